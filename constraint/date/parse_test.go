package date

import (
	"slices"
	"testing"
)

// iso writes the alternatives of d as "first→last" pairs, ".." for open.
func iso(d Date) []string {
	var out []string
	for _, a := range d.Alternatives {
		f, l := "..", ".."
		if !a.OpenStart {
			f = a.First.ISO()
		}
		if !a.OpenEnd {
			l = a.Last.ISO()
		}
		out = append(out, f+"→"+l)
	}
	return out
}

// parsedAs parses in and checks its EDTF form and its days (as iso writes
// them); it returns the date for a table's other checks.
func parsedAs(t *testing.T, in, edtf string, alts []string) Date {
	t.Helper()
	d, err := Parse(in)
	if err != nil {
		t.Fatalf("Parse(%q): %v", in, err)
	}
	if d.EDTF() != edtf {
		t.Errorf("EDTF() = %q, want %q", d.EDTF(), edtf)
	}
	if got := iso(d); !slices.Equal(got, alts) {
		t.Errorf("days = %v, want %v", got, alts)
	}
	return d
}

func TestParseBasics(t *testing.T) {
	tests := []struct {
		in, edtf string
		alts     []string
		prec     Precision
	}{
		{"1874", "1874", []string{"1874-01-01→1874-12-31"}, PrecisionYear},
		{"1874-05", "1874-05", []string{"1874-05-01→1874-05-31"}, PrecisionMonth},
		{"1874-05-21", "1874-05-21", []string{"1874-05-21→1874-05-21"}, PrecisionDay},
		{"-1199", "-1199", []string{"-1199-01-01→-1199-12-31"}, PrecisionYear},
		{"187X", "187X", []string{"1870-01-01→1879-12-31"}, PrecisionDecade},
		{"18XX", "18XX", []string{"1800-01-01→1899-12-31"}, PrecisionCentury},
		{"1870/1879", "1870/1879", []string{"1870-01-01→1879-12-31"}, PrecisionYear},
		{"../1900", "../1900", []string{"..→1900-12-31"}, PrecisionYear},
		{"1850/..", "1850/..", []string{"1850-01-01→.."}, PrecisionYear},
		{"[1667, 1668, 1670..1672]", "[1667,1668,1670..1672]",
			[]string{"1667-01-01→1668-12-31", "1670-01-01→1672-12-31"}, PrecisionYear},
	}
	for _, tt := range tests {
		t.Run(tt.in, func(t *testing.T) {
			d := parsedAs(t, tt.in, tt.edtf, tt.alts)
			if d.Precision != tt.prec {
				t.Errorf("precision = %v, want %v", d.Precision, tt.prec)
			}
		})
	}
}
