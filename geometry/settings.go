package geometry

import (
	"math"
	"strconv"
	"strings"
	"unicode/utf8"
)

// Kind is how a setting is typed, stored and written.
type Kind int

const (
	KindText       Kind = iota // free text in quotes
	KindChoice                 // one of Setting.Choices, in quotes
	KindNumber                 // a plain number
	KindBool                   // true or false
	KindLength                 // a Length: "12ft", "3.6m"; bare in ft or m
	KindForce                  // a Force: "40kip", "180kN"; bare in kip or kN
	KindStress                 // a Stress: "2000psi", "13.8MPa"; bare in psi or MPa
	KindLineLoad               // a LineLoad: "1.2kip/ft", "15kN/m"; bare in kip/ft or kN/m
	KindAreaLoad               // a Stress given per face area: "60psf", "2.9kPa"; bare in psf or kPa
	KindDriftLimit             // a DriftPresets name or a fraction of the height
)

// Value is the value of one setting: Num for numbers and quantities (in SI
// base units: m, N, Pa, N/m), Text for text and choices, Bool for flags. A
// drift limit holds both: the preset's name in Text and the fraction in Num.
type Value struct {
	Num  float64
	Text string
	Bool bool
}

// Write says when Marshal writes a setting.
type Write int

const (
	WriteChanged   Write = iota // when it differs from its default
	WriteAlways                 // always
	WriteWithTable              // whenever its table is written
)

// Setting describes one setting of the wall file, once: how the file names
// and writes it, how it is checked, and where it shows. Parse, Marshal,
// MarshalKeeping, Validate, the editor's wall form, the report's inputs and
// the JSON of pierwise solve are all driven by Settings; a new setting is one
// entry there (and, when it holds a new kind of value, a field of Wall).
type Setting struct {
	Key     string    // path in the file: "length", "material.strength"
	Kind    Kind      //
	Label   string    // the editor's and the report's name for it
	Help    string    // what may be typed: the editor's hint
	Example [2]string // a value as written in a US and an SI file, for messages
	Default Value     // the value when the file leaves it out
	Choices []string  // KindChoice: the names a file may use, in enum order
	Aliases map[string]string
	Noun    string  // KindChoice: what an unknown name is ("support")
	Max     float64 // plausible maximum (SI base units) for the default check; 0 = none
	Write   Write   // when Marshal writes it
	Form    int     // position in the editor's wall form; 0 = not in the form
	Report  bool    // listed among the report's inputs when not the default (false when the report has a line of its own for it)

	// Required reports whether the wall needs the setting; nil = optional.
	// Needs names a setting that must have been read for the requirement to
	// be checked ("material.kind" for the strength).
	Required func(w *Wall) bool
	Needs    string
	Missing  string // the message when a required setting is left out; "" = "missing; add KEY = EXAMPLE"

	Get func(w *Wall) Value
	Set func(w *Wall, v Value)

	// Check adds what is wrong with the setting's value on w to l; nil uses
	// the kind's check (finite, not negative, at most Max, a known choice).
	Check func(s *Setting, w *Wall, l *ErrorList)
	// InFile is an extra rule for a value written in a file (a zero mesh
	// size, which the wall itself takes as "the default"); "" = fine.
	InFile func(v Value) string
}

// Settings are the wall file's settings in the order the file writes them
// (and Validate checks them). Openings, layouts and the names layout and
// active are not settings: they are lists and references the file parser
// reads itself.
var Settings = []Setting{
	{Key: "title", Kind: KindText, Label: "title", Form: 10, Get: func(w *Wall) Value { return Value{Text: w.Title} },
		Set: func(w *Wall, v Value) { w.Title = v.Text }},
	{Key: "project.name", Kind: KindText, Label: "project", Form: 11,
		Get: func(w *Wall) Value { return Value{Text: w.Project.Name} }, Set: func(w *Wall, v Value) { w.Project.Name = v.Text }},
	{Key: "project.job", Kind: KindText, Label: "job number", Form: 12,
		Get: func(w *Wall) Value { return Value{Text: w.Project.Job} }, Set: func(w *Wall, v Value) { w.Project.Job = v.Text }},
	{Key: "project.engineer", Kind: KindText, Label: "engineer", Form: 13,
		Get: func(w *Wall) Value { return Value{Text: w.Project.Engineer} }, Set: func(w *Wall, v Value) { w.Project.Engineer = v.Text }},
	{Key: "project.checker", Kind: KindText, Label: "checker", Form: 14,
		Get: func(w *Wall) Value { return Value{Text: w.Project.Checker} }, Set: func(w *Wall, v Value) { w.Project.Checker = v.Text }},
	{Key: "units", Kind: KindChoice, Label: "units", Help: "us or si", Noun: "unit system", Choices: []string{US: "us", SI: "si"},
		Write: WriteAlways, Form: 20,
		Get: func(w *Wall) Value { return Value{Text: w.Units.String()} },
		Set: func(w *Wall, v Value) { w.Units, _ = ParseSystem(v.Text) }},
	{Key: "length", Kind: KindLength, Label: "length", Example: [2]string{`"36ft"`, `"9.6m"`}, Required: always, Write: WriteAlways, Form: 30,
		Get: func(w *Wall) Value { return Value{Num: float64(w.Length)} }, Set: func(w *Wall, v Value) { w.Length = Length(v.Num) },
		Check: checkSize},
	{Key: "height", Kind: KindLength, Label: "height", Example: [2]string{`"14ft"`, `"3.6m"`}, Required: always, Write: WriteAlways, Form: 40,
		Get: func(w *Wall) Value { return Value{Num: float64(w.Height)} }, Set: func(w *Wall, v Value) { w.Height = Length(v.Num) },
		Check: checkSize},
	{Key: "thickness", Kind: KindLength, Label: "thickness", Example: [2]string{`"7.625in"`, `"190mm"`}, Required: always, Write: WriteAlways, Form: 50,
		Get: func(w *Wall) Value { return Value{Num: float64(w.Thickness)} }, Set: func(w *Wall, v Value) { w.Thickness = Length(v.Num) },
		Check: checkThickness},
	{Key: "support", Kind: KindChoice, Label: "support", Help: "cantilever or fixed", Noun: "support", Choices: supportNames,
		Aliases: map[string]string{"fixed-fixed": "fixed"}, Write: WriteAlways, Form: 60,
		Get: func(w *Wall) Value { return Value{Text: w.Support.String()} },
		Set: func(w *Wall, v Value) { w.Support, _ = ParseSupport(v.Text) }},

	{Key: "material.kind", Kind: KindChoice, Label: "material", Help: "concrete-masonry, clay-masonry, concrete, custom", Noun: "material",
		Choices: materialNames, Write: WriteAlways, Form: 70,
		Get: func(w *Wall) Value { return Value{Text: w.Material.Kind.String()} },
		Set: func(w *Wall, v Value) { w.Material.Kind, _ = ParseMaterialKind(v.Text) }},
	{Key: "material.strength", Kind: KindStress, Label: "strength f'm / f'c", Help: "e.g. 2000psi, 13.8MPa", Example: [2]string{`"2000psi"`, `"13.8MPa"`},
		Required: func(w *Wall) bool { return w.Material.Kind != Custom }, Needs: "material.kind",
		Missing: "missing strength (f'm for masonry, f'c for concrete); add [material] strength = ", Form: 80,
		Get: func(w *Wall) Value { return Value{Num: float64(w.Material.Strength)} }, Set: func(w *Wall, v Value) { w.Material.Strength = Stress(v.Num) },
		Check: checkStrength},
	{Key: "material.modulus", Kind: KindStress, Label: "modulus E", Help: "blank: from the strength", Example: [2]string{`"2000psi"`, `"13.8MPa"`}, Form: 90,
		Get: func(w *Wall) Value { return Value{Num: float64(w.Material.Modulus)} }, Set: func(w *Wall, v Value) { w.Material.Modulus = Stress(v.Num) },
		Check: checkModulus},
	{Key: "material.shear_modulus", Kind: KindStress, Label: "shear modulus E_v", Example: [2]string{`"2000psi"`, `"13.8MPa"`},
		Get: func(w *Wall) Value { return Value{Num: float64(w.Material.ShearModulus)} }, Set: func(w *Wall, v Value) { w.Material.ShearModulus = Stress(v.Num) },
		Check: checkShearModulus},
	{Key: "material.poisson", Kind: KindNumber, Label: "Poisson's ratio",
		Get: func(w *Wall) Value { return Value{Num: w.Material.Poisson} }, Set: func(w *Wall, v Value) { w.Material.Poisson = v.Num },
		Check: checkPoisson},

	{Key: "load.shear", Kind: KindForce, Label: "shear V at top", Help: "blank: no load", Example: [2]string{`"40kip"`, `"40kip"`}, Form: 100,
		Get: func(w *Wall) Value { return Value{Num: float64(w.Load.Shear)} }, Set: func(w *Wall, v Value) { w.Load.Shear = Force(v.Num) },
		Check: checkShear},

	{Key: "stiffness.flexure", Kind: KindNumber, Label: "stiffness flexure", Help: "x I_g; e.g. 0.35 cracked (ACI 318-19 Table 6.6.3.1.1(a))",
		Default: Value{Num: 1}, Write: WriteWithTable, Form: 140,
		Get: func(w *Wall) Value { return Value{Num: w.Stiffness.Flexure} }, Set: func(w *Wall, v Value) { w.Stiffness.Flexure = v.Num },
		Check: checkModifier},
	{Key: "stiffness.shear", Kind: KindNumber, Label: "stiffness shear", Help: "x shear area; 1 = gross",
		Default: Value{Num: 1}, Write: WriteWithTable, Form: 150,
		Get: func(w *Wall) Value { return Value{Num: w.Stiffness.Shear} }, Set: func(w *Wall, v Value) { w.Stiffness.Shear = v.Num },
		Check: checkModifier},

	// C_d and I_e have no default (docs/method.md §7): 0 is "not given",
	// and no drift verdict is made without them.
	{Key: "drift.cd", Kind: KindNumber, Label: "Cd", Help: "deflection amplification; blank: not given, no drift verdict", Form: 120,
		Get: func(w *Wall) Value { return Value{Num: w.Drift.Cd} }, Set: func(w *Wall, v Value) { w.Drift.Cd = v.Num },
		InFile: positiveFactor,
		Check:  checkFactor},
	{Key: "drift.ie", Kind: KindNumber, Label: "Ie", Help: "importance factor; blank: not given, no drift verdict", Form: 130,
		Get: func(w *Wall) Value { return Value{Num: w.Drift.Ie} }, Set: func(w *Wall, v Value) { w.Drift.Ie = v.Num },
		InFile: positiveFactor,
		Check:  checkFactor},
	{Key: "drift.limit", Kind: KindDriftLimit, Label: "drift limit", Help: "a fraction (0.01) or " + strings.Join([]string{DriftPresets[0].Name, DriftPresets[1].Name}, ", ") + ", ...",
		Form: 110,
		Get:  func(w *Wall) Value { return Value{Num: w.Drift.Limit, Text: w.Drift.Preset} },
		Set:  func(w *Wall, v Value) { w.Drift.Limit, w.Drift.Preset = v.Num, v.Text },
		Check: func(_ *Setting, w *Wall, l *ErrorList) {
			w.validateDriftLimit(l)
		}},
	{Key: "drift.storey_height", Kind: KindLength, Label: "storey height h_sx", Help: "blank: the wall's height", Example: [2]string{`"10ft"`, `"3m"`}, Form: 135,
		Get: func(w *Wall) Value { return Value{Num: float64(w.Drift.StoreyHeight)} }, Set: func(w *Wall, v Value) { w.Drift.StoreyHeight = Length(v.Num) },
		Check: checkStoreyHeight,
		InFile: func(v Value) string {
			if v.Num <= 0 {
				return "must be greater than zero (leave it out to use the wall's height)"
			}
			return ""
		}},

	{Key: "check.mesh", Kind: KindLength, Label: "FE mesh size", Help: "blank: the default size", Example: [2]string{`"6in"`, `"150mm"`}, Form: 160,
		Get: func(w *Wall) Value { return Value{Num: float64(w.Check.Mesh)} }, Set: func(w *Wall, v Value) { w.Check.Mesh = Length(v.Num) },
		Check: checkMesh,
		InFile: func(v Value) string {
			if v.Num <= 0 {
				return "must be greater than zero (leave it out for the default size)"
			}
			return ""
		}},
	{Key: "check.element", Kind: KindText, Label: "FE element", Help: "blank: default (qm6), or q4", Form: 170,
		Get: func(w *Wall) Value { return Value{Text: w.Check.Element} }, Set: func(w *Wall, v Value) { w.Check.Element = v.Text },
		Check: func(s *Setting, w *Wall, l *ErrorList) {
			if w.Check.Element != "" && !knownElement(w.Check.Element) {
				l.add(s.Key, "unknown element "+strconv.Quote(w.Check.Element)+" (use qm6 or q4)")
			}
		}},

	{Key: "analysis.basis", Kind: KindChoice, Label: "basis", Help: "classic or fe: the model every result comes from",
		Noun: "basis", Choices: []string{BasisClassic: "classic", BasisFE: "fe"}, Form: 180, Report: true,
		Default: Value{Text: "classic"},
		Get:     func(w *Wall) Value { return Value{Text: w.Analysis.Basis.String()} },
		Set: func(w *Wall, v Value) {
			w.Analysis.Basis = BasisClassic
			if v.Text == "fe" {
				w.Analysis.Basis = BasisFE
			}
		},
		Check: func(s *Setting, w *Wall, l *ErrorList) {
			if w.Analysis.Basis != BasisClassic && w.Analysis.Basis != BasisFE {
				l.add(s.Key, "unknown basis "+strconv.Itoa(int(w.Analysis.Basis))+` (use "classic" or "fe")`)
			}
		}},
	{Key: "analysis.top_tie", Kind: KindBool, Label: "FE top tie", Help: "true: the FE model ties the top's sway (a bond beam)",
		Default: Value{Bool: true}, Form: 190, Report: true,
		Get: func(w *Wall) Value { return Value{Bool: !w.Analysis.NoTopTie} }, Set: func(w *Wall, v Value) { w.Analysis.NoTopTie = !v.Bool }},

	{Key: "gravity.dead", Kind: KindLineLoad, Label: "dead load D", Help: "along the top, e.g. 1.2kip/ft, 800plf, 15kN/m",
		Example: [2]string{`"1.2kip/ft"`, `"15kN/m"`}, Max: maxLineLoad, Form: 200,
		Get: func(w *Wall) Value { return Value{Num: float64(w.Gravity.Dead)} }, Set: func(w *Wall, v Value) { w.Gravity.Dead = LineLoad(v.Num) }},
	{Key: "gravity.live", Kind: KindLineLoad, Label: "live load L", Help: "along the top, e.g. 0.5kip/ft, 7kN/m",
		Example: [2]string{`"0.5kip/ft"`, `"7kN/m"`}, Max: maxLineLoad, Form: 210,
		Get: func(w *Wall) Value { return Value{Num: float64(w.Gravity.Live)} }, Set: func(w *Wall, v Value) { w.Gravity.Live = LineLoad(v.Num) }},
	{Key: "gravity.self_weight", Kind: KindAreaLoad, Label: "self weight", Help: "per face area, e.g. 60psf, 2.9kPa; blank: from the material; 0: none",
		Example: [2]string{`"60psf"`, `"2.9kPa"`}, Max: maxAreaLoad, Form: 220,
		Default: Value{Num: math.NaN()}, // "not given" (NaN so that 0, "no self weight", is written)
		Get: func(w *Wall) Value {
			if w.Gravity.NoSelf {
				return Value{Num: 0}
			}
			if w.Gravity.SelfWeight == 0 {
				return Value{Num: math.NaN()}
			}
			return Value{Num: float64(w.Gravity.SelfWeight)}
		},
		Set: func(w *Wall, v Value) {
			switch {
			case math.IsNaN(v.Num):
				w.Gravity.SelfWeight, w.Gravity.NoSelf = 0, false
			case v.Num == 0:
				w.Gravity.SelfWeight, w.Gravity.NoSelf = 0, true
			default:
				w.Gravity.SelfWeight, w.Gravity.NoSelf = Stress(v.Num), false
			}
		},
		Check: func(s *Setting, w *Wall, l *ErrorList) {
			if w.Gravity.NoSelf && w.Gravity.SelfWeight != 0 {
				l.add(s.Key, "no self weight (self_weight = 0) and a self weight at once")
				return
			}
			checkQuantity(s, w, Value{Num: float64(w.Gravity.SelfWeight)}, l)
		}},
}

// Plausible maximum gravity loads: far above any wall (a 1000 kip/ft line
// load is a 15 MN/m, a 100 ksf weight a 5 m thick wall of steel) and far
// below what could overflow the mechanics.
const (
	maxLineLoad = 1e8 // N/m
	maxAreaLoad = 5e6 // Pa
)

func always(*Wall) bool { return true }

// FindSetting returns the setting with the file key key ("drift.cd").
func FindSetting(key string) (*Setting, bool) {
	for i := range Settings {
		if Settings[i].Key == key {
			return &Settings[i], true
		}
	}
	return nil, false
}

// Table returns the table the setting sits in ("material"), "" for the top
// level; Name returns its key within that table ("strength").
func (s *Setting) Table() string {
	t, _ := s.split()
	return t
}

// Name returns the setting's key within its table.
func (s *Setting) Name() string {
	_, n := s.split()
	return n
}

func (s *Setting) split() (table, name string) {
	if i := strings.LastIndexByte(s.Key, '.'); i >= 0 {
		return s.Key[:i], s.Key[i+1:]
	}
	return "", s.Key
}

// settingTables returns the tables of Settings in the order they are written.
func settingTables() []string {
	var ts []string
	seen := map[string]bool{}
	for i := range Settings {
		t := Settings[i].Table()
		if t != "" && !seen[t] {
			seen[t] = true
			ts = append(ts, t)
		}
	}
	return ts
}

// IsDefault reports whether the setting holds its default value on w.
func (s *Setting) IsDefault(w *Wall) bool {
	return sameValue(s.Get(w), s.Default)
}

func sameValue(a, b Value) bool {
	same := a.Num == b.Num || (math.IsNaN(a.Num) && math.IsNaN(b.Num))
	return same && a.Text == b.Text && a.Bool == b.Bool
}

// written reports whether Marshal writes the setting on its own account
// (WriteWithTable settings follow their table).
func (s *Setting) written(w *Wall) bool {
	return s.Write == WriteAlways || (s.Write == WriteChanged && !s.IsDefault(w))
}

// example returns the setting's example value for the system.
func (s *Setting) example(sys System) string {
	if sys == SI && s.Example[1] != "" {
		return s.Example[1]
	}
	return s.Example[0]
}

// choice returns the file name a typed choice stands for.
// Case and surrounding spaces do not matter.
func (s *Setting) choice(t string) (string, bool) {
	t = strings.TrimSpace(t)
	if a, ok := s.Aliases[strings.ToLower(t)]; ok {
		t = a
	}
	for _, c := range s.Choices {
		if strings.EqualFold(c, t) {
			return c, true
		}
	}
	return "", false
}

// choiceList writes the choices as `"us" or "si"`.
func (s *Setting) choiceList(quoted bool) string {
	q := make([]string, len(s.Choices))
	for i, c := range s.Choices {
		q[i] = c
		if quoted {
			q[i] = strconv.Quote(c)
		}
	}
	if len(q) < 2 {
		return strings.Join(q, "")
	}
	return strings.Join(q[:len(q)-1], ", ") + " or " + q[len(q)-1]
}

// unknownChoice is the message for a name that is not one of the choices.
func (s *Setting) unknownChoice(t string) string {
	return "unknown " + s.Noun + " " + strconv.Quote(t) + " (use " + s.choiceList(true) + ")"
}

// parseQuantity reads a quantity of the setting's kind typed as text.
func (s *Setting) parseQuantity(t string, sys System) (float64, error) {
	switch s.Kind {
	case KindLength:
		v, err := ParseLength(t, sys)
		return float64(v), err
	case KindForce:
		v, err := ParseForce(t, sys)
		return float64(v), err
	case KindStress:
		v, err := ParseStress(t, sys)
		return float64(v), err
	case KindLineLoad:
		v, err := ParseLineLoad(t, sys)
		return float64(v), err
	case KindAreaLoad:
		v, err := ParseAreaLoad(t, sys)
		return float64(v), err
	}
	panic("geometry: parseQuantity of a setting that is no quantity: " + s.Key)
}

// isQuantity reports whether the setting holds a quantity with a unit.
func (s *Setting) isQuantity() bool {
	switch s.Kind {
	case KindLength, KindForce, KindStress, KindLineLoad, KindAreaLoad:
		return true
	}
	return false
}

// base is the unit of a bare number in a file, for quantities.
func (s *Setting) base(sys System) float64 {
	switch s.Kind {
	case KindLength:
		return float64(sys.BaseLength())
	case KindForce:
		return float64(sys.BaseForce())
	case KindStress:
		return float64(sys.BaseStress())
	case KindLineLoad:
		return float64(sys.BaseLineLoad())
	case KindAreaLoad:
		return float64(sys.BaseAreaLoad())
	}
	return 1
}

// Format shows a value of the setting to people in the system's units
// (rounded, as FormatLength does; not meant to be read back exactly).
func (s *Setting) Format(v Value, sys System) string {
	switch s.Kind {
	case KindText, KindChoice:
		return v.Text
	case KindBool:
		return strconv.FormatBool(v.Bool)
	case KindNumber:
		return strconv.FormatFloat(v.Num, 'g', -1, 64)
	case KindDriftLimit:
		if v.Text != "" {
			return v.Text
		}
		return strconv.FormatFloat(v.Num, 'g', -1, 64)
	case KindLength:
		return FormatLength(Length(v.Num), sys)
	case KindForce:
		return FormatForce(Force(v.Num), sys)
	case KindStress:
		return FormatStress(Stress(v.Num), sys)
	case KindLineLoad:
		return FormatLineLoad(LineLoad(v.Num), sys)
	case KindAreaLoad:
		return FormatAreaLoad(Stress(v.Num), sys)
	}
	return ""
}

// Show returns the setting's value on w as the editor's form shows it:
// Format of the value, or "" for an optional quantity or limit not given.
// A number of zero shows its default (a wall built in code may leave C_d
// or a stiffness modifier zero, which the mechanics read as the default).
func (s *Setting) Show(w *Wall) string {
	v := s.Get(w)
	switch {
	case math.IsNaN(v.Num):
		return ""
	case s.Kind == KindNumber && v.Num <= 0 && s.Default.Num > 0:
		return s.Format(s.Default, w.Units)
	case s.Kind == KindDriftLimit && v.Text == "" && v.Num <= 0:
		return ""
	case s.isQuantity() && v.Num == 0 && s.Default.Num == 0:
		return ""
	}
	return s.Format(v, w.Units)
}

// Read parses a value of the setting as typed in the editor (text, not
// TOML): a blank is the default; a quantity takes a unit or is in the
// system's base unit. The error message is short, for beside a field.
func (s *Setting) Read(t string, sys System) (Value, string) {
	t = strings.TrimSpace(t)
	if t == "" && s.Kind != KindText {
		if s.Kind == KindChoice && s.Default.Text == "" {
			return Value{}, s.choiceList(false)
		}
		return s.Default, ""
	}
	switch s.Kind {
	case KindText:
		return Value{Text: t}, ""
	case KindChoice:
		c, ok := s.choice(t)
		if !ok {
			return Value{}, s.choiceList(false)
		}
		return Value{Text: c}, ""
	case KindBool:
		switch strings.ToLower(t) {
		case "true", "yes", "on", "y":
			return Value{Bool: true}, ""
		case "false", "no", "off", "n":
			return Value{Bool: false}, ""
		}
		return Value{}, "true or false"
	case KindNumber:
		f, msg := parseNumber(t)
		if msg != "" {
			return Value{}, "a number such as " + s.Format(s.Default, sys)
		}
		return Value{Num: f}, ""
	case KindDriftLimit:
		if p, ok := FindDriftPreset(t); ok {
			return Value{Num: p.Limit, Text: p.Name}, ""
		}
		f, msg := parseNumber(strings.TrimSuffix(t, "h"))
		if msg != "" || !(f > 0 && f < 1) {
			return Value{}, "a fraction of the height such as 0.01, or a preset name"
		}
		return Value{Num: f}, ""
	}
	f, err := s.parseQuantity(t, sys)
	if err != nil {
		msg := err.Error()
		if i := strings.LastIndex(msg, ": "); i >= 0 && i+2 < len(msg) {
			msg = msg[i+2:]
		}
		return Value{}, msg
	}
	return Value{Num: f}, ""
}

// fileText writes the setting's value on w as TOML that Parse reads back
// to the very same value (see Marshal).
func (s *Setting) fileText(w *Wall) string {
	v, sys := s.Get(w), w.Units
	switch s.Kind {
	case KindText, KindChoice:
		return quote(v.Text)
	case KindBool:
		return strconv.FormatBool(v.Bool)
	case KindNumber:
		return tomlFloat(v.Num)
	case KindDriftLimit:
		if v.Text != "" {
			return quote(v.Text)
		}
		return tomlFloat(v.Num)
	case KindLength:
		return quote(exactLength(Length(v.Num), sys))
	case KindForce:
		return quote(exactForce(Force(v.Num), sys))
	case KindStress:
		return quote(exactStress(Stress(v.Num), sys))
	case KindLineLoad:
		return quote(exactLineLoad(LineLoad(v.Num), sys))
	case KindAreaLoad:
		return quote(exactAreaLoad(Stress(v.Num), sys))
	}
	return ""
}

// JSONValue is the setting's value on w for JSON: text, true/false, or a
// number, quantities in SI base units (m, N, Pa, N/m); nil when not given.
func (s *Setting) JSONValue(w *Wall) any {
	v := s.Get(w)
	switch s.Kind {
	case KindText, KindChoice:
		return v.Text
	case KindBool:
		return v.Bool
	case KindDriftLimit:
		if v.Text != "" {
			return v.Text
		}
	}
	if math.IsNaN(v.Num) || math.IsInf(v.Num, 0) {
		return nil
	}
	return v.Num
}

// check adds what is wrong with the setting on w to l.
func (s *Setting) check(w *Wall, l *ErrorList) {
	if s.Check != nil {
		s.Check(s, w, l)
		return
	}
	checkQuantity(s, w, s.Get(w), l)
}

// checkQuantity is the default check: text is UTF-8, a choice is known, a
// number or quantity is finite, not negative and at most s.Max.
func checkQuantity(s *Setting, w *Wall, v Value, l *ErrorList) {
	switch s.Kind {
	case KindBool:
		return
	case KindText:
		if !utf8.ValidString(v.Text) {
			l.add(s.Key, "is not valid UTF-8 text")
		}
		return
	case KindChoice:
		if _, ok := s.choice(v.Text); !ok {
			l.add(s.Key, s.unknownChoice(v.Text))
		}
		return
	}
	show := func(x float64) string { return s.Format(Value{Num: x}, w.Units) }
	switch x := v.Num; {
	case math.IsNaN(x) && s.Default.Num != s.Default.Num:
		// not given
	case !finite(x):
		l.add(s.Key, "is not a finite number")
	case x < 0:
		l.add(s.Key, "must not be negative (is "+show(x)+")")
	case s.Max > 0 && x > s.Max:
		l.add(s.Key, "is implausibly large ("+show(x)+"; at most "+show(s.Max)+"): check the unit")
	}
}

func checkSize(s *Setting, w *Wall, l *ErrorList) {
	positiveLength(l, s.Key, Length(s.Get(w).Num), w.Units)
}

func checkThickness(s *Setting, w *Wall, l *ErrorList) {
	if positiveLength(l, s.Key, w.Thickness, w.Units) && (w.Thickness < minThickness || w.Thickness > maxThickness) {
		// Masonry and concrete shear walls are 4 in to 2 ft thick or so;
		// thickness = 8 in a US file is 8 ft, a unit left out.
		bare := "feet"
		if w.Units == SI {
			bare = "metres"
		}
		l.add(s.Key, "is implausible for a wall ("+FormatLength(w.Thickness, w.Units)+"); thicknesses run from 2 in to 5 ft (50 mm to 1.5 m): check the unit (a bare number is in "+bare+")")
	}
}

// stressCheck is what checkStress asks of a stress value: zero is an error
// unless zeroOK (and then says required when it is set), and a positive
// value outside [lo, hi] is implausible, with what naming the quantity and
// ranges stating the plausible ones.
type stressCheck struct {
	zeroOK   bool
	required string
	lo, hi   Stress
	what     string
	ranges   string
}

// checkStress adds to l the one error of v for key, if any: not finite,
// negative (or zero where it must not be), beyond the largest stress, or
// implausible, which a unit left out or mistyped most often explains.
func checkStress(key string, v Stress, sys System, c stressCheck, l *ErrorList) {
	switch f := float64(v); {
	case !finite(f):
		l.add(key, "is not a finite number")
	case f < 0 || (f == 0 && !c.zeroOK):
		l.add(key, "must be greater than zero (is "+FormatStress(v, sys)+")")
	case v > maxStress:
		l.add(key, tooLargeStress(v, sys))
	case f == 0 && c.required != "":
		l.add(key, c.required)
	case f > 0 && (v < c.lo || v > c.hi):
		l.add(key, "is implausible for "+c.what+" ("+FormatStress(v, sys)+"); "+c.ranges+": check the unit")
	}
}

// f'm and f'c of real walls lie within a few MPa to about 100 MPa; far
// outside that, a unit was most likely left out or mistyped (strength =
// 2000 in an SI file is 2000 MPa, not psi).
func checkStrength(s *Setting, w *Wall, l *ErrorList) {
	checkStress(s.Key, w.Material.Strength, w.Units, stressCheck{
		zeroOK: w.Material.Kind == Custom, lo: minStrength, hi: maxStrength,
		what: "f'm or f'c", ranges: "strengths run from 1 MPa to 250 MPa (145 psi to 36 ksi)",
	}, l)
}

// modulus = 1500 in a US file is 1500 psi, a thousand times too soft.
func checkModulus(s *Setting, w *Wall, l *ErrorList) {
	c := stressCheck{zeroOK: true, lo: minModulus, hi: maxModulus,
		what: "E", ranges: "moduli run from 0.5 GPa to 500 GPa (73 ksi to 72,500 ksi)"}
	if w.Material.Kind == Custom {
		c.required = `is required for kind = "custom"`
	}
	checkStress(s.Key, w.Material.Modulus, w.Units, c, l)
}

func checkShearModulus(s *Setting, w *Wall, l *ErrorList) {
	checkStress(s.Key, w.Material.ShearModulus, w.Units, stressCheck{
		zeroOK: true, lo: minModulus / 5, hi: maxModulus / 2,
		what: "E_v", ranges: "shear moduli run from 0.1 GPa to 250 GPa (15 ksi to 36,000 ksi)",
	}, l)
}

// checkPoisson: ν of an isotropic material in plane stress lies below 0.5
// (E_v = E/(2(1+ν)) above E/3); zero means "not given", so it is a ratio
// above 0.
func checkPoisson(s *Setting, w *Wall, l *ErrorList) {
	m := w.Material
	if nu := m.Poisson; !finite(nu) {
		l.add(s.Key, "is not a finite number")
	} else if nu < 0 || nu >= 0.5 {
		l.add(s.Key, "must be a Poisson's ratio from above 0 to below 0.5, such as 0.2 for concrete (is "+strconv.FormatFloat(nu, 'g', -1, 64)+")")
	} else if nu > 0 && m.ShearModulus != 0 {
		l.add(s.Key, "give either shear_modulus or poisson, not both (E_v = E/(2(1+ν)))")
	}
}

func checkShear(s *Setting, w *Wall, l *ErrorList) {
	sys := w.Units
	if v := float64(w.Load.Shear); !finite(v) {
		l.add(s.Key, "is not a finite number")
	} else if v > float64(maxForce) {
		l.add(s.Key, "is implausibly large ("+FormatForce(w.Load.Shear, sys)+"); check the unit")
	} else if v < 0 {
		l.add(s.Key, "must not be negative (is "+FormatForce(w.Load.Shear, sys)+"); the sign of the shear does not change rigidity or shares")
	}
}

func checkModifier(s *Setting, w *Wall, l *ErrorList) {
	numberIn(l, s.Key, s.Get(w).Num, minModifier, maxModifier)
}

func checkFactor(s *Setting, w *Wall, l *ErrorList) {
	if v := s.Get(w).Num; v != 0 { // 0: not given (docs/method.md §7)
		numberIn(l, s.Key, v, 0, maxFactor)
	}
}

// positiveFactor refuses a C_d or I_e of zero or less written in a file
// (the wall takes 0 as "not given").
func positiveFactor(v Value) string {
	if v.Num <= 0 {
		return "must be greater than zero (leave it out when it is not known: no drift verdict is made without it)"
	}
	return ""
}

// checkStoreyHeight: h_sx is 0 (the wall's height) or a plausible length.
func checkStoreyHeight(s *Setting, w *Wall, l *ErrorList) {
	switch h := float64(w.Drift.StoreyHeight); {
	case !finite(h):
		l.add(s.Key, "is not a finite number")
	case h < 0:
		l.add(s.Key, "must be greater than zero (leave it out to use the wall's height)")
	case h > float64(maxSize):
		l.add(s.Key, "is implausibly large ("+FormatLength(w.Drift.StoreyHeight, w.Units)+"); check the unit")
	}
}

func checkMesh(s *Setting, w *Wall, l *ErrorList) {
	sys := w.Units
	if m := float64(w.Check.Mesh); !finite(m) {
		l.add(s.Key, "is not a finite number")
	} else if m < 0 {
		l.add(s.Key, "must be positive (or left out for the default size)")
	} else if big := math.Max(float64(w.Length), float64(w.Height)); m > 0 && finite(big) && big > 0 {
		if m > big {
			l.add(s.Key, "is larger than the wall ("+FormatLength(w.Check.Mesh, sys)+")")
		} else if m*maxMeshCells < big {
			l.add(s.Key, "is too fine: more than "+strconv.Itoa(maxMeshCells)+" elements along the wall (at least "+FormatLength(Length(big/maxMeshCells), sys)+")")
		}
	}
}
