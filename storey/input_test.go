package storey

import (
	"errors"
	"math"
	"os"
	"path/filepath"
	"strings"
	"testing"
	"time"

	"pierwise/geometry"
)

// writeStorey writes two invented block walls (a.toml, 40 ft with a window;
// b.toml, 20 ft solid) and the storey text into a temporary directory and
// returns the storey file's path.
func writeStorey(t *testing.T, storeyText string) string {
	t.Helper()
	dir := t.TempDir()
	for name, w := range map[string]*geometry.Wall{
		"a.toml": blockWall("front", 40*ft, 14*ft, window("W1", 10*ft, 4*ft, 8*ft, 4*ft)),
		"b.toml": blockWall("side", 20*ft, 14*ft),
	} {
		w.Stiffness = geometry.Stiffness{Flexure: 1, Shear: 1}
		w.Drift = geometry.Drift{Cd: 1, Ie: 1}
		if err := geometry.Save(filepath.Join(dir, name), w); err != nil {
			t.Fatal(err)
		}
	}
	path := filepath.Join(dir, "plan.toml")
	if err := os.WriteFile(path, []byte(storeyText), 0o644); err != nil {
		t.Fatal(err)
	}
	return path
}

const boxStorey = `title = "box"
[storey]
shear = "100kip"
mass_center = ["20ft", "10ft"]
size = ["40ft", "20ft"]
diaphragm = "flexible"

[[wall]]
file = "a.toml"
direction = "x"
position = "0ft"

[[wall]]
file = "a.toml"
direction = "x"
position = "20ft"

[[wall]]
file = "b.toml"
direction = "y"
position = "0ft"

[[wall]]
file = "b.toml"
direction = "y"
position = "40ft"
`

// A flexible diaphragm with a single line of y-walls is refused at the
// diaphragm key, naming the file and its line.
func TestFlexibleSingleLineError(t *testing.T) {
	text := strings.Replace(boxStorey, "position = \"40ft\"", "position = \"0ft\"\nstart = \"0ft\"", 1)
	path := writeStorey(t, text)
	_, err := Load(path)
	var e *Error
	if !errors.As(err, &e) || e.File != path || e.Line != 6 || e.Key != "storey.diaphragm" || !strings.Contains(e.Msg, "y-wall stands on one line") {
		t.Errorf("got %v, want %s:6: storey.diaphragm about one line of y-walls", err, path)
	}
	// The same plan with a rigid diaphragm cannot resist torsion either,
	// but a flexible one with two lines each way works.
	if _, err := Load(writeStorey(t, boxStorey)); err != nil {
		t.Errorf("box storey: %v", err)
	}
}

// A flexible box storey by hand: the two x-lines at y = 0 and 20 ft of a
// 20 ft deep plan share 100 kip as 50/50 with the mass at mid-depth, and
// the y-lines at x = 0 and 40 ft likewise (tributary spans, common
// practice). The envelope takes each wall's larger of rigid and flexible.
func TestFlexibleAndEnvelopeStorey(t *testing.T) {
	a, err := Load(writeStorey(t, boxStorey))
	if err != nil {
		t.Fatal(err)
	}
	for _, w := range a.Walls {
		if !near(w.Design.Shear, 50*float64(geometry.Kip), 1e-9) || w.Design.Case != CaseFlexible {
			t.Errorf("%s: design %g N (case %d), want 50 kip, flexible", w.Name, w.Design.Shear, w.Design.Case)
		}
		if w.Loaded == nil || len(w.Piers) == 0 && len(w.Loaded.Leaves()) > 0 {
			t.Errorf("%s: the design shear did not flow into the piers", w.Name)
		}
		for _, p := range w.Piers {
			if !near(float64(p.Shear), p.Share*w.Design.Shear, 1e-9) {
				t.Errorf("%s %s: %g, want share × design", w.Name, p.Name, float64(p.Shear))
			}
		}
	}
	env := strings.Replace(boxStorey, `"flexible"`, `"envelope"`, 1)
	a, err = Load(writeStorey(t, env))
	if err != nil {
		t.Fatal(err)
	}
	for _, w := range a.Walls {
		want := math.Max(w.Rigid.Shear, w.Flexible)
		if !near(w.Design.Shear, want, 1e-12) {
			t.Errorf("%s: envelope %g, want max(%g, %g)", w.Name, w.Design.Shear, w.Rigid.Shear, w.Flexible)
		}
	}
	var b strings.Builder
	if err := Report(&b, a, time.Date(2026, 12, 2, 0, 0, 0, 0, time.UTC), ""); err != nil {
		t.Fatal(err)
	}
	for _, want := range []string{"Flexible diaphragm: shear to the wall lines", "the larger of rigid and flexible", "common practice"} {
		if !strings.Contains(b.String(), want) {
			t.Errorf("envelope report lacks %q", want)
		}
	}
}

// A wall given by its rigidity takes V·R/ΣR with the others' absolute
// rigidities (rigid diaphragm, Taly 2nd ed. §7.9), is shown as given, and
// cannot sit beside walls whose rigidity is only relative.
func TestRigidityWall(t *testing.T) {
	text := strings.Replace(boxStorey, `diaphragm = "flexible"`, "", 1)
	text = strings.Replace(text, "file = \"b.toml\"\ndirection = \"y\"\nposition = \"40ft\"",
		"name = \"braced frame\"\nrigidity = \"500kip/in\"\ndirection = \"y\"\nposition = \"40ft\"\nlength = \"10ft\"", 1)
	path := writeStorey(t, text)
	a, err := Load(path)
	if err != nil {
		t.Fatal(err)
	}
	frame, side := a.Walls[3], a.Walls[2]
	R := 500 * float64(geometry.Kip) / float64(geometry.Inch)
	if !near(frame.Rigidity, R, 1e-12) || frame.Wall != nil || frame.Name != "braced frame" {
		t.Fatalf("frame %+v", frame)
	}
	V := float64(a.Storey.Shear)
	if want := V * R / (R + side.Rigidity); !near(frame.Design.Direct, want, 1e-9) {
		t.Errorf("frame direct %g, want V·R/ΣR = %g", frame.Design.Direct, want)
	}
	j := a.JSON()
	if !j.Walls[3].RigidityGiven || j.Walls[3].File != "" || j.Walls[3].Rigidity == nil || !near(*j.Walls[3].Rigidity, 500, 1e-9) {
		t.Errorf("JSON frame %+v", j.Walls[3])
	}
	var b strings.Builder
	if err := Report(&b, a, time.Now(), ""); err != nil {
		t.Fatal(err)
	}
	if !strings.Contains(b.String(), "(given by rigidity)") || !strings.Contains(b.String(), "braced frame (given by rigidity), design shear") {
		t.Errorf("report does not show the frame as given by rigidity")
	}
	// A wall with no modulus beside it (as the editor may hold one): an
	// error naming that wall.
	st, walls, err := LoadFiles(path)
	if err != nil {
		t.Fatal(err)
	}
	walls[2].Material = geometry.Material{Kind: geometry.ConcreteMasonry}
	_, err = Analyse(st, walls)
	var e *Error
	if !errors.As(err, &e) || e.Key != "wall[3].file" || !strings.Contains(e.Msg, "no modulus") {
		t.Errorf("relative wall beside a given rigidity: %v", err)
	}
}

// A storey that points at something that is not a wall file says where the
// errors are without quoting the file, and refuses what is not a regular
// file before reading it.
func TestWallFileErrorsDoNotEchoContent(t *testing.T) {
	path := writeStorey(t, strings.Replace(boxStorey, `file = "b.toml"`, `file = "secret.txt"`, 1))
	secret := "token = \"hunter2-do-not-print\"\n[[opening]]\nwho = \"also-private\"\n"
	if err := os.WriteFile(filepath.Join(filepath.Dir(path), "secret.txt"), []byte(secret), 0o644); err != nil {
		t.Fatal(err)
	}
	_, err := Load(path)
	if err == nil || strings.Contains(err.Error(), "hunter2") || strings.Contains(err.Error(), "private") || strings.Contains(err.Error(), "token") {
		t.Fatalf("error %q echoes the file", err)
	}
	if !strings.Contains(err.Error(), path+":19: wall[3].file") || !strings.Contains(err.Error(), "not a valid wall file") {
		t.Errorf("error %q does not name the storey line", err)
	}
	if _, err := os.Stat("/dev/zero"); err != nil {
		t.Skip("no /dev/zero here")
	}
	path = writeStorey(t, strings.Replace(boxStorey, `file = "b.toml"`, `file = "/dev/zero"`, 1))
	if _, err := Load(path); err == nil || !strings.Contains(err.Error(), "not a regular file") {
		t.Errorf("/dev/zero: %v", err)
	}
}

// On the fe basis every wall's rigidity is the finite-element model's, the
// classic one stays beside it, and the design shear flows into the piers by
// the model's shares.
func TestFEBasis(t *testing.T) {
	text := strings.Replace(boxStorey, `diaphragm = "flexible"`, `basis = "fe"`, 1)
	a, err := Load(writeStorey(t, text))
	if err != nil {
		t.Fatal(err)
	}
	for _, w := range a.Walls {
		if w.FE == nil || !near(w.Rigidity, w.FE.RigidityAbs, 1e-12) || !near(w.ClassicRigidity, w.Unit.RigidityAbs, 1e-12) {
			t.Fatalf("%s: rigidity %g, FE %v, classic %g", w.Name, w.Rigidity, w.FE, w.ClassicRigidity)
		}
		sum := 0.0
		for _, p := range w.Piers {
			sum += p.Share
			if !near(float64(p.Shear), p.Share*w.Design.Shear, 1e-9) {
				t.Errorf("%s %s: shear %g, want FE share × design", w.Name, p.Name, float64(p.Shear))
			}
		}
		// One band of piers (the window wall): the model's pier shears at
		// mid-height carry the whole wall shear (equilibrium).
		if len(w.Piers) > 0 && !near(sum, 1, 1e-6) {
			t.Errorf("%s: FE pier shares sum to %g, want 1", w.Name, sum)
		}
	}
	var b strings.Builder
	if err := Report(&b, a, time.Now(), ""); err != nil {
		t.Fatal(err)
	}
	if !strings.Contains(b.String(), "Rigidity by each model") || !strings.Contains(b.String(), "classic - FE") {
		t.Errorf("fe report lacks the side-by-side rigidities")
	}
}

// Storey drift from the diaphragm displacements: at a wall
// δ = Cd·(V_i/R_i)/Ie for its worst case; at an edge δ = Cd·δe/Ie
// (ASCE 7-22 §12.8.6), against limit × h (Table 12.12-1, 0.007 h for
// other masonry shear wall structures).
func TestStoreyDrift(t *testing.T) {
	text := strings.Replace(boxStorey, `diaphragm = "flexible"`, "cd = 3.5\nie = 1.25\nheight = \"14ft\"\ndrift_limit = \"masonry-other\"", 1)
	a, err := Load(writeStorey(t, text))
	if err != nil {
		t.Fatal(err)
	}
	h := 14 * float64(ft)
	for i, w := range a.Walls {
		worst := 0.0
		for _, c := range a.Distribution.Cases {
			worst = math.Max(worst, math.Abs(c.Shares[i].Total()))
		}
		want := 3.5 * worst / w.Rigidity / 1.25
		if !w.Drift.Checked || !near(w.Drift.Design, want, 1e-12) || !near(w.Drift.Allowable, 0.007*h, 1e-12) || w.Drift.OK != (want <= 0.007*h) {
			t.Errorf("%s: drift %+v, want %g of %g", w.Name, w.Drift, want, 0.007*h)
		}
	}
	if len(a.Edges) != 8 {
		t.Fatalf("%d edge drifts, want 2 per case", len(a.Edges))
	}
	for _, e := range a.Edges {
		c := a.Distribution.Cases[e.Case]
		k := 0
		if e.Edge == "north" || e.Edge == "east" {
			k = 1
		}
		if want := 3.5 * math.Abs(c.Edges[k]) / 1.25; !near(e.Drift.Design, want, 1e-12) {
			t.Errorf("%s %s: %g, want %g", c.Name(), e.Edge, e.Drift.Design, want)
		}
	}
	if j := a.JSON(); j.StoreyDrift == nil || len(j.StoreyDrift.Edges) != 8 || j.Walls[0].StoreyDrift == nil || len(j.TorsionalIrregularity) != 4 {
		t.Errorf("JSON lacks the storey drift or the irregularity")
	}
}

// A wall at an angle given by its rigidity: it takes part in the rigid
// diaphragm, the JSON places it by angle and point, and a flexible
// diaphragm refuses it at its direction line.
func TestAngledWallStorey(t *testing.T) {
	text := strings.Replace(boxStorey, `diaphragm = "flexible"`, "", 1) + `
[[wall]]
name = "brace"
rigidity = "800kip/in"
direction = 30
position = ["30ft", "12ft"]
length = "8ft"
`
	path := writeStorey(t, text)
	a, err := Load(path)
	if err != nil {
		t.Fatal(err)
	}
	j := a.JSON()
	b := j.Walls[4]
	if b.Angle == nil || *b.Angle != 30 || b.At == nil || b.At[0] != 30 || b.At[1] != 12 || !b.RigidityGiven {
		t.Errorf("JSON brace %+v", b)
	}
	// It resists both directions: some direct shear under each load.
	for _, c := range a.Distribution.Cases {
		if !(math.Abs(c.Shares[4].Direct) > 0) {
			t.Errorf("%s: brace direct shear %g", c.Name(), c.Shares[4].Direct)
		}
	}
	flex := strings.Replace(text, "[storey]\n", "[storey]\ndiaphragm = \"flexible\"\n", 1)
	_, err = Load(writeStorey(t, flex))
	var e *Error
	if !errors.As(err, &e) || e.Key != "wall[5].direction" || e.Line != 32 || !strings.Contains(e.Msg, "30°") {
		t.Errorf("flexible with a wall at 30°: %v", err)
	}
}

// A flexible diaphragm's wall line holding a wall given by its rigidity
// without a length: the collector warning says the length is not known
// rather than that the walls cover 0 in of the plan.
func TestCollectorWarningUnknownLength(t *testing.T) {
	text := boxStorey + "\n[[wall]]\nname = \"frame\"\nrigidity = \"500kip/in\"\ndirection = \"y\"\nposition = \"20ft\"\n"
	a, err := Load(writeStorey(t, text))
	if err != nil {
		t.Fatal(err)
	}
	found := false
	for _, w := range a.Warnings {
		if strings.Contains(w, "x = 20'-0\"") {
			found = true
			if !strings.Contains(w, "without a length") || strings.Contains(w, "walls along 0\"") {
				t.Errorf("collector warning: %s", w)
			}
		}
	}
	if !found {
		t.Errorf("no warning about the frame's line; warnings: %q", a.Warnings)
	}
}
