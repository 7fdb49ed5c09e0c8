// Package date reads and writes historical dates as intervals of days.
//
// # The model
//
// A time point is a calendar day, a [Day]: its Julian Day Number, an
// integer (2000-01-01 is Day 2451545). Years are astronomical, as in ISO
// 8601: year 0 is 1 BCE, year -1 is 2 BCE, year -1199 is 1200 BCE. Dates
// are on the proleptic Gregorian calendar unless the input says Julian.
// There is no time of day and no time zone, and time.Time is not used (it
// stops at year 9999 and carries nanoseconds). Years up to ±999999999999
// are read.
//
// A written [Date] is the run of days it names: "1874" is 1874-01-01 to
// 1874-12-31. An interval runs from the first day of its start to the last
// day of its end. A one-of set is a disjunction, kept as sorted, disjoint
// [Interval]s (members that overlap or touch are merged), never as its
// hull. An open ("..") or unknown (empty) end is unbounded.
//
// The qualifiers are kept per end: in "1870~/1879" only the start is
// approximate. "~" (approximate) moves an end out only when asked, by a
// [Circa] policy ([Date.Widen], [DefaultCirca]); EDTF itself gives no
// width. "?" (uncertain) never moves anything: it is a flag for the
// reasoner, which lowers the strength of the evidence that carries it.
//
// [Date.Precision] is the unit of the run of days the first date names:
// day, month, season, year, decade, century or millennium. For X digits it
// is the unit the X digits leave: 187X is a decade, 18XX a century,
// 1985-XX a year, 1985-04-XX a month (EDTF's own wording calls 201X "year
// precision"; here the decade is meant, so that "c. 1870s" widens by the
// decade policy). For scattered X digits it is the unit of each run
// (156X-12-25: day).
//
// # EDTF
//
// The Extended Date/Time Format (Library of Congress, 2019; ISO 8601-2).
// Level 0 is supported: 1985-04-12, 1985-04, 1985; date and time
// 1985-04-12T23:20:30 with Z, ±hh or ±hh:mm (the time is kept in the
// canonical form and otherwise ignored: the day is the calendar date as
// written); intervals 1964/2008, 2004-02-01/2005-02.
//
// Level 1 is supported: Y170000002 and Y-170000002; seasons 2001-21 to
// 2001-24; the qualifiers ? ~ % at the end of a date; X digits from the
// right (201X, 20XX, 2004-XX, 1985-04-XX, 1985-XX-XX, and also 1XXX,
// 1985-1X, 1985-04-1X); open (..) and unknown (empty) interval ends,
// qualified ends (1984?/2004-06~); negative years -1985.
//
// Of level 2: one-of sets [1667,1668,1670..1672], [..1760-12-03],
// [1760-12..] (a disjunction; spaces after the commas are accepted);
// exponential years Y-17E7; significant digits 1950S2 (some year from 1900
// to 1999); the divisions of the year 25–41 (hemisphere seasons, quarters,
// quadrimesters, semesters); X digits anywhere in a four-digit year, month
// or day. X digits that leave scattered days (156X-12-25, December 25 in
// each year of the 1560s) give a disjunction too: one [Interval] per run
// of days, at most 1000 runs (XXXX-12-XX, 10000 Decembers, is an error). In
// an interval end such X digits count by their first or last day
// (2004-06-XX/2004-07-03 starts 2004-06-01). Qualifiers on single parts:
// after a part for it and every part before it (2004-06~-11: year and
// month approximate), before a part for it alone (?2004-06-~11: year
// uncertain, day approximate); such a date widens by the circa policy of
// its finest approximate part (2004-06~-11 by the month policy). Not
// supported, with an error that says so: all-of sets {…} (a single event
// is not on several dates at once), and qualifiers on parts together with
// scattered X digits, a time of day, significant digits or a long year.
//
// Seasons are read as meteorological seasons of the northern hemisphere:
// spring (21, 25) March–May, summer (22, 26) June–August, autumn (23, 27)
// September–November, winter (24, 28) December of the year written to the
// end of February of the next; the southern seasons 29–32 are shifted by
// six months (southern summer, 30, runs December to February). Quarters
// (33–36), quadrimesters (37–39) and semesters (40, 41) divide the
// calendar year from January.
//
// [Date.EDTF] gives the canonical form: four-digit years with a sign
// below 0, the Y prefix above four digits, "%" for "?" with "~", sets
// without spaces. Parsing the canonical form gives the same days again.
//
// # Friendly forms
//
// Parse also reads the forms people write, and EDTF() shows how they
// were read (case does not matter):
//
//	c. 1870, c.1870, ca 1870, ca. 1870, circa 1870,
//	about 1870, around 1870, approx. 1870       1870~
//	c. 1870?                                    1870%
//	1870s, 1870's, the 1870s                    187X (1870–1879)
//	1800s                                       18XX (1800–1899): a year ending
//	                                            in 00 reads as the wider century
//	1870s?                                      187X?
//	early 1870s, mid 1870s, mid-1870s, late 1870s
//	                                            1870/1873, 1873/1876, 1876/1879
//	early 1800s, mid 1800s, late 1800s          1800/1833, 1833/1866, 1866/1899
//	1200 BCE, 1200 BC, 1200 B.C., 1200 B.C.E.   -1199 (no year 0 BCE)
//	AD 79, A.D. 79, 79 AD, 79 CE                0079
//	1870-1875, 1870 - 1875, 1870–1875,
//	1870 to 1875, between 1870 and 1875         1870/1875
//	before 1900                                 ../1899  (strictly before)
//	after 1850                                  1851/..  (strictly after)
//	not after 1900, no later than 1900, by 1900,
//	until 1900                                  ../1900  (inclusive)
//	not before 1850, no earlier than 1850,
//	from 1850, since 1850                       1850/..  (inclusive)
//	May 1874, 21 May 1874, May 21, 1874, Sept. 1874
//	                                            1874-05, 1874-05-21, 1874-09
//
// In a range written with a dash or "to", an era written after the second
// year only applies to both ("1200-1100 BCE" is -1199/-1099), and so does
// a circa word before the first only ("c. 1870-1875" is 1870~/1875~); an
// EDTF interval with "/" keeps its qualifiers per end ("c. 1870/1879" is
// 1870~/1879).
//
// Centuries and millennia by name ("18th century", "18th c.", "3rd
// century BCE", "5th millennium BCE") are read as the union of the strict
// and the common count: the 18th century is 1700 to 1800, so that neither
// 1701–1800 nor 1700–1799 is excluded. Their parts ("early", "mid",
// "late", "first half of the", "second quarter of the") divide the hundred
// years from the round year (early 18th century 1700–1733, late
// 1766–1800). See century.go.
//
// "Early", "mid" and "late" are thirds of the decade or century that
// overlap by one year at the seams, so a year at a seam belongs to both.
// "Before" and "after" are strict at the precision written: before
// 1900-05 is ../1900-04, after 1881-24 (winter) is 1882-03/..; a date
// with a time of day keeps its own day ("before 1985-04-12T10:00:00" is
// ../1985-04-12T10:00:00, up to and with that day). The qualifiers of the date carry over: before c. 1900
// is ../1899~.
//
// # Calendars
//
// Dates are Gregorian unless marked Julian. A text that ends with
// "(Julian)", "Julian", "O.S." or "(O.S.)" is read on the Julian calendar
// (every date in it); [ParseIn] with [CalendarJulian] reads unmarked text
// so, and "(Gregorian)" or "N.S." at the end then overrides it. A Julian
// date becomes the Gregorian days it names, and its canonical EDTF writes
// those days: "1582-10-04 (Julian)" is 1582-10-14, "1582 (Julian)" is
// 1582-01-11/1583-01-10. EDTF numbers years from 1 January; a date
// written with a month name follows the year start of its documents
// ([Options].YearStart): "10 Feb 1712/13" (a dual year) is 10 February 1713
// Julian, and a Julian 1 January–24 March date without a dual year or a
// year start is the one-of set of its two possible years.
//
// Other calendars are read as the records write them and converted to
// Gregorian days: Japanese eras (with lunisolar months before 1873),
// Chinese reigns of the Ming and Qing, zodiac and stem-branch years inside
// a range, Hijri (widened by two days at each side), solar Hijri, Hebrew,
// French Republican, Buddhist Era and Republic of China years.
// [Date.Calendar] names the calendar read and [Date.Notes] says how the
// text was read: its conventions, alternatives and widenings. The East
// Asian months are computed from the astronomy of astro.go; see
// lunisolar.go for the margins that widen them.
// [Julian] and [Day.JulianCivil] convert single days; [JDFromGregorian],
// [JDFromJulian] and [FromJD] work with fractional Julian Dates.
//
// # Durations
//
// [ParseDuration] reads ISO 8601 durations in years, months, weeks and
// days. [Duration.AddTo] adds one to a day on the calendar (a day of the
// month that the target month lacks becomes its last day). A duration
// spans a different number of days from different start days (P1M spans
// 28 to 31), so [Duration.MinDays] and [Duration.MaxDays] give the exact
// fewest and most over every start day: an "at least" gap uses MinDays
// and an "at most" gap MaxDays, which keeps both bounds conservative.
//
// # Errors
//
// Every parse error is a *[ParseError] with the input, the byte position
// of the problem, a message that says what was expected and, where one
// fits, a hint. Parse never panics; input longer than 1024 bytes is an
// error.
package date
