package date

import "testing"

// benchMix is a realistic mix of the dates a case file and the materials
// dataset hold: milestone years, record days and months, claims with
// circa, decades, open bounds, sets, seasons, ancient years.
var benchMix = []string{
	"1874", "1706", "1856~", "1874-05-21", "1905-03", "c. 1870", "1870/1879", "187X",
	"1990s", "../1912-06", "1850/..", "before 1900", "after 1850", "[1667,1668,1670..1672]",
	"1881-21", "1200 BCE", "-2500~", "1704?", "1826/1828", "early 1870s",
}

func BenchmarkParse(b *testing.B) {
	b.ReportAllocs()
	for i := 0; b.Loop(); i++ {
		if _, err := Parse(benchMix[i%len(benchMix)]); err != nil {
			b.Fatal(err)
		}
	}
}

func BenchmarkParseEDTFYear(b *testing.B) {
	b.ReportAllocs()
	for b.Loop() {
		if _, err := Parse("1874"); err != nil {
			b.Fatal(err)
		}
	}
}

func BenchmarkWiden(b *testing.B) {
	d, err := Parse("1870~/1879")
	if err != nil {
		b.Fatal(err)
	}
	c := DefaultCirca()
	b.ReportAllocs()
	for b.Loop() {
		_ = d.Widen(c)
	}
}

func BenchmarkMaxDays(b *testing.B) {
	u := Duration{Years: 1, Months: 6}
	b.ReportAllocs()
	for b.Loop() {
		_ = u.MaxDays()
	}
}

// BenchmarkParseCalendars reads the dates of other calendars: an arithmetic
// calendar, a Gregorian-era date, a lunisolar month (two solstice years of
// astronomy and the union over the period's margins), and a cyclical year
// over forty years.
func BenchmarkParseCalendars(b *testing.B) {
	for _, s := range []string{"15 Ramadan 1300 AH", "Meiji 14.5.3", "Ansei 4, 7th month", "Horse 7 in 1840/1880"} {
		b.Run(s, func(b *testing.B) {
			b.ReportAllocs()
			for b.Loop() {
				if _, err := Parse(s); err != nil {
					b.Fatal(err)
				}
			}
		})
	}
}
