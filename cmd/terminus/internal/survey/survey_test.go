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

func TestCSVSplitter(t *testing.T) {
	tests := []struct {
		name  string
		lines []string
		want  []string
		cols  []int
	}{
		{"plain", []string{"a,b,c"}, []string{"a", "b", "c"}, []int{1, 3, 5}},
		{"empty fields", []string{",,"}, []string{"", "", ""}, []int{1, 2, 3}},
		{"quoted comma", []string{`x,"a, b",y`}, []string{"x", "a, b", "y"}, []int{1, 3, 10}},
		{"doubled quote", []string{`"say ""hi""",z`}, []string{`say "hi"`, "z"}, []int{1, 14}},
		{"spans lines", []string{`1,"two`, `lines",3`}, []string{"1", "two\nlines", "3"}, []int{1, 3, 8}},
		{"stray quote kept", []string{`5" x 7",b`}, []string{`5" x 7"`, "b"}, []int{1, 9}},
		{"text after closing quote", []string{`"a"b,c`}, []string{"ab", "c"}, []int{1, 6}},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			s := csvSplitter{collect: true}
			s.reset(1)
			for i, l := range tc.lines {
				s.feed([]byte(l), i+1)
				if open := s.inQuotes; open != (i < len(tc.lines)-1) {
					t.Fatalf("after line %d: a quote open %v", i+1, open)
				}
			}
			s.finish()
			var got []string
			var cols []int
			for _, f := range s.fields {
				got = append(got, f.Text)
				cols = append(cols, f.Column)
			}
			if fmt.Sprint(got) != fmt.Sprint(tc.want) || fmt.Sprint(cols) != fmt.Sprint(tc.cols) {
				t.Errorf("got %q at %v, want %q at %v", got, cols, tc.want, tc.cols)
			}
		})
	}
}

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

func TestCSVHeader(t *testing.T) {
	in := openText(t, "h.csv", "ID, Not Before ,Material,Claimed,Shelf mark\n")
	for col, idx := range map[string]int{colID: 0, colNotBefore: 1, colMaterials: 2, colClaim: 3} {
		if in.known[col] != idx {
			t.Errorf("column %s at %d, want %d (known %v)", col, in.known[col], idx, in.known)
		}
	}
	if fmt.Sprint(in.Free) != "[Shelf mark]" {
		t.Errorf("free columns %q", in.Free)
	}
	for _, tc := range []struct{ text, want string }{
		{"id,claim,Claim\n", `names the column "claim" twice`},
		{"title,tittle\n", `did you mean "title"?`},
		{"\"id,claim\n", "does not close"},
	} {
		p := filepath.Join(t.TempDir(), "bad.csv")
		os.WriteFile(p, []byte(tc.text), 0o644)
		_, err := Open(p, nil, "")
		var ie *InputError
		if !errors.As(err, &ie) || !strings.Contains(err.Error(), tc.want) {
			t.Errorf("%q: error %v, want an InputError with %q", tc.text, err, tc.want)
		}
	}
}

// readRecords reads every record of an input and gives each as
// "LINE+LINES", with " error" for an error record (of the reader or the
// parser), and checks that the lines add up.
func readRecords(t *testing.T, in *Input) []string {
	t.Helper()
	var got []string
	inRecords := 0
	for {
		r, err := in.next()
		if errors.Is(err, io.EOF) {
			break
		}
		if err != nil {
			t.Fatal(err)
		}
		s := fmt.Sprintf("%d+%d", r.line, r.lines)
		if _, err := parse(r); err != nil {
			s += " error"
		}
		got = append(got, s)
		inRecords += r.lines
	}
	if in.lines != in.header+in.blank+inRecords {
		t.Errorf("%d lines read, %d header, %d blank, %d in records: they do not add up", in.lines, in.header, in.blank, inRecords)
	}
	return got
}

// A quoted field may span lines only when it closes properly and the row
// then has the header's number of fields; otherwise the line that opens
// it is an error record and the next line is read afresh.
func TestCSVQuotesThatSpanLines(t *testing.T) {
	tests := []struct {
		name, text string
		want       string
		errHas     string // in the first error
	}{
		{"closes on the next line", "id,title,n\na,\"x\ny\",1\nb,t,2\n", "[2+2 4+1]", ""},
		{"a blank line and a doubled quote inside", "id,title,n\na,\"x \"\"\n\ny\",1\n", "[2+3]", ""},
		{"CRLF line ends", "id,title,n\r\na,\"x\r\ny\",1\r\nb,t,2\r\n", "[2+2 4+1]", ""},
		{"closes and opens another", "id,title,n,note\na,\"x\ny\",1,\"p\nq\"\n", "[2+3]", ""},
		{"the closing quote is followed by text", "id,title,n\na,\"x\ny\" z,1\nb,t,2\n", "[2+1 error 3+1 error 4+1]",
			"c.csv:2:3: a quoted field opens here and its closing quote on line 3 (column 2) is followed by text, not by a comma"},
		{"the row would have a field too many", "id,title,n\na,\"x\ny\",1,2\nb,t,3\n", "[2+1 error 3+1 4+1]",
			"c.csv:2:3: a quoted field opens here and closes on line 3, but the row would then have 4 fields, the header 3"},
		{"never closed", "id,title,n\na,ok,1\nb,\"never closed\nc,kept,3\n", "[2+1 3+1 error 4+1]",
			"c.csv:3:3: a quoted field opens here and is not closed before the end of the file"},
		{"invalid UTF-8 in a record of two lines", "id,title,n\na,\"x\n\xff\",1\n", "[2+2 error]", "c.csv:3:1: the text is not valid UTF-8"},
		{"a stray quote inside a field is text", "id,title,n\na,5\" x 7\",1\n", "[2+1]", ""},
		{"blank lines are no records", "\nid,title,n\n \t\na,t,1\n\n", "[4+1]", ""},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			in := openText(t, "c.csv", tc.text)
			if got := fmt.Sprint(readRecords(t, in)); got != tc.want {
				t.Errorf("records %s, want %s", got, tc.want)
			}
			if tc.errHas == "" {
				return
			}
			in = openText(t, "c.csv", tc.text)
			for {
				r, err := in.next()
				if err != nil {
					t.Fatalf("no error record: %v", err)
				}
				if _, err := parse(r); err != nil {
					if !strings.Contains(err.Error(), tc.errHas) {
						t.Errorf("error %q, want %q", err, tc.errHas)
					}
					return
				}
			}
		})
	}
}

// Lines that each open a quote and keep it open when read from inside
// one: every line is an error record, and deciding so takes linear work
// (read afresh from each line, the rest of the file would be scanned again
// and again).
func TestCSVOpenQuotesCostLinearWork(t *testing.T) {
	const n = 20000
	text := "id,title,n\n" + strings.Repeat("a\",b,\"c\n", n)
	path := filepath.Join(t.TempDir(), "q.csv")
	writeFile(t, path, text)
	in, err := Open(path, nil, "")
	if err != nil {
		t.Fatal(err)
	}
	got := readRecords(t, in)
	if len(got) != n || got[0] != "2+1 error" || got[n-1] != fmt.Sprintf("%d+1 error", n+1) {
		t.Fatalf("%d records, from %v to %v; want %d errors of one line", len(got), got[0], got[len(got)-1], n)
	}
	if s := in.scanned(); s > 3*int64(len(text)) {
		t.Errorf("%d bytes scanned for %d bytes of input", s, len(text))
	}
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

func TestCSVLongRecords(t *testing.T) {
	big := strings.Repeat("x", MaxLine*3/5)
	// Two records of 0.6 MiB each are fine; a quoted field that runs on
	// past the limit is an error at its first line, and the reader goes on
	// at the next.
	text := "id,notes\na," + big + "\nb," + big + "\nc,\"" + big + "\n" + big + "\nmore\"\nd,ok\n"
	in := openText(t, "long.csv", text)
	var got []string
	for {
		r, err := in.next()
		if errors.Is(err, io.EOF) {
			break
		}
		if err != nil {
			t.Fatal(err)
		}
		s := fmt.Sprint(r.line)
		if _, err := parse(r); err != nil {
			s += " error"
		}
		got = append(got, s)
	}
	// Lines 5 and 6, the rest of the runaway field, are read as rows of
	// their own, with one field too few each.
	if want := "[2 3 4 error 5 error 6 error 7]"; fmt.Sprint(got) != want {
		t.Errorf("records %v, want %s", got, want)
	}
}

// A record with a claim and nothing that bounds it is counted apart, and
// the summary reports say what its "consistent" means.
func TestUnboundedRecordsAreCounted(t *testing.T) {
	const text = "id,claim,materials,not_after\nu-1,1850,,\nb-1,1850,smalt,\nb-2,1850,,1900\n"
	for _, format := range []string{"md", "html"} {
		var out bytes.Buffer
		var w Writer = NewMarkdownWriter(&out, ReportInfo{})
		if format == "html" {
			w = NewHTMLWriter(&out, ReportInfo{})
		}
		c, err := Run(context.Background(), []*Input{openText(t, "c.csv", text)}, w, Options{Dataset: builtin(t)})
		if err != nil {
			t.Fatal(err)
		}
		if c.Records != 3 || c.Unbounded != 1 {
			t.Errorf("%s: %d records, %d unbounded; want 3 and 1 (u-1 only)", format, c.Records, c.Unbounded)
		}
		if !strings.Contains(out.String(), "No finding or record bounds the date of 1 record") {
			t.Errorf("%s: the report does not say which records nothing bounds:\n%s", format, out.String())
		}
	}
}

// Findings of materials not in the dataset are counted, and the summaries
// say they bound nothing.
func TestUnlistedFindingsAreCounted(t *testing.T) {
	const text = `{"id":"a","claims":[{"date":"1850"}],"findings":[{"material":"an unknown lake","unlisted":true},{"material":"smalt"}]}
{"id":"b","claims":[{"date":"1850"}],"findings":[{"material":"x","unlisted":true},{"material":"y","unlisted":true}]}
{"id":"c","claims":[{"date":"1850"}],"findings":[{"material":"smalt"}]}
`
	for _, format := range []string{"md", "html"} {
		var out bytes.Buffer
		var w Writer = NewMarkdownWriter(&out, ReportInfo{})
		if format == "html" {
			w = NewHTMLWriter(&out, ReportInfo{})
		}
		c, err := Run(context.Background(), []*Input{openText(t, "c.jsonl", text)}, w, Options{Dataset: builtin(t)})
		if err != nil {
			t.Fatal(err)
		}
		if c.Unlisted != 3 || c.UnlistedRecords != 2 {
			t.Errorf("%s: %d unlisted findings in %d records; want 3 in 2", format, c.Unlisted, c.UnlistedRecords)
		}
		if !strings.Contains(out.String(), "3 findings of 2 records name materials not in the dataset, which bound nothing.") {
			t.Errorf("%s: the report does not count the unlisted findings:\n%s", format, out.String())
		}
	}
}
