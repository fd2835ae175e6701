// Package testkit holds what the tests of several packages share: golden
// files with one -update flag, and a dummy wall setting that proves a new
// setting needs one entry in geometry.Settings. Only tests import it.
package testkit

import (
	"flag"
	"fmt"
	"os"
	"path/filepath"
	"strings"
	"sync"
	"testing"

	"pierwise/geometry"
)

// The -update flag rewrites golden files. teatest's golden package
// registers a flag of that name too; a package whose tests import it gets
// that one (it is initialised first: its import path sorts first).
func init() {
	if flag.Lookup("update") == nil {
		flag.Bool("update", false, "rewrite the golden files in testdata/")
	}
}

// Update reports whether the tests run with -update.
func Update() bool {
	f := flag.Lookup("update")
	return f != nil && f.Value.String() == "true"
}

// Golden compares got with the file testdata/name, or writes the file
// when the tests run with -update. Read the diff before committing one.
func Golden(t testing.TB, name, got string) {
	t.Helper()
	path := filepath.Join("testdata", name)
	if Update() {
		if err := os.MkdirAll(filepath.Dir(path), 0o755); err != nil {
			t.Fatal(err)
		}
		if err := os.WriteFile(path, []byte(got), 0o644); err != nil {
			t.Fatal(err)
		}
		return
	}
	want, err := os.ReadFile(path)
	if err != nil {
		t.Fatalf("%v (go test -update writes it)", err)
	}
	if string(want) == got {
		return
	}
	gl, wl := strings.Split(got, "\n"), strings.Split(string(want), "\n")
	at := min(len(gl), len(wl))
	for i := range at {
		if gl[i] != wl[i] {
			at = i
			break
		}
	}
	msg := fmt.Sprintf("%s differs at line %d (check it, then go test -update):\n got: %q\nwant: %q", path, at+1, line(gl, at), line(wl, at))
	if len(gl) <= 60 {
		msg += "\n--- got:\n" + got // a screen: show all of it
	}
	t.Error(msg)
}

func line(ls []string, i int) string {
	if i < len(ls) {
		return ls[i]
	}
	return "(end of file)"
}

// Dummy is the key of the setting DummySetting adds.
const Dummy = "dummy.reach"

var (
	dummyMu  sync.Mutex
	dummyVal = map[string]float64{} // the dummy's value, by wall title
)

// DummySetting adds a setting to geometry.Settings for the rest of the
// test: [dummy] reach, a length up to 100 m shown in the wall form and the
// report. It has no field of Wall, so it keeps its value beside the wall,
// under the wall's title (which Clone and the editor keep). The setting is
// removed when the test ends; tests that call it must not run in parallel.
func DummySetting(t testing.TB) *geometry.Setting {
	t.Helper()
	saved := geometry.Settings
	geometry.Settings = append(append([]geometry.Setting(nil), saved...), geometry.Setting{
		Key: Dummy, Kind: geometry.KindLength, Label: "dummy reach", Help: "a test setting, e.g. 3ft",
		Example: [2]string{`"3ft"`, `"1m"`}, Max: 100, Form: 10000, Report: true,
		Get: func(w *geometry.Wall) geometry.Value {
			dummyMu.Lock()
			defer dummyMu.Unlock()
			return geometry.Value{Num: dummyVal[w.Title]}
		},
		Set: func(w *geometry.Wall, v geometry.Value) {
			dummyMu.Lock()
			defer dummyMu.Unlock()
			dummyVal[w.Title] = v.Num
		},
	})
	t.Cleanup(func() {
		geometry.Settings = saved
		dummyMu.Lock()
		clear(dummyVal)
		dummyMu.Unlock()
	})
	return &geometry.Settings[len(geometry.Settings)-1]
}
