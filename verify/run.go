package verify

import (
	"fmt"
	"math"
	"sort"
	"strings"
	"sync"
)

// Outcome is one case run: the value computed, in the case's unit, its
// deviation from the expected value (relative, as a fraction, when the
// tolerance is relative; in the case's unit when it is absolute), and
// whether it lies within the tolerance. Err is set when the function could
// not be run; such a case fails.
type Outcome struct {
	Case
	Computed  float64 `json:"computed"`
	Deviation float64 `json:"deviation"`
	Pass      bool    `json:"pass"`
	Err       error   `json:"-"`
}

// Record is a run of the catalogue.
type Record struct {
	Outcomes []Outcome
	Cases    int
	Passed   int
	Failed   int
}

// Run runs every case of the catalogue. A catalogue that cannot be read
// is an error; a case that cannot run is a failed outcome with its Err.
func Run() (Record, error) {
	cs, err := Catalogue()
	if err != nil {
		return Record{}, err
	}
	return RunCases(cs), nil
}

// RunCases runs the given cases in order.
func RunCases(cs []Case) Record {
	r := Record{Outcomes: make([]Outcome, 0, len(cs))}
	for _, c := range cs {
		o := runCase(c)
		r.Outcomes = append(r.Outcomes, o)
		r.Cases++
		if o.Pass {
			r.Passed++
		} else {
			r.Failed++
		}
	}
	return r
}

var (
	summaryOnce          sync.Once
	sumCases, sumP, sumF int
	summaryErr           error
)

// Summary runs the catalogue once per process and returns how many cases
// it holds, how many passed and how many failed. err is set when the
// catalogue cannot be read.
func Summary() (cases, passed, failed int, err error) {
	summaryOnce.Do(func() {
		var r Record
		r, summaryErr = Run()
		sumCases, sumP, sumF = r.Cases, r.Passed, r.Failed
	})
	return sumCases, sumP, sumF, summaryErr
}

// SummaryText is the summary in one line for a title block, such as
// "verification: 160 reference cases, 160 pass".
func SummaryText() string {
	n, p, f, err := Summary()
	if err != nil {
		return "verification: the catalogue could not be read"
	}
	if f == 0 {
		return fmt.Sprintf("verification: %d reference cases, all pass", n)
	}
	return fmt.Sprintf("verification: %d reference cases, %d pass, %d FAIL", n, p, f)
}

// runCase runs one case, turning a panic in the function into a failure.
func runCase(c Case) (o Outcome) {
	o = Outcome{Case: c, Computed: math.NaN(), Deviation: math.NaN()}
	defer func() {
		if p := recover(); p != nil {
			o.Pass, o.Err = false, fmt.Errorf("panic: %v", p)
		}
	}()
	run, ok := runners[c.Function]
	if !ok {
		o.Err = fmt.Errorf("function %q cannot be run", c.Function)
		return o
	}
	vals, err := run(newArgs("inputs.", c.Inputs))
	if err != nil {
		o.Err = err
		return o
	}
	got, ok := vals[c.Quantity]
	if !ok {
		var names []string
		for k := range vals {
			names = append(names, k)
		}
		sort.Strings(names)
		o.Err = fmt.Errorf("quantity %q: %s gives %s", c.Quantity, c.Function, strings.Join(names, ", "))
		return o
	}
	scale, err := unitScale(c.Unit)
	if err != nil {
		o.Err = err
		return o
	}
	if got.Dim != scale.Dim {
		o.Err = fmt.Errorf("unit %q is a %v, but %s is a %v", c.Unit, dimName(scale.Dim), c.Quantity, dimName(got.Dim))
		return o
	}
	o.Computed = got.Value / scale.Value
	if math.IsNaN(o.Computed) || math.IsInf(o.Computed, 0) {
		o.Err = fmt.Errorf("computed %v", o.Computed)
		return o
	}
	if c.Tolerance.Relative > 0 {
		o.Deviation = (o.Computed - c.Expected) / math.Abs(c.Expected)
		o.Pass = math.Abs(o.Deviation) <= c.Tolerance.Relative
	} else {
		o.Deviation = o.Computed - c.Expected
		o.Pass = math.Abs(o.Deviation) <= c.Tolerance.Absolute
	}
	return o
}
