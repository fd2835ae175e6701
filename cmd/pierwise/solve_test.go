package main

import (
	"bytes"
	"encoding/json"
	"math"
	"os"
	"path/filepath"
	"strings"
	"testing"

	"pierwise/report"
)

// runCLI runs one command line in-process and returns its exit status and
// outputs.
func runCLI(args ...string) (int, string, string) {
	var out, errb bytes.Buffer
	code := run(&env{stdout: &out, stderr: &errb, stdin: strings.NewReader("")}, args)
	return code, out.String(), errb.String()
}

// The JSON keys of the README, checked on the Masonry Chronicles wall
// (Concrete Masonry Association of California and Nevada; printed wall
// deflection 7.614/(E t), exact 7.607; compare within 0.2 %).
func TestSolveJSONKeys(t *testing.T) {
	code, out, errs := runCLI("solve", "../../testdata/walls/nested.toml", "--json")
	if code != exitOK {
		t.Fatalf("exit %d: %s", code, errs)
	}
	var w map[string]any
	if err := json.Unmarshal([]byte(out), &w); err != nil {
		t.Fatalf("not JSON: %v\n%s", err, out)
	}
	for _, k := range []string{"deflection_relative", "rigidity_relative", "rigidity", "deflection", "piers"} {
		if _, ok := w[k]; !ok {
			t.Errorf("missing key %q", k)
		}
	}
	if d := w["deflection_relative"].(float64); math.Abs(d-7.614)/7.614 > 0.002 {
		t.Errorf("deflection_relative = %.4f, want 7.614 within 0.2 %%", d)
	}
	piers := w["piers"].([]any)
	if len(piers) != 4 {
		t.Fatalf("got %d piers, want P1, P2, P2.1, P2.2", len(piers))
	}
	leafShares := 0.0
	for _, p := range piers {
		p := p.(map[string]any)
		for _, k := range []string{"name", "x0", "x1", "y0", "y1", "h", "l", "support", "rigidity_relative", "share", "leaf"} {
			if _, ok := p[k]; !ok {
				t.Errorf("pier %v lacks key %q", p["name"], k)
			}
		}
		if p["leaf"].(bool) {
			leafShares += p["share"].(float64)
			if _, ok := p["shear"]; !ok {
				t.Errorf("leaf pier %v lacks shear under a load", p["name"])
			}
			if _, ok := p["moment"]; !ok {
				t.Errorf("leaf pier %v lacks moment under a load", p["name"])
			}
		}
	}
	// P1 takes the first band's share beside P2; P2.1 and P2.2 split P2's:
	// the leaves together carry the whole shear once per band they sit in.
	if leafShares < 1-1e-9 {
		t.Errorf("leaf shares sum to %.4f, want at least 1", leafShares)
	}
	// P1 is 4 ft × 8 ft fixed: its x-range in feet comes from the file.
	p1 := piers[0].(map[string]any)
	if p1["name"] != "P1" || p1["x0"].(float64) != 0 || math.Abs(p1["x1"].(float64)-4) > 1e-9 || math.Abs(p1["y1"].(float64)-8) > 1e-9 || p1["support"] != "fixed" {
		t.Errorf("P1 = %v, want x 0…4 ft, y 0…8 ft, fixed", p1)
	}
}

func TestSolveFEJSON(t *testing.T) {
	code, out, errs := runCLI("solve", "../../testdata/walls/door.toml", "--json", "--fe", "--mesh", "6in", "--element", "q4")
	if code != exitOK {
		t.Fatalf("exit %d: %s", code, errs)
	}
	var w struct {
		RigidityRelative float64 `json:"rigidity_relative"`
		FE               struct {
			DeflectionRelative float64 `json:"deflection_relative"`
			Mesh               float64 `json:"mesh"`
			Elements, DOFs     int
			Element            string
			Piers              []struct {
				Name  string
				Share float64
			}
		} `json:"fe"`
	}
	if err := json.Unmarshal([]byte(out), &w); err != nil {
		t.Fatal(err)
	}
	if w.FE.Element != "q4" || math.Abs(w.FE.Mesh-0.5) > 1e-9 || w.FE.Elements == 0 || w.FE.DOFs == 0 {
		t.Errorf("fe = %+v, want q4 with a 0.5 ft mesh", w.FE)
	}
	// The continuum is more flexible than the hand method's rigid spandrels
	// (common practice), and the shares of the model sum to one per band.
	if w.FE.DeflectionRelative <= 1/w.RigidityRelative {
		t.Errorf("FE deflection %.4f not above the classic %.4f", w.FE.DeflectionRelative, 1/w.RigidityRelative)
	}
	sum := 0.0
	for _, p := range w.FE.Piers {
		sum += p.Share
	}
	if len(w.FE.Piers) == 0 || math.Abs(sum-1) > 0.02 {
		t.Errorf("FE shares %v sum to %.4f, want 1 within 0.02", w.FE.Piers, sum)
	}
}

// A wall cut in two has no load path: a clear message, exit 1, and no
// NaN or Inf in anything printed.
func TestSolveCutWall(t *testing.T) {
	for _, args := range [][]string{
		{"solve", "testdata/cut.toml"},
		{"solve", "testdata/cut.toml", "--json"},
		{"report", "testdata/cut.toml"},
	} {
		code, out, errs := runCLI(args...)
		if code != exitInput {
			t.Errorf("%v: exit %d, want %d", args, code, exitInput)
		}
		if !strings.Contains(errs+out, "SLOT") || !strings.Contains(errs+out, "load path") {
			t.Errorf("%v: the message does not name the cutting opening:\n%s%s", args, errs, out)
		}
		if strings.Count(errs, "cut.toml") != 1 {
			t.Errorf("%v: the message names the file %d times, want once:\n%s", args, strings.Count(errs, "cut.toml"), errs)
		}
		for _, bad := range []string{"NaN", "Inf", "+Inf"} {
			if strings.Contains(out, bad) {
				t.Errorf("%v: output contains %s:\n%s", args, bad, out)
			}
		}
	}
}

func TestExitStatuses(t *testing.T) {
	tests := []struct {
		args []string
		code int
		want string // in stderr
	}{
		{[]string{"solve", "testdata/badkey.toml"}, exitInput, "badkey.toml:9"},
		{[]string{"solve", "testdata/missing.toml"}, exitInput, "missing.toml"},
		{[]string{"solve", "--nonsense"}, exitUsage, "nonsense"},
		{[]string{"frobnicate"}, exitUsage, "unknown command"},
		{[]string{"report", "a.toml", "b.toml"}, exitUsage, "one FILE"},
		{[]string{"solve", "--mesh", "-3in", "testdata/cut.toml"}, exitUsage, "--mesh"},
		{[]string{"solve", "--element", "foo", "../../testdata/walls/door.toml"}, exitUsage, "--element"},
		// The opening that cuts the wall, where it is in the file.
		{[]string{"solve", "testdata/cut.toml"}, exitInput, "cut.toml:22: opening[2]: opening SLOT cuts"},
		{[]string{"testdata/cut.toml"}, exitUsage, "pierwise edit testdata/cut.toml"},
	}
	for _, tc := range tests {
		code, _, errs := runCLI(tc.args...)
		if code != tc.code || !strings.Contains(errs, tc.want) {
			t.Errorf("%v: exit %d, stderr %q; want exit %d mentioning %q", tc.args, code, errs, tc.code, tc.want)
		}
	}
}

func TestSolveDemoTable(t *testing.T) {
	code, out, errs := runCLI("solve")
	if code != exitOK {
		t.Fatalf("exit %d: %s", code, errs)
	}
	for _, want := range []string{"Library annex", "relative rigidity", "kip/in", "P1.2.1", "OK"} {
		if !strings.Contains(out, want) {
			t.Errorf("demo table lacks %q:\n%s", want, out)
		}
	}
}

// The wall file shown in the README is a working file: it parses, and its
// variant solves too.
func TestReadmeWallFile(t *testing.T) {
	data, err := os.ReadFile("../../README.md")
	if err != nil {
		t.Fatal(err)
	}
	_, rest, ok := strings.Cut(string(data), "```toml\n")
	block, _, ok2 := strings.Cut(rest, "```")
	if !ok || !ok2 {
		t.Fatal("README has no toml block")
	}
	path := filepath.Join(t.TempDir(), "readme.toml")
	if err := os.WriteFile(path, []byte(block), 0o644); err != nil {
		t.Fatal(err)
	}
	for _, arg := range []string{path, path + ":door moved"} {
		if code, _, errs := runCLI("solve", arg); code != exitOK {
			t.Errorf("solve %s: exit %d: %s", arg, code, errs)
		}
	}
}

// A report written over the file it reads would destroy the wall (or a
// wall of a storey): -o refuses, and the file is left as it was.
func TestReportRefusesToOverwriteItsInput(t *testing.T) {
	dir := t.TempDir()
	for _, name := range []string{"workshop.toml", "north.toml", "south.toml", "east.toml", "west.toml", "partition.toml"} {
		data, err := os.ReadFile(filepath.Join("../../testdata/storey", name))
		if err != nil {
			t.Fatal(err)
		}
		if err := os.WriteFile(filepath.Join(dir, name), data, 0o644); err != nil {
			t.Fatal(err)
		}
	}
	storeyFile, wall := filepath.Join(dir, "workshop.toml"), filepath.Join(dir, "north.toml")
	before, _ := os.ReadFile(wall)
	for _, args := range [][]string{
		{"report", wall, "-o", wall},
		{"report", storeyFile, "-o", wall},
		{"report", storeyFile, "-o", storeyFile},
	} {
		if code, _, errs := runCLI(args...); code != exitUsage || !strings.Contains(errs, "would overwrite") {
			t.Errorf("%v: exit %d, %q; want a usage error", args, code, errs)
		}
	}
	if after, _ := os.ReadFile(wall); string(after) != string(before) {
		t.Error("the wall file changed")
	}
	if code, _, errs := runCLI("report", wall, "-o", filepath.Join(dir, "north.txt")); code != exitOK {
		t.Errorf("report to another file: exit %d: %s", code, errs)
	}
}

// A finite-element check that was asked for and fails because of the input
// makes the exit status 1 with the message; a mesh size out of range on the
// command line is refused with the words of [check] mesh.
func TestFEFailureExitStatus(t *testing.T) {
	dir := t.TempDir()
	src, err := os.ReadFile("../../testdata/walls/nested.toml")
	if err != nil {
		t.Fatal(err)
	}
	p := filepath.Join(dir, "wall.toml")
	if err := os.WriteFile(p, src, 0o644); err != nil {
		t.Fatal(err)
	}
	for _, c := range []struct {
		args []string
		code int
		want string
	}{
		{[]string{"solve", p, "--mesh", "1e308in"}, exitUsage, "larger than the wall"},
		{[]string{"solve", p, "--mesh", "1e-300in"}, exitUsage, "too fine"},
		{[]string{"solve", p, "--mesh", "0.25in"}, exitInput, "finite-element check failed"},
		{[]string{"report", p, "--mesh", "0.25in"}, exitInput, "finite-element check failed"},
		{[]string{"solve", p, "--mesh", "6in"}, exitOK, ""},
	} {
		var out, errb strings.Builder
		code := run(&env{stdout: &out, stderr: &errb}, c.args)
		if code != c.code || !strings.Contains(errb.String(), c.want) {
			t.Errorf("%v: exit %d, stderr %q; want %d and %q", c.args, code, errb.String(), c.code, c.want)
		}
	}
}

// What a command prints never carries a raw control character from a file:
// the title and a name holding ESC, BEL and NUL are shown escaped.
func TestVisibleWriter(t *testing.T) {
	var b strings.Builder
	w := visibleWriter{&b}
	in := "Hi\x1b]0;x\a\x00 ok\n\tpage\f"
	n, err := w.Write([]byte(in))
	if err != nil || n != len(in) {
		t.Fatalf("wrote %d, %v", n, err)
	}
	if got, want := b.String(), `Hi\x1b]0;x\x07\x00 ok`+"\n\tpage\f"; got != want {
		t.Errorf("got %q, want %q", got, want)
	}
}

// The table prints the method's results to three significant figures
// (report.Sig) while the JSON keeps them whole: every figure of the table
// is the JSON's value through report.Sig. The wall is the Masonry
// Chronicles example (Concrete Masonry Association of California and
// Nevada): relative rigidity 0.1315 E·t in its working, 0.131 here.
func TestSolveTableThreeFigures(t *testing.T) {
	_, js, _ := runCLI("solve", "../../testdata/walls/nested.toml", "--json")
	var w struct {
		Rigidity   float64 `json:"rigidity_relative"`
		Deflection float64 `json:"deflection_relative"`
		Piers      []struct {
			Name     string  `json:"name"`
			Rigidity float64 `json:"rigidity_relative"`
			Share    float64 `json:"share"`
			Shear    float64 `json:"shear"`
			Moment   float64 `json:"moment"`
		} `json:"piers"`
	}
	if err := json.Unmarshal([]byte(js), &w); err != nil {
		t.Fatal(err)
	}
	_, out, _ := runCLI("solve", "../../testdata/walls/nested.toml")
	if want := "relative deflection " + report.Sig(w.Deflection) + " /(E·t), relative rigidity 0.131 E·t"; !strings.Contains(out, want) {
		t.Errorf("table lacks %q:\n%s", want, out)
	}
	if len(w.Piers) == 0 {
		t.Fatal("no piers in the JSON")
	}
	for _, p := range w.Piers {
		var row []string
		for _, l := range strings.Split(out, "\n") {
			if f := strings.Fields(l); len(f) > 0 && strings.TrimRight(f[0], "*†") == p.Name {
				row = f
			}
		}
		// pier, h, L, h/L, support, R rel, share, V, M, N
		if len(row) != 10 {
			t.Errorf("%s: row %q", p.Name, row)
			continue
		}
		want := []string{report.Sig(p.Rigidity), report.Sig(100*p.Share) + "%", report.Sig(p.Shear), report.Sig(p.Moment)}
		if got := row[5:9]; strings.Join(got, " ") != strings.Join(want, " ") {
			t.Errorf("%s: R rel, share, V, M %q, want %q", p.Name, got, want)
		}
	}
}
