package main

import (
	"encoding/json"
	"errors"
	"flag"
	"fmt"
	"io"
	"slices"
	"strings"

	"pierwise/basis"
	"pierwise/demo"
	"pierwise/design"
	"pierwise/geometry"
	"pierwise/pier"
	"pierwise/pier/fe"
	"pierwise/report"
	"pierwise/study"
)

func init() {
	register(command{
		name:  "solve",
		args:  "[FILE[:LAYOUT]...] [--json] [--basis classic|fe] [--fe] [--mesh SIZE] [--element q4|qm6]",
		short: "rigidity, pier shares, forces and drift of each wall (the demo wall without FILE)",
		run:   runSolve,
	})
}

// feFlags are the finite-element options shared by solve and report.
type feFlags struct {
	on      bool
	mesh    string
	element string
	basis   string // --basis; "" takes the wall file's [analysis] basis
}

// register adds --fe, --mesh and --element to fs; what names the check in
// the help of --fe ("also run the finite-element check", …).
func (f *feFlags) register(fs *flag.FlagSet, what string) {
	fs.BoolVar(&f.on, "fe", false, what)
	fs.StringVar(&f.mesh, "mesh", "", "maximum element size of the finite-element mesh, e.g. 6in or 150mm (implies --fe)")
	fs.StringVar(&f.element, "element", "", "finite-element type: qm6 (default) or q4 (implies --fe)")
	f.registerBasis(fs)
}

// implied turns the check on when --mesh or --element was given.
func (f *feFlags) implied() {
	if f.mesh != "" || f.element != "" {
		f.on = true
	}
}

func (f *feFlags) options(w *geometry.Wall) (fe.Options, error) {
	opt := fe.Options{Mesh: w.Check.Mesh, Element: w.Check.Element}
	if f.mesh != "" {
		m, err := geometry.ParseLength(f.mesh, w.Units)
		if err != nil {
			return opt, usagef("--mesh: %v", err)
		}
		if m <= 0 {
			return opt, usagef("--mesh: the element size must be positive")
		}
		// The same bounds as [check] mesh in the file: a size larger than
		// the wall or too fine for it is refused in the file's words.
		c := *w
		c.Check.Mesh = m
		var list geometry.ErrorList
		if errors.As(c.Validate(), &list) {
			for _, e := range list {
				if e.Key == "check.mesh" {
					return opt, usagef("--mesh %s %s", f.mesh, e.Msg)
				}
			}
		}
		opt.Mesh = m
	}
	if f.element != "" {
		if !slices.Contains(geometry.Elements, f.element) {
			return opt, usagef("--element: unknown finite-element type %q (use %s)", f.element, strings.Join(geometry.Elements, " or "))
		}
		opt.Element = f.element
	}
	return opt, nil
}

// solved is one wall with its answers.
type solved struct {
	arg   string // the command-line argument, "" for the demo
	wall  *geometry.Wall
	res   *pier.Result
	err   error // the classic method's error
	fe    *fe.Result
	feErr error
	b     *basis.Result // the answer of the chosen basis; res, err, fe and feErr are its parts

	design    *design.Result // the pier design when the file has [design]
	designErr error
}

// solveArg loads FILE[:LAYOUT] (the demo for "") and solves it.
func solveArg(arg string, ff *feFlags) (*solved, error) {
	var w *geometry.Wall
	if arg == "" {
		w = demo.Wall()
	} else {
		var err error
		if w, err = study.Open(arg); err != nil {
			return nil, err
		}
	}
	s := &solved{arg: arg, wall: w}
	b, err := ff.chosen(w)
	if err != nil {
		return nil, err
	}
	var opt basis.Options
	if ff != nil && (ff.on || b == geometry.BasisFE) {
		if opt.FE, err = ff.options(w); err != nil {
			return nil, err
		}
		opt.Check = ff.on
	}
	s.b = basis.Solve(w, b, opt)
	s.res, s.err = s.b.Classic, locate(arg, w, s.b.ClassicErr)
	s.fe, s.feErr = s.b.FE, s.b.FEErr
	checkDesign(s)
	return s, nil
}

// locate puts the file, line and key of the opening that cuts a wall in
// front of a CutError ("wall.toml:12: opening[2]: opening W2 cuts …"), so
// the message says where to look; other errors pass unchanged.
func locate(arg string, w *geometry.Wall, err error) error {
	var ce *pier.CutError
	if arg == "" || !errors.As(err, &ce) {
		return err
	}
	path, _ := study.SplitArg(arg)
	data, rerr := geometry.ReadUserFile(path)
	key := geometry.OpeningKey(w, ce.Opening)
	if rerr != nil || key == "" {
		return err
	}
	return &locatedError{where: fmt.Sprintf("%s:%d: %s", path, geometry.KeyLine(data, key), key), err: err}
}

// locatedError is an error of the mechanics with the place in the file
// that causes it.
type locatedError struct {
	where string
	err   error
}

func (e *locatedError) Error() string { return e.where + ": " + e.err.Error() }
func (e *locatedError) Unwrap() error { return e.err }

func runSolve(e *env, args []string) error {
	fs := newFlags(e, "solve")
	asJSON := fs.Bool("json", false, "print JSON")
	var ff feFlags
	ff.register(fs, "also run the finite-element check")
	files, err := parseInterleaved(fs, args)
	if err != nil {
		return err
	}
	ff.implied()
	if len(files) == 0 {
		files = []string{""}
	}
	var all []*solved
	var failed []error // one per wall that has no answer
	for _, f := range files {
		s, err := solveArg(f, &ff)
		if err != nil {
			var ue *usageError
			if errors.As(err, &ue) || len(files) == 1 {
				return err
			}
			fmt.Fprintln(e.stderr, "pierwise:", err)
			failed = append(failed, err)
			continue
		}
		if serr := s.basisErr(); serr != nil {
			err := namedFailure(f, serr)
			if len(files) > 1 {
				fmt.Fprintln(e.stderr, "pierwise:", err)
			}
			failed = append(failed, err)
		} else if s.feErr != nil {
			// A check that was asked for and failed is a failure of the
			// command: its cause is the wall or the mesh asked for.
			err := feFailed(f, s.feErr)
			if len(files) > 1 {
				fmt.Fprintln(e.stderr, "pierwise:", err)
			}
			failed = append(failed, err)
		}
		all = append(all, s)
	}
	if *asJSON {
		if err := writeSolveJSON(e.stdout, all); err != nil {
			return err
		}
	} else {
		for i, s := range all {
			if i > 0 {
				fmt.Fprintln(e.stdout)
			}
			if s.b.IsFE() {
				writeSolveTableFE(e.stdout, s)
			} else {
				writeSolveTable(e.stdout, s)
			}
		}
	}
	switch {
	case len(failed) == 1 && len(files) == 1:
		return failed[0]
	case len(failed) > 0:
		return fmt.Errorf("%d of %d walls could not be solved", len(failed), len(files))
	}
	return nil
}

// feFailed is the error of a finite-element check that was asked for and
// has no answer.
func feFailed(arg string, err error) error {
	return fmt.Errorf("%s: the finite-element check failed: %w", displayName(arg), err)
}

func displayName(arg string) string {
	if arg == "" {
		return "demo wall"
	}
	return arg
}

// solveHeading writes the first lines of a solve table, on either basis:
// the wall's title, file and layout, and its size, support and openings.
func solveHeading(t *report.Text, s *solved) {
	w := s.wall
	L := func(l geometry.Length) string { return geometry.FormatLength(l, w.Units) }
	title := w.Title
	if title == "" {
		title = displayName(s.arg)
	}
	t.Line(fmt.Sprintf("%s  [%s, layout %q]", title, displayName(s.arg), w.Layouts[w.Active].Name))
	t.Wrapped("  ", fmt.Sprintf("wall %s long × %s high × %s thick, %s, %s", L(w.Length), L(w.Height), L(w.Thickness), supportLong(w.Support), plural(len(w.Openings()), "opening")))
}

func writeSolveTable(out io.Writer, s *solved) {
	w, u := s.wall, report.UnitsFor(s.wall.Units)
	t := report.NewText(out)
	solveHeading(t, s)
	t.Line("  basis: " + basis.Name(s.b.Basis))
	if s.res == nil {
		t.Wrapped("  ", fmt.Sprintf("classic method: no answer: %v", s.err))
		writeFETable(t, s)
		return
	}
	r := s.res
	t.Line(fmt.Sprintf("  relative deflection %s /(E·t), relative rigidity %s E·t", report.Sig(r.Deflection), report.Sig(r.Rigidity)))
	if d := r.Split.Total(); d > 0 {
		t.Line(fmt.Sprintf("  bending %.0f %%, shear %.0f %% of the wall's deflection", 100*r.Split.Bending/d, 100*r.Split.Shear/d))
	}
	if r.Moduli.E > 0 {
		t.Line(fmt.Sprintf("  E = %s, E_v = %s; rigidity %s %s", geometry.FormatStress(r.Moduli.E, w.Units), geometry.FormatStress(r.Moduli.Ev, w.Units), report.Sig(u.RigidityOf(r.RigidityAbs)), u.Rigidity))
	}
	if r.HasLoad {
		driftLines(t, w, r.DeflectionAbs, r.Drift)
	}
	if r.HasLoad {
		t.Line(fmt.Sprintf("  overturning moment at the base %s %s", report.Sig(u.MomentOf(r.Overturning)), u.Moment))
	}
	t.Blank()
	pierRows(t, r, w)
	writeDesignLine(t, s)
	for _, warn := range r.Warnings {
		t.Wrapped("  warning: ", warn.Text)
	}
	writeFETable(t, s)
}

// driftLines writes the top deflection δe under the wall's shear and the
// drift check of either basis: no design drift (and no verdict) when C_d or
// I_e is not given (docs/method.md §7).
func driftLines(t *report.Text, w *geometry.Wall, elastic geometry.Length, d pier.DriftCheck) {
	u := report.UnitsFor(w.Units)
	if d.Missing != "" {
		t.Line(fmt.Sprintf("  V = %s: δe = %s %s; no design drift: %s not given", geometry.FormatForce(w.Load.Shear, w.Units),
			report.Sig(u.DeflectionOf(elastic)), u.Deflection, d.Missing))
	} else {
		t.Line(fmt.Sprintf("  V = %s: δe = %s %s; δ = Cd·δe/Ie = %s %s = %s h_sx", geometry.FormatForce(w.Load.Shear, w.Units),
			report.Sig(u.DeflectionOf(elastic)), u.Deflection, report.Sig(u.DeflectionOf(d.Design)), u.Deflection, report.Fraction(d.Ratio)))
	}
	check := "  drift limit: none set"
	if d.Allowable > 0 {
		check = fmt.Sprintf("  drift limit %s h_sx = %s %s: %s", report.Fraction(w.Drift.Limit), report.Sig(u.DeflectionOf(d.Allowable)), u.Deflection, d.Verdict())
	}
	t.Line(check)
}

// pierRows writes the pier table of the solve command: * marks a pier with
// openings of its own (its forces are those of the whole pier, which the
// piers inside it share), † a pier that its openings cut (no load path).
// N is the axial force of the band's overturning couple (compression
// positive).
func pierRows(t *report.Text, r *pier.Result, w *geometry.Wall) {
	u := report.UnitsFor(w.Units)
	L := func(x float64) string { return geometry.FormatLength(geometry.Length(x), w.Units) }
	tab := report.Table{Head: []string{"pier", "h", "L", "h/L", "support", "R rel", "share"}, Right: []bool{false, true, true, true, false, true, true}}
	if r.HasLoad {
		tab.Head = append(tab.Head, "V "+u.Force, "M "+u.Moment, "N "+u.Force)
		tab.Right = append(tab.Right, true, true, true)
	}
	for _, p := range r.Piers {
		name, rel := p.Name, report.Sig(p.Rigidity)
		switch {
		case p.Cut:
			name, rel = name+"†", "-"
		case !p.Leaf:
			name += "*"
		}
		row := []string{name, L(p.H()), L(p.L()), fmt.Sprintf("%.2f", p.Ratio()), p.Support.String(), rel, report.Sig(100*p.Share) + "%"}
		if r.HasLoad && !p.Cut {
			row = append(row, report.Sig(u.ForceOf(p.Shear)), report.Sig(u.MomentOf(p.Moment)), report.Sig(u.ForceOf(p.Loads.Lateral.Middle.Axial)))
		} else if r.HasLoad {
			row = append(row, "-", "-", "-")
		}
		tab.Add(row...)
	}
	tab.Write(t, "  ")
}

func writeFETable(t *report.Text, s *solved) {
	if s.feErr != nil {
		t.Wrapped("  ", fmt.Sprintf("finite-element check failed: %v", s.feErr))
	}
	if s.fe == nil {
		return
	}
	f := s.fe
	t.Line(fmt.Sprintf("  finite-element check (%s, mesh %s, %d elements):", f.Element, geometry.FormatLength(f.Mesh, s.wall.Units), f.Elements))
	t.Line(fmt.Sprintf("    relative deflection %s /(E·t), relative rigidity %s E·t", report.Sig(f.Deflection), report.Sig(f.Rigidity)))
	if u := report.UnitsFor(s.wall.Units); f.RigidityAbs > 0 {
		line := fmt.Sprintf("    rigidity %s %s", report.Sig(u.RigidityOf(f.RigidityAbs)), u.Rigidity)
		if f.HasLoad {
			line += fmt.Sprintf("; δe = %s %s", report.Sig(u.DeflectionOf(f.DeflectionAbs)), u.Deflection)
			if f.Drift.Missing == "" {
				line += fmt.Sprintf(", δ = %s %s", report.Sig(u.DeflectionOf(f.Drift.Design)), u.Deflection)
			}
		}
		t.Line(line)
	}
	if s.res != nil {
		t.Line(fmt.Sprintf("    the classic rigidity is %s the finite-element rigidity", report.ClassicVersusFE(f.Difference)))
	}
	if len(f.Piers) > 0 {
		parts := make([]string, len(f.Piers))
		for i, p := range f.Piers {
			parts[i] = p.Name + " " + report.Sig(100*p.Share) + "%"
		}
		t.Wrapped("    shares: ", strings.Join(parts, ", "))
	}
	for _, warn := range f.Warnings {
		t.Wrapped("  warning: ", warn)
	}
	if f.Collector && len(f.Notes) > 0 {
		t.Wrapped("  note: ", f.Notes[0])
	}
}

// JSON output (README: the command line). Lengths in the base unit (ft or m); forces,
// rigidities, deflections and moments in the report units, named in "units".
type jsonWall struct {
	File               string          `json:"file"`
	Title              string          `json:"title"`
	Layout             string          `json:"layout"`
	Basis              string          `json:"basis"` // "classic" or "fe": every number below is of this basis
	Units              jsonUnits       `json:"units"`
	Inputs             jsonInputs      `json:"inputs"`
	Error              string          `json:"error,omitempty"`
	DeflectionRelative *float64        `json:"deflection_relative,omitempty"`
	RigidityRelative   *float64        `json:"rigidity_relative,omitempty"`
	BendingFraction    *float64        `json:"bending_fraction,omitempty"`
	Rigidity           *float64        `json:"rigidity,omitempty"`
	Deflection         *float64        `json:"deflection,omitempty"`
	Shear              *float64        `json:"shear,omitempty"`
	Overturning        *float64        `json:"overturning,omitempty"`
	Drift              *jsonDrift      `json:"drift,omitempty"`
	Piers              []jsonPier      `json:"piers"`
	Warnings           []string        `json:"warnings"`
	Check              *jsonCheck      `json:"check,omitempty"` // the other basis's rigidity, when it was solved
	FE                 *jsonFE         `json:"fe,omitempty"`
	Design             *jsonWallDesign `json:"design,omitempty"`
}

// jsonInputs are the wall's settings keyed as in the wall file
// ("material.strength"), one entry per geometry.Settings entry: text,
// true/false, or a number, quantities in SI base units (m, N, Pa, N/m) to
// 12 significant digits.
type jsonInputs map[string]any

func inputsJSON(w *geometry.Wall) jsonInputs {
	in := jsonInputs{}
	for i := range geometry.Settings {
		s := &geometry.Settings[i]
		switch v := s.JSONValue(w).(type) {
		case nil:
		case float64:
			in[s.Key] = report.Tidy(v)
		default:
			in[s.Key] = v
		}
	}
	return in
}

type jsonUnits struct {
	Length     string `json:"length"`
	Force      string `json:"force"`
	Deflection string `json:"deflection"`
	Rigidity   string `json:"rigidity"`
	Moment     string `json:"moment"`
}

// jsonDrift is the drift check (docs/method.md §7): without C_d or I_e
// there is no design drift and no verdict, and missing says which is
// not given.
type jsonDrift struct {
	Design       *float64 `json:"design,omitempty"`
	Ratio        *float64 `json:"ratio,omitempty"`
	StoreyHeight float64  `json:"storey_height"` // h_sx in the base length unit (ft or m)
	Allowable    *float64 `json:"allowable,omitempty"`
	Limit        *float64 `json:"limit,omitempty"`
	OK           *bool    `json:"ok,omitempty"`
	Missing      string   `json:"missing,omitempty"`
}

type jsonPier struct {
	Name             string          `json:"name"`
	Parent           string          `json:"parent,omitempty"`
	X0               float64         `json:"x0"`
	X1               float64         `json:"x1"`
	Y0               float64         `json:"y0"`
	Y1               float64         `json:"y1"`
	H                float64         `json:"h"`
	L                float64         `json:"l"`
	Support          string          `json:"support"`
	RigidityRelative *float64        `json:"rigidity_relative,omitempty"` // the classic formula's; not on the fe basis
	Share            float64         `json:"share"`
	Leaf             bool            `json:"leaf"`
	Cut              bool            `json:"cut,omitempty"`
	BendingFraction  *float64        `json:"bending_fraction,omitempty"` // of the classic formula; not on the fe basis
	Shear            *float64        `json:"shear,omitempty"`
	Moment           *float64        `json:"moment,omitempty"`
	Forces           *jsonForces     `json:"forces,omitempty"`
	Bars             []jsonBar       `json:"bars,omitempty"`
	Design           *jsonPierDesign `json:"design,omitempty"`
}

// jsonForces are a pier's section forces (docs/method.md §6), unfactored,
// per load case: the lateral shear and moment with the axial force of the
// overturning, and the axial forces of the dead and live loads
// (compression positive).
type jsonForces struct {
	Bottom jsonSection `json:"bottom"`
	Middle jsonSection `json:"middle"`
	Top    jsonSection `json:"top"`
}

type jsonSection struct {
	Shear        float64 `json:"shear"`
	Moment       float64 `json:"moment"`
	AxialLateral float64 `json:"axial_lateral"`
	AxialDead    float64 `json:"axial_dead"`
	AxialLive    float64 `json:"axial_live"`
}

func sectionsJSON(l pier.PierLoads, u report.Units) *jsonForces {
	at := func(lat, dead, live pier.Forces) jsonSection {
		return jsonSection{Shear: u.ForceOf(lat.Shear), Moment: u.MomentOf(lat.Moment),
			AxialLateral: u.ForceOf(lat.Axial), AxialDead: u.ForceOf(dead.Axial), AxialLive: u.ForceOf(live.Axial)}
	}
	return &jsonForces{
		Bottom: at(l.Lateral.Bottom, l.Dead.Bottom, l.Live.Bottom),
		Middle: at(l.Lateral.Middle, l.Dead.Middle, l.Live.Middle),
		Top:    at(l.Lateral.Top, l.Dead.Top, l.Live.Top),
	}
}

type jsonFE struct {
	DeflectionRelative float64       `json:"deflection_relative"`
	RigidityRelative   float64       `json:"rigidity_relative"`
	Difference         *float64      `json:"rigidity_difference,omitempty"`
	Rigidity           *float64      `json:"rigidity,omitempty"`
	Deflection         *float64      `json:"deflection,omitempty"`
	Mesh               float64       `json:"mesh"`
	Element            string        `json:"element"`
	Elements           int           `json:"elements"`
	DOFs               int           `json:"dofs"`
	Piers              []jsonFEShare `json:"piers"`
	Warnings           []string      `json:"warnings"`
	Notes              []string      `json:"notes,omitempty"` // what the model assumed (top collector, self weight)
	Error              string        `json:"error,omitempty"`
}

type jsonFEShare struct {
	Name  string  `json:"name"`
	Share float64 `json:"share"`
}

func ptr(x float64) *float64 { return &x }

func toJSON(s *solved) jsonWall {
	if s.b.IsFE() {
		return toJSONFE(s)
	}
	w, u := s.wall, report.UnitsFor(s.wall.Units)
	j := jsonWall{
		File: s.arg, Title: w.Title, Layout: w.Layouts[w.Active].Name, Basis: s.b.Basis.String(),
		Units:    jsonUnits{Length: u.Coord, Force: u.Force, Deflection: u.Deflection, Rigidity: u.Rigidity, Moment: u.Moment},
		Inputs:   inputsJSON(w),
		Piers:    []jsonPier{},
		Warnings: []string{},
	}
	if s.err != nil {
		j.Error = s.err.Error()
	}
	if r := s.res; r != nil {
		j.DeflectionRelative, j.RigidityRelative = ptr(r.Deflection), ptr(r.Rigidity)
		if d := r.Split.Total(); d > 0 {
			j.BendingFraction = ptr(r.Split.Bending / d)
		}
		if r.Moduli.E > 0 {
			j.Rigidity = ptr(u.RigidityOf(r.RigidityAbs))
		}
		if r.HasLoad {
			j.Shear = ptr(u.ForceOf(w.Load.Shear))
			j.Overturning = ptr(u.MomentOf(r.Overturning))
			j.Deflection = ptr(u.DeflectionOf(r.DeflectionAbs))
			d := &jsonDrift{StoreyHeight: u.CoordOf(float64(r.Drift.Height)), Missing: r.Drift.Missing}
			if r.Drift.Missing == "" {
				d.Design, d.Ratio = ptr(u.DeflectionOf(r.Drift.Design)), ptr(r.Drift.Ratio)
			}
			if r.Drift.Judged() {
				d.OK = &r.Drift.OK
			}
			if r.Drift.Allowable > 0 {
				d.Allowable, d.Limit = ptr(u.DeflectionOf(r.Drift.Allowable)), ptr(w.Drift.Limit)
			}
			j.Drift = d
		}
		for _, p := range r.Piers {
			jp := jsonPier{
				Name: p.Name, Parent: p.Parent,
				X0: report.Tidy(u.CoordOf(p.Rect.X0)), X1: report.Tidy(u.CoordOf(p.Rect.X1)), Y0: report.Tidy(u.CoordOf(p.Rect.Y0)), Y1: report.Tidy(u.CoordOf(p.Rect.Y1)),
				H: report.Tidy(u.CoordOf(p.H())), L: report.Tidy(u.CoordOf(p.L())), Support: p.Support.String(),
				RigidityRelative: ptr(p.Rigidity), Share: p.Share, Leaf: p.Leaf, Cut: p.Cut, BendingFraction: ptr(0),
			}
			if d := p.Parts.Total(); d > 0 {
				jp.BendingFraction = ptr(p.Parts.Bending / d)
			}
			if r.HasLoad && !p.Cut {
				jp.Shear, jp.Moment = ptr(u.ForceOf(p.Shear)), ptr(u.MomentOf(p.Moment))
			}
			if !p.Cut {
				jp.Forces = sectionsJSON(p.Loads, u)
			}
			j.Piers = append(j.Piers, jp)
		}
		j.Warnings = append(j.Warnings, pier.Texts(r.Warnings)...)
		designJSON(s, &j)
	}
	if s.fe != nil || s.feErr != nil {
		f := &jsonFE{Piers: []jsonFEShare{}, Warnings: []string{}}
		if s.feErr != nil {
			f.Error = s.feErr.Error()
		} else {
			f.DeflectionRelative, f.RigidityRelative = s.fe.Deflection, s.fe.Rigidity
			f.Mesh, f.Element, f.Elements, f.DOFs = report.Tidy(u.CoordOf(float64(s.fe.Mesh))), s.fe.Element, s.fe.Elements, s.fe.DOFs
			if s.res != nil {
				f.Difference = ptr(s.fe.Difference)
			}
			if s.fe.RigidityAbs > 0 {
				f.Rigidity = ptr(u.RigidityOf(s.fe.RigidityAbs))
			}
			if s.fe.HasLoad {
				f.Deflection = ptr(u.DeflectionOf(s.fe.DeflectionAbs))
			}
			for _, p := range s.fe.Piers {
				f.Piers = append(f.Piers, jsonFEShare{Name: p.Name, Share: p.Share})
			}
			f.Warnings = append(f.Warnings, s.fe.Warnings...)
		}
		j.FE = f
	}
	j.Check = checkJSON(s, u)
	return j
}

// writeSolveJSON prints one object for one wall and an array for several.
func writeSolveJSON(out io.Writer, all []*solved) error {
	enc := json.NewEncoder(out)
	enc.SetIndent("", "  ")
	if len(all) == 1 {
		return enc.Encode(toJSON(all[0]))
	}
	list := make([]jsonWall, len(all))
	for i, s := range all {
		list[i] = toJSON(s)
	}
	return enc.Encode(list)
}

// plural returns "1 opening", "2 openings".
func plural(n int, noun string) string {
	if n == 1 {
		return "1 " + noun
	}
	return fmt.Sprintf("%d %ss", n, noun)
}
