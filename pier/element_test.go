package pier

import (
	"errors"
	"math"
	"strings"
	"testing"

	"pierwise/geometry"
)

// near reports whether got is within a relative tolerance rel of want.
func near(got, want, rel float64) bool {
	return math.Abs(got-want) <= rel*math.Abs(want)
}

func TestElementFormulas(t *testing.T) {
	// Hand arithmetic of docs/method.md §2: cantilever d = 4r³ + 3r, fixed-fixed
	// d = r³ + 3r with the defaults (g = 0.4, kf = kv = 1), r = h/L.
	tests := []struct {
		h, l     float64
		sup      geometry.Support
		p        Params
		bend, sh float64
	}{
		{1, 4, geometry.Cantilever, Params{}, 4 * 0.015625, 0.75},      // r = 0.25: 0.0625 + 0.75 = 0.8125
		{2, 4, geometry.Cantilever, Params{}, 0.5, 1.5},                // r = 0.5: 0.5 + 1.5 = 2
		{3, 3, geometry.Cantilever, Params{}, 4, 3},                    // r = 1: 4 + 3 = 7
		{8, 4, geometry.Cantilever, Params{}, 32, 6},                   // r = 2: 32 + 6 = 38
		{1, 4, geometry.Fixed, Params{}, 0.015625, 0.75},               // r = 0.25: 0.765625
		{2, 4, geometry.Fixed, Params{}, 0.125, 1.5},                   // r = 0.5: 1.625
		{5, 5, geometry.Fixed, Params{}, 1, 3},                         // r = 1: 4
		{8, 4, geometry.Fixed, Params{}, 8, 6},                         // r = 2: 14
		{16, 4, geometry.Fixed, Params{}, 64, 12},                      // r = 4: 76
		{5, 5, geometry.Cantilever, Params{0.4, 0.35, 1}, 4 / 0.35, 3}, // cracked flexure kf = 0.35 (ACI 318-14 Table 6.6.3.1.1(a))
		{5, 5, geometry.Fixed, Params{0.5, 1, 0.5}, 1, 1.2 / 0.25},     // g = 0.5, kv = 0.5: 1.2/(0.5·0.5) = 4.8
	}
	for _, tc := range tests {
		got := Element(tc.h, tc.l, tc.sup, tc.p)
		if !near(got.Bending, tc.bend, 1e-12) || !near(got.Shear, tc.sh, 1e-12) {
			t.Errorf("Element(%g, %g, %v, %+v) = %+v, want bending %g shear %g", tc.h, tc.l, tc.sup, tc.p, got, tc.bend, tc.sh)
		}
		if !near(got.Total(), tc.bend+tc.sh, 1e-12) {
			t.Errorf("Total() = %g, want %g", got.Total(), tc.bend+tc.sh)
		}
	}
}

func TestSquatWallIsMostlyShear(t *testing.T) {
	// Common practice: a squat cantilever wall with h/L = 0.25 deflects
	// about 7 % in bending and 93 % in shear (the formula gives 7.7 %);
	// compared within one percentage point.
	d := Element(0.25, 1, geometry.Cantilever, Params{})
	if frac := d.Bending / d.Total(); math.Abs(frac-0.07) > 0.01 {
		t.Errorf("bending fraction at h/L = 0.25 = %.3f, want about 0.07", frac)
	}
	if frac := d.Shear / d.Total(); math.Abs(frac-0.93) > 0.01 {
		t.Errorf("shear fraction at h/L = 0.25 = %.3f, want about 0.93", frac)
	}
}

func TestBendingShearCrossover(t *testing.T) {
	// docs/method.md §2.1: bending equals shear at h/L = √0.75 for the cantilever
	// formula (4r³ = 3r) and at h/L = √3 for fixed-fixed (r³ = 3r); below
	// it shear governs, above it bending.
	for _, tc := range []struct {
		sup geometry.Support
		r   float64
	}{{geometry.Cantilever, math.Sqrt(0.75)}, {geometry.Fixed, math.Sqrt(3)}} {
		d := Element(tc.r, 1, tc.sup, Params{})
		if !near(d.Bending, d.Shear, 1e-12) {
			t.Errorf("%v at h/L = %.4f: bending %g, shear %g, want equal", tc.sup, tc.r, d.Bending, d.Shear)
		}
		lo, hi := Element(0.9*tc.r, 1, tc.sup, Params{}), Element(1.1*tc.r, 1, tc.sup, Params{})
		if lo.Bending >= lo.Shear || hi.Bending <= hi.Shear {
			t.Errorf("%v: shear should govern below h/L = %.4f and bending above", tc.sup, tc.r)
		}
	}
}

func TestElementIsTimoshenkoBeam(t *testing.T) {
	// Gere & Timoshenko, Mechanics of Materials: a cantilever deflects
	// V·h³/(3EI) + V·h/(κ·G·A), a beam fixed at the base and guided at the
	// top V·h³/(12EI) + V·h/(κ·G·A); rectangle I = t·L³/12, A = t·L,
	// κ = 5/6, and G = 0.4 E (docs/method.md §2.1). Element times V/(E·t) must agree.
	const (
		E  = 12.4e9 // Pa (invented, any positive value)
		th = 0.19   // m
		V  = 178e3  // N
	)
	G := 0.4 * E
	for _, dims := range [][2]float64{{3, 6}, {4.2, 2.4}, {2.7, 10.8}, {9, 1.5}} {
		h, l := dims[0], dims[1]
		I, A := th*l*l*l/12, th*l
		shear := V * h / (5.0 / 6 * G * A)
		cant := V*h*h*h/(3*E*I) + shear
		guided := V*h*h*h/(12*E*I) + shear
		if got := Element(h, l, geometry.Cantilever, Params{}).Total() * V / (E * th); !near(got, cant, 1e-12) {
			t.Errorf("cantilever %gx%g: %g m, Timoshenko %g m", h, l, got, cant)
		}
		if got := Element(h, l, geometry.Fixed, Params{}).Total() * V / (E * th); !near(got, guided, 1e-12) {
			t.Errorf("fixed %gx%g: %g m, Timoshenko %g m", h, l, got, guided)
		}
	}
}

func TestTalyE73SolidFixedWall(t *testing.T) {
	// Taly, Design of Reinforced Masonry Structures, 2nd ed., Example E7.3:
	// 44 ft × 20 ft wall, fixed-fixed, f'm = 2,000 psi concrete masonry
	// (E_m = 1,800 ksi), t = 7.625 in: R = 9,418 kip/in (relative 0.686).
	ft := geometry.Foot
	w := &geometry.Wall{
		Length: 44 * ft, Height: 20 * ft, Thickness: 7.625 * geometry.Inch,
		Support:  geometry.Fixed,
		Material: geometry.Material{Kind: geometry.ConcreteMasonry, Strength: 2000 * geometry.PSI},
		Layouts:  []geometry.Layout{{Name: "main"}},
	}
	r, err := Solve(w)
	if err != nil {
		t.Fatal(err)
	}
	if math.Abs(r.Rigidity-0.686) > 0.0005 {
		t.Errorf("relative rigidity = %.4f, want 0.686", r.Rigidity)
	}
	kipPerIn := float64(geometry.Kip) / float64(geometry.Inch)
	if got := r.RigidityAbs / kipPerIn; !near(got, 9418, 0.001) {
		t.Errorf("R = %.0f kip/in, want 9,418 within 0.1 %%", got)
	}
	if got := float64(r.Moduli.E / geometry.KSI); !near(got, 1800, 1e-12) {
		t.Errorf("E_m = %g ksi, want 1,800", got)
	}
}

func TestMaterialModuli(t *testing.T) {
	psi, ksi, mpa := geometry.PSI, geometry.KSI, geometry.Megapascal
	tests := []struct {
		name   string
		m      geometry.Material
		sys    geometry.System
		e, ev  geometry.Stress
		source string // a piece the Source must contain
	}{
		// TMS 402-22 §4.2.2 (clause number from memory; §1.8.2.2 of the 2008 edition as quoted in Taly, 2nd ed.): E_m = 900 f'm for
		// concrete masonry, E_v = 0.4 E_m; f'm = 2,000 psi gives 1,800 ksi
		// (Taly Example E7.3).
		{"concrete masonry", geometry.Material{Kind: geometry.ConcreteMasonry, Strength: 2000 * psi}, geometry.US, 1800 * ksi, 720 * ksi, "900 f'm"},
		// TMS 402-22 §4.2.2 (clause number from memory): clay masonry E_m = 700 f'm; 1,500 psi → 1,050 ksi.
		{"clay masonry", geometry.Material{Kind: geometry.ClayMasonry, Strength: 1500 * psi}, geometry.US, 1050 * ksi, 420 * ksi, "700 f'm"},
		// ACI 318-19 §19.2.2.1: E_c = 57,000 √f'c psi; f'c = 4,000 psi gives
		// 3,605 ksi (57,000 × 63.246 psi, hand arithmetic; "about 3,600 ksi"
		// is the familiar figure, from memory).
		{"concrete US", geometry.Material{Kind: geometry.Concrete, Strength: 4000 * psi}, geometry.US, 57000 * psi * geometry.Stress(math.Sqrt(4000)), 0.4 * 57000 * psi * geometry.Stress(math.Sqrt(4000)), "57,000"},
		// ACI 318M: E_c = 4,700 √f'c MPa; 25 MPa gives 23,500 MPa.
		{"concrete SI", geometry.Material{Kind: geometry.Concrete, Strength: 25 * mpa}, geometry.SI, 23500 * mpa, 9400 * mpa, "4,700"},
		// Overrides and custom values are the user's.
		{"modulus given", geometry.Material{Kind: geometry.ConcreteMasonry, Strength: 2000 * psi, Modulus: 1500 * ksi}, geometry.US, 1500 * ksi, 600 * ksi, "E given"},
		{"both given", geometry.Material{Kind: geometry.ConcreteMasonry, Strength: 2000 * psi, ShearModulus: 500 * ksi}, geometry.US, 1800 * ksi, 500 * ksi, "E_v given"},
		{"custom", geometry.Material{Kind: geometry.Custom, Modulus: 30 * geometry.Stress(1e9)}, geometry.SI, 30e9, 12e9, "E given"},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			m, err := MaterialModuliFor(tc.m, tc.sys)
			if err != nil {
				t.Fatal(err)
			}
			if !near(float64(m.E), float64(tc.e), 1e-9) || !near(float64(m.Ev), float64(tc.ev), 1e-9) {
				t.Errorf("E = %g ksi, E_v = %g ksi; want %g, %g", m.E/ksi, m.Ev/ksi, tc.e/ksi, tc.ev/ksi)
			}
			if !strings.Contains(m.Source, tc.source) || m.ESource == "" || m.EvSource == "" {
				t.Errorf("Source = %q (E: %q, E_v: %q), want it to mention %q", m.Source, m.ESource, m.EvSource, tc.source)
			}
		})
	}

	// The US and SI forms of the ACI rule agree within 1 %: 57,000 √psi is
	// 4,733 √MPa (hand arithmetic).
	us, _ := MaterialModuliFor(geometry.Material{Kind: geometry.Concrete, Strength: 30 * mpa}, geometry.US)
	si, _ := MaterialModuliFor(geometry.Material{Kind: geometry.Concrete, Strength: 30 * mpa}, geometry.SI)
	if !near(float64(us.E), float64(si.E), 0.01) {
		t.Errorf("ACI US %g MPa vs SI %g MPa", us.E/mpa, si.E/mpa)
	}

	for _, bad := range []geometry.Material{
		{Kind: geometry.Custom},                                          // custom needs E
		{Kind: geometry.ConcreteMasonry},                                 // no strength, no modulus
		{Kind: geometry.ConcreteMasonry, Strength: -2000 * psi},          // negative
		{Kind: geometry.Concrete, Strength: geometry.Stress(math.NaN())}, // not a number
		{Kind: geometry.ClayMasonry, Strength: 2000 * psi, Modulus: geometry.Stress(math.Inf(1))},
		{Kind: geometry.MaterialKind(99), Strength: 2000 * psi},
	} {
		if m, err := MaterialModuli(bad); err == nil {
			t.Errorf("MaterialModuli(%+v) = %+v, want an error", bad, m)
		}
	}
}

func TestParamsFor(t *testing.T) {
	w := &geometry.Wall{Stiffness: geometry.Stiffness{Flexure: 0.35}}
	p := ParamsFor(w, Moduli{E: 1000, Ev: 500})
	if !near(p.G, 0.5, 1e-12) || !near(p.Kf, 0.35, 1e-12) || !near(p.Kv, 1, 1e-12) {
		t.Errorf("ParamsFor = %+v, want G 0.5, Kf 0.35, Kv 1", p)
	}
	p = ParamsFor(&geometry.Wall{}, Moduli{})
	if !near(p.G, 0.4, 1e-12) || !near(p.Kf, 1, 1e-12) || !near(p.Kv, 1, 1e-12) {
		t.Errorf("ParamsFor(no moduli) = %+v, want the defaults", p)
	}
}

func TestBadModifiersAreErrors(t *testing.T) {
	w := solidWall(10, 10, geometry.Cantilever)
	w.Stiffness.Flexure = -0.35
	if _, err := Solve(w); err == nil {
		t.Error("negative flexure modifier: want an error")
	}
	w.Stiffness.Flexure = math.NaN()
	if _, err := Solve(w); err == nil {
		t.Error("NaN flexure modifier: want an error")
	}
	var ce *CutError
	if _, err := Solve(w); errors.As(err, &ce) {
		t.Error("a bad modifier is not a cut")
	}
}
