package report

import (
	"bytes"
	"strings"
	"testing"

	"pierwise/design"
	"pierwise/geometry"
	"pierwise/pier"
)

// The reinforced example wall's report carries the design section: the
// inputs, the combinations, the rules once each, a table per pier, the
// governing line and the caution.
func TestWallReportDesign(t *testing.T) {
	w, err := geometry.LoadFile("../testdata/walls/cmu-reinforced.toml")
	if err != nil {
		t.Fatal(err)
	}
	res, err := pier.Solve(w)
	if err != nil {
		t.Fatal(err)
	}
	d, ok, err := design.CheckClassic(w, res)
	if !ok || err != nil {
		t.Fatalf("design: %v %v", ok, err)
	}
	var buf bytes.Buffer
	if err := Wall(&buf, Input{Path: "testdata/walls/cmu-reinforced.toml", Wall: w, Result: res, Design: &d, Now: reportTime, Version: "test"}); err != nil {
		t.Fatal(err)
	}
	got := buf.String()
	for _, want := range []string{"Pier design", "vertical #5@48in", "S_DS = 0.6 g", "1.32D + 1.00Q_E + 1.00L",
		"0.78D + 1.00Q_E", "Governing:", "licensed engineer's", "amendments govern"} {
		if !strings.Contains(got, want) {
			t.Errorf("report lacks %q", want)
		}
	}
	// Each rule once: its clause appears in the rules list and nowhere else.
	for _, e := range d.Equations() {
		if n := strings.Count(got, e.Text[:20]); n != 1 {
			t.Errorf("rule %q printed %d times", e.Text[:20], n)
		}
	}
	// One table row per check.
	for _, p := range d.Piers {
		if n := strings.Count(got, "\n  "+p.Name+"  (x "); n != 1 {
			t.Errorf("pier %s heads %d tables", p.Name, n)
		}
	}
	cmpGolden(t, "wall_cmu_reinforced.golden", []byte(got))
}

// A ratio above 1 reads as a failure without colour.
func TestRatioMark(t *testing.T) {
	for _, c := range []struct {
		r    float64
		want string
	}{{0.5, "0.50"}, {1.0, "1.00"}, {1.004, "1.00!"}, {2.5, "2.50!"}, {design.RatioCap, "≥100!"}} {
		if got := Ratio(c.r); got != c.want {
			t.Errorf("Ratio(%g) = %q, want %q", c.r, got, c.want)
		}
	}
}
