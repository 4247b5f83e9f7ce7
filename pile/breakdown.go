package pile

import (
	"fmt"

	"github.com/qultgeo/qult/bearing"
	"github.com/qultgeo/qult/cite"
	"github.com/qultgeo/qult/profile"
	"github.com/qultgeo/qult/shaft"
	"github.com/qultgeo/qult/units"
)

// Row is one shaft segment of a breakdown: a length of shaft in one layer
// between two split depths, with every value a reviewer needs to redo it.
type Row struct {
	Top, Bottom units.Length
	Layer       int
	LayerName   string
	Drainage    profile.Drainage
	Method      string // shaft method identifier ("lambda" for the λ method, "none" where no friction is counted)
	Equation    string
	// σ′v at the top and bottom of the segment as used (held below the
	// critical depth), and su (factored) where the layer has it.
	SigmaTop, SigmaBottom units.Stress
	SuTop, SuBottom       units.Stress
	// The method's results at the top and bottom of the segment.
	At [2]shaft.Result
	// Integral is ∫fs dz over the segment (N/m); Perimeter the perimeter
	// it acts on; Force = Integral·Perimeter.
	Integral  units.ForcePerLength
	Perimeter units.Length
	Force     units.Force
	Flags     Flags
}

// TipBlock is the tip of a breakdown.
type TipBlock struct {
	Depth     units.Length
	Layer     int
	LayerName string
	Method    string
	Equation  string
	Input     bearing.Input
	Result    bearing.Result
	// Own is the bearing layer's unit tip resistance by its own method at
	// the tip (Result.Qp), before the rules below.
	Own units.Stress
	// Embedment ramp (Meyerhof 1976), where it applied: Lb the embedment
	// in the drained top layer, EmbedLength = (Lb/D)cr·D, and
	// EmbedFactor = Lb/EmbedLength (1 where the ramp did not apply).
	Lb, EmbedLength units.Length
	EmbedFactor     float64
	// Upper is the upper layer's unit tip resistance where Meyerhof's
	// layered rule applied (0 otherwise).
	Upper units.Stress
	// Weak layer below (Meyerhof 1976), where the reduction applied
	// (WeakLayer ≥ 0; −1 otherwise): q_strong (Strong, the value after the
	// rules above), q_weak (Weak, the weaker layer's value at its top), H
	// (the distance from the tip down to it) and WeakZone = 10·D, so that
	//
	//	Qp = Weak + (Strong − Weak)·H/WeakZone
	WeakLayer    int
	Strong, Weak units.Stress
	H, WeakZone  units.Length
	// Qp is the unit tip resistance used (net of σ′v with WeightNet).
	Qp    units.Stress
	Area  units.Area
	Force units.Force
	Flags Flags
}

// Breakdown is a capacity with its derivation.
type Breakdown struct {
	Capacity
	Rows     []Row
	Tip      TipBlock
	Lambda   *shaft.LambdaResult // where the λ method was used
	Warnings []string
	Sources  []cite.Source
}

// Breakdown returns the capacity with the pile's own tip depth and a row
// per shaft segment. It allocates; Capacity is the lean path.
func (a *Analysis) Breakdown() (Breakdown, error) { return a.breakdown(nil) }

// ShaftPass is the shaft of an analysis' capacity, segment by segment, kept
// so that the breakdown of another analysis of the same pile in the same
// profile can take the segments it shares (BreakdownSharing).
type ShaftPass struct {
	segs []segRecord
}

// ShaftPass integrates the shaft of the pile at its own tip depth, as
// Capacity does, and keeps it segment by segment.
func (a *Analysis) ShaftPass() (*ShaftPass, error) {
	var s sums
	p := &ShaftPass{segs: make([]segRecord, 0, len(a.iv))}
	if err := a.addShaft(&s, float64(a.pile.HeadDepth), float64(a.pile.Tip()), &p.segs, nil); err != nil {
		return nil, err
	}
	return p, nil
}

// BreakdownSharing is Breakdown, to the bit, for an analysis of the same
// pile in the same profile as the one that made pass, with the same
// methods and options except in layers i where same[i] is false: a shaft
// segment of a layer marked the same, with the same ends as a segment of
// pass, is taken from pass rather than integrated again. A caller that
// marks a layer the same whose methods differ gets that layer's segments
// from the other analysis. It is for callers that want the numbers: it
// leaves Sources and Warnings empty.
func (a *Analysis) BreakdownSharing(pass *ShaftPass, same []bool) (Breakdown, error) {
	var segs []segRecord
	if pass != nil {
		segs = pass.segs
	}
	return a.breakdown(&reuse{segs: segs, same: same})
}

func (a *Analysis) breakdown(from *reuse) (Breakdown, error) {
	// Capacity, recording its segments: a row on one of them takes it
	// rather than integrating it again.
	head, t := float64(a.pile.HeadDepth), float64(a.pile.Tip())
	var c Capacity
	var s0 sums
	rec := make([]segRecord, 0, len(a.iv))
	err := a.addShaft(&s0, head, t, &rec, from)
	if err == nil {
		err = a.finish(&s0, t, &c)
	}
	if err != nil {
		return Breakdown{}, err
	}
	b := Breakdown{Capacity: c, Rows: make([]Row, 0, len(rec)+1)}
	perim := a.outer
	if !c.Plugged {
		perim += a.inner
	}
	var all sums
	var refs []cite.Ref
	seen := map[string]bool{}
	// BreakdownSharing leaves the sources out: no list is built for it.
	share := from != nil
	addRefs := func(id string, r []cite.Ref) {
		if !share && !seen[id] {
			seen[id] = true
			refs = append(refs, r...)
		}
	}
	// The bottom diameter of drilled-shaft α layers carries no side
	// resistance (see finish): rows there are split off and shown as none.
	cut := t
	if a.drilled {
		cut = max(t-a.size, head)
	}
	addRow := func(iv *interval, top, bot float64, bottomZone bool) error {
		var s sums
		li := iv.layer
		lp := &a.plans[li]
		if !bottomZone {
			for len(rec) > 0 && &a.iv[rec[0].k] != iv && rec[0].top < top {
				rec = rec[1:] // a segment no row takes whole (split at the bottom zone)
			}
			if len(rec) > 0 && &a.iv[rec[0].k] == iv && rec[0].top == top && rec[0].bot == bot {
				s, rec = rec[0].s, rec[1:]
			} else if err := a.segment(&s, iv, top, bot); err != nil {
				return err
			}
		}
		row := Row{Top: units.Length(top), Bottom: units.Length(bot), Layer: li, LayerName: lp.layer.Name,
			Drainage: lp.layer.Drainage, Perimeter: units.Length(perim), Flags: s.flags}
		if lp.layer.HasSu {
			row.SuTop, row.SuBottom = lp.suAt(units.Length(top)), lp.suAt(units.Length(bot))
		}
		s0, s1 := iv.sigma(top), iv.sigma(bot)
		row.SigmaTop, row.SigmaBottom = units.Stress(s0), units.Stress(s1)
		switch {
		case bottomZone:
			row.Method, row.Equation = "none", "fs = 0 (bottom diameter of a drilled shaft, O'Neill & Reese 1999)"
			row.Flags |= DrilledZones
		case iv.drilledTop:
			row.Method, row.Equation = "none", "fs = 0 (top 1.5 m of a drilled shaft, O'Neill & Reese 1999)"
		case lp.noShaft || iv.noShaft:
			row.Method, row.Equation = "none", "fs = 0"
		case lp.lambda:
			row.Method, row.Equation = lambdaID, a.lambda.Equation()
			if !share && !seen[lambdaID] {
				addRefs(lambdaID, a.lambda.Refs())
			}
			all.lamSig += s.lamSig
			all.lamSu += s.lamSu
			all.lamLen += s.lamLen
		default:
			row.Method, row.Equation = lp.shaft.ID(), lp.shaft.Equation()
			if !share && !seen[row.Method] { // Refs builds its list: only once per method
				addRefs(row.Method, lp.shaft.Refs())
			}
			for j, z := range endPoints(top, bot) {
				sv := s0 + (s1-s0)*(z-top)/(bot-top)
				r, err := lp.shaft.Unit(a.point(lp, units.Length(z), units.Stress(sv)))
				if err != nil {
					return pathErrorf(fmt.Sprintf("layers[%d].shaft", li), "layer %q at %.4g m: %w", lp.layer.Name, z, err)
				}
				row.At[j] = r
			}
			row.Integral = units.ForcePerLength(s.outer)
			row.Force = units.Force(s.outer * perim)
		}
		b.Rows = append(b.Rows, row)
		return nil
	}
	for k := range a.iv {
		iv := &a.iv[k]
		top, bot := max(head, iv.top), min(t, iv.bot)
		if !(bot > top) {
			continue
		}
		zoned := a.plans[iv.layer].drilled && !iv.noShaft && bot > cut
		if !zoned {
			if err := addRow(iv, top, bot, false); err != nil {
				return Breakdown{}, err
			}
			continue
		}
		if cut > top {
			if err := addRow(iv, top, cut, false); err != nil {
				return Breakdown{}, err
			}
		}
		if err := addRow(iv, max(top, cut), bot, true); err != nil {
			return Breakdown{}, err
		}
	}
	// λ rows share the average friction of the whole λ length.
	if all.lamLen > 0 {
		L := units.Length(t - head)
		var fav units.Stress
		var lr shaft.LambdaResult
		lamVal := 0.0
		for i := range a.plans {
			if a.plans[i].lambda && a.plans[i].lamVal > 0 {
				lamVal = a.plans[i].lamVal
			}
		}
		lr, err = a.lambdaAverage(lamVal, L, units.Stress(all.lamSig/all.lamLen), units.Stress(all.lamSu/all.lamLen))
		if err != nil {
			return Breakdown{}, err
		}
		fav = lr.Fav
		b.Lambda = &lr
		for i := range b.Rows {
			if b.Rows[i].Method == lambdaID {
				h := float64(b.Rows[i].Bottom - b.Rows[i].Top)
				b.Rows[i].Integral = units.ForcePerLength(float64(fav) * h)
				b.Rows[i].Force = units.Force(float64(fav) * h * perim)
			}
		}
	}
	var tr tipResult
	var td tipDetail
	if err := a.tipAt(t, &tr, &td, -1); err != nil {
		return Breakdown{}, err
	}
	lp := &a.plans[tr.layer]
	area := a.gross
	if !c.Plugged {
		area = a.mat
	}
	b.Tip = TipBlock{Depth: units.Length(t), Layer: tr.layer, LayerName: lp.layer.Name, Method: lp.tip.ID(),
		Equation: lp.tip.Equation(), Input: td.in, Result: td.res, Own: units.Stress(tr.own),
		EmbedFactor: tr.embed, Upper: units.Stress(tr.upper), WeakLayer: -1,
		Qp: c.UnitTip, Area: units.Area(area), Force: c.Tip, Flags: tr.flags}
	if tr.flags&EmbedmentRamp != 0 {
		b.Tip.Lb = units.Length(t) - max(lp.layer.Top, a.prof.DesignGround()) // the embedment the ramp used
		b.Tip.EmbedLength = units.Length(a.embedN * a.size)
		addRefs("embedment", []cite.Ref{{Source: cite.Meyerhof1976, Where: "growth of the point resistance with embedment up to the critical ratio"},
			{Source: cite.Das2019, Where: "Meyerhof's method for piles in sand, critical embedment ratio"}})
	}
	if w := tr.weak; w.ok {
		b.Tip.WeakLayer, b.Tip.Strong, b.Tip.Weak = w.layer, units.Stress(w.strong), units.Stress(w.weak)
		b.Tip.H, b.Tip.WeakZone = units.Length(w.h), units.Length(WeakZoneRatio*a.size)
		addRefs("weak-layer", []cite.Ref{{Source: cite.Meyerhof1976, Where: "point resistance of a pile in a strong layer above a weak one"}})
	}
	if c.Flags&DrilledZones != 0 {
		addRefs("drilled-zones", []cite.Ref{{Source: cite.ONeillReese1999, Where: "α method: top 1.5 m and bottom diameter excluded"},
			{Source: cite.Brown2010, Where: "ch. 13, side resistance in cohesive soil"}})
	}
	if !share {
		addRefs(lp.tip.ID(), lp.tip.Refs())
	}
	if a.zc > 0 && !share {
		addRefs("critical-depth", (shaft.CriticalDepth{}).Refs())
	}
	if tr.flags&LayeredTip != 0 {
		addRefs("layered-tip", []cite.Ref{{Source: cite.Meyerhof1976, Where: "tip in a stronger layer below a weaker one"}})
	}
	addRefs("tension-"+a.tension.Name, a.tension.Refs)
	if !share { // BreakdownSharing leaves them out
		b.Sources = cite.Collect(refs...)
		b.Warnings = c.Flags.Messages()
	}
	return b, nil
}
