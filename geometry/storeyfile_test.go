package geometry

import (
	"errors"
	"os"
	"strings"
	"testing"
)

// A storey file (docs/method.md §9) given where a wall file is expected gets one
// error that says what it is, at the [storey] line, instead of a list of
// unknown and missing keys; a wall file with a stray [[wall]] table is still
// a wall file with an unknown key.
func TestStoreyFileIsNotAWall(t *testing.T) {
	storey := "title = \"t\"\nunits = \"us\"\n\n[storey]\nshear = \"100kip\"\n\n[[wall]]\nfile = \"a.toml\"\n"
	_, err := Parse("plan.toml", []byte(storey))
	var l ErrorList
	if !errors.As(err, &l) || len(l) != 1 {
		t.Fatalf("err = %v, want one error", err)
	}
	if e := l[0]; e.File != "plan.toml" || e.Line != 4 || e.Key != "storey" || !strings.Contains(e.Msg, "storey file") {
		t.Errorf("got %q (line %d, key %q), want line 4, key storey, saying it is a storey file", e, e.Line, e.Key)
	}

	wall := "length = \"10ft\"\nheight = \"10ft\"\nthickness = \"8in\"\n[material]\nstrength = \"2000psi\"\n[[wall]]\nfile = \"a\"\n"
	_, err = Parse("w.toml", []byte(wall))
	if !errors.As(err, &l) || len(l) != 1 || l[0].Line != 6 || !strings.Contains(l[0].Msg, `unknown key "wall"`) {
		t.Errorf("err = %v, want the unknown key wall at line 6", err)
	}
}

// A size out of the plausible range is shown in the wall's own unit too, so
// that a US user sees the feet they typed (1e5 ft = 30.48 km).
func TestImplausibleSizeInWallUnits(t *testing.T) {
	src := "length = \"1e5ft\"\nheight = \"10ft\"\nthickness = \"8in\"\n[material]\nstrength = \"2000psi\"\n"
	_, err := Parse("big.toml", []byte(src))
	if err == nil || !strings.Contains(err.Error(), "big.toml:1: length: is implausible (1e+05 ft = 3.048e+04 m)") {
		t.Errorf("err = %v", err)
	}
}

// OpeningKey and KeyLine point at an opening's [[opening]] or
// [[variant.opening]] line after parsing (for errors found by the solver).
func TestOpeningKeyAndLine(t *testing.T) {
	src, err := os.ReadFile("../testdata/walls/variants.toml")
	if err != nil {
		t.Fatal(err)
	}
	w, err := Parse("variants.toml", src)
	if err != nil {
		t.Fatal(err)
	}
	lines := strings.Split(string(src), "\n")
	for _, active := range []int{0, 1} {
		w.Active = active
		key := OpeningKey(w, "W2")
		want := map[int]string{0: "opening[3]", 1: "variant[1].opening[3]"}[active]
		if key != want {
			t.Fatalf("layout %d: key %q, want %q", active, key, want)
		}
		n := KeyLine(src, key)
		if n < 1 || n >= len(lines) || !strings.Contains(lines[n-1], "opening]]") || !strings.Contains(lines[n], `name = "W2"`) {
			t.Errorf("layout %d: line %d is not W2's header", active, n)
		}
	}
	if OpeningKey(w, "nope") != "" || KeyLine(src, "nope") != 0 {
		t.Error("unknown names must give nothing")
	}
}
