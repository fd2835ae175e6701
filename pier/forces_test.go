package pier

import (
	"fmt"
	"math"
	"math/rand/v2"
	"testing"

	"pierwise/geometry"
)

// Units of the hand arithmetic below: kip, ft, kip·ft, lb/ft².
var (
	kip   = float64(geometry.Kip)
	kipFt = float64(geometry.Kip) * float64(geometry.Foot)
	psf   = geometry.Stress(geometry.Pound) / geometry.Stress(geometry.Foot*geometry.Foot)
	klf   = geometry.LineLoad(geometry.Kip) / geometry.LineLoad(geometry.Foot)
)

// want is one expected section force, in kip or kip·ft.
type want struct {
	what      string
	got, want float64 // got in N or N·m, want in kip or kip·ft
	unit      float64
}

func checkWants(t *testing.T, ws []want) {
	t.Helper()
	for _, w := range ws {
		got := w.got / w.unit
		if math.Abs(got-w.want) > 1e-4*math.Max(1, math.Abs(w.want)) {
			t.Errorf("%s = %.5f, want %.5f", w.what, got, w.want)
		}
	}
}

// loaded sets the hand-arithmetic loads: V = 10 kip, D = 1 kip/ft,
// L = 0.5 kip/ft along the top, self weight 80 lb/ft² of face.
func loaded(w *geometry.Wall) *geometry.Wall {
	w.Load.Shear = 10 * geometry.Kip
	w.Gravity = geometry.Gravity{Dead: 1 * klf, Live: 0.5 * klf, SelfWeight: 80 * psf}
	return w
}

// A solid wall is one pier carrying everything (docs/method.md §6). Hand
// arithmetic, 20 ft × 10 ft, V = 10 kip: cantilever M = V·(10 − y), 100,
// 50, 0 kip·ft at bottom, middle, top; fixed-fixed M = V·(5 − y), 50, 0,
// −50; no overturning axial force (one pier: no couple). Dead load
// 1 kip/ft × 20 ft = 20 kip plus 80 lb/ft² × 20 ft × (10 − y): 36, 28, 20
// kip; live 0.5 × 20 = 10 kip throughout. Overturning V·h = 100 kip·ft
// (cantilever) and V·h/2 = 50 kip·ft (top held against rotation).
func TestSolidWallForces(t *testing.T) {
	for _, c := range []struct {
		sup              geometry.Support
		mb, mm, mt, over float64
	}{
		{geometry.Cantilever, 100, 50, 0, 100},
		{geometry.Fixed, 50, 0, -50, 50},
	} {
		r, err := Solve(loaded(solidWall(20, 10, c.sup)))
		if err != nil {
			t.Fatal(err)
		}
		p := r.Piers[0]
		lat, dead, live := p.Loads.Lateral, p.Loads.Dead, p.Loads.Live
		checkWants(t, []want{
			{"overturning", r.Overturning, c.over, kipFt},
			{"V bottom", float64(lat.Bottom.Shear), 10, kip}, {"V top", float64(lat.Top.Shear), 10, kip},
			{"M bottom", lat.Bottom.Moment, c.mb, kipFt}, {"M middle", lat.Middle.Moment, c.mm, kipFt}, {"M top", lat.Top.Moment, c.mt, kipFt},
			{"N lateral bottom", float64(lat.Bottom.Axial), 0, kip},
			{"N dead bottom", float64(dead.Bottom.Axial), 36, kip}, {"N dead middle", float64(dead.Middle.Axial), 28, kip}, {"N dead top", float64(dead.Top.Axial), 20, kip},
			{"N live bottom", float64(live.Bottom.Axial), 10, kip}, {"N live top", float64(live.Top.Axial), 10, kip},
			// The pier's old-style fields agree with its sections.
			{"Pier.Shear", float64(p.Shear), 10, kip}, {"Pier.Moment", p.Moment, c.mb, kipFt},
		})
	}
}

// The default self weight applies when the file gives none, and none when
// the user sets it to zero on purpose.
func TestSelfWeightDefault(t *testing.T) {
	w := solidWall(20, 10, geometry.Cantilever)
	w.Material = geometry.Material{Kind: geometry.ConcreteMasonry, Strength: 2000 * geometry.PSI}
	r, err := Solve(w)
	if err != nil {
		t.Fatal(err)
	}
	sw := float64(DefaultSelfWeight(w).Weight)
	if !(sw > 0) {
		t.Fatalf("default self weight %g", sw)
	}
	// 20 ft × 10 ft of face.
	wantN := sw * 20 * 10 * float64(geometry.Foot*geometry.Foot)
	if got := float64(r.Piers[0].Loads.Dead.Bottom.Axial); !near(got, wantN, 1e-12) {
		t.Errorf("dead load at the base %g N, want the default self weight × face area %g N", got, wantN)
	}
	if r.HasLoad || r.Overturning != 0 || r.Piers[0].Loads.Lateral != (Sections{}) {
		t.Errorf("no shear, yet lateral forces: %+v, overturning %g", r.Piers[0].Loads.Lateral, r.Overturning)
	}
	w.Gravity.NoSelf = true
	if r, _ = Solve(w); r.Piers[0].Loads.Dead != (Sections{}) {
		t.Errorf("self_weight = 0: dead %+v, want none", r.Piers[0].Loads.Dead)
	}
	w.Gravity = geometry.Gravity{Dead: geometry.LineLoad(math.NaN())}
	if _, err := Solve(w); err == nil {
		t.Error("NaN dead load: want an error")
	}
	w.Gravity = geometry.Gravity{Live: -1}
	if _, err := Solve(w); err == nil {
		t.Error("negative live load: want an error")
	}
}

// Door and window: 20 ft × 10 ft cantilever, door D1 x 4–7 ft, 0–7 ft;
// window W1 x 13–16 ft, sill 3 ft, head 7 ft. The band [0, 7] has the door
// as its cut: P1 (0–4 ft) and P2 (7–20 ft), both fixed-fixed; the window
// sits in P2, whose band [3, 7] has P2.1 (7–13 ft) and P2.2 (16–20 ft).
// V = 10 kip toward +x, D = 1 kip/ft, L = 0.5 kip/ft, 80 lb/ft².
func TestDoorAndWindowForces(t *testing.T) {
	w := wallFt(20, 10, geometry.Cantilever, [4]float64{4, 0, 3, 7}, [4]float64{13, 3, 3, 4})
	r, err := Solve(loaded(w))
	if err != nil {
		t.Fatal(err)
	}
	p1, p2, p21, p22 := pierByName(r, "P1"), pierByName(r, "P2"), pierByName(r, "P2.1"), pierByName(r, "P2.2")
	if p1 == nil || p2 == nil || p21 == nil || p22 == nil {
		t.Fatalf("piers %v", names(r.Piers))
	}
	// Shares by hand (d = r³ + 3r fixed-fixed): P1 r = 7/4: d = 10.609375;
	// P2: solid 7/13: 1.771507, strip 4/13: 0.952208, P2.1 4/6: 2.296296,
	// P2.2 4/4: 4, so d = 1.771507 − 0.952208 + 1/(0.435484 + 0.25)
	// = 2.278123; shares 0.176770 and 0.823230; P2.1 0.522993, P2.2
	// 0.300237 of the wall.
	//
	// Overturning axial force, wall band [0, 7] at y = 3.5 ft: M = V·(10 −
	// 3.5) = 65 kip·ft; the piers' own moments vanish at mid-height
	// (fixed-fixed); two piers at x = 2 and 13.5 ft: N = ±M/(13.5 − 2)
	// = ±5.652174 kip, P1 in tension (negative), P2 in compression.
	//
	// P2's band [3, 7] at y = 5 ft: P2 bends as a fixed-fixed pier of 7 ft,
	// M = V_P2·(3.5 − 5) = −1.5 × 8.23230 = −12.34845 kip·ft about its
	// centre x = 13.5 ft; its N = 5.652174 kip acts there. The centroid of
	// P2.1 (A 6, x 10) and P2.2 (A 4, x 18) is x̄ = 13.2 ft, so about x̄:
	// M = −12.34845 + 5.652174 × 0.3 = −10.65280 kip·ft; Σ A·(x − x̄)² =
	// 6 × 3.2² + 4 × 4.8² = 153.6. N_P2.1 = 5.652174 × 0.6 + (−10.65280)
	// × 6 × (−3.2)/153.6 = 3.391304 + 1.331600 = 4.722904 kip; N_P2.2 =
	// 5.652174 × 0.4 − 1.331600 = 0.929270 kip (they add up to P2's).
	//
	// Gravity by tributary width: the door's middle (5.5 ft) and the
	// window's (14.5 ft) divide the top: P1 0–5.5, P2 5.5–20, P2.1
	// 5.5–14.5, P2.2 14.5–20 ft. Self weight of the strip above each
	// section, less the openings in it:
	//   P1 bottom: 5.5 × 10 − 1.5 × 7 (door) = 44.5 ft² → 5.5 + 3.56 = 9.06
	//   P1 middle (3.5): 5.5 × 6.5 − 1.5 × 3.5 = 30.5 ft² → 5.5 + 2.44 = 7.94
	//   P1 top (7): 5.5 × 3 = 16.5 ft² → 5.5 + 1.32 = 6.82
	//   P2 bottom: 14.5 × 10 − 1.5 × 7 − 3 × 4 (window) = 122.5 → 14.5 + 9.8 = 24.3
	//   P2.1 bottom (3): 9 × 7 − 1.5 × 4 − 1.5 × 4 = 51 → 9 + 4.08 = 13.08
	//   P2.1 top (7): 9 × 3 = 27 → 9 + 2.16 = 11.16
	//   P2.2 bottom (3): 5.5 × 7 − 1.5 × 4 = 32.5 → 5.5 + 2.6 = 8.1
	// Live: 0.5 kip/ft × 5.5, 14.5, 9, 5.5 ft = 2.75, 7.25, 4.5, 2.75 kip.
	checkWants(t, []want{
		{"overturning", r.Overturning, 100, kipFt},
		{"P1 share", p1.Share, 0.176770, 1}, {"P2 share", p2.Share, 0.823230, 1},
		{"P2.1 share", p21.Share, 0.522993, 1}, {"P2.2 share", p22.Share, 0.300237, 1},
		{"P1 V", float64(p1.Loads.Lateral.Middle.Shear), 1.76770, kip},
		{"P2 V", float64(p2.Loads.Lateral.Middle.Shear), 8.23230, kip},
		{"P1 M bottom", p1.Loads.Lateral.Bottom.Moment, 1.76770 * 3.5, kipFt},
		{"P1 M middle", p1.Loads.Lateral.Middle.Moment, 0, kipFt},
		{"P1 M top", p1.Loads.Lateral.Top.Moment, -1.76770 * 3.5, kipFt},
		{"P2 M bottom", p2.Loads.Lateral.Bottom.Moment, 8.23230 * 3.5, kipFt},
		{"P2.1 M bottom", p21.Loads.Lateral.Bottom.Moment, 5.22993 * 2, kipFt},
		{"P1 N", float64(p1.Loads.Lateral.Middle.Axial), -5.652174, kip},
		{"P1 N bottom", float64(p1.Loads.Lateral.Bottom.Axial), -5.652174, kip},
		{"P2 N", float64(p2.Loads.Lateral.Top.Axial), 5.652174, kip},
		{"P2.1 N", float64(p21.Loads.Lateral.Middle.Axial), 4.722904, kip},
		{"P2.2 N", float64(p22.Loads.Lateral.Middle.Axial), 0.929270, kip},
		{"P1 D bottom", float64(p1.Loads.Dead.Bottom.Axial), 9.06, kip},
		{"P1 D middle", float64(p1.Loads.Dead.Middle.Axial), 7.94, kip},
		{"P1 D top", float64(p1.Loads.Dead.Top.Axial), 6.82, kip},
		{"P2 D bottom", float64(p2.Loads.Dead.Bottom.Axial), 24.3, kip},
		{"P2.1 D bottom", float64(p21.Loads.Dead.Bottom.Axial), 13.08, kip},
		{"P2.1 D top", float64(p21.Loads.Dead.Top.Axial), 11.16, kip},
		{"P2.2 D bottom", float64(p22.Loads.Dead.Bottom.Axial), 8.1, kip},
		{"P1 L", float64(p1.Loads.Live.Middle.Axial), 2.75, kip},
		{"P2 L", float64(p2.Loads.Live.Bottom.Axial), 7.25, kip},
		{"P2.1 L", float64(p21.Loads.Live.Top.Axial), 4.5, kip},
		{"P2.2 L", float64(p22.Loads.Live.Top.Axial), 2.75, kip},
	})
}

// The nested wall of Masonry Chronicles (docs/method.md §2.5 geometry): 18 ft × 16 ft
// cantilever, door D1 x 4–8 ft, 0–8 ft; window W1 x 12–16 ft, 2–6 ft. P1
// (0–4 ft) and P2 (8–18 ft) in the band [0, 8]; P2.1 (8–12 ft) and P2.2
// (16–18 ft) in P2's band [2, 6]. V = 10 kip, D = 1 kip/ft, 80 lb/ft².
func TestNestedWallForces(t *testing.T) {
	r, err := Solve(loaded(chronicles()))
	if err != nil {
		t.Fatal(err)
	}
	p1, p2, p21, p22 := pierByName(r, "P1"), pierByName(r, "P2"), pierByName(r, "P2.1"), pierByName(r, "P2.2")
	// Wall band at y = 4 ft: M = 10 × (16 − 4) = 120 kip·ft, piers at x = 2
	// and 13 ft: N = ±120/11 = ±10.909091 kip.
	// P2's band [2, 6] at y = 4 ft is P2's own mid-height (fixed-fixed,
	// 0–8 ft): no moment; P2's N acts at x = 13 ft, the children's centroid
	// is (4 × 10 + 2 × 17)/6 = 12.333 ft: M = 10.909091 × 0.666667 =
	// 7.272727 kip·ft; Σ A(x − x̄)² = 4 × 2.3333² + 2 × 4.6667² = 65.3333.
	// N_P2.1 = 10.909091 × 4/6 + 7.272727 × 4 × (−2.3333)/65.3333 =
	// 7.272727 − 1.038961 = 6.233766; N_P2.2 = 3.636364 + 1.038961 =
	// 4.675325 kip: with P2's N at 13 ft their resultant stays there
	// (6.233766 × 10 + 4.675325 × 17 = 141.818 = 10.909091 × 13).
	//
	// Tributary widths: door middle 6 ft, window middle 14 ft. P1 0–6,
	// P2.1 6–14, P2.2 14–18 ft. Self weight above the sections:
	//   P1 bottom: 6 × 16 − 2 × 8 (door) = 80 ft² → 6 + 6.4 = 12.4 kip
	//   P2.1 bottom (2): 8 × 14 − 2 × 6 (door) − 2 × 4 (window) = 92 → 8 + 7.36 = 15.36
	//   P2.2 bottom (2): 4 × 14 − 2 × 4 = 48 → 4 + 3.84 = 7.84
	checkWants(t, []want{
		{"overturning", r.Overturning, 160, kipFt},
		{"P1 N", float64(p1.Loads.Lateral.Middle.Axial), -10.909091, kip},
		{"P2 N", float64(p2.Loads.Lateral.Middle.Axial), 10.909091, kip},
		{"P2.1 N", float64(p21.Loads.Lateral.Middle.Axial), 6.233766, kip},
		{"P2.2 N", float64(p22.Loads.Lateral.Middle.Axial), 4.675325, kip},
		{"P2 M middle", p2.Loads.Lateral.Middle.Moment, 0, kipFt},
		{"P1 D bottom", float64(p1.Loads.Dead.Bottom.Axial), 12.4, kip},
		{"P2.1 D bottom", float64(p21.Loads.Dead.Bottom.Axial), 15.36, kip},
		{"P2.2 D bottom", float64(p22.Loads.Dead.Bottom.Axial), 7.84, kip},
		{"P2.2 L", float64(p22.Loads.Live.Bottom.Axial), 2, kip},
	})
}

// A band that reaches the top of a cantilever wall has no spandrel to
// couple its piers: their own cantilever moments carry the whole
// overturning there, and no axial force arises. Hand arithmetic, 20 ft ×
// 10 ft, window x 8–12 ft, 6–10 ft, V = 10 kip: at y = 8 ft, M = 10 × 2 =
// 20 kip·ft = 2 × (5 kip × 2 ft), the two piers' own moments.
func TestTopBandOfCantileverHasNoCouple(t *testing.T) {
	r, err := Solve(loaded(wallFt(20, 10, geometry.Cantilever, [4]float64{8, 6, 4, 4})))
	if err != nil {
		t.Fatal(err)
	}
	for _, p := range r.Piers {
		checkWants(t, []want{
			{p.Name + " N", float64(p.Loads.Lateral.Middle.Axial), 0, kip},
			{p.Name + " M middle", p.Loads.Lateral.Middle.Moment, 10, kipFt},
			{p.Name + " M top", p.Loads.Lateral.Top.Moment, 0, kipFt},
		})
	}
}

// Equilibrium of the classic forces over seeded random walls (docs/method.md
// §6): in every band of every region, at the bottom, middle and top of its
// piers, the piers' shears add up to the region's shear, their lateral
// axial forces to the region's (zero for the wall), and Σ(M_i + N_i·(x_i −
// x̄)) to the region's moment about x̄ (for the wall, the overturning
// moment there) when the band has two piers or more; their dead loads add
// up to the region's (for the wall, the line load on its length and the
// weight of the wall above).
func TestClassicForcesEquilibrium(t *testing.T) {
	rng := rand.New(rand.NewPCG(9, 15))
	solvedWalls := 0
	for range 1500 {
		w := randomWall(rng, rng.IntN(9))
		w.Load.Shear = geometry.Force(1+rng.IntN(50)) * geometry.Kip
		w.Gravity = geometry.Gravity{Dead: geometry.LineLoad(rng.Float64()) * klf, Live: geometry.LineLoad(rng.Float64()) * klf, SelfWeight: geometry.Stress(40+rng.IntN(80)) * psf}
		r, err := Solve(w)
		if err != nil {
			continue
		}
		solvedWalls++
		checkEquilibrium(t, w, r)
		if t.Failed() {
			t.Fatalf("wall %+v", w)
		}
	}
	if solvedWalls < 500 {
		t.Fatalf("only %d walls solved", solvedWalls)
	}
}

// region is what the piers of a band must balance: the wall, or the pier
// they divide.
type region struct {
	rect    geometry.Rect
	sup     geometry.Support
	V, N    float64
	isWall  bool
	subject string
}

func checkEquilibrium(t *testing.T, w *geometry.Wall, r *Result) {
	t.Helper()
	V := float64(w.Load.Shear)
	H, L := float64(w.Height), float64(w.Length)
	tolF, tolM := 1e-9*V, 1e-9*V*H
	// The wall above a height, less the openings: the dead load a wall band
	// must carry.
	faceAbove := func(y float64) float64 {
		a := L * (H - y)
		for _, o := range w.Openings() {
			rr := o.Rect()
			if dy := rr.Y1 - math.Max(y, rr.Y0); dy > 0 {
				a -= rr.W() * dy
			}
		}
		return a
	}
	wallDead := func(y float64) float64 {
		return float64(w.Gravity.Dead)*L + float64(w.Gravity.SelfWeight)*faceAbove(y)
	}
	bands := map[bandKey][]Pier{}
	var order []bandKey
	for _, p := range r.Piers {
		if p.Cut {
			continue
		}
		k := bandKey{p.Parent, p.Rect.Y0, p.Rect.Y1}
		if _, ok := bands[k]; !ok {
			order = append(order, k)
		}
		bands[k] = append(bands[k], p)
	}
	for _, k := range order {
		ps := bands[k]
		reg := region{rect: w.Rect(), sup: w.Support, V: V, isWall: true, subject: "wall"}
		if k.parent != "" {
			par := pierByName(r, k.parent)
			reg = region{rect: par.Rect, sup: par.Support, V: float64(par.Shear), N: float64(par.Loads.Lateral.Middle.Axial), subject: par.Name}
		}
		var sumA, sumAx float64
		for _, p := range ps {
			sumA += p.L()
			sumAx += p.L() * (p.Rect.X0 + p.Rect.X1) / 2
		}
		xbar := sumAx / sumA
		xc := (reg.rect.X0 + reg.rect.X1) / 2
		yi := inflection(reg.rect, reg.sup)
		for si, y := range []float64{k.y0, (k.y0 + k.y1) / 2, k.y1} {
			var sV, sN, sM, sD float64
			for _, p := range ps {
				f := []Forces{p.Loads.Lateral.Bottom, p.Loads.Lateral.Middle, p.Loads.Lateral.Top}[si]
				d := []Forces{p.Loads.Dead.Bottom, p.Loads.Dead.Middle, p.Loads.Dead.Top}[si]
				sV += float64(f.Shear)
				sN += float64(f.Axial)
				sM += f.Moment + float64(f.Axial)*((p.Rect.X0+p.Rect.X1)/2-xbar)
				sD += float64(d.Axial)
			}
			where := fmt.Sprintf("%s band %g–%g m at %g m", reg.subject, k.y0, k.y1, y)
			if math.Abs(sV-reg.V) > tolF {
				t.Errorf("%s: ΣV = %g, want %g", where, sV, reg.V)
			}
			if math.Abs(sN-reg.N) > tolF {
				t.Errorf("%s: ΣN = %g, want %g", where, sN, reg.N)
			}
			if M := reg.V*(yi-y) + reg.N*(xc-xbar); len(ps) > 1 && math.Abs(sM-M) > tolM {
				t.Errorf("%s: Σ(M + N·(x − x̄)) = %g, want %g", where, sM, M)
			}
			if reg.isWall {
				if want := wallDead(y); math.Abs(sD-want) > 1e-9*math.Max(want, 1) {
					t.Errorf("%s: ΣN dead = %g, want %g", where, sD, want)
				}
			}
		}
		// The children's strips divide the pier's: their line loads add up
		// to the pier's.
		if k.parent != "" {
			var sL float64
			for _, p := range ps {
				sL += float64(p.Loads.Live.Middle.Axial)
			}
			if par := pierByName(r, k.parent); math.Abs(sL-float64(par.Loads.Live.Middle.Axial)) > 1e-9*math.Max(sL, 1) {
				t.Errorf("%s: children's live load %g, the pier's %g", k.parent, sL, float64(par.Loads.Live.Middle.Axial))
			}
		}
	}
}

// A door at the end of a cantilever wall leaves one pier in its band: the
// wall's overturning at its mid-height (V·(10 − 3.5) = 65 kip·ft for V =
// 10 kip) cannot become a couple of axial forces, and the pier's
// fixed-fixed end moments do not carry it, so the result says so.
func TestOnePierBandWarns(t *testing.T) {
	r, err := Solve(loaded(wallFt(20, 10, geometry.Cantilever, [4]float64{0, 0, 4, 7})))
	if err != nil {
		t.Fatal(err)
	}
	found := false
	for _, w := range r.Warnings {
		if w.Kind == WarnOnePier {
			found = w.Subject == "P1" && w.Severity == SeverityCaution
		}
	}
	if !found {
		t.Errorf("warnings %q, want P1 alone in its band", Texts(r.Warnings))
	}
	// Its axial force is the wall's (none) and its moments those of its
	// support, as the rule says.
	p := r.Piers[0]
	checkWants(t, []want{
		{"P1 N", float64(p.Loads.Lateral.Middle.Axial), 0, kip},
		{"P1 M bottom", p.Loads.Lateral.Bottom.Moment, 35, kipFt},
	})
	// Without a shear there are no forces to warn about.
	w := wallFt(20, 10, geometry.Cantilever, [4]float64{0, 0, 4, 7})
	r, _ = Solve(w)
	for _, w := range r.Warnings {
		if w.Kind == WarnOnePier {
			t.Errorf("no shear, yet %q", w.Text)
		}
	}
}
