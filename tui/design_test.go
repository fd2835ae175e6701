package tui

import (
	"fmt"
	"math"
	"strings"
	"testing"

	tea "github.com/charmbracelet/bubbletea"

	"pierwise/design"
	"pierwise/geometry"
	"pierwise/pier"
	"pierwise/report"
)

// reinforced is the repository's reinforced example wall (invented data).
func reinforced(t *testing.T) *geometry.Wall {
	t.Helper()
	w, err := geometry.LoadFile("../testdata/walls/cmu-reinforced.toml")
	if err != nil {
		t.Fatal(err)
	}
	return w
}

// overloaded is the example wall under a shear its piers cannot carry.
func overloaded(t *testing.T) *geometry.Wall {
	w := reinforced(t)
	w.Load.Shear = 150 * geometry.Kip
	return w
}

func TestDesignGolden(t *testing.T) {
	for _, size := range [][2]int{{80, 24}, {120, 36}} {
		W, H := size[0], size[1]
		for _, tc := range []struct {
			name string
			wall func(*testing.T) *geometry.Wall
			keys []tea.Msg
		}{
			{"design_shares", reinforced, nil},
			{"design_ratios", reinforced, []tea.Msg{runes("R")}},
			{"design_fails", overloaded, []tea.Msg{runes("R")}},
			{"design_pier", reinforced, []tea.Msg{openPier}},
			{"design_pier_next", overloaded, []tea.Msg{openPier, keyTab}},
		} {
			name := fmt.Sprintf("%s_%dx%d.golden", tc.name, W, H)
			t.Run(name, func(t *testing.T) {
				ed := newEditor(t, tc.wall(t), "", W, H)
				for _, k := range tc.keys {
					if _, ok := k.(openPierMsg); ok {
						ed.press(pushScreenMsg{newPierView(ed.m.c)})
						continue
					}
					ed.press(k)
				}
				v := ed.view()
				checkSize(t, v, W, H)
				checkGolden(t, name, v)
			})
		}
	}
}

// openPier stands for P in the golden tests: the elevation answers P with
// a command that pushes the pier view, which the tests push themselves.
type openPierMsg struct{}

var openPier = openPierMsg{}

// P pushes the pier view.
func TestPierKeyOpensView(t *testing.T) {
	ed := newEditor(t, reinforced(t), "", 80, 24)
	cmd := ed.press(runes("P"))
	if cmd == nil {
		t.Fatal("P gives no command")
	}
	found := false
	for _, s := range screenEntries {
		if s.name == "pier design" {
			next, _ := s.open(ed.m.c)
			_, found = next.(*pierView)
		}
	}
	if !found {
		t.Error("no pier design screen registered")
	}
}

// The ratios on the drawing and in the table are the design package's, and
// they follow every edit; a pier over 1.0 is filled with failFill and its
// ratio marked "!", without colour.
func TestRatiosFollowEdits(t *testing.T) {
	ed := newEditor(t, overloaded(t), "", 120, 36)
	ed.press(runes("R"))
	if !ed.elev().showRatios() {
		t.Fatal("R does not show ratios")
	}
	for step := 0; step < 3; step++ {
		w := ed.wall()
		res, err := pier.Solve(w)
		if err != nil {
			t.Fatal(err)
		}
		want, err := design.CheckWall(design.InputOf(w, design.ClassicPiers(res)))
		if err != nil {
			t.Fatal(err)
		}
		v := ed.view()
		for _, p := range want.Piers {
			cell := report.Ratio(p.Ratio)
			if !strings.Contains(v, cell) {
				t.Errorf("step %d: %s ratio %s not shown:\n%s", step, p.Name, cell, v)
			}
		}
		if !want.OK && !strings.Contains(v, strings.Repeat(string(failFill), 4)) {
			t.Errorf("step %d: a failing wall without %c fill:\n%s", step, failFill, v)
		}
		gp := want.Piers[want.Governing]
		if !strings.Contains(v, gp.Name+" "+report.Ratio(gp.Ratio)) {
			t.Errorf("step %d: results panel does not name governing %s %s", step, gp.Name, report.Ratio(gp.Ratio))
		}
		ed.press(keyTab, runes("l")) // move an opening: the ratios move with it
	}
	// Ratios of a wall with no lateral load and no gravity are all zero
	// (docs/method.md §8 invariant), so nothing is filled as failing.
	w := reinforced(t)
	w.Load.Shear = 0
	ed = newEditor(t, w, "", 80, 24)
	ed.press(runes("R"))
	if strings.Contains(ed.view(), "!") && strings.Contains(ed.view(), "!!!") {
		t.Errorf("unloaded wall shows failures:\n%s", ed.view())
	}
}

// R on a wall without [design] refuses and says why.
func TestRatiosNeedDesign(t *testing.T) {
	ed := newEditor(t, annex(), "", 80, 24)
	ed.press(runes("R"))
	if ed.elev().ratios || !strings.Contains(ed.view(), "no pier design") {
		t.Errorf("R without [design]:\n%s", ed.view())
	}
}

// The pier view tabs through the piers and plots each pier's curve with its
// demand points; the caution is on it.
func TestPierView(t *testing.T) {
	ed := newEditor(t, overloaded(t), "", 80, 24)
	v := newPierView(ed.m.c)
	v.setSize(80, 24)
	r := v.design.res
	if r == nil || v.sel != r.Governing {
		t.Fatalf("opens on pier %d, governing %d", v.sel, r.Governing)
	}
	seen := map[string]bool{}
	for range r.Piers {
		out := v.view()
		p := r.Piers[v.sel]
		seen[p.Name] = true
		if !strings.Contains(out, p.Name+" ("+fmt.Sprint(v.sel+1)+" of") || !strings.Contains(out, "licensed engineer") {
			t.Errorf("pier view of %s:\n%s", p.Name, out)
		}
		if !strings.ContainsAny(out, "x!*") || !strings.ContainsRune(out, '⠀'+1) && !hasBraille(out) {
			t.Errorf("%s: no curve or demand points:\n%s", p.Name, out)
		}
		v.update(keyTab)
	}
	if len(seen) != len(r.Piers) {
		t.Errorf("tab visited %d of %d piers", len(seen), len(r.Piers))
	}
}

func hasBraille(s string) bool {
	for _, r := range s {
		if r > 0x2800 && r <= 0x28ff {
			return true
		}
	}
	return false
}

// The plot puts a demand point outside the curve exactly when its flexure
// ratio is above 1: checked by the curve's own moment strength at that P.
func TestPMPlotMarks(t *testing.T) {
	w := overloaded(t)
	res, _ := pier.Solve(w)
	d := checkDesign(w, res)
	u := report.UnitsFor(w.Units)
	for _, p := range d.res.Piers {
		lines := pmPlot(&p, u, 40, 20)
		text := strings.Join(lines, "\n")
		var over bool
		for _, c := range p.Checks {
			over = over || c.FlexureRatio > 1
		}
		if over && !strings.Contains(text, "!") && !strings.Contains(text, "*") {
			t.Errorf("%s: a check outside the curve is not marked", p.Name)
		}
		if len(lines) != 20 {
			t.Errorf("%s: plot %d lines, want 20", p.Name, len(lines))
		}
	}
	if math.IsNaN(d.res.Ratio) {
		t.Fatal("NaN ratio")
	}
}

// D edits the pier design: a wall without one gets it, a bad bar is refused
// on its field with the reason, and the ratios follow at once; applying the
// form of the example wall unchanged keeps its inputs.
func TestDesignForm(t *testing.T) {
	ed := newEditor(t, annex(), "", 100, 30)
	ed.press(runes("D"))
	if ed.elev().mode != modeForm || !strings.Contains(ed.view(), "Pier design") {
		t.Fatalf("D opens no form:\n%s", ed.view())
	}
	ed.typeText("yes")
	for range dfFy {
		ed.press(keyTab)
	}
	ed.typeText("60ksi")
	ed.press(keyTab)
	ed.typeText("#13@48in")
	ed.press(keyEnter)
	if ed.elev().mode != modeForm || !strings.Contains(ed.view(), "unknown bar size") {
		t.Fatalf("bad bar accepted:\n%s", ed.view())
	}
	ed.typeText("#5@48in")
	ed.press(keyTab)
	ed.typeText("1#5")
	ed.press(keyEnter)
	if ed.elev().mode != modeNormal {
		t.Fatalf("good bars refused:\n%s", ed.view())
	}
	w := ed.wall()
	if w.Design == nil || w.Reinforcement == nil || w.Reinforcement.Vertical.Size.Name != "#5" || w.Reinforcement.Jamb.Count != 1 {
		t.Fatalf("design inputs not set: %+v %+v", w.Design, w.Reinforcement)
	}
	if ed.elev().design.res == nil {
		t.Fatalf("no checks after the form: %v", ed.elev().design.err)
	}
	ed.press(runes("R"))
	if !ed.elev().showRatios() {
		t.Error("R after the form shows no ratios")
	}
	// Unchanged, the example wall's inputs survive the form.
	ed = newEditor(t, reinforced(t), "", 100, 30)
	before := ed.wall().Clone()
	ed.press(runes("D"), keyEnter)
	if *ed.wall().Design != *before.Design || *ed.wall().Reinforcement != *before.Reinforcement || ed.wall().Load != before.Load {
		t.Errorf("form applied unchanged changed the inputs:\n%+v\n%+v", ed.wall().Reinforcement, before.Reinforcement)
	}
	// "no" turns the design off (and undo brings it back).
	ed.press(runes("D"))
	ed.typeText("no")
	ed.press(keyEnter)
	if ed.wall().Design != nil || ed.elev().design.on {
		t.Error("no left the design on")
	}
	ed.press(runes("u"))
	if ed.wall().Design == nil {
		t.Error("undo did not bring the design back")
	}
}
