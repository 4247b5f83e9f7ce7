package report

// Sources of the numbers in this file: the calc file
// ../examples/warehouse-driven-settle.yaml (a scenario of our own); the
// exact inch (25.4 mm, NIST SP 811 (2008), Appendix B). Values shown are
// checked against the result they render, converted in closed form.

import (
	"encoding/json"
	"math"
	"strings"
	"testing"

	"github.com/qultgeo/qult/calc"
	"github.com/qultgeo/qult/units"
)

const settleExample = "../examples/warehouse-driven-settle.yaml"

func TestSettleViewEveryFormat(t *testing.T) {
	r := load(t, settleExample, nil)
	for _, sys := range allSystems {
		for _, f := range allFormats {
			out := render(t, r, f, Options{Units: UnitsOf(sys), View: ViewSettle})
			if strings.Contains(out, "NaN") || strings.Contains(out, "Inf") || strings.Contains(out, "n/a") {
				t.Errorf("%v %v: a non-finite number in the output", f, sys)
			}
			if !strings.Contains(out, calc.CautionLine) && !strings.Contains(out, "qualified geotechnical engineers") {
				t.Errorf("%v %v: no cautions", f, sys)
			}
		}
	}
	text := render(t, r, Text, Options{View: ViewSettle})
	for _, want := range []string{headSettlement, headLoadTest, "pass: 2.298 mm ≤ 15 mm", "Davisson (1972) offset limit", "Axial load and displacement with depth"} {
		if !strings.Contains(text, want) {
			t.Errorf("text: no %q", want)
		}
	}
	html := render(t, r, HTML, Options{View: ViewSettle})
	if n := strings.Count(html, "<figure>"); n != 2 {
		t.Errorf("html: %d figures, want 2 (load-settlement, axial load)", n)
	}
	if !strings.Contains(html, "measured (load test)") {
		t.Error("html: the measured curve is not in the figure's legend")
	}
	report := render(t, r, Text, Options{View: ViewReport})
	if !strings.Contains(report, headSettlement) || !strings.Contains(report, headLoadTest) {
		t.Error("the report view has no settlement or load-test section")
	}
	check := render(t, r, Text, Options{View: ViewCheck})
	if !strings.Contains(check, "Serviceability") {
		t.Error("the check view has no serviceability summary")
	}
	if v, err := ParseView("settle"); err != nil || v != ViewSettle || ViewSettle.String() != "settle" {
		t.Errorf("ParseView(settle) = %v, %v", v, err)
	}
}

// TestSettleJSON: the keys of JSON.md, with the values of the result in
// the display units (mm and in for settlements).
func TestSettleJSON(t *testing.T) {
	r := load(t, settleExample, nil)
	for _, sys := range allSystems {
		var d struct {
			Settlement struct {
				Settlement struct {
					Value float64
					Unit  string
				}
				Pass      bool
				Plunged   bool
				Curve     []map[string]qtyT
				WithDepth []map[string]qtyT `json:"with_depth"`
			}
			LoadTest struct {
				Criteria []struct {
					Criterion string
					Reached   bool
					Load      *qtyT
				}
			} `json:"load_test"`
		}
		if err := json.Unmarshal([]byte(render(t, r, JSON, Options{Units: UnitsOf(sys), View: ViewSettle})), &d); err != nil {
			t.Fatal(err)
		}
		s := d.Settlement
		want, unit := r.Settlement.Settlement.Millimetres(), "mm"
		if sys == units.US {
			want, unit = float64(r.Settlement.Settlement)/0.0254, "in" // 1 in = 25.4 mm
		}
		if math.Abs(s.Settlement.Value-want) > 1e-5*want || s.Settlement.Unit != unit || !s.Pass || s.Plunged {
			t.Errorf("%v: settlement %+v, want %.6g %s", sys, s.Settlement, want, unit)
		}
		if len(s.Curve) != len(r.Settlement.Curve) || len(s.WithDepth) != len(r.Settlement.Depth) {
			t.Errorf("%v: curve %d points, with depth %d nodes", sys, len(s.Curve), len(s.WithDepth))
		}
		if len(d.LoadTest.Criteria) != 4 || d.LoadTest.Criteria[1].Criterion != "ten-percent" || d.LoadTest.Criteria[1].Reached || d.LoadTest.Criteria[1].Load != nil {
			t.Errorf("%v: criteria %+v", sys, d.LoadTest.Criteria)
		}
	}
	// Without the sections the keys are absent (the layout only grows).
	plain := render(t, load(t, example, nil), JSON, Options{View: ViewReport})
	if strings.Contains(plain, `"settlement"`) || strings.Contains(plain, `"load_test"`) {
		t.Error("a result without settlement or load_test writes their keys")
	}
}

type qtyT struct {
	Value float64
	Unit  string
}

// TestSettlePlungedReport: a load the pile cannot carry reads as such, in
// every format, with no settlement and no non-finite number.
func TestSettlePlungedReport(t *testing.T) {
	r := load(t, settleExample, func(s string) string {
		return strings.Replace(s, "  allowable: 15 mm\n", "  allowable: 15 mm\n  load: 4000 kN\n", 1)
	})
	if !r.Settlement.Plunged {
		t.Fatal("4000 kN did not plunge")
	}
	text := render(t, r, Text, Options{View: ViewSettle})
	if !strings.Contains(text, "FAIL: the pile cannot carry 4000 kN; it plunges at") {
		t.Errorf("text does not say the pile plunges:\n%s", text)
	}
	var d struct {
		Settlement map[string]any
	}
	if err := json.Unmarshal([]byte(render(t, r, JSON, Options{View: ViewSettle})), &d); err != nil {
		t.Fatal(err)
	}
	if d.Settlement["settlement"] != nil || d.Settlement["plunged"] != true || d.Settlement["pass"] != false || d.Settlement["plunge_load"] == nil {
		t.Errorf("json: %v", d.Settlement)
	}
	for _, f := range allFormats {
		if out := render(t, r, f, Options{View: ViewSettle}); strings.Contains(out, "NaN") || strings.Contains(out, "n/a") {
			t.Errorf("%v: a non-finite number", f)
		}
	}
}

// TestSettleViewWithoutSections says what is missing rather than print
// nothing.
func TestSettleViewWithoutSections(t *testing.T) {
	out := render(t, load(t, example, nil), Text, Options{View: ViewSettle})
	if !strings.Contains(out, "no settlement or load_test section") {
		t.Errorf("no note of the missing sections:\n%s", out)
	}
}

func TestWithDepthRows(t *testing.T) {
	for _, n := range []int{1, 2, 21, 22, 102} {
		rows := withDepthRows(n)
		if rows[0] != 0 || rows[len(rows)-1] != n-1 || len(rows) > 22 {
			t.Errorf("withDepthRows(%d) = %v", n, rows)
		}
	}
}
