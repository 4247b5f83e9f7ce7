package verify

import (
	"bytes"
	"embed"
	"errors"
	"fmt"
	"io/fs"
	"math"
	"path"
	"sort"
	"strings"

	"go.yaml.in/yaml/v3"
)

//go:embed cases/*.yaml
var embedded embed.FS

// Source is one published source as a catalogue file records it.
type Source struct {
	Author    string `yaml:"author" json:"author"`
	Year      string `yaml:"year" json:"year"`
	Title     string `yaml:"title" json:"title"`
	Edition   string `yaml:"edition,omitempty" json:"edition,omitempty"`
	Publisher string `yaml:"publisher,omitempty" json:"publisher,omitempty"`
	// Note says how the source was reached (a reproduction, a
	// transcription, the primary text).
	Note string `yaml:"note,omitempty" json:"note,omitempty"`
}

// Cite is the source in one line: author (year), title, edition.
func (s Source) Cite() string {
	c := s.Author + " (" + s.Year + "). " + s.Title
	if s.Edition != "" {
		c += ", " + s.Edition
	}
	return c
}

// Tolerance is a case's tolerance: relative (a fraction of the expected
// value) or absolute (in the case's unit), exactly one of them, and why
// it has that size.
type Tolerance struct {
	Relative float64 `yaml:"relative,omitempty" json:"relative,omitempty"`
	Absolute float64 `yaml:"absolute,omitempty" json:"absolute,omitempty"`
	Why      string  `yaml:"why" json:"why"`
}

// String is the tolerance as "±0.5 %" or "±0.05 kPa".
func (t Tolerance) String(unit string) string {
	if t.Relative > 0 {
		return "±" + trimFloat(100*t.Relative) + " %"
	}
	u := unit
	if u == "-" {
		u = ""
	} else {
		u = " " + u
	}
	return "±" + trimFloat(t.Absolute) + u
}

// Case is one reference case of the catalogue.
type Case struct {
	ID       string         `yaml:"id" json:"id"`
	Function string         `yaml:"function" json:"function"`
	Inputs   map[string]any `yaml:"inputs" json:"inputs"`
	Quantity string         `yaml:"quantity" json:"quantity"`
	Expected float64        `yaml:"expected" json:"expected"`
	// Unit of Expected and of the tolerance when absolute; "-" for a
	// number without dimension.
	Unit      string    `yaml:"unit" json:"unit"`
	Tolerance Tolerance `yaml:"tolerance" json:"tolerance"`
	// SourceKey names one of the file's sources.
	SourceKey string `yaml:"source" json:"-"`
	// Where is the example, table, equation or figure; Page the page.
	Where string `yaml:"where" json:"where"`
	Page  string `yaml:"page,omitempty" json:"page,omitempty"`
	// Status: "read" or "from memory".
	Status string `yaml:"status" json:"status"`
	// Kind: printed, table, equation or arithmetic (see the package doc).
	Kind string `yaml:"kind" json:"kind"`
	Note string `yaml:"note,omitempty" json:"note,omitempty"`

	// Set on loading.
	Source Source `yaml:"-" json:"source"`
	Topic  string `yaml:"-" json:"topic"`
	File   string `yaml:"-" json:"file"`
}

// Reference is the case's source with its place: "Bowles (1996).
// Foundation Analysis and Design, 5th ed., Table 16-2, p. 990".
func (c Case) Reference() string {
	r := c.Source.Cite() + ", " + c.Where
	if c.Page != "" {
		r += ", p. " + c.Page
	}
	return r
}

// file is one catalogue file.
type file struct {
	Topic   string            `yaml:"topic"`
	About   string            `yaml:"about,omitempty"`
	Sources map[string]Source `yaml:"sources"`
	Cases   []Case            `yaml:"cases"`
}

var (
	statuses = map[string]bool{"read": true, "from memory": true}
	kinds    = map[string]bool{"printed": true, "table": true, "equation": true, "arithmetic": true}
)

// Catalogue returns every case of the embedded catalogue, in file order
// and, within a file, in the order written. A malformed catalogue is an
// error listing every problem.
func Catalogue() ([]Case, error) { return load(embedded, "cases") }

// load reads every *.yaml file in dir of fsys.
func load(fsys fs.FS, dir string) ([]Case, error) {
	names, err := fs.Glob(fsys, path.Join(dir, "*.yaml"))
	if err != nil {
		return nil, err
	}
	sort.Strings(names)
	var all []Case
	var errs []error
	seen := map[string]string{}
	for _, name := range names {
		data, err := fs.ReadFile(fsys, name)
		if err != nil {
			return nil, err
		}
		cs, ferrs := parseFile(path.Base(name), data)
		errs = append(errs, ferrs...)
		for _, c := range cs {
			if prev, dup := seen[c.ID]; dup {
				errs = append(errs, fmt.Errorf("%s: case %q: identifier already used in %s", c.File, c.ID, prev))
				continue
			}
			seen[c.ID] = c.File
			all = append(all, c)
		}
	}
	if len(names) == 0 {
		errs = append(errs, fmt.Errorf("verify: no catalogue files in %s", dir))
	}
	return all, errors.Join(errs...)
}

// parseFile decodes and checks one catalogue file.
func parseFile(name string, data []byte) ([]Case, []error) {
	dec := yaml.NewDecoder(bytes.NewReader(data))
	dec.KnownFields(true)
	var f file
	if err := dec.Decode(&f); err != nil {
		return nil, []error{fmt.Errorf("%s: %v", name, err)}
	}
	var errs []error
	bad := func(format string, args ...any) { errs = append(errs, fmt.Errorf(name+": "+format, args...)) }
	if strings.TrimSpace(f.Topic) == "" {
		bad("topic: missing")
	}
	for k, s := range f.Sources {
		if s.Author == "" || s.Year == "" || s.Title == "" {
			bad("sources.%s: author, year and title are required", k)
		}
	}
	for i := range f.Cases {
		c := &f.Cases[i]
		c.File, c.Topic = name, f.Topic
		at := fmt.Sprintf("cases[%d] %q", i, c.ID)
		switch {
		case c.ID == "":
			bad("%s: id: missing", at)
		case strings.ContainsAny(c.ID, " \t\n"):
			bad("%s: id: no spaces allowed", at)
		}
		if c.Function == "" {
			bad("%s: function: missing", at)
		} else if _, ok := runners[c.Function]; !ok {
			bad("%s: function: %q is not one the catalogue can run (known: %s)", at, c.Function, strings.Join(Functions(), ", "))
		}
		if c.Quantity == "" {
			bad("%s: quantity: missing", at)
		}
		if c.Unit == "" {
			bad("%s: unit: missing (\"-\" for a number without dimension)", at)
		} else if _, err := unitScale(c.Unit); err != nil {
			bad("%s: unit: %v", at, err)
		}
		if math.IsNaN(c.Expected) || math.IsInf(c.Expected, 0) {
			bad("%s: expected: not a finite number", at)
		}
		t := c.Tolerance
		switch {
		case (t.Relative > 0) == (t.Absolute > 0):
			bad("%s: tolerance: give exactly one of relative and absolute, above 0", at)
		case t.Relative < 0 || t.Absolute < 0 || t.Relative > 0.5:
			bad("%s: tolerance: relative must lie in (0, 0.5], absolute above 0", at)
		case strings.TrimSpace(t.Why) == "":
			bad("%s: tolerance.why: say why the tolerance has this size", at)
		}
		if t.Relative > 0 && c.Expected == 0 {
			bad("%s: tolerance: a relative tolerance needs a non-zero expected value", at)
		}
		src, ok := f.Sources[c.SourceKey]
		if !ok {
			bad("%s: source: %q is not among the file's sources", at, c.SourceKey)
		}
		c.Source = src
		if c.Where == "" {
			bad("%s: where: name the example, table or equation", at)
		}
		if !statuses[c.Status] {
			bad("%s: status: %q, want read or from memory", at, c.Status)
		}
		if !kinds[c.Kind] {
			bad("%s: kind: %q, want printed, table, equation or arithmetic", at, c.Kind)
		}
	}
	return f.Cases, errs
}

// trimFloat prints x with up to 6 significant digits and no trailing zeros.
func trimFloat(x float64) string {
	s := fmt.Sprintf("%.6g", x)
	if strings.ContainsAny(s, "e") {
		return s
	}
	if strings.Contains(s, ".") {
		s = strings.TrimRight(strings.TrimRight(s, "0"), ".")
	}
	return s
}
