package tui

import (
	"errors"
	"fmt"
	"path/filepath"
	"sort"
	"strings"

	tea "github.com/charmbracelet/bubbletea"

	"pierwise/geometry"
)

// openForm shows f; apply answers its submissions: an empty formResult
// closes the form, errors go back to it.
func (e *elevation) openForm(f *form, apply func(formSubmitted) formResult) {
	f.setWidth(e.width)
	e.form, e.formApply, e.mode = f, apply, modeForm
}

// formEvent applies what the open form answered; done reports that the
// form closed.
func (e *elevation) formEvent(ev tea.Msg) (done bool, cmd tea.Cmd) {
	switch ev := ev.(type) {
	case formCancelled:
		return true, nil
	case formSubmitted:
		r := e.formApply(ev)
		if r.ok() {
			return true, r.cmd
		}
		e.form.showErrors(r)
	}
	return false, nil
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
	e.openForm(newForm("Opening "+o.Name, specs), func(sub formSubmitted) formResult {
		vals, changed := sub.vals, sub.changed
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
	})
}

// wallFormSettings are the settings the wall form shows, in its order
// (geometry.Setting.Form).
func wallFormSettings() []*geometry.Setting {
	var list []*geometry.Setting
	for i := range geometry.Settings {
		if s := &geometry.Settings[i]; s.Form > 0 {
			list = append(list, s)
		}
	}
	sort.SliceStable(list, func(i, j int) bool { return list[i].Form < list[j].Form })
	return list
}

// openWallForm edits the wall's own settings, one field per setting that
// shows in the form.
func (e *elevation) openWallForm() {
	w := e.wall()
	sys := w.Units
	settings := wallFormSettings()
	specs := make([]fieldSpec, len(settings))
	for i, s := range settings {
		specs[i] = fieldSpec{s.Label, s.Show(w), s.Help}
	}
	e.openForm(newForm("Wall", specs), func(sub formSubmitted) formResult {
		n, r := applyWallForm(w, settings, sub)
		if !r.ok() {
			return r
		}
		_ = e.c.doc.change(func(w *geometry.Wall) error { *w = *n; return nil })
		e.step = min(e.step, len(steps(n.Units))-1)
		if n.Units != sys {
			e.step = defaultStep(n.Units)
		}
		e.say("wall updated")
		return r
	})
}

// applyWallForm reads the wall form's fields into a copy of w. Settings are
// read in the file's order, so that lengths are read in the units the form
// now names; an unchanged field keeps its exact value, not its rounded
// display. The wall's own rules put their messages on the fields they are
// about.
func applyWallForm(w *geometry.Wall, settings []*geometry.Setting, sub formSubmitted) (*geometry.Wall, formResult) {
	r := formResult{fields: map[int]string{}}
	n := w.Clone()
	field := map[string]int{}
	for i, s := range settings {
		field[s.Key] = i
	}
	for k := range geometry.Settings {
		s := &geometry.Settings[k]
		i, shown := field[s.Key]
		if !shown || !sub.changed[i] {
			continue
		}
		v, msg := s.Read(sub.vals[i], n.Units)
		if msg != "" {
			r.fields[i] = msg
			continue
		}
		s.Set(n, v)
	}
	if len(r.fields) > 0 {
		return nil, r
	}
	if err := n.Validate(); err != nil {
		placeErrors(err, field, &r)
		return nil, r
	}
	return n, r
}

// openSaveAs asks for a file name and saves; quit closes the program after
// a successful save.
func (e *elevation) openSaveAs(quit bool) {
	name := e.c.doc.path
	if name == "" {
		name = "wall.toml"
	}
	e.openForm(newForm("Save as", []fieldSpec{{"file", name, "a .toml wall file"}}), func(sub formSubmitted) formResult {
		vals := sub.vals
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
	})
}

// openRenameForm renames the active layout.
func (e *elevation) openRenameForm() {
	w := e.wall()
	cur := w.Layouts[w.Active].Name
	e.openForm(newForm("Rename layout", []fieldSpec{{"name", cur, "unique among the wall's layouts"}}), func(sub formSubmitted) formResult {
		vals := sub.vals
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
	})
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
