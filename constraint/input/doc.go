// Package input reads the files people write for terminus — case files and
// materials files, in YAML, TOML or JSON — into one tree of positioned
// nodes, and reads that tree strictly. The case reader (package casefile)
// and the materials loader (package materials) share it, so that both
// formats' quirks, limits and error messages are dealt with once.
//
// # Model
//
// A [Node] is a mapping, a list or a scalar, with the line and column
// where it starts (1-based; columns count characters) and, for a scalar,
// its text and type (string, integer, float, boolean or null) and whether
// it was quoted. [ParseYAML], [ParseTOML] and [ParseJSON] build the tree;
// [Parse] picks one by format. YAML goes through gopkg.in/yaml.v3, TOML
// through github.com/BurntSushi/toml (which keeps no positions: they are
// found again in the text), JSON through a reader of this package that
// gives the positions the YAML reader would give the same text.
//
// [ReadFields] reads a mapping against the keys allowed there: an unknown
// key is a problem with a "did you mean" hint, a key given twice another.
//
// # Limits and one behaviour for every format
//
// Before any decoder sees the input, [Check] enforces [Limits]: a size (at
// most [DefaultMaxBytes] unless raised) and a nesting depth (at most
// [DefaultMaxDepth]), so that a multi-gigabyte file, /dev/zero or
// thousands of nested brackets give a clear error at once instead of
// minutes of work. In every format a UTF-8 byte-order mark at the start is
// accepted and skipped; invalid UTF-8 is refused with its position; empty
// input (nothing but white space and comments) is refused; a YAML file
// holds one document. Messages quote at most a short stretch of the input.
//
// Every problem is an [*Error] with the file, line and column and, where
// one fits, a suggestion ([Error.Hint]).
package input

import (
	"fmt"
	"strings"
	"unicode/utf8"
)

// Error is a problem in a file people wrote: where it is, what is wrong
// and, where one fits, how to put it right.
type Error struct {
	File         string
	Line, Column int    // 1-based; 0 when unknown
	Msg          string // what is wrong and what was expected
	Suggestion   string // a fix, when one fits; see [Error.Hint]
	Err          error  // the underlying error, if any
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

// Hint returns the suggested fix, or "".
func (e *Error) Hint() string { return e.Suggestion }

func (e *Error) Unwrap() error { return e.Err }

// Pos is a place in a file: a line and a column, 1-based.
type Pos struct{ Line, Column int }

// At makes an error at p in file.
func At(file string, p Pos, suggestion, format string, args ...any) *Error {
	return &Error{File: file, Line: p.Line, Column: p.Column, Msg: fmt.Sprintf(format, args...), Suggestion: suggestion}
}

// maxQuoted is how many characters of the input a message quotes.
const maxQuoted = 60

// Quote quotes s for a message, cut to a short stretch with "…" when it is
// long, so that a message never echoes a whole file.
func Quote(s string) string {
	if utf8.RuneCountInString(s) > maxQuoted {
		r := []rune(s)
		return fmt.Sprintf("%q…", string(r[:maxQuoted]))
	}
	return fmt.Sprintf("%q", s)
}
