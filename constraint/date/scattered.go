package date

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
