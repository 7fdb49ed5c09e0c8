package network

import (
	"encoding/binary"
	"errors"
	"slices"
)

// This file explains an inconsistent set of constraints within a work
// budget: a first minimal conflict by QuickXplain, more of them until the
// hitting-set duality says there are no others, and the cheapest
// correction by an implicit hitting-set loop.

// errOutOfWork ends an explanation whose work budget is spent.
var errOutOfWork = errors.New("work budget spent")

// explainer is the state of one explanation.
type explainer struct {
	*solver
	active    []int32   // the active constraints, in the order of their ids
	conflicts [][]int32 // the minimal conflicts to report, each sorted by index
	complete  bool      // conflicts holds them all
	// correction is the cheapest hitting set found whose complement is
	// consistent; cheapest reports that none costs less.
	correction []int32
	cheapest   bool
	// verified holds the hitting sets whose complement is consistent.
	verified map[string]bool
	hitting  hittingSearch // the search for the cheapest hitting set, reused
	budget   int           // the work the explanation may spend
	halt     int           // the work at which the current step stops
	work     int           // the work spent
}

// explain fills the conflicts and the correction of an inconsistent set of
// active constraints. seed, when not nil, is a candidate small
// inconsistent subset (the constraints of a negative cycle).
func (s *solver) explain(active []int32, seed []int32, r *Result) error {
	e := &explainer{solver: s, active: s.byRank(active), verified: map[string]bool{}, budget: s.opt.maxWork()}
	s.keepUnary = true // every check reads the same sets
	defer func() { s.keepUnary, s.unary = false, nil }()
	if err := e.run(seed); err != nil && !errors.Is(err, errOutOfWork) {
		return err
	}
	for _, c := range e.conflicts {
		r.Conflicts = append(r.Conflicts, s.indicesByID(c))
	}
	slices.SortFunc(r.Conflicts, s.compareSets)
	r.ConflictsComplete = e.complete
	r.Correction = s.indicesByID(e.correction)
	r.BudgetSpent = !e.cheapest
	r.Work = e.work
	return nil
}

// run finds a first conflict, lists more with half of the budget, and
// looks for a correction with the rest.
func (e *explainer) run(seed []int32) error {
	e.halt = e.budget
	first, err := e.firstConflict(seed)
	if err != nil {
		return err
	}
	e.conflicts = [][]int32{first}
	e.halt = e.budget / 2
	e.complete, err = e.listConflicts()
	if err != nil && !errors.Is(err, errOutOfWork) {
		return err
	}
	return e.findCorrection()
}

// spend counts units of work, and fails when the current step's share of
// the budget is spent.
func (e *explainer) spend(units int) error {
	e.work += units
	if e.work > e.halt {
		return errOutOfWork
	}
	return nil
}

// check reports whether the constraints cs are consistent, counting the
// check and its search nodes as work; a search that passes its limit (the
// step's share of the budget, or Options.MaxNodes) ends the step.
func (e *explainer) check(cs []int32) (bool, []int32, error) {
	if err := e.spend(1); err != nil {
		return false, nil, err
	}
	before := e.nodes
	ok, cycle, err := e.consistent(cs, e.halt-e.work)
	e.work += e.nodes - before
	if errors.Is(err, ErrLimit) {
		return false, nil, errOutOfWork
	}
	return ok, cycle, err
}

// checkWithout reports whether the active constraints less the sorted set
// h are consistent, remembering the sets found to leave them so.
func (e *explainer) checkWithout(h []int32) (bool, error) {
	key := setKey(h)
	if e.verified[key] {
		return true, nil
	}
	ok, _, err := e.check(without(e.active, h))
	if ok {
		e.verified[key] = true
	}
	return ok, err
}

// firstConflict finds a minimal conflict, in the seed when it is
// inconsistent.
func (e *explainer) firstConflict(seed []int32) ([]int32, error) {
	cand := e.active
	if len(seed) > 0 {
		seed = e.byRank(seed)
		ok, _, err := e.check(seed)
		if err != nil {
			return nil, err
		}
		if !ok {
			cand = seed
		}
	}
	return e.quickXplain(cand)
}

// listConflicts adds conflicts until the list is complete or holds
// Options.MaxConflicts of them, and reports whether it is complete: the
// complement of every minimal hitting set of the conflicts is consistent.
func (e *explainer) listConflicts() (bool, error) {
	for len(e.conflicts) < e.opt.maxConflicts() {
		hs, capped, err := e.minimalHittingSets(e.conflicts)
		if err != nil || capped {
			return false, err
		}
		slices.SortFunc(hs, e.compareByCost)
		h, err := e.inconsistentComplement(hs)
		if err != nil || h == nil {
			return h == nil, err
		}
		m, err := e.quickXplain(without(e.active, h))
		if err != nil {
			return false, err
		}
		e.conflicts = append(e.conflicts, m)
	}
	// The cap is reached: the list is complete only if the duality check
	// passes.
	hs, capped, err := e.minimalHittingSets(e.conflicts)
	if err != nil || capped {
		return false, err
	}
	h, err := e.inconsistentComplement(hs)
	return err == nil && h == nil, err
}

// inconsistentComplement returns the first of the hitting sets whose
// complement is inconsistent, or nil when there is none.
func (e *explainer) inconsistentComplement(hs [][]int32) ([]int32, error) {
	for _, h := range hs {
		ok, err := e.checkWithout(h)
		if err != nil {
			return nil, err
		}
		if !ok {
			return h, nil
		}
	}
	return nil, nil
}

// findCorrection finds the cheapest correction with three quarters of the
// budget, and any correction with the rest when that runs out.
func (e *explainer) findCorrection() error {
	e.halt = e.budget * 3 / 4
	last, err := e.cheapestCorrection()
	if !errors.Is(err, errOutOfWork) {
		return err
	}
	e.halt = e.budget
	return e.anyCorrection(last)
}

// cheapestCorrection runs the implicit hitting-set loop: the cheapest
// hitting set of the conflicts known is the correction when its
// complement is consistent; else that complement holds another conflict.
// The loop is exact even when the reported list of conflicts is capped.
// When the budget runs out, it returns the last hitting set it tried.
func (e *explainer) cheapestCorrection() ([]int32, error) {
	all := slices.Clone(e.conflicts)
	for {
		h, cheapest, err := e.cheapestHittingSet(all)
		if err != nil {
			return nil, err
		}
		ok, err := e.checkWithout(h)
		if err != nil {
			return h, err
		}
		if ok {
			e.correction, e.cheapest = h, cheapest
			return nil, nil
		}
		if !cheapest {
			return h, errOutOfWork
		}
		m, err := e.quickXplain(without(e.active, h))
		if err != nil {
			return h, err
		}
		all = append(all, m)
		if len(e.conflicts) < e.opt.maxConflicts() {
			e.conflicts = append(e.conflicts, m)
		}
	}
}

// anyCorrection finds constraints whose removal restores consistency,
// perhaps not the cheapest: it keeps the constraints that stay consistent
// with those kept before them, the costliest first, then those outside
// the hitting set last tried, then in the order of their ids; it adds
// them in blocks, halving a block that fails, so that it takes about
// two checks per constraint removed for each halving.
func (e *explainer) anyCorrection(last []int32) error {
	order := slices.Clone(e.active) // by rank
	slices.SortStableFunc(order, func(a, b int32) int {
		if ca, cb := cost(e.n.cons[a].Tier), cost(e.n.cons[b].Tier); ca != cb {
			return cmp64(cb, ca)
		}
		_, inA := slices.BinarySearch(last, a)
		_, inB := slices.BinarySearch(last, b)
		switch {
		case inA && !inB:
			return 1
		case inB && !inA:
			return -1
		}
		return 0
	})
	var kept, removed []int32
	var grow func(block []int32) error
	grow = func(block []int32) error {
		ok, _, err := e.check(concat(kept, block))
		if err != nil {
			return err
		}
		switch {
		case ok:
			kept = append(kept, block...)
		case len(block) == 1:
			removed = append(removed, block[0])
		default:
			if err := grow(block[:len(block)/2]); err != nil {
				return err
			}
			return grow(block[len(block)/2:])
		}
		return nil
	}
	if err := grow(order); err != nil {
		return err
	}
	slices.Sort(removed)
	e.correction = removed
	return nil
}

// quickXplain returns a minimal inconsistent subset of the inconsistent
// constraints cs (Junker 2004), preferring constraints early in cs; it is
// sorted by index.
func (e *explainer) quickXplain(cs []int32) ([]int32, error) {
	var rec func(b, d, c []int32) ([]int32, error)
	rec = func(b, d, c []int32) ([]int32, error) {
		if len(d) > 0 {
			ok, _, err := e.check(b)
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

// byRank returns the constraints xs in the order of their ids, once each.
func (s *solver) byRank(xs []int32) []int32 {
	xs = slices.Clone(xs)
	slices.SortFunc(xs, func(a, b int32) int { return int(s.rank[a]) - int(s.rank[b]) })
	return slices.Compact(xs)
}

// indicesByID returns the constraints xs as indices, in the order of their
// ids.
func (s *solver) indicesByID(xs []int32) []int {
	out := make([]int, 0, len(xs))
	for _, x := range s.byRank(xs) {
		out = append(out, int(x))
	}
	return out
}

// compareSets orders sets of constraints, each in the order of their ids,
// by size and then by ids.
func (s *solver) compareSets(a, b []int) int {
	if len(a) != len(b) {
		return len(a) - len(b)
	}
	for i := range a {
		if a[i] != b[i] {
			return int(s.rank[a[i]]) - int(s.rank[b[i]])
		}
	}
	return 0
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
