package storey

import (
	"errors"
	"fmt"
	"math"
	"path/filepath"
	"slices"
	"sort"
	"strconv"
	"strings"

	"github.com/BurntSushi/toml"

	"pierwise/geometry"
)

// Storey is a storey file (docs/method.md §9) as read: the storey shear, where it
// acts, the plan size and the walls by reference. Lengths are metres and
// forces newtons whatever Units says; Units decides how they are read and
// shown.
type Storey struct {
	// CompareFE is not read from the file: set by the caller (the storey
	// report), it asks Analyse to solve each wall's finite-element model on
	// the classic basis too, for the classic-vs-FE difference of each wall
	// (docs/method.md §9).
	CompareFE bool

	Path       string // the storey file as given
	Title      string
	Project    geometry.Project // the [project] table: the report's heading
	Units      geometry.System
	Shear      geometry.Force
	MassCenter [2]geometry.Length // (x, y) from the plan's south-west corner
	Size       [2]geometry.Length // plan dimensions along x and y
	Accidental float64            // fraction of the plan dimension perpendicular to the load
	Walls      []WallRef

	Diaphragm Diaphragm      // rigid (default), flexible or envelope
	Basis     geometry.Basis // where the walls' rigidities come from: classic (default) or fe
	SDC       string         // seismic design category "A" to "F"; "" when not given
	Cd        float64        // deflection amplification factor C_d; 0 when not given (storey drift not checked)
	Ie        float64        // importance factor I_e; default 1
	Height    geometry.Length
	// DriftLimit is the allowable storey drift as a fraction of Height
	// (ASCE 7-22 Table 12.12-1); 0 when not given. DriftPreset names the
	// preset it came from ("" when typed as a number).
	DriftLimit  float64
	DriftPreset string

	lines map[string]int // key → line, for messages
}

// KeyLine returns the line of a key of the storey file ("storey.diaphragm",
// "wall#0.direction"), or 0.
func (s *Storey) KeyLine(key string) int { return s.lines[key] }

// WallRef is one [[wall]] entry: a wall file placed in plan.
type WallRef struct {
	Name      string          // as given, or "" (then the wall file's title or base name)
	File      string          // as written in the storey file; "" for a wall given by its rigidity
	Path      string          // File resolved against the storey file's directory
	Direction Direction       // the axis along which the wall resists shear
	Position  geometry.Length // its line: y of an x-wall, x of a y-wall

	// An Angled wall runs at Angle (radians, counter-clockwise from +x;
	// AngleDeg as typed, in degrees) through the point At.
	Angle    float64
	AngleDeg float64
	At       [2]geometry.Length

	// A wall given by its stiffness instead of a wall file: Rigidity in
	// N/m, and optionally its Length for the plan sketch.
	Rigidity    float64
	HasRigidity bool
	Length      geometry.Length

	Start    geometry.Length // where it begins along its line (x of an x-wall, y of a y-wall)
	Layout   string          // the wall file's layout to use; "" for the file's active one
	HasStart bool            // false: the wall is drawn centred on the plan
	Line     int             // line of the [[wall]] header in the storey file
	lines    map[string]int  // key → line, for messages
}

// DefaultAccidental is the accidental eccentricity as a fraction of the plan
// dimension perpendicular to the load (ASCE 7-22 §12.8.4.2: 5 %).
const DefaultAccidental = 0.05

// Error is a problem in a storey file: "file:line: key: msg" (the parts that
// are not known are left out), in the shape of the wall file's errors.
type Error = geometry.Error

func newError(file string, line int, key, format string, a ...any) *Error {
	return &Error{File: file, Line: line, Key: key, Msg: fmt.Sprintf(format, a...)}
}

// IsStoreyFile reports whether data looks like a storey file rather than a
// wall file: it has a [storey] table or [[wall]] entries, and no wall sizes
// (geometry.IsStoreyFile, the one detector the wall parser uses too). A file
// with TOML syntax errors is still recognised by its table headers, so that
// its errors are reported as a storey file's.
func IsStoreyFile(data []byte) bool { return geometry.IsStoreyFile(data) }

// Parse reads a storey file. It checks the keys, the values and the plan
// (positions inside the plan); the wall files themselves are read by
// Analyse's callers (see Load), since their lengths are needed to check that
// a wall fits on its line.
func Parse(filename string, data []byte) (*Storey, error) {
	lines := keyLines(data)
	var m map[string]any
	if _, err := toml.Decode(string(data), &m); err != nil {
		var pe toml.ParseError
		if errors.As(err, &pe) {
			return nil, newError(filename, pe.Position.Line, pe.LastKey, "%s", pe.Message)
		}
		return nil, newError(filename, 0, "", "%v", err)
	}
	p := parser{file: filename, lines: lines, wall: -1}
	s := &Storey{Path: filename, Accidental: DefaultAccidental, Ie: 1, lines: lines}

	for _, k := range sortedKeys(m) {
		switch k {
		case "title", "units", "storey", "wall", "project":
		default:
			p.errorf(k, "unknown key (the storey file has title, units, [project], [storey] and [[wall]])")
		}
	}
	s.Title = p.str(m, "title", "title")
	if v, ok := m["project"]; ok {
		pt, isTable := v.(map[string]any)
		if !isTable {
			p.errorf("project", "must be a table: [project]")
		}
		for _, k := range sortedKeys(pt) {
			if !slices.Contains(geometry.ProjectKeys, k) {
				p.errorf("project."+k, "unknown key (a [project] table has %s)", strings.Join(geometry.ProjectKeys, ", "))
				continue
			}
			*s.Project.Field(k) = p.str(pt, k, "project."+k)
		}
	}
	if u, ok := m["units"]; ok {
		text, isStr := u.(string)
		sys, known := geometry.ParseSystem(text)
		if !isStr || !known {
			p.errorf("units", "must be \"us\" or \"si\", not %s", show(u))
		}
		s.Units = sys
	}

	st, _ := m["storey"].(map[string]any)
	if st == nil {
		if _, ok := m["storey"]; ok {
			p.errorf("storey", "must be a table: [storey]")
		} else {
			p.errorf("", "missing the [storey] table (shear, mass_center, size)")
		}
		return nil, p.errs
	}
	for _, k := range sortedKeys(st) {
		switch k {
		case "shear", "mass_center", "size", "accidental", "diaphragm", "basis", "sdc", "cd", "ie", "height", "drift_limit":
		default:
			p.errorf("storey."+k, "unknown key (the [storey] table has shear, mass_center, size, accidental, diaphragm, basis, sdc, cd, ie, height and drift_limit)")
		}
	}
	if v, ok := p.need(st, "storey.shear"); ok {
		if f, ok := p.force(v, "storey.shear", s.Units); ok {
			switch {
			case f <= 0:
				p.errorf("storey.shear", "must be positive, e.g. \"120kip\"")
			case float64(f) > maxShear:
				p.errorf("storey.shear", "%s is implausible for one storey (at most %s)", showForce(f, s.Units), geometry.FormatForce(maxShear, s.Units))
			default:
				s.Shear = f
			}
		}
	}
	sizeOK := false
	if v, ok := p.need(st, "storey.size"); ok {
		if xy, ok := p.pair(v, "storey.size", s.Units); ok {
			if xy[0] <= 0 || xy[1] <= 0 {
				p.errorf("storey.size", "both plan dimensions must be positive")
			} else if float64(xy[0]) > maxPlan || float64(xy[1]) > maxPlan {
				p.errorf("storey.size", "a plan dimension of %s is implausible (at most %s)", showLen(max(xy[0], xy[1]), s.Units), fmtLen(maxPlan, s.Units))
			} else {
				s.Size, sizeOK = xy, true
			}
		}
	}
	if v, ok := p.need(st, "storey.mass_center"); ok {
		if xy, ok := p.pair(v, "storey.mass_center", s.Units); ok {
			s.MassCenter = xy
			if sizeOK && !inside(xy[0], s.Size[0]) || sizeOK && !inside(xy[1], s.Size[1]) {
				p.errorf("storey.mass_center", "(%s, %s) is off the plan, which runs from (0, 0) to (%s, %s)",
					fmtLen(xy[0], s.Units), fmtLen(xy[1], s.Units), fmtLen(s.Size[0], s.Units), fmtLen(s.Size[1], s.Units))
			}
		}
	}
	if v, ok := st["accidental"]; ok {
		// !(a >= 0 && a < 0.5) also refuses NaN.
		if a, ok := number(v); !ok || !(a >= 0 && a < 0.5) {
			p.errorf("storey.accidental", "must be a fraction from 0 to below 0.5 (0.05 = 5 %% of the plan dimension), not %s", show(v))
		} else {
			s.Accidental = a
		}
	}
	p.storeyOptions(st, s)

	walls, ok := m["wall"].([]map[string]any)
	if !ok {
		if _, there := m["wall"]; there {
			p.errorf("wall", "must be a list of [[wall]] tables")
		} else {
			p.errorf("", "no [[wall]] entries: list the walls of the storey, each with file, direction and position")
		}
	}
	dir := filepath.Dir(filename)
	for i, w := range walls {
		p.wall = i
		ref := WallRef{Line: p.line("wall"), lines: map[string]int{}}
		for _, k := range sortedKeys(w) {
			ref.lines[k] = p.line("wall." + k)
			switch k {
			case "file", "rigidity", "direction", "position", "start", "name", "layout", "length":
			default:
				p.errorf("wall."+k, "unknown key (a [[wall]] has file or rigidity, direction, position, and optionally start, name, layout and length)")
			}
		}
		ref.Name = strings.TrimSpace(p.str(w, "name", "wall.name"))
		ref.Layout = strings.TrimSpace(p.str(w, "layout", "wall.layout"))
		_, hasFile := w["file"]
		if rv, hasRig := w["rigidity"]; hasRig {
			switch {
			case hasFile:
				p.errorf("wall.rigidity", "a wall has either a file or a rigidity, not both: remove one of them")
			default:
				p.rigidityWall(w, rv, &ref, s.Units)
			}
		} else if _, there := w["length"]; there {
			p.errorf("wall.length", "only a wall given by its rigidity has a length here; a wall file gives its own")
		}
		_, hasRig := w["rigidity"]
		if v, ok := w["file"]; ok {
			if f, isStr := v.(string); !isStr || strings.TrimSpace(f) == "" {
				p.errorf("wall.file", "must be the path of a wall file, relative to this file, e.g. \"north.toml\"")
			} else {
				ref.File = f
				ref.Path = f
				if !filepath.IsAbs(f) {
					ref.Path = filepath.Join(dir, f)
				}
			}
		} else if !hasRig {
			p.errorf("wall.file", "missing: give the wall's file (a wall file, relative to this file) or its rigidity, e.g. rigidity = \"500kip/in\"")
		}
		if ref.HasRigidity && ref.Layout != "" {
			p.errorf("wall.layout", "a wall given by its rigidity has no layouts")
		}
		if v, ok := p.need(w, "wall.direction"); ok {
			p.direction(v, &ref)
		}
		across := ref.Direction.other()
		if v, ok := p.need(w, "wall.position"); ok && ref.Direction == Angled {
			p.anglePosition(v, &ref, s, sizeOK)
		} else if ok {
			if l, ok := p.length(v, "wall.position", s.Units); ok {
				ref.Position = l
				if sizeOK && !inside(l, s.Size[across]) {
					p.errorf("wall.position", "%s is off the plan: %s-wall's position is its %s, from 0 to %s",
						fmtLen(l, s.Units), article(ref.Direction), across, fmtLen(s.Size[across], s.Units))
				}
			}
		}
		if v, ok := w["start"]; ok && ref.Direction == Angled {
			p.errorf("wall.start", "a wall at an angle is placed by position = [x, y], its centre; it has no start")
		} else if ok {
			if l, ok := p.length(v, "wall.start", s.Units); ok {
				ref.Start, ref.HasStart = l, true
				if sizeOK && !inside(l, s.Size[ref.Direction]) {
					p.errorf("wall.start", "%s is off the plan: along %s the plan runs from 0 to %s",
						fmtLen(l, s.Units), ref.Direction, fmtLen(s.Size[ref.Direction], s.Units))
				}
			}
		}
		s.Walls = append(s.Walls, ref)
	}
	p.wall = -1
	if len(p.errs) > 0 {
		return nil, p.errs
	}
	return s, nil
}

// Plausible ranges of storey values: a storey shear of 1e7 kN (2.2 million
// kip) and a plan 10 km across are beyond any building, and keep every
// product of the analysis far from overflow.
const (
	maxShear = 1e10 // N
	maxPlan  = 1e4  // m
	maxRig   = 1e13 // N/m, about 57 million kip/in
)

// storeyOptions reads the [storey] keys of the diaphragm, the basis and the
// storey drift check.
func (p *parser) storeyOptions(st map[string]any, s *Storey) {
	if v, ok := st["diaphragm"]; ok {
		text, _ := v.(string)
		d, known := ParseDiaphragm(strings.TrimSpace(text))
		if !known {
			p.errorf("storey.diaphragm", "must be \"rigid\", \"flexible\" or \"envelope\", not %s", show(v))
		}
		s.Diaphragm = d
	}
	if v, ok := st["basis"]; ok {
		switch v {
		case "classic":
			s.Basis = geometry.BasisClassic
		case "fe":
			s.Basis = geometry.BasisFE
		default:
			p.errorf("storey.basis", "must be \"classic\" or \"fe\" (where the walls' rigidities come from), not %s", show(v))
		}
	}
	if v, ok := st["sdc"]; ok {
		text, _ := v.(string)
		t := strings.ToUpper(strings.TrimSpace(text))
		if len(t) != 1 || t[0] < 'A' || t[0] > 'F' {
			p.errorf("storey.sdc", "must be a seismic design category from \"A\" to \"F\" (ASCE 7-22 §11.6), not %s", show(v))
		} else {
			s.SDC = t
		}
	}
	factor := func(key string, lo, hi float64, what string) (float64, bool) {
		v, ok := st[key]
		if !ok {
			return 0, false
		}
		// !(x >= lo && x <= hi) also refuses NaN.
		if x, isNum := number(v); !isNum || !(x >= lo && x <= hi) {
			p.errorf("storey."+key, "must be %s, a number from %g to %g, not %s", what, lo, hi, show(v))
			return 0, false
		} else {
			return x, true
		}
	}
	if x, ok := factor("cd", 1, 10, "the deflection amplification factor C_d (ASCE 7-22 Table 12.2-1)"); ok {
		s.Cd = x
	}
	if x, ok := factor("ie", 1, 1.5, "the importance factor I_e (ASCE 7-22 Table 1.5-2)"); ok {
		s.Ie = x
	}
	if v, ok := st["height"]; ok {
		if l, ok := p.length(v, "storey.height", s.Units); ok {
			if !(l > 0) || float64(l) > 1000 {
				p.errorf("storey.height", "must be a positive storey height up to %s, not %s", fmtLen(1000, s.Units), showLen(l, s.Units))
			} else {
				s.Height = l
			}
		}
	}
	if v, ok := st["drift_limit"]; ok {
		if name, isStr := v.(string); isStr {
			if pr, found := geometry.FindDriftPreset(name); found {
				s.DriftPreset, s.DriftLimit = pr.Name, pr.Limit
			} else {
				var names []string
				for _, pr := range geometry.DriftPresets {
					names = append(names, pr.Name)
				}
				p.errorf("storey.drift_limit", "unknown preset %s (use %s, or a number such as 0.01)", show(v), strings.Join(names, ", "))
			}
		} else if x, ok := factor("drift_limit", 1e-4, 0.1, "the allowable storey drift as a fraction of the height"); ok {
			s.DriftLimit = x
		}
	}
	if s.Cd > 0 && s.Height == 0 {
		p.errorf("storey.cd", "the storey drift needs the storey height too: height = \"14ft\"")
	}
	if s.DriftLimit > 0 && (s.Cd == 0 || s.Height == 0) {
		p.errorf("storey.drift_limit", "the storey drift check needs cd and height too")
	}
}

// rigidityWall reads a wall given by its stiffness: rigidity = "500kip/in"
// and an optional length for the plan sketch.
func (p *parser) rigidityWall(w map[string]any, v any, ref *WallRef, sys geometry.System) {
	text, ok := quantity(v)
	r, err := parseRigidity(text, sys)
	switch {
	case !ok:
		p.errorf("wall.rigidity", "must be a stiffness such as \"500kip/in\" or \"90kN/mm\", not %s", show(v))
		return
	case err != nil:
		p.errorf("wall.rigidity", "%v", err)
		return
	case !(r > 0) || r > maxRig:
		p.errorf("wall.rigidity", "must be positive and plausible (at most %.3g kip/in, %.3g kN/mm), not %s",
			maxRig/float64(geometry.Kip/geometry.Force(geometry.Inch)), maxRig/1e6, strconv.Quote(text))
		return
	}
	ref.Rigidity, ref.HasRigidity = r, true
	if ref.Name == "" {
		p.errorf("wall.name", "missing: a wall given by its rigidity needs a name")
	}
	if lv, there := w["length"]; there {
		if l, ok := p.length(lv, "wall.length", sys); ok {
			if !(l > 0) || float64(l) > maxPlan {
				p.errorf("wall.length", "must be a positive length, not %s", showLen(l, sys))
			} else {
				ref.Length = l
			}
		}
	}
}

// parseRigidity reads a stiffness "500kip/in", "90 kN/mm", "1.2e8 N/m" or a
// bare number in kip/in (US) or kN/mm (SI); it returns N/m.
func parseRigidity(text string, sys geometry.System) (float64, error) {
	bad := func(msg string) (float64, error) {
		return 0, &geometry.UnitError{Quantity: "rigidity", Input: text, Msg: msg}
	}
	t := strings.TrimSpace(text)
	force, per, found := strings.Cut(t, "/")
	if !found {
		if _, err := strconv.ParseFloat(t, 64); err != nil {
			return bad("write it as a force per length, e.g. 500kip/in or 90kN/mm")
		}
		force, per = t+"kip", "in"
		if sys == geometry.SI {
			force, per = t+"kN", "mm"
		}
	}
	f, err := geometry.ParseForce(strings.TrimSpace(force), sys)
	if err != nil {
		return bad("the force part: " + err.Error())
	}
	per = strings.TrimSpace(per)
	if per == "" || strings.ContainsAny(per[:1], "0123456789.+-") {
		return bad("the length after / is a unit: in, ft, mm or m")
	}
	l, err := geometry.ParseLength("1"+per, sys)
	if err != nil || !(l > 0) {
		return bad("unknown length unit " + strconv.Quote(per) + " after / (use in, ft, mm, cm or m)")
	}
	r := float64(f) / float64(l)
	if math.IsInf(r, 0) || math.IsNaN(r) {
		return bad("out of range")
	}
	return r, nil
}

// direction reads "x", "y" or an angle in degrees (a number, or a string
// such as "30" or "30deg"), counter-clockwise from the x axis: the line
// along which the wall resists shear.
func (p *parser) direction(v any, ref *WallRef) {
	switch v {
	case "x", "X":
		ref.Direction = X
		return
	case "y", "Y":
		ref.Direction = Y
		return
	}
	deg, ok := number(v)
	if text, isStr := v.(string); isStr {
		t := strings.TrimSpace(strings.TrimSuffix(strings.TrimSuffix(strings.TrimSpace(text), "deg"), "°"))
		var err error
		deg, err = strconv.ParseFloat(t, 64)
		ok = err == nil
	}
	switch {
	case !ok:
		p.errorf("wall.direction", "must be \"x\" or \"y\", or an angle in degrees from the x axis such as 30 (the line along which the wall resists shear), not %s", show(v))
	case math.IsNaN(deg) || math.IsInf(deg, 0) || math.Abs(deg) > 360:
		p.errorf("wall.direction", "an angle must be a finite number of degrees from -360 to 360, not %s", show(v))
	default:
		ref.Direction, ref.AngleDeg = Angled, deg
		ref.Angle = deg * math.Pi / 180
	}
}

// anglePosition reads the position of a wall at an angle: a point [x, y] on
// its line (its centre, for the sketch). A wall along 0° or 90° becomes an
// x- or y-wall on that line.
func (p *parser) anglePosition(v any, ref *WallRef, s *Storey, sizeOK bool) {
	if _, isList := v.([]any); !isList {
		p.errorf("wall.position", "a wall at an angle is placed by a point on its line, its centre: position = [\"20ft\", \"12ft\"], not %s", show(v))
		return
	}
	xy, ok := p.pair(v, "wall.position", s.Units)
	if !ok {
		return
	}
	if sizeOK && (!inside(xy[0], s.Size[0]) || !inside(xy[1], s.Size[1])) {
		p.errorf("wall.position", "(%s, %s) is off the plan, which runs from (0, 0) to (%s, %s)",
			fmtLen(xy[0], s.Units), fmtLen(xy[1], s.Units), fmtLen(s.Size[0], s.Units), fmtLen(s.Size[1], s.Units))
	}
	ref.At = xy
	// 0°, 180°: an x-wall; 90°, 270°: a y-wall (within 1e-9°).
	r := math.Mod(math.Abs(ref.AngleDeg), 180)
	switch {
	case r < 1e-9 || 180-r < 1e-9:
		ref.Direction, ref.Position = X, xy[1]
	case math.Abs(r-90) < 1e-9:
		ref.Direction, ref.Position = Y, xy[0]
	}
}

func showForce(f geometry.Force, sys geometry.System) string {
	return strconv.FormatFloat(float64(f/sys.BaseForce()), 'g', 3, 64) + map[bool]string{true: " kN", false: " kip"}[sys == geometry.SI]
}

func showLen(l geometry.Length, sys geometry.System) string {
	return strconv.FormatFloat(float64(l/sys.BaseLength()), 'g', 3, 64) + map[bool]string{true: " m", false: " ft"}[sys == geometry.SI]
}

// article returns the direction with its indefinite article: "an x", "a y".
func article(d Direction) string {
	if d == X {
		return "an x"
	}
	return "a y"
}

// inside reports whether 0 ≤ v ≤ size, with a little slack for rounding in
// unit conversions.
func inside(v, size geometry.Length) bool {
	tol := 1e-9 * float64(size)
	return float64(v) >= -tol && float64(v) <= float64(size)+tol
}

func fmtLen(l geometry.Length, sys geometry.System) string { return geometry.FormatLength(l, sys) }

// parser collects the errors of one storey file.
type parser struct {
	file  string
	lines map[string]int
	wall  int // index of the [[wall]] being read, -1 outside
	errs  geometry.ErrorList
}

// line returns the line of a key: "storey.shear", "wall.file" (of the
// current wall), "wall" (its header).
func (p *parser) line(key string) int {
	if strings.HasPrefix(key, "wall") && p.wall >= 0 {
		rest := strings.TrimPrefix(key, "wall")
		if n, ok := p.lines["wall#"+strconv.Itoa(p.wall)+rest]; ok {
			return n
		}
		return p.lines["wall#"+strconv.Itoa(p.wall)]
	}
	if n, ok := p.lines[key]; ok {
		return n
	}
	if i := strings.LastIndexByte(key, '.'); i > 0 {
		return p.lines[key[:i]]
	}
	return 0
}

func (p *parser) errorf(key, format string, a ...any) {
	shown := key
	if p.wall >= 0 && strings.HasPrefix(key, "wall") {
		// Tables of an array are counted from 1, as in wall files' messages.
		shown = "wall[" + strconv.Itoa(p.wall+1) + "]" + strings.TrimPrefix(key, "wall")
	}
	p.errs = append(p.errs, newError(p.file, p.line(key), shown, format, a...))
}

// need returns the value of a required key.
func (p *parser) need(m map[string]any, key string) (any, bool) {
	v, ok := m[key[strings.LastIndexByte(key, '.')+1:]]
	if !ok {
		p.errorf(key, "missing")
	}
	return v, ok
}

// str returns an optional string value.
func (p *parser) str(m map[string]any, name, key string) string {
	v, ok := m[name]
	if !ok {
		return ""
	}
	s, isStr := v.(string)
	if !isStr {
		p.errorf(key, "must be a string in quotes, not %s", show(v))
	}
	return s
}

// quantity returns the text of a length or force: a string as typed, or a
// bare TOML number (then in the base unit).
func quantity(v any) (string, bool) {
	switch t := v.(type) {
	case string:
		return t, true
	case int64:
		return strconv.FormatInt(t, 10), true
	case float64:
		return strconv.FormatFloat(t, 'g', -1, 64), true
	}
	return "", false
}

func number(v any) (float64, bool) {
	switch t := v.(type) {
	case int64:
		return float64(t), true
	case float64:
		return t, true
	}
	return 0, false
}

func (p *parser) length(v any, key string, sys geometry.System) (geometry.Length, bool) {
	text, ok := quantity(v)
	if !ok {
		p.errorf(key, "must be a length such as \"50ft\" or \"15.2m\", not %s", show(v))
		return 0, false
	}
	l, err := geometry.ParseLength(text, sys)
	if err != nil {
		p.errorf(key, "%v", err)
		return 0, false
	}
	return l, true
}

func (p *parser) force(v any, key string, sys geometry.System) (geometry.Force, bool) {
	text, ok := quantity(v)
	if !ok {
		p.errorf(key, "must be a force such as \"120kip\" or \"500kN\", not %s", show(v))
		return 0, false
	}
	f, err := geometry.ParseForce(text, sys)
	if err != nil {
		p.errorf(key, "%v", err)
		return 0, false
	}
	return f, true
}

// pair reads ["40ft", "25ft"].
func (p *parser) pair(v any, key string, sys geometry.System) ([2]geometry.Length, bool) {
	var xy [2]geometry.Length
	list, ok := v.([]any)
	if !ok || len(list) != 2 {
		p.errorf(key, "must be a pair of lengths [x, y], e.g. [\"40ft\", \"25ft\"], not %s", show(v))
		return xy, false
	}
	for i := range list {
		l, ok := p.length(list[i], key, sys)
		if !ok {
			return xy, false
		}
		xy[i] = l
	}
	return xy, true
}

// show prints a TOML value the way the user typed it, roughly.
func show(v any) string {
	switch t := v.(type) {
	case string:
		return strconv.Quote(t)
	case map[string]any:
		return "a table"
	case []map[string]any:
		return "a list of tables"
	}
	return fmt.Sprint(v)
}

func sortedKeys[V any](m map[string]V) []string {
	keys := make([]string, 0, len(m))
	for k := range m {
		keys = append(keys, k)
	}
	sort.Strings(keys)
	return keys
}

// keyLines maps keys to the lines they are on: "title", "storey",
// "storey.shear", "wall#0" (the first [[wall]] header), "wall#0.file", from
// the scanner every TOML file of pierwise shares (geometry.KeyLines).
func keyLines(data []byte) map[string]int {
	lines := map[string]int{}
	for path, n := range geometry.KeyLines(data) {
		if rest, ok := strings.CutPrefix(path, "wall["); ok {
			if i := strings.IndexByte(rest, ']'); i > 0 {
				if k, err := strconv.Atoi(rest[:i]); err == nil {
					path = "wall#" + strconv.Itoa(k-1) + rest[i+1:]
				}
			}
		}
		lines[path] = n
	}
	return lines
}
