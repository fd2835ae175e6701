package study

import (
	"testing"

	"pierwise/geometry"
)

// FormatStep never shows a real step as zero: 1 mm is 0.0394 in
// (1 in = 25.4 mm exactly), and everyday steps keep the usual forms.
func TestFormatStep(t *testing.T) {
	for _, c := range []struct {
		step geometry.Length
		sys  geometry.System
		want string
	}{
		{8 * geometry.Inch, geometry.US, `8"`},
		{geometry.Foot, geometry.US, `1'-0"`},
		{geometry.Millimetre, geometry.US, "0.0394 in"},
		{200 * geometry.Millimetre, geometry.SI, "0.200 m"},
		{0.1 * geometry.Millimetre, geometry.SI, "0.1 mm"},
	} {
		if got := FormatStep(c.step, c.sys); got != c.want {
			t.Errorf("FormatStep(%g m) = %q, want %q", float64(c.step), got, c.want)
		}
	}
}
