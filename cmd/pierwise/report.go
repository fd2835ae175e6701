package main

import (
	"bytes"
	"errors"
	"fmt"
	"os"
	"strings"
	"time"

	"pierwise/geometry"
	"pierwise/report"
	"pierwise/storey"
	"pierwise/study"
)

func init() {
	register(command{
		name:  "report",
		args:  "[FILE[:LAYOUT]] [-o OUT] [--basis classic|fe] [--fe] [--mesh SIZE] [--element q4|qm6]",
		short: "write the text report of a wall (or of a storey file) for the calculation package",
		run:   runReport,
	})
}

func runReport(e *env, args []string) error {
	fs := newFlags(e, "report")
	outPath := fs.String("o", "", "write the report to this file (atomically) instead of standard output")
	var ff feFlags
	ff.register(fs, "include the finite-element check")
	files, err := parseInterleaved(fs, args)
	if err != nil {
		return err
	}
	if len(files) > 1 {
		return usagef("report takes one FILE, got %d", len(files))
	}
	ff.implied()
	arg := ""
	if len(files) == 1 {
		arg = files[0]
	}
	if *outPath != "" {
		if err := checkOutput("-o", *outPath); err != nil {
			return err
		}
		for _, in := range reportInputs(arg) {
			if sameFile(*outPath, in) {
				return usagef("-o %s would overwrite %s, which the report reads; write the report to another file", *outPath, in)
			}
		}
	}
	var buf bytes.Buffer
	var classicErr error // the report is written, but the wall has no answer
	var feErr error      // the report is written, but the check asked for failed
	now := time.Now()
	if isStorey(arg) {
		if ff.on || ff.basis != "" {
			return usagef("--fe, --mesh, --element and --basis apply to wall files, not to the storey file %s (the storey file's basis key, or pierwise storey --basis)", arg)
		}
		if err := storey.WriteReport(&buf, arg, now, version); err != nil {
			return err
		}
	} else {
		s, err := solveArg(arg, &ff)
		if err != nil {
			return err
		}
		in := report.Input{Path: arg, Wall: s.wall, Result: s.res, Err: s.err, FE: s.fe, FEErr: s.feErr, Basis: s.b, Design: s.design, DesignErr: s.designErr, Now: now, Version: version}
		if err := report.Wall(&buf, in); err != nil {
			return err
		}
		classicErr = s.basisErr()
		if classicErr == nil && s.feErr != nil {
			feErr = feFailed(arg, s.feErr)
		}
	}
	if *outPath == "" {
		if _, err := e.stdout.Write(buf.Bytes()); err != nil {
			return err
		}
	} else {
		if err := writeOutput("-o", *outPath, buf.Bytes()); err != nil {
			return err
		}
		fmt.Fprintln(e.stderr, "report written to", *outPath)
	}
	if classicErr != nil {
		return namedFailure(arg, classicErr)
	}
	return feErr
}

// namedFailure is err, the reason a command's output has no answer for
// arg, named by its file: as it is when it names its file and line
// already, else headed by the file's name.
func namedFailure(arg string, err error) error {
	var le *locatedError
	if errors.As(err, &le) {
		return err
	}
	return fmt.Errorf("%s: %w", displayName(arg), err)
}

// reportInputs lists the files a report of arg reads: the wall file, or a
// storey file and each of its wall files.
func reportInputs(arg string) []string {
	if arg == "" {
		return nil
	}
	path, _ := study.SplitArg(arg)
	files := []string{path}
	if data, err := geometry.ReadUserFile(path); err == nil && storey.IsStoreyFile(data) {
		if s, err := storey.Parse(path, data); err == nil {
			for _, w := range s.Walls {
				files = append(files, w.Path)
			}
		}
	}
	return files
}

// isStorey reports whether arg names a storey file rather than a wall file.
func isStorey(arg string) bool {
	if arg == "" || strings.Contains(arg, ":") && !fileExists(arg) {
		return false
	}
	data, err := geometry.ReadUserFile(arg)
	return err == nil && storey.IsStoreyFile(data)
}

func fileExists(p string) bool {
	_, err := os.Stat(p)
	return err == nil
}
