package bearing

import (
	"math"
	"strconv"
	"strings"

	"github.com/qultgeo/qult/cite"
	"github.com/qultgeo/qult/units"
)

// Method is a published rule for the tip: it has our own stable
// identifier (used in calc files and on the command line), a one-line
// equation and the sources it rests on.
type Method interface {
	// ID returns the stable identifier, such as "meyerhof".
	ID() string
	// Equation returns the rule on one line, such as "qp = q′·Nq*".
	Equation() string
	// Range returns the inputs the method accepts, on one line, such as
	// "φ′ 20 to 45 deg (chart); q′ ≥ 0".
	Range() string
	cite.Cited
}

// Tip is a method that gives the unit tip resistance for one Input.
// Tip allocates nothing when it succeeds.
type Tip interface {
	Method
	Tip(in Input) (Result, error)
}

// DefaultPa is the atmospheric pressure used when Input.Pa is zero:
// 100 kPa, the round value Das (2019) uses with Meyerhof's limit.
const DefaultPa = 100 * units.Kilopascal

// Input holds the soil state at the pile tip. Each method reads only the
// fields it needs and says which in its documentation; the zero value of
// an unused field is ignored.
type Input struct {
	Phi units.Angle  // φ′, effective friction angle
	C   units.Stress // c′, effective cohesion (drained methods add c′·Nc)
	Su  units.Stress // su, undrained shear strength (undrained methods)
	Q   units.Stress // q′ = σ′v, effective vertical stress at the tip

	// K0 is the coefficient of earth pressure at rest used by Vesic's
	// mean stress; 0 means Jaky's 1 − sinφ′.
	K0 float64
	// Ir is the rigidity index for Vesic's methods; 0 means compute it
	// from G: Ir = G/(c′ + q′·tanφ′) drained, Ir = G/su undrained.
	Ir float64
	// G is the shear modulus of the soil, used when Ir is 0.
	G units.Stress
	// Delta is the average volumetric strain Δ in the plastic zone
	// (Vesic). 0 means "not given": the drained Vesic methods then take Δ
	// from Vesic's correlation with φ′ and q′/pa (see VesicDelta) unless
	// the method is set to ignore volume change; the undrained method
	// takes Δ = 0 (no volume change at constant volume).
	Delta float64

	L units.Length // embedded length of the pile, for Berezantzev's L/D
	// D is the pile diameter or width at the tip: for Berezantzev's L/D,
	// and the base diameter B of the large-base reduction (LargeBase,
	// BoredSand); for a belled shaft give the diameter of the bell.
	D units.Length

	N60 float64 // SPT blow count corrected to 60 % energy, for drilled shafts in sand

	// Pa is the atmospheric pressure used to make stresses dimensionless:
	// in Meyerhof's limit 0.5·pa·Nq*·tanφ′, in the bored-pile rules built
	// on it, and in Vesic's Δ correlation (q′/pa). 0 means DefaultPa
	// (100 kPa); any value from 50 to 150 kPa is accepted, so a US file may
	// pass 2000 psf (95.76 kPa) or 2116 psf (101.3 kPa) as it chooses.
	Pa units.Stress

	// Clamp asks chart methods to read a φ′ or L/D outside the chart at
	// the chart's edge instead of returning an error. A clamped read sets
	// the Clamped flag in the Result.
	Clamp bool
}

// Result is the unit tip resistance by one method, with the values a
// reviewer needs to redo the arithmetic:
//
//	Unlimited = C·Nc + Sigma·Nq     (SPT methods: their own correlation)
//	Qp        = Unlimited with the method's Limit applied
//
// Most methods limit the whole of Qp; Meyerhof limits the friction term
// Sigma·Nq only, as Das presents it.
type Result struct {
	Nq    float64      // factor on Sigma: Nq, Nq*, Nσ* or, for SPT methods, 0
	Nc    float64      // factor on c′ (drained) or su (undrained); 0 if unused
	Sigma units.Stress // stress Nq multiplies: q′, or σ′o for Vesic
	C     units.Stress // strength Nc multiplies: c′ or su

	// Vesic's rigidity, as used (Vesic methods; zero otherwise):
	// Irr = Ir/(1 + Ir·Delta), with Delta obtained as DeltaBy says.
	Ir      float64
	Delta   float64
	DeltaBy DeltaBasis
	Irr     float64

	// Reduction is the factor an installation or size rule applied to the
	// tip resistance after the limit: 1/3 for bored piles by BoredPhi,
	// 1.27 m/B for a large base by LargeBase, or their product. 0 means no
	// such rule applied (a factor of 1).
	Reduction float64
	// Rule is the identifier of the rule a composite method chose (such as
	// "drilled-n60-sand" or "bored-phi" under BoredSand); "" otherwise.
	Rule string

	Unlimited units.Stress // unit tip resistance before any limit
	Limit     units.Stress // the method's limit; 0 means none
	Cap       units.Stress // a cap on Qp after any Reduction (bored-pile rules); 0 means none
	Qp        units.Stress // unit tip resistance after the limit, any Reduction and the Cap
	Flags     Flags        // warnings

	// Cone is what a direct CPT method averaged about the tip (the zero
	// value, Q = 0, for every other method): Unlimited = Cone.Factor·Cone.Q.
	Cone ConeAverage
}

// ConeAverage is the cone resistance a direct CPT method averaged over its
// zone about the tip, and the factor it applied.
type ConeAverage struct {
	Q           units.Stress // the averaged cone resistance (qca, (qc1 + qc2)/2, qEg)
	Factor      float64      // the factor on Q (kc, 1, Ct)
	Top, Bottom units.Length // the zone averaged
	// Below and Above are the means below and above the tip of a
	// minimum-path rule (qc1, qc2); 0 otherwise.
	Below, Above units.Stress
	// Raw is the mean before clipping of a rule that clips the readings
	// about it (LCPC: to 0.7…1.3 × Raw); 0 otherwise.
	Raw units.Stress
}

// Flags are warnings about a Result, as a small bitmask so that the hot
// path allocates nothing. Err turns them into an error where a breakdown
// wants one.
type Flags uint8

const (
	// Clamped: φ′ or L/D lay outside a chart and was read at its edge
	// because the caller set Input.Clamp.
	Clamped Flags = 1 << iota
	// LimitGoverns: the limiting tip resistance is less than the
	// unlimited value, so Qp is the limit.
	LimitGoverns
	// VolumeChangeIgnored: a drained Vesic tip used Irr = Ir (Δ = 0)
	// because the method was set to ignore volume change; the
	// correlation would have given a lower tip resistance.
	VolumeChangeIgnored
	// ReductionOff: a rule that lowers the tip resistance (the bored-pile
	// cap or the large-base reduction) was switched off by the caller
	// where it would have applied.
	ReductionOff
	// CapGoverns: the bored-pile cap is less than the reduced value, so Qp
	// is the cap.
	CapGoverns
)

var flagNames = [...]string{"clamped to chart edge", "limit governs",
	"volume change in the plastic zone ignored (Irr = Ir)", "a reducing rule was switched off", "cap governs"}

// String returns the warnings joined by "; ", or "" when there are none.
func (f Flags) String() string {
	var parts []string
	for i, name := range flagNames {
		if f&(1<<i) != 0 {
			parts = append(parts, name)
		}
	}
	return strings.Join(parts, "; ")
}

// Err returns the warnings as an error, or nil when there are none.
func (f Flags) Err() error {
	if f == 0 {
		return nil
	}
	return warning(f)
}

type warning Flags

func (w warning) Error() string { return "bearing: " + Flags(w).String() }

// RangeError reports an input outside the range a method accepts.
type RangeError struct {
	Method string // method identifier
	Field  string // input field, such as "phi"
	Value  string // the value given, with its unit
	Range  string // the accepted range, with its unit
}

func (e *RangeError) Error() string {
	return "bearing: " + e.Method + ": " + e.Field + ": " + e.Value + " is outside " + e.Range
}

func num(x float64) string { return strconv.FormatFloat(x, 'g', 6, 64) }

// rangeErr reports v outside lo to hi; rng says the accepted range in words.
// The value is written with enough digits to differ from the nearer limit.
func rangeErr(method, field string, v, lo, hi float64, unit, rng string) error {
	val := units.FormatNear(v, lo, hi)
	if unit != "" {
		val += " " + unit
	}
	return &RangeError{Method: method, Field: field, Value: val, Range: rng}
}

func finite(x float64) bool { return !math.IsNaN(x) && !math.IsInf(x, 0) }

// degEps absorbs the round-off of converting degrees to radians and back,
// so that a range edge such as 20 deg is inside the range.
const degEps = 1e-9

// checkPhi checks lo ≤ φ′ ≤ hi (degrees).
func checkPhi(id string, phi units.Angle, lo, hi float64) error {
	d := phi.Degrees()
	if !finite(d) || d < lo-degEps || d > hi+degEps {
		return rangeErr(id, "phi", d, lo, hi, "deg", num(lo)+" to "+num(hi)+" deg")
	}
	return nil
}

// checkStress checks 0 ≤ s ≤ 1 GPa; the upper bound only catches garbage.
func checkStress(id, field string, s units.Stress) error {
	k := s.KPa()
	if !finite(k) || k < 0 || k > 1e6 {
		return rangeErr(id, field, k, 0, 1e6, "kPa", "0 to 1e+06 kPa")
	}
	return nil
}

// finish fills Qp and the limit flag.
func finish(r Result) Result {
	r.Qp = r.Unlimited
	if r.Limit > 0 && r.Unlimited > r.Limit {
		r.Qp = r.Limit
		r.Flags |= LimitGoverns
	}
	return r
}

// cohesionTerm returns Nc = (Nq − 1)·cotφ′, the drained cohesion factor by
// the theorem of corresponding states, with its limit at φ′ → 0 given by
// nc0 (for φ′ below 1e-9 rad, where the quotient loses precision).
func cohesionTerm(nq float64, phi units.Angle, nc0 float64) float64 {
	if phi < 1e-9 {
		return nc0
	}
	return (nq - 1) / phi.Tan()
}
