package tui

import (
	"flag"
	"os"
	"testing"

	"github.com/charmbracelet/lipgloss"
	"github.com/muesli/termenv"
)

// update is true with -update: the golden tests rewrite their files. The
// flag itself is registered by teatest's golden package (imported by the
// flow tests); it is read once flags are parsed.
var update = new(bool)

func TestMain(m *testing.M) {
	flag.Parse()
	if f := flag.Lookup("update"); f != nil {
		*update = f.Value.String() == "true"
	}
	// Plain ASCII output: golden files and teatest flows see text only, and
	// the elevation uses its monochrome textures.
	lipgloss.SetColorProfile(termenv.Ascii)
	os.Exit(m.Run())
}
