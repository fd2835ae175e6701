package fe

import (
	"context"
	"errors"
	"math"
)

// model is a meshed wall with its material, element and constraints.
//
// Each DOF (2n for node n's x, 2n+1 for its y) is either free, with its own
// equation in the band matrix; prescribed (held at a given value, usually
// zero); or tied: every DOF of a tie group moves as one unknown (the top
// collector ties the top nodes' x, a fixed top ties their y). The tied
// unknowns are kept out of the band, which they would otherwise widen to
// the whole matrix, and solved by a small Schur complement (system).
type model struct {
	m    *mesh
	kind string
	d    elasticity

	eq   []int // DOF → equation ≥ 0, prescribed (−1), or tied to group g (−2 − g)
	neq  int   // equations in the band
	ntie int   // tie groups

	colClass, rowClass []int // size class of each grid column and row
	ncol               int
	kcache             []*[8][8]float64
}

const prescribed = -1

// tied returns the tie group of an equation entry, or −1.
func tied(q int) int {
	if q <= -2 {
		return -2 - q
	}
	return -1
}

func newModel(m *mesh, kind string, d elasticity) *model {
	md := &model{m: m, kind: kind, d: d}
	md.eq = make([]int, 2*len(m.nodeAt))
	return md
}

// fix marks the DOFs for which fixed(node, component) is true as prescribed
// and numbers the others in node order (which keeps the mesh's band order).
func (md *model) fix(fixed func(n, c int) bool) { md.constrain(fixed, nil) }

// constrain is fix with tie groups: tie(n, c) returns the group (0, 1, …)
// the DOF moves with, or −1 for a free DOF. Groups must be numbered from 0
// without gaps.
func (md *model) constrain(fixed func(n, c int) bool, tie func(n, c int) int) {
	md.neq, md.ntie = 0, 0
	for dof := range md.eq {
		n, c := dof/2, dof%2
		switch g := -1; {
		case fixed(n, c):
			md.eq[dof] = prescribed
		case tie != nil && func() bool { g = tie(n, c); return g >= 0 }():
			md.eq[dof] = -2 - g
			md.ntie = max(md.ntie, g+1)
		default:
			md.eq[dof] = md.neq
			md.neq++
		}
	}
}

// elementK returns the stiffness of element e. Elements of equal size
// share one matrix: sizes are classed per grid column and row once.
func (md *model) elementK(e int) *[8][8]float64 {
	if md.colClass == nil {
		md.colClass, md.ncol = sizeClasses(md.m.xs)
		md.rowClass, _ = sizeClasses(md.m.ys)
		md.kcache = make([]*[8][8]float64, md.ncol*(maxInt(md.rowClass)+1))
	}
	c := md.m.cellOf[e]
	key := md.rowClass[c[1]]*md.ncol + md.colClass[c[0]]
	if k := md.kcache[key]; k != nil {
		return k
	}
	w := md.m.xs[c[0]+1] - md.m.xs[c[0]]
	h := md.m.ys[c[1]+1] - md.m.ys[c[1]]
	k := stiffness(md.kind, w, h, &md.d)
	md.kcache[key] = &k
	return &k
}

// sizeClasses numbers the distinct interval lengths of lines (equal within
// 1e-12 relative: equal subdivisions differ only by rounding). It returns
// each interval's class and the number of classes.
func sizeClasses(lines []float64) ([]int, int) {
	class := make([]int, len(lines)-1)
	var sizes []float64
	for i := range class {
		d := lines[i+1] - lines[i]
		class[i] = -1
		for k, s := range sizes {
			if math.Abs(d-s) <= 1e-12*s {
				class[i] = k
				break
			}
		}
		if class[i] < 0 {
			class[i] = len(sizes)
			sizes = append(sizes, d)
		}
	}
	return class, len(sizes)
}

func maxInt(v []int) int {
	m := 0
	for _, x := range v {
		m = max(m, x)
	}
	return m
}

// dofs returns the 8 global DOFs of element e.
func (md *model) dofs(e int) [8]int {
	var g [8]int
	for a, n := range md.m.elems[e] {
		g[2*a], g[2*a+1] = 2*n, 2*n+1
	}
	return g
}

// bandwidth returns the largest distance between two band equations of one
// element.
func (md *model) bandwidth() int {
	kd := 0
	for e := range md.m.elems {
		lo, hi := math.MaxInt, -1
		for _, g := range md.dofs(e) {
			if q := md.eq[g]; q >= 0 {
				lo, hi = min(lo, q), max(hi, q)
			}
		}
		if hi >= 0 {
			kd = max(kd, hi-lo)
		}
	}
	return kd
}

var errSingular = errors.New("the model has no load path from its base to its top (its stiffness matrix is singular)")

// assembleEvery is how many elements the assembly adds between checks of
// its context.
const assembleEvery = 1024

// system is a factored model: the band of free equations factored, and for
// the tie groups their coupling columns C (K between free equations and a
// group), Z = K⁻¹C and the inverse of the Schur complement
// S = K_tt − CᵀZ. It solves any number of load cases.
type system struct {
	md      *model
	k       band
	release func()
	c, z    [][]float64 // per tie group, neq values
	sinv    [][]float64 // ntie × ntie
}

// factor assembles and factors the model's stiffness. It checks ctx every
// assembleEvery elements and every cancelEvery rows of the factorisation.
// The caller must close the system.
func (md *model) factor(ctx context.Context) (*system, error) {
	n, kd := md.neq, md.bandwidth()
	work, release := allocBand(n * (kd + 1))
	s := &system{md: md, k: newBand(n, kd, work), release: release}
	s.c = make([][]float64, md.ntie)
	ktt := make([][]float64, md.ntie)
	for g := range s.c {
		s.c[g] = make([]float64, n)
		ktt[g] = make([]float64, md.ntie)
	}
	for e := range md.m.elems {
		if e%assembleEvery == 0 {
			if err := ctx.Err(); err != nil {
				s.close()
				return nil, err
			}
		}
		k := md.elementK(e)
		g := md.dofs(e)
		for a := 0; a < 8; a++ {
			qa := md.eq[g[a]]
			if qa == prescribed {
				continue
			}
			for b := 0; b < 8; b++ {
				qb := md.eq[g[b]]
				switch {
				case qb == prescribed:
				case qa >= 0 && qb >= qa:
					s.k.add(qa, qb, k[a][b])
				case qa >= 0 && qb <= -2:
					s.c[tied(qb)][qa] += k[a][b]
				case qa <= -2 && qb <= -2:
					ktt[tied(qa)][tied(qb)] += k[a][b]
				}
			}
		}
	}
	if n > 0 {
		if err := s.k.factor(ctx); err != nil {
			s.close()
			return nil, err
		}
	}
	if md.ntie == 0 {
		return s, nil
	}
	s.z = make([][]float64, md.ntie)
	for g := range s.z {
		s.z[g] = append([]float64(nil), s.c[g]...)
		if n > 0 {
			s.k.solve(s.z[g])
		}
	}
	for a := range ktt {
		for b := range ktt {
			ktt[a][b] -= dot(s.c[a], s.z[b])
		}
	}
	inv, ok := invertSPD(ktt)
	if !ok {
		s.close()
		return nil, errSingular
	}
	s.sinv = inv
	return s, nil
}

// close releases the band's memory; the system cannot solve after it.
func (s *system) close() {
	if s.release != nil {
		s.release()
		s.release = nil
	}
}

// solve returns the nodal displacements (2 per node) under the nodal forces
// f (2 per node), with the prescribed DOFs held at the values of u0 (nil =
// all zero).
func (s *system) solve(f, u0 []float64) ([]float64, error) {
	md := s.md
	rhs := make([]float64, md.neq)
	ft := make([]float64, md.ntie)
	for dof, q := range md.eq {
		switch {
		case q >= 0:
			rhs[q] += f[dof]
		case q <= -2:
			ft[tied(q)] += f[dof]
		}
	}
	if u0 != nil {
		// Move the prescribed displacements' forces to the right-hand side.
		for e := range md.m.elems {
			k, g := md.elementK(e), md.dofs(e)
			for b := 0; b < 8; b++ {
				if md.eq[g[b]] != prescribed || u0[g[b]] == 0 {
					continue
				}
				for a := 0; a < 8; a++ {
					switch qa := md.eq[g[a]]; {
					case qa >= 0:
						rhs[qa] -= k[a][b] * u0[g[b]]
					case qa <= -2:
						ft[tied(qa)] -= k[a][b] * u0[g[b]]
					}
				}
			}
		}
	}
	if md.neq > 0 {
		s.k.solve(rhs)
	}
	// Tied unknowns: S ut = ft − Cᵀx, then x −= Z ut.
	ut := make([]float64, md.ntie)
	if md.ntie > 0 {
		r := make([]float64, md.ntie)
		for g := range r {
			r[g] = ft[g] - dot(s.c[g], rhs)
		}
		for a := range ut {
			for b := range r {
				ut[a] += s.sinv[a][b] * r[b]
			}
		}
		for g := range ut {
			axpy(-ut[g], s.z[g], rhs)
		}
	}
	u := make([]float64, len(md.eq))
	for dof, q := range md.eq {
		switch {
		case q >= 0:
			u[dof] = rhs[q]
		case q <= -2:
			u[dof] = ut[tied(q)]
		case u0 != nil:
			u[dof] = u0[dof]
		}
	}
	for _, v := range u {
		if math.IsNaN(v) || math.IsInf(v, 0) {
			return nil, errSingular
		}
	}
	return u, nil
}

// solve factors the model and solves one load case (see system.solve).
func (md *model) solve(f, u0 []float64) ([]float64, error) {
	s, err := md.factor(context.Background())
	if err != nil {
		return nil, err
	}
	defer s.close()
	return s.solve(f, u0)
}

// elementForces returns K_e u_e: the forces the nodes of element e exert on
// it, less any load applied to the element itself.
func (md *model) elementForces(e int, u []float64) [8]float64 {
	k := md.elementK(e)
	g := md.dofs(e)
	var f [8]float64
	for a := 0; a < 8; a++ {
		s := 0.0
		for b := 0; b < 8; b++ {
			s += k[a][b] * u[g[b]]
		}
		f[a] = s
	}
	return f
}

func dot(x, y []float64) float64 {
	s := 0.0
	for i := range x {
		s += x[i] * y[i]
	}
	return s
}

// invertSPD inverts a small symmetric positive definite matrix by
// Gauss–Jordan elimination without pivoting; false when it is not positive
// definite.
func invertSPD(a [][]float64) ([][]float64, bool) {
	n := len(a)
	m := make([][]float64, n)
	inv := make([][]float64, n)
	for i := range a {
		m[i] = append([]float64(nil), a[i]...)
		inv[i] = make([]float64, n)
		inv[i][i] = 1
	}
	for c := 0; c < n; c++ {
		p := m[c][c]
		if !(p > 0) || math.IsInf(p, 0) {
			return nil, false
		}
		for j := 0; j < n; j++ {
			m[c][j] /= p
			inv[c][j] /= p
		}
		for r := 0; r < n; r++ {
			if r == c || m[r][c] == 0 {
				continue
			}
			f := m[r][c]
			for j := 0; j < n; j++ {
				m[r][j] -= f * m[c][j]
				inv[r][j] -= f * inv[c][j]
			}
		}
	}
	return inv, true
}
