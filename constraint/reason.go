package constraint

import (
	"context"
	"errors"
	"fmt"
	"slices"
	"sort"
	"strings"

	"terminus/constraint/date"
	"terminus/constraint/network"
	"terminus/materials"
)

// Options tune an analysis.
type Options struct {
	// MaxConflicts caps the minimal conflicts listed per tier (0: 10).
	MaxConflicts int
	// NoSensitivity skips re-solving under the other claims of disagreeing
	// sources.
	NoSensitivity bool
	// Memo, when not nil, shares work between the analyses of many cases
	// against its dataset (see [Memo]); results are the same with or
	// without it.
	Memo *Memo
}

// Analyze checks a case against a materials dataset and returns the
// windows, verdicts, conflicts and the evidence behind them. A problem with
// the case (an unknown material, event or place) is an [*Error] with the
// position in the case file; no partial result is returned.
func Analyze(ctx context.Context, c *Case, ds *materials.Dataset, opt Options) (*Result, error) {
	a, err := prepare(c, ds)
	if err != nil {
		return nil, err
	}
	res, err := a.run(ctx, opt, nil)
	if err != nil {
		return nil, err
	}
	if !opt.NoSensitivity {
		if err := a.sensitivity(ctx, opt, res); err != nil {
			return nil, err
		}
	}
	res.Notes = append(a.notes, res.Notes...)
	res.Cautions = Cautions()
	return res, nil
}

// Cautions are the limits every report states.
func Cautions() []string {
	return []string{
		"Material evidence can rule dates out; it never proves a date, nor that an object is authentic.",
		"A bound from a material holds only if the finding belongs to that event: not to a later retouching, a consolidant, a fill or a contamination.",
		"Absence proves nothing: a material not detected may be below the detection limit, or not sampled.",
		"Dataset dates are only as good as their sources and may be revised; a first date of making, sale or arrival is the earliest known, not a rule of nature.",
		"This is no authentication certificate and no legal opinion: defer to qualified conservators, accredited laboratories and the laws on cultural property that apply.",
	}
}

// analysis is a case resolved against a dataset, ready to build networks.
type analysis struct {
	c         *Case
	ds        *materials.Dataset
	events    []Event
	eventIdx  map[string]int
	findings  []resolvedFinding
	circa     date.Circa
	allowance date.Duration
	notes     []string
}

type resolvedFinding struct {
	Finding
	mats   []*materials.Material
	groups []groupUse // the markers and families among its names
}

// groupUse is a name in a finding that stands for several materials.
type groupUse struct {
	name  string // as the case wrote it
	group *materials.Group
}

// groupNote says in words how a finding that names a marker or a family
// is read.
func groupNote(f *resolvedFinding, g groupUse) string {
	names := make([]string, len(g.group.Members))
	for i, m := range g.group.Members {
		names[i] = displayName(m)
	}
	what := "a " + string(g.group.Kind)
	switch g.group.Kind {
	case materials.GroupColourIndex:
		what = "a Colour Index name that several materials share"
	case materials.GroupCAS:
		what = "a CAS Registry Number that several materials share"
	}
	if len(names) == 1 {
		return f.ID + " names " + g.name + ", " + what + " that only " + names[0] + " carries in the dataset."
	}
	return f.ID + " names " + g.name + ", " + what + ": " + orList(names) + ". The finding is read as any of them, bounded by the earliest."
}

func orList(list []string) string {
	if len(list) < 2 {
		return strings.Join(list, "")
	}
	return strings.Join(list[:len(list)-1], ", ") + " or " + list[len(list)-1]
}

func (a *analysis) errAt(p Pos, suggest, format string, args ...any) *Error {
	return &Error{File: a.c.File, Line: p.Line, Column: p.Column, Msg: fmt.Sprintf(format, args...), Suggest: suggest}
}

func prepare(c *Case, ds *materials.Dataset) (*analysis, error) {
	if ds == nil {
		return nil, errors.New("no materials dataset")
	}
	// The case's circa policy is read, never changed; what it leaves out
	// falls back to the defaults (date.Circa.For).
	a := &analysis{c: c, ds: ds, eventIdx: make(map[string]int, len(c.Events)), circa: c.Circa, allowance: DefaultStockAllowance}
	if c.StockAllowance != nil {
		a.allowance = *c.StockAllowance
	}
	a.events = c.Events
	if len(a.events) == 0 {
		a.events = []Event{{ID: "making", Label: "making of the object"}}
	}
	for i, e := range a.events {
		if _, dup := a.eventIdx[e.ID]; dup {
			return nil, a.errAt(e.Pos, "give each event its own id", "event %q is defined twice", e.ID)
		}
		a.eventIdx[e.ID] = i
	}
	ids := make([]string, len(a.events))
	for i, e := range a.events {
		ids[i] = e.ID
	}
	if err := a.checkPlace(c.Place, c.PlacePos); err != nil {
		return nil, err
	}
	for _, e := range a.events {
		if err := a.checkPlace(e.Place, e.PlacePos); err != nil {
			return nil, err
		}
		for _, o := range e.After {
			if _, ok := a.eventIdx[o.Event]; !ok {
				return nil, a.errAt(o.Pos, didYouMean(o.Event, ids), "event %s: 'after' names an unknown event %q (events: %s)", e.ID, o.Event, strings.Join(ids, ", "))
			}
			if o.Event == e.ID {
				return nil, a.errAt(o.Pos, "", "event %s cannot come after itself", e.ID)
			}
			if o.AtLeast != nil && o.AtMost != nil && o.AtLeast.MinDays() > o.AtMost.MaxDays() {
				return nil, a.errAt(o.Pos, "swap at_least and at_most", "event %s: at_least is longer than at_most", e.ID)
			}
		}
	}
	first := a.events[0].ID
	evidenceIDs := map[string]Pos{}
	claimIDs := map[string]bool{}
	useID := func(id string, p Pos) error {
		if prev, dup := evidenceIDs[id]; dup {
			return a.errAt(p, "give each finding, record and order its own id", "id %q is used twice (first at line %d)", id, prev.Line)
		}
		evidenceIDs[id] = p
		return nil
	}
	for _, e := range a.events {
		for _, o := range e.After {
			if err := useID(o.ID, o.Pos); err != nil {
				return nil, err
			}
		}
	}
	for _, f := range c.Findings {
		if err := useID(f.ID, f.Pos); err != nil {
			return nil, err
		}
		if f.Event == "" {
			f.Event = first
		} else if _, ok := a.eventIdx[f.Event]; !ok {
			return nil, a.errAt(f.EventPos, didYouMean(f.Event, ids), "finding %s: unknown event %q (events: %s)", f.ID, f.Event, strings.Join(ids, ", "))
		}
		rf := resolvedFinding{Finding: f, mats: make([]*materials.Material, 0, len(f.Materials))}
		if f.Unlisted {
			a.findings = append(a.findings, rf)
			continue
		}
		for i, name := range f.Materials {
			r, err := ds.Resolve(name)
			if err != nil {
				var hint string
				var h interface{ Hint() string }
				if errors.As(err, &h) {
					hint = h.Hint()
				}
				if hint == "" {
					hint = "'terminus materials list' shows the materials; --materials FILE adds your own"
				}
				at := f.Pos
				if i < len(f.MatPos) {
					at = f.MatPos[i]
				}
				return nil, a.errAt(at, hint, "finding %s: unknown material %q", f.ID, name)
			}
			if r.Group != nil {
				rf.groups = append(rf.groups, groupUse{name: name, group: r.Group})
			}
			for _, m := range r.Materials {
				if !slices.Contains(rf.mats, m) { // named twice, perhaps by two names
					rf.mats = append(rf.mats, m)
				}
			}
		}
		a.findings = append(a.findings, rf)
	}
	for i := range c.Records {
		r := &c.Records[i]
		if err := useID(r.ID, r.Pos); err != nil {
			return nil, err
		}
		if r.Event == "" {
			r.Event = first
		} else if _, ok := a.eventIdx[r.Event]; !ok {
			return nil, a.errAt(r.EventPos, didYouMean(r.Event, ids), "record %s: unknown event %q (events: %s)", r.ID, r.Event, strings.Join(ids, ", "))
		}
	}
	for i := range c.Claims {
		cl := &c.Claims[i]
		if claimIDs[cl.ID] {
			return nil, a.errAt(cl.Pos, "", "claim id %q is used twice", cl.ID)
		}
		claimIDs[cl.ID] = true
		if cl.Event == "" {
			cl.Event = first
		} else if _, ok := a.eventIdx[cl.Event]; !ok {
			return nil, a.errAt(cl.EventPos, didYouMean(cl.Event, ids), "claim %s: unknown event %q (events: %s)", cl.ID, cl.Event, strings.Join(ids, ", "))
		}
	}
	if err := a.checkCycles(); err != nil {
		return nil, err
	}
	return a, nil
}

func (a *analysis) checkPlace(place string, p Pos) error {
	if place == "" {
		return nil
	}
	if a.ds.Regions == nil || a.ds.Regions.Valid(place) {
		return nil
	}
	hint := "use an ISO 3166-1 alpha-2 code (NL, GB, JP) or a UN M49 area code (\"155\" Western Europe)"
	if s := a.ds.Regions.Suggest(place); len(s) > 0 {
		hint = "did you mean " + quoteJoin(s) + "?"
	}
	return a.errAt(p, hint, "unknown place %q", place)
}

// checkCycles rejects 'after' orders that go round in a loop with no gap
// allowed, which no dating can satisfy; the network would report it as a
// conflict, but it is a mistake in the case file.
func (a *analysis) checkCycles() error {
	state := make([]int, len(a.events))
	var visit func(i int) error
	visit = func(i int) error {
		state[i] = 1
		for _, o := range a.events[i].After {
			j := a.eventIdx[o.Event]
			if state[j] == 1 {
				return a.errAt(o.Pos, "check the 'after' entries of these events", "the events %s and %s are each after the other", a.events[i].ID, o.Event)
			}
			if state[j] == 0 {
				if err := visit(j); err != nil {
					return err
				}
			}
		}
		state[i] = 2
		return nil
	}
	for i := range a.events {
		if state[i] == 0 {
			if err := visit(i); err != nil {
				return err
			}
		}
	}
	return nil
}

func (a *analysis) placeOf(e Event) string {
	if e.Place != "" {
		return e.Place
	}
	return a.c.Place
}

// A link ties a network constraint to the evidence it came from. Its
// texts are made only when a result shows them, and once.
type link struct {
	evidence string
	lower    *lazyText // what it says as a lower bound
	upper    *lazyText // what it says as an upper bound
	general  *lazyText // what it says in a conflict
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
func same(evidence string, text func() string) link {
	t := &lazyText{make: text}
	return link{evidence: evidence, lower: t, upper: t, general: t}
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
			if !contains(pn.names, name) {
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
		out = append(out, "No arrival data for "+andList(names)+" in "+a.placeName(p)+": their soft bounds fall back to their firm bounds.")
	}
	return out
}

func andList(list []string) string {
	if len(list) < 2 {
		return strings.Join(list, "")
	}
	return strings.Join(list[:len(list)-1], ", ") + " and " + list[len(list)-1]
}

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
		t += ", plus a stock allowance of " + durationText(it.allow)
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

func dayText(d date.Day, upper bool) string { return FormatBound(d, upper) }

// FormatBound shows a day as people write a bound: the year alone when the
// bound is the first (lower) or last (upper) day of a year, the month when
// it is the first or last of a month.
func FormatBound(d date.Day, upper bool) string {
	y, m, dd := d.Civil()
	yearText := date.FormatYear(y)
	if y < 1 {
		yearText = fmt.Sprintf("%d BCE", 1-y)
	} else if y < 1000 {
		yearText = fmt.Sprintf("%d", y)
	}
	if !upper && m == 1 && dd == 1 || upper && m == 12 && dd == 31 {
		return yearText
	}
	if !upper && dd == 1 || upper && dd == date.DaysInMonth(y, m) {
		if y < 1000 {
			return fmt.Sprintf("%s %s", monthName(m), yearText)
		}
		return fmt.Sprintf("%s-%02d", date.FormatYear(y), m)
	}
	if y < 1000 {
		return fmt.Sprintf("%d %s %s", dd, monthName(m), yearText)
	}
	return d.ISO()
}

func monthName(m int) string {
	return [...]string{"", "Jan", "Feb", "Mar", "Apr", "May", "Jun", "Jul", "Aug", "Sep", "Oct", "Nov", "Dec"}[m]
}

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
			for i, c := range cands {
				cl[i] = claimLabel(c.ms)
			}
			b.disagreements = append(b.disagreements, Disagreement{
				Material: m.ID, Name: name, Kind: string(kind), Place: area, Claims: cl, Used: cl[pick],
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
func claimLabel(ms *materials.Milestone) string {
	if ms.Kind == materials.KindAttested {
		return ms.Date.String() + " (attested in " + ms.Object + "; " + ms.Source + ")"
	}
	return ms.Date.String() + " (" + ms.Source + ")"
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

func durationText(d date.Duration) string {
	var parts []string
	add := func(n int64, unit string) {
		if n == 0 {
			return
		}
		if n == 1 {
			parts = append(parts, "1 "+unit)
		} else {
			parts = append(parts, fmt.Sprintf("%d %ss", n, unit))
		}
	}
	add(d.Years, "year")
	add(d.Months, "month")
	add(d.Weeks, "week")
	add(d.Days, "day")
	if len(parts) == 0 {
		return "0 days"
	}
	return strings.Join(parts, " ")
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
				gap += " at least " + durationText(*o.AtLeast)
			}
			if o.AtMost != nil {
				hi = o.AtMost.MaxDays()
				if gap != "" {
					gap += " and"
				}
				gap += " at most " + durationText(*o.AtMost)
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
			if err := add(c, same(o.ID, func() string { return text })); err != nil {
				return nil, err
			}
			row := Evidence{ID: o.ID, Kind: "order", Event: e.ID, What: text}
			side := "after"
			row.Bounds = append(row.Bounds, EvidenceBound{Side: side, Date: o.Event + gap, Tier: o.Strength})
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
		ev := a.events[a.eventIdx[f.Event]]
		v := b.vars[a.eventIdx[f.Event]]
		cap := a.confidenceCap(f.Confidence)
		place := a.placeOf(ev)
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
			what = strings.Join(f.Materials, " or ") + " (read as " + orList(names) + ")"
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
					Milestone: string(it.ms.Kind), Material: f.mats[i].ID, MaterialName: names[i], Source: it.ms.Source})
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
					if err := add(c, same(f.ID, text)); err != nil {
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
					if err := add(c, same(f.ID, text)); err != nil {
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
			if err := add(c, link{evidence: f.ID, lower: low, upper: &lazyText{make: upText}, general: low}); err != nil {
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
			sides = append(sides, EvidenceBound{Side: "not before", Day: date.Day(lo), Date: date.Day(lo).ISO(), Tier: t, Source: r.Source})
		}
		if hi < network.Inf {
			sides = append(sides, EvidenceBound{Side: "not after", Day: date.Day(hi), Date: date.Day(hi).ISO(), Tier: t, Source: r.Source})
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
		if err := add(network.Constraint{ID: r.ID, Tier: t, Alts: alts}, same(r.ID, func() string { return general })); err != nil {
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
	res := &Result{ID: a.c.ID, Title: a.c.Title, File: a.c.File, Place: a.c.Place, Evidence: b.evidence, Disagreements: b.disagreements}
	res.Dataset = DatasetInfo{Version: a.ds.Version, SHA256: a.ds.SHA256}
	res.Notes = append(res.Notes, a.arrivalNotes(b)...)
	res.Notes = append(res.Notes, dedupe(b.notes)...)
	res.Events = make([]EventResult, len(a.events))
	for i, e := range a.events {
		res.Events[i] = EventResult{ID: e.ID, Label: e.Label, Place: a.placeOf(e)}
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
				res.Corrections = append(res.Corrections, Correction{Tier: t, Evidence: evs})
			}
			continue
		}
		for i := range a.events {
			v := b.vars[i]
			w := &Window{}
			for _, iv := range sol.Domain(v) {
				w.Intervals = append(w.Intervals, spanOf(iv))
			}
			w.Earliest = b.bound(sol.Earliest(v), false)
			w.Latest = b.bound(sol.Latest(v), true)
			res.Events[i].Windows[t] = w
		}
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

func (b *built) bound(nb network.Bound, upper bool) Bound {
	out := Bound{}
	if upper && nb.Value < network.Inf || !upper && nb.Value > -network.Inf {
		out.Day, out.Bounded = date.Day(nb.Value), true
	}
	for _, i := range nb.Because {
		l, ok := b.link(i)
		if !ok {
			continue
		}
		if len(out.Because) == 0 || out.Because[len(out.Because)-1] != l.evidence {
			out.Because = append(out.Because, l.evidence)
		}
		text := l.lower
		if upper {
			text = l.upper
		}
		out.Chain = append(out.Chain, Step{Evidence: l.evidence, Text: text.String()})
	}
	return out
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

// judge gives each claim its verdict from the windows.
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
		if strongest < 0 {
			cr.Verdict = Undetermined
			cr.Note = "the hard evidence contradicts itself; resolve the conflicts first"
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
			w := ev.Windows[failed]
			cr.Deciding = deciding(claim, w)
		}
		res.Claims = append(res.Claims, cr)
	}
}

// deciding names the evidence behind the bound a claim falls outside.
func deciding(claim []Span, w *Window) []string {
	if len(claim) == 0 {
		return nil
	}
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
		if !contains(out, id) {
			out = append(out, id)
		}
	}
	return out
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

// sensitivity re-solves the case under the other claim of every
// disagreement (the least conservative one) and says whether a verdict or
// the consistency of a tier would change.
func (a *analysis) sensitivity(ctx context.Context, opt Options, res *Result) error {
	for i := range res.Disagreements {
		d := &res.Disagreements[i]
		ov := override{overrideKey(d.Material, materials.Kind(d.Kind), d.Place): len(d.Claims) - 1}
		alt, err := a.run(ctx, opt, ov)
		if err != nil {
			return err
		}
		var changes []string
		for t := range res.Consistent {
			if res.Consistent[t] != alt.Consistent[t] {
				changes = append(changes, fmt.Sprintf("the %s tier would %s", network.Tier(t), map[bool]string{true: "agree", false: "conflict"}[alt.Consistent[t]]))
			}
		}
		for j := range res.Claims {
			if res.Claims[j].Verdict != alt.Claims[j].Verdict {
				changes = append(changes, fmt.Sprintf("claim %s would be %s", res.Claims[j].ID, alt.Claims[j].Verdict))
			}
		}
		latest := d.Claims[len(d.Claims)-1]
		what := "was " + d.Kind // made, sold, withdrawn
		if d.Kind == string(materials.KindArrived) {
			what = "arrived"
		}
		if d.Place != "" {
			what += " in " + a.placeName(d.Place)
		}
		d.Text = fmt.Sprintf("Sources disagree on when %s %s: %s. The bound uses %s, the most conservative.", d.Name, what, strings.Join(d.Claims, ", "), d.Used)
		if len(changes) == 0 {
			d.Text += fmt.Sprintf(" Under %s no verdict would change.", latest)
		} else {
			d.ChangesVerdict = true
			d.Text += fmt.Sprintf(" Under %s %s.", latest, strings.Join(changes, "; "))
		}
	}
	return nil
}

// recordText says what a record states, in the words of its kind.
func recordText(r Record, alts []network.Alt) string {
	lo, hi := alts[0].Lo, alts[len(alts)-1].Hi
	first, last := "open", "open"
	if lo > -network.Inf {
		first = FormatBound(date.Day(lo), false)
	}
	if hi < network.Inf {
		last = FormatBound(date.Day(hi), true)
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
