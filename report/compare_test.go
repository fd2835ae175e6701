package report

import (
	"bytes"
	"fmt"
	"strings"
	"testing"
	"time"

	"pierwise/geometry"
	"pierwise/internal/testkit"
	"pierwise/pier/fe"
	"pierwise/study"
)

// cmpTestWall is an invented wall (not a published example): 30 ft by 12 ft
// concrete masonry with a door and two windows, and a variant in which the
// second window has moved to the right end and become a door.
func cmpTestWall() *geometry.Wall {
	ft := geometry.Foot
	main := []geometry.Opening{
		{Name: "D1", X: 3 * ft, Width: 3 * ft, Height: 7 * ft},
		{Name: "W1", X: 10 * ft, Sill: 3 * ft, Width: 5 * ft, Height: 4 * ft},
		{Name: "W2", X: 19 * ft, Sill: 3 * ft, Width: 5 * ft, Height: 4 * ft},
	}
	moved := append([]geometry.Opening(nil), main...)
	moved[2] = geometry.Opening{Name: "W2", X: 25 * ft, Sill: 0, Width: 5 * ft, Height: 7 * ft}
	return &geometry.Wall{
		Title: "Test wall", Units: geometry.US,
		Length: 30 * ft, Height: 12 * ft, Thickness: 7.625 * geometry.Inch,
		Support:   geometry.Cantilever,
		Material:  geometry.Material{Kind: geometry.ConcreteMasonry, Strength: 2000 * geometry.PSI},
		Load:      geometry.Load{Shear: 30 * geometry.Kip},
		Stiffness: geometry.Stiffness{Flexure: 1, Shear: 1},
		Drift:     geometry.Drift{Cd: 3.5, Ie: 1, Limit: 0.010},
		Layouts:   []geometry.Layout{{Name: "main", Openings: main}, {Name: "W2 at the end", Openings: moved}},
	}
}

func cmpGolden(t *testing.T, name string, got []byte) {
	t.Helper()
	testkit.Golden(t, name, string(got))
}

func TestCompareReportGolden(t *testing.T) {
	w := cmpTestWall()
	c, err := study.Compare(study.WithLayout(w, 0), study.WithLayout(w, 1))
	if err != nil {
		t.Fatal(err)
	}
	c.Before.Path, c.After.Path = "test.toml", "test.toml"
	var buf bytes.Buffer
	if err := CompareReport(&buf, c, CompareInfo{Now: time.Date(2026, 12, 1, 23, 0, 0, 0, time.UTC), Version: "test"}); err != nil {
		t.Fatal(err)
	}
	cmpGolden(t, "compare_test_wall.golden", buf.Bytes())
	text := strings.Join(strings.Fields(buf.String()), " ")
	if !strings.Contains(text, "do not replace, the judgement of a licensed engineer; local codes govern") {
		t.Error("no caution")
	}
	// The pier right of W2 vanishes when W2 moves to the wall's end; the
	// warning says where it was, in the wall's units.
	if !strings.Contains(text, "vanishes") || !strings.Contains(text, `Pier P2.3 of main (x 24'-0" to 30'-0") has no counterpart`) {
		t.Error("no vanishing pier called out with its place")
	}
	// Every line but the shared caution keeps the 78-column margin.
	for _, l := range strings.Split(buf.String(), "\n") {
		if n := len([]rune(l)); n > 78 && !strings.Contains(Caution, l) {
			t.Errorf("line of %d columns: %q", n, l)
		}
	}
}

func TestCompareReportCutLayout(t *testing.T) {
	w := cmpTestWall()
	cut := w.Clone()
	// A ribbon window along the whole length: no path from base to top.
	cut.Layouts = []geometry.Layout{{Name: "cut", Openings: []geometry.Opening{
		{Name: "W9", X: 0, Sill: 3 * geometry.Foot, Width: 30 * geometry.Foot, Height: 2 * geometry.Foot},
	}}}
	cut.Active = 0
	c, err := study.Compare(w, cut)
	if err != nil {
		t.Fatal(err)
	}
	var buf bytes.Buffer
	if err := CompareReport(&buf, c, CompareInfo{}); err != nil {
		t.Fatal(err)
	}
	text := buf.String()
	for _, want := range []string{"no answer", "W9", "No pier table"} {
		if !strings.Contains(text, want) {
			t.Errorf("report of a cut layout lacks %q:\n%s", want, text)
		}
	}
	for _, bad := range []string{"NaN", "Inf"} {
		if strings.Contains(text, bad) {
			t.Errorf("report prints %s", bad)
		}
	}
}

// The differences table equals the numbers of the two layouts solved apart.
func TestCompareRowsMatchResults(t *testing.T) {
	w := cmpTestWall()
	c, err := study.Compare(study.WithLayout(w, 0), study.WithLayout(w, 1))
	if err != nil {
		t.Fatal(err)
	}
	var rel *CompareRow
	rows := CompareRows(c)
	for i := range rows {
		if strings.HasPrefix(rows[i].Quantity, "Relative rigidity") {
			rel = &rows[i]
		}
	}
	if rel == nil {
		t.Fatal("no relative rigidity row")
	}
	if rel.Before != Sig(c.Before.Result.Rigidity) || rel.After != Sig(c.After.Result.Rigidity) {
		t.Errorf("row %+v, results %g %g", *rel, c.Before.Result.Rigidity, c.After.Result.Rigidity)
	}
}

// With the FE check the report carries each side's FE rigidity and shares,
// as computed (no golden file: the FE numbers belong to package fe).
func TestCompareReportFE(t *testing.T) {
	w := cmpTestWall()
	opt := study.Options{FE: true, FEOptions: fe.Options{Mesh: geometry.Foot}}
	c, err := study.CompareWith(study.WithLayout(w, 0), study.WithLayout(w, 1), opt)
	if err != nil {
		t.Fatal(err)
	}
	if c.Before.FE == nil || c.After.FE == nil {
		t.Fatalf("FE: %v / %v", c.Before.FEErr, c.After.FEErr)
	}
	var buf bytes.Buffer
	if err := CompareReport(&buf, c, CompareInfo{}); err != nil {
		t.Fatal(err)
	}
	text := buf.String()
	for _, want := range []string{
		"FE relative rigidity", Sig(c.Before.FE.Rigidity), Sig(c.After.FE.Rigidity),
		"Leaf piers, finite-element shares", cmpShare(c.Before.FE.Piers[0].Share),
	} {
		if !strings.Contains(text, want) {
			t.Errorf("report lacks %q:\n%s", want, text)
		}
	}
	// The classic rigidity against the FE one, in words, from the two
	// relative rigidities of each layout.
	for _, s := range []*study.Side{&c.Before, &c.After} {
		d := 100 * (s.Result.Rigidity/s.FE.Rigidity - 1)
		word := "higher"
		if d < 0 {
			word, d = "lower", -d
		}
		if want := fmt.Sprintf("%.1f %% %s", d, word); !strings.Contains(text, want) {
			t.Errorf("report lacks %q in the Classic vs FE row:\n%s", want, text)
		}
	}
}

// Against a layout without openings every pier vanishes, and the warning
// says the wall is one solid pier there rather than pointing at piers that
// do not exist.
func TestCompareWarningsSolidLayout(t *testing.T) {
	w := cmpTestWall()
	w.Layouts[1].Openings = nil
	c, err := study.Compare(study.WithLayout(w, 0), study.WithLayout(w, 1))
	if err != nil {
		t.Fatal(err)
	}
	text := strings.Join(CompareWarnings(c), "\n")
	if !strings.Contains(text, "that layout has no openings, so the whole wall works as one solid pier") || strings.Contains(text, "check its reinforcement against the piers of") {
		t.Errorf("warnings:\n%s", text)
	}
}

// The comparison is printed on sheets like the wall report: every sheet
// headed by the walls' project and "sheet k of n"; several comparisons
// (the first layout against each other one) each begin a sheet of their
// own, numbered through.
func TestCompareReportSheets(t *testing.T) {
	w := cmpTestWall()
	w.Project = geometry.Project{Name: "Test building (invented)", Job: "T-12", Engineer: "A. Engineer"}
	third := w.Layouts[1]
	third.Name = "no W1"
	third.Openings = append([]geometry.Opening{third.Openings[0]}, third.Openings[2:]...)
	w.Layouts = append(w.Layouts, third)
	var cs []*study.Comparison
	for i := 1; i < 3; i++ {
		c, err := study.Compare(study.WithLayout(w, 0), study.WithLayout(w, i))
		if err != nil {
			t.Fatal(err)
		}
		cs = append(cs, c)
	}
	var one, two bytes.Buffer
	if err := CompareReport(&one, cs[0], CompareInfo{}); err != nil {
		t.Fatal(err)
	}
	if err := CompareReports(&two, cs, CompareInfo{}); err != nil {
		t.Fatal(err)
	}
	nOne := len(strings.Split(one.String(), "\f"))
	sheets := strings.Split(two.String(), "\f")
	if len(sheets) < 2*nOne {
		t.Fatalf("two comparisons on %d sheets, one on %d: each should begin a sheet", len(sheets), nOne)
	}
	titles := 0
	for k, s := range sheets {
		lines := strings.Split(strings.TrimSuffix(s, "\n"), "\n")
		if len(lines) > SheetLines {
			t.Errorf("sheet %d has %d lines, more than %d", k+1, len(lines), SheetLines)
		}
		if want := fmt.Sprintf("sheet %d of %d", k+1, len(sheets)); !strings.HasSuffix(lines[1], want) {
			t.Errorf("sheet %d heading %q, want it to end with %q", k+1, lines[1], want)
		}
		if !strings.HasPrefix(lines[0], "project Test building (invented) · job T-12 · engineer A. Engineer") {
			t.Errorf("sheet %d project line %q", k+1, lines[0])
		}
		// A comparison begins right under the heading of its sheet.
		if len(lines) > 4 && lines[4] == "PIERWISE LAYOUT COMPARISON" {
			titles++
		}
	}
	if titles != 2 {
		t.Errorf("%d comparisons begin a sheet, want 2", titles)
	}
	if err := CompareReports(&two, nil, CompareInfo{}); err == nil {
		t.Error("no comparison: no error")
	}
}

// A break line in the body ends the sheet; the numbering runs through.
func TestPaginateSheetBreak(t *testing.T) {
	var b strings.Builder
	if err := Paginate(&b, "a\nb\n"+SheetBreak+"\nc\n", Heading{Subject: "s"}); err != nil {
		t.Fatal(err)
	}
	sheets := strings.Split(b.String(), "\f")
	if len(sheets) != 2 {
		t.Fatalf("%d sheets, want 2:\n%q", len(sheets), b.String())
	}
	if !strings.HasSuffix(sheets[0], "\na\nb\n") || !strings.HasSuffix(sheets[1], "\nc\n") || !strings.Contains(sheets[1], "sheet 2 of 2") {
		t.Errorf("sheets %q", sheets)
	}
}
