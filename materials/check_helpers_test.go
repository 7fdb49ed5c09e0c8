package materials_test

import (
	"strings"
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

// sourceRow is one value a named published source gives: the material,
// the milestone kind and place, the date as EDTF, and where it was read.
type sourceRow struct {
	id    string
	kind  materials.Kind
	place string
	want  string
	src   string
}

// checkSourceRows checks that each row's material comes from the family
// file and carries a claim of the row's kind and place with the row's date.
func checkSourceRows(t *testing.T, d *materials.Dataset, file string, rows []sourceRow) {
	t.Helper()
	for _, r := range rows {
		t.Run(r.id+"/"+string(r.kind)+"/"+r.place+"/"+r.want, func(t *testing.T) {
			want, err := date.Parse(r.want)
			if err != nil {
				t.Fatalf("bad expected date %q: %v", r.want, err)
			}
			m := mustLookup(t, d, r.id)
			if !strings.HasSuffix(m.File, file) {
				t.Fatalf("%s comes from %s, want %s", r.id, m.File, file)
			}
			var got []string
			for _, ms := range m.Claims(r.kind, r.place) {
				got = append(got, ms.Date.EDTF())
				if ms.Date.EDTF() == want.EDTF() {
					return
				}
			}
			t.Errorf("%s %s %q: no claim dated %s (%s); have %v", r.id, r.kind, r.place, want.EDTF(), r.src, got)
		})
	}
}
