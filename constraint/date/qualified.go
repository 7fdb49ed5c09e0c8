package date

import "errors"

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
