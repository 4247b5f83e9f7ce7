package shaft

import (
	"math"
	"strconv"
	"strings"

	"github.com/qultgeo/qult/cite"
	"github.com/qultgeo/qult/units"
)

// Method is a published rule (or a value the engineer gives) for unit
// shaft resistance, or for one factor inside it.
type Method interface {
	// ID returns our stable identifier, used in calc files and on the
	// command line, such as "beta" or "alpha-api".
	ID() string
	// Equation returns the rule on one line, such as "fs = α·su".
	Equation() string
	// Valid returns the accepted range of the inputs the rule reads.
	Valid() string
	// Refs returns the published sources the rule rests on.
	Refs() []cite.Ref
}

// Unit is a method that gives the unit shaft resistance at one point of a
// pile. Unit allocates nothing when it succeeds.
type Unit interface {
	Method
	Unit(p Point) (Result, error)
}

// Point holds the soil state at one depth beside the shaft. Each method reads
// only the fields it needs and checks only those; the others may be zero.
type Point struct {
	SigmaV   units.Stress // σ′v, vertical effective stress, 0 to 20 MPa
	Depth    units.Length // z, depth below ground level, 0 to 300 m
	Phi      units.Angle  // φ′, effective friction angle, above 0° and at most 50°
	OCR      float64      // overconsolidation ratio, 1 to 100; 0 means 1 (normally consolidated)
	Su       units.Stress // su, undrained shear strength, above 0 and at most 5 MPa
	Diameter units.Length // D, pile diameter, above 0 and at most 10 m (critical depth only)
	N60      float64      // SPT blow count corrected to 60 % energy, above 0 and at most 100
	Pa       units.Stress // pa, atmospheric pressure; 0 means 100 kPa; else 80 to 120 kPa
}

// ocr returns the OCR with 0 read as 1.
func (p Point) ocr() float64 {
	if p.OCR == 0 {
		return 1
	}
	return p.OCR
}

// DefaultPa is the atmospheric pressure used when Point.Pa is zero: 100 kPa,
// the round value used with the α tabulation and the drilled-shaft α.
const DefaultPa = 100 * units.Kilopascal

// pa returns the atmospheric pressure with 0 read as DefaultPa.
func (p Point) pa() units.Stress {
	if p.Pa == 0 {
		return DefaultPa
	}
	return p.Pa
}

// Result is the unit shaft resistance at one point with every factor used,
// so that a reviewer can redo the arithmetic. Factors a method does not use
// are zero.
type Result struct {
	Fs         units.Stress // unit shaft resistance, after any limit
	Unlimited  units.Stress // unit shaft resistance before any limit
	SigmaV     units.Stress // σ′v used (after any critical-depth hold); 0 where the method does not read σ′v
	K          float64      // lateral earth pressure coefficient on the shaft
	K0         float64      // at-rest coefficient, where K is a ratio of it
	Kp         float64      // passive coefficient, where K is a ratio of it
	KRatio     float64      // K/K0 or K/Kp, where K is a ratio
	Delta      units.Angle  // δ, interface friction angle
	DeltaRatio float64      // δ/φ′, where δ is a ratio
	Beta       float64      // β = fs/σ′v (before any limit)
	Alpha      float64      // α = fs/su (before any limit)
	Psi        float64      // ψ = su/σ′v (API α only)
	SuPa       float64      // su/pa, the strength ratio of the drilled-shaft α and the chart α
	Flags      Flags        // warnings raised on the way
}

// Flags are warnings raised while computing a result. They are data on the
// hot path; Err turns them into an error where a caller wants one.
type Flags uint8

const (
	// LimitGoverns: a limiting unit friction capped fs.
	LimitGoverns Flags = 1 << iota
	// CriticalDepthGoverns: the point lies below the critical depth and σ′v
	// was held at its value there.
	CriticalDepthGoverns
	// BoundApplied: a published bound of the method (such as 0.25 ≤ β ≤ 1.2
	// or α ≤ 1) replaced the raw value.
	BoundApplied
	// ChartEdge: the input lay beyond a digitised chart and the caller opted
	// in to holding the chart's last value.
	ChartEdge
	// LambdaCapped: the λ method's limit fav ≤ s̄u (α ≤ 1) replaced
	// λ·(σ̄′v + 2·s̄u).
	LambdaCapped
	// LambdaCapOff: the λ method's limit fav ≤ s̄u was switched off, so fav
	// may exceed s̄u.
	LambdaCapOff
	// NoCompressibility: a tension/compression ratio was taken without the
	// pile compressibility term (η = 0), its upper bound.
	NoCompressibility
)

var flagNames = [...]string{"limit governs", "critical depth governs", "bound applied", "beyond chart, end value held",
	"λ limit fav ≤ s̄u governs", "λ limit fav ≤ s̄u switched off", "tension ratio without pile compressibility"}

// String lists the set flags, joined by ", ", or "none".
func (f Flags) String() string {
	if f == 0 {
		return "none"
	}
	var parts []string
	for i, n := range flagNames {
		if f&(1<<i) != 0 {
			parts = append(parts, n)
		}
	}
	if rest := f &^ (1<<len(flagNames) - 1); rest != 0 {
		parts = append(parts, "unknown flags 0x"+strconv.FormatUint(uint64(rest), 16))
	}
	return strings.Join(parts, ", ")
}

// Err returns nil when no flag is set, and otherwise an error whose text is
// String, for breakdown paths that report warnings as errors.
func (f Flags) Err() error {
	if f == 0 {
		return nil
	}
	return &FlagError{Flags: f}
}

// FlagError carries warnings as an error.
type FlagError struct{ Flags Flags }

func (e *FlagError) Error() string { return "shaft: warning: " + e.Flags.String() }

// RangeError reports an input outside the range a method accepts (or not a
// number). It is the only error type returned for bad input.
type RangeError struct {
	Method string  // identifier of the method that refused the input
	Field  string  // name of the field, such as "phi" or "sigma_v"
	Value  float64 // the value given, in Unit
	Unit   string  // unit of Value, Min and Max, such as "deg" or "kPa"
	Min    float64 // smallest accepted value
	Max    float64 // largest accepted value
	Open   bool    // Min itself is refused
}

// Error says which limit the value passes, with enough digits to show the
// difference from it: "sigma_v: 20000.000000004 kPa is above 20000 kPa
// (accepted 0 to 20000 kPa)".
func (e *RangeError) Error() string {
	var b strings.Builder
	b.WriteString("shaft: ")
	b.WriteString(e.Method)
	b.WriteString(": ")
	b.WriteString(e.Field)
	b.WriteString(": ")
	unit := ""
	if e.Unit != "" {
		unit = " " + e.Unit
	}
	switch {
	case e.Value > e.Max:
		b.WriteString(units.FormatApart(e.Value, e.Max) + unit + " is above " + num(e.Max) + unit)
	case e.Value < e.Min:
		b.WriteString(units.FormatApart(e.Value, e.Min) + unit + " is below " + num(e.Min) + unit)
	case e.Value == e.Min && e.Open:
		b.WriteString(num(e.Value) + unit + " is not accepted; it must be above " + num(e.Min) + unit)
	default: // NaN
		b.WriteString(num(e.Value) + unit + " is not a number")
	}
	if e.Open {
		b.WriteString(" (accepted above " + num(e.Min) + " and up to " + num(e.Max) + unit + ")")
	} else {
		b.WriteString(" (accepted " + num(e.Min) + " to " + num(e.Max) + unit + ")")
	}
	return b.String()
}

func num(v float64) string { return strconv.FormatFloat(v, 'g', 6, 64) }

// check returns a RangeError unless lo ≤ v ≤ hi (lo < v ≤ hi when open):
// both limits are inclusive unless open excludes the lower one, and a
// value computed a rounding error past a limit is refused like any other.
// NaN is always refused.
func check(method, field string, v, lo, hi float64, unit string, open bool) error {
	ok := v >= lo && v <= hi
	if open && v == lo {
		ok = false
	}
	if ok {
		return nil
	}
	return &RangeError{Method: method, Field: field, Value: v, Unit: unit, Min: lo, Max: hi, Open: open}
}

// Limits of the inputs, in SI base units.
const (
	maxSigmaV = 20e6  // Pa
	maxSu     = 5e6   // Pa
	maxDepth  = 300.0 // m
	maxPhiDeg = 50.0  // degrees
	maxOCR    = 100.0 // -
	maxN60    = 100.0 // blows/0.3 m
	maxDiam   = 10.0  // m
	minPa     = 80e3  // Pa
	maxPaVal  = 120e3 // Pa
	deg       = math.Pi / 180
)

func checkSigmaV(id string, s units.Stress) error {
	return check(id, "sigma_v", s.KPa(), 0, maxSigmaV/1e3, "kPa", false)
}

func checkSigmaVPositive(id string, s units.Stress) error {
	return check(id, "sigma_v", s.KPa(), 0, maxSigmaV/1e3, "kPa", true)
}

func checkPhi(id string, a units.Angle) error {
	return check(id, "phi", a.Degrees(), 0, maxPhiDeg, "deg", true)
}

func checkOCR(id string, p Point) error {
	if p.OCR == 0 {
		return nil
	}
	return check(id, "ocr", p.OCR, 1, maxOCR, "", false)
}

func checkSu(id string, s units.Stress) error {
	return check(id, "su", s.KPa(), 0, maxSu/1e3, "kPa", true)
}

func checkDepth(id string, z units.Length) error {
	return check(id, "depth", z.Metres(), 0, maxDepth, "m", false)
}

func checkPa(id string, p Point) error {
	if p.Pa == 0 {
		return nil
	}
	return check(id, "pa", p.Pa.KPa(), minPa/1e3, maxPaVal/1e3, "kPa", false)
}

func checkN60(id string, n float64) error {
	return check(id, "n60", n, 0, maxN60, "", true)
}
