package report

import (
	"bytes"
	"fmt"
	"strings"
	"testing"

	"pierwise/geometry"
	"pierwise/study"
)

// sweepWall is an invented classroom wall: 40 ft × 12 ft cantilever, three
// 4 ft × 4 ft windows with sills at 3 ft, at 6, 18 and 30 ft.
func sweepWall(load bool) *geometry.Wall {
	ft := geometry.Foot
	w := &geometry.Wall{
		Title: "sweep", Units: geometry.US, Length: 40 * ft, Height: 12 * ft, Thickness: 7.625 * geometry.Inch,
		Support:  geometry.Cantilever,
		Material: geometry.Material{Kind: geometry.ConcreteMasonry, Strength: 2000 * geometry.PSI},
		Layouts: []geometry.Layout{{Name: "main", Openings: []geometry.Opening{
			{Name: "W1", X: 6 * ft, Sill: 3 * ft, Width: 4 * ft, Height: 4 * ft},
			{Name: "W2", X: 18 * ft, Sill: 3 * ft, Width: 4 * ft, Height: 4 * ft},
			{Name: "W3", X: 30 * ft, Sill: 3 * ft, Width: 4 * ft, Height: 4 * ft},
		}}},
	}
	if load {
		w.Load.Shear = 35 * geometry.Kip
	}
	return w
}

// The sweep table's stress column and its footnote say what ranks the
// positions: the highest pier shear stress V_i/(L_i·t) with a load, share/L
// without one.
func TestSweepTableStressOrShare(t *testing.T) {
	// With the load, at the current position the 8 ft piers P2 and P3 are
	// the most stressed. Hand arithmetic (docs/method.md §2, fixed-fixed piers 4 ft
	// high): 6 ft piers d = (2/3)³ + 3·(2/3) = 2.2963, 8 ft piers d = 0.5³ +
	// 1.5 = 1.625; share of P2 = (1/1.625) / (2/2.2963 + 2/1.625) = 0.2928;
	// τ = 35 kip × 0.2928 / (96 in × 7.625 in) = 14.0 psi.
	w := sweepWall(true)
	pts, err := study.Sweep(w, "W2", study.AlongX, 12*geometry.Foot)
	if err != nil {
		t.Fatal(err)
	}
	var b bytes.Buffer
	if err := SweepTable(&b, w, "W2", study.AlongX, 12*geometry.Foot, pts); err != nil {
		t.Fatal(err)
	}
	out := b.String()
	flat := strings.Join(strings.Fields(out), " ")
	tau := 35000 * (1 / 1.625) / (2/2.2963 + 2/1.625) / (96 * 7.625)
	want := fmt.Sprintf("%.1f P2  current", tau)
	if !strings.Contains(out, "max stress (psi)") || !strings.Contains(out, want) || !strings.Contains(flat, "shear stress V_i/(L_i t)") {
		t.Errorf("want the stress column with %q:\n%s", want, out)
	}
	// Positions of a US wall in feet-inches: W2 at 18 ft, sill 3 ft.
	if !strings.Contains(out, `18'-0"  3'-0"`) {
		t.Errorf("want the current position as 18'-0\"  3'-0\":\n%s", out)
	}

	w = sweepWall(false)
	pts, err = study.Sweep(w, "W2", study.AlongX, 12*geometry.Foot)
	if err != nil {
		t.Fatal(err)
	}
	b.Reset()
	if err := SweepTable(&b, w, "W2", study.AlongX, 12*geometry.Foot, pts); err != nil {
		t.Fatal(err)
	}
	out = b.String()
	flat = strings.Join(strings.Fields(out), " ")
	if !strings.Contains(out, "max share/L (1/ft)") || !strings.Contains(flat, "share/L_i (the wall has no load") || strings.Contains(flat, "stress V_i") {
		t.Errorf("want the share/L column and its footnote without a load:\n%s", out)
	}
}

// The sweep table's notes keep to 78 columns like the reports.
func TestSweepTableNotesWrap(t *testing.T) {
	w := sweepWall(true)
	pts, err := study.Sweep(w, "W2", study.AlongX, 4*geometry.Foot)
	if err != nil {
		t.Fatal(err)
	}
	var b bytes.Buffer
	if err := SweepTable(&b, w, "W2", study.AlongX, 4*geometry.Foot, pts); err != nil {
		t.Fatal(err)
	}
	lines := strings.Split(b.String(), "\n")
	notes := false
	for _, l := range lines {
		if l == "" {
			notes = true // the notes follow the blank line after the table
			continue
		}
		if notes && len([]rune(l)) > 78 {
			t.Errorf("note line of %d columns: %q", len([]rune(l)), l)
		}
	}
	if !notes {
		t.Error("no notes after the table")
	}
}

// A position without a classic answer says why in a few words: a ribbon
// window from end to end leaves no load path at any height.
func TestSweepTableNoAnswerReason(t *testing.T) {
	w := sweepWall(true)
	w.Layouts[0].Openings = []geometry.Opening{{Name: "R1", X: 0, Sill: 3 * geometry.Foot, Width: w.Length, Height: 2 * geometry.Foot}}
	pts, err := study.Sweep(w, "R1", study.AlongY, 4*geometry.Foot)
	if err != nil {
		t.Fatal(err)
	}
	var b bytes.Buffer
	if err := SweepTable(&b, w, "R1", study.AlongY, 4*geometry.Foot, pts); err != nil {
		t.Fatal(err)
	}
	if n := strings.Count(b.String(), "no load path: R1 cuts the wall"); n != len(pts) || n == 0 {
		t.Errorf("%d reasons for %d points:\n%s", n, len(pts), b.String())
	}
}

// With a pier design the sweep table has the governing ratio of every
// position, marks where every pier passes, and says what best means.
func TestSweepTableDesign(t *testing.T) {
	w, err := geometry.LoadFile("../testdata/walls/cmu-reinforced.toml")
	if err != nil {
		t.Fatal(err)
	}
	w.Load.Shear = 50 * geometry.Kip
	pts, err := study.Sweep(w, "W1", study.AlongX, geometry.Foot)
	if err != nil {
		t.Fatal(err)
	}
	var b strings.Builder
	if err := SweepTable(&b, w, "W1", study.AlongX, geometry.Foot, pts); err != nil {
		t.Fatal(err)
	}
	out := b.String()
	passes := 0
	for _, p := range pts {
		if p.Passes {
			passes++
		}
	}
	if got := strings.Count(out, "  passes"); got != passes {
		t.Errorf("%d passes marks for %d passing positions:\n%s", got, passes, out)
	}
	best := pts[study.BestIndex(pts)]
	if !strings.Contains(out, Ratio(best.Ratio)+" "+best.RatioPier) || !strings.Contains(out, "D/C is the wall's governing") ||
		!strings.Contains(out, "amendments govern") {
		t.Errorf("table lacks the best ratio, the rule or the caution:\n%s", out)
	}
}

// The sweep table prints the method's results to three significant figures
// (report.Sig): every position's R rel and its piers' shares are those of
// the sweep through Sig; at the current position the 8 ft piers take 29.3 %
// and the 6 ft piers 20.7 % (hand arithmetic of TestSweepTableStressOrShare:
// 0.6154 / 2.1017 and 0.4355 / 2.1017).
func TestSweepTableThreeFigures(t *testing.T) {
	w := sweepWall(true)
	pts, err := study.Sweep(w, "W2", study.AlongX, 12*geometry.Foot)
	if err != nil {
		t.Fatal(err)
	}
	var b bytes.Buffer
	if err := SweepTable(&b, w, "W2", study.AlongX, 12*geometry.Foot, pts); err != nil {
		t.Fatal(err)
	}
	rows := strings.Split(b.String(), "\n")[2:] // below the title and the heading
	n := 0
	for _, p := range pts {
		if p.Err != nil {
			continue
		}
		row := strings.Fields(rows[n])
		n++
		if row[2] != Sig(p.Rigidity) {
			t.Errorf("x %v: R rel %q, want %q", p.X, row[2], Sig(p.Rigidity))
		}
		for _, ps := range p.Piers {
			if want := Sig(100*ps.Share) + "%"; !strings.Contains(rows[n-1], " "+want) {
				t.Errorf("x %v: pier %s share %s not in %q", p.X, ps.Key, want, rows[n-1])
			}
		}
		if p.Current && (!strings.Contains(rows[n-1], " 29.3%") || !strings.Contains(rows[n-1], " 20.7%")) {
			t.Errorf("current position %q, want shares 29.3%% and 20.7%%", rows[n-1])
		}
	}
	if n == 0 {
		t.Fatal("no position answered")
	}
}
