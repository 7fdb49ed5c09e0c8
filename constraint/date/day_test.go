package date

import (
	"fmt"
	"math"
	"testing"
)

// Julian Dates from J. Meeus, Astronomical Algorithms, 2nd ed. (1998),
// chapter 7. Meeus reads dates before 1582 October 15 on the Julian
// calendar, and numbers years astronomically.
func TestMeeusJulianDates(t *testing.T) {
	tests := []struct {
		name    string
		julian  bool // the date is on the Julian calendar
		y       int64
		m       int
		day     float64
		jd      float64
		source  string
		fromMem bool
	}{
		{"1957 Oct 4.81", false, 1957, 10, 4.81, 2436116.31, "Meeus ch. 7, example 7.a (Sputnik 1)", false},
		{"333 Jan 27.5", true, 333, 1, 27.5, 1842713.0, "Meeus ch. 7, example 7.b", false},
		{"2000 Jan 1.5", false, 2000, 1, 1.5, 2451545.0, "Meeus ch. 7, table of Julian Days", false},
		{"1600 Jan 1.0", false, 1600, 1, 1.0, 2305447.5, "Meeus ch. 7, table of Julian Days", false},
		{"-1000 Jul 12.5", true, -1000, 7, 12.5, 1356001.0, "Meeus ch. 7, table of Julian Days", false},
		{"-4712 Jan 1.5", true, -4712, 1, 1.5, 0.0, "Meeus ch. 7, table of Julian Days", false},
		// The following rows of the same table are quoted from memory.
		{"1999 Jan 1.0", false, 1999, 1, 1.0, 2451179.5, "Meeus ch. 7 table, from memory", true},
		{"1987 Jan 27.0", false, 1987, 1, 27.0, 2446822.5, "Meeus ch. 7 table, from memory", true},
		{"1987 Jun 19.5", false, 1987, 6, 19.5, 2446966.0, "Meeus ch. 7 table, from memory", true},
		{"1988 Jan 27.0", false, 1988, 1, 27.0, 2447187.5, "Meeus ch. 7 table, from memory", true},
		{"1988 Jun 19.5", false, 1988, 6, 19.5, 2447332.0, "Meeus ch. 7 table, from memory", true},
		{"1900 Jan 1.0", false, 1900, 1, 1.0, 2415020.5, "Meeus ch. 7 table, from memory", true},
		{"1600 Dec 31.0", false, 1600, 12, 31.0, 2305812.5, "Meeus ch. 7 table, from memory", true},
		{"837 Apr 10.3", true, 837, 4, 10.3, 2026871.8, "Meeus ch. 7 table, from memory", true},
		{"-123 Dec 31.0", true, -123, 12, 31.0, 1676496.5, "Meeus ch. 7 table, from memory", true},
		{"-122 Jan 1.0", true, -122, 1, 1.0, 1676497.5, "Meeus ch. 7 table, from memory", true},
		{"-1000 Feb 29.0", true, -1000, 2, 29.0, 1355866.5, "Meeus ch. 7 table, from memory", true},
		{"-1001 Aug 17.9", true, -1001, 8, 17.9, 1355671.4, "Meeus ch. 7 table, from memory", true},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			var jd float64
			if tt.julian {
				jd = JDFromJulian(tt.y, tt.m, tt.day)
			} else {
				jd = JDFromGregorian(tt.y, tt.m, tt.day)
			}
			if math.Abs(jd-tt.jd) > 1e-6 {
				t.Errorf("JD = %.6f, want %.2f (%s)", jd, tt.jd, tt.source)
			}
			// The day-level part is exact: the day holding JD, and back.
			d, frac := FromJD(tt.jd)
			var want Day
			whole := int(math.Floor(tt.day))
			if tt.julian {
				want = Julian(tt.y, tt.m, whole)
			} else {
				want = Gregorian(tt.y, tt.m, whole)
			}
			if d != want {
				t.Errorf("FromJD(%.2f) day = %d, want %d", tt.jd, d, want)
			}
			if math.Abs(frac-(tt.day-float64(whole))) > 1e-6 {
				t.Errorf("FromJD(%.2f) fraction = %.6f, want %.6f", tt.jd, frac, tt.day-float64(whole))
			}
		})
	}
}

// The Day numbers themselves are integers; these are exact.
func TestDayNumbersExact(t *testing.T) {
	tests := []struct {
		name string
		got  Day
		want Day
	}{
		{"2000-01-01 is JD 2451545 at noon (Meeus ch. 7)", Gregorian(2000, 1, 1), 2451545},
		{"Julian -4712-01-01 is Day 0 (Meeus ch. 7)", Julian(-4712, 1, 1), 0},
		{"Julian 333-01-27 (Meeus ch. 7, example 7.b)", Julian(333, 1, 27), 1842713},
		{"Julian -1000-07-12 (Meeus ch. 7)", Julian(-1000, 7, 12), 1356001},
		{"1957-10-04 (Meeus ch. 7, example 7.a: JD 2436116.31 is in the afternoon of the day numbered 2436116)", Gregorian(1957, 10, 4), 2436116},
		{"Gregorian -4713-11-24 is Day 0 (the proleptic Gregorian date of JD 0; common practice)", Gregorian(-4713, 11, 24), 0},
	}
	for _, tt := range tests {
		if tt.got != tt.want {
			t.Errorf("%s: got %d, want %d", tt.name, tt.got, tt.want)
		}
	}
}

// The leap-year rules (Meeus ch. 7): 1700, 1800, 1900 are not Gregorian
// leap years, 1600 and 2000 are; on the Julian calendar every fourth year
// is one.
func TestLeapYears(t *testing.T) {
	for _, tt := range []struct {
		y                int64
		gregorian, julia bool
	}{
		{1600, true, true}, {1700, false, true}, {1800, false, true}, {1900, false, true},
		{2000, true, true}, {2004, true, true}, {2001, false, false}, {0, true, true},
		{-4, true, true}, {-100, false, true}, {-400, true, true}, {-1, false, false},
	} {
		if IsLeap(tt.y) != tt.gregorian {
			t.Errorf("IsLeap(%d) = %v, want %v", tt.y, !tt.gregorian, tt.gregorian)
		}
		if got := JulianDaysInMonth(tt.y, 2) == 29; got != tt.julia {
			t.Errorf("Julian February %d has 29 days = %v, want %v", tt.y, got, tt.julia)
		}
		if got := Gregorian(tt.y, 3, 1) - Gregorian(tt.y, 2, 28); (got == 2) != tt.gregorian {
			t.Errorf("Gregorian %d: days from 28 Feb to 1 Mar = %d", tt.y, got)
		}
		if got := Julian(tt.y, 3, 1) - Julian(tt.y, 2, 28); (got == 2) != tt.julia {
			t.Errorf("Julian %d: days from 28 Feb to 1 Mar = %d", tt.y, got)
		}
	}
}

// The reform: Thursday 4 October 1582 (Julian) was followed by Friday 15
// October 1582 (Gregorian), consecutive days (Meeus ch. 7).
func TestReform(t *testing.T) {
	last := Julian(1582, 10, 4)
	first := Gregorian(1582, 10, 15)
	if first != last+1 {
		t.Fatalf("Gregorian 1582-10-15 = %d, Julian 1582-10-04 = %d; want consecutive", first, last)
	}
	if y, m, d := last.Civil(); y != 1582 || m != 10 || d != 14 {
		t.Errorf("Julian 1582-10-04 on the proleptic Gregorian calendar = %d-%d-%d, want 1582-10-14", y, m, d)
	}
	if y, m, d := first.JulianCivil(); y != 1582 || m != 10 || d != 5 {
		t.Errorf("Gregorian 1582-10-15 on the Julian calendar = %d-%d-%d, want 1582-10-05", y, m, d)
	}
	// Weekdays: (JD + 1) mod 7 is 0 for Sunday (Meeus ch. 7); 4 is Thursday.
	if wd := (int64(last) + 1) % 7; wd != 4 {
		t.Errorf("weekday of Julian 1582-10-04 = %d, want 4 (Thursday)", wd)
	}
	d, err := Parse("1582-10-04 (Julian)")
	if err != nil {
		t.Fatal(err)
	}
	if got, _ := d.Latest(); got+1 != first {
		t.Errorf("Parse(1582-10-04 (Julian)) = %s; want the day before Gregorian 1582-10-15", got.ISO())
	}
	if d.EDTF() != "1582-10-14" {
		t.Errorf("EDTF() = %q, want 1582-10-14", d.EDTF())
	}
}

// Astronomical year numbering (ISO 8601-1): 1 BCE is year 0, 2 BCE is
// year -1; there is no year 0 in the BCE/AD count.
func TestAstronomicalYears(t *testing.T) {
	for _, tt := range []struct{ in, edtf string }{
		{"1 BCE", "0000"},
		{"2 BCE", "-0001"},
		{"AD 1", "0001"},
		{"1200 BCE", "-1199"},
		{"44 BC", "-0043"},
	} {
		d, err := Parse(tt.in)
		if err != nil {
			t.Fatalf("Parse(%q): %v", tt.in, err)
		}
		if d.EDTF() != tt.edtf {
			t.Errorf("Parse(%q).EDTF() = %q, want %q", tt.in, d.EDTF(), tt.edtf)
		}
	}
	// 1 BCE ends the day before AD 1 begins.
	if Gregorian(0, 12, 31)+1 != Gregorian(1, 1, 1) {
		t.Error("year 0 does not run into year 1")
	}
	if got := Gregorian(-1199, 1, 1).ISO(); got != "-1199-01-01" {
		t.Errorf("ISO of 1200 BCE = %q, want -1199-01-01", got)
	}
	if got := FormatYear(-44); got != "-0044" {
		t.Errorf("FormatYear(-44) = %q", got)
	}
}

// Civil and JulianCivil invert Gregorian and Julian for every day of a
// 400-year cycle on both sides of the epoch, and days follow each other.
func TestCivilRoundTripCycle(t *testing.T) {
	for _, start := range []Day{Gregorian(-800, 1, 1), Gregorian(1600, 1, 1)} {
		prevY, prevM, prevD := (start - 1).Civil()
		for d := start; d < start+146097; d++ {
			y, m, dd := d.Civil()
			if Gregorian(y, m, dd) != d {
				t.Fatalf("Gregorian(Civil(%d)) != %d", d, d)
			}
			if dd != prevD+1 && !(dd == 1 && prevD == DaysInMonth(prevY, prevM)) {
				t.Fatalf("day %d: %d-%d-%d does not follow %d-%d-%d", d, y, m, dd, prevY, prevM, prevD)
			}
			prevY, prevM, prevD = y, m, dd
			jy, jm, jd := d.JulianCivil()
			if Julian(jy, jm, jd) != d {
				t.Fatalf("Julian(JulianCivil(%d)) != %d", d, d)
			}
		}
	}
}

// ISO and FormatYear agree with the plain printf formulation of ISO 8601
// (four digits at least, a minus sign below year 0) over a wide range of
// days and years, including the extremes of int64 years.
func TestISOMatchesPrintf(t *testing.T) {
	for d := Gregorian(-12000, 1, 1); d < Gregorian(12100, 1, 1); d += 17 {
		y, m, dd := d.Civil()
		want := fmt.Sprintf("%04d-%02d-%02d", y, m, dd)
		if y < 0 {
			want = fmt.Sprintf("-%04d-%02d-%02d", -y, m, dd)
		}
		if got := d.ISO(); got != want {
			t.Fatalf("Day(%d).ISO() = %q, want %q", d, got, want)
		}
	}
	for _, y := range []int64{0, 1, 9, 10, 99, 100, 999, 1000, 9999, 10000, -1, -9, -10, -999, -1000, -10000, math.MaxInt64, math.MinInt64 + 1} {
		want := fmt.Sprintf("%04d", y)
		if y < 0 {
			want = fmt.Sprintf("-%04d", -y)
		}
		if got := FormatYear(y); got != want {
			t.Errorf("FormatYear(%d) = %q, want %q", y, got, want)
		}
	}
	if got := FormatYear(math.MinInt64); got != "-9223372036854775808" {
		t.Errorf("FormatYear(MinInt64) = %q", got)
	}
}
