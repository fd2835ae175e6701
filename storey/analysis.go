package storey

import (
	"errors"
	"fmt"
	"math"
	"path/filepath"
	"strconv"
	"strings"

	"pierwise/geometry"
	"pierwise/pier"
	"pierwise/report"
)

// Wall is one wall of the storey with its answers.
type Wall struct {
	Ref  WallRef
	Name string // Ref.Name, or the wall file's title, or its base name
	Wall *geometry.Wall

	// Unit is the wall solved as it is (its own load, if any, ignored for
	// the storey): relative rigidity, moduli, pier shares.
	Unit *pier.Result

	// Rigidity is what the distribution used: E·t/d in N/m when
	// Analysis.Absolute, otherwise the relative rigidity times the
	// thickness in metres (one E assumed for every wall).
	Rigidity float64

	Design Design

	// Loaded is the wall solved under its design shear: pier shears and
	// moments, top deflection and drift.
	Loaded *pier.Result
}

// Analysis is a storey's complete answer; the report, the JSON and the
// editor's storey screen are views of it.
type Analysis struct {
	Storey       *Storey
	Walls        []Wall
	Distribution *Distribution

	// Absolute is true when every wall's material gives moduli, so the
	// distribution used absolute rigidities R = E·t/d. Otherwise it used
	// relative rigidity × thickness, which assumes one E for all walls.
	Absolute bool

	Warnings []string
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
func LoadFiles(path string) (*Storey, []*geometry.Wall, error) {
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
		key := "wall[" + strconv.Itoa(i+1) + "].file"
		line := ref.lines["file"]
		if _, err := statFile(ref.Path); err != nil {
			msg := fmt.Sprintf("wall file %q not found (looked for %s)", ref.File, ref.Path)
			if i := strings.LastIndex(ref.Path, ":"); i > 0 {
				if _, err := statFile(ref.Path[:i]); err == nil {
					msg += fmt.Sprintf("; to use a layout of a wall file, write file = %q and layout = %q",
						ref.File[:strings.LastIndex(ref.File, ":")], ref.Path[i+1:])
				}
			}
			errs = append(errs, newError(path, line, key, "%s", msg))
			continue
		}
		w, err := loadWall(ref.Path)
		if err != nil {
			errs = append(errs, newError(path, line, key, "wall file %q has errors:\n%v", ref.File, err))
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

// Analyse solves every wall, distributes the storey shear and solves each
// wall again under its design shear. walls[i] is the wall of s.Walls[i]
// (the editor passes its edited copy). Neither s nor the walls are changed.
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
	names := map[string]int{}
	for i, ref := range s.Walls {
		w := walls[i]
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
		along := float64(s.Size[ref.Direction])
		length := float64(w.Length)
		tol := 1e-9 * along
		switch {
		case ref.HasStart && float64(ref.Start)+length > along+tol:
			wallErr(i, "start", "the wall (%s long, from %s) runs off the plan, which is %s along %s",
				fmtLen(w.Length, s.Units), fmtLen(ref.Start, s.Units), fmtLen(s.Size[ref.Direction], s.Units), ref.Direction)
		case !ref.HasStart && length > along+tol:
			wallErr(i, "file", "the wall is %s long, longer than the plan (%s along %s)",
				fmtLen(w.Length, s.Units), fmtLen(s.Size[ref.Direction], s.Units), ref.Direction)
		}

		res, err := pier.Solve(w)
		if err != nil {
			wallErr(i, "file", "%s: %v", wallWhere(ref, w, err), err)
			a.Walls = append(a.Walls, sw)
			continue
		}
		sw.Unit = res
		if !(res.RigidityAbs > 0) {
			a.Absolute = false
		}
		if w.Load.Shear != 0 {
			a.Warnings = append(a.Warnings, fmt.Sprintf("%s: the wall file's own load (%s) is ignored; the wall takes its share of the storey shear",
				sw.Name, geometry.FormatForce(w.Load.Shear, s.Units)))
		}
		a.Walls = append(a.Walls, sw)
	}
	if len(errs) > 0 {
		return nil, errs
	}

	members := make([]Member, len(a.Walls))
	for i := range a.Walls {
		w := &a.Walls[i]
		if a.Absolute {
			w.Rigidity = w.Unit.RigidityAbs
		} else {
			w.Rigidity = w.Unit.Rigidity * float64(w.Wall.Thickness)
		}
		members[i] = Member{Name: w.Name, Direction: w.Ref.Direction, Position: float64(w.Ref.Position), Rigidity: w.Rigidity}
	}
	if !a.Absolute {
		a.Warnings = append(a.Warnings, "not every wall's material gives a modulus E, so the walls are compared by relative rigidity × thickness, as if they shared one E")
	}
	d, err := Distribute(members, Action{
		Shear:      float64(s.Shear),
		MassCenter: [2]float64{float64(s.MassCenter[0]), float64(s.MassCenter[1])},
		Size:       [2]float64{float64(s.Size[0]), float64(s.Size[1])},
		Accidental: s.Accidental,
	})
	if err != nil {
		return nil, storeyError(s, err)
	}
	a.Distribution = d

	for i := range a.Walls {
		w := &a.Walls[i]
		w.Design = d.Designs[i]
		loaded := *w.Wall // shallow copy: pier.Solve reads the layouts only
		loaded.Load.Shear = geometry.Force(w.Design.Shear)
		res, err := pier.Solve(&loaded)
		if err != nil {
			// The same wall solved a moment ago without this load.
			return nil, fmt.Errorf("storey: wall %s under its design shear: %w", w.Name, err)
		}
		w.Loaded = res // its own warnings stay with it
		if res.HasLoad && res.Drift.Allowable > 0 && !res.Drift.OK {
			u := report.UnitsFor(s.Units)
			a.Warnings = append(a.Warnings, fmt.Sprintf("%s: under its design shear the drift δ = Cd·δe/Ie = %.3g %s exceeds the limit of its wall file, %.3g %s",
				w.Name, u.DeflectionOf(res.Drift.Design), u.Deflection, u.DeflectionOf(res.Drift.Allowable), u.Deflection))
		}
	}
	a.Warnings = append(a.Warnings, planWarnings(a)...)
	return a, nil
}

// storeyError turns a distribution error into a storey file error.
func storeyError(s *Storey, err error) error {
	var de *DirectionError
	switch {
	case errors.As(err, &de):
		line := 0
		if len(s.Walls) > 0 {
			line = s.Walls[0].Line // the walls start here
		}
		return newError(s.Path, line, "wall", "no wall has direction = %q: nothing resists shear along %s", de.Direction.String(), de.Direction)
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
			x0 = (float64(s.Size[w.Ref.Direction]) - float64(w.Wall.Length)) / 2
		}
		return x0, x0 + float64(w.Wall.Length)
	}
	for i, wi := range a.Walls {
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
		hmin = math.Min(hmin, float64(w.Wall.Height))
		hmax = math.Max(hmax, float64(w.Wall.Height))
	}
	if hmax > hmin*1.01 {
		out = append(out, fmt.Sprintf("the walls are not all the same height (%s to %s): check that they really share one diaphragm level",
			fmtLen(geometry.Length(hmin), s.Units), fmtLen(geometry.Length(hmax), s.Units)))
	}
	r := float64(s.Size[0]) / float64(s.Size[1])
	if r > 3 || r < 1.0/3 {
		out = append(out, "the plan is more than three times as long as it is wide: check that the diaphragm is rigid enough to be treated as rigid")
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
	if ref.Name != "" {
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
