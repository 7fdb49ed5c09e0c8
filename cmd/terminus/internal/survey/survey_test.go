package survey

import (
	"bytes"
	"context"
	"encoding/json"
	"errors"
	"fmt"
	"io"
	"os"
	"path/filepath"
	"strings"
	"sync/atomic"
	"testing"
	"time"

	"terminus/constraint/casefile"
	"terminus/constraint/input"
	"terminus/materials"
)

func TestTakeID(t *testing.T) {
	tests := []struct {
		name, line, id string
		wantErr        bool
	}{
		{"first", `{"id": "a", "title": "t"}`, "a", false},
		{"middle", `{"title": "t", "id": "b", "place": "NL"}`, "b", false},
		{"last", `{"title": "t", "id": "c"}`, "c", false},
		{"only", `{"id": "d"}`, "d", false},
		{"number", `{"id": 42, "title": "t"}`, "42", false},
		{"null", `{"id": null, "title": "t"}`, "", false},
		{"nested ids are not the record's", `{"findings": [{"id": "f-1", "material": "smalt"}]}`, "", false},
		{"escaped", `{"id": "x\"y", "title": "t"}`, `x"y`, false},
		{"object", `{"id": {"a": 1}}`, "", true},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			id, rest, err := takeID([]byte(tc.line))
			if (err != nil) != tc.wantErr {
				t.Fatalf("error %v, want error %v", err, tc.wantErr)
			}
			if err != nil {
				return
			}
			if id != tc.id {
				t.Errorf("id %q, want %q", id, tc.id)
			}
			if len(rest) != len(tc.line) {
				t.Errorf("the rest %q is not as long as the line: columns would move", rest)
			}
			var m map[string]any
			if err := json.Unmarshal(rest, &m); err != nil {
				t.Fatalf("the rest %q is not JSON: %v", rest, err)
			}
			if _, has := m["id"]; has {
				t.Errorf("the rest %q still has the id", rest)
			}
			if tc.id == "" && !strings.Contains(tc.line, `"id": null`) && string(rest) != tc.line {
				t.Errorf("a line without a top-level id changed: %q", rest)
			}
		})
	}
	// The rest decodes as a case, and positions in it are those of the line.
	line := `{"id": "a-1", "title": "t", "claimz": []}`
	_, rest, _ := takeID([]byte(line))
	_, err := casefile.Parse("c.jsonl", rest, input.JSON, input.Limits{})
	var ce *input.Error
	if !errors.As(err, &ce) || ce.Column != strings.Index(line, `"claimz"`)+1 {
		t.Errorf("error %v: want the column of \"claimz\" in the line, %d", err, strings.Index(line, `"claimz"`)+1)
	}
}

func TestLineReader(t *testing.T) {
	long := strings.Repeat("x", 100)
	in := "\xef\xbb\xbfone\r\ntwo\n" + long + "\nthree"
	lr := newLineReader(strings.NewReader(in), 50)
	type got struct {
		text    string
		line    int
		tooLong bool
	}
	var all []got
	for {
		text, line, tooLong, err := lr.next()
		if errors.Is(err, io.EOF) {
			break
		}
		if err != nil {
			t.Fatal(err)
		}
		all = append(all, got{string(text), line, tooLong})
	}
	want := []got{{"one", 1, false}, {"two", 2, false}, {long[:50], 3, true}, {"three", 4, false}}
	if fmt.Sprint(all) != fmt.Sprint(want) {
		t.Errorf("got %v\nwant %v", all, want)
	}
}

func openText(t *testing.T, name, text string) *Input {
	t.Helper()
	p := filepath.Join(t.TempDir(), name)
	if err := os.WriteFile(p, []byte(text), 0o644); err != nil {
		t.Fatal(err)
	}
	in, err := Open(p, nil, "")
	if err != nil {
		t.Fatal(err)
	}
	return in
}

// probe is a Writer that checks the order of writes and counts the
// records rendered but not yet written.
type probe struct {
	inFlight, most atomic.Int64
	lines          []int
	delay          func(o *Outcome)
}

func (p *probe) Render(o *Outcome) error {
	n := p.inFlight.Add(1)
	for {
		m := p.most.Load()
		if n <= m || p.most.CompareAndSwap(m, n) {
			break
		}
	}
	if p.delay != nil {
		p.delay(o)
	}
	return nil
}

func (p *probe) Write(o *Outcome) error {
	p.inFlight.Add(-1)
	p.lines = append(p.lines, o.Line)
	return nil
}

func (p *probe) Close(Counts) error { return nil }

func builtin(t testing.TB) *materials.Dataset {
	ds, err := materials.Builtin()
	if err != nil {
		t.Fatal(err)
	}
	return ds
}

func TestRunWindowBoundsRecordsInFlight(t *testing.T) {
	const n, window = 300, 8
	in := openText(t, "c.jsonl", string(benchCollection(n, false)))
	// The first record is slow: without the window every later record
	// would pile up behind it.
	p := &probe{delay: func(o *Outcome) {
		if o.Line == 1 {
			for range 200000 {
				_ = fmt.Sprint(o.Line)
			}
		}
	}}
	c, err := Run(context.Background(), []*Input{in}, p, Options{Dataset: builtin(t), Workers: 4, Window: window})
	if err != nil {
		t.Fatal(err)
	}
	if c.Records != n || len(p.lines) != n {
		t.Fatalf("%d records counted, %d written, want %d", c.Records, len(p.lines), n)
	}
	for i, l := range p.lines {
		if l != i+1 {
			t.Fatalf("write %d is line %d: out of order", i+1, l)
		}
	}
	if m := p.most.Load(); m > window {
		t.Errorf("%d records were in flight at once, more than the window of %d", m, window)
	}
}

func TestRunCanceled(t *testing.T) {
	in := openText(t, "c.jsonl", string(benchCollection(500, false)))
	ctx, cancel := context.WithCancel(context.Background())
	p := &probe{delay: func(o *Outcome) {
		if o.Line == 20 {
			cancel()
		}
	}}
	c, err := Run(ctx, []*Input{in}, p, Options{Dataset: builtin(t), Workers: 2})
	if !errors.Is(err, context.Canceled) {
		t.Errorf("error %v, want context.Canceled", err)
	}
	if c.Records >= 500 {
		t.Errorf("all %d records were written after the cancel", c.Records)
	}
	// A streaming writer's records so far reach the output, each whole.
	in = openText(t, "c.jsonl", string(benchCollection(500, false)))
	ctx, cancel = context.WithCancel(context.Background())
	var out bytes.Buffer
	jw := NewJSONLWriter(&out, nil)
	c, err = Run(ctx, []*Input{in}, &cancelAt{Writer: jw, line: 30, cancel: cancel}, Options{Dataset: builtin(t), Workers: 2})
	if !errors.Is(err, context.Canceled) {
		t.Fatalf("error %v, want context.Canceled", err)
	}
	lines := strings.Split(strings.TrimSuffix(out.String(), "\n"), "\n")
	if len(lines) != c.Records || c.Records < 29 {
		t.Fatalf("%d lines on the output for %d records written", len(lines), c.Records)
	}
	for i, l := range lines {
		if !json.Valid([]byte(l)) {
			t.Fatalf("output line %d is not whole JSON", i+1)
		}
	}
}

// cancelAt cancels the survey when it writes a given line.
type cancelAt struct {
	Writer
	line   int
	cancel func()
}

func (c *cancelAt) Write(o *Outcome) error {
	if o.Line == c.line {
		c.cancel()
	}
	return c.Writer.Write(o)
}

func (c *cancelAt) Flush() error { return c.Writer.(*JSONLWriter).Flush() }

type failWriter struct{ probe }

func (f *failWriter) Write(o *Outcome) error {
	if o.Line == 3 {
		return errors.New("disk full")
	}
	return f.probe.Write(o)
}

func TestRunWriterErrorStops(t *testing.T) {
	in := openText(t, "c.jsonl", string(benchCollection(200, false)))
	c, err := Run(context.Background(), []*Input{in}, &failWriter{}, Options{Dataset: builtin(t)})
	if err == nil || err.Error() != "disk full" || c.Records != 2 {
		t.Errorf("error %v after %d records, want disk full after 2", err, c.Records)
	}
}

func TestReportSpill(t *testing.T) {
	var out bytes.Buffer
	rw := newReportWriter(&out, ReportInfo{}, false, 64)
	var c Counts
	for i := range 50 {
		o := &Outcome{ID: fmt.Sprintf("r-%02d", i), File: "f", Line: i + 1, Summary: Summary{Status: StatusConsistent, Claims: "1840 consistent"}}
		if i%10 == 0 {
			o.Summary = Summary{Status: StatusError, Err: "bad", Fails: true}
		}
		if err := rw.Render(o); err != nil {
			t.Fatal(err)
		}
		if err := rw.Write(o); err != nil {
			t.Fatal(err)
		}
		c.add(o.Summary)
	}
	spilled := rw.sections[StatusConsistent].file
	if spilled == nil {
		t.Fatal("the section did not move to a temporary file past its limit")
	}
	name := spilled.Name()
	if err := rw.Close(c); err != nil {
		t.Fatal(err)
	}
	if _, err := os.Stat(name); !errors.Is(err, os.ErrNotExist) {
		t.Errorf("the temporary file %s is still there: %v", name, err)
	}
	s := out.String()
	last := -1
	for i := range 50 {
		if i%10 == 0 {
			continue
		}
		at := strings.Index(s, fmt.Sprintf("| r-%02d |", i))
		if at < last {
			t.Fatalf("row r-%02d missing or out of order", i)
		}
		last = at
	}
	if !strings.Contains(s, "## Record errors: not checked (5)") || !strings.Contains(s, "## Consistent (45)") {
		t.Errorf("section counts wrong:\n%s", s)
	}
	if strings.Index(s, "## Record errors") > strings.Index(s, "## Consistent") {
		t.Error("errors should come before the consistent records")
	}
}

func TestCountsString(t *testing.T) {
	var c Counts
	for _, s := range []Status{StatusConsistent, StatusError, StatusExcluded, StatusConsistent} {
		c.add(Summary{Status: s})
	}
	if got, want := c.String(), "4 records: 1 excluded, 1 error, 2 consistent"; got != want {
		t.Errorf("got %q, want %q", got, want)
	}
}

func TestProgress(t *testing.T) {
	in := openText(t, "c.jsonl", string(benchCollection(40, false)))
	var buf bytes.Buffer
	// The first record takes long enough for the ticker to draw.
	p := &probe{delay: func(o *Outcome) {
		if o.Line == 1 {
			time.Sleep(700 * time.Millisecond)
		}
	}}
	if _, err := Run(context.Background(), []*Input{in}, p, Options{Dataset: builtin(t), Progress: &buf}); err != nil {
		t.Fatal(err)
	}
	s := buf.String()
	if !strings.HasSuffix(s, "\r\x1b[K") {
		t.Errorf("the progress line is not cleared at the end: %q", s)
	}
	if !strings.Contains(s, "survey: 0 records [") || !strings.Contains(s, "%") {
		t.Errorf("no progress line with a bar (the input's size is known): %q", s)
	}
}

// A record with a claim and nothing that bounds it is counted apart, and
// the summary reports say what its "consistent" means.
func TestUnboundedRecordsAreCounted(t *testing.T) {
	const text = "id,claim,materials,not_after\nu-1,1850,,\nb-1,1850,smalt,\nb-2,1850,,1900\n"
	summaries(t, "c.csv", text, func(format string, c Counts, out string) {
		if c.Records != 3 || c.Unbounded != 1 {
			t.Errorf("%s: %d records, %d unbounded; want 3 and 1 (u-1 only)", format, c.Records, c.Unbounded)
		}
		if !strings.Contains(out, "No finding or record bounds the date of 1 record") {
			t.Errorf("%s: the report does not say which records nothing bounds:\n%s", format, out)
		}
	})
}

// summaries surveys text (as a file of that name) against the built-in
// dataset once with the Markdown and once with the HTML summary writer,
// and gives check each format's counts and output.
func summaries(t *testing.T, name, text string, check func(format string, c Counts, out string)) {
	t.Helper()
	for _, format := range []string{"md", "html"} {
		var out bytes.Buffer
		var w Writer = NewMarkdownWriter(&out, ReportInfo{})
		if format == "html" {
			w = NewHTMLWriter(&out, ReportInfo{})
		}
		c, err := Run(context.Background(), []*Input{openText(t, name, text)}, w, Options{Dataset: builtin(t)})
		if err != nil {
			t.Fatal(err)
		}
		check(format, c, out.String())
	}
}

// Findings of materials not in the dataset are counted, and the summaries
// say they bound nothing.
func TestUnlistedFindingsAreCounted(t *testing.T) {
	const text = `{"id":"a","claims":[{"date":"1850"}],"findings":[{"material":"an unknown lake","unlisted":true},{"material":"smalt"}]}
{"id":"b","claims":[{"date":"1850"}],"findings":[{"material":"x","unlisted":true},{"material":"y","unlisted":true}]}
{"id":"c","claims":[{"date":"1850"}],"findings":[{"material":"smalt"}]}
`
	summaries(t, "c.jsonl", text, func(format string, c Counts, out string) {
		if c.Unlisted != 3 || c.UnlistedRecords != 2 {
			t.Errorf("%s: %d unlisted findings in %d records; want 3 in 2", format, c.Unlisted, c.UnlistedRecords)
		}
		if !strings.Contains(out, "3 findings of 2 records name materials not in the dataset, which bound nothing.") {
			t.Errorf("%s: the report does not count the unlisted findings:\n%s", format, out)
		}
	})
}
