package wording

import "terminus/constraint/date"

// Precision is how finely evidence states a date: to the day, the month or
// the year. A bound is shown at the precision of the evidence behind it,
// never finer: a rule of thumb in years added to a year gives a year.
type Precision int8

// The precisions, finest first. Unstated is the precision of evidence that
// carries no date of its own (an order without a gap): it leaves the
// precision of the rest.
const (
	Unstated Precision = iota - 1
	Day
	Month
	Year
)

func (p Precision) String() string {
	switch p {
	case Day:
		return "day"
	case Month:
		return "month"
	case Year:
		return "year"
	}
	return ""
}

// Coarser is the coarser of two precisions.
func Coarser(a, b Precision) Precision { return max(a, b) }

// PrecisionOf is the precision a date states: year when every run of it
// starts on the first of January and ends on the last of December (a year,
// a decade, "c. 1870", "18XX"), month when every run starts on the first
// and ends on the last of a month, else day. Open ends do not count.
func PrecisionOf(d date.Date) Precision {
	p := Year
	for _, iv := range d.Alternatives {
		if !iv.OpenStart {
			p = min(p, startPrecision(iv.First))
		}
		if !iv.OpenEnd {
			p = min(p, endPrecision(iv.Last))
		}
	}
	return p
}

func startPrecision(d date.Day) Precision {
	_, m, dd := d.Civil()
	switch {
	case m == 1 && dd == 1:
		return Year
	case dd == 1:
		return Month
	}
	return Day
}

func endPrecision(d date.Day) Precision {
	y, m, dd := d.Civil()
	switch {
	case m == 12 && dd == 31:
		return Year
	case dd == date.DaysInMonth(y, m):
		return Month
	}
	return Day
}

// PrecisionOfDuration is the precision a gap states: year for whole years,
// month for whole months, day otherwise; Unstated for no gap.
func PrecisionOfDuration(d *date.Duration) Precision {
	switch {
	case d == nil:
		return Unstated
	case d.Weeks != 0 || d.Days != 0:
		return Day
	case d.Months != 0:
		return Month
	}
	return Year
}

// BoundAt shows a bound at a precision: a lower bound at year precision is
// the year it falls in ("not before 1658" for 29 December 1658: the
// precision the evidence has, rounded outward, which only widens), an
// upper bound likewise; month precision gives the month; day precision is
// [Bound].
func BoundAt(d date.Day, upper bool, p Precision) string {
	y, m, _ := d.Civil()
	switch p {
	case Year:
		if upper {
			return Bound(date.Gregorian(y, 12, 31), true)
		}
		return Bound(date.Gregorian(y, 1, 1), false)
	case Month:
		if upper {
			return Bound(date.Gregorian(y, m, date.DaysInMonth(y, m)), true)
		}
		return Bound(date.Gregorian(y, m, 1), false)
	}
	return Bound(d, upper)
}
