package cli

import (
	"fmt"
	"os"
	"path/filepath"
	"strings"
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
