package materials

import (
	"strings"
	"testing"

	"terminus/constraint/date"
)

// ArrivalArea walks up the region table without allocating; it must name
// the same area as the plain definition: the first of Ancestors(place)
// for which the material has arrival claims. Checked for every material of
// the built-in dataset at every place of the table, and at unknown places.
func TestArrivalAreaMatchesAncestors(t *testing.T) {
	d, err := Builtin()
	if err != nil {
		t.Fatal(err)
	}
	places := append(d.Regions.Codes(), "", "XX", "nl")
	checked := 0
	for _, m := range d.Materials {
		for _, place := range places {
			want := ""
			for _, a := range d.Regions.Ancestors(place) {
				if len(m.Claims(KindArrived, a)) > 0 {
					want = a
					break
				}
			}
			if got := d.ArrivalArea(m, place); got != want {
				t.Fatalf("ArrivalArea(%s, %q) = %q, want %q", m.ID, place, got, want)
			}
			claims, area := d.Arrival(m, place)
			if area != want || (want == "") != (len(claims) == 0) {
				t.Fatalf("Arrival(%s, %q) = %d claims in %q, want area %q", m.ID, place, len(claims), area, want)
			}
			if want != "" {
				checked++
			}
		}
	}
	if checked == 0 {
		t.Fatal("no material has an arrival anywhere: the check checked nothing")
	}
	if n := testing.AllocsPerRun(100, func() { d.ArrivalArea(d.Materials[0], "NL") }); n != 0 {
		t.Errorf("ArrivalArea allocates %.0f times per call", n)
	}
}

// TestLocalManufactureIsNoArrival: the start of making a material in a
// place is not its arrival there when it was already sold elsewhere, as
// imports may have come first. Such a claim (its note begins "local
// manufacture") says only that the material was there by that date: it is
// open at its start unless another claim for the place comes no later than
// the first sale anywhere, or the material was first made in that place
// (the listed exceptions, each with its reason).
func TestLocalManufactureIsNoArrival(t *testing.T) {
	madeThereFirst := map[[2]string]string{
		{"lead-white", "150"}:      "the Greek corrosion method is an origin independent of the Chinese one (Han et al. 2022)",
		{"oil-pastel", "JP"}:       "invented in Japan",
		{"synthetic-indigo", "DE"}: "BASF put the first synthetic indigo on the market at Ludwigshafen (Schmidt 1997)",
	}
	d, err := Builtin()
	if err != nil {
		t.Fatal(err)
	}
	checked := 0
	for _, m := range d.Materials {
		var firstSale date.Day
		sold := false
		for _, ms := range m.Claims(KindSold, "") {
			if day, ok := ms.Date.Earliest(); ok && (!sold || day < firstSale) {
				firstSale, sold = day, true
			}
		}
		if !sold {
			continue
		}
		byPlace := map[string][]*Milestone{}
		for i := range m.Milestones {
			if ms := &m.Milestones[i]; ms.Kind == KindArrived {
				byPlace[ms.Place] = append(byPlace[ms.Place], ms)
			}
		}
		for place, claims := range byPlace {
			covered := false
			for _, ms := range claims {
				if day, ok := ms.Date.Earliest(); !ok || day <= firstSale {
					covered = true
				}
			}
			for _, ms := range claims {
				if !strings.HasPrefix(ms.Note, "local manufacture") {
					continue
				}
				checked++
				if _, ok := ms.Date.Earliest(); ok && !covered && madeThereFirst[[2]string{m.ID, place}] == "" {
					t.Errorf("%s arrived in %s %s (%s): local manufacture after the first sale anywhere (%s); write it open at the start (../DATE)", m.ID, place, ms.Date, ms.Source, firstSale.ISO())
				}
			}
		}
	}
	if checked == 0 {
		t.Fatal("no local manufacture claims: the check checked nothing")
	}
}
