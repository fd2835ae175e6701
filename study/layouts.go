package study

import (
	"fmt"
	"os"
	"strings"

	"pierwise/geometry"
)

// SplitArg splits a command-line wall argument FILE[:LAYOUT] into the path
// and the layout (variant) name ("" when none is given). A path that names an
// existing file is taken whole, so a file name with a colon still works.
func SplitArg(arg string) (path, variant string) {
	if _, err := os.Stat(arg); err == nil {
		return arg, ""
	}
	i := strings.LastIndex(arg, ":")
	if i <= 0 {
		return arg, ""
	}
	return arg[:i], arg[i+1:]
}

// Select makes the layout called name the wall's active layout.
func Select(w *geometry.Wall, name string) error {
	i := LayoutIndex(w, name)
	if i < 0 {
		return fmt.Errorf("no layout %q; the layouts are %s", name, quoteNames(LayoutNames(w)))
	}
	w.Active = i
	return nil
}

// LayoutIndex returns the index of the layout called name, or -1. Names are
// matched exactly first, then ignoring case.
func LayoutIndex(w *geometry.Wall, name string) int { return w.LayoutIndex(name) }

// LayoutNames returns the names of the wall's layouts in file order.
func LayoutNames(w *geometry.Wall) []string {
	names := make([]string, len(w.Layouts))
	for i, l := range w.Layouts {
		names[i] = l.Name
	}
	return names
}

// WithLayout returns a shallow copy of w whose active layout is i. The
// layouts themselves are shared, so the copy must not be edited.
func WithLayout(w *geometry.Wall, i int) *geometry.Wall {
	c := *w
	c.Active = i
	return &c
}

func quoteNames(names []string) string {
	q := make([]string, len(names))
	for i, n := range names {
		q[i] = fmt.Sprintf("%q", n)
	}
	return strings.Join(q, ", ")
}
