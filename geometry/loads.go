package geometry

import (
	"math"
	"strconv"
	"strings"
)

// Units of line load (force per length along the top of a wall) and of area
// load (force per face area, a pressure: the wall's own weight). They follow
// from the exact length and force units above.
const (
	NewtonPerMetre     LineLoad = 1
	KilonewtonPerMetre LineLoad = 1000
	PoundPerFoot       LineLoad = LineLoad(float64(Pound) / float64(Foot)) // plf
	KipPerFoot         LineLoad = 1000 * PoundPerFoot                      // klf

	PoundPerSquareFoot Stress = Stress(float64(Pound) / float64(Foot*Foot)) // psf
	KipPerSquareFoot   Stress = 1000 * PoundPerSquareFoot                   // ksf
)

var lineLoadUnits = map[string]LineLoad{
	"plf": PoundPerFoot, "lb/ft": PoundPerFoot, "lbs/ft": PoundPerFoot, "lbf/ft": PoundPerFoot,
	"klf": KipPerFoot, "kip/ft": KipPerFoot, "kips/ft": KipPerFoot,
	"n/m": NewtonPerMetre, "kn/m": KilonewtonPerMetre, "n/mm": KilonewtonPerMetre,
}

var areaLoadUnits = map[string]Stress{
	"psf": PoundPerSquareFoot, "lb/ft2": PoundPerSquareFoot, "lbs/ft2": PoundPerSquareFoot,
	"ksf": KipPerSquareFoot, "kip/ft2": KipPerSquareFoot, "psi": PSI,
	"pa": Pascal, "n/m2": Pascal, "kpa": Kilopascal, "kn/m2": Kilopascal,
}

const (
	lineLoadUnitList = "plf, lb/ft, klf, kip/ft, N/m or kN/m"
	areaLoadUnitList = "psf, ksf, psi, Pa, kPa, N/m2 or kN/m2"
)

// BaseLineLoad is the unit of a bare line load: kip/ft (US) or kN/m (SI),
// the base force over the base length.
func (s System) BaseLineLoad() LineLoad {
	if s == SI {
		return KilonewtonPerMetre
	}
	return KipPerFoot
}

// BaseAreaLoad is the unit of a bare area load: psf (US) or kPa (SI), the
// units wall weights are tabulated in.
func (s System) BaseAreaLoad() Stress {
	if s == SI {
		return Kilopascal
	}
	return PoundPerSquareFoot
}

// ParseLineLoad reads a force per length: a number with a unit (plf, lb/ft,
// klf, kip/ft, N/m, kN/m; "kip / ft" with spaces too) or a bare number in
// kip/ft (US) or kN/m (SI). Negative values are returned as they are.
func ParseLineLoad(s string, sys System) (LineLoad, error) {
	v, err := parsePerUnit(s, "line load", lineLoadUnits, lineLoadUnitList, float64(sys.BaseLineLoad()))
	return LineLoad(v), err
}

// ParseAreaLoad reads a force per area such as a wall's weight per face
// area: a number with a unit (psf, ksf, psi, Pa, kPa, N/m2, kN/m2; m² for m2)
// or a bare number in psf (US) or kPa (SI).
func ParseAreaLoad(s string, sys System) (Stress, error) {
	v, err := parsePerUnit(s, "area load", areaLoadUnits, areaLoadUnitList, float64(sys.BaseAreaLoad()))
	return Stress(v), err
}

// parsePerUnit reads a number and a compound unit ("kip/ft", "kN/m²").
func parsePerUnit[T ~float64](s, quantity string, units map[string]T, list string, base float64) (float64, error) {
	bad := func(msg string) (float64, error) {
		return 0, &UnitError{Quantity: quantity, Input: s, Msg: msg}
	}
	t := strings.TrimSpace(s)
	if t == "" {
		return bad("empty; type a number and a unit (" + list + ")")
	}
	end := numberEnd(t)
	if end == 0 {
		_, _, msg := splitQuantity(t)
		return bad(msg)
	}
	num, msg := parseNumber(t[:end])
	if msg != "" {
		return bad(msg)
	}
	unit := strings.ToLower(strings.Join(strings.Fields(t[end:]), ""))
	unit = strings.ReplaceAll(unit, "²", "2")
	u := base
	if unit != "" {
		f, ok := units[unit]
		if !ok {
			return bad("unknown unit " + strconv.Quote(strings.TrimSpace(t[end:])) + " (use " + list + ")")
		}
		u = float64(f)
	}
	v := num * u
	if math.IsInf(v, 0) || math.IsNaN(v) {
		return bad("out of range")
	}
	return v, nil
}

// FormatLineLoad shows a line load to people with three significant digits:
// lb/ft below 1 kip/ft and kip/ft above for US walls ("800 lb/ft",
// "1.20 kip/ft"), kN/m for SI walls ("15.0 kN/m").
func FormatLineLoad(q LineLoad, sys System) string {
	if sys == SI {
		return formatSig(float64(q/KilonewtonPerMetre), 3) + " kN/m"
	}
	if math.Abs(float64(q)) >= float64(KipPerFoot) {
		return formatSig(float64(q/KipPerFoot), 3) + " kip/ft"
	}
	return formatSig(float64(q/PoundPerFoot), 3) + " lb/ft"
}

// FormatAreaLoad shows a force per area to people: psf for US walls
// ("60.0 psf"), kPa for SI walls ("2.87 kPa").
func FormatAreaLoad(s Stress, sys System) string {
	if sys == SI {
		return formatSig(float64(s/Kilopascal), 3) + " kPa"
	}
	return formatSig(float64(s/PoundPerSquareFoot), 3) + " psf"
}

// exactLineLoad writes a line load that reads back to the same float64.
func exactLineLoad(q LineLoad, sys System) string {
	v := float64(q)
	if v == 0 {
		return "0"
	}
	exact := strconv.FormatFloat(v, 'g', -1, 64) + "N/m"
	if sys == SI {
		return firstExact(q, sys, ParseLineLoad, exact, decimals(v/float64(KilonewtonPerMetre), 4)+"kN/m", decimals(v, 4)+"N/m")
	}
	klf, plf := decimals(v/float64(KipPerFoot), 4)+"kip/ft", decimals(v/float64(PoundPerFoot), 4)+"lb/ft"
	if math.Abs(v) < float64(KipPerFoot) {
		return firstExact(q, sys, ParseLineLoad, exact, plf, klf)
	}
	return firstExact(q, sys, ParseLineLoad, exact, klf, plf)
}

// exactAreaLoad writes an area load that reads back to the same float64.
func exactAreaLoad(s Stress, sys System) string {
	v := float64(s)
	if v == 0 {
		return "0" // self_weight = "0": no self weight
	}
	exact := strconv.FormatFloat(v, 'g', -1, 64) + "Pa"
	if sys == SI {
		return firstExact(s, sys, ParseAreaLoad, exact, decimals(v/float64(Kilopascal), 4)+"kPa", decimals(v, 4)+"Pa")
	}
	return firstExact(s, sys, ParseAreaLoad, exact, decimals(v/float64(PoundPerSquareFoot), 4)+"psf", decimals(v/float64(KipPerSquareFoot), 6)+"ksf")
}
