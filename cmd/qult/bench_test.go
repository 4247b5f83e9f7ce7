package main

// Sources: none needed; the benchmarks run the example calc files of
// examples/ (invented numbers) and check nothing but speed.

import (
	"io"
	"testing"
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
