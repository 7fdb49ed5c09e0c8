package date

import "strings"

// bound reads the friendly one-sided and two-sided forms: "before X",
// "after X", "not before X", "not after X", "between X and Y".
func (p *parser) bound(lo, hi int) ([]member, bool, error) {
	s := p.in
	word := func(w string) bool {
		return hasFold(s, lo, hi, w) && lo+len(w) < hi && isSpace(s[lo+len(w)])
	}
	switch {
	case word("not before"), word("no earlier than"), word("from"), word("since"):
		n := len("not before")
		switch {
		case word("no earlier than"):
			n = len("no earlier than")
		case word("from"):
			n = len("from")
		case word("since"):
			n = len("since")
		}
		m, err := p.pointish(lo+n, hi)
		if err != nil {
			return nil, true, err
		}
		return p.one(member{start: m.start, kind: ranged | openEnd | friendly}), true, nil
	case word("not after"), word("no later than"), word("by"), word("until"):
		n := len("not after")
		switch {
		case word("no later than"):
			n = len("no later than")
		case word("by"):
			n = len("by")
		case word("until"):
			n = len("until")
		}
		m, err := p.pointish(lo+n, hi)
		if err != nil {
			return nil, true, err
		}
		return p.one(member{end: m.end, kind: ranged | openStart | friendly}), true, nil
	case word("before"):
		m, err := p.pointish(lo+len("before"), hi)
		if err != nil {
			return nil, true, err
		}
		e := m.start
		if e.time == "" {
			e = p.pointAt(m.start.first-1, m.start)
		}
		return p.one(member{end: e, kind: ranged | openStart | friendly}), true, nil
	case word("after"):
		m, err := p.pointish(lo+len("after"), hi)
		if err != nil {
			return nil, true, err
		}
		st := m.end
		if st.time == "" {
			st = p.pointAt(m.end.last+1, m.end)
		}
		return p.one(member{start: st, kind: ranged | openEnd | friendly}), true, nil
	case word("between"):
		b := lo + len("between")
		k := indexFold(s[b:hi], " and ")
		if k < 0 {
			return nil, true, p.fail(hi, `expected "between X and Y"`)
		}
		m, err := p.span(lo+len("between"), b+k, b+k+len(" and "), hi)
		return p.one(m), true, err
	}
	return nil, false, nil
}

func indexFold(s, sub string) int {
	for i := 0; i+len(sub) <= len(s); i++ {
		if strings.EqualFold(s[i:i+len(sub)], sub) {
			return i
		}
	}
	return -1
}

// pointAt makes the point of the given precision class that holds day d,
// in the calendar of like, keeping like's qualifiers: the year, month or
// day just before or after a date.
func (p *parser) pointAt(d Day, like point) point {
	if like.isFixed() {
		// a date of another calendar: the Gregorian day
		y, m, dd := d.Civil()
		pt := point{year: y, month: uint8(m), day: uint8(dd), approx: like.approx, uncert: like.uncert}
		pt.span()
		return pt
	}
	y, m, dd := civilIn(d, like.cal)
	pt := point{year: y, cal: like.cal, approx: like.approx, uncert: like.uncert}
	switch {
	case like.prec == PrecisionDay:
		pt.month, pt.day = uint8(m), uint8(dd)
	case like.prec <= PrecisionSeason:
		pt.month = uint8(m)
	}
	pt.span()
	return pt
}

// rangeSplit finds a friendly range "1870-1875", "1870 - 1875",
// "1870–1875" or "1870 to 1875": the end of the first part and the start
// of the second.
func (p *parser) rangeSplit(lo, hi int) (int, int, bool) {
	s := p.in[lo:hi]
	plain := true // no space and nothing but ASCII: only "1870-1875" can match
	for i := 0; i < len(s); i++ {
		if s[i] == ' ' || s[i] >= 0x80 {
			plain = false
			break
		}
	}
	if !plain {
		for _, sep := range []string{" – ", "–", " — ", "—", " - "} {
			if k := strings.Index(s, sep); k > 0 {
				return lo + k, lo + k + len(sep), true
			}
		}
		if k := indexFold(s, " to "); k > 0 {
			return lo + k, lo + k + len(" to "), true
		}
		// 18th-19th century: a hyphen after an ordinal, before a digit
		for k := 3; k+1 < len(s); k++ {
			if s[k] == '-' && isDigit(s[k+1]) && isLetter(s[k-1]) && isDigit(s[k-3]) {
				if _, ok := ordinal(s[:k]); ok {
					return lo + k, lo + k + 1, true
				}
			}
		}
	}
	// 1870-1875 and 1870s-1880s: a year (or decade), a hyphen, four digits
	// (never EDTF, whose months have two digits).
	for k := 4; k+5 <= len(s); k++ {
		if s[k] != '-' || !allDigits(s[k+1:k+5]) || (k+5 < len(s) && (isDigit(s[k+5]) || s[k+5] == '-')) {
			continue
		}
		e := k
		if s[e-1] == 's' {
			e--
		}
		if e >= 4 && allDigits(s[e-4:e]) && (e == 4 || !isDigit(s[e-5])) {
			return lo + k, lo + k + 1, true
		}
	}
	return 0, 0, false
}

func allDigits(s string) bool {
	for i := 0; i < len(s); i++ {
		if !isDigit(s[i]) {
			return false
		}
	}
	return len(s) > 0
}

// circaWord reports whether s[lo:hi] begins with a circa word.
func (p *parser) circaWord(lo, hi int) bool {
	lo, hi = p.trim(lo, hi)
	for _, w := range circaWords {
		if hasFold(p.in, lo, hi, w) {
			return true
		}
	}
	return hi-lo > 2 && (p.in[lo]|0x20) == 'c' && isSpace(p.in[lo+1])
}

// span reads a two-part friendly range whose parts are [lo,a) and [b,hi).
// An era after the second part only ("1200-1100 BCE") applies to both,
// and so does a circa word before the first part only ("c. 1870-1875").
func (p *parser) span(lo, a, b, hi int) (member, error) {
	x, y := p.trim(b, hi)
	if era, _, _ := p.era(x, y); era == eraBCE {
		if e, _, _ := p.era(p.trim(lo, a)); e == 0 {
			p.era2 = eraBCE
		}
	}
	if u := p.rangeUnit(x, y); u != 0 {
		if _, ok := ordinal(strings.TrimSpace(p.in[lo:a])); ok {
			p.unit2 = u // "18th" in "18th–19th century"
		}
	}
	m1, err := p.pointish(lo, a)
	p.era2, p.unit2 = 0, 0
	if err != nil {
		return member{}, err
	}
	m2, err := p.pointish(b, hi)
	if err != nil {
		return member{}, err
	}
	m := member{start: m1.start, end: m2.end, kind: ranged}
	if p.circaWord(lo, a) && !p.circaWord(b, hi) {
		m.end.approx = true
	}
	return m, p.ordered(m, a)
}

var circaWords = []string{"circa", "approximately", "approx.", "approx", "about", "around", "ca.", "ca", "c."}

// fraction makes the friendly "early", "mid" or "late" part of a decade
// or century: the thirds 0–3, 3–6, 6–9 of a decade and 00–33, 33–66,
// 66–99 of a century, overlapping by one year at the seams.
func fraction(pt point, frac int) member {
	step := int64(3)
	if pt.yx == 2 {
		step = 33
	}
	base := pt.year
	a := point{year: base + int64(frac-1)*step, cal: pt.cal, approx: pt.approx, uncert: pt.uncert}
	b := a
	b.year = a.year + step
	a.span()
	b.span()
	return member{start: a, end: b, kind: ranged | friendly}
}

const (
	eraBCE = 1 + iota
	eraAD
)

var eraBCEWords = []string{"b.c.e.", "bce", "b.c.", "bc"}
var eraADWords = []string{"a.d.", "ad", "c.e.", "ce"}

// era finds an era name after the year ("1200 BCE", "79 AD") or "AD"
// before it ("AD 79"); it returns where the name stands.
func (p *parser) era(lo, hi int) (int, int, int) {
	s := p.in
	for _, w := range eraBCEWords {
		if endsFold(s, lo, hi, w) && hi-len(w) > lo && (isSpace(s[hi-len(w)-1]) || isDigit(s[hi-len(w)-1])) {
			return eraBCE, hi - len(w), hi
		}
	}
	for _, w := range eraADWords {
		if endsFold(s, lo, hi, w) && hi-len(w) > lo && (isSpace(s[hi-len(w)-1]) || isDigit(s[hi-len(w)-1])) {
			return eraAD, hi - len(w), hi
		}
	}
	for _, w := range eraADWords[:2] {
		if hasFold(s, lo, hi, w) && lo+len(w) < hi && isSpace(s[lo+len(w)]) {
			return eraAD, lo, lo + len(w)
		}
	}
	return 0, 0, 0
}

// eraYear reads the year number before or after an era name: 1200 BCE is
// the astronomical year -1199, AD 79 the year 79.
func (p *parser) eraYear(lo, hi int, era int, pt *point) error {
	s := p.in
	if lo == hi {
		return p.fail(lo, "expected a year with the era")
	}
	var v int64
	for i := lo; i < hi; i++ {
		if !isDigit(s[i]) {
			return p.failHint(i, "expected the digits of a year with the era",
				"write a whole year, such as 1200 BCE or 79 CE; for months and days use EDTF with astronomical years (-1199-05)")
		}
		if i-lo >= 12 {
			return p.fail(lo, "year out of range: this package reads years up to 999999999999")
		}
		v = v*10 + int64(s[i]-'0')
	}
	if v == 0 {
		return p.failHint(lo, "there is no year 0 in the BCE/AD count", "1 BCE is followed by AD 1; in EDTF 1 BCE is 0000")
	}
	if era == eraBCE {
		pt.year = 1 - v
	} else {
		pt.year = v
	}
	pt.span()
	return nil
}

// plural reads "1870s" (the decade 187X) and "1800s" (the century 18XX:
// a year ending in 00 reads as the wider century).
func (p *parser) plural(lo, hi int, pt *point) error {
	s := p.in
	end := hi - 1
	if end-lo >= 2 && (s[end-1] == '\'' || s[end-1] == '`') {
		end--
	}
	for i := lo; i < end; i++ {
		if !isDigit(s[i]) {
			return p.failHint(i, "expected a decade such as 1870s", "write 1870s (the decade) or 1800s (the century)")
		}
	}
	n := end - lo
	if n < 3 || n > 4 {
		return p.failHint(lo, "expected a decade of three or four digits, such as 1870s", "write 1870s or 870s")
	}
	if s[end-1] != '0' {
		return p.failHint(end-1, "a decade ends in 0: 1870s", "for one year write 1874")
	}
	var v int64
	for i := lo; i < end; i++ {
		v = v*10 + int64(s[i]-'0')
	}
	pt.year = v
	pt.yx = 1
	if s[end-2] == '0' {
		pt.yx = 2
	}
	pt.span()
	return nil
}

func isLetter(c byte) bool {
	return (c|0x20) >= 'a' && (c|0x20) <= 'z' && c != 'X' && c != 'Y' && c != 'E' && c != 'S' && c != 'T' && c != 'Z'
}

// hasLetter reports whether s[lo:hi] holds a letter that EDTF does not use.
func (p *parser) hasLetter(lo, hi int) bool {
	for k := lo; k < hi; k++ {
		if isLetter(p.in[k]) {
			return true
		}
	}
	return false
}

// named reads a date with an English month name: "May 1874",
// "21 May 1874", "May 21, 1874"; the name may be cut to three letters
// ("Sept." too).
func (p *parser) named(lo, hi int, pt *point) error {
	s := p.in
	type tok = [2]int // a word's start and end
	var buf [5]tok
	toks, _ := p.splitWords(lo, hi, buf[:0], false)
	if len(toks) == len(buf) { // a date with a month name has four words at most
		return p.failHint(toks[4][1], "expected a date such as 21 May 1874", "write 21 May 1874, May 1874 or 1874-05-21")
	}
	n := len(toks)
	month, mi := 0, -1
	for k := 0; k < n; k++ {
		if m := monthByName(s[toks[k][0]:toks[k][1]]); m > 0 {
			month, mi = m, k
			break
		}
	}
	if month == 0 {
		k := toks[0][0]
		for _, tk := range toks[:n] {
			if p.hasLetter(tk[0], tk[1]) {
				k = tk[0]
				break
			}
		}
		hint := "write 21 May 1874, May 1874, 1874-05-21, c. 1870, 1870s or 1200 BCE"
		w := ""
		for _, tk := range toks[:n] {
			if tk[0] == k {
				w = s[tk[0]:tk[1]]
			}
		}
		switch {
		case strings.ContainsAny(w, "0123456789") && strings.ContainsAny(w, "xu"):
			hint = "unspecified digits are an upper-case X: " + strings.NewReplacer("x", "X", "u", "X").Replace(w)
		case strings.EqualFold(w, "century") || strings.HasPrefix(strings.ToLower(w), "cent"):
			hint = "write the century as 18th century (read as 1700 to 1800), or 1700s for 1700–1799"
		default:
			if n, ok := ordinal(w); ok && n < 100 {
				c := itoa(int(n-1)) + "00"
				hint = "write " + w + " century (read as " + c + " to " + itoa(int(n)) + "00, both ways of counting it) or " + c + "s (" + c + "–" + itoa(int(n-1)) + "99)"
			}
		}
		return p.failHint(k, "unexpected word in a date: expected a month name or an EDTF date", hint)
	}
	num := func(t tok, what string, digits int) (int64, error) {
		if t[1]-t[0] > digits || t[1] == t[0] {
			return 0, p.fail(t[0], "expected "+what)
		}
		var v int64
		for k := t[0]; k < t[1]; k++ {
			if !isDigit(s[k]) {
				return 0, p.fail(k, "expected "+what)
			}
			v = v*10 + int64(s[k]-'0')
		}
		return v, nil
	}
	var dayTok, yearTok tok
	switch {
	case n == 2 && mi == 0: // May 1874
		yearTok = toks[1]
	case n == 3 && mi == 1: // 21 May 1874
		dayTok, yearTok = toks[0], toks[2]
	case n == 3 && mi == 0: // May 21, 1874
		dayTok, yearTok = toks[1], toks[2]
	default:
		return p.failHint(toks[0][0], "expected a date such as 21 May 1874", "write 21 May 1874, May 21, 1874 or May 1874")
	}
	dual := int64(-1) // the new-style year of a dual year "1712/13"
	if k := strings.IndexByte(s[yearTok[0]:yearTok[1]], '/'); k > 0 {
		y2, err := p.dualYear(yearTok[0], yearTok[0]+k, yearTok[1])
		if err != nil {
			return err
		}
		dual = y2
		yearTok[1] = yearTok[0] + k
	}
	if yearTok[1]-yearTok[0] != 4 {
		return p.failHint(yearTok[0], "expected a year of four digits after the month", "write May 1874; for other years use EDTF: 0079-05")
	}
	y, err := num(yearTok, "a year of four digits", 4)
	if err != nil {
		return err
	}
	pt.year, pt.month = y, uint8(month)
	if dayTok[1] > 0 {
		d, err := num(dayTok, "a day of the month", 2)
		if err != nil {
			return err
		}
		pt.day = uint8(d)
	}
	if dual >= 0 {
		return p.dualDate(lo, hi, dayTok[0], dual, pt)
	}
	if pt.cal == CalendarJulian || p.ys != YearStartUnknown {
		return p.documentary(lo, hi, dayTok[0], pt)
	}
	if pt.day != 0 {
		if err := p.checkDay(dayTok[0], pt); err != nil {
			return err
		}
	}
	pt.span()
	return nil
}

// monthByName returns 1–12 for an English month name or its first three
// letters (with or without a full stop, and "Sept"), or 0.
func monthByName(w string) int {
	w = strings.TrimSuffix(w, ".")
	if len(w) < 3 {
		return 0
	}
	for i, name := range monthNames {
		if strings.EqualFold(w, name) || strings.EqualFold(w, name[:3]) || (i == 8 && strings.EqualFold(w, "sept")) {
			return i + 1
		}
	}
	return 0
}

// rangeUnit returns the unit (100 or 1000 years) of a century or
// millennium form in s[lo:hi], or 0.
func (p *parser) rangeUnit(lo, hi int) int64 {
	var buf [10][2]int
	ws, ok := p.words(lo, hi, buf[:0])
	if !ok || len(ws) < 2 {
		return 0
	}
	for _, w := range ws[len(ws)-2:] {
		if u := centuryUnit(p.in[w[0]:w[1]]); u != 0 {
			return u
		}
	}
	return 0
}

// hasMonthName reports whether a word of s[lo:hi] is an English month name.
func (p *parser) hasMonthName(lo, hi int) bool {
	s := p.in
	for i := lo; i < hi; {
		for i < hi && (isSpace(s[i]) || s[i] == ',') {
			i++
		}
		j := i
		for j < hi && !isSpace(s[j]) && s[j] != ',' {
			j++
		}
		if j > i && monthByName(s[i:j]) > 0 {
			return true
		}
		i = j
	}
	return false
}
