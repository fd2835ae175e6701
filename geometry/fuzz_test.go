package geometry

import (
	"errors"
	"math"
	"os"
	"reflect"
	"strings"
	"testing"

	"github.com/BurntSushi/toml"
)

// FuzzParseLength: any text either reads as a finite length or gives a
// *UnitError that carries the text; a length that reads is written back
// exactly by the file writer and shown without panicking.
func FuzzParseLength(f *testing.F) {
	for _, s := range []string{"12ft", "7.625in", `12'-6"`, `12'6"`, `6"`, `12' 6 1/2"`, "3.2m", "200mm", "20cm", "12", "-3ft",
		"1e400", "nan", "inf", "", `'"`, "1/0in", "7 5/8 in", "12′-6″", "0x10", "1_0", "..", "-", `-'-"`, "1e-320mm"} {
		f.Add(s, false)
		f.Add(s, true)
	}
	f.Fuzz(func(t *testing.T, s string, si bool) {
		sys := US
		if si {
			sys = SI
		}
		l, err := ParseLength(s, sys)
		if err != nil {
			var ue *UnitError
			if !errors.As(err, &ue) || ue.Input != s || ue.Msg == "" {
				t.Fatalf("ParseLength(%q): error %#v does not carry the input", s, err)
			}
			if l != 0 {
				t.Fatalf("ParseLength(%q) = %g with an error", s, float64(l))
			}
			return
		}
		v := float64(l)
		if math.IsNaN(v) || math.IsInf(v, 0) {
			t.Fatalf("ParseLength(%q) = %g", s, v)
		}
		text := exactLength(l, sys)
		back, err := ParseLength(text, sys)
		if err != nil || back != l {
			t.Fatalf("ParseLength(%q) = %g, written as %q, reads back as %g, %v", s, v, text, float64(back), err)
		}
		if FormatLength(l, sys) == "" {
			t.Fatalf("FormatLength(%g) is empty", v)
		}
	})
}

// FuzzParse: any bytes either give a valid wall that survives a round trip
// through Marshal, or an ErrorList whose every entry names the file.
func FuzzParse(f *testing.F) {
	for _, name := range wallFiles(f) {
		data, err := os.ReadFile(name)
		if err != nil {
			f.Fatal(err)
		}
		f.Add(data)
	}
	f.Add([]byte(wallText))
	f.Add([]byte(wallText + "\n[drift]\nlimit = \"masonry-cantilever\"\ncd = 4\n[stiffness]\nflexure = 0.35\n[check]\nmesh = 6\nelement = \"q4\"\n"))
	f.Add([]byte(strings.Replace(wallText, `x = "10ft"`, `x = "5ft"`, 1)))
	f.Add([]byte(wallText + "\n[analysis]\nbasis = \"fe\"\ntop_tie = false\n[gravity]\ndead = \"1.2kip/ft\"\nlive = 800\nself_weight = 0\n"))
	f.Add([]byte("LENGTH = 1\nlength = 2\nheight = 1\nthickness = 1\n[Material]\nstrength = 1\n"))
	f.Add([]byte("length = 1\nheight = 1\nthickness = 1\n[material]\nstrength = 1\n[[opening]]\nx = 0\nwidth = 1\nheight = 1\n"))
	f.Add([]byte("units = \"si\"\nlength = 1e300\nheight = 1e-300\nthickness = \"1mm\"\n[material]\nkind = \"custom\"\nmodulus = 1\n"))
	f.Add([]byte("a = \"\"\"\nb = 1\n\"\"\"\n[[x.y]]\n[[x]]\n"))
	f.Fuzz(func(t *testing.T, data []byte) {
		w, err := Parse("fuzz.toml", data)
		if err != nil {
			if w != nil {
				t.Fatalf("a wall and an error")
			}
			var l ErrorList
			if !errors.As(err, &l) || len(l) == 0 {
				t.Fatalf("error %T %v is not a non-empty ErrorList", err, err)
			}
			for _, e := range l {
				if e.File != "fuzz.toml" || e.Msg == "" || e.Line < 0 {
					t.Fatalf("error without file or message: %#v", e)
				}
			}
			return
		}
		if err := w.Validate(); err != nil {
			t.Fatalf("Parse accepted a wall that Validate refuses: %v", err)
		}
		for _, v := range []float64{float64(w.Length), float64(w.Height), float64(w.Thickness), w.Stiffness.Flexure, w.Stiffness.Shear} {
			if !(v > 0) || math.IsInf(v, 0) {
				t.Fatalf("non-positive or non-finite value %g in %+v", v, w)
			}
		}
		// C_d, I_e and h_sx are 0 when not given (docs/method.md §7).
		for _, v := range []float64{w.Drift.Cd, w.Drift.Ie, float64(w.Drift.StoreyHeight)} {
			if !(v >= 0) || math.IsInf(v, 0) {
				t.Fatalf("negative or non-finite drift setting %g in %+v", v, w)
			}
		}
		for _, lay := range w.Layouts {
			for _, o := range lay.Openings {
				for _, v := range []Length{o.Width, o.Height} {
					if !(v > 0) || math.IsInf(float64(v), 0) {
						t.Fatalf("opening size %g", float64(v))
					}
				}
			}
		}
		out, err := Marshal(w)
		if err != nil {
			t.Fatalf("Marshal of a parsed wall: %v", err)
		}
		back, err := Parse("fuzz.toml", out)
		if err != nil {
			t.Fatalf("Parse(Marshal(w)): %v\n%s", err, out)
		}
		if !reflect.DeepEqual(normal(w), normal(back)) {
			t.Fatalf("round trip changed the wall\n%+v\n%+v\n%s", w, back, out)
		}
	})
}

// FuzzScanTOML: the one line scanner behind the wall and storey files'
// line numbers, MarshalKeeping and IsStoreyFile gives one entry per line
// and, on any text the TOML decoder accepts, agrees with the decoder about
// which keys exist: every top-level key and every key of a table opened by
// a header has a line, and IsStoreyFile sees the top-level names the
// decoder sees.
func FuzzScanTOML(f *testing.F) {
	for _, name := range wallFiles(f) {
		data, err := os.ReadFile(name)
		if err != nil {
			f.Fatal(err)
		}
		f.Add(string(data))
	}
	for _, s := range []string{wallText, "a = \"\"\"\n[storey]\n\"\"\"\nb = [\n 1, # ]\n 2]\n[[wall]]\nfile = 'x'\n",
		"[storey]\nshear = 1\n[[wall]]\nfile = \"a.toml\"\n", "\"quoted.key\" = 1\ndotted.key = 2\n[t . 'u']\nk = { a = 1 }\n",
		"[[o]]\n[[o.p]]\nk = 2\n[[o]]\n[[o.p]]\nk = 3 # c\n", "x = '''\n'''\ny = \"\\\"#\" # c\n"} {
		f.Add(s)
	}
	f.Fuzz(func(t *testing.T, src string) {
		lines := ScanTOML(src)
		raw := strings.Split(src, "\n")
		if len(lines) != len(raw) {
			t.Fatalf("%d lines scanned, %d in the text", len(lines), len(raw))
		}
		headers := map[string]bool{}
		for i, l := range lines {
			if l.Num != i+1 || l.Text != raw[i] {
				t.Fatalf("line %d: %+v", i+1, l)
			}
			switch l.Kind {
			case LineKey:
				want := l.Table
				for _, s := range l.Segs {
					want = joinKey(want, s)
				}
				if len(l.Segs) == 0 || l.Path != want {
					t.Fatalf("line %d: key %+v", i+1, l)
				}
			case LineTable, LineArray:
				headers[stripIndices(l.Path)] = true
			}
		}
		var m map[string]any
		md, err := toml.Decode(src, &m)
		if err != nil {
			return
		}
		kl := KeyLines([]byte(src))
		plain := map[string]bool{}
		for k := range kl {
			plain[stripIndices(k)] = true
		}
		for _, k := range md.Keys() {
			parent := strings.Join(k[:len(k)-1], ".")
			if len(k) > 1 && !headers[parent] {
				continue // inside an inline table or below an implicit table
			}
			if !plain[strings.Join(k, ".")] && !strings.ContainsAny(strings.Join(k, ""), ".[]") {
				t.Fatalf("key %q has no line\n%s", k, src)
			}
		}
		_, st := m["storey"]
		_, wl := m["wall"]
		_, ln := m["length"]
		_, ht := m["height"]
		_, op := m["opening"]
		if want := (st || wl) && !ln && !ht && !op; IsStoreyFile([]byte(src)) != want {
			t.Fatalf("IsStoreyFile = %v, the decoder says %v\n%s", !want, want, src)
		}
	})
}
