package drawing

import (
	"bytes"
	"encoding/xml"
	"errors"
	"fmt"
	"image"
	"image/color"
	"io"
	"math"
	"os"
	"path/filepath"
	"strconv"
	"strings"
	"testing"
	"time"

	"github.com/fyne-io/oksvg"
	"github.com/srwiley/rasterx"

	"pierwise/geometry"
	"pierwise/internal/testkit"
	"pierwise/pier"
	"pierwise/pier/fe"
	"pierwise/report"
	"pierwise/storey"
)

// fixedNow keeps the title block's date out of the golden files' diffs.
var fixedNow = time.Date(2026, 12, 1, 9, 30, 0, 0, time.UTC)

func loadWall(t testing.TB, name string) (*geometry.Wall, *pier.Result) {
	t.Helper()
	w, err := geometry.LoadFile(filepath.Join("..", "testdata", "walls", name))
	if err != nil {
		t.Fatal(err)
	}
	r, err := pier.Solve(w)
	if err != nil {
		t.Fatal(err)
	}
	return w, r
}

func wallInput(path string, w *geometry.Wall, r *pier.Result) WallInput {
	return WallInput{Path: path, Wall: w, Basis: "classic strip method", Piers: LeafPiers(r), HasLoad: r.HasLoad,
		Warnings: pier.Texts(r.Warnings), Now: fixedNow, Version: "test"}
}

// wellFormed parses the whole document with encoding/xml.
func wellFormed(t *testing.T, svg []byte) {
	t.Helper()
	dec := xml.NewDecoder(bytes.NewReader(svg))
	n := 0
	for {
		_, err := dec.Token()
		if errors.Is(err, io.EOF) {
			break
		}
		if err != nil {
			t.Fatalf("not well-formed XML after %d tokens: %v", n, err)
		}
		n++
	}
	if n < 20 {
		t.Fatalf("only %d tokens", n)
	}
}

func golden(t *testing.T, name string, got []byte) {
	t.Helper()
	testkit.Golden(t, name, string(got))
}

// pxPerMM is the resolution of the test rasters.
const pxPerMM = 2.0

// raster renders an SVG with a pure-Go SVG renderer (fyne-io/oksvg with
// srwiley/rasterx), as an independent viewer would. Text is not rendered by
// it; shapes, paths and fills are.
func raster(t testing.TB, svg []byte) *image.RGBA {
	t.Helper()
	// The renderer draws no text: drop the text elements, then read the
	// rest strictly, so an element or attribute it cannot draw fails.
	icon, err := oksvg.ReadIconStream(bytes.NewReader(withoutText(t, svg)), oksvg.StrictErrorMode)
	if err != nil {
		t.Fatalf("the renderer cannot read the SVG: %v", err)
	}
	w, h := int(icon.ViewBox.W*pxPerMM), int(icon.ViewBox.H*pxPerMM)
	icon.SetTarget(0, 0, float64(w), float64(h))
	img := image.NewRGBA(image.Rect(0, 0, w, h))
	sc := rasterx.NewScannerGV(w, h, img, img.Bounds())
	icon.Draw(rasterx.NewDasher(w, h, sc), 1)
	return img
}

// withoutText returns the document without its text and tspan elements.
func withoutText(t testing.TB, svg []byte) []byte {
	t.Helper()
	dec := xml.NewDecoder(bytes.NewReader(svg))
	var out bytes.Buffer
	enc := xml.NewEncoder(&out)
	skip := 0
	for {
		tok, err := dec.Token()
		if errors.Is(err, io.EOF) {
			break
		}
		if err != nil {
			t.Fatal(err)
		}
		switch e := tok.(type) {
		case xml.StartElement:
			if skip > 0 || e.Name.Local == "text" {
				skip++
				continue
			}
			e.Name.Space = ""
			for i := range e.Attr {
				e.Attr[i].Name.Space = ""
			}
			tok = e
		case xml.EndElement:
			if skip > 0 {
				skip--
				continue
			}
			e.Name.Space = ""
			tok = e
		case xml.CharData, xml.ProcInst, xml.Comment:
			if skip > 0 {
				continue
			}
		}
		if err := enc.EncodeToken(xml.CopyToken(tok)); err != nil {
			t.Fatal(err)
		}
	}
	if err := enc.Flush(); err != nil {
		t.Fatal(err)
	}
	return out.Bytes()
}

// patch returns the share of pixels in a (2r+1)² square around sheet point
// (x, y) mm that are within tol of colour c in every channel.
func patch(img *image.RGBA, x, y float64, r int, c color.RGBA, tol int) float64 {
	cx, cy := int(x*pxPerMM), int(y*pxPerMM)
	n, hit := 0, 0
	for j := cy - r; j <= cy+r; j++ {
		for i := cx - r; i <= cx+r; i++ {
			p := img.RGBAAt(i, j)
			n++
			if abs(int(p.R)-int(c.R)) <= tol && abs(int(p.G)-int(c.G)) <= tol && abs(int(p.B)-int(c.B)) <= tol {
				hit++
			}
		}
	}
	return float64(hit) / float64(n)
}

// darkest returns the smallest channel value in a (2r+1)² square around
// sheet point (x, y) mm.
func darkest(img *image.RGBA, x, y float64, r int) uint8 {
	cx, cy := int(x*pxPerMM), int(y*pxPerMM)
	m := uint8(255)
	for j := cy - r; j <= cy+r; j++ {
		for i := cx - r; i <= cx+r; i++ {
			p := img.RGBAAt(i, j)
			m = min(m, p.R, p.G, p.B)
		}
	}
	return m
}

func abs(v int) int {
	if v < 0 {
		return -v
	}
	return v
}

func hex(s string) color.RGBA {
	var r, g, b uint8
	fmt.Sscanf(s, "#%02x%02x%02x", &r, &g, &b)
	return color.RGBA{r, g, b, 255}
}

var white = color.RGBA{255, 255, 255, 255}

// anywhere reports whether colour c appears (within tol) in the sheet
// rectangle [x0, x1] × [y0, y1] mm.
func anywhere(img *image.RGBA, x0, y0, x1, y1 float64, c color.RGBA, tol int) bool {
	for j := int(y0 * pxPerMM); j < int(y1*pxPerMM); j++ {
		for i := int(x0 * pxPerMM); i < int(x1*pxPerMM); i++ {
			p := img.RGBAAt(i, j)
			if abs(int(p.R)-int(c.R)) <= tol && abs(int(p.G)-int(c.G)) <= tol && abs(int(p.B)-int(c.B)) <= tol {
				return true
			}
		}
	}
	return false
}

// TestWallGolden draws three example walls: a nested opening (US, shares), an
// SI wall (millimetre dimensions, forces) and a two-storey wall (eight
// piers), compares them with their golden files, and renders each.
func TestWallGolden(t *testing.T) {
	for _, c := range []struct {
		file string
		show Show
	}{
		{"nested.toml", Shares},
		{"si.toml", Forces},
		{"two-storey.toml", Shares},
	} {
		t.Run(c.file, func(t *testing.T) {
			w, r := loadWall(t, c.file)
			in := wallInput("testdata/walls/"+c.file, w, r)
			in.Show = c.show
			in.Project = []Entry{{"Project", "Example (test data)"}, {"Job", "T-1"}}
			svg, err := Wall(in)
			if err != nil {
				t.Fatal(err)
			}
			wellFormed(t, svg)
			golden(t, strings.TrimSuffix(c.file, ".toml")+"."+c.show.String()+".svg", svg)
			checkWallPixels(t, w, in, raster(t, svg))
		})
	}
}

// checkWallPixels: every opening is empty (white at its corners' insides,
// away from the tag), every leaf pier is filled with its class's colour, and
// the legend shows every class's colour.
func checkWallPixels(t *testing.T, w *geometry.Wall, in WallInput, img *image.RGBA) {
	t.Helper()
	s := newWallSheet(w)
	for _, o := range w.Openings() {
		r := o.Rect()
		x, y := s.at(r.X0+0.1*r.W(), r.Y0+0.1*r.H())
		if f := patch(img, x, y, 2, white, 6); f < 0.95 {
			t.Errorf("opening %s is not empty near its lower-left corner (%.0f %% white)", o.Name, 100*f)
		}
	}
	for _, p := range in.Piers {
		pt, ok := paintOf(in, p)
		if !ok {
			continue
		}
		// A quarter in from the pier's lower-left corner, clear of the
		// label at its centre.
		x, y := s.at(p.Rect.X0+0.2*p.Rect.W(), p.Rect.Y0+0.2*p.Rect.H())
		if f := patch(img, x, y, 3, hex(pt.Fill), 12); f < 0.5 {
			t.Errorf("pier %s: only %.0f %% of the patch has its fill %s", p.Name, 100*f, pt.Fill)
		}
	}
	lx := s.sh.W - margin - sideW
	for i, pt := range sharePaints {
		if !anywhere(img, lx, margin, s.sh.W-margin, margin+60, hex(pt.Fill), 6) {
			t.Errorf("legend: class %d's colour %s is missing", i, pt.Fill)
		}
	}
	// The wall's outline is drawn: black at the middle of its base.
	x, y := s.at(float64(w.Length)/2, 0)
	if v := darkest(img, x, y, 2); v > 140 { // the renderer draws hairlines light
		t.Errorf("no outline at the middle of the base (darkest %d)", v)
	}
}

// TestWallField maps the shear stress over the nested wall: the openings
// stay empty, the piers are coloured from the map (not white, not the plain
// wall grey) and the colour bar is in the legend.
func TestWallField(t *testing.T) {
	w, r := loadWall(t, "nested.toml")
	f, err := fe.StressField(w, r, fe.Options{})
	if err != nil {
		t.Fatal(err)
	}
	for _, comp := range []Component{Shear, Vertical} {
		in := wallInput("nested.toml", w, r)
		in.Field, in.Component = f, comp
		svg, err := Wall(in)
		if err != nil {
			t.Fatal(err)
		}
		wellFormed(t, svg)
		if len(svg) > 400_000 {
			t.Errorf("%s map: %d bytes; keep the file under 400 kB", comp, len(svg))
		}
		img := raster(t, svg)
		s := newWallSheet(w)
		for _, o := range w.Openings() {
			rc := o.Rect()
			x, y := s.at(rc.X0+0.1*rc.W(), rc.Y0+0.1*rc.H())
			if fr := patch(img, x, y, 2, white, 6); fr < 0.95 {
				t.Errorf("%s: opening %s is painted (%.0f %% white)", comp, o.Name, 100*fr)
			}
		}
		for _, p := range in.Piers {
			x, y := s.at(p.Rect.X0+0.2*p.Rect.W(), p.Rect.Y0+0.3*p.Rect.H())
			if patch(img, x, y, 2, white, 3) > 0.5 || patch(img, x, y, 2, hex(solidFill), 3) > 0.5 {
				t.Errorf("%s: pier %s is not coloured by the map", comp, p.Name)
			}
		}
		lx := s.sh.W - margin - sideW
		for _, k := range []int{0, fieldLevels / 2, fieldLevels - 1} {
			if !anywhere(img, lx, margin, s.sh.W-margin, margin+80, hex(fieldColour(k)), 4) {
				t.Errorf("%s: the colour bar lacks level %d (%s)", comp, k, fieldColour(k))
			}
		}
	}
}

// TestShearMapMatchesPierShare: the shear map's values are the model's
// stresses times V/t, so the mean τ across a pier at mid-height is close to
// the pier's shear over its area, V_i/(L_i·t). The FE and classic shares
// differ by several points (fe's documentation), so 30 %.
func TestShearMapMatchesPierShare(t *testing.T) {
	w, r := loadWall(t, "nested.toml")
	f, err := fe.StressField(w, r, fe.Options{})
	if err != nil {
		t.Fatal(err)
	}
	m := newStressMap(f, Shear, w)
	for _, p := range LeafPiers(r) {
		y := (p.Rect.Y0 + p.Rect.Y1) / 2
		sum, n := 0.0, 0
		for k := 0; k < 50; k++ {
			x := p.Rect.X0 + (float64(k)+0.5)/50*p.Rect.W()
			s, ok := f.At(x, y)
			if ok {
				sum += s.XY * m.scale
				n++
			}
		}
		mean := sum / float64(n)
		want := float64(p.Shear) / (p.Rect.W() * float64(w.Thickness)) / float64(geometry.PSI)
		if math.Abs(mean/want-1) > 0.3 {
			t.Errorf("pier %s: mean τ %.1f psi, V_i/(L_i t) %.1f psi", p.Name, mean, want)
		}
	}
}

// TestEscaping: a title, an opening name and a path with <, & and control
// characters come out as well-formed XML whose text reads back as given
// (with U+FFFD for the characters XML cannot hold).
func TestEscaping(t *testing.T) {
	w, r := loadWall(t, "nested.toml")
	w.Title = "Rear <wall> & \"grid\" 4\x1b[31m red\x07"
	w.Layouts[w.Active].Openings[0].Name = "D<1>&"
	in := wallInput("dir/a&b<c>.toml", w, r)
	in.Project = []Entry{{"Client", "A & B <Ltd>"}}
	svg, err := Wall(in)
	if err != nil {
		t.Fatal(err)
	}
	wellFormed(t, svg)
	if bytes.ContainsAny(svg, "\x1b\x07") {
		t.Error("a control character reached the SVG")
	}
	texts := allText(t, svg)
	for _, want := range []string{"Rear <wall> & \"grid\" 4\uFFFD[31m red\uFFFD", "D<1>&", "File: dir/a&b<c>.toml", "Client: A & B <Ltd>"} {
		if !strings.Contains(texts, want) {
			t.Errorf("text %q not found in the SVG's text", want)
		}
	}
}

// allText returns the character data of the document, one element per line.
func allText(t *testing.T, svg []byte) string {
	dec := xml.NewDecoder(bytes.NewReader(svg))
	var b strings.Builder
	for {
		tok, err := dec.Token()
		if err != nil {
			break
		}
		if cd, ok := tok.(xml.CharData); ok {
			b.Write(cd)
			b.WriteByte('\n')
		}
	}
	return b.String()
}

// TestRatios: without pier design the legend says so and the piers are left
// unfilled; with a ratio function the piers take the ratio classes.
func TestRatios(t *testing.T) {
	w, r := loadWall(t, "nested.toml")
	in := wallInput("nested.toml", w, r)
	in.Show = Ratios
	svg, err := Wall(in)
	if err != nil {
		t.Fatal(err)
	}
	if !strings.Contains(allText(t, svg), "Pier design is not available yet") {
		t.Error("the sheet does not say that pier design is missing")
	}
	ratios := map[string]float64{"P1": 0.3, "P2.1": 1.2, "P2.2": 0.8}
	in.Ratio = func(name string) (float64, bool) { v, ok := ratios[name]; return v, ok }
	svg, err = Wall(in)
	if err != nil {
		t.Fatal(err)
	}
	wellFormed(t, svg)
	img := raster(t, svg)
	s := newWallSheet(w)
	for _, p := range in.Piers {
		want := ratioPaints[classOf(ratios[p.Name], ratioBounds)]
		x, y := s.at(p.Rect.X0+0.2*p.Rect.W(), p.Rect.Y0+0.2*p.Rect.H())
		if f := patch(img, x, y, 3, hex(want.Fill), 12); f < 0.5 {
			t.Errorf("pier %s (D/C %.2f): not filled with %s", p.Name, ratios[p.Name], want.Fill)
		}
	}
	if !strings.Contains(allText(t, svg), "D/C 1.20") {
		t.Error("the ratio of P2.1 is not printed")
	}
}

// TestStoreyGolden draws the workshop storey and checks it.
func TestStoreyGolden(t *testing.T) {
	a, err := storey.Load(filepath.Join("..", "testdata", "storey", "workshop.toml"))
	if err != nil {
		t.Fatal(err)
	}
	a.Storey.Path = "testdata/storey/workshop.toml"
	svg, err := Storey(StoreyInput{Analysis: a, Now: fixedNow, Version: "test"})
	if err != nil {
		t.Fatal(err)
	}
	wellFormed(t, svg)
	golden(t, "workshop.plan.svg", svg)
	text := allText(t, svg)
	for _, wl := range a.Walls {
		if !strings.Contains(text, wl.Name) {
			t.Errorf("wall %q not named on the plan", wl.Name)
		}
	}
	flat := strings.Join(strings.Fields(text), " ")
	wants := []string{"CM (40.00, 25.00) ft", "CR (", Caution}
	for _, wl := range a.Walls { // each wall's design shear, as the storey package gives it
		wants = append(wants, "V = "+geometry.FormatForce(geometry.Force(wl.Design.Shear), a.Storey.Units))
	}
	for _, want := range wants {
		if !strings.Contains(flat, want) {
			t.Errorf("%q missing", want)
		}
	}
	img := raster(t, svg)
	// Each wall's line is black at its middle; the diaphragm is tinted.
	var walls []*geometry.Wall
	for _, wl := range a.Walls {
		walls = append(walls, wl.Wall)
	}
	ws := storeySheet(a.Storey)
	for i, wl := range a.Walls {
		mid := float64(wl.Ref.Start) + float64(walls[i].Length)/2
		var x, y float64
		if wl.Ref.Direction == storey.X {
			x, y = ws.at(mid, float64(wl.Ref.Position))
		} else {
			x, y = ws.at(float64(wl.Ref.Position), mid)
		}
		if f := patch(img, x, y, 0, color.RGBA{0, 0, 0, 255}, 40); f < 1 {
			t.Errorf("wall %s: no heavy bar at its middle", wl.Name)
		}
	}
	x, y := ws.at(10*0.3048, 10*0.3048)
	if f := patch(img, x, y, 2, hex("#f4f4f0"), 4); f < 0.9 {
		t.Error("the diaphragm is not tinted")
	}
}

// TestScaleChoice: the chosen scale is the largest of the list at which the
// object fits (the next larger one does not), and a huge object still gets
// a scale at which it fits.
func TestScaleChoice(t *testing.T) {
	for _, c := range []struct {
		sys  geometry.System
		w, h float64 // metres
	}{
		{geometry.US, 18 * 0.3048, 16 * 0.3048}, {geometry.US, 100 * 0.3048, 24 * 0.3048},
		{geometry.SI, 9.6, 3.6}, {geometry.SI, 0.5, 0.4}, {geometry.SI, 5000, 10}, {geometry.US, 3000, 3000},
	} {
		const aw, ah = 230.0, 160.0
		sc := chooseScale(c.sys, c.w, c.h, aw, ah)
		if c.w*1000/sc.Den > aw+1e-9 || c.h*1000/sc.Den > ah+1e-9 {
			t.Errorf("%v %gx%g m: %s does not fit", c.sys, c.w, c.h, sc.Name)
		}
		list := usScales
		if c.sys == geometry.SI {
			list = siScales
		}
		for _, larger := range list {
			if larger.Den < sc.Den && c.w*1000/larger.Den <= aw && c.h*1000/larger.Den <= ah {
				t.Errorf("%v %gx%g m: %s chosen, but %s fits", c.sys, c.w, c.h, sc.Name, larger.Name)
			}
		}
	}
}

// TestHatch: every hatch segment lies inside its rectangle at 45°, and the
// segments of one family are Spacing apart.
func TestHatch(t *testing.T) {
	for _, pt := range sharePaints {
		var p pathBuilder
		x0, y0, x1, y1 := 12.3, 40.1, 31.7, 95.2
		hatch(&p, pt, x0, y0, x1, y1)
		var segs [][4]float64
		for _, part := range strings.Split(p.String(), "M")[1:] {
			var a, b, c, d float64
			if _, err := fmt.Sscanf(part, "%g %gL%g %g", &a, &b, &c, &d); err != nil {
				t.Fatalf("%q: %v", part, err)
			}
			segs = append(segs, [4]float64{a, b, c, d})
		}
		if len(segs) == 0 {
			t.Fatalf("%s: no hatch", pt.Fill)
		}
		rising := 0
		for _, s := range segs {
			for _, v := range [][2]float64{{s[0], s[1]}, {s[2], s[3]}} {
				if v[0] < x0-0.01 || v[0] > x1+0.01 || v[1] < y0-0.01 || v[1] > y1+0.01 {
					t.Fatalf("%s: point %v outside the rectangle", pt.Fill, v)
				}
			}
			if math.Abs(math.Abs(s[2]-s[0])-math.Abs(s[3]-s[1])) > 0.02 {
				t.Fatalf("%s: segment %v not at 45°", pt.Fill, s)
			}
			if (s[2]-s[0])*(s[3]-s[1]) > 0 {
				rising++
			}
		}
		// Family y = x − c: neighbouring c differ by Spacing·√2, so
		// neighbouring lines are Spacing apart.
		first := segs[0]
		second := segs[1]
		dc := math.Abs((second[0] - second[1]) - (first[0] - first[1]))
		if math.Abs(dc-pt.Spacing*math.Sqrt2) > 0.03 {
			t.Errorf("%s: lines %.3f apart along x, want %.3f", pt.Fill, dc, pt.Spacing*math.Sqrt2)
		}
		if !pt.Cross && rising != len(segs) {
			t.Errorf("%s: a single hatch has both diagonals", pt.Fill)
		}
		if pt.Cross && (rising == 0 || rising == len(segs)) {
			t.Errorf("%s: a cross hatch lacks a diagonal", pt.Fill)
		}
	}
}

// A wall given by its rigidity with a length, along x or at an angle, is
// drawn on the plan as the text report's plan sketch places it: along its
// line from its start, or centred on its given point (the invented
// workshop with its mezzanine frame, plus an angled brace).
func TestStoreyGivenAndAngledWalls(t *testing.T) {
	dir := t.TempDir()
	src := filepath.Join("..", "testdata", "storey")
	entries, err := os.ReadDir(src)
	if err != nil {
		t.Fatal(err)
	}
	for _, e := range entries {
		b, err := os.ReadFile(filepath.Join(src, e.Name()))
		if err != nil {
			t.Fatal(err)
		}
		if e.Name() == "workshop-frame.toml" {
			b = append(b, "\n[[wall]]\nname = \"Angled brace\"\nrigidity = \"300kip/in\"\ndirection = 30\nposition = [\"60ft\", \"20ft\"]\nlength = \"20ft\"\n"...)
		}
		if err := os.WriteFile(filepath.Join(dir, e.Name()), b, 0o644); err != nil {
			t.Fatal(err)
		}
	}
	a, err := storey.Load(filepath.Join(dir, "workshop-frame.toml"))
	if err != nil {
		t.Fatal(err)
	}
	svg, err := Storey(StoreyInput{Analysis: a, Now: fixedNow, Version: "test"})
	if err != nil {
		t.Fatal(err)
	}
	wellFormed(t, svg)
	text := strings.Join(strings.Fields(allText(t, svg)), " ")
	for _, want := range []string{"Mezzanine frame", "Angled brace", "30°", "given"} {
		if !strings.Contains(text, want) {
			t.Errorf("%q missing from the plan", want)
		}
	}
	img := raster(t, svg)
	ws := storeySheet(a.Storey)
	ft := 0.3048
	for _, p := range []struct {
		name string
		x, y float64
	}{
		{"Mezzanine frame (50 to 74 ft along y = 35 ft)", 62 * ft, 35 * ft},
		{"Angled brace (centred on 60, 20 ft)", 60 * ft, 20 * ft},
		{"Angled brace, 8 ft from its centre at 30°", (60 + 8*math.Cos(math.Pi/6)) * ft, (20 + 8*math.Sin(math.Pi/6)) * ft},
	} {
		x, y := ws.at(p.x, p.y)
		if f := patch(img, x, y, 0, color.RGBA{0, 0, 0, 255}, 40); f < 1 {
			t.Errorf("%s: no heavy bar", p.name)
		}
	}
}

// A drawing of a wall with unsaved edits (the editor's snapshot) says so
// beside its file name, as the snapshot's report heading does; a saved one
// does not.
func TestUnsavedTitleBlock(t *testing.T) {
	w, r := loadWall(t, "nested.toml")
	for _, unsaved := range []bool{false, true} {
		in := wallInput("nested.toml", w, r)
		in.Unsaved = unsaved
		svg, err := Wall(in)
		if err != nil {
			t.Fatal(err)
		}
		if got := strings.Contains(allText(t, svg), "unsaved changes"); got != unsaved {
			t.Errorf("unsaved %v: the title block says unsaved changes: %v", unsaved, got)
		}
	}
}

// The plan's note on the design shear follows the diaphragm: on a flexible
// diaphragm it is the wall line's tributary shear, not "the worst case,
// never below the direct shear" of the rigid one (the invented workshop).
func TestStoreyFlexibleNote(t *testing.T) {
	dir := t.TempDir()
	src := filepath.Join("..", "testdata", "storey")
	entries, err := os.ReadDir(src)
	if err != nil {
		t.Fatal(err)
	}
	for _, e := range entries {
		b, err := os.ReadFile(filepath.Join(src, e.Name()))
		if err != nil {
			t.Fatal(err)
		}
		if e.Name() == "workshop.toml" {
			b = []byte(strings.Replace(string(b), "[storey]\n", "[storey]\ndiaphragm = \"flexible\"\n", 1))
		}
		if err := os.WriteFile(filepath.Join(dir, e.Name()), b, 0o644); err != nil {
			t.Fatal(err)
		}
	}
	a, err := storey.Load(filepath.Join(dir, "workshop.toml"))
	if err != nil {
		t.Fatal(err)
	}
	if a.Storey.Diaphragm != storey.Flexible {
		t.Fatal("the copy is not flexible")
	}
	svg, err := Storey(StoreyInput{Analysis: a, Now: fixedNow, Version: "test"})
	if err != nil {
		t.Fatal(err)
	}
	text := strings.Join(strings.Fields(allText(t, svg)), " ")
	if strings.Contains(text, "torsion does not relieve") || !strings.Contains(text, "tributary shear") {
		t.Errorf("the flexible plan's note is the rigid one:\n%s", text)
	}
}

// The drawings print forces, moments, shares and relative rigidities to
// three significant figures through report.Sig, as every other view does
// (docs/method.md §1): each "V …"/"M …" label of the SI wall and each
// number of the storey plan's wall table is already in Sig's form.
func TestDrawingThreeFigures(t *testing.T) {
	sigForm := func(s string) bool {
		v, err := strconv.ParseFloat(s, 64)
		return err == nil && report.Sig(v) == s
	}
	for _, file := range []string{"si.toml", "nested.toml"} {
		w, r := loadWall(t, file)
		in := wallInput("testdata/walls/"+file, w, r)
		in.Show = Forces
		svg, err := Wall(in)
		if err != nil {
			t.Fatal(err)
		}
		labels := 0
		for _, l := range strings.Split(allText(t, svg), "\n") {
			f := strings.Fields(l)
			if len(f) == 3 && (f[0] == "V" || f[0] == "M") {
				labels++
				if !sigForm(f[1]) {
					t.Errorf("%s: label %q is not three significant figures", file, l)
				}
			}
		}
		if labels == 0 {
			t.Errorf("%s: no V or M label drawn", file)
		}
		// The pier table gives each pier's V and M as Sig prints them.
		text := allText(t, svg)
		u := report.UnitsFor(w.Units)
		for _, p := range in.Piers {
			if p.Cut {
				continue
			}
			for _, want := range []string{report.Sig(u.ForceOf(p.Shear)), report.Sig(u.MomentOf(p.Moment)), report.SigPercent(p.Share)} {
				if !strings.Contains(text, "\n"+want+"\n") {
					t.Errorf("%s: pier %s: %q not in the drawing", file, p.Name, want)
				}
			}
		}
	}
	a, err := storey.Load(filepath.Join("..", "testdata", "storey", "workshop.toml"))
	if err != nil {
		t.Fatal(err)
	}
	svg, err := Storey(StoreyInput{Analysis: a, Now: fixedNow, Version: "test"})
	if err != nil {
		t.Fatal(err)
	}
	text := allText(t, svg)
	u := report.UnitsFor(a.Storey.Units)
	for _, wl := range a.Walls {
		for _, want := range []string{report.Sig(wl.Unit.Rigidity), report.Sig(u.ForceOf(geometry.Force(wl.Design.Direct))), report.Sig(u.ForceOf(geometry.Force(wl.Design.Shear)))} {
			if !strings.Contains(text, "\n"+want+"\n") {
				t.Errorf("storey table: wall %s: %q not in the drawing", wl.Name, want)
			}
		}
	}
}
