package main

import (
	"bufio"
	"bytes"
	"context"
	"encoding/json"
	"errors"
	"flag"
	"fmt"
	"io"
	"os"
	"runtime/debug"
	"strings"
	"sync"

	"github.com/qultgeo/qult/calc"
	"github.com/qultgeo/qult/report"
	"github.com/qultgeo/qult/units"
)

type batchOpts struct {
	units   string
	out     string
	workers int
	lean    bool
}

func batchFlags(o *batchOpts) *flag.FlagSet {
	fs := newFlagSet("batch")
	fs.StringVar(&o.units, "units", "", "display `system` SI or US for every result (default: each file's units)")
	fs.StringVar(&o.out, "o", "", "write the output to `FILE` instead of standard output")
	fs.IntVar(&o.workers, "workers", 0, "run `N` calc files at once; 0 means one per CPU")
	fs.BoolVar(&o.lean, "lean", false, "leave the capacity-with-depth table out of each line (listed under \"omitted\")")
	return fs
}

// batchProblem is a problem of a bad line in the batch output.
type batchProblem struct {
	Path    string `json:"path,omitempty"`
	Line    int    `json:"line,omitempty"`
	Message string `json:"message"`
}

func runBatch(c *cmd, args []string) int {
	var o batchOpts
	fs := batchFlags(&o)
	pos, code, ok := c.parseFlags(fs, args)
	if !ok {
		return code
	}
	if len(pos) > 1 {
		return c.usageErr("batch: one input at a time, got %d (%s)", len(pos), strings.Join(pos, " "))
	}
	if o.workers < 0 {
		return c.usageErr("batch: --workers %d: want 0 (one per CPU) or a positive number of workers", o.workers)
	}
	sys, hasSys := units.SI, false
	if o.units != "" {
		s, err := units.ParseSystem(o.units)
		if err != nil {
			return c.usageErr("batch: --units %q: want SI or US", o.units)
		}
		sys, hasSys = s, true
	}
	name := "-"
	if len(pos) == 1 {
		name = pos[0]
	}
	if !c.checkOut(o.out, name) {
		return exitUsage
	}
	var in io.Reader = stdin
	if name != "-" {
		f, err := os.Open(name)
		if err != nil {
			c.errorf("%v", err)
			return exitUsage
		}
		defer f.Close()
		in = f
	}
	var out io.Writer = c.stdout
	var file *atomicFile
	if o.out != "" && o.out != "-" {
		f, err := createAtomic(o.out)
		if err != nil {
			c.errorf("batch: %v", err)
			return exitUsage
		}
		file = f
		out = f
	}
	bw := bufio.NewWriter(out)
	bad, fail, err := batch(in, bw, batchSettings{sys: sys, hasSys: hasSys, workers: o.workers, lean: o.lean})
	if ferr := bw.Flush(); err == nil {
		err = ferr
	}
	if file != nil {
		if err == nil {
			err = file.commit()
		} else {
			file.abort()
		}
	}
	if err != nil {
		c.errorf("batch: %v", err)
		return exitUsage
	}
	switch {
	case bad > 0:
		c.errorf("batch: %d line(s) with bad input; see their \"error\" members", bad)
		return exitUsage
	case fail > 0:
		c.errorf("batch: %d design check(s) fail", fail)
		return exitFail
	}
	return exitOK
}

// batchGOGC is the collector's target percentage while batch runs,
// unless GOGC is set.
const batchGOGC = 400

// batchSettings are what batch needs of the flags.
type batchSettings struct {
	sys     units.System
	hasSys  bool // sys overrides each file's units
	workers int  // 0: one per CPU
	lean    bool // leave capacity with depth out (and uncomputed)
}

// batch runs the JSON Lines of in through calc.RunBatch and writes one
// line per non-blank input line to out, in input order: the result as
// compact JSON with its line number and id first, or the line's error.
// Each answer is rendered in the worker that ran it. It returns the counts
// of bad lines and of failing design checks.
func batch(in io.Reader, out io.Writer, s batchSettings) (bad, fail int, err error) {
	verify := verificationLine()
	finish := func(it *calc.BatchItem) {
		if it.Err != nil {
			it.Out = errLine(it.Line, it.ID, it.Err)
			return
		}
		r := it.Result
		if s.hasSys {
			r.Display = s.sys
		}
		buf := bytes.NewBuffer(outPool.get())
		if err := report.WriteLine(buf, r, report.LineOptions{Units: report.FileUnits, Verification: verify,
			Line: it.Line, ID: it.ID, Lean: s.lean}); err != nil {
			it.Result, it.Err = nil, err
			it.Out = errLine(it.Line, it.ID, err)
			return
		}
		it.Out = buf.Bytes()
	}
	// Each calculation allocates a few hundred kB and keeps almost none
	// of it, so with the default GOGC the collector runs every few
	// calculations and, stopping every worker each time, eats the gain of
	// a second core. The window bounds the live heap to a few MB, so a
	// looser target costs little memory; a GOGC set by the user wins.
	if os.Getenv("GOGC") == "" {
		defer debug.SetGCPercent(debug.SetGCPercent(batchGOGC))
	}
	o := calc.BatchOptions{Workers: s.workers, Lean: s.lean, Finish: finish}
	err = calc.RunBatch(context.Background(), in, o, func(it calc.BatchItem) error {
		if it.Out == nil { // finish did not run to the end (a recovered panic)
			if it.Err == nil {
				it.Err = errors.New("internal error: no answer")
			}
			it.Result, it.Out = nil, errLine(it.Line, it.ID, it.Err)
		}
		switch r := it.Result; {
		case it.Err != nil:
			bad++
		case (r.Design != nil && !r.Design.Pass) || !r.ServiceabilityPass() || !r.DowndragPass() || (r.Group != nil && !r.Group.Pass):
			fail++
		}
		_, err := out.Write(it.Out)
		outPool.put(it.Out)
		return err
	})
	return bad, fail, err
}

// outPool recycles the buffers of batch answers once they are written.
var outPool = bufPool{p: sync.Pool{New: func() any { return new([]byte) }}}

type bufPool struct{ p sync.Pool }

func (b *bufPool) get() []byte {
	return (*b.p.Get().(*[]byte))[:0]
}

func (b *bufPool) put(s []byte) {
	if cap(s) > 0 && cap(s) <= 1<<20 {
		b.p.Put(&s)
	}
}

// errLine is the answer for a bad line: its line number, its id or title
// when one could be read, the problems in one message and as a list.
func errLine(num int, id string, err error) []byte {
	var ps []batchProblem
	var cps calc.Problems
	if errors.As(err, &cps) {
		for _, p := range cps {
			ps = append(ps, batchProblem{Path: p.Path, Line: p.Line, Message: p.Msg})
		}
	} else {
		ps = append(ps, batchProblem{Message: err.Error()})
	}
	msgs := make([]string, len(ps))
	for i, p := range ps {
		msgs[i] = p.Message
		if p.Path != "" {
			msgs[i] = p.Path + ": " + p.Message
		}
	}
	v := struct {
		Line     int            `json:"line"`
		ID       string         `json:"id,omitempty"`
		Error    string         `json:"error"`
		Problems []batchProblem `json:"problems"`
	}{num, id, strings.Join(msgs, "; "), ps}
	b, merr := json.Marshal(v)
	if merr != nil {
		b = fmt.Appendf(nil, `{"line":%d,"error":"unprintable error"}`, num)
	}
	return append(b, '\n')
}

// runVersion prints the versions.
func runVersion(c *cmd, args []string) int {
	fs := newFlagSet("version")
	pos, code, ok := c.parseFlags(fs, args)
	if !ok {
		return code
	}
	if len(pos) > 0 {
		return c.usageErr("version takes no arguments, got %q", strings.Join(pos, " "))
	}
	fmt.Fprintf(c.stdout, "qult %s\ncalc file format %d\nresult schema %s\n", version, calc.FormatVersion, calc.ResultSchema)
	return exitOK
}
