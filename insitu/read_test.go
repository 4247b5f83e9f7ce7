// Source of the numbers in this file: the test files in testdata are written
// by us to the published AGS4 4.1.1 and GEF-CPT-Report definitions (cited in
// ags.go and gef.go); the expected values are those files' own numbers read
// back, so no published worked value is involved.

package insitu

import (
	"bytes"
	"errors"
	"math"
	"os"
	"strings"
	"testing"

	"github.com/google/go-cmp/cmp"
	"github.com/qultgeo/qult/units"
)

func open(t *testing.T, name string) *os.File {
	t.Helper()
	f, err := os.Open("testdata/" + name)
	if err != nil {
		t.Fatal(err)
	}
	t.Cleanup(func() { f.Close() })
	return f
}

// closeRel compares floats to a relative tolerance: the same decimal read
// in MPa and in kPa may differ in the last bit.
var closeRel = cmp.Options{
	cmp.Comparer(relEq),
	cmp.Comparer(func(a, b units.Length) bool { return relEq(float64(a), float64(b)) }),
	cmp.Comparer(func(a, b units.Stress) bool { return relEq(float64(a), float64(b)) }),
}

func relEq(a, b float64) bool {
	return a == b || math.Abs(a-b) <= 1e-12*math.Max(math.Abs(a), math.Abs(b))
}

func TestAGSAndGEFGiveTheSameSounding(t *testing.T) {
	ags, err := ReadAGS(open(t, "cpt-north.ags"), "cpt-north.ags")
	if err != nil {
		t.Fatal(err)
	}
	gef, err := ReadGEF(open(t, "cpt-north.gef"), "cpt-north.gef")
	if err != nil {
		t.Fatal(err)
	}
	if len(ags.Soundings) != 1 {
		t.Fatalf("AGS soundings = %d, want 1", len(ags.Soundings))
	}
	if gef.Voids != 1 {
		t.Errorf("GEF voids = %d, want 1 (the row at 1.75 m)", gef.Voids)
	}
	g := *gef
	g.Voids = 0
	if d := cmp.Diff(ags.Soundings[0], g); d != "" {
		t.Errorf("AGS and GEF soundings differ (-ags +gef):\n%s", d)
	}
	csv, err := ReadCPTCSV(open(t, "cpt-north.csv"), "cpt-north.csv")
	if err != nil {
		t.Fatal(err)
	}
	if d := cmp.Diff(ags.Soundings[0], *csv, closeRel); d != "" {
		t.Errorf("AGS and CSV soundings differ (-ags +csv):\n%s", d)
	}
	if len(g.Rows) != 6 || g.AreaRatio != 0.8 || g.ID != "CPT-N1" || !g.HasU2 {
		t.Errorf("GEF sounding = %+v", g)
	}
	// Values as written in the files: 1.50 m, qc 0.820 MPa, fs 0.0213 MPa, u2 0.0356 MPa.
	r := g.Rows[1]
	if r.Depth != 1.5 || r.Qc != 0.82e6 || math.Abs(float64(r.Fs)-21300) > 1e-9 || math.Abs(float64(r.U2)-35600) > 1e-9 {
		t.Errorf("row 2 = %+v", r)
	}
}

func TestAGSOtherGroups(t *testing.T) {
	d, err := ReadAGS(open(t, "cpt-north.ags"), "cpt-north.ags")
	if err != nil {
		t.Fatal(err)
	}
	if want := []string{"CPT-N1", "BH-2"}; !cmp.Equal(d.Locations, want) {
		t.Errorf("locations = %v, want %v", d.Locations, want)
	}
	wantSPT := []SPT{{Location: "BH-2", Depth: 1.5, N: 3, EnergyRatio: 72}, {Location: "BH-2", Depth: 3, N: 18, EnergyRatio: 72},
		{Location: "BH-2", Depth: 4.5, N: 24}}
	if diff := cmp.Diff(wantSPT, d.SPT); diff != "" {
		t.Errorf("SPT (-want +got):\n%s", diff)
	}
	wantGeol := []Stratum{{Location: "BH-2", Top: 0, Base: 2.3, Description: "Soft grey silty CLAY", Legend: "201"},
		{Location: "BH-2", Top: 2.3, Base: 6, Description: "Medium dense grey fine SAND", Legend: "101"}}
	if diff := cmp.Diff(wantGeol, d.Strata); diff != "" {
		t.Errorf("strata (-want +got):\n%s", diff)
	}
}

func TestCPTCSVRoundTrip(t *testing.T) {
	s1, err := ReadCPTCSV(open(t, "cpt-north.csv"), "cpt-north.csv")
	if err != nil {
		t.Fatal(err)
	}
	var b1 bytes.Buffer
	if err := WriteCPTCSV(&b1, s1); err != nil {
		t.Fatal(err)
	}
	s2, err := ReadCPTCSV(bytes.NewReader(b1.Bytes()), "written")
	if err != nil {
		t.Fatal(err)
	}
	if d := cmp.Diff(s1, s2, closeRel); d != "" {
		t.Errorf("round trip differs:\n%s", d)
	}
	var b2 bytes.Buffer
	if err := WriteCPTCSV(&b2, s2); err != nil {
		t.Fatal(err)
	}
	if b1.String() != b2.String() {
		t.Errorf("second write differs from the first:\n%s\n---\n%s", b1.String(), b2.String())
	}
	orig, _ := os.ReadFile("testdata/cpt-north.csv")
	if b1.String() != string(orig) {
		t.Errorf("writer output differs from the file read:\n%s\n---\n%s", b1.String(), orig)
	}
}

func TestSPTCSVRoundTrip(t *testing.T) {
	in := "location,depth_m,n,energy_ratio_pct,rod_length_m,borehole_mm,sampler\n" +
		"BH-2,1.5,3,72,2.7,150,no-liner\nBH-2,3,18,72,4.2,150,liner-dense\nBH-3,1,7,,,,liner-loose\n"
	s, err := ReadSPTCSV(strings.NewReader(in), "spt.csv")
	if err != nil {
		t.Fatal(err)
	}
	if len(s) != 3 || s[1].Sampler != SamplerLinerDense || math.Abs(s[0].Borehole.Millimetres()-150) > 1e-9 || s[2].EnergyRatio != 0 {
		t.Errorf("read %+v", s)
	}
	var b bytes.Buffer
	if err := WriteSPTCSV(&b, s); err != nil {
		t.Fatal(err)
	}
	if b.String() != in {
		t.Errorf("round trip:\n%s\nwant\n%s", b.String(), in)
	}
}

// TestMalformed checks that each malformed file gives a *ParseError naming
// the file, the line and the field, wrapping the expected sentinel.
func TestMalformed(t *testing.T) {
	agsHead := "\"GROUP\",\"LOCA\"\n\"HEADING\",\"LOCA_ID\"\n\"UNIT\",\"\"\n\"TYPE\",\"ID\"\n\"DATA\",\"C1\"\n\n"
	scpt := "\"GROUP\",\"SCPT\"\n\"HEADING\",\"LOCA_ID\",\"SCPT_DPTH\",\"SCPT_RES\",\"SCPT_FRES\"\n"
	gefHead := "#GEFID= 1, 1, 0\n#COLUMN= 3\n#COLUMNINFO= 1, m, length, 1\n#COLUMNINFO= 2, MPa, qc, 2\n#COLUMNINFO= 3, MPa, fs, 3\n#EOH=\n"
	tests := []struct {
		name, format, in string
		line             int
		field            string
		err              error
	}{
		{"csv no header", "csv", "# id: x\n", 2, "", ErrMissing},
		{"csv missing qc", "csv", "depth_m,fs_kPa\n1,2\n", 1, "qc_MPa", ErrMissing},
		{"csv unknown column", "csv", "depth_m,qc_MPa,fs_kPa,qd_MPa\n", 1, "qd_MPa", ErrNotSupported},
		{"csv two tips", "csv", "depth_m,qc_MPa,qt_MPa,fs_kPa\n", 1, "qt_MPa", ErrDuplicate},
		{"csv text cell", "csv", "depth_m,qc_MPa,fs_kPa\n1,2,3\n2,abc,3\n", 3, "qc_MPa", ErrNumber},
		{"csv NaN", "csv", "depth_m,qc_MPa,fs_kPa\n1,NaN,3\n", 2, "qc_MPa", ErrNumber},
		{"csv depth order", "csv", "# area_ratio: 0.8\ndepth_m,qc_MPa,fs_kPa\n1,2,3\n1,2,3\n", 4, "depth_m", ErrDepthOrder},
		{"csv area ratio", "csv", "# area_ratio: 1.3\ndepth_m,qc_MPa,fs_kPa\n1,2,3\n", 1, "area_ratio", ErrRange},
		{"csv field count", "csv", "depth_m,qc_MPa,fs_kPa\n1,2,3\n2,3\n", 3, "", ErrSyntax},
		{"csv no rows", "csv", "depth_m,qc_MPa,fs_kPa\n", 1, "", ErrNoData},
		{"spt sampler", "spt", "depth_m,n,sampler\n1,4,lined\n", 2, "sampler", ErrRange},
		{"spt energy", "spt", "depth_m,n,energy_ratio_pct\n1,4,160\n", 2, "energy_ratio_pct", ErrRange},
		{"ags no heading", "ags", agsHead + "\"GROUP\",\"SCPT\"\n\"UNIT\",\"m\"\n", 8, "SCPT", ErrMissing},
		{"ags data before type", "ags", agsHead + scpt + "\"UNIT\",\"\",\"m\",\"MPa\",\"MPa\"\n\"DATA\",\"C1\",\"1\",\"2\",\"0.01\"\n", 10, "SCPT", ErrMissing},
		{"ags wrong unit", "ags", agsHead + scpt + "\"UNIT\",\"\",\"m\",\"bar\",\"MPa\"\n\"TYPE\",\"ID\",\"2DP\",\"2DP\",\"2DP\"\n", 9, "SCPT.SCPT_RES", ErrUnit},
		{"ags text cell", "ags", agsHead + scpt + "\"UNIT\",\"\",\"m\",\"MPa\",\"MPa\"\n\"TYPE\",\"ID\",\"2DP\",\"2DP\",\"2DP\"\n\"DATA\",\"C1\",\"1\",\"x\",\"0.01\"\n", 11, "SCPT.SCPT_RES", ErrNumber},
		{"ags depth order", "ags", agsHead + scpt + "\"UNIT\",\"\",\"m\",\"MPa\",\"MPa\"\n\"TYPE\",\"ID\",\"2DP\",\"2DP\",\"2DP\"\n\"DATA\",\"C1\",\"2\",\"1\",\"0.01\"\n\"DATA\",\"C1\",\"1\",\"1\",\"0.01\"\n", 12, "SCPT.SCPT_DPTH", ErrDepthOrder},
		{"ags duplicate group", "ags", agsHead + agsHead, 7, "LOCA", ErrDuplicate},
		{"ags field count", "ags", agsHead + scpt + "\"UNIT\",\"\",\"m\"\n", 9, "SCPT", ErrSyntax},
		{"ags unknown location", "ags", agsHead + scpt + "\"UNIT\",\"\",\"m\",\"MPa\",\"MPa\"\n\"TYPE\",\"ID\",\"2DP\",\"2DP\",\"2DP\"\n\"DATA\",\"C9\",\"1\",\"1\",\"0.01\"\n", 11, "SCPT.LOCA_ID", ErrMissing},
		{"ags missing heading", "ags", agsHead + "\"GROUP\",\"SCPT\"\n\"HEADING\",\"LOCA_ID\",\"SCPT_DPTH\",\"SCPT_FRES\"\n\"UNIT\",\"\",\"m\",\"MPa\"\n\"TYPE\",\"ID\",\"2DP\",\"2DP\"\n", 8, "SCPT.SCPT_RES", ErrMissing},
		{"ags bad row kind", "ags", "\"GRUP\",\"LOCA\"\n", 1, "GRUP", ErrSyntax},
		{"gef no eoh", "gef", "#GEFID= 1, 1, 0\n#COLUMN= 3\n", 2, "#EOH", ErrMissing},
		{"gef no gefid", "gef", "#COLUMN= 3\n#EOH=\n", 2, "#GEFID", ErrMissing},
		{"gef text cell", "gef", gefHead + "1.0 2.0 0.01\n1.5 x 0.01\n", 8, "column 2 (quantity 2)", ErrNumber},
		{"gef depth order", "gef", gefHead + "1.0 2.0 0.01\n0.5 2.0 0.01\n", 8, "column 1 (quantity 1)", ErrDepthOrder},
		{"gef unit", "gef", strings.Replace(gefHead, "2, MPa", "2, bar", 1), 4, "#COLUMNINFO", ErrUnit},
		{"gef count", "gef", gefHead + "1.0 2.0\n", 7, "", ErrSyntax},
		{"gef duplicate column", "gef", "#GEFID= 1\n#COLUMN= 3\n#COLUMN= 3\n", 3, "#COLUMN", ErrDuplicate},
		{"gef area ratio", "gef", strings.Replace(gefHead, "#EOH=", "#MEASUREMENTVAR= 3, 1.4, -, a\n#EOH=", 1), 6, "#MEASUREMENTVAR 3", ErrRange},
		{"gef no friction", "gef", strings.Replace(gefHead, "#COLUMNINFO= 3, MPa, fs, 3\n", "", 1), 5, "#COLUMNINFO", ErrMissing},
		{"gef report code", "gef", "#GEFID= 1\n#REPORTCODE= GEF-BORE-Report, 1, 0, 0\n", 2, "#REPORTCODE", ErrNotSupported},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			var err error
			r := strings.NewReader(tt.in)
			switch tt.format {
			case "csv":
				_, err = ReadCPTCSV(r, "f.csv")
			case "spt":
				_, err = ReadSPTCSV(r, "f.csv")
			case "ags":
				_, err = ReadAGS(r, "f.ags")
			case "gef":
				_, err = ReadGEF(r, "f.gef")
			}
			var pe *ParseError
			if !errors.As(err, &pe) {
				t.Fatalf("error %v is not a *ParseError", err)
			}
			if !errors.Is(err, tt.err) {
				t.Errorf("error %v does not wrap %v", err, tt.err)
			}
			if pe.Line != tt.line || pe.Field != tt.field || !strings.HasPrefix(pe.File, "f.") {
				t.Errorf("error %q: file %q line %d field %q, want line %d field %q", err, pe.File, pe.Line, pe.Field, tt.line, tt.field)
			}
		})
	}
}
