package basis

import (
	"errors"
	"math"
	"testing"

	"pierwise/geometry"
	"pierwise/pier"
	"pierwise/pier/fe"
)

// wallFt builds a wall in feet with openings {name, x, sill, width, height}
// (invented test walls).
func wallFt(l, h float64, ops ...[5]any) *geometry.Wall {
	ft := func(v float64) geometry.Length { return geometry.Length(v) * geometry.Foot }
	w := &geometry.Wall{Units: geometry.US, Length: ft(l), Height: ft(h), Thickness: 7.625 * geometry.Inch,
		Support:  geometry.Cantilever,
		Material: geometry.Material{Kind: geometry.ConcreteMasonry, Strength: 2000 * geometry.PSI},
		Load:     geometry.Load{Shear: 30 * geometry.Kip}}
	var os []geometry.Opening
	for _, o := range ops {
		os = append(os, geometry.Opening{Name: o[0].(string), X: ft(o[1].(float64)), Sill: ft(o[2].(float64)), Width: ft(o[3].(float64)), Height: ft(o[4].(float64))})
	}
	w.Layouts = []geometry.Layout{{Name: "as built", Openings: os}}
	return w
}

func typical() *geometry.Wall {
	return wallFt(30, 12, [5]any{"W1", 3.0, 3.0, 5.0, 4.0}, [5]any{"D1", 12.0, 0.0, 4.0, 8.0}, [5]any{"W2", 21.0, 3.0, 6.0, 4.0})
}

func near(a, b, tol float64) bool {
	return math.Abs(a-b) <= tol*math.Max(1, math.Max(math.Abs(a), math.Abs(b)))
}

func TestParse(t *testing.T) {
	for in, want := range map[string]geometry.Basis{"classic": geometry.BasisClassic, "fe": geometry.BasisFE, " FE ": geometry.BasisFE} {
		got, err := Parse(in)
		if err != nil || got != want {
			t.Errorf("Parse(%q) = %v, %v; want %v", in, got, err, want)
		}
	}
	for _, in := range []string{"", "finite", "classic,fe"} {
		if _, err := Parse(in); err == nil {
			t.Errorf("Parse(%q): no error", in)
		}
	}
}

// The classic basis gives the classic result's numbers unchanged.
func TestClassicBasisIsTheClassicResult(t *testing.T) {
	w := typical()
	want, err := pier.Solve(w)
	if err != nil {
		t.Fatal(err)
	}
	r := Solve(w, geometry.BasisClassic, Options{})
	if r.Err() != nil || r.FE != nil {
		t.Fatalf("classic basis: err %v, FE solved %v", r.Err(), r.FE != nil)
	}
	if r.Rigidity() != want.Rigidity || r.Deflection() != want.Deflection || r.RigidityAbs() != want.RigidityAbs ||
		r.DeflectionAbs() != want.DeflectionAbs || r.Drift() != want.Drift || r.Overturning() != want.Overturning {
		t.Errorf("classic basis differs from pier.Solve")
	}
	ps := r.Piers()
	if len(ps) != len(want.Piers) {
		t.Fatalf("%d piers, want %d", len(ps), len(want.Piers))
	}
	for i, p := range ps {
		q := want.Piers[i]
		if p.Name != q.Name || p.Share != q.Share || p.Shear != q.Shear || p.Moment != q.Moment || p.Loads != q.Loads {
			t.Errorf("pier %s differs from the classic pier", p.Name)
		}
	}
	if _, ok := r.Check(); ok {
		t.Error("a check without the model solved")
	}
}

// On the fe basis the numbers are the model's; the leaf shares of each
// band sum to one (every band carries the whole wall shear, statics), and
// the classic rigidity stands beside as the check.
func TestFEBasis(t *testing.T) {
	w := typical()
	r := Solve(w, geometry.BasisFE, Options{})
	if err := r.Err(); err != nil {
		t.Fatal(err)
	}
	if r.Rigidity() != r.FE.Rigidity || r.DeflectionAbs() != r.FE.DeflectionAbs || r.Drift() != r.FE.Drift {
		t.Error("fe basis does not give the model's numbers")
	}
	if !near(r.Rigidity()*r.Deflection(), 1, 1e-12) {
		t.Errorf("rigidity %g × deflection %g ≠ 1", r.Rigidity(), r.Deflection())
	}
	// One band (sills 0 and 3 ft, heads 7 and 8 ft merge): P1–P4.
	sum := 0.0
	V := float64(w.Load.Shear)
	for _, p := range r.Leaves() {
		sum += p.Share
		if !near(float64(p.Shear), p.Share*V, 1e-6) {
			t.Errorf("%s: V %g, share × V %g", p.Name, float64(p.Shear), p.Share*V)
		}
		if s, ok := r.Share(p.Name); !ok || s != p.Share {
			t.Errorf("Share(%s) = %g, %v", p.Name, s, ok)
		}
	}
	if !near(sum, 1, 1e-6) {
		t.Errorf("leaf shares sum to %g, want 1", sum)
	}
	c, ok := r.Check()
	if !ok || c.Basis != geometry.BasisClassic || c.Rigidity != r.Classic.Rigidity || !near(c.Difference, r.FE.Difference, 1e-12) {
		t.Errorf("check %+v %v; classic %g, fe difference %g", c, ok, r.Classic.Rigidity, r.FE.Difference)
	}
	// The hand method is the stiffer on a wall with openings (docs/method.md §4).
	if !(c.Difference > 0) {
		t.Errorf("classic − fe difference %g, expected positive", c.Difference)
	}
}

// A staggered band: the classic basis has no answer, the fe basis has a
// rigidity but no piers.
func TestStaggered(t *testing.T) {
	// A, B and C together cover the length of the band 2–8 ft, yet a path
	// of solid wall winds up between them (the layout of study's
	// TestCompareFEWhereClassicFails).
	w := wallFt(10, 10, [5]any{"A", 0.0, 2.0, 6.0, 2.0}, [5]any{"B", 4.0, 6.0, 6.0, 2.0}, [5]any{"C", 7.0, 4.0, 1.0, 2.0})
	c := Solve(w, geometry.BasisClassic, Options{})
	var st *pier.StaggeredError
	if !errors.As(c.Err(), &st) {
		t.Fatalf("classic basis: %v, want a staggered band", c.Err())
	}
	if c.Rigidity() != 0 || c.Piers() != nil {
		t.Error("numbers without an answer")
	}
	f := Solve(w, geometry.BasisFE, Options{})
	if f.Err() != nil {
		t.Fatalf("fe basis: %v", f.Err())
	}
	if !(f.Rigidity() > 0) || f.Piers() != nil {
		t.Errorf("fe basis: rigidity %g, %d piers", f.Rigidity(), len(f.Piers()))
	}
	if _, ok := f.Check(); ok {
		t.Error("a check with no classic answer")
	}
	if v := f.View(); v == nil || v.Rigidity != f.FE.Rigidity || len(v.Piers) != 0 || v.Drift != f.FE.Drift {
		t.Errorf("view without a classic decomposition: %+v", v)
	}
}

// A model that cannot be built: the fe basis says so, the classic answers.
func TestFEBasisRefused(t *testing.T) {
	w := typical()
	r := Solve(w, geometry.BasisFE, Options{FE: feOptions(0.01 * geometry.Inch)})
	if r.Err() == nil {
		t.Fatal("a 0.01 in mesh on a 30 ft wall was solved")
	}
	var na *NoAnswerError
	if !errors.As(r.Err(), &na) || na.Basis != geometry.BasisFE || r.Classic == nil {
		t.Errorf("err %v, classic %v", r.Err(), r.Classic != nil)
	}
}

func feOptions(mesh geometry.Length) fe.Options { return fe.Options{Mesh: mesh} }

// View gives the model's numbers in a classic result's shape and leaves
// the classic result alone.
func TestView(t *testing.T) {
	w := typical()
	r := Solve(w, geometry.BasisFE, Options{})
	before := r.Classic.Piers[1].Share
	v := r.View()
	if v == r.Classic || v.Rigidity != r.FE.Rigidity || v.DeflectionAbs != r.FE.DeflectionAbs || len(v.Steps) != 0 {
		t.Fatal("view is not the model's")
	}
	for i, p := range r.Piers() {
		if v.Piers[i].Name != p.Name || v.Piers[i].Share != p.Share || v.Piers[i].Loads != p.Loads {
			t.Errorf("view pier %s differs", p.Name)
		}
	}
	if r.Classic.Piers[1].Share != before {
		t.Error("View changed the classic result")
	}
	if c := Solve(w, geometry.BasisClassic, Options{}); c.View() != c.Classic {
		t.Error("the classic view is not the classic result")
	}
}
