// Package report writes the text report of a wall for the calculation
// package: title block, inputs, a to-scale elevation, the classic method's
// working, the pier table, results, the finite-element check when it was
// run, warnings and the caution. It formats a pier.Result (and an fe.Result);
// it computes no mechanics of its own.
package report

import (
	"bytes"
	"fmt"
	"io"
	"math"
	"pierwise/basis"
	"strings"
	"time"
	"unicode"
	"unicode/utf8"

	"pierwise/design"
	"pierwise/geometry"
	"pierwise/pier"
	"pierwise/pier/fe"
	"pierwise/sketch"
	"pierwise/study"
)

// Caution is printed at the end of every report.
const Caution = "CAUTION: these results support, and do not replace, the judgement of a\n" +
	"licensed engineer; local codes govern. Check the inputs, the method's\n" +
	"assumptions and the warnings above before using any number in a design."

// Input is everything a wall report shows. Result is nil when the classic
// method failed; Err then says why.
type Input struct {
	Path   string // the wall file, "" for the built-in demo
	Wall   *geometry.Wall
	Result *pier.Result
	Err    error
	FE     *fe.Result
	FEErr  error
	// Basis is the answer of the chosen basis (its Classic and FE are
	// Result and FE above); nil is the classic basis.
	Basis *basis.Result

	// Design is the pier design when the wall has a [design] table;
	// DesignErr says why it could not be made.
	Design    *design.Result
	DesignErr error

	Now     time.Time
	Version string
	Drawing string // the SVG drawing written beside the report, "" for none

	// Unsaved is set when the wall has changes not yet saved to Path (an
	// editor snapshot): the report then says so in its header.
	Unsaved bool
}

// Wall writes the text report of one wall layout, in sheets of SheetLines
// lines headed by the wall's [project] table and "sheet k of n".
func Wall(out io.Writer, in Input) error {
	var body bytes.Buffer
	if err := wallBody(&body, in); err != nil {
		return err
	}
	subject := "wall report: " + orDefault(in.Wall.Title, orDefault(filePart(in.Path), "built-in demo wall"))
	if in.Unsaved {
		subject += " (unsaved changes)"
	}
	return Paginate(out, body.String(), Heading{Project: in.Wall.Project, Subject: subject})
}

func wallBody(out io.Writer, in Input) error {
	w := NewText(out)
	wall := in.Wall
	u := UnitsFor(wall.Units)

	w.Title("PIERWISE WALL REPORT")
	w.KV("Title", orDash(wall.Title))
	for _, e := range wall.Project.Entries() {
		w.KV(strings.ToUpper(e[0][:1])+e[0][1:], e[1])
	}
	file := orDefault(filePart(in.Path), "(built-in demo wall)")
	if in.Unsaved {
		file += " — UNSAVED CHANGES: this report is of the wall as edited, not as saved"
	}
	w.KV("File", file)
	w.KV("Layout", layoutLine(wall))
	w.KV("Date", in.Now.Format("2006-01-02 15:04 MST"))
	w.KV("Program", Program(in.Version))
	w.KV("Units", unitsLine(wall.Units))
	onFE := in.Basis != nil && in.Basis.IsFE()
	if onFE {
		w.KV("Method", "plane-stress finite-element model; the classic strip method as its check")
	} else {
		w.KV("Method", "classic strip method (solid wall − strips with openings + piers)")
	}
	w.KV("Basis", basisLine(in.Basis))
	if in.Drawing != "" {
		w.KV("Drawing", in.Drawing+" (beside this report)")
	}
	if onFE {
		return wallFE(w, in)
	}

	w.Section("1. Inputs")
	inputs(w, wall, in.Result)

	w.Section("2. Elevation (to scale; shares of the wall shear per leaf pier)")
	w.Lines(sketch.Elevation(wall, in.Result, 72, 22).String(), "  ")

	if in.Result == nil {
		w.Section("3. Classic method")
		w.Wrapped("  ", fmt.Sprintf("The classic method cannot be applied to this layout: %v.", in.Err))
		var warns []string
		switch {
		case in.FE != nil:
			w.Section("4. Finite-element check (the only answer for this layout)")
			feSection(w, in.FE, nil, wall)
			warns = in.FE.Warnings
		case in.FEErr != nil:
			w.Section("4. Finite-element check")
			w.Wrapped("  ", fmt.Sprintf("The finite-element check failed: %v.", in.FEErr))
		}
		w.Section("5. Warnings")
		w.Close(warns)
		return w.Err()
	}
	res := in.Result

	w.Section("3. Classic method (relative deflections in units of 1/(E·t))")
	steps(w, res, wall)
	if len(wall.Openings()) > 0 {
		w.Blank()
		w.Wrapped("  Assumption: ", strings.TrimSuffix(pier.FixedPiersAssumption, ".")+" (docs/method.md §2.6).")
	}

	w.Section("4. Piers")
	pierTable(w, res, wall)

	w.Section("5. Results")
	results(w, res, wall, u, in.FE)

	n := 6
	if in.Design != nil || in.DesignErr != nil {
		w.Section(fmt.Sprintf("%d. Pier design", n))
		designSection(w, wall, in.Design, in.DesignErr)
		n++
	}
	if in.FE != nil || in.FEErr != nil {
		w.Section(fmt.Sprintf("%d. Finite-element check", n))
		if in.FE != nil {
			feSection(w, in.FE, res, wall)
		} else {
			w.Para(fmt.Sprintf("The finite-element check failed: %v.", in.FEErr))
		}
		n++
	}

	w.Section(fmt.Sprintf("%d. References (edition and clause)", n))
	references(w, WallReferences(wall, res))
	n++

	w.Section(fmt.Sprintf("%d. Warnings", n))
	warns := pier.Texts(res.Warnings)
	if in.FE != nil {
		warns = append(warns, in.FE.Warnings...)
	}
	if in.FE != nil && math.Abs(in.FE.Difference) > fe.WarnDifference {
		warns = append(warns, fmt.Sprintf("The classic method's rigidity differs from the finite-element model's by %+.0f %% (more than ±%.0f %%): the piers are not as well fixed as the method assumes; prefer the finite-element rigidity for distributing shear, or justify the difference.", 100*in.FE.Difference, 100*fe.WarnDifference))
	}
	w.Close(warns)
	return w.Err()
}

func inputs(w *Text, wall *geometry.Wall, res *pier.Result) {
	sys := wall.Units
	L := func(l geometry.Length) string { return geometry.FormatLength(l, sys) }
	w.KV("Wall", fmt.Sprintf("length %s, height %s, thickness %s", L(wall.Length), L(wall.Height), L(wall.Thickness)))
	w.KV("Support", supportLong(wall.Support))
	w.KV("Material", materialLine(wall.Material, sys))
	if res != nil && res.Moduli.E > 0 {
		w.KV("E", fmt.Sprintf("%s; E_v = %s", geometry.FormatStress(res.Moduli.E, sys), geometry.FormatStress(res.Moduli.Ev, sys)))
		w.KV("", res.Moduli.ESource)
		w.KV("", res.Moduli.EvSource)
	}
	w.KV("Stiffness", fmt.Sprintf("flexure × %.2f, shear × %.2f (1.00 = gross section)", orOne(wall.Stiffness.Flexure), orOne(wall.Stiffness.Shear)))
	if wall.Load.Shear > 0 {
		w.KV("Load", fmt.Sprintf("in-plane shear V = %s at the top of the wall", geometry.FormatForce(wall.Load.Shear, sys)))
	} else {
		w.KV("Load", "none given (relative values only)")
	}
	w.KV("Gravity", gravityLine(wall))
	drift, source, _ := strings.Cut(driftLine(wall.Drift, wall.Units), "\n")
	w.KV("Drift", drift)
	if source != "" {
		w.KV("", source)
	}
	for i := range geometry.Settings {
		if s := &geometry.Settings[i]; s.Report && !s.IsDefault(wall) {
			w.KV(upperFirst(s.Label), s.Format(s.Get(wall), sys))
		}
	}
	ops := wall.Openings()
	if len(ops) == 0 {
		w.KV("Openings", "none (solid wall)")
		return
	}
	w.KV("Openings", fmt.Sprintf("%d", len(ops)))
	t := Table{Head: []string{"name", "kind", "x", "sill", "width", "height", "head"}, Right: []bool{false, false, true, true, true, true, true}}
	for _, o := range ops {
		kind := "window"
		if o.IsDoor() {
			kind = "door"
		}
		t.Add(o.Name, kind, L(o.X), L(o.Sill), L(o.Width), L(o.Height), L(o.Sill+o.Height))
	}
	t.Write(w, "    ")
}

func steps(w *Text, res *pier.Result, wall *geometry.Wall) {
	dim := func(r geometry.Rect) string {
		return fmt.Sprintf("h %s × L %s", geometry.FormatLength(geometry.Length(r.H()), wall.Units), geometry.FormatLength(geometry.Length(r.W()), wall.Units))
	}
	type row struct {
		label, sign string
		value       float64
	}
	var rows []row
	for _, s := range res.Steps {
		indent := "  " + strings.Repeat("    ", depth(s.Region))
		where := "wall"
		if s.Region != "" && s.Region != "wall" {
			where = "pier " + s.Region
		}
		switch s.Kind {
		case pier.StepSolid:
			rows = append(rows, row{indent + fmt.Sprintf("%s as solid, %s, %s", where, dim(s.Rect), s.Support.String()), "+", s.Deflection})
		case pier.StepStrip:
			rows = append(rows, row{indent + fmt.Sprintf("strip %s…%s, %s, %s", yText(s.Rect.Y0, wall), yText(s.Rect.Y1, wall), dim(s.Rect), s.Support.String()), "−", s.Deflection})
		case pier.StepPiers:
			rows = append(rows, row{indent + fmt.Sprintf("piers %s in parallel: 1/Σ(1/Δ)", pierList(s.Piers)), "+", s.Deflection})
		}
	}
	rows = append(rows, row{"  wall deflection Δ", "=", res.Deflection}, row{"  relative rigidity R = 1/Δ", "=", res.Rigidity})
	width := 0
	for _, r := range rows {
		width = max(width, utf8.RuneCountInString(r.label))
	}
	for _, r := range rows {
		w.Line(fmt.Sprintf("%-*s %s %8s", width, r.label, r.sign, Sig(r.value)))
	}
}

// pierList names the piers of a band: all of them up to three, else the
// first and the last (a band's piers are numbered in a row).
func pierList(names []string) string {
	if len(names) <= 3 {
		return strings.Join(names, ", ")
	}
	return fmt.Sprintf("%s … %s (%d)", names[0], names[len(names)-1], len(names))
}

// pierLabel is a pier's name in a table: indented by its depth, † when its
// openings cut it (no load path), * when it has piers of its own.
func pierLabel(name string, cut, leaf bool) string {
	n := strings.Repeat("  ", depth(name)-1) + name
	switch {
	case cut:
		n += "†"
	case !leaf:
		n += "*"
	}
	return n
}

func pierTable(w *Text, res *pier.Result, wall *geometry.Wall) {
	u := UnitsFor(wall.Units)
	L := func(x float64) string { return geometry.FormatLength(geometry.Length(x), wall.Units) }
	name := func(p pier.Pier) string { return pierLabel(p.Name, p.Cut, p.Leaf) }
	// Geometry and rigidity first; shares and forces in a second table, so
	// each fits the report's width.
	t := Table{Head: []string{"pier", "h", "L", "h/L", "support", "R rel"}, Right: []bool{false, true, true, true, false, true}}
	f := Table{Head: []string{"pier", "share", "bending/shear"}, Right: []bool{false, true, true}}
	if res.HasLoad {
		f.Head = append(f.Head, "V "+u.Force, "M "+u.Moment, "N "+u.Force)
		f.Right = append(f.Right, true, true, true)
	}
	var cut, nested bool
	for _, p := range res.Piers {
		rel, split := Sig(p.Rigidity), "-"
		if d := p.Parts.Total(); d > 0 {
			split = fmt.Sprintf("%.0f/%.0f %%", 100*p.Parts.Bending/d, 100*p.Parts.Shear/d)
		}
		if p.Cut {
			rel, cut = "-", true
		}
		nested = nested || (!p.Leaf && !p.Cut)
		t.Add(name(p), L(p.H()), L(p.L()), fmt.Sprintf("%.2f", p.Ratio()), p.Support.String(), rel)
		row := []string{name(p), SigPercent(p.Share), split}
		if res.HasLoad && !p.Cut {
			row = append(row, Sig(u.ForceOf(p.Shear)), Sig(u.MomentOf(p.Moment)), Sig(u.ForceOf(p.Loads.Lateral.Middle.Axial)))
		} else if res.HasLoad {
			row = append(row, "-", "-", "-")
		}
		f.Add(row...)
	}
	t.Write(w, "  ")
	w.Blank()
	f.Write(w, "  ")
	if nested {
		w.Wrapped("  * ", "pier with openings of its own; its share and forces are those of the whole pier, which the piers inside it share.")
	}
	if cut {
		w.Wrapped("  † ", "pier that its own openings cut: it has no load path, no rigidity and no share.")
	}
	if res.HasLoad {
		w.Wrapped("  ", "M is at the base of a cantilever pier, and at the top and the base (V·h/2) of a fixed pier. N is the axial force of the overturning, compression positive: the piers of a band act as one section about the centroid of their areas (common practice; docs/method.md §6).")
	}
	w.Blank()
	sectionTable(w, res, wall)
}

// sectionTable writes every pier's forces at its bottom, middle and top,
// unfactored, by load case: lateral (V, M, N of the overturning), dead and
// live (N by tributary width, docs/method.md §6).
func sectionTable(w *Text, res *pier.Result, wall *geometry.Wall) {
	u := sectionForces(w, res, wall)
	w.Wrapped("  ", fmt.Sprintf("Forces in %s and %s. Dead and live: the line loads on each pier's tributary width (its own width and half of each opening beside it) and the wall's weight above the section in that width (common practice; docs/method.md §6).", u.Force, u.Moment))
}

// sectionForces writes the table of sectionTable (either basis's forces)
// and returns the report units.
func sectionForces(w *Text, res *pier.Result, wall *geometry.Wall) Units {
	u := UnitsFor(wall.Units)
	w.Wrapped("  ", "Section forces, unfactored, by load case (compression positive; moments positive when they compress the right end):")
	t := Table{Head: []string{"pier", "section"}, Right: []bool{false, false}}
	if res.HasLoad {
		t.Head = append(t.Head, "V "+u.Force, "M "+u.Moment, "N lat")
		t.Right = append(t.Right, true, true, true)
	}
	t.Head = append(t.Head, "N dead", "N live")
	t.Right = append(t.Right, true, true)
	for _, p := range res.Piers {
		if p.Cut {
			continue
		}
		l := p.Loads
		for i, at := range []struct {
			name            string
			lat, dead, live pier.Forces
		}{
			{"top", l.Lateral.Top, l.Dead.Top, l.Live.Top},
			{"middle", l.Lateral.Middle, l.Dead.Middle, l.Live.Middle},
			{"bottom", l.Lateral.Bottom, l.Dead.Bottom, l.Live.Bottom},
		} {
			name := ""
			if i == 0 {
				name = strings.Repeat("  ", depth(p.Name)-1) + p.Name
			}
			row := []string{name, at.name}
			if res.HasLoad {
				row = append(row, Sig(u.ForceOf(at.lat.Shear)), Sig(u.MomentOf(at.lat.Moment)), Sig(u.ForceOf(at.lat.Axial)))
			}
			t.Add(append(row, Sig(u.ForceOf(at.dead.Axial)), Sig(u.ForceOf(at.live.Axial)))...)
		}
	}
	t.Write(w, "  ")
	return u
}

// gravityLine describes the gravity loads of a wall: the line loads along
// its top and its self weight, given or by default.
func gravityLine(wall *geometry.Wall) string {
	g := wall.Gravity
	// One formatting for every figure on the line: the geometry's own
	// three-significant-figure load formatter, the same one the settings use.
	s := "dead " + geometry.FormatLineLoad(g.Dead, wall.Units) + ", live " + geometry.FormatLineLoad(g.Live, wall.Units) + " along the top; "
	sw, err := pier.SelfWeightOf(wall)
	switch {
	case err != nil:
		return s + "self weight not valid"
	case sw.Weight == 0:
		return s + "no self weight: " + sw.Source
	}
	return s + fmt.Sprintf("self weight %s of face (%s)", geometry.FormatAreaLoad(sw.Weight, wall.Units), sw.Source)
}

func results(w *Text, res *pier.Result, wall *geometry.Wall, u Units, f *fe.Result) {
	w.KV("Δ relative", Sig(res.Deflection)+" /(E·t)")
	w.KV("R relative", Sig(res.Rigidity)+" E·t")
	if f != nil && f.Rigidity > 0 {
		// The method's uncertainty for this wall (docs/method.md §1, §5).
		w.KV("Uncertainty", fmt.Sprintf("%+.0f %%: the classic rigidity's difference from the finite-element model's for this wall (the finite-element check below), the method's uncertainty here", 100*f.Difference))
	}
	if d := res.Split.Total(); d > 0 {
		w.KV("Split", fmt.Sprintf("bending %.0f %%, shear %.0f %% of the wall's deflection", 100*res.Split.Bending/d, 100*res.Split.Shear/d))
	}
	inUnits(w, wall, u, res.RigidityAbs, res.HasLoad, res.DeflectionAbs, res.Drift)
	if res.HasLoad {
		arm := "V·h"
		if wall.Support == geometry.Fixed {
			arm = "V·h/2, the top held against rotation"
		}
		w.KV("Overturning", fmt.Sprintf("M = %s %s at the base (%s)", Sig(u.MomentOf(res.Overturning)), u.Moment, arm))
	}
}

// inUnits writes a rigidity (N/m, 0 when the material gives no modulus)
// and, under a load, the deflection and the drift check, in report units.
// The classic results and the finite-element model's share it.
func inUnits(w *Text, wall *geometry.Wall, u Units, rigidity float64, loaded bool, defl geometry.Length, d pier.DriftCheck) {
	if rigidity <= 0 {
		w.KV("Rigidity", "not known: the material gives no modulus")
		return
	}
	w.KV("Rigidity", fmt.Sprintf("R = %s %s  (R relative × E·t)", Sig(u.RigidityOf(rigidity)), u.Rigidity))
	if !loaded {
		w.KV("Deflection", "no load given")
		return
	}
	w.KV("Deflection", fmt.Sprintf("δe = %s %s under V = %s", Sig(u.DeflectionOf(defl)), u.Deflection, geometry.FormatForce(wall.Load.Shear, wall.Units)))
	hs := "h_sx = " + geometry.FormatLength(d.Height, wall.Units)
	if wall.Drift.StoreyHeight == 0 {
		hs += " (the wall's height; no storey_height given)"
	}
	if d.Missing != "" {
		w.KV("Drift", fmt.Sprintf("no design drift and no verdict: %s not given ([drift] cd and ie; ASCE 7-22 §12.8.6: δ = C_d·δe/I_e)", d.Missing))
		return
	}
	w.KV("Drift", fmt.Sprintf("δ = C_d·δe/I_e = %s %s = %s h_sx, %s", Sig(u.DeflectionOf(d.Design)), u.Deflection, Fraction(d.Ratio), hs))
	if d.Allowable > 0 {
		w.KV("Drift limit", fmt.Sprintf("%s %s (%s h_sx): %s", Sig(u.DeflectionOf(d.Allowable)), u.Deflection, Fraction(wall.Drift.Limit), d.Verdict()))
	} else {
		w.KV("Drift limit", "none set")
	}
}

func feSection(w *Text, r *fe.Result, res *pier.Result, wall *geometry.Wall) {
	w.KV("Model", fmt.Sprintf("plane stress, element %s, max size %s, %d elements, %d unknowns", r.Element, geometry.FormatLength(r.Mesh, wall.Units), r.Elements, r.DOFs))
	supports := "base fixed; shear spread over the top edge; deflection = load-weighted mean of the top nodes (Σ f·u / V)"
	if r.Collector {
		supports = "base fixed; top nodes tied horizontally (collector); deflection = the collector's"
	}
	w.KV("Supports", supports)
	w.KV("Δ relative", Sig(r.Deflection)+" /(E·t)")
	w.KV("R relative", Sig(r.Rigidity)+" E·t")
	inUnits(w, wall, UnitsFor(wall.Units), r.RigidityAbs, r.HasLoad, r.DeflectionAbs, r.Drift)
	if res == nil {
		return
	}
	w.KV("Classic/FE", "the classic rigidity is "+ClassicVersusFE(r.Difference)+" the model's")
	if len(r.Piers) == 0 {
		return
	}
	share := map[string]float64{}
	for _, p := range r.Piers {
		share[p.Name] = p.Share
	}
	t := Table{Head: []string{"pier", "classic", "FE", "difference"}, Right: []bool{false, true, true, true}}
	for _, p := range res.Leaves() {
		s, ok := share[p.Name]
		if !ok {
			continue
		}
		t.Add(p.Name, SigPercent(p.Share), SigPercent(s), fmt.Sprintf("%+.1f pt", 100*(p.Share-s)))
	}
	t.Write(w, "  ")
}

// depth is 0 for the wall, 1 for P1, 2 for P1.2 …
func depth(name string) int {
	if name == "" || name == "wall" {
		return 0
	}
	return strings.Count(name, ".") + 1
}

func yText(y float64, wall *geometry.Wall) string {
	return geometry.FormatLength(geometry.Length(y), wall.Units)
}

// filePart is the file of a FILE[:LAYOUT] argument; the layout has its
// own line.
func filePart(arg string) string {
	path, _ := study.SplitArg(arg)
	return path
}

func layoutLine(w *geometry.Wall) string {
	if len(w.Layouts) == 0 {
		return "-"
	}
	name := w.Layouts[w.Active].Name
	if len(w.Layouts) == 1 {
		return name
	}
	return fmt.Sprintf("%s (%d of %d)", name, w.Active+1, len(w.Layouts))
}

func unitsLine(s geometry.System) string {
	if s == geometry.SI {
		return "SI (m, mm, kN, MPa)"
	}
	return "US customary (ft, in, kip, psi)"
}

func supportLong(s geometry.Support) string {
	if s == geometry.Fixed {
		return "fixed-fixed (base fixed, top kept from rotating)"
	}
	return "cantilever (base fixed, top free)"
}

func materialLine(m geometry.Material, sys geometry.System) string {
	var s string
	switch m.Kind {
	case geometry.ConcreteMasonry:
		s = "concrete masonry, f'm = " + geometry.FormatStress(m.Strength, sys)
	case geometry.ClayMasonry:
		s = "clay masonry, f'm = " + geometry.FormatStress(m.Strength, sys)
	case geometry.Concrete:
		s = "concrete, f'c = " + geometry.FormatStress(m.Strength, sys)
	default:
		s = "custom"
	}
	if m.Modulus > 0 {
		s += ", E given = " + geometry.FormatStress(m.Modulus, sys)
	}
	if m.ShearModulus > 0 {
		s += ", E_v given = " + geometry.FormatStress(m.ShearModulus, sys)
	}
	if m.Poisson > 0 {
		s += fmt.Sprintf(", ν = %.3g given", m.Poisson)
	}
	return s
}

func driftLine(d geometry.Drift, sys geometry.System) string {
	factor := func(name string, v float64) string {
		if v == 0 {
			return name + " not given"
		}
		return fmt.Sprintf("%s = %g", name, v)
	}
	s := factor("C_d", d.Cd) + ", " + factor("I_e", d.Ie)
	if d.StoreyHeight > 0 {
		s += ", h_sx = " + geometry.FormatLength(d.StoreyHeight, sys)
	}
	if d.Limit <= 0 {
		return s + ", no limit set"
	}
	s += fmt.Sprintf(", limit %s h_sx", Fraction(d.Limit))
	if d.Preset == "" {
		return s
	}
	if p, ok := geometry.FindDriftPreset(d.Preset); ok {
		return s + fmt.Sprintf(" (%s)\n%s", p.Name, p.Source)
	}
	return s + " (" + d.Preset + ")"
}

func orOne(x float64) float64 {
	if x == 0 {
		return 1
	}
	return x
}

func orDash(s string) string { return orDefault(s, "-") }

func orDefault(s, d string) string {
	if s == "" {
		return d
	}
	return s
}

// Fraction prints a drift limit or ratio as a decimal fraction to three
// significant figures, trailing zeros kept, so that ratios side by side read
// alike: 0.0100, 0.00750, 0.000170, 0.000218 (docs/method.md §1).
func Fraction(x float64) string { return Sig(x) }

// Grouped prints a large quantity as a whole number with its thousands
// grouped: 752,179,465.
func Grouped(v float64) string {
	s := fmt.Sprintf("%.0f", math.Abs(v))
	if s == "0" {
		return s
	}
	var b strings.Builder
	if v < 0 {
		b.WriteByte('-')
	}
	for i, c := range s {
		if i > 0 && (len(s)-i)%3 == 0 {
			b.WriteByte(',')
		}
		b.WriteRune(c)
	}
	return b.String()
}

// Number prints a result with about four significant figures and never in
// exponent notation for the magnitudes of this trade (11604, not 1.16e+04).
func Number(x float64) string {
	switch a := math.Abs(x); {
	case a >= 1000:
		return fmt.Sprintf("%.0f", x)
	case a >= 100:
		return fmt.Sprintf("%.1f", x)
	case a >= 10:
		return fmt.Sprintf("%.2f", x)
	default:
		return fmt.Sprintf("%.4g", x)
	}
}

// upperFirst capitalises a setting's label for a report line.
func upperFirst(s string) string {
	r, n := utf8.DecodeRuneInString(s)
	return string(unicode.ToUpper(r)) + s[n:]
}
