package date

import "strings"

var monthNames = [12]string{"January", "February", "March", "April", "May", "June",
	"July", "August", "September", "October", "November", "December"}

var divisionNames = [...]string{
	21: "spring", 22: "summer", 23: "autumn", 24: "winter",
	25: "northern spring", 26: "northern summer", 27: "northern autumn", 28: "northern winter",
	29: "southern spring", 30: "southern summer", 31: "southern autumn", 32: "southern winter",
	33: "first quarter", 34: "second quarter", 35: "third quarter", 36: "fourth quarter",
	37: "first third", 38: "second third", 39: "last third",
	40: "first half", 41: "second half",
}

// JulianDaysInMonth returns the number of days of month m of year y of the
// Julian calendar, where every fourth year (astronomical numbering) is a
// leap year.
func JulianDaysInMonth(y int64, m int) int {
	if m == 2 {
		if y%4 == 0 {
			return 29
		}
		return 28
	}
	return DaysInMonth(1, m)
}

func itoa(v int) string { return string(appendInt(nil, int64(v))) }

func twoDigits(v int) string { return string([]byte{byte('0' + v/10%10), byte('0' + v%10)}) }

func appendInt(b []byte, v int64) []byte {
	if v < 0 {
		b = append(b, '-')
		v = -v
	}
	var tmp [20]byte
	i := len(tmp)
	for {
		i--
		tmp[i] = byte('0' + v%10)
		v /= 10
		if v == 0 {
			break
		}
	}
	return append(b, tmp[i:]...)
}

func append2(b []byte, v int) []byte { return append(b, byte('0'+v/10%10), byte('0'+v%10)) }

// appendYear writes an EDTF year: four digits with a sign before years
// below 0, X for unspecified digits, and the Y prefix for years of more
// than four digits.
func appendYear(b []byte, y int64, yx uint8) []byte { return appendYearSign(b, y, yx, false) }

// appendYearSign is appendYear with a minus sign also before a year of 0
// (-00XX, the years -99 to 0).
func appendYearSign(b []byte, y int64, yx uint8, neg bool) []byte {
	a := y
	if a < 0 {
		a = -a
	}
	if a > 9999 {
		b = append(b, 'Y')
		return appendInt(b, y)
	}
	if y < 0 || neg {
		b = append(b, '-')
	}
	digits := [4]byte{byte('0' + a/1000), byte('0' + a/100%10), byte('0' + a/10%10), byte('0' + a%10)}
	for k := 0; k < int(yx) && k < 4; k++ {
		digits[3-k] = 'X'
	}
	return append(b, digits[:]...)
}

func appendQual(b []byte, approx, uncert bool) []byte {
	switch {
	case approx && uncert:
		return append(b, '%')
	case approx:
		return append(b, '~')
	case uncert:
		return append(b, '?')
	}
	return b
}

func appendDay(b []byte, d Day) []byte {
	y, m, dd := d.Civil()
	b = appendYear(b, y, 0)
	b = append(b, '-')
	b = append2(b, m)
	b = append(b, '-')
	return append2(b, dd)
}

const (
	roleSingle = iota
	roleStart
	roleEnd
)

// appendPoint writes pt in EDTF. A Julian date is written as the Gregorian
// day or days it names: one day, or first and last joined by sep.
func appendPoint(b []byte, pt point, role int, sep string) []byte {
	if pt.cal == CalendarJulian || pt.isFixed() {
		switch {
		case role == roleStart || (role == roleSingle && pt.first == pt.last):
			b = appendDay(b, pt.first)
			b = append(b, pt.time...)
		case role == roleEnd:
			b = appendDay(b, pt.last)
		default:
			b = appendDay(b, pt.first)
			b = appendQual(b, pt.approx, pt.uncert)
			b = append(b, sep...)
			b = appendDay(b, pt.last)
		}
		return appendQual(b, pt.approx, pt.uncert)
	}
	if pt.scattered {
		return appendScattered(b, pt)
	}
	if pt.partial {
		return appendPartial(b, pt)
	}
	b = appendPlain(b, pt)
	return appendQual(b, pt.approx, pt.uncert)
}

// appendPlain writes a Gregorian point without its qualifiers.
func appendPlain(b []byte, pt point) []byte {
	b = appendYearSign(b, pt.year, pt.yx, pt.neg)
	if pt.sig > 0 {
		b = append(b, 'S')
		b = appendInt(b, int64(pt.sig))
	}
	if pt.month != 0 || pt.mx != 0 {
		b = appendXField(append(b, '-'), pt.month, pt.mx)
		if pt.day != 0 || pt.dx != 0 {
			b = appendXField(append(b, '-'), pt.day, pt.dx)
		}
	}
	return append(b, pt.time...)
}

// appendXField writes a month or a day with x unspecified trailing digits
// (0, 1 or 2), as the parser's xField reads it: "05", "1X", "XX".
func appendXField(b []byte, v, x uint8) []byte {
	switch x {
	case 2:
		return append(b, 'X', 'X')
	case 1:
		return append(b, '0'+v/10, 'X')
	}
	return append2(b, int(v))
}

func appendMember(b []byte, m member, inSet bool) []byte {
	if m.kind&ranged == 0 {
		sep := "/"
		if inSet {
			sep = ".."
		}
		return appendPoint(b, m.start, roleSingle, sep)
	}
	if inSet {
		if m.kind&openStart == 0 {
			b = appendPoint(b, m.start, roleStart, "")
		}
		b = append(b, ".."...)
		if m.kind&openEnd == 0 {
			b = appendPoint(b, m.end, roleEnd, "")
		}
		return b
	}
	switch {
	case m.kind&openStart != 0:
		b = append(b, ".."...)
	case m.kind&unknownStart != 0:
	default:
		b = appendPoint(b, m.start, roleStart, "")
	}
	b = append(b, '/')
	switch {
	case m.kind&openEnd != 0:
		b = append(b, ".."...)
	case m.kind&unknownEnd != 0:
	default:
		b = appendPoint(b, m.end, roleEnd, "")
	}
	return b
}

// canonical writes the EDTF form of the members, reusing the input text
// when it is already canonical.
func (p *parser) canonical(ms []member, oneOf bool) string {
	var buf [64]byte
	b := buf[:0]
	if oneOf {
		b = append(b, '[')
		for i, m := range ms {
			if i > 0 {
				b = append(b, setSep...)
			}
			b = appendMember(b, m, true)
		}
		b = append(b, ']')
	} else {
		b = appendMember(b, ms[0], false)
	}
	lo, hi := p.trim(0, len(p.in))
	if string(b) == p.in[lo:hi] {
		return p.in[lo:hi]
	}
	return string(b)
}

// setSep separates the members of a set in the canonical form.
const setSep = ","

// edtfString is the EDTF of one point, for messages.
func (pt point) edtfString() string { return string(appendPoint(nil, pt, roleSingle, "/")) }

// yearPeople writes a year for people: 1874, 79 CE, 1200 BCE.
func yearPeople(b *strings.Builder, y int64) {
	b.WriteString(YearForPeople(y))
}

// YearForPeople is the one way a year is written for people in every
// report: 1874; 79 CE and 1 CE below 1000, where a bare number could be
// misread; 1200 BCE before the era (astronomical year 0 is 1 BCE).
func YearForPeople(y int64) string {
	switch {
	case y >= 1000:
		return string(appendInt(nil, y))
	case y >= 1:
		return string(appendInt(nil, y)) + " CE"
	}
	return string(appendInt(nil, 1-y)) + " BCE"
}

func (pt point) people(b *strings.Builder) {
	if pt.approx && !pt.partial {
		b.WriteString("c. ")
	}
	if pt.x != nil && pt.x.label != "" {
		b.WriteString(pt.x.label)
		if pt.uncert {
			b.WriteByte('?')
		}
		return
	}
	if pt.partial {
		plain := pt
		plain.partial, plain.approx, plain.uncert = false, false, false
		plain.people(b)
		b.WriteString(" (")
		names := [3]string{"year", "month", "day"}
		for i, first := 0, true; i < pt.parts(); i++ {
			if pt.q[i] == 0 {
				continue
			}
			if !first {
				b.WriteString(", ")
			}
			first = false
			b.WriteString(names[i])
			switch pt.q[i] {
			case qApprox:
				b.WriteString(" approximate")
			case qUncert:
				b.WriteString(" uncertain")
			default:
				b.WriteString(" approximate and uncertain")
			}
		}
		b.WriteByte(')')
		return
	}
	if pt.scattered {
		q := pt
		q.approx, q.uncert = false, false
		b.WriteString("any day written ")
		b.Write(appendScattered(nil, q))
		if pt.uncert {
			b.WriteByte('?')
		}
		return
	}
	if pt.yx > 0 || pt.sig > 0 {
		switch {
		// A decade reads as "1870s"; a century is written out ("1700 to
		// 1799"), as is the first decade of one, since "1700s" is read as
		// the century.
		case pt.year >= 1000 && pt.yx == 1 && pt.year%100 != 0:
			b.Write(appendInt(nil, pt.year))
			b.WriteByte('s')
		case pt.year >= 100 && !pt.neg && pt.yx == 1 && pt.year%100 != 0:
			b.Write(appendInt(nil, pt.year))
			b.WriteString("s CE")
		default:
			lo, _, _ := civilIn(pt.first, pt.cal)
			hi, _, _ := civilIn(pt.last, pt.cal)
			spanPeople(b, YearForPeople(lo), YearForPeople(hi))
			if pt.sig > 0 {
				b.WriteString(" (estimated ")
				yearPeople(b, pt.year)
				b.WriteByte(')')
			}
		}
	} else {
		switch {
		case pt.month > 12:
			b.WriteString(divisionNames[pt.month])
			b.WriteByte(' ')
		case pt.mx == 1 && pt.month == 0:
			b.WriteString("January to September ")
		case pt.mx == 1:
			b.WriteString("October to December ")
		case pt.month != 0 && pt.mx == 0:
			switch pt.dx {
			case 0:
				if pt.day != 0 {
					b.Write(appendInt(nil, int64(pt.day)))
					b.WriteByte(' ')
				}
			case 1:
				_, _, dlo := civilIn(pt.first, pt.cal)
				_, _, dhi := civilIn(pt.last, pt.cal)
				b.Write(appendInt(nil, int64(dlo)))
				b.WriteString(" to ")
				b.Write(appendInt(nil, int64(dhi)))
				b.WriteByte(' ')
			}
			b.WriteString(monthNames[pt.month-1])
			b.WriteByte(' ')
		}
		yearPeople(b, pt.year)
	}
	if pt.time != "" {
		b.WriteByte(' ')
		b.WriteString(pt.time[1:])
	}
	if pt.cal == CalendarJulian {
		b.WriteString(" (Julian)")
	}
	if pt.uncert {
		b.WriteByte('?')
	}
}

func (m member) people(b *strings.Builder, inSet bool) {
	if m.kind&ranged == 0 {
		m.start.people(b)
		return
	}
	if m.kind&friendly != 0 && m.start.x != nil && m.start.x.whole != "" {
		if m.start.approx {
			b.WriteString("c. ")
		}
		b.WriteString(m.start.x.whole)
		if m.start.uncert {
			b.WriteByte('?')
		}
		return
	}
	switch {
	case m.kind&openStart != 0:
		var end strings.Builder
		m.end.people(&end)
		b.WriteString("up to ")
		if strings.Contains(end.String(), " to ") {
			b.WriteString("the years ") // up to the years 800 to 899 CE
		}
		b.WriteString(end.String())
	case m.kind&unknownStart != 0:
		b.WriteString("from an unknown date to ")
		m.end.people(b)
	case m.kind&openEnd != 0:
		m.start.people(b)
		b.WriteString(" or later")
	case m.kind&unknownEnd != 0:
		m.start.people(b)
		b.WriteString(" to an unknown date")
	default:
		var start, end strings.Builder
		m.start.people(&start)
		m.end.people(&end)
		spanPeople(b, start.String(), end.String())
	}
}

// spanPeople writes "a to z", naming an era both ends share once, at the
// end: "800 to 899 CE", "3300 to 3101 BCE", but "1200 BCE to 50 CE".
func spanPeople(b *strings.Builder, a, z string) {
	for _, era := range []string{" BCE", " CE"} {
		if strings.HasSuffix(a, era) && strings.HasSuffix(z, era) {
			a = strings.TrimSuffix(a, era)
			break
		}
	}
	b.WriteString(a)
	b.WriteString(" to ")
	b.WriteString(z)
}

// appendScattered writes a point with scattered X digits.
func appendScattered(b []byte, pt point) []byte {
	if pt.year < 0 || pt.neg {
		b = append(b, '-')
	}
	a := max(pt.year, -pt.year)
	for k := 3; k >= 0; k-- {
		w := int64(1)
		for range k {
			w *= 10
		}
		if pt.ym&(1<<k) != 0 {
			b = append(b, 'X')
		} else {
			b = append(b, byte('0'+a/w%10))
		}
	}
	two := func(val, mask uint8) {
		b = append(b, '-')
		for k, c := range [2]byte{'0' + val/10, '0' + val%10} {
			if mask&(2>>k) != 0 {
				c = 'X'
			}
			b = append(b, c)
		}
	}
	if pt.month != 0 || pt.mm != 0 {
		two(pt.month, pt.mm)
		if pt.day != 0 || pt.dm != 0 {
			two(pt.day, pt.dm)
		}
	}
	return appendQual(b, pt.approx, pt.uncert)
}

func qualChar(q uint8) byte {
	switch q {
	case qApprox:
		return '~'
	case qUncert:
		return '?'
	}
	return '%'
}

// appendPartial writes a date with qualifiers on its parts: one qualifier
// at the end when every part has the same; a qualifier after the last of
// the leading parts that share one, when the rest have none (2004-06~-11);
// else one before each qualified part (?2004-06-~11).
func appendPartial(b []byte, pt point) []byte {
	n := pt.parts()
	q := pt.q
	var tbuf [32]byte
	text := appendPlain(tbuf[:0], pt)
	// the parts of the plain text: year, month, day
	var cuts [3]int // where each part ends in text
	k := 0
	if text[0] == '-' {
		k = 1
	}
	for part := 0; part < n; part++ {
		for k < len(text) && text[k] != '-' {
			k++
		}
		cuts[part] = k
		k++
	}
	same := true
	for i := 1; i < n; i++ {
		same = same && q[i] == q[0]
	}
	if same {
		b = append(b, text...)
		return appendQual(b, q[0]&qApprox != 0, q[0]&qUncert != 0)
	}
	last := 0 // the leading parts q[0..last] share q[0], the rest have none
	for last+1 < n && q[last+1] == q[0] {
		last++
	}
	prefix := q[0] != 0
	for i := last + 1; i < n; i++ {
		prefix = prefix && q[i] == 0
	}
	if prefix {
		b = append(b, text[:cuts[last]]...)
		b = append(b, qualChar(q[0]))
		return append(b, text[cuts[last]:]...)
	}
	start := 0
	for part := 0; part < n; part++ {
		if part > 0 {
			b = append(b, '-')
			start = cuts[part-1] + 1
		}
		if q[part] != 0 {
			b = append(b, qualChar(q[part]))
		}
		b = append(b, text[start:cuts[part]]...)
	}
	return b
}
