package input

import (
	"bytes"
	"errors"
	"fmt"
	"io"
	"os"
	"unicode/utf8"
)

// The default limits: far above any case or materials file a person
// writes (the largest built-in data file is about 0.1 MiB; a case with
// 10,000 ordered events about 1 MiB), far below what costs real time or
// memory to refuse.
const (
	DefaultMaxBytes = 16 << 20 // 16 MiB
	DefaultMaxDepth = 64       // a case file needs 5 levels, a materials file 4
)

// Limits bound what a file may hold before any decoder reads it. A zero
// field takes its default.
type Limits struct {
	MaxBytes int64 // bytes
	MaxDepth int   // levels of nested mappings and lists
}

func (l Limits) maxBytes() int64 {
	if l.MaxBytes <= 0 {
		return DefaultMaxBytes
	}
	return l.MaxBytes
}

func (l Limits) maxDepth() int {
	if l.MaxDepth <= 0 {
		return DefaultMaxDepth
	}
	return l.MaxDepth
}

// ReadFile reads the file at path, refusing at once one larger than the
// limit (no more than MaxBytes+1 bytes are read, so /dev/zero ends too).
func ReadFile(path string, l Limits) ([]byte, error) {
	f, err := os.Open(path)
	if err != nil {
		return nil, &Error{File: path, Msg: "cannot read the file: " + pathErr(err), Err: err}
	}
	defer f.Close()
	return Read(path, f, l)
}

// Read reads r (named name in messages) as ReadFile reads a file.
func Read(name string, r io.Reader, l Limits) ([]byte, error) {
	max := l.maxBytes()
	data, err := io.ReadAll(io.LimitReader(r, max+1))
	if err != nil {
		return nil, &Error{File: name, Msg: "cannot read the file: " + pathErr(err), Err: err}
	}
	if int64(len(data)) > max {
		return nil, &Error{File: name, Msg: fmt.Sprintf("the file is larger than the limit of %s", sizeText(max)),
			Suggestion: "is this the right file? If so, raise the limit with --max-input-size"}
	}
	return data, nil
}

func pathErr(err error) string {
	var pe *os.PathError
	if errors.As(err, &pe) {
		return pe.Err.Error()
	}
	return err.Error()
}

func sizeText(n int64) string {
	switch {
	case n >= 1<<20 && n%(1<<20) == 0:
		return fmt.Sprintf("%d MiB", n>>20)
	case n >= 1<<10 && n%(1<<10) == 0:
		return fmt.Sprintf("%d KiB", n>>10)
	}
	return fmt.Sprintf("%d bytes", n)
}

// bom is the UTF-8 byte-order mark.
var bom = []byte{0xEF, 0xBB, 0xBF}

// Check applies the rules every format shares to data before a decoder
// sees it: the size limit, a byte-order mark skipped, valid UTF-8 (the
// first invalid byte is an error at its line and column), and the nesting
// depth as far as the format's brackets, indentation and dotted keys show
// it. It returns the data without the mark.
func Check(name string, data []byte, format Format, l Limits) ([]byte, error) {
	if max := l.maxBytes(); int64(len(data)) > max {
		return nil, &Error{File: name, Msg: fmt.Sprintf("the file is larger than the limit of %s", sizeText(max)),
			Suggestion: "is this the right file? If so, raise the limit with --max-input-size"}
	}
	data = bytes.TrimPrefix(data, bom)
	if !utf8.Valid(data) {
		line, col := 1, 1
		for i := 0; i < len(data); {
			r, size := utf8.DecodeRune(data[i:])
			if r == utf8.RuneError && size == 1 {
				return nil, &Error{File: name, Line: line, Column: col, Msg: "the text is not valid UTF-8",
					Suggestion: "save the file as UTF-8 in your editor"}
			}
			if r == '\n' {
				line, col = line+1, 1
			} else {
				col++
			}
			i += size
		}
	}
	if at, r, ok := controlChar(data); ok {
		return nil, &Error{File: name, Line: at.Line, Column: at.Column,
			Msg:        fmt.Sprintf("a control character (%U) is not allowed in the text", r),
			Suggestion: "remove it; only tabs and line breaks may stand between the characters of a file"}
	}
	max := l.maxDepth()
	var at Pos
	var deep bool
	switch format {
	case YAML:
		at, deep = yamlTooDeep(data, max)
	case TOML:
		at, deep = tomlTooDeep(data, max)
	case JSON:
		at, deep = bracketsTooDeep(data, false, max)
	}
	if deep {
		return nil, &Error{File: name, Line: at.Line, Column: at.Column,
			Msg:        fmt.Sprintf("nested more than %d levels deep", max),
			Suggestion: "a case or materials file needs only a few levels; check the brackets and indentation here"}
	}
	return data, nil
}

// controlChar finds the first control character other than a tab or a
// line break (C0 controls and DEL; YAML, TOML and JSON refuse them all
// outside strings, YAML and JSON inside too).
func controlChar(data []byte) (Pos, rune, bool) {
	line, col := 1, 0
	for i := 0; i < len(data); i++ {
		c := data[i]
		if c >= 0x80 && !utf8.RuneStart(c) {
			continue
		}
		col++
		switch {
		case c == '\n':
			line, col = line+1, 0
		case c == '\t' || c == '\r':
		case c < 0x20 || c == 0x7f:
			return Pos{line, col}, rune(c), true
		}
	}
	return Pos{}, 0, false
}

// bracketsTooDeep finds where [ and { outside quoted strings first nest
// deeper than max; with comments, '#' starts a comment and
// a single quote may open a string too. A quote opens a string only where
// a value can start (after white space or a bracket, comma, colon or
// equals sign), so that the apostrophe of "dyer's madder" does not.
func bracketsTooDeep(data []byte, comments bool, max int) (Pos, bool) {
	depth := 0
	line, col := 1, 0
	var quote, prev byte = 0, '\n'
	for i := 0; i < len(data); i++ {
		c := data[i]
		col++
		if c >= 0x80 && !utf8.RuneStart(c) {
			col-- // a continuation byte is part of the character before
		}
		switch {
		case c == '\n':
			line, col = line+1, 0
		case quote != 0:
			if c == '\\' && quote == '"' && i+1 < len(data) && data[i+1] != '\n' {
				i++
				col++
			} else if c == quote {
				quote = 0
			}
		case (c == '"' || c == '\'' && comments) && valueStart(prev):
			quote = c
		case c == '#' && comments && (prev == ' ' || prev == '\t' || prev == '\n'):
			for i+1 < len(data) && data[i+1] != '\n' {
				i++
			}
		case c == '[' || c == '{':
			if depth++; depth > max {
				return Pos{line, col}, true
			}
		case (c == ']' || c == '}') && depth > 0:
			depth--
		}
		prev = c
	}
	return Pos{}, false
}

func valueStart(prev byte) bool {
	switch prev {
	case ' ', '\t', '\n', '\r', '[', '{', ',', ':', '=', '-':
		return true
	}
	return false
}

// tomlTooDeep finds where TOML's brackets, or its dotted keys and table
// headers ([a.b.c] is three levels), first nest deeper than max.
func tomlTooDeep(data []byte, max int) (Pos, bool) {
	if at, deep := bracketsTooDeep(data, true, max); deep {
		return at, true
	}
	line := 0
	for l := range bytes.Lines(data) {
		line++
		l = bytes.TrimSuffix(l, []byte{'\n'})
		l = bytes.TrimLeft(l, " \t")
		end := len(l)
		if l0 := bytes.IndexAny(l, "=#"); l0 >= 0 && (len(l) == 0 || l[0] != '[') {
			end = l0 // a key: the dots before '='
		} else if l1 := bytes.IndexByte(l, ']'); l1 >= 0 && len(l) > 0 && l[0] == '[' {
			end = l1 // a header
		}
		if dottedDepth(l[:end]) > max {
			return Pos{line, 1}, true
		}
	}
	return Pos{}, false
}

// dottedDepth counts the parts of a dotted key, quoted parts whole.
func dottedDepth(key []byte) int {
	n := 1
	var quote byte
	for _, c := range key {
		switch {
		case quote != 0:
			if c == quote {
				quote = 0
			}
		case c == '"' || c == '\'':
			quote = c
		case c == '.':
			n++
		}
	}
	return n
}

// yamlTooDeep finds where YAML first nests deeper than max: its flow
// brackets, or its block structure as the indentation of each line shows
// it (a deeper indentation, or a "- " that starts a list item, opens a
// level).
func yamlTooDeep(data []byte, max int) (Pos, bool) {
	if at, deep := bracketsTooDeep(data, true, max); deep {
		return at, true
	}
	var stack []int // the indentation of each open level
	line := 0
	for l := range bytes.Lines(data) {
		line++
		l = bytes.TrimSuffix(l, []byte{'\n'})
		indent := 0
		for indent < len(l) && l[indent] == ' ' {
			indent++
		}
		rest := bytes.TrimRight(l[indent:], " \t\r")
		if len(rest) == 0 || rest[0] == '#' {
			continue
		}
		for len(stack) > 0 && stack[len(stack)-1] >= indent {
			stack = stack[:len(stack)-1]
		}
		stack = append(stack, indent)
		// "- - x" opens one level per dash.
		for len(rest) >= 2 && rest[0] == '-' && rest[1] == ' ' {
			indent += 2
			rest = bytes.TrimLeft(rest[2:], " ")
			stack = append(stack, indent)
		}
		if len(stack) > max {
			return Pos{line, 1}, true
		}
	}
	return Pos{}, false
}
