package date

// Reading era dates and lunisolar months as runs of days.

// japaneseGregorian is the first day of the Gregorian calendar in Japan
// (Meiji 6, 1 January 1873, the day after Meiji 5/12/2).
var japaneseGregorian = Gregorian(1873, 1, 1)

var monthOrdinals = [...]string{"", "1st", "2nd", "3rd", "4th", "5th", "6th", "7th", "8th", "9th", "10th", "11th", "12th", "13th"}

func ordinalText(n int) string {
	if n > 0 && n < len(monthOrdinals) {
		return monthOrdinals[n]
	}
	suf := "th"
	switch {
	case n%100 >= 11 && n%100 <= 13:
	case n%10 == 1:
		suf = "st"
	case n%10 == 2:
		suf = "nd"
	case n%10 == 3:
		suf = "rd"
	}
	return itoa(n) + suf
}

// lunarMonthText is "7th month" or "intercalary 5th month".
func lunarMonthText(m int, leap bool) string {
	if leap {
		return "intercalary " + ordinalText(m) + " month"
	}
	return ordinalText(m) + " month"
}

// lsRead reads month m (leap) and day d (0: none, -1: the last) of
// lunisolar year y of calendar cal, or the whole year when m is 0. It
// returns the union of the days under every reading of the calendar's
// uncertainty and whether that union is wider than the nominal reading.
func (p *parser) lsRead(c *lsCalc, y int64, m int, leap bool, d int, what string, pos int) (Day, Day, bool, error) {
	if m == 0 {
		sp := c.wholeYear(y)
		return sp.first, sp.last, sp.first != sp.nFirst || sp.last != sp.nLast, nil
	}
	if m == 13 {
		// the 13th month in order: the last month of a year with a leap month
		if c.leapMonthOf(y) == 0 {
			return 0, 0, false, p.failHint(pos, what+" has no intercalary month: its year has 12 months",
				"write the 12th month, or check the year")
		}
		// the months after the leap month are shifted: the 13th is the 12th
		m, leap = 12, c.leapMonthOf(y) == 12
	}
	if m < 1 || m > 12 {
		return 0, 0, false, p.fail(pos, "a month of the lunisolar year is 1 to 12 (and an intercalary month)")
	}
	sp := c.month(y, m, leap)
	if !sp.found {
		lm := c.leapMonthOf(y)
		hint := what + " has no intercalary month"
		if lm != 0 {
			hint = "its intercalary month is the " + ordinalText(lm)
		}
		return 0, 0, false, p.failHint(pos, what+" has no "+lunarMonthText(m, leap), hint)
	}
	if !sp.nominal {
		p.note(what + ": the " + lunarMonthText(m, leap) + " exists only under some readings of how the calendar of the time was computed; read as its days under those")
	}
	if d == 0 {
		return sp.first, sp.last, sp.first != sp.nFirst || sp.last != sp.nLast, nil
	}
	if d == -1 {
		return sp.earlyLast, sp.last, sp.earlyLast != sp.last, nil
	}
	if d < 1 || d > 30 || d > int(sp.nLast-sp.nFirst+1) && d > int(sp.last-sp.lateFirst+1) && d > int(sp.earlyLast-sp.first+1) {
		return 0, 0, false, p.fail(pos, "day "+itoa(d)+": the "+lunarMonthText(m, leap)+" of "+what+" had "+itoa(int(sp.nLast-sp.nFirst+1))+" days")
	}
	a, b := sp.first+Day(d-1), sp.lateFirst+Day(d-1)
	return a, b, a != b, nil
}

// readEra turns an era date into a point.
func (p *parser) readEra(d eraDate, refs []eraRef, lo int) (member, error) {
	if len(refs) > 1 {
		var keep []eraRef
		for _, r := range refs {
			if r.cal == p.cal {
				keep = append(keep, r)
			}
		}
		if len(keep) > 0 {
			refs = keep
		}
	}
	ref := refs[0]
	if len(refs) > 1 {
		ref = refs[p.choose(len(refs))]
		names := ""
		for i, r := range refs {
			if i > 0 {
				names += " or "
			}
			names += r.e.name + " (" + r.cal.String() + ", " + r.span() + ")"
		}
		p.note(p.in[lo:lo+min(len(p.in)-lo, 64)] + " names " + names + "; read as one of them (a case's calendar setting chooses)")
	}
	e := ref.e
	cal := ref.cal
	lastY := ref.lastYear()
	if d.year < 0 || lastY != 0 && d.year > lastY {
		return member{}, p.failHint(d.pos, e.name+" has years 1 to "+itoa(lastY)+" ("+ref.span()+"): year "+itoa(d.year)+" is past its end",
			"check the era name and the year; "+e.name+" "+itoa(lastY)+" is "+itoa(int(e.start)+lastY-1))
	}
	if d.year == 0 {
		return p.wholeEra(ref, lo)
	}
	y := e.start + int64(d.year) - 1
	what := e.name + " " + itoa(d.year)
	if e.reign {
		// the year of accession as the first year, or the next
		if p.choose(2) == 1 {
			y++
		}
		p.note(what + ": a Joseon reign year is counted from the year after the accession in the annals and from the accession year in other records; read as one of the two years (" +
			itoa(int(e.start)+d.year-1) + " or " + itoa(int(e.start)+d.year) + "), on the Korean lunisolar calendar")
	}
	label := what
	if d.month != 0 {
		label += ", " + lunarMonthText(d.month, d.leap)
	}
	if d.day == -1 {
		label += ", last day"
	} else if d.day != 0 {
		label += ", " + ordinalText(d.day) + " day"
	}
	label += " (" + e.kanji + ")"
	if e.reign {
		label += ", the lunisolar year " + itoa(int(y))
	}
	if e.note != "" {
		p.note(e.name + ": " + e.note)
	}
	prec := PrecisionYear
	switch {
	case d.day != 0:
		prec = PrecisionDay
	case d.month != 0:
		prec = PrecisionMonth
	}
	var first, last Day
	switch {
	case cal == CalendarKorean && (!e.reign || y >= 1896) || cal == CalendarJapanese && y >= 1873:
		if d.leap {
			return member{}, p.fail(d.pos, what+" is on the Gregorian calendar: it has no intercalary month")
		}
		f, l, err := p.gregorianPart(y, d.month, d.day, d.pos)
		if err != nil {
			return member{}, err
		}
		first, last = f, l
		if cal == CalendarKorean && d.year == 1 && d.month == 0 {
			p.note(what + ": the year the era was proclaimed is read whole")
		}
		if e.from[0] != 0 {
			from := Gregorian(int64(e.from[0]), e.from[1], e.from[2])
			if last < from {
				return member{}, p.failHint(d.pos, e.name+" began on "+from.ISO()+": "+label+" is before it", "check the era and the year")
			}
			first = max(first, from)
		}
		if ref.next != nil && ref.next.from[0] != 0 {
			end := Gregorian(int64(ref.next.from[0]), ref.next.from[1], ref.next.from[2])
			if first >= end {
				return member{}, p.failHint(d.pos, e.name+" ended when "+ref.next.name+" began on "+end.ISO()+": "+label+" is after it", "check the era and the year")
			}
			last = min(last, end-1)
		}
		pt := fixedPoint(cal, label, first, last, prec)
		return member{start: pt, end: pt}, nil
	}
	c := newLSCalc(cal)
	switch cal {
	case CalendarJapanese:
		p.note("Japanese months before 1873 are lunisolar: computed here for the meridian of Kyoto; " + lsProfileOf(cal, y).why)
	case CalendarKorean:
		p.note("Korean months before 1896 are lunisolar: computed here for the meridian of Seoul; " + lsProfileOf(cal, y).why)
	default:
		p.note("Chinese months are lunisolar: computed here for the meridian of Beijing; " + lsProfileOf(cal, y).why)
	}
	f, l, widened, err := p.lsRead(c, y, d.month, d.leap, d.day, what, d.pos)
	if err != nil {
		return member{}, err
	}
	if cal == CalendarJapanese {
		// Meiji 5 ended on its 12th month, 2nd day: 31 December 1872
		if f >= japaneseGregorian {
			return member{}, p.failHint(d.pos, label+" is after the lunisolar calendar ended on Meiji 5, 12th month, 2nd day (31 December 1872)",
				"from then on Japan used the Gregorian calendar: 1 January 1873 is Meiji 6.1.1")
		}
		l = min(l, japaneseGregorian-1)
		if e.from[0] == 0 && (d.year == 1 || d.year == lastY) {
			p.note(what + ": an era's first and last years are read as whole lunisolar years (later records name the whole year of a change by either era)")
		}
	}
	if widened {
		p.note(label + " is widened where the historical calendar's own computation may have differed from this one")
	}
	pt := fixedPoint(cal, label, f, l, prec)
	return member{start: pt, end: pt}, nil
}

// gregorianPart is the days of year y, of its month m, or of day d.
func (p *parser) gregorianPart(y int64, m, d, pos int) (Day, Day, error) {
	switch {
	case m == 0:
		return Gregorian(y, 1, 1), Gregorian(y, 12, 31), nil
	case m > 12:
		return 0, 0, p.fail(pos, "month "+itoa(m)+": months are 1 to 12")
	case d == 0:
		return Gregorian(y, m, 1), Gregorian(y, m, DaysInMonth(y, m)), nil
	case d == -1:
		l := Gregorian(y, m, DaysInMonth(y, m))
		return l, l, nil
	case d > DaysInMonth(y, m):
		return 0, 0, p.fail(pos, "day "+itoa(d)+": "+monthNames[m-1]+" "+FormatYear(y)+" has "+itoa(DaysInMonth(y, m))+" days")
	}
	g := Gregorian(y, m, d)
	return g, g, nil
}

// wholeEra reads an era alone: from the first day of its year 1 to the
// last day of its last year (open for the current era).
func (p *parser) wholeEra(ref eraRef, lo int) (member, error) {
	e := ref.e
	label := e.name + " (" + e.kanji + ", " + ref.span() + ")"
	var first, last Day
	y1 := e.start
	switch {
	case e.from[0] != 0:
		first = Gregorian(int64(e.from[0]), e.from[1], e.from[2])
	case ref.cal == CalendarKorean:
		first = Gregorian(y1, 1, 1)
	default:
		first = newLSCalc(ref.cal).wholeYear(y1).first
	}
	l := ref.lastYear()
	p.note(label + ": the whole " + map[bool]string{true: "reign", false: "era"}[ref.cal == CalendarChinese] + ", from its first year to its last")
	if l == 0 {
		pt := fixedPoint(ref.cal, label, first, first, PrecisionYear)
		return member{start: pt, kind: ranged | openEnd | friendly}, nil
	}
	yl := e.start + int64(l) - 1
	switch {
	case ref.next != nil && ref.next.from[0] != 0:
		last = Gregorian(int64(ref.next.from[0]), ref.next.from[1], ref.next.from[2]) - 1
	case ref.cal == CalendarKorean || ref.cal == CalendarJapanese && yl >= 1873:
		last = Gregorian(yl, 12, 31)
	default:
		last = newLSCalc(ref.cal).wholeYear(yl).last
		if ref.cal == CalendarJapanese {
			last = min(last, japaneseGregorian-1)
		}
	}
	pt := fixedPoint(ref.cal, label, first, last, PrecisionDecade)
	return member{start: pt, end: pt}, nil
}
