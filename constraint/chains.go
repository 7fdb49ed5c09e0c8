package constraint

import (
	"terminus/constraint/date"
	"terminus/constraint/network"
	"terminus/constraint/wording"
)

// This file reads the network's bounds back as chains of evidence, in
// linear space: the solver's explanation of a bound is the path of
// constraints from the reference point, and the paths of a chain of
// ordered events share their storage (each is its predecessor's with one
// constraint more). The chains read back share theirs the same way, so a
// case of ten thousand ordered events costs ten thousand steps, not fifty
// million.

// chainKey names one path of the solver: where its storage starts, its
// length, and the side it explains.
type chainKey struct {
	first *int
	n     int
	upper bool
}

// chainEntry is a path read back, and whether a longer path has already
// grown its slices in place (a second one must copy them).
type chainEntry struct {
	because  []string
	chain    []Step
	prec     wording.Precision
	extended bool
}

func keyOf(path []int, n int, upper bool) chainKey {
	return chainKey{first: &path[0], n: n, upper: upper}
}

// bound reads a network bound back: the day and the chain of evidence.
func (b *built) bound(nb network.Bound, upper bool) Bound {
	out := Bound{}
	if upper && nb.Value < network.Inf || !upper && nb.Value > -network.Inf {
		out.Day, out.Bounded = date.Day(nb.Value), true
	}
	path := nb.Because
	if len(path) == 0 {
		return out
	}
	if b.chains == nil {
		b.chains = map[chainKey]*chainEntry{}
	}
	// The longest prefix already read, then one step at a time.
	k := len(path)
	var e *chainEntry
	for ; k > 0; k-- {
		if c, ok := b.chains[keyOf(path, k, upper)]; ok {
			e = c
			break
		}
	}
	if e == nil {
		e = &chainEntry{prec: wording.Day}
	}
	for ; k < len(path); k++ {
		e = b.extend(e, path[k], upper)
		b.chains[keyOf(path, k+1, upper)] = e
	}
	out.Because, out.Chain, out.Precision = e.because, e.chain, e.prec
	return out
}

// extend makes the entry of a path one constraint longer than prev's.
func (b *built) extend(prev *chainEntry, i int, upper bool) *chainEntry {
	next := &chainEntry{because: prev.because, chain: prev.chain, prec: prev.prec}
	l, ok := b.link(i)
	if !ok {
		return next
	}
	if prev.extended { // the slices' room past their ends is taken: copy
		next.because = append([]string(nil), prev.because...)
		next.chain = append([]Step(nil), prev.chain...)
	}
	prev.extended = true
	if len(next.because) == 0 || next.because[len(next.because)-1] != l.evidence {
		next.because = append(next.because, l.evidence)
	}
	text := l.lower
	if upper {
		text = l.upper
	}
	next.chain = append(next.chain, Step{Evidence: l.evidence, Text: text.String()})
	next.prec = wording.Coarser(next.prec, l.precision)
	return next
}

// linkChains notes, for each event's bound at a tier, the event whose
// bound at that tier and side it continues: the last step of its chain is
// an order from that event, and that event's chain is its own less that
// step (the same storage, or the same length: the solver's explanation of
// a value reached through a tight order). A report may then write the
// bound as a reference to that one and its last step.
func (b *built) linkChains(events []EventResult, t network.Tier, paths [][2][]int) {
	owner := map[chainKey]int{}
	for i, p := range paths {
		for side, path := range p {
			if len(path) > 0 {
				owner[keyOf(path, len(path), side == 1)] = i
			}
		}
	}
	for i, p := range paths {
		w := events[i].Windows[t]
		if w == nil {
			continue
		}
		for side, path := range p {
			n := len(path)
			if n < 2 {
				continue
			}
			j, ok := owner[keyOf(path, n-1, side == 1)]
			if !ok {
				// The last step is an order from the event before (after,
				// for an upper bound) whose chain is one step shorter.
				l, isLink := b.link(path[n-1])
				if !isLink || !l.order {
					continue
				}
				j = l.before
				if side == 1 {
					j = l.after
				}
			}
			if j == i || events[j].Windows[t] == nil {
				continue
			}
			prev, bd := &events[j].Windows[t].Earliest, &w.Earliest
			if side == 1 {
				prev, bd = &events[j].Windows[t].Latest, &w.Latest
			}
			if len(prev.Chain) != len(bd.Chain)-1 {
				continue
			}
			bd.From, bd.Own = events[j].ID, len(prev.Chain)
		}
	}
}
