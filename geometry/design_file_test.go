package geometry

import (
	"os"
	"strings"
	"testing"
)

// The reinforced example wall reads its design inputs, and every bad design
// input is an error naming its line and key.
func TestDesignInputs(t *testing.T) {
	src, err := os.ReadFile("../testdata/walls/cmu-reinforced.toml")
	if err != nil {
		t.Fatal(err)
	}
	w, err := Parse("cmu.toml", src)
	if err != nil {
		t.Fatal(err)
	}
	r, d := w.Reinforcement, w.Design
	if r == nil || d == nil {
		t.Fatal("no design inputs")
	}
	// #5 bar: 0.31 in² (ASTM A615 nominal area).
	if r.Grout != PartialGrout || !near(float64(r.Fy), 60*float64(KSI), 1e-12) ||
		r.Vertical.Size.Name != "#5" || !near(float64(r.Vertical.Spacing), 48*float64(Inch), 1e-12) ||
		r.Jamb.Count != 1 || !near(r.Jamb.Area(), 0.31*float64(Inch*Inch), 1e-3) || r.Horizontal.Size.Name != "#4" {
		t.Errorf("reinforcement %+v", r)
	}
	if !d.CodeGiven || d.Code != TMS402 || d.Class != Intermediate || !near(d.SDS, 0.6, 1e-12) || w.Load.Kind != Seismic {
		t.Errorf("design %+v kind %v", d, w.Load.Kind)
	}
	base := string(src)
	cases := []struct {
		name, from, to string
		key, msg       string
	}{
		{"unknown bar", `vertical = "#5@48in"`, `vertical = "#13@48in"`, "reinforcement.vertical", `unknown bar size "#13"`},
		{"spacing under the bar", `horizontal = "#4@48in"`, `horizontal = "#4@0.25in"`, "reinforcement.horizontal", "not more than the bar's diameter"},
		{"jamb", `jamb = "1#5"`, `jamb = "0#5"`, "reinforcement.jamb", "zero bars"},
		{"fy low", `fy = "60ksi"`, `fy = "6ksi"`, "reinforcement.fy", "between 30 and 100 ksi"},
		{"fy missing", `fy = "60ksi"`, ``, "reinforcement.fy", "missing"},
		{"sds", `sds = 0.6`, `sds = 6`, "design.sds", "between 0 and 3"},
		{"rho", `rho = 1.0`, `rho = 2`, "design.rho", "ρ must be"},
		{"code for material", `code = "tms402-22"`, `code = "aci318-19"`, "design.code", "does not fit the material"},
		{"unknown code", `code = "tms402-22"`, `code = "tms402-16"`, "design.code", "unknown code"},
		{"class", `wall_class = "intermediate"`, `wall_class = "extra"`, "design.wall_class", "unknown wall class"},
		{"grout", `grout = "partial"`, `grout = "some"`, "reinforcement.grout", "unknown grout"},
		{"kind", `kind = "seismic"`, `kind = "snow"`, "load.kind", "unknown load kind"},
		{"unknown key", `fy = "60ksi"`, `fy = "60ksi"` + "\ncover = \"2in\"", "reinforcement.cover", "unknown key"},
	}
	for _, c := range cases {
		t.Run(c.name, func(t *testing.T) {
			text := strings.Replace(base, c.from, c.to, 1)
			_, err := Parse("cmu.toml", []byte(text))
			l := errorList(err)
			for _, e := range l {
				if e.Key == c.key && strings.Contains(e.Msg, c.msg) {
					if e.File != "cmu.toml" || e.Line == 0 {
						t.Errorf("%v: no file or line", e)
					}
					// the key's line, or its table's header when the key is missing
					if ln := strings.Split(text, "\n")[e.Line-1]; !strings.Contains(ln, lastPart(c.key)) && !strings.HasPrefix(ln, "[") {
						t.Errorf("%v: line %d is %q", e, e.Line, ln)
					}
					return
				}
			}
			t.Errorf("want %s: %s, got %v", c.key, c.msg, err)
		})
	}
	// Reinforcement keys on a wall with no [design] table.
	text := strings.Replace(base, "[design]\ncode = \"tms402-22\"\nwall_class = \"intermediate\"\nsds = 0.6\nrho = 1.0\n", "", 1)
	_, err = Parse("cmu.toml", []byte(text))
	if err == nil || !strings.Contains(err.Error(), "reinforcement without a [design] table") {
		t.Errorf("reinforcement without design: %v", err)
	}
}

func lastPart(key string) string {
	if i := strings.LastIndexByte(key, '.'); i >= 0 {
		return key[i+1:]
	}
	return key
}

// Marshal writes the design inputs back so that they read back the same, and
// MarshalKeeping keeps their comments.
func TestDesignRoundTrip(t *testing.T) {
	src, _ := os.ReadFile("../testdata/walls/cmu-reinforced.toml")
	w, err := Parse("cmu.toml", src)
	if err != nil {
		t.Fatal(err)
	}
	w.Reinforcement.Edge = 3 * Inch
	w.Reinforcement.Layers = 1
	w.Design.Mortar = MortarN
	w.Load.Kind = Wind
	out, err := Marshal(w)
	if err != nil {
		t.Fatal(err)
	}
	back, err := Parse("out.toml", out)
	if err != nil {
		t.Fatalf("%v\n%s", err, out)
	}
	if *back.Reinforcement != *w.Reinforcement || *back.Design != *w.Design || back.Load != w.Load {
		t.Errorf("round trip:\n%+v\n%+v", back.Reinforcement, w.Reinforcement)
	}
	kept, err := MarshalKeeping(src, w)
	if err != nil {
		t.Fatal(err)
	}
	if !strings.Contains(string(kept), "# at each wall end and each side of every opening") {
		t.Errorf("comment lost:\n%s", kept)
	}
	if _, err := Parse("kept.toml", kept); err != nil {
		t.Error(err)
	}
	c := w.Clone()
	c.Reinforcement.Jamb.Count = 3
	c.Design.SDS = 1
	if w.Reinforcement.Jamb.Count == 3 || w.Design.SDS == 1 {
		t.Error("Clone shares the design inputs")
	}
}
