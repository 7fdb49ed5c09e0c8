package network

import (
	"context"
	"testing"
)

func TestDbgDisj(t *testing.T) {
	n := disjunctiveInstance(100)
	r, err := n.Solve(context.Background(), Soft, Options{MaxNodes: 3000})
	t.Log(err, r)
}
