package main

import (
	"bytes"
	"errors"
	"flag"
	"fmt"
	"io"
	"os"
	"strings"
)

// help is the text of one verb's help.
type help struct {
	usage   string // the usage line after "qult "
	about   string // what the verb does, a few lines
	example string // one or more example command lines with a word on each
	flags   func() *flag.FlagSet
}

var helps map[string]help

func init() {
	calcFlagsOnly := func(name, formats string) func() *flag.FlagSet {
		return func() *flag.FlagSet { return calcFlags(name, formats, &calcOpts{}) }
	}
	helps = map[string]help{
		"check": {
			usage: "check [--format F] [--units SI|US] [-o FILE] FILE",
			about: `Runs the calc file and verifies the design: the design resistance of
every case of the design basis against the factored loads, the
utilisation and whether each passes. The file needs a design section and
loads. With a group section it checks the group too (efficiency, block
failure, uplift, settlement; loads on the cap). Exit code 1 when any case
fails.`,
			example: `qult check examples/pump-station-bored.yaml
  qult check --format json - < pile.yaml`,
			flags: calcFlagsOnly("check", calcFormats),
		},
		"capacity": {
			usage: "capacity [--format F] [--units SI|US] [-o FILE] FILE",
			about: `Runs the calc file and prints the characteristic axial capacity with its
full breakdown: one row per shaft segment (depths, layer, method, σ′v,
unit friction, force), the tip block (method, factors, unit tip
resistance, area, force), totals, warnings and sources.`,
			example: `qult capacity examples/pump-station-bored.yaml
  qult capacity --units US --format csv -o capacity.csv examples/pump-station-bored.yaml`,
			flags: calcFlagsOnly("capacity", calcFormats),
		},
		"length": {
			usage: "length [--format F] [--units SI|US] [-o FILE] FILE",
			about: `Runs the calc file and finds the shortest pile whose design resistance
carries the loads in every case of the design basis, searching tip depths
on the file's search grid (search.step down to search.max_tip), and
prints the capacity with depth. The file needs a design section and
loads. Exit code 1 when no length on the grid passes.`,
			example: `qult length examples/river-jetty-pipe.yaml
  qult length --format csv -o with-depth.csv examples/river-jetty-pipe.yaml`,
			flags: calcFlagsOnly("length", calcFormats),
		},
		"report": {
			usage: "report [--format F] [--units SI|US] [-o FILE] FILE",
			about: `Writes the calculation package: title block (with the calc file's SHA-256),
the summary (verdict, governing case, utilisation, required length,
warnings), pile, loads, ground profile, stresses, shaft table and tip
block with the equations, totals, the methods compared, design check,
capacity with depth, settlement, defaults, sources, cautions and the calc
file as entered. The format follows -o's extension (.html, .pdf, .json,
.csv, .md), else text. A PDF is A4 for SI display units and US Letter for
US units unless --paper says otherwise, with a header (title, project,
revision) and a footer (qult version, the calc file's SHA-256, page x of
y, the cautions) on every page.`,
			example: `qult report -o pump-station.html examples/pump-station-bored.yaml
  qult report -o pump-station.pdf examples/pump-station-bored.yaml
  qult report --format md examples/abutment-hpile-us.yaml > abutment.md`,
			flags: calcFlagsOnly("report", calcFormats),
		},
		"settle": settleHelp(),
		"phase": {
			usage: "phase [flags]",
			about: `Solves the three-phase state of one soil element from any sufficient set
of values and prints every quantity. Unit weights take a unit ("18 kN/m3",
"115 pcf") or count in --units; w and S are fractions (0.25) or
percentages ("25 %"). A value given as exactly 0 (S or w) counts as given.
Over-determined values must agree within 0.5 %.`,
			example: `qult phase --gs 2.70 --e 0.65 --s 1
  qult phase --units US --gamma 120 --w "18 %" --gs 2.68`,
			flags: func() *flag.FlagSet { return phaseFlags(&phaseOpts{}) },
		},
		"factors": {
			usage: "factors [flags]",
			about: `Evaluates every tip bearing method that applies to the given soil and
prints their factors and unit tip resistance side by side: the drained
methods when --phi or --q is given (the SPT method only with --n60), the
undrained methods when --su is given. A method that cannot be applied
keeps its row with the reason.`,
			example: `qult factors --phi 34 --q 180 --l 20 --d 0.6
  qult factors --su 75 --ir 150
  qult factors --units US --phi 36 --q 3.2 --l 60 --d 2 --n60 35`,
			flags: func() *flag.FlagSet { return factorFlags(&factorOpts{}) },
		},
		"batch": {
			usage: "batch [--workers N] [--lean] [--units SI|US] [-o FILE] [FILE]",
			about: `Reads JSON Lines: one calc file per line as a JSON object. Runs them in
parallel (--workers N at once, 0 for one per CPU) and writes one line per
input line, in input order: the result in the report's JSON form, opened
by "line" (the input line number) and "id" (the file's id key, or its
title), or {"line": N, "id": "...", "error": "...", "problems": [...]} for
a bad line. --lean leaves the capacity-with-depth table and the methods
compared out of each result (and does not compute them). Blank lines are
skipped. Reads standard input when FILE is "-" or absent. Exit code 2
when any line is bad input, else 1 when any design check fails, else 0.`,
			example: `qult batch piles.jsonl > results.jsonl
  cat piles.jsonl | qult batch -`,
			flags: func() *flag.FlagSet { return batchFlags(&batchOpts{}) },
		},
		"help": {
			usage: "help [VERB]",
			about: `Prints the list of verbs, or with a verb its usage, what it does, its
flags and an example. "qult VERB --help" does the same.`,
			example: `qult help report
  qult help`,
			flags: func() *flag.FlagSet { return newFlagSet("help") },
		},
		"version": {
			usage:   "version",
			about:   `Prints the version of qult, of the calc file format it reads and of the result schema it writes.`,
			example: `qult version`,
			flags:   func() *flag.FlagSet { return newFlagSet("version") },
		},
	}
}

func writeVerbHelp(w io.Writer, name string) {
	h := helps[name]
	fmt.Fprintf(w, "usage: qult %s\n\n%s\n", h.usage, h.about)
	fs := h.flags()
	n := 0
	fs.VisitAll(func(*flag.Flag) { n++ })
	if n > 0 {
		fmt.Fprintf(w, "\nflags:\n")
		printFlags(w, fs)
	}
	fmt.Fprintf(w, "\nexample:\n  %s\n", h.example)
}

func newFlagSet(name string) *flag.FlagSet {
	fs := flag.NewFlagSet(name, flag.ContinueOnError)
	fs.SetOutput(io.Discard)
	fs.Usage = func() {}
	return fs
}

// parseFlags parses args with flags and file names in any order. It
// returns the positional arguments, or an exit code when parsing ended
// (help shown, or a usage error printed).
func (c *cmd) parseFlags(fs *flag.FlagSet, args []string) ([]string, int, bool) {
	var pos []string
	for {
		err := fs.Parse(args)
		if errors.Is(err, flag.ErrHelp) {
			writeVerbHelp(c.stdout, c.verb)
			return nil, exitOK, false
		}
		if err != nil {
			return nil, c.usageErr("%s: %v", c.verb, err), false
		}
		rest := fs.Args()
		if len(rest) == 0 {
			return pos, 0, true
		}
		if rest[0] == "--" {
			return append(pos, rest[1:]...), 0, true
		}
		pos = append(pos, rest[0])
		args = rest[1:]
	}
}

// readInput reads a calc file, or standard input for "-", refusing to read
// more than limit+1 bytes (so that an over-long input is seen to be too
// long without being read whole).
func readInput(name string, limit int64) ([]byte, error) {
	var r io.Reader
	if name == "-" {
		r = stdin
	} else {
		st, err := os.Stat(name)
		if err != nil {
			return nil, err
		}
		if st.IsDir() {
			return nil, fmt.Errorf("%s is a directory, not a calc file", name)
		}
		f, err := os.Open(name)
		if err != nil {
			return nil, err
		}
		defer f.Close()
		r = f
	}
	return io.ReadAll(io.LimitReader(r, limit+1))
}

// output writes the verb's output to standard output or, with -o, to a
// file, only once the whole of it is ready.
func (c *cmd) output(out string, buf *bytes.Buffer) int {
	if out == "" || out == "-" {
		if _, err := c.stdout.Write(buf.Bytes()); err != nil {
			c.errorf("writing output: %v", err)
			return exitUsage
		}
		return exitOK
	}
	if err := writeAtomic(out, buf.Bytes()); err != nil {
		c.errorf("%v", err)
		return exitUsage
	}
	return exitOK
}

// oneOf checks a flag value against the accepted words.
func oneOf(flagName, v string, accepted ...string) error {
	for _, a := range accepted {
		if strings.EqualFold(v, a) {
			return nil
		}
	}
	return fmt.Errorf("--%s %q: want one of %s", flagName, v, strings.Join(accepted, ", "))
}

// printFlags lists the flags as users write them: --name for every flag
// but the output file, -o.
func printFlags(w io.Writer, fs *flag.FlagSet) {
	fs.VisitAll(func(f *flag.Flag) {
		dash := "--"
		if f.Name == "o" {
			dash = "-"
		}
		arg, usage := flag.UnquoteUsage(f)
		line := "  " + dash + f.Name
		if arg != "" {
			line += " " + arg
		}
		if f.DefValue != "" && f.DefValue != "false" {
			usage += fmt.Sprintf(" (default %q)", f.DefValue)
		}
		fmt.Fprintf(w, "%s\n", line)
		for _, l := range wrapWords(usage, textWidth-6) {
			fmt.Fprintf(w, "      %s\n", l)
		}
	})
}
