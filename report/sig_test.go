package report

import "testing"

// Three significant figures, arithmetic by hand.
func TestSig(t *testing.T) {
	for _, c := range []struct {
		x    float64
		want string
	}{
		{6494.2, "6490"}, {0.47318, "0.473"}, {0.006929, "0.00693"}, {16.72, "16.7"}, {-2.164, "-2.16"},
		{999.7, "1000"}, {0.0999, "0.0999"}, {0.09996, "0.100"}, {630, "630"}, {12345678, "12300000"},
		{0, "0"}, {-0.0000001, "-1e-07"}, {3e-14, "0"}, {1, "1.00"}, {-0.0004999, "-0.000500"},
	} {
		if got := Sig(c.x); got != c.want {
			t.Errorf("Sig(%g) = %q, want %q", c.x, got, c.want)
		}
	}
	if got := SigPercent(0.3738); got != "37.4 %" {
		t.Errorf("SigPercent(0.3738) = %q", got)
	}
}
