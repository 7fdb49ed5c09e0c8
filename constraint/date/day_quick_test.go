package date

import "testing"

func TestQuickRoundTrip(t *testing.T) {
	if got := Gregorian(2000, 1, 1); got != 2451545 {
		t.Fatalf("2000-01-01 = %d", got)
	}
	if got := Julian(-4712, 1, 1); got != 0 {
		t.Fatalf("julian -4712-01-01 = %d", got)
	}
	if Julian(1582, 10, 4)+1 != Gregorian(1582, 10, 15) {
		t.Fatal("reform")
	}
	for d := Day(-3000000); d < 4000000; d += 97 {
		y, m, dd := d.Civil()
		if Gregorian(y, m, dd) != d {
			t.Fatalf("civil %d", d)
		}
		y, m, dd = d.JulianCivil()
		if Julian(y, m, dd) != d {
			t.Fatalf("julian %d", d)
		}
	}
}
