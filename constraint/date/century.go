package date

import "strings"

// Centuries and millennia by name: "18th century", "18th c.", "3rd
// century BCE", "5th millennium BCE", with their parts ("early", "mid",
// "late", "first half of the", "second quarter of the").
//
// The words are used in two ways: strictly the 18th century is 1701–1800,
// and as commonly meant it is 1700–1799 (the 1700s). A date must never be
// read narrower than its writer meant, so the name is read as the union
// of both: 1700 to 1800. Before the era the same holds: the 3rd century
// BCE is 300 to 200 BCE. The parts divide the hundred (or thousand) years
// from the round year (1700) and the last part runs to the end of the
// union: early 1700–1733, mid 1733–1766, late 1766–1800; first half
// 1700–1750, second half 1750–1800; quarters 1700–1725 … 1775–1800.
// Parts overlap by one year at their seams, as the thirds of a decade do.

var ordinalWords = []string{"first", "second", "third", "fourth", "fifth", "sixth", "seventh", "eighth", "ninth",
	"tenth", "eleventh", "twelfth", "thirteenth", "fourteenth", "fifteenth", "sixteenth", "seventeenth",
	"eighteenth", "nineteenth", "twentieth"}

// ordinal reads "18th", "1st", "eighteenth", "twenty-first".
func ordinal(w string) (int64, bool) {
	if n := len(w); n >= 3 && isDigit(w[0]) {
		suf := strings.ToLower(w[n-2:])
		if suf != "st" && suf != "nd" && suf != "rd" && suf != "th" || !allDigits(w[:n-2]) || n-2 > 6 {
			return 0, false
		}
		var v int64
		for i := 0; i < n-2; i++ {
			v = v*10 + int64(w[i]-'0')
		}
		return v, v > 0
	}
	lw := strings.ToLower(w)
	for i, o := range ordinalWords {
		if lw == o {
			return int64(i + 1), true
		}
	}
	if rest, ok := strings.CutPrefix(lw, "twenty-"); ok {
		for i, o := range ordinalWords[:9] {
			if rest == o {
				return int64(21 + i), true
			}
		}
	}
	return 0, false
}

// centuryUnit returns 100 or 1000 for a unit word: century, centuries,
// cent., c., c; millennium, millennia, millenium.
func centuryUnit(w string) int64 {
	switch strings.ToLower(strings.TrimSuffix(w, ".")) {
	case "century", "centuries", "cent", "c", "centuary":
		return 100
	case "millennium", "millennia", "millenium", "mill":
		return 1000
	}
	return 0
}

// words splits s[lo:hi] at spaces and commas and at a hyphen before a
// century word ("18th-century", "mid-18th"); it returns false beyond
// cap(out) words.
func (p *parser) words(lo, hi int, out [][2]int) ([][2]int, bool) {
	return p.splitWords(lo, hi, out, true)
}

func (p *parser) wordAt(i, hi int) string {
	j := i
	for j < hi && !isSpace(p.in[j]) && p.in[j] != ',' {
		j++
	}
	return p.in[i:j]
}

// hasCenturyWord reports quickly whether s[lo:hi] may be a century form.
func hasCenturyWord(s string, lo, hi int) bool {
	for i := lo; i+1 < hi; i++ {
		switch s[i] | 0x20 {
		case 'c':
			// "century", "cent.", "c." or a final "c" after a space
			if i > lo && isSpace(s[i-1]) || i > lo && s[i-1] == '-' {
				return true
			}
		case 'm':
			if hasFold(s, i, hi, "millen") {
				return true
			}
		}
	}
	return hi-lo > 2 && (s[hi-1]|0x20) == 'c' && isSpace(s[hi-2])
}

// century reads a century or millennium by name with its part, if any:
// frac is early (1), mid (2) or late (3) from pointish. It returns false
// when s[lo:hi] is no such form.
func (p *parser) century(lo, hi, frac int, approx, uncert bool) (member, bool, error) {
	s := p.in
	if !hasCenturyWord(s, lo, hi) && p.unit2 == 0 {
		return member{}, false, nil
	}
	var buf [10][2]int
	ws, ok := p.words(lo, hi, buf[:0])
	if !ok || len(ws) == 0 {
		return member{}, false, nil
	}
	w := func(k int) string { return s[ws[k][0]:ws[k][1]] }
	// the era at the end
	bce, era := false, false
	last := len(ws) - 1
	switch strings.ToLower(w(last)) {
	case "bce", "bc", "b.c.", "b.c.e.", "bc.":
		bce, era = true, true
	case "ad", "a.d.", "ce", "c.e.":
		era = true
	}
	if era {
		last--
	}
	if !era && p.era2 == eraBCE {
		bce = true
	}
	if last < 0 {
		return member{}, false, nil
	}
	unit := centuryUnit(w(last))
	ordAt := last - 1
	if unit == 0 {
		if p.unit2 == 0 || last != 0 {
			return member{}, false, nil
		}
		unit, ordAt = p.unit2, last // "18th" in "18th–19th century"
	}
	if ordAt < 0 {
		return member{}, false, nil
	}
	n, ok := ordinal(w(ordAt))
	if !ok {
		if unit == 100 && strings.EqualFold(w(last), "c") || ordAt > 0 {
			return member{}, false, nil
		}
		return member{}, true, p.failHint(ws[ordAt][0], "expected an ordinal before "+w(last),
			"write 18th century, 3rd century BCE or 5th millennium BCE")
	}
	if n > 100_000_000 {
		return member{}, true, p.fail(ws[ordAt][0], "year out of range: this package reads years up to 999999999999")
	}
	// A part written before: "first half of the", "second quarter of".
	part, parts := 0, 0
	if ordAt > 0 {
		k := 0
		pw := strings.ToLower(w(0))
		pn, ok := ordinal(pw)
		if pw == "last" {
			pn, ok = -1, true
		}
		if !ok || ordAt < 2 {
			return member{}, true, p.failHint(ws[0][0], "unexpected words before the "+unitName(unit),
				"write early, mid or late 18th century, or first half (second quarter…) of the 18th century")
		}
		switch strings.ToLower(w(1)) {
		case "half":
			parts = 2
		case "quarter":
			parts = 4
		case "third":
			parts = 3
		default:
			return member{}, true, p.failHint(ws[1][0], "expected half, quarter or third", "write first half of the 18th century")
		}
		k = 2
		if k < ordAt && strings.EqualFold(w(k), "of") {
			k++
		}
		if k < ordAt && strings.EqualFold(w(k), "the") {
			k++
		}
		if k != ordAt {
			return member{}, true, p.failHint(ws[k][0], "expected \"of the\" before the "+unitName(unit),
				"write first half of the 18th century")
		}
		if pn == -1 {
			pn = int64(parts)
		}
		if pn < 1 || pn > int64(parts) {
			return member{}, true, p.fail(ws[0][0], "a "+unitName(unit)+" has "+itoa(parts)+" "+w(1)+"s")
		}
		part = int(pn)
	}
	if frac != 0 {
		if parts != 0 {
			return member{}, true, p.fail(lo, "early, mid or late and a half or quarter do not go together")
		}
		part, parts = frac, 3
	}
	// The union of the strict and the common reading, in years as the era
	// counts them, then astronomical.
	var a, b, a0 int64 // first and last year, and the round year the parts count from
	lo1 := max(unit*(n-1), 1)
	if bce {
		a, b, a0 = 1-unit*n, 1-lo1, 1-unit*n
	} else {
		a, b, a0 = lo1, unit*n, unit*(n-1)
	}
	if parts != 0 {
		step := unit / int64(parts)
		if parts == 3 {
			step = unit / 3 // 33 years, 333 years
		}
		pa, pb := a0+int64(part-1)*step, a0+int64(part)*step
		if part == 1 {
			pa = a
		}
		if part == parts {
			pb = b
		}
		a, b = pa, pb
	}
	prec := PrecisionCentury
	switch {
	case unit == 1000 && parts != 0:
		prec = PrecisionCentury
	case unit == 1000:
		prec = PrecisionMillennium
	case parts != 0:
		prec = PrecisionDecade
	}
	if max(-a, b) > maxYear {
		return member{}, true, p.fail(lo, "year out of range: this package reads years up to 999999999999")
	}
	start := point{year: a, cal: CalendarGregorian, approx: approx, uncert: uncert}
	end := point{year: b, cal: CalendarGregorian, approx: approx, uncert: uncert}
	start.span()
	end.span()
	start.prec, end.prec = prec, prec
	name := strings.TrimSpace(s[lo:hi])
	if p.unit2 != 0 && centuryUnit(w(last)) == 0 {
		name += " " + unitName(unit)
	}
	whole := name
	if frac != 0 {
		whole = [...]string{"", "early ", "mid ", "late "}[frac] + name
	}
	start.x = &pointExtra{cal: CalendarGregorian, whole: whole + " (" + YearForPeople(a) + " to " + YearForPeople(b) + ")"}
	p.note(centuryNote(unit))
	return member{start: start, end: end, kind: ranged | friendly}, true, nil
}

func unitName(unit int64) string {
	if unit == 1000 {
		return "millennium"
	}
	return "century"
}

func centuryNote(unit int64) string {
	if unit == 1000 {
		return "a millennium by name is read as both ways of counting it: the 2nd millennium as 1001–2000 and as 1000–1999, so 1000 to 2000"
	}
	return "a century by name is read as both ways of counting it: the 18th century as 1701–1800 (strictly) and as 1700–1799 (as commonly meant), so 1700 to 1800; early, mid and late are its thirds from the round year (1700–1733, 1733–1766, 1766–1800)"
}
