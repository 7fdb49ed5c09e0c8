package input

// Kind is what a node is.
type Kind uint8

// The kinds of node.
const (
	Invalid Kind = iota
	Scalar
	Mapping
	Sequence
)

// Type is the type of a scalar, as YAML 1.2's core schema resolves a plain
// scalar and JSON and TOML say outright.
type Type uint8

// The scalar types.
const (
	String Type = iota
	Int
	Float
	Bool
	Null
)

// Node is one value of a document and where it starts.
type Node struct {
	Kind Kind
	Type Type // for a scalar
	// Quoted is true for a single- or double-quoted scalar in YAML or JSON
	// (TOML keeps no positions inside a string, so its strings are not
	// counted as quoted).
	Quoted       bool
	Line, Column int32
	Value        string  // a scalar's text
	Content      []*Node // a mapping's keys and values in turn; a list's items
}

// Pos is where the node starts.
func (n *Node) Pos() Pos { return Pos{Line: int(n.Line), Column: int(n.Column)} }

// IsNull reports whether n is a null scalar (or missing).
func (n *Node) IsNull() bool { return n == nil || n.Kind == Scalar && n.Type == Null }

// Describe names n for a message: "a mapping", "a list", "nothing", or the
// scalar's text quoted (shortened when long).
func (n *Node) Describe() string {
	switch {
	case n == nil:
		return "nothing"
	case n.Kind == Mapping:
		return "a mapping"
	case n.Kind == Sequence:
		return "a list"
	case n.Kind == Scalar && n.Type == Null:
		return "nothing"
	case n.Kind == Scalar:
		return Quote(n.Value)
	}
	return "something else"
}
