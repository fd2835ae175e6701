package geometry

import (
	"math"
	"strconv"
	"strings"
)

// Length is a length in metres. Lengths are stored in SI whatever the wall's
// unit system; the System decides only how they are read and shown.
type Length float64

// Units of length. 1 in = 25.4 mm and 1 ft = 0.3048 m exactly, by definition
// (international yard and pound agreement of 1959; NIST SP 811, Appendix B).
const (
	Metre      Length = 1
	Centimetre Length = 0.01
	Millimetre Length = 0.001
	Inch       Length = 0.0254
	Foot       Length = 0.3048
)

// Force is a force in newtons.
type Force float64

// Units of force. 1 lbf = 4.448 221 615 260 5 N exactly (NIST SP 811,
// Appendix B: the avoirdupois pound times standard gravity 9.806 65 m/s²).
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
	Pascal     Stress = 1
	Kilopascal Stress = 1e3
	Megapascal Stress = 1e6
	Gigapascal Stress = 1e9
	PSI        Stress = Stress(Pound) / Stress(Inch*Inch)
	KSI        Stress = 1000 * PSI
)

// BaseLength is the unit of a bare number and of coordinates in output:
// feet for US walls, metres for SI walls.
func (s System) BaseLength() Length {
	if s == SI {
		return Metre
	}
	return Foot
}

// BaseForce is the unit of a bare force: kip (US) or kN (SI).
func (s System) BaseForce() Force {
	if s == SI {
		return Kilonewton
	}
	return Kip
}

// BaseStress is the unit of a bare stress: psi (US) or MPa (SI).
func (s System) BaseStress() Stress {
	if s == SI {
		return Megapascal
	}
	return PSI
}

// String returns the name used in wall files: "us" or "si".
func (s System) String() string {
	switch s {
	case US:
		return "us"
	case SI:
		return "si"
	}
	return "System(" + strconv.Itoa(int(s)) + ")"
}

// ParseSystem reads a unit system name ("us" or "si", any case).
func ParseSystem(s string) (System, bool) {
	switch strings.ToLower(strings.TrimSpace(s)) {
	case "us":
		return US, true
	case "si":
		return SI, true
	}
	return US, false
}

// UnitError is the error of ParseLength, ParseForce and ParseStress. Like
// strconv.NumError it says what was typed and what is wrong with it.
type UnitError struct {
	Quantity string // "length", "force" or "stress"
	Input    string // the text as typed
	Msg      string // what is wrong
}

func (e *UnitError) Error() string {
	return "bad " + e.Quantity + " " + strconv.Quote(e.Input) + ": " + e.Msg
}

var lengthUnits = map[string]Length{
	"in": Inch, "inch": Inch, "inches": Inch, `"`: Inch,
	"ft": Foot, "foot": Foot, "feet": Foot, "'": Foot,
	"mm": Millimetre, "cm": Centimetre, "m": Metre,
}

var forceUnits = map[string]Force{
	"lb": Pound, "lbs": Pound, "lbf": Pound,
	"kip": Kip, "kips": Kip,
	"n": Newton, "kn": Kilonewton, "mn": 1e6 * Newton,
}

var stressUnits = map[string]Stress{
	"psi": PSI, "ksi": KSI,
	"pa": Pascal, "kpa": Kilopascal, "mpa": Megapascal, "gpa": Gigapascal,
}

const (
	lengthUnitList = "in, ft, mm, cm or m, or feet-inches like 12'-6\""
	forceUnitList  = "lb, kip, N or kN"
	stressUnitList = "psi, ksi, Pa, kPa, MPa or GPa"
)

// ParseLength reads a length as typed by a person: a number with a unit (in,
// ft, mm, cm, m), feet-inches (12'-6", 12'6", 12' 6", 12', 6", 6 1/2",
// 12ft 6in), or a
// bare number in the system's base unit (ft for US, m for SI). Spaces between
// the parts are allowed. Negative values are returned as they are (callers
// decide whether they make sense); NaN, infinities and overflow are errors.
func ParseLength(s string, sys System) (Length, error) {
	bad := func(msg string) (Length, error) {
		return 0, &UnitError{Quantity: "length", Input: s, Msg: msg}
	}
	t := normalizeQuotes(strings.TrimSpace(s))
	if t == "" {
		return bad("empty; type a number and a unit, e.g. 12ft or 3.6m")
	}
	if strings.ContainsAny(t, `'"`) {
		v, msg := parseFeetInches(t)
		if msg != "" {
			return bad(msg)
		}
		return Length(v), nil
	}
	num, unit, msg := splitQuantity(t)
	if msg != "" {
		return bad(msg)
	}
	if v, ok, msg := feetThenInches(num, unit); ok {
		if msg != "" {
			return bad(msg)
		}
		return Length(v), nil
	}
	if msg := checkUnitText(unit); msg != "" {
		return bad(msg)
	}
	u := sys.BaseLength()
	if unit != "" {
		var ok bool
		if u, ok = lengthUnits[strings.ToLower(unit)]; !ok {
			return bad("unknown unit " + strconv.Quote(unit) + " (use " + lengthUnitList + ")")
		}
	}
	v := num * float64(u)
	if math.IsInf(v, 0) || math.IsNaN(v) {
		return bad("out of range")
	}
	return Length(v), nil
}

// ParseForce reads a force: a number with a unit (lb, kip, N, kN) or a bare
// number in kip (US) or kN (SI).
func ParseForce(s string, sys System) (Force, error) {
	v, err := parseScaled(s, "force", forceUnits, forceUnitList, float64(sys.BaseForce()))
	return Force(v), err
}

// ParseStress reads a stress or a modulus: a number with a unit (psi, ksi,
// Pa, kPa, MPa, GPa) or a bare number in psi (US) or MPa (SI).
func ParseStress(s string, sys System) (Stress, error) {
	v, err := parseScaled(s, "stress", stressUnits, stressUnitList, float64(sys.BaseStress()))
	return Stress(v), err
}

func parseScaled[T ~float64](s, quantity string, units map[string]T, list string, base float64) (float64, error) {
	bad := func(msg string) (float64, error) {
		return 0, &UnitError{Quantity: quantity, Input: s, Msg: msg}
	}
	t := strings.TrimSpace(s)
	if t == "" {
		return bad("empty; type a number and a unit (" + list + ")")
	}
	num, unit, msg := splitQuantity(t)
	if msg == "" {
		msg = checkUnitText(unit)
	}
	if msg != "" {
		return bad(msg)
	}
	u := base
	if unit != "" {
		f, ok := units[strings.ToLower(unit)]
		if !ok {
			return bad("unknown unit " + strconv.Quote(unit) + " (use " + list + ")")
		}
		u = float64(f)
	}
	v := num * u
	if math.IsInf(v, 0) || math.IsNaN(v) {
		return bad("out of range")
	}
	return v, nil
}

// normalizeQuotes maps the typographic foot and inch marks (and the doubled
// apostrophe some people type for inches) to ' and ".
func normalizeQuotes(s string) string {
	if !strings.ContainsAny(s, "′″’”'") {
		return s
	}
	r := strings.NewReplacer("''", `"`, "′", "'", "’", "'", "″", `"`, "”", `"`)
	return r.Replace(s)
}

// parseFeetInches reads 12'-6", 12'6", 12' 6 1/2", 12', 6" and 6 1/2" (with
// an optional leading minus for the whole value). It returns metres, or a
// message saying what is wrong.
func parseFeetInches(t string) (float64, string) {
	neg := false
	if strings.HasPrefix(t, "-") {
		neg = true
		t = strings.TrimSpace(t[1:])
	}
	var feet, inches float64
	rest := t
	if i := strings.IndexByte(rest, '\''); i >= 0 {
		f, msg := parseMixed(strings.TrimSpace(rest[:i]))
		if msg != "" {
			return 0, "feet: " + msg
		}
		feet = f
		rest = strings.TrimSpace(rest[i+1:])
		// The dash between feet and inches is a separator, not a sign.
		if strings.HasPrefix(rest, "-") {
			rest = strings.TrimSpace(rest[1:])
			if rest == "" {
				return 0, "inches missing after the dash"
			}
		}
	}
	if rest != "" {
		if !strings.HasSuffix(rest, `"`) {
			return 0, `inches must end with " (as in 12'-6")`
		}
		in, msg := parseMixed(strings.TrimSpace(rest[:len(rest)-1]))
		if msg != "" {
			return 0, "inches: " + msg
		}
		inches = in
	}
	if feet < 0 || inches < 0 {
		return 0, "put a minus sign only in front of the whole value"
	}
	if strings.Contains(t, "'") && inches >= 12 {
		return 0, inchesOver12(feet, inches)
	}
	v := (feet*12 + inches) * float64(Inch)
	if math.IsInf(v, 0) || math.IsNaN(v) {
		return 0, "out of range"
	}
	if neg {
		v = -v
	}
	return v, ""
}

// parseMixed reads a plain number, a fraction 1/2 or a mixed number 6 1/2
// (also 6-1/2).
func parseMixed(s string) (float64, string) {
	if s == "" {
		return 0, "number missing"
	}
	if !strings.Contains(s, "/") {
		return parseNumber(s)
	}
	whole := 0.0
	frac := s
	if i := strings.LastIndexAny(s, " -"); i > 0 {
		w, msg := parseNumber(strings.TrimSpace(s[:i]))
		if msg != "" {
			return 0, msg
		}
		whole = w
		frac = strings.TrimSpace(s[i+1:])
	}
	num, den, ok := strings.Cut(frac, "/")
	if !ok {
		return 0, "bad fraction " + strconv.Quote(frac)
	}
	n, msg := parseNumber(strings.TrimSpace(num))
	if msg != "" {
		return 0, msg
	}
	d, msg := parseNumber(strings.TrimSpace(den))
	if msg != "" {
		return 0, msg
	}
	if d == 0 {
		return 0, "fraction with a zero denominator"
	}
	if n < 0 || d < 0 || whole < 0 {
		return 0, "negative part in a fraction"
	}
	return whole + n/d, ""
}

// splitQuantity splits "12.5 kip" into 12.5 and "kip". A mixed number with a
// fraction is allowed before a unit ("7 5/8 in").
func splitQuantity(t string) (float64, string, string) {
	end := numberEnd(t)
	if end == 0 {
		l := strings.ToLower(strings.TrimLeft(t, "+-"))
		if strings.HasPrefix(l, "nan") || strings.HasPrefix(l, "inf") {
			return 0, "", "not a finite number"
		}
		return 0, "", "no number at the start"
	}
	numText := t[:end]
	rest := strings.TrimSpace(t[end:])
	if strings.HasPrefix(rest, "/") || (rest != "" && rest[0] >= '0' && rest[0] <= '9') {
		// A fraction: take everything up to the first letter.
		i := strings.IndexFunc(rest, func(r rune) bool { return !strings.ContainsRune("0123456789./ -", r) })
		if i < 0 {
			i = len(rest)
		}
		numText = t[:end] + " " + rest[:i]
		rest = strings.TrimSpace(rest[i:])
		v, msg := parseMixed(strings.TrimSpace(strings.Replace(numText, " /", "/", 1)))
		if msg != "" {
			return 0, "", msg
		}
		return v, rest, ""
	}
	v, msg := parseNumber(numText)
	if msg != "" {
		return 0, "", msg
	}
	return v, rest, ""
}

// feetThenInches reads the rest of "12ft 6in" or "12 ft 6 1/2 in" after the
// number of feet; ok is false when unit is not of that form.
func feetThenInches(feet float64, unit string) (v float64, ok bool, msg string) {
	i := strings.IndexAny(unit, " 0123456789.")
	if i <= 0 || lengthUnits[strings.ToLower(unit[:i])] != Foot {
		return 0, false, ""
	}
	in, inUnit, msg := splitQuantity(strings.TrimSpace(unit[i:]))
	if msg != "" {
		return 0, true, "inches: " + msg
	}
	if lengthUnits[strings.ToLower(inUnit)] != Inch || inUnit == `"` {
		return 0, true, "after the feet give inches, as in 12ft 6in"
	}
	if feet < 0 || in < 0 {
		return 0, true, "put a minus sign only in front of the whole value"
	}
	if in >= 12 {
		return 0, true, inchesOver12(feet, in)
	}
	v = (feet*12 + in) * float64(Inch)
	if math.IsInf(v, 0) {
		return 0, true, "out of range"
	}
	return v, true, ""
}

// inchesOver12 explains why 12'-13" is refused: after the feet, the inches
// are a remainder below 12, and 13 is most likely a typing slip.
func inchesOver12(feet, inches float64) string {
	return "the inches after the feet must be less than 12 (did you mean " +
		FormatLength(Length((feet*12+inches)*float64(Inch)), US) + "?)"
}

func checkUnitText(u string) string {
	for _, r := range u {
		if !(r >= 'a' && r <= 'z' || r >= 'A' && r <= 'Z') {
			return "unexpected " + strconv.Quote(u) + " after the number"
		}
	}
	return ""
}

// numberEnd returns the length of the decimal number at the start of s:
// optional sign, digits, point, digits, exponent. Hex floats, underscores,
// "inf" and "nan" are not numbers here.
func numberEnd(s string) int {
	i := 0
	if i < len(s) && (s[i] == '+' || s[i] == '-') {
		i++
	}
	digits := 0
	for i < len(s) && s[i] >= '0' && s[i] <= '9' {
		i++
		digits++
	}
	if i < len(s) && s[i] == '.' {
		i++
		for i < len(s) && s[i] >= '0' && s[i] <= '9' {
			i++
			digits++
		}
	}
	if digits == 0 {
		return 0
	}
	if i < len(s) && (s[i] == 'e' || s[i] == 'E') {
		j := i + 1
		if j < len(s) && (s[j] == '+' || s[j] == '-') {
			j++
		}
		k := j
		for k < len(s) && s[k] >= '0' && s[k] <= '9' {
			k++
		}
		if k > j {
			i = k
		}
	}
	return i
}

// parseNumber reads a whole string as a finite decimal number.
func parseNumber(s string) (float64, string) {
	if s == "" || numberEnd(s) != len(s) {
		return 0, "not a number: " + strconv.Quote(s)
	}
	v, err := strconv.ParseFloat(s, 64)
	if err != nil || math.IsInf(v, 0) || math.IsNaN(v) {
		return 0, "number out of range"
	}
	return v, ""
}

// FormatLength shows a length to people: feet-inches to the nearest 1/8 in
// for US walls (12'-6 1/2", or 7 5/8" below one foot), metres with three
// decimals for SI walls (3.600 m).
func FormatLength(l Length, sys System) string {
	v := float64(l)
	if math.IsNaN(v) || math.IsInf(v, 0) {
		return strconv.FormatFloat(v, 'g', -1, 64)
	}
	if sys == SI {
		return strconv.FormatFloat(v, 'f', 3, 64) + " m"
	}
	eighths := math.Round(math.Abs(v) / float64(Inch) * 8)
	sign := ""
	if v < 0 && eighths > 0 {
		sign = "-"
	}
	if eighths > 1e15 {
		return sign + strconv.FormatFloat(math.Abs(v)/float64(Foot), 'g', 6, 64) + " ft"
	}
	n := int64(eighths)
	feet := n / 96
	in := (n % 96) / 8
	fr := n % 8
	inText := strconv.FormatInt(in, 10)
	if fr != 0 {
		num, den := fr, int64(8)
		for num%2 == 0 {
			num /= 2
			den /= 2
		}
		f := strconv.FormatInt(num, 10) + "/" + strconv.FormatInt(den, 10)
		if in == 0 && feet == 0 {
			inText = f
		} else {
			inText += " " + f
		}
	}
	if feet == 0 {
		return sign + inText + `"`
	}
	return sign + strconv.FormatInt(feet, 10) + "'-" + inText + `"`
}

// FormatForce shows a force to people with three significant digits (more
// when the value has more whole digits): "40.0 kip", "178 kN".
func FormatForce(f Force, sys System) string {
	if sys == SI {
		return formatSig(float64(f/Kilonewton), 3) + " kN"
	}
	return formatSig(float64(f/Kip), 3) + " kip"
}

// FormatStress shows a stress to people: psi below 100 ksi and ksi above for
// US walls ("2000 psi", "1800 ksi"), MPa for SI walls ("13.8 MPa").
func FormatStress(s Stress, sys System) string {
	if sys == SI {
		return formatSig(float64(s/Megapascal), 3) + " MPa"
	}
	if math.Abs(float64(s)) >= float64(100*KSI) {
		return formatSig(float64(s/KSI), 3) + " ksi"
	}
	return formatSig(float64(s/PSI), 3) + " psi"
}

// formatSig formats v with at least sig significant digits and never in
// exponent form for everyday magnitudes.
func formatSig(v float64, sig int) string {
	if math.IsNaN(v) || math.IsInf(v, 0) {
		return strconv.FormatFloat(v, 'g', -1, 64)
	}
	if v == 0 {
		return "0"
	}
	a := math.Abs(v)
	if a >= 1e15 || a < 1e-6 {
		return strconv.FormatFloat(v, 'g', sig, 64)
	}
	dec := sig - 1 - int(math.Floor(math.Log10(a)))
	if dec < 0 {
		dec = 0
	}
	s := strconv.FormatFloat(v, 'f', dec, 64)
	if s == "-0" || strings.Trim(s, "-0.") == "" {
		return strings.TrimPrefix(s, "-")
	}
	return s
}
