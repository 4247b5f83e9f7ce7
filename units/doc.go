// Package units provides typed physical quantities for geotechnical
// calculations, stored as float64 in SI base units.
//
// Each quantity is a defined type in one base unit, in the manner of
// time.Duration: Length in metres, Area in square metres, Volume in cubic
// metres, Stress in pascals (also used for moduli), Force in newtons,
// ForcePerLength in newtons per metre, UnitWeight in newtons per cubic metre,
// and Angle in radians. Named constants give the engineering SI and US
// customary units, derived from exact definitions (NIST SP 811, 2008,
// Appendix B): for example
//
//	Foot       = 0.3048 * Metre
//	PoundForce = 0.45359237 * 9.80665 * Newton
//
// Multiply a number by a constant to make a quantity, and divide a quantity
// by a constant, or call an accessor such as Stress.KPa, to count it in a unit:
//
//	d := 600 * units.Millimetre
//	fmt.Println(d.Feet())
//
// Operations that change dimension are named functions (StressOver,
// ForceOn, ForceAlong, …), never bare multiplication, so that the dimension
// of every result is checked by the compiler.
//
// Parse and the typed parsers (ParseLength, ParseStress, …) read strings such
// as "450 mm", "2.5 ksf", "18 kN/m³" or "30°". Ambiguous spellings
// ("ton", "lb", "t") are refused with an error naming the accepted units.
// String returns a form that parses back to the same value. A System (SI or
// US) names the customary display unit of each dimension; ParseIn reads a
// bare number in that unit.
package units
