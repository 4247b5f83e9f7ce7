package report

import (
	"bufio"
	"bytes"
	"fmt"
	"math"
	"strconv"
	"strings"
	"time"

	"codeberg.org/go-fonts/liberation/liberationmonoregular"
	"codeberg.org/go-fonts/liberation/liberationsansbold"
	"codeberg.org/go-fonts/liberation/liberationsansregular"
	"codeberg.org/go-pdf/fpdf"
	"gonum.org/v1/plot/vg"

	"github.com/qultgeo/qult/calc"
	"github.com/qultgeo/qult/units"
)

// Paper is the page size of a PDF report.
type Paper int

// The page sizes.
const (
	// PaperAuto is A4 for SI display units and US Letter for US units.
	PaperAuto Paper = iota
	// PaperA4 is ISO 216 A4, 210 × 297 mm.
	PaperA4
	// PaperLetter is US Letter, 8.5 × 11 in.
	PaperLetter
)

var paperNames = [...]string{PaperAuto: "auto", PaperA4: "a4", PaperLetter: "letter"}

// String returns "auto", "a4" or "letter".
func (p Paper) String() string {
	if p >= 0 && int(p) < len(paperNames) {
		return paperNames[p]
	}
	return "Paper(" + strconv.Itoa(int(p)) + ")"
}

// ParsePaper reads a page size: auto, a4 or letter, in any case.
func ParsePaper(s string) (Paper, error) {
	for i, n := range paperNames {
		if strings.EqualFold(strings.TrimSpace(s), n) {
			return Paper(i), nil
		}
	}
	return 0, fmt.Errorf("report: paper %q: want auto, a4 or letter", s)
}

// PDF page layout, in millimetres and points.
const (
	pdfMargin    = 15.0 // left and right
	pdfTop       = 20.0 // the body starts below the header
	pdfBottom    = 22.0 // the body ends above the footer
	pdfLine      = 4.2  // line height of body text (9 pt)
	pdfTableFont = 7.5
	pdfTableLine = 3.3
	pdfPad       = 0.9 // cell padding
	pdfDPI       = 200 // figures
)

// pdfWriter lays the document model out on pages.
type pdfWriter struct {
	f     *fpdf.Fpdf
	w     float64 // text width
	pageH float64
	figN  int
	err   error
}

// writePDF renders the view as a paginated PDF: the sections of the text
// report, with the figures of the HTML package as images, a header on
// every page (title, project, revision) and a footer (qult version, the
// first 12 digits of the calc file's SHA-256, page x of y and the cautions
// in one line).
func writePDF(b *bufio.Writer, r *calc.Result, o Options) error {
	d := build(r, o)
	if err := addFigures(d, r, o); err != nil {
		return err
	}
	size := "A4"
	if o.Paper == PaperLetter || (o.Paper == PaperAuto && o.sys == units.US) {
		size = "Letter"
	}
	f := fpdf.New("P", "mm", size, "")
	f.SetCatalogSort(true) // the same result gives the same bytes
	// The creation date is the report's date where it reads as a date,
	// else a fixed one: no date is made up from the clock.
	when := time.Date(2000, 1, 1, 0, 0, 0, 0, time.UTC)
	if t, err := time.Parse("2006-01-02", date(r, o)); err == nil {
		when = t
	}
	f.SetCreationDate(when)
	f.SetModificationDate(when)
	f.AddUTF8FontFromBytes("sans", "", liberationsansregular.TTF)
	f.AddUTF8FontFromBytes("sans", "B", liberationsansbold.TTF)
	f.AddUTF8FontFromBytes("mono", "", liberationmonoregular.TTF)
	f.SetTitle(pdfClean(d.title), true)
	f.SetCreator("qult "+pdfClean(r.Version), true)
	f.SetProducer("qult", true)
	if r.Engineer != "" {
		f.SetAuthor(pdfClean(r.Engineer), true)
	}
	pw, ph := f.GetPageSize()
	f.SetMargins(pdfMargin, pdfTop, pdfMargin)
	f.SetAutoPageBreak(true, pdfBottom)
	f.AliasNbPages("{nb}")
	hash := SourceHash(r)
	if len(hash) > 12 {
		hash = hash[:12]
	}
	head := pdfClean(d.title)
	var right []string
	if r.Project != "" {
		right = append(right, "Project: "+pdfClean(r.Project))
	}
	if r.Revision != "" {
		right = append(right, "Revision: "+pdfClean(r.Revision))
	}
	f.SetHeaderFunc(func() {
		f.SetFont("sans", "", 8)
		f.SetTextColor(60, 60, 60)
		rt := strings.Join(right, "   ")
		rw := f.GetStringWidth(rt)
		f.Text(pw-pdfMargin-rw, 11, rt)
		f.Text(pdfMargin, 11, fitText(f, head, pw-2*pdfMargin-rw-6))
		f.SetDrawColor(120, 120, 120)
		f.SetLineWidth(0.2)
		f.Line(pdfMargin, 13, pw-pdfMargin, 13)
		f.SetTextColor(0, 0, 0)
		f.SetXY(pdfMargin, pdfTop)
	})
	f.SetFooterFunc(func() {
		y := ph - 15
		f.SetDrawColor(120, 120, 120)
		f.SetLineWidth(0.2)
		f.Line(pdfMargin, y, pw-pdfMargin, y)
		f.SetFont("sans", "", 8)
		f.SetTextColor(60, 60, 60)
		left := "qult " + pdfClean(r.Version)
		if hash != "" {
			left += "   calc file SHA-256 " + hash
		}
		if dt := date(r, o); dt != "" {
			left += "   " + pdfClean(dt)
		}
		f.Text(pdfMargin, y+4, left)
		pg := fmt.Sprintf("page %d of {nb}", f.PageNo())
		f.Text(pw-pdfMargin-f.GetStringWidth(pg)-1.5, y+4, pg)
		f.SetFont("sans", "", 6.5)
		f.Text(pdfMargin, y+8, fitText(f, calc.CautionLine, pw-2*pdfMargin))
		f.SetTextColor(0, 0, 0)
	})
	p := &pdfWriter{f: f, w: pw - 2*pdfMargin, pageH: ph}
	f.AddPage()
	p.title(d.title)
	for _, s := range d.sections {
		if s.heading != "" {
			p.heading(s.heading)
		}
		for _, bl := range s.blocks {
			p.block(bl, s.heading)
			if p.err != nil {
				return p.err
			}
		}
	}
	if err := f.Error(); err != nil {
		return fmt.Errorf("report: pdf: %w", err)
	}
	return f.Output(b)
}

// pdfClean is clean for the PDF's fonts, which fpdf reads within the
// Basic Multilingual Plane: characters beyond it (emoji, say) become
// U+FFFD too.
func pdfClean(s string) string {
	return strings.Map(func(r rune) rune {
		if r > 0xFFFF {
			return '\uFFFD'
		}
		return r
	}, clean(s))
}

// fitText shortens s with an ellipsis until it fits in w.
func fitText(f *fpdf.Fpdf, s string, w float64) string {
	if f.GetStringWidth(s) <= w {
		return s
	}
	r := []rune(s)
	for len(r) > 1 && f.GetStringWidth(string(r)+"…") > w {
		r = r[:len(r)-1]
	}
	return string(r) + "…"
}

// room starts a new page unless h millimetres are left on this one.
func (p *pdfWriter) room(h float64) {
	if p.f.GetY()+h > p.pageH-pdfBottom {
		p.f.AddPage()
	}
}

func (p *pdfWriter) title(s string) {
	p.f.SetFont("sans", "B", 15)
	p.f.MultiCell(0, 7, pdfClean(s), "", "L", false)
	p.f.Ln(2)
}

func (p *pdfWriter) heading(s string) {
	p.room(24) // a heading is not left alone at the foot of a page
	p.f.Ln(3)
	p.f.SetFont("sans", "B", 11.5)
	p.f.Bookmark(pdfClean(s), 0, -1) // the viewer's outline of the package
	p.f.MultiCell(0, 6, pdfClean(s), "B", "L", false)
	p.f.Ln(2)
}

func (p *pdfWriter) text(s string, size, lh float64, font string) {
	p.f.SetFont(font, "", size)
	p.f.MultiCell(0, lh, pdfClean(s), "", "L", false)
}

func (p *pdfWriter) block(bl block, heading string) {
	f := p.f
	switch {
	case bl.pre != "":
		f.SetFont("mono", "", 7)
		n := 100
		if m := f.GetStringWidth("M"); m > 0 {
			n = max(20, int(p.w/m))
		}
		for _, l := range preLines(pdfClean(bl.pre), n) {
			f.CellFormat(0, 3.1, l, "", 1, "L", false, 0, "")
		}
		f.Ln(1.5)
	case bl.para != "":
		p.text(bl.para, 9, pdfLine, "sans")
		f.Ln(1.5)
	case len(bl.items) > 0:
		t := &table{cols: []column{{"", ""}, {"", ""}}}
		for _, it := range bl.items {
			v := it.val.str(sig)
			if it.unit != "" {
				v += " " + it.unit
			}
			t.rows = append(t.rows, []cell{txt(it.label), txt(v)})
		}
		p.table(t, false)
	case bl.tbl != nil:
		p.table(bl.tbl, true)
	case len(bl.eqs) > 0:
		f.SetLeftMargin(pdfMargin + 3)
		for _, e := range bl.eqs {
			p.text(e, 7.8, 3.6, "mono")
			f.Ln(0.6)
		}
		f.SetLeftMargin(pdfMargin)
		f.Ln(1)
	case len(bl.list) > 0:
		for i, l := range bl.list {
			f.SetFont("sans", "", 9)
			mark := "•"
			if heading == "Sources cited" {
				mark = strconv.Itoa(i+1) + "."
			}
			p.room(pdfLine)
			y := f.GetY()
			f.Text(pdfMargin+1, y+3.1, mark)
			f.SetLeftMargin(pdfMargin + 6)
			f.SetX(pdfMargin + 6)
			f.MultiCell(0, pdfLine, pdfClean(l), "", "L", false)
			f.SetLeftMargin(pdfMargin)
			f.Ln(0.6)
		}
		f.Ln(1)
	case bl.draw != nil:
		p.figure(bl.draw, bl.fig)
	}
}

// figure places a drawing as a PNG image, scaled to the text width at
// most, with its caption.
func (p *pdfWriter) figure(g *figure, caption string) {
	// fpdf writes images in order of their pixel width, in map order
	// among equal widths; one more dot per inch for each figure gives
	// every image its own width, so the same result gives the same bytes.
	p.figN++
	img, err := g.png(pdfDPI + p.figN)
	if err != nil {
		p.err = err
		return
	}
	name := "fig" + strconv.Itoa(p.figN)
	f := p.f
	f.RegisterImageOptionsReader(name, fpdf.ImageOptions{ImageType: "PNG"}, bytes.NewReader(img))
	w := math.Min(p.w, float64(g.w/vg.Millimeter))
	h := w * float64(g.h/g.w)
	if max := p.pageH - pdfTop - pdfBottom - 14; h > max {
		h = max
		w = h * float64(g.w/g.h)
	}
	p.room(h + 10)
	y := f.GetY()
	f.ImageOptions(name, pdfMargin+(p.w-w)/2, y, w, h, false, fpdf.ImageOptions{ImageType: "PNG"}, 0, "")
	f.SetY(y + h + 1)
	f.SetFont("sans", "", 8)
	f.SetTextColor(60, 60, 60)
	f.MultiCell(0, 3.6, pdfClean(caption), "", "C", false)
	f.SetTextColor(0, 0, 0)
	f.Ln(2)
}

// table draws t with a grid, numbers right-aligned. With a header, a
// table wider than the page is split into parts of whole columns that
// repeat the key columns (as in Text), a text column too wide for what is
// left wraps in its cell, and the header repeats on every page. Without a
// header (label-value items) the first column is bold-free labels.
func (p *pdfWriter) table(t *table, header bool) {
	f := p.f
	f.SetFont("sans", "", pdfTableFont)
	f.SetCellMargin(pdfPad)
	n := len(t.cols)
	heads := make([]string, n)
	right := make([]bool, n)
	natural := make([]float64, n)
	least := make([]float64, n) // the longest word
	for j, c := range t.cols {
		heads[j] = pdfClean(c.header())
		right[j] = true
		if header {
			f.SetFont("sans", "B", pdfTableFont)
			for _, w := range strings.Fields(heads[j]) {
				least[j] = max(least[j], f.GetStringWidth(w)+2*pdfPad+0.5)
			}
			natural[j] = f.GetStringWidth(heads[j]) + 2*pdfPad + 0.5
			f.SetFont("sans", "", pdfTableFont)
		}
	}
	cells := make([][]string, len(t.rows))
	for i, row := range t.rows {
		cells[i] = make([]string, n)
		for j, c := range row {
			cells[i][j] = pdfClean(c.str(sig))
			natural[j] = max(natural[j], f.GetStringWidth(cells[i][j])+2*pdfPad+0.5)
			if !c.num && c.s != "-" {
				right[j] = false
			}
			if c.num {
				least[j] = max(least[j], f.GetStringWidth(cells[i][j])+2*pdfPad+0.5)
			}
		}
	}
	if !header {
		right[1] = false
	}
	// Parts of whole columns, as in Text.
	var parts [][]int
	key := min(max(1, t.key), n-1)
	if n < 2 {
		parts = [][]int{{0}}
	} else {
		keys := make([]int, key)
		kw := 0.0
		for j := range key {
			keys[j] = j
			kw += max(least[j], math.Min(natural[j], 45))
		}
		cur := append([]int(nil), keys...)
		used := kw
		for j := key; j < n; j++ {
			wj := max(least[j], math.Min(natural[j], 45))
			if len(cur) > key && used+wj > p.w {
				parts = append(parts, cur)
				cur = append([]int(nil), keys...)
				used = kw
			}
			cur = append(cur, j)
			used += wj
		}
		parts = append(parts, cur)
	}
	for pi, cols := range parts {
		ws := make([]float64, len(cols))
		total := 0.0
		for k, j := range cols {
			ws[k] = natural[j]
			total += ws[k]
		}
		if total > p.w {
			// Shrink text columns towards their longest word, widest first,
			// in proportion to their excess.
			excess := total - p.w
			slack := 0.0
			for k, j := range cols {
				if !right[j] || !header {
					slack += ws[k] - least[j]
				}
			}
			for k, j := range cols {
				if (!right[j] || !header) && slack > 0 {
					ws[k] -= math.Min(ws[k]-least[j], excess*(ws[k]-least[j])/slack)
				}
			}
			total = 0
			for _, w := range ws {
				total += w
			}
			if total > p.w { // still too wide: scale every column
				for k := range ws {
					ws[k] *= p.w / total
				}
			}
		}
		if pi > 0 {
			f.SetFont("sans", "", 8)
			f.CellFormat(0, 4, "(continued)", "", 1, "L", false, 0, "")
		}
		drawHead := func() {
			if header {
				hs := make([]string, len(cols))
				for k, j := range cols {
					hs[k] = heads[j]
				}
				p.row(hs, ws, nil, true)
			}
		}
		p.room(2 * (pdfTableLine + 2))
		drawHead()
		for _, row := range cells {
			vs := make([]string, len(cols))
			al := make([]bool, len(cols))
			for k, j := range cols {
				vs[k] = row[j]
				al[k] = right[j]
			}
			if h := p.rowHeight(vs, ws, ""); f.GetY()+h > p.pageH-pdfBottom {
				f.AddPage()
				drawHead()
			}
			p.row(vs, ws, al, false)
		}
		f.Ln(2)
	}
}

func (p *pdfWriter) lines(s string, w float64) []string {
	if s == "" {
		return []string{""}
	}
	ls := p.f.SplitText(s, w)
	if len(ls) == 0 {
		return []string{""}
	}
	return ls
}

func (p *pdfWriter) rowHeight(vs []string, ws []float64, style string) float64 {
	p.f.SetFont("sans", style, pdfTableFont)
	h := 1
	for k, v := range vs {
		h = max(h, len(p.lines(v, ws[k])))
	}
	return float64(h)*pdfTableLine + 1.2
}

// row draws one table row at the current position; head rows are bold on
// grey.
func (p *pdfWriter) row(vs []string, ws []float64, rightAlign []bool, head bool) {
	f := p.f
	style := ""
	if head {
		style = "B"
	}
	h := p.rowHeight(vs, ws, style)
	f.SetFont("sans", style, pdfTableFont)
	x0, y := pdfMargin, f.GetY()
	f.SetDrawColor(150, 150, 150)
	f.SetLineWidth(0.15)
	f.SetFillColor(235, 235, 235)
	x := x0
	for k, v := range vs {
		mode := "D"
		if head {
			mode = "FD"
		}
		f.Rect(x, y, ws[k], h, mode)
		for i, l := range p.lines(v, ws[k]) {
			tx := x + pdfPad
			if rightAlign != nil && rightAlign[k] {
				tx = x + ws[k] - pdfPad - f.GetStringWidth(l)
			}
			f.Text(tx, y+0.6+float64(i+1)*pdfTableLine-0.8, l)
		}
		x += ws[k]
	}
	f.SetXY(x0, y+h)
}
