package casefile

import (
	"encoding/json"
	"errors"
	"os"
	"path/filepath"
	"reflect"
	"strings"
	"testing"
	"time"

	"gopkg.in/yaml.v3"

	"terminus/constraint"
	"terminus/constraint/input"
)

// stripPositions clears what differs between formats of one case: the
// positions and the file name.
func stripPositions(c *constraint.Case) {
	c.File = ""
	c.PlacePos = input.Pos{}
	for i := range c.Events {
		e := &c.Events[i]
		e.Pos, e.PlacePos = input.Pos{}, input.Pos{}
		for j := range e.After {
			e.After[j].Pos = input.Pos{}
		}
	}
	for i := range c.Findings {
		f := &c.Findings[i]
		f.Pos, f.EventPos, f.MatPos = input.Pos{}, input.Pos{}, nil
	}
	for i := range c.Records {
		r := &c.Records[i]
		r.Pos, r.EventPos, r.DatePos = input.Pos{}, input.Pos{}, input.Pos{}
	}
	for i := range c.Claims {
		cl := &c.Claims[i]
		cl.Pos, cl.EventPos = input.Pos{}, input.Pos{}
	}
}

// Every example reads the same in YAML and in JSON (indented and on one
// line): one reader for every format.
func TestExamplesReadAlikeInEveryFormat(t *testing.T) {
	paths, _ := filepath.Glob("../../examples/*/case.yaml")
	if len(paths) == 0 {
		t.Fatal("no examples found")
	}
	for _, p := range paths {
		data, err := os.ReadFile(p)
		if err != nil {
			t.Fatal(err)
		}
		want, err := Parse(p, data, input.YAML, input.Limits{})
		if err != nil {
			t.Fatalf("%s: %v", p, err)
		}
		stripPositions(want)
		var v any
		if err := yaml.Unmarshal(data, &v); err != nil {
			t.Fatal(err)
		}
		v = datesAsText(v)
		for _, indent := range []string{"", "  "} {
			j, err := json.MarshalIndent(v, "", indent)
			if err != nil {
				t.Fatal(err)
			}
			got, err := Parse(p, j, input.JSON, input.Limits{})
			if err != nil {
				t.Fatalf("%s as JSON: %v", p, err)
			}
			stripPositions(got)
			if !reflect.DeepEqual(got, want) {
				t.Errorf("%s reads differently as JSON", p)
			}
		}
	}
}

// datesAsText turns the timestamps YAML makes of plain dates (1651-12-31)
// back into the text the case reader reads.
func datesAsText(v any) any {
	switch x := v.(type) {
	case map[string]any:
		for k, e := range x {
			x[k] = datesAsText(e)
		}
	case []any:
		for i, e := range x {
			x[i] = datesAsText(e)
		}
	case time.Time:
		return x.Format("2006-01-02")
	}
	return v
}

func TestOneCaseThreeFormats(t *testing.T) {
	docs := map[input.Format]string{
		input.YAML: "title: A panel\nplace: NL\nfindings:\n  - {id: f, material: smalt, confidence: probable, unlisted: false}\nclaims:\n  - {date: \"1650\"}\n",
		input.TOML: "title = \"A panel\"\nplace = \"NL\"\n[[findings]]\nid = \"f\"\nmaterial = \"smalt\"\nconfidence = \"probable\"\nunlisted = false\n[[claims]]\ndate = \"1650\"\n",
		input.JSON: `{"title": "A panel", "place": "NL", "findings": [{"id": "f", "material": "smalt", "confidence": "probable", "unlisted": false}], "claims": [{"date": "1650"}]}`,
	}
	var first *constraint.Case
	for f, doc := range docs {
		c, err := Parse("case", []byte(doc), f, input.Limits{})
		if err != nil {
			t.Fatalf("%s: %v", f, err)
		}
		stripPositions(c)
		if first == nil {
			first = c
		} else if !reflect.DeepEqual(c, first) {
			t.Errorf("%s reads differently: %+v vs %+v", f, c, first)
		}
	}
	for f := range docs {
		_, err := Parse("case", nil, f, input.Limits{})
		var e *input.Error
		if !errors.As(err, &e) || e.Msg != "the case file is empty" || !strings.Contains(e.Hint(), "terminus init") {
			t.Errorf("%s empty: %v", f, err)
		}
	}
}

func TestReadFromStandardInput(t *testing.T) {
	c, err := ReadFrom("(standard input)", strings.NewReader("claims:\n  - date: \"1650\"\n"), input.YAML, input.Limits{})
	if err != nil || len(c.Claims) != 1 || c.File != "(standard input)" {
		t.Fatalf("got %+v, %v", c, err)
	}
	_, err = ReadFrom("(standard input)", strings.NewReader(strings.Repeat("#", 2000)), input.YAML, input.Limits{MaxBytes: 1000})
	if err == nil || !strings.Contains(err.Error(), "larger than the limit") {
		t.Errorf("a large input: %v", err)
	}
}

// FuzzCase reads arbitrary input as a case in each format: it never
// panics, and every error is an *input.Error naming the file.
func FuzzCase(f *testing.F) {
	paths, _ := filepath.Glob("../../examples/*/case.yaml")
	for _, p := range paths {
		if data, err := os.ReadFile(p); err == nil {
			f.Add(data, uint8(0))
		}
	}
	for _, s := range []string{"title = \"x\"\n[[findings]]\nmaterial = \"smalt\"\n", `{"findings":[{"material":"smalt"}],"claims":[{"date":"1650"}]}`,
		"records:\n  - {between: [1700, 1650]}\n", "events:\n  - {id: a, after: [{event: b, at_least: P1Y}]}\n"} {
		for k := range 3 {
			f.Add([]byte(s), uint8(k))
		}
	}
	f.Fuzz(func(t *testing.T, data []byte, which uint8) {
		_, err := Parse("fuzz", data, input.Format(which%3), input.Limits{})
		if err == nil {
			return
		}
		var e *input.Error
		if !errors.As(err, &e) || e.File != "fuzz" {
			t.Fatalf("error %v (%T) is not an *input.Error naming the file", err, err)
		}
	})
}

// Entries without an id get a readable default that no other entry has;
// two orders between the same events get two ids.
func TestDefaultIDsAreUnique(t *testing.T) {
	text := `events:
  - id: felling
  - id: painting
    after:
      - {event: felling}
      - {event: felling, at_least: P2Y}
findings:
  - {id: finding-2, material: smalt}
  - {material: lead white}
records:
  - {not_after: "1700"}
claims:
  - {date: "1650"}
  - {id: claim-1, date: "1660"}
`
	c, err := Parse("case.yaml", []byte(text), input.YAML, input.Limits{})
	if err != nil {
		t.Fatal(err)
	}
	got := []string{c.Events[1].After[0].ID, c.Events[1].After[1].ID, c.Findings[0].ID, c.Findings[1].ID, c.Records[0].ID, c.Claims[0].ID, c.Claims[1].ID}
	want := []string{"order:painting>felling", "order:painting>felling-2", "finding-2", "finding-2-2", "record-1", "claim-1-2", "claim-1"}
	// Why: two orders between the same events; a default taken by an id the
	// case wrote gets a number; claims the same, in their own namespace.
	if strings.Join(got, " ") != strings.Join(want, " ") {
		t.Errorf("ids %v, want %v", got, want)
	}
}
