package main

import (
	"encoding/json"
	"fmt"
	"io"
	"math"
	"strings"

	"pierwise/geometry"
	"pierwise/report"
	"pierwise/storey"
	"pierwise/tui"
)

func init() {
	register(command{
		name:  "storey",
		args:  "FILE [--json | --edit] [--basis classic|fe] [--diaphragm rigid|flexible|envelope]",
		short: "share a storey shear among its walls (rigid, flexible or enveloped diaphragm) and give each wall's piers",
		run:   runStorey,
	})
}

func runStorey(e *env, args []string) error {
	fs := newFlags(e, "storey")
	asJSON := fs.Bool("json", false, "print JSON")
	edit := fs.Bool("edit", false, "open the storey screen of the editor (plan, walls, and each wall's elevation)")
	basis := fs.String("basis", "", "where the walls' rigidities come from: classic or fe (default: the storey file's basis, else classic)")
	diaphragm := fs.String("diaphragm", "", "rigid, flexible or envelope (default: the storey file's diaphragm, else rigid)")
	files, err := parseInterleaved(fs, args)
	if err != nil {
		return err
	}
	if len(files) != 1 {
		return usagef("storey needs one FILE (a storey file), got %d", len(files))
	}
	if *edit && *asJSON {
		return usagef("storey: --json and --edit do not go together")
	}
	var b geometry.Basis
	switch *basis {
	case "", "classic":
	case "fe":
		b = geometry.BasisFE
	default:
		return usagef("storey: --basis must be classic or fe, not %q", *basis)
	}
	dia, ok := storey.ParseDiaphragm(*diaphragm)
	if *diaphragm != "" && !ok {
		return usagef("storey: --diaphragm must be rigid, flexible or envelope, not %q", *diaphragm)
	}
	if *edit {
		if *basis != "" || *diaphragm != "" {
			return usagef("storey: --edit takes the basis and the diaphragm from the storey file")
		}
		return tui.EditStorey(files[0], tui.Options{Version: version})
	}
	s, walls, err := storey.LoadFiles(files[0])
	if err != nil {
		return err
	}
	if *basis != "" {
		s.Basis = b
	}
	if *diaphragm != "" {
		s.Diaphragm = dia
	}
	a, err := storey.Analyse(s, walls)
	if err != nil {
		return err
	}
	if *asJSON {
		enc := json.NewEncoder(e.stdout)
		enc.SetIndent("", "  ")
		return enc.Encode(a.JSON())
	}
	writeStoreyTables(e.stdout, a)
	return nil
}

// writeStoreyTables prints the storey's numbers for people; the full working
// is in the report (pierwise report FILE).
func writeStoreyTables(out io.Writer, a *storey.Analysis) {
	s, d := a.Storey, a.Distribution
	u := report.UnitsFor(s.Units)
	title := s.Title
	if title == "" {
		title = s.Path
	}
	fmt.Fprintf(out, "%s  (%s)\n", title, s.Path)
	fmt.Fprintf(out, "diaphragm %s, basis %s", s.Diaphragm, s.Basis)
	if s.SDC != "" {
		fmt.Fprintf(out, ", seismic design category %s", s.SDC)
	}
	fmt.Fprintln(out)
	fmt.Fprintf(out, "storey shear %s, mass centre (%.2f, %.2f) %s\ncentre of rigidity (%.2f, %.2f) %s\n",
		geometry.FormatForce(s.Shear, s.Units), u.CoordOf(float64(s.MassCenter[0])), u.CoordOf(float64(s.MassCenter[1])), u.Coord,
		u.CoordOf(d.CenterOfRigidity[0]), u.CoordOf(d.CenterOfRigidity[1]), u.Coord)
	if a.Absolute {
		fmt.Fprintf(out, "torsional rigidity J = %s %s per radian\n", report.Grouped(u.MomentOf(d.J)), u.Moment)
	} else {
		fmt.Fprintln(out, "rigidities: relative × thickness (not every wall has a modulus)")
	}
	if s.Basis == geometry.BasisFE {
		fmt.Fprintln(out, "\nrigidity by each model (the distribution uses the finite-element one)")
		unit := "rel×t"
		if a.Absolute {
			unit = u.Rigidity
		}
		tw := newTextTable("wall", "dir", "classic "+unit, "FE "+unit, "classic - FE")
		for _, w := range a.Walls {
			cl, fr, diff := "-", "-", "-"
			if w.ClassicRigidity > 0 {
				cl = rigidityText(a, u, w.ClassicRigidity)
			}
			if w.FERigidity > 0 {
				fr = rigidityText(a, u, w.FERigidity)
			}
			if d, ok := w.RigidityDifference(); ok {
				diff = fmt.Sprintf("%+.1f%%", 100*d)
			}
			tw.Add(w.Name, dirText(w.Ref), cl, fr, diff)
		}
		tw.Write(report.NewText(out), "  ")
	}
	if s.Diaphragm != storey.Flexible {
		for _, c := range d.Cases {
			fmt.Fprintf(out, "\ncase %s: e = %.2f %s, V·e = %s %s; shears in %s\n", c.Name(), u.CoordOf(c.Eccentricity), u.Coord, report.Sig(u.MomentOf(c.Torque)), u.Moment, u.Force)
			// The distribution uses R = E·t·R rel: when the walls' moduli or
			// thicknesses differ, only that column explains the direct shears.
			head := []string{"wall", "dir", "R rel"}
			if a.Absolute {
				head = append(head, "R "+u.Rigidity)
			}
			tw := newTextTable(append(head, "direct", "torsion", "total")...)
			for i, w := range a.Walls {
				sh := c.Shares[i]
				direct := "-"
				if w.Ref.Direction == c.Load || sh.Direct != 0 {
					direct = report.Sig(u.ForceOf(geometry.Force(sh.Direct)))
				}
				cells := []string{w.Name, dirText(w.Ref), relText(s, w)}
				if a.Absolute {
					cells = append(cells, report.Sig(u.RigidityOf(w.Rigidity)))
				}
				tw.Add(append(cells, direct,
					report.Sig(u.ForceOf(geometry.Force(sh.Torsional))), report.Sig(u.ForceOf(geometry.Force(sh.Total()))))...)
			}
			tw.Write(report.NewText(out), "  ")
		}
	}
	if s.Diaphragm == storey.Flexible {
		// The rigid cases and the irregularity check are the rigid
		// diaphragm's; on a flexible one they do not apply (docs/method.md §9).
		fmt.Fprintln(out)
		report.NewText(out).Wrapped("", "The diaphragm is flexible: the flexible distribution below governs. The rigid diaphragm's load cases and its torsional irregularity check (ASCE 7-22 Table 12.3-1, rigid or semirigid diaphragms) do not apply; --diaphragm rigid or envelope shows them.")
	} else {
		fmt.Fprintln(out, "\ntorsional irregularity (ASCE 7-22 Table 12.3-1; A_x by §12.8.4.3)")
		tw := newTextTable("case", "edges", "dmax/davg", "type", "A_x")
		for _, c := range d.Cases {
			edges := "south, north"
			if c.Load == storey.Y {
				edges = "west, east"
			}
			ratio := "n/a"
			if !math.IsInf(c.Torsion.Ratio, 0) {
				ratio = fmt.Sprintf("%.3f", c.Torsion.Ratio)
			}
			tw.Add(c.Name(), edges, ratio, c.Torsion.Type.String(), fmt.Sprintf("%.3f", c.Torsion.Amplification))
		}
		tw.Write(report.NewText(out), "  ")
	}
	if a.Flexible != nil {
		governs := ""
		if s.Diaphragm == storey.Flexible {
			governs = " (governs)"
		}
		fmt.Fprintf(out, "\nflexible diaphragm%s: shear to the wall lines (tributary spans), %s\n", governs, u.Force)
		tw := newTextTable("load", "line "+u.Coord, "tributary "+u.Coord, "shear "+u.Force)
		for _, lines := range a.Flexible.Lines {
			for _, ln := range lines {
				tw.Add(ln.Load.String(), fmt.Sprintf("%.2f", u.CoordOf(ln.Position)),
					fmt.Sprintf("%.2f to %.2f", u.CoordOf(ln.Tributary[0]), u.CoordOf(ln.Tributary[1])), report.Sig(u.ForceOf(geometry.Force(ln.Shear))))
			}
		}
		tw.Write(report.NewText(out), "  ")
	}
	switch s.Diaphragm {
	case storey.Envelope:
		fmt.Fprintln(out, "\ndesign shears (the larger of rigid and flexible, per wall)")
		tw := newTextTable("wall", "dir", "rigid "+u.Force, "flexible "+u.Force, "design "+u.Force, "governs")
		for _, w := range a.Walls {
			tw.Add(w.Name, dirText(w.Ref), report.Sig(u.ForceOf(geometry.Force(w.Rigid.Shear))), report.Sig(u.ForceOf(geometry.Force(w.Flexible))),
				report.Sig(u.ForceOf(geometry.Force(w.Design.Shear))), storey.CaseName(d, w.Design.Case))
		}
		tw.Write(report.NewText(out), "  ")
	case storey.Flexible:
		fmt.Fprintln(out, "\ndesign shears (flexible diaphragm: the line's shear shared by rigidity)")
		tw := newTextTable("wall", "dir", "design "+u.Force)
		for _, w := range a.Walls {
			tw.Add(w.Name, dirText(w.Ref), report.Sig(u.ForceOf(geometry.Force(w.Design.Shear))))
		}
		tw.Write(report.NewText(out), "  ")
	default:
		fmt.Fprintln(out, "\ndesign shears (worst case, never below the direct shear)")
		tw := newTextTable("wall", "dir", "direct "+u.Force, "design "+u.Force, "governs")
		for _, w := range a.Walls {
			tw.Add(w.Name, dirText(w.Ref), report.Sig(u.ForceOf(geometry.Force(w.Design.Direct))),
				report.Sig(u.ForceOf(geometry.Force(w.Design.Shear))), storey.CaseName(d, w.Design.Case))
		}
		tw.Write(report.NewText(out), "  ")
	}
	if s.Cd > 0 && a.Absolute {
		fmt.Fprintf(out, "\nstorey drift δ = Cd·δe/Ie (Cd %.3g, Ie %.3g, h %s)\n", s.Cd, s.Ie, geometry.FormatLength(s.Height, s.Units))
		tw := newTextTable("where", "δ "+u.Deflection, "δ/h", "limit "+u.Deflection, "check")
		row := func(name string, dr storey.Drift) {
			lim, verdict := "-", "-"
			if dr.Allowable > 0 {
				lim, verdict = report.Sig(u.DeflectionOf(geometry.Length(dr.Allowable))), "OK"
				if !dr.OK {
					verdict = "EXCEEDS"
				}
			}
			tw.Add(name, report.Sig(u.DeflectionOf(geometry.Length(dr.Design))), report.Fraction(dr.Ratio), lim, verdict)
		}
		for _, w := range a.Walls {
			row(w.Name, w.Drift)
		}
		// The worst edge of each load direction.
		for _, load := range []storey.Direction{storey.X, storey.Y} {
			best := -1
			for k, e := range a.Edges {
				if d.Cases[e.Case].Load == load && (best < 0 || e.Drift.Design > a.Edges[best].Drift.Design) {
					best = k
				}
			}
			if best >= 0 {
				e := a.Edges[best]
				name := e.Edge + " edge, " + d.Cases[e.Case].Name()
				if s.Diaphragm == storey.Flexible {
					name += " (rigid, comparison)"
				}
				row(name, e.Drift)
			}
		}
		tw.Write(report.NewText(out), "  ")
	}
	for _, w := range a.Walls {
		fmt.Fprintf(out, "\n%s under %s:\n", w.Name, geometry.FormatForce(geometry.Force(w.Design.Shear), s.Units))
		if g := w.Governing; g != nil {
			fmt.Fprintf(out, "  governing pier %s (%s), ratio %.2f\n", g.Pier, g.Check, g.Ratio)
		}
		if line := storey.DriftLine(w.Loaded, u); line != "" && s.Basis == geometry.BasisClassic {
			report.NewText(out).Wrapped("  ", line)
		}
		switch {
		case w.Wall == nil:
			fmt.Fprintf(out, "  given by its rigidity, %s %s: no piers\n", report.Grouped(u.RigidityOf(w.Ref.Rigidity)), u.Rigidity)
			continue
		case w.Loaded == nil:
			fmt.Fprintln(out, "  the classic method cannot solve this layout: no piers")
			continue
		case len(w.Piers) == 0:
			fmt.Fprintln(out, "  solid wall, no piers")
			continue
		}
		tw := newTextTable("pier", "h/L", "support", "share", "V "+u.Force, "M "+u.Moment)
		for _, p := range w.Piers {
			support := p.Support.String()
			tw.Add(p.Name, fmt.Sprintf("%.2f", p.Ratio()), support, report.Sig(100*p.Share)+"%",
				report.Sig(u.ForceOf(p.Shear)), report.Sig(u.MomentOf(p.Moment)))
		}
		tw.Write(report.NewText(out), "  ")
	}
	for _, msg := range a.Warnings {
		report.NewText(out).Wrapped("warning: ", msg)
	}
	fmt.Fprintln(out, "\nResults support, and do not replace, the judgement of a licensed engineer;\nlocal codes govern.")
}

func dirText(r storey.WallRef) string {
	if r.Direction == storey.Angled {
		return fmt.Sprintf("%g°", r.AngleDeg)
	}
	return r.Direction.String()
}

// relText is the wall's relative rigidity on the storey's basis, or "given".
func relText(s *storey.Storey, w storey.Wall) string {
	switch {
	case s.Basis == geometry.BasisFE && w.FE != nil:
		return report.Sig(w.FE.Rigidity)
	case w.Unit != nil:
		return report.Sig(w.Unit.Rigidity)
	}
	return "given"
}

func rigidityText(a *storey.Analysis, u report.Units, r float64) string {
	if a.Absolute {
		return report.Sig(u.RigidityOf(r))
	}
	return report.Sig(u.CoordOf(r))
}

// newTextTable is a table of the storey command: the first two columns,
// the support and the governing case read left, numbers right.
func newTextTable(head ...string) *report.Table {
	right := make([]bool, len(head))
	for i, h := range head {
		right[i] = !(i <= 1 || h == "support" || h == "governs" || h == "type" || h == "check" || strings.HasPrefix(h, "tributary"))
	}
	return &report.Table{Head: head, Right: right}
}
