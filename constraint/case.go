package constraint

import (
	"terminus/constraint/date"
	"terminus/constraint/input"
	"terminus/constraint/network"
)

// Pos is a place in a case file: a line and a column, 1-based.
type Pos = input.Pos

// Case is what is known of one object: its events, the materials found,
// the documented dates and the dates claimed for it.
type Case struct {
	File string
	// ID names the object (an inventory or accession number); optional. A
	// number is kept as written.
	ID    string
	Title string
	// Place is where the object was made: an ISO 3166-1 alpha-2 code or a
	// UN M49 area code. Empty: regional arrivals are not used.
	Place    string
	PlacePos Pos
	// Circa overrides the widening of approximate dates, per precision.
	Circa date.Circa
	// StockAllowance is added after a withdrawal date, for stocks that
	// linger; nil uses [DefaultStockAllowance].
	StockAllowance *date.Duration
	Events         []Event
	Findings       []Finding
	Records        []Record
	Claims         []Claim
}

// DefaultStockAllowance is how long a withdrawn material is taken to stay in
// use after the end of its manufacture, unless the dataset or the case says
// otherwise: ten years.
func DefaultStockAllowance() date.Duration { return date.Duration{Years: 10} }

// Event is a moment in the object's history: its making, a retouching, a
// signature.
type Event struct {
	ID    string
	Label string
	// Place overrides the case's place for this event.
	Place    string
	PlacePos Pos
	After    []Order
	Pos      Pos
}

// Order says that an event comes after another, optionally with a gap.
type Order struct {
	ID      string // default "order:EVENT>OTHER"
	Event   string // the earlier event
	AtLeast *date.Duration
	AtMost  *date.Duration
	// Strength is hard unless the case says otherwise.
	Strength network.Tier
	Note     string
	Pos      Pos
}

// Confidence is how sure the identification of a finding is.
type Confidence string

// The confidences and the tier each caps a finding's evidence at.
const (
	Certain  Confidence = "certain"
	Probable Confidence = "probable"
	Possible Confidence = "possible"
)

// Finding is a material identified in the object.
type Finding struct {
	ID         string
	Materials  []string // several: one of them (alternatives)
	MatPos     []Pos
	Event      string
	EventPos   Pos
	Confidence Confidence
	Method     string
	Sample     string
	Note       string
	// Unlisted says that the material is not in the dataset: the finding
	// is reported but bounds nothing, and its names are not looked up.
	Unlisted bool
	Pos      Pos
}

// RecordKind is how a record bounds its event.
type RecordKind string

// The record kinds.
const (
	RecordOn        RecordKind = "on"
	RecordNotBefore RecordKind = "not_before"
	RecordNotAfter  RecordKind = "not_after"
	RecordBetween   RecordKind = "between"
)

// Record is a documented date: an inscription, a sale, an inventory.
type Record struct {
	ID       string
	Event    string
	EventPos Pos
	Kind     RecordKind
	Date     date.Date
	DateText string
	DatePos  Pos
	Strength network.Tier
	Source   string
	Note     string
	Pos      Pos
}

// Claim is a date claimed for an event (by a signature, a dealer, a
// catalogue), to be judged against the evidence.
type Claim struct {
	ID       string
	Event    string
	EventPos Pos
	Date     date.Date
	DateText string
	By       string
	Pos      Pos
}
