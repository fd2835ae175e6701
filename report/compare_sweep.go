package report

import (
	"errors"
	"fmt"
	"io"
	"strconv"
	"strings"
	"unicode/utf8"

	"pierwise/geometry"
	"pierwise/pier"
	"pierwise/study"
)

// SweepTable writes the table of a sweep (study.Sweep) of the opening called
// name: for every position the opening's left edge and sill, the wall's
// relative rigidity and its change from the current position, each leaf
// pier's share, the highest pier shear stress (or share/L without a load)
// and marks for the current and the best position.
func SweepTable(out io.Writer, w *geometry.Wall, name string, axis study.Axis, step geometry.Length, pts []study.Point) error {
	u := UnitsFor(w.Units)
	layout := w.Layouts[w.Active].Name
	fmt.Fprintf(out, "Sweep of %s along %s in steps of %s: %s, layout %q\n", geometry.Visible(name), axis, study.FormatStep(step, w.Units), geometry.Visible(w.Title), layout)
	if len(pts) == 0 {
		_, err := fmt.Fprintln(out, "The opening fits nowhere else along this axis.")
		return err
	}
	names := study.PierSeries(pts)
	cur := study.CurrentIndex(pts)
	// Positions as an engineer writes them: feet-inches for US walls (a
	// step of 8 in reads 0'-8", not 0.67), metres to the millimetre for SI.
	pos := func(l geometry.Length) string {
		if w.Units == geometry.SI {
			return strconv.FormatFloat(u.CoordOf(float64(l)), 'f', 3, 64)
		}
		return geometry.FormatLength(l, w.Units)
	}
	head := []string{"x", "sill", "R rel", "change"}
	if w.Units == geometry.SI {
		head[0], head[1] = "x ("+u.Coord+")", "sill ("+u.Coord+")"
	}
	head = append(head, names...)
	stressHead := "max share/L (1/" + u.Coord + ")"
	if w.Load.Shear > 0 && w.Thickness > 0 {
		stressHead = "max stress (" + u.Stress + ")"
	}
	head = append(head, stressHead)
	designed := study.Designed(pts)
	if designed {
		head = append(head, "D/C")
	}
	head = append(head, "")
	rows := [][]string{head}
	weak := false
	for _, p := range pts {
		r := []string{pos(p.X), pos(p.Y)}
		if p.Err != nil {
			r = append(r, "no answer", "")
			for range names {
				r = append(r, "")
			}
			r = append(r, "")
			if designed {
				r = append(r, "")
			}
			r = append(r, sweepNoAnswer(p.Err))
			rows = append(rows, r)
			continue
		}
		ch := ""
		if cur >= 0 && pts[cur].Err == nil {
			ch = cmpPct(pts[cur].Rigidity, p.Rigidity)
		}
		r = append(r, Sig(p.Rigidity), ch)
		shares := map[string]float64{}
		for _, ps := range p.Piers {
			shares[ps.Key] = ps.Share
		}
		for _, n := range names {
			if s, ok := shares[n]; ok {
				r = append(r, Sig(100*s)+"%")
			} else {
				r = append(r, "")
			}
		}
		var st string
		if p.MaxStress > 0 {
			st = Sig(float64(p.MaxStress)/float64(w.Units.BaseStress())) + " " + p.StressPier
		} else {
			st = Sig(p.StressIndex*float64(w.Units.BaseLength())) + " " + p.StressPier
		}
		var marks []string
		if designed {
			dc := "-"
			if p.Designed {
				dc = Ratio(p.Ratio) + " " + p.RatioPier
				if p.Passes {
					marks = append(marks, "passes")
				}
			}
			st += "  " // the D/C column follows
			r = append(r, st)
			st = dc
		}
		if p.Current {
			marks = append(marks, "current")
		}
		if p.Best {
			marks = append(marks, "best")
		}
		if len(p.Weak) > 0 {
			marks = append(marks, "! "+strings.Join(p.Weak, ", "))
			weak = true
		}
		r = append(r, st, strings.Join(marks, ", "))
		rows = append(rows, r)
	}
	sweepAlign(out, rows)
	best := "Best: the lowest highest pier shear stress V_i/(L_i t)."
	if !(w.Load.Shear > 0 && w.Thickness > 0) {
		best = "Best: the lowest highest pier share/L_i (the wall has no load or thickness, so no stress)."
	}
	if designed {
		best = "D/C is the wall's governing demand/capacity ratio of the pier design (docs/method.md §8) and the pier that has it; passes marks a position where every pier passes every check. Best: the lowest governing ratio."
	}
	if weak {
		best += " ! marks a position where the classic method warns of something it does not at the current position (solve that layout to read the warning); such a position is not taken as best."
	}
	_, err := fmt.Fprintln(out, "\n"+wrapText("R rel is the wall's relative rigidity (E = 1, t = 1) and change its change from the current position. Shares are fractions of the wall shear; each column follows one pier, named by the openings on either side of it (end: the wall's end), whatever its number at that position. "+best, 78)+"\n"+
		wrapText(sweepCaution(designed), 78))
	return err
}

// sweepNoAnswer says in a few words why a position has no classic answer.
func sweepNoAnswer(err error) string {
	var ce *pier.CutError
	var se *pier.StaggeredError
	switch {
	case errors.As(err, &ce):
		return "no load path: " + ce.Opening + " cuts the wall"
	case errors.As(err, &se):
		return "staggered band without a pier: use the FE check"
	}
	return err.Error()
}

// wrapText word-wraps s to width columns.
func wrapText(s string, width int) string {
	var b strings.Builder
	n := 0
	for _, word := range strings.Fields(s) {
		l := utf8.RuneCountInString(word)
		if n > 0 && n+1+l > width {
			b.WriteByte('\n')
			n = 0
		} else if n > 0 {
			b.WriteByte(' ')
			n++
		}
		b.WriteString(word)
		n += l
	}
	return b.String()
}

// sweepAlign prints rows as columns: numbers right-aligned, the last column
// (marks and errors) left-aligned.
func sweepAlign(out io.Writer, rows [][]string) {
	n := len(rows[0])
	wid := make([]int, n)
	for _, r := range rows {
		for i, c := range r {
			if i < n-1 && len([]rune(c)) > wid[i] {
				wid[i] = len([]rune(c))
			}
		}
	}
	for _, r := range rows {
		var b strings.Builder
		for i, c := range r {
			if i > 0 {
				b.WriteString("  ")
			}
			if i == n-1 {
				b.WriteString(c)
			} else {
				b.WriteString(strings.Repeat(" ", wid[i]-len([]rune(c))) + c)
			}
		}
		fmt.Fprintln(out, strings.TrimRight(b.String(), " "))
	}
}

func sweepCaution(designed bool) string {
	if designed {
		return "Results support, and do not replace, the judgement of a licensed engineer. " + DesignCaution
	}
	return "Results support, and do not replace, the judgement of a licensed engineer; local codes govern."
}
