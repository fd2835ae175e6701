package study

import (
	"os"
	"path/filepath"
	"strings"
	"testing"

	"pierwise/geometry"
)

// A wall with variants survives geometry.Marshal and Parse, and each variant
// solves to the same answer after the round trip.
func TestVariantsRoundTrip(t *testing.T) {
	w := annex()
	w.Active = 1
	data, err := geometry.Marshal(w)
	if err != nil {
		t.Fatal(err)
	}
	if !strings.Contains(string(data), "[[variant]]") {
		t.Fatalf("no [[variant]] table in\n%s", data)
	}
	back, err := geometry.Parse("annex.toml", data)
	if err != nil {
		t.Fatalf("parse: %v\n%s", err, data)
	}
	if back.Active != 1 || len(back.Layouts) != len(w.Layouts) {
		t.Fatalf("active %d of %d layouts, want 1 of %d", back.Active, len(back.Layouts), len(w.Layouts))
	}
	for i := range w.Layouts {
		a, b := w.Layouts[i], back.Layouts[i]
		if a.Name != b.Name || len(a.Openings) != len(b.Openings) {
			t.Fatalf("layout %d: %q with %d openings, back %q with %d", i, a.Name, len(a.Openings), b.Name, len(b.Openings))
		}
		for k := range a.Openings {
			oa, ob := a.Openings[k], b.Openings[k]
			if oa.Name != ob.Name || !near(float64(oa.X), float64(ob.X), 1e-12) || !near(float64(oa.Sill), float64(ob.Sill), 1e-12) ||
				!near(float64(oa.Width), float64(ob.Width), 1e-12) || !near(float64(oa.Height), float64(ob.Height), 1e-12) {
				t.Errorf("layout %q opening %d: %+v, back %+v", a.Name, k, oa, ob)
			}
		}
		c, err := Compare(WithLayout(w, i), WithLayout(back, i))
		if err != nil {
			t.Fatal(err)
		}
		if ch, ok := c.RigidityChange(); !ok || !near(1+ch, 1, 1e-12) {
			t.Errorf("layout %q: rigidity change %g after the round trip", a.Name, ch)
		}
	}
}

func TestOpen(t *testing.T) {
	dir := t.TempDir()
	path := filepath.Join(dir, "annex.toml")
	if err := geometry.Save(path, annex()); err != nil {
		t.Fatal(err)
	}
	w, err := Open(path + ":W2 moved")
	if err != nil || w.Active != 1 {
		t.Fatalf("open variant: %v, active %v", err, w)
	}
	w, err = Open(path)
	if err != nil || w.Active != 0 {
		t.Fatalf("open: %v", err)
	}
	_, err = Open(path + ":nope")
	if err == nil || !strings.Contains(err.Error(), `"main", "W2 moved", "no entrance"`) || !strings.Contains(err.Error(), "annex.toml") {
		t.Errorf("unknown variant: %v", err)
	}
	// A file whose name has a colon is taken whole when it exists.
	odd := filepath.Join(dir, "a:b.toml")
	data, _ := os.ReadFile(path)
	if err := os.WriteFile(odd, data, 0o644); err != nil {
		t.Fatal(err)
	}
	if _, err := Open(odd); err != nil {
		t.Errorf("file with a colon: %v", err)
	}
	if _, err := Open(filepath.Join(dir, "missing.toml")); err == nil {
		t.Error("missing file: no error")
	}
}
