package date

import "strings"

// core reads an EDTF date from s[i:hi] (years, months or seasons, days,
// X digits, a time of day; no qualifiers) and returns where it stopped.
func (p *parser) core(i, hi int, pt *point) (int, error) {
	s := p.in
	if s[i] == 'Y' {
		return p.longYear(i, hi, pt)
	}
	neg := false
	if s[i] == '-' {
		neg = true
		i++
	}
	if isScattered(s[i:hi]) {
		return p.scatteredCore(i, hi, neg, pt)
	}
	j := i
	i = digitsOrX(s, i, hi)
	n := i - j
	if n > 4 {
		return i, p.failHint(j, "a year of more than four digits takes the Y prefix",
			"write Y"+s[j:i]+" for the year, or 1874-05-21 (with hyphens) for a day")
	}
	if n < 4 {
		if n == 0 {
			return i, p.failHint(j, "expected a year of four digits", "write 1874, 0079, -1199 (1200 BCE), 187X or c. 1870")
		}
		if j >= 5 && s[j-1] == '/' && allDigits(s[j-5:j-1]) {
			return i, p.failHint(j, "expected a year of four digits after the \"/\"",
				"write the second year in full: "+s[j-5:j]+s[j-5:j-1-n]+s[j:i])
		}
		return i, p.failHint(j, "expected a year of four digits",
			"EDTF years have four digits: write "+strings.Repeat("0", 4-n)+s[j:i]+" or "+s[j:i]+" CE (and 1200 BCE for years before the era)")
	}
	seenX := false
	var v int64
	for k := j; k < i; k++ {
		c := s[k]
		if c == 'X' {
			if n > 4 {
				return k, p.fail(k, "unspecified digits (X) are read in four-digit years only")
			}
			seenX = true
			pt.yx++
			v *= 10
			continue
		}
		if seenX {
			return k, p.xRun(k)
		}
		if k-j >= 12 {
			return k, p.fail(j, "year out of range: this package reads years up to 999999999999")
		}
		v = v*10 + int64(c-'0')
	}
	if neg {
		v = -v
	}
	pt.year, pt.neg = v, neg && pt.yx > 0
	if i < hi && s[i] == 'S' {
		if seenX {
			return i, p.fail(i, "a year with unspecified digits (X) has no significant digits")
		}
		return p.significant(i, hi, pt)
	}
	// Month or season.
	if i < hi && s[i] == '-' {
		j = i + 1
		i = digitsOrX(s, j, hi)
		if i-j != 2 {
			return i, p.failHint(j, "expected a month of two digits (01–12) or a season (21–24)", "write 1874-05")
		}
		if n > 4 {
			return j, p.failHint(j, "a year of more than four digits has no month here", "write the long year alone: Y12000")
		}
		m, mx, at, err := p.xField(j, seenX, '1', "month", "months are 01–12; unspecified months are 0X, 1X or XX")
		if err != nil {
			return at, err
		}
		if mx == 0 && (m == 0 || (m > 12 && m < 21) || m > 41) {
			e := p.fail(j, "month "+s[j:j+2]+": months are 01–12, seasons 21–24 (and 25–41, ISO 8601-2 divisions of the year)")
			if n == 4 && !neg && i == hi && int64(m) > v%100 {
				// 1870-75: most likely a range of years written short.
				e.hint = "for a range of years write " + s[j-5:j-1] + "/" + s[j-5:j-3] + s[j:j+2]
			}
			return j, e
		}
		pt.month, pt.mx = m, mx
		seenX = seenX || pt.mx > 0
		// Day.
		if i < hi && s[i] == '-' {
			j = i + 1
			i = digitsOrX(s, j, hi)
			if i-j != 2 {
				return i, p.failHint(j, "expected a day of two digits (01–31)", "write 1874-05-21")
			}
			if pt.month > 12 {
				return j, p.fail(j, "a season has no days")
			}
			d, dx, at, err := p.xField(j, seenX, '3', "day", "days are 01–31; unspecified days are 0X, 1X, 2X, 3X or XX")
			if err != nil {
				return at, err
			}
			pt.day, pt.dx = d, dx
			if err := p.checkDay(j, pt); err != nil {
				return j, err
			}
			if i < hi && s[i] == 'T' {
				if pt.dx > 0 {
					return i, p.fail(i, "a time of day needs a whole date")
				}
				t := i
				var err error
				if i, err = p.clock(i, hi); err != nil {
					return i, err
				}
				pt.time = s[t:i]
			}
		}
	}
	pt.span()
	return i, nil
}

// digitsOrX is where the run of digits and X that starts at s[i] ends
// (at hi at the latest).
func digitsOrX(s string, i, hi int) int {
	for i < hi && (isDigit(s[i]) || s[i] == 'X') {
		i++
	}
	return i
}

// xField reads the two characters at j of a month or a day, which may end
// in unspecified digits: "XX" gives x = 2, "1X" the value 10 with x = 1,
// "12" the value 12 (unchecked) with x = 0. A field with one X has tens of
// at most maxTens, or the error names the field (what) and its rule. X
// digits run to the end of the date: after an earlier X (seenX) only "XX"
// may follow, and a digit never follows an X. On an error, at is where it
// lies.
func (p *parser) xField(j int, seenX bool, maxTens byte, what, rule string) (v, x uint8, at int, err *ParseError) {
	s := p.in
	c0, c1 := s[j], s[j+1]
	switch {
	case c0 == 'X' && c1 == 'X':
		return 0, 2, j, nil
	case c0 == 'X':
		return 0, 0, j + 1, p.xRun(j + 1)
	case seenX:
		return 0, 0, j, p.xRun(j)
	case c1 == 'X':
		if c0 > maxTens {
			return 0, 0, j, p.fail(j, what+" "+s[j:j+2]+": "+rule)
		}
		return (c0 - '0') * 10, 1, j, nil
	}
	return (c0-'0')*10 + c1 - '0', 0, j, nil
}

func (p *parser) xRun(k int) *ParseError {
	return p.failHint(k, "unspecified digits (X) must run to the end of the date, so that the date is one run of days",
		"write 1985-04-XX, 1985-XX-XX, 198X or 19XX; a set such as [1985-01-12,1985-02-12] names scattered days")
}

// checkDay checks that the day (or the run of unspecified days) exists in
// the month, in the point's calendar.
func (p *parser) checkDay(pos int, pt *point) error {
	if pt.mx > 0 {
		return nil // XX day with an unspecified month: always some days
	}
	dim := daysIn(pt.year, int(pt.month), pt.cal)
	switch {
	case pt.dx == 0 && (pt.day == 0 || int(pt.day) > dim):
		return p.fail(pos, "day "+twoDigits(int(pt.day))+": "+monthNames[pt.month-1]+" "+FormatYear(pt.year)+
			" has "+itoa(dim)+" days"+calNote(pt.cal))
	case pt.dx == 1 && int(pt.day) > dim:
		return p.fail(pos, "days "+itoa(int(pt.day))+"–"+itoa(int(pt.day)+9)+": "+monthNames[pt.month-1]+" "+FormatYear(pt.year)+
			" has "+itoa(dim)+" days"+calNote(pt.cal))
	}
	return nil
}

func calNote(c Calendar) string {
	if c == CalendarJulian {
		return " (Julian calendar)"
	}
	return ""
}

// clock reads "Thh:mm:ss" and an optional zone "Z", "±hh" or "±hh:mm".
func (p *parser) clock(i, hi int) (int, error) {
	s := p.in
	two := func(k int, max byte) bool {
		return k+2 <= hi && isDigit(s[k]) && isDigit(s[k+1]) && (s[k]-'0')*10+s[k+1]-'0' <= max
	}
	k := i + 1
	if !(two(k, 23) && k+2 < hi && s[k+2] == ':' && two(k+3, 59) && k+5 < hi && s[k+5] == ':' && two(k+6, 59)) {
		return k, p.failHint(k, "expected a time hh:mm:ss (00:00:00–23:59:59) after T", "write 1985-04-12T23:20:30")
	}
	k += 8
	if k < hi {
		switch s[k] {
		case 'Z':
			k++
		case '+', '-':
			if !two(k+1, 14) {
				return k + 1, p.fail(k+1, "expected a zone offset ±hh or ±hh:mm")
			}
			k += 3
			if k < hi && s[k] == ':' {
				if !two(k+1, 59) {
					return k + 1, p.fail(k+1, "expected the minutes of the zone offset")
				}
				k += 3
			}
		}
	}
	return k, nil
}

// longYear reads a Y-prefixed year: "Y170000002", "Y-170000002", and the
// level-2 exponential form "Y-17E7".
func (p *parser) longYear(i, hi int, pt *point) (int, error) {
	s := p.in
	i++
	neg := false
	if i < hi && s[i] == '-' {
		neg = true
		i++
	}
	j := i
	var v int64
	for i < hi && isDigit(s[i]) {
		if i-j >= 12 {
			return i, p.fail(j, "year out of range: this package reads years up to 999999999999")
		}
		v = v*10 + int64(s[i]-'0')
		i++
	}
	if i == j {
		return i, p.failHint(j, "expected the digits of a year after Y", "write Y170000002 or Y-12000")
	}
	if i < hi && s[i] == 'E' {
		i++
		k := i
		e := 0
		for i < hi && isDigit(s[i]) && i-k < 3 {
			e = e*10 + int(s[i]-'0')
			i++
		}
		if i == k {
			return i, p.fail(k, "expected the digits of an exponent after E")
		}
		for ; e > 0; e-- {
			v *= 10
			if v > maxYear {
				return i, p.fail(j, "year out of range: this package reads years up to 999999999999")
			}
		}
	}
	if neg {
		v = -v
	}
	pt.year = v
	if i < hi && s[i] == 'S' {
		return p.significant(i, hi, pt)
	}
	if i < hi && s[i] == '-' {
		return i, p.failHint(i, "a Y-prefixed year stands alone, without month or day", "write Y12000")
	}
	pt.span()
	return i, nil
}

// significant reads the level-2 significant digits "S2" after a year:
// 1950S2 is some year from 1900 to 1999, estimated to be 1950.
func (p *parser) significant(i, hi int, pt *point) (int, error) {
	s := p.in
	i++
	j := i
	n := 0
	for i < hi && isDigit(s[i]) && i-j < 2 {
		n = n*10 + int(s[i]-'0')
		i++
	}
	digits := len(appendInt(nil, max(pt.year, -pt.year)))
	switch {
	case i == j:
		return i, p.fail(i, "expected the number of significant digits after S")
	case n == 0 || n > digits:
		return j, p.fail(j, "significant digits: "+itoa(n)+" is not between 1 and the "+itoa(digits)+" digits of the year")
	}
	if i < hi && s[i] == '-' {
		return i, p.fail(i, "a year with significant digits stands alone, without month or day")
	}
	pt.sig = uint8(n)
	pt.span()
	return i, nil
}
