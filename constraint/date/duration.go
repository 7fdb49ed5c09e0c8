package date

import "strings"

// Duration is an ISO 8601 duration in calendar units ("P1Y6M", "P10D").
// Fields are not negative; [ParseDuration] keeps years and months below
// 10^9 and weeks and days below 10^12, far inside the range of a [Day].
type Duration struct {
	Years, Months, Weeks, Days int64
}

// maxDurationField bounds the years and months of a parsed duration, and
// maxDurationDays its weeks and days.
const (
	maxDurationField = 999_999_999
	maxDurationDays  = 999_999_999_999
)

// ParseDuration reads an ISO 8601 duration of years, months, weeks and
// days: "P2Y", "P6M", "P10D", "P1Y6M", "P2W", "P0D". The designators come
// in that order, each at most once, with whole numbers; hours, minutes and
// seconds ("PT12H") and fractions are finer than this package and are
// errors. Lower-case letters are accepted. Every error is a *[ParseError].
func ParseDuration(s string) (Duration, error) {
	fail := func(pos int, msg string) (Duration, error) {
		return Duration{}, &ParseError{Input: s, Pos: pos, Msg: msg,
			hint: "write an ISO 8601 duration such as P5Y, P6M, P2W, P10D or P1Y6M"}
	}
	var u Duration
	lo, hi := 0, len(s)
	for lo < hi && isSpace(s[lo]) {
		lo++
	}
	for hi > lo && isSpace(s[hi-1]) {
		hi--
	}
	if lo == hi {
		return fail(lo, "empty duration")
	}
	if len(s) > maxInput {
		return fail(maxInput, "text too long for a duration")
	}
	if s[lo] != 'P' && s[lo] != 'p' {
		return fail(lo, `a duration starts with "P"`)
	}
	i := lo + 1
	if i == hi {
		return fail(i, `expected a number and a unit after "P"`)
	}
	order := 0 // the units seen so far: 1 years, 2 months, 3 weeks, 4 days
	for i < hi {
		c := s[i]
		if c == 'T' || c == 't' {
			return fail(i, "hours, minutes and seconds are finer than a day; durations here are in years, months, weeks and days")
		}
		j := i
		var v int64
		for i < hi && isDigit(s[i]) {
			if i-j >= 12 {
				return fail(j, "number too large for a duration")
			}
			v = v*10 + int64(s[i]-'0')
			i++
		}
		if i == j {
			return fail(i, "expected a whole number before the unit (Y, M, W or D)")
		}
		if i == hi {
			return fail(i, "expected a unit after the number: Y (years), M (months), W (weeks) or D (days)")
		}
		var k int
		var f *int64
		switch s[i] {
		case 'Y', 'y':
			k, f = 1, &u.Years
		case 'M', 'm':
			k, f = 2, &u.Months
		case 'W', 'w':
			k, f = 3, &u.Weeks
		case 'D', 'd':
			k, f = 4, &u.Days
		case '.', ',':
			return fail(i, "fractions are not read; write whole units (P18M rather than P1.5Y)")
		default:
			return fail(i, "unknown unit "+quoteChar(s, i)+": expected Y (years), M (months), W (weeks) or D (days)")
		}
		if k <= order {
			return fail(i, "units come once each, in the order Y, M, W, D")
		}
		if (k <= 2 && v > maxDurationField) || v > maxDurationDays {
			return fail(j, "number too large for a duration")
		}
		order = k
		*f = v
		i++
	}
	return u, nil
}

// String returns the ISO 8601 form of u ("P1Y6M"; "P0D" for no time).
func (u Duration) String() string {
	b := []byte{'P'}
	for _, f := range [...]struct {
		v int64
		c byte
	}{{u.Years, 'Y'}, {u.Months, 'M'}, {u.Weeks, 'W'}, {u.Days, 'D'}} {
		if f.v != 0 {
			b = appendInt(b, f.v)
			b = append(b, f.c)
		}
	}
	if len(b) == 1 {
		return "P0D"
	}
	return string(b)
}

// AddTo returns the day u after d on the proleptic Gregorian calendar:
// the years and months are added together as one number of months, a day
// of the month that the target month lacks becomes its last day
// (2001-01-31 plus P1M is 2001-02-28; 2000-02-29 plus P1Y is 2001-02-28),
// then weeks and days are added.
func (u Duration) AddTo(d Day) Day {
	if n := u.Years*12 + u.Months; n != 0 {
		y, m, dd := d.Civil()
		total := y*12 + int64(m-1) + n
		ny := floorDiv(total, 12)
		nm := int(total-ny*12) + 1
		if dim := DaysInMonth(ny, nm); dd > dim {
			dd = dim
		}
		d = Gregorian(ny, nm, dd)
	}
	return d + Day(u.Weeks*7+u.Days)
}

// MinDays is the fewest days u can span, over every start day: the least
// AddTo(d) − d. P1M gives 28, P1Y 365, P1Y6M 546. An "at least" gap uses it.
func (u Duration) MinDays() int64 {
	lo, _ := u.spanRange()
	return lo
}

// MaxDays is the most days u can span, over every start day: the greatest
// AddTo(d) − d. P1M gives 31, P1Y 366, P1Y6M 550. An "at most" gap and the
// circa widening use it.
func (u Duration) MaxDays() int64 {
	_, hi := u.spanRange()
	return hi
}

// spanRange computes the least and greatest span of u. The calendar
// repeats every 400 years (4800 months, 146097 days), so the start months
// of one cycle cover every case. Within a start month the span is largest
// from its first day (no day is cut at the end) and smallest from its last
// day (the most is cut), so two start days per month suffice; the month
// starts are walked incrementally.
func (u Duration) spanRange() (int64, int64) {
	fixed := u.Weeks*7 + u.Days
	n := u.Years*12 + u.Months
	if n == 0 {
		return fixed, fixed
	}
	cycles := n / 4800
	r := n % 4800
	if r%12 == 0 {
		lo, hi := yearSpans(r / 12)
		base := cycles*146097 + fixed
		return lo + base, hi + base
	}
	ys, ms := int64(2000), 1 // the start month
	yt, mt := ys+r/12, 1+int(r%12)
	s := int64(Gregorian(ys, ms, 1))
	t := int64(Gregorian(yt, mt, 1))
	lo, hi := int64(1)<<62, int64(-1)<<62
	leapS, leapT := IsLeap(ys), IsLeap(yt)
	for k := 0; k < 4800; k++ {
		ds, dt := int(monthDays[ms]), int(monthDays[mt])
		if ms == 2 && leapS {
			ds++
		}
		if mt == 2 && leapT {
			dt++
		}
		hi = max(hi, t-s)
		lo = min(lo, t-s+int64(min(ds, dt)-ds))
		s += int64(ds)
		t += int64(dt)
		if ms++; ms == 13 {
			ms, ys = 1, ys+1
			leapS = IsLeap(ys)
		}
		if mt++; mt == 13 {
			mt, yt = 1, yt+1
			leapT = IsLeap(yt)
		}
	}
	base := cycles*146097 + fixed
	return lo + base, hi + base
}

// leapsBefore counts the Gregorian leap years from year 1 up to year x
// (negative for x < 0); leapsBefore(b) − leapsBefore(a−1) counts those of
// a..b.
func leapsBefore(x int64) int64 {
	return floorDiv(x, 4) - floorDiv(x, 100) + floorDiv(x, 400)
}

// yearSpans gives the least and greatest span of k whole years (k <
// 400). From a day in January or February the span holds the 29
// Februaries of the k years from its own year on, from a later day those
// of the k years after it: 365k days plus the leap years among k
// consecutive years. From 29 February to a year without one the day
// becomes 28 February, a day less.
func yearSpans(k int64) (int64, int64) {
	if k == 0 {
		return 0, 0
	}
	lo, hi := int64(1)<<62, int64(-1)<<62
	for a := int64(2000); a < 2400; a++ {
		l := leapsBefore(a+k-1) - leapsBefore(a-1)
		lo, hi = min(lo, l), max(hi, l)
		if IsLeap(a) && !IsLeap(a+k) {
			lo = min(lo, l-1)
		}
	}
	return 365*k + lo, 365*k + hi
}

// monthDays holds the lengths of the months of a common year, from index 1.
var monthDays = [13]uint8{0, 31, 28, 31, 30, 31, 30, 31, 31, 30, 31, 30, 31}

// Circa is the widening policy for approximate ("~") dates: how far each
// approximate end of a date moves out, by the precision it was written in.
// A precision missing from the map uses [DefaultCirca]; map it to P0D to
// widen nothing.
type Circa map[Precision]Duration

// DefaultCirca returns the default widening policy (a new map each call):
//
//	day P7D, month P1M, season P1M, year P5Y, decade P5Y, century P25Y,
//	millennium P100Y
//
// A "c. 1870" in a catalogue entry is commonly taken to mean within about
// five years (common practice), hence P5Y for years; a circa decade
// ("c. 1870s") moves half a decade further at each end; a circa century a
// quarter century. A circa month or season can slip into the next one (one
// month); a circa day, a week either side.
func DefaultCirca() Circa {
	return Circa{
		PrecisionDay:        {Days: 7},
		PrecisionMonth:      {Months: 1},
		PrecisionSeason:     {Months: 1},
		PrecisionYear:       {Years: 5},
		PrecisionDecade:     {Years: 5},
		PrecisionCentury:    {Years: 25},
		PrecisionMillennium: {Years: 100},
	}
}

// For returns the widening for precision p: c's entry, else the default.
func (c Circa) For(p Precision) Duration {
	if u, ok := c[p]; ok {
		return u
	}
	switch p {
	case PrecisionDay:
		return Duration{Days: 7}
	case PrecisionMonth, PrecisionSeason:
		return Duration{Months: 1}
	case PrecisionYear, PrecisionDecade:
		return Duration{Years: 5}
	case PrecisionCentury:
		return Duration{Years: 25}
	}
	return Duration{Years: 100}
}

// String lists the policy in precision order, with defaults filled in:
// "day P7D, month P1M, season P1M, year P5Y, decade P5Y, century P25Y,
// millennium P100Y".
func (c Circa) String() string {
	var b strings.Builder
	for p := PrecisionDay; p <= PrecisionMillennium; p++ {
		if p > PrecisionDay {
			b.WriteString(", ")
		}
		b.WriteString(p.String())
		b.WriteByte(' ')
		b.WriteString(c.For(p).String())
	}
	return b.String()
}

// ParseCircaKey reads a case-file key of the circa policy: day, month,
// season, year, decade, century or millennium (case-insensitive).
func ParseCircaKey(name string) (Precision, error) {
	for p, n := range precisionNames {
		if strings.EqualFold(strings.TrimSpace(name), n) {
			return Precision(p), nil
		}
	}
	return 0, &ParseError{Input: name, Pos: 0,
		Msg:  "unknown circa key: expected day, month, season, year, decade, century or millennium",
		hint: "write circa: {year: P5Y}"}
}

// Widen returns d with every approximate end moved out by the policy c
// for the precision that end was written in (for qualifiers on single
// parts, the finest approximate part), on the calendar: the first day of
// the end's run of days goes back by the duration, its last day forward
// by it ("1870~" with P5Y is 1865-01-01 to 1875-12-31; a day of the month
// that the target month lacks becomes its last day, as in
// [Duration.AddTo]). A single approximate date ("1870~")
// widens at both sides; an interval "1870~/1879" only at its start. Open
// ends stay open; uncertain ("?") ends do not move. Widen always starts
// from the date as written, so widening twice is widening once with the
// later policy; [Date.EDTF] keeps the written form.
func (d Date) Widen(c Circa) Date {
	if len(d.members) == 0 {
		return d
	}
	by := func(p Precision) Duration {
		if p > PrecisionMillennium {
			p = PrecisionMillennium
		}
		return c.For(p)
	}
	d.Alternatives = alternatives(d.members, func(m member, iv Interval) Interval {
		if !iv.OpenStart && m.start.approx {
			iv.First = by(m.start.widenPrec()).negated().AddTo(iv.First)
		}
		if !iv.OpenEnd && m.end.approx {
			iv.Last = by(m.end.widenPrec()).AddTo(iv.Last)
		}
		return iv
	}, nil)
	d.widened = true
	return d
}

// negated is u pointing backwards: AddTo with it goes back in time.
func (u Duration) negated() Duration {
	return Duration{Years: -u.Years, Months: -u.Months, Weeks: -u.Weeks, Days: -u.Days}
}

// WidenBy returns how far [Date.Widen] with policy c moves the start and
// the end of d (of the first member's start and the last member's end in a
// set): the policy for the precision of an approximate end, P0D for an end
// that is not approximate or is open.
func (d Date) WidenBy(c Circa) (start, end Duration) {
	if len(d.members) == 0 {
		return
	}
	first, last := d.members[0], d.members[len(d.members)-1]
	if first.kind&(openStart|unknownStart) == 0 && first.start.approx {
		start = c.For(first.start.widenPrec())
	}
	if last.kind&(openEnd|unknownEnd) == 0 && last.end.approx {
		end = c.For(last.end.widenPrec())
	}
	return start, end
}
