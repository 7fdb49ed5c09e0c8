package date

import (
	"slices"
	"strings"
)

// Options are the settings a text is read with where it does not say: a
// case's or a record's calendar, the year start of its documents, and the
// range that a repeating cycle (a zodiac year) is looked for in.
type Options struct {
	// Calendar is the calendar of unmarked Western dates (Gregorian or
	// Julian); for the cyclical East Asian forms ("Horse 7", "gengzi") it
	// may name the lunisolar calendar (Japanese, Chinese or Korean) they
	// are read in. A marker at the end of the text overrides it.
	Calendar Calendar
	// YearStart is the day on which the year number of documentary dates
	// (with a month name: "10 February 1712") changes. Unknown leaves an Old
	// Style date of 1 January to 24 March ambiguous: it is read as one of
	// its two years.
	YearStart YearStart
	// Within limits a repeating cycle written without a range of its own
	// ("year of the horse"): only the matching years or months that meet
	// it are read. A record's between is the natural source.
	Within Date
}

// YearStart is the first day of the year in which a document counted its
// year numbers. EDTF numbers years from 1 January (ISO 8601) whatever
// the setting; the year start applies to dates written with a month name.
type YearStart uint8

// The year starts.
const (
	YearStartUnknown   YearStart = iota // not said: Julian 1 January–24 March dates read as one of two years
	YearStartJanuary                    // 1 January (the modern style, Scotland from 1600)
	YearStartLadyDay                    // 25 March, after 1 January (England and its colonies before 1752)
	YearStartMarch                      // 1 March (Venice, more veneto)
	YearStartChristmas                  // 25 December, before 1 January (the Nativity style)
)

var yearStartNames = [...]string{"unknown", "1 January", "25 March", "1 March", "25 December"}

// String returns the day a year starts on: "25 March".
func (y YearStart) String() string {
	if int(y) < len(yearStartNames) {
		return yearStartNames[y]
	}
	return "unknown"
}

// ParseYearStart reads a year start as a case file writes it: "1 January"
// (or "january"), "25 March" (or "lady day", "annunciation", "english"),
// "1 March" (or "venetian"), "25 December" (or "christmas", "nativity").
func ParseYearStart(s string) (YearStart, error) {
	k := strings.ToLower(strings.Join(strings.Fields(s), " "))
	switch k {
	case "1 january", "january 1", "january", "jan 1", "1 jan", "modern", "circumcision":
		return YearStartJanuary, nil
	case "25 march", "march 25", "lady day", "ladyday", "annunciation", "english", "old style", "florentine":
		return YearStartLadyDay, nil
	case "1 march", "march 1", "march", "venetian", "more veneto":
		return YearStartMarch, nil
	case "25 december", "december 25", "christmas", "nativity":
		return YearStartChristmas, nil
	}
	return YearStartUnknown, &ParseError{Input: s, Msg: "unknown year start: expected 1 January, 25 March, 1 March or 25 December",
		hint: "English documents before 1752 began the year on 25 March: year_start: 25 March"}
}

// CalendarNames are the names a case file gives its calendars, as
// [ParseCalendar] reads them (each also has other spellings).
func CalendarNames() []string {
	return []string{"gregorian", "julian", "japanese", "chinese", "korean", "islamic", "persian", "hebrew", "french republican", "buddhist", "roc"}
}

// calendarList writes the names for a message: "gregorian, julian … or roc".
func calendarList() string {
	n := CalendarNames()
	return strings.Join(n[:len(n)-1], ", ") + " or " + n[len(n)-1]
}

// ParseCalendar reads a calendar's name as a case file writes it:
// gregorian, julian, japanese, chinese, korean, islamic (or hijri),
// persian (or solar hijri), hebrew, french republican, buddhist, roc (or
// minguo).
func ParseCalendar(s string) (Calendar, error) {
	k := strings.ToLower(strings.Join(strings.Fields(strings.ReplaceAll(s, "-", " ")), " "))
	switch k {
	case "gregorian", "new style", "n.s.":
		return CalendarGregorian, nil
	case "julian", "old style", "o.s.":
		return CalendarJulian, nil
	case "japanese":
		return CalendarJapanese, nil
	case "chinese":
		return CalendarChinese, nil
	case "korean":
		return CalendarKorean, nil
	case "islamic", "hijri", "muslim":
		return CalendarIslamic, nil
	case "persian", "solar hijri", "jalali", "iranian":
		return CalendarPersian, nil
	case "hebrew", "jewish":
		return CalendarHebrew, nil
	case "french republican", "republican", "french":
		return CalendarFrenchRepublican, nil
	case "buddhist", "thai":
		return CalendarBuddhist, nil
	case "roc", "minguo", "republic of china":
		return CalendarROC, nil
	}
	return CalendarGregorian, &ParseError{Input: s, Msg: "unknown calendar: expected " + calendarList(),
		hint: "write calendar: julian for documents dated before the Gregorian reform"}
}

// ParseWith is [Parse] with the settings o. A text whose parts can be read
// in several ways (an Old Style date of February whose year start is not
// known) is read in every way, and the date is the one-of set of the
// readings; its notes say so.
func ParseWith(s string, o Options) (Date, error) {
	p := parser{in: s, cal: o.Calendar, ys: o.YearStart, within: o.Within.Alternatives}
	d, err := p.parse()
	if err != nil || p.nsite == 0 {
		return d, err
	}
	return p.everyReading(d, o)
}

// everyReading reads p.in again for every other combination of the
// readings of its ambiguous parts, and returns the one-of set of all.
func (p *parser) everyReading(first Date, o Options) (Date, error) {
	sites := p.sites
	n := p.nsite
	ms := append([]member(nil), first.members...)
	notes := append([]string(nil), first.notes...)
	var pick [maxSites]uint8
	for pass := 1; pass < maxPasses; pass++ {
		// the next combination, as an odometer over the sites
		k := 0
		for ; k < n; k++ {
			pick[k]++
			if pick[k] < sites[k] {
				break
			}
			pick[k] = 0
		}
		if k == n {
			break
		}
		q := parser{in: p.in, cal: o.Calendar, ys: o.YearStart, within: p.within, pick: pick}
		d, err := q.parse()
		if err != nil {
			return Date{}, err
		}
		ms = append(ms, d.members...)
		for _, s := range d.notes {
			if !slices.Contains(notes, s) {
				notes = append(notes, s)
			}
		}
	}
	for i := range ms {
		// an unknown end is read as open; in a set it is written so
		if ms[i].kind&unknownStart != 0 {
			ms[i].kind = ms[i].kind&^unknownStart | openStart
		}
		if ms[i].kind&unknownEnd != 0 {
			ms[i].kind = ms[i].kind&^unknownEnd | openEnd
		}
	}
	q := parser{in: p.in, notes: notes}
	return q.finish(ms, true), nil
}
