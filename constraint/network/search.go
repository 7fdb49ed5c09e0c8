package network

import "fmt"

// This file holds the depth-first search over the choices of a component:
// its drivers (the domains of a solve, a consistency check), a node, the
// dive and the branching.

// domains solves the active constraints into r. It returns false (and
// perhaps the constraints of a negative cycle) when they are inconsistent.
func (s *solver) domains(active []int32, r *Result) (bool, []int32, error) {
	p := s.prepare(active)
	if p.empty >= 0 {
		return false, nil, nil
	}
	s.isolatedResult(p, r)
	for _, pr := range p.problems {
		sr, err := s.searchComponent(pr, true, s.opt.maxNodes())
		if err != nil || !sr.found {
			return false, sr.seed, err
		}
		for i, v := range pr.vars {
			if i == 0 {
				continue
			}
			r.domains[v] = sr.cover.dom[i]
			r.earliest[v] = sr.cover.early[i]
			r.latest[v] = sr.cover.late[i]
		}
	}
	return true, nil, nil
}

// consistent reports whether the given constraints are consistent, and on
// an inconsistent simple network the constraints of a negative cycle. It
// spends at most limit search nodes in all, and at most Options.MaxNodes
// on one component.
func (s *solver) consistent(active []int32, limit int) (bool, []int32, error) {
	if err := s.ctx.Err(); err != nil {
		return false, nil, fmt.Errorf("solve: %w", err)
	}
	p := s.prepare(active)
	if p.empty >= 0 {
		return false, nil, nil
	}
	for _, pr := range p.problems {
		sr, err := s.searchComponent(pr, false, min(limit, s.opt.maxNodes()))
		if err != nil || !sr.found {
			return false, sr.seed, err
		}
		limit -= sr.spent
	}
	return true, nil, nil
}

// searchComponent searches the choices of one component, for its domains
// (record) or for a solution, spending at most limit nodes.
func (s *solver) searchComponent(pr *problem, record bool, limit int) (*search, error) {
	sr := s.newSearch(pr, record, limit)
	return sr, sr.node(nil, pr.choices, false)
}

// search is the depth-first search over the choices of one component.
type search struct {
	*solver
	p      *problem
	record bool    // collect domains (else stop at the first solution)
	limit  int     // the most nodes the search may spend
	spent  int     // nodes of this search
	found  bool    // a consistent leaf was met
	seed   []int32 // the constraints of a negative cycle met at the root
	arcs   []arc   // scratch: the arcs of the scenario being solved

	cover     coverage // the windows of the consistent leaves
	trial     trial    // scratch of bounds propagation
	ahead     forecast // what the last lookahead learnt of the open choices
	uncovered int32    // a variable the last dominance test found uncovered, or 0
	dive      diveScratch
}

// diveScratch keeps a node's bounds while it dives, and the start of the
// dive's potential.
type diveScratch struct {
	lo, up []int64
	start  []int64
}

func (s *solver) newSearch(pr *problem, record bool, limit int) *search {
	sr := &search{solver: s, p: pr, record: record, limit: limit, arcs: make([]arc, 0, len(pr.base)+2*len(pr.choices)+4)}
	if record {
		sr.cover.init(len(pr.vars))
	}
	return sr
}

// nodeState is a node's choices while it settles.
type nodeState struct {
	fixed []calt   // the alternatives taken, by branching or as the last left
	open  [][]calt // the choices still open
	exact bool     // the graph's bounds were solved, not carried by propagation
}

// node solves the network of the base arcs and the fixed alternatives,
// propagates the open choices and branches on one of them. When the
// parent's lookahead already knows this node's bounds (given: they are in
// the graph's bound arrays), the node skips the full solve; a leaf always
// gets one, for its explanations and to rule out a negative cycle
// propagation missed.
func (sr *search) node(fixed []calt, open [][]calt, given bool) error {
	if err := sr.enter(); err != nil {
		return err
	}
	st := nodeState{fixed: fixed, open: open}
	if !sr.settle(&st, given) {
		return nil
	}
	if len(st.open) == 0 {
		if !st.exact && !sr.solveNode(false) {
			return nil
		}
		sr.found = true
		if sr.record {
			sr.leaf()
		}
		return nil
	}
	if !sr.record && sr.found {
		return nil
	}
	if sr.record && sr.dominated() {
		return nil
	}
	if sr.diveFrom(st.fixed, st.open) && (!sr.record || sr.dominated()) {
		// A consistent dive ends a consistency check at once.
		return nil
	}
	return sr.branch(st.fixed, st.open)
}

// enter counts a node against the search's limit, and now and then looks
// whether the caller gave up.
func (sr *search) enter() error {
	sr.nodes++
	sr.spent++
	if sr.spent > sr.limit {
		return fmt.Errorf("solve: %d search nodes: %w", sr.spent, ErrLimit)
	}
	if sr.nodes&1023 == 0 {
		if err := sr.ctx.Err(); err != nil {
			return fmt.Errorf("solve: %w", err)
		}
	}
	return nil
}

// settle brings a node to a fixed point: it brings the bounds up to date,
// narrows the open choices by them and looks one alternative ahead, again
// while that fixes a choice. It returns false when the node has no
// solution.
func (sr *search) settle(st *nodeState, given bool) bool {
	root := st.fixed == nil
	var seeds []int32 // ends of the alternatives fixed since the last bounds
	for {
		sr.buildScenario(st.fixed, nil)
		switch {
		case given:
			given = false
		case seeds != nil && !st.exact:
			// The bounds before the last fixes are valid labels: carry
			// on from them.
			ok, sure := sr.repropagate(seeds)
			if !ok || !sure && !sr.solveNode(false) {
				return false
			}
		default:
			if !sr.solveNode(root && len(st.open) == len(sr.p.choices)) {
				return false
			}
			st.exact = true
		}
		seeds = seeds[:0]
		nf := len(st.fixed)
		if !sr.narrowChoices(st) {
			return false
		}
		if len(st.fixed) > nf {
			seeds = appendEnds(seeds, st.fixed[nf:])
			continue
		}
		if len(st.open) == 0 {
			return true
		}
		// Look one alternative ahead: drop the alternatives whose bounds
		// propagation fails, fix a choice with one left.
		changed, dead := sr.lookahead(st)
		if dead {
			return false
		}
		seeds = appendEnds(seeds, st.fixed[nf:])
		if !changed {
			return true
		}
	}
}

// appendEnds appends the nodes that the alternatives relate.
func appendEnds(nodes []int32, alts []calt) []int32 {
	for _, a := range alts {
		nodes = append(nodes, a.from, a.to)
	}
	return nodes
}

// buildScenario builds the graph of the base arcs, the fixed alternatives
// and the first alternative of each of the given open choices.
func (sr *search) buildScenario(fixed []calt, open [][]calt) {
	sr.arcs = append(sr.arcs[:0], sr.p.base...)
	for _, a := range fixed {
		sr.arcs = a.arcs(sr.arcs)
	}
	for _, alts := range open {
		sr.arcs = alts[0].arcs(sr.arcs)
	}
	sr.g.build(len(sr.p.vars), sr.arcs)
}

// narrowChoices drops the alternatives of the open choices that the bounds
// exclude and the choices that the bounds entail, and fixes a choice left
// with one alternative. It returns false when a choice has none left.
func (sr *search) narrowChoices(st *nodeState) bool {
	g := &sr.g
	var next [][]calt
	for _, alts := range st.open {
		var kept []calt
		entailed := false
		for _, a := range alts {
			lo, hi := diffRange(g, a.from, a.to)
			if a.lo > hi || a.hi < lo {
				continue
			}
			if a.lo <= lo && hi <= a.hi {
				entailed = true
				break
			}
			kept = append(kept, a)
		}
		switch {
		case entailed:
		case len(kept) == 0:
			return false
		case len(kept) == 1:
			st.fixed = append(st.fixed[:len(st.fixed):len(st.fixed)], kept[0])
		default:
			next = append(next, kept)
		}
	}
	st.open = next
	return true
}

// solveNode computes the potential and the bounds of the graph built; on
// a negative cycle it returns false and, when asked, keeps the cycle's
// constraints as a seed for the conflicts.
func (sr *search) solveNode(keepSeed bool) bool {
	g := &sr.g
	ok, cyc := g.potential()
	if !ok {
		if keepSeed {
			for _, k := range cyc {
				sr.seed = append(sr.seed, g.arcs[k].tag)
			}
		}
		return false
	}
	g.bounds()
	return true
}

// diveFrom fixes every open choice to its first alternative and solves
// that scenario in one step; a consistent one is a leaf like any other.
// When the open choices do not touch the windows still uncovered, that
// leaf covers them and spares the descent through every level below.
func (sr *search) diveFrom(fixed []calt, open [][]calt) bool {
	g := &sr.g
	k := len(sr.p.vars)
	d := &sr.dive
	d.lo = append(d.lo[:0], g.lo[:k]...)
	d.up = append(d.up[:0], g.up[:k]...)
	sr.nodes++
	sr.spent++
	sr.buildScenario(fixed, open)
	// Bounds by label correcting from the node's; then a potential started
	// from them (upper bounds meet every arc between bounded nodes), to
	// rule out a negative cycle they cannot see; the shortest-path trees
	// only when the leaf moves an earliest or a latest.
	var seeds []int32
	for _, alts := range open {
		seeds = append(seeds, alts[0].from, alts[0].to)
	}
	ok, sure := sr.repropagate(seeds)
	switch {
	case ok && !sr.record:
		ok, _ = g.potential()
		sr.found = sr.found || ok
	case ok:
		if sure {
			d.start = d.start[:0]
			for _, x := range g.up[:k] {
				d.start = append(d.start, min(x, 2*int64(k+1)*Limit))
			}
			ok, _ = g.potentialFrom(d.start)
		} else {
			ok, _ = g.potential()
		}
		if ok {
			sr.recordDive(sure)
		}
	}
	g.lo = append(g.lo[:0], d.lo...)
	g.up = append(g.up[:0], d.up...)
	return ok
}

// recordDive adds the windows of a consistent dive to the domains,
// computing only the shortest-path trees of the sides it moves (all of
// them when its bounds were not sure).
func (sr *search) recordDive(sure bool) {
	g := &sr.g
	lower, upper := sr.cover.improves(g)
	switch {
	case !sure:
		g.bounds()
		sr.leaf()
	case lower || upper:
		g.side(lower, upper)
		sr.leafSides(lower, upper)
	default:
		sr.cover.unite(g)
	}
	sr.found = true
}

// branch tries each alternative of one open choice in turn.
func (sr *search) branch(fixed []calt, open [][]calt) error {
	g := &sr.g
	best := sr.branchChoice(open)
	rest := make([][]calt, 0, len(open)-1)
	rest = append(rest, open[:best]...)
	rest = append(rest, open[best+1:]...)
	// Keep what the lookahead knows of each child, to skip a child whose
	// windows are already covered without solving it.
	pre := sr.previewOf(best)
	for ai, a := range open[best] {
		if pre != nil {
			if sr.record && sr.childDominated(pre, ai) {
				continue
			}
			pre.apply(g, ai)
		}
		if err := sr.node(append(fixed[:len(fixed):len(fixed)], a), rest, pre != nil); err != nil {
			return err
		}
		if !sr.record && sr.found {
			return nil
		}
	}
	return nil
}

// branchChoice picks the open choice to branch on: one that moves the
// window found uncovered, so that the search settles what matters to it
// first; else the narrowest (the first of those).
func (sr *search) branchChoice(open [][]calt) int {
	best := -1
	if sr.record && sr.uncovered > 0 {
		for i, alts := range open {
			if sr.ahead.sure[i] && touches(sr.ahead.changes[i], sr.uncovered) && (best < 0 || len(alts) < len(open[best])) {
				best = i
			}
		}
	}
	if best < 0 {
		best = 0
		for i, alts := range open {
			if len(alts) < len(open[best]) {
				best = i
			}
		}
	}
	return best
}
