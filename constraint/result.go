package constraint

import (
	"terminus/constraint/date"
	"terminus/constraint/network"
	"terminus/constraint/wording"
)

// tiers returns the three strength tiers, strongest first; windows nest:
// soft ⊆ firm ⊆ hard.
func tiers() [3]network.Tier { return [3]network.Tier{network.Hard, network.Firm, network.Soft} }

// Verdict is the judgement on a claimed date.
type Verdict string

// The verdicts, from best to worst. Undetermined is used only when even the
// hard evidence contradicts itself, so that no tier can judge.
const (
	Consistent   Verdict = "consistent"
	Doubtful     Verdict = "doubtful"
	Improbable   Verdict = "improbable"
	Excluded     Verdict = "excluded"
	Undetermined Verdict = "undetermined"
)

// Result is everything terminus concludes about one case.
type Result struct {
	// ID is the case's id (an inventory number), when it has one.
	ID      string
	Title   string
	File    string
	Place   string
	Dataset DatasetInfo
	// Consistent tells, per tier (indexed by network.Tier), whether the
	// evidence of that tier agrees.
	Consistent [3]bool
	Events     []EventResult
	Claims     []ClaimResult
	// Conflicts are minimal sets of evidence that cannot all hold, per
	// inconsistent tier; Corrections the cheapest removal per tier.
	Conflicts   []Conflict
	Corrections []Correction
	// ConflictsComplete is false where more conflicts exist than were listed.
	ConflictsComplete [3]bool
	Evidence          []Evidence
	Disagreements     []Disagreement
	// Sources are the dataset sources the evidence cites, by key.
	Sources  []SourceRef
	Notes    []string
	Cautions []string
}

// DatasetInfo names the materials dataset a result was computed with.
type DatasetInfo struct {
	Version string
	SHA256  string
}

// EventResult holds an event's window at each tier; nil where the tier is
// inconsistent.
type EventResult struct {
	ID, Label string
	Place     string
	Windows   [3]*Window
}

// Window is the exact set of days an event can fall on at one tier.
type Window struct {
	Earliest, Latest Bound
	// Intervals is the exact feasible set (a union of intervals), ascending.
	Intervals []Span
}

// Span is a run of days; an open side is unbounded.
type Span struct {
	First, Last        date.Day
	OpenStart, OpenEnd bool
}

// Bound is one end of a window and the evidence that sets it.
type Bound struct {
	Day     date.Day
	Bounded bool
	// Because lists evidence ids in order from the dated evidence to the
	// event.
	Because []string
	// Chain says, step by step, why: each step an evidence item and what it
	// contributes.
	Chain []Step
	// Precision is how finely the evidence behind the bound states its
	// dates: the coarsest of its steps (day when none states one). Reports
	// show the bound no finer ([wording.BoundAt]); Day stays exact.
	Precision wording.Precision
	// From names the event whose bound at the same tier and side this one
	// continues (through an order), when there is one: Chain[:Own] is that
	// bound's chain, Chain[Own:] this bound's own steps. The slices share
	// their storage with From's, so a long order of events costs linear
	// space; a report may write the chain as a reference to From.
	From string
	Own  int
}

// Step is one link of a chain of evidence.
type Step struct {
	Evidence string
	Text     string
}

// ClaimResult is the verdict on one claim.
type ClaimResult struct {
	// Date is the claim in canonical EDTF, DateText as people write it.
	ID, Event, Date, DateText, By string
	Verdict                       Verdict
	// JudgedAt is the tier whose window decided the verdict's level, the
	// strongest consistent one.
	JudgedAt network.Tier
	// Surviving is, per tier, the part of the claim that the evidence of
	// that tier allows (nil: none, or the tier is inconsistent).
	Surviving [3][]Span
	// Deciding lists the evidence that rules the claim out at the tier
	// where it fails (empty when consistent), strongest first.
	// DecidingEachAlone is true when each item alone rules it out (the
	// verdict does not hang on one sample); false when they do so only
	// together, as a chain.
	Deciding          []string
	DecidingEachAlone bool
	// Sentence says the verdict, the tier that judged it and why, and the
	// deciding evidence, in the words of every format.
	Sentence string
	Note     string
}

// Conflict is a minimal set of evidence that cannot all be true at a tier.
type Conflict struct {
	Tier     network.Tier
	Evidence []string
	Steps    []Step
}

// Correction is a smallest, weakest set of evidence whose removal restores
// consistency at a tier.
type Correction struct {
	Tier     network.Tier
	Evidence []string
	// Cheapest is false when the search stopped at its work budget before
	// it could prove that no cheaper correction exists.
	Cheapest bool
}

// Evidence is one row of the evidence table.
type Evidence struct {
	ID         string
	Kind       string // finding, record, order
	Event      string
	What       string // the material(s), the record, the order
	Method     string
	Sample     string
	Confidence string
	Bounds     []EvidenceBound
	Source     string
	// Unlisted marks a finding of a material that is not in the dataset:
	// it is reported, and bounds nothing.
	Unlisted bool
}

// EvidenceBound is one bound that an evidence item puts on its event.
type EvidenceBound struct {
	Side         string   // "not before", "not after", "within", "after"
	Day          date.Day // the bound, for findings and records
	Date         string   // the day, ISO 8601, or a gap for an order
	Earlier      string   // for an order, the event it comes after
	Tier         network.Tier
	Milestone    string // made, sold, arrived, withdrawn; empty for records and orders
	Material     string // the material's id
	MaterialName string // the name it is shown by
	Source       string // a dataset source key, or the record's source
	// Precision is how finely the milestone or record states the bound.
	Precision wording.Precision
}

// Disagreement is a milestone on which sources disagree, and whether using
// another claim would change a verdict.
type Disagreement struct {
	Material, Name, Kind, Place string
	Claims                      []string // "1704 (source)", …
	Used                        string
	// OneSource is set when every claim comes from one source (a paper
	// that gives the earliest find and an earlier record, a patent and a
	// first production): the claims differ, no two sources disagree.
	OneSource      bool
	ChangesVerdict bool
	Text           string
}

// SourceRef is a dataset source cited by the evidence.
type SourceRef struct {
	Key, Cite, URL string
}
