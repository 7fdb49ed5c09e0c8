package materials

import "gopkg.in/yaml.v3"

// node is what the schema check reads of a YAML or TOML value: its kind,
// its text, whether it was quoted, null or an integer, and where it is. It
// is a third of the size of a yaml.Node, which matters when a whole dataset
// is read at start-up.
type node struct {
	kind      kindOfNode
	quoted    bool // a single- or double-quoted scalar
	null      bool // a null scalar ("", "~", "null")
	integer   bool // a scalar the YAML decoder reads as an integer
	line, col int32
	value     string
	content   []*node // a mapping's keys and values in turn; a list's items
}

type kindOfNode uint8

const (
	otherNode kindOfNode = iota
	scalarNode
	mapNode
	seqNode
)

// fromYAML converts a decoded YAML tree. Aliases point at the node their
// anchor made, converted once, so that a file of nested aliases cannot make
// the tree grow beyond the text.
func fromYAML(n *yaml.Node, done map[*yaml.Node]*node) *node {
	for i := 0; n != nil && n.Kind == yaml.AliasNode && i < 64; i++ {
		n = n.Alias
	}
	if n == nil || n.Kind == yaml.AliasNode {
		return &node{}
	}
	if c, ok := done[n]; ok {
		return c
	}
	out := &node{line: int32(n.Line), col: int32(n.Column), value: n.Value}
	done[n] = out
	switch n.Kind {
	case yaml.ScalarNode:
		out.kind = scalarNode
		out.quoted = n.Style&(yaml.DoubleQuotedStyle|yaml.SingleQuotedStyle) != 0
		out.null = n.Tag == "!!null"
		out.integer = n.Tag == "!!int"
	case yaml.MappingNode:
		out.kind = mapNode
	case yaml.SequenceNode:
		out.kind = seqNode
	}
	if len(n.Content) > 0 {
		out.content = make([]*node, len(n.Content))
		for i, c := range n.Content {
			out.content[i] = fromYAML(c, done)
		}
	}
	return out
}
