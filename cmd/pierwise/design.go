package main

import (
	"fmt"

	"pierwise/design"
	"pierwise/drawing"
	"pierwise/report"
)

// designInput is the one place the commands turn a solved wall into the
// checks' input (docs/method.md §8): the piers and their forces come from
// the chosen basis (its View: the classic result, or on the fe basis the
// model's section forces on the classic piers).
func designInput(s *solved) (design.Input, bool) {
	res := s.res
	if s.b != nil {
		res = s.b.View()
	}
	if s.wall.Design == nil || res == nil {
		return design.Input{}, false
	}
	return design.InputOf(s.wall, design.ClassicPiers(res)), true
}

// checkDesign fills the solved wall's pier design when its file has a
// [design] table.
func checkDesign(s *solved) {
	in, ok := designInput(s)
	if !ok {
		return
	}
	r, err := design.CheckWall(in)
	if err != nil {
		s.designErr = err
		return
	}
	s.design = &r
}

// JSON of the pier design: forces in the JSON's units, compression positive.
type jsonBar struct {
	X    float64 `json:"x"`
	Area float64 `json:"area"`
}

type jsonDesignCheck struct {
	Combination       string  `json:"combination"`
	Section           string  `json:"section"`
	Axial             float64 `json:"axial"`
	Shear             float64 `json:"shear"`
	Moment            float64 `json:"moment"`
	PhiShearStrength  float64 `json:"phi_shear_strength"`
	PhiMomentStrength float64 `json:"phi_moment_strength"`
	ShearRatio        float64 `json:"shear_ratio"`
	FlexureRatio      float64 `json:"flexure_ratio"`
	Governs           string  `json:"governs"`
}

type jsonRequirement struct {
	Name     string  `json:"name"`
	Clause   string  `json:"clause"`
	Required float64 `json:"required"`
	Provided float64 `json:"provided"`
	Ratio    float64 `json:"ratio"`
	OK       bool    `json:"ok"`
}

type jsonPierDesign struct {
	Method       string            `json:"method"`
	Checks       []jsonDesignCheck `json:"checks"`
	Requirements []jsonRequirement `json:"requirements"`
	Governing    jsonGoverning     `json:"governing"`
	OK           bool              `json:"ok"`
}

// jsonGoverning is what governs a pier: a check (its index into checks and
// its ratio) or a requirement on the bars.
type jsonGoverning struct {
	Ratio       float64          `json:"ratio"`
	Text        string           `json:"text"`
	Check       *jsonDesignCheck `json:"check,omitempty"`
	Requirement string           `json:"requirement,omitempty"`
}

type jsonWallDesign struct {
	Code           string   `json:"code"`
	WallClass      string   `json:"wall_class"`
	LoadKind       string   `json:"load_kind"`
	Combinations   []string `json:"combinations"`
	GoverningPier  string   `json:"governing_pier,omitempty"`
	GoverningRatio float64  `json:"governing_ratio"`
	Governing      string   `json:"governing"`
	OK             bool     `json:"ok"`
	Notes          []string `json:"notes"`
	Caution        string   `json:"caution"`
	Error          string   `json:"error,omitempty"`
}

func designJSON(s *solved, j *jsonWall) {
	if s.designErr != nil {
		j.Design = &jsonWallDesign{Error: s.designErr.Error(), Caution: report.DesignCaution, Combinations: []string{}, Notes: []string{}}
		return
	}
	r := s.design
	if r == nil {
		return
	}
	u := report.UnitsFor(s.wall.Units)
	d := &jsonWallDesign{Code: r.Code.String(), WallClass: r.Class.String(), LoadKind: r.Kind.String(), GoverningRatio: r.Ratio,
		Governing: report.GoverningLine(r), OK: r.OK, Notes: append([]string{}, r.Notes...), Caution: report.DesignCaution}
	for _, c := range r.Combinations {
		d.Combinations = append(d.Combinations, c.Factors(r.Kind))
	}
	if r.Governing >= 0 {
		d.GoverningPier = r.Piers[r.Governing].Name
	}
	j.Design = d
	byName := map[string]*design.PierResult{}
	for i := range r.Piers {
		byName[r.Piers[i].Name] = &r.Piers[i]
	}
	for i := range j.Piers {
		p := byName[j.Piers[i].Name]
		if p == nil || !j.Piers[i].Leaf {
			continue
		}
		jp := &j.Piers[i]
		for _, b := range p.Bars {
			jp.Bars = append(jp.Bars, jsonBar{X: report.Tidy(u.CoordOf(b.X)), Area: report.Tidy(u.AreaOf(b.Area))})
		}
		pd := &jsonPierDesign{Method: p.Method, Checks: []jsonDesignCheck{}, Requirements: []jsonRequirement{}, OK: p.OK}
		for _, c := range p.Checks {
			pd.Checks = append(pd.Checks, jsonDesignCheck{
				Combination: r.Combinations[c.Combination].Factors(r.Kind), Section: c.Section.String(),
				Axial: u.ForceOf(c.Axial), Shear: u.ForceOf(c.Shear), Moment: u.MomentOf(c.Moment),
				PhiShearStrength: u.ForceOf(c.PhiShear), PhiMomentStrength: u.MomentOf(c.PhiMoment),
				ShearRatio: c.ShearRatio, FlexureRatio: c.FlexureRatio, Governs: c.Governs.String(),
			})
		}
		for _, q := range p.Require {
			pd.Requirements = append(pd.Requirements, jsonRequirement{Name: q.Name, Clause: q.Clause, Required: q.Required, Provided: q.Provided, Ratio: q.Ratio, OK: q.OK})
		}
		pd.Governing = jsonGoverning{Ratio: p.Ratio, Text: report.PierGoverning(r, p)}
		if p.Requirement >= 0 {
			pd.Governing.Requirement = p.Require[p.Requirement].Name
		} else if len(pd.Checks) > 0 {
			c := pd.Checks[p.Governing]
			pd.Governing.Check = &c
		}
		jp.Design = pd
	}
}

// writeDesignLine writes the solve table's governing-ratio line.
func writeDesignLine(t *report.Text, s *solved) {
	switch {
	case s.designErr != nil:
		t.Wrapped("  design: ", "the piers could not be checked: "+s.designErr.Error())
	case s.design != nil:
		r := s.design
		t.Wrapped("  design: ", r.Code.String()+", "+r.Class.String()+"; governing "+report.GoverningLine(r))
	}
}

// drawRatios gives pierwise draw --show ratios each leaf pier's governing
// ratio.
func drawRatios(s *solved) (drawing.RatioFunc, error) {
	switch {
	case s.designErr != nil:
		return nil, fmt.Errorf("%s: the piers could not be checked: %w", displayName(s.arg), s.designErr)
	case s.design == nil:
		return nil, usagef("--show ratios: %s has no pier design; add [design] (and [reinforcement]) to the wall file, or use --show shares or --show forces", displayName(s.arg))
	}
	by := map[string]float64{}
	for _, p := range s.design.Piers {
		by[p.Name] = p.Ratio
	}
	return func(name string) (float64, bool) { r, ok := by[name]; return r, ok }, nil
}
