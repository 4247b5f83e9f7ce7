package structural

import (
	"fmt"
	"math"

	"github.com/qultgeo/qult/cite"
	"github.com/qultgeo/qult/pile"
	"github.com/qultgeo/qult/units"
)

// AASHTO is the rule of AASHTO LRFD Bridge Design Specifications for the
// axial resistance of a fully embedded pile section, used with the LRFD
// bases:
//
//	concrete  Po = 0.85·f′c·(Ag − Ast) + fy·Ast         (5.6.4.4-3)
//	          Pn = k·Po, k = 0.80 ties, 0.85 spiral      (5.6.4.4-2, -1)
//	          Pr = φ·Pn, φ = 0.75                        (5.5.4.2, compression-controlled)
//	steel     Pn = Fy·As (λ = 0)                         (6.9.4.1)
//	          Pr = φc·Pn, φc = 0.50 H, 0.60 pipe (severe driving);
//	                      0.60 H, 0.70 pipe (good driving)  (6.5.4.2)
//
// The zero value takes ties and severe driving, the lower resistances.
// Prestress (Aps) is not counted. The factors were not read in the
// specification here (from memory): check them against the edition in
// force. A steel section with slender elements (6.9.4.2: H flange
// b/t > 0.56·√(E/Fy) with b half the flange width, web h/tw > 1.49·√(E/Fy),
// pipe D/t > 0.11·E/Fy; E = 200 GPa; from memory) is refused.
type AASHTO struct {
	Spiral      bool // spiral transverse reinforcement (k = 0.85)
	GoodDriving bool // φc for good driving conditions
}

// ID returns "aashto".
func (AASHTO) ID() string { return "aashto" }

// Refs returns AASHTO LRFD 5.6.4.4, 5.5.4.2, 6.9.4.1, 6.9.4.2, 6.5.4.2.
func (AASHTO) Refs() []cite.Ref {
	return []cite.Ref{{Source: cite.AASHTO2020, Where: "5.6.4.4, 5.5.4.2 (concrete); 6.9.4.1, 6.9.4.2, 6.5.4.2 (steel piles) (from memory)"}}
}

// aashtoE is the modulus of structural steel, 29 000 ksi (AASHTO 6.4.1,
// from memory).
const aashtoE = 29000 * units.KSI

// Compression returns φPn (see AASHTO).
func (a AASHTO) Compression(m Member) (Resistance, error) {
	if err := m.Validate("candidate"); err != nil {
		return Resistance{}, err
	}
	r := Resistance{Rule: a.ID(), Refs: a.Refs(), Notes: []string{fullyEmbedded}}
	if m.IsSteel() {
		if err := aashtoCompact(m); err != nil {
			return Resistance{}, err
		}
		as := m.Section.MaterialArea()
		phi, what := 0.60, "pipe"
		if m.Section.Shape == pile.HSection {
			phi, what = 0.50, "H-pile"
		}
		drive := "severe"
		if a.GoodDriving {
			phi += 0.10
			drive = "good"
		}
		red, col, err := steelColumn("aashto", m, m.Column)
		if err != nil {
			return Resistance{}, err
		}
		r.Material, r.SteelArea = "steel", as
		r.Squash = squash(m.SteelYield, as)
		r.Nominal = units.Force(red) * r.Squash
		r.Factor, r.Design = phi, units.Force(phi)*r.Nominal
		r.Equation = fmt.Sprintf("Pr = φc·Fy·As = %.3g × %.4g MPa × %.6g mm² = %.6g kN (φc of a %s under %s driving)",
			phi, mpa(m.SteelYield), mm2(as), kn(r.Design), what, drive)
		if col != "" {
			r.Equation = fmt.Sprintf("Pr = φc·Pn = %.3g × %.6g kN = %.6g kN (φc of a %s under %s driving); %s", phi, kn(r.Nominal), kn(r.Design), what, drive, col)
			r.Notes = []string{"a column over the free length given (AASHTO 6.9.4.1.1, Q = 1); bending at the head is not checked"}
		}
		return r, nil
	}
	ag, ast := m.Section.GrossArea(), m.Rebar
	k, how := 0.80, "ties"
	if a.Spiral {
		k, how = 0.85, "spiral"
	}
	const phi = 0.75
	po := concreteSquash(m.Concrete, ag, ast, m.RebarYield)
	r.Material, r.ConcreteArea, r.SteelArea = "concrete", ag-ast, ast
	r.Nominal, r.Squash = units.Force(k)*po, po
	r.Factor, r.Design = phi, units.Force(phi)*r.Nominal
	r.Equation = fmt.Sprintf("Pr = φ·k·[0.85·f′c·(Ag − Ast) + fy·Ast] = %.2g × %.2f × [0.85 × %.4g MPa × %.6g mm² + %.4g MPa × %.6g mm²] = %.6g kN (k for %s)",
		phi, k, mpa(m.Concrete), mm2(ag-ast), mpa(m.RebarYield), mm2(ast), kn(r.Design), how)
	r.Notes = append(r.Notes, "prestress is not counted")
	return r, nil
}

// squash returns the yield (squash) load of a steel area, fy·A: AASHTO's
// Pn with λ = 0 and EN 1993-1-1's A·fy before γM0.
func squash(fy units.Stress, a units.Area) units.Force { return units.ForceOn(fy, a) }

// concreteSquash returns AASHTO 5.6.4.4's Po = 0.85·f′c·(Ag − Ast) + fy·Ast.
func concreteSquash(fc units.Stress, ag, ast units.Area, fy units.Stress) units.Force {
	return units.ForceOn(0.85*fc, ag-ast) + units.ForceOn(fy, ast)
}

// aashtoCompact refuses a steel section with slender elements.
func aashtoCompact(m Member) error {
	s := m.Section
	ey := float64(aashtoE / m.SteelYield)
	switch s.Shape {
	case pile.HSection:
		if bt := float64(s.Width / (2 * s.Flange)); bt > 0.56*math.Sqrt(ey) {
			return fieldErrorf("candidate.section.flange", "b/t = %.3g exceeds 0.56·√(E/Fy) = %.3g (AASHTO 6.9.4.2): a slender flange is not covered", bt, 0.56*math.Sqrt(ey))
		}
		if ht := float64((s.Depth - 2*s.Flange) / s.Web); ht > 1.49*math.Sqrt(ey) {
			return fieldErrorf("candidate.section.web", "h/tw = %.3g exceeds 1.49·√(E/Fy) = %.3g (AASHTO 6.9.4.2): a slender web is not covered", ht, 1.49*math.Sqrt(ey))
		}
	default:
		if dt := float64(s.Diameter / s.Wall); dt > 0.11*ey {
			return fieldErrorf("candidate.section.wall", "D/t = %.3g exceeds 0.11·E/Fy = %.3g (AASHTO 6.9.4.2): a slender pipe wall is not covered", dt, 0.11*ey)
		}
	}
	return nil
}

// Eurocode is the rule of EN 1992-1-1 (concrete) and EN 1993-1-1 (steel)
// for a pile designed to EN 1997-1:
//
//	concrete  NRd = fcd·Ac + σsd·As,  fcd = αcc·fck/(kf·γc),  σsd = min(fyk/γs, Es·εc2)
//	steel     Npl,Rd = A·fy/γM0                                 (EN 1993-1-1 6.2.4, eq. 6.10)
//
// with αcc = 1.0 (3.1.6(1), recommended; a national annex may take 0.85),
// γc = 1.5 and γs = 1.15 (Table 2.1N, persistent situations), kf = 1.1
// for cast-in-place piles without permanent casing (2.4.2.5(2)), else 1;
// Es = 200 GPa (3.2.7(4)) and εc2 = 2.0 ‰ for fck ≤ 50 MPa, 2.0 +
// 0.085·(fck − 50)^0.53 ‰ above (Table 3.1), the strain limit of a section
// in pure compression (6.1(5)); γM0 = 1.0 (6.1, recommended). A bored or
// augered circle without permanent casing is designed on the diameter of
// 2.3.4.2(2): d − 20 mm for d < 0.4 m, 0.95·d for 0.4 ≤ d ≤ 1.0 m,
// d − 50 mm above; Ac = π·d²/4 − As. The recommended values are from
// memory. A steel section in Class 4 (Table 5.2, ε = √(235 MPa/fy):
// pipe d/t > 90·ε², H outstand flange c/tf > 14·ε with c = (b − tw)/2,
// web c/tw > 42·ε with c = d − 2tf; root radii left out, on the safe side)
// is refused.
type Eurocode struct {
	// AlphaCC is αcc, 0.8 to 1; 0 means 1.0.
	AlphaCC float64
}

// ID returns "en".
func (Eurocode) ID() string { return "en" }

// Refs returns EN 1992-1-1 and EN 1993-1-1.
func (Eurocode) Refs() []cite.Ref {
	return []cite.Ref{{Source: cite.EN1992, Where: "2.3.4.2(2), 2.4.2.5(2), 3.1.6(1), 3.2.7(4), 6.1(5), Tables 2.1N and 3.1 (from memory)"},
		{Source: cite.EN1993, Where: "6.2.4 eq. 6.10, Table 5.2, 6.1 γM0 (from memory)"}}
}

const (
	enGammaC  = 1.5
	enGammaS  = 1.15
	enKf      = 1.1
	enGammaM0 = 1.0
	enEs      = 200 * units.Gigapascal
)

// DesignDiameter returns the diameter used in design for a cast-in-place
// pile without permanent casing, EN 1992-1-1 2.3.4.2(2).
func DesignDiameter(d units.Length) units.Length {
	switch {
	case d < 0.4*units.Metre:
		return d - 20*units.Millimetre
	case d <= 1.0*units.Metre:
		return 0.95 * d
	}
	return d - 50*units.Millimetre
}

// epsC2 returns εc2 of EN 1992-1-1 Table 3.1 for fck.
func epsC2(fck units.Stress) float64 {
	if f := fck.MPa(); f > 50 {
		return (2.0 + 0.085*math.Pow(f-50, 0.53)) / 1000
	}
	return 0.002
}

// Compression returns NRd or Npl,Rd (see Eurocode).
func (e Eurocode) Compression(m Member) (Resistance, error) {
	if err := m.Validate("candidate"); err != nil {
		return Resistance{}, err
	}
	acc := e.AlphaCC
	if acc == 0 {
		acc = 1
	}
	if !(acc >= 0.8 && acc <= 1) {
		return Resistance{}, fieldErrorf("alpha_cc", "%g is outside 0.8 to 1", acc)
	}
	r := Resistance{Rule: e.ID(), Refs: e.Refs(), Notes: []string{fullyEmbedded}}
	if m.IsSteel() {
		if err := enClass(m); err != nil {
			return Resistance{}, err
		}
		a := m.Section.MaterialArea()
		chi, col, err := steelColumn("en", m, m.Column)
		if err != nil {
			return Resistance{}, err
		}
		r.Material, r.SteelArea = "steel", a
		r.Nominal = squash(m.SteelYield, a)
		r.Squash = r.Nominal
		r.Design = units.Force(chi) * r.Nominal / enGammaM0
		r.Factor = float64(r.Design / r.Nominal)
		r.Equation = fmt.Sprintf("Npl,Rd = A·fy/γM0 = %.6g mm² × %.4g MPa / %.2g = %.6g kN", mm2(a), mpa(m.SteelYield), enGammaM0, kn(r.Design))
		if col != "" {
			r.Equation = fmt.Sprintf("Nb,Rd = χ·A·fy/γM1 = %.4g × %.6g mm² × %.4g MPa / 1.0 = %.6g kN; %s", chi, mm2(a), mpa(m.SteelYield), kn(r.Design), col)
			r.Notes = []string{"a column over the free length given (EN 1993-1-1 6.3.1, flexural buckling about the weaker axis); bending at the head is not checked"}
		}
		r.Notes = append(r.Notes, "cross-section in Class 1 to 3 (EN 1993-1-1 Table 5.2)")
		r.Refs = r.Refs[1:]
		return r, nil
	}
	kf := 1.0
	ag := m.Section.GrossArea()
	if m.castInPlace() {
		kf = enKf
		if m.Section.Shape == pile.Circle {
			r.DesignDiameter = DesignDiameter(m.Section.Diameter)
			ag = units.Circle(r.DesignDiameter)
		} else {
			r.Notes = append(r.Notes, "EN 1992-1-1 2.3.4.2(2) reduces a diameter; a non-circular cast-in-place section is taken at its nominal size")
		}
	}
	as := m.Rebar
	ac := ag - as
	fcd := units.Stress(acc) * m.Concrete / units.Stress(enGammaC*kf)
	fyd := m.RebarYield / enGammaS
	lim := units.Stress(float64(enEs) * epsC2(m.Concrete))
	ssd := min(fyd, lim)
	r.Material, r.ConcreteArea, r.SteelArea = "concrete", ac, as
	r.Design = units.ForceOn(fcd, ac) + units.ForceOn(ssd, as)
	r.Nominal = units.ForceOn(m.Concrete, ac) + units.ForceOn(min(m.RebarYield, lim), as)
	r.Squash = r.Nominal
	r.Factor = float64(r.Design / r.Nominal)
	r.Equation = fmt.Sprintf("NRd = fcd·Ac + σsd·As, fcd = αcc·fck/(kf·γc) = %.3g × %.4g MPa / (%.2g × %.2g) = %.4g MPa; σsd = min(fyk/γs, Es·εc2) = %.4g MPa; NRd = %.4g MPa × %.6g mm² + %.4g MPa × %.6g mm² = %.6g kN",
		acc, mpa(m.Concrete), kf, enGammaC, mpa(fcd), mpa(ssd), mpa(fcd), mm2(ac), mpa(ssd), mm2(as), kn(r.Design))
	if r.DesignDiameter > 0 {
		r.Notes = append(r.Notes, fmt.Sprintf("cast in place without permanent casing: design diameter %.4g mm (EN 1992-1-1 2.3.4.2(2)) and γc × kf = %.2g × %.2g (2.4.2.5(2))",
			r.DesignDiameter.Millimetres(), enGammaC, kf))
	}
	if as > 0 && lim < fyd {
		r.Notes = append(r.Notes, fmt.Sprintf("the bars' stress is limited to Es·εc2 = %.4g MPa in pure compression (EN 1992-1-1 6.1(5))", mpa(lim)))
	}
	r.Refs = r.Refs[:1]
	return r, nil
}

// enClass refuses a Class 4 steel section (EN 1993-1-1 Table 5.2).
func enClass(m Member) error {
	s := m.Section
	eps := math.Sqrt(235 / m.SteelYield.MPa())
	switch s.Shape {
	case pile.HSection:
		if ct := float64((s.Width - s.Web) / 2 / s.Flange); ct > 14*eps {
			return fieldErrorf("candidate.section.flange", "c/tf = %.3g exceeds 14ε = %.3g (EN 1993-1-1 Table 5.2): a Class 4 flange is not covered", ct, 14*eps)
		}
		if ct := float64((s.Depth - 2*s.Flange) / s.Web); ct > 42*eps {
			return fieldErrorf("candidate.section.web", "c/tw = %.3g exceeds 42ε = %.3g (EN 1993-1-1 Table 5.2): a Class 4 web is not covered", ct, 42*eps)
		}
	default:
		if dt := float64(s.Diameter / s.Wall); dt > 90*eps*eps {
			return fieldErrorf("candidate.section.wall", "d/t = %.3g exceeds 90ε² = %.3g (EN 1993-1-1 Table 5.2): a Class 4 pipe is not covered", dt, 90*eps*eps)
		}
	}
	return nil
}

// Allowable is the allowable-stress rule used with a factor of safety:
// the unfactored load is checked against
//
//	concrete  Pa = fc·f′c·(Ag − As) + fr·fy·As
//	steel     Pa = fs·Fy·As
//
// with the allowable stresses of IBC 2018 §1810.3.2.6 (from memory):
// fc = 0.30 for concrete cast in place without a permanent casing (bored,
// augered), 0.33 for concrete in a permanent casing and for precast
// non-prestressed driven piles; fr = 0.40 on the bars; fs = 0.50 on the
// steel of pipes and H-sections. Fields left zero take these values;
// given, each is 0.1 to 0.6. A steel section with slender elements (the
// limits of AASHTO 6.9.4.2, see AASHTO) is refused.
type Allowable struct {
	Concrete, Rebar, Steel float64
}

// ID returns "allowable".
func (Allowable) ID() string { return "allowable" }

// Refs returns IBC 2018 §1810.3.2.6.
func (Allowable) Refs() []cite.Ref {
	return []cite.Ref{{Source: cite.IBC2018, Where: "§1810.3.2.6, allowable stresses of deep foundation materials (from memory)"}}
}

// Compression returns the allowable load (see Allowable).
func (a Allowable) Compression(m Member) (Resistance, error) {
	if err := m.Validate("candidate"); err != nil {
		return Resistance{}, err
	}
	for _, f := range []struct {
		n string
		v float64
	}{{"allowable.concrete", a.Concrete}, {"allowable.reinforcement", a.Rebar}, {"allowable.steel", a.Steel}} {
		if f.v != 0 && !(f.v >= 0.1 && f.v <= 0.6) {
			return Resistance{}, fieldErrorf(f.n, "%g is outside 0.1 to 0.6", f.v)
		}
	}
	pick := func(v, def float64) float64 {
		if v == 0 {
			return def
		}
		return v
	}
	r := Resistance{Rule: a.ID(), Refs: a.Refs(), Notes: []string{fullyEmbedded}}
	if m.IsSteel() {
		if err := aashtoCompact(m); err != nil {
			return Resistance{}, err
		}
		fs := pick(a.Steel, 0.50)
		as := m.Section.MaterialArea()
		red, col, err := steelColumn("allowable", m, m.Column)
		if err != nil {
			return Resistance{}, err
		}
		r.Material, r.SteelArea = "steel", as
		r.Squash = squash(m.SteelYield, as)
		r.Nominal = units.Force(red) * r.Squash
		r.Factor, r.Design = fs, units.Force(fs)*r.Nominal
		r.Equation = fmt.Sprintf("Pa = fs·Fy·As = %.3g × %.4g MPa × %.6g mm² = %.6g kN", fs, mpa(m.SteelYield), mm2(as), kn(r.Design))
		if col != "" {
			r.Equation = fmt.Sprintf("Pa = fs·Pn = %.3g × %.6g kN = %.6g kN; %s", fs, kn(r.Nominal), kn(r.Design), col)
			r.Notes = []string{"a column over the free length given: Pn by AASHTO 6.9.4.1.1 (the AISC 360 E3 curve), times the allowable fraction; bending at the head is not checked"}
		}
		return r, nil
	}
	def := 0.33
	if m.castInPlace() {
		def = 0.30
	}
	fc, fr := pick(a.Concrete, def), pick(a.Rebar, 0.40)
	ag, as := m.Section.GrossArea(), m.Rebar
	r.Material, r.ConcreteArea, r.SteelArea = "concrete", ag-as, as
	r.Nominal = units.ForceOn(m.Concrete, ag-as) + units.ForceOn(m.RebarYield, as)
	r.Squash = r.Nominal
	r.Design = units.ForceOn(units.Stress(fc)*m.Concrete, ag-as) + units.ForceOn(units.Stress(fr)*m.RebarYield, as)
	r.Factor = float64(r.Design / r.Nominal)
	r.Equation = fmt.Sprintf("Pa = fc·f′c·(Ag − As) + fr·fy·As = %.3g × %.4g MPa × %.6g mm² + %.3g × %.4g MPa × %.6g mm² = %.6g kN",
		fc, mpa(m.Concrete), mm2(ag-as), fr, mpa(m.RebarYield), mm2(as), kn(r.Design))
	return r, nil
}
