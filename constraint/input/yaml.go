package input

import (
	"bytes"
	"errors"
	"io"
	"regexp"
	"strconv"
	"strings"

	"gopkg.in/yaml.v3"
)

// parseYAML reads the one document of a YAML text; nil when it holds
// none (white space and comments only).
func parseYAML(name string, data []byte) (*Node, error) {
	dec := yaml.NewDecoder(bytes.NewReader(data))
	var doc yaml.Node
	if err := dec.Decode(&doc); err != nil {
		if errors.Is(err, io.EOF) {
			return nil, nil
		}
		return nil, yamlError(name, err)
	}
	var extra yaml.Node
	if err := dec.Decode(&extra); err == nil {
		return nil, &Error{File: name, Line: extra.Line, Column: extra.Column, Msg: "a file holds one YAML document; found a second",
			Suggestion: "remove the '---' line or split the file"}
	} else if !errors.Is(err, io.EOF) {
		return nil, yamlError(name, err)
	}
	if len(doc.Content) == 0 {
		return nil, nil
	}
	root := doc.Content[0]
	if root.Kind == yaml.ScalarNode && root.Tag == "!!null" && root.Value == "" {
		return nil, nil // "---" alone: a document with nothing in it
	}
	return fromYAML(root, map[*yaml.Node]*Node{}), nil
}

var yamlLine = regexp.MustCompile(`^yaml: line (\d+): (.*)$`)

// yamlError turns a decoder's message into an error at its line. The
// decoder leaves the line out when the problem is on the first line.
func yamlError(name string, err error) *Error {
	msg := err.Error()
	e := &Error{File: name, Line: 1, Msg: "not valid YAML: " + strings.TrimPrefix(msg, "yaml: "), Err: err,
		Suggestion: "check the indentation and quoting on this line and the one before; quote text with ':' or '#', dates and places"}
	if m := yamlLine.FindStringSubmatch(msg); m != nil {
		e.Line, _ = strconv.Atoi(m[1])
		e.Msg = "not valid YAML: " + m[2]
	}
	return e
}

// fromYAML converts a decoded YAML tree. Aliases point at the node their
// anchor made, converted once, so that a file of nested aliases cannot make
// the tree grow beyond the text.
func fromYAML(n *yaml.Node, done map[*yaml.Node]*Node) *Node {
	for i := 0; n != nil && n.Kind == yaml.AliasNode && i < 64; i++ {
		n = n.Alias
	}
	if n == nil || n.Kind == yaml.AliasNode {
		return &Node{}
	}
	if c, ok := done[n]; ok {
		return c
	}
	out := &Node{Line: int32(n.Line), Column: int32(n.Column), Value: n.Value}
	done[n] = out
	switch n.Kind {
	case yaml.ScalarNode:
		out.Kind = Scalar
		out.Quoted = n.Style&(yaml.DoubleQuotedStyle|yaml.SingleQuotedStyle) != 0
		switch n.Tag {
		case "!!null":
			out.Type = Null
		case "!!int":
			out.Type = Int
		case "!!float":
			out.Type = Float
		case "!!bool":
			out.Type = Bool
		}
	case yaml.MappingNode:
		out.Kind = Mapping
	case yaml.SequenceNode:
		out.Kind = Sequence
	case yaml.DocumentNode:
		if len(n.Content) == 1 {
			return fromYAML(n.Content[0], done)
		}
	}
	if len(n.Content) > 0 && out.Kind != Scalar {
		out.Content = make([]*Node, len(n.Content))
		for i, c := range n.Content {
			out.Content[i] = fromYAML(c, done)
		}
	}
	return out
}
