package date

// The arithmetic Islamic calendar (the "civil" tabular calendar): 30-year
// cycles with the leap years 2, 5, 7, 10, 13, 16, 18, 21, 24, 26 and 29,
// months of 30 and 29 days in turn, the last of 30 in a leap year, and the
// epoch 1 Muharram AH 1 = 16 July 622 (Julian), a Friday. This is the
// calendar of E. M. Reingold and N. Dershowitz, Calendrical Calculations
// (the "islamic" functions), and of ICU's islamic-civil.
//
// Where a month was begun on the sighting of the new crescent, its first
// day may fall a day or two from the arithmetic one; every Hijri date is
// therefore widened by islamicSlack days at each side, and the notes say so.

// islamicEpoch is the Day of 1 Muharram AH 1.
const islamicEpoch Day = 1948440

// islamicSlack is the widening of a Hijri date at each side, in days.
const islamicSlack = 2

var islamicMonths = [12]string{"Muharram", "Safar", "Rabiʿ I", "Rabiʿ II", "Jumada I", "Jumada II",
	"Rajab", "Shaʿban", "Ramadan", "Shawwal", "Dhu al-Qaʿda", "Dhu al-Hijja"}

// islamicLeap reports whether AH year y has 355 days.
func islamicLeap(y int64) bool { return floorMod(14+11*y, 30) < 11 }

func floorMod(a, b int64) int64 { return a - floorDiv(a, b)*b }

// islamicDay returns the Day of day d of month m of AH year y.
func islamicDay(y int64, m, d int) Day {
	return islamicEpoch - 1 + Day((y-1)*354+floorDiv(3+11*y, 30)+int64(29*(m-1)+m/2+d))
}

// islamicMonthDays is the length of month m of AH year y.
func islamicMonthDays(y int64, m int) int {
	if m%2 == 1 || m == 12 && islamicLeap(y) {
		return 30
	}
	return 29
}

// islamicFromDay returns the AH year, month and day of d.
func islamicFromDay(d Day) (int64, int, int) {
	y := floorDiv(30*int64(d-islamicEpoch)+10646, 10631)
	m := 1
	for m < 12 && d >= islamicDay(y, m+1, 1) {
		m++
	}
	return y, m, int(d-islamicDay(y, m, 1)) + 1
}
