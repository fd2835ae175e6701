package geometry

import (
	"math"
	"strings"
	"testing"
)

// The [drift] table: C_d and I_e have no default, h_sx is a length
// (docs/method.md §7); written values read back.
func TestDriftSettings(t *testing.T) {
	const head = "length = \"20ft\"\nheight = \"20ft\"\nthickness = \"8in\"\n[material]\nstrength = \"2000psi\"\n"
	w, err := Parse("a.toml", []byte(head+"[drift]\nlimit = 0.007\nstorey_height = \"10ft\"\n"))
	if err != nil {
		t.Fatal(err)
	}
	if w.Drift.Cd != 0 || w.Drift.Ie != 0 {
		t.Errorf("Cd, Ie = %g, %g; want 0, 0 (not given)", w.Drift.Cd, w.Drift.Ie)
	}
	if got := float64(w.Drift.StoreyHeight); math.Abs(got-10*float64(Foot)) > 1e-12 {
		t.Errorf("storey height %g m, want 10 ft", got)
	}
	data, err := Marshal(w)
	if err != nil {
		t.Fatal(err)
	}
	if s := string(data); strings.Contains(s, "cd =") || !strings.Contains(s, `storey_height = "10ft"`) {
		t.Errorf("Marshal wrote:\n%s", s)
	}
	back, err := Parse("b.toml", data)
	if err != nil || back.Drift != w.Drift {
		t.Errorf("round trip: %+v, %v; want %+v", back.Drift, err, w.Drift)
	}
	for _, c := range []struct{ text, key string }{
		{"cd = 0", "drift.cd"},
		{"ie = -1", "drift.ie"},
		{`storey_height = "0ft"`, "drift.storey_height"},
	} {
		_, err := Parse("bad.toml", []byte(head+"[drift]\n"+c.text+"\n"))
		if err == nil || !strings.Contains(err.Error(), c.key) {
			t.Errorf("%s: error %v, want one naming %s", c.text, err, c.key)
		}
	}
}
