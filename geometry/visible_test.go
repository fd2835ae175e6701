package geometry

import "testing"

func TestVisible(t *testing.T) {
	for _, c := range []struct{ in, want string }{
		{"Rear wall, grid 4", "Rear wall, grid 4"},
		{"façade – 3 m²", "façade – 3 m²"},
		{"\x1b]0;owned\a\x1b[2J", `\x1b]0;owned\a\x1b[2J`},
		{"a\x00b", `a\x00b`},
		{"line\nnext\tx", `line\nnext\tx`},
		{"\xff\xfe", `\xff\xfe`},
		{"\u009b31m", `\x9b31m`},
		{"abc\u202edef", `abc\u202edef`},
		{"del\x7f", `del\x7f`},
	} {
		if got := Visible(c.in); got != c.want {
			t.Errorf("Visible(%q) = %q, want %q", c.in, got, c.want)
		}
	}
	if got := VisibleLines("a\x1b\nb"); got != "a\\x1b\nb" {
		t.Errorf("VisibleLines = %q", got)
	}
}

func FuzzVisible(f *testing.F) {
	f.Add("\x1b[2J title")
	f.Add("plain")
	f.Fuzz(func(t *testing.T, s string) {
		v := Visible(s)
		for _, r := range v {
			if needsEscape(r) {
				t.Fatalf("Visible(%q) = %q keeps %U", s, v, r)
			}
		}
		if Visible(v) != v {
			t.Fatalf("Visible is not idempotent on %q", s)
		}
	})
}
