package report

import (
	"fmt"
	"strings"

	"github.com/qultgeo/qult/calc"
	"github.com/qultgeo/qult/insitu"
)

const headSounding = "Cone sounding"

// secSounding is the cone sounding the ground names: what was read, the
// means over each layer of the ground, and the suggested layering, with
// the note that none of it enters the capacity.
func secSounding(r *calc.Result, c conv) section {
	s := r.Sounding
	if s == nil {
		return section{}
	}
	items := []item{
		{"File", txt(fmt.Sprintf("%s (%s)", s.File, s.Format)), ""},
		{"Sounding", txt(s.ID), ""},
		{"Cone area ratio a", num(s.AreaRatio), ""},
		{"Readings interpreted", num(float64(s.Readings)), ""},
		{"From", num(c.L(s.Top)), c.uL()},
		{"To", num(c.L(s.Bottom)), c.uL()},
	}
	if s.NotNormalised > 0 {
		items = append(items, item{"Not normalised (qt ≤ σv, fs = 0 or σ′v ≤ 0)", num(float64(s.NotNormalised)), ""})
	}
	if s.Voids > 0 {
		items = append(items, item{"Rows the file marks missing", num(float64(s.Voids)), ""})
	}
	if s.Below > 0 {
		items = append(items, item{"Rows below the ground model, left out", num(float64(s.Below)), ""})
	}
	if s.Nkt > 0 {
		items = append(items, item{"Nkt (given)", num(s.Nkt), ""})
	}
	blocks := []block{{items: items},
		{para: "Each reading: qt = qc + u2(1 − a), qn = qt − σv with σv and u0 of the ground above, Fr = fs/qn, Qtn = (qn/pa)(pa/σ′v)^n with n = 0.381·Ic + 0.05·σ′v/pa − 0.15 ≤ 1 solved together with Ic = √((3.47 − log Qtn)² + (log Fr + 1.22)²) (Robertson 2009). Means over each layer are depth-weighted over the readings inside it; su = (qt − σv)/Nkt for clay-like layers (mean Ic > 2.60) and φ′ = 17.6° + 11°·log Qtn for sand-like ones (Kulhawy & Mayne 1990)."}}
	lt := &table{cols: []column{{"Layer", ""}, {"Top", c.uL()}, {"Bottom", c.uL()}, {"Readings", ""}, {"qt", c.uS()},
		{"Qtn", ""}, {"Fr", "%"}, {"Ic", ""}, {"Zone", ""}, {"su", c.uS()}, {"φ′", "deg"}}}
	for _, l := range s.Layers {
		if l.Readings == 0 {
			lt.rows = append(lt.rows, []cell{txt(l.Name), num(c.L(l.Top)), num(c.L(l.Bottom)), num(0), txt(""), txt(""), txt(""), txt(""),
				txt("no reading"), txt(""), txt("")})
			continue
		}
		su, phi := txt(""), txt("")
		if l.Su > 0 {
			su = num(c.S(l.Su))
		}
		if l.Phi > 0 {
			phi = num(l.Phi.Degrees())
		}
		lt.rows = append(lt.rows, []cell{txt(l.Name), num(c.L(l.Top)), num(c.L(l.Bottom)), num(float64(l.Readings)), num(c.S(l.Qt)),
			num(l.Qtn), num(l.Fr), num(l.Ic), txt(zoneText(l.Zone)), su, phi})
	}
	blocks = append(blocks, block{tbl: lt})
	if len(s.Suggested) > 0 {
		st := &table{cols: []column{{"Top", c.uL()}, {"Bottom", c.uL()}, {"Readings", ""}, {"Mean Ic", ""}, {"Zone", ""}}}
		for _, l := range s.Suggested {
			st.rows = append(st.rows, []cell{num(c.L(l.Top)), num(c.L(l.Bottom)), num(float64(l.Readings)), num(l.MeanIc), txt(zoneText(l.Zone))})
		}
		blocks = append(blocks, block{para: "Layering suggested by breaks in Ic (zones of Robertson 1990 and 2009):"}, block{tbl: st})
	}
	blocks = append(blocks, block{para: "The sounding is reported beside the calculation: its means, su, φ′ and the suggested layering are not used in the capacity. Compare them with the layers given and the borehole logs; correlations are empirical and site-specific experience governs."})
	if len(s.ReadBy) > 0 {
		blocks = append(blocks, block{para: "The readings themselves (qc, and qt − u2) are read in the capacity by the direct CPT methods of " + strings.Join(s.ReadBy, ", ") + "."})
	}
	return section{heading: headSounding, blocks: blocks}
}

func zoneText(z insitu.Zone) string {
	if z == insitu.ZoneNone {
		return ""
	}
	return z.String()
}

type jSounding struct {
	File          string           `json:"file"`
	Format        string           `json:"format"`
	ID            string           `json:"id"`
	AreaRatio     jnum             `json:"area_ratio"`
	Readings      int              `json:"readings"`
	NotNormalised int              `json:"not_normalised"`
	Voids         int              `json:"void_rows"`
	Below         int              `json:"rows_below_ground_model"`
	Top           qty              `json:"top"`
	Bottom        qty              `json:"bottom"`
	Nkt           *jnum            `json:"nkt,omitempty"`
	Layers        []jSoundingLayer `json:"layers"`
	Suggested     []jSuggested     `json:"suggested_layers"`
	Note          string           `json:"note"`
	ReadBy        []string         `json:"read_by,omitempty"`
}

type jSoundingLayer struct {
	Name     string `json:"name"`
	Top      qty    `json:"top"`
	Bottom   qty    `json:"bottom"`
	Readings int    `json:"readings"`
	Qt       *qty   `json:"qt,omitempty"`
	Qtn      *jnum  `json:"qtn,omitempty"`
	Fr       *jnum  `json:"fr_percent,omitempty"`
	Ic       *jnum  `json:"ic,omitempty"`
	Zone     int    `json:"zone,omitempty"`
	Su       *qty   `json:"su,omitempty"`
	Phi      *qty   `json:"friction_angle,omitempty"`
}

type jSuggested struct {
	Top      qty    `json:"top"`
	Bottom   qty    `json:"bottom"`
	Readings int    `json:"readings"`
	MeanIc   jnum   `json:"mean_ic"`
	Zone     int    `json:"zone"`
	ZoneName string `json:"zone_name"`
}

func soundingJSON(r *calc.Result, c jconv) *jSounding {
	s := r.Sounding
	if s == nil {
		return nil
	}
	j := &jSounding{File: s.File, Format: s.Format, ID: s.ID, AreaRatio: jnum(s.AreaRatio), Readings: s.Readings,
		NotNormalised: s.NotNormalised, Voids: s.Voids, Below: s.Below, Top: c.L(s.Top), Bottom: c.L(s.Bottom),
		Layers: []jSoundingLayer{}, Suggested: []jSuggested{},
		Note: "reported beside the calculation: not used in the capacity", ReadBy: s.ReadBy}
	if s.Nkt > 0 {
		j.Nkt = jn(s.Nkt)
	}
	for _, l := range s.Layers {
		jl := jSoundingLayer{Name: l.Name, Top: c.L(l.Top), Bottom: c.L(l.Bottom), Readings: l.Readings}
		if l.Readings > 0 {
			qt := c.S(l.Qt)
			jl.Qt, jl.Qtn, jl.Fr, jl.Ic, jl.Zone = &qt, jn(l.Qtn), jn(l.Fr), jn(l.Ic), int(l.Zone)
			jl.Su = opt(c.S(l.Su), l.Su > 0)
			jl.Phi = opt(c.deg(l.Phi), l.Phi > 0)
		}
		j.Layers = append(j.Layers, jl)
	}
	for _, l := range s.Suggested {
		j.Suggested = append(j.Suggested, jSuggested{Top: c.L(l.Top), Bottom: c.L(l.Bottom), Readings: l.Readings, MeanIc: jnum(l.MeanIc),
			Zone: int(l.Zone), ZoneName: zoneText(l.Zone)})
	}
	return j
}
