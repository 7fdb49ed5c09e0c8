package input

import (
	"slices"
	"strings"

	"terminus/constraint/wording"
	"terminus/materials/spell"
)

// Field is one key of a mapping and its value.
type Field struct {
	Key, Value *Node
	// Typo marks an unknown key that stands in for this one (it was
	// reported with a "did you mean"), so that a reader does not report
	// this key missing as well.
	Typo bool
}

// Fields are the keys of one mapping, by their place in the list of keys
// allowed there.
type Fields struct {
	allowed []string
	f       []Field
	set     []bool
}

// Lookup returns the field key; ok is false when it is not there. A nil
// Fields (not a mapping) has none.
func (fs *Fields) Lookup(key string) (Field, bool) {
	if fs == nil {
		return Field{}, false
	}
	if i := slices.Index(fs.allowed, key); i >= 0 && fs.set[i] {
		return fs.f[i], true
	}
	return Field{}, false
}

// At returns the field key, or the zero Field.
func (fs *Fields) At(key string) Field {
	f, _ := fs.Lookup(key)
	return f
}

// Given returns the field key when it was written (not a typo of it).
func (fs *Fields) Given(key string) (Field, bool) {
	f, ok := fs.Lookup(key)
	return f, ok && !f.Typo
}

// ReadFields reads the mapping n, whose keys must be among allowed; what
// names it in messages ("case file", "milestone"). Each problem goes to
// report: n not a mapping (then the result is nil), a key that is not
// text, an unknown key (with the nearest allowed one as a hint; the
// allowed key is then marked a typo), a key given twice. report returns
// false to stop at that problem; the result then holds what was read.
func ReadFields(file string, n *Node, what string, allowed []string, report func(*Error) bool) *Fields {
	if n == nil || n.Kind != Mapping {
		report(At(file, n.Pos(), "", "%s: expected a mapping of keys (%s); found %s", what, strings.Join(allowed, ", "), n.Describe()))
		return nil
	}
	out := &Fields{allowed: allowed, f: make([]Field, len(allowed)), set: make([]bool, len(allowed))}
	for i := 0; i+1 < len(n.Content); i += 2 {
		k, v := n.Content[i], n.Content[i+1]
		if k.Kind != Scalar {
			if !report(At(file, k.Pos(), "", "%s: expected a key; found %s", what, k.Describe())) {
				return out
			}
			continue
		}
		j := slices.Index(allowed, k.Value)
		if j < 0 {
			hint := "the keys of a " + what + " are " + strings.Join(allowed, ", ")
			if s := spell.Nearest(k.Value, allowed, 1); len(s) == 1 {
				hint = "did you mean " + OrList(s) + "? (" + hint + ")"
				if t := slices.Index(allowed, s[0]); !out.set[t] {
					out.f[t], out.set[t] = Field{Key: k, Typo: true}, true
				}
			}
			if !report(At(file, k.Pos(), hint, "%s: unknown key %s", what, Quote(k.Value))) {
				return out
			}
			continue
		}
		if prev := out.f[j]; out.set[j] && !prev.Typo {
			if !report(At(file, k.Pos(), "keep one of them", "%s: key %s is given twice (first on line %d)", what, Quote(k.Value), prev.Key.Line)) {
				return out
			}
			continue
		}
		out.f[j], out.set[j] = Field{Key: k, Value: v}, true
	}
	return out
}

// Text reads a scalar as text: a problem (reported as by [ReadFields]) for
// a mapping or list; "" for null.
func Text(file string, n *Node, what string, report func(*Error) bool) (string, bool) {
	if n == nil || n.IsNull() {
		return "", true
	}
	if n.Kind != Scalar {
		return "", report(At(file, n.Pos(), "", "%s: expected text; found %s", what, n.Describe())) && false
	}
	return n.Value, true
}

// DidYouMean suggests the nearest of candidates to s ("did you mean
// 'claims'?"), or "" when none is near enough to look like a slip.
func DidYouMean(s string, candidates []string) string {
	best := spell.Nearest(s, candidates, 3)
	if len(best) == 0 {
		return ""
	}
	return "did you mean " + OrList(best) + "?"
}

// OrList quotes and joins: 'a', 'b' or 'c'.
func OrList(xs []string) string {
	q := make([]string, len(xs))
	for i, x := range xs {
		q[i] = "'" + x + "'"
	}
	return wording.Join(q, "or")
}
