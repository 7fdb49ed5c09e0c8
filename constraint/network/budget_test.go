package network

import (
	"context"
	"fmt"
	"math/rand/v2"
	"os"
	"slices"
	"strconv"
	"strings"
	"testing"
)

// recordsNetwork reads the case file of forty records, each one of two
// hundred years (the even years and the odd years in turn), and builds the
// network the reasoner builds from its records: one variable, and per
// record a firm one-of constraint (here in years, not days: the structure
// is the same).
func recordsNetwork(tb testing.TB) *Network {
	tb.Helper()
	data, err := os.ReadFile("../testdata/hostile/records-40-oneof-200.yaml")
	if err != nil {
		tb.Fatal(err)
	}
	n := New()
	x := n.AddVar("object")
	for line := range strings.Lines(string(data)) {
		list, ok := strings.CutPrefix(strings.TrimSpace(line), `- on: "[`)
		if !ok {
			continue
		}
		var alts []Alt
		for _, f := range strings.Split(strings.TrimSuffix(list, `]"`), ",") {
			y, err := strconv.ParseInt(f, 10, 64)
			if err != nil {
				tb.Fatalf("record %d: %v", n.NumConstraints()+1, err)
			}
			alts = append(alts, Alt{Zero, x, y, y})
		}
		mustAdd(n, Constraint{ID: fmt.Sprintf("record-%d", n.NumConstraints()+1), Tier: Firm, Alts: alts})
	}
	if n.NumConstraints() != 40 {
		tb.Fatalf("read %d records, want 40", n.NumConstraints())
	}
	return n
}

// TestRecordsOneOfEnds explains the forty records: every even record
// conflicts with every odd one (400 conflicts of two), so the list is
// capped and marked incomplete, and the cheapest correction sets aside
// one parity, twenty firm records. Once the search for it tried every
// order of the same twenty records and never ended; the work it takes now
// is counted in nodes, and held well under the budget.
func TestRecordsOneOfEnds(t *testing.T) {
	n := recordsNetwork(t)
	r, err := n.Solve(context.Background(), Firm, Options{})
	if err != nil {
		t.Fatal(err)
	}
	if r.Consistent || r.ConflictsComplete || len(r.Conflicts) != 10 {
		t.Fatalf("consistent %v, %d conflicts, complete %v; want inconsistent, 10 conflicts, incomplete", r.Consistent, len(r.Conflicts), r.ConflictsComplete)
	}
	for _, k := range r.Conflicts {
		if len(k) != 2 || k[0]%2 == k[1]%2 {
			t.Errorf("conflict %v, want an even and an odd record", n.IDs(k))
		}
	}
	// The odd records, record-1 ... record-39, cost as much as the even
	// ones, and their ids sort first ("record-1" < "record-10").
	var odd []string
	for i := 1; i <= 39; i += 2 {
		odd = append(odd, fmt.Sprintf("record-%d", i))
	}
	slices.Sort(odd)
	if got := n.IDs(r.Correction); !slices.Equal(got, odd) || r.BudgetSpent {
		t.Errorf("correction %v (budget spent %v), want the odd records %v", got, r.BudgetSpent, odd)
	}
	const most = 50_000 // it takes 32,144 (229 conflicts found on the way), far below DefaultMaxWork
	if r.Work > most {
		t.Errorf("the explanation took %d units of work, want at most %d", r.Work, most)
	}
	t.Logf("%d units of work", r.Work)
}

// oneOfNetwork has n unary one-of constraints on one variable, each
// allowing half of the values 1..u at random: every value is ruled out by
// some constraint, so the network is inconsistent, and its conflicts are
// the sets of constraints with no value in common, too many to list. The
// cheapest correction keeps the constraints that allow the value most of
// them allow, which the test computes by counting.
func oneOfNetwork(seed uint64, n, u int) (*Network, int) {
	rng := rand.New(rand.NewPCG(seed, 5))
	net := New()
	x := net.AddVar("x")
	allow := make([]int, u+1)
	for i := range n {
		var alts []Alt
		for _, v := range rng.Perm(u)[:u/2] {
			alts = append(alts, Alt{Zero, x, int64(v + 1), int64(v + 1)})
			allow[v+1]++
		}
		mustAdd(net, Constraint{ID: fmt.Sprintf("c%02d", i), Tier: Soft, Alts: alts})
	}
	return net, n - slices.Max(allow)
}

// TestExplanationBudget solves networks whose explanation would run for
// hours: the budget ends it, the result says so, and what it gives is
// still true (each conflict inconsistent and minimal, the correction, when
// there is one, restores consistency and costs no less than the cheapest).
func TestExplanationBudget(t *testing.T) {
	ctx := context.Background()
	consistent := func(n *Network, keep func(int) bool) bool {
		m := New()
		m.AddVar("x")
		for i, c := range n.cons {
			if keep(i) {
				mustAdd(m, c)
			}
		}
		r, err := m.Solve(ctx, Soft, Options{MaxWork: 1})
		if err != nil {
			t.Fatal(err)
		}
		return r.Consistent
	}
	tests := []struct {
		name    string
		net     func() (*Network, int)
		maxWork int
	}{
		{"forty records with a small budget", func() (*Network, int) { return recordsNetwork(t), 20 * 1000 }, 500},
		{"sixty one-of sets of twenty values", func() (*Network, int) { return oneOfNetwork(1, 60, 20) }, 0},
		{"eighty one-of sets of thirty values", func() (*Network, int) { return oneOfNetwork(2, 80, 30) }, 0},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			n, cheapest := tt.net()
			r, err := n.Solve(ctx, Soft, Options{MaxWork: tt.maxWork})
			if err != nil {
				t.Fatal(err)
			}
			budget := Options{MaxWork: tt.maxWork}.maxWork()
			if r.Consistent || !r.BudgetSpent || r.ConflictsComplete {
				t.Fatalf("consistent %v, budget spent %v, conflicts complete %v; want an inconsistent result marked incomplete", r.Consistent, r.BudgetSpent, r.ConflictsComplete)
			}
			// A check or a search may pass the budget by what it was
			// allowed when it started, never by more than the budget.
			if r.Work > 2*budget {
				t.Errorf("%d units of work, budget %d", r.Work, budget)
			}
			for _, k := range r.Conflicts {
				if consistent(n, func(i int) bool { return slices.Contains(k, i) }) {
					t.Errorf("conflict %v is consistent", n.IDs(k))
				}
				for _, drop := range k {
					if !consistent(n, func(i int) bool { return i != drop && slices.Contains(k, i) }) {
						t.Errorf("conflict %v is not minimal without %s", n.IDs(k), n.ID(drop))
					}
				}
			}
			var paid int
			for _, i := range r.Correction {
				paid += int(cost(n.cons[i].Tier))
			}
			if len(r.Correction) > 0 {
				if !consistent(n, func(i int) bool { return !slices.Contains(r.Correction, i) }) {
					t.Errorf("removing the correction %v leaves an inconsistent network", n.IDs(r.Correction))
				}
				if paid < cheapest {
					t.Errorf("correction costs %d, below the cheapest, %d", paid, cheapest)
				}
			}
			t.Logf("%d units of work; %d conflicts; correction of cost %d (cheapest %d)", r.Work, len(r.Conflicts), paid, cheapest)
		})
	}
}

// BenchmarkRecordsOneOf explains the forty records at the firm tier: the
// work it takes, its time and its memory (held under one second and
// 256 MiB allocated in all).
func BenchmarkRecordsOneOf(b *testing.B) {
	n := recordsNetwork(b)
	b.ReportAllocs()
	work := 0
	for b.Loop() {
		r, err := n.Solve(context.Background(), Firm, Options{})
		if err != nil || r.Consistent || r.BudgetSpent {
			b.Fatalf("want an inconsistent network explained within the budget: %v", err)
		}
		work = r.Work
	}
	b.ReportMetric(float64(work), "work/op")
}
