package network

import (
	"context"
	"slices"
	"testing"
)

// commute builds the worked example of R. Dechter, I. Meiri and J. Pearl,
// "Temporal constraint networks", Artificial Intelligence 49 (1991): time
// in minutes after 7:00. The story and the expected values are as the
// project's issue summarises the paper (the paper itself was not re-read
// for this test); each expected value was also checked by hand against the
// constraints, as the comments show. aTravel and bTravel choose the alternatives of the
// two travel constraints (nil: both open).
func commute(t *testing.T, aTravel, bTravel []Alt) (*Network, [5]Var) {
	t.Helper()
	n := New()
	var v [5]Var
	v[1] = n.AddVar("A leaves home")
	v[2] = n.AddVar("A arrives at work")
	v[3] = n.AddVar("B leaves home")
	v[4] = n.AddVar("B arrives at work")
	car := []Alt{{v[1], v[2], 30, 40}}
	bus := []Alt{{v[1], v[2], 60, Inf}}
	if aTravel == nil {
		aTravel = append(car, bus...)
	}
	if bTravel == nil {
		bTravel = []Alt{{v[3], v[4], 20, 30}, {v[3], v[4], 40, 50}}
	}
	for _, c := range []Constraint{
		{ID: "a-left", Alts: []Alt{{Zero, v[1], 10, 20}}},
		{ID: "b-arrived", Alts: []Alt{{Zero, v[4], 60, 70}}},
		{ID: "a-travel", Alts: aTravel},
		{ID: "b-travel", Alts: bTravel},
		{ID: "a-arrived-after-b-left", Alts: []Alt{{v[3], v[2], 10, 20}}},
	} {
		if _, err := n.Add(c); err != nil {
			t.Fatal(err)
		}
	}
	return n, v
}

func TestCommute(t *testing.T) {
	ctx := context.Background()
	// Variables 1..4 are placeholders here; commute re-creates them in the
	// same order, so the numbers match.
	carA := []Alt{{1, 2, 30, 40}}
	busA := []Alt{{1, 2, 60, Inf}}
	carpoolB := []Alt{{3, 4, 40, 50}}

	t.Run("car and carpool", func(t *testing.T) {
		// Dechter, Meiri & Pearl (1991): the minimal network of this
		// labelling gives A leaves [10,20], A arrives [40,50], B leaves
		// [20,30], B arrives [60,70].
		n, v := commute(t, carA, carpoolB)
		r, err := n.Solve(ctx, Soft, Options{})
		if err != nil {
			t.Fatal(err)
		}
		want := map[Var]Set{v[1]: {{10, 20}}, v[2]: {{40, 50}}, v[3]: {{20, 30}}, v[4]: {{60, 70}}}
		for x, w := range want {
			if got := r.Domain(x); !slices.Equal(got, w) {
				t.Errorf("%s: domain %v, want %v", n.Name(x), got, w)
			}
		}
		// A arrives no earlier than 40: a-left (>= 10) then car (>= 30).
		if got := r.Earliest(v[2]); got.Value != 40 || !slices.Equal(n.IDs(got.Because), []string{"a-left", "a-travel"}) {
			t.Errorf("earliest arrival of A = %v, want 40 because [a-left a-travel]", got)
		}
		// A arrives no later than 50: B arrives <= 70, carpool >= 40, so B
		// leaves <= 30, and A arrives at most 20 after.
		if got := r.Latest(v[2]); got.Value != 50 || !slices.Equal(n.IDs(got.Because), []string{"b-arrived", "b-travel", "a-arrived-after-b-left"}) {
			t.Errorf("latest arrival of A = %v", got)
		}
	})

	t.Run("bus and carpool", func(t *testing.T) {
		// Dechter, Meiri & Pearl (1991): inconsistent, through a negative
		// cycle of weight -20 over all five constraints.
		n, _ := commute(t, busA, carpoolB)
		r, err := n.Solve(ctx, Soft, Options{})
		if err != nil {
			t.Fatal(err)
		}
		if r.Consistent {
			t.Fatal("bus and carpool: consistent, want inconsistent")
		}
		all := []string{"a-arrived-after-b-left", "a-left", "a-travel", "b-arrived", "b-travel"}
		if len(r.Conflicts) != 1 || !slices.Equal(n.IDs(r.Conflicts[0]), all) || !r.ConflictsComplete {
			t.Errorf("conflicts %v (complete %v), want exactly [%v]", r.Conflicts, r.ConflictsComplete, all)
		}
		if len(r.Correction) != 1 || !slices.Contains(all, n.ID(r.Correction[0])) {
			t.Errorf("correction %v, want one of the five constraints", r.Correction)
		}
		// The negative cycle itself: A arrives >= 10 + 60 = 70 and
		// A arrives <= (70 - 40) + 20 = 50, a cycle of weight 50 - 70 = -20.
		s := n.newSolver(ctx, Options{}, n.ranks())
		p := s.prepare([]int32{0, 1, 2, 3, 4})
		pr := p.problems[0]
		var arcs []arc
		arcs = append(arcs, pr.base...)
		for _, alts := range pr.choices {
			arcs = alts[0].arcs(arcs)
		}
		s.g.build(len(pr.vars), arcs)
		ok, cyc := s.g.potential()
		if ok {
			t.Fatal("potential found for the bus and carpool network")
		}
		var w int64
		tags := map[string]bool{}
		for _, k := range cyc {
			w += s.g.arcs[k].w
			tags[n.cons[s.g.arcs[k].tag].ID] = true
		}
		if w != -20 || len(tags) != 5 {
			t.Errorf("negative cycle of weight %d over %d constraints, want -20 over 5", w, len(tags))
		}
	})

	t.Run("both open", func(t *testing.T) {
		// Dechter, Meiri & Pearl (1991): with both disjunctions open, A
		// arrives in {[40,60], [70,70]} minutes after 7:00.
		n, v := commute(t, nil, nil)
		r, err := n.Solve(ctx, Soft, Options{})
		if err != nil {
			t.Fatal(err)
		}
		if got, want := r.Domain(v[2]), (Set{{40, 60}, {70, 70}}); !slices.Equal(got, want) {
			t.Errorf("A arrives in %v, want %v", got, want)
		}
		// By hand from the same constraints: A arrives no later than 70
		// (B arrives <= 70, by car B travels >= 20, so B leaves <= 50, and
		// A arrives <= 20 after B leaves), the path naming the chosen
		// alternative's disjunction; no earlier than 40 (A leaves >= 10,
		// by car >= 30).
		if got := r.Latest(v[2]); got.Value != 70 || !slices.Equal(n.IDs(got.Because), []string{"b-arrived", "b-travel", "a-arrived-after-b-left"}) {
			t.Errorf("latest arrival of A = %v, want 70 because [b-arrived b-travel a-arrived-after-b-left]", got)
		}
		if got := r.Earliest(v[2]); got.Value != 40 || !slices.Equal(n.IDs(got.Because), []string{"a-left", "a-travel"}) {
			t.Errorf("earliest arrival of A = %v, want 40 because [a-left a-travel]", got)
		}
		for i := 1; i <= 4; i++ {
			t.Logf("%s: %v (earliest %v, latest %v)", n.Name(v[i]), r.Domain(v[i]), r.Earliest(v[i]), r.Latest(v[i]))
		}
	})
}
