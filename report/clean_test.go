package report

import "testing"

// TestCleanText: control and bidirectional formatting characters from a
// calc file never reach a terminal (the code points are those of the
// Unicode Standard's Bidi_Control property and the C0/C1 control ranges).
func TestCleanText(t *testing.T) {
	cases := []struct{ in, want string }{
		{"dense sand", "dense sand"},
		{"line one\nline two\tcol", "line one\nline two\tcol"},
		{"clay\x1b[31m red", "clay\uFFFD[31m red"},
		{"fill\u202Ednas", "fill\uFFFDdnas"},
		{"a\u2066b\u2069c\u200Fd\u061Ce", "a\uFFFDb\uFFFDc\uFFFDd\uFFFDe"},
		{"bell\x07 del\x7f c1\u0085", "bell\uFFFD del\uFFFD c1\uFFFD"},
		{"cr\rhere", "cr\uFFFDhere"},
		{"bad \xff utf8", "bad \uFFFD utf8"},
		{"σ′v φ′ — ok", "σ′v φ′ — ok"},
	}
	for _, c := range cases {
		if got := CleanText(c.in); got != c.want {
			t.Errorf("CleanText(%q) = %q, want %q", c.in, got, c.want)
		}
	}
}
