package storey

import (
	"fmt"
	"io"
	"strings"
	"time"
	"unicode/utf8"

	"pierwise/geometry"
	"pierwise/report"
	"pierwise/sketch"
)

// Version is the program version printed in the report's title block; the
// command sets it.
var Version = "dev"

// WriteReport loads the storey file at path with its walls, analyses it and
// writes the storey report. Errors in the files are returned before anything
// is written.
func WriteReport(out io.Writer, path string, now time.Time) error {
	a, err := Load(path)
	if err != nil {
		return err
	}
	return Report(out, a, now)
}

// Report writes the text report of an analysed storey.
func Report(out io.Writer, a *Analysis, now time.Time) error {
	s := a.Storey
	u := report.UnitsFor(s.Units)
	d := a.Distribution
	w := &textWriter{out: out}

	w.title("PIERWISE STOREY REPORT")
	w.kv("Title", orDash(s.Title))
	w.kv("File", s.Path)
	w.kv("Date", now.Format("2006-01-02 15:04 MST"))
	w.kv("Program", "pierwise "+Version)
	w.kv("Units", unitsLine(s.Units, u))
	w.kv("Method", "rigid diaphragm; direct shear by rigidity, torsion about R")

	w.section("1. Inputs")
	w.kv("Shear", geometry.FormatForce(s.Shear, s.Units)+", applied along x and along y in turn")
	w.kv("Mass centre", fmt.Sprintf("x = %s %s, y = %s %s", coord(u, s.MassCenter[0]), u.Coord, coord(u, s.MassCenter[1]), u.Coord))
	w.kv("Plan", fmt.Sprintf("%s %s (x) × %s %s (y), origin at the south-west corner", coord(u, s.Size[0]), u.Coord, coord(u, s.Size[1]), u.Coord))
	w.kv("Accidental", fmt.Sprintf("±%.3g %% of the plan size across the load (ASCE 7-22 §12.8.4.2)", 100*s.Accidental))
	if a.Absolute {
		w.kv("Rigidities", "R = E·t/d of each wall (classic method), "+u.Rigidity)
	} else {
		w.kv("Rigidities", "relative rigidity × thickness (one E assumed for every wall)")
	}
	w.blank()
	t := &textTable{
		head:  []string{"key", "wall", "file", "length", "height", "t"},
		right: []bool{false, false, false, true, true, true},
	}
	for i, wl := range a.Walls {
		t.add(string(WallKey(i)), wl.Name, wl.Ref.File, geometry.FormatLength(wl.Wall.Length, s.Units),
			geometry.FormatLength(wl.Wall.Height, s.Units), geometry.FormatLength(wl.Wall.Thickness, s.Units))
	}
	t.write(w, "  ")
	w.blank()
	t = &textTable{
		head:  []string{"key", "dir", "line " + u.Coord, "from " + u.Coord, "R rel", "R " + rigUnit(a, u)},
		right: []bool{false, false, true, true, true, true},
	}
	for i, wl := range a.Walls {
		from := "centred"
		if wl.Ref.HasStart {
			from = coord(u, wl.Ref.Start)
		}
		t.add(string(WallKey(i)), wl.Ref.Direction.String(), coord(u, wl.Ref.Position), from,
			fmt.Sprintf("%.4f", wl.Unit.Rigidity), rigidity(a, u, wl.Rigidity))
	}
	t.write(w, "  ")
	w.line("  line: y of an x-wall, x of a y-wall; from: where it begins along its line;")
	w.line("  R rel: relative rigidity, 1/(E·t) units")

	w.section("2. Plan (north up; = x-wall, | y-wall, M mass centre, R centre of rigidity)")
	w.lines(Plan(s, a, 72, 20).String(), "  ")
	w.line(fmt.Sprintf("  x from 0 to %s %s (east), y from 0 to %s %s (north)", coord(u, s.Size[0]), u.Coord, coord(u, s.Size[1]), u.Coord))

	w.section("3. Centre of rigidity and torsional rigidity")
	w.kv("x_R", fmt.Sprintf("%s %s  (Σ R·x / Σ R over the y-walls, Σ R = %s %s)", num(u.CoordOf(d.CenterOfRigidity[X]), 2), u.Coord, rigidity(a, u, d.SumRigidity[Y]), rigUnit(a, u)))
	w.kv("y_R", fmt.Sprintf("%s %s  (Σ R·y / Σ R over the x-walls, Σ R = %s %s)", num(u.CoordOf(d.CenterOfRigidity[Y]), 2), u.Coord, rigidity(a, u, d.SumRigidity[X]), rigUnit(a, u)))
	w.kv("J", fmt.Sprintf("%s  (Σ R·d², all walls)", torsional(a, u, d.J)))

	for _, c := range d.Cases {
		across := c.Load.other()
		e0 := float64(s.MassCenter[across]) - d.CenterOfRigidity[across]
		w.section(fmt.Sprintf("4.%d Load along %s, case %s", caseNumber(c), c.Load, c.Name()))
		sign := "+"
		if c.Sign < 0 {
			sign = "-"
		}
		w.kv("e", fmt.Sprintf("%s_m - %s_R %s accidental = %s %s %s = %s %s",
			across, across, sign, num(u.CoordOf(e0), 2), sign, num(u.CoordOf(d.AccidentalEccentricity[c.Load]), 2), num(u.CoordOf(c.Eccentricity), 2), u.Coord))
		w.kv("V·e", fmt.Sprintf("%s %s", num(u.MomentOf(c.Torque), 1), u.Moment))
		w.kv("Shears", u.Force+"; d from the centre of rigidity across the wall's line")
		w.blank()
		t := &textTable{
			head:  []string{"key", "wall", "dir", "d " + u.Coord, "direct", "torsion", "total"},
			right: []bool{false, false, false, true, true, true, true},
		}
		for i, wl := range a.Walls {
			sh := c.Shares[i]
			direct := "-"
			if wl.Ref.Direction == c.Load {
				direct = num(u.ForceOf(geometry.Force(sh.Direct)), 2)
			}
			t.add(string(WallKey(i)), wl.Name, wl.Ref.Direction.String(), num(u.CoordOf(d.Distance[i]), 2), direct,
				num(u.ForceOf(geometry.Force(sh.Torsional)), 2), num(u.ForceOf(geometry.Force(sh.Total())), 2))
		}
		t.write(w, "  ")
	}

	w.section("5. Design shears (the worst case of each wall, never below its direct shear)")
	t = &textTable{
		head:  []string{"key", "wall", "dir", "direct " + u.Force, "design " + u.Force, "governs", "of V"},
		right: []bool{false, false, false, true, true, false, true},
	}
	for i, wl := range a.Walls {
		t.add(string(WallKey(i)), wl.Name, wl.Ref.Direction.String(), num(u.ForceOf(geometry.Force(wl.Design.Direct)), 2),
			num(u.ForceOf(geometry.Force(wl.Design.Shear)), 2), CaseName(d, wl.Design.Case), fmt.Sprintf("%.1f %%", 100*wl.Design.Shear/float64(s.Shear)))
	}
	t.write(w, "  ")
	w.line("  Torsional shear is taken with its sign; where torsion would relieve a wall,")
	w.line("  the direct shear alone governs (\"direct\").")

	w.section("6. Walls under their design shears")
	for i, wl := range a.Walls {
		res := wl.Loaded
		w.blank()
		w.line(fmt.Sprintf("%c  %s (%s), design shear %s, case %s", WallKey(i), wl.Name, wl.Ref.File,
			geometry.FormatForce(geometry.Force(wl.Design.Shear), s.Units), CaseName(d, wl.Design.Case)))
		w.blank()
		w.lines(sketch.Elevation(wl.Wall, res, 60, 12).String(), "   ")
		w.blank()
		leaves := res.Leaves()
		if len(leaves) == 0 {
			w.line("   solid wall: no piers; it takes the whole design shear")
		} else {
			t := &textTable{
				head:  []string{"pier", "h", "L", "h/L", "support", "share", "V " + u.Force, "M " + u.Moment},
				right: []bool{false, true, true, true, false, true, true, true},
			}
			for _, p := range leaves {
				t.add(p.Name, geometry.FormatLength(geometry.Length(p.H()), s.Units), geometry.FormatLength(geometry.Length(p.L()), s.Units),
					fmt.Sprintf("%.2f", p.Ratio()), supportName(p.Support), fmt.Sprintf("%.1f %%", 100*p.Share),
					num(u.ForceOf(p.Shear), 2), num(u.MomentOf(p.Moment), 1))
			}
			t.write(w, "   ")
		}
		if res.DeflectionAbs > 0 {
			w.line(fmt.Sprintf("   top deflection under the design shear: %s %s (elastic)", num(u.DeflectionOf(res.DeflectionAbs), 4), u.Deflection))
		}
		for _, msg := range res.Warnings {
			w.wrapped("   ! ", msg)
		}
	}

	w.section("7. Warnings")
	if len(a.Warnings) == 0 {
		w.line("  none for the storey (see each wall above for its own)")
	}
	for _, msg := range a.Warnings {
		w.wrapped("  ! ", msg)
	}
	w.line("  ! The diaphragm is assumed rigid; a flexible diaphragm shares the shear by")
	w.line("    tributary area instead.")
	w.blank()
	w.lines(report.Caution, "")
	return w.err
}

// CaseName names case i of d, or "direct" for -1.
func CaseName(d *Distribution, i int) string {
	if i < 0 || i >= len(d.Cases) {
		return "direct"
	}
	return d.Cases[i].Name()
}

func caseNumber(c Case) int {
	n := 1 + 2*int(c.Load)
	if c.Sign < 0 {
		n++
	}
	return n
}

func supportName(s geometry.Support) string {
	if s == geometry.Fixed {
		return "fixed"
	}
	return "cantilever"
}

func unitsLine(sys geometry.System, u report.Units) string {
	name := "US"
	if sys == geometry.SI {
		name = "SI"
	}
	return fmt.Sprintf("%s (%s, %s, %s, %s)", name, u.Coord, u.Force, u.Rigidity, u.Moment)
}

func orDash(s string) string {
	if strings.TrimSpace(s) == "" {
		return "-"
	}
	return s
}

// num formats a rounded number and never prints "-0".
func num(v float64, dec int) string {
	s := fmt.Sprintf("%.*f", dec, v)
	if strings.Trim(s, "-0.") == "" {
		s = strings.TrimPrefix(s, "-")
	}
	return s
}

func coord(u report.Units, l geometry.Length) string { return num(u.CoordOf(float64(l)), 2) }

func rigUnit(a *Analysis, u report.Units) string {
	if a.Absolute {
		return u.Rigidity
	}
	return "(rel.×t, " + u.Coord + ")"
}

// rigidity shows a rigidity used in the distribution: N/m in report units,
// or relative × thickness in the base unit of length.
func rigidity(a *Analysis, u report.Units, r float64) string {
	if a.Absolute {
		return num(u.RigidityOf(r), 0)
	}
	return num(u.CoordOf(r), 4)
}

// torsional shows J: Σ R·d² is N/m·m² = N·m per radian of diaphragm rotation.
func torsional(a *Analysis, u report.Units, j float64) string {
	if a.Absolute {
		return num(u.MomentOf(j), 0) + " " + u.Moment + " per radian"
	}
	return fmt.Sprintf("%.4g (relative × t) %s³", u.CoordOf(u.CoordOf(u.CoordOf(j))), u.Coord)
}

// textWriter writes report lines and keeps the first error.
type textWriter struct {
	out io.Writer
	err error
}

const reportWidth = 78

func (w *textWriter) line(s string) {
	if w.err != nil {
		return
	}
	_, w.err = fmt.Fprintln(w.out, strings.TrimRight(s, " "))
}

func (w *textWriter) blank() { w.line("") }

func (w *textWriter) title(s string) {
	w.line(s)
	w.line(strings.Repeat("=", utf8.RuneCountInString(s)))
}

func (w *textWriter) section(s string) {
	w.blank()
	w.line(s)
	w.line(strings.Repeat("-", min(utf8.RuneCountInString(s), reportWidth)))
}

func (w *textWriter) kv(k, v string) { w.line(fmt.Sprintf("  %-12s %s", k+":", v)) }

func (w *textWriter) lines(block, indent string) {
	for _, l := range strings.Split(strings.TrimRight(block, "\n"), "\n") {
		w.line(indent + l)
	}
}

// wrapped writes s word-wrapped to the report width after a prefix.
func (w *textWriter) wrapped(prefix, s string) {
	pad := strings.Repeat(" ", utf8.RuneCountInString(prefix))
	cur, empty := prefix, true
	for _, word := range strings.Fields(s) {
		if !empty && utf8.RuneCountInString(cur)+1+utf8.RuneCountInString(word) > reportWidth {
			w.line(cur)
			cur, empty = pad, true
		}
		if empty {
			cur += word
			empty = false
		} else {
			cur += " " + word
		}
	}
	w.line(cur)
}

// textTable is a plain table with columns aligned left or right.
type textTable struct {
	head  []string
	right []bool
	rows  [][]string
}

func (t *textTable) add(cells ...string) { t.rows = append(t.rows, cells) }

func (t *textTable) write(w *textWriter, indent string) {
	widths := make([]int, len(t.head))
	for i, h := range t.head {
		widths[i] = utf8.RuneCountInString(h)
	}
	for _, r := range t.rows {
		for i, c := range r {
			widths[i] = max(widths[i], utf8.RuneCountInString(c))
		}
	}
	row := func(cells []string) string {
		var b strings.Builder
		b.WriteString(indent)
		for i, c := range cells {
			if i > 0 {
				b.WriteString("  ")
			}
			pad := strings.Repeat(" ", widths[i]-utf8.RuneCountInString(c))
			if t.right[i] {
				b.WriteString(pad + c)
			} else {
				b.WriteString(c + pad)
			}
		}
		return b.String()
	}
	w.line(row(t.head))
	rule := make([]string, len(widths))
	for i, n := range widths {
		rule[i] = strings.Repeat("-", n)
	}
	w.line(row(rule))
	for _, r := range t.rows {
		w.line(row(r))
	}
}
