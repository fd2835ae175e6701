package storey

import (
	"bytes"
	"fmt"
	"io"
	"math"
	"strings"
	"time"

	"pierwise/geometry"
	"pierwise/pier"
	"pierwise/report"
	"pierwise/sketch"
)

// WriteReport loads the storey file at path with its walls, analyses it and
// writes the storey report. Errors in the files are returned before anything
// is written. version is the program's, for the title block ("" when not
// known).
//
// Each wall's finite-element model is solved too (Storey.CompareFE), so that
// the report states the classic method's difference from it for every wall.
func WriteReport(out io.Writer, path string, now time.Time, version string) error {
	s, walls, err := LoadFiles(path)
	if err != nil {
		return err
	}
	s.CompareFE = true
	a, err := Analyse(s, walls)
	if err != nil {
		return err
	}
	return Report(out, a, now, version)
}

// Report writes the text report of an analysed storey, in sheets of
// report.SheetLines lines headed by the storey's [project] table and
// "sheet k of n".
func Report(out io.Writer, a *Analysis, now time.Time, version string) error {
	var body bytes.Buffer
	if err := reportBody(&body, a, now, version); err != nil {
		return err
	}
	subject := a.Storey.Title
	if subject == "" {
		subject = a.Storey.Path
	}
	return report.Paginate(out, body.String(), report.Heading{Project: a.Storey.Project, Subject: "storey report: " + subject})
}

func reportBody(out io.Writer, a *Analysis, now time.Time, version string) error {
	s := a.Storey
	u := report.UnitsFor(s.Units)
	d := a.Distribution
	w := report.NewText(out)

	w.Title("PIERWISE STOREY REPORT")
	w.KV("Title", orDash(s.Title))
	for _, e := range s.Project.Entries() {
		w.KV(strings.ToUpper(e[0][:1])+e[0][1:], e[1])
	}
	w.KV("File", s.Path)
	w.KV("Date", now.Format("2006-01-02 15:04 MST"))
	w.KV("Program", report.Program(version))
	w.KV("Units", unitsLine(s.Units, u))
	w.KV("Method", methodLine(s))

	// The storey's warnings come before the numbers they bear on; each
	// wall's own are with it in the walls section.
	w.Section("Warnings (the storey's; each wall's own are with it below)")
	if len(a.Warnings) == 0 {
		w.Line("  none")
	}
	for _, msg := range a.Warnings {
		w.Wrapped("  - ", msg)
	}

	w.Section("1. Inputs")
	w.KV("Shear", geometry.FormatForce(s.Shear, s.Units)+", applied along x and along y in turn")
	w.KV("Mass centre", fmt.Sprintf("x = %s %s, y = %s %s", coord(u, s.MassCenter[0]), u.Coord, coord(u, s.MassCenter[1]), u.Coord))
	w.KV("Plan", fmt.Sprintf("%s %s (x) × %s %s (y), origin at the south-west corner", coord(u, s.Size[0]), u.Coord, coord(u, s.Size[1]), u.Coord))
	w.KV("Accidental", fmt.Sprintf("±%.3g %% of the plan size across the load (ASCE 7-22 §12.8.4.2)", 100*s.Accidental))
	basisName := "classic method"
	if s.Basis == geometry.BasisFE {
		basisName = "finite-element model, basis fe"
	}
	if a.Absolute {
		w.KV("Rigidities", "R = E·t/Δ of each wall, Δ its relative deflection ("+basisName+"), "+u.Rigidity)
	} else {
		w.KV("Rigidities", "relative rigidity × thickness (one E assumed for every wall; "+basisName+")")
	}
	if s.SDC != "" {
		w.KV("SDC", s.SDC+" (ASCE 7-22 §11.6); A_x applies in C to F (§12.8.4.3)")
	}
	if s.Cd > 0 {
		lim := "no limit given"
		if s.DriftLimit > 0 {
			lim = "limit " + report.Fraction(s.DriftLimit) + " h"
			if s.DriftPreset != "" {
				lim += " (" + s.DriftPreset + ", ASCE 7-22 Table 12.12-1)"
			}
		}
		w.KV("Storey drift", fmt.Sprintf("Cd = %.3g, Ie = %.3g, h = %s; %s", s.Cd, s.Ie, geometry.FormatLength(s.Height, s.Units), lim))
	}
	w.Blank()
	t := &report.Table{
		Head:  []string{"key", "wall", "file", "length", "height", "t"},
		Right: []bool{false, false, false, true, true, true},
	}
	for i, wl := range a.Walls {
		if wl.Wall == nil {
			length := "-"
			if wl.Ref.Length > 0 {
				length = geometry.FormatLength(wl.Ref.Length, s.Units)
			}
			t.Add(string(WallKey(i)), wl.Name, "(given by rigidity)", length, "-", "-")
			continue
		}
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
		dir, line := wl.Ref.Direction.String(), coord(u, wl.Ref.Position)
		if wl.Ref.Direction == Angled {
			dir = fmt.Sprintf("%g°", wl.Ref.AngleDeg)
			line, from = coord(u, wl.Ref.At[0])+", "+coord(u, wl.Ref.At[1]), "at"
		}
		rel := "given"
		switch {
		case s.Basis == geometry.BasisFE && wl.FE != nil:
			rel = report.Sig(wl.FE.Rigidity)
		case wl.Unit != nil:
			rel = report.Sig(wl.Unit.Rigidity)
		}
		t.Add(string(WallKey(i)), dir, line, from, rel, rigidity(a, u, wl.Rigidity))
	}
	t.Write(w, "  ")
	w.Line("  dir: the direction the wall resists; line: y of an x-wall, x of a y-wall")
	w.Line("  (x, y of a point on an angled wall's line); from: where it begins along its")
	w.Line("  line; R rel: relative rigidity, in units of E·t; given: the wall is given")
	w.Line("  by its rigidity")
	if anyFE(a) {
		w.Blank()
		which := "classic"
		if s.Basis == geometry.BasisFE {
			which = "finite-element"
		}
		w.Wrapped("  ", "Rigidity by each model (the distribution uses the "+which+" one); classic - FE is the classic method's difference from the finite-element model, its uncertainty for each wall (docs/method.md §4, §5):")
		t := &report.Table{
			Head:  []string{"key", "wall", "classic " + rigUnit(a, u), "FE " + rigUnit(a, u), "classic - FE"},
			Right: []bool{false, false, true, true, true},
		}
		for i, wl := range a.Walls {
			cl, fr, diff := "-", "-", "-"
			if wl.ClassicRigidity > 0 {
				cl = rigidity(a, u, wl.ClassicRigidity)
			}
			if wl.FERigidity > 0 {
				fr = rigidity(a, u, wl.FERigidity)
			}
			if d, ok := wl.RigidityDifference(); ok {
				diff = fmt.Sprintf("%+.1f %%", 100*d)
			}
			t.Add(string(WallKey(i)), wl.Name, cl, fr, diff)
		}
		t.Write(w, "  ")
	}

	w.Section("2. Plan (north up; = x-wall, | y-wall, M mass centre, R centre of rigidity)")
	w.Lines(Plan(s, a, 72, 20).String(), "  ")
	w.Line(fmt.Sprintf("  x from 0 to %s %s (east), y from 0 to %s %s (north)", coord(u, s.Size[0]), u.Coord, coord(u, s.Size[1]), u.Coord))

	// On a flexible diaphragm sections 3 to 5 are the rigid diaphragm's,
	// kept for comparison; the flexible distribution governs (docs/method.md §9).
	comparison, heading := "", "3. Centre of rigidity and torsional rigidity (rigid diaphragm)"
	if s.Diaphragm == Flexible {
		comparison = " (rigid diaphragm, for comparison only)"
		heading = "3. Centre of rigidity and J" + comparison
	}
	w.Section(heading)
	if s.Diaphragm == Flexible {
		w.Wrapped("  ", "The diaphragm is flexible: the flexible distribution of section 6 governs. Sections 3 to 5 are the rigid diaphragm's, shown for comparison only; they do not give the design shears.")
	}
	w.KV("x_R", fmt.Sprintf("%s %s  (Σ R·x / Σ R over the y-walls, Σ R = %s %s)", num(u.CoordOf(d.CenterOfRigidity[X]), 2), u.Coord, rigidity(a, u, d.SumRigidity[Y]), rigUnit(a, u)))
	w.KV("y_R", fmt.Sprintf("%s %s  (Σ R·y / Σ R over the x-walls, Σ R = %s %s)", num(u.CoordOf(d.CenterOfRigidity[Y]), 2), u.Coord, rigidity(a, u, d.SumRigidity[X]), rigUnit(a, u)))
	w.KV("J", fmt.Sprintf("%s  (Σ R·arm², all walls)", torsional(a, u, d.J)))
	w.Wrapped("  ", "The diaphragm is solved as a stiffness problem in u_x, u_y and θ; about the centre of rigidity it uncouples, and each wall's shear is the direct part V·R/ΣR plus the torsional part V·e·arm·R/J, as tabulated below.")
	w.Wrapped("  Signs: ", "x points east, y north, rotation counter-clockwise positive seen from above. arm is a wall's signed distance from the centre of rigidity across its line: y − y_R for an x-wall, x − x_R for a y-wall. The eccentricity e is the mass centre's distance from the centre of rigidity across the load, y_m − y_R for a load along +x and x_m − x_R for a load along +y, plus (case +acc) or minus (case −acc) the accidental part. The torque V·e turns the plan clockwise under a load along +x and counter-clockwise under a load along +y when e is positive. Shears are along the wall's own positive axis under a load along the positive axis: the torsional shear is +V·e·arm·R/J for a wall parallel to the load and −V·e·arm·R/J for a wall across it; positive adds to the direct shear.")

	for _, c := range d.Cases {
		across := c.Load.other()
		e0 := float64(s.MassCenter[across]) - d.CenterOfRigidity[across]
		w.Section(fmt.Sprintf("4.%d Load along %s, case %s%s", caseNumber(c), c.Load, c.Name(), comparison))
		sign := "+"
		if c.Sign < 0 {
			sign = "-"
		}
		w.KV("e", fmt.Sprintf("%s_m - %s_R %s accidental = %s %s %s = %s %s",
			across, across, sign, num(u.CoordOf(e0), 2), sign, num(u.CoordOf(d.AccidentalEccentricity[c.Load]), 2), num(u.CoordOf(c.Eccentricity), 2), u.Coord))
		if c.Torsion.Amplification > 1 {
			w.KV("A_x", fmt.Sprintf("%.3f: the accidental part is amplified (ASCE 7-22 §12.8.4.3)", c.Torsion.Amplification))
		}
		w.KV("V·e", fmt.Sprintf("%s %s", report.Sig(u.MomentOf(c.Torque)), u.Moment))
		w.KV("Shears", u.Force+"; arm from the centre of rigidity across the wall's line, "+u.Coord)
		w.Blank()
		t := &report.Table{
			Head:  []string{"key", "wall", "dir", "arm " + u.Coord, "direct", "torsion", "total"},
			Right: []bool{false, false, false, true, true, true, true},
		}
		for i, wl := range a.Walls {
			sh := c.Shares[i]
			direct := "-"
			if wl.Ref.Direction == c.Load || sh.Direct != 0 {
				direct = report.Sig(u.ForceOf(geometry.Force(sh.Direct)))
			}
			t.Add(string(WallKey(i)), wl.Name, wl.Ref.Direction.String(), num(u.CoordOf(d.Distance[i]), 2), direct,
				report.Sig(u.ForceOf(geometry.Force(sh.Torsional))), report.Sig(u.ForceOf(geometry.Force(sh.Total()))))
		}
		t.Write(w, "  ")
	}

	torsionSection(w, a, u)
	n := 6
	if a.Flexible != nil {
		flexibleSection(w, a, u)
		n++
	}

	w.Section(fmt.Sprintf("%d. Design shears (%s)", n, designRule(s.Diaphragm)))
	n++
	t = &report.Table{
		Head:  []string{"key", "wall", "dir", "direct " + u.Force, "design " + u.Force, "governs", "of V"},
		Right: []bool{false, false, false, true, true, false, true},
	}
	if s.Diaphragm == Envelope {
		t.Head = []string{"key", "wall", "dir", "rigid", "flexible", "design", "governs"}
		t.Right = []bool{false, false, false, true, true, true, false}
	}
	for i, wl := range a.Walls {
		design := []string{report.Sig(u.ForceOf(geometry.Force(wl.Design.Shear))), CaseName(d, wl.Design.Case), report.SigPercent(wl.Design.Shear / float64(s.Shear))}
		if s.Diaphragm == Envelope {
			t.Add(append([]string{string(WallKey(i)), wl.Name, dirName(wl.Ref), report.Sig(u.ForceOf(geometry.Force(wl.Rigid.Shear))),
				report.Sig(u.ForceOf(geometry.Force(wl.Flexible)))}, design[:2]...)...)
			continue
		}
		t.Add(append([]string{string(WallKey(i)), wl.Name, dirName(wl.Ref), report.Sig(u.ForceOf(geometry.Force(wl.Design.Direct)))}, design...)...)
	}
	t.Write(w, "  ")
	if s.Diaphragm == Envelope {
		w.Line("  Shears in " + u.Force + ".")
	}
	if s.Diaphragm != Flexible {
		w.Line("  Torsional shear is taken with its sign; where torsion would relieve a wall,")
		w.Line("  the direct shear alone governs (\"direct\").")
	}
	if s.Cd > 0 {
		driftSection(w, a, u, n)
		n++
	}

	w.Section(fmt.Sprintf("%d. Walls under their design shears (%s basis)", n, s.Basis))
	n++
	for i, wl := range a.Walls {
		res := wl.Loaded
		w.Blank()
		src := wl.Ref.File
		if wl.Ref.HasRigidity {
			src = "given by rigidity"
		}
		w.Line(fmt.Sprintf("%c  %s (%s), design shear %s, case %s", WallKey(i), wl.Name, src,
			geometry.FormatForce(geometry.Force(wl.Design.Shear), s.Units), CaseName(d, wl.Design.Case)))
		if g := wl.Governing; g != nil {
			w.Line(fmt.Sprintf("   governing pier %s, %s, ratio %.2f", g.Pier, g.Check, g.Ratio))
		}
		if wl.Wall == nil {
			if a.Absolute && wl.Rigidity > 0 {
				w.Line(fmt.Sprintf("   displacement under the design shear: %s %s (elastic)", report.Sig(u.DeflectionOf(geometry.Length(wl.Design.Shear/wl.Rigidity))), u.Deflection))
			}
			continue
		}
		if res == nil {
			w.Line("   the classic method cannot solve this layout: no piers (see the wall's own report)")
			continue
		}
		// The wall's own warnings come before the numbers they bear on.
		for _, msg := range res.Warnings {
			w.Wrapped("   ! ", msg.Text)
		}
		if wl.FE != nil && s.Basis == geometry.BasisFE {
			for _, msg := range wl.FE.Warnings {
				w.Wrapped("   ! ", msg)
			}
		}
		w.Blank()
		w.Lines(sketch.Elevation(wl.Wall, res, 60, 12).String(), "   ")
		w.Blank()
		leaves := wl.Piers
		if len(leaves) == 0 {
			w.Line("   solid wall: no piers; it takes the whole design shear")
		} else {
			t := &report.Table{
				Head:  []string{"pier", "h", "L", "h/L", "support", "share", "V " + u.Force, "M " + u.Moment},
				Right: []bool{false, true, true, true, false, true, true, true},
			}
			for _, p := range leaves {
				t.Add(p.Name, geometry.FormatLength(geometry.Length(p.H()), s.Units), geometry.FormatLength(geometry.Length(p.L()), s.Units),
					fmt.Sprintf("%.2f", p.Ratio()), p.Support.String(), report.SigPercent(p.Share),
					report.Sig(u.ForceOf(p.Shear)), report.Sig(u.MomentOf(p.Moment)))
			}
			t.Write(w, "   ")
		}
		if a.Absolute && wl.Rigidity > 0 {
			w.Line(fmt.Sprintf("   top deflection under the design shear: %s %s (elastic)", report.Sig(u.DeflectionOf(geometry.Length(wl.Design.Shear/wl.Rigidity))), u.Deflection))
		}
		if line := DriftLine(res, u); line != "" && s.Basis == geometry.BasisClassic {
			w.Wrapped("   ", line)
		}
	}

	w.Section(fmt.Sprintf("%d. References (edition and clause)", n))
	report.References(w, report.StoreyReferences(s.Cd > 0, s.SDC != ""))
	n++

	w.Section(fmt.Sprintf("%d. Diaphragm assumption", n))
	closing := "The diaphragm is assumed rigid; a flexible diaphragm shares the shear by tributary area instead."
	switch s.Diaphragm {
	case Flexible:
		closing = "The diaphragm is taken as flexible; a rigid diaphragm shares the shear by rigidity, with torsion, instead."
	case Envelope:
		closing = "Each wall takes the larger of its rigid- and flexible-diaphragm shares (envelope)."
	}
	w.Close([]string{closing})
	return w.Err()
}

func methodLine(s *Storey) string {
	switch s.Diaphragm {
	case Flexible:
		return "flexible diaphragm; shear to wall lines by tributary spans"
	case Envelope:
		return "envelope of rigid and flexible diaphragms, per wall"
	}
	return "rigid diaphragm; direct shear by rigidity, torsion about R"
}

func designRule(d Diaphragm) string {
	switch d {
	case Flexible:
		return "flexible diaphragm: the line's shear shared by rigidity"
	case Envelope:
		return "the larger of rigid and flexible, per wall"
	}
	return "the worst case of each wall, never below its direct shear"
}

func dirName(r WallRef) string {
	if r.Direction == Angled {
		return fmt.Sprintf("%g°", r.AngleDeg)
	}
	return r.Direction.String()
}

// torsionSection is the torsional irregularity check of each rigid case.
func torsionSection(w *report.Text, a *Analysis, u report.Units) {
	s, d := a.Storey, a.Distribution
	heading := "5. Torsional irregularity (ASCE 7-22 Table 12.3-1, §12.8.4.3)"
	if s.Diaphragm == Flexible {
		heading = "5. Torsional irregularity (rigid diaphragm, for comparison only)"
	}
	w.Section(heading)
	w.Wrapped("  ", "Displacement along the load at the two plan edges perpendicular to it, rigid diaphragm, accidental torsion included with A_x = 1. Type 1a above 1.2, 1b above 1.4; A_x = (δmax/1.2 δavg)², from 1 to 3, in seismic design categories C to F.")
	if s.Diaphragm == Flexible {
		w.Wrapped("  ", "For information only: the diaphragm is flexible, and Types 1a and 1b apply to rigid or semirigid diaphragms.")
	}
	unit := u.Deflection
	dec := 5 // inches
	if u.Deflection == "mm" {
		dec = 3
	}
	scale := func(v float64) string { return num(u.DeflectionOf(geometry.Length(v)), dec) }
	if !a.Absolute {
		unit = "relative"
		scale = func(v float64) string { return fmt.Sprintf("%.4g", v) }
	}
	w.Blank()
	t := &report.Table{
		Head:  []string{"case", "edges", "δ1 " + unit, "δ2 " + unit, "δmax/δavg", "type", "A_x"},
		Right: []bool{false, false, true, true, true, false, true},
	}
	for _, c := range d.Cases {
		edges := "south, north"
		if c.Load == Y {
			edges = "west, east"
		}
		ratio := "n/a"
		if !math.IsInf(c.Torsion.Ratio, 0) {
			ratio = fmt.Sprintf("%.3f", c.Torsion.Ratio)
		}
		t.Add(c.Name(), edges, scale(c.Torsion.Edges[0]), scale(c.Torsion.Edges[1]), ratio, c.Torsion.Type.String(), fmt.Sprintf("%.3f", c.Torsion.Amplification))
	}
	t.Write(w, "  ")
}

// flexibleSection shows the wall lines of the flexible diaphragm.
func flexibleSection(w *report.Text, a *Analysis, u report.Units) {
	s := a.Storey
	heading := "6. Flexible diaphragm: shear to the wall lines"
	if s.Diaphragm == Flexible {
		heading += " (governs)"
	}
	w.Section(heading)
	w.Wrapped("  ", "The storey shear is spread across the plan as the mass is (uniform, or linear with its resultant at the mass centre), carried to the wall lines as simple spans between lines (the stretch from a plan edge to the outermost line goes to that line), and shared within a line by rigidity. No torsion.")
	for _, load := range []Direction{X, Y} {
		ld := a.Flexible.Load[load]
		w.Blank()
		w.Line(fmt.Sprintf("  Load along %s: w = %s %s/%s at %s = 0, %s at %s = %s", load,
			num(u.ForceOf(geometry.Force(ld[0]))*float64(s.Units.BaseLength()), 3), u.Force, u.Coord, load.other(),
			num(u.ForceOf(geometry.Force(ld[0]+ld[1]*float64(s.Size[load.other()])))*float64(s.Units.BaseLength()), 3), load.other(), coord(u, s.Size[load.other()])))
		t := &report.Table{
			Head:  []string{"line " + u.Coord, "tributary " + u.Coord, "shear " + u.Force, "walls"},
			Right: []bool{true, false, true, false},
		}
		for _, ln := range a.Flexible.Lines[load] {
			var keys []string
			for _, i := range ln.Members {
				keys = append(keys, string(WallKey(i)))
			}
			t.Add(num(u.CoordOf(ln.Position), 2), num(u.CoordOf(ln.Tributary[0]), 2)+" to "+num(u.CoordOf(ln.Tributary[1]), 2),
				report.Sig(u.ForceOf(geometry.Force(ln.Shear))), strings.Join(keys, " "))
		}
		t.Write(w, "  ")
	}
}

// driftSection is the storey drift check at the walls and the plan edges.
func driftSection(w *report.Text, a *Analysis, u report.Units, n int) {
	s := a.Storey
	w.Section(fmt.Sprintf("%d. Storey drift (ASCE 7-22 §12.8.6, §12.12.1)", n))
	if !a.Absolute {
		w.Wrapped("  ", "Not checked: the rigidities are relative (not every wall's material gives E).")
		return
	}
	w.Wrapped("  ", fmt.Sprintf("δ = Cd·δe/Ie with Cd = %.3g and Ie = %.3g; δe from the diaphragm's displacements (a wall's shear over its rigidity). Storey height %s.",
		s.Cd, s.Ie, geometry.FormatLength(s.Height, s.Units)))
	row := func(t *report.Table, name string, dr Drift) {
		verdict, lim := "-", "-"
		if dr.Allowable > 0 {
			lim = report.Sig(u.DeflectionOf(geometry.Length(dr.Allowable)))
			verdict = "OK"
			if !dr.OK {
				verdict = "EXCEEDS"
			}
		}
		t.Add(name, report.Sig(u.DeflectionOf(geometry.Length(dr.Elastic))), report.Sig(u.DeflectionOf(geometry.Length(dr.Design))), report.Fraction(dr.Ratio), lim, verdict)
	}
	head := []string{"where", "δe " + u.Deflection, "δ " + u.Deflection, "δ/h", "limit " + u.Deflection, "check"}
	right := []bool{false, true, true, true, true, false}
	w.Blank()
	t := &report.Table{Head: head, Right: right}
	for i, wl := range a.Walls {
		row(t, string(WallKey(i))+" "+wl.Name, wl.Drift)
	}
	t.Write(w, "  ")
	if len(a.Edges) > 0 {
		w.Blank()
		t := &report.Table{Head: head, Right: right}
		for _, e := range a.Edges {
			row(t, a.Distribution.Cases[e.Case].Name()+", "+e.Edge+" edge", e.Drift)
		}
		t.Write(w, "  ")
	}
}

// DriftLine states a wall's drift check under its design shear, with the
// wall file's own Cd, Ie and limit (ASCE 7-22 §12.8.6: δ = Cd·δe/Ie), or ""
// when the wall file sets no limit.
func DriftLine(res *pier.Result, u report.Units) string {
	if res == nil || !res.HasLoad || res.Drift.Allowable <= 0 {
		return ""
	}
	d := res.Drift
	if d.Missing != "" {
		return "drift: " + d.Verdict() + " in its wall file"
	}
	return fmt.Sprintf("design drift δ = Cd·δe/Ie = %.4g %s (%.5f h_sx), limit %.4g %s: %s",
		u.DeflectionOf(d.Design), u.Deflection, d.Ratio, u.DeflectionOf(d.Allowable), u.Deflection, d.Verdict())
}

// CaseName names case i of d, or "direct" for -1.
func CaseName(d *Distribution, i int) string {
	if i == CaseFlexible {
		return "flexible"
	}
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
		return report.Sig(u.RigidityOf(r))
	}
	return report.Sig(u.CoordOf(r))
}

func torsional(a *Analysis, u report.Units, j float64) string {
	if a.Absolute {
		return report.Grouped(u.MomentOf(j)) + " " + u.Moment + " per radian"
	}
	return fmt.Sprintf("%.4g (relative × t) %s³", u.CoordOf(u.CoordOf(u.CoordOf(j))), u.Coord)
}

// anyFE reports whether some wall has both a classic and a finite-element
// rigidity, so that the report can state their difference.
func anyFE(a *Analysis) bool {
	for _, wl := range a.Walls {
		if wl.FE != nil && wl.ClassicRigidity > 0 {
			return true
		}
	}
	return false
}
