package constraint

import (
	"bytes"
	"encoding/json"
	"fmt"
	"math/rand/v2"
	"strings"
	"testing"

	"gopkg.in/yaml.v3"
)

// sameTree compares the parts of two node trees that the case decoder
// reads: kind, position, scalar value, null or not, quoted or plain.
func sameTree(a, b *yaml.Node, path string) error {
	if a.Kind != b.Kind || a.Line != b.Line || a.Column != b.Column {
		return fmt.Errorf("%s: kind/line/column %d %d:%d, YAML reader %d %d:%d", path, a.Kind, a.Line, a.Column, b.Kind, b.Line, b.Column)
	}
	if a.Kind == yaml.ScalarNode {
		if a.Value != b.Value || (a.Tag == "!!null") != (b.Tag == "!!null") || (a.Style == 0) != (b.Style == 0) {
			return fmt.Errorf("%s: scalar %q %s style %d, YAML reader %q %s style %d", path, a.Value, a.Tag, a.Style, b.Value, b.Tag, b.Style)
		}
	}
	if len(a.Content) != len(b.Content) {
		return fmt.Errorf("%s: %d children, YAML reader %d", path, len(a.Content), len(b.Content))
	}
	for i := range a.Content {
		if err := sameTree(a.Content[i], b.Content[i], fmt.Sprintf("%s/%d", path, i)); err != nil {
			return err
		}
	}
	return nil
}

// yamlCanCompare reports whether the YAML reader reads data as JSON does:
// it counts U+0085, U+2028 and U+2029 as line breaks and refuses some
// escapes ("\/") and invalid UTF-8, where JSON does not.
func yamlCanCompare(data []byte) bool {
	return !bytes.ContainsAny(data, "\u0085\u2028\u2029\ufeff") && !bytes.Contains(data, []byte(`\/`)) && json.Valid(data) && bytesValidUTF8(data)
}

func bytesValidUTF8(b []byte) bool { return strings.ToValidUTF8(string(b), "\x00") == string(b) }

// checkJSON holds the JSON reader to encoding/json (what is valid) and to
// the YAML reader (the tree and its positions), where the YAML reader
// reads the text at all (it refuses, say, a line break between a key and
// its colon, which JSON allows); it reports whether the trees were compared.
func checkJSON(t *testing.T, data []byte) (compared bool) {
	t.Helper()
	got, err := jsonToNode("t.json", data)
	valid := json.Valid(data)
	empty := len(bytes.Trim(data, " \t\r\n")) == 0 // JSON's white space, not \v or \f
	switch {
	case empty:
		if got != nil || err != nil {
			t.Fatalf("%q: empty input gave %v, %v", data, got, err)
		}
		return false
	case valid && err != nil:
		t.Fatalf("%q is valid JSON, but: %v", data, err)
	case !valid && err == nil:
		t.Fatalf("%q is not valid JSON, but it was read", data)
	case !valid:
		if _, ok := err.(*Error); !ok {
			t.Fatalf("%q: error %T, want *Error", data, err)
		}
		return false
	}
	if !yamlCanCompare(data) {
		return false
	}
	var doc yaml.Node
	if err := yaml.Unmarshal(data, &doc); err != nil {
		return false
	}
	if err := sameTree(got, doc.Content[0], "$"); err != nil {
		t.Fatalf("%q: %v", data, err)
	}
	return true
}

// randomJSON writes a random JSON value shaped like a case, with random
// white space (spaces, tabs, line breaks of three kinds) between tokens.
func randomJSON(rng *rand.Rand, b *strings.Builder, depth int) {
	ws := func() {
		for range rng.IntN(3) {
			b.WriteString([]string{" ", "\t", "\n", "\r\n", "  "}[rng.IntN(5)])
		}
	}
	ws()
	switch k := rng.IntN(10); {
	case depth < 4 && k < 3:
		b.WriteByte('{')
		for i := range rng.IntN(4) {
			if i > 0 {
				b.WriteByte(',')
			}
			ws()
			b.WriteString(strQuote(rng))
			ws()
			b.WriteByte(':')
			randomJSON(rng, b, depth+1)
		}
		ws()
		b.WriteByte('}')
	case depth < 4 && k < 5:
		b.WriteByte('[')
		for i := range rng.IntN(4) {
			if i > 0 {
				b.WriteByte(',')
			}
			randomJSON(rng, b, depth+1)
		}
		ws()
		b.WriteByte(']')
	case k < 8:
		b.WriteString(strQuote(rng))
	default:
		b.WriteString([]string{"1850", "-0", "0", "3.25", "-1.5e+3", "2E8", "true", "false", "null", "12345678901234567890"}[rng.IntN(10)])
	}
	ws()
}

func strQuote(rng *rand.Rand) string {
	parts := []string{"findings", "material", "lead white", "Gräfin", "藍", "\\u00e9", "\\n", "\\\"", "\\\\", "\\t", "c. 1870", "1870~", "é", "\\ud83c\\udfa8", "a b"}
	var s strings.Builder
	s.WriteByte('"')
	for range rng.IntN(4) {
		s.WriteString(parts[rng.IntN(len(parts))])
	}
	s.WriteByte('"')
	return s.String()
}

func TestJSONReaderMatchesYAMLReader(t *testing.T) {
	rng := rand.New(rand.NewPCG(5, 6))
	compared := 0
	for range 5000 {
		var b strings.Builder
		randomJSON(rng, &b, 0)
		if checkJSON(t, []byte(b.String())) {
			compared++
		}
	}
	if compared < 2000 {
		t.Errorf("only %d of 5000 random documents were compared with the YAML reader", compared)
	}
	// Every example, written as indented JSON and as one line.
	for _, ex := range examples(t) {
		p, data := ex.path, ex.data
		var v any
		if err := yaml.Unmarshal(data, &v); err != nil {
			t.Fatal(err)
		}
		for _, indent := range []string{"", "  "} {
			j, err := json.MarshalIndent(v, "", indent)
			if err != nil {
				t.Fatal(err)
			}
			if !checkJSON(t, j) {
				t.Errorf("%s: the example in JSON was not compared", p)
			}
			// And the case it holds is the example's case.
			fromJSON, err := ParseCase(p, j, "json")
			if err != nil {
				t.Fatalf("%s as JSON: %v", p, err)
			}
			fromYAML, err := ParseCase(p, data, "yaml")
			if err != nil {
				t.Fatal(err)
			}
			if len(fromJSON.Findings) != len(fromYAML.Findings) || len(fromJSON.Claims) != len(fromYAML.Claims) || fromJSON.Title != fromYAML.Title {
				t.Errorf("%s: the JSON form reads differently", p)
			}
		}
	}
}

// Mistakes are reported where they are, with what was expected.
func TestJSONReaderErrors(t *testing.T) {
	for _, tc := range []struct {
		in        string
		line, col int
		msg       string
	}{
		{`{"title": "x",}`, 1, 15, "a ',' before '}'"},
		{`{"title": 1, 2}`, 1, 14, "expected a key in double quotes"},
		{"{\"findings\": [\n  {\"material\": \"smalt\"},\n]}", 3, 1, "a ',' before ']'"},
		{`{"title" "x"}`, 1, 10, `expected ':' after the key "title"`},
		{"{\n  \"findings\": [1, 2\n}", 3, 1, "expected ',' or ']'"},
		{`{"a": "b`, 1, 9, "a '\"' is missing"},
		{"{\"a\": \"b\x01\"}", 1, 9, "a control character"},
		{`{"a": "\q"}`, 1, 8, `unknown escape \q`},
		{`{"a": "\u12"}`, 1, 8, `\u must be followed by four hexadecimal digits`},
		{`{"a": 01}`, 1, 8, "expected ',' or '}'"},
		{`{"a": -}`, 1, 7, "needs digits after its sign"},
		{`{"a": 1.}`, 1, 7, "decimal point"},
		{`{"a": tru}`, 1, 7, `unexpected 't'`},
		{`{"é": "ü", "x": ?}`, 1, 17, `unexpected '?'`},
		{`{} {}`, 1, 4, "unexpected text after the end"},
		{strings.Repeat("[", 100), 1, 66, "nested more than 64 levels"},
	} {
		_, err := jsonToNode("t.json", []byte(tc.in))
		e, ok := err.(*Error)
		if !ok || e.Line != tc.line || e.Column != tc.col || !strings.Contains(e.Msg, tc.msg) || !strings.HasPrefix(e.Msg, "not valid JSON: ") || e.Suggest == "" {
			t.Errorf("%q: got %v (%#v), want %d:%d %q", tc.in, err, err, tc.line, tc.col, tc.msg)
		}
	}
	// What JSON allows and the YAML reader refused.
	n, err := jsonToNode("t.json", []byte(`{"a": "x\/y \ud83c\udfa8 \ud800"}`))
	if err != nil || n.Content[1].Value != "x/y \U0001F3A8 \uFFFD" {
		t.Errorf(`escapes: got %v, %v`, n, err)
	}
}

// FuzzJSONReader holds the JSON reader to encoding/json and the YAML
// reader on arbitrary input.
func FuzzJSONReader(f *testing.F) {
	for _, s := range []string{`{"findings": [{"material": "smalt"}], "claims": [{"date": "1650"}]}`, "[1, 2.5e3, true, null]", `"\u00e9\/"`, "{\r\n\"a\":\t[]}", "", "{"} {
		f.Add([]byte(s))
	}
	f.Fuzz(func(t *testing.T, data []byte) {
		checkJSON(t, data)
	})
}

func BenchmarkJSONCase(b *testing.B) {
	line := []byte(`{"title": "Object 7", "place": "NL", "findings": [{"material": "lead white"}, {"material": ["smalt", "azurite"], "confidence": "probable"}], "records": [{"not_after": "1700"}], "claims": [{"date": "1650"}]}`)
	for _, format := range []string{"json", "yaml"} {
		b.Run(format, func(b *testing.B) {
			b.ReportAllocs()
			for b.Loop() {
				if _, err := ParseCase("c.jsonl", line, format); err != nil {
					b.Fatal(err)
				}
			}
		})
	}
}
