package insitu

import (
	"fmt"
	"math"

	"github.com/qultgeo/qult/cite"
	"github.com/qultgeo/qult/units"
)

// SPTFlag records a default or a limit applied in correcting one test.
type SPTFlag uint8

const (
	// FlagEnergyAssumed: the energy ratio was not recorded and
	// SPTOptions.EnergyRatio was used.
	FlagEnergyAssumed SPTFlag = 1 << iota
	// FlagRodFromDepth: the rod length was not recorded and was taken as
	// the test depth plus SPTOptions.RodStickUp.
	FlagRodFromDepth
	// FlagBoreholeAssumed: the borehole diameter was not recorded and CB
	// was taken as 1.0 (a 65 to 115 mm hole).
	FlagBoreholeAssumed
	// FlagCNLimited: CN from Liao & Whitman exceeded SPTOptions.CNMax and
	// was limited to it.
	FlagCNLimited
)

// SPTOptions are the defaults and limits of CorrectSPT. A nil *SPTOptions
// means DefaultSPTOptions.
type SPTOptions struct {
	// EnergyRatio (percent) used where a test's energy ratio is not
	// recorded. Zero means such a test is an error.
	EnergyRatio float64
	// RodStickUp is added to the test depth for the rod length where it is
	// not recorded (rod above ground to the anvil). Negative means such a
	// test is an error.
	RodStickUp units.Length
	// CNMax limits the overburden factor CN (shallow tests). Zero means no
	// limit.
	CNMax float64
	// ReferencePressure is pa in CN = (pa/σ′v)^0.5. Zero means 100 kPa;
	// Liao & Whitman wrote the rule with σ′v in tons per square foot, that
	// is pa = 1 tsf = 95.76 kPa (units.TSF).
	ReferencePressure units.Stress
}

// DefaultSPTOptions: an unrecorded energy ratio is an error (the factor
// ER/60 ranges from about 0.75 to 1.6 between hammers and cannot be guessed
// safely); an unrecorded rod length is the depth plus 1.0 m of rod above
// ground (common practice; shorter rods give a smaller CR, so a short
// stick-up errs low); CN ≤ 1.7 (from memory: the limit recommended by
// Youd et al. 2001; it lowers (N1)60 near the surface).
var DefaultSPTOptions = SPTOptions{EnergyRatio: 0, RodStickUp: 1 * units.Metre, CNMax: 1.7}

// CorrectedSPT is one test with its corrections.
type CorrectedSPT struct {
	Test      SPT
	RodLength units.Length // as used
	SigmaVEff units.Stress // σ′v at the test depth
	CE        float64      // ER/60
	CB        float64      // borehole diameter
	CS        float64      // sampler
	CR        float64      // rod length
	CN        float64      // overburden, after any limit
	N60       float64      // N·CE·CB·CS·CR
	N160      float64      // CN·N60
	Flags     SPTFlag
}

// SPTRefs are the sources of CorrectSPT.
func SPTRefs() []cite.Ref {
	return []cite.Ref{
		{Source: cite.Skempton1986, Where: "corrections CE, CB, CS, CR"},
		{Source: cite.ENV1997Part3, Where: "5.5.2(2)P: N·ER constant, N60 = N·ER/60"},
		{Source: cite.ISRNCE2012, Where: "Table 1 (values of CB, CS, CR read)"},
		{Source: cite.LiaoWhitman1986, Where: "CN = (pa/σ′v)^0.5"},
		{Source: cite.FHWAGEC5, Where: "SPT corrections"},
	}
}

// BoreholeFactor returns CB for a borehole diameter d (Skempton 1986;
// values as tabulated in ISRN Civil Engineering 2012, article 346439,
// Table 1, read): 60 to 120 mm 1.00, 150 mm 1.05, 200 mm 1.15. Between the
// tabulated diameters the larger factor applies from just above 120 mm and
// 150 mm (a step, our choice; it never lowers N60 below the nearer
// tabulated value's). Diameters outside 60 to 200 mm are an error.
func BoreholeFactor(d units.Length) (float64, error) {
	mm := d.Millimetres()
	switch {
	case !(mm >= 60 && mm <= 200):
		return 0, fmt.Errorf("insitu: borehole diameter %g mm is outside 60 to 200 mm", mm)
	case mm <= 120:
		return 1.0, nil
	case mm <= 150:
		return 1.05, nil
	default:
		return 1.15, nil
	}
}

// RodFactor returns CR for a rod length L (same table): L ≥ 10 m 1.0;
// 6 ≤ L < 10 m 0.95; 4 ≤ L < 6 m 0.85; L < 4 m 0.75. L must be positive.
func RodFactor(l units.Length) (float64, error) {
	m := l.Metres()
	switch {
	case !(m > 0) || math.IsInf(m, 0):
		return 0, fmt.Errorf("insitu: rod length %g m must be positive", m)
	case m >= 10:
		return 1.0, nil
	case m >= 6:
		return 0.95, nil
	case m >= 4:
		return 0.85, nil
	default:
		return 0.75, nil
	}
}

// SamplerFactor returns CS (same table): without liner 1.00; with liner in
// dense sand or clay 0.80; with liner in loose sand 0.90.
func SamplerFactor(s Sampler) (float64, error) {
	switch s {
	case SamplerNoLiner:
		return 1.0, nil
	case SamplerLinerDense:
		return 0.8, nil
	case SamplerLinerLoose:
		return 0.9, nil
	}
	return 0, fmt.Errorf("insitu: sampler %d is not a known sampler", int(s))
}

// OverburdenFactor returns Liao & Whitman's (1986) CN = (pa/σ′v)^0.5.
// σ′v and pa must be positive; pa is commonly 100 kPa (ReferencePressure)
// or 1 tsf (units.TSF, 95.76 kPa). Read: a published worked answer
// (University of Nairobi question 14976980) computing CN = √(95.76/σ′v);
// Hatanaka & Uchida (1996, abstract) normalise N to 98 kPa by the same
// rule. Liao & Whitman's paper itself was not reached.
func OverburdenFactor(sigmaVEff, pa units.Stress) (float64, error) {
	if !(sigmaVEff > 0) || math.IsInf(float64(sigmaVEff), 0) {
		return 0, fmt.Errorf("insitu: σ′v %g kPa must be positive", sigmaVEff.KPa())
	}
	if !(pa > 0) || math.IsInf(float64(pa), 0) {
		return 0, fmt.Errorf("insitu: reference pressure %g kPa must be positive", pa.KPa())
	}
	return math.Sqrt(float64(pa / sigmaVEff)), nil
}

// CorrectSPT corrects each test:
//
//	N60    = N · (ER/60) · CB · CS · CR       (Skempton 1986)
//	(N1)60 = CN · N60,  CN = (pa/σ′v)^0.5      (Liao & Whitman 1986), CN ≤ CNMax
//
// The energy factor ER/60 was read in ENV 1997-3:1999, 5.5.2(2)P and (4)P:
// in sands N is inversely proportional to the energy ratio
// (Na·ERa = Nb·ERb) and N is adjusted to the reference ratio of 60 %. CB,
// CS and CR are the tabulated values read (see BoreholeFactor); Skempton
// (1986) himself was not reached.
//
// σ′v comes from stresses at the test depth. Defaults taken for values not
// recorded are flagged on each result; see SPTOptions.
func CorrectSPT(tests []SPT, stresses Stresses, opt *SPTOptions) ([]CorrectedSPT, error) {
	if opt == nil {
		opt = &DefaultSPTOptions
	}
	out := make([]CorrectedSPT, 0, len(tests))
	for i, t := range tests {
		c := CorrectedSPT{Test: t}
		where := func(field string) string {
			return fmt.Sprintf("spt[%d] (%s, %g m).%s", i, t.Location, t.Depth.Metres(), field)
		}
		if !(t.N >= 0) || math.IsInf(t.N, 0) {
			return nil, fmt.Errorf("insitu: %s: %g is not a blow count ≥ 0", where("n"), t.N)
		}
		if !(t.Depth >= 0) || math.IsInf(float64(t.Depth), 0) {
			return nil, fmt.Errorf("insitu: %s: %g m is not a depth ≥ 0", where("depth"), t.Depth.Metres())
		}
		er := t.EnergyRatio
		if er == 0 {
			if opt.EnergyRatio == 0 {
				return nil, fmt.Errorf("insitu: %s: not recorded and no default given (typically 45 to 100 %%)", where("energy_ratio"))
			}
			er = opt.EnergyRatio
			c.Flags |= FlagEnergyAssumed
		}
		if !(er > 0 && er <= 100) {
			return nil, fmt.Errorf("insitu: %s: %g %% is outside 0 (exclusive) to 100 %%", where("energy_ratio"), er)
		}
		c.CE = er / 60
		var err error
		if t.Borehole == 0 {
			c.CB = 1
			c.Flags |= FlagBoreholeAssumed
		} else if c.CB, err = BoreholeFactor(t.Borehole); err != nil {
			return nil, fmt.Errorf("%s: %w", where("borehole"), err)
		}
		if c.CS, err = SamplerFactor(t.Sampler); err != nil {
			return nil, fmt.Errorf("%s: %w", where("sampler"), err)
		}
		c.RodLength = t.RodLength
		if c.RodLength == 0 {
			if opt.RodStickUp < 0 {
				return nil, fmt.Errorf("insitu: %s: not recorded and no stick-up given", where("rod_length"))
			}
			c.RodLength = t.Depth + opt.RodStickUp
			c.Flags |= FlagRodFromDepth
		}
		if c.CR, err = RodFactor(c.RodLength); err != nil {
			return nil, fmt.Errorf("%s: %w", where("rod_length"), err)
		}
		c.N60 = t.N * c.CE * c.CB * c.CS * c.CR
		sv, u0 := stresses(t.Depth)
		c.SigmaVEff = sv - u0
		pa := opt.ReferencePressure
		if pa == 0 {
			pa = ReferencePressure
		}
		if c.CN, err = OverburdenFactor(c.SigmaVEff, pa); err != nil {
			return nil, fmt.Errorf("%s: %w", where("stresses"), err)
		}
		if opt.CNMax > 0 && c.CN > opt.CNMax {
			c.CN = opt.CNMax
			c.Flags |= FlagCNLimited
		}
		c.N160 = c.CN * c.N60
		out = append(out, c)
	}
	return out, nil
}
