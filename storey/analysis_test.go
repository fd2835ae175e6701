package storey

import (
	"errors"
	"math"
	"strings"
	"testing"
	"time"

	"pierwise/geometry"
)

const ft = geometry.Foot

// blockWall is a 7.625 in concrete block wall, f'm = 2000 psi, cantilever.
func blockWall(title string, length, height geometry.Length, openings ...geometry.Opening) *geometry.Wall {
	return &geometry.Wall{
		Title: title, Units: geometry.US, Length: length, Height: height, Thickness: 7.625 * geometry.Inch,
		Support:  geometry.Cantilever,
		Material: geometry.Material{Kind: geometry.ConcreteMasonry, Strength: 2000 * geometry.PSI},
		Layouts:  []geometry.Layout{{Name: "main", Openings: openings}},
	}
}

func window(name string, x, sill, w, h geometry.Length) geometry.Opening {
	return geometry.Opening{Name: name, X: x, Sill: sill, Width: w, Height: h}
}

// symmetricStorey is an 80 ft × 50 ft plan, symmetric about both centre
// lines: equal x-walls with windows at y = 0 and 50 ft, equal solid y-walls at
// x = 0 and 80 ft, and a shorter solid pair of y-walls at x = 20 and 60 ft.
func symmetricStorey(acc float64) (*Storey, []*geometry.Wall) {
	s := &Storey{
		Path: "sym.toml", Title: "symmetric", Units: geometry.US, Shear: 120 * geometry.Kip,
		MassCenter: [2]geometry.Length{40 * ft, 25 * ft}, Size: [2]geometry.Length{80 * ft, 50 * ft}, Accidental: acc,
	}
	var walls []*geometry.Wall
	add := func(name string, d Direction, pos geometry.Length, w *geometry.Wall) {
		s.Walls = append(s.Walls, WallRef{Name: name, File: name + ".toml", Direction: d, Position: pos, lines: map[string]int{}})
		walls = append(walls, w)
	}
	windows := func() []geometry.Opening {
		return []geometry.Opening{window("W1", 10*ft, 4*ft, 8*ft, 4*ft), window("W2", 62*ft, 4*ft, 8*ft, 4*ft)}
	}
	add("S", X, 0, blockWall("south", 80*ft, 14*ft, windows()...))
	add("N", X, 50*ft, blockWall("north", 80*ft, 14*ft, windows()...))
	add("W", Y, 0, blockWall("west", 50*ft, 14*ft))
	add("E", Y, 80*ft, blockWall("east", 50*ft, 14*ft))
	add("W2", Y, 20*ft, blockWall("inner west", 16*ft, 14*ft))
	add("E2", Y, 60*ft, blockWall("inner east", 16*ft, 14*ft))
	return s, walls
}

// A symmetric storey with no accidental part: no torsion, and each wall's
// share of the storey shear is its relative rigidity over the direction's
// sum (rigid diaphragm, Taly 2nd ed. §7.9; same E and t everywhere, so
// absolute and relative rigidities are proportional).
func TestAnalyseSymmetricShares(t *testing.T) {
	s, walls := symmetricStorey(0)
	a, err := Analyse(s, walls)
	if err != nil {
		t.Fatal(err)
	}
	if !a.Absolute {
		t.Fatal("every wall has a material: want absolute rigidities")
	}
	var sum [2]float64
	for _, w := range a.Walls {
		sum[w.Ref.Direction] += w.Unit.Rigidity
	}
	V := float64(s.Shear)
	for _, w := range a.Walls {
		want := w.Unit.Rigidity / sum[w.Ref.Direction]
		if got := w.Design.Shear / V; !near(got, want, 1e-9) {
			t.Errorf("%s: share %.6f, want relative rigidity share %.6f", w.Name, got, want)
		}
		// R = E·t/d with E = 900·2000 psi (TMS 402) and t = 7.625 in.
		E := 900 * 2000 * float64(geometry.PSI)
		if !near(w.Rigidity, w.Unit.Rigidity*E*7.625*float64(geometry.Inch), 1e-9) {
			t.Errorf("%s: rigidity %g N/m, want relative × E·t", w.Name, w.Rigidity)
		}
	}
	if c := a.Distribution.CenterOfRigidity; !near(c[0], float64(40*ft), 1e-9) || !near(c[1], float64(25*ft), 1e-9) {
		t.Errorf("centre of rigidity %v, want the plan centre", c)
	}
}

// Each wall's design shear flows into its piers: a leaf pier takes
// V_i = share·V_design and M_i = V_i·h (cantilever) or V_i·h/2 (fixed-fixed)
// (docs/method.md §2).
func TestAnalysePierForces(t *testing.T) {
	s, walls := symmetricStorey(DefaultAccidental)
	a, err := Analyse(s, walls)
	if err != nil {
		t.Fatal(err)
	}
	checked := 0
	for _, w := range a.Walls {
		if w.Design.Shear < w.Design.Direct {
			t.Errorf("%s: design %g below direct %g", w.Name, w.Design.Shear, w.Design.Direct)
		}
		if !w.Loaded.HasLoad {
			t.Fatalf("%s: not solved under its design shear", w.Name)
		}
		for _, p := range w.Loaded.Leaves() {
			if !near(float64(p.Shear), p.Share*w.Design.Shear, 1e-9) {
				t.Errorf("%s %s: shear %g, want share %g × %g", w.Name, p.Name, float64(p.Shear), p.Share, w.Design.Shear)
			}
			arm := p.H() // cantilever: moment at the base
			if p.Support == geometry.Fixed {
				arm /= 2 // fixed-fixed: inflection point at mid-height
			}
			if !near(p.Moment, float64(p.Shear)*arm, 1e-9) {
				t.Errorf("%s %s: moment %g, want V·%g = %g", w.Name, p.Name, p.Moment, arm, float64(p.Shear)*arm)
			}
			checked++
		}
	}
	if checked == 0 {
		t.Error("no pier was checked")
	}
}

// Without a modulus on one wall, the walls are compared by relative
// rigidity × thickness, and the report says so.
func TestAnalyseRelativeFallback(t *testing.T) {
	s, walls := symmetricStorey(DefaultAccidental)
	walls[2].Material = geometry.Material{Kind: geometry.ConcreteMasonry}
	a, err := Analyse(s, walls)
	if err != nil {
		t.Fatal(err)
	}
	if a.Absolute {
		t.Fatal("a wall without strength: want relative rigidities")
	}
	for _, w := range a.Walls {
		if !near(w.Rigidity, w.Unit.Rigidity*float64(w.Wall.Thickness), 1e-12) {
			t.Errorf("%s: rigidity %g, want relative × t", w.Name, w.Rigidity)
		}
	}
	if !strings.Contains(strings.Join(a.Warnings, "\n"), "relative rigidity × thickness") {
		t.Errorf("no warning about relative rigidities in %q", a.Warnings)
	}
}

func TestAnalyseErrors(t *testing.T) {
	// A wall that runs off the plan from its start.
	s, walls := symmetricStorey(DefaultAccidental)
	s.Walls[2].Start, s.Walls[2].HasStart = 10*ft, true
	s.Walls[2].Line, s.Walls[2].lines["start"] = 20, 24
	_, err := Analyse(s, walls)
	var e *Error
	if !errors.As(err, &e) || e.Line != 24 || e.Key != "wall[3].start" || !strings.Contains(e.Msg, "off the plan") {
		t.Errorf("wall off the plan: got %v", err)
	}

	// All y-walls on one line and one x-wall: the walls cross at one point.
	s, walls = symmetricStorey(DefaultAccidental)
	s.Walls, walls = s.Walls[1:3], walls[1:3]
	_, err = Analyse(s, walls)
	if !errors.As(err, &e) || !strings.Contains(e.Msg, "cannot resist torsion") || e.File != "sym.toml" {
		t.Errorf("walls through one point: got %v", err)
	}

	// No wall along y.
	s, walls = symmetricStorey(DefaultAccidental)
	s.Walls, walls = s.Walls[:2], walls[:2]
	_, err = Analyse(s, walls)
	if !errors.As(err, &e) || !strings.Contains(e.Msg, `direction = "y"`) {
		t.Errorf("no y-wall: got %v", err)
	}

	// A wall the classic method cannot solve is named with its line.
	s, walls = symmetricStorey(DefaultAccidental)
	s.Walls[0].lines["file"] = 9
	walls[0].Layouts[0].Openings = []geometry.Opening{window("D9", 0, 4*ft, 80*ft, 2*ft)} // a band window the full length: no load path
	_, err = Analyse(s, walls)
	if !errors.As(err, &e) || e.Line != 9 || e.Key != "wall[1].file" || !strings.Contains(e.Msg, "D9") {
		t.Errorf("cut wall: got %v", err)
	}
}

// Walls without a name of their own are called by their title; the same
// wall file placed several times still gives every wall its own name, so
// the tables and the JSON can be read.
func TestAnalyseSameFileTwiceNamesApart(t *testing.T) {
	s, walls := symmetricStorey(0.05)
	for i := range s.Walls {
		s.Walls[i].Name = ""
		s.Walls[i].File, s.Walls[i].Path = "same.toml", "same.toml"
		walls[i].Title = "Typical wall"
	}
	a, err := Analyse(s, walls)
	if err != nil {
		t.Fatal(err)
	}
	seen := map[string]bool{}
	for _, w := range a.Walls {
		if seen[w.Name] {
			t.Errorf("name %q given twice", w.Name)
		}
		seen[w.Name] = true
	}
	if a.Walls[2].Name != "Typical wall (wall 3)" {
		t.Errorf("third wall named %q, want \"Typical wall (wall 3)\"", a.Walls[2].Name)
	}
}

// The same wall listed twice on one line is counted twice by the
// distribution; the storey says so. Walls on distinct lines or apart along
// one line are not called out.
func TestAnalyseWarnsOverlappingWalls(t *testing.T) {
	s, walls := symmetricStorey(0.05)
	a, err := Analyse(s, walls)
	if err != nil {
		t.Fatal(err)
	}
	for _, m := range a.Warnings {
		if strings.Contains(m, "overlap") {
			t.Errorf("symmetric storey: %q", m)
		}
	}
	s.Walls = append(s.Walls, s.Walls[0])
	s.Walls[len(s.Walls)-1].Name = "S again"
	walls = append(walls, walls[0])
	if a, err = Analyse(s, walls); err != nil {
		t.Fatal(err)
	}
	found := false
	for _, m := range a.Warnings {
		if strings.Contains(m, "walls 1 (S) and 7 (S again) stand on the same line and overlap along it by 80'-0\"") {
			found = true
		}
	}
	if !found {
		t.Errorf("no overlap warning in %q", a.Warnings)
	}
}

// A wall file's drift settings are checked under the wall's design shear
// (δ = Cd·δe/Ie, ASCE 7-22 §12.8.6): the report states it, and a storey
// warning names a wall whose drift exceeds its limit.
func TestAnalyseDriftUnderDesignShear(t *testing.T) {
	s, walls := symmetricStorey(0.05)
	walls[0].Drift = geometry.Drift{Cd: 3.5, Ie: 1, Limit: 0.010}
	a, err := Analyse(s, walls)
	if err != nil {
		t.Fatal(err)
	}
	res := a.Walls[0].Loaded
	if want := 3.5 * float64(res.DeflectionAbs); math.Abs(float64(res.Drift.Design)-want) > 1e-12*want || !res.Drift.OK {
		t.Fatalf("drift %g m, want %g m and OK", float64(res.Drift.Design), want)
	}
	var b strings.Builder
	if err := Report(&b, a, time.Date(2026, 12, 1, 0, 0, 0, 0, time.UTC), ""); err != nil {
		t.Fatal(err)
	}
	if !strings.Contains(b.String(), "design drift δ = Cd·δe/Ie =") || !strings.Contains(b.String(), ": OK") {
		t.Errorf("report lacks the drift line")
	}
	for _, m := range a.Warnings {
		if strings.Contains(m, "drift") {
			t.Errorf("unexpected warning %q", m)
		}
	}
	// The JSON carries the check of the wall that sets a limit only.
	if j := a.JSON(); j.Walls[0].Drift == nil || !j.Walls[0].Drift.OK || j.Walls[1].Drift != nil {
		t.Errorf("JSON drift %+v and %+v", j.Walls[0].Drift, j.Walls[1].Drift)
	}
	// A limit far below the drift is exceeded and said so.
	walls[0].Drift.Limit = 1e-7
	if a, err = Analyse(s, walls); err != nil {
		t.Fatal(err)
	}
	found := false
	for _, m := range a.Warnings {
		if strings.Contains(m, "S: under its design shear the drift") && strings.Contains(m, "exceeds the limit") {
			found = true
		}
	}
	if !found {
		t.Errorf("no drift warning in %q", a.Warnings)
	}
}
