package geometry

import "strconv"

// Names used in wall files for the enumerations. Each name maps to one value
// and back, so a file written by Marshal reads back the same.
var (
	supportNames  = []string{Cantilever: "cantilever", Fixed: "fixed"}
	materialNames = []string{ConcreteMasonry: "concrete-masonry", ClayMasonry: "clay-masonry", Concrete: "concrete", Custom: "custom"}
)

// String returns the file name of the support: "cantilever" or "fixed".
func (s Support) String() string {
	if s >= 0 && int(s) < len(supportNames) {
		return supportNames[s]
	}
	return "Support(" + strconv.Itoa(int(s)) + ")"
}

// ParseSupport reads "cantilever" or "fixed" ("fixed-fixed" is accepted too).
func ParseSupport(s string) (Support, bool) {
	if s == "fixed-fixed" {
		return Fixed, true
	}
	for i, n := range supportNames {
		if n == s {
			return Support(i), true
		}
	}
	return Cantilever, false
}

// String returns the file name of the material kind, e.g. "concrete-masonry".
func (k MaterialKind) String() string {
	if k >= 0 && int(k) < len(materialNames) {
		return materialNames[k]
	}
	return "MaterialKind(" + strconv.Itoa(int(k)) + ")"
}

// ParseMaterialKind reads a material kind name as written in wall files.
func ParseMaterialKind(s string) (MaterialKind, bool) {
	for i, n := range materialNames {
		if n == s {
			return MaterialKind(i), true
		}
	}
	return ConcreteMasonry, false
}

// Elements are the finite-element names a wall file may ask for in
// [check] element; "" means the FE package's default.
var Elements = []string{"qm6", "q4"}

// DriftPreset is a named allowable storey drift, as a fraction of the storey
// height.
type DriftPreset struct {
	Name   string
	Limit  float64
	Source string
}

// DriftPresets are the allowable storey drifts Δa/h of ASCE 7-22
// Table 12.12-1 under names of our own. "low-rise" stands for the table's
// structures of four stories or fewer above the base whose interior walls,
// partitions, ceilings and exterior wall systems are designed for the drift;
// the suffix is the risk category.
var DriftPresets = []DriftPreset{
	{"masonry-cantilever", 0.010, "ASCE 7-22 Table 12.12-1: masonry cantilever shear wall structures, all risk categories"},
	{"masonry-other", 0.007, "ASCE 7-22 Table 12.12-1: other masonry shear wall structures, all risk categories"},
	{"low-rise-i-ii", 0.025, "ASCE 7-22 Table 12.12-1: structures of 4 stories or fewer, risk category I or II"},
	{"low-rise-iii", 0.020, "ASCE 7-22 Table 12.12-1: structures of 4 stories or fewer, risk category III"},
	{"low-rise-iv", 0.015, "ASCE 7-22 Table 12.12-1: structures of 4 stories or fewer, risk category IV"},
	{"other-i-ii", 0.020, "ASCE 7-22 Table 12.12-1: all other structures, risk category I or II"},
	{"other-iii", 0.015, "ASCE 7-22 Table 12.12-1: all other structures, risk category III"},
	{"other-iv", 0.010, "ASCE 7-22 Table 12.12-1: all other structures, risk category IV"},
}

// FindDriftPreset returns the preset of that name.
func FindDriftPreset(name string) (DriftPreset, bool) {
	for _, p := range DriftPresets {
		if p.Name == name {
			return p, true
		}
	}
	return DriftPreset{}, false
}

func driftPresetNames() string {
	s := ""
	for i, p := range DriftPresets {
		if i > 0 {
			s += ", "
		}
		s += p.Name
	}
	return s
}
