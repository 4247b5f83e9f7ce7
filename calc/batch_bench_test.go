package calc_test

// Sources: none needed; the benchmark runs the example calc files of
// examples/ (invented numbers) and checks nothing but speed.

import (
	"bytes"
	"context"
	"encoding/json"
	"os"
	"path/filepath"
	"runtime/debug"
	"testing"

	"github.com/qultgeo/qult/calc"
	"go.yaml.in/yaml/v3"
)

// benchLines returns n calc lines: the three examples the command's goldens
// run on (a bored pile, a driven pipe pile, an H-pile in US units), as
// JSON, in turn.
func benchLines(b *testing.B, n int) []byte {
	b.Helper()
	var lines [][]byte
	for _, ex := range []string{"pump-station-bored", "river-jetty-pipe", "abutment-hpile-us"} {
		data, err := os.ReadFile(filepath.Join("..", "examples", ex+".yaml"))
		if err != nil {
			b.Fatal(err)
		}
		var v map[string]any
		if err := yaml.Unmarshal(data, &v); err != nil {
			b.Fatal(err)
		}
		j, err := json.Marshal(v)
		if err != nil {
			b.Fatal(err)
		}
		lines = append(lines, j)
	}
	var in bytes.Buffer
	for i := range n {
		in.Write(lines[i%len(lines)])
		in.WriteByte('\n')
	}
	return in.Bytes()
}

// BenchmarkBatch runs 1,000 calc lines through RunBatch with one worker
// per CPU and reports calculations per second: full results, results
// without capacity with depth (Lean), and full results with the
// collector's target at 400 % (as qult batch sets it; see RunBatch).
func BenchmarkBatch(b *testing.B) {
	const n = 1000
	in := benchLines(b, n)
	for _, c := range []struct {
		name string
		o    calc.BatchOptions
		gogc int
	}{{"full", calc.BatchOptions{}, 0}, {"lean", calc.BatchOptions{Lean: true}, 0}, {"full-gogc400", calc.BatchOptions{}, 400},
		{"lean-gogc400", calc.BatchOptions{Lean: true}, 400}} {
		b.Run(c.name, func(b *testing.B) {
			if c.gogc > 0 {
				defer debug.SetGCPercent(debug.SetGCPercent(c.gogc))
			}
			b.ReportAllocs()
			cpu0 := cpuTime()
			for b.Loop() {
				got := 0
				err := calc.RunBatch(context.Background(), bytes.NewReader(in), c.o, func(it calc.BatchItem) error {
					if it.Err != nil {
						b.Fatalf("line %d: %v", it.Line, it.Err)
					}
					got++
					return nil
				})
				if err != nil || got != n {
					b.Fatalf("%d answers, err %v", got, err)
				}
			}
			b.ReportMetric(float64(n*b.N)/b.Elapsed().Seconds(), "calcs/s")
			if cpu := cpuTime() - cpu0; cpu > 0 {
				b.ReportMetric(cpu.Seconds()*1e6/float64(n*b.N), "cpu-µs/calc")
			}
		})
	}
}
