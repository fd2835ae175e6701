package fe

import (
	"context"
	"math"
	"math/rand/v2"
	"testing"

	"gonum.org/v1/gonum/blas"
	"gonum.org/v1/gonum/blas/blas64"
	"gonum.org/v1/gonum/lapack/lapack64"

	"pierwise/geometry"
)

// The reference factorisation: gonum's LAPACK Pbtrf/Pbtrs on the same
// storage (blocked, BLAS-3).
func choleskyLAPACK(ab []float64, n, kd int) bool {
	_, ok := lapack64.Pbtrf(blas64.SymmetricBand{Uplo: blas.Upper, N: n, K: kd, Data: ab, Stride: kd + 1})
	return ok
}

func solveLAPACK(ab []float64, n, kd int, b []float64) {
	t := blas64.TriangularBand{Uplo: blas.Upper, Diag: blas.NonUnit, N: n, K: kd, Data: ab, Stride: kd + 1}
	lapack64.Pbtrs(t, blas64.General{Rows: n, Cols: 1, Data: b, Stride: 1})
}

// ours factors and solves with the band type.
func ours(ab []float64, n, kd int, rhs []float64) bool {
	b := newBand(n, kd, ab)
	if b.factor(context.Background()) != nil {
		return false
	}
	b.solve(rhs)
	return true
}

// bandSystem assembles the 160 × 80 solid-wall system (20 ft × 10 ft, 1.5 in
// q4) and returns its band matrix and load.
func bandSystem(t testing.TB, lengthFt, heightFt, meshIn float64) (ab []float64, n, kd int, rhs []float64) {
	w := wallFt(lengthFt, heightFt, geometry.Cantilever)
	md, f, err := modelFor(w, nil, Options{Mesh: geometry.Length(meshIn) * geometry.Inch, Element: ElementQ4})
	if err != nil {
		t.Fatal(err)
	}
	n, kd = md.neq, md.bandwidth()
	ab = make([]float64, n*(kd+1))
	rhs = make([]float64, n)
	for dof, q := range md.eq {
		if q >= 0 {
			rhs[q] = f[dof]
		}
	}
	for e := range md.m.elems {
		k, g := md.elementK(e), md.dofs(e)
		for a := 0; a < 8; a++ {
			for b := 0; b < 8; b++ {
				qa, qb := md.eq[g[a]], md.eq[g[b]]
				if qa >= 0 && qb >= qa {
					ab[qa*(kd+1)+qb-qa] += k[a][b]
				}
			}
		}
	}
	return ab, n, kd, rhs
}

// TestBandCholesky: our band factorisation gives the same solution as
// LAPACK's (gonum Pbtrf/Pbtrs).
func TestBandCholesky(t *testing.T) {
	ab, n, kd, rhs := bandSystem(t, 20, 10, 6)
	ab1, rhs1 := append([]float64(nil), ab...), append([]float64(nil), rhs...)
	ab2, rhs2 := append([]float64(nil), ab...), append([]float64(nil), rhs...)
	if !choleskyLAPACK(ab1, n, kd) || !ours(ab2, n, kd, rhs2) {
		t.Fatal("not positive definite")
	}
	solveLAPACK(ab1, n, kd, rhs1)
	for i := range rhs1 {
		if math.Abs(rhs1[i]-rhs2[i]) > 1e-10*math.Abs(rhs1[i])+1e-14 {
			t.Fatalf("x[%d]: LAPACK %.15g, ours %.15g", i, rhs1[i], rhs2[i])
		}
	}
	// Not positive definite: both must say so.
	bad := []float64{1, 2, 0, 1} // [[1 2] [2 1]], kd = 1
	if ours(append([]float64(nil), bad...), 2, 1, make([]float64, 2)) ||
		choleskyLAPACK(append([]float64(nil), bad...), 2, 1) {
		t.Error("indefinite matrix factored")
	}
}

// TestBandCancel: a cancelled context stops the factorisation and says so.
func TestBandCancel(t *testing.T) {
	ab, n, kd, _ := bandSystem(t, 20, 10, 6)
	ctx, cancel := context.WithCancel(context.Background())
	cancel()
	b := newBand(n, kd, ab)
	if err := b.factor(ctx); err != context.Canceled {
		t.Errorf("factor on a cancelled context: %v, want context.Canceled", err)
	}
}

// BenchmarkBandCholesky compares the two factorisations (factor + solve) on
// the 160 × 80 mesh of the 20 ft × 10 ft wall (25,760 equations, band 165).
func BenchmarkBandCholesky(b *testing.B) {
	ab, n, kd, rhs := bandSystem(b, 20, 10, 1.5)
	work, x := make([]float64, len(ab)), make([]float64, len(rhs))
	for _, impl := range []struct {
		name  string
		solve func(ab []float64, n, kd int, rhs []float64) bool
	}{
		{"lapack-pbtrf", func(ab []float64, n, kd int, rhs []float64) bool {
			if !choleskyLAPACK(ab, n, kd) {
				return false
			}
			solveLAPACK(ab, n, kd, rhs)
			return true
		}},
		{"band-block4", ours},
	} {
		b.Run(impl.name, func(b *testing.B) {
			b.ReportAllocs()
			for b.Loop() {
				copy(work, ab)
				copy(x, rhs)
				if !impl.solve(work, n, kd, x) {
					b.Fatal("not positive definite")
				}
			}
		})
	}
}

// TestBandCholeskyRandom: random diagonally dominant band matrices of sizes
// that exercise partial blocks and bands narrower than a block.
func TestBandCholeskyRandom(t *testing.T) {
	rng := rand.New(rand.NewPCG(3, 4))
	for _, sz := range [][2]int{{1, 0}, {2, 1}, {7, 1}, {9, 2}, {13, 3}, {37, 5}, {50, 4}, {61, 17}} {
		n, kd := sz[0], sz[1]
		ld := kd + 1
		ab := make([]float64, n*ld)
		for i := 0; i < n; i++ {
			ab[i*ld] = float64(2*kd + 1)
			for s := 1; s <= kd && i+s < n; s++ {
				ab[i*ld+s] = rng.Float64()*2 - 1
			}
		}
		rhs := make([]float64, n)
		for i := range rhs {
			rhs[i] = rng.Float64()
		}
		want, x := append([]float64(nil), rhs...), append([]float64(nil), rhs...)
		a1, a2 := append([]float64(nil), ab...), append([]float64(nil), ab...)
		if !choleskyLAPACK(a1, n, kd) || !ours(a2, n, kd, x) {
			t.Fatalf("n=%d kd=%d: not positive definite", n, kd)
		}
		solveLAPACK(a1, n, kd, want)
		for i := range x {
			if math.Abs(x[i]-want[i]) > 1e-12 {
				t.Fatalf("n=%d kd=%d: x[%d] = %.15g, LAPACK %.15g", n, kd, i, x[i], want[i])
			}
		}
	}
}
