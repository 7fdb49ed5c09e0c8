package network

import (
	"context"
	"errors"
	"reflect"
	"strings"
	"testing"
)

func TestAddRefuses(t *testing.T) {
	n := New()
	a := n.AddVar("a")
	if _, err := n.Add(Constraint{ID: "taken", Alts: []Alt{{Zero, a, 0, 1}}}); err != nil {
		t.Fatal(err)
	}
	tests := []struct {
		name string
		c    Constraint
		want string // part of the message
	}{
		{"empty id", Constraint{Alts: []Alt{{Zero, a, 0, 1}}}, "empty id"},
		{"duplicate id", Constraint{ID: "taken", Alts: []Alt{{Zero, a, 0, 1}}}, "duplicate id"},
		{"bad tier", Constraint{ID: "t", Tier: 7, Alts: []Alt{{Zero, a, 0, 1}}}, "expected Hard, Firm or Soft"},
		{"no alternatives", Constraint{ID: "n"}, "no alternatives"},
		{"unknown variable", Constraint{ID: "u", Alts: []Alt{{Zero, 9, 0, 1}}}, "variable 9 is not in the network"},
		{"negative variable", Constraint{ID: "u", Alts: []Alt{{-1, a, 0, 1}}}, "variable -1 is not in the network"},
		{"self", Constraint{ID: "s", Alts: []Alt{{a, a, 0, 1}}}, "to itself"},
		{"reversed", Constraint{ID: "r", Alts: []Alt{{Zero, a, 0, 1}, {Zero, a, 5, 4}}}, "alternative 2: lower side 5 is above upper side 4"},
		{"lower +Inf", Constraint{ID: "i", Alts: []Alt{{Zero, a, Inf, Inf}}}, "lower side"},
		{"upper -Inf", Constraint{ID: "i", Alts: []Alt{{Zero, a, -Inf, -Inf}}}, "upper side"},
		{"beyond limit", Constraint{ID: "l", Alts: []Alt{{Zero, a, Limit + 1, Limit + 2}}}, "beyond"},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			i, err := n.Add(tt.c)
			var ce *ConstraintError
			if !errors.As(err, &ce) || !errors.Is(err, ErrInvalid) {
				t.Fatalf("Add: %v, want a *ConstraintError wrapping ErrInvalid", err)
			}
			if i != -1 {
				t.Errorf("Add refused the constraint but gave index %d, want -1", i)
			}
			if !strings.Contains(err.Error(), tt.want) {
				t.Errorf("Add: %q, want it to say %q", err, tt.want)
			}
		})
	}
	if got := len(n.Constraints()); got != 1 {
		t.Errorf("%d constraints kept, want 1 (refused ones must not be added)", got)
	}
	// Sides beyond ±Inf are stored as ±Inf.
	if i, err := n.Add(Constraint{ID: "wide", Alts: []Alt{{Zero, a, -5 * Inf, 3 * Inf}}}); err != nil || i != 1 {
		t.Fatalf("Add: index %d, %v; want index 1", i, err)
	}
	if got := n.Constraints()[1].Alts[0]; got.Lo != -Inf || got.Hi != Inf {
		t.Errorf("stored %v, want sides ±Inf", got)
	}
}

func TestTierString(t *testing.T) {
	for tier, want := range map[Tier]string{Hard: "hard", Firm: "firm", Soft: "soft", 9: "tier(9)"} {
		if got := tier.String(); got != want {
			t.Errorf("Tier(%d).String() = %q, want %q", tier, got, want)
		}
	}
}

func TestTiersNest(t *testing.T) {
	// Solving at a tier uses the constraints of that tier and stronger.
	n := New()
	x := n.AddVar("x")
	mustAdd(n, Constraint{ID: "h", Tier: Hard, Alts: []Alt{{Zero, x, 0, 100}}})
	mustAdd(n, Constraint{ID: "f", Tier: Firm, Alts: []Alt{{Zero, x, 10, 90}}})
	mustAdd(n, Constraint{ID: "s", Tier: Soft, Alts: []Alt{{Zero, x, 20, 80}}})
	want := map[Tier]Interval{Hard: {0, 100}, Firm: {10, 90}, Soft: {20, 80}}
	for tier, w := range want {
		r, err := n.Solve(context.Background(), tier, Options{})
		if err != nil {
			t.Fatal(err)
		}
		if got := (Interval{r.Earliest(x).Value, r.Latest(x).Value}); got != w || r.Tier != tier {
			t.Errorf("%s: window %v (tier %s), want %v", tier, got, r.Tier, w)
		}
	}
}

func TestUnboundedAndInconsistentAccessors(t *testing.T) {
	n := New()
	x := n.AddVar("x")
	y := n.AddVar("y")
	mustAdd(n, Constraint{ID: "lo", Alts: []Alt{{Zero, x, 5, Inf}}})
	r, err := n.Solve(context.Background(), Soft, Options{})
	if err != nil {
		t.Fatal(err)
	}
	if b := r.Latest(x); b.Value != Inf || len(b.Because) != 0 {
		t.Errorf("latest of x = %v, want +Inf with no explanation", b)
	}
	if d := r.Domain(y); len(d) != 1 || d[0] != (Interval{-Inf, Inf}) {
		t.Errorf("domain of a free variable = %v, want everything", d)
	}
	if d := r.Domain(Zero); len(d) != 1 || d[0] != (Interval{0, 0}) {
		t.Errorf("domain of Zero = %v, want {0}", d)
	}
	if r.Domain(99) != nil || r.Earliest(99).Value != Inf || r.Latest(-1).Value != -Inf {
		t.Error("a variable not in the network must give an empty domain")
	}
	mustAdd(n, Constraint{ID: "hi", Tier: Firm, Alts: []Alt{{Zero, x, -Inf, 4}}})
	r, err = n.Solve(context.Background(), Soft, Options{})
	if err != nil {
		t.Fatal(err)
	}
	if r.Consistent || r.Domain(x) != nil || r.Earliest(x).Value != Inf {
		t.Errorf("inconsistent network: consistent %v, domain %v, earliest %v", r.Consistent, r.Domain(x), r.Earliest(x))
	}
	if len(r.Correction) != 1 || n.ID(r.Correction[0]) != "hi" {
		t.Errorf("correction %v, want [hi] (firm is cheaper than hard)", r.Correction)
	}
}

func TestSolveStops(t *testing.T) {
	n := disjunctiveInstance(200)
	ctx, cancel := context.WithCancel(context.Background())
	cancel()
	if _, err := n.Solve(ctx, Soft, Options{}); !errors.Is(err, context.Canceled) {
		t.Errorf("cancelled context: %v, want context.Canceled", err)
	}
	if _, err := n.Solve(context.Background(), Soft, Options{MaxNodes: 3}); !errors.Is(err, ErrLimit) {
		t.Errorf("MaxNodes 3: %v, want ErrLimit", err)
	}
}

func TestConflictCap(t *testing.T) {
	// Twelve lower bounds each contradicting one upper bound: twelve
	// conflicts of two. A cap of 5 reports 5, marked incomplete; the
	// correction (the one soft upper bound) is still the cheapest.
	n := New()
	x := n.AddVar("x")
	mustAdd(n, Constraint{ID: "upper", Tier: Soft, Alts: []Alt{{Zero, x, -Inf, 0}}})
	for i := range 12 {
		mustAdd(n, Constraint{ID: string(rune('a' + i)), Tier: Hard, Alts: []Alt{{Zero, x, int64(1 + i), Inf}}})
	}
	r, err := n.Solve(context.Background(), Soft, Options{MaxConflicts: 5})
	if err != nil {
		t.Fatal(err)
	}
	if len(r.Conflicts) != 5 || r.ConflictsComplete {
		t.Errorf("%d conflicts, complete %v; want 5, incomplete", len(r.Conflicts), r.ConflictsComplete)
	}
	if len(r.Correction) != 1 || n.ID(r.Correction[0]) != "upper" {
		t.Errorf("correction %v, want [upper]", r.Correction)
	}
	r, err = n.Solve(context.Background(), Soft, Options{MaxConflicts: 20})
	if err != nil {
		t.Fatal(err)
	}
	if len(r.Conflicts) != 12 || !r.ConflictsComplete {
		t.Errorf("%d conflicts, complete %v; want 12, complete", len(r.Conflicts), r.ConflictsComplete)
	}
}

func TestDeterministicAndConcurrent(t *testing.T) {
	// The same network solved several times, at once, gives identical
	// results: no map order or shared state leaks into them.
	n := disjunctiveInstance(100)
	mustAdd(n, Constraint{ID: "zz-late", Tier: Soft, Alts: []Alt{{Zero, 1, 1_000_000, Inf}}})
	results := make([][2]*Result, 4)
	errs := make(chan error, len(results))
	for i := range results {
		go func() {
			for k, tier := range []Tier{Firm, Soft} {
				r, err := n.Solve(context.Background(), tier, Options{})
				if err != nil {
					errs <- err
					return
				}
				results[i][k] = r
			}
			errs <- nil
		}()
	}
	for range results {
		if err := <-errs; err != nil {
			t.Fatal(err)
		}
	}
	for i := 1; i < len(results); i++ {
		for k := range 2 {
			if !reflect.DeepEqual(results[0][k], results[i][k]) {
				t.Errorf("solve %d, tier %d differs from solve 0", i, k)
			}
		}
	}
	if !results[0][0].Consistent || results[0][1].Consistent {
		t.Errorf("firm consistent %v, soft consistent %v; want true, false", results[0][0].Consistent, results[0][1].Consistent)
	}
}
