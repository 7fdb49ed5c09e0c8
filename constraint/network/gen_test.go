package network

import (
	"fmt"
	"math/rand/v2"
	"testing"
)

// genSpec shapes a random network.
type genSpec struct {
	vars, cons int
	w          int64   // finite bounds lie in [-w, w]
	pDisj      float64 // chance that a constraint is a disjunction
	pOpen      float64 // chance that a side is unbounded
	pUnary     float64 // chance that an alternative is unary
}

// genNetwork draws a random network; every constraint is valid.
func genNetwork(rng *rand.Rand, sp genSpec) *Network {
	n := New()
	for i := 0; i < sp.vars; i++ {
		n.AddVar(fmt.Sprintf("v%d", i+1))
	}
	alt := func() Alt {
		to := Var(1 + rng.IntN(sp.vars))
		from := Zero
		if sp.vars > 1 && rng.Float64() >= sp.pUnary {
			for from = Var(1 + rng.IntN(sp.vars)); from == to; {
				from = Var(1 + rng.IntN(sp.vars))
			}
		}
		a, b := rng.Int64N(2*sp.w+1)-sp.w, rng.Int64N(2*sp.w+1)-sp.w
		if a > b {
			a, b = b, a
		}
		if rng.Float64() < sp.pOpen {
			a = -Inf
		} else if rng.Float64() < sp.pOpen {
			b = Inf
		}
		return Alt{from, to, a, b}
	}
	for i := 0; i < sp.cons; i++ {
		c := Constraint{ID: fmt.Sprintf("c%02d", i), Tier: Tier(rng.IntN(3))}
		k := 1
		if rng.Float64() < sp.pDisj {
			k = 2 + rng.IntN(2)
		}
		for range k {
			c.Alts = append(c.Alts, alt())
		}
		if _, err := n.Add(c); err != nil {
			panic(err)
		}
	}
	return n
}

// satisfies reports whether the assignment x (x[0] = 0) meets c.
// constraintsAt returns the constraints of the given indices.
func constraintsAt(n *Network, indices []int) []Constraint {
	out := make([]Constraint, len(indices))
	for k, i := range indices {
		out[k] = n.cons[i]
	}
	return out
}

func satisfies(c Constraint, x []int64) bool {
	for _, a := range c.Alts {
		d := x[a.To] - x[a.From]
		if (a.Lo <= -Inf || d >= a.Lo) && (a.Hi >= Inf || d <= a.Hi) {
			return true
		}
	}
	return false
}

// brute enumerates every assignment of the variables over [-r, r] meeting
// the constraints cs; visit is called on each and stops the walk by
// returning false. With onlyUsed, a variable no constraint mentions takes
// the value 0 alone.
func brute(nv int, cs []Constraint, r int64, visit func(x []int64) bool) {
	bruteWalk(nv, cs, r, false, visit)
}

func bruteWalk(nv int, cs []Constraint, r int64, onlyUsed bool, visit func(x []int64) bool) {
	used := make([]bool, nv)
	// Check each constraint as soon as its last variable is assigned.
	at := make([][]Constraint, nv)
	for _, c := range cs {
		last := Var(0)
		for _, a := range c.Alts {
			last = max(last, a.From, a.To)
			used[a.From], used[a.To] = true, true
		}
		at[last] = append(at[last], c)
	}
	x := make([]int64, nv)
	var rec func(v int) bool
	rec = func(v int) bool {
		if v == nv {
			return visit(x)
		}
		lo, hi := -r, r
		if onlyUsed && !used[v] {
			lo, hi = 0, 0
		}
		for val := lo; val <= hi; val++ {
			x[v] = val
			ok := true
			for _, c := range at[v] {
				if !satisfies(c, x) {
					ok = false
					break
				}
			}
			if ok && !rec(v+1) {
				return false
			}
		}
		return true
	}
	rec(1)
}

func bruteConsistent(nv int, cs []Constraint, r int64) bool {
	found := false
	bruteWalk(nv, cs, r, true, func([]int64) bool { found = true; return false })
	return found
}

func TestGenerator(t *testing.T) {
	// The generator must produce what it promises: valid networks with
	// disjunctions and open sides present.
	rng := rand.New(rand.NewPCG(1, 2))
	disj, open := 0, 0
	for range 50 {
		n := genNetwork(rng, genSpec{vars: 3, cons: 5, w: 4, pDisj: 0.3, pOpen: 0.2, pUnary: 0.4})
		for _, c := range n.Constraints() {
			if len(c.Alts) > 1 {
				disj++
			}
			for _, a := range c.Alts {
				if a.Lo <= -Inf || a.Hi >= Inf {
					open++
				}
			}
		}
	}
	if disj == 0 || open == 0 {
		t.Errorf("generator: %d disjunctions, %d open sides; want some of each", disj, open)
	}
}
