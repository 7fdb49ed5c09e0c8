// Package report writes a check result for people and programs: plain text
// for a terminal, Markdown to paste into an examination or condition
// report, and JSON. Every writer is a func(w io.Writer, r *constraint.Result)
// error, and the output is deterministic: the same result gives the same
// bytes.
package report

import (
	"bufio"
	"io"

	"terminus/constraint"
)

// SchemaVersion is the version of the JSON layout; it grows when a field
// changes meaning or goes away (new fields do not change it). Version 2:
// a long chain of evidence may be written as a reference to the bound it
// continues ("from", "steps").
const SchemaVersion = 2

// JSON writes r as indented JSON with a schema_version: the document
// [AppendJSONLine] writes, indented by two spaces (one writer, one schema).
func JSON(w io.Writer, r *constraint.Result) error {
	line := AppendJSONLine(make([]byte, 0, 16<<10), r)
	return writeIndented(w, line)
}

// writeIndented writes a compact JSON document indented by two spaces
// and a newline.
func writeIndented(w io.Writer, compact []byte) error {
	in := newIndenter(w)
	in.Write(compact)
	in.Write([]byte{'\n'})
	return in.Flush()
}

// indenter indents compact JSON as it passes through, to the bytes that
// json.Indent writes with no prefix and two spaces, but without holding
// the document twice more: a report of tens of megabytes is indented
// through a buffer of 64 KiB. Space outside strings is dropped, except at
// the top level (the newline after a document). Its input is valid JSON
// that this package wrote; it does not check it.
type indenter struct {
	w        *bufio.Writer
	depth    int
	inString bool
	escaped  bool
	opened   bool // the last byte opened an object or an array
}

func newIndenter(w io.Writer) *indenter {
	return &indenter{w: bufio.NewWriterSize(w, 64<<10)}
}

// Write indents p; errors of the writer below wait for Flush.
func (d *indenter) Write(p []byte) (int, error) {
	for _, c := range p {
		if d.inString {
			d.w.WriteByte(c)
			switch {
			case d.escaped:
				d.escaped = false
			case c == '\\':
				d.escaped = true
			case c == '"':
				d.inString = false
			}
			continue
		}
		if c == ' ' || c == '\t' || c == '\n' || c == '\r' {
			if d.depth == 0 {
				d.w.WriteByte(c)
			}
			continue
		}
		if d.opened {
			d.opened = false
			if c == '}' || c == ']' { // empty: {} and [] stay on one line
				d.depth--
				d.w.WriteByte(c)
				continue
			}
			d.newline()
		}
		switch c {
		case '"':
			d.inString = true
			d.w.WriteByte(c)
		case '{', '[':
			d.w.WriteByte(c)
			d.depth++
			d.opened = true
		case ',':
			d.w.WriteByte(c)
			d.newline()
		case ':':
			d.w.WriteString(": ")
		case '}', ']':
			d.depth--
			d.newline()
			d.w.WriteByte(c)
		default:
			d.w.WriteByte(c)
		}
	}
	return len(p), nil
}

func (d *indenter) newline() {
	d.w.WriteByte('\n')
	for range d.depth {
		d.w.WriteString("  ")
	}
}

// Flush writes what is buffered and returns the first error of the writer
// below.
func (d *indenter) Flush() error {
	return d.w.Flush()
}

// JSONLine writes r as one line of JSON, for JSON Lines output: the
// document [JSON] writes, without the indentation.
func JSONLine(w io.Writer, r *constraint.Result) error {
	b := AppendJSONLine(make([]byte, 0, 8<<10), r)
	_, err := w.Write(append(b, '\n'))
	return err
}
