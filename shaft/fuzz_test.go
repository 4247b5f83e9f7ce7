package shaft

import (
	"math"
	"testing"

	"github.com/qultgeo/qult/units"
)

// fuzzMethods returns every point method, with parameters taken from q.
func fuzzMethods(q float64) []Unit {
	return []Unit{
		Beta{K: KGiven{K: q}, Delta: DeltaGiven{Delta: units.Angle(q) * units.Degree}},
		Beta{K: KJaky{}, Delta: DeltaOverPhi{Ratio: q}},
		Beta{K: KMayneKulhawy{}, Delta: DeltaOverPhi{Ratio: 1}},
		Beta{K: KOverK0{Ratio: q}, Delta: DeltaOverPhi{Ratio: 0.8}},
		Beta{K: KOverKp{Ratio: q}, Delta: DeltaOverPhi{Ratio: 0.8}},
		BetaGiven{Beta: q},
		Burland{},
		DrilledSand{},
		DrilledSandK0{},
		DrivenN60{},
		DrivenN60{Low: q > 0},
		APIBeta{Class: SandClass(int(math.Abs(math.Mod(q, 6))))},
		AlphaAPI{},
		AlphaChart{},
		AlphaChart{Extrapolate: true},
		AlphaDrilled{},
		AlphaGiven{Alpha: q},
		Capped{Method: AlphaAPI{}, Limit: LimitGiven{Fs: units.Stress(q) * kPa}},
		Capped{Method: BetaGiven{Beta: 0.3}, Limit: LimitAPI{Class: SandClass(int(math.Abs(math.Mod(q, 6))))}},
	}
}

func finite(v ...float64) bool {
	for _, x := range v {
		if math.IsNaN(x) || math.IsInf(x, 0) {
			return false
		}
	}
	return true
}

// FuzzUnitShaft runs every method on arbitrary input: no panic, and no NaN,
// Inf or negative fs returned without an error.
func FuzzUnitShaft(f *testing.F) {
	// Seeds: ordinary values (σ′v, z, φ′, OCR, su in kPa, D, N60, pa in kPa,
	// parameter), edges and non-numbers. Numbers are invented for coverage (no published source).
	f.Add(100.0, 10.0, 32.0, 1.0, 50.0, 0.6, 20.0, 0.0, 0.8)
	f.Add(0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0)
	f.Add(1e-300, 300.0, 50.0, 100.0, 5000.0, 10.0, 100.0, 120.0, 3.0)
	f.Add(math.NaN(), math.Inf(1), -1.0, math.Inf(-1), -5.0, math.NaN(), 14.9, 79.0, math.NaN())
	f.Add(20000.0, 1e9, 1e-9, 1.0, 1e-9, 1e-9, 1e-9, 100.0, 1.0)
	f.Fuzz(func(t *testing.T, sv, z, phi, ocr, su, dia, n60, pa, q float64) {
		p := Point{SigmaV: units.Stress(sv) * kPa, Depth: units.Length(z), Phi: units.Angle(phi) * units.Degree,
			OCR: ocr, Su: units.Stress(su) * kPa, Diameter: units.Length(dia), N60: n60, Pa: units.Stress(pa) * kPa}
		for _, m := range fuzzMethods(q) {
			r, err := m.Unit(p)
			if err != nil {
				continue
			}
			if !finite(float64(r.Fs), float64(r.Unlimited), float64(r.SigmaV), r.K, r.K0, r.Kp, r.KRatio,
				float64(r.Delta), r.DeltaRatio, r.Beta, r.Alpha, r.Psi, r.SuPa) || r.Fs < 0 || r.Fs > r.Unlimited {
				t.Fatalf("%s at %+v: %+v", m.ID(), p, r)
			}
		}
		lr, err := Lambda{Extrapolate: q > 0}.Average(units.Length(z), units.Stress(sv)*kPa, units.Stress(su)*kPa)
		if err == nil && (!finite(float64(lr.Fav), float64(lr.Unlimited), lr.Lambda, lr.Alpha) || lr.Fav < 0 || lr.Fav > lr.Su) {
			t.Fatalf("lambda: %+v", lr)
		}
		lg, err := LambdaGiven{Lambda: q, NoCap: ocr > 1}.Average(units.Length(z), units.Stress(sv)*kPa, units.Stress(su)*kPa)
		if err == nil && (!finite(float64(lg.Fav), lg.Alpha) || lg.Fav < 0 || (lg.Flags&LambdaCapOff == 0 && lg.Fav > lg.Su)) {
			t.Fatalf("lambda given: %+v", lg)
		}
		pieces := [2]LambdaPiece{
			{Thickness: units.Length(dia), SigmaTop: units.Stress(pa) * kPa, SigmaBottom: units.Stress(sv) * kPa, SuTop: units.Stress(n60) * kPa, SuBottom: units.Stress(su) * kPa},
			{Thickness: units.Length(q), SigmaTop: units.Stress(sv) * kPa, SigmaBottom: units.Stress(sv) * kPa, SuTop: units.Stress(su) * kPa, SuBottom: units.Stress(su) * kPa},
		}
		ly, err := Lambda{Extrapolate: true}.Layered(units.Length(z), pieces[:])
		if err == nil && (!finite(float64(ly.Fav), float64(ly.Integral), float64(ly.SigmaV), float64(ly.Su)) || ly.Fav < 0 || ly.Fav > ly.Su ||
			ly.Pieces > units.Length(z)*(1+1e-12)) {
			t.Fatalf("lambda layered: %+v", ly)
		}
		tr, err := TensionPoisson{}.Tension(TensionInput{Slenderness: z, PilePoisson: ocr, ShearModulusRatio: q, Delta: units.Angle(phi) * units.Degree})
		if err == nil && (!finite(tr.Ratio, tr.Eta) || tr.Ratio <= 0 || tr.Ratio > 1) {
			t.Fatalf("tension: %+v", tr)
		}
		if from, to, ok, err := (AlphaDrilled{}).NoSide().Span(units.Length(z), units.Length(sv), units.Length(dia)); err == nil &&
			(!finite(float64(from), float64(to)) || (ok && !(from < to))) {
			t.Fatalf("no-side span: %v %v %v", from, to, ok)
		}
		zc, err := CriticalDepth{Ratio: q}.Depth(units.Length(dia))
		if err == nil && (!finite(float64(zc)) || zc < 0) {
			t.Fatalf("critical depth: %v", zc)
		}
	})
}
