package tui

import (
	"bytes"
	"errors"
	"fmt"
	"io"
	"io/fs"
	"path/filepath"
	"strings"
	"time"

	"pierwise/geometry"
)

// snapshotPath names a new snapshot file beside the wall file: the wall
// file's name without its extension, the kind ("compare", "sweep-W1") and
// the time to the second, e.g. annex-compare-20261201-225012.txt. A wall
// without a file (the demo) writes into the working directory.
func snapshotPath(wallPath, kind string, now time.Time, n int) string {
	dir, base := ".", "demo"
	if wallPath != "" {
		dir = filepath.Dir(wallPath)
		base = strings.TrimSuffix(filepath.Base(wallPath), filepath.Ext(wallPath))
	}
	name := fmt.Sprintf("%s-%s-%s", base, snapshotKind(kind), now.Format("20060102-150405"))
	if n > 1 {
		name += fmt.Sprintf("-%d", n)
	}
	return filepath.Join(dir, name+".txt")
}

// snapshotKind keeps a kind safe in a file name.
func snapshotKind(kind string) string {
	return strings.Map(func(r rune) rune {
		switch {
		case r >= 'a' && r <= 'z', r >= 'A' && r <= 'Z', r >= '0' && r <= '9', r == '-', r == '.':
			return r
		}
		return '_'
	}, kind)
}

// writeSnapshot writes a new snapshot file (never over an existing file,
// link or device: geometry.CreateNewFile, written whole before it appears)
// and returns its path. It runs in a tea.Cmd.
func writeSnapshot(wallPath, kind string, now time.Time, write func(io.Writer) error) (string, error) {
	var buf bytes.Buffer
	if err := write(&buf); err != nil {
		return "", err
	}
	for n := 1; n < 100; n++ {
		path := snapshotPath(wallPath, kind, now, n)
		err := geometry.CreateNewFile(path, buf.Bytes())
		if errors.Is(err, fs.ErrExist) {
			continue
		}
		if err != nil {
			return "", err
		}
		return path, nil
	}
	return "", errors.New("too many snapshots in the same second")
}

// snapshotSaid is the message that says where a snapshot went: the file
// name first, so a narrow window still shows it.
func snapshotSaid(path string) string {
	return fmt.Sprintf("wrote %s in %s", filepath.Base(path), filepath.Dir(path))
}
