package main

import (
	"encoding/json"
	"fmt"
	"io"
	"math"

	"pierwise/basis"
	"pierwise/geometry"
	"pierwise/report"
	"pierwise/study"
)

func init() {
	register(command{
		name:  "sweep",
		args:  "FILE[:LAYOUT] --opening NAME [--step SIZE] [--axis x|y] [--basis classic|fe] [--mesh SIZE] [--element q4|qm6] [--json]",
		short: "move one opening step by step along the wall and tabulate rigidity and pier shares",
		run:   runSweep,
	})
}

func runSweep(e *env, args []string) error {
	fs := newFlags(e, "sweep")
	opening := fs.String("opening", "", "the opening to move, by `NAME`")
	stepText := fs.String("step", "", "the step, a length such as 8in or 200mm (default 8in, or 200mm for SI walls)")
	axisText := fs.String("axis", "x", "move along x (left edge) or y (sill)")
	asJSON := fs.Bool("json", false, "print the points as JSON")
	var ff feFlags
	ff.registerBasis(fs)
	fs.StringVar(&ff.mesh, "mesh", "", "maximum element size of the finite-element model, e.g. 6in or 150mm (with --basis fe)")
	fs.StringVar(&ff.element, "element", "", "finite-element type: qm6 (default) or q4 (with --basis fe)")
	pos, err := parseInterleaved(fs, args)
	if err != nil {
		return err
	}
	if len(pos) != 1 {
		return usagef("sweep: give one wall as FILE[:LAYOUT]")
	}
	if *opening == "" {
		return usagef("sweep: say which opening to move with --opening NAME")
	}
	axis, err := study.ParseAxis(*axisText)
	if err != nil {
		return usagef("sweep: --axis: %v", err)
	}
	w, err := study.Open(pos[0])
	if err != nil {
		return err
	}
	step := 8 * geometry.Inch
	if w.Units == geometry.SI {
		step = 200 * geometry.Millimetre
	}
	if *stepText != "" {
		step, err = geometry.ParseLength(*stepText, w.Units)
		if err != nil {
			return usagef("sweep: --step: %v", err)
		}
		if !(step > 0) {
			return usagef("sweep: --step: the step must be a positive length, not %q", *stepText)
		}
	}
	var opt study.SweepOptions
	if opt.Basis, err = ff.chosen(w); err != nil {
		return err
	}
	if opt.Basis == geometry.BasisFE {
		if opt.FE, err = ff.options(w); err != nil {
			return err
		}
	} else if ff.mesh != "" || ff.element != "" {
		return usagef("sweep: --mesh and --element set up the finite-element model: they go with --basis fe")
	}
	pts, err := study.SweepWith(w, *opening, axis, step, opt)
	if err != nil {
		return fmt.Errorf("%s: %w", pos[0], err)
	}
	if *asJSON {
		return writeSweepJSON(e.stdout, w, pts, opt.Basis)
	}
	fmt.Fprintf(e.stdout, "basis: %s\n", basis.Name(opt.Basis))
	name := *opening
	if i := study.FindOpening(w, name); i >= 0 {
		name = w.Openings()[i].Name // as written in the file, whatever the case typed
	}
	return report.SweepTable(e.stdout, w, name, axis, step, pts)
}

type sweepPierJSON struct {
	Name  string  `json:"name"`  // the pier's name at this position
	Pier  string  `json:"pier"`  // the physical pier: the openings (or "end") on either side
	Share float64 `json:"share"` // fraction of the wall shear
}

type sweepPointJSON struct {
	X                float64         `json:"x"`
	Sill             float64         `json:"sill"`
	RigidityRelative *float64        `json:"rigidity_relative"`
	Piers            []sweepPierJSON `json:"piers"`
	MaxStressPier    string          `json:"max_stress_pier,omitempty"`
	MaxStress        *float64        `json:"max_stress,omitempty"`      // psi or MPa, with a load
	Basis            string          `json:"basis"`                     // "classic" or "fe": where this point's numbers come from
	GoverningRatio   *float64        `json:"governing_ratio,omitempty"` // the pier design's, with [design]
	GoverningPier    string          `json:"governing_pier,omitempty"`
	Passes           *bool           `json:"passes,omitempty"` // every pier passes every check
	DesignError      string          `json:"design_error,omitempty"`
	Current          bool            `json:"current"`
	Best             bool            `json:"best"`
	Weak             []string        `json:"weak,omitempty"` // layout warnings here that the current position has not
	Error            string          `json:"error,omitempty"`
}

func writeSweepJSON(out io.Writer, w *geometry.Wall, pts []study.Point, b geometry.Basis) error {
	base := float64(w.Units.BaseLength())
	stress := float64(w.Units.BaseStress())
	list := make([]sweepPointJSON, len(pts))
	for i, p := range pts {
		// Positions are k steps from the current one in metres; rounding to
		// a nanometre-scale fraction of the base unit hides the float noise.
		j := sweepPointJSON{X: sweepRound(float64(p.X) / base), Sill: sweepRound(float64(p.Y) / base), Piers: []sweepPierJSON{},
			Basis: b.String(), Current: p.Current, Best: p.Best, Weak: p.Weak}
		if p.Err != nil {
			j.Error = p.Err.Error()
		} else {
			r := p.Rigidity
			j.RigidityRelative = &r
			j.MaxStressPier = p.StressPier
			if p.MaxStress > 0 {
				s := float64(p.MaxStress) / stress
				j.MaxStress = &s
			}
			for _, ps := range p.Piers {
				j.Piers = append(j.Piers, sweepPierJSON{Name: ps.Name, Pier: ps.Key, Share: ps.Share})
			}
			if p.Designed {
				r, ok := p.Ratio, p.Passes
				j.GoverningRatio, j.GoverningPier, j.Passes = &r, p.RatioPier, &ok
			}
			if p.DesignErr != nil {
				j.DesignError = p.DesignErr.Error()
			}
		}
		list[i] = j
	}
	enc := json.NewEncoder(out)
	enc.SetIndent("", "  ")
	return enc.Encode(list)
}

func sweepRound(v float64) float64 { return math.Round(v*1e9) / 1e9 }
