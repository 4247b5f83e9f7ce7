// Package report renders a calculation result (calc.Result) as aligned
// text tables, CSV, JSON, Markdown, a self-contained HTML calculation
// package or a PDF.
//
// Write takes a Format and Options: the display unit system (SI: m, kPa,
// kN, kN/m3, m2, kN/m; US: ft, ksf, kip, pcf, ft2, kip/ft; angles in
// degrees; Young's modulus in MPa or ksi), the View, an optional date,
// Wide (text tables at their natural width instead of 100 columns) and
// Paper (the PDF's page size: A4 for SI, Letter for US unless given).
//
// # Views
//
//	ViewCheck     loads, characteristic capacity totals, each design case with Ed, Rd and Ed/Rd, warnings
//	ViewCapacity  the per-segment shaft table (with why a segment carries no friction), the tip block with every
//	              tip rule applied and its worked equation, totals, the defaults and rules in force, warnings
//	ViewLength    the required length (the search, its passing ranges, or why none was found) and the
//	              capacity with depth, warnings
//	ViewReport    all of it, in the order a reviewer reads it: title block (with the calc file's SHA-256),
//	              summary (verdict, governing case, utilisation, required length, warnings), warnings,
//	              pile, loads, ground profile with derived unit weights (and, below an excavation or
//	              scour, the original and design ground lines and the thickness removed from each
//	              layer), vertical stresses, shaft and tip with worked equations, totals, the methods
//	              compared, design check, required length, capacity with depth, settlement and load
//	              test (as in ViewSettle) when present, the defaults and rules in force, sources cited,
//	              cautions, and the calc file as entered in an appendix; ViewCheck then adds a
//	              serviceability summary
//	ViewSettle    loads, capacity totals, the settlement at the serviceability load against the allowable
//	              (method, inputs, worked equations or the curves used), the predicted load-settlement
//	              curve, axial load and displacement with depth, the load test's points and criteria
//	ViewReliability  capacity totals and the probabilistic capacity: the uncertain parameters and their
//	              correlations, Monte Carlo and FOSM side by side (mean, σ, CoV, 5/50/95 % percentiles,
//	              P(R < Q), β), the sensitivity ranking; also in ViewReport when the file has a
//	              reliability section
//	(group)       ViewCheck and ViewReport add the pile group when the file has a group section:
//	              layout, efficiency, the block and its side shear by layer, uplift, the group's design
//	              check, Vesic's settlement and the equivalent raft by layer; HTML and PDF draw the plan
//	              of the group to scale (cap, block outline, piles numbered)
//	ViewChoose    the candidate piles ranked by cost (or length × area): each one's shortest passing
//	              length, what governs it, the utilisations, the section's axial resistance with its
//	              equation, quantities and cost, why a failing one fails; HTML and PDF add the required
//	              length against the diameter; also in ViewReport when the file has a candidates section
//
// Each format renders the view as follows.
//
//	Text      aligned tables with units in the headers, every line within 100 columns: a wider table is
//	          split into parts that repeat its key columns, long text wraps (Options.Wide: the
//	          natural width)
//	Markdown  the same content as Text, as headings and pipe tables
//	CSV       one table per view: check, one row per design case (characteristic totals without a design
//	          basis); capacity and report, one row per shaft segment then a tip row; length, capacity with depth;
//	          settle, the predicted load-settlement curve then the load test's points; reliability, the
//	          Monte Carlo and FOSM table
//	JSON      the whole result for every view (schema calc.ResultSchema, described in JSON.md)
//	HTML      the view's sections in one self-contained page (inline CSS and SVG, no scripts, no external
//	          fetches). ViewReport is the calculation package: it adds the inputs as entered, a drawing of
//	          the ground profile to scale, a plot of vertical stress with depth and a plot of capacity with
//	          depth; ViewLength adds the capacity plot; the settlement section adds the load-settlement
//	          curve (predicted and measured) and the axial load with depth; the reliability section adds
//	          the histogram, the distribution function and the sensitivity chart; ViewCheck and
//	          ViewCapacity are tables only. Print styles give A4 or Letter pages with the PDF's header and footer.
//	PDF       the view's sections as HTML has them, on A4 (SI) or Letter (US) pages (Options.Paper), with
//	          fpdf and the Liberation fonts embedded: a header (title, project, revision) and a footer
//	          (version, the calc file's SHA-256 prefix, date, page x of y, the cautions) on every page;
//	          tables split to the page width, figures as PNG images; the same result gives the same
//	          bytes
//
// # Numbers
//
// Text, Markdown and HTML show 4 significant digits, CSV and JSON 6, so
// that output is the same on every machine; trailing zeros are dropped
// ("24", "78.74"). In text formats a magnitude below 5e-7 display units is
// round-off and shows as 0. A result never holds NaN or Inf; if one did,
// text would show "n/a" and JSON null.
//
// # JSON
//
// Every quantity is an object with its value in display units and the unit
// named alongside, {"value": 12.3, "unit": "kN"}; dimensionless numbers (K,
// β, α, Nq, utilisation) are plain numbers. Optional values are left out
// when they do not apply. The layout is versioned by its "schema" field;
// a change that removes or renames a key changes the version. See JSON.md.
//
// # Safety
//
// All text from the calc file (title, names, the file itself) is escaped:
// html.EscapeString in HTML and in the SVG drawings, entities and
// backslashes in Markdown. CSV text cells starting with =, +, -, @ are
// prefixed with an apostrophe so that spreadsheets do not read them as
// formulas.
//
// # Tip rules, warnings and defaults
//
// The tip block writes one worked equation per rule, in the order the
// rules apply: Vesic's Irr (with Δ as it was obtained, or Irr = Ir where Δ
// was not used), the method's qp and its limit, a bored-pile rule's factor,
// the drilled-shaft cap and the large-base reduction, the embedment ramp,
// the layered transition and the weak-layer reduction, then Qp = qp·A; and
// it states the settlement basis of the tip value (bearing.SettlementBasis
// of the rule or method used). The warnings section gathers, without
// repeats, the run's warnings, the flags of the capacity, the tip and every
// shaft segment, the tip method's own warnings (a reducing rule switched
// off, volume change ignored) and the required-length search's; CSV, one
// table, carries none. The section "Defaults and rules in force" is built
// from the result and the calc file resolved again (for the switches the
// result does not carry): each rule, its value, its source, and whether it
// is applied, on, off or not applicable for this pile.
//
// # Choices
//
// The date in the title block is Options.Date,
// else the calc file's date, else none; the worked shaft equations use the
// bottom end of the first segment of each method (the top is often at zero
// stress); the capacity plot adds the governing case's design compression
// action Ed as a vertical line; the ground drawing shares one scale for
// depth and pile width, with the ground column an arbitrary width, its
// labels in a column beside it (measured in the font drawn, wrapped,
// stacked, with leaders), and a neutral fill by drainage with a key. The
// methods compared apply each catalogue method that needs no key to every
// embedded layer of its drainage class (tip methods to every layer of the
// bearing layer's class), keeping every other choice of the file. Figures
// are painted once on a gonum/plot vg.Canvas for SVG and PDF, in
// Liberation Sans at fixed sizes; in HTML the fonts are named, not
// embedded, so the SVG is stable and small.
package report
