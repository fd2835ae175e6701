package main

import (
	"pierwise/geometry"

	"pierwise/demo"
	"pierwise/storey"
	"pierwise/tui"
)

func init() {
	register(command{
		name:  "edit",
		args:  "FILE",
		short: "open the editor on a wall FILE (created with a plain wall when missing) or a storey file",
		run:   runEdit,
	})
	defaultCommand = func(e *env) error {
		return tui.Edit(demo.Wall(), tui.Options{Message: "demo wall: s saves it to a file of your choice, ? shows every key", Version: version})
	}
}

func runEdit(e *env, args []string) error {
	fs := newFlags(e, "edit")
	pos, err := parseInterleaved(fs, args)
	if err != nil {
		return err
	}
	if len(pos) != 1 {
		return usagef("edit needs exactly one file")
	}
	if data, err := geometry.ReadUserFile(pos[0]); err == nil && storey.IsStoreyFile(data) {
		return tui.EditStorey(pos[0], tui.Options{Version: version})
	}
	return tui.EditFile(pos[0], tui.Options{Version: version})
}
