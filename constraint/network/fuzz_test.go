package network

import (
	"context"
	"errors"
	"fmt"
	"slices"
	"testing"
)

// decodeNetwork reads a small network from fuzz bytes: the first byte
// gives the number of variables (1 to 6), then every four bytes make an
// alternative: from, to, lo, hi (values -20..20, with 0xff meaning
// unbounded); the high bit of from continues the constraint with another
// alternative, and bits of to choose the tier. Invalid alternatives are
// skipped, as Add refuses them; bytes past 16 alternatives are ignored.
func decodeNetwork(data []byte) *Network {
	n := New()
	if len(data) == 0 {
		return n
	}
	nv := 1 + int(data[0])%6
	for i := 0; i < nv; i++ {
		n.AddVar(fmt.Sprintf("v%d", i+1))
	}
	val := func(b byte, side int64) int64 {
		if b == 0xff {
			return side
		}
		return int64(b%41) - 20
	}
	data = data[1:]
	if len(data) > 4*16 {
		data = data[:4*16] // at most 16 alternatives keep every run quick
	}
	var c Constraint
	flush := func() {
		if len(c.Alts) > 0 {
			c.ID = fmt.Sprintf("c%02d", len(n.cons))
			if _, err := n.Add(c); err != nil {
				panic(fmt.Sprintf("decoded constraint refused: %v", err))
			}
		}
		c = Constraint{}
	}
	for len(data) >= 4 {
		b := data[:4]
		data = data[4:]
		a := Alt{
			From: Var(int(b[0]&0x7f) % (nv + 1)),
			To:   Var(int(b[1]&0x3f) % (nv + 1)),
			Lo:   val(b[2], -Inf),
			Hi:   val(b[3], Inf),
		}
		if a.From == a.To || a.Lo > a.Hi {
			continue
		}
		c.Tier = Tier(b[1] >> 6 % 3)
		c.Alts = append(c.Alts, a)
		if b[0]&0x80 == 0 {
			flush()
		}
	}
	flush()
	return n
}

func FuzzSolve(f *testing.F) {
	f.Add([]byte{3, 0, 1, 30, 40, 1, 2, 5, 0xff})
	f.Add([]byte{1, 0x80, 1, 0, 2, 0, 1, 30, 35, 0, 1, 1, 33})
	f.Add([]byte{2, 0, 1, 10, 20, 1, 2, 30, 40, 0, 2, 0xff, 35})
	f.Add([]byte{4, 0, 1, 10, 20, 0x81, 2, 30, 40, 1, 2, 60, 0xff, 0, 4, 60, 70, 0x83, 4, 20, 30, 3, 4, 40, 50, 3, 2, 10, 20})
	f.Add([]byte{5, 0xc1, 0x42, 3, 9, 0x12, 0x83, 0xff, 4, 2, 0xc4, 7, 7})
	f.Fuzz(func(t *testing.T, data []byte) {
		n := decodeNetwork(data)
		ctx := context.Background()
		for _, tier := range []Tier{Hard, Firm, Soft} {
			r, err := n.Solve(ctx, tier, Options{MaxNodes: 20000})
			if errors.Is(err, ErrLimit) {
				continue
			}
			if err != nil {
				t.Fatalf("%s: %v", tier, err)
			}
			checkResult(t, n, tier, r)
		}
	})
}

// checkResult checks a result against the constraints it came from, with
// the solver itself as the judge of feasibility of single values.
func checkResult(t *testing.T, n *Network, tier Tier, r *Result) {
	t.Helper()
	ctx := context.Background()
	var cs []Constraint
	for _, c := range n.Constraints() {
		if c.Tier <= tier {
			cs = append(cs, c)
		}
	}
	// with returns a copy of the active constraints plus extra ones.
	with := func(keep func(Constraint) bool, extra ...Constraint) *Network {
		m := New()
		for v := 1; v < n.NumVars(); v++ {
			m.AddVar(n.Name(Var(v)))
		}
		for _, c := range cs {
			if keep(c) {
				mustAdd(m, c)
			}
		}
		for _, c := range extra {
			mustAdd(m, c)
		}
		return m
	}
	all := func(Constraint) bool { return true }
	feasible := func(m *Network) bool {
		res, err := m.Solve(ctx, Soft, Options{MaxNodes: 20000})
		if err != nil {
			t.Skipf("re-solve: %v", err)
		}
		return res.Consistent
	}
	if !r.Consistent {
		// Only a spent budget leaves an inconsistency unexplained.
		if !r.BudgetSpent && (len(r.Conflicts) == 0 || len(r.Correction) == 0) {
			t.Fatalf("%s: inconsistent, conflicts %v, correction %v", tier, r.Conflicts, r.Correction)
		}
		for _, k := range r.Conflicts {
			if feasible(with(func(c Constraint) bool { return slices.Contains(n.IDs(k), c.ID) })) {
				t.Fatalf("%s: conflict %v is consistent", tier, k)
			}
		}
		if len(r.Correction) > 0 && !feasible(with(func(c Constraint) bool { return !slices.Contains(n.IDs(r.Correction), c.ID) })) {
			t.Fatalf("%s: removing %v does not restore consistency", tier, r.Correction)
		}
		return
	}
	for v := Var(1); int(v) < n.NumVars(); v++ {
		dom := r.Domain(v)
		lo, hi := r.Earliest(v), r.Latest(v)
		if len(dom) == 0 || dom[0].Lo != lo.Value || dom[len(dom)-1].Hi != hi.Value {
			t.Fatalf("%s: %s: domain %v, window [%d, %d]", tier, n.Name(v), dom, lo.Value, hi.Value)
		}
		for i, iv := range dom {
			if iv.Lo > iv.Hi || (i > 0 && iv.Lo <= dom[i-1].Hi+1) {
				t.Fatalf("%s: %s: domain %v not sorted, disjoint and apart", tier, n.Name(v), dom)
			}
		}
		// Every unary constraint on v holds on the whole domain.
		for _, c := range cs {
			u, ok := unaryOf(&c)
			if !ok || u != v {
				continue
			}
			for _, iv := range dom {
				for _, x := range []int64{iv.Lo, iv.Hi} {
					if x <= -Inf || x >= Inf {
						continue
					}
					xs := make([]int64, n.NumVars())
					xs[v] = x
					if !satisfies(c, xs) {
						t.Fatalf("%s: %s: domain %v holds %d, against %v", tier, n.Name(v), dom, x, c)
					}
				}
			}
		}
		// Every finite end of a run is feasible, and the value just past it
		// (inside a gap or beyond the window) is not.
		for _, iv := range dom {
			for _, end := range []struct{ at, past int64 }{{iv.Lo, iv.Lo - 1}, {iv.Hi, iv.Hi + 1}} {
				if end.at <= -Inf || end.at >= Inf {
					continue
				}
				fix := func(x int64) Constraint {
					return Constraint{ID: "fuzz-fix", Alts: []Alt{{Zero, v, x, x}}}
				}
				if !feasible(with(all, fix(end.at))) {
					t.Fatalf("%s: %s: domain %v holds %d, which is infeasible", tier, n.Name(v), dom, end.at)
				}
				if !dom.Contains(end.past) && feasible(with(all, fix(end.past))) {
					t.Fatalf("%s: %s: domain %v leaves out %d, which is feasible", tier, n.Name(v), dom, end.past)
				}
			}
		}
	}
	// Simple binary constraints hold between the windows.
	for _, c := range cs {
		if len(c.Alts) != 1 {
			continue
		}
		a := c.Alts[0]
		if a.Lo > -Inf && r.Earliest(a.From).Value > -Inf && r.Earliest(a.To).Value < r.Earliest(a.From).Value+a.Lo {
			t.Fatalf("%s: earliest of %s below earliest of %s + %d (%v)", tier, n.Name(a.To), n.Name(a.From), a.Lo, c)
		}
		if a.Hi < Inf && r.Latest(a.From).Value < Inf && r.Latest(a.To).Value > r.Latest(a.From).Value+a.Hi {
			t.Fatalf("%s: latest of %s above latest of %s + %d (%v)", tier, n.Name(a.To), n.Name(a.From), a.Hi, c)
		}
	}
}
