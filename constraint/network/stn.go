package network

// This file holds the simple temporal network engine: a distance graph in
// compressed rows, a feasible potential by the Goldberg–Radzik method
// (A. V. Goldberg and T. Radzik, "A heuristic improvement of the
// Bellman-Ford algorithm", Applied Mathematics Letters 6, 1993), negative
// cycles from the parent graph, and bounds from and to the reference point
// by Dijkstra's method on reduced costs (Johnson's reweighting).

// arc is an edge of the distance graph: to - from <= w. tag is the index
// of the constraint it comes from.
type arc struct {
	from, to int32
	w        int64
	tag      int32
}

// stn is a distance graph over nodes 0..n-1; node 0 is the reference point.
type stn struct {
	n      int
	start  []int32 // forward rows: arcs[start[u]:start[u+1]] leave u
	arcs   []arc
	rstart []int32 // reverse rows: rarcs index arcs entering v
	rarcs  []int32

	pi      []int64 // feasible potential
	pred    []int32 // parent arc of each node while labelling, -1 for none
	inB     []bool
	seen    []int32
	stack   []int32
	order   []int32
	b, next []int32
	iter    []int32

	// bounds
	up, lo       []int64 // d(0→v) and −d(v→0), ±Inf when unbounded
	upArc, loArc []int32 // arc into v on the tree (index into arcs), -1 at the root or when unbounded
	hops         []int32
	upHops       []int32 // steps of the path that sets up, and lo
	loHops       []int32
	heap         []hentry
	rank         []int32 // constraint index → rank of its id, for ties
}

type hentry struct {
	d    int64
	hops int32
	node int32
}

// build fills the graph from arcs, keeping their order within each row.
func (g *stn) build(n int, as []arc) {
	g.n = n
	g.start = resize32(g.start, n+1)
	g.rstart = resize32(g.rstart, n+1)
	clear(g.start)
	clear(g.rstart)
	for _, a := range as {
		g.start[a.from+1]++
		g.rstart[a.to+1]++
	}
	for i := 0; i < n; i++ {
		g.start[i+1] += g.start[i]
		g.rstart[i+1] += g.rstart[i]
	}
	if cap(g.arcs) < len(as) {
		g.arcs = make([]arc, len(as))
		g.rarcs = make([]int32, len(as))
	}
	g.arcs = g.arcs[:len(as)]
	g.rarcs = g.rarcs[:len(as)]
	g.iter = resize32(g.iter, n)
	copy(g.iter, g.start[:n])
	for _, a := range as {
		g.arcs[g.iter[a.from]] = a
		g.iter[a.from]++
	}
	copy(g.iter, g.rstart[:n])
	for i, a := range g.arcs {
		g.rarcs[g.iter[a.to]] = int32(i)
		g.iter[a.to]++
	}
}

func resize32(s []int32, n int) []int32 {
	if cap(s) < n {
		return make([]int32, n)
	}
	return s[:n]
}

func resize64(s []int64, n int) []int64 {
	if cap(s) < n {
		return make([]int64, n)
	}
	return s[:n]
}

// potential computes a feasible potential (a solution) in g.pi. On a
// negative cycle it returns false and the arcs of the cycle.
func (g *stn) potential() (bool, []int32) { return g.potentialFrom(nil) }

// potentialFrom starts the labels from init (nil: all 0) instead; any
// start works (it is the weight of a virtual source's arc to each node),
// and a start that already meets most arcs leaves little to do.
func (g *stn) potentialFrom(init []int64) (bool, []int32) {
	n := g.n
	g.pi = resize64(g.pi, n)
	g.pred = resize32(g.pred, n)
	g.seen = resize32(g.seen, n)
	if cap(g.inB) < n {
		g.inB = make([]bool, n)
	}
	g.inB = g.inB[:n]
	clear(g.pi)
	if init != nil {
		copy(g.pi, init)
	}
	clear(g.seen)
	for i := range g.pred {
		g.pred[i] = -1
	}
	g.b = g.b[:0]
	for u := 0; u < n; u++ {
		g.b = append(g.b, int32(u))
		g.inB[u] = true
	}
	stamp := int32(0)
	for len(g.b) > 0 {
		// Keep the nodes of B with an arc of negative reduced cost, then
		// order everything reachable from them over arcs of non-positive
		// reduced cost, parents first.
		g.order = g.order[:0]
		stamp++
		for _, u := range g.b {
			g.inB[u] = false
			if g.seen[u] == stamp || !g.hasNegative(u) {
				continue
			}
			g.dfs(u, stamp)
		}
		// g.order holds a post-order; scan it backwards.
		g.next = g.next[:0]
		for i := len(g.order) - 1; i >= 0; i-- {
			u := g.order[i]
			pu := g.pi[u]
			for k := g.start[u]; k < g.start[u+1]; k++ {
				a := &g.arcs[k]
				if d := pu + a.w; d < g.pi[a.to] {
					g.pi[a.to] = d
					g.pred[a.to] = k
					if !g.inB[a.to] {
						g.inB[a.to] = true
						g.next = append(g.next, a.to)
					}
				}
			}
		}
		if len(g.next) > 0 {
			if cyc := g.parentCycle(g.next); cyc != nil {
				for _, u := range g.next {
					g.inB[u] = false
				}
				return false, cyc
			}
		}
		g.b, g.next = g.next, g.b
	}
	return true, nil
}

func (g *stn) hasNegative(u int32) bool {
	pu := g.pi[u]
	for k := g.start[u]; k < g.start[u+1]; k++ {
		a := &g.arcs[k]
		if pu+a.w < g.pi[a.to] {
			return true
		}
	}
	return false
}

// dfs appends to g.order, in post-order, the nodes reachable from root
// over arcs of non-positive reduced cost.
func (g *stn) dfs(root int32, stamp int32) {
	g.iter = resize32(g.iter, g.n)
	g.stack = append(g.stack[:0], root)
	g.seen[root] = stamp
	g.iter[root] = g.start[root]
	for len(g.stack) > 0 {
		u := g.stack[len(g.stack)-1]
		k := g.iter[u]
		pushed := false
		for ; k < g.start[u+1]; k++ {
			a := &g.arcs[k]
			if g.seen[a.to] != stamp && g.pi[u]+a.w <= g.pi[a.to] {
				g.seen[a.to] = stamp
				g.iter[u] = k + 1
				g.iter[a.to] = g.start[a.to]
				g.stack = append(g.stack, a.to)
				pushed = true
				break
			}
		}
		if !pushed {
			g.stack = g.stack[:len(g.stack)-1]
			g.order = append(g.order, u)
		}
	}
}

// parentCycle looks for a cycle in the parent graph reached from the given
// nodes; a parent-graph cycle of a labelling method is a negative cycle.
func (g *stn) parentCycle(from []int32) []int32 {
	// seen holds walk marks: >0 for the walk that visited a node, <0 done.
	mark := g.iter
	mark = resize32(mark, g.n)
	clear(mark)
	for w, s := range from {
		id := int32(w + 1)
		x := s
		for x >= 0 && mark[x] == 0 {
			mark[x] = id
			if p := g.pred[x]; p >= 0 {
				x = g.arcs[p].from
			} else {
				x = -1
			}
		}
		if x >= 0 && mark[x] == id {
			// x lies on a cycle; collect its arcs.
			var cyc []int32
			y := x
			for {
				p := g.pred[y]
				cyc = append(cyc, p)
				y = g.arcs[p].from
				if y == x {
					break
				}
			}
			return cyc
		}
		for y := s; y >= 0 && mark[y] == id; {
			mark[y] = -1
			if p := g.pred[y]; p >= 0 {
				y = g.arcs[p].from
			} else {
				y = -1
			}
		}
	}
	return nil
}

// bounds computes, from a feasible potential, the upper bounds d(0→v)
// and the lower bounds −d(v→0) with their shortest-path trees.
func (g *stn) bounds() { g.side(true, true) }

// side computes the lower bounds, the upper ones, or both.
func (g *stn) side(lower, upper bool) {
	n := g.n
	g.up = resize64(g.up, n)
	g.lo = resize64(g.lo, n)
	g.upArc = resize32(g.upArc, n)
	g.loArc = resize32(g.loArc, n)
	g.hops = resize32(g.hops, n)
	if upper {
		g.dijkstra(false)
		g.upHops = append(g.upHops[:0], g.hops...)
	}
	if lower {
		g.dijkstra(true)
		g.loHops = append(g.loHops[:0], g.hops...)
	}
}

// dijkstra runs from node 0 over the arcs (reverse: against them) with the
// reduced costs w + pi[from] − pi[to] >= 0, keyed by (distance, hops); a
// tie on both is broken by the smaller rank of the arc's constraint.
func (g *stn) dijkstra(reverse bool) {
	n := g.n
	dist, via := g.up, g.upArc
	if reverse {
		dist, via = g.lo, g.loArc
	}
	for i := 0; i < n; i++ {
		dist[i] = Inf
		via[i] = -1
		g.hops[i] = 0
	}
	// dist holds reduced distances while running; done nodes are marked
	// by seen == -2.
	g.seen = resize32(g.seen, n)
	clear(g.seen)
	dist[0] = 0
	g.heap = append(g.heap[:0], hentry{0, 0, 0})
	for len(g.heap) > 0 {
		e := g.heapPop()
		u := e.node
		if g.seen[u] == -2 || e.d != dist[u] || e.hops != g.hops[u] {
			continue
		}
		g.seen[u] = -2
		if !reverse {
			for k := g.start[u]; k < g.start[u+1]; k++ {
				a := &g.arcs[k]
				g.relax(dist, via, u, a.to, e, a.w+g.pi[u]-g.pi[a.to], k)
			}
		} else {
			for j := g.rstart[u]; j < g.rstart[u+1]; j++ {
				k := g.rarcs[j]
				a := &g.arcs[k]
				g.relax(dist, via, u, a.from, e, a.w+g.pi[a.from]-g.pi[u], k)
			}
		}
	}
	// Undo the reweighting: a reduced path length from 0 to v is the true
	// one plus pi[0] − pi[v] (reverse: plus pi[v] − pi[0]).
	for v := 0; v < n; v++ {
		if dist[v] >= Inf {
			if reverse {
				dist[v] = -Inf
			}
			continue
		}
		if reverse {
			dist[v] = -(dist[v] - g.pi[v] + g.pi[0])
		} else {
			dist[v] = dist[v] - g.pi[0] + g.pi[v]
		}
	}
}

func (g *stn) relax(dist []int64, via []int32, u, v int32, e hentry, c int64, k int32) {
	if g.seen[v] == -2 {
		return
	}
	d, h := e.d+c, e.hops+1
	switch {
	case d < dist[v], d == dist[v] && h < g.hops[v]:
	case d == dist[v] && h == g.hops[v] && via[v] >= 0 && g.rank[g.arcs[k].tag] < g.rank[g.arcs[via[v]].tag]:
		via[v] = k
		return
	default:
		return
	}
	dist[v], g.hops[v], via[v] = d, h, k
	g.heapPush(hentry{d, h, v})
}

func (a hentry) less(b hentry) bool {
	if a.d != b.d {
		return a.d < b.d
	}
	if a.hops != b.hops {
		return a.hops < b.hops
	}
	return a.node < b.node
}

func (g *stn) heapPush(e hentry) {
	h := append(g.heap, e)
	i := len(h) - 1
	for i > 0 {
		p := (i - 1) / 2
		if !h[i].less(h[p]) {
			break
		}
		h[i], h[p] = h[p], h[i]
		i = p
	}
	g.heap = h
}

func (g *stn) heapPop() hentry {
	h := g.heap
	top := h[0]
	last := len(h) - 1
	h[0] = h[last]
	h = h[:last]
	i := 0
	for {
		l := 2*i + 1
		if l >= len(h) {
			break
		}
		m := l
		if r := l + 1; r < len(h) && h[r].less(h[l]) {
			m = r
		}
		if !h[m].less(h[i]) {
			break
		}
		h[i], h[m] = h[m], h[i]
		i = m
	}
	g.heap = h
	return top
}
