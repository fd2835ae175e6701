package storey

import (
	"errors"
	"fmt"
	"math"
	"path/filepath"
	"pierwise/design"
	"strconv"
	"strings"

	"runtime"
	"sync"

	"pierwise/geometry"
	"pierwise/pier"
	"pierwise/pier/fe"
	"pierwise/report"
)

// Wall is one wall of the storey with its answers.
type Wall struct {
	Ref  WallRef
	Name string         // Ref.Name, or the wall file's title, or its base name
	Wall *geometry.Wall // nil for a wall given by its rigidity

	// Unit is the wall solved by the classic method as it is (its own
	// load, if any, ignored for the storey): relative rigidity, moduli,
	// pier shares. Nil for a wall given by its rigidity, and on the fe
	// basis for a layout the classic method cannot solve.
	Unit *pier.Result

	// FE is the finite-element answer for the wall (fe basis only).
	FE *fe.Result

	// Rigidity is what the distribution used, on the storey's basis: E·t/d
	// in N/m when Analysis.Absolute, otherwise the relative rigidity times
	// the thickness in metres (one E assumed for every wall).
	Rigidity float64

	// Classic and FERigidity are the wall's rigidity by each model in the
	// unit of Rigidity (0 where not known), for the side-by-side check.
	ClassicRigidity, FERigidity float64

	// Rigid is the rigid-diaphragm design shear (Distribution.Designs) and
	// Flexible the flexible-diaphragm shear (0 unless the diaphragm is
	// flexible or enveloped). Design is the one that governs for the
	// storey's diaphragm.
	Rigid    Design
	Flexible float64
	Design   Design

	// Loaded is the wall solved by the classic method under its design
	// shear: pier shears and moments, top deflection and the wall file's
	// drift check. Nil when Unit is.
	Loaded *pier.Result

	// Piers are the leaf piers under the design shear on the storey's
	// basis: the design shear flows into them (docs/method.md §9).
	Piers []PierForce

	// Drift is the storey drift at the wall from the diaphragm's
	// displacements (Checked false when the storey has no cd and height
	// or the rigidities are relative).
	Drift Drift

	// Governing is the wall's governing pier under its design shear
	// (docs/method.md §8); nil for a wall file without [design].
	Governing *Governing
}

// PierForce is one leaf pier of a wall under the wall's design shear.
type PierForce struct {
	Name    string
	Rect    geometry.Rect
	Support geometry.Support
	Share   float64        // of the wall's design shear, on the storey's basis
	Shear   geometry.Force // Share × design shear
	Moment  float64        // N·m: V·h (cantilever, at the base) or V·h/2 (fixed-fixed)
}

// H and L are the pier's height and length in metres.
func (p PierForce) H() float64 { return p.Rect.Y1 - p.Rect.Y0 }
func (p PierForce) L() float64 { return p.Rect.X1 - p.Rect.X0 }

// Governing is a wall's governing pier and its demand over capacity.
type Governing struct {
	Pier  string
	Ratio float64
	Check string // what governs, e.g. "shear" or "flexure"
}

// Drift is a storey drift check: the elastic displacement δe along the
// wall (or edge), the design drift δ = Cd·δe/Ie (ASCE 7-22 §12.8.6), its
// ratio to the storey height and the allowable drift.
type Drift struct {
	Checked   bool    // false: no cd and height, or rigidities relative
	Elastic   float64 // δe, metres
	Design    float64 // δ, metres
	Ratio     float64 // δ/h
	Allowable float64 // limit × h, metres; 0 when no limit is given
	OK        bool
}

// EdgeDrift is the storey drift at one plan edge in one rigid-diaphragm
// case.
type EdgeDrift struct {
	Case  int    // index into Distribution.Cases
	Edge  string // "south", "north", "west" or "east"
	Drift Drift
}

// Analysis is a storey's complete answer; the report, the JSON and the
// editor's storey screen are views of it.
type Analysis struct {
	Storey       *Storey
	Walls        []Wall
	Distribution *Distribution   // the rigid diaphragm (always computed)
	Flexible     *FlexibleShares // the flexible diaphragm (flexible and envelope only)
	Edges        []EdgeDrift     // storey drift at the plan edges, rigid cases, when checked

	// Absolute is true when every wall's material gives moduli, so the
	// distribution used absolute rigidities R = E·t/d. Otherwise it used
	// relative rigidity × thickness, which assumes one E for all walls.
	Absolute bool

	Warnings []string
}

// maxFileSize bounds what the storey reads: a storey or wall file is a few
// kilobytes.
const maxFileSize = 1 << 20

// checkRegular refuses what is not a regular file of a sensible size
// (a device, a FIFO, a directory), before it is read.
func checkRegular(path string) error {
	fi, err := statFile(path)
	if err != nil {
		return err
	}
	switch {
	case !fi.Mode().IsRegular():
		return fmt.Errorf("%q is not a regular file", path)
	case fi.Size() > maxFileSize:
		return fmt.Errorf("%q is %d bytes, larger than the %d bytes a storey or wall file may have", path, fi.Size(), maxFileSize)
	}
	return nil
}

// Load reads a storey file and its wall files (relative to the storey file)
// and analyses the storey. Errors name the storey file, the line and the
// key; a wall file's own errors are passed on as they are, after the line
// of the storey file that points at it.
func Load(path string) (*Analysis, error) {
	s, walls, err := LoadFiles(path)
	if err != nil {
		return nil, err
	}
	return Analyse(s, walls)
}

// LoadFiles reads a storey file and its wall files without analysing them.
// walls[i] is nil for a wall given by its rigidity.
func LoadFiles(path string) (*Storey, []*geometry.Wall, error) {
	if err := checkRegular(path); err != nil {
		return nil, nil, newError(path, 0, "", "%v", err)
	}
	data, err := readFile(path)
	if err != nil {
		return nil, nil, newError(path, 0, "", "%v", err)
	}
	s, err := Parse(path, data)
	if err != nil {
		return nil, nil, err
	}
	walls := make([]*geometry.Wall, len(s.Walls))
	var errs geometry.ErrorList
	for i, ref := range s.Walls {
		if ref.HasRigidity {
			continue
		}
		key := "wall[" + strconv.Itoa(i+1) + "].file"
		line := ref.lines["file"]
		if _, err := statFile(ref.Path); err != nil {
			msg := fmt.Sprintf("wall file %q not found (looked for %q)", ref.File, ref.Path)
			if i := strings.LastIndex(ref.Path, ":"); i > 0 {
				if _, err := statFile(ref.Path[:i]); err == nil {
					msg += fmt.Sprintf("; to use a layout of a wall file, write file = %q and layout = %q",
						ref.File[:strings.LastIndex(ref.File, ":")], ref.Path[i+1:])
				}
			}
			errs = append(errs, newError(path, line, key, "%s", msg))
			continue
		}
		if err := checkRegular(ref.Path); err != nil {
			errs = append(errs, newError(path, line, key, "wall file: %v", err))
			continue
		}
		w, err := loadWall(ref.Path)
		if err != nil {
			errs = append(errs, newError(path, line, key, "%s", wallFileErrors(ref, err)))
			continue
		}
		if ref.Layout != "" {
			k := w.LayoutIndex(ref.Layout)
			if k < 0 {
				names := make([]string, len(w.Layouts))
				for j, l := range w.Layouts {
					names[j] = strconv.Quote(l.Name)
				}
				errs = append(errs, newError(path, ref.lines["layout"], "wall["+strconv.Itoa(i+1)+"].layout",
					"wall file %q has no layout %q (its layouts: %s)", ref.File, ref.Layout, strings.Join(names, ", ")))
				continue
			}
			w.Active = k
		}
		walls[i] = w
	}
	if len(errs) > 0 {
		return nil, nil, errs
	}
	return s, walls, nil
}

// wallFileErrors says that a wall file has errors and where, without
// echoing its content: the file may be anything the storey file points at
// (a wall file's own messages quote what it says, and a file that is not a
// wall file would be quoted line by line). `pierwise solve FILE` shows them.
func wallFileErrors(ref WallRef, err error) string {
	var lines []string
	var list geometry.ErrorList
	var one *geometry.Error
	switch {
	case errors.As(err, &list):
		for _, e := range list {
			if e.Line > 0 {
				lines = append(lines, strconv.Itoa(e.Line))
			}
		}
	case errors.As(err, &one) && one.Line > 0:
		lines = append(lines, strconv.Itoa(one.Line))
	}
	n := max(len(list), 1)
	where := ""
	if len(lines) > 0 {
		if len(lines) > 5 {
			lines = append(lines[:5], "…")
		}
		where = " (line " + strings.Join(lines, ", ") + ")"
	}
	return fmt.Sprintf("wall file %q is not a valid wall file: %d error(s)%s; `pierwise solve %s` shows them", ref.File, n, where, strconv.Quote(ref.Path))
}

// Analyse solves every wall on the storey's basis, distributes the storey
// shear through its diaphragm and solves each wall again under its design
// shear. walls[i] is the wall of s.Walls[i] (nil for a wall given by its
// rigidity; the editor passes its edited copies). Neither s nor the walls
// are changed. docs/method.md §9.
func Analyse(s *Storey, walls []*geometry.Wall) (*Analysis, error) {
	if len(walls) != len(s.Walls) {
		panic("storey: Analyse needs one wall per [[wall]] entry")
	}
	a := &Analysis{Storey: s, Absolute: true}
	var errs geometry.ErrorList
	wallErr := func(i int, key, format string, args ...any) {
		line := s.Walls[i].lines[key]
		if line == 0 {
			line = s.Walls[i].Line
		}
		errs = append(errs, newError(s.Path, line, "wall["+strconv.Itoa(i+1)+"]."+key, format, args...))
	}
	var feRes []*fe.Result
	var feErr []error
	if s.Basis == geometry.BasisFE || s.CompareFE {
		feRes, feErr = solveFE(walls)
	}
	names := map[string]int{}
	anyRigidity, relWall := false, -1
	for i, ref := range s.Walls {
		w := walls[i]
		if (w == nil) != ref.HasRigidity {
			panic("storey: Analyse needs a wall for each [[wall]] with a file, and nil for one given by its rigidity")
		}
		sw := Wall{Ref: ref, Wall: w, Name: wallName(ref, w)}
		if j, dup := names[sw.Name]; dup {
			if ref.Name != "" {
				wallErr(i, "name", "%q is already the name of wall %d", sw.Name, j+1)
			} else {
				// The same title twice: tell them apart by file, or by the
				// wall's number when the same file is placed twice.
				byFile := sw.Name + " (" + filepath.Base(ref.File) + ")"
				if _, taken := names[byFile]; taken || filepath.Clean(ref.Path) == filepath.Clean(s.Walls[j].Path) {
					byFile = sw.Name + " (wall " + strconv.Itoa(i+1) + ")"
				}
				sw.Name = byFile
			}
		}
		names[sw.Name] = i

		// The wall must fit on its line inside the plan.
		if ref.Direction != Angled {
			along := float64(s.Size[ref.Direction])
			length := float64(wallLength(sw))
			tol := 1e-9 * along
			key := "file"
			if ref.HasRigidity {
				key = "length"
			}
			switch {
			case ref.HasStart && float64(ref.Start)+length > along+tol:
				wallErr(i, "start", "the wall (%s long, from %s) runs off the plan, which is %s along %s",
					fmtLen(geometry.Length(length), s.Units), fmtLen(ref.Start, s.Units), fmtLen(s.Size[ref.Direction], s.Units), ref.Direction)
			case !ref.HasStart && length > along+tol:
				wallErr(i, key, "the wall is %s long, longer than the plan (%s along %s)",
					fmtLen(geometry.Length(length), s.Units), fmtLen(s.Size[ref.Direction], s.Units), ref.Direction)
			}
		}

		if ref.HasRigidity {
			anyRigidity = true
			sw.Rigidity, sw.ClassicRigidity, sw.FERigidity = ref.Rigidity, ref.Rigidity, ref.Rigidity
			a.Walls = append(a.Walls, sw)
			continue
		}
		res, err := pier.Solve(w)
		if err == nil {
			sw.Unit = res
		}
		if s.Basis == geometry.BasisFE {
			if feErr[i] != nil {
				wallErr(i, "file", "%s: the finite-element model: %v", ref.File, feErr[i])
				a.Walls = append(a.Walls, sw)
				continue
			}
			sw.FE = feRes[i]
			if !(sw.FE.RigidityAbs > 0) && relWall < 0 {
				relWall = i
			}
		} else {
			if s.CompareFE && feErr[i] == nil {
				sw.FE = feRes[i] // for the classic-vs-FE difference only
			}
			if err != nil {
				wallErr(i, "file", "%s: %v", wallWhere(ref, w, err), err)
				a.Walls = append(a.Walls, sw)
				continue
			}
			if !(res.RigidityAbs > 0) && relWall < 0 {
				relWall = i
			}
		}
		if w.Load.Shear != 0 {
			a.Warnings = append(a.Warnings, fmt.Sprintf("%s: the wall file's own load (%s) is ignored; the wall takes its share of the storey shear",
				sw.Name, geometry.FormatForce(w.Load.Shear, s.Units)))
		}
		a.Walls = append(a.Walls, sw)
	}
	if relWall >= 0 {
		a.Absolute = false
		if anyRigidity {
			wallErr(relWall, "file", "the wall's material gives no modulus E, so its rigidity is relative and cannot be set beside a wall given by its rigidity; give the material's strength or modulus")
		}
	}
	if len(errs) > 0 {
		return nil, errs
	}

	members := make([]Member, len(a.Walls))
	for i := range a.Walls {
		w := &a.Walls[i]
		if !w.Ref.HasRigidity {
			t := float64(w.Wall.Thickness)
			pick := func(abs, rel float64) float64 {
				if a.Absolute {
					return abs
				}
				return rel * t
			}
			if w.Unit != nil {
				w.ClassicRigidity = pick(w.Unit.RigidityAbs, w.Unit.Rigidity)
			}
			if w.FE != nil {
				w.FERigidity = pick(w.FE.RigidityAbs, w.FE.Rigidity)
			}
			w.Rigidity = w.ClassicRigidity
			if s.Basis == geometry.BasisFE {
				w.Rigidity = w.FERigidity
			}
		}
		members[i] = w.member()
	}
	if !a.Absolute {
		a.Warnings = append(a.Warnings, "not every wall's material gives a modulus E, so the walls are compared by relative rigidity × thickness, as if they shared one E")
	}
	act := Action{
		Shear:      float64(s.Shear),
		MassCenter: [2]float64{float64(s.MassCenter[0]), float64(s.MassCenter[1])},
		Size:       [2]float64{float64(s.Size[0]), float64(s.Size[1])},
		Accidental: s.Accidental,
		Amplify:    s.SDC >= "C",
	}
	d, err := Distribute(members, act)
	if err != nil {
		return nil, storeyError(s, err)
	}
	a.Distribution = d
	if s.Diaphragm != Rigid {
		f, err := DistributeFlexible(members, act)
		if err != nil {
			return nil, storeyError(s, err)
		}
		a.Flexible = f
	}

	for i := range a.Walls {
		w := &a.Walls[i]
		w.Rigid = d.Designs[i]
		w.Design = w.Rigid
		if a.Flexible != nil {
			w.Flexible = a.Flexible.Shears[i]
			switch {
			case s.Diaphragm == Flexible:
				w.Design = Design{Direct: w.Flexible, Shear: w.Flexible, Case: CaseFlexible}
			case w.Flexible > w.Rigid.Shear*(1+1e-12):
				// Envelope: the larger of the two (common practice).
				w.Design = Design{Direct: w.Rigid.Direct, Shear: w.Flexible, Case: CaseFlexible}
			}
		}
		if err := a.loadWall(w); err != nil {
			return nil, err
		}
	}
	a.storeyDrift()
	a.Warnings = append(a.Warnings, planWarnings(a)...)
	return a, nil
}

// member is the wall as the diaphragm sees it.
func (w *Wall) member() Member {
	m := Member{Name: w.Name, Direction: w.Ref.Direction, Position: float64(w.Ref.Position), Rigidity: w.Rigidity}
	if m.Direction == Angled {
		m.Angle = w.Ref.Angle
		m.At = [2]float64{float64(w.Ref.At[0]), float64(w.Ref.At[1])}
	}
	return m
}

// wallLength is the wall's length in plan: its wall file's, or the length
// given beside its rigidity (0 when none).
func wallLength(w Wall) geometry.Length {
	if w.Wall != nil {
		return w.Wall.Length
	}
	return w.Ref.Length
}

// loadWall carries the wall's design shear into its piers on the storey's
// basis: the classic method solved under the design shear, and on the fe
// basis the model's pier shares times the design shear.
func (a *Analysis) loadWall(w *Wall) error {
	s := a.Storey
	if w.Wall == nil || w.Unit == nil {
		return nil
	}
	loaded := *w.Wall // shallow copy: pier.Solve reads the layouts only
	loaded.Load.Shear = geometry.Force(w.Design.Shear)
	res, err := pier.Solve(&loaded)
	if err != nil {
		// The same wall solved a moment ago without this load.
		return fmt.Errorf("storey: wall %s under its design shear: %w", w.Name, err)
	}
	w.Loaded = res // its own warnings stay with it
	feShare := map[string]float64{}
	if w.FE != nil {
		for _, p := range w.FE.Piers {
			feShare[p.Name] = p.Share
		}
	}
	for _, p := range res.Leaves() {
		pf := PierForce{Name: p.Name, Rect: p.Rect, Support: p.Support, Share: p.Share, Shear: p.Shear, Moment: p.Moment}
		if s.Basis == geometry.BasisFE {
			pf.Share = feShare[p.Name]
			pf.Shear = geometry.Force(pf.Share * w.Design.Shear)
			arm := pf.H()
			if p.Support == geometry.Fixed {
				arm /= 2
			}
			pf.Moment = float64(pf.Shear) * arm
		}
		w.Piers = append(w.Piers, pf)
	}
	if s.Basis == geometry.BasisClassic && res.HasLoad && res.Drift.Judged() && !res.Drift.OK {
		u := report.UnitsFor(s.Units)
		a.Warnings = append(a.Warnings, fmt.Sprintf("%s: under its design shear the drift δ = Cd·δe/Ie = %.3g %s exceeds the limit of its wall file, %.3g %s",
			w.Name, u.DeflectionOf(res.Drift.Design), u.Deflection, u.DeflectionOf(res.Drift.Allowable), u.Deflection))
	}
	g, err := PierDesign(w.Wall, res)
	if err != nil {
		return fmt.Errorf("storey: wall %s: pier design: %w", w.Name, err)
	}
	w.Governing = g
	return nil
}

// storeyDrift checks the storey drift at each wall and, for the rigid
// diaphragm, at the plan edges, from the diaphragm's displacements
// (ASCE 7-22 §12.8.6: δ = Cd·δe/Ie; §12.12.1 and Table 12.12-1 for the
// limit).
func (a *Analysis) storeyDrift() {
	s := a.Storey
	if !(s.Cd > 0) || !(s.Height > 0) || !a.Absolute {
		return
	}
	h := float64(s.Height)
	check := func(elastic float64) Drift {
		dr := Drift{Checked: true, Elastic: elastic, Design: s.Cd * elastic / s.Ie}
		dr.Ratio = dr.Design / h
		dr.OK = true
		if s.DriftLimit > 0 {
			dr.Allowable = s.DriftLimit * h
			dr.OK = dr.Design <= dr.Allowable*(1+1e-12)
		}
		return dr
	}
	d := a.Distribution
	for i := range a.Walls {
		w := &a.Walls[i]
		// A wall's displacement along its line is its shear over its
		// rigidity, in each case of each diaphragm.
		var e float64
		if s.Diaphragm != Flexible {
			for _, c := range d.Cases {
				e = math.Max(e, math.Abs(c.Shares[i].Total())/w.Rigidity)
			}
		}
		if a.Flexible != nil {
			e = math.Max(e, w.Flexible/w.Rigidity)
		}
		w.Drift = check(e)
		if !w.Drift.OK {
			a.Warnings = append(a.Warnings, fmt.Sprintf("%s: the storey drift at the wall exceeds the limit", w.Name))
		}
	}
	if s.Diaphragm == Flexible {
		return
	}
	names := [2][2]string{{"south", "north"}, {"west", "east"}}
	for ci, c := range d.Cases {
		for k, e := range c.Edges {
			ed := EdgeDrift{Case: ci, Edge: names[c.Load][k], Drift: check(math.Abs(e))}
			a.Edges = append(a.Edges, ed)
		}
	}
}

// solveFE solves every wall's finite-element model on a bounded pool of
// workers, one per available core.
func solveFE(walls []*geometry.Wall) ([]*fe.Result, []error) {
	res := make([]*fe.Result, len(walls))
	errs := make([]error, len(walls))
	jobs := make(chan int)
	var wg sync.WaitGroup
	for range min(runtime.GOMAXPROCS(0), max(len(walls), 1)) {
		wg.Add(1)
		go func() {
			defer wg.Done()
			for i := range jobs {
				classic, _ := pier.Solve(walls[i]) // for the pier names; nil when the classic method cannot solve the layout
				res[i], errs[i] = fe.Solve(walls[i], classic, fe.Options{})
			}
		}()
	}
	for i, w := range walls {
		if w != nil {
			jobs <- i
		}
	}
	close(jobs)
	wg.Wait()
	return res, errs
}

// storeyError turns a distribution error into a storey file error.
func storeyError(s *Storey, err error) error {
	var de *DirectionError
	var le *LineError
	switch {
	case errors.As(err, &de):
		line := 0
		if len(s.Walls) > 0 {
			line = s.Walls[0].Line // the walls start here
		}
		return newError(s.Path, line, "wall", "no wall has direction = %q: nothing resists shear along %s", de.Direction.String(), de.Direction)
	case errors.As(err, &le):
		return newError(s.Path, s.KeyLine("storey.diaphragm"), "storey.diaphragm",
			"a flexible diaphragm spans between wall lines, and every %s-wall stands on one line: add a wall on another line, or use diaphragm = \"rigid\"", le.Direction)
	case errors.Is(err, ErrFlexibleAngle):
		for i, w := range s.Walls {
			if w.Direction == Angled {
				return newError(s.Path, w.lines["direction"], "wall["+strconv.Itoa(i+1)+"].direction",
					"a flexible diaphragm shares the shear by wall lines along x and y; a wall at %g° has none (use diaphragm = \"rigid\")", w.AngleDeg)
			}
		}
	case errors.Is(err, ErrMassOutside):
		return newError(s.Path, s.KeyLine("storey.mass_center"), "storey.mass_center",
			"a flexible diaphragm spreads the storey's mass linearly across the plan with its resultant at the mass centre; that needs the mass centre within the middle third of the plan in each direction")
	case errors.Is(err, ErrParallel):
		return newError(s.Path, 0, "wall", "%v", err)
	case errors.Is(err, ErrTorsion):
		var lines []string
		for _, d := range []Direction{X, Y} {
			for _, w := range s.Walls {
				if w.Direction == d {
					u := report.UnitsFor(s.Units)
					lines = append(lines, fmt.Sprintf("%s-walls on %s = %s %s", d, d.other(), num(u.CoordOf(float64(w.Position)), 2), u.Coord))
					break
				}
			}
		}
		if len(lines) < 2 {
			return newError(s.Path, 0, "wall", "the walls cannot resist torsion: their lines all pass through one point; add a wall on another line")
		}
		return newError(s.Path, 0, "wall", "the walls cannot resist torsion: the %s and the %s all pass through one point; add a wall on another line",
			lines[0], lines[1])
	}
	return newError(s.Path, 0, "", "%v", err)
}

// planWarnings points out where the rigid-diaphragm assumptions are weak.
func planWarnings(a *Analysis) []string {
	var out []string
	s := a.Storey
	if s.Accidental < DefaultAccidental {
		out = append(out, fmt.Sprintf("accidental eccentricity %.3g %% is less than the 5 %% of ASCE 7-22 §12.8.4.2", 100*s.Accidental))
	}
	for _, d := range []Direction{X, Y} {
		lines := map[float64]bool{}
		for _, w := range a.Walls {
			if w.Ref.Direction == d {
				lines[math.Round(float64(w.Ref.Position)*1e6)] = true
			}
		}
		if len(lines) == 1 {
			out = append(out, fmt.Sprintf("every %s-wall stands on one line: the walls along %s resist all the torsion", d, d.other()))
		}
	}
	// Two walls of one direction on one line that overlap along it are
	// most likely the same wall listed twice: it would count double.
	span := func(w Wall) (float64, float64) {
		x0 := float64(w.Ref.Start)
		if !w.Ref.HasStart {
			x0 = (float64(s.Size[w.Ref.Direction]) - float64(wallLength(w))) / 2
		}
		return x0, x0 + float64(wallLength(w))
	}
	for i, wi := range a.Walls {
		if wi.Ref.Direction == Angled {
			continue
		}
		for j := i + 1; j < len(a.Walls); j++ {
			wj := a.Walls[j]
			tol := 1e-6 * float64(s.Size[wi.Ref.Direction.other()])
			if wi.Ref.Direction != wj.Ref.Direction || math.Abs(float64(wi.Ref.Position-wj.Ref.Position)) > tol {
				continue
			}
			a0, a1 := span(wi)
			b0, b1 := span(wj)
			if overlap := math.Min(a1, b1) - math.Max(a0, b0); overlap > tol {
				out = append(out, fmt.Sprintf("walls %d (%s) and %d (%s) stand on the same line and overlap along it by %s: if they are one wall, it is counted twice",
					i+1, wi.Name, j+1, wj.Name, fmtLen(geometry.Length(overlap), s.Units)))
			}
		}
	}
	hmin, hmax := math.Inf(1), math.Inf(-1)
	for _, w := range a.Walls {
		if w.Wall != nil {
			hmin = math.Min(hmin, float64(w.Wall.Height))
			hmax = math.Max(hmax, float64(w.Wall.Height))
		}
	}
	if hmax > hmin*1.01 {
		out = append(out, fmt.Sprintf("the walls are not all the same height (%s to %s): check that they really share one diaphragm level",
			fmtLen(geometry.Length(hmin), s.Units), fmtLen(geometry.Length(hmax), s.Units)))
	}
	out = append(out, torsionWarnings(a)...)
	out = append(out, collectorWarnings(a)...)
	r := float64(s.Size[0]) / float64(s.Size[1])
	if s.Diaphragm == Rigid && (r > 3 || r < 1.0/3) {
		out = append(out, "the plan is more than three times as long as it is wide: check that the diaphragm is rigid enough to be treated as rigid")
	}
	return out
}

// collectorWarnings names the flexible diaphragm's wall lines whose walls
// cover less than half of the plan across the load: the diaphragm's shear
// along the whole line must reach them through a collector (drag strut),
// which the tributary rule assumes (common practice).
func collectorWarnings(a *Analysis) []string {
	if a.Flexible == nil {
		return nil
	}
	s := a.Storey
	var out []string
	for _, load := range []Direction{X, Y} {
		for _, ln := range a.Flexible.Lines[load] {
			cover, unknown := 0.0, 0
			for _, i := range ln.Members {
				l := float64(wallLength(a.Walls[i]))
				cover += l
				if !(l > 0) {
					unknown++
				}
			}
			along := float64(s.Size[load])
			if unknown > 0 && cover < along/2 {
				// A wall given by its rigidity without a length: its cover
				// is not known, so the line's cover cannot be measured.
				out = append(out, fmt.Sprintf("flexible diaphragm: the %s-wall line at %s = %s has %d wall(s) given by rigidity without a length: give its length to check the cover, or check that a collector brings the line's %s to them",
					load, load.other(), fmtLen(geometry.Length(ln.Position), s.Units), unknown, geometry.FormatForce(geometry.Force(ln.Shear), s.Units)))
				continue
			}
			if cover < along/2 {
				out = append(out, fmt.Sprintf("flexible diaphragm: the %s-wall line at %s = %s has walls along %s of the plan's %s: a collector must bring the line's %s to them",
					load, load.other(), fmtLen(geometry.Length(ln.Position), s.Units), fmtLen(geometry.Length(cover), s.Units),
					fmtLen(geometry.Length(along), s.Units), geometry.FormatForce(geometry.Force(ln.Shear), s.Units)))
			}
		}
	}
	return out
}

// torsionWarnings states what the torsional irregularity found means
// under ASCE 7-22.
func torsionWarnings(a *Analysis) []string {
	var out []string
	s, d := a.Storey, a.Distribution
	worst := Regular
	for _, c := range d.Cases {
		worst = max(worst, c.Torsion.Type)
	}
	if s.Diaphragm == Flexible {
		if s.MassCenter != [2]geometry.Length{s.Size[0] / 2, s.Size[1] / 2} {
			out = append(out, "flexible diaphragm: the storey's mass is spread linearly across the plan with its resultant at the mass centre")
		}
		return append(out, "flexible diaphragm: no accidental torsion (ASCE 7-22 §12.8.4.2 asks for it where diaphragms are not flexible), and the torsional irregularity types 1a and 1b apply to rigid or semirigid diaphragms only (ASCE 7-22 Table 12.3-1)")
	}
	switch {
	case worst == Type1b && (s.SDC == "E" || s.SDC == "F"):
		out = append(out, "extreme torsional irregularity (Type 1b) is not permitted in seismic design category "+s.SDC+" (ASCE 7-22 §12.3.3.1)")
	case worst != Regular && s.SDC == "":
		out = append(out, "the plan is torsionally irregular (Type "+worst.String()+"); give sdc in [storey] so that the accidental torsion is amplified where ASCE 7-22 §12.8.4.3 asks")
	case worst == Regular && s.SDC != "":
		out = append(out, "no torsional irregularity: ASCE 7-22 §12.8.4.2 would let the accidental torsion be left out of the design forces here; pierwise keeps it (conservative)")
	}
	if worst != Regular && s.SDC >= "D" {
		out = append(out, "torsional irregularity in seismic design category "+s.SDC+": see ASCE 7-22 §12.3.3.4 (25 % increase in diaphragm connection forces) and §12.7.3 (a three-dimensional model)")
	}
	if s.Diaphragm == Envelope {
		out = append(out, "envelope: each wall's design shear is the larger of the rigid- and the flexible-diaphragm shares (common practice for a diaphragm that is neither)")
	}
	return out
}

// wallWhere names the wall file of an error of the classic method; for a
// cut wall also the line and key of the opening that cuts it
// ("north.toml:31: opening[2]").
func wallWhere(ref WallRef, w *geometry.Wall, err error) string {
	var ce *pier.CutError
	if !errors.As(err, &ce) {
		return ref.File
	}
	data, rerr := readFile(ref.Path)
	key := geometry.OpeningKey(w, ce.Opening)
	if rerr != nil || key == "" {
		return ref.File
	}
	return fmt.Sprintf("%s:%d: %s", ref.File, geometry.KeyLine(data, key), key)
}

// wallName is the name given in the storey file, or the wall's title, or the
// wall file's base name.
func wallName(ref WallRef, w *geometry.Wall) string {
	if ref.Name != "" || w == nil {
		return ref.Name
	}
	name := strings.TrimSpace(w.Title)
	if name == "" {
		name = strings.TrimSuffix(filepath.Base(ref.File), filepath.Ext(ref.File))
	}
	if ref.Layout != "" {
		// The layout chosen in the storey file is part of what the wall is.
		name += ", " + w.Layouts[w.Active].Name
	}
	return name
}

// Ratio is the pier's h/L.
func (p PierForce) Ratio() float64 { return p.H() / p.L() }

// PierDesign checks a storey wall's piers under its storey design shear
// (docs/method.md §8): loaded is the wall solved under that shear on the
// classic basis, whose section forces by load case the checks combine. A
// wall file without [design] has no check (nil, nil).
func PierDesign(w *geometry.Wall, loaded *pier.Result) (*Governing, error) {
	if w == nil || w.Design == nil || loaded == nil {
		return nil, nil
	}
	r, err := design.CheckWall(design.InputOf(w, design.ClassicPiers(loaded)))
	if err != nil {
		return nil, err
	}
	if r.Governing < 0 {
		return nil, nil
	}
	p := &r.Piers[r.Governing]
	check := "requirement"
	if p.Requirement < 0 && len(p.Checks) > 0 {
		check = p.GoverningCheck().Governs.String()
	}
	return &Governing{Pier: p.Name, Ratio: p.Ratio, Check: check}, nil
}

// RigidityDifference returns (classic − FE) / FE of the wall's rigidity, and
// false when one of them is not known or the wall is given by its rigidity
// (then both are the given value).
func (w *Wall) RigidityDifference() (float64, bool) {
	if !(w.ClassicRigidity > 0) || !(w.FERigidity > 0) || w.Ref.HasRigidity {
		return 0, false
	}
	return (w.ClassicRigidity - w.FERigidity) / w.FERigidity, true
}
