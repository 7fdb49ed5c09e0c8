package cli

import (
	"os"
	"runtime/debug"
)

// The garbage collector's settings of the commands that may hold much in
// memory; the help texts quote them.
const (
	// A survey's live heap is small and bounded (the reorder window), so
	// the default target of 100 % makes the collector run every few
	// hundred records: at 1000 % it takes about a third less CPU time. A
	// soft limit of 64 MiB keeps the peak flat however long the input:
	// the live heap stays near 10 MiB, so the limit is never tight enough
	// to make the collector thrash.
	surveyGCPercent      = 1000
	surveyMemoryLimitMiB = 64

	// check keeps its reports in memory until all are computed (bad input
	// leaves stdout empty). For an order of 10,000 events the live heap
	// ends near 120 MiB (the result, the HTML page's view and its 60 MB
	// of output); at the default target the heap may grow to twice that
	// before the collector runs, past 256 MiB. A soft limit of 192 MiB
	// holds the peak under 256 MiB without the collector thrashing; an
	// ordinary case stays far below it and never feels it.
	checkGCPercent      = 100
	checkMemoryLimitMiB = 192
)

// tuneGC sets the garbage collector's target (in per cent) and soft memory
// limit (in MiB) for a command, unless the user set GOGC or GOMEMLIMIT,
// and returns the function that puts the old settings back.
func tuneGC(percent int, limitMiB int64) func() {
	if os.Getenv("GOGC") != "" || os.Getenv("GOMEMLIMIT") != "" {
		return func() {}
	}
	oldPercent := debug.SetGCPercent(percent)
	oldLimit := debug.SetMemoryLimit(limitMiB << 20)
	return func() {
		debug.SetGCPercent(oldPercent)
		debug.SetMemoryLimit(oldLimit)
	}
}
