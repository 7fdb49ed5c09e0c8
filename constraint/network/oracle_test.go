package network

import (
	"context"
	"fmt"
	"math/rand/v2"
	"reflect"
	"slices"
	"testing"
)

// TestBruteForce compares Solve (and SolveTiers) with an exhaustive enumeration on many
// small random networks with disjunctions: consistency, exact domains,
// earliest and latest, the explanations of simple networks, minimal
// conflicts (and all of them when the list claims to be complete), and
// the cheapest correction.
func TestBruteForce(t *testing.T) {
	ctx := context.Background()
	rng := rand.New(rand.NewPCG(7, 11))
	specs := []genSpec{
		{vars: 1, cons: 4, w: 6, pDisj: 0.5, pOpen: 0.2, pUnary: 1},
		{vars: 2, cons: 5, w: 5, pDisj: 0.3, pOpen: 0.2, pUnary: 0.4},
		{vars: 3, cons: 6, w: 3, pDisj: 0.3, pOpen: 0.15, pUnary: 0.4},
		{vars: 3, cons: 7, w: 3, pDisj: 0, pOpen: 0.15, pUnary: 0.4},
		{vars: 4, cons: 6, w: 1, pDisj: 0.4, pOpen: 0.1, pUnary: 0.3},
	}
	var inconsistent, disjunctive int
	for i := 0; i < 600; i++ {
		sp := specs[i%len(specs)]
		n := genNetwork(rng, sp)
		all, err := n.SolveTiers(ctx, Options{})
		if err != nil {
			t.Fatalf("net%03d: SolveTiers: %v", i, err)
		}
		for _, tier := range []Tier{Hard, Firm, Soft} {
			name := fmt.Sprintf("net%03d/%s", i, tier)
			res, err := n.Solve(ctx, tier, Options{})
			if err != nil {
				t.Fatalf("%s: %v", name, err)
			}
			if !reflect.DeepEqual(all[tier], res) {
				t.Errorf("%s: SolveTiers gives %+v, Solve %+v", name, all[tier], res)
			}
			var cs []Constraint
			for _, c := range n.Constraints() {
				if c.Tier <= tier {
					cs = append(cs, c)
					if len(c.Alts) > 1 {
						disjunctive++
					}
				}
			}
			checkAgainstBrute(t, name, n, cs, res, sp.w)
			if !res.Consistent {
				inconsistent++
			}
		}
	}
	if inconsistent < 50 || disjunctive < 200 {
		t.Errorf("weak sample: %d inconsistent solves, %d disjunctions", inconsistent, disjunctive)
	}
	t.Logf("%d inconsistent solves, %d disjunctions", inconsistent, disjunctive)
}

// checkAgainstBrute compares a result with enumeration. With every finite
// bound within [-w, w] and nv nodes, a consistent simple network has a
// solution within ±nv·w, and one with x[v] = val within ±(|val| + nv·w)
// (boxing every variable adds no negative cycle), so: consistency is
// decided over ±rc; every finite end of a window lies within ±rc (a path
// of at most nv steps), so domains are compared over ±(rc+1), which needs
// an enumeration over ±(2rc+1).
func checkAgainstBrute(t *testing.T, name string, n *Network, cs []Constraint, res *Result, w int64) {
	t.Helper()
	nv := n.NumVars()
	rc := int64(nv) * w
	r := rc + 1
	seen := make([]map[int64]bool, nv)
	for v := range seen {
		seen[v] = map[int64]bool{}
	}
	consistent := bruteConsistent(nv, cs, rc)
	if consistent {
		brute(nv, cs, 2*rc+1, func(x []int64) bool {
			for v := 1; v < nv; v++ {
				if -r <= x[v] && x[v] <= r {
					seen[v][x[v]] = true
				}
			}
			return true
		})
	}
	if res.Consistent != consistent {
		t.Errorf("%s: consistent = %v, brute force says %v\n%v", name, res.Consistent, consistent, cs)
		return
	}
	if consistent {
		for v := Var(1); int(v) < nv; v++ {
			dom := res.Domain(v)
			for x := -r; x <= r; x++ {
				if dom.Contains(x) != seen[v][x] {
					t.Errorf("%s: %s: domain %v, but brute force says %d is %v\n%v", name, n.Name(v), dom, x, seen[v][x], cs)
					break
				}
			}
			lo, hi := res.Earliest(v), res.Latest(v)
			wantLo, wantHi := int64(Inf), int64(-Inf)
			for x := range seen[v] {
				wantLo, wantHi = min(wantLo, x), max(wantHi, x)
			}
			if wantLo == -r {
				wantLo = -Inf
			}
			if wantHi == r {
				wantHi = Inf
			}
			if lo.Value != wantLo || hi.Value != wantHi {
				t.Errorf("%s: %s: window [%d, %d], want [%d, %d]\n%v", name, n.Name(v), lo.Value, hi.Value, wantLo, wantHi, cs)
			}
			if len(dom) == 0 || dom[0].Lo != lo.Value || dom[len(dom)-1].Hi != hi.Value {
				t.Errorf("%s: %s: window [%d, %d] is not the hull of %v", name, n.Name(v), lo.Value, hi.Value, dom)
			}
			checkBecause(t, name, n, cs, v, lo, hi, rc)
		}
		if len(res.Conflicts) > 0 || len(res.Correction) > 0 {
			t.Errorf("%s: consistent, but conflicts %v and correction %v", name, res.Conflicts, res.Correction)
		}
		return
	}
	if len(res.Conflicts) == 0 {
		t.Errorf("%s: inconsistent without a conflict", name)
	}
	for _, k := range res.Conflicts {
		if bruteConsistent(nv, constraintsAt(n, k), rc) {
			t.Errorf("%s: conflict %v is consistent", name, n.IDs(k))
			continue
		}
		for i := range k {
			sub := slices.Delete(slices.Clone(k), i, i+1)
			if !bruteConsistent(nv, constraintsAt(n, sub), rc) {
				t.Errorf("%s: conflict %v is not minimal: %v is inconsistent", name, n.IDs(k), n.IDs(sub))
				break
			}
		}
	}
	// Every subset of at most 7 constraints: the minimal conflicts and the
	// cheapest correction by enumeration.
	m := len(cs)
	incons := make([]bool, 1<<m)
	for mask := 0; mask < 1<<m; mask++ {
		var sub []Constraint
		for i := 0; i < m; i++ {
			if mask&(1<<i) != 0 {
				sub = append(sub, cs[i])
			}
		}
		incons[mask] = !bruteConsistent(nv, sub, rc)
	}
	var muses [][]string
	bestCost := int64(-1)
	for mask := 0; mask < 1<<m; mask++ {
		var ids []string
		var removed int64
		for i := 0; i < m; i++ {
			if mask&(1<<i) != 0 {
				ids = append(ids, cs[i].ID)
			} else {
				removed += cost(cs[i].Tier)
			}
		}
		if !incons[mask] && (bestCost < 0 || removed < bestCost) {
			bestCost = removed
		}
		if !incons[mask] {
			continue
		}
		minimal := true
		for i := 0; i < m; i++ {
			if mask&(1<<i) != 0 && incons[mask&^(1<<i)] {
				minimal = false
			}
		}
		if minimal {
			slices.Sort(ids)
			muses = append(muses, ids)
		}
	}
	if res.ConflictsComplete {
		var got [][]string
		for _, k := range res.Conflicts {
			got = append(got, n.IDs(k))
		}
		slices.SortFunc(got, slices.Compare)
		slices.SortFunc(muses, slices.Compare)
		if !slices.EqualFunc(got, muses, slices.Equal) {
			t.Errorf("%s: complete conflicts %v, brute force finds %v", name, res.Conflicts, muses)
		}
	} else if len(muses) <= 10 {
		t.Errorf("%s: %d conflicts exist, under the cap, but the list is marked incomplete", name, len(muses))
	}
	var rest []Constraint
	var paid int64
	for _, c := range cs {
		if slices.Contains(n.IDs(res.Correction), c.ID) {
			paid += cost(c.Tier)
		} else {
			rest = append(rest, c)
		}
	}
	if !bruteConsistent(nv, rest, rc) {
		t.Errorf("%s: removing the correction %v leaves an inconsistent network", name, res.Correction)
	}
	if paid != bestCost {
		t.Errorf("%s: correction %v costs %d, the cheapest costs %d", name, res.Correction, paid, bestCost)
	}
}

// checkBecause checks, on networks without disjunctions, that the
// constraints named for a bound force it on their own.
func checkBecause(t *testing.T, name string, n *Network, cs []Constraint, v Var, lo, hi Bound, r int64) {
	t.Helper()
	byID := map[string]Constraint{}
	for _, c := range cs {
		if len(c.Alts) > 1 {
			return
		}
		byID[c.ID] = c
	}
	for _, b := range []struct {
		bound Bound
		past  Alt // the values beyond the bound
	}{
		{lo, Alt{Zero, v, -Inf, lo.Value - 1}},
		{hi, Alt{Zero, v, hi.Value + 1, Inf}},
	} {
		if b.bound.Value <= -Inf || b.bound.Value >= Inf {
			if len(b.bound.Because) != 0 {
				t.Errorf("%s: %s: unbounded side explained by %v", name, n.Name(v), b.bound.Because)
			}
			continue
		}
		if len(b.bound.Because) == 0 {
			t.Errorf("%s: %s: bound %d without explanation", name, n.Name(v), b.bound.Value)
			continue
		}
		sub := []Constraint{{ID: "beyond", Alts: []Alt{b.past}}}
		for _, i := range b.bound.Because {
			id := n.ID(i)
			c, ok := byID[id]
			if !ok {
				t.Errorf("%s: %s: explanation names %q, not an active constraint", name, n.Name(v), id)
			}
			sub = append(sub, c)
		}
		// The added bound reaches ±(r+1), which widens the range needed.
		if bruteConsistent(n.NumVars(), sub, int64(n.NumVars())*(r+1)) {
			t.Errorf("%s: %s: bound %d is not forced by %v", name, n.Name(v), b.bound.Value, b.bound.Because)
		}
	}
}
