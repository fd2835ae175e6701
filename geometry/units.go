package geometry

// Length is a length in metres. Lengths are stored in SI whatever the wall's
// unit system; the System decides only how they are read and shown.
type Length float64

// Units of length.
const (
	Metre      Length = 1
	Centimetre Length = 0.01
	Millimetre Length = 0.001
	Inch       Length = 0.0254
	Foot       Length = 0.3048
)

// Force is a force in newtons.
type Force float64

// Units of force.
const (
	Newton     Force = 1
	Kilonewton Force = 1000
	Pound      Force = 4.4482216152605 // lbf
	Kip        Force = 1000 * Pound
)

// Stress is a stress (or modulus) in pascals.
type Stress float64

// Units of stress.
const (
	Pascal    Stress = 1
	Megapascal Stress = 1e6
	PSI       Stress = Stress(Pound) / Stress(Inch*Inch)
	KSI       Stress = 1000 * PSI
)

// BaseLength is the unit of a bare number and of coordinates in output:
// feet for US walls, metres for SI walls.
func (s System) BaseLength() Length {
	if s == SI {
		return Metre
	}
	return Foot
}
