package drawing

import (
	"bytes"
	"encoding/xml"
	"errors"
	"io"
	"math"
	"testing"

	"pierwise/geometry"
	"pierwise/pier"
)

// FuzzWall draws walls of any size with up to three openings and any title:
// the sheet is always well-formed XML with an <svg> root, holds no NaN or
// Inf, and keeps the caution; Wall never panics.
func FuzzWall(f *testing.F) {
	f.Add("Rear wall", 18.0, 16.0, 4.0, 0.0, 4.0, 8.0, 12.0, 2.0, 4.0, 4.0, uint8(2), false)
	f.Add("<&\x1b>", 0.5, 300.0, 0.1, 0.1, 0.2, 0.2, 0.0, 0.0, 0.0, 0.0, uint8(1), true)
	f.Add("", 900.0, 3.0, 10.0, 0.0, 800.0, 2.9, 1.0, 1.0, 1.0, 1.0, uint8(2), false)
	f.Fuzz(func(t *testing.T, title string, L, H, x1, s1, w1, h1, x2, s2, w2, h2 float64, n uint8, si bool) {
		for _, v := range []float64{L, H, x1, s1, w1, h1, x2, s2, w2, h2} {
			if math.IsNaN(v) || math.IsInf(v, 0) || math.Abs(v) > 1e4 {
				return
			}
		}
		if !(L > 0.01) || !(H > 0.01) {
			return
		}
		ft := float64(geometry.Foot)
		sys := geometry.US
		if si {
			sys = geometry.SI
		}
		var ops []geometry.Opening
		for k, o := range [][4]float64{{x1, s1, w1, h1}, {x2, s2, w2, h2}} {
			if k >= int(n%3) || !(o[2] > 0) || !(o[3] > 0) {
				continue
			}
			ops = append(ops, geometry.Opening{Name: "O" + string(rune('1'+k)), X: geometry.Length(o[0] * ft), Sill: geometry.Length(o[1] * ft),
				Width: geometry.Length(o[2] * ft), Height: geometry.Length(o[3] * ft)})
		}
		w := &geometry.Wall{Title: title, Units: sys, Length: geometry.Length(L * ft), Height: geometry.Length(H * ft),
			Thickness: 0.2, Layouts: []geometry.Layout{{Name: "main", Openings: ops}}}
		if w.Validate() != nil {
			return
		}
		in := WallInput{Wall: w, Now: fixedNow, Project: []Entry{{title, title}}}
		if r, err := pier.Solve(w); err == nil {
			in.Piers, in.HasLoad = LeafPiers(r), r.HasLoad
		} else {
			in.NoAnswer = err.Error()
		}
		svg, err := Wall(in)
		if err != nil {
			t.Fatal(err)
		}
		if bytes.Contains(svg, []byte("NaN")) || bytes.Contains(svg, []byte("Inf")) {
			t.Fatal("NaN or Inf in the sheet")
		}
		dec := xml.NewDecoder(bytes.NewReader(svg))
		var text bytes.Buffer
		for {
			tok, err := dec.Token()
			if errors.Is(err, io.EOF) {
				break
			}
			if err != nil {
				t.Fatalf("not well-formed: %v", err)
			}
			if cd, ok := tok.(xml.CharData); ok {
				text.Write(cd)
				text.WriteByte(' ')
			}
		}
		if !bytes.Contains(text.Bytes(), []byte("licensed engineer")) {
			t.Fatal("no caution")
		}
	})
}
