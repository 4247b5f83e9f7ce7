package report

import (
	"bufio"
	"encoding/csv"
	"strings"

	"github.com/qultgeo/qult/calc"
)

// csvTable returns the one table of a view in CSV:
//
//	check:           one row per design case (or one row of characteristic totals without a design basis)
//	capacity, report: the shaft segments, then one tip row
//	length:          capacity with depth
//	settle:          the predicted load-settlement curve, with the load test's points
//	reliability:     the Monte Carlo and FOSM estimates (the capacity table without a reliability section)
//	choose:          the candidates ranked (the capacity table without a candidates section)
func csvTable(r *calc.Result, o Options) *table {
	c := conv{o.sys}
	switch o.View {
	case ViewCheck:
		if r.Design != nil {
			return secDesign(r, c).blocks[1].tbl
		}
		k := r.Breakdown.Capacity
		return &table{cols: []column{{"Tip depth", c.uL()}, {"Qp", c.uF()}, {"Qs", c.uF()}, {"W′", c.uF()}, {"Rc", c.uF()}, {"Rt", c.uF()}},
			rows: [][]cell{{num(c.L(k.TipDepth)), num(c.F(k.Tip)), num(c.F(k.Shaft)), num(c.F(k.Weight)), num(c.F(k.Compression)), num(c.F(k.Tension))}}}
	case ViewLength:
		return withDepthTable(r, c)
	case ViewSettle:
		return settleCSV(r, c)
	case ViewReliability:
		if r.Reliability != nil && r.Reliability.MonteCarlo != nil {
			return reliabilityTable(r.Reliability, c)
		}
	case ViewChoose:
		if r.Candidates != nil {
			return secCandidates(r, c).blocks[1].tbl
		}
	}
	return breakdownTable(r, c)
}

// breakdownTable is the shaft table with a part column and a tip row.
func breakdownTable(r *calc.Result, c conv) *table {
	s := shaftTable(r, c)
	t := &table{cols: append([]column{{"Part", ""}}, s.cols...)}
	t.cols = append(t.cols, column{"qp", c.uS()}, column{"Area", c.uA()})
	// Rename the last shaft column (Qs) to a force common to both parts.
	t.cols[len(s.cols)] = column{"Force", c.uF()}
	for _, row := range s.rows {
		nr := append([]cell{txt("shaft")}, row...)
		nr = append(nr, txt(""), txt(""))
		t.rows = append(t.rows, nr)
	}
	tp := r.Breakdown.Tip
	su := txt("")
	if tp.Input.Su > 0 {
		su = num(c.S(tp.Input.Su))
	}
	t.rows = append(t.rows, []cell{txt("tip"), num(c.L(tp.Depth)), num(c.L(tp.Depth)), txt(tp.LayerName), txt(tp.Method),
		num(c.S(tp.Input.Q)), num(c.S(tp.Input.Q)), su, su, txt(""), txt(""), txt(""), txt(""),
		num(c.F(tp.Force)), num(c.S(tp.Qp)), num(c.A(tp.Area))})
	return t
}

func writeCSV(b *bufio.Writer, r *calc.Result, o Options) error {
	t := csvTable(r, o)
	w := csv.NewWriter(b)
	h := make([]string, len(t.cols))
	for j, c := range t.cols {
		h[j] = c.header()
	}
	if err := w.Write(h); err != nil {
		return err
	}
	rec := make([]string, len(t.cols))
	for _, row := range t.rows {
		for j, c := range row {
			rec[j] = c.str(csvSig)
			if !c.num {
				rec[j] = csvText(rec[j])
			}
		}
		if err := w.Write(rec); err != nil {
			return err
		}
	}
	w.Flush()
	if err := w.Error(); err != nil {
		return err
	}
	// The cautions as a last comment line (read CSV with comment='#').
	_, err := b.WriteString("# " + calc.CautionLine + "\n")
	return err
}

// csvText guards text cells against formula injection in spreadsheets: a
// cell from the calc file that starts with =, +, -, @, tab or carriage
// return is prefixed with an apostrophe. A lone "-" (not applicable) is
// written as an empty cell.
func csvText(s string) string {
	if s == "-" {
		return ""
	}
	if s != "" && strings.ContainsRune("=+-@\t\r", rune(s[0])) {
		return "'" + s
	}
	return s
}
