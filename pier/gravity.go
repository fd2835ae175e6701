package pier

import (
	"fmt"
	"math"

	"pierwise/geometry"
)

// SelfWeight is a wall's own weight per area of its face and where the
// figure came from (docs/method.md §6).
type SelfWeight struct {
	Weight geometry.Stress // N/m² of wall face; zero when there is none or it is not known
	Source string          // e.g. "given in the file", or the default's source
}

// PoundPerCubicFoot is 1 lb/ft³ in N/m³.
const PoundPerCubicFoot = float64(geometry.Pound) / (float64(geometry.Foot) * float64(geometry.Foot) * float64(geometry.Foot))

// Unit weights of the wall's material behind DefaultSelfWeight, in N/m³ of
// wall (weight per face area divided by the actual thickness).
const (
	// Solidly grouted concrete masonry: about 130 lb/ft³ of wall. NCMA TEK
	// 14-13B, Concrete Masonry Wall Weights (2008), tabulates 8 in walls
	// solidly grouted at about 78–87 lb/ft² for units of 115–135 lb/ft³
	// (values from memory); 130 lb/ft³ × 7.625 in gives 83 lb/ft². A
	// partially grouted or ungrouted wall is lighter: give self_weight.
	UnitWeightConcreteMasonry = 130 * PoundPerCubicFoot
	// Solid clay brick masonry: 120 lb/ft³ of wall (common practice, from
	// memory).
	UnitWeightClayMasonry = 120 * PoundPerCubicFoot
	// Normal-weight reinforced concrete: 150 lb/ft³ (common practice).
	UnitWeightConcrete = 150 * PoundPerCubicFoot
)

// DefaultSelfWeight returns the default self weight of w from its material
// and thickness: the unit weight of the material (UnitWeight…) times the
// thickness. It is zero, with a source that says why, when the thickness is
// not given or the material is custom (its density is not known).
func DefaultSelfWeight(w *geometry.Wall) SelfWeight {
	t := float64(w.Thickness)
	if !(t > 0) || math.IsInf(t, 0) {
		return SelfWeight{Source: "not known: the wall has no thickness"}
	}
	var gamma float64
	var src string
	switch w.Material.Kind {
	case geometry.ConcreteMasonry:
		gamma, src = UnitWeightConcreteMasonry, "solidly grouted concrete masonry, 130 lb/ft³ × thickness (NCMA TEK 14-13B)"
	case geometry.ClayMasonry:
		gamma, src = UnitWeightClayMasonry, "solid clay masonry, 120 lb/ft³ × thickness (common practice)"
	case geometry.Concrete:
		gamma, src = UnitWeightConcrete, "normal-weight concrete, 150 lb/ft³ × thickness (common practice)"
	default:
		return SelfWeight{Source: "not known for a custom material: give self_weight"}
	}
	return SelfWeight{Weight: geometry.Stress(gamma * t), Source: src}
}

// SelfWeightOf returns the self weight the analyses use: the file's
// self_weight when given, none when the file sets it to zero on purpose,
// and DefaultSelfWeight otherwise. A negative or non-finite value is an
// error.
func SelfWeightOf(w *geometry.Wall) (SelfWeight, error) {
	g := w.Gravity
	switch q := float64(g.SelfWeight); {
	case math.IsNaN(q) || math.IsInf(q, 0) || q < 0:
		return SelfWeight{}, fmt.Errorf("pier: self weight must be a non-negative number, got %g Pa", q)
	case g.NoSelf:
		return SelfWeight{Source: "none (self_weight = 0)"}, nil
	case q > 0:
		return SelfWeight{Weight: g.SelfWeight, Source: "given"}, nil
	}
	return DefaultSelfWeight(w), nil
}
