package survey

import (
	"bytes"
	"context"
	"errors"
	"io"
	"testing"

	"terminus/constraint"
	"terminus/constraint/input"
)

// physicalLines counts the lines of a text as the line reader does: a
// last line without its line end is a line.
func physicalLines(text []byte) int {
	n := bytes.Count(text, []byte("\n"))
	if len(text) > 0 && text[len(text)-1] != '\n' {
		n++
	}
	return n
}

// readAllChecked reads every record of a file, and checks what every
// reader promises: records in order, none overlapping, every physical line
// read once and accounted for (header, blank, or in one record), every
// byte read, and the CSV splitters fed at most three times the input.
func readAllChecked(t *testing.T, in *Input, text []byte) []rawRecord {
	t.Helper()
	var recs []rawRecord
	next, inRecords := 1, 0
	for {
		r, err := in.next()
		if errors.Is(err, io.EOF) {
			break
		}
		if err != nil {
			t.Fatal(err)
		}
		if r.line < next || r.lines < 1 {
			t.Fatalf("a record at line %d+%d, after lines up to %d were taken", r.line, r.lines, next-1)
		}
		next = r.line + r.lines
		inRecords += r.lines
		recs = append(recs, r)
	}
	lines := physicalLines(text)
	if in.lines != lines || in.lines != in.header+in.blank+inRecords || next-1 > lines {
		t.Fatalf("%d physical lines; read %d: %d header, %d blank, %d in records, the last ending at %d", lines, in.lines, in.header, in.blank, inRecords, next-1)
	}
	if got := in.read.Load(); got != int64(len(text)) {
		t.Fatalf("%d bytes read of %d", got, len(text))
	}
	if s := in.scanned(); s > 3*int64(len(text)) {
		t.Fatalf("%d bytes scanned for %d bytes of input", s, len(text))
	}
	return recs
}

// openFuzz opens text as standard input (no file to write: faster).
func openFuzz(t *testing.T, text []byte, f Format) (*Input, bool) {
	in, err := Open("-", bytes.NewReader(text), f)
	if err != nil {
		var ie *InputError
		if !errors.As(err, &ie) {
			t.Fatalf("open: %v (%T) is not an *InputError", err, err)
		}
		return nil, false
	}
	return in, true
}

// FuzzJSONLine checks that every physical line of a JSON Lines input is
// one record or a blank line, and every record a case or an error of our
// type placed on its line, never a panic; and that the id pre-pass keeps
// every column in its place.
//
// Each record goes through the reasoner too, so a record whose analysis
// does not end stalls the fuzzer. That is how a run once hit its deadline
// with a busy worker: the mutator grows lines with many records of one of
// several dates, and the network solver's search for the cheapest
// correction had no cap (forty such records never ended). The solver's
// work budget ends it; the stalls of a few tens of seconds that remain in
// the progress lines (0 execs/sec) are the minimization of new inputs,
// whose executions are counted only when it ends.
func FuzzJSONLine(f *testing.F) {
	for _, s := range []string{
		`{"id": "a-1", "title": "t", "place": "NL", "findings": [{"material": "lead white"}], "claims": [{"date": "1650"}]}`,
		`{"title": "t", "id": 7}`, `{"id": {"x": 1}}`, `{"id": "x"`, `[1, 2]`, `"text"`, `{}`, `{"claimz": []}`,
		`{"findings": [{"id": "f", "material": ["smalt", "azurite"]}], "records": [{"not_after": "1700?"}]}`,
		"{}\n\n \t\n{\"title\": \"a\xffb\"}\r\n\u00a0\n{\"id\": 1}",
	} {
		f.Add(s)
	}
	ds := builtin(f)
	f.Fuzz(func(t *testing.T, text string) {
		in, ok := openFuzz(t, []byte(text), JSONL)
		if !ok {
			t.Fatal("a JSON Lines input always opens")
		}
		defer in.Close()
		for _, r := range readAllChecked(t, in, []byte(text)) {
			if r.lines != 1 {
				t.Fatalf("a record of %d lines", r.lines)
			}
			if r.err == nil {
				if _, rest, err := takeID(r.text); err == nil && len(rest) != len(r.text) {
					t.Fatalf("takeID changed the length: %q → %q", r.text, rest)
				}
			}
			p, err := parse(r)
			if err == nil {
				if p.c == nil {
					t.Fatal("no case and no error")
				}
				_, err = constraint.Analyze(context.Background(), p.c, ds, constraint.Options{NoSensitivity: true})
				if err != nil {
					err = onLine(err, "stdin", r.line)
				}
			}
			if err == nil {
				continue
			}
			var ce *input.Error
			if !errors.As(err, &ce) {
				t.Fatalf("error %v (%T) is not a *input.Error", err, err)
			}
			if ce.File != "stdin" || ce.Line != r.line {
				t.Fatalf("error %v is not placed on stdin line %d", err, r.line)
			}
		}
	})
}

// FuzzCSV checks that any file with a usable header yields records that
// account for every line, in order, each a case or an error of our type on
// the record's lines, within linear work.
func FuzzCSV(f *testing.F) {
	f.Add("id,title,claim,materials\na,\"x, y\",1840,lead white; smalt|azurite?\n")
	f.Add("id,claim\n\"a\nb\",18x5\n,\n")
	f.Add("materials,Notes\nsmalt,\"open\n")
	f.Add("\xef\xbb\xbfid,place\r\na,XQ\r\n")
	f.Add("id,title,n\na,\"x\ny\" z,1\nb,\"t\n\n\",2\nc,\xff,3\n")
	f.Add("id,title,n\na\",b,\"c\na\",b,\"c\n")
	f.Fuzz(func(t *testing.T, text string) {
		in, ok := openFuzz(t, []byte(text), CSV)
		if !ok {
			return
		}
		defer in.Close()
		for _, r := range readAllChecked(t, in, []byte(text)) {
			pr, err := parse(r)
			if err != nil {
				var ce *input.Error
				if !errors.As(err, &ce) || ce.Line < r.line || ce.Line >= r.line+r.lines {
					t.Fatalf("error %v (%T) is not a *input.Error on the record's lines %d+%d", err, err, r.line, r.lines)
				}
				continue
			}
			if pr.c == nil {
				t.Fatal("no case and no error")
			}
		}
	})
}
