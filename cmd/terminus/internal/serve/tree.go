package serve

import (
	"bytes"
	"encoding/json"
	"errors"
	"strconv"

	"gopkg.in/yaml.v3"

	"terminus/constraint"
	"terminus/constraint/casefile"
	"terminus/constraint/input"
)

// caseName is the name the page's case goes by: the name of the file it
// downloads, so that a report made from the download names it alike.
const caseName = "case.yaml"

func parseCase(data []byte, l input.Limits) (*constraint.Case, error) {
	return casefile.Parse(caseName, data, input.JSON, l)
}

// treeJSON writes a tree read from any format as JSON for the page, in
// the order it was written: numbers as text (a case file reads text
// wherever it reads a number, and a year stays as written), booleans and
// nulls as such.
func treeJSON(b *bytes.Buffer, n *input.Node) {
	switch n.Kind {
	case input.Mapping:
		b.WriteByte('{')
		for i := 0; i+1 < len(n.Content); i += 2 {
			if i > 0 {
				b.WriteByte(',')
			}
			k, _ := json.Marshal(n.Content[i].Value)
			b.Write(k)
			b.WriteByte(':')
			treeJSON(b, n.Content[i+1])
		}
		b.WriteByte('}')
	case input.Sequence:
		b.WriteByte('[')
		for i, c := range n.Content {
			if i > 0 {
				b.WriteByte(',')
			}
			treeJSON(b, c)
		}
		b.WriteByte(']')
	default:
		switch n.Type {
		case input.Null:
			b.WriteString("null")
		case input.Bool:
			if v, err := strconv.ParseBool(n.Value); err == nil && v || n.Value == "yes" || n.Value == "on" {
				b.WriteString("true")
			} else {
				b.WriteString("false")
			}
		default:
			s, _ := json.Marshal(n.Value)
			b.Write(s)
		}
	}
}

// yamlNode turns a tree into yaml.v3's, keeping its order and the type of
// every scalar (so that a date given as text stays text). Lists of plain
// values are written on one line.
func yamlNode(n *input.Node) *yaml.Node {
	switch n.Kind {
	case input.Mapping:
		y := &yaml.Node{Kind: yaml.MappingNode, Tag: "!!map"}
		for _, c := range n.Content {
			y.Content = append(y.Content, yamlNode(c))
		}
		return y
	case input.Sequence:
		y := &yaml.Node{Kind: yaml.SequenceNode, Tag: "!!seq", Style: yaml.FlowStyle}
		for _, c := range n.Content {
			if c.Kind != input.Scalar {
				y.Style = 0
			}
			y.Content = append(y.Content, yamlNode(c))
		}
		return y
	}
	tag := map[input.Type]string{input.String: "!!str", input.Int: "!!int", input.Float: "!!float", input.Bool: "!!bool", input.Null: "!!null"}[n.Type]
	return &yaml.Node{Kind: yaml.ScalarNode, Tag: tag, Value: n.Value}
}

// caseYAML writes the page's case (strict JSON) as a YAML case file.
func caseYAML(data []byte, l input.Limits) ([]byte, error) {
	root, err := input.Parse(caseName, data, input.JSON, l)
	if err != nil {
		return nil, err
	}
	var b bytes.Buffer
	b.WriteString("# A case file written by the local page of terminus (terminus serve).\n# Check it with: terminus check case.yaml\n")
	enc := yaml.NewEncoder(&b)
	enc.SetIndent(2)
	if err := enc.Encode(&yaml.Node{Kind: yaml.DocumentNode, Content: []*yaml.Node{yamlNode(root)}}); err != nil {
		return nil, err
	}
	if err := enc.Close(); err != nil {
		return nil, err
	}
	return b.Bytes(), nil
}

// fieldError is an error of the case in the words of the command line,
// with the path of the field it concerns (keys and list indexes), so that
// the page can show it beside that field.
type fieldError struct {
	Message string `json:"message"`
	Hint    string `json:"hint,omitempty"`
	Path    []any  `json:"path"`
}

func newFieldError(err error, root *input.Node) *fieldError {
	var ie *input.Error
	if !errors.As(err, &ie) {
		return &fieldError{Message: err.Error(), Path: []any{}}
	}
	fe := &fieldError{Message: ie.Msg, Hint: ie.Hint(), Path: []any{}}
	if root != nil && ie.Line > 0 {
		fe.Path = pathAt(root, ie.Line, ie.Column)
	}
	return fe
}

// pathAt finds the node a position points at (the last one, in the
// order of the text, that starts at or before it) and returns its path.
func pathAt(root *input.Node, line, col int) []any {
	best := []any{}
	before := func(n *input.Node) bool {
		return int(n.Line) < line || int(n.Line) == line && int(n.Column) <= col
	}
	var walk func(n *input.Node, path []any)
	walk = func(n *input.Node, path []any) {
		if !before(n) {
			return
		}
		best = append([]any{}, path...)
		switch n.Kind {
		case input.Mapping:
			for i := 0; i+1 < len(n.Content); i += 2 {
				k, v := n.Content[i], n.Content[i+1]
				p := append(append([]any{}, path...), k.Value)
				if before(k) {
					best = p
				}
				walk(v, p)
			}
		case input.Sequence:
			for i, c := range n.Content {
				walk(c, append(append([]any{}, path...), i))
			}
		}
	}
	walk(root, nil)
	return best
}
