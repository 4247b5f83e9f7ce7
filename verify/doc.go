// Package verify runs qult's verification record: a catalogue of reference
// cases whose expected values are printed in published sources (handbook
// worked examples, tables, agency manuals), each run through the library
// function it checks and compared within a stated tolerance.
//
// # The catalogue
//
// The cases live as YAML files in verify/cases/, one file per topic or
// source, embedded in the package (go:embed), so that the command
// `qult verify` carries them. They are kept under verify/ rather than in a
// top-level testdata/ folder because the go tool ignores folders named
// testdata, and an embed pattern cannot reach outside the package's folder.
//
// A file holds its sources once, under a key, and its cases:
//
//	topic: bearing factors
//	sources:
//	  bowles1996:
//	    author: Bowles, J.E.
//	    year: 1996
//	    title: Foundation Analysis and Design
//	    edition: 5th
//	    publisher: McGraw-Hill
//	cases:
//	  - id: bowles-t16-2-janbu-30-90-nq
//	    function: bearing.Janbu.Factors
//	    inputs: {phi: 30 deg, eta: 90 deg}
//	    quantity: nq
//	    expected: 18.40
//	    unit: "-"
//	    tolerance: {relative: 0.005, why: printed to two decimals}
//	    source: bowles1996
//	    where: Table 16-2
//	    status: read
//	    kind: table
//
// Every case names the function it checks (package.Function or
// package.Type.Method, as the function-to-case map lists them), its inputs
// (quantities as text with their unit, "30 deg", "100 kPa", "16 in";
// ratios as bare numbers), the quantity compared, the expected value in the
// unit given, a tolerance, relative or absolute, with the reason for its
// size, and the source: author, year, title, edition, the example, table or
// equation, the page, and whether the value was read in the source (status
// "read") or recalled ("from memory"). The kind says what the expected
// value is: "printed" (a worked example's printed result), "table" (a
// tabulated value), "equation" (the published equation evaluated by hand at
// the case's inputs), "arithmetic" (plain arithmetic on a source's printed
// inputs and intermediate values).
//
// Expected values come from the sources, never from qult's output. Where a
// source was read through a reproduction or transcription, the where or
// note field says so.
//
// # Running
//
// Run runs every case and returns a Record (per case: identifier, source,
// quantity, expected, computed, deviation, tolerance, pass or fail; and the
// counts). Summary gives the counts alone. Record.Write prints the record
// as text, Markdown, JSON or HTML. The package's tests run every case, so
// `go test ./...` fails when any case fails.
//
// The results are checks of arithmetic and method choices against published
// examples; they are for qualified engineers, who remain responsible for
// any design, checked against local codes, site investigation and load
// tests.
package verify
