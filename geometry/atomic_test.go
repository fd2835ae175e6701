//go:build unix

package geometry

import (
	"errors"
	"io/fs"
	"os"
	"path/filepath"
	"strings"
	"syscall"
	"testing"
	"time"
)

func refused(t *testing.T, err error, want string) {
	t.Helper()
	var re *RefusedPathError
	if !errors.As(err, &re) {
		t.Fatalf("got %v, want a refusal (%s)", err, want)
	}
	if !strings.Contains(re.Reason, want) {
		t.Errorf("reason %q, want it to say %q", re.Reason, want)
	}
}

func TestReadUserFileRefusesWhatIsNotARegularFile(t *testing.T) {
	dir := t.TempDir()
	_, err := ReadUserFile(dir)
	refused(t, err, "directory")

	if _, err := os.Stat("/dev/zero"); err == nil {
		_, err := ReadUserFile("/dev/zero")
		refused(t, err, "character device")
	} else {
		t.Logf("no /dev/zero here: %v", err)
	}

	fifo := filepath.Join(dir, "pipe")
	if err := syscall.Mkfifo(fifo, 0o644); err != nil {
		t.Logf("skipping the FIFO: mkfifo: %v", err)
	} else {
		done := make(chan error, 1)
		go func() { _, err := ReadUserFile(fifo); done <- err }()
		select {
		case err := <-done:
			refused(t, err, "FIFO")
		case <-time.After(5 * time.Second):
			t.Fatal("reading a FIFO with no writer blocked")
		}
	}

	dev := filepath.Join(dir, "null")
	if err := syscall.Mknod(dev, syscall.S_IFCHR|0o666, 1<<8|3); err != nil {
		t.Logf("skipping the device node: mknod needs privileges here: %v", err)
	} else {
		_, err := ReadUserFile(dev)
		refused(t, err, "character device")
	}
}

func TestReadUserFileLimit(t *testing.T) {
	dir := t.TempDir()
	p := filepath.Join(dir, "big.toml")
	if err := os.WriteFile(p, make([]byte, MaxFileSize+1), 0o644); err != nil {
		t.Fatal(err)
	}
	_, err := ReadUserFile(p)
	refused(t, err, "1024 KiB")
	if err := os.WriteFile(p, make([]byte, MaxFileSize), 0o644); err != nil {
		t.Fatal(err)
	}
	if data, err := ReadUserFile(p); err != nil || len(data) != MaxFileSize {
		t.Fatalf("a file of exactly the limit: %d bytes, %v", len(data), err)
	}
	link := filepath.Join(dir, "link.toml")
	if err := os.Symlink(p, link); err != nil {
		t.Skipf("no symbolic links here: %v", err)
	}
	if _, err := ReadUserFile(link); err != nil {
		t.Fatalf("a link to a regular file is read: %v", err)
	}
}

func TestWriteFileAtomicRefuses(t *testing.T) {
	dir := t.TempDir()
	if err := WriteFileAtomic(dir, []byte("x")); err == nil {
		t.Fatal("a directory was replaced")
	} else {
		refused(t, err, "directory")
	}
	fifo := filepath.Join(dir, "pipe")
	if err := syscall.Mkfifo(fifo, 0o644); err != nil {
		t.Logf("skipping the FIFO: mkfifo: %v", err)
	} else {
		refused(t, WriteFileAtomic(fifo, []byte("x")), "FIFO")
		if fi, err := os.Lstat(fifo); err != nil || fi.Mode()&fs.ModeNamedPipe == 0 {
			t.Errorf("the FIFO did not survive: %v %v", fi, err)
		}
	}
	dev := filepath.Join(dir, "null")
	if err := syscall.Mknod(dev, syscall.S_IFCHR|0o666, 1<<8|3); err != nil {
		t.Logf("skipping the device node: mknod needs privileges here: %v", err)
	} else {
		refused(t, WriteFileAtomic(dev, []byte("x")), "character device")
		if fi, err := os.Lstat(dev); err != nil || fi.Mode()&fs.ModeCharDevice == 0 {
			t.Errorf("the device node was replaced: %v %v", fi, err)
		}
	}
	ro := filepath.Join(dir, "ro.txt")
	if err := os.WriteFile(ro, []byte("keep"), 0o444); err != nil {
		t.Fatal(err)
	}
	refused(t, WriteFileAtomic(ro, []byte("x")), "read-only")
	if b, _ := os.ReadFile(ro); string(b) != "keep" {
		t.Errorf("the read-only file now holds %q", b)
	}
	dangling := filepath.Join(dir, "dangling")
	if err := os.Symlink(filepath.Join(dir, "nowhere", "x"), dangling); err != nil {
		t.Skipf("no symbolic links here: %v", err)
	}
	refused(t, WriteFileAtomic(dangling, []byte("x")), "symbolic link")
}

func TestWriteFileAtomicFollowsLinkAndKeepsMode(t *testing.T) {
	dir := t.TempDir()
	target := filepath.Join(dir, "target.txt")
	if err := os.WriteFile(target, []byte("old"), 0o640); err != nil {
		t.Fatal(err)
	}
	if err := os.Chmod(target, 0o640); err != nil {
		t.Fatal(err)
	}
	link := filepath.Join(dir, "link.txt")
	if err := os.Symlink("target.txt", link); err != nil {
		t.Skipf("no symbolic links here: %v", err)
	}
	if err := WriteFileAtomic(link, []byte("new")); err != nil {
		t.Fatal(err)
	}
	if fi, err := os.Lstat(link); err != nil || fi.Mode()&fs.ModeSymlink == 0 {
		t.Fatalf("the link became %v (%v)", fi, err)
	}
	fi, err := os.Stat(target)
	if err != nil {
		t.Fatal(err)
	}
	if fi.Mode().Perm() != 0o640 {
		t.Errorf("mode %v, want 0640 kept", fi.Mode().Perm())
	}
	if b, _ := os.ReadFile(target); string(b) != "new" {
		t.Errorf("target holds %q", b)
	}
	fresh := filepath.Join(dir, "fresh.txt")
	if err := WriteFileAtomic(fresh, []byte("a")); err != nil {
		t.Fatal(err)
	}
	if fi, _ := os.Stat(fresh); fi.Mode().Perm() != 0o644 {
		t.Errorf("a new file got %v, want 0644", fi.Mode().Perm())
	}
	left, _ := filepath.Glob(filepath.Join(dir, ".*tmp-*"))
	if len(left) > 0 {
		t.Errorf("temporary files left behind: %v", left)
	}
}

func TestCreateNewFileNeverReplaces(t *testing.T) {
	dir := t.TempDir()
	p := filepath.Join(dir, "snap.txt")
	if err := CreateNewFile(p, []byte("one")); err != nil {
		t.Fatal(err)
	}
	if err := CreateNewFile(p, []byte("two")); !errors.Is(err, fs.ErrExist) {
		t.Fatalf("second create: %v, want fs.ErrExist", err)
	}
	if b, _ := os.ReadFile(p); string(b) != "one" {
		t.Errorf("holds %q", b)
	}
	link := filepath.Join(dir, "link.txt")
	if err := os.Symlink(filepath.Join(dir, "elsewhere.txt"), link); err == nil {
		if err := CreateNewFile(link, []byte("x")); !errors.Is(err, fs.ErrExist) {
			t.Errorf("a dangling link was written through: %v", err)
		}
		if _, err := os.Stat(filepath.Join(dir, "elsewhere.txt")); err == nil {
			t.Error("the link's target was created")
		}
	}
}
