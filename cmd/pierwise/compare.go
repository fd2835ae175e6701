package main

import (
	"bytes"
	"errors"
	"fmt"
	"io"
	"os"
	"path/filepath"
	"strings"
	"time"

	"pierwise/geometry"
	"pierwise/pier"
	"pierwise/report"
	"pierwise/study"
)

func init() {
	register(command{
		name:  "compare",
		args:  "FILE[:LAYOUT] FILE[:LAYOUT]... [-o OUT] [--basis classic|fe] [--fe] [--mesh SIZE] [--element q4|qm6]",
		short: "compare opening layouts side by side (the first against each of the others; one FILE alone: all its layouts)",
		run:   runCompare,
	})
}

func runCompare(e *env, args []string) error {
	fs := newFlags(e, "compare")
	outPath := fs.String("o", "", "write the comparison report to `OUT` instead of standard output")
	var ff feFlags
	ff.register(fs, "also run the finite-element check on every layout")
	pos, err := parseInterleaved(fs, args)
	if err != nil {
		return err
	}
	if len(pos) == 0 {
		return usagef("compare: give two or more walls as FILE[:LAYOUT], or one FILE with several layouts")
	}
	walls, err := compareWalls(pos)
	if err != nil {
		return err
	}
	if *outPath != "" {
		if err := checkOutput("compare: -o", *outPath); err != nil {
			return err
		}
		for _, w := range walls {
			if sameFile(*outPath, w.path) {
				return usagef("compare: -o %s would overwrite the wall file %s; write the comparison to another file", *outPath, w.path)
			}
		}
	}
	ff.implied()
	var opt study.Options
	// One basis for every layout compared: the flag's, else the first
	// wall file's.
	if opt.Basis, err = ff.chosen(walls[0].wall); err != nil {
		return err
	}
	if ff.on || opt.Basis == geometry.BasisFE {
		opt.FE = ff.on
		// The mesh of the first wall's file, unless given here.
		if opt.FEOptions, err = ff.options(walls[0].wall); err != nil {
			return err
		}
	}
	if len(walls) < 2 {
		return usagef("compare: %s has a single layout; give two or more walls as FILE[:LAYOUT]", pos[0])
	}

	// The report is built in memory and written at once: to standard
	// output, or atomically to OUT (never a half-written file).
	var buf bytes.Buffer
	out := io.Writer(&buf)
	info := report.CompareInfo{Now: time.Now(), Version: version}
	// A layout the classic method cannot solve (cut or staggered) is shown
	// in the comparison and, as in solve, makes the exit status 1.
	var noAnswer []string
	var feFailures []string // a check asked for that failed: exit status 1 too
	seen := map[string]bool{}
	var cs []*study.Comparison
	for i := 1; i < len(walls); i++ {
		c, err := study.CompareWith(walls[0].wall, walls[i].wall, opt)
		if err != nil {
			return err
		}
		for k, side := range []*study.Side{&c.Before, &c.After} {
			if cw := walls[[]int{0, i}[k]]; side.Err != nil && !seen[cw.label] {
				seen[cw.label] = true
				noAnswer = append(noAnswer, noAnswerLine(cw, side.Err))
			} else if side.Err == nil && side.FEErr != nil && !seen[cw.label] {
				seen[cw.label] = true
				feFailures = append(feFailures, cw.label+": "+side.FEErr.Error())
			}
		}
		c.Before.Path, c.Before.Label = walls[0].path, walls[0].label
		c.After.Path, c.After.Label = walls[i].path, walls[i].label
		cs = append(cs, c)
	}
	// One report: each comparison begins a sheet, numbered through.
	if err := report.CompareReports(out, cs, info); err != nil {
		return err
	}
	if *outPath == "" {
		if _, err := e.stdout.Write(buf.Bytes()); err != nil {
			return err
		}
	} else {
		if err := writeOutput("compare: -o", *outPath, buf.Bytes()); err != nil {
			return err
		}
		fmt.Fprintln(e.stderr, "comparison written to", *outPath)
	}
	if len(noAnswer) > 0 {
		if opt.Basis == geometry.BasisFE {
			return fmt.Errorf("the finite-element basis has no answer for %s", strings.Join(noAnswer, "; "))
		}
		return fmt.Errorf("the classic method has no answer for %s", strings.Join(noAnswer, "; "))
	}
	if len(feFailures) > 0 {
		return fmt.Errorf("the finite-element check failed for %s", strings.Join(feFailures, "; "))
	}
	return nil
}

type compareSide struct {
	path, label string
	wall        *geometry.Wall
}

// compareWalls opens the arguments; a single FILE without a variant stands
// for all of its layouts.
func compareWalls(args []string) ([]compareSide, error) {
	var out []compareSide
	for _, a := range args {
		w, err := study.Open(a)
		if err != nil {
			return nil, err
		}
		path, _ := study.SplitArg(a)
		lw := func(w *geometry.Wall) compareSide {
			return compareSide{path: path, label: filepath.Base(path) + ":" + w.Layouts[w.Active].Name, wall: w}
		}
		if _, variant := study.SplitArg(a); len(args) == 1 && variant == "" {
			for i := range w.Layouts {
				out = append(out, lw(study.WithLayout(w, i)))
			}
			continue
		}
		out = append(out, lw(w))
	}
	return out, nil
}

// sameFile reports whether the paths name one existing file (a report
// written with -o onto its own wall file would destroy the wall).
func sameFile(a, b string) bool {
	fa, err := os.Stat(a)
	if err != nil {
		return false
	}
	fb, err := os.Stat(b)
	return err == nil && os.SameFile(fa, fb)
}

// noAnswerLine says which layout the classic method cannot solve; for a
// cut wall it names the file, line and key of the opening that cuts it.
func noAnswerLine(cw compareSide, err error) string {
	var ce *pier.CutError
	if errors.As(err, &ce) {
		if data, rerr := geometry.ReadUserFile(cw.path); rerr == nil {
			if key := geometry.OpeningKey(cw.wall, ce.Opening); key != "" {
				return fmt.Sprintf("%s:%d: %s: %v (layout %q)", cw.path, geometry.KeyLine(data, key), key, err, cw.wall.Layouts[cw.wall.Active].Name)
			}
		}
	}
	return fmt.Sprintf("%s: %v", cw.label, err)
}
