package main

import (
	"fmt"
	"time"

	"pierwise/drawing"
	"pierwise/geometry"
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

func runDraw(e *env, args []string) error {
	fs := newFlags(e, "draw")
	outPath := fs.String("o", "", "write the SVG to this file (atomically) instead of standard output")
	show := fs.String("show", "shares", "what the piers carry: shares, forces (V and M) or ratios (demand/capacity)")
	field := fs.String("field", "", "map the finite-element stress over the wall: shear (τxy) or vertical (σy)")
	var ff feFlags
	ff.registerBasis(fs)
	fs.StringVar(&ff.mesh, "mesh", "", "maximum element size of the finite-element model, e.g. 6in or 150mm (with --field or --basis fe)")
	fs.StringVar(&ff.element, "element", "", "finite-element type: qm6 (default) or q4 (with --field or --basis fe)")
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
	// The pier values come from the chosen basis (docs/method.md §5).
	if ff.basis != "" {
		if _, err := parseBasisFlag(ff.basis); err != nil {
			return err
		}
	}
	now := time.Now()
	var svg []byte
	var classicErr error // the drawing is written, but the wall has no answer
	if isStorey(arg) {
		if comp != drawing.NoField || sh != drawing.Shares || ff.basis != "" {
			return usagef("--show, --field and --basis apply to wall files, not to the storey file %s (its basis is the storey file's)", arg)
		}
		a, err := storey.Load(arg)
		if err != nil {
			return err
		}
		if svg, err = drawing.Storey(drawing.StoreyInput{Analysis: a, Project: projectEntries(a.Storey.Project), Now: now, Version: version}); err != nil {
			return err
		}
	} else {
		s, err := solveArg(arg, &ff)
		if err != nil {
			return err
		}
		if comp == drawing.NoField && !s.b.IsFE() && (ff.mesh != "" || ff.element != "") {
			return usagef("--mesh and --element set up the finite-element model: they go with --field or --basis fe")
		}
		view := s.b.View()
		in := drawing.WallInput{
			Path: arg, Wall: s.wall, Basis: "classic strip method", Piers: drawing.LeafPiers(view),
			Show: sh, Component: comp, Project: projectEntries(s.wall.Project), Now: now, Version: version,
		}
		if s.b.IsFE() {
			in.Basis, in.FE = "plane-stress finite-element model", true
		}
		switch {
		case view != nil:
			in.HasLoad, in.Warnings = view.HasLoad, s.b.Warnings()
			if s.err != nil { // fe basis, no classic decomposition: no piers
				in.Warnings = append(in.Warnings, "the classic method has no answer here, so no piers are named: "+s.err.Error())
			}
		case s.basisErr() != nil:
			in.NoAnswer = s.basisErr().Error()
			classicErr = s.basisErr()
		}
		if sh == drawing.Ratios {
			if in.Ratio, err = drawRatios(s); err != nil {
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
		return namedFailure(arg, classicErr)
	}
	return nil
}

// projectEntries is the [project] table of a wall or storey file for the
// drawing's title block.
func projectEntries(p geometry.Project) []drawing.Entry {
	var out []drawing.Entry
	for _, e := range p.Entries() {
		out = append(out, drawing.Entry{Key: e[0], Value: e[1]})
	}
	return out
}
