package bearing

// Row is one method's answer in a comparison.
type Row struct {
	ID       string  // method identifier
	Equation string  // the method's equation
	Range    string  // the inputs the method accepts
	Factor   float64 // the principal factor: Nq (or Nσ*) for drained methods, Nc for undrained; 0 for SPT
	Result   Result  // the full result; zero when Err is not nil
	Err      error   // why the method could not be applied, or nil
}

// Drained returns the drained (friction) tip methods of the catalogue
// that need no given value, built as a calc file builds them with no key
// beside method:, in the catalogue's order (Methods): Meyerhof, Vesic
// with Δ by its correlation, Berezantzev, Janbu at η′ = 90 deg, the four
// API sand classes, the SPT methods for drilled shafts and driven piles
// and the two bored-pile rules.
func Drained() []Tip { return of(DrainedLayers) }

// Undrained returns the undrained tip methods of the catalogue that need
// no given value: Skempton's Nc = 9 and Vesic's undrained Nc*.
func Undrained() []Tip { return of(UndrainedLayers) }

// NeedsN60 reports whether a tip method reads N60 and has no meaning
// without it (the SPT rules: drilled-n60-sand and driven-n60-sand).
func NeedsN60(m Tip) bool {
	switch m.(type) {
	case ShaftSand, DrivenN60:
		return true
	}
	return false
}

// Compare evaluates every method that applies to in and returns one row
// each: the drained methods when φ′ or q′ is given (the SPT method only
// when N60 is given) and the undrained methods when su is given. A method
// that cannot be applied (a missing input, φ′ off its chart) keeps its row
// with the error, so that a reviewer sees why. Compare allocates; use the
// methods directly on a hot path.
func Compare(in Input) []Row {
	var methods []Tip
	if in.Phi != 0 || in.Q != 0 {
		for _, m := range Drained() {
			if NeedsN60(m) && in.N60 == 0 {
				continue
			}
			methods = append(methods, m)
		}
	} else if in.N60 != 0 {
		methods = append(methods, ShaftSand{}, DrivenN60{})
	}
	if in.Su != 0 {
		methods = append(methods, Undrained()...)
	}
	rows := make([]Row, 0, len(methods))
	for _, m := range methods {
		r, err := m.Tip(in)
		row := Row{ID: m.ID(), Equation: m.Equation(), Range: m.Range(), Result: r, Err: err}
		if err == nil {
			row.Factor = r.Nq
			if r.Nq == 0 {
				row.Factor = r.Nc
			}
		}
		rows = append(rows, row)
	}
	return rows
}
