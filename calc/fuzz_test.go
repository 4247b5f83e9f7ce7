package calc

import (
	"errors"
	"math"
	"strings"
	"testing"
	"time"
)

// FuzzParse feeds arbitrary bytes to the decoder, validation and run: no
// panic, no hang (each input must finish within 2 s), and either Problems
// or a result with finite numbers.
func FuzzParse(f *testing.F) {
	f.Add([]byte(base))
	f.Add([]byte("a: &x [1]\nb: *x\n"))
	f.Add([]byte("{\"title\": 1}"))
	f.Add([]byte(base + "design: {basis: en1997, approach: DA1}\nloads: {compression: {permanent: 500 kN}}\n"))
	f.Add([]byte(base + "methods: {shaft_undrained: lambda, critical_depth: 20}\n"))
	// Layer methods with the keys of the catalogues (an inline map in the
	// decoder).
	f.Add([]byte(strings.Replace(base, "friction_angle: 34 deg", "friction_angle: 34 deg\n      tip: {method: given-nq, nq: 40, nc: 5, limit: 8 MPa}\n      shaft: {method: beta, k0: ocr, delta: 30 deg, limit: 90 kPa}", 1)))
	f.Add([]byte(strings.Replace(base, "friction_angle: 34 deg", "friction_angle: 34 deg\n      tip: {method: janbu, eta: 80, eta: 90}\n      shaft: {method: beta, k: 1, k_over_kp: 0.2, nq: [1]}", 1)))
	f.Fuzz(func(t *testing.T, data []byte) {
		done := make(chan struct{})
		var r *Result
		var err error
		go func() {
			defer close(done)
			r, err = Parse(data)
		}()
		select {
		case <-done:
		case <-time.After(2 * time.Second):
			t.Fatalf("Parse did not finish in 2 s on %q", data)
		}
		if err != nil {
			var ps Problems
			if !errors.As(err, &ps) || len(ps) == 0 {
				t.Fatalf("error is not Problems: %T %v", err, err)
			}
			return
		}
		c := r.Breakdown.Capacity
		for _, v := range []float64{float64(c.Tip), float64(c.Shaft), float64(c.Compression), float64(c.Tension)} {
			if math.IsNaN(v) || math.IsInf(v, 0) {
				t.Fatalf("non-finite result %+v", c)
			}
		}
	})
}
