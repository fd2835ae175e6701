package main

import (
	"encoding/json"
	"math"
	"strings"
	"testing"

	"pierwise/design"
	"pierwise/geometry"
	"pierwise/pier"
	"pierwise/storey"
)

// solve --json of the reinforced example wall: every leaf pier has its bars
// and its checks; the numbers in the JSON's units agree with the wall's
// governing ratio; every ratio is the demand over the strength.
func TestSolveDesignJSON(t *testing.T) {
	code, out, errs := runCLI("solve", "../../testdata/walls/cmu-reinforced.toml", "--json")
	if code != exitOK {
		t.Fatalf("exit %d: %s", code, errs)
	}
	var w struct {
		Design struct {
			GoverningPier  string  `json:"governing_pier"`
			GoverningRatio float64 `json:"governing_ratio"`
			OK             bool    `json:"ok"`
			Caution        string  `json:"caution"`
		} `json:"design"`
		Piers []struct {
			Name   string `json:"name"`
			Leaf   bool   `json:"leaf"`
			Bars   []struct{ X, Area float64 }
			Design *struct {
				Checks []struct {
					Combination, Section string
					Axial, Shear, Moment float64
					PhiShear             float64 `json:"phi_shear_strength"`
					PhiMoment            float64 `json:"phi_moment_strength"`
					ShearRatio           float64 `json:"shear_ratio"`
					FlexureRatio         float64 `json:"flexure_ratio"`
				}
				Governing struct{ Ratio float64 }
				OK        bool
			}
		} `json:"piers"`
	}
	if err := json.Unmarshal([]byte(out), &w); err != nil {
		t.Fatal(err)
	}
	if !strings.Contains(w.Design.Caution, "licensed engineer") {
		t.Errorf("caution %q", w.Design.Caution)
	}
	maxRatio, leaves := 0.0, 0
	for _, p := range w.Piers {
		if !p.Leaf {
			if p.Design != nil {
				t.Errorf("%s: design on a parent pier", p.Name)
			}
			continue
		}
		leaves++
		if p.Design == nil || len(p.Design.Checks) != 8 {
			t.Fatalf("%s: want 8 checks (4 combinations × 2 sections)", p.Name)
		}
		// #5 bars, 0.31 in² each (ASTM A615 nominal area).
		for _, b := range p.Bars {
			if math.Abs(b.Area-0.31) > 0.005 {
				t.Errorf("%s: bar area %.3f in², want 0.31", p.Name, b.Area)
			}
		}
		if len(p.Bars) < 2 {
			t.Errorf("%s: %d bars", p.Name, len(p.Bars))
		}
		for _, c := range p.Design.Checks {
			if c.PhiShear > 0 && math.Abs(c.ShearRatio-math.Abs(c.Shear)/c.PhiShear) > 1e-9 {
				t.Errorf("%s: shear ratio %.4f, |V_u|/φV_n = %.4f", p.Name, c.ShearRatio, math.Abs(c.Shear)/c.PhiShear)
			}
			if c.PhiMoment > 0 && math.Abs(c.FlexureRatio-math.Abs(c.Moment)/c.PhiMoment) > 1e-9 {
				t.Errorf("%s: flexure ratio %.4f, |M_u|/φM_n = %.4f", p.Name, c.FlexureRatio, math.Abs(c.Moment)/c.PhiMoment)
			}
		}
		maxRatio = math.Max(maxRatio, p.Design.Governing.Ratio)
	}
	if leaves != 4 {
		t.Errorf("%d leaf piers, want 4", leaves)
	}
	if math.Abs(maxRatio-w.Design.GoverningRatio) > 1e-12 || w.Design.OK != (maxRatio <= 1) {
		t.Errorf("wall governing %.4f ok %v, largest pier ratio %.4f", w.Design.GoverningRatio, w.Design.OK, maxRatio)
	}
	code, out, _ = runCLI("solve", "../../testdata/walls/cmu-reinforced.toml")
	if code != exitOK || !strings.Contains(out, "design: tms402-22, intermediate; governing "+w.Design.GoverningPier) {
		t.Errorf("solve table lacks the governing line:\n%s", out)
	}
}

// draw --show ratios draws the reinforced wall's ratios; the storey's hook
// gives each wall with [design] its governing pier.
func TestDrawRatiosAndStoreyHook(t *testing.T) {
	code, out, errs := runCLI("draw", "../../testdata/walls/cmu-reinforced.toml", "--show", "ratios")
	if code != exitOK || !strings.Contains(out, "<svg") {
		t.Fatalf("exit %d: %s", code, errs)
	}
	w, err := geometry.LoadFile("../../testdata/walls/cmu-reinforced.toml")
	if err != nil {
		t.Fatal(err)
	}
	res, err := pier.Solve(w)
	if err != nil {
		t.Fatal(err)
	}
	g, err := storey.PierDesign(w, res)
	if err != nil || g == nil {
		t.Fatalf("storey hook: %v %v", g, err)
	}
	d, _, _ := design.CheckClassic(w, res)
	if g.Pier != d.Piers[d.Governing].Name || math.Abs(g.Ratio-d.Ratio) > 1e-12 {
		t.Errorf("storey hook %+v, design %s %.4f", g, d.Piers[d.Governing].Name, d.Ratio)
	}
}

// On the fe basis the design takes the model's pier forces: the JSON and the
// table carry it, and its governing ratio is the design package's on
// FEPiers of the same model.
func TestSolveDesignFEBasis(t *testing.T) {
	code, out, errs := runCLI("solve", "../../testdata/walls/cmu-reinforced.toml", "--basis", "fe", "--json")
	if code != exitOK {
		t.Fatalf("exit %d: %s", code, errs)
	}
	var j struct {
		Design struct {
			GoverningRatio float64 `json:"governing_ratio"`
		} `json:"design"`
	}
	if err := json.Unmarshal([]byte(out), &j); err != nil {
		t.Fatal(err)
	}
	if !(j.Design.GoverningRatio > 0) {
		t.Fatalf("no design on the fe basis:\n%s", out)
	}
	code, out, _ = runCLI("solve", "../../testdata/walls/cmu-reinforced.toml", "--basis", "fe")
	if code != exitOK || !strings.Contains(out, "design: tms402-22") {
		t.Errorf("fe table lacks the design line:\n%s", out)
	}
	code, out, _ = runCLI("report", "../../testdata/walls/cmu-reinforced.toml", "--basis", "fe")
	if code != exitOK || !strings.Contains(out, "Pier design (finite-element pier forces)") || !strings.Contains(out, "amendments govern") {
		t.Errorf("fe report lacks the design section")
	}
}
