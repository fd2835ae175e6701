package pier

import (
	"errors"
	"math"
	"math/rand/v2"
	"strings"
	"testing"

	"pierwise/geometry"
)

// Invariants of the classic method (docs/method.md §2) over seeded random
// layouts on a 2 ft grid, so that openings often touch, line up and nest.

const walls = 3000 // random walls per property

// solved yields random walls that the method can solve; every failure
// must be one of its two documented errors.
func solved(t *testing.T, seed uint64, f func(w *geometry.Wall, r *Result)) {
	t.Helper()
	rng := rand.New(rand.NewPCG(seed, 0x9e3779b97f4a7c15))
	ok := 0
	for range walls {
		w := randomWall(rng, rng.IntN(10))
		r, err := Solve(w)
		if err != nil {
			var ce *CutError
			var se *StaggeredError
			if !errors.As(err, &ce) && !errors.As(err, &se) {
				t.Fatalf("valid wall %+v: unexpected error %v", w, err)
			}
			continue
		}
		ok++
		f(w, r)
		if t.Failed() {
			t.Fatalf("failed on wall %+v", w)
		}
	}
	if ok < walls/2 {
		t.Fatalf("only %d of %d random walls solved", ok, walls)
	}
}

// bandKey identifies the band a pier belongs to.
type bandKey struct {
	parent string
	y0, y1 float64
}

func checkShares(t *testing.T, r *Result) {
	t.Helper()
	share := map[string]float64{"": 1}
	bandSum := map[bandKey]float64{}
	shareSum := map[bandKey]float64{}
	for _, p := range r.Piers {
		share[p.Name] = p.Share
		if p.Share < 0 || p.Share > 1+1e-12 || p.BandShare < 0 || p.BandShare > 1+1e-12 {
			t.Errorf("%s: share %g, band share %g out of [0, 1]", p.Name, p.Share, p.BandShare)
		}
		k := bandKey{p.Parent, math.Round(p.Rect.Y0 * 1e6), math.Round(p.Rect.Y1 * 1e6)}
		bandSum[k] += p.BandShare
		shareSum[k] += p.Share
	}
	for k, s := range bandSum {
		if math.Abs(s-1) > 1e-9 {
			t.Errorf("band %+v: band shares add to %.12f, want 1", k, s)
		}
		if math.Abs(shareSum[k]-share[k.parent]) > 1e-9 {
			t.Errorf("band %+v: shares add to %g, want the parent's %g", k, shareSum[k], share[k.parent])
		}
	}
}

func TestPropertyBandSharesSumToOne(t *testing.T) {
	solved(t, 1, func(w *geometry.Wall, r *Result) {
		checkShares(t, r)
		if !near(r.Split.Total(), r.Deflection, 1e-9) || r.Split.Bending < -1e-12 || r.Split.Shear < -1e-12 {
			t.Errorf("split %+v vs deflection %g", r.Split, r.Deflection)
		}
		if !(r.Deflection > 0) || !near(r.Rigidity*r.Deflection, 1, 1e-12) {
			t.Errorf("deflection %g, rigidity %g", r.Deflection, r.Rigidity)
		}
	})
}

func mirror(w *geometry.Wall) *geometry.Wall {
	m := w.Clone()
	for i, o := range m.Layouts[0].Openings {
		m.Layouts[0].Openings[i].X = w.Length - o.X - o.Width
	}
	return m
}

func TestPropertyMirroredWallMirrorsShares(t *testing.T) {
	solved(t, 2, func(w *geometry.Wall, r *Result) {
		m, err := Solve(mirror(w))
		if err != nil {
			t.Fatalf("mirrored wall: %v", err)
		}
		if !near(m.Deflection, r.Deflection, 1e-9) || !near(m.Split.Bending, r.Split.Bending, 1e-9) {
			t.Errorf("deflection %g, mirrored %g", r.Deflection, m.Deflection)
		}
		if len(m.Piers) != len(r.Piers) {
			t.Fatalf("%d piers, mirrored %d", len(r.Piers), len(m.Piers))
		}
		L := float64(w.Length)
		for _, p := range r.Piers {
			depth := strings.Count(p.Name, ".")
			found := false
			for _, q := range m.Piers {
				if strings.Count(q.Name, ".") != depth || math.Abs(q.Rect.X0-(L-p.Rect.X1)) > 1e-9 ||
					math.Abs(q.Rect.X1-(L-p.Rect.X0)) > 1e-9 || math.Abs(q.Rect.Y0-p.Rect.Y0) > 1e-9 || math.Abs(q.Rect.Y1-p.Rect.Y1) > 1e-9 {
					continue
				}
				found = true
				if math.Abs(q.Share-p.Share) > 1e-9 || q.Support != p.Support || q.Leaf != p.Leaf {
					t.Errorf("%s share %g, its mirror %s %g", p.Name, p.Share, q.Name, q.Share)
				}
			}
			if !found {
				t.Errorf("pier %s has no mirror image", p.Name)
			}
		}
	})
}

func TestPropertyScalingLeavesRelativeValues(t *testing.T) {
	for _, k := range []geometry.Length{1 / geometry.Foot, 3.7, 0.01} {
		solved(t, 3, func(w *geometry.Wall, r *Result) {
			s := w.Clone()
			s.Length *= k
			s.Height *= k
			s.Thickness *= k
			for i := range s.Layouts[0].Openings {
				o := &s.Layouts[0].Openings[i]
				o.X, o.Sill, o.Width, o.Height = o.X*k, o.Sill*k, o.Width*k, o.Height*k
			}
			rs, err := Solve(s)
			if err != nil {
				t.Fatalf("scaled by %g: %v", k, err)
			}
			if !near(rs.Deflection, r.Deflection, 1e-9) || len(rs.Piers) != len(r.Piers) {
				t.Fatalf("scaled by %g: deflection %g, was %g", k, rs.Deflection, r.Deflection)
			}
			for i, p := range r.Piers {
				q := rs.Piers[i]
				if q.Name != p.Name || math.Abs(q.Share-p.Share) > 1e-9 || !near(q.Rigidity+1, p.Rigidity+1, 1e-9) {
					t.Errorf("scaled by %g: %s %g, was %s %g", k, q.Name, q.Share, p.Name, p.Share)
				}
			}
		})
	}
}

// TestPropertyAddingAnOpeningNeverStiffens checks that a wall never gets
// stiffer when an opening is added, except in the documented case of the
// classic rules (doc.go, TestKnownCaseNewOpeningMakesWallStiffer): a band
// where no opening spans the full height takes every opening as a cut,
// and a new opening can change which openings are cuts.
func TestPropertyAddingAnOpeningNeverStiffens(t *testing.T) {
	known, checked := 0, 0
	solved(t, 4, func(w *geometry.Wall, r *Result) {
		rng := rand.New(rand.NewPCG(uint64(len(r.Steps)), uint64(w.Length*1e6)))
		const cell = 2 * geometry.Foot
		o, ok := randomOpening(rng, w, int(math.Round(float64(w.Length/cell))), int(math.Round(float64(w.Height/cell))), cell)
		if !ok {
			return
		}
		more := w.Clone()
		more.Layouts[0].Openings = append(more.Layouts[0].Openings, o)
		r2, err := Solve(more)
		if err != nil {
			return // cut or staggered: no rigidity to compare
		}
		checked++
		if r2.Deflection >= r.Deflection*(1-1e-9) {
			return
		}
		if usesAllCuts(r) || usesAllCuts(r2) {
			known++
			return
		}
		t.Errorf("adding %+v made the wall stiffer: %g → %g", o, r.Deflection, r2.Deflection)
	})
	t.Logf("%d additions checked, %d stiffer ones of the documented kind", checked, known)
	if checked < walls/3 {
		t.Errorf("only %d additions checked", checked)
	}
}

func usesAllCuts(r *Result) bool {
	for _, s := range r.Steps {
		if s.AllCuts {
			return true
		}
	}
	return false
}

func TestPropertyNoNaNAnywhere(t *testing.T) {
	solved(t, 5, func(w *geometry.Wall, _ *Result) {
		// The same wall again with a material, a load and a drift limit.
		w.Material = geometry.Material{Kind: geometry.ClayMasonry, Strength: 2500 * geometry.PSI}
		w.Load.Shear = 25 * geometry.Kip
		w.Drift = geometry.Drift{Cd: 2, Limit: 0.007}
		r, err := Solve(w)
		if err != nil {
			t.Fatal(err)
		}
		if err := r.checkFinite(); err != nil || !(r.RigidityAbs > 0) || !(r.DeflectionAbs > 0) {
			t.Errorf("result not finite and positive: %v %+v", err, r)
		}
		for _, p := range r.Piers {
			if !p.Cut && !(p.Rigidity > 0 && p.Parts.Total() > 0) {
				t.Errorf("%s: rigidity %g, parts %+v", p.Name, p.Rigidity, p.Parts)
			}
		}
	})
}
