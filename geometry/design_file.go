package geometry

import (
	"math"
	"slices"
	"strconv"
	"strings"
)

// Sane ranges of the design inputs (docs/method.md §8): outside them a value
// is a typing slip rather than a design.
var (
	FyMin  = 30 * KSI  // below Grade 40 with margin
	FyMax  = 100 * KSI // Grade 100 (ASTM A615), the highest either code admits
	SDSMax = 3.0       // g; mapped values in ASCE 7-22 stay well below
)

// validateDesign checks the design inputs against the wall they belong to
// (the settings' own checks are this one, so that every rule is in one
// place; docs/method.md §8.7).
func (w *Wall) validateDesign(l *ErrorList) {
	if w.barText != nil {
		for _, key := range []string{"reinforcement.vertical", "reinforcement.horizontal", "reinforcement.jamb"} {
			if msg := w.barText[key]; msg != "" {
				l.add(key, msg)
			}
		}
	}
	if w.Load.Kind != Seismic && w.Load.Kind != Wind {
		l.add("load.kind", `unknown load kind (use "seismic" or "wind")`)
	}
	d, r := w.Design, w.Reinforcement
	if d == nil {
		if r != nil {
			l.add("reinforcement", "reinforcement without a [design] table: add [design] so that the piers are checked, or remove [reinforcement]")
		}
		return
	}
	want, ok := CodeFor(w.Material.Kind)
	switch {
	case !ok:
		l.add("design.code", "a custom material has no design code; give the material as concrete-masonry, clay-masonry or concrete")
	case d.CodeGiven && d.Code != want:
		l.add("design.code", d.Code.String()+" does not fit the material ("+w.Material.Kind.String()+"); use "+want.String())
	}
	code := w.DesignCode()
	if d.Class < Ordinary || d.Class > Special {
		l.add("design.wall_class", `unknown wall class (use "ordinary", "intermediate" or "special")`)
	} else if code == ACI318 && d.Class == Intermediate {
		l.add("design.wall_class", `concrete shear walls are "ordinary" or "special"`)
	}
	if !(d.SDS >= 0 && d.SDS <= SDSMax) {
		l.add("design.sds", "S_DS must be between 0 and "+strconv.FormatFloat(SDSMax, 'g', -1, 64)+" g (is "+strconv.FormatFloat(d.SDS, 'g', 4, 64)+")")
	}
	if d.Rho != 0 && !(d.Rho >= 1.0 && d.Rho <= 1.3) {
		l.add("design.rho", "ρ must be 1.0 or 1.3 (ASCE 7-22 §12.3.4), or a value between (is "+strconv.FormatFloat(d.Rho, 'g', 4, 64)+")")
	}
	if d.Mortar < MortarMS || d.Mortar > MasonryCementN {
		l.add("design.mortar", "unknown mortar (use "+strings.Join(mortarNames, ", ")+")")
	}
	if r == nil {
		if code == ACI318 {
			l.add("design", "a concrete wall needs its [reinforcement] (plain concrete walls are not checked)")
		}
		return
	}
	sys := w.Units
	if r.Reinforced() || r.Horizontal.Spacing > 0 {
		if !(r.Fy >= FyMin && r.Fy <= FyMax) {
			msg := "f_y must be between 30 and 100 ksi (207 and 690 MPa)"
			if r.Fy == 0 {
				msg = "missing; add fy = " + map[System]string{US: `"60ksi"`, SI: `"420MPa"`}[sys] + " (the bars' yield strength)"
			} else {
				msg += "; is " + FormatStress(r.Fy, sys)
			}
			l.add("reinforcement.fy", msg)
		}
	}
	if code == ACI318 && !r.Reinforced() {
		l.add("reinforcement.vertical", "a concrete wall needs vertical bars (plain concrete walls are not checked)")
	}
	if r.Grout != FullGrout && r.Grout != PartialGrout {
		l.add("reinforcement.grout", `unknown grout (use "full" or "partial")`)
	} else if code == ACI318 && r.Grout == PartialGrout {
		l.add("reinforcement.grout", "grout applies to masonry only")
	}
	if !finite(float64(r.Edge)) || r.Edge < 0 {
		l.add("reinforcement.edge", "the edge distance must be a length of zero or more")
	} else if r.Edge > 0 && 2*r.Edge >= w.Length {
		l.add("reinforcement.edge", "the edge distance is half the wall or more ("+FormatLength(r.Edge, sys)+")")
	}
	if r.Layers < 0 || r.Layers > 2 {
		l.add("reinforcement.layers", "one or two curtains of bars")
	}
	if !finite(float64(r.FaceShell)) || r.FaceShell < 0 || (r.FaceShell > 0 && 2*r.FaceShell >= w.Thickness) {
		l.add("reinforcement.face_shell", "two face shells must be thinner than the wall")
	}
	for _, b := range []struct {
		key string
		s   BarSpacing
	}{{"reinforcement.vertical", r.Vertical}, {"reinforcement.horizontal", r.Horizontal}} {
		if b.s.Spacing != 0 && !(b.s.Spacing > b.s.Size.Diameter) {
			l.add(b.key, "the spacing must be more than the bar's diameter")
		}
	}
}

// barSpacingText writes bars at a spacing so that they read back exactly:
// in inches or millimetres when that is exact, else in the base unit.
func barSpacingText(b BarSpacing, sys System) string {
	s := b.String(sys)
	if back, err := ParseBarSpacing(s, sys); err == nil && back.Spacing == b.Spacing {
		return s
	}
	return b.Size.Name + "@" + exactLength(b.Spacing, sys)
}

// designSettings are the design inputs as entries of Settings: read,
// written, kept and validated as every other setting of the wall file. They
// are not in the wall form (the editor's pier design form edits them).
var designSettings = []Setting{
	{Key: "load.kind", Kind: KindChoice, Label: "load kind", Help: "seismic or wind", Noun: "load kind",
		Choices: []string{Seismic: "seismic", Wind: "wind"}, Default: Value{Text: "seismic"},
		Get:   func(w *Wall) Value { return Value{Text: w.Load.Kind.String()} },
		Set:   func(w *Wall, v Value) { w.Load.Kind, _ = ParseLoadKind(v.Text) },
		Check: func(*Setting, *Wall, *ErrorList) {}},

	{Key: "reinforcement.grout", Kind: KindChoice, Label: "grout", Noun: "grout", Choices: []string{FullGrout: "full", PartialGrout: "partial"},
		Get: func(w *Wall) Value {
			if w.Reinforcement == nil {
				return Value{}
			}
			return Value{Text: w.Reinforcement.Grout.String()}
		},
		Set:   func(w *Wall, v Value) { w.reinforcementFor(v).Grout, _ = ParseGrout(v.Text) },
		Check: noCheck},
	{Key: "reinforcement.fy", Kind: KindStress, Label: "f_y", Example: [2]string{`"60ksi"`, `"420MPa"`},
		Get: func(w *Wall) Value {
			if w.Reinforcement == nil {
				return Value{}
			}
			return Value{Num: float64(w.Reinforcement.Fy)}
		},
		Set: func(w *Wall, v Value) { w.reinforcementFor(v).Fy = Stress(v.Num) }, Check: noCheck},
	barSpacingSetting("reinforcement.vertical", "vertical bars", func(r *Reinforcement) *BarSpacing { return &r.Vertical }),
	{Key: "reinforcement.jamb", Kind: KindText, Label: "jamb bars",
		Get: func(w *Wall) Value {
			if w.Reinforcement == nil || w.Reinforcement.Jamb.Count == 0 {
				return Value{}
			}
			return Value{Text: w.Reinforcement.Jamb.String()}
		},
		Set: func(w *Wall, v Value) {
			if v.Text == "" {
				w.reinforcementFor(v).Jamb = BarCount{}
				w.badBars("reinforcement.jamb", nil)
				return
			}
			b, err := ParseBarCount(v.Text)
			w.reinforcementFor(v).Jamb = b
			w.badBars("reinforcement.jamb", err)
		},
		Check: noCheck},
	barSpacingSetting("reinforcement.horizontal", "horizontal bars", func(r *Reinforcement) *BarSpacing { return &r.Horizontal }),
	{Key: "reinforcement.edge", Kind: KindLength, Label: "edge distance", Example: [2]string{`"4in"`, `"100mm"`},
		Get: func(w *Wall) Value {
			if w.Reinforcement == nil {
				return Value{}
			}
			return Value{Num: float64(w.Reinforcement.Edge)}
		},
		Set: func(w *Wall, v Value) { w.reinforcementFor(v).Edge = Length(v.Num) }, Check: noCheck},
	{Key: "reinforcement.layers", Kind: KindNumber, Label: "curtains",
		Get: func(w *Wall) Value {
			if w.Reinforcement == nil {
				return Value{}
			}
			return Value{Num: float64(w.Reinforcement.Layers)}
		},
		Set: func(w *Wall, v Value) {
			n := -1 // not a whole number: validation says so
			if v.Num == math.Trunc(v.Num) && math.Abs(v.Num) < 100 {
				n = int(v.Num)
			}
			w.reinforcementFor(v).Layers = n
		},
		Check: noCheck},
	{Key: "reinforcement.face_shell", Kind: KindLength, Label: "face shell", Example: [2]string{`"1.25in"`, `"32mm"`},
		Get: func(w *Wall) Value {
			if w.Reinforcement == nil {
				return Value{}
			}
			return Value{Num: float64(w.Reinforcement.FaceShell)}
		},
		Set: func(w *Wall, v Value) { w.reinforcementFor(v).FaceShell = Length(v.Num) }, Check: noCheck},

	{Key: "design.code", Kind: KindChoice, Label: "design code", Noun: "code", Choices: []string{TMS402: "tms402-22", ACI318: "aci318-19"},
		Get: func(w *Wall) Value {
			if w.Design == nil || !w.Design.CodeGiven {
				return Value{}
			}
			return Value{Text: w.Design.Code.String()}
		},
		Set: func(w *Wall, v Value) {
			d := w.designFor(v)
			d.Code, d.CodeGiven = ParseCode(v.Text)
		},
		Check: noCheck},
	{Key: "design.wall_class", Kind: KindChoice, Label: "wall class", Noun: "wall class",
		Choices: []string{Ordinary: "ordinary", Intermediate: "intermediate", Special: "special"},
		Get: func(w *Wall) Value {
			if w.Design == nil {
				return Value{}
			}
			return Value{Text: w.Design.Class.String()}
		},
		Set: func(w *Wall, v Value) { w.designFor(v).Class, _ = ParseWallClass(v.Text) }, Check: noCheck},
	{Key: "design.sds", Kind: KindNumber, Label: "S_DS",
		Get: func(w *Wall) Value {
			if w.Design == nil {
				return Value{}
			}
			return Value{Num: w.Design.SDS}
		},
		Set: func(w *Wall, v Value) { w.designFor(v).SDS = v.Num }, Check: noCheck},
	{Key: "design.rho", Kind: KindNumber, Label: "rho",
		Get: func(w *Wall) Value {
			if w.Design == nil {
				return Value{}
			}
			return Value{Num: w.Design.Rho}
		},
		Set: func(w *Wall, v Value) { w.designFor(v).Rho = v.Num }, Check: noCheck},
	{Key: "design.mortar", Kind: KindChoice, Label: "mortar", Noun: "mortar", Choices: mortarNames,
		Get: func(w *Wall) Value {
			if w.Design == nil || w.Design.Mortar == MortarMS {
				return Value{}
			}
			return Value{Text: w.Design.Mortar.String()}
		},
		Set: func(w *Wall, v Value) { w.designFor(v).Mortar, _ = ParseMortar(v.Text) }, Check: noCheck},
}

// noCheck leaves a design setting's checks to validateDesign.
func noCheck(*Setting, *Wall, *ErrorList) {}

func barSpacingSetting(key, label string, field func(*Reinforcement) *BarSpacing) Setting {
	return Setting{Key: key, Kind: KindText, Label: label,
		Get: func(w *Wall) Value {
			if w.Reinforcement == nil || field(w.Reinforcement).Spacing == 0 {
				return Value{}
			}
			return Value{Text: barSpacingText(*field(w.Reinforcement), w.Units)}
		},
		Set: func(w *Wall, v Value) {
			if v.Text == "" {
				*field(w.reinforcementFor(v)) = BarSpacing{}
				w.badBars(key, nil)
				return
			}
			b, err := ParseBarSpacing(v.Text, w.Units)
			*field(w.reinforcementFor(v)) = b
			w.badBars(key, err)
		},
		Check: noCheck}
}

// reinforcement and design return the wall's tables, made when a key of
// theirs is read.
func (w *Wall) reinforcement() *Reinforcement {
	if w.Reinforcement == nil {
		w.Reinforcement = &Reinforcement{}
	}
	return w.Reinforcement
}

func (w *Wall) design() *Design {
	if w.Design == nil {
		w.Design = &Design{}
	}
	return w.Design
}

// reinforcementFor and designFor are the tables a setting's value goes
// into: a value that is no value (a default set on a new wall) makes no
// table and goes into a scrap one.
func (w *Wall) reinforcementFor(v Value) *Reinforcement {
	if w.Reinforcement == nil && noValue(v) {
		return &Reinforcement{}
	}
	return w.reinforcement()
}

func (w *Wall) designFor(v Value) *Design {
	if w.Design == nil && noValue(v) {
		return &Design{}
	}
	return w.design()
}

func noValue(v Value) bool { return v.Text == "" && v.Num == 0 && !v.Bool }

// badBars keeps why bars typed in a file could not be read, for
// validateDesign to report at their key (a setting's Set cannot fail).
func (w *Wall) badBars(key string, err error) {
	if err == nil {
		if w.barText != nil {
			delete(w.barText, key)
		}
		return
	}
	if w.barText == nil {
		w.barText = map[string]string{}
	}
	w.barText[key] = err.Error()
}

// designTablesGiven makes the design tables a file gives, even with none of
// their keys ([design] alone checks the piers with the defaults).
func designTablesGiven(w *Wall, given func(table string) bool) {
	if given("design") {
		w.design()
	}
	if given("reinforcement") {
		w.reinforcement()
	}
}

func init() {
	// load.kind joins [load] after the shear; the rest follow in order.
	i := slices.IndexFunc(Settings, func(s Setting) bool { return s.Key == "load.shear" })
	Settings = slices.Insert(Settings, i+1, designSettings[0])
	Settings = append(Settings, designSettings[1:]...)
}
