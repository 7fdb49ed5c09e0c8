// Package wording holds the words terminus shows people, written once for
// every format (text, Markdown, HTML, the picture, the survey summaries
// and the local page): days and bounds as people write them, durations,
// the tiers in graded words, and the cautions every report carries.
//
// The reasoner uses it for the chains of evidence it writes; the report
// writers for everything else. Nothing here reasons: it only says.
package wording

import (
	"fmt"
	"strings"

	"terminus/constraint/date"
)

var monthAbbr = [...]string{"", "Jan", "Feb", "Mar", "Apr", "May", "Jun", "Jul", "Aug", "Sep", "Oct", "Nov", "Dec"}

// MonthAbbr is the English abbreviation of month m (1–12): "Jan".
func MonthAbbr(m int) string { return monthAbbr[m] }

// YearText writes an astronomical year as people do: "1200 BCE" for -1199,
// "1 CE" and "79 CE" below 1000, "1870" from 1000 on.
func YearText(y int64) string {
	if y < 1000 {
		return date.YearForPeople(y)
	}
	return date.FormatYear(y)
}

// Bound shows a day as people write a bound: the year alone when the bound
// is the first (lower) or last (upper) day of a year, the month when it is
// the first or last of a month, else the day. Years before 1000 are
// written with their era ("1200 BCE", "Mar 79 CE", "24 Aug 79 CE"); later
// ones in ISO 8601 ("1870-05", "1868-04-12").
func Bound(d date.Day, upper bool) string {
	y, m, dd := d.Civil()
	yearText := YearText(y)
	if !upper && m == 1 && dd == 1 || upper && m == 12 && dd == 31 {
		return yearText
	}
	if !upper && dd == 1 || upper && dd == date.DaysInMonth(y, m) {
		if y < 1000 {
			return fmt.Sprintf("%s %s", MonthAbbr(m), yearText)
		}
		return fmt.Sprintf("%s-%02d", date.FormatYear(y), m)
	}
	if y < 1000 {
		return fmt.Sprintf("%d %s %s", dd, MonthAbbr(m), yearText)
	}
	return d.ISO()
}

// Duration says a duration in words: "7 years", "1 year 6 months",
// "0 days".
func Duration(d date.Duration) string {
	var parts []string
	add := func(n int64, unit string) {
		if n == 0 {
			return
		}
		parts = append(parts, fmt.Sprintf("%d %s", n, Plural(int(n), unit, unit+"s")))
	}
	add(d.Years, "year")
	add(d.Months, "month")
	add(d.Weeks, "week")
	add(d.Days, "day")
	if len(parts) == 0 {
		return "0 days"
	}
	return strings.Join(parts, " ")
}

// Cautions are the limits every report states, in every format.
func Cautions() []string {
	return []string{
		"Material evidence can rule dates out; it never proves a date, nor that an object is authentic.",
		"A bound from a material holds only if the finding belongs to that event: not to a later retouching, a consolidant, a fill or a contamination.",
		"Absence proves nothing: a material not detected may be below the detection limit, or not sampled.",
		"Dataset dates are only as good as their sources and may be revised; a first date of making, sale or arrival is the earliest known, not a rule of nature.",
		"This is no authentication certificate and no legal opinion: defer to qualified conservators, accredited laboratories and the laws on cultural property that apply.",
	}
}

// The tiers in graded words, strongest first: what a hard bound says, and
// what firm and soft bounds say.
var (
	tierNames  = [3]string{"hard", "firm", "soft"}
	lowerWords = [3]string{"cannot be earlier than", "is unlikely to be earlier than", "would be unusual before"}
	upperWords = [3]string{"cannot be later than", "is unlikely to be later than", "would be unusual after"}
)

// Tier names a tier (0 hard, 1 firm, 2 soft).
func Tier[T ~int8 | ~int](t T) string { return tierNames[t] }

// NotBefore says what a lower bound of a tier means: "cannot be earlier
// than" (hard), "is unlikely to be earlier than" (firm), "would be unusual
// before" (soft).
func NotBefore[T ~int8 | ~int](t T) string { return lowerWords[t] }

// NotAfter is [NotBefore] for an upper bound.
func NotAfter[T ~int8 | ~int](t T) string { return upperWords[t] }

// chainShown is how many ids of a chain are written out in full; a longer
// chain shows its first and last two with the count of those between.
const chainShown = 6

// Chain writes the ids of a chain of evidence with arrows: "r-dendro →
// order:felling>heartwood", or for a long one "r → o1 → … 996 more … →
// o998 → o999", so that a report of a long order of events grows with
// the case, not with its square.
func Chain(ids []string) string {
	if len(ids) <= chainShown {
		return strings.Join(ids, " → ")
	}
	return strings.Join(ids[:2], " → ") + " → … " + itoa(len(ids)-4) + " more … → " + strings.Join(ids[len(ids)-2:], " → ")
}
