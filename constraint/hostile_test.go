package constraint_test

import (
	"context"
	"fmt"
	"os"
	"slices"
	"strings"
	"testing"

	"terminus/constraint"
	"terminus/constraint/casefile"
	"terminus/constraint/input"
	"terminus/constraint/network"
	"terminus/materials"
)

// analyzeFile analyses a case file of testdata against the built-in
// dataset.
func analyzeFile(tb testing.TB, path string) *constraint.Result {
	tb.Helper()
	data, err := os.ReadFile(path)
	if err != nil {
		tb.Fatal(err)
	}
	c, err := casefile.Parse(path, data, input.YAML, input.Limits{})
	if err != nil {
		tb.Fatal(err)
	}
	ds, err := materials.Builtin()
	if err != nil {
		tb.Fatal(err)
	}
	res, err := constraint.Analyze(context.Background(), c, ds, constraint.Options{})
	if err != nil {
		tb.Fatal(err)
	}
	return res
}

// TestHostileRecordsEnd analyses forty records, each one of two hundred
// years, the even and the odd years in turn: four hundred conflicts of
// two, whose cheapest correction once took a search that never ended. The
// analysis ends with the list of conflicts marked incomplete and the
// cheapest correction: the twenty odd records at each inconsistent tier
// (as costly as the even ones, and "record-1" sorts first). The work it
// takes is counted by TestRecordsOneOfEnds in the network package.
func TestHostileRecordsEnd(t *testing.T) {
	res := analyzeFile(t, "testdata/hostile/records-40-oneof-200.yaml")
	var odd []string
	for i := 1; i <= 39; i += 2 {
		odd = append(odd, fmt.Sprintf("record-%d", i))
	}
	slices.Sort(odd)
	if res.Consistent[network.Firm] || res.ConflictsComplete[network.Firm] {
		t.Errorf("firm tier: consistent %v, conflicts complete %v; want inconsistent, incomplete", res.Consistent[network.Firm], res.ConflictsComplete[network.Firm])
	}
	if len(res.Corrections) == 0 {
		t.Fatal("no correction")
	}
	for _, c := range res.Corrections {
		if !slices.Equal(c.Evidence, odd) {
			t.Errorf("%s tier: correction %v, want the odd records", c.Tier, c.Evidence)
		}
	}
	for _, n := range res.Notes {
		if strings.Contains(n, "work budget") {
			t.Errorf("note %q: the budget should not run out here", n)
		}
	}
}

// BenchmarkHostileRecords is the analysis of TestHostileRecordsEnd: it
// must take under a second and allocate under 256 MiB in all.
func BenchmarkHostileRecords(b *testing.B) {
	b.ReportAllocs()
	for b.Loop() {
		analyzeFile(b, "testdata/hostile/records-40-oneof-200.yaml")
	}
}

// TestHostileChainsShare reads the hostile orders of 1,000 and 2,000
// events: each bound's chain runs the length of the order, and the chains
// of successive events share their storage (as the solver's paths do, in
// arrays that double as they grow), so that all the chains of an order of
// n events hold a few times n steps, not n²/2. (The bytes written per
// format are held to linear growth by TestLongOrdersGrowLinearly in the
// command's tests.)
func TestHostileChainsShare(t *testing.T) {
	for _, n := range []int{1000, 2000} {
		res := analyzeFile(t, fmt.Sprintf("testdata/hostile/chain-%d-events.yaml", n))
		last := res.Events[n-1].Windows[network.Hard].Earliest
		if len(last.Chain) != n || last.From != fmt.Sprintf("e%d", n-2) || last.Own != n-1 {
			t.Fatalf("%d events: last chain %d steps from %q own %d", n, len(last.Chain), last.From, last.Own)
		}
		held := map[*constraint.Step]int{} // each backing array once, by its first step
		steps := 0
		for _, e := range res.Events {
			for _, w := range e.Windows {
				if w == nil {
					continue
				}
				for _, b := range []constraint.Bound{w.Earliest, w.Latest} {
					steps += len(b.Chain)
					if len(b.Chain) > 0 {
						held[&b.Chain[0]] = max(held[&b.Chain[0]], cap(b.Chain))
					}
				}
			}
		}
		total := 0
		for _, c := range held {
			total += c
		}
		// Three tiers, two sides: the chains show about 3n² steps; the
		// arrays behind them hold each chain once, in arrays that at most
		// double: under 4n steps a chain, 24n in all.
		if total > 24*n {
			t.Errorf("%d events: %d steps shown, %d held in storage; want linear", n, steps, total)
		}
	}
}

// BenchmarkHostileChain analyses the order of 2,000 events.
func BenchmarkHostileChain(b *testing.B) {
	b.ReportAllocs()
	for b.Loop() {
		analyzeFile(b, "testdata/hostile/chain-2000-events.yaml")
	}
}
