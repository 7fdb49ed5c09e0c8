package report

import (
	"bytes"
	"context"
	"encoding/json"
	"os"
	"path/filepath"
	"testing"

	"terminus/constraint"
	"terminus/constraint/casefile"
	"terminus/constraint/date"
	"terminus/constraint/input"
	"terminus/constraint/network"
	"terminus/materials"
)

// reference encodes r the slow way, with encoding/json over the document
// structs of json.go: what AppendJSONLine must reproduce byte for byte.
func reference(t testing.TB, r *constraint.Result) []byte {
	t.Helper()
	var buf bytes.Buffer
	enc := json.NewEncoder(&buf)
	enc.SetEscapeHTML(false)
	if err := enc.Encode(toJSON(r)); err != nil {
		t.Fatal(err)
	}
	return bytes.TrimSuffix(buf.Bytes(), []byte("\n"))
}

func sameAsReference(t *testing.T, name string, r *constraint.Result) {
	t.Helper()
	want := reference(t, r)
	got := AppendJSONLine(nil, r)
	if !bytes.Equal(got, want) {
		i := 0
		for i < len(got) && i < len(want) && got[i] == want[i] {
			i++
		}
		lo := max(0, i-60)
		t.Errorf("%s: AppendJSONLine differs from encoding/json at byte %d:\n got …%s\nwant …%s", name, i, got[lo:min(len(got), i+60)], want[lo:min(len(want), i+60)])
	}
	if !json.Valid(got) {
		t.Errorf("%s: not valid JSON", name)
	}
}

// The hand-written line encoder gives the bytes of encoding/json for the
// results of every example (built-in dataset) and of invented fixture cases
// that reach every part of the document: conflicts, corrections, an
// undetermined verdict, alternatives, disagreements, notes.
func TestJSONLineMatchesEncodingJSON(t *testing.T) {
	ds, err := materials.Builtin()
	if err != nil {
		t.Fatal(err)
	}
	paths, err := filepath.Glob("../../../../examples/*/case.yaml")
	if err != nil || len(paths) == 0 {
		t.Fatalf("no examples found (%v)", err)
	}
	for _, p := range paths {
		data, err := os.ReadFile(p)
		if err != nil {
			t.Fatal(err)
		}
		c, err := casefile.Parse(p, data, input.YAML, input.Limits{})
		if err != nil {
			t.Fatal(err)
		}
		for _, opt := range []constraint.Options{{}, {NoSensitivity: true}} {
			r, err := constraint.Analyze(context.Background(), c, ds, opt)
			if err != nil {
				t.Fatal(err)
			}
			sameAsReference(t, p, r)
		}
	}
	fixtures := map[string]string{
		"panel": panel,
		"undetermined": `place: NL
findings:
  - {id: f1, material: fixture violet}
records:
  - {id: r1, not_after: "1700", strength: hard}
claims:
  - {date: "1650"}
`,
		"firm conflict": `findings:
  - {id: f1, material: fixture yellow}
records:
  - {id: r1, not_after: "1810", strength: firm, note: "a \"quoted\" note\twith a tab"}
claims:
  - {date: 1805, by: "line one\nline two"}
`,
	}
	for name, text := range fixtures {
		sameAsReference(t, name, result(t, text))
	}
}

// A result whose every string is s, and whose optional parts are present
// or absent by the flags: the line encoder must agree with encoding/json on
// escaping and on null, [] and omitted fields.
func oddResult(s string, full bool) *constraint.Result {
	r := &constraint.Result{Title: s, File: s, Dataset: constraint.DatasetInfo{Version: s, SHA256: s}}
	r.Consistent = [3]bool{true, full, false}
	r.ConflictsComplete = [3]bool{full, true, false}
	if !full {
		r.Events = []constraint.EventResult{{ID: s}}
		r.Claims = []constraint.ClaimResult{{ID: s, Verdict: constraint.Undetermined}}
		r.Evidence = []constraint.Evidence{{ID: s, Bounds: []constraint.EvidenceBound{{Side: s}}}}
		return r
	}
	r.Place, r.ID = s, s
	step := constraint.Step{Evidence: s, Text: s}
	w := &constraint.Window{
		Earliest:  constraint.Bound{Day: date.Gregorian(-1199, 1, 1), Bounded: true, Because: []string{s, s}, Chain: []constraint.Step{step, step}},
		Latest:    constraint.Bound{},
		Intervals: []constraint.Span{{First: date.Gregorian(1, 2, 3), OpenEnd: true}, {OpenStart: true, Last: date.Gregorian(12000, 12, 31)}},
	}
	r.Events = []constraint.EventResult{{ID: s, Label: s, Place: s, Windows: [3]*constraint.Window{w, nil, w}}, {ID: "b"}}
	r.Claims = []constraint.ClaimResult{
		{ID: s, Event: s, Date: s, By: s, Verdict: constraint.Verdict(s), JudgedAt: network.Firm, Deciding: []string{s},
			Surviving: [3][]constraint.Span{nil, w.Intervals, {{First: 5, Last: 9}}}, Note: s},
		{ID: "c2", Verdict: constraint.Consistent},
	}
	r.Conflicts = []constraint.Conflict{{Tier: network.Soft, Evidence: []string{s}, Steps: []constraint.Step{step}}, {Tier: network.Hard}}
	r.Corrections = []constraint.Correction{{Tier: network.Firm, Evidence: []string{s, s}}, {}}
	r.Evidence = []constraint.Evidence{
		{ID: s, Kind: s, Event: s, What: s, Method: s, Sample: s, Confidence: s, Source: s, Unlisted: true,
			Bounds: []constraint.EvidenceBound{{Side: s, Date: s, Tier: network.Soft, Milestone: s, Material: s, Source: s}, {}}},
		{},
	}
	r.Disagreements = []constraint.Disagreement{{Material: s, Kind: s, Place: s, Claims: []string{s}, Used: s, ChangesVerdict: true, Text: s}, {}}
	r.Sources = []constraint.SourceRef{{Key: s, Cite: s, URL: s}, {Key: "k"}}
	r.Notes = []string{s, ""}
	r.Cautions = constraint.Cautions()
	return r
}

func TestJSONLineOddStrings(t *testing.T) {
	for _, s := range []string{"", "plain", `"quoted" \ back`, "<html> & 'apos'", "tab\tnl\ncr\rbs\bff\f\x00\x01\x1f\x7f",
		"Gr\u00e4fin \u2028 line \u2029 para", "bad \xff\xfe utf-8 \xe2\x82", "emoji \U0001F3A8 and CJK \u85cd"} {
		for _, full := range []bool{false, true} {
			sameAsReference(t, "odd string", oddResult(s, full))
		}
	}
}

// FuzzJSONLine puts arbitrary strings into every field of a result.
func FuzzJSONLine(f *testing.F) {
	for _, s := range []string{"", "a\"b", "\x00\u2028\xff", "<&>"} {
		f.Add(s, true)
	}
	f.Fuzz(func(t *testing.T, s string, full bool) {
		r := oddResult(s, full)
		want := reference(t, r)
		got := AppendJSONLine(nil, r)
		if !bytes.Equal(got, want) {
			t.Fatalf("AppendJSONLine(%q) =\n%s\nwant\n%s", s, got, want)
		}
		checkIndentedAsEncodingJSON(t, got)
	})
}

// checkIndentedAsEncodingJSON holds the streaming indenter to the bytes of
// encoding/json's Indent, the reference.
func checkIndentedAsEncodingJSON(t *testing.T, compact []byte) {
	t.Helper()
	var want bytes.Buffer
	if err := json.Indent(&want, compact, "", "  "); err != nil {
		t.Fatalf("%s: %v", compact, err)
	}
	want.WriteByte('\n')
	var got bytes.Buffer
	if err := writeIndented(&got, compact); err != nil {
		t.Fatal(err)
	}
	if !bytes.Equal(got.Bytes(), want.Bytes()) {
		t.Fatalf("indenting %s:\n%s\nwant (encoding/json)\n%s", compact, got.Bytes(), want.Bytes())
	}
}

// The report's indenter writes what encoding/json's Indent writes, on the
// shapes that are easy to get wrong: empty objects and arrays, nesting,
// brackets, colons, commas and escaped quotes inside strings.
func TestIndenterMatchesEncodingJSON(t *testing.T) {
	for _, doc := range []string{
		`{}`, `[]`, `{"a":{}}`, `{"a":[],"b":[[],{}]}`, `[1,2,[3,{"x":null}]]`,
		`{"s":"a,b:{c}[d]"}`, `{"q":"say \"hi\", then {go}"}`, `{"b":"\\"}`, `{"b":"\\\"]"}`,
		`{"u":"\u2028 é 藤黄"}`, `"alone"`, `12.5e3`, `true`,
	} {
		checkIndentedAsEncodingJSON(t, []byte(doc))
	}
}

func BenchmarkJSONLine(b *testing.B) {
	r := oddResult("chrome yellow: made 1809 [key, documented]", true)
	b.Run("append", func(b *testing.B) {
		b.ReportAllocs()
		buf := make([]byte, 0, 16<<10)
		for b.Loop() {
			buf = AppendJSONLine(buf[:0], r)
		}
	})
	b.Run("encoding-json", func(b *testing.B) {
		b.ReportAllocs()
		for b.Loop() {
			reference(b, r)
		}
	})
}
