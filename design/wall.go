package design

import (
	"pierwise/geometry"
	"pierwise/pier"
	"pierwise/pier/fe"
)

// SettingsOf returns the design settings of a wall file: its [design] table
// and its load kind, the code from the material when the file gives none.
// A wall without a [design] table gets the defaults (ordinary class, S_DS 0,
// ρ 1).
func SettingsOf(w *geometry.Wall) Settings {
	s := Settings{Code: w.DesignCode(), Kind: w.Load.Kind}
	if d := w.Design; d != nil {
		s.Class, s.SDS, s.Rho, s.Mortar = d.Class, d.SDS, d.Rho, d.Mortar
	}
	return s
}

// InputOf is the one place a wall and its piers' forces become the checks'
// input (docs/method.md §8). The piers come from the model the analysis is
// based on: ClassicPiers for the classic method; a finite-element basis
// gives its own []PierInput from its pier section forces.
func InputOf(w *geometry.Wall, piers []PierInput) Input {
	return Input{Wall: WallOf(w), Reinforcement: w.Reinforcement, Settings: SettingsOf(w), Piers: piers}
}

// ClassicPiers returns the leaf piers of a classic result with their section
// forces by load case (docs/method.md §6): the lateral shear, moment and
// overturning axial force, and the tributary dead and live axial forces.
// Cut piers (no load path) are left out. A solid wall is one pier P1. A
// basis.Result's View on the fe basis has the same shape with the model's
// section forces, so it passes here too.
func ClassicPiers(res *pier.Result) []PierInput {
	var out []PierInput
	for _, p := range res.Leaves() {
		if p.Cut {
			continue
		}
		out = append(out, PierInput{Name: p.Name, Rect: p.Rect, Loads: p.Loads})
	}
	return out
}

// CheckClassic checks a wall whose file has a [design] table, from the classic
// result; ok is false when the wall has none.
func CheckClassic(w *geometry.Wall, res *pier.Result) (r Result, ok bool, err error) {
	if w.Design == nil {
		return Result{}, false, nil
	}
	r, err = CheckWall(InputOf(w, ClassicPiers(res)))
	return r, err == nil, err
}

// FEPiers returns the leaf piers of a finite-element result with the
// model's section forces by load case (docs/method.md §4, §6): the same
// piers as ClassicPiers, their forces from the plane-stress model. A basis
// switch hands these to InputOf in place of ClassicPiers.
func FEPiers(r *fe.Result) []PierInput {
	var out []PierInput
	for _, p := range r.Forces {
		if p.Leaf {
			out = append(out, PierInput{Name: p.Name, Rect: p.Rect, Loads: p.Loads})
		}
	}
	return out
}
