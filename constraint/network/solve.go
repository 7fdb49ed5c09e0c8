package network

import (
	"context"
	"fmt"
	"slices"
	"strings"
)

// Solve solves the network with every constraint whose tier is at most
// tier. It fails only when ctx is done or a search exceeds
// [Options.MaxNodes]; an inconsistent network is a Result, not an error.
func (n *Network) Solve(ctx context.Context, tier Tier, opt Options) (*Result, error) {
	return n.solveWith(ctx, tier, opt, n.ranks())
}

// SolveTiers solves the network at each of the tiers Hard, Firm and Soft,
// as three calls of [Network.Solve] would, sharing the work they have in
// common; the results are indexed by tier. An error names the tier.
func (n *Network) SolveTiers(ctx context.Context, opt Options) ([3]*Result, error) {
	var out [3]*Result
	rank := n.ranks()
	if n.allUnary() {
		return n.solveUnaryTiers(ctx, opt, rank)
	}
	for t := Hard; t <= Soft; t++ {
		r, err := n.solveWith(ctx, t, opt, rank)
		if err != nil {
			return [3]*Result{}, fmt.Errorf("solving the %s tier: %w", t, err)
		}
		out[t] = r
	}
	return out, nil
}

// allUnary reports whether every constraint bounds one variable: then
// each variable is solved by the intersection of its sets alone.
func (n *Network) allUnary() bool {
	for i := range n.cons {
		if _, ok := unaryOf(&n.cons[i]); !ok {
			return false
		}
	}
	return true
}

// solveUnaryTiers is SolveTiers for a network of unary constraints: each
// tier's sets are the last tier's, intersected with the constraints of the
// tier, which is what a fresh solve would compute (the intersection keeps
// the same tie-breaks in any order, by the ids' ranks). An inconsistent
// tier, and those after it, are solved afresh for their explanations.
func (n *Network) solveUnaryTiers(ctx context.Context, opt Options, rank []int32) ([3]*Result, error) {
	var out [3]*Result
	s := &solver{n: n, ctx: ctx, opt: opt, rank: rank}
	s.g.rank = rank
	p := &prepared{sets: make([][]piece, len(n.names)), empty: -1, isolated: make([]Var, 0, len(n.names)-1)}
	for v := 1; v < len(n.names); v++ {
		p.isolated = append(p.isolated, Var(v))
	}
	for t := Hard; t <= Soft; t++ {
		if err := ctx.Err(); err != nil {
			return [3]*Result{}, fmt.Errorf("solving the %s tier: solve: %w", t, err)
		}
		if p.empty < 0 {
			for ci := range n.cons {
				if c := &n.cons[ci]; c.Tier == t {
					s.addUnary(p, c, int32(ci))
				}
			}
		}
		if p.empty >= 0 {
			r, err := n.solveWith(ctx, t, opt, rank)
			if err != nil {
				return [3]*Result{}, fmt.Errorf("solving the %s tier: %w", t, err)
			}
			out[t] = r
			continue
		}
		r := &Result{Tier: t, Consistent: true}
		s.isolatedResult(p, r)
		out[t] = r
	}
	return out, nil
}

func (n *Network) solveWith(ctx context.Context, tier Tier, opt Options, rank []int32) (*Result, error) {
	if err := ctx.Err(); err != nil {
		return nil, fmt.Errorf("solve: %w", err)
	}
	s := &solver{n: n, ctx: ctx, opt: opt, rank: rank}
	s.g.rank = rank
	active := make([]int32, 0, len(n.cons))
	for i, c := range n.cons {
		if c.Tier <= tier {
			active = append(active, int32(i))
		}
	}
	r := &Result{Tier: tier}
	ok, seed, err := s.domains(active, r)
	if err != nil {
		return nil, err
	}
	r.Nodes = s.nodes
	r.Consistent = ok
	if ok {
		return r, nil
	}
	r.domains, r.earliest, r.latest = nil, nil, nil
	if err := s.explain(active, seed, r); err != nil {
		return nil, err
	}
	return r, nil
}

// solver holds what one call of Solve shares between its searches.
type solver struct {
	n     *Network
	ctx   context.Context
	opt   Options
	rank  []int32 // constraint index → rank of its id
	nodes int
	g     stn
}

func (n *Network) newSolver(ctx context.Context, opt Options) *solver {
	rank := n.ranks()
	s := &solver{n: n, ctx: ctx, opt: opt, rank: rank}
	s.g.rank = rank
	return s
}

// ranks maps each constraint index to the rank of its id in sorted order,
// which breaks ties the same way whatever order constraints were added in.
func (n *Network) ranks() []int32 {
	order := make([]int32, len(n.cons))
	for i := range order {
		order[i] = int32(i)
	}
	slices.SortFunc(order, func(a, b int32) int { return strings.Compare(n.cons[a].ID, n.cons[b].ID) })
	rank := make([]int32, len(n.cons))
	for r, i := range order {
		rank[i] = int32(r)
	}
	return rank
}

// piece is a run of a unary interval set with the constraints that set
// its ends (-1 for an unbounded end).
type piece struct {
	lo, hi       int64
	loTag, hiTag int32
}

// calt is an alternative in solver form over local nodes: lo <= to − from
// <= hi, with the constraints that set each side.
type calt struct {
	from, to     int32
	lo, hi       int64
	loTag, hiTag int32
}

func (a calt) arcs(out []arc) []arc {
	if a.hi < Inf {
		out = append(out, arc{a.from, a.to, a.hi, a.hiTag})
	}
	if a.lo > -Inf {
		out = append(out, arc{a.to, a.from, -a.lo, a.loTag})
	}
	return out
}

// problem is one component: local node 0 is the reference point and
// vars[i] the variable of local node i.
type problem struct {
	vars    []Var
	base    []arc
	choices [][]calt
}

// prepared is the active constraints in solver form.
type prepared struct {
	sets     [][]piece // per variable; nil when unconstrained
	empty    int       // a variable whose set is empty, or -1
	problems []*problem
	isolated []Var // variables solved by their set alone
}

// unaryOf reports whether every alternative of c bounds one and the same
// variable, and returns it.
func unaryOf(c *Constraint) (Var, bool) {
	v := Var(-1)
	for _, a := range c.Alts {
		var w Var
		switch {
		case a.From == Zero:
			w = a.To
		case a.To == Zero:
			w = a.From
		default:
			return 0, false
		}
		if v >= 0 && w != v {
			return 0, false
		}
		v = w
	}
	return v, true
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

// unarySet is the union of the alternatives of a unary constraint on v.
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
	out := make([]piece, 0, len(a)+len(b))
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
	return out
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

// addUnary intersects the set of the variable that the unary constraint
// c (index ci) bounds with c, and notes the first variable left empty.
func (s *solver) addUnary(p *prepared, c *Constraint, ci int32) {
	v, _ := unaryOf(c)
	if len(c.Alts) == 1 && p.sets[v] != nil {
		p.sets[v] = s.clip(p.sets[v], c, ci)
	} else {
		p.sets[v] = s.intersect(p.sets[v], unarySet(c, ci))
	}
	if len(p.sets[v]) == 0 && p.empty < 0 {
		p.empty = int(v)
	}
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

// prepare turns the active constraints into interval sets and components.
func (s *solver) prepare(active []int32) *prepared {
	n := s.n
	nv := len(n.names)
	p := &prepared{sets: make([][]piece, nv), empty: -1}
	var links []int32
	for _, ci := range active {
		c := &n.cons[ci]
		if _, ok := unaryOf(c); !ok {
			links = append(links, ci)
			continue
		}
		s.addUnary(p, c, ci)
	}
	if p.empty >= 0 {
		return p
	}
	if len(links) == 0 { // every variable stands alone
		p.isolated = make([]Var, 0, nv-1)
		for v := 1; v < nv; v++ {
			p.isolated = append(p.isolated, Var(v))
		}
		return p
	}
	parent := make([]int32, nv)
	for i := range parent {
		parent[i] = int32(i)
	}
	find := func(x int32) int32 {
		for parent[x] != x {
			parent[x] = parent[parent[x]]
			x = parent[x]
		}
		return x
	}
	join := func(a, b Var) {
		if a == Zero || b == Zero {
			return
		}
		ra, rb := find(int32(a)), find(int32(b))
		if ra != rb {
			parent[max(ra, rb)] = min(ra, rb)
		}
	}
	for _, ci := range links {
		first := Var(-1)
		for _, a := range n.cons[ci].Alts {
			for _, v := range [2]Var{a.From, a.To} {
				if v == Zero {
					continue
				}
				if first < 0 {
					first = v
				}
				join(first, v)
			}
		}
	}
	linked := make([]bool, nv)
	for _, ci := range links {
		for _, a := range n.cons[ci].Alts {
			linked[a.From], linked[a.To] = true, true
		}
	}
	// Number the components by their smallest variable.
	byRoot := map[int32]*problem{}
	local := make([]int32, nv)
	for v := 1; v < nv; v++ {
		if !linked[v] {
			p.isolated = append(p.isolated, Var(v))
			continue
		}
		r := find(int32(v))
		pr := byRoot[r]
		if pr == nil {
			pr = &problem{vars: []Var{Zero}}
			byRoot[r] = pr
			p.problems = append(p.problems, pr)
		}
		local[v] = int32(len(pr.vars))
		pr.vars = append(pr.vars, Var(v))
		set := p.sets[v]
		if len(set) == 0 {
			continue
		}
		lv := local[v]
		first, last := set[0], set[len(set)-1]
		hull := calt{0, lv, first.lo, last.hi, first.loTag, last.hiTag}
		pr.base = hull.arcs(pr.base)
		if len(set) > 1 {
			alts := make([]calt, len(set))
			for i, q := range set {
				alts[i] = calt{0, lv, q.lo, q.hi, q.loTag, q.hiTag}
			}
			pr.choices = append(pr.choices, alts)
		}
	}
	for _, ci := range links {
		c := &n.cons[ci]
		var v Var
		for _, a := range c.Alts {
			if a.From != Zero {
				v = a.From
			} else {
				v = a.To
			}
			break
		}
		pr := byRoot[find(int32(v))]
		alts := make([]calt, len(c.Alts))
		for i, a := range c.Alts {
			alts[i] = calt{local[a.From], local[a.To], a.Lo, a.Hi, ci, ci}
		}
		if len(alts) == 1 {
			pr.base = alts[0].arcs(pr.base)
		} else {
			pr.choices = append(pr.choices, alts)
		}
	}
	return p
}

// isolatedResult allocates r's per-variable answers and fills in those of
// the isolated variables (and of Zero) from their sets.
func (s *solver) isolatedResult(p *prepared, r *Result) {
	nv := len(s.n.names)
	r.domains = make([]Set, nv)
	r.earliest = make([]Bound, nv)
	r.latest = make([]Bound, nv)
	// The isolated variables' sets and explanations share one backing
	// array each (full slice expressions keep them apart).
	total := 1
	for _, v := range p.isolated {
		total += max(1, len(p.sets[v]))
	}
	ivs := make([]Interval, 1, total)
	r.domains[0] = ivs[0:1:1] // Zero is 0
	ids := make([]string, 0, 2*len(p.isolated))
	because := func(tag int32) []string {
		if tag < 0 {
			return nil
		}
		ids = append(ids, s.n.cons[tag].ID)
		return ids[len(ids)-1 : len(ids) : len(ids)]
	}
	for _, v := range p.isolated {
		set := p.sets[v]
		start := len(ivs)
		if set == nil {
			ivs = append(ivs, Interval{-Inf, Inf})
			r.domains[v] = ivs[start:len(ivs):len(ivs)]
			r.earliest[v] = Bound{Value: -Inf}
			r.latest[v] = Bound{Value: Inf}
			continue
		}
		for _, q := range set {
			ivs = append(ivs, Interval{q.lo, q.hi})
		}
		r.domains[v] = ivs[start:len(ivs):len(ivs)]
		r.earliest[v] = Bound{Value: set[0].lo, Because: because(set[0].loTag)}
		r.latest[v] = Bound{Value: set[len(set)-1].hi, Because: because(set[len(set)-1].hiTag)}
	}
}

// domains solves the active constraints into r. It returns false (and
// perhaps the constraints of a negative cycle) when they are inconsistent.
func (s *solver) domains(active []int32, r *Result) (bool, []int32, error) {
	p := s.prepare(active)
	if p.empty >= 0 {
		return false, nil, nil
	}
	s.isolatedResult(p, r)
	for _, pr := range p.problems {
		sr := &search{solver: s, p: pr, record: true, arcs: make([]arc, 0, len(pr.base)+2*len(pr.choices)+4)}
		sr.init()
		if err := sr.node(nil, pr.choices, false); err != nil {
			return false, nil, err
		}
		if !sr.found {
			return false, sr.seed, nil
		}
		for i, v := range pr.vars {
			if i == 0 {
				continue
			}
			r.domains[v] = sr.dom[i]
			r.earliest[v] = sr.early[i]
			r.latest[v] = sr.late[i]
		}
	}
	return true, nil, nil
}

// consistent reports whether the given constraints are consistent, and on
// an inconsistent simple network the constraints of a negative cycle.
func (s *solver) consistent(active []int32) (bool, []int32, error) {
	if err := s.ctx.Err(); err != nil {
		return false, nil, fmt.Errorf("solve: %w", err)
	}
	p := s.prepare(active)
	if p.empty >= 0 {
		return false, nil, nil
	}
	for _, pr := range p.problems {
		sr := &search{solver: s, p: pr, arcs: make([]arc, 0, len(pr.base)+2*len(pr.choices)+4)}
		if err := sr.node(nil, pr.choices, false); err != nil {
			return false, nil, err
		}
		if !sr.found {
			return false, sr.seed, nil
		}
	}
	return true, nil, nil
}

// search is the depth-first search over the choices of one component.
type search struct {
	*solver
	p      *problem
	record bool // collect domains (else stop at the first solution)
	spent  int  // nodes of this search, against Options.MaxNodes
	found  bool
	seed   []int32
	arcs   []arc

	dom         []Set
	early, late []Bound
	memo        [][]string
	extended    []bool

	// lookahead
	tlo, tup      []int64
	count, cstamp []int32
	stamp         int32
	touched       []change
	queue         []int32
	refSets       []Set   // per variable, valid where refMark == refStamp
	refMark       []int32 // the lookahead's cut of each variable's values
	refStamp      int32
	refVars       []int32
	laChanges     [][][]change // per choice left open, per alternative
	laSure        []bool
	failVar       int32 // a variable the last dominance test found uncovered
	inq           []bool
	init0         []int64
	units         []unit
	saveLo        []int64
	saveUp        []int64
}

func (sr *search) init() {
	k := len(sr.p.vars)
	sr.dom = make([]Set, k)
	sr.early = make([]Bound, k)
	sr.late = make([]Bound, k)
	for i := range sr.early {
		sr.early[i].Value = Inf
		sr.late[i].Value = -Inf
	}
}

// node solves the network of the base arcs and the fixed alternatives,
// propagates the open choices and branches on the narrowest one. When the
// parent's lookahead already knows this node's bounds (given: they are in
// the graph's bound arrays), the node skips the full solve; a leaf always gets one, for its
// explanations and to rule out a negative cycle propagation missed.
func (sr *search) node(fixed []calt, open [][]calt, given bool) error {
	sr.nodes++
	sr.spent++
	if sr.spent > sr.opt.maxNodes() {
		return fmt.Errorf("solve: %d search nodes: %w", sr.spent, ErrLimit)
	}
	if sr.nodes&1023 == 0 {
		if err := sr.ctx.Err(); err != nil {
			return fmt.Errorf("solve: %w", err)
		}
	}
	g := &sr.g
	root := fixed == nil
	exact := false
	var seeds []int32 // ends of the alternatives fixed since the last bounds
	for {
		sr.arcs = append(sr.arcs[:0], sr.p.base...)
		for _, a := range fixed {
			sr.arcs = a.arcs(sr.arcs)
		}
		g.build(len(sr.p.vars), sr.arcs)
		switch {
		case given:
			given = false
		case seeds != nil && !exact:
			// The bounds before the last fixes are valid labels: carry
			// on from them.
			ok, sure := sr.repropagate(seeds)
			if !ok {
				return nil
			}
			if !sure && !sr.solveNode(false) {
				return nil
			}
			exact = exact && sure
		default:
			if !sr.solveNode(root && len(open) == len(sr.p.choices)) {
				return nil
			}
			exact = true
		}
		seeds = seeds[:0]
		changed := false
		var next [][]calt
		for _, alts := range open {
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
				return nil
			case len(kept) == 1:
				fixed = append(fixed[:len(fixed):len(fixed)], kept[0])
				seeds = append(seeds, kept[0].from, kept[0].to)
				changed = true
			default:
				next = append(next, kept)
			}
		}
		open = next
		if changed {
			continue
		}
		if len(open) == 0 {
			break
		}
		// Look one alternative ahead: drop the alternatives whose bounds
		// propagation fails, fix a choice with one left.
		var dead bool
		nf := len(fixed)
		open, fixed, changed, dead = sr.lookahead(open, fixed)
		if dead {
			return nil
		}
		for _, a := range fixed[nf:] {
			seeds = append(seeds, a.from, a.to)
		}
		if !changed {
			break
		}
	}
	if len(open) == 0 {
		if !exact && !sr.solveNode(false) {
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
	if sr.dive(fixed, open) && (!sr.record || sr.dominated()) {
		// A consistent dive ends a consistency check at once.
		return nil
	}
	// Branch on a choice that moves the window found uncovered, so that
	// the search settles what matters to it first; else on the narrowest.
	best := -1
	if sr.record && sr.failVar > 0 {
		for i, alts := range open {
			if sr.laSure[i] && touches(sr.laChanges[i], sr.failVar) && (best < 0 || len(alts) < len(open[best])) {
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
	rest := make([][]calt, 0, len(open)-1)
	rest = append(rest, open[:best]...)
	rest = append(rest, open[best+1:]...)
	// Keep what the lookahead knows of each child, to skip a child whose
	// windows are already covered without solving it.
	var pre *preview
	if sr.laSure[best] {
		pre = &preview{
			lo: slices.Clone(g.lo[:len(sr.p.vars)]), up: slices.Clone(g.up[:len(sr.p.vars)]),
			refined: sr.refinedList(), changes: sr.laChanges[best],
		}
	}
	for ai, a := range open[best] {
		if pre != nil {
			if sr.record && sr.childDominated(pre, ai) {
				continue
			}
			g.lo = append(g.lo[:0], pre.lo...)
			g.up = append(g.up[:0], pre.up...)
			for _, c := range pre.changes[ai] {
				g.lo[c.v], g.up[c.v] = c.lo, c.hi
			}
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

// dive fixes every open choice to its first alternative and solves that
// scenario in one step; a consistent one is a leaf like any other. When
// the open choices do not touch the windows still uncovered, that leaf
// covers them and spares the descent through every level below.
func (sr *search) dive(fixed []calt, open [][]calt) bool {
	g := &sr.g
	k := len(sr.p.vars)
	sr.saveLo = append(sr.saveLo[:0], g.lo[:k]...)
	sr.saveUp = append(sr.saveUp[:0], g.up[:k]...)
	sr.arcs = append(sr.arcs[:0], sr.p.base...)
	for _, a := range fixed {
		sr.arcs = a.arcs(sr.arcs)
	}
	for _, alts := range open {
		sr.arcs = alts[0].arcs(sr.arcs)
	}
	sr.nodes++
	sr.spent++
	g.build(k, sr.arcs)
	// Bounds by label correcting from the node's; then a potential started
	// from them (upper bounds meet every arc between bounded nodes), to
	// rule out a negative cycle they cannot see; the shortest-path trees
	// only when the leaf moves an earliest or a latest.
	var seeds []int32
	for _, alts := range open {
		seeds = append(seeds, alts[0].from, alts[0].to)
	}
	ok, sure := sr.repropagate(seeds)
	if ok && !sr.record {
		ok, _ = g.potential()
		sr.found = sr.found || ok
		g.lo = append(g.lo[:0], sr.saveLo...)
		g.up = append(g.up[:0], sr.saveUp...)
		return ok
	}
	if ok {
		if sure {
			sr.init0 = sr.init0[:0]
			for _, x := range g.up[:k] {
				sr.init0 = append(sr.init0, min(x, 2*int64(k+1)*Limit))
			}
			ok, _ = g.potentialFrom(sr.init0)
		} else {
			ok, _ = g.potential()
		}
	}
	if ok {
		lower, upper := sr.improves()
		switch {
		case !sure:
			g.bounds()
			sr.leaf()
		case lower || upper:
			g.side(lower, upper)
			sr.leafSides(lower, upper)
		default:
			sr.unite()
		}
		sr.found = true
	}
	g.lo = append(g.lo[:0], sr.saveLo...)
	g.up = append(g.up[:0], sr.saveUp...)
	return ok
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
	if cap(sr.inq) < k {
		sr.inq = make([]bool, k)
	}
	inq := sr.inq[:k]
	q := sr.queue[:0]
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
	sr.queue = q
	return ok, sure
}

// improves reports whether the current bounds would move an earliest (a
// latest); only then is the lower (upper) shortest-path tree needed.
func (sr *search) improves() (lower, upper bool) {
	g := &sr.g
	for i := 1; i < len(sr.p.vars); i++ {
		lower = lower || g.lo[i] < sr.early[i].Value
		upper = upper || g.up[i] > sr.late[i].Value
	}
	return lower, upper
}

// unite adds the current windows to the domains.
func (sr *search) unite() {
	g := &sr.g
	for v := 1; v < len(sr.p.vars); v++ {
		if !inside(sr.dom[v], g.lo[v], g.up[v]) {
			sr.dom[v] = union(sr.dom[v], Interval{g.lo[v], g.up[v]})
		}
	}
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

// preview is what the lookahead of a node learnt about its children.
type preview struct {
	lo, up  []int64
	refined []unit     // sorted by variable
	changes [][]change // per alternative of the branching choice
}

// refinedList copies the lookahead's cuts, sorted by variable.
func (sr *search) refinedList() []unit {
	out := make([]unit, 0, len(sr.refVars))
	for _, v := range sr.refVars {
		out = append(out, unit{v, sr.refSets[v]})
	}
	slices.SortFunc(out, func(a, b unit) int { return int(a.v - b.v) })
	return out
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
		if inside(sr.dom[i], pre.lo[i], pre.up[i]) {
			continue
		}
		j, ok := slices.BinarySearchFunc(pre.refined, int32(i), func(u unit, v int32) int { return int(u.v - v) })
		if !ok {
			covered = false
			break
		}
		for _, iv := range intersectSets(pre.refined[j].s, Set{{pre.lo[i], pre.up[i]}}) {
			if !inside(sr.dom[i], iv.Lo, iv.Hi) {
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

// dominated reports whether every variable's values at this node lie
// inside the union found so far; deeper choices could only narrow them.
// A variable's values are over-approximated by its window, cut by the
// union, over the alternatives of each open choice, of the windows that
// bounds propagation gives (so that a gap an open choice will open does
// not defeat the test).
func (sr *search) dominated() bool {
	g := &sr.g
	for i := 1; i < len(sr.p.vars); i++ {
		if inside(sr.dom[i], g.lo[i], g.up[i]) {
			continue
		}
		sr.failVar = int32(i)
		if sr.refMark[i] != sr.refStamp {
			return false
		}
		for _, iv := range sr.refSets[i] {
			if !inside(sr.dom[i], iv.Lo, iv.Hi) {
				return false
			}
		}
	}
	sr.failVar = 0
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

// unit is a variable and a set of its values.
type unit struct {
	v int32
	s Set
}

// change is a variable's window after propagating one alternative.
type change struct {
	v      int32
	lo, hi int64
}

// lookahead propagates the bounds of every alternative of every open
// choice from the current node. It drops the alternatives that fail,
// fixes the choices left with one, and records in sr.refined, for each
// variable that every alternative of some choice narrows, the union of
// those narrowed windows (intersected over the choices).
func (sr *search) lookahead(open [][]calt, fixed []calt) (next [][]calt, fx []calt, changed, dead bool) {
	g := &sr.g
	k := len(sr.p.vars)
	sr.tlo = append(sr.tlo[:0], g.lo[:k]...)
	sr.tup = append(sr.tup[:0], g.up[:k]...)
	if cap(sr.count) < k {
		sr.count = make([]int32, k)
		sr.cstamp = make([]int32, k)
	}
	sr.count, sr.cstamp = sr.count[:k], sr.cstamp[:k]
	if len(sr.refSets) < k {
		sr.refSets = make([]Set, k)
		sr.refMark = make([]int32, k)
	}
	sr.refStamp++
	sr.refVars = sr.refVars[:0]
	fx = fixed
	sr.laChanges, sr.laSure = sr.laChanges[:0], sr.laSure[:0]
	for _, alts := range open {
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
			return nil, nil, false, true
		case 1:
			fx = append(fx[:len(fx):len(fx)], kept[0])
			changed = true
			continue
		}
		next = append(next, kept)
		sr.laChanges = append(sr.laChanges, changes)
		sr.laSure = append(sr.laSure, known)
		if !known {
			continue
		}
		// Variables narrowed by every alternative.
		sr.stamp++
		for _, ch := range changes {
			for _, c := range ch {
				if sr.cstamp[c.v] != sr.stamp {
					sr.cstamp[c.v], sr.count[c.v] = sr.stamp, 0
				}
				sr.count[c.v]++
			}
		}
		sr.units = sr.units[:0]
		for _, ch := range changes {
			for _, c := range ch {
				if sr.count[c.v] != int32(len(kept)) {
					continue
				}
				j := 0
				for j < len(sr.units) && sr.units[j].v != c.v {
					j++
				}
				if j == len(sr.units) {
					sr.units = append(sr.units, unit{v: c.v})
				}
				sr.units[j].s = union(sr.units[j].s, Interval{c.lo, c.hi})
			}
		}
		for _, u := range sr.units {
			if sr.refMark[u.v] == sr.refStamp {
				sr.refSets[u.v] = intersectSets(sr.refSets[u.v], u.s)
				continue
			}
			sr.refMark[u.v] = sr.refStamp
			sr.refSets[u.v] = u.s
			sr.refVars = append(sr.refVars, u.v)
		}
	}
	if changed {
		sr.refStamp++ // forget the cuts: the node will be solved again
		sr.refVars = sr.refVars[:0]
	}
	return next, fx, changed, false
}

// propagate adds alternative a to the current bounds and propagates them
// along the arcs. It returns false when the bounds cross (a cannot hold),
// and sure = false when it gave up after its step budget; the changes are
// the new windows of the variables it narrowed.
func (sr *search) propagate(a calt) (ok, sure bool, changes []change) {
	g := &sr.g
	lo, up := sr.tlo, sr.tup
	k := len(sr.p.vars)
	floor := -int64(k+1) * Limit // no consistent bound lies beyond
	sr.touched = sr.touched[:0]
	sr.queue = sr.queue[:0]
	sr.stamp++
	if cap(sr.inq) < k {
		sr.inq = make([]bool, k)
	}
	inq := sr.inq[:k]
	mark := func(v int32) {
		if sr.cstamp[v] != sr.stamp {
			sr.cstamp[v] = sr.stamp
			sr.touched = append(sr.touched, change{v, lo[v], up[v]})
		}
		if !inq[v] {
			inq[v] = true
			sr.queue = append(sr.queue, v)
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
	for ; qi < len(sr.queue); qi++ {
		y := sr.queue[qi]
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
	for _, v := range sr.queue[min(qi, len(sr.queue)):] {
		inq[v] = false
	}
	// Report and undo.
	if ok && sure {
		changes = make([]change, 0, len(sr.touched))
	}
	for _, c := range sr.touched {
		if ok && sure {
			changes = append(changes, change{c.v, lo[c.v], up[c.v]})
		}
		lo[c.v], up[c.v] = c.lo, c.hi
	}
	return ok, sure, changes
}

func inside(s Set, lo, hi int64) bool {
	for _, iv := range s {
		if iv.Lo <= lo && hi <= iv.Hi {
			return true
		}
	}
	return false
}

// leaf adds the windows of a solved scenario to the domains.
func (sr *search) leaf() { sr.leafSides(true, true) }

// leafSides is leaf for the lower bounds, the upper ones, or both, whose
// shortest-path trees are up to date.
func (sr *search) leafSides(lower, upper bool) {
	g := &sr.g
	k := len(sr.p.vars)
	for pass := 0; pass < 2; pass++ {
		if (pass == 0 && !lower) || (pass == 1 && !upper) {
			continue
		}
		sr.memo = sr.memo[:0]
		for range k {
			sr.memo = append(sr.memo, nil)
		}
		if cap(sr.extended) < k {
			sr.extended = make([]bool, k)
		}
		sr.extended = sr.extended[:k]
		clear(sr.extended)
		sr.memo[0] = []string{}
		for v := 1; v < k; v++ {
			var val, old int64
			var b *Bound
			if pass == 0 {
				val, b = g.lo[v], &sr.early[v]
				old = b.Value
				if val > old {
					continue
				}
			} else {
				val, b = g.up[v], &sr.late[v]
				old = b.Value
				if val < old {
					continue
				}
			}
			if val == old {
				// A tie with an earlier scenario: only a shorter
				// explanation replaces the first found.
				hops := g.upHops[v]
				if pass == 0 {
					hops = g.loHops[v]
				}
				if int(hops) >= len(b.Because) {
					continue
				}
			}
			why := sr.path(int32(v), pass == 0)
			if val == old && !betterWhy(why, b.Because) {
				continue
			}
			*b = Bound{Value: val, Because: why[:len(why):len(why)]}
		}
	}
	sr.unite()
}

// path returns the constraint ids on the tree path from the reference
// point to v, sharing storage with the paths of v's ancestors.
func (sr *search) path(v int32, lower bool) []string {
	g := &sr.g
	via := g.upArc
	if lower {
		via = g.loArc
	}
	if via[v] < 0 {
		return nil
	}
	var stack []int32
	x := v
	for sr.memo[x] == nil {
		stack = append(stack, x)
		a := &g.arcs[via[x]]
		if lower {
			x = a.to
		} else {
			x = a.from
		}
	}
	for i := len(stack) - 1; i >= 0; i-- {
		y := stack[i]
		id := sr.n.cons[g.arcs[via[y]].tag].ID
		pp := sr.memo[x]
		if !sr.extended[x] {
			sr.extended[x] = true
			sr.memo[y] = append(pp, id)
		} else {
			q := make([]string, len(pp)+1)
			copy(q, pp)
			q[len(pp)] = id
			sr.memo[y] = q
		}
		x = y
	}
	return sr.memo[v]
}

// betterWhy prefers the shorter explanation, then the smaller ids.
func betterWhy(a, b []string) bool {
	if len(a) != len(b) {
		return len(a) < len(b)
	}
	return slices.Compare(a, b) < 0
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
