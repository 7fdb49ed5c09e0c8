package report

import (
	"fmt"
	"html"
	"io"
	"math"
	"strings"

	"terminus/constraint"
	"terminus/constraint/date"
	"terminus/constraint/wording"
)

// The timeline: one row per event, a bar per tier (hard palest and widest,
// soft darkest and narrowest, since soft ⊆ firm ⊆ hard), claims as
// brackets coloured by verdict, and a year axis. Open ends run to the
// edge of the picture and end in an arrow.

const (
	svgWidth   = 760
	svgLeft    = 150
	svgRight   = 20
	svgRowH    = 54
	svgTop     = 30
	svgAxisGap = 34
)

var tierFill = [3]string{"#c9d7e8", "#7fa1c8", "#2f5d8f"}

var verdictColour = map[constraint.Verdict]string{
	constraint.Consistent:   "#2e7d32",
	constraint.Doubtful:     "#b8860b",
	constraint.Improbable:   "#d2691e",
	constraint.Excluded:     "#b22222",
	constraint.Undetermined: "#555555",
}

// fracYear turns a day into a year with a fraction, for the axis.
func fracYear(d date.Day) float64 {
	y, _, _ := d.Civil()
	start := date.Gregorian(y, 1, 1)
	length := float64(date.Gregorian(y+1, 1, 1) - start)
	return float64(y) + float64(d-start)/length
}

// axisRange finds the years the picture spans: every bounded end of every
// window and claim, padded.
func axisRange(r *constraint.Result) (lo, hi float64, ok bool) {
	lo, hi = math.Inf(1), math.Inf(-1)
	see := func(d date.Day) {
		y := fracYear(d)
		lo, hi = math.Min(lo, y), math.Max(hi, y)
	}
	for _, e := range r.Events {
		for _, w := range e.Windows {
			if w == nil {
				continue
			}
			for _, s := range w.Intervals {
				if !s.OpenStart {
					see(s.First)
				}
				if !s.OpenEnd {
					see(s.Last + 1)
				}
			}
		}
	}
	for _, c := range r.Claims {
		for _, s := range c.Surviving {
			for _, sp := range s {
				if !sp.OpenStart {
					see(sp.First)
				}
				if !sp.OpenEnd {
					see(sp.Last + 1)
				}
			}
		}
	}
	if math.IsInf(lo, 1) {
		return 0, 0, false
	}
	span := hi - lo
	if span < 10 {
		span = 10
	}
	return lo - span*0.08, hi + span*0.08, true
}

// niceStep picks a tick spacing of 1, 2 or 5 times a power of ten giving
// about six ticks.
func niceStep(span float64) float64 {
	raw := span / 6
	p := math.Pow(10, math.Floor(math.Log10(raw)))
	for _, m := range []float64{1, 2, 5, 10} {
		if raw <= m*p {
			return m * p
		}
	}
	return 10 * p
}

func yearLabel(y float64) string {
	n := int64(math.Round(y))
	if n < 1 {
		return fmt.Sprintf("%d BCE", 1-n)
	}
	return fmt.Sprintf("%d", n)
}

// SVG writes the timeline picture of r alone.
func SVG(w io.Writer, r *constraint.Result) error {
	ew := &errWriter{w: w}
	writeSVG(ew, r)
	return ew.err
}

func writeSVG(w io.Writer, r *constraint.Result) {
	rows := len(r.Events)
	height := svgTop + rows*svgRowH + svgAxisGap + 30
	fmt.Fprintf(w, `<svg xmlns="http://www.w3.org/2000/svg" width="%d" height="%d" viewBox="0 0 %d %d" font-family="sans-serif" font-size="12" role="img" aria-label="timeline of the dating windows">`+"\n", svgWidth, height, svgWidth, height)
	fmt.Fprintf(w, `<title>%s</title>`+"\n", html.EscapeString("Dating windows: "+r.Title))
	fmt.Fprintln(w, `<rect width="100%" height="100%" fill="#ffffff"/>`)
	lo, hi, ok := axisRange(r)
	if !ok {
		fmt.Fprintf(w, `<text x="%d" y="%d">No event has a bounded window.</text>`+"\n</svg>\n", svgLeft, svgTop+20)
		return
	}
	plotW := float64(svgWidth - svgLeft - svgRight)
	x := func(y float64) float64 { return float64(svgLeft) + (y-lo)/(hi-lo)*plotW }
	axisY := svgTop + rows*svgRowH + 8
	// Ticks and grid.
	step := niceStep(hi - lo)
	for t := math.Ceil(lo/step) * step; t <= hi; t += step {
		xx := x(t)
		fmt.Fprintf(w, `<line x1="%.1f" y1="%d" x2="%.1f" y2="%d" stroke="#e5e5e5"/>`+"\n", xx, svgTop-8, xx, axisY)
		fmt.Fprintf(w, `<text x="%.1f" y="%d" text-anchor="middle" fill="#333">%s</text>`+"\n", xx, axisY+16, yearLabel(t))
	}
	fmt.Fprintf(w, `<line x1="%d" y1="%d" x2="%d" y2="%d" stroke="#333"/>`+"\n", svgLeft, axisY, svgWidth-svgRight, axisY)
	for i, e := range r.Events {
		top := svgTop + i*svgRowH
		label := e.ID
		if e.Label != "" {
			label = e.Label
		}
		if len(label) > 22 {
			label = label[:21] + "…"
		}
		fmt.Fprintf(w, `<text x="8" y="%d" fill="#111">%s</text>`+"\n", top+22, html.EscapeString(label))
		for t, win := range e.Windows {
			barY := top + 4 + t*10
			barH := 30 - t*10
			if win == nil {
				fmt.Fprintf(w, `<text x="%d" y="%d" fill="#b22222" font-size="10">%s: conflict</text>`+"\n", svgLeft+4, top+12+t*12, wording.Tier(t))
				continue
			}
			for _, s := range win.Intervals {
				x1, x2 := float64(svgLeft), float64(svgWidth-svgRight)
				if !s.OpenStart {
					x1 = x(fracYear(s.First))
				}
				if !s.OpenEnd {
					x2 = x(fracYear(s.Last + 1))
				}
				if x2-x1 < 1.5 {
					x2 = x1 + 1.5
				}
				fmt.Fprintf(w, `<rect x="%.1f" y="%d" width="%.1f" height="%d" fill="%s"><title>%s %s: %s</title></rect>`+"\n",
					x1, barY, x2-x1, barH, tierFill[t], html.EscapeString(e.ID), wording.Tier(t), html.EscapeString(spanText(s)))
				if s.OpenEnd {
					fmt.Fprintf(w, `<path d="M%.1f %d l8 %d l-8 %d z" fill="%s"/>`+"\n", x2-8, barY, barH/2, barH/2, tierFill[t])
				}
				if s.OpenStart {
					fmt.Fprintf(w, `<path d="M%.1f %d l-8 %d l8 %d z" fill="%s"/>`+"\n", x1+8, barY, barH/2, barH/2, tierFill[t])
				}
			}
		}
		// Claims on this event: a bracket below the bars.
		for _, c := range r.Claims {
			if c.Event != e.ID {
				continue
			}
			cd, err := date.Parse(c.Date)
			if err != nil {
				continue
			}
			first, okF := cd.Earliest()
			last, okL := cd.Latest()
			if !okF || !okL {
				continue
			}
			x1, x2 := x(fracYear(first)), x(fracYear(last+1))
			if x2-x1 < 3 {
				x2 = x1 + 3
			}
			cy := top + 40
			col := verdictColour[c.Verdict]
			fmt.Fprintf(w, `<path d="M%.1f %d v6 H%.1f v-6" fill="none" stroke="%s" stroke-width="2"><title>%s</title></path>`+"\n",
				x1, cy, x2, col, html.EscapeString(fmt.Sprintf("claim %s %s: %s", c.ID, c.DateText, c.Verdict)))
			fmt.Fprintf(w, `<text x="%.1f" y="%d" fill="%s" font-size="10">%s</text>`+"\n", x2+4, cy+8, col, html.EscapeString(c.ID+": "+string(c.Verdict)))
		}
	}
	// Legend.
	ly := axisY + 30
	lx := svgLeft
	for t := range 3 {
		fmt.Fprintf(w, `<rect x="%d" y="%d" width="14" height="10" fill="%s"/><text x="%d" y="%d">%s</text>`+"\n", lx, ly-9, tierFill[t], lx+18, ly, wording.Tier(t))
		lx += 70
	}
	fmt.Fprintf(w, `<text x="%d" y="%d" fill="#555">bars: where the event can fall; brackets: claims</text>`+"\n", lx+10, ly)
	fmt.Fprintln(w, "</svg>")
}

// HTML writes a self-contained page: the timeline, then the Markdown
// report's content as HTML.
func HTML(w io.Writer, r *constraint.Result) error {
	ew := &errWriter{w: w}
	var md strings.Builder
	if err := Markdown(&md, r); err != nil {
		return err
	}
	fmt.Fprintln(ew, "<!DOCTYPE html>")
	fmt.Fprintln(ew, `<html lang="en"><head><meta charset="utf-8">`)
	fmt.Fprintf(ew, "<title>%s</title>\n", html.EscapeString("Dating from materials: "+r.Title))
	fmt.Fprintln(ew, `<style>body{font-family:sans-serif;max-width:60em;margin:2em auto;padding:0 1em;line-height:1.45;color:#111}
table{border-collapse:collapse;margin:1em 0;font-size:.9em}td,th{border:1px solid #bbb;padding:.25em .5em;text-align:left;vertical-align:top}
th{background:#f0f0f0}.caution{background:#fff8e1;border-left:4px solid #b8860b;padding:.5em 1em}</style></head><body>`)
	body := markdownToHTML(md.String())
	// The timeline goes after the summary heading's section title.
	if i := strings.Index(body, "<h3>Windows</h3>"); i >= 0 {
		var pic strings.Builder
		writeSVG(&pic, r)
		body = body[:i] + "<h3>Timeline</h3>\n" + pic.String() + body[i:]
	}
	fmt.Fprint(ew, body)
	fmt.Fprintln(ew, "</body></html>")
	return ew.err
}

// markdownToHTML converts the small Markdown subset the report writer
// produces (headings, paragraphs, bold, code, tables, lists) to HTML.
func markdownToHTML(md string) string {
	var b strings.Builder
	lines := strings.Split(md, "\n")
	inList, inTable, inCautions := false, false, false
	closeBlocks := func() {
		if inList {
			b.WriteString("</ul>\n")
			if inCautions {
				b.WriteString("</div>\n")
				inCautions = false
			}
			inList = false
		}
		if inTable {
			b.WriteString("</table>\n")
			inTable = false
		}
	}
	for i := 0; i < len(lines); i++ {
		line := lines[i]
		switch {
		case strings.HasPrefix(line, "## "):
			closeBlocks()
			fmt.Fprintf(&b, "<h2>%s</h2>\n", inline(line[3:]))
		case strings.HasPrefix(line, "### "):
			closeBlocks()
			if line == "### Cautions" {
				inCautions = true
				b.WriteString(`<div class="caution">` + "\n")
			}
			fmt.Fprintf(&b, "<h3>%s</h3>\n", inline(line[4:]))
		case strings.HasPrefix(line, "|"):
			cells := splitRow(line)
			if !inTable {
				closeBlocks()
				inTable = true
				b.WriteString("<table>\n<tr>")
				for _, c := range cells {
					fmt.Fprintf(&b, "<th>%s</th>", inline(c))
				}
				b.WriteString("</tr>\n")
				if i+1 < len(lines) && strings.HasPrefix(lines[i+1], "|---") {
					i++
				}
				continue
			}
			b.WriteString("<tr>")
			for _, c := range cells {
				fmt.Fprintf(&b, "<td>%s</td>", inline(c))
			}
			b.WriteString("</tr>\n")
		case strings.HasPrefix(line, "- ") || strings.HasPrefix(line, "   - "):
			if inTable {
				b.WriteString("</table>\n")
				inTable = false
			}
			if !inList {
				b.WriteString("<ul>\n")
				inList = true
			}
			fmt.Fprintf(&b, "<li>%s</li>\n", inline(strings.TrimLeft(line, " -")))
		case len(line) > 2 && line[0] >= '0' && line[0] <= '9' && strings.Contains(line[:4], ". "):
			if !inList {
				closeBlocks()
				b.WriteString("<ul>\n")
				inList = true
			}
			fmt.Fprintf(&b, "<li>%s</li>\n", inline(line))
		case strings.TrimSpace(line) == "":
			closeBlocks()
		default:
			closeBlocks()
			fmt.Fprintf(&b, "<p>%s</p>\n", inline(line))
		}
	}
	closeBlocks()
	return b.String()
}

func splitRow(line string) []string {
	line = strings.TrimSpace(line)
	line = strings.TrimPrefix(line, "|")
	line = strings.TrimSuffix(line, "|")
	var cells []string
	var cur strings.Builder
	for i := 0; i < len(line); i++ {
		if line[i] == '\\' && i+1 < len(line) {
			cur.WriteByte(line[i])
			cur.WriteByte(line[i+1])
			i++
			continue
		}
		if line[i] == '|' {
			cells = append(cells, strings.TrimSpace(cur.String()))
			cur.Reset()
			continue
		}
		cur.WriteByte(line[i])
	}
	return append(cells, strings.TrimSpace(cur.String()))
}

// inline turns the report's escapes back into text, escapes it for HTML
// and renders **bold**, `code` and <links>.
func inline(s string) string {
	s = strings.NewReplacer(`\|`, "|", `\*`, "\x01", `\_`, "_", "&lt;", "<").Replace(s)
	s = html.EscapeString(s)
	var b strings.Builder
	for {
		i := strings.Index(s, "**")
		if i < 0 {
			break
		}
		j := strings.Index(s[i+2:], "**")
		if j < 0 {
			break
		}
		b.WriteString(s[:i] + "<strong>" + s[i+2:i+2+j] + "</strong>")
		s = s[i+2+j+2:]
	}
	b.WriteString(s)
	s = b.String()
	b.Reset()
	for {
		i := strings.Index(s, "`")
		if i < 0 {
			break
		}
		j := strings.Index(s[i+1:], "`")
		if j < 0 {
			break
		}
		b.WriteString(s[:i] + "<code>" + s[i+1:i+1+j] + "</code>")
		s = s[i+1+j+1:]
	}
	b.WriteString(s)
	s = b.String()
	for {
		i := strings.Index(s, "&lt;http")
		if i < 0 {
			break
		}
		j := strings.Index(s[i:], "&gt;")
		if j < 0 {
			break
		}
		url := s[i+4 : i+j]
		s = s[:i] + `<a href="` + url + `">` + url + "</a>" + s[i+j+4:]
	}
	return strings.ReplaceAll(s, "\x01", "*")
}
