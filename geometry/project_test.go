package geometry

import (
	"strings"
	"testing"
)

// The [project] table reads, writes and reads back; an unknown key in it
// is an error naming project.KEY.
func TestProjectTable(t *testing.T) {
	const head = "length = \"20ft\"\nheight = \"10ft\"\nthickness = \"8in\"\n[material]\nstrength = \"2000psi\"\n"
	w, err := Parse("a.toml", []byte(head+"[project]\nname = \"Library annex\"\njob = \"24-117\"\nengineer = \"A. B.\"\nchecker = \"C. D.\"\n"))
	if err != nil {
		t.Fatal(err)
	}
	want := Project{Name: "Library annex", Job: "24-117", Engineer: "A. B.", Checker: "C. D."}
	if w.Project != want {
		t.Fatalf("project %+v, want %+v", w.Project, want)
	}
	data, err := Marshal(w)
	if err != nil {
		t.Fatal(err)
	}
	back, err := Parse("b.toml", data)
	if err != nil || back.Project != want {
		t.Errorf("round trip %+v, %v:\n%s", back.Project, err, data)
	}
	if _, err := Parse("c.toml", []byte(head+"[project]\nclient = \"x\"\n")); err == nil || !strings.Contains(err.Error(), "project.client") {
		t.Errorf("unknown key: %v", err)
	}
	if n := len((Project{Job: "1"}).Entries()); n != 1 {
		t.Errorf("Entries of a project with a job only: %d, want 1", n)
	}
}
