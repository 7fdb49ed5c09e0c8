package wording

import (
	"testing"

	"terminus/constraint/date"
)

func TestBound(t *testing.T) {
	for _, tc := range []struct {
		day   date.Day
		upper bool
		want  string
		why   string
	}{
		{date.Gregorian(1870, 1, 1), false, "1870", "the first day of a year, as a lower bound"},
		{date.Gregorian(1870, 12, 31), true, "1870", "the last day of a year, as an upper bound"},
		{date.Gregorian(1870, 12, 31), false, "1870-12-31", "the last day as a lower bound is a day"},
		{date.Gregorian(1870, 5, 1), false, "1870-05", "the first day of a month"},
		{date.Gregorian(1870, 2, 28), true, "1870-02", "the last day of February in a common year"},
		{date.Gregorian(-1199, 1, 1), false, "1200 BCE", "astronomical year -1199 is 1200 BCE"},
		{date.Gregorian(79, 8, 24), false, "24 Aug 79", "a day of a year below 1000, in words"},
		{date.Gregorian(79, 8, 1), false, "Aug 79", "a month of a year below 1000"},
	} {
		if got := Bound(tc.day, tc.upper); got != tc.want {
			t.Errorf("Bound(%s, %v) = %q, want %q (%s)", tc.day.ISO(), tc.upper, got, tc.want, tc.why)
		}
	}
}

func TestDuration(t *testing.T) {
	for in, want := range map[string]string{"P7Y": "7 years", "P1Y6M": "1 year 6 months", "P0D": "0 days", "P2W": "2 weeks", "P1D": "1 day"} {
		d, err := date.ParseDuration(in)
		if err != nil {
			t.Fatal(err)
		}
		if got := Duration(d); got != want {
			t.Errorf("Duration(%s) = %q, want %q", in, got, want)
		}
	}
}

func TestTierWords(t *testing.T) {
	if Tier(0) != "hard" || NotBefore(1) != "is unlikely to be earlier than" || NotAfter(2) != "would be unusual after" {
		t.Errorf("tier words: %q %q %q", Tier(0), NotBefore(1), NotAfter(2))
	}
	if len(Cautions()) != 5 {
		t.Errorf("the five cautions of the contract: got %d", len(Cautions()))
	}
}
