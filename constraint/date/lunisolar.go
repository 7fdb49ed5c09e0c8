package date

import (
	"math"
	"sort"
)

// The East Asian lunisolar calendars (Chinese, Japanese, Korean), computed
// from the astronomy of astro.go by the rules of E. M. Reingold and N.
// Dershowitz, Calendrical Calculations ("The Chinese calendar"): a month
// begins on the day of a new moon at the calendar's meridian; the month
// that holds the winter solstice is the 11th; a year of solstice to
// solstice (a sui) with 13 months has a leap month, the first of them
// that holds no major solar term (a multiple of 30° of the sun's
// longitude), which repeats the number of the month before it.
//
// The historical calendars were not computed this way throughout: China
// used mean solar terms for the leap month until 1645, and Beijing local
// time until 1929; Japan used Kyoto time and, until 1844, mean solar terms
// from calendars (Senmyō to 1684, Jōkyō, Hōreki, Kansei) whose new moons
// and solstices drifted from the sky; Korea used Seoul's meridian. Where
// a historical calendar's own computation may differ, a month is read as
// the union of its days under every reading of the uncertainty: new moons
// moved earlier and later by a margin, solar terms moved by another, mean
// or true terms as the period used (see lsProfile). A month whose days
// differ between those readings is widened, and the notes say so.

// lsMonth is one month of a lunisolar calendar.
type lsMonth struct {
	year        int64 // the year of the month's 1st month (its Gregorian year)
	num         int   // 1–12
	leap        bool
	first, last Day
}

// lsShift is one reading of a calendar's uncertainty.
type lsShift struct {
	moon, term float64 // days added to new moons and to solar terms
	mean       bool    // mean solar terms (equal parts of the sui)
}

// lsProfile is how a calendar was computed in the sui that ends in
// Gregorian year y: its meridian (hours east of Greenwich), whether its
// terms were mean, and the margins of its new moons and solar terms.
type lsProfile struct {
	hours      float64
	mean       bool
	moonMargin float64
	termShifts []float64
	why        string
}

const hour = 1.0 / 24

func lsProfileOf(cal Calendar, y int64) lsProfile {
	switch cal {
	case CalendarJapanese:
		kyoto := 135.7681 / 15
		switch {
		case y < 1685:
			return lsProfile{kyoto, true, 12 * hour, []float64{-1, 0, 1, 2, 3},
				"the Senmyō calendar (to 1684) used mean solar terms and had drifted from the sky by about two days"}
		case y < 1755:
			return lsProfile{kyoto, true, 3 * hour, []float64{-1, 0, 1}, "the Jōkyō calendar (1685–1754) used mean solar terms"}
		case y < 1798:
			return lsProfile{kyoto, true, 6 * hour, []float64{-1, 0, 1}, "the Hōreki calendar (1755–1797) used mean solar terms and was known for its errors"}
		case y < 1844:
			return lsProfile{kyoto, true, 2 * hour, []float64{-1, 0, 1}, "the Kansei calendar (1798–1843) used mean solar terms"}
		}
		return lsProfile{kyoto, false, hour, []float64{-hour, 0, hour}, "the Tenpō calendar (1844–1872) used true solar terms at Kyoto, with its own solar and lunar theory"}
	case CalendarKorean:
		seoul := 126.978 / 15
		switch {
		case y < 1653:
			return lsProfile{seoul, true, 6 * hour, []float64{-1, 0, 1}, "Korea used mean solar terms until the Shixian calendar of 1653"}
		case y < 1908:
			return lsProfile{seoul, false, hour, []float64{-hour, 0, hour}, "Korea computed the calendar for Seoul with the Shixian methods"}
		case y < 1912:
			return lsProfile{8.5, false, hour, []float64{-hour, 0, hour}, "Korean standard time was UTC+8:30 (1908–1911; other reckonings of these years used UTC+8 or UTC+9)"}
		case y >= 1954 && y < 1961:
			return lsProfile{8.5, false, 15.0 / 1440, []float64{-15.0 / 1440, 0, 15.0 / 1440}, "Korean standard time was UTC+8:30"}
		}
		return lsProfile{9, false, 15.0 / 1440, []float64{-15.0 / 1440, 0, 15.0 / 1440}, "Korean standard time is UTC+9"}
	}
	switch {
	case y < 1645:
		return lsProfile{116.4074 / 15, true, 6 * hour, []float64{-1, 0, 1}, "the Ming Datong calendar (to 1644) used mean solar terms and drifted from the sky"}
	case y < 1929:
		return lsProfile{116.4074 / 15, false, hour, []float64{-2 * hour, 0, 2 * hour},
			"the Qing calendar (1645–1928) used true solar terms at Beijing with its own solar and lunar theory, whose solar terms may differ by an hour or two from the sky"}
	}
	return lsProfile{8, false, 10.0 / 1440, []float64{-10.0 / 1440, 0, 10.0 / 1440}, "the calendar since 1929 uses UTC+8"}
}

// lsSui holds the moments (UT) a sui's months are built from.
type lsSui struct {
	ws1, ws2 float64     // the winter solstices it runs between
	terms    [11]float64 // the true major terms between them
	moons    []float64   // new moons from before ws1 to after ws2
}

// lsSuiOf computes the sui that ends at the winter solstice of year y.
func lsSuiOf(y int64) lsSui {
	var s lsSui
	s.ws1 = solarLongitudeAfter(270, float64(Gregorian(y-1, 12, 1)))
	s.ws2 = solarLongitudeAfter(270, float64(Gregorian(y, 12, 1)))
	t := s.ws1
	for j := range s.terms {
		t = solarLongitudeAfter(math.Mod(270+30*float64(j+1), 360), t+25)
		s.terms[j] = t
	}
	k := newMoonIndex(s.ws1 - 35)
	for {
		m := newMoon(k)
		s.moons = append(s.moons, m)
		if m > s.ws2+35 {
			break
		}
		k++
	}
	return s
}

// months returns the months of the sui under the shift sh at the meridian
// hours, from its 11th month to the month before the next 11th, and the
// first day of that next 11th month.
func (s *lsSui) months(hours float64, sh lsShift) ([]lsMonth, Day) {
	d1 := localDay(s.ws1+sh.term, hours)
	d2 := localDay(s.ws2+sh.term, hours)
	var starts [16]Day
	n := 0
	for _, m := range s.moons {
		if n < len(starts) {
			starts[n] = localDay(m+sh.moon, hours)
			n++
		}
	}
	// the month holding each solstice: the last start on or before it
	i1, i2 := -1, -1
	for i := 0; i < n; i++ {
		if starts[i] <= d1 {
			i1 = i
		}
		if starts[i] <= d2 {
			i2 = i
		}
	}
	var termDays [11]Day
	for j := range termDays {
		t := s.terms[j]
		if sh.mean {
			t = s.ws1 + float64(j+1)*(s.ws2-s.ws1)/12
		}
		termDays[j] = localDay(t+sh.term, hours)
	}
	count := i2 - i1
	leapAt := -1
	if count == 13 {
		for i := i1 + 1; i < i2; i++ {
			has := false
			for _, td := range termDays {
				if td >= starts[i] && td < starts[i+1] {
					has = true
					break
				}
			}
			if !has {
				leapAt = i
				break
			}
		}
	}
	out := make([]lsMonth, 0, 13)
	num := 10
	for i := i1; i < i2; i++ {
		leap := i == leapAt
		if !leap {
			num = num%12 + 1
		}
		out = append(out, lsMonth{num: num, leap: leap, first: starts[i], last: starts[i+1] - 1})
	}
	return out, starts[i2]
}

// lsCalc computes lunisolar years, keeping the suis it has computed.
type lsCalc struct {
	cal  Calendar
	suis map[int64]*lsSui
}

func newLSCalc(cal Calendar) *lsCalc { return &lsCalc{cal: cal, suis: map[int64]*lsSui{}} }

func (c *lsCalc) sui(y int64) *lsSui {
	if s, ok := c.suis[y]; ok {
		return s
	}
	s := lsSuiOf(y)
	c.suis[y] = &s
	return &s
}

// year returns the months of lunisolar year y (from its 1st month to the
// last month before the next 1st) under the shift sh.
func (c *lsCalc) year(y int64, sh lsShift) []lsMonth {
	pa := lsProfileOf(c.cal, y)
	ma, _ := c.sui(y).months(pa.hours, sh)
	pb := lsProfileOf(c.cal, y+1)
	mb, _ := c.sui(y+1).months(pb.hours, sh)
	var out []lsMonth
	started := false
	for _, m := range ma {
		if m.num == 1 && !m.leap {
			started = true
		}
		if started {
			m.year = y
			out = append(out, m)
		}
	}
	for _, m := range mb {
		if m.num == 1 && !m.leap {
			break
		}
		m.year = y
		out = append(out, m)
	}
	return out
}

// shifts lists the readings of the calendar's uncertainty for year y, the
// nominal one first.
func (c *lsCalc) shifts(y int64) []lsShift {
	p := lsProfileOf(c.cal, y)
	out := []lsShift{{mean: p.mean}}
	for _, dm := range []float64{-p.moonMargin, 0, p.moonMargin} {
		for _, dt := range p.termShifts {
			if dm == 0 && dt == 0 {
				continue
			}
			out = append(out, lsShift{moon: dm, term: dt, mean: p.mean})
		}
	}
	return out
}

// lsSpan is the reading of a lunisolar month or year: its days under the
// nominal computation and the union under every reading of the
// uncertainty.
type lsSpan struct {
	first, last   Day  // the union
	lateFirst     Day  // the latest first day of any reading
	earlyLast     Day  // the earliest last day of any reading
	nFirst, nLast Day  // the nominal days, when nominal
	nominal       bool // it exists in the nominal computation
	found         bool // it exists in some reading
}

// month reads month num (leap when leap) of year y.
func (c *lsCalc) month(y int64, num int, leap bool) lsSpan {
	var sp lsSpan
	for i, sh := range c.shifts(y) {
		for _, m := range c.year(y, sh) {
			if m.num != num || m.leap != leap {
				continue
			}
			if i == 0 {
				sp.nominal, sp.nFirst, sp.nLast = true, m.first, m.last
			}
			if !sp.found || m.first < sp.first {
				sp.first = m.first
			}
			if !sp.found || m.last > sp.last {
				sp.last = m.last
			}
			if !sp.found || m.first > sp.lateFirst {
				sp.lateFirst = m.first
			}
			if !sp.found || m.last < sp.earlyLast {
				sp.earlyLast = m.last
			}
			sp.found = true
		}
	}
	return sp
}

// wholeYear reads lunisolar year y: from its 1st month to the day before
// the next 1st month.
func (c *lsCalc) wholeYear(y int64) lsSpan {
	var sp lsSpan
	for i, sh := range c.shifts(y) {
		ms := c.year(y, sh)
		if len(ms) == 0 {
			continue
		}
		a, b := ms[0].first, ms[len(ms)-1].last
		if i == 0 {
			sp.nominal, sp.nFirst, sp.nLast = true, a, b
		}
		if !sp.found || a < sp.first {
			sp.first = a
		}
		if !sp.found || b > sp.last {
			sp.last = b
		}
		sp.found = true
	}
	return sp
}

// leapMonthOf returns the number of the leap month of year y in the nominal
// computation, or 0.
func (c *lsCalc) leapMonthOf(y int64) int {
	for _, m := range c.year(y, c.shifts(y)[0]) {
		if m.leap {
			return m.num
		}
	}
	return 0
}

// at returns the nominal month and day of d.
func (c *lsCalc) at(d Day) (lsMonth, int) {
	y, _, _ := d.Civil()
	for _, yy := range []int64{y, y - 1} {
		ms := c.year(yy, c.shifts(yy)[0])
		i := sort.Search(len(ms), func(i int) bool { return ms[i].last >= d })
		if i < len(ms) && ms[i].first <= d {
			return ms[i], int(d-ms[i].first) + 1
		}
	}
	return lsMonth{}, 0
}
