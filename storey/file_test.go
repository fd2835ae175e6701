package storey

import (
	"errors"
	"math"
	"os"
	"path/filepath"
	"strings"
	"testing"

	"pierwise/geometry"
)

func TestParseWorkshop(t *testing.T) {
	path := filepath.Join("..", "testdata", "storey", "workshop.toml")
	data, err := os.ReadFile(path)
	if err != nil {
		t.Fatal(err)
	}
	if !IsStoreyFile(data) {
		t.Fatal("IsStoreyFile(workshop.toml) = false")
	}
	s, err := Parse(path, data)
	if err != nil {
		t.Fatal(err)
	}
	const ft = float64(geometry.Foot)
	if !near(float64(s.Shear), 120*float64(geometry.Kip), 1e-12) {
		t.Errorf("shear %g N, want 120 kip", float64(s.Shear))
	}
	if !near(float64(s.Size[0])/ft, 80, 1e-12) || !near(float64(s.Size[1])/ft, 50, 1e-12) {
		t.Errorf("size %v", s.Size)
	}
	if len(s.Walls) != 5 || s.Walls[4].Name != "Partition" || s.Walls[3].Direction != Y || !near(float64(s.Walls[1].Position)/ft, 50, 1e-12) {
		t.Errorf("walls %+v", s.Walls)
	}
	if want := filepath.Join("..", "testdata", "storey", "north.toml"); s.Walls[1].Path != want {
		t.Errorf("north wall path %q, want %q (relative to the storey file)", s.Walls[1].Path, want)
	}
	if !near(s.Accidental, 0.05, 1e-15) {
		t.Errorf("accidental %g", s.Accidental)
	}
}

func TestIsStoreyFile(t *testing.T) {
	for _, c := range []struct {
		text string
		want bool
	}{
		{"title = \"a\"\n[storey]\nshear = \"1kip\"\n", true},
		{"[[wall]]\nfile = \"a.toml\"\n", true},
		{"[[wall]]\nfile = \"a.toml\n", true}, // broken TOML, still a storey file
		{"title = \"wall\"\nlength = \"10ft\"\n[[opening]]\nx = 1\n", false},
		{"", false},
	} {
		if got := IsStoreyFile([]byte(c.text)); got != c.want {
			t.Errorf("IsStoreyFile(%q) = %v, want %v", c.text, got, c.want)
		}
	}
}

const goodStorey = `title = "t"
units = "us"

[storey]
shear = "100kip"
mass_center = ["20ft", "10ft"]
size = ["40ft", "20ft"]

[[wall]]
file = "a.toml"
direction = "x"
position = "0ft"

[[wall]]
file = "b.toml"
direction = "y"
position = "40ft"
`

// Every bad input is an error that names the file, the line and the key.
func TestParseErrors(t *testing.T) {
	for _, c := range []struct {
		name, old, new string
		line           int
		key, msg       string
	}{
		{"unknown top key", `title = "t"`, `title = "t"` + "\nheight = 3", 2, "height", "unknown key"},
		{"unknown storey key", `shear = "100kip"`, `shear = "100kip"` + "\nsheer = 1", 6, "storey.sheer", "unknown key"},
		{"unknown wall key", `direction = "x"`, `direction = "x"` + "\nside = 2", 12, "wall[1].side", "unknown key"},
		{"bad force", `shear = "100kip"`, `shear = "100 bananas"`, 5, "storey.shear", "bananas"},
		{"negative shear", `shear = "100kip"`, `shear = "-5kip"`, 5, "storey.shear", "positive"},
		{"bad pair", `size = ["40ft", "20ft"]`, `size = ["40ft"]`, 7, "storey.size", "pair"},
		{"mass centre off the plan", `mass_center = ["20ft", "10ft"]`, `mass_center = ["20ft", "30ft"]`, 6, "storey.mass_center", "off the plan"},
		{"wall off the plan", `position = "40ft"`, `position = "41ft"`, 17, "wall[2].position", "off the plan: a y-wall's position is its x"},
		{"x-wall off the plan", `position = "0ft"`, `position = "21ft"`, 12, "wall[1].position", "off the plan: an x-wall's position is its y"},
		{"bad direction", `direction = "x"`, `direction = "z"`, 11, "wall[1].direction", `"x" or "y"`},
		{"missing file", `file = "b.toml"`, ``, 14, "wall[2].file", "missing"},
		{"missing storey", "[storey]", "[stor]", 4, "stor", "unknown key"},
		{"bad accidental", `size = ["40ft", "20ft"]`, `size = ["40ft", "20ft"]` + "\naccidental = 5", 8, "storey.accidental", "fraction"},
		{"bad units", `units = "us"`, `units = "imperial"`, 2, "units", `"us" or "si"`},
		{"toml syntax", `position = "0ft"`, `position = "0ft`, 12, "", ""},
		// Issue cases: values beyond any building, NaN, angles, both file and rigidity.
		{"shear 1e300kip", `shear = "100kip"`, `shear = "1e300kip"`, 5, "storey.shear", "implausible"},
		{"shear 1e200kip", `shear = "100kip"`, `shear = "1e200kip"`, 5, "storey.shear", "implausible"},
		{"accidental nan", `size = ["40ft", "20ft"]`, `size = ["40ft", "20ft"]` + "\naccidental = nan", 8, "storey.accidental", "fraction"},
		{"plan 1e200ft", `size = ["40ft", "20ft"]`, `size = ["1e200ft", "20ft"]`, 7, "storey.size", "implausible"},
		{"angle nan", `direction = "x"`, `direction = nan`, 11, "wall[1].direction", "finite"},
		{"angle inf", `direction = "x"`, `direction = "inf"`, 11, "wall[1].direction", "finite"},
		{"angle -inf number", `direction = "x"`, `direction = -inf`, 11, "wall[1].direction", "finite"},
		{"angled wall by one length", `direction = "x"`, `direction = 30`, 12, "wall[1].position", "point on its line"},
		{"file and rigidity", `file = "a.toml"`, `file = "a.toml"` + "\nrigidity = \"500kip/in\"", 11, "wall[1].rigidity", "not both"},
		{"rigidity without a name", `file = "a.toml"`, `rigidity = "500kip/in"`, 9, "wall[1].name", "needs a name"},
		{"bad rigidity unit", `file = "a.toml"`, `name = "frame"` + "\nrigidity = \"500kip/furlong\"", 11, "wall[1].rigidity", "unknown length unit"},
		{"rigidity 1e300", `file = "a.toml"`, `name = "frame"` + "\nrigidity = \"1e300kip/in\"", 11, "wall[1].rigidity", "plausible"},
		{"sdc G", `size = ["40ft", "20ft"]`, `size = ["40ft", "20ft"]` + "\nsdc = \"G\"", 8, "storey.sdc", `"A" to "F"`},
		{"diaphragm", `size = ["40ft", "20ft"]`, `size = ["40ft", "20ft"]` + "\ndiaphragm = \"semi\"", 8, "storey.diaphragm", `"rigid", "flexible" or "envelope"`},
		{"basis", `size = ["40ft", "20ft"]`, `size = ["40ft", "20ft"]` + "\nbasis = \"exact\"", 8, "storey.basis", `"classic" or "fe"`},
		{"cd nan", `size = ["40ft", "20ft"]`, `size = ["40ft", "20ft"]` + "\ncd = nan\nheight = \"14ft\"", 8, "storey.cd", "C_d"},
		{"cd without height", `size = ["40ft", "20ft"]`, `size = ["40ft", "20ft"]` + "\ncd = 3.5", 8, "storey.cd", "height"},
		{"drift preset", `size = ["40ft", "20ft"]`, `size = ["40ft", "20ft"]` + "\ncd = 3.5\nheight = 14\ndrift_limit = \"tight\"", 10, "storey.drift_limit", "masonry-cantilever"},
	} {
		t.Run(c.name, func(t *testing.T) {
			text := strings.Replace(goodStorey, c.old, c.new, 1)
			_, err := Parse("plan.toml", []byte(text))
			if err == nil {
				t.Fatalf("no error for\n%s", text)
			}
			var e *Error
			if !errors.As(err, &e) {
				t.Fatalf("error %v is not a *geometry.Error", err)
			}
			if e.File != "plan.toml" || e.Line != c.line || (c.key != "" && e.Key != c.key) || !strings.Contains(e.Msg, c.msg) {
				t.Errorf("got %q (line %d key %q), want line %d key %q with %q", err, e.Line, e.Key, c.line, c.key, c.msg)
			}
		})
	}
	if _, err := Parse("plan.toml", []byte(goodStorey)); err != nil {
		t.Errorf("good storey: %v", err)
	}
}

// The new keys, read: the diaphragm, the basis, the category, the storey
// drift settings, a wall at an angle and a wall given by its rigidity
// (500 kip/in = 500·4448.2216 N / 0.0254 m, NIST SP 811 factors).
func TestParseNewKeys(t *testing.T) {
	text := strings.Replace(goodStorey, `size = ["40ft", "20ft"]`, `size = ["40ft", "20ft"]
diaphragm = "envelope"
basis = "fe"
sdc = "d"
cd = 3.5
ie = 1.25
height = "14ft"
drift_limit = "masonry-other"`, 1) + `
[[wall]]
name = "frame"
rigidity = "500kip/in"
direction = 30
position = ["20ft", "10ft"]
length = "12ft"

[[wall]]
name = "east frame"
rigidity = "90 kN/mm"
direction = "90deg"
position = ["40ft", "10ft"]
`
	s, err := Parse("plan.toml", []byte(text))
	if err != nil {
		t.Fatal(err)
	}
	if s.Diaphragm != Envelope || s.Basis != geometry.BasisFE || s.SDC != "D" || s.Cd != 3.5 || s.Ie != 1.25 || s.DriftLimit != 0.007 || !near(float64(s.Height), 14*0.3048, 1e-12) {
		t.Errorf("storey %+v", s)
	}
	w := s.Walls[2]
	if w.Direction != Angled || !near(w.Angle, math.Pi/6, 1e-12) || !w.HasRigidity || !near(w.Rigidity, 500*4448.2216152605/0.0254, 1e-12) || !near(float64(w.At[0]), 20*0.3048, 1e-12) {
		t.Errorf("angled frame %+v", w)
	}
	// 90° is a y-wall on the line x = 40 ft; 90 kN/mm = 9e7 N/m.
	if e := s.Walls[3]; e.Direction != Y || !near(float64(e.Position), 40*0.3048, 1e-12) || !near(e.Rigidity, 9e7, 1e-12) {
		t.Errorf("east frame %+v", e)
	}
}

// SI storeys: a bare length is metres and a bare force kN (as in wall files, the
// same rule as wall files); units may be mixed with explicit suffixes.
func TestParseSI(t *testing.T) {
	text := `units = "si"
[storey]
shear = 500
mass_center = [12, "7500mm"]
size = ["24m", 15]
[[wall]]
file = "a.toml"
direction = "y"
position = 24
`
	s, err := Parse("si.toml", []byte(text))
	if err != nil {
		t.Fatal(err)
	}
	if s.Units != geometry.SI || !near(float64(s.Shear), 500e3, 1e-12) {
		t.Errorf("units %v shear %g N, want SI and 500 kN", s.Units, float64(s.Shear))
	}
	if !near(float64(s.MassCenter[1]), 7.5, 1e-12) || !near(float64(s.Size[1]), 15, 1e-12) || !near(float64(s.Walls[0].Position), 24, 1e-12) {
		t.Errorf("lengths %v %v %v", s.MassCenter, s.Size, s.Walls[0].Position)
	}
}
