package survey

import (
	"bytes"
	"encoding/json"
	"errors"
	"fmt"
	"iter"
	"strconv"
	"strings"

	"terminus/constraint"
	"terminus/constraint/casefile"
	"terminus/constraint/date"
	"terminus/constraint/input"
	"terminus/constraint/network"
)

func recordErr(file string, line, col int, msg, suggest string) *input.Error {
	return &input.Error{File: file, Line: line, Column: col, Msg: msg, Suggestion: suggest}
}

// parsed is a record made ready for the reasoner.
type parsed struct {
	id   string
	c    *constraint.Case
	free []string // values of the free columns, in the input's order
}

// parse turns a raw record into a case. The error, if any, is a
// *input.Error whose file and line are the input's.
func parse(r rawRecord) (parsed, error) {
	p := parsed{id: "line-" + strconv.Itoa(r.line)}
	if r.err != nil {
		if r.id != "" {
			p.id = r.id
		}
		return p, r.err
	}
	if r.in.Format == CSV {
		return parseCSV(r, p)
	}
	return parseJSONLine(r, p)
}

// onLine moves an error that the case decoder or the reasoner placed in a
// one-line document onto the input's line.
func onLine(err error, file string, line int) error {
	var ce *input.Error
	if errors.As(err, &ce) {
		ce.File = file
		if ce.Line > 1 {
			// A character the YAML reader counts as a line break (U+0085,
			// U+2028 inside a string): the column is not the input's.
			ce.Column = 0
		}
		ce.Line = line
	}
	return err
}

func parseJSONLine(r rawRecord, p parsed) (parsed, error) {
	name := r.in.DisplayName()
	text := r.text
	if bytes.IndexByte(text, '\r') >= 0 {
		// A carriage return is white space in JSON, but the case reader
		// counts it as a line break (as YAML does): keep the columns.
		text = bytes.ReplaceAll(text, []byte("\r"), []byte(" "))
	}
	c, err := casefile.Parse(name, text, input.JSON, input.Limits{})
	if err != nil {
		// The id may still be readable before the mistake.
		if id, _, e := takeID(text); e == nil && id != "" {
			p.id = id
		}
		return p, onLine(err, name, r.line)
	}
	if c.ID != "" {
		p.id = c.ID
	}
	p.c = c
	return p, nil
}

// takeID finds a top-level "id" member of a JSON object and returns its
// value and the line with the member blanked out by spaces, so that the
// case decoder (which has no id key) reads the rest with every column in
// its place. A line without one is returned as it is.
func takeID(line []byte) (string, []byte, error) {
	if !bytes.Contains(line, []byte(`"id"`)) {
		return "", line, nil
	}
	dec := json.NewDecoder(bytes.NewReader(line))
	dec.UseNumber()
	if t, err := dec.Token(); err != nil || t != json.Delim('{') {
		return "", line, nil // not an object: the decoder says so
	}
	prevEnd := int(dec.InputOffset())
	first := true
	for dec.More() {
		k, err := dec.Token()
		if err != nil {
			return "", line, nil
		}
		var raw json.RawMessage
		if err := dec.Decode(&raw); err != nil {
			return "", line, nil
		}
		end := int(dec.InputOffset())
		if k != "id" {
			prevEnd, first = end, false
			continue
		}
		var id string
		switch v := bytes.TrimSpace(raw); {
		case len(v) > 0 && v[0] == '"':
			if err := json.Unmarshal(v, &id); err != nil {
				return "", line, fmt.Errorf("id: %v", err)
			}
		case len(v) > 0 && (v[0] == '-' || (v[0] >= '0' && v[0] <= '9')):
			id = string(v)
		case string(v) == "null":
		default:
			return "", line, fmt.Errorf("id: expected a string or a number, found %s", v)
		}
		out := bytes.Clone(line)
		for i := prevEnd; i < end; i++ {
			out[i] = ' '
		}
		if first { // the member was first: its comma follows it
			for i := end; i < len(out); i++ {
				if out[i] == ',' {
					out[i] = ' '
					break
				}
				if out[i] != ' ' && out[i] != '\t' {
					break
				}
			}
		}
		return id, out, nil
	}
	return "", line, nil
}

// parseCSV builds a case from a CSV row: one event (making), a finding per
// ';'-separated entry of materials ("a|b" alternatives, a final '?' for a
// probable identification), a claim per ';'-separated date of claim, and
// firm records for not_before and not_after.
func parseCSV(r rawRecord, p parsed) (parsed, error) {
	in := r.in
	name := in.DisplayName()
	fields := r.fields
	p.free = make([]string, len(in.free))
	for i, fi := range in.free {
		if fi < len(fields) {
			p.free[i] = fields[fi].Text
		}
	}
	get := func(col string) (csvField, bool) {
		i, ok := in.known[col]
		if !ok || i >= len(fields) {
			return csvField{}, false
		}
		f := fields[i]
		f.Text = strings.TrimSpace(f.Text)
		return f, f.Text != ""
	}
	if f, ok := get(colID); ok {
		p.id = f.Text
	}
	if len(fields) != in.width {
		return p, recordErr(name, r.line, 0, fmt.Sprintf("the row has %d fields, the header %d", len(fields), in.width),
			"quote a field that contains a comma, e.g. \"Portrait, oil on panel\"")
	}
	c := &constraint.Case{File: name}
	if f, ok := get(colTitle); ok {
		c.Title = f.Text
	}
	if f, ok := get(colPlace); ok {
		c.Place = f.Text
		c.PlacePos = constraint.Pos{Line: f.Line, Column: f.Column}
	}
	if f, ok := get(colMaterials); ok {
		n := 0
		for entry := range listEntries(f.Text) {
			n++
			pos := constraint.Pos{Line: f.Line, Column: f.Column}
			fi := constraint.Finding{ID: fmt.Sprintf("finding-%d", n), Confidence: constraint.Certain, Pos: pos}
			if s, ok := strings.CutSuffix(entry, "?"); ok {
				fi.Confidence = constraint.Probable
				entry = strings.TrimSpace(s)
			}
			for _, alt := range strings.Split(entry, "|") {
				alt = strings.TrimSpace(alt)
				if alt == "" {
					return p, recordErr(name, f.Line, f.Column, fmt.Sprintf("materials: finding %d has an empty alternative in %q", n, entry),
						"write alternatives as 'azurite|malachite', findings apart with ';'")
				}
				fi.Materials = append(fi.Materials, alt)
				fi.MatPos = append(fi.MatPos, pos)
			}
			c.Findings = append(c.Findings, fi)
		}
	}
	if f, ok := get(colClaim); ok {
		n := 0
		for s := range listEntries(f.Text) {
			n++
			d, err := csvDate(name, f, "claim", s)
			if err != nil {
				return p, err
			}
			pos := constraint.Pos{Line: f.Line, Column: f.Column}
			c.Claims = append(c.Claims, constraint.Claim{ID: fmt.Sprintf("claim-%d", n), Date: d, DateText: s, By: "the claim column", Pos: pos})
		}
	}
	for _, k := range []struct {
		col, id string
		kind    constraint.RecordKind
	}{{colNotBefore, "not-before", constraint.RecordNotBefore}, {colNotAfter, "not-after", constraint.RecordNotAfter}} {
		f, ok := get(k.col)
		if !ok {
			continue
		}
		d, err := csvDate(name, f, k.col, f.Text)
		if err != nil {
			return p, err
		}
		pos := constraint.Pos{Line: f.Line, Column: f.Column}
		c.Records = append(c.Records, constraint.Record{ID: k.id, Kind: k.kind, Date: d, DateText: f.Text, DatePos: pos,
			Strength: network.Firm, Source: "the " + k.col + " column", Pos: pos})
	}
	p.c = c
	return p, nil
}

// listEntries yields the entries of a column that holds a list: split at
// ';', trimmed, the empty ones left out.
func listEntries(text string) iter.Seq[string] {
	return func(yield func(string) bool) {
		for e := range strings.SplitSeq(text, ";") {
			if e = strings.TrimSpace(e); e != "" && !yield(e) {
				return
			}
		}
	}
}

func csvDate(name string, f csvField, col, s string) (date.Date, error) {
	d, err := date.Parse(s)
	if err == nil {
		return d, nil
	}
	msg := err.Error()
	var pe *date.ParseError
	if errors.As(err, &pe) {
		msg = pe.Msg
	}
	return date.Date{}, recordErr(name, f.Line, f.Column, fmt.Sprintf("%s: %q is not a date: %s", col, s, msg),
		"write EDTF (1874, 1874-05, 1870/1879, 1870~) or e.g. 'c. 1870'; 'terminus date EXPR' shows how a date is read")
}
