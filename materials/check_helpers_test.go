package materials_test

import (
	"testing"

	"terminus/constraint/date"
	"terminus/materials"
)

// The helpers the family checks share.

// checkBuiltin loads the embedded dataset, logging every problem when it
// does not load.
func checkBuiltin(t *testing.T) *materials.Dataset {
	t.Helper()
	d, err := materials.Builtin()
	if err != nil {
		for _, p := range materials.Problems(err) {
			t.Log(p)
		}
		t.Fatalf("Builtin: %v", err)
	}
	return d
}

// mustLookup finds a material by any of its names or fails the test.
func mustLookup(t *testing.T, d *materials.Dataset, name string) *materials.Material {
	t.Helper()
	m, err := d.Lookup(name)
	if err != nil {
		t.Fatalf("Lookup(%q): %v", name, err)
	}
	return m
}

// earliestOf is the earliest bounded first day among claims.
func earliestOf(claims []materials.Milestone) (date.Day, bool) {
	var best date.Day
	ok := false
	for _, c := range claims {
		if e, bounded := c.Date.Earliest(); bounded && (!ok || e < best) {
			best, ok = e, true
		}
	}
	return best, ok
}
