package materials

import (
	"errors"
	"fmt"
	"regexp"
	"slices"
	"strconv"
	"strings"
	"time"

	"github.com/BurntSushi/toml"
	"gopkg.in/yaml.v3"
)

// tomlTree reads a TOML file into the same node tree a YAML file gives, so
// that one schema check serves both. The TOML decoder keeps no positions,
// so each node's line is found in the text: a [[materials]] or
// [[materials.milestones]] header, or the line where a key is set under it.
// Strictness does not depend on the decoder's list of undecoded keys:
// decoding into a map keeps every key, known or not, in the tree, and the
// schema check rejects unknown ones with their line.
func (p *parser) tomlTree(data []byte) *yaml.Node {
	var m map[string]any
	_, err := toml.Decode(string(data), &m)
	if err != nil {
		line, col := 1, 0
		var pe toml.ParseError
		if errors.As(err, &pe) {
			line, col = pe.Position.Line, pe.Position.Col
		}
		msg := err.Error()
		if errors.As(err, &pe) {
			msg = pe.Message
		}
		p.errs = append(p.errs, &Error{File: p.file, Line: max(line, 1), Column: col, Msg: "TOML syntax: " + msg, Err: err,
			Suggestion: "check the quoting and brackets on this line"})
		return nil
	}
	lines := strings.Split(string(data), "\n")
	t := &tomlLines{lines: lines}
	t.scan()
	return t.node(m, "", 1, 0)
}

var tomlHeader = regexp.MustCompile(`^\s*\[\[\s*([A-Za-z0-9_.\s"]+?)\s*\]\]`)

type tomlLines struct {
	lines   []string
	headers map[string][]int // table path → header lines (1-based), in order
	seen    map[string]int   // table path → how many of its tables were given out
}

func (t *tomlLines) scan() {
	t.headers = map[string][]int{}
	t.seen = map[string]int{}
	for i, l := range t.lines {
		if m := tomlHeader.FindStringSubmatch(l); m != nil {
			key := strings.ReplaceAll(strings.ReplaceAll(m[1], " ", ""), `"`, "")
			t.headers[key] = append(t.headers[key], i+1)
		}
	}
}

// keyLine finds the line at or after from where key is set, before the next
// table header; it returns from and the column 0 when it cannot tell.
func (t *tomlLines) keyLine(key string, from int) (int, int) {
	re := regexp.MustCompile(`^(\s*)"?` + regexp.QuoteMeta(key) + `"?\s*=`)
	for i := from; i <= len(t.lines); i++ {
		l := t.lines[i-1]
		if i > from && strings.HasPrefix(strings.TrimSpace(l), "[") {
			break
		}
		if m := re.FindStringSubmatch(l); m != nil {
			return i, len(m[1]) + 1
		}
	}
	return from, 0
}

// node turns a decoded TOML value into a node at line (and column).
func (t *tomlLines) node(v any, path string, line, col int) *yaml.Node {
	switch x := v.(type) {
	case map[string]any:
		n := &yaml.Node{Kind: yaml.MappingNode, Tag: "!!map", Line: line, Column: max(col, 1)}
		keys := make([]string, 0, len(x))
		for k := range x {
			keys = append(keys, k)
		}
		slices.Sort(keys)
		for _, k := range keys {
			kl, kc := t.keyLine(k, line)
			sub := k
			if path != "" {
				sub = path + "." + k
			}
			n.Content = append(n.Content,
				&yaml.Node{Kind: yaml.ScalarNode, Tag: "!!str", Value: k, Line: kl, Column: max(kc, 1)},
				t.node(x[k], sub, kl, max(kc, 1)))
		}
		return n
	case []map[string]any:
		n := &yaml.Node{Kind: yaml.SequenceNode, Tag: "!!seq", Line: line, Column: max(col, 1)}
		for _, e := range x {
			el := line
			if hs := t.headers[path]; t.seen[path] < len(hs) {
				el = hs[t.seen[path]]
				t.seen[path]++
			}
			n.Content = append(n.Content, t.node(e, path, el, 1))
		}
		return n
	case []any:
		n := &yaml.Node{Kind: yaml.SequenceNode, Tag: "!!seq", Line: line, Column: max(col, 1)}
		for _, e := range x {
			n.Content = append(n.Content, t.node(e, path, line, col))
		}
		return n
	case string:
		return &yaml.Node{Kind: yaml.ScalarNode, Tag: "!!str", Value: x, Line: line, Column: max(col, 1)}
	case int64:
		return &yaml.Node{Kind: yaml.ScalarNode, Tag: "!!int", Value: strconv.FormatInt(x, 10), Line: line, Column: max(col, 1)}
	case float64:
		return &yaml.Node{Kind: yaml.ScalarNode, Tag: "!!float", Value: strconv.FormatFloat(x, 'g', -1, 64), Line: line, Column: max(col, 1)}
	case bool:
		return &yaml.Node{Kind: yaml.ScalarNode, Tag: "!!bool", Value: strconv.FormatBool(x), Line: line, Column: max(col, 1)}
	case time.Time:
		return &yaml.Node{Kind: yaml.ScalarNode, Tag: "!!str", Value: x.Format("2006-01-02"), Line: line, Column: max(col, 1)}
	}
	return &yaml.Node{Kind: yaml.ScalarNode, Tag: "!!str", Value: fmt.Sprint(v), Line: line, Column: max(col, 1)}
}
