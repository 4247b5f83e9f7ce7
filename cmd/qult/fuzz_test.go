package main

// Sources: none; fuzz seeds are invented inputs.

import (
	"bufio"
	"bytes"
	"encoding/json"
	"testing"

	"github.com/qultgeo/qult/units"
)

// FuzzBatch feeds arbitrary bytes to batch: no panic, and one JSON object
// out for every non-blank line in, in order.
func FuzzBatch(f *testing.F) {
	f.Add([]byte(`{"title":"t","ground":{"water_depth":"none","layers":[{"name":"s","thickness":"10 m","drainage":"drained","unit_weight":18,"friction_angle":30}]},"pile":{"section":{"shape":"circle","diameter":"0.5 m"},"length":"8 m","installation":"bored"}}` + "\n"))
	f.Add([]byte("\n\n{}\nnot json\n\xef\xbb\xbf{\"title\": 1}\n"))
	f.Add([]byte("{\"a\":[[[[[[[[[[[[[[[[[[[[1]]]]]]]]]]]]]]]]]]]}\r\n"))
	f.Fuzz(func(t *testing.T, in []byte) {
		var out bytes.Buffer
		bw := bufio.NewWriter(&out)
		if _, _, err := batch(bytes.NewReader(in), bw, batchSettings{sys: units.SI, workers: 2}); err != nil {
			return // a read error of the input is reported, not a panic
		}
		bw.Flush()
		want := 0
		sc := bufio.NewScanner(bytes.NewReader(in))
		sc.Buffer(make([]byte, 0, 64<<10), 4<<20)
		for n := 1; sc.Scan(); n++ {
			l := sc.Bytes()
			if n == 1 { // a byte-order mark is skipped at the start of the input only
				l = bytes.TrimPrefix(l, []byte("\xef\xbb\xbf"))
			}
			if len(bytes.TrimSpace(l)) > 0 {
				want++
			}
		}
		if sc.Err() != nil {
			return // lines longer than the scanner takes: not this property's concern
		}
		lines := bytes.Split(bytes.TrimRight(out.Bytes(), "\n"), []byte("\n"))
		if out.Len() == 0 {
			lines = nil
		}
		if len(lines) != want {
			t.Fatalf("%d lines out for %d non-blank lines in", len(lines), want)
		}
		for _, l := range lines {
			var m map[string]any
			if err := json.Unmarshal(l, &m); err != nil {
				t.Fatalf("output line is not JSON: %v: %.200s", err, l)
			}
		}
	})
}
