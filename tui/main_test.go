package tui

import (
	"os"
	"testing"

	"github.com/charmbracelet/lipgloss"
	"github.com/muesli/termenv"
)

func TestMain(m *testing.M) {
	// Plain ASCII output: golden files and teatest flows see text only, and
	// the elevation uses its monochrome textures.
	lipgloss.SetColorProfile(termenv.Ascii)
	os.Exit(m.Run())
}
