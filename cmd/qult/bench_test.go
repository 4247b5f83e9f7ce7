package main

// Sources: none needed; the benchmarks run the example calc files of
// examples/ (invented numbers) and check nothing but speed.

import (
	"bytes"
	"encoding/json"
	"io"
	"os"
	"testing"

	"go.yaml.in/yaml/v3"
)

// BenchmarkCapacity is one in-process qult capacity run on the pump-station
// example: read, decode, validate, run, render text.
func BenchmarkCapacity(b *testing.B) {
	args := []string{"capacity", examplePath("pump-station-bored")}
	b.ReportAllocs()
	for b.Loop() {
		if code := run(io.Discard, io.Discard, args); code != 0 {
			b.Fatalf("exit %d", code)
		}
	}
}

// BenchmarkReportHTML is one qult report --format html run.
func BenchmarkReportHTML(b *testing.B) {
	args := []string{"report", "--format", "html", examplePath("pump-station-bored")}
	b.ReportAllocs()
	for b.Loop() {
		if code := run(io.Discard, io.Discard, args); code != 0 {
			b.Fatalf("exit %d", code)
		}
	}
}

// BenchmarkBatchJSON is qult batch end to end on 1,000 calc lines (the
// three golden examples in turn, as JSON): read, decode, run, write each
// result as a JSON line, with one worker per CPU; with --lean too.
func BenchmarkBatchJSON(b *testing.B) {
	const n = 1000
	var lines [][]byte
	for _, ex := range examples {
		data, err := os.ReadFile(examplePath(ex))
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
	defer func() { stdin = os.Stdin }()
	for _, c := range []struct {
		name string
		args []string
	}{{"full", []string{"batch"}}, {"lean", []string{"batch", "--lean"}}} {
		b.Run(c.name, func(b *testing.B) {
			b.ReportAllocs()
			cpu0 := cpuTime()
			for b.Loop() {
				stdin = bytes.NewReader(in.Bytes())
				if code := run(io.Discard, io.Discard, c.args); code != 0 {
					b.Fatalf("exit %d", code)
				}
			}
			b.ReportMetric(float64(n*b.N)/b.Elapsed().Seconds(), "calcs/s")
			if cpu := cpuTime() - cpu0; cpu > 0 {
				b.ReportMetric(cpu.Seconds()*1e6/float64(n*b.N), "cpu-µs/calc")
			}
		})
	}
}
