package geometry

import (
	"errors"
	"math"
	"strconv"
	"strings"
)

// BarSize is one size of deformed reinforcing bar: its designation as typed
// ("#5", "15M", "16mm"), its nominal diameter and its nominal area in m².
type BarSize struct {
	Name     string
	Diameter Length
	Area     float64 // m²
	Standard string  // the standard that gives the nominal dimensions
}

// Bar standards (docs/method.md §8).
const (
	StandardA615 = "ASTM A615/A615M"
	StandardCSA  = "CSA G30.18"
	StandardISO  = "ISO 6935-2 / EN 10080"
)

// barSizes lists every size pierwise knows, in the order they are shown.
//
// Inch-pound sizes #3–#11: nominal diameters and areas of ASTM A615/A615M
// (Table 1), the values every US design aid repeats (e.g. ACI 318-19
// Appendix A). Canadian sizes 10M–35M: nominal diameters and areas of CSA
// G30.18 (Table 1). ISO/EN sizes 6–32 mm: the nominal diameter is the size,
// and the nominal area is π d²/4 (ISO 6935-2, EN 10080).
var barSizes = func() []BarSize {
	in2 := float64(Inch * Inch)
	mm2 := float64(Millimetre * Millimetre)
	s := []BarSize{
		{"#3", 0.375 * Inch, 0.11 * in2, StandardA615},
		{"#4", 0.500 * Inch, 0.20 * in2, StandardA615},
		{"#5", 0.625 * Inch, 0.31 * in2, StandardA615},
		{"#6", 0.750 * Inch, 0.44 * in2, StandardA615},
		{"#7", 0.875 * Inch, 0.60 * in2, StandardA615},
		{"#8", 1.000 * Inch, 0.79 * in2, StandardA615},
		{"#9", 1.128 * Inch, 1.00 * in2, StandardA615},
		{"#10", 1.270 * Inch, 1.27 * in2, StandardA615},
		{"#11", 1.410 * Inch, 1.56 * in2, StandardA615},
		{"10M", 11.3 * Millimetre, 100 * mm2, StandardCSA},
		{"15M", 16.0 * Millimetre, 200 * mm2, StandardCSA},
		{"20M", 19.5 * Millimetre, 300 * mm2, StandardCSA},
		{"25M", 25.2 * Millimetre, 500 * mm2, StandardCSA},
		{"30M", 29.9 * Millimetre, 700 * mm2, StandardCSA},
		{"35M", 35.7 * Millimetre, 1000 * mm2, StandardCSA},
	}
	for _, d := range []int{6, 8, 10, 12, 14, 16, 20, 25, 28, 32} {
		dm := float64(d) * float64(Millimetre)
		s = append(s, BarSize{strconv.Itoa(d) + "mm", Length(dm), math.Pi * dm * dm / 4, StandardISO})
	}
	return s
}()

// BarSizes returns every bar size pierwise knows (a copy).
func BarSizes() []BarSize {
	return append([]BarSize(nil), barSizes...)
}

// LookupBar finds a bar size by its designation: "#5" (also "No. 5",
// "no5"), "15M" (also "15m"), "16mm" (also "16 mm", "ø16", "Ø16"). Case and
// spaces are ignored.
func LookupBar(name string) (BarSize, bool) {
	k := normalBarName(name)
	for _, b := range barSizes {
		if normalBarName(b.Name) == k {
			return b, true
		}
	}
	return BarSize{}, false
}

func normalBarName(s string) string {
	s = strings.ToLower(strings.Join(strings.Fields(s), ""))
	switch {
	case strings.HasPrefix(s, "no."):
		s = "#" + s[3:]
	case strings.HasPrefix(s, "no") && len(s) > 2 && s[2] >= '0' && s[2] <= '9':
		s = "#" + s[2:]
	case strings.HasPrefix(s, "ø"):
		s = strings.TrimPrefix(s, "ø") + "mm"
	}
	return s
}

// barNameList is shown when a bar size is not known.
const barNameList = "#3 to #11, 10M to 35M, or 6mm to 32mm"

// BarSpacing is a bar size laid at a spacing ("#5@48in").
type BarSpacing struct {
	Size    BarSize
	Spacing Length
}

// AreaPerLength returns the bar area per length of wall, m²/m.
func (b BarSpacing) AreaPerLength() float64 {
	if b.Spacing <= 0 {
		return 0
	}
	return b.Size.Area / float64(b.Spacing)
}

// String writes the bars back as they are typed, in the wall's units.
func (b BarSpacing) String(sys System) string {
	u, unit := Inch, "in"
	if sys == SI {
		u, unit = Millimetre, "mm"
	}
	return b.Size.Name + "@" + strconv.FormatFloat(math.Round(float64(b.Spacing/u)*1e6)/1e6, 'f', -1, 64) + unit
}

// BarCount is a number of bars of one size ("2#5").
type BarCount struct {
	Count int
	Size  BarSize
}

// Area returns the area of all the bars, m².
func (b BarCount) Area() float64 { return float64(b.Count) * b.Size.Area }

// String writes the bars back as they are typed.
func (b BarCount) String() string { return strconv.Itoa(b.Count) + b.Size.Name }

// maxBarCount bounds a count of bars at one place: more than this is a typing
// slip, not a jamb.
const maxBarCount = 50

// ParseBarSpacing reads bars at a spacing: a bar size, "@", and a length
// ("#5@48in", "16mm@1200mm", "15M @ 400 mm"; a bare spacing is in the
// system's base unit, feet or metres). The spacing must be finite and larger
// than the bar's diameter. Errors are *UnitError values naming what is wrong.
func ParseBarSpacing(s string, sys System) (BarSpacing, error) {
	bad := func(msg string) (BarSpacing, error) {
		return BarSpacing{}, &UnitError{Quantity: "bar spacing", Input: s, Msg: msg}
	}
	name, spacing, ok := strings.Cut(s, "@")
	if !ok {
		return bad(`give a bar size and a spacing, as in #5@48in or 16mm@1200mm`)
	}
	if strings.TrimSpace(name) == "" {
		return bad("no bar size before the @ (use " + barNameList + ")")
	}
	size, ok := LookupBar(name)
	if !ok {
		return bad("unknown bar size " + strconv.Quote(strings.TrimSpace(name)) + " (use " + barNameList + ")")
	}
	sp, err := ParseLength(spacing, sys)
	if err != nil {
		var ue *UnitError
		if errors.As(err, &ue) {
			return bad("spacing: " + ue.Msg)
		}
		return bad("spacing: " + err.Error())
	}
	if !(sp > 0) {
		return bad("the spacing must be more than zero")
	}
	if sp <= size.Diameter {
		return bad("the spacing " + FormatLength(sp, sys) + " is not more than the bar's diameter " + FormatLength(size.Diameter, sys))
	}
	return BarSpacing{Size: size, Spacing: sp}, nil
}

// ParseBarCount reads a number of bars of one size: "1#5", "2#5", "2-#5",
// "2 x 16mm", "2×15M", or a bar size alone for one bar ("#5"). Errors are
// *UnitError values naming what is wrong.
func ParseBarCount(s string) (BarCount, error) {
	bad := func(msg string) (BarCount, error) {
		return BarCount{}, &UnitError{Quantity: "bar count", Input: s, Msg: msg}
	}
	t := strings.TrimSpace(s)
	if t == "" {
		return bad("empty; give a number of bars and a size, as in 2#5")
	}
	count, rest := 1, t
	i := 0
	for i < len(t) && t[i] >= '0' && t[i] <= '9' {
		i++
	}
	// A leading number is a count unless it is the size itself ("16mm", "15M").
	if i > 0 {
		if _, isSize := LookupBar(t); !isSize {
			if i > 4 {
				return bad("too many bars")
			}
			count, _ = strconv.Atoi(t[:i])
			rest = strings.TrimSpace(t[i:])
			for _, sep := range []string{"-", "x", "X", "×", "*"} {
				if strings.HasPrefix(rest, sep) {
					rest = strings.TrimSpace(strings.TrimPrefix(rest, sep))
					break
				}
			}
		}
	} else if strings.HasPrefix(t, "-") || strings.HasPrefix(t, "+") {
		return bad("the number of bars must be a whole number of one or more")
	}
	if rest == "" {
		return bad("no bar size after the number (use " + barNameList + ")")
	}
	size, ok := LookupBar(rest)
	if !ok {
		return bad("unknown bar size " + strconv.Quote(rest) + " (use " + barNameList + ")")
	}
	if count == 0 {
		return bad("zero bars; give one or more, or leave the key out")
	}
	if count > maxBarCount {
		return bad("more than " + strconv.Itoa(maxBarCount) + " bars at one place")
	}
	return BarCount{Count: count, Size: size}, nil
}
