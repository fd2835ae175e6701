package report

import (
	"math"
	"strconv"
)

// Sig prints a method-level result (a rigidity, a deflection, a share, a
// force or a moment) to three significant figures, the precision the
// screens and reports give these numbers (docs/method.md §1): 6490, 0.473,
// 0.00693, 16.7, -2.16. It never uses exponent notation for the magnitudes
// of the trade (below 1e-6 it does), never prints -0, and leaves NaN and Inf
// as Go spells them; below 1e-9 it prints 0. JSON keeps full precision; this is for people.
func Sig(x float64) string {
	if math.IsNaN(x) || math.IsInf(x, 0) {
		return strconv.FormatFloat(x, 'g', -1, 64)
	}
	if x == 0 {
		return "0"
	}
	a := math.Abs(x)
	if a < 1e-9 {
		return "0" // rounding noise of a zero (a moment at an inflection point)
	}
	if a < 1e-6 {
		return strconv.FormatFloat(x, 'g', 3, 64)
	}
	// Round to three significant figures first, then print with the
	// decimals those figures need (999.7 rounds to 1000, printed as such).
	r, _ := strconv.ParseFloat(strconv.FormatFloat(x, 'g', 3, 64), 64)
	d := int(math.Floor(math.Log10(math.Abs(r))))
	s := strconv.FormatFloat(r, 'f', max(0, 2-d), 64)
	if r == 0 || s == "-0" {
		return "0"
	}
	return s
}

// SigPercent prints a fraction (0–1) as a percentage to three significant
// figures: 0.3738 → "37.4 %", 0.05 → "5.00 %".
func SigPercent(f float64) string { return Sig(100*f) + " %" }
