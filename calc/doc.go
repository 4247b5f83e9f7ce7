// Package calc reads one calculation of one pile from a calc file (YAML or
// JSON), checks it, runs it through the library and returns a Result with
// every intermediate value a report needs.
//
// Decode is strict: unknown or duplicate keys, anchors and aliases, more
// than one document, deep nesting and files over MaxFileSize are refused,
// and every problem found is reported at once as Problems, each with its
// field path (the calc file's keys, such as "ground.layers[2].thickness")
// and line. Resolve turns every value into SI quantities (a bare number is
// counted in the file's unit system, SI or US) and library inputs; Run
// builds the profile, the analysis, capacity with depth, the design check
// and the required length, and, with a reliability section, the Monte
// Carlo and FOSM estimates of package reliability (Result.Reliability),
// and, with a candidates section, the candidate piles compared, each with
// its shortest passing length, its section's strength (package
// structural), quantities and cost (Result.Candidates).
// Parse is Decode and Run in one call. Problems
// keep the library errors behind them (errors.Is and errors.As reach a
// *units.ParseError, a *profile.FieldError, a *pile.PathError, …).
//
// The methods a file names are looked up in the catalogues of packages
// bearing and shaft; Schema returns the file's JSON Schema, generated from
// the Go types and the catalogues.
//
// Results are for qualified engineers: check them against the governing
// codes, the site investigation and load tests.
package calc
