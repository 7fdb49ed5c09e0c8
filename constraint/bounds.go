package constraint

import (
	"terminus/constraint/date"
	"terminus/constraint/network"
	"terminus/constraint/wording"
	"terminus/materials"
)

// override picks, for a milestone on which sources disagree, a claim other
// than the most conservative one. Key: material id, kind, area.
type override map[string]int

func overrideKey(mat string, kind materials.Kind, area string) string {
	return mat + "\x00" + string(kind) + "\x00" + area
}

func lower(t network.Tier) network.Tier {
	if t < network.Soft {
		return t + 1
	}
	return t
}

func maxTier(a, b network.Tier) network.Tier {
	if a > b {
		return a
	}
	return b
}

// boundItem is one bound a milestone gives a material's availability.
type boundItem struct {
	upper bool
	day   date.Day
	tier  network.Tier
	ms    *materials.Milestone // in the dataset, which is never changed
	name  string               // the material's name
	area  string               // the area of an arrival
	allow date.Duration        // the stock allowance of an upper bound
	txt   string               // itemText, when a memo has made it
	iso   string               // day.ISO(), when a memo has made it
}

// text says where the bound comes from: "chrome yellow: made 1809 [key, documented]".
func (a *analysis) itemText(it *boundItem) string {
	if it.txt != "" {
		return it.txt
	}
	what := string(it.ms.Kind) + " " + it.ms.Date.String()
	switch it.ms.Kind {
	case materials.KindArrived:
		what = "arrived in " + a.placeName(it.area) + " " + it.ms.Date.String()
	case materials.KindWithdrawn:
		if it.area != "" {
			what = "withdrawn in " + a.placeName(it.area) + " " + it.ms.Date.String()
		}
	case materials.KindAttested:
		what = "attested " + it.ms.Date.String() + " in " + it.ms.Object + " (earlier than its dated milestones)"
	}
	t := it.name + ": " + what + " [" + it.ms.Source + ", " + string(it.ms.Basis) + "]"
	if it.upper {
		t += ", plus a stock allowance of " + wording.Duration(it.allow)
	}
	return t
}

func (a *analysis) confidenceCap(c Confidence) network.Tier {
	switch c {
	case Probable:
		return network.Firm
	case Possible:
		return network.Soft
	}
	return network.Hard
}

func dayText(d date.Day, upper bool) string { return wording.Bound(d, upper) }

// materialBounds returns the bounds a material's milestones give an event
// made at place, and notes about fallbacks, open ends and disagreements.
//
// Each kind gives one bound from its claims (several claims are the
// claims of sources that disagree): made a hard lower bound, sold a firm
// one, the arrivals of the most specific area containing place a soft one,
// and the withdrawals of the most specific area containing place (or the
// worldwide ones) a soft upper bound. The most conservative claim bounds:
// the earliest start for a lower bound, the latest end for an upper one;
// a claim open at that end leaves the kind without a bound. An attestation
// earlier than a kind's lower bound (any attestation for made and sold,
// one in the area for an arrival) takes its place, so that no bound is
// later than an object known to hold the material.
func (a *analysis) materialBounds(m *materials.Material, place string, cap network.Tier, ov override, b *built) []boundItem {
	items := make([]boundItem, 0, 4)
	name := displayName(m)
	type cand struct {
		day date.Day
		ms  *materials.Milestone
	}
	var buf [8]cand
	group := func(kind materials.Kind, area string, base network.Tier, upper bool) {
		cands := buf[:0]
		var open *materials.Milestone
		for i := range m.Milestones {
			ms := &m.Milestones[i]
			if ms.Kind != kind || !a.inGroup(ms, kind, area) {
				continue
			}
			day, ok := a.claimEnd(ms, upper)
			if !ok {
				if open == nil {
					open = ms
				}
				continue
			}
			cands = append(cands, cand{day, ms})
		}
		if open != nil {
			if b != nil {
				b.notes = append(b.notes, openEndNote(name, kind, a.placeName(area), open, upper))
			}
			return
		}
		if len(cands) == 0 {
			return
		}
		// Most conservative first: the earliest lower bound, the latest
		// upper; on a tie, a documented claim before one from memory and a
		// scholarly source before a weak one. A stable insertion sort: the
		// lists are short.
		better := func(x, y cand) bool {
			if x.day != y.day {
				return upper && x.day > y.day || !upper && x.day < y.day
			}
			return a.claimRank(x.ms) < a.claimRank(y.ms)
		}
		for i := 1; i < len(cands); i++ {
			for j := i; j > 0 && better(cands[j], cands[j-1]); j-- {
				cands[j], cands[j-1] = cands[j-1], cands[j]
			}
		}
		if !upper {
			// An earlier attestation caps the bound.
			var att *cand
			for i := range m.Milestones {
				ms := &m.Milestones[i]
				if ms.Kind != materials.KindAttested || kind == materials.KindArrived && !a.ds.InArea(ms, area) {
					continue
				}
				day, ok := a.claimEnd(ms, false)
				if !ok || day >= cands[0].day || att != nil && !better(cand{day, ms}, *att) {
					continue
				}
				att = &cand{day, ms}
			}
			if att != nil {
				cands = append(cands, cand{})
				copy(cands[1:], cands)
				cands[0] = *att
			}
		}
		pick := 0
		if len(ov) > 0 {
			if i, ok := ov[overrideKey(m.ID, kind, area)]; ok && i < len(cands) {
				pick = i
			}
		}
		if b != nil && len(cands) > 1 && cands[0].day != cands[len(cands)-1].day {
			cl := make([]string, len(cands))
			one := true
			for i, c := range cands {
				cl[i] = claimLabel(c.ms, c.day, upper)
				one = one && c.ms.Source == cands[0].ms.Source
			}
			b.disagreements = append(b.disagreements, Disagreement{
				Material: m.ID, Name: name, Kind: string(kind), Place: area, Claims: cl, Used: cl[pick], OneSource: one,
			})
		}
		c := cands[pick]
		t := base
		if c.ms.Date.Uncertain {
			t = lower(t)
		}
		t = maxTier(t, cap)
		it := boundItem{upper: upper, day: c.day, tier: t, ms: c.ms, name: name, area: area}
		if upper {
			it.allow = a.stockAllowance(c.ms)
		}
		items = append(items, it)
	}
	group(materials.KindMade, "", network.Hard, false)
	group(materials.KindSold, "", network.Firm, false)
	if place != "" {
		if area := a.ds.ArrivalArea(m, place); area != "" {
			group(materials.KindArrived, area, network.Soft, false)
		} else if b != nil {
			b.addNoArrival(place, name)
		}
	}
	if area, ok := a.ds.WithdrawalArea(m, place); ok {
		group(materials.KindWithdrawn, area, network.Soft, true)
	}
	return items
}

// inGroup reports whether the milestone ms of the given kind belongs to
// the claims of area: an arrival recorded for that area, a withdrawal
// recorded for it ("" being the whole world), any made or sold claim.
func (a *analysis) inGroup(ms *materials.Milestone, kind materials.Kind, area string) bool {
	switch kind {
	case materials.KindArrived:
		return ms.Place == area
	case materials.KindWithdrawn:
		if area == "" {
			return ms.Place == "" || ms.Place == "001"
		}
		return ms.Place == area
	}
	return true
}

// claimEnd is the day a claim bounds from: its first day for a lower
// bound, its last day plus the stock allowance for an upper one, after
// widening an approximate date. ok is false when the claim is open there.
func (a *analysis) claimEnd(ms *materials.Milestone, upper bool) (date.Day, bool) {
	d := ms.Date
	if d.Approximate {
		d = d.Widen(a.circa)
	}
	if upper {
		day, ok := d.Latest()
		if ok {
			day = a.stockAllowance(ms).AddTo(day)
		}
		return day, ok
	}
	return d.Earliest()
}

// claimRank orders claims of one day: documented before from memory, and
// within each the stronger kind of source first (scholarly, reference,
// trade, unclassified, weak).
func (a *analysis) claimRank(ms *materials.Milestone) int {
	r := 0
	if ms.Basis != materials.BasisDocumented {
		r = 10
	}
	typ := ""
	if s, ok := a.ds.Source(ms.Source); ok {
		typ = s.Type
	}
	switch materials.SourceClass(typ) {
	case "scholarly":
	case "encyclopedia":
		r++
	case "trade":
		r += 2
	case "unclassified":
		r += 3
	default:
		r += 4
	}
	return r
}

// claimLabel names a claim in a list of disagreeing ones: its date and
// source, and for an attestation what it is.
func claimLabel(ms *materials.Milestone, day date.Day, upper bool) string {
	text := ms.Date.String()
	if ms.Date.Approximate {
		// An approximate date counts from its widened end, which may
		// come before (or after) a plainer claim beside it: say so.
		text += ", read as " + wording.YearText(day.Year()) + map[bool]string{false: " at the earliest", true: " at the latest"}[upper]
	}
	if ms.Kind == materials.KindAttested {
		return text + " (attested in " + ms.Object + "; " + ms.Source + ")"
	}
	return text + " (" + ms.Source + ")"
}

// openEndNote says that a kind gives no bound because a claim is open on
// the side it would bound.
func openEndNote(name string, kind materials.Kind, area string, ms *materials.Milestone, upper bool) string {
	what := "the first making of " + name
	switch kind {
	case materials.KindSold:
		what = "the first sale of " + name
	case materials.KindArrived:
		what = "the arrival of " + name + " in " + area
	case materials.KindWithdrawn:
		what = "the withdrawal of " + name
		if area != "" {
			what += " in " + area
		}
	}
	side, end := "lower", "start"
	if upper {
		side, end = "upper", "end"
	}
	return "No " + side + " bound from " + what + ": " + ms.Source + " gives " + ms.Date.String() + ", which leaves its " + end + " open."
}

// itemPrecision is how finely a material's bound is stated: the precision
// of the milestone's date as widened, coarsened by the stock allowance of
// an upper bound.
func (a *analysis) itemPrecision(it *boundItem) wording.Precision {
	d := it.ms.Date
	if d.Approximate {
		d = d.Widen(a.circa)
	}
	p := wording.PrecisionOf(d)
	if it.upper {
		p = wording.Coarser(p, wording.PrecisionOfDuration(&it.allow))
	}
	return p
}

// stockAllowance is how long stocks may have lingered after the withdrawal
// ms: the dataset's figure, else the case's.
func (a *analysis) stockAllowance(ms *materials.Milestone) date.Duration {
	if ms.Allowance != nil {
		return *ms.Allowance
	}
	return a.allowance
}

func (a *analysis) placeName(code string) string {
	if a.ds.Regions != nil {
		if n := a.ds.Regions.Name(code); n != "" && n != code {
			return n + " (" + code + ")"
		}
	}
	return code
}

func displayName(m *materials.Material) string {
	if len(m.Names) > 0 {
		return m.Names[0]
	}
	return m.ID
}

// window is a material's availability at one tier: [lo, hi], either side
// possibly open, with the items that set each side.
type window struct {
	lo, hi     date.Day
	hasLo      bool
	hasHi      bool
	loBy, hiBy *boundItem
}

func windowAt(items []boundItem, t network.Tier) window {
	var w window
	for i := range items {
		it := &items[i]
		if it.tier > t {
			continue
		}
		if it.upper {
			if !w.hasHi || it.day < w.hi {
				w.hi, w.hasHi, w.hiBy = it.day, true, it
			}
		} else if !w.hasLo || it.day > w.lo {
			w.lo, w.hasLo, w.loBy = it.day, true, it
		}
	}
	return w
}

func (w window) alt(v network.Var) network.Alt {
	alt := network.Alt{From: network.Zero, To: v, Lo: -network.Inf, Hi: network.Inf}
	if w.hasLo {
		alt.Lo = int64(w.lo)
	}
	if w.hasHi {
		alt.Hi = int64(w.hi)
	}
	return alt
}

func (w window) same(o window) bool {
	return w.hasLo == o.hasLo && w.hasHi == o.hasHi && (!w.hasLo || w.lo == o.lo) && (!w.hasHi || w.hi == o.hi)
}
