package network

// This file holds what a search records of its consistent leaves: the
// union of their windows, and the earliest and latest values with the
// constraints that force them.

// coverage is the union of the windows of the consistent leaves met so
// far, per local node, with the earliest and latest values.
type coverage struct {
	dom         []Set
	early, late []Bound
	paths       [][]int // per node: the explanation of the side being recorded
	extended    []bool  // per node: paths[v] was appended to (its storage is shared)
}

func (c *coverage) init(k int) {
	c.dom = make([]Set, k)
	c.early = make([]Bound, k)
	c.late = make([]Bound, k)
	for i := range c.early {
		c.early[i].Value = Inf
		c.late[i].Value = -Inf
	}
}

// improves reports whether the graph's bounds would move an earliest (a
// latest); only then is the lower (upper) shortest-path tree needed.
func (c *coverage) improves(g *stn) (lower, upper bool) {
	for i := 1; i < len(c.dom); i++ {
		lower = lower || g.lo[i] < c.early[i].Value
		upper = upper || g.up[i] > c.late[i].Value
	}
	return lower, upper
}

// unite adds the graph's windows to the domains.
func (c *coverage) unite(g *stn) {
	for v := 1; v < len(c.dom); v++ {
		if !inside(c.dom[v], g.lo[v], g.up[v]) {
			c.dom[v] = union(c.dom[v], Interval{g.lo[v], g.up[v]})
		}
	}
}

// leaf adds the windows of a solved scenario to the domains.
func (sr *search) leaf() { sr.leafSides(true, true) }

// leafSides is leaf for the lower bounds, the upper ones, or both, whose
// shortest-path trees are up to date.
func (sr *search) leafSides(lower, upper bool) {
	if lower {
		sr.recordSide(true)
	}
	if upper {
		sr.recordSide(false)
	}
	sr.cover.unite(&sr.g)
}

// recordSide moves each earliest (lower) or latest value that the
// scenario improves, with its explanation; a tie keeps the first found
// unless the new explanation is shorter, or as short with smaller ids.
func (sr *search) recordSide(lower bool) {
	g := &sr.g
	c := &sr.cover
	k := len(c.dom)
	c.paths = c.paths[:0]
	for range k {
		c.paths = append(c.paths, nil)
	}
	if cap(c.extended) < k {
		c.extended = make([]bool, k)
	}
	c.extended = c.extended[:k]
	clear(c.extended)
	// The root's path is empty, with room for the deepest path of the
	// side's tree: a chain of ordered events then grows its paths in one
	// array, each node's path a prefix of the next one's (linear space for
	// the explanations of a long order, and one storage for a reader to
	// share).
	depth := int32(0)
	hops := g.upHops
	if lower {
		hops = g.loHops
	}
	for _, h := range hops[:k] {
		depth = max(depth, h)
	}
	c.paths[0] = make([]int, 0, depth)
	for v := 1; v < k; v++ {
		var val int64
		var b *Bound
		var hops []int32 // steps of each node's path on the side's tree
		if lower {
			val, b, hops = g.lo[v], &c.early[v], g.loHops
			if val > b.Value {
				continue
			}
		} else {
			val, b, hops = g.up[v], &c.late[v], g.upHops
			if val < b.Value {
				continue
			}
		}
		old := b.Value
		// A tie with an earlier scenario: only a shorter explanation
		// replaces the first found.
		if val == old && int(hops[v]) >= len(b.Because) {
			continue
		}
		why := sr.path(int32(v), lower)
		if val == old && !sr.betterWhy(why, b.Because) {
			continue
		}
		*b = Bound{Value: val, Because: why[:len(why):len(why)]}
	}
}

// path returns the constraints on the tree path from the reference point
// to v, sharing storage with the paths of v's ancestors.
func (sr *search) path(v int32, lower bool) []int {
	g := &sr.g
	c := &sr.cover
	via := g.upArc
	if lower {
		via = g.loArc
	}
	if via[v] < 0 {
		return nil
	}
	var stack []int32
	x := v
	for c.paths[x] == nil {
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
		tag := int(g.arcs[via[y]].tag)
		pp := c.paths[x]
		if !c.extended[x] {
			c.extended[x] = true
			c.paths[y] = append(pp, tag)
		} else {
			q := make([]int, len(pp)+1)
			copy(q, pp)
			q[len(pp)] = tag
			c.paths[y] = q
		}
		x = y
	}
	return c.paths[v]
}

// betterWhy prefers the shorter explanation, then the one whose ids come
// first.
func (sr *search) betterWhy(a, b []int) bool {
	if len(a) != len(b) {
		return len(a) < len(b)
	}
	for i := range a {
		if a[i] != b[i] {
			return sr.rank[a[i]] < sr.rank[b[i]]
		}
	}
	return false
}
