package survey

import (
	"bytes"
	"context"
	"io"
	"os"
	"path/filepath"
	"runtime"
	"strings"
	"testing"
)

// collector is a Writer that keeps what it is given of every outcome.
type collector struct{ got []Outcome }

func (c *collector) Render(*Outcome) error { return nil }
func (c *collector) Write(o *Outcome) error {
	c.got = append(c.got, Outcome{File: o.File, Line: o.Line, Lines: o.Lines, ID: o.ID, Err: o.Err, Summary: o.Summary})
	return nil
}
func (c *collector) Close(Counts) error { return nil }

// surveyFile runs a survey of one file and returns the outcomes, the
// counts, and the input for its work counters.
func surveyFile(t testing.TB, path string) ([]Outcome, Counts, *Input) {
	t.Helper()
	in, err := Open(path, nil, "")
	if err != nil {
		t.Fatal(err)
	}
	var c collector
	counts, err := Run(context.Background(), []*Input{in}, &c, Options{Dataset: builtin(t), Workers: 2})
	if err != nil {
		t.Fatal(err)
	}
	return c.got, counts, in
}

// scanned is the number of bytes the CSV splitters of an input were fed.
func (in *Input) scanned() int64 { return in.split.scanned + in.csv.counting.scanned }

// checkWork holds the reading of a file to its size: every byte read once,
// and scanned at most three times (as the first line of a record, from
// inside an open quote, and to collect the fields).
func checkWork(t *testing.T, in *Input, path string) {
	t.Helper()
	st, err := os.Stat(path)
	if err != nil {
		t.Fatal(err)
	}
	if got := in.read.Load(); got != st.Size() {
		t.Errorf("%d bytes read of a file of %d", got, st.Size())
	}
	if s := in.scanned(); s > 3*st.Size() {
		t.Errorf("%d bytes scanned for a file of %d: more than three passes", s, st.Size())
	}
}

// One stray quote on line 5 used to close the quote that line 2 leaves
// open, and lines 2 to 5 became one record with a title of four lines.
func TestHostileUnbalancedQuote(t *testing.T) {
	path := filepath.Join("testdata", "hostile", "csv-unbalanced-quote-swallows-rows.csv")
	got, counts, in := surveyFile(t, path)
	want := []struct {
		id          string
		line, lines int
		status      Status
		errHas      string
	}{
		{"a1", 2, 1, StatusError, "hostile/csv-unbalanced-quote-swallows-rows.csv:2:4: a quoted field opens here and its closing quote on line 5 (column 14) is followed by text"},
		{"a2", 3, 1, StatusConsistent, ""},
		{"a3", 4, 1, StatusConsistent, ""},
		{"a4", 5, 1, StatusConsistent, ""},
	}
	if len(got) != len(want) {
		t.Fatalf("%d records, want %d: %+v", len(got), len(want), got)
	}
	for i, w := range want {
		g := got[i]
		if g.ID != w.id || g.Line != w.line || g.Lines != w.lines || g.Summary.Status != w.status {
			t.Errorf("record %d: %s line %d+%d %s, want %s line %d+%d %s", i+1, g.ID, g.Line, g.Lines, g.Summary.Status, w.id, w.line, w.lines, w.status)
		}
		if w.errHas != "" && (g.Err == nil || !strings.Contains(g.Err.Error(), w.errHas)) {
			t.Errorf("record %d: error %v, want %q", i+1, g.Err, w.errHas)
		}
	}
	if !counts.Balanced() || counts.Lines != 5 || counts.HeaderLines != 1 || counts.RecordLines != 4 || counts.Judged() != 3 || counts.Errors() != 1 {
		t.Errorf("counts: %s", counts.Accounting())
	}
	checkWork(t, in, path)
}

// A header of 100,000 columns: each free column is kept, matching them
// across the inputs is linear (it took minutes, quadratic), and the row,
// one field short, is an error record.
func TestHostileWideHeader(t *testing.T) {
	path := filepath.Join("testdata", "hostile", "csv-header-100000-columns.csv")
	got, counts, in := surveyFile(t, path)
	if len(in.Free) != 100000 || in.Free[0] != "x0" || in.Free[99999] != "x99999" {
		t.Errorf("%d free columns", len(in.Free))
	}
	if len(got) != 1 || got[0].ID != "a" || got[0].Line != 2 || got[0].Lines != 1 || got[0].Err == nil ||
		!strings.Contains(got[0].Err.Error(), "csv-header-100000-columns.csv:2: the row has 100001 fields, the header 100002") {
		t.Fatalf("%d records, want one: a, line 2, an error for its 100,001 fields", len(got))
	}
	if !counts.Balanced() || counts.Lines != 2 || counts.Records != 1 {
		t.Errorf("counts: %s", counts.Accounting())
	}
	checkWork(t, in, path)
}

// BenchmarkHostile surveys each hostile input whole (open, read, check,
// write JSON Lines); the promise is under a second and 256 MiB each. B/op
// is all the memory allocated in a run, a bound on its peak heap;
// heap-sys-MiB is the most memory the heap took from the system.
func BenchmarkHostile(b *testing.B) {
	ds := builtin(b)
	for _, name := range []string{"csv-unbalanced-quote-swallows-rows.csv", "csv-header-100000-columns.csv"} {
		path := filepath.Join("testdata", "hostile", name)
		b.Run(strings.TrimSuffix(name, ".csv"), func(b *testing.B) {
			b.ReportAllocs()
			var peak uint64
			for b.Loop() {
				in, err := Open(path, nil, "")
				if err != nil {
					b.Fatal(err)
				}
				c, err := Run(context.Background(), []*Input{in}, NewJSONLWriter(io.Discard, in.Free), Options{Dataset: ds})
				if err != nil || !c.Balanced() {
					b.Fatalf("%v: %s", err, c.Accounting())
				}
				var ms runtime.MemStats
				runtime.ReadMemStats(&ms)
				peak = max(peak, ms.HeapSys)
			}
			b.ReportMetric(float64(peak)/(1<<20), "heap-sys-MiB")
		})
	}
}

// A survey never stalls on one record: the record of forty one-of-two-
// hundred records, among two thousand ordinary ones, ends within the
// solver's work budget (its conflicts listed as incomplete), and every
// record gets its output record in order.
func TestHostileSlowRecord(t *testing.T) {
	data, err := os.ReadFile(filepath.Join("testdata", "hostile", "survey-one-slow-record.jsonl"))
	if err != nil {
		t.Fatal(err)
	}
	var out bytes.Buffer
	c, err := Run(context.Background(), []*Input{openText(t, "slow.jsonl", string(data))}, NewJSONLWriter(&out, nil), Options{Dataset: builtin(t)})
	if err != nil {
		t.Fatal(err)
	}
	if c.Records != 2001 || !c.Balanced() {
		t.Fatalf("%d records, balanced %v; want 2001, balanced", c.Records, c.Balanced())
	}
	lines := strings.Split(strings.TrimSpace(out.String()), "\n")
	if len(lines) != 2001 {
		t.Fatalf("%d output records, want 2001", len(lines))
	}
	slow := lines[1000]
	if !strings.Contains(slow, `"id":"slow-sets"`) || !strings.Contains(slow, `"conflicts_complete":{"hard":true,"firm":false`) {
		t.Errorf("the slow record's output: %.300s", slow)
	}
}

// One record of a long order of events writes an output record that
// grows linearly with the order (see TestLongOrdersGrowLinearly in cli).
func TestHostileChainRecord(t *testing.T) {
	data, err := os.ReadFile(filepath.Join("testdata", "hostile", "survey-one-chain-record-88KB.jsonl"))
	if err != nil {
		t.Fatal(err)
	}
	var out bytes.Buffer
	if _, err := Run(context.Background(), []*Input{openText(t, "chain.jsonl", string(data))}, NewJSONLWriter(&out, nil), Options{Dataset: builtin(t)}); err != nil {
		t.Fatal(err)
	}
	// 88 KB of input; the chains copied per event made hundreds of MB.
	if out.Len() > 100*len(data) {
		t.Errorf("%d bytes of output for %d of input", out.Len(), len(data))
	}
}
