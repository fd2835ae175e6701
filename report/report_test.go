package report

import (
	"bytes"
	"fmt"
	"math"
	"strings"
	"testing"
	"time"

	"pierwise/demo"
	"pierwise/geometry"
	"pierwise/pier"
	"pierwise/pier/fe"
)

var reportTime = time.Date(2026, 12, 1, 9, 30, 0, 0, time.UTC)

func wallReport(t *testing.T, w *geometry.Wall, path string) string {
	t.Helper()
	res, err := pier.Solve(w)
	var buf bytes.Buffer
	in := Input{Path: path, Wall: w, Result: res, Err: err, Now: reportTime, Version: "test"}
	if err := Wall(&buf, in); err != nil {
		t.Fatal(err)
	}
	return buf.String()
}

// The Masonry Chronicles wall with a nested opening (Concrete Masonry
// Association of California and Nevada; geometry as in docs/method.md §2): the
// report must show the published working — solid 5.476, strip 1.421,
// piers 3.559, wall 7.614 (printed; exact arithmetic gives 7.607).
func TestWallReportPublishedWall(t *testing.T) {
	w, err := geometry.LoadFile("../testdata/walls/nested.toml")
	if err != nil {
		t.Fatal(err)
	}
	got := wallReport(t, w, "testdata/walls/nested.toml")
	for _, want := range []string{
		// Three significant figures (docs/method.md §1); the solver's own
		// tests check these to 0.2 % against the published figures.
		"5.48",  // solid wall, 4(16/18)³ + 3(16/18) = 5.476; printed 5.476
		"1.42",  // strip 0…8 ft, fixed: (8/18)³ + 3(8/18) = 1.421
		"3.55",  // piers P1 and P2 in parallel, 3.5517 (printed 3.559 carries rounding)
		"7.61",  // wall, 7.6066; printed 7.614
		"0.131", // relative rigidity; printed 0.131
		"CAUTION",
		"local codes govern",
	} {
		if !strings.Contains(got, want) {
			t.Errorf("report lacks %q", want)
		}
	}
	cmpGolden(t, "wall_nested.golden", []byte(got))
}

func TestWallReportDemo(t *testing.T) {
	got := wallReport(t, demo.Wall(), "")
	if strings.Contains(got, "NaN") || strings.Contains(got, "Inf") {
		t.Fatalf("report prints a non-number:\n%s", got)
	}
	for _, want := range []string{"built-in demo wall", "Drift limit", "OK", "P1.2.1"} {
		if !strings.Contains(got, want) {
			t.Errorf("demo report lacks %q", want)
		}
	}
	cmpGolden(t, "wall_demo.golden", []byte(got))
}

// A wall cut in two by a full-height opening has no answer: the report says
// which opening cuts it instead of printing numbers.
func TestWallReportCutWall(t *testing.T) {
	w := demo.Wall()
	w.Layouts[0].Openings = append(w.Layouts[0].Openings, geometry.Opening{Name: "SLOT", X: 0, Sill: 10 * geometry.Foot, Width: w.Length, Height: 2 * geometry.Foot})
	got := wallReport(t, w, "")
	if !strings.Contains(got, "cannot be applied") || !strings.Contains(got, "SLOT") {
		t.Errorf("cut wall report does not explain the cut:\n%s", got)
	}
	if strings.Contains(got, "NaN") || strings.Contains(got, "Inf") {
		t.Errorf("cut wall report prints a non-number")
	}
}

// The FE section shows the model, the comparison in words and, past the
// threshold, the warning; the numbers are fe.Solve's own.
func TestWallReportFE(t *testing.T) {
	w, err := geometry.LoadFile("../testdata/walls/windows-band.toml")
	if err != nil {
		t.Fatal(err)
	}
	res, err := pier.Solve(w)
	if err != nil {
		t.Fatal(err)
	}
	f, err := fe.Solve(w, res, fe.Options{})
	if err != nil {
		t.Fatal(err)
	}
	var buf bytes.Buffer
	if err := Wall(&buf, Input{Path: "windows-band.toml", Wall: w, Result: res, FE: f, Now: reportTime, Version: "test"}); err != nil {
		t.Fatal(err)
	}
	got := buf.String()
	for _, want := range []string{
		"Finite-element check",
		Sig(f.Deflection) + " /(E·t)",
		"the classic rigidity is " + ClassicVersusFE(f.Difference),
	} {
		if !strings.Contains(got, want) {
			t.Errorf("report lacks %q", want)
		}
	}
	warned := strings.Contains(got, "differs from the finite-element model's")
	if over := math.Abs(f.Difference) > fe.WarnDifference; over != warned {
		t.Errorf("difference %.3f against threshold %.2f: warned %v", f.Difference, fe.WarnDifference, warned)
	}
}

func TestClassicVersusFE(t *testing.T) {
	for _, tc := range []struct {
		d    float64
		want string
	}{{0.342, "34.2 % higher than"}, {-0.05, "5.0 % lower than"}, {0.0001, "equal to"}} {
		if got := ClassicVersusFE(tc.d); got != tc.want {
			t.Errorf("ClassicVersusFE(%g) = %q, want %q", tc.d, got, tc.want)
		}
	}
}

func TestFraction(t *testing.T) {
	for _, tc := range []struct {
		x    float64
		want string
	}{{0.01, "0.0100"}, {0.025, "0.0250"}, {0.0075, "0.00750"}, {0.0001, "0.000100"}, {0.0125, "0.0125"}, {0.007, "0.00700"},
		// A drift ratio keeps its trailing zero beside one that has none.
		{0.000170, "0.000170"}, {0.000218, "0.000218"}, {0.0002184, "0.000218"}, {0, "0"}} {
		if got := Fraction(tc.x); got != tc.want {
			t.Errorf("Fraction(%g) = %q, want %q", tc.x, got, tc.want)
		}
	}
}

// A pier that its own openings cut (a door beside a window that runs to the
// wall's end) carries nothing: the report marks it and prints no rigidity,
// split or forces for it.
func TestWallReportCutPier(t *testing.T) {
	ft := geometry.Foot
	w := &geometry.Wall{
		Title: "cut pier (invented)", Length: 20 * ft, Height: 10 * ft, Thickness: 8 * geometry.Inch,
		Material: geometry.Material{Kind: geometry.ConcreteMasonry, Strength: 2000 * geometry.PSI},
		Load:     geometry.Load{Shear: 10 * geometry.Kip},
		Layouts: []geometry.Layout{{Name: "main", Openings: []geometry.Opening{
			{Name: "D1", X: 4 * ft, Width: 4 * ft, Height: 8 * ft},
			{Name: "W1", X: 8 * ft, Sill: 2 * ft, Width: 12 * ft, Height: 4 * ft},
		}}},
	}
	got := wallReport(t, w, "")
	var cutLines int
	for _, l := range strings.Split(got, "\n") {
		if strings.HasPrefix(strings.TrimSpace(l), "P2†") {
			cutLines++
			if !strings.Contains(l, " -") || strings.Contains(l, "0.0000") {
				t.Errorf("cut pier row shows numbers: %q", l)
			}
		}
	}
	if cutLines != 2 || !strings.Contains(got, "† pier that its own openings cut") {
		t.Errorf("cut pier P2 not marked in both tables (%d rows) or not explained:\n%s", cutLines, got)
	}
}

// When the classic method has no answer (staggered openings), the FE model
// is the only one: the report gives its rigidity, deflection and drift in
// real units, from fe.Solve's own result.
func TestWallReportFEOnly(t *testing.T) {
	ft := geometry.Foot
	w := &geometry.Wall{
		Title: "staggered (invented)", Length: 10 * ft, Height: 10 * ft, Thickness: 8 * geometry.Inch,
		Material: geometry.Material{Kind: geometry.ConcreteMasonry, Strength: 2000 * geometry.PSI},
		Load:     geometry.Load{Shear: 10 * geometry.Kip},
		Layouts: []geometry.Layout{{Name: "main", Openings: []geometry.Opening{
			{Name: "W1", X: 0, Sill: 2 * ft, Width: 5 * ft, Height: 2 * ft},
			{Name: "W2", X: 6 * ft, Sill: 3.5 * ft, Width: 4 * ft, Height: 2 * ft},
			{Name: "W3", X: 5 * ft, Sill: 5 * ft, Width: 1 * ft, Height: 2 * ft},
		}}},
	}
	res, classicErr := pier.Solve(w)
	if res != nil || classicErr == nil {
		t.Fatalf("want the classic method to fail on staggered openings, got %v", classicErr)
	}
	f, err := fe.Solve(w, nil, fe.Options{})
	if err != nil {
		t.Fatal(err)
	}
	if !f.HasLoad || !(f.RigidityAbs > 0) || !(f.DeflectionAbs > 0) {
		t.Fatalf("FE result without real units: %+v", f)
	}
	var buf bytes.Buffer
	if err := Wall(&buf, Input{Wall: w, Err: classicErr, FE: f, Now: reportTime, Version: "test"}); err != nil {
		t.Fatal(err)
	}
	u := UnitsFor(geometry.US)
	got := buf.String()
	for _, want := range []string{"staggered", "the only answer", "R = " + Sig(u.RigidityOf(f.RigidityAbs)), "δe = " + Sig(u.DeflectionOf(f.DeflectionAbs)), "CAUTION"} {
		if !strings.Contains(got, want) {
			t.Errorf("report lacks %q:\n%s", want, got)
		}
	}
}

func TestGrouped(t *testing.T) {
	for v, want := range map[float64]string{0: "0", 999: "999", 1000: "1,000", 752179464.986: "752,179,465", -12989.5: "-12,990", 0.4: "0"} {
		if got := Grouped(v); got != want {
			t.Errorf("Grouped(%g) = %q, want %q", v, got, want)
		}
	}
}

// A title and an opening name holding escape sequences, BEL and NUL reach
// the report escaped (regression: a title cleared the screen and set the
// terminal's title).
func TestReportShowsControlCharactersEscaped(t *testing.T) {
	var b strings.Builder
	tx := NewText(&b)
	tx.KV("Title", "Hi\x1b]0;PWNED\a\x1b[2J\x00")
	tx.Line("D\x1b[31m1")
	out := b.String()
	for _, c := range out {
		if c < 0x20 && c != '\n' || c == 0x7f {
			t.Fatalf("report holds control character %U: %q", c, out)
		}
	}
	if !strings.Contains(out, `Hi\x1b]0;PWNED\a\x1b[2J\x00`) || !strings.Contains(out, `D\x1b[31m1`) {
		t.Errorf("escapes not shown: %q", out)
	}
}

// A report is cut into sheets of SheetLines lines, each headed by the
// project and "sheet k of n", separated by form feeds.
func TestWallReportSheets(t *testing.T) {
	w := demo.Wall()
	res, err := pier.Solve(w)
	if err != nil {
		t.Fatal(err)
	}
	var b strings.Builder
	if err := Wall(&b, Input{Wall: w, Result: res, Now: time.Date(2026, 1, 2, 3, 4, 0, 0, time.UTC), Version: "test"}); err != nil {
		t.Fatal(err)
	}
	sheets := strings.Split(b.String(), "\f")
	if len(sheets) < 2 {
		t.Fatalf("%d sheet(s), want the demo report on several", len(sheets))
	}
	for k, s := range sheets {
		lines := strings.Split(strings.TrimSuffix(s, "\n"), "\n")
		if len(lines) > SheetLines {
			t.Errorf("sheet %d has %d lines, more than %d", k+1, len(lines), SheetLines)
		}
		if want := fmt.Sprintf("sheet %d of %d", k+1, len(sheets)); !strings.HasSuffix(lines[1], want) {
			t.Errorf("sheet %d heading %q, want it to end with %q", k+1, lines[1], want)
		}
		if !strings.Contains(lines[0], "project Library annex (invented) · job DEMO-01") {
			t.Errorf("sheet %d project line %q", k+1, lines[0])
		}
	}
}

// The gravity line prints every load with one formatting, three significant
// figures (docs/method.md §1): 12 and 5 kN/m read "12.0" and "5.00", not
// "12.00" beside "5". The values are invented for the check.
func TestWallReportGravityOneFormatting(t *testing.T) {
	w, err := geometry.LoadFile("../testdata/walls/si.toml")
	if err != nil {
		t.Fatal(err)
	}
	w.Gravity.Dead = 12 * geometry.KilonewtonPerMetre
	w.Gravity.Live = 5 * geometry.KilonewtonPerMetre
	got := gravityLine(w)
	for _, want := range []string{"dead 12.0 kN/m", "live 5.00 kN/m"} {
		if !strings.Contains(got, want) {
			t.Errorf("gravity line %q lacks %q", got, want)
		}
	}
	if strings.Contains(got, "12.00") {
		t.Errorf("gravity line %q mixes precisions", got)
	}
}
