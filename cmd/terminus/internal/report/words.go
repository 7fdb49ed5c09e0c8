package report

import (
	"fmt"
	"strings"

	"terminus/constraint"
	"terminus/constraint/network"
	"terminus/constraint/wording"
)

// The sentences that every format for people (Markdown, HTML, Linked Art)
// shares, in plain text: each writer adds only its markup.

// eventName names an event as a report does: its label and id.
func eventName(e constraint.EventResult) string {
	if e.Label != "" {
		return e.Label + " (" + e.ID + ")"
	}
	return e.ID
}

// eventSentence puts an event's windows in graded words: "cannot" for the
// hard tier, "unlikely" for firm, "unusual" for soft; a tier is named only
// where it narrows the one before, and each bound is shown at the
// precision of its evidence.
func eventSentence(e constraint.EventResult) string {
	if e.Windows[0] == nil {
		return "Even the hard evidence for this event contradicts itself; no window can be given until the conflicts below are resolved."
	}
	var lows, highs []string
	var prevLo, prevHi *constraint.Bound
	for t, w := range e.Windows {
		if w == nil {
			continue
		}
		if w.Earliest.Bounded && (prevLo == nil || prevLo.Day != w.Earliest.Day) {
			lows = append(lows, fmt.Sprintf("%s %s (%s evidence: %s)", wording.NotBefore(t), wording.BoundAt(w.Earliest.Day, false, w.Earliest.Precision), wording.Tier(t), wording.Chain(w.Earliest.Because)))
		}
		if w.Latest.Bounded && (prevHi == nil || prevHi.Day != w.Latest.Day) {
			highs = append(highs, fmt.Sprintf("%s %s (%s evidence: %s)", wording.NotAfter(t), wording.BoundAt(w.Latest.Day, true, w.Latest.Precision), wording.Tier(t), wording.Chain(w.Latest.Because)))
		}
		if w.Earliest.Bounded {
			b := w.Earliest
			prevLo = &b
		}
		if w.Latest.Bounded {
			b := w.Latest
			prevHi = &b
		}
	}
	if len(lows) == 0 && len(highs) == 0 {
		return "The evidence considered sets no bound on this event."
	}
	s := "On the evidence considered, it " + joinAnd(append(lows, highs...)) + "."
	if e.Windows[1] == nil || e.Windows[2] == nil {
		s += " The weaker evidence conflicts (see Conflicts), so only the stronger tiers are stated."
	}
	return s
}

func joinAnd(list []string) string {
	switch len(list) {
	case 0:
		return ""
	case 1:
		return list[0]
	}
	return strings.Join(list[:len(list)-1], "; it ") + "; and it " + list[len(list)-1]
}

// claimSentences says what the verdict on a claim means: the lead before
// the verdict word ("The date claimed by the inscription for the original
// paint layers (making), 1847, is") and the rest after it (the verdict's
// sentence and what survives of the claim).
func claimSentences(c constraint.ClaimResult, events []constraint.EventResult) (lead, rest string) {
	name := c.Event
	for _, e := range events {
		if e.ID == c.Event && e.Label != "" {
			name = e.Label + " (" + e.ID + ")"
			if !strings.HasPrefix(strings.ToLower(e.Label), "the ") {
				name = "the " + name
			}
		}
	}
	by := ""
	if c.By != "" {
		by = " by " + c.By
	}
	lead = fmt.Sprintf("The date claimed%s for %s, %s, is", by, name, c.DateText)
	rest = c.Sentence
	switch c.Verdict {
	case constraint.Doubtful:
		rest += fmt.Sprintf(" Of the claim, %s remains within the firm window.", spansText(c.Surviving[network.Firm]))
	case constraint.Improbable:
		rest += fmt.Sprintf(" Of the claim, %s remains possible on the hard evidence alone.", spansText(c.Surviving[network.Hard]))
	}
	return lead, rest
}

// claimText is the claim's sentences in one plain text.
func claimText(c constraint.ClaimResult, events []constraint.EventResult) string {
	lead, rest := claimSentences(c, events)
	return lead + " " + string(c.Verdict) + ". " + rest
}

// survivingText says what survives of a claim at tier t: its spans, or
// "not judged" above the tier that judged it and for an undetermined claim.
func survivingText(c constraint.ClaimResult, t network.Tier) string {
	if c.Verdict == constraint.Undetermined || t > c.JudgedAt {
		return "not judged"
	}
	return spansText(c.Surviving[t])
}

// evidenceRow is one bound of one piece of evidence, in words; Tier is ""
// in the one row of evidence that bounds nothing.
type evidenceRow struct {
	ID, Event, What, Method, Confidence, Bound, Tier, Source string
}

// evidenceRows lays out the evidence table of the Markdown and HTML
// reports: a row for each bound of each piece of evidence (a material's
// bound names the material, its milestone and its source; an order's names
// what it comes after), or one row "none" for evidence that bounds
// nothing. atPrecision writes each bound at the precision of its evidence
// (the Markdown report); otherwise it reads as its day does.
func evidenceRows(r *constraint.Result, atPrecision bool) []evidenceRow {
	var rows []evidenceRow
	for _, e := range r.Evidence {
		method := e.Method
		if e.Sample != "" {
			method += " (" + e.Sample + ")"
		}
		if len(e.Bounds) == 0 {
			none := "none"
			if e.Unlisted {
				none = "none: not in the dataset"
			}
			rows = append(rows, evidenceRow{ID: e.ID, Event: e.Event, What: e.What, Method: method, Confidence: e.Confidence, Bound: none, Source: e.Source})
			continue
		}
		for _, b := range e.Bounds {
			upper := b.Side == "not after"
			bound := wording.Bound(b.Day, upper)
			if atPrecision {
				bound = wording.BoundAt(b.Day, upper, b.Precision)
			}
			row := evidenceRow{ID: e.ID, Event: e.Event, What: e.What, Method: method, Confidence: e.Confidence,
				Bound: b.Side + " " + bound, Tier: wording.Tier(b.Tier), Source: e.Source}
			if b.Milestone != "" {
				row.What = b.MaterialName
				row.Bound = fmt.Sprintf("%s %s (%s)", b.Side, bound, b.Milestone)
				row.Source = b.Source
			}
			if e.Kind == "order" {
				row.Bound = "after " + b.Date
			}
			rows = append(rows, row)
		}
	}
	return rows
}
