package date

// The solar Hijri (Persian) calendar, read with the arithmetic rule of 33-
// year cycles: the year AP y has 366 days when (25y + 11) mod 33 < 8. The
// official calendar (since 1925, AP 1304) begins the year on the day of the
// vernal equinox at Tehran; the rule and the equinox agree over the years
// this package is tested on (see the tests, which compute the equinox).
// Months 1–6 have 31 days, 7–11 have 30, Esfand 29 or 30. 1 Farvardin AP 1
// is 19 March 622 (Julian).

// persianEpoch is the Day of 1 Farvardin AP 1.
const persianEpoch Day = 1948320

var persianMonths = [12]string{"Farvardin", "Ordibehesht", "Khordad", "Tir", "Mordad", "Shahrivar",
	"Mehr", "Aban", "Azar", "Dey", "Bahman", "Esfand"}

func persianLeap(y int64) bool { return floorMod(25*y+11, 33) < 8 }

// persianNewYear is the Day of 1 Farvardin of AP year y.
func persianNewYear(y int64) Day {
	return persianEpoch + Day(365*(y-1)+floorDiv(8*y+21, 33))
}

func persianDay(y int64, m, d int) Day {
	before := 31 * (m - 1)
	if m > 7 {
		before = 186 + 30*(m-7)
	}
	return persianNewYear(y) + Day(before+d-1)
}

func persianMonthDays(y int64, m int) int {
	switch {
	case m <= 6:
		return 31
	case m <= 11 || persianLeap(y):
		return 30
	}
	return 29
}

func persianFromDay(d Day) (int64, int, int) {
	y := floorDiv(33*int64(d-persianEpoch), 12053) + 1
	for persianNewYear(y+1) <= d {
		y++
	}
	for persianNewYear(y) > d {
		y--
	}
	m := 1
	for m < 12 && d >= persianDay(y, m+1, 1) {
		m++
	}
	return y, m, int(d-persianDay(y, m, 1)) + 1
}
