package survey

import (
	"fmt"
	"math/rand/v2"
	"os"
	"path/filepath"
	"strings"
	"testing"
)

// span is what one output record should be: where it starts, how many
// physical lines it takes, and whether it is an error record.
type span struct {
	line, lines int
	err         bool
}

// malformedCSV writes a collection of n records with a share of malformed
// lines of many kinds, and says what each record should become and which
// lines are blank. The quoted fields it writes all begin with a letter, so
// that a stray open quote meets, at the next quote of the file, an opening
// quote followed by text (a bad close) and stands alone as an error.
func malformedCSV(n int, bad float64, seed uint64) (text string, want []span, blanks []int) {
	rng := rand.New(rand.NewPCG(seed, seed+1))
	var b strings.Builder
	line := 0
	mats := []string{"lead white", "smalt", "azurite", "vermilion", "prussian blue", "chrome yellow", "madder lake"}
	places := []string{"NL", "GB", "FR", "DE", "IT", "JP", ""}
	emit := func(l string) {
		line++
		b.WriteString(l)
		if rng.IntN(4) == 0 {
			b.WriteString("\r\n")
		} else {
			b.WriteString("\n")
		}
	}
	b.WriteString("\xef\xbb\xbf")
	emit("id,title,place,claim,materials,not_before,not_after,inventory")
	row := func(i int, title, claim, mat string) string {
		return fmt.Sprintf("r-%d,%s,%s,%s,%s; %s?,,%d,INV %d", i, title, places[rng.IntN(len(places))], claim, mat,
			mats[rng.IntN(len(mats))], 1700+rng.IntN(300), i)
	}
	for i := range n {
		claim := fmt.Sprint(1600 + rng.IntN(400))
		mat := mats[rng.IntN(len(mats))]
		if rng.Float64() >= bad {
			switch rng.IntN(10) {
			case 0: // a quoted title over two lines
				emit(fmt.Sprintf("r-%d,\"Object %d", i, i))
				emit("on two lines\"" + strings.TrimPrefix(row(i, "", claim, mat), fmt.Sprintf("r-%d,", i)))
				want = append(want, span{line - 1, 2, false})
			case 1: // over three, a blank line and a doubled quote inside
				emit(fmt.Sprintf("r-%d,\"Object \"\"%d\"\"", i, i))
				emit("")
				emit("three lines\"" + strings.TrimPrefix(row(i, "", claim, mat), fmt.Sprintf("r-%d,", i)))
				want = append(want, span{line - 2, 3, false})
			case 2: // a comma inside quotes
				emit(row(i, fmt.Sprintf("\"Sign, object %d\"", i), claim, mat))
				want = append(want, span{line, 1, false})
			default:
				emit(row(i, fmt.Sprintf("Object %d", i), claim, mat))
				want = append(want, span{line, 1, false})
			}
			continue
		}
		switch kind := rng.IntN(8); kind {
		case 0: // an unbalanced quote
			emit(row(i, fmt.Sprintf("\"Object %d", i), claim, mat))
			want = append(want, span{line, 1, true})
		case 1: // a field too many
			emit(row(i, "Object", claim, mat) + ",extra")
			want = append(want, span{line, 1, true})
		case 2: // a field too few
			emit(fmt.Sprintf("r-%d,Object,NL,%s", i, claim))
			want = append(want, span{line, 1, true})
		case 3: // a bad date
			emit(row(i, "Object", "18x5", mat))
			want = append(want, span{line, 1, true})
		case 4: // an unknown material
			emit(row(i, "Object", claim, mat+"qx"))
			want = append(want, span{line, 1, true})
		case 5: // invalid UTF-8
			emit(row(i, "Object \xff\xfe", claim, mat))
			want = append(want, span{line, 1, true})
		case 6: // a quoted field over two lines that leaves the row a field too many:
			// its first line is an error, its second a row of its own, short
			emit(fmt.Sprintf("r-%d,\"Two", i))
			emit("lines\",NL," + claim + "," + mat + ",,,INV,extra")
			want = append(want, span{line - 1, 1, true}, span{line, 1, true})
		case 7: // blank lines: no record
			emit("")
			blanks = append(blanks, line)
			emit(" \t")
			blanks = append(blanks, line)
			emit(row(i, "After blanks", claim, mat))
			want = append(want, span{line, 1, false})
		}
	}
	return b.String(), want, blanks
}

// Every physical line belongs to exactly one of: the header, a blank line,
// one output record; and every input record gives one output record, a
// result or an error, as the generator meant it.
func TestCSVAccounting(t *testing.T) {
	text, want, blanks := malformedCSV(3000, 0.05, 7)
	path := filepath.Join(t.TempDir(), "c.csv")
	writeFile(t, path, text)
	got, counts, in := surveyFile(t, path)
	lines := strings.Count(text, "\n")
	if len(got) != len(want) {
		t.Fatalf("%d output records, want %d", len(got), len(want))
	}
	for i, w := range want {
		g := got[i]
		if g.Line != w.line || g.Lines != w.lines || (g.Summary.Status == StatusError) != w.err {
			t.Fatalf("record %d: line %d+%d, error %v (%v); want line %d+%d, error %v", i+1, g.Line, g.Lines, g.Err != nil, g.Err, w.line, w.lines, w.err)
		}
	}
	owner := make([]int, lines+1) // 0: nobody yet
	claim := func(l, who int) {
		if l < 1 || l > lines || owner[l] != 0 {
			t.Fatalf("line %d claimed by %d and %d (of %d lines)", l, owner[max(0, min(l, lines))], who, lines)
		}
		owner[l] = who
	}
	claim(1, -1) // the header
	for _, l := range blanks {
		claim(l, -2)
	}
	for i, o := range got {
		for l := o.Line; l < o.Line+o.Lines; l++ {
			claim(l, i+1)
		}
	}
	for l := 1; l <= lines; l++ {
		if owner[l] == 0 {
			t.Errorf("line %d belongs to no record", l)
		}
	}
	if counts.Lines != lines || counts.HeaderLines != 1 || counts.BlankLines != len(blanks) || !counts.Balanced() {
		t.Errorf("counts %s; want %d lines, %d blank", counts.Accounting(), lines, len(blanks))
	}
	errs := 0
	for _, w := range want {
		if w.err {
			errs++
		}
	}
	if counts.Records != len(want) || counts.Errors() != errs {
		t.Errorf("counts %s; want %d records, %d errors", counts.Accounting(), len(want), errs)
	}
	if errs < 100 {
		t.Errorf("only %d malformed records: the generator should make about 5 %%", errs)
	}
	checkWork(t, in, path)
}

func writeFile(t testing.TB, path, text string) {
	t.Helper()
	if err := os.WriteFile(path, []byte(text), 0o644); err != nil {
		t.Fatal(err)
	}
}

// Every physical line of a JSON Lines input is one output record, or a
// blank line: an invalid UTF-8 line, a line over the size limit, a line of
// other white space are error records of their own line.
func TestJSONLAccounting(t *testing.T) {
	good := `{"id": "g", "claims": [{"date": "1850"}], "findings": [{"material": "smalt"}]}`
	lines := []struct {
		text string
		want string // "ok", "error" or "blank"
	}{
		{"\xef\xbb\xbf" + good, "ok"},
		{good + "\r", "ok"},
		{"", "blank"},
		{" \t\r", "blank"},
		{`{"id": "broken", "claims": [`, "error"},
		{`{"id": "bad-utf8", "title": "a` + "\xff" + `"}`, "error"},
		{`{"id": "long", "title": "` + strings.Repeat("x", MaxLine) + `"}`, "error"},
		{"\u00a0", "error"},
		{`{"id": "sep", "title": "a` + "\u2028" + `b", "claims": [{"date": "1850"}]}`, "ok"},
		{good, "ok"},
	}
	var b strings.Builder
	for _, l := range lines {
		b.WriteString(l.text + "\n")
	}
	path := filepath.Join(t.TempDir(), "c.jsonl")
	writeFile(t, path, b.String())
	got, counts, in := surveyFile(t, path)
	var want []string
	for i, l := range lines {
		if l.want != "blank" {
			want = append(want, fmt.Sprintf("%d %s", i+1, l.want))
		}
	}
	var have []string
	for _, o := range got {
		s := "ok"
		if o.Summary.Status == StatusError {
			s = "error"
		}
		if o.Lines != 1 {
			t.Errorf("line %d: a record of %d lines", o.Line, o.Lines)
		}
		have = append(have, fmt.Sprintf("%d %s", o.Line, s))
	}
	if fmt.Sprint(have) != fmt.Sprint(want) {
		t.Errorf("records %q\nwant %q", have, want)
	}
	if !counts.Balanced() || counts.Lines != len(lines) || counts.BlankLines != 2 || counts.HeaderLines != 0 {
		t.Errorf("counts %s", counts.Accounting())
	}
	if got := in.read.Load(); got != int64(b.Len()) {
		t.Errorf("%d bytes read of %d", got, b.Len())
	}
}
