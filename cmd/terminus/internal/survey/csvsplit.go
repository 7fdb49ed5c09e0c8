package survey

// csvField is one field of a CSV record and where it starts.
type csvField struct {
	Text         string
	Line, Column int // 1-based; Column counts bytes
}

// csvSplitter assembles one logical CSV record (RFC 4180: fields separated
// by commas, quoted with double quotes, "" for a quote inside quotes, a
// quoted field may span lines) from physical lines. It is lenient where
// spreadsheets are sloppy: a quote inside an unquoted field and text after
// a closing quote are kept as written.
type csvSplitter struct {
	fields   []csvField
	cur      []byte
	start    csvField // position of the current field
	inQuotes bool
	atStart  bool
	open     bool // a record is being assembled
	size     int
}

// feed adds a physical line. It returns true when the record is complete;
// fields then holds it until the next feed.
func (s *csvSplitter) feed(line []byte, lineNo int) bool {
	if !s.open {
		s.fields = s.fields[:0]
		s.cur = s.cur[:0]
		s.open, s.atStart, s.inQuotes, s.size = true, true, false, 0
		s.start = csvField{Line: lineNo, Column: 1}
	} else {
		s.cur = append(s.cur, '\n') // inside a quoted field that spans lines
	}
	s.size += len(line) + 1
	for i := 0; i < len(line); i++ {
		c := line[i]
		if s.inQuotes {
			if c == '"' {
				if i+1 < len(line) && line[i+1] == '"' {
					s.cur = append(s.cur, '"')
					i++
					continue
				}
				s.inQuotes = false
				continue
			}
			s.cur = append(s.cur, c)
			continue
		}
		switch {
		case c == ',':
			s.fields = append(s.fields, csvField{Text: string(s.cur), Line: s.start.Line, Column: s.start.Column})
			s.cur = s.cur[:0]
			s.start = csvField{Line: lineNo, Column: i + 2}
			s.atStart = true
			continue
		case c == '"' && s.atStart:
			s.inQuotes = true
		default:
			s.cur = append(s.cur, c)
		}
		s.atStart = false
	}
	if s.inQuotes {
		return false
	}
	s.finish()
	return true
}

// finish closes the record as it stands (also at the end of the input or
// when a quoted field grows too long).
func (s *csvSplitter) finish() {
	s.fields = append(s.fields, csvField{Text: string(s.cur), Line: s.start.Line, Column: s.start.Column})
	s.open = false
	s.inQuotes = false
}
