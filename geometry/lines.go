package geometry

import (
	"strconv"
	"strings"
)

// keyLines maps the key paths of a TOML source ("length",
// "material.strength", "opening[2]", "variant[1].opening[3].x"; tables of
// an array counted from 1) to the line, counted from 1, where each is
// written. The TOML library does not expose key positions, so this small
// scanner reads the source a second time; it understands tables, arrays of
// tables, dotted and quoted keys, and skips multi-line strings and arrays.
// Keys inside inline tables are not mapped; find falls back to the line of
// the enclosing key.
type keyLines map[string]int

func scanKeyLines(src string) keyLines {
	kl := keyLines{}
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
		n := i + 1
		if closer != "" {
			if k := strings.Index(line, closer); k >= 0 {
				closer = ""
				line = line[k+3:]
			} else {
				continue
			}
		}
		if depth > 0 {
			depth, closer = bracketDepth(line, depth)
			continue
		}
		t := strings.TrimSpace(line)
		switch {
		case t == "" || t[0] == '#':
		case strings.HasPrefix(t, "[["):
			end := strings.Index(t, "]]")
			if end < 0 {
				continue
			}
			segs := splitKey(t[2:end])
			if len(segs) == 0 {
				continue
			}
			name := joinKey(resolve(segs[:len(segs)-1]), segs[len(segs)-1])
			arrays[name]++
			prefix = name + "[" + strconv.Itoa(arrays[name]) + "]"
			kl.set(prefix, n)
		case t[0] == '[':
			end := strings.IndexByte(t, ']')
			if end < 0 {
				continue
			}
			prefix = resolve(splitKey(t[1:end]))
			kl.set(prefix, n)
		default:
			eq := keyEnd(t)
			if eq < 0 {
				continue
			}
			segs := splitKey(t[:eq])
			if len(segs) == 0 {
				continue
			}
			path := prefix
			for _, s := range segs {
				path = joinKey(path, s)
				kl.set(path, n)
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
		}
	}
	return kl
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
		segs = append(segs, strings.TrimSpace(cur.String()))
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
