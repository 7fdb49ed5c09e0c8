package constraint

import (
	"bytes"
	"fmt"
	"os"
	"path/filepath"
	"regexp"
	"sort"
	"strconv"
	"strings"
	"time"

	"github.com/BurntSushi/toml"
	"gopkg.in/yaml.v3"

	"terminus/materials/spell"
)

// Error is a problem with a case file: where it is, what is wrong and,
// where one fits, a suggestion.
type Error struct {
	File         string
	Line, Column int // 1-based; 0 when unknown
	Msg          string
	Suggest      string // "did you mean …", or empty
}

func (e *Error) Error() string {
	var b strings.Builder
	b.WriteString(e.File)
	if e.Line > 0 {
		fmt.Fprintf(&b, ":%d", e.Line)
		if e.Column > 0 {
			fmt.Fprintf(&b, ":%d", e.Column)
		}
	}
	b.WriteString(": ")
	b.WriteString(e.Msg)
	return b.String()
}

// Hint returns the suggestion, for the command line's "hint:" line.
func (e *Error) Hint() string { return e.Suggest }

// Pos is a place in a case file.
type Pos struct{ Line, Column int }

// ReadCaseFile reads a case file in YAML, JSON or TOML by its extension:
// ".toml" is TOML, ".json" strict JSON (RFC 8259), anything else YAML.
func ReadCaseFile(path string) (*Case, error) {
	data, err := os.ReadFile(path)
	if err != nil {
		return nil, &Error{File: path, Msg: fmt.Sprintf("cannot read the case file: %v", errUnwrapPath(err))}
	}
	format := "yaml"
	switch ext := filepath.Ext(path); {
	case strings.EqualFold(ext, ".toml"):
		format = "toml"
	case strings.EqualFold(ext, ".json"):
		format = "json"
	}
	return ParseCase(path, data, format)
}

func errUnwrapPath(err error) error {
	if pe, ok := err.(*os.PathError); ok {
		return pe.Err
	}
	return err
}

// ParseCase decodes a case from data; format is "yaml", "json" or "toml".
// name is used in error messages. Every key is checked: a misspelt key is
// an error with its line and column, never silently dropped.
func ParseCase(name string, data []byte, format string) (*Case, error) {
	var root *yaml.Node
	switch format {
	case "toml":
		n, err := tomlToNode(name, data)
		if err != nil {
			return nil, err
		}
		root = n
	case "json":
		n, err := jsonToNode(name, data)
		if err != nil {
			return nil, err
		}
		if n == nil {
			return nil, &Error{File: name, Msg: "the case file is empty", Suggest: "run 'terminus init' for a starter case file"}
		}
		root = n
	case "yaml", "":
		var doc yaml.Node
		dec := yaml.NewDecoder(bytes.NewReader(data))
		if err := dec.Decode(&doc); err != nil {
			if err.Error() == "EOF" {
				return nil, &Error{File: name, Msg: "the case file is empty", Suggest: "run 'terminus init' for a starter case file"}
			}
			return nil, yamlSyntaxError(name, err)
		}
		if len(doc.Content) == 0 {
			return nil, &Error{File: name, Msg: "the case file is empty", Suggest: "run 'terminus init' for a starter case file"}
		}
		root = doc.Content[0]
	default:
		return nil, &Error{File: name, Msg: fmt.Sprintf("unknown case format %q: expected yaml, json or toml", format)}
	}
	d := &decoder{file: name}
	c, err := d.caseFile(root)
	if err != nil {
		return nil, err
	}
	c.File = name
	return c, nil
}

var yamlLineRe = regexp.MustCompile(`^yaml: line (\d+): (.*)$`)

func yamlSyntaxError(name string, err error) error {
	msg := err.Error()
	if m := yamlLineRe.FindStringSubmatch(msg); m != nil {
		line, _ := strconv.Atoi(m[1])
		return &Error{File: name, Line: line, Msg: "not valid YAML: " + m[2],
			Suggest: "check the indentation and that text with ':' or '#' is quoted"}
	}
	return &Error{File: name, Msg: "not valid YAML: " + strings.TrimPrefix(msg, "yaml: ")}
}

// decoder walks a yaml.Node tree and keeps the file name for errors.
type decoder struct{ file string }

func (d *decoder) errAt(n *yaml.Node, suggest, format string, args ...any) *Error {
	e := &Error{File: d.file, Msg: fmt.Sprintf(format, args...), Suggest: suggest}
	if n != nil {
		e.Line, e.Column = n.Line, n.Column
	}
	return e
}

func pos(n *yaml.Node) Pos { return Pos{Line: n.Line, Column: n.Column} }

type field struct {
	key   *yaml.Node
	value *yaml.Node
}

// fields reads a mapping whose keys must be among allowed.
func (d *decoder) fields(n *yaml.Node, what string, allowed ...string) (map[string]field, error) {
	n = deref(n)
	if n.Kind != yaml.MappingNode {
		return nil, d.errAt(n, "", "%s: expected a mapping of keys (%s), found %s", what, strings.Join(allowed, ", "), kindName(n))
	}
	out := make(map[string]field, len(n.Content)/2)
	for i := 0; i+1 < len(n.Content); i += 2 {
		k, v := n.Content[i], n.Content[i+1]
		name := k.Value
		if !contains(allowed, name) {
			return nil, d.errAt(k, didYouMean(name, allowed), "%s: unknown key %q (known keys: %s)", what, name, strings.Join(allowed, ", "))
		}
		if _, dup := out[name]; dup {
			return nil, d.errAt(k, "", "%s: key %q given twice", what, name)
		}
		out[name] = field{key: k, value: deref(v)}
	}
	return out, nil
}

func deref(n *yaml.Node) *yaml.Node {
	for n != nil && n.Kind == yaml.AliasNode {
		n = n.Alias
	}
	if n != nil && n.Kind == yaml.DocumentNode && len(n.Content) > 0 {
		return deref(n.Content[0])
	}
	return n
}

func kindName(n *yaml.Node) string {
	switch n.Kind {
	case yaml.MappingNode:
		return "a mapping"
	case yaml.SequenceNode:
		return "a list"
	case yaml.ScalarNode:
		if n.Tag == "!!null" {
			return "nothing"
		}
		return fmt.Sprintf("%q", n.Value)
	}
	return "something else"
}

func (d *decoder) str(n *yaml.Node, what string) (string, error) {
	if n.Kind != yaml.ScalarNode || n.Tag == "!!null" {
		return "", d.errAt(n, "", "%s: expected text, found %s", what, kindName(n))
	}
	return n.Value, nil
}

// strs reads one string or a list of strings.
func (d *decoder) strs(n *yaml.Node, what string) ([]string, []Pos, error) {
	if n.Kind == yaml.ScalarNode {
		s, err := d.str(n, what)
		if err != nil {
			return nil, nil, err
		}
		return []string{s}, []Pos{pos(n)}, nil
	}
	if n.Kind != yaml.SequenceNode {
		return nil, nil, d.errAt(n, "", "%s: expected text or a list of text, found %s", what, kindName(n))
	}
	var out []string
	var ps []Pos
	for _, c := range n.Content {
		c = deref(c)
		s, err := d.str(c, what)
		if err != nil {
			return nil, nil, err
		}
		out = append(out, s)
		ps = append(ps, pos(c))
	}
	if len(out) == 0 {
		return nil, nil, d.errAt(n, "", "%s: the list is empty", what)
	}
	return out, ps, nil
}

func (d *decoder) list(n *yaml.Node, what string) ([]*yaml.Node, error) {
	if n.Kind == yaml.ScalarNode && n.Tag == "!!null" {
		return nil, nil
	}
	if n.Kind != yaml.SequenceNode {
		return nil, d.errAt(n, "", "%s: expected a list (each item starting with '- '), found %s", what, kindName(n))
	}
	out := make([]*yaml.Node, len(n.Content))
	for i, c := range n.Content {
		out[i] = deref(c)
	}
	return out, nil
}

func contains(list []string, s string) bool {
	for _, x := range list {
		if x == s {
			return true
		}
	}
	return false
}

// didYouMean suggests the nearest of candidates to s, or nothing when none
// is near.
func didYouMean(s string, candidates []string) string {
	best := nearest(s, candidates, 3)
	if len(best) == 0 {
		return ""
	}
	return "did you mean " + quoteJoin(best) + "?"
}

func quoteJoin(list []string) string {
	q := make([]string, len(list))
	for i, s := range list {
		q[i] = strconv.Quote(s)
	}
	switch len(q) {
	case 1:
		return q[0]
	case 2:
		return q[0] + " or " + q[1]
	}
	return strings.Join(q[:len(q)-1], ", ") + " or " + q[len(q)-1]
}

// nearest returns up to max candidates within a small edit distance of s.
func nearest(s string, candidates []string, max int) []string {
	type cand struct {
		s string
		d int
	}
	ls := strings.ToLower(s)
	limit := len(ls)/3 + 1
	var cs []cand
	for _, c := range candidates {
		dist := spell.Distance(ls, strings.ToLower(c))
		if dist <= limit {
			cs = append(cs, cand{c, dist})
		}
	}
	sort.SliceStable(cs, func(i, j int) bool {
		if cs[i].d != cs[j].d {
			return cs[i].d < cs[j].d
		}
		return cs[i].s < cs[j].s
	})
	var out []string
	for _, c := range cs {
		if len(out) == max {
			break
		}
		out = append(out, c.s)
	}
	return out
}

// tomlToNode decodes TOML and rebuilds it as a yaml.Node tree, so that one
// walker checks both formats. TOML's decoder keeps no public positions, so
// lines and columns are found again in the text: the n-th [[table]] header
// and the keys below it.
func tomlToNode(name string, data []byte) (*yaml.Node, error) {
	var m map[string]any
	if _, err := toml.Decode(string(data), &m); err != nil {
		if pe, ok := err.(toml.ParseError); ok {
			return nil, &Error{File: name, Line: pe.Position.Line, Column: pe.Position.Col, Msg: "not valid TOML: " + pe.Message}
		}
		return nil, &Error{File: name, Msg: "not valid TOML: " + err.Error()}
	}
	loc := newTomlLocator(data)
	return tomlValue(m, loc, "", -1, 1, 1), nil
}

type tomlLocator struct {
	lines []string
	// headers: table-array name → the line numbers of its [[name]] headers.
	headers map[string][]int
	tables  map[string]int
}

var (
	tomlArrayHeader = regexp.MustCompile(`^\s*\[\[\s*([A-Za-z0-9_.-]+)\s*\]\]`)
	tomlTableHeader = regexp.MustCompile(`^\s*\[\s*([A-Za-z0-9_.-]+)\s*\]`)
	tomlAnyHeader   = regexp.MustCompile(`^\s*\[`)
)

func newTomlLocator(data []byte) *tomlLocator {
	l := &tomlLocator{lines: strings.Split(string(data), "\n"), headers: map[string][]int{}, tables: map[string]int{}}
	for i, line := range l.lines {
		if m := tomlArrayHeader.FindStringSubmatch(line); m != nil {
			l.headers[m[1]] = append(l.headers[m[1]], i+1)
		} else if m := tomlTableHeader.FindStringSubmatch(line); m != nil {
			l.tables[m[1]] = i + 1
		}
	}
	return l
}

// key finds "key =" at or below line from, before the next header.
func (l *tomlLocator) key(key string, from int) (line, col int) {
	re := regexp.MustCompile(`^(\s*)"?` + regexp.QuoteMeta(key) + `"?\s*=`)
	for i := from - 1; i < len(l.lines); i++ {
		if i < 0 {
			continue
		}
		if i > from-1 && tomlAnyHeader.MatchString(l.lines[i]) {
			break
		}
		if m := re.FindStringSubmatch(l.lines[i]); m != nil {
			return i + 1, len(m[1]) + 1
		}
	}
	return from, 1
}

func tomlValue(v any, loc *tomlLocator, path string, index int, line, col int) *yaml.Node {
	switch x := v.(type) {
	case map[string]any:
		n := &yaml.Node{Kind: yaml.MappingNode, Tag: "!!map", Line: line, Column: col}
		start := line
		if index >= 0 {
			if hs := loc.headers[path]; index < len(hs) {
				start = hs[index]
			}
		} else if t, ok := loc.tables[path]; ok {
			start = t
		}
		n.Line = start
		type kv struct {
			k    string
			v    any
			l, c int
		}
		var kvs []kv
		for k, val := range x {
			child := k
			if path != "" {
				child = path + "." + k
			}
			l, c := loc.key(k, start)
			if hs, ok := loc.headers[child]; ok && len(hs) > 0 {
				l, c = hs[0], 1
			} else if t, ok := loc.tables[child]; ok {
				l, c = t, 1
			}
			kvs = append(kvs, kv{k: k, v: val, l: l, c: c})
		}
		sort.Slice(kvs, func(i, j int) bool {
			if kvs[i].l != kvs[j].l {
				return kvs[i].l < kvs[j].l
			}
			return kvs[i].k < kvs[j].k
		})
		for _, e := range kvs {
			child := e.k
			if path != "" {
				child = path + "." + e.k
			}
			kn := &yaml.Node{Kind: yaml.ScalarNode, Tag: "!!str", Value: e.k, Line: e.l, Column: e.c}
			vn := tomlValue(e.v, loc, child, -1, e.l, e.c+len(e.k)+3)
			n.Content = append(n.Content, kn, vn)
		}
		return n
	case []map[string]any:
		n := &yaml.Node{Kind: yaml.SequenceNode, Tag: "!!seq", Line: line, Column: col}
		for i, item := range x {
			n.Content = append(n.Content, tomlValue(item, loc, path, i, line, col))
		}
		return n
	case []any:
		n := &yaml.Node{Kind: yaml.SequenceNode, Tag: "!!seq", Line: line, Column: col}
		for i, item := range x {
			if mm, ok := item.(map[string]any); ok {
				if hs := loc.headers[path]; i < len(hs) {
					n.Content = append(n.Content, tomlValue(mm, loc, path, i, line, col))
					continue
				}
				n.Content = append(n.Content, tomlValue(mm, &tomlLocator{lines: loc.lines}, "", -1, line, col))
				continue
			}
			n.Content = append(n.Content, tomlValue(item, loc, path, -1, line, col))
		}
		return n
	case string:
		return &yaml.Node{Kind: yaml.ScalarNode, Tag: "!!str", Value: x, Line: line, Column: col}
	case time.Time:
		s := x.Format("2006-01-02")
		return &yaml.Node{Kind: yaml.ScalarNode, Tag: "!!str", Value: s, Line: line, Column: col}
	case bool:
		return &yaml.Node{Kind: yaml.ScalarNode, Tag: "!!bool", Value: strconv.FormatBool(x), Line: line, Column: col}
	case int64:
		return &yaml.Node{Kind: yaml.ScalarNode, Tag: "!!int", Value: strconv.FormatInt(x, 10), Line: line, Column: col}
	case float64:
		return &yaml.Node{Kind: yaml.ScalarNode, Tag: "!!float", Value: strconv.FormatFloat(x, 'g', -1, 64), Line: line, Column: col}
	}
	return &yaml.Node{Kind: yaml.ScalarNode, Tag: "!!str", Value: fmt.Sprint(v), Line: line, Column: col}
}
