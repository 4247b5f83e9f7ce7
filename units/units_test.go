package units

import (
	"errors"
	"math"
	"testing"
)

// withinRel reports whether got is within rel (relative) of want.
func withinRel(got, want, rel float64) bool {
	if want == 0 {
		return math.Abs(got) <= rel
	}
	return math.Abs(got-want) <= rel*math.Abs(want)
}

// TestNIST checks every US customary constant against the conversion
// factors of NIST Special Publication 811 (2008 ed.), Guide for the Use of
// the International System of Units (SI), Appendix B.8 "Factors for units
// listed alphabetically" and B.9 "by kind of quantity". NIST prints factors
// to seven significant digits (exact ones are marked and given in full), so
// inexact factors are checked to half a unit in the seventh digit, 5e-7
// relative; exact ones to 1e-15.
func TestNIST(t *testing.T) {
	const exact, seven = 1e-15, 5e-7
	cases := []struct {
		name      string
		got, want float64
		rel       float64
	}{
		// Appendix B.8: foot = 3.048 E-01 m (exact).
		{"ft", Foot.Metres(), 0.3048, exact},
		// B.8: inch = 2.54 E-02 m (exact).
		{"in", Inch.Metres(), 0.0254, exact},
		// B.8: square foot = 9.290 304 E-02 m² (exact).
		{"ft2", SquareFoot.SquareMetres(), 9.290304e-2, exact},
		// B.8: square inch = 6.4516 E-04 m² (exact).
		{"in2", SquareInch.SquareMetres(), 6.4516e-4, exact},
		// B.8: cubic foot = 2.831 685 E-02 m³.
		{"ft3", CubicFoot.CubicMetres(), 2.831685e-2, seven},
		// B.8: pound-force = 4.448 222 E+00 N; the exact value from the
		// definitions lbm = 0.453 592 37 kg and gn = 9.806 65 m/s² (B.8
		// footnotes) is 4.448 221 615 260 5 N.
		{"lbf", PoundForce.Newtons(), 4.4482216152605, 1e-14},
		// B.8: kip (1 kip = 1000 lbf) = 4.448 222 E+03 N.
		{"kip", Kip.Newtons(), 4.448222e3, seven},
		// B.8: pound-force per square foot = 4.788 026 E+01 Pa.
		{"psf", PSF.Pascals(), 4.788026e1, seven},
		// B.8: pound-force per square inch = 6.894 757 E+03 Pa.
		{"psi", PSI.Pascals(), 6.894757e3, seven},
		// B.8: kip per square inch (ksi) = 6.894 757 E+06 Pa.
		{"ksi", KSI.Pascals(), 6.894757e6, seven},
		// B.8: ton-force (2000 lbf) = 8.896 443 E+03 N, so one short
		// ton-force per square foot is 8.896 443 E+03 / 9.290 304 E-02 Pa.
		{"tsf", TSF.Pascals(), 8.896443e3 / 9.290304e-2, seven},
		// ksf: 1000 psf, from B.8 pound-force per square foot.
		{"ksf", KSF.Pascals(), 4.788026e4, seven},
		// B.8: pound-force per foot = 1.459 390 E+01 N/m.
		{"lbf/ft", PoundForcePerFoot.NewtonsPerMetre(), 1.459390e1, seven},
		// pcf = lbf/ft³: 4.448 222 E+00 N / 2.831 685 E-02 m³ = 157.087 46 N/m³
		// (NIST SP 811 factors).
		{"pcf", PCF.NewtonsPerCubicMetre(), 157.08746, seven},
		{"pcf-from-factors", PCF.NewtonsPerCubicMetre(), 4.448222 / 2.831685e-2, 1e-6},
		// B.8: degree = 1.745 329 E-02 rad.
		{"deg", Degree.Radians(), 1.745329e-2, seven},
	}
	for _, c := range cases {
		if !withinRel(c.got, c.want, c.rel) {
			t.Errorf("%s: got %.12g, want %.12g (rel %g)", c.name, c.got, c.want, c.rel)
		}
	}
}

// TestAccessors checks that accessors divide by the same constants the
// constructors multiply by (closed form: x·U/U = x).
func TestAccessors(t *testing.T) {
	const rel = 1e-15
	checks := []struct {
		name      string
		got, want float64
	}{
		{"mm", (450 * Millimetre).Millimetres(), 450},
		{"ft", (52.5 * Foot).Feet(), 52.5},
		{"in", (18 * Inch).Inches(), 18},
		{"ft2", (3 * SquareFoot).SquareFeet(), 3},
		{"in2", (10 * SquareInch).SquareInches(), 10},
		{"ft3", (2 * CubicFoot).CubicFeet(), 2},
		{"kPa", (120 * Kilopascal).KPa(), 120},
		{"MPa", (4.5 * Megapascal).MPa(), 4.5},
		{"GPa", (30 * Gigapascal).GPa(), 30},
		{"psf", (2000 * PSF).PSF(), 2000},
		{"ksf", (2.5 * KSF).KSF(), 2.5},
		{"tsf", (1.5 * TSF).TSF(), 1.5},
		{"psi", (60 * PSI).PSI(), 60},
		{"ksi", (29000 * KSI).KSI(), 29000},
		{"kN", (2200 * Kilonewton).KN(), 2200},
		{"MN", (3 * Meganewton).MN(), 3},
		{"lbf", (800 * PoundForce).PoundsForce(), 800},
		{"kip", (450 * Kip).Kips(), 450},
		{"kN/m", (35 * KilonewtonPerMetre).KNPerMetre(), 35},
		{"kip/ft", (2 * KipPerFoot).KipsPerFoot(), 2},
		{"kN/m3", (18 * KilonewtonPerCubicMetre).KNPerCubicMetre(), 18},
		{"pcf", (120 * PCF).PCF(), 120},
		{"kcf", (0.125 * KCF).KCF(), 0.125},
		{"deg", (30 * Degree).Degrees(), 30},
	}
	for _, c := range checks {
		if !withinRel(c.got, c.want, rel) {
			t.Errorf("%s: got %.17g, want %g", c.name, c.got, c.want)
		}
	}
}

// TestDimensionChanges checks the named operations against closed forms.
func TestDimensionChanges(t *testing.T) {
	const rel = 1e-15
	// σ = γ·h: 18 kN/m³ over 2 m is 36 kPa (closed form).
	if got := StressOver(18*KilonewtonPerCubicMetre, 2*Metre); !withinRel(got.KPa(), 36, rel) {
		t.Errorf("StressOver = %v", got)
	}
	// 120 pcf over 10 ft is 1200 psf (closed form, same units both sides).
	if got := StressOver(120*PCF, 10*Foot); !withinRel(got.PSF(), 1200, 1e-14) {
		t.Errorf("StressOver US = %v psf", got.PSF())
	}
	// A = πd²/4: d = 0.6 m gives 0.2827433 m² (closed form).
	if got := Circle(0.6 * Metre); !withinRel(got.SquareMetres(), math.Pi*0.09, rel) {
		t.Errorf("Circle = %v", got)
	}
	// F = σ·A: 5 MPa on 0.2 m² is 1000 kN.
	if got := ForceOn(5*Megapascal, 0.2*SquareMetre); !withinRel(got.KN(), 1000, rel) {
		t.Errorf("ForceOn = %v", got)
	}
	if got := StressOf(1000*Kilonewton, 0.2*SquareMetre); !withinRel(got.MPa(), 5, rel) {
		t.Errorf("StressOf = %v", got)
	}
	// q = fs·p then F = q·L: 50 kPa on 2 m perimeter over 10 m is 1000 kN.
	q := PerLength(50*Kilopascal, 2*Metre)
	if !withinRel(q.KNPerMetre(), 100, rel) || !withinRel(ForceAlong(q, 10*Metre).KN(), 1000, rel) {
		t.Errorf("PerLength/ForceAlong = %v, %v", q, ForceAlong(q, 10*Metre))
	}
	// W = γ·A·h: 24 kN/m³ × 0.25 m² × 20 m = 120 kN.
	if got := WeightOf(24*KilonewtonPerCubicMetre, Prism(Rectangle(0.5*Metre, 0.5*Metre), 20*Metre)); !withinRel(got.KN(), 120, 1e-14) {
		t.Errorf("WeightOf = %v", got)
	}
	// Atan(1) = 45°, Asin(0.5) = 30° (closed forms).
	if !withinRel(Atan(1).Degrees(), 45, 1e-14) || !withinRel(Asin(0.5).Degrees(), 30, 1e-14) {
		t.Errorf("Atan/Asin wrong")
	}
	if a := 30 * Degree; !withinRel(a.Sin(), 0.5, 1e-15) || !withinRel(a.Tan(), 1/math.Sqrt(3), 1e-15) || !withinRel((60*Degree).Cos(), 0.5, 1e-15) {
		t.Errorf("trig wrong")
	}
}

func TestParse(t *testing.T) {
	cases := []struct {
		in   string
		dim  Dimension
		want float64 // SI base units, from the NIST factors above
	}{
		{"16 m", DimLength, 16},
		{"450 mm", DimLength, 0.45},
		{"450mm", DimLength, 0.45},
		{"  52.5 ft ", DimLength, 52.5 * 0.3048},
		{"18 in", DimLength, 18 * 0.0254},
		{"-1.5 m", DimLength, -1.5},
		{"1e3 mm", DimLength, 1},
		{"2.5E-1 m", DimLength, 0.25},
		{"120 pcf", DimUnitWeight, 120 * 157.08746},
		{"2.5 ksf", DimStress, 2.5 * 47880.26},
		{"1 tsf", DimStress, 2000 * 47.88026},
		{"30 deg", DimAngle, 30 * math.Pi / 180},
		{"30°", DimAngle, 30 * math.Pi / 180},
		{"30 °", DimAngle, 30 * math.Pi / 180},
		{"18 kN/m3", DimUnitWeight, 18000},
		{"18 kN/m³", DimUnitWeight, 18000},
		{"18 kN/m^3", DimUnitWeight, 18000},
		{"0.28 m²", DimArea, 0.28},
		{"3 ft2", DimArea, 3 * 0.09290304},
		{"30 GPa", DimStress, 30e9},
		{"100 kN/m2", DimStress, 1e5},
		{"2200 kN", DimForce, 2.2e6},
		{"450 kip", DimForce, 450 * 4448.2216152605},
		{"35 kN/m", DimForcePerLength, 35000},
		{"2 kip/ft", DimForcePerLength, 2 * 14593.90},
		{"1.2 m3", DimVolume, 1.2},
		{"60 psi", DimStress, 60 * 6894.757},
		{".5 m", DimLength, 0.5},
	}
	for _, c := range cases {
		q, err := Parse(c.in)
		if err != nil {
			t.Errorf("Parse(%q): %v", c.in, err)
			continue
		}
		if q.Dim != c.dim || !withinRel(q.Value, c.want, 5e-7) {
			t.Errorf("Parse(%q) = %v %v, want %v %v", c.in, q.Value, q.Dim, c.want, c.dim)
		}
	}
}

func TestParseErrors(t *testing.T) {
	cases := []struct {
		in   string
		want error
	}{
		{"", ErrEmpty},
		{"   ", ErrEmpty},
		{"m", ErrSyntax},
		{"abc", ErrSyntax},
		{"12", ErrNoUnit},
		{"12 furlongs", ErrUnit},
		{"12 mPa", ErrUnit}, // case matters: not a millipascal
		{"3 ton", ErrAmbiguous},
		{"3 tons", ErrAmbiguous},
		{"3 t", ErrAmbiguous},
		{"400 lb", ErrAmbiguous},
		{"NaN m", ErrRange},
		{"nan", ErrRange},
		{"Inf kPa", ErrRange},
		{"-inf m", ErrRange},
		{"1e400 m", ErrRange},
		{"1e308 GPa", ErrRange},
		{"1.2.3 m", ErrUnit},
	}
	for _, c := range cases {
		_, err := Parse(c.in)
		if !errors.Is(err, c.want) {
			t.Errorf("Parse(%q) error = %v, want %v", c.in, err, c.want)
		}
		var pe *ParseError
		if err != nil && (!errors.As(err, &pe) || pe.Input != c.in) {
			t.Errorf("Parse(%q) error %v does not quote the input", c.in, err)
		}
	}
	// Ambiguous spellings name the accepted ones.
	if _, err := ParseForce("3 ton"); err == nil || !containsAll(err.Error(), "kip", "kN") {
		t.Errorf("ParseForce(3 ton) = %v, want advice naming kip and kN", err)
	}
	// Wrong dimension names both dimensions and the accepted units.
	_, err := ParseLength("12 kPa")
	if !errors.Is(err, ErrDimension) || !containsAll(err.Error(), "stress", "length", "mm", "ft") {
		t.Errorf("ParseLength(12 kPa) = %v", err)
	}
}

func containsAll(s string, subs ...string) bool {
	for _, sub := range subs {
		found := false
		for i := 0; i+len(sub) <= len(s); i++ {
			if s[i:i+len(sub)] == sub {
				found = true
				break
			}
		}
		if !found {
			return false
		}
	}
	return true
}

// TestRoundTrip checks Parse(q.String()) == q within 1e-12 relative for
// every accepted unit, at several magnitudes.
func TestRoundTrip(t *testing.T) {
	mags := []float64{0, 1, -2.5, 0.1, 1.0 / 3, 12345.678, 1e-7, 6.02e23, 0.3048}
	for _, u := range unitTable {
		for _, m := range mags {
			v := m * u.factor
			var s string
			switch u.dim {
			case DimLength:
				s = Length(v).String()
			case DimArea:
				s = Area(v).String()
			case DimVolume:
				s = Volume(v).String()
			case DimStress:
				s = Stress(v).String()
			case DimForce:
				s = Force(v).String()
			case DimForcePerLength:
				s = ForcePerLength(v).String()
			case DimUnitWeight:
				s = UnitWeight(v).String()
			case DimAngle:
				s = Angle(v).String()
			}
			q, err := Parse(s)
			if err != nil {
				t.Errorf("%s: Parse(%q): %v", u.sym, s, err)
				continue
			}
			if q.Dim != u.dim || !withinRel(q.Value, v, 1e-12) {
				t.Errorf("%s: Parse(%q) = %v, want %v", u.sym, s, q.Value, v)
			}
		}
	}
}

func TestParseIn(t *testing.T) {
	// A bare number is counted in the system's display unit.
	v, err := ParseIn("120", DimUnitWeight, US)
	if err != nil || !withinRel(v, 120*157.08746, 5e-7) { // NIST: 1 pcf = 157.08746 N/m³
		t.Errorf("ParseIn(120, unit weight, US) = %v, %v", v, err)
	}
	v, err = ParseIn("18", DimUnitWeight, SI)
	if err != nil || v != 18000 {
		t.Errorf("ParseIn(18, unit weight, SI) = %v, %v", v, err)
	}
	// A unit written overrides the system.
	v, err = ParseIn("6 m", DimLength, US)
	if err != nil || v != 6 {
		t.Errorf("ParseIn(6 m, length, US) = %v, %v", v, err)
	}
	if _, err := ParseIn("6 kPa", DimLength, SI); !errors.Is(err, ErrDimension) {
		t.Errorf("ParseIn(6 kPa, length) error = %v", err)
	}
}

func TestTextEncoding(t *testing.T) {
	var l Length
	if err := l.UnmarshalJSON([]byte(`"52.5 ft"`)); err != nil || !withinRel(l.Feet(), 52.5, 1e-15) {
		t.Errorf("UnmarshalJSON ft: %v %v", l, err)
	}
	if err := l.UnmarshalJSON([]byte(`12.5`)); err != nil || l != 12.5 {
		t.Errorf("UnmarshalJSON bare: %v %v", l, err)
	}
	var s Stress
	if err := s.UnmarshalText([]byte("40")); err != nil || s != 40*Kilopascal {
		t.Errorf("UnmarshalText bare stress: %v %v", s, err)
	}
	if err := s.UnmarshalText([]byte("40 m")); !errors.Is(err, ErrDimension) {
		t.Errorf("UnmarshalText wrong dimension: %v", err)
	}
	b, _ := (18 * KilonewtonPerCubicMetre).MarshalText()
	if string(b) != "18 kN/m3" {
		t.Errorf("MarshalText = %q", b)
	}
}

func TestSystem(t *testing.T) {
	v, sym := US.In(float64(47880.26*Pascal), DimStress)
	if sym != "ksf" || !withinRel(v, 1, 5e-7) { // NIST: 1 psf = 47.88026 Pa
		t.Errorf("US.In stress = %v %s", v, sym)
	}
	if s, err := ParseSystem("us"); err != nil || s != US {
		t.Errorf("ParseSystem(us) = %v %v", s, err)
	}
	if _, err := ParseSystem("imperial"); err == nil {
		t.Errorf("ParseSystem(imperial) accepted")
	}
}
