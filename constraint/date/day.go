package date

import (
	"strconv"
)

// Day is a calendar day, numbered by its Julian Day Number: the Julian Date
// at the noon of that day. 2000-01-01 (Gregorian) is Day 2451545 and
// -4712-01-01 (Julian calendar) is Day 0. Days before that are negative.
type Day int64

// floorDiv divides rounding toward negative infinity.
func floorDiv(a, b int64) int64 {
	q := a / b
	if (a%b != 0) && ((a < 0) != (b < 0)) {
		q--
	}
	return q
}

// Gregorian returns the day for year y (astronomical numbering: 0 is 1 BCE),
// month m (1–12) and day d of the proleptic Gregorian calendar. It does not
// check that the month and day exist; see [DaysInMonth].
func Gregorian(y int64, m, d int) Day {
	// Days from civil after H. Hinnant, "chrono-Compatible Low-Level Date
	// Algorithms", with era arithmetic that holds for every integer year.
	yy, doy := toMarchYear(y, m, d)
	era := floorDiv(yy, 400)
	yoe := yy - era*400
	doe := yoe*365 + yoe/4 - yoe/100 + doy
	return Day(era*146097 + doe + 1721120)
}

// Civil returns the proleptic Gregorian year, month and day of d.
func (d Day) Civil() (y int64, m, dd int) {
	z := int64(d) - 1721120
	era := floorDiv(z, 146097)
	doe := z - era*146097
	yoe := (doe - doe/1460 + doe/36524 - doe/146096) / 365
	return fromMarchYear(yoe+era*400, doe-(365*yoe+yoe/4-yoe/100))
}

// Julian returns the day for year y, month m and day d of the Julian
// calendar (astronomical year numbering).
func Julian(y int64, m, d int) Day {
	yy, doy := toMarchYear(y, m, d)
	era := floorDiv(yy, 4)
	yoe := yy - era*4
	doe := yoe*365 + doy
	return Day(era*1461 + doe + 1721118)
}

// JulianCivil returns the Julian-calendar year, month and day of d.
func (d Day) JulianCivil() (y int64, m, dd int) {
	z := int64(d) - 1721118
	era := floorDiv(z, 1461)
	doe := z - era*1461
	yoe := (doe - doe/1460) / 365
	return fromMarchYear(yoe+era*4, doe-365*yoe)
}

// toMarchYear moves a civil date into a year that starts on 1 March, so
// that the leap day is the last day of the year: the year so counted and
// the day of it (0 for 1 March). The Gregorian and Julian calendars share
// it; they differ only in how many days their years of a cycle hold.
func toMarchYear(y int64, m, d int) (yy, doy int64) {
	yy = y
	if m <= 2 {
		yy--
	}
	mp := int64((m + 9) % 12)
	return yy, (153*mp+2)/5 + int64(d) - 1
}

// fromMarchYear is the inverse of [toMarchYear]: the civil year, month and
// day of day doy of the March-based year yy.
func fromMarchYear(yy, doy int64) (y int64, m, d int) {
	mp := (5*doy + 2) / 153
	d = int(doy - (153*mp+2)/5 + 1)
	if mp < 10 {
		m = int(mp + 3)
	} else {
		m = int(mp - 9)
	}
	y = yy
	if m <= 2 {
		y++
	}
	return y, m, d
}

// IsLeap reports whether y is a leap year of the Gregorian calendar.
func IsLeap(y int64) bool {
	return y%4 == 0 && (y%100 != 0 || y%400 == 0)
}

// DaysInMonth returns the number of days of month m of Gregorian year y.
func DaysInMonth(y int64, m int) int {
	switch m {
	case 2:
		if IsLeap(y) {
			return 29
		}
		return 28
	case 4, 6, 9, 11:
		return 30
	}
	return 31
}

// ISO formats d as an ISO 8601 calendar date with astronomical years: four
// digits, and a sign with at least four digits for years before 1
// ("-1199-01-01").
func (d Day) ISO() string {
	var buf [24]byte
	return string(d.AppendISO(buf[:0]))
}

// AppendISO appends d formatted as [Day.ISO] does to b.
func (d Day) AppendISO(b []byte) []byte {
	y, m, dd := d.Civil()
	b = AppendYear(b, y)
	b = append(b, '-', byte('0'+m/10), byte('0'+m%10), '-', byte('0'+dd/10), byte('0'+dd%10))
	return b
}

// Year returns the Gregorian year of d.
func (d Day) Year() int64 {
	y, _, _ := d.Civil()
	return y
}

// FormatYear writes an astronomical year as ISO 8601 does: four digits at
// least, with a minus sign before years below 0 ("0000", "-0044", "12000").
func FormatYear(y int64) string {
	var buf [24]byte
	return string(AppendYear(buf[:0], y))
}

// AppendYear appends y formatted as [FormatYear] does to b.
func AppendYear(b []byte, y int64) []byte {
	u := uint64(y)
	if y < 0 {
		b = append(b, '-')
		u = uint64(-y) // two's complement: right for math.MinInt64 too
	}
	for p := uint64(1000); p > 1 && u < p; p /= 10 {
		b = append(b, '0')
	}
	return strconv.AppendUint(b, u, 10)
}
