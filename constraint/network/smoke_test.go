package network

import (
	"context"
	"testing"
)

func TestSmokeChain(t *testing.T) {
	n := New()
	a, b := n.AddVar("a"), n.AddVar("b")
	must := func(err error) {
		if err != nil {
			t.Fatal(err)
		}
	}
	must(n.Add(Constraint{ID: "bound-on-a", Alts: []Alt{{Zero, a, 10, 20}}}))
	must(n.Add(Constraint{ID: "a-to-b", Alts: []Alt{{a, b, 5, Inf}}}))
	r, err := n.Solve(context.Background(), Soft, Options{})
	must(err)
	t.Log(r.Earliest(b), r.Latest(b), r.Domain(b))
}
