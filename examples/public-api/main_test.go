package main

// Sources: none needed; the test checks that the public API runs end to end
// and that its numbers agree with each other (closed form: the report's
// capacity equals the library's at the same tip, Rc = Qp + Qs).

import (
	"bytes"
	"strings"
	"testing"
)

func TestPublicAPI(t *testing.T) {
	var out bytes.Buffer
	if err := run(&out); err != nil {
		t.Fatal(err)
	}
	s := out.String()
	for _, want := range []string{"tip (m)  Qp (kN)", "required length", "Public API tour", "Characteristic capacity", "qualified"} {
		if !strings.Contains(s, want) {
			t.Errorf("output lacks %q:\n%s", want, s)
		}
	}
	// The 20 m row of capacity with depth and the report of the 20 m pile
	// agree on Rc.
	var rc20 string
	for _, l := range strings.Split(s, "\n") {
		f := strings.Fields(l)
		if len(f) == 4 && f[0] == "20" {
			rc20 = f[3]
		}
	}
	if rc20 == "" || !strings.Contains(s, "Compression Rc") {
		t.Fatalf("no 20 m row or no Rc in the report:\n%s", s)
	}
	for _, l := range strings.Split(s, "\n") {
		if strings.Contains(l, "Compression Rc") && !strings.Contains(l, rc20) {
			t.Errorf("report line %q does not show the 20 m row's Rc %s kN", l, rc20)
		}
	}
}
