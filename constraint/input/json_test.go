package input

import (
	"bytes"
	"encoding/json"
	"fmt"
	"math/rand/v2"
	"strings"
	"testing"
)

// sameTree compares two trees: kind, position, scalar value, type, quoted
// or plain.
func sameTree(a, b *Node, path string) error {
	if a.Kind != b.Kind || a.Line != b.Line || a.Column != b.Column {
		return fmt.Errorf("%s: kind/line/column %d %d:%d, YAML reader %d %d:%d", path, a.Kind, a.Line, a.Column, b.Kind, b.Line, b.Column)
	}
	if a.Kind == Scalar {
		// An integer too large for 64 bits is a float to the YAML reader;
		// the readers of this project read numbers as text, so a number is
		// a number.
		number := func(t Type) Type {
			if t == Float {
				return Int
			}
			return t
		}
		if a.Value != b.Value || number(a.Type) != number(b.Type) || a.Quoted != b.Quoted {
			return fmt.Errorf("%s: scalar %q type %d quoted %v, YAML reader %q type %d quoted %v", path, a.Value, a.Type, a.Quoted, b.Value, b.Type, b.Quoted)
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
	got, err := parseJSON("t.json", data, DefaultMaxDepth)
	valid := json.Valid(data) && !deeper(data, DefaultMaxDepth)
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
	want, err := parseYAML("t.yaml", data)
	if err != nil {
		return false
	}
	if err := sameTree(got, want, "$"); err != nil {
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

// deeper reports whether JSON text nests deeper than max.
func deeper(data []byte, max int) bool {
	_, deep := bracketsTooDeep(data, false, max)
	return deep
}

// The JSON reader gives the tree and the positions the YAML reader gives
// the same text, on 5,000 random documents shaped like cases.
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
	} {
		_, err := parseJSON("t.json", []byte(tc.in), DefaultMaxDepth)
		e, ok := err.(*Error)
		if !ok || e.Line != tc.line || e.Column != tc.col || !strings.Contains(e.Msg, tc.msg) || !strings.HasPrefix(e.Msg, "not valid JSON: ") || e.Suggestion == "" {
			t.Errorf("%q: got %v (%#v), want %d:%d %q", tc.in, err, err, tc.line, tc.col, tc.msg)
		}
	}
	// What JSON allows and the YAML reader refused.
	n, err := parseJSON("t.json", []byte(`{"a": "x\/y \ud83c\udfa8 \ud800"}`), DefaultMaxDepth)
	if err != nil || n.Content[1].Value != "x/y \U0001F3A8 \uFFFD" {
		t.Errorf(`escapes: got %v, %v`, n, err)
	}
}

// FuzzJSONReader holds the JSON reader to encoding/json and the YAML
// reader on arbitrary input.
func FuzzJSONReader(f *testing.F) {
	for _, s := range []string{`{"findings": [{"material": "smalt"}], "claims": [{"date": "1650"}]}`, "[1, 2.5e3, true, null]", "[1e400, 99999999999999999999, -9223372036854775809]", `"\u00e9\/"`, "{\r\n\"a\":\t[]}", "", "{"} {
		f.Add([]byte(s))
	}
	f.Fuzz(func(t *testing.T, data []byte) {
		checkJSON(t, data)
	})
}

// FuzzParse reads arbitrary input in every format: it never panics, every
// error is an *Error naming the file, and a tree's positions are in the
// text.
func FuzzParse(f *testing.F) {
	for _, s := range []string{"title: x\nclaims:\n  - date: \"1850\"\n", "title = \"x\"\n[[claims]]\ndate = \"1850\"\n",
		`{"title": "x"}`, "a: [[[", "x = {a={a=1}}", "---\na: 1\n---\nb: 2\n", "\ufeffa: 1", "a: \xff"} {
		for f2 := range 3 {
			f.Add([]byte(s), uint8(f2))
		}
	}
	f.Fuzz(func(t *testing.T, data []byte, which uint8) {
		format := Format(which % 3)
		n, err := Parse("fuzz", data, format, Limits{})
		if err != nil {
			e, ok := err.(*Error)
			if !ok || e.File != "fuzz" {
				t.Fatalf("%s: error %v (%T) is not an *Error naming the file", format, err, err)
			}
			return
		}
		// A line break is \n, \r\n or a lone \r; YAML also breaks at
		// U+0085, U+2028 and U+2029. Counting each as one bounds the lines.
		lines := int32(1 + bytes.Count(data, []byte("\n")) + bytes.Count(data, []byte("\r")) +
			bytes.Count(data, []byte("\u0085")) + bytes.Count(data, []byte("\u2028")) + bytes.Count(data, []byte("\u2029")))
		var walk func(n *Node)
		walk = func(n *Node) {
			// An implicit null at the end of a YAML text is placed on the
			// line after it, hence one more.
			if n.Line < 1 || n.Line > lines+1 {
				t.Fatalf("%s: node at line %d of %d", format, n.Line, lines)
			}
			for _, c := range n.Content {
				walk(c)
			}
		}
		walk(n)
	})
}
