package report

import (
	"fmt"
	"strconv"

	"pierwise/geometry"
)

// Units are the units results are reported in for one unit system: forces
// in kip or kN, deflections in in or mm, rigidities in kip/in or kN/mm,
// moments in kip·ft or kN·m, coordinates in ft or m. Every view (report,
// table, JSON, editor) converts through these, so a unit lives in one place.
type Units struct {
	Force      string
	Deflection string
	Rigidity   string
	Moment     string
	Coord      string
	Stress     string
	Area       string // bar areas: in² or mm²

	force      geometry.Force
	deflection geometry.Length
	moment     float64 // N·m per unit
	coord      geometry.Length
}

// AreaOf converts an area in m² to the report unit (in² or mm²).
func (u Units) AreaOf(a float64) float64 {
	if u.Coord == "m" {
		return a / float64(geometry.Millimetre*geometry.Millimetre)
	}
	return a / float64(geometry.Inch*geometry.Inch)
}

// UnitsFor returns the report units of a unit system.
func UnitsFor(sys geometry.System) Units {
	if sys == geometry.SI {
		return Units{
			Force: "kN", Deflection: "mm", Rigidity: "kN/mm", Moment: "kN·m", Coord: "m", Stress: "MPa", Area: "mm²",
			force: geometry.Kilonewton, deflection: geometry.Millimetre, moment: 1000, coord: geometry.Metre,
		}
	}
	return Units{
		Force: "kip", Deflection: "in", Rigidity: "kip/in", Moment: "kip·ft", Coord: "ft", Stress: "psi", Area: "in²",
		force: geometry.Kip, deflection: geometry.Inch, moment: float64(geometry.Kip) * float64(geometry.Foot), coord: geometry.Foot,
	}
}

// ClassicVersusFE says how the classic rigidity stands to the finite-element
// rigidity, given their relative difference (classic − FE)/FE: "34.2 %
// higher than", "5.0 % lower than" or "equal to".
func ClassicVersusFE(diff float64) string {
	switch {
	case diff >= 0.0005:
		return fmt.Sprintf("%.1f %% higher than", 100*diff)
	case diff <= -0.0005:
		return fmt.Sprintf("%.1f %% lower than", -100*diff)
	}
	return "equal to"
}

// ForceOf converts a force to the report unit.
func (u Units) ForceOf(f geometry.Force) float64 { return float64(f / u.force) }

// DeflectionOf converts a deflection to the report unit.
func (u Units) DeflectionOf(l geometry.Length) float64 { return float64(l / u.deflection) }

// RigidityOf converts a rigidity in N/m to the report unit.
func (u Units) RigidityOf(k float64) float64 { return k * float64(u.deflection) / float64(u.force) }

// MomentOf converts a moment in N·m to the report unit.
func (u Units) MomentOf(m float64) float64 { return m / u.moment }

// CoordOf converts a coordinate or size in metres to the base unit (ft or m).
func (u Units) CoordOf(x float64) float64 { return x / float64(u.coord) }

// Tidy rounds a number for JSON to 12 significant digits, so that 10 ft
// read as metres and converted back prints as 10, not 10.000000000000002.
func Tidy(x float64) float64 {
	y, _ := strconv.ParseFloat(strconv.FormatFloat(x, 'g', 12, 64), 64)
	return y
}

// Program names the program in a report's title block: "pierwise 0.1.0",
// or "pierwise" when the version is not known.
func Program(version string) string {
	if version == "" {
		return "pierwise"
	}
	return "pierwise " + version
}
