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
// Carlo and FOSM estimates of package reliability (Result.Reliability);
// with a candidates section, the candidate piles compared, each with its
// shortest passing length, its section's strength (package structural),
// quantities and cost (Result.Candidates); with a downdrag section (what is placed after the pile is installed),
// the neutral plane, drag load and largest axial force by the unified
// method of package settle in the ground after the loads, the design check
// with the drag load and the required length with it (Result.Downdrag;
// see Downdrag for the choices made). A ground.surcharge is in place before
// installation, and a warning says so when there is no downdrag section.
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
