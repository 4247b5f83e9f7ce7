// Command qult computes the axial capacity of a pile or drilled shaft from
// a calc file, checks it against a design basis, finds the required
// length, writes the calculation package, and offers two quick tools
// (three-phase soil relations and tip bearing factors) that need no file.
//
// Usage:
//
//	qult check    [flags] FILE   design verification summary (exit 1 when it fails)
//	qult capacity [flags] FILE   capacity with its full breakdown
//	qult length   [flags] FILE   required length and capacity with depth (exit 1 when none passes)
//	qult report   [flags] FILE   the calculation package (HTML when -o ends in .html)
//	qult settle   [flags] FILE   settlement at the serviceability load and the load test (exit 1 when it exceeds the allowable)
//	qult reliability [flags] FILE  probabilistic capacity: Monte Carlo, FOSM and sensitivities
//	qult choose   [flags] FILE   candidate piles compared, the recommended one (exit 1 when none passes)
//	qult phase    [flags]        three-phase relations of one soil element
//	qult factors  [flags]        tip bearing factors by every applicable method
//	qult batch    [flags] [FILE] JSON Lines in (one calc file per line), JSON Lines out
//	qult verify   [flags]        run the shipped reference cases against their published values (exit 1 when any fails)
//	qult version                 the version of qult and of its file formats
//	qult help [VERB]             help, with an example, for each verb
//
// FILE may be "-" for standard input. Exit codes: 0 done, 1 the design
// check (or the serviceability check) fails, 2 bad input or usage.
//
// Choices: flags may come before or after the file name; -o writes the
// output only when the verb succeeds, under a temporary name renamed over
// the destination at the end (nothing is left half-written), and refuses a
// path that names the input file; text, CSV and Markdown output and error
// messages carry no control or bidirectional formatting characters (they
// become U+FFFD); at most 100 problems are printed, then a count of the
// rest; check and length need a design section and loads in
// the file; batch exits 2 when any line is bad input, else 1 when any
// design check fails, else 0, and every line's answer (or its error) is
// written either way.
package main

import (
	"fmt"
	"io"
	"os"
	"runtime/debug"
	"strings"

	"github.com/qultgeo/qult/report"
)

// version is the qult version; set at build time with
// -ldflags "-X main.version=v1.2.3", else read from the build information.
var version = ""

// stdin is where "-" reads from; tests replace it.
var stdin io.Reader = os.Stdin

func main() { os.Exit(run(os.Stdout, os.Stderr, os.Args[1:])) }

// Exit codes.
const (
	exitOK    = 0
	exitFail  = 1 // the design check fails, or no length passes
	exitUsage = 2 // bad input or usage
)

// verb is one sub-command.
type verb struct {
	name    string
	summary string
	run     func(c *cmd, args []string) int
}

var verbs []verb

func init() {
	verbs = []verb{
		{"check", "design verification summary; exit 1 when the design check fails", runCheck},
		{"capacity", "axial capacity with its full breakdown (shaft segments and tip)", runCapacity},
		{"length", "required pile length and capacity with depth; exit 1 when no length passes", runLength},
		{"report", "the calculation package (text, or HTML when -o ends in .html)", runReport},
		{"settle", "settlement at the serviceability load and the load test; exit 1 when it exceeds the allowable", runSettle},
		{"reliability", "probabilistic capacity: Monte Carlo, FOSM and the sensitivity ranking", runReliability},
		{"choose", "candidate piles compared: each one's shortest passing length, quantities and cost; exit 1 when none passes", runChoose},
		{"phase", "three-phase relations of one soil element (Gs, e, n, w, S, unit weights)", runPhase},
		{"factors", "tip bearing factors by every applicable method, side by side", runFactors},
		{"batch", "JSON Lines in (one calc file per line), JSON Lines out, in parallel, order kept", runBatch},
		{"verify", "run the shipped reference cases against their published values; exit 1 when any fails", runVerify},
		{"version", "the version of qult and of its file formats", runVersion},
	}
}

// cmd carries the streams of one invocation.
type cmd struct {
	stdout, stderr io.Writer
	verb           string
}

// errorf prints an error line prefixed with "qult: ", cleaned of control
// and bidirectional characters (a message may quote a name from the file).
func (c *cmd) errorf(format string, args ...any) {
	fmt.Fprint(c.stderr, report.CleanText(fmt.Sprintf("qult: "+format+"\n", args...)))
}

// usageErr prints a usage error and points at the verb's help.
func (c *cmd) usageErr(format string, args ...any) int {
	c.errorf(format, args...)
	if c.verb != "" {
		fmt.Fprintf(c.stderr, "run 'qult help %s' for usage\n", c.verb)
	} else {
		fmt.Fprintf(c.stderr, "run 'qult help' for usage\n")
	}
	return exitUsage
}

// run is the whole command: it parses args, runs one verb, and returns the
// exit code. It never panics: a panic is reported as an internal error
// with exit code 2.
func run(stdout, stderr io.Writer, args []string) (code int) {
	defer func() {
		if p := recover(); p != nil {
			fmt.Fprintf(stderr, "qult: internal error: %v\n%s", p, debug.Stack())
			code = exitUsage
		}
	}()
	setVersion()
	c := &cmd{stdout: stdout, stderr: stderr}
	if len(args) == 0 {
		writeUsage(stderr)
		return exitUsage
	}
	name, rest := args[0], args[1:]
	switch name {
	case "help", "-h", "-help", "--help":
		if len(rest) == 0 {
			writeUsage(stdout)
			return exitOK
		}
		if len(rest) > 1 {
			return c.usageErr("help takes one verb, got %q", strings.Join(rest, " "))
		}
		if rest[0] == "help" {
			writeVerbHelp(stdout, "help")
			return exitOK
		}
		v := findVerb(rest[0])
		if v == nil {
			return c.usageErr("unknown verb %q", rest[0])
		}
		writeVerbHelp(stdout, v.name)
		return exitOK
	case "-version", "--version":
		name = "version"
	}
	v := findVerb(name)
	if v == nil {
		if strings.HasPrefix(name, "-") {
			return c.usageErr("flag %s given before a verb; the verb comes first", name)
		}
		return c.usageErr("unknown verb %q", name)
	}
	c.verb = v.name
	return v.run(c, rest)
}

func findVerb(name string) *verb {
	for i := range verbs {
		if verbs[i].name == name {
			return &verbs[i]
		}
	}
	return nil
}

func writeUsage(w io.Writer) {
	fmt.Fprintf(w, "qult: axial capacity of piles and drilled shafts from a calc file\n\n")
	fmt.Fprintf(w, "usage: qult VERB [flags] [FILE]\n\n")
	for _, v := range verbs {
		for i, l := range wrapWords(v.summary, textWidth-14) {
			name := ""
			if i == 0 {
				name = v.name
			}
			fmt.Fprintf(w, "  %-11s %s\n", name, l)
		}
	}
	fmt.Fprintf(w, "  %-11s %s\n", "help", "help for a verb, with an example: qult help VERB")
	fmt.Fprintf(w, "\nFILE is a calc file in YAML or JSON; \"-\" reads standard input.\n")
	fmt.Fprintf(w, "Exit codes: 0 done, 1 the design check fails, 2 bad input or usage.\n")
}

// setVersion settles the version string and hands it to package calc.
func setVersion() {
	if version == "" {
		bi, _ := debug.ReadBuildInfo()
		version = versionOf(bi)
	}
	setCalcVersion(version)
}

// versionOf returns the module version of a build (go install …@v0.1.0),
// or, for a build from a clone, "dev" with the revision and time of the
// commit it was built from ("dev+4f3c2a1b9e0d 2026-12-02T07:12:04Z", with
// "+dirty" when the tree had changes), or "dev" alone.
func versionOf(bi *debug.BuildInfo) string {
	if bi == nil {
		return "dev"
	}
	if v := bi.Main.Version; v != "" && v != "(devel)" {
		return v
	}
	var rev, at, dirty string
	for _, s := range bi.Settings {
		switch s.Key {
		case "vcs.revision":
			rev = s.Value
		case "vcs.time":
			at = s.Value
		case "vcs.modified":
			if s.Value == "true" {
				dirty = "+dirty"
			}
		}
	}
	if rev == "" {
		return "dev"
	}
	if len(rev) > 12 {
		rev = rev[:12]
	}
	v := "dev+" + rev + dirty
	if at != "" {
		v += " " + at
	}
	return v
}
