package geometry

import (
	"slices"
	"strconv"
	"strings"
)

// MarshalKeeping writes w as a wall file that reuses the text of old, an
// earlier version of the same file, wherever it still says the same thing:
// comments, blank lines, the order of tables and keys, and the user's way of
// writing each unchanged value (10'-0" stays 10'-0"). Changed values are
// rewritten in place, keeping the line's comment; removed openings and
// layouts lose their tables (with the comment lines directly above them);
// new ones are added after their kin. Openings and layouts are matched by
// name. When old is not a wall file, or uses TOML forms this merge does not
// follow (inline tables, dotted keys, multi-line values), or the merged
// text would not read back as w, the result is Marshal(w).
func MarshalKeeping(old []byte, w *Wall) ([]byte, error) {
	fresh, err := Marshal(w)
	if err != nil {
		return nil, err
	}
	ow, err := Parse("", old)
	if err != nil {
		return fresh, nil
	}
	oldCanon, err := Marshal(ow)
	if err != nil {
		return fresh, nil
	}
	out, ok := keepText(string(old), ow, string(oldCanon), w, string(fresh))
	if !ok {
		return fresh, nil
	}
	back, err := Parse("", []byte(out))
	if err != nil {
		return fresh, nil
	}
	if again, err := Marshal(back); err != nil || string(again) != string(fresh) {
		return fresh, nil
	}
	return []byte(out), nil
}

// textBlock is one table of a wall file: the comment lines directly above
// its header, the header, and its body up to the next table (the top-level
// keys form the first block, with id "").
type textBlock struct {
	id        string
	lines     []string
	headerEnd int               // lines[:headerEnd] are the comments and the header
	keyLine   map[int]string    // line index → key
	vals      map[string]string // key → value text without comment
	order     []string          // keys in order
	fresh     bool              // added by the merge
}

func newBlock(id string) *textBlock {
	return &textBlock{id: id, keyLine: map[int]string{}, vals: map[string]string{}}
}

// splitBlocks cuts a wall file (that parsed as w) into its tables
// (ScanTOML) and names each one by what it holds: "material", an opening by
// its layout and name. It fails on forms the merge does not follow: dotted
// keys, values that may span lines or hold tables.
func splitBlocks(text string, w *Wall) ([]*textBlock, bool) {
	cur := newBlock("")
	blocks := []*textBlock{cur}
	for _, l := range ScanTOML(strings.TrimSuffix(text, "\n")) {
		switch l.Kind {
		case LineBlank:
			cur.lines = append(cur.lines, l.Text)
		case LineTable, LineArray:
			id, ok := blockID(l.Path, w)
			if !ok {
				return nil, false
			}
			nb := newBlock(id)
			k := len(cur.lines)
			for k > cur.headerEnd && strings.HasPrefix(strings.TrimSpace(cur.lines[k-1]), "#") {
				k--
			}
			nb.lines = append(nb.lines, cur.lines[k:]...)
			cur.lines = cur.lines[:k]
			nb.lines = append(nb.lines, l.Text)
			nb.headerEnd = len(nb.lines)
			cur = nb
			blocks = append(blocks, nb)
		case LineKey:
			if len(l.Segs) != 1 || l.Open || l.Value == "" || strings.ContainsAny(l.Value[:1], "[{") ||
				strings.HasPrefix(l.Value, `"""`) || strings.HasPrefix(l.Value, "'''") {
				return nil, false
			}
			cur.keyLine[len(cur.lines)] = l.Segs[0]
			cur.vals[l.Segs[0]] = l.Value
			cur.order = append(cur.order, l.Segs[0])
			cur.lines = append(cur.lines, l.Text)
		default:
			return nil, false
		}
	}
	return blocks, true
}

// blockID names a table by its content so that the same opening is found
// in two versions of a file even when other openings came or went.
func blockID(path string, w *Wall) (string, bool) {
	if slices.Contains(settingTables(), path) {
		return path, true
	}
	index := func(s, prefix string) (int, string, bool) {
		if !strings.HasPrefix(s, prefix+"[") {
			return 0, "", false
		}
		end := strings.IndexByte(s, ']')
		n, err := strconv.Atoi(s[len(prefix)+1 : end])
		if err != nil {
			return 0, "", false
		}
		return n, s[end+1:], true
	}
	if i, rest, ok := index(path, "opening"); ok && rest == "" {
		if i < 1 || i > len(w.Layouts[0].Openings) {
			return "", false
		}
		return "O\x00" + w.Layouts[0].Openings[i-1].Name, true
	}
	k, rest, ok := index(path, "variant")
	if !ok || k < 1 || k >= len(w.Layouts) {
		return "", false
	}
	v := "V\x00" + w.Layouts[k].Name
	if rest == "" {
		return v, true
	}
	i, rest, ok := index(strings.TrimPrefix(rest, "."), "opening")
	if !ok || rest != "" || i < 1 || i > len(w.Layouts[k].Openings) {
		return "", false
	}
	return v + "\x00O\x00" + w.Layouts[k].Openings[i-1].Name, true
}

// valueAndComment splits the text after '=' into a one-line value and its
// comment; ok is false for values that may span lines or hold tables.
func valueAndComment(s string) (value, comment string, ok bool) {
	v := strings.TrimSpace(s)
	if v == "" || strings.HasPrefix(v, `"""`) || strings.HasPrefix(v, "'''") || v[0] == '[' || v[0] == '{' {
		return "", "", false
	}
	if i := indexUnquoted(v, "#"); i >= 0 {
		return strings.TrimSpace(v[:i]), v[i:], true
	}
	return v, "", true
}

// rewrite gives a key line a new value, keeping its indentation, key text
// and comment (at its old column when there is room).
func rewrite(line, value string) string {
	indent := line[:len(line)-len(strings.TrimLeft(line, " \t"))]
	t := line[len(indent):]
	eq := keyEnd(t)
	_, comment, _ := valueAndComment(t[eq+1:])
	out := indent + strings.TrimRight(t[:eq], " \t") + " = " + value
	if comment != "" {
		col := strings.LastIndex(line, comment)
		if pad := col - len(out); pad > 0 {
			out += strings.Repeat(" ", pad)
		} else {
			out += " "
		}
		out += comment
	}
	return out
}

func keepText(oldText string, ow *Wall, oldCanon string, w *Wall, fresh string) (string, bool) {
	src, ok1 := splitBlocks(oldText, ow)
	oc, ok2 := splitBlocks(oldCanon, ow)
	nc, ok3 := splitBlocks(fresh, w)
	if !ok1 || !ok2 || !ok3 {
		return "", false
	}
	ocMap := map[string]*textBlock{}
	for _, b := range oc {
		ocMap[b.id] = b
	}
	ncMap := map[string]*textBlock{}
	for _, b := range nc {
		ncMap[b.id] = b
	}
	var out []*textBlock
	placed := map[string]bool{}
	dropped := map[int]bool{} // out index before which a table was removed
	for _, b := range src {
		n, inNew := ncMap[b.id]
		o, inOld := ocMap[b.id]
		if !inNew {
			if !inOld {
				out = append(out, b) // all defaults before and after
				placed[b.id] = true
			} else {
				dropped[len(out)] = true
			}
			continue
		}
		if o == nil {
			o = newBlock(b.id)
		}
		nb := newBlock(b.id)
		nb.lines = append(nb.lines, b.lines[:b.headerEnd]...)
		nb.headerEnd = b.headerEnd
		last := len(nb.lines)
		seen := map[string]bool{}
		for i := b.headerEnd; i < len(b.lines); i++ {
			line := b.lines[i]
			key, isKey := b.keyLine[i]
			if !isKey {
				nb.lines = append(nb.lines, line)
				continue
			}
			seen[key] = true
			nv, hasNew := n.vals[key]
			ov, hasOld := o.vals[key]
			switch {
			case hasNew == hasOld && nv == ov:
				nb.lines = append(nb.lines, line)
			case hasNew:
				nb.lines = append(nb.lines, rewrite(line, nv))
			default:
				continue // now a default: leave it out
			}
			last = len(nb.lines)
		}
		var add []string
		for _, k := range n.order {
			if seen[k] {
				continue
			}
			if ov, hasOld := o.vals[k]; hasOld && ov == n.vals[k] {
				continue // implied by the old text and unchanged
			}
			add = append(add, k+" = "+n.vals[k])
		}
		nb.lines = append(nb.lines[:last], append(add, nb.lines[last:]...)...)
		out = append(out, nb)
		placed[b.id] = true
	}
	for _, n := range nc {
		if placed[n.id] {
			continue
		}
		nb := newBlock(n.id)
		nb.lines = append([]string{""}, n.lines...)
		nb.fresh = true
		pos := insertAt(out, n.id)
		out = append(out[:pos], append([]*textBlock{nb}, out[pos:]...)...)
		placed[n.id] = true
		// Keep the removal marks with the blocks they stand before.
		moved := map[int]bool{}
		for i := range dropped {
			if i >= pos {
				moved[i+1] = true
			} else {
				moved[i] = true
			}
		}
		dropped = moved
	}
	var lines []string
	for i, b := range out {
		ls := b.lines
		blankBefore := len(lines) == 0 || strings.TrimSpace(lines[len(lines)-1]) == ""
		if (b.fresh || dropped[i]) && blankBefore {
			for len(ls) > 0 && strings.TrimSpace(ls[0]) == "" {
				ls = ls[1:]
			}
		}
		lines = append(lines, ls...)
	}
	return strings.Join(lines, "\n") + "\n", true
}

// insertAt finds where a new table goes: an opening after the last table of
// its layout, a new layout at the end, a settings table before the openings.
func insertAt(out []*textBlock, id string) int {
	lastWith := func(match func(string) bool) int {
		for i := len(out) - 1; i >= 0; i-- {
			if match(out[i].id) {
				return i + 1
			}
		}
		return -1
	}
	firstWith := func(match func(string) bool) int {
		for i, b := range out {
			if match(b.id) {
				return i
			}
		}
		return -1
	}
	isOpening := func(s string) bool { return strings.HasPrefix(s, "O\x00") }
	isVariant := func(s string) bool { return strings.HasPrefix(s, "V\x00") }
	switch {
	case isOpening(id):
		if p := lastWith(isOpening); p >= 0 {
			return p
		}
		if p := firstWith(isVariant); p >= 0 {
			return p
		}
	case isVariant(id):
		if i := strings.Index(id, "\x00O\x00"); i >= 0 {
			v := id[:i]
			if p := lastWith(func(s string) bool { return s == v || strings.HasPrefix(s, v+"\x00") }); p >= 0 {
				return p
			}
		}
	default:
		if p := firstWith(func(s string) bool { return isOpening(s) || isVariant(s) }); p >= 0 {
			return p
		}
	}
	return len(out)
}
