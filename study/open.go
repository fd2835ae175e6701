package study

import (
	"fmt"

	"pierwise/geometry"
)

// Open loads a wall file given as FILE[:LAYOUT] and makes the named layout
// (variant) the active one. Without a layout the file's own active layout
// stays. An unknown layout is an error that lists the layouts the file has.
func Open(arg string) (*geometry.Wall, error) {
	path, variant := SplitArg(arg)
	w, err := geometry.LoadFile(path)
	if err != nil {
		return nil, err
	}
	if variant == "" {
		return w, nil
	}
	if err := Select(w, variant); err != nil {
		return nil, fmt.Errorf("%s: %w", path, err)
	}
	return w, nil
}
