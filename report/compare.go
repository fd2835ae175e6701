package report

import (
	"bytes"
	"errors"
	"fmt"
	"io"
	"math"
	"path/filepath"
	"strings"
	"time"
	"unicode/utf8"

	"pierwise/geometry"
	"pierwise/pier"
	"pierwise/pier/fe"
	"pierwise/sketch"
	"pierwise/study"
)

// CompareInfo is what the comparison report says about its making.
type CompareInfo struct {
	Now     time.Time
	Version string
}

// cmpDash stands for a value that does not exist on one side.
const cmpDash = "-"

// CompareReport writes the text report of a comparison of two layouts, in
// sheets of SheetLines lines under the [project] table of the walls
// compared (report.Paginate): title block, both elevations side by side,
// the differences table, the pier table with piers matched by their bounds,
// warnings and the caution. It computes nothing: every number comes from c.
func CompareReport(out io.Writer, c *study.Comparison, info CompareInfo) error {
	return CompareReports(out, []*study.Comparison{c}, info)
}

// CompareReports writes several comparisons (the first layout against each
// of the others) as one report: each comparison begins a sheet of its own,
// and the sheets are numbered through ("sheet 3 of 5") under the project
// of the first comparison's walls.
func CompareReports(out io.Writer, cs []*study.Comparison, info CompareInfo) error {
	if len(cs) == 0 {
		return errors.New("report: no comparison to write")
	}
	var body bytes.Buffer
	for i, c := range cs {
		if i > 0 {
			body.WriteString(SheetBreak + "\n")
		}
		if err := compareBody(&body, c, info); err != nil {
			return err
		}
	}
	b := &cs[0].Before
	subject := "layout comparison: " + orDefault(b.Wall.Title, orDefault(filePart(b.Path), "built-in demo wall"))
	return Paginate(out, body.String(), Heading{Project: b.Wall.Project, Subject: subject})
}

func compareBody(out io.Writer, c *study.Comparison, info CompareInfo) error {
	w := NewText(out)
	b, a := &c.Before, &c.After
	sys := b.Wall.Units
	w.Title("PIERWISE LAYOUT COMPARISON")
	if t := b.Wall.Title; t != "" {
		w.KV("Title", t)
	}
	if a.Wall.Title != b.Wall.Title && a.Wall.Title != "" {
		w.KV("Other wall", a.Wall.Title)
	}
	for _, e := range b.Wall.Project.Entries() {
		w.KV(strings.ToUpper(e[0][:1])+e[0][1:], e[1])
	}
	if pa := a.Wall.Project; pa != b.Wall.Project && len(pa.Entries()) > 0 {
		// Walls of two projects: the sheets carry the first one's.
		var parts []string
		for _, e := range pa.Entries() {
			parts = append(parts, e[0]+" "+e[1])
		}
		w.KV("After wall", strings.Join(parts, ", "))
	}
	w.KV("Before", cmpSideName(b))
	w.KV("After", cmpSideName(a))
	if !info.Now.IsZero() {
		w.KV("Date", info.Now.UTC().Format("2006-01-02 15:04 UTC"))
	}
	if info.Version != "" {
		w.KV("Program", Program(info.Version))
	}
	w.KV("Units", unitsLine(sys))
	onFE := b.Basis != nil && b.Basis.IsFE()
	if onFE {
		w.KV("Method", "finite-element model (the basis), relative values with E = 1 and t = 1; the classic method as its check")
	} else {
		w.KV("Method", "classic method, relative values with E = 1 and t = 1")
	}
	if (b.FE != nil || a.FE != nil) && !onFE {
		w.KV("Check", "plane-stress finite-element model of each layout")
	}

	sec := 0
	section := func(s string) {
		sec++
		w.Section(fmt.Sprintf("%d. %s", sec, s))
	}
	section("Elevations (to scale; shares of the wall shear per leaf pier)")
	w.Para(CompareElevations(c, Width, 14))

	section("Differences (change = after against before)")
	t := &Table{Head: []string{"", "before", "after", "change"}, Right: []bool{false, true, true, true}}
	for _, r := range CompareRows(c) {
		t.Add(r.Quantity, r.Before, r.After, r.Change)
	}
	t.Write(w, "  ")

	section("Leaf piers, matched by the openings beside them")
	if len(c.Piers) == 0 {
		w.Line("  No pier table: the classic method has no answer for one of the layouts.")
	} else {
		pt := &Table{
			Head:  []string{"before", "after", "share", "share", "change", "V before", "V after", "note"},
			Right: []bool{false, false, true, true, true, true, true, false},
		}
		for _, r := range ComparePierRows(c) {
			pt.Add(r.Before, r.After, r.ShareBefore, r.ShareAfter, r.Change, r.ShearBefore, r.ShearAfter, r.Note)
		}
		pt.Write(w, "  ")
		w.Blank()
		w.Wrapped("  ", "Shares are fractions of the wall shear. Change is in percentage points. "+
			"A pier of one layout matches the pier of the other that stands between the same openings (or wall ends), "+
			"else the one it overlaps most; "+
			"the names P1, P2, ... are given left to right in each layout and may differ.")
	}

	if len(c.Piers) > 0 && (c.Before.FE != nil || c.After.FE != nil) && !onFE {
		section("Leaf piers, finite-element shares")
		ft := &Table{
			Head:  []string{"before", "after", "classic", "FE", "classic", "FE"},
			Right: []bool{false, false, true, true, true, true},
		}
		for _, r := range ComparePierRows(c) {
			ft.Add(r.Before, r.After, r.ShareBefore, cmpOr(r.FEBefore), r.ShareAfter, cmpOr(r.FEAfter))
		}
		ft.Write(w, "  ")
		w.Blank()
		w.Wrapped("  ", "FE shares are the shear through each pier's mid-height section of the plane-stress model, as fractions of the wall shear; columns 3-4 are the before layout, 5-6 the after layout.")
	}

	section("Warnings")
	w.Close(CompareWarnings(c))
	return w.Err()
}

func cmpSideName(s *study.Side) string {
	name := fmt.Sprintf("layout %q", s.Layout())
	if s.Path != "" {
		name = filepath.Base(s.Path) + ", " + name
	}
	return name
}

// CompareElevations draws the two layouts side by side in at most cols
// columns and rows rows (each under a heading with its label).
func CompareElevations(c *study.Comparison, cols, rows int) string {
	const gap = 4
	half := (cols - gap) / 2
	left := cmpElevation(&c.Before, half, rows-1)
	right := cmpElevation(&c.After, half, rows-1)
	n := max(len(left), len(right))
	var sb strings.Builder
	for i := 0; i < n; i++ {
		var l, r string
		if i < len(left) {
			l = left[i]
		}
		if i < len(right) {
			r = right[i]
		}
		pad := half + gap - utf8.RuneCountInString(l)
		sb.WriteString(strings.TrimRight(l+strings.Repeat(" ", max(pad, 1))+r, " "))
		sb.WriteByte('\n')
	}
	return sb.String()
}

func cmpElevation(s *study.Side, cols, rows int) []string {
	head := cmpClip(s.Label, cols)
	g := sketch.Elevation(s.Wall, s.Result, cols, rows)
	lines := []string{head}
	if g.Rows > 0 {
		lines = append(lines, strings.Split(g.String(), "\n")...)
	}
	if !s.OK() {
		lines = append(lines, cmpClip("(no classic answer)", cols))
	}
	return lines
}

func cmpClip(s string, n int) string {
	if utf8.RuneCountInString(s) <= n {
		return s
	}
	r := []rune(s)
	return string(r[:max(n-3, 0)]) + "..."
}

// CompareRow is one line of the differences table, already formatted.
type CompareRow struct {
	Key                             string // what the row is, for views that pick rows: "layout", "openings", "length", "height", "thickness", "rigidity_relative", "rigidity", "deflection_relative", "deflection", "drift", "drift_check"
	Quantity, Before, After, Change string
}

// CompareRows returns the differences table of a comparison: wall sizes when
// they differ, relative rigidity, rigidity, relative deflection, deflection,
// design drift and its check. The editor shows the same rows.
func CompareRows(c *study.Comparison) []CompareRow {
	b, a := &c.Before, &c.After
	sys := b.Wall.Units
	u := UnitsFor(sys)
	var rows []CompareRow
	add := func(k, q, vb, va, ch string) { rows = append(rows, CompareRow{k, q, vb, va, ch}) }

	add("layout", "Layout", b.Layout(), a.Layout(), "")
	lengthRow := func(k, q string, lb, la geometry.Length) {
		if math.Abs(float64(lb-la)) > 1e-9 {
			add(k, q, geometry.FormatLength(lb, sys), geometry.FormatLength(la, sys), cmpPct(float64(lb), float64(la)))
		}
	}
	lengthRow("length", "Wall length", b.Wall.Length, a.Wall.Length)
	lengthRow("height", "Wall height", b.Wall.Height, a.Wall.Height)
	lengthRow("thickness", "Thickness", b.Wall.Thickness, a.Wall.Thickness)
	add("openings", "Openings", fmt.Sprint(len(b.Wall.Openings())), fmt.Sprint(len(a.Wall.Openings())), "")

	rb, ra := b.Result, a.Result
	val := func(r *pier.Result, f func(*pier.Result) (float64, bool), format func(float64) string) (string, float64, bool) {
		if r == nil {
			return "no answer", 0, false
		}
		v, ok := f(r)
		if !ok {
			return cmpDash, 0, false
		}
		return format(v), v, true
	}
	row := func(k, q string, f func(*pier.Result) (float64, bool), format func(float64) string) {
		sb, vb, okb := val(rb, f, format)
		sa, va, oka := val(ra, f, format)
		ch := ""
		if okb && oka {
			ch = cmpPct(vb, va)
		}
		if sb == cmpDash && sa == cmpDash {
			return
		}
		add(k, q, sb, sa, ch)
	}
	row("rigidity_relative", "Relative rigidity (E t)", func(r *pier.Result) (float64, bool) { return r.Rigidity, true }, Sig)
	row("rigidity", "Rigidity, "+u.Rigidity, func(r *pier.Result) (float64, bool) { return u.RigidityOf(r.RigidityAbs), r.RigidityAbs > 0 }, Sig)
	row("deflection_relative", "Relative deflection", func(r *pier.Result) (float64, bool) { return r.Deflection, true }, Sig)
	row("deflection", "Deflection, "+u.Deflection, func(r *pier.Result) (float64, bool) {
		return u.DeflectionOf(r.DeflectionAbs), r.HasLoad && r.DeflectionAbs > 0
	}, Sig)
	row("drift", "Design drift, "+u.Deflection, func(r *pier.Result) (float64, bool) {
		return u.DeflectionOf(r.Drift.Design), r.HasLoad && r.Drift.Design > 0
	}, Sig)
	if (rb != nil && rb.HasLoad && rb.Drift.Allowable > 0) || (ra != nil && ra.HasLoad && ra.Drift.Allowable > 0) {
		check := func(r *pier.Result) string {
			switch {
			case r == nil:
				return "no answer"
			case !r.HasLoad || r.Drift.Allowable <= 0:
				return cmpDash
			case r.Drift.Missing != "":
				return "no verdict: no " + r.Drift.Missing
			case r.Drift.OK:
				return "OK, limit " + Sig(u.DeflectionOf(r.Drift.Allowable))
			}
			return "EXCEEDS limit " + Sig(u.DeflectionOf(r.Drift.Allowable))
		}
		add("drift_check", "Drift check", check(rb), check(ra), "")
	}
	if b.FE != nil || a.FE != nil || b.FEErr != nil || a.FEErr != nil {
		feVal := func(s *study.Side, f func(*fe.Result) string) string {
			switch {
			case s.FE != nil:
				return f(s.FE)
			case s.FEErr != nil:
				return "no answer"
			}
			return cmpDash
		}
		rel := func(r *fe.Result) string { return Sig(r.Rigidity) }
		ch := ""
		if b.FE != nil && a.FE != nil {
			ch = cmpPct(b.FE.Rigidity, a.FE.Rigidity)
		}
		if b.Basis != nil && b.Basis.IsFE() {
			// The rows above are the model's: the classic rigidity is the check.
			cl := func(s *study.Side) (string, float64) {
				if s.Basis == nil || s.Basis.Classic == nil {
					return "no answer", 0
				}
				return Sig(s.Basis.Classic.Rigidity), s.Basis.Classic.Rigidity
			}
			sb, vb := cl(b)
			sa, va := cl(a)
			ch = ""
			if vb > 0 && va > 0 {
				ch = cmpPct(vb, va)
			}
			add("classic_rigidity_relative", "Classic relative rigidity", sb, sa, ch)
		} else {
			add("fe_rigidity_relative", "FE relative rigidity", feVal(b, rel), feVal(a, rel), ch)
		}
		// The classic rigidity against the FE one, per side: only where
		// both methods answered.
		diff := func(s *study.Side) string {
			switch {
			case s.FE == nil && s.FEErr != nil:
				return "no answer"
			case s.FE == nil || s.Result == nil:
				return cmpDash
			}
			d := 100 * s.FE.Difference
			switch {
			case math.Abs(d) < 0.05:
				return "equal"
			case d > 0:
				return fmt.Sprintf("%.1f %% higher", d)
			}
			return fmt.Sprintf("%.1f %% lower", -d)
		}
		if (b.FE != nil && rb != nil) || (a.FE != nil && ra != nil) {
			add("fe_difference", "Classic vs FE rigidity", diff(b), diff(a), "")
		}
		mesh := func(r *fe.Result) string {
			return fmt.Sprintf("%s %s", r.Element, geometry.FormatLength(r.Mesh, sys))
		}
		add("fe_mesh", "FE element, mesh", feVal(b, mesh), feVal(a, mesh), "")
	}
	return rows
}

// ComparePierRow is one line of the pier table, already formatted.
type ComparePierRow struct {
	Before, After           string // pier names, "-" when missing
	ShareBefore, ShareAfter string // "28.1 %"
	Change                  string // "+1.9 pt"
	ShearBefore, ShearAfter string // pier shear with unit, "-" without a load
	FEBefore, FEAfter       string // FE shares when the check ran, else ""
	Note                    string // "appears", "vanishes" or "renamed" (where: CompareWarnings)
	Status                  study.Status
}

// ComparePierRows returns the pier table of a comparison.
func ComparePierRows(c *study.Comparison) []ComparePierRow {
	sys := c.Before.Wall.Units
	var rows []ComparePierRow
	for _, pc := range c.Piers {
		r := ComparePierRow{Before: cmpDash, After: cmpDash, ShareBefore: cmpDash, ShareAfter: cmpDash,
			ShearBefore: cmpDash, ShearAfter: cmpDash, Status: pc.Status()}
		feShare := func(s *study.Side, p *pier.Pier) string {
			if s.FE == nil {
				return ""
			}
			if p == nil {
				return cmpDash
			}
			if v, ok := s.FEShare(p.Name); ok {
				return cmpShare(v)
			}
			return cmpDash
		}
		r.FEBefore, r.FEAfter = feShare(&c.Before, pc.Before), feShare(&c.After, pc.After)
		if p := pc.Before; p != nil {
			r.Before, r.ShareBefore = p.Name, cmpShare(p.Share)
			if c.Before.Result.HasLoad {
				r.ShearBefore = geometry.FormatForce(p.Shear, sys)
			}
		}
		if p := pc.After; p != nil {
			r.After, r.ShareAfter = p.Name, cmpShare(p.Share)
			if c.After.Result.HasLoad {
				r.ShearAfter = geometry.FormatForce(p.Shear, sys)
			}
		}
		r.Change = fmt.Sprintf("%+.1f pt", 100*pc.ShareChange())
		if r.Change == "-0.0 pt" {
			r.Change = "+0.0 pt"
		}
		switch pc.Status() {
		case study.Appears:
			r.Note = "appears" // where: in the warnings, to keep 78 columns
		case study.Vanishes:
			r.Note = "vanishes"
		default:
			if pc.Before.Name != pc.After.Name {
				r.Note = "renamed"
			}
		}
		rows = append(rows, r)
	}
	return rows
}

// CompareWarnings returns what the reader of a comparison should know: a
// layout without a classic answer, each layout's own warnings, piers that
// appear or vanish, a drift check that changes, and walls that differ in
// more than their openings.
func CompareWarnings(c *study.Comparison) []string {
	var out []string
	for _, s := range []*study.Side{&c.Before, &c.After} {
		if s.Err != nil {
			out = append(out, fmt.Sprintf("%s: the classic method has no answer: %v", s.Label, s.Err))
		}
	}
	for _, s := range []*study.Side{&c.Before, &c.After} {
		if s.FEErr != nil {
			out = append(out, fmt.Sprintf("%s: the finite-element check has no answer: %v", s.Label, s.FEErr))
		}
		if s.FE != nil && s.Result != nil && math.Abs(s.FE.Difference) > fe.WarnDifference {
			out = append(out, fmt.Sprintf("%s: the classic rigidity differs from the finite-element model by %+.0f %%, more than %.0f %%: the rigid-spandrel assumption is weak for this layout; look at the pier shares of both methods.",
				s.Label, 100*s.FE.Difference, 100*fe.WarnDifference))
		}
	}
	// A warning both layouts share is said once.
	var wb, wa []string
	if c.Before.Result != nil {
		wb = pier.Texts(c.Before.Result.Warnings)
	}
	if c.After.Result != nil {
		wa = pier.Texts(c.After.Result.Warnings)
	}
	inB := map[string]bool{}
	for _, m := range wb {
		inB[m] = true
	}
	inA := map[string]bool{}
	for _, m := range wa {
		inA[m] = true
	}
	for _, m := range wb {
		if inA[m] {
			out = append(out, "Both layouts: "+m)
		} else {
			out = append(out, c.Before.Label+": "+m)
		}
	}
	for _, m := range wa {
		if !inB[m] {
			out = append(out, c.After.Label+": "+m)
		}
	}
	for _, pc := range c.Piers {
		switch pc.Status() {
		case study.Appears:
			out = append(out, fmt.Sprintf("Pier %s of %s (x %s) has no counterpart in %s: design it on its own.",
				pc.After.Name, c.After.Label, cmpSpan(pc.After.Rect, c.Before.Wall.Units), c.Before.Label))
		case study.Vanishes:
			// The wall of a vanished pier is now inside another pier or an
			// opening; it may carry more shear than before, not less.
			where := fmt.Sprintf("Pier %s of %s (x %s) has no counterpart in %s", pc.Before.Name, c.Before.Label, cmpSpan(pc.Before.Rect, c.Before.Wall.Units), c.After.Label)
			if len(c.After.Wall.Openings()) == 0 {
				out = append(out, where+": that layout has no openings, so the whole wall works as one solid pier.")
			} else {
				out = append(out, where+": that stretch of wall is now part of other piers or of an opening; check its reinforcement against the piers of "+c.After.Label+".")
			}
		}
	}
	if rb, ra := c.Before.Result, c.After.Result; rb != nil && ra != nil && rb.HasLoad && ra.HasLoad && rb.Drift.Judged() && ra.Drift.Judged() {
		if rb.Drift.OK && !ra.Drift.OK {
			out = append(out, fmt.Sprintf("The drift check passes for %s and fails for %s.", c.Before.Label, c.After.Label))
		} else if !rb.Drift.OK && ra.Drift.OK {
			out = append(out, fmt.Sprintf("The drift check fails for %s and passes for %s.", c.Before.Label, c.After.Label))
		}
	}
	if b, a := c.Before.Wall, c.After.Wall; b.Material != a.Material || b.Support != a.Support || b.Load != a.Load || b.Stiffness != a.Stiffness {
		out = append(out, "The two walls differ in more than their openings (material, support, load or stiffness modifiers): the change is not due to the openings alone.")
	}
	return out
}

// ComparePct formats the relative change from vb to va as "+1.2 %" (never
// "-0.0 %"), or "" when it is not defined.
func ComparePct(vb, va float64) string { return cmpPct(vb, va) }

// cmpPct formats the relative change from vb to va.
func cmpPct(vb, va float64) string {
	ch, ok := study.Change(vb, va)
	if !ok {
		return ""
	}
	s := fmt.Sprintf("%+.1f %%", 100*ch)
	if s == "-0.0 %" {
		s = "+0.0 %"
	}
	return s
}

func cmpOr(s string) string {
	if s == "" {
		return cmpDash
	}
	return s
}

func cmpShare(s float64) string { return SigPercent(s) }

// cmpSpan shows where a pier runs along the wall in the wall's own units:
// 7'-0" to 12'-0", or 2.100 to 3.600 m.
func cmpSpan(r geometry.Rect, sys geometry.System) string {
	x0, x1 := geometry.FormatLength(geometry.Length(r.X0), sys), geometry.FormatLength(geometry.Length(r.X1), sys)
	if sys == geometry.SI {
		x0 = strings.TrimSuffix(x0, " m")
	}
	return x0 + " to " + x1
}
