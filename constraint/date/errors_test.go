package date

import (
	"errors"
	"slices"
	"strings"
	"testing"
)

// Bad dates: the position of the problem and a message that says what was
// expected.
func TestParseErrors(t *testing.T) {
	tests := []struct {
		in   string
		pos  int
		msg  string // a part of the message
		hint string // a part of the hint, "" for none expected
	}{
		{"", 0, "empty date", "write a year"},
		{"1874-13", 5, "month 13: months are 01–12, seasons 21–24", ""},
		{"1874-00", 5, "month 00", ""},
		{"1870-75", 5, "month 75", "for a range of years write 1870/1875"},
		{"1985-02-29", 8, "day 29: February 1985 has 28 days", ""},
		{"1985-04-31", 8, "April 1985 has 30 days", ""},
		{"1900-02-29", 8, "February 1900 has 28 days", ""},
		{"1985-02-3X", 8, "days 30–39: February 1985 has 28 days", ""},
		{"1985-5", 5, "expected a month of two digits", "1874-05"},
		{"874", 0, "expected a year of four digits", "0874 or 874 CE"},
		{"18740521", 0, "more than four digits takes the Y prefix", "1874-05-21"},
		{"XXXX-12-XX", 0, "name 10000 scattered runs of days; at most 1000", "1000/1999"},
		{"1985-XX-12T10:00:00", 10, "a time of day needs a whole date", ""},
		{"19X5-2X", 5, "has no unspecified digits", ""},
		{"19X5-02-3X", 0, "these digits name no day", ""},
		{"19X5-5", 3, "unspecified digits (X) must run to the end", ""},
		{"1985-21-05", 8, "a season has no days", ""},
		{"2004-06-1~1", 9, "a qualifier stands before or after a whole part", "2004-06~-11"},
		{"2004-~~06", 5, "too many qualifiers on one part", ""},
		{"2004~-", 6, "expected a month of two digits", ""},
		{"1874??", 4, "too many qualifiers", ""},
		{"1900/1870", 4, "the interval ends before it starts", "1870/1900"},
		{"../..", 2, "an interval needs at least one date", ""},
		{"1870/1880/1890", 9, `an interval has one "/"`, ""},
		{"{1667,1668}", 0, "all-of set", "[1667,1668]"},
		{"[1667", 5, `expected "]"`, ""},
		{"[1667,,1668]", 6, "expected a date in the set", ""},
		{"[1672..1670]", 5, "the interval ends before it starts", ""},
		{"0 BCE", 0, "there is no year 0", "1 BCE"},
		{"early 1874", 6, "early, mid and late apply to a decade or a century", ""},
		{"1875s", 3, "a decade ends in 0", ""},
		{"1985-04-12T25:00:00", 11, "expected a time hh:mm:ss", ""},
		{"Y", 1, "expected the digits of a year after Y", ""},
		{"1950S5", 5, "significant digits: 5 is not between 1 and the 4 digits", ""},
		{"Smarch 1874", 0, "expected a month name or an EDTF date", ""},
		{"187x", 0, "expected a month name or an EDTF date", "upper-case X: 187X"},
		{"19th centry", 0, "expected a month name or an EDTF date", "19th century (read as 1800 to 1900"},
		{"30 February 1874", 0, "day 30: February 1874 has 28 days", ""},
		{"1874-05-21 (Julian", 11, "unexpected word", ""},
		{"1234567890123 BCE", 0, "year out of range", ""},
		{strings.Repeat("1", 2000), 1024, "too long", ""},
		{"156X-12-25 (Julian)", 0, "Gregorian calendar only", ""},
		{"Y12000 (Julian)", 0, "years -9999 to 9999", ""},
		{"9999 (Julian)", 0, "years -9999 to 9999", ""},
	}
	for _, tt := range tests {
		t.Run(tt.in, func(t *testing.T) {
			_, err := Parse(tt.in)
			var pe *ParseError
			if !errors.As(err, &pe) {
				t.Fatalf("Parse(%q) error = %v, want a *ParseError", tt.in, err)
			}
			if pe.Input != tt.in {
				t.Errorf("Input = %q", pe.Input)
			}
			if pe.Pos != tt.pos {
				t.Errorf("Pos = %d, want %d (%v)", pe.Pos, tt.pos, pe)
			}
			if !strings.Contains(pe.Msg, tt.msg) {
				t.Errorf("Msg = %q, want it to contain %q", pe.Msg, tt.msg)
			}
			if tt.hint != "" && !strings.Contains(pe.Hint(), tt.hint) {
				t.Errorf("Hint() = %q, want it to contain %q", pe.Hint(), tt.hint)
			}
			if !strings.HasPrefix(err.Error(), "date ") || strings.HasSuffix(err.Error(), ".") {
				t.Errorf("Error() = %q: want lower case, no final period", err.Error())
			}
		})
	}
}

func TestParseInCalendars(t *testing.T) {
	tests := []struct {
		in   string
		cal  Calendar
		edtf string
	}{
		{"1582-10-04", CalendarJulian, "1582-10-14"},
		{"1582-10-04 (Gregorian)", CalendarJulian, "1582-10-04"},
		{"1582-10-04 N.S.", CalendarJulian, "1582-10-04"},
		{"1582-10-04 O.S.", CalendarGregorian, "1582-10-14"},
		{"1582-10-04 (O.S.)", CalendarGregorian, "1582-10-14"},
		{"1582-10-04 julian", CalendarGregorian, "1582-10-14"},
		{"1582 (Julian)", CalendarGregorian, "1582-01-11/1583-01-10"},
		{"1582~ (Julian)", CalendarGregorian, "1582-01-11~/1583-01-10~"},
		{"1700-02-29 (Julian)", CalendarGregorian, "1700-03-11"},
		{"1600/1610 (Julian)", CalendarGregorian, "1600-01-11/1611-01-10"},
		{"[1600-01-01,1600-02..] (Julian)", CalendarGregorian, "[1600-01-11,1600-02-11..]"},
		{"before 1582 (Julian)", CalendarGregorian, "../1582-01-10"},
		{"21 May 1620 O.S.", CalendarGregorian, "1620-05-31"},
	}
	for _, tt := range tests {
		t.Run(tt.in, func(t *testing.T) {
			d, err := ParseIn(tt.in, tt.cal)
			if err != nil {
				t.Fatal(err)
			}
			if d.EDTF() != tt.edtf {
				t.Errorf("EDTF() = %q, want %q", d.EDTF(), tt.edtf)
			}
			again, err := Parse(d.EDTF())
			if err != nil || !slices.Equal(iso(again), iso(d)) {
				t.Errorf("Parse(%q) = %v, %v; want %v", d.EDTF(), iso(again), err, iso(d))
			}
		})
	}
	if _, err := Parse("1700-02-29"); err == nil {
		t.Error("Gregorian 1700-02-29 accepted")
	}
}
