package geometry

import (
	"strconv"
	"strings"
)

// Error is one problem with a wall, as precise as its origin allows: File
// and Line are set when the wall came from a file, Key names the setting in
// the file's terms ("length", "material.strength", "opening[2].width",
// "variant[1].opening[3]"; tables of an array are counted from 1 in the
// order they appear in their layout).
type Error struct {
	File string
	Line int
	Key  string
	Msg  string
}

// Error returns "file:line: key: msg", leaving out the parts that are not
// known.
func (e *Error) Error() string {
	var b strings.Builder
	if e.File != "" {
		b.WriteString(e.File)
		if e.Line > 0 {
			b.WriteString(":")
			b.WriteString(strconv.Itoa(e.Line))
		}
		b.WriteString(": ")
	} else if e.Line > 0 {
		b.WriteString("line ")
		b.WriteString(strconv.Itoa(e.Line))
		b.WriteString(": ")
	}
	if e.Key != "" {
		b.WriteString(e.Key)
		b.WriteString(": ")
	}
	b.WriteString(e.Msg)
	return b.String()
}

// ErrorList is every problem found at once, in the order of the file where
// the wall came from a file.
type ErrorList []*Error

// Error joins the errors with newlines.
func (l ErrorList) Error() string {
	s := make([]string, len(l))
	for i, e := range l {
		s[i] = e.Error()
	}
	return strings.Join(s, "\n")
}

// Unwrap gives errors.As and errors.Is access to each *Error.
func (l ErrorList) Unwrap() []error {
	errs := make([]error, len(l))
	for i, e := range l {
		errs[i] = e
	}
	return errs
}

// Err returns the list as an error, or nil when it is empty.
func (l ErrorList) Err() error {
	if len(l) == 0 {
		return nil
	}
	return l
}

func (l *ErrorList) add(key, msg string) {
	*l = append(*l, &Error{Key: key, Msg: msg})
}
