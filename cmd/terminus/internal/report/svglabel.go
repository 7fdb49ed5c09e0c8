package report

import (
	"strings"
	"unicode/utf8"
)

// Text in the picture: its width estimated from the advance widths of
// DejaVu Sans, the widest of the common sans-serif faces (a browser that
// draws with Arial, Helvetica or Liberation Sans draws narrower), so that
// labels placed apart on the estimate stay apart when drawn.

// advance is the width of r in ems.
func advance(r rune) float64 {
	switch {
	case r >= '0' && r <= '9':
		return 0.636
	case r == ' ':
		return 0.318
	case r == 'i' || r == 'j' || r == 'l' || r == '.' || r == ',' || r == ':' || r == ';' || r == '\'' || r == '|' || r == '!':
		return 0.34
	case r == 'f' || r == 't' || r == 'r' || r == '-' || r == '(' || r == ')' || r == '[' || r == ']' || r == '/':
		return 0.43
	case r == 'm' || r == 'w':
		return 0.98
	case r == 'M' || r == 'W':
		return 1.0
	case r >= 'a' && r <= 'z':
		return 0.64
	case r >= 'A' && r <= 'Z':
		return 0.78
	case r == '…' || r == '—':
		return 1.0
	case r == '→' || r == '←':
		return 0.84
	case r < 0x80:
		return 0.7
	}
	return 0.9 // accented letters, other scripts: generously
}

// textWidth estimates the width of s drawn at size px, bold or not.
func textWidth(s string, size float64, bold bool) float64 {
	w := 0.0
	for _, r := range s {
		w += advance(r)
	}
	if bold {
		w *= 1.08
	}
	return w * size * 1.03
}

// shorten cuts s to fit width (at size px) with "…" at the end; short
// enough text is returned whole.
func shorten(s string, width, size float64, bold bool) string {
	if textWidth(s, size, bold) <= width {
		return s
	}
	ell := textWidth("…", size, bold)
	var b strings.Builder
	w := 0.0
	for _, r := range s {
		a := advance(r) * size * 1.03
		if bold {
			a *= 1.08
		}
		if w+a+ell > width {
			break
		}
		b.WriteRune(r)
		w += a
	}
	return strings.TrimRight(b.String(), " ,;:") + "…"
}

// wrapText breaks s into at most maxLines lines of at most width; the
// last line is shortened with "…" when the text does not fit. The second
// result tells whether anything was cut.
func wrapText(s string, width, size float64, bold bool, maxLines int) ([]string, bool) {
	var lines []string
	cur := ""
	for _, w := range strings.Fields(s) {
		switch {
		case cur == "":
			cur = w
		case textWidth(cur+" "+w, size, bold) <= width:
			cur += " " + w
		default:
			lines = append(lines, cur)
			cur = w
		}
	}
	if cur != "" {
		lines = append(lines, cur)
	}
	if len(lines) > maxLines {
		lines = append(lines[:maxLines-1], strings.Join(lines[maxLines-1:], " "))
	}
	cut := false
	for i, l := range lines {
		if textWidth(l, size, bold) > width {
			lines[i], cut = shorten(l, width, size, bold), true
		}
	}
	return lines, cut
}

// shortID cuts an evidence id for a label; the tooltip has it whole.
func shortID(id string) string {
	const most = 24
	if utf8.RuneCountInString(id) <= most {
		return id
	}
	r := []rune(id)
	return string(r[:most-1]) + "…"
}

// rowGap is the space kept between two labels on one row.
const rowGap = 6

// placer puts labels on the rows of a lane so that no two overlap and
// none leaves [min, max]: row 0 is the lane's own line, beside its bar;
// further rows are added below it as needed.
type placer struct {
	min, max float64
	rows     [][][2]float64 // per row, the x extents taken
}

// place finds a spot for a label of width w: the first of the beside
// candidates (left edges) that fits whole on row 0, beside the marks,
// else the first row below where one of the below candidates, pulled
// inside the drawing, is free. It returns the left edge and the row.
func (p *placer) place(w float64, beside, below []float64) (float64, int) {
	if w > p.max-p.min {
		w = p.max - p.min
	}
	for row := 0; ; row++ {
		for len(p.rows) <= row {
			p.rows = append(p.rows, nil)
		}
		candidates := beside
		if row > 0 {
			candidates = below
		}
		for _, x := range candidates {
			if row > 0 {
				x = min(max(x, p.min), p.max-w)
			}
			if x < p.min || x+w > p.max || !p.free(row, x, x+w) {
				continue
			}
			p.rows[row] = append(p.rows[row], [2]float64{x, x + w})
			return x, row
		}
	}
}

func (p *placer) free(row int, x0, x1 float64) bool {
	for _, e := range p.rows[row] {
		if x0 < e[1]+rowGap && e[0] < x1+rowGap {
			return false
		}
	}
	return true
}

// extraRows is the number of rows used below the lane's own line.
func (p *placer) extraRows() int {
	n := 0
	for i, r := range p.rows {
		if len(r) > 0 {
			n = i
		}
	}
	return n
}
