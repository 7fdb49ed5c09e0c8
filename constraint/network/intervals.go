package network

import "slices"

// This file holds the interval sets: the runs of values a variable may
// take, as the solver keeps them (pieces, with the constraints that set
// their ends) and as results show them (a Set).

// piece is a run of a unary interval set with the constraints that set
// its ends (-1 for an unbounded end).
type piece struct {
	lo, hi       int64
	loTag, hiTag int32
}

// unaryPiece is the alternative a of unary constraint ci as a run of the
// variable's values; an infinite side has no tag (-1).
func unaryPiece(a Alt, ci int32) piece {
	lo, hi := a.Lo, a.Hi
	if a.To == Zero { // lo <= 0 − v <= hi
		lo, hi = neg(a.Hi), neg(a.Lo)
	}
	p := piece{lo, hi, ci, ci}
	if p.lo <= -Inf {
		p.loTag = -1
	}
	if p.hi >= Inf {
		p.hiTag = -1
	}
	return p
}

// unarySet is the union of the alternatives of the unary constraint ci.
// While the solver keeps them (for the many checks of an explanation),
// the unions of several alternatives are made once: the caller must not
// change the set.
func (s *solver) unarySet(ci int32) []piece {
	c := &s.n.cons[ci]
	if !s.keepUnary || len(c.Alts) == 1 {
		return unarySet(c, ci)
	}
	set, ok := s.unary[ci]
	if !ok {
		if s.unary == nil {
			s.unary = map[int32][]piece{}
		}
		set = unarySet(c, ci)
		s.unary[ci] = set
	}
	return set
}

// ownUnarySet is unarySet(ci) for the caller to change.
func (s *solver) ownUnarySet(ci int32) []piece {
	set := s.unarySet(ci)
	if s.keepUnary && len(s.n.cons[ci].Alts) > 1 {
		return slices.Clone(set)
	}
	return set
}

// unarySet is the union of the alternatives of the unary constraint c
// (index ci).
func unarySet(c *Constraint, ci int32) []piece {
	ps := make([]piece, 0, len(c.Alts))
	for _, a := range c.Alts {
		ps = append(ps, unaryPiece(a, ci))
	}
	slices.SortFunc(ps, func(a, b piece) int { return cmp64(a.lo, b.lo) })
	out := ps[:0]
	for _, p := range ps {
		if k := len(out) - 1; k >= 0 && (out[k].hi >= Inf || p.lo <= out[k].hi+1) {
			out[k].hi = max(out[k].hi, p.hi)
			continue
		}
		out = append(out, p)
	}
	for i := range out {
		if out[i].lo <= -Inf {
			out[i].loTag = -1
		}
		if out[i].hi >= Inf {
			out[i].hiTag = -1
		}
	}
	return out
}

func neg(x int64) int64 {
	switch {
	case x >= Inf:
		return -Inf
	case x <= -Inf:
		return Inf
	}
	return -x
}

func cmp64(a, b int64) int {
	switch {
	case a < b:
		return -1
	case a > b:
		return 1
	}
	return 0
}

// intersect intersects two sets, keeping for each end the constraint that
// sets it (the smaller id on a tie).
func (s *solver) intersect(a, b []piece) []piece {
	if a == nil {
		return b
	}
	out := s.scratch[:0]
	i, j := 0, 0
	for i < len(a) && j < len(b) {
		p, q := a[i], b[j]
		if m, ok := s.meet(p, q); ok {
			out = append(out, m)
		}
		if p.hi < q.hi {
			i++
		} else {
			j++
		}
	}
	s.scratch = out
	return append(make([]piece, 0, len(out)), out...) // not nil: an empty set is no set
}

// meet is the common part of two runs, each end keeping the constraint
// that sets it (the smaller id on a tie); ok is false when they miss.
func (s *solver) meet(p, q piece) (piece, bool) {
	lo, loTag := p.lo, p.loTag
	if q.lo > lo || (q.lo == lo && s.less(q.loTag, loTag)) {
		lo, loTag = q.lo, q.loTag
	}
	hi, hiTag := p.hi, p.hiTag
	if q.hi < hi || (q.hi == hi && s.less(q.hiTag, hiTag)) {
		hi, hiTag = q.hi, q.hiTag
	}
	return piece{lo, hi, loTag, hiTag}, lo <= hi
}

// clip intersects the set a with the single alternative of the unary
// constraint c (index ci) in place, exactly as intersect(a, unarySet(c, ci))
// would: a is the caller's to change.
func (s *solver) clip(a []piece, c *Constraint, ci int32) []piece {
	q := unaryPiece(c.Alts[0], ci)
	out := a[:0]
	for _, p := range a {
		if m, ok := s.meet(p, q); ok {
			out = append(out, m)
		}
		if p.hi >= q.hi {
			break
		}
	}
	return out
}

// less orders constraint tags by id; -1 (no constraint) sorts last.
func (s *solver) less(a, b int32) bool {
	if a < 0 || b < 0 {
		return b < 0 && a >= 0
	}
	return s.rank[a] < s.rank[b]
}

// inside reports whether the run [lo, hi] lies within one interval of s.
func inside(s Set, lo, hi int64) bool {
	for _, iv := range s {
		if iv.Lo <= lo && hi <= iv.Hi {
			return true
		}
	}
	return false
}

// union adds iv to the sorted set s, merging overlapping and adjacent runs.
func union(s Set, iv Interval) Set {
	out := make(Set, 0, len(s)+1)
	placed := false
	for _, x := range s {
		if !placed && iv.Lo < x.Lo {
			out = appendMerge(out, iv)
			placed = true
		}
		out = appendMerge(out, x)
	}
	if !placed {
		out = appendMerge(out, iv)
	}
	return out
}

func appendMerge(s Set, iv Interval) Set {
	if k := len(s) - 1; k >= 0 && (s[k].Hi >= Inf || iv.Lo <= s[k].Hi+1) {
		s[k].Hi = max(s[k].Hi, iv.Hi)
		return s
	}
	return append(s, iv)
}

// intersectSets is the common part of two sets.
func intersectSets(a, b Set) Set {
	var out Set
	i, j := 0, 0
	for i < len(a) && j < len(b) {
		lo, hi := max(a[i].Lo, b[j].Lo), min(a[i].Hi, b[j].Hi)
		if lo <= hi {
			out = append(out, Interval{lo, hi})
		}
		if a[i].Hi < b[j].Hi {
			i++
		} else {
			j++
		}
	}
	return out
}
