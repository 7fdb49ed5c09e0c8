package survey

import (
	"bytes"
	"context"
	"errors"
	"io"
	"os"
	"path/filepath"
	"testing"

	"terminus/constraint"
	"terminus/constraint/input"
)

// FuzzJSONLine checks that any line becomes a case or an error of our type
// placed on the input's line, never a panic, and that the id pre-pass
// keeps every column in its place.
func FuzzJSONLine(f *testing.F) {
	for _, s := range []string{
		`{"id": "a-1", "title": "t", "place": "NL", "findings": [{"material": "lead white"}], "claims": [{"date": "1650"}]}`,
		`{"title": "t", "id": 7}`, `{"id": {"x": 1}}`, `{"id": "x"`, `[1, 2]`, `"text"`, `{}`, `{"claimz": []}`,
		`{"findings": [{"id": "f", "material": ["smalt", "azurite"]}], "records": [{"not_after": "1700?"}]}`,
	} {
		f.Add(s)
	}
	ds := builtin(f)
	in := &Input{Name: "f.jsonl", Format: JSONL}
	f.Fuzz(func(t *testing.T, line string) {
		if bytes.ContainsAny([]byte(line), "\n") {
			return
		}
		if _, rest, err := takeID([]byte(line)); err == nil && len(rest) != len(line) {
			t.Fatalf("takeID changed the length: %q → %q", line, rest)
		}
		p, err := parse(rawRecord{in: in, line: 7, text: []byte(line)})
		if err == nil {
			if p.c == nil {
				t.Fatal("no case and no error")
			}
			_, err = constraint.Analyze(context.Background(), p.c, ds, constraint.Options{NoSensitivity: true})
			if err != nil {
				err = onLine(err, "f.jsonl", 7)
			}
		}
		if err == nil {
			return
		}
		var ce *input.Error
		if !errors.As(err, &ce) {
			t.Fatalf("error %v (%T) is not a *input.Error", err, err)
		}
		if ce.File != "f.jsonl" || ce.Line != 7 {
			t.Fatalf("error %v is not placed on f.jsonl line 7", err)
		}
	})
}

// FuzzCSV checks that any file with a usable header yields records whose
// lines lie in the file, in order, each a case or an error of our type.
func FuzzCSV(f *testing.F) {
	f.Add("id,title,claim,materials\na,\"x, y\",1840,lead white; smalt|azurite?\n")
	f.Add("id,claim\n\"a\nb\",18x5\n,\n")
	f.Add("materials,Notes\nsmalt,\"open\n")
	f.Add("\xef\xbb\xbfid,place\r\na,XQ\r\n")
	dir := f.TempDir()
	f.Fuzz(func(t *testing.T, text string) {
		p := filepath.Join(dir, "f.csv")
		if err := os.WriteFile(p, []byte(text), 0o644); err != nil {
			t.Fatal(err)
		}
		in, err := Open(p, nil, CSV)
		if err != nil {
			var ie *InputError
			if !errors.As(err, &ie) {
				t.Fatalf("open: %v (%T) is not an *InputError", err, err)
			}
			return
		}
		defer in.Close()
		lines := bytes.Count([]byte(text), []byte("\n")) + 1
		last := 0
		for {
			r, err := in.next()
			if errors.Is(err, io.EOF) {
				break
			}
			if err != nil {
				t.Fatal(err)
			}
			if r.line <= last || r.line > lines {
				t.Fatalf("record at line %d after %d, in a file of %d lines", r.line, last, lines)
			}
			last = r.line
			pr, err := parse(r)
			if err != nil {
				var ce *input.Error
				if !errors.As(err, &ce) || ce.Line < r.line || ce.Line > lines {
					t.Fatalf("error %v (%T) is not a *input.Error on the record's lines", err, err)
				}
				continue
			}
			if pr.c == nil {
				t.Fatal("no case and no error")
			}
		}
	})
}
