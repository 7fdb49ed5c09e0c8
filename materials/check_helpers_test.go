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

// year is the first of January of a year (astronomical: 0 = 1 BCE).
func year(y int64) date.Day { return date.Gregorian(y, 1, 1) }

// familyMaterials lists the materials that come from a family file, in the
// dataset's order.
func familyMaterials(d *materials.Dataset, file string) []*materials.Material {
	var out []*materials.Material
	for _, m := range d.Materials {
		if strings.HasSuffix(m.File, file) {
			out = append(out, m)
		}
	}
	return out
}

// checkFamilyFile checks what every family file promises: it adds no lint
// problem, it holds at least atLeast materials, each of them has a made
// milestone, cites only sources of the dataset and resolves by every one of
// its names, and each source the file defines has a type. It returns the
// file's materials for the family's own counts.
func checkFamilyFile(t *testing.T, d *materials.Dataset, file string, atLeast int) []*materials.Material {
	t.Helper()
	for _, p := range materials.Lint(d) {
		if strings.HasSuffix(p.File, file) {
			t.Errorf("lint: %s", p)
		}
	}
	ms := familyMaterials(d, file)
	if len(ms) < atLeast {
		t.Errorf("only %d materials come from %s, want at least %d", len(ms), file, atLeast)
	}
	for _, m := range ms {
		if len(m.Claims(materials.KindMade, "")) == 0 {
			t.Errorf("%s has no made milestone", m.ID)
		}
		for _, x := range m.Milestones {
			if _, ok := d.Source(x.Source); !ok {
				t.Errorf("%s: milestone %s %s cites unknown source %q", m.ID, x.Kind, x.Date.EDTF(), x.Source)
			}
		}
		for _, name := range m.Names {
			got, err := d.Lookup(name)
			if err != nil {
				t.Errorf("Lookup(%q): %v", name, err)
				continue
			}
			if got.ID != m.ID {
				t.Errorf("Lookup(%q) = %s, want %s", name, got.ID, m.ID)
			}
		}
	}
	for _, s := range d.Sources {
		if strings.HasSuffix(s.File, file) && s.Type == "" {
			t.Errorf("source %s has no type", s.Key)
		}
	}
	return ms
}

// orderRow is an order the trade takes for granted: the earlier material's
// first bounded claim of a kind comes before the later material's.
type orderRow struct {
	earlier, later string
	kind           materials.Kind
	why            string
}

// orderRule says how [checkOrder] compares the two first claims.
type orderRule struct {
	// sameDay lets both start on the same day ("no later than" rather
	// than "before"), as a lake may start with its dye.
	sameDay bool
	// soldOrMade compares a material without a sold claim by its made
	// claim, on either side of a row of kind sold.
	soldOrMade bool
}

// checkOrder checks each row in a subtest named earlier<later.
func checkOrder(t *testing.T, d *materials.Dataset, rule orderRule, rows []orderRow) {
	t.Helper()
	first := func(t *testing.T, name string, kind materials.Kind) (date.Day, bool) {
		m := mustLookup(t, d, name)
		day, ok := earliestOf(m.Claims(kind, ""))
		if !ok && rule.soldOrMade && kind == materials.KindSold {
			day, ok = earliestOf(m.Claims(materials.KindMade, ""))
		}
		return day, ok
	}
	for _, r := range rows {
		t.Run(r.earlier+"<"+r.later, func(t *testing.T) {
			a, okA := first(t, r.earlier, r.kind)
			b, okB := first(t, r.later, r.kind)
			if !okA || !okB {
				t.Fatalf("%s: missing %s claim (%s %v, %s %v)", r.why, r.kind, r.earlier, okA, r.later, okB)
			}
			switch {
			case rule.sameDay && a > b:
				t.Errorf("%s: %s %s starts %s, after %s at %s", r.why, r.earlier, r.kind, a.ISO(), r.later, b.ISO())
			case !rule.sameDay && a >= b:
				t.Errorf("%s: %s %s starts %s, not before %s at %s", r.why, r.earlier, r.kind, a.ISO(), r.later, b.ISO())
			}
		})
	}
}

// checkApart checks that the two names of each pair are different
// materials: variants practitioners keep apart, each with its own dates.
func checkApart(t *testing.T, d *materials.Dataset, pairs [][2]string) {
	t.Helper()
	for _, p := range pairs {
		a, b := mustLookup(t, d, p[0]), mustLookup(t, d, p[1])
		if a.ID == b.ID {
			t.Errorf("%q and %q resolve to the same material %s", p[0], p[1], a.ID)
		}
	}
}

// groupRow is a name that resolves to a group, and members the group must
// hold (it may hold more).
type groupRow struct {
	name string
	want []string
}

// checkGroups checks that each row's name resolves to a group holding every
// wanted member.
func checkGroups(t *testing.T, d *materials.Dataset, rows []groupRow) {
	t.Helper()
	for _, r := range rows {
		res, err := d.Resolve(r.name)
		if err != nil {
			t.Errorf("Resolve(%q): %v", r.name, err)
			continue
		}
		got := map[string]bool{}
		for _, m := range res.Materials {
			got[m.ID] = true
		}
		for _, id := range r.want {
			if !got[id] {
				t.Errorf("Resolve(%q) lacks %s (has %v)", r.name, id, got)
			}
		}
	}
}

// nameRow is a name the trade uses and the material it must find.
type nameRow struct{ name, id string }

// checkNames checks each row in a subtest named by the name.
func checkNames(t *testing.T, d *materials.Dataset, rows []nameRow) {
	t.Helper()
	for _, r := range rows {
		t.Run(r.name, func(t *testing.T) {
			if m := mustLookup(t, d, r.name); m.ID != r.id {
				t.Errorf("Lookup(%q) = %s, want %s", r.name, m.ID, r.id)
			}
		})
	}
}
