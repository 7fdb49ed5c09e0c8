package cli

import (
	"encoding/json"
	"strings"
	"testing"
)

func TestDateText(t *testing.T) {
	checkPrints(t, []string{
		"c. 1870\n  EDTF         1870~\n  reads as     c. 1870\n  first day    1870-01-01\n  last day     1870-12-31\n  precision    year\n  qualifiers   approximate\n",
		// The default circa policy: P5Y spans at most 1827 days each side.
		"  circa        1865-01-01 to 1875-12-31 (default policy: P5Y each side)\n",
		"  qualifiers   start approximate, end exact\n  circa        1865-01-01 to 1879-12-31 (default policy: P5Y at the start)\n",
		"  one of       1667-01-01 to 1668-12-31\n               1670-01-01 to 1672-12-31\n",
		// Julian 1582-10-04 is the day before Gregorian 1582-10-15.
		"  EDTF         1582-10-14\n  reads as     4 October 1582 (Julian)\n  calendar     Julian, converted to Gregorian days\n",
		"  first day    open\n  last day     1900-12-31\n",
	}, "date", "c. 1870", "1870~/1879", "[1667,1668,1670..1672]", "1582-10-04 (Julian)", "../1900")
}

func TestDateJSON(t *testing.T) {
	out, errs, code := execute(t, "date", "--format", "json", "1200 BCE", "c. 1870", "[1760-01,1760-12..]", "1850/..")
	if code != 0 || errs != "" {
		t.Fatalf("exit %d, stderr %q", code, errs)
	}
	var got struct {
		SchemaVersion int `json:"schema_version"`
		Dates         []struct {
			Input        string       `json:"input"`
			EDTF         string       `json:"edtf"`
			First        *string      `json:"first"`
			Last         *string      `json:"last"`
			Approximate  bool         `json:"approximate"`
			Uncertain    bool         `json:"uncertain"`
			Precision    string       `json:"precision"`
			Alternatives [][2]*string `json:"alternatives"`
			Widened      []*string    `json:"widened"`
		} `json:"dates"`
	}
	if err := json.Unmarshal([]byte(out), &got); err != nil {
		t.Fatalf("%v\n%s", err, out)
	}
	if got.SchemaVersion != 1 || len(got.Dates) != 4 {
		t.Fatalf("schema %d, %d dates", got.SchemaVersion, len(got.Dates))
	}
	str := func(p *string) string {
		if p == nil {
			return "null"
		}
		return *p
	}
	bce := got.Dates[0]
	// 1200 BCE is the astronomical year -1199 (ISO 8601): signed, four digits.
	if bce.EDTF != "-1199" || str(bce.First) != "-1199-01-01" || str(bce.Last) != "-1199-12-31" || bce.Precision != "year" {
		t.Errorf("1200 BCE = %+v", bce)
	}
	if !strings.Contains(out, `"widened_by": [
        "P5Y",
        "P5Y"
      ]`) {
		t.Errorf("JSON lacks widened_by for c. 1870:\n%s", out)
	}
	c := got.Dates[1]
	if !c.Approximate || c.Uncertain || len(c.Widened) != 2 || str(c.Widened[0]) != "1865-01-01" {
		t.Errorf("c. 1870 = %+v", c)
	}
	set := got.Dates[2]
	if len(set.Alternatives) != 2 || str(set.Alternatives[0][1]) != "1760-01-31" || set.Alternatives[1][1] != nil || set.Last != nil {
		t.Errorf("set = %+v", set)
	}
	if open := got.Dates[3]; str(open.First) != "1850-01-01" || open.Last != nil || open.Alternatives != nil {
		t.Errorf("1850/.. = %+v", open)
	}
	for _, key := range []string{`"input"`, `"edtf"`, `"first"`, `"last"`, `"approximate"`, `"uncertain"`, `"precision"`, `"alternatives"`} {
		if !strings.Contains(out, key) {
			t.Errorf("JSON lacks %s", key)
		}
	}
}

func TestDateBadInput(t *testing.T) {
	tests := []struct {
		name string
		args []string
		want []string
	}{
		{"bad month", []string{"date", "1874", "1874-13"}, []string{
			`terminus: error: date "1874-13" at column 6: month 13: months are 01–12, seasons 21–24`}},
		{"short range", []string{"date", "1870-75"}, []string{
			"terminus: hint: for a range of years write 1870/1875"}},
		{"reversed", []string{"date", "1900/1870"}, []string{
			"the interval ends before it starts", "terminus: hint: write the earlier date first: 1870/1900"}},
		{"no year 0", []string{"date", "0 BC"}, []string{"there is no year 0"}},
		{"bad format", []string{"date", "--format", "xml", "1874"}, []string{`unknown --format "xml"`}},
		{"no expression", []string{"date"}, []string{"terminus: error:"}},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			checkFails(t, tt.want, tt.args...)
		})
	}
}

func TestDateJulianFlag(t *testing.T) {
	out, _, code := execute(t, "date", "--julian", "--format", "json", "1582-10-04", "1582-10-15 (Gregorian)")
	if code != 0 {
		t.Fatalf("exit %d", code)
	}
	// Julian 1582-10-04 and Gregorian 1582-10-15 are consecutive days (the reform).
	if !strings.Contains(out, `"first": "1582-10-14"`) || !strings.Contains(out, `"first": "1582-10-15"`) {
		t.Errorf("output:\n%s", out)
	}
	if !strings.Contains(out, `"calendar": "Julian"`) || !strings.Contains(out, `"calendar": "Gregorian"`) {
		t.Errorf("calendars missing:\n%s", out)
	}
}

func TestDateScattered(t *testing.T) {
	// EDTF level 2: "December 25 sometime during the 1500s" is 100 days.
	checkPrints(t, []string{"  one of       1500-12-25 to 1500-12-25\n", "… and 88 more (--format json lists them all)\n", "  precision    day\n"},
		"date", "15XX-12-25")
	out, _, _ := execute(t, "date", "--format", "json", "15XX-12-25")
	var got struct {
		Dates []struct {
			Alternatives [][2]string `json:"alternatives"`
		} `json:"dates"`
	}
	if err := json.Unmarshal([]byte(out), &got); err != nil {
		t.Fatal(err)
	}
	alts := got.Dates[0].Alternatives
	if len(alts) != 100 || alts[99] != [2]string{"1599-12-25", "1599-12-25"} {
		t.Errorf("%d alternatives, last %v; want 100, the last 1599-12-25", len(alts), alts[len(alts)-1])
	}
}

func TestDateNegativeYear(t *testing.T) {
	// "-1199" is 1200 BCE, not a flag; flags after it still work
	checkPrints(t, []string{`"input": "-1199"`, `"first": "-1199-01-01"`, `"input": "-0044-03-15"`}, "date", "-1199", "--format", "json", "-0044-03-15")
	if _, errs, code := execute(t, "date", "--bogus", "1874"); code != 2 || !strings.Contains(errs, "unknown flag: --bogus") {
		t.Errorf("an unknown flag: exit %d, stderr %q", code, errs)
	}
	if out, _, code := execute(t, "date", "--help"); code != 0 || !strings.Contains(out, "negative year") {
		t.Errorf("--help: exit %d, output %q", code, out)
	}
}

func TestDateCalendarsShown(t *testing.T) {
	checkPrints(t, []string{
		// the calendar read and the Gregorian interval
		"  calendar     Japanese, converted to Gregorian days\n  first day    1857-08-20\n  last day     1857-09-17\n",
		// the Old Style ambiguity: the alternatives and why
		"  one of       1712-02-21 to 1712-02-21\n               1713-02-21 to 1713-02-21\n",
		"(Old Style) is ambiguous",
		// the century convention
		"both ways of counting it",
		// the widening of a Hijri date, with its reason
		"widened by 2 days at each side",
	}, "date", "Ansei 4, 7th month", "10 Feb 1712 O.S.", "18th century", "15 Ramadan 1300 AH")
}

func TestDateSettings(t *testing.T) {
	out, errs, code := execute(t, "date", "--within", "1840/1880", "--calendar", "japanese", "Snake 7")
	if code != 0 || errs != "" {
		t.Fatalf("exit %d, stderr %q", code, errs)
	}
	// Ansei 4 (1857) was a snake year; its 7th month is 1857-08-20 to 09-17
	if !strings.Contains(out, "1857-08-20 to 1857-09-17") || !strings.Contains(out, "Japanese") {
		t.Errorf("Snake 7 within 1840/1880 (Japanese):\n%s", out)
	}
	out, errs, code = execute(t, "date", "--julian", "--year-start", "25 March", "10 February 1712")
	if code != 0 || errs != "" || !strings.Contains(out, "first day    1713-02-21") {
		t.Errorf("--year-start 25 March: exit %d, stderr %q\n%s", code, errs, out)
	}
	if _, errs, code := execute(t, "date", "--year-start", "easter", "1874"); code != 2 || !strings.Contains(errs, "--year-start") {
		t.Errorf("a bad --year-start: exit %d, stderr %q", code, errs)
	}
}

func TestDateErrorsNameTheProblem(t *testing.T) {
	for _, tc := range []struct{ in, want, reason string }{
		{"Meji 14", "did you mean Meiji?", "an unknown era gets a suggestion"},
		{"Ansei 8", "Ansei has years 1 to 7 (1854–1860)", "a year past an era's end names its span"},
		{"Kansei 3, 13th month", "has no intercalary month", "a 13th month in a year without one is refused"},
	} {
		_, errs, code := execute(t, "date", tc.in)
		if code != 2 || !strings.Contains(errs, tc.want) {
			t.Errorf("%s: exit %d, stderr %q, want %q", tc.reason, code, errs, tc.want)
		}
	}
}
