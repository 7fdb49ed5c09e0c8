package input

import (
	"errors"
	"fmt"
	"slices"
	"strconv"
	"strings"
	"time"

	"github.com/BurntSushi/toml"
)

// parseTOML decodes TOML and builds the same tree YAML gives. The TOML
// decoder keeps no positions, so they are found again in the text by a
// locator made once per file: the n-th [[table]] header of a path, a
// [table] header, and the line and column where a key is set below a
// header. Decoding into a map keeps every key, known or not, so that the
// strict field reader sees unknown ones with their lines.
func parseTOML(name string, data []byte) (*Node, error) {
	var m map[string]any
	if _, err := toml.Decode(string(data), &m); err != nil {
		e := &Error{File: name, Msg: "not valid TOML: " + err.Error(), Err: err,
			Suggestion: "check the quoting and brackets on this line: text in double quotes, a list in [ ], a table in { }"}
		var pe toml.ParseError
		if errors.As(err, &pe) {
			e.Line, e.Column, e.Msg = pe.Position.Line, pe.Position.Col, "not valid TOML: "+pe.Message
		}
		return nil, e
	}
	if len(m) == 0 {
		return nil, nil
	}
	loc := newTOMLLocator(string(data))
	return loc.node(m, "", -1, 1, 1), nil
}

// tomlLocator finds where things are in a TOML text.
type tomlLocator struct {
	lines   []string
	headers map[string][]int // [[path]] → the lines of its headers, in order
	tables  map[string]int   // [path] → the line of its header
}

func newTOMLLocator(text string) *tomlLocator {
	l := &tomlLocator{lines: strings.Split(text, "\n"), headers: map[string][]int{}, tables: map[string]int{}}
	for i, line := range l.lines {
		t := strings.TrimLeft(line, " \t")
		if !strings.HasPrefix(t, "[") {
			continue
		}
		array := strings.HasPrefix(t, "[[")
		t = strings.TrimLeft(t, "[")
		end := strings.IndexByte(t, ']')
		if end < 0 {
			continue
		}
		path := tablePath(t[:end])
		if array {
			l.headers[path] = append(l.headers[path], i+1)
		} else {
			l.tables[path] = i + 1
		}
	}
	return l
}

// tablePath normalises a header's dotted path: no spaces, no quotes.
func tablePath(s string) string {
	return strings.Map(func(r rune) rune {
		if r == ' ' || r == '\t' || r == '"' || r == '\'' {
			return -1
		}
		return r
	}, s)
}

// key finds where key is set at or below line from, before the next
// header: its line, its column and the column of its value. It returns
// from, 1, 1 when it cannot tell.
func (l *tomlLocator) key(key string, from int) (line, col, valueCol int) {
	for i := max(from-1, 0); i < len(l.lines); i++ {
		text := l.lines[i]
		t := strings.TrimLeft(text, " \t")
		if i > from-1 && strings.HasPrefix(t, "[") {
			break
		}
		indent := len(text) - len(t)
		rest, ok := cutKey(t, key)
		if !ok {
			continue
		}
		rest = strings.TrimLeft(rest, " \t")
		if !strings.HasPrefix(rest, "=") {
			continue
		}
		after := strings.TrimLeft(rest[1:], " \t")
		return i + 1, indent + 1, len([]rune(text)) - len([]rune(after)) + 1
	}
	return from, 1, 1
}

// cutKey cuts key (bare or quoted) from the start of t.
func cutKey(t, key string) (string, bool) {
	for _, q := range []string{"", `"`, "'"} {
		if rest, ok := strings.CutPrefix(t, q+key+q); ok {
			if q == "" && rest != "" && (isBareKeyChar(rest[0])) {
				continue // a longer key that starts like this one
			}
			return rest, true
		}
	}
	return "", false
}

func isBareKeyChar(c byte) bool {
	return c >= 'a' && c <= 'z' || c >= 'A' && c <= 'Z' || c >= '0' && c <= '9' || c == '_' || c == '-'
}

// node turns a decoded value at path into a node. index is the position of
// a table in its array of tables (-1 otherwise); line and col are where the
// value starts when the text cannot say better.
func (l *tomlLocator) node(v any, path string, index, line, col int) *Node {
	switch x := v.(type) {
	case map[string]any:
		start := line
		if index >= 0 {
			if hs := l.headers[path]; index < len(hs) {
				start = hs[index]
			}
		} else if t, ok := l.tables[path]; ok {
			start = t
		}
		n := &Node{Kind: Mapping, Line: int32(start), Column: int32(col)}
		type entry struct {
			k           string
			v           any
			line, c, vc int
		}
		entries := make([]entry, 0, len(x))
		for k, val := range x {
			child := join(path, k)
			kl, kc, vc := l.key(k, start)
			if hs, ok := l.headers[child]; ok && len(hs) > 0 {
				kl, kc, vc = hs[0], 1, 1
			} else if t, ok := l.tables[child]; ok {
				kl, kc, vc = t, 1, 1
			}
			entries = append(entries, entry{k, val, kl, kc, vc})
		}
		slices.SortFunc(entries, func(a, b entry) int {
			if a.line != b.line {
				return a.line - b.line
			}
			return strings.Compare(a.k, b.k)
		})
		n.Content = make([]*Node, 0, 2*len(entries))
		for _, e := range entries {
			n.Content = append(n.Content,
				&Node{Kind: Scalar, Value: e.k, Line: int32(e.line), Column: int32(e.c)},
				l.node(e.v, join(path, e.k), -1, e.line, e.vc))
		}
		return n
	case []map[string]any:
		n := &Node{Kind: Sequence, Line: int32(line), Column: int32(col)}
		for i, item := range x {
			n.Content = append(n.Content, l.node(item, path, i, line, 1))
		}
		return n
	case []any:
		n := &Node{Kind: Sequence, Line: int32(line), Column: int32(col)}
		for i, item := range x {
			if mm, ok := item.(map[string]any); ok {
				if hs := l.headers[path]; i < len(hs) {
					n.Content = append(n.Content, l.node(mm, path, i, line, 1))
					continue
				}
				// An inline table: its keys are on its own line.
				inline := &tomlLocator{lines: l.lines}
				n.Content = append(n.Content, inline.node(mm, "", -1, line, col))
				continue
			}
			n.Content = append(n.Content, l.node(item, path, -1, line, col))
		}
		return n
	case string:
		return &Node{Kind: Scalar, Value: x, Line: int32(line), Column: int32(col)}
	case bool:
		return &Node{Kind: Scalar, Type: Bool, Value: strconv.FormatBool(x), Line: int32(line), Column: int32(col)}
	case int64:
		return &Node{Kind: Scalar, Type: Int, Value: strconv.FormatInt(x, 10), Line: int32(line), Column: int32(col)}
	case float64:
		return &Node{Kind: Scalar, Type: Float, Value: strconv.FormatFloat(x, 'g', -1, 64), Line: int32(line), Column: int32(col)}
	case time.Time:
		return &Node{Kind: Scalar, Value: x.Format("2006-01-02"), Line: int32(line), Column: int32(col)}
	}
	return &Node{Kind: Scalar, Value: fmt.Sprint(v), Line: int32(line), Column: int32(col)}
}

func join(path, k string) string {
	if path == "" {
		return k
	}
	return path + "." + k
}
