package insitu

import (
	"bufio"
	"errors"
	"fmt"
	"io"
	"math"
	"strconv"
	"strings"
)

// errQtOnly: the AGS4 and GEF writers write the measured qc; a sounding
// that holds only qt is written in the CSV form.
var errQtOnly = errors.New("insitu: the sounding holds qt, not qc; write it in the CSV form")

func fixed(v float64, dp int) string { return strconv.FormatFloat(v, 'f', dp, 64) }

func checkWritable(s *Sounding) error {
	if s.TipCorrected {
		return errQtOnly
	}
	for i, r := range s.Rows {
		for _, v := range []float64{float64(r.Depth), float64(r.Qc), float64(r.Fs), float64(r.U2)} {
			if math.IsNaN(v) || math.IsInf(v, 0) {
				return fmt.Errorf("insitu: sounding %q: rows[%d] holds a value that is not finite", s.ID, i)
			}
		}
	}
	return nil
}

// WriteGEF writes a sounding as a GEF-CPT-Report file that ReadGEF reads
// back: depth (m, 3 decimals), qc (MPa, 3 decimals), fs (MPa, 4
// decimals) and, when measured, u2 (MPa, 4 decimals), separated by ";",
// each record ended by "!", the cone area quotient as measurement
// variable 3. Values are rounded to those decimals (1 mm, 1 kPa, 0.1 kPa).
func WriteGEF(w io.Writer, s *Sounding) error {
	if err := checkWritable(s); err != nil {
		return err
	}
	bw := bufio.NewWriter(w)
	n := 3
	if s.HasU2 {
		n = 4
	}
	fmt.Fprintf(bw, "#GEFID= 1, 1, 0\n#REPORTCODE= GEF-CPT-Report, 1, 1, 2\n")
	if s.ID != "" {
		fmt.Fprintf(bw, "#TESTID= %s\n", strings.NewReplacer("\n", " ", "\r", " ").Replace(s.ID))
	}
	fmt.Fprintf(bw, "#COLUMN= %d\n", n)
	fmt.Fprintf(bw, "#COLUMNINFO= 1, m, penetration length, %d\n", gefLength)
	fmt.Fprintf(bw, "#COLUMNINFO= 2, MPa, cone resistance, %d\n", gefConeRes)
	fmt.Fprintf(bw, "#COLUMNINFO= 3, MPa, local friction, %d\n", gefFriction)
	if s.HasU2 {
		fmt.Fprintf(bw, "#COLUMNINFO= 4, MPa, pore pressure u2, %d\n", gefPoreU2)
	}
	fmt.Fprintf(bw, "#COLUMNSEPARATOR= ;\n#RECORDSEPARATOR= !\n")
	fmt.Fprintf(bw, "#MEASUREMENTVAR= %d, %s, -, cone area quotient\n", gefVarAreaRatio, fmtNum(s.AreaRatio))
	fmt.Fprintf(bw, "#EOH=\n")
	for _, r := range s.Rows {
		bw.WriteString(fixed(r.Depth.Metres(), 3) + ";" + fixed(r.Qc.MPa(), 3) + ";" + fixed(r.Fs.MPa(), 4))
		if s.HasU2 {
			bw.WriteString(";" + fixed(r.U2.MPa(), 4))
		}
		bw.WriteString(";!\n")
	}
	return bw.Flush()
}

// agsLine writes one AGS4 line: every field quoted, quotes doubled.
func agsLine(w *bufio.Writer, fields ...string) {
	for i, f := range fields {
		if i > 0 {
			w.WriteByte(',')
		}
		w.WriteByte('"')
		w.WriteString(strings.ReplaceAll(f, "\"", "\"\""))
		w.WriteByte('"')
	}
	w.WriteString("\r\n")
}

// WriteAGS writes soundings as an AGS4 file that ReadAGS reads back: the
// groups PROJ, TRAN, UNIT, TYPE, LOCA, SCPG and SCPT, with each sounding's
// ID as LOCA_ID and test 1. Depth is written to 3 decimals (m), qc to 3
// and fs and u2 to 4 (MPa), as the AGS 4.1 dictionary's types 3DP and
// 4DP; values are rounded to them. project names PROJ_ID.
func WriteAGS(w io.Writer, project string, soundings []Sounding) error {
	seen := map[string]bool{}
	for i := range soundings {
		s := &soundings[i]
		if err := checkWritable(s); err != nil {
			return err
		}
		if s.ID == "" {
			return fmt.Errorf("insitu: soundings[%d]: an AGS4 location needs an ID", i)
		}
		if seen[s.ID] {
			return fmt.Errorf("insitu: soundings[%d]: ID %q given twice", i, s.ID)
		}
		seen[s.ID] = true
	}
	bw := bufio.NewWriter(w)
	group := func(name string, headings, units, types []string) {
		agsLine(bw, "GROUP", name)
		agsLine(bw, append([]string{"HEADING"}, headings...)...)
		agsLine(bw, append([]string{"UNIT"}, units...)...)
		agsLine(bw, append([]string{"TYPE"}, types...)...)
	}
	group("PROJ", []string{"PROJ_ID"}, []string{""}, []string{"ID"})
	agsLine(bw, "DATA", project)
	bw.WriteString("\r\n")
	group("TRAN", []string{"TRAN_ISNO", "TRAN_AGS", "TRAN_RCON"}, []string{"", "", ""}, []string{"X", "X", "X"})
	agsLine(bw, "DATA", "1", "4.1.1", "+")
	bw.WriteString("\r\n")
	group("UNIT", []string{"UNIT_UNIT", "UNIT_DESC"}, []string{"", ""}, []string{"X", "X"})
	agsLine(bw, "DATA", "m", "metre")
	agsLine(bw, "DATA", "MPa", "megapascal")
	bw.WriteString("\r\n")
	group("TYPE", []string{"TYPE_TYPE", "TYPE_DESC"}, []string{"", ""}, []string{"X", "X"})
	for _, t := range [][2]string{{"ID", "Unique identifier"}, {"X", "Text"}, {"3DP", "Value; 3 decimal places"}, {"4DP", "Value; 4 decimal places"}} {
		agsLine(bw, "DATA", t[0], t[1])
	}
	bw.WriteString("\r\n")
	group("LOCA", []string{"LOCA_ID"}, []string{""}, []string{"ID"})
	for _, s := range soundings {
		agsLine(bw, "DATA", s.ID)
	}
	bw.WriteString("\r\n")
	group("SCPG", []string{"LOCA_ID", "SCPG_TESN", "SCPG_CAR"}, []string{"", "", ""}, []string{"ID", "X", "3DP"})
	for _, s := range soundings {
		agsLine(bw, "DATA", s.ID, "1", fmtNum(s.AreaRatio))
	}
	bw.WriteString("\r\n")
	group("SCPT", []string{"LOCA_ID", "SCPG_TESN", "SCPT_DPTH", "SCPT_RES", "SCPT_FRES", "SCPT_PWP2"},
		[]string{"", "", "m", "MPa", "MPa", "MPa"}, []string{"ID", "X", "3DP", "3DP", "4DP", "4DP"})
	for _, s := range soundings {
		for _, r := range s.Rows {
			u := ""
			if s.HasU2 {
				u = fixed(r.U2.MPa(), 4)
			}
			agsLine(bw, "DATA", s.ID, "1", fixed(r.Depth.Metres(), 3), fixed(r.Qc.MPa(), 3), fixed(r.Fs.MPa(), 4), u)
		}
	}
	return bw.Flush()
}
