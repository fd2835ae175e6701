package report

import (
	"fmt"
	"strconv"
	"strings"

	"pierwise/design"
	"pierwise/geometry"
)

// DesignCaution is printed with every pier design: in the report's design
// section, the editor's design view and the solve table.
const DesignCaution = "The strength checks support, and do not replace, a licensed engineer's " +
	"design; local codes and their amendments govern."

// Verdict is "OK" or "FAILS" for a ratio.
func Verdict(ok bool) string {
	if ok {
		return "OK"
	}
	return "FAILS"
}

// Ratio writes a demand/capacity ratio: two decimals, "!" after one above
// 1.0 so that a failure reads without colour.
func Ratio(r float64) string {
	s := strconv.FormatFloat(r, 'f', 2, 64)
	if r >= design.RatioCap {
		s = "≥" + strconv.FormatFloat(design.RatioCap, 'f', 0, 64)
	}
	if r > 1 {
		s += "!"
	}
	return s
}

// CombinationLabel numbers a combination for the tables: "3 (−x)".
func CombinationLabel(r *design.Result, i int) string {
	dir := "+x"
	if r.Combinations[i].Dir < 0 {
		dir = "−x"
	}
	return strconv.Itoa(i+1) + " " + dir
}

// PierGoverning says what governs one pier: "flexure at the bottom,
// combination 3 (0.78D + 1.00Q_E (+x))" or the reinforcement rule.
func PierGoverning(r *design.Result, p *design.PierResult) string {
	if p.Requirement >= 0 {
		q := p.Require[p.Requirement]
		return q.Name + " (" + q.Clause + ")"
	}
	if len(p.Checks) == 0 {
		return "no checks"
	}
	c := p.GoverningCheck()
	return fmt.Sprintf("%s at the %s, combination %d: %s", c.Governs, c.Section, c.Combination+1, r.Combinations[c.Combination].Factors(r.Kind))
}

// GoverningLine names the wall's governing pier and check with its ratio and
// verdict, one line for the solve table, the report and the editor.
func GoverningLine(r *design.Result) string {
	if r.Governing < 0 {
		return "no leaf pier to check"
	}
	p := &r.Piers[r.Governing]
	return fmt.Sprintf("%s %s: ratio %s, %s", p.Name, PierGoverning(r, p), Ratio(p.Ratio), Verdict(r.OK))
}

// designInputs writes the design inputs of a wall (the report's inputs).
func designInputs(w *Text, wall *geometry.Wall, r *design.Result) {
	sys := wall.Units
	rf := wall.Reinforcement
	if rf == nil || (!rf.Reinforced() && rf.Horizontal.Spacing == 0) {
		w.KV("Bars", "none (unreinforced)")
	} else {
		var parts []string
		if rf.Vertical.Spacing > 0 {
			parts = append(parts, "vertical "+rf.Vertical.String(sys))
		}
		if rf.Jamb.Count > 0 {
			parts = append(parts, "jamb "+rf.Jamb.String())
		}
		if rf.Horizontal.Spacing > 0 {
			parts = append(parts, "horizontal "+rf.Horizontal.String(sys))
		}
		parts = append(parts, "f_y = "+geometry.FormatStress(rf.Fy, sys))
		w.KV("Bars", strings.Join(parts, ", "))
		edge := "edge distance "
		if rf.Edge > 0 {
			edge += geometry.FormatLength(rf.Edge, sys)
		} else {
			edge += geometry.FormatLength(design.EdgeDefault(design.WallOf(wall), rf), sys) + " (default)"
		}
		if wall.Material.Kind != geometry.Concrete {
			edge += ", " + rf.Grout.String() + " grout"
		}
		w.KV("", edge)
	}
	d := design.SettingsOf(wall)
	rho := d.Rho
	if rho == 0 {
		rho = 1
	}
	line := fmt.Sprintf("%s, %s wall, %s load", d.Code, d.Class, d.Kind)
	if d.Kind == geometry.Seismic {
		line += fmt.Sprintf(", S_DS = %s g, ρ = %s", strconv.FormatFloat(d.SDS, 'g', 4, 64), strconv.FormatFloat(rho, 'g', 4, 64))
	}
	w.KV("Design", line)
}

// designSection writes the pier design: inputs, combinations, the rules
// applied (each once), a table per pier, the governing line and the caution.
func designSection(w *Text, wall *geometry.Wall, r *design.Result, err error) {
	if err != nil {
		w.Wrapped("  ", fmt.Sprintf("The piers could not be checked: %v.", err))
		w.Wrapped("  ", DesignCaution)
		return
	}
	u := UnitsFor(wall.Units)
	designInputs(w, wall, r)
	w.Blank()
	w.Line("  Load combinations (the lateral load toward +x and toward −x):")
	for i, c := range r.Combinations {
		w.Wrapped("    ", fmt.Sprintf("%d: %s = %s  (%s)", i+1, c.Name, c.Factors(r.Kind), c.Clause))
	}
	w.Blank()
	w.Line("  Rules applied:")
	for _, e := range r.Equations() {
		w.Wrapped("    ", e.Text+"  ["+e.Clause+"]")
	}
	w.Blank()
	w.Wrapped("  ", fmt.Sprintf("Per pier and section: P_u, V_u, φV_n in %s; M_u, φM_n in %s; compression positive; a ratio above 1.00 is marked !.", u.Force, u.Moment))
	for i := range r.Piers {
		p := &r.Piers[i]
		w.Blank()
		L := func(x float64) string { return geometry.FormatLength(geometry.Length(x), wall.Units) }
		w.Line(fmt.Sprintf("  %s  (x %s to %s, %s high; %d bars, %s %s; %s)", p.Name, L(p.Rect.X0), L(p.Rect.X1), L(p.Rect.H()),
			len(p.Bars), Number(u.AreaOf(barArea(p.Bars))), u.Area, p.Method))
		t := Table{Head: []string{"comb", "at", "P_u", "V_u", "M_u", "φV_n", "φM_n", "V ratio", "M ratio", "governs"},
			Right: []bool{false, false, true, true, true, true, true, true, true, false}}
		for k, c := range p.Checks {
			gov := c.Governs.String()
			if k == p.Governing && p.Requirement < 0 {
				gov += " ◀"
			}
			t.Add(CombinationLabel(r, c.Combination), c.Section.String(), f1(u.ForceOf(c.Axial)), f1(u.ForceOf(c.Shear)), f1(u.MomentOf(c.Moment)),
				f1(u.ForceOf(c.PhiShear)), f1(u.MomentOf(c.PhiMoment)), Ratio(c.ShearRatio), Ratio(c.FlexureRatio), gov)
		}
		t.Write(w, "  ")
		for _, q := range p.Require {
			w.Wrapped("    ", fmt.Sprintf("%s: ratio %s, %s  [%s]", q.Name, Ratio(q.Ratio), Verdict(q.OK), q.Clause))
		}
		w.Wrapped("    ", fmt.Sprintf("governs: %s; ratio %s, %s", PierGoverning(r, p), Ratio(p.Ratio), Verdict(p.OK)))
	}
	w.Blank()
	w.Wrapped("  Governing: ", GoverningLine(r))
	for _, n := range r.Notes {
		w.Wrapped("  note: ", n)
	}
	w.Wrapped("  ", DesignCaution)
}

func barArea(bars []design.Bar) float64 {
	a := 0.0
	for _, b := range bars {
		a += b.Area
	}
	return a
}

func f1(v float64) string {
	s := strconv.FormatFloat(v, 'f', 1, 64)
	if s == "-0.0" {
		s = "0.0"
	}
	return s
}
