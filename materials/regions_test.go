package materials

import (
	"encoding/csv"
	"errors"
	"io/fs"
	"os"
	"path/filepath"
	"slices"
	"strings"
	"testing"
)

// m49Reference is the open compilation of UN M49 and ISO 3166-1 kept beside
// the checkout for checks; the project's table is written separately.
const m49Reference = "../../shared/data/m49-countries.csv"

// TestRegionsAgainstReference compares every country of the project's table
// with the reference compilation (UN Statistics Division M49 standard as
// compiled in m49-countries.csv): the same alpha-2 codes, M49 numbers and
// chain of intermediate region, sub-region and region, with the areas'
// names.
func TestRegionsAgainstReference(t *testing.T) {
	f, err := os.Open(filepath.FromSlash(m49Reference))
	if errors.Is(err, fs.ErrNotExist) {
		t.Skipf("SKIP: reference file %s is absent; the region table is not compared with it", m49Reference)
	}
	if err != nil {
		t.Fatal(err)
	}
	defer f.Close()
	rows, err := csv.NewReader(f).ReadAll()
	if err != nil {
		t.Fatal(err)
	}
	r, err := BuiltinRegions()
	if err != nil {
		t.Fatal(err)
	}
	head := rows[0]
	col := func(name string) int {
		i := slices.Index(head, name)
		if i < 0 {
			t.Fatalf("reference has no column %q (has %q)", name, head)
		}
		return i
	}
	ca, cm, ci, cin, cs, csn, cr, crn := col("alpha2"), col("m49"), col("intermediate_code"), col("intermediate_name"),
		col("subregion_code"), col("subregion_name"), col("region_code"), col("region_name")
	// Where the compilation leaves out a grouping that the standard has, the
	// table follows the standard: M49 files Guernsey and Jersey under the
	// Channel Islands (830) inside Northern Europe.
	standardOverCompilation := map[string]string{"GG": "830", "JE": "830"}
	seen := map[string]bool{}
	for _, row := range rows[1:] {
		code := row[ca]
		seen[code] = true
		t.Run(code, func(t *testing.T) {
			if !r.Valid(code) || r.IsArea(code) {
				t.Fatalf("%s (%s) is not a country in the table", code, row[col("name")])
			}
			if got := r.M49(code); got != row[cm] {
				t.Errorf("M49 number: got %q, reference %q", got, row[cm])
			}
			var want []string
			inter := row[ci]
			if c, ok := standardOverCompilation[code]; ok && inter == "" {
				inter = c
			}
			for _, c := range []string{inter, row[cs], row[cr]} {
				if c != "" {
					want = append(want, c)
				}
			}
			want = append([]string{code}, append(want, "001")...)
			if got := r.Ancestors(code); !slices.Equal(got, want) {
				t.Errorf("ancestors: got %q, reference %q", got, want)
			}
			for _, p := range [][2]int{{ci, cin}, {cs, csn}, {cr, crn}} {
				if c := row[p[0]]; c != "" && r.Name(c) != row[p[1]] {
					t.Errorf("name of area %s: got %q, reference %q", c, r.Name(c), row[p[1]])
				}
			}
		})
	}
	for _, c := range r.Codes() {
		if !r.IsArea(c) && !seen[c] {
			t.Errorf("country %s (%s) of the table is not in the reference", c, r.Name(c))
		}
	}
}

func TestRegions(t *testing.T) {
	r, err := BuiltinRegions()
	if err != nil {
		t.Fatal(err)
	}
	// Values from the UN Statistics Division M49 standard.
	for _, tc := range []struct {
		code string
		want []string
	}{
		{"NL", []string{"NL", "155", "150", "001"}},
		{"GB", []string{"GB", "154", "150", "001"}},
		{"JP", []string{"JP", "030", "142", "001"}},
		{"BR", []string{"BR", "005", "419", "019", "001"}},
		{"US", []string{"US", "021", "019", "001"}},
		{"KE", []string{"KE", "014", "202", "002", "001"}},
		{"JE", []string{"JE", "830", "154", "150", "001"}},
		{"AQ", []string{"AQ", "001"}},
		{"150", []string{"150", "001"}},
		{"001", []string{"001"}},
		{"XX", nil},
		{"nl", nil},
	} {
		t.Run(tc.code, func(t *testing.T) {
			if got := r.Ancestors(tc.code); !slices.Equal(got, tc.want) {
				t.Errorf("Ancestors(%q): got %q, want %q", tc.code, got, tc.want)
			}
			if got := r.Valid(tc.code); got != (tc.want != nil) {
				t.Errorf("Valid(%q): got %v", tc.code, got)
			}
		})
	}
	for code, want := range map[string]string{"NL": "150", "JP": "142", "BR": "019", "AQ": "001", "001": "001", "XX": ""} {
		if got := r.Region(code); got != want {
			t.Errorf("Region(%q): got %q, want %q", code, got, want)
		}
	}
	if got := r.Name("155"); got != "Western Europe" {
		t.Errorf("Name(155): got %q", got)
	}
}

func TestRegionsSuggest(t *testing.T) {
	r, err := BuiltinRegions()
	if err != nil {
		t.Fatal(err)
	}
	for _, tc := range []struct {
		in, first string
	}{
		{"nl", "NL"},
		{"UK", "GB"},
		{"Japan", "JP"},
		{"japan", "JP"},
		{"528", "NL"}, // the Netherlands' M49 number
		{"30", "030"},
		{"western europe", "155"},
		{"Neth", "NL"},
	} {
		t.Run(tc.in, func(t *testing.T) {
			got := r.Suggest(tc.in)
			if len(got) == 0 || got[0] != tc.first || len(got) > 3 {
				t.Errorf("Suggest(%q): got %q, want %q first and at most three", tc.in, got, tc.first)
			}
		})
	}
	if got := r.Suggest(""); len(got) != 0 {
		t.Errorf("Suggest(\"\"): got %q", got)
	}
}

func TestParseRegionsErrors(t *testing.T) {
	for _, tc := range []struct{ text, msg string }{
		{"area 001 - World\nNL 528 155 Netherlands\n", "parent area"},
		{"area 001 - World\nNLX 528 001 Netherlands\n", "two letters"},
		{"area 01 - World\n", "three digits"},
		{"area 001 - World\narea 001 - World\n", "twice"},
		{"area 001\n", "expected"},
	} {
		_, err := parseRegions("t.txt", tc.text)
		if err == nil || !strings.Contains(err.Error(), tc.msg) || !strings.HasPrefix(err.Error(), "t.txt:") {
			t.Errorf("parseRegions(%q): got %v, want an error with %q", tc.text, err, tc.msg)
		}
	}
}

// TestRegionCounts counts the countries and areas filed directly under each
// M49 area. Want values: the M49 code list as of December 2021, as given in
// the Wikipedia article "UN M49" (section Code lists: World 248 entries,
// Eastern Asia 7, Northern Europe 16 …). The table adds Taiwan (TW), which
// has an ISO 3166-1 code but no M49 entry, to Eastern Asia; Northern Europe
// counts the Channel Islands' Guernsey and Jersey.
func TestRegionCounts(t *testing.T) {
	r, err := BuiltinRegions()
	if err != nil {
		t.Fatal(err)
	}
	got := map[string]int{}
	countries := 0
	for _, c := range r.Codes() {
		if r.IsArea(c) {
			continue
		}
		countries++
		p := r.Parent(c)
		if p == "830" { // the Channel Islands lie in Northern Europe
			p = r.Parent(p)
		}
		got[p]++
	}
	want := map[string]int{
		"015": 7, "011": 17, "017": 9, "014": 22, "018": 5, // Africa
		"029": 28, "013": 8, "005": 16, "021": 5, // Americas
		"143": 5, "030": 7 + 1, "034": 9, "035": 11, "145": 18, // Asia (+ TW)
		"154": 16, "155": 9, "151": 10, "039": 16, // Europe
		"054": 5, "053": 6, "057": 8, "061": 10, // Oceania
		"001": 1, // Antarctica
	}
	for area, n := range want {
		if got[area] != n {
			t.Errorf("%s (%s): %d countries or areas, want %d", area, r.Name(area), got[area], n)
		}
	}
	if countries != 248+1 {
		t.Errorf("%d countries or areas, want 248 of M49 and TW", countries)
	}
}
