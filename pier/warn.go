package pier

import (
	"fmt"
	"slices"
	"strings"

	"pierwise/geometry"
)

// Thresholds of the warnings about the method's assumptions.
const (
	// SlenderRatio: beyond h/L = 4 a pier is a slender column rather than
	// a wall pier; its share hangs on end fixity the method assumes.
	SlenderRatio = 4.0
	// SliverLength: a pier shorter than this many wall thicknesses is a
	// sliver left by an opening close to an edge or to another opening.
	SliverLength = 2.0
	// sliverRatio stands in for SliverLength when the thickness is unknown.
	sliverRatio = 10.0
	// SpandrelRatio: a spandrel (or the solid between two bands) shallower
	// than this fraction of the height of the piers it is assumed to fix
	// is shallow. Basis, measured with the finite-element model
	// (docs/method.md §2.6; TestSpandrelThreshold in pier/fe): on walls with
	// two windows between three piers, below half the pier height the
	// spandrel alone adds more than fe.WarnDifference (25 %) to the classic
	// method's overestimate of the rigidity, against the same wall with a
	// spandrel 1.5 times the pier height; at 0.75 it adds 12–23 %.
	SpandrelRatio = 0.5
)

// warn records a warning once (the first of equal texts).
func (s *solver) warn(kind string, sev Severity, subject, msg string) {
	if slices.ContainsFunc(s.res.Warnings, func(w Warning) bool { return w.Text == msg }) {
		return
	}
	s.res.Warnings = append(s.res.Warnings, Warning{Kind: kind, Severity: sev, Subject: subject, Text: msg})
}

// spandrels warns when the solid above or below band bi of a region is
// shallower than the band's piers, which the method assumes it fixes
// against rotation. above is the solid over the region (see region), part
// of the spandrel of the region's top band.
func (s *solver) spandrels(rect geometry.Rect, bands []band, bi int, region string, ops []opening, above float64) {
	b := bands[bi]
	h := b.y1 - b.y0
	top := rect.Y1 + above
	if bi+1 < len(bands) {
		top = bands[bi+1].y0
	}
	if depth := top - b.y1; depth > s.eps && depth < SpandrelRatio*h-s.eps {
		s.warn(WarnSpandrel, SeverityCaution, s.bandNames(b, ops), fmt.Sprintf("in %s the spandrel above %s is %.2f times as deep as the piers beside %s are tall: it is assumed to keep them from rotating, which a spandrel shallower than %.1f times the piers' height does not do, so their rigidity is overestimated (docs/method.md §2.6)",
			where(region), s.openingsPhrase(b, ops), depth/h, themOrIt(b), SpandrelRatio))
	}
	if bi > 0 {
		if depth := b.y0 - bands[bi-1].y1; depth < SpandrelRatio*h-s.eps {
			s.warn(WarnSolidBetween, SeverityCaution, s.bandNames(b, ops), fmt.Sprintf("in %s the solid between %s and %s below is %.2f times as deep as the piers above it are tall: it is assumed rigid, which it is not",
				where(region), s.openingsPhrase(b, ops), s.bandNames(bands[bi-1], ops), depth/h))
		}
	}
}

// openingsPhrase names a band's openings in a sentence: "the opening W1",
// "the openings W1, W2".
func (s *solver) openingsPhrase(b band, ops []opening) string {
	if len(b.ops) == 1 {
		return "the opening " + s.bandNames(b, ops)
	}
	return "the openings " + s.bandNames(b, ops)
}

// themOrIt is the pronoun for a band's openings.
func themOrIt(b band) string {
	if len(b.ops) == 1 {
		return "it"
	}
	return "them"
}

// where names a region in a sentence: "the wall" or "pier P2".
func where(region string) string {
	if region == "" || region == "wall" {
		return "the wall"
	}
	return "pier " + region
}

// bandNames lists a band's openings for a warning.
func (s *solver) bandNames(b band, ops []opening) string {
	return strings.Join(bandNames(b, ops), ", ")
}

// assumptions adds the warnings that look at the finished decomposition.
func (s *solver) assumptions(w *geometry.Wall, ops []opening) {
	for _, p := range s.res.Piers {
		if p.Cut || len(ops) == 0 {
			continue // a solid wall's one pier is the wall, which has its own warning
		}
		ratio := p.Ratio()
		switch {
		case s.thick > 0 && p.L() < SliverLength*s.thick:
			s.warn(WarnSliver, SeverityCaution, p.Name, fmt.Sprintf("pier %s is a sliver, only %.1f times as long as the wall is thick: it acts as a column, not as a wall pier; consider moving the opening beside it to the edge or away from it", p.Name, p.L()/s.thick))
		case s.thick == 0 && ratio > sliverRatio:
			s.warn(WarnSliver, SeverityCaution, p.Name, fmt.Sprintf("pier %s is a sliver (h/L = %.1f): it acts as a column, not as a wall pier", p.Name, ratio))
		case ratio > SlenderRatio:
			s.warn(WarnSlender, SeverityCaution, p.Name, fmt.Sprintf("pier %s is slender (h/L = %.1f > %g): the formulas are meant for wall piers; its small share depends on end fixity the method only assumes", p.Name, ratio, SlenderRatio))
		}
	}
	if ratio := float64(w.Height) / float64(w.Length); ratio > SlenderRatio {
		s.warn(WarnSlenderWall, SeverityCaution, "wall", fmt.Sprintf("the wall is slender (h/L = %.1f > %g): it acts as a column rather than a shear wall, and the formulas are meant for wall proportions", ratio, SlenderRatio))
	}
	s.edges(w, ops)
	if w.Support == geometry.Fixed {
		s.warn(WarnFixedTop, SeverityInfo, "wall", "the wall's top is assumed held against rotation (fixed-fixed): the structure above must provide that restraint")
	}
}

// edges warns about openings that stop just short of the wall's base or
// top: the thin strip left there counts as solid wall in the method, which
// it barely is. (Near an end, the sliver pier warning says it.)
func (s *solver) edges(w *geometry.Wall, ops []opening) {
	limit := SliverLength * s.thick
	if s.thick == 0 {
		limit = float64(w.Height) / sliverRatio / 5 // 2 % of the height
	}
	top := float64(w.Height)
	for _, o := range ops {
		if gap := o.r.Y0; gap > s.eps && gap < limit {
			s.warn(WarnNearEdge, SeverityCaution, o.name, fmt.Sprintf("opening %s stops %s above the base: the thin strip below it is taken as solid wall, which it barely is; consider taking the opening down to the base", o.name, geometry.FormatLength(geometry.Length(gap), w.Units)))
		}
		if gap := top - o.r.Y1; gap > s.eps && gap < limit {
			s.warn(WarnNearEdge, SeverityCaution, o.name, fmt.Sprintf("opening %s stops %s below the top: the thin strip above it is taken as solid wall, which it barely is; consider taking the opening up to the top", o.name, geometry.FormatLength(geometry.Length(gap), w.Units)))
		}
	}
}
