package storey

import (
	"errors"
	"fmt"
	"path/filepath"
	"regexp"
	"sort"
	"strconv"
	"strings"

	"github.com/BurntSushi/toml"

	"pierwise/geometry"
)

// Storey is a storey file (DESIGN §10) as read: the storey shear, where it
// acts, the plan size and the walls by reference. Lengths are metres and
// forces newtons whatever Units says; Units decides how they are read and
// shown.
type Storey struct {
	Path       string // the storey file as given
	Title      string
	Units      geometry.System
	Shear      geometry.Force
	MassCenter [2]geometry.Length // (x, y) from the plan's south-west corner
	Size       [2]geometry.Length // plan dimensions along x and y
	Accidental float64            // fraction of the plan dimension perpendicular to the load
	Walls      []WallRef
}

// WallRef is one [[wall]] entry: a wall file placed in plan.
type WallRef struct {
	Name      string          // as given, or "" (then the wall file's title or base name)
	File      string          // as written in the storey file
	Path      string          // File resolved against the storey file's directory
	Direction Direction       // the axis along which the wall resists shear
	Position  geometry.Length // its line: y of an x-wall, x of a y-wall
	Start     geometry.Length // where it begins along its line (x of an x-wall, y of a y-wall)
	Layout    string          // the wall file's layout to use; "" for the file's active one
	HasStart  bool            // false: the wall is drawn centred on the plan
	Line      int             // line of the [[wall]] header in the storey file
	lines     map[string]int  // key → line, for messages
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

var (
	storeyHeader = regexp.MustCompile(`(?m)^[ \t]*\[[ \t]*storey[ \t]*\]`)
	wallHeader   = regexp.MustCompile(`(?m)^[ \t]*\[\[[ \t]*wall[ \t]*\]\]`)
)

// IsStoreyFile reports whether data looks like a storey file rather than a
// wall file: it has a [storey] table or [[wall]] entries. A file with TOML
// syntax errors is still recognised by its table headers, so that its errors
// are reported as a storey file's.
func IsStoreyFile(data []byte) bool {
	var m map[string]any
	if _, err := toml.Decode(string(data), &m); err == nil {
		_, s := m["storey"]
		_, w := m["wall"]
		return s || w
	}
	return storeyHeader.Match(data) || wallHeader.Match(data)
}

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
	s := &Storey{Path: filename, Accidental: DefaultAccidental}

	for _, k := range sortedKeys(m) {
		switch k {
		case "title", "units", "storey", "wall":
		default:
			p.errorf(k, "unknown key (the storey file has title, units, [storey] and [[wall]])")
		}
	}
	s.Title = p.str(m, "title", "title")
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
		case "shear", "mass_center", "size", "accidental":
		default:
			p.errorf("storey."+k, "unknown key (the [storey] table has shear, mass_center, size and accidental)")
		}
	}
	if v, ok := p.need(st, "storey.shear"); ok {
		if f, ok := p.force(v, "storey.shear", s.Units); ok {
			if f <= 0 {
				p.errorf("storey.shear", "must be positive, e.g. \"120kip\"")
			}
			s.Shear = f
		}
	}
	sizeOK := false
	if v, ok := p.need(st, "storey.size"); ok {
		if xy, ok := p.pair(v, "storey.size", s.Units); ok {
			if xy[0] <= 0 || xy[1] <= 0 {
				p.errorf("storey.size", "both plan dimensions must be positive")
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
		if a, ok := number(v); !ok || a < 0 || a >= 0.5 {
			p.errorf("storey.accidental", "must be a fraction from 0 to below 0.5 (0.05 = 5 %% of the plan dimension), not %s", show(v))
		} else {
			s.Accidental = a
		}
	}

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
			case "file", "direction", "position", "start", "name", "layout":
			default:
				p.errorf("wall."+k, "unknown key (a [[wall]] has file, direction, position, and optionally start, name and layout)")
			}
		}
		ref.Name = strings.TrimSpace(p.str(w, "name", "wall.name"))
		ref.Layout = strings.TrimSpace(p.str(w, "layout", "wall.layout"))
		if v, ok := p.need(w, "wall.file"); ok {
			if f, isStr := v.(string); !isStr || strings.TrimSpace(f) == "" {
				p.errorf("wall.file", "must be the path of a wall file, relative to this file, e.g. \"north.toml\"")
			} else {
				ref.File = f
				ref.Path = f
				if !filepath.IsAbs(f) {
					ref.Path = filepath.Join(dir, f)
				}
			}
		}
		if v, ok := p.need(w, "wall.direction"); ok {
			switch v {
			case "x", "X":
				ref.Direction = X
			case "y", "Y":
				ref.Direction = Y
			default:
				p.errorf("wall.direction", "must be \"x\" or \"y\" (the axis along which the wall resists shear), not %s", show(v))
			}
		}
		across := ref.Direction.other()
		if v, ok := p.need(w, "wall.position"); ok {
			if l, ok := p.length(v, "wall.position", s.Units); ok {
				ref.Position = l
				if sizeOK && !inside(l, s.Size[across]) {
					p.errorf("wall.position", "%s is off the plan: %s-wall's position is its %s, from 0 to %s",
						fmtLen(l, s.Units), article(ref.Direction), across, fmtLen(s.Size[across], s.Units))
				}
			}
		}
		if v, ok := w["start"]; ok {
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

var (
	headerLine = regexp.MustCompile(`^\s*(\[\[?)\s*([A-Za-z0-9_.\-]+)\s*\]\]?`)
	keyLine    = regexp.MustCompile(`^\s*([A-Za-z0-9_\-]+)\s*=`)
)

// keyLines maps keys to the lines they are on: "title", "storey",
// "storey.shear", "wall#0" (the first [[wall]] header), "wall#0.file". The
// TOML decoder keeps no positions, and errors must name lines. Multi-line
// strings are skipped over.
func keyLines(data []byte) map[string]int {
	lines := map[string]int{}
	table := ""
	walls := -1
	inMulti := ""
	for i, l := range strings.Split(string(data), "\n") {
		n := i + 1
		if inMulti != "" {
			if strings.Count(l, inMulti)%2 == 1 {
				inMulti = ""
			}
			continue
		}
		if m := headerLine.FindStringSubmatch(l); m != nil {
			table = m[2]
			if m[1] == "[[" && table == "wall" {
				walls++
				table = "wall#" + strconv.Itoa(walls)
			}
			if _, seen := lines[table]; !seen {
				lines[table] = n
			}
			continue
		}
		if m := keyLine.FindStringSubmatch(l); m != nil {
			key := m[1]
			if table != "" {
				key = table + "." + key
			}
			if _, seen := lines[key]; !seen {
				lines[key] = n
			}
			for _, q := range []string{`"""`, `'''`} {
				if strings.Count(l, q)%2 == 1 {
					inMulti = q
				}
			}
		}
	}
	return lines
}
