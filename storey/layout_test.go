package storey

import (
	"errors"
	"fmt"
	"math"
	"os"
	"path/filepath"
	"strings"
	"testing"

	"pierwise/geometry"
	"pierwise/pier"
)

// A [[wall]] may choose a layout of its wall file (layout = "..."); the
// storey then uses that layout's rigidity, names the wall with it, and an
// unknown layout is an error at the layout line that lists the file's
// layouts. Invented walls.
func TestWallLayoutChoice(t *testing.T) {
	dir := t.TempDir()
	front := blockWall("front", 40*ft, 14*ft, window("W1", 10*ft, 4*ft, 8*ft, 4*ft))
	front.Layouts = append(front.Layouts, geometry.Layout{Name: "wide", Openings: []geometry.Opening{window("W1", 10*ft, 4*ft, 20*ft, 4*ft)}})
	solid := blockWall("side", 30*ft, 14*ft)
	for name, w := range map[string]*geometry.Wall{"front.toml": front, "side.toml": solid} {
		w.Stiffness = geometry.Stiffness{Flexure: 1, Shear: 1}
		w.Drift = geometry.Drift{Cd: 1, Ie: 1}
		if err := geometry.Save(filepath.Join(dir, name), w); err != nil {
			t.Fatal(err)
		}
	}
	plan := `title = "t"
[storey]
shear = "100kip"
mass_center = ["20ft", "15ft"]
size = ["40ft", "30ft"]

[[wall]]
file = "front.toml"
layout = "wide"
direction = "x"
position = "0ft"

[[wall]]
file = "front.toml"
direction = "x"
position = "30ft"

[[wall]]
file = "side.toml"
direction = "y"
position = "0ft"

[[wall]]
file = "side.toml"
direction = "y"
position = "40ft"
`
	path := filepath.Join(dir, "plan.toml")
	if err := os.WriteFile(path, []byte(plan), 0o644); err != nil {
		t.Fatal(err)
	}
	a, err := Load(path)
	if err != nil {
		t.Fatal(err)
	}
	wide := front.Clone()
	wide.Active = 1
	want, err := pier.Solve(wide)
	if err != nil {
		t.Fatal(err)
	}
	if got := a.Walls[0].Unit.Rigidity; math.Abs(got-want.Rigidity) > 1e-12 {
		t.Errorf("wall 1 rigidity %g, want the wide layout's %g", got, want.Rigidity)
	}
	if a.Walls[0].Name != "front, wide" || a.Walls[1].Name == a.Walls[0].Name {
		t.Errorf("names %q and %q", a.Walls[0].Name, a.Walls[1].Name)
	}
	// The wider window makes wall 1 softer, so it takes less of the x shear.
	if a.Walls[0].Design.Direct >= a.Walls[1].Design.Direct {
		t.Errorf("direct shears %g and %g: the wide layout should take less", a.Walls[0].Design.Direct, a.Walls[1].Design.Direct)
	}

	if j := a.JSON(); j.Walls[0].Layout != "wide" || j.Walls[1].Layout != "main" {
		t.Errorf("JSON layouts %q and %q, want wide and main", j.Walls[0].Layout, j.Walls[1].Layout)
	}

	bad := strings.Replace(plan, `layout = "wide"`, `layout = "narrow"`, 1)
	if err := os.WriteFile(path, []byte(bad), 0o644); err != nil {
		t.Fatal(err)
	}
	_, err = Load(path)
	var e *Error
	if !errors.As(err, &e) || e.Line != 9 || e.Key != "wall[1].layout" || !strings.Contains(e.Msg, `"main", "wide"`) {
		t.Errorf("unknown layout: %v, want line 9, wall[1].layout, listing the layouts", err)
	}
}

// A wall that its openings cut in two is named by the storey line that
// points at it and by the line and key of the cutting opening in its own
// file, as parse errors are.
func TestCutWallNamesTheOpeningLine(t *testing.T) {
	dir := t.TempDir()
	cut := blockWall("cut", 30*ft, 14*ft, window("R1", 0, 4*ft, 30*ft, 3*ft)) // a ribbon from end to end
	cut.Stiffness = geometry.Stiffness{Flexure: 1, Shear: 1}
	cut.Drift = geometry.Drift{Cd: 1, Ie: 1}
	if err := geometry.Save(filepath.Join(dir, "cut.toml"), cut); err != nil {
		t.Fatal(err)
	}
	src, err := os.ReadFile(filepath.Join(dir, "cut.toml"))
	if err != nil {
		t.Fatal(err)
	}
	plan := "[storey]\nshear = \"100kip\"\nmass_center = [\"20ft\", \"15ft\"]\nsize = [\"40ft\", \"30ft\"]\n\n" +
		"[[wall]]\nfile = \"cut.toml\"\ndirection = \"x\"\nposition = \"0ft\"\n"
	path := filepath.Join(dir, "plan.toml")
	if err := os.WriteFile(path, []byte(plan), 0o644); err != nil {
		t.Fatal(err)
	}
	_, err = Load(path)
	want := fmt.Sprintf("cut.toml:%d: opening[1]: opening R1 cuts the wall", geometry.KeyLine(src, "opening[1]"))
	var e *Error
	if !errors.As(err, &e) || e.Line != 7 || e.Key != "wall[1].file" || !strings.Contains(e.Msg, want) {
		t.Errorf("got %v, want line 7, wall[1].file, with %q", err, want)
	}
}
