package geometry

import (
	"errors"
	"fmt"
	"math"
	"reflect"
	"slices"
	"sort"
	"strconv"
	"strings"

	"github.com/BurntSushi/toml"
)

// DefaultLayout is the name of the top-level layout when the file gives none.
const DefaultLayout = "main"

// Parse reads a wall file (TOML; see doc.go and Settings) and validates the
// wall. filename is only used in messages. On failure the error is an
// ErrorList naming the file, line and key of every problem found, and the
// wall is nil.
func Parse(filename string, data []byte) (*Wall, error) {
	sc := schemaOf()
	top := reflect.New(sc.top.typ)
	md, err := toml.Decode(string(data), top.Interface())
	if err != nil {
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
	scanned := ScanTOML(string(data))
	p := &fileParser{file: filename, lines: keyLinesOf(scanned), bad: map[string]bool{}, md: &md, sc: sc}
	if e := storeyFile(scanned, p.lines); e != nil {
		e.File = filename
		return nil, ErrorList{e}
	}
	w := p.wall(sc.top.fields(top))
	p.unknownKeys()
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

// storeyFile returns one error that says a storey file (IsStoreyFile) was
// handed over as a wall file, instead of a list of unknown and missing keys.
func storeyFile(scanned []TOMLLine, lines keyLines) *Error {
	if !isStorey(scanned) {
		return nil
	}
	key := "storey"
	if lines.find(key) == 0 {
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
	md    *toml.MetaData
	sc    *schema
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

// badAbove reports whether key or a table or key it lies in could not be
// read (a value given as an inline table has keys of its own).
func (p *fileParser) badAbove(key string) bool {
	for key != "" {
		if p.bad[key] {
			return true
		}
		i := strings.LastIndexAny(key, ".[")
		if i < 0 {
			return false
		}
		key = key[:i]
	}
	return false
}

// unknownKeys reports the keys the decoder met and the parser did not ask
// for (toml.MetaData.Undecoded), and keys that match a known one only when
// case is ignored (the decoder takes those as the known key). Tables of an
// array are numbered in the order of the file, as keyLines numbers them.
func (p *fileParser) unknownKeys() {
	undecoded := map[string]bool{}
	for _, k := range p.md.Undecoded() {
		undecoded[k.String()] = true
	}
	count := map[string]int{}
	for _, k := range p.md.Keys() {
		ks := k.String()
		if p.md.Type(k...) == "ArrayHash" {
			count[ks]++
			for c := range count {
				if strings.HasPrefix(c, ks+".") {
					delete(count, c)
				}
			}
		}
		name := k[len(k)-1]
		parent := p.sc.top.lookup(k[:len(k)-1])
		unknown := undecoded[ks]
		if !unknown && parent != nil && !slices.Contains(parent.keys, name) {
			unknown = true // matched a known key only ignoring case
		}
		if !unknown {
			continue
		}
		// The key path with indices, as errors name it.
		full, prefix := "", ""
		for i, seg := range k {
			full = joinKey(full, seg)
			prefix = joinKey(prefix, seg)
			if n := count[prefix]; n > 0 && i < len(k)-1 {
				full += "[" + strconv.Itoa(n) + "]"
			}
		}
		if p.badAbove(full) || (len(k) > 1 && undecoded[k[:len(k)-1].String()]) {
			continue // inside something already reported
		}
		table := strings.TrimSuffix(full, "."+name)
		where := "here"
		if len(k) > 1 {
			where = "in " + tableName(table)
		}
		known := ""
		if parent != nil {
			known = " (known keys: " + parent.known + ")"
		}
		p.fail(full, "unknown key "+strconv.Quote(name)+" "+where+known)
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

// value decodes one value as the TOML library gives it (string, int64,
// float64, bool, a table, a list, a date).
func (p *fileParser) value(prim *toml.Primitive) any {
	var v any
	_ = p.md.PrimitiveDecode(*prim, &v) // decoding into any cannot fail
	return v
}

// table decodes the table at key (full is its path with indices).
func (p *fileParser) table(m map[string]*toml.Primitive, key, full string, n *node) map[string]*toml.Primitive {
	prim, ok := m[key]
	if !ok {
		return nil
	}
	v := reflect.New(n.typ)
	if err := p.md.PrimitiveDecode(*prim, v.Interface()); err != nil {
		p.fail(full, "must be a table: ["+full+"] followed by its keys")
		return nil
	}
	return n.fields(v)
}

// tables decodes the list of tables at key.
func (p *fileParser) tables(m map[string]*toml.Primitive, key, full string, n *node) []map[string]*toml.Primitive {
	prim, ok := m[key]
	if !ok {
		return nil
	}
	var list []toml.Primitive
	err := p.md.PrimitiveDecode(*prim, &list)
	out := make([]map[string]*toml.Primitive, len(list))
	for i := 0; err == nil && i < len(list); i++ {
		v := reflect.New(n.typ)
		if err = p.md.PrimitiveDecode(list[i], v.Interface()); err == nil {
			out[i] = n.fields(v)
		}
	}
	if err != nil {
		p.fail(full, "must be a list of tables, each starting with [["+stripIndices(full)+"]]")
		return nil
	}
	return out
}

func (p *fileParser) str(m map[string]*toml.Primitive, key, full string) (string, bool) {
	prim, ok := m[key]
	if !ok {
		return "", false
	}
	v := p.value(prim)
	s, ok := v.(string)
	if !ok {
		p.fail(full, "must be text in quotes, not "+describe(v))
		return "", false
	}
	return s, true
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

// length reads a length given as text with a unit or as a bare number in
// the base unit.
func (p *fileParser) length(m map[string]*toml.Primitive, key, full string, sys System) (Length, bool) {
	prim, ok := m[key]
	if !ok {
		return 0, false
	}
	ex := `"12ft"`
	if sys == SI {
		ex = `"3.6m"`
	}
	switch x := p.value(prim).(type) {
	case string:
		l, err := ParseLength(x, sys)
		if err != nil {
			p.fail(full, err.Error())
			return 0, false
		}
		return l, true
	case int64, float64:
		f, _ := toFloat(x)
		l := Length(f) * sys.BaseLength()
		if !finite(float64(l)) {
			p.fail(full, "must be a finite number")
			return 0, false
		}
		return l, true
	default:
		p.fail(full, "must be a value such as "+ex+", not "+describe(x))
	}
	return 0, false
}

func (p *fileParser) requiredLength(m map[string]*toml.Primitive, key, full string, sys System) Length {
	l, ok := p.length(m, key, full, sys)
	if !ok && !p.bad[full] {
		examples := map[string][2]string{"x": {`"4ft"`, `"1.2m"`}, "width": {`"3ft"`, `"900mm"`}, "height": {`"14ft"`, `"3.6m"`}}
		ex := examples[key][0]
		if sys == SI {
			ex = examples[key][1]
		}
		p.fail(full, "missing; add "+key+" = "+ex)
	}
	return l
}

// setting reads one setting from its table (nil when the file has no such
// table) into w.
func (p *fileParser) setting(s *Setting, t map[string]*toml.Primitive, tablePresent bool, w *Wall) {
	table, name := s.split()
	key := s.Key
	prim, given := t[name]
	if !given {
		if s.Required != nil && s.Required(w) && !p.bad[key] && (s.Needs == "" || !p.bad[s.Needs]) {
			msg := "missing; add " + name + " = " + s.example(w.Units)
			if s.Missing != "" {
				msg = s.Missing + s.example(w.Units)
			}
			errKey := key
			if !tablePresent && table != "" && !p.bad[table] {
				errKey = table
			}
			p.fail(errKey, msg)
			p.bad[key] = true
		}
		return
	}
	v, msg := s.fromFile(p.value(prim), w.Units)
	if msg == "" && s.InFile != nil {
		msg = s.InFile(v)
	}
	if msg != "" {
		p.fail(key, msg)
		return
	}
	s.Set(w, v)
}

// fromFile reads a setting's value as the TOML library decoded it.
func (s *Setting) fromFile(raw any, sys System) (Value, string) {
	switch s.Kind {
	case KindText, KindChoice:
		t, ok := raw.(string)
		if !ok {
			return Value{}, "must be text in quotes, not " + describe(raw)
		}
		if s.Kind == KindChoice {
			c, ok := s.choice(t)
			if !ok {
				return Value{}, s.unknownChoice(t)
			}
			t = c
		}
		return Value{Text: t}, ""
	case KindBool:
		b, ok := raw.(bool)
		if !ok {
			return Value{}, "must be true or false (without quotes), not " + describe(raw)
		}
		return Value{Bool: b}, ""
	case KindNumber:
		f, ok := toFloat(raw)
		if !ok {
			return Value{}, "must be a number, not " + describe(raw)
		}
		if !finite(f) {
			return Value{}, "must be a finite number"
		}
		return Value{Num: f}, ""
	case KindDriftLimit:
		return driftLimitFromFile(raw)
	}
	switch x := raw.(type) {
	case string:
		f, err := s.parseQuantity(x, sys)
		if err != nil {
			return Value{}, err.Error()
		}
		return Value{Num: f}, ""
	case int64, float64:
		f, _ := toFloat(x)
		f *= s.base(sys)
		if !finite(f) {
			return Value{}, "must be a finite number"
		}
		return Value{Num: f}, ""
	}
	return Value{}, "must be a value such as " + s.example(sys) + ", not " + describe(raw)
}

func driftLimitFromFile(v any) (Value, string) {
	limit, isNum := toFloat(v)
	if s, isStr := v.(string); isStr {
		if pr, found := FindDriftPreset(s); found {
			return Value{Num: pr.Limit, Text: pr.Name}, ""
		}
		f, msg := parseNumber(strings.TrimSpace(s))
		if msg != "" {
			return Value{}, "unknown preset " + strconv.Quote(s) + " (use " + driftPresetNames() + ", or a number such as 0.01)"
		}
		limit, isNum = f, true
	}
	if !isNum {
		return Value{}, "must be a preset name or a number such as 0.01, not " + describe(v)
	}
	if !finite(limit) || limit <= 0 || limit > 0.1 {
		return Value{}, "must be a fraction of the height greater than 0 and at most 0.1, such as 0.01 (is " + strconv.FormatFloat(limit, 'g', -1, 64) + "); leave it out for no drift check"
	}
	return Value{Num: limit}, ""
}

// newDefaultWall returns a wall with every setting at its default and no
// size, material or layout: what Parse starts from.
func newDefaultWall() *Wall {
	w := &Wall{}
	for i := range Settings {
		Settings[i].Set(w, Settings[i].Default)
	}
	return w
}

func (p *fileParser) wall(raw map[string]*toml.Primitive) *Wall {
	w := newDefaultWall()
	tables := map[string]map[string]*toml.Primitive{"": raw}
	for i := range Settings {
		s := &Settings[i]
		table := s.Table()
		t, seen := tables[table]
		if !seen {
			t = p.table(raw, table, table, p.sc.top.sub[table])
			tables[table] = t
		}
		p.setting(s, t, t != nil, w)
	}
	designTablesGiven(w, func(table string) bool { return tables[table] != nil })
	name := DefaultLayout
	if s, ok := p.str(raw, "layout", "layout"); ok {
		name = s
	}
	w.Layouts = []Layout{{Name: name, Openings: p.openings(raw, "", w.Units)}}
	for k, v := range p.tables(raw, "variant", "variant", p.sc.variant) {
		key := "variant[" + strconv.Itoa(k+1) + "]"
		lay := Layout{}
		if s, ok := p.str(v, "name", key+".name"); ok {
			lay.Name = s
		} else if !p.bad[key+".name"] {
			p.fail(key+".name", `missing; every [[variant]] needs a name = "..."`)
		}
		lay.Openings = p.openings(v, key, w.Units)
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

// openings reads the [[opening]] tables of the layout at prefix ("" for the
// top level) and names the unnamed ones D1, D2… (doors) and W1, W2…
// (windows) after the names already taken.
func (p *fileParser) openings(m map[string]*toml.Primitive, prefix string, sys System) []Opening {
	list := p.tables(m, "opening", joinKey(prefix, "opening"), p.sc.opening)
	if len(list) == 0 {
		return nil
	}
	ops := make([]Opening, len(list))
	for i, t := range list {
		key := joinKey(prefix, "opening["+strconv.Itoa(i+1)+"]")
		o := &ops[i]
		o.Name, _ = p.str(t, "name", key+".name")
		o.X = p.requiredLength(t, "x", key+".x", sys)
		o.Sill, _ = p.length(t, "sill", key+".sill", sys)
		o.Width = p.requiredLength(t, "width", key+".width", sys)
		o.Height = p.requiredLength(t, "height", key+".height", sys)
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
	for i := range Settings {
		if s := &Settings[i]; s.Table() == "" && s.written(w) {
			kv(s.Name(), s.fileText(w))
		}
	}
	if name := w.Layouts[0].Name; name != DefaultLayout {
		kv("layout", quote(name))
	}
	if w.Active != 0 {
		kv("active", quote(w.Layouts[w.Active].Name))
	}
	for _, t := range settingTables() {
		var in []*Setting
		write := false
		for i := range Settings {
			if s := &Settings[i]; s.Table() == t {
				in = append(in, s)
				write = write || s.Write == WriteAlways || !s.IsDefault(w)
			}
		}
		if !write {
			continue
		}
		b.WriteString("\n[" + t + "]\n")
		for _, s := range in {
			if s.Write != WriteChanged || !s.IsDefault(w) {
				kv(s.Name(), s.fileText(w))
			}
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
