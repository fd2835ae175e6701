// Command pierwise computes the lateral rigidity of masonry and concrete
// shear walls with openings, the share of the wall shear each pier takes,
// and the wall's deflection and drift; it checks the hand method against a
// plane-stress finite-element model and distributes a storey shear among
// walls. Run without arguments it opens the editor on a built-in demo wall.
//
// Each subcommand lives in its own file and registers itself from init.
package main

import (
	"errors"
	"flag"
	"fmt"
	"io"
	"os"
	"sort"
	"strings"

	"pierwise/geometry"
)

// version is the program version printed in reports.
const version = "0.1.0"

// Exit statuses (README: the command line).
const (
	exitOK    = 0
	exitInput = 1 // bad input: the message names file, line and key
	exitUsage = 2
)

// command is one subcommand. run gets the arguments after the command name
// and returns an error; wrap it with usageError for a usage problem.
type command struct {
	name  string
	args  string // argument synopsis, e.g. "FILE... [--json]"
	short string // one line for the command list
	run   func(env *env, args []string) error
}

// env is what a command may touch of the outside world, so tests can run
// commands in-process.
type env struct {
	stdout, stderr io.Writer
	stdin          io.Reader
}

var commands = map[string]command{}

// register adds a subcommand; called from init in each command's file.
func register(c command) {
	if _, dup := commands[c.name]; dup {
		panic("pierwise: command registered twice: " + c.name)
	}
	commands[c.name] = c
}

// usageError marks an error as a usage problem (exit status 2).
type usageError struct{ msg string }

func (e *usageError) Error() string { return e.msg }

func usagef(format string, a ...any) error { return &usageError{fmt.Sprintf(format, a...)} }

// defaultCommand runs when pierwise is called with no arguments; the editor
// sets it to open the demo wall.
var defaultCommand func(env *env) error

func main() {
	os.Exit(run(&env{stdout: visibleWriter{os.Stdout}, stderr: visibleWriter{os.Stderr}, stdin: os.Stdin}, os.Args[1:]))
}

// run executes one command line and returns the exit status.
func run(e *env, args []string) int {
	if len(args) == 0 {
		if defaultCommand == nil {
			printUsage(e.stderr)
			return exitUsage
		}
		return status(e, defaultCommand(e))
	}
	switch args[0] {
	case "-h", "--help", "help":
		printUsage(e.stdout)
		return exitOK
	case "--version", "version":
		fmt.Fprintln(e.stdout, "pierwise", version)
		return exitOK
	}
	c, ok := commands[args[0]]
	if !ok {
		if fi, err := os.Stat(args[0]); err == nil && !fi.IsDir() {
			fmt.Fprintf(e.stderr, "pierwise: %q is a file, not a command: did you mean \"pierwise edit %s\" or \"pierwise solve %s\"?\n", args[0], args[0], args[0])
			return exitUsage
		}
		fmt.Fprintf(e.stderr, "pierwise: unknown command %q\n\n", args[0])
		printUsage(e.stderr)
		return exitUsage
	}
	return status(e, c.run(e, args[1:]))
}

func status(e *env, err error) int {
	if err == nil {
		return exitOK
	}
	var help *helpRequest
	if errors.As(err, &help) {
		help.print(e.stdout)
		return exitOK
	}
	var ue *usageError
	if errors.As(err, &ue) {
		fmt.Fprintln(e.stderr, "pierwise:", geometry.VisibleLines(ue.msg))
		fmt.Fprintln(e.stderr, "run 'pierwise help' for the commands")
		return exitUsage
	}
	fmt.Fprintln(e.stderr, "pierwise:", geometry.VisibleLines(strings.TrimRight(err.Error(), "\n")))
	return exitInput
}

func printUsage(w io.Writer) {
	fmt.Fprintln(w, "pierwise: rigidity, pier shares and drift of shear walls with openings")
	fmt.Fprintln(w)
	fmt.Fprintln(w, "usage:")
	fmt.Fprintln(w, "  pierwise                 open the editor on the built-in demo wall")
	names := make([]string, 0, len(commands))
	for n := range commands {
		names = append(names, n)
	}
	sort.Strings(names)
	for _, n := range names {
		c := commands[n]
		fmt.Fprintf(w, "  pierwise %s %s\n      %s\n", c.name, c.args, c.short)
	}
	fmt.Fprintln(w)
	fmt.Fprintln(w, "Results support, and do not replace, the judgement of a licensed engineer; local codes govern.")
}

// newFlags returns a flag set for a subcommand that reports errors as usage
// errors instead of exiting.
func newFlags(e *env, name string) *flag.FlagSet {
	fs := flag.NewFlagSet("pierwise "+name, flag.ContinueOnError)
	// The flag package would print a parse error and the flags itself;
	// status prints the error once, and -h prints the flags (helpRequest).
	fs.SetOutput(io.Discard)
	fs.Usage = func() {}
	return fs
}

// helpRequest is the answer to -h: print the command's synopsis and flags.
type helpRequest struct{ fs *flag.FlagSet }

func (h *helpRequest) Error() string { return "help requested" }

func (h *helpRequest) Is(target error) bool { return target == flag.ErrHelp }

func (h *helpRequest) print(w io.Writer) {
	name := strings.TrimPrefix(h.fs.Name(), "pierwise ")
	if c, ok := commands[name]; ok {
		fmt.Fprintf(w, "usage: pierwise %s %s\n  %s\n\nflags:\n", c.name, c.args, c.short)
	}
	h.fs.SetOutput(w)
	h.fs.PrintDefaults()
	h.fs.SetOutput(io.Discard)
}

// parseInterleaved parses flags that may come before, between or after the
// positional arguments (pierwise solve a.toml --json b.toml).
func parseInterleaved(fs *flag.FlagSet, args []string) ([]string, error) {
	var pos []string
	for {
		if err := fs.Parse(args); err != nil {
			if errors.Is(err, flag.ErrHelp) {
				return nil, &helpRequest{fs}
			}
			return nil, usagef("%v", err)
		}
		args = fs.Args()
		if len(args) == 0 {
			return pos, nil
		}
		pos = append(pos, args[0])
		args = args[1:]
	}
}
