package main

import (
	"encoding/json"
	"math"
	"os"
	"path/filepath"
	"strings"
	"testing"

	"pierwise/geometry"
	"pierwise/internal/testkit"
)

// TestDummySettingJSON: a setting added as one entry of geometry.Settings
// reaches solve --json under its file key (in SI base units) and the
// report's inputs. (Parsing, keeping comments, checking and the wall form:
// TestDummySetting in tui.)
func TestDummySettingJSON(t *testing.T) {
	testkit.DummySetting(t)
	data, err := os.ReadFile("../../testdata/walls/nested.toml")
	if err != nil {
		t.Fatal(err)
	}
	path := filepath.Join(t.TempDir(), "dummy.toml")
	text := string(data) + "\n[dummy]\nreach = \"2ft\"\n"
	if err := os.WriteFile(path, []byte(text), 0o644); err != nil {
		t.Fatal(err)
	}
	code, out, errs := runCLI("solve", path, "--json")
	if code != exitOK {
		t.Fatalf("exit %d: %s", code, errs)
	}
	var w struct {
		Inputs map[string]any `json:"inputs"`
	}
	if err := json.Unmarshal([]byte(out), &w); err != nil {
		t.Fatal(err)
	}
	if got, ok := w.Inputs[testkit.Dummy].(float64); !ok || math.Abs(got-0.6096) > 1e-12 {
		t.Errorf("inputs[%q] = %v, want 0.6096 (2 ft in metres)", testkit.Dummy, w.Inputs[testkit.Dummy])
	}
	code, out, errs = runCLI("report", path)
	if code != exitOK || !strings.Contains(out, `Dummy reach`) || !strings.Contains(out, `2'-0"`) {
		t.Errorf("report (exit %d, %s) does not show the dummy:\n%s", code, errs, out)
	}
}

// Every setting is in the JSON inputs, with the value the wall holds.
func TestSolveJSONInputs(t *testing.T) {
	code, out, errs := runCLI("solve", "../../testdata/walls/nested.toml", "--json")
	if code != exitOK {
		t.Fatalf("exit %d: %s", code, errs)
	}
	var j struct {
		Inputs map[string]any `json:"inputs"`
	}
	if err := json.Unmarshal([]byte(out), &j); err != nil {
		t.Fatal(err)
	}
	for _, s := range geometry.Settings {
		if _, ok := j.Inputs[s.Key]; !ok && s.Key != "gravity.self_weight" {
			t.Errorf("inputs lack %s", s.Key)
		}
	}
	// 18 ft (the nested wall's length) is 5.4864 m exactly.
	if got, _ := j.Inputs["length"].(float64); math.Abs(got-5.4864) > 1e-12 {
		t.Errorf("length %v m", j.Inputs["length"])
	}
	if j.Inputs["analysis.basis"] != "classic" || j.Inputs["analysis.top_tie"] != true {
		t.Errorf("analysis %v %v", j.Inputs["analysis.basis"], j.Inputs["analysis.top_tie"])
	}
}
