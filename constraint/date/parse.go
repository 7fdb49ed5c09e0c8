package date

import (
	"slices"
	"strings"
)

// maxInput is the longest text Parse reads; longer input is an error, so
// that a date can never make the parser do unbounded work.
const maxInput = 1024

// maxYear bounds the absolute value of a year. Day numbers of such years
// stay far inside int64, also after widening.
const maxYear = 999_999_999_999

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
	in     string
	cal    Calendar
	marked bool      // the text ends with a calendar marker
	ys     YearStart // the year start of documentary dates, when known
	within []Interval
	era2   int        // an era that a bare year takes from the other end of a range
	unit2  int64      // a unit (100 or 1000 years) a bare ordinal takes from the other end of a range
	ivs    []Interval // room for the alternatives of a single member
	notes  []string

	// Ambiguous texts are read once for each combination of the readings
	// of their ambiguous parts (see choose).
	nsite int
	sites [maxSites]uint8 // how many readings each ambiguous part has
	pick  [maxSites]uint8 // the reading taken of each in this pass
}

// maxSites bounds the ambiguous parts of one text, and maxPasses the
// combinations of their readings.
const (
	maxSites  = 6
	maxPasses = 32
)

// choose registers an ambiguous part with n readings and returns the one
// to take in this pass.
func (p *parser) choose(n int) int {
	k := p.nsite
	if k >= maxSites {
		return 0
	}
	p.nsite++
	p.sites[k] = uint8(n)
	return int(p.pick[k])
}

// note adds a sentence to the date's notes, once.
func (p *parser) note(s string) {
	if !slices.Contains(p.notes, s) {
		p.notes = append(p.notes, s)
	}
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
func Parse(s string) (Date, error) { return ParseWith(s, Options{}) }

// ParseIn is [Parse] with the calendar that unmarked dates are read in. A
// marker at the end of the text ("(Julian)", "O.S.", "(Gregorian)", "N.S.")
// overrides cal.
func ParseIn(s string, cal Calendar) (Date, error) { return ParseWith(s, Options{Calendar: cal}) }

// parse reads p.in in one pass, with the readings p.pick of its ambiguous
// parts.
func (p *parser) parse() (Date, error) {
	s := p.in
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
	if err != nil && (p.hasLetter(lo, hi) || hasNonASCII(s, lo, hi)) {
		// a cyclical year with its range reads as a whole text
		notes, nsite := p.notes, p.nsite
		p.notes, p.nsite = nil, 0
		if cms, ok, cerr := p.cyclical(lo, hi); ok {
			ms, oneOf, err = cms, len(cms) > 1, cerr
		} else {
			p.notes, p.nsite = notes, nsite
		}
	}
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
				p.cal, p.marked = set.cal, true
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
	if k := strings.IndexByte(s[lo:hi], '/'); k >= 0 && !p.dualAt(lo, hi, lo+k) {
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
	d.notes = p.notes
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
