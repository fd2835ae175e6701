package design

// Equation is one rule the checks applied, as a report prints it once: the
// rule in the code's notation and its edition and clause (docs/method.md §8).
type Equation struct {
	Text   string
	Clause string
}

// Equations returns the rules a result's checks applied, each once, in the
// order a reader meets them. The text is the method's; the clause numbers
// marked "from memory" are so marked in docs/method.md §8.
func (r *Result) Equations() []Equation {
	var reinforced, plain bool
	for _, p := range r.Piers {
		if p.Method == "unreinforced" {
			plain = true
		} else {
			reinforced = true
		}
	}
	if len(r.Piers) == 0 {
		reinforced = true
	}
	var eq []Equation
	add := func(text, clause string) { eq = append(eq, Equation{Text: text, Clause: clause}) }
	if r.Code == ACI318 {
		add("V_n = A_cv (α_c λ √f'c + ρ_t f_y) ≤ 8 A_cv √f'c; α_c = 3.0 at h_w/l_w ≤ 1.5, 2.0 at ≥ 2.0, linear between; λ = 1",
			"ACI 318-19 §11.5.4.3, §11.5.4.2, §18.10.4")
		add("φ = 0.75 for shear (0.60 where V_n is below the shear at M_n, §21.2.4.1)", "ACI 318-19 Table 21.2.1")
		if r.Class == Special && r.Kind == Seismic {
			add("special walls: V_e = Ω_v ω_v V_u ≤ 3 V_u, Ω_v = max(1.5, M_pr/M_u) where h_w/l_w > 1.5", "ACI 318-19 §18.10.3.1, Table 18.10.3.1.2")
		}
		add("strain compatibility: ε_cu = 0.003, 0.85 f'c over β_1 c, bars elastic–plastic at f_y, E_s = 29,000 ksi", "ACI 318-19 §22.2.2.1, §22.2.2.4.1, §20.2.2.2")
		add("φ = 0.65 at ε_t ≤ ε_ty, 0.90 at ε_t ≥ ε_ty + 0.003, linear between", "ACI 318-19 Table 21.2.2")
		add("φP_n,max = 0.65 × 0.80 P_o, P_o = 0.85 f'c (A_g − A_st) + f_y A_st", "ACI 318-19 §22.4.2.2, Table 22.4.2.1")
		add("minimum ρ_l and ρ_t: Table 11.6.1 where V_u ≤ 0.5 φ α_c √f'c A_cv, else ρ_t ≥ 0.0025 and ρ_l ≥ 0.0025 + 0.5 (2.5 − h_w/l_w)(ρ_t − 0.0025)",
			"ACI 318-19 §11.6.1, §11.6.2")
		if r.Class == Special {
			add("special walls: ρ_l, ρ_t ≥ 0.0025 where V_u > √f'c A_cv", "ACI 318-19 §18.10.2.1")
		}
		return eq
	}
	if reinforced {
		add("V_n = (V_nm + V_ns) γ_g; γ_g = 0.75 partially grouted, 1.0 fully grouted", "TMS 402-22 §9.3.4.1.2 (clause number from memory)")
		add("V_nm = [4.0 − 1.75 M_u/(V_u d_v)] A_nv √f'm + 0.25 P_u, M_u/(V_u d_v) positive, ≤ 1.0", "TMS 402-22 §9.3.4.1.2.1 (clause number from memory)")
		add("V_ns = 0.5 (A_v/s) f_y d_v", "TMS 402-22 §9.3.4.1.2.2 (clause number from memory)")
		add("V_n ≤ 6 A_nv √f'm γ_g at M_u/(V_u d_v) ≤ 0.25, ≤ 4 A_nv √f'm γ_g at ≥ 1.0, linear between; φ = 0.80", "TMS 402-22 §9.3.4.1.2, §9.1.4 (clause numbers from memory)")
		if r.Class == Special && r.Kind == Seismic {
			add("special walls: φV_n ≥ the shear at 1.25 M_n, not more than 2.5 V_u", "TMS 402-22 §7.3.2.6.1.1 (clause number from memory)")
			add("special walls: ρ_v, ρ_h ≥ 0.0007, ρ_v + ρ_h ≥ 0.002, spacing ≤ min(L/3, H/3, 48 in)", "TMS 402-22 §7.3.2.6 (clause number from memory)")
		}
		add("strain compatibility: ε_mu = 0.0025 concrete / 0.0035 clay masonry, 0.80 f'm over 0.80 c, bars elastic–plastic at f_y, masonry tension and compression bars ignored; φ = 0.90",
			"TMS 402-22 §9.3.2, §9.1.4 (clause numbers from memory)")
		add("φP_n,max = 0.90 × 0.80 [0.80 f'm A_n]", "TMS 402-22 §9.3.4.1.1 (clause number from memory)")
		add("maximum reinforcement: bars' tension at α ε_y with ε_mu at the compressed end, under D + 0.75 L + 0.525 Q_E",
			"TMS 402-16 §9.3.3.2 (2016 edition, kept pending TMS 402-22; docs/method.md §8)")
	}
	if plain {
		add("unreinforced flexure: |M_u|/S_n − P_u/A_n ≤ φ f_r and P_u/A_n + |M_u|/S_n ≤ φ 0.80 f'm; φ = 0.60", "TMS 402-22 §9.2.2, §9.2.4, Table 9.1.9.2 (clause numbers from memory)")
		add("unreinforced shear: V_n = least of 3.8 A_nv √f'm, 300 A_nv, 56 A_nv + 0.45 N_u (90 A_nv + 0.45 N_u solidly grouted); φ = 0.80", "TMS 402-22 §9.2.6 (clause number from memory)")
	}
	return eq
}
