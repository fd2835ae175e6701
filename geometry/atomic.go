package geometry

import (
	"crypto/sha256"
	"errors"
	"fmt"
	"io"
	"io/fs"
	"os"
	"path/filepath"
)

// MaxFileSize is the largest wall or storey file pierwise reads
// (docs/method.md §11). A wall file is a few kilobytes; the limit keeps
// /dev/zero, a log file or a disk image handed over by mistake from filling
// the memory.
const MaxFileSize = 1 << 20

// A RefusedPathError is a path pierwise will not read or write: a device,
// a directory, a FIFO or socket, a file that is too large, a read-only file,
// or a file of another user. The command line treats a refused output path as
// a usage error.
type RefusedPathError struct {
	Path   string
	Reason string
}

func (e *RefusedPathError) Error() string { return Visible(e.Path) + ": " + e.Reason }

// kindOf names a file type that is not a regular file, for messages.
func kindOf(m fs.FileMode) string {
	switch {
	case m.IsDir():
		return "a directory"
	case m&fs.ModeNamedPipe != 0:
		return "a FIFO (named pipe)"
	case m&fs.ModeSocket != 0:
		return "a socket"
	case m&fs.ModeCharDevice != 0:
		return "a character device"
	case m&fs.ModeDevice != 0:
		return "a block device"
	case m&fs.ModeSymlink != 0:
		return "a symbolic link"
	}
	return "not a regular file"
}

// ReadUserFile reads a file the user named: a regular file (a symbolic link
// to one is fine) of at most MaxFileSize bytes. A FIFO, a device or a
// directory is refused without blocking: the path is opened non-blocking
// and its type checked on the open file before anything is read.
func ReadUserFile(path string) ([]byte, error) {
	if fi, err := os.Stat(path); err != nil {
		return nil, err
	} else if !fi.Mode().IsRegular() {
		return nil, &RefusedPathError{path, "is " + kindOf(fi.Mode()) + "; pierwise reads only regular files"}
	}
	f, err := os.OpenFile(path, os.O_RDONLY|openNonblock, 0)
	if err != nil {
		return nil, err
	}
	defer f.Close()
	fi, err := f.Stat() // the file opened, which may not be the one stat saw
	if err != nil {
		return nil, err
	}
	if !fi.Mode().IsRegular() {
		return nil, &RefusedPathError{path, "is " + kindOf(fi.Mode()) + "; pierwise reads only regular files"}
	}
	tooBig := &RefusedPathError{path, fmt.Sprintf("is larger than %d KiB, the most a wall or storey file may hold", MaxFileSize>>10)}
	if fi.Size() > MaxFileSize {
		return nil, tooBig
	}
	data, err := io.ReadAll(io.LimitReader(f, MaxFileSize+1))
	if err != nil {
		return nil, err
	}
	if len(data) > MaxFileSize {
		return nil, tooBig // grew while read
	}
	return data, nil
}

// Sum is the content hash of a file as read or written: the editor keeps it
// to notice a change made by another program before it saves.
type Sum [sha256.Size]byte

// SumOf hashes data.
func SumOf(data []byte) Sum { return sha256.Sum256(data) }

// WriteTarget resolves the path a write to path would replace and checks
// it: a symbolic link is followed to its target (the link keeps pointing at
// the file it names); an existing target must be a regular file that is
// writable and the runner's own; a missing one is created. It returns the
// target path, and whether it exists.
func WriteTarget(path string) (target string, exists bool, err error) {
	target = path
	li, err := os.Lstat(path)
	if errors.Is(err, fs.ErrNotExist) {
		return path, false, nil
	}
	if err != nil {
		return "", false, err
	}
	if li.Mode()&fs.ModeSymlink != 0 {
		t, err := filepath.EvalSymlinks(path)
		if err != nil {
			return "", false, &RefusedPathError{path, "is a symbolic link to a missing file or a loop; give the file itself"}
		}
		target = t
	}
	fi, err := os.Stat(target)
	if err != nil {
		return "", false, err
	}
	if !fi.Mode().IsRegular() {
		return "", false, &RefusedPathError{path, "is " + kindOf(fi.Mode()) + "; pierwise writes only to a regular file or a new path"}
	}
	if fi.Mode().Perm()&0o222 == 0 || !writable(target) {
		return "", false, &RefusedPathError{path, "is read-only; pierwise does not replace it"}
	}
	if err := sameOwner(fi); err != nil {
		return "", false, &RefusedPathError{path, err.Error()}
	}
	return target, true, nil
}

// WriteFileAtomic writes data to path so that a reader sees either the old
// file or the whole new one, never a part: it writes a temporary file in the
// same directory, syncs it, and renames it over the target. The target is
// what WriteTarget allows: a symbolic link is followed and stays a link; a
// device, a directory, a FIFO, a read-only file or another user's file is
// refused with a *RefusedPathError. An existing file keeps its permission
// bits (and group where allowed); a new one gets 0644.
func WriteFileAtomic(path string, data []byte) (err error) {
	target, exists, err := WriteTarget(path)
	if err != nil {
		return err
	}
	mode := os.FileMode(0o644)
	var old fs.FileInfo
	if exists {
		if old, err = os.Stat(target); err != nil {
			return fmt.Errorf("saving %s: %w", Visible(path), err)
		}
		mode = old.Mode().Perm()
	}
	dir, base := filepath.Split(target)
	if dir == "" {
		dir = "."
	}
	tmp, err := os.CreateTemp(dir, "."+base+".tmp-*")
	if err != nil {
		return fmt.Errorf("saving %s: %w", Visible(path), err)
	}
	defer func() {
		if err != nil {
			tmp.Close()
			os.Remove(tmp.Name())
		}
	}()
	if _, err = tmp.Write(data); err != nil {
		return fmt.Errorf("saving %s: %w", Visible(path), err)
	}
	if err = tmp.Chmod(mode); err != nil {
		return fmt.Errorf("saving %s: %w", Visible(path), err)
	}
	if old != nil {
		keepGroup(tmp, old)
	}
	if err = tmp.Sync(); err != nil {
		return fmt.Errorf("saving %s: %w", Visible(path), err)
	}
	if err = tmp.Close(); err != nil {
		return fmt.Errorf("saving %s: %w", Visible(path), err)
	}
	if err = os.Rename(tmp.Name(), target); err != nil {
		return fmt.Errorf("saving %s: %w", Visible(path), err)
	}
	if d, derr := os.Open(dir); derr == nil {
		d.Sync() // make the rename durable where the file system allows it
		d.Close()
	}
	return nil
}

// CreateNewFile writes data to a new file at path and fails with
// fs.ErrExist when anything (a file, a link, a device) is there already; the
// data is written to a temporary file first and linked into place, so the
// new file is never seen half written.
func CreateNewFile(path string, data []byte) (err error) {
	dir, base := filepath.Split(path)
	if dir == "" {
		dir = "."
	}
	tmp, err := os.CreateTemp(dir, "."+base+".tmp-*")
	if err != nil {
		return err
	}
	defer func() {
		tmp.Close()
		os.Remove(tmp.Name())
	}()
	if _, err = tmp.Write(data); err != nil {
		return err
	}
	if err = tmp.Chmod(0o644); err != nil {
		return err
	}
	if err = tmp.Sync(); err != nil {
		return err
	}
	return os.Link(tmp.Name(), path) // fails when path exists, even as a dangling link
}
