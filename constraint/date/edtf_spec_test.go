package date

import (
	"errors"
	"slices"
	"testing"
)

// The examples of the EDTF specification (Library of Congress, "Extended
// Date/Time Format (EDTF) Specification", February 4, 2019), each with the
// meaning the specification gives it, as runs of days. The section of the
// specification is named beside each example.

type specCase struct {
	section string
	in      string
	alts    []string // first→last per alternative, ".." for an open side
	prec    Precision
	approx  bool
	uncert  bool
}

func checkSpec(t *testing.T, cases []specCase) {
	t.Helper()
	for _, c := range cases {
		t.Run(c.section+" "+c.in, func(t *testing.T) {
			d := parsedAs(t, c.in, c.in, c.alts) // the EDTF form is the example itself
			if d.Precision != c.prec {
				t.Errorf("precision = %v, want %v", d.Precision, c.prec)
			}
			if d.Approximate != c.approx || d.Uncertain != c.uncert {
				t.Errorf("approximate, uncertain = %v, %v; want %v, %v", d.Approximate, d.Uncertain, c.approx, c.uncert)
			}
			again, err := Parse(d.EDTF())
			if err != nil || !slices.Equal(iso(again), iso(d)) {
				t.Errorf("Parse(EDTF()) = %v, %v; want the same days", iso(again), err)
			}
		})
	}
}

func TestEDTFLevel0(t *testing.T) {
	checkSpec(t, []specCase{
		// Level 0, Date, examples 1–3.
		{"L0 Date ex1", "1985-04-12", []string{"1985-04-12→1985-04-12"}, PrecisionDay, false, false},
		{"L0 Date ex2", "1985-04", []string{"1985-04-01→1985-04-30"}, PrecisionMonth, false, false},
		{"L0 Date ex3", "1985", []string{"1985-01-01→1985-12-31"}, PrecisionYear, false, false},
		// Level 0, Date and Time, examples 1–4: the calendar date as written.
		{"L0 Date and Time ex1", "1985-04-12T23:20:30", []string{"1985-04-12→1985-04-12"}, PrecisionDay, false, false},
		{"L0 Date and Time ex2", "1985-04-12T23:20:30Z", []string{"1985-04-12→1985-04-12"}, PrecisionDay, false, false},
		{"L0 Date and Time ex3", "1985-04-12T23:20:30-04", []string{"1985-04-12→1985-04-12"}, PrecisionDay, false, false},
		{"L0 Date and Time ex4", "1985-04-12T23:20:30+04:30", []string{"1985-04-12→1985-04-12"}, PrecisionDay, false, false},
		// Level 0, Time Interval, examples 1–6: "beginning sometime in 1964
		// and ending sometime in 2008" and so on.
		{"L0 Time Interval ex1", "1964/2008", []string{"1964-01-01→2008-12-31"}, PrecisionYear, false, false},
		{"L0 Time Interval ex2", "2004-06/2006-08", []string{"2004-06-01→2006-08-31"}, PrecisionMonth, false, false},
		{"L0 Time Interval ex3", "2004-02-01/2005-02-08", []string{"2004-02-01→2005-02-08"}, PrecisionDay, false, false},
		{"L0 Time Interval ex4", "2004-02-01/2005-02", []string{"2004-02-01→2005-02-28"}, PrecisionDay, false, false},
		{"L0 Time Interval ex5", "2004-02-01/2005", []string{"2004-02-01→2005-12-31"}, PrecisionDay, false, false},
		{"L0 Time Interval ex6", "2005/2006-02", []string{"2005-01-01→2006-02-28"}, PrecisionYear, false, false},
	})
}

func TestEDTFLevel1(t *testing.T) {
	checkSpec(t, []specCase{
		// Level 1, Letter-prefixed calendar year, examples 1–2.
		{"L1 Letter-prefixed year ex1", "Y170000002", []string{"170000002-01-01→170000002-12-31"}, PrecisionYear, false, false},
		{"L1 Letter-prefixed year ex2", "Y-170000002", []string{"-170000002-01-01→-170000002-12-31"}, PrecisionYear, false, false},
		// Level 1, Seasons: "Spring, 2001" (read as March–May, see the package doc).
		{"L1 Seasons ex", "2001-21", []string{"2001-03-01→2001-05-31"}, PrecisionSeason, false, false},
		// Level 1, Qualification of a date (complete), examples 1–3.
		{"L1 Qualification ex1", "1984?", []string{"1984-01-01→1984-12-31"}, PrecisionYear, false, true},
		{"L1 Qualification ex2", "2004-06~", []string{"2004-06-01→2004-06-30"}, PrecisionMonth, true, false},
		{"L1 Qualification ex3", "2004-06-11%", []string{"2004-06-11→2004-06-11"}, PrecisionDay, true, true},
		// Level 1, Unspecified digit(s) from the right, examples 1–5.
		{"L1 Unspecified ex1", "201X", []string{"2010-01-01→2019-12-31"}, PrecisionDecade, false, false},
		{"L1 Unspecified ex2", "20XX", []string{"2000-01-01→2099-12-31"}, PrecisionCentury, false, false},
		{"L1 Unspecified ex3", "2004-XX", []string{"2004-01-01→2004-12-31"}, PrecisionYear, false, false},
		{"L1 Unspecified ex4", "1985-04-XX", []string{"1985-04-01→1985-04-30"}, PrecisionMonth, false, false},
		{"L1 Unspecified ex5", "1985-XX-XX", []string{"1985-01-01→1985-12-31"}, PrecisionYear, false, false},
		// Level 1, Extended Interval: open end, examples 1–3.
		{"L1 Open end ex1", "1985-04-12/..", []string{"1985-04-12→.."}, PrecisionDay, false, false},
		{"L1 Open end ex2", "1985-04/..", []string{"1985-04-01→.."}, PrecisionMonth, false, false},
		{"L1 Open end ex3", "1985/..", []string{"1985-01-01→.."}, PrecisionYear, false, false},
		// Open start, examples 4–6.
		{"L1 Open start ex4", "../1985-04-12", []string{"..→1985-04-12"}, PrecisionDay, false, false},
		{"L1 Open start ex5", "../1985-04", []string{"..→1985-04-30"}, PrecisionMonth, false, false},
		{"L1 Open start ex6", "../1985", []string{"..→1985-12-31"}, PrecisionYear, false, false},
		// Unknown end, examples 7–9 (an unknown end bounds nothing).
		{"L1 Unknown end ex7", "1985-04-12/", []string{"1985-04-12→.."}, PrecisionDay, false, false},
		{"L1 Unknown end ex8", "1985-04/", []string{"1985-04-01→.."}, PrecisionMonth, false, false},
		{"L1 Unknown end ex9", "1985/", []string{"1985-01-01→.."}, PrecisionYear, false, false},
		// Unknown start, examples 10–12.
		{"L1 Unknown start ex10", "/1985-04-12", []string{"..→1985-04-12"}, PrecisionDay, false, false},
		{"L1 Unknown start ex11", "/1985-04", []string{"..→1985-04-30"}, PrecisionMonth, false, false},
		{"L1 Unknown start ex12", "/1985", []string{"..→1985-12-31"}, PrecisionYear, false, false},
		// Level 1, Negative calendar year, example 1.
		{"L1 Negative year ex1", "-1985", []string{"-1985-01-01→-1985-12-31"}, PrecisionYear, false, false},
		// Level 1, Extended Interval, rule 3: "a modifier may appear at the
		// end of the date" of either end (the strings are ours).
		{"L1 Extended Interval rule3", "1984?/2004-06~", []string{"1984-01-01→2004-06-30"}, PrecisionYear, true, true},
		{"L1 Extended Interval rule3", "1984-06-02?/2004-08-08~", []string{"1984-06-02→2004-08-08"}, PrecisionDay, true, true},
	})
}

func TestEDTFLevel2Sets(t *testing.T) {
	checkSpec(t, []specCase{
		// Level 2, Set representation, One of a set, examples 1–6.
		// Ex1 "One of the years 1667, 1668, 1670, 1671, 1672": 1667 and 1668 touch and merge.
		{"L2 One of a set ex1", "[1667,1668,1670..1672]", []string{"1667-01-01→1668-12-31", "1670-01-01→1672-12-31"}, PrecisionYear, false, false},
		// Ex2 "December 3, 1760; or some earlier date".
		{"L2 One of a set ex2", "[..1760-12-03]", []string{"..→1760-12-03"}, PrecisionDay, false, false},
		// Ex3 "December 1760, or some later month".
		{"L2 One of a set ex3", "[1760-12..]", []string{"1760-12-01→.."}, PrecisionMonth, false, false},
		// Ex4 "January or February of 1760 or December 1760 or some later month" (1760 is a leap year).
		{"L2 One of a set ex4", "[1760-01,1760-02,1760-12..]", []string{"1760-01-01→1760-02-29", "1760-12-01→.."}, PrecisionMonth, false, false},
		// Ex5 "Either the year 1667 or the month December of 1760."
		{"L2 One of a set ex5", "[1667,1760-12]", []string{"1667-01-01→1667-12-31", "1760-12-01→1760-12-31"}, PrecisionYear, false, false},
		// Ex6 "The year 1984 or an earlier year".
		{"L2 One of a set ex6", "[..1984]", []string{"..→1984-12-31"}, PrecisionYear, false, false},
		// Level 2, other features read here: Exponential year example.
		{"L2 Exponential year ex", "Y-170000000", []string{"-170000000-01-01→-170000000-12-31"}, PrecisionYear, false, false},
		// Significant digits, example 1: "some year between 1900 and 1999, estimated to be 1950".
		{"L2 Significant digits ex1", "1950S2", []string{"1900-01-01→1999-12-31"}, PrecisionCentury, false, false},
		// Example 2: "some year between 171000000 and 171999999".
		{"L2 Significant digits ex2", "Y171010000S3", []string{"171000000-01-01→171999999-12-31"}, PrecisionMillennium, false, false},
		// Sub-year groupings example: "second quarter of 2001".
		{"L2 Sub-year groupings ex", "2001-34", []string{"2001-04-01→2001-06-30"}, PrecisionSeason, false, false},
		// Unspecified Digit example 6: "October, November, or December 1984".
		{"L2 Unspecified Digit ex6", "1984-1X", []string{"1984-10-01→1984-12-31"}, PrecisionYear, false, false},
		// Unspecified Digit example 4: "Some month during the 1000s".
		{"L2 Unspecified Digit ex4", "1XXX-XX", []string{"1000-01-01→1999-12-31"}, PrecisionMillennium, false, false},
		// Interval example 2: "beginning on an unspecified day in June 2004 and ending July 3".
		{"L2 Interval ex2", "2004-06-XX/2004-07-03", []string{"2004-06-01→2004-07-03"}, PrecisionMonth, false, false},
	})
}

// Level-2 forms that give non-canonical input or other spellings of the
// same dates.
func TestEDTFLevel2Spellings(t *testing.T) {
	tests := []struct{ section, in, edtf string }{
		// Exponential year example: the canonical form writes the digits.
		{"L2 Exponential year ex", "Y-17E7", "Y-170000000"},
		// Significant digits example 3: "some year between 338000 and 338999, estimated to be 338800".
		{"L2 Significant digits ex3", "Y3388E2S3", "Y338800S3"},
		// A set with spaces after the commas (the specification allows none).
		{"L2 Set representation rule 4", "[1667, 1668, 1670..1672]", "[1667,1668,1670..1672]"},
	}
	for _, tt := range tests {
		t.Run(tt.section, func(t *testing.T) {
			d, err := Parse(tt.in)
			if err != nil {
				t.Fatal(err)
			}
			if d.EDTF() != tt.edtf {
				t.Errorf("EDTF() = %q, want %q", d.EDTF(), tt.edtf)
			}
		})
	}
	d, _ := Parse("Y3388E2S3")
	if got := iso(d); !slices.Equal(got, []string{"338000-01-01→338999-12-31"}) {
		t.Errorf("Y3388E2S3 days = %v, want 338000 to 338999", got)
	}
}

// Level-2 forms not read: each is a *ParseError that says why.
func TestEDTFLevel2Unsupported(t *testing.T) {
	for _, tt := range []struct{ section, in string }{
		{"L2 All Members ex7", "{1667,1668,1670..1672}"},
		{"L2 All Members ex8", "{1960,1961-12}"},
		{"L2 All Members ex9", "{..1984}"},
		// "Some day in December in some year": 10000 Decembers, more runs
		// of days than this package reads (1000).
		{"L2 Unspecified Digit ex3", "XXXX-12-XX"},
	} {
		t.Run(tt.section, func(t *testing.T) {
			_, err := Parse(tt.in)
			var pe *ParseError
			if !errors.As(err, &pe) {
				t.Fatalf("Parse(%q) error = %v, want a *ParseError", tt.in, err)
			}
			if pe.Input != tt.in || pe.Pos < 0 || pe.Pos > len(tt.in) || pe.Msg == "" {
				t.Errorf("error fields = %+v", pe)
			}
		})
	}
}

// Level 2, Unspecified Digit: X digits anywhere leave scattered days, read
// as a disjunction of runs of days (the meanings are the specification's).
func TestEDTFLevel2ScatteredX(t *testing.T) {
	tests := []struct {
		section, in string
		n           int    // how many runs
		first, last string // the first and the last run
		prec        Precision
	}{
		// Example 1: "December 25 sometime during the 1560s".
		{"L2 Unspecified Digit ex1", "156X-12-25", 10, "1560-12-25→1560-12-25", "1569-12-25→1569-12-25", PrecisionDay},
		// Example 2: "December 25 sometime during the 1500s".
		{"L2 Unspecified Digit ex2", "15XX-12-25", 100, "1500-12-25→1500-12-25", "1599-12-25→1599-12-25", PrecisionDay},
		// Example 5: "Some December during the 1000s".
		{"L2 Unspecified Digit ex5", "1XXX-12", 1000, "1000-12-01→1000-12-31", "1999-12-01→1999-12-31", PrecisionMonth},
		// Our own strings: the twelfth of each month of 1985 (1985-01-12 … 1985-12-12).
		{"L2 Unspecified Digit (ours)", "1985-XX-12", 12, "1985-01-12→1985-01-12", "1985-12-12→1985-12-12", PrecisionDay},
		// Every year of 1905, 1915, … 1995; February or December 1984; the 5th, 15th, 25th of February 1985;
		// the 1st, 11th, 21st of April 1985 (not the 31st: April has 30 days).
		{"L2 Unspecified Digit (ours)", "19X5", 10, "1905-01-01→1905-12-31", "1995-01-01→1995-12-31", PrecisionYear},
		{"L2 Unspecified Digit (ours)", "1984-X2", 2, "1984-02-01→1984-02-29", "1984-12-01→1984-12-31", PrecisionMonth},
		{"L2 Unspecified Digit (ours)", "1985-02-X5", 3, "1985-02-05→1985-02-05", "1985-02-25→1985-02-25", PrecisionDay},
		{"L2 Unspecified Digit (ours)", "1985-04-X1", 3, "1985-04-01→1985-04-01", "1985-04-21→1985-04-21", PrecisionDay},
		{"L2 Unspecified Digit (ours)", "-15X0", 10, "-1590-01-01→-1590-12-31", "-1500-01-01→-1500-12-31", PrecisionYear},
	}
	for _, tt := range tests {
		t.Run(tt.section+" "+tt.in, func(t *testing.T) {
			d, err := Parse(tt.in)
			if err != nil {
				t.Fatal(err)
			}
			got := iso(d)
			if len(got) != tt.n || got[0] != tt.first || got[len(got)-1] != tt.last {
				t.Errorf("%d runs from %s to %s, want %d from %s to %s", len(got), got[0], got[len(got)-1], tt.n, tt.first, tt.last)
			}
			if d.EDTF() != tt.in || d.Precision != tt.prec {
				t.Errorf("EDTF() = %q, precision %v; want %q, %v", d.EDTF(), d.Precision, tt.in, tt.prec)
			}
			checkDate(t, tt.in, d)
		})
	}
	// Approximate scattered days widen run by run (day policy: 7 days).
	d, err := Parse("156X-12-25~")
	if err != nil {
		t.Fatal(err)
	}
	w := iso(d.Widen(DefaultCirca()))
	if len(w) != 10 || w[0] != "1560-12-18→1561-01-01" {
		t.Errorf("156X-12-25~ widened = %v", w)
	}
}

// Level 2, Qualification: qualifiers on single parts, with the meaning the
// specification gives (which parts are approximate or uncertain), and how
// far the default circa policy then widens (the finest approximate part).
func TestEDTFLevel2Qualification(t *testing.T) {
	tests := []struct {
		section, in    string
		people         string // the parts qualified, as the specification lists them
		approx, uncert bool
		widened        string
	}{
		// Group Qualification example 1: "year, month, and day uncertain and approximate".
		{"L2 Group Qualification ex1", "2004-06-11%", "c. 11 June 2004?", true, true, "2004-06-04→2004-06-18"},
		// Example 2: "year and month approximate" (widened by the month policy, one calendar month each way).
		{"L2 Group Qualification ex2", "2004-06~-11", "11 June 2004 (year approximate, month approximate)", true, false, "2004-05-11→2004-07-11"},
		// Example 3: "year uncertain" (nothing widens).
		{"L2 Group Qualification ex3", "2004?-06-11", "11 June 2004 (year uncertain)", false, true, "2004-06-11→2004-06-11"},
		// Qualification of Individual Component example 4: "year uncertain; month known; day approximate".
		{"L2 Individual Component ex4", "?2004-06-~11", "11 June 2004 (year uncertain, day approximate)", true, true, "2004-06-04→2004-06-18"},
		// Example 5: "month uncertain and approximate; year and day known".
		{"L2 Individual Component ex5", "2004-%06-11", "11 June 2004 (month approximate and uncertain)", true, true, "2004-05-11→2004-07-11"},
		// Interval example 1: "An interval in June 2004 beginning approximately the first and ending approximately the 20th".
		{"L2 Interval ex1", "2004-06-~01/2004-06-~20", "1 June 2004 (day approximate) to 20 June 2004 (day approximate)", true, false, "2004-05-25→2004-06-27"},
	}
	for _, tt := range tests {
		t.Run(tt.section, func(t *testing.T) {
			d, err := Parse(tt.in)
			if err != nil {
				t.Fatal(err)
			}
			if d.EDTF() != tt.in {
				t.Errorf("EDTF() = %q, want %q", d.EDTF(), tt.in)
			}
			if d.String() != tt.people {
				t.Errorf("String() = %q, want %q", d.String(), tt.people)
			}
			if d.Approximate != tt.approx || d.Uncertain != tt.uncert {
				t.Errorf("approximate, uncertain = %v, %v", d.Approximate, d.Uncertain)
			}
			if got := iso(d.Widen(DefaultCirca())); len(got) != 1 || got[0] != tt.widened {
				t.Errorf("widened = %v, want %s", got, tt.widened)
			}
			checkDate(t, tt.in, d)
		})
	}
	// Other spellings of the same qualifiers come back in the shortest form.
	for in, want := range map[string]string{
		"~2004-~06-~11":  "2004-06-11~",
		"2004-~06~":      "2004-06~",
		"~2004-06-11":    "2004~-06-11",
		"2004?-06-11~":   "%2004-~06-~11",
		"c. 2004-06~-11": "2004-06-11~",
	} {
		d, err := Parse(in)
		if err != nil {
			t.Fatalf("Parse(%q): %v", in, err)
		}
		if d.EDTF() != want {
			t.Errorf("Parse(%q).EDTF() = %q, want %q", in, d.EDTF(), want)
		}
	}
}
