package report

import (
	"fmt"
	"image/color"
	"slices"
	"strings"

	"github.com/qultgeo/qult/calc"
	"github.com/qultgeo/qult/units"
	"gonum.org/v1/plot/plotter"
)

const headCandidates = "Candidate piles compared"

// steelMass converts a mass in kg for display: tonnes (SI) or pounds (US).
func (c conv) steelMass(kg float64) (float64, string) {
	if c.sys == units.US {
		return kg / 0.45359237, "lb"
	}
	return kg / 1000, "t"
}

// candidateSection is a candidate's section in words: "circle 600 mm",
// "closed-pipe 508 × 12.5 mm", "h-section 308 × 310 mm".
func candidateSection(r *calc.CandidateResult, c conv) string {
	s := r.Section
	mm := func(l units.Length) string {
		if c.sys == units.US {
			return fmtNum(l.Inches(), sig) + " in"
		}
		return fmtNum(l.Millimetres(), sig) + " mm"
	}
	unit := func(l units.Length) string { return strings.TrimSuffix(strings.TrimSuffix(mm(l), " mm"), " in") }
	switch s.Shape.String() {
	case "closed-pipe", "open-pipe":
		return fmt.Sprintf("%s %s × %s", s.Shape, unit(s.Diameter), mm(s.Wall))
	case "h-section":
		return fmt.Sprintf("%s %s × %s", s.Shape, unit(s.Depth), mm(s.Width))
	case "square":
		return fmt.Sprintf("%s %s", s.Shape, mm(s.Width))
	case "given":
		return fmt.Sprintf("%s %s wide", s.Shape, mm(s.Width))
	}
	return fmt.Sprintf("%s %s", s.Shape, mm(s.Size()))
}

// secCandidates is the comparison of the candidate piles: the ranking
// table, the recommended candidate, and why each failing one fails.
func secCandidates(r *calc.Result, c conv) section {
	k := r.Candidates
	if k == nil {
		return section{}
	}
	rec := "none: no candidate passes every check within the search"
	if k.Recommended >= 0 {
		x := &k.Rows[k.Recommended]
		rec = fmt.Sprintf("%s, %s long (tip at %s), governed by %s", x.Name, c.ls(x.Length), c.ls(x.TipDepth), x.Governs)
	}
	rule := map[string]string{"aashto": "AASHTO LRFD 5.6.4.4 (concrete), 6.9.4.1 (steel)", "en": "EN 1992-1-1 (concrete), EN 1993-1-1 (steel)",
		"allowable": "allowable stresses, IBC 2018 §1810.3.2.6"}[k.Rule]
	its := []item{
		{"Recommended", txt(rec), ""},
		{"Ranked by", txt(k.SortedBy), ""},
		{"Largest axial force Ed (each section checked against it)", num(c.F(k.Ed)), c.uF()},
		{"Structural rule", txt(rule), ""},
		{"Search", txt(fmt.Sprintf("tip depths in steps of %s down to %s", c.ls(k.Step), c.ls(k.MaxTip))), ""},
	}
	if k.Settlement {
		its = append(its, item{"Settlement", txt("checked at the serviceability load against the allowable settlement"), ""})
	}
	var drag []string
	for i := range k.Rows {
		if x := &k.Rows[i]; x.HasDowndrag {
			drag = append(drag, fmt.Sprintf("%s: neutral plane at %s, drag load Qn = %s %s, largest design axial force with it %s %s",
				x.Name, c.ls(x.NeutralPlane), fmtNum(c.F(x.DragLoad), sig), c.uF(), fmtNum(c.F(x.DowndragEd), sig), c.uF()))
		}
	}
	if len(drag) > 0 {
		for i := range its {
			if strings.HasPrefix(its[i].label, "Largest axial force") {
				its[i].label = "Largest axial force at the head Ed (before the drag load)"
			}
		}
		its = append(its, item{"Downdrag", txt("each candidate is checked at its length with the drag load (the downdrag section): the design cases without shaft resistance above the neutral plane, and its section against γG·Qd + γDD·Qn where that exceeds the Ed above"), ""})
	}
	_, mu := c.steelMass(0)
	cost := "Cost"
	if k.Currency != "" {
		cost += " (" + k.Currency + ")"
	}
	t := &table{key: 2, cols: []column{{"Rank", ""}, {"Candidate", ""}, {"Section", ""}, {"Installation", ""}, {"Length", c.uL()},
		{"Governs", ""}, {"Utilisation", ""}, {"Structure Ed/Rd", ""}, {"Settlement", c.uSm()}, {"Concrete", c.u(units.DimVolume)},
		{"Steel", mu}, {cost, ""}, {"Verdict", ""}}}
	var why []string
	for i := range k.Rows {
		x := &k.Rows[i]
		blank := txt("")
		length, conc, steel, money, settle := blank, blank, blank, blank, blank
		verdict := "FAIL"
		if x.Pass {
			verdict = "pass"
			if i == k.Recommended {
				verdict = "pass, recommended"
			}
			length = num(c.L(x.Length))
			conc = num(c.in(float64(x.Concrete), units.DimVolume))
			m, _ := c.steelMass(x.SteelMass)
			steel = num(m)
			if x.HasCost {
				money = num(x.Cost)
			}
		} else {
			why = append(why, fmt.Sprintf("%s: %s", x.Name, x.Why))
		}
		if x.HasSettlement {
			settle = num(c.sm(x.Settlement))
		}
		t.rows = append(t.rows, []cell{num(float64(i + 1)), txt(x.Name), txt(candidateSection(x, c)), txt(x.Installation.String()),
			length, txt(x.Governs), useCell(x.Use), useCell(x.Structural.Use), settle, conc, steel, money, txt(verdict)})
	}
	blocks := []block{{items: its}, {tbl: t}}
	if len(drag) > 0 {
		blocks = append(blocks, block{para: "Downdrag at each candidate's length (the last length tried where none passes):"}, block{list: drag})
	}
	if len(why) > 0 {
		blocks = append(blocks, block{para: "Candidates that do not pass, and how near they came:"}, block{list: why})
	}
	var eqs []string
	for i := range k.Rows {
		x := &k.Rows[i]
		eqs = append(eqs, x.Name+": "+x.Structural.Resistance.Equation)
	}
	blocks = append(blocks, block{para: "The section's axial resistance of each candidate (SI: kN, mm², MPa):"}, block{list: eqs})
	notes := slices.Clone(k.Notes)
	notes = append(notes, "Each length is the shortest on the search grid from which every longer one passes every geotechnical case (as qult length finds it); settlement, where checked, may lengthen it; the section's strength does not depend on the length, so a section that fails fails at every length.")
	blocks = append(blocks, block{list: notes})
	return section{heading: headCandidates, blocks: blocks}
}

// candidatePalette colours the installations of the length-against-
// diameter figure.
var candidatePalette = []color.Color{blue, red, green, orange, purple, black}

// candidatesSVG plots the required length against the diameter (or width)
// of the passing candidates, one line per installation and shape.
func candidatesSVG(r *calc.Result, c conv) (figure, bool, error) {
	k := r.Candidates
	type group struct {
		name string
		xy   plotter.XYs
	}
	var gs []*group
	find := func(name string) *group {
		for _, g := range gs {
			if g.name == name {
				return g
			}
		}
		g := &group{name: name}
		gs = append(gs, g)
		return g
	}
	n := 0
	for i := range k.Rows {
		x := &k.Rows[i]
		if !x.Pass {
			continue
		}
		g := find(fmt.Sprintf("%s %s", x.Installation, x.Section.Shape))
		size := x.Section.Size()
		d := size.Millimetres()
		if c.sys == units.US {
			d = size.Inches()
		}
		g.xy = append(g.xy, plotter.XY{X: d, Y: -c.L(x.Length)})
		n++
	}
	if n == 0 {
		return figure{}, false, nil
	}
	var ss []series
	for i, g := range gs {
		slices.SortFunc(g.xy, func(a, b plotter.XY) int {
			switch {
			case a.X < b.X:
				return -1
			case a.X > b.X:
				return 1
			}
			return 0
		})
		ss = append(ss, series{g.name, g.xy, candidatePalette[i%len(candidatePalette)], nil, len(g.xy) < 2})
	}
	du := "mm"
	if c.sys == units.US {
		du = "in"
	}
	f, err := svgPlot("Required length against size", "diameter or width ("+du+")", "required length ("+c.uL()+")", ss)
	return f, true, err
}

// candidatesFigures adds the figure to the candidates section (HTML, PDF).
func candidatesFigures(s *section, r *calc.Result, c conv) error {
	if s.heading != headCandidates || r.Candidates == nil {
		return nil
	}
	g, ok, err := candidatesSVG(r, c)
	if err != nil || !ok {
		return err
	}
	s.blocks = append(s.blocks, figBlock(g, "Required length of the candidates that pass against their diameter (or width), one line per installation and shape."))
	return nil
}

// JSON form of the comparison.
type jCandidates struct {
	Currency    string       `json:"currency,omitempty"`
	SortedBy    string       `json:"ranked_by"`
	Rule        string       `json:"structural_rule"`
	Ed          qty          `json:"largest_axial_force"`
	Step        qty          `json:"search_step"`
	MaxTip      qty          `json:"search_max_tip"`
	Settlement  bool         `json:"settlement_checked"`
	Recommended *string      `json:"recommended"`
	Rows        []jCandidate `json:"candidates"`
	Notes       []string     `json:"notes"`
}

type jCandidate struct {
	Rank          int         `json:"rank"`
	Name          string      `json:"name"`
	Key           string      `json:"key"`
	Shape         string      `json:"shape"`
	Size          qty         `json:"size"`
	Installation  string      `json:"installation"`
	Pass          bool        `json:"pass"`
	Length        *qty        `json:"length"`
	TipDepth      *qty        `json:"tip_depth"`
	Governs       string      `json:"governs"`
	Use           jnum        `json:"utilisation"`
	GeoUse        jnum        `json:"geotechnical_utilisation"`
	Structural    jStructural `json:"structural"`
	Settlement    *qty        `json:"settlement"`
	SettlementUse *jnum       `json:"settlement_utilisation"`
	NeutralPlane  *qty        `json:"neutral_plane,omitempty"`
	DragLoad      *qty        `json:"drag_load,omitempty"`
	DowndragEd    *qty        `json:"largest_axial_force_with_drag,omitempty"`
	Concrete      *qty        `json:"concrete_volume"`
	SteelMass     *jnum       `json:"steel_mass_kg"`
	Cost          *jnum       `json:"cost"`
	Why           string      `json:"why,omitempty"`
}

type jStructural struct {
	Rule       string   `json:"rule"`
	Material   string   `json:"material"`
	Resistance qty      `json:"design_resistance"`
	Nominal    qty      `json:"nominal_resistance"`
	Factor     jnum     `json:"factor"`
	Ed         qty      `json:"ed"`
	Use        jnum     `json:"utilisation"`
	Pass       bool     `json:"pass"`
	Equation   string   `json:"equation"`
	Notes      []string `json:"notes"`
}

func candidatesJSON(r *calc.Result, c jconv) *jCandidates {
	k := r.Candidates
	if k == nil {
		return nil
	}
	j := &jCandidates{Currency: k.Currency, SortedBy: k.SortedBy, Rule: k.Rule, Ed: c.F(k.Ed), Step: c.L(k.Step), MaxTip: c.L(k.MaxTip),
		Settlement: k.Settlement, Rows: []jCandidate{}, Notes: nonNil(k.Notes)}
	if k.Recommended >= 0 {
		j.Recommended = &k.Rows[k.Recommended].Name
	}
	capUse := func(u float64) jnum { return jnum(min(u, 1e9)) }
	for i := range k.Rows {
		x := &k.Rows[i]
		s := x.Structural
		jc := jCandidate{Rank: i + 1, Name: x.Name, Key: x.Path, Shape: x.Section.Shape.String(), Size: c.L(x.Section.Size()),
			Installation: x.Installation.String(), Pass: x.Pass, Governs: x.Governs, Use: capUse(x.Use), GeoUse: jnum(x.GeoUse), Why: x.Why,
			Structural: jStructural{Rule: s.Resistance.Rule, Material: s.Resistance.Material, Resistance: c.F(s.Resistance.Design),
				Nominal: c.F(s.Resistance.Nominal), Factor: jnum(s.Resistance.Factor), Ed: c.F(s.Ed), Use: capUse(s.Use), Pass: s.Pass,
				Equation: s.Resistance.Equation, Notes: nonNil(s.Resistance.Notes)}}
		if x.Pass {
			l, t := c.L(x.Length), c.L(x.TipDepth)
			v := c.q(float64(x.Concrete), units.DimVolume)
			m := jnum(x.SteelMass)
			jc.Length, jc.TipDepth, jc.Concrete, jc.SteelMass = &l, &t, &v, &m
			if x.HasCost {
				cost := jnum(x.Cost)
				jc.Cost = &cost
			}
		}
		if x.HasSettlement {
			s := c.L(x.Settlement)
			u := capUse(x.SettlementUse)
			jc.Settlement, jc.SettlementUse = &s, &u
		}
		if x.HasDowndrag {
			np, qn, ed := c.L(x.NeutralPlane), c.F(x.DragLoad), c.F(x.DowndragEd)
			jc.NeutralPlane, jc.DragLoad, jc.DowndragEd = &np, &qn, &ed
		}
		j.Rows = append(j.Rows, jc)
	}
	return j
}
