// Package casefile reads case files — what is known of one object: its
// events, the materials found, the documented dates and the dates claimed
// — from YAML, TOML or JSON into a [constraint.Case].
//
// Reading is strict: every key is checked, and a misspelt key, a bad date,
// a reversed interval or a value of the wrong kind is an [*input.Error]
// with the file, line and column and, where one fits, a suggestion. Limits
// on size and nesting are checked before any decoder sees the text (see
// package input). Defaults: a finding is certain, a record firm, an order
// ("after") hard; findings, records and claims without an id are numbered
// (finding-1, record-1, claim-1), an order without one is named after its
// events. Whether the materials, events and places a case names exist is
// the reasoner's to check, against its dataset.
package casefile

import (
	"io"
	"strconv"

	"terminus/constraint"
	"terminus/constraint/date"
	"terminus/constraint/input"
)

// Read reads the case file at path in the format its extension says:
// ".toml" TOML, ".json" strict JSON (RFC 8259), anything else YAML.
func Read(path string, l input.Limits) (*constraint.Case, error) {
	data, err := input.ReadFile(path, l)
	if err != nil {
		return nil, err
	}
	return Parse(path, data, input.FormatOf(path), l)
}

// ReadFrom reads a case from r (standard input, say), named name in
// messages.
func ReadFrom(name string, r io.Reader, format input.Format, l input.Limits) (*constraint.Case, error) {
	data, err := input.Read(name, r, l)
	if err != nil {
		return nil, err
	}
	return Parse(name, data, format, l)
}

// Parse reads a case from data; name is used in messages.
func Parse(name string, data []byte, format input.Format, l input.Limits) (*constraint.Case, error) {
	root, err := input.Parse(name, data, format, l)
	if err != nil {
		if e, ok := err.(*input.Error); ok && e.Msg == "the file is empty" {
			e.Msg = "the case file is empty"
			e.Suggestion = "run 'terminus init' for a starter case file"
		}
		return nil, err
	}
	d := &decoder{file: name}
	c, err := d.caseFile(root)
	if err != nil {
		return nil, err
	}
	c.File = name
	return c, nil
}

// decoder walks a tree and keeps the file name for errors; it stops at the
// first problem. It notes the entries that were given no id, to name them
// once the whole case is read.
type decoder struct {
	file       string
	yearStart  date.YearStart // the case's, for dates that give none
	unnamed    []unnamed
	eventIndex int // the event being read
}

// An unnamed entry: its kind and where it is (the event and the index of
// an order; the index of a finding, record or claim).
type unnamed struct {
	kind         idKind
	event, index int
}

type idKind uint8

const (
	orderID idKind = iota
	findingID
	recordID
	claimID
)

// name gives each entry without an id its default (order:EVENT>OTHER,
// finding-N, record-N, claim-N), numbered on when that is taken by an id
// the case wrote or by an earlier default (order:painting>felling-2), so
// that every id is unique and an error about a duplicate id is always
// about ids the user wrote. Claims have ids of their own kind.
func (d *decoder) name(c *constraint.Case) {
	taken := map[string]bool{}
	claims := map[string]bool{}
	isUnnamed := func(k idKind, event, index int) bool {
		for _, u := range d.unnamed {
			if u.kind == k && u.event == event && u.index == index {
				return true
			}
		}
		return false
	}
	for ei, e := range c.Events {
		for oi, o := range e.After {
			if !isUnnamed(orderID, ei, oi) {
				taken[o.ID] = true
			}
		}
	}
	for i, f := range c.Findings {
		if !isUnnamed(findingID, 0, i) {
			taken[f.ID] = true
		}
	}
	for i, r := range c.Records {
		if !isUnnamed(recordID, 0, i) {
			taken[r.ID] = true
		}
	}
	for i, cl := range c.Claims {
		if !isUnnamed(claimID, 0, i) {
			claims[cl.ID] = true
		}
	}
	free := func(base string, in map[string]bool) string {
		id := base
		for n := 2; in[id]; n++ {
			id = base + "-" + strconv.Itoa(n)
		}
		in[id] = true
		return id
	}
	for _, u := range d.unnamed {
		switch u.kind {
		case orderID:
			o := &c.Events[u.event].After[u.index]
			o.ID = free(o.ID, taken)
		case findingID:
			c.Findings[u.index].ID = free(c.Findings[u.index].ID, taken)
		case recordID:
			c.Records[u.index].ID = free(c.Records[u.index].ID, taken)
		case claimID:
			c.Claims[u.index].ID = free(c.Claims[u.index].ID, claims)
		}
	}
}

func (d *decoder) errAt(n *input.Node, suggestion, format string, args ...any) *input.Error {
	return input.At(d.file, n.Pos(), suggestion, format, args...)
}

// fields reads a mapping whose keys must be among allowed.
func (d *decoder) fields(n *input.Node, what string, allowed []string) (*input.Fields, error) {
	var first *input.Error
	fs := input.ReadFields(d.file, n, what, allowed, func(e *input.Error) bool {
		first = e
		return false
	})
	if first != nil {
		return nil, first
	}
	return fs, nil
}

func (d *decoder) str(n *input.Node, what string) (string, error) {
	if n.Kind != input.Scalar || n.IsNull() {
		return "", d.errAt(n, "", "%s: expected text, found %s", what, n.Describe())
	}
	return n.Value, nil
}

// strs reads one string or a list of strings.
func (d *decoder) strs(n *input.Node, what string) ([]string, []constraint.Pos, error) {
	if n.Kind == input.Scalar {
		s, err := d.str(n, what)
		if err != nil {
			return nil, nil, err
		}
		return []string{s}, []constraint.Pos{n.Pos()}, nil
	}
	if n.Kind != input.Sequence {
		return nil, nil, d.errAt(n, "", "%s: expected text or a list of text, found %s", what, n.Describe())
	}
	out := make([]string, 0, len(n.Content))
	ps := make([]constraint.Pos, 0, len(n.Content))
	for _, c := range n.Content {
		s, err := d.str(c, what)
		if err != nil {
			return nil, nil, err
		}
		out = append(out, s)
		ps = append(ps, c.Pos())
	}
	if len(out) == 0 {
		return nil, nil, d.errAt(n, "", "%s: the list is empty", what)
	}
	return out, ps, nil
}

func (d *decoder) list(n *input.Node, what string) ([]*input.Node, error) {
	if n.IsNull() {
		return nil, nil
	}
	if n.Kind != input.Sequence {
		return nil, d.errAt(n, "", "%s: expected a list (each item starting with '- '), found %s", what, n.Describe())
	}
	return n.Content, nil
}
