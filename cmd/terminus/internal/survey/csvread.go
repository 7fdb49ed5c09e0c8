package survey

import (
	"errors"
	"fmt"
	"io"
	"strings"
	"unicode/utf8"
)

// A CSV record that opens a quoted field on one line and closes it on a
// later one is taken whole only when the quote closes properly (followed by
// a comma or the end of the line), within [MaxLine] bytes, and the record
// then has the header's number of fields. Otherwise the line that opens the
// quote becomes an error record of its own and reading resumes at the next
// line, so that one stray quote costs one record, not the rows after it.
//
// Deciding this reads ahead: the lines after an open quote wait in a queue
// (at most MaxLine bytes of them, plus one line). Each line is scanned at
// most three times (as the first line of a record, as a line inside an open
// quote, and once more to collect the fields of the record it belongs to),
// and where the open quote of a record closes is found by a scan that never
// goes back: a line inside an open quote does the same whatever record it
// belongs to, so every record that opens a quote before a line that closes
// one ends at that line. The work is linear in the input, however the
// quotes fall.

// queuedLine is a physical line read ahead.
type queuedLine struct {
	no       int   // the line number
	off, n   int   // the text: in.csv.text[off : off+n]
	end      int64 // bytes of the input up to the end of this line
	size     int   // bytes of the input the line takes, its line end included
	tooLong  bool  // longer than MaxLine (no text kept)
	scanned  bool  // read as a line inside an open quote: the fields below are set
	closes   bool  // it closes the quote (or closes it badly, badClose > 0)
	badClose int   // the column of a closing quote followed by text
	seps     int   // separators outside quotes, read from inside a quote
	sepsTo   int64 // seps of the scanned lines up to this one, a running total
}

// csvQueue is the read-ahead of a CSV input.
type csvQueue struct {
	lines    []queuedLine
	head     int
	text     []byte
	bytes    int64 // bytes read so far (the ends of the lines)
	scanEnd  int   // the last line read from inside an open quote, 0: none
	sepsTo   int64
	eof      bool
	counting csvSplitter // for the lines read from inside a quote
}

func (q *csvQueue) len() int { return len(q.lines) - q.head }

// at returns the i-th line waiting (0: the first).
func (q *csvQueue) at(i int) *queuedLine { return &q.lines[q.head+i] }

func (q *csvQueue) textOf(l *queuedLine) []byte { return q.text[l.off : l.off+l.n] }

// pop drops the first line.
func (q *csvQueue) pop() {
	q.head++
	switch {
	case q.head == len(q.lines):
		q.lines, q.head, q.text = q.lines[:0], 0, q.text[:0]
	case q.head >= 1024 && 2*q.head >= len(q.lines):
		base := q.lines[q.head].off
		n := copy(q.lines, q.lines[q.head:])
		q.lines, q.head = q.lines[:n], 0
		for i := range q.lines {
			q.lines[i].off -= base
		}
		q.text = q.text[:copy(q.text, q.text[base:])]
	}
}

// fill reads one more line into the queue; false at the end of the input.
func (in *Input) fill() (bool, error) {
	q := &in.csv
	if q.eof {
		return false, nil
	}
	text, line, tooLong, err := in.lr.next()
	if errors.Is(err, io.EOF) {
		q.eof = true
		return false, nil
	}
	if err != nil {
		return false, &InputError{File: in.Name, Line: line, Msg: fmt.Sprintf("cannot read the collection: %v", err), Err: err}
	}
	in.lines++
	q.bytes += int64(in.lr.size)
	l := queuedLine{no: line, off: len(q.text), end: q.bytes, size: in.lr.size, tooLong: tooLong}
	if !tooLong {
		q.text = append(q.text, text...)
		l.n = len(text)
	}
	q.lines = append(q.lines, l)
	return true, nil
}

// nextCSV returns the next CSV record, or io.EOF.
func (in *Input) nextCSV() (rawRecord, error) {
	q := &in.csv
	for {
		if q.len() == 0 {
			ok, err := in.fill()
			if err != nil {
				return rawRecord{}, err
			}
			if !ok {
				return rawRecord{}, io.EOF
			}
		}
		first := q.at(0)
		no := first.no
		if first.tooLong {
			q.pop()
			return in.errorRecord(no, 0, fmt.Sprintf("the line is longer than %d bytes", MaxLine), ""), nil
		}
		text := q.textOf(first)
		if blank(text) {
			q.pop()
			in.blank++
			continue
		}
		s := &in.split
		s.collect = true
		s.reset(no)
		s.feed(text, no)
		if !s.inQuotes {
			r := in.csvRecord(1)
			q.pop()
			return r, nil
		}
		// A quoted field is open at the end of the line.
		n, fail, err := in.closeQuote()
		if err != nil {
			return rawRecord{}, err
		}
		if fail != "" {
			r := in.errorRecord(no, s.start.Column, "a quoted field opens here and "+fail,
				"close the quote, or write a quote inside a quoted field as \"\"; the lines after this one are read as rows of their own")
			r.id = in.idOf(s.fields)
			q.pop()
			return r, nil
		}
		for i := 1; i < n; i++ {
			l := q.at(i)
			s.feed(q.textOf(l), l.no)
		}
		r := in.csvRecord(n)
		for range n {
			q.pop()
		}
		return r, nil
	}
}

// closeQuote decides the record whose first line, first in the queue,
// leaves a quoted field open: it returns the number of lines the record
// takes, or why the line must stand alone as an error record.
func (in *Input) closeQuote() (lines int, fail string, err error) {
	q := &in.csv
	s := &in.split
	start := *q.at(0) // a copy: reading ahead may move the queue
	if q.scanEnd <= start.no {
		q.scanEnd = start.no // lines after this one are read afresh
	}
	// The lines up to scanEnd have been read from inside a quote; those
	// before it stay inside, so the record's quote closes at scanEnd if
	// that line closes it, and after it otherwise.
	for {
		last := q.at(q.scanEnd - start.no)
		if last.no > start.no && last.closes {
			break
		}
		if size := last.end - start.end + int64(start.size); size > MaxLine {
			return 0, fmt.Sprintf("runs on past %d bytes without closing", MaxLine), nil
		}
		if q.scanEnd-start.no+1 == q.len() {
			ok, err := in.fill()
			if err != nil {
				return 0, "", err
			}
			if !ok {
				return 0, "is not closed before the end of the file", nil
			}
		}
		l := q.at(q.scanEnd - start.no + 1)
		if !l.tooLong {
			c := &q.counting
			c.resumeInQuotes()
			c.feed(q.textOf(l), l.no)
			l.closes, l.badClose, l.seps = !c.inQuotes || c.badClose > 0, c.badClose, c.seps
		}
		q.sepsTo += int64(l.seps)
		l.sepsTo, l.scanned = q.sepsTo, true
		q.scanEnd = l.no
	}
	closer := q.at(q.scanEnd - start.no)
	if size := closer.end - start.end + int64(start.size); size > MaxLine {
		return 0, fmt.Sprintf("runs on past %d bytes without closing", MaxLine), nil
	}
	if closer.badClose > 0 {
		return 0, fmt.Sprintf("its closing quote on line %d (column %d) is followed by text, not by a comma", closer.no, closer.badClose), nil
	}
	second := q.at(1)
	fields := 1 + int64(s.seps) + closer.sepsTo - second.sepsTo + int64(second.seps)
	if fields != int64(in.width) {
		return 0, fmt.Sprintf("closes on line %d, but the row would then have %d fields, the header %d", closer.no, fields, in.width), nil
	}
	return closer.no - start.no + 1, "", nil
}

// csvRecord makes a record of the fields split from the first n lines of
// the queue; a record with invalid UTF-8 is an error record.
func (in *Input) csvRecord(n int) rawRecord {
	q := &in.csv
	s := &in.split
	s.finish()
	first := q.at(0).no
	for i := range n {
		l := q.at(i)
		if text := q.textOf(l); !utf8.Valid(text) {
			col := 1
			for len(text) > 0 {
				r, size := utf8.DecodeRune(text)
				if r == utf8.RuneError && size <= 1 {
					break
				}
				text, col = text[size:], col+size
			}
			r := in.errorRecord(first, 0, "", "")
			r.err = recordErr(in.DisplayName(), l.no, col, "the text is not valid UTF-8", "save the file as UTF-8 in your editor")
			r.lines = n
			r.id = in.idOf(s.fields)
			return r
		}
	}
	fields := make([]csvField, len(s.fields))
	copy(fields, s.fields)
	return rawRecord{in: in, line: first, lines: n, fields: fields}
}

// errorRecord is a record of one line that cannot be read.
func (in *Input) errorRecord(line, col int, msg, suggest string) rawRecord {
	return rawRecord{in: in, line: line, lines: 1, err: recordErr(in.DisplayName(), line, col, msg, suggest)}
}

// idOf is the id of an error record, when the fields read so far hold it
// (with any invalid UTF-8 replaced); "" otherwise.
func (in *Input) idOf(fields []csvField) string {
	if i, ok := in.known[colID]; ok && i < len(fields) {
		return strings.ToValidUTF8(strings.TrimSpace(fields[i].Text), "\uFFFD")
	}
	return ""
}
