package date_test

import (
	"fmt"

	"terminus/constraint/date"
)

func ExampleParse() {
	for _, s := range []string{"1874-05", "c. 1870", "early 1870s", "1200 BCE", "before 1900", "[1667,1668,1670..1672]"} {
		d, err := date.Parse(s)
		if err != nil {
			fmt.Println(err)
			continue
		}
		fmt.Printf("%-24s %-24s %s", s, d.EDTF(), d)
		for _, a := range d.Alternatives {
			first, last := "..", ".."
			if !a.OpenStart {
				first = a.First.ISO()
			}
			if !a.OpenEnd {
				last = a.Last.ISO()
			}
			fmt.Printf(" [%s %s]", first, last)
		}
		fmt.Println()
	}
	// Output:
	// 1874-05                  1874-05                  May 1874 [1874-05-01 1874-05-31]
	// c. 1870                  1870~                    c. 1870 [1870-01-01 1870-12-31]
	// early 1870s              1870/1873                1870 to 1873 [1870-01-01 1873-12-31]
	// 1200 BCE                 -1199                    1200 BCE [-1199-01-01 -1199-12-31]
	// before 1900              ../1899                  up to 1899 [.. 1899-12-31]
	// [1667,1668,1670..1672]   [1667,1668,1670..1672]   one of 1667, 1668, 1670 to 1672 [1667-01-01 1668-12-31] [1670-01-01 1672-12-31]
}

func ExampleParse_error() {
	_, err := date.Parse("1874-13")
	fmt.Println(err)
	// Output:
	// date "1874-13" at column 6: month 13: months are 01–12, seasons 21–24 (and 25–41, ISO 8601-2 divisions of the year)
}

func ExampleDate_Widen() {
	d, _ := date.Parse("1870~/1879")
	w := d.Widen(date.DefaultCirca())
	first, _ := w.Earliest()
	last, _ := w.Latest()
	fmt.Println(first.ISO(), last.ISO())
	// Output:
	// 1865-01-01 1879-12-31
}

func ExampleDuration_MinDays() {
	u, _ := date.ParseDuration("P1Y6M")
	fmt.Println(u.MinDays(), u.MaxDays())
	// Output:
	// 546 550
}

func ExampleParseIn() {
	d, _ := date.ParseIn("1582-10-04", date.CalendarJulian)
	fmt.Println(d.EDTF(), d)
	// Output:
	// 1582-10-14 4 October 1582 (Julian)
}
