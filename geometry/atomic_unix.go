//go:build unix

package geometry

import (
	"errors"
	"io/fs"
	"os"
	"syscall"
)

// openNonblock keeps an open of a FIFO from waiting for a writer.
const openNonblock = syscall.O_NONBLOCK

// writable asks the system whether the runner may write path (root may
// write a file without write bits; the caller checks the bits too).
func writable(path string) bool { return syscall.Access(path, 0x2 /* W_OK */) == nil }

// sameOwner refuses a file of another user: replacing it by rename would
// make it the runner's.
func sameOwner(fi fs.FileInfo) error {
	st, ok := fi.Sys().(*syscall.Stat_t)
	if !ok {
		return nil
	}
	if uid := os.Geteuid(); uid != 0 && int(st.Uid) != uid {
		return errors.New("belongs to another user; pierwise would take it over by replacing it")
	}
	return nil
}

// keepGroup gives the new file the old one's owner and group where the
// system allows it (root keeps both; others keep a group they belong to).
func keepGroup(f *os.File, old fs.FileInfo) {
	if st, ok := old.Sys().(*syscall.Stat_t); ok {
		if f.Chown(int(st.Uid), int(st.Gid)) != nil {
			f.Chown(-1, int(st.Gid))
		}
	}
}
