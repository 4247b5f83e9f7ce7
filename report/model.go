package report

import (
	"crypto/sha256"
	"encoding/hex"
	"fmt"
	"math"
	"strings"

	"github.com/qultgeo/qult/bearing"
	"github.com/qultgeo/qult/calc"
	"github.com/qultgeo/qult/insitu"
	"github.com/qultgeo/qult/pile"
	"github.com/qultgeo/qult/shaft"
	"github.com/qultgeo/qult/units"
)

// The text, Markdown and HTML writers render one document model: sections
// of blocks (paragraphs, label-value items, tables, equations, lists),
// built once from the result by build.

// cell is a table or item value: text, or a number formatted by the writer.
type cell struct {
	s   string
	v   float64
	num bool
}

func txt(s string) cell  { return cell{s: s} }
func num(v float64) cell { return cell{v: v, num: true} }
func (c cell) str(n int) string {
	if c.num {
		return fmtNum(c.v, n)
	}
	return c.s
}

type column struct{ name, unit string }

// header returns "name (unit)" or the name alone.
func (c column) header() string {
	if c.unit == "" {
		return c.name
	}
	return c.name + " (" + c.unit + ")"
}

type table struct {
	cols []column
	rows [][]cell
	// listInText renders the table in Text as one wrapped list entry per
	// row (for tables of sentences, too wide for columns).
	listInText bool
	// key is how many leading columns name a row; Text repeats them in
	// every part of a table split to fit the width (0 means 1).
	key int
}

type item struct {
	label string
	val   cell
	unit  string
}

// block is one of: a paragraph, items, a table, equations, a list, and for
// HTML only an inline SVG figure (ours, not escaped) or preformatted text.
type block struct {
	para  string
	items []item
	tbl   *table
	eqs   []string
	list  []string
	svg   string
	pre   string
	fig   string  // figure caption
	draw  *figure // the figure as a drawing (for PDF); nil for SVG-only figures
}

// figBlock is a block holding figure f with caption cap.
func figBlock(f figure, cap string) block { return block{svg: f.svg, draw: &f, fig: cap} }

type section struct {
	heading string
	blocks  []block
}

type doc struct {
	title    string
	sections []section
}

// build assembles the document of view o.View.
func build(r *calc.Result, o Options) *doc {
	c := conv{o.sys}
	d := &doc{title: r.Title}
	if d.title == "" {
		d.title = "qult calculation"
	}
	add := func(s section) {
		if len(s.blocks) > 0 {
			d.sections = append(d.sections, s)
		}
	}
	add(secTitle(r, o))
	warnings := secList("Warnings", allWarnings(r, c))
	switch o.View {
	case ViewCheck:
		add(secLoads(r, c))
		add(secTotals(r, c))
		add(secDesign(r, c))
		add(secServiceability(r, c))
		add(secGroup(r, c))
		add(secDowndrag(r, c))
	case ViewCapacity:
		add(secShaft(r, c))
		add(secTip(r, c))
		add(secTotals(r, c))
		add(secCompared(r, c))
		add(secDefaults(r, c))
	case ViewLength:
		add(secLength(r, c))
		add(secDowndragLength(r, c))
		add(secWithDepth(r, c))
	case ViewReport:
		// The summary a reviewer reads first, then the warnings, then the
		// inputs and the derivation in the order it runs.
		add(secSummary(r, c))
		add(warnings)
		add(secPile(r, c))
		add(secLoads(r, c))
		add(secLayers(r, c))
		add(secStresses(r, c))
		add(secShaft(r, c))
		add(secTip(r, c))
		add(secTotals(r, c))
		add(secCompared(r, c))
		add(secDesign(r, c))
		add(secLength(r, c))
		add(secWithDepth(r, c))
		add(secSettlement(r, c))
		add(secLoadTest(r, c))
		add(secDowndrag(r, c))
		add(secReliability(r, c))
		add(secGroup(r, c))
		add(secCandidates(r, c))
		add(secSounding(r, c))
		add(secSPT(r, c))
		add(secDefaults(r, c))
	case ViewChoose:
		add(secCandidates(r, c))
	case ViewReliability:
		add(secTotals(r, c))
		add(secReliability(r, c))
	case ViewSettle:
		add(secLoads(r, c))
		add(secTotals(r, c))
		add(secSettlement(r, c))
		add(secLoadTest(r, c))
		if r.Settlement == nil && r.LoadTest == nil {
			add(section{heading: "Settlement", blocks: []block{{para: "The calc file has no settlement or load_test section."}}})
		}
	}
	if o.View != ViewReport {
		add(warnings)
	}
	if o.View == ViewReport {
		var src []string
		for _, s := range sources(r) {
			src = append(src, s.String())
		}
		add(secList("Sources cited", src))
	}
	// Every view an engineer may act on carries the cautions.
	cautions := r.Cautions
	if len(cautions) == 0 {
		cautions = calc.CautionText()
	}
	add(secList("Cautions", cautions))
	if o.View == ViewReport && len(r.Source) > 0 {
		add(section{heading: headAppendix, blocks: []block{
			{para: "The calc file exactly as read (SHA-256 " + SourceHash(r) + "), line by line; a line too long for the page continues on the next (marked » in text and PDF)."},
			{pre: string(r.Source)}}})
	}
	return d
}

// headAppendix is the heading of the appendix with the calc file.
const headAppendix = "Appendix: the calc file as entered"

// SourceHash returns the SHA-256 of the calc file as entered (r.Source),
// in hexadecimal, or "" when the result has no source text. Printed pages
// carry it (or its first 12 digits) so that they can be tied to the file
// that produced them.
func SourceHash(r *calc.Result) string {
	if r == nil || len(r.Source) == 0 {
		return ""
	}
	h := sha256.Sum256(r.Source)
	return hex.EncodeToString(h[:])
}

// secSummary is what a reviewer reads first: the verdict, the governing
// case and its utilisation, the required length, the serviceability check
// and how many warnings there are.
func secSummary(r *calc.Result, c conv) section {
	var it []item
	k := r.Breakdown.Capacity
	if d := r.Design; d != nil {
		verdict := "PASS: every design case has Ed/Rd ≤ 1"
		if !d.Pass {
			verdict = "FAIL: at least one design case has Ed/Rd > 1"
		}
		it = append(it, item{"Verdict", txt(verdict), ""}, item{"Design basis", txt(d.Basis), ""})
		if d.Governing >= 0 && d.Governing < len(d.Cases) {
			it = append(it, item{"Governing case", txt(d.Cases[d.Governing].Case), ""})
		}
		it = append(it, item{"Highest utilisation Ed/Rd", useCell(d.MaxUse()), ""})
	} else {
		it = append(it, item{"Verdict", txt("none: no design basis given (characteristic values only)"), ""})
	}
	it = append(it, item{"Pile", txt(fmt.Sprintf("%s %s, %s, length %s, tip at %s", r.Pile.Section.Shape, c.ls(r.Pile.Section.Size()),
		r.Pile.Installation, c.ls(r.Pile.Length), c.ls(r.Pile.Tip()))), ""},
		item{"Compression Rc (characteristic)", txt(c.fs(k.Compression)), ""},
		item{"Tension Rt (characteristic)", txt(c.fs(k.Tension)), ""})
	switch l := r.Length; {
	case l != nil && l.Found:
		it = append(it, item{"Required length", txt(fmt.Sprintf("%s (tip at %s; governed by %s)", c.ls(l.Length), c.ls(l.TipDepth), l.Governs)), ""})
	case l != nil:
		it = append(it, item{"Required length", txt("none found within the search (see Required length)"), ""})
	case r.Design != nil:
		it = append(it, item{"Required length", txt("not found (see the warnings)"), ""})
	}
	if s := r.Settlement; s != nil {
		v := "pass"
		if !r.ServiceabilityPass() {
			v = "FAIL"
		}
		switch {
		case s.Plunged:
			v += fmt.Sprintf(": the pile cannot carry %s (%s)", c.fs(s.Load), s.Method)
		case s.HasAllowable:
			v += fmt.Sprintf(": %s at %s against %s allowed (%s)", c.sms(s.Settlement), c.fs(s.Load), c.sms(s.Allowable), s.Method)
		default:
			v += fmt.Sprintf(": %s at %s, no allowable given (%s)", c.sms(s.Settlement), c.fs(s.Load), s.Method)
		}
		it = append(it, item{"Serviceability", txt(v), ""})
	}
	if g := r.Group; g != nil {
		it = append(it, item{"Pile group", txt(groupSummary(g, c)), ""})
	}
	if d := r.Downdrag; d != nil {
		it = append(it, item{"Downdrag", txt(downdragVerdict(d, c)), ""})
	}
	n := len(allWarnings(r, c))
	w := "none"
	if n > 0 {
		w = fmt.Sprintf("%d, listed under Warnings below", n)
	}
	it = append(it, item{"Warnings", txt(w), ""})
	return section{heading: "Summary", blocks: []block{{items: it}}}
}

func date(r *calc.Result, o Options) string {
	if o.Date != "" {
		return o.Date
	}
	return r.Date
}

func secTitle(r *calc.Result, o Options) section {
	var it []item
	for _, kv := range [][2]string{{"Project", r.Project}, {"Revision", r.Revision}, {"Engineer", r.Engineer},
		{"Date", date(r, o)}, {"qult version", r.Version}, {"Verification", o.Verification},
		{"Calc file SHA-256", SourceHash(r)}, {"Display units", o.sys.String()}} {
		if kv[1] != "" {
			it = append(it, item{label: kv[0], val: txt(kv[1])})
		}
	}
	return section{heading: "", blocks: []block{{items: it}}}
}

func secPile(r *calc.Result, c conv) section {
	p := r.Pile
	s := p.Section
	it := []item{
		{"Section", txt(s.Shape.String()), ""},
		{"Size (diameter or width)", num(c.L(s.Size())), c.uL()},
	}
	if s.Wall > 0 {
		it = append(it, item{"Wall", num(c.L(s.Wall)), c.uL()})
	}
	it = append(it,
		item{"Gross area", num(c.A(s.GrossArea())), c.uA()},
		item{"Material area", num(c.A(s.MaterialArea())), c.uA()},
		item{"Outer perimeter", num(c.L(s.OuterPerimeter())), c.uL()},
		item{"Length", num(c.L(p.Length)), c.uL()},
		item{"Head depth", num(c.L(p.HeadDepth)), c.uL()},
		item{"Tip depth", num(c.L(p.Tip())), c.uL()},
		item{"Installation", txt(p.Installation.String()), ""},
	)
	if s.CanPlug() {
		it = append(it, item{"Plug", txt(p.Plug.String()), ""})
	}
	if p.Modulus > 0 {
		v, u := c.modulus(p.Modulus)
		it = append(it, item{"Young's modulus", num(v), u})
	}
	if p.UnitWeight > 0 {
		it = append(it, item{"Unit weight of pile", num(c.G(p.UnitWeight)), c.uG()})
	}
	return section{heading: "Pile", blocks: []block{{items: it}}}
}

func secLayers(r *calc.Result, c conv) section {
	t := &table{cols: []column{{"Layer", ""}, {"Top", c.uL()}, {"Bottom", c.uL()}, {"Drainage", ""},
		{"φ′", "deg"}, {"c′", c.uS()}, {"su top", c.uS()}, {"su bottom", c.uS()},
		{"γ", c.uG()}, {"γsat", c.uG()}, {"γ′", c.uG()}, {"Weights", ""}, {"Shaft", ""}, {"Tip", ""}}}
	zd := designGround(r)
	cut := zd > 0
	if cut {
		t.cols = append(t.cols, column{"Removed", c.uL()})
	}
	for i, l := range r.Layers {
		row := []cell{txt(l.Name), num(c.L(l.Top)), num(c.L(l.Bottom)), txt(l.Drainage.String()),
			optNum(l.Phi.Degrees(), l.Phi > 0), optNum(c.S(l.Cohesion), l.Cohesion > 0),
			optNum(c.S(l.SuTop), l.HasSu), optNum(c.S(l.SuBottom), l.HasSu),
			optNum(c.G(l.UnitWeight), l.UnitWeight > 0), optNum(c.G(l.SaturatedUnitWeight), l.SaturatedUnitWeight > 0),
			optNum(c.G(l.SubmergedUnitWeight), l.SaturatedUnitWeight > 0), txt(l.Basis.String())}
		shaftM, tipM := "", ""
		if i < len(r.Methods) {
			shaftM, tipM = r.Methods[i].Shaft, r.Methods[i].Tip
		}
		row = append(row, txt(dash(shaftM)), txt(dash(tipM)))
		if cut {
			row = append(row, optNum(c.L(l.Removed), l.Removed > 0))
		}
		t.rows = append(t.rows, row)
	}
	zw, wet := r.Ground.WaterDepth()
	water := "none (dry site)"
	if wet {
		water = c.ls(zw) + " below ground"
		if zw < 0 {
			water = c.ls(-zw) + " of free water above ground"
		}
	}
	gi := []item{{"Water table", txt(water), ""}, {"γw", num(c.G(r.Ground.WaterUnitWeight())), c.uG()}}
	var cutNote []block
	if cut {
		gl := r.Ground.GroundLines()
		gi = append(gi, item{"Original ground line", num(c.L(gl.Original)), c.uL()})
		if gl.Excavation > 0 {
			gi = append(gi, item{"Excavation floor", num(c.L(gl.Excavation)), c.uL()})
		}
		if gl.GeneralScour > gl.Excavation {
			gi = append(gi, item{"General scour line", num(c.L(gl.GeneralScour)), c.uL()})
		}
		gi = append(gi, item{"Design ground line", num(c.L(gl.Design)), c.uL()})
		cutNote = []block{{para: fmt.Sprintf("The soil above the design ground line at %s (excavation and scour; depths from the original ground) is removed: its weight is left out of σ′v below, and it gives no shaft or tip resistance. Removed is the thickness cut from each layer.", c.ls(gl.Design))}}
	}
	return section{heading: "Ground profile", blocks: append([]block{
		{items: gi},
		{tbl: t}}, append(cutNote, []block{
		{para: "Weights: given = as entered; phase = derived from dry unit weight, void ratio, water content or specific gravity by phase relations; assumed-dry and assumed-saturated mark an assumption where data were missing. γ′ = γsat − γw."},
	}...)...)}
}

func dash(s string) string {
	if s == "" {
		return "-"
	}
	return s
}

func optNum(v float64, ok bool) cell {
	if !ok {
		return txt("-")
	}
	return num(v)
}

func secStresses(r *calc.Result, c conv) section {
	t := &table{cols: []column{{"Depth", c.uL()}, {"σv", c.uS()}, {"u", c.uS()}, {"σ′v", c.uS()}}}
	for _, p := range r.Stresses {
		t.rows = append(t.rows, []cell{num(c.L(p.Depth)), num(c.S(p.Total)), num(c.S(p.Pore)), num(c.S(p.Effective))})
	}
	return section{heading: "Vertical stress", blocks: []block{{para: "Total stress σv, pore pressure u and effective stress σ′v = σv − u at each break of the profile; linear between."}, {tbl: t}}}
}

func secLoads(r *calc.Result, c conv) section {
	l := r.Loads
	if l.Compression.Permanent == 0 && l.Compression.Variable == 0 && l.Tension.Permanent == 0 && l.Tension.Variable == 0 {
		return section{}
	}
	return section{heading: "Loads (characteristic)", blocks: []block{{items: []item{
		{"Compression, permanent", num(c.F(l.Compression.Permanent)), c.uF()},
		{"Compression, variable", num(c.F(l.Compression.Variable)), c.uF()},
		{"Tension, permanent", num(c.F(l.Tension.Permanent)), c.uF()},
		{"Tension, variable", num(c.F(l.Tension.Variable)), c.uF()},
	}}}}
}

// shaftTable is the per-segment table.
func shaftTable(r *calc.Result, c conv) *table {
	t := &table{cols: []column{{"Top", c.uL()}, {"Bottom", c.uL()}, {"Layer", ""}, {"Method", ""},
		{"σ′v top", c.uS()}, {"σ′v bottom", c.uS()}, {"su top", c.uS()}, {"su bottom", c.uS()},
		{"fs top", c.uS()}, {"fs bottom", c.uS()}, {"∫fs dz", c.uQ()}, {"Perimeter", c.uL()}, {"Qs", c.uF()}}, key: 2}
	for _, w := range r.Breakdown.Rows {
		hasSu := w.SuTop > 0 || w.SuBottom > 0
		fsOK := w.Method != "none" && w.Method != "lambda"
		t.rows = append(t.rows, []cell{num(c.L(w.Top)), num(c.L(w.Bottom)), txt(w.LayerName), txt(w.Method),
			num(c.S(w.SigmaTop)), num(c.S(w.SigmaBottom)), optNum(c.S(w.SuTop), hasSu), optNum(c.S(w.SuBottom), hasSu),
			optNum(c.S(w.At[0].Fs), fsOK), optNum(c.S(w.At[1].Fs), fsOK),
			num(c.Q(w.Integral)), num(c.L(w.Perimeter)), num(c.F(w.Force))})
	}
	return t
}

func secShaft(r *calc.Result, c conv) section {
	b := r.Breakdown
	blocks := []block{{para: "One row per segment between layer boundaries, the water table and any critical depth; fs at the segment ends, ∫fs dz the exact integral over the segment, Qs = perimeter × ∫fs dz."}, {tbl: shaftTable(r, c)}}
	if b.Lambda != nil {
		l := b.Lambda
		blocks = append(blocks, block{para: fmt.Sprintf("λ method: embedded length L = %s, mean σ′v = %s and mean su = %s over the layers using it, λ = %s, fs,av = %s (its rows show no end values).",
			c.ls(l.Length), c.ss(l.SigmaV), c.ss(l.Su), fmtNum(l.Lambda, sig), c.ss(l.Fav))})
	}
	if z := noShaftList(r, c); len(z) > 0 {
		blocks = append(blocks, block{para: "Segments without side resistance, and why:"}, block{list: z})
	}
	if eq := shaftEquations(r, c); len(eq) > 0 {
		blocks = append(blocks, block{para: "Worked equations (the bottom of the first segment of each method):"}, block{eqs: eq})
	}
	// The scope of each method used, from the catalogue of methods.
	var scopes []string
	seen := map[string]bool{}
	for _, row := range b.Rows {
		if d, ok := shaft.Lookup(row.Method); ok && d.Scope != "" && !seen[row.Method] {
			seen[row.Method] = true
			scopes = append(scopes, row.Method+": "+d.Scope)
		} else if d, ok := insitu.LookupDirect(insitu.ShaftPart, row.Method); ok && !seen[row.Method] {
			seen[row.Method] = true
			scopes = append(scopes, row.Method+": "+d.Scope)
		}
	}
	if len(scopes) > 0 {
		blocks = append(blocks, block{para: "Scope of the shaft methods used:"}, block{list: scopes})
	}
	return section{heading: "Shaft resistance", blocks: blocks}
}

// noShaftList names each stretch of shaft without side resistance and says
// why; adjacent segments of one layer with the same reason (split at the
// water table, say) are one stretch.
func noShaftList(r *calc.Result, c conv) []string {
	type stretch struct {
		top, bot    units.Length
		layer       int
		name, cause string
	}
	var ss []stretch
	for _, w := range r.Breakdown.Rows {
		if w.Method != "none" {
			continue
		}
		why := noShaftReason(r, w)
		if n := len(ss); n > 0 && ss[n-1].layer == w.Layer && ss[n-1].cause == why && ss[n-1].bot == w.Top {
			ss[n-1].bot = w.Bottom
			continue
		}
		ss = append(ss, stretch{w.Top, w.Bottom, w.Layer, w.LayerName, why})
	}
	var out []string
	for _, s := range ss {
		out = append(out, fmt.Sprintf("%s to %s (%s): %s", c.ls(s.top), c.ls(s.bot), s.name, s.cause))
	}
	return out
}

// shaftEquations writes each shaft method's equation once with the
// numbers of the bottom end of its first segment.
func shaftEquations(r *calc.Result, c conv) []string {
	var out []string
	seen := map[string]bool{}
	for _, w := range r.Breakdown.Rows {
		if w.Method == "none" || seen[w.Method] {
			continue
		}
		seen[w.Method] = true
		a := w.At[1]
		head := fmt.Sprintf("%s (%s, z = %s): ", w.Method, w.LayerName, c.ls(w.Bottom))
		var e string
		switch {
		case w.Method == "lambda" && r.Breakdown.Lambda != nil:
			l := r.Breakdown.Lambda
			e = fmt.Sprintf("fs,av = λ·(σ̄′v + 2·s̄u) = %s × (%s + 2 × %s) = %s", fmtNum(l.Lambda, sig), c.ss(l.SigmaV), c.ss(l.Su), c.ss(l.Fav))
		case a.K > 0 && a.Delta > 0:
			if a.KRatio > 0 && a.K0 > 0 {
				out = append(out, head+fmt.Sprintf("K = (K/K0)·K0 = %s × %s = %s", fmtNum(a.KRatio, sig), fmtNum(a.K0, sig), fmtNum(a.K, sig)))
			} else if a.KRatio > 0 && a.Kp > 0 {
				out = append(out, head+fmt.Sprintf("K = (K/Kp)·Kp = %s × %s = %s", fmtNum(a.KRatio, sig), fmtNum(a.Kp, sig), fmtNum(a.K, sig)))
			}
			e = fmt.Sprintf("fs = K·σ′v·tan δ = %s × %s × tan %s° = %s", fmtNum(a.K, sig), c.ss(a.SigmaV), fmtNum(a.Delta.Degrees(), sig), c.ss(a.Unlimited))
		case a.Beta > 0:
			e = fmt.Sprintf("fs = β·σ′v = %s × %s = %s", fmtNum(a.Beta, sig), c.ss(a.SigmaV), c.ss(a.Unlimited))
		case a.Alpha > 0:
			su := w.SuBottom
			e = fmt.Sprintf("fs = α·su = %s × %s = %s", fmtNum(a.Alpha, sig), c.ss(su), c.ss(a.Unlimited))
			switch {
			case a.Psi > 0:
				e += fmt.Sprintf(" (ψ = su/σ′v = %s)", fmtNum(a.Psi, sig))
			case a.SuPa > 0:
				e += fmt.Sprintf(" (su/pa = %s)", fmtNum(a.SuPa, sig))
			}
		default:
			e = fmt.Sprintf("%s gives fs = %s", w.Equation, c.ss(a.Fs))
		}
		if a.Unlimited != a.Fs && w.Method != "lambda" {
			e += fmt.Sprintf("; limited to fs = %s", c.ss(a.Fs))
		}
		out = append(out, head+e)
		out = append(out, head+fmt.Sprintf("Qs = p·∫fs dz = %s × %s = %s (segment %s to %s)", c.ls(w.Perimeter), c.qs(w.Integral), c.fs(w.Force), c.ls(w.Top), c.ls(w.Bottom)))
	}
	return out
}

func secTip(r *calc.Result, c conv) section {
	t := r.Breakdown.Tip
	res := t.Result
	it := []item{
		{"Tip depth", num(c.L(t.Depth)), c.uL()},
		{"Layer", txt(t.LayerName), ""},
		{"Method", txt(t.Method), ""},
	}
	if d, ok := bearing.Lookup(t.Method); ok && d.Scope != "" {
		it = append(it, item{"Method's scope", txt(d.Scope), ""}) // from the catalogue of methods
	} else if d, ok := insitu.LookupDirect(insitu.TipPart, t.Method); ok && res.Cone.Q > 0 {
		it = append(it, item{"Method's scope", txt(d.Scope), ""})
	}
	if res.Rule != "" {
		it = append(it, item{"Rule used by the method", txt(res.Rule), ""})
	}
	it = append(it, item{"q′ = σ′v at the tip", num(c.S(t.Input.Q)), c.uS()})
	if t.Input.Phi > 0 {
		it = append(it, item{"φ′", num(t.Input.Phi.Degrees()), "deg"})
	}
	if t.Input.Su > 0 {
		it = append(it, item{"su", num(c.S(t.Input.Su)), c.uS()})
	}
	if t.Input.N60 > 0 {
		it = append(it, item{"N60", num(t.Input.N60), ""})
	}
	if res.Nq > 0 {
		it = append(it, item{"Nq", num(res.Nq), ""})
	}
	if res.Nc > 0 {
		it = append(it, item{"Nc", num(res.Nc), ""})
	}
	if res.Ir > 0 {
		it = append(it, item{"Ir", num(res.Ir), ""})
		if res.DeltaBy == bearing.DeltaGiven || res.DeltaBy == bearing.DeltaCorrelation {
			it = append(it, item{"Δ (" + res.DeltaBy.String() + ")", num(res.Delta), ""})
		} else {
			why := "not used"
			switch {
			case res.DeltaBy == bearing.DeltaUndrained:
				why = "0 (undrained)"
			case res.Flags&bearing.VolumeChangeIgnored != 0:
				why = "not used (volume change ignored)"
			}
			it = append(it, item{"Δ", txt(why), ""})
		}
	}
	if res.Irr > 0 {
		it = append(it, item{"Irr", num(res.Irr), ""})
	}
	if cn := res.Cone; cn.Q > 0 {
		it = append(it, item{"Cone zone averaged, top", num(c.L(cn.Top)), c.uL()},
			item{"Cone zone averaged, bottom", num(c.L(cn.Bottom)), c.uL()})
		if cn.Raw > 0 {
			it = append(it, item{"Mean over the zone before clipping", num(c.S(cn.Raw)), c.uS()},
				item{"Clipped to", txt(fmt.Sprintf("%s to %s %s", fmtNum(c.S(0.7*cn.Raw), sig), fmtNum(c.S(1.3*cn.Raw), sig), c.uS())), ""})
		}
		if cn.Below > 0 || cn.Above > 0 {
			it = append(it, item{"qc1 (below the tip, minimum path)", num(c.S(cn.Below)), c.uS()},
				item{"qc2 (above the tip, minimum path)", num(c.S(cn.Above)), c.uS()})
		}
		it = append(it, item{"Cone resistance averaged", num(c.S(cn.Q)), c.uS()},
			item{"Factor on it", num(cn.Factor), ""})
	}
	it = append(it, item{"qp before limit", num(c.S(res.Unlimited)), c.uS()})
	if res.Limit > 0 {
		it = append(it, item{"Limit", num(c.S(res.Limit)), c.uS()})
	}
	if res.Reduction > 0 {
		it = append(it, item{"Reduction factor (installation, size)", num(res.Reduction), ""})
	}
	if res.Cap > 0 {
		it = append(it, item{"Drilled-shaft cap", num(c.S(res.Cap)), c.uS()})
	}
	it = append(it, item{"Method's own qp", num(c.S(t.Own)), c.uS()})
	if t.Flags&pile.EmbedmentRamp != 0 {
		it = append(it, item{"Embedment Lb", num(c.L(embedment(r))), c.uL()},
			item{"(Lb/D)cr·D", num(c.L(t.EmbedLength)), c.uL()},
			item{"Embedment factor", num(t.EmbedFactor), ""})
	}
	if t.Upper > 0 {
		it = append(it, item{"Upper layer's qp (layered rule)", num(c.S(t.Upper)), c.uS()})
	}
	if t.WeakLayer >= 0 {
		it = append(it, item{"q_strong", num(c.S(t.Strong)), c.uS()},
			item{"q_weak (weaker layer below)", num(c.S(t.Weak)), c.uS()},
			item{"H to the weaker layer", num(c.L(t.H)), c.uL()},
			item{"10 D", num(c.L(t.WeakZone)), c.uL()})
	}
	it = append(it, item{"qp used", num(c.S(t.Qp)), c.uS()},
		item{"Area", num(c.A(t.Area)), c.uA()},
		item{"Qp", num(c.F(t.Force)), c.uF()})
	blocks := []block{{items: it}, {para: "Method's equation: " + t.Equation}}
	if b := settlementBasis(t); b != "" {
		blocks = append(blocks, block{para: "Settlement basis of qp: " + b + "."})
	}
	if m := append(t.Flags.Messages(), bearingNotes(res.Flags)...); len(m) > 0 {
		blocks = append(blocks, block{para: "Notes: " + strings.Join(m, "; ") + "."})
	}
	blocks = append(blocks, block{para: "Worked equations, each rule in the order applied:"}, block{eqs: tipSteps(r, c)})
	return section{heading: "Tip resistance", blocks: blocks}
}

// bearingNotes names the tip method's own notes that the pile's flags do
// not already carry (the limit and a chart edge reach them as TipLimit and
// ChartEdge).
func bearingNotes(f bearing.Flags) []string {
	f &^= bearing.LimitGoverns | bearing.Clamped
	if f == 0 {
		return nil
	}
	return strings.Split(f.String(), "; ")
}

func secTotals(r *calc.Result, c conv) section {
	k := r.Breakdown.Capacity
	it := []item{
		{"Tip Qp", num(c.F(k.Tip)), c.uF()},
		{"Shaft Qs", num(c.F(k.Shaft)), c.uF()},
		{"Pile weight W′", num(c.F(k.Weight)), c.uF()},
		{"Compression Rc", num(c.F(k.Compression)), c.uF()},
		{"Shaft in tension", num(c.F(k.TensionShaft)), c.uF()},
		{"Tension Rt", num(c.F(k.Tension)), c.uF()},
	}
	if r.Pile.Section.CanPlug() {
		mode := "unplugged"
		if k.Plugged {
			mode = "plugged"
		}
		it = append(it, item{"Governing mode", txt(mode), ""})
	}
	rc := "Rc = Qp + Qs = " + c.fs(k.Tip) + " + " + c.fs(k.Shaft)
	if math.Abs(float64(k.Compression-k.Tip-k.Shaft)) > 1e-6*math.Abs(float64(k.Compression))+1e-9 {
		// The gross self-weight option subtracts W′: the symbols say so.
		rc = "Rc = Qp + Qs − W′ = " + c.fs(k.Tip) + " + " + c.fs(k.Shaft) + " − " + c.fs(k.Weight)
	}
	rc += " = " + c.fs(k.Compression)
	rt := "Rt = Qs,t + W′ = " + c.fs(k.TensionShaft) + " + " + c.fs(k.Weight) + " = " + c.fs(k.Tension)
	return section{heading: "Characteristic capacity", blocks: []block{{items: it}, {eqs: []string{rc, rt}}}}
}

func useCell(u float64) cell {
	if u >= 1e6 {
		return txt("> 1e6")
	}
	return num(u)
}

func passText(p bool) string {
	if p {
		return "pass"
	}
	return "FAIL"
}

func secDesign(r *calc.Result, c conv) section {
	d := r.Design
	if d == nil {
		return section{heading: "Design check", blocks: []block{{para: "No design basis given: characteristic values only."}}}
	}
	t := &table{cols: []column{{"Case", ""}, {"Compression Ed", c.uF()}, {"Compression Rd", c.uF()}, {"Compression Ed/Rd", ""},
		{"Tension Ed", c.uF()}, {"Tension Rd", c.uF()}, {"Tension Ed/Rd", ""}, {"Result", ""}}}
	for _, v := range d.Cases {
		t.rows = append(t.rows, []cell{txt(v.Case), num(c.F(v.CompressionEd)), num(c.F(v.CompressionRd)), useCell(v.CompressionUse),
			num(c.F(v.TensionEd)), num(c.F(v.TensionRd)), useCell(v.TensionUse), txt(passText(v.Pass))})
	}
	gov := ""
	if d.Governing >= 0 && d.Governing < len(d.Cases) {
		gov = d.Cases[d.Governing].Case
	}
	it := []item{{"Basis", txt(d.Basis), ""}, {"Governing case", txt(gov), ""}, {"Highest utilisation", useCell(d.MaxUse()), ""}, {"Result", txt(passText(d.Pass)), ""}}
	return section{heading: "Design check", blocks: []block{{items: it}, {tbl: t},
		{para: "Ed is the design action, Rd the design resistance of the case; the pile passes when Ed/Rd ≤ 1 in every case and direction."}}}
}

func secLength(r *calc.Result, c conv) section {
	l := r.Length
	if l == nil {
		msg := "No required length: it needs a design basis and loads."
		if r.Design != nil {
			msg = "No required length was found (see the warnings)."
		}
		return section{heading: "Required length", blocks: []block{{para: msg}}}
	}
	search := block{para: fmt.Sprintf("Search: candidate tip depths from one step below the head down to %s in steps of %s; a tip passes only where every deeper candidate down to that limit passes too.",
		c.ls(l.MaxTip), c.ls(l.Step))}
	var blocks []block
	if !l.Found {
		blocks = []block{{para: "No tip depth within the search passes every design case: " + strings.TrimPrefix(notFound(*l, c), "no pile length passes: ") + "."}, search}
	} else {
		blocks = []block{{items: []item{
			{"Tip depth", num(c.L(l.TipDepth)), c.uL()},
			{"Length", num(c.L(l.Length)), c.uL()},
			{"Governs", txt(l.Governs), ""},
			{"Utilisation there", useCell(l.Use), ""},
		}}, search}
	}
	if len(l.Passing) > 1 || (!l.Found && len(l.Passing) > 0) {
		t := &table{cols: []column{{"Passing from", c.uL()}, {"to", c.uL()}}}
		for _, p := range l.Passing {
			t.rows = append(t.rows, []cell{num(c.L(p.From)), num(c.L(p.To))})
		}
		blocks = append(blocks, block{para: "Ranges of tip depth that pass (a shorter pile passes where a longer one fails):"}, block{tbl: t})
	}
	if len(l.Warnings) > 0 {
		var w []string
		nf := l.NotFound()
		for _, s := range l.Warnings {
			if s != nf { // the not-found sentence is the paragraph above
				w = append(w, s)
			}
		}
		if len(w) > 0 {
			blocks = append(blocks, block{list: w})
		}
	}
	return section{heading: "Required length", blocks: blocks}
}

// withDepthTable is the capacity with depth.
func withDepthTable(r *calc.Result, c conv) *table {
	t := &table{cols: []column{{"Tip depth", c.uL()}, {"qp", c.uS()}, {"Qp", c.uF()}, {"Qs", c.uF()}, {"W′", c.uF()},
		{"Rc", c.uF()}, {"Rt", c.uF()}}}
	des := len(r.DesignWithDepth) == len(r.WithDepth) && len(r.DesignWithDepth) > 0
	if des {
		t.cols = append(t.cols, column{"Rc,d", c.uF()})
	}
	t.cols = append(t.cols, column{"Tip rules", ""})
	for i, k := range r.WithDepth {
		row := []cell{num(c.L(k.TipDepth)), num(c.S(k.UnitTip)), num(c.F(k.Tip)), num(c.F(k.Shaft)), num(c.F(k.Weight)),
			num(c.F(k.Compression)), num(c.F(k.Tension))}
		if des {
			row = append(row, num(c.F(r.DesignWithDepth[i])))
		}
		row = append(row, txt(dash(strings.Join(tipRuleNames(k.Flags), ", "))))
		t.rows = append(t.rows, row)
	}
	return t
}

// tipRuleNames are short names of the tip rules that act at one tip depth
// (for the capacity with depth); a rule switched off where it would act is
// named in capitals.
func tipRuleNames(f pile.Flags) []string {
	var out []string
	for _, n := range []struct {
		f    pile.Flags
		name string
	}{{pile.TipLimit, "limit"}, {pile.EmbedmentRamp, "ramp"}, {pile.EmbedmentOff, "RAMP OFF"}, {pile.LayeredTip, "layered"},
		{pile.WeakLayerReduced, "weak below"}, {pile.WeakLayerOff, "WEAK BELOW OFF"}} {
		if f&n.f != 0 {
			out = append(out, n.name)
		}
	}
	return out
}

func secWithDepth(r *calc.Result, c conv) section {
	if len(r.WithDepth) == 0 {
		return section{heading: "Capacity with depth", blocks: []block{{para: "Not computed (see the warnings)."}}}
	}
	p := "Characteristic capacity for each tip depth (same pile, head fixed). Tip rules names those acting on qp at that depth: the method's limit, Meyerhof's embedment ramp, the layered transition into a stronger layer and the reduction above a weaker layer (in capitals where switched off)."
	if len(r.DesignWithDepth) == len(r.WithDepth) {
		p += " Rc,d is the design compression resistance of the governing case."
	}
	return section{heading: "Capacity with depth", blocks: []block{{para: p}, {tbl: withDepthTable(r, c)}}}
}

func secList(h string, l []string) section {
	if len(l) == 0 {
		if h == "Warnings" {
			return section{heading: h, blocks: []block{{para: "None."}}}
		}
		return section{}
	}
	return section{heading: h, blocks: []block{{list: l}}}
}
