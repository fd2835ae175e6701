package geometry

import (
	"strconv"
	"strings"
)

// LineKind says what a line of a TOML source is.
type LineKind int

const (
	LineBlank LineKind = iota // empty, or only a comment
	LineTable                 // a [table] header
	LineArray                 // an [[array]] header: one more table of the array
	LineKey                   // key = value
	LineMore                  // inside a multi-line string or array begun above
	LineOther                 // none of these (not TOML; the decoder says why)
)

// TOMLLine is one line of a TOML source as ScanTOML sees it.
type TOMLLine struct {
	Num  int    // counted from 1
	Text string // as written, without the newline
	Kind LineKind
	// Path is, for a header, the table's key path and, for a key, the key's
	// full path; tables of an array are counted from 1 in the order they
	// appear ("variant[1].opening[2]", "material.strength").
	Path    string
	Table   string   // LineKey: the path of the table the key is in ("" at the top)
	Segs    []string // LineKey: the parts of the key as written, unquoted
	Value   string   // LineKey: the value without its comment, when it ends on this line
	Comment string   // the comment at the end of the line (or the whole comment line), with its '#'
	Open    bool     // LineKey: the value goes on over the next lines
}

// ScanTOML reads a TOML source line by line, quote-aware: tables, arrays of
// tables, dotted and quoted keys, comments, and multi-line strings and
// arrays (their lines are LineMore). The TOML library keeps no positions,
// so the wall and storey parsers find lines for their messages here, and
// MarshalKeeping finds the tables, keys and comments it keeps. It never
// fails: lines it cannot read are LineOther, and keys inside inline
// tables are not mapped.
func ScanTOML(src string) []TOMLLine {
	out := make([]TOMLLine, 0, strings.Count(src, "\n")+1)
	arrays := map[string]int{} // array-of-tables path → tables seen so far
	prefix := ""
	closer := "" // closing delimiter of a multi-line string being skipped
	depth := 0   // bracket depth of a multi-line array being skipped
	resolve := func(segs []string) string {
		path := ""
		for _, s := range segs {
			path = joinKey(path, s)
			if n, ok := arrays[path]; ok {
				path += "[" + strconv.Itoa(n) + "]"
			}
		}
		return path
	}
	for i, line := range strings.Split(src, "\n") {
		l := TOMLLine{Num: i + 1, Text: line, Kind: LineOther}
		switch {
		case closer != "":
			l.Kind = LineMore
			if k := strings.Index(line, closer); k >= 0 {
				closer = ""
			}
		case depth > 0:
			l.Kind = LineMore
			depth, closer = bracketDepth(line, depth)
		default:
			t := strings.TrimSpace(line)
			switch {
			case t == "" || t[0] == '#':
				l.Kind, l.Comment = LineBlank, t
			case strings.HasPrefix(t, "[["):
				end := indexUnquoted(t[2:], "]")
				if end < 0 || !strings.HasPrefix(t[2+end:], "]]") {
					break
				}
				segs := splitKey(t[2 : 2+end])
				if len(segs) == 0 {
					break
				}
				name := joinKey(resolve(segs[:len(segs)-1]), segs[len(segs)-1])
				arrays[name]++
				prefix = name + "[" + strconv.Itoa(arrays[name]) + "]"
				l.Kind, l.Path, l.Comment = LineArray, prefix, trailingComment(t[4+end:])
			case t[0] == '[':
				end := indexUnquoted(t[1:], "]")
				if end < 0 {
					break
				}
				prefix = resolve(splitKey(t[1 : 1+end]))
				l.Kind, l.Path, l.Comment = LineTable, prefix, trailingComment(t[2+end:])
			default:
				eq := keyEnd(t)
				if eq < 0 {
					break
				}
				segs := splitKey(t[:eq])
				if len(segs) == 0 {
					break
				}
				l.Kind, l.Segs, l.Table = LineKey, segs, prefix
				l.Path = prefix
				for _, s := range segs {
					l.Path = joinKey(l.Path, s)
				}
				v := strings.TrimSpace(t[eq+1:])
				for _, q := range []string{`"""`, "'''"} {
					if strings.HasPrefix(v, q) && !strings.Contains(v[3:], q) {
						closer = q
					}
				}
				if closer == "" && strings.HasPrefix(v, "[") {
					depth, closer = bracketDepth(v, 0)
				}
				l.Open = closer != "" || depth > 0
				if !l.Open {
					l.Value, l.Comment = splitComment(v)
				}
			}
		}
		out = append(out, l)
	}
	return out
}

// trailingComment returns the comment after a header, or "".
func trailingComment(rest string) string {
	if i := strings.IndexByte(rest, '#'); i >= 0 {
		return strings.TrimSpace(rest[i:])
	}
	return ""
}

// splitComment splits a one-line value from its comment.
func splitComment(v string) (value, comment string) {
	if i := indexUnquoted(v, "#"); i >= 0 {
		return strings.TrimSpace(v[:i]), v[i:]
	}
	return v, ""
}

// keyLines maps the key paths of a TOML source ("length",
// "material.strength", "opening[2]", "variant[1].opening[3].x"; tables of
// an array counted from 1) to the line, counted from 1, where each is
// written (ScanTOML). Dotted keys map each of their parts.
type keyLines map[string]int

func scanKeyLines(src string) keyLines { return keyLinesOf(ScanTOML(src)) }

func keyLinesOf(lines []TOMLLine) keyLines {
	kl := keyLines{}
	for _, l := range lines {
		switch l.Kind {
		case LineTable, LineArray:
			kl.set(l.Path, l.Num)
		case LineKey:
			path := l.Table
			for _, s := range l.Segs {
				path = joinKey(path, s)
				kl.set(path, l.Num)
			}
		}
	}
	return kl
}

// KeyLines maps every key path of a TOML source (as TOMLLine.Path names
// them) to its line, counted from 1: the first line when a path repeats.
func KeyLines(src []byte) map[string]int {
	return scanKeyLines(string(src))
}

func (kl keyLines) set(path string, line int) {
	if _, ok := kl[path]; !ok {
		kl[path] = line
	}
}

// find returns the line of key, or of its nearest enclosing key or table,
// or 0 when none of them is in the source.
func (kl keyLines) find(key string) int {
	for key != "" {
		if n, ok := kl[key]; ok {
			return n
		}
		if n, ok := kl[key+"[1]"]; ok {
			return n // an array of tables: its first table
		}
		i := strings.LastIndexAny(key, ".[")
		if i < 0 {
			break
		}
		key = key[:i]
	}
	return 0
}

func joinKey(a, b string) string {
	if a == "" {
		return b
	}
	return a + "." + b
}

// keyEnd returns the index of the '=' that ends the key of a key/value line,
// or -1.
func keyEnd(t string) int {
	if i := indexUnquoted(t, "=#"); i >= 0 && t[i] == '=' {
		return i
	}
	return -1
}

// indexUnquoted returns the index of the first byte of t that is one of
// chars and stands outside a TOML string ("…" with backslash escapes, or
// '…'), or -1.
func indexUnquoted(t, chars string) int {
	var q byte
	for i := 0; i < len(t); i++ {
		c := t[i]
		switch {
		case q != 0:
			if c == '\\' && q == '"' {
				i++
			} else if c == q {
				q = 0
			}
		case c == '"' || c == '\'':
			q = c
		case strings.IndexByte(chars, c) >= 0:
			return i
		}
	}
	return -1
}

// splitKey splits a dotted key into its parts, unquoting quoted parts.
func splitKey(k string) []string {
	var segs []string
	var cur strings.Builder
	var q byte
	flush := func() {
		segs = append(segs, cur.String()) // spaces outside quotes are skipped; inside they count
		cur.Reset()
	}
	for i := 0; i < len(k); i++ {
		c := k[i]
		switch {
		case q != 0:
			if c == '\\' && q == '"' && i+1 < len(k) {
				i++
				cur.WriteByte(k[i])
			} else if c == q {
				q = 0
			} else {
				cur.WriteByte(c)
			}
		case c == '"' || c == '\'':
			q = c
		case c == '.':
			flush()
		case c == ' ' || c == '\t':
		default:
			cur.WriteByte(c)
		}
	}
	flush()
	return segs
}

// bracketDepth follows the brackets of a (possibly multi-line) array value
// from depth d to the end of the line, ignoring brackets in strings and
// comments. It also reports a multi-line string left open.
func bracketDepth(s string, d int) (int, string) {
	for i := 0; i < len(s); i++ {
		switch c := s[i]; c {
		case '#':
			return d, ""
		case '[':
			d++
		case ']':
			d--
		case '"', '\'':
			q := string([]byte{c, c, c})
			if strings.HasPrefix(s[i:], q) {
				k := strings.Index(s[i+3:], q)
				if k < 0 {
					return d, q
				}
				i += 3 + k + 2
				continue
			}
			for i++; i < len(s) && s[i] != c; i++ {
				if c == '"' && s[i] == '\\' {
					i++
				}
			}
		}
	}
	if d < 0 {
		d = 0
	}
	return d, ""
}

// OpeningKey returns the key path of the active layout's opening called
// name as errors name it ("opening[2]", "variant[1].opening[3]"), or "" when
// there is none. With KeyLine it lets a caller that finds a problem after
// parsing (the classic method's cut wall) point at the opening's line.
func OpeningKey(w *Wall, name string) string {
	if w == nil || w.Active < 0 || w.Active >= len(w.Layouts) {
		return ""
	}
	for i, o := range w.Layouts[w.Active].Openings {
		if o.Name == name {
			return openingKey(w.Active, i)
		}
	}
	return ""
}

// KeyLine returns the line, counted from 1, of a key path ("length",
// "material.strength", "opening[2]", "variant[1].opening[3].x") in the TOML
// source src, or of its nearest enclosing key or table; 0 when none of them
// is there.
func KeyLine(src []byte, key string) int {
	return scanKeyLines(string(src)).find(key)
}

// IsStoreyFile reports whether a TOML source is a storey file rather than a
// wall file: it has a [storey] table or [[wall]] entries, and none of a
// wall's length, height or [[opening]] tables. It reads the lines only
// (ScanTOML), so a storey file with a TOML error is still recognised and its
// errors reported as a storey file's.
func IsStoreyFile(src []byte) bool { return isStorey(ScanTOML(string(src))) }

func isStorey(lines []TOMLLine) bool {
	storey, wall := false, false
	for _, l := range lines {
		var top string
		switch {
		case l.Kind == LineTable || l.Kind == LineArray:
			top = l.Path
			if i := strings.IndexAny(top, ".["); i >= 0 {
				top = top[:i]
			}
		case l.Kind == LineKey && l.Table == "":
			top = l.Segs[0]
		default:
			continue
		}
		switch top {
		case "storey":
			storey = true
		case "wall":
			wall = true
		case "length", "height", "opening":
			return false
		}
	}
	return storey || wall
}
