package geometry

import (
	"errors"
	"math"
	"math/rand/v2"
	"os"
	"reflect"
	"strings"
	"testing"
)

// Line and area load units against their definitions: 1 lbf =
// 4.448 221 615 260 5 N and 1 ft = 0.3048 m exactly (NIST SP 811 (2008),
// Appendix B.8), so 1 lbf/ft = 14.593 902 937 206 4 N/m and 1 lbf/ft² =
// 47.880 258 980 335 8 Pa (NIST SP 811, Appendix B.8 lists 1.459 390 E+01
// and 4.788 026 E+01).
func TestLoadUnits(t *testing.T) {
	cases := []struct {
		text string
		sys  System
		want float64 // N/m or Pa
		area bool
	}{
		{"1.2kip/ft", US, 1.2 * 14593.902937206364, false},
		{"800lb/ft", US, 800 * 14.593902937206364, false},
		{"800 plf", US, 800 * 14.593902937206364, false},
		{"1.5 klf", US, 1500 * 14.593902937206364, false},
		{"1.2", US, 1200 * 14.593902937206364, false}, // bare: kip/ft
		{"15kN/m", SI, 15000, false},
		{"15", SI, 15000, false}, // bare: kN/m
		{"15 N/mm", SI, 15000, false},
		{"60psf", US, 60 * 47.88025898033584, true},
		{"60", US, 60 * 47.88025898033584, true}, // bare: psf
		{"2 ksf", US, 2000 * 47.88025898033584, true},
		{"2.9kPa", SI, 2900, true},
		{"2.9 kN/m²", SI, 2900, true},
		{"2900 N/m2", SI, 2900, true},
		{"2.9", SI, 2900, true}, // bare: kPa
	}
	for _, c := range cases {
		var got float64
		var err error
		if c.area {
			var s Stress
			s, err = ParseAreaLoad(c.text, c.sys)
			got = float64(s)
		} else {
			var q LineLoad
			q, err = ParseLineLoad(c.text, c.sys)
			got = float64(q)
		}
		if err != nil || !near(got, c.want, 1e-12) {
			t.Errorf("%q: %g, %v; want %g", c.text, got, err, c.want)
		}
	}
	for _, bad := range []string{"", "kip/ft", "1.2 kip/in", "1.2 tonnes/m", "nan", "1e400kip/ft", "1.2kip/ft/ft"} {
		if _, err := ParseLineLoad(bad, US); err == nil {
			t.Errorf("ParseLineLoad(%q) gave no error", bad)
		}
	}
	if s := FormatLineLoad(1.2*KipPerFoot, US); s != "1.20 kip/ft" {
		t.Errorf("FormatLineLoad = %q", s)
	}
	if s := FormatLineLoad(800*PoundPerFoot, US); s != "800 lb/ft" {
		t.Errorf("FormatLineLoad = %q", s)
	}
	if s := FormatAreaLoad(2900, SI); s != "2.90 kPa" {
		t.Errorf("FormatAreaLoad = %q", s)
	}
}

// The basis, the top tie and the gravity loads read from a file, show in
// the wall as their types say, and survive Marshal exactly.
func TestAnalysisAndGravitySettings(t *testing.T) {
	text := wallText + `
[analysis]
basis = "fe"
top_tie = false

[gravity]
dead = "1.2kip/ft"
live = "800lb/ft"
self_weight = 0
`
	w, err := Parse("wall.toml", []byte(text))
	if err != nil {
		t.Fatal(err)
	}
	if w.Analysis.Basis != BasisFE || !w.Analysis.NoTopTie {
		t.Errorf("analysis %+v", w.Analysis)
	}
	if !near(float64(w.Gravity.Dead), float64(1.2*KipPerFoot), 1e-15) || !near(float64(w.Gravity.Live), float64(800*PoundPerFoot), 1e-15) ||
		!w.Gravity.NoSelf || w.Gravity.SelfWeight != 0 {
		t.Errorf("gravity %+v", w.Gravity)
	}
	out, err := Marshal(w)
	if err != nil {
		t.Fatal(err)
	}
	for _, want := range []string{"[analysis]\nbasis = \"fe\"\ntop_tie = false\n", "[gravity]\ndead = \"1.2kip/ft\"\nlive = \"800lb/ft\"\nself_weight = \"0\"\n"} {
		if !strings.Contains(string(out), want) {
			t.Errorf("Marshal lacks %q:\n%s", want, out)
		}
	}
	back, err := Parse("back.toml", out)
	if err != nil || !reflect.DeepEqual(normal(back), normal(w)) {
		t.Errorf("round trip: %v\n%+v\n%+v", err, back, w)
	}

	// Defaults: classic, tied, no loads, self weight from the material.
	w, err = Parse("wall.toml", []byte(wallText))
	if err != nil {
		t.Fatal(err)
	}
	if w.Analysis != (Analysis{}) || w.Gravity != (Gravity{}) {
		t.Errorf("defaults: %+v %+v", w.Analysis, w.Gravity)
	}
	if out, _ := Marshal(w); strings.Contains(string(out), "[analysis]") || strings.Contains(string(out), "[gravity]") {
		t.Errorf("defaults written:\n%s", out)
	}
	w, err = Parse("wall.toml", []byte(wallText+"\n[gravity]\nself_weight = \"60psf\"\n"))
	if err != nil || w.Gravity.NoSelf || !near(float64(w.Gravity.SelfWeight), 60*47.88025898033584, 1e-12) {
		t.Errorf("self weight 60 psf: %+v, %v", w.Gravity, err)
	}
}

// Random analysis and gravity settings round-trip bit for bit in both unit
// systems.
func TestGravityRoundTrip(t *testing.T) {
	rng := rand.New(rand.NewPCG(20261202, 1))
	for n := range 300 {
		w := randomWall(rand.New(rand.NewPCG(uint64(n), 7)))
		w.Analysis = Analysis{Basis: Basis(rng.IntN(2)), NoTopTie: rng.IntN(2) == 0}
		w.Gravity.Dead = LineLoad(rng.Float64() * 1e5)
		if rng.IntN(2) == 0 {
			w.Gravity.Live = LineLoad(math.Round(rng.Float64()*100) * float64(PoundPerFoot))
		}
		switch rng.IntN(3) {
		case 0:
			w.Gravity.NoSelf = true
		case 1:
			w.Gravity.SelfWeight = Stress(rng.Float64() * 1e4)
		}
		out, err := Marshal(w)
		if err != nil {
			t.Fatal(err)
		}
		back, err := Parse("r.toml", out)
		if err != nil || !reflect.DeepEqual(normal(back), normal(w)) {
			t.Fatalf("round trip %d: %v\n%s", n, err, out)
		}
	}
}

// Bad analysis and gravity values are errors naming file, line and key.
func TestAnalysisAndGravityErrors(t *testing.T) {
	cases := []struct {
		name, add string
		line      int
		key, msg  string
	}{
		{"negative dead", "[gravity]\ndead = \"-1kip/ft\"\n", 30, "gravity.dead", "must not be negative"},
		{"huge live", "[gravity]\nlive = \"1e9kip/ft\"\n", 30, "gravity.live", "implausibly large"},
		{"nan dead", "[gravity]\ndead = nan\n", 30, "gravity.dead", "finite"},
		{"infinite self weight", "[gravity]\nself_weight = inf\n", 30, "gravity.self_weight", "finite"},
		{"negative self weight", "[gravity]\n\nself_weight = \"-60psf\"\n", 31, "gravity.self_weight", "must not be negative"},
		{"self weight as force", "[gravity]\nself_weight = \"60kip\"\n", 30, "gravity.self_weight", `unknown unit "kip"`},
		{"unknown basis", "[analysis]\nbasis = \"strut-and-tie\"\n", 30, "analysis.basis", `unknown basis "strut-and-tie"`},
		{"top tie as text", "[analysis]\ntop_tie = \"yes\"\n", 30, "analysis.top_tie", "true or false"},
		{"unknown gravity key", "[gravity]\nsnow = \"1kip/ft\"\n", 30, "gravity.snow", `unknown key "snow"`},
	}
	for _, c := range cases {
		_, err := Parse("wall.toml", []byte(wallText+"\n"+c.add))
		var l ErrorList
		if !errors.As(err, &l) || len(l) == 0 {
			t.Errorf("%s: no error", c.name)
			continue
		}
		e := l[0]
		if e.File != "wall.toml" || e.Line != c.line || e.Key != c.key || !strings.Contains(e.Msg, c.msg) {
			t.Errorf("%s: %v, want wall.toml:%d: %s: …%s…", c.name, err, c.line, c.key, c.msg)
		}
	}
	// The wall's own check names the key too.
	w, _ := Parse("wall.toml", []byte(wallText))
	w.Gravity.Dead = LineLoad(math.Inf(1))
	w.Analysis.Basis = 7
	err := w.Validate()
	if err == nil || !strings.Contains(err.Error(), "gravity.dead: is not a finite number") || !strings.Contains(err.Error(), "analysis.basis: unknown basis") {
		t.Errorf("Validate: %v", err)
	}
	if _, err := Marshal(w); err == nil {
		t.Error("Marshal wrote an infinite load")
	}
}

// BenchmarkParse reads and writes the example walls: the table-driven
// parser (schema structs, toml.MetaData.Undecoded, ScanTOML) and Marshal.
func BenchmarkParse(b *testing.B) {
	data, err := os.ReadFile("../testdata/walls/variants.toml")
	if err != nil {
		b.Fatal(err)
	}
	w, err := Parse("variants.toml", data)
	if err != nil {
		b.Fatal(err)
	}
	b.Run("Parse", func(b *testing.B) {
		b.ReportAllocs()
		for b.Loop() {
			if _, err := Parse("variants.toml", data); err != nil {
				b.Fatal(err)
			}
		}
	})
	b.Run("Marshal", func(b *testing.B) {
		b.ReportAllocs()
		for b.Loop() {
			if _, err := Marshal(w); err != nil {
				b.Fatal(err)
			}
		}
	})
	b.Run("MarshalKeeping", func(b *testing.B) {
		b.ReportAllocs()
		for b.Loop() {
			if _, err := MarshalKeeping(data, w); err != nil {
				b.Fatal(err)
			}
		}
	})
}
