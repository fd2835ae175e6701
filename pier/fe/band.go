package fe

import (
	"context"
	"math"
)

// band is a symmetric positive definite band matrix A of n equations with
// kd superdiagonals, stored as LAPACK's upper band in row-major order
// (gonum's blas64.SymmetricBand layout): row i holds A[i][i..i+kd] at
// ab[i*(kd+1):]. It is factored in place as A = UᵀU and then solves any
// number of right-hand sides.
//
// Preconditions (programmer errors, checked by panics where cheap):
//   - ab has at least n*(kd+1) values, all zero before assembly; the caller
//     supplies it (the workspace), and the band never allocates;
//   - entries are added with j ≥ i and j − i ≤ kd only;
//   - solve is called only after factor returned nil, and the caller keeps
//     ab unchanged in between.
//
// The factorisation is right-looking with rank-4 updates of the trailing
// window (which stays in cache). It is kept over gonum's LAPACK
// lapack64.Pbtrf/Pbtrs, the tests' reference, because it is faster here and
// can be cancelled: on the 160 × 80 mesh of a 20 ft × 10 ft wall (25,760
// equations, band 165), BenchmarkBandCholesky in two series of 6 and 8 runs
// on this project's shared 2-core machine gave medians of 176 and 224 ms
// against 220 and 272 ms for Pbtrf/Pbtrs: about 20 % faster (single runs
// scatter widely under the machine's load). (mat.BandCholesky is not used:
// it always estimates the condition number.)
type band struct {
	n, kd int
	ab    []float64
}

// newBand returns the n × n band matrix of kd superdiagonals held in work,
// which must have room for n*(kd+1) values and be zero.
func newBand(n, kd int, work []float64) band {
	if len(work) < n*(kd+1) {
		panic("fe: band workspace too small")
	}
	return band{n: n, kd: kd, ab: work[:n*(kd+1)]}
}

// add adds v to A[i][j], j ≥ i.
func (b *band) add(i, j int, v float64) { b.ab[i*(b.kd+1)+j-i] += v }

// cancelEvery is how many rows the factorisation runs between checks of
// its context: about a millisecond of work on the default mesh.
const cancelEvery = 256

// factor factors the matrix in place (A = UᵀU). It returns errSingular
// when A is not positive definite (a wall with no load path), or ctx.Err()
// when ctx is done first. The trailing update is done four rows of U at a
// time (a rank-4 update), which loads and stores each trailing entry once
// per four rows instead of once per row.
func (b *band) factor(ctx context.Context) error {
	ab, n, kd := b.ab, b.n, b.kd
	ld := kd + 1
	for k0 := 0; k0 < n; k0 += 4 {
		if k0%cancelEvery == 0 {
			if err := ctx.Err(); err != nil {
				return err
			}
		}
		nb := min(4, n-k0)
		// Factor the block's rows; each already holds every update from
		// the rows above the block.
		for p := 0; p < nb; p++ {
			k := k0 + p
			rk := ab[k*ld : k*ld+ld]
			d := rk[0]
			if !(d > 0) {
				return errSingular
			}
			d = math.Sqrt(d)
			rk[0] = d
			inv := 1 / d
			m := min(kd, n-1-k)
			for j := 1; j <= m; j++ {
				rk[j] *= inv
			}
			for q := p + 1; q < nb; q++ {
				s := q - p
				if s > m {
					break
				}
				if f := rk[s]; f != 0 {
					axpy(-f, rk[s:m+1], ab[(k+s)*ld:(k+s)*ld+m-s+1])
				}
			}
		}
		if nb < 4 {
			continue
		}
		// Rank-4 update of the rows below the block: for row i and column j,
		// A[i][j] -= Σp U[k0+p][i] U[k0+p][j], where row k0+p reaches column
		// k0+p+kd.
		r0 := ab[k0*ld : k0*ld+ld]
		r1 := ab[(k0+1)*ld : (k0+1)*ld+ld]
		r2 := ab[(k0+2)*ld : (k0+2)*ld+ld]
		r3 := ab[(k0+3)*ld : (k0+3)*ld+ld]
		last := min(n-1, k0+3+kd)
		for i := k0 + 4; i <= last; i++ {
			var f0, f1, f2, f3 float64
			if s := i - k0; s <= kd {
				f0 = r0[s]
			}
			if s := i - k0 - 1; s <= kd {
				f1 = r1[s]
			}
			if s := i - k0 - 2; s <= kd {
				f2 = r2[s]
			}
			f3 = r3[i-k0-3]
			ri := ab[i*ld : i*ld+ld]
			// Columns j = i … end, as offsets t = j − i into row i; row k0+p
			// holds column j at offset j − k0 − p.
			end := min(n-1, k0+3+kd) // last column any block row reaches
			width := end - i + 1
			// Part where all four rows reach: j ≤ k0 + kd.
			all := min(width, k0+kd-i+1)
			if all > 0 {
				x0 := r0[i-k0 : i-k0+all]
				x1 := r1[i-k0-1 : i-k0-1+all]
				x2 := r2[i-k0-2 : i-k0-2+all]
				x3 := r3[i-k0-3 : i-k0-3+all]
				y := ri[:all]
				for t := range y {
					y[t] -= f0*x0[t] + f1*x1[t] + f2*x2[t] + f3*x3[t]
				}
			}
			// Tails: columns reached by rows k0+1.., k0+2.., k0+3 only.
			for t := max(all, 0); t < width; t++ {
				j := i + t
				v := f3 * r3[j-k0-3]
				if j-k0-2 <= kd {
					v += f2 * r2[j-k0-2]
				}
				if j-k0-1 <= kd {
					v += f1 * r1[j-k0-1]
				}
				ri[t] -= v
			}
		}
	}
	return nil
}

// solve solves UᵀU x = rhs in place (len(rhs) == n).
func (b *band) solve(rhs []float64) {
	ab, n, kd := b.ab, b.n, b.kd
	ld := kd + 1
	rhs = rhs[:n]
	// Uᵀ y = b (forward): y_k = b_k / U_kk, then b_j -= U_kj y_k.
	for k := 0; k < n; k++ {
		rk := ab[k*ld:]
		rhs[k] /= rk[0]
		if m := min(kd, n-1-k); m > 0 {
			axpy(-rhs[k], rk[1:m+1], rhs[k+1:k+1+m])
		}
	}
	// U x = y (backward).
	for k := n - 1; k >= 0; k-- {
		rk := ab[k*ld:]
		m := min(kd, n-1-k)
		s := rhs[k]
		for j := 1; j <= m; j++ {
			s -= rk[j] * rhs[k+j]
		}
		rhs[k] = s / rk[0]
	}
}

// axpy computes y += a x (len(y) == len(x)), unrolled by four.
func axpy(a float64, x, y []float64) {
	y = y[:len(x)]
	i := 0
	for ; i+4 <= len(x); i += 4 {
		y[i] += a * x[i]
		y[i+1] += a * x[i+1]
		y[i+2] += a * x[i+2]
		y[i+3] += a * x[i+3]
	}
	for ; i < len(x); i++ {
		y[i] += a * x[i]
	}
}
