package calc_test

// Sources: none needed. The calc files are invented scenarios; each batch
// answer is checked against calc.Parse of the same line (the oracle), and
// the order, line numbers, identifiers, cancellation and memory bounds
// against what the input was built to hold.

import (
	"context"
	"errors"
	"fmt"
	"io"
	"reflect"
	"strings"
	"sync/atomic"
	"testing"

	"github.com/qultgeo/qult/calc"
)

// pileLine is one calc file on one line: a bored pile of the given length
// in a two-layer profile (invented numbers).
func pileLine(id, title string, length float64) string {
	idKey := ""
	if id != "" {
		idKey = fmt.Sprintf(`"id":%q,`, id)
	}
	return fmt.Sprintf(`{%s"title":%q,"ground":{"water_depth":"2 m","layers":[`+
		`{"name":"clay","thickness":"6 m","drainage":"undrained","saturated_unit_weight":"18 kN/m3","undrained_strength":"40 kPa"},`+
		`{"name":"sand","thickness":"20 m","drainage":"drained","saturated_unit_weight":"20 kN/m3","friction_angle":"34 deg"}]},`+
		`"pile":{"section":{"shape":"circle","diameter":"600 mm"},"length":"%g m","installation":"bored"},`+
		`"design":{"basis":"safety-factor","factor":2.5},"loads":{"compression":{"permanent":"600 kN","variable":"300 kN"}}}`, idKey, title, length)
}

// batchInput is good lines with an id, good lines with a title only, and
// bad lines of every kind, with blank lines among them.
func batchInput() (string, []string) {
	lines := []string{
		pileLine("P1", "pile one", 10),
		pileLine("", "title only", 12),
		"",
		`{"id":"bad-1","title":"unknown key","grund":1}`,
		"   ",
		`not json at all`,
		pileLine("P4", "pile four", 14),
		`["a list"]`,
		`{"id":"bad-2","ground":{"layers":[]},"pile":{"section":{"shape":"circle","diameter":"0.5 m"},"length":"8 m","installation":"bored"}}`,
		pileLine("P6", "pile six", 16),
	}
	return strings.Join(lines, "\n") + "\n", lines
}

func collect(t *testing.T, in string, o calc.BatchOptions) []calc.BatchItem {
	t.Helper()
	var items []calc.BatchItem
	err := calc.RunBatch(context.Background(), strings.NewReader(in), o, func(it calc.BatchItem) error {
		items = append(items, it)
		return nil
	})
	if err != nil {
		t.Fatalf("RunBatch: %v", err)
	}
	return items
}

// TestRunBatch: one item per non-blank line, in input order, with its line
// number and id (else title), the same whatever the workers and window;
// good lines give the result calc.Parse gives; bad lines are items.
func TestRunBatch(t *testing.T) {
	in, lines := batchInput()
	want := []struct {
		line int
		id   string
		bad  bool
	}{{1, "P1", false}, {2, "title only", false}, {4, "bad-1", true}, {6, "", true}, {7, "P4", false},
		{8, "", true}, {9, "bad-2", true}, {10, "P6", false}}
	var first []calc.BatchItem
	for _, o := range []calc.BatchOptions{{Workers: 1}, {Workers: 8}, {Workers: 3, Window: 1}, {}} {
		items := collect(t, in, o)
		if len(items) != len(want) {
			t.Fatalf("%+v: %d items, want %d", o, len(items), len(want))
		}
		for i, it := range items {
			w := want[i]
			if it.Line != w.line || it.ID != w.id || (it.Err != nil) != w.bad || (it.Result == nil) != w.bad {
				t.Errorf("%+v: item %d: line %d id %q err %v, want line %d id %q bad %v", o, i, it.Line, it.ID, it.Err, w.line, w.id, w.bad)
				continue
			}
			r, err := calc.Parse([]byte(lines[w.line-1]))
			if w.bad {
				if strings.HasPrefix(lines[w.line-1], "{") && !reflect.DeepEqual(it.Err, err) {
					t.Errorf("item %d: error %v, want Parse's %v", i, it.Err, err)
				}
				continue
			}
			if err != nil {
				t.Fatal(err)
			}
			if it.Result.Breakdown.Capacity != r.Breakdown.Capacity || it.Result.Design.MaxUse() != r.Design.MaxUse() {
				t.Errorf("item %d: capacity %+v, want Parse's %+v", i, it.Result.Breakdown.Capacity, r.Breakdown.Capacity)
			}
			if it.Result.ID != it.ID && it.Result.Title != it.ID {
				t.Errorf("item %d: result id %q title %q, item id %q", i, it.Result.ID, it.Result.Title, it.ID)
			}
		}
		if first == nil {
			first = items
		} else {
			for i := range items {
				if items[i].Line != first[i].Line || items[i].ID != first[i].ID || fmt.Sprint(items[i].Err) != fmt.Sprint(first[i].Err) {
					t.Errorf("%+v: item %d differs from one worker's", o, i)
				}
			}
		}
	}
}

// TestRunBatchLimits: a line over the size limit and a byte-order mark.
func TestRunBatchLimits(t *testing.T) {
	good := pileLine("A", "a", 10)
	long := `{"title":"` + strings.Repeat("x", calc.MaxFileSize) + `"}`
	items := collect(t, "\ufeff"+good+"\n"+long+"\n"+good, calc.BatchOptions{Workers: 2})
	if len(items) != 3 || items[0].Err != nil || items[2].Err != nil {
		t.Fatalf("items %+v", items)
	}
	if items[1].Line != 2 || items[1].Err == nil || !strings.Contains(items[1].Err.Error(), "over the limit") {
		t.Errorf("long line: %+v", items[1])
	}
}

// TestRunBatchFinish: Finish runs for every item before it is delivered.
func TestRunBatchFinish(t *testing.T) {
	in, _ := batchInput()
	var calls atomic.Int32
	items := collect(t, in, calc.BatchOptions{Workers: 4, Finish: func(it *calc.BatchItem) {
		calls.Add(1)
		it.Out = fmt.Appendf(nil, "%d:%s", it.Line, it.ID)
		it.Result = nil
	}})
	for _, it := range items {
		if string(it.Out) != fmt.Sprintf("%d:%s", it.Line, it.ID) || it.Result != nil {
			t.Errorf("item %d: Out %q Result %v", it.Line, it.Out, it.Result != nil)
		}
	}
	if int(calls.Load()) != len(items) {
		t.Errorf("Finish called %d times for %d items", calls.Load(), len(items))
	}
}

// endless yields the same calc line forever, one line per Read, and
// counts the lines it has given.
type endless struct {
	line  []byte
	lines atomic.Int64
}

func (e *endless) Read(p []byte) (int, error) {
	if len(p) < len(e.line) {
		return 0, io.ErrShortBuffer
	}
	e.lines.Add(1)
	return copy(p, e.line), nil
}

// TestRunBatchStreams: an endless input streams in bounded memory (the
// reader is never more than the window ahead of delivery) and stops when
// the context is cancelled, returning its error.
func TestRunBatchStreams(t *testing.T) {
	src := &endless{line: []byte(pileLine("E", "endless", 10) + "\n")}
	ctx, cancel := context.WithCancel(context.Background())
	defer cancel()
	const window = 6
	delivered := 0
	err := calc.RunBatch(ctx, src, calc.BatchOptions{Workers: 2, Window: window}, func(it calc.BatchItem) error {
		delivered++
		if it.Line != delivered {
			t.Errorf("item %d has line %d", delivered, it.Line)
		}
		// Lines read: those delivered, at most the window in flight, and
		// the one the reader holds while it waits for room.
		if ahead := src.lines.Load() - int64(delivered); ahead > window+1 {
			t.Errorf("after %d items the reader has read %d lines ahead; window %d", delivered, ahead, window)
		}
		if delivered == 40 {
			cancel()
		}
		return nil
	})
	if !errors.Is(err, context.Canceled) {
		t.Errorf("err %v, want context.Canceled", err)
	}
	if delivered < 40 || delivered > 40+window {
		t.Errorf("%d items delivered after cancelling at 40", delivered)
	}
}

// TestRunBatchStops: an error from emit stops the batch and is returned;
// negative options are refused.
func TestRunBatchStops(t *testing.T) {
	src := &endless{line: []byte(pileLine("E", "endless", 10) + "\n")}
	stop := errors.New("disk full")
	n := 0
	err := calc.RunBatch(context.Background(), src, calc.BatchOptions{Workers: 2}, func(calc.BatchItem) error {
		n++
		if n == 5 {
			return stop
		}
		return nil
	})
	if !errors.Is(err, stop) || n != 5 {
		t.Errorf("err %v after %d items, want %v after 5", err, n, stop)
	}
	for _, o := range []calc.BatchOptions{{Workers: -1}, {Window: -2}} {
		err := calc.RunBatch(context.Background(), strings.NewReader(""), o, func(calc.BatchItem) error { return nil })
		if err == nil || !strings.Contains(err.Error(), "want 0") {
			t.Errorf("%+v: err %v, want a refusal naming the accepted range", o, err)
		}
	}
	// A context cancelled before the start reads nothing.
	ctx, cancel := context.WithCancel(context.Background())
	cancel()
	src = &endless{line: src.line}
	err = calc.RunBatch(ctx, src, calc.BatchOptions{}, func(calc.BatchItem) error { return nil })
	if !errors.Is(err, context.Canceled) || src.lines.Load() != 0 {
		t.Errorf("cancelled before the start: err %v, %d lines read", err, src.lines.Load())
	}
}

// TestRunBatchLean: Lean leaves capacity with depth and the methods
// compared out and changes nothing else of the result.
func TestRunBatchLean(t *testing.T) {
	in, _ := batchInput()
	full := collect(t, in, calc.BatchOptions{Workers: 2})
	lean := collect(t, in, calc.BatchOptions{Workers: 2, Lean: true})
	for i := range full {
		f, l := full[i].Result, lean[i].Result
		if f == nil {
			continue
		}
		if len(f.WithDepth) == 0 || len(l.WithDepth) != 0 || len(l.DesignWithDepth) != 0 {
			t.Errorf("line %d: %d rows with depth in full, %d and %d in lean", full[i].Line, len(f.WithDepth), len(l.WithDepth), len(l.DesignWithDepth))
		}
		if f.Compared == nil || l.Compared != nil {
			t.Errorf("line %d: methods compared %v in full, %v in lean", full[i].Line, f.Compared != nil, l.Compared != nil)
		}
		if f.Breakdown.Capacity != l.Breakdown.Capacity || !reflect.DeepEqual(f.Design, l.Design) || !reflect.DeepEqual(f.Length, l.Length) ||
			!reflect.DeepEqual(f.Warnings, l.Warnings) {
			t.Errorf("line %d: the lean result differs beyond capacity with depth", full[i].Line)
		}
	}
}
