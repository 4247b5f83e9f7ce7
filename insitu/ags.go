package insitu

import (
	"bytes"
	"encoding/csv"
	"errors"
	"io"
	"slices"
	"strings"

	"github.com/qultgeo/qult/units"
)

// AGSData is what ReadAGS takes from an AGS4 file.
type AGSData struct {
	Locations []string   // LOCA_ID of group LOCA, in file order
	Soundings []Sounding // from SCPT, with the cone area ratio of SCPG
	SPT       []SPT      // from ISPT
	Strata    []Stratum  // from GEOL
}

// agsRow is one DATA row with the line of each cell.
type agsRow struct {
	cells []string
	lines []int
}

type agsGroup struct {
	name     string
	line     int
	headings []string
	units    []string
	index    map[string]int
	headLine int
	unitLine int
	typed    bool
	rows     []agsRow
}

// ReadAGS reads the groups LOCA, GEOL, ISPT, SCPG and SCPT of an AGS4
// file (AGS4 Data Format, 4.x). Every line is a record of quoted,
// comma-separated fields whose first field says what it is: a GROUP line
// names a group; a HEADING line, the UNIT line and the TYPE line follow it
// in that order, each with one field per heading; DATA lines follow them.
// Other groups are checked for this structure and otherwise skipped.
//
// Headings read (units accepted):
//
//	LOCA  LOCA_ID
//	GEOL  LOCA_ID, GEOL_TOP (m), GEOL_BASE (m), GEOL_DESC, GEOL_LEG
//	ISPT  LOCA_ID, ISPT_TOP (m), ISPT_NVAL, ISPT_ERAT (%)
//	SCPG  LOCA_ID, SCPG_TESN, SCPG_CAR (the cone area ratio; 1 when absent)
//	SCPT  LOCA_ID, SCPG_TESN, SCPT_DPTH (m), SCPT_RES (MPa, MN/m2, kPa, kN/m2),
//	      SCPT_FRES (same), SCPT_PWP2 (same)
//
// A sounding's ID is its LOCA_ID, or LOCA_ID/SCPG_TESN when a location has
// more than one test. The ISPT group holds no rod length, borehole
// diameter or sampler: those fields of SPT are left zero (not recorded).
// A missing HEADING, UNIT or TYPE line, a unit not accepted, a cell that is
// not a number, depths that do not increase, a group given twice or a
// LOCA_ID not in LOCA give a *ParseError naming file, line and field.
func ReadAGS(r io.Reader, file string) (*AGSData, error) {
	b, err := readAllLimited(r, file)
	if err != nil {
		return nil, err
	}
	b = bytes.TrimPrefix(b, []byte("\xef\xbb\xbf"))
	cr := csv.NewReader(bytes.NewReader(b))
	cr.FieldsPerRecord = -1
	groups := map[string]*agsGroup{}
	var g *agsGroup
	for {
		rec, err := cr.Read()
		if err == io.EOF {
			break
		}
		if err != nil {
			var pe *csv.ParseError
			if errors.As(err, &pe) {
				return nil, perr(file, pe.Line, "", ErrSyntax, "%v", pe.Err)
			}
			return nil, perr(file, 0, "", err, "")
		}
		line, _ := cr.FieldPos(0)
		kind := rec[0]
		switch kind {
		case "GROUP":
			if len(rec) != 2 || rec[1] == "" {
				return nil, perr(file, line, "GROUP", ErrSyntax, "a GROUP line holds one group name")
			}
			if old, dup := groups[rec[1]]; dup {
				return nil, perr(file, line, rec[1], ErrDuplicate, "group first given on line %d", old.line)
			}
			if g != nil && !g.typed {
				return nil, g.incomplete(file, line)
			}
			g = &agsGroup{name: rec[1], line: line}
			groups[g.name] = g
		case "HEADING":
			if g == nil {
				return nil, perr(file, line, "HEADING", ErrMissing, "GROUP line before it")
			}
			if g.headings != nil {
				return nil, perr(file, line, g.name, ErrDuplicate, "HEADING line")
			}
			g.headings = append([]string(nil), rec[1:]...)
			g.headLine = line
			g.index = map[string]int{}
			for i, h := range g.headings {
				if _, dup := g.index[h]; dup {
					fl, _ := cr.FieldPos(i + 1)
					return nil, perr(file, fl, g.name+"."+h, ErrDuplicate, "heading")
				}
				g.index[h] = i
			}
		case "UNIT", "TYPE", "DATA":
			if g == nil {
				return nil, perr(file, line, kind, ErrMissing, "GROUP line before it")
			}
			if g.headings == nil {
				return nil, perr(file, line, g.name, ErrMissing, "HEADING line before the %s line", kind)
			}
			if len(rec)-1 != len(g.headings) {
				return nil, perr(file, line, g.name, ErrSyntax, "%s line has %d fields, HEADING line %d", kind, len(rec)-1, len(g.headings))
			}
			switch kind {
			case "UNIT":
				if g.units != nil {
					return nil, perr(file, line, g.name, ErrDuplicate, "UNIT line")
				}
				g.units = append([]string(nil), rec[1:]...)
				g.unitLine = line
			case "TYPE":
				if g.units == nil {
					return nil, perr(file, line, g.name, ErrMissing, "UNIT line before the TYPE line")
				}
				if g.typed {
					return nil, perr(file, line, g.name, ErrDuplicate, "TYPE line")
				}
				g.typed = true
			case "DATA":
				if !g.typed {
					return nil, g.incomplete(file, line)
				}
				row := agsRow{cells: append([]string(nil), rec[1:]...), lines: make([]int, len(rec)-1)}
				for i := range row.lines {
					row.lines[i], _ = cr.FieldPos(i + 1)
				}
				g.rows = append(g.rows, row)
			}
		default:
			return nil, perr(file, line, kind, ErrSyntax, "a line starts with GROUP, HEADING, UNIT, TYPE or DATA")
		}
	}
	if g == nil {
		return nil, perr(file, 0, "", ErrNoData, "no GROUP line")
	}
	if !g.typed {
		return nil, g.incomplete(file, 0)
	}
	return buildAGS(groups, file)
}

func (g *agsGroup) incomplete(file string, line int) error {
	switch {
	case g.headings == nil:
		return perr(file, line, g.name, ErrMissing, "HEADING line")
	case g.units == nil:
		return perr(file, line, g.name, ErrMissing, "UNIT line")
	default:
		return perr(file, line, g.name, ErrMissing, "TYPE line")
	}
}

// agsReader reads typed cells of one group.
type agsReader struct {
	file string
	g    *agsGroup
}

func (a agsReader) col(h string, required bool) (int, error) {
	i, ok := a.g.index[h]
	if !ok {
		if required {
			return -1, perr(a.file, a.g.headLine, a.g.name+"."+h, ErrMissing, "heading")
		}
		return -1, nil
	}
	return i, nil
}

// unit checks the unit of heading column i against the accepted ones and
// returns its scale to SI.
func (a agsReader) unit(i int, accepted map[string]float64) (float64, error) {
	if i < 0 {
		return 0, nil
	}
	u := a.g.units[i]
	s, ok := accepted[u]
	if !ok {
		var names []string
		for k := range accepted {
			names = append(names, "\""+k+"\"")
		}
		slices.Sort(names)
		return 0, perr(a.file, a.g.unitLine, a.g.name+"."+a.g.headings[i], ErrUnit, "%q (accepted: %s)", u, strings.Join(names, ", "))
	}
	return s, nil
}

func (a agsReader) num(r agsRow, i int) (float64, error) {
	v, err := parseNumber(r.cells[i])
	if err != nil {
		if strings.TrimSpace(r.cells[i]) == "" {
			err = ErrMissing
		}
		return 0, perr(a.file, r.lines[i], a.g.name+"."+a.g.headings[i], err, "")
	}
	return v, nil
}

func (a agsReader) text(r agsRow, i int) string {
	if i < 0 {
		return ""
	}
	return r.cells[i]
}

var (
	agsMetre  = map[string]float64{"m": 1}
	agsStress = map[string]float64{"MPa": 1e6, "MN/m2": 1e6, "kPa": 1e3, "kN/m2": 1e3}
	agsRatio  = map[string]float64{"": 1, "-": 1}
	agsPct    = map[string]float64{"%": 1}
	agsCount  = map[string]float64{"": 1, "-": 1, "blows": 1}
)

func buildAGS(groups map[string]*agsGroup, file string) (*AGSData, error) {
	out := &AGSData{}
	locs := map[string]bool{}
	loca := groups["LOCA"]
	if loca != nil {
		a := agsReader{file, loca}
		id, err := a.col("LOCA_ID", true)
		if err != nil {
			return nil, err
		}
		for _, r := range loca.rows {
			v := r.cells[id]
			if v == "" {
				return nil, perr(file, r.lines[id], "LOCA.LOCA_ID", ErrMissing, "")
			}
			if locs[v] {
				return nil, perr(file, r.lines[id], "LOCA.LOCA_ID", ErrDuplicate, "%q", v)
			}
			locs[v] = true
			out.Locations = append(out.Locations, v)
		}
	}
	checkLoc := func(a agsReader, r agsRow, i int) (string, error) {
		v := r.cells[i]
		if v == "" {
			return "", perr(file, r.lines[i], a.g.name+".LOCA_ID", ErrMissing, "")
		}
		if loca == nil {
			return "", perr(file, r.lines[i], a.g.name+".LOCA_ID", ErrMissing, "group LOCA, which must list %q", v)
		}
		if !locs[v] {
			return "", perr(file, r.lines[i], a.g.name+".LOCA_ID", ErrMissing, "%q is not in group LOCA", v)
		}
		return v, nil
	}
	if g := groups["GEOL"]; g != nil {
		a := agsReader{file, g}
		id, err := a.col("LOCA_ID", true)
		if err != nil {
			return nil, err
		}
		top, err := a.col("GEOL_TOP", true)
		if err != nil {
			return nil, err
		}
		base, err := a.col("GEOL_BASE", true)
		if err != nil {
			return nil, err
		}
		desc, _ := a.col("GEOL_DESC", false)
		leg, _ := a.col("GEOL_LEG", false)
		for _, i := range []int{top, base} {
			if _, err := a.unit(i, agsMetre); err != nil {
				return nil, err
			}
		}
		last := map[string]float64{}
		for _, r := range g.rows {
			loc, err := checkLoc(a, r, id)
			if err != nil {
				return nil, err
			}
			t, err := a.num(r, top)
			if err != nil {
				return nil, err
			}
			bo, err := a.num(r, base)
			if err != nil {
				return nil, err
			}
			if t < 0 {
				return nil, perr(file, r.lines[top], "GEOL.GEOL_TOP", ErrRange, "%g is negative", t)
			}
			if !(bo > t) {
				return nil, perr(file, r.lines[base], "GEOL.GEOL_BASE", ErrDepthOrder, "base %g is not below top %g", bo, t)
			}
			if prev, ok := last[loc]; ok && t < prev {
				return nil, perr(file, r.lines[top], "GEOL.GEOL_TOP", ErrDepthOrder, "%g is above the previous stratum's base %g", t, prev)
			}
			last[loc] = bo
			out.Strata = append(out.Strata, Stratum{Location: loc, Top: units.Length(t), Base: units.Length(bo),
				Description: a.text(r, desc), Legend: a.text(r, leg)})
		}
	}
	if g := groups["ISPT"]; g != nil {
		a := agsReader{file, g}
		id, err := a.col("LOCA_ID", true)
		if err != nil {
			return nil, err
		}
		top, err := a.col("ISPT_TOP", true)
		if err != nil {
			return nil, err
		}
		nv, err := a.col("ISPT_NVAL", true)
		if err != nil {
			return nil, err
		}
		er, _ := a.col("ISPT_ERAT", false)
		if _, err := a.unit(top, agsMetre); err != nil {
			return nil, err
		}
		if _, err := a.unit(nv, agsCount); err != nil {
			return nil, err
		}
		if _, err := a.unit(er, agsPct); err != nil {
			return nil, err
		}
		last := map[string]float64{}
		for _, r := range g.rows {
			loc, err := checkLoc(a, r, id)
			if err != nil {
				return nil, err
			}
			z, err := a.num(r, top)
			if err != nil {
				return nil, err
			}
			if z < 0 {
				return nil, perr(file, r.lines[top], "ISPT.ISPT_TOP", ErrRange, "%g is negative", z)
			}
			if prev, ok := last[loc]; ok && !(z > prev) {
				return nil, perr(file, r.lines[top], "ISPT.ISPT_TOP", ErrDepthOrder, "%g after %g", z, prev)
			}
			last[loc] = z
			n, err := a.num(r, nv)
			if err != nil {
				return nil, err
			}
			if n < 0 {
				return nil, perr(file, r.lines[nv], "ISPT.ISPT_NVAL", ErrRange, "%g is negative", n)
			}
			p := SPT{Location: loc, Depth: units.Length(z), N: n}
			if er >= 0 && strings.TrimSpace(r.cells[er]) != "" {
				e, err := a.num(r, er)
				if err != nil {
					return nil, err
				}
				if !(e > 0 && e <= 100) {
					return nil, perr(file, r.lines[er], "ISPT.ISPT_ERAT", ErrRange, "%g is outside 0 (exclusive) to 100", e)
				}
				p.EnergyRatio = e
			}
			out.SPT = append(out.SPT, p)
		}
	}
	if g := groups["SCPT"]; g != nil {
		if err := buildSCPT(out, g, groups["SCPG"], file, checkLoc); err != nil {
			return nil, err
		}
	}
	return out, nil
}

func buildSCPT(out *AGSData, g, scpg *agsGroup, file string, checkLoc func(agsReader, agsRow, int) (string, error)) error {
	type key struct{ loc, test string }
	ratio := map[key]float64{}
	if scpg != nil {
		a := agsReader{file, scpg}
		id, err := a.col("LOCA_ID", true)
		if err != nil {
			return err
		}
		tn, _ := a.col("SCPG_TESN", false)
		car, _ := a.col("SCPG_CAR", false)
		if _, err := a.unit(car, agsRatio); err != nil {
			return err
		}
		for _, r := range scpg.rows {
			loc, err := checkLoc(a, r, id)
			if err != nil {
				return err
			}
			k := key{loc, a.text(r, tn)}
			if _, dup := ratio[k]; dup {
				return perr(file, r.lines[id], "SCPG.SCPG_TESN", ErrDuplicate, "test %q at %q", k.test, k.loc)
			}
			ratio[k] = 1
			if car >= 0 && strings.TrimSpace(r.cells[car]) != "" {
				v, err := a.num(r, car)
				if err != nil {
					return err
				}
				if !(v > 0 && v <= 1) {
					return perr(file, r.lines[car], "SCPG.SCPG_CAR", ErrRange, "%g is outside 0 (exclusive) to 1", v)
				}
				ratio[k] = v
			}
		}
	}
	a := agsReader{file, g}
	id, err := a.col("LOCA_ID", true)
	if err != nil {
		return err
	}
	tn, _ := a.col("SCPG_TESN", false)
	dp, err := a.col("SCPT_DPTH", true)
	if err != nil {
		return err
	}
	res, err := a.col("SCPT_RES", true)
	if err != nil {
		return err
	}
	fres, err := a.col("SCPT_FRES", true)
	if err != nil {
		return err
	}
	pwp, _ := a.col("SCPT_PWP2", false)
	if _, err := a.unit(dp, agsMetre); err != nil {
		return err
	}
	qs, err := a.unit(res, agsStress)
	if err != nil {
		return err
	}
	fs, err := a.unit(fres, agsStress)
	if err != nil {
		return err
	}
	us, err := a.unit(pwp, agsStress)
	if err != nil {
		return err
	}
	var order []key
	byKey := map[key]*Sounding{}
	u2Seen := map[key]int{} // 1 blank, 2 given
	for _, r := range g.rows {
		loc, err := checkLoc(a, r, id)
		if err != nil {
			return err
		}
		k := key{loc, a.text(r, tn)}
		s := byKey[k]
		if s == nil {
			ar, ok := ratio[k]
			if !ok {
				ar = 1
			}
			s = &Sounding{ID: loc, AreaRatio: ar}
			byKey[k] = s
			order = append(order, k)
		}
		z, err := a.num(r, dp)
		if err != nil {
			return err
		}
		if z < 0 {
			return perr(file, r.lines[dp], "SCPT.SCPT_DPTH", ErrRange, "%g is negative", z)
		}
		if n := len(s.Rows); n > 0 && !(z > float64(s.Rows[n-1].Depth)) {
			return perr(file, r.lines[dp], "SCPT.SCPT_DPTH", ErrDepthOrder, "%g after %g", z, float64(s.Rows[n-1].Depth))
		}
		q, err := a.num(r, res)
		if err != nil {
			return err
		}
		if q < 0 {
			return perr(file, r.lines[res], "SCPT.SCPT_RES", ErrRange, "%g is negative", q)
		}
		f, err := a.num(r, fres)
		if err != nil {
			return err
		}
		if f < 0 {
			return perr(file, r.lines[fres], "SCPT.SCPT_FRES", ErrRange, "%g is negative", f)
		}
		row := Row{Depth: units.Length(z), Qc: units.Stress(q * qs), Fs: units.Stress(f * fs)}
		if pwp >= 0 {
			state := 1
			if strings.TrimSpace(r.cells[pwp]) != "" {
				state = 2
				u, err := a.num(r, pwp)
				if err != nil {
					return err
				}
				row.U2 = units.Stress(u * us)
				s.HasU2 = true
			}
			if prev, ok := u2Seen[k]; ok && prev != state {
				return perr(file, r.lines[pwp], "SCPT.SCPT_PWP2", ErrMissing, "given on some rows of the test and not on others")
			}
			u2Seen[k] = state
		}
		s.Rows = append(s.Rows, row)
	}
	perLoc := map[string]int{}
	for _, k := range order {
		perLoc[k.loc]++
	}
	for _, k := range order {
		s := byKey[k]
		if perLoc[k.loc] > 1 {
			s.ID = k.loc + "/" + k.test
		}
		out.Soundings = append(out.Soundings, *s)
	}
	return nil
}
