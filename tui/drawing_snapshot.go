package tui

import (
	"bytes"
	"errors"
	"io"
	"io/fs"
	"os"
	"path/filepath"
	"strings"

	"pierwise/drawing"
	"pierwise/geometry"
	"pierwise/report"
)

// reportDrawnMsg says where a report snapshot and its drawing went.
type reportDrawnMsg struct {
	report, drawing string
	err             error
}

// writeReportAndDrawing writes the report snapshot of in beside the wall
// file, with its SVG drawing under the same name (…-report-TIME.svg beside
// …-report-TIME.txt); the report names the drawing. Neither file is ever
// written over an existing one. It runs in a tea.Cmd.
func writeReportAndDrawing(in report.Input, draw drawing.WallInput) (txt, svgPath string, err error) {
	svg, err := drawing.Wall(draw)
	if err != nil {
		return "", "", err
	}
	for n := 1; n < 100; n++ {
		txt = snapshotPath(in.Path, "report", in.Now, n)
		svgPath = strings.TrimSuffix(txt, ".txt") + ".svg"
		if _, err := os.Lstat(txt); err == nil {
			continue
		}
		if err := createNew(svgPath, func(w io.Writer) error { _, err := w.Write(svg); return err }); err != nil {
			if errors.Is(err, fs.ErrExist) {
				continue
			}
			return "", "", err
		}
		in.Drawing = filepath.Base(svgPath)
		var buf bytes.Buffer
		if err := report.Wall(&buf, in); err != nil {
			os.Remove(svgPath)
			return "", "", err
		}
		if err := createNew(txt, func(w io.Writer) error { _, err := w.Write(buf.Bytes()); return err }); err != nil {
			os.Remove(svgPath)
			if errors.Is(err, fs.ErrExist) {
				continue
			}
			return "", "", err
		}
		return txt, svgPath, nil
	}
	return "", "", errors.New("too many snapshots in the same second")
}

// createNew writes a file that must not exist yet (geometry.CreateNewFile:
// written whole, then linked into place; nothing is left on an error).
func createNew(path string, write func(io.Writer) error) error {
	var buf bytes.Buffer
	if err := write(&buf); err != nil {
		return err
	}
	return geometry.CreateNewFile(path, buf.Bytes())
}
