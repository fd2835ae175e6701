//go:build unix

package main

import (
	"io/fs"
	"os"
	"path/filepath"
	"strings"
	"syscall"
	"testing"
	"time"
)

func hostileDir(t *testing.T) (dir, wall string) {
	t.Helper()
	dir = t.TempDir()
	src, err := os.ReadFile("../../testdata/walls/nested.toml")
	if err != nil {
		t.Fatal(err)
	}
	wall = filepath.Join(dir, "wall.toml")
	if err := os.WriteFile(wall, src, 0o644); err != nil {
		t.Fatal(err)
	}
	return dir, wall
}

func runQuick(t *testing.T, args ...string) (int, string) {
	t.Helper()
	type answer struct {
		code int
		msg  string
	}
	done := make(chan answer, 1)
	go func() {
		var out, errb strings.Builder
		code := run(&env{stdout: &out, stderr: &errb}, args)
		done <- answer{code, errb.String()}
	}()
	select {
	case a := <-done:
		return a.code, a.msg
	case <-time.After(10 * time.Second):
		t.Fatalf("%v blocked", args)
	}
	return 0, ""
}

// -o never replaces what is not a regular file, nor a read-only file; it
// writes through a symbolic link and keeps the target's mode.
func TestOutputPathRules(t *testing.T) {
	dir, wall := hostileDir(t)
	fifo := filepath.Join(dir, "pipe")
	if err := syscall.Mkfifo(fifo, 0o644); err != nil {
		t.Logf("no FIFO case: mkfifo: %v", err)
		fifo = ""
	}
	dev := filepath.Join(dir, "null")
	if err := syscall.Mknod(dev, syscall.S_IFCHR|0o666, 1<<8|3); err != nil {
		t.Logf("no device node case: mknod needs privileges here: %v", err)
		dev = ""
	}
	ro := filepath.Join(dir, "ro.txt")
	if err := os.WriteFile(ro, []byte("keep"), 0o444); err != nil {
		t.Fatal(err)
	}
	for _, c := range []struct{ path, want string }{
		{dir, "directory"}, {fifo, "FIFO"}, {dev, "character device"}, {ro, "read-only"},
	} {
		if c.path == "" {
			continue
		}
		for _, cmd := range [][]string{{"report", wall, "-o", c.path}, {"compare", wall, wall, "-o", c.path}} {
			code, msg := runQuick(t, cmd...)
			if code != exitUsage || !strings.Contains(msg, c.want) {
				t.Errorf("%v: exit %d %q; want %d and %q", cmd, code, msg, exitUsage, c.want)
			}
		}
	}
	if b, _ := os.ReadFile(ro); string(b) != "keep" {
		t.Errorf("read-only file now %q", b)
	}
	if dev != "" {
		if fi, err := os.Lstat(dev); err != nil || fi.Mode()&fs.ModeCharDevice == 0 {
			t.Errorf("the device node is now %v", fi)
		}
	}
	target := filepath.Join(dir, "target.txt")
	if err := os.WriteFile(target, nil, 0o600); err != nil {
		t.Fatal(err)
	}
	link := filepath.Join(dir, "link.txt")
	if err := os.Symlink("target.txt", link); err != nil {
		t.Skipf("no symbolic links: %v", err)
	}
	if code, msg := runQuick(t, "report", wall, "-o", link); code != exitOK {
		t.Fatalf("report through a link: %d %s", code, msg)
	}
	if fi, _ := os.Lstat(link); fi.Mode()&fs.ModeSymlink == 0 {
		t.Error("the link was replaced by a file")
	}
	fi, _ := os.Stat(target)
	if fi.Size() == 0 || fi.Mode().Perm() != 0o600 {
		t.Errorf("target: %d bytes, mode %v; want the report, mode 0600", fi.Size(), fi.Mode().Perm())
	}
}

// Every command refuses a device or a FIFO as its input at once, and a file
// over the size limit with the limit in the message.
func TestInputPathRules(t *testing.T) {
	dir, wall := hostileDir(t)
	var inputs []string
	if _, err := os.Stat("/dev/zero"); err == nil {
		inputs = append(inputs, "/dev/zero")
	}
	fifo := filepath.Join(dir, "pipe.toml")
	if err := syscall.Mkfifo(fifo, 0o644); err == nil {
		inputs = append(inputs, fifo)
	} else {
		t.Logf("no FIFO case: %v", err)
	}
	big := filepath.Join(dir, "big.toml")
	if err := os.WriteFile(big, make([]byte, 2<<20), 0o644); err != nil {
		t.Fatal(err)
	}
	storeyFile := filepath.Join(dir, "storey.toml")
	os.WriteFile(storeyFile, []byte("title = \"s\"\n[storey]\nshear = \"10kip\"\nmass_center = [\"10ft\", \"10ft\"]\nsize = [\"20ft\", \"20ft\"]\n\n[[wall]]\nfile = \"/dev/zero\"\ndirection = \"x\"\nposition = \"0ft\"\n"), 0o644)
	for _, in := range inputs {
		for _, cmd := range [][]string{{"solve", in}, {"report", in}, {"compare", in, wall}, {"sweep", in, "--opening", "D1"}, {"storey", in}} {
			code, msg := runQuick(t, cmd...)
			if code != exitInput || !strings.Contains(msg, "regular file") {
				t.Errorf("%v: exit %d %q", cmd, code, msg)
			}
		}
	}
	if code, msg := runQuick(t, "solve", big); code != exitInput || !strings.Contains(msg, "1024 KiB") {
		t.Errorf("big file: exit %d %q", code, msg)
	}
	if code, msg := runQuick(t, "storey", storeyFile); code != exitInput || !strings.Contains(msg, "regular file") {
		t.Errorf("storey pointing at /dev/zero: exit %d %q", code, msg)
	}
}
