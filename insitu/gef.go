package insitu

import (
	"bytes"
	"math"
	"strconv"
	"strings"

	"io"

	"github.com/qultgeo/qult/units"
)

// GEF-CPT-Report quantity numbers of the columns read (#COLUMNINFO's
// fourth field) and the measurement variable holding the cone's net area
// ratio.
const (
	gefLength        = 1  // penetration length, m
	gefConeRes       = 2  // cone resistance qc, MPa
	gefFriction      = 3  // local (sleeve) friction fs, MPa
	gefPoreU2        = 6  // pore pressure behind the cone u2, MPa
	gefCorrDepth     = 11 // corrected depth, m
	gefVarAreaRatio  = 3  // #MEASUREMENTVAR 3: cone area quotient a
	gefMaxColumns    = 1024
	gefMaxHeaderLine = 1 << 16
)

// ReadGEF reads one cone sounding from a GEF-CPT-Report file (Geotechnical
// Exchange Format for CPT data, CUR, version 1.1.x). The header is a list
// of "#KEYWORD= values" lines ending with "#EOH="; the data rows follow,
// one reading a line, separated by #COLUMNSEPARATOR (white space when
// absent) and ended by #RECORDSEPARATOR when given.
//
// Keywords read: #GEFID (required), #REPORTCODE (when present it must be
// GEF-CPT-Report), #TESTID (the sounding's ID), #COLUMN (required),
// #COLUMNINFO (column, unit, name, quantity number), #COLUMNVOID,
// #COLUMNSEPARATOR, #RECORDSEPARATOR and #MEASUREMENTVAR 3 (the cone area
// quotient a; 1 when absent). Columns read by quantity number: 1
// penetration length or 11 corrected depth (m; 11 is used when both are
// given), 2 cone resistance qc, 3 sleeve friction fs, 6 pore pressure u2
// (MPa or kPa). A row holding a column's void value in any column read is
// left out and counted in Sounding.Voids. Quantity numbers 1, 2, 3, 4 and
// 6 and measurement variable 3 were read in files written to the
// definition; 11 (corrected depth) is from memory.
func ReadGEF(r io.Reader, file string) (*Sounding, error) {
	b, err := readAllLimited(r, file)
	if err != nil {
		return nil, err
	}
	b = bytes.TrimPrefix(b, []byte("\xef\xbb\xbf"))
	type colInfo struct {
		unit  string
		qty   int
		line  int
		void  float64
		voidd bool
	}
	cols := map[int]*colInfo{}
	nCols := 0
	colLine := 0
	sep, recSep := "", ""
	var gefid bool
	s := &Sounding{AreaRatio: 1}
	seen := map[string]int{}
	line := 0
	pos := 0
	eoh := false
	nextLine := func() (string, bool) {
		if pos >= len(b) {
			return "", false
		}
		end := bytes.IndexByte(b[pos:], '\n')
		var l []byte
		if end < 0 {
			l = b[pos:]
			pos = len(b)
		} else {
			l = b[pos : pos+end]
			pos += end + 1
		}
		line++
		return strings.TrimRight(string(l), "\r"), true
	}
	for !eoh {
		text, ok := nextLine()
		if !ok {
			return nil, perr(file, line, "#EOH", ErrMissing, "end of header")
		}
		t := strings.TrimSpace(text)
		if t == "" {
			continue
		}
		if !strings.HasPrefix(t, "#") {
			return nil, perr(file, line, "", ErrSyntax, "header line does not start with #")
		}
		kw, val, ok := strings.Cut(t[1:], "=")
		if !ok {
			return nil, perr(file, line, t, ErrSyntax, "no = after the keyword")
		}
		kw = "#" + strings.ToUpper(strings.TrimSpace(kw))
		val = strings.TrimSpace(val)
		fields := splitGEF(val)
		once := func() error {
			if prev, dup := seen[kw]; dup {
				return perr(file, line, kw, ErrDuplicate, "first on line %d", prev)
			}
			seen[kw] = line
			return nil
		}
		switch kw {
		case "#GEFID":
			if err := once(); err != nil {
				return nil, err
			}
			gefid = true
		case "#REPORTCODE":
			if err := once(); err != nil {
				return nil, err
			}
			if len(fields) == 0 || !strings.EqualFold(fields[0], "GEF-CPT-Report") {
				return nil, perr(file, line, kw, ErrNotSupported, "%q is not GEF-CPT-Report", val)
			}
		case "#TESTID":
			if err := once(); err != nil {
				return nil, err
			}
			s.ID = val
		case "#COLUMN":
			if err := once(); err != nil {
				return nil, err
			}
			n, err := strconv.Atoi(val)
			if err != nil || n < 2 || n > gefMaxColumns {
				return nil, perr(file, line, kw, ErrRange, "%q is not a column count from 2 to %d", val, gefMaxColumns)
			}
			nCols, colLine = n, line
		case "#COLUMNINFO":
			if len(fields) < 4 {
				return nil, perr(file, line, kw, ErrSyntax, "give column, unit, name, quantity number")
			}
			c, err1 := strconv.Atoi(fields[0])
			q, err2 := strconv.Atoi(fields[3])
			if err1 != nil || c < 1 || c > gefMaxColumns {
				return nil, perr(file, line, kw, ErrNumber, "column %q", fields[0])
			}
			if err2 != nil {
				return nil, perr(file, line, kw, ErrNumber, "quantity number %q", fields[3])
			}
			ci := cols[c]
			if ci == nil {
				ci = &colInfo{}
				cols[c] = ci
			} else if ci.line > 0 {
				return nil, perr(file, line, kw, ErrDuplicate, "column %d first described on line %d", c, ci.line)
			}
			ci.unit, ci.qty, ci.line = fields[1], q, line
		case "#COLUMNVOID":
			if len(fields) < 2 {
				return nil, perr(file, line, kw, ErrSyntax, "give column, void value")
			}
			c, err := strconv.Atoi(fields[0])
			if err != nil || c < 1 || c > gefMaxColumns {
				return nil, perr(file, line, kw, ErrNumber, "column %q", fields[0])
			}
			v, err := parseNumber(fields[1])
			if err != nil {
				return nil, perr(file, line, kw, err, "")
			}
			ci := cols[c]
			if ci == nil {
				ci = &colInfo{}
				cols[c] = ci
			}
			if ci.voidd {
				return nil, perr(file, line, kw, ErrDuplicate, "void value of column %d", c)
			}
			ci.void, ci.voidd = v, true
		case "#COLUMNSEPARATOR":
			if err := once(); err != nil {
				return nil, err
			}
			sep = val
			if sep == "" {
				return nil, perr(file, line, kw, ErrMissing, "separator character")
			}
		case "#RECORDSEPARATOR":
			if err := once(); err != nil {
				return nil, err
			}
			recSep = val
		case "#MEASUREMENTVAR":
			if len(fields) < 2 {
				return nil, perr(file, line, kw, ErrSyntax, "give index, value, unit, name")
			}
			i, err := strconv.Atoi(fields[0])
			if err != nil {
				return nil, perr(file, line, kw, ErrNumber, "index %q", fields[0])
			}
			mk := kw + " " + fields[0]
			if prev, dup := seen[mk]; dup {
				return nil, perr(file, line, mk, ErrDuplicate, "first on line %d", prev)
			}
			seen[mk] = line
			if i == gefVarAreaRatio {
				a, err := parseNumber(fields[1])
				if err != nil {
					return nil, perr(file, line, mk, err, "")
				}
				if !(a > 0 && a <= 1) {
					return nil, perr(file, line, mk, ErrRange, "cone area quotient %g is outside 0 (exclusive) to 1", a)
				}
				s.AreaRatio = a
			}
		case "#EOH":
			eoh = true
		}
	}
	if !gefid {
		return nil, perr(file, line, "#GEFID", ErrMissing, "keyword")
	}
	if nCols == 0 {
		return nil, perr(file, line, "#COLUMN", ErrMissing, "keyword")
	}
	// Find the columns by quantity number.
	at := map[int]int{} // quantity -> column index (0-based)
	for c, ci := range cols {
		if ci.line == 0 {
			continue
		}
		if c > nCols {
			return nil, perr(file, ci.line, "#COLUMNINFO", ErrRange, "column %d beyond #COLUMN= %d (line %d)", c, nCols, colLine)
		}
		if prev, dup := at[ci.qty]; dup && (ci.qty == gefLength || ci.qty == gefConeRes || ci.qty == gefFriction ||
			ci.qty == gefPoreU2 || ci.qty == gefCorrDepth) {
			return nil, perr(file, ci.line, "#COLUMNINFO", ErrDuplicate, "quantity %d in columns %d and %d", ci.qty, prev+1, c)
		}
		at[ci.qty] = c - 1
	}
	depthQ := gefLength
	if _, ok := at[gefCorrDepth]; ok {
		depthQ = gefCorrDepth
	}
	type use struct {
		q     int
		col   int
		scale float64
	}
	need := func(q int, name string, units map[string]float64, required bool) (use, error) {
		c, ok := at[q]
		if !ok {
			if required {
				return use{q: q, col: -1}, perr(file, line, "#COLUMNINFO", ErrMissing, "a column of quantity %d (%s)", q, name)
			}
			return use{q: q, col: -1}, nil
		}
		ci := cols[c+1]
		sc, ok := units[ci.unit]
		if !ok {
			return use{}, perr(file, ci.line, "#COLUMNINFO", ErrUnit, "%s in %q", name, ci.unit)
		}
		return use{q, c, sc}, nil
	}
	stressU := map[string]float64{"MPa": 1e6, "kPa": 1e3}
	dU, err := need(depthQ, "depth", map[string]float64{"m": 1}, true)
	if err != nil {
		return nil, err
	}
	qU, err := need(gefConeRes, "cone resistance", stressU, true)
	if err != nil {
		return nil, err
	}
	fU, err := need(gefFriction, "sleeve friction", stressU, true)
	if err != nil {
		return nil, err
	}
	uU, err := need(gefPoreU2, "pore pressure u2", stressU, false)
	if err != nil {
		return nil, err
	}
	s.HasU2 = uU.col >= 0
	colName := func(u use) string { return "column " + strconv.Itoa(u.col+1) + " (quantity " + strconv.Itoa(u.q) + ")" }
	vals := make([]float64, nCols)
	prev := math.Inf(-1)
	for {
		text, ok := nextLine()
		if !ok {
			break
		}
		t := strings.TrimSpace(text)
		if recSep != "" {
			t = strings.TrimSpace(strings.TrimSuffix(t, recSep))
		}
		if t == "" {
			continue
		}
		var cells []string
		if sep == "" {
			cells = strings.Fields(t)
		} else {
			cells = strings.Split(strings.TrimSuffix(t, sep), sep)
		}
		if len(cells) != nCols {
			return nil, perr(file, line, "", ErrSyntax, "%d values, #COLUMN= %d", len(cells), nCols)
		}
		void := false
		for _, u := range []use{dU, qU, fU, uU} {
			if u.col < 0 {
				continue
			}
			v, err := parseNumber(cells[u.col])
			if err != nil {
				return nil, perr(file, line, colName(u), err, "")
			}
			if ci := cols[u.col+1]; ci.voidd && v == ci.void {
				void = true
			}
			vals[u.col] = v
		}
		if void {
			s.Voids++
			continue
		}
		z := vals[dU.col]
		if z < 0 {
			return nil, perr(file, line, colName(dU), ErrRange, "depth %g is negative", z)
		}
		if !(z > prev) {
			return nil, perr(file, line, colName(dU), ErrDepthOrder, "%g after %g", z, prev)
		}
		prev = z
		row := Row{Depth: units.Length(z * dU.scale), Qc: units.Stress(vals[qU.col] * qU.scale), Fs: units.Stress(vals[fU.col] * fU.scale)}
		if row.Qc < 0 {
			return nil, perr(file, line, colName(qU), ErrRange, "%g is negative", vals[qU.col])
		}
		if row.Fs < 0 {
			return nil, perr(file, line, colName(fU), ErrRange, "%g is negative", vals[fU.col])
		}
		if uU.col >= 0 {
			row.U2 = units.Stress(vals[uU.col] * uU.scale)
		}
		s.Rows = append(s.Rows, row)
	}
	if len(s.Rows) == 0 {
		return nil, perr(file, line, "", ErrNoData, "")
	}
	return s, nil
}

// splitGEF splits a keyword's value at commas and trims each field.
func splitGEF(v string) []string {
	if v == "" {
		return nil
	}
	f := strings.Split(v, ",")
	for i := range f {
		f[i] = strings.TrimSpace(f[i])
	}
	return f
}
