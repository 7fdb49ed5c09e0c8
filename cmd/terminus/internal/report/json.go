// Package report writes a check result for people and programs: plain text
// for a terminal, Markdown to paste into an examination or condition
// report, and JSON. Every writer is a func(w io.Writer, r *constraint.Result)
// error, and the output is deterministic: the same result gives the same
// bytes.
package report

import (
	"bytes"
	"encoding/json"
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
	var buf bytes.Buffer
	buf.Grow(2 * len(line))
	if err := json.Indent(&buf, line, "", "  "); err != nil {
		return err
	}
	buf.WriteByte('\n')
	_, err := w.Write(buf.Bytes())
	return err
}

// JSONLine writes r as one line of JSON, for JSON Lines output: the
// document [JSON] writes, without the indentation.
func JSONLine(w io.Writer, r *constraint.Result) error {
	b := AppendJSONLine(make([]byte, 0, 8<<10), r)
	_, err := w.Write(append(b, '\n'))
	return err
}
