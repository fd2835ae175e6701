package report

import (
	"fmt"
	"slices"

	"pierwise/geometry"
	"pierwise/pier"
)

// Reference is one published source a report relies on, named with its
// edition and that edition's clause (docs/method.md §12).
type Reference struct {
	Source string // the document and its edition: "ASCE/SEI 7-22"
	Clause string // the clause, table or chapter: "§12.8.6"
	Use    string // what the report takes from it
}

// The sources of the wall report, once (docs/method.md §12).
var (
	refChronicles = Reference{"Masonry Chronicles (Concrete Masonry Association of California and Nevada)", "wall with a nested opening", "the classic strip method, worked (docs/method.md §2.5)"}
	refTaly       = Reference{"Taly, Design of Reinforced Masonry Structures, 2nd ed. (2010)", "Ch. 7 (from memory)", "rigidity of walls with openings: solid − strip + piers"}
	refTimoshenko = Reference{"Gere and Timoshenko, Mechanics of Materials", "Timoshenko beam", "bending and shear deflection, shear coefficient 5/6"}
	refTMSModulus = Reference{"TMS 402-22", "§4.2.2 (clause number from memory)", "E_m = 900 f'm (concrete), 700 f'm (clay); E_v = 0.4 E_m"}
	refACIModulus = Reference{"ACI 318-19", "§19.2.2.1", "E_c = 57,000 √f'c psi (4,700 √f'c MPa)"}
	refTEK        = Reference{"NCMA TEK 14-13B", "", "unit weight of grouted concrete masonry"}
	refDrift      = Reference{"ASCE/SEI 7-22", "§12.8.6", "design drift δ = C_d·δe/I_e"}
	refDriftLimit = Reference{"ASCE/SEI 7-22", "Table 12.12-1", "allowable storey drift Δa/h_sx"}
	refCracked    = Reference{"ASCE/SEI 7-22", "§12.7.3", "stiffness of cracked sections for drift"}
	refACICracked = Reference{"ACI 318-19", "Table 6.6.3.1.1(a)", "cracked and uncracked moments of inertia of walls"}
)

// WallReferences lists the sources the report of wall w (solved as res,
// which may be nil) relies on, in the order the report uses them.
func WallReferences(w *geometry.Wall, res *pier.Result) []Reference {
	refs := []Reference{refChronicles, refTaly, refTimoshenko}
	switch w.Material.Kind {
	case geometry.ConcreteMasonry, geometry.ClayMasonry:
		refs = append(refs, refTMSModulus)
	case geometry.Concrete:
		refs = append(refs, refACIModulus)
	}
	if sw, err := pier.SelfWeightOf(w); err == nil && sw.Weight > 0 && w.Gravity.SelfWeight == 0 && w.Material.Kind == geometry.ConcreteMasonry {
		refs = append(refs, refTEK)
	}
	if res != nil && res.HasLoad {
		refs = append(refs, refDrift)
	}
	if w.Drift.Limit > 0 {
		refs = append(refs, refDriftLimit)
	}
	if res != nil && slices.ContainsFunc(res.Warnings, func(x pier.Warning) bool { return x.Kind == pier.WarnDriftGross }) {
		refs = append(refs, refCracked, refACICracked)
	}
	return refs
}

// StoreyReferences lists the published sources of the storey report, with
// edition and clause (docs/method.md §9, §12); each wall's own report lists
// those of its wall.
func StoreyReferences(drift, sdc bool) []Reference {
	refs := []Reference{
		{"ASCE/SEI 7-22", "§12.8.4.1, §12.8.4.2", "inherent and accidental torsion (five per cent of the plan dimension)"},
		{"ASCE/SEI 7-22", "Table 12.3-1 (Types 1a, 1b)", "torsional irregularity"},
		{"ASCE/SEI 7-22", "§12.3.1", "diaphragm flexibility"},
		{"Taly, Design of Reinforced Masonry Structures, 2nd ed. (2010)", "§7.9", "centre of rigidity, direct and torsional shears"},
	}
	if sdc {
		refs = append(refs, Reference{"ASCE/SEI 7-22", "§12.8.4.3, §11.6", "amplification A_x of accidental torsion; seismic design category"})
	}
	if drift {
		refs = append(refs, refDrift, refDriftLimit)
	}
	return refs
}

// References writes a table of sources, one numbered entry each (the
// storey report's; the wall report writes its own through it too).
func References(w *Text, refs []Reference) { references(w, refs) }

// references writes the table of sources, one numbered entry each:
// source, clause: use (the long titles wrap, which columns would not).
func references(w *Text, refs []Reference) {
	for i, r := range refs {
		s := r.Source
		if r.Clause != "" {
			s += ", " + r.Clause
		}
		w.Wrapped(fmt.Sprintf("  [%d] ", i+1), s+": "+r.Use)
	}
}
