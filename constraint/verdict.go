package constraint

import (
	"fmt"
	"slices"

	"terminus/constraint/date"
	"terminus/constraint/network"
	"terminus/constraint/wording"
)

// judge gives each claim its verdict from the windows, the evidence that
// decides it, and the sentence that says so.
func (a *analysis) judge(res *Result) {
	strongest := -1 // the weakest tier that is still consistent
	for _, t := range tiers() {
		if !res.Consistent[t] {
			break
		}
		strongest = int(t)
	}
	if strongest < int(network.Soft) && strongest >= 0 {
		res.Notes = append(res.Notes, fmt.Sprintf("The evidence of the %s tier conflicts, so verdicts are judged at the %s tier, the weakest that agrees.", network.Tier(strongest+1), network.Tier(strongest)))
	}
	for _, c := range a.c.Claims {
		cr := ClaimResult{ID: c.ID, Event: c.Event, Date: c.Date.EDTF(), DateText: c.Date.String(), By: c.By}
		d := c.Date
		if d.Approximate {
			d = d.Widen(a.circa)
		}
		ev := res.Events[a.eventIdx[c.Event]]
		var claim []Span
		for _, iv := range d.Alternatives {
			claim = append(claim, Span{First: iv.First, Last: iv.Last, OpenStart: iv.OpenStart, OpenEnd: iv.OpenEnd})
		}
		facts := wording.VerdictFacts{Consistent: res.Consistent}
		if strongest < 0 {
			cr.Verdict = Undetermined
			cr.Note = "the hard evidence contradicts itself; resolve the conflicts first"
			facts.Verdict, facts.Note = string(cr.Verdict), cr.Note
			cr.Sentence = wording.VerdictSentence(facts)
			res.Claims = append(res.Claims, cr)
			continue
		}
		cr.Verdict = Consistent
		cr.JudgedAt = network.Tier(strongest)
		failed := -1
		for _, t := range tiers() {
			if int(t) > strongest {
				break
			}
			w := ev.Windows[t]
			cr.Surviving[t] = intersect(claim, w.Intervals)
			if len(cr.Surviving[t]) == 0 && failed < 0 {
				failed = int(t)
			}
		}
		if failed >= 0 {
			cr.Verdict = [...]Verdict{Excluded, Improbable, Doubtful}[failed]
			cr.Deciding, cr.DecidingEachAlone = a.deciding(claim, c.Event, network.Tier(failed), ev.Windows[failed], res.Evidence)
		}
		facts.Verdict, facts.JudgedAt = string(cr.Verdict), strongest
		facts.Deciding, facts.EachAlone = cr.Deciding, cr.DecidingEachAlone
		facts.Findings, facts.Samples = findingsAndSamples(cr.Deciding, res.Evidence)
		cr.Sentence = wording.VerdictSentence(facts)
		res.Claims = append(res.Claims, cr)
	}
}

// deciding names the evidence that rules the claim out at tier t. Where
// pieces of evidence on the claim's event each rule it out on their own
// (their bounds at tier t or stronger leave no day of the claim), those
// are the deciding ones, strongest first, and eachAlone is true: the
// verdict does not hang on one sample. Otherwise the verdict rests on the
// chain behind the window's bound (evidence on other events carried by
// orders, or alternatives that only together leave a gap), and that chain
// is given.
func (a *analysis) deciding(claim []Span, event string, t network.Tier, w *Window, rows []Evidence) ([]string, bool) {
	if len(claim) == 0 {
		return nil, false
	}
	type hit struct {
		id   string
		tier network.Tier
	}
	var alone []hit
	for i := range rows {
		if e := &rows[i]; e.Event == event && (e.Kind == "finding" || e.Kind == "record") {
			if tier, ok := rulesOut(claim, e, t, a.alternatives(e.ID)); ok {
				alone = append(alone, hit{e.ID, tier})
			}
		}
	}
	if len(alone) > 0 {
		slices.SortStableFunc(alone, func(x, y hit) int { return int(x.tier) - int(y.tier) })
		ids := make([]string, len(alone))
		for i, h := range alone {
			ids[i] = h.id
		}
		return ids, true
	}
	return chainDeciding(claim, w), false
}

// rulesOut reports whether evidence e alone leaves no day of the claim at
// tier t (using its bounds of tier t or stronger), and the strongest tier
// at which it does. A finding of several materials rules the claim out
// only if every one of them does (the finding may be any of them).
func rulesOut(claim []Span, e *Evidence, t network.Tier, alts int) (network.Tier, bool) {
	first, last := claim[0], claim[len(claim)-1]
	best, found := network.Soft+1, false
	for tier := network.Hard; tier <= t; tier++ {
		type window struct {
			lo, hi       date.Day
			hasLo, hasHi bool
		}
		byMat := map[string]*window{}
		var order []string
		for _, b := range e.Bounds {
			if b.Tier > tier {
				continue
			}
			key := b.Material
			w, ok := byMat[key]
			if !ok {
				w = &window{}
				byMat[key] = w
				order = append(order, key)
			}
			switch b.Side {
			case "not before":
				if !w.hasLo || b.Day > w.lo {
					w.lo, w.hasLo = b.Day, true
				}
			case "not after":
				if !w.hasHi || b.Day < w.hi {
					w.hi, w.hasHi = b.Day, true
				}
			}
		}
		if len(order) == 0 {
			continue
		}
		all := true
		for _, k := range order {
			w := byMat[k]
			out := w.hasLo && !last.OpenEnd && last.Last < w.lo || w.hasHi && !first.OpenStart && first.First > w.hi
			if !out {
				all = false
				break
			}
		}
		if all && e.Kind == "finding" && len(order) < alts {
			all = false // some alternative has no bound at this tier
		}
		if all {
			best, found = tier, true
			break
		}
	}
	return best, found
}

// alternatives counts the materials a finding may be (1 for a record).
func (a *analysis) alternatives(id string) int {
	for i := range a.findings {
		if a.findings[i].ID == id {
			return len(a.findings[i].mats)
		}
	}
	return 1
}

// chainDeciding names the evidence behind the bound a claim falls outside.
func chainDeciding(claim []Span, w *Window) []string {
	last := claim[len(claim)-1]
	first := claim[0]
	var out []string
	if w.Earliest.Bounded && !last.OpenEnd && last.Last < w.Earliest.Day {
		return append(out, w.Earliest.Because...)
	}
	if w.Latest.Bounded && !first.OpenStart && first.First > w.Latest.Day {
		return append(out, w.Latest.Because...)
	}
	// The claim falls in a gap of the window: both sides count.
	out = append(out, w.Earliest.Because...)
	for _, id := range w.Latest.Because {
		if !slices.Contains(out, id) {
			out = append(out, id)
		}
	}
	return out
}

// findingsAndSamples counts the findings among ids and the distinct
// samples they name; samples is 0 when a finding names none.
func findingsAndSamples(ids []string, rows []Evidence) (findings, samples int) {
	var seen []string
	named := true
	for _, r := range rows {
		if r.Kind != "finding" || !slices.Contains(ids, r.ID) {
			continue
		}
		findings++
		if r.Sample == "" {
			named = false
			continue
		}
		if !slices.Contains(seen, r.Sample) {
			seen = append(seen, r.Sample)
		}
	}
	if !named {
		return findings, 0
	}
	return findings, len(seen)
}

// intersect returns the days in both a and b, as spans.
func intersect(a, b []Span) []Span {
	var out []Span
	for _, x := range a {
		for _, y := range b {
			s := Span{}
			switch {
			case x.OpenStart && y.OpenStart:
				s.OpenStart = true
			case x.OpenStart:
				s.First = y.First
			case y.OpenStart:
				s.First = x.First
			default:
				s.First = max(x.First, y.First)
			}
			switch {
			case x.OpenEnd && y.OpenEnd:
				s.OpenEnd = true
			case x.OpenEnd:
				s.Last = y.Last
			case y.OpenEnd:
				s.Last = x.Last
			default:
				s.Last = min(x.Last, y.Last)
			}
			if !s.OpenStart && !s.OpenEnd && s.First > s.Last {
				continue
			}
			out = append(out, s)
		}
	}
	return out
}
