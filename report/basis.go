package report

import (
	"fmt"
	"math"

	"pierwise/basis"
	"pierwise/geometry"
	"pierwise/pier/fe"
	"pierwise/sketch"
)

// basisLine says which basis the report's numbers come from.
func basisLine(b *basis.Result) string {
	if b == nil || !b.IsFE() {
		return "classic method (docs/method.md §5)"
	}
	return "finite-element model (docs/method.md §5)"
}

// wallFE writes the report of a wall on the finite-element basis: the
// model's rigidity, deflection, drift, shares and section forces, with the
// classic rigidity beside as the check.
func wallFE(w *Text, in Input) error {
	wall, b := in.Wall, in.Basis
	u := UnitsFor(wall.Units)
	view := b.View()

	w.Section("1. Inputs")
	inputs(w, wall, b.Classic)

	w.Section("2. Elevation (to scale; shares of the wall shear per leaf pier, finite-element model)")
	w.Lines(sketch.Elevation(wall, view, 72, 22).String(), "  ")

	w.Section("3. Finite-element model (the basis)")
	if err := b.Err(); err != nil {
		w.Wrapped("  ", fmt.Sprintf("The finite-element model has no answer for this layout: %v.", b.FEErr))
		if b.Classic != nil {
			w.Wrapped("  ", fmt.Sprintf("The classic method would give a relative rigidity of %s E·t; run the report on the classic basis (--basis classic) for its numbers.", Sig(b.Classic.Rigidity)))
		}
		w.Section("4. Warnings")
		w.Close(nil)
		return w.Err()
	}
	feSection(w, b.FE, b.Classic, wall)
	for _, n := range b.FE.Notes {
		w.Wrapped("  Note: ", n)
	}

	n := 4
	if b.Classic != nil {
		w.Section(fmt.Sprintf("%d. Piers (finite-element model)", n))
		piersFE(w, b, u)
		n++
	}

	w.Section(fmt.Sprintf("%d. Results", n))
	w.KV("Δ relative", Sig(b.Deflection())+" /(E·t)")
	w.KV("R relative", Sig(b.Rigidity())+" E·t")
	inUnits(w, wall, u, b.RigidityAbs(), b.HasLoad(), b.DeflectionAbs(), b.Drift())
	if wall.Load.Shear > 0 {
		arm := "V·h"
		if wall.Support == geometry.Fixed {
			arm = "V·h/2, the top held against rotation"
		}
		w.KV("Overturning", fmt.Sprintf("M = %s %s at the base (%s)", Sig(u.MomentOf(b.Overturning())), u.Moment, arm))
	}
	n++

	w.Section(fmt.Sprintf("%d. Check: the classic method", n))
	if c, ok := b.Check(); ok {
		w.KV("R relative", Sig(c.Rigidity)+" E·t (classic method)")
		if c.RigidityAbs > 0 {
			w.KV("Rigidity", fmt.Sprintf("R = %s %s (classic method)", Sig(u.RigidityOf(c.RigidityAbs)), u.Rigidity))
		}
		w.KV("Difference", "the classic rigidity is "+ClassicVersusFE(c.Difference)+" the finite-element rigidity")
	} else {
		w.Wrapped("  ", fmt.Sprintf("The classic method cannot be applied to this layout: %v. Its decomposition names the piers, so none are reported.", in.Err))
	}
	n++

	if in.Design != nil || in.DesignErr != nil {
		w.Section(fmt.Sprintf("%d. Pier design (finite-element pier forces)", n))
		designSection(w, in.Wall, in.Design, in.DesignErr)
		n++
	}

	w.Section(fmt.Sprintf("%d. Warnings", n))
	warns := append([]string(nil), b.Warnings()...)
	if c, ok := b.Check(); ok && math.Abs(c.Difference) > fe.WarnDifference {
		warns = append(warns, fmt.Sprintf("The classic method's rigidity differs from the finite-element model's by %+.0f %% (more than ±%.0f %%): the numbers of this report are the model's; a distribution on classic rigidities would differ.", 100*c.Difference, 100*fe.WarnDifference))
	}
	w.Close(warns)
	return w.Err()
}

// piersFE writes the pier table on the fe basis: geometry, the model's
// share beside the classic share, V and M under the wall shear, then the
// section forces by load case.
func piersFE(w *Text, b *basis.Result, u Units) {
	wall := b.Wall
	L := func(x float64) string { return geometry.FormatLength(geometry.Length(x), wall.Units) }
	loaded := wall.Load.Shear > 0
	t := Table{Head: []string{"pier", "h", "L", "h/L", "support", "share", "classic"}, Right: []bool{false, true, true, true, false, true, true}}
	if loaded {
		t.Head = append(t.Head, "V "+u.Force, "M "+u.Moment)
		t.Right = append(t.Right, true, true)
	}
	var nested bool
	for _, p := range b.Piers() {
		name := pierLabel(p.Name, p.Cut, p.Leaf)
		nested = nested || (!p.Leaf && !p.Cut)
		row := []string{name, L(p.H()), L(p.L()), fmt.Sprintf("%.2f", p.Ratio()), p.Support.String(), SigPercent(p.Share), SigPercent(p.Classic.Share)}
		if loaded && !p.Cut {
			row = append(row, Sig(u.ForceOf(p.Shear)), Sig(u.MomentOf(p.Moment)))
		} else if loaded {
			row = append(row, "-", "-")
		}
		t.Add(row...)
	}
	t.Write(w, "  ")
	if nested {
		w.Wrapped("  * ", "pier with openings of its own; its share and forces are those of the whole pier, which the piers inside it share.")
	}
	w.Wrapped("  ", "Shares and forces are the resultants of the model's nodal forces along each pier's sections (docs/method.md §4): V at mid-height, M the larger of the bottom and top moments. The piers are those of the classic decomposition.")
	w.Blank()
	u = sectionForces(w, b.View(), wall)
	w.Wrapped("  ", fmt.Sprintf("Forces in %s and %s, each the resultant of the model's nodal forces along the section. Dead: the dead line load along the top of the wall and the wall's own weight; live: the live line load; each a load case of the same model (docs/method.md §4).", u.Force, u.Moment))
}
