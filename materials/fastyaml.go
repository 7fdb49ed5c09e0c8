package materials

import (
	"strconv"
	"strings"
	"unicode/utf8"
)

// fastYAML reads the plain subset of YAML that materials files are written
// in — block mappings and sequences, one-line flow lists and mappings,
// plain, single- and double-quoted scalars, comments — into the tree that
// yaml.v3's would convert to (kinds, values, quoting, lines and columns;
// the tags that matter here, null and integer). It is several times quicker than the
// general decoder. Anything outside the subset (anchors, tags, block
// scalars, multi-line values, tabs, several documents, a value it is not
// sure of) makes it give up with ok false, and the general decoder reads
// the file instead, so it never changes what a file means or which errors
// it gets. A differential fuzz test holds it to that.
func fastYAML(data []byte) (root *node, ok bool) {
	if !utf8.Valid(data) {
		return nil, false
	}
	p := &fastParser{}
	if !p.split(string(data)) {
		return nil, false
	}
	if len(p.lines) == 0 || p.lines[0].col != 1 {
		return nil, false // empty, or indented: let the decoder say what that is
	}
	n, ok := p.block(1)
	if !ok || p.i != len(p.lines) {
		return nil, false
	}
	return n, true
}

type fastLine struct {
	text string // the line without its newline
	num  int    // 1-based line number
	off  int    // byte offset where the content starts (after indentation or "- ")
	col  int    // 1-based column (in characters) of off
	// ascii lines count columns in bytes.
	ascii bool
}

type fastParser struct {
	lines []fastLine
	i     int
	slab  []node // nodes are taken from here, a chunk at a time
	// The children of the collections being read wait on stack; when a
	// collection ends they move to a slice of their own size, cut from ptrs.
	stack, ptrs []*node
}

func (p *fastParser) push(n ...*node) { p.stack = append(p.stack, n...) }

// collect takes the children pushed since base.
func (p *fastParser) collect(base int) []*node {
	k := len(p.stack) - base
	if k == 0 {
		return nil
	}
	if cap(p.ptrs)-len(p.ptrs) < k {
		p.ptrs = make([]*node, 0, max(2048, k))
	}
	n := len(p.ptrs)
	out := p.ptrs[n : n+k : n+k]
	copy(out, p.stack[base:])
	p.ptrs = p.ptrs[:n+k]
	p.stack = p.stack[:base]
	return out
}

// node returns a new node from the current chunk.
func (p *fastParser) node(kind kindOfNode, line, col int) *node {
	if len(p.slab) == cap(p.slab) {
		p.slab = make([]node, 0, 1024)
	}
	p.slab = p.slab[:len(p.slab)+1]
	n := &p.slab[len(p.slab)-1]
	n.kind, n.line, n.col = kind, int32(line), int32(col)
	return n
}

// scalar returns a scalar node; a plain one gets the decoder's reading of
// null and integer.
func (p *fastParser) scalar(value string, quoted bool, line, col int) *node {
	n := p.node(scalarNode, line, col)
	n.value, n.quoted = value, quoted
	if !quoted {
		n.null, n.integer = plainTag(value)
	}
	return n
}

// split cuts the text into lines, refusing what the subset does not have.
func (p *fastParser) split(s string) bool {
	if strings.HasPrefix(s, "\uFEFF") {
		return false
	}
	num := 0
	for len(s) > 0 {
		num++
		line, rest, found := strings.Cut(s, "\n")
		s = rest
		if !found && line == "" {
			break
		}
		ascii := true
		for j := 0; j < len(line); j++ {
			if c := line[j]; c >= 0x80 {
				ascii = false
				break
			} else if c < 0x20 || c == 0x7F {
				return false // tabs, CR, controls: the decoder decides
			}
		}
		if !ascii {
			for _, r := range line {
				if !printable(r) {
					return false
				}
			}
		}
		off := 0
		for off < len(line) && line[off] == ' ' {
			off++
		}
		content := line[off:]
		if content == "" || content[0] == '#' {
			continue
		}
		if strings.HasPrefix(line, "---") || strings.HasPrefix(line, "...") || content[0] == '%' {
			return false
		}
		p.lines = append(p.lines, fastLine{text: line, num: num, off: off, col: off + 1, ascii: ascii})
	}
	return true
}

// printable is yaml.v3's set of printable characters, without the tab and
// without the ones it also reads as line breaks (U+0085, U+2028, U+2029).
func printable(r rune) bool {
	switch {
	case r == 0x2028 || r == 0x2029:
		return false
	case r >= 0x20 && r <= 0x7E, r >= 0xA0 && r <= 0xD7FF:
		return true
	case r >= 0xE000 && r <= 0xFFFD:
		return r != 0xFEFF
	case r >= 0x10000 && r <= 0x10FFFF:
		return true
	}
	return false
}

func (p *fastParser) cur() *fastLine { return &p.lines[p.i] }

// block reads the node that starts at the current line, at column col.
func (p *fastParser) block(col int) (*node, bool) {
	l := p.cur()
	if l.col != col {
		return nil, false
	}
	if isDash(l.text[l.off:]) {
		return p.sequence(col)
	}
	return p.mapping(col)
}

func isDash(s string) bool { return s == "-" || strings.HasPrefix(s, "- ") }

func (p *fastParser) sequence(col int) (*node, bool) {
	l := p.cur()
	seq := p.node(seqNode, l.num, col)
	base := len(p.stack)
	for p.i < len(p.lines) {
		l = p.cur()
		if l.col < col {
			break
		}
		if l.col > col || !isDash(l.text[l.off:]) {
			return nil, false
		}
		// Step over "- " and the spaces after it; the item starts there.
		off := l.off + 1
		for off < len(l.text) && l.text[off] == ' ' {
			off++
		}
		if off == len(l.text) || l.text[off] == '#' {
			return nil, false // an empty item or one on the next lines
		}
		l.col += off - l.off
		l.off = off
		item, ok := p.item(l.col)
		if !ok {
			return nil, false
		}
		p.push(item)
	}
	seq.content = p.collect(base)
	return seq, true
}

// item reads a sequence item or mapping value that starts on the current
// line at its offset: a nested mapping or sequence, or a one-line value.
func (p *fastParser) item(col int) (*node, bool) {
	l := p.cur()
	s := l.text[l.off:]
	if isDash(s) {
		return p.sequence(col)
	}
	if _, _, isKey := p.key(l); isKey {
		return p.mapping(col)
	}
	n, ok := p.lineValue(l)
	if !ok {
		return nil, false
	}
	p.i++
	return n, p.noContinuation(col)
}

// noContinuation refuses a value that goes on over the next lines.
func (p *fastParser) noContinuation(col int) bool {
	return p.i == len(p.lines) || p.lines[p.i].col <= col
}

func (p *fastParser) mapping(col int) (*node, bool) {
	l := p.cur()
	m := p.node(mapNode, l.num, col)
	base := len(p.stack)
	for p.i < len(p.lines) {
		l = p.cur()
		if l.col < col {
			break
		}
		if l.col > col || isDash(l.text[l.off:]) {
			return nil, false
		}
		k, after, isKey := p.key(l)
		if !isKey {
			return nil, false
		}
		p.push(k)
		// The value: on this line after ": ", or a block on the next lines.
		rest := l.text[after:]
		trimmed := strings.TrimLeft(rest, " ")
		if trimmed == "" || trimmed[0] == '#' {
			p.i++
			if p.i == len(p.lines) {
				return nil, false // an empty value: leave it to the decoder
			}
			next := p.cur()
			switch {
			case next.col > col:
				v, ok := p.block(next.col)
				if !ok {
					return nil, false
				}
				p.push(v)
			case next.col == col && isDash(next.text[next.off:]):
				v, ok := p.sequence(col)
				if !ok {
					return nil, false
				}
				p.push(v)
			default:
				return nil, false
			}
			continue
		}
		l.off = after + len(rest) - len(trimmed)
		l.col = l.column(l.off)
		v, ok := p.lineValue(l)
		if !ok {
			return nil, false
		}
		p.push(v)
		p.i++
		if !p.noContinuation(col) {
			return nil, false
		}
	}
	m.content = p.collect(base)
	return m, true
}

// column is the 1-based character column of byte offset off.
func (l *fastLine) column(off int) int {
	if l.ascii {
		return off + 1
	}
	return utf8.RuneCountInString(l.text[:off]) + 1
}

// maxKey is the longest key the quick reader takes: YAML allows a simple
// key of at most 1024 characters, and the reader leaves the edge to the
// decoder.
const maxKey = 1000

// key reads "key:" at the line's offset; after is the byte offset just past
// the colon.
func (p *fastParser) key(l *fastLine) (k *node, after int, ok bool) {
	s := l.text[l.off:]
	if s == "" {
		return nil, 0, false
	}
	switch s[0] {
	case '"', '\'':
		v, n, ok := quoted(s)
		if !ok || n >= len(s) || s[n] != ':' || (n+1 < len(s) && s[n+1] != ' ') || n > maxKey {
			return nil, 0, false
		}
		return p.scalar(v, true, l.num, l.col), l.off + n + 1, true
	}
	if !plainStart(s, false) {
		return nil, 0, false
	}
	for i := 0; i < len(s); i++ {
		switch {
		case s[i] == '#' && i > 0 && s[i-1] == ' ':
			return nil, 0, false
		case i > maxKey:
			return nil, 0, false
		case s[i] == ':' && (i+1 == len(s) || s[i+1] == ' '):
			name := strings.TrimRight(s[:i], " ")
			if name == "" || strings.ContainsAny(name, "\"'[]{},") {
				return nil, 0, false
			}
			return p.scalar(name, false, l.num, l.col), l.off + i + 1, true
		}
	}
	return nil, 0, false
}

// lineValue reads a value that must end on its line: a flow collection, a
// quoted or a plain scalar, then at most a comment.
func (p *fastParser) lineValue(l *fastLine) (*node, bool) {
	s := l.text[l.off:]
	var n *node
	var used int
	switch s[0] {
	case '[', '{':
		f := &flow{p: p, l: l, s: l.text, i: l.off, line: l.num}
		v, ok := f.node()
		if !ok {
			return nil, false
		}
		n, used = v, f.i-l.off
	case '"', '\'':
		v, w, ok := quoted(s)
		if !ok {
			return nil, false
		}
		n = p.scalar(v, true, l.num, l.col)
		used = w
	default:
		if !plainStart(s, false) {
			return nil, false
		}
		end := len(s)
		if i := strings.Index(s, " #"); i >= 0 {
			end = i
		}
		v := strings.TrimRight(s[:end], " ")
		if strings.Contains(v, ": ") || strings.HasSuffix(v, ":") {
			return nil, false
		}
		return p.scalar(v, false, l.num, l.col), true
	}
	rest := strings.TrimLeft(s[used:], " ")
	if rest != "" && (rest[0] != '#' || used == len(s) || s[used] != ' ') {
		return nil, false
	}
	return n, true
}

// plainStart reports whether s may begin a plain scalar: not with an
// indicator, except "-", "?" and ":" before a character that is not a
// space (and, in a flow, not a flow indicator).
func plainStart(s string, inFlow bool) bool {
	if s == "" {
		return false
	}
	switch s[0] {
	case ',', '[', ']', '{', '}', '#', '&', '*', '!', '|', '>', '\'', '"', '%', '@', '`':
		return false
	case '-', '?', ':':
		if len(s) == 1 || s[1] == ' ' {
			return false
		}
		if inFlow && strings.ContainsRune(",[]{}", rune(s[1])) {
			return false
		}
		// "-" and "?" starting a plain scalar are valid, but keep to the
		// plain cases: a number or a word.
		return s[0] == '-'
	}
	return true
}

// plainTag resolves the tags that matter here, as the decoder does: null,
// and integers. Any other plain scalar that the decoder might read as
// something else (a bool, a float, a date) is still text to the schema
// check, which reads every scalar's value as written.
func plainTag(v string) (null, integer bool) {
	switch v {
	case "", "~", "null", "Null", "NULL":
		return true, false
	}
	// As the decoder reads integers: a plain scalar that begins with a
	// digit or a sign and parses, underscores dropped, in Go's base-prefix
	// syntax ("030" octal, "0x1F", "0b101"), as a signed or unsigned 64-bit
	// integer ("08" and numbers too large are not).
	if c := v[0]; c != '+' && c != '-' && (c < '0' || c > '9') {
		return false, false
	}
	plain := strings.ReplaceAll(v, "_", "")
	if _, err := strconv.ParseInt(plain, 0, 64); err == nil {
		return false, true
	}
	_, err := strconv.ParseUint(plain, 0, 64)
	return false, err == nil
}

// quoted reads a quoted scalar at the start of s, returning its value and
// the bytes it used. Escapes other than \" \\ \n \t and \uXXXX, and
// quotes left open at the end of the line, make it give up (yaml.v3, which
// then reads the file, rejects some escapes of YAML 1.2 such as \/).
func quoted(s string) (string, int, bool) {
	q := s[0]
	// Most values have no escape: the value is the text between the quotes.
	if end := strings.IndexByte(s[1:], q); end >= 0 && !strings.ContainsRune(s[1:1+end], '\\') {
		if q == '"' || end+2 >= len(s) || s[end+2] != '\'' {
			return s[1 : 1+end], end + 2, true
		}
	}
	var b strings.Builder
	for i := 1; i < len(s); i++ {
		c := s[i]
		switch {
		case c == q && q == '\'':
			if i+1 < len(s) && s[i+1] == '\'' {
				b.WriteByte('\'')
				i++
				continue
			}
			return b.String(), i + 1, true
		case c == q:
			return b.String(), i + 1, true
		case c == '\\' && q == '"':
			if i+1 >= len(s) {
				return "", 0, false
			}
			i++
			switch s[i] {
			case '"', '\\':
				b.WriteByte(s[i])
			case 'n':
				b.WriteByte('\n')
			case 't':
				b.WriteByte('\t')
			case 'u':
				if i+4 >= len(s) {
					return "", 0, false
				}
				var r rune
				for _, h := range s[i+1 : i+5] {
					switch {
					case h >= '0' && h <= '9':
						r = r*16 + h - '0'
					case h >= 'a' && h <= 'f':
						r = r*16 + h - 'a' + 10
					case h >= 'A' && h <= 'F':
						r = r*16 + h - 'A' + 10
					default:
						return "", 0, false
					}
				}
				if r >= 0xD800 && r <= 0xDFFF {
					return "", 0, false
				}
				b.WriteRune(r)
				i += 4
			default:
				return "", 0, false
			}
		default:
			b.WriteByte(c)
		}
	}
	return "", 0, false
}

// flow reads a one-line flow collection.
type flow struct {
	p     *fastParser
	l     *fastLine
	s     string
	i     int
	line  int
	depth int
}

func (f *flow) space() {
	for f.i < len(f.s) && f.s[f.i] == ' ' {
		f.i++
	}
}

func (f *flow) node() (*node, bool) {
	f.space()
	if f.i >= len(f.s) {
		return nil, false
	}
	col := f.l.column(f.i)
	switch c := f.s[f.i]; c {
	case '[', '{':
		if f.depth++; f.depth > 8 {
			return nil, false
		}
		defer func() { f.depth-- }()
		kind, end := seqNode, byte(']')
		if c == '{' {
			kind, end = mapNode, '}'
		}
		n := f.p.node(kind, f.line, col)
		base := len(f.p.stack)
		f.i++
		f.space()
		if f.i < len(f.s) && f.s[f.i] == end {
			f.i++
			return n, true
		}
		for {
			start := f.i
			item, ok := f.node()
			if !ok {
				return nil, false
			}
			f.space()
			if kind == mapNode {
				if item.kind != scalarNode || f.i-start > maxKey || f.i >= len(f.s) || f.s[f.i] != ':' {
					return nil, false
				}
				f.i++
				if f.i < len(f.s) && f.s[f.i] != ' ' {
					return nil, false
				}
				v, ok := f.node()
				if !ok {
					return nil, false
				}
				f.p.push(item, v)
				f.space()
			} else {
				if f.i < len(f.s) && f.s[f.i] == ':' {
					return nil, false // a one-pair mapping inside a list
				}
				f.p.push(item)
			}
			if f.i >= len(f.s) {
				return nil, false
			}
			switch f.s[f.i] {
			case ',':
				f.i++
				f.space()
				if f.i < len(f.s) && f.s[f.i] == end {
					return nil, false // a trailing comma: leave it to the decoder
				}
			case end:
				f.i++
				n.content = f.p.collect(base)
				return n, true
			default:
				return nil, false
			}
		}
	case '"', '\'':
		v, w, ok := quoted(f.s[f.i:])
		if !ok {
			return nil, false
		}
		f.i += w
		return f.p.scalar(v, true, f.line, col), true
	default:
		rest := f.s[f.i:]
		if !plainStart(rest, true) {
			return nil, false
		}
		end := len(rest)
		for j := 0; j < len(rest); j++ {
			c := rest[j]
			// The decoder ends a plain scalar in a flow at , ? [ ] { }
			// and at ": "; a colon elsewhere is left to the decoder.
			if c == ',' || c == ']' || c == '}' || c == '[' || c == '{' || c == '?' || c == ':' ||
				(c == '#' && j > 0 && rest[j-1] == ' ') {
				end = j
				break
			}
		}
		if end < len(rest) {
			switch c := rest[end]; {
			case c == '[', c == '{', c == '#', c == '?':
				return nil, false
			case c == ':' && end+1 < len(rest) && rest[end+1] != ' ':
				return nil, false
			}
		}
		v := strings.TrimRight(rest[:end], " ")
		if v == "" {
			return nil, false
		}
		f.i += end
		return f.p.scalar(v, false, f.line, col), true
	}
}
