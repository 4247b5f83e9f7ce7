package insitu

import (
	"bufio"
	"bytes"
	"encoding/csv"
	"errors"
	"fmt"
	"io"
	"math"
	"strconv"
	"strings"

	"github.com/qultgeo/qult/units"
)

// The CSV forms are our own. A file opens with optional metadata lines
// "# key: value", then one header line naming the columns with their units,
// then one line per reading:
//
//	# id: CPT-07
//	# area_ratio: 0.80
//	depth_m,qc_MPa,fs_kPa,u2_kPa
//	0.50,1.84,21.5,3.1
//
// CPT columns: depth_m (required); exactly one of qc_MPa, qc_kPa, qt_MPa,
// qt_kPa (required; qt_ means the file already holds qt = qc + u2(1 − a));
// fs_kPa or fs_MPa (required); u2_kPa or u2_MPa (optional). Metadata keys:
// id, area_ratio (0 < a ≤ 1; 1 when absent, meaning qt = qc).
//
// SPT columns: depth_m and n (required); location, energy_ratio_pct,
// rod_length_m, borehole_mm and sampler (no-liner, liner-dense,
// liner-loose) optional. Depths increase within a location.
//
// Values are plain decimal numbers; NaN and infinities are refused. Blank
// lines are skipped. A column not listed above is an error, so that a
// misspelt header is never read as missing data.

type csvTable struct {
	file   string
	meta   map[string]string
	metaLn map[string]int
	header []string
	headLn int
	r      *csv.Reader
	offset int // lines before the CSV body
}

func readAllLimited(r io.Reader, file string) ([]byte, error) {
	b, err := io.ReadAll(io.LimitReader(r, maxFile+1))
	if err != nil {
		return nil, perr(file, 0, "", err, "")
	}
	if len(b) > maxFile {
		return nil, perr(file, 0, "", ErrTooLarge, "more than %d bytes", maxFile)
	}
	return b, nil
}

func openCSV(r io.Reader, file string) (*csvTable, error) {
	b, err := readAllLimited(r, file)
	if err != nil {
		return nil, err
	}
	t := &csvTable{file: file, meta: map[string]string{}, metaLn: map[string]int{}}
	pos := 0
	line := 0
	for pos < len(b) {
		end := bytes.IndexByte(b[pos:], '\n')
		next := len(b)
		if end >= 0 {
			next = pos + end + 1
			end += pos
		} else {
			end = len(b)
		}
		trimmed := strings.TrimSpace(string(b[pos:end]))
		if trimmed != "" && !strings.HasPrefix(trimmed, "#") {
			break
		}
		line++
		pos = next
		if trimmed == "" || trimmed == "#" {
			continue
		}
		kv := strings.TrimSpace(strings.TrimPrefix(trimmed, "#"))
		k, v, ok := strings.Cut(kv, ":")
		if !ok {
			continue // a comment
		}
		k = strings.TrimSpace(k)
		if _, dup := t.meta[k]; dup {
			return nil, perr(file, line, k, ErrDuplicate, "")
		}
		t.meta[k] = strings.TrimSpace(v)
		t.metaLn[k] = line
	}
	t.offset = line
	t.r = csv.NewReader(bytes.NewReader(b[pos:]))
	t.r.FieldsPerRecord = 0
	t.r.Comment = '#'
	t.r.ReuseRecord = true
	rec, err := t.r.Read()
	if err == io.EOF {
		return nil, perr(file, line+1, "", ErrMissing, "header line")
	}
	if err != nil {
		return nil, t.csvErr(err)
	}
	t.headLn = t.line(0)
	t.header = make([]string, len(rec))
	seen := map[string]bool{}
	for i, h := range rec {
		h = strings.TrimSpace(h)
		if seen[h] {
			return nil, perr(file, t.headLn, h, ErrDuplicate, "column")
		}
		seen[h] = true
		t.header[i] = h
	}
	return t, nil
}

func (t *csvTable) line(field int) int {
	l, _ := t.r.FieldPos(field)
	return l + t.offset
}

func (t *csvTable) csvErr(err error) error {
	var pe *csv.ParseError
	if errors.As(err, &pe) {
		return perr(t.file, pe.Line+t.offset, "", ErrSyntax, "%v", pe.Err)
	}
	return perr(t.file, 0, "", err, "")
}

// column finds one of the names (each with its SI scale); it returns -1
// when none is present and an error when more than one is.
func (t *csvTable) column(names []string, scales []float64) (int, float64, error) {
	at, scale := -1, 0.0
	for i, h := range t.header {
		for j, n := range names {
			if h == n {
				if at >= 0 {
					return 0, 0, perr(t.file, t.headLn, h, ErrDuplicate, "give one of %s", strings.Join(names, ", "))
				}
				at, scale = i, scales[j]
			}
		}
	}
	return at, scale, nil
}

func (t *csvTable) checkKnown(known map[string]bool) error {
	for _, h := range t.header {
		if !known[h] {
			return perr(t.file, t.headLn, h, ErrNotSupported, "unknown column")
		}
	}
	return nil
}

func parseNumber(s string) (float64, error) {
	s = strings.TrimSpace(s)
	v, err := strconv.ParseFloat(s, 64)
	if err != nil || math.IsNaN(v) || math.IsInf(v, 0) {
		return 0, fmt.Errorf("%w: %q", ErrNumber, s)
	}
	return v, nil
}

func (t *csvTable) number(rec []string, col int) (float64, error) {
	v, err := parseNumber(rec[col])
	if err != nil {
		return 0, perr(t.file, t.line(col), t.header[col], err, "")
	}
	return v, nil
}

// ReadCPTCSV reads one sounding in our CSV form (see the package
// documentation and the comment above). file names the input in errors.
func ReadCPTCSV(r io.Reader, file string) (*Sounding, error) {
	t, err := openCSV(r, file)
	if err != nil {
		return nil, err
	}
	s := &Sounding{ID: t.meta["id"], AreaRatio: 1}
	if v, ok := t.meta["area_ratio"]; ok {
		a, err := parseNumber(v)
		if err != nil {
			return nil, perr(file, t.metaLn["area_ratio"], "area_ratio", err, "")
		}
		if !(a > 0 && a <= 1) {
			return nil, perr(file, t.metaLn["area_ratio"], "area_ratio", ErrRange, "%g is outside 0 (exclusive) to 1", a)
		}
		s.AreaRatio = a
	}
	for k := range t.meta {
		if k != "id" && k != "area_ratio" {
			return nil, perr(file, t.metaLn[k], k, ErrNotSupported, "unknown metadata key (id, area_ratio)")
		}
	}
	if err := t.checkKnown(map[string]bool{"depth_m": true, "qc_MPa": true, "qc_kPa": true, "qt_MPa": true,
		"qt_kPa": true, "fs_kPa": true, "fs_MPa": true, "u2_kPa": true, "u2_MPa": true}); err != nil {
		return nil, err
	}
	dc, _, _ := t.column([]string{"depth_m"}, []float64{1})
	qc, qs, err := t.column([]string{"qc_MPa", "qc_kPa", "qt_MPa", "qt_kPa"}, []float64{1e6, 1e3, 1e6, 1e3})
	if err != nil {
		return nil, err
	}
	fc, fsc, err := t.column([]string{"fs_kPa", "fs_MPa"}, []float64{1e3, 1e6})
	if err != nil {
		return nil, err
	}
	uc, us, err := t.column([]string{"u2_kPa", "u2_MPa"}, []float64{1e3, 1e6})
	if err != nil {
		return nil, err
	}
	for _, m := range []struct {
		at   int
		name string
	}{{dc, "depth_m"}, {qc, "qc_MPa"}, {fc, "fs_kPa"}} {
		if m.at < 0 {
			return nil, perr(file, t.headLn, m.name, ErrMissing, "required column")
		}
	}
	s.TipCorrected = strings.HasPrefix(t.header[qc], "qt_")
	s.HasU2 = uc >= 0
	prev := math.Inf(-1)
	for {
		rec, err := t.r.Read()
		if err == io.EOF {
			break
		}
		if err != nil {
			return nil, t.csvErr(err)
		}
		var row Row
		z, err := t.number(rec, dc)
		if err != nil {
			return nil, err
		}
		if z < 0 {
			return nil, perr(file, t.line(dc), "depth_m", ErrRange, "%g is negative", z)
		}
		if !(z > prev) {
			return nil, perr(file, t.line(dc), "depth_m", ErrDepthOrder, "%g after %g", z, prev)
		}
		prev = z
		row.Depth = units.Length(z)
		q, err := t.number(rec, qc)
		if err != nil {
			return nil, err
		}
		if q < 0 {
			return nil, perr(file, t.line(qc), t.header[qc], ErrRange, "%g is negative", q)
		}
		row.Qc = units.Stress(q * qs)
		f, err := t.number(rec, fc)
		if err != nil {
			return nil, err
		}
		if f < 0 {
			return nil, perr(file, t.line(fc), t.header[fc], ErrRange, "%g is negative", f)
		}
		row.Fs = units.Stress(f * fsc)
		if uc >= 0 {
			u, err := t.number(rec, uc)
			if err != nil {
				return nil, err
			}
			row.U2 = units.Stress(u * us)
		}
		s.Rows = append(s.Rows, row)
	}
	if len(s.Rows) == 0 {
		return nil, perr(file, t.headLn, "", ErrNoData, "")
	}
	return s, nil
}

func fmtNum(v float64) string { return strconv.FormatFloat(v, 'g', -1, 64) }

// WriteCPTCSV writes a sounding in our CSV form: depth_m, qc_MPa (qt_MPa
// when the sounding holds qt), fs_kPa and, when measured, u2_kPa.
func WriteCPTCSV(w io.Writer, s *Sounding) error {
	bw := bufio.NewWriter(w)
	fmt.Fprintf(bw, "# qult CPT sounding\n")
	if s.ID != "" {
		fmt.Fprintf(bw, "# id: %s\n", strings.ReplaceAll(s.ID, "\n", " "))
	}
	fmt.Fprintf(bw, "# area_ratio: %s\n", fmtNum(s.AreaRatio))
	q := "qc_MPa"
	if s.TipCorrected {
		q = "qt_MPa"
	}
	bw.WriteString("depth_m," + q + ",fs_kPa")
	if s.HasU2 {
		bw.WriteString(",u2_kPa")
	}
	bw.WriteString("\n")
	for _, r := range s.Rows {
		bw.WriteString(fmtNum(float64(r.Depth)))
		bw.WriteByte(',')
		bw.WriteString(fmtNum(r.Qc.MPa()))
		bw.WriteByte(',')
		bw.WriteString(fmtNum(r.Fs.KPa()))
		if s.HasU2 {
			bw.WriteByte(',')
			bw.WriteString(fmtNum(r.U2.KPa()))
		}
		bw.WriteByte('\n')
	}
	return bw.Flush()
}

// ReadSPTCSV reads SPT records in our CSV form (see the comment above).
func ReadSPTCSV(r io.Reader, file string) ([]SPT, error) {
	t, err := openCSV(r, file)
	if err != nil {
		return nil, err
	}
	for k := range t.meta {
		return nil, perr(file, t.metaLn[k], k, ErrNotSupported, "unknown metadata key")
	}
	if err := t.checkKnown(map[string]bool{"location": true, "depth_m": true, "n": true, "energy_ratio_pct": true,
		"rod_length_m": true, "borehole_mm": true, "sampler": true}); err != nil {
		return nil, err
	}
	idx := func(n string) int { c, _, _ := t.column([]string{n}, []float64{1}); return c }
	lc, dc, nc, ec, rc, bc, sc := idx("location"), idx("depth_m"), idx("n"), idx("energy_ratio_pct"),
		idx("rod_length_m"), idx("borehole_mm"), idx("sampler")
	if dc < 0 {
		return nil, perr(file, t.headLn, "depth_m", ErrMissing, "required column")
	}
	if nc < 0 {
		return nil, perr(file, t.headLn, "n", ErrMissing, "required column")
	}
	var out []SPT
	last := map[string]float64{}
	for {
		rec, err := t.r.Read()
		if err == io.EOF {
			break
		}
		if err != nil {
			return nil, t.csvErr(err)
		}
		var p SPT
		if lc >= 0 {
			p.Location = strings.TrimSpace(rec[lc])
		}
		z, err := t.number(rec, dc)
		if err != nil {
			return nil, err
		}
		if z < 0 {
			return nil, perr(file, t.line(dc), "depth_m", ErrRange, "%g is negative", z)
		}
		if prev, ok := last[p.Location]; ok && !(z > prev) {
			return nil, perr(file, t.line(dc), "depth_m", ErrDepthOrder, "%g after %g", z, prev)
		}
		last[p.Location] = z
		p.Depth = units.Length(z)
		if p.N, err = t.number(rec, nc); err != nil {
			return nil, err
		}
		if p.N < 0 {
			return nil, perr(file, t.line(nc), "n", ErrRange, "%g is negative", p.N)
		}
		if ec >= 0 && strings.TrimSpace(rec[ec]) != "" {
			if p.EnergyRatio, err = t.number(rec, ec); err != nil {
				return nil, err
			}
			if !(p.EnergyRatio > 0 && p.EnergyRatio <= 100) {
				return nil, perr(file, t.line(ec), "energy_ratio_pct", ErrRange, "%g is outside 0 (exclusive) to 100", p.EnergyRatio)
			}
		}
		if rc >= 0 && strings.TrimSpace(rec[rc]) != "" {
			v, err := t.number(rec, rc)
			if err != nil {
				return nil, err
			}
			if !(v > 0) {
				return nil, perr(file, t.line(rc), "rod_length_m", ErrRange, "%g is not positive", v)
			}
			p.RodLength = units.Length(v)
		}
		if bc >= 0 && strings.TrimSpace(rec[bc]) != "" {
			v, err := t.number(rec, bc)
			if err != nil {
				return nil, err
			}
			if !(v > 0) {
				return nil, perr(file, t.line(bc), "borehole_mm", ErrRange, "%g is not positive", v)
			}
			p.Borehole = units.Length(v) * units.Millimetre
		}
		if sc >= 0 && strings.TrimSpace(rec[sc]) != "" {
			s, ok := ParseSampler(strings.TrimSpace(rec[sc]))
			if !ok {
				return nil, perr(file, t.line(sc), "sampler", ErrRange, "%q is not no-liner, liner-dense or liner-loose", rec[sc])
			}
			p.Sampler = s
		}
		out = append(out, p)
	}
	if len(out) == 0 {
		return nil, perr(file, t.headLn, "", ErrNoData, "")
	}
	return out, nil
}

// WriteSPTCSV writes SPT records in our CSV form. Values not recorded
// (zero) are written as empty cells.
func WriteSPTCSV(w io.Writer, tests []SPT) error {
	bw := bufio.NewWriter(w)
	cw := csv.NewWriter(bw)
	cw.Write([]string{"location", "depth_m", "n", "energy_ratio_pct", "rod_length_m", "borehole_mm", "sampler"})
	opt := func(v float64) string {
		if v == 0 {
			return ""
		}
		return fmtNum(v)
	}
	for _, p := range tests {
		cw.Write([]string{p.Location, fmtNum(float64(p.Depth)), fmtNum(p.N), opt(p.EnergyRatio),
			opt(float64(p.RodLength)), opt(p.Borehole.Millimetres()), p.Sampler.String()})
	}
	cw.Flush()
	if err := cw.Error(); err != nil {
		return err
	}
	return bw.Flush()
}
