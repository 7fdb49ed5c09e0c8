package wording

import "strconv"

// AxisYear writes the label of a tick on a year axis whose ticks are
// counted in the years people use, with no year 0: h > 0 is a year of the
// common era ("1850"), h < 0 a year before it ("1200 BCE" for -1200), and
// h == 0, which people skip, is shown as the first year of the era
// ("1 CE").
func AxisYear(h int64) string {
	switch {
	case h < 0:
		return strconv.FormatInt(-h, 10) + " BCE"
	case h == 0:
		return "1 CE"
	}
	return strconv.FormatInt(h, 10)
}
