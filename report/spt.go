package report

import (
	"fmt"
	"strings"

	"github.com/qultgeo/qult/calc"
	"github.com/qultgeo/qult/insitu"
)

const headSPT = "Standard penetration tests"

// sptFlags spells out what CorrectSPT assumed for one test.
func sptFlags(f insitu.SPTFlag) []string {
	var out []string
	if f&insitu.FlagEnergyAssumed != 0 {
		out = append(out, "ER assumed")
	}
	if f&insitu.FlagRodFromDepth != 0 {
		out = append(out, "rod = depth + stick-up")
	}
	if f&insitu.FlagBoreholeAssumed != 0 {
		out = append(out, "CB = 1 (hole not recorded)")
	}
	if f&insitu.FlagCNLimited != 0 {
		out = append(out, "CN limited to 1.7")
	}
	return out
}

// secSPT is the borehole's SPTs: what was read, each test corrected with
// what was assumed and what was derived by which correlation, and the
// means over each layer, with the note that none of it enters the
// capacity.
func secSPT(r *calc.Result, c conv) section {
	s := r.SPT
	if s == nil {
		return section{}
	}
	items := []item{
		{"File", txt(fmt.Sprintf("%s (%s)", s.File, s.Format)), ""},
		{"Borehole", txt(s.Hole), ""},
		{"Tests", num(float64(len(s.Tests))), ""},
	}
	if s.EnergyRatio > 0 {
		items = append(items, item{"Energy ratio where not recorded (given)", num(s.EnergyRatio), "%"})
	}
	items = append(items, item{"Rod above ground where rod length not recorded", num(c.L(s.StickUp)), c.uL()})
	if s.PhiBy != "" {
		items = append(items, item{"φ′ of tests in drained layers by", txt(s.PhiBy), ""})
	}
	if s.F1 > 0 {
		items = append(items, item{"su of tests in undrained layers by su-stroud, f1", num(c.S(s.F1)), c.uS()})
	}
	blocks := []block{{items: items},
		{para: "Each test: N60 = N·CE·CB·CS·CR with CE = ER/60 and CB, CS, CR as tabulated (Skempton 1986); (N1)60 = CN·N60 with CN = (pa/σ′v)^0.5 ≤ 1.7, pa = 100 kPa (Liao & Whitman 1986), σ′v from the ground above. φ′ = √(20·(N1)60) + 20° (hatanaka-uchida) or arctan[(N60/(12.2 + 20.3·σ′v/pa))^0.34] (kulhawy-mayne-n60); su = f1·N60 (su-stroud, Stroud 1974). Layer means are arithmetic means of the tests inside the layer."}}
	tt := &table{cols: []column{{"Depth", c.uL()}, {"Layer", ""}, {"N", ""}, {"ER", "%"}, {"CE", ""}, {"CB", ""}, {"CS", ""}, {"CR", ""},
		{"N60", ""}, {"σ′v", c.uS()}, {"CN", ""}, {"(N1)60", ""}, {"φ′", "deg"}, {"su", c.uS()}, {"By", ""}, {"Assumed", ""}}}
	for _, t := range s.Tests {
		phi, su := txt(""), txt("")
		if t.Phi > 0 {
			phi = num(t.Phi.Degrees())
		}
		if t.Su > 0 {
			su = num(c.S(t.Su))
		}
		by := t.By
		if t.Source != "" {
			by += ", " + t.Source
		}
		if t.Note != "" {
			by = "none: " + t.Note
		}
		tt.rows = append(tt.rows, []cell{num(c.L(t.Test.Depth)), txt(t.Layer), num(t.Test.N), num(60 * t.CE), num(t.CE), num(t.CB), num(t.CS), num(t.CR),
			num(t.N60), num(c.S(t.SigmaVEff)), num(t.CN), num(t.N160), phi, su, txt(by), txt(strings.Join(sptFlags(t.Flags), "; "))})
	}
	blocks = append(blocks, block{tbl: tt})
	lt := &table{cols: []column{{"Layer", ""}, {"Top", c.uL()}, {"Bottom", c.uL()}, {"Tests", ""}, {"Mean N60", ""}, {"n60 given", ""},
		{"Mean (N1)60", ""}, {"Mean φ′", "deg"}, {"Mean su", c.uS()}, {"Of tests", ""}}}
	for _, l := range s.Layers {
		given := txt("")
		if l.N60Given > 0 {
			given = num(l.N60Given)
		}
		if l.Tests == 0 {
			lt.rows = append(lt.rows, []cell{txt(l.Name), num(c.L(l.Top)), num(c.L(l.Bottom)), num(0), txt("no test"), given, txt(""), txt(""), txt(""), txt("")})
			continue
		}
		phi, su := txt(""), txt("")
		if l.Phi > 0 {
			phi = num(l.Phi.Degrees())
		}
		if l.Su > 0 {
			su = num(c.S(l.Su))
		}
		lt.rows = append(lt.rows, []cell{txt(l.Name), num(c.L(l.Top)), num(c.L(l.Bottom)), num(float64(l.Tests)), num(l.N60), given, num(l.N160), phi, su,
			num(float64(l.Estimates))})
	}
	blocks = append(blocks, block{para: "Means over each layer of the ground (the mean φ′ or su over the tests that gave one: \"of tests\"):"}, block{tbl: lt})
	blocks = append(blocks, block{para: "The tests are reported beside the calculation: their N60, (N1)60, φ′ and su are not used in the capacity. A method that reads N60 takes the layer's own n60, written by the engineer. Correlations are empirical; compare them with laboratory tests and site-specific experience."})
	return section{heading: headSPT, blocks: blocks}
}

type jSPT struct {
	File        string      `json:"file"`
	Format      string      `json:"format"`
	Hole        string      `json:"hole"`
	EnergyRatio *jnum       `json:"energy_ratio_given_percent,omitempty"`
	StickUp     qty         `json:"stick_up"`
	PhiBy       string      `json:"phi_by,omitempty"`
	F1          *qty        `json:"f1,omitempty"`
	Tests       []jSPTTest  `json:"tests"`
	Layers      []jSPTLayer `json:"layers"`
	Note        string      `json:"note"`
}

type jSPTTest struct {
	Depth       qty      `json:"depth"`
	Layer       string   `json:"layer"`
	N           jnum     `json:"n"`
	EnergyRatio jnum     `json:"energy_ratio_percent"`
	RodLength   qty      `json:"rod_length"`
	CE          jnum     `json:"ce"`
	CB          jnum     `json:"cb"`
	CS          jnum     `json:"cs"`
	CR          jnum     `json:"cr"`
	N60         jnum     `json:"n60"`
	SigmaVEff   qty      `json:"effective_vertical_stress"`
	CN          jnum     `json:"cn"`
	N160        jnum     `json:"n1_60"`
	Phi         *qty     `json:"friction_angle,omitempty"`
	Su          *qty     `json:"su,omitempty"`
	By          string   `json:"by,omitempty"`
	BySource    string   `json:"by_source,omitempty"`
	Note        string   `json:"not_estimated,omitempty"`
	Assumed     []string `json:"assumed"`
}

type jSPTLayer struct {
	Name      string `json:"name"`
	Top       qty    `json:"top"`
	Bottom    qty    `json:"bottom"`
	Tests     int    `json:"tests"`
	N60       *jnum  `json:"mean_n60,omitempty"`
	N160      *jnum  `json:"mean_n1_60,omitempty"`
	N60Given  *jnum  `json:"n60_given,omitempty"`
	Phi       *qty   `json:"mean_friction_angle,omitempty"`
	Su        *qty   `json:"mean_su,omitempty"`
	Estimates int    `json:"estimates"`
}

func sptJSON(r *calc.Result, c jconv) *jSPT {
	s := r.SPT
	if s == nil {
		return nil
	}
	j := &jSPT{File: s.File, Format: s.Format, Hole: s.Hole, StickUp: c.L(s.StickUp), PhiBy: s.PhiBy,
		Tests: []jSPTTest{}, Layers: []jSPTLayer{}, Note: "reported beside the calculation: not used in the capacity"}
	if s.EnergyRatio > 0 {
		j.EnergyRatio = jn(s.EnergyRatio)
	}
	j.F1 = opt(c.S(s.F1), s.F1 > 0)
	for _, t := range s.Tests {
		a := sptFlags(t.Flags)
		if a == nil {
			a = []string{}
		}
		j.Tests = append(j.Tests, jSPTTest{Depth: c.L(t.Test.Depth), Layer: t.Layer, N: jnum(t.Test.N), EnergyRatio: jnum(60 * t.CE),
			RodLength: c.L(t.RodLength), CE: jnum(t.CE), CB: jnum(t.CB), CS: jnum(t.CS), CR: jnum(t.CR), N60: jnum(t.N60),
			SigmaVEff: c.S(t.SigmaVEff), CN: jnum(t.CN), N160: jnum(t.N160),
			Phi: opt(c.deg(t.Phi), t.Phi > 0), Su: opt(c.S(t.Su), t.Su > 0), By: t.By, BySource: t.Source, Note: t.Note, Assumed: a})
	}
	for _, l := range s.Layers {
		jl := jSPTLayer{Name: l.Name, Top: c.L(l.Top), Bottom: c.L(l.Bottom), Tests: l.Tests, Estimates: l.Estimates}
		if l.Tests > 0 {
			jl.N60, jl.N160 = jn(l.N60), jn(l.N160)
		}
		if l.N60Given > 0 {
			jl.N60Given = jn(l.N60Given)
		}
		jl.Phi = opt(c.deg(l.Phi), l.Phi > 0)
		jl.Su = opt(c.S(l.Su), l.Su > 0)
		j.Layers = append(j.Layers, jl)
	}
	return j
}
