package tui

import (
	"strconv"

	"pierwise/geometry"
)

// The pier design form's fields, in order.
const (
	dfCheck = iota
	dfKind
	dfCode
	dfClass
	dfSDS
	dfRho
	dfGrout
	dfFy
	dfVertical
	dfJamb
	dfHorizontal
	dfEdge
)

// openDesignForm edits the wall's pier design inputs: whether its piers are
// checked ([design]), the load kind, the code, class, S_DS and ρ, and the
// bars ([reinforcement]); docs/method.md §8.7. Errors are placed on their
// fields by the wall's own validation, as the wall file reports them.
func (e *elevation) openDesignForm() {
	w := e.wall()
	sys := w.Units
	d := geometry.Design{}
	check := "no"
	if w.Design != nil {
		d, check = *w.Design, "yes"
	}
	r := geometry.Reinforcement{}
	if w.Reinforcement != nil {
		r = *w.Reinforcement
	}
	code := ""
	if d.CodeGiven {
		code = d.Code.String()
	}
	num := func(v float64) string {
		if v == 0 {
			return ""
		}
		return strconv.FormatFloat(v, 'g', -1, 64)
	}
	fy, edge, vert, hor, jamb := "", "", "", "", ""
	if r.Fy > 0 {
		fy = geometry.FormatStress(r.Fy, sys)
	}
	if r.Edge > 0 {
		edge = geometry.FormatLength(r.Edge, sys)
	}
	if r.Vertical.Spacing > 0 {
		vert = r.Vertical.String(sys)
	}
	if r.Horizontal.Spacing > 0 {
		hor = r.Horizontal.String(sys)
	}
	if r.Jamb.Count > 0 {
		jamb = r.Jamb.String()
	}
	specs := []fieldSpec{
		dfCheck:      {"check the piers", check, "yes or no: [design]"},
		dfKind:       {"load kind", w.Load.Kind.String(), "seismic or wind"},
		dfCode:       {"code", code, "blank: by material"},
		dfClass:      {"wall class", d.Class.String(), "ordinary/intermediate/special"},
		dfSDS:        {"S_DS (g)", num(d.SDS), "0 to 3"},
		dfRho:        {"rho", num(d.Rho), "1.0 to 1.3; blank: 1.0"},
		dfGrout:      {"grout", r.Grout.String(), "full or partial"},
		dfFy:         {"f_y", fy, "e.g. 60ksi, 420MPa"},
		dfVertical:   {"vertical bars", vert, "e.g. #5@48in; blank: none"},
		dfJamb:       {"jamb bars", jamb, "e.g. 2#5; blank: none"},
		dfHorizontal: {"horizontal bars", hor, "e.g. #4@48in; blank: none"},
		dfEdge:       {"edge distance", edge, "blank: the default"},
	}
	// Only the fields the user changed are read back, so an unchanged
	// value keeps its exact number (a stress shown rounded stays as typed
	// in the file).
	e.openForm(newForm("Pier design", specs), func(sub formSubmitted) formResult {
		vals, changed := sub.vals, sub.changed
		res := formResult{fields: map[int]string{}}
		n := w.Clone()
		if k, ok := geometry.ParseLoadKind(vals[dfKind]); ok {
			n.Load.Kind = k
		} else {
			res.fields[dfKind] = "seismic or wind"
		}
		switch vals[dfCheck] {
		case "no", "":
			n.Design, n.Reinforcement = nil, nil
			if len(res.fields) == 0 {
				_ = e.c.doc.change(func(w *geometry.Wall) error { *w = *n; return nil })
				e.say("pier design off")
			}
			return res
		case "yes":
		default:
			res.fields[dfCheck] = "yes or no"
			return res
		}
		nd := d
		nd.CodeGiven = vals[dfCode] != ""
		if changed[dfCode] && vals[dfCode] != "" {
			c, ok := geometry.ParseCode(vals[dfCode])
			if !ok {
				res.fields[dfCode] = "tms402-22 or aci318-19"
			}
			nd.Code, nd.CodeGiven = c, ok
		}
		if c, ok := geometry.ParseWallClass(vals[dfClass]); ok {
			nd.Class = c
		} else {
			res.fields[dfClass] = "ordinary, intermediate or special"
		}
		for j, dst := range map[int]*float64{dfSDS: &nd.SDS, dfRho: &nd.Rho} {
			if !changed[j] {
				continue
			}
			if vals[j] == "" {
				*dst = 0
				continue
			}
			f, err := strconv.ParseFloat(vals[j], 64)
			if err != nil {
				res.fields[j] = "a number"
				continue
			}
			*dst = f
		}
		nr := r
		if g, ok := geometry.ParseGrout(vals[dfGrout]); ok {
			nr.Grout = g
		} else {
			res.fields[dfGrout] = "full or partial"
		}
		if changed[dfFy] {
			nr.Fy = 0
			if vals[dfFy] != "" {
				s, err := geometry.ParseStress(vals[dfFy], n.Units)
				if err != nil {
					res.fields[dfFy] = shortReason(err)
				}
				nr.Fy = s
			}
		}
		for j, dst := range map[int]*geometry.BarSpacing{dfVertical: &nr.Vertical, dfHorizontal: &nr.Horizontal} {
			if !changed[j] {
				continue
			}
			*dst = geometry.BarSpacing{}
			if vals[j] == "" {
				continue
			}
			b, err := geometry.ParseBarSpacing(vals[j], n.Units)
			if err != nil {
				res.fields[j] = shortReason(err)
				continue
			}
			*dst = b
		}
		if changed[dfJamb] {
			nr.Jamb = geometry.BarCount{}
		}
		if changed[dfJamb] && vals[dfJamb] != "" {
			b, err := geometry.ParseBarCount(vals[dfJamb])
			if err != nil {
				res.fields[dfJamb] = shortReason(err)
			}
			nr.Jamb = b
		}
		if changed[dfEdge] {
			nr.Edge = 0
		}
		if changed[dfEdge] && vals[dfEdge] != "" {
			l, err := geometry.ParseLength(vals[dfEdge], n.Units)
			if err != nil {
				res.fields[dfEdge] = shortReason(err)
			}
			nr.Edge = l
		}
		if len(res.fields) > 0 {
			return res
		}
		n.Design, n.Reinforcement = &nd, &nr
		if err := n.Validate(); err != nil {
			placeErrors(err, map[string]int{
				"load.kind": dfKind, "design": dfCheck, "design.code": dfCode, "design.wall_class": dfClass,
				"design.sds": dfSDS, "design.rho": dfRho, "reinforcement": dfCheck, "reinforcement.grout": dfGrout,
				"reinforcement.fy": dfFy, "reinforcement.vertical": dfVertical, "reinforcement.jamb": dfJamb,
				"reinforcement.horizontal": dfHorizontal, "reinforcement.edge": dfEdge,
			}, &res)
			return res
		}
		_ = e.c.doc.change(func(w *geometry.Wall) error { *w = *n; return nil })
		e.say("pier design updated")
		return res
	})
}
