package pier

import "fmt"

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
	Region   string   // "wall" or a pier name
	Y0, Y1   float64  // the band, metres
	Openings []string // the openings of the band
}

func (e *StaggeredError) Error() string {
	return fmt.Sprintf("openings %v are staggered across the whole length of the %s between heights %.3g m and %.3g m: the classic method has no pier to work with there; use the finite-element check", e.Openings, regionName(e.Region), e.Y0, e.Y1)
}

func regionName(r string) string {
	if r == "" || r == "wall" {
		return "wall"
	}
	return "pier " + r
}
