package pier

import (
	"math"
	"strings"
	"testing"

	"pierwise/geometry"
)

// loadedMasonry gives wall w a concrete masonry material (f'm 2000 psi) and
// a 40 kip shear so that the drift check runs.
func loadedMasonry(w *geometry.Wall) *geometry.Wall {
	w.Material = geometry.Material{Kind: geometry.ConcreteMasonry, Strength: 2000 * geometry.PSI}
	w.Load.Shear = 40 * geometry.Kip
	return w
}

func hasKind(r *Result, kind string) (string, bool) {
	for _, w := range r.Warnings {
		if w.Kind == kind {
			return w.Text, true
		}
	}
	return "", false
}

// No drift verdict without C_d and I_e (docs/method.md §7); with them,
// δ = C_d·δe/I_e against limit·h_sx (ASCE 7-22 §12.8.6, Table 12.12-1).
func TestDriftNeedsCdAndIe(t *testing.T) {
	w := loadedMasonry(solidWall(20, 12, geometry.Cantilever))
	w.Drift = geometry.Drift{Preset: "masonry-cantilever", Limit: 0.010}
	r, err := Solve(w)
	if err != nil {
		t.Fatal(err)
	}
	d := r.Drift
	if d.Missing != "C_d and I_e" || d.Judged() || d.Design != 0 || !strings.Contains(d.Verdict(), "not given") {
		t.Errorf("no factors: %+v, verdict %q; want no design drift and no verdict", d, d.Verdict())
	}
	w.Drift.Cd = 3.5
	if r, _ = Solve(w); r.Drift.Missing != "I_e" {
		t.Errorf("Cd only: missing %q, want I_e", r.Drift.Missing)
	}
	w.Drift.Ie, w.Drift.StoreyHeight = 1.25, 10*ft
	r, err = Solve(w)
	if err != nil {
		t.Fatal(err)
	}
	d = r.Drift
	want := 3.5 * float64(r.DeflectionAbs) / 1.25 // ASCE 7-22 Eq. 12.8-15 (equation number from memory)
	if !d.Judged() || math.Abs(float64(d.Design)-want) > 1e-12*want {
		t.Errorf("design drift %g, want %g", float64(d.Design), want)
	}
	h := 10 * float64(ft)
	if math.Abs(d.Ratio-want/h) > 1e-9*d.Ratio || math.Abs(float64(d.Allowable)-0.010*h) > 1e-12 {
		t.Errorf("ratio %g and allowable %g m, want δ/h_sx = %g and 0.010 h_sx = %g", d.Ratio, float64(d.Allowable), want/h, 0.010*h)
	}
}

// A preset whose ASCE 7-22 Table 12.12-1 row does not fit the wall warns,
// naming the row: the low-rise and all-other rows exclude masonry shear
// wall structures; masonry-cantilever (footnote d) needs walls cantilevered
// from the base without coupling.
func TestDriftPresetRow(t *testing.T) {
	cases := []struct {
		name   string
		wall   *geometry.Wall
		kind   geometry.MaterialKind
		preset string
		want   string // "" = no warning
	}{
		{"low-rise on masonry", solidWall(20, 12, geometry.Cantilever), geometry.ConcreteMasonry, "low-rise-i-ii", "excludes masonry shear wall structures"},
		{"other on clay masonry", solidWall(20, 12, geometry.Cantilever), geometry.ClayMasonry, "other-iv", "excludes masonry shear wall structures"},
		{"masonry row on concrete", solidWall(20, 12, geometry.Cantilever), geometry.Concrete, "masonry-other", "this wall is concrete"},
		{"cantilever on a fixed top", solidWall(20, 12, geometry.Fixed), geometry.ConcreteMasonry, "masonry-cantilever", "footnote d"},
		// Windows under a spandrel: their piers are fixed-fixed, coupled.
		{"cantilever on coupled piers", wallFt(20, 12, geometry.Cantilever, [4]float64{4, 3, 4, 4}, [4]float64{12, 3, 4, 4}), geometry.ConcreteMasonry, "masonry-cantilever", "P1, P2, P3 are fixed-fixed"},
		// Doors to the top of a cantilever: cantilever piers, no coupling.
		{"cantilever on cantilever piers", wallFt(20, 12, geometry.Cantilever, [4]float64{8, 0, 4, 12}), geometry.ConcreteMasonry, "masonry-cantilever", ""},
		{"other masonry on coupled piers", wallFt(20, 12, geometry.Cantilever, [4]float64{4, 3, 4, 4}), geometry.ConcreteMasonry, "masonry-other", ""},
		{"low-rise on concrete", solidWall(20, 12, geometry.Cantilever), geometry.Concrete, "low-rise-iii", ""},
	}
	for _, c := range cases {
		w := loadedMasonry(c.wall)
		w.Material.Kind = c.kind
		p, _ := geometry.FindDriftPreset(c.preset)
		w.Drift = geometry.Drift{Cd: 3.5, Ie: 1, Preset: p.Name, Limit: p.Limit}
		r, err := Solve(w)
		if err != nil {
			t.Fatalf("%s: %v", c.name, err)
		}
		text, ok := hasKind(r, WarnDriftRow)
		switch {
		case c.want == "" && ok:
			t.Errorf("%s: unexpected warning %q", c.name, text)
		case c.want != "" && !strings.Contains(text, c.want):
			t.Errorf("%s: warning %q, want one saying %q", c.name, text, c.want)
		case c.want != "" && !strings.Contains(text, "Table 12.12-1"):
			t.Errorf("%s: warning %q does not name the table", c.name, text)
		}
	}
}

// Openings at two levels: a single top load is not a storey drift. Gross
// sections: ASCE 7-22 §12.7.3 asks for cracked ones. Neither without a
// drift check.
func TestDriftStoreysAndGross(t *testing.T) {
	w := loadedMasonry(wallFt(20, 20, geometry.Cantilever, [4]float64{4, 3, 4, 4}, [4]float64{4, 13, 4, 4}))
	r, err := Solve(w)
	if err != nil {
		t.Fatal(err)
	}
	if _, ok := hasKind(r, WarnDriftStoreys); ok {
		t.Error("storey warning without a drift check")
	}
	w.Drift = geometry.Drift{Cd: 3.5, Ie: 1, Limit: 0.007}
	if r, err = Solve(w); err != nil {
		t.Fatal(err)
	}
	if text, ok := hasKind(r, WarnDriftStoreys); !ok || !strings.Contains(text, "2 levels") {
		t.Errorf("storey warning %q, want openings at 2 levels", text)
	}
	if text, ok := hasKind(r, WarnDriftGross); !ok || !strings.Contains(text, "§12.7.3") {
		t.Errorf("gross-section note %q", text)
	}
	w.Stiffness = geometry.Stiffness{Flexure: 0.5, Shear: 1}
	if r, _ = Solve(w); func() bool { _, ok := hasKind(r, WarnDriftGross); return ok }() {
		t.Error("gross-section note with a flexure modifier of 0.5")
	}
	one := loadedMasonry(wallFt(20, 20, geometry.Cantilever, [4]float64{4, 3, 4, 4}))
	one.Drift = w.Drift
	if r, _ = Solve(one); func() bool { _, ok := hasKind(r, WarnDriftStoreys); return ok }() {
		t.Error("storey warning with openings at one level")
	}
}

// A drift check on a wall whose lateral load is wind warns that C_d, I_e
// and the limits of ASCE 7-22 Table 12.12-1 belong to the seismic effect
// (common practice: wind drift is a serviceability check).
func TestDriftWindWarns(t *testing.T) {
	const ft = geometry.Foot
	w := &geometry.Wall{
		Units: geometry.US, Length: 20 * ft, Height: 10 * ft, Thickness: 8 * geometry.Inch,
		Material:  geometry.Material{Kind: geometry.ConcreteMasonry, Strength: 2000 * geometry.PSI},
		Load:      geometry.Load{Shear: 10 * geometry.Kip},
		Stiffness: geometry.Stiffness{Flexure: 1, Shear: 1},
		Drift:     geometry.Drift{Cd: 4, Ie: 1, Limit: 0.01},
		Layouts:   []geometry.Layout{{Name: "a"}},
	}
	has := func(r *Result) bool {
		for _, x := range r.Warnings {
			if x.Kind == WarnDriftWind {
				return true
			}
		}
		return false
	}
	r, err := Solve(w)
	if err != nil {
		t.Fatal(err)
	}
	if has(r) {
		t.Error("seismic load: a wind drift warning")
	}
	w.Load.Kind = geometry.Wind
	if r, err = Solve(w); err != nil {
		t.Fatal(err)
	}
	if !has(r) {
		t.Error("wind load with C_d: no warning that the drift check is a seismic one")
	}
}
