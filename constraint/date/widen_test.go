package date

import (
	"errors"
	"slices"
	"testing"
)

func TestDefaultCirca(t *testing.T) {
	c := DefaultCirca()
	want := "day P7D, month P1M, season P1M, year P5Y, decade P5Y, century P25Y, millennium P100Y"
	if c.String() != want {
		t.Errorf("DefaultCirca().String() = %q, want %q", c.String(), want)
	}
	c[PrecisionYear] = Duration{Years: 10}
	if DefaultCirca()[PrecisionYear] != (Duration{Years: 5}) {
		t.Error("changing one policy changed the default")
	}
	if got := (Circa{PrecisionYear: {Years: 2}}).For(PrecisionDecade); got != (Duration{Years: 5}) {
		t.Errorf("missing precision falls back to %v, want P5Y", got)
	}
}

func TestParseCircaKey(t *testing.T) {
	for i, k := range []string{"day", "month", "season", "year", "decade", "century", "millennium"} {
		p, err := ParseCircaKey(k)
		if err != nil || p != Precision(i) {
			t.Errorf("ParseCircaKey(%q) = %v, %v; want %v", k, p, err, Precision(i))
		}
		if p.String() != k {
			t.Errorf("%v.String() = %q, want %q", p, p.String(), k)
		}
	}
	if p, err := ParseCircaKey("Year"); err != nil || p != PrecisionYear {
		t.Errorf("ParseCircaKey(Year) = %v, %v", p, err)
	}
	_, err := ParseCircaKey("years")
	var pe *ParseError
	if !errors.As(err, &pe) || pe.Input != "years" {
		t.Errorf("ParseCircaKey(years) error = %v, want *ParseError", err)
	}
}

func TestWiden(t *testing.T) {
	c := DefaultCirca()
	tests := []struct {
		in     string
		circa  Circa
		widest []string
	}{
		// Year P5Y: five calendar years earlier at the start, five later at
		// the end (1870-01-01 back to 1865-01-01, 1870-12-31 on to 1875-12-31).
		{"1870~", c, []string{"1865-01-01→1875-12-31"}},
		{"1870~/1879", c, []string{"1865-01-01→1879-12-31"}},
		{"1870/1879~", c, []string{"1870-01-01→1884-12-31"}},
		{"1870?", c, []string{"1870-01-01→1870-12-31"}},
		{"1870", c, []string{"1870-01-01→1870-12-31"}},
		// Month P1M: May widens to April–June, its last day to the last of June.
		{"1874-05~", c, []string{"1874-04-01→1874-06-30"}},
		{"1874-05-21~", c, []string{"1874-05-14→1874-05-28"}},
		{"187X~", c, []string{"1865-01-01→1884-12-31"}},
		{"../1900~", c, []string{"..→1905-12-31"}},
		{"1870~", Circa{PrecisionYear: {Years: 1}}, []string{"1869-01-01→1871-12-31"}},
		{"1870~", Circa{PrecisionYear: {}}, []string{"1870-01-01→1870-12-31"}},
		// A month end moved back a month: 31 March to the last day of February.
		{"1870-03-31~", Circa{PrecisionDay: {Months: 1}}, []string{"1870-02-28→1870-04-30"}},
		// Members of a set widen on their own and merge when they meet.
		{"[1870~,1880]", c, []string{"1865-01-01→1875-12-31", "1880-01-01→1880-12-31"}},
		{"[1870~,1878~]", c, []string{"1865-01-01→1883-12-31"}},
	}
	for _, tt := range tests {
		t.Run(tt.in, func(t *testing.T) {
			d, err := Parse(tt.in)
			if err != nil {
				t.Fatal(err)
			}
			w := d.Widen(tt.circa)
			if got := iso(w); !slices.Equal(got, tt.widest) {
				t.Errorf("Widen = %v, want %v", got, tt.widest)
			}
			if w.EDTF() != d.EDTF() {
				t.Errorf("Widen changed EDTF() to %q", w.EDTF())
			}
			// Widening starts from the date as written: twice is once.
			if got := iso(w.Widen(tt.circa)); !slices.Equal(got, tt.widest) {
				t.Errorf("Widen twice = %v, want %v", got, tt.widest)
			}
			if !slices.Equal(iso(d), iso(mustParse(t, tt.in))) {
				t.Error("Widen changed the receiver")
			}
		})
	}
	if got := (Duration{Years: 5}).MaxDays(); got != 1827 {
		t.Errorf("P5Y MaxDays = %d, want 1827 (5 × 365 + 2)", got)
	}
}

func mustParse(t *testing.T, s string) Date {
	t.Helper()
	d, err := Parse(s)
	if err != nil {
		t.Fatal(err)
	}
	return d
}

func TestQualifiedEnds(t *testing.T) {
	for _, tt := range []struct {
		in                     string
		sa, su, ea, eu, da, du bool
	}{
		{"1870~/1879", true, false, false, false, true, false},
		{"1870/1879?", false, false, false, true, false, true},
		{"1870%", true, true, true, true, true, true},
		{"../1900~", false, false, true, false, true, false},
	} {
		d := mustParse(t, tt.in)
		sa, su, ea, eu := d.QualifiedEnds()
		if sa != tt.sa || su != tt.su || ea != tt.ea || eu != tt.eu {
			t.Errorf("%s: QualifiedEnds = %v %v %v %v", tt.in, sa, su, ea, eu)
		}
		if d.Approximate != tt.da || d.Uncertain != tt.du {
			t.Errorf("%s: Approximate, Uncertain = %v, %v", tt.in, d.Approximate, d.Uncertain)
		}
	}
}

func TestSmallAccessors(t *testing.T) {
	if got := Precision(42).String(); got != "Precision(42)" {
		t.Errorf("Precision(42).String() = %q", got)
	}
	if mustParse(t, "1582 (Julian)").Calendar() != CalendarJulian || mustParse(t, "1582").Calendar() != CalendarGregorian {
		t.Error("Calendar() does not say how the date was read")
	}
	if CalendarJulian.String() != "Julian" || CalendarGregorian.String() != "Gregorian" {
		t.Error("Calendar names")
	}
	if y := Gregorian(-1199, 3, 1).Year(); y != -1199 {
		t.Errorf("Year() = %d", y)
	}
	d := mustParse(t, "1870~")
	if d.Widened() || !d.Widen(DefaultCirca()).Widened() {
		t.Error("Widened() does not tell a widened date")
	}
	var zero Date
	if _, ok := zero.Earliest(); ok {
		t.Error("the zero Date has an earliest day")
	}
	if zero.String() != "" || len(zero.Widen(DefaultCirca()).Alternatives) != 0 {
		t.Error("the zero Date is not empty")
	}
}

func TestWidenBy(t *testing.T) {
	c := DefaultCirca()
	for _, tt := range []struct {
		in         string
		start, end string
	}{
		{"1870~", "P5Y", "P5Y"},
		{"1870~/1879-05", "P5Y", "P0D"},
		{"1870/1879-05~", "P0D", "P1M"},
		{"2004-06~-11", "P1M", "P1M"}, // the finest approximate part is the month
		{"?2004-06-~11", "P7D", "P7D"},
		{"187X~", "P5Y", "P5Y"},
		{"../1900~", "P0D", "P5Y"},
		{"1870?", "P0D", "P0D"},
	} {
		s, e := mustParse(t, tt.in).WidenBy(c)
		if s.String() != tt.start || e.String() != tt.end {
			t.Errorf("%s: WidenBy = %s, %s; want %s, %s", tt.in, s, e, tt.start, tt.end)
		}
	}
}
