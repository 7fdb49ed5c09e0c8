package constraint

import (
	"fmt"
	"strings"

	"gopkg.in/yaml.v3"

	"terminus/constraint/date"
	"terminus/constraint/network"
)

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
var DefaultStockAllowance = date.Duration{Years: 10}

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

var (
	caseKeys    = []string{"id", "title", "place", "circa", "stock_allowance", "events", "findings", "records", "claims"}
	eventKeys   = []string{"id", "label", "place", "after"}
	orderKeys   = []string{"event", "at_least", "at_most", "id", "strength", "note"}
	findingKeys = []string{"id", "material", "event", "confidence", "method", "sample", "note", "unlisted"}
	recordKeys  = []string{"id", "event", "on", "not_before", "not_after", "between", "strength", "source", "note", "calendar"}
	claimKeys   = []string{"id", "event", "date", "by", "calendar"}
	circaKeys   = []string{"day", "month", "season", "year", "decade", "century"}
)

func (d *decoder) caseFile(root *yaml.Node) (*Case, error) {
	f, err := d.fields(root, "case file", caseKeys...)
	if err != nil {
		return nil, err
	}
	c := &Case{}
	if v, ok := f["id"]; ok && !(v.value.Kind == yaml.ScalarNode && v.value.Tag == "!!null") {
		if v.value.Kind != yaml.ScalarNode {
			return nil, d.errAt(v.value, `write the id as text, e.g. id: "inv-1"`, "id: expected text or a number, found %s", kindName(v.value))
		}
		c.ID = v.value.Value
	}
	if v, ok := f["title"]; ok {
		if c.Title, err = d.str(v.value, "title"); err != nil {
			return nil, err
		}
	}
	if v, ok := f["place"]; ok {
		if c.Place, err = d.str(v.value, "place"); err != nil {
			return nil, err
		}
		c.PlacePos = pos(v.value)
	}
	if v, ok := f["circa"]; ok {
		if c.Circa, err = d.circa(v.value); err != nil {
			return nil, err
		}
	}
	if v, ok := f["stock_allowance"]; ok {
		du, err := d.duration(v.value, "stock_allowance")
		if err != nil {
			return nil, err
		}
		c.StockAllowance = &du
	}
	if v, ok := f["events"]; ok {
		items, err := d.list(v.value, "events")
		if err != nil {
			return nil, err
		}
		for _, it := range items {
			e, err := d.event(it)
			if err != nil {
				return nil, err
			}
			c.Events = append(c.Events, e)
		}
	}
	if v, ok := f["findings"]; ok {
		items, err := d.list(v.value, "findings")
		if err != nil {
			return nil, err
		}
		for i, it := range items {
			fi, err := d.finding(it, i)
			if err != nil {
				return nil, err
			}
			c.Findings = append(c.Findings, fi)
		}
	}
	if v, ok := f["records"]; ok {
		items, err := d.list(v.value, "records")
		if err != nil {
			return nil, err
		}
		for i, it := range items {
			r, err := d.record(it, i)
			if err != nil {
				return nil, err
			}
			c.Records = append(c.Records, r)
		}
	}
	if v, ok := f["claims"]; ok {
		items, err := d.list(v.value, "claims")
		if err != nil {
			return nil, err
		}
		for i, it := range items {
			cl, err := d.claim(it, i)
			if err != nil {
				return nil, err
			}
			c.Claims = append(c.Claims, cl)
		}
	}
	return c, nil
}

func (d *decoder) circa(n *yaml.Node) (date.Circa, error) {
	f, err := d.fields(n, "circa", circaKeys...)
	if err != nil {
		return nil, err
	}
	c := date.DefaultCirca()
	for _, k := range circaKeys {
		v, ok := f[k]
		if !ok {
			continue
		}
		p, err := date.ParseCircaKey(k)
		if err != nil {
			return nil, d.errAt(v.key, "", "circa: %v", err)
		}
		du, err := d.duration(v.value, "circa."+k)
		if err != nil {
			return nil, err
		}
		c[p] = du
	}
	return c, nil
}

func (d *decoder) duration(n *yaml.Node, what string) (date.Duration, error) {
	s, err := d.str(n, what)
	if err != nil {
		return date.Duration{}, err
	}
	du, err := date.ParseDuration(s)
	if err != nil {
		return date.Duration{}, d.errAt(n, "write an ISO 8601 duration such as P5Y, P6M, P10D or P1Y6M", "%s: %q is not a duration: %s", what, s, parseMsg(err))
	}
	return du, nil
}

func parseMsg(err error) string {
	if pe, ok := err.(*date.ParseError); ok {
		return pe.Msg
	}
	return err.Error()
}

func (d *decoder) event(n *yaml.Node) (Event, error) {
	if n.Kind == yaml.ScalarNode {
		id, err := d.str(n, "event")
		return Event{ID: id, Pos: pos(n)}, err
	}
	f, err := d.fields(n, "event", eventKeys...)
	if err != nil {
		return Event{}, err
	}
	e := Event{Pos: pos(n)}
	v, ok := f["id"]
	if !ok {
		return Event{}, d.errAt(n, "add 'id: making' (or another short name)", "event: every event needs an id")
	}
	if e.ID, err = d.id(v.value, "event id"); err != nil {
		return Event{}, err
	}
	if v, ok := f["label"]; ok {
		if e.Label, err = d.str(v.value, "label"); err != nil {
			return Event{}, err
		}
	}
	if v, ok := f["place"]; ok {
		if e.Place, err = d.str(v.value, "place"); err != nil {
			return Event{}, err
		}
		e.PlacePos = pos(v.value)
	}
	if v, ok := f["after"]; ok {
		if e.After, err = d.orders(v.value, e.ID); err != nil {
			return Event{}, err
		}
	}
	return e, nil
}

func (d *decoder) id(n *yaml.Node, what string) (string, error) {
	s, err := d.str(n, what)
	if err != nil {
		return "", err
	}
	if strings.TrimSpace(s) == "" || strings.ContainsAny(s, " \t\n") {
		return "", d.errAt(n, "use letters, digits and hyphens, e.g. 'retouch-1'", "%s %q: an id is one word without spaces", what, s)
	}
	return s, nil
}

// orders reads `after: making`, `after: [a, b]` or a list of mappings with gaps.
func (d *decoder) orders(n *yaml.Node, self string) ([]Order, error) {
	var items []*yaml.Node
	if n.Kind == yaml.SequenceNode {
		items, _ = d.list(n, "after")
	} else {
		items = []*yaml.Node{n}
	}
	var out []Order
	for _, it := range items {
		o := Order{Pos: pos(it), Strength: network.Hard}
		if it.Kind == yaml.ScalarNode {
			s, err := d.str(it, "after")
			if err != nil {
				return nil, err
			}
			o.Event = s
		} else {
			f, err := d.fields(it, "after", orderKeys...)
			if err != nil {
				return nil, err
			}
			v, ok := f["event"]
			if !ok {
				return nil, d.errAt(it, "write e.g. {event: making, at_least: P1Y}", "after: each entry names the earlier event with 'event:'")
			}
			if o.Event, err = d.str(v.value, "after.event"); err != nil {
				return nil, err
			}
			o.Pos = pos(v.value)
			if v, ok := f["at_least"]; ok {
				du, err := d.duration(v.value, "at_least")
				if err != nil {
					return nil, err
				}
				o.AtLeast = &du
			}
			if v, ok := f["at_most"]; ok {
				du, err := d.duration(v.value, "at_most")
				if err != nil {
					return nil, err
				}
				o.AtMost = &du
			}
			if v, ok := f["id"]; ok {
				if o.ID, err = d.id(v.value, "order id"); err != nil {
					return nil, err
				}
			}
			if v, ok := f["strength"]; ok {
				if o.Strength, err = d.tier(v.value); err != nil {
					return nil, err
				}
			}
			if v, ok := f["note"]; ok {
				if o.Note, err = d.str(v.value, "note"); err != nil {
					return nil, err
				}
			}
		}
		if o.ID == "" {
			o.ID = fmt.Sprintf("order:%s>%s", self, o.Event)
		}
		out = append(out, o)
	}
	return out, nil
}

func (d *decoder) tier(n *yaml.Node) (network.Tier, error) {
	s, err := d.str(n, "strength")
	if err != nil {
		return 0, err
	}
	switch strings.ToLower(s) {
	case "hard":
		return network.Hard, nil
	case "firm":
		return network.Firm, nil
	case "soft":
		return network.Soft, nil
	}
	return 0, d.errAt(n, didYouMean(s, []string{"hard", "firm", "soft"}), "strength %q: expected hard, firm or soft", s)
}

func (d *decoder) finding(n *yaml.Node, i int) (Finding, error) {
	f, err := d.fields(n, "finding", findingKeys...)
	if err != nil {
		return Finding{}, err
	}
	fi := Finding{Pos: pos(n), Confidence: Certain, ID: fmt.Sprintf("finding-%d", i+1)}
	if v, ok := f["id"]; ok {
		if fi.ID, err = d.id(v.value, "finding id"); err != nil {
			return Finding{}, err
		}
	}
	v, ok := f["material"]
	if !ok {
		return Finding{}, d.errAt(n, "write e.g. 'material: chrome yellow', or a list of alternatives", "finding %s: every finding names a material", fi.ID)
	}
	if fi.Materials, fi.MatPos, err = d.strs(v.value, "material"); err != nil {
		return Finding{}, err
	}
	if v, ok := f["event"]; ok {
		if fi.Event, err = d.str(v.value, "event"); err != nil {
			return Finding{}, err
		}
		fi.EventPos = pos(v.value)
	}
	if v, ok := f["confidence"]; ok {
		s, err := d.str(v.value, "confidence")
		if err != nil {
			return Finding{}, err
		}
		switch c := Confidence(strings.ToLower(s)); c {
		case Certain, Probable, Possible:
			fi.Confidence = c
		default:
			return Finding{}, d.errAt(v.value, didYouMean(s, []string{"certain", "probable", "possible"}), "confidence %q: expected certain, probable or possible", s)
		}
	}
	if v, ok := f["unlisted"]; ok {
		n := deref(v.value)
		if n.Kind != yaml.ScalarNode || n.Tag != "!!bool" {
			return Finding{}, d.errAt(v.value, "write 'unlisted: true' for a material the dataset does not have, or leave it out",
				"finding %s: unlisted: expected true or false, found %s", fi.ID, kindName(v.value))
		}
		fi.Unlisted = n.Value == "true" || n.Value == "True" || n.Value == "TRUE"
	}
	for _, k := range []struct {
		key string
		dst *string
	}{{"method", &fi.Method}, {"sample", &fi.Sample}, {"note", &fi.Note}} {
		if v, ok := f[k.key]; ok {
			if *k.dst, err = d.str(v.value, k.key); err != nil {
				return Finding{}, err
			}
		}
	}
	return fi, nil
}

// dateField parses a date at node n, in the calendar given.
func (d *decoder) dateField(n *yaml.Node, what string, julian bool) (date.Date, string, error) {
	var s string
	if n.Kind == yaml.SequenceNode && len(n.Content) == 2 {
		a, err := d.str(deref(n.Content[0]), what)
		if err != nil {
			return date.Date{}, "", err
		}
		b, err := d.str(deref(n.Content[1]), what)
		if err != nil {
			return date.Date{}, "", err
		}
		s = a + "/" + b
	} else {
		var err error
		if s, err = d.str(n, what); err != nil {
			return date.Date{}, "", err
		}
	}
	var dt date.Date
	var err error
	if julian {
		dt, err = date.ParseIn(s, date.CalendarJulian)
	} else {
		dt, err = date.Parse(s)
	}
	if err != nil {
		col := n.Column
		if pe, ok := err.(*date.ParseError); ok && n.Style == 0 {
			col += pe.Pos
		}
		e := &Error{File: d.file, Line: n.Line, Column: col, Msg: fmt.Sprintf("%s: %q is not a date: %s", what, s, parseMsg(err)),
			Suggest: "write EDTF (1874, 1874-05, 1874-05-21, 1870/1879, 1870~) or e.g. 'c. 1870'; 'terminus date EXPR' shows how a date is read"}
		return date.Date{}, "", e
	}
	return dt, s, nil
}

func (d *decoder) julian(f map[string]field) (bool, error) {
	v, ok := f["calendar"]
	if !ok {
		return false, nil
	}
	s, err := d.str(v.value, "calendar")
	if err != nil {
		return false, err
	}
	switch strings.ToLower(s) {
	case "gregorian":
		return false, nil
	case "julian":
		return true, nil
	}
	return false, d.errAt(v.value, didYouMean(s, []string{"gregorian", "julian"}), "calendar %q: expected gregorian or julian", s)
}

func (d *decoder) record(n *yaml.Node, i int) (Record, error) {
	f, err := d.fields(n, "record", recordKeys...)
	if err != nil {
		return Record{}, err
	}
	r := Record{Pos: pos(n), Strength: network.Firm, ID: fmt.Sprintf("record-%d", i+1)}
	if v, ok := f["id"]; ok {
		if r.ID, err = d.id(v.value, "record id"); err != nil {
			return Record{}, err
		}
	}
	julian, err := d.julian(f)
	if err != nil {
		return Record{}, err
	}
	var kinds []RecordKind
	for _, k := range []RecordKind{RecordOn, RecordNotBefore, RecordNotAfter, RecordBetween} {
		v, ok := f[string(k)]
		if !ok {
			continue
		}
		kinds = append(kinds, k)
		r.Kind = k
		if r.Date, r.DateText, err = d.dateField(v.value, string(k), julian); err != nil {
			return Record{}, err
		}
		r.DatePos = pos(v.value)
	}
	switch len(kinds) {
	case 0:
		return Record{}, d.errAt(n, "add e.g. 'not_after: 1912-06'", "record %s: give one of on, not_before, not_after or between", r.ID)
	case 1:
	default:
		return Record{}, d.errAt(n, "split it into two records", "record %s: give only one of on, not_before, not_after or between (found %d)", r.ID, len(kinds))
	}
	if r.Kind == RecordBetween && len(r.Date.Alternatives) == 1 {
		iv := r.Date.Alternatives[0]
		if !iv.OpenStart && !iv.OpenEnd && iv.First > iv.Last {
			return Record{}, d.errAt(f["between"].value, "write the earlier date first", "record %s: the interval %q ends before it starts", r.ID, r.DateText)
		}
	}
	if v, ok := f["event"]; ok {
		if r.Event, err = d.str(v.value, "event"); err != nil {
			return Record{}, err
		}
		r.EventPos = pos(v.value)
	}
	if v, ok := f["strength"]; ok {
		if r.Strength, err = d.tier(v.value); err != nil {
			return Record{}, err
		}
	}
	if v, ok := f["source"]; ok {
		if r.Source, err = d.str(v.value, "source"); err != nil {
			return Record{}, err
		}
	}
	if v, ok := f["note"]; ok {
		if r.Note, err = d.str(v.value, "note"); err != nil {
			return Record{}, err
		}
	}
	return r, nil
}

func (d *decoder) claim(n *yaml.Node, i int) (Claim, error) {
	f, err := d.fields(n, "claim", claimKeys...)
	if err != nil {
		return Claim{}, err
	}
	c := Claim{Pos: pos(n), ID: fmt.Sprintf("claim-%d", i+1)}
	if v, ok := f["id"]; ok {
		if c.ID, err = d.id(v.value, "claim id"); err != nil {
			return Claim{}, err
		}
	}
	julian, err := d.julian(f)
	if err != nil {
		return Claim{}, err
	}
	v, ok := f["date"]
	if !ok {
		return Claim{}, d.errAt(n, "add e.g. 'date: 1870/1879'", "claim %s: every claim has a date", c.ID)
	}
	if c.Date, c.DateText, err = d.dateField(v.value, "date", julian); err != nil {
		return Claim{}, err
	}
	if v, ok := f["event"]; ok {
		if c.Event, err = d.str(v.value, "event"); err != nil {
			return Claim{}, err
		}
		c.EventPos = pos(v.value)
	}
	if v, ok := f["by"]; ok {
		if c.By, err = d.str(v.value, "by"); err != nil {
			return Claim{}, err
		}
	}
	return c, nil
}
