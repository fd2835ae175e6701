package fe

import (
	"errors"
	"math"
)

// model is a meshed wall with its material, element and supports.
type model struct {
	m    *mesh
	kind string
	d    elasticity

	eq  []int // DOF 2n+c → equation number, or −1 when the DOF is prescribed
	neq int

	colClass, rowClass []int // size class of each grid column and row
	ncol               int
	kcache             []*[8][8]float64
}

func newModel(m *mesh, kind string, d elasticity) *model {
	md := &model{m: m, kind: kind, d: d}
	md.eq = make([]int, 2*len(m.nodeAt))
	return md
}

// fix marks the DOFs for which fixed(node, component) is true as prescribed
// and numbers the others in node order (which keeps the mesh's band order).
func (md *model) fix(fixed func(n, c int) bool) {
	md.neq = 0
	for dof := range md.eq {
		if fixed(dof/2, dof%2) {
			md.eq[dof] = -1
		} else {
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

// bandwidth returns the largest distance between two equations of one element.
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

// The band factorisation Solve uses (see band.go).
var (
	factor    bandFactor  = choleskyBlock4
	bandSolve bandSolveFn = solveAxpy
)

var errSingular = errors.New("the model has no load path from its base to its top (its stiffness matrix is singular)")

// solve returns the nodal displacements (2 per node) under the nodal forces
// f (2 per node), with the prescribed DOFs held at the values of u0 (nil =
// all zero).
func (md *model) solve(f, u0 []float64) ([]float64, error) {
	n, kd := md.neq, md.bandwidth()
	ld := kd + 1
	ab, release := allocBand(n * ld)
	defer release()
	rhs := make([]float64, n)
	for dof, q := range md.eq {
		if q >= 0 {
			rhs[q] = f[dof]
		}
	}
	for e := range md.m.elems {
		k := md.elementK(e)
		g := md.dofs(e)
		for a := 0; a < 8; a++ {
			qa := md.eq[g[a]]
			if qa < 0 {
				continue
			}
			for b := 0; b < 8; b++ {
				qb := md.eq[g[b]]
				switch {
				case qb < 0:
					if u0 != nil {
						rhs[qa] -= k[a][b] * u0[g[b]]
					}
				case qb >= qa:
					ab[qa*ld+qb-qa] += k[a][b]
				}
			}
		}
	}
	if n > 0 {
		if !factor(ab, n, kd) {
			return nil, errSingular
		}
		bandSolve(ab, n, kd, rhs)
	}
	u := make([]float64, len(md.eq))
	for dof, q := range md.eq {
		switch {
		case q >= 0:
			u[dof] = rhs[q]
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

// elementForces returns K_e u_e: the forces the nodes of element e exert on it.
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
