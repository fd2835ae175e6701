package storey

import (
	"fmt"
	"io"
	"strings"
	"time"

	"pierwise/geometry"
	"pierwise/pier"
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
	w := report.NewText(out)

	w.Title("PIERWISE STOREY REPORT")
	w.KV("Title", orDash(s.Title))
	w.KV("File", s.Path)
	w.KV("Date", now.Format("2006-01-02 15:04 MST"))
	w.KV("Program", "pierwise "+Version)
	w.KV("Units", unitsLine(s.Units, u))
	w.KV("Method", "rigid diaphragm; direct shear by rigidity, torsion about R")

	w.Section("1. Inputs")
	w.KV("Shear", geometry.FormatForce(s.Shear, s.Units)+", applied along x and along y in turn")
	w.KV("Mass centre", fmt.Sprintf("x = %s %s, y = %s %s", coord(u, s.MassCenter[0]), u.Coord, coord(u, s.MassCenter[1]), u.Coord))
	w.KV("Plan", fmt.Sprintf("%s %s (x) × %s %s (y), origin at the south-west corner", coord(u, s.Size[0]), u.Coord, coord(u, s.Size[1]), u.Coord))
	w.KV("Accidental", fmt.Sprintf("±%.3g %% of the plan size across the load (ASCE 7-22 §12.8.4.2)", 100*s.Accidental))
	if a.Absolute {
		w.KV("Rigidities", "R = E·t/d of each wall (classic method), "+u.Rigidity)
	} else {
		w.KV("Rigidities", "relative rigidity × thickness (one E assumed for every wall)")
	}
	w.Blank()
	t := &report.Table{
		Head:  []string{"key", "wall", "file", "length", "height", "t"},
		Right: []bool{false, false, false, true, true, true},
	}
	for i, wl := range a.Walls {
		t.Add(string(WallKey(i)), wl.Name, wl.Ref.File, geometry.FormatLength(wl.Wall.Length, s.Units),
			geometry.FormatLength(wl.Wall.Height, s.Units), geometry.FormatLength(wl.Wall.Thickness, s.Units))
	}
	t.Write(w, "  ")
	w.Blank()
	t = &report.Table{
		Head:  []string{"key", "dir", "line " + u.Coord, "from " + u.Coord, "R rel", "R " + rigUnit(a, u)},
		Right: []bool{false, false, true, true, true, true},
	}
	for i, wl := range a.Walls {
		from := "centred"
		if wl.Ref.HasStart {
			from = coord(u, wl.Ref.Start)
		}
		t.Add(string(WallKey(i)), wl.Ref.Direction.String(), coord(u, wl.Ref.Position), from,
			fmt.Sprintf("%.4f", wl.Unit.Rigidity), rigidity(a, u, wl.Rigidity))
	}
	t.Write(w, "  ")
	w.Line("  line: y of an x-wall, x of a y-wall; from: where it begins along its line;")
	w.Line("  R rel: relative rigidity, 1/(E·t) units")

	w.Section("2. Plan (north up; = x-wall, | y-wall, M mass centre, R centre of rigidity)")
	w.Lines(Plan(s, a, 72, 20).String(), "  ")
	w.Line(fmt.Sprintf("  x from 0 to %s %s (east), y from 0 to %s %s (north)", coord(u, s.Size[0]), u.Coord, coord(u, s.Size[1]), u.Coord))

	w.Section("3. Centre of rigidity and torsional rigidity")
	w.KV("x_R", fmt.Sprintf("%s %s  (Σ R·x / Σ R over the y-walls, Σ R = %s %s)", num(u.CoordOf(d.CenterOfRigidity[X]), 2), u.Coord, rigidity(a, u, d.SumRigidity[Y]), rigUnit(a, u)))
	w.KV("y_R", fmt.Sprintf("%s %s  (Σ R·y / Σ R over the x-walls, Σ R = %s %s)", num(u.CoordOf(d.CenterOfRigidity[Y]), 2), u.Coord, rigidity(a, u, d.SumRigidity[X]), rigUnit(a, u)))
	w.KV("J", fmt.Sprintf("%s  (Σ R·d², all walls)", torsional(a, u, d.J)))

	for _, c := range d.Cases {
		across := c.Load.other()
		e0 := float64(s.MassCenter[across]) - d.CenterOfRigidity[across]
		w.Section(fmt.Sprintf("4.%d Load along %s, case %s", caseNumber(c), c.Load, c.Name()))
		sign := "+"
		if c.Sign < 0 {
			sign = "-"
		}
		w.KV("e", fmt.Sprintf("%s_m - %s_R %s accidental = %s %s %s = %s %s",
			across, across, sign, num(u.CoordOf(e0), 2), sign, num(u.CoordOf(d.AccidentalEccentricity[c.Load]), 2), num(u.CoordOf(c.Eccentricity), 2), u.Coord))
		w.KV("V·e", fmt.Sprintf("%s %s", num(u.MomentOf(c.Torque), 1), u.Moment))
		w.KV("Shears", u.Force+"; d from the centre of rigidity across the wall's line")
		w.Blank()
		t := &report.Table{
			Head:  []string{"key", "wall", "dir", "d " + u.Coord, "direct", "torsion", "total"},
			Right: []bool{false, false, false, true, true, true, true},
		}
		for i, wl := range a.Walls {
			sh := c.Shares[i]
			direct := "-"
			if wl.Ref.Direction == c.Load {
				direct = num(u.ForceOf(geometry.Force(sh.Direct)), 2)
			}
			t.Add(string(WallKey(i)), wl.Name, wl.Ref.Direction.String(), num(u.CoordOf(d.Distance[i]), 2), direct,
				num(u.ForceOf(geometry.Force(sh.Torsional)), 2), num(u.ForceOf(geometry.Force(sh.Total())), 2))
		}
		t.Write(w, "  ")
	}

	w.Section("5. Design shears (the worst case of each wall, never below its direct shear)")
	t = &report.Table{
		Head:  []string{"key", "wall", "dir", "direct " + u.Force, "design " + u.Force, "governs", "of V"},
		Right: []bool{false, false, false, true, true, false, true},
	}
	for i, wl := range a.Walls {
		t.Add(string(WallKey(i)), wl.Name, wl.Ref.Direction.String(), num(u.ForceOf(geometry.Force(wl.Design.Direct)), 2),
			num(u.ForceOf(geometry.Force(wl.Design.Shear)), 2), CaseName(d, wl.Design.Case), fmt.Sprintf("%.1f %%", 100*wl.Design.Shear/float64(s.Shear)))
	}
	t.Write(w, "  ")
	w.Line("  Torsional shear is taken with its sign; where torsion would relieve a wall,")
	w.Line("  the direct shear alone governs (\"direct\").")

	w.Section("6. Walls under their design shears")
	for i, wl := range a.Walls {
		res := wl.Loaded
		w.Blank()
		w.Line(fmt.Sprintf("%c  %s (%s), design shear %s, case %s", WallKey(i), wl.Name, wl.Ref.File,
			geometry.FormatForce(geometry.Force(wl.Design.Shear), s.Units), CaseName(d, wl.Design.Case)))
		w.Blank()
		w.Lines(sketch.Elevation(wl.Wall, res, 60, 12).String(), "   ")
		w.Blank()
		leaves := res.Leaves()
		if len(leaves) == 0 {
			w.Line("   solid wall: no piers; it takes the whole design shear")
		} else {
			t := &report.Table{
				Head:  []string{"pier", "h", "L", "h/L", "support", "share", "V " + u.Force, "M " + u.Moment},
				Right: []bool{false, true, true, true, false, true, true, true},
			}
			for _, p := range leaves {
				t.Add(p.Name, geometry.FormatLength(geometry.Length(p.H()), s.Units), geometry.FormatLength(geometry.Length(p.L()), s.Units),
					fmt.Sprintf("%.2f", p.Ratio()), supportName(p.Support), fmt.Sprintf("%.1f %%", 100*p.Share),
					num(u.ForceOf(p.Shear), 2), num(u.MomentOf(p.Moment), 1))
			}
			t.Write(w, "   ")
		}
		if res.DeflectionAbs > 0 {
			w.Line(fmt.Sprintf("   top deflection under the design shear: %s %s (elastic)", num(u.DeflectionOf(res.DeflectionAbs), 4), u.Deflection))
		}
		if line := DriftLine(res, u); line != "" {
			w.Wrapped("   ", line)
		}
		for _, msg := range res.Warnings {
			w.Wrapped("   ! ", msg.Text)
		}
	}

	w.Section("7. Warnings (each wall's own are listed with it above)")
	w.Close(append(append([]string(nil), a.Warnings...),
		"The diaphragm is assumed rigid; a flexible diaphragm shares the shear by tributary area instead."))
	return w.Err()
}

// CaseName names case i of d, or "direct" for -1.
// DriftLine states a wall's drift check under its design shear, with the
// wall file's own Cd, Ie and limit (ASCE 7-22 §12.8.6: δ = Cd·δe/Ie), or ""
// when the wall file sets no limit.
func DriftLine(res *pier.Result, u report.Units) string {
	if res == nil || !res.HasLoad || res.Drift.Allowable <= 0 {
		return ""
	}
	d := res.Drift
	verdict := "OK"
	if !d.OK {
		verdict = "EXCEEDS THE LIMIT"
	}
	return fmt.Sprintf("design drift δ = Cd·δe/Ie = %.4g %s (%.5f h), limit %.4g %s: %s",
		u.DeflectionOf(d.Design), u.Deflection, d.Ratio, u.DeflectionOf(d.Allowable), u.Deflection, verdict)
}

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

func torsional(a *Analysis, u report.Units, j float64) string {
	if a.Absolute {
		return report.Grouped(u.MomentOf(j)) + " " + u.Moment + " per radian"
	}
	return fmt.Sprintf("%.4g (relative × t) %s³", u.CoordOf(u.CoordOf(u.CoordOf(j))), u.Coord)
}
