package tui

import (
	"math"
	"os"
	"strings"
	"testing"

	tea "github.com/charmbracelet/bubbletea"

	"pierwise/geometry"
	"pierwise/pier"
)

func twoStorey(t *testing.T) *geometry.Wall {
	t.Helper()
	data, err := os.ReadFile("../testdata/walls/two-storey.toml")
	if err != nil {
		t.Fatal(err)
	}
	w, err := geometry.Parse("two-storey.toml", data)
	if err != nil {
		t.Fatal(err)
	}
	return w
}

// At 80 × 24 every warning of the two-storey wall can be read: ! opens a
// page of them, most severe first, which scrolls to the last one.
func TestWarningsPageAt80x24(t *testing.T) {
	w := twoStorey(t)
	ed := newEditor(t, w, "", 80, 24)
	ws := bySeverity(ed.elev().warnings())
	if len(ws) < 3 {
		t.Fatalf("%d warnings, want the two-storey wall's several", len(ws))
	}
	for i := 1; i < len(ws); i++ {
		if ws[i].Severity > ws[i-1].Severity {
			t.Fatalf("warnings not most severe first: %v", pier.Texts(ws))
		}
	}
	if !strings.Contains(ed.view(), "warnings (caution): key !") {
		t.Errorf("the panel does not count the warnings:\n%s", ed.view())
	}
	ed.press(runes("!"))
	seen := ""
	for range 40 {
		seen += ed.view()
		ed.press(tea.KeyMsg{Type: tea.KeyDown})
	}
	flat := strings.Join(strings.Fields(seen), " ")
	for _, wn := range ws {
		// The last words of each warning reach the screen (wrapped, so
		// compare without line breaks and indents).
		words := strings.Fields(wn.Text)
		tail := strings.Join(words[max(0, len(words)-4):], " ")
		if !strings.Contains(flat, tail) {
			t.Errorf("warning never fully shown: ...%q", tail)
		}
	}
	ed.do(runes("!"))
	if ed.elev().mode != modeNormal {
		t.Error("! does not close the warnings page")
	}
}

// The help scrolls at 80 × 24 down to its last line.
func TestHelpScrollsAt80x24(t *testing.T) {
	ed := newEditor(t, annex(), "", 80, 24)
	ed.press(runes("?"))
	ed.press(tea.KeyMsg{Type: tea.KeyEnd})
	if v := ed.view(); !strings.Contains(v, "Assumption of the classic method") && !strings.Contains(v, "finite-element check. (docs") {
		t.Errorf("the end of the help is not reachable:\n%s", v)
	}
}

// A new door on a plain masonry wall goes on the step grid with at least
// one 8 in module of pier each side (geometry.PlaceNew).
func TestNewOpeningPlaced(t *testing.T) {
	ed := newEditor(t, NewWall(geometry.US), "", 80, 24)
	ed.press(runes("d"))
	ed.press(runes("d"))
	ops := ed.wall().Openings()
	if len(ops) != 2 {
		t.Fatalf("%d openings, want 2", len(ops))
	}
	step := float64(ed.elev().stepLength())
	module := float64(8 * geometry.Inch)
	for _, o := range ops {
		if r := math.Mod(float64(o.X)+1e-9, step); r > 1e-6 {
			t.Errorf("%s at x = %g m, off the %g m grid", o.Name, float64(o.X), step)
		}
	}
	a, b := ops[0], ops[1]
	if a.X > b.X {
		a, b = b, a
	}
	if gap := float64(b.X - (a.X + a.Width)); gap < module-1e-9 {
		t.Errorf("pier between the doors %g m, want at least one module (%g m)", gap, module)
	}
	if float64(a.X) < module-1e-9 || float64(ed.wall().Length-(b.X+b.Width)) < module-1e-9 {
		t.Errorf("end piers %g and %g m, want at least %g m", float64(a.X), float64(ed.wall().Length-(b.X+b.Width)), module)
	}
}
