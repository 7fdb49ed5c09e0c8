package constraint

import (
	"context"
	"errors"
	"slices"
	"strings"
	"terminus/constraint/date"
	"terminus/constraint/input"
	"terminus/constraint/wording"
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

// Cautions are the limits every report states (see package wording).
func Cautions() []string { return wording.Cautions() }

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
	// place is the case's place and eventPlaces each event's own, read as
	// codes ("" where none is given).
	place       string
	eventPlaces []string
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
	return f.ID + " names " + g.name + ", " + what + ": " + wording.Join(names, "or") + ". The finding is read as any of them, bounded by the earliest."
}

func (a *analysis) errAt(p Pos, suggest, format string, args ...any) *input.Error {
	return input.At(a.c.File, p, suggest, format, args...)
}

func prepare(c *Case, ds *materials.Dataset) (*analysis, error) {
	if ds == nil {
		return nil, errors.New("no materials dataset")
	}
	// The case's circa policy is read, never changed; what it leaves out
	// falls back to the defaults (date.Circa.For).
	a := &analysis{c: c, ds: ds, eventIdx: make(map[string]int, len(c.Events)), circa: c.Circa, allowance: DefaultStockAllowance()}
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
	var err error
	if a.place, err = a.resolvePlace(c.Place, c.PlacePos); err != nil {
		return nil, err
	}
	a.eventPlaces = make([]string, len(a.events))
	for i, e := range a.events {
		if a.eventPlaces[i], err = a.resolvePlace(e.Place, e.PlacePos); err != nil {
			return nil, err
		}
		for _, o := range e.After {
			if _, ok := a.eventIdx[o.Event]; !ok {
				return nil, a.errAt(o.Pos, input.DidYouMean(o.Event, ids), "event %s: 'after' names an unknown event %q (events: %s)", e.ID, o.Event, strings.Join(ids, ", "))
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
	claimIDs := map[string]Pos{}
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
			return nil, a.errAt(f.EventPos, input.DidYouMean(f.Event, ids), "finding %s: unknown event %q (events: %s)", f.ID, f.Event, strings.Join(ids, ", "))
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
			return nil, a.errAt(r.EventPos, input.DidYouMean(r.Event, ids), "record %s: unknown event %q (events: %s)", r.ID, r.Event, strings.Join(ids, ", "))
		}
	}
	for i := range c.Claims {
		cl := &c.Claims[i]
		if prev, dup := claimIDs[cl.ID]; dup {
			return nil, a.errAt(cl.Pos, "give each claim its own id", "claim id %q is used twice (first at line %d)", cl.ID, prev.Line)
		}
		claimIDs[cl.ID] = cl.Pos
		if cl.Event == "" {
			cl.Event = first
		} else if _, ok := a.eventIdx[cl.Event]; !ok {
			return nil, a.errAt(cl.EventPos, input.DidYouMean(cl.Event, ids), "claim %s: unknown event %q (events: %s)", cl.ID, cl.Event, strings.Join(ids, ", "))
		}
	}
	// How records and claims were read, where the date says it (an Old
	// Style year, a cyclical year, a widened month).
	for _, r := range c.Records {
		for _, n := range r.Date.Notes() {
			a.notes = append(a.notes, "Record "+r.ID+": "+n+".")
		}
	}
	for _, cl := range c.Claims {
		for _, n := range cl.Date.Notes() {
			a.notes = append(a.notes, "Claim "+cl.ID+": "+n+".")
		}
	}
	if err := a.checkCycles(); err != nil {
		return nil, err
	}
	return a, nil
}

// resolvePlace reads a place as a code, or as a name or former name of a
// country or area (a note then says how it was read); "" stays "".
func (a *analysis) resolvePlace(place string, p Pos) (string, error) {
	if place == "" || a.ds.Regions == nil {
		return place, nil
	}
	code, note, ok := a.ds.Regions.ResolvePlace(place)
	if ok {
		if note != "" {
			a.notes = append(a.notes, note)
		}
		return code, nil
	}
	hint := "use an ISO 3166-1 alpha-2 code (NL, GB, JP), a UN M49 area code (\"155\" Western Europe) or a country's English name"
	if s := a.ds.Regions.SuggestPlace(place); len(s) > 0 {
		hint = "did you mean " + input.OrList(s) + "? (" + placeList(a.ds.Regions, s) + ")"
	}
	return "", a.errAt(p, hint, "unknown place %q", place)
}

// placeList names codes: "NL Netherlands, BE Belgium".
func placeList(r *materials.Regions, codes []string) string {
	parts := make([]string, len(codes))
	for i, c := range codes {
		parts[i] = c + " " + r.Name(c)
	}
	return strings.Join(parts, ", ")
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

// placeOf is where event i was made: its own place, else the case's.
func (a *analysis) placeOf(i int) string {
	if a.eventPlaces[i] != "" {
		return a.eventPlaces[i]
	}
	return a.place
}
