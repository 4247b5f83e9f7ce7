package report

import (
	"fmt"
	"math"
	"strings"

	"github.com/qultgeo/qult/bearing"
	"github.com/qultgeo/qult/calc"
	"github.com/qultgeo/qult/cite"
	"github.com/qultgeo/qult/pile"
	"github.com/qultgeo/qult/profile"
	"github.com/qultgeo/qult/units"
)

// This file reads, from a result, the rules that shaped the tip and the
// shaft and the defaults in force, for the tip block, the warnings and the
// reviewer's table of defaults.

// tipMethods are the bearing methods whose identifiers a tip block can
// name; settlementBasis looks a method up here to ask it for its basis.
func tipMethods() []bearing.Method {
	var ms []bearing.Method
	for _, m := range bearing.Drained() {
		ms = append(ms, m)
	}
	for _, m := range bearing.Undrained() {
		ms = append(ms, m)
	}
	return append(ms, bearing.BoredSand{}, bearing.BoredPhi{}, bearing.GivenNq{}, bearing.GivenNc{}, bearing.VesicGiven{})
}

// methodByID returns the bearing method with identifier id (a method
// wrapped for the large-base reduction has the suffix "+large-base"), or
// nil when the identifier is not one package bearing defines.
func methodByID(id string) bearing.Method {
	if in, ok := strings.CutSuffix(id, "+large-base"); ok {
		if m, ok := methodByID(in).(bearing.Tip); ok {
			return bearing.LargeBase{Of: m}
		}
		return nil
	}
	for _, m := range tipMethods() {
		if m.ID() == id {
			return m
		}
	}
	return nil
}

// settlementBasis returns the settlement basis of the tip value: that of
// the rule a composite method chose (Result.Rule) where there is one, else
// that of the method; "" when the method is not one bearing defines.
func settlementBasis(t pile.TipBlock) string {
	if t.Result.Rule != "" {
		if m := methodByID(t.Result.Rule); m != nil {
			return bearing.SettlementBasis(m)
		}
	}
	if m := methodByID(t.Method); m != nil {
		return bearing.SettlementBasis(m)
	}
	return ""
}

// resolved returns the calc file's inputs resolved again (the methods and
// switches the run used, which the result does not carry), or nil when the
// result has no decoded file.
func resolved(r *calc.Result) *calc.Inputs {
	if r.Input == nil {
		return nil
	}
	in, err := calc.Resolve(r.Input)
	if err != nil {
		return nil
	}
	return in
}

// designGround returns the depth of the design ground line (0 without a
// cut or without a profile).
func designGround(r *calc.Result) units.Length {
	if r.Ground == nil {
		return 0
	}
	return r.Ground.DesignGround()
}

// sources returns the sources of the result and those of its design ground
// line (scour), each once.
func sources(r *calc.Result) []cite.Source {
	out := append([]cite.Source(nil), r.Sources...)
	if r.Ground == nil {
		return out
	}
	seen := map[string]bool{}
	for _, s := range out {
		seen[s.Key] = true
	}
	for _, s := range cite.Collect(r.Ground.Refs()...) {
		if !seen[s.Key] {
			seen[s.Key] = true
			out = append(out, s)
		}
	}
	return out
}

// noShaftReason says why a segment carries no side resistance.
func noShaftReason(r *calc.Result, w pile.Row) string {
	if i := strings.Index(w.Equation, "("); i >= 0 && strings.HasSuffix(w.Equation, ")") {
		return w.Equation[i+1 : len(w.Equation)-1]
	}
	if zd := designGround(r); zd > 0 && w.Bottom <= zd+1e-9 {
		return "above the design ground line (excavation or scour): the soil is removed"
	}
	return "a zone without shaft resistance given in the calc file (methods.no_shaft or a layer's shaft method none)"
}

// bearingWarnings turns the tip method's own warnings that a reviewer must
// see into sentences (the others reach the pile flags or the tip block).
func bearingWarnings(f bearing.Flags) []string {
	var out []string
	if f&bearing.ReductionOff != 0 {
		out = append(out, "WARNING: a rule of the bored-pile tip that lowers it (the drilled-shaft cap or the large-base reduction) is switched off where it applies; the tip resistance may be unconservative")
	}
	if f&bearing.VolumeChangeIgnored != 0 {
		out = append(out, "WARNING: Vesic's tip takes Irr = Ir (volume change in the plastic zone ignored); with Δ from the correlation the tip resistance would be lower")
	}
	return out
}

// allWarnings gathers every warning of a result, in order and without
// repeats: the run's warnings, the flags of the capacity, of the tip and of
// every shaft segment, the tip method's own warnings, and those of the
// required-length search (the not-found sentence in display units).
func allWarnings(r *calc.Result, c conv) []string {
	var out []string
	seen := map[string]bool{}
	add := func(s ...string) {
		for _, x := range s {
			if x != "" && !seen[x] {
				seen[x] = true
				out = append(out, x)
			}
		}
	}
	add(r.Warnings...)
	b := r.Breakdown
	add(b.Capacity.Flags.Messages()...)
	add(b.Tip.Flags.Messages()...)
	for _, w := range b.Rows {
		add(w.Flags.Messages()...)
	}
	add(bearingWarnings(b.Tip.Result.Flags)...)
	if r.Design != nil {
		add(r.Design.Characteristic.Flags.Messages()...)
	}
	// A rule switched off at other tip depths matters to the capacity with
	// depth and the required length: say where.
	for _, f := range []pile.Flags{pile.WeakLayerOff, pile.EmbedmentOff, pile.DrilledZonesOff} {
		lo, hi, n := units.Length(0), units.Length(0), 0
		for _, k := range r.WithDepth {
			if k.Flags&f != 0 {
				if n == 0 {
					lo = k.TipDepth
				}
				hi = k.TipDepth
				n++
			}
		}
		if n > 0 {
			add(fmt.Sprintf("%s (capacity with depth: %d tip depths from %s to %s)", f.Messages()[0], n, c.ls(lo), c.ls(hi)))
		}
	}
	if l := r.Length; l != nil {
		nf := l.NotFound()
		for _, w := range l.Warnings {
			if nf != "" && w == nf {
				w = notFound(*l, c)
			}
			add(w)
		}
	}
	return out
}

// notFound is pile.LengthResult.NotFound in display units.
func notFound(l pile.LengthResult, c conv) string {
	gov := ""
	if l.BestGoverns != "" {
		gov = " (" + l.BestGoverns + ")"
	}
	return fmt.Sprintf("no pile length passes: the search ran to a tip depth of %s in steps of %s; the best utilisation reached was %s%s with the tip at %s",
		c.ls(l.MaxTip), c.ls(l.Step), useText(l.BestUse), gov, c.ls(l.BestTipDepth))
}

func useText(u float64) string {
	if u >= 1e6 {
		return "> 1e6"
	}
	return fmtNum(u, 3)
}

// tipSteps are the worked equations of the tip, one rule per line, in the
// order the rules apply: the method's own value (with Vesic's rigidity),
// its limit, the bored-pile rule, the cap and the large-base reduction,
// the embedment ramp, the layered transition and the weak-layer
// reduction, then the force.
func tipSteps(r *calc.Result, c conv) []string {
	t := r.Breakdown.Tip
	res := t.Result
	var out []string
	if res.Ir > 0 {
		out = append(out, vesicLine(res))
	}
	var terms, vals []string
	if res.Nq > 0 {
		sym := "q′"
		if math.Abs(float64(res.Sigma-t.Input.Q)) > 1e-9*math.Abs(float64(t.Input.Q)) {
			sym = "σ′o"
		}
		terms = append(terms, sym+"·Nq")
		vals = append(vals, fmt.Sprintf("%s × %s", c.ss(res.Sigma), fmtNum(res.Nq, sig)))
	}
	if res.Nc > 0 {
		terms = append(terms, "c·Nc")
		vals = append(vals, fmt.Sprintf("%s × %s", c.ss(res.C), fmtNum(res.Nc, sig)))
	}
	switch {
	case res.Cone.Q > 0:
		cn := res.Cone
		if cn.Raw > 0 {
			out = append(out, fmt.Sprintf("mean qc over %s to %s = %s; readings clipped to 0.7 × %s = %s and 1.3 × %s = %s; their mean q̄c = %s",
				c.ls(cn.Top), c.ls(cn.Bottom), c.ss(cn.Raw), c.ss(cn.Raw), c.ss(0.7*cn.Raw), c.ss(cn.Raw), c.ss(1.3*cn.Raw), c.ss(cn.Q)))
		} else if cn.Below > 0 || cn.Above > 0 {
			out = append(out, fmt.Sprintf("q̄c = (qc1 + qc2)/2 = (%s + %s)/2 = %s (zone %s to %s)", c.ss(cn.Below), c.ss(cn.Above), c.ss(cn.Q), c.ls(cn.Top), c.ls(cn.Bottom)))
		} else {
			out = append(out, fmt.Sprintf("q̄c = %s, averaged from %s to %s", c.ss(cn.Q), c.ls(cn.Top), c.ls(cn.Bottom)))
		}
		out = append(out, fmt.Sprintf("qp = factor·q̄c = %s × %s = %s", fmtNum(cn.Factor, sig), c.ss(cn.Q), c.ss(res.Unlimited)))
	case len(terms) > 0:
		out = append(out, fmt.Sprintf("qp = %s = %s = %s", strings.Join(terms, " + "), strings.Join(vals, " + "), c.ss(res.Unlimited)))
	default:
		out = append(out, fmt.Sprintf("%s: qp = %s", t.Method, c.ss(res.Unlimited)))
	}
	q := res.Unlimited
	if res.Limit > 0 {
		q = min(res.Unlimited, res.Limit)
		out = append(out, fmt.Sprintf("qp ≤ limit %s, so qp = min(%s, %s) = %s", c.ss(res.Limit), c.ss(res.Unlimited), c.ss(res.Limit), c.ss(q)))
	}
	out = append(out, reductionLines(t, c, q)...)
	if rl := ruleLines(r, c); len(rl) > 0 {
		out = append(out, fmt.Sprintf("the method's own qp at the tip = %s (%s); the pile's tip rules:", c.ss(t.Own), t.Method))
		out = append(out, rl...)
	}
	if rr := ruleResult(r); math.Abs(float64(t.Qp-rr)) > 1e-9*math.Abs(float64(rr))+1e-9 {
		out = append(out, fmt.Sprintf("qp used = %s", c.ss(t.Qp)))
	}
	out = append(out, fmt.Sprintf("Qp = qp·A = %s × %s = %s", c.ss(t.Qp), c.as(t.Area), c.fs(t.Force)))
	return out
}

// vesicLine writes Vesic's reduced rigidity as it was used.
func vesicLine(res bearing.Result) string {
	switch res.DeltaBy {
	case bearing.DeltaGiven, bearing.DeltaCorrelation:
		return fmt.Sprintf("Irr = Ir/(1 + Ir·Δ) = %s/(1 + %s × %s) = %s (Δ %s)", fmtNum(res.Ir, sig), fmtNum(res.Ir, sig),
			fmtNum(res.Delta, sig), fmtNum(res.Irr, sig), res.DeltaBy)
	case bearing.DeltaUndrained:
		return fmt.Sprintf("Irr = Ir = %s (Δ = 0: no volume change in undrained shear)", fmtNum(res.Irr, sig))
	}
	return fmt.Sprintf("Irr = Ir = %s (volume change ignored: Δ not used)", fmtNum(res.Irr, sig))
}

// boredFactor and largeBaseFactor split Result.Reduction into the
// installation factor of the rule used and the large-base factor.
func boredFactor(t pile.TipBlock) float64 {
	if t.Result.Rule == (bearing.BoredPhi{}).ID() || t.Method == (bearing.BoredPhi{}).ID() {
		return bearing.BoredPhiFactor
	}
	return 1
}

func largeBaseFactor(t pile.TipBlock) float64 {
	if t.Result.Reduction == 0 {
		return 1
	}
	return t.Result.Reduction / boredFactor(t)
}

// reductionLines writes the bored-pile reduction, the cap and the
// large-base reduction applied to q (the value after the limit), checked
// against the method's result: where the steps do not reproduce it, one
// line states the factor and the cap instead.
func reductionLines(t pile.TipBlock, c conv, q units.Stress) []string {
	res := t.Result
	if res.Reduction == 0 && res.Cap == 0 {
		return nil
	}
	var out []string
	fb, fl := boredFactor(t), largeBaseFactor(t)
	v := q
	if fb != 1 {
		v = units.Stress(fb * float64(v))
		out = append(out, fmt.Sprintf("bored pile (%s): qp = %s × %s = %s (Meyerhof 1976)", t.Result.Rule, fmtNum(fb, sig), c.ss(q), c.ss(v)))
	}
	if res.Cap > 0 {
		w := min(v, res.Cap)
		out = append(out, fmt.Sprintf("drilled-shaft cap: qp = min(%s, %s) = %s", c.ss(v), c.ss(res.Cap), c.ss(w)))
		v = w
	}
	if math.Abs(fl-1) > 1e-9 {
		w := units.Stress(fl * float64(v))
		out = append(out, fmt.Sprintf("large base (B = %s > %s): qp = (%s/B)·qp = %s × %s = %s", c.ls(t.Input.D),
			c.ls(bearing.LargeBaseDiameter), c.ls(bearing.LargeBaseDiameter), fmtNum(fl, sig), c.ss(v), c.ss(w)))
		v = w
	}
	if math.Abs(float64(v-res.Qp)) > 1e-6*math.Abs(float64(res.Qp))+1e-9 {
		s := fmt.Sprintf("installation and size rules: reduction factor %s", fmtNum(res.Reduction, sig))
		if res.Cap > 0 {
			s += ", cap " + c.ss(res.Cap)
		}
		return []string{s + ", qp = " + c.ss(res.Qp)}
	}
	return out
}

// layerTop returns the top of the bearing stratum: the layer's top or the
// design ground line, whichever is deeper.
func layerTop(r *calc.Result, li int) (units.Length, bool) {
	if li < 0 || li >= len(r.Layers) {
		return 0, false
	}
	return max(r.Layers[li].Top, designGround(r)), true
}

// embedment returns the embedment Lb of the tip in the bearing stratum,
// measured from the top of the layer or the design ground line, whichever
// is deeper, as the ramp measures it (TipBlock.Lb is the depth below the
// layer's top, which overstates Lb below an excavation or scour); the
// result equals TipBlock.EmbedFactor × TipBlock.EmbedLength.
func embedment(r *calc.Result) units.Length {
	t := r.Breakdown.Tip
	if top, ok := layerTop(r, t.Layer); ok {
		return t.Depth - top
	}
	return t.Lb
}

// ruleLines writes the pile's tip rules with their numbers: the embedment
// ramp, the layered transition and the weak-layer reduction.
func ruleLines(r *calc.Result, c conv) []string {
	t := r.Breakdown.Tip
	var out []string
	q := t.Own
	if t.Flags&pile.EmbedmentRamp != 0 && t.EmbedLength > 0 {
		nq := units.Stress(t.EmbedFactor * float64(q))
		lb := embedment(r)
		out = append(out, fmt.Sprintf("embedment ramp (Meyerhof 1976): Lb = %s < (Lb/D)cr·D = %s × %s = %s", c.ls(lb),
			fmtNum(float64(t.EmbedLength/r.Pile.Section.Size()), sig), c.ls(r.Pile.Section.Size()), c.ls(t.EmbedLength)))
		out = append(out, fmt.Sprintf("  qp = qp·Lb/((Lb/D)cr·D) = %s × %s/%s = %s × %s = %s", c.ss(q), c.ls(lb), c.ls(t.EmbedLength),
			c.ss(q), fmtNum(t.EmbedFactor, sig), c.ss(nq)))
		q = nq
	}
	if t.Upper > 0 {
		d := r.Pile.Section.Size()
		if top, ok := layerTop(r, t.Layer); ok {
			lb := t.Depth - top
			nq := t.Upper + (q-t.Upper)*units.Stress(float64(lb)/float64(10*d))
			out = append(out, fmt.Sprintf("layered transition (Meyerhof 1976): Lb = %s into a stronger layer, < 10 D = %s:", c.ls(lb), c.ls(10*d)))
			out = append(out, fmt.Sprintf("  qp = q_upper + (qp − q_upper)·Lb/(10 D) = %s + (%s − %s) × %s/%s = %s", c.ss(t.Upper), c.ss(q),
				c.ss(t.Upper), c.ls(lb), c.ls(10*d), c.ss(nq)))
			q = nq
		}
	}
	if t.WeakLayer >= 0 {
		name := ""
		if t.WeakLayer < len(r.Layers) {
			name = " (" + r.Layers[t.WeakLayer].Name + ")"
		}
		v := t.Weak + (t.Strong-t.Weak)*units.Stress(float64(t.H)/float64(t.WeakZone))
		out = append(out, fmt.Sprintf("weak layer below (Meyerhof 1976): weaker layer%s at H = %s below the tip, < 10 D = %s:",
			name, c.ls(t.H), c.ls(t.WeakZone)))
		out = append(out, fmt.Sprintf("  qp = q_weak + (q_strong − q_weak)·H/(10 D) = %s + (%s − %s) × %s/%s = %s", c.ss(t.Weak),
			c.ss(t.Strong), c.ss(t.Weak), c.ls(t.H), c.ls(t.WeakZone), c.ss(v)))
	}
	return out
}

// ruleResult is the unit tip resistance the rules give, for comparison with
// TipBlock.Qp (which is net of σ′v under WeightNet).
func ruleResult(r *calc.Result) units.Stress {
	t := r.Breakdown.Tip
	if t.WeakLayer >= 0 {
		return t.Weak + (t.Strong-t.Weak)*units.Stress(float64(t.H)/float64(t.WeakZone))
	}
	q := t.Own
	if t.Flags&pile.EmbedmentRamp != 0 {
		q = units.Stress(t.EmbedFactor * float64(q))
	}
	if t.Upper > 0 {
		if top, ok := layerTop(r, t.Layer); ok {
			d := r.Pile.Section.Size()
			q = t.Upper + (q-t.Upper)*units.Stress(float64(t.Depth-top)/float64(10*d))
		}
	}
	return q
}

// A defaultRow is one line of the reviewer's table of defaults.
type defaultRow struct {
	Rule   string `json:"rule"`
	Value  string `json:"setting"`
	Source string `json:"source"`
	// State is "applied" (acts on this pile), "on" (in force, not acting
	// here), "off" (switched off; a warning is shown), "not-applicable"
	// or "unknown" (the result does not say).
	State  string `json:"state"`
	Status string `json:"status"`
}

// defaultRows builds the reviewer's table of the defaults and rules in
// force for this pile from the result (and the calc file resolved again
// for the switches the result does not carry).
func defaultRows(r *calc.Result, c conv) []defaultRow {
	in := resolved(r)
	var m *pile.Methods
	if in != nil {
		m = &in.Methods
	}
	t := r.Breakdown.Tip
	res := t.Result
	p := r.Pile
	d := p.Section.Size()
	bored := p.Installation == pile.Bored || p.Installation == pile.Augered
	tipDrained := t.Layer >= 0 && t.Layer < len(r.Layers) && r.Layers[t.Layer].Drainage == profile.Drained
	var rows []defaultRow
	add := func(rule, value, source, state, status string) {
		rows = append(rows, defaultRow{rule, value, source, state, status})
	}
	// The tip method and its settlement basis.
	tipState := "applied"
	method := t.Method
	if res.Rule != "" {
		method += " (rule " + res.Rule + ")"
	}
	add("Tip method at the tip", method, "see Sources cited", tipState, "bearing layer "+t.LayerName)
	if b := settlementBasis(t); b != "" {
		add("Settlement basis of qp", b, "the method's source", "applied", "qp = "+c.ss(t.Qp))
	} else {
		add("Settlement basis of qp", "not stated for method "+t.Method, "-", "unknown", "the result does not name it")
	}
	// Embedment ramp.
	ratio := float64(pile.DefaultEmbedmentRatio)
	if m != nil && m.EmbedmentRatio > 0 {
		ratio = m.EmbedmentRatio
	}
	if t.EmbedLength > 0 && d > 0 {
		ratio = float64(t.EmbedLength / d)
	}
	emb := defaultRow{Rule: "Embedment ramp in a drained top layer", Value: fmt.Sprintf("qp·Lb/((Lb/D)cr·D), (Lb/D)cr = %s", fmtNum(ratio, sig)),
		Source: "Meyerhof (1976); Das, Meyerhof's method in sand"}
	top, _ := layerTop(r, t.Layer)
	first := t.Layer == 0 || (t.Layer > 0 && t.Layer-1 < len(r.Layers) && r.Layers[t.Layer-1].Bottom <= designGround(r))
	switch {
	case t.Flags&pile.EmbedmentOff != 0:
		emb.State, emb.Status = "off", "switched off where it applies (WARNING in the warnings)"
	case t.Flags&pile.EmbedmentRamp != 0:
		emb.State, emb.Status = "applied", "factor "+fmtNum(t.EmbedFactor, sig)+" at the tip"
	case m != nil && m.NoEmbedment:
		emb.State, emb.Status = "off", "switched off; it does not act at this tip"
	case !tipDrained || !first:
		emb.State, emb.Status = "not-applicable", "the bearing layer is not a drained top layer"
	default:
		emb.State, emb.Status = "on", fmt.Sprintf("the tip is %s into the layer, beyond (Lb/D)cr·D", c.ls(t.Depth-top))
	}
	rows = append(rows, emb)
	// Layered transition.
	lay := defaultRow{Rule: "Transition into a stronger layer", Value: "qp grows from the upper layer's qp over 10 D",
		Source: "Meyerhof (1976)"}
	switch {
	case t.Upper > 0:
		lay.State, lay.Status = "applied", "upper layer's qp "+c.ss(t.Upper)
	case m != nil && !m.LayeredTip:
		lay.State, lay.Status = "off", "switched off (methods.layered_tip: false)"
	case m == nil:
		lay.State, lay.Status = "unknown", "does not act at this tip"
	default:
		lay.State, lay.Status = "on", "does not act at this tip"
	}
	rows = append(rows, lay)
	// Weak layer below.
	weak := defaultRow{Rule: "Weaker layer below the tip", Value: fmt.Sprintf("qp = q_weak + (q_strong − q_weak)·H/(%d D) ≤ q_strong", pile.WeakZoneRatio),
		Source: "Meyerhof (1976)"}
	switch {
	case t.Flags&pile.WeakLayerOff != 0:
		weak.State, weak.Status = "off", "switched off where it applies (WARNING in the warnings)"
	case t.WeakLayer >= 0:
		weak.State, weak.Status = "applied", "q_weak "+c.ss(t.Weak)+", H "+c.ls(t.H)
	case m != nil && m.NoWeakLayer:
		weak.State, weak.Status = "off", "switched off; no weaker layer within 10 D of this tip"
	default:
		weak.State, weak.Status = "on", "no weaker layer within 10 D below this tip"
	}
	rows = append(rows, weak)
	wb := 3.0
	if m != nil && m.WeakBelow > 0 {
		wb = m.WeakBelow
	}
	wbs := "none found"
	state := "on"
	if t.Flags&pile.WeakBelow != 0 {
		wbs, state = "a weaker layer lies within the search", "applied"
	}
	add("Warning of a weaker layer below", fmt.Sprintf("within %s D below the tip", fmtNum(wb, sig)), "our choice", state, wbs)
	// Vesic's rigidity.
	if res.Ir > 0 {
		st, s := "applied", "Δ "+res.DeltaBy.String()
		if res.DeltaBy == bearing.DeltaNone {
			st, s = "off", "Δ not used: Irr = Ir"
		}
		add("Vesic's reduced rigidity", "Irr = Ir/(1 + Ir·Δ)", "Vesic (1977)", st, s+", Irr = "+fmtNum(res.Irr, sig))
	}
	// Bored-pile tip, cap and large base.
	bt := defaultRow{Rule: "Bored-pile tip in drained soil", Value: "bored-sand: SPT rule with N60, else 1/3 of the driven qp",
		Source: "O'Neill & Reese (1999); Meyerhof (1976)"}
	switch {
	case !bored:
		bt.State, bt.Status = "not-applicable", "installation "+p.Installation.String()
	case !tipDrained:
		bt.State, bt.Status = "not-applicable", "the bearing layer is undrained"
	case res.Rule != "" || boredFactor(t) != 1:
		bt.State, bt.Status = "applied", "rule "+dash(res.Rule)
	default:
		bt.State, bt.Status = "off", "tip method "+t.Method+" used without a bored-pile rule"
	}
	rows = append(rows, bt)
	capRow := defaultRow{Rule: "Drilled-shaft cap on qp", Value: "30 tsf (" + c.ss(30*units.TSF) + ")", Source: "O'Neill & Reese (1999)"}
	switch {
	case res.Flags&bearing.CapGoverns != 0:
		capRow.State, capRow.Status = "applied", "the cap governs"
	case res.Cap > 0:
		capRow.State, capRow.Status = "on", "the cap does not govern"
	case res.Flags&bearing.ReductionOff != 0:
		capRow.State, capRow.Status = "off", "a bored-pile reduction is switched off (WARNING in the warnings)"
	case bt.State == "applied" && res.Rule == (bearing.ShaftSand{}).ID():
		capRow.State, capRow.Status = "applied", "as the SPT rule's limit"
	default:
		capRow.State, capRow.Status = "not-applicable", "no bored-pile rule at this tip"
	}
	rows = append(rows, capRow)
	lb := defaultRow{Rule: "Large-base reduction", Value: fmt.Sprintf("f = %s/B for B > %s", c.ls(bearing.LargeBaseDiameter), c.ls(bearing.LargeBaseDiameter)),
		Source: "O'Neill & Reese (1999)"}
	switch {
	case math.Abs(largeBaseFactor(t)-1) > 1e-9:
		lb.State, lb.Status = "applied", "f = "+fmtNum(largeBaseFactor(t), sig)
	case d <= bearing.LargeBaseDiameter:
		lb.State, lb.Status = "not-applicable", "B = "+c.ls(d)
	case res.Flags&bearing.ReductionOff != 0:
		lb.State, lb.Status = "off", "switched off (WARNING in the warnings)"
	default:
		lb.State, lb.Status = "not-applicable", "the tip method "+t.Method+" has no large-base reduction"
	}
	rows = append(rows, lb)
	// Drilled-shaft zones.
	dz := defaultRow{Rule: "Drilled-shaft zones without side resistance", Value: fmt.Sprintf("top %s below the head, bottom 1 D", c.ls(pile.DrilledTopZone)),
		Source: "O'Neill & Reese (1999); FHWA GEC 10"}
	switch {
	case r.Breakdown.Capacity.Flags&pile.DrilledZonesOff != 0:
		dz.State, dz.Status = "off", "switched off (WARNING in the warnings)"
	case r.Breakdown.Capacity.Flags&pile.DrilledZones != 0:
		dz.State, dz.Status = "applied", "see the shaft segments marked none"
	case !bored:
		dz.State, dz.Status = "not-applicable", "installation "+p.Installation.String()
	default:
		dz.State, dz.Status = "not-applicable", "no layer along the shaft uses the drilled-shaft α"
	}
	rows = append(rows, dz)
	// Critical depth.
	if m != nil {
		if m.CriticalDepth > 0 {
			add("Critical depth", fmt.Sprintf("σ′v held below %s·D", fmtNum(m.CriticalDepth, sig)), "Meyerhof (1976); Kulhawy (1984)", "applied",
				"β-family methods in drained layers only")
		} else {
			add("Critical depth", "none", "Kulhawy (1984)", "off", "σ′v is not held (the default)")
		}
	}
	// Interface friction.
	surf := pile.DefaultSurface(p.Section, p.Installation)
	how := "default for the section and installation"
	if p.Surface != 0 {
		surf, how = p.Surface, "given"
	}
	add("Interface for δ/φ′", surf.String(), "Kulhawy (1984)", "applied", how)
	// Tension.
	if m != nil {
		tf := m.Tension
		if tf.Name == "" {
			tf = pile.DefaultTension()
		}
		val := fmt.Sprintf("%s × compression in drained layers, %s in undrained", fmtNum(tf.For(profile.Drained), sig), fmtNum(tf.For(profile.Undrained), sig))
		st, s := "applied", tf.Name
		if tf.Unreduced() {
			st, s = "off", tf.Name+": no reduction in drained layers"
		}
		add("Shaft resistance in tension", val, "De Nicola & Randolph (1993)", st, s)
		add("Self-weight in compression", m.SelfWeight.String(), "Das (pile capacity)", "applied", "")
		ce := "an error"
		if m.Clamp {
			ce = "read at the edge, with a warning"
		}
		add("Charts read outside their range", ce, "our choice", map[bool]string{true: "off", false: "on"}[m.Clamp], "")
	}
	// Design ground line.
	if zd := designGround(r); zd > 0 {
		add("Design ground line", "overburden above it removed from σ′v, shaft and tip", "FHWA HEC-18 (scour); mechanics", "applied", "at "+c.ls(zd))
	} else {
		add("Design ground line", "overburden above it removed from σ′v, shaft and tip", "FHWA HEC-18 (scour); mechanics", "not-applicable", "no excavation or scour")
	}
	// Plug.
	if p.Section.CanPlug() {
		add("Plug mode", p.Plug.String(), "common practice", "applied", "design values in a design case")
	}
	// Required length.
	if l := r.Length; l != nil {
		s := "a tip passes only where every deeper candidate passes too"
		st := "applied"
		if len(l.Passing) > 1 {
			s = fmt.Sprintf("%d passing ranges (WARNING in the warnings)", len(l.Passing))
		}
		if !l.Found {
			s = "no length found"
		}
		add("Required length", fmt.Sprintf("search to %s in steps of %s", c.ls(l.MaxTip), c.ls(l.Step)), "our choice", st, s)
	}
	return rows
}

// defaultsTable renders the rows as a table.
func defaultsTable(rows []defaultRow) *table {
	t := &table{cols: []column{{"Rule", ""}, {"Value", ""}, {"Source", ""}, {"State", ""}, {"For this pile", ""}}, listInText: true}
	for _, d := range rows {
		t.rows = append(t.rows, []cell{txt(d.Rule), txt(d.Value), txt(d.Source), txt(d.State), txt(dash(d.Status))})
	}
	return t
}

func secDefaults(r *calc.Result, c conv) section {
	rows := defaultRows(r, c)
	return section{heading: "Defaults and rules in force", blocks: []block{
		{para: "Each rule qult applies by default, its value and source, and whether it acts on this pile: applied, on (in force but not acting here), off (switched off; the warnings say where it would have acted) or not-applicable."},
		{tbl: defaultsTable(rows)},
	}}
}
