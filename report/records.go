package report

import (
	"bytes"
	"fmt"
	"io"
	"math"
	"strconv"
	"strings"

	"github.com/qultgeo/qult/calc"
	"github.com/qultgeo/qult/units"
)

// RecordsSchema names the version of the records document WriteRecords
// writes.
const RecordsSchema = "qult.records/1"

// Table is one table of a result as flat records, for notebooks and data
// frames. Columns are ASCII names, unique in the table, that carry their
// unit after the last underscore where the column has one (depth_m,
// sigma_v_eff_top_kPa, Qs_kN in SI; depth_ft, sigma_v_eff_top_ksf, Qs_kip
// in US units; a slash becomes _per_: integral_kN_per_m). Each row holds
// one value per column: a float64 (rounded to 6 significant digits, as
// the JSON result), an int, a string, a bool, or nil where the value does
// not apply.
type Table struct {
	Name    string
	Columns []string
	Rows    [][]any
}

// recTableNames are the names of the tables, in order (see Tables).
var recTableNames = []string{"pile", "layers", "stresses", "shaft_segments", "tip", "capacity", "design_cases",
	"required_length", "capacity_with_depth", "settlement", "load_settlement", "axial_load", "load_test_points",
	"load_test_criteria", "warnings", "sources"}

// dimSettlement marks a column of settlements, counted in mm (SI) or in
// (US) rather than in the display length unit.
const dimSettlement units.Dimension = -1

// recCol is one column: its base name, its dimension (0 for none: counts,
// words, flags) and the value of row i.
type recCol struct {
	name string
	dim  units.Dimension
	get  func(i int) any
}

// recUnitSuffix is the ASCII form of a unit symbol: "kN/m3" → "kN_per_m3".
func recUnitSuffix(u string) string {
	u = strings.ReplaceAll(u, "/", "_per_")
	var b strings.Builder
	for _, r := range u {
		if r < 128 && (r == '_' || r >= '0' && r <= '9' || r >= 'a' && r <= 'z' || r >= 'A' && r <= 'Z') {
			b.WriteRune(r)
		} else {
			b.WriteByte('_')
		}
	}
	return b.String()
}

// build makes a table of n rows. Every quantity must be in the display
// unit the column names; a mismatch is an error (a mistake in this file).
func recTable(name string, sys units.System, n int, cols []recCol) (Table, error) {
	t := Table{Name: name, Columns: make([]string, len(cols)), Rows: make([][]any, 0, n)}
	unitOf := make([]string, len(cols))
	for j, c := range cols {
		t.Columns[j] = c.name
		switch c.dim {
		case 0:
		case dimSettlement:
			unitOf[j] = conv{sys}.uSm()
		default:
			unitOf[j] = sys.Unit(c.dim)
		}
		if unitOf[j] != "" {
			t.Columns[j] += "_" + recUnitSuffix(unitOf[j])
		}
	}
	for i := range n {
		row := make([]any, len(cols))
		for j, c := range cols {
			v := c.get(i)
			switch x := v.(type) {
			case *qty:
				if x == nil {
					v = nil
					break
				}
				v = *x
			case *jnum:
				if x == nil {
					v = nil
				} else {
					v = roundSig(float64(*x), jsonSig)
				}
			case jnum:
				v = roundSig(float64(x), jsonSig)
			case []string:
				v = strings.Join(x, "; ")
			}
			if q, ok := v.(qty); ok {
				if q.Unit != unitOf[j] {
					return Table{}, fmt.Errorf("report: records: %s.%s holds %s, want %s", name, c.name, q.Unit, unitOf[j])
				}
				v = roundSig(float64(q.Value), jsonSig)
			}
			if f, ok := v.(float64); ok && (math.IsNaN(f) || math.IsInf(f, 0)) {
				v = nil // never in a result; shown as not applicable, never as a number
			}
			row[j] = v
		}
		t.Rows = append(t.Rows, row)
	}
	return t, nil
}

// Tables returns the tables of result r in display system sys, in this
// order (a table with nothing to show has no rows):
//
//	pile                 one row: section, areas, perimeter, length, tip depth, installation
//	layers               one row per layer: depths, strength, unit weights, methods
//	stresses             σv, u and σ′v at each break of the profile
//	shaft_segments       one row per shaft segment: depths, σ′v, su, fs, K, δ, β, α, ∫fs dz, perimeter, Qs
//	tip                  one row: σ′v, factors, unit tip resistance and its limits, area, Qp
//	capacity             one row: Qp, Qs, W′, Rc, tension shaft and Rt
//	design_cases         one row per case of the design basis (none without one)
//	required_length      one row when the file has a design basis and loads
//	capacity_with_depth  one row per tip depth of the search grid
//	settlement           one row with a settlement section: load, settlement (mm or in), allowable, shares
//	load_settlement      the predicted load-settlement curve
//	axial_load           axial load and displacement with depth at the serviceability load
//	load_test_points     the load test's points, with a load_test section
//	load_test_criteria   one row per criterion read from the load test
//	warnings             one row per warning
//	sources              one row per source cited
//
// Errors: a nil result and an unknown unit system.
func Tables(r *calc.Result, sys units.System) ([]Table, error) {
	if r == nil {
		return nil, fmt.Errorf("report: nil result")
	}
	if sys != units.SI && sys != units.US {
		return nil, fmt.Errorf("report: unit system %v: want SI or US", sys)
	}
	j := toJSON(r, Options{Units: UnitsOf(sys), sys: sys, View: ViewReport})
	return tablesOf(j, sys)
}

func tablesOf(j *jResult, sys units.System) ([]Table, error) {
	L, S, F, A, G, Q, D := units.DimLength, units.DimStress, units.DimForce, units.DimArea, units.DimUnitWeight, units.DimForcePerLength, units.DimAngle
	one := func(ok bool) int {
		if ok {
			return 1
		}
		return 0
	}
	p := j.Pile
	ly, st, sg, wd := j.Ground.Layers, j.Ground.Stresses, j.Segments, j.WithDepth
	tp, cp := j.Tip, j.Capacity
	var cases []jCase
	if j.Design != nil {
		cases = j.Design.Cases
	}
	ln := j.Length
	if ln == nil {
		ln = &jLength{}
	}
	se, lt := j.Settle, j.LoadTest
	if se == nil {
		se = &jSettle{}
	}
	if lt == nil {
		lt = &jLoadTest{}
	}
	sm := dimSettlement
	specs := []struct {
		n    int
		cols []recCol
	}{
		{1, []recCol{
			{"shape", 0, func(int) any { return p.Shape }},
			{"size", L, func(int) any { return p.Size }},
			{"wall", L, func(int) any { return p.Wall }},
			{"gross_area", A, func(int) any { return p.GrossArea }},
			{"material_area", A, func(int) any { return p.MaterialArea }},
			{"outer_perimeter", L, func(int) any { return p.Perimeter }},
			{"length", L, func(int) any { return p.Length }},
			{"head_depth", L, func(int) any { return p.HeadDepth }},
			{"tip_depth", L, func(int) any { return p.TipDepth }},
			{"installation", 0, func(int) any { return p.Installation }},
			{"plug", 0, func(int) any { return p.Plug }},
		}},
		{len(ly), []recCol{
			{"layer", 0, func(i int) any { return i }},
			{"name", 0, func(i int) any { return ly[i].Name }},
			{"top", L, func(i int) any { return ly[i].Top }},
			{"bottom", L, func(i int) any { return ly[i].Bottom }},
			{"drainage", 0, func(i int) any { return ly[i].Drainage }},
			{"friction_angle", D, func(i int) any { return ly[i].FrictionAngle }},
			{"cohesion", S, func(i int) any { return ly[i].Cohesion }},
			{"su_top", S, func(i int) any { return ly[i].SuTop }},
			{"su_bottom", S, func(i int) any { return ly[i].SuBottom }},
			{"unit_weight", G, func(i int) any { return ly[i].UnitWeight }},
			{"saturated_unit_weight", G, func(i int) any { return ly[i].SaturatedUnitWeight }},
			{"submerged_unit_weight", G, func(i int) any { return ly[i].SubmergedUnitWeight }},
			{"weights_basis", 0, func(i int) any { return ly[i].WeightsBasis }},
			{"shaft_method", 0, func(i int) any { return ly[i].ShaftMethod }},
			{"tip_method", 0, func(i int) any { return ly[i].TipMethod }},
			{"removed", L, func(i int) any { return ly[i].Removed }},
		}},
		{len(st), []recCol{
			{"depth", L, func(i int) any { return st[i].Depth }},
			{"sigma_v", S, func(i int) any { return st[i].Total }},
			{"u", S, func(i int) any { return st[i].Pore }},
			{"sigma_v_eff", S, func(i int) any { return st[i].Effective }},
		}},
		{len(sg), []recCol{
			{"top", L, func(i int) any { return sg[i].Top }},
			{"bottom", L, func(i int) any { return sg[i].Bottom }},
			{"layer", 0, func(i int) any { return sg[i].Layer }},
			{"layer_name", 0, func(i int) any { return sg[i].LayerName }},
			{"drainage", 0, func(i int) any { return sg[i].Drainage }},
			{"method", 0, func(i int) any { return sg[i].Method }},
			{"sigma_v_eff_top", S, func(i int) any { return sg[i].SigmaTop }},
			{"sigma_v_eff_bottom", S, func(i int) any { return sg[i].SigmaBottom }},
			{"su_top", S, func(i int) any { return sg[i].SuTop }},
			{"su_bottom", S, func(i int) any { return sg[i].SuBottom }},
			{"fs_top", S, func(i int) any { return sg[i].FsTop }},
			{"fs_bottom", S, func(i int) any { return sg[i].FsBottom }},
			{"K", 0, func(i int) any { return sg[i].K }},
			{"delta", D, func(i int) any { return sg[i].Delta }},
			{"beta", 0, func(i int) any { return sg[i].Beta }},
			{"alpha", 0, func(i int) any { return sg[i].Alpha }},
			{"fs_integral", Q, func(i int) any { return sg[i].Integral }},
			{"perimeter", L, func(i int) any { return sg[i].Perimeter }},
			{"Qs", F, func(i int) any { return sg[i].Force }},
			{"flags", 0, func(i int) any { return sg[i].Flags }},
			{"no_resistance", 0, func(i int) any { return sg[i].NoResistance }},
		}},
		{1, []recCol{
			{"tip_depth", L, func(int) any { return tp.Depth }},
			{"layer", 0, func(int) any { return tp.Layer }},
			{"layer_name", 0, func(int) any { return tp.LayerName }},
			{"method", 0, func(int) any { return tp.Method }},
			{"sigma_v_eff", S, func(int) any { return tp.Q }},
			{"friction_angle", D, func(int) any { return tp.Phi }},
			{"su", S, func(int) any { return tp.Su }},
			{"Nq", 0, func(int) any { return tp.Nq }},
			{"Nc", 0, func(int) any { return tp.Nc }},
			{"Irr", 0, func(int) any { return tp.Irr }},
			{"qp_unlimited", S, func(int) any { return tp.Unlimited }},
			{"qp_limit", S, func(int) any { return tp.Limit }},
			{"qp_upper_layer", S, func(int) any { return tp.Upper }},
			{"qp", S, func(int) any { return tp.Qp }},
			{"area", A, func(int) any { return tp.Area }},
			{"Qp", F, func(int) any { return tp.Force }},
			{"flags", 0, func(int) any { return tp.Flags }},
		}},
		{1, []recCol{
			{"Qp", F, func(int) any { return cp.Tip }},
			{"Qs", F, func(int) any { return cp.Shaft }},
			{"W", F, func(int) any { return cp.Weight }},
			{"Rc", F, func(int) any { return cp.Compression }},
			{"Qs_tension", F, func(int) any { return cp.TensionShaft }},
			{"Rt", F, func(int) any { return cp.Tension }},
			{"plugged", 0, func(int) any { return cp.Plugged }},
			{"flags", 0, func(int) any { return cp.Flags }},
		}},
		{len(cases), []recCol{
			{"case", 0, func(i int) any { return cases[i].Case }},
			{"Ed_compression", F, func(i int) any { return cases[i].CompressionEd }},
			{"Rd_compression", F, func(i int) any { return cases[i].CompressionRd }},
			{"utilisation_compression", 0, func(i int) any { return cases[i].CompressionUse }},
			{"Ed_tension", F, func(i int) any { return cases[i].TensionEd }},
			{"Rd_tension", F, func(i int) any { return cases[i].TensionRd }},
			{"utilisation_tension", 0, func(i int) any { return cases[i].TensionUse }},
			{"pass", 0, func(i int) any { return cases[i].Pass }},
		}},
		{one(j.Length != nil), []recCol{
			{"found", 0, func(int) any { return ln.Found }},
			{"tip_depth", L, func(int) any { return ln.TipDepth }},
			{"length", L, func(int) any { return ln.Length }},
			{"governs", 0, func(int) any { return ln.Governs }},
			{"utilisation", 0, func(int) any { return ln.Use }},
			{"step", L, func(int) any { return ln.Step }},
			{"max_tip", L, func(int) any { return ln.MaxTip }},
			{"best_tip_depth", L, func(int) any { return ln.BestTipDepth }},
			{"best_utilisation", 0, func(int) any { return ln.BestUse }},
			{"not_found", 0, func(int) any { return ln.NotFound }},
		}},
		{len(wd), []recCol{
			{"tip_depth", L, func(i int) any { return wd[i].TipDepth }},
			{"qp", S, func(i int) any { return wd[i].UnitTip }},
			{"Qp", F, func(i int) any { return wd[i].Tip }},
			{"Qs", F, func(i int) any { return wd[i].Shaft }},
			{"W", F, func(i int) any { return wd[i].Weight }},
			{"Rc", F, func(i int) any { return wd[i].Compression }},
			{"Rt", F, func(i int) any { return wd[i].Tension }},
			{"Rc_design", F, func(i int) any { return wd[i].DesignCompression }},
			{"tip_rules", 0, func(i int) any { return wd[i].TipRules }},
		}},
		{one(j.Settle != nil), []recCol{
			{"method", 0, func(int) any { return se.Method }},
			{"load", F, func(int) any { return se.Load }},
			{"load_from", 0, func(int) any { return se.LoadFrom }},
			{"allowable", sm, func(int) any { return se.Allowable }},
			{"settlement", sm, func(int) any { return se.Settlement }},
			{"plunged", 0, func(int) any { return se.Plunged }},
			{"plunge_load", F, func(int) any { return se.PlungeLoad }},
			{"pass", 0, func(int) any { return se.Pass }},
			{"shaft_load", F, func(int) any { return se.ShaftLoad }},
			{"tip_load", F, func(int) any { return se.TipLoad }},
			{"shaft_share", 0, func(int) any { return se.ShaftShare }},
			{"tip_share", 0, func(int) any { return se.TipShare }},
			{"tip_displacement", sm, func(int) any { return se.TipMove }},
			{"EA", F, func(int) any { return se.EA }},
			{"shaft_capacity", F, func(int) any { return se.ShaftCapacity }},
			{"tip_capacity", F, func(int) any { return se.TipCapacity }},
		}},
		{len(se.Curve), []recCol{
			{"load", F, func(i int) any { return se.Curve[i].Load }},
			{"settlement", sm, func(i int) any { return se.Curve[i].Settlement }},
		}},
		{len(se.WithDepth), []recCol{
			{"depth", L, func(i int) any { return se.WithDepth[i].Depth }},
			{"axial_load", F, func(i int) any { return se.WithDepth[i].AxialLoad }},
			{"displacement", sm, func(i int) any { return se.WithDepth[i].Displacement }},
		}},
		{len(lt.Points), []recCol{
			{"load", F, func(i int) any { return lt.Points[i].Load }},
			{"settlement", sm, func(i int) any { return lt.Points[i].Settlement }},
		}},
		{len(lt.Criteria), []recCol{
			{"criterion", 0, func(i int) any { return lt.Criteria[i].Criterion }},
			{"reached", 0, func(i int) any { return lt.Criteria[i].Reached }},
			{"load", F, func(i int) any { return lt.Criteria[i].Load }},
			{"settlement", sm, func(i int) any { return lt.Criteria[i].Settlement }},
			{"c1", 0, func(i int) any { return lt.Criteria[i].C1 }},
			{"c2", 0, func(i int) any { return lt.Criteria[i].C2 }},
			{"r2", 0, func(i int) any { return lt.Criteria[i].R2 }},
			{"note", 0, func(i int) any { return lt.Criteria[i].Note }},
		}},
		{len(j.Warnings), []recCol{
			{"warning", 0, func(i int) any { return j.Warnings[i] }},
		}},
		{len(j.Sources), []recCol{
			{"key", 0, func(i int) any { return j.Sources[i].Key }},
			{"citation", 0, func(i int) any { return j.Sources[i].Citation }},
		}},
	}
	out := make([]Table, len(specs))
	for k, s := range specs {
		t, err := recTable(recTableNames[k], sys, s.n, s.cols)
		if err != nil {
			return nil, err
		}
		out[k] = t
	}
	return out, nil
}

// WriteRecords writes result r as one JSON document of records, for
// notebooks:
//
//	{"schema": "qult.records/1", "qult_version": …, "id": …, "title": …,
//	 "units": "SI", "tables": {"stresses": [{"depth_m": 0, …}, …], …},
//	 "cautions": […]}
//
// one record per line, in the display system o.Units (o.View is not
// used: every table is written). Numbers are those of the JSON result (6
// significant digits); a value that does not apply is null.
//
// Errors: a nil result, an unknown unit system, and write errors from w.
func WriteRecords(w io.Writer, r *calc.Result, o Options) error {
	ts, sys, err := recordTables(r, o)
	if err != nil {
		return err
	}
	b := append([]byte(nil), `{"schema":`...)
	b = appendString(b, RecordsSchema)
	b = append(b, `,"qult_version":`...)
	b = appendString(b, r.Version)
	if r.ID != "" {
		b = append(b, `,"id":`...)
		b = appendString(b, r.ID)
	}
	b = append(b, `,"title":`...)
	b = appendString(b, r.Title)
	b = append(b, `,"units":`...)
	b = appendString(b, sys.String())
	b = append(b, `,"tables":{`...)
	for k, t := range ts {
		if k > 0 {
			b = append(b, ',')
		}
		b = append(b, '\n')
		b = appendString(b, t.Name)
		b = append(b, ":["...)
		for i, row := range t.Rows {
			if i > 0 {
				b = append(b, ',')
			}
			b = append(b, "\n{"...)
			for c, v := range row {
				if c > 0 {
					b = append(b, ',')
				}
				b = appendString(b, t.Columns[c])
				b = append(b, ':')
				b = recValue(b, v)
			}
			b = append(b, '}')
		}
		b = append(b, ']')
	}
	b = append(b, "},\n\"cautions\":["...)
	for i, c := range r.Cautions {
		if i > 0 {
			b = append(b, ',')
		}
		b = appendString(b, c)
	}
	b = append(b, "]}\n"...)
	_, err = w.Write(b)
	return err
}

func recValue(b []byte, v any) []byte {
	switch x := v.(type) {
	case nil:
		return append(b, "null"...)
	case float64:
		return appendJnum(b, x)
	case int:
		return strconv.AppendInt(b, int64(x), 10)
	case bool:
		return strconv.AppendBool(b, x)
	case string:
		return appendString(b, x)
	}
	return appendString(b, fmt.Sprint(v))
}

// WriteRecordsCSV writes result r's tables as CSV, one section per table:
// a comment line "# table: NAME", the header of column names, the rows,
// and a blank line; a value that does not apply is an empty cell. A first
// comment line names the result (its title and id) and the units; the
// last line is the cautions as a comment ("# For qualified engineers
// only: …"). Text cells
// are quoted when they hold a comma, a quote, a line break or a #, and
// guarded against spreadsheet formulas as the CSV format is; control and
// bidirectional characters become U+FFFD.
//
// Errors: a nil result, an unknown unit system, and write errors from w.
func WriteRecordsCSV(w io.Writer, r *calc.Result, o Options) error {
	ts, sys, err := recordTables(r, o)
	if err != nil {
		return err
	}
	var b bytes.Buffer
	title := strings.Join(strings.Fields(r.Title), " ")
	if id := strings.Join(strings.Fields(r.ID), " "); id != "" {
		title += "; id " + id
	}
	fmt.Fprintf(&b, "# %s: %s; units %s\n", RecordsSchema, title, sys)
	for _, t := range ts {
		fmt.Fprintf(&b, "# table: %s\n", t.Name)
		b.WriteString(strings.Join(t.Columns, ","))
		b.WriteByte('\n')
		for _, row := range t.Rows {
			for c, v := range row {
				if c > 0 {
					b.WriteByte(',')
				}
				switch x := v.(type) {
				case nil:
				case string:
					b.WriteString(recQuote(csvText(x)))
				default:
					b.Write(recValue(nil, x))
				}
			}
			b.WriteByte('\n')
		}
		b.WriteByte('\n')
	}
	b.WriteString("# " + calc.CautionLine + "\n")
	_, err = io.WriteString(w, CleanText(b.String()))
	return err
}

// recQuote quotes a CSV text cell that needs it (RFC 4180), and also one
// that holds a # (so that readers given comment='#' keep it whole).
func recQuote(s string) string {
	if s == "" || !strings.ContainsAny(s, ",\"\r\n#") && s[0] != ' ' && s[len(s)-1] != ' ' {
		return s
	}
	return `"` + strings.ReplaceAll(s, `"`, `""`) + `"`
}

// recordTables returns the tables of r in the display system o.Units
// stands for, and that system.
func recordTables(r *calc.Result, o Options) ([]Table, units.System, error) {
	if r == nil {
		return nil, 0, fmt.Errorf("report: nil result")
	}
	sys, err := o.Units.resolve(r)
	if err != nil {
		return nil, 0, err
	}
	ts, err := Tables(r, sys)
	return ts, sys, err
}
