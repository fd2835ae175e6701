package tui

import (
	"fmt"
	"math"
	"strings"
	"testing"

	"pierwise/geometry"
	"pierwise/internal/testkit"
)

// The wall form's field positions the tests step to, found by file key.
var (
	wfLength   = wallField("length")
	wfStrength = wallField("material.strength")
	wfShear    = wallField("load.shear")
	wfKf       = wallField("stiffness.flexure")
	wfIe       = wallField("drift.ie")
)

func wallField(key string) int {
	for i, s := range wallFormSettings() {
		if s.Key == key {
			return i
		}
	}
	panic("tui test: no wall form field " + key)
}

func TestWallFormOrder(t *testing.T) {
	if wfLength >= wfShear || wfStrength >= wfShear {
		t.Errorf("wall form order: length %d, strength %d, shear %d", wfLength, wfStrength, wfShear)
	}
}

// TestDummySetting: one entry added to geometry.Settings is read from a
// file, written back with the file's comments kept, checked with file,
// line and key, and shown and edited in the wall form. (The JSON and the
// report: TestDummySettingJSON in cmd/pierwise.)
func TestDummySetting(t *testing.T) {
	s := testkit.DummySetting(t)
	text := strings.Replace(annexFile(t), "\n[material]", "\n# how far the dummy reaches\n[dummy]\nreach = \"3ft\"   # measured on site\n\n[material]", 1)
	w, err := geometry.Parse("annex.toml", []byte(text))
	if err != nil {
		t.Fatal(err)
	}
	if got := s.Get(w).Num; math.Abs(got-3*float64(geometry.Foot)) > 1e-12 {
		t.Fatalf("parsed reach %g m, want 3 ft", got)
	}

	// Written with the comments kept, the changed value in place.
	s.Set(w, geometry.Value{Num: 4 * float64(geometry.Foot)})
	out, err := geometry.MarshalKeeping([]byte(text), w)
	if err != nil {
		t.Fatal(err)
	}
	if !strings.Contains(string(out), "# how far the dummy reaches\n[dummy]\nreach = \"4ft\"   # measured on site\n") {
		t.Errorf("kept file:\n%s", out)
	}

	// Checked with file, line and key.
	bad := strings.Replace(text, `reach = "3ft"`, `reach = "-3ft"`, 1)
	line := strings.Count(bad[:strings.Index(bad, "reach =")], "\n") + 1
	_, err = geometry.Parse("annex.toml", []byte(bad))
	if want := fmt.Sprintf("annex.toml:%d: dummy.reach: must not be negative", line); err == nil || !strings.Contains(err.Error(), want) {
		t.Errorf("error %v, want %q", err, want)
	}
	_, err = geometry.Parse("annex.toml", []byte(strings.Replace(text, `reach = "3ft"`, `reach = "3ft"`+"\nreech = 1", 1)))
	if err == nil || !strings.Contains(err.Error(), fmt.Sprintf("annex.toml:%d: dummy.reech: unknown key", line+1)) {
		t.Errorf("unknown key beside the dummy: %v", err)
	}

	// Shown and edited in the wall form.
	ed := newEditor(t, w, "", 120, 40)
	ed.press(runes("E"))
	i := wallField(testkit.Dummy)
	for range i {
		ed.press(keyTab)
	}
	if v := ed.view(); !strings.Contains(v, "dummy reach") || !strings.Contains(v, `4'-0"`) {
		t.Errorf("the form does not show the dummy:\n%s", v)
	}
	ed.typeText("200m")
	ed.press(keyEnter)
	if f := ed.elev().form; f == nil || !strings.Contains(f.fields[i].err, "implausibly large") {
		t.Fatalf("200 m accepted:\n%s", ed.view())
	}
	ed.typeText("5ft")
	ed.press(keyEnter)
	if got := s.Get(ed.wall()).Num; ed.elev().form != nil || math.Abs(got-5*float64(geometry.Foot)) > 1e-12 {
		t.Errorf("after the form: reach %g m\n%s", got, ed.view())
	}
}

// annexFile is the annex wall as a file.
func annexFile(t *testing.T) string {
	t.Helper()
	out, err := geometry.Marshal(annex())
	if err != nil {
		t.Fatal(err)
	}
	return string(out)
}

// The wall form at 80×24 scrolls: shift+tab from the first field wraps to
// the last, which shows with the fields above it counted; tab wraps back.
// Backspace and the arrows edit the focused field.
func TestWallFormScrolls(t *testing.T) {
	ed := newEditor(t, annex(), "", 80, 24)
	ed.press(runes("E"))
	n := len(wallFormSettings())
	if v := ed.view(); !strings.Contains(v, "more below") || strings.Contains(v, "more above") {
		t.Fatalf("the form's first page:\n%s", v)
	}
	ed.press(keyShiftTab)
	f := ed.elev().form
	last := f.fields[n-1].label
	if v := ed.view(); f.focus != n-1 || !strings.Contains(v, "> "+last) || !strings.Contains(v, "more above") || strings.Contains(v, "more below") {
		t.Fatalf("shift+tab did not scroll to %q:\n%s", last, v)
	}
	checkSize(t, ed.view(), 80, 24)
	ed.press(keyTab)
	if f.focus != 0 || strings.Contains(ed.view(), "more above") {
		t.Fatalf("tab did not wrap to the first field:\n%s", ed.view())
	}
	ed.press(keyBack, keyBack, keyBack, keyBack, keyBack, keyRight, runes("!"))
	if got := f.fields[0].input.Value(); got != "Library annex, east!" {
		t.Errorf("title typed as %q", got)
	}
}
