package casefile

import (
	"fmt"
	"strings"

	"terminus/constraint"
	"terminus/constraint/date"
	"terminus/constraint/input"
	"terminus/constraint/network"
)

// The keys each part of a case file may have.
var (
	caseKeys    = []string{"id", "title", "place", "circa", "stock_allowance", "year_start", "events", "findings", "records", "claims"}
	eventKeys   = []string{"id", "label", "place", "after"}
	orderKeys   = []string{"event", "at_least", "at_most", "id", "strength", "note"}
	findingKeys = []string{"id", "material", "event", "confidence", "method", "sample", "note", "unlisted"}
	recordKeys  = []string{"id", "event", "on", "not_before", "not_after", "between", "strength", "source", "note", "calendar", "year_start"}
	claimKeys   = []string{"id", "event", "date", "by", "calendar", "year_start"}
	circaKeys   = []string{"day", "month", "season", "year", "decade", "century"}
)

func (d *decoder) caseFile(root *input.Node) (*constraint.Case, error) {
	f, err := d.fields(root, "case file", caseKeys)
	if err != nil {
		return nil, err
	}
	c := &constraint.Case{}
	if v, ok := f.Given("id"); ok && !v.Value.IsNull() {
		if v.Value.Kind != input.Scalar {
			return nil, d.errAt(v.Value, `write the id as text, e.g. id: "inv-1"`, "id: expected text or a number, found %s", v.Value.Describe())
		}
		c.ID = v.Value.Value
	}
	if v, ok := f.Given("title"); ok {
		if c.Title, err = d.str(v.Value, "title"); err != nil {
			return nil, err
		}
	}
	if v, ok := f.Given("place"); ok {
		if c.Place, err = d.str(v.Value, "place"); err != nil {
			return nil, err
		}
		c.PlacePos = v.Value.Pos()
	}
	if v, ok := f.Given("circa"); ok {
		if c.Circa, err = d.circa(v.Value); err != nil {
			return nil, err
		}
	}
	if v, ok := f.Given("year_start"); ok {
		if d.yearStart, err = d.yearStartOf(v.Value); err != nil {
			return nil, err
		}
	}
	if v, ok := f.Given("stock_allowance"); ok {
		du, err := d.duration(v.Value, "stock_allowance")
		if err != nil {
			return nil, err
		}
		c.StockAllowance = &du
	}
	if v, ok := f.Given("events"); ok {
		items, err := d.list(v.Value, "events")
		if err != nil {
			return nil, err
		}
		for _, it := range items {
			d.eventIndex = len(c.Events)
			e, err := d.event(it)
			if err != nil {
				return nil, err
			}
			c.Events = append(c.Events, e)
		}
	}
	if v, ok := f.Given("findings"); ok {
		items, err := d.list(v.Value, "findings")
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
	if v, ok := f.Given("records"); ok {
		items, err := d.list(v.Value, "records")
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
	if v, ok := f.Given("claims"); ok {
		items, err := d.list(v.Value, "claims")
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
	d.name(c)
	return c, nil
}

func (d *decoder) circa(n *input.Node) (date.Circa, error) {
	f, err := d.fields(n, "circa", circaKeys)
	if err != nil {
		return nil, err
	}
	c := date.DefaultCirca()
	for _, k := range circaKeys {
		v, ok := f.Given(k)
		if !ok {
			continue
		}
		p, err := date.ParseCircaKey(k)
		if err != nil {
			return nil, d.errAt(v.Key, "", "circa: %v", err)
		}
		du, err := d.duration(v.Value, "circa."+k)
		if err != nil {
			return nil, err
		}
		c[p] = du
	}
	return c, nil
}

func (d *decoder) duration(n *input.Node, what string) (date.Duration, error) {
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

func (d *decoder) event(n *input.Node) (constraint.Event, error) {
	if n.Kind == input.Scalar {
		id, err := d.str(n, "event")
		return constraint.Event{ID: id, Pos: n.Pos()}, err
	}
	f, err := d.fields(n, "event", eventKeys)
	if err != nil {
		return constraint.Event{}, err
	}
	e := constraint.Event{Pos: n.Pos()}
	v, ok := f.Given("id")
	if !ok {
		return constraint.Event{}, d.errAt(n, "add 'id: making' (or another short name)", "event: every event needs an id")
	}
	if e.ID, err = d.id(v.Value, "event id"); err != nil {
		return constraint.Event{}, err
	}
	if v, ok := f.Given("label"); ok {
		if e.Label, err = d.str(v.Value, "label"); err != nil {
			return constraint.Event{}, err
		}
	}
	if v, ok := f.Given("place"); ok {
		if e.Place, err = d.str(v.Value, "place"); err != nil {
			return constraint.Event{}, err
		}
		e.PlacePos = v.Value.Pos()
	}
	if v, ok := f.Given("after"); ok {
		if e.After, err = d.orders(v.Value, e.ID); err != nil {
			return constraint.Event{}, err
		}
	}
	return e, nil
}

func (d *decoder) id(n *input.Node, what string) (string, error) {
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
func (d *decoder) orders(n *input.Node, self string) ([]constraint.Order, error) {
	// An order without an id is named after its events; a name that is
	// taken gets a number (see named).
	items := []*input.Node{n}
	if n.Kind == input.Sequence {
		items = n.Content
	}
	var out []constraint.Order
	for _, it := range items {
		o := constraint.Order{Pos: it.Pos(), Strength: network.Hard}
		if it.Kind == input.Scalar {
			s, err := d.str(it, "after")
			if err != nil {
				return nil, err
			}
			o.Event = s
		} else {
			f, err := d.fields(it, "after", orderKeys)
			if err != nil {
				return nil, err
			}
			v, ok := f.Given("event")
			if !ok {
				return nil, d.errAt(it, "write e.g. {event: making, at_least: P1Y}", "after: each entry names the earlier event with 'event:'")
			}
			if o.Event, err = d.str(v.Value, "after.event"); err != nil {
				return nil, err
			}
			o.Pos = v.Value.Pos()
			if v, ok := f.Given("at_least"); ok {
				du, err := d.duration(v.Value, "at_least")
				if err != nil {
					return nil, err
				}
				o.AtLeast = &du
			}
			if v, ok := f.Given("at_most"); ok {
				du, err := d.duration(v.Value, "at_most")
				if err != nil {
					return nil, err
				}
				o.AtMost = &du
			}
			if v, ok := f.Given("id"); ok {
				if o.ID, err = d.id(v.Value, "order id"); err != nil {
					return nil, err
				}
			}
			if v, ok := f.Given("strength"); ok {
				if o.Strength, err = d.tier(v.Value); err != nil {
					return nil, err
				}
			}
			if v, ok := f.Given("note"); ok {
				if o.Note, err = d.str(v.Value, "note"); err != nil {
					return nil, err
				}
			}
		}
		if o.ID == "" {
			o.ID = fmt.Sprintf("order:%s>%s", self, o.Event)
			d.unnamed = append(d.unnamed, unnamed{kind: orderID, event: d.eventIndex, index: len(out)})
		}
		out = append(out, o)
	}
	return out, nil
}

func (d *decoder) tier(n *input.Node) (network.Tier, error) {
	s, err := d.str(n, "strength")
	if err != nil {
		return 0, err
	}
	t, err := network.ParseTier(s)
	if err != nil {
		return 0, d.errAt(n, input.DidYouMean(s, []string{"hard", "firm", "soft"}), "strength %q: expected hard, firm or soft", s)
	}
	return t, nil
}

func (d *decoder) finding(n *input.Node, i int) (constraint.Finding, error) {
	f, err := d.fields(n, "finding", findingKeys)
	if err != nil {
		return constraint.Finding{}, err
	}
	fi := constraint.Finding{Pos: n.Pos(), Confidence: constraint.Certain, ID: fmt.Sprintf("finding-%d", i+1)}
	if v, ok := f.Given("id"); ok {
		if fi.ID, err = d.id(v.Value, "finding id"); err != nil {
			return constraint.Finding{}, err
		}
	} else {
		d.unnamed = append(d.unnamed, unnamed{kind: findingID, index: i})
	}
	v, ok := f.Given("material")
	if !ok {
		return constraint.Finding{}, d.errAt(n, "write e.g. 'material: chrome yellow', or a list of alternatives", "finding %s: every finding names a material", fi.ID)
	}
	if fi.Materials, fi.MatPos, err = d.strs(v.Value, "material"); err != nil {
		return constraint.Finding{}, err
	}
	if v, ok := f.Given("event"); ok {
		if fi.Event, err = d.str(v.Value, "event"); err != nil {
			return constraint.Finding{}, err
		}
		fi.EventPos = v.Value.Pos()
	}
	if v, ok := f.Given("confidence"); ok {
		s, err := d.str(v.Value, "confidence")
		if err != nil {
			return constraint.Finding{}, err
		}
		switch c := constraint.Confidence(strings.ToLower(s)); c {
		case constraint.Certain, constraint.Probable, constraint.Possible:
			fi.Confidence = c
		default:
			return constraint.Finding{}, d.errAt(v.Value, input.DidYouMean(s, []string{"certain", "probable", "possible"}), "confidence %q: expected certain, probable or possible", s)
		}
	}
	if v, ok := f.Given("unlisted"); ok {
		n := v.Value
		if n.Kind != input.Scalar || n.Type != input.Bool {
			return constraint.Finding{}, d.errAt(v.Value, "write 'unlisted: true' for a material the dataset does not have, or leave it out",
				"finding %s: unlisted: expected true or false, found %s", fi.ID, n.Describe())
		}
		fi.Unlisted = n.Value == "true" || n.Value == "True" || n.Value == "TRUE"
	}
	for _, k := range []struct {
		key string
		dst *string
	}{{"method", &fi.Method}, {"sample", &fi.Sample}, {"note", &fi.Note}} {
		if v, ok := f.Given(k.key); ok {
			if *k.dst, err = d.str(v.Value, k.key); err != nil {
				return constraint.Finding{}, err
			}
		}
	}
	return fi, nil
}

// dateField parses a date at node n with the reading options given (the
// calendar and year start of its entry or of the case).
func (d *decoder) dateField(n *input.Node, what string, opt date.Options) (date.Date, string, error) {
	var s string
	if n.Kind == input.Sequence && len(n.Content) == 2 {
		a, err := d.str(n.Content[0], what)
		if err != nil {
			return date.Date{}, "", err
		}
		b, err := d.str(n.Content[1], what)
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
	dt, err := date.ParseWith(s, opt)
	if err != nil {
		col := int(n.Column)
		if pe, ok := err.(*date.ParseError); ok && !n.Quoted {
			col += pe.Pos
		}
		e := &input.Error{File: d.file, Line: int(n.Line), Column: col, Msg: fmt.Sprintf("%s: %s is not a date: %s", what, input.Quote(s), parseMsg(err)),
			Suggestion: "write EDTF (1874, 1874-05, 1874-05-21, 1870/1879, 1870~) or e.g. 'c. 1870', '18th century', 'Meiji 14'; 'terminus date EXPR' shows how a date is read"}
		if h := hintOf(err); h != "" {
			e.Suggestion = h + "; 'terminus date EXPR' shows how a date is read"
		}
		return date.Date{}, "", e
	}
	return dt, s, nil
}

// hintOf is a date error's own suggestion, if it has one.
func hintOf(err error) string {
	if h, ok := err.(interface{ Hint() string }); ok {
		return h.Hint()
	}
	return ""
}

// dateOptions reads an entry's calendar and year start, over the case's
// year start.
func (d *decoder) dateOptions(f *input.Fields) (date.Options, error) {
	opt := date.Options{YearStart: d.yearStart}
	if v, ok := f.Given("calendar"); ok {
		s, err := d.str(v.Value, "calendar")
		if err != nil {
			return opt, err
		}
		if opt.Calendar, err = date.ParseCalendar(s); err != nil {
			return opt, d.errAt(v.Value, input.DidYouMean(s, date.CalendarNames()), "calendar %s: %s", input.Quote(s), parseMsg(err))
		}
	}
	if v, ok := f.Given("year_start"); ok {
		ys, err := d.yearStartOf(v.Value)
		if err != nil {
			return opt, err
		}
		opt.YearStart = ys
	}
	return opt, nil
}

// yearStartOf reads a year start: "25 March", "1 January" …
func (d *decoder) yearStartOf(n *input.Node) (date.YearStart, error) {
	s, err := d.str(n, "year_start")
	if err != nil {
		return 0, err
	}
	ys, err := date.ParseYearStart(s)
	if err != nil {
		return 0, d.errAt(n, "write the day the year began: 25 March (England before 1752), 1 January, 1 March or 25 December", "year_start %s: %s", input.Quote(s), parseMsg(err))
	}
	return ys, nil
}

func (d *decoder) record(n *input.Node, i int) (constraint.Record, error) {
	f, err := d.fields(n, "record", recordKeys)
	if err != nil {
		return constraint.Record{}, err
	}
	r := constraint.Record{Pos: n.Pos(), Strength: network.Firm, ID: fmt.Sprintf("record-%d", i+1)}
	if v, ok := f.Given("id"); ok {
		if r.ID, err = d.id(v.Value, "record id"); err != nil {
			return constraint.Record{}, err
		}
	} else {
		d.unnamed = append(d.unnamed, unnamed{kind: recordID, index: i})
	}
	opt, err := d.dateOptions(f)
	if err != nil {
		return constraint.Record{}, err
	}
	var kinds []constraint.RecordKind
	for _, k := range []constraint.RecordKind{constraint.RecordOn, constraint.RecordNotBefore, constraint.RecordNotAfter, constraint.RecordBetween} {
		v, ok := f.Given(string(k))
		if !ok {
			continue
		}
		kinds = append(kinds, k)
		r.Kind = k
		if r.Date, r.DateText, err = d.dateField(v.Value, string(k), opt); err != nil {
			return constraint.Record{}, err
		}
		r.DatePos = v.Value.Pos()
	}
	switch len(kinds) {
	case 0:
		return constraint.Record{}, d.errAt(n, "add e.g. 'not_after: 1912-06'", "record %s: give one of on, not_before, not_after or between", r.ID)
	case 1:
	default:
		return constraint.Record{}, d.errAt(n, "split it into two records", "record %s: give only one of on, not_before, not_after or between (found %d)", r.ID, len(kinds))
	}
	if r.Kind == constraint.RecordBetween && len(r.Date.Alternatives) == 1 {
		iv := r.Date.Alternatives[0]
		if !iv.OpenStart && !iv.OpenEnd && iv.First > iv.Last {
			return constraint.Record{}, d.errAt(f.At("between").Value, "write the earlier date first", "record %s: the interval %q ends before it starts", r.ID, r.DateText)
		}
	}
	if v, ok := f.Given("event"); ok {
		if r.Event, err = d.str(v.Value, "event"); err != nil {
			return constraint.Record{}, err
		}
		r.EventPos = v.Value.Pos()
	}
	if v, ok := f.Given("strength"); ok {
		if r.Strength, err = d.tier(v.Value); err != nil {
			return constraint.Record{}, err
		}
	}
	if v, ok := f.Given("source"); ok {
		if r.Source, err = d.str(v.Value, "source"); err != nil {
			return constraint.Record{}, err
		}
	}
	if v, ok := f.Given("note"); ok {
		if r.Note, err = d.str(v.Value, "note"); err != nil {
			return constraint.Record{}, err
		}
	}
	return r, nil
}

func (d *decoder) claim(n *input.Node, i int) (constraint.Claim, error) {
	f, err := d.fields(n, "claim", claimKeys)
	if err != nil {
		return constraint.Claim{}, err
	}
	c := constraint.Claim{Pos: n.Pos(), ID: fmt.Sprintf("claim-%d", i+1)}
	if v, ok := f.Given("id"); ok {
		if c.ID, err = d.id(v.Value, "claim id"); err != nil {
			return constraint.Claim{}, err
		}
	} else {
		d.unnamed = append(d.unnamed, unnamed{kind: claimID, index: i})
	}
	opt, err := d.dateOptions(f)
	if err != nil {
		return constraint.Claim{}, err
	}
	v, ok := f.Given("date")
	if !ok {
		return constraint.Claim{}, d.errAt(n, "add e.g. 'date: 1870/1879'", "claim %s: every claim has a date", c.ID)
	}
	if c.Date, c.DateText, err = d.dateField(v.Value, "date", opt); err != nil {
		return constraint.Claim{}, err
	}
	if v, ok := f.Given("event"); ok {
		if c.Event, err = d.str(v.Value, "event"); err != nil {
			return constraint.Claim{}, err
		}
		c.EventPos = v.Value.Pos()
	}
	if v, ok := f.Given("by"); ok {
		if c.By, err = d.str(v.Value, "by"); err != nil {
			return constraint.Claim{}, err
		}
	}
	return c, nil
}
