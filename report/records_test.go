package report

// Sources: none needed. The oracle is the JSON result document (Write in
// JSON): every record value must equal the value at the same place of
// that document, read back by encoding/json, to 1e-12 relative, and carry
// the unit the document names. The map from tables and columns to places
// in the document is written out again here, by hand, so that a wrong
// mapping in records.go fails. The calc files are the invented scenarios
// of ../examples.

import (
	"bufio"
	"bytes"
	"encoding/csv"
	"encoding/json"
	"fmt"
	"math"
	"os"
	"path/filepath"
	"regexp"
	"strings"
	"testing"

	"github.com/qultgeo/qult/calc"
	"github.com/qultgeo/qult/units"
)

// recordPlaces maps each table to its place in the JSON document (a list,
// or an object for a one-row table) and each column base name to the key
// of its value there.
var recordPlaces = map[string]struct {
	path []string
	keys map[string]string
}{
	"pile": {[]string{"pile"}, map[string]string{"shape": "shape", "size": "size", "wall": "wall", "gross_area": "gross_area",
		"material_area": "material_area", "outer_perimeter": "outer_perimeter", "length": "length", "head_depth": "head_depth",
		"tip_depth": "tip_depth", "installation": "installation", "plug": "plug"}},
	"layers": {[]string{"ground", "layers"}, map[string]string{"layer": "#", "name": "name", "top": "top", "bottom": "bottom",
		"drainage": "drainage", "friction_angle": "friction_angle", "cohesion": "cohesion", "su_top": "su_top", "su_bottom": "su_bottom",
		"unit_weight": "unit_weight", "saturated_unit_weight": "saturated_unit_weight", "submerged_unit_weight": "submerged_unit_weight",
		"weights_basis": "weights_basis", "shaft_method": "shaft_method", "tip_method": "tip_method", "removed": "removed"}},
	"stresses": {[]string{"ground", "stresses"}, map[string]string{"depth": "depth", "sigma_v": "total", "u": "pore", "sigma_v_eff": "effective"}},
	"shaft_segments": {[]string{"shaft_segments"}, map[string]string{"top": "top", "bottom": "bottom", "layer": "layer",
		"layer_name": "layer_name", "drainage": "drainage", "method": "method", "sigma_v_eff_top": "sigma_v_top",
		"sigma_v_eff_bottom": "sigma_v_bottom", "su_top": "su_top", "su_bottom": "su_bottom", "fs_top": "fs_top", "fs_bottom": "fs_bottom",
		"K": "k", "delta": "delta", "beta": "beta", "alpha": "alpha", "fs_integral": "integral", "perimeter": "perimeter", "Qs": "force",
		"flags": "flags", "no_resistance": "no_resistance"}},
	"tip": {[]string{"tip"}, map[string]string{"tip_depth": "depth", "layer": "layer", "layer_name": "layer_name", "method": "method",
		"sigma_v_eff": "sigma_v", "friction_angle": "friction_angle", "su": "su", "Nq": "nq", "Nc": "nc", "Irr": "irr",
		"qp_unlimited": "qp_unlimited", "qp_limit": "limit", "qp_upper_layer": "qp_upper_layer", "qp": "qp", "area": "area",
		"Qp": "force", "flags": "flags"}},
	"capacity": {[]string{"capacity"}, map[string]string{"Qp": "tip", "Qs": "shaft", "W": "weight", "Rc": "compression",
		"Qs_tension": "tension_shaft", "Rt": "tension", "plugged": "plugged", "flags": "flags"}},
	"design_cases": {[]string{"design", "cases"}, map[string]string{"case": "case", "Ed_compression": "compression_ed",
		"Rd_compression": "compression_rd", "utilisation_compression": "compression_utilisation", "Ed_tension": "tension_ed",
		"Rd_tension": "tension_rd", "utilisation_tension": "tension_utilisation", "pass": "pass"}},
	"required_length": {[]string{"required_length"}, map[string]string{"found": "found", "tip_depth": "tip_depth", "length": "length",
		"governs": "governs", "utilisation": "utilisation", "step": "step", "max_tip": "max_tip", "best_tip_depth": "best_tip_depth",
		"best_utilisation": "best_utilisation", "not_found": "not_found"}},
	"capacity_with_depth": {[]string{"capacity_with_depth"}, map[string]string{"tip_depth": "tip_depth", "qp": "qp", "Qp": "tip",
		"Qs": "shaft", "W": "weight", "Rc": "compression", "Rt": "tension", "Rc_design": "design_compression", "tip_rules": "tip_rules"}},
	"settlement": {[]string{"settlement"}, map[string]string{"method": "method", "load": "load", "load_from": "load_from",
		"allowable": "allowable", "settlement": "settlement", "plunged": "plunged", "plunge_load": "plunge_load", "pass": "pass",
		"shaft_load": "shaft_load", "tip_load": "tip_load", "shaft_share": "shaft_share", "tip_share": "tip_share",
		"tip_displacement": "tip_displacement", "EA": "ea", "shaft_capacity": "shaft_capacity", "tip_capacity": "tip_capacity"}},
	"load_settlement":    {[]string{"settlement", "curve"}, map[string]string{"load": "load", "settlement": "settlement"}},
	"axial_load":         {[]string{"settlement", "with_depth"}, map[string]string{"depth": "depth", "axial_load": "axial_load", "displacement": "displacement"}},
	"load_test_points":   {[]string{"load_test", "points"}, map[string]string{"load": "load", "settlement": "settlement"}},
	"load_test_criteria": {[]string{"load_test", "criteria"}, map[string]string{"criterion": "criterion", "reached": "reached", "load": "load", "settlement": "settlement", "c1": "c1", "c2": "c2", "r2": "r2", "note": "note"}},
	"warnings":           {[]string{"warnings"}, map[string]string{"warning": "."}},
	"sources":            {[]string{"sources"}, map[string]string{"key": "key", "citation": "citation"}},
}

// The display units of each system, as column suffixes.
var recordUnits = map[units.System]map[string]bool{
	units.SI: {"m": true, "m2": true, "kPa": true, "kN": true, "kN_per_m": true, "kN_per_m3": true, "deg": true, "mm": true},
	units.US: {"ft": true, "ft2": true, "ksf": true, "kip": true, "kip_per_ft": true, "pcf": true, "deg": true, "in": true},
}

var asciiName = regexp.MustCompile(`^[A-Za-z][A-Za-z0-9_]*$`)

// splitUnit splits a column name into its base and unit suffix, trying the
// longest suffix of either system first.
func splitUnit(name string) (base, unit string) {
	best := ""
	for _, set := range recordUnits {
		for u := range set {
			if strings.HasSuffix(name, "_"+u) && len(u) > len(best) {
				best = u
			}
		}
	}
	if best == "" {
		return name, ""
	}
	return strings.TrimSuffix(name, "_"+best), best
}

func recordsResults(t *testing.T) map[string]*calc.Result {
	t.Helper()
	rs := lineExamples(t)
	// A file with an id, so that it reaches the records.
	data := strings.Replace(readExample(t, "pump-station-bored.yaml"), "title:", "id: PS-B\ntitle:", 1)
	r, err := calc.Parse([]byte(data))
	if err != nil {
		t.Fatal(err)
	}
	rs["with id"] = r
	return rs
}

// TestRecordsAgainstJSON: every table of every example in both systems:
// ASCII column names unique in their table, units of the display system
// only, each value equal to the JSON result's (1e-12 relative) with the
// unit the document names, and as many rows as the document has.
func TestRecordsAgainstJSON(t *testing.T) {
	for name, r := range recordsResults(t) {
		for _, sys := range []units.System{units.SI, units.US} {
			var js bytes.Buffer
			if err := Write(&js, r, JSON, Options{Units: UnitsOf(sys), View: ViewReport}); err != nil {
				t.Fatal(err)
			}
			var doc map[string]any
			if err := json.Unmarshal(js.Bytes(), &doc); err != nil {
				t.Fatal(err)
			}
			ts, err := Tables(r, sys)
			if err != nil {
				t.Fatal(err)
			}
			if len(ts) != len(recordPlaces) {
				t.Errorf("%d tables, want %d", len(ts), len(recordPlaces))
			}
			for _, tb := range ts {
				checkTable(t, fmt.Sprintf("%s %v %s", name, sys, tb.Name), tb, doc, sys)
			}
		}
	}
}

func checkTable(t *testing.T, where string, tb Table, doc map[string]any, sys units.System) {
	t.Helper()
	place, ok := recordPlaces[tb.Name]
	if !ok {
		t.Fatalf("%s: unexpected table", where)
	}
	seen := map[string]bool{}
	for _, c := range tb.Columns {
		if !asciiName.MatchString(c) || seen[c] {
			t.Errorf("%s: column %q is not a unique ASCII name", where, c)
		}
		seen[c] = true
	}
	var node any = doc
	for _, k := range place.path {
		m, _ := node.(map[string]any)
		node = m[k]
	}
	var rows []any
	switch x := node.(type) {
	case []any:
		rows = x
	case map[string]any:
		rows = []any{x}
	case nil:
	default:
		t.Fatalf("%s: the document holds %T", where, node)
	}
	if len(rows) != len(tb.Rows) {
		t.Fatalf("%s: %d rows, the JSON result has %d", where, len(tb.Rows), len(rows))
	}
	for i, row := range tb.Rows {
		for c, v := range row {
			base, unit := splitUnit(tb.Columns[c])
			if unit != "" && !recordUnits[sys][unit] {
				t.Errorf("%s: column %s names %s, not a unit of %v", where, tb.Columns[c], unit, sys)
			}
			key, ok := place.keys[base]
			if !ok {
				t.Errorf("%s: column %s (base %q) has no place in the JSON result", where, tb.Columns[c], base)
				continue
			}
			var want any
			switch key {
			case "#":
				want = float64(i)
			case ".":
				want = rows[i]
			default:
				want = rows[i].(map[string]any)[key]
			}
			if q, ok := want.(map[string]any); ok {
				if q["unit"] != unitSymbol(unit) {
					t.Errorf("%s row %d: %s: the JSON result counts it in %v", where, i, tb.Columns[c], q["unit"])
				}
				want = q["value"]
			}
			if list, ok := want.([]any); ok {
				s := make([]string, len(list))
				for k, e := range list {
					s[k] = e.(string)
				}
				want = strings.Join(s, "; ")
			}
			if !sameValue(v, want) {
				t.Errorf("%s row %d: %s = %v, the JSON result has %v", where, i, tb.Columns[c], v, want)
			}
		}
	}
}

// unitSymbol turns a column suffix back into the unit symbol of the
// JSON result.
func unitSymbol(u string) string { return strings.ReplaceAll(u, "_per_", "/") }

// sameValue compares a record value with a value decoded from JSON:
// numbers to 1e-12 relative, missing with nil, strings and booleans
// exactly ("" for a text the document leaves out).
func sameValue(got, want any) bool {
	switch g := got.(type) {
	case nil:
		return want == nil
	case int:
		w, ok := want.(float64)
		return ok && float64(g) == w
	case float64:
		w, ok := want.(float64)
		return ok && math.Abs(g-w) <= 1e-12*math.Max(math.Abs(w), 1e-300)
	case string:
		if want == nil {
			return g == ""
		}
		return want == g
	case bool:
		return want == g
	}
	return false
}

// TestRecordsDocument: WriteRecords is valid JSON whose tables are the
// records of Tables (the same names, columns in order and values), with
// the id, title, units and cautions.
func TestRecordsDocument(t *testing.T) {
	r := recordsResults(t)["with id"]
	for _, sys := range []units.System{units.SI, units.US} {
		var b bytes.Buffer
		if err := WriteRecords(&b, r, Options{Units: UnitsOf(sys)}); err != nil {
			t.Fatal(err)
		}
		var doc struct {
			Schema, ID, Title, Units string
			Tables                   map[string][]map[string]any
			Cautions                 []string
		}
		if err := json.Unmarshal(b.Bytes(), &doc); err != nil {
			t.Fatalf("not JSON: %v", err)
		}
		if doc.Schema != RecordsSchema || doc.ID != "PS-B" || doc.Title != r.Title || doc.Units != sys.String() || len(doc.Cautions) == 0 {
			t.Errorf("head: %q %q %q %q, %d cautions", doc.Schema, doc.ID, doc.Title, doc.Units, len(doc.Cautions))
		}
		ts, _ := Tables(r, sys)
		for _, tb := range ts {
			recs := doc.Tables[tb.Name]
			if len(recs) != len(tb.Rows) {
				t.Fatalf("%s: %d records, want %d", tb.Name, len(recs), len(tb.Rows))
			}
			for i, row := range tb.Rows {
				for c, v := range row {
					if !sameValue(v, recs[i][tb.Columns[c]]) {
						t.Errorf("%s row %d %s: %v, want %v", tb.Name, i, tb.Columns[c], recs[i][tb.Columns[c]], v)
					}
				}
			}
		}
		// Column order is kept: the first record's keys in order.
		line := b.String()[strings.Index(b.String(), `"stresses":[`):]
		if !strings.HasPrefix(line, `"stresses":[`+"\n"+`{"depth_`) {
			t.Errorf("stresses do not open with the depth: %.60s", line)
		}
	}
}

// TestRecordsCSV: every section of WriteRecordsCSV reads back, with
// encoding/csv, to the table's columns and values; text with commas,
// quotes and # survives; the last line is the cautions.
func TestRecordsCSV(t *testing.T) {
	r := recordsResults(t)["with id"]
	rr := *r
	rr.Layers = append(rr.Layers[:0:0], r.Layers...)
	rr.Layers[0].Name = `fill, "made" #1`
	for _, sys := range []units.System{units.SI, units.US} {
		var b bytes.Buffer
		if err := WriteRecordsCSV(&b, &rr, Options{Units: UnitsOf(sys)}); err != nil {
			t.Fatal(err)
		}
		text := b.String()
		if head := "# " + RecordsSchema + ": " + rr.Title + "; id PS-B; units " + sys.String() + "\n"; !strings.HasPrefix(text, head) {
			t.Errorf("first line %.80q, want %q", text, head)
		}
		if !strings.HasSuffix(text, "# "+calc.CautionLine+"\n") {
			t.Errorf("the last line is not the cautions")
		}
		ts, _ := Tables(&rr, sys)
		sections := map[string][][]string{}
		sc := bufio.NewScanner(strings.NewReader(text))
		var name string
		var buf strings.Builder
		flush := func() {
			if name == "" {
				return
			}
			recs, err := csv.NewReader(strings.NewReader(buf.String())).ReadAll()
			if err != nil {
				t.Fatalf("%s: %v", name, err)
			}
			sections[name] = recs
			name = ""
			buf.Reset()
		}
		for sc.Scan() {
			l := sc.Text()
			switch {
			case strings.HasPrefix(l, "# table: "):
				flush()
				name = strings.TrimPrefix(l, "# table: ")
			case l == "" || strings.HasPrefix(l, "# "):
				flush()
			default:
				buf.WriteString(l + "\n")
			}
		}
		flush()
		for _, tb := range ts {
			recs := sections[tb.Name]
			if len(recs) != len(tb.Rows)+1 || strings.Join(recs[0], ",") != strings.Join(tb.Columns, ",") {
				t.Fatalf("%s: %d lines, header %v", tb.Name, len(recs), recs[:min(1, len(recs))])
			}
			for i, row := range tb.Rows {
				for c, v := range row {
					got := recs[i+1][c]
					want := ""
					switch x := v.(type) {
					case nil:
					case string:
						want = csvText(x)
					default:
						want = string(recValue(nil, x))
					}
					if got != want {
						t.Errorf("%s row %d %s: %q, want %q", tb.Name, i, tb.Columns[c], got, want)
					}
				}
			}
		}
		if !strings.Contains(text, `"fill, ""made"" #1"`) {
			t.Errorf("the layer name with a comma, quotes and # is not quoted whole")
		}
	}
}

func readExample(t *testing.T, name string) string {
	t.Helper()
	data, err := os.ReadFile(filepath.Join("..", "examples", name))
	if err != nil {
		t.Fatal(err)
	}
	return string(data)
}
