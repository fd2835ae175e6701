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
		for _, w := range s.Walls {
			if !inside(w.Position, s.Size[w.Direction.other()]) || w.File == "" {
				t.Fatalf("wall off the plan accepted: %+v", w)
			}
		}
		if !IsStoreyFile([]byte(text)) {
			t.Fatalf("a valid storey file is not recognised")
		}
	})
}
