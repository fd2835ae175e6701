package tui

import (
	"errors"
	"fmt"
	"io/fs"

	tea "github.com/charmbracelet/bubbletea"

	"pierwise/geometry"
)

// Options say what the editor opens.
type Options struct {
	Path    string // the wall's file; "" for a wall without one (the demo)
	Message string // shown in the status line at the start
	Content []byte // the file's bytes as read, to notice a change by another program before saving
	Version string // the program's version, printed in the reports it writes

	Program []tea.ProgramOption // extra bubbletea options (tests: input, output)
}

// Edit runs the editor on w until the user quits.
//
// On a crash (a panic anywhere in the editor) bubbletea restores the
// terminal; Edit then writes the unsaved wall to its recovery file beside
// the wall file (recoveryPath) and says where. While editing, the recovery
// file is kept up to date a second after each edit, so even a crash the
// program cannot catch (out of memory, a kill) loses nothing; a save or a
// deliberate quit without saving removes it.
func Edit(w *geometry.Wall, opt Options) error {
	m := newModel(w, opt)
	opts := append([]tea.ProgramOption{tea.WithAltScreen(), tea.WithMouseCellMotion()}, opt.Program...)
	_, err := tea.NewProgram(m, opts...).Run()
	if err != nil && errors.Is(err, tea.ErrProgramPanic) {
		return crashed(err, m.c.doc)
	}
	return err
}

// crashed writes the unsaved wall of a crashed editor to its recovery file.
func crashed(err error, d *document) error {
	if d == nil || !d.dirty() {
		return fmt.Errorf("the editor crashed (%w); there were no unsaved changes", err)
	}
	if werr := writeRecovery(d.path, d.onDisk()); werr != nil {
		return fmt.Errorf("the editor crashed (%w) and the unsaved wall could not be kept: %v", err, werr)
	}
	return fmt.Errorf("the editor crashed (%w); the unsaved wall is in %s", err, geometry.Visible(recoveryPath(d.path)))
}

// newModel builds the root model with the elevation screen on w.
func newModel(w *geometry.Wall, opt Options) *root {
	d := newDocument(w, opt.Path)
	if opt.Content != nil {
		sum := geometry.SumOf(opt.Content)
		d.sum = &sum
	}
	c := newCommon(d, nil)
	c.version = opt.Version
	e := newElevation(c)
	if opt.Message != "" {
		e.say("%s", opt.Message)
	}
	return newRoot(c, e)
}

// EditFile opens the wall file at path in the editor; a missing file is
// created first with NewWall. opt.Path, opt.Message and opt.Content are set
// here.
func EditFile(path string, opt Options) error {
	w, data, msg, err := openFile(path)
	if err != nil {
		return err
	}
	if n := recoveryNotice(path); n != "" {
		msg = n
	}
	opt.Path, opt.Message, opt.Content = path, msg, data
	return Edit(w, opt)
}

// openFile reads the wall at path (geometry.ReadUserFile: a regular file of
// bounded size), or writes a new plain wall there when there is no file;
// msg says when it did. data is what the file holds.
func openFile(path string) (w *geometry.Wall, data []byte, msg string, err error) {
	data, err = geometry.ReadUserFile(path)
	switch {
	case errors.Is(err, fs.ErrNotExist):
		w = NewWall(geometry.US)
		if err := geometry.Save(path, w); err != nil {
			return nil, nil, "", err
		}
		data, err = geometry.ReadUserFile(path)
		if err != nil {
			return nil, nil, "", err
		}
		return w, data, fmt.Sprintf("created %s with a plain wall: w adds a window, d a door, E edits the wall", geometry.Visible(path)), nil
	case err != nil:
		return nil, nil, "", err
	}
	w, err = geometry.Parse(path, data)
	if err != nil {
		return nil, nil, "", err
	}
	return w, data, "", nil
}

// NewWall is the wall a new file starts with: a plain 24 ft × 12 ft
// (7.2 m × 3.6 m) cantilever of 8 in (200 mm) concrete masonry, f'm
// 2000 psi (13.8 MPa), no openings and no load, drift limit of masonry
// cantilever shear walls.
func NewWall(sys geometry.System) *geometry.Wall {
	w := &geometry.Wall{
		Title:     "New wall",
		Units:     sys,
		Length:    24 * geometry.Foot,
		Height:    12 * geometry.Foot,
		Thickness: 7.625 * geometry.Inch,
		Support:   geometry.Cantilever,
		Material:  geometry.Material{Kind: geometry.ConcreteMasonry, Strength: 2000 * geometry.PSI},
		Stiffness: geometry.Stiffness{Flexure: 1, Shear: 1},
		Layouts:   []geometry.Layout{{Name: "main"}},
	}
	if sys == geometry.SI {
		w.Length, w.Height, w.Thickness = 7.2, 3.6, 190*geometry.Millimetre
		w.Material.Strength = 13.8 * geometry.Megapascal
	}
	if p, ok := geometry.FindDriftPreset("masonry-cantilever"); ok {
		w.Drift.Preset, w.Drift.Limit = p.Name, p.Limit
	}
	return w
}
