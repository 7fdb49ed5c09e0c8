package network

import "slices"

// This file holds the hitting sets of a family of conflicts: all the
// minimal ones (for the duality check), and a cheapest one (for the
// correction). A hitting set meets every conflict; its members are
// constraint indices, sorted.

// maxHittingSets caps the minimal hitting sets enumerated while checking
// that the conflicts found are all of them.
const maxHittingSets = 4096

// minimalHittingSets enumerates the minimal hitting sets of the sets
// (Berge's incremental method). It reports true when the count passed
// maxHittingSets.
func minimalHittingSets(sets [][]int32) ([][]int32, bool) {
	cur := [][]int32{{}}
	for _, s := range sets {
		var next [][]int32
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
			if !hasSubset(cur, x) {
				cur = append(cur, x)
			}
		}
		if len(cur) > maxHittingSets {
			return nil, true
		}
	}
	return cur, false
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

// cheapestHittingSet returns a hitting set of least cost (then least ids)
// by branch and bound; the result is sorted by index.
func (s *solver) cheapestHittingSet(sets [][]int32) []int32 {
	var best []int32
	bestCost := int64(-1)
	var chosen []int32
	var rec func(cost int64)
	rec = func(c int64) {
		if bestCost >= 0 && c > bestCost {
			return
		}
		var open []int32
		for _, st := range sets {
			if !intersects(chosen, st) {
				open = st
				break
			}
		}
		if open == nil {
			h := slices.Clone(chosen)
			slices.Sort(h)
			if bestCost < 0 || s.compareByCost(h, best) < 0 {
				best, bestCost = h, c
			}
			return
		}
		es := slices.Clone(open)
		slices.SortFunc(es, func(a, b int32) int {
			if ca, cb := cost(s.n.cons[a].Tier), cost(s.n.cons[b].Tier); ca != cb {
				return cmp64(ca, cb)
			}
			return int(s.rank[a]) - int(s.rank[b])
		})
		for _, e := range es {
			chosen = append(chosen, e)
			rec(c + cost(s.n.cons[e].Tier))
			chosen = chosen[:len(chosen)-1]
		}
	}
	rec(0)
	return best
}
