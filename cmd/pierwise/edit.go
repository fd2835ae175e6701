package main

import (
	"pierwise/demo"
	"pierwise/tui"
)

func init() {
	register(command{
		name:  "edit",
		args:  "FILE",
		short: "open the wall editor on FILE (created with a plain wall when missing)",
		run:   runEdit,
	})
	defaultCommand = func(e *env) error {
		return tui.Edit(demo.Wall(), tui.Options{Message: "demo wall: s saves it to a file of your choice, ? shows every key"})
	}
}

func runEdit(e *env, args []string) error {
	fs := newFlags(e, "edit")
	pos, err := parseInterleaved(fs, args)
	if err != nil {
		return err
	}
	if len(pos) != 1 {
		return usagef("edit needs exactly one wall file")
	}
	return tui.EditFile(pos[0])
}
