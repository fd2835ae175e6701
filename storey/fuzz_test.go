package storey

import (
	"errors"
	"math"
	"strings"
	"testing"
)

// FuzzParse: any input gives either a storey whose values are finite and
// inside the plan, or errors that all name the file (never a panic).
func FuzzParse(f *testing.F) {
	f.Add(goodStorey)
	f.Add(strings.Replace(goodStorey, `"40ft"`, `"-3ft"`, 1))
	f.Add("[storey]\nshear = 1\nsize = [1, 1]\nmass_center = [0.5, 0.5]\n[[wall]]\nfile = \"a\"\ndirection = \"x\"\nposition = 1e308\n")
	f.Add(goodStorey + "\n[[wall]]\nname = \"f\"\nrigidity = \"500kip/in\"\ndirection = 30\nposition = [\"10ft\", \"5ft\"]\n")
	f.Add(strings.Replace(goodStorey, `size = ["40ft", "20ft"]`, "size = [\"40ft\", \"20ft\"]\ndiaphragm = \"envelope\"\nsdc = \"D\"\ncd = 3.5\nheight = 14\ndrift_limit = 0.007\nbasis = \"fe\"", 1))
	f.Fuzz(func(t *testing.T, text string) {
		s, err := Parse("f.toml", []byte(text))
		if err != nil {
			var e *Error
			if !errors.As(err, &e) || e.File != "f.toml" {
				t.Fatalf("error %q does not name the file", err)
			}
			return
		}
		fin := func(v float64) bool { return !math.IsNaN(v) && !math.IsInf(v, 0) }
		if !(s.Shear > 0) || !fin(float64(s.Shear)) || !(s.Size[0] > 0) || !(s.Size[1] > 0) || !fin(float64(s.Size[0])) || !fin(float64(s.Size[1])) {
			t.Fatalf("bad storey accepted: %+v", s)
		}
		if float64(s.Shear) > maxShear || !(s.Accidental >= 0 && s.Accidental < 0.5) || (s.Cd != 0 && !(s.Cd >= 1 && s.Cd <= 10)) || !(s.Ie >= 1 && s.Ie <= 1.5) {
			t.Fatalf("value out of range accepted: %+v", s)
		}
		for _, w := range s.Walls {
			if w.File == "" == !w.HasRigidity {
				t.Fatalf("a wall needs exactly one of file and rigidity: %+v", w)
			}
			if w.HasRigidity && (!(w.Rigidity > 0) || w.Rigidity > maxRig || w.Name == "") {
				t.Fatalf("bad rigidity accepted: %+v", w)
			}
			switch w.Direction {
			case Angled:
				if !fin(w.Angle) || !inside(w.At[0], s.Size[0]) || !inside(w.At[1], s.Size[1]) {
					t.Fatalf("angled wall accepted: %+v", w)
				}
			default:
				if !inside(w.Position, s.Size[w.Direction.other()]) {
					t.Fatalf("wall off the plan accepted: %+v", w)
				}
			}
		}
		if !IsStoreyFile([]byte(text)) {
			t.Fatalf("a valid storey file is not recognised")
		}
	})
}
