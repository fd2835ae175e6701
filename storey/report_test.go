package storey

import (
	"bytes"
	"os"
	"path/filepath"
	"strings"
	"testing"
	"time"

	"pierwise/internal/testkit"
)

// The storey report of the invented workshop, compared with a golden file.
// Its numbers are rounded in the text (2 decimals for forces and distances),
// so the file does not depend on the last bits of the arithmetic. Run
// go test ./storey -run TestReportGolden -update after a deliberate change,
// and read the diff.
func TestReportGolden(t *testing.T) {
	var buf bytes.Buffer
	now := time.Date(2026, 12, 1, 23, 0, 0, 0, time.UTC)
	if err := WriteReport(&buf, filepath.Join("..", "testdata", "storey", "workshop.toml"), now, "test"); err != nil {
		t.Fatal(err)
	}
	testkit.Golden(t, "workshop.report.txt", buf.String())
	// What the report must say whatever its layout.
	for _, s := range []string{"licensed", "local codes govern", "ASCE 7-22 §12.8.4.2", "x_R:", "y_R:", "J:", " M ", " R "} {
		if !strings.Contains(buf.String(), s) {
			t.Errorf("report lacks %q", s)
		}
	}
}

// The report of the workshop copy with a mezzanine frame given by its
// rigidity, a seismic design category and the storey drift check, against
// a golden file (rounded numbers; read the diff after -update).
func TestReportGoldenFrame(t *testing.T) {
	var buf bytes.Buffer
	now := time.Date(2026, 12, 2, 12, 0, 0, 0, time.UTC)
	if err := WriteReport(&buf, filepath.Join("..", "testdata", "storey", "workshop-frame.toml"), now, "test"); err != nil {
		t.Fatal(err)
	}
	testkit.Golden(t, "workshop-frame.report.txt", buf.String())
	for _, s := range []string{"Mezzanine frame", "(given by rigidity)", "Storey drift (ASCE 7-22 §12.8.6", "Torsional irregularity", "licensed"} {
		if !strings.Contains(buf.String(), s) {
			t.Errorf("report lacks %q", s)
		}
	}
	// Every line fits the report's 78 columns.
	for i, l := range strings.Split(buf.String(), "\n") {
		if n := len([]rune(l)); n > 78 {
			t.Errorf("line %d has %d columns: %q", i+1, n, l)
		}
	}
}

// A bad storey file: nothing is written and the error names file and line.
func TestWriteReportError(t *testing.T) {
	dir := t.TempDir()
	path := filepath.Join(dir, "s.toml")
	text := strings.Replace(goodStorey, `file = "b.toml"`, `file = "missing.toml"`, 1)
	if err := os.WriteFile(path, []byte(text), 0o644); err != nil {
		t.Fatal(err)
	}
	var buf bytes.Buffer
	err := WriteReport(&buf, path, time.Now(), "")
	if err == nil || !strings.Contains(err.Error(), path+":15: wall[2].file") || !strings.Contains(err.Error(), "not found") {
		t.Errorf("got %v, want a missing-file error at line 15", err)
	}
	if buf.Len() != 0 {
		t.Errorf("wrote %d bytes for a bad storey", buf.Len())
	}
}

// On a flexible diaphragm the report heads the rigid diaphragm's sections
// as shown for comparison only and the flexible distribution as governing;
// the JSON says which governs. On the rigid workshop the JSON says rigid.
func TestReportFlexibleGoverns(t *testing.T) {
	a, err := Load(writeStorey(t, boxStorey))
	if err != nil {
		t.Fatal(err)
	}
	var buf bytes.Buffer
	if err := Report(&buf, a, time.Date(2026, 12, 2, 12, 0, 0, 0, time.UTC), "test"); err != nil {
		t.Fatal(err)
	}
	got := buf.String()
	for _, want := range []string{
		"3. Centre of rigidity and J (rigid diaphragm, for comparison only)",
		"(rigid diaphragm, for comparison only)", // each rigid case
		"5. Torsional irregularity (rigid diaphragm, for comparison only)",
		"6. Flexible diaphragm: shear to the wall lines (governs)",
	} {
		if !strings.Contains(got, want) {
			t.Errorf("flexible report lacks %q", want)
		}
	}
	if n := strings.Count(got, "(rigid diaphragm, for comparison only)"); n != 6 {
		t.Errorf("%d rigid sections marked for comparison, want 6 (3, four cases, 5)", n)
	}
	for i, l := range strings.Split(got, "\n") {
		if n := len([]rune(l)); n > 78 {
			t.Errorf("line %d has %d columns: %q", i+1, n, l)
		}
	}
	if g := a.JSON().Governing; g != "flexible" {
		t.Errorf("JSON governing %q, want flexible", g)
	}
	rigid, err := Load(filepath.Join("..", "testdata", "storey", "workshop.toml"))
	if err != nil {
		t.Fatal(err)
	}
	if g := rigid.JSON().Governing; g != "rigid" {
		t.Errorf("JSON governing %q on the rigid workshop, want rigid", g)
	}
}
