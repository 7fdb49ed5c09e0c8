package date

import (
	"errors"
	"math/rand/v2"
	"slices"
	"testing"
)

// checkDate checks the invariants of a parsed date: sorted, disjoint,
// non-touching alternatives with First ≤ Last, and a canonical form that
// parses to the same days and to itself.
func checkDate(t *testing.T, in string, d Date) {
	t.Helper()
	if len(d.Alternatives) == 0 {
		t.Fatalf("Parse(%q): no alternatives", in)
	}
	for i, a := range d.Alternatives {
		if !a.OpenStart && !a.OpenEnd && a.First > a.Last {
			t.Fatalf("Parse(%q): alternative %d runs backwards: %v", in, i, a)
		}
		if i > 0 {
			p := d.Alternatives[i-1]
			if p.OpenEnd || a.OpenStart || a.First <= p.Last+1 {
				t.Fatalf("Parse(%q): alternatives %d and %d overlap or touch: %v %v", in, i-1, i, p, a)
			}
		}
	}
	again, err := Parse(d.EDTF())
	if err != nil {
		t.Fatalf("Parse(%q) gave EDTF %q, which does not parse: %v", in, d.EDTF(), err)
	}
	if !slices.Equal(iso(again), iso(d)) {
		t.Fatalf("Parse(%q): EDTF %q reads as %v, want %v", in, d.EDTF(), iso(again), iso(d))
	}
	if again.EDTF() != d.EDTF() {
		t.Fatalf("Parse(%q): EDTF %q is not canonical: it reads back as %q", in, d.EDTF(), again.EDTF())
	}
	if again.Approximate != d.Approximate || again.Uncertain != d.Uncertain {
		t.Fatalf("Parse(%q): EDTF %q loses a qualifier", in, d.EDTF())
	}
	_ = d.String()
	_ = d.Widen(DefaultCirca())
}

func FuzzParse(f *testing.F) {
	for _, s := range []string{
		"1874", "1874-05", "1874-05-21", "-1199", "187X", "18XX", "1874?", "1874~", "1874%",
		"1870/1879", "../1900", "1850/..", "1985/", "/1985", "2001-21", "2001-24", "Y170000002", "Y-17E7",
		"1950S2", "Y3388E2S3", "1985-04-12T23:20:30+04:30", "[1667,1668,1670..1672]", "[..1760-12-03]",
		"[1760-01,1760-02,1760-12..]", "c. 1870", "1870s?", "early 1870s", "1200 BCE", "AD 79",
		"before 1900", "after 1850", "1870-1875", "between 1870 and 1875", "21 May 1874",
		"1582-10-04 (Julian)", "1582~ O.S.", "1985-XX-XX", "1985-04-1X", "1984-1X", "{1667}", "",
		"1985-13", "1985-02-30", "156X-12-25", "2004-06~-11", "[", "/", "../..", "c.", "Y", "-", "X",
		// Old Style, centuries, other calendars
		"10 Feb 1712/13", "1712/3", "10 February 1712 O.S.", "March 1712 (Julian)", "before 11 Feb 1731 O.S.",
		"18th century", "18th c.", "early 18th century", "second quarter of the 19th century",
		"3rd century BCE", "5th millennium BCE", "18th-19th century", "first half of the 18th century",
		"Meiji 14", "Meiji 14.5.3", "Ansei 4, 7th month", "Ansei 4, intercalary 5th month", "明治十四年五月",
		"安政四年七月", "明治元年", "Qianlong 12", "乾隆十二年", "大清乾隆年製", "正德三年", "Ansei 8",
		"year of the horse in 1840/1880", "Horse 7 in 1840/1880", "gengzi in 1800/1999", "庚子 in 1800/1999",
		"1300 AH", "AH 1300", "Muharram 1300", "15 Ramadan 1300 AH", "1300 SH", "1 Farvardin 1300 SH",
		"5600 AM", "1 Tishri 5600", "Adar II 5783", "18 Brumaire an VIII", "an XX", "BE 2475", "民國20年",
		"ROC 20", "c. Meiji 14", "before Meiji 14", "Kansei 3, 13th month", "Reiwa", "Yeongjo 12", "영조 12년",
		"英祖十二年", "Meji 14", "fire horse in 1900/2000", "巳七月 in 1850/1860 (Japanese)",
	} {
		f.Add(s)
	}
	f.Fuzz(func(t *testing.T, s string) {
		d, err := Parse(s)
		if err != nil {
			var pe *ParseError
			if !errors.As(err, &pe) {
				t.Fatalf("Parse(%q) error %T is not a *ParseError", s, err)
			}
			if pe.Pos < 0 || pe.Pos > len(s) || pe.Msg == "" || pe.Input != s {
				t.Fatalf("Parse(%q) error has bad fields: %+v", s, pe)
			}
			return
		}
		checkDate(t, s, d)
		if _, err := ParseIn(s, CalendarJulian); err != nil {
			var pe *ParseError
			if !errors.As(err, &pe) {
				t.Fatalf("ParseIn(%q, Julian) error %T is not a *ParseError", s, err)
			}
		}
	})
}

func FuzzParseDuration(f *testing.F) {
	for _, s := range []string{"P2Y", "P6M", "P10D", "P1Y6M", "P2W", "P0D", "PT1H", "P", ""} {
		f.Add(s)
	}
	f.Fuzz(func(t *testing.T, s string) {
		u, err := ParseDuration(s)
		if err != nil {
			var pe *ParseError
			if !errors.As(err, &pe) || pe.Pos < 0 || pe.Pos > len(s) {
				t.Fatalf("ParseDuration(%q) error %v", s, err)
			}
			return
		}
		v, err := ParseDuration(u.String())
		if err != nil || v != u {
			t.Fatalf("ParseDuration(%q) = %+v; its String %q reads back as %+v, %v", s, u, u.String(), v, err)
		}
		if lo, hi := u.MinDays(), u.MaxDays(); lo > hi || lo < 0 {
			t.Fatalf("%s: MinDays %d, MaxDays %d", u, lo, hi)
		}
	})
}

// Every canonical date parses back to the same days: canonical forms
// generated at random (a fixed seed, so the test is repeatable).
func TestRoundTripGenerated(t *testing.T) {
	r := rand.New(rand.NewPCG(1874, 1906))
	quals := []string{"", "", "?", "~", "%"}
	point := func() string {
		y := r.Int64N(8000) - 4000
		if r.IntN(20) == 0 {
			y = r.Int64N(2_000_000_000) - 1_000_000_000
		}
		b := appendYear(nil, y, 0)
		if y >= 10000 || y <= -10000 {
			return string(b) + quals[r.IntN(len(quals))]
		}
		switch r.IntN(8) {
		case 0: // X digits in the year
			b = appendYear(nil, y, uint8(1+r.IntN(2)))
		case 1, 2: // a month
			b = append(b, '-')
			b = append2(b, 1+r.IntN(12))
		case 3: // a season or division
			b = append(b, '-')
			b = append2(b, 21+r.IntN(21))
		case 4, 5: // a day
			m := 1 + r.IntN(12)
			b = append(b, '-')
			b = append2(b, m)
			b = append(b, '-')
			b = append2(b, 1+r.IntN(DaysInMonth(y, m)))
		case 6: // unspecified day
			b = append(b, '-')
			b = append2(b, 1+r.IntN(12))
			b = append(b, "-XX"...)
		}
		return string(b) + quals[r.IntN(len(quals))]
	}
	for i := 0; i < 5000; i++ {
		var s string
		switch r.IntN(4) {
		case 0:
			s = point()
		case 1:
			a, b := point(), point()
			da, _ := Parse(a)
			db, _ := Parse(b)
			if x, _ := da.Earliest(); func() bool { y, _ := db.Latest(); return x > y }() {
				a, b = b, a
			}
			s = a + "/" + b
		case 2:
			s = point() + "/.."
		case 3:
			s = "[" + point() + "," + point() + ".." + "]"
		}
		d, err := Parse(s)
		if err != nil {
			t.Fatalf("Parse(%q): %v", s, err)
		}
		if d.EDTF() != s {
			t.Fatalf("Parse(%q).EDTF() = %q; a canonical form should come back unchanged", s, d.EDTF())
		}
		checkDate(t, s, d)
	}
}
