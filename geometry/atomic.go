package geometry

import (
	"fmt"
	"os"
	"path/filepath"
)

// WriteFileAtomic writes data to path so that a reader sees either the old
// file or the whole new one, never a part: it writes a temporary file in the
// same directory, syncs it, and renames it over path. An existing file keeps
// its permission bits; a new one gets 0644.
func WriteFileAtomic(path string, data []byte) (err error) {
	mode := os.FileMode(0o644)
	if fi, err := os.Stat(path); err == nil {
		mode = fi.Mode().Perm()
	}
	dir, base := filepath.Split(path)
	if dir == "" {
		dir = "."
	}
	tmp, err := os.CreateTemp(dir, "."+base+".tmp-*")
	if err != nil {
		return fmt.Errorf("saving %s: %w", path, err)
	}
	defer func() {
		if err != nil {
			tmp.Close()
			os.Remove(tmp.Name())
		}
	}()
	if _, err = tmp.Write(data); err != nil {
		return fmt.Errorf("saving %s: %w", path, err)
	}
	if err = tmp.Chmod(mode); err != nil {
		return fmt.Errorf("saving %s: %w", path, err)
	}
	if err = tmp.Sync(); err != nil {
		return fmt.Errorf("saving %s: %w", path, err)
	}
	if err = tmp.Close(); err != nil {
		return fmt.Errorf("saving %s: %w", path, err)
	}
	if err = os.Rename(tmp.Name(), path); err != nil {
		return fmt.Errorf("saving %s: %w", path, err)
	}
	if d, derr := os.Open(dir); derr == nil {
		d.Sync() // make the rename durable where the file system allows it
		d.Close()
	}
	return nil
}
