package pier

import (
	"fmt"
	"strings"

	"pierwise/geometry"
)

// driftNotes adds the warnings about the wall's drift check
// (docs/method.md §7) when one is asked for (a limit, C_d or I_e given):
// a limit preset whose row of ASCE 7-22 Table 12.12-1 does not fit the
// wall, a single top load on a wall with openings at more than one level,
// gross-section stiffness, and a wind load (the check is a seismic one).
func (s *solver) driftNotes(w *geometry.Wall, root *node) {
	d := w.Drift
	if d.Limit <= 0 && d.Preset == "" && d.Cd == 0 && d.Ie == 0 {
		return
	}
	if w.Load.Kind == geometry.Wind {
		s.warn(WarnDriftWind, SeverityCaution, "drift", "the wall's lateral load is wind: the design drift δ = C_d·δe/I_e and the limits of ASCE 7-22 Table 12.12-1 belong to the seismic load effect (ASCE 7-22 §12.8.6, §12.12.1); under wind, drift is a serviceability check with limits the engineer chooses (ASCE 7-22 Appendix C, from memory), so read this check as a seismic one only (docs/method.md §7)")
	}
	if msg := PresetMisfit(w, s.res); msg != "" {
		s.warn(WarnDriftRow, SeverityCaution, "drift", msg)
	}
	if n := len(root.bands); n > 1 {
		var at []string
		for _, b := range root.bands {
			at = append(at, geometry.FormatLength(geometry.Length(b.y0), w.Units)+"–"+geometry.FormatLength(geometry.Length(b.y1), w.Units))
		}
		s.warn(WarnDriftStoreys, SeverityCaution, "drift", fmt.Sprintf("the wall has openings at %d levels (%s): one load at its top gives the top deflection of the whole wall, not a storey drift; ASCE 7-22 §12.8.6 takes each storey's drift as the difference of the deflections at its top and bottom under the storey forces (docs/method.md §7)", n, strings.Join(at, ", ")))
	}
	if orOne(w.Stiffness.Flexure) == 1 && orOne(w.Stiffness.Shear) == 1 {
		s.warn(WarnDriftGross, SeverityInfo, "drift", "the drift is computed on gross sections; ASCE 7-22 §12.7.3 asks for the stiffness of cracked sections in concrete and masonry: set [stiffness] flexure and shear (the wall form, E), e.g. flexure = 0.35 for cracked concrete walls (ACI 318-19 Table 6.6.3.1.1(a)); for masonry the engineer chooses the value (docs/method.md §3)")
	}
}

func orOne(x float64) float64 {
	if x == 0 {
		return 1
	}
	return x
}

// PresetMisfit says why the wall's drift limit preset does not fit it, by
// the row of ASCE 7-22 Table 12.12-1 and its footnote (docs/method.md §7),
// or returns "". res (may be nil) tells which piers are fixed-fixed. A
// typed limit and a custom material are the engineer's to judge.
func PresetMisfit(w *geometry.Wall, res *Result) string {
	p, ok := geometry.FindDriftPreset(w.Drift.Preset)
	if !ok {
		return ""
	}
	masonry := w.Material.Kind == geometry.ConcreteMasonry || w.Material.Kind == geometry.ClayMasonry
	concrete := w.Material.Kind == geometry.Concrete
	isMasonryRow := strings.HasPrefix(p.Name, "masonry-")
	switch {
	case isMasonryRow && concrete:
		return fmt.Sprintf("drift limit %s is the row of ASCE 7-22 Table 12.12-1 for masonry shear wall structures, and this wall is concrete: use a row for other structures (low-rise-… or other-…)", p.Name)
	case !isMasonryRow && masonry:
		return fmt.Sprintf("drift limit %s is a row of ASCE 7-22 Table 12.12-1 that excludes masonry shear wall structures (they have rows of their own): use masonry-cantilever (0.010 h_sx, footnote d) or masonry-other (0.007 h_sx)", p.Name)
	case p.Name == "masonry-cantilever" && masonry:
		var fixed []string
		if res != nil {
			for _, q := range res.Piers {
				if q.Leaf && !q.Cut && q.Support == geometry.Fixed && len(res.Piers) > 1 {
					fixed = append(fixed, q.Name)
				}
			}
		}
		why := ""
		switch {
		case w.Support == geometry.Fixed:
			why = "the wall's top is held against rotation"
		case len(fixed) > 0:
			why = "piers " + strings.Join(fixed, ", ") + " are fixed-fixed, coupled by the spandrel above them"
		}
		if why != "" {
			return "drift limit masonry-cantilever (ASCE 7-22 Table 12.12-1, footnote d: walls cantilevered from their base with negligible moment transfer, or coupling, between them) does not fit this wall: " + why + "; use masonry-other (0.007 h_sx) (footnote letter from memory)"
		}
	}
	return ""
}
