package geometry

import (
	"math"
	"sort"
	"strconv"
	"unicode/utf8"
)

// edgeTol is how far (in metres) two edges may miss each other and still
// count as touching: a nanometre, far below any building tolerance, and far
// above the rounding of sums such as 4 ft + 14 ft = 18 ft in metres.
const edgeTol = 1e-9

// Plausible ranges. They are far wider than any building needs; they exist
// so that no accepted wall can drive the mechanics to overflow (h/L stays
// within 1e8, E·t·Δ within float64) and so that a wrong unit is caught.
const (
	minSize      Length = 1e-4  // 0.1 mm
	maxSize      Length = 1e4   // 10 km
	maxStress    Stress = 1e12  // 1000 GPa, five times steel's modulus
	minThickness Length = 0.05  // 50 mm (2 in), thinner than any shear wall
	maxThickness Length = 1.5   // 1.5 m (5 ft), thicker than any shear wall
	minModulus   Stress = 0.5e9 // E: 0.5 GPa (73 ksi), below any masonry
	maxModulus   Stress = 500e9 // E: 500 GPa, above steel
	minStrength  Stress = 1e6   // f'm, f'c: 1 MPa (145 psi), below any structural masonry
	maxStrength  Stress = 250e6 // 250 MPa (36 ksi), above ultra-high-performance concrete
	maxForce     Force  = 1e12  // 10^9 kN
	minModifier         = 0.01
	maxModifier         = 10.0
	maxFactor           = 100.0 // C_d and I_e
	maxMeshCells        = 1000  // elements along the wall's larger side
)

// Validate checks every rule a wall must satisfy to be solved, drawn and
// saved, and returns all the problems at once as an ErrorList (nil when
// there is none). Keys name the settings as a wall file would.
func (w *Wall) Validate() error {
	var l ErrorList
	w.validate(&l)
	return l.Err()
}

func (w *Wall) validate(l *ErrorList) {
	for i := range Settings {
		Settings[i].check(w, l)
	}
	w.validateDesign(l)
	w.validateLayouts(l)
}

func (w *Wall) validateDriftLimit(l *ErrorList) {
	d := w.Drift
	if !finite(d.Limit) {
		l.add("drift.limit", "is not a finite number")
		return
	}
	if d.Preset != "" {
		p, ok := FindDriftPreset(d.Preset)
		if !ok {
			l.add("drift.limit", "unknown preset "+strconv.Quote(d.Preset)+" (use "+driftPresetNames()+", or a number such as 0.01)")
			return
		}
		if math.Abs(p.Limit-d.Limit) > 1e-12 {
			l.add("drift.limit", "preset "+p.Name+" is "+strconv.FormatFloat(p.Limit, 'g', -1, 64)+", not "+strconv.FormatFloat(d.Limit, 'g', -1, 64))
		}
		return
	}
	if d.Limit < 0 || d.Limit > 0.1 {
		l.add("drift.limit", "must be a fraction of the height between 0 and 0.1, such as 0.01 (is "+strconv.FormatFloat(d.Limit, 'g', -1, 64)+")")
	}
}

func (w *Wall) validateLayouts(l *ErrorList) {
	if len(w.Layouts) == 0 {
		l.add("layout", "the wall has no layout")
		return
	}
	if w.Active < 0 || w.Active >= len(w.Layouts) {
		l.add("active", "no layout number "+strconv.Itoa(w.Active))
	}
	seen := map[string]int{}
	for k, lay := range w.Layouts {
		key := layoutKey(k)
		nameKey := key + ".name"
		if k == 0 {
			nameKey = "layout"
		}
		switch {
		case lay.Name == "":
			l.add(nameKey, "a layout needs a name")
		case !utf8.ValidString(lay.Name):
			l.add(nameKey, "is not valid UTF-8 text")
		default:
			if j, dup := seen[lay.Name]; dup {
				l.add(nameKey, "layout name "+strconv.Quote(lay.Name)+" is already used by "+layoutTitle(j))
			} else {
				seen[lay.Name] = k
			}
		}
		w.validateOpenings(l, k)
	}
}

func (w *Wall) validateOpenings(l *ErrorList, k int) {
	ops := w.Layouts[k].Openings
	names := map[string]int{}
	for i, o := range ops {
		key := openingKey(k, i)
		if o.Name == "" {
			l.add(key+".name", "an opening needs a name")
		} else if !utf8.ValidString(o.Name) {
			l.add(key+".name", "is not valid UTF-8 text")
		} else if j, dup := names[o.Name]; dup {
			l.add(key+".name", "name "+strconv.Quote(o.Name)+" is already used by "+openingKey(k, j))
		} else {
			names[o.Name] = i
		}
		for _, e := range w.openingErrors(ops, i, o) {
			if e.Key == "" {
				e.Key = key
			} else {
				e.Key = key + "." + e.Key
			}
			*l = append(*l, e)
		}
	}
}

// openingErrors checks o as opening i of ops (i = -1 for a new opening):
// sizes, position inside the wall, and overlap with the openings before it
// (all the others when i = -1 or when asked through CheckOpening). Keys are
// relative to the opening.
func (w *Wall) openingErrors(ops []Opening, i int, o Opening) ErrorList {
	return w.openingErrorsAgainst(ops, i, o, i)
}

func (w *Wall) openingErrorsAgainst(ops []Opening, i int, o Opening, upTo int) ErrorList {
	var l ErrorList
	sys := w.Units
	who := "opening"
	if o.Name != "" {
		who = "opening " + o.Name
	}
	okSize := positiveLength(&l, "width", o.Width, sys)
	okSize = positiveLength(&l, "height", o.Height, sys) && okSize
	okPos := true
	for _, c := range []struct {
		key string
		v   Length
	}{{"x", o.X}, {"sill", o.Sill}} {
		if !finite(float64(c.v)) {
			l.add(c.key, "is not a finite number")
			okPos = false
		} else if c.v < 0 {
			l.add(c.key, "must not be negative (is "+FormatLength(c.v, sys)+")")
			okPos = false
		}
	}
	if !okSize || !okPos {
		return l
	}
	r := o.Rect()
	if w.Length > 0 && r.X1 > float64(w.Length)+edgeTol {
		l.add("", who+" reaches past the right end of the wall: x + width = "+FormatLength(Length(r.X1), sys)+", wall length "+FormatLength(w.Length, sys))
	}
	if w.Height > 0 && r.Y1 > float64(w.Height)+edgeTol {
		l.add("", who+" reaches above the top of the wall: sill + height = "+FormatLength(Length(r.Y1), sys)+", wall height "+FormatLength(w.Height, sys))
	}
	for j, p := range ops {
		if j == i || (upTo >= 0 && j >= upTo) {
			continue
		}
		if overlaps(r, p.Rect()) {
			other := "opening " + strconv.Itoa(j+1)
			if p.Name != "" {
				other = "opening " + p.Name
			}
			l.add("", who+" overlaps "+other)
		}
	}
	return l
}

// overlaps reports whether the interiors of a and b meet; rectangles that
// only touch along an edge or at a corner do not overlap.
func overlaps(a, b Rect) bool {
	return a.X0 < b.X1-edgeTol && b.X0 < a.X1-edgeTol && a.Y0 < b.Y1-edgeTol && b.Y0 < a.Y1-edgeTol
}

// CheckOpening reports whether opening i of the active layout (i = -1 for a
// new one) could be replaced by o: positive sizes, inside the wall (it may
// reach the base and the top edge), no overlap with any other opening
// (touching edges are allowed), and a name not used by another opening.
// The error is an ErrorList whose keys name the opening's settings.
func (w *Wall) CheckOpening(i int, o Opening) error {
	ops := w.Openings()
	if i < -1 || i >= len(ops) {
		return ErrorList{{Key: "opening", Msg: "no opening number " + strconv.Itoa(i+1) + " in the active layout"}}
	}
	l := w.openingErrorsAgainst(ops, i, o, -1)
	if o.Name != "" {
		for j, p := range ops {
			if j != i && p.Name == o.Name {
				l.add("name", "name "+strconv.Quote(o.Name)+" is already used by another opening")
				break
			}
		}
	}
	return l.Err()
}

// FreeSpot moves o along x, keeping its sill and size, to a place in the
// active layout where CheckOpening(-1, ·) accepts it, ignoring its name: the
// nearest such place at or to the right of o.X, else the nearest to its
// left. It reports false when the opening fits nowhere at that sill.
func (w *Wall) FreeSpot(o Opening) (Opening, bool) {
	ops := w.Openings()
	probe := o
	probe.Name = ""
	fits := func(x float64) bool {
		probe.X = Length(x)
		return w.CheckOpening(-1, probe) == nil
	}
	if !finite(float64(o.X)) {
		o.X = 0
	}
	cands := []float64{float64(o.X), 0, float64(w.Length - o.Width)}
	for _, p := range ops {
		r := p.Rect()
		cands = append(cands, r.X1, r.X0-float64(o.Width))
	}
	sort.Float64s(cands)
	best, found := 0.0, false
	for _, x := range cands {
		if x >= float64(o.X) && fits(x) {
			best, found = x, true
			break
		}
	}
	if !found {
		for k := len(cands) - 1; k >= 0; k-- {
			if x := cands[k]; x < float64(o.X) && fits(x) {
				best, found = x, true
				break
			}
		}
	}
	if !found {
		return o, false
	}
	o.X = Length(best)
	return o, true
}

// Clone returns a deep copy of the wall; changing the copy's layouts or
// openings leaves the original as it was.
func (w *Wall) Clone() *Wall {
	c := *w
	if w.Reinforcement != nil {
		r := *w.Reinforcement
		c.Reinforcement = &r
	}
	if w.Design != nil {
		d := *w.Design
		c.Design = &d
	}
	if w.Layouts != nil {
		c.Layouts = make([]Layout, len(w.Layouts))
		for k, lay := range w.Layouts {
			c.Layouts[k] = Layout{Name: lay.Name}
			if lay.Openings != nil {
				c.Layouts[k].Openings = append([]Opening(nil), lay.Openings...)
			}
		}
	}
	return &c
}

// NextOpeningName returns the first free name D1, D2, … (door) or W1, W2, …
// (window) in layout k.
func (w *Wall) NextOpeningName(k int, door bool) string {
	if k < 0 || k >= len(w.Layouts) {
		return ""
	}
	return nextName(w.Layouts[k].Openings, door)
}

func nextName(ops []Opening, door bool) string {
	prefix := "W"
	if door {
		prefix = "D"
	}
	used := map[string]bool{}
	for _, o := range ops {
		used[o.Name] = true
	}
	for n := 1; ; n++ {
		if s := prefix + strconv.Itoa(n); !used[s] {
			return s
		}
	}
}

func layoutKey(k int) string {
	if k == 0 {
		return ""
	}
	return "variant[" + strconv.Itoa(k) + "]"
}

func layoutTitle(k int) string {
	if k == 0 {
		return "the top-level layout"
	}
	return layoutKey(k)
}

func openingKey(k, i int) string {
	key := "opening[" + strconv.Itoa(i+1) + "]"
	if k > 0 {
		key = layoutKey(k) + "." + key
	}
	return key
}

func knownElement(e string) bool {
	for _, n := range Elements {
		if n == e {
			return true
		}
	}
	return false
}

func finite(v float64) bool { return !math.IsNaN(v) && !math.IsInf(v, 0) }

func positiveLength(l *ErrorList, key string, v Length, sys System) bool {
	if !finite(float64(v)) {
		l.add(key, "is not a finite number")
		return false
	}
	if v <= 0 {
		l.add(key, "must be greater than zero (is "+FormatLength(v, sys)+")")
		return false
	}
	if v < minSize || v > maxSize {
		shown := strconv.FormatFloat(float64(v), 'g', 4, 64) + " m"
		if sys == US {
			shown = strconv.FormatFloat(float64(v/Foot), 'g', 4, 64) + " ft = " + shown
		}
		l.add(key, "is implausible ("+shown+"); sizes run from 0.1 mm to 10 km, check the unit")
		return false
	}
	return true
}

func tooLargeStress(s Stress, sys System) string {
	return "is implausibly large (" + FormatStress(s, sys) + "); check the unit"
}

// numberIn checks lo < v ≤ hi, or lo ≤ v ≤ hi when lo > 0.
func numberIn(l *ErrorList, key string, v, lo, hi float64) {
	g := func(x float64) string { return strconv.FormatFloat(x, 'g', -1, 64) }
	switch {
	case !finite(v):
		l.add(key, "is not a finite number")
	case v <= 0:
		l.add(key, "must be greater than zero (is "+g(v)+")")
	case v < lo || v > hi:
		l.add(key, "must be between "+g(lo)+" and "+g(hi)+" (is "+g(v)+")")
	}
}
