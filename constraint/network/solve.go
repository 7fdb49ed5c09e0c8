package network

import (
	"context"
	"fmt"
	"sort"
)

// Solve solves the network with every constraint whose tier is at most
// tier. It fails only when ctx is done or a search exceeds opt.MaxNodes.
func (n *Network) Solve(ctx context.Context, tier Tier, opt Options) (*Result, error) {
	var active []int
	for i, c := range n.cons {
		if c.Tier <= tier {
			active = append(active, i)
		}
	}
	r := &Result{Tier: tier}
	ok, err := n.naiveDomains(ctx, active, r)
	if err != nil {
		return nil, err
	}
	r.Consistent = ok
	if !ok {
		r.domains, r.earliest, r.latest = nil, nil, nil
		n.naiveConflicts(ctx, active, r, opt)
	}
	return r, nil
}

// naiveDomains enumerates every scenario (one alternative per constraint)
// and solves each with Bellman–Ford. A first, slow, exact solver.
func (n *Network) naiveDomains(ctx context.Context, active []int, r *Result) (bool, error) {
	nv := len(n.names)
	choice := make([]int, len(active))
	r.domains = make([]Set, nv)
	r.earliest = make([]Bound, nv)
	r.latest = make([]Bound, nv)
	for v := range r.earliest {
		r.earliest[v] = Bound{Value: Inf}
		r.latest[v] = Bound{Value: -Inf}
	}
	any := false
	for {
		if err := ctx.Err(); err != nil {
			return false, fmt.Errorf("solve: %w", err)
		}
		var es []edge
		for k, ci := range active {
			a := n.cons[ci].Alts[choice[k]]
			if a.Hi < Inf {
				es = append(es, edge{int32(a.From), int32(a.To), a.Hi, int32(ci)})
			}
			if a.Lo > -Inf {
				es = append(es, edge{int32(a.To), int32(a.From), -a.Lo, int32(ci)})
			}
		}
		if up, upWhy, ok := bellmanFord(nv, es, false); ok {
			lo, loWhy, _ := bellmanFord(nv, es, true)
			any = true
			for v := 0; v < nv; v++ {
				l, h := -lo[v], up[v]
				r.domains[v] = union(r.domains[v], Interval{l, h})
				if l < r.earliest[v].Value {
					r.earliest[v] = Bound{Value: l, Because: n.idsOf(loWhy[v], true)}
				}
				if h > r.latest[v].Value {
					r.latest[v] = Bound{Value: h, Because: n.idsOf(upWhy[v], true)}
				}
			}
		}
		k := 0
		for ; k < len(active); k++ {
			choice[k]++
			if choice[k] < len(n.cons[active[k]].Alts) {
				break
			}
			choice[k] = 0
		}
		if k == len(active) {
			break
		}
	}
	return any, nil
}

func (n *Network) idsOf(path []int32, reverse bool) []string {
	out := make([]string, 0, len(path))
	for _, c := range path {
		out = append(out, n.cons[c].ID)
	}
	if reverse {
		for i, j := 0, len(out)-1; i < j; i, j = i+1, j-1 {
			out[i], out[j] = out[j], out[i]
		}
	}
	return out
}

type edge struct {
	from, to int32
	w        int64
	tag      int32
}

// bellmanFord returns shortest distances from Zero (or to Zero when rev),
// saturated at ±Inf, the constraint indexes along each path (from the
// variable back to Zero), and false on a negative cycle.
func bellmanFord(nv int, es []edge, rev bool) ([]int64, [][]int32, bool) {
	d := make([]int64, nv)
	pred := make([]int, nv)
	for i := range d {
		d[i] = Inf
		pred[i] = -1
	}
	d[0] = 0
	for it := 0; it <= nv; it++ {
		changed := false
		for i, e := range es {
			u, v := e.from, e.to
			if rev {
				u, v = v, u
			}
			if d[u] < Inf && d[u]+e.w < d[v] {
				d[v] = d[u] + e.w
				pred[v] = i
				changed = true
			}
		}
		if !changed {
			break
		}
		if it == nv {
			return nil, nil, false
		}
	}
	// negative cycles not reachable from Zero
	p := make([]int64, nv)
	for it := 0; it <= nv; it++ {
		changed := false
		for _, e := range es {
			if p[e.from]+e.w < p[e.to] {
				p[e.to] = p[e.from] + e.w
				changed = true
			}
		}
		if !changed {
			break
		}
		if it == nv {
			return nil, nil, false
		}
	}
	why := make([][]int32, nv)
	for v := 0; v < nv; v++ {
		for x := v; pred[x] >= 0; {
			e := es[pred[x]]
			why[v] = append(why[v], e.tag)
			if rev {
				x = int(e.to)
			} else {
				x = int(e.from)
			}
		}
	}
	return d, why, true
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

// naiveConflicts finds one minimal conflict by deletion.
func (n *Network) naiveConflicts(ctx context.Context, active []int, r *Result, opt Options) {
	cur := append([]int(nil), active...)
	for i := 0; i < len(cur); {
		try := append(append([]int(nil), cur[:i]...), cur[i+1:]...)
		var tmp Result
		ok, _ := n.naiveDomains(ctx, try, &tmp)
		if !ok {
			cur = try
		} else {
			i++
		}
	}
	ids := n.idsOf(toInt32(cur), false)
	sort.Strings(ids)
	r.Conflicts = [][]string{ids}
	best := ""
	for _, c := range cur {
		if best == "" || cost(n.cons[c].Tier) < cost(n.cons[n.ids[best]].Tier) {
			best = n.cons[c].ID
		}
	}
	r.Correction = []string{best}
}

func toInt32(xs []int) []int32 {
	out := make([]int32, len(xs))
	for i, x := range xs {
		out[i] = int32(x)
	}
	return out
}
