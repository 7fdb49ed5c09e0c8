package materials

import (
	"cmp"
	"fmt"
	"slices"
	"strings"

	"terminus/constraint/input"
	"terminus/constraint/wording"
)

// Error is a problem in a materials file, at a position: the one shape of
// every input problem of terminus (see package input).
type Error = input.Error

// ErrorList is every problem found in a set of files, sorted by file,
// line and column. Its Error method reports the first and counts the rest;
// range over it to see each.
type ErrorList []*Error

func (l ErrorList) Error() string {
	switch len(l) {
	case 0:
		return "no errors"
	case 1:
		return l[0].Error()
	}
	return fmt.Sprintf("%s (and %d more %s)", l[0].Error(), len(l)-1, wording.Plural(len(l)-1, "problem", "problems"))
}

// Hint returns the first problem's hint, or how to see every problem.
func (l ErrorList) Hint() string {
	if len(l) == 0 {
		return ""
	}
	if len(l) == 1 {
		return l[0].Hint()
	}
	h := l[0].Hint()
	if h != "" {
		h += "; "
	}
	return h + "run 'terminus materials lint FILE' to list every problem"
}

// Unwrap gives the problems to [errors.Is] and [errors.As].
func (l ErrorList) Unwrap() []error {
	out := make([]error, len(l))
	for i, e := range l {
		out[i] = e
	}
	return out
}

func (l ErrorList) sort() {
	slices.SortStableFunc(l, func(a, b *Error) int {
		return cmp.Or(cmp.Compare(a.File, b.File), cmp.Compare(a.Line, b.Line), cmp.Compare(a.Column, b.Column))
	})
}

// NotFoundError is a lookup that matched nothing.
type NotFoundError struct {
	Name        string   // as asked
	Suggestions []string // up to three nearest names, nearest first
}

func (e *NotFoundError) Error() string {
	return fmt.Sprintf("no material named %q in the dataset", e.Name)
}

// Hint suggests the nearest names.
func (e *NotFoundError) Hint() string {
	if len(e.Suggestions) == 0 {
		return "run 'terminus materials list' to see every material, or add your own with --materials FILE"
	}
	return "did you mean " + input.OrList(e.Suggestions) + "?"
}

// AmbiguousError is a lookup of one material by a name that stands for
// several: a marker, a family, or a Colour Index name or number or a CAS RN
// that several materials share (the two crystal forms of titanium dioxide
// white have one Colour Index number).
type AmbiguousError struct {
	Name    string
	Kind    GroupKind
	Matches []string // the ids that match
}

func (e *AmbiguousError) Error() string {
	what := ""
	switch e.Kind {
	case GroupMarker:
		what = " (a marker)"
	case GroupFamily:
		what = " (a family)"
	}
	return fmt.Sprintf("%q%s names %d materials: %s", e.Name, what, len(e.Matches), strings.Join(e.Matches, ", "))
}

// Hint asks for one of the ids.
func (e *AmbiguousError) Hint() string {
	return "name one of them by its id, for instance " + quote(e.Matches[0])
}

func quote(s string) string { return "'" + s + "'" }
