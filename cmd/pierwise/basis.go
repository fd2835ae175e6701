package main

import (
	"flag"
	"fmt"
	"io"

	"pierwise/basis"
	"pierwise/geometry"
	"pierwise/report"
)

// The basis on the command line (docs/method.md §5): --basis classic|fe on
// solve, report, compare, sweep and draw; the wall file's [analysis] basis
// when the flag is not given.

const basisUsage = "the model every number comes from: classic or fe (default: the wall file's [analysis] basis, else classic)"

// registerBasis adds --basis to fs.
func (f *feFlags) registerBasis(fs *flag.FlagSet) {
	fs.StringVar(&f.basis, "basis", "", basisUsage)
}

// chosen returns the basis for wall w: the flag's when given (an unknown
// one is a usage error), else the wall file's.
func (f *feFlags) chosen(w *geometry.Wall) (geometry.Basis, error) {
	if f == nil || f.basis == "" {
		return w.Analysis.Basis, nil
	}
	return parseBasisFlag(f.basis)
}

// parseBasisFlag reads the value of --basis.
func parseBasisFlag(v string) (geometry.Basis, error) {
	b, err := basis.Parse(v)
	if err != nil {
		return b, usagef("--basis: %v", err)
	}
	return b, nil
}

// basisErr returns why the chosen basis has no answer for the wall (the
// classic method's error with its place in the file), or nil.
func (s *solved) basisErr() error {
	if s.b == nil || !s.b.IsFE() {
		return s.err
	}
	return s.b.Err()
}

// jsonCheck is the other basis's rigidity beside the chosen one.
type jsonCheck struct {
	Basis            string   `json:"basis"` // the other basis
	RigidityRelative float64  `json:"rigidity_relative"`
	Rigidity         *float64 `json:"rigidity,omitempty"`
	Difference       float64  `json:"rigidity_difference"` // (classic − fe) / fe
}

func checkJSON(s *solved, u report.Units) *jsonCheck {
	c, ok := s.b.Check()
	if !ok {
		return nil
	}
	j := &jsonCheck{Basis: c.Basis.String(), RigidityRelative: c.Rigidity, Difference: c.Difference}
	if c.RigidityAbs > 0 {
		j.Rigidity = ptr(u.RigidityOf(c.RigidityAbs))
	}
	return j
}

// toJSONFE is toJSON on the fe basis: the wall's numbers and every pier's
// share and forces are the model's, in the same shape as the classic
// basis's; "fe" keeps the model's details and "check" the classic
// rigidity.
func toJSONFE(s *solved) jsonWall {
	w, u, r := s.wall, report.UnitsFor(s.wall.Units), s.b
	j := jsonWall{
		File: s.arg, Title: w.Title, Layout: w.Layouts[w.Active].Name, Basis: r.Basis.String(),
		Units:    jsonUnits{Length: u.Coord, Force: u.Force, Deflection: u.Deflection, Rigidity: u.Rigidity, Moment: u.Moment},
		Inputs:   inputsJSON(w),
		Piers:    []jsonPier{},
		Warnings: []string{},
	}
	f := &jsonFE{Piers: []jsonFEShare{}, Warnings: []string{}}
	j.FE = f
	if err := r.Err(); err != nil {
		j.Error = err.Error()
		f.Error = s.feErr.Error()
		return j
	}
	j.DeflectionRelative, j.RigidityRelative = ptr(r.Deflection()), ptr(r.Rigidity())
	if r.RigidityAbs() > 0 {
		j.Rigidity = ptr(u.RigidityOf(r.RigidityAbs()))
	}
	if w.Load.Shear > 0 {
		j.Shear = ptr(u.ForceOf(w.Load.Shear))
		j.Overturning = ptr(u.MomentOf(r.Overturning()))
	}
	if r.HasLoad() {
		d := r.Drift()
		j.Deflection = ptr(u.DeflectionOf(r.DeflectionAbs()))
		jd := &jsonDrift{StoreyHeight: u.CoordOf(float64(d.Height)), Missing: d.Missing}
		if d.Missing == "" {
			jd.Design, jd.Ratio = ptr(u.DeflectionOf(d.Design)), ptr(d.Ratio)
		}
		if d.Judged() {
			ok := d.OK
			jd.OK = &ok
		}
		if d.Allowable > 0 {
			jd.Allowable, jd.Limit = ptr(u.DeflectionOf(d.Allowable)), ptr(w.Drift.Limit)
		}
		j.Drift = jd
	}
	for _, p := range r.Piers() {
		jp := jsonPier{
			Name: p.Name, Parent: p.Parent,
			X0: report.Tidy(u.CoordOf(p.Rect.X0)), X1: report.Tidy(u.CoordOf(p.Rect.X1)), Y0: report.Tidy(u.CoordOf(p.Rect.Y0)), Y1: report.Tidy(u.CoordOf(p.Rect.Y1)),
			H: report.Tidy(u.CoordOf(p.H())), L: report.Tidy(u.CoordOf(p.L())), Support: p.Support.String(),
			Share: p.Share, Leaf: p.Leaf, Cut: p.Cut,
		}
		if w.Load.Shear > 0 && !p.Cut {
			jp.Shear, jp.Moment = ptr(u.ForceOf(p.Shear)), ptr(u.MomentOf(p.Moment))
		}
		if !p.Cut {
			jp.Forces = sectionsJSON(p.Loads, u)
		}
		j.Piers = append(j.Piers, jp)
	}
	j.Warnings = append(j.Warnings, r.Warnings()...)
	if s.err != nil {
		j.Warnings = append(j.Warnings, "the classic method has no answer, so the piers it would name are not reported: "+s.err.Error())
	}
	m := s.fe
	f.DeflectionRelative, f.RigidityRelative = m.Deflection, m.Rigidity
	f.Mesh, f.Element, f.Elements, f.DOFs = report.Tidy(u.CoordOf(float64(m.Mesh))), m.Element, m.Elements, m.DOFs
	if s.res != nil {
		f.Difference = ptr(m.Difference)
	}
	if m.RigidityAbs > 0 {
		f.Rigidity = ptr(u.RigidityOf(m.RigidityAbs))
	}
	if m.HasLoad {
		f.Deflection = ptr(u.DeflectionOf(m.DeflectionAbs))
	}
	for _, p := range m.Piers {
		f.Piers = append(f.Piers, jsonFEShare{Name: p.Name, Share: p.Share})
	}
	f.Warnings = append(f.Warnings, m.Warnings...)
	f.Notes = m.Notes
	j.Check = checkJSON(s, u)
	designJSON(s, &j)
	return j
}

// writeSolveTableFE is the solve table on the fe basis: the model's
// rigidity, deflection, drift and pier forces, with the classic rigidity
// beside as the check.
func writeSolveTableFE(out io.Writer, s *solved) {
	w, u, r := s.wall, report.UnitsFor(s.wall.Units), s.b
	t := report.NewText(out)
	L := func(l geometry.Length) string { return geometry.FormatLength(l, w.Units) }
	solveHeading(t, s)
	if err := r.Err(); err != nil {
		t.Line("  basis: " + basis.Name(r.Basis))
		t.Wrapped("  ", fmt.Sprintf("no answer: %v", s.feErr))
		return
	}
	m := s.fe
	t.Line(fmt.Sprintf("  basis: finite-element model (%s, mesh %s, %d elements)", m.Element, L(m.Mesh), m.Elements))
	t.Line(fmt.Sprintf("  relative deflection %s /(E·t), relative rigidity %s E·t", report.Sig(r.Deflection()), report.Sig(r.Rigidity())))
	if r.RigidityAbs() > 0 {
		t.Line(fmt.Sprintf("  rigidity %s %s", report.Sig(u.RigidityOf(r.RigidityAbs())), u.Rigidity))
	}
	if c, ok := r.Check(); ok {
		line := fmt.Sprintf("classic relative rigidity %s E·t", report.Sig(c.Rigidity))
		if c.RigidityAbs > 0 {
			line += fmt.Sprintf(" (%s %s)", report.Sig(u.RigidityOf(c.RigidityAbs)), u.Rigidity)
		}
		t.Wrapped("  check: ", line+fmt.Sprintf(", %s the finite-element rigidity", report.ClassicVersusFE(c.Difference)))
	} else if s.err != nil {
		t.Wrapped("  ", fmt.Sprintf("check: the classic method has no answer: %v", s.err))
	}
	if r.HasLoad() {
		driftLines(t, w, r.DeflectionAbs(), r.Drift())
	}
	if w.Load.Shear > 0 {
		t.Line(fmt.Sprintf("  overturning moment at the base %s %s", report.Sig(u.MomentOf(r.Overturning())), u.Moment))
	}
	for _, n := range m.Notes {
		t.Wrapped("  note: ", n)
	}
	if ps := r.Piers(); len(ps) > 0 {
		t.Blank()
		tab := report.Table{Head: []string{"pier", "h", "L", "h/L", "support", "share"}, Right: []bool{false, true, true, true, false, true}}
		if w.Load.Shear > 0 {
			tab.Head = append(tab.Head, "V "+u.Force, "M "+u.Moment, "N "+u.Force)
			tab.Right = append(tab.Right, true, true, true)
		}
		Lm := func(x float64) string { return geometry.FormatLength(geometry.Length(x), w.Units) }
		for _, p := range ps {
			name := p.Name
			switch {
			case p.Cut:
				name += "†"
			case !p.Leaf:
				name += "*"
			}
			row := []string{name, Lm(p.H()), Lm(p.L()), fmt.Sprintf("%.2f", p.Ratio()), p.Support.String(), report.Sig(100*p.Share) + "%"}
			if w.Load.Shear > 0 && !p.Cut {
				row = append(row, report.Sig(u.ForceOf(p.Shear)), report.Sig(u.MomentOf(p.Moment)), report.Sig(u.ForceOf(p.Loads.Lateral.Middle.Axial)))
			} else if w.Load.Shear > 0 {
				row = append(row, "-", "-", "-")
			}
			tab.Add(row...)
		}
		tab.Write(t, "  ")
		if w.Load.Shear > 0 {
			t.Wrapped("  ", "V at mid-height, M the larger of the bottom and top moments, N at mid-height under the wall shear (compression positive), each the resultant of the model's nodal forces along the section")
		}
	}
	writeDesignLine(t, s)
	for _, warn := range r.Warnings() {
		t.Wrapped("  warning: ", warn)
	}
}

// supportLong says a wall's support in the table's words.
func supportLong(s geometry.Support) string {
	if s == geometry.Fixed {
		return "fixed-fixed"
	}
	return "cantilever"
}
