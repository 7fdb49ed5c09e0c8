package date

import (
	"slices"
	"strings"
	"testing"
)

func TestCyclical(t *testing.T) {
	tests := []struct {
		in     string
		o      Options
		want   []string // the alternatives
		reason string
	}{
		// 1846, 1858 and 1870 were horse years (1846 丙午, 1858 戊午, 1870 庚午),
		// the stem-branch cycle from 1984 = 甲子 (jiazi), a convention the
		// whole East Asian calendar shares.
		{"year of the horse in 1840/1880", Options{}, []string{"1846-01-27→1847-02-14", "1858-02-14→1859-02-02", "1870-01-31→1871-02-18"},
			"three horse years; each the union of its Chinese and Japanese lunisolar years"},
		{"year of the horse", Options{Within: mustParse(t, "1840/1880")}, []string{"1846-01-27→1847-02-14", "1858-02-14→1859-02-02", "1870-01-31→1871-02-18"},
			"the range may come from the settings"},
		{"Snake 7 in 1850/1860", Options{Calendar: CalendarJapanese}, []string{"1857-08-20→1857-09-17"},
			"a seal's animal and month: Ansei 4, 7th month, in the Japanese calendar"},
		{"巳七月 in 1850/1860 (Japanese)", Options{}, []string{"1857-08-20→1857-09-17"}, "the same seal in characters, with a marker"},
		{"fire horse in 1900/2000", Options{}, []string{"1906-01-01→1907-02-12", "1966-01-01→1967-02-08"},
			"丙午 (hinoe-uma): in Japan from 1873 the year is the Gregorian year"},
		{"hinoe-uma in 1900/2000", Options{Calendar: CalendarJapanese}, []string{"1906-01-01→1906-12-31", "1966-01-01→1966-12-31"},
			"the Japanese name of the pair; Japanese years after 1873 are Gregorian"},
		{"gengzi in 1800/1999", Options{Calendar: CalendarChinese}, []string{"1840-02-03→1841-01-22", "1900-01-31→1901-02-18", "1960-01-28→1961-02-14"},
			"a stem-branch pair repeats every 60 years"},
		{"year of the horse in 1846-06/1846-12", Options{}, []string{"1846-06-01→1846-12-31"},
			"the matching year is cut to the range"},
	}
	for _, tc := range tests {
		t.Run(tc.in, func(t *testing.T) {
			d, err := ParseWith(tc.in, tc.o)
			if err != nil {
				t.Fatalf("%s: %v", tc.reason, err)
			}
			if got := iso(d); !slices.Equal(got, tc.want) {
				t.Errorf("%s: %v, want %v", tc.reason, got, tc.want)
			}
			if !strings.Contains(strings.Join(d.Notes(), " "), "repeats every") {
				t.Errorf("%s: notes %q do not say how the cycle was limited", tc.reason, d.Notes())
			}
			checkDate(t, tc.in, d)
		})
	}
}

// The calendar setting chooses between a Japanese and a Chinese era of the
// same characters.
func TestAmbiguousEra(t *testing.T) {
	both, err := Parse("正德三年")
	if err != nil || len(both.Alternatives) != 2 {
		t.Fatalf("正德三年 = %v, %v: want Shōtoku 3 and Zhengde 3", iso(both), err)
	}
	jp, err := ParseWith("正德三年", Options{Calendar: CalendarJapanese})
	if err != nil || len(jp.Alternatives) != 1 || jp.Calendar() != CalendarJapanese {
		t.Errorf("正德三年 in a Japanese case = %v, %v", iso(jp), err)
	}
}

// A Joseon reign year is one of two lunisolar years (the annals count from
// the year after the accession; Yeongjo acceded in 1724, as the list of
// Joseon monarchs gives).
func TestKoreanReignYears(t *testing.T) {
	d, err := Parse("Yeongjo 12")
	if err != nil {
		t.Fatal(err)
	}
	if len(d.members) != 2 || !strings.Contains(d.String(), "the lunisolar year 1735") || !strings.Contains(d.String(), "the lunisolar year 1736") {
		t.Errorf("Yeongjo 12 = %s, want one of the lunisolar years 1735 and 1736", d)
	}
	for _, s := range []string{"英祖十二年", "영조 12년", "King Yeongjo 12"} {
		if o, err := Parse(s); err != nil || o.EDTF() != d.EDTF() {
			t.Errorf("%s = %v, %v; want the same days as Yeongjo 12 (%s)", s, o.EDTF(), err, d.EDTF())
		}
	}
	if _, err := Parse("Sejong 40"); err == nil || !strings.Contains(err.Error(), "Sejong has years 1 to 33 (1418–1450)") {
		t.Errorf("Sejong 40: %v, want the reign's span", err)
	}
}
