package geometry

import (
	"errors"
	"math"
	"strconv"
	"strings"
	"testing"
)

// testWall is a valid 20 ft × 10 ft wall with two windows in one band.
func testWall() *Wall {
	ft := Foot
	return &Wall{
		Units: US, Length: 20 * ft, Height: 10 * ft, Thickness: 7.625 * Inch,
		Material:  Material{Kind: ConcreteMasonry, Strength: 2000 * PSI},
		Stiffness: Stiffness{1, 1},

		Layouts: []Layout{{Name: "main", Openings: []Opening{
			{Name: "W1", X: 2 * ft, Sill: 3 * ft, Width: 4 * ft, Height: 4 * ft},
			{Name: "W2", X: 10 * ft, Sill: 3 * ft, Width: 4 * ft, Height: 4 * ft},
		}}},
	}
}

func keysOf(err error) []string {
	var l ErrorList
	errors.As(err, &l)
	var k []string
	for _, e := range l {
		k = append(k, e.Key)
	}
	return k
}

func TestValidate(t *testing.T) {
	ft := Foot
	nan := math.NaN()
	cases := []struct {
		name string
		edit func(w *Wall)
		key  string // "" = valid
	}{
		{"valid", func(w *Wall) {}, ""},
		{"touching edges", func(w *Wall) { w.Layouts[0].Openings[1].X = 6 * ft }, ""},
		{"touching corners", func(w *Wall) {
			w.Layouts[0].Openings[1] = Opening{Name: "W2", X: 6 * ft, Sill: 7 * ft, Width: 2 * ft, Height: 2 * ft}
		}, ""},
		{"reaches the top", func(w *Wall) { w.Layouts[0].Openings[1].Height = 7 * ft }, ""},
		{"door at the base", func(w *Wall) { w.Layouts[0].Openings[1].Sill = 0 }, ""},
		{"full height opening", func(w *Wall) { w.Layouts[0].Openings[1].Sill, w.Layouts[0].Openings[1].Height = 0, 10*ft }, ""},
		{"at both ends", func(w *Wall) { w.Layouts[0].Openings[0].X, w.Layouts[0].Openings[1].X = 0, 16*ft }, ""},
		{"sum rounding at the end", func(w *Wall) {
			w.Length = 18 * ft
			w.Layouts[0].Openings[1] = Opening{Name: "W2", X: 4.1 * ft, Sill: 0, Width: 13.9 * ft, Height: 1 * ft}
			w.Layouts[0].Openings[0].X = 0.1 * ft
			w.Layouts[0].Openings[0].Width = 4 * ft
			w.Layouts[0].Openings[0].Sill = 1 * ft
		}, ""},
		{"zero length", func(w *Wall) { w.Length = 0 }, "length"},
		{"NaN height", func(w *Wall) { w.Height = Length(nan) }, "height"},
		{"infinite thickness", func(w *Wall) { w.Thickness = Length(math.Inf(1)) }, "thickness"},
		{"negative thickness", func(w *Wall) { w.Thickness = -1 }, "thickness"},
		{"bad units", func(w *Wall) { w.Units = 7 }, "units"},
		{"bad support", func(w *Wall) { w.Support = -1 }, "support"},
		{"bad material", func(w *Wall) { w.Material.Kind = 9 }, "material.kind"},
		{"zero strength", func(w *Wall) { w.Material.Strength = 0 }, "material.strength"},
		{"NaN strength", func(w *Wall) { w.Material.Strength = Stress(nan) }, "material.strength"},
		{"custom without modulus", func(w *Wall) { w.Material.Kind = Custom }, "material.modulus"},
		{"custom with modulus, no strength", func(w *Wall) { w.Material = Material{Kind: Custom, Modulus: 1e10} }, ""},
		{"negative shear modulus", func(w *Wall) { w.Material.ShearModulus = -1 }, "material.shear_modulus"},
		{"negative shear", func(w *Wall) { w.Load.Shear = -1 }, "load.shear"},
		{"NaN shear", func(w *Wall) { w.Load.Shear = Force(nan) }, "load.shear"},
		{"negative modifier", func(w *Wall) { w.Stiffness.Flexure = -0.35 }, "stiffness.flexure"},
		{"zero modifier", func(w *Wall) { w.Stiffness.Shear = 0 }, "stiffness.shear"},
		{"negative cd", func(w *Wall) { w.Drift.Cd = -1 }, "drift.cd"},
		{"cd not given", func(w *Wall) { w.Drift.Cd = 0 }, ""},
		{"negative storey height", func(w *Wall) { w.Drift.StoreyHeight = -1 }, "drift.storey_height"},
		{"NaN storey height", func(w *Wall) { w.Drift.StoreyHeight = Length(nan) }, "drift.storey_height"},
		{"NaN ie", func(w *Wall) { w.Drift.Ie = nan }, "drift.ie"},
		{"unknown preset", func(w *Wall) { w.Drift.Preset, w.Drift.Limit = "steel", 0.01 }, "drift.limit"},
		{"preset with other limit", func(w *Wall) { w.Drift.Preset, w.Drift.Limit = "masonry-cantilever", 0.02 }, "drift.limit"},
		{"preset", func(w *Wall) { w.Drift.Preset, w.Drift.Limit = "masonry-cantilever", 0.01 }, ""},
		{"limit too big", func(w *Wall) { w.Drift.Limit = 0.11 }, "drift.limit"},
		{"limit negative", func(w *Wall) { w.Drift.Limit = -0.01 }, "drift.limit"},
		{"limit at 0.1", func(w *Wall) { w.Drift.Limit = 0.1 }, ""},
		{"mesh negative", func(w *Wall) { w.Check.Mesh = -1 }, "check.mesh"},
		{"element unknown", func(w *Wall) { w.Check.Element = "q9" }, "check.element"},
		{"no layouts", func(w *Wall) { w.Layouts = nil }, "layout"},
		{"active out of range", func(w *Wall) { w.Active = 1 }, "active"},
		{"layout without name", func(w *Wall) { w.Layouts[0].Name = "" }, "layout"},
		{"duplicate layout", func(w *Wall) { w.Layouts = append(w.Layouts, Layout{Name: "main"}) }, "variant[1].name"},
		{"opening without name", func(w *Wall) { w.Layouts[0].Openings[0].Name = "" }, "opening[1].name"},
		{"duplicate opening name", func(w *Wall) { w.Layouts[0].Openings[1].Name = "W1" }, "opening[2].name"},
		{"zero width", func(w *Wall) { w.Layouts[0].Openings[0].Width = 0 }, "opening[1].width"},
		{"NaN x", func(w *Wall) { w.Layouts[0].Openings[0].X = Length(nan) }, "opening[1].x"},
		{"negative sill", func(w *Wall) { w.Layouts[0].Openings[0].Sill = -ft }, "opening[1].sill"},
		{"past the right end", func(w *Wall) { w.Layouts[0].Openings[1].X = 17 * ft }, "opening[2]"},
		{"above the top", func(w *Wall) { w.Layouts[0].Openings[1].Height = 7.01 * ft }, "opening[2]"},
		{"overlap", func(w *Wall) { w.Layouts[0].Openings[1].X = 5.9 * ft }, "opening[2]"},
		{"one inside another", func(w *Wall) {
			w.Layouts[0].Openings[1] = Opening{Name: "W2", X: 3 * ft, Sill: 4 * ft, Width: 1 * ft, Height: 1 * ft}
		}, "opening[2]"},
		{"variant overlap", func(w *Wall) {
			w.Layouts = append(w.Layouts, Layout{Name: "b", Openings: []Opening{
				{Name: "A", X: 0, Width: ft, Height: ft}, {Name: "B", X: 0.5 * ft, Width: ft, Height: ft}}})
		}, "variant[1].opening[2]"},
		{"bad title", func(w *Wall) { w.Title = "\xff" }, "title"},
		{"wall of 20 km", func(w *Wall) { w.Length = 2e4 }, "length"},
		{"thickness of 0.01 mm", func(w *Wall) { w.Thickness = 1e-5 }, "thickness"},
		{"opening of 0.01 mm", func(w *Wall) { w.Layouts[0].Openings[0].Width = 1e-5 }, "opening[1].width"},
		{"strength of 10^13 Pa", func(w *Wall) { w.Material.Strength = 1e13 }, "material.strength"},
		{"modulus of 10^13 Pa", func(w *Wall) { w.Material.Modulus = 1e13 }, "material.modulus"},
		{"shear of 10^13 N", func(w *Wall) { w.Load.Shear = 1e13 }, "load.shear"},
		{"modifier of 20", func(w *Wall) { w.Stiffness.Flexure = 20 }, "stiffness.flexure"},
		{"modifier of 0.001", func(w *Wall) { w.Stiffness.Shear = 0.001 }, "stiffness.shear"},
		{"cd of 1000", func(w *Wall) { w.Drift.Cd = 1000 }, "drift.cd"},
		{"mesh too fine", func(w *Wall) { w.Check.Mesh = 0.1 * Inch }, "check.mesh"},
		{"mesh fine enough", func(w *Wall) { w.Check.Mesh = 1 * Inch }, ""},
		{"mesh larger than the wall", func(w *Wall) { w.Check.Mesh = 21 * ft }, "check.mesh"},
	}
	for _, c := range cases {
		w := testWall()
		c.edit(w)
		err := w.Validate()
		if c.key == "" {
			if err != nil {
				t.Errorf("%s: unexpected error %v", c.name, err)
			}
			continue
		}
		keys := keysOf(err)
		if len(keys) != 1 || keys[0] != c.key {
			t.Errorf("%s: error keys %v, want just %q (%v)", c.name, keys, c.key, err)
		}
	}
}

func TestValidateReportsAll(t *testing.T) {
	w := testWall()
	w.Thickness = 0
	w.Drift.Limit = 1
	w.Layouts[0].Openings[1].X = 5 * ft()
	w.Layouts[0].Openings[1].Name = "W1"
	keys := strings.Join(keysOf(w.Validate()), " ")
	for _, k := range []string{"thickness", "drift.limit", "opening[2]", "opening[2].name"} {
		if !strings.Contains(keys, k) {
			t.Errorf("missing %s in %s", k, keys)
		}
	}
	var e *Error
	if !errors.As(w.Validate(), &e) {
		t.Errorf("errors.As cannot reach an *Error in the list")
	}
}

func ft() Length { return Foot }

func TestErrorText(t *testing.T) {
	cases := []struct {
		e    Error
		want string
	}{
		{Error{File: "a.toml", Line: 3, Key: "length", Msg: "bad"}, "a.toml:3: length: bad"},
		{Error{File: "a.toml", Key: "length", Msg: "bad"}, "a.toml: length: bad"},
		{Error{Key: "length", Msg: "bad"}, "length: bad"},
		{Error{Line: 4, Msg: "bad"}, "line 4: bad"},
		{Error{Msg: "bad"}, "bad"},
	}
	for _, c := range cases {
		if got := c.e.Error(); got != c.want {
			t.Errorf("got %q, want %q", got, c.want)
		}
	}
	if ErrorList(nil).Err() != nil {
		t.Errorf("an empty list is an error")
	}
}

func TestCheckOpening(t *testing.T) {
	w := testWall()
	o := w.Openings()[0]
	if err := w.CheckOpening(0, o); err != nil {
		t.Errorf("an opening in its own place: %v", err)
	}
	o.X += Foot // still clear of W2 (10 ft)
	if err := w.CheckOpening(0, o); err != nil {
		t.Errorf("moving W1 by a foot: %v", err)
	}
	o.X = 7 * Foot // over W2
	if err := w.CheckOpening(0, o); err == nil || !strings.Contains(err.Error(), "overlaps opening W2") {
		t.Errorf("moving W1 over W2: %v", err)
	}
	o.X = 17 * Foot // past the end
	if err := w.CheckOpening(0, o); err == nil || !strings.Contains(err.Error(), "right end") {
		t.Errorf("moving W1 past the end: %v", err)
	}
	n := Opening{Name: "W2", X: 15 * Foot, Sill: 3 * Foot, Width: 2 * Foot, Height: 2 * Foot}
	if err := w.CheckOpening(-1, n); err == nil || !strings.Contains(err.Error(), "already used") {
		t.Errorf("new opening with a taken name: %v", err)
	}
	n.Name = ""
	if err := w.CheckOpening(-1, n); err != nil {
		t.Errorf("new opening at a free place: %v", err)
	}
	n.Width = 0
	if err := w.CheckOpening(-1, n); err == nil {
		t.Errorf("new opening of zero width accepted")
	}
	if err := w.CheckOpening(5, n); err == nil {
		t.Errorf("no opening 5, but no error")
	}
	if err := w.CheckOpening(-2, n); err == nil {
		t.Errorf("index -2, but no error")
	}
}

func TestFreeSpot(t *testing.T) {
	ft := Foot
	w := testWall() // windows at 2–6 ft and 10–14 ft, sill 3 ft, 4 ft high
	cases := []struct {
		name  string
		o     Opening
		x     Length
		found bool
	}{
		{"already free", Opening{X: 6 * ft, Sill: 3 * ft, Width: 4 * ft, Height: 4 * ft}, 6 * ft, true},
		{"over W1, moves right", Opening{X: 3 * ft, Sill: 3 * ft, Width: 4 * ft, Height: 4 * ft}, 6 * ft, true},
		{"too wide for the gap", Opening{X: 3 * ft, Sill: 3 * ft, Width: 5 * ft, Height: 4 * ft}, 14 * ft, true},
		{"near the end, moves left", Opening{X: 17 * ft, Sill: 3 * ft, Width: 4 * ft, Height: 4 * ft}, 16 * ft, true},
		{"other band, stays", Opening{X: 3 * ft, Sill: 0, Width: 3 * ft, Height: 3 * ft}, 3 * ft, true},
		{"wider than the wall", Opening{X: 0, Sill: 0, Width: 21 * ft, Height: 1 * ft}, 0, false},
		{"taller than the wall", Opening{X: 0, Sill: 0, Width: 1 * ft, Height: 11 * ft}, 0, false},
		{"NaN x", Opening{X: Length(math.NaN()), Sill: 8 * ft, Width: 1 * ft, Height: 1 * ft}, 0, true},
	}
	for _, c := range cases {
		got, ok := w.FreeSpot(c.o)
		if ok != c.found || (ok && math.Abs(float64(got.X-c.x)) > 1e-12) {
			t.Errorf("%s: FreeSpot at x = %g ft, %v; want %g ft, %v", c.name, float64(got.X/ft), ok, float64(c.x/ft), c.found)
		}
		if ok && (got.Sill != c.o.Sill || got.Width != c.o.Width || got.Height != c.o.Height) {
			t.Errorf("%s: FreeSpot changed more than x: %+v", c.name, got)
		}
		if ok {
			if err := w.CheckOpening(-1, got); err != nil {
				t.Errorf("%s: the free spot is not free: %v", c.name, err)
			}
		}
	}
	full := testWall()
	full.Layouts[0].Openings = []Opening{{Name: "W1", X: 0, Sill: 3 * ft, Width: 20 * ft, Height: 4 * ft}}
	if _, ok := full.FreeSpot(Opening{X: 3 * ft, Sill: 4 * ft, Width: 1 * ft, Height: 1 * ft}); ok {
		t.Errorf("found a spot in a band that is all opening")
	}
}

func TestClone(t *testing.T) {
	w := testWall()
	w.Layouts = append(w.Layouts, Layout{Name: "b"})
	c := w.Clone()
	c.Layouts[0].Openings[0].X = 0
	c.Layouts[0].Openings = append(c.Layouts[0].Openings, Opening{Name: "W9"})
	c.Layouts[1].Name = "changed"
	c.Length = 1
	if w.Layouts[0].Openings[0].X != 2*Foot || len(w.Layouts[0].Openings) != 2 || w.Layouts[1].Name != "b" || w.Length != 20*Foot {
		t.Errorf("changing the clone changed the original: %+v", w)
	}
}

func TestNextOpeningName(t *testing.T) {
	w := testWall()
	if got := w.NextOpeningName(0, false); got != "W3" {
		t.Errorf("next window %q, want W3", got)
	}
	if got := w.NextOpeningName(0, true); got != "D1" {
		t.Errorf("next door %q, want D1", got)
	}
	if got := w.NextOpeningName(3, true); got != "" {
		t.Errorf("no layout 3, got %q", got)
	}
}

// ASCE 7-22 Table 12.12-1, allowable story drift Δa as a fraction of the
// story height h_sx (values as quoted in docs/method.md §7).
func TestDriftPresets(t *testing.T) {
	want := map[string]float64{
		"masonry-cantilever": 0.010, "masonry-other": 0.007,
		"low-rise-i-ii": 0.025, "low-rise-iii": 0.020, "low-rise-iv": 0.015,
		"other-i-ii": 0.020, "other-iii": 0.015, "other-iv": 0.010,
	}
	if len(DriftPresets) != len(want) {
		t.Errorf("%d presets, want %d", len(DriftPresets), len(want))
	}
	for _, p := range DriftPresets {
		v, ok := want[p.Name]
		if !ok || !near(p.Limit, v, 1e-12) {
			t.Errorf("preset %s = %g, want %g", p.Name, p.Limit, v)
		}
		if !strings.HasPrefix(p.Source, "ASCE 7-22 Table 12.12-1") {
			t.Errorf("preset %s has no source", p.Name)
		}
		if got, ok := FindDriftPreset(p.Name); !ok || got != p {
			t.Errorf("FindDriftPreset(%s) = %+v, %v", p.Name, got, ok)
		}
	}
	if _, ok := FindDriftPreset("steel"); ok {
		t.Errorf("found an unknown preset")
	}
}

func TestNames(t *testing.T) {
	for _, s := range []Support{Cantilever, Fixed} {
		if got, ok := ParseSupport(s.String()); !ok || got != s {
			t.Errorf("support %v does not read back", s)
		}
	}
	for _, k := range []MaterialKind{ConcreteMasonry, ClayMasonry, Concrete, Custom} {
		if got, ok := ParseMaterialKind(k.String()); !ok || got != k {
			t.Errorf("material %v does not read back", k)
		}
	}
	for _, s := range []System{US, SI} {
		if got, ok := ParseSystem(s.String()); !ok || got != s {
			t.Errorf("system %v does not read back", s)
		}
	}
	if _, ok := ParseSupport("pinned"); ok {
		t.Errorf("pinned accepted")
	}
	if Support(5).String() == "" || MaterialKind(-1).String() == "" || System(9).String() == "" {
		t.Errorf("unknown values have no text")
	}
}

func BenchmarkValidate(b *testing.B) {
	for _, n := range []int{1, 10, 50} {
		w := testWall()
		w.Length = Length(n) * 2 * Foot
		w.Layouts[0].Openings = nil
		for i := 0; i < n; i++ {
			w.Layouts[0].Openings = append(w.Layouts[0].Openings, Opening{Name: "W" + strconv.Itoa(i+1), X: Length(2*i) * Foot, Sill: 3 * Foot, Width: Foot, Height: 4 * Foot})
		}
		b.Run(strconv.Itoa(n)+"-openings", func(b *testing.B) {
			b.ReportAllocs()
			for b.Loop() {
				if err := w.Validate(); err != nil {
					b.Fatal(err)
				}
			}
		})
	}
}
