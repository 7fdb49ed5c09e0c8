package report

import (
	"bytes"
	"context"
	"encoding/json"
	"strings"
	"testing"
	"unicode/utf8"

	"terminus/constraint"
	"terminus/constraint/casefile"
	"terminus/constraint/input"
	"terminus/materials"
)

// result analyzes an invented case against the fixture materials (invented
// for tests; see constraint/testdata).
func result(t *testing.T, text string) *constraint.Result {
	t.Helper()
	ds, err := materials.LoadFile("../../../../constraint/testdata/fixture-materials.yaml")
	if err != nil {
		t.Fatal(err)
	}
	return analyze(t, "case.yaml", []byte(text), input.YAML, ds)
}

// analyze reads a case file's text and analyzes it against ds.
func analyze(t testing.TB, name string, data []byte, f input.Format, ds *materials.Dataset) *constraint.Result {
	t.Helper()
	c, err := casefile.Parse(name, data, f, input.Limits{})
	if err != nil {
		t.Fatal(err)
	}
	r, err := constraint.Analyze(context.Background(), c, ds, constraint.Options{})
	if err != nil {
		t.Fatal(err)
	}
	return r
}

const panel = `title: A <panel> & "its" retouching | with a pipe
place: NL
events:
  - {id: making, label: original paint}
  - {id: retouch, label: later retouching, after: [{event: making, at_least: P1Y}]}
findings:
  - {id: f-yellow, material: fixture yellow, event: making, method: Raman, sample: S1 border of the sky seen from below the very long horizon line}
  - {id: f-alt, material: [fixture early, fixture late], event: retouch, confidence: probable}
  - {id: f-violet, material: fixture violet, event: making}
records:
  - {id: r-sale, event: making, not_after: "1850", source: sale catalogue}
claims:
  - {event: making, date: 1820/1829, by: dealer}
`

func TestTextFitsEightyColumns(t *testing.T) {
	var b bytes.Buffer
	if err := Text(&b, result(t, panel)); err != nil {
		t.Fatal(err)
	}
	for i, line := range strings.Split(b.String(), "\n") {
		if n := utf8.RuneCountInString(line); n > Width {
			t.Errorf("line %d has %d columns: %q", i+1, n, line)
		}
	}
	for _, want := range []string{"WINDOWS", "CLAIMS", "CONFLICTS", "CAUTIONS", "Cheapest correction at the firm tier: set aside r-sale."} {
		if !strings.Contains(b.String(), want) {
			t.Errorf("text lacks %q", want)
		}
	}
}

func TestEveryFormatCarriesTheCautions(t *testing.T) {
	r := result(t, panel)
	for name, write := range map[string]func(*bytes.Buffer) error{
		"text": func(b *bytes.Buffer) error { return Text(b, r) },
		"md":   func(b *bytes.Buffer) error { return Markdown(b, r) },
		"json": func(b *bytes.Buffer) error { return JSON(b, r) },
		"html": func(b *bytes.Buffer) error { return HTML(b, r) },
	} {
		var b bytes.Buffer
		if err := write(&b); err != nil {
			t.Fatalf("%s: %v", name, err)
		}
		// The text report wraps lines: compare with white space folded.
		flat := strings.Join(strings.Fields(b.String()), " ")
		for _, c := range constraint.Cautions() {
			if !strings.Contains(flat, c) {
				t.Errorf("%s lacks the caution %q", name, c)
			}
		}
	}
}

func TestDeterministic(t *testing.T) {
	var a, b bytes.Buffer
	if err := JSON(&a, result(t, panel)); err != nil {
		t.Fatal(err)
	}
	if err := JSON(&b, result(t, panel)); err != nil {
		t.Fatal(err)
	}
	if a.String() != b.String() {
		t.Error("two runs of the same case differ")
	}
	var doc map[string]any
	if err := json.Unmarshal(a.Bytes(), &doc); err != nil {
		t.Fatal(err)
	}
	if doc["schema_version"] != float64(SchemaVersion) {
		t.Errorf("schema_version = %v", doc["schema_version"])
	}
	conflicts := doc["conflicts"].([]any)
	if len(conflicts) != 1 {
		t.Fatalf("conflicts = %v, want one (f-violet made 1856 against the sale of 1850)", conflicts)
	}
}

func TestMarkupIsEscaped(t *testing.T) {
	r := result(t, panel)
	var h, s, m bytes.Buffer
	if err := HTML(&h, r); err != nil {
		t.Fatal(err)
	}
	if strings.Contains(h.String(), "<panel>") || !strings.Contains(h.String(), "&lt;panel&gt;") {
		t.Error("HTML does not escape the title")
	}
	if err := SVG(&s, r); err != nil {
		t.Fatal(err)
	}
	if strings.Contains(s.String(), "<panel>") || !strings.HasPrefix(s.String(), "<svg") {
		t.Error("SVG does not escape the title or does not start with <svg")
	}
	if err := Markdown(&m, r); err != nil {
		t.Fatal(err)
	}
	if !strings.Contains(m.String(), `retouching \| with a pipe`) {
		t.Error("Markdown does not escape a pipe in the title")
	}
}
