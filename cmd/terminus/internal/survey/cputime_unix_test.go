//go:build unix

package survey

import (
	"syscall"
	"time"
)

// cpuTime is the process's user and system CPU time so far: on a shared
// machine it measures the work, where wall time measures the neighbours.
func cpuTime() time.Duration {
	var ru syscall.Rusage
	if err := syscall.Getrusage(syscall.RUSAGE_SELF, &ru); err != nil {
		return 0
	}
	return time.Duration(ru.Utime.Nano() + ru.Stime.Nano())
}
