package tui

import (
	"errors"
	"fmt"
	"path/filepath"
	"strconv"
	"strings"

	tea "github.com/charmbracelet/bubbletea"

	"pierwise/geometry"
)

func (e *elevation) openForm(f *form) {
	f.setWidth(e.width)
	e.form, e.mode = f, modeForm
}

// openOpeningForm edits the selected opening's name, position and size.
func (e *elevation) openOpeningForm() {
	w := e.wall()
	if e.sel < 0 || e.sel >= len(w.Openings()) {
		e.refuse("no opening selected: d adds a door, w a window")
		return
	}
	i := e.sel
	o := w.Openings()[i]
	sys := w.Units
	fl := func(l geometry.Length) string { return geometry.FormatLength(l, sys) }
	hint := "e.g. 4ft, 7'-4\", 48in"
	if sys == geometry.SI {
		hint = "e.g. 1.2m, 900mm"
	}
	specs := []fieldSpec{
		{"name", o.Name, "unique in the layout"},
		{"x (from left end)", fl(o.X), hint},
		{"sill (from base)", fl(o.Sill), "0 for a door"},
		{"width", fl(o.Width), hint},
		{"height", fl(o.Height), hint},
	}
	e.openForm(newForm("Opening "+o.Name, specs, func(vals []string, changed []bool) formResult {
		r := formResult{fields: map[int]string{}}
		n := o
		n.Name = vals[0]
		if n.Name == "" {
			r.fields[0] = errNoName.Error()
		}
		for j, dst := range []*geometry.Length{&n.X, &n.Sill, &n.Width, &n.Height} {
			if !changed[j+1] {
				continue // keep the exact value, not its rounded display
			}
			l, err := geometry.ParseLength(vals[j+1], sys)
			if err != nil {
				r.fields[j+1] = shortReason(err)
				continue
			}
			*dst = l
		}
		if len(r.fields) > 0 {
			return r
		}
		for j, p := range w.Openings() {
			if j != i && p.Name == n.Name {
				r.fields[0] = "another opening is called " + n.Name
				return r
			}
		}
		err := e.c.doc.change(func(w *geometry.Wall) error {
			if err := w.CheckOpening(i, n); err != nil {
				return err
			}
			w.Layouts[w.Active].Openings[i] = n
			return nil
		})
		if err != nil {
			placeErrors(err, map[string]int{"name": 0, "x": 1, "sill": 2, "width": 3, "height": 4}, &r)
			return r
		}
		e.say("%s updated", n.Name)
		return r
	}))
}

// wallFields are the fields of the wall form, in order.
const (
	wfTitle = iota
	wfUnits
	wfLength
	wfHeight
	wfThickness
	wfSupport
	wfMaterial
	wfStrength
	wfModulus
	wfShear
	wfDrift
	wfCd
	wfIe
	wfKf
	wfKv
	wfMesh
	wfElement
)

// openWallForm edits the wall's own values.
func (e *elevation) openWallForm() {
	w := e.wall()
	sys := w.Units
	fl := func(l geometry.Length) string { return geometry.FormatLength(l, sys) }
	drift := ""
	switch {
	case w.Drift.Preset != "":
		drift = w.Drift.Preset
	case w.Drift.Limit > 0:
		drift = strconv.FormatFloat(w.Drift.Limit, 'g', -1, 64)
	}
	modulus := ""
	if w.Material.Modulus > 0 {
		modulus = geometry.FormatStress(w.Material.Modulus, sys)
	}
	strength := ""
	if w.Material.Strength > 0 {
		strength = geometry.FormatStress(w.Material.Strength, sys)
	}
	shear := ""
	if w.Load.Shear > 0 {
		shear = geometry.FormatForce(w.Load.Shear, sys)
	}
	cd, ie := "", ""
	if w.Drift.Cd > 0 {
		cd = strconv.FormatFloat(w.Drift.Cd, 'g', -1, 64)
	}
	if w.Drift.Ie > 0 {
		ie = strconv.FormatFloat(w.Drift.Ie, 'g', -1, 64)
	}
	mesh := ""
	if w.Check.Mesh > 0 {
		mesh = fl(w.Check.Mesh)
	}
	presets := make([]string, len(geometry.DriftPresets))
	for i, p := range geometry.DriftPresets {
		presets[i] = p.Name
	}
	specs := []fieldSpec{
		wfTitle:     {"title", w.Title, ""},
		wfUnits:     {"units", sys.String(), "us or si"},
		wfLength:    {"length", fl(w.Length), ""},
		wfHeight:    {"height", fl(w.Height), ""},
		wfThickness: {"thickness", fl(w.Thickness), ""},
		wfSupport:   {"support", w.Support.String(), "cantilever or fixed"},
		wfMaterial:  {"material", w.Material.Kind.String(), "concrete-masonry, clay-masonry, concrete, custom"},
		wfStrength:  {"strength f'm / f'c", strength, "e.g. 2000psi, 13.8MPa"},
		wfModulus:   {"modulus E", modulus, "blank: from the strength"},
		wfShear:     {"shear V at top", shear, "blank: no load"},
		wfDrift:     {"drift limit", drift, "a fraction (0.01) or " + strings.Join(presets[:2], ", ") + ", ..."},
		wfCd:        {"Cd", cd, "deflection amplification"},
		wfIe:        {"Ie", ie, "importance factor"},
		wfKf:        {"stiffness flexure", modifier(w.Stiffness.Flexure), "x I_g; e.g. 0.35 cracked (ACI 318-14 6.6.3.1.1)"},
		wfKv:        {"stiffness shear", modifier(w.Stiffness.Shear), "x shear area; 1 = gross"},
		wfMesh:      {"FE mesh size", mesh, "blank: the default size"},
		wfElement:   {"FE element", w.Check.Element, "blank: default (qm6), or q4"},
	}
	e.openForm(newForm("Wall", specs, func(vals []string, changed []bool) formResult {
		r := formResult{fields: map[int]string{}}
		n := w.Clone()
		n.Title = vals[wfTitle]
		if s, ok := geometry.ParseSystem(vals[wfUnits]); ok {
			n.Units = s
		} else {
			r.fields[wfUnits] = "us or si"
		}
		for j, dst := range map[int]*geometry.Length{wfLength: &n.Length, wfHeight: &n.Height, wfThickness: &n.Thickness} {
			if !changed[j] {
				continue
			}
			l, err := geometry.ParseLength(vals[j], n.Units)
			if err != nil {
				r.fields[j] = shortReason(err)
				continue
			}
			*dst = l
		}
		if s, ok := geometry.ParseSupport(vals[wfSupport]); ok {
			n.Support = s
		} else {
			r.fields[wfSupport] = "cantilever or fixed"
		}
		if k, ok := geometry.ParseMaterialKind(vals[wfMaterial]); ok {
			n.Material.Kind = k
		} else {
			r.fields[wfMaterial] = "concrete-masonry, clay-masonry, concrete or custom"
		}
		stress := func(j int, dst *geometry.Stress) {
			if !changed[j] {
				return
			}
			if vals[j] == "" {
				*dst = 0
				return
			}
			s, err := geometry.ParseStress(vals[j], n.Units)
			if err != nil {
				r.fields[j] = shortReason(err)
				return
			}
			*dst = s
		}
		stress(wfStrength, &n.Material.Strength)
		stress(wfModulus, &n.Material.Modulus)
		if changed[wfShear] {
			if vals[wfShear] == "" {
				n.Load.Shear = 0
			} else if f, err := geometry.ParseForce(vals[wfShear], n.Units); err != nil {
				r.fields[wfShear] = shortReason(err)
			} else {
				n.Load.Shear = f
			}
		}
		if changed[wfDrift] {
			v := vals[wfDrift]
			switch p, ok := geometry.FindDriftPreset(v); {
			case v == "":
				n.Drift.Preset, n.Drift.Limit = "", 0
			case ok:
				n.Drift.Preset, n.Drift.Limit = p.Name, p.Limit
			default:
				f, err := strconv.ParseFloat(strings.TrimSuffix(v, "h"), 64)
				if err != nil || !(f > 0 && f < 1) {
					r.fields[wfDrift] = "a fraction of the height such as 0.01, or a preset name"
				} else {
					n.Drift.Preset, n.Drift.Limit = "", f
				}
			}
		}
		for j, dst := range map[int]*float64{wfCd: &n.Drift.Cd, wfIe: &n.Drift.Ie} {
			if !changed[j] {
				continue
			}
			if vals[j] == "" {
				*dst = 0 // the default, 1
			} else if f, err := strconv.ParseFloat(vals[j], 64); err != nil || !(f > 0) {
				r.fields[j] = "a positive number"
			} else {
				*dst = f
			}
		}
		for j, dst := range map[int]*float64{wfKf: &n.Stiffness.Flexure, wfKv: &n.Stiffness.Shear} {
			if !changed[j] {
				continue
			}
			if vals[j] == "" {
				*dst = 1
			} else if f, err := strconv.ParseFloat(vals[j], 64); err != nil {
				r.fields[j] = "a number such as 0.35 or 1"
			} else {
				*dst = f
			}
		}
		if changed[wfMesh] {
			if vals[wfMesh] == "" {
				n.Check.Mesh = 0
			} else if l, err := geometry.ParseLength(vals[wfMesh], n.Units); err != nil {
				r.fields[wfMesh] = shortReason(err)
			} else {
				n.Check.Mesh = l
			}
		}
		n.Check.Element = vals[wfElement]
		if len(r.fields) > 0 {
			return r
		}
		if err := n.Validate(); err != nil {
			placeErrors(err, map[string]int{
				"title": wfTitle, "units": wfUnits, "length": wfLength, "height": wfHeight, "thickness": wfThickness,
				"support": wfSupport, "material.kind": wfMaterial, "material.strength": wfStrength,
				"material.modulus": wfModulus, "load.shear": wfShear, "drift.limit": wfDrift, "drift.cd": wfCd,
				"stiffness.flexure": wfKf, "stiffness.shear": wfKv, "check.mesh": wfMesh, "check.element": wfElement,
			}, &r)
			return r
		}
		_ = e.c.doc.change(func(w *geometry.Wall) error { *w = *n; return nil })
		e.step = min(e.step, len(steps(n.Units))-1)
		if n.Units != sys {
			e.step = defaultStep(n.Units)
		}
		e.say("wall updated")
		return r
	}))
}

// openSaveAs asks for a file name and saves; quit closes the program after
// a successful save.
func (e *elevation) openSaveAs(quit bool) {
	name := e.c.doc.path
	if name == "" {
		name = "wall.toml"
	}
	e.openForm(newForm("Save as", []fieldSpec{{"file", name, "a .toml wall file"}}, func(vals []string, _ []bool) formResult {
		r := formResult{fields: map[int]string{}}
		if vals[0] == "" {
			r.fields[0] = "a file name is required"
			return r
		}
		p := vals[0]
		if filepath.Ext(p) == "" {
			p += ".toml"
		}
		r.cmd = func() tea.Msg { return saveAsMsg{p, quit} } // the parent saves, in a command
		return r
	}))
}

// openRenameForm renames the active layout.
func (e *elevation) openRenameForm() {
	w := e.wall()
	cur := w.Layouts[w.Active].Name
	e.openForm(newForm("Rename layout", []fieldSpec{{"name", cur, "unique among the wall's layouts"}}, func(vals []string, _ []bool) formResult {
		r := formResult{fields: map[int]string{}}
		name := vals[0]
		if name == "" {
			r.fields[0] = errNoName.Error()
			return r
		}
		for i, l := range w.Layouts {
			if i != w.Active && l.Name == name {
				r.fields[0] = fmt.Sprintf("layout %q exists already", name)
				return r
			}
		}
		if name != cur {
			_ = e.c.doc.change(func(w *geometry.Wall) error { w.Layouts[w.Active].Name = name; return nil })
			e.say("layout renamed to %q", name)
		}
		return r
	}))
}

// placeErrors puts each validation error on the form field its key names;
// the others are shown under the form.
func placeErrors(err error, fields map[string]int, r *formResult) {
	var list geometry.ErrorList
	if !errors.As(err, &list) {
		r.err = err.Error()
		return
	}
	var rest []string
	for _, e := range list {
		if i, ok := fields[e.Key]; ok {
			if r.fields[i] == "" {
				r.fields[i] = e.Msg
			}
			continue
		}
		rest = append(rest, e.Error())
	}
	r.err = strings.Join(rest, "; ")
}

// modifier shows a stiffness modifier; zero means the default, 1.
func modifier(v float64) string {
	if v == 0 {
		v = 1
	}
	return strconv.FormatFloat(v, 'g', -1, 64)
}
