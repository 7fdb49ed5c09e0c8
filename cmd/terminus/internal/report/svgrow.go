package report

import (
	"fmt"
	"strings"

	"terminus/constraint"
	"terminus/constraint/wording"
)

// halo keeps a label readable wherever it falls on a bar.
const halo = ` paint-order="stroke" stroke="#ffffff" stroke-width="3" stroke-linejoin="round"`

// drawEvent draws an event's heading, its three tier lanes and its claims
// from y down, and returns the y below them.
func drawEvent(c *canvas, r *constraint.Result, e constraint.EventResult, claims []claimSpan, marks []conflictMark, sc yearScale, scaled bool, y float64) float64 {
	name := e.ID
	if e.Label != "" {
		name = e.ID + " — " + e.Label
	}
	lines, _ := wrapText(name, plotRight-8, headSize, true, 2)
	for _, l := range lines {
		y += 15
		c.text(8, y, l, name, "#111", "label event", ` font-weight="bold" font-size="12"`)
	}
	y += 3
	for t, w := range e.Windows {
		var lane canvas
		var h float64
		if w == nil {
			h = conflictLane(&lane, r, e, t, marks, sc)
		} else {
			var prev *constraint.Window
			if t > 0 {
				prev = e.Windows[t-1]
			}
			h = windowLane(&lane, e, t, w, prev, sc, scaled)
		}
		c.printf(`<g class="lane" transform="translate(0 %.1f)">`+"\n", y)
		c.text(plotLeft-6, 13, wording.Tier(t), "", "#333", "label tier", ` text-anchor="end"`)
		c.b.WriteString(lane.b.String())
		c.printf("</g>\n")
		y += h
	}
	var mine []claimSpan
	for _, cs := range claims {
		if cs.claim.Event == e.ID {
			mine = append(mine, cs)
		}
	}
	if len(mine) > 0 {
		var lane canvas
		h := claimLane(&lane, mine, sc, scaled)
		c.printf(`<g class="lane claims" transform="translate(0 %.1f)">`+"\n", y)
		c.text(plotLeft-6, 13, "claims", "", "#333", "label tier", ` text-anchor="end"`)
		c.b.WriteString(lane.b.String())
		c.printf("</g>\n")
		y += h
	}
	return y
}

// ends gives the x of a span's ends: an open end at the edge of the plot.
func ends(s constraint.Span, sc yearScale, scaled bool) (x1, x2 float64) {
	x1, x2 = plotLeft+2, plotRight-2
	if scaled && !s.OpenStart {
		x1 = sc.dayX(s.First)
	}
	if scaled && !s.OpenEnd {
		x2 = sc.dayX(s.Last + 1)
	}
	if x2-x1 < 2 {
		x2 = x1 + 2
	}
	return x1, x2
}

// windowLane draws one tier's window: its bars, arrows at open ends, and
// a label at each bound naming the evidence that sets it (left out where
// the bound is the stronger tier's, set by the same evidence). It returns
// the lane's height.
func windowLane(c *canvas, e constraint.EventResult, t int, w, prev *constraint.Window, sc yearScale, scaled bool) float64 {
	p := &placer{min: plotLeft, max: plotRight}
	tip := fmt.Sprintf("%s, %s tier: %s", e.ID, wording.Tier(t), windowText(w))
	first, last := plotRight, plotLeft
	for i, s := range w.Intervals {
		x1, x2 := ends(s, sc, scaled)
		if i == 0 {
			first = x1
		}
		last = x2
		c.printf(`<g class="bar"><title>%s</title>`, esc(tip))
		bx1, bx2 := x1, x2
		if s.OpenStart {
			bx1 += 8
		}
		if s.OpenEnd {
			bx2 -= 8
		}
		c.printf(`<rect x="%.1f" y="4" width="%.1f" height="%.0f" fill="%s"/>`, bx1, max(bx2-bx1, 2), barH, tierFill[t])
		if s.OpenStart {
			c.printf(`<path d="M%.1f 1 L%.1f 9 L%.1f 17 z" fill="%s"/>`, bx1, x1, bx1, tierFill[t])
		}
		if s.OpenEnd {
			c.printf(`<path d="M%.1f 1 L%.1f 9 L%.1f 17 z" fill="%s"/>`, bx2, x2, bx2, tierFill[t])
		}
		c.printf("</g>\n")
	}
	var labels []func()
	if w.Earliest.Bounded && (prev == nil || !sameBound(prev.Earliest, w.Earliest)) {
		text, full := boundLabel(e, t, w.Earliest, false)
		wd := textWidth(text, fontSize, false)
		x, row := p.place(wd, at(first-5-wd), at(first))
		labels = append(labels, func() { c.text(x, 13+float64(row)*rowH, text, full, "#111", "label bound", halo) })
	}
	if w.Latest.Bounded && (prev == nil || !sameBound(prev.Latest, w.Latest)) {
		text, full := boundLabel(e, t, w.Latest, true)
		wd := textWidth(text, fontSize, false)
		x, row := p.place(wd, at(last+5), at(last-wd))
		labels = append(labels, func() { c.text(x, 13+float64(row)*rowH, text, full, "#111", "label bound", halo) })
	}
	for _, f := range labels {
		f()
	}
	return laneH + rowH*float64(p.extraRows())
}

// boundLabel is the label of a bound (its date and the evidence at its
// start, shortened) and its tooltip (the whole chain).
func boundLabel(e constraint.EventResult, t int, b constraint.Bound, upper bool) (text, full string) {
	day := wording.Bound(b.Day, upper)
	text = day
	if len(b.Because) > 0 {
		text += " " + shortID(b.Because[0])
	}
	which := "earliest"
	if upper {
		which = "latest"
	}
	steps := stepTexts(b.Chain)
	full = fmt.Sprintf("%s, %s tier, %s %s: %s", e.ID, wording.Tier(t), which, day, wording.Chain(b.Because))
	if len(steps) > 0 {
		full += "\n" + strings.Join(steps, "\n→ ")
	}
	return text, full
}

// conflictLane draws a tier with no window: a hatched band marked as a
// conflict, the bounds that clash on this event, and the conflicts'
// steps in its tooltip.
func conflictLane(c *canvas, r *constraint.Result, e constraint.EventResult, t int, marks []conflictMark, sc yearScale) float64 {
	p := &placer{min: plotLeft, max: plotRight}
	var steps []string
	firstTier := t
	for _, cf := range r.Conflicts {
		if int(cf.Tier) > t {
			continue
		}
		firstTier = min(firstTier, int(cf.Tier))
		steps = append(steps, fmt.Sprintf("At the %s tier these cannot all hold: %s", wording.Tier(cf.Tier), strings.Join(cf.Evidence, ", ")))
		for _, s := range cf.Steps {
			steps = append(steps, "  "+s.Text)
		}
	}
	tip := fmt.Sprintf("%s, %s tier: no window, the evidence conflicts", e.ID, wording.Tier(t))
	if len(steps) > 0 {
		tip += "\n" + strings.Join(steps, "\n")
	}
	c.printf(`<g class="conflict"><title>%s</title><rect x="%.1f" y="4" width="%.1f" height="%.0f" fill="url(#tl-hatch)" stroke="%s" stroke-dasharray="3 2"/></g>`+"\n",
		esc(tip), plotLeft, plotRight-plotLeft, barH, conflictColour)
	var labels []func()
	for _, m := range marks {
		if m.event != e.ID || m.tier != t {
			continue
		}
		text := wording.Bound(m.day, m.upper) + " " + shortID(m.evidence)
		full := fmt.Sprintf("%s: %s %s", m.evidence, map[bool]string{false: "not before", true: "not after"}[m.upper], wording.Bound(m.day, m.upper))
		wd := textWidth(text, fontSize, false)
		var x float64
		var row int
		if m.upper {
			xm := sc.dayX(m.day + 1)
			c.printf(`<path class="clash" d="M%.1f 1 H%.1f V17 H%.1f" fill="none" stroke="%s" stroke-width="2"><title>%s</title></path>`, xm-5, xm, xm-5, conflictColour, esc(full))
			x, row = p.place(wd, at(xm-7-wd), at(xm-wd))
		} else {
			xm := sc.dayX(m.day)
			c.printf(`<path class="clash" d="M%.1f 1 H%.1f V17 H%.1f" fill="none" stroke="%s" stroke-width="2"><title>%s</title></path>`, xm+5, xm, xm+5, conflictColour, esc(full))
			x, row = p.place(wd, at(xm+7), at(xm))
		}
		labels = append(labels, func() { c.text(x, 13+float64(row)*rowH, text, full, conflictColour, "label bound", halo) })
	}
	msg := "no window: the evidence conflicts"
	if firstTier < t {
		msg += " (as at the " + wording.Tier(firstTier) + " tier)"
	}
	wd := textWidth(msg, fontSize, false)
	x, row := p.place(wd, at(plotLeft+4, plotRight-4-wd), at(plotLeft+4))
	labels = append(labels, func() {
		c.text(x, 13+float64(row)*rowH, msg, tip, conflictColour, "label conflict-note", halo+` font-style="italic"`)
	})
	c.printf("\n")
	for _, f := range labels {
		f()
	}
	return laneH + rowH*float64(p.extraRows())
}

// claimLane draws the claims on an event: a bracket over each claimed
// date, in the colour of its verdict, named with the verdict in words.
func claimLane(c *canvas, claims []claimSpan, sc yearScale, scaled bool) float64 {
	p := &placer{min: plotLeft, max: plotRight}
	var labels []func()
	for _, cs := range claims {
		cl := cs.claim
		col := verdictColour[cl.Verdict]
		full := claimTip(cl)
		text := shortID(cl.ID) + " " + cl.DateText + ": " + string(cl.Verdict)
		if !cs.ok {
			text += " (not drawn)"
		}
		wd := textWidth(text, fontSize, false)
		if !cs.ok {
			x, row := p.place(wd, at(plotLeft+4), at(plotLeft+4))
			labels = append(labels, func() { c.text(x, 13+float64(row)*rowH, text, full, col, "label claim", halo) })
			continue
		}
		x1, x2 := ends(cs.span, sc, scaled)
		c.printf(`<g class="claim"><title>%s</title>`, esc(full))
		if x2-x1 < 6 {
			mid := (x1 + x2) / 2
			c.printf(`<path d="M%.1f 3 L%.1f 9 L%.1f 15 L%.1f 9 z" fill="%s"/>`, mid, mid+5, mid, mid-5, col)
			x1, x2 = mid-5, mid+5
		} else {
			c.printf(`<path d="M%.1f 3 V15 M%.1f 9 H%.1f M%.1f 3 V15" fill="none" stroke="%s" stroke-width="2"/>`, x1+1, x1+1, x2-1, x2-1, col)
		}
		c.printf("</g>\n")
		x, row := p.place(wd, at(x2+5, x1-5-wd), at(x1))
		labels = append(labels, func() { c.text(x, 13+float64(row)*rowH, text, full, col, "label claim", halo) })
	}
	for _, f := range labels {
		f()
	}
	return laneH + rowH*float64(p.extraRows())
}

// claimTip says everything about a claim for its tooltip.
func claimTip(c constraint.ClaimResult) string {
	s := fmt.Sprintf("claim %s: %s %s", c.ID, c.Event, c.DateText)
	if c.By != "" {
		s += " (by " + c.By + ")"
	}
	s += ": " + string(c.Verdict)
	if c.Verdict != constraint.Undetermined {
		s += ", judged at the " + wording.Tier(c.JudgedAt) + " tier"
	}
	if len(c.Deciding) > 0 {
		s += "; deciding evidence: " + strings.Join(c.Deciding, ", ")
	}
	if c.Note != "" {
		s += "; " + c.Note
	}
	return s
}

// at lists candidate left edges for [placer.place].
func at(xs ...float64) []float64 { return xs }
