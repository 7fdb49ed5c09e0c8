package survey

import (
	"bufio"
	"bytes"
	"errors"
	"io"
)

// MaxLine is the longest physical line a reader keeps, and the longest CSV
// record, in bytes. A longer line becomes a record error (its text is
// skipped, its place kept), so that one runaway line cannot make the memory
// grow with the input.
const MaxLine = 1 << 20

// lineReader hands out physical lines one by one, without their line end
// ("\n" or "\r\n"), counting them from 1. The slice it returns is valid
// until the next call.
type lineReader struct {
	r    *bufio.Reader
	buf  []byte
	line int
	max  int
	// size is the number of bytes the last line took in the input, its
	// line end (and a byte-order mark) included.
	size int
}

func newLineReader(r io.Reader, max int) *lineReader {
	if max <= 0 {
		max = MaxLine
	}
	return &lineReader{r: bufio.NewReaderSize(r, 64<<10), max: max}
}

// next returns the next line and its number; tooLong is true when the line
// was longer than the limit (and is then returned cut at the limit). At the
// end of the input it returns io.EOF.
func (lr *lineReader) next() (text []byte, line int, tooLong bool, err error) {
	lr.buf = lr.buf[:0]
	lr.size = 0
	for {
		chunk, err := lr.r.ReadSlice('\n')
		lr.size += len(chunk)
		if len(lr.buf)+len(chunk) <= lr.max {
			lr.buf = append(lr.buf, chunk...)
		} else {
			if room := lr.max - len(lr.buf); room > 0 {
				lr.buf = append(lr.buf, chunk[:room]...)
			}
			tooLong = true
		}
		if errors.Is(err, bufio.ErrBufferFull) {
			continue
		}
		if err != nil && !errors.Is(err, io.EOF) {
			return nil, lr.line, false, err
		}
		if errors.Is(err, io.EOF) && len(lr.buf) == 0 && len(chunk) == 0 {
			return nil, lr.line, false, io.EOF
		}
		break
	}
	lr.line++
	text = lr.buf
	if !tooLong {
		text = bytes.TrimSuffix(text, []byte("\n"))
		text = bytes.TrimSuffix(text, []byte("\r"))
	}
	if lr.line == 1 {
		text = bytes.TrimPrefix(text, []byte("\xef\xbb\xbf")) // a byte order mark
	}
	return text, lr.line, tooLong, nil
}

// blank reports whether a line holds nothing but spaces, tabs and carriage
// returns: such a line is no record in either format. Other white space
// (a no-break space, U+2028) is text, and a record that holds it is read
// and, where it does not belong, refused.
func blank(line []byte) bool {
	for _, c := range line {
		if c != ' ' && c != '\t' && c != '\r' {
			return false
		}
	}
	return true
}
