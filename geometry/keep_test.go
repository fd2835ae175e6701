package geometry

import (
	"math/rand/v2"
	"os"
	"path/filepath"
	"strings"
	"testing"
)

func TestMarshalKeeping(t *testing.T) {
	old, err := os.ReadFile("../testdata/walls/top-openings.toml")
	if err != nil {
		t.Fatal(err)
	}
	w, err := Parse("top-openings.toml", old)
	if err != nil {
		t.Fatal(err)
	}
	ops := w.Layouts[0].Openings
	ops[0].X = 2 * Foot                                // W1 moved: its x line changes
	ops[1].Height = 11 * Foot                          // D1 lower: its commented height line changes
	w.Layouts[0].Openings = append(ops[:2:2], Opening{ // W2 removed, W3 added
		Name: "W3", X: 25 * Foot, Sill: 4 * Foot, Width: 3 * Foot, Height: 4 * Foot})
	w.Load.Shear = 30 * Kip
	w.Stiffness = Stiffness{Flexure: 0.35, Shear: 1}
	w.Layouts = append(w.Layouts, Layout{Name: "narrow door", Openings: []Opening{
		{Name: "D1", X: 13 * Foot, Width: 6 * Foot, Height: 12 * Foot}}})

	got, err := MarshalKeeping(old, w)
	if err != nil {
		t.Fatal(err)
	}
	text := string(got)
	back, err := Parse("kept.toml", got)
	if err != nil {
		t.Fatalf("kept text does not parse: %v\n%s", err, text)
	}
	if a, b := mustMarshal(t, back), mustMarshal(t, w); a != b {
		t.Fatalf("kept text reads as another wall:\n%s\n---\n%s", a, b)
	}
	for _, want := range []string{
		"# Invented scenario: a garage wall whose openings run up to the top of the",  // file comment kept
		`height = "8ft"                  # sill + height = wall height`,               // unchanged line kept verbatim
		`height = "11ft"                 # full height: cuts the wall into two piers`, // changed value, comment at its column
		`x = "2ft"`,
		`shear = "30kip"`,
		"[stiffness]\nflexure = 0.35",
		`name = "W3"`,
		"[[variant]]\nname = \"narrow door\"",
	} {
		if !strings.Contains(text, want) {
			t.Errorf("kept text lacks %q:\n%s", want, text)
		}
	}
	if strings.Contains(text, `name = "W2"`) || strings.Contains(text, `x = "3ft"`) {
		t.Errorf("removed or moved values still there:\n%s", text)
	}
	// The settings table goes before the openings, new openings after their kin.
	if i, j := strings.Index(text, "[stiffness]"), strings.Index(text, "[[opening]]"); i < 0 || i > j {
		t.Errorf("[stiffness] not placed before the openings:\n%s", text)
	}
	if i, j := strings.Index(text, `name = "W3"`), strings.Index(text, "[[variant]]"); i > j {
		t.Errorf("new opening placed after the variant:\n%s", text)
	}
	if strings.Contains(text, "\n\n\n") {
		t.Errorf("double blank lines:\n%s", text)
	}
}

func mustMarshal(t testing.TB, w *Wall) string {
	t.Helper()
	b, err := Marshal(w)
	if err != nil {
		t.Fatal(err)
	}
	return string(b)
}

// Whatever the edit, the kept text reads back as the edited wall, and for
// edits of values it keeps every comment line of the original.
func TestMarshalKeepingRandomEdits(t *testing.T) {
	rng := rand.New(rand.NewPCG(uint64(7), 0))
	kept := 0
	total := 0
	for _, f := range wallFiles(t) {
		old, err := os.ReadFile(f)
		if err != nil {
			t.Fatal(err)
		}
		for n := 0; n < 40; n++ {
			w, err := Parse(f, old)
			if err != nil {
				t.Fatal(err)
			}
			valuesOnly := randomEdit(rng, w)
			got, err := MarshalKeeping(old, w)
			if err != nil {
				t.Fatal(err)
			}
			back, err := Parse(f, got)
			if err != nil {
				t.Fatalf("%s: %v\n%s", f, err, got)
			}
			if a, b := mustMarshal(t, back), mustMarshal(t, w); a != b {
				t.Fatalf("%s: kept text reads as another wall", f)
			}
			total++
			if string(got) != mustMarshal(t, w) || !strings.Contains(string(old), "#") {
				kept++
			}
			if valuesOnly {
				for _, line := range strings.Split(string(old), "\n") {
					if strings.HasPrefix(strings.TrimSpace(line), "#") && !strings.Contains(string(got), line) {
						t.Errorf("%s: comment line %q lost after a value edit", f, line)
					}
				}
			}
		}
	}
	if kept < total*9/10 {
		t.Errorf("the original text was kept in only %d of %d saves", kept, total)
	}
}

// randomEdit changes w as an editor would and reports whether it changed
// values only (no tables added or removed).
func randomEdit(rng *rand.Rand, w *Wall) bool {
	ops := w.Openings()
	switch rng.IntN(5) {
	case 0:
		if len(ops) > 0 {
			i := rng.IntN(len(ops))
			o := ops[i]
			o.X += Length(rng.IntN(5)-2) * Inch
			if w.CheckOpening(i, o) == nil {
				ops[i] = o
			}
		}
		return true
	case 1:
		w.Load.Shear *= 1.5
		w.Title += " (rev)"
		return true
	case 2:
		if len(ops) > 0 {
			w.Layouts[w.Active].Openings = append(ops[:0:0], ops[1:]...)
		}
		return false
	case 3:
		o := Opening{Name: w.NextOpeningName(w.Active, false), X: 0, Sill: w.Height / 2, Width: w.Length / 20, Height: w.Height / 10}
		if spot, ok := w.FreeSpot(o); ok {
			w.Layouts[w.Active].Openings = append(ops, spot)
		}
		return false
	default:
		c := w.Clone()
		w.Layouts = append(w.Layouts, Layout{Name: "copy " + c.Layouts[c.Active].Name, Openings: c.Openings()})
		return false
	}
}

func TestSaveKeepsComments(t *testing.T) {
	dir := t.TempDir()
	path := filepath.Join(dir, "wall.toml")
	src, err := os.ReadFile("../testdata/walls/door.toml")
	if err != nil {
		t.Fatal(err)
	}
	if err := os.WriteFile(path, src, 0o644); err != nil {
		t.Fatal(err)
	}
	w, err := LoadFile(path)
	if err != nil {
		t.Fatal(err)
	}
	w.Layouts[0].Openings[0].X = 6 * Foot
	if err := Save(path, w); err != nil {
		t.Fatal(err)
	}
	got, _ := os.ReadFile(path)
	if !strings.Contains(string(got), `x = "6ft"                      # wall's left end to the door's left edge`) ||
		!strings.HasPrefix(string(got), "# Invented scenario") {
		t.Errorf("comments not kept:\n%s", got)
	}
	// A file that is not a wall file is simply replaced.
	if err := os.WriteFile(path, []byte("not toml ["), 0o644); err != nil {
		t.Fatal(err)
	}
	if err := Save(path, w); err != nil {
		t.Fatal(err)
	}
	if got, _ := os.ReadFile(path); string(got) != mustMarshal(t, w) {
		t.Errorf("over a broken file Save should write Marshal's text")
	}
}

// FuzzMarshalKeeping: over any old text, the kept text reads back as the
// edited wall (or Marshal's text is used), and nothing panics.
func FuzzMarshalKeeping(f *testing.F) {
	for _, name := range wallFiles(f) {
		data, err := os.ReadFile(name)
		if err != nil {
			f.Fatal(err)
		}
		f.Add(data, int64(1))
	}
	f.Add([]byte(wallText), int64(2))
	f.Fuzz(func(t *testing.T, old []byte, seed int64) {
		w, err := Parse("f", old)
		if err != nil {
			w = testWall()
		}
		randomEdit(rand.New(rand.NewPCG(uint64(seed), 0)), w)
		if w.Validate() != nil {
			return
		}
		got, err := MarshalKeeping(old, w)
		if err != nil {
			t.Fatalf("MarshalKeeping of a valid wall: %v", err)
		}
		back, err := Parse("f", got)
		if err != nil {
			t.Fatalf("kept text does not parse: %v\n%s", err, got)
		}
		if a, b := mustMarshal(t, back), mustMarshal(t, w); a != b {
			t.Fatalf("kept text reads as another wall")
		}
	})
}
