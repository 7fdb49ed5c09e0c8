package cli

import (
	"encoding/json"
	"strings"
	"testing"
)

func TestDateText(t *testing.T) {
	out, errs, code := execute(t, "date", "c. 1870", "1870~/1879", "[1667,1668,1670..1672]", "1582-10-04 (Julian)", "../1900")
	if code != 0 || errs != "" {
		t.Fatalf("exit %d, stderr %q", code, errs)
	}
	for _, want := range []string{
		"c. 1870\n  EDTF         1870~\n  reads as     c. 1870\n  first day    1870-01-01\n  last day     1870-12-31\n  precision    year\n  qualifiers   approximate\n",
		// The default circa policy: P5Y spans at most 1827 days each side.
		"  circa        1865-01-01 to 1875-12-31 (default policy: P5Y each side)\n",
		"  qualifiers   start approximate, end exact\n  circa        1865-01-01 to 1879-12-31 (default policy: P5Y at the start)\n",
		"  one of       1667-01-01 to 1668-12-31\n               1670-01-01 to 1672-12-31\n",
		// Julian 1582-10-04 is the day before Gregorian 1582-10-15.
		"  EDTF         1582-10-14\n  reads as     4 October 1582 (Julian)\n  calendar     Julian, converted to Gregorian days\n",
		"  first day    open\n  last day     1900-12-31\n",
	} {
		if !strings.Contains(out, want) {
			t.Errorf("output lacks %q\ngot:\n%s", want, out)
		}
	}
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
			out, errs, code := execute(t, tt.args...)
			if code != 2 {
				t.Errorf("exit %d, want 2", code)
			}
			if out != "" {
				t.Errorf("stdout %q, want nothing", out)
			}
			for _, w := range tt.want {
				if !strings.Contains(errs, w) {
					t.Errorf("stderr %q lacks %q", errs, w)
				}
			}
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
	out, _, code := execute(t, "date", "15XX-12-25")
	if code != 0 {
		t.Fatalf("exit %d", code)
	}
	for _, want := range []string{"  one of       1500-12-25 to 1500-12-25\n", "… and 88 more (--format json lists them all)\n", "  precision    day\n"} {
		if !strings.Contains(out, want) {
			t.Errorf("output lacks %q:\n%s", want, out)
		}
	}
	out, _, _ = execute(t, "date", "--format", "json", "15XX-12-25")
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
