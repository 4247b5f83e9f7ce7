package calc

import (
	"bytes"
	"errors"
	"fmt"
	"math"
	"path/filepath"
	"strings"

	"github.com/qultgeo/qult/cite"
	"github.com/qultgeo/qult/insitu"
	"github.com/qultgeo/qult/pile"
	"github.com/qultgeo/qult/profile"
	"github.com/qultgeo/qult/units"
)

// Sounding names a cone penetration sounding to read and interpret against
// the file's ground (package insitu): its readings normalised with the
// ground's stresses, averaged over each layer, and a layering suggested
// from breaks in Ic. The interpretation is reported beside the
// calculation and changes no capacity: the layering it suggests and the
// values it correlates are for the engineer to compare with the layers
// given and, if accepted, to write into them. A layer whose tip or shaft
// is a direct CPT method (package insitu) reads the sounding's readings
// themselves (see loadCone). The sounding's depths are read as the
// ground's: below the original ground surface.
type Sounding struct {
	File     string `yaml:"file" json:"file" doc:"The sounding file, relative to the calc file: the CSV form of qult (.csv), AGS4 (.ags) or GEF-CPT-Report (.gef)."`
	Format   string `yaml:"format,omitempty" json:"format,omitempty" doc:"csv, ags or gef; default from the file's extension."`
	Location string `yaml:"location,omitempty" json:"location,omitempty" doc:"In an AGS4 file holding several soundings, the one to read: its LOCA_ID (or LOCA_ID/SCPG_TESN)."`
	Nkt      Value  `yaml:"nkt,omitempty" json:"nkt,omitempty" q:"number,6,30" doc:"Cone factor Nkt for su = (qt − σv)/Nkt of clay-like layers (typically 10 to 18, from site-specific testing); absent: su is not estimated."`
	MinLayer Value  `yaml:"min_layer,omitempty" json:"min_layer,omitempty" q:"length,0," doc:"Thinnest layer of the suggested layering; default 0.5 m."`
}

// DefaultMinLayer is the thinnest suggested layer when the file gives none:
// 0.5 m, about ten cone diameters, below which a CPT does not resolve a
// layer fully (common practice).
const DefaultMinLayer = 0.5 * units.Metre

// SoundingResult is the sounding as read and interpreted.
type SoundingResult struct {
	File      string
	Format    string
	ID        string
	AreaRatio float64
	// Readings interpreted; NotNormalised of them had qn, fs or σ′v not
	// positive; Voids rows the file marked missing; Below rows below the
	// bottom of the ground model, left out.
	Readings, NotNormalised, Voids, Below int
	Top, Bottom                           units.Length // first and last reading interpreted
	Nkt                                   float64      // 0: su not estimated
	Layers                                []SoundingLayer
	Suggested                             []insitu.SuggestedLayer
	// Points are the readings interpreted, for the report's plots.
	Points []insitu.Point
	Refs   []cite.Ref
	// ReadBy lists the calc-file keys of the direct CPT methods that read
	// the sounding's readings in the capacity (empty: none does).
	ReadBy []string
}

// SoundingLayer is the sounding averaged over one layer of the ground
// (depth-weighted means of the valid readings inside it).
type SoundingLayer struct {
	Name        string
	Top, Bottom units.Length
	Readings    int
	Qt          units.Stress
	Qtn, Fr, Ic float64
	Zone        insitu.Zone // the zone of the mean Ic
	// Su is the mean (qt − σv)/Nkt of a clay-like layer (mean Ic > 2.60)
	// when Nkt is given; Phi the mean φ′ = 17.6° + 11°·log Qtn of a
	// sand-like layer. Zero when not estimated.
	Su  units.Stress
	Phi units.Angle
}

// ReadFileFunc reads a file named in a calc file (a sounding), by the name
// as written there.
type ReadFileFunc func(name string) ([]byte, error)

// ParseOptions are the options of ParseWith.
type ParseOptions struct {
	// ReadFile reads the files a calc file names (ground.sounding.file).
	// Nil means such a file is an error (a calc file read from standard
	// input or in a batch has no folder to read from).
	ReadFile ReadFileFunc
}

// ParseWith decodes and runs a calc file, reading the files it names
// through o.ReadFile.
func ParseWith(data []byte, o ParseOptions) (*Result, error) {
	f, err := Decode(data)
	if err != nil {
		return nil, err
	}
	r, err := run(f, runOptions{readFile: o.ReadFile})
	if r != nil {
		r.Source = data
	}
	return r, err
}

// ReadFileIn returns a ReadFileFunc reading names relative to dir (the
// folder of the calc file); an absolute name is read as it is.
func ReadFileIn(dir string, read func(string) ([]byte, error)) ReadFileFunc {
	return func(name string) ([]byte, error) {
		if !filepath.IsAbs(name) {
			name = filepath.Join(dir, name)
		}
		return read(name)
	}
}

// loadCone reads the sounding the ground names into the cone the layers'
// direct CPT methods share, when a layer chooses one. A direct method
// without a sounding is a problem at the method's key.
func loadCone(f *File, in *Inputs, read ReadFileFunc) error {
	if in == nil || len(in.coneUsers) == 0 {
		return nil
	}
	sd := f.Ground.Sounding
	if sd == nil {
		var probs Problems
		for _, p := range in.coneUsers {
			probs = append(probs, Problem{Path: p, Line: lineOf(f, p),
				Msg: "a direct CPT method reads the cone sounding, and the file has none: give ground.sounding (file: …) or choose another method"})
		}
		return probs
	}
	s, err := readGroundSounding(f, read)
	if err != nil {
		var probs Problems
		if errors.As(err, &probs) {
			for i := range probs {
				probs[i].Msg += " (the direct CPT methods of " + strings.Join(in.coneUsers, ", ") + " read it)"
			}
		}
		return err
	}
	c, err := insitu.NewCone(s)
	if err != nil {
		const pre = "ground.sounding"
		return Problems{{Path: pre + ".file", Line: lineOf(f, pre+".file"), Msg: fmt.Sprintf("%s: %v (the direct CPT methods of %s read it)", sd.File, err, strings.Join(in.coneUsers, ", ")), Err: err}}
	}
	*in.cone = *c
	return nil
}

// coneReach returns the deepest tip depth at which every layer's direct
// CPT methods find readings: a cone tip's zone reaches 4 diameters below
// the tip (the deepest zone of the methods), a cone shaft reads down to
// the tip. ok is false when no layer reaching below the sounding uses one.
func coneReach(in *Inputs, prof *profile.Profile) (units.Length, bool) {
	if in == nil || len(in.coneUsers) == 0 || in.cone == nil || in.cone.Readings() == 0 {
		return 0, false
	}
	last := in.cone.Bottom()
	reach, ok := prof.Depth(), false
	for i, l := range prof.Layers() {
		if i >= len(in.Methods.Layers) {
			break
		}
		lm := in.Methods.Layers[i]
		limit := prof.Depth()
		if _, cone := lm.Tip.(pile.ConeTip); cone {
			limit = last - 4*in.Pile.Section.Size()
		}
		if _, cone := lm.Shaft.(pile.ConeShaft); cone {
			limit = min(limit, last)
		}
		if l.Bottom > limit {
			reach, ok = min(reach, max(limit, l.Top)), true
		}
	}
	return reach, ok
}

// readGroundSounding reads the sounding the ground names (f.Ground.Sounding
// not nil); a problem names the sounding's key.
func readGroundSounding(f *File, read ReadFileFunc) (*insitu.Sounding, error) {
	sd := f.Ground.Sounding
	const pre = "ground.sounding"
	prob := func(path, msg string, err error) error {
		return Problems{{Path: path, Line: lineOf(f, path), Msg: msg, Err: err}}
	}
	if strings.TrimSpace(sd.File) == "" {
		return nil, prob(pre+".file", "missing: the sounding file, relative to the calc file", nil)
	}
	format := soundingFormat(sd)
	if format != "csv" && format != "ags" && format != "gef" {
		return nil, prob(pre+".format", fmt.Sprintf("%q: want csv, ags or gef (or a file ending .csv, .ags or .gef)", format), nil)
	}
	if read == nil {
		return nil, prob(pre+".file", "the file cannot be read here: a calc file from standard input or a batch line has no folder to read from; run it from a file", nil)
	}
	data, err := read(sd.File)
	if err != nil {
		return nil, prob(pre+".file", err.Error(), err)
	}
	s, err := readSounding(data, sd.File, format, sd.Location)
	if err != nil {
		var pe *insitu.ParseError
		if errors.As(err, &pe) {
			return nil, prob(pre+".file", err.Error(), err)
		}
		return nil, prob(pre+".location", err.Error(), err)
	}
	return s, nil
}

// soundingFormat returns the sounding's format: as given, or from the
// file's extension.
func soundingFormat(sd *Sounding) string {
	format := strings.ToLower(strings.TrimSpace(sd.Format))
	if format == "" {
		format = strings.TrimPrefix(strings.ToLower(filepath.Ext(sd.File)), ".")
	}
	return format
}

// runSounding reads and interprets the sounding the ground names.
func runSounding(f *File, in *Inputs, prof *profile.Profile, res *Result, read ReadFileFunc) error {
	sd := f.Ground.Sounding
	if sd == nil {
		return nil
	}
	const pre = "ground.sounding"
	prob := func(path, msg string, err error) error {
		return Problems{{Path: path, Line: lineOf(f, path), Msg: msg, Err: err}}
	}
	if strings.TrimSpace(sd.File) == "" {
		return prob(pre+".file", "missing: the sounding file, relative to the calc file", nil)
	}
	format := soundingFormat(sd)
	if format != "csv" && format != "ags" && format != "gef" {
		return prob(pre+".format", fmt.Sprintf("%q: want csv, ags or gef (or a file ending .csv, .ags or .gef)", format), nil)
	}
	r := &resolver{f: f, sys: in.System}
	nkt := r.num(sd.Nkt, pre+".nkt", 6, 30)
	minLayer := r.length(sd.MinLayer, pre+".min_layer")
	if sd.MinLayer.IsSet() && minLayer < 0 {
		r.add(pre+".min_layer", sd.MinLayer.Line, "%s is negative", sd.MinLayer.Raw)
	}
	if len(r.probs) > 0 {
		return r.probs
	}
	if !sd.MinLayer.IsSet() {
		minLayer = DefaultMinLayer
	}
	s, err := readGroundSounding(f, read)
	if err != nil {
		return err
	}
	out := &SoundingResult{File: sd.File, Format: format, ID: s.ID, AreaRatio: s.AreaRatio, Voids: s.Voids, Nkt: nkt,
		Refs: insitu.CPTInterpretationRefs(), ReadBy: append([]string(nil), in.coneUsers...)}
	depth := prof.Depth()
	keep := len(s.Rows)
	for keep > 0 && s.Rows[keep-1].Depth > depth {
		keep--
	}
	out.Below = len(s.Rows) - keep
	s.Rows = s.Rows[:keep]
	if keep == 0 {
		return prob(pre+".file", fmt.Sprintf("no reading of the sounding lies within the ground model (0 to %g m)", depth.Metres()), nil)
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
	pts, err := insitu.InterpretCPT(s, stresses, nil)
	if err != nil {
		if stressErr != nil {
			err = stressErr
		}
		return prob(pre+".file", err.Error(), err)
	}
	out.Readings = len(pts)
	out.Points = pts
	out.Top, out.Bottom = pts[0].Depth, pts[len(pts)-1].Depth
	for i := range pts {
		if !pts[i].Valid() {
			out.NotNormalised++
		}
	}
	for _, l := range prof.Layers() {
		sl := SoundingLayer{Name: l.Name, Top: l.Top, Bottom: l.Bottom}
		if l.Bottom >= out.Top && l.Top <= out.Bottom {
			sl = meanLayer(sl, pts, nkt)
		}
		out.Layers = append(out.Layers, sl)
	}
	if sug, err := insitu.SuggestLayers(pts, minLayer); err == nil {
		out.Suggested = sug
	}
	if nkt > 0 {
		out.Refs = append(out.Refs, insitu.StrengthNkt{Nkt: nkt}.Refs()...)
	}
	out.Refs = append(out.Refs, insitu.PhiQtn{}.Refs()...)
	res.Sounding = out
	return nil
}

// meanLayer averages the readings inside one layer.
func meanLayer(sl SoundingLayer, pts []insitu.Point, nkt float64) SoundingLayer {
	mean := func(v insitu.Value) (float64, int) {
		m, err := insitu.MeanOver(pts, sl.Top, sl.Bottom, v)
		if err != nil {
			return 0, 0
		}
		return m.Value, m.Readings
	}
	ic, n := mean(func(p *insitu.Point) float64 { return p.Ic })
	if n == 0 {
		return sl
	}
	sl.Readings, sl.Ic, sl.Zone = n, ic, insitu.ZoneOf(ic)
	qt, _ := mean(func(p *insitu.Point) float64 { return float64(p.Qt) })
	sl.Qt = units.Stress(qt)
	sl.Qtn, _ = mean(func(p *insitu.Point) float64 { return p.Qtn })
	sl.Fr, _ = mean(func(p *insitu.Point) float64 { return p.Fr })
	if ic > 2.60 {
		if nkt > 0 {
			qn, _ := mean(func(p *insitu.Point) float64 { return float64(p.Qnet) })
			sl.Su = units.Stress(qn / nkt)
		}
	} else {
		phi, _ := mean(func(p *insitu.Point) float64 { return 17.6 + 11*math.Log10(p.Qtn) })
		sl.Phi = units.Angle(phi) * units.Degree
	}
	return sl
}

// readSounding reads one sounding in the given format; in an AGS4 file,
// the one at location (or the only one).
func readSounding(data []byte, name, format, location string) (*insitu.Sounding, error) {
	switch format {
	case "csv":
		return insitu.ReadCPTCSV(bytes.NewReader(data), name)
	case "gef":
		return insitu.ReadGEF(bytes.NewReader(data), name)
	}
	d, err := insitu.ReadAGS(bytes.NewReader(data), name)
	if err != nil {
		return nil, err
	}
	var ids []string
	for i := range d.Soundings {
		if location == "" && len(d.Soundings) == 1 || d.Soundings[i].ID == location {
			return &d.Soundings[i], nil
		}
		ids = append(ids, d.Soundings[i].ID)
	}
	switch {
	case len(ids) == 0:
		return nil, fmt.Errorf("%s holds no cone sounding (group SCPT)", name)
	case location == "":
		return nil, fmt.Errorf("%s holds %d soundings (%s): name one", name, len(ids), strings.Join(ids, ", "))
	}
	return nil, fmt.Errorf("%q is not a sounding of %s (%s)", location, name, strings.Join(ids, ", "))
}
