package date

import (
	"strings"
)

// Japanese, Chinese and Korean dates by era: "Meiji 14", "Meiji 14.5.3",
// "Ansei 4, 7th month", "Ansei 4, intercalary 5th month", "明治十四年五月",
// "安政四年閏五月", "元年" for the first year, "Qianlong 12", "乾隆十二年",
// a reign alone ("Qianlong", "Qianlong period", "大清乾隆年製").

// eraRef is an era of one of the tables, with the next era of its table
// (nil for the last) and the table's calendar.
type eraRef struct {
	e    *era
	next *era
	cal  Calendar
}

// eraIndex maps the folded names of every era (romanised, aliases, kanji)
// to the eras that bear them: built once, read only.
var eraIndex = buildEraIndex()

func buildEraIndex() map[string][]eraRef {
	idx := map[string][]eraRef{}
	add := func(k string, r eraRef) {
		for _, x := range idx[k] {
			if x.e == r.e {
				return
			}
		}
		idx[k] = append(idx[k], r)
	}
	for _, t := range []struct {
		eras []era
		cal  Calendar
	}{{japaneseEras, CalendarJapanese}, {chineseEras, CalendarChinese}, {koreanEras, CalendarKorean}, {koreanKings, CalendarKorean}} {
		for i := range t.eras {
			e := &t.eras[i]
			r := eraRef{e: e, cal: t.cal}
			if i+1 < len(t.eras) {
				r.next = &t.eras[i+1]
			}
			add(foldLatin(e.name), r)
			add(kanjiFold.Replace(e.kanji), r)
			for _, a := range e.aliases {
				if hasNonASCII(a, 0, len(a)) {
					add(kanjiFold.Replace(a), r)
				} else {
					add(foldLatin(a), r)
				}
			}
		}
	}
	return idx
}

// lastYear is the last year number of the era, 0 when open.
func (r eraRef) lastYear() int {
	if r.e.last != 0 || r.next == nil {
		return r.e.last
	}
	return int(r.next.start-r.e.start) + 1
}

// span is the era's whole run of years for people: "1854–1860".
func (r eraRef) span() string {
	if l := r.lastYear(); l != 0 {
		return itoa(int(r.e.start)) + "–" + itoa(int(r.e.start)+l-1)
	}
	return itoa(int(r.e.start)) + " on"
}

// eraDate is an era date as read (its era beside it): the year (0 for the
// era alone), the month (0 for none), intercalary, the day (0 for none, -1
// for the last day of the month).
type eraDate struct {
	year       int
	month, day int
	leap       bool
	pos        int // where the year stands, for errors
}

// eraForm reads s[lo:hi] as an era date; false when it names no era.
func (p *parser) eraForm(lo, hi int) (eraDate, []eraRef, bool, error) {
	if hasCJK(p.in[lo:hi]) {
		return p.eraKanji(lo, hi)
	}
	return p.eraRoman(lo, hi)
}

// eraRoman reads "Meiji 14", "Meiji 14.5.3", "Ansei 4, 7th month",
// "Ansei 4, intercalary 5th month, 15th day", "Meiji gannen",
// "Qianlong period".
func (p *parser) eraRoman(lo, hi int) (eraDate, []eraRef, bool, error) {
	s := p.in
	var buf [12][2]int
	ws := p.tokens(lo, hi, buf[:0])
	if len(ws) == 0 {
		return eraDate{}, nil, false, nil
	}
	w := func(k int) string { return s[ws[k][0]:ws[k][1]] }
	// the era name: one word, or two ("Man en", "Ch'ien lung")
	var refs []eraRef
	n := 0
	if len(ws) >= 2 && !isDigit(w(1)[0]) {
		refs, n = eraIndex[foldLatin(w(0)+w(1))], 2
	}
	if refs == nil {
		refs, n = eraIndex[foldLatin(w(0))], 1
	}
	if refs == nil && len(ws) >= 2 && (strings.EqualFold(w(0), "king") || strings.EqualFold(w(0), "emperor")) {
		refs, n = eraIndex[foldLatin(w(1))], 2
	}
	if refs == nil {
		return eraDate{}, nil, false, nil
	}
	d := eraDate{pos: ws[0][0]}
	rest := ws[n:]
	r := func(k int) string { return s[rest[k][0]:rest[k][1]] }
	if len(rest) == 0 {
		return d, refs, true, nil // the era alone
	}
	switch strings.ToLower(r(0)) {
	case "period", "reign", "era", "mark", "nengo", "nengō":
		if len(rest) > 1 {
			return d, refs, true, p.fail(rest[1][0], "expected nothing after the era")
		}
		return d, refs, true, nil
	}
	d.pos = rest[0][0]
	y := r(0)
	k := 1
	switch strings.ToLower(y) {
	case "gannen", "first":
		d.year = 1
		if k < len(rest) && strings.EqualFold(r(k), "year") {
			k++
		}
	default:
		// "14" or "14.5.3" (a Korean "12년" too)
		y = strings.TrimSuffix(strings.TrimSuffix(y, "년"), "年")
		parts := strings.Split(y, ".")
		if len(parts) > 3 {
			return d, refs, true, p.failHint(rest[0][0], "expected the year, month and day of the era as 14.5.3", "write Meiji 14.5.3")
		}
		for i, part := range parts {
			v, ok := smallNumber(part)
			if !ok {
				if i == 0 {
					return d, refs, true, p.failHint(rest[0][0], "expected the year of the era after its name",
						"write "+refs[0].e.name+" 4, "+refs[0].e.name+" 4.7.15 or "+refs[0].e.name+" 4, 7th month")
				}
				return d, refs, true, p.fail(rest[0][0], "expected a month and a day as numbers: 14.5.3")
			}
			switch i {
			case 0:
				d.year = v
			case 1:
				d.month = v
			case 2:
				d.day = v
			}
		}
	}
	// ", 7th month", "intercalary 5th month", "15th day", "month 7", "day 15"
	for k < len(rest) {
		word := strings.ToLower(r(k))
		switch {
		case word == "intercalary" || word == "leap" || word == "int." || word == "uru" || word == "urū":
			d.leap = true
			k++
		case word == "month" && k+1 < len(rest):
			v, ok := smallNumber(r(k + 1))
			if !ok {
				return d, refs, true, p.fail(rest[k+1][0], "expected the number of the month")
			}
			d.month = v
			k += 2
		case word == "day" && k+1 < len(rest):
			v, ok := smallNumber(r(k + 1))
			if !ok {
				return d, refs, true, p.fail(rest[k+1][0], "expected the number of the day")
			}
			d.day = v
			k += 2
		default:
			v, ok := ordinalNumber(r(k))
			if !ok {
				return d, refs, true, p.failHint(rest[k][0], "unexpected "+quoteChar(s, rest[k][0])+" in an era date",
					"write "+refs[0].e.name+" 4, 7th month, 15th day, "+refs[0].e.name+" 4, intercalary 5th month or "+refs[0].e.name+" 4.7.15")
			}
			unit := ""
			if k+1 < len(rest) {
				unit = strings.ToLower(r(k + 1))
			}
			switch {
			case unit == "month" || unit == "moon":
				d.month = v
				k += 2
			case unit == "day":
				d.day = v
				k += 2
			case unit == "intercalary" && k+2 < len(rest) && strings.EqualFold(r(k+2), "month"):
				d.month, d.leap = v, true // "5th intercalary month"
				k += 3
			case d.month == 0:
				d.month = v
				k++
			case d.day == 0:
				d.day = v
				k++
			default:
				return d, refs, true, p.fail(rest[k][0], "expected at most a year, a month and a day")
			}
		}
	}
	if d.leap && d.month == 0 {
		return d, refs, true, p.fail(d.pos, "intercalary names a month: write intercalary 5th month")
	}
	if d.day != 0 && d.month == 0 {
		return d, refs, true, p.fail(d.pos, "a day needs its month: write 7th month, 15th day")
	}
	return d, refs, true, nil
}

// smallNumber reads 1 to 4 ASCII digits.
func smallNumber(w string) (int, bool) {
	if len(w) == 0 || len(w) > 4 || !allDigits(w) {
		return 0, false
	}
	v := 0
	for i := 0; i < len(w); i++ {
		v = v*10 + int(w[i]-'0')
	}
	return v, true
}

// ordinalNumber reads "7th", "1st", "7" or "seventh".
func ordinalNumber(w string) (int, bool) {
	if v, ok := smallNumber(w); ok {
		return v, true
	}
	if v, ok := ordinal(w); ok && v < 100 {
		return int(v), true
	}
	return 0, false
}

// eraKanji reads "明治十四年五月三日", "安政四年閏五月", "明治元年",
// "乾隆十二年", "大清乾隆年製", "乾隆年間".
func (p *parser) eraKanji(lo, hi int) (eraDate, []eraRef, bool, error) {
	s := kanjiFold.Replace(strings.TrimSpace(p.in[lo:hi]))
	for _, pre := range []string{"大清国", "大清", "大明", "大日本", "日本", "清", "明朝"} {
		if rest, ok := strings.CutPrefix(s, pre); ok && len(rest) > 0 {
			s = rest
			break
		}
	}
	// the longest era name at the start
	var refs []eraRef
	n := 0
	for k := len(s); k > 0; k-- {
		if r, ok := eraIndex[s[:k]]; ok {
			refs, n = r, k
			break
		}
	}
	if refs == nil {
		return eraDate{}, nil, false, nil
	}
	d := eraDate{pos: lo}
	rest := s[n:]
	for _, mark := range []string{"年製", "年制", "年造", "年間", "年间", "御製", "時代"} {
		if rest == mark {
			return d, refs, true, nil // a reign mark: the whole reign
		}
	}
	if rest == "" {
		return d, refs, true, nil
	}
	yEnd := strings.Index(rest, "年")
	if yEnd <= 0 {
		return d, refs, true, p.failHint(lo, "expected the year of the era and 年", "write 明治十四年 or 安政四年七月")
	}
	y, ok := cjkNumber(rest[:yEnd])
	if !ok || y < 1 || y > 9999 {
		return d, refs, true, p.fail(lo, "expected the year of the era in numerals before 年")
	}
	d.year = int(y)
	rest = rest[yEnd+len("年"):]
	if rest == "" {
		return d, refs, true, nil
	}
	if r, ok := strings.CutPrefix(rest, "閏"); ok {
		d.leap, rest = true, r
	} else if r, ok := strings.CutPrefix(rest, "閠"); ok {
		d.leap, rest = true, r
	}
	mEnd := strings.Index(rest, "月")
	if mEnd <= 0 {
		return d, refs, true, p.failHint(lo, "expected the month and 月 after the year", "write 安政四年七月 or 安政四年閏五月")
	}
	m, ok := cjkNumber(rest[:mEnd])
	if !ok || m < 1 || m > 13 {
		return d, refs, true, p.fail(lo, "expected the month in numerals before 月")
	}
	d.month = int(m)
	rest = rest[mEnd+len("月"):]
	switch rest {
	case "":
		return d, refs, true, nil
	case "朔", "朔日", "一日", "ついたち":
		d.day = 1
		return d, refs, true, nil
	case "晦", "晦日", "晦日日", "みそか":
		d.day = -1
		return d, refs, true, nil
	}
	dd, ok := cjkNumber(strings.TrimSuffix(rest, "日"))
	if !ok || !strings.HasSuffix(rest, "日") || dd < 1 || dd > 30 {
		return d, refs, true, p.failHint(lo, "expected the day in numerals and 日 after the month", "write 明治十四年五月三日")
	}
	d.day = int(dd)
	return d, refs, true, nil
}

// hasCJK reports whether s holds a character of the CJK blocks.
func hasCJK(s string) bool {
	for _, r := range s {
		if r >= 0x3000 && r < 0xA000 || r >= 0xF900 && r < 0xFB00 || r >= 0xFF00 && r < 0xFFF0 || r >= 0x20000 {
			return true
		}
	}
	return false
}
