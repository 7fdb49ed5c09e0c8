// Package constraint is the reasoner of terminus: it reads a case file,
// turns its evidence into an interval network (package network), solves it
// at three strength tiers and reads back windows, verdicts, conflicts and
// the chain of evidence behind every bound.
//
// # Case files
//
// A [Case] is read by [ReadCaseFile] or [ParseCase] from YAML, JSON (a
// subset of YAML) or TOML. Decoding is strict: every key is checked, and a
// misspelt key, an unknown event, material or place, a bad date or a
// reversed interval is an [*Error] with the file, line and column and,
// where one fits, a suggestion. Defaults: one event "making" when none is
// given; a finding's, record's or claim's event is the first event; a
// finding is certain; a record is firm; an order ("after") is hard.
//
// # From evidence to constraints
//
// Each event is a variable counted in days. A finding of a material gives,
// from the material's milestones in the dataset:
//
//   - made: not before its first day, hard;
//   - sold: not before its first day, firm (missing: the made bound serves);
//   - arrived, for the event's place: not before its first day, soft; the
//     most specific area containing the place is used (missing: the firm
//     bound serves, and a note says there is no arrival data);
//   - withdrawn: not after its last day plus a stock allowance (the
//     milestone's own, else the case's stock_allowance, else
//     [DefaultStockAllowance], ten years), soft.
//
// A milestone date marked uncertain ("?") lowers its tier by one (hard →
// firm → soft); an approximate one ("~") is widened by the case's circa
// policy (package date's defaults where the case gives none). Where sources
// disagree (several milestones of one kind and place), the most
// conservative claim bounds: the earliest for a lower bound, the latest for
// an upper one; the result lists the spread, and the case is solved again
// under the least conservative claim to say whether any verdict would
// change.
//
// The confidence of an identification caps its tier: certain keeps it,
// probable caps at firm, possible caps at soft. A finding with
// alternatives ("one of these") puts its event in the union of the
// alternatives' windows, tier by tier: a disjunction in the network.
//
// A record bounds its event with its date: on (inside the date), not_before
// (from its first day), not_after (to its last day), between (from the
// first day of its start to the last of its end). Its strength is firm
// unless given, lowered by "?". An order "B after A" is B − A ≥ 0 days
// (same-day work is possible), with at_least and at_most gaps converted by
// date.Duration's MinDays and MaxDays, so that a gap never says more than
// the duration allows.
//
// # Verdicts
//
// The claim's days (widened when approximate) are intersected with the
// event's exact window at each tier. A claim that meets the soft window is
// consistent; one that misses only the soft window is doubtful; one that
// misses the firm window is improbable; one that misses the hard window is
// excluded. Where a tier's evidence conflicts, verdicts are judged at the
// weakest tier that agrees, and the result says so; if even the hard tier
// conflicts the verdict is undetermined.
//
// # Limits
//
// The reasoner trusts the assignment of findings to events: a finding in a
// retouching bounds the retouching, not the original, only if the case file
// says so. It draws nothing from the absence of a material. Every result
// carries [Cautions].
package constraint
