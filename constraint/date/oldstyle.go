package date

// Old Style dates: the Julian calendar with a year that did not begin on
// 1 January. In England and its colonies until 1752 the year number
// changed on 25 March, so that "10 February 1712" there is 10 February
// 1713 as years are numbered now; documents often wrote both numbers, as
// "10 February 1712/13".

// dualYear reads the second year of a dual year "1712/13", "1712/3" or
// "1699/1700" whose first year is s[lo:slash] and returns it whole (1713).
func (p *parser) dualYear(lo, slash, hi int) (int64, error) {
	s := p.in
	if slash-lo != 4 || !allDigits(s[lo:slash]) {
		return 0, p.failHint(lo, "expected a dual year such as 1712/13", "write 10 February 1712/13")
	}
	var y int64
	for i := lo; i < slash; i++ {
		y = y*10 + int64(s[i]-'0')
	}
	tail := s[slash+1 : hi]
	if !allDigits(tail) || len(tail) == 3 || len(tail) > 4 {
		return 0, p.failHint(slash+1, "expected the next year after the \"/\" of a dual year", "write 1712/13, 1712/3 or 1699/1700")
	}
	var v, mod int64 = 0, 1
	for i := 0; i < len(tail); i++ {
		v = v*10 + int64(tail[i]-'0')
		mod *= 10
	}
	next := y + 1
	if v != next%mod {
		return 0, p.failHint(slash+1, "the second year of a dual year is the next year",
			"write "+s[lo:slash]+"/"+twoDigits(int(next%100))+" (the old-style and the new-style year)")
	}
	return next, nil
}

// isDualYear reports whether s[lo:hi] is a bare dual year ("1712/13",
// "1712/3"), not an EDTF interval.
func isDualYear(s string, lo, hi int) bool {
	n := hi - lo
	return (n == 6 || n == 7) && s[lo+4] == '/' && allDigits(s[lo:lo+4]) && allDigits(s[lo+5:hi])
}

// bareDualYear reads a dual year alone: the Old Style year that began in
// March of the first year and ended in March of the second (from 1 March,
// the Venetian start, to 24 March, the English end: both styles are
// covered), on the Julian calendar unless the text is marked otherwise.
func (p *parser) bareDualYear(lo, hi int, pt *point) error {
	y2, err := p.dualYear(lo, lo+4, hi)
	if err != nil {
		return err
	}
	cal := p.dualCalendar()
	label := p.in[lo:hi] + " (Old Style year" + calSuffix(cal) + ")"
	*pt = fixedPoint(cal, label, dayIn(y2-1, 3, 1, cal), dayIn(y2, 3, 24, cal), PrecisionYear)
	p.note(p.in[lo:hi] + " is a dual year: read as the year that began in March " + FormatYear(y2-1) +
		" and ended in March " + FormatYear(y2) + " (1 March to 24 March covers the Venetian and the English year starts)")
	return nil
}

// dualCalendar is the calendar of a dual-dated text: Julian, unless the
// text is marked Gregorian (N.S.).
func (p *parser) dualCalendar() Calendar {
	if p.marked && p.cal == CalendarGregorian {
		return CalendarGregorian
	}
	return CalendarJulian
}

func calSuffix(c Calendar) string {
	if c == CalendarJulian {
		return ", Julian"
	}
	return ""
}

// dualDate reads a date with a dual year, "10 February 1712/13": the day
// of the new-style year y2, which must fall between 1 January and 24 March.
func (p *parser) dualDate(lo, hi, dayPos int, y2 int64, pt *point) error {
	if pt.month > 3 || pt.month == 3 && pt.day >= 25 {
		return p.failHint(lo, "a dual year is written for dates from 1 January to 24 March, when the old-style and the new-style years differ",
			"write the date with one year: "+itoa(int(pt.day))+" "+monthNames[pt.month-1]+" "+FormatYear(y2-1))
	}
	pt.cal = p.dualCalendar()
	written := pt.year
	pt.year = y2
	if pt.day != 0 {
		if err := p.checkDay(dayPos, pt); err != nil {
			return err
		}
	}
	pt.span()
	label := ""
	if pt.day != 0 {
		label = itoa(int(pt.day)) + " "
	}
	label += monthNames[pt.month-1] + " " + FormatYear(written) + "/" + twoDigits(int(y2%100))
	if pt.cal == CalendarJulian {
		label += " (Julian)"
	}
	pt.x = &pointExtra{cal: pt.cal, label: label}
	p.note(label + ": a dual year, " + FormatYear(written) + " as the year was numbered from 25 March, " +
		FormatYear(y2) + " from 1 January; read as " + FormatYear(y2))
	return nil
}

// documentary reads a date written with a month name in the Julian
// calendar or with a year start given: the written year is moved to the
// year as numbered from 1 January. A Julian date of 1 January to 24 March
// whose year start is not known has two readings (see choose).
func (p *parser) documentary(lo, hi, dayPos int, pt *point) error {
	ys := p.ys
	m, d := int(pt.month), int(pt.day)
	ambiguous := false
	if ys == YearStartUnknown {
		if pt.cal != CalendarJulian || m > 3 || m == 3 && d >= 25 {
			ys = YearStartJanuary
		} else {
			ambiguous = true
			ys = YearStartJanuary
			if p.choose(2) == 1 {
				ys = YearStartLadyDay
			}
		}
	}
	written := pt.year
	// The runs of days: the month (or day) may straddle the year start.
	type run struct {
		year   int64
		d1, d2 int // days of the month; 0 for the month's last
	}
	runs := [2]run{{written, 1, 0}}
	nr := 1
	if d != 0 {
		runs[0] = run{written + shiftYear(ys, m, d), d, d}
	} else {
		switch {
		case ys == YearStartLadyDay && m == 3:
			runs[0] = run{written + 1, 1, 24}
			runs[1] = run{written, 25, 0}
			nr = 2
		case ys == YearStartChristmas && m == 12:
			runs[0] = run{written, 1, 24}
			runs[1] = run{written - 1, 25, 0}
			nr = 2
		default:
			runs[0] = run{written + shiftYear(ys, m, 1), 1, 0}
		}
	}
	k := 0
	if nr == 2 {
		k = p.choose(2)
	}
	r := runs[k]
	pt.year = r.year
	if d != 0 {
		if err := p.checkDay(dayPos, pt); err != nil {
			return err
		}
	}
	label := ""
	if d != 0 {
		label = itoa(d) + " "
	}
	label += monthNames[m-1] + " " + FormatYear(written)
	switch {
	case pt.cal == CalendarJulian && ys != YearStartJanuary:
		label += " (Julian, year from " + ys.String() + ")"
	case pt.cal == CalendarJulian && ambiguous:
		label += " (Julian, year from 1 January)"
	case pt.cal == CalendarJulian:
		label += " (Julian)"
	case ys != YearStartJanuary:
		label += " (year from " + ys.String() + ")"
	}
	if nr == 2 {
		dim := daysIn(r.year, m, pt.cal)
		last := r.d2
		if last == 0 {
			last = dim
		}
		first := dayIn(r.year, m, r.d1, pt.cal)
		*pt = fixedPoint(pt.cal, label+": "+itoa(r.d1)+"–"+itoa(last)+" "+monthNames[m-1]+" "+FormatYear(r.year),
			first, dayIn(r.year, m, last, pt.cal), PrecisionMonth)
		p.note(monthNames[m-1] + " " + FormatYear(written) + " straddles the year start (" + ys.String() +
			"): its days lie in two years as numbered from 1 January, read as one of the two runs")
		return nil
	}
	pt.span()
	pt.x = &pointExtra{cal: pt.cal, label: label}
	if ambiguous {
		day := ""
		if d != 0 {
			day = itoa(d) + " "
		}
		p.note(day + monthNames[m-1] + " " + FormatYear(written) + " (Old Style) is ambiguous: the year is " + FormatYear(written) +
			" if it began on 1 January, " + FormatYear(written+1) + " if it began on 25 March (England before 1752); read as one of the two. Write " +
			day + monthNames[m-1] + " " + FormatYear(written) + "/" + twoDigits(int((written+1)%100)) + " or give the year start")
	}
	return nil
}

// shiftYear is how far the year written in style ys for day d of month m
// is from the year numbered from 1 January.
func shiftYear(ys YearStart, m, d int) int64 {
	switch ys {
	case YearStartLadyDay:
		if m < 3 || m == 3 && d < 25 {
			return 1
		}
	case YearStartMarch:
		if m < 3 {
			return 1
		}
	case YearStartChristmas:
		if m == 12 && d >= 25 {
			return -1
		}
	}
	return 0
}

// dualAt reports whether the "/" at slash is that of a dual year: after a
// month name ("10 February 1712/13", "Feb. 1699/1700"), or alone before
// 1753 ("1712/13", "1712/3"; later such text is an error of EDTF, most
// likely a range written short), with the next year after it.
func (p *parser) dualAt(lo, hi, slash int) bool {
	s := p.in
	a := slash
	for a > lo && isDigit(s[a-1]) {
		a--
	}
	b := slash + 1
	for b < hi && isDigit(s[b]) {
		b++
	}
	if slash-a != 4 || (a > lo && !isSpace(s[a-1])) {
		return false
	}
	for k := b; k < hi; k++ {
		if c := s[k]; c != '?' && c != '~' && c != '%' && !isSpace(c) {
			return false
		}
	}
	n := b - slash - 1
	if n == 0 || n == 3 || n > 4 {
		return false
	}
	var y, v, mod int64 = 0, 0, 1
	for k := a; k < slash; k++ {
		y = y*10 + int64(s[k]-'0')
	}
	for k := slash + 1; k < b; k++ {
		v = v*10 + int64(s[k]-'0')
		mod *= 10
	}
	if a == lo {
		return n < 4 && y < 1753 && v == (y+1)%mod
	}
	// after a month name: a wrong second year is an error of the dual year
	for i := lo; i < a; {
		for i < a && (isSpace(s[i]) || s[i] == ',') {
			i++
		}
		j := i
		for j < a && !isSpace(s[j]) && s[j] != ',' {
			j++
		}
		if j > i && monthByName(s[i:j]) > 0 {
			return true
		}
		i = j
	}
	return false
}
