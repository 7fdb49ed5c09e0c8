package network

import (
	"context"
	"fmt"
	"slices"
	"strings"
)

// This file holds the entry points: a solve at one tier, and the three
// tiers at once.

// Solve solves the network with every constraint whose tier is at most
// tier. It fails only when ctx is done or a search for the domains exceeds
// [Options.MaxNodes]; an inconsistent network is a Result, not an error.
func (n *Network) Solve(ctx context.Context, tier Tier, opt Options) (*Result, error) {
	return n.newSolver(ctx, opt, n.ranks()).solve(tier)
}

// SolveTiers solves the network at each of the tiers Hard, Firm and Soft,
// as three calls of [Network.Solve] would, sharing the work they have in
// common; the results are indexed by tier. An error names the tier.
func (n *Network) SolveTiers(ctx context.Context, opt Options) ([3]*Result, error) {
	s := n.newSolver(ctx, opt, n.ranks())
	if n.allUnary() {
		return s.solveUnaryTiers()
	}
	var out [3]*Result
	for t := Hard; t <= Soft; t++ {
		r, err := s.solve(t)
		if err != nil {
			return [3]*Result{}, fmt.Errorf("solving the %s tier: %w", t, err)
		}
		out[t] = r
	}
	return out, nil
}

// solver holds what one call of Solve shares between its searches.
type solver struct {
	n     *Network
	ctx   context.Context
	opt   Options
	rank  []int32 // constraint index → rank of its id
	nodes int     // search nodes spent, by every search
	g     stn
	// keepUnary keeps in unary, per constraint of several alternatives
	// on one variable, their union.
	keepUnary bool
	unary     map[int32][]piece
	scratch   []piece // an intersection being made
}

func (n *Network) newSolver(ctx context.Context, opt Options, rank []int32) *solver {
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

// solve solves the constraints of tier and the stronger ones: their
// domains, or, when they are inconsistent, the conflicts and correction.
func (s *solver) solve(tier Tier) (*Result, error) {
	if err := s.ctx.Err(); err != nil {
		return nil, fmt.Errorf("solve: %w", err)
	}
	s.nodes = 0
	active := make([]int32, 0, len(s.n.cons))
	for i, c := range s.n.cons {
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
func (s *solver) solveUnaryTiers() ([3]*Result, error) {
	var out [3]*Result
	n := s.n
	p := &prepared{sets: make([][]piece, len(n.names)), empty: -1, isolated: allVars(len(n.names))}
	for t := Hard; t <= Soft; t++ {
		if err := s.ctx.Err(); err != nil {
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
			r, err := s.solve(t)
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
