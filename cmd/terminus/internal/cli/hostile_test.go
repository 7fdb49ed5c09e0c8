package cli

import (
	"fmt"
	"io"
	"os"
	"os/exec"
	"path/filepath"
	"strings"
	"syscall"
	"testing"
)

// chainCase writes a case of n events, each at least a day after the one
// before, a finding on the first and a record on the last: every bound's
// chain of evidence runs the length of the order (after the hostile
// inputs chain-1000-events.yaml and chain-2000-events.yaml of
// constraint/testdata/hostile).
func chainCase(t testing.TB, n int) string {
	var b strings.Builder
	b.WriteString("title: a long order of events\nplace: NL\nevents:\n  - id: e0\n")
	for i := 1; i < n; i++ {
		fmt.Fprintf(&b, "  - id: e%d\n    after: [{event: e%d, at_least: P1D}]\n", i, i-1)
	}
	fmt.Fprintf(&b, "findings:\n  - material: chrome yellow\n    event: e0\nrecords:\n  - event: e%d\n    not_after: \"2000\"\nclaims:\n  - date: \"1847\"\n    event: e0\n", n-1)
	p := filepath.Join(t.TempDir(), fmt.Sprintf("chain-%d.yaml", n))
	if err := os.WriteFile(p, []byte(b.String()), 0o644); err != nil {
		t.Fatal(err)
	}
	return p
}

// The report of a long order of events grows linearly with its length in
// every format: the chains behind the bounds are shared and written as
// their ends (text, Markdown, HTML, the picture) or as a reference to the
// bound they continue (JSON). Doubling the events at most a little more
// than doubles the bytes; the chains copied per event once made it four
// times (hundreds of megabytes for two thousand events).
func TestLongOrdersGrowLinearly(t *testing.T) {
	small, large := chainCase(t, 500), chainCase(t, 1000)
	for _, format := range []string{"text", "md", "json", "html", "svg", "jsonld"} {
		t.Run(format, func(t *testing.T) {
			a, errA, codeA := execute(t, "check", "--format", format, small)
			b, errB, codeB := execute(t, "check", "--format", format, large)
			if codeA == 2 || codeB == 2 {
				t.Fatalf("exit %d %d: %s %s", codeA, codeB, errA, errB)
			}
			if ratio := float64(len(b)) / float64(len(a)); ratio > 2.2 {
				t.Errorf("%d bytes for 500 events, %d for 1000: %.2f times, want linear growth", len(a), len(b), ratio)
			}
		})
	}
}

// A case of 10,000 ordered events is checked in every format within the
// memory a survey promises, 256 MiB: each format runs in a process of its
// own (this test binary, started again) and the kernel's count of its peak
// resident memory is held to it. Without check's soft memory limit the
// collector let the heap grow to twice the live report (HTML and JSON-LD
// peaked near 290 MB).
func TestLongOrderPeakMemory(t *testing.T) {
	if args := os.Getenv("TERMINUS_TEST_CHILD"); args != "" {
		os.Exit(Main(t.Context(), strings.Fields(args), os.Stdin, os.Stdout, os.Stderr))
	}
	if testing.Short() {
		t.Skip("checks a case of 10,000 events in six processes")
	}
	p := chainCase(t, 10000)
	const limit = 256 << 20
	for _, format := range []string{"text", "md", "json", "html", "svg", "jsonld"} {
		t.Run(format, func(t *testing.T) {
			t.Parallel()
			cmd := exec.Command(os.Args[0], "-test.run=^TestLongOrderPeakMemory$")
			cmd.Env = append(withoutGCSettings(os.Environ()), "TERMINUS_TEST_CHILD=check --format "+format+" "+p)
			var count countingWriter
			cmd.Stdout = &count
			var errw strings.Builder
			cmd.Stderr = &errw
			if err := cmd.Run(); err != nil && cmd.ProcessState.ExitCode() != 1 {
				t.Fatalf("%v: %s", err, errw.String())
			}
			if count < 1<<20 {
				t.Fatalf("%d bytes of report, want the whole report", count)
			}
			usage, ok := cmd.ProcessState.SysUsage().(*syscall.Rusage)
			if !ok {
				t.Skip("no resource usage on this system")
			}
			if peak := usage.Maxrss << 10; peak > limit { // Maxrss is in KiB on Linux
				t.Errorf("peak resident memory %d MiB for %d bytes of report, want at most %d MiB", peak>>20, count, limit>>20)
			} else {
				t.Logf("peak resident memory %d MiB, %d MB of report", peak>>20, count/1e6)
			}
		})
	}
}

// withoutGCSettings drops GOGC and GOMEMLIMIT from an environment, so that
// the command's own settings apply.
func withoutGCSettings(env []string) []string {
	var out []string
	for _, kv := range env {
		if !strings.HasPrefix(kv, "GOGC=") && !strings.HasPrefix(kv, "GOMEMLIMIT=") {
			out = append(out, kv)
		}
	}
	return out
}

// countingWriter counts the bytes written to it and keeps none.
type countingWriter int64

func (c *countingWriter) Write(p []byte) (int, error) {
	*c += countingWriter(len(p))
	return len(p), nil
}

var _ io.Writer = (*countingWriter)(nil)

// BenchmarkLongOrder checks a case of 10,000 ordered events in each
// format: seconds, not hours.
func BenchmarkLongOrder(b *testing.B) {
	benchOrder(b, chainCase(b, 10000))
}

// BenchmarkHostileOrder checks the hostile chain of 2,000 events in each
// format: each under a second and 256 MiB.
func BenchmarkHostileOrder(b *testing.B) {
	benchOrder(b, "../../../../constraint/testdata/hostile/chain-2000-events.yaml")
}

func benchOrder(b *testing.B, p string) {
	for _, format := range []string{"text", "md", "json", "html", "svg", "jsonld"} {
		b.Run(format, func(b *testing.B) {
			b.ReportAllocs()
			for b.Loop() {
				var out, errw strings.Builder
				if code := Main(b.Context(), []string{"check", "--format", format, p}, strings.NewReader(""), &out, &errw); code == 2 {
					b.Fatal(errw.String())
				}
			}
		})
	}
}
