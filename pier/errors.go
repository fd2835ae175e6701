package pier

import (
	"fmt"
	"strings"

	"pierwise/geometry"
)

// CutError says that the openings leave no continuous solid path from the
// base of a region to its top: the wall (or a pier) has no load path and no
// rigidity.
type CutError struct {
	Region  string // "wall" or a pier name
	Opening string // an opening that completes the cut
}

func (e *CutError) Error() string {
	return fmt.Sprintf("opening %s cuts the %s in two: there is no load path from its base to its top", e.Opening, regionName(e.Region))
}

// StaggeredError says that a band has no pier: staggered openings together
// cover the band's whole length, which the classic method cannot represent.
type StaggeredError struct {
	Region   string          // "wall" or a pier name
	Y0, Y1   float64         // the band, metres
	Openings []string        // the openings of the band
	Units    geometry.System // how the message shows the heights (the wall's units)
}

func (e *StaggeredError) Error() string {
	return fmt.Sprintf("openings %s are staggered across the whole length of the %s between heights %s and %s: the classic method has no pier to work with there; use the finite-element check",
		strings.Join(e.Openings, ", "), regionName(e.Region),
		geometry.FormatLength(geometry.Length(e.Y0), e.Units), geometry.FormatLength(geometry.Length(e.Y1), e.Units))
}

func regionName(r string) string {
	if r == "" || r == "wall" {
		return "wall"
	}
	return "pier " + r
}
