package main

import (
	"encoding/json"
	"math"
	"strconv"
	"strings"
	"testing"

	"pierwise/internal/testkit"
	"pierwise/report"
)

// round4 rounds every number of a decoded JSON value to 4 significant
// digits, so that the golden file holds what an engineer reads, not the
// last bits of the solver.
func round4(v any) any {
	switch x := v.(type) {
	case float64:
		if x == 0 {
			return 0.0
		}
		r, _ := strconv.ParseFloat(strconv.FormatFloat(x, 'g', 4, 64), 64)
		if math.Abs(r) < 1e-9 {
			return 0.0
		}
		return r
	case []any:
		for i := range x {
			x[i] = round4(x[i])
		}
	case map[string]any:
		for k := range x {
			x[k] = round4(x[k])
		}
	}
	return v
}

// solve --basis fe --json on the Masonry Chronicles wall (Concrete Masonry
// Association of California and Nevada; its classic relative rigidity
// 0.1315 E·t is the published working by exact arithmetic): the model's
// numbers in the classic JSON's shape, the classic rigidity as the check,
// and statics across each band's section (the piers of a band carry the
// whole wall shear, 20 kip, and the lateral case puts no net axial force
// on a band: the overturning is a couple).
func TestSolveFEBasisJSON(t *testing.T) {
	code, out, errs := runCLI("solve", "../../testdata/walls/nested.toml", "--basis", "fe", "--json")
	if code != exitOK {
		t.Fatalf("exit %d: %s", code, errs)
	}
	var w map[string]any
	if err := json.Unmarshal([]byte(out), &w); err != nil {
		t.Fatal(err)
	}
	if w["basis"] != "fe" {
		t.Errorf("basis %v", w["basis"])
	}
	check := w["check"].(map[string]any)
	if check["basis"] != "classic" || math.Abs(check["rigidity_relative"].(float64)-0.1315) > 0.0001 {
		t.Errorf("check %v", check)
	}
	if fe := w["fe"].(map[string]any); math.Abs(fe["rigidity_relative"].(float64)-w["rigidity_relative"].(float64)) > 1e-12 {
		t.Error("the top-level rigidity is not the model's")
	}
	piers := map[string]map[string]any{}
	for _, p := range w["piers"].([]any) {
		p := p.(map[string]any)
		piers[p["name"].(string)] = p
		f, ok := p["forces"].(map[string]any)
		if !ok {
			t.Fatalf("pier %v has no forces", p["name"])
		}
		for _, at := range []string{"bottom", "middle", "top"} {
			for _, k := range []string{"shear", "moment", "axial_lateral", "axial_dead", "axial_live"} {
				if _, ok := f[at].(map[string]any)[k]; !ok {
					t.Errorf("pier %v %s lacks %s", p["name"], at, k)
				}
			}
		}
		if _, ok := p["rigidity_relative"]; ok {
			t.Errorf("pier %v carries the classic formula's rigidity on the fe basis", p["name"])
		}
	}
	mid := func(name, key string) float64 {
		return piers[name]["forces"].(map[string]any)["middle"].(map[string]any)[key].(float64)
	}
	const V = 20.0 // kip, the file's shear
	if s := mid("P1", "shear") + mid("P2", "shear"); math.Abs(s-V) > 1e-6*V {
		t.Errorf("P1 + P2 carry %g kip, want %g", s, V)
	}
	if s := mid("P2.1", "shear") + mid("P2.2", "shear"); math.Abs(s-mid("P2", "shear")) > 1e-6*V {
		t.Errorf("P2.1 + P2.2 carry %g kip, P2 %g", s, mid("P2", "shear"))
	}
	if n := mid("P1", "axial_lateral") + mid("P2", "axial_lateral"); math.Abs(n) > 1e-6*V {
		t.Errorf("net axial force of the lateral case across the band %g kip, want 0", n)
	}
	var v any
	_ = json.Unmarshal([]byte(out), &v)
	pretty, _ := json.MarshalIndent(round4(v), "", "  ")
	testkit.Golden(t, "solve_nested_fe.golden", string(pretty)+"\n")
}

// The classic basis is today's JSON with "basis" added; with --fe its
// check is the model's rigidity.
func TestSolveClassicBasisJSON(t *testing.T) {
	_, out, _ := runCLI("solve", "../../testdata/walls/nested.toml", "--json")
	var w map[string]any
	if err := json.Unmarshal([]byte(out), &w); err != nil {
		t.Fatal(err)
	}
	if w["basis"] != "classic" || w["check"] != nil {
		t.Errorf("basis %v, check %v", w["basis"], w["check"])
	}
	_, out, _ = runCLI("solve", "../../testdata/walls/nested.toml", "--json", "--fe")
	w = nil
	if err := json.Unmarshal([]byte(out), &w); err != nil {
		t.Fatal(err)
	}
	check, fe := w["check"].(map[string]any), w["fe"].(map[string]any)
	if check["basis"] != "fe" || check["rigidity_relative"] != fe["rigidity_relative"] || check["rigidity_difference"] != fe["rigidity_difference"] {
		t.Errorf("check %v, fe %v", check, fe)
	}
	if math.Abs(w["rigidity_relative"].(float64)-0.1315) > 0.0001 {
		t.Errorf("classic rigidity %v moved", w["rigidity_relative"])
	}
}

func TestBasisErrors(t *testing.T) {
	for _, c := range []struct {
		args []string
		code int
		say  string
	}{
		{[]string{"solve", "../../testdata/walls/nested.toml", "--basis", "finite"}, exitUsage, `unknown basis "finite"`},
		{[]string{"report", "../../testdata/walls/nested.toml", "--basis", "FEM"}, exitUsage, "unknown basis"},
		{[]string{"compare", "../../testdata/walls/variants.toml", "--basis", "x"}, exitUsage, "unknown basis"},
		{[]string{"sweep", "../../testdata/walls/door.toml", "--opening", "D1", "--basis", "x"}, exitUsage, "unknown basis"},
		{[]string{"sweep", "../../testdata/walls/door.toml", "--opening", "D1", "--mesh", "3in"}, exitUsage, "go with --basis fe"},
		// The model cannot be built: a mesh the flag allows (1/4 in) but far
		// too fine for the model of an 18 × 16 ft wall (over 200 MB of band).
		{[]string{"solve", "../../testdata/walls/nested.toml", "--basis", "fe", "--mesh", "0.25in"}, exitInput, "finite-element model has no answer"},
		{[]string{"report", "../../testdata/walls/nested.toml", "--basis", "fe", "--mesh", "0.25in"}, exitInput, "finite-element model has no answer"},
		// A wall cut in two has no answer on either basis.
		{[]string{"solve", "testdata/cut.toml", "--basis", "fe"}, exitInput, "cut.toml"},
		{[]string{"solve", "testdata/cut.toml"}, exitInput, "cut.toml"},
	} {
		code, _, errs := runCLI(c.args...)
		if code != c.code || !strings.Contains(errs, c.say) {
			t.Errorf("%v: exit %d, %q; want exit %d saying %q", c.args, code, errs, c.code, c.say)
		}
	}
}

// The report on the fe basis names its basis and carries the classic
// check; the table too.
func TestReportAndTableFEBasis(t *testing.T) {
	code, out, errs := runCLI("report", "../../testdata/walls/nested.toml", "--basis", "fe")
	if code != exitOK {
		t.Fatalf("exit %d: %s", code, errs)
	}
	for _, want := range []string{"Basis:       finite-element model", "Check: the classic method", "0.131 E·t (classic method)", "local codes govern"} {
		if !strings.Contains(out, want) {
			t.Errorf("report lacks %q", want)
		}
	}
	_, out, _ = runCLI("solve", "../../testdata/walls/nested.toml", "--basis", "fe")
	for _, want := range []string{"basis: finite-element model", "check: classic relative rigidity 0.131 E·t", "P2.2",
		// No C_d and I_e in the file: no design drift, as on the classic basis.
		"no design drift: C_d and I_e not given"} {
		if !strings.Contains(out, want) {
			t.Errorf("table lacks %q:\n%s", want, out)
		}
	}
	_, out, _ = runCLI("solve", "../../testdata/walls/nested.toml")
	if !strings.Contains(out, "basis: classic method") {
		t.Errorf("classic table does not say its basis:\n%s", out)
	}
}

// compare --basis fe: the compared numbers are the model's (the relative
// rigidity row is the one solve --basis fe prints for each layout) and the
// classic rigidity is the check row.
func TestCompareFEBasis(t *testing.T) {
	code, out, errs := runCLI("compare", "../../testdata/walls/variants.toml", "--basis", "fe")
	if code != exitOK {
		t.Fatalf("exit %d: %s", code, errs)
	}
	for _, want := range []string{"finite-element model (the basis)", "Classic relative rigidity", "local codes govern"} {
		if !strings.Contains(out, want) {
			t.Errorf("comparison lacks %q", want)
		}
	}
	for _, layout := range []string{"as drawn", "door moved"} {
		_, js, _ := runCLI("solve", "../../testdata/walls/variants.toml:"+layout, "--basis", "fe", "--json")
		var w map[string]any
		if err := json.Unmarshal([]byte(js), &w); err != nil {
			t.Fatal(err)
		}
		rel := report.Sig(w["rigidity_relative"].(float64))
		if !strings.Contains(out, rel) {
			t.Errorf("%s: the model's relative rigidity %s is not in the comparison", layout, rel)
		}
	}
}

// The wall file's [analysis] basis is the default and --basis overrides
// it; an unknown basis in the file is an input error naming the file, the
// line and the key.
func TestBasisFromFile(t *testing.T) {
	basisOf := func(args ...string) string {
		t.Helper()
		code, out, errs := runCLI(append([]string{"solve"}, append(args, "--json")...)...)
		if code != exitOK {
			t.Fatalf("%v: exit %d: %s", args, code, errs)
		}
		var w map[string]any
		if err := json.Unmarshal([]byte(out), &w); err != nil {
			t.Fatal(err)
		}
		return w["basis"].(string)
	}
	if b := basisOf("testdata/basis-fe.toml"); b != "fe" {
		t.Errorf("the file's basis: %s", b)
	}
	if b := basisOf("testdata/basis-fe.toml", "--basis", "classic"); b != "classic" {
		t.Errorf("--basis classic over the file's fe: %s", b)
	}
	if b := basisOf("../../testdata/walls/door.toml"); b != "classic" {
		t.Errorf("no [analysis] basis: %s", b)
	}
	code, _, errs := runCLI("solve", "testdata/basis-bad.toml")
	if code != exitInput || !strings.Contains(errs, "basis-bad.toml:8: analysis.basis") || !strings.Contains(errs, "finite") {
		t.Errorf("exit %d, %q; want 1 naming basis-bad.toml:8: analysis.basis", code, errs)
	}
}
