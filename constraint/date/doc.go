// Package date reads and writes historical dates as intervals of days.
//
// # The model
//
// A time point is a calendar day, a [Day]: its Julian Day Number, an
// integer. Years are astronomical (ISO 8601): year 0 is 1 BCE, year -1 is
// 2 BCE, year -1199 is 1200 BCE. Calendar dates are on the proleptic
// Gregorian calendar unless the input says Julian. There is no time of
// day and no time zone; time.Time is not used (it stops at year 9999 and
// carries nanoseconds).
//
// A written [Date] is read as the run of days it names: "1874" is
// 1874-01-01 to 1874-12-31. An interval runs from the first day of its
// start to the last day of its end. A one-of set is a disjunction, kept as
// sorted, disjoint [Interval]s, never as its hull. The qualifiers are kept
// per end of a date: "~" (approximate) widens by a [Circa] policy when
// asked ([Date.Widen]); "?" (uncertain) is only a flag, for the reasoner to
// weaken the evidence that carries it.
//
// (The sections on EDTF support, the friendly forms, durations and
// calendars are written below as each part is finished.)
package date
