package tui

import "github.com/charmbracelet/bubbles/key"

// KeyMap holds the keys of the elevation screen. It implements
// help.KeyMap: ShortHelp is the one-line hint, FullHelp the ? page.
type KeyMap struct {
	Next, Prev                         key.Binding // select an opening
	Left, Right, Up, Down              key.Binding // move it by the step
	Narrower, Wider, Taller, Shorter   key.Binding // resize it by the step
	AddDoor, AddWindow, Delete, Copy   key.Binding
	Step                               key.Binding // cycle the step
	EditOpening, EditWall              key.Binding // the forms
	Undo, Redo                         key.Binding
	Save, SaveAs                       key.Binding
	NextLayout, PrevLayout             key.Binding
	NewLayout, RenameLayout, DelLayout key.Binding
	FE                                 key.Binding // the finite-element check on/off
	Basis                              key.Binding // the basis: classic method or finite-element model
	Snapshot                           key.Binding // write a text report next to the file
	Warnings                           key.Binding // every warning, most severe first
	RowsUp, RowsDown                   key.Binding // scroll the pier table
	Ratios                             key.Binding // pier demand/capacity ratios instead of shares
	DesignForm                         key.Binding // the pier design inputs
	Help, Quit                         key.Binding

	screens []key.Binding // keys of registered screens
}

func newKeyMap() KeyMap {
	b := func(help string, keys ...string) key.Binding {
		return key.NewBinding(key.WithKeys(keys...), key.WithHelp(keys[0], help))
	}
	k := KeyMap{
		Next:         key.NewBinding(key.WithKeys("tab"), key.WithHelp("tab", "next opening")),
		Prev:         key.NewBinding(key.WithKeys("shift+tab"), key.WithHelp("shift+tab", "previous opening")),
		Left:         key.NewBinding(key.WithKeys("left", "h"), key.WithHelp("←/h", "move left")),
		Right:        key.NewBinding(key.WithKeys("right", "l"), key.WithHelp("→/l", "move right")),
		Up:           key.NewBinding(key.WithKeys("up", "k"), key.WithHelp("↑/k", "move up")),
		Down:         key.NewBinding(key.WithKeys("down", "j"), key.WithHelp("↓/j", "move down")),
		Narrower:     key.NewBinding(key.WithKeys("shift+left", "H"), key.WithHelp("H", "narrower")),
		Wider:        key.NewBinding(key.WithKeys("shift+right", "L"), key.WithHelp("L", "wider")),
		Taller:       key.NewBinding(key.WithKeys("shift+up", "K"), key.WithHelp("K", "taller")),
		Shorter:      key.NewBinding(key.WithKeys("shift+down", "J"), key.WithHelp("J", "shorter")),
		AddDoor:      b("add door", "d"),
		AddWindow:    b("add window", "w"),
		Delete:       key.NewBinding(key.WithKeys("x", "delete"), key.WithHelp("x", "delete opening")),
		Copy:         b("duplicate opening", "c"),
		Step:         b("change step", "."),
		EditOpening:  key.NewBinding(key.WithKeys("e", "enter"), key.WithHelp("e", "edit opening")),
		EditWall:     b("edit wall", "E"),
		Undo:         key.NewBinding(key.WithKeys("u", "ctrl+z"), key.WithHelp("u", "undo")),
		Redo:         key.NewBinding(key.WithKeys("U", "ctrl+r", "ctrl+y"), key.WithHelp("U", "redo")),
		Save:         key.NewBinding(key.WithKeys("s", "ctrl+s"), key.WithHelp("s", "save")),
		SaveAs:       b("save as", "S"),
		NextLayout:   b("next layout", "]"),
		PrevLayout:   b("previous layout", "["),
		NewLayout:    b("new layout from this one", "n"),
		RenameLayout: b("rename layout", "r"),
		DelLayout:    b("delete layout", "X"),
		FE:           b("finite-element check on/off", "f"),
		Basis:        b("basis classic/fe", "b"),
		Snapshot:     b("write report snapshot", "p"),
		Warnings:     b("list the warnings", "!"),
		RowsUp:       key.NewBinding(key.WithKeys("pgup"), key.WithHelp("pgup", "pier table up")),
		RowsDown:     key.NewBinding(key.WithKeys("pgdown"), key.WithHelp("pgdown", "pier table down")),
		Ratios:       b("ratios on/off", "R"),
		DesignForm:   b("pier design inputs", "D"),
		Help:         b("help", "?"),
		Quit:         key.NewBinding(key.WithKeys("q"), key.WithHelp("q", "quit")),
	}
	for _, e := range screenEntries {
		k.screens = append(k.screens, e.key)
	}
	return k
}

// ShortHelp is the hint line at the bottom of the elevation, in short
// words, help and quit first so that a narrow window still shows them.
func (k KeyMap) ShortHelp() []key.Binding {
	return []key.Binding{short(k.Help, "help"), short(k.Quit, "quit"), short(k.Warnings, "warnings"), short(k.Next, "select"), k.moveHint(), k.resizeHint(),
		short(k.Step, "step"), short(k.AddWindow, "window"), short(k.AddDoor, "door"), short(k.Delete, "delete"),
		short(k.EditOpening, "edit"), short(k.EditWall, "wall"), short(k.Undo, "undo"), short(k.Save, "save")}
}

// short is b with a shorter description for the hint line.
func short(b key.Binding, desc string) key.Binding {
	return key.NewBinding(key.WithKeys(b.Keys()...), key.WithHelp(b.Help().Key, desc))
}

// FullHelp is the help page, one column per group.
func (k KeyMap) FullHelp() [][]key.Binding {
	groups := [][]key.Binding{
		{k.Next, k.Prev, k.Left, k.Right, k.Up, k.Down, k.Narrower, k.Wider, k.Taller, k.Shorter, k.Step},
		{k.AddDoor, k.AddWindow, k.Delete, k.Copy, k.EditOpening, k.EditWall, k.DesignForm, k.Undo, k.Redo},
		{k.Save, k.SaveAs, k.NextLayout, k.PrevLayout, k.NewLayout, k.RenameLayout, k.DelLayout, k.FE, k.Basis, k.Snapshot, k.Ratios, k.Warnings, k.RowsUp, k.RowsDown, k.Help, k.Quit},
	}
	if len(k.screens) > 0 {
		groups = append(groups, k.screens)
	}
	return groups
}

func (k KeyMap) moveHint() key.Binding {
	return key.NewBinding(key.WithKeys("left"), key.WithHelp("hjkl/arrows", "move"))
}

func (k KeyMap) resizeHint() key.Binding {
	return key.NewBinding(key.WithKeys("H"), key.WithHelp("HJKL", "resize"))
}
