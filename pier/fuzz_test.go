package pier

import (
	"errors"
	"math"
	"testing"

	"pierwise/geometry"
)

// wallFromBytes builds a wall from fuzz bytes: support, length and height,
// then four bytes per opening on a quarter-foot grid. When bit 1 of the
// first byte is set, openings that do not fit are dropped (valid walls);
// otherwise they are taken as given and may overlap or stick out, which
// Solve must report.
func wallFromBytes(data []byte) *geometry.Wall {
	const q = geometry.Foot / 4
	next := func() int {
		if len(data) == 0 {
			return 0
		}
		b := int(data[0])
		data = data[1:]
		return b
	}
	flags := next()
	w := &geometry.Wall{
		Support:   geometry.Support(flags % 2),
		Length:    geometry.Length(next()) * q,
		Height:    geometry.Length(next()) * q,
		Thickness: 8 * geometry.Inch,
		Layouts:   []geometry.Layout{{Name: "main"}},
	}
	for len(data) >= 4 && len(w.Layouts[0].Openings) < 60 {
		o := geometry.Opening{
			X: geometry.Length(next()) * q, Sill: geometry.Length(next()) * q,
			Width: geometry.Length(next()) * q, Height: geometry.Length(next()) * q,
		}
		if flags&2 != 0 && (o.Width <= 0 || o.Height <= 0 || !fits(w, o)) {
			continue
		}
		w.Layouts[0].Openings = append(w.Layouts[0].Openings, o)
	}
	return w
}

func FuzzSolve(f *testing.F) {
	f.Add([]byte{0, 72, 64, 16, 0, 16, 32, 48, 8, 16, 16})             // the Masonry Chronicles wall
	f.Add([]byte{1, 80, 40, 32, 0, 16, 40})                            // full-height door
	f.Add([]byte{0, 40, 40, 0, 8, 20, 8, 24, 14, 16, 8, 20, 20, 4, 8}) // staggered
	f.Add([]byte{2, 100, 60, 8, 12, 16, 16, 24, 12, 16, 16, 40, 12, 16, 16, 8, 36, 16, 16, 24, 36, 16, 16})
	f.Fuzz(func(t *testing.T, data []byte) {
		w := wallFromBytes(data)
		w.Load.Shear = 10 * geometry.Kip
		w.Material = geometry.Material{Kind: geometry.ConcreteMasonry, Strength: 2000 * geometry.PSI}
		w.Gravity = geometry.Gravity{Dead: 1 * klf, Live: 0.5 * klf, SelfWeight: 80 * psf}
		r, err := Solve(w)
		if err != nil {
			if r != nil {
				t.Fatalf("error %v with a result", err)
			}
			var ce *CutError
			if errors.As(err, &ce) && ce.Opening == "" {
				t.Fatalf("CutError names no opening: %v", err)
			}
			return
		}
		if !(r.Deflection > 0) || math.IsInf(r.Deflection, 0) || !(r.Rigidity > 0) || !(r.RigidityAbs > 0) {
			t.Fatalf("deflection %g, rigidity %g", r.Deflection, r.Rigidity)
		}
		if err := r.checkFinite(); err != nil {
			t.Fatal(err)
		}
		checkShares(t, r)
		var leafShear float64
		for _, p := range r.Piers {
			if !p.Cut && !(p.Rigidity > 0) {
				t.Fatalf("%s: rigidity %g", p.Name, p.Rigidity)
			}
			if p.L() <= 0 || p.H() <= 0 {
				t.Fatalf("%s: empty pier %+v", p.Name, p.Rect)
			}
			if p.Leaf {
				leafShear += float64(p.Shear)
			}
		}
		if len(r.Piers) == 0 || !(leafShear > 0) {
			t.Fatalf("leaves carry no shear")
		}
		checkEquilibrium(t, w, r)
	})
}
