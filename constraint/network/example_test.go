package network_test

import (
	"context"
	"fmt"

	"terminus/constraint/network"
)

// A painting (making) and a later retouching, in days from an arbitrary
// origin: a pigment available only from day 100, a document that puts the
// retouching before day 400, and the retouching at least 30 days after the
// painting.
func Example() {
	n := network.New()
	making := n.AddVar("making")
	retouch := n.AddVar("retouch")
	for _, c := range []network.Constraint{
		{ID: "pigment", Tier: network.Hard, Alts: []network.Alt{{From: network.Zero, To: making, Lo: 100, Hi: network.Inf}}},
		{ID: "inventory", Tier: network.Firm, Alts: []network.Alt{{From: network.Zero, To: retouch, Lo: -network.Inf, Hi: 400}}},
		{ID: "order", Tier: network.Hard, Alts: []network.Alt{{From: making, To: retouch, Lo: 30, Hi: network.Inf}}},
	} {
		if _, err := n.Add(c); err != nil {
			fmt.Println(err)
			return
		}
	}
	r, err := n.Solve(context.Background(), network.Firm, network.Options{})
	if err != nil {
		fmt.Println(err)
		return
	}
	for _, v := range []network.Var{making, retouch} {
		lo, hi := r.Earliest(v), r.Latest(v)
		fmt.Printf("%s: %d %v .. %d %v\n", n.Name(v), lo.Value, n.IDs(lo.Because), hi.Value, n.IDs(hi.Because))
	}
	// Output:
	// making: 100 [pigment] .. 370 [inventory order]
	// retouch: 130 [pigment order] .. 400 [inventory]
}

// Two pieces of evidence that cannot both hold: the conflict and the
// cheapest correction (the soft one goes).
func ExampleResult_Conflicts() {
	n := network.New()
	x := n.AddVar("making")
	_, _ = n.Add(network.Constraint{ID: "pigment", Tier: network.Hard, Alts: []network.Alt{{From: network.Zero, To: x, Lo: 100, Hi: network.Inf}}})
	_, _ = n.Add(network.Constraint{ID: "style", Tier: network.Soft, Alts: []network.Alt{{From: network.Zero, To: x, Lo: -network.Inf, Hi: 50}}})
	for _, tier := range []network.Tier{network.Hard, network.Soft} {
		r, _ := n.Solve(context.Background(), tier, network.Options{})
		var conflicts [][]string
		for _, c := range r.Conflicts {
			conflicts = append(conflicts, n.IDs(c))
		}
		fmt.Println(tier, r.Consistent, conflicts, r.ConflictsComplete, n.IDs(r.Correction))
	}
	// Output:
	// hard true [] false []
	// soft false [[pigment style]] true [style]
}

// One-of dates on one variable merge into an interval set.
func ExampleResult_Domain() {
	n := network.New()
	x := n.AddVar("letter")
	_, _ = n.Add(network.Constraint{ID: "one-of", Alts: []network.Alt{
		{From: network.Zero, To: x, Lo: 10, Hi: 19},
		{From: network.Zero, To: x, Lo: 40, Hi: 49},
		{From: network.Zero, To: x, Lo: 70, Hi: 79},
	}})
	_, _ = n.Add(network.Constraint{ID: "after", Alts: []network.Alt{{From: network.Zero, To: x, Lo: 15, Hi: network.Inf}}})
	r, _ := n.Solve(context.Background(), network.Soft, network.Options{})
	fmt.Println(r.Domain(x), n.IDs(r.Earliest(x).Because))
	// Output:
	// [{15 19} {40 49} {70 79}] [after]
}
