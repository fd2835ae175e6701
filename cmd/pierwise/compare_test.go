package main

import (
	"bytes"
	"fmt"
	"os"
	"path/filepath"
	"strings"
	"testing"

	"pierwise/demo"
	"pierwise/geometry"
	"pierwise/pier"
	"pierwise/report"
)

// studyFile saves the demo wall (two layouts: "main", "wide entrance").
func studyFile(t *testing.T) string {
	t.Helper()
	path := filepath.Join(t.TempDir(), "annex.toml")
	if err := geometry.Save(path, demo.Wall()); err != nil {
		t.Fatal(err)
	}
	return path
}

func runCmd(args ...string) (int, string, string) {
	var out, errb bytes.Buffer
	code := run(&env{stdout: &out, stderr: &errb, stdin: strings.NewReader("")}, args)
	return code, out.String(), errb.String()
}

func TestCompareCommand(t *testing.T) {
	path := studyFile(t)
	code, out, errs := runCmd("compare", path+":main", path+":wide entrance")
	if code != exitOK {
		t.Fatalf("exit %d: %s", code, errs)
	}
	// The rigidities printed are those of the layouts solved on their own.
	w := demo.Wall()
	u := report.UnitsFor(w.Units)
	for i := range w.Layouts {
		w.Active = i
		r, err := pier.Solve(w)
		if err != nil {
			t.Fatal(err)
		}
		for _, want := range []string{
			report.Sig(r.Rigidity),
			report.Sig(u.RigidityOf(r.RigidityAbs)),
		} {
			if !strings.Contains(out, want) {
				t.Errorf("layout %q: %s not in the output", w.Layouts[i].Name, want)
			}
		}
	}
	flat := strings.Join(strings.Fields(out), " ")
	for _, want := range []string{"annex.toml:main", "annex.toml:wide entrance", "judgement of a licensed engineer; local codes govern"} {
		if !strings.Contains(flat, want) {
			t.Errorf("%q not in the output", want)
		}
	}
	// One file alone compares its layouts.
	code, out2, _ := runCmd("compare", path)
	if code != exitOK || !strings.Contains(out2, "annex.toml:wide entrance") {
		t.Errorf("one file: exit %d", code)
	}
}

func TestCompareCommandErrors(t *testing.T) {
	path := studyFile(t)
	for _, tc := range []struct {
		args []string
		code int
		msg  string
	}{
		{[]string{"compare"}, exitUsage, "two or more"},
		{[]string{"compare", path + ":nope", path}, exitInput, `"main", "wide entrance"`},
		{[]string{"compare", filepath.Join(t.TempDir(), "missing.toml"), path}, exitInput, "missing.toml"},
		{[]string{"compare", path, "--bogus"}, exitUsage, "bogus"},
	} {
		code, _, errs := runCmd(tc.args...)
		if code != tc.code || !strings.Contains(errs, tc.msg) {
			t.Errorf("%v: exit %d, %q; want %d and %q", tc.args, code, errs, tc.code, tc.msg)
		}
	}
}

func TestCompareCommandFE(t *testing.T) {
	path := studyFile(t)
	code, out, errs := runCmd("compare", path, "--fe", "--mesh", "1ft", "--element", "q4")
	if code != exitOK {
		t.Fatalf("exit %d: %s", code, errs)
	}
	for _, want := range []string{"FE relative rigidity", "q4 1'-0\"", "finite-element shares"} {
		if !strings.Contains(out, want) {
			t.Errorf("%q not in the output", want)
		}
	}
	if code, _, errs := runCmd("compare", path, "--mesh", "-1in"); code != exitUsage || !strings.Contains(errs, "mesh") {
		t.Errorf("negative mesh: exit %d %q", code, errs)
	}
}

// A layout that its openings cut in two is shown in the comparison ("no
// answer") and, as solve does for such a wall (README: exit status 1), the
// command exits with status 1 and names it.
func TestCompareCommandCutLayout(t *testing.T) {
	w := demo.Wall()
	// A ribbon window from end to end cuts the second layout in two.
	w.Layouts[1].Openings = []geometry.Opening{{Name: "R1", X: 0, Sill: 3 * geometry.Foot, Width: w.Length, Height: 3 * geometry.Foot}}
	path := filepath.Join(t.TempDir(), "cut.toml")
	if err := geometry.Save(path, w); err != nil {
		t.Fatal(err)
	}
	code, out, errs := runCmd("compare", path)
	// The message names the file, the line of R1's [[variant.opening]]
	// header and its key, as the parser's errors do, and the layout.
	src, err := os.ReadFile(path)
	if err != nil {
		t.Fatal(err)
	}
	line := geometry.KeyLine(src, "variant[1].opening[1]")
	want := fmt.Sprintf("cut.toml:%d: variant[1].opening[1]: opening R1 cuts the wall", line)
	if code != exitInput || !strings.Contains(out, "no answer") || !strings.Contains(errs, want) || !strings.Contains(errs, `(layout "wide entrance")`) {
		t.Errorf("exit %d, stderr %q; want 1 and %q", code, errs, want)
	}
	if lines := strings.Split(string(src), "\n"); line < 1 || !strings.Contains(lines[line-1], "[[variant.opening]]") {
		t.Errorf("line %d is not an opening header", line)
	}
}

// compare -o writes the whole comparison to OUT at once (as report -o does)
// and nothing to standard output; a path it cannot write is an error.
func TestCompareCommandOutputFile(t *testing.T) {
	path := studyFile(t)
	dir := t.TempDir()
	outFile := filepath.Join(dir, "cmp.txt")
	code, out, errs := runCmd("compare", path, "-o", outFile)
	if code != exitOK || out != "" || !strings.Contains(errs, outFile) {
		t.Fatalf("exit %d, stdout %q, stderr %q", code, out, errs)
	}
	data, err := os.ReadFile(outFile)
	if err != nil || !strings.Contains(string(data), "PIERWISE LAYOUT COMPARISON") || !strings.Contains(string(data), "local codes govern") {
		t.Errorf("file: %v\n%s", err, data)
	}
	if code, _, _ := runCmd("compare", path, "-o", filepath.Join(dir, "missing", "cmp.txt")); code != exitInput {
		t.Errorf("unwritable OUT: exit %d, want 1", code)
	}
	if entries, _ := os.ReadDir(dir); len(entries) != 1 {
		t.Errorf("%d files in the output directory, want only cmp.txt", len(entries))
	}
}

// compare -o onto one of the wall files it reads would replace the wall by
// its comparison: it is refused as a usage error and the wall is intact.
func TestCompareRefusesToOverwriteAWall(t *testing.T) {
	path := studyFile(t)
	before, err := os.ReadFile(path)
	if err != nil {
		t.Fatal(err)
	}
	code, _, errs := runCmd("compare", path, "-o", path)
	if code != exitUsage || !strings.Contains(errs, "would overwrite the wall file") {
		t.Errorf("exit %d, %q; want a usage error", code, errs)
	}
	if after, _ := os.ReadFile(path); string(after) != string(before) {
		t.Error("the wall file changed")
	}
}
