package report

import (
	"bytes"
	"strings"
	"testing"

	"pierwise/basis"
	"pierwise/geometry"
)

// The report on the fe basis: the model's numbers, the classic rigidity as
// the check, the caution. The wall is the Masonry Chronicles wall of
// TestWallReportPublishedWall; its classic relative rigidity 0.1315 (from
// the published working, exact arithmetic) must stand in the check.
func TestWallReportFEBasis(t *testing.T) {
	w, err := geometry.LoadFile("../testdata/walls/nested.toml")
	if err != nil {
		t.Fatal(err)
	}
	b := basis.Solve(w, geometry.BasisFE, basis.Options{})
	if b.Err() != nil {
		t.Fatal(b.Err())
	}
	var buf bytes.Buffer
	in := Input{Path: "testdata/walls/nested.toml", Wall: w, Result: b.Classic, FE: b.FE, Basis: b, Now: reportTime, Version: "test"}
	if err := Wall(&buf, in); err != nil {
		t.Fatal(err)
	}
	got := buf.String()
	for _, want := range []string{
		"Basis:       finite-element model",
		"Check: the classic method",
		"0.131 E·t (classic method)",
		"Piers (finite-element model)",
		"Overturning: M = 320 kip·ft", // V·h = 20 kip × 16 ft
		"CAUTION",
		"local codes govern",
	} {
		if !strings.Contains(got, want) {
			t.Errorf("report lacks %q", want)
		}
	}
	// The classic working is not the basis here.
	if strings.Contains(got, "piers P1, P2 in parallel") {
		t.Error("the fe-basis report shows the classic working as its basis")
	}
	cmpGolden(t, "wall_nested_fe.golden", []byte(got))
}
