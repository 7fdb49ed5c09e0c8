package wording

import (
	"fmt"
	"testing"
)

func TestPlural(t *testing.T) {
	for _, tc := range []struct {
		n    int
		want string
		why  string
	}{
		{1, "record", "exactly one takes the singular"},
		{0, "records", "none takes the plural in English (0 records)"},
		{2, "records", "two or more take the plural"},
		{-1, "records", "a negative count is not one"},
	} {
		t.Run(tc.why, func(t *testing.T) {
			if got := Plural(tc.n, "record", "records"); got != tc.want {
				t.Errorf("Plural(%d) = %q, want %q", tc.n, got, tc.want)
			}
		})
	}
}

func ExamplePlural() {
	for _, n := range []int{0, 1, 2} {
		fmt.Println(n, Plural(n, "tier", "tiers"))
	}
	// Output:
	// 0 tiers
	// 1 tier
	// 2 tiers
}
