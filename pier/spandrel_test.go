package pier

import (
	"strings"
	"testing"

	"pierwise/geometry"
)

// TestNestedSpandrelMeasuredToTheNextOpening checks that the spandrel over
// the openings inside a pier is measured through the pier's top into the
// solid wall above it, up to the next opening or the wall's top: the cut at
// the pier's top is a line of the method, not an edge of the masonry.
func TestNestedSpandrelMeasuredToTheNextOpening(t *testing.T) {
	// Masonry Chronicles wall (docs/method.md §2): the window W1 (head at 6 ft) sits
	// in pier P2 (0–8 ft) of a 16 ft wall, so 10 ft of wall lie over it,
	// more than the 4 ft height of the piers beside it: no warning. Before
	// the fix only the 2 ft inside P2 counted (ratio 0.50).
	r, err := Solve(chronicles())
	if err != nil {
		t.Fatal(err)
	}
	for _, m := range Texts(r.Warnings) {
		if strings.Contains(m, "spandrel above the opening W1") {
			t.Errorf("unexpected warning %q: 10 ft of wall lie over W1", m)
		}
	}

	// The depth counts through the pier's top: 20 ft × 10 ft cantilever,
	// door O1 (x 10–14 ft, 0–9 ft 8 in) and window O2 (x 2–6 ft, sill 3 ft,
	// 4 ft high) inside pier P1 (0–9 ft 8 in). Over O2: 2 ft 8 in inside P1
	// plus 4 in above it, 3 ft in all, against piers 4 ft tall: 0.75
	// (arithmetic), above SpandrelRatio: no warning.
	w := wallFt(20, 10, geometry.Cantilever, [4]float64{10, 0, 4, 9 + 8.0/12}, [4]float64{2, 3, 4, 4})
	r, err = Solve(w)
	if err != nil {
		t.Fatal(err)
	}
	if all := strings.Join(Texts(r.Warnings), "\n"); strings.Contains(all, "above the opening O2") {
		t.Errorf("warnings %q: a spandrel 0.75 times the piers' height is not shallow", all)
	}
	// O2 5 ft 6 in high: 1 ft 2 in inside P1 plus 4 in, 1 ft 6 in against
	// piers 5 ft 6 in tall: 0.27 (arithmetic), below SpandrelRatio.
	w.Layouts[0].Openings[1].Height = 5.5 * ft
	if r, err = Solve(w); err != nil {
		t.Fatal(err)
	}
	all := strings.Join(Texts(r.Warnings), "\n")
	if !strings.Contains(all, "in pier P1 the spandrel above the opening O2 is 0.27 times") {
		t.Errorf("warnings %q, want the spandrel over O2 in P1 at 0.27", all)
	}
	// One opening reads in the singular: a window 8 ft tall under a 1 ft
	// spandrel.
	r, err = Solve(wallFt(20, 12, geometry.Cantilever, [4]float64{6, 3, 4, 8}))
	if err != nil {
		t.Fatal(err)
	}
	if all := strings.Join(Texts(r.Warnings), "\n"); !strings.Contains(all, "the spandrel above the opening O1 is 0.1") {
		t.Errorf("warnings %q, want the singular for O1", all)
	}
}

// TestStaggeredMessageInWallUnits checks that the staggered-band message
// shows its heights in the wall's own units and lists the openings plainly
// (the band of these invented windows runs from 2 ft to 7 ft).
func TestStaggeredMessageInWallUnits(t *testing.T) {
	w := wallFt(10, 10, geometry.Cantilever, [4]float64{0, 2, 5, 2}, [4]float64{6, 3.5, 4, 2}, [4]float64{5, 5, 1, 2})
	_, err := Solve(w)
	want := `openings O1, O2, O3 are staggered across the whole length of the wall between heights 2'-0" and 7'-0"`
	if err == nil || !strings.Contains(err.Error(), want) {
		t.Errorf("err = %v, want it to contain %q", err, want)
	}
	w.Units = geometry.SI
	_, err = Solve(w)
	if want := "between heights 0.610 m and 2.134 m"; err == nil || !strings.Contains(err.Error(), want) {
		t.Errorf("err = %v, want it to contain %q", err, want)
	}
}

// A solid wall taller than four times its length gets the slender warning
// that a pier of those proportions gets (h/L > SlenderRatio); a squat one
// does not.
func TestSlenderSolidWall(t *testing.T) {
	r, err := Solve(solidWall(2, 10, geometry.Cantilever))
	if err != nil {
		t.Fatal(err)
	}
	if all := strings.Join(Texts(r.Warnings), "\n"); !strings.Contains(all, "the wall is slender (h/L = 5.0") {
		t.Errorf("warnings %q, want the wall slender", all)
	}
	r, err = Solve(solidWall(20, 10, geometry.Cantilever))
	if err != nil {
		t.Fatal(err)
	}
	if len(r.Warnings) != 0 {
		t.Errorf("squat solid wall: warnings %q", r.Warnings)
	}
}

// docs/method.md §3: E_v given as Poisson's ratio, E_v = E/(2(1+ν)) (isotropic
// elasticity, Gere & Timoshenko, Mechanics of Materials). For concrete with
// ν = 0.2, E_v = E/2.4, so a cantilever of h/L = 0.5 deflects 4·0.125 +
// 1.2·0.5·2.4 = 1.94 (instead of 2.0 with E_v = 0.4 E); f'c = 4000 psi
// gives E_c = 57,000·√4000 psi = 3605 ksi (ACI 318).
func TestPoissonGivesShearModulus(t *testing.T) {
	w := solidWall(20, 10, geometry.Cantilever)
	w.Material = geometry.Material{Kind: geometry.Concrete, Strength: 4000 * geometry.PSI, Poisson: 0.2}
	r, err := Solve(w)
	if err != nil {
		t.Fatal(err)
	}
	if !near(r.Deflection, 1.94, 1e-9) {
		t.Errorf("deflection %g, want 1.94", r.Deflection)
	}
	if e := float64(r.Moduli.E / geometry.KSI); !near(e, 3604.997, 1e-6) || !near(float64(r.Moduli.Ev/r.Moduli.E), 1/2.4, 1e-12) {
		t.Errorf("E = %g ksi, E_v/E = %g; want 3605 ksi and 1/2.4", e, float64(r.Moduli.Ev/r.Moduli.E))
	}
	if !strings.Contains(r.Moduli.EvSource, "ν = 0.2") {
		t.Errorf("E_v source %q does not name ν", r.Moduli.EvSource)
	}
	w.Material.Poisson = 0.5
	if _, err := Solve(w); err == nil {
		t.Error("ν = 0.5 accepted")
	}
}

// Every warning has a kind, a severity and a subject beside its text; the
// sliver pier of a window 6 in from the end is a layout warning, the note
// on fixed piers is not (every layout of the wall has it).
func TestWarningKinds(t *testing.T) {
	r, err := Solve(wallFt(20, 10, geometry.Cantilever, [4]float64{0.5, 3, 4, 4}))
	if err != nil {
		t.Fatal(err)
	}
	kinds := map[string]string{}
	for _, w := range r.Warnings {
		kinds[w.Kind] = w.Text
		switch w.Kind {
		case WarnSliver:
			if w.Subject != "P1" || w.Severity != SeverityCaution {
				t.Errorf("sliver warning %+v, want subject P1, caution", w)
			}
		case WarnFixedPiers:
			t.Errorf("fixed-piers warning on the wall: the assumption is stated once in the help and the report, %+v", w)
		}
	}
	if m := kinds[WarnSliver]; !strings.Contains(m, "sliver") {
		t.Errorf("sliver kind on %q", m)
	}
	if !LayoutWarning(WarnSliver) || LayoutWarning(WarnFixedPiers) || LayoutWarning(WarnFixedTop) {
		t.Error("LayoutWarning: sliver is one, fixed piers and fixed top are not")
	}
}
