package fe

import (
	"bufio"
	"errors"
	"fmt"
	"io"
	"math"
	"strconv"

	"pierwise/geometry"
	"pierwise/pier"
)

// WriteCalculix writes a CalculiX (ccx) input file for the identical model
// Solve builds for these arguments, with CPS4 elements (the plain bilinear
// quadrilateral, like "q4"): same nodes, same elements, E = 1, t = 1, the
// same ν, supports, ties (*EQUATION) and top load. Node n of the model is
// ccx node n+1, and element e is ccx element e+1. The step prints the displacements of every
// node (set NALL) and the reactions of the base (set NBASE) to the .dat file.
// Only an isotropic material (no stiffness modifiers) can be written.
func WriteCalculix(out io.Writer, w *geometry.Wall, classic *pier.Result, opt Options, elem string) error {
	if elem != "CPS4" && elem != "CPE4" {
		return fmt.Errorf("fe: CalculiX element %q: want CPS4 or CPE4", elem)
	}
	md, f, err := modelFor(w, classic, opt)
	if err != nil {
		return err
	}
	nu := md.d[0][1] / md.d[0][0]
	if math.Abs(md.d[2][2]-1/(2*(1+nu))) > 1e-12 || math.Abs(md.d[1][1]-md.d[0][0]) > 1e-12 {
		return errors.New("fe: CalculiX input is written for an isotropic material only (no stiffness modifiers)")
	}
	m := md.m
	b := bufio.NewWriter(out)
	e := 1.0
	if elem == "CPE4" {
		// Plane strain with E* = E(1+2ν)/(1+ν)², ν* = ν/(1+ν) has exactly the
		// plane-stress D of (E, ν): the same element, without ccx's
		// out-of-plane expansion of plane-stress elements.
		e, nu = (1+2*nu)/((1+nu)*(1+nu)), nu/(1+nu)
	}
	num := func(v float64) string { return strconv.FormatFloat(v, 'g', 17, 64) }
	fmt.Fprintf(b, "*HEADING\npierwise plane-stress wall, %d elements, %s, E = %s, t = 1, nu = %s\n", len(m.elems), elem, num(e), num(nu))
	fmt.Fprintln(b, "*NODE, NSET=NALL")
	for n := range m.nodeAt {
		x, y := m.nodeXY(n)
		fmt.Fprintf(b, "%d, %s, %s\n", n+1, num(x), num(y))
	}
	fmt.Fprintf(b, "*ELEMENT, TYPE=%s, ELSET=EALL\n", elem)
	for e, el := range m.elems {
		fmt.Fprintf(b, "%d, %d, %d, %d, %d\n", e+1, el[0]+1, el[1]+1, el[2]+1, el[3]+1)
	}
	var base []int
	groups := make([][]equationDOF, md.ntie)
	for n, p := range m.nodeAt {
		if p[1] == 0 {
			base = append(base, n)
		}
		for c := 0; c < 2; c++ {
			if g := tied(md.eq[2*n+c]); g >= 0 {
				groups[g] = append(groups[g], equationDOF{n, c})
			}
		}
	}
	writeSet(b, "NBASE", base)
	fmt.Fprintln(b, "*BOUNDARY\nNBASE, 1, 2")
	// Tied DOFs (the top collector's x, a fixed top's y): each moves with
	// the group's first, u_n − u_first = 0.
	for _, g := range groups {
		if len(g) < 2 {
			continue
		}
		fmt.Fprintln(b, "*EQUATION")
		for _, d := range g[1:] {
			fmt.Fprintf(b, "2\n%d, %d, 1., %d, %d, -1.\n", d.n+1, d.c+1, g[0].n+1, g[0].c+1)
		}
	}
	fmt.Fprintf(b, "*MATERIAL, NAME=WALL\n*ELASTIC\n%s, %s\n", num(e), num(nu))
	fmt.Fprintln(b, "*SOLID SECTION, ELSET=EALL, MATERIAL=WALL\n1.0")
	fmt.Fprintln(b, "*STEP\n*STATIC\n*CLOAD")
	for n := range m.nodeAt {
		if f[2*n] != 0 {
			fmt.Fprintf(b, "%d, 1, %s\n", n+1, num(f[2*n]))
		}
	}
	fmt.Fprintln(b, "*NODE PRINT, NSET=NALL\nU\n*NODE PRINT, NSET=NBASE, TOTALS=YES\nRF\n*END STEP")
	return b.Flush()
}

// equationDOF is component c (0: x, 1: y) of node n.
type equationDOF struct{ n, c int }

func writeSet(b *bufio.Writer, name string, nodes []int) {
	fmt.Fprintf(b, "*NSET, NSET=%s\n", name)
	for k, n := range nodes {
		if k > 0 && k%10 == 0 {
			b.WriteString("\n")
		} else if k > 0 {
			b.WriteString(", ")
		}
		fmt.Fprintf(b, "%d", n+1)
	}
	b.WriteString("\n")
}

// modelFor builds the model and load vector Solve would use.
func modelFor(w *geometry.Wall, classic *pier.Result, opt Options) (*model, []float64, error) {
	w, _ = pier.SnapEdges(w)
	set, err := prepare(w, classic, opt)
	if err != nil {
		return nil, nil, err
	}
	md, err := buildModel(w, set)
	if err != nil {
		return nil, nil, err
	}
	f, err := topLoad(md.m)
	if err != nil {
		return nil, nil, err
	}
	return md, f, nil
}
