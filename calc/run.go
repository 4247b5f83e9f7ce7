package calc

import (
	"errors"
	"fmt"
	"strings"

	"github.com/qultgeo/qult/cite"
	"github.com/qultgeo/qult/pile"
	"github.com/qultgeo/qult/profile"
	"github.com/qultgeo/qult/units"
)

// Version is the qult version written into results; the command sets it.
var version = "dev"

// SetVersion sets the version string written into results (the command
// line tool sets it from its build).
func SetVersion(v string) { version = v }

// CautionText returns the cautions printed with every result.
func CautionText() []string {
	return []string{
		"These results are for qualified geotechnical engineers. Check them against the codes of practice that govern the project, the site investigation and load tests.",
		"Each method carries the limitations stated in its source; values read from charts carry the stated reading tolerance.",
		"qult is not a substitute for the judgement of a licensed professional engineer, who remains responsible for any design that uses it.",
		"Where the governing code, licensed practice or the engineer of record differs from qult, they prevail.",
	}
}

// CautionLine is the cautions in one short line, for tables and CSV.
const CautionLine = "For qualified engineers only: check against the governing code, the site investigation and load tests; the code and licensed practice prevail."

// Parse decodes and runs a calc file.
func Parse(data []byte) (*Result, error) { return ParseWith(data, ParseOptions{}) }

// Run resolves and runs a decoded calc file: the profile, the
// characteristic capacity with its breakdown, capacity with depth, and,
// with a design basis, the design check and the required length. Bad
// input gives Problems naming each field and its line.
func Run(f *File) (*Result, error) { return run(f, runOptions{}) }

// runOptions trim a run to what its caller shows.
type runOptions struct {
	// lean leaves capacity with depth (characteristic and design) and the
	// methods compared uncomputed: Result.WithDepth, DesignWithDepth and
	// Compared stay empty.
	lean bool
	// readFile reads the files the calc file names (ground.sounding).
	readFile ReadFileFunc
}

func run(f *File, o runOptions) (*Result, error) {
	in, err := Resolve(f)
	if err != nil {
		return nil, alsoLibrary(f, in, err)
	}
	if err := loadCone(f, in, o.readFile); err != nil {
		return nil, err
	}
	prof, err := profile.New(in.Ground)
	if err != nil {
		return nil, translate(f, err)
	}
	res := &Result{Schema: ResultSchema, Version: version, ID: f.ID, Title: f.Title, Project: f.Project, Revision: f.Revision,
		Engineer: f.Engineer, Date: f.Date, Display: in.System, Input: f, Ground: prof, Layers: prof.Layers(),
		Pile: in.Pile, Loads: in.Loads, Cautions: CautionText()}
	for _, b := range prof.Breaks() {
		st, err := prof.StressesAt(b)
		if err != nil {
			return nil, err
		}
		res.Stresses = append(res.Stresses, StressPoint{Depth: b, Total: st.Total, Pore: st.Pore, Effective: st.Effective})
	}
	a, err := pile.NewAnalysis(prof, in.Pile, in.Methods, nil)
	if err != nil {
		return nil, translate(f, err)
	}
	res.Breakdown, err = a.Breakdown()
	if err != nil {
		return nil, translate(f, err)
	}
	res.Methods = layerMethods(prof, res.Breakdown)
	if !o.lean {
		res.Compared = compare(a, prof, in.Pile, in.Methods, res.Breakdown)
	}
	// Capacity with depth: from one step below the head to the search
	// depth (default: the bottom of the profile).
	step, maxTip := in.Step, in.MaxTip
	if step == 0 {
		step = 0.5 * units.Metre
		if in.System == units.US {
			step = 2 * units.Foot
		}
	}
	if maxTip == 0 {
		maxTip = prof.Depth()
		if z, ok := coneReach(in, prof); ok && z < maxTip && z > in.Pile.Tip() {
			maxTip = z
			res.Warnings = append(res.Warnings, fmt.Sprintf("capacity with depth and the required length are searched down to %v only: the direct CPT methods read the sounding, which ends at %v, and are never extrapolated below it (give search.max_tip to choose)", z, in.cone.Bottom()))
		}
	}
	if maxTip > prof.Depth() {
		return nil, Problems{{Path: "search.max_tip", Line: lineOf(f, "search.max_tip"),
			Msg: fmt.Sprintf("%v is below the bottom of the ground profile at %v", maxTip, prof.Depth())}}
	}
	if !(step > 0) || float64((maxTip-in.Pile.HeadDepth)/step) > 1e5 {
		return nil, Problems{{Path: "search.step", Line: lineOf(f, "search.step"),
			Msg: fmt.Sprintf("%v: want a positive step giving at most 100000 depths", step)}}
	}
	deep := in.Pile
	deep.Length = maxTip - in.Pile.HeadDepth
	ad, err := pile.NewAnalysis(prof, deep, in.Methods, nil)
	if err == nil && !o.lean {
		res.WithDepth, err = ad.WithDepth(pile.DepthGrid{From: in.Pile.HeadDepth + step, To: maxTip, Step: step}, nil)
	}
	if err != nil {
		res.Warnings = append(res.Warnings, "capacity with depth stops short: "+err.Error())
		res.WithDepth = nil
	}
	if in.Basis != nil {
		d, err := a.Check(in.Basis, in.Loads) // pile.Check with a, which it would build again
		if err != nil {
			return nil, translate(f, err)
		}
		res.Design = &d
		if len(in.OtherProfiles) > 0 {
			if err := res.severalProfiles(f, in, prof); err != nil {
				return nil, err
			}
		}
		// The search for the length runs each case's capacity with depth
		// on the same grid: the governing case's rows are the design
		// capacity with depth, not computed twice.
		var caseRows [][]pile.Capacity
		if in.HasLoad {
			l, rows, err := pile.RequiredLengthWithDepth(prof, in.Pile, in.Methods, in.Basis, in.Loads, pile.Search{Step: step, MaxTip: maxTip})
			if err != nil {
				res.Warnings = append(res.Warnings, "required length not found: "+err.Error())
			} else {
				res.Length, caseRows = &l, rows
			}
		}
		cases, _ := in.Basis.Cases(in.Pile.Installation)
		if len(res.WithDepth) > 0 && d.Governing < len(cases) {
			rows := []pile.Capacity(nil)
			if d.Governing < len(caseRows) {
				rows = caseRows[d.Governing]
			} else {
				cs := cases[d.Governing]
				if a2, err := pile.NewAnalysis(prof, deep, in.Methods, &pile.Options{Case: &cs}); err == nil {
					if r, err := a2.WithDepth(pile.DepthGrid{From: in.Pile.HeadDepth + step, To: maxTip, Step: step}, nil); err == nil {
						rows = r
					}
				}
			}
			for _, c := range rows {
				res.DesignWithDepth = append(res.DesignWithDepth, c.DesignCompression)
			}
		}
	}
	srefs, err := runSettlement(f, in, prof, res)
	if err != nil {
		return nil, err
	}
	if err := runReliability(f, in, res); err != nil {
		return nil, err
	}
	drefs, err := runDowndrag(f, in, prof, res)
	if err != nil {
		return nil, err
	}
	srefs = append(srefs, drefs...)
	if err := runGroup(f, in, prof, res); err != nil {
		return nil, err
	}
	if err := runCandidates(f, in, prof, res, step, maxTip); err != nil {
		return nil, err
	}
	srefs = append(srefs, candidateRefs(in)...)
	if err := runSounding(f, in, prof, res, o.readFile); err != nil {
		return nil, err
	}
	if err := runSPT(f, in, prof, res, o.readFile); err != nil {
		return nil, err
	}
	res.Warnings = append(res.Warnings, downdragWarnings(f, in)...)
	res.Warnings = append(res.Warnings, warnings(res)...)
	res.Warnings = append(res.Warnings, settleWarnings(res)...)
	var refs []cite.Source
	refs = append(refs, res.Breakdown.Sources...)
	refs = append(refs, cite.Collect(srefs...)...)
	if in.Basis != nil {
		refs = append(refs, cite.Collect(in.Basis.Refs()...)...)
	}
	if res.Group != nil {
		refs = append(refs, cite.Collect(res.Group.Refs...)...)
	}
	if res.Sounding != nil {
		refs = append(refs, cite.Collect(res.Sounding.Refs...)...)
	}
	if res.SPT != nil {
		refs = append(refs, cite.Collect(res.SPT.Refs...)...)
	}
	res.Sources = uniqueSources(refs)
	return res, nil
}

func uniqueSources(s []cite.Source) []cite.Source {
	refs := make([]cite.Ref, len(s))
	for i, x := range s {
		refs[i] = cite.Ref{Source: x}
	}
	return cite.Collect(refs...)
}

// warnings gathers the warnings of a result that are data, not failures.
func warnings(r *Result) []string {
	var w []string
	zw, wet := r.Ground.WaterDepth()
	for _, l := range r.Layers {
		// The unit weight above water is an assumption that matters only
		// where part of the layer lies above the water table.
		if wet && l.Top >= zw {
			continue
		}
		if l.Basis&(profile.AssumedDry|profile.AssumedSaturated|profile.SaturatedAboveWater) != 0 {
			w = append(w, fmt.Sprintf("layer %q: unit weights %s (an assumption; give the weights to remove it)", l.Name, l.Basis))
		}
	}
	w = append(w, r.Breakdown.Warnings...)
	w = append(w, unusual(r)...)
	if r.Design != nil && !r.Design.Pass {
		w = append(w, "the design check fails: utilisation above 1")
	}
	return w
}

func layerMethods(prof *profile.Profile, b pile.Breakdown) []LayerMethods {
	out := make([]LayerMethods, prof.NumLayers())
	for i, l := range prof.Layers() {
		out[i] = LayerMethods{Layer: l.Name, Drainage: l.Drainage.String()}
	}
	for _, r := range b.Rows {
		out[r.Layer].Shaft = r.Method
	}
	out[b.Tip.Layer].Tip = b.Tip.Method
	return out
}

// severalProfiles replaces the design check by EN 1997-1's verification
// from n ground test profiles (eq. 7.8): the characteristic resistances
// of the pile in the file's ground and in each of design.other_profiles
// (with the pile-wide methods) give Rc,k = min(mean/ξ3, min/ξ4).
func (res *Result) severalProfiles(f *File, in *Inputs, prof *profile.Profile) error {
	e, ok := in.Basis.(pile.Eurocode7)
	if !ok {
		return Problems{{Path: "design.other_profiles", Line: lineOf(f, "design.other_profiles"), Msg: "other ground profiles apply to the en1997 basis only"}}
	}
	one := func(p *profile.Profile, ms pile.Methods) (pile.ProfileResistance, error) {
		a, err := pile.NewAnalysis(p, in.Pile, ms, nil)
		if err != nil {
			return pile.ProfileResistance{}, err
		}
		c, err := a.Capacity()
		return pile.ProfileResistance{Base: c.Tip, Shaft: c.Shaft, Tension: c.TensionShaft}, err
	}
	first, err := one(prof, in.Methods)
	if err != nil {
		return translate(f, err)
	}
	cal := []pile.ProfileResistance{first}
	wide := in.Methods
	wide.Layers = nil // layer-by-layer choices belong to the file's own ground
	for i, spec := range in.OtherProfiles {
		pre := fmt.Sprintf("design.other_profiles[%d]", i)
		p, err := profile.New(spec)
		if err == nil {
			var r pile.ProfileResistance
			if r, err = one(p, wide); err == nil {
				cal = append(cal, r)
				continue
			}
		}
		return prefixed(f, pre, err)
	}
	d, err := e.VerifyProfiles(in.Pile.Installation, cal, res.Breakdown.Weight, in.Loads)
	if err != nil {
		return translate(f, err)
	}
	res.Design = &d
	res.Warnings = append(res.Warnings, fmt.Sprintf("the design check uses %d ground profiles (EN 1997-1 eq. 7.8); capacity with depth and the required length use the file's ground only", len(cal)))
	return nil
}

// prefixed reports err of a further ground profile under its own key.
func prefixed(f *File, pre string, err error) error {
	var ps Problems
	if errors.As(translate(f, err), &ps) {
		for i := range ps {
			ps[i].Path = pre + "." + strings.TrimPrefix(ps[i].Path, "ground.")
			ps[i].Line = lineOf(f, ps[i].Path)
		}
		return ps
	}
	return err
}

// unusual returns warnings for values that are accepted but unusual enough
// that a slip of units is the likelier story (common practice, not a
// published limit): the engineer confirms or corrects them.
func unusual(r *Result) []string {
	var w []string
	p := r.Pile
	size := p.Section.Size()
	switch {
	case p.Installation.Driven() && p.Section.Shape != pile.OpenPipe && size > 2*units.Metre:
		w = append(w, fmt.Sprintf("unusual input: a driven %s %v wide (driven piles other than open pipes are rarely over 2 m); check the section's units", p.Section.Shape, size))
	case size > 0 && size < 0.15*units.Metre:
		w = append(w, fmt.Sprintf("unusual input: a pile %v wide (under 0.15 m); check the section's units", size))
	}
	if p.Length > 150*units.Metre {
		w = append(w, fmt.Sprintf("unusual input: a pile %v long (over 150 m); check the length's units", p.Length))
	}
	if size > 0 && float64(p.Length/size) > 200 {
		w = append(w, fmt.Sprintf("unusual input: a slenderness L/D of %.0f (over 200); check the length and the section", float64(p.Length/size)))
	}
	for _, l := range r.Layers {
		if l.Drainage == profile.Drained && l.Phi > 45*units.Degree {
			w = append(w, fmt.Sprintf("unusual input: layer %q has φ′ = %.4g° (over 45°; most charts stop at 45°)", l.Name, l.Phi.Degrees()))
		}
		if l.HasSu && max(l.SuTop, l.SuBottom) > 1000*units.Kilopascal {
			w = append(w, fmt.Sprintf("unusual input: layer %q has su up to %v (over 1 MPa: an intermediate geomaterial rather than a clay)", l.Name, max(l.SuTop, l.SuBottom)))
		}
	}
	return w
}

// alsoLibrary adds to the problems of resolution those the library finds
// in the sections that resolved cleanly: the ground profile when no
// problem touches the ground, then the pile analysis and the design check
// when none touches what they read. So a file with a bad thickness and a
// pile too long for a good profile is not the only problem reported.
func alsoLibrary(f *File, in *Inputs, err error) error {
	var probs Problems
	if !errors.As(err, &probs) || in == nil {
		return err
	}
	touches := func(prefixes ...string) bool {
		for _, p := range probs {
			if p.Path == "" || p.Path == "units" || p.Path == "qult" {
				return true
			}
			for _, pre := range prefixes {
				if p.Path == pre || strings.HasPrefix(p.Path, pre+".") || strings.HasPrefix(p.Path, pre+"[") {
					return true
				}
			}
		}
		return false
	}
	add := func(e error) {
		var more Problems
		if errors.As(translate(f, e), &more) {
			probs = append(probs, more...)
		}
	}
	if touches("ground") {
		return probs
	}
	prof, perr := profile.New(in.Ground)
	if perr != nil {
		add(perr)
		return probs
	}
	if touches("pile", "methods") {
		return probs
	}
	if _, aerr := pile.NewAnalysis(prof, in.Pile, in.Methods, nil); aerr != nil {
		add(aerr)
		return probs
	}
	if in.Basis != nil && !touches("design", "loads") {
		if _, cerr := pile.Check(prof, in.Pile, in.Methods, in.Basis, in.Loads); cerr != nil {
			add(cerr)
		}
	}
	return probs
}

// profileRename maps the profile package's field names onto the calc
// file's keys.
var profileRename = map[string]string{
	"phi": "friction_angle", "su": "undrained_strength", "su_top": "undrained_strength.top",
	"su_bottom": "undrained_strength.bottom", "gs": "specific_gravity", "dr": "relative_density",
	"ir": "rigidity_index", "nu": "poissons_ratio", "e": "youngs_modulus", "g": "shear_modulus", "u": "pressure",
}

// translate turns the library's errors into Problems with calc-file paths
// and lines.
func translate(f *File, err error) error {
	var errs []error
	if j, ok := err.(interface{ Unwrap() []error }); ok {
		errs = j.Unwrap()
	} else {
		errs = []error{err}
	}
	var ps Problems
	for _, e := range errs {
		var fe *profile.FieldError
		var mf *pile.MissingFactorError
		var pf *pile.FieldError
		var pp *pile.PathError
		var path, msg string
		switch {
		case errors.As(e, &mf):
			// The key to add does not exist yet: the line is that of the
			// design section.
			ps = append(ps, Problem{Path: mf.Key(), Line: lineOf(f, "design"), Msg: strings.TrimPrefix(mf.Error(), "pile: "), Err: e})
			continue
		case errors.As(e, &pp):
			path = pp.Path
			if strings.HasPrefix(path, "layers[") {
				path = "ground." + path
			}
			ps = append(ps, Problem{Path: path, Line: lineOf(f, path), Msg: pp.Msg, Err: e})
			continue
		case errors.As(e, &pf):
			path, msg = pf.Field, strings.TrimPrefix(pf.Error(), pf.Field+": ")
			if !strings.HasPrefix(path, "design") && !strings.HasPrefix(path, "loads") && !strings.HasPrefix(path, "methods") && !strings.HasPrefix(path, "pile") {
				path = "design." + path
			}
			ps = append(ps, Problem{Path: path, Line: lineOf(f, path), Msg: msg, Err: e})
			continue
		}
		if errors.As(e, &fe) {
			path, msg = fe.Path, fe.Msg
			if i := strings.LastIndexByte(path, '.'); i >= 0 {
				if n, ok := profileRename[path[i+1:]]; ok {
					path = path[:i+1] + n
				}
			} else if n, ok := profileRename[path]; ok {
				path = n
			}
			path = "ground." + path
		} else {
			s := e.Error()
			if i := strings.Index(s, ": "); i > 0 && !strings.ContainsAny(s[:i], " ") || strings.HasPrefix(s, "layers[") {
				i := strings.Index(s, ": ")
				path, msg = s[:i], s[i+2:]
			} else {
				msg = s
			}
			if strings.HasPrefix(path, "layers[") {
				path = "ground." + path
			}
			// "ground.layers[1] (clay).shaft at 3 m" → path ground.layers[1].shaft
			if i := strings.Index(path, " ("); i > 0 {
				if j := strings.Index(path[i:], ")"); j > 0 {
					rest := path[i+j+1:]
					if k := strings.Index(rest, " at "); k >= 0 {
						msg = strings.TrimSpace(rest[k+1:]) + ": " + msg
						rest = rest[:k]
					}
					path = path[:i] + rest
				}
			}
		}
		ps = append(ps, Problem{Path: path, Line: lineOf(f, path), Msg: msg, Err: e})
	}
	return ps
}

// lineOf returns the line of the field at a calc path, or of its
// nearest parent that was read from the file; 0 when unknown.
func lineOf(f *File, path string) int {
	lines := f.lineMap()
	if lines == nil {
		return 0
	}
	for path != "" {
		if l, ok := lines[path]; ok {
			return l
		}
		i := strings.LastIndexAny(path, ".[")
		if i < 0 {
			break
		}
		path = path[:i]
	}
	return 0
}
