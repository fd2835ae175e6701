package tui

import "pierwise/geometry"

// document is the wall being edited, with its file and its history. Every
// change goes through change, which keeps a snapshot for undo; undo and redo
// are unlimited. The wall is replaced, never mutated in place, so a snapshot
// handed to a background command stays valid.
type document struct {
	wall *geometry.Wall
	path string // "" until the wall has a file (the demo)

	version int // of wall; a new number for every change
	saved   int // version last saved (or opened)
	next    int

	undo, redo []snapshot

	// sum is the content hash of the file as read or last saved, to notice
	// a change made by another program before saving over it; nil when
	// unknown.
	sum *geometry.Sum

	// own is the layout the file itself names active, when the wall was
	// opened with another one active (a storey file's layout = "..."); save
	// writes own back so that the file's active key does not change.
	own *ownActive
}

// ownActive is the file's own active layout: by name, and by index for a
// layout renamed since.
type ownActive struct {
	name  string
	index int
}

// keepOwnActive makes save write the file's own active layout (by name)
// instead of the one being edited.
func (d *document) keepOwnActive(name string, index int) {
	d.own = &ownActive{name: name, index: index}
}

type snapshot struct {
	wall    *geometry.Wall
	version int
}

// newDocument starts the history of w. A wall opened from its file, and the
// demo, start clean: quitting without a change asks nothing.
func newDocument(w *geometry.Wall, path string) *document {
	return &document{wall: w, path: path, next: 1}
}

// dirty reports whether the wall differs from the file on disk.
func (d *document) dirty() bool { return d.version != d.saved }

// change applies f to a copy of the wall; when f succeeds the copy becomes
// the wall and the old one goes on the undo stack. f's error is returned
// unchanged and leaves everything as it was.
func (d *document) change(f func(w *geometry.Wall) error) error {
	w := d.wall.Clone()
	if err := f(w); err != nil {
		return err
	}
	d.undo = append(d.undo, snapshot{d.wall, d.version})
	d.redo = d.redo[:0]
	d.wall, d.version = w, d.next
	d.next++
	return nil
}

// amend is change without a new undo step: the result replaces the
// current wall, so a drag of the mouse is undone in one go.
func (d *document) amend(f func(w *geometry.Wall) error) error {
	w := d.wall.Clone()
	if err := f(w); err != nil {
		return err
	}
	d.redo = d.redo[:0]
	d.wall, d.version = w, d.next
	d.next++
	return nil
}

// view makes layout i the one shown, edited and solved. Viewing is not a
// change: a clean document stays clean, there is no undo step, and the file
// keeps the active layout it names (keepOwnActive), so that a bare
// pierwise solve FILE solves the same layout before and after.
func (d *document) view(i int) {
	if d.own == nil {
		d.keepOwnActive(d.wall.Layouts[d.wall.Active].Name, d.wall.Active)
	}
	clean := !d.dirty()
	w := d.wall.Clone()
	w.Active = i
	d.wall, d.version = w, d.next
	d.next++
	if clean {
		d.saved = d.version
	}
}

// undoChange and redoChange step through the history; they report whether
// there was anything to step to.
func (d *document) undoChange() bool { return d.travel(&d.undo, &d.redo) }

func (d *document) redoChange() bool { return d.travel(&d.redo, &d.undo) }

// travel makes the last state of from current and keeps the current one
// on to.
func (d *document) travel(from, to *[]snapshot) bool {
	if len(*from) == 0 {
		return false
	}
	s := (*from)[len(*from)-1]
	*from = (*from)[:len(*from)-1]
	*to = append(*to, snapshot{d.wall, d.version})
	d.wall, d.version = s.wall, s.version
	return true
}

// onDisk is the wall as it is written: the wall itself, or a copy with the
// file's own active layout (by name; by index when that layout was
// renamed; the edited one when it was deleted).
func (d *document) onDisk() *geometry.Wall {
	if d.own == nil {
		return d.wall
	}
	w := d.wall.Clone()
	switch k := w.LayoutIndex(d.own.name); {
	case k >= 0:
		w.Active = k
	case d.own.index < len(w.Layouts):
		w.Active = d.own.index
	}
	return w
}
