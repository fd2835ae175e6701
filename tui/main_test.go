package tui

import (
	"flag"
	"os"
	"testing"

	"github.com/charmbracelet/lipgloss"
	"github.com/muesli/termenv"
)

var update = flag.Bool("update", false, "rewrite the golden files in testdata")

func TestMain(m *testing.M) {
	// Plain ASCII output: golden files and teatest flows see text only, and
	// the elevation uses its monochrome textures.
	lipgloss.SetColorProfile(termenv.Ascii)
	os.Exit(m.Run())
}
