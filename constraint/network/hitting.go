package network

import (
	"fmt"
	"slices"
)

// This file holds the hitting sets of a family of conflicts: all the
// minimal ones (for the duality check), and a cheapest one (for the
// correction). A hitting set meets every conflict; its members are
// constraint indices, sorted.

// maxHittingSets caps the minimal hitting sets enumerated while checking
// that the conflicts found are all of them.
const maxHittingSets = 4096

// minimalHittingSets enumerates the minimal hitting sets of the sets
// (Berge's incremental method), counting as a unit of work each candidate
// and each 64 sets a candidate is compared with. It reports true when the
// count passed maxHittingSets.
func (e *explainer) minimalHittingSets(sets [][]int32) ([][]int32, bool, error) {
	cur := [][]int32{{}}
	for _, s := range sets {
		candidates := 0
		for _, h := range cur {
			if intersects(h, s) {
				candidates++
			} else {
				candidates += len(s)
			}
		}
		if err := e.spend(candidates); err != nil {
			return nil, false, err
		}
		next := make([][]int32, 0, candidates)
		for _, h := range cur {
			if intersects(h, s) {
				next = append(next, h)
				continue
			}
			for _, x := range s {
				next = append(next, insertSorted(h, x))
			}
		}
		// Keep the minimal ones, once each.
		slices.SortFunc(next, func(a, b []int32) int {
			if len(a) != len(b) {
				return len(a) - len(b)
			}
			return slices.Compare(a, b)
		})
		next = slices.CompactFunc(next, slices.Equal)
		cur = cur[:0]
		for _, x := range next {
			if err := e.spend(len(cur) / 64); err != nil {
				return nil, false, err
			}
			if !hasSubset(cur, x) {
				cur = append(cur, x)
			}
			if len(cur) > maxHittingSets {
				return nil, true, nil
			}
		}
	}
	return cur, false, nil
}

// insertSorted returns a copy of the sorted set h with x added.
func insertSorted(h []int32, x int32) []int32 {
	out := make([]int32, len(h), len(h)+1)
	copy(out, h)
	i, _ := slices.BinarySearch(out, x)
	return slices.Insert(out, i, x)
}

// hasSubset reports whether one of the sets, all smaller than x or equal
// to it in size, is a proper subset of x.
func hasSubset(sets [][]int32, x []int32) bool {
	for _, y := range sets {
		if len(y) < len(x) && subset(y, x) {
			return true
		}
	}
	return false
}

func intersects(a, b []int32) bool {
	for _, x := range a {
		if slices.Contains(b, x) {
			return true
		}
	}
	return false
}

// subset reports whether sorted a is a subset of sorted b.
func subset(a, b []int32) bool {
	i := 0
	for _, x := range b {
		if i < len(a) && a[i] == x {
			i++
		}
	}
	return i == len(a)
}

// setCost is the cost of removing the constraints h.
func (s *solver) setCost(h []int32) int64 {
	var c int64
	for _, x := range h {
		c += cost(s.n.cons[x].Tier)
	}
	return c
}

// compareByCost orders sets of constraints by cost, then by their ids.
func (s *solver) compareByCost(a, b []int32) int {
	if ca, cb := s.setCost(a), s.setCost(b); ca != cb {
		return cmp64(ca, cb)
	}
	return slices.Compare(s.rankList(a), s.rankList(b))
}

// rankList returns the ranks of the constraints h, sorted.
func (s *solver) rankList(h []int32) []int32 {
	out := make([]int32, len(h))
	for i, x := range h {
		out[i] = s.rank[x]
	}
	slices.Sort(out)
	return out
}

// hittingSearch is a branch and bound for a cheapest hitting set: least
// cost, then least ids. Each node takes the first conflict not yet hit
// and branches on its members, cheapest first; each branch sets aside the
// members tried before it, so that no set is reached twice. A node is cut
// when its cost plus a lower bound of what it must still pay exceeds the
// best found (a node that only ties goes on, as it may find smaller ids).
type hittingSearch struct {
	*solver
	sets     [][]int32
	chosen   []int32
	taken    []bool  // per constraint: in chosen
	aside    []bool  // per constraint: set aside in the current branch
	packed   []int32 // per constraint: the stamp of the lower bound that used it
	stamp    int32
	best     []int32
	bestCost int64
	nodes    int // nodes spent
	limit    int // the most nodes, once a hitting set is found
	capped   bool
}

// cheapestHittingSet returns a hitting set of least cost (then least ids),
// sorted by index, and whether it is known to be the cheapest: a search
// that passes its node limit (the lesser of Options.MaxNodes and half of
// the work left) returns the best it found. Its nodes count as work.
func (e *explainer) cheapestHittingSet(sets [][]int32) ([]int32, bool, error) {
	hs := &e.hitting // its arrays are clean after each search
	if hs.taken == nil {
		n := len(e.n.cons)
		hs.solver = e.solver
		hs.taken, hs.aside, hs.packed = make([]bool, n), make([]bool, n), make([]int32, n)
	}
	hs.sets, hs.chosen, hs.best, hs.bestCost = sets, hs.chosen[:0], nil, -1
	hs.nodes, hs.capped = 0, false
	hs.limit = min(e.opt.maxNodes(), max(0, e.halt-e.work)/2)
	hs.visit(0)
	e.work += hs.nodes // a search that ran to its end is exact whatever it cost
	if err := e.ctx.Err(); err != nil {
		return nil, false, fmt.Errorf("solve: %w", err)
	}
	return hs.best, !hs.capped, nil
}

// visit explores the node whose chosen members cost c.
func (hs *hittingSearch) visit(c int64) {
	if hs.best != nil && hs.nodes >= hs.limit {
		hs.capped = true
		return
	}
	hs.nodes++
	open, bound, dead := hs.survey()
	switch {
	case dead:
		return
	case open == nil:
		hs.offer(c)
		return
	case hs.best != nil && c+bound > hs.bestCost:
		return
	}
	members := hs.free(open)
	for _, x := range members {
		hs.chosen = append(hs.chosen, x)
		hs.taken[x] = true
		hs.visit(c + cost(hs.n.cons[x].Tier))
		hs.taken[x] = false
		hs.chosen = hs.chosen[:len(hs.chosen)-1]
		hs.aside[x] = true
		if hs.capped {
			break
		}
	}
	for _, x := range members {
		hs.aside[x] = false
	}
}

// survey returns the first conflict not hit, a lower bound of what the
// conflicts not hit still cost (the cheapest free member of each of a run
// of them with no free member in common), and dead when a conflict not
// hit has every member set aside.
func (hs *hittingSearch) survey() (open []int32, bound int64, dead bool) {
	hs.stamp++
	stamp := hs.stamp
	for _, st := range hs.sets {
		if hs.hit(st) {
			continue
		}
		if open == nil {
			open = st
		}
		cheapest, disjoint := int64(-1), true
		for _, x := range st {
			if hs.aside[x] {
				continue
			}
			if hs.packed[x] == stamp {
				disjoint = false
			}
			if c := cost(hs.n.cons[x].Tier); cheapest < 0 || c < cheapest {
				cheapest = c
			}
		}
		if cheapest < 0 {
			return nil, 0, true
		}
		if disjoint {
			bound += cheapest
			for _, x := range st {
				hs.packed[x] = stamp
			}
		}
	}
	return open, bound, false
}

func (hs *hittingSearch) hit(set []int32) bool {
	for _, x := range set {
		if hs.taken[x] {
			return true
		}
	}
	return false
}

// free returns the members of the conflict not set aside, cheapest first,
// then in the order of their ids.
func (hs *hittingSearch) free(set []int32) []int32 {
	out := make([]int32, 0, len(set))
	for _, x := range set {
		if !hs.aside[x] {
			out = append(out, x)
		}
	}
	slices.SortFunc(out, func(a, b int32) int {
		if ca, cb := cost(hs.n.cons[a].Tier), cost(hs.n.cons[b].Tier); ca != cb {
			return cmp64(ca, cb)
		}
		return int(hs.rank[a]) - int(hs.rank[b])
	})
	return out
}

// offer keeps the chosen set, which hits every conflict at cost c, when
// it beats the best found.
func (hs *hittingSearch) offer(c int64) {
	h := slices.Clone(hs.chosen)
	slices.Sort(h)
	if hs.best == nil || c < hs.bestCost || c == hs.bestCost && slices.Compare(hs.rankList(h), hs.rankList(hs.best)) < 0 {
		hs.best, hs.bestCost = h, c
	}
}
