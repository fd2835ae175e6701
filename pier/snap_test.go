package pier

import (
	"math"
	"strings"
	"testing"

	"pierwise/geometry"
)

func snapWall(ops ...geometry.Opening) *geometry.Wall {
	return &geometry.Wall{Length: 20 * geometry.Foot, Height: 10 * geometry.Foot, Thickness: 8 * geometry.Inch,
		Layouts: []geometry.Layout{{Name: "main", Openings: ops}}}
}

// Two doors 3 µm apart (an entry slip) are taken as touching: the warning
// names both, the wall passed in is not changed, and the gap is gone.
func TestSnapEdgesMergesNearEdges(t *testing.T) {
	ft := geometry.Foot
	w := snapWall(
		geometry.Opening{Name: "D1", X: 4 * ft, Width: 3 * ft, Height: 7 * ft},
		geometry.Opening{Name: "D2", X: 7*ft + 3e-6, Width: 3 * ft, Height: 7 * ft},
	)
	got, warns := SnapEdges(w)
	if len(warns) != 1 || !strings.Contains(warns[0].Text, "D1") || !strings.Contains(warns[0].Text, "D2") || warns[0].Subject != "D1, D2" || warns[0].Kind != WarnMergedEdges {
		t.Fatalf("warnings %q, want one naming D1 and D2", warns)
	}
	a, b := got.Openings()[0].Rect(), got.Openings()[1].Rect()
	if a.X1 != b.X0 {
		t.Errorf("D1 ends at %.9g m, D2 starts at %.9g m: want one line", a.X1, b.X0)
	}
	// D2 keeps its right edge: only the near edge moves.
	if math.Abs(b.X1-float64(10*ft+3e-6)) > 1e-12 {
		t.Errorf("D2's right edge moved to %.9g m", b.X1)
	}
	if w.Openings()[1].X != 7*ft+3e-6 {
		t.Error("SnapEdges changed the wall passed in")
	}
}

// An edge a hair from the wall's end or top goes onto it; edges further
// apart than the tolerance stay; an opening narrower than the tolerance is
// not collapsed.
func TestSnapEdgesCases(t *testing.T) {
	ft, in := geometry.Foot, geometry.Inch
	cases := []struct {
		name  string
		ops   []geometry.Opening
		warns int
		check func(r []geometry.Rect) bool
	}{
		{"near the right end", []geometry.Opening{{Name: "W1", X: 16 * ft, Sill: 3 * ft, Width: 4*ft - in/64, Height: 4 * ft}}, 1,
			func(r []geometry.Rect) bool { return r[0].X1 == float64(20*ft) }},
		{"near the top", []geometry.Opening{{Name: "W1", X: 6 * ft, Sill: 3 * ft, Width: 4 * ft, Height: 7*ft - in/100}}, 1,
			func(r []geometry.Rect) bool { return r[0].Y1 == float64(10*ft) }},
		{"heads a hair apart", []geometry.Opening{
			{Name: "W1", X: 2 * ft, Sill: 3 * ft, Width: 4 * ft, Height: 4 * ft},
			{Name: "W2", X: 10 * ft, Sill: 3 * ft, Width: 4 * ft, Height: 4*ft + in/50}}, 1,
			func(r []geometry.Rect) bool { return r[0].Y1 == r[1].Y1 }},
		{"apart by 1/16 in", []geometry.Opening{
			{Name: "D1", X: 4 * ft, Width: 3 * ft, Height: 7 * ft},
			{Name: "D2", X: 7*ft + in/16, Width: 3 * ft, Height: 7 * ft}}, 0, nil},
		{"apart by rounding only", []geometry.Opening{
			{Name: "D1", X: 4 * ft, Width: 3 * ft, Height: 7 * ft},
			{Name: "D2", X: 7 * ft * (1 + 1e-15), Width: 3 * ft, Height: 7 * ft}}, 0, nil},
		{"narrower than the tolerance", []geometry.Opening{{Name: "S1", X: 6 * ft, Sill: 3 * ft, Width: in / 64, Height: 2 * ft}}, 0, nil},
	}
	for _, c := range cases {
		w := snapWall(c.ops...)
		got, warns := SnapEdges(w)
		if len(warns) != c.warns {
			t.Errorf("%s: %d warnings %q, want %d", c.name, len(warns), warns, c.warns)
			continue
		}
		if c.warns == 0 {
			if got != w {
				t.Errorf("%s: nothing to merge, but a copy came back", c.name)
			}
			continue
		}
		var rs []geometry.Rect
		for _, o := range got.Openings() {
			rs = append(rs, o.Rect())
		}
		if !c.check(rs) {
			t.Errorf("%s: openings %+v", c.name, rs)
		}
	}
}

// The 3 µm gap between two doors: Solve merges the edges (SnapEdges),
// solves the wall as one wide door and says so; the finite-element model used to find
// no load path through the 3 µm pier between them.
func TestSnapEdgesClassicSolves(t *testing.T) {
	ft := geometry.Foot
	res, err := Solve(snapWall(
		geometry.Opening{Name: "D1", X: 4 * ft, Width: 3 * ft, Height: 7 * ft},
		geometry.Opening{Name: "D2", X: 7*ft + 3e-6, Width: 3 * ft, Height: 7 * ft},
	))
	if err != nil {
		t.Fatal(err)
	}
	if len(res.Warnings) == 0 || res.Warnings[0].Kind != WarnMergedEdges {
		t.Errorf("warnings %+v, want the merge first", res.Warnings)
	}
	for _, p := range res.Piers {
		if p.L() < float64(SnapTolerance) {
			t.Errorf("pier %s is %.3g m long: the sliver survived", p.Name, p.L())
		}
	}
}

// DefaultSelfWeight: unit weight × thickness; 8 in nominal (7.625 in)
// concrete masonry at 130 lb/ft³ is 82.6 lb/ft² (NCMA TEK 14-13B's solidly
// grouted 8 in walls are about 78–87 lb/ft², from memory); normal-weight
// concrete at 150 lb/ft³, 8 in thick, is 100 lb/ft² (common practice).
func TestDefaultSelfWeight(t *testing.T) {
	psf := float64(geometry.Pound) / float64(geometry.Foot*geometry.Foot)
	w := snapWall()
	w.Thickness = 7.625 * geometry.Inch
	if got := float64(DefaultSelfWeight(w).Weight) / psf; math.Abs(got-130*7.625/12) > 1e-9 {
		t.Errorf("CMU 7.625 in: %.4f psf, want %.4f", got, 130*7.625/12)
	}
	w.Material.Kind, w.Thickness = geometry.Concrete, 8*geometry.Inch
	if got := float64(DefaultSelfWeight(w).Weight) / psf; math.Abs(got-100) > 1e-9 {
		t.Errorf("concrete 8 in: %.4f psf, want 100", got)
	}
	w.Material.Kind = geometry.Custom
	if sw := DefaultSelfWeight(w); sw.Weight != 0 || sw.Source == "" {
		t.Errorf("custom material: %+v, want none with a reason", sw)
	}
	w.Material.Kind, w.Thickness = geometry.ClayMasonry, 0
	if sw := DefaultSelfWeight(w); sw.Weight != 0 || sw.Source == "" {
		t.Errorf("no thickness: %+v, want none with a reason", sw)
	}
	w.Thickness = 8 * geometry.Inch
	w.Gravity = geometry.Gravity{NoSelf: true}
	if sw, err := SelfWeightOf(w); err != nil || sw.Weight != 0 {
		t.Errorf("self_weight = 0: %+v, %v", sw, err)
	}
	w.Gravity = geometry.Gravity{SelfWeight: 1234}
	if sw, err := SelfWeightOf(w); err != nil || sw.Weight != 1234 {
		t.Errorf("given: %+v, %v", sw, err)
	}
	for _, bad := range []float64{-1, math.NaN(), math.Inf(1)} {
		w.Gravity = geometry.Gravity{SelfWeight: geometry.Stress(bad)}
		if _, err := SelfWeightOf(w); err == nil {
			t.Errorf("self weight %g accepted", bad)
		}
	}
}
