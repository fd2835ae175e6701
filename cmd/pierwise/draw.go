package main

import (
	"errors"
	"fmt"
	"time"

	"pierwise/drawing"
	"pierwise/pier"
	"pierwise/pier/fe"
	"pierwise/storey"
)

func init() {
	register(command{
		name:  "draw",
		args:  "FILE[:LAYOUT] [-o OUT.svg] [--show shares|forces|ratios] [--field shear|vertical] [--basis classic|fe]",
		short: "draw the wall elevation (or the storey plan) to scale as an SVG sheet for the calculation package",
		run:   runDraw,
	})
}

// pierRatios is where pier design plugs in its demand/capacity ratios for
// --show ratios (the governing ratio of each leaf pier, by name, e.g. from
// design.CheckWall's PierResult.Ratio); nil until the design checks read
// their inputs from the wall file.
var pierRatios func(s *solved) (drawing.RatioFunc, error)

func runDraw(e *env, args []string) error {
	fs := newFlags(e, "draw")
	outPath := fs.String("o", "", "write the SVG to this file (atomically) instead of standard output")
	show := fs.String("show", "shares", "what the piers carry: shares, forces (V and M) or ratios (demand/capacity)")
	field := fs.String("field", "", "map the finite-element stress over the wall: shear (τxy) or vertical (σy)")
	basis := fs.String("basis", "", "the model the pier values come from: classic (default) or fe")
	var ff feFlags
	fs.StringVar(&ff.mesh, "mesh", "", "maximum element size of the stress map's model, e.g. 6in or 150mm (with --field)")
	fs.StringVar(&ff.element, "element", "", "finite-element type of the stress map's model: qm6 (default) or q4 (with --field)")
	files, err := parseInterleaved(fs, args)
	if err != nil {
		return err
	}
	if len(files) != 1 {
		return usagef("draw needs one FILE (a wall file, FILE:LAYOUT, or a storey file), got %d", len(files))
	}
	arg := files[0]
	if *outPath != "" {
		if err := checkOutput("-o", *outPath); err != nil {
			return err
		}
		for _, in := range reportInputs(arg) {
			if sameFile(*outPath, in) {
				return usagef("-o %s would overwrite %s, which the drawing reads; write the SVG to another file", *outPath, in)
			}
		}
	}
	sh, ok := drawing.ParseShow(*show)
	if !ok {
		return usagef("--show: unknown value %q (use shares, forces or ratios)", *show)
	}
	comp := drawing.NoField
	if *field != "" {
		if comp, ok = drawing.ParseComponent(*field); !ok {
			return usagef("--field: unknown component %q (use shear or vertical)", *field)
		}
	}
	// The basis hook: the basis work adds "fe" (pier values from the
	// finite-element model); until then every value is the classic one.
	switch *basis {
	case "", "classic":
	case "fe":
		return usagef("--basis fe: the finite-element basis is not in this build yet; draw with the classic basis (the default), and use --field to see the finite-element stresses")
	default:
		return usagef("--basis: unknown basis %q (use classic or fe)", *basis)
	}
	now := time.Now()
	var svg []byte
	var classicErr error // the drawing is written, but the wall has no answer
	if comp == drawing.NoField && (ff.mesh != "" || ff.element != "") {
		return usagef("--mesh and --element set up the stress map's model: they go with --field")
	}
	if isStorey(arg) {
		if comp != drawing.NoField || sh != drawing.Shares {
			return usagef("--show and --field apply to wall files, not to the storey file %s", arg)
		}
		a, err := storey.Load(arg)
		if err != nil {
			return err
		}
		if svg, err = drawing.Storey(drawing.StoreyInput{Analysis: a, Now: now, Version: version}); err != nil {
			return err
		}
	} else {
		s, err := solveArg(arg, nil)
		if err != nil {
			return err
		}
		in := drawing.WallInput{
			Path: arg, Wall: s.wall, Basis: "classic strip method", Piers: drawing.LeafPiers(s.res),
			Show: sh, Component: comp, Now: now, Version: version,
		}
		if s.res != nil {
			in.HasLoad, in.Warnings = s.res.HasLoad, pier.Texts(s.res.Warnings)
		} else if s.err != nil {
			in.NoAnswer = s.err.Error()
			classicErr = s.err
		}
		if sh == drawing.Ratios {
			if pierRatios == nil {
				return usagef("--show ratios: pier design is not available yet for drawings (the design checks are not yet connected to the wall file's reinforcement and loads), so there are no demand/capacity ratios to draw; use --show shares or --show forces")
			}
			if in.Ratio, err = pierRatios(s); err != nil {
				return err
			}
		}
		if comp != drawing.NoField {
			opt, err := ff.options(s.wall)
			if err != nil {
				return err
			}
			if in.Field, err = fe.StressField(s.wall, s.res, opt); err != nil {
				return fmt.Errorf("%s: the stress field: %w", displayName(arg), err)
			}
		}
		if svg, err = drawing.Wall(in); err != nil {
			return err
		}
	}
	if *outPath == "" {
		if _, err := e.stdout.Write(svg); err != nil {
			return err
		}
	} else {
		if err := writeOutput("-o", *outPath, svg); err != nil {
			return err
		}
		fmt.Fprintln(e.stderr, "drawing written to", *outPath)
	}
	if classicErr != nil {
		var le *locatedError
		if errors.As(classicErr, &le) {
			return classicErr // it names the file already
		}
		return fmt.Errorf("%s: %w", displayName(arg), classicErr)
	}
	return nil
}
