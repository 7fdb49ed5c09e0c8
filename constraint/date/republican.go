package date

// The French Republican calendar: twelve months of 30 days and five or six
// complementary days (sansculottides) at the end of the year, which began
// on the day of the autumn equinox at the Paris Observatory. It was in use
// from year I (22 September 1792) to the end of 1805 (10 Nivôse XIV), and
// again for some weeks under the Commune of 1871 (year LXXIX).
//
// For years I to XIV the first days of the years are the ones the
// calendar had (years III, VII and XI had six complementary days); they are
// held to the equinox computed by this package's solar theory by a test.
// Later years are read by the equinox rule from that computation, widened
// by a day at each side (the historical rule and the computation may
// differ when the equinox falls near midnight), and the notes say so.

// republicanYearStarts is 1 Vendémiaire of years I to XIV (Gregorian).
var republicanYearStarts = [15][3]int{
	1: {1792, 9, 22}, 2: {1793, 9, 22}, 3: {1794, 9, 22}, 4: {1795, 9, 23}, 5: {1796, 9, 22},
	6: {1797, 9, 22}, 7: {1798, 9, 22}, 8: {1799, 9, 23}, 9: {1800, 9, 23}, 10: {1801, 9, 23},
	11: {1802, 9, 23}, 12: {1803, 9, 24}, 13: {1804, 9, 23}, 14: {1805, 9, 23},
}

var republicanMonths = [13]string{"Vendémiaire", "Brumaire", "Frimaire", "Nivôse", "Pluviôse", "Ventôse",
	"Germinal", "Floréal", "Prairial", "Messidor", "Thermidor", "Fructidor", "jours complémentaires"}

// republicanNewYear returns 1 Vendémiaire of year y and whether it is
// exact (years I to XIV) rather than computed.
func republicanNewYear(y int64) (Day, bool) {
	if y >= 1 && y <= 14 {
		s := republicanYearStarts[y]
		return Gregorian(int64(s[0]), s[1], s[2]), true
	}
	return autumnEquinoxDay(y+1791, parisLongitude), false
}

// parisLongitude is the longitude of the Paris Observatory, degrees east.
const parisLongitude = 2.3371

// romanNumeral reads a Roman numeral (I to MMMM, any case) or returns 0.
func romanNumeral(w string) int64 {
	val := func(c byte) int64 {
		switch c | 0x20 {
		case 'i':
			return 1
		case 'v':
			return 5
		case 'x':
			return 10
		case 'l':
			return 50
		case 'c':
			return 100
		case 'd':
			return 500
		case 'm':
			return 1000
		}
		return 0
	}
	var total int64
	for i := 0; i < len(w); i++ {
		v := val(w[i])
		if v == 0 {
			return 0
		}
		if i+1 < len(w) && val(w[i+1]) > v {
			total -= v
		} else {
			total += v
		}
	}
	if total > 4000 || toRoman(total) != toUpperASCII(w) {
		return 0 // only well-formed numerals
	}
	return total
}

func toUpperASCII(w string) string {
	b := []byte(w)
	for i, c := range b {
		if c >= 'a' && c <= 'z' {
			b[i] = c - 32
		}
	}
	return string(b)
}

func toRoman(v int64) string {
	var b []byte
	for _, r := range []struct {
		v int64
		s string
	}{{1000, "M"}, {900, "CM"}, {500, "D"}, {400, "CD"}, {100, "C"}, {90, "XC"}, {50, "L"}, {40, "XL"}, {10, "X"}, {9, "IX"}, {5, "V"}, {4, "IV"}, {1, "I"}} {
		for v >= r.v {
			b = append(b, r.s...)
			v -= r.v
		}
	}
	return string(b)
}
