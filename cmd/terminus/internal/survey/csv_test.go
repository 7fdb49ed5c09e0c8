package survey

import (
	"errors"
	"fmt"
	"os"
	"path/filepath"
	"strings"
	"testing"
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

// readRecords reads every record of an input made of text, checked as
// readAllChecked checks it, and gives each as "LINE+LINES", with " error"
// for an error record (of the reader or the parser).
func readRecords(t *testing.T, in *Input, text string) []string {
	t.Helper()
	var got []string
	for _, r := range readAllChecked(t, in, []byte(text)) {
		s := fmt.Sprintf("%d+%d", r.line, r.lines)
		if _, err := parse(r); err != nil {
			s += " error"
		}
		got = append(got, s)
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
			if got := fmt.Sprint(readRecords(t, in, tc.text)); got != tc.want {
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
	got := readRecords(t, in, text) // which also holds the work to three times the input
	if len(got) != n || got[0] != "2+1 error" || got[n-1] != fmt.Sprintf("%d+1 error", n+1) {
		t.Fatalf("%d records, from %v to %v; want %d errors of one line", len(got), got[0], got[len(got)-1], n)
	}
}

func TestCSVLongRecords(t *testing.T) {
	big := strings.Repeat("x", MaxLine*3/5)
	// Two records of 0.6 MiB each are fine; a quoted field that runs on
	// past the limit is an error at its first line, and the reader goes on
	// at the next.
	text := "id,notes\na," + big + "\nb," + big + "\nc,\"" + big + "\n" + big + "\nmore\"\nd,ok\n"
	got := readRecords(t, openText(t, "long.csv", text), text)
	// Lines 5 and 6, the rest of the runaway field, are read as rows of
	// their own, with one field too few each.
	if want := "[2+1 3+1 4+1 error 5+1 error 6+1 error 7+1]"; fmt.Sprint(got) != want {
		t.Errorf("records %v, want %s", got, want)
	}
}
