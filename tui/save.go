package tui

import (
	"errors"
	"fmt"
	"os"
	"path/filepath"
	"strings"
	"time"

	tea "github.com/charmbracelet/bubbletea"

	"pierwise/geometry"
	"pierwise/storey"
)

// saveRequest is one save of the document, run in a command (saveCmd) on a
// copy of the wall: nothing is written inside update. The flags record what
// the user has already agreed to.
type saveRequest struct {
	path    string
	wall    *geometry.Wall
	version int           // of the document when the save was asked
	known   *geometry.Sum // content of path as last read or saved; nil when path is not the document's file
	quit    bool          // quit after a successful save

	replace      bool // the user agreed to replace an existing file (save as)
	overwrite    bool // the user agreed to overwrite a file changed on disk
	dropComments bool // the user agreed to lose the file's comments
}

// savedMsg is the answer of saveCmd: saved (sum of what is on disk now),
// a question for the user (ask), or an error.
type savedMsg struct {
	req  saveRequest
	sum  geometry.Sum
	ask  question
	info string // for the question: what is at the path
	err  error
}

// saveCmd checks the path and writes the wall (geometry.Save: atomic,
// comments kept where practical). Before writing it stops with a question
// when the path holds a file the user has not agreed to replace, a file
// changed on disk since it was read (by content), or a file whose comments
// the save would drop. A storey file is never replaced by a wall
// (docs/method.md §11).
func saveCmd(req saveRequest) tea.Cmd {
	return func() tea.Msg { return save(req) }
}

func save(req saveRequest) savedMsg {
	out := savedMsg{req: req}
	_, exists, err := geometry.WriteTarget(req.path)
	if err != nil {
		out.err = err
		return out
	}
	if exists {
		old, err := geometry.ReadUserFile(req.path)
		if err != nil {
			out.err = err
			return out
		}
		if storey.IsStoreyFile(old) {
			out.err = fmt.Errorf("%s is a storey file; a wall is never written over it (S saves elsewhere)", geometry.Visible(req.path))
			return out
		}
		switch {
		case req.known == nil && !req.replace:
			out.ask, out.info = askReplace, describe(old)
			return out
		case req.known != nil && geometry.SumOf(old) != *req.known && !req.overwrite:
			out.ask = askChanged
			return out
		case !req.dropComments && commentsLost(old, req.wall):
			out.ask = askComments
			return out
		}
	}
	if err := geometry.Save(req.path, req.wall); err != nil {
		out.err = err
		return out
	}
	data, err := geometry.ReadUserFile(req.path)
	if err != nil {
		out.err = err
		return out
	}
	out.sum = geometry.SumOf(data)
	return out
}

// describe says in a few words what a file about to be replaced holds.
func describe(data []byte) string {
	w, err := geometry.Parse("", data)
	if err != nil {
		return "a file that is not a wall"
	}
	if n := len(w.Layouts); n > 1 {
		return fmt.Sprintf("a wall with %d layouts", n)
	}
	return "a wall"
}

// commentsLost reports whether writing w over old would drop a comment
// line of old: geometry.MarshalKeeping falls back to a plain file when old
// uses forms it does not follow (dotted keys, inline tables, multi-line
// strings).
func commentsLost(old []byte, w *geometry.Wall) bool {
	kept, err := geometry.MarshalKeeping(old, w)
	if err != nil {
		return false
	}
	have := map[string]bool{}
	for _, l := range strings.Split(string(kept), "\n") {
		have[strings.TrimSpace(l)] = true
	}
	for _, l := range strings.Split(string(old), "\n") {
		if t := strings.TrimSpace(l); strings.HasPrefix(t, "#") && !have[t] {
			return true
		}
	}
	return false
}

// saved applies a save's answer to the elevation screen.
func (e *elevation) saved(msg savedMsg) tea.Cmd {
	e.saving = false
	r := msg.req
	name := geometry.Visible(filepath.Base(r.path))
	switch {
	case msg.err != nil:
		e.refuse("not saved: %v", msg.err)
		return nil
	case msg.ask == askReplace:
		e.openChoice(newChoice(askReplace, fmt.Sprintf("%s exists (%s). Replace it?", name, msg.info),
			ans("y", "replace", "replace"), ans("n", "keep it", "cancel")), r)
		return nil
	case msg.ask == askChanged:
		e.openChoice(newChoice(askChanged, name+" changed on disk.",
			ans("r", "reload", "reload"), ans("o", "overwrite", "overwrite"), ans("S", "save as", "elsewhere")), r)
		return nil
	case msg.ask == askComments:
		e.openChoice(newChoice(askComments, "Saving drops the comments of "+name+" (dotted keys, inline tables or multi-line strings).",
			ans("y", "save anyway", "save"), ans("S", "save as", "elsewhere")), r)
		return nil
	}
	d := e.c.doc
	d.path, d.saved, d.sum = r.path, r.version, &msg.sum
	e.say("saved %s", geometry.Visible(r.path))
	if r.quit {
		return tea.Sequence(clearRecovery(r.path), tea.Quit)
	}
	return clearRecovery(r.path)
}

// requestSave starts a save of the document to path ("" for its file).
func (e *elevation) requestSave(path string, quit bool) tea.Cmd {
	d := e.c.doc
	if e.saving {
		e.refuse("a save is under way")
		return nil
	}
	req := saveRequest{path: path, wall: d.onDisk(), version: d.version, quit: quit}
	if path == "" || path == d.path {
		req.path, req.known = d.path, d.sum
		if d.sum == nil {
			req.replace = true // a file the editor made itself or could not hash
		}
	}
	if req.path == "" {
		e.openSaveAs(quit)
		return nil
	}
	e.saving = true
	e.say("saving %s...", geometry.Visible(filepath.Base(req.path)))
	return saveCmd(req)
}

// reloadedMsg is the wall read again from its file.
type reloadedMsg struct {
	wall *geometry.Wall
	sum  geometry.Sum
	err  error
}

func reloadCmd(path string) tea.Cmd {
	return func() tea.Msg {
		data, err := geometry.ReadUserFile(path)
		if err != nil {
			return reloadedMsg{err: err}
		}
		w, err := geometry.Parse(path, data)
		return reloadedMsg{wall: w, sum: geometry.SumOf(data), err: err}
	}
}

// reloaded makes the file's wall the document's, as a change: u brings the
// edits made here back.
func (e *elevation) reloaded(msg reloadedMsg) tea.Cmd {
	if msg.err != nil {
		e.refuse("not reloaded: %v", msg.err)
		return nil
	}
	d := e.c.doc
	_ = d.change(func(w *geometry.Wall) error { *w = *msg.wall; return nil })
	d.saved, d.sum = d.version, &msg.sum
	e.say("reloaded %s (u brings back the edits made here)", geometry.Visible(filepath.Base(d.path)))
	return e.afterEdit()
}

// answered applies the answer of a save question.
func (e *elevation) answered(msg chosenMsg) tea.Cmd {
	r := msg.req
	switch msg.what {
	case "replace":
		r.replace = true
	case "overwrite":
		r.overwrite = true
	case "save":
		r.dropComments = true
	case "reload":
		return reloadCmd(r.path)
	case "elsewhere":
		e.openSaveAs(r.quit)
		return nil
	case "cancel":
		e.say("not saved")
		return nil
	}
	e.saving = true
	return saveCmd(r)
}

// recoveryPath is where the unsaved wall of path is kept against a crash:
// beside it, "wall.toml" → "wall.recover.toml" (a wall file the editor
// opens as any other). The demo's goes in the working directory.
func recoveryPath(path string) string {
	if path == "" {
		return "pierwise-demo.recover.toml"
	}
	ext := filepath.Ext(path)
	return strings.TrimSuffix(path, ext) + ".recover" + orText(ext, ".toml")
}

// writeRecovery writes w to the recovery file of path (atomically; never
// over something that is not a regular file).
func writeRecovery(path string, w *geometry.Wall) error {
	data, err := geometry.Marshal(w)
	if err != nil {
		return err
	}
	return geometry.WriteFileAtomic(recoveryPath(path), data)
}

// recoveryMsg is the answer of a background recovery write.
type recoveryMsg struct{ err error }

// recoveryCmd keeps the unsaved wall in its recovery file, so that even a
// crash the program cannot catch (out of memory, a kill) loses nothing.
func recoveryCmd(path string, w *geometry.Wall) tea.Cmd {
	return func() tea.Msg { return recoveryMsg{writeRecovery(path, w)} }
}

// clearRecovery removes the recovery file once the wall is saved.
func clearRecovery(path string) tea.Cmd {
	return func() tea.Msg {
		err := os.Remove(recoveryPath(path))
		if errors.Is(err, os.ErrNotExist) {
			err = nil
		}
		return recoveryMsg{err}
	}
}

// recoveryNotice says at the start that a recovery file from an earlier
// session is waiting beside path, and how to open it.
func recoveryNotice(path string) string {
	p := recoveryPath(path)
	fi, err := os.Lstat(p)
	if err != nil || !fi.Mode().IsRegular() {
		return ""
	}
	return fmt.Sprintf("%s holds unsaved work from %s; pierwise edit opens it",
		geometry.Visible(filepath.Base(p)), fi.ModTime().Format("Jan 2 15:04"))
}

// recoveryDelay lets a burst of edits settle before the recovery copy is
// written.
const recoveryDelay = time.Second

type recoveryTickMsg struct{ version int }

// scheduleRecovery writes the recovery copy a moment after an edit of a
// wall that has a file (the demo's copy is written only on a crash).
func (e *elevation) scheduleRecovery() tea.Cmd {
	if e.c.doc.path == "" || e.c.tick == nil {
		return nil
	}
	v := e.c.doc.version
	return e.c.tick(recoveryDelay, func(time.Time) tea.Msg { return recoveryTickMsg{v} })
}

func (e *elevation) recoveryTick(msg recoveryTickMsg) tea.Cmd {
	d := e.c.doc
	switch {
	case msg.version != d.version || d.path == "":
		return nil // another edit came; its own tick writes
	case !d.dirty():
		return clearRecovery(d.path)
	}
	return recoveryCmd(d.path, d.onDisk())
}

// quoteVisible quotes a name from a file for the status line.
func quoteVisible(s string) string { return "\"" + geometry.Visible(s) + "\"" }
