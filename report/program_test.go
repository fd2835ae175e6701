package report

import (
	"bytes"
	"strings"
	"testing"

	"pierwise/geometry"
	"pierwise/pier"
)

// A report written without a version names the program alone, never
// "pierwise " with a dangling space.
func TestProgramWithoutVersion(t *testing.T) {
	if Program("") != "pierwise" || Program("0.1.0") != "pierwise 0.1.0" {
		t.Fatalf("Program: %q, %q", Program(""), Program("0.1.0"))
	}
	w, err := geometry.LoadFile("../testdata/walls/nested.toml")
	if err != nil {
		t.Fatal(err)
	}
	res, err := pier.Solve(w)
	if err != nil {
		t.Fatal(err)
	}
	var buf bytes.Buffer
	if err := Wall(&buf, Input{Path: "nested.toml", Wall: w, Result: res, Now: reportTime}); err != nil {
		t.Fatal(err)
	}
	for _, l := range strings.Split(buf.String(), "\n") {
		if strings.Contains(l, "Program:") && strings.TrimSpace(l) != "Program:     pierwise" {
			t.Errorf("program line %q", l)
		}
	}
}
