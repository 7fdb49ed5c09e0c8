package survey

import "bytes"

// csvField is one field of a CSV record and where it starts.
type csvField struct {
	Text         string
	Line, Column int // 1-based; Column counts bytes
}

// csvSplitter splits CSV records (RFC 4180: fields separated by commas,
// quoted with double quotes, "" for a quote inside quotes, a quoted field
// may span lines) one physical line at a time. It is lenient where
// spreadsheets are sloppy, within a line: a quote inside an unquoted field
// and text after a closing quote are kept as written. A quoted field that
// spans lines must close properly, its closing quote followed by a comma or
// the end of the line; otherwise the splitter stops at that quote
// (badClose), for the caller to refuse the record.
//
// A line does one of two things to the state of a record, depending only
// on whether it starts inside a quoted field: the reader of package survey
// relies on that to decide in linear time where a record that opens a
// quote ends. With collect false the splitter only counts (separators, the
// state at the end) and keeps no text.
type csvSplitter struct {
	collect  bool
	fields   []csvField
	cur      []byte
	start    csvField // where the current field starts
	inQuotes bool     // inside a quoted field
	atStart  bool     // at the start of a field: a quote here opens one
	spanning bool     // the open quoted field began on an earlier line
	seps     int      // separators outside quotes since the last reset
	badClose int      // the column of a bad closing quote, 0 when none
	scanned  int64    // bytes fed, ever: the work done, for the tests
}

// reset starts a new record at the start of a line.
func (s *csvSplitter) reset(lineNo int) {
	s.fields = s.fields[:0]
	s.cur = s.cur[:0]
	s.start = csvField{Line: lineNo, Column: 1}
	s.inQuotes, s.atStart, s.spanning = false, true, false
	s.seps, s.badClose = 0, 0
}

// resumeInQuotes sets the state of a line that starts inside a quoted
// field begun on an earlier line, for counting.
func (s *csvSplitter) resumeInQuotes() {
	s.inQuotes, s.atStart, s.spanning = true, false, true
	s.seps, s.badClose = 0, 0
}

// feed reads one physical line. A line that continues an open quoted
// field adds the line break to it. It stops early at a bad closing quote.
func (s *csvSplitter) feed(line []byte, lineNo int) {
	s.scanned += int64(len(line))
	if s.inQuotes && s.collect {
		s.cur = append(s.cur, '\n')
	}
	for i := 0; i < len(line); i++ {
		if s.inQuotes {
			j := bytes.IndexByte(line[i:], '"')
			if j < 0 {
				if s.collect {
					s.cur = append(s.cur, line[i:]...)
				}
				break
			}
			if s.collect {
				s.cur = append(s.cur, line[i:i+j]...)
			}
			i += j
			if i+1 < len(line) && line[i+1] == '"' {
				if s.collect {
					s.cur = append(s.cur, '"')
				}
				i++
				continue
			}
			s.inQuotes = false
			if s.spanning {
				s.spanning = false
				if i+1 < len(line) && line[i+1] != ',' {
					s.badClose = i + 1
					return
				}
			}
			continue
		}
		switch c := line[i]; {
		case c == ',':
			s.seps++
			if s.collect {
				s.fields = append(s.fields, csvField{Text: string(s.cur), Line: s.start.Line, Column: s.start.Column})
				s.cur = s.cur[:0]
			}
			s.start = csvField{Line: lineNo, Column: i + 2}
			s.atStart = true
			continue
		case c == '"' && s.atStart:
			s.inQuotes = true
		default:
			if s.collect {
				s.cur = append(s.cur, c)
			}
		}
		s.atStart = false
	}
	if s.inQuotes {
		s.spanning = true
	}
}

// finish closes the record: the last field.
func (s *csvSplitter) finish() {
	s.fields = append(s.fields, csvField{Text: string(s.cur), Line: s.start.Line, Column: s.start.Column})
}
