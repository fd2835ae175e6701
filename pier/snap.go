package pier

import (
	"fmt"
	"math"
	"slices"
	"sort"
	"strconv"

	"pierwise/geometry"
)

// SnapTolerance is the distance under which two parallel opening edges (or
// an opening edge and the wall's end, base or top) are taken as one line:
// 1/32 in (0.79 mm), half the 1/16 in that is the finest fraction a
// dimension string on a drawing gives (common practice). Closer edges are
// an entry slip, not a pier or a spandrel anyone builds, and left apart they
// make a sliver that the classic method and the finite-element model read
// differently (docs/method.md §4).
const SnapTolerance = geometry.Inch / 32

// SnapEdges returns w with the active layout's opening edges that lie closer
// than SnapTolerance merged, and one warning per merge (kind
// WarnMergedEdges) naming the two openings (or the opening and the wall's
// edge). When nothing is merged it
// returns w itself and no warnings; otherwise a copy, and w is unchanged.
// Both the classic method and the finite-element model call it, so both see
// the same wall. An edge is never moved when that would leave its opening
// without width or height.
func SnapEdges(w *geometry.Wall) (*geometry.Wall, []Warning) {
	if w == nil || w.Active < 0 || w.Active >= len(w.Layouts) || len(w.Layouts[w.Active].Openings) == 0 {
		return w, nil
	}
	ops := w.Layouts[w.Active].Openings
	tol := float64(SnapTolerance)
	rects := make([]geometry.Rect, len(ops))
	for i, o := range ops {
		rects[i] = o.Rect()
		for _, v := range []float64{rects[i].X0, rects[i].Y0, rects[i].X1, rects[i].Y1} {
			if math.IsNaN(v) || math.IsInf(v, 0) {
				return w, nil // the solvers refuse it with their own message
			}
		}
	}
	name := func(i int) string {
		if i < 0 {
			return ""
		}
		if ops[i].Name != "" {
			return ops[i].Name
		}
		return "#" + strconv.Itoa(i+1)
	}
	var warns []Warning
	changed := false
	// Edges that differ by rounding only (sums of typed lengths) are one
	// line already, as the classic method's own tolerance reads them: they
	// are neither moved nor reported.
	rounding := tolerance * math.Max(float64(w.Length), float64(w.Height))
	// One direction at a time: x (0: left edges, 1: right) then y.
	for dir := 0; dir < 2; dir++ {
		type edge struct {
			v     float64
			op    int // −1 for the wall's own edge
			which int // 0: low edge (X0/Y0), 1: high edge (X1/Y1)
		}
		lo, hi := 0.0, float64(w.Length)
		wallNames := [2]string{"the wall's left end", "the wall's right end"}
		if dir == 1 {
			hi = float64(w.Height)
			wallNames = [2]string{"the wall's base", "the wall's top"}
		}
		edges := []edge{{lo, -1, 0}, {hi, -1, 1}}
		for i, r := range rects {
			if dir == 0 {
				edges = append(edges, edge{r.X0, i, 0}, edge{r.X1, i, 1})
			} else {
				edges = append(edges, edge{r.Y0, i, 0}, edge{r.Y1, i, 1})
			}
		}
		sort.SliceStable(edges, func(a, b int) bool { return edges[a].v < edges[b].v })
		for a := 0; a < len(edges); {
			b := a + 1
			for b < len(edges) && edges[b].v-edges[b-1].v < tol {
				b++
			}
			group := edges[a:b]
			a = b
			if len(group) < 2 || group[len(group)-1].v-group[0].v <= rounding {
				continue
			}
			// The line they merge onto: the wall's edge when one is in the
			// group, else the edge of the opening listed first in the file.
			anchor := group[0]
			for _, e := range group {
				if e.op < 0 || (anchor.op >= 0 && e.op < anchor.op) {
					anchor = e
				}
				if e.op < 0 {
					break
				}
			}
			for _, e := range group {
				if e.op < 0 || math.Abs(e.v-anchor.v) <= rounding {
					continue
				}
				r := rects[e.op]
				p := []*float64{&r.X0, &r.X1}
				if dir == 1 {
					p = []*float64{&r.Y0, &r.Y1}
				}
				*p[e.which] = anchor.v
				if !(*p[1]-*p[0] > tol) {
					continue // would leave the opening without width or height
				}
				gap := math.Abs(e.v - anchor.v)
				other := name(anchor.op)
				if anchor.op < 0 {
					other = wallNames[anchor.which]
				}
				subject := name(e.op)
				if anchor.op >= 0 {
					subject = other + ", " + subject
				}
				warns = append(warns, Warning{Kind: WarnMergedEdges, Severity: SeverityInfo, Subject: subject,
					Text: fmt.Sprintf("the edges of %s and %s are %s apart, closer than %s: they are taken as one line, moving %s's edge",
						name(e.op), other, gapText(gap, w.Units), gapText(tol, w.Units), name(e.op))})
				rects[e.op] = r
				changed = true
			}
		}
	}
	if !changed {
		return w, nil
	}
	cp := *w
	cp.Layouts = slices.Clone(w.Layouts)
	snapped := slices.Clone(ops)
	for i := range snapped {
		r := rects[i]
		snapped[i].X = geometry.Length(r.X0)
		snapped[i].Sill = geometry.Length(r.Y0)
		snapped[i].Width = geometry.Length(r.X1 - r.X0)
		snapped[i].Height = geometry.Length(r.Y1 - r.Y0)
	}
	cp.Layouts[w.Active].Openings = snapped
	return &cp, warns
}

// gapText prints a small distance in the wall's units, to three
// significant digits: "0.000118 in", "0.003 mm".
func gapText(m float64, units geometry.System) string {
	if units == geometry.SI {
		return strconv.FormatFloat(m/float64(geometry.Millimetre), 'g', 3, 64) + " mm"
	}
	return strconv.FormatFloat(m/float64(geometry.Inch), 'g', 3, 64) + " in"
}
