package calc

import (
	"bytes"
	"fmt"
	"math"
	"path/filepath"
	"slices"
	"strings"

	"github.com/qultgeo/qult/cite"
	"github.com/qultgeo/qult/insitu"
	"github.com/qultgeo/qult/profile"
	"github.com/qultgeo/qult/units"
)

// SPTRecords names the standard penetration tests of one borehole to read
// and correct against the file's ground (package insitu): N60 and (N1)60
// with the profile's σ′v, and, where the engineer asks, φ′ of the tests in
// drained layers and su of those in undrained ones by a named
// correlation. The records are reported beside the calculation and change
// no capacity: an SPT-based method reads the layers' own n60, which the
// engineer writes after comparing these values. The tests' depths are read
// as the ground's: below the original ground surface.
type SPTRecords struct {
	File   string `yaml:"file" json:"file" doc:"The SPT records file, relative to the calc file: the CSV form of qult (.csv) or AGS4 (.ags, group ISPT)."`
	Format string `yaml:"format,omitempty" json:"format,omitempty" doc:"csv or ags; default from the file's extension."`
	Hole   string `yaml:"hole,omitempty" json:"hole,omitempty" doc:"The borehole to read (the CSV location column, or the AGS4 LOCA_ID); needed when the file holds several."`
	// EnergyRatio is used for the tests whose energy ratio the file does
	// not record; absent, such a test is an error.
	EnergyRatio Value  `yaml:"energy_ratio,omitempty" json:"energy_ratio,omitempty" q:"number,30,100" doc:"Hammer energy ratio ER (% of free-fall energy) for tests whose record has none; absent: such a test is an error. Each test using it is flagged."`
	StickUp     Value  `yaml:"stick_up,omitempty" json:"stick_up,omitempty" q:"length,0," doc:"Rod above ground to the anvil, added to the depth for a test without a recorded rod length; default 1.0 m (0 to 5 m)."`
	Phi         string `yaml:"phi,omitempty" json:"phi,omitempty" doc:"Correlation for φ′ of the tests in drained layers: hatanaka-uchida (from (N1)60) or kulhawy-mayne-n60 (from N60 and σ′v); absent: φ′ is not estimated."`
	F1          Value  `yaml:"f1,omitempty" json:"f1,omitempty" q:"stress" doc:"Stroud's factor f1 in su = f1·N60 for the tests in undrained layers (3.5 to 6.5 kPa); absent: su is not estimated."`
}

// DefaultStickUp is the rod above ground when the file gives none; see
// insitu.DefaultSPTOptions.
const DefaultStickUp = 1 * units.Metre

// SPTResult is the borehole's tests as read and corrected.
type SPTResult struct {
	File, Format, Hole string
	EnergyRatio        float64 // the default given (percent); 0: none
	StickUp            units.Length
	PhiBy              string // the φ′ correlation's identifier; "" when not asked
	F1                 units.Stress
	Tests              []SPTTest
	Layers             []SPTLayer
	Refs               []cite.Ref
}

// SPTTest is one test with its corrections and the values derived from it.
type SPTTest struct {
	insitu.CorrectedSPT
	Layer string // the layer of the ground the test lies in
	// Phi and Su are the correlated values (zero when not estimated); By
	// names the correlation that gave the one estimated, Note why none
	// was where one was asked for.
	Phi units.Angle
	Su  units.Stress
	By  string
	// Source is the correlation's published source, short ("Stroud
	// (1974)"); "" when none was estimated.
	Source string
	Note   string
}

// SPTLayer is the tests averaged over one layer of the ground (arithmetic
// means, insitu.MeanSPT); Tests is 0 where none lies in it.
type SPTLayer struct {
	Name        string
	Top, Bottom units.Length
	Tests       int
	N60, N160   float64
	// Phi and Su are the means of the tests' estimates (zero when none);
	// Estimates counts the tests that gave one.
	Phi       units.Angle
	Su        units.Stress
	Estimates int
	// N60Given is the layer's own n60 in the calc file (0 when not given),
	// shown beside the mean for comparison.
	N60Given float64
}

// sptPhi returns the φ′ correlation named by id.
func sptPhi(id string) (insitu.SPTFriction, bool) {
	switch id {
	case insitu.PhiN160{}.ID():
		return insitu.PhiN160{}, true
	case insitu.PhiN60Stress{}.ID():
		return insitu.PhiN60Stress{}, true
	}
	return nil, false
}

// runSPT reads and corrects the SPT records the ground names.
func runSPT(f *File, in *Inputs, prof *profile.Profile, res *Result, read ReadFileFunc) error {
	sp := f.Ground.SPT
	if sp == nil {
		return nil
	}
	const pre = "ground.spt"
	prob := func(path, msg string, err error) error {
		return Problems{{Path: path, Line: lineOf(f, path), Msg: msg, Err: err}}
	}
	if strings.TrimSpace(sp.File) == "" {
		return prob(pre+".file", "missing: the SPT records file, relative to the calc file", nil)
	}
	format := strings.ToLower(strings.TrimSpace(sp.Format))
	if format == "" {
		format = strings.TrimPrefix(strings.ToLower(filepath.Ext(sp.File)), ".")
	}
	if format != "csv" && format != "ags" {
		return prob(pre+".format", fmt.Sprintf("%q: want csv or ags (or a file ending .csv or .ags)", format), nil)
	}
	r := &resolver{f: f, sys: in.System}
	er := r.num(Value{Raw: strings.TrimSuffix(strings.TrimSpace(sp.EnergyRatio.Raw), "%"), Line: sp.EnergyRatio.Line},
		pre+".energy_ratio", 30, 100)
	stick := DefaultStickUp
	if sp.StickUp.IsSet() {
		stick = r.length(sp.StickUp, pre+".stick_up")
		if len(r.probs) == 0 && !(stick >= 0 && stick <= 5*units.Metre) {
			r.add(pre+".stick_up", sp.StickUp.Line, "%s is outside 0 to 5 m", sp.StickUp.Raw)
		}
	}
	var f1 units.Stress
	if sp.F1.IsSet() {
		f1 = r.stress(sp.F1, pre+".f1")
		if len(r.probs) == 0 && !(f1 >= 3.5*units.Kilopascal && f1 <= 6.5*units.Kilopascal) {
			r.add(pre+".f1", sp.F1.Line, "%s is outside 3.5 to 6.5 kPa (Stroud's f1, typically 4 to 6 kPa)", sp.F1.Raw)
		}
	}
	var phiBy insitu.SPTFriction
	if sp.Phi != "" {
		var ok bool
		if phiBy, ok = sptPhi(sp.Phi); !ok {
			r.add(pre+".phi", 0, "%q: want %s or %s", sp.Phi, insitu.PhiN160{}.ID(), insitu.PhiN60Stress{}.ID())
		}
	}
	if len(r.probs) > 0 {
		return r.probs
	}
	if read == nil {
		return prob(pre+".file", "the file cannot be read here: a calc file from standard input or a batch line has no folder to read from; run it from a file", nil)
	}
	data, err := read(sp.File)
	if err != nil {
		return prob(pre+".file", err.Error(), err)
	}
	tests, err := readSPT(data, sp.File, format)
	if err != nil {
		return prob(pre+".file", err.Error(), err)
	}
	tests, err = sptHole(tests, sp.File, sp.Hole)
	if err != nil {
		return prob(pre+".hole", err.Error(), err)
	}
	depth := prof.Depth()
	for _, t := range tests {
		if t.Depth > depth {
			return prob(pre+".file", fmt.Sprintf("%s: the test at %g m lies below the ground model (0 to %g m); extend the layers or leave the test out",
				sp.File, t.Depth.Metres(), depth.Metres()), nil)
		}
	}
	var stressErr error
	stresses := func(z units.Length) (units.Stress, units.Stress) {
		st, err := prof.StressesAt(z)
		if err != nil {
			stressErr = err
			return units.Stress(math.NaN()), 0
		}
		return st.Total, st.Pore
	}
	opt := insitu.DefaultSPTOptions
	opt.EnergyRatio = er
	opt.RodStickUp = stick
	cs, err := insitu.CorrectSPT(tests, stresses, &opt)
	if err != nil {
		if stressErr != nil {
			err = stressErr
		}
		path := pre + ".file"
		if er == 0 && strings.Contains(err.Error(), "energy_ratio: not recorded") {
			path = pre + ".energy_ratio"
			err = fmt.Errorf("%w; give %s (percent) for the tests without one", err, path)
		}
		return prob(path, err.Error(), err)
	}
	out := &SPTResult{File: sp.File, Format: format, Hole: tests[0].Location, EnergyRatio: er, StickUp: stick, F1: f1,
		Refs: insitu.SPTRefs()}
	if phiBy != nil {
		out.PhiBy = phiBy.ID()
		out.Refs = append(out.Refs, phiBy.Refs()...)
	}
	if f1 > 0 {
		out.Refs = append(out.Refs, insitu.StrengthN60{F1: f1}.Refs()...)
	}
	layers := prof.Layers()
	for i := range cs {
		t := SPTTest{CorrectedSPT: cs[i]}
		l := layerAt(layers, cs[i].Test.Depth)
		t.Layer = l.Name
		switch {
		case l.Drainage == profile.Drained && phiBy != nil:
			phi, err := phiBy.Phi(&cs[i])
			if err != nil {
				t.Note = strings.TrimPrefix(err.Error(), "insitu: ")
				break
			}
			t.Phi, t.By, t.Source = phi, phiBy.ID(), phiBy.Refs()[0].Source.Short()
		case l.Drainage == profile.Undrained && f1 > 0:
			su, err := insitu.StrengthN60{F1: f1}.Su(&cs[i])
			if err != nil {
				t.Note = strings.TrimPrefix(err.Error(), "insitu: ")
				break
			}
			t.Su, t.By, t.Source = su, insitu.StrengthN60{}.ID(), insitu.StrengthN60{}.Refs()[0].Source.Short()
		}
		out.Tests = append(out.Tests, t)
	}
	for _, l := range layers {
		sl := SPTLayer{Name: l.Name, Top: l.Top, Bottom: l.Bottom, N60Given: l.N60}
		var phi, su float64
		for i := range out.Tests {
			t := &out.Tests[i]
			if t.Layer != l.Name || t.Test.Depth < l.Top || t.Test.Depth > l.Bottom {
				continue
			}
			sl.Tests++
			sl.N60 += t.N60
			sl.N160 += t.N160
			if t.By != "" {
				sl.Estimates++
				phi += float64(t.Phi)
				su += float64(t.Su)
			}
		}
		if sl.Tests > 0 {
			sl.N60 /= float64(sl.Tests)
			sl.N160 /= float64(sl.Tests)
		}
		if sl.Estimates > 0 {
			sl.Phi = units.Angle(phi / float64(sl.Estimates))
			sl.Su = units.Stress(su / float64(sl.Estimates))
		}
		out.Layers = append(out.Layers, sl)
	}
	res.SPT = out
	res.Warnings = append(res.Warnings, sptWarnings(out)...)
	return nil
}

// sptWarnings flags each layer whose own n60 (the value an SPT-based
// method reads) is above the mean N60 of the tests in it: the records do
// not support it, and the capacity by such a method may be unconservative.
func sptWarnings(s *SPTResult) []string {
	var w []string
	for _, l := range s.Layers {
		if l.Tests > 0 && l.N60Given > l.N60 {
			w = append(w, fmt.Sprintf("layer %q: n60 = %.4g is above the mean N60 = %.3g of its %d SPT(s) in %s; a method that reads n60 may overstate the capacity",
				l.Name, l.N60Given, l.N60, l.Tests, s.File))
		}
	}
	return w
}

// layerAt returns the layer holding depth z: the upper one at a break.
func layerAt(layers []profile.Layer, z units.Length) profile.Layer {
	for _, l := range layers {
		if z <= l.Bottom {
			return l
		}
	}
	return layers[len(layers)-1]
}

// readSPT reads the tests of an SPT file in the given format.
func readSPT(data []byte, name, format string) ([]insitu.SPT, error) {
	if format == "csv" {
		return insitu.ReadSPTCSV(bytes.NewReader(data), name)
	}
	d, err := insitu.ReadAGS(bytes.NewReader(data), name)
	if err != nil {
		return nil, err
	}
	if len(d.SPT) == 0 {
		return nil, fmt.Errorf("%s holds no standard penetration test (group ISPT)", name)
	}
	return d.SPT, nil
}

// sptHole keeps the tests of the named hole, or of the only one.
func sptHole(tests []insitu.SPT, name, hole string) ([]insitu.SPT, error) {
	var holes []string
	for _, t := range tests {
		if !slices.Contains(holes, t.Location) {
			holes = append(holes, t.Location)
		}
	}
	if hole == "" {
		if len(holes) > 1 {
			return nil, fmt.Errorf("%s holds the tests of %d boreholes (%s): name one", name, len(holes), strings.Join(holes, ", "))
		}
		return tests, nil
	}
	var out []insitu.SPT
	for _, t := range tests {
		if t.Location == hole {
			out = append(out, t)
		}
	}
	if len(out) == 0 {
		return nil, fmt.Errorf("%q is not a borehole of %s (%s)", hole, name, strings.Join(holes, ", "))
	}
	return out, nil
}
