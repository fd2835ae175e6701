package main

import (
	"encoding/json"
	"math"
	"os"
	"path/filepath"
	"strings"
	"testing"

	"pierwise/report"
)

const workshop = "../../testdata/storey/workshop.toml"

// pierwise storey --json on the invented workshop: the keys of the storey JSON, and
// the statics of the rigid diaphragm checked on the printed numbers (direct
// shears of one direction sum to the storey shear, Taly 2nd ed. §7.9; the
// design shear is never below the direct shear, common practice).
func TestStoreyJSON(t *testing.T) {
	code, out, errs := runCLI("storey", workshop, "--json")
	if code != exitOK {
		t.Fatalf("exit %d: %s", code, errs)
	}
	var s struct {
		Shear            float64   `json:"shear"`
		CenterOfRigidity []float64 `json:"center_of_rigidity"`
		Walls            []struct {
			Name             string   `json:"name"`
			Direction        string   `json:"direction"`
			Position         float64  `json:"position"`
			RigidityRelative float64  `json:"rigidity_relative"`
			Rigidity         float64  `json:"rigidity"`
			DirectShear      *float64 `json:"direct_shear"`
			DesignShear      *float64 `json:"design_shear"`
			Piers            []struct {
				Share float64 `json:"share"`
				Shear float64 `json:"shear"`
			} `json:"piers"`
		} `json:"walls"`
	}
	if err := json.Unmarshal([]byte(out), &s); err != nil {
		t.Fatalf("not JSON: %v\n%s", err, out)
	}
	if s.Shear != 120 || len(s.CenterOfRigidity) != 2 || len(s.Walls) != 5 {
		t.Fatalf("shear %g kip, centre %v, %d walls", s.Shear, s.CenterOfRigidity, len(s.Walls))
	}
	sum := map[string]float64{}
	moment := map[string]float64{}
	rsum := map[string]float64{}
	for _, w := range s.Walls {
		if w.Name == "" || w.DirectShear == nil || w.DesignShear == nil || w.RigidityRelative <= 0 {
			t.Fatalf("wall %+v lacks a key", w)
		}
		sum[w.Direction] += *w.DirectShear
		moment[w.Direction] += w.Rigidity * w.Position
		rsum[w.Direction] += w.Rigidity
		if *w.DesignShear < *w.DirectShear-1e-9 {
			t.Errorf("%s: design %g below direct %g", w.Name, *w.DesignShear, *w.DirectShear)
		}
	}
	for _, d := range []string{"x", "y"} {
		if math.Abs(sum[d]-120) > 1e-6 {
			t.Errorf("direct shears along %s sum to %g kip, want 120", d, sum[d])
		}
	}
	// x_R = Σ R·x / Σ R over the y-walls (docs/method.md §9), from the printed values.
	if xr := moment["y"] / rsum["y"]; math.Abs(xr-s.CenterOfRigidity[0]) > 1e-6 {
		t.Errorf("center_of_rigidity x %g, want Σ R·x / Σ R = %g", s.CenterOfRigidity[0], xr)
	}
	if yr := moment["x"] / rsum["x"]; math.Abs(yr-s.CenterOfRigidity[1]) > 1e-6 {
		t.Errorf("center_of_rigidity y %g, want Σ R·y / Σ R = %g", s.CenterOfRigidity[1], yr)
	}
}

func TestStoreyTable(t *testing.T) {
	code, out, errs := runCLI("storey", workshop)
	if code != exitOK {
		t.Fatalf("exit %d: %s", code, errs)
	}
	for _, want := range []string{"centre of rigidity", "case x +acc", "case y -acc", "design shears", "Partition under", "licensed engineer"} {
		if !strings.Contains(out, want) {
			t.Errorf("output lacks %q:\n%s", want, out)
		}
	}
	// It fits an 80-column terminal, with the report's 78-column margin.
	for _, l := range strings.Split(out, "\n") {
		if n := len([]rune(l)); n > 78 {
			t.Errorf("line of %d columns: %q", n, l)
		}
	}
}

func TestStoreyExitStatus(t *testing.T) {
	dir := t.TempDir()
	bad := filepath.Join(dir, "bad.toml")
	data, err := os.ReadFile(workshop)
	if err != nil {
		t.Fatal(err)
	}
	text := strings.Replace(string(data), `direction = "y"`, `direction = "north"`, 1)
	if err := os.WriteFile(bad, []byte(text), 0o644); err != nil {
		t.Fatal(err)
	}
	for _, c := range []struct {
		args []string
		code int
		msg  string
	}{
		{[]string{"storey"}, exitUsage, "one FILE"},
		{[]string{"storey", workshop, workshop}, exitUsage, "one FILE"},
		{[]string{"storey", "--bogus", workshop}, exitUsage, "bogus"},
		{[]string{"storey", bad}, exitInput, bad + ":27: wall[3].direction"},
		{[]string{"storey", filepath.Join(dir, "none.toml")}, exitInput, "none.toml"},
	} {
		code, _, errs := runCLI(c.args...)
		if code != c.code || !strings.Contains(errs, c.msg) {
			t.Errorf("%v: exit %d, stderr %q; want %d with %q", c.args, code, errs, c.code, c.msg)
		}
	}
}

// The storey table shows the rigidity the distribution used, R = E·t·R rel
// in kip/in, so that walls of different strengths can be followed: with the
// north wall at f'm = 4000 psi (E_m = 900 f'm = 3600 ksi, TMS 402) its R is
// twice that of the same wall at 2000 psi, and the direct shears of the
// x-walls split as their R (V·R_i/ΣR, Taly 2nd ed. §7.9).
func TestStoreyTableAbsoluteRigidity(t *testing.T) {
	dir := t.TempDir()
	for _, f := range []string{"south.toml", "north.toml", "west.toml", "east.toml", "partition.toml", "workshop.toml"} {
		data, err := os.ReadFile(filepath.Join("../../testdata/storey", f))
		if err != nil {
			t.Fatal(err)
		}
		if f == "north.toml" {
			data = []byte(strings.Replace(string(data), `strength = "2000psi"`, `strength = "4000psi"`, 1))
		}
		if err := os.WriteFile(filepath.Join(dir, f), data, 0o644); err != nil {
			t.Fatal(err)
		}
	}
	code, out, errs := runCLI("storey", filepath.Join(dir, "workshop.toml"), "--json")
	if code != exitOK {
		t.Fatalf("exit %d: %s", code, errs)
	}
	var s struct {
		Walls []struct {
			Name        string   `json:"name"`
			Direction   string   `json:"direction"`
			RigidityRel float64  `json:"rigidity_relative"`
			Rigidity    float64  `json:"rigidity"`
			DirectShear *float64 `json:"direct_shear"`
		} `json:"walls"`
	}
	if err := json.Unmarshal([]byte(out), &s); err != nil {
		t.Fatal(err)
	}
	south, north := s.Walls[0], s.Walls[1]
	if r := north.Rigidity / north.RigidityRel / (south.Rigidity / south.RigidityRel); math.Abs(r-2) > 1e-9 {
		t.Errorf("E·t of the north wall is %g times the south wall's, want 2", r)
	}
	if got, want := *north.DirectShear / *south.DirectShear, north.Rigidity/south.Rigidity; math.Abs(got-want) > 1e-9*want {
		t.Errorf("direct shears north/south %g, want R ratio %g", got, want)
	}
	code, out, errs = runCLI("storey", filepath.Join(dir, "workshop.toml"))
	if code != exitOK {
		t.Fatalf("exit %d: %s", code, errs)
	}
	if !strings.Contains(out, "R kip/in") || !strings.Contains(out, report.Sig(north.Rigidity)) {
		t.Errorf("table lacks the R kip/in column with %s:\n%s", report.Sig(north.Rigidity), out)
	}
	if !strings.Contains(out, "kip·ft per radian") {
		t.Errorf("no J line:\n%s", out)
	}
}

// storey --diaphragm and --basis override the storey file; the JSON gives
// the irregularity per case, the flexible and rigid shears, and on the fe
// basis both rigidities of every wall. Statics checked on the printed
// numbers: the flexible shears of each direction sum to V (tributary
// spans, common practice); each envelope design shear is the larger of
// the two (common practice).
func TestStoreyDiaphragmAndBasis(t *testing.T) {
	type wallJSON struct {
		Name            string   `json:"name"`
		Direction       string   `json:"direction"`
		DesignShear     float64  `json:"design_shear"`
		RigidShear      float64  `json:"rigid_shear"`
		FlexibleShear   *float64 `json:"flexible_shear"`
		Rigidity        float64  `json:"rigidity"`
		RigidityClassic *float64 `json:"rigidity_classic"`
		RigidityFE      *float64 `json:"rigidity_fe"`
	}
	var s struct {
		Diaphragm string `json:"diaphragm"`
		Basis     string `json:"basis"`
		Irregular []struct {
			Case          string   `json:"case"`
			Ratio         *float64 `json:"ratio"`
			Type          string   `json:"type"`
			Amplification float64  `json:"amplification"`
		} `json:"torsional_irregularity"`
		Walls []wallJSON `json:"walls"`
	}
	code, out, errs := runCLI("storey", workshop, "--json", "--diaphragm", "envelope")
	if code != exitOK {
		t.Fatalf("exit %d: %s", code, errs)
	}
	if err := json.Unmarshal([]byte(out), &s); err != nil {
		t.Fatal(err)
	}
	if s.Diaphragm != "envelope" || s.Basis != "classic" || len(s.Irregular) != 4 {
		t.Fatalf("diaphragm %q basis %q, %d irregularity cases", s.Diaphragm, s.Basis, len(s.Irregular))
	}
	for _, c := range s.Irregular {
		if c.Ratio == nil || *c.Ratio < 1 || c.Amplification != 1 || c.Type != "none" {
			t.Errorf("case %+v: the workshop is regular (ratios 1.04 to 1.11)", c)
		}
	}
	sum := map[string]float64{}
	for _, w := range s.Walls {
		if w.FlexibleShear == nil {
			t.Fatalf("%s: no flexible_shear", w.Name)
		}
		sum[w.Direction] += *w.FlexibleShear
		if want := math.Max(w.RigidShear, *w.FlexibleShear); math.Abs(w.DesignShear-want) > 1e-9 {
			t.Errorf("%s: design %g, want max(%g, %g)", w.Name, w.DesignShear, w.RigidShear, *w.FlexibleShear)
		}
	}
	if math.Abs(sum["x"]-120) > 1e-6 || math.Abs(sum["y"]-120) > 1e-6 {
		t.Errorf("flexible shears sum to %v, want 120 kip each way", sum)
	}

	s.Walls = nil
	code, out, errs = runCLI("storey", workshop, "--json", "--basis", "fe")
	if code != exitOK {
		t.Fatalf("exit %d: %s", code, errs)
	}
	if err := json.Unmarshal([]byte(out), &s); err != nil {
		t.Fatal(err)
	}
	if s.Basis != "fe" {
		t.Errorf("basis %q", s.Basis)
	}
	for _, w := range s.Walls {
		if w.RigidityFE == nil || w.RigidityClassic == nil || math.Abs(w.Rigidity-*w.RigidityFE) > 1e-9**w.RigidityFE {
			t.Fatalf("%s: rigidity %g, FE %v, classic %v", w.Name, w.Rigidity, w.RigidityFE, w.RigidityClassic)
		}
		// The classic method overestimates walls with openings (docs/method.md §4:
		// often by tens of percent); it is never below the model here.
		if *w.RigidityClassic < *w.RigidityFE {
			t.Errorf("%s: classic %g below FE %g", w.Name, *w.RigidityClassic, *w.RigidityFE)
		}
	}

	for _, c := range []struct{ args []string }{
		{[]string{"storey", workshop, "--basis", "exact"}},
		{[]string{"storey", workshop, "--diaphragm", "semi"}},
		{[]string{"storey", workshop, "--edit", "--basis", "fe"}},
	} {
		if code, _, _ := runCLI(c.args...); code != exitUsage {
			t.Errorf("%v: exit %d, want usage", c.args, code)
		}
	}
}

// The workshop copy with a frame given by its rigidity, a category and the
// storey drift check runs, and shows the frame and the drift table.
func TestStoreyWorkshopFrame(t *testing.T) {
	code, out, errs := runCLI("storey", "../../testdata/storey/workshop-frame.toml")
	if code != exitOK {
		t.Fatalf("exit %d: %s", code, errs)
	}
	for _, want := range []string{"Mezzanine frame", "given by its rigidity, 1,500 kip/in", "storey drift δ = Cd·δe/Ie", "seismic design category D", "south edge"} {
		if !strings.Contains(out, want) {
			t.Errorf("output lacks %q", want)
		}
	}
}

// On a flexible diaphragm the storey table gives the flexible distribution
// as the governing result and leaves out the rigid diaphragm's cases and
// torsional irregularity table: Types 1a and 1b apply to rigid or
// semirigid diaphragms (ASCE 7-22 Table 12.3-1). The envelope keeps both.
func TestStoreyTableFlexibleGoverns(t *testing.T) {
	code, out, errs := runCLI("storey", workshop, "--diaphragm", "flexible")
	if code != exitOK {
		t.Fatalf("exit %d: %s", code, errs)
	}
	if !strings.Contains(out, "flexible diaphragm (governs)") || !strings.Contains(out, "the flexible distribution below governs") {
		t.Errorf("flexible output does not say the flexible distribution governs:\n%s", out)
	}
	for _, no := range []string{"torsional irregularity (ASCE", "case x +acc:", "dmax/davg"} {
		if strings.Contains(out, no) {
			t.Errorf("flexible output prints the rigid diaphragm's %q:\n%s", no, out)
		}
	}
	code, out, errs = runCLI("storey", workshop, "--diaphragm", "envelope")
	if code != exitOK {
		t.Fatalf("exit %d: %s", code, errs)
	}
	for _, want := range []string{"torsional irregularity (ASCE", "case x +acc:", "flexible diaphragm: shear"} {
		if !strings.Contains(out, want) {
			t.Errorf("envelope output lacks %q", want)
		}
	}
}
