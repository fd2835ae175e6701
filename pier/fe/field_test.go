package fe

import (
	"math"
	"testing"

	"pierwise/geometry"
)

// TestFieldStatics: the element-centre stresses of a solid cantilever wall
// must carry the section forces that statics gives at any horizontal section
// away from the ends (Saint-Venant): ∫τxy dx = V (= 1), ∫σy dx = 0 and
// ∫σy (x − L/2) dx = −V·(h − y) (the load toward +x at the top puts the
// left end in tension), y at the centre line of the row of elements. Mid-point sums over a row of elements, 1 % (the
// element-centre values are exact for the linear part of the field).
func TestFieldStatics(t *testing.T) {
	w := wallFt(20, 10, geometry.Cantilever)
	f, err := StressField(w, nil, Options{Mesh: 6 * geometry.Inch})
	if err != nil {
		t.Fatal(err)
	}
	L, h := float64(w.Length), float64(w.Height)
	for _, yf := range []float64{0.3, 0.5, 0.7} {
		y := yf * h
		var v, n, m, yc float64
		for _, c := range f.Cells {
			if c.Rect.Y0 <= y && y < c.Rect.Y1 {
				yc = (c.Rect.Y0 + c.Rect.Y1) / 2
				dx := c.Rect.W()
				xc := (c.Rect.X0 + c.Rect.X1) / 2
				v += c.Center.XY * dx
				n += c.Center.Y * dx
				m += c.Center.Y * (xc - L/2) * dx
			}
		}
		if math.Abs(v-1) > 0.01 {
			t.Errorf("y = %.2f h: ∫τ dx = %.4f, want 1", yf, v)
		}
		if math.Abs(n) > 0.01 {
			t.Errorf("y = %.2f h: ∫σy dx = %.4f, want 0", yf, n)
		}
		want := -(h - yc) // the row's centre line
		if math.Abs(m/want-1) > 0.01 {
			t.Errorf("y = %.2f h: ∫σy x dx = %.4f, want %.4f", yf, m, want)
		}
	}
}

// TestFieldAt: At is the bilinear interpolation of the nodal averages, so it
// is continuous across element edges, finite everywhere on the solid wall,
// and refuses points inside an opening or off the wall.
func TestFieldAt(t *testing.T) {
	w := wallFt(18, 16, geometry.Cantilever,
		geometry.Opening{Name: "D1", X: 4 * ft, Width: 4 * ft, Height: 8 * ft},
		geometry.Opening{Name: "W1", X: 12 * ft, Sill: 2 * ft, Width: 4 * ft, Height: 4 * ft})
	f, err := StressField(w, nil, Options{})
	if err != nil {
		t.Fatal(err)
	}
	if len(f.Cells) == 0 {
		t.Fatal("no cells")
	}
	F := float64(ft)
	if _, ok := f.At(6*F, 4*F); ok {
		t.Error("At inside D1 should be refused")
	}
	if _, ok := f.At(19*F, 4*F); ok {
		t.Error("At off the wall should be refused")
	}
	xs, ys := f.Lines()
	for i := 1; i+1 < len(xs); i += 7 {
		for j := 1; j+1 < len(ys); j += 5 {
			a, okA := f.At(xs[i]-1e-9, ys[j]+1e-4)
			b, okB := f.At(xs[i]+1e-9, ys[j]+1e-4)
			if !okA || !okB {
				continue
			}
			for _, d := range []float64{a.X - b.X, a.Y - b.Y, a.XY - b.XY} {
				if math.Abs(d) > 1e-6*(1+math.Abs(a.XY)) || math.IsNaN(d) {
					t.Fatalf("At jumps across x = %.4f: %+v vs %+v", xs[i], a, b)
				}
			}
		}
	}
}
