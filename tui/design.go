package tui

import (
	"fmt"
	"strings"

	"pierwise/design"
	"pierwise/geometry"
	"pierwise/pier"
	"pierwise/report"
	"pierwise/sketch"
)

// designState is the pier design of the edited wall, made with every
// re-solve (the checks of a 20-opening wall take well under a millisecond,
// so they stay in step with every key). on is false when the wall has no
// [design] table.
type designState struct {
	on  bool
	res *design.Result
	err error
}

// designInput is the editor's one place where a wall and its piers' forces
// become the checks' input (docs/method.md §8): res is what the elevation
// shows, the classic result or, on the fe basis, the basis view whose piers
// carry the model's section forces.
func designInput(w *geometry.Wall, res *pier.Result) design.Input {
	return design.InputOf(w, design.ClassicPiers(res))
}

// checkDesign checks the piers of w from the result shown.
func checkDesign(w *geometry.Wall, res *pier.Result) designState {
	if w.Design == nil || res == nil {
		return designState{}
	}
	d := designState{on: true}
	r, err := design.CheckWall(designInput(w, res))
	if err != nil {
		d.err = err
		return d
	}
	d.res = &r
	return d
}

// named returns the design of the leaf pier called name, or nil.
func (d *designState) named(name string) *design.PierResult {
	if d.res == nil {
		return nil
	}
	for i := range d.res.Piers {
		if d.res.Piers[i].Name == name {
			return &d.res.Piers[i]
		}
	}
	return nil
}

// Ratio tint levels: the upper bounds of each level's demand/capacity
// ratio; the last level is a failure, drawn with failFill whatever the
// terminal's colours.
var ratioBounds = [5]float64{0.5, 0.75, 0.9, 1.0 + 1e-9, 1e300}

// failFill fills a pier whose ratio is above 1.0, in colour and without.
const failFill = '!'

func ratioLevel(r float64) int {
	for i, b := range ratioBounds {
		if r < b {
			return i
		}
	}
	return len(ratioBounds) - 1
}

// showRatios reports whether the elevation draws ratios instead of shares.
func (e *elevation) showRatios() bool { return e.ratios && e.design.res != nil }

// toggleRatios switches the drawing and the table between shares and
// demand/capacity ratios.
func (e *elevation) toggleRatios() {
	switch {
	case e.wall().Design == nil:
		e.refuse("no pier design: add [design] (and [reinforcement]) to the wall file")
	case e.design.err != nil:
		e.refuse("no pier design: %s", shortReason(e.design.err))
	default:
		e.ratios = !e.ratios
		if e.ratios {
			e.say("demand/capacity ratios (over 1.00 filled with %c)", failFill)
		} else {
			e.say("shares of the wall shear")
		}
	}
}

// designGrid is the elevation's sketch labelled with ratios.
func (e *elevation) designGrid(l elevLayout) *sketch.Grid {
	return sketch.ElevationLabeled(e.wall(), e.res, l.elevW, l.elevH, func(i int, p pier.Pier) string {
		if dp := e.design.named(p.Name); dp != nil {
			return report.Ratio(dp.Ratio)
		}
		return "-"
	})
}

// ratioLevelOf is the tint level of the pier called name by its ratio.
func (e *elevation) ratioLevelOf(name string) int {
	if dp := e.design.named(name); dp != nil {
		return ratioLevel(dp.Ratio)
	}
	return 0
}

// ratioCell is the pier table's ratio column: the ratio and a bar to 1.0,
// over it marked with failFill.
func (e *elevation) ratioCell(name string, barW int) string {
	dp := e.design.named(name)
	if dp == nil {
		return ""
	}
	barW-- // the ratio takes one cell more than a share
	n := min(barW, int(dp.Ratio*float64(barW)+0.5))
	bar := strings.Repeat("#", n) + strings.Repeat(".", barW-n)
	if dp.Ratio > 1 {
		bar = strings.Repeat(string(failFill), barW)
	}
	return fmt.Sprintf("%5s ", report.Ratio(dp.Ratio)) + bar
}

// designLines is the pier design's part of the results panel.
func (e *elevation) designLines(l elevLayout) []string {
	d := e.design
	if !d.on {
		return nil
	}
	st := e.c.styles
	lines := []string{st.heading.Render("Pier design") + st.dim.Render(" (R: ratios, P: piers)")}
	if d.err != nil {
		return append(append(lines, st.errText.Render("No checks:")), wrap(d.err.Error(), l.sumW)...)
	}
	r := d.res
	if r.Governing < 0 {
		return append(lines, st.dim.Render("no leaf pier to check"))
	}
	p := &r.Piers[r.Governing]
	verdict := st.pass.Render("PASS")
	if !r.OK {
		verdict = st.fail.Render("FAIL")
	}
	lines = append(lines, l.kv("governing", p.Name+" "+report.Ratio(p.Ratio)+" "+verdict)...)
	for _, s := range wrap(report.PierGoverning(r, p), l.sumW-2) {
		lines = append(lines, "  "+st.dim.Render(s))
	}
	return lines
}
