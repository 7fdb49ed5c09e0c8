package date

import "strings"

// point is one written calendar date: a year, perhaps a month or season,
// perhaps a day, with its qualifiers and the run of days it names.
type point struct {
	year int64 // astronomical year, X digits read as 0 (187X → 1870, -18XX → -1800)
	yx   uint8 // unspecified (X) trailing digits of the year
	neg  bool  // the year was written with a minus sign (it matters for -00XX)

	// scattered marks X digits that leave scattered days (156X-12-25):
	// then ym, mm and dm mark the X digits of the year (bit 3 the
	// thousands), the month and the day (bit 1 the tens), and yx, mx and dx
	// are 0.
	scattered  bool
	ym, mm, dm uint8

	// partial marks qualifiers on single parts (EDTF level 2: 2004-06~-11,
	// ?2004-06-~11): q holds the qualifiers in effect on the year, the
	// month and the day (qApprox, qUncert), and approx and uncert say
	// whether any part has them.
	partial bool
	q       [3]uint8
	month   uint8  // 0 none; 1–12 a month; 21–41 a season or other division
	mx      uint8  // unspecified trailing digits of the month
	day     uint8  // 0 none
	dx      uint8  // unspecified trailing digits of the day
	sig     uint8  // significant digits of the year (level 2 "1950S2"), 0 when not given
	time    string // a time of day as written ("T23:20:30Z"); kept, never used
	cal     Calendar
	prec    Precision

	approx, uncert bool

	first, last Day

	x *pointExtra // nil for a plain EDTF or friendly Western date
}

// pointExtra is what the dates of other calendars and the documentary
// forms add to a point.
type pointExtra struct {
	cal   Calendar // the calendar the text was read in
	label string   // the date for people, as read ("Meiji 14, 5th month")
	fixed bool     // first and last were set by the calendar, not by span
	whole string   // for the start of a friendly range: the range for people ("18th century")
}

// fixedPoint is a point whose days a calendar has set: it is written in
// EDTF as its Gregorian days.
func fixedPoint(cal Calendar, label string, first, last Day, prec Precision) point {
	return point{first: first, last: last, prec: prec, x: &pointExtra{cal: cal, label: label, fixed: true}}
}

// isFixed reports whether pt's days were set by a calendar.
func (pt *point) isFixed() bool { return pt.x != nil && pt.x.fixed }

// pointish reads one date with the friendly forms: a circa word, "early",
// "mid", "late", "1870s", era names (BCE, AD), and the EDTF date itself.
func (p *parser) pointish(lo, hi int) (member, error) {
	s := p.in
	lo, hi = p.trim(lo, hi)
	if lo == hi {
		return member{}, p.failHint(lo, "expected a date", "write a year (1874), a month (1874-05) or a day (1874-05-21)")
	}
	var approx, uncert bool
	word := isLetter(s[lo]) // only then can a friendly word lead
	// A circa word: "c. 1870", "c.1870", "ca 1870", "circa 1870".
	for _, w := range circaWords {
		if !word {
			break
		}
		if !hasFold(s, lo, hi, w) {
			continue
		}
		n := lo + len(w)
		if n < hi && (isSpace(s[n]) || (w[len(w)-1] == '.' && isDigit(s[n]))) {
			approx = true
			lo, hi = p.trim(n, hi)
			break
		}
	}
	if !approx && hi-lo > 2 && (s[lo] == 'c' || s[lo] == 'C') && isSpace(s[lo+1]) {
		approx = true
		lo, hi = p.trim(lo+2, hi)
	}
	if word && hasFold(s, lo, hi, "the ") { // "the 1870s", "c. the early 1870s"
		lo, hi = p.trim(lo+len("the "), hi)
	}
	// Early, mid, late.
	frac := 0
	for i, w := range []string{"early", "mid", "late"} {
		if !word {
			break
		}
		if hasFold(s, lo, hi, w) && lo+len(w) < hi && (isSpace(s[lo+len(w)]) || s[lo+len(w)] == '-') {
			frac = i + 1
			lo, hi = p.trim(lo+len(w)+1, hi)
			break
		}
	}
	// Trailing qualifiers.
	q := hi
	for q > lo && (s[q-1] == '?' || s[q-1] == '~' || s[q-1] == '%') {
		q--
	}
	if hi-q > 2 || (hi-q == 2 && (s[q] == s[q+1] || s[q] == '%' || s[q+1] == '%')) {
		return member{}, p.failHint(q, "too many qualifiers", "write one: ? (uncertain), ~ (approximate) or % (both)")
	}
	for _, c := range []byte(s[q:hi]) {
		switch c {
		case '?':
			uncert = true
		case '~':
			approx = true
		case '%':
			approx, uncert = true, true
		}
	}
	hi = q
	_, hi = p.trim(lo, hi)
	if lo == hi {
		return member{}, p.fail(lo, "expected a date before the qualifier")
	}
	if p.unit2 != 0 || p.hasLetter(lo, hi) {
		if m, ok, err := p.century(lo, hi, frac, approx, uncert); ok {
			return m, err
		}
	}
	var pt point
	pt.cal = p.cal
	era, eraLo, eraHi := 0, 0, 0
	if c := s[hi-1] | 0x20; (c >= 'a' && c <= 'z') || c == '.' || isLetter(s[lo]) {
		era, eraLo, eraHi = p.era(lo, hi)
	}
	if era == 0 && p.era2 != 0 && allDigits(s[lo:hi]) {
		era, eraLo, eraHi = p.era2, hi, hi
	}
	switch {
	case isDualYear(s, lo, hi) && p.dualAt(lo, hi, lo+4):
		if err := p.bareDualYear(lo, hi, &pt); err != nil {
			return member{}, err
		}
	case era != 0:
		if era == eraAD && eraLo == lo {
			lo = eraHi
		} else {
			hi = eraLo
		}
		lo, hi = p.trim(lo, hi)
		if err := p.eraYear(lo, hi, era, &pt); err != nil {
			return member{}, err
		}
	case hi-lo >= 4 && (s[hi-1] == 's' || s[hi-1] == 'S') && isDigit(s[lo]):
		if err := p.plural(lo, hi, &pt); err != nil {
			return member{}, err
		}
	case (p.hasLetter(lo, hi) || hasNonASCII(s, lo, hi)) && !p.hasMonthName(lo, hi):
		m, ok, err := p.otherCalendar(lo, hi)
		if err != nil {
			return member{}, err
		}
		if ok {
			if a, b := m.start.first.Year(), m.end.last.Year(); a < -9999 || b > 9999 || m.kind&openEnd == 0 && m.end.first > m.end.last {
				return member{}, p.fail(lo, "dates of other calendars are read for the Gregorian years -9999 to 9999")
			}
			if frac != 0 {
				return member{}, p.failHint(lo, "early, mid and late apply to a decade or a century", "write early 1870s or late 18th century")
			}
			for _, e := range []*point{&m.start, &m.end} {
				e.approx, e.uncert = e.approx || approx, e.uncert || uncert
			}
			return m, nil
		}
		if err := p.named(lo, hi, &pt); err != nil {
			return member{}, err
		}
	case p.hasLetter(lo, hi):
		if err := p.named(lo, hi, &pt); err != nil {
			return member{}, err
		}
	case strings.ContainsAny(s[lo:hi], "?~%"):
		if err := p.qualifiedCore(lo, hi, &pt); err != nil {
			return member{}, err
		}
	default:
		i, err := p.core(lo, hi, &pt)
		if err != nil {
			return member{}, err
		}
		if i < hi {
			return member{}, p.unexpected(i, hi)
		}
	}
	if pt.partial {
		// A qualifier after the whole date applies to every part.
		var q uint8
		if approx {
			q |= qApprox
		}
		if uncert {
			q |= qUncert
		}
		for k := range pt.q {
			pt.q[k] |= q
		}
		pt.settle()
	} else {
		// pt.approx and pt.uncert are set only when qualifiers on every
		// part came to the same as a whole-date qualifier.
		pt.approx, pt.uncert = pt.approx || approx, pt.uncert || uncert
	}
	if pt.cal == CalendarJulian && !pt.isFixed() {
		if pt.scattered {
			return member{}, p.fail(lo, "scattered unspecified digits are read on the Gregorian calendar only")
		}
		if a, b := pt.first.Year(), pt.last.Year(); a < -9999 || b > 9999 {
			return member{}, p.fail(lo, "Julian dates are read for the years -9999 to 9999 (their days are written in four-digit years)")
		}
	}
	if frac != 0 {
		if pt.yx != 1 && pt.yx != 2 || pt.month != 0 {
			return member{}, p.failHint(lo, "early, mid and late apply to a decade or a century",
				"write early 1870s or late 1800s")
		}
		return fraction(pt, frac), nil
	}
	return member{start: pt, end: pt}, nil
}

func (p *parser) unexpected(i, hi int) *ParseError {
	s := p.in
	switch c := s[i]; {
	case c == '?' || c == '~' || c == '%':
		return p.failHint(i, "a qualifier stands at the end of a date or next to one of its parts",
			"write 2004-06-11? (all uncertain) or 2004?-06-11 (the year uncertain)")
	case c == '-' && i+1 < hi && isDigit(s[i+1]):
		return p.failHint(i, "expected the end of the date after the day",
			"a date has at most a year, a month and a day: 1874-05-21")
	case c == 'T':
		return p.fail(i, "expected a time hh:mm:ss after T")
	case c == 'X':
		return p.failHint(i, "unspecified digits (X) replace digits, they do not follow them", "write 187X or 1874-XX")
	}
	return p.failHint(i, "unexpected "+quoteChar(s, i)+" after the date",
		"EDTF dates look like 1874, 1874-05, 1874-05-21, 187X, 1874~ or 1870/1879")
}

func quoteChar(s string, i int) string {
	j := i + 1
	for j < len(s) && s[j]&0xC0 == 0x80 {
		j++
	}
	return `"` + s[i:j] + `"`
}

// divisions gives the first month and the length in months of the season
// codes 21–41: 21–24 are spring, summer, autumn, winter (read as in the
// northern hemisphere, as 25–28); 29–32 the southern seasons; 33–36
// quarters; 37–39 quadrimesters; 40–41 semesters.
var divisions = [...][2]uint8{
	21: {3, 3}, 22: {6, 3}, 23: {9, 3}, 24: {12, 3},
	25: {3, 3}, 26: {6, 3}, 27: {9, 3}, 28: {12, 3},
	29: {9, 3}, 30: {12, 3}, 31: {3, 3}, 32: {6, 3},
	33: {1, 3}, 34: {4, 3}, 35: {7, 3}, 36: {10, 3},
	37: {1, 4}, 38: {5, 4}, 39: {9, 4},
	40: {1, 6}, 41: {7, 6},
}

// span sets the precision and the run of days of pt.
func (pt *point) span() {
	if pt.scattered {
		pt.first, pt.last = pt.eachRun(nil)
		pt.prec = pt.runPrecision()
		return
	}
	ylo, yhi := pt.year, pt.year
	unit := int64(1) // the run of years: 10^(unspecified or insignificant digits)
	if pt.yx > 0 {
		for k := uint8(0); k < pt.yx; k++ {
			unit *= 10
		}
	}
	if pt.sig > 0 {
		a := max(pt.year, -pt.year)
		for k := len(appendInt(nil, a)) - int(pt.sig); k > 0; k-- {
			unit *= 10
		}
		ylo = a / unit * unit
		if pt.year < 0 {
			ylo = -ylo
		}
		yhi = ylo
	}
	if unit > 1 {
		if ylo < 0 || pt.neg {
			ylo -= unit - 1
		} else {
			yhi += unit - 1
		}
	}
	mlo, mhi := 1, 12
	dlo, dhi := 1, 0 // dhi 0: the last day of the month
	switch {
	case pt.month == 0 || pt.mx == 2:
		// the whole year
	case pt.month > 12:
		dv := divisions[pt.month]
		mlo = int(dv[0])
		mhi = mlo + int(dv[1]) - 1
	case pt.mx == 1:
		mlo = int(pt.month)
		if mlo == 0 {
			mlo, mhi = 1, 9
		} else {
			mhi = 12
		}
	default:
		mlo, mhi = int(pt.month), int(pt.month)
		switch {
		case pt.day == 0 && pt.dx == 0, pt.dx == 2:
		case pt.dx == 1:
			dlo, dhi = int(pt.day), int(pt.day)+9
			if dlo == 0 {
				dlo = 1
			}
		default:
			dlo, dhi = int(pt.day), int(pt.day)
		}
	}
	yEnd := yhi
	if mhi > 12 {
		yEnd++
		mhi -= 12
	}
	if dim := daysIn(yEnd, mhi, pt.cal); dhi == 0 || dhi > dim {
		dhi = dim
	}
	pt.first = dayIn(ylo, mlo, dlo, pt.cal)
	pt.last = dayIn(yEnd, mhi, dhi, pt.cal)
	switch {
	case unit == 10:
		pt.prec = PrecisionDecade
	case unit == 100:
		pt.prec = PrecisionCentury
	case unit >= 1000:
		pt.prec = PrecisionMillennium
	case pt.month == 0 || pt.mx > 0:
		pt.prec = PrecisionYear
	case pt.month > 12:
		pt.prec = PrecisionSeason
	case pt.day == 0 && pt.dx == 0, pt.dx > 0:
		pt.prec = PrecisionMonth
	default:
		pt.prec = PrecisionDay
	}
}

func dayIn(y int64, m, d int, c Calendar) Day {
	if c == CalendarJulian {
		return Julian(y, m, d)
	}
	return Gregorian(y, m, d)
}

func civilIn(d Day, c Calendar) (int64, int, int) {
	if c == CalendarJulian {
		return d.JulianCivil()
	}
	return d.Civil()
}

func daysIn(y int64, m int, c Calendar) int {
	if c == CalendarJulian {
		return JulianDaysInMonth(y, m)
	}
	return DaysInMonth(y, m)
}
