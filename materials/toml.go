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
)

// tomlTree reads a TOML file into the same node tree a YAML file gives, so
// that one schema check serves both. The TOML decoder keeps no positions,
// so each node's line is found in the text: a [[materials]] or
// [[materials.milestones]] header, or the line where a key is set under it.
// Strictness does not depend on the decoder's list of undecoded keys:
// decoding into a map keeps every key, known or not, in the tree, and the
// schema check rejects unknown ones with their line.
func (p *parser) tomlTree(data []byte) *node {
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
func (t *tomlLines) node(v any, path string, line, col int) *node {
	switch x := v.(type) {
	case map[string]any:
		n := &node{kind: mapNode, line: int32(line), col: int32(max(col, 1))}
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
			n.content = append(n.content,
				&node{kind: scalarNode, value: k, line: int32(kl), col: int32(max(kc, 1))},
				t.node(x[k], sub, kl, max(kc, 1)))
		}
		return n
	case []map[string]any:
		n := &node{kind: seqNode, line: int32(line), col: int32(max(col, 1))}
		for _, e := range x {
			el := line
			if hs := t.headers[path]; t.seen[path] < len(hs) {
				el = hs[t.seen[path]]
				t.seen[path]++
			}
			n.content = append(n.content, t.node(e, path, el, 1))
		}
		return n
	case []any:
		n := &node{kind: seqNode, line: int32(line), col: int32(max(col, 1))}
		for _, e := range x {
			n.content = append(n.content, t.node(e, path, line, col))
		}
		return n
	case string:
		return t.scalar(x, false, false, line, col)
	case int64:
		return t.scalar(strconv.FormatInt(x, 10), false, true, line, col)
	case float64:
		return t.scalar(strconv.FormatFloat(x, 'g', -1, 64), false, false, line, col)
	case bool:
		return t.scalar(strconv.FormatBool(x), false, false, line, col)
	case time.Time:
		return t.scalar(x.Format("2006-01-02"), false, false, line, col)
	}
	return t.scalar(fmt.Sprint(v), false, false, line, col)
}

// scalar makes a TOML value's node. Positions in TOML are only those of
// lines and keys, so a string does not count as quoted (which would move
// the column of a date error inside it).
func (t *tomlLines) scalar(v string, quoted, integer bool, line, col int) *node {
	return &node{kind: scalarNode, value: v, quoted: quoted, integer: integer, line: int32(line), col: int32(max(col, 1))}
}
