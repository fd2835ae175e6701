package geometry

import (
	"errors"
	"fmt"
	"math"
	"sort"
	"strconv"
	"strings"

	"github.com/BurntSushi/toml"
)

// DefaultLayout is the name of the top-level layout when the file gives none.
const DefaultLayout = "main"

// Parse reads a wall file (TOML, DESIGN §6 plus layouts, stiffness, drift
// and check settings; see doc.go) and validates the wall. filename is only
// used in messages. On failure the error is an ErrorList naming the file,
// line and key of every problem found, and the wall is nil.
func Parse(filename string, data []byte) (w *Wall, err error) {
	defer func() {
		if r := recover(); r != nil {
			w, err = nil, ErrorList{{File: filename, Msg: fmt.Sprint("cannot read the file: ", r)}}
		}
	}()
	var raw map[string]any
	if _, err := toml.Decode(string(data), &raw); err != nil {
		var pe toml.ParseError
		if errors.As(err, &pe) {
			msg := pe.Message
			if msg == "" {
				msg = pe.Error()
			}
			return nil, ErrorList{{File: filename, Line: pe.Position.Line, Key: pe.LastKey, Msg: "not valid TOML: " + msg}}
		}
		return nil, ErrorList{{File: filename, Msg: "not valid TOML: " + err.Error()}}
	}
	p := &fileParser{file: filename, lines: scanKeyLines(string(data)), bad: map[string]bool{}}
	if e := storeyFile(raw, p.lines); e != nil {
		e.File = filename
		return nil, ErrorList{e}
	}
	w = p.wall(raw)
	for _, e := range errorList(w.Validate()) {
		if !p.hidden(e.Key) {
			p.errs = append(p.errs, e)
		}
	}
	if len(p.errs) > 0 {
		for _, e := range p.errs {
			e.File = filename
			if e.Line == 0 {
				e.Line = p.lines.find(e.Key)
			}
		}
		sort.SliceStable(p.errs, func(i, j int) bool { return p.errs[i].Line < p.errs[j].Line })
		return nil, p.errs
	}
	return w, nil
}

// storeyFile recognises a storey file (DESIGN §10: a [storey] table or
// [[wall]] entries, and none of a wall's sizes) handed over as a wall file,
// and returns one error that says so instead of a list of unknown and
// missing keys.
func storeyFile(raw map[string]any, lines keyLines) *Error {
	_, st := raw["storey"]
	_, wl := raw["wall"]
	if !st && !wl {
		return nil
	}
	for _, k := range []string{"length", "height", "opening"} {
		if _, ok := raw[k]; ok {
			return nil // a wall file with a stray key: report it as such
		}
	}
	key := "storey"
	if !st {
		key = "wall"
	}
	return &Error{Line: lines.find(key), Key: key,
		Msg: "this is a storey file ([storey] and [[wall]]), not a wall file: use it with pierwise storey or pierwise report"}
}

// LoadFile reads and parses the wall file at path. (It cannot be called
// Load: that name is the type of the wall's load.)
func LoadFile(path string) (*Wall, error) {
	data, err := ReadUserFile(path)
	if err != nil {
		return nil, err
	}
	return Parse(path, data)
}

func errorList(err error) ErrorList {
	var l ErrorList
	if errors.As(err, &l) {
		return l
	}
	if err != nil {
		return ErrorList{{Msg: err.Error()}}
	}
	return nil
}

type fileParser struct {
	file  string
	lines keyLines
	errs  ErrorList
	bad   map[string]bool // keys that could not be read; validation stays quiet about them
	sys   System
}

func (p *fileParser) fail(key, msg string) {
	p.bad[key] = true
	p.errs = append(p.errs, &Error{Key: key, Line: p.lines.find(key), Msg: msg})
}

// hidden reports whether a validation error about key would repeat a
// reading error already reported for key or for one of its parts.
func (p *fileParser) hidden(key string) bool {
	if p.bad[key] {
		return true
	}
	for k := range p.bad {
		if strings.HasPrefix(k, key+".") {
			return true
		}
	}
	return false
}

// table checks that every key of m is one of allowed and reports the others.
func (p *fileParser) table(m map[string]any, prefix string, allowed ...string) {
	var unknown []string
	for k := range m {
		found := false
		for _, a := range allowed {
			if k == a {
				found = true
				break
			}
		}
		if !found {
			unknown = append(unknown, k)
		}
	}
	sort.Strings(unknown)
	for _, k := range unknown {
		full := joinKey(prefix, k)
		where := "here"
		if prefix != "" {
			where = "in " + tableName(prefix)
		}
		p.fail(full, "unknown key "+strconv.Quote(k)+" "+where+" (known keys: "+strings.Join(allowed, ", ")+")")
	}
}

func tableName(prefix string) string {
	if i := strings.LastIndexByte(prefix, '['); i >= 0 {
		return "[[" + stripIndices(prefix[:i]) + "]]"
	}
	return "[" + prefix + "]"
}

func stripIndices(k string) string {
	var b strings.Builder
	skip := false
	for _, r := range k {
		switch {
		case r == '[':
			skip = true
		case r == ']':
			skip = false
		case !skip:
			b.WriteRune(r)
		}
	}
	return b.String()
}

func (p *fileParser) subTable(m map[string]any, key string) map[string]any {
	v, ok := m[key]
	if !ok {
		return nil
	}
	t, ok := v.(map[string]any)
	if !ok {
		p.fail(key, "must be a table: ["+key+"] followed by its keys")
		return nil
	}
	return t
}

func (p *fileParser) tables(m map[string]any, key, full string) []map[string]any {
	v, ok := m[key]
	if !ok {
		return nil
	}
	t, ok := v.([]map[string]any)
	if !ok {
		p.fail(full, "must be a list of tables, each starting with [["+stripIndices(full)+"]]")
		return nil
	}
	return t
}

func (p *fileParser) str(m map[string]any, key, full string) (string, bool) {
	v, ok := m[key]
	if !ok {
		return "", false
	}
	s, ok := v.(string)
	if !ok {
		p.fail(full, "must be text in quotes, not "+describe(v))
		return "", false
	}
	return s, true
}

func (p *fileParser) number(m map[string]any, key, full string, def float64) float64 {
	v, ok := m[key]
	if !ok {
		return def
	}
	f, ok := toFloat(v)
	if !ok {
		p.fail(full, "must be a number, not "+describe(v))
		return def
	}
	if !finite(f) {
		p.fail(full, "must be a finite number")
		return def
	}
	return f
}

func toFloat(v any) (float64, bool) {
	switch x := v.(type) {
	case int64:
		return float64(x), true
	case float64:
		return x, true
	}
	return 0, false
}

func describe(v any) string {
	switch v.(type) {
	case string:
		return "text"
	case int64, float64:
		return "a number"
	case bool:
		return "true/false"
	case map[string]any:
		return "a table"
	case []map[string]any:
		return "a list of tables"
	case []any:
		return "a list"
	}
	return "a date or time"
}

// quantity reads a length, force or stress given as text with a unit or as
// a bare number in the base unit.
func quantity[T ~float64](p *fileParser, m map[string]any, key, full string, parse func(string, System) (T, error), base T, example string) (T, bool) {
	v, ok := m[key]
	if !ok {
		return 0, false
	}
	switch x := v.(type) {
	case string:
		q, err := parse(x, p.sys)
		if err != nil {
			p.fail(full, err.Error())
			return 0, false
		}
		return q, true
	case int64, float64:
		f, _ := toFloat(x)
		q := T(f) * base
		if !finite(float64(q)) {
			p.fail(full, "must be a finite number")
			return 0, false
		}
		return q, true
	}
	p.fail(full, "must be a value such as "+example+", not "+describe(v))
	return 0, false
}

func (p *fileParser) length(m map[string]any, key, full string) (Length, bool) {
	ex := `"12ft"`
	if p.sys == SI {
		ex = `"3.6m"`
	}
	return quantity(p, m, key, full, ParseLength, p.sys.BaseLength(), ex)
}

func (p *fileParser) requiredLength(m map[string]any, key, full string) Length {
	l, ok := p.length(m, key, full)
	if !ok && !p.bad[full] {
		examples := map[string][2]string{
			"length": {`"36ft"`, `"9.6m"`}, "height": {`"14ft"`, `"3.6m"`}, "thickness": {`"7.625in"`, `"190mm"`},
			"x": {`"4ft"`, `"1.2m"`}, "width": {`"3ft"`, `"900mm"`},
		}
		ex := examples[key][0]
		if p.sys == SI {
			ex = examples[key][1]
		}
		if ex == "" {
			ex = `"4ft"`
		}
		p.fail(full, "missing; add "+key+" = "+ex)
	}
	return l
}

func (p *fileParser) wall(raw map[string]any) *Wall {
	w := &Wall{
		Stiffness: Stiffness{Flexure: 1, Shear: 1},
		Drift:     Drift{Cd: 1, Ie: 1},
	}
	p.table(raw, "", "title", "units", "length", "height", "thickness", "support",
		"layout", "active", "material", "load", "stiffness", "drift", "check", "opening", "variant")
	w.Title, _ = p.str(raw, "title", "title")
	if u, ok := p.str(raw, "units", "units"); ok {
		if w.Units, ok = ParseSystem(u); !ok {
			p.fail("units", "unknown unit system "+strconv.Quote(u)+` (use "us" or "si")`)
		}
	}
	p.sys = w.Units
	w.Length = p.requiredLength(raw, "length", "length")
	w.Height = p.requiredLength(raw, "height", "height")
	w.Thickness = p.requiredLength(raw, "thickness", "thickness")
	if s, ok := p.str(raw, "support", "support"); ok {
		if w.Support, ok = ParseSupport(s); !ok {
			p.fail("support", "unknown support "+strconv.Quote(s)+` (use "cantilever" or "fixed")`)
		}
	}
	p.material(w, p.subTable(raw, "material"))
	if t := p.subTable(raw, "load"); t != nil {
		p.table(t, "load", "shear")
		w.Load.Shear, _ = quantity(p, t, "shear", "load.shear", ParseForce, p.sys.BaseForce(), `"40kip"`)
	}
	if t := p.subTable(raw, "stiffness"); t != nil {
		p.table(t, "stiffness", "flexure", "shear")
		w.Stiffness.Flexure = p.number(t, "flexure", "stiffness.flexure", 1)
		w.Stiffness.Shear = p.number(t, "shear", "stiffness.shear", 1)
	}
	if t := p.subTable(raw, "drift"); t != nil {
		p.drift(w, t)
	}
	if t := p.subTable(raw, "check"); t != nil {
		p.table(t, "check", "mesh", "element")
		if m, ok := p.length(t, "mesh", "check.mesh"); ok {
			if m <= 0 {
				p.fail("check.mesh", "must be greater than zero (leave it out for the default size)")
			}
			w.Check.Mesh = m
		}
		w.Check.Element, _ = p.str(t, "element", "check.element")
	}
	name := DefaultLayout
	if s, ok := p.str(raw, "layout", "layout"); ok {
		name = s
	}
	w.Layouts = []Layout{{Name: name, Openings: p.openings(raw, "")}}
	for k, v := range p.tables(raw, "variant", "variant") {
		key := "variant[" + strconv.Itoa(k+1) + "]"
		p.table(v, key, "name", "opening")
		lay := Layout{}
		if s, ok := p.str(v, "name", key+".name"); ok {
			lay.Name = s
		} else if !p.bad[key+".name"] {
			p.fail(key+".name", `missing; every [[variant]] needs a name = "..."`)
		}
		lay.Openings = p.openings(v, key)
		w.Layouts = append(w.Layouts, lay)
	}
	if s, ok := p.str(raw, "active", "active"); ok {
		found := false
		var names []string
		for k, lay := range w.Layouts {
			names = append(names, strconv.Quote(lay.Name))
			if lay.Name == s && !found {
				w.Active, found = k, true
			}
		}
		if !found {
			p.fail("active", "no layout named "+strconv.Quote(s)+" (layouts: "+strings.Join(names, ", ")+")")
		}
	}
	return w
}

func (p *fileParser) material(w *Wall, t map[string]any) {
	p.table(t, "material", "kind", "strength", "modulus", "shear_modulus", "poisson")
	if s, ok := p.str(t, "kind", "material.kind"); ok {
		if w.Material.Kind, ok = ParseMaterialKind(s); !ok {
			p.fail("material.kind", "unknown material "+strconv.Quote(s)+" (use concrete-masonry, clay-masonry, concrete or custom)")
		}
	}
	ex := `"2000psi"`
	if p.sys == SI {
		ex = `"13.8MPa"`
	}
	var ok bool
	w.Material.Strength, ok = quantity(p, t, "strength", "material.strength", ParseStress, p.sys.BaseStress(), ex)
	if !ok && !p.bad["material.strength"] && !p.bad["material.kind"] && w.Material.Kind != Custom {
		key := "material.strength"
		if t == nil && !p.bad["material"] {
			key = "material"
		}
		p.fail(key, "missing strength (f'm for masonry, f'c for concrete); add [material] strength = "+ex)
		p.bad["material.strength"] = true
	}
	w.Material.Modulus, _ = quantity(p, t, "modulus", "material.modulus", ParseStress, p.sys.BaseStress(), ex)
	w.Material.ShearModulus, _ = quantity(p, t, "shear_modulus", "material.shear_modulus", ParseStress, p.sys.BaseStress(), ex)
	w.Material.Poisson = p.number(t, "poisson", "material.poisson", 0)
}

func (p *fileParser) drift(w *Wall, t map[string]any) {
	p.table(t, "drift", "cd", "ie", "limit")
	w.Drift.Cd = p.number(t, "cd", "drift.cd", 1)
	w.Drift.Ie = p.number(t, "ie", "drift.ie", 1)
	v, ok := t["limit"]
	if !ok {
		return
	}
	const key = "drift.limit"
	limit, isNum := toFloat(v)
	if s, isStr := v.(string); isStr {
		if pr, found := FindDriftPreset(s); found {
			w.Drift.Preset, w.Drift.Limit = pr.Name, pr.Limit
			return
		}
		f, msg := parseNumber(strings.TrimSpace(s))
		if msg != "" {
			p.fail(key, "unknown preset "+strconv.Quote(s)+" (use "+driftPresetNames()+", or a number such as 0.01)")
			return
		}
		limit, isNum = f, true
	}
	if !isNum {
		p.fail(key, "must be a preset name or a number such as 0.01, not "+describe(v))
		return
	}
	if !finite(limit) || limit <= 0 || limit > 0.1 {
		p.fail(key, "must be a fraction of the height greater than 0 and at most 0.1, such as 0.01 (is "+strconv.FormatFloat(limit, 'g', -1, 64)+"); leave it out for no drift check")
		return
	}
	w.Drift.Limit = limit
}

// openings reads the [[opening]] tables of the layout at prefix ("" for the
// top level) and names the unnamed ones D1, D2… (doors) and W1, W2…
// (windows) after the names already taken.
func (p *fileParser) openings(m map[string]any, prefix string) []Opening {
	list := p.tables(m, "opening", joinKey(prefix, "opening"))
	if len(list) == 0 {
		return nil
	}
	ops := make([]Opening, len(list))
	for i, t := range list {
		key := joinKey(prefix, "opening["+strconv.Itoa(i+1)+"]")
		p.table(t, key, "name", "x", "sill", "width", "height")
		o := &ops[i]
		o.Name, _ = p.str(t, "name", key+".name")
		o.X = p.requiredLength(t, "x", key+".x")
		o.Sill, _ = p.length(t, "sill", key+".sill")
		o.Width = p.requiredLength(t, "width", key+".width")
		o.Height = p.requiredLength(t, "height", key+".height")
	}
	for i := range ops {
		if _, named := list[i]["name"]; !named {
			ops[i].Name = nextName(ops, ops[i].Sill <= 0)
		}
	}
	return ops
}

// Marshal writes the wall as a tidy wall file in the wall's units. Every
// value is written in a natural unit (ft, in or feet-inches for US walls, m
// or mm for SI walls) only when that text reads back to the very same
// number; otherwise with more digits, or in SI base units. Parse(Marshal(w))
// therefore equals w for every valid wall. Marshal refuses what a file cannot
// hold: non-finite numbers, text that is not UTF-8, values of no name.
func Marshal(w *Wall) ([]byte, error) {
	if err := marshalable(w); err != nil {
		return nil, err
	}
	var b strings.Builder
	sys := w.Units
	kv := func(k, v string) { b.WriteString(k + " = " + v + "\n") }
	if w.Title != "" {
		kv("title", quote(w.Title))
	}
	kv("units", quote(sys.String()))
	kv("length", quote(exactLength(w.Length, sys)))
	kv("height", quote(exactLength(w.Height, sys)))
	kv("thickness", quote(exactLength(w.Thickness, sys)))
	kv("support", quote(w.Support.String()))
	if name := w.Layouts[0].Name; name != DefaultLayout {
		kv("layout", quote(name))
	}
	if w.Active != 0 {
		kv("active", quote(w.Layouts[w.Active].Name))
	}
	m := w.Material
	b.WriteString("\n[material]\n")
	kv("kind", quote(m.Kind.String()))
	if m.Strength != 0 {
		kv("strength", quote(exactStress(m.Strength, sys)))
	}
	if m.Modulus != 0 {
		kv("modulus", quote(exactStress(m.Modulus, sys)))
	}
	if m.ShearModulus != 0 {
		kv("shear_modulus", quote(exactStress(m.ShearModulus, sys)))
	}
	if m.Poisson != 0 {
		kv("poisson", strconv.FormatFloat(m.Poisson, 'g', -1, 64))
	}
	if w.Load.Shear != 0 {
		b.WriteString("\n[load]\n")
		kv("shear", quote(exactForce(w.Load.Shear, sys)))
	}
	if w.Stiffness.Flexure != 1 || w.Stiffness.Shear != 1 {
		b.WriteString("\n[stiffness]\n")
		kv("flexure", tomlFloat(w.Stiffness.Flexure))
		kv("shear", tomlFloat(w.Stiffness.Shear))
	}
	d := w.Drift
	if d.Cd != 1 || d.Ie != 1 || d.Limit != 0 || d.Preset != "" {
		b.WriteString("\n[drift]\n")
		kv("cd", tomlFloat(d.Cd))
		kv("ie", tomlFloat(d.Ie))
		if d.Preset != "" {
			kv("limit", quote(d.Preset))
		} else if d.Limit != 0 {
			kv("limit", tomlFloat(d.Limit))
		}
	}
	if w.Check.Mesh != 0 || w.Check.Element != "" {
		b.WriteString("\n[check]\n")
		if w.Check.Mesh != 0 {
			kv("mesh", quote(exactLength(w.Check.Mesh, sys)))
		}
		if w.Check.Element != "" {
			kv("element", quote(w.Check.Element))
		}
	}
	for k, lay := range w.Layouts {
		table := "[[opening]]"
		if k > 0 {
			b.WriteString("\n[[variant]]\n")
			kv("name", quote(lay.Name))
			table = "[[variant.opening]]"
		}
		for _, o := range lay.Openings {
			b.WriteString("\n" + table + "\n")
			kv("name", quote(o.Name))
			kv("x", quote(exactLength(o.X, sys)))
			kv("sill", quote(exactLength(o.Sill, sys)))
			kv("width", quote(exactLength(o.Width, sys)))
			kv("height", quote(exactLength(o.Height, sys)))
		}
	}
	return []byte(b.String()), nil
}

// marshalable reports what Marshal cannot write so that it reads back.
func marshalable(w *Wall) error {
	var l ErrorList
	w.validate(&l)
	var keep ErrorList
	for _, e := range l {
		if strings.Contains(e.Msg, "finite") || strings.Contains(e.Msg, "UTF-8") || strings.HasPrefix(e.Msg, "unknown") ||
			e.Key == "layout" || e.Key == "active" {
			keep = append(keep, e)
		}
	}
	if w.Drift.Preset != "" {
		if _, ok := FindDriftPreset(w.Drift.Preset); !ok {
			keep = append(keep, &Error{Key: "drift.limit", Msg: "unknown preset " + strconv.Quote(w.Drift.Preset)})
		}
	}
	return keep.Err()
}

// Save writes the wall file atomically: a temporary file in the same
// directory, flushed to disk, then renamed over path. An existing file keeps
// its permission bits; a symbolic link keeps pointing at the file it names.
// When path already holds a wall file, its comments and unchanged lines are
// kept where practical (see MarshalKeeping).
func Save(path string, w *Wall) error {
	data, err := Marshal(w)
	if err != nil {
		return err
	}
	if old, err := ReadUserFile(path); err == nil {
		if kept, err := MarshalKeeping(old, w); err == nil {
			data = kept
		}
	}
	return writeAtomic(path, data)
}

// writeAtomic is WriteFileAtomic, which keeps a symbolic link pointing at
// the file it names.
func writeAtomic(path string, data []byte) error { return WriteFileAtomic(path, data) }

// quote writes a TOML basic string.
func quote(s string) string {
	var b strings.Builder
	b.WriteByte('"')
	for _, r := range s {
		switch {
		case r == '"':
			b.WriteString(`\"`)
		case r == '\\':
			b.WriteString(`\\`)
		case r == '\n':
			b.WriteString(`\n`)
		case r == '\t':
			b.WriteString(`\t`)
		case r == '\r':
			b.WriteString(`\r`)
		case r < 0x20 || r == 0x7f:
			fmt.Fprintf(&b, `\u%04X`, r)
		default:
			b.WriteRune(r)
		}
	}
	b.WriteByte('"')
	return b.String()
}

// tomlFloat writes a float that TOML reads back as the same float.
func tomlFloat(v float64) string {
	s := strconv.FormatFloat(v, 'g', -1, 64)
	if !strings.ContainsAny(s, ".eEn") {
		s += ".0"
	}
	return s
}

// decimals formats v with at most n decimals and no trailing zeros.
func decimals(v float64, n int) string {
	s := strconv.FormatFloat(v, 'f', n, 64)
	if strings.Contains(s, ".") {
		s = strings.TrimRight(strings.TrimRight(s, "0"), ".")
	}
	if s == "-0" {
		s = "0"
	}
	return s
}

// firstExact returns the first candidate that parse reads back as exactly
// v, or fallback (which must be exact).
func firstExact[T ~float64](v T, sys System, parse func(string, System) (T, error), fallback string, cands ...string) string {
	for _, c := range cands {
		if got, err := parse(c, sys); err == nil && got == v {
			return c
		}
	}
	return fallback
}

// exactLength writes a length in a natural unit that reads back to the same
// float64 (see Marshal).
func exactLength(l Length, sys System) string {
	v := float64(l)
	if v == 0 {
		return "0"
	}
	exact := strconv.FormatFloat(v, 'g', -1, 64) + "m"
	if sys == SI {
		mm, m := decimals(v/float64(Millimetre), 3)+"mm", decimals(v, 6)+"m"
		if math.Abs(v) < 1 {
			return firstExact(l, sys, ParseLength, exact, mm, m, decimals(v/float64(Millimetre), 6)+"mm")
		}
		return firstExact(l, sys, ParseLength, exact, m, mm, decimals(v/float64(Millimetre), 6)+"mm")
	}
	ft := v / float64(Foot)
	in := v / float64(Inch)
	var cands []string
	if r := math.Round(ft); math.Abs(ft-r) < 1e-9*math.Max(1, math.Abs(r)) {
		cands = append(cands, decimals(r, 0)+"ft")
	}
	if math.Abs(in) < 24 {
		cands = append(cands, decimals(in, 4)+"in")
	}
	if tot, err := strconv.ParseFloat(decimals(math.Abs(in), 4), 64); err == nil && tot >= 12 && tot < 1e15 {
		f := math.Floor(tot / 12)
		rest, _ := strconv.ParseFloat(decimals(tot-12*f, 4), 64)
		if rest >= 12 {
			f, rest = f+1, rest-12
		}
		sign := ""
		if v < 0 {
			sign = "-"
		}
		cands = append(cands, sign+decimals(f, 0)+"'-"+decimals(rest, 4)+`"`)
	}
	cands = append(cands, decimals(ft, 6)+"ft", decimals(in, 6)+"in")
	return firstExact(l, sys, ParseLength, exact, cands...)
}

func exactForce(f Force, sys System) string {
	v := float64(f)
	exact := strconv.FormatFloat(v, 'g', -1, 64) + "N"
	if sys == SI {
		return firstExact(f, sys, ParseForce, exact, decimals(v/float64(Kilonewton), 4)+"kN", decimals(v, 4)+"N")
	}
	kip, lb := decimals(v/float64(Kip), 4)+"kip", decimals(v/float64(Pound), 4)+"lb"
	if math.Abs(v) < float64(Kip) {
		return firstExact(f, sys, ParseForce, exact, lb, kip)
	}
	return firstExact(f, sys, ParseForce, exact, kip, lb)
}

func exactStress(s Stress, sys System) string {
	v := float64(s)
	exact := strconv.FormatFloat(v, 'g', -1, 64) + "Pa"
	if sys == SI {
		return firstExact(s, sys, ParseStress, exact, decimals(v/float64(Megapascal), 4)+"MPa", decimals(v/float64(Gigapascal), 6)+"GPa")
	}
	psi, ksi := decimals(v/float64(PSI), 4)+"psi", decimals(v/float64(KSI), 4)+"ksi"
	if math.Abs(v) >= float64(100*KSI) {
		return firstExact(s, sys, ParseStress, exact, ksi, psi)
	}
	return firstExact(s, sys, ParseStress, exact, psi, ksi)
}
