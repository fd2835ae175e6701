package fe

import (
	"bufio"
	"bytes"
	"context"
	"encoding/json"
	"fmt"
	"math"
	"os"
	"os/exec"
	"path/filepath"
	"sort"
	"strconv"
	"strings"
	"testing"

	"pierwise/geometry"
)

// CalculiX (Debian package calculix-ccx), a general-purpose FE program,
// solves the identical mesh (same nodes, elements, supports and loads, as
// written by WriteCalculix) in three variants per wall:
//
//   - "cps4-nu0": CPS4, ccx's plane-stress 4-node quadrilateral with 2×2
//     Gauss points, the element "q4" is, with the material's ν replaced by 0
//     (E_v = E/2) in both programs;
//   - "cpe4": at the wall's ν, ccx's plane-strain CPE4 with E* = E(1+2ν)/(1+ν)²
//     and ν* = ν/(1+ν), whose constitutive matrix is exactly the plane-stress
//     one of (E, ν), so it is the same element and the same model;
//   - "cps4": CPS4 at the wall's ν.
//
// Why three: ccx does not solve plane-stress elements in 2-D; it expands
// each CPS4 into one layer of 8-node bricks (C3D8). With ν ≠ 0 the brick's
// through-thickness strain, interpolated from its nodes, cannot make σzz
// vanish at every Gauss point, so the expanded model is slightly stiffer than
// 2-D plane stress (measured: 0.1 % for a solid wall, 0.7–2.1 % with
// openings, about the same at 1 ft, 6 in and 3 in elements). With ν = 0 the out-of-plane
// direction decouples, and in plane strain it is held, so the first two
// variants are the exact one-to-one comparison
// (deflections within 0.5 %, pier shares within 1 percentage point; they
// agree to about 1e-6). The third is held to 2.5 %, the size of that
// expansion effect, so that a change on either side still shows.
//
// How the numbers are compared:
//   - deflection: the plain average of ccx's horizontal displacements of the
//     top nodes (NODE PRINT U), against ours;
//   - pier shares: ccx's displacement field is put through our q4 element
//     stiffness, and the same section sum as Solve (x-forces K_e u_e at the
//     top nodes of the elements just below the pier's mid-height) gives the
//     share. This checks the field where the share is measured;
//   - independently of our elements, ccx's own base reactions (NODE PRINT RF)
//     must total the load, and for a pier with free edges on both sides from
//     the base to its mid-height, the base reactions under it equal its
//     shear by equilibrium: they must match our share too.
//
// With ccx installed the test runs it live. Without it the test compares
// against the results recorded in testdata/calculix/results.json (produced
// by ccx from the .inp files beside it, which must equal what
// WriteCalculix writes now) and logs that it did so. PIERWISE_REQUIRE_CCX=1
// makes ccx mandatory; PIERWISE_UPDATE_CCX=1 rewrites the recorded files.

const ccxDir = "../../testdata/calculix"

// ccxMesh is the element size of the comparison meshes (1 ft keeps the
// recorded inputs small; the comparison is element by element).
const ccxMesh = 0.3048

// ccxVariant is one way of running the comparison; see above.
type ccxVariant struct {
	name string
	elem string  // CalculiX element
	nu0  bool    // material ν replaced by 0 in both programs
	tol  float64 // relative deflection tolerance
	pp   float64 // share tolerance (fraction of V)
	pf   float64 // pier section force tolerance (fraction of V)
}

// The pier forces are held to 1 % of V where the two programs solve the
// same equations (measured: within 1.2e-5 of V), and to 2.5 % for the
// literal CPS4 at ν ≠ 0, whose brick expansion moves the axial forces of
// the outer piers by up to 2.1 % of V (measured).
var ccxVariants = []ccxVariant{
	{name: "cps4-nu0", elem: "CPS4", nu0: true, tol: 0.005, pp: 0.01, pf: 0.01},
	{name: "cpe4", elem: "CPE4", tol: 0.005, pp: 0.01, pf: 0.01},
	{name: "cps4", elem: "CPS4", tol: 0.025, pp: 0.01, pf: 0.025},
}

type ccxRecord struct {
	Deflection float64            `json:"deflection"`
	Shares     map[string]float64 `json:"shares,omitempty"`
	BaseShares map[string]float64 `json:"base_shares,omitempty"`
	BaseFx     float64            `json:"base_fx"`
	// Per pier, (shear, axial) at its bottom, middle and top sections under
	// V = 1, from ccx's displacements through the q4 element forces.
	Sections map[string][3][2]float64 `json:"sections,omitempty"`
	// Per pier standing on the base, (shear, axial) from ccx's own base
	// reactions under it.
	BaseForces map[string][2]float64 `json:"base_forces,omitempty"`
}

type ccxRecords struct {
	Program string               `json:"program"`
	Cases   map[string]ccxRecord `json:"cases"`
}

func TestCalculix(t *testing.T) {
	ccx, lookErr := exec.LookPath("ccx")
	update := os.Getenv("PIERWISE_UPDATE_CCX") == "1"
	if lookErr != nil {
		if os.Getenv("PIERWISE_REQUIRE_CCX") == "1" || update {
			t.Fatalf("PIERWISE_REQUIRE_CCX=1 but CalculiX is not installed (apt-get install -y calculix-ccx): %v", lookErr)
		}
		t.Logf("ccx not found: comparing with the CalculiX results recorded in %s", ccxDir)
	}
	var recorded ccxRecords
	data, err := os.ReadFile(filepath.Join(ccxDir, "results.json"))
	if err == nil {
		err = json.Unmarshal(data, &recorded)
	}
	if err != nil && !update {
		t.Fatalf("recorded CalculiX results: %v", err)
	}
	fresh := ccxRecords{Program: "CalculiX " + ccxVersion(ccx), Cases: map[string]ccxRecord{}}

	opt := Options{Mesh: ccxMesh, Element: ElementQ4}
	for _, v := range ccxVariants {
		for _, c := range ccxWalls() {
			if v.nu0 {
				c.wall.Material = geometry.Material{Kind: geometry.Custom, Modulus: 1e9, ShearModulus: 0.5e9}
			}
			compareCalculix(t, ccx, lookErr == nil, update, v, c, opt, &recorded, &fresh)
		}
	}
	if update && lookErr == nil && !t.Failed() {
		out, err := json.MarshalIndent(fresh, "", "  ")
		if err != nil {
			t.Fatal(err)
		}
		if err := os.WriteFile(filepath.Join(ccxDir, "results.json"), append(out, '\n'), 0o644); err != nil {
			t.Fatal(err)
		}
		t.Logf("wrote %s", filepath.Join(ccxDir, "results.json"))
	}
}

// ccxWalls are the example walls and one whose opening reaches the top, so
// that the top collector (*EQUATION) is compared too.
func ccxWalls() []testWall {
	return append(exampleWalls(), testWall{
		name:    "notch",
		wall:    wallFt(24, 10, geometry.Cantilever, opening("N1", 9, 6, 6, 4), opening("D1", 3, 0, 3, 7)),
		classic: classicOf(leaf("P1", 0, 6, 9, 10), leaf("P2", 15, 6, 24, 10)),
	})
}

func compareCalculix(t *testing.T, ccx string, live, update bool, v ccxVariant, c testWall, opt Options, recorded, fresh *ccxRecords) {
	key := c.name + "-" + v.name
	elem := v.elem
	{
		t.Run(key, func(t *testing.T) {
			var inp bytes.Buffer
			if err := WriteCalculix(&inp, c.wall, c.classic, opt, elem); err != nil {
				t.Fatal(err)
			}
			md, _, err := modelFor(c.wall, c.classic, opt)
			if err != nil {
				t.Fatal(err)
			}
			inpPath := filepath.Join(ccxDir, key+".inp")
			var rec ccxRecord
			if live {
				u, rf, baseFx := runCalculix(t, ccx, inp.Bytes())
				rec = recordOf(md, c, u, rf, baseFx)
				fresh.Cases[key] = rec
				if update {
					if err := os.WriteFile(inpPath, inp.Bytes(), 0o644); err != nil {
						t.Fatal(err)
					}
				} else if old, err := os.ReadFile(inpPath); err != nil || !bytes.Equal(old, inp.Bytes()) {
					// Keep the record usable on machines without ccx.
					t.Errorf("%s is missing or differs from the model written now: rerun with PIERWISE_UPDATE_CCX=1", inpPath)
				}
				t.Logf("ccx run live")
			} else {
				old, err := os.ReadFile(inpPath)
				if err != nil {
					t.Fatal(err)
				}
				if !bytes.Equal(old, inp.Bytes()) {
					t.Fatalf("%s differs from the model written now: the recorded results are stale (rerun with ccx and PIERWISE_UPDATE_CCX=1)", inpPath)
				}
				var ok bool
				if rec, ok = recorded.Cases[key]; !ok {
					t.Fatalf("no recorded CalculiX result for %s", key)
				}
				t.Logf("compared with recorded %s results", recorded.Program)
			}

			ours, err := Solve(c.wall, c.classic, opt)
			if err != nil {
				t.Fatal(err)
			}
			// Deflections within 0.5 % (see above for "cps4").
			rel := math.Abs(ours.Deflection/rec.Deflection - 1)
			if rel > v.tol {
				t.Errorf("deflection: q4 %.6g, CalculiX %s %.6g (%.3f %% apart, want ≤ %.1f %%)", ours.Deflection, elem, rec.Deflection, 100*rel, 100*v.tol)
			}
			t.Logf("deflection: q4 %.6g, CalculiX %s %.6g (%.4f %% apart)", ours.Deflection, elem, rec.Deflection, 100*rel)
			// Equilibrium in CalculiX: base reactions balance the unit load.
			if math.Abs(rec.BaseFx+1) > 1e-5 {
				t.Errorf("CalculiX base reaction %.6g, want −1", rec.BaseFx)
			}
			// Pier shares within 1 percentage point.
			worst := 0.0
			for _, p := range ours.Piers {
				worst = max(worst, math.Abs(p.Share-rec.Shares[p.Name]))
				want, ok := rec.Shares[p.Name]
				if !ok {
					t.Errorf("pier %s: no CalculiX share", p.Name)
					continue
				}
				if math.Abs(p.Share-want) > v.pp {
					t.Errorf("pier %s share: q4 %.4f, CalculiX %.4f (want within 0.01)", p.Name, p.Share, want)
				}
				if b, ok := rec.BaseShares[p.Name]; ok && math.Abs(p.Share-b) > v.pp {
					t.Errorf("pier %s share: q4 %.4f, CalculiX base reactions %.4f (want within 0.01)", p.Name, p.Share, b)
				}
			}
			if len(ours.Piers) > 0 {
				t.Logf("pier shares: largest difference %.2g (fraction of V)", worst)
			}
			// Pier forces: shear and axial force of each pier at its three
			// sections within 1 % of the wall shear (V = 1 here) of ccx's,
			// and at the base, of ccx's own reactions.
			worst = 0
			var own *solution
			if len(ours.Forces) > 0 {
				set, err := prepare(c.wall, c.classic, opt)
				if err != nil {
					t.Fatal(err)
				}
				if own, err = solveWall(context.Background(), c.wall, set); err != nil {
					t.Fatal(err)
				}
			}
			for _, f := range ours.Forces {
				p := f.Rect
				sec, ok := rec.Sections[f.Name]
				if !ok {
					t.Errorf("pier %s: no CalculiX section forces", f.Name)
					continue
				}
				// ours.Forces are under the wall's shear, which is zero here:
				// recompute the unit case's sections from our own field.
				mine := sectionsOf(own.md, own.lateral.u, p)
				for k, name := range []string{"bottom", "middle", "top"} {
					for q, what := range []string{"shear", "axial"} {
						d := math.Abs(mine[k][q] - sec[k][q])
						worst = max(worst, d)
						if d > v.pf {
							t.Errorf("pier %s %s %s: ours %.5f, CalculiX %.5f (want within %.3g V)", f.Name, name, what, mine[k][q], sec[k][q], v.pf)
						}
					}
				}
				if b, ok := rec.BaseForces[f.Name]; ok {
					for q, what := range []string{"shear", "axial"} {
						if d := math.Abs(mine[0][q] - b[q]); d > v.pf {
							t.Errorf("pier %s base %s: ours %.5f, CalculiX reactions %.5f (want within %.3g V)", f.Name, what, mine[0][q], b[q], v.pf)
						}
					}
				}
			}
			if len(ours.Forces) > 0 {
				t.Logf("pier section forces: largest difference %.2g (fraction of V)", worst)
			}
		})
	}
}

// recordOf turns ccx's displacements and reactions into the compared values.
func recordOf(md *model, c testWall, u []float64, rf map[int][2]float64, baseFx float64) ccxRecord {
	m := md.m
	rec := ccxRecord{BaseFx: baseFx}
	// The work-conjugate deflection Σ f_i u_i / V of the same loads.
	f, err := topLoad(m)
	if err != nil {
		panic(err)
	}
	for dof, v := range f {
		rec.Deflection += v * u[dof]
	}
	if c.classic != nil {
		rec.Shares = map[string]float64{}
		for _, p := range c.classic.Piers {
			rec.Shares[p.Name] = md.section(u, 0, (p.Rect.Y0+p.Rect.Y1)/2, p.Rect.X0, p.Rect.X1, true).v
		}
	}
	if c.classic != nil {
		rec.Sections = map[string][3][2]float64{}
		for _, p := range c.classic.Piers {
			rec.Sections[p.Name] = sectionsOf(md, u, p.Rect)
			if p.Rect.Y0 > snap {
				continue
			}
			// Standing on the base: ccx's reactions under the pier, turned
			// into the force the pier exerts on the base (shear along +x,
			// compression positive).
			var v, n float64
			for node, f := range rf {
				x, _ := m.nodeXY(node)
				if x >= p.Rect.X0-snap && x <= p.Rect.X1+snap && pierAtBase(m, node, p.Rect) {
					v -= f[0]
					n += f[1]
				}
			}
			if rec.BaseForces == nil {
				rec.BaseForces = map[string][2]float64{}
			}
			rec.BaseForces[p.Name] = [2]float64{round10(v), round10(n)}
		}
	}
	for _, name := range c.baseShare {
		if rec.BaseShares == nil {
			rec.BaseShares = map[string]float64{}
		}
		for _, p := range c.classic.Piers {
			if p.Name != name {
				continue
			}
			s := 0.0
			for n, f := range rf {
				x, _ := m.nodeXY(n)
				if x >= p.Rect.X0-snap && x <= p.Rect.X1+snap {
					s -= f[0] // a reaction opposes the shear it carries
				}
			}
			rec.BaseShares[name] = s
		}
	}
	rec.Deflection = round10(rec.Deflection)
	for k, v := range rec.Shares {
		rec.Shares[k] = round10(v)
	}
	for k, v := range rec.BaseShares {
		rec.BaseShares[k] = round10(v)
	}
	for k, v := range rec.Sections {
		for a := range v {
			for b := range v[a] {
				v[a][b] = round10(v[a][b])
			}
		}
		rec.Sections[k] = v
	}
	return rec
}

// sectionsOf is (shear, axial) at the bottom, middle and top of r under
// the displacements u, integrated as Solve does.
func sectionsOf(md *model, u []float64, r geometry.Rect) [3][2]float64 {
	var out [3][2]float64
	for k, s := range []sectionForce{
		md.section(u, 0, r.Y0, r.X0, r.X1, false),
		md.section(u, 0, (r.Y0+r.Y1)/2, r.X0, r.X1, true),
		md.section(u, 0, r.Y1, r.X0, r.X1, true),
	} {
		out[k] = [2]float64{s.v, s.n}
	}
	return out
}

// pierAtBase says whether base node n carries pier r alone: a base node at
// the pier's edge is shared with the solid beyond it only when there is
// solid there (not an opening or the wall's end).
func pierAtBase(m *mesh, n int, r geometry.Rect) bool {
	i := m.nodeAt[n][0]
	x := m.xs[i]
	if math.Abs(x-r.X0) <= snap && i > 0 && m.solid[i-1] {
		return false
	}
	if math.Abs(x-r.X1) <= snap && i < m.nx && m.solid[i] {
		return false
	}
	return true
}

// round10 keeps 10 significant digits (ccx prints 7) for a readable record.
func round10(v float64) float64 {
	r, _ := strconv.ParseFloat(strconv.FormatFloat(v, 'g', 10, 64), 64)
	return r
}

// runCalculix runs ccx on the input in a temporary directory and returns
// the nodal displacements (2 per model node), the base reactions by model
// node, and the total base reaction in x.
func runCalculix(t *testing.T, ccx string, inp []byte) ([]float64, map[int][2]float64, float64) {
	t.Helper()
	dir := t.TempDir()
	if err := os.WriteFile(filepath.Join(dir, "wall.inp"), inp, 0o644); err != nil {
		t.Fatal(err)
	}
	cmd := exec.Command(ccx, "wall")
	cmd.Dir = dir
	cmd.Env = append(os.Environ(), "OMP_NUM_THREADS=1")
	if out, err := cmd.CombinedOutput(); err != nil {
		t.Fatalf("ccx: %v\n%s", err, out)
	}
	dat, err := os.ReadFile(filepath.Join(dir, "wall.dat"))
	if err != nil {
		t.Fatal(err)
	}
	u, rf, total, err := parseDat(dat)
	if err != nil {
		t.Fatal(err)
	}
	return u, rf, total
}

// parseDat reads the .dat blocks written by WriteCalculix's NODE PRINTs.
func parseDat(dat []byte) (u []float64, rf map[int][2]float64, totalFx float64, err error) {
	rf = map[int][2]float64{}
	disp := map[int][2]float64{}
	block := ""
	sc := bufio.NewScanner(bytes.NewReader(dat))
	for sc.Scan() {
		line := strings.TrimSpace(sc.Text())
		switch {
		case strings.HasPrefix(line, "displacements"):
			block = "u"
			continue
		case strings.HasPrefix(line, "forces"):
			block = "rf"
			continue
		case strings.HasPrefix(line, "total force"):
			block = "total"
			continue
		case line == "":
			continue
		}
		f := strings.Fields(line)
		nums := make([]float64, len(f))
		for k, s := range f {
			if nums[k], err = strconv.ParseFloat(s, 64); err != nil {
				return nil, nil, 0, fmt.Errorf("ccx .dat line %q: %v", line, err)
			}
		}
		switch {
		case block == "u" && len(nums) == 4:
			disp[int(nums[0])-1] = [2]float64{nums[1], nums[2]}
		case block == "rf" && len(nums) == 4:
			rf[int(nums[0])-1] = [2]float64{nums[1], nums[2]}
		case block == "total" && len(nums) == 3:
			totalFx = nums[0]
			block = ""
		default:
			return nil, nil, 0, fmt.Errorf("ccx .dat: unexpected line %q in block %q", line, block)
		}
	}
	nodes := make([]int, 0, len(disp))
	for n := range disp {
		nodes = append(nodes, n)
	}
	sort.Ints(nodes)
	if len(nodes) == 0 || nodes[0] != 0 || nodes[len(nodes)-1] != len(nodes)-1 {
		return nil, nil, 0, fmt.Errorf("ccx .dat: displacements of %d nodes, not numbered 1…n", len(nodes))
	}
	u = make([]float64, 2*len(nodes))
	for n, d := range disp {
		u[2*n], u[2*n+1] = d[0], d[1]
	}
	return u, rf, totalFx, sc.Err()
}

func ccxVersion(ccx string) string {
	if ccx == "" {
		return "(not installed)"
	}
	out, _ := exec.Command(ccx, "-v").CombinedOutput()
	s := strings.TrimSpace(string(out))
	if i := strings.Index(s, "Version"); i >= 0 {
		return strings.TrimSpace(s[i+len("Version"):])
	}
	return s
}
