package main

import "io"

// visibleWriter shows the C0 control characters (and DEL) of everything a
// command prints as escapes (\x1b, \x07), keeping newline, tab and form
// feed: the last guard, behind report.Text and geometry.Visible, so that no
// title or name from a file can drive the terminal. (Multi-byte characters
// pass untouched; report text has had geometry.Visible already.)
type visibleWriter struct{ w io.Writer }

const hexDigits = "0123456789abcdef"

func (v visibleWriter) Write(p []byte) (int, error) {
	clean := true
	for _, b := range p {
		if escapedByte(b) {
			clean = false
			break
		}
	}
	if clean {
		return v.w.Write(p)
	}
	out := make([]byte, 0, len(p)+16)
	for _, b := range p {
		if escapedByte(b) {
			out = append(out, '\\', 'x', hexDigits[b>>4], hexDigits[b&15])
			continue
		}
		out = append(out, b)
	}
	if _, err := v.w.Write(out); err != nil {
		return 0, err
	}
	return len(p), nil
}

func escapedByte(b byte) bool {
	return (b < 0x20 && b != '\n' && b != '\t' && b != '\f') || b == 0x7f
}
