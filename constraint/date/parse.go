package date

import (
	"errors"
	"slices"
	"strings"
)

// maxInput is the longest text Parse reads; longer input is an error, so
// that a date can never make the parser do unbounded work.
const maxInput = 1024

// maxYear bounds the absolute value of a year. Day numbers of such years
// stay far inside int64, also after widening.
const maxYear = 999_999_999_999

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
}

// member is one element of a date: a single point, or a run from start to
// end (an interval, a set range, a friendly "early 1870s").
type member struct {
	start, end point
	kind       uint8
}

const (
	ranged       = 1 << iota // start..end rather than one point
	openStart                // ".." start: unbounded
	openEnd                  // ".." end: unbounded
	unknownStart             // empty start: unknown, read as unbounded
	unknownEnd               // empty end: unknown, read as unbounded
	friendly                 // a friendly form that EDTF writes as an interval
)

func (m member) interval() Interval {
	var iv Interval
	if m.kind&(openStart|unknownStart) != 0 {
		iv.OpenStart = true
	} else {
		iv.First = m.start.first
	}
	if m.kind&(openEnd|unknownEnd) != 0 {
		iv.OpenEnd = true
	} else {
		iv.Last = m.end.last
	}
	return iv
}

type parser struct {
	in   string
	cal  Calendar
	era2 int        // an era that a bare year takes from the other end of a range
	ivs  []Interval // room for the alternatives of a single member
}

// one returns a single member in one allocation that also holds room for
// its interval, which finish then uses.
func (p *parser) one(m member) []member {
	box := &struct {
		m  [1]member
		iv [1]Interval
	}{m: [1]member{m}}
	p.ivs = box.iv[:0]
	return box.m[:]
}

func (p *parser) fail(pos int, msg string) *ParseError {
	return &ParseError{Input: p.in, Pos: pos, Msg: msg}
}

func (p *parser) failHint(pos int, msg, hint string) *ParseError {
	return &ParseError{Input: p.in, Pos: pos, Msg: msg, hint: hint}
}

// Parse reads a date written in EDTF or in one of the friendly forms (see
// the package documentation) on the proleptic Gregorian calendar, unless the
// text ends with a Julian marker. Every error is a *[ParseError].
func Parse(s string) (Date, error) { return ParseIn(s, CalendarGregorian) }

// ParseIn is [Parse] with the calendar that unmarked dates are read in. A
// marker at the end of the text ("(Julian)", "O.S.", "(Gregorian)", "N.S.")
// overrides cal.
func ParseIn(s string, cal Calendar) (Date, error) {
	p := parser{in: s, cal: cal}
	if len(s) > maxInput {
		return Date{}, p.fail(maxInput, "text too long for a date (more than 1024 bytes)")
	}
	lo, hi := p.trim(0, len(s))
	if lo == hi {
		return Date{}, p.failHint(lo, "empty date: expected EDTF such as 1874, 1874-05-21 or 1870/1879",
			"write a year (1874), a month (1874-05), a day (1874-05-21) or an interval (1870/1879)")
	}
	hi = p.calendarMarker(lo, hi)
	if lo == hi {
		return Date{}, p.fail(lo, "expected a date before the calendar marker")
	}
	ms, oneOf, err := p.top(lo, hi)
	if err != nil {
		return Date{}, err
	}
	return p.finish(ms, oneOf), nil
}

func isSpace(c byte) bool { return c == ' ' || c == '\t' || c == '\n' || c == '\r' }
func isDigit(c byte) bool { return c >= '0' && c <= '9' }

func (p *parser) trim(lo, hi int) (int, int) {
	for lo < hi && isSpace(p.in[lo]) {
		lo++
	}
	for hi > lo && isSpace(p.in[hi-1]) {
		hi--
	}
	return lo, hi
}

// hasFold reports whether s[lo:hi] begins with word, ignoring ASCII case.
func hasFold(s string, lo, hi int, word string) bool {
	return hi-lo >= len(word) && strings.EqualFold(s[lo:lo+len(word)], word)
}

// endsFold reports whether s[lo:hi] ends with word, ignoring ASCII case.
func endsFold(s string, lo, hi int, word string) bool {
	return hi-lo >= len(word) && strings.EqualFold(s[hi-len(word):hi], word)
}

var julianMarkers = []string{"(julian)", "julian", "(o.s.)", "o.s.", "(os)", "os"}
var gregorianMarkers = []string{"(gregorian)", "gregorian", "(n.s.)", "n.s.", "(ns)", "ns"}

// calendarMarker strips a trailing calendar marker, which must follow a
// space, and sets the calendar.
func (p *parser) calendarMarker(lo, hi int) int {
	for _, set := range [...]struct {
		cal   Calendar
		words []string
	}{{CalendarJulian, julianMarkers}, {CalendarGregorian, gregorianMarkers}} {
		for _, w := range set.words {
			if endsFold(p.in, lo, hi, w) && hi-len(w) > lo && isSpace(p.in[hi-len(w)-1]) {
				p.cal = set.cal
				_, h := p.trim(lo, hi-len(w))
				return h
			}
		}
	}
	return hi
}

// top reads the whole expression: a set, a friendly bound, an interval or
// a single date.
func (p *parser) top(lo, hi int) ([]member, bool, error) {
	s := p.in
	switch s[lo] {
	case '[':
		ms, err := p.set(lo, hi)
		return ms, true, err
	case '{':
		return nil, false, p.failHint(lo, "an all-of set {…} names several dates at once; a date here is one run of days",
			"for one of several dates write a one-of set: [1667,1668]")
	}
	if c := s[lo] | 0x20; c >= 'a' && c <= 'z' {
		if ms, ok, err := p.bound(lo, hi); ok {
			return ms, false, err
		}
	}
	if k := strings.IndexByte(s[lo:hi], '/'); k >= 0 {
		m, err := p.interval(lo, lo+k, hi)
		return p.one(m), false, err
	}
	if a, b, ok := p.rangeSplit(lo, hi); ok {
		m, err := p.span(lo, a, b, hi)
		return p.one(m), false, err
	}
	m, err := p.pointish(lo, hi)
	return p.one(m), false, err
}

func (p *parser) ordered(m member, pos int) error {
	if m.start.first > m.end.last {
		return p.failHint(pos, "the interval ends before it starts",
			"write the earlier date first: "+m.end.edtfString()+"/"+m.start.edtfString())
	}
	return nil
}

// interval reads an EDTF interval "A/B"; slash is the position of "/".
func (p *parser) interval(lo, slash, hi int) (member, error) {
	s := p.in
	if k := strings.IndexByte(s[slash+1:hi], '/'); k >= 0 {
		return member{}, p.fail(slash+1+k, "an interval has one \"/\"")
	}
	m := member{kind: ranged}
	a, b := p.trim(lo, slash)
	switch {
	case a == b:
		m.kind |= unknownStart
	case s[a:b] == "..":
		m.kind |= openStart
	default:
		x, err := p.pointish(a, b)
		if err != nil {
			return member{}, err
		}
		m.start = x.start
	}
	a, b = p.trim(slash+1, hi)
	switch {
	case a == b:
		m.kind |= unknownEnd
	case s[a:b] == "..":
		m.kind |= openEnd
	default:
		x, err := p.pointish(a, b)
		if err != nil {
			return member{}, err
		}
		m.end = x.end
	}
	if m.kind&(openStart|unknownStart) != 0 && m.kind&(openEnd|unknownEnd) != 0 {
		return member{}, p.failHint(slash, "an interval needs at least one date",
			"write 1850/.. (from 1850 on) or ../1900 (up to 1900)")
	}
	if m.kind&(openStart|unknownStart|openEnd|unknownEnd) == 0 {
		if err := p.ordered(m, slash); err != nil {
			return member{}, err
		}
	}
	return m, nil
}

// set reads a level-2 one-of set "[a, b, c..d, ..e, f..]".
func (p *parser) set(lo, hi int) ([]member, error) {
	s := p.in
	if s[hi-1] != ']' {
		return nil, p.fail(hi, `expected "]" to close the set`)
	}
	var ms []member
	i := lo + 1
	for {
		j := i
		for j < hi-1 && s[j] != ',' {
			j++
		}
		a, b := p.trim(i, j)
		if a == b {
			return nil, p.fail(a, "expected a date in the set")
		}
		m, err := p.setMember(a, b)
		if err != nil {
			return nil, err
		}
		ms = append(ms, m)
		if j >= hi-1 {
			break
		}
		i = j + 1
	}
	return ms, nil
}

func (p *parser) setMember(a, b int) (member, error) {
	s := p.in
	k := strings.Index(s[a:b], "..")
	if k < 0 {
		return p.pointish(a, b)
	}
	k += a
	switch {
	case k == a:
		x, err := p.pointish(k+2, b)
		if err != nil {
			return member{}, err
		}
		return member{end: x.end, kind: ranged | openStart}, nil
	case k+2 == b:
		x, err := p.pointish(a, k)
		if err != nil {
			return member{}, err
		}
		return member{start: x.start, kind: ranged | openEnd}, nil
	}
	x, err := p.pointish(a, k)
	if err != nil {
		return member{}, err
	}
	y, err := p.pointish(k+2, b)
	if err != nil {
		return member{}, err
	}
	m := member{start: x.start, end: y.end, kind: ranged}
	return m, p.ordered(m, k)
}

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
	if pt.cal == CalendarJulian {
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
	for i < hi && (isDigit(s[i]) || s[i] == 'X') {
		i++
	}
	n := i - j
	if n > 4 {
		return i, p.failHint(j, "a year of more than four digits takes the Y prefix",
			"write Y"+s[j:i]+" for the year, or 1874-05-21 (with hyphens) for a day")
	}
	if n < 4 {
		if n == 0 {
			return i, p.failHint(j, "expected a year of four digits", "write 1874, 0079, -1199 (1200 BCE), 187X or c. 1870")
		}
		return i, p.failHint(j, "expected a year of four digits",
			"EDTF years have four digits: write "+strings.Repeat("0", 4-n)+s[j:i]+" or AD "+s[j:i]+" (and 1200 BCE for years before the era)")
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
		i++
		j = i
		for i < hi && (isDigit(s[i]) || s[i] == 'X') {
			i++
		}
		if i-j != 2 {
			return i, p.failHint(j, "expected a month of two digits (01–12) or a season (21–24)", "write 1874-05")
		}
		if n > 4 {
			return j, p.failHint(j, "a year of more than four digits has no month here", "write the long year alone: Y12000")
		}
		c0, c1 := s[j], s[j+1]
		switch {
		case c0 == 'X' && c1 == 'X':
			pt.mx = 2
		case c1 == 'X':
			if seenX {
				return j, p.xRun(j)
			}
			if c0 != '0' && c0 != '1' {
				return j, p.fail(j, "month "+s[j:j+2]+": months are 01–12; unspecified months are 0X, 1X or XX")
			}
			pt.mx = 1
			pt.month = (c0 - '0') * 10
		case c0 == 'X':
			return j + 1, p.xRun(j + 1)
		default:
			if seenX {
				return j, p.xRun(j)
			}
			m := (c0-'0')*10 + c1 - '0'
			if m == 0 || (m > 12 && m < 21) || m > 41 {
				e := p.fail(j, "month "+s[j:j+2]+": months are 01–12, seasons 21–24 (and 25–41, ISO 8601-2 divisions of the year)")
				if n == 4 && !neg && i == hi && int64(m) > v%100 {
					// 1870-75: most likely a range of years written short.
					e.hint = "for a range of years write " + s[j-5:j-1] + "/" + s[j-5:j-3] + s[j:j+2]
				}
				return j, e
			}
			pt.month = m
		}
		seenX = seenX || pt.mx > 0
		// Day.
		if i < hi && s[i] == '-' {
			i++
			j = i
			for i < hi && (isDigit(s[i]) || s[i] == 'X') {
				i++
			}
			if i-j != 2 {
				return i, p.failHint(j, "expected a day of two digits (01–31)", "write 1874-05-21")
			}
			if pt.month > 12 {
				return j, p.fail(j, "a season has no days")
			}
			c0, c1 := s[j], s[j+1]
			switch {
			case c0 == 'X' && c1 == 'X':
				pt.dx = 2
			case c1 == 'X':
				if seenX {
					return j, p.xRun(j)
				}
				if c0 > '3' {
					return j, p.fail(j, "day "+s[j:j+2]+": days are 01–31; unspecified days are 0X, 1X, 2X, 3X or XX")
				}
				pt.dx = 1
				pt.day = (c0 - '0') * 10
			case c0 == 'X':
				return j + 1, p.xRun(j + 1)
			default:
				if seenX {
					return j, p.xRun(j)
				}
				pt.day = (c0-'0')*10 + c1 - '0'
			}
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

// finish builds the Date from its members.
func (p *parser) finish(ms []member, oneOf bool) Date {
	d := Date{Input: p.in, OneOf: oneOf, members: ms}
	for _, m := range ms {
		if m.kind&(openStart|unknownStart) == 0 {
			d.Approximate = d.Approximate || m.start.approx
			d.Uncertain = d.Uncertain || m.start.uncert
		}
		if m.kind&(openEnd|unknownEnd) == 0 {
			d.Approximate = d.Approximate || m.end.approx
			d.Uncertain = d.Uncertain || m.end.uncert
		}
	}
	if ms[0].kind&(openStart|unknownStart) != 0 {
		d.Precision = ms[0].end.prec
	} else {
		d.Precision = ms[0].start.prec
	}
	d.Alternatives = alternatives(ms, nil, p.ivs)
	d.edtf = p.canonical(ms, oneOf)
	return d
}

// alternatives returns the sorted, merged intervals of ms, each moved out
// by the function w when it is not nil, in room when it is large enough. A single date with scattered X
// digits gives one interval per run of days.
func alternatives(ms []member, w func(m member, iv Interval) Interval, room []Interval) []Interval {
	out := room[:0]
	if cap(out) < len(ms) {
		out = make([]Interval, 0, len(ms))
	}
	for _, m := range ms {
		if m.kind&ranged == 0 && m.start.scattered {
			m.start.eachRun(func(first, last Day) {
				iv := Interval{First: first, Last: last}
				if w != nil {
					iv = w(m, iv)
				}
				out = append(out, iv)
			})
			continue
		}
		iv := m.interval()
		if w != nil {
			iv = w(m, iv)
		}
		out = append(out, iv)
	}
	if len(out) == 1 {
		return out
	}
	slices.SortFunc(out, func(a, b Interval) int {
		switch {
		case a.OpenStart && b.OpenStart:
			return 0
		case a.OpenStart:
			return -1
		case b.OpenStart:
			return 1
		case a.First < b.First:
			return -1
		case a.First > b.First:
			return 1
		}
		return 0
	})
	k := 0
	for _, iv := range out[1:] {
		cur := &out[k]
		if cur.OpenEnd || iv.OpenStart || iv.First <= cur.Last+1 {
			if iv.OpenEnd {
				cur.OpenEnd, cur.Last = true, 0
			} else if !cur.OpenEnd && iv.Last > cur.Last {
				cur.Last = iv.Last
			}
			continue
		}
		k++
		out[k] = iv
	}
	return out[:k+1]
}

// maxRuns bounds the runs of days that scattered X digits may name.
const maxRuns = 1000

// isScattered reports whether the date at the start of s has an X digit
// followed by a specified digit: four year characters, then perhaps two
// month and two day characters after hyphens.
func isScattered(s string) bool {
	seenX, scattered := false, false
	k := 0
	for seg, width := 0, 4; seg < 3; seg, width = seg+1, 2 {
		if seg > 0 {
			if k >= len(s) || s[k] != '-' {
				break
			}
			k++
		}
		if k+width > len(s) || (k+width < len(s) && (isDigit(s[k+width]) || s[k+width] == 'X')) {
			return false
		}
		for _, c := range []byte(s[k : k+width]) {
			switch {
			case c == 'X':
				seenX = true
			case !isDigit(c):
				return false
			case seenX:
				scattered = true
			}
		}
		k += width
	}
	return scattered
}

// scatteredCore reads an EDTF level-2 date whose X digits leave scattered
// days ("156X-12-25", "1985-XX-12", "1XXX-12"): a disjunction of at most
// maxRuns runs of days.
func (p *parser) scatteredCore(i, hi int, neg bool, pt *point) (int, error) {
	s := p.in
	pos := i
	var v int64
	for k := 0; k < 4; k++ {
		pt.ym <<= 1
		v *= 10
		if c := s[i+k]; c == 'X' {
			pt.ym |= 1
		} else {
			v += int64(c - '0')
		}
	}
	i += 4
	pt.year, pt.neg, pt.scattered = v, neg, true
	if neg {
		pt.year = -v
	}
	two := func(j int) (uint8, uint8) {
		var val, mask uint8
		for k := 0; k < 2; k++ {
			mask <<= 1
			val *= 10
			if c := s[j+k]; c == 'X' {
				mask |= 1
			} else {
				val += c - '0'
			}
		}
		return val, mask
	}
	if i < hi && s[i] == '-' {
		pt.month, pt.mm = two(i + 1)
		if pt.mm != 0 && (pt.month > 12 || pt.mm == 1 && pt.month >= 20) {
			return i + 1, p.fail(i+1, "month "+s[i+1:i+3]+": a season or division of the year has no unspecified digits")
		}
		if pt.mm == 0 && (pt.month == 0 || pt.month > 12) {
			return i + 1, p.fail(i+1, "month "+s[i+1:i+3]+": months with a day are 01–12")
		}
		if len(months(pt.month, pt.mm)) == 0 {
			return i + 1, p.fail(i+1, "month "+s[i+1:i+3]+" names no month (01–12)")
		}
		i += 3
		if i < hi && s[i] == '-' {
			pt.day, pt.dm = two(i + 1)
			if pt.dm == 0 && (pt.day == 0 || pt.day > 31) || len(days(pt.day, pt.dm, 31)) == 0 {
				return i + 1, p.fail(i+1, "day "+s[i+1:i+3]+": days are 01–31")
			}
			i += 3
		}
	}
	if i < hi && s[i] == 'T' {
		return i, p.fail(i, "a time of day needs a whole date")
	}
	n := 1
	for k := 0; k < 4; k++ {
		if pt.ym&(1<<k) != 0 {
			n *= 10
		}
	}
	if pt.month != 0 || pt.mm != 0 {
		n *= len(months(pt.month, pt.mm))
		if pt.dm != 3 && (pt.day != 0 || pt.dm != 0) {
			n *= len(days(pt.day, pt.dm, 31))
		}
	}
	if n > maxRuns {
		return pos, p.failHint(pos, "these unspecified digits name "+itoa(n)+" scattered runs of days; at most 1000 are read",
			"write fewer X digits, or an interval that holds them all: 1000/1999")
	}
	pt.span()
	if pt.first > pt.last {
		return pos, p.fail(pos, "these digits name no day of the calendar")
	}
	return i, nil
}

// months lists the months 1–12 that two month digits with X digits (mask
// bit 1 the tens, bit 0 the units) can be.
func months(val, mask uint8) []uint8 { return digitsIn(val, mask, 1, 12) }

// days lists the days 1–dim that two day digits with X digits can be.
func days(val, mask uint8, dim int) []uint8 { return digitsIn(val, mask, 1, uint8(dim)) }

func digitsIn(val, mask, lo, hi uint8) []uint8 {
	var out []uint8
	for t := uint8(0); t <= 9; t++ {
		if mask&2 == 0 && t != val/10 {
			continue
		}
		for u := uint8(0); u <= 9; u++ {
			if mask&1 == 0 && u != val%10 {
				continue
			}
			if v := t*10 + u; v >= lo && v <= hi {
				out = append(out, v)
			}
		}
	}
	return out
}

// eachRun calls f, when it is not nil, with each run of days a scattered
// point names, and returns the first and last day of all of them.
func (pt *point) eachRun(f func(first, last Day)) (Day, Day) {
	var xs []int // the weights of the X digits of the year
	for k, w := 0, 1; k < 4; k, w = k+1, w*10 {
		if pt.ym&(1<<k) != 0 {
			xs = append(xs, w)
		}
	}
	base := pt.year
	if base < 0 {
		base = -base
	}
	combos := 1
	for range xs {
		combos *= 10
	}
	lo, hi := Day(1)<<62, -Day(1)<<62
	emit := func(a, b Day) {
		lo, hi = min(lo, a), max(hi, b)
		if f != nil {
			f(a, b)
		}
	}
	for c := 0; c < combos; c++ {
		y, rest := base, c
		for _, w := range xs {
			y += int64(rest%10) * int64(w)
			rest /= 10
		}
		if pt.year < 0 || pt.neg {
			y = -y
		}
		if pt.month == 0 && pt.mm == 0 {
			emit(dayIn(y, 1, 1, pt.cal), dayIn(y, 12, 31, pt.cal))
			continue
		}
		for _, m := range months(pt.month, pt.mm) {
			dim := daysIn(y, int(m), pt.cal)
			if pt.dm == 3 || (pt.day == 0 && pt.dm == 0) {
				emit(dayIn(y, int(m), 1, pt.cal), dayIn(y, int(m), dim, pt.cal))
				continue
			}
			for _, d := range days(pt.day, pt.dm, dim) {
				day := dayIn(y, int(m), int(d), pt.cal)
				emit(day, day)
			}
		}
	}
	return lo, hi
}

// runPrecision is the unit of the runs of a scattered point.
func (pt *point) runPrecision() Precision {
	switch {
	case pt.day != 0 || pt.dm == 1 || pt.dm == 2:
		if pt.dm == 1 {
			return PrecisionMonth // runs of up to ten days: 1X
		}
		return PrecisionDay
	case pt.month != 0 || pt.mm != 0:
		return PrecisionMonth
	}
	return PrecisionYear
}

// The qualifier bits of a part of a date.
const (
	qApprox = 1 << iota
	qUncert
)

func qualBits(c byte) uint8 {
	switch c {
	case '~':
		return qApprox
	case '?':
		return qUncert
	}
	return qApprox | qUncert
}

// qualifiedCore reads an EDTF level-2 date with qualifiers on its parts.
// A qualifier right after a part applies to it and to every part before it
// (2004-06~-11: year and month approximate); one right before a part
// applies to that part alone (?2004-06-~11: year uncertain, day
// approximate). The date without its qualifiers is read by core.
func (p *parser) qualifiedCore(lo, hi int, pt *point) error {
	s := p.in
	var buf [48]byte
	var at [len(buf) + 1]int // the position in s of each byte of buf, and of its end
	b := buf[:0]
	part := 0
	var left, right [3]uint8
	for k := lo; k < hi; k++ {
		c := s[k]
		if len(b) == len(buf) {
			return p.fail(k, "text too long for a date with qualified parts")
		}
		switch c {
		case '?', '~', '%':
			q := qualBits(c)
			start := len(b) == 0 || b[len(b)-1] == '-'
			next := byte(0)
			if k+1 < hi {
				next = s[k+1]
			}
			if start && left[part] == 0 && (isDigit(next) || next == 'X' || (next == '-' && len(b) == 0)) {
				left[part] = q
				continue
			}
			if !start && right[part] == 0 && (next == 0 || next == '-' || next == '?' || next == '~' || next == '%') {
				right[part] = q
				continue
			}
			if !start && (isDigit(next) || next == 'X') {
				return p.failHint(k, "a qualifier stands before or after a whole part of the date, not inside it",
					"write 2004-06~-11 (year and month approximate) or 2004-06-~11 (day approximate)")
			}
			return p.failHint(k, "too many qualifiers on one part of the date",
				"write one: ? (uncertain), ~ (approximate) or % (both), before a part or after it")
		case '-':
			if len(b) > 0 {
				part++
				if part > 2 {
					return p.fail(k, "expected the end of the date after the day")
				}
			}
		}
		at[len(b)] = k
		b = append(b, c)
	}
	if len(b) == 0 {
		return p.fail(lo, "expected a date with the qualifiers")
	}
	at[len(b)] = hi
	sub := parser{in: string(b), cal: p.cal}
	i, err := sub.core(0, len(b), pt)
	if err != nil {
		var pe *ParseError
		if errors.As(err, &pe) {
			pe.Input, pe.Pos = p.in, at[min(pe.Pos, len(b))]
		}
		return err
	}
	if i < len(b) {
		return p.unexpected(at[i], hi)
	}
	if pt.scattered || pt.time != "" || pt.sig != 0 || pt.year > 9999 || pt.year < -9999 {
		return p.fail(lo, "qualifiers on single parts are read on plain dates only (no scattered X digits, time, significant digits or long year)")
	}
	parts := 1
	if pt.month != 0 || pt.mx != 0 {
		parts = 2
		if pt.day != 0 || pt.dx != 0 {
			parts = 3
		}
	}
	for k := parts; k < 3; k++ {
		if left[k] != 0 || right[k] != 0 {
			return p.fail(hi-1, "a qualifier on a part the date does not have")
		}
	}
	for k := 0; k < 3; k++ {
		pt.q[k] = left[k]
		for j := k; j < 3; j++ {
			pt.q[k] |= right[j]
		}
		if k >= parts {
			pt.q[k] = 0
		}
	}
	pt.partial = true
	pt.settle()
	return nil
}

// settle sets approx and uncert from the qualifiers of the parts. When
// every part has the same qualifiers they are those of the whole date.
func (pt *point) settle() {
	parts := pt.parts()
	same := true
	for k := 1; k < parts; k++ {
		same = same && pt.q[k] == pt.q[0]
	}
	if same {
		pt.partial = false
		pt.approx, pt.uncert = pt.q[0]&qApprox != 0, pt.q[0]&qUncert != 0
		pt.q = [3]uint8{}
		return
	}
	pt.approx, pt.uncert = false, false
	for k := 0; k < parts; k++ {
		pt.approx = pt.approx || pt.q[k]&qApprox != 0
		pt.uncert = pt.uncert || pt.q[k]&qUncert != 0
	}
}

// parts is how many parts pt has: 1 (year), 2 (month) or 3 (day).
func (pt *point) parts() int {
	switch {
	case pt.day != 0 || pt.dx != 0:
		return 3
	case pt.month != 0 || pt.mx != 0:
		return 2
	}
	return 1
}

// widenPrec is the precision whose circa policy widens pt: its own, or for
// qualified parts the finest approximate part (2004-06~-11 widens by the
// month policy, ?2004-06-~11 by the day policy).
func (pt *point) widenPrec() Precision {
	if !pt.partial {
		return pt.prec
	}
	switch {
	case pt.q[2]&qApprox != 0:
		return PrecisionDay
	case pt.q[1]&qApprox != 0 && pt.month > 12:
		return PrecisionSeason
	case pt.q[1]&qApprox != 0:
		return PrecisionMonth
	case pt.prec > PrecisionYear:
		return pt.prec
	}
	return PrecisionYear
}
