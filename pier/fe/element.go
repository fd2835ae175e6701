package fe

import "math"

// Element names accepted by Options.Element.
const (
	ElementQ4  = "q4"  // plain 4-node bilinear quadrilateral, 2×2 Gauss points
	ElementQM6 = "qm6" // bilinear with incompatible modes (Taylor, Beresford & Wilson); the default
)

// elasticity is the plane-stress constitutive matrix D (σ = D ε) with
// engineering shear strain: σ = [σx σy τxy], ε = [εx εy γxy].
type elasticity [3][3]float64

// isotropic returns D for plane stress with modulus e and Poisson's ratio nu.
func isotropic(e, nu float64) elasticity {
	c := e / (1 - nu*nu)
	return elasticity{
		{c, c * nu, 0},
		{c * nu, c, 0},
		{0, 0, e / (2 * (1 + nu))},
	}
}

// orthotropic returns D for plane stress with a horizontal modulus e, a
// vertical modulus kf·e, a shear modulus kv·e/(2(1+ν)) and the compliance
// coupling −ν/e. With kf = kv = 1 it is isotropic. It models the user's
// cracking modifiers: the vertical fibres carry the wall's bending and the
// shear modulus its shear, as kf and kv do in the classic formulas.
func orthotropic(e, nu, kf, kv float64) elasticity {
	s11, s22, s12 := 1/e, 1/(kf*e), -nu/e
	det := s11*s22 - s12*s12
	return elasticity{
		{s22 / det, -s12 / det, 0},
		{-s12 / det, s11 / det, 0},
		{0, 0, kv * e / (2 * (1 + nu))},
	}
}

// gauss2 are the abscissae of 2-point Gauss–Legendre quadrature (weights 1).
var gauss2 = [2]float64{-1 / sqrt3, 1 / sqrt3}

var sqrt3 = math.Sqrt(3)

// corner gives the natural coordinates (ξ, η) of the element's nodes, counter-
// clockwise from the bottom-left corner.
var corner = [4][2]float64{{-1, -1}, {1, -1}, {1, 1}, {-1, 1}}

// stiffness returns the 8×8 stiffness matrix of an axis-aligned rectangle w
// wide and h high, thickness 1, for the element kind ("q4" or "qm6"). DOFs are
// ordered (ux, uy) node by node, nodes as in corner.
func stiffness(kind string, w, h float64, d *elasticity) [8][8]float64 {
	// On a rectangle the Jacobian is constant: x = w/2 ξ, y = h/2 η.
	dxi, deta := 2/w, 2/h
	det := w * h / 4

	// Compatible part (q4) and, for qm6, the four incompatible DOFs.
	var kcc [8][8]float64
	var kci [8][4]float64
	var kii [4][4]float64
	for _, xi := range gauss2 {
		for _, eta := range gauss2 {
			// B for the nodal DOFs: strain = Bc u.
			var bc [3][8]float64
			for n, c := range corner {
				dx := c[0] * (1 + eta*c[1]) / 4 * dxi
				dy := c[1] * (1 + xi*c[0]) / 4 * deta
				bc[0][2*n] = dx
				bc[1][2*n+1] = dy
				bc[2][2*n] = dy
				bc[2][2*n+1] = dx
			}
			// B for the incompatible modes P1 = 1 − ξ², P2 = 1 − η²,
			// each in x and y: a = (a1x, a1y, a2x, a2y).
			var bi [3][4]float64
			p1x := -2 * xi * dxi
			p2y := -2 * eta * deta
			bi[0][0] = p1x // ∂(P1 a1x)/∂x
			bi[2][1] = p1x // ∂(P1 a1y)/∂x
			bi[1][3] = p2y // ∂(P2 a2y)/∂y
			bi[2][2] = p2y // ∂(P2 a2x)/∂y
			var dbc [3][8]float64
			var dbi [3][4]float64
			for r := 0; r < 3; r++ {
				for s := 0; s < 3; s++ {
					if d[r][s] == 0 {
						continue
					}
					for c := 0; c < 8; c++ {
						dbc[r][c] += d[r][s] * bc[s][c]
					}
					for c := 0; c < 4; c++ {
						dbi[r][c] += d[r][s] * bi[s][c]
					}
				}
			}
			for a := 0; a < 8; a++ {
				for b := 0; b < 8; b++ {
					kcc[a][b] += det * (bc[0][a]*dbc[0][b] + bc[1][a]*dbc[1][b] + bc[2][a]*dbc[2][b])
				}
				for b := 0; b < 4; b++ {
					kci[a][b] += det * (bc[0][a]*dbi[0][b] + bc[1][a]*dbi[1][b] + bc[2][a]*dbi[2][b])
				}
			}
			for a := 0; a < 4; a++ {
				for b := 0; b < 4; b++ {
					kii[a][b] += det * (bi[0][a]*dbi[0][b] + bi[1][a]*dbi[1][b] + bi[2][a]*dbi[2][b])
				}
			}
		}
	}
	if kind == ElementQ4 {
		return kcc
	}
	// Static condensation of the incompatible modes: K = Kcc − Kci Kii⁻¹ Kic.
	inv, ok := invert4(kii)
	if !ok {
		panic("fe: singular incompatible-mode stiffness")
	}
	var t [8][4]float64 // Kci Kii⁻¹
	for a := 0; a < 8; a++ {
		for b := 0; b < 4; b++ {
			for c := 0; c < 4; c++ {
				t[a][b] += kci[a][c] * inv[c][b]
			}
		}
	}
	for a := 0; a < 8; a++ {
		for b := 0; b < 8; b++ {
			s := 0.0
			for c := 0; c < 4; c++ {
				s += t[a][c] * kci[b][c]
			}
			kcc[a][b] -= s
		}
	}
	// Restore exact symmetry lost to rounding.
	for a := 0; a < 8; a++ {
		for b := a + 1; b < 8; b++ {
			m := (kcc[a][b] + kcc[b][a]) / 2
			kcc[a][b], kcc[b][a] = m, m
		}
	}
	return kcc
}

// invert4 inverts a symmetric positive definite 4×4 matrix by Gauss–Jordan
// elimination without pivoting (safe for positive definite matrices).
func invert4(m [4][4]float64) ([4][4]float64, bool) {
	var inv [4][4]float64
	for i := range inv {
		inv[i][i] = 1
	}
	for c := 0; c < 4; c++ {
		p := m[c][c]
		if !(p > 0) {
			return inv, false
		}
		for j := 0; j < 4; j++ {
			m[c][j] /= p
			inv[c][j] /= p
		}
		for r := 0; r < 4; r++ {
			if r == c || m[r][c] == 0 {
				continue
			}
			f := m[r][c]
			for j := 0; j < 4; j++ {
				m[r][j] -= f * m[c][j]
				inv[r][j] -= f * inv[c][j]
			}
		}
	}
	return inv, true
}
