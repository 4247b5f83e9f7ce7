package calc

import (
	"bufio"
	"bytes"
	"context"
	"fmt"
	"io"
	"runtime"
	"sync"

	"go.yaml.in/yaml/v3"
)

// BatchOptions set how RunBatch works. The zero value runs GOMAXPROCS
// workers with a window of four items per worker.
type BatchOptions struct {
	// Workers is the number of calculations run at once; 0 means
	// runtime.GOMAXPROCS(0). Negative is an error.
	Workers int
	// Window is the most items read ahead of the one being delivered
	// (read, running or waiting for their turn); 0 means 4 × Workers.
	// Memory is bounded by the window, not by the length of the input.
	// Negative is an error.
	Window int
	// Lean leaves capacity with depth (Result.WithDepth and
	// DesignWithDepth) and the methods compared (Result.Compared)
	// uncomputed, for callers that do not show them: the table is the
	// largest part of most results and the comparison the largest part of
	// their cost.
	Lean bool
	// Finish, when set, is called once for every item, in the worker that
	// ran it and before the item is delivered, so that work on the result
	// (such as rendering it) runs in parallel too. It may set the item's
	// Out, or drop its Result once Out holds what is needed. It must be
	// safe to call from several goroutines at once.
	Finish func(*BatchItem)
}

// BatchItem is the answer for one non-blank line of a batch.
type BatchItem struct {
	// Line is the line number in the input, from 1.
	Line int
	// ID is the calc file's id key, or its title when it has no id; for a
	// line that could not be read as a calc file, whichever of the two
	// could still be read ("" when none).
	ID string
	// Result is the calculation; nil when Err is set.
	Result *Result
	// Err is the line's problem: Problems for bad input (each with its
	// field path and its line within the calc file, which is 1 for a
	// calc file on one line). A bad line is an answer, not a stop.
	Err error
	// Out is set by BatchOptions.Finish, if at all.
	Out []byte
}

// RunBatch runs a stream of calc files, one JSON object per line (JSON
// Lines), and calls emit with each answer in input order. Blank lines are
// skipped; a byte-order mark at the start of the input is ignored; a line
// over MaxFileSize bytes, a line that is not a JSON object, and a calc
// file with problems each give an item with Err set, and the batch goes
// on. The lines run on o.Workers goroutines with at most o.Window items
// in flight, so a long input streams in bounded memory.
//
// RunBatch returns nil at the end of the input; the first error of emit
// (which stops the batch); a read error of in; ctx.Err() when ctx is
// cancelled (it stops reading, and answers not yet delivered are dropped);
// or an error for negative options. Before it returns, its goroutines
// have stopped; a Read on in that blocks is not interrupted by ctx.
//
// Throughput: each calculation allocates a few hundred kB that die young
// while the live heap stays small, so with Go's default GOGC the
// collector runs every few calculations and its pauses take much of the
// gain of more workers. A program that runs large batches gains from a
// higher target (debug.SetGCPercent(400), as qult batch sets, or GOGC);
// RunBatch leaves that process-wide setting to its caller.
func RunBatch(ctx context.Context, in io.Reader, o BatchOptions, emit func(BatchItem) error) error {
	if o.Workers < 0 {
		return fmt.Errorf("calc: batch workers %d: want 0 (one per CPU) or more", o.Workers)
	}
	if o.Window < 0 {
		return fmt.Errorf("calc: batch window %d: want 0 (4 per worker) or more", o.Window)
	}
	n := o.Workers
	if n == 0 {
		n = runtime.GOMAXPROCS(0)
	}
	window := o.Window
	if window == 0 {
		window = 4 * n
	}
	ctx, stop := context.WithCancel(ctx)
	defer stop()

	type job struct {
		line int
		data []byte
		long bool
		res  chan BatchItem
	}
	jobs := make(chan job)
	// order holds each item's answer slot in input order; its capacity
	// (with the job being handed over) bounds the items in flight.
	order := make(chan chan BatchItem, max(window-1, 0))
	var wg sync.WaitGroup
	for range n {
		wg.Add(1)
		go func() {
			defer wg.Done()
			for j := range jobs {
				it := batchOne(j.line, j.data, j.long, runOptions{lean: o.Lean})
				if o.Finish != nil {
					finish(o.Finish, &it)
				}
				j.res <- it // buffered: never blocks
			}
		}()
	}

	// The reader: lines to jobs, slots to order, until the end, an error
	// or cancellation.
	var rerr error
	readDone := make(chan struct{})
	go func() {
		defer close(readDone)
		defer close(order)
		defer close(jobs)
		br := bufio.NewReaderSize(in, 64<<10)
		for line := 1; ; line++ {
			if ctx.Err() != nil {
				rerr = ctx.Err()
				return
			}
			data, long, err := readLine(br, MaxFileSize)
			if line == 1 {
				data = bytes.TrimPrefix(data, []byte("\xef\xbb\xbf"))
			}
			if len(bytes.TrimSpace(data)) > 0 || long {
				slot := make(chan BatchItem, 1)
				select {
				case order <- slot:
				case <-ctx.Done():
					rerr = ctx.Err()
					return
				}
				select {
				case jobs <- job{line, data, long, slot}:
				case <-ctx.Done():
					// The slot is in order but has no job: the
					// deliverer stops on ctx too.
					rerr = ctx.Err()
					return
				}
			}
			if err == io.EOF {
				return
			}
			if err != nil {
				rerr = err
				return
			}
		}
	}()

	// The deliverer: this goroutine, in input order.
	var err error
deliver:
	for slot := range order {
		select {
		case it := <-slot:
			if err = emit(it); err != nil {
				break deliver
			}
		case <-ctx.Done():
			err = ctx.Err()
			break deliver
		}
	}
	stop()
	// Drain so that the reader, blocked on a full order, sees the stop.
	for range order {
	}
	<-readDone
	wg.Wait()
	if err != nil {
		return err
	}
	return rerr
}

// finish calls f on it, turning a panic into the item's error.
func finish(f func(*BatchItem), it *BatchItem) {
	defer func() {
		if p := recover(); p != nil {
			it.Result, it.Out = nil, nil
			it.Err = fmt.Errorf("calc: batch finish: internal error: %v", p)
		}
	}()
	f(it)
}

// readLine reads one line of at most limit bytes without its line break;
// a longer line is consumed and reported as long, with its data dropped.
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

// batchOne runs one line; a panic becomes the item's error.
func batchOne(line int, data []byte, long bool, ro runOptions) (it BatchItem) {
	it.Line = line
	defer func() {
		if p := recover(); p != nil {
			it.Result = nil
			it.Err = Problems{{Msg: fmt.Sprintf("internal error: %v", p)}}
		}
	}()
	if long {
		it.Err = Problems{{Msg: fmt.Sprintf("line is over the limit of %d bytes (1 MiB)", MaxFileSize)}}
		return it
	}
	t := bytes.TrimSpace(data)
	if len(t) == 0 || t[0] != '{' {
		it.Err = Problems{{Msg: "want one calc file as a JSON object ({...}) on each line"}}
		return it
	}
	f, err := Decode(data)
	if err != nil {
		it.Err = err
		it.ID = idOf(data)
		return it
	}
	it.ID = f.ID
	if it.ID == "" {
		it.ID = f.Title
	}
	r, err := run(f, ro)
	if err != nil {
		it.Err = err
		return it
	}
	r.Source = data
	it.Result = r
	return it
}

// idOf reads the top-level id, else title, of a calc file that did not
// decode, when the file is still a mapping whose id or title is text.
func idOf(data []byte) string {
	root, ok := jsonTree(data)
	if !ok {
		var err error
		if root, err = yamlTree(data); err != nil {
			return ""
		}
	}
	if root.Kind != yaml.MappingNode {
		return ""
	}
	var id, title string
	for i := 0; i+1 < len(root.Content); i += 2 {
		k, v := root.Content[i], root.Content[i+1]
		if v.Kind != yaml.ScalarNode || v.Tag == "!!null" {
			continue
		}
		switch k.Value {
		case "id":
			id = v.Value
		case "title":
			title = v.Value
		}
	}
	if id != "" {
		return id
	}
	return title
}
