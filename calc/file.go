package calc

import "encoding/json"

// FormatVersion is the version of the calc file format this package reads.
const FormatVersion = 1

// File is a calc file as written: one calculation of one pile in one
// ground profile. Quantities are Values: a number with a unit ("450 mm",
// "52 ft", "18 kN/m3") or a bare number counted in the unit system the file
// declares (Units). Field names are the YAML/JSON keys.
type File struct {
	// Qult is the format version; 0 or absent means FormatVersion.
	Qult int `yaml:"qult,omitempty" json:"qult,omitempty"`
	// ID is an identifier of the caller's own (a pile mark, a row key),
	// carried unchanged into the result and into each batch answer, so
	// that answers can be joined to their inputs.
	ID       string `yaml:"id,omitempty" json:"id,omitempty" doc:"An identifier of your own (a pile mark, a row key), carried unchanged into the result and each batch answer."`
	Title    string `yaml:"title" json:"title"`
	Project  string `yaml:"project,omitempty" json:"project,omitempty"`
	Revision string `yaml:"revision,omitempty" json:"revision,omitempty"`
	Engineer string `yaml:"engineer,omitempty" json:"engineer,omitempty"`
	Date     string `yaml:"date,omitempty" json:"date,omitempty"`
	// Units is the system for bare numbers and for display: SI (m, kPa,
	// kN, kN/m3, deg) or US (ft, ksf, kip, pcf, deg). Default SI.
	Units   string   `yaml:"units,omitempty" json:"units,omitempty"`
	Ground  Ground   `yaml:"ground" json:"ground"`
	Pile    Pile     `yaml:"pile" json:"pile"`
	Methods *Methods `yaml:"methods,omitempty" json:"methods,omitempty"`
	Design  *Design  `yaml:"design,omitempty" json:"design,omitempty"`
	Loads   *Loads   `yaml:"loads,omitempty" json:"loads,omitempty"`
	Search  *Search  `yaml:"search,omitempty" json:"search,omitempty"`
	// Settlement asks for the settlement of the pile at the
	// serviceability load; LoadTest gives a static load test to read.
	Settlement *Settlement `yaml:"settlement,omitempty" json:"settlement,omitempty" doc:"Settlement at the serviceability load: method, allowable settlement, load-transfer curves and the options of the elastic methods."`
	LoadTest   *LoadTest   `yaml:"load_test,omitempty" json:"load_test,omitempty" doc:"A static compression load test on the pile, as points of head load and head settlement, read by the chosen criteria."`
	// Reliability asks for the probabilistic capacity (Monte Carlo, FOSM).
	Reliability *Reliability `yaml:"reliability,omitempty" json:"reliability,omitempty" doc:"Probabilistic capacity: uncertain parameters with their distributions and correlations, for Monte Carlo simulation and FOSM."`
	// Group is a group of the file's piles under a rigid cap.
	Group *Group `yaml:"group,omitempty" json:"group,omitempty" doc:"A group of the file's piles under a rigid cap: layout, efficiency, block failure, uplift and settlement."`
	// Candidates lists pile types to compare (qult choose).
	Candidates *Candidates `yaml:"candidates,omitempty" json:"candidates,omitempty" doc:"Pile types to compare: sections, installations and materials, with unit costs; each gets its shortest passing length, quantities and cost."`
	// Downdrag lists the loads placed after the pile is installed and asks
	// for the neutral plane and the drag load (calc/downdrag.go).
	Downdrag *Downdrag `yaml:"downdrag,omitempty" json:"downdrag,omitempty" doc:"Loads placed after the pile is installed (fill, surcharge, lowered water table) and the ground settlement they cause: the neutral plane, drag load and largest axial force by the unified method."`

	// lines maps each field path read from the file to its line, built
	// on first use (see pathLines).
	lines *pathLines
}

// Ground is the borehole: groundwater and layers from the surface down.
type Ground struct {
	// WaterDepth is the depth of the water table below ground level;
	// negative means free water standing above the ground; "none" (or
	// omitting it) is a dry site.
	WaterDepth      Value       `yaml:"water_depth,omitempty" json:"water_depth,omitempty" q:"length-or-none" doc:"Depth of the water table below ground level; negative for free water above the ground; \"none\" for a dry site."`
	WaterUnitWeight Value       `yaml:"water_unit_weight,omitempty" json:"water_unit_weight,omitempty" q:"unitweight,0," doc:"Unit weight of water; default 9.81 kN/m3 (SI) or 62.4 pcf (US)."`
	Surcharge       Value       `yaml:"surcharge,omitempty" json:"surcharge,omitempty" q:"stress,0," doc:"Uniform surcharge on the ground surface, in place before the pile is installed (it raises σ′v and the shaft resistance); one placed after installation goes under downdrag."`
	PorePressures   []PorePoint `yaml:"pore_pressures,omitempty" json:"pore_pressures,omitempty"`
	// ExcavationDepth and Scour lower the ground to the design ground
	// line; the soil above it gives no shaft or tip resistance and its
	// weight leaves σ′v below (package profile).
	ExcavationDepth Value       `yaml:"excavation_depth,omitempty" json:"excavation_depth,omitempty" q:"length,0," doc:"Depth of an excavation floor below the original ground; the soil above is removed from σ′v, shaft and tip."`
	Scour           *Scour      `yaml:"scour,omitempty" json:"scour,omitempty" doc:"Design scour: general below the excavation floor (or the ground), local below the general scour line."`
	Layers          []Layer     `yaml:"layers" json:"layers"`
	Sounding        *Sounding   `yaml:"sounding,omitempty" json:"sounding,omitempty" doc:"A cone sounding (CSV, AGS4 or GEF) to interpret against this ground and report beside the calculation; its interpretation changes no capacity, and the layers whose tip or shaft is a direct CPT method (lcpc, schmertmann, eslami-fellenius) read its readings."`
	SPT             *SPTRecords `yaml:"spt,omitempty" json:"spt,omitempty" doc:"Standard penetration tests of one borehole (CSV or AGS4) to correct against this ground and report beside the calculation; they change no capacity."`
}

// Scour is the design scour at a pier or abutment.
type Scour struct {
	General Value `yaml:"general,omitempty" json:"general,omitempty" q:"length,0," doc:"General scour (long-term degradation and contraction), below the excavation floor or the original ground."`
	Local   Value `yaml:"local,omitempty" json:"local,omitempty" q:"length,0," doc:"Local scour at the pier or abutment, below the general scour line."`
}

// PorePoint is a pore pressure at a depth, for non-hydrostatic water.
type PorePoint struct {
	Depth    Value `yaml:"depth" json:"depth" q:"length,0," doc:"Depth of the pore-pressure point below ground level."`
	Pressure Value `yaml:"pressure" json:"pressure" q:"stress" doc:"Pore water pressure at that depth."`
}

// Strength is an undrained strength: a single value, or top and bottom
// values varying linearly through the layer.
type Strength struct {
	Value  Value `yaml:"-" json:"-"`
	Top    Value `yaml:"top,omitempty" json:"top,omitempty" q:"stress,0," doc:"Undrained shear strength su at the top of the layer."`
	Bottom Value `yaml:"bottom,omitempty" json:"bottom,omitempty" q:"stress,0," doc:"Undrained shear strength su at the bottom of the layer."`
}

// Layer is one layer of the log.
type Layer struct {
	Name      string `yaml:"name" json:"name"`
	Thickness Value  `yaml:"thickness,omitempty" json:"thickness,omitempty" q:"length,0," doc:"Layer thickness (or give top and bottom)."`
	Top       Value  `yaml:"top,omitempty" json:"top,omitempty" q:"length,0," doc:"Depth of the top of the layer below ground level."`
	Bottom    Value  `yaml:"bottom,omitempty" json:"bottom,omitempty" q:"length,0," doc:"Depth of the bottom of the layer below ground level."`
	// Drainage is "drained" (φ′, c′ govern) or "undrained" (su governs).
	Drainage string `yaml:"drainage" json:"drainage"`
	// Soil is the kind of soil as the log names it; description only (the
	// report's ground drawing shows it with a pattern).
	Soil string `yaml:"soil,omitempty" json:"soil,omitempty" doc:"Kind of soil as the log names it (description only: the ground drawing shows it with a fill pattern)."`

	UnitWeight          Value `yaml:"unit_weight,omitempty" json:"unit_weight,omitempty" q:"unitweight,0," doc:"Unit weight above the water table."`
	SaturatedUnitWeight Value `yaml:"saturated_unit_weight,omitempty" json:"saturated_unit_weight,omitempty" q:"unitweight,0," doc:"Saturated unit weight, used below the water table."`
	DryUnitWeight       Value `yaml:"dry_unit_weight,omitempty" json:"dry_unit_weight,omitempty" q:"unitweight,0," doc:"Dry unit weight (with void_ratio or specific_gravity: the other unit weights by phase relations)."`
	VoidRatio           Value `yaml:"void_ratio,omitempty" json:"void_ratio,omitempty" q:"number,0,20" doc:"Void ratio e."`
	WaterContent        Value `yaml:"water_content,omitempty" json:"water_content,omitempty" q:"fraction" doc:"Water content w, as a fraction (0.18) or a percentage (\"18 %\")."`
	SpecificGravity     Value `yaml:"specific_gravity,omitempty" json:"specific_gravity,omitempty" q:"number,0,10" doc:"Specific gravity of solids Gs."`
	Saturation          Value `yaml:"saturation,omitempty" json:"saturation,omitempty" q:"fraction" doc:"Degree of saturation S, as a fraction (0.9) or a percentage (\"90 %\")."`

	FrictionAngle     Value     `yaml:"friction_angle,omitempty" json:"friction_angle,omitempty" q:"angle,0,50" doc:"Effective friction angle φ′ (deg)."`
	Cohesion          Value     `yaml:"cohesion,omitempty" json:"cohesion,omitempty" q:"stress,0," doc:"Effective cohesion c′."`
	UndrainedStrength *Strength `yaml:"undrained_strength,omitempty" json:"undrained_strength,omitempty"`

	OCR              Value `yaml:"ocr,omitempty" json:"ocr,omitempty" q:"number,0,1000000" doc:"Overconsolidation ratio OCR."`
	RelativeDensity  Value `yaml:"relative_density,omitempty" json:"relative_density,omitempty" q:"fraction" doc:"Relative density Dr, as a fraction or a percentage."`
	N60              Value `yaml:"n60,omitempty" json:"n60,omitempty" q:"number,0,1000000" doc:"SPT blow count corrected to 60 % energy, N60 (blows/0.3 m)."`
	YoungsModulus    Value `yaml:"youngs_modulus,omitempty" json:"youngs_modulus,omitempty" q:"stress,0," doc:"Young's modulus of the soil."`
	PoissonsRatio    Value `yaml:"poissons_ratio,omitempty" json:"poissons_ratio,omitempty" q:"number,0,1000000" doc:"Poisson's ratio of the soil."`
	ShearModulus     Value `yaml:"shear_modulus,omitempty" json:"shear_modulus,omitempty" q:"stress,0," doc:"Shear modulus of the soil G."`
	RigidityIndex    Value `yaml:"rigidity_index,omitempty" json:"rigidity_index,omitempty" q:"number,0,1000000000" doc:"Rigidity index Ir (for Vesic's tip)."`
	VolumetricStrain Value `yaml:"volumetric_strain,omitempty" json:"volumetric_strain,omitempty" q:"number,0,0.5" doc:"Vesic's average volumetric strain Δ in the plastic zone at the tip; absent: Vesic's correlation with φ′ and q′."`

	// Compressibility, for one-dimensional consolidation (ground
	// settlement under fills and drawdown, group settlement): Cc and Cr
	// with e0 and σ′p, or the constrained modulus M = 1/mv.
	CompressionIndex       Value `yaml:"compression_index,omitempty" json:"compression_index,omitempty" q:"number,0,10" doc:"Compression index Cc (virgin compression, per log cycle of σ′v)."`
	RecompressionIndex     Value `yaml:"recompression_index,omitempty" json:"recompression_index,omitempty" q:"number,0,10" doc:"Recompression (swelling) index Cr, used below σ′p and on unloading."`
	InitialVoidRatio       Value `yaml:"initial_void_ratio,omitempty" json:"initial_void_ratio,omitempty" q:"number,0,15" doc:"Initial void ratio e0 for consolidation; default the layer's void_ratio."`
	PreconsolidationStress Value `yaml:"preconsolidation_stress,omitempty" json:"preconsolidation_stress,omitempty" q:"stress,0," doc:"Preconsolidation stress σ′p; absent: OCR·σ′v0 where ocr is given, else σ′v0 (normally consolidated)."`
	ConstrainedModulus     Value `yaml:"constrained_modulus,omitempty" json:"constrained_modulus,omitempty" q:"stress,0," doc:"Constrained (oedometer) modulus M = 1/mv, instead of the compression indices."`

	// Shaft and Tip override the methods for this layer.
	Shaft *ShaftChoice `yaml:"shaft,omitempty" json:"shaft,omitempty"`
	Tip   *TipChoice   `yaml:"tip,omitempty" json:"tip,omitempty"`

	// TZ is the t-z curve of this layer for the load-transfer settlement,
	// in place of the API curve of its drainage class.
	TZ *CurvePoints `yaml:"t_z,omitempty" json:"t_z,omitempty" doc:"t-z curve of this layer for the load-transfer settlement (settlement.method load-transfer), replacing the API curve of its drainage class."`
}

// ShaftChoice picks a shaft method for a layer and gives the values it
// reads instead of computing them. Method is an identifier of the shaft
// catalogue (shaft.Methods); Params are the other keys, each one the
// method reads (shaft.Descriptor.Params): for beta, K by one of k,
// k_over_k0, k_over_kp, k0 (jaky or ocr) and δ by one of delta,
// delta_over_phi, with defaults by the pile's installation and surface;
// beta-given its beta, alpha-given its alpha, beta-api its sand_class,
// lambda its lambda; every method that gives fs at a depth a limit. A key
// the method does not read is an error.
type ShaftChoice struct {
	Method string           `yaml:"method" json:"method"`
	Params map[string]Value `yaml:",inline" json:"-"`
}

// TipChoice picks a tip method for a layer. Method is an identifier of
// the tip catalogue (bearing.Methods); Params are the other keys, each one
// the method reads (bearing.Descriptor.Params): nq, nc and limit for
// given-nq, nsigma and nc for vesic-given, nc for given-nc, eta for janbu.
// A key the method does not read is an error.
type TipChoice struct {
	Method string           `yaml:"method" json:"method"`
	Params map[string]Value `yaml:",inline" json:"-"`
}

// MarshalJSON writes the choice as the calc file has it: method and its
// keys side by side.
func (c ShaftChoice) MarshalJSON() ([]byte, error) { return choiceJSON(c.Method, c.Params) }

// MarshalJSON writes the choice as the calc file has it: method and its
// keys side by side.
func (c TipChoice) MarshalJSON() ([]byte, error) { return choiceJSON(c.Method, c.Params) }

func choiceJSON(method string, params map[string]Value) ([]byte, error) {
	m := map[string]string{"method": method}
	for k, v := range params {
		m[k] = v.Raw
	}
	return json.Marshal(m)
}

// Section is a pile cross-section. Each shape reads its own keys, and a
// key it does not read is an error:
//
//	circle        diameter
//	square        width (the side)
//	closed-pipe   diameter (outside), wall
//	open-pipe     diameter (outside), wall
//	h-section     depth, width (flange), web, flange (thicknesses)
//	given         area (tip), perimeter (shaft), width (for L/D, critical depth, tip zones)
type Section struct {
	// Shape: circle, square, closed-pipe, open-pipe, h-section, given.
	Shape     string `yaml:"shape" json:"shape"`
	Diameter  Value  `yaml:"diameter,omitempty" json:"diameter,omitempty" q:"length,0," doc:"Diameter (outside diameter of a pipe)."`
	Width     Value  `yaml:"width,omitempty" json:"width,omitempty" q:"length,0," doc:"Side of a square, flange width of an H-section, or the width of a given section."`
	Wall      Value  `yaml:"wall,omitempty" json:"wall,omitempty" q:"length,0," doc:"Wall thickness of a pipe."`
	Depth     Value  `yaml:"depth,omitempty" json:"depth,omitempty" q:"length,0," doc:"Depth of an H-section."`
	Web       Value  `yaml:"web,omitempty" json:"web,omitempty" q:"length,0," doc:"Web thickness of an H-section."`
	Flange    Value  `yaml:"flange,omitempty" json:"flange,omitempty" q:"length,0," doc:"Flange thickness of an H-section."`
	Area      Value  `yaml:"area,omitempty" json:"area,omitempty" q:"area,0," doc:"Tip area of a given section."`
	Perimeter Value  `yaml:"perimeter,omitempty" json:"perimeter,omitempty" q:"length,0," doc:"Shaft perimeter of a given section."`
}

// Pile is the pile and its installation.
type Pile struct {
	Section      Section `yaml:"section" json:"section"`
	Length       Value   `yaml:"length" json:"length" q:"length,0," doc:"Pile length from head to tip."`
	HeadDepth    Value   `yaml:"head_depth,omitempty" json:"head_depth,omitempty" q:"length,0," doc:"Depth of the pile head below ground level (default 0)."`
	Installation string  `yaml:"installation" json:"installation"`
	// Surface: rough-concrete, smooth-concrete, rough-steel, smooth-steel,
	// timber; default by section and installation.
	Surface       string `yaml:"surface,omitempty" json:"surface,omitempty"`
	Plug          string `yaml:"plug,omitempty" json:"plug,omitempty"`
	YoungsModulus Value  `yaml:"youngs_modulus,omitempty" json:"youngs_modulus,omitempty" q:"stress,0," doc:"Young's modulus of the pile material."`
	UnitWeight    Value  `yaml:"unit_weight,omitempty" json:"unit_weight,omitempty" q:"unitweight,0," doc:"Unit weight of the pile material, for its self-weight."`
}

// Zone is a depth range with no shaft friction.
type Zone struct {
	Top    Value `yaml:"top" json:"top" q:"length,0," doc:"Top of the zone, depth below ground level."`
	Bottom Value `yaml:"bottom" json:"bottom" q:"length,0," doc:"Bottom of the zone, depth below ground level."`
}

// Methods are the methods for the whole pile, by drainage class.
type Methods struct {
	// TipDrained, TipUndrained, ShaftDrained and ShaftUndrained are
	// identifiers of the catalogues (bearing.Methods, shaft.Methods) for
	// every layer of a drainage class, among those that need no key (a
	// given factor is chosen on a layer); shaft_drained takes a method that
	// gives fs at each depth, shaft_undrained also lambda. Absent: the
	// defaults of package pile for the installation.
	TipDrained     string `yaml:"tip_drained,omitempty" json:"tip_drained,omitempty" doc:"Tip method for drained layers (an identifier of the tip catalogue); absent: the default for the installation."`
	TipUndrained   string `yaml:"tip_undrained,omitempty" json:"tip_undrained,omitempty" doc:"Tip method for undrained layers (an identifier of the tip catalogue); absent: the default."`
	ShaftDrained   string `yaml:"shaft_drained,omitempty" json:"shaft_drained,omitempty" doc:"Shaft method for drained layers (an identifier of the shaft catalogue); absent: the default."`
	ShaftUndrained string `yaml:"shaft_undrained,omitempty" json:"shaft_undrained,omitempty" doc:"Shaft method for undrained layers (an identifier of the shaft catalogue, or lambda); absent: the default."`
	// CriticalDepth is the ratio n of zc = n·D; 0 or absent for none.
	CriticalDepth Value `yaml:"critical_depth,omitempty" json:"critical_depth,omitempty" q:"number,0,1000" doc:"Critical depth ratio n of zc = n·D (β methods in drained layers); absent for none."`
	// LayeredTip turns Meyerhof's rule for a tip near a weaker layer above
	// on or off (default on).
	LayeredTip *bool `yaml:"layered_tip,omitempty" json:"layered_tip,omitempty"`
	// WeakBelow is how many diameters below the tip to look for a weaker
	// layer (default 3).
	WeakBelow Value `yaml:"weak_below,omitempty" json:"weak_below,omitempty" q:"number,0,1000" doc:"How many diameters below the tip to look for a weaker layer."`
	// SelfWeight: ignored (default), net or gross.
	SelfWeight string `yaml:"self_weight,omitempty" json:"self_weight,omitempty"`
	// TensionShaftRatio multiplies shaft resistance in tension (the
	// default by drainage: 0.7 drained, 1 undrained). Formerly
	// tension_factor, a spelling the design section used for a factor of
	// safety too; the old key is refused with a message naming the new.
	TensionShaftRatio Value `yaml:"tension_shaft_ratio,omitempty" json:"tension_shaft_ratio,omitempty" q:"number,0,1000" doc:"Ratio of shaft resistance in tension to that in compression."`
	ClampCharts       bool  `yaml:"clamp_charts,omitempty" json:"clamp_charts,omitempty"`
	// Pa is the atmospheric (reference) pressure of the methods that read
	// one; default 100 kPa in SI files and 2000 psf in US files.
	Pa Value `yaml:"pa,omitempty" json:"pa,omitempty" q:"stress,0," doc:"Atmospheric (reference) pressure pa; default 100 kPa (SI) or 2000 psf (US); 80 to 120 kPa."`
	// Rules that lower capacity, on unless set to false (a warning then
	// says so where the rule would have applied).
	WeakLayer      *bool  `yaml:"weak_layer,omitempty" json:"weak_layer,omitempty" doc:"Meyerhof's reduction of the tip within 10 D above a weaker layer (default true)."`
	Embedment      *bool  `yaml:"embedment,omitempty" json:"embedment,omitempty" doc:"Meyerhof's ramp of the tip with embedment below the critical embedment ratio (default true)."`
	EmbedmentRatio Value  `yaml:"embedment_ratio,omitempty" json:"embedment_ratio,omitempty" q:"number,1,50" doc:"Critical embedment ratio (Lb/D)cr of the embedment ramp (default 10)."`
	DrilledZones   *bool  `yaml:"drilled_zones,omitempty" json:"drilled_zones,omitempty" doc:"No side resistance in the top 1.5 m and the bottom diameter of drilled-shaft α layers (default true)."`
	LambdaCap      *bool  `yaml:"lambda_cap,omitempty" json:"lambda_cap,omitempty" doc:"The λ method's unit friction capped at the mean su (default true)."`
	NoShaft        []Zone `yaml:"no_shaft,omitempty" json:"no_shaft,omitempty"`
}

// Design is the design basis.
type Design struct {
	// Basis: safety-factor, lrfd or en1997.
	Basis string `yaml:"basis" json:"basis"`
	// safety-factor: factor (global), or tip_factor and shaft_factor;
	// tension_safety_factor.
	Factor              Value `yaml:"factor,omitempty" json:"factor,omitempty" q:"number,0,100" doc:"Global factor of safety (safety-factor)."`
	TipFactor           Value `yaml:"tip_factor,omitempty" json:"tip_factor,omitempty" q:"number,0,100" doc:"Factor of safety on the tip (safety-factor)."`
	ShaftFactor         Value `yaml:"shaft_factor,omitempty" json:"shaft_factor,omitempty" q:"number,0,100" doc:"Factor of safety on the shaft (safety-factor)."`
	TensionSafetyFactor Value `yaml:"tension_safety_factor,omitempty" json:"tension_safety_factor,omitempty" q:"number,0,100" doc:"Factor of safety in tension (safety-factor); formerly tension_factor."`
	// lrfd: preset (aashto-driven, aashto-drilled) and/or resistance
	// factors by method identifier ("*" for any other), load factors.
	Preset    string           `yaml:"preset,omitempty" json:"preset,omitempty"`
	Tip       map[string]Value `yaml:"tip,omitempty" json:"tip,omitempty" q:"factormap,0,1" doc:"Resistance factors φ on tip resistance, by tip method (lrfd)."`
	Shaft     map[string]Value `yaml:"shaft,omitempty" json:"shaft,omitempty" q:"factormap,0,1" doc:"Resistance factors φ on shaft resistance, by shaft method (lrfd)."`
	Uplift    map[string]Value `yaml:"uplift,omitempty" json:"uplift,omitempty" q:"factormap,0,1" doc:"Resistance factors φ on uplift resistance, by shaft method (lrfd)."`
	Permanent Value            `yaml:"permanent,omitempty" json:"permanent,omitempty" q:"number,0,10" doc:"Load factor on permanent actions (lrfd)."`
	Variable  Value            `yaml:"variable,omitempty" json:"variable,omitempty" q:"number,0,10" doc:"Load factor on variable actions (lrfd)."`
	// en1997: approach (DA1, DA2, DA3), profiles (n for ξ3/ξ4; 0 for the
	// model factor alone), model_factor (γRd), total (use γt).
	Approach    string `yaml:"approach,omitempty" json:"approach,omitempty"`
	Profiles    Value  `yaml:"profiles,omitempty" json:"profiles,omitempty" q:"integer,0,1000" doc:"Number of ground test profiles n for ξ3/ξ4 (en1997)."`
	ModelFactor Value  `yaml:"model_factor,omitempty" json:"model_factor,omitempty" q:"number,0,10" doc:"Model factor γRd (en1997)."`
	Total       bool   `yaml:"total,omitempty" json:"total,omitempty"`
	// en1997: the annex whose factors apply (recommended, the default:
	// EN 1997-1 Annex A; uk: the UK National Annex), sls_verified for
	// the UK annex's lower R4 factors, given ξ3 and ξ4, and factor tables
	// that replace the annex's for this pile's installation.
	// OtherProfiles are further ground test profiles at the site (each a
	// ground section), for EN 1997-1's characteristic resistance from n
	// profiles, Rc,k = min(mean/ξ3, min/ξ4) (eq. 7.8): the pile is analysed
	// in the file's ground and in each of these, with the pile-wide
	// methods.
	OtherProfiles []Ground            `yaml:"other_profiles,omitempty" json:"other_profiles,omitempty" doc:"Further ground test profiles for EN 1997-1's characteristic resistance from n profiles (en1997)."`
	Annex         string              `yaml:"annex,omitempty" json:"annex,omitempty"`
	SLSVerified   bool                `yaml:"sls_verified,omitempty" json:"sls_verified,omitempty"`
	Xi3           Value               `yaml:"xi3,omitempty" json:"xi3,omitempty" q:"number,1,3" doc:"Correlation factor ξ3, given (en1997)."`
	Xi4           Value               `yaml:"xi4,omitempty" json:"xi4,omitempty" q:"number,1,3" doc:"Correlation factor ξ4, given (en1997)."`
	Resistance    map[string]RFactors `yaml:"resistance_factors,omitempty" json:"resistance_factors,omitempty" doc:"Partial resistance factors by set (R1 to R4) for this pile's installation, replacing the annex's (en1997)."`
	Actions       map[string]AFactors `yaml:"action_factors,omitempty" json:"action_factors,omitempty" doc:"Partial factors on actions by set (A1, A2), replacing the annex's (en1997)."`
	// lrfd: the factor on the pile's weight W′ in uplift; safety-factor:
	// weight_unfactored counts W′ in full instead of W′/F.
	Weight           Value `yaml:"weight,omitempty" json:"weight,omitempty" q:"number,0,1" doc:"Factor on the pile's effective weight in uplift (lrfd; preset default 0.9)."`
	WeightUnfactored bool  `yaml:"weight_unfactored,omitempty" json:"weight_unfactored,omitempty" doc:"Count the pile's weight in uplift in full, not divided by the factor (safety-factor)."`
}

// RFactors are the partial resistance factors of one set (R1 to R4).
type RFactors struct {
	Base    Value `yaml:"base,omitempty" json:"base,omitempty" q:"number,1,5" doc:"γb on base resistance."`
	Shaft   Value `yaml:"shaft,omitempty" json:"shaft,omitempty" q:"number,1,5" doc:"γs on shaft resistance in compression."`
	Total   Value `yaml:"total,omitempty" json:"total,omitempty" q:"number,1,5" doc:"γt on total resistance."`
	Tension Value `yaml:"tension,omitempty" json:"tension,omitempty" q:"number,1,5" doc:"γs;t on shaft resistance in tension."`
}

// AFactors are the partial factors on actions of one set (A1, A2).
type AFactors struct {
	G    Value `yaml:"g,omitempty" json:"g,omitempty" q:"number,0,5" doc:"γG on unfavourable permanent actions."`
	GFav Value `yaml:"g_fav,omitempty" json:"g_fav,omitempty" q:"number,0,5" doc:"γG,fav on favourable permanent actions."`
	Q    Value `yaml:"q,omitempty" json:"q,omitempty" q:"number,0,5" doc:"γQ on unfavourable variable actions."`
}

// Load is a characteristic load given as its permanent and variable parts
// ({permanent: 1500 kN, variable: 700 kN}); either may be left out. A bare
// value ("800 kN") is refused, because the design bases factor the two
// parts differently and a bare value would choose one in silence.
type Load struct {
	Value     Value `yaml:"-" json:"-"`
	Permanent Value `yaml:"permanent,omitempty" json:"permanent,omitempty" q:"force,0," doc:"Permanent (dead) part of the characteristic load."`
	Variable  Value `yaml:"variable,omitempty" json:"variable,omitempty" q:"force,0," doc:"Variable (live, wind, …) part of the characteristic load."`
}

// Loads are the characteristic loads on the pile head.
type Loads struct {
	Compression *Load `yaml:"compression,omitempty" json:"compression,omitempty"`
	Tension     *Load `yaml:"tension,omitempty" json:"tension,omitempty"`
}

// Search sets the depths for capacity with depth and the search for the
// required length.
type Search struct {
	Step   Value `yaml:"step,omitempty" json:"step,omitempty" q:"length,0," doc:"Step of the depth grid for capacity with depth and the required length."`
	MaxTip Value `yaml:"max_tip,omitempty" json:"max_tip,omitempty" q:"length,0," doc:"Deepest tip considered, below ground level."`
}

// CurvePoints is a load-transfer curve given as points: [displacement,
// ratio] pairs from [0, 0] to a ratio of 1, the ratio being the mobilised
// share of the ultimate resistance (t/tmax on the shaft, Q/Qp at the tip).
// Displacements are lengths ("2.5 mm"), or multiples of the pile's
// diameter or width when PerDiameter is set (plain numbers then).
type CurvePoints struct {
	Points      [][]Value `yaml:"points" json:"points" doc:"[displacement, ratio] pairs: displacements rising from 0 (a length, or a multiple of the diameter with per_diameter), ratios from 0 never falling, the last 1."`
	PerDiameter bool      `yaml:"per_diameter,omitempty" json:"per_diameter,omitempty" doc:"Displacements are multiples of the pile's diameter or width (plain numbers)."`
}

// Settlement asks for the settlement of the pile at the serviceability
// load. Method is load-transfer (the default: t-z springs along the shaft
// and a q-z spring at the tip, on the API curves of each layer's drainage
// class unless the layer gives t_z), vesic (Vesic's three components) or
// randolph-wroth (the closed-form head stiffness in soil with G linear in
// depth). Every method reads pile.youngs_modulus.
type Settlement struct {
	Method    string `yaml:"method,omitempty" json:"method,omitempty" doc:"Settlement method: load-transfer (default), vesic or randolph-wroth."`
	Allowable Value  `yaml:"allowable,omitempty" json:"allowable,omitempty" q:"length,0," doc:"Allowable settlement of the pile head at the serviceability load; absent: no serviceability check (a load the pile cannot carry still fails)."`
	Load      Value  `yaml:"load,omitempty" json:"load,omitempty" q:"force,0," doc:"Serviceability load on the pile head; absent: the characteristic compression load of loads (permanent + variable)."`
	// load-transfer
	Residual  Value        `yaml:"residual,omitempty" json:"residual,omitempty" q:"number,0.7,1" doc:"Post-peak ratio tres/tmax of the API clay t-z curve (load-transfer; default 0.7, the low end of API RP 2GEO's 0.7 to 0.9)."`
	QZ        *CurvePoints `yaml:"q_z,omitempty" json:"q_z,omitempty" doc:"q-z curve of the tip as points (load-transfer); absent: the API Q-z curve."`
	Elements  Value        `yaml:"elements,omitempty" json:"elements,omitempty" q:"integer,1,100000" doc:"Number of pile elements of the load-transfer solution (default 100)."`
	Tolerance Value        `yaml:"tolerance,omitempty" json:"tolerance,omitempty" q:"number,1e-14,0.001" doc:"Relative force tolerance of the load-transfer solution (default 1e-9)."`
	// vesic
	Vesic *VesicOptions `yaml:"vesic,omitempty" json:"vesic,omitempty" doc:"Options of Vesic's method (method vesic)."`
}

// VesicOptions are the choices of Vesic's three-component method.
type VesicOptions struct {
	Form string `yaml:"form,omitempty" json:"form,omitempty" doc:"How the tip and shaft components are found: elastic (Es and ν of the layers, Iwp and Iws; default) or empirical (Cp and Cs with qp of the pile analysis)."`
	Xi   Value  `yaml:"xi,omitempty" json:"xi,omitempty" q:"number,0,1" doc:"Distribution factor ξ of the shaft load in the elastic shortening (default 0.67, the triangular distribution; 0.5 uniform)."`
	Iwp  Value  `yaml:"iwp,omitempty" json:"iwp,omitempty" q:"number,0,2" doc:"Influence factor Iwp of the tip (elastic form; default 0.85)."`
	Cp   Value  `yaml:"cp,omitempty" json:"cp,omitempty" q:"number,0,0.5" doc:"Empirical coefficient Cp (empirical form; default the loose or soft end of Vesic's range for the soil at the tip and the installation)."`
}

// LoadTest is a static compression load test on the pile.
type LoadTest struct {
	Points   [][]Value `yaml:"points" json:"points" doc:"[load, settlement] pairs of head load and head settlement in the order applied: loads never falling, settlements rising."`
	FitFrom  Value     `yaml:"fit_from,omitempty" json:"fit_from,omitempty" q:"integer,0,100000" doc:"Index (from 0) of the first point of the hyperbolic fits (chin-kondner, brinch-hansen-80); default 0."`
	Criteria []string  `yaml:"criteria,omitempty" json:"criteria,omitempty" doc:"Criteria to read the test by: davisson (reads pile.youngs_modulus), ten-percent, chin-kondner, brinch-hansen-80 (default all four)."`
}
