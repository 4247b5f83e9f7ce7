//go:build unix

package calc_test

import (
	"syscall"
	"time"
)

// cpuTime is the processor time (user and system) the process has used,
// for benchmarks on a machine shared with other work, where wall time
// varies with the load and processor time much less.
func cpuTime() time.Duration {
	var ru syscall.Rusage
	if err := syscall.Getrusage(syscall.RUSAGE_SELF, &ru); err != nil {
		return 0
	}
	return time.Duration(ru.Utime.Nano() + ru.Stime.Nano())
}
