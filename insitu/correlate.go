package insitu

import (
	"fmt"
	"math"

	"github.com/qultgeo/qult/cite"
	"github.com/qultgeo/qult/units"
)

// Correlations are empirical and site-specific experience should govern
// their choice. Each is a value with our own identifier, its equation and
// its sources; the engineer picks one. Each doc says where its equation was
// read (source and page), or "from memory" where it was recalled and no
// printed copy was reached.

// sandLike is Robertson's (2009) boundary between sand-like (Ic ≤ 2.60,
// drained penetration) and clay-like behaviour.
const sandLike = 2.60

func checkSandLike(p *Point, what string) error {
	if !p.Valid() {
		return fmt.Errorf("insitu: %s at %g m: the reading was not normalised (flags %d)", what, p.Depth.Metres(), p.Flags)
	}
	if p.Ic > sandLike {
		return fmt.Errorf("insitu: %s at %g m: Ic = %.2f is above %.2f; the correlation is for sand-like soils (Ic ≤ %.2f)",
			what, p.Depth.Metres(), p.Ic, sandLike, sandLike)
	}
	return nil
}

// CPTFriction estimates φ′ of a sand-like soil from an interpreted reading.
type CPTFriction interface {
	ID() string
	Equation() string
	Refs() []cite.Ref
	Phi(p *Point) (units.Angle, error)
}

// PhiQtn is Kulhawy & Mayne's (1990) peak friction angle from the
// normalised cone resistance, in the form Robertson & Cabal (2015) give:
//
//	φ′ = 17.6° + 11°·log Qtn
//
// for uncemented, unaged quartz sands (Ic ≤ 2.60). Read: the equation
// φp = 17.60 + 11·log(Qtn) as printed in the CPT interpretation summary of
// a site report (public records copy, publicdocs.santa-ana.org document
// 111870, p. 119). Neither Kulhawy & Mayne (1990) nor Robertson & Cabal
// (2015) was reached; their attribution is from memory. Kulhawy & Mayne's
// own normalisation of qt (exponent 0.5) is not Robertson's iterated Qtn;
// the two agree where n ≈ 0.5, in clean sand.
type PhiQtn struct{}

func (PhiQtn) ID() string       { return "kulhawy-mayne-qtn" }
func (PhiQtn) Equation() string { return "φ′ = 17.6° + 11°·log Qtn" }
func (PhiQtn) Refs() []cite.Ref {
	return []cite.Ref{{Source: cite.KulhawyMayne1990}, {Source: cite.RobertsonCabal2015, Where: "friction angle of sands"}}
}

// Phi returns φ′ for a sand-like reading.
func (PhiQtn) Phi(p *Point) (units.Angle, error) {
	if err := checkSandLike(p, "φ′ (kulhawy-mayne-qtn)"); err != nil {
		return 0, err
	}
	return units.Angle((17.6 + 11*math.Log10(p.Qtn)) * float64(units.Degree)), nil
}

// PhiQcRatio is Robertson & Campanella's (1983) friction angle of
// uncemented quartz sand (Ic ≤ 2.60):
//
//	tan φ′ = [log(qc/σ′v) + 0.29] / 2.68
//
// with qt for qc (equal in sand, where u2 ≈ u0). Equation from memory: no
// printed copy of the paper, nor of a manual or textbook giving it, was
// reached.
type PhiQcRatio struct{}

func (PhiQcRatio) ID() string       { return "robertson-campanella" }
func (PhiQcRatio) Equation() string { return "tan φ′ = [log(qc/σ′v) + 0.29]/2.68" }
func (PhiQcRatio) Refs() []cite.Ref {
	return []cite.Ref{{Source: cite.RobertsonCampanella1983}}
}

// Phi returns φ′ for a sand-like reading.
func (PhiQcRatio) Phi(p *Point) (units.Angle, error) {
	if err := checkSandLike(p, "φ′ (robertson-campanella)"); err != nil {
		return 0, err
	}
	return units.Atan((math.Log10(float64(p.Qt/p.SigmaVEff)) + 0.29) / 2.68), nil
}

// DensityQtn is the relative density of clean, uncemented, unaged quartz
// sand from the normalised cone resistance (Kulhawy & Mayne 1990, as
// simplified in Robertson & Cabal 2015):
//
//	Dr = √(Qtn / K),  K = 350 when zero (range 300 to 400 stated)
//
// returned as a fraction and not clamped: a value above 1 is returned with
// an error, since it says the correlation does not fit the soil. Equation
// and the range of K from memory: no printed copy was reached.
type DensityQtn struct{ K float64 }

func (DensityQtn) ID() string       { return "dr-qtn" }
func (DensityQtn) Equation() string { return "Dr = √(Qtn/K), K ≈ 350" }
func (DensityQtn) Refs() []cite.Ref {
	return []cite.Ref{{Source: cite.KulhawyMayne1990}, {Source: cite.RobertsonCabal2015, Where: "relative density"}}
}

// Dr returns the relative density (a fraction) of a sand-like reading.
func (d DensityQtn) Dr(p *Point) (float64, error) {
	k := d.K
	if k == 0 {
		k = 350
	}
	if !(k >= 300 && k <= 400) {
		return 0, fmt.Errorf("insitu: dr-qtn: K = %g is outside 300 to 400", k)
	}
	if err := checkSandLike(p, "Dr (dr-qtn)"); err != nil {
		return 0, err
	}
	dr := math.Sqrt(p.Qtn / k)
	if dr > 1 {
		return dr, fmt.Errorf("insitu: Dr (dr-qtn) at %g m: %.2f exceeds 1; the correlation does not fit this reading", p.Depth.Metres(), dr)
	}
	return dr, nil
}

// StrengthNkt is the undrained shear strength of a clay-like soil
// (Ic > 2.60) from the net cone resistance:
//
//	su = (qt − σv) / Nkt
//
// Nkt is given by the engineer, from site-specific testing where possible.
// Read: Mayne & Peuchen (2018), abstract (CPT'18, ch. 58, p. 1), give
// su = qnet/Nkt with qnet = qt − σvo, and Nkt back-figured from 407
// triaxial compression (CAUC) tests on 62 clays between 8 and 25,
// decreasing with Bq. That it typically lies between 10 and 18 with 14 an
// average (Robertson & Cabal 2015) is from memory. Accepted: 6 to 30 (our
// bounds, around the 8 to 25 read).
type StrengthNkt struct{ Nkt float64 }

func (StrengthNkt) ID() string       { return "su-nkt" }
func (StrengthNkt) Equation() string { return "su = (qt − σv)/Nkt" }
func (StrengthNkt) Refs() []cite.Ref {
	return []cite.Ref{{Source: cite.MaynePeuchen2018, Where: "abstract: su = qnet/Nkt, Nkt 8 to 25"},
		{Source: cite.RobertsonCabal2015, Where: "undrained shear strength"}, {Source: cite.Robertson2009}}
}

// Su returns su for a clay-like reading.
func (s StrengthNkt) Su(p *Point) (units.Stress, error) {
	if !(s.Nkt >= 6 && s.Nkt <= 30) {
		return 0, fmt.Errorf("insitu: su-nkt: Nkt = %g is outside 6 to 30 (typically 10 to 18)", s.Nkt)
	}
	if !p.Valid() {
		return 0, fmt.Errorf("insitu: su (su-nkt) at %g m: the reading was not normalised (flags %d)", p.Depth.Metres(), p.Flags)
	}
	if p.Ic <= sandLike {
		return 0, fmt.Errorf("insitu: su (su-nkt) at %g m: Ic = %.2f is not above %.2f; the correlation is for clay-like soils",
			p.Depth.Metres(), p.Ic, sandLike)
	}
	return units.Stress(float64(p.Qnet) / s.Nkt), nil
}

// SPTFriction estimates φ′ of a sand from a corrected SPT.
type SPTFriction interface {
	ID() string
	Equation() string
	Refs() []cite.Ref
	Phi(c *CorrectedSPT) (units.Angle, error)
}

// PhiN160 is Hatanaka & Uchida's (1996) friction angle of sand, with
// (N1)60 first brought to the energy of the tests behind the correlation:
//
//	N1 = (N1)60 · 60/ER,   φ′ = √(20·N1) + 20°,   3.5 ≤ N1 ≤ 30
//
// Read: the abstract of the paper (Soils and Foundations 36(4), p. 1)
// prints φd = (20·N1)^0.5 + 20 for N1 between 3.5 and 30, N1 being the
// measured N normalised to an effective overburden of 98 kPa by Liao &
// Whitman's (1986) rule, from drained triaxial tests on samples taken by
// in-situ freezing. The abstract does not state the energy ratio of those
// (Japanese) tests. ENV 1997-3:1999, Annex D, Table D.1 (read) gives the
// Japanese donut hammer ERr = 65 % with two turns of rope and 78 % with an
// auto-trigger, both above the 60 % of (N1)60; N being inversely
// proportional to ERr (5.5.2(2)P, read), the same sand gives a smaller N1
// than (N1)60, and putting (N1)60 straight into the equation overstates φ′
// (by about 2.5° at (N1)60 = 20 if ER = 78 %).
//
// ER is the energy ratio, in percent, taken for the correlation's tests.
// Zero means 78 %, the higher Japanese value of Table D.1, which gives the
// lower φ′ (our choice; that Hatanaka & Uchida's hammer was the
// auto-trigger one is from memory). ER = 60 uses (N1)60 as N1 unchanged,
// as some textbooks do. Accepted: 45 to 100 %.
type PhiN160 struct{ ER float64 }

// DefaultHatanakaER is the energy ratio PhiN160 takes when ER is zero.
const DefaultHatanakaER = 78.0

func (PhiN160) ID() string { return "hatanaka-uchida" }
func (PhiN160) Equation() string {
	return "φ′ = √(20·N1) + 20°, N1 = (N1)60·60/ER, ER = 78 % unless given"
}
func (PhiN160) Refs() []cite.Ref {
	return []cite.Ref{{Source: cite.HatanakaUchida1996, Where: "abstract, p. 1"},
		{Source: cite.ENV1997Part3, Where: "Annex D, Table D.1: Japan, donut, ERr 65 % (rope) and 78 % (auto-trigger)"}}
}

// Phi returns φ′ in degrees converted to an angle.
func (h PhiN160) Phi(c *CorrectedSPT) (units.Angle, error) {
	er := h.ER
	if er == 0 {
		er = DefaultHatanakaER
	}
	if !(er >= 45 && er <= 100) {
		return 0, fmt.Errorf("insitu: hatanaka-uchida: energy ratio %g %% is outside 45 to 100 %%", er)
	}
	n1 := c.N160 * 60 / er
	if !(n1 >= 3.5 && n1 <= 30) {
		return 0, fmt.Errorf("insitu: φ′ (hatanaka-uchida) at %g m: N1 = (N1)60·60/%g = %.1f (from (N1)60 = %.1f) is outside 3.5 to 30",
			c.Test.Depth.Metres(), er, n1, c.N160)
	}
	return units.Angle((math.Sqrt(20*n1) + 20) * float64(units.Degree)), nil
}

// PhiN60Stress is Kulhawy & Mayne's (1990) fit to Schmertmann's chart:
//
//	φ′ = arctan[(N60 / (12.2 + 20.3·σ′v/pa))^0.34]
//
// Equation from memory: neither Kulhawy & Mayne (1990) nor a manual or
// textbook printing it was reached.
type PhiN60Stress struct{}

func (PhiN60Stress) ID() string       { return "kulhawy-mayne-n60" }
func (PhiN60Stress) Equation() string { return "φ′ = arctan[(N60/(12.2 + 20.3·σ′v/pa))^0.34]" }
func (PhiN60Stress) Refs() []cite.Ref { return []cite.Ref{{Source: cite.KulhawyMayne1990}} }

// Phi returns φ′.
func (PhiN60Stress) Phi(c *CorrectedSPT) (units.Angle, error) {
	if !(c.N60 > 0) || !(c.SigmaVEff > 0) {
		return 0, fmt.Errorf("insitu: φ′ (kulhawy-mayne-n60) at %g m: N60 = %g and σ′v = %g kPa must be positive",
			c.Test.Depth.Metres(), c.N60, c.SigmaVEff.KPa())
	}
	x := c.N60 / (12.2 + 20.3*float64(c.SigmaVEff/ReferencePressure))
	return units.Atan(math.Pow(x, 0.34)), nil
}

// StrengthN60 is Stroud's (1974) undrained shear strength of insensitive
// clay:
//
//	su = f1 · N60,  f1 from about 4 to 6 kPa (higher for low plasticity)
//
// Read: White et al. (2019), abstract (ECSMGE-2019, paper 0500, p. 1),
// define f1 as the ratio cu/N of Stroud (1974) and give a typical f1 of 4.0
// to 5.0 (kPa per blow) for a clay of plasticity index about 50 %, such as
// London Clay; they add that recent triaxial data give higher f1, which
// they put down to changes in SPT practice. f1 is given by the engineer;
// accepted 3.5 to 6.5 kPa (bounds from memory of Stroud's chart).
type StrengthN60 struct{ F1 units.Stress }

func (StrengthN60) ID() string       { return "su-stroud" }
func (StrengthN60) Equation() string { return "su = f1·N60" }
func (StrengthN60) Refs() []cite.Ref {
	return []cite.Ref{{Source: cite.Stroud1974}, {Source: cite.WhiteEtAl2019, Where: "abstract: f1 = cu/N, 4.0 to 5.0 at PI ≈ 50 %"}}
}

// Su returns su.
func (s StrengthN60) Su(c *CorrectedSPT) (units.Stress, error) {
	if !(s.F1 >= 3.5*units.Kilopascal && s.F1 <= 6.5*units.Kilopascal) {
		return 0, fmt.Errorf("insitu: su-stroud: f1 = %g kPa is outside 3.5 to 6.5 kPa", s.F1.KPa())
	}
	return units.Stress(c.N60 * float64(s.F1)), nil
}
