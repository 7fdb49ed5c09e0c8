package date

// The Hebrew calendar, by the arithmetic rules of the fixed calendar (the
// molad of Tishri and its postponements), as E. M. Reingold and N.
// Dershowitz give them in Calendrical Calculations. Years are Anno Mundi;
// 1 Tishri AM 1 is 7 October 3761 BCE (Julian). Months are numbered here
// from Tishri, the first month of the civil year: Tishri 1, Heshvan 2,
// Kislev 3, Tevet 4, Shevat 5, Adar (Adar I in a leap year) 6, Adar II 7
// in a leap year, then Nisan, Iyar, Sivan, Tammuz, Av, Elul. A day begins
// at the evening before; a date here is the civil day of its daylight.

// hebrewEpoch is the Day of 1 Tishri AM 1.
const hebrewEpoch Day = 347998

func hebrewLeap(y int64) bool { return floorMod(7*y+1, 19) < 7 }

// hebrewElapsed is the days from the epoch to the molad of Tishri of year y,
// with the first postponement.
func hebrewElapsed(y int64) int64 {
	months := floorDiv(235*y-234, 19)
	parts := 12084 + 13753*months
	days := 29*months + floorDiv(parts, 25920)
	if floorMod(3*(days+1), 7) < 3 {
		return days + 1
	}
	return days
}

// hebrewNewYear is the Day of 1 Tishri of year y.
func hebrewNewYear(y int64) Day {
	ny0, ny1, ny2 := hebrewElapsed(y-1), hebrewElapsed(y), hebrewElapsed(y+1)
	corr := int64(0)
	switch {
	case ny2-ny1 == 356:
		corr = 2
	case ny1-ny0 == 382:
		corr = 1
	}
	return hebrewEpoch + Day(ny1+corr)
}

func hebrewYearDays(y int64) int { return int(hebrewNewYear(y+1) - hebrewNewYear(y)) }

// hebrewMonths is the number of months of year y: 13 in a leap year.
func hebrewMonths(y int64) int {
	if hebrewLeap(y) {
		return 13
	}
	return 12
}

// hebrewMonthDays is the length of month m (numbered from Tishri) of year y.
func hebrewMonthDays(y int64, m int) int {
	leap := hebrewLeap(y)
	n := hebrewYearDays(y)
	name := hebrewMonthKey(y, m)
	switch name {
	case "heshvan":
		if n%10 == 5 { // 355 or 385 days: a long Heshvan
			return 30
		}
		return 29
	case "kislev":
		if n%10 == 3 { // 353 or 383 days: a short Kislev
			return 29
		}
		return 30
	case "tevet", "iyar", "tammuz", "elul", "adar ii":
		return 29
	case "adar":
		if !leap {
			return 29
		}
	}
	return 30
}

var hebrewCommon = [12]string{"tishri", "heshvan", "kislev", "tevet", "shevat", "adar", "nisan", "iyar", "sivan", "tammuz", "av", "elul"}
var hebrewLeapMonths = [13]string{"tishri", "heshvan", "kislev", "tevet", "shevat", "adar", "adar ii", "nisan", "iyar", "sivan", "tammuz", "av", "elul"}

// hebrewMonthKey names month m of year y in lower case ("adar" is Adar I in a
// leap year).
func hebrewMonthKey(y int64, m int) string {
	if hebrewLeap(y) {
		return hebrewLeapMonths[m-1]
	}
	return hebrewCommon[m-1]
}

var hebrewMonthTitles = map[string]string{"tishri": "Tishri", "heshvan": "Heshvan", "kislev": "Kislev", "tevet": "Tevet",
	"shevat": "Shevat", "adar": "Adar", "adar ii": "Adar II", "nisan": "Nisan", "iyar": "Iyar", "sivan": "Sivan",
	"tammuz": "Tammuz", "av": "Av", "elul": "Elul"}

func hebrewMonthTitle(y int64, m int) string {
	t := hebrewMonthTitles[hebrewMonthKey(y, m)]
	if t == "Adar" && hebrewLeap(y) {
		return "Adar I"
	}
	return t
}

func hebrewDay(y int64, m, d int) Day {
	day := hebrewNewYear(y)
	for k := 1; k < m; k++ {
		day += Day(hebrewMonthDays(y, k))
	}
	return day + Day(d-1)
}

func hebrewFromDay(d Day) (int64, int, int) {
	y := floorDiv(int64(d-hebrewEpoch)*98496, 35975351) + 1
	for hebrewNewYear(y+1) <= d {
		y++
	}
	for hebrewNewYear(y) > d {
		y--
	}
	m, start := 1, hebrewNewYear(y)
	for m < hebrewMonths(y) && d >= start+Day(hebrewMonthDays(y, m)) {
		start += Day(hebrewMonthDays(y, m))
		m++
	}
	return y, m, int(d-start) + 1
}
