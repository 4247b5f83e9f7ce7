// Package cite records published sources as data, so that every method in
// qult can say what it rests on and a report can list what was used.
//
// A Source is a publication; a Ref is a Source with the place in it that a
// method uses (an equation, table, figure or page). Methods expose their
// references through the Cited interface; Collect gathers the distinct
// sources of a calculation for its bibliography.
package cite

import (
	"cmp"
	"slices"
	"strconv"
	"strings"
)

// Source is one publication.
type Source struct {
	Key         string // our stable identifier, such as "meyerhof1976"
	Authors     string // as cited, such as "Meyerhof, G.G."
	Year        int    // year of publication
	Title       string // title of the paper, book or standard
	Publication string // journal with volume and pages, or publisher and edition
}

// String returns the source in author-year form:
//
//	Meyerhof, G.G. (1976). Bearing capacity and settlement of pile foundations. J. Geotech. Eng. Div. ASCE 102(GT3), 197-228.
func (s Source) String() string {
	var b strings.Builder
	b.WriteString(s.Authors)
	b.WriteString(" (")
	b.WriteString(strconv.Itoa(s.Year))
	b.WriteString("). ")
	b.WriteString(s.Title)
	b.WriteString(".")
	if s.Publication != "" {
		b.WriteString(" ")
		b.WriteString(s.Publication)
		b.WriteString(".")
	}
	return b.String()
}

// Short returns the source in the form used beside a number, such as
// "Meyerhof (1976)".
func (s Source) Short() string {
	return surnames(s.Authors) + " (" + strconv.Itoa(s.Year) + ")"
}

// surnames reads authors written "Surname, I., Surname, I." and returns
// "Surname", "Surname & Surname" or "Surname et al."; a corporate author
// (no comma) is returned whole.
func surnames(authors string) string {
	parts := strings.Split(authors, ", ")
	if len(parts) < 2 {
		return authors
	}
	n := (len(parts) + 1) / 2
	switch {
	case n == 1:
		return parts[0]
	case n == 2:
		return parts[0] + " & " + parts[2]
	default:
		return parts[0] + " et al."
	}
}

// Ref is a source and the place in it that a method uses.
type Ref struct {
	Source Source
	Where  string // such as "Eq. 12", "Table 3", "Fig. 5", "p. 212"
}

// String returns the short citation and the place, such as
// "Meyerhof (1976), Fig. 5".
func (r Ref) String() string {
	if r.Where == "" {
		return r.Source.Short()
	}
	return r.Source.Short() + ", " + r.Where
}

// Cited is implemented by anything that rests on published sources: a
// method, a preset, a result row.
type Cited interface {
	Refs() []Ref
}

// Collect returns the distinct sources of refs, sorted by key, for a list
// of sources cited.
func Collect(refs ...Ref) []Source {
	out := make([]Source, 0, len(refs))
	for _, r := range refs {
		out = append(out, r.Source)
	}
	slices.SortFunc(out, func(a, b Source) int { return cmp.Compare(a.Key, b.Key) })
	return slices.CompactFunc(out, func(a, b Source) bool { return a.Key == b.Key })
}
