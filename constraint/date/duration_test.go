package date

import (
	"errors"
	"testing"
)

func TestParseDuration(t *testing.T) {
	tests := []struct {
		in   string
		want Duration
		str  string
	}{
		{"P2Y", Duration{Years: 2}, "P2Y"},
		{"P6M", Duration{Months: 6}, "P6M"},
		{"P10D", Duration{Days: 10}, "P10D"},
		{"P1Y6M", Duration{Years: 1, Months: 6}, "P1Y6M"},
		{"P2W", Duration{Weeks: 2}, "P2W"},
		{"P1Y2M3W4D", Duration{1, 2, 3, 4}, "P1Y2M3W4D"},
		{"P0D", Duration{}, "P0D"},
		{"p5y", Duration{Years: 5}, "P5Y"},
		{" P18M ", Duration{Months: 18}, "P18M"},
	}
	for _, tt := range tests {
		got, err := ParseDuration(tt.in)
		if err != nil {
			t.Errorf("ParseDuration(%q): %v", tt.in, err)
			continue
		}
		if got != tt.want {
			t.Errorf("ParseDuration(%q) = %+v, want %+v", tt.in, got, tt.want)
		}
		if got.String() != tt.str {
			t.Errorf("String() = %q, want %q", got.String(), tt.str)
		}
	}
	bad := []struct {
		in  string
		pos int
	}{
		{"", 0}, {"P", 1}, {"2Y", 0}, {"PY", 1}, {"P2", 2}, {"PT12H", 1}, {"P1DT2H", 3},
		{"P1.5Y", 2}, {"P1M2Y", 4}, {"P1Y1Y", 4}, {"P3Q", 2}, {"P-1Y", 1},
		{"P9999999999999D", 1}, {"P1000000000Y", 1},
	}
	for _, tt := range bad {
		_, err := ParseDuration(tt.in)
		var pe *ParseError
		if !errors.As(err, &pe) {
			t.Errorf("ParseDuration(%q) error = %v, want *ParseError", tt.in, err)
			continue
		}
		if pe.Pos != tt.pos || pe.Input != tt.in {
			t.Errorf("ParseDuration(%q) error at %d (%v), want at %d", tt.in, pe.Pos, pe, tt.pos)
		}
	}
}

// naiveAdd adds the years, then the months one at a time, clamping the day at the end only,
// then days: an independent version of Duration.AddTo.
func naiveAdd(u Duration, d Day) Day {
	y, m, dd := d.Civil()
	y += u.Years
	for k := int64(0); k < u.Months; k++ {
		m++
		if m == 13 {
			m, y = 1, y+1
		}
	}
	if dim := DaysInMonth(y, m); dd > dim {
		dd = dim
	}
	return Gregorian(y, m, dd) + Day(7*u.Weeks+u.Days)
}

func TestAddTo(t *testing.T) {
	tests := []struct {
		from string
		u    Duration
		want string
	}{
		{"2001-01-31", Duration{Months: 1}, "2001-02-28"},
		{"2000-01-31", Duration{Months: 1}, "2000-02-29"},
		{"2000-02-29", Duration{Years: 1}, "2001-02-28"},
		{"2000-02-29", Duration{Years: 4}, "2004-02-29"},
		{"1999-08-31", Duration{Years: 1, Months: 6}, "2001-02-28"},
		{"1874-05-21", Duration{Weeks: 2, Days: 1}, "1874-06-05"},
		{"-0001-12-31", Duration{Days: 1}, "0000-01-01"},
		{"1582-10-14", Duration{Days: 1}, "1582-10-15"},
	}
	for _, tt := range tests {
		d, err := Parse(tt.from)
		if err != nil {
			t.Fatal(err)
		}
		from, _ := d.Earliest()
		if got := tt.u.AddTo(from).ISO(); got != tt.want {
			t.Errorf("%s + %s = %s, want %s", tt.from, tt.u, got, tt.want)
		}
	}
}

// MinDays and MaxDays are the fewest and most days over every start day:
// checked by brute force over all 146097 start days of a 400-year cycle
// (after which the Gregorian calendar repeats), with the independent
// naiveAdd.
func TestMinMaxDaysBruteForce(t *testing.T) {
	tests := []struct {
		u        Duration
		min, max int64 // expected, where known independently
	}{
		{Duration{Months: 1}, 28, 31},             // the shortest and longest month (common practice)
		{Duration{Years: 1}, 365, 366},            // common and leap years (common practice)
		{Duration{Years: 1, Months: 6}, 546, 550}, // computed here by brute force; the documented figures
		{Duration{Months: 2}, 59, 62},             // Jan–Feb of a common year; Jul–Aug (common practice)
		{Duration{Months: 6}, 181, 184},           // January–June of a common year; March–August (common practice)
		{Duration{Years: 4}, 1460, 1461},          // one 29 February in four years, none across 1900 (common practice)
		{Duration{Years: 100}, 36524, 36525},      // 24 or 25 leap days in a century (common practice)
		{Duration{Years: 400}, 146097, 146097},    // the Gregorian cycle (common practice)
		{Duration{Years: 401, Months: 1, Weeks: 1, Days: 1}, -1, -1},
		{Duration{Weeks: 2, Days: 3}, 17, 17},
		{Duration{Years: 5}, 1825, 1827},  // one or two 29 Februaries in five years; from a 29 February one day less
		{Duration{Years: 25}, 9130, 9132}, // 5 to 7 leap days (brute force; 2100 is no leap year)
		{Duration{Years: 80}, -1, -1},
		{Duration{Years: 399}, -1, -1},
		{Duration{Years: 800, Months: 12}, -1, -1},
		{Duration{Years: 3, Months: 24}, -1, -1},
		{Duration{}, 0, 0},
	}
	start := Gregorian(2000, 3, 1)
	for _, tt := range tests {
		t.Run(tt.u.String(), func(t *testing.T) {
			lo, hi := int64(1)<<62, int64(-1)<<62
			for d := start; d < start+146097; d++ {
				s := int64(naiveAdd(tt.u, d) - d)
				lo, hi = min(lo, s), max(hi, s)
			}
			if got := tt.u.MinDays(); got != lo {
				t.Errorf("MinDays() = %d, brute force %d", got, lo)
			}
			if got := tt.u.MaxDays(); got != hi {
				t.Errorf("MaxDays() = %d, brute force %d", got, hi)
			}
			if tt.min >= 0 && (lo != tt.min || hi != tt.max) {
				t.Errorf("brute force = %d..%d, want %d..%d", lo, hi, tt.min, tt.max)
			}
			t.Logf("%s spans %d to %d days", tt.u, lo, hi)
		})
	}
}
