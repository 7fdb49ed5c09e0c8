package date

import "testing"

// The friendly forms, each with the reading the package documentation
// promises (these meanings are the project's own choices, written down
// there).
func TestFriendly(t *testing.T) {
	tests := []struct {
		in, edtf, people string
		alts             []string
	}{
		{"c. 1870", "1870~", "c. 1870", []string{"1870-01-01→1870-12-31"}},
		{"c.1870", "1870~", "c. 1870", []string{"1870-01-01→1870-12-31"}},
		{"ca 1870", "1870~", "c. 1870", []string{"1870-01-01→1870-12-31"}},
		{"ca. 1870", "1870~", "c. 1870", []string{"1870-01-01→1870-12-31"}},
		{"circa 1870", "1870~", "c. 1870", []string{"1870-01-01→1870-12-31"}},
		{"Circa 1870", "1870~", "c. 1870", []string{"1870-01-01→1870-12-31"}},
		{"about 1870", "1870~", "c. 1870", []string{"1870-01-01→1870-12-31"}},
		{"c. 1870?", "1870%", "c. 1870?", []string{"1870-01-01→1870-12-31"}},
		{"1870s", "187X", "1870s", []string{"1870-01-01→1879-12-31"}},
		{"1870's", "187X", "1870s", []string{"1870-01-01→1879-12-31"}},
		{"1870s?", "187X?", "1870s?", []string{"1870-01-01→1879-12-31"}},
		{"c. 1870s", "187X~", "c. 1870s", []string{"1870-01-01→1879-12-31"}},
		{"1800s", "18XX", "1800s", []string{"1800-01-01→1899-12-31"}},
		{"early 1870s", "1870/1873", "1870 to 1873", []string{"1870-01-01→1873-12-31"}},
		{"mid 1870s", "1873/1876", "1873 to 1876", []string{"1873-01-01→1876-12-31"}},
		{"mid-1870s", "1873/1876", "1873 to 1876", []string{"1873-01-01→1876-12-31"}},
		{"late 1870s", "1876/1879", "1876 to 1879", []string{"1876-01-01→1879-12-31"}},
		{"early 1800s", "1800/1833", "1800 to 1833", []string{"1800-01-01→1833-12-31"}},
		{"late 1800s", "1866/1899", "1866 to 1899", []string{"1866-01-01→1899-12-31"}},
		{"c. early 1870s", "1870~/1873~", "c. 1870 to c. 1873", []string{"1870-01-01→1873-12-31"}},
		{"1200 BCE", "-1199", "1200 BCE", []string{"-1199-01-01→-1199-12-31"}},
		{"1200 BC", "-1199", "1200 BCE", []string{"-1199-01-01→-1199-12-31"}},
		{"1200 B.C.", "-1199", "1200 BCE", []string{"-1199-01-01→-1199-12-31"}},
		{"c. 1200 BCE", "-1199~", "c. 1200 BCE", []string{"-1199-01-01→-1199-12-31"}},
		{"12000 BCE", "Y-11999", "12000 BCE", []string{"-11999-01-01→-11999-12-31"}},
		{"AD 79", "0079", "AD 79", []string{"0079-01-01→0079-12-31"}},
		{"A.D. 79", "0079", "AD 79", []string{"0079-01-01→0079-12-31"}},
		{"79 AD", "0079", "AD 79", []string{"0079-01-01→0079-12-31"}},
		{"79 CE", "0079", "AD 79", []string{"0079-01-01→0079-12-31"}},
		{"before 1900", "../1899", "up to 1899", []string{"..→1899-12-31"}},
		{"before 1900-05", "../1900-04", "up to April 1900", []string{"..→1900-04-30"}},
		{"before 1900-05-01", "../1900-04-30", "up to 30 April 1900", []string{"..→1900-04-30"}},
		{"before c. 1900", "../1899~", "up to c. 1899", []string{"..→1899-12-31"}},
		{"before 1870s", "../1869", "up to 1869", []string{"..→1869-12-31"}},
		{"before 1881-21", "../1881-02", "up to February 1881", []string{"..→1881-02-28"}},
		{"after 1850", "1851/..", "1851 or later", []string{"1851-01-01→.."}},
		{"after 1881-24", "1882-03/..", "March 1882 or later", []string{"1882-03-01→.."}},
		{"after 1200 BCE", "-1198/..", "1199 BCE or later", []string{"-1198-01-01→.."}},
		{"not after 1900", "../1900", "up to 1900", []string{"..→1900-12-31"}},
		{"no later than 1900", "../1900", "up to 1900", []string{"..→1900-12-31"}},
		{"by 1900", "../1900", "up to 1900", []string{"..→1900-12-31"}},
		{"not before 1850", "1850/..", "1850 or later", []string{"1850-01-01→.."}},
		{"since 1850", "1850/..", "1850 or later", []string{"1850-01-01→.."}},
		{"1870-1875", "1870/1875", "1870 to 1875", []string{"1870-01-01→1875-12-31"}},
		{"1870 - 1875", "1870/1875", "1870 to 1875", []string{"1870-01-01→1875-12-31"}},
		{"1870–1875", "1870/1875", "1870 to 1875", []string{"1870-01-01→1875-12-31"}},
		{"1870 to 1875", "1870/1875", "1870 to 1875", []string{"1870-01-01→1875-12-31"}},
		{"1870s-1880s", "187X/188X", "1870s to 1880s", []string{"1870-01-01→1889-12-31"}},
		{"between 1870 and 1875", "1870/1875", "1870 to 1875", []string{"1870-01-01→1875-12-31"}},
		{"c. 1870-1875", "1870~/1875~", "c. 1870 to c. 1875", []string{"1870-01-01→1875-12-31"}},
		{"c. 1870 to 1875", "1870~/1875~", "c. 1870 to c. 1875", []string{"1870-01-01→1875-12-31"}},
		{"1200-1100 BCE", "-1199/-1099", "1200 BCE to 1100 BCE", []string{"-1199-01-01→-1099-12-31"}},
		{"1200 BCE – AD 50", "-1199/0050", "1200 BCE to AD 50", []string{"-1199-01-01→0050-12-31"}},
		{"c. 1870s-1880s", "187X~/188X~", "c. 1870s to c. 1880s", []string{"1870-01-01→1889-12-31"}},
		{"c. 1870/1879", "1870~/1879", "c. 1870 to 1879", []string{"1870-01-01→1879-12-31"}},
		{"May 1874", "1874-05", "May 1874", []string{"1874-05-01→1874-05-31"}},
		{"21 May 1874", "1874-05-21", "21 May 1874", []string{"1874-05-21→1874-05-21"}},
		{"May 21, 1874", "1874-05-21", "21 May 1874", []string{"1874-05-21→1874-05-21"}},
		{"c. Sept. 1874", "1874-09~", "c. September 1874", []string{"1874-09-01→1874-09-30"}},
		{"  1874  ", "1874", "1874", []string{"1874-01-01→1874-12-31"}},
	}
	for _, tt := range tests {
		t.Run(tt.in, func(t *testing.T) {
			d, err := Parse(tt.in)
			if err != nil {
				t.Fatalf("Parse(%q): %v", tt.in, err)
			}
			if d.EDTF() != tt.edtf {
				t.Errorf("EDTF() = %q, want %q", d.EDTF(), tt.edtf)
			}
			if d.String() != tt.people {
				t.Errorf("String() = %q, want %q", d.String(), tt.people)
			}
			if got := iso(d); !sameStrings(got, tt.alts) {
				t.Errorf("days = %v, want %v", got, tt.alts)
			}
			again, err := Parse(d.EDTF())
			if err != nil || !sameStrings(iso(again), tt.alts) {
				t.Errorf("Parse(%q) = %v, %v; want the same days", d.EDTF(), iso(again), err)
			}
			if d.Input != tt.in {
				t.Errorf("Input = %q, want %q", d.Input, tt.in)
			}
		})
	}
}

// String for people: the forms the issue asks for.
func TestStringPeople(t *testing.T) {
	tests := []struct{ in, want string }{
		{"1874", "1874"},
		{"-1199", "1200 BCE"},
		{"0000", "1 BCE"},
		{"0001", "AD 1"},
		{"1874-05-21", "21 May 1874"},
		{"1881-21", "spring 1881"},
		{"1874%", "c. 1874?"},
		{"1870/..", "1870 or later"},
		{"1985/", "1985 to an unknown date"},
		{"/1985", "from an unknown date to 1985"},
		{"[1667,1668,1670..1672]", "one of 1667, 1668, 1670 to 1672"},
		{"[..1760-12-03]", "one of up to 3 December 1760"},
		{"1985-04-1X", "10 to 19 April 1985"},
		{"1984-1X", "October to December 1984"},
		{"-18XX", "1900 BCE to 1801 BCE"},
		{"1582-10-04 (Julian)", "4 October 1582 (Julian)"},
		{"1985-04-12T23:20:30Z", "12 April 1985 23:20:30Z"},
		{"1950S2", "1900 to 1999 (estimated 1950)"},
	}
	for _, tt := range tests {
		d, err := Parse(tt.in)
		if err != nil {
			t.Fatalf("Parse(%q): %v", tt.in, err)
		}
		if got := d.String(); got != tt.want {
			t.Errorf("Parse(%q).String() = %q, want %q", tt.in, got, tt.want)
		}
	}
}
