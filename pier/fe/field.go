package fe

import (
	"context"
	"math"
	"sort"

	"pierwise/geometry"
	"pierwise/pier"
)

// Stress is the plane stress at a point: σx, σy and τxy in pascals per
// newton of wall shear and per metre of thickness (the model is solved with
// V = 1 and t = 1), so a wall's stress is Stress·V/t. Tension is positive;
// τxy is positive where it acts along +x on a face whose outward normal is
// +y, so under the wall's shear (toward +x at the top) the shear that carries
// the load is positive (docs/method.md §10).
type Stress struct {
	X, Y, XY float64
}

// FieldCell is one element of the model: its rectangle (metres) and the
// stress at its centre. At the centre the incompatible modes of qm6 add no
// strain (their derivatives vanish there), so the centre stress is D·B(0,0)·u
// for both elements.
type FieldCell struct {
	Rect   geometry.Rect
	Center Stress
}

// Field is the stress field of a solved model: one value per element and
// nodal averages (the mean of the centre values of the elements around each
// node), which At interpolates bilinearly inside each element for a smooth
// picture. Where an opening corner makes the stress singular the averages
// stay finite but grow as the mesh is refined.
type Field struct {
	Cells []FieldCell
	Elem  string          // element used
	Mesh  geometry.Length // maximum element size used

	xs, ys []float64
	cell   []int    // grid cell (i, j) at j*nx+i → index into Cells, or −1
	nodal  []Stress // grid point (i, j) at j*(nx+1)+i
}

// StressField solves the model of w as Solve does and returns its stress
// field under V = 1, t = 1.
func StressField(w *geometry.Wall, classic *pier.Result, opt Options) (*Field, error) {
	w, _ = pier.SnapEdges(w) // the wall Solve models
	set, err := prepare(w, classic, opt)
	if err != nil {
		return nil, err
	}
	sol, err := solveWall(context.Background(), w, set)
	if err != nil {
		return nil, err
	}
	m, d := sol.md.m, set.d
	f := &Field{Elem: set.kind, Mesh: geometry.Length(set.size), xs: m.xs, ys: m.ys}
	f.cell = make([]int, m.nx*m.ny)
	for i := range f.cell {
		f.cell[i] = -1
	}
	f.nodal = make([]Stress, (m.nx+1)*(m.ny+1))
	count := make([]float64, len(f.nodal))
	for e, c := range m.cellOf {
		x0, x1 := m.xs[c[0]], m.xs[c[0]+1]
		y0, y1 := m.ys[c[1]], m.ys[c[1]+1]
		s := centreStress(&d, x1-x0, y1-y0, sol.md.dofs(e), sol.lateral.u)
		f.cell[c[1]*m.nx+c[0]] = len(f.Cells)
		f.Cells = append(f.Cells, FieldCell{Rect: geometry.Rect{X0: x0, Y0: y0, X1: x1, Y1: y1}, Center: s})
		for _, g := range [4][2]int{{0, 0}, {1, 0}, {1, 1}, {0, 1}} {
			k := (c[1]+g[1])*(m.nx+1) + c[0] + g[0]
			f.nodal[k].X += s.X
			f.nodal[k].Y += s.Y
			f.nodal[k].XY += s.XY
			count[k]++
		}
	}
	for k, n := range count {
		if n > 0 {
			f.nodal[k] = Stress{f.nodal[k].X / n, f.nodal[k].Y / n, f.nodal[k].XY / n}
		}
	}
	return f, nil
}

// centreStress returns D·B(0,0)·u_e for a w × h rectangle with global DOFs g.
func centreStress(d *elasticity, w, h float64, g [8]int, u []float64) Stress {
	var eps [3]float64
	for n, c := range corner {
		dx := c[0] / 4 * 2 / w // ∂N/∂x at ξ = η = 0
		dy := c[1] / 4 * 2 / h
		ux, uy := u[g[2*n]], u[g[2*n+1]]
		eps[0] += dx * ux
		eps[1] += dy * uy
		eps[2] += dy*ux + dx*uy
	}
	var s [3]float64
	for r := 0; r < 3; r++ {
		s[r] = d[r][0]*eps[0] + d[r][1]*eps[1] + d[r][2]*eps[2]
	}
	return Stress{s[0], s[1], s[2]}
}

// At returns the stress at (x, y) in metres, interpolated bilinearly between
// the nodal averages of the element that contains the point; ok is false
// outside the solid wall.
func (f *Field) At(x, y float64) (s Stress, ok bool) {
	nx := len(f.xs) - 1
	i := sort.SearchFloat64s(f.xs, x) - 1
	j := sort.SearchFloat64s(f.ys, y) - 1
	i, j = max(i, 0), max(j, 0)
	if i >= nx || j >= len(f.ys)-1 || x < f.xs[0] || y < f.ys[0] || f.cell[j*nx+i] < 0 {
		return Stress{}, false
	}
	a := (x - f.xs[i]) / (f.xs[i+1] - f.xs[i])
	b := (y - f.ys[j]) / (f.ys[j+1] - f.ys[j])
	a, b = math.Min(math.Max(a, 0), 1), math.Min(math.Max(b, 0), 1)
	p := nx + 1
	n00, n10 := f.nodal[j*p+i], f.nodal[j*p+i+1]
	n01, n11 := f.nodal[(j+1)*p+i], f.nodal[(j+1)*p+i+1]
	w00, w10, w01, w11 := (1-a)*(1-b), a*(1-b), (1-a)*b, a*b
	return Stress{
		X:  w00*n00.X + w10*n10.X + w01*n01.X + w11*n11.X,
		Y:  w00*n00.Y + w10*n10.Y + w01*n01.Y + w11*n11.Y,
		XY: w00*n00.XY + w10*n10.XY + w01*n01.XY + w11*n11.XY,
	}, true
}

// Lines returns the model's grid lines across (x) and up (y), in metres:
// every element edge lies on them, and so does every opening edge.
func (f *Field) Lines() (xs, ys []float64) { return f.xs, f.ys }
