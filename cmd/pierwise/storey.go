package main

import (
	"encoding/json"
	"fmt"
	"io"

	"pierwise/geometry"
	"pierwise/report"
	"pierwise/storey"
	"pierwise/tui"
)

func init() {
	storey.Version = version
	register(command{
		name:  "storey",
		args:  "FILE [--json | --edit]",
		short: "share a storey shear among its walls (rigid diaphragm with torsion) and give each wall's piers",
		run:   runStorey,
	})
}

func runStorey(e *env, args []string) error {
	fs := newFlags(e, "storey")
	asJSON := fs.Bool("json", false, "print JSON")
	edit := fs.Bool("edit", false, "open the storey screen of the editor (plan, walls, and each wall's elevation)")
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
	if *edit {
		return tui.EditStorey(files[0])
	}
	a, err := storey.Load(files[0])
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
	fmt.Fprintf(out, "storey shear %s, mass centre (%.2f, %.2f) %s\ncentre of rigidity (%.2f, %.2f) %s\n",
		geometry.FormatForce(s.Shear, s.Units), u.CoordOf(float64(s.MassCenter[0])), u.CoordOf(float64(s.MassCenter[1])), u.Coord,
		u.CoordOf(d.CenterOfRigidity[0]), u.CoordOf(d.CenterOfRigidity[1]), u.Coord)
	if a.Absolute {
		fmt.Fprintf(out, "torsional rigidity J = %s %s per radian\n", report.Grouped(u.MomentOf(d.J)), u.Moment)
	} else {
		fmt.Fprintln(out, "rigidities: relative × thickness (not every wall has a modulus)")
	}
	for _, c := range d.Cases {
		fmt.Fprintf(out, "\ncase %s: e = %.2f %s, V·e = %.1f %s; shears in %s\n", c.Name(), u.CoordOf(c.Eccentricity), u.Coord, u.MomentOf(c.Torque), u.Moment, u.Force)
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
			if w.Ref.Direction == c.Load {
				direct = fmt.Sprintf("%.2f", u.ForceOf(geometry.Force(sh.Direct)))
			}
			cells := []string{w.Name, w.Ref.Direction.String(), fmt.Sprintf("%.4f", w.Unit.Rigidity)}
			if a.Absolute {
				cells = append(cells, report.Grouped(u.RigidityOf(w.Rigidity)))
			}
			tw.Add(append(cells, direct,
				fmt.Sprintf("%.2f", u.ForceOf(geometry.Force(sh.Torsional))), fmt.Sprintf("%.2f", u.ForceOf(geometry.Force(sh.Total()))))...)
		}
		tw.Write(report.NewText(out), "  ")
	}
	fmt.Fprintln(out, "\ndesign shears (worst case, never below the direct shear)")
	tw := newTextTable("wall", "dir", "direct "+u.Force, "design "+u.Force, "governs")
	for _, w := range a.Walls {
		tw.Add(w.Name, w.Ref.Direction.String(), fmt.Sprintf("%.2f", u.ForceOf(geometry.Force(w.Design.Direct))),
			fmt.Sprintf("%.2f", u.ForceOf(geometry.Force(w.Design.Shear))), storey.CaseName(d, w.Design.Case))
	}
	tw.Write(report.NewText(out), "  ")
	for _, w := range a.Walls {
		fmt.Fprintf(out, "\n%s under %s:\n", w.Name, geometry.FormatForce(geometry.Force(w.Design.Shear), s.Units))
		if line := storey.DriftLine(w.Loaded, u); line != "" {
			report.NewText(out).Wrapped("  ", line)
		}
		leaves := w.Loaded.Leaves()
		if len(leaves) == 0 {
			fmt.Fprintln(out, "  solid wall, no piers")
			continue
		}
		tw := newTextTable("pier", "h/L", "support", "share", "V "+u.Force, "M "+u.Moment)
		for _, p := range leaves {
			support := "cantilever"
			if p.Support == geometry.Fixed {
				support = "fixed"
			}
			tw.Add(p.Name, fmt.Sprintf("%.2f", p.Ratio()), support, fmt.Sprintf("%.1f%%", 100*p.Share),
				fmt.Sprintf("%.2f", u.ForceOf(p.Shear)), fmt.Sprintf("%.1f", u.MomentOf(p.Moment)))
		}
		tw.Write(report.NewText(out), "  ")
	}
	for _, msg := range a.Warnings {
		report.NewText(out).Wrapped("warning: ", msg)
	}
	fmt.Fprintln(out, "\nResults support, and do not replace, the judgement of a licensed engineer;\nlocal codes govern.")
}

// newTextTable is a table of the storey command: the first two columns,
// the support and the governing case read left, numbers right.
func newTextTable(head ...string) *report.Table {
	right := make([]bool, len(head))
	for i, h := range head {
		right[i] = !(i <= 1 || h == "support" || h == "governs")
	}
	return &report.Table{Head: head, Right: right}
}
