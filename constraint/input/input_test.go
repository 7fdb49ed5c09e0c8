package input

import (
	"bytes"
	"errors"
	"os"
	"path/filepath"
	"strings"
	"testing"
)

func parseText(t *testing.T, text string, f Format) (*Node, error) {
	t.Helper()
	return Parse("t."+strings.ToLower(f.String()), []byte(text), f, Limits{})
}

// One behaviour for every format: empty input, a byte-order mark, invalid
// UTF-8, deep nesting and the size limit.
func TestSameRulesEveryFormat(t *testing.T) {
	docs := map[Format]string{
		YAML: "title: x\nclaims:\n  - date: \"1850\"\n",
		TOML: "title = \"x\"\n[[claims]]\ndate = \"1850\"\n",
		JSON: "{\"title\": \"x\",\n \"claims\": [{\"date\": \"1850\"}]}\n",
	}
	for f, doc := range docs {
		t.Run(f.String(), func(t *testing.T) {
			for _, empty := range []string{"", "  \n\n", "\ufeff"} {
				if f == YAML {
					empty += "# only a comment\n"
				}
				if _, err := parseText(t, empty, f); err == nil || !strings.Contains(err.Error(), "the file is empty") {
					t.Errorf("empty input %q: %v, want 'the file is empty'", empty, err)
				}
			}
			n, err := parseText(t, "\ufeff"+doc, f)
			plain, _ := parseText(t, doc, f)
			if err != nil || n.Kind != Mapping || n.Content[0].Value != "title" || n.Content[0].Pos() != plain.Content[0].Pos() {
				t.Errorf("with a byte-order mark: %v %+v, want the document with positions as without", err, n)
			}
			bad := strings.Replace(doc, "1850", "18\xff50", 1)
			var e *Error
			if _, err := parseText(t, bad, f); !errors.As(err, &e) || !strings.Contains(e.Msg, "not valid UTF-8") || e.Line != 3 && e.Line != 2 {
				t.Errorf("invalid UTF-8: %v, want an error at its line", err)
			}
			if _, err := Parse("t", []byte(doc), f, Limits{MaxBytes: 10}); err == nil || !strings.Contains(err.Error(), "larger than the limit of 10 bytes") {
				t.Errorf("size limit: %v", err)
			}
		})
	}
}

func TestDepthLimit(t *testing.T) {
	for _, tc := range []struct {
		name string
		f    Format
		text string
		line int
	}{
		{"JSON arrays", JSON, strings.Repeat("[", 70) + strings.Repeat("]", 70), 1},
		{"YAML flow", YAML, "a: " + strings.Repeat("[", 70) + strings.Repeat("]", 70), 1},
		{"YAML blocks", YAML, deepYAML(70), 65},
		{"TOML inline", TOML, "x = " + strings.Repeat("{a=", 70) + "1" + strings.Repeat("}", 70), 1},
		{"TOML dotted header", TOML, "title = \"x\"\n[" + strings.Repeat("a.", 69) + "a]\n", 2},
	} {
		t.Run(tc.name, func(t *testing.T) {
			_, err := parseText(t, tc.text, tc.f)
			var e *Error
			if !errors.As(err, &e) || !strings.Contains(e.Msg, "nested more than 64 levels deep") || e.Line != tc.line {
				t.Errorf("got %v, want 'nested more than 64 levels deep' at line %d", err, tc.line)
			}
		})
	}
	// Files people write are far from the limit: apostrophes in plain text
	// and brackets in comments do not count.
	ok := "names: [madder, dyer's madder]\nnote: it's [not a list] # a [comment\nlist:\n  - a\n  - - b\n"
	if _, err := parseText(t, ok, YAML); err != nil {
		t.Errorf("plain YAML: %v", err)
	}
}

func deepYAML(n int) string {
	var b strings.Builder
	for i := range n {
		b.WriteString(strings.Repeat(" ", i) + "a:\n")
	}
	return b.String()
}

// The hostile inputs end at once with a clear error; the work is one scan
// of the text (a benchmark shows the time).
func TestHostileInputs(t *testing.T) {
	for _, tc := range []struct {
		file, msg string
	}{
		{"toml-deep-inline-3000.toml", "nested more than 64 levels deep"},
		{"toml-deep-inline-10000.toml", "nested more than 64 levels deep"},
		{"toml-deep-dotted-table-30000.toml", "nested more than 64 levels deep"},
		{"two-documents.yaml", "a file holds one YAML document; found a second"},
	} {
		t.Run(tc.file, func(t *testing.T) {
			data, err := os.ReadFile(filepath.Join("testdata", "hostile", tc.file))
			if err != nil {
				t.Fatal(err)
			}
			_, err = Parse(tc.file, data, FormatOf(tc.file), Limits{})
			var e *Error
			if !errors.As(err, &e) || !strings.Contains(e.Msg, tc.msg) || e.Line == 0 {
				t.Errorf("got %v, want %q with a line", err, tc.msg)
			}
		})
	}
}

func BenchmarkHostileInputs(b *testing.B) {
	for _, file := range []string{"toml-deep-inline-10000.toml", "toml-deep-dotted-table-30000.toml"} {
		data, err := os.ReadFile(filepath.Join("testdata", "hostile", file))
		if err != nil {
			b.Fatal(err)
		}
		b.Run(file, func(b *testing.B) {
			b.ReportAllocs()
			for b.Loop() {
				if _, err := Parse(file, data, TOML, Limits{}); err == nil {
					b.Fatal("no error")
				}
			}
		})
	}
}

func TestReadLimit(t *testing.T) {
	_, err := Read("zero", bytes.NewReader(make([]byte, 1<<20)), Limits{MaxBytes: 1000})
	if err == nil || !strings.Contains(err.Error(), "zero: the file is larger than the limit of 1000 bytes") || !strings.Contains(err.(*Error).Hint(), "--max-input-size") {
		t.Errorf("got %v", err)
	}
	if _, err := ReadFile("/dev/zero", Limits{MaxBytes: 1 << 20}); err == nil || !strings.Contains(err.Error(), "larger than the limit of 1 MiB") {
		t.Errorf("/dev/zero: %v", err)
	}
}

// TOML positions are found again in the text.
func TestTOMLPositions(t *testing.T) {
	text := "title = \"x\"\nplace = 'NL'\n\n[[findings]]\nmaterial = \"smalt\"\n  \"event\" = \"making\"\n\n[[findings]]\nmaterial=[\"a\", \"b\"]\n[circa]\nyear = \"P5Y\"\n"
	n, err := parseText(t, text, TOML)
	if err != nil {
		t.Fatal(err)
	}
	want := map[string][4]int32{ // key → key line, key column, value line, value column
		"title":    {1, 1, 1, 9},
		"place":    {2, 1, 2, 9},
		"findings": {4, 1, 4, 1},
		"circa":    {10, 1, 10, 1},
	}
	for i := 0; i+1 < len(n.Content); i += 2 {
		k, v := n.Content[i], n.Content[i+1]
		if w, ok := want[k.Value]; ok && [4]int32{k.Line, k.Column, v.Line, v.Column} != w {
			t.Errorf("%s: key %d:%d value %d:%d, want %v", k.Value, k.Line, k.Column, v.Line, v.Column, w)
		}
		if k.Value == "findings" {
			second := v.Content[1]
			if second.Line != 8 {
				t.Errorf("second finding at line %d, want 8", second.Line)
			}
			first := v.Content[0]
			for j := 0; j+1 < len(first.Content); j += 2 {
				fk := first.Content[j]
				if fk.Value == "event" && (fk.Line != 6 || fk.Column != 3) {
					t.Errorf("quoted key event at %d:%d, want 6:3", fk.Line, fk.Column)
				}
			}
		}
	}
}

func TestReadFields(t *testing.T) {
	n, err := parseText(t, "titel: x\nplace: NL\nplace: GB\n", YAML)
	if err != nil {
		t.Fatal(err)
	}
	var got []string
	fs := ReadFields("t.yaml", n, "case file", []string{"title", "place"}, func(e *Error) bool {
		got = append(got, e.Error()+" | "+e.Hint())
		return true
	})
	want := []string{
		`t.yaml:1:1: case file: unknown key "titel" | did you mean 'title'? (the keys of a case file are title, place)`,
		`t.yaml:3:1: case file: key "place" is given twice (first on line 2) | keep one of them`,
	}
	if strings.Join(got, "\n") != strings.Join(want, "\n") {
		t.Errorf("problems:\n%s\nwant:\n%s", strings.Join(got, "\n"), strings.Join(want, "\n"))
	}
	if f, ok := fs.Lookup("title"); !ok || !f.Typo {
		t.Errorf("title should be marked a typo so that it is not reported missing")
	}
	if f, ok := fs.Given("place"); !ok || f.Value.Value != "NL" {
		t.Errorf("place = %+v", f)
	}
}

func TestQuoteShortensLongInput(t *testing.T) {
	long := strings.Repeat("x", 10000)
	if q := Quote(long); len(q) > 70 || !strings.HasSuffix(q, "…") {
		t.Errorf("Quote of 10,000 characters: %d bytes", len(q))
	}
}
