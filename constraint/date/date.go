package date

import (
	"fmt"
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

var precisionNames = [...]string{"day", "month", "season", "year", "decade", "century", "millennium"}

// String returns the name of p as the case files write it ("year").
func (p Precision) String() string {
	if int(p) < len(precisionNames) {
		return precisionNames[p]
	}
	return fmt.Sprintf("Precision(%d)", uint8(p))
}

// Calendar is the calendar a written date is read in.
type Calendar uint8

// The calendars. Every result is a [Day], whatever the input calendar.
const (
	CalendarGregorian        Calendar = iota // proleptic Gregorian, the default
	CalendarJulian                           // the Julian calendar, for documents dated before the reform
	CalendarJapanese                         // Japanese era years; lunisolar months before 1873
	CalendarChinese                          // Chinese reign years, sexagenary years, lunisolar months
	CalendarKorean                           // the Korean lunisolar calendar (sexagenary years, months)
	CalendarIslamic                          // Hijri years and months (the arithmetic calendar, widened)
	CalendarPersian                          // solar Hijri years and months
	CalendarHebrew                           // Hebrew years (Anno Mundi) and months
	CalendarFrenchRepublican                 // the French Republican calendar (years I to XIV and later)
	CalendarBuddhist                         // Buddhist Era years (Thai reckoning)
	CalendarROC                              // Republic of China (Minguo) years
	CalendarEastAsian                        // a cyclical date whose calendar (Chinese or Japanese) is not said
)

var calendarNames = [...]string{"Gregorian", "Julian", "Japanese", "Chinese", "Korean", "Islamic", "Persian",
	"Hebrew", "French Republican", "Buddhist", "Republic of China", "Chinese or Japanese"}

// String returns the name of c: "Gregorian", "Julian", "Japanese"…
func (c Calendar) String() string {
	if int(c) < len(calendarNames) {
		return calendarNames[c]
	}
	return fmt.Sprintf("Calendar(%d)", uint8(c))
}

// Interval is a closed run of days. An open side (OpenStart, OpenEnd) is
// unbounded and its First or Last is meaningless (zero).
type Interval struct {
	First, Last        Day
	OpenStart, OpenEnd bool
}

// Date is a written date read as one interval of days or, for an EDTF
// one-of set, as several disjoint intervals (a disjunction).
type Date struct {
	// Input is the text as written.
	Input string
	// Alternatives holds the intervals in ascending order, disjoint and not
	// touching (adjacent or overlapping members of a set are merged); a
	// plain date or an EDTF interval has exactly one, unless its X digits
	// leave scattered days (156X-12-25 has ten).
	Alternatives []Interval
	// Precision is the precision of the first written date (the start of an
	// interval, the first member of a set).
	Precision Precision
	// Approximate and Uncertain are the EDTF qualifiers "~" and "?" ("%"
	// sets both), true when any end of the date carries them.
	Approximate, Uncertain bool
	// OneOf marks a level-2 one-of set "[…]".
	OneOf bool

	edtf    string
	members []member
	notes   []string
	widened bool
}

// ParseError is the error of every parse in this package.
type ParseError struct {
	Input string // the whole text
	Pos   int    // byte offset of the problem in Input
	Msg   string // what was wrong and what was expected
	hint  string
}

func (e *ParseError) Error() string {
	return fmt.Sprintf("date %q at column %d: %s", e.Input, e.Pos+1, e.Msg)
}

// Hint suggests a fix, or returns "".
func (e *ParseError) Hint() string { return e.hint }

// EDTF returns the canonical EDTF form of d, as parsed: friendly input
// normalised, Julian dates converted to Gregorian days. [Date.Widen] does
// not change it.
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

// Calendar returns the calendar d was written in: [CalendarJulian] when
// it was marked or read as Julian (its days are converted all the same).
func (d Date) Calendar() Calendar {
	if len(d.members) == 0 {
		return CalendarGregorian
	}
	pt := d.members[0].start
	if d.members[0].kind&(openStart|unknownStart) != 0 {
		pt = d.members[0].end
	}
	if pt.x != nil {
		return pt.x.cal
	}
	return pt.cal
}

// Notes says how d was read where the reading is not plain: the calendar
// and its conventions, the alternatives of an ambiguous text, and every
// widening with its reason. It is nil for plain EDTF.
func (d Date) Notes() []string { return d.notes }

// Widened reports whether d is the result of [Date.Widen].
func (d Date) Widened() bool { return d.widened }

// QualifiedEnds reports the qualifiers of the start and the end of d: for a
// single date both ends carry the date's qualifiers; for an interval each
// end its own; for a set, the qualifiers of the first member's start and the
// last member's end.
func (d Date) QualifiedEnds() (startApprox, startUncertain, endApprox, endUncertain bool) {
	if len(d.members) == 0 {
		return
	}
	first, last := d.members[0], d.members[len(d.members)-1]
	if first.kind&openStart == 0 {
		startApprox, startUncertain = first.start.approx, first.start.uncert
	}
	if last.kind&openEnd == 0 {
		endApprox, endUncertain = last.end.approx, last.end.uncert
	}
	return
}

// String returns d for people: "1874", "May 1874", "1200 BCE",
// "c. 1870", "1870 to 1879", "one of 1667, 1668, 1670 to 1672".
func (d Date) String() string {
	if len(d.members) == 0 {
		return d.edtf
	}
	var b strings.Builder
	if d.OneOf {
		b.WriteString("one of ")
	}
	for i, m := range d.members {
		if i > 0 {
			b.WriteString(", ")
		}
		m.people(&b, d.OneOf)
	}
	return b.String()
}
