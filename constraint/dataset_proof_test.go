package constraint

import (
	"testing"

	"terminus/constraint/date"
	"terminus/materials"
)

// builtin loads the embedded dataset or fails the test.
func builtin(t *testing.T) *materials.Dataset {
	t.Helper()
	ds, err := materials.Builtin()
	if err != nil {
		t.Fatalf("built-in dataset: %v", err)
	}
	return ds
}

// TestDatasetExcludesNoneOfItsAttestations is the dataset's own proof that
// it brands none of its own examples: every attestation (a securely dated
// object in which the material was identified) becomes a case made at the
// attested place with the material found, certain, and the object's date
// claimed; the verdict must be consistent at every tier.
func TestDatasetExcludesNoneOfItsAttestations(t *testing.T) {
	ds := builtin(t)
	n, mats := 0, 0
	for _, m := range ds.Materials {
		found := false
		for _, ms := range m.Milestones {
			if ms.Kind != materials.KindAttested {
				continue
			}
			n++
			found = true
			c := &Case{File: m.ID, Place: ms.Place,
				Findings: []Finding{{ID: "f", Materials: []string{m.ID}, Confidence: Certain}},
				Claims:   []Claim{{ID: "attested", Date: ms.Date, DateText: ms.Date.EDTF()}}}
			res, err := Analyze(t.Context(), c, ds, Options{NoSensitivity: true})
			if err != nil {
				t.Errorf("%s (%s:%d): %v", m.ID, ms.File, ms.Line, err)
				continue
			}
			if v := res.Claims[0].Verdict; v != Consistent {
				t.Errorf("%s attested %s in %s (place %q, %s:%d) is %s by the dataset; deciding: %v",
					m.ID, ms.Date.EDTF(), ms.Object, ms.Place, ms.File, ms.Line, v, res.Claims[0].Deciding)
			}
		}
		if found {
			mats++
		}
	}
	t.Logf("%d attestations of %d materials, each consistent", n, mats)
}

// TestClassicAnachronismsStayExcluded holds the tool's sharpness: the
// safe-bounds rules widen what is uncertain, but a modern pigment in an old
// object is still excluded at the hard tier. The dates are facts of the
// trade (common practice): copper phthalocyanine blue from the 1930s,
// titanium dioxide whites from the 1910s, synthetic ultramarine from the
// 1820s, Prussian blue from the 1700s, mauveine from 1856.
func TestClassicAnachronismsStayExcluded(t *testing.T) {
	ds := builtin(t)
	for _, tc := range []struct {
		material, place, claim string
	}{
		{"phthalocyanine blue", "IT", "1350"},
		{"titanium dioxide", "NL", "1650"},
		{"synthetic ultramarine", "FR", "1400"},
		{"Prussian blue", "NL", "1650"},
		{"mauveine", "GB", "1800"},
	} {
		t.Run(tc.material, func(t *testing.T) {
			c := &Case{File: "anachronism", Place: tc.place,
				Findings: []Finding{{ID: "f", Materials: []string{tc.material}, Confidence: Certain}}}
			d, err := date.Parse(tc.claim)
			if err != nil {
				t.Fatal(err)
			}
			c.Claims = []Claim{{ID: "c", Date: d, DateText: tc.claim}}
			res, err := Analyze(t.Context(), c, ds, Options{NoSensitivity: true})
			if err != nil {
				t.Fatal(err)
			}
			if v := res.Claims[0].Verdict; v != Excluded {
				t.Errorf("%s in an object of %s: %s, want excluded", tc.material, tc.claim, v)
			}
		})
	}
}
