package network

import "slices"

// This file holds bounds propagation: label correcting from the bounds a
// node has (after fixing alternatives, or to try one), the lookahead over
// the open choices, and the dominance tests that prune a node whose
// windows are already covered.

// change is a variable's window after propagating one alternative (or,
// in trial.touched, before it).
type change struct {
	v      int32
	lo, hi int64
}

// unit is a variable and a set of its values.
type unit struct {
	v int32
	s Set
}

// trial is the scratch of bounds propagation.
type trial struct {
	lo, up  []int64  // the bounds of a trial, copies of the node's
	touched []change // the variables a trial moved, with their bounds before it
	queue   []int32  // the nodes whose arcs are to be scanned
	queued  []bool   // per node: in the queue
	mark    []int32  // per node: the stamp of the last trial (or count) that met it
	stamp   int32
	count   []int32 // per node: how many alternatives of a choice narrow it
	units   []unit  // the variables every alternative of a choice narrows
}

// forecast is what the lookahead of a node learnt of its open choices.
type forecast struct {
	changes [][][]change // per open choice, per alternative: the windows it narrows
	sure    []bool       // per open choice: every propagation ran to its end
	cuts    cuts
}

// cuts holds, for each variable that every alternative of some open
// choice narrows, the union of those narrowed windows, intersected over
// the choices; sets[v] is valid where mark[v] == stamp.
type cuts struct {
	sets  []Set
	mark  []int32
	stamp int32
	vars  []int32 // the variables with a cut
}

// forget drops every cut.
func (c *cuts) forget() {
	c.stamp++
	c.vars = c.vars[:0]
}

// add cuts variable v to the values s.
func (c *cuts) add(v int32, s Set) {
	if c.mark[v] == c.stamp {
		c.sets[v] = intersectSets(c.sets[v], s)
		return
	}
	c.mark[v] = c.stamp
	c.sets[v] = s
	c.vars = append(c.vars, v)
}

// diffRange bounds to − from by the current bounds of both nodes.
func diffRange(g *stn, from, to int32) (int64, int64) {
	lo, hi := int64(-Inf), int64(Inf)
	if g.lo[to] > -Inf && g.up[from] < Inf {
		lo = g.lo[to] - g.up[from]
	}
	if g.up[to] < Inf && g.lo[from] > -Inf {
		hi = g.up[to] - g.lo[from]
	}
	return lo, hi
}

// repropagate brings the bounds up to date after arcs were added at the
// seed nodes, by label correcting from the current bounds along the
// graph. It returns false when the bounds cross, and sure = false when it
// gave up after its step budget (the bounds are then to be recomputed).
func (sr *search) repropagate(seeds []int32) (ok, sure bool) {
	g := &sr.g
	lo, up := g.lo, g.up
	k := len(sr.p.vars)
	floor := -int64(k+1) * Limit
	tr := &sr.trial
	if cap(tr.queued) < k {
		tr.queued = make([]bool, k)
	}
	inq := tr.queued[:k]
	q := tr.queue[:0]
	push := func(v int32) {
		if !inq[v] {
			inq[v] = true
			q = append(q, v)
		}
	}
	for _, v := range seeds {
		push(v)
	}
	budget := 4*k + 2*len(seeds) + 64
	ok, sure = true, true
	qi := 0
	for ; qi < len(q); qi++ {
		y := q[qi]
		inq[y] = false
		if qi > budget {
			sure = false
			break
		}
		if lo[y] > up[y] || up[y] < floor || lo[y] > -floor {
			ok = false
			break
		}
		if up[y] < Inf {
			for j := g.start[y]; j < g.start[y+1]; j++ {
				e := &g.arcs[j]
				if x := up[y] + e.w; x < up[e.to] {
					up[e.to] = x
					push(e.to)
				}
			}
		}
		if lo[y] > -Inf {
			for j := g.rstart[y]; j < g.rstart[y+1]; j++ {
				e := &g.arcs[g.rarcs[j]]
				if x := lo[y] - e.w; x > lo[e.from] {
					lo[e.from] = x
					push(e.from)
				}
			}
		}
	}
	for _, v := range q[min(qi, len(q)):] {
		inq[v] = false
	}
	tr.queue = q
	return ok, sure
}

// lookahead propagates the bounds of every alternative of every open
// choice from the current node. It drops the alternatives that fail,
// fixes the choices left with one (changed), and records in sr.ahead what
// each alternative narrows and the cuts of the variables. dead reports a
// choice with no alternative left.
func (sr *search) lookahead(st *nodeState) (changed, dead bool) {
	g := &sr.g
	k := len(sr.p.vars)
	tr, ah := &sr.trial, &sr.ahead
	tr.lo = append(tr.lo[:0], g.lo[:k]...)
	tr.up = append(tr.up[:0], g.up[:k]...)
	if cap(tr.count) < k {
		tr.count = make([]int32, k)
		tr.mark = make([]int32, k)
	}
	tr.count, tr.mark = tr.count[:k], tr.mark[:k]
	if len(ah.cuts.sets) < k {
		ah.cuts.sets = make([]Set, k)
		ah.cuts.mark = make([]int32, k)
	}
	ah.cuts.forget()
	ah.changes, ah.sure = ah.changes[:0], ah.sure[:0]
	var next [][]calt
	for _, alts := range st.open {
		var kept []calt
		var changes [][]change
		known := true
		for _, a := range alts {
			ok, sure, ch := sr.propagate(a)
			if !ok {
				continue
			}
			kept = append(kept, a)
			changes = append(changes, ch)
			known = known && sure
		}
		switch len(kept) {
		case 0:
			return false, true
		case 1:
			st.fixed = append(st.fixed[:len(st.fixed):len(st.fixed)], kept[0])
			changed = true
			continue
		}
		next = append(next, kept)
		ah.changes = append(ah.changes, changes)
		ah.sure = append(ah.sure, known)
		if known {
			sr.cutByChoice(changes, len(kept))
		}
	}
	st.open = next
	if changed {
		ah.cuts.forget() // the node will be solved again
	}
	return changed, false
}

// cutByChoice cuts each variable that every one of the alternatives of a
// choice narrows to the union of the windows they give it.
func (sr *search) cutByChoice(changes [][]change, alts int) {
	tr := &sr.trial
	tr.stamp++
	for _, ch := range changes {
		for _, c := range ch {
			if tr.mark[c.v] != tr.stamp {
				tr.mark[c.v], tr.count[c.v] = tr.stamp, 0
			}
			tr.count[c.v]++
		}
	}
	tr.units = tr.units[:0]
	for _, ch := range changes {
		for _, c := range ch {
			if tr.count[c.v] != int32(alts) {
				continue
			}
			j := 0
			for j < len(tr.units) && tr.units[j].v != c.v {
				j++
			}
			if j == len(tr.units) {
				tr.units = append(tr.units, unit{v: c.v})
			}
			tr.units[j].s = union(tr.units[j].s, Interval{c.lo, c.hi})
		}
	}
	for _, u := range tr.units {
		sr.ahead.cuts.add(u.v, u.s)
	}
}

// propagate adds alternative a to the current bounds and propagates them
// along the arcs. It returns false when the bounds cross (a cannot hold),
// and sure = false when it gave up after its step budget; the changes are
// the new windows of the variables it narrowed.
func (sr *search) propagate(a calt) (ok, sure bool, changes []change) {
	g := &sr.g
	tr := &sr.trial
	lo, up := tr.lo, tr.up
	k := len(sr.p.vars)
	floor := -int64(k+1) * Limit // no consistent bound lies beyond
	tr.touched = tr.touched[:0]
	tr.queue = tr.queue[:0]
	tr.stamp++
	if cap(tr.queued) < k {
		tr.queued = make([]bool, k)
	}
	inq := tr.queued[:k]
	mark := func(v int32) {
		if tr.mark[v] != tr.stamp {
			tr.mark[v] = tr.stamp
			tr.touched = append(tr.touched, change{v, lo[v], up[v]})
		}
		if !inq[v] {
			inq[v] = true
			tr.queue = append(tr.queue, v)
		}
	}
	setUp := func(v int32, x int64) {
		if x < up[v] {
			mark(v)
			up[v] = x
		}
	}
	setLo := func(v int32, x int64) {
		if x > lo[v] {
			mark(v)
			lo[v] = x
		}
	}
	alt := func() {
		f, t := a.from, a.to
		if a.hi < Inf {
			if up[f] < Inf {
				setUp(t, up[f]+a.hi)
			}
			if lo[t] > -Inf {
				setLo(f, lo[t]-a.hi)
			}
		}
		if a.lo > -Inf {
			if up[t] < Inf {
				setUp(f, up[t]-a.lo)
			}
			if lo[f] > -Inf {
				setLo(t, lo[f]+a.lo)
			}
		}
	}
	alt()
	ok, sure = true, true
	budget := 4*k + 64
	qi := 0
	for ; qi < len(tr.queue); qi++ {
		y := tr.queue[qi]
		inq[y] = false
		if lo[y] > up[y] || up[y] < floor || lo[y] > -floor {
			ok = false
			break
		}
		if qi > budget {
			sure = false
			break
		}
		if up[y] < Inf {
			for j := g.start[y]; j < g.start[y+1]; j++ {
				e := &g.arcs[j]
				setUp(e.to, up[y]+e.w)
			}
		}
		if lo[y] > -Inf {
			for j := g.rstart[y]; j < g.rstart[y+1]; j++ {
				e := &g.arcs[g.rarcs[j]]
				setLo(e.from, lo[y]-e.w)
			}
		}
		if y == a.from || y == a.to {
			alt()
		}
	}
	for _, v := range tr.queue[min(qi, len(tr.queue)):] {
		inq[v] = false
	}
	// Report and undo.
	if ok && sure {
		changes = make([]change, 0, len(tr.touched))
	}
	for _, c := range tr.touched {
		if ok && sure {
			changes = append(changes, change{c.v, lo[c.v], up[c.v]})
		}
		lo[c.v], up[c.v] = c.lo, c.hi
	}
	return ok, sure, changes
}

// dominated reports whether every variable's values at this node lie
// inside the union found so far; deeper choices could only narrow them.
// A variable's values are over-approximated by its window, cut by the
// union, over the alternatives of each open choice, of the windows that
// bounds propagation gives (so that a gap an open choice will open does
// not defeat the test).
func (sr *search) dominated() bool {
	g := &sr.g
	cuts := &sr.ahead.cuts
	for i := 1; i < len(sr.p.vars); i++ {
		if inside(sr.cover.dom[i], g.lo[i], g.up[i]) {
			continue
		}
		sr.uncovered = int32(i)
		if cuts.mark[i] != cuts.stamp {
			return false
		}
		for _, iv := range cuts.sets[i] {
			if !inside(sr.cover.dom[i], iv.Lo, iv.Hi) {
				return false
			}
		}
	}
	sr.uncovered = 0
	return true
}

// touches reports whether some alternative's changes move variable v.
func touches(changes [][]change, v int32) bool {
	for _, ch := range changes {
		for _, c := range ch {
			if c.v == v {
				return true
			}
		}
	}
	return false
}

// preview is what the lookahead of a node learnt about its children.
type preview struct {
	lo, up  []int64
	cuts    []unit     // sorted by variable
	changes [][]change // per alternative of the branching choice
}

// previewOf keeps what the lookahead learnt of the children of the open
// choice best, or nil when its propagation did not run to its end.
func (sr *search) previewOf(best int) *preview {
	if !sr.ahead.sure[best] {
		return nil
	}
	g := &sr.g
	k := len(sr.p.vars)
	cuts := &sr.ahead.cuts
	pre := &preview{lo: slices.Clone(g.lo[:k]), up: slices.Clone(g.up[:k]), changes: sr.ahead.changes[best]}
	pre.cuts = make([]unit, 0, len(cuts.vars))
	for _, v := range cuts.vars {
		pre.cuts = append(pre.cuts, unit{v, cuts.sets[v]})
	}
	slices.SortFunc(pre.cuts, func(a, b unit) int { return int(a.v - b.v) })
	return pre
}

// apply sets the graph's bounds to those of the child of alternative alt.
func (pre *preview) apply(g *stn, alt int) {
	g.lo = append(g.lo[:0], pre.lo...)
	g.up = append(g.up[:0], pre.up...)
	for _, c := range pre.changes[alt] {
		g.lo[c.v], g.up[c.v] = c.lo, c.hi
	}
}

// childDominated reports whether the windows of a child, as propagation
// predicts them, are all covered already.
func (sr *search) childDominated(pre *preview, alt int) bool {
	ch := pre.changes[alt]
	old := make([]change, len(ch))
	for j, c := range ch {
		old[j] = change{c.v, pre.lo[c.v], pre.up[c.v]}
		pre.lo[c.v], pre.up[c.v] = c.lo, c.hi
	}
	covered := true
	for i := 1; i < len(pre.lo) && covered; i++ {
		if inside(sr.cover.dom[i], pre.lo[i], pre.up[i]) {
			continue
		}
		j, ok := slices.BinarySearchFunc(pre.cuts, int32(i), func(u unit, v int32) int { return int(u.v - v) })
		if !ok {
			covered = false
			break
		}
		for _, iv := range intersectSets(pre.cuts[j].s, Set{{pre.lo[i], pre.up[i]}}) {
			if !inside(sr.cover.dom[i], iv.Lo, iv.Hi) {
				covered = false
				break
			}
		}
	}
	for _, c := range old {
		pre.lo[c.v], pre.up[c.v] = c.lo, c.hi
	}
	return covered
}
