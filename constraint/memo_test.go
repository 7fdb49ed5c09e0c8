package constraint_test

import (
	"context"
	"fmt"
	"reflect"
	"strings"
	"sync"
	"terminus/constraint"
	"terminus/constraint/casefile"
	"terminus/constraint/input"
	"testing"

	"terminus/materials"
)

// A memo changes nothing but the speed: every example, and a case for each
// built-in material at several places and confidences (alone and as an
// alternative to its neighbour in the list), gives the same result with a
// memo (cold, then warm, then shared by goroutines) as without one.
func TestMemoGivesTheSameResults(t *testing.T) {
	ds, err := materials.Builtin()
	if err != nil {
		t.Fatal(err)
	}
	var cases []*constraint.Case
	for _, ex := range examples(t) {
		c, err := casefile.Parse(ex.path, ex.data, input.YAML, input.Limits{})
		if err != nil {
			t.Fatal(err)
		}
		cases = append(cases, c)
	}
	places := []string{"", "NL", "JP", "US", "155", "IN", "PE"}
	confs := []string{"", "probable", "possible"}
	for i, m := range ds.Materials {
		next := ds.Materials[(i+1)%len(ds.Materials)]
		material := fmt.Sprintf("%q", m.ID)
		if i%3 == 0 {
			material = fmt.Sprintf("[%q, %q]", m.ID, next.ID)
		}
		var b strings.Builder
		fmt.Fprintf(&b, "title: case %d\n", i)
		if p := places[i%len(places)]; p != "" {
			fmt.Fprintf(&b, "place: %q\n", p)
		}
		fmt.Fprintf(&b, "findings:\n  - {id: f1, material: %s", material)
		if c := confs[i%len(confs)]; c != "" {
			fmt.Fprintf(&b, ", confidence: %s", c)
		}
		fmt.Fprintf(&b, "}\n  - {id: f2, material: %q}\n", next.ID)
		fmt.Fprintf(&b, "records:\n  - {id: r1, not_after: \"%d\"}\nclaims:\n  - {date: \"%d\"}\n", 1700+i%300, 1500+(i*7)%500)
		c, err := casefile.Parse("gen.yaml", []byte(b.String()), input.YAML, input.Limits{})
		if err != nil {
			t.Fatalf("case %d: %v\n%s", i, err, b.String())
		}
		cases = append(cases, c)
	}
	ctx := context.Background()
	want := make([]*constraint.Result, len(cases))
	for i, c := range cases {
		if want[i], err = constraint.Analyze(ctx, c, ds, constraint.Options{}); err != nil {
			t.Fatalf("%s: %v", c.File, err)
		}
	}
	memo := constraint.NewMemo(ds)
	for pass, name := range []string{"cold", "warm"} {
		for i, c := range cases {
			got, err := constraint.Analyze(ctx, c, ds, constraint.Options{Memo: memo})
			if err != nil {
				t.Fatal(err)
			}
			if !reflect.DeepEqual(got, want[i]) {
				t.Fatalf("pass %d (%s memo), case %d (%s): the result differs from the one without a memo", pass, name, i, c.Title)
			}
		}
	}
	shared := constraint.NewMemo(ds)
	var wg sync.WaitGroup
	errs := make(chan string, 4)
	for w := range 4 {
		wg.Go(func() {
			for i := w; i < len(cases); i += 2 {
				got, err := constraint.Analyze(ctx, cases[i], ds, constraint.Options{Memo: shared, NoSensitivity: true})
				ref, _ := constraint.Analyze(ctx, cases[i], ds, constraint.Options{NoSensitivity: true})
				if err != nil || !reflect.DeepEqual(got, ref) {
					errs <- fmt.Sprintf("case %d differs with a shared memo (%v)", i, err)
					return
				}
			}
		})
	}
	wg.Wait()
	close(errs)
	for e := range errs {
		t.Error(e)
	}
	// A memo made for another dataset is not used.
	other := constraint.NewMemo(&materials.Dataset{})
	if got, _ := constraint.Analyze(ctx, cases[0], ds, constraint.Options{Memo: other}); !reflect.DeepEqual(got, want[0]) {
		t.Error("a memo for another dataset changed the result")
	}
}
