package units

import "math"

// Length is a distance or depth in metres.
type Length float64

// Area is an area in square metres.
type Area float64

// Volume is a volume in cubic metres.
type Volume float64

// Stress is a stress, pressure or modulus in pascals (N/m²).
type Stress float64

// Force is a force in newtons.
type Force float64

// ForcePerLength is a force per unit length, in newtons per metre; for
// example the shaft resistance per metre of pile.
type ForcePerLength float64

// UnitWeight is a weight per unit volume in newtons per cubic metre.
type UnitWeight float64

// Angle is a plane angle in radians.
type Angle float64

// Exact definitions behind the US customary units (NIST SP 811, 2008,
// Appendix B): the international foot is 0.3048 m, the international pound
// is 0.45359237 kg, and standard gravity is 9.80665 m/s².
const (
	footInMetres    = 0.3048
	poundInKg       = 0.45359237
	standardGravity = 9.80665
	lbfInNewtons    = poundInKg * standardGravity // 4.4482216152605 N
)

// Lengths.
const (
	Metre      Length = 1
	Millimetre Length = 1e-3
	Centimetre Length = 1e-2
	Kilometre  Length = 1e3
	Foot       Length = footInMetres
	Inch       Length = footInMetres / 12
)

// Areas.
const (
	SquareMetre      Area = 1
	SquareMillimetre Area = 1e-6
	SquareCentimetre Area = 1e-4
	SquareFoot       Area = footInMetres * footInMetres
	SquareInch       Area = SquareFoot / 144
)

// Volumes.
const (
	CubicMetre Volume = 1
	CubicFoot  Volume = footInMetres * footInMetres * footInMetres
	CubicInch  Volume = CubicFoot / 1728
)

// Stresses.
const (
	Pascal     Stress = 1
	Kilopascal Stress = 1e3
	Megapascal Stress = 1e6
	Gigapascal Stress = 1e9
	// PSF is one pound-force per square foot.
	PSF Stress = lbfInNewtons / (footInMetres * footInMetres)
	// KSF is one kip (1000 lbf) per square foot.
	KSF Stress = 1000 * PSF
	// TSF is one short ton-force (2000 lbf) per square foot.
	TSF Stress = 2000 * PSF
	// PSI is one pound-force per square inch.
	PSI Stress = 144 * PSF
	// KSI is one kip per square inch.
	KSI Stress = 1000 * PSI
)

// Forces.
const (
	Newton     Force = 1
	Kilonewton Force = 1e3
	Meganewton Force = 1e6
	// PoundForce is the pound-force, lbf.
	PoundForce Force = lbfInNewtons
	// Kip is 1000 lbf.
	Kip Force = 1000 * PoundForce
)

// Forces per length.
const (
	NewtonPerMetre     ForcePerLength = 1
	KilonewtonPerMetre ForcePerLength = 1e3
	PoundForcePerFoot  ForcePerLength = lbfInNewtons / footInMetres
	KipPerFoot         ForcePerLength = 1000 * PoundForcePerFoot
)

// Unit weights.
const (
	NewtonPerCubicMetre     UnitWeight = 1
	KilonewtonPerCubicMetre UnitWeight = 1e3
	// PCF is one pound-force per cubic foot.
	PCF UnitWeight = lbfInNewtons / (footInMetres * footInMetres * footInMetres)
	// KCF is one kip per cubic foot.
	KCF UnitWeight = 1000 * PCF
)

// Angles.
const (
	Radian Angle = 1
	Degree Angle = math.Pi / 180
)

// Accessors: each divides the quantity by a unit and returns the count.

// Metres returns l in metres.
func (l Length) Metres() float64 { return float64(l) }

// Millimetres returns l in millimetres.
func (l Length) Millimetres() float64 { return float64(l / Millimetre) }

// Feet returns l in feet.
func (l Length) Feet() float64 { return float64(l / Foot) }

// Inches returns l in inches.
func (l Length) Inches() float64 { return float64(l / Inch) }

// SquareMetres returns a in square metres.
func (a Area) SquareMetres() float64 { return float64(a) }

// SquareFeet returns a in square feet.
func (a Area) SquareFeet() float64 { return float64(a / SquareFoot) }

// SquareInches returns a in square inches.
func (a Area) SquareInches() float64 { return float64(a / SquareInch) }

// CubicMetres returns v in cubic metres.
func (v Volume) CubicMetres() float64 { return float64(v) }

// CubicFeet returns v in cubic feet.
func (v Volume) CubicFeet() float64 { return float64(v / CubicFoot) }

// Pascals returns s in pascals.
func (s Stress) Pascals() float64 { return float64(s) }

// KPa returns s in kilopascals.
func (s Stress) KPa() float64 { return float64(s / Kilopascal) }

// MPa returns s in megapascals.
func (s Stress) MPa() float64 { return float64(s / Megapascal) }

// GPa returns s in gigapascals.
func (s Stress) GPa() float64 { return float64(s / Gigapascal) }

// PSF returns s in pounds-force per square foot.
func (s Stress) PSF() float64 { return float64(s / PSF) }

// KSF returns s in kips per square foot.
func (s Stress) KSF() float64 { return float64(s / KSF) }

// TSF returns s in short tons-force per square foot.
func (s Stress) TSF() float64 { return float64(s / TSF) }

// PSI returns s in pounds-force per square inch.
func (s Stress) PSI() float64 { return float64(s / PSI) }

// KSI returns s in kips per square inch.
func (s Stress) KSI() float64 { return float64(s / KSI) }

// Newtons returns f in newtons.
func (f Force) Newtons() float64 { return float64(f) }

// KN returns f in kilonewtons.
func (f Force) KN() float64 { return float64(f / Kilonewton) }

// MN returns f in meganewtons.
func (f Force) MN() float64 { return float64(f / Meganewton) }

// PoundsForce returns f in pounds-force.
func (f Force) PoundsForce() float64 { return float64(f / PoundForce) }

// Kips returns f in kips.
func (f Force) Kips() float64 { return float64(f / Kip) }

// NewtonsPerMetre returns f in newtons per metre.
func (f ForcePerLength) NewtonsPerMetre() float64 { return float64(f) }

// KNPerMetre returns f in kilonewtons per metre.
func (f ForcePerLength) KNPerMetre() float64 { return float64(f / KilonewtonPerMetre) }

// KipsPerFoot returns f in kips per foot.
func (f ForcePerLength) KipsPerFoot() float64 { return float64(f / KipPerFoot) }

// NewtonsPerCubicMetre returns g in N/m³.
func (g UnitWeight) NewtonsPerCubicMetre() float64 { return float64(g) }

// KNPerCubicMetre returns g in kN/m³.
func (g UnitWeight) KNPerCubicMetre() float64 { return float64(g / KilonewtonPerCubicMetre) }

// PCF returns g in pounds-force per cubic foot.
func (g UnitWeight) PCF() float64 { return float64(g / PCF) }

// KCF returns g in kips per cubic foot.
func (g UnitWeight) KCF() float64 { return float64(g / KCF) }

// Radians returns a in radians.
func (a Angle) Radians() float64 { return float64(a) }

// Degrees returns a in degrees.
func (a Angle) Degrees() float64 { return float64(a / Degree) }

// Sin returns the sine of a.
func (a Angle) Sin() float64 { return math.Sin(float64(a)) }

// Cos returns the cosine of a.
func (a Angle) Cos() float64 { return math.Cos(float64(a)) }

// Tan returns the tangent of a.
func (a Angle) Tan() float64 { return math.Tan(float64(a)) }

// Operations that change dimension.

// StressOver returns the vertical stress γ·h of a column of unit weight g
// and height h.
func StressOver(g UnitWeight, h Length) Stress { return Stress(float64(g) * float64(h)) }

// ForceOn returns the force σ·A of stress s acting on area a.
func ForceOn(s Stress, a Area) Force { return Force(float64(s) * float64(a)) }

// StressOf returns the mean stress F/A of force f over area a.
// It returns ±Inf or NaN when a is zero, as float division does.
func StressOf(f Force, a Area) Stress { return Stress(float64(f) / float64(a)) }

// PerLength returns the force per length s·p of a unit shaft resistance s
// acting over a perimeter p.
func PerLength(s Stress, p Length) ForcePerLength {
	return ForcePerLength(float64(s) * float64(p))
}

// ForceAlong returns the force q·L of a force per length q acting along a
// length l.
func ForceAlong(q ForcePerLength, l Length) Force { return Force(float64(q) * float64(l)) }

// Rectangle returns the area a·b.
func Rectangle(a, b Length) Area { return Area(float64(a) * float64(b)) }

// Circle returns the area π·d²/4 of a circle of diameter d.
func Circle(d Length) Area { return Area(math.Pi / 4 * float64(d) * float64(d)) }

// Prism returns the volume A·h of a prism of cross-section a and height h.
func Prism(a Area, h Length) Volume { return Volume(float64(a) * float64(h)) }

// WeightOf returns the weight γ·V of volume v at unit weight g.
func WeightOf(g UnitWeight, v Volume) Force { return Force(float64(g) * float64(v)) }

// Atan returns the angle whose tangent is x.
func Atan(x float64) Angle { return Angle(math.Atan(x)) }

// Asin returns the angle whose sine is x, for x in [-1, 1].
func Asin(x float64) Angle { return Angle(math.Asin(x)) }
