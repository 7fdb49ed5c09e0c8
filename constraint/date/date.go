// Package date reads and writes historical dates as intervals of days.
//
// (The full package documentation — supported EDTF features, friendly forms,
// the circa policy, durations and calendars — is written with the parser.)
package date

import (
	"fmt"
	"strconv"
	"strings"
)

// Precision is how finely a date was written.
type Precision uint8

// The precisions, finest first.
const (
	PrecisionDay Precision = iota
	PrecisionMonth
	PrecisionSeason
	PrecisionYear
	PrecisionDecade
	PrecisionCentury
	PrecisionMillennium
)

// Interval is a closed run of days. An open side (OpenStart, OpenEnd) is
// unbounded and its First or Last is meaningless.
type Interval struct {
	First, Last        Day
	OpenStart, OpenEnd bool
}

// Date is a written date read as one interval of days or, for an EDTF
// one-of set, as several disjoint intervals (a disjunction).
type Date struct {
	// Input is the text as written.
	Input string
	// Alternatives holds the intervals in ascending order; a plain date or
	// an EDTF interval has exactly one.
	Alternatives []Interval
	// Precision is the precision of the (first) written date.
	Precision Precision
	// Approximate and Uncertain are the EDTF qualifiers "~" and "?" ("%"
	// sets both), on any part of the date.
	Approximate, Uncertain bool
	// OneOf marks a level-2 one-of set "[…]".
	OneOf bool

	edtf string
	// parts keep what Widen needs: the precision and approximation of each end.
	parts []part
}

type part struct {
	precision              Precision
	approxStart, approxEnd bool
}

// ParseError is the error of every parse in this package.
type ParseError struct {
	Input string // the whole text
	Pos   int    // byte offset of the problem in Input
	Msg   string // what was expected
}

func (e *ParseError) Error() string {
	return fmt.Sprintf("date %q at column %d: %s", e.Input, e.Pos+1, e.Msg)
}

// EDTF returns the canonical EDTF form of d.
func (d Date) EDTF() string { return d.edtf }

// Earliest returns the first day d can be, or false when it is open.
func (d Date) Earliest() (Day, bool) {
	if len(d.Alternatives) == 0 || d.Alternatives[0].OpenStart {
		return 0, false
	}
	return d.Alternatives[0].First, true
}

// Latest returns the last day d can be, or false when it is open.
func (d Date) Latest() (Day, bool) {
	if len(d.Alternatives) == 0 || d.Alternatives[len(d.Alternatives)-1].OpenEnd {
		return 0, false
	}
	return d.Alternatives[len(d.Alternatives)-1].Last, true
}

// String returns d for people: "1874", "1874-05", "1200 BCE", "c. 1870".
func (d Date) String() string { return d.edtf }

// Parse reads EDTF or one of the friendly forms.
//
// This first version reads years, year-months and full dates, "~" and "?",
// and "A/B" intervals; the full grammar replaces it.
func Parse(s string) (Date, error) {
	in := strings.TrimSpace(s)
	d := Date{Input: s, edtf: in}
	if a, b, ok := strings.Cut(in, "/"); ok {
		first, p1, err := parseSimple(s, a)
		if err != nil {
			return Date{}, err
		}
		last, _, err := parseSimple(s, b)
		if err != nil {
			return Date{}, err
		}
		d.Alternatives = []Interval{{First: first.First, Last: last.Last}}
		d.Precision = p1
		return d, nil
	}
	iv, p, err := parseSimple(s, in)
	if err != nil {
		return Date{}, err
	}
	d.Alternatives = []Interval{iv}
	d.Precision = p
	d.Approximate = strings.ContainsAny(in, "~%")
	d.Uncertain = strings.ContainsAny(in, "?%")
	return d, nil
}

func parseSimple(input, s string) (Interval, Precision, error) {
	s = strings.TrimRight(s, "~?%")
	neg := strings.HasPrefix(s, "-")
	if neg {
		s = s[1:]
	}
	fields := strings.Split(s, "-")
	nums := make([]int64, len(fields))
	for i, f := range fields {
		n, err := strconv.ParseInt(f, 10, 64)
		if err != nil {
			return Interval{}, 0, &ParseError{Input: input, Msg: "expected a date such as 1874, 1874-05 or 1874-05-21"}
		}
		nums[i] = n
	}
	y := nums[0]
	if neg {
		y = -y
	}
	switch len(nums) {
	case 1:
		return Interval{First: Gregorian(y, 1, 1), Last: Gregorian(y, 12, 31)}, PrecisionYear, nil
	case 2:
		m := int(nums[1])
		return Interval{First: Gregorian(y, m, 1), Last: Gregorian(y, m, DaysInMonth(y, m))}, PrecisionMonth, nil
	case 3:
		day := Gregorian(y, int(nums[1]), int(nums[2]))
		return Interval{First: day, Last: day}, PrecisionDay, nil
	}
	return Interval{}, 0, &ParseError{Input: input, Msg: "expected a date such as 1874, 1874-05 or 1874-05-21"}
}

// Duration is an ISO 8601 duration in calendar units ("P1Y6M", "P10D").
type Duration struct {
	Years, Months, Weeks, Days int64
}

// ParseDuration reads an ISO 8601 duration of years, months, weeks and days.
func ParseDuration(s string) (Duration, error) {
	return Duration{}, &ParseError{Input: s, Msg: "durations are not read yet"}
}

// MinDays is the fewest days the duration can span (years of 365 days,
// months of 28): what an "at least" gap uses.
func (u Duration) MinDays() int64 { return u.Years*365 + u.Months*28 + u.Weeks*7 + u.Days }

// MaxDays is the most days the duration can span (years of 366 days,
// months of 31): what an "at most" gap uses.
func (u Duration) MaxDays() int64 { return u.Years*366 + u.Months*31 + u.Weeks*7 + u.Days }

// Circa is the widening policy for approximate ("~") dates: how far each
// side of an approximate date moves out, by the precision it was written in.
type Circa map[Precision]Duration

// Widen returns d with every approximate part moved out by the policy.
func (d Date) Widen(c Circa) Date { return d }
