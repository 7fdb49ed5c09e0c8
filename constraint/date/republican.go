package date

import "strings"

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

// republican reads a French Republican date whose "an" is rest[k]: "18
// Brumaire an VIII", "Brumaire an VIII", "an VIII", "3e jour complémentaire
// an VII", "1er vendémiaire an I".
func (p *parser) republican(lo int, rest [][2]int, k int) (point, bool, error) {
	s := p.in
	if k+1 >= len(rest) {
		return point{}, true, p.failHint(lo, "expected the year after \"an\"", "write 18 Brumaire an VIII")
	}
	yw := s[rest[k+1][0]:rest[k+1][1]]
	y := romanNumeral(yw)
	if y == 0 {
		if v, ok := smallNumber(yw); ok {
			y = int64(v)
		}
	}
	if y < 1 {
		return point{}, true, p.failHint(rest[k+1][0], "expected the year of the Republic in Roman or Arabic numerals", "write an VIII or an 8")
	}
	for _, t := range rest[k+2:] {
		w := foldLatin(s[t[0]:t[1]])
		if w != "de" && w != "la" && w != "republique" && w != "delarepublique" && w != "francaise" {
			return point{}, true, p.fail(t[0], "unexpected words after the year")
		}
	}
	ny, exact := republicanNewYear(y)
	nextNY, _ := republicanNewYear(y + 1)
	label := "an " + toRoman(y)
	first, last := ny, nextNY-1
	prec := PrecisionYear
	words := rest[:k]
	if len(words) > 0 {
		day := 0
		dw := strings.ToLower(s[words[0][0]:words[0][1]])
		for _, suf := range []string{"er", "e", "re", "ème", "eme"} {
			if v, ok := smallNumber(strings.TrimSuffix(dw, suf)); ok && strings.HasSuffix(dw, suf) {
				day = v
				break
			}
		}
		if v, ok := smallNumber(dw); ok {
			day = v
		}
		if day != 0 {
			words = words[1:]
		}
		if len(words) == 0 {
			return point{}, true, p.failHint(rest[0][0], "a day needs its month", "write 18 Brumaire an VIII")
		}
		mkey := ""
		for _, t := range words {
			mkey += s[t[0]:t[1]]
		}
		mkey = foldLatin(mkey)
		month := 0
		for i, name := range republicanMonths {
			if mkey == foldLatin(name) {
				month = i + 1
			}
		}
		switch mkey {
		case "jourcomplementaire", "jourscomplementaires", "sansculottides", "sansculottide", "complementaire":
			month = 13
		case "fervidor":
			month = 11
		}
		if month == 0 {
			return point{}, true, p.failHint(words[0][0], "unknown month of the Republican calendar",
				"the months are Vendémiaire, Brumaire, Frimaire, Nivôse, Pluviôse, Ventôse, Germinal, Floréal, Prairial, Messidor, Thermidor, Fructidor, and the jours complémentaires")
		}
		mfirst := ny + Day(30*(month-1))
		mlen := 30
		if month == 13 {
			mlen = int(nextNY - mfirst)
		}
		first, last = mfirst, mfirst+Day(mlen)-1
		label = republicanMonths[month-1] + " " + label
		prec = PrecisionMonth
		if day != 0 {
			if day > mlen {
				return point{}, true, p.fail(words[0][0], "day "+itoa(day)+": "+republicanMonths[month-1]+" an "+toRoman(y)+" has "+itoa(mlen)+" days")
			}
			first = mfirst + Day(day-1)
			last = first
			label = itoa(day) + " " + label
			prec = PrecisionDay
		}
	}
	if !exact {
		p.note("the Republican calendar was used for the years I to XIV (and in 1871); an " + toRoman(y) +
			" is read from the autumn equinox at Paris as computed here, widened by a day at each side")
		first--
		last++
	}
	return fixedPoint(CalendarFrenchRepublican, label, first, last, prec), true, nil
}
