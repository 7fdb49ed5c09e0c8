package date

import (
	"slices"
	"strings"
	"testing"
)

func TestOldStyle(t *testing.T) {
	tests := []struct {
		in     string
		ys     YearStart
		cal    Calendar
		want   []string // the alternatives, first and last day
		note   string   // a part of a note, "" for none
		reason string
	}{
		// George Washington's birth, "11 February 1731/32" Old Style, is 22
		// February 1732 New Style (well known; from memory, as his birth is
		// given by Mount Vernon and in every biography).
		{"11 February 1731/32", 0, 0, []string{"1732-02-22→1732-02-22"}, "dual year",
			"a dual year gives the new-style year; Julian unless marked"},
		{"11 Feb 1731/2", 0, 0, []string{"1732-02-22→1732-02-22"}, "", "the second year may be one digit"},
		{"11 February 1731 O.S.", 0, 0, []string{"1731-02-22→1731-02-22", "1732-02-22→1732-02-22"}, "ambiguous",
			"an Old Style February date without the year start is one of two years"},
		{"11 February 1731", YearStartUnknown, CalendarJulian, []string{"1731-02-22→1731-02-22", "1732-02-22→1732-02-22"}, "ambiguous",
			"a case's Julian calendar makes the date Old Style too"},
		{"11 February 1731", YearStartLadyDay, CalendarJulian, []string{"1732-02-22→1732-02-22"}, "",
			"the English year start resolves it"},
		{"11 February 1731", YearStartJanuary, CalendarJulian, []string{"1731-02-22→1731-02-22"}, "",
			"a 1 January year start resolves it the other way"},
		// Isaac Newton's birth, 25 December 1642 Old Style, is 4 January
		// 1643 New Style (well known; from memory).
		{"25 December 1642 O.S.", 0, 0, []string{"1643-01-04→1643-01-04"}, "",
			"a date after 25 March is not ambiguous"},
		{"25 December 1642", YearStartChristmas, CalendarJulian, []string{"1642-01-04→1642-01-04"}, "",
			"in the Nativity style 25 December begins the next year number"},
		{"10 February 1712", YearStartMarch, CalendarJulian, []string{"1713-02-21→1713-02-21"}, "",
			"in the Venetian style January and February belong to the year before"},
		{"March 1712 O.S.", 0, 0, []string{"1712-03-12→1712-04-11", "1713-03-12→1713-04-04"}, "straddles",
			"March straddles 25 March: one reading splits it in two runs"},
		{"1712/13", 0, 0, []string{"1712-03-12→1713-04-04"}, "dual year",
			"a bare dual year is the Old Style year, 1 March to 24 March covering both starts"},
		{"before 11 February 1731 O.S.", 0, 0, []string{"..→1732-02-21"}, "ambiguous",
			"a bound on an ambiguous date takes the later reading: nothing is excluded that either allows"},
		{"10 June 1712 O.S.", 0, 0, []string{"1712-06-21→1712-06-21"}, "", "June is the same year in both styles"},
		{"1712-02-10 (Julian)", 0, 0, []string{"1712-02-21→1712-02-21"}, "",
			"EDTF numbers years from 1 January: never ambiguous"},
		{"10 February 1712/13 N.S.", 0, 0, []string{"1713-02-10→1713-02-10"}, "",
			"a dual year marked Gregorian stays Gregorian"},
		// The British calendar reform: Wednesday 2 September 1752 was
		// followed by Thursday 14 September 1752 (Calendar (New Style) Act
		// 1750; from memory).
		{"2 September 1752 O.S.", 0, 0, []string{"1752-09-13→1752-09-13"}, "", "the last Julian day in Britain"},
	}
	for _, tc := range tests {
		t.Run(tc.in, func(t *testing.T) {
			d, err := ParseWith(tc.in, Options{Calendar: tc.cal, YearStart: tc.ys})
			if err != nil {
				t.Fatalf("%s: %v", tc.reason, err)
			}
			if got := iso(d); !slices.Equal(got, tc.want) {
				t.Errorf("%s: days %v, want %v", tc.reason, got, tc.want)
			}
			notes := strings.Join(d.Notes(), "\n")
			if tc.note != "" && !strings.Contains(notes, tc.note) {
				t.Errorf("%s: notes %q lack %q", tc.reason, notes, tc.note)
			}
			if tc.note == "" && len(d.Notes()) > 0 && strings.Contains(notes, "ambiguous") {
				t.Errorf("%s: unexpected note %q", tc.reason, notes)
			}
			checkDate(t, tc.in, d)
		})
	}
}

func TestOldStyleErrors(t *testing.T) {
	tests := []struct {
		in, msg, hint, reason string
	}{
		{"10 June 1712/13", "dual year is written for dates from 1 January to 24 March", "10 June 1712",
			"a dual year outside January–March is a slip"},
		{"10 February 1712/14", "the second year of a dual year is the next year", "1712/13",
			"the second year must follow the first"},
		{"1870/75", "expected a year of four digits", "1870/1875",
			"after 1752 a short second year is a range written short, not a dual year"},
	}
	for _, tc := range tests {
		t.Run(tc.in, func(t *testing.T) {
			_, err := Parse(tc.in)
			pe, ok := err.(*ParseError)
			if !ok {
				t.Fatalf("%s: error %v, want a *ParseError", tc.reason, err)
			}
			if !strings.Contains(pe.Msg, tc.msg) || !strings.Contains(pe.Hint(), tc.hint) {
				t.Errorf("%s: %v (hint %q), want %q and hint %q", tc.reason, err, pe.Hint(), tc.msg, tc.hint)
			}
		})
	}
}

func TestParseYearStart(t *testing.T) {
	for in, want := range map[string]YearStart{"25 March": YearStartLadyDay, "lady day": YearStartLadyDay,
		"1 January": YearStartJanuary, "1 March": YearStartMarch, "christmas": YearStartChristmas} {
		if got, err := ParseYearStart(in); err != nil || got != want {
			t.Errorf("ParseYearStart(%q) = %v, %v; want %v", in, got, err, want)
		}
	}
	if _, err := ParseYearStart("easter"); err == nil {
		t.Error("ParseYearStart(easter): no error; the movable Easter style is not read")
	}
}

func TestCenturies(t *testing.T) {
	tests := []struct {
		in, edtf string
		prec     Precision
		reason   string
	}{
		{"18th century", "1700/1800", PrecisionCentury, "the union of 1701–1800 and 1700–1799"},
		{"18th c.", "1700/1800", PrecisionCentury, "the catalogue abbreviation"},
		{"18th cent.", "1700/1800", PrecisionCentury, "another abbreviation"},
		{"eighteenth century", "1700/1800", PrecisionCentury, "the ordinal in words"},
		{"18th-century", "1700/1800", PrecisionCentury, "the adjective"},
		{"early 18th century", "1700/1733", PrecisionDecade, "the first third from the round year"},
		{"mid-18th century", "1733/1766", PrecisionDecade, "the middle third"},
		{"late 18th century", "1766/1800", PrecisionDecade, "the last third runs to the end of the union"},
		{"first half of the 18th century", "1700/1750", PrecisionDecade, "halves meet at 1750"},
		{"second half of the 18th century", "1750/1800", PrecisionDecade, "the second half"},
		{"second quarter of the 19th century", "1825/1850", PrecisionDecade, "quarters of 25 years"},
		{"last quarter of the 18th century", "1775/1800", PrecisionDecade, "last is the fourth"},
		{"3rd century BCE", "-0299/-0199", PrecisionCentury, "300 to 200 BCE, astronomical -299 to -199"},
		{"1st century BCE", "-0099/0000", PrecisionCentury, "100 BCE to 1 BCE: there is no year 0 BCE"},
		{"1st century AD", "0001/0100", PrecisionCentury, "AD 1 to 100: there is no year 0 AD"},
		{"5th millennium BCE", "-4999/-3999", PrecisionMillennium, "5000 to 4000 BCE"},
		{"2nd millennium", "1000/2000", PrecisionMillennium, "1001–2000 and 1000–1999"},
		{"c. 18th century", "1700~/1800~", PrecisionCentury, "circa widens both ends by the century policy"},
		{"18th century?", "1700?/1800?", PrecisionCentury, "uncertain"},
		{"18th-19th century", "1700/1900", PrecisionCentury, "a range of centuries with one unit word"},
		{"3rd–2nd century BCE", "-0299/-0099", PrecisionCentury, "the era after the range applies to both"},
		{"before the 18th century", "../1699", PrecisionYear, "strictly before the union"},
		{"the 1700s", "17XX", PrecisionCentury, "the hundreds stay 1700–1799"},
	}
	for _, tc := range tests {
		t.Run(tc.in, func(t *testing.T) {
			d, err := Parse(tc.in)
			if err != nil {
				t.Fatalf("%s: %v", tc.reason, err)
			}
			if d.EDTF() != tc.edtf || d.Precision != tc.prec {
				t.Errorf("%s: %s (%v), want %s (%v)", tc.reason, d.EDTF(), d.Precision, tc.edtf, tc.prec)
			}
			checkDate(t, tc.in, d)
		})
	}
}
