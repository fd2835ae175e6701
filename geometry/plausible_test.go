package geometry

import (
	"errors"
	"strings"
	"testing"
)

// A strength far outside what masonry and concrete reach is a unit slip:
// strength = 2000 in an SI file is 2000 MPa (f'm of concrete masonry is a
// few to about 40 MPa, f'c up to about 100 MPa; common practice). It is an
// error at its line; everyday strengths pass.
func TestImplausibleStrengthIsAnError(t *testing.T) {
	wall := func(units, strength string) string {
		return "units = \"" + units + "\"\nlength = \"10\"\nheight = \"3\"\nthickness = \"0.2\"\n[material]\nstrength = \"" + strength + "\"\n"
	}
	for _, c := range []struct{ units, strength string }{
		{"si", "2000"}, {"us", "2"}, {"si", "0.5MPa"}, {"us", "50ksi"},
	} {
		_, err := Parse("w.toml", []byte(wall(c.units, c.strength)))
		var l ErrorList
		if !errors.As(err, &l) || len(l) != 1 || l[0].Line != 6 || l[0].Key != "material.strength" || !strings.Contains(l[0].Msg, "check the unit") {
			t.Errorf("%s %q: err = %v, want one implausible-strength error at line 6", c.units, c.strength, err)
		}
	}
	for _, c := range []struct{ units, strength string }{
		{"si", "12"}, {"si", "100MPa"}, {"us", "1500"}, {"us", "4000psi"},
	} {
		if _, err := Parse("w.toml", []byte(wall(c.units, c.strength))); err != nil {
			t.Errorf("%s %q: %v", c.units, c.strength, err)
		}
	}
}

// thickness = 8 in a US file is 8 ft, a unit left out (shear walls are a
// few inches to about two feet thick; common practice): an error at its
// line. 7.625 in and 200 mm pass.
func TestImplausibleThicknessIsAnError(t *testing.T) {
	wall := func(units, thick string) string {
		return "units = \"" + units + "\"\nlength = \"30ft\"\nheight = \"12ft\"\nthickness = " + thick + "\n[material]\nstrength = \"2000psi\"\n"
	}
	for _, c := range []struct{ units, thick string }{{"us", "8"}, {"si", "190"}, {"us", `"1in"`}} {
		_, err := Parse("w.toml", []byte(wall(c.units, c.thick)))
		var l ErrorList
		if !errors.As(err, &l) || len(l) != 1 || l[0].Line != 4 || l[0].Key != "thickness" || !strings.Contains(l[0].Msg, "check the unit") {
			t.Errorf("%s %s: err = %v, want one implausible-thickness error at line 4", c.units, c.thick, err)
		}
	}
	for _, c := range []struct{ units, thick string }{{"us", `"7.625in"`}, {"si", `"200mm"`}, {"si", "0.19"}} {
		if _, err := Parse("w.toml", []byte(wall(c.units, c.thick))); err != nil {
			t.Errorf("%s %s: %v", c.units, c.thick, err)
		}
	}
}

// modulus = 1500 in a US file is 1500 psi, a thousand times softer than
// the 1500 ksi meant (masonry E is some 5–30 GPa, concrete 20–50 GPa;
// common practice): an error at its line, as is an E_v far out of range.
func TestImplausibleModulusIsAnError(t *testing.T) {
	wall := func(extra string) string {
		return "length = \"30ft\"\nheight = \"12ft\"\nthickness = \"8in\"\n[material]\nkind = \"custom\"\n" + extra
	}
	for _, c := range []struct{ extra, key string }{
		{"modulus = 1500\n", "material.modulus"},
		{"modulus = \"1500ksi\"\nshear_modulus = 600\n", "material.shear_modulus"},
		{"modulus = \"1000GPa\"\n", "material.modulus"},
	} {
		_, err := Parse("w.toml", []byte(wall(c.extra)))
		var l ErrorList
		if !errors.As(err, &l) || len(l) != 1 || l[0].Key != c.key || !strings.Contains(l[0].Msg, "check the unit") {
			t.Errorf("%q: err = %v, want one implausible error on %s", c.extra, err, c.key)
		}
	}
	if _, err := Parse("w.toml", []byte(wall("modulus = \"1500ksi\"\nshear_modulus = \"600ksi\"\n"))); err != nil {
		t.Errorf("1500 ksi, 600 ksi: %v", err)
	}
}
