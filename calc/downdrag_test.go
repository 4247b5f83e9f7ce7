package calc

// Sources of the expected values: closed forms worked by hand here.
// Fellenius (2004), Unified design of piled foundations with emphasis on
// settlement analysis, ASCE GSP 125: the neutral plane is where the load
// from the head plus negative skin friction equals the toe resistance
// plus the positive shaft resistance below; with fs uniform,
// Qd + p·fs·z = Rt + p·fs·(L − z), so z = (L + (Rt − Qd)/(p·fs))/2.
// Skempton (1951): Qp = 9·su·A. The β method given, fs = β·σ′v, with a
// surcharge q: ∫ fs dz = β·(q·L + γ′L²/2) below the water table at the
// surface. The ground and pile are invented.

import (
	"math"
	"strings"
	"testing"
)

const downdragFile = `title: one soft clay layer
units: SI
ground:
  water_depth: 0 m
  layers:
    - name: soft clay
      thickness: 30 m
      drainage: undrained
      saturated_unit_weight: 18 kN/m3
      undrained_strength: 50 kPa
      shaft: {method: alpha-given, alpha: 0.5}
pile:
  section: {shape: circle, diameter: 500 mm}
  length: 15 m
  installation: driven-high
  youngs_modulus: 30 GPa
methods: {tip_undrained: nc9}
design: {basis: safety-factor, factor: 2.5}
loads:
  compression: {permanent: 300 kN, variable: 100 kN}
downdrag:
  surcharge: 20 kPa
  tip_force: 50 kN
  ground_settlement:
    - {depth: 0 m, settlement: 100 mm}
    - {depth: 15 m, settlement: 0 mm}
`

// TestDowndragClosedForm: the calc file reaches the unified method with
// the pile analysis' own fs (α·su = 25 kPa, not changed by the surcharge:
// a total-stress method), and the design check counts no shaft resistance
// above the neutral plane.
func TestDowndragClosedForm(t *testing.T) {
	r, err := Parse([]byte(downdragFile))
	if err != nil {
		t.Fatal(err)
	}
	d := r.Downdrag
	if d == nil {
		t.Fatal("no downdrag result")
	}
	const L, qd, rt, fs = 15.0, 300e3, 50e3, 0.5 * 50e3
	p := math.Pi * 0.5
	z := (L + (rt-qd)/(p*fs)) / 2
	qn := p * fs * z
	for _, c := range []struct {
		name      string
		got, want float64
	}{
		{"neutral plane", float64(d.NeutralPlane), z},
		{"drag load", float64(d.DragLoad), qn},
		{"largest force", float64(d.MaxForce), qd + qn},
		{"shaft below", float64(d.ShaftBelow), p * fs * (L - z)},
	} {
		if math.Abs(c.got-c.want) > 1e-6*math.Abs(c.want) {
			t.Errorf("%s = %.6g, want %.6g", c.name, c.got, c.want)
		}
	}
	if len(d.Cases) != 1 {
		t.Fatalf("cases = %d, want 1", len(d.Cases))
	}
	qp := 9 * 50e3 * math.Pi * 0.25 * 0.25
	cs := d.Cases[0]
	if want := (p*fs*(L-z) + qp) / 2.5; math.Abs(float64(cs.Rd)-want) > 1e-6*want {
		t.Errorf("Rd = %.6g N, want %.6g N (no shaft above the neutral plane)", float64(cs.Rd), want)
	}
	if want := qd + 100e3 + qn; math.Abs(float64(cs.Ed)-want) > 1e-6*want {
		t.Errorf("Ed = %.6g N, want G + Q + Qn = %.6g N", float64(cs.Ed), want)
	}
	if cs.Pass != (cs.Ed <= cs.Rd) || d.Pass != cs.Pass || r.DowndragPass() != cs.Pass {
		t.Errorf("pass = %v (case %v, result %v) with Ed %v and Rd %v", r.DowndragPass(), cs.Pass, d.Pass, cs.Ed, cs.Rd)
	}
}

// TestDowndragLongTermStress: in an effective-stress method the unit shaft
// resistance is that of the ground after the loads: β·(q + γ′z).
func TestDowndragLongTermStress(t *testing.T) {
	src := strings.Replace(downdragFile, "      shaft: {method: alpha-given, alpha: 0.5}\n", "      shaft: {method: beta-given, beta: 0.3}\n", 1)
	r, err := Parse([]byte(src))
	if err != nil {
		t.Fatal(err)
	}
	const L, beta, q = 15.0, 0.3, 20e3
	gp := 18e3 - 9.81e3
	want := math.Pi * 0.5 * beta * (q*L + gp*L*L/2)
	if got := float64(r.Downdrag.ShaftTotal); math.Abs(got-want) > 1e-6*want {
		t.Errorf("shaft after the surcharge = %.6g N, want %.6g N", got, want)
	}
	// The ordinary capacity stays that of the ground before the loads.
	if want0 := math.Pi * 0.5 * beta * gp * L * L / 2; math.Abs(float64(r.Breakdown.Shaft)-want0) > 1e-6*want0 {
		t.Errorf("shaft before = %.6g N, want %.6g N", float64(r.Breakdown.Shaft), want0)
	}
}

// TestSurchargeTimingWarning: a ground surcharge without a downdrag
// section says that it is counted as in place before installation.
func TestSurchargeTimingWarning(t *testing.T) {
	i := strings.Index(downdragFile, "downdrag:")
	plain := strings.Replace(downdragFile[:i], "  water_depth: 0 m\n", "  water_depth: 0 m\n  surcharge: 20 kPa\n", 1)
	for _, c := range []struct {
		src  string
		want bool
	}{{plain, true}, {downdragFile, false}, {downdragFile[:i], false}} {
		r, err := Parse([]byte(c.src))
		if err != nil {
			t.Fatal(err)
		}
		got := false
		for _, w := range r.Warnings {
			if strings.Contains(w, "ground.surcharge is counted as in place before the pile is installed") {
				got = true
			}
		}
		if got != c.want {
			t.Errorf("warning given = %v, want %v (warnings %q)", got, c.want, r.Warnings)
		}
	}
}

// TestDowndragLoadFactorByMethod: under lrfd the drag load factor follows
// the installation and the shaft method above the neutral plane (the
// AASHTO LRFD Table 3.4.1-2 values as qult takes them, from memory: 1.4
// α method, 1.05 λ method, 1.25 drilled shafts); a given factor wins.
func TestDowndragLoadFactorByMethod(t *testing.T) {
	lrfd := "design: {basis: lrfd, tip: {nc9: 0.4}, shaft: {alpha-given: 0.35, lambda: 0.35}, uplift: {alpha-given: 0.25, lambda: 0.25}, permanent: 1.25, variable: 1.75}"
	base := strings.Replace(downdragFile, "design: {basis: safety-factor, factor: 2.5}", lrfd, 1)
	lambda := strings.Replace(strings.Replace(base, "      shaft: {method: alpha-given, alpha: 0.5}\n", "", 1), "methods: {tip_undrained: nc9}", "methods: {tip_undrained: nc9, shaft_undrained: lambda}", 1)
	for _, c := range []struct {
		name, src string
		want      float64
	}{
		{"driven, α", base, 1.4},
		{"bored, α", strings.Replace(base, "installation: driven-high", "installation: bored", 1), 1.25},
		{"driven, λ", lambda, 1.05},
		{"given", strings.Replace(base, "  tip_force: 50 kN\n", "  tip_force: 50 kN\n  drag_load_factor: 1.1\n", 1), 1.1},
	} {
		r, err := Parse([]byte(c.src))
		if err != nil {
			t.Fatalf("%s: %v", c.name, err)
		}
		if cs := r.Downdrag.Cases; len(cs) != 1 || cs[0].DragFactor != c.want {
			t.Errorf("%s: drag load factor %v, want %v", c.name, cs, c.want)
		}
	}
}
