package geometry

import (
	"errors"
	"math"
	"strings"
	"testing"
)

const nuWall = `units = "us"
length = "20ft"
height = "10ft"
thickness = "8in"
[material]
kind = "concrete"
strength = "4000psi"
poisson = 0.2
`

// docs/method.md §3: a custom E_v may be given as Poisson's ratio ν instead
// (E_v = E/(2(1+ν)), isotropic elasticity, Gere & Timoshenko). It is read,
// written back and read again unchanged; out-of-range values and ν together
// with shear_modulus are errors naming the line and the key.
func TestPoissonReadWriteAndErrors(t *testing.T) {
	w, err := Parse("nu.toml", []byte(nuWall))
	if err != nil {
		t.Fatal(err)
	}
	if math.Abs(w.Material.Poisson-0.2) > 1e-15 {
		t.Fatalf("Poisson = %g, want 0.2", w.Material.Poisson)
	}
	data, err := Marshal(w)
	if err != nil {
		t.Fatal(err)
	}
	back, err := Parse("back.toml", data)
	if err != nil || back.Material != w.Material {
		t.Errorf("round trip: %v, material %+v, want %+v\n%s", err, back.Material, w.Material, data)
	}
	// The editor's save keeps comments and must keep ν too.
	kept, err := MarshalKeeping([]byte(nuWall), w)
	if err != nil {
		t.Fatal(err)
	}
	if back, err := Parse("kept.toml", kept); err != nil || back.Material != w.Material {
		t.Errorf("save keeping comments: %v, material %+v\n%s", err, back.Material, kept)
	}

	for _, c := range []struct{ text, msg string }{
		{strings.Replace(nuWall, "0.2", "0.5", 1), "below 0.5"},
		{strings.Replace(nuWall, "0.2", "-0.1", 1), "above 0"},
		{strings.Replace(nuWall, "0.2", `"0.2"`, 1), "must be a number"},
		{nuWall + `shear_modulus = "1500ksi"` + "\n", "not both"},
	} {
		_, err := Parse("nu.toml", []byte(c.text))
		var l ErrorList
		if !errors.As(err, &l) || len(l) != 1 || l[0].Key != "material.poisson" || l[0].Line != 8 || !strings.Contains(l[0].Msg, c.msg) {
			t.Errorf("err = %v, want one error at line 8, material.poisson, with %q", err, c.msg)
		}
	}
}
