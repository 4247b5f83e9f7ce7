package units

import "testing"

// TestFormatApart: a value past a range limit is written with the digits
// that distinguish it from the limit (closed form: the expected strings are
// the decimal expansions of the inputs).
func TestFormatApart(t *testing.T) {
	tenth, fifth := 0.1, 0.2 // variables, so the sum is rounded as at run time
	cases := []struct {
		x, bound float64
		want     string
	}{
		{20000.000000004, 20000, "20000.000000004"},
		{62, 50, "62"},
		{50, 50, "50"},
		{tenth + fifth, 0.3, "0.30000000000000004"},
		{-1e-300, 0, "-1e-300"},
		{1234567, 1234568, "1234567"},
	}
	for _, c := range cases {
		if got := FormatApart(c.x, c.bound); got != c.want {
			t.Errorf("FormatApart(%v, %v) = %q, want %q", c.x, c.bound, got, c.want)
		}
	}
	if got := FormatNear(20000.000000004, 0, 20000); got != "20000.000000004" {
		t.Errorf("FormatNear = %q", got)
	}
}
