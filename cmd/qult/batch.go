package main

import (
	"bufio"
	"bytes"
	"encoding/json"
	"errors"
	"flag"
	"fmt"
	"io"
	"os"
	"runtime"
	"strings"
	"sync"

	"github.com/qultgeo/qult/calc"
	"github.com/qultgeo/qult/units"
)

type batchOpts struct {
	units string
	out   string
}

func batchFlags(o *batchOpts) *flag.FlagSet {
	fs := newFlagSet("batch")
	fs.StringVar(&o.units, "units", "", "display `system` SI or US for every result (default: each file's units)")
	fs.StringVar(&o.out, "o", "", "write the output to `FILE` instead of standard output")
	return fs
}

// batchLine is one line's answer.
type batchLine struct {
	out  []byte
	bad  bool // bad input
	fail bool // the design check fails
}

// batchProblem is a problem of a bad line in the batch output.
type batchProblem struct {
	Path    string `json:"path,omitempty"`
	Line    int    `json:"line,omitempty"`
	Message string `json:"message"`
}

// workers is the size of batch's worker pool; a variable so that tests
// can run with one worker and with many.
var workers = runtime.NumCPU()

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
	bad, fail, err := batch(in, bw, sys, hasSys, max(1, workers))
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

// batch reads JSON Lines from in and writes one line per non-blank input
// line to out, in input order, running n workers. It returns the counts of
// bad lines and of failing design checks.
func batch(in io.Reader, out io.Writer, sys units.System, hasSys bool, n int) (bad, fail int, err error) {
	type job struct {
		num  int
		data []byte
		long bool
		res  chan batchLine
	}
	jobs := make(chan job)
	order := make(chan chan batchLine, 4*n)
	var wg sync.WaitGroup
	for range n {
		wg.Add(1)
		go func() {
			defer wg.Done()
			for j := range jobs {
				j.res <- batchOne(j.num, j.data, j.long, sys, hasSys)
			}
		}()
	}
	// The writer takes answers in input order.
	var werr error
	done := make(chan struct{})
	go func() {
		defer close(done)
		for ch := range order {
			l := <-ch
			if l.bad {
				bad++
			}
			if l.fail {
				fail++
			}
			if werr == nil {
				_, werr = out.Write(l.out)
			}
		}
	}()
	br := bufio.NewReaderSize(in, 64<<10)
	var rerr error
	for num := 1; ; num++ {
		data, long, err := readLine(br, calc.MaxFileSize)
		if num == 1 {
			// A byte-order mark at the start of the input, as some
			// editors write, is not part of the first line (single calc
			// files accept it too).
			data = bytes.TrimPrefix(data, []byte("\xef\xbb\xbf"))
		}
		if len(bytes.TrimSpace(data)) > 0 || long {
			ch := make(chan batchLine, 1)
			order <- ch
			jobs <- job{num: num, data: data, long: long, res: ch}
		}
		if err == io.EOF {
			break
		}
		if err != nil {
			rerr = err
			break
		}
	}
	close(jobs)
	wg.Wait()
	close(order)
	<-done
	if rerr != nil {
		return bad, fail, rerr
	}
	return bad, fail, werr
}

// readLine reads one line of at most limit bytes; a longer line is
// consumed and reported as long, with its data dropped.
func readLine(br *bufio.Reader, limit int) ([]byte, bool, error) {
	var line []byte
	long := false
	for {
		chunk, err := br.ReadSlice('\n')
		if !long {
			if len(line)+len(chunk) > limit+1 {
				long, line = true, nil
			} else {
				line = append(line, chunk...)
			}
		}
		if err == bufio.ErrBufferFull {
			continue
		}
		return bytes.TrimRight(line, "\r\n"), long, err
	}
}

// batchOne runs one line.
func batchOne(num int, data []byte, long bool, sys units.System, hasSys bool) (l batchLine) {
	defer func() {
		if p := recover(); p != nil {
			l = errLine(num, []batchProblem{{Message: fmt.Sprintf("internal error: %v", p)}})
		}
	}()
	if long {
		return errLine(num, []batchProblem{{Message: fmt.Sprintf("line is over the limit of %d bytes (1 MiB)", calc.MaxFileSize)}})
	}
	t := bytes.TrimSpace(data)
	if len(t) == 0 || t[0] != '{' {
		return errLine(num, []batchProblem{{Message: "want one calc file as a JSON object ({...}) on each line"}})
	}
	res, err := calc.Parse(data)
	if err != nil {
		var ps calc.Problems
		var out []batchProblem
		if errors.As(err, &ps) {
			for _, p := range ps {
				out = append(out, batchProblem{Path: p.Path, Line: p.Line, Message: p.Msg})
			}
		} else {
			out = append(out, batchProblem{Message: err.Error()})
		}
		return errLine(num, out)
	}
	if hasSys {
		res.Display = sys
	}
	var buf bytes.Buffer
	if err := renderJSONLine(&buf, res, res.Display); err != nil {
		return errLine(num, []batchProblem{{Message: err.Error()}})
	}
	l.out = buf.Bytes()
	if len(l.out) == 0 || l.out[len(l.out)-1] != '\n' {
		l.out = append(l.out, '\n')
	}
	l.fail = (res.Design != nil && !res.Design.Pass) || !res.ServiceabilityPass()
	return l
}

func errLine(num int, ps []batchProblem) batchLine {
	msgs := make([]string, len(ps))
	for i, p := range ps {
		msgs[i] = p.Message
		if p.Path != "" {
			msgs[i] = p.Path + ": " + p.Message
		}
	}
	v := struct {
		Line     int            `json:"line"`
		Error    string         `json:"error"`
		Problems []batchProblem `json:"problems"`
	}{num, strings.Join(msgs, "; "), ps}
	b, err := json.Marshal(v)
	if err != nil {
		b = []byte(fmt.Sprintf(`{"line":%d,"error":"unprintable error"}`, num))
	}
	return batchLine{out: append(b, '\n'), bad: true}
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
