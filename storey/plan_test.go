package storey

import (
	"strings"
	"testing"
)

// In a symmetric storey the centre of rigidity is the mass centre (one '*'
// at the middle of the sketch); every wall shows its key once.
func TestPlanSymmetric(t *testing.T) {
	s, walls := symmetricStorey(DefaultAccidental)
	a, err := Analyse(s, walls)
	if err != nil {
		t.Fatal(err)
	}
	g := Plan(s, a, 41, 30)
	text := g.String()
	if strings.Count(text, "*") != 1 || strings.ContainsAny(text, "MR") {
		t.Fatalf("want one '*' where M and R coincide:\n%s", text)
	}
	// 80 ft × 50 ft at 2 ft a column and 4 ft a row: 80/2 + 1 = 41 columns,
	// round(50/4) + 1 = 14 rows; y = 25 ft is row 13 − round(6.25) = 7 from
	// the top, x = 40 ft column 20.
	if g.Cols != 41 || g.Rows != 14 || g.Cells[7][20].Ch != '*' {
		t.Errorf("grid %d×%d, centre %q:\n%s", g.Cols, g.Rows, g.Cells[7][20].Ch, text)
	}
	for i := range s.Walls {
		if strings.Count(text, string(WallKey(i))) != 1 {
			t.Errorf("wall key %c not shown once:\n%s", WallKey(i), text)
		}
	}
}
