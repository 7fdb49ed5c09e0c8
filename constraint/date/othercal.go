package date

import (
	"strings"

	"terminus/materials/spell"
)

// The dates of the other calendars, as records write them: Hijri ("1300
// AH", "AH 1300", "Muharram 1300", "15 Ramadan 1300 AH"), solar Hijri
// ("1300 SH", "1 Farvardin 1300 SH"), Hebrew ("5600 AM", "1 Tishri 5600"),
// French Republican ("18 Brumaire an VIII", "an VIII"), Buddhist Era
// ("BE 2475", "พ.ศ. 2475") and Republic of China ("民國20年", "ROC 20").

// otherCalendar reads s[lo:hi] as a date of another calendar; false when
// it is none.
func (p *parser) otherCalendar(lo, hi int) (member, bool, error) {
	if d, refs, ok, err := p.eraForm(lo, hi); ok {
		if err != nil {
			return member{}, true, err
		}
		m, err := p.readEra(d, refs, lo)
		return m, true, err
	}
	if pt, ok, err := p.calendarWords(lo, hi); ok {
		return member{start: pt, end: pt}, true, err
	}
	if hint := p.nearestEra(lo, hi); hint != "" {
		return member{}, true, p.failHint(lo, "unknown era "+p.wordAt(lo, hi), hint)
	}
	if p.isCyclical(lo, hi) {
		return member{}, true, p.failHint(lo, "a zodiac or sexagenary year repeats every 12 or 60 years: it is read alone, with a range",
			"write year of the horse in 1840/1880, or give the range as a setting (terminus date --within)")
	}
	return member{}, false, nil
}

// tokens splits s[lo:hi] into words at spaces and commas; nil when there
// are more than cap(out).
func (p *parser) tokens(lo, hi int, out [][2]int) [][2]int {
	ws, all := p.splitWords(lo, hi, out, false)
	if !all {
		return nil
	}
	return ws
}

// splitWords splits s[lo:hi] into at most cap(out) words at spaces and
// commas; all is false when more words follow them. With centuryHyphens, a
// hyphen before a century word also ends a word ("18th-century",
// "mid-18th").
func (p *parser) splitWords(lo, hi int, out [][2]int, centuryHyphens bool) (ws [][2]int, all bool) {
	s := p.in
	out = out[:0]
	for i := lo; i < hi; {
		for i < hi && (isSpace(s[i]) || s[i] == ',') {
			i++
		}
		if i == hi {
			break
		}
		j := i
		for j < hi && !isSpace(s[j]) && s[j] != ',' &&
			!(centuryHyphens && s[j] == '-' && j > i && j+1 < hi && !isDigit(s[j+1]) && centuryUnit(p.wordAt(j+1, hi)) != 0) {
			j++
		}
		if len(out) == cap(out) {
			return out, false
		}
		out = append(out, [2]int{i, j})
		if j < hi && s[j] == '-' { // only after a century hyphen
			j++
		}
		i = j
	}
	return out, true
}

// calendarWords reads the Hijri, solar Hijri, Hebrew, French Republican,
// Buddhist and ROC forms.
func (p *parser) calendarWords(lo, hi int) (point, bool, error) {
	s := p.in
	if pt, ok, err := p.cjkYear(lo, hi); ok {
		return pt, true, err
	}
	var buf [10][2]int
	ws := p.tokens(lo, hi, buf[:0])
	if len(ws) == 0 {
		return point{}, false, nil
	}
	w := func(k int) string { return s[ws[k][0]:ws[k][1]] }
	// an era word first or last
	kind, eraAt := 0, -1
	for _, k := range []int{len(ws) - 1, 0} {
		switch foldLatin(w(k)) {
		case "ah", "h", "hijri", "hegira", "hijra":
			kind, eraAt = 'i', k
		case "sh", "ap", "hs", "ahs", "shamsi", "solarhijri":
			kind, eraAt = 'p', k
		case "am", "annomundi":
			kind, eraAt = 'h', k
		case "be", "ps", "พศ":
			kind, eraAt = 'b', k
		case "roc", "minguo", "mingkuo":
			kind, eraAt = 'r', k
		}
		if kind != 0 {
			break
		}
	}
	if strings.HasPrefix(w(0), "พ.ศ.") {
		kind, eraAt = 'b', 0
		if len(w(0)) > len("พ.ศ.") {
			ws[0][0] += len("พ.ศ.")
			eraAt = -1
		}
	}
	// the rest: [day] [month words] year
	rest := make([][2]int, 0, len(ws))
	for k := range ws {
		if k != eraAt {
			rest = append(rest, ws[k])
		}
	}
	if len(rest) == 0 {
		return point{}, kind != 0, p.fail(lo, "expected a year with the era")
	}
	r := func(k int) string { return s[rest[k][0]:rest[k][1]] }
	// French Republican: "… an VIII"
	for k := range rest {
		if strings.EqualFold(r(k), "an") || strings.EqualFold(r(k), "l'an") || strings.EqualFold(r(k), "l’an") {
			if kind != 0 {
				break
			}
			return p.republican(lo, rest, k)
		}
	}
	last := r(len(rest) - 1)
	year, ok := smallNumber(last)
	if !ok {
		if kind != 0 {
			return point{}, true, p.failHint(rest[len(rest)-1][0], "expected the year", "write 1300 AH, 1300 SH, 5600 AM or BE 2475")
		}
		return point{}, false, nil
	}
	day, month := 0, ""
	mw := rest[:len(rest)-1]
	if len(mw) > 0 {
		if v, ok := smallNumber(strings.TrimSuffix(strings.TrimSuffix(r(0), "."), "th")); ok {
			day = v
			mw = mw[1:]
		}
	}
	for _, t := range mw {
		month += s[t[0]:t[1]]
	}
	key := foldLatin(month)
	if kind == 0 && key == "" {
		return point{}, false, nil
	}
	calKind := kind
	var mon int
	if key != "" {
		found := false
		for _, c := range []int{'i', 'p', 'h'} {
			if kind != 0 && c != kind {
				continue
			}
			var n int
			switch c {
			case 'i':
				n = islamicMonthKeys[key]
			case 'p':
				n = persianMonthKeys[key]
			case 'h':
				n = hebrewMonthKeys[key]
			}
			if n != 0 {
				calKind, mon, found = c, n, true
				break
			}
		}
		if !found {
			if kind == 0 {
				return point{}, false, nil
			}
			return point{}, true, p.failHint(mw[0][0], "unknown month "+quoteChar(s, mw[0][0])+" of the "+calendarOfKind(kind).String()+" calendar",
				monthHint(kind))
		}
	}
	if day != 0 && mon == 0 {
		return point{}, true, p.fail(rest[0][0], "a day needs its month")
	}
	pos := rest[len(rest)-1][0]
	switch calKind {
	case 'i':
		pt, err := p.islamicPoint(int64(year), mon, day, pos)
		return pt, true, err
	case 'p':
		pt, err := p.persianPoint(int64(year), mon, day, pos)
		return pt, true, err
	case 'h':
		pt, err := p.hebrewPoint(int64(year), mon, day, key, pos)
		return pt, true, err
	case 'b':
		if mon != 0 || day != 0 {
			return point{}, true, p.fail(lo, "a Buddhist Era year is read alone, without month or day")
		}
		return p.buddhistPoint(int64(year), pos), true, nil
	case 'r':
		if mon != 0 || day != 0 {
			return point{}, true, p.failHint(lo, "months of the Republic of China are Gregorian", "write ROC 20 alone, or 民國20年5月3日")
		}
		pt, err := p.rocPoint(int64(year), 0, 0, false, pos)
		return pt, true, err
	}
	return point{}, false, nil
}

func calendarOfKind(k int) Calendar {
	switch k {
	case 'i':
		return CalendarIslamic
	case 'p':
		return CalendarPersian
	case 'h':
		return CalendarHebrew
	case 'b':
		return CalendarBuddhist
	case 'r':
		return CalendarROC
	}
	return CalendarGregorian
}

func monthHint(k int) string {
	switch k {
	case 'i':
		return "the Hijri months are Muharram, Safar, Rabi I, Rabi II, Jumada I, Jumada II, Rajab, Shaban, Ramadan, Shawwal, Dhu al-Qada, Dhu al-Hijja"
	case 'p':
		return "the solar Hijri months are Farvardin, Ordibehesht, Khordad, Tir, Mordad, Shahrivar, Mehr, Aban, Azar, Dey, Bahman, Esfand"
	case 'h':
		return "the Hebrew months are Tishri, Heshvan, Kislev, Tevet, Shevat, Adar (Adar I, Adar II), Nisan, Iyar, Sivan, Tammuz, Av, Elul"
	}
	return "write the year alone"
}

var islamicMonthKeys = keys(map[int][]string{
	1:  {"muharram", "moharram", "muharrem", "muharam"},
	2:  {"safar", "sefer", "saphar"},
	3:  {"rabialawwal", "rabiulawwal", "rabiulawal", "rabialawal", "rabii", "rabi1", "rebiulevvel", "rabiallawal", "rabielawal"},
	4:  {"rabialthani", "rabiulthani", "rabiussani", "rabialakhir", "rabiulakhir", "rabiii", "rabi2", "rebiulahir", "rabiuthani", "rabiassani", "rabialakhar"},
	5:  {"jumadaalawwal", "jumadaalula", "jumadai", "jumada1", "jumadalawwal", "jumadiulawal", "jumadalula", "cemaziyelevvel", "jumadiulawwal", "jumadalawal"},
	6:  {"jumadaalthani", "jumadaalakhira", "jumadaii", "jumada2", "jumadiulakhir", "jumadiussani", "jumadathani", "cemaziyelahir", "jumadaalakhirah", "jumadalakhira", "jumadiulakhira", "jumadiathani"},
	7:  {"rajab", "recep", "receb", "radjab"},
	8:  {"shaban", "saban", "shaaban", "chaban"},
	9:  {"ramadan", "ramazan", "ramadhan", "ramadaan"},
	10: {"shawwal", "sevval", "shawal", "chawwal"},
	11: {"dhualqada", "dhulqada", "dhulqadah", "dhualqidah", "dhulqaada", "zulkade", "zilkade", "dhulqidah", "dhualqadah", "dhulkada", "zulqada", "zulqadah", "dhualqida", "dhulqida"},
	12: {"dhualhijja", "dhulhijja", "dhulhijjah", "dhualhijjah", "zulhijja", "zilhicce", "zulhijjah", "dhulhija", "zilhijja"},
})

var persianMonthKeys = keys(map[int][]string{
	1: {"farvardin"}, 2: {"ordibehesht", "ordibehest"}, 3: {"khordad", "xordad"}, 4: {"tir"},
	5: {"mordad", "amordad", "amordad"}, 6: {"shahrivar", "sahrivar"}, 7: {"mehr"}, 8: {"aban"},
	9: {"azar"}, 10: {"dey", "dei"}, 11: {"bahman"}, 12: {"esfand", "esfand", "isfand", "espand"},
})

// hebrewMonthKeys numbers the months by name; Adar I is 6, Adar II 7 (in a
// leap year; hebrewPoint renumbers the months after Adar in a common year).
var hebrewMonthKeys = keys(map[int][]string{
	1: {"tishri", "tishrei", "tisri"}, 2: {"heshvan", "cheshvan", "marheshvan", "marcheshvan", "heshwan", "hesvan", "marheshwan"},
	3: {"kislev", "chislev", "kislew", "kisleu"}, 4: {"tevet", "tebeth", "teves", "tebet", "tevet"},
	5: {"shevat", "shvat", "shebat", "sebat"}, 6: {"adar", "adari", "adar1", "adarrishon", "adara"},
	7: {"adarii", "adar2", "adarsheni", "veadar", "adarbet", "adarb"}, 8: {"nisan", "nissan"},
	9: {"iyar", "iyyar", "iyar"}, 10: {"sivan", "siwan"}, 11: {"tammuz", "tamuz", "tamouz"}, 12: {"av", "ab", "menachemav"},
	13: {"elul"},
})

func keys(m map[int][]string) map[string]int {
	out := map[string]int{}
	for n, ks := range m {
		for _, k := range ks {
			out[k] = n
		}
	}
	return out
}

func (p *parser) islamicPoint(y int64, m, d, pos int) (point, error) {
	if y < 1 || y > 9999 {
		return point{}, p.fail(pos, "Hijri years are read from AH 1 to 9999")
	}
	first, last := islamicDay(y, 1, 1), islamicDay(y+1, 1, 1)-1
	label := "AH " + itoa(int(y))
	prec := PrecisionYear
	switch {
	case d != 0:
		if d > 30 {
			return point{}, p.fail(pos, "day "+itoa(d)+": Hijri months have 29 or 30 days")
		}
		if d == 30 && islamicMonthDays(y, m) == 29 {
			p.note(islamicMonths[m-1] + " " + itoa(int(y)) + " has 29 days in the arithmetic calendar; day 30 is read as a month begun a day late")
		}
		first = islamicDay(y, m, d)
		last = first
		label = itoa(d) + " " + islamicMonths[m-1] + " " + itoa(int(y)) + " AH"
		prec = PrecisionDay
	case m != 0:
		first, last = islamicDay(y, m, 1), islamicDay(y, m, islamicMonthDays(y, m))
		label = islamicMonths[m-1] + " " + itoa(int(y)) + " AH"
		prec = PrecisionMonth
	}
	p.note("Hijri dates are read on the arithmetic (tabular) calendar and widened by " + itoa(islamicSlack) +
		" days at each side: a month begun on the sighting of the new moon may start a day or two from it")
	return fixedPoint(CalendarIslamic, label, first-islamicSlack, last+islamicSlack, prec), nil
}

func (p *parser) persianPoint(y int64, m, d, pos int) (point, error) {
	if y < 1 || y > 9999 {
		return point{}, p.fail(pos, "solar Hijri years are read from 1 to 9999")
	}
	first, last := persianNewYear(y), persianNewYear(y+1)-1
	label := itoa(int(y)) + " SH"
	prec := PrecisionYear
	switch {
	case d != 0:
		if d > persianMonthDays(y, m) {
			return point{}, p.fail(pos, "day "+itoa(d)+": "+persianMonths[m-1]+" "+itoa(int(y))+" has "+itoa(persianMonthDays(y, m))+" days")
		}
		first = persianDay(y, m, d)
		last = first
		label = itoa(d) + " " + persianMonths[m-1] + " " + itoa(int(y)) + " SH"
		prec = PrecisionDay
	case m != 0:
		first, last = persianDay(y, m, 1), persianDay(y, m, persianMonthDays(y, m))
		label = persianMonths[m-1] + " " + itoa(int(y)) + " SH"
		prec = PrecisionMonth
	}
	if y < 1304 {
		p.note("the solar Hijri calendar became official in 1925 (1304 SH); earlier years are read proleptically")
	}
	return fixedPoint(CalendarPersian, label, first, last, prec), nil
}

func (p *parser) hebrewPoint(y int64, m, d int, key string, pos int) (point, error) {
	if y < 1 || y > 99999 {
		return point{}, p.fail(pos, "Hebrew years are read from AM 1 to 99999")
	}
	leap := hebrewLeap(y)
	first, last := hebrewNewYear(y), hebrewNewYear(y+1)-1
	label := "AM " + itoa(int(y))
	prec := PrecisionYear
	if m != 0 {
		// months by name: 6 Adar (I), 7 Adar II, 8… the months after
		switch {
		case m == 7 && !leap:
			return point{}, p.failHint(pos, itoa(int(y))+" is not a leap year: it has no Adar II (no 13th month)", "write Adar "+itoa(int(y)))
		case m == 6 && leap && (key == "adar"):
			// Adar in a leap year: Adar I or Adar II
			p.note("Adar " + itoa(int(y)) + " in a leap year is read as Adar I or Adar II")
		case m > 7 && !leap:
			m--
		}
		num := m
		mfirst := hebrewDay(y, num, 1)
		mlast := mfirst + Day(hebrewMonthDays(y, num)) - 1
		if m == 6 && leap && key == "adar" {
			mlast = hebrewDay(y, 7, 1) + Day(hebrewMonthDays(y, 7)) - 1
		}
		first, last = mfirst, mlast
		label = hebrewMonthTitle(y, num) + " " + itoa(int(y))
		if m == 6 && leap && key == "adar" {
			label = "Adar " + itoa(int(y)) + " (Adar I or Adar II)"
		}
		prec = PrecisionMonth
		if d != 0 {
			if d > hebrewMonthDays(y, num) {
				return point{}, p.fail(pos, "day "+itoa(d)+": "+hebrewMonthTitle(y, num)+" "+itoa(int(y))+" has "+itoa(hebrewMonthDays(y, num))+" days")
			}
			first = mfirst + Day(d-1)
			last = first
			if m == 6 && leap && key == "adar" {
				last = hebrewDay(y, 7, d)
			}
			label = itoa(d) + " " + label
			prec = PrecisionDay
		}
	}
	p.note("a Hebrew day begins at the evening before; it is read as the civil day of its daylight")
	return fixedPoint(CalendarHebrew, label, first, last, prec), nil
}

// buddhistPoint reads a Buddhist Era year in the Thai reckoning (BE =
// CE + 543). From BE 2484 (1941) the year begins on 1 January; from 2432
// (1889) to 2483 it began on 1 April; before, at the Thai new year in
// April. Before 2484 the year is read from 1 January of its first
// Gregorian year to the end of April of the next, which holds every
// reckoning.
func (p *parser) buddhistPoint(y int64, pos int) point {
	g := y - 543
	label := "BE " + itoa(int(y))
	if y >= 2484 {
		return fixedPoint(CalendarBuddhist, label, Gregorian(g, 1, 1), Gregorian(g, 12, 31), PrecisionYear)
	}
	p.note("before BE 2484 (1941) the Thai year began in April: BE " + itoa(int(y)) + " is read from 1 January " + itoa(int(g)) +
		" to 30 April " + itoa(int(g+1)) + ", which holds every reckoning; in Sri Lanka, Myanmar and Cambodia the era is counted from a year earlier")
	return fixedPoint(CalendarBuddhist, label, Gregorian(g, 1, 1), Gregorian(g+1, 4, 30), PrecisionYear)
}

// rocPoint reads a year of the Republic of China (year 1 is 1912) on the
// Gregorian calendar; before is a year "民國前" before it.
func (p *parser) rocPoint(y int64, m, d int, before bool, pos int) (point, error) {
	g := 1911 + y
	label := "ROC " + itoa(int(y))
	if before {
		g = 1912 - y
		label = "ROC −" + itoa(int(y)) + " (民國前" + itoa(int(y)) + "年)"
	}
	if y < 1 {
		return point{}, p.fail(pos, "the years of the Republic of China start at 1 (1912)")
	}
	first, last, err := p.gregorianPart(g, m, d, pos)
	if err != nil {
		return point{}, err
	}
	prec := PrecisionYear
	switch {
	case d != 0:
		prec = PrecisionDay
		label += "." + itoa(m) + "." + itoa(d)
	case m != 0:
		prec = PrecisionMonth
		label += "." + itoa(m)
	}
	return fixedPoint(CalendarROC, label, first, last, prec), nil
}

// cjkYear reads the years of the Republic of China written in characters
// ("民國20年", "民国二十年五月三日", "中華民國20年", "民國前10年") and Thai
// Buddhist Era years ("พ.ศ. 2475").
func (p *parser) cjkYear(lo, hi int) (point, bool, error) {
	s := strings.TrimSpace(p.in[lo:hi])
	if !hasNonASCII(s, 0, len(s)) {
		return point{}, false, nil
	}
	s = strings.TrimPrefix(s, "中華")
	s = strings.TrimPrefix(s, "中华")
	rest, ok := strings.CutPrefix(kanjiFold.Replace(s), "民国")
	if !ok {
		return point{}, false, nil
	}
	before := false
	if r, ok := strings.CutPrefix(rest, "前"); ok {
		before, rest = true, r
	}
	yEnd := strings.Index(rest, "年")
	if yEnd <= 0 {
		return point{}, true, p.failHint(lo, "expected the year and 年 after 民國", "write 民國20年")
	}
	y, ok := cjkNumber(rest[:yEnd])
	if !ok || y < 1 || y > 9999 {
		return point{}, true, p.fail(lo, "expected the year in numerals before 年")
	}
	rest = rest[yEnd+len("年"):]
	m, d := 0, 0
	if rest != "" {
		mEnd := strings.Index(rest, "月")
		if mEnd <= 0 {
			return point{}, true, p.fail(lo, "expected the month and 月 after the year")
		}
		v, ok := cjkNumber(rest[:mEnd])
		if !ok {
			return point{}, true, p.fail(lo, "expected the month in numerals before 月")
		}
		m = int(v)
		rest = rest[mEnd+len("月"):]
		if rest != "" {
			v, ok := cjkNumber(strings.TrimSuffix(rest, "日"))
			if !ok || !strings.HasSuffix(rest, "日") {
				return point{}, true, p.fail(lo, "expected the day in numerals and 日 after the month")
			}
			d = int(v)
		}
	}
	pt, err := p.rocPoint(y, m, d, before, lo)
	return pt, true, err
}

// nearestEra suggests the era a misspelt "Name 14" may mean, or "".
func (p *parser) nearestEra(lo, hi int) string {
	w := p.wordAt(lo, hi)
	if len(w) < 3 || !isLetter(w[0]) || lo+len(w) >= hi {
		return ""
	}
	rest := strings.TrimSpace(p.in[lo+len(w) : hi])
	if rest == "" || !isDigit(rest[0]) {
		return ""
	}
	key := foldLatin(w)
	best, bestD := "", 3
	for k, refs := range eraIndex {
		if hasNonASCII(k, 0, len(k)) {
			continue
		}
		if d := spell.Distance(key, k); d < bestD || d == bestD && best != "" && refs[0].e.name < best {
			best, bestD = refs[0].e.name, d
		}
	}
	if best == "" || bestD > len(key)/3+1 {
		return ""
	}
	return "did you mean " + best + "? (" + best + " " + rest + ")"
}
