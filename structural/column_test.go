package structural

import (
	"errors"
	"math"
	"testing"

	"github.com/qultgeo/qult/pile"
	"github.com/qultgeo/qult/units"
)

// TestColumnAISC: AASHTO 6.9.4.1.1's column curve (the AISC 360 E3
// curve: Pn = 0.658^(Po/Pe)·Po for Pe/Po ≥ 0.44, else 0.877·Pe) against
// the printed column table.
//
// AISC Steel Construction Manual, Table 4-1, Available Strength in Axial
// Compression, Fy = 50 ksi (read in the excerpt "Table 2: Available
// Strength in Axial Compression, kips", Scribd document 245305753, p. 1),
// effective length KL about the least radius of gyration ry:
//
//	W14×873: Ag = 257 in², ry = 4.90 in; KL = 20 ft: Pn/Ωc = 6 460, φcPn = 9 700 kips;
//	         KL = 40 ft: 3 810 and 5 730 kips
//	W14×808: Ag = 238 in², ry = 4.83 in; KL = 20 ft: 5 950 and 8 940 kips;
//	         KL = 40 ft: 3 460 and 5 200 kips
//
// with φc = 0.90 and Ωc = 1.67; E = 29 000 ksi. The table prints three
// figures.
func TestColumnAISC(t *testing.T) {
	for _, c := range []struct {
		name       string
		ag, ry, kl float64 // in², in, ft
		asd, lrfd  float64 // kips
	}{
		{"W14x873 20 ft", 257, 4.90, 20, 6460, 9700},
		{"W14x873 40 ft", 257, 4.90, 40, 3810, 5730},
		{"W14x808 20 ft", 238, 4.83, 20, 5950, 8940},
		{"W14x808 40 ft", 238, 4.83, 40, 3460, 5200},
	} {
		a := units.Area(c.ag) * units.SquareInch
		po := squash(50*units.KSI, a)
		pe := eulerLoad(aashtoE, a, units.Length(c.kl)*units.Foot, units.Length(c.ry)*units.Inch)
		pn := aashtoColumn(po, pe).Kips()
		if !near(0.90*pn, c.lrfd, 0.005) {
			t.Errorf("%s: φcPn = %.5g kips, want %.4g (AISC Table 4-1)", c.name, 0.90*pn, c.lrfd)
		}
		if !near(pn/1.67, c.asd, 0.005) {
			t.Errorf("%s: Pn/Ωc = %.5g kips, want %.4g (AISC Table 4-1)", c.name, pn/1.67, c.asd)
		}
	}
	// Below Pe/Po = 0.44 the curve is 0.877·Pe (closed form).
	if got := aashtoColumn(1000*units.Kilonewton, 400*units.Kilonewton); !near(got.KN(), 0.877*400, 1e-12) {
		t.Errorf("aashtoColumn below 0.44 = %v", got)
	}
}

// TestEnChi: EN 1993-1-1 6.3.1.2 worked by hand (closed form): curve c
// (α = 0.49) at λ̄ = 1: Φ = 0.5·(1 + 0.49·0.8 + 1) = 1.196,
// χ = 1/(1.196 + √(1.196² − 1)) = 0.53991; λ̄ ≤ 0.2 gives 1.
func TestEnChi(t *testing.T) {
	phi := 1.196
	want := 1 / (phi + math.Sqrt(phi*phi-1))
	if got := enChi(1, 0.49); !near(got, want, 1e-12) || !near(got, 0.53991, 1e-4) {
		t.Errorf("χ(1, 0.49) = %.6g, want %.6g", got, want)
	}
	if enChi(0.2, 0.49) != 1 || enChi(0.1, 0.49) != 1 {
		t.Errorf("χ at λ̄ ≤ 0.2 is not 1")
	}
}

// TestColumnThroughRules: a pipe with a free length through each rule,
// worked by hand (closed form); a concrete section with a free length is
// refused; a free length of zero changes nothing.
func TestColumnThroughRules(t *testing.T) {
	sec := pile.Section{Shape: pile.ClosedPipe, Diameter: 508 * units.Millimetre, Wall: 12.5 * units.Millimetre}
	m := Member{Section: sec, Installation: pile.DrivenHigh, SteelYield: 355 * units.Megapascal, Column: Column{Length: 6 * units.Metre}}
	a := math.Pi / 4 * (508*508 - 483*483) // 19 458.2 mm²
	r := math.Sqrt(508*508+483*483) / 4    // 175.25 mm
	kl := 2.1 * 6000.0
	po := 355 * a // N
	// AASHTO: Pe = π²·E·A/(Kl/r)², E = 29 000 ksi = 199 948 MPa.
	e := 29000 * 6.894757293168361
	pe := math.Pi * math.Pi * e * a / math.Pow(kl/r, 2)
	pn := math.Pow(0.658, po/pe) * po
	if pe < 0.44*po {
		pn = 0.877 * pe
	}
	got, err := AASHTO{}.Compression(m)
	if err != nil {
		t.Fatal(err)
	}
	if !near(got.Design.Newtons(), 0.60*pn, 1e-9) || !near(got.Squash.Newtons(), po, 1e-12) {
		t.Errorf("AASHTO column: %v (%s), want %.6g N", got.Design, got.Equation, 0.60*pn)
	}
	// EN: λ̄ = √(A·fy/Ncr), Ncr with E = 210 GPa, curve c.
	ncr := math.Pi * math.Pi * 210000 * a / math.Pow(kl/r, 2)
	lam := math.Sqrt(po / ncr)
	ph := 0.5 * (1 + 0.49*(lam-0.2) + lam*lam)
	chi := 1 / (ph + math.Sqrt(ph*ph-lam*lam))
	got, err = Eurocode{}.Compression(m)
	if err != nil {
		t.Fatal(err)
	}
	if !near(got.Design.Newtons(), chi*po, 1e-9) {
		t.Errorf("EN column: %v (%s), want %.6g N", got.Design, got.Equation, chi*po)
	}
	got, _ = Allowable{}.Compression(m)
	if !near(got.Design.Newtons(), 0.5*pn, 1e-9) {
		t.Errorf("allowable column: %v, want %.6g N", got.Design, 0.5*pn)
	}
	short := m
	short.Column = Column{}
	full, _ := AASHTO{}.Compression(short)
	if !near(full.Design.Newtons(), 0.60*po, 1e-12) {
		t.Errorf("no free length: %v, want %.6g N", full.Design, 0.60*po)
	}
	conc := Member{Section: pile.Section{Shape: pile.Circle, Diameter: units.Metre}, Installation: pile.Bored,
		Concrete: 30 * units.Megapascal, Column: Column{Length: 3 * units.Metre}}
	_, err = Eurocode{}.Compression(conc)
	var fe *FieldError
	if !errors.As(err, &fe) || fe.Field != "candidate.free_length" {
		t.Errorf("concrete with a free length: %v", err)
	}
	bad := m
	bad.Column.K = 5
	if _, err := (AASHTO{}).Compression(bad); !errors.As(err, &fe) || fe.Field != "candidate.effective_length_factor" {
		t.Errorf("K = 5: %v", err)
	}
}

// TestMinRadius: r of a pipe √(D² + d²)/4 and of an H about its weak axis,
// by hand.
func TestMinRadius(t *testing.T) {
	p := pile.Section{Shape: pile.OpenPipe, Diameter: 0.6 * units.Metre, Wall: 0.01 * units.Metre}
	if got := MinRadius(p).Metres(); !near(got, math.Sqrt(0.36+0.58*0.58)/4, 1e-12) {
		t.Errorf("pipe r = %g", got)
	}
	h := pile.Section{Shape: pile.HSection, Depth: 0.3 * units.Metre, Width: 0.3 * units.Metre, Web: 0.015 * units.Metre, Flange: 0.015 * units.Metre}
	iz := 2*0.015*math.Pow(0.3, 3)/12 + 0.27*math.Pow(0.015, 3)/12
	area := 2*0.3*0.015 + 0.27*0.015
	if got := MinRadius(h).Metres(); !near(got, math.Sqrt(iz/area), 1e-12) {
		t.Errorf("H r = %g", got)
	}
}
