package date

import (
	"strings"
	"unicode/utf8"
)

// Sexagenary years and zodiac animals, as date seals and colophons give
// them: "year of the horse", "fire horse", "Horse 7" (the 7th month of a
// horse year), "gengzi", "kanoe-ne", "庚子", "午年", "午七月". A branch (an
// animal) repeats every 12 years and a stem-branch pair every 60, so such
// a date is read inside a range: "year of the horse in 1840/1880", or the
// range of the setting Options.Within. It is the one-of set of the
// matching lunisolar years (or months) that meet the range, cut to it.
// The lunisolar year is the one from the 1st month (not the solar year
// from the beginning of spring). Without a calendar (a marker "(Japanese)",
// "(Chinese)", "(Korean)" or the setting), a month is read in the Chinese
// and the Japanese calendars at once; in Japan from 1873 the months and
// years are Gregorian.

var branchNames = [12][]string{
	{"rat", "mouse", "zi", "ne"}, {"ox", "cow", "bull", "buffalo", "chou", "ushi"},
	{"tiger", "yin", "tora"}, {"rabbit", "hare", "mao"}, {"dragon", "chen", "tatsu"},
	{"snake", "serpent", "si"}, {"horse", "wu", "uma"}, {"goat", "sheep", "ram", "wei", "hitsuji"},
	{"monkey", "shen", "saru"}, {"rooster", "cock", "chicken", "hen", "you", "tori"},
	{"dog", "xu", "inu"}, {"pig", "boar", "hog", "hai"},
}

var branchTitles = [12]string{"rat", "ox", "tiger", "rabbit", "dragon", "snake", "horse", "goat", "monkey", "rooster", "dog", "pig"}

const branchKanji = "子丑寅卯辰巳午未申酉戌亥"
const stemKanji = "甲乙丙丁戊己庚辛壬癸"

var stemPinyin = [10]string{"jia", "yi", "bing", "ding", "wu", "ji", "geng", "xin", "ren", "gui"}
var stemJapanese = [10]string{"kinoe", "kinoto", "hinoe", "hinoto", "tsuchinoe", "tsuchinoto", "kanoe", "kanoto", "mizunoe", "mizunoto"}
var elementNames = [5]string{"wood", "fire", "earth", "metal", "water"}

// branchOf returns the branch (0 rat … 11 pig) a folded word names, or -1.
// Only the animals' English and Japanese names count here; the pinyin
// branch names count only in a stem-branch pair.
func branchOf(w string) int {
	for i, names := range branchNames {
		for _, n := range names {
			if w == foldLatin(n) && len(n) > 2 && !isPinyinBranch(n) {
				return i
			}
		}
	}
	if w == "ox" {
		return 1
	}
	return -1
}

func isPinyinBranch(n string) bool {
	switch n {
	case "zi", "chou", "yin", "mao", "chen", "si", "wu", "wei", "shen", "you", "xu", "hai":
		return true
	}
	return false
}

// pairOf returns the index 0–59 of a stem-branch pair written as one folded
// word ("gengzi", "jiazi", "kanoene", "hinoeuma"), -1 when none, -2 for a
// pair that is not in the cycle.
func pairOf(w string) int {
	for si, stems := range [2][10]string{stemPinyin, stemJapanese} {
		for s, st := range stems {
			rest, ok := strings.CutPrefix(w, foldLatin(st))
			if !ok || rest == "" {
				continue
			}
			for b, names := range branchNames {
				for _, n := range names {
					if rest != foldLatin(n) || si == 0 && !isPinyinBranch(n) || si == 1 && len(n) > 2 && n != "ushi" && n != "tora" && n != "tatsu" && n != "uma" && n != "hitsuji" && n != "saru" && n != "tori" && n != "inu" && n != "ne" {
						continue
					}
					if s%2 != b%2 {
						return -2
					}
					return sexagenary(s, b)
				}
			}
		}
	}
	return -1
}

// sexagenary is the place 0–59 in the cycle of stem s and branch b (of the
// same parity): 0 is jiazi.
func sexagenary(s, b int) int {
	for k := 0; k < 60; k++ {
		if k%10 == s && k%12 == b {
			return k
		}
	}
	return -1
}

// cycleSpec is a cyclical date as read.
type cycleSpec struct {
	period int // 12 (an animal) or 60 (a stem-branch pair)
	index  int // the branch, or the place in the cycle
	month  int
	leap   bool
	name   string
}

// isCyclical reports whether s[lo:hi] holds a zodiac or stem-branch word.
func (p *parser) isCyclical(lo, hi int) bool {
	_, ok, _ := p.cycleOf(lo, hi)
	return ok
}

// cycleOf reads a cyclical date.
func (p *parser) cycleOf(lo, hi int) (cycleSpec, bool, error) {
	s := p.in[lo:hi]
	if hasCJK(s) {
		return p.cycleKanji(strings.TrimSpace(s))
	}
	var buf [10][2]int
	ws := p.tokens(lo, hi, buf[:0])
	var c cycleSpec
	c.index = -1
	element := -1
	k := 0
	word := func(i int) string { return foldLatin(p.in[ws[i][0]:ws[i][1]]) }
	for ; k < len(ws); k++ {
		w := word(k)
		switch {
		case w == "the" || w == "a" || w == "year" || w == "of" || w == "yearofthe":
		case c.index < 0 && elementIndex(w) >= 0:
			element = elementIndex(w)
		case c.index < 0 && branchOf(w) >= 0:
			c.index, c.period, c.name = branchOf(w), 12, branchTitles[branchOf(w)]
		case c.index < 0 && pairOf(w) >= 0:
			c.index, c.period, c.name = pairOf(w), 60, p.in[ws[k][0]:ws[k][1]]
		case c.index < 0 && pairOf(w) == -2:
			return c, true, p.fail(ws[k][0], quoteChar(p.in, ws[k][0])+" is no stem-branch pair of the cycle (a stem and a branch pair only when both are yang or both yin)")
		case c.index < 0:
			return c, false, nil
		default:
			goto months
		}
	}
months:
	if c.index < 0 {
		return c, false, nil
	}
	if element >= 0 {
		if c.period != 12 {
			return c, true, p.fail(lo, "an element goes with an animal: fire horse")
		}
		stem := 2*element + c.index%2
		c.index, c.period = sexagenary(stem, c.index), 60
		c.name = elementNames[element] + " " + c.name
	}
	for ; k < len(ws); k++ {
		w := strings.ToLower(p.in[ws[k][0]:ws[k][1]])
		switch {
		case w == "year" || w == "month" || w == "moon":
		case w == "intercalary" || w == "leap":
			c.leap = true
		default:
			v, ok := ordinalNumber(w)
			if !ok || c.month != 0 {
				return c, true, p.failHint(ws[k][0], "unexpected "+quoteChar(p.in, ws[k][0])+" after the cyclical year",
					"write Horse 7, Horse, 7th month, or Horse, intercalary 5th month")
			}
			c.month = v
		}
	}
	if c.leap && c.month == 0 {
		return c, true, p.fail(lo, "intercalary names a month: Horse, intercalary 5th month")
	}
	if c.month > 12 {
		return c, true, p.fail(lo, "a month of the lunisolar year is 1 to 12 (and an intercalary month)")
	}
	return c, true, nil
}

func elementIndex(w string) int {
	for i, e := range elementNames {
		if w == e {
			return i
		}
	}
	if w == "gold" {
		return 3
	}
	return -1
}

// cycleKanji reads 庚子, 庚子年, 午年, 午七月, 午年閏五月, 午七.
func (p *parser) cycleKanji(s string) (cycleSpec, bool, error) {
	var c cycleSpec
	r, n := utf8.DecodeRuneInString(s)
	stem := strings.IndexRune(stemKanji, r)
	if stem >= 0 {
		b, m := utf8.DecodeRuneInString(s[n:])
		branch := strings.IndexRune(branchKanji, b)
		if branch < 0 {
			return c, false, nil
		}
		stem /= len("甲")
		branch /= len("子")
		if stem%2 != branch%2 {
			return c, true, p.fail(0, s[:n+m]+" is no stem-branch pair of the cycle")
		}
		c.period, c.index, c.name = 60, sexagenary(stem, branch), s[:n+m]
		s = s[n+m:]
	} else if b := strings.IndexRune(branchKanji, r); b >= 0 {
		c.period, c.index, c.name = 12, b/len("子"), branchTitles[b/len("子")]
		s = s[n:]
	} else {
		return c, false, nil
	}
	s = strings.TrimPrefix(s, "年")
	s = strings.TrimPrefix(s, "歳")
	if s == "" {
		return c, true, nil
	}
	if rest, ok := strings.CutPrefix(s, "閏"); ok {
		c.leap, s = true, rest
	}
	s = strings.TrimSuffix(s, "月")
	v, ok := cjkNumber(s)
	if !ok || v < 1 || v > 12 {
		return c, true, p.fail(0, "expected a month in numerals after the cyclical year")
	}
	c.month = int(v)
	return c, true, nil
}

// maxCycleYears bounds the range a cyclical date is looked for in.
const maxCycleYears = 1000

// cyclical reads a whole text that is a cyclical date, with its range.
func (p *parser) cyclical(lo, hi int) ([]member, bool, error) {
	s := p.in
	// a calendar marker at the end
	cals := []Calendar{CalendarChinese, CalendarJapanese}
	switch p.cal {
	case CalendarChinese, CalendarJapanese, CalendarKorean:
		cals = []Calendar{p.cal}
	}
	for _, mk := range []struct {
		w string
		c Calendar
	}{{"(japanese)", CalendarJapanese}, {"(chinese)", CalendarChinese}, {"(korean)", CalendarKorean}} {
		if endsFold(s, lo, hi, mk.w) {
			cals = []Calendar{mk.c}
			_, hi = p.trim(lo, hi-len(mk.w))
		}
	}
	exprHi, rangeLo := hi, -1
	for _, sep := range []string{" in ", " within ", " between "} {
		if k := indexFold(s[lo:hi], sep); k > 0 {
			exprHi, rangeLo = lo+k, lo+k+len(sep)
			if sep == " between " {
				rangeLo = lo + k + 1
			}
			break
		}
	}
	c, ok, err := p.cycleOf(lo, exprHi)
	if !ok || err != nil {
		return nil, ok, err
	}
	within := p.within
	rangeText := "the range of the setting"
	if rangeLo >= 0 {
		rt := s[rangeLo:hi]
		d, err := ParseWith(rt, Options{Calendar: CalendarGregorian})
		if err != nil {
			var pe *ParseError
			if e, ok := err.(*ParseError); ok {
				pe = e
				return nil, true, p.fail(rangeLo+pe.Pos, "the range: "+pe.Msg)
			}
			return nil, true, err
		}
		within, rangeText = d.Alternatives, strings.TrimSpace(rt)
	}
	if len(within) == 0 {
		per := "12"
		if c.period == 60 {
			per = "60"
		}
		return nil, true, p.failHint(lo, "a cyclical year repeats every "+per+" years: give the range it falls in",
			"write "+strings.TrimSpace(s[lo:exprHi])+" in 1800/1899, or give the range as a setting (terminus date --within 1800/1899)")
	}
	a, b := within[0], within[len(within)-1]
	if a.OpenStart || b.OpenEnd {
		return nil, true, p.fail(lo, "the range of a cyclical year must be closed, such as 1800/1899")
	}
	y1, y2 := a.First.Year()-1, b.Last.Year()
	if y2-y1 > maxCycleYears {
		return nil, true, p.fail(lo, "the range of a cyclical year is at most 1000 years")
	}
	if y1 < 1368 && cals[0] != CalendarJapanese || y1 < 1595 && len(cals) > 1 || y1 < 1595 && cals[0] == CalendarJapanese {
		if y1 < 1368 || cals[0] == CalendarJapanese && y1 < 1595 {
			return nil, true, p.fail(lo, "cyclical years are read from 1368 (China) and 1596 (Japan) on")
		}
	}
	var out []member
	calc := map[Calendar]*lsCalc{}
	for _, cal := range cals {
		calc[cal] = newLSCalc(cal)
	}
	calName := cals[0].String()
	if len(cals) > 1 {
		calName = "Chinese or Japanese"
	}
	for y := y1; y <= y2; y++ {
		if floorMod(y-4, int64(c.period)) != int64(c.index) {
			continue
		}
		var first, last Day
		have := false
		for _, cal := range cals {
			if cal == CalendarJapanese && y < 1596 {
				continue
			}
			var f, l Day
			if cal == CalendarJapanese && y >= 1873 {
				if c.leap {
					continue
				}
				var err error
				if f, l, err = p.gregorianPart(y, c.month, 0, lo); err != nil {
					return nil, true, err
				}
			} else {
				what := itoa(int(y)) + " (" + cal.String() + ")"
				var err error
				f, l, _, err = p.lsRead(calc[cal], y, c.month, c.leap, 0, what, lo)
				if err != nil {
					continue // no such intercalary month in this year
				}
				if cal == CalendarJapanese {
					l = min(l, japaneseGregorian-1)
					if f > l {
						continue
					}
				}
			}
			if !have || f < first {
				first = f
			}
			if !have || l > last {
				last = l
			}
			have = true
		}
		if !have {
			continue
		}
		label := "year of the " + c.name + " " + itoa(int(y))
		if c.period == 60 {
			label = c.name + " " + itoa(int(y))
		}
		if c.month != 0 {
			label += ", " + lunarMonthText(c.month, c.leap)
		}
		label += " (" + calName + ")"
		for _, iv := range within {
			f, l := max(first, iv.First), min(last, iv.Last)
			if f > l {
				continue
			}
			pt := fixedPoint(cals[0], label, f, l, PrecisionMonth)
			if len(cals) > 1 {
				pt.x.cal = CalendarEastAsian
			}
			if c.month == 0 {
				pt.prec = PrecisionYear
			}
			out = append(out, member{start: pt, end: pt})
		}
	}
	if len(out) == 0 {
		what := "year of the " + c.name
		if c.month != 0 {
			what += ", " + lunarMonthText(c.month, c.leap)
		}
		return nil, true, p.failHint(lo, "no "+what+" falls in "+rangeText, "widen the range")
	}
	per := "12"
	if c.period == 60 {
		per = "60"
	}
	p.note("a cyclical year repeats every " + per + " years: read as the matching lunisolar years in " + rangeText + " (" + calName + " calendar), cut to it")
	if len(cals) > 1 {
		p.note("the calendar is not given: each month is the union of its days in the Chinese and the Japanese calendars (in Japan Gregorian from 1873); a case's calendar setting or a marker (Japanese) chooses")
	}
	return out, true, nil
}
