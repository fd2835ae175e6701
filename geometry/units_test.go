package geometry

import (
	"errors"
	"math"
	"strconv"
	"strings"
	"testing"
)

func near(got, want, rel float64) bool {
	return math.Abs(got-want) <= rel*math.Max(math.Abs(want), 1e-300)
}

// Conversion factors against their published definitions. NIST SP 811
// (2008), Appendix B.8/B.9: 1 in = 2.54 E-02 m and 1 ft = 3.048 E-01 m
// exactly; 1 lbf = 4.448 222 E+00 N; 1 kip = 4.448 222 E+03 N;
// 1 psi = 6.894 757 E+03 Pa; 1 ksi = 6.894 757 E+06 Pa.
func TestUnitFactors(t *testing.T) {
	cases := []struct {
		name      string
		got, want float64
		rel       float64
	}{
		{"inch", float64(Inch), 0.0254, 1e-15},
		{"foot", float64(Foot), 0.3048, 1e-15},
		{"foot is 12 inches", float64(Foot), 12 * float64(Inch), 1e-15},
		{"pound-force", float64(Pound), 4.448222, 1e-6},
		{"kip", float64(Kip), 4448.222, 1e-6},
		{"psi", float64(PSI), 6894.757, 1e-6},
		{"ksi", float64(KSI), 6.894757e6, 1e-6},
		// Common practice: f'm = 2000 psi is quoted as 13.8 MPa.
		{"2000 psi in MPa", float64(2000 * PSI / Megapascal), 13.79, 1e-3},
	}
	for _, c := range cases {
		if !near(c.got, c.want, c.rel) {
			t.Errorf("%s = %.12g, want %.12g", c.name, c.got, c.want)
		}
	}
}

func TestParseLength(t *testing.T) {
	cases := []struct {
		in   string
		sys  System
		want float64 // metres; 1 in = 0.0254 m, 1 ft = 0.3048 m exactly (NIST SP 811)
	}{
		{"12ft", US, 3.6576},
		{"12 ft", US, 3.6576},
		{"  12 ft  ", US, 3.6576},
		{"12 feet", US, 3.6576},
		{"1 foot", US, 0.3048},
		{"7.625in", US, 0.193675},
		{"7.625 inches", US, 0.193675},
		{"7 5/8in", US, 0.193675},
		{"7 5/8 in", US, 0.193675},
		{"1/2in", US, 0.0127},
		{`12'-6"`, US, 3.81},
		{`12'6"`, US, 3.81},
		{`12' 6"`, US, 3.81},
		{`12' - 6"`, US, 3.81},
		{`12'-6 1/2"`, US, 3.8227},
		{`12'-6-1/2"`, US, 3.8227},
		{`12'-0"`, US, 3.6576},
		{`12'`, US, 3.6576},
		{`6"`, US, 0.1524},
		{`7 5/8"`, US, 0.193675},
		{`5/8"`, US, 0.015875},
		{`-2'-6"`, US, -0.762},
		{"12’-6”", US, 3.81},
		{"12′-6″", US, 3.81},
		{"12'-6''", US, 3.81},
		{"12ft 6in", US, 3.81},
		{"12 ft 6 in", US, 3.81},
		{"12ft6in", US, 3.81},
		{"12 feet 6 1/2 inches", US, 3.8227},
		{"3.2m", US, 3.2},
		{"200mm", US, 0.2},
		{"20cm", SI, 0.2},
		{"200 MM", SI, 0.2},
		{"1.5e3mm", SI, 1.5},
		{"12", US, 3.6576}, // bare number: feet in a US wall
		{"3.6", SI, 3.6},   // bare number: metres in an SI wall
		{"0", US, 0},
		{"-3ft", US, -0.9144}, // negative values are the caller's to refuse
		{"+3ft", US, 0.9144},
		{".5m", SI, 0.5},
	}
	for _, c := range cases {
		got, err := ParseLength(c.in, c.sys)
		if err != nil {
			t.Errorf("ParseLength(%q): %v", c.in, err)
			continue
		}
		if !near(float64(got), c.want, 1e-12) && !(c.want == 0 && got == 0) {
			t.Errorf("ParseLength(%q) = %.15g m, want %.15g", c.in, float64(got), c.want)
		}
	}
}

func TestParseLengthErrors(t *testing.T) {
	cases := []struct {
		in, msg string
	}{
		{"", "empty"},
		{"   ", "empty"},
		{"ft", "no number"},
		{"12 yd", `unknown unit "yd"`},
		{"12 fts", `unknown unit "fts"`},
		{"nan", "not a finite number"},
		{"NaN m", "not a finite number"},
		{"inf", "not a finite number"},
		{"-Inf ft", "not a finite number"},
		{"infinity", "not a finite number"},
		{"1e400", "out of range"},
		{"1e400mm", "out of range"},
		{"0x10", `unexpected "x10"`},
		{"1_000mm", `unexpected "_000mm"`},
		{"12ft 6mm", "give inches"},
		{"12ft 6", "give inches"},
		{"-12ft -6in", "minus sign"},
		{"12ft 6in 3", "give inches"},
		{"12m 6in", `unexpected "m 6in"`},
		{"12..5ft", `unexpected`},
		{`12'-`, "inches missing"},
		{`12'6`, `must end with "`},
		{`'6"`, "feet"},
		{`"`, "inches"},
		{`12'-x"`, "inches"},
		{`12'--6"`, "minus sign"},
		{`6 1/0"`, "zero denominator"},
		{"1/0 in", "zero denominator"},
		{`1e400'`, "out of range"},
		// After the feet the inches are a remainder: 12'-13" is a slip
		// (common practice writes 13'-1").
		{`12'-13"`, `less than 12 (did you mean 13'-1"?)`},
		{`12'12"`, "less than 12"},
		{"12ft 12in", "less than 12"},
	}
	for _, c := range cases {
		_, err := ParseLength(c.in, US)
		if err == nil {
			t.Errorf("ParseLength(%q) = nil error, want one about %q", c.in, c.msg)
			continue
		}
		var ue *UnitError
		if !errors.As(err, &ue) || ue.Input != c.in || ue.Quantity != "length" {
			t.Errorf("ParseLength(%q): error %#v does not carry the input", c.in, err)
		}
		if !strings.Contains(err.Error(), c.msg) || !strings.Contains(err.Error(), strconv.Quote(c.in)) {
			t.Errorf("ParseLength(%q) error %q, want it to quote the input and say %q", c.in, err, c.msg)
		}
	}
}

func TestParseForceStress(t *testing.T) {
	// Reference values from NIST SP 811, Appendix B (see TestUnitFactors).
	forces := []struct {
		in   string
		sys  System
		want float64 // N
	}{
		{"40kip", US, 40 * 4448.222},
		{"40 kips", US, 40 * 4448.222},
		{"40", US, 40 * 4448.222}, // bare: kip
		{"500lb", US, 500 * 4.448222},
		{"500 lbf", US, 500 * 4.448222},
		{"178kN", SI, 178e3},
		{"178", SI, 178e3}, // bare: kN
		{"1500 N", SI, 1500},
		{"2MN", SI, 2e6},
	}
	for _, c := range forces {
		got, err := ParseForce(c.in, c.sys)
		if err != nil || !near(float64(got), c.want, 1e-6) {
			t.Errorf("ParseForce(%q) = %g, %v; want %g N", c.in, float64(got), err, c.want)
		}
	}
	stresses := []struct {
		in   string
		sys  System
		want float64 // Pa
	}{
		{"2000psi", US, 2000 * 6894.757},
		{"2000", US, 2000 * 6894.757}, // bare: psi
		{"1800 ksi", US, 1800 * 6.894757e6},
		{"13.8MPa", SI, 13.8e6},
		{"13.8", SI, 13.8e6}, // bare: MPa
		{"24.9 GPa", SI, 24.9e9},
		{"500kPa", SI, 500e3},
		{"1e6 Pa", SI, 1e6},
	}
	for _, c := range stresses {
		got, err := ParseStress(c.in, c.sys)
		if err != nil || !near(float64(got), c.want, 1e-6) {
			t.Errorf("ParseStress(%q) = %g, %v; want %g Pa", c.in, float64(got), err, c.want)
		}
	}
	for _, in := range []string{"", "kip", "40 tons", "nan", "inf kip", "1e999kN", "12ft"} {
		if _, err := ParseForce(in, US); err == nil {
			t.Errorf("ParseForce(%q): no error", in)
		} else if !strings.Contains(err.Error(), "force") {
			t.Errorf("ParseForce(%q) error %q does not say force", in, err)
		}
	}
	for _, in := range []string{"", "psf", "2000 bar", "NaN", "1e999psi", `12"`} {
		if _, err := ParseStress(in, US); err == nil {
			t.Errorf("ParseStress(%q): no error", in)
		}
	}
}

func TestFormat(t *testing.T) {
	ft, in := Foot, Inch
	cases := []struct {
		got, want string
	}{
		{FormatLength(12*ft+6*in, US), `12'-6"`},
		{FormatLength(12*ft, US), `12'-0"`},
		{FormatLength(12*ft+6.5*in, US), `12'-6 1/2"`},
		{FormatLength(12*ft+0.375*in, US), `12'-0 3/8"`},
		{FormatLength(7.625*in, US), `7 5/8"`},
		{FormatLength(0.5*in, US), `1/2"`},
		{FormatLength(11.96*in, US), `1'-0"`},      // rounds to the nearest 1/8 in, carrying into feet
		{FormatLength(6*in+0.07*in, US), `6 1/8"`}, // 6.07 in is nearer 6 1/8 than 6
		{FormatLength(-30*in, US), `-2'-6"`},
		{FormatLength(0, US), `0"`},
		{FormatLength(3.6, SI), "3.600 m"},
		{FormatLength(0.19, SI), "0.190 m"},
		{FormatForce(40*Kip, US), "40.0 kip"},
		{FormatForce(178*Kilonewton, SI), "178 kN"},
		{FormatForce(1234.6*Kilonewton, SI), "1235 kN"},
		{FormatForce(0.5*Kip, US), "0.500 kip"},
		{FormatStress(2000*PSI, US), "2000 psi"},
		{FormatStress(1800*KSI, US), "1800 ksi"},
		{FormatStress(13.79*Megapascal, SI), "13.8 MPa"},
	}
	for _, c := range cases {
		if c.got != c.want {
			t.Errorf("got %q, want %q", c.got, c.want)
		}
	}
	// What FormatLength shows reads back within the rounding it promises.
	for _, l := range []Length{0.1, 1, 3.81, 7.123, 12.0001, 100} {
		s := FormatLength(l, US)
		back, err := ParseLength(s, US)
		if err != nil || math.Abs(float64(back-l)) > float64(Inch)/16+1e-12 {
			t.Errorf("FormatLength(%g) = %q reads back as %g, %v", float64(l), s, float64(back), err)
		}
		s = FormatLength(l, SI)
		back, err = ParseLength(s, SI)
		if err != nil || math.Abs(float64(back-l)) > 0.0005+1e-12 {
			t.Errorf("FormatLength(%g, SI) = %q reads back as %g, %v", float64(l), s, float64(back), err)
		}
	}
}

func TestExactFormsReadBack(t *testing.T) {
	// Marshal's writers must give text that reads back bit for bit, also for
	// values that are not round in any unit.
	vals := []float64{3.6576, 0.193675, 1e-9, 123.456789012345, 0.1 + 0.2, math.Pi, 1e12, -2.5, math.SmallestNonzeroFloat64, math.MaxFloat64 / 2}
	for _, sys := range []System{US, SI} {
		for _, v := range vals {
			s := exactLength(Length(v), sys)
			if got, err := ParseLength(s, sys); err != nil || float64(got) != v {
				t.Errorf("exactLength(%g, %v) = %q reads back as %g, %v", v, sys, s, float64(got), err)
			}
			f := exactForce(Force(v), sys)
			if got, err := ParseForce(f, sys); err != nil || float64(got) != v {
				t.Errorf("exactForce(%g, %v) = %q reads back as %g, %v", v, sys, f, float64(got), err)
			}
			st := exactStress(Stress(v), sys)
			if got, err := ParseStress(st, sys); err != nil || float64(got) != v {
				t.Errorf("exactStress(%g, %v) = %q reads back as %g, %v", v, sys, st, float64(got), err)
			}
		}
	}
	// Natural units where they are exact.
	natural := []struct {
		got, want string
	}{
		{exactLength(18*Foot, US), "18ft"},
		{exactLength(7.625*Inch, US), "7.625in"},
		{exactLength(150*Inch, US), `12'-6"`},
		{exactLength(3.6, SI), "3.6m"},
		{exactLength(0.19, SI), "190mm"},
		{exactForce(40*Kip, US), "40kip"},
		{exactForce(150*Kilonewton, SI), "150kN"},
		{exactStress(2000*PSI, US), "2000psi"},
		{exactStress(1800*KSI, US), "1800ksi"},
		{exactStress(12*Megapascal, SI), "12MPa"},
	}
	for _, c := range natural {
		if c.got != c.want {
			t.Errorf("got %q, want %q", c.got, c.want)
		}
	}
}
