package survey

import (
	"bufio"
	"bytes"
	"errors"
	"fmt"
	"io"
	"os"
	"path/filepath"
	"slices"
	"strings"
	"sync/atomic"
	"unicode/utf8"

	"terminus/materials/spell"
)

// Format is the layout of an input file.
type Format string

// The input formats.
const (
	JSONL Format = "jsonl" // one case per line, the case file schema in JSON
	CSV   Format = "csv"   // the spreadsheet column set of the package comment
)

// ParseFormat reads an --input value: "jsonl", "csv" or "" / "auto".
func ParseFormat(s string) (Format, error) {
	switch strings.ToLower(s) {
	case "", "auto":
		return "", nil
	case "jsonl", "ndjson", "json":
		return JSONL, nil
	case "csv":
		return CSV, nil
	}
	return "", fmt.Errorf("unknown input format %q: expected jsonl, csv or auto", s)
}

// InputError is a problem with a whole input (it cannot be read, or a CSV
// file has no usable header): the survey does not start.
type InputError struct {
	File    string
	Line    int // 0 when the problem is not on a line
	Msg     string
	Suggest string
	Err     error
}

func (e *InputError) Error() string {
	if e.Line > 0 {
		return fmt.Sprintf("%s:%d: %s", e.File, e.Line, e.Msg)
	}
	return fmt.Sprintf("%s: %s", e.File, e.Msg)
}

// Hint returns the suggestion, for the command line's "hint:" line.
func (e *InputError) Hint() string { return e.Suggest }

func (e *InputError) Unwrap() error { return e.Err }

// The CSV columns the survey reads; every other column is free and passed
// through to the output unchanged.
const (
	colID        = "id"
	colTitle     = "title"
	colPlace     = "place"
	colClaim     = "claim"
	colMaterials = "materials"
	colNotBefore = "not_before"
	colNotAfter  = "not_after"
)

// Columns returns the CSV column names the survey reads, in the documented
// order.
func Columns() []string {
	return []string{colID, colTitle, colPlace, colClaim, colMaterials, colNotBefore, colNotAfter}
}

// Input is one collection opened for a survey. Open every input before the
// survey starts, so that a missing file or a bad header stops it before any
// output.
type Input struct {
	// Name is the file name as given, "-" for standard input.
	Name string
	// Format is the format read or detected.
	Format Format
	// Size is the input's length in bytes, -1 when not known (a pipe).
	Size int64
	// Free are the names of the CSV columns kept through, in file order.
	Free []string

	read   atomic.Int64 // bytes consumed, for the progress bar
	closer io.Closer
	lr     *lineReader
	known  map[string]int // CSV: known column → field index
	free   []int          // CSV: field index of each free column
	split  csvSplitter
	csv    csvQueue
	width  int // CSV: number of header fields

	// The physical lines read, and of them the header rows and the blank
	// lines; every other line belongs to a record (see [Counts]).
	lines, header, blank int
}

// DisplayName is the name used in messages: the file name, or "stdin".
func (in *Input) DisplayName() string {
	if in.Name == "-" {
		return "stdin"
	}
	return in.Name
}

type countingReader struct {
	r io.Reader
	n *atomic.Int64
}

func (c countingReader) Read(p []byte) (int, error) {
	n, err := c.r.Read(p)
	c.n.Add(int64(n))
	return n, err
}

// Open opens a collection file; name "-" reads stdin. format "" detects the
// format from the extension (.csv; .jsonl, .ndjson, .json) or, failing
// that, from the first character ('{' is JSON Lines, anything else CSV).
// For CSV the header row is read and checked here.
func Open(name string, stdin io.Reader, format Format) (*Input, error) {
	in := &Input{Name: name, Size: -1}
	var r io.Reader
	if name == "-" {
		if stdin == nil {
			stdin = os.Stdin
		}
		r = stdin
	} else {
		f, err := os.Open(name)
		if err != nil {
			var pe *os.PathError
			if errors.As(err, &pe) {
				err = pe.Err
			}
			return nil, &InputError{File: name, Msg: fmt.Sprintf("cannot read the collection: %v", err), Err: err}
		}
		if st, err := f.Stat(); err == nil {
			if st.IsDir() {
				f.Close()
				return nil, &InputError{File: name, Msg: "is a folder, not a collection file", Suggest: "name the .jsonl or .csv files, e.g. folder/*.csv"}
			}
			if st.Mode().IsRegular() {
				in.Size = st.Size()
			}
		}
		in.closer = f
		r = f
	}
	br := bufio.NewReaderSize(countingReader{r, &in.read}, 64<<10)
	if format == "" {
		format = formatByName(name)
	}
	if format == "" {
		format = sniff(br)
	}
	in.Format = format
	in.lr = newLineReader(br, MaxLine)
	if format == CSV {
		if err := in.readHeader(); err != nil {
			in.Close()
			return nil, err
		}
	}
	return in, nil
}

func formatByName(name string) Format {
	switch strings.ToLower(filepath.Ext(name)) {
	case ".csv":
		return CSV
	case ".jsonl", ".ndjson", ".json":
		return JSONL
	}
	return ""
}

// sniff looks at the first character that is not white space.
func sniff(br *bufio.Reader) Format {
	head, _ := br.Peek(4096)
	head = bytes.TrimPrefix(head, []byte("\xef\xbb\xbf"))
	head = bytes.TrimLeft(head, " \t\r\n")
	if len(head) > 0 && head[0] == '{' {
		return JSONL
	}
	return CSV
}

// Close closes the file (not standard input).
func (in *Input) Close() error {
	if in.closer == nil {
		return nil
	}
	c := in.closer
	in.closer = nil
	return c.Close()
}

// normColumn folds a header name: case, surrounding space, and spaces or
// hyphens for underscores ("Not before" is not_before).
func normColumn(s string) string {
	return strings.Map(func(r rune) rune {
		if r == ' ' || r == '-' {
			return '_'
		}
		return r
	}, strings.ToLower(strings.TrimSpace(s)))
}

// columnAlias returns the known column for another spelling of it.
func columnAlias(n string) (string, bool) {
	switch n {
	case "material":
		return colMaterials, true
	case "claims", "claimed":
		return colClaim, true
	}
	return "", false
}

func (in *Input) readHeader() error {
	s := &in.split
	for {
		text, line, tooLong, err := in.lr.next()
		if errors.Is(err, io.EOF) {
			return nil // an empty file: no records
		}
		if err != nil {
			return &InputError{File: in.Name, Msg: fmt.Sprintf("cannot read the collection: %v", err), Err: err}
		}
		in.lines++
		if tooLong {
			return &InputError{File: in.Name, Line: line, Msg: "the header row is longer than 1 MiB"}
		}
		if blank(text) {
			in.blank++
			continue
		}
		in.header++
		if !utf8.Valid(text) {
			return &InputError{File: in.Name, Line: line, Msg: "the header row is not valid UTF-8", Suggest: "save the file as UTF-8 in your editor"}
		}
		s.collect = true
		s.reset(line)
		s.feed(text, line)
		if s.inQuotes {
			return &InputError{File: in.Name, Line: line, Msg: "the header row opens a quote that it does not close"}
		}
		s.finish()
		in.known = map[string]int{}
		in.width = len(s.fields)
		known := Columns()
		for i, f := range s.fields {
			n := normColumn(f.Text)
			if a, ok := columnAlias(n); ok {
				n = a
			}
			if slices.Contains(known, n) {
				if prev, dup := in.known[n]; dup {
					return &InputError{File: in.Name, Line: line, Msg: fmt.Sprintf("the header names the column %q twice (fields %d and %d)", n, prev+1, i+1)}
				}
				in.known[n] = i
				continue
			}
			if near := nearColumn(n, known); near != "" {
				return &InputError{File: in.Name, Line: line, Msg: fmt.Sprintf("header column %q: did you mean %q?", f.Text, near),
					Suggest: "rename the column; the survey reads " + strings.Join(known, ", ") + " and keeps any other column as it is"}
			}
			in.free = append(in.free, i)
			in.Free = append(in.Free, strings.TrimSpace(f.Text))
		}
		if len(in.known) == 0 {
			return &InputError{File: in.Name, Line: line, Msg: "the first row names none of the survey's columns: is the header row missing?",
				Suggest: "start the file with a header row such as: id,title,place,claim,materials,not_before,not_after"}
		}
		return nil
	}
}

// nearColumn returns the known column that a header name is a slip of
// spelling for, by the one rule of every "did you mean" ([spell.Nearest]);
// "" when there is none. Names of fewer than four letters are never taken
// for slips: two edits turn any two-letter name into "id".
func nearColumn(n string, known []string) string {
	if utf8.RuneCountInString(n) < 4 {
		return ""
	}
	if near := spell.Nearest(n, known, 1); len(near) > 0 {
		return near[0]
	}
	return ""
}

// rawRecord is one record as read, before parsing: a JSON line or the
// fields of a CSV row.
type rawRecord struct {
	in     *Input
	line   int        // the first line
	lines  int        // the number of physical lines
	text   []byte     // JSON Lines: the line (a copy)
	fields []csvField // CSV: the row (a copy)
	err    error      // a record that could not even be split
	id     string     // the id of an error record, when it can be read
}

// next reads the next record; io.EOF at the end. Blank lines are not
// records and are skipped (and counted).
func (in *Input) next() (rawRecord, error) {
	if in.Format == CSV {
		return in.nextCSV()
	}
	for {
		text, line, tooLong, err := in.lr.next()
		if errors.Is(err, io.EOF) {
			return rawRecord{}, io.EOF
		}
		if err != nil {
			return rawRecord{}, &InputError{File: in.Name, Line: line, Msg: fmt.Sprintf("cannot read the collection: %v", err), Err: err}
		}
		in.lines++
		if tooLong {
			return in.errorRecord(line, 0, fmt.Sprintf("the line is longer than %d bytes", MaxLine), ""), nil
		}
		if blank(text) {
			in.blank++
			continue
		}
		return rawRecord{in: in, line: line, lines: 1, text: bytes.Clone(text)}, nil
	}
}
