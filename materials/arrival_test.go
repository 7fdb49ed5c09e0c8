package materials

import "testing"

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
