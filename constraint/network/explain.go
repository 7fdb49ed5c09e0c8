package network

import (
	"encoding/binary"
	"slices"
)

// maxHittingSets caps the minimal hitting sets enumerated while checking
// that the conflicts found are all of them.
const maxHittingSets = 4096

// explain fills the conflicts and the correction of an inconsistent set of
// active constraints. seed, when not nil, is a candidate small
// inconsistent subset (the constraints of a negative cycle).
func (s *solver) explain(active []int32, seed []int32, r *Result) error {
	byRank := func(xs []int32) []int32 {
		xs = slices.Clone(xs)
		slices.SortFunc(xs, func(a, b int32) int { return int(s.rank[a]) - int(s.rank[b]) })
		return slices.Compact(xs)
	}
	active = byRank(active)
	cand := active
	if len(seed) > 0 {
		seed = byRank(seed)
		ok, _, err := s.consistent(seed)
		if err != nil {
			return err
		}
		if !ok {
			cand = seed
		}
	}
	first, err := s.quickXplain(cand)
	if err != nil {
		return err
	}
	conflicts := [][]int32{first}
	known := map[string]bool{} // hitting sets whose complement is consistent
	maxC := s.opt.maxConflicts()
	complete := false
search:
	for len(conflicts) < maxC {
		hs, capped := minimalHittingSets(conflicts)
		if capped {
			break
		}
		s.sortByCost(hs)
		for _, h := range hs {
			key := setKey(h)
			if known[key] {
				continue
			}
			rest := without(active, h)
			ok, _, err := s.consistent(rest)
			if err != nil {
				return err
			}
			if ok {
				known[key] = true
				continue
			}
			m, err := s.quickXplain(rest)
			if err != nil {
				return err
			}
			conflicts = append(conflicts, m)
			continue search
		}
		complete = true
		break
	}
	if !complete && len(conflicts) >= maxC {
		// The cap is reached: the list is complete only if the duality
		// check passes.
		complete = true
		hs, capped := minimalHittingSets(conflicts)
		if capped {
			complete = false
		}
		for _, h := range hs {
			if !complete {
				break
			}
			if known[setKey(h)] {
				continue
			}
			ok, _, err := s.consistent(without(active, h))
			if err != nil {
				return err
			}
			if ok {
				known[setKey(h)] = true
			} else {
				complete = false
			}
		}
	}
	// The cheapest correction: an implicit hitting-set loop, exact even
	// when the reported list of conflicts is capped.
	all := slices.Clone(conflicts)
	var corr []int32
	for {
		h := s.cheapestHittingSet(all)
		ok := known[setKey(h)]
		if !ok {
			var err error
			ok, _, err = s.consistent(without(active, h))
			if err != nil {
				return err
			}
		}
		if ok {
			corr = h
			break
		}
		m, err := s.quickXplain(without(active, h))
		if err != nil {
			return err
		}
		all = append(all, m)
		if len(conflicts) < maxC {
			conflicts = append(conflicts, m)
		}
	}
	for _, c := range conflicts {
		r.Conflicts = append(r.Conflicts, s.idList(c))
	}
	slices.SortFunc(r.Conflicts, func(a, b []string) int {
		if len(a) != len(b) {
			return len(a) - len(b)
		}
		return slices.Compare(a, b)
	})
	r.ConflictsComplete = complete
	r.Correction = s.idList(corr)
	return nil
}

func (s *solver) idList(xs []int32) []string {
	out := make([]string, len(xs))
	for i, x := range xs {
		out[i] = s.n.cons[x].ID
	}
	slices.Sort(out)
	return out
}

// quickXplain returns a minimal inconsistent subset of the inconsistent
// constraints cs (Junker 2004), preferring constraints early in cs.
func (s *solver) quickXplain(cs []int32) ([]int32, error) {
	var rec func(b, d, c []int32) ([]int32, error)
	rec = func(b, d, c []int32) ([]int32, error) {
		if len(d) > 0 {
			ok, _, err := s.consistent(b)
			if err != nil {
				return nil, err
			}
			if !ok {
				return nil, nil
			}
		}
		if len(c) == 1 {
			return c, nil
		}
		k := len(c) / 2
		c1, c2 := c[:k], c[k:]
		d2, err := rec(concat(b, c1), c1, c2)
		if err != nil {
			return nil, err
		}
		d1, err := rec(concat(b, d2), d2, c1)
		if err != nil {
			return nil, err
		}
		return concat(d1, d2), nil
	}
	m, err := rec(nil, nil, cs)
	if err != nil {
		return nil, err
	}
	m = slices.Clone(m)
	slices.Sort(m)
	return m, nil
}

func concat(a, b []int32) []int32 {
	out := make([]int32, 0, len(a)+len(b))
	return append(append(out, a...), b...)
}

// without returns xs less the members of the sorted set h.
func without(xs, h []int32) []int32 {
	out := make([]int32, 0, len(xs))
	for _, x := range xs {
		if _, found := slices.BinarySearch(h, x); !found {
			out = append(out, x)
		}
	}
	return out
}

func setKey(h []int32) string {
	b := make([]byte, 0, 4*len(h))
	for _, x := range h {
		b = binary.LittleEndian.AppendUint32(b, uint32(x))
	}
	return string(b)
}

// minimalHittingSets enumerates the minimal hitting sets of the sets
// (Berge's incremental method); each result is sorted. It reports true
// when the count passed maxHittingSets.
func minimalHittingSets(sets [][]int32) ([][]int32, bool) {
	cur := [][]int32{{}}
	for _, s := range sets {
		var next [][]int32
		for _, h := range cur {
			if intersects(h, s) {
				next = append(next, h)
				continue
			}
			for _, e := range s {
				x := slices.Clone(h)
				i, _ := slices.BinarySearch(x, e)
				x = slices.Insert(x, i, e)
				next = append(next, x)
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
			minimal := true
			for _, y := range cur {
				if len(y) < len(x) && subset(y, x) {
					minimal = false
					break
				}
			}
			if minimal {
				cur = append(cur, x)
			}
		}
		if len(cur) > maxHittingSets {
			return nil, true
		}
	}
	return cur, false
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

func (s *solver) setCost(h []int32) int64 {
	var c int64
	for _, x := range h {
		c += cost(s.n.cons[x].Tier)
	}
	return c
}

// cmpSets orders sets by cost, then by their sorted ids.
func (s *solver) cmpSets(a, b []int32) int {
	if ca, cb := s.setCost(a), s.setCost(b); ca != cb {
		return cmp64(ca, cb)
	}
	return slices.Compare(s.idList(a), s.idList(b))
}

func (s *solver) sortByCost(hs [][]int32) {
	slices.SortFunc(hs, s.cmpSets)
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
			if bestCost < 0 || s.cmpSets(h, best) < 0 {
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
