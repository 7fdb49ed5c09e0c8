package constraint

import (
	"context"
	"fmt"
	"slices"
	"sort"
	"strings"

	"terminus/constraint/date"
	"terminus/constraint/network"
	"terminus/constraint/wording"
)

// A link ties a network constraint to the evidence it came from. Its
// texts are made only when a result shows them, and once.
type link struct {
	evidence string
	lower    *lazyText // what it says as a lower bound
	upper    *lazyText // what it says as an upper bound
	general  *lazyText // what it says in a conflict
	// precision is how finely the evidence states its date (or its gap):
	// a bound is shown no finer than the coarsest step behind it.
	precision wording.Precision
	// order is set for an order between two events: the earlier one's
	// index and the later one's.
	order         bool
	before, after int
}

// lazyText is a text made on first use; the windows of three tiers often
// show the same step.
type lazyText struct {
	make func() string
	text string
	done bool
}

func (t *lazyText) String() string {
	if !t.done {
		t.text, t.done, t.make = t.make(), true, nil
	}
	return t.text
}

// same makes a link whose three texts are one.
func same(evidence string, p wording.Precision, text func() string) link {
	t := &lazyText{make: text}
	return link{evidence: evidence, lower: t, upper: t, general: t, precision: p}
}

// built is one network built from the case, and how to read it back.
type built struct {
	net   *network.Network
	vars  []network.Var
	links []link // by the network's index of each constraint
	// evidence rows, in case order
	evidence []Evidence
	// disagreements found while building
	disagreements []Disagreement
	notes         []string
	// noArrival lists, per place (in the order met), the materials without
	// arrival data there.
	noArrival []placeNames
	// chains holds the chains of evidence read back, by solver path.
	chains map[chainKey]*chainEntry
}

// link returns the link of the network constraint of index i.
func (b *built) link(i int) (link, bool) {
	if i < 0 || i >= len(b.links) {
		return link{}, false
	}
	return b.links[i], true
}

// addNoArrival records that the material name has no arrival data at place.
func (b *built) addNoArrival(place, name string) {
	for i := range b.noArrival {
		if pn := &b.noArrival[i]; pn.place == place {
			if !slices.Contains(pn.names, name) {
				pn.names = append(pn.names, name)
			}
			return
		}
	}
	b.noArrival = append(b.noArrival, placeNames{place, []string{name}})
}

// placeNames is a place and the names of materials.
type placeNames struct {
	place string
	names []string
}

// arrivalNotes says, once per place, which materials have no arrival data.
func (a *analysis) arrivalNotes(b *built) []string {
	var out []string
	for _, pn := range b.noArrival {
		p, names := pn.place, pn.names
		if len(names) == 1 {
			out = append(out, "No arrival data for "+names[0]+" in "+a.placeName(p)+": its soft bound falls back to its firm bound.")
			continue
		}
		out = append(out, "No arrival data for "+wording.Join(names, "and")+" in "+a.placeName(p)+": their soft bounds fall back to their firm bounds.")
	}
	return out
}

// build translates the case into a network: findings into availability
// bounds (a disjunction for alternatives), records into bounds, orders into
// differences.
func (a *analysis) build(ov override, memo *Memo) (*built, error) {
	b := &built{net: network.New(), links: make([]link, 0, 3*(len(a.findings)+len(a.c.Records))),
		evidence: make([]Evidence, 0, len(a.findings)+len(a.c.Records))}
	for _, e := range a.events {
		b.vars = append(b.vars, b.net.AddVar(e.ID))
	}
	add := func(c network.Constraint, l link) error {
		if _, err := b.net.Add(c); err != nil {
			return fmt.Errorf("building the network for %s: %w", l.evidence, err)
		}
		b.links = append(b.links, l) // in the network's order of constraints
		return nil
	}
	// Orders.
	for i, e := range a.events {
		for _, o := range e.After {
			lo, hi := int64(0), network.Inf
			gap := ""
			if o.AtLeast != nil {
				lo = o.AtLeast.MinDays()
				gap += " at least " + wording.Duration(*o.AtLeast)
			}
			if o.AtMost != nil {
				hi = o.AtMost.MaxDays()
				if gap != "" {
					gap += " and"
				}
				gap += " at most " + wording.Duration(*o.AtMost)
			}
			text := e.ID + " comes after " + o.Event
			if gap != "" {
				text += "," + gap + " later"
			}
			text += " [" + o.Strength.String() + "]"
			if o.Note != "" {
				text += " (" + o.Note + ")"
			}
			c := network.Constraint{ID: o.ID, Tier: o.Strength, Alts: []network.Alt{{From: b.vars[a.eventIdx[o.Event]], To: b.vars[i], Lo: lo, Hi: hi}}}
			p := wording.Coarser(wording.PrecisionOfDuration(o.AtLeast), wording.PrecisionOfDuration(o.AtMost))
			l := same(o.ID, p, func() string { return text })
			l.order, l.before, l.after = true, a.eventIdx[o.Event], i
			if err := add(c, l); err != nil {
				return nil, err
			}
			row := Evidence{ID: o.ID, Kind: "order", Event: e.ID, What: text}
			side := "after"
			row.Bounds = append(row.Bounds, EvidenceBound{Side: side, Date: o.Event + gap, Earlier: o.Event, Tier: o.Strength})
			b.evidence = append(b.evidence, row)
		}
	}
	// Findings.
	for fi := range a.findings {
		f := &a.findings[fi]
		if f.Unlisted {
			what := strings.Join(f.Materials, " or ")
			b.evidence = append(b.evidence, Evidence{ID: f.ID, Kind: "finding", Event: f.Event, What: what,
				Method: f.Method, Sample: f.Sample, Confidence: string(f.Confidence), Unlisted: true})
			b.notes = append(b.notes, f.ID+": "+what+" is not in the dataset and gives no bound.")
			continue
		}
		for _, g := range f.groups {
			b.notes = append(b.notes, groupNote(f, g))
		}
		ei := a.eventIdx[f.Event]
		v := b.vars[ei]
		cap := a.confidenceCap(f.Confidence)
		place := a.placeOf(ei)
		perMat := make([][]boundItem, len(f.mats))
		var names []string
		for i, m := range f.mats {
			if memo != nil && ov == nil {
				perMat[i] = a.memoBounds(memo, m, place, cap, b)
			} else {
				perMat[i] = a.materialBounds(m, place, cap, ov, b)
			}
			names = append(names, displayName(m))
		}
		what := strings.Join(names, " or ")
		if len(f.groups) > 0 {
			what = strings.Join(f.Materials, " or ") + " (read as " + wording.Join(names, "or") + ")"
		}
		row := Evidence{ID: f.ID, Kind: "finding", Event: f.Event, What: what,
			Method: f.Method, Sample: f.Sample, Confidence: string(f.Confidence)}
		nb := 0
		for _, items := range perMat {
			nb += len(items)
		}
		row.Bounds = make([]EvidenceBound, 0, nb)
		for i, items := range perMat {
			for _, it := range items {
				side := "not before"
				if it.upper {
					side = "not after"
				}
				iso := it.iso
				if iso == "" {
					iso = it.day.ISO()
				}
				row.Bounds = append(row.Bounds, EvidenceBound{Side: side, Day: it.day, Date: iso, Tier: it.tier,
					Milestone: string(it.ms.Kind), Material: f.mats[i].ID, MaterialName: names[i], Source: it.ms.Source,
					Precision: a.itemPrecision(&it)})
			}
		}
		b.evidence = append(b.evidence, row)
		if len(f.mats) == 1 {
			// One material: its lower and upper sides are separate constraints,
			// so that a conflict names the side that fails.
			var prevLo, prevHi *boundItem
			for _, t := range tiers() {
				w := windowAt(perMat[0], t)
				if w.hasLo && w.loBy != prevLo {
					prevLo = w.loBy
					id := f.ID + "/after@" + t.String()
					fid, conf, lo, by := f.ID, f.Confidence, w.lo, w.loBy
					text := func() string {
						return fid + " found (" + string(conf) + "): not before " + dayText(lo, false) + ", from " + a.itemText(by)
					}
					c := network.Constraint{ID: id, Tier: t, Alts: []network.Alt{{From: network.Zero, To: v, Lo: int64(w.lo), Hi: network.Inf}}}
					if err := add(c, same(f.ID, a.itemPrecision(by), text)); err != nil {
						return nil, err
					}
				}
				if w.hasHi && w.hiBy != prevHi {
					prevHi = w.hiBy
					id := f.ID + "/before@" + t.String()
					fid, conf, hi, by := f.ID, f.Confidence, w.hi, w.hiBy
					text := func() string {
						return fid + " found (" + string(conf) + "): not after " + dayText(hi, true) + ", from " + a.itemText(by)
					}
					c := network.Constraint{ID: id, Tier: t, Alts: []network.Alt{{From: network.Zero, To: v, Lo: -network.Inf, Hi: int64(w.hi)}}}
					if err := add(c, same(f.ID, a.itemPrecision(by), text)); err != nil {
						return nil, err
					}
				}
			}
			continue
		}
		// Alternatives: the event lies in the union of their windows.
		var prev []window
		for _, t := range tiers() {
			ws := make([]window, len(perMat))
			unbounded := false
			for i := range perMat {
				ws[i] = windowAt(perMat[i], t)
				if !ws[i].hasLo && !ws[i].hasHi {
					unbounded = true
				}
			}
			if unbounded {
				prev = ws
				continue
			}
			if prev != nil && len(prev) == len(ws) {
				same := true
				for i := range ws {
					if !ws[i].same(prev[i]) {
						same = false
					}
				}
				if same {
					continue
				}
			}
			prev = ws
			var alts []network.Alt
			var kept []window
			var keptNames []string
			for i, w := range ws {
				if w.hasLo && w.hasHi && w.lo > w.hi {
					b.notes = append(b.notes, fmt.Sprintf("%s: by the dataset, %s was withdrawn before it was available at the %s tier; that alternative is dropped there.", f.ID, names[i], t))
					continue
				}
				alts = append(alts, w.alt(v))
				kept = append(kept, w)
				keptNames = append(keptNames, names[i])
			}
			if len(alts) == 0 {
				continue
			}
			id := f.ID + "@" + t.String()
			fid, conf := f.ID, f.Confidence
			lowText := func() string {
				var parts []string
				for i, w := range kept {
					if w.loBy != nil {
						parts = append(parts, a.itemText(w.loBy))
					} else {
						parts = append(parts, keptNames[i]+": no lower bound")
					}
				}
				return fid + " found (" + string(conf) + "), one of: " + strings.Join(parts, "; ")
			}
			upText := func() string {
				var parts []string
				for _, w := range kept {
					if w.hiBy != nil {
						parts = append(parts, a.itemText(w.hiBy))
					}
				}
				if len(parts) == 0 {
					return lowText()
				}
				return fid + " found (" + string(conf) + "), one of: " + strings.Join(parts, "; ")
			}
			c := network.Constraint{ID: id, Tier: t, Alts: alts}
			low := &lazyText{make: lowText}
			p := wording.Unstated
			for _, w := range kept {
				for _, by := range []*boundItem{w.loBy, w.hiBy} {
					if by != nil {
						p = wording.Coarser(p, a.itemPrecision(by))
					}
				}
			}
			if err := add(c, link{evidence: f.ID, lower: low, upper: &lazyText{make: upText}, general: low, precision: p}); err != nil {
				return nil, err
			}
		}
	}
	// Records.
	for _, r := range a.c.Records {
		v := b.vars[a.eventIdx[r.Event]]
		d := r.Date
		if d.Approximate {
			d = d.Widen(a.circa)
		}
		t := r.Strength
		if d.Uncertain {
			t = lower(t)
		}
		var alts []network.Alt
		var sides []EvidenceBound
		switch r.Kind {
		case RecordOn:
			for _, iv := range d.Alternatives {
				alt := network.Alt{From: network.Zero, To: v, Lo: -network.Inf, Hi: network.Inf}
				if !iv.OpenStart {
					alt.Lo = int64(iv.First)
				}
				if !iv.OpenEnd {
					alt.Hi = int64(iv.Last)
				}
				alts = append(alts, alt)
			}
		case RecordNotBefore:
			if first, ok := d.Earliest(); ok {
				alts = append(alts, network.Alt{From: network.Zero, To: v, Lo: int64(first), Hi: network.Inf})
			}
		case RecordNotAfter:
			if last, ok := d.Latest(); ok {
				alts = append(alts, network.Alt{From: network.Zero, To: v, Lo: -network.Inf, Hi: int64(last)})
			}
		case RecordBetween:
			alt := network.Alt{From: network.Zero, To: v, Lo: -network.Inf, Hi: network.Inf}
			if first, ok := d.Earliest(); ok {
				alt.Lo = int64(first)
			}
			if last, ok := d.Latest(); ok {
				alt.Hi = int64(last)
			}
			alts = append(alts, alt)
		}
		if len(alts) == 0 {
			b.notes = append(b.notes, fmt.Sprintf("Record %s (%s %s) is open on the side it bounds and adds nothing.", r.ID, r.Kind, r.DateText))
			continue
		}
		lo, hi := alts[0].Lo, alts[len(alts)-1].Hi
		if lo > -network.Inf {
			sides = append(sides, EvidenceBound{Side: "not before", Day: date.Day(lo), Date: date.Day(lo).ISO(), Tier: t, Source: r.Source, Precision: wording.PrecisionOf(d)})
		}
		if hi < network.Inf {
			sides = append(sides, EvidenceBound{Side: "not after", Day: date.Day(hi), Date: date.Day(hi).ISO(), Tier: t, Source: r.Source, Precision: wording.PrecisionOf(d)})
		}
		what := recordText(r, alts)
		src := ""
		if r.Source != "" {
			src = " (" + r.Source + ")"
		}
		general := r.ID + ": record, " + what + src + " [" + t.String() + "]"
		if r.Note != "" {
			general += " (" + r.Note + ")"
		}
		if err := add(network.Constraint{ID: r.ID, Tier: t, Alts: alts}, same(r.ID, wording.PrecisionOf(d), func() string { return general })); err != nil {
			return nil, err
		}
		b.evidence = append(b.evidence, Evidence{ID: r.ID, Kind: "record", Event: r.Event, What: what, Bounds: sides, Source: r.Source})
	}
	return b, nil
}

// run builds and solves the network at every tier and reads the result.
func (a *analysis) run(ctx context.Context, opt Options, ov override) (*Result, error) {
	b, err := a.build(ov, a.memoFor(opt))
	if err != nil {
		return nil, err
	}
	res := &Result{ID: a.c.ID, Title: a.c.Title, File: a.c.File, Place: a.place, Evidence: b.evidence, Disagreements: b.disagreements}
	res.Dataset = DatasetInfo{Version: a.ds.Version, SHA256: a.ds.SHA256}
	res.Notes = append(res.Notes, a.arrivalNotes(b)...)
	res.Notes = append(res.Notes, dedupe(b.notes)...)
	res.Events = make([]EventResult, len(a.events))
	for i, e := range a.events {
		res.Events[i] = EventResult{ID: e.ID, Label: e.Label, Place: a.placeOf(i)}
	}
	reported := map[string]bool{}
	sols, err := b.net.SolveTiers(ctx, network.Options{MaxConflicts: opt.MaxConflicts})
	if err != nil {
		return nil, err
	}
	for _, t := range tiers() {
		sol := sols[t]
		res.Consistent[t] = sol.Consistent
		res.ConflictsComplete[t] = true
		if !sol.Consistent {
			res.ConflictsComplete[t] = sol.ConflictsComplete
			for _, cs := range sol.Conflicts {
				evs, steps := b.explainSet(cs)
				key := strings.Join(evs, "\x00")
				if reported[key] {
					continue
				}
				reported[key] = true
				res.Conflicts = append(res.Conflicts, Conflict{Tier: t, Evidence: evs, Steps: steps})
			}
			if sol.BudgetSpent {
				res.Notes = append(res.Notes, fmt.Sprintf("The explanation of the %s tier stopped at its work budget: the correction given, if any, may not be the cheapest.", t))
			}
			if len(sol.Correction) > 0 {
				evs, _ := b.explainSet(sol.Correction)
				res.Corrections = append(res.Corrections, Correction{Tier: t, Evidence: evs, Cheapest: !sol.BudgetSpent})
			}
			continue
		}
		paths := make([][2][]int, len(a.events))
		for i := range a.events {
			v := b.vars[i]
			w := &Window{}
			for _, iv := range sol.Domain(v) {
				w.Intervals = append(w.Intervals, spanOf(iv))
			}
			lo, hi := sol.Earliest(v), sol.Latest(v)
			w.Earliest = b.bound(lo, false)
			w.Latest = b.bound(hi, true)
			paths[i] = [2][]int{lo.Because, hi.Because}
			res.Events[i].Windows[t] = w
		}
		b.linkChains(res.Events, t, paths)
	}
	for _, e := range res.Events {
		// The soft window is the narrowest; when even it is open on both
		// sides, no evidence speaks to the event, and "consistent" says
		// only that nothing was found against a claim.
		if w := e.Windows[network.Soft]; w != nil && !w.Earliest.Bounded && !w.Latest.Bounded {
			res.Notes = append(res.Notes, "Nothing in the evidence bounds "+e.ID+" ("+e.Label+"): any date is consistent with it, which says nothing for or against a claim.")
		}
	}
	a.judge(res)
	res.Sources = a.sources(res.Evidence)
	res.Disagreements = dedupeDisagreements(res.Disagreements)
	return res, nil
}

func (a *analysis) sources(rows []Evidence) []SourceRef {
	var out []SourceRef
	for _, r := range rows {
		if r.Kind != "finding" {
			continue
		}
	bounds:
		for _, b := range r.Bounds {
			if b.Source == "" {
				continue
			}
			for _, o := range out { // a handful: a scan beats a map
				if o.Key == b.Source {
					continue bounds
				}
			}
			ref := SourceRef{Key: b.Source}
			if s, ok := a.ds.Source(b.Source); ok {
				ref.Cite, ref.URL = s.Cite, s.URL
			}
			out = append(out, ref)
		}
	}
	slices.SortFunc(out, func(x, y SourceRef) int { return strings.Compare(x.Key, y.Key) })
	return out
}

func dedupeDisagreements(list []Disagreement) []Disagreement {
	var out []Disagreement
next:
	for _, d := range list {
		for _, o := range out { // a handful: a scan beats a map
			if o.Material == d.Material && o.Kind == d.Kind && o.Place == d.Place {
				continue next
			}
		}
		out = append(out, d)
	}
	return out
}

func spanOf(iv network.Interval) Span {
	s := Span{First: date.Day(iv.Lo), Last: date.Day(iv.Hi)}
	if iv.Lo <= -network.Inf {
		s.OpenStart, s.First = true, 0
	}
	if iv.Hi >= network.Inf {
		s.OpenEnd, s.Last = true, 0
	}
	return s
}

// explainSet maps network constraint indices to evidence ids (sorted,
// without repeats) and the steps that say what each contributes.
func (b *built) explainSet(indices []int) ([]string, []Step) {
	seen := map[string]bool{}
	var evs []string
	var steps []Step
	for _, i := range indices {
		l, ok := b.link(i)
		if !ok {
			continue
		}
		steps = append(steps, Step{Evidence: l.evidence, Text: l.general.String()})
		if !seen[l.evidence] {
			seen[l.evidence] = true
			evs = append(evs, l.evidence)
		}
	}
	sort.Strings(evs)
	return evs, steps
}

func dedupe(list []string) []string {
	seen := map[string]bool{}
	var out []string
	for _, s := range list {
		if !seen[s] {
			seen[s] = true
			out = append(out, s)
		}
	}
	return out
}

// recordText says what a record states, in the words of its kind.
func recordText(r Record, alts []network.Alt) string {
	lo, hi := alts[0].Lo, alts[len(alts)-1].Hi
	first, last := "open", "open"
	if lo > -network.Inf {
		first = wording.Bound(date.Day(lo), false)
	}
	if hi < network.Inf {
		last = wording.Bound(date.Day(hi), true)
	}
	q := ""
	if r.Date.Uncertain {
		q = " (uncertain)"
	}
	if r.Date.Approximate {
		q += " (approximate, widened)"
	}
	switch r.Kind {
	case RecordOn:
		if len(alts) > 1 {
			if text := r.Date.String(); strings.HasPrefix(text, "one of") {
				return "dated " + text + q
			}
			return "dated one of " + r.Date.String() + q
		}
		if first == last {
			return "dated " + first + q
		}
		return "dated " + r.Date.String() + q
	case RecordNotBefore:
		return "not before " + first + q
	case RecordNotAfter:
		return "not after " + last + q
	}
	return "between " + first + " and " + last + q
}
