package wording

import "testing"

func TestYearWords(t *testing.T) {
	for _, tc := range []struct {
		got, want, why string
	}{
		{YearText(1850), "1850", "a year of the common era is written plainly"},
		{YearText(79), "79 CE", "no padding below 1000, and the era said"},
		{YearText(0), "1 BCE", "astronomical year 0 is 1 BCE"},
		{YearText(-1199), "1200 BCE", "astronomical -1199 is 1200 BCE"},
		{AxisYear(-1200), "1200 BCE", "a tick counted in historical years"},
		{AxisYear(0), "1 CE", "there is no year 0: the tick at the era's start"},
		{AxisYear(1900), "1900", "a tick of the common era"},
	} {
		if tc.got != tc.want {
			t.Errorf("got %q, want %q (%s)", tc.got, tc.want, tc.why)
		}
	}
}
