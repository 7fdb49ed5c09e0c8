package report

import (
	"fmt"
	"html"
	"io"
	"strings"

	"terminus/constraint"
	"terminus/constraint/date"
	"terminus/constraint/wording"
)

// The timeline picture: a row per event with a lane per tier (a bar over
// the days the event can fall on, hard palest, soft darkest; an open end
// runs to the edge of the drawing and ends in an arrow), a lane for the
// claims on the event (a bracket over each claimed date, coloured and
// named by its verdict, wherever it falls), and a year axis under all of
// them. The axis spans every finite bound, claim and record, so that
// nothing collapses onto a point and nothing falls off the edge. Each
// bound is labelled with the evidence that sets it, with the whole chain
// in a tooltip; a tier whose evidence conflicts is drawn as a marked lane
// with the bounds that clash. Labels are placed so that none overlaps
// another or leaves the drawing (the browser test measures it).

const (
	picWidth  = 760.0
	plotLeft  = 64.0  // the tier names stand right-aligned left of it
	plotRight = 748.0 // the drawing's right margin
	arrowRoom = 16.0  // kept at either end for the arrows of open ends
	laneH     = 18.0  // a lane's own line
	rowH      = 14.0  // each further row of labels in a lane
	barH      = 10.0
	fontSize  = 11.0
	headSize  = 12.0
)

var tierFill = [3]string{"#c9d7e8", "#7fa1c8", "#2f5d8f"}

var verdictColour = map[constraint.Verdict]string{
	constraint.Consistent:   "#2e7d32",
	constraint.Doubtful:     "#8a6d00",
	constraint.Improbable:   "#c05000",
	constraint.Excluded:     "#b22222",
	constraint.Undetermined: "#555555",
}

const conflictColour = "#b22222"

// SVG writes the timeline picture of r alone.
func SVG(w io.Writer, r *constraint.Result) error {
	ew := &errWriter{w: w}
	io.WriteString(ew, picture(r))
	return ew.err
}

// claimSpan is a claim and the days it covers.
type claimSpan struct {
	claim constraint.ClaimResult
	span  constraint.Span
	ok    bool // false: the date could not be read back (never expected)
}

func claimSpans(r *constraint.Result) []claimSpan {
	out := make([]claimSpan, 0, len(r.Claims))
	for _, c := range r.Claims {
		cs := claimSpan{claim: c}
		if d, err := date.Parse(c.Date); err == nil {
			first, okF := d.Earliest()
			last, okL := d.Latest()
			cs.span = constraint.Span{First: first, Last: last, OpenStart: !okF, OpenEnd: !okL}
			cs.ok = okF || okL
		}
		out = append(out, cs)
	}
	return out
}

// conflictMark is a bound that takes part in a conflict at a tier: the
// bound of one piece of evidence on one event, at its tightest among the
// tiers in force.
type conflictMark struct {
	event    string
	tier     int
	day      date.Day
	upper    bool
	evidence string
}

// conflictMarks lists, for each event and each tier where the evidence
// first conflicts, the dated bounds of the evidence in those conflicts.
func conflictMarks(r *constraint.Result) []conflictMark {
	var out []conflictMark
	for _, c := range r.Conflicts {
		t := int(c.Tier)
		for _, id := range c.Evidence {
			for _, ev := range r.Evidence {
				if ev.ID != id || ev.Kind == "order" {
					continue
				}
				for _, side := range []bool{false, true} {
					if day, ok := tightest(ev, t, side); ok {
						out = append(out, conflictMark{event: ev.Event, tier: t, day: day, upper: side, evidence: id})
					}
				}
			}
		}
	}
	return out
}

// tightest is the bound one piece of evidence puts on one side of its
// event at tier t: for each of its materials the tightest bound of the
// tiers up to t, and of those, since the finding is one of them, the
// loosest.
func tightest(ev constraint.Evidence, t int, upper bool) (date.Day, bool) {
	per := map[string]date.Day{}
	var order []string
	for _, b := range ev.Bounds {
		if int(b.Tier) > t || (b.Side == "not after") != upper || b.Side != "not before" && b.Side != "not after" {
			continue
		}
		d, seen := per[b.Material]
		if !seen {
			order = append(order, b.Material)
			per[b.Material] = b.Day
			continue
		}
		if upper && b.Day < d || !upper && b.Day > d {
			per[b.Material] = b.Day
		}
	}
	if len(order) == 0 {
		return 0, false
	}
	best := per[order[0]]
	for _, m := range order[1:] {
		if d := per[m]; upper && d > best || !upper && d < best {
			best = d
		}
	}
	return best, true
}

// svgText is a text element: escaped, with an optional class and tooltip.
type canvas struct {
	b strings.Builder
}

func (c *canvas) printf(format string, args ...any) { fmt.Fprintf(&c.b, format, args...) }

func esc(s string) string { return html.EscapeString(s) }

// label writes a text label at x (left edge) and baseline y, with the
// full text in a tooltip when it was cut.
func (c *canvas) label(x, y float64, text, full, fill, class string) {
	c.text(x, y, text, full, fill, class, "")
}

// text is label with further attributes.
func (c *canvas) text(x, y float64, text, full, fill, class, attrs string) {
	c.printf(`<text class="%s" x="%.1f" y="%.1f" fill="%s"%s>`, class, x, y, fill, attrs)
	if full != "" && full != text {
		c.printf(`<title>%s</title>`, esc(full))
	}
	c.printf("%s</text>\n", esc(text))
}

// picture draws r.
func picture(r *constraint.Result) string {
	claims := claimSpans(r)
	marks := conflictMarks(r)
	ext := pictureExtent(r, claims, marks)
	var sc yearScale
	var tk []tick
	if ext.any {
		lo, hi := axisRange(ext)
		sc = yearScale{lo: lo, hi: hi, x0: plotLeft + arrowRoom, x1: plotRight - arrowRoom}
		tk = ticks(lo, hi)
	}

	var body canvas
	y := 8.0
	title := r.Title
	if title == "" {
		title = "untitled case"
	}
	lines, _ := wrapText("Dating windows: "+title, plotRight-8, headSize, true, 2)
	for _, l := range lines {
		y += 15
		body.text(8, y, l, "Dating windows: "+title, "#111", "label title", ` font-weight="bold" font-size="12"`)
	}
	y += 8
	plotTop := y
	if !ext.any {
		y += 16
		body.label(plotLeft, y, "No window, claim or record has a finite bound: every window is open.", "", "#333", "label")
		y += 8
	}
	for i, e := range r.Events {
		if i > 0 {
			body.printf(`<line x1="8" y1="%.1f" x2="%.1f" y2="%.1f" stroke="#d0d0d0"/>`+"\n", y+3, plotRight, y+3)
			y += 6
		}
		y = drawEvent(&body, r, e, claims, marks, sc, ext.any, y)
	}
	plotBottom := y + 4

	var out canvas
	height := plotBottom + 50
	out.printf(`<svg xmlns="http://www.w3.org/2000/svg" class="terminus-timeline" width="%.0f" height="%.0f" viewBox="0 0 %.0f %.0f" font-family="DejaVu Sans, Verdana, Arial, sans-serif" font-size="%.0f" role="img" aria-labelledby="tl-title tl-desc">`+"\n",
		picWidth, height, picWidth, height, fontSize)
	out.printf(`<title id="tl-title">%s</title>`+"\n", esc("Dating windows: "+title))
	out.printf(`<desc id="tl-desc">%s</desc>`+"\n", esc(pictureText(r)))
	out.printf(`<defs><pattern id="tl-hatch" width="6" height="6" patternUnits="userSpaceOnUse" patternTransform="rotate(45)"><rect width="6" height="6" fill="#fdecea"/><line x1="0" y1="0" x2="0" y2="6" stroke="%s" stroke-width="1.5" stroke-opacity="0.45"/></pattern></defs>`+"\n", conflictColour)
	out.printf(`<rect width="100%%" height="100%%" fill="#ffffff"/>` + "\n")
	// The grid behind everything, then the rows, then the axis.
	for _, t := range tk {
		x := sc.x(t.year)
		out.printf(`<line x1="%.1f" y1="%.1f" x2="%.1f" y2="%.1f" stroke="#e8e8e8"/>`+"\n", x, plotTop, x, plotBottom)
	}
	out.b.WriteString(body.b.String())
	ay := plotBottom
	out.printf(`<line x1="%.1f" y1="%.1f" x2="%.1f" y2="%.1f" stroke="#333"/>`+"\n", plotLeft, ay, plotRight, ay)
	lastEnd := -1e9
	for _, t := range tk {
		x := sc.x(t.year)
		w := textWidth(t.label, fontSize, false)
		if x-w/2 < lastEnd+rowGap || x-w/2 < 0 || x+w/2 > picWidth {
			continue // never expected with at most nine ticks; never overlapping
		}
		lastEnd = x + w/2
		out.printf(`<line x1="%.1f" y1="%.1f" x2="%.1f" y2="%.1f" stroke="#333"/>`+"\n", x, ay, x, ay+4)
		out.printf(`<text class="label tick" x="%.1f" y="%.1f" text-anchor="middle" fill="#333">%s</text>`+"\n", x, ay+16, esc(t.label))
	}
	writeLegend(&out, ay+38)
	out.printf("</svg>\n")
	return out.b.String()
}

// writeLegend explains the marks in one line.
func writeLegend(c *canvas, y float64) {
	x := 8.0
	for t := range 3 {
		c.printf(`<rect x="%.1f" y="%.1f" width="14" height="%.0f" fill="%s"/>`, x, y-9, barH, tierFill[t])
		c.label(x+18, y, wording.Tier(t), "", "#111", "label legend")
		x += 18 + textWidth(wording.Tier(t), fontSize, false) + 12
	}
	c.printf(`<path d="M%.1f %.1f h14 l6 5 l-6 5 h-14 z" fill="%s"/>`, x, y-9, tierFill[0])
	c.label(x+24, y, "open end", "", "#111", "label legend")
	x += 24 + textWidth("open end", fontSize, false) + 12
	c.printf(`<rect x="%.1f" y="%.1f" width="14" height="%.0f" fill="url(#tl-hatch)" stroke="%s" stroke-dasharray="3 2"/>`, x, y-9, barH, conflictColour)
	c.label(x+18, y, "conflict", "", "#111", "label legend")
	x += 18 + textWidth("conflict", fontSize, false) + 12
	c.printf(`<path d="M%.1f %.1f v6 h14 v-6" fill="none" stroke="#333" stroke-width="2"/>`, x, y-8)
	c.label(x+18, y, "claim, named with its verdict", "", "#111", "label legend")
	c.printf("\n")
}

// pictureText is the picture in words, for readers who cannot see it.
func pictureText(r *constraint.Result) string {
	var parts []string
	for _, e := range r.Events {
		name := e.ID
		if e.Label != "" {
			name += " (" + e.Label + ")"
		}
		var tiers []string
		for t, w := range e.Windows {
			if w == nil {
				tiers = append(tiers, wording.Tier(t)+": no window, the evidence conflicts")
				continue
			}
			tiers = append(tiers, wording.Tier(t)+" "+windowText(w))
		}
		parts = append(parts, name+": "+strings.Join(tiers, "; ")+".")
	}
	for _, c := range r.Claims {
		parts = append(parts, fmt.Sprintf("Claim %s, %s %s: %s.", c.ID, c.Event, c.DateText, c.Verdict))
	}
	return strings.Join(parts, " ")
}
