package geometry

import (
	"errors"
	"math"
	"math/rand/v2"
	"os"
	"path/filepath"
	"reflect"
	"strconv"
	"strings"
	"testing"
)

func wallFiles(t testing.TB) []string {
	files, err := filepath.Glob(filepath.Join("..", "testdata", "walls", "*.toml"))
	if err != nil || len(files) == 0 {
		t.Fatalf("no example walls found: %v", err)
	}
	return files
}

func TestExampleWalls(t *testing.T) {
	for _, f := range wallFiles(t) {
		w, err := LoadFile(f)
		if err != nil {
			t.Errorf("%s: %v", f, err)
			continue
		}
		if w.Material.Strength <= 0 || w.Thickness <= 0 || w.Load.Shear <= 0 {
			t.Errorf("%s: every example needs a material strength, a thickness and a shear", f)
		}
	}
}

// The published walls carry the geometry their sources print.
func TestPublishedExampleGeometry(t *testing.T) {
	ft := float64(Foot)
	// Masonry Chronicles nested-opening wall (docs/method.md §2).
	w, err := LoadFile("../testdata/walls/nested.toml")
	if err != nil {
		t.Fatal(err)
	}
	want := []Rect{{4 * ft, 0, 8 * ft, 8 * ft}, {12 * ft, 2 * ft, 16 * ft, 6 * ft}}
	if !near(float64(w.Length), 18*ft, 1e-12) || !near(float64(w.Height), 16*ft, 1e-12) || w.Support != Cantilever {
		t.Errorf("nested wall is %g × %g m, %v; want 18 ft × 16 ft cantilever", float64(w.Length), float64(w.Height), w.Support)
	}
	for i, o := range w.Openings() {
		r := o.Rect()
		if !near(r.X0+1, want[i].X0+1, 1e-12) || !near(r.Y0+1, want[i].Y0+1, 1e-12) || !near(r.X1, want[i].X1, 1e-12) || !near(r.Y1, want[i].Y1, 1e-12) {
			t.Errorf("nested opening %d at %+v, want %+v", i, r, want[i])
		}
	}
	// Taly, Design of Reinforced Masonry Structures, 2nd ed., Example E7.3.
	w, err = LoadFile("../testdata/walls/fixed.toml")
	if err != nil {
		t.Fatal(err)
	}
	if !near(float64(w.Length), 44*ft, 1e-12) || !near(float64(w.Height), 20*ft, 1e-12) || w.Support != Fixed ||
		!near(float64(w.Thickness/Inch), 7.625, 1e-12) || !near(float64(w.Material.Strength/PSI), 2000, 1e-12) ||
		w.Material.Kind != ConcreteMasonry || len(w.Openings()) != 0 {
		t.Errorf("fixed.toml does not hold Taly E7.3: %+v", w)
	}
}

// Parse(Marshal(w)) must give back w exactly: a lossless round trip is
// the point, so float64 values are compared bit for bit here on purpose.
func TestRoundTripExampleWalls(t *testing.T) {
	for _, f := range wallFiles(t) {
		w, err := LoadFile(f)
		if err != nil {
			t.Fatalf("%s: %v", f, err)
		}
		checkRoundTrip(t, f, w)
	}
}

func checkRoundTrip(t testing.TB, name string, w *Wall) {
	t.Helper()
	data, err := Marshal(w)
	if err != nil {
		t.Fatalf("%s: Marshal: %v", name, err)
	}
	back, err := Parse(name, data)
	if err != nil {
		t.Fatalf("%s: Parse(Marshal(w)): %v\n%s", name, err, data)
	}
	if !reflect.DeepEqual(normal(w), normal(back)) {
		t.Fatalf("%s: round trip changed the wall\nbefore %+v\nafter  %+v\n%s", name, w, back, data)
	}
	again, err := Marshal(back)
	if err != nil || string(again) != string(data) {
		t.Fatalf("%s: Marshal is not stable:\n%s\n---\n%s", name, data, again)
	}
}

// normal makes empty and nil opening lists the same for comparison.
func normal(w *Wall) *Wall {
	c := w.Clone()
	for k := range c.Layouts {
		if len(c.Layouts[k].Openings) == 0 {
			c.Layouts[k].Openings = nil
		}
	}
	return c
}

func TestRoundTripRandomWalls(t *testing.T) {
	rng := rand.New(rand.NewPCG(uint64(20261201), 0))
	for n := 0; n < 500; n++ {
		w := randomWall(rng)
		if err := w.Validate(); err != nil {
			t.Fatalf("random wall %d is not valid (generator bug): %v", n, err)
		}
		checkRoundTrip(t, "random-"+strconv.Itoa(n), w)
	}
}

// randomWall makes a valid wall with values on a building grid or
// arbitrary floats, openings in columns that cannot overlap, and variants.
func randomWall(rng *rand.Rand) *Wall {
	sys := System(rng.IntN(2))
	grid := float64(Inch)
	if sys == SI {
		grid = float64(Millimetre)
	}
	val := func(lo, hi float64) float64 {
		v := lo + rng.Float64()*(hi-lo)
		if rng.IntN(3) > 0 {
			v = math.Max(grid, math.Round(v/grid)*grid)
		}
		return v
	}
	titles := []string{"", "Wall A", `quote " and \ backslash`, "tab\tand\nnewline", "ünïcödé — 12'-6\"", "#not a comment", "\x7f\x01"}
	w := &Wall{
		Title:     titles[rng.IntN(len(titles))],
		Units:     sys,
		Length:    Length(val(2, 40)),
		Height:    Length(val(2, 15)),
		Thickness: Length(val(0.1, 0.4)),
		Support:   Support(rng.IntN(2)),
		Material: Material{
			Kind:     MaterialKind(rng.IntN(4)),
			Strength: Stress(val(5e6, 4e7)),
		},
		Stiffness: Stiffness{Flexure: 1, Shear: 1},
	}
	if w.Material.Kind == Custom || rng.IntN(4) == 0 {
		w.Material.Modulus = Stress(val(5e9, 3e10))
	}
	if rng.IntN(3) == 0 {
		w.Material.ShearModulus = Stress(val(2e9, 1e10))
	}
	if rng.IntN(5) > 0 {
		w.Load.Shear = Force(val(1e3, 1e6))
	}
	if rng.IntN(2) == 0 {
		w.Stiffness = Stiffness{Flexure: rng.Float64() + 0.01, Shear: 0.35}
	}
	switch rng.IntN(3) {
	case 0:
		p := DriftPresets[rng.IntN(len(DriftPresets))]
		w.Drift = Drift{Cd: 1 + rng.Float64()*5, Ie: 1.25, Preset: p.Name, Limit: p.Limit}
	case 1:
		w.Drift = Drift{Cd: 4, Ie: 1, Limit: 0.001 + rng.Float64()*0.099}
	}
	if rng.IntN(3) == 0 {
		w.Check = Check{Mesh: Length(val(0.05, 0.5)), Element: Elements[rng.IntN(len(Elements))]}
	}
	nl := 1 + rng.IntN(3)
	for k := 0; k < nl; k++ {
		lay := Layout{Name: []string{"main", "as drawn", "door moved", "v" + strconv.Itoa(k)}[rng.IntN(4)]}
		if k > 0 || rng.IntN(2) == 0 {
			lay.Name += " " + strconv.Itoa(k)
		}
		cols := rng.IntN(6)
		cw := float64(w.Length) / float64(max(cols, 1))
		for c := 0; c < cols; c++ {
			if rng.IntN(4) == 0 {
				continue
			}
			x0 := float64(c) * cw
			o := Opening{Name: "O" + strconv.Itoa(c)}
			o.Width = Length(math.Min(val(0.05*cw, 0.9*cw), 0.95*cw))
			o.X = Length(math.Min(x0+rng.Float64()*(cw-float64(o.Width)), x0+cw-float64(o.Width)))
			if o.X < Length(x0) {
				o.X = Length(x0)
			}
			if rng.IntN(2) == 0 {
				o.Sill = 0
			} else {
				o.Sill = Length(rng.Float64() * 0.5 * float64(w.Height))
			}
			o.Height = Length(math.Min(val(0.05, float64(w.Height)-float64(o.Sill)), float64(w.Height)-float64(o.Sill)))
			if o.Height <= 0 || o.X+o.Width > w.Length || o.Sill+o.Height > w.Height {
				continue
			}
			lay.Openings = append(lay.Openings, o)
		}
		w.Layouts = append(w.Layouts, lay)
	}
	w.Active = rng.IntN(len(w.Layouts))
	return w
}

// wallText is a valid wall file that the error tests break one line at a
// time. Line numbers matter: keep them in step with the cases below.
const wallText = `title = "test"
units = "us"
length = "20ft"
height = "10ft"
thickness = "7.625in"
support = "cantilever"

[material]
kind = "concrete-masonry"
strength = "2000psi"

[load]
shear = "10kip"

[[opening]]
name = "W1"
x = "2ft"
sill = "3ft"
width = "4ft"
height = "4ft"

[[opening]]
name = "W2"
x = "10ft"
sill = "3ft"
width = "4ft"
height = "4ft"
`

func TestParseValidText(t *testing.T) {
	w, err := Parse("wall.toml", []byte(wallText))
	if err != nil {
		t.Fatal(err)
	}
	if len(w.Layouts) != 1 || w.Layouts[0].Name != DefaultLayout || len(w.Openings()) != 2 {
		t.Fatalf("unexpected layouts %+v", w.Layouts)
	}
	// Defaults of geometry/doc.go and the README's wall file.
	if w.Units != US || w.Support != Cantilever || w.Stiffness != (Stiffness{1, 1}) || w.Drift != (Drift{}) {
		t.Errorf("defaults not applied: %+v %+v", w.Stiffness, w.Drift)
	}
}

func TestParseErrors(t *testing.T) {
	cases := []struct {
		name    string
		edit    func(string) string
		line    int
		key     string
		message string
	}{
		{"unknown top key", repl(`support = "cantilever"`, `support = "cantilever"`+"\ncolour = \"red\""), 7, "colour", `unknown key "colour"`},
		{"unknown material key", repl(`kind = "concrete-masonry"`, `knid = "concrete-masonry"`), 9, "material.knid", "unknown key"},
		{"unknown opening key", repl(`name = "W2"`, `name = "W2"`+"\nwidht = \"4ft\""), 24, "opening[2].widht", "unknown key"},
		{"bad unit", repl(`length = "20ft"`, `length = "20 yd"`), 3, "length", `unknown unit "yd"`},
		{"not finite", repl(`height = "10ft"`, `height = nan`), 4, "height", "finite"},
		{"not finite text", repl(`height = "10ft"`, `height = "inf ft"`), 4, "height", "finite"},
		{"wrong type", repl(`thickness = "7.625in"`, `thickness = true`), 5, "thickness", "true/false"},
		{"zero thickness", repl(`thickness = "7.625in"`, `thickness = "0in"`), 5, "thickness", "greater than zero"},
		{"negative length", repl(`length = "20ft"`, `length = "-20ft"`), 3, "length", "greater than zero"},
		{"missing height", repl(`height = "10ft"`, ``), 0, "height", "missing"},
		{"bad units", repl(`units = "us"`, `units = "imperial"`), 2, "units", `unknown unit system "imperial"`},
		{"bad support", repl(`support = "cantilever"`, `support = "pinned"`), 6, "support", `unknown support "pinned"`},
		{"bad material", repl(`kind = "concrete-masonry"`, `kind = "adobe"`), 9, "material.kind", `unknown material "adobe"`},
		{"custom without modulus", repl(`kind = "concrete-masonry"`, `kind = "custom"`), 8, "material.modulus", "required"},
		{"missing strength", repl(`strength = "2000psi"`, ``), 8, "material.strength", "missing"},
		{"zero strength", repl(`strength = "2000psi"`, `strength = "0psi"`), 10, "material.strength", "greater than zero"},
		{"negative modulus", repl(`strength = "2000psi"`, `strength = "2000psi"`+"\nmodulus = \"-5ksi\""), 11, "material.modulus", "greater than zero"},
		{"bad shear", repl(`shear = "10kip"`, `shear = "10 tonnes"`), 13, "load.shear", `unknown unit "tonnes"`},
		{"opening outside", repl(`x = "10ft"`, `x = "17ft"`), 22, "opening[2]", "past the right end"},
		{"opening above", repl(`sill = "3ft"`+"\nwidth = \"4ft\"\nheight = \"4ft\"\n", `sill = "7ft"`+"\nwidth = \"4ft\"\nheight = \"4ft\"\n"), 15, "opening[1]", "above the top"},
		{"overlap", repl(`x = "10ft"`, `x = "5ft"`), 22, "opening[2]", "overlaps opening W1"},
		{"duplicate name", repl(`name = "W2"`, `name = "W1"`), 23, "opening[2].name", `"W1" is already used`},
		{"missing width", repl(`width = "4ft"`+"\nheight = \"4ft\"\n\n[[opening]]", `height = "4ft"`+"\n\n[[opening]]"), 15, "opening[1].width", "missing"},
		{"zero width", repl(`x = "10ft"`+"\nsill = \"3ft\"\nwidth = \"4ft\"", `x = "10ft"`+"\nsill = \"3ft\"\nwidth = \"0ft\""), 26, "opening[2].width", "greater than zero"},
		{"negative sill", repl(`sill = "3ft"`, `sill = "-3ft"`), 18, "opening[1].sill", "must not be negative"},
		{"load not a table", func(s string) string {
			return strings.Replace(strings.Replace(s, "[load]\nshear = \"10kip\"\n", "", 1), "support = \"cantilever\"\n", "support = \"cantilever\"\nload = 5\n", 1)
		}, 7, "load", "must be a table"},
		{"opening not a list of tables", func(s string) string {
			return strings.Replace(s[:strings.Index(s, "[[opening]]")], "support = \"cantilever\"\n", "support = \"cantilever\"\nopening = [1, 2]\n", 1)
		}, 7, "opening", "must be a list of tables"},
		{"toml syntax", repl(`height = "10ft"`, `height = "10ft`), 4, "", "not valid TOML"},
		{"toml duplicate key", repl(`height = "10ft"`, `height = "10ft"`+"\nheight = \"12ft\""), 5, "", "not valid TOML"},
		{"drift preset", add("\n[drift]\nlimit = \"masonry-sideways\"\n"), 30, "drift.limit", `unknown preset "masonry-sideways"`},
		{"drift limit high", add("\n[drift]\nlimit = 0.2\n"), 30, "drift.limit", "at most 0.1"},
		{"drift limit zero", add("\n[drift]\nlimit = 0\n"), 30, "drift.limit", "greater than 0"},
		{"drift cd", add("\n[drift]\ncd = -4\n"), 30, "drift.cd", "greater than zero"},
		{"stiffness negative", add("\n[stiffness]\nflexure = -0.35\n"), 30, "stiffness.flexure", "greater than zero"},
		{"stiffness text", add("\n[stiffness]\nshear = \"half\"\n"), 30, "stiffness.shear", "must be a number"},
		{"check element", add("\n[check]\nelement = \"q9\"\n"), 30, "check.element", `unknown element "q9"`},
		{"check mesh", add("\n[check]\nmesh = \"-3in\"\n"), 30, "check.mesh", "greater than zero"},
		{"active unknown", repl(`support = "cantilever"`, `support = "cantilever"`+"\nactive = \"plan B\""), 7, "active", `no layout named "plan B"`},
		{"variant without name", add("\n[[variant]]\n\n[[variant.opening]]\nx = \"1ft\"\nwidth = \"1ft\"\nheight = \"1ft\"\n"), 29, "variant[1].name", "missing"},
		{"variant opening outside", add("\n[[variant]]\nname = \"b\"\n\n[[variant.opening]]\nx = \"1ft\"\nwidth = \"1ft\"\nheight = \"1ft\"\n\n[[variant.opening]]\nx = \"19.5ft\"\nwidth = \"1ft\"\nheight = \"1ft\"\n"), 37, "variant[1].opening[2]", "past the right end"},
		{"variant duplicate name", add("\n[[variant]]\nname = \"main\"\n"), 30, "variant[1].name", `"main" is already used`},
		{"unknown variant key", add("\n[[variant]]\nname = \"b\"\nopenings = 3\n"), 31, "variant[1].openings", "unknown key"},
	}
	for _, c := range cases {
		t.Run(c.name, func(t *testing.T) {
			text := c.edit(wallText)
			if text == wallText {
				t.Fatal("the edit changed nothing (test bug)")
			}
			w, err := Parse("wall.toml", []byte(text))
			if err == nil {
				t.Fatalf("no error for\n%s", text)
			}
			if w != nil {
				t.Errorf("a wall came back with the error")
			}
			var list ErrorList
			if !errors.As(err, &list) || len(list) == 0 {
				t.Fatalf("error %T is not an ErrorList", err)
			}
			var found *Error
			for _, e := range list {
				if e.File != "wall.toml" {
					t.Errorf("error %q does not name the file", e)
				}
				if e.Key == c.key && strings.Contains(e.Msg, c.message) {
					found = e
				}
			}
			if found == nil && c.key == "" {
				found = list[0]
			}
			if found == nil || !strings.Contains(found.Msg, c.message) {
				t.Fatalf("no error with key %q saying %q in:\n%v", c.key, c.message, err)
			}
			if found.Line != c.line {
				t.Errorf("error %q: line %d, want %d\n%s", found, found.Line, c.line, numbered(text))
			}
			prefix := "wall.toml:"
			if c.line > 0 {
				prefix += strconv.Itoa(c.line) + ":"
			}
			if c.key != "" {
				prefix += " " + c.key + ":"
			}
			if !strings.HasPrefix(found.Error(), prefix) {
				t.Errorf("message %q does not start with %q", found.Error(), prefix)
			}
		})
	}
}

func repl(old, new string) func(string) string {
	return func(s string) string { return strings.Replace(s, old, new, 1) }
}

func add(extra string) func(string) string {
	return func(s string) string { return s + extra }
}

func numbered(s string) string {
	var b strings.Builder
	for i, l := range strings.Split(s, "\n") {
		b.WriteString(strconv.Itoa(i+1) + "\t" + l + "\n")
	}
	return b.String()
}

// All problems are reported at once, in the order of the file.
func TestParseReportsAllErrors(t *testing.T) {
	text := strings.NewReplacer(`length = "20ft"`, `length = "20 yd"`, `kind = "concrete-masonry"`, `kind = "adobe"`,
		`x = "10ft"`, `x = "5ft"`, `name = "W2"`, `name = "W1"`).Replace(wallText) + "\n[drift]\nlimit = 7\n"
	_, err := Parse("w.toml", []byte(text))
	var list ErrorList
	if !errors.As(err, &list) {
		t.Fatalf("got %v", err)
	}
	keys := []string{}
	for _, e := range list {
		keys = append(keys, e.Key)
	}
	want := []string{"length", "material.kind", "opening[2]", "opening[2].name", "drift.limit"}
	for _, k := range want {
		if !strings.Contains(strings.Join(keys, " "), k) {
			t.Errorf("key %s not reported; got %v", k, keys)
		}
	}
	for i := 1; i < len(list); i++ {
		if list[i].Line < list[i-1].Line {
			t.Errorf("errors out of file order: %v", err)
		}
	}
	if n := strings.Count(err.Error(), "\n") + 1; n != len(list) {
		t.Errorf("Error() has %d lines for %d errors", n, len(list))
	}
}

func TestParseDefaultsAndForms(t *testing.T) {
	text := `units = "si"
length = 9.6
height = 3.6
thickness = "190 mm"
layout = "as drawn"
active = "b"

[material]
kind = "concrete"
strength = 30

[drift]
limit = "0.015"

[[opening]]
x = 1
width = 1
height = "2100mm"

[[opening]]
x = 3
sill = "0.9m"
width = 1
height = 1

[[opening]]
name = "D1"
x = 5
width = 1
height = 2

[[variant]]
name = "b"
`
	w, err := Parse("si.toml", []byte(text))
	if err != nil {
		t.Fatal(err)
	}
	ops := w.Layouts[0].Openings
	// Unnamed openings get the next free door or window name: D1 is taken
	// by the third opening, so the first door becomes D2.
	if ops[0].Name != "D2" || ops[1].Name != "W1" || ops[2].Name != "D1" {
		t.Errorf("auto names %q %q %q, want D2 W1 D1", ops[0].Name, ops[1].Name, ops[2].Name)
	}
	if w.Layouts[0].Name != "as drawn" || w.Active != 1 || len(w.Layouts[1].Openings) != 0 {
		t.Errorf("layouts %+v active %d", w.Layouts, w.Active)
	}
	if !near(float64(w.Length), 9.6, 1e-15) || !near(float64(w.Material.Strength), 30e6, 1e-15) || !near(w.Drift.Limit, 0.015, 1e-15) {
		t.Errorf("bare numbers not read in SI base units: %+v", w)
	}
}

func TestSave(t *testing.T) {
	dir := t.TempDir()
	path := filepath.Join(dir, "wall.toml")
	w, err := Parse("wall.toml", []byte(wallText))
	if err != nil {
		t.Fatal(err)
	}
	if err := os.WriteFile(path, []byte("old"), 0o600); err != nil {
		t.Fatal(err)
	}
	w.Layouts[0].Openings[0].Width = 5 * Foot
	if err := Save(path, w); err != nil {
		t.Fatal(err)
	}
	fi, err := os.Stat(path)
	if err != nil || fi.Mode().Perm() != 0o600 {
		t.Errorf("file mode %v, %v; want 0600 kept", fi.Mode(), err)
	}
	back, err := LoadFile(path)
	if err != nil || !reflect.DeepEqual(normal(back), normal(w)) {
		t.Errorf("saved wall reads back as %+v, %v", back, err)
	}
	entries, _ := os.ReadDir(dir)
	if len(entries) != 1 {
		t.Errorf("temporary files left behind: %v", entries)
	}
	// A new file, and a link that keeps pointing at its file.
	link := filepath.Join(dir, "link.toml")
	if err := os.Symlink("wall.toml", link); err == nil {
		w.Title = "through the link"
		if err := Save(link, w); err != nil {
			t.Fatal(err)
		}
		if fi, err := os.Lstat(link); err != nil || fi.Mode()&os.ModeSymlink == 0 {
			t.Errorf("the link was replaced by a file")
		}
		if back, err := LoadFile(path); err != nil || back.Title != "through the link" {
			t.Errorf("the linked file was not written: %v", err)
		}
	}
	if err := Save(filepath.Join(dir, "missing", "w.toml"), w); err == nil {
		t.Errorf("Save into a missing directory gave no error")
	}
	bad := w.Clone()
	bad.Length = Length(math.NaN())
	if err := Save(path, bad); err == nil {
		t.Errorf("Save of a wall with a NaN length gave no error")
	}
	if back, err := LoadFile(path); err != nil || back.Title != "through the link" && back.Title != "test" {
		t.Errorf("a failed save damaged the file: %v", err)
	}
	if _, err := LoadFile(filepath.Join(dir, "nope.toml")); !errors.Is(err, os.ErrNotExist) {
		t.Errorf("LoadFile of a missing file: %v", err)
	}
}

func TestScanKeyLines(t *testing.T) {
	src := `a = 1 # x = 2
"quoted.key" = 3
dotted.key = 4
s = """
b = 5
"""
arr = [
  "c = 6",
]
[t]
k = "# not a comment"
[[o]]
k = 1
[[o]]
[[o.p]]
k = 2
[[o]]
[[o.p]]
k = 3
[[o.p]]
`
	kl := scanKeyLines(src)
	want := map[string]int{
		"a": 1, "quoted.key": 2, "dotted": 3, "dotted.key": 3, "s": 4, "arr": 7, "t": 10, "t.k": 11,
		"o[1]": 12, "o[1].k": 13, "o[2]": 14, "o[2].p[1]": 15, "o[2].p[1].k": 16, "o[3]": 17, "o[3].p[1]": 18, "o[3].p[1].k": 19, "o[3].p[2]": 20,
	}
	for k, n := range want {
		if kl[k] != n {
			t.Errorf("line of %q = %d, want %d", k, kl[k], n)
		}
	}
	for _, k := range []string{"b", "x", "c"} {
		if _, ok := kl[k]; ok {
			t.Errorf("key %q inside a string or comment was mapped", k)
		}
	}
	if kl.find("o[3].p[2].missing") != 20 || kl.find("nothing") != 0 {
		t.Errorf("find does not fall back to the enclosing table")
	}
}

// The commented example wall file (the file format in its fullest form) reads as it says.
func TestDesignExampleFile(t *testing.T) {
	text := `title = "Rear wall, grid 4"        # free text
units = "us"                       # "us" (ft, in, kip, psi) or "si" (m, mm, kN, MPa); default "us"
length = "36ft"                    # a length: number + unit (in, ft, mm, cm, m), or feet-inches 12'-6"
height = "14ft"                    # a bare number is ft ("us") or m ("si")
thickness = "7.625in"
support = "cantilever"             # or "fixed"

[material]
kind = "concrete-masonry"          # "concrete-masonry", "clay-masonry", "concrete", "custom"
strength = "2000psi"               # f'm for masonry, f'c for concrete
# modulus = "1800ksi"              # E, required for "custom"; overrides the preset otherwise
# shear_modulus = "720ksi"         # E_v; default 0.4 E

[load]
shear = "40kip"                    # in-plane shear at the top of the wall (optional)

[[opening]]
name = "D1"
x = "4ft"                          # wall's left end to the opening's left edge
sill = "0"                         # wall's base to the opening's bottom edge (0 for a door)
width = "10ft"
height = "10ft"
`
	w, err := Parse("design.toml", []byte(text))
	if err != nil {
		t.Fatal(err)
	}
	ft := float64(Foot)
	o := w.Openings()[0]
	checks := []struct {
		name      string
		got, want float64
	}{
		{"length", float64(w.Length), 36 * ft},
		{"height", float64(w.Height), 14 * ft},
		{"thickness", float64(w.Thickness), 7.625 * float64(Inch)},
		{"strength", float64(w.Material.Strength), 2000 * float64(PSI)},
		{"shear", float64(w.Load.Shear), 40 * float64(Kip)},
		{"x", float64(o.X), 4 * ft},
		{"width", float64(o.Width), 10 * ft},
		{"height", float64(o.Height), 10 * ft},
	}
	for _, c := range checks {
		if !near(c.got, c.want, 1e-12) {
			t.Errorf("%s = %g, want %g", c.name, c.got, c.want)
		}
	}
	if w.Title != "Rear wall, grid 4" || o.Name != "D1" || o.Sill != 0 || !o.IsDoor() || w.Material.Modulus != 0 {
		t.Errorf("unexpected wall %+v", w)
	}
}
