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

// Drained returns the drained (friction) tip methods, in a fixed order:
// Meyerhof, Vesic, Berezantzev, Janbu at η′ = 90 deg, the four API sand
// classes, and the SPT method for drilled shafts.
func Drained() []Tip {
	return []Tip{Meyerhof{}, Vesic{}, Berezantzev{}, Janbu{},
		APISand{Class: 1}, APISand{Class: 2}, APISand{Class: 3}, APISand{Class: 4}, ShaftSand{}}
}

// Undrained returns the undrained tip methods: Skempton's Nc = 9 and
// Vesic's undrained Nc*.
func Undrained() []Tip { return []Tip{Skempton{}, VesicUndrained{}} }

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
			if _, ok := m.(ShaftSand); ok && in.N60 == 0 {
				continue
			}
			methods = append(methods, m)
		}
	} else if in.N60 != 0 {
		methods = append(methods, ShaftSand{})
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
