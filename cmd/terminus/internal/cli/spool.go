package cli

import "io"

// spool keeps a command's output in memory until it is complete, in
// chunks: unlike one growing buffer it never copies what it holds, so a
// report of 60 MB costs 60 MB, not the 32 + 64 MB of a buffer's last
// doubling.
type spool struct {
	chunks [][]byte
}

// spoolChunk is the size of a chunk; a write larger than it gets a chunk
// of its own size.
const spoolChunk = 1 << 20

func (s *spool) Write(p []byte) (int, error) {
	spoolAppend(s, p)
	return len(p), nil
}

func (s *spool) WriteString(str string) (int, error) {
	spoolAppend(s, str)
	return len(str), nil
}

func spoolAppend[T string | []byte](s *spool, p T) {
	for len(p) > 0 {
		last := len(s.chunks) - 1
		if last < 0 || len(s.chunks[last]) == cap(s.chunks[last]) {
			s.chunks = append(s.chunks, make([]byte, 0, max(spoolChunk, len(p))))
			last++
		}
		c := s.chunks[last]
		k := min(len(p), cap(c)-len(c))
		s.chunks[last] = append(c, p[:k]...)
		p = p[k:]
	}
}

// WriteTo writes what the spool holds to w.
func (s *spool) WriteTo(w io.Writer) (int64, error) {
	var total int64
	for _, c := range s.chunks {
		n, err := w.Write(c)
		total += int64(n)
		if err != nil {
			return total, err
		}
	}
	return total, nil
}
