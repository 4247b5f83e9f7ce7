package main

// Sources: the calc file is examples/warehouse-driven-settle.yaml (a
// scenario of our own, invented numbers); goldens hold the command's own
// output and check only that it stays the same (refresh with -update
// after a deliberate change and review the diff).

import (
	"os"
	"strings"
	"testing"
)

const settleFile = "warehouse-driven-settle"

// TestGoldenSettle runs settle in every format on the settlement example,
// and check and report on it (the serviceability summary and sections).
func TestGoldenSettle(t *testing.T) {
	for _, format := range []string{"text", "json", "csv", "md", "html"} {
		r := runQ(t, slow, "", "settle", "--format", format, examplePath(settleFile))
		if r.code != 0 {
			t.Fatalf("settle --format %s: exit %d; stderr:\n%s", format, r.code, r.stderr)
		}
		if !strings.Contains(r.stdout, "qualified") && !strings.Contains(r.stdout, "For qualified engineers") {
			t.Errorf("settle --format %s: no cautions", format)
		}
		golden(t, "settle/"+settleFile+"."+extOf[format], []byte(r.stdout))
	}
	r := runQ(t, slow, "", "settle", "--units", "US", examplePath(settleFile))
	if r.code != 0 {
		t.Fatalf("settle --units US: exit %d", r.code)
	}
	golden(t, "settle/"+settleFile+"-us.txt", []byte(r.stdout))
	for _, verb := range []string{"check", "report"} {
		r := runQ(t, slow, "", verb, examplePath(settleFile))
		if r.code != 0 {
			t.Fatalf("%s: exit %d; stderr:\n%s", verb, r.code, r.stderr)
		}
		golden(t, "settle/"+verb+".txt", []byte(r.stdout))
	}
}

// TestSettleExitCodes: a settlement above the allowable, or a load the
// pile cannot carry, is exit 1 for settle and for check; a file without a
// settlement or load_test section is a usage error for settle.
func TestSettleExitCodes(t *testing.T) {
	data, err := os.ReadFile(examplePath(settleFile))
	if err != nil {
		t.Fatal(err)
	}
	src := string(data)
	for _, c := range []struct {
		name, old, new string
		want           string
	}{
		{"above the allowable", "allowable: 15 mm", "allowable: 1 mm", "FAIL: 2.298 mm > 1 mm"},
		{"plunges", "allowable: 15 mm", "allowable: 15 mm\n  load: 4000 kN", "plunges at"},
	} {
		in := strings.Replace(src, c.old, c.new, 1)
		for _, verb := range []string{"settle", "check"} {
			r := runQ(t, slow, in, verb, "-")
			if r.code != 1 || !strings.Contains(r.stdout, c.want) {
				t.Errorf("%s, %s: exit %d (want 1), output has %q: %v", c.name, verb, r.code, c.want, strings.Contains(r.stdout, c.want))
			}
		}
	}
	r := runQ(t, slow, "", "settle", examplePath("pump-station-bored"))
	if r.code != 2 || !strings.Contains(r.stderr, "settlement: not given") {
		t.Errorf("settle without a settlement section: exit %d, stderr %q", r.code, r.stderr)
	}
}
