package constraint

import (
	"strings"
	"testing"

	"terminus/constraint/network"
)

// The safe-bounds rules, each held by a test that fails if the cause of a
// false exclusion comes back. The fixture materials are invented
// (testdata/fixture-materials.yaml); each expected value is worked out in
// the comment beside it.

func hasNote(r *Result, part string) bool {
	for _, n := range r.Notes {
		if strings.Contains(n, part) {
			return true
		}
	}
	return false
}

func claimVerdict(t *testing.T, r *Result, id string) Verdict {
	t.Helper()
	for _, c := range r.Claims {
		if c.ID == id {
			return c.Verdict
		}
	}
	t.Fatalf("no claim %s", id)
	return ""
}

// A made claim open at its start ("../1519") says no earlier limit is
// known: the milestone gives no lower bound, whatever the other claims say,
// and the report names the source that leaves it open.
func TestOpenStartGivesNoLowerBound(t *testing.T) {
	// fx-insect-a: made ../1519 (fx-a) and 14XX (fx-b). Without the rule,
	// 1400 would be a hard floor and a claim of 1200 excluded.
	r := analyze(t, "findings:\n  - {id: f, material: fixture insect a}\nclaims:\n  - {id: c, date: \"1200\"}\n")
	wantWindow(t, r, "making", network.Hard, "", "")
	if v := claimVerdict(t, r, "c"); v != Consistent {
		t.Errorf("claim 1200: %s, want consistent", v)
	}
	if !hasNote(r, "No lower bound from the first making of fixture insect a: fx-a gives up to 1519, which leaves its start open.") {
		t.Errorf("no note names the open source; notes: %q", r.Notes)
	}
}

// A withdrawal with a place bounds only objects made there, the most
// specific area first; one without a place is worldwide; an object of
// unknown place is bounded only by the worldwide one.
func TestWithdrawalsBelongToPlaces(t *testing.T) {
	// fx-banned: made 1880; withdrawn US 1976, Western Europe (155) 1985,
	// worldwide 2000, each with no stock allowance.
	for _, tc := range []struct {
		place, latest string
		why           string
	}{
		{"US", "1976-12-31", "the US ban is the most specific"},
		{"NL", "1985-12-31", "NL lies in 155; the US ban does not reach it"},
		{"JP", "2000-12-31", "only the worldwide end reaches Japan"},
		{"", "2000-12-31", "no place: only the worldwide end"},
	} {
		t.Run(tc.place, func(t *testing.T) {
			place := ""
			if tc.place != "" {
				place = "place: " + tc.place + "\n"
			}
			r := analyze(t, place+"findings:\n  - {id: f, material: fixture banned}\n")
			wantWindow(t, r, "making", network.Soft, "1880-01-01", tc.latest) // tc.why
		})
	}
}

// A marker or a family is read as every material that carries it, bounded
// by the earliest; a material's own name still means that one material.
func TestMarkersAndFamilies(t *testing.T) {
	tests := []struct {
		name, material, claim string
		want                  Verdict
		why                   string
	}{
		// fixture insects: fx-insect-b (-0999) and fx-insect-c (1520).
		{"family bounded by the earliest", "fixture insects", "1000", Consistent, "1000 is after -0999, the earliest member"},
		{"family excludes before all", "fixture insects", "-1200", Excluded, "before every member"},
		// fixture acid also holds fx-insect-a, whose start is open: no bound.
		{"marker with an open member", "fixture acid", "-1200", Consistent, "one member has no lower bound"},
		// The specific name: fx-insect-c alone, made 1520.
		{"specific name is one material", "fixture insect c", "1000", Excluded, "1000 is before 1520"},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			r := analyze(t, "findings:\n  - {id: f, material: "+tc.material+"}\nclaims:\n  - {id: c, date: \""+tc.claim+"\"}\n")
			if v := claimVerdict(t, r, "c"); v != tc.want {
				t.Errorf("%s: %s, want %s (%s)", tc.claim, v, tc.want, tc.why)
			}
		})
	}
	r := analyze(t, "findings:\n  - {id: f, material: fixture insects}\n")
	if !hasNote(r, "f names fixture insects, a family: fixture insect b or fixture insect c. The finding is read as any of them, bounded by the earliest.") {
		t.Errorf("no note says how the family is read; notes: %q", r.Notes)
	}
	if got := r.Evidence[0].What; got != "fixture insects (read as fixture insect b or fixture insect c)" {
		t.Errorf("evidence what = %q", got)
	}
}

// A finding marked unlisted is reported and bounds nothing; an unknown name
// without the mark stays an error with a suggestion.
func TestUnlistedFinding(t *testing.T) {
	r := analyze(t, "findings:\n  - {id: f, material: a red lake not in any dataset, unlisted: true}\n  - {id: g, material: fixture late}\nclaims:\n  - {id: c, date: \"1960\"}\n")
	if v := claimVerdict(t, r, "c"); v != Consistent {
		t.Errorf("claim 1960: %s, want consistent", v)
	}
	var row *Evidence
	for i := range r.Evidence {
		if r.Evidence[i].ID == "f" {
			row = &r.Evidence[i]
		}
	}
	if row == nil || !row.Unlisted || len(row.Bounds) != 0 {
		t.Fatalf("unlisted row = %+v, want unlisted with no bounds", row)
	}
	if !hasNote(r, "f: a red lake not in any dataset is not in the dataset and gives no bound.") {
		t.Errorf("notes: %q", r.Notes)
	}
	c, err := ParseCase("case.yaml", []byte("findings:\n  - {id: f, material: fixture yelow}\n"), "yaml")
	if err != nil {
		t.Fatal(err)
	}
	_, err = Analyze(t.Context(), c, fixture(t), Options{})
	if err == nil || !strings.Contains(err.Error(), `unknown material "fixture yelow"`) {
		t.Fatalf("unknown material without the mark: err %v", err)
	}
	if h := err.(*Error).Hint(); !strings.Contains(h, "fixture yellow") {
		t.Errorf("hint %q does not suggest the near name", h)
	}
}

// No lower bound is later than an attestation that should bound it: made
// and sold by any attestation, an arrival by one in its area.
func TestAttestationsCapBounds(t *testing.T) {
	// fx-attested: made 1710, sold 1730, arrived Europe 1750 and JP 1800;
	// attested 1705 in NL and 1720 in JP.
	for _, tc := range []struct {
		place, hard, firm, soft string
		why                     string
	}{
		{"NL", "1705-01-01", "1705-01-01", "1705-01-01", "the NL attestation caps made, sold and the European arrival"},
		{"JP", "1705-01-01", "1705-01-01", "1720-01-01", "made and sold capped by 1705 anywhere; the JP arrival of 1800 by the JP attestation of 1720"},
		{"US", "1705-01-01", "1705-01-01", "1705-01-01", "no US arrival: soft falls back to firm"},
	} {
		t.Run(tc.place, func(t *testing.T) {
			r := analyze(t, "place: "+tc.place+"\nfindings:\n  - {id: f, material: fixture attested}\n")
			wantWindow(t, r, "making", network.Hard, tc.hard, "")
			wantWindow(t, r, "making", network.Firm, tc.firm, "")
			wantWindow(t, r, "making", network.Soft, tc.soft, "")
		})
	}
	r := analyze(t, "place: NL\nfindings:\n  - {id: f, material: fixture attested}\n")
	chain := r.Events[0].Windows[network.Hard].Earliest.Chain
	if len(chain) == 0 || !strings.Contains(chain[0].Text, "attested 1705 in an invented dated panel") {
		t.Errorf("hard chain %+v does not cite the attestation", chain)
	}
}

// Where claims give the same date, the bound cites a documented one before
// one from memory, and a scholarly source before a weak one.
func TestTieCitesTheBetterSource(t *testing.T) {
	// fx-tie: 1704 from a blog (documented), from fx-a (from memory), from
	// a paper (documented); 1706 from fx-b.
	r := analyze(t, "findings:\n  - {id: f, material: fixture tie}\n")
	b := r.Events[0].Windows[network.Hard].Earliest
	if len(b.Chain) == 0 || !strings.Contains(b.Chain[0].Text, "[fx-paper, documented]") {
		t.Errorf("chain %+v does not cite the paper", b.Chain)
	}
}
