package geometry

import (
	"errors"
	"math"
	"strings"
	"testing"
)

func TestBarSizesNominal(t *testing.T) {
	in2 := float64(Inch * Inch)
	mm2 := float64(Millimetre * Millimetre)
	tests := []struct {
		name string
		d    Length
		area float64
	}{
		// ASTM A615/A615M Table 1 nominal dimensions (repeated in ACI 318-19
		// Appendix A and every US design aid).
		{"#3", 0.375 * Inch, 0.11 * in2},
		{"#4", 0.5 * Inch, 0.20 * in2},
		{"#5", 0.625 * Inch, 0.31 * in2},
		{"#6", 0.75 * Inch, 0.44 * in2},
		{"#7", 0.875 * Inch, 0.60 * in2},
		{"#8", 1.0 * Inch, 0.79 * in2},
		{"#9", 1.128 * Inch, 1.00 * in2},
		{"#10", 1.27 * Inch, 1.27 * in2},
		{"#11", 1.41 * Inch, 1.56 * in2},
		// CSA G30.18 Table 1.
		{"10M", 11.3 * Millimetre, 100 * mm2},
		{"15M", 16 * Millimetre, 200 * mm2},
		{"25M", 25.2 * Millimetre, 500 * mm2},
		{"35M", 35.7 * Millimetre, 1000 * mm2},
		// ISO 6935-2 / EN 10080: nominal area π d²/4; EN 10080 tabulates
		// 201 mm² for 16 mm and 804 mm² for 32 mm.
		{"16mm", 16 * Millimetre, 201.06 * mm2},
		{"32mm", 32 * Millimetre, 804.25 * mm2},
	}
	for _, tc := range tests {
		b, ok := LookupBar(tc.name)
		if !ok {
			t.Fatalf("LookupBar(%q) not found", tc.name)
		}
		if math.Abs(float64(b.Diameter-tc.d)) > 1e-9 || math.Abs(b.Area-tc.area) > 1e-3*tc.area {
			t.Errorf("%s: d = %g m, A = %g m²; want %g, %g", tc.name, float64(b.Diameter), b.Area, float64(tc.d), tc.area)
		}
	}
	// The A615 areas are rounded nominal values near π d²/4 (within 2 %).
	for _, b := range BarSizes() {
		d := float64(b.Diameter)
		if r := b.Area / (math.Pi * d * d / 4); r < 0.98 || r > 1.02 {
			t.Errorf("%s: area %.4g is %.3f of π d²/4", b.Name, b.Area, r)
		}
	}
}

func TestLookupBarSpellings(t *testing.T) {
	for _, s := range []string{"#5", " #5 ", "No. 5", "no5", "NO.5"} {
		if b, ok := LookupBar(s); !ok || b.Name != "#5" {
			t.Errorf("LookupBar(%q) = %v, %v", s, b.Name, ok)
		}
	}
	for _, s := range []string{"16mm", "16 mm", "ø16", "16MM"} {
		if b, ok := LookupBar(s); !ok || b.Name != "16mm" {
			t.Errorf("LookupBar(%q) = %v, %v", s, b.Name, ok)
		}
	}
	for _, s := range []string{"#2", "#12", "15mm", "M16", "", "#"} {
		if _, ok := LookupBar(s); ok {
			t.Errorf("LookupBar(%q) found a bar", s)
		}
	}
}

func TestParseBarSpacing(t *testing.T) {
	tests := []struct {
		in      string
		sys     System
		bar     string
		spacing Length
	}{
		{"#5@48in", US, "#5", 48 * Inch},
		{"#5 @ 4ft", US, "#5", 4 * Foot},
		{"#4@4", US, "#4", 4 * Foot}, // a bare spacing is in feet
		{`#6@16"`, US, "#6", 16 * Inch},
		{"16mm@1200mm", SI, "16mm", 1200 * Millimetre},
		{"15M@0.4", SI, "15M", 0.4 * Metre},
	}
	for _, tc := range tests {
		b, err := ParseBarSpacing(tc.in, tc.sys)
		if err != nil {
			t.Errorf("ParseBarSpacing(%q): %v", tc.in, err)
			continue
		}
		if b.Size.Name != tc.bar || math.Abs(float64(b.Spacing-tc.spacing)) > 1e-12 {
			t.Errorf("ParseBarSpacing(%q) = %s @ %g m", tc.in, b.Size.Name, float64(b.Spacing))
		}
	}
	bad := []struct{ in, want string }{
		{"#5", "give a bar size and a spacing"},
		{"#13@48in", "unknown bar size"},
		{"@48in", "no bar size"},
		{"#5@0.5in", "not more than the bar's diameter"},
		{"#5@0in", "more than zero"},
		{"#5@-8in", "more than zero"},
		{"#5@48furlong", "spacing: unknown unit"},
		{"#5@", "spacing: empty"},
	}
	for _, tc := range bad {
		_, err := ParseBarSpacing(tc.in, US)
		var ue *UnitError
		if !errors.As(err, &ue) || ue.Input != tc.in || !strings.Contains(ue.Msg, tc.want) {
			t.Errorf("ParseBarSpacing(%q) = %v; want a *UnitError saying %q", tc.in, err, tc.want)
		}
	}
}

func TestParseBarCount(t *testing.T) {
	tests := []struct {
		in    string
		count int
		bar   string
	}{
		{"1#5", 1, "#5"}, {"2#5", 2, "#5"}, {"2-#6", 2, "#6"}, {"2 x 16mm", 2, "16mm"},
		{"2×15M", 2, "15M"}, {"#4", 1, "#4"}, {"16mm", 1, "16mm"}, {"10M", 1, "10M"}, {"3 10M", 3, "10M"},
	}
	for _, tc := range tests {
		b, err := ParseBarCount(tc.in)
		if err != nil || b.Count != tc.count || b.Size.Name != tc.bar {
			t.Errorf("ParseBarCount(%q) = %+v, %v", tc.in, b, err)
		}
	}
	bad := []struct{ in, want string }{
		{"0#5", "zero bars"}, {"2#15", "unknown bar size"}, {"", "empty"}, {"3", "no bar size"},
		{"-2#5", "whole number"}, {"99#5", "more than 50"}, {"123456#5", "too many"},
	}
	for _, tc := range bad {
		_, err := ParseBarCount(tc.in)
		var ue *UnitError
		if !errors.As(err, &ue) || ue.Input != tc.in || !strings.Contains(ue.Msg, tc.want) {
			t.Errorf("ParseBarCount(%q) = %v; want a *UnitError saying %q", tc.in, err, tc.want)
		}
	}
}

func TestBarSpacingStringRoundTrip(t *testing.T) {
	for _, tc := range []struct {
		in  string
		sys System
	}{{"#5@48in", US}, {"16mm@1200mm", SI}, {"#4@16in", US}} {
		b, err := ParseBarSpacing(tc.in, tc.sys)
		if err != nil {
			t.Fatal(err)
		}
		if got := b.String(tc.sys); got != tc.in {
			t.Errorf("String() = %q, want %q", got, tc.in)
		}
	}
}

// FuzzParseBar: any text either reads as bars (a known size, a spacing larger
// than the bar, one to fifty bars) or gives a *UnitError carrying the text.
func FuzzParseBar(f *testing.F) {
	for _, s := range []string{"#5@48in", "16mm@1200mm", "2#5", "1#5", "0#5", "#5@0.1in", "2 x 16mm", "@", "#@#", "ø16@1e400mm", "9999999999#5"} {
		f.Add(s)
	}
	f.Fuzz(func(t *testing.T, s string) {
		if b, err := ParseBarSpacing(s, US); err != nil {
			var ue *UnitError
			if !errors.As(err, &ue) || ue.Input != s || ue.Msg == "" {
				t.Fatalf("ParseBarSpacing(%q): %v", s, err)
			}
		} else if !(b.Spacing > b.Size.Diameter) || math.IsInf(float64(b.Spacing), 0) || b.Size.Area <= 0 {
			t.Fatalf("ParseBarSpacing(%q) = %+v", s, b)
		}
		if b, err := ParseBarCount(s); err != nil {
			var ue *UnitError
			if !errors.As(err, &ue) || ue.Input != s || ue.Msg == "" {
				t.Fatalf("ParseBarCount(%q): %v", s, err)
			}
		} else if b.Count < 1 || b.Count > maxBarCount || b.Size.Area <= 0 {
			t.Fatalf("ParseBarCount(%q) = %+v", s, b)
		}
	})
}
