package report

import (
	"fmt"
	"slices"
	"strings"

	"github.com/qultgeo/qult/calc"
	"github.com/qultgeo/qult/insitu"
	"github.com/qultgeo/qult/units"
)

// headCompared is the heading of the methods compared.
const headCompared = "Methods compared"

// secCompared is the shaft resistance by every applicable shaft method
// and the tip resistance by every applicable tip method, for the same pile
// and ground, the file's choices marked and the spread stated.
func secCompared(r *calc.Result, c conv) section {
	cm := r.Compared
	if cm == nil || len(cm.Shaft)+len(cm.Tip) == 0 {
		return section{}
	}
	blocks := []block{{para: "The same pile in the same ground by every method of the catalogues that applies and needs no key of its own: each shaft method in every embedded layer of its drainage class (the other layers as chosen), each tip method in every layer of the bearing layer's class. Limits, critical depth, tip rules and zones without friction stay as chosen. The file's choice is marked *. Some methods are written for other piles or ground than these (each method's scope is in its source and in qult's catalogue): the table shows how far accepted methods differ, it does not make them apply."}}
	if r.Pile.Section.CanPlug() {
		blocks = append(blocks, block{para: "The section can plug: each row is the governing mode (plugged or unplugged) with that method, so a tip method can change Qs too, and Rc need not follow Qp."})
	}
	for _, g := range cm.Shaft {
		blocks = append(blocks, compareBlocks(g, c, "Shaft", "Qs", "Qs, all layers")...)
		if n := directShaftNote(r, g, c); n != "" {
			blocks = append(blocks, block{para: n})
		}
	}
	for _, g := range cm.Tip {
		blocks = append(blocks, compareBlocks(g, c, "Tip", "Qp", "Rc")...)
		if t := r.Breakdown.Tip; slices.Contains(g.Layers, t.LayerName) {
			if _, ok := insitu.LookupDirect(insitu.TipPart, t.Method); ok {
				blocks = append(blocks, block{para: fmt.Sprintf("The file's choice, %s, is a direct CPT method and is not among the methods compared: Qp = %s, Rc = %s.",
					t.Method, c.fs(r.Breakdown.Capacity.Tip), c.fs(r.Breakdown.Capacity.Compression))})
			}
		}
	}
	return section{heading: headCompared, blocks: blocks}
}

func compareBlocks(g calc.CompareGroup, c conv, what, force, total string) []block {
	t := &table{cols: []column{{"Method", ""}, {"Chosen", ""}, {force, c.uF()}, {total, c.uF()}}}
	var not []string
	for _, row := range g.Rows {
		if row.NotApplied != "" {
			why, _, _ := strings.Cut(row.NotApplied, "\n")
			not = append(not, row.Method+": "+why)
			continue
		}
		mark := ""
		if row.Chosen {
			mark = "*"
		}
		t.rows = append(t.rows, []cell{txt(row.Method), txt(mark), num(c.F(row.Force)), num(c.F(row.Total))})
	}
	head := fmt.Sprintf("%s resistance, %s layers (%s):", what, g.Drainage, strings.Join(g.Layers, ", "))
	out := []block{{para: head}}
	if len(t.rows) > 0 {
		out = append(out, block{tbl: t})
	}
	out = append(out, block{para: spreadText(g, c, force)})
	if len(not) > 0 {
		out = append(out, block{para: "Not applied:"}, block{list: not})
	}
	return out
}

// directShaftNote names the direct CPT shaft methods the file chose in a
// group's layers, which are not among the methods compared, with the shaft
// resistance of those layers as chosen.
func directShaftNote(r *calc.Result, g calc.CompareGroup, c conv) string {
	var ids []string
	var qs units.Force
	for _, row := range r.Breakdown.Rows {
		if !slices.Contains(g.Layers, row.LayerName) {
			continue
		}
		qs += row.Force
		if _, ok := insitu.LookupDirect(insitu.ShaftPart, row.Method); ok && !slices.Contains(ids, row.Method) {
			ids = append(ids, row.Method)
		}
	}
	if len(ids) == 0 {
		return ""
	}
	return fmt.Sprintf("The file chooses direct CPT methods (%s) in some of these layers, which are not among the methods compared; Qs of these layers as chosen = %s.",
		strings.Join(ids, ", "), c.fs(qs))
}

// spreadText states the spread of a group: least and greatest value and
// their ratio.
func spreadText(g calc.CompareGroup, c conv, force string) string {
	lo, hi, n := g.Spread()
	switch {
	case n == 0:
		return "Spread: no method gave a value."
	case n == 1:
		return fmt.Sprintf("Spread: one method gave a value (%s = %s).", force, c.fs(lo))
	case lo > 0:
		return fmt.Sprintf("Spread: %s from %s to %s over %d methods; the greatest is %s times the least.", force, c.fs(lo), c.fs(hi), n, fmtNum(float64(hi/lo), 3))
	}
	return fmt.Sprintf("Spread: %s from %s to %s over %d methods.", force, c.fs(lo), c.fs(hi), n)
}
