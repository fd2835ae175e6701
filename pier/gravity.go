package pier

import "pierwise/geometry"

// DefaultSelfWeight returns the wall's weight per face area when the file
// gives none: a unit weight for the material times the thickness
// (docs/method.md §6). Zero when the thickness is unknown.
//
// Unit weights (from memory; common practice): reinforced normal-weight
// concrete 150 lb/ft³ (ASCE 7-22 Commentary Table C3.1-2, clause number
// from memory); fully grouted normal-weight concrete masonry and solid clay
// masonry about 130 lb/ft³ (about 83 lb/ft² for an 8 in nominal wall).
func DefaultSelfWeight(w *geometry.Wall) geometry.Stress {
	const pcf = geometry.Stress(geometry.Pound) / geometry.Stress(geometry.Foot*geometry.Foot*geometry.Foot)
	unit := 130 * pcf
	if w.Material.Kind == geometry.Concrete {
		unit = 150 * pcf
	}
	return unit * geometry.Stress(w.Thickness)
}
