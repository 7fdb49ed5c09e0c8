package date

import "math"

// JDFromGregorian returns the Julian Date of a moment written as a
// Gregorian calendar date whose day carries a fraction, as astronomers
// write it: 1957 October 4.81 is JDFromGregorian(1957, 10, 4.81) =
// 2436116.31. A Julian Date counts days from noon, so day D.0 (midnight)
// is the Day number of D minus one half.
func JDFromGregorian(y int64, m int, day float64) float64 {
	whole := math.Floor(day)
	return float64(Gregorian(y, m, int(whole))) - 0.5 + (day - whole)
}

// JDFromJulian is [JDFromGregorian] for a date of the Julian calendar:
// 333 January 27.5 is JD 1842713.0.
func JDFromJulian(y int64, m int, day float64) float64 {
	whole := math.Floor(day)
	return float64(Julian(y, m, int(whole))) - 0.5 + (day - whole)
}

// FromJD returns the calendar day that holds the moment jd, and the
// fraction of that day gone since its midnight (0 ≤ fraction < 1):
// FromJD(2451545.0) is 2000-01-01 and 0.5.
func FromJD(jd float64) (Day, float64) {
	t := jd + 0.5
	whole := math.Floor(t)
	return Day(whole), t - whole
}
