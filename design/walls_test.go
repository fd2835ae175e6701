package design

import (
	"math"
	"path/filepath"
	"testing"

	"pierwise/geometry"
	"pierwise/pier"
	"pierwise/pier/fe"
)

// lateralLoads builds a leaf pier's lateral load case from the classic
// method's shear and moment (the forces the basis work will give in full):
// a cantilever pier carries V h at its base and nothing at its top; a
// fixed-fixed pier V h/2 at both ends, of opposite signs.
func lateralLoads(p pier.Pier) pier.PierLoads {
	v := p.Shear
	var l pier.PierLoads
	if p.Support == geometry.Cantilever {
		l.Lateral.Bottom = pier.Forces{Shear: v, Moment: float64(v) * p.H()}
		l.Lateral.Top = pier.Forces{Shear: v}
	} else {
		l.Lateral.Bottom = pier.Forces{Shear: v, Moment: float64(v) * p.H() / 2}
		l.Lateral.Top = pier.Forces{Shear: v, Moment: -float64(v) * p.H() / 2}
	}
	return l
}

// Every example wall of the repository, solved by the classic method and
// checked with bars at every jamb: each leaf pier gets jamb bars inside it,
// at both of its bounded ends, and every result is finite.
func TestExampleWalls(t *testing.T) {
	files, _ := filepath.Glob("../testdata/walls/*.toml")
	if len(files) == 0 {
		t.Skip("no example walls")
	}
	for _, f := range files {
		w, err := geometry.LoadFile(f)
		if err != nil {
			t.Fatalf("%s: %v", f, err)
		}
		res, err := pier.Solve(w)
		if err != nil {
			continue // a wall the classic method refuses is not this test's concern
		}
		code, ok := CodeFor(w.Material.Kind)
		if !ok {
			continue
		}
		dw := WallOf(w)
		var piers []PierInput
		for _, p := range res.Leaves() {
			piers = append(piers, PierInput{Name: p.Name, Rect: p.Rect, Loads: lateralLoads(p)})
		}
		sys := w.Units
		v, _ := geometry.ParseBarSpacing(map[geometry.System]string{geometry.US: "#5@32in", geometry.SI: "16mm@800mm"}[sys], sys)
		h, _ := geometry.ParseBarSpacing(map[geometry.System]string{geometry.US: "#4@16in", geometry.SI: "12mm@400mm"}[sys], sys)
		j, _ := geometry.ParseBarCount("2#5")
		r := &Reinforcement{Fy: geometry.Stress(60 * ksi), Vertical: v, Jamb: j, Horizontal: h}
		out, err := CheckWall(Input{Wall: dw, Reinforcement: r, Settings: Settings{Code: code, SDS: 1, Rho: 1}, Piers: piers})
		if err != nil {
			t.Fatalf("%s: %v", f, err)
		}
		for _, p := range out.Piers {
			jambs := 0
			for _, b := range p.Bars {
				if b.X < p.Rect.X0-1e-9 || b.X > p.Rect.X1+1e-9 {
					t.Errorf("%s %s: bar at %.3f m outside [%.3f, %.3f]", f, p.Name, b.X, p.Rect.X0, p.Rect.X1)
				}
				if math.Abs(b.Area-j.Area()) < 1e-12 {
					jambs++
				}
			}
			// Every leaf pier of these walls is bounded at both ends by a
			// wall end or an opening.
			if jambs < 2 {
				t.Errorf("%s %s: %d jamb bars in %v", f, p.Name, jambs, p.Bars)
			}
			for _, c := range p.Checks {
				if math.IsNaN(c.ShearRatio+c.FlexureRatio) || math.IsInf(c.ShearRatio+c.FlexureRatio, 0) {
					t.Fatalf("%s %s: %+v", f, p.Name, c)
				}
			}
		}
		if out.Governing >= 0 {
			t.Logf("%s: %d piers, governing %s ratio %.2f", filepath.Base(f), len(out.Piers), out.Piers[out.Governing].Name, out.Ratio)
		}
	}
}

// The finite-element piers feed the same checks: the reinforced example
// wall checked on either basis has the same piers, finite ratios, and the
// same zero-load invariant.
func TestFEPiers(t *testing.T) {
	w, err := geometry.LoadFile("../testdata/walls/cmu-reinforced.toml")
	if err != nil {
		t.Fatal(err)
	}
	res, err := pier.Solve(w)
	if err != nil {
		t.Fatal(err)
	}
	fr, err := fe.Solve(w, res, fe.Options{Mesh: 6 * geometry.Inch})
	if err != nil {
		t.Fatal(err)
	}
	cl, err := CheckWall(InputOf(w, ClassicPiers(res)))
	if err != nil {
		t.Fatal(err)
	}
	fd, err := CheckWall(InputOf(w, FEPiers(fr)))
	if err != nil {
		t.Fatal(err)
	}
	if len(cl.Piers) != len(fd.Piers) {
		t.Fatalf("classic %d piers, fe %d", len(cl.Piers), len(fd.Piers))
	}
	for i := range cl.Piers {
		if cl.Piers[i].Name != fd.Piers[i].Name || math.IsNaN(fd.Piers[i].Ratio) || math.IsInf(fd.Piers[i].Ratio, 0) {
			t.Errorf("pier %d: classic %s, fe %s ratio %v", i, cl.Piers[i].Name, fd.Piers[i].Name, fd.Piers[i].Ratio)
		}
		t.Logf("%s: classic ratio %.3f, fe ratio %.3f", cl.Piers[i].Name, cl.Piers[i].Ratio, fd.Piers[i].Ratio)
	}
}
