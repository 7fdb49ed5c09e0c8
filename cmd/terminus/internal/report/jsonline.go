package report

import (
	"strconv"
	"unicode/utf8"

	"terminus/constraint"
	"terminus/constraint/date"
	"terminus/constraint/network"
)

// This file writes the JSON document on one line by hand, for
// surveys that write a million of them: the same fields in the same order
// with the same escaping as encoding/json (SetEscapeHTML(false)), which a
// test checks byte for byte, at a fraction of the cost of reflection.

// AppendJSONLine appends r as one line of JSON (without the newline) to b:
// the bytes [JSONLine] writes.
func AppendJSONLine(b []byte, r *constraint.Result) []byte {
	b = append(b, `{"schema_version":`...)
	b = strconv.AppendInt(b, SchemaVersion, 10)
	b = appendOmitEmpty(b, `,"id":`, r.ID)
	b = append(b, `,"title":`...)
	b = AppendJSONString(b, r.Title)
	b = append(b, `,"file":`...)
	b = AppendJSONString(b, r.File)
	b = append(b, `,"place":`...)
	b = appendOptString(b, r.Place)
	b = append(b, `,"dataset":{"version":`...)
	b = AppendJSONString(b, r.Dataset.Version)
	b = append(b, `,"sha256":`...)
	b = AppendJSONString(b, r.Dataset.SHA256)
	b = append(b, `},"consistent":`...)
	b = appendTiers(b, func(b []byte, t network.Tier) []byte { return strconv.AppendBool(b, r.Consistent[t]) })
	b = append(b, `,"events":[`...)
	for i := range r.Events {
		e := &r.Events[i]
		if i > 0 {
			b = append(b, ',')
		}
		b = append(b, `{"id":`...)
		b = AppendJSONString(b, e.ID)
		b = append(b, `,"label":`...)
		b = AppendJSONString(b, e.Label)
		b = append(b, `,"place":`...)
		b = appendOptString(b, e.Place)
		b = append(b, `,"windows":`...)
		b = appendTiers(b, func(b []byte, t network.Tier) []byte {
			w := e.Windows[t]
			if w == nil {
				return append(b, "null"...)
			}
			b = append(b, `{"earliest":`...)
			b = appendBound(b, &w.Earliest)
			b = append(b, `,"latest":`...)
			b = appendBound(b, &w.Latest)
			b = append(b, `,"intervals":`...)
			b = appendSpans(b, w.Intervals)
			return append(b, '}')
		})
		b = append(b, '}')
	}
	b = append(b, `],"claims":[`...)
	for i := range r.Claims {
		c := &r.Claims[i]
		if i > 0 {
			b = append(b, ',')
		}
		b = append(b, `{"id":`...)
		b = AppendJSONString(b, c.ID)
		b = append(b, `,"event":`...)
		b = AppendJSONString(b, c.Event)
		b = append(b, `,"date":`...)
		b = AppendJSONString(b, c.Date)
		if c.By != "" {
			b = append(b, `,"by":`...)
			b = AppendJSONString(b, c.By)
		}
		b = append(b, `,"verdict":`...)
		b = AppendJSONString(b, string(c.Verdict))
		b = append(b, `,"judged_at":`...)
		if c.Verdict != constraint.Undetermined {
			b = appendOptString(b, c.JudgedAt.String())
		} else {
			b = append(b, "null"...)
		}
		b = append(b, `,"deciding":`...)
		b = appendStrings(b, c.Deciding)
		b = append(b, `,"deciding_each_alone":`...)
		b = strconv.AppendBool(b, c.DecidingEachAlone)
		b = append(b, `,"sentence":`...)
		b = AppendJSONString(b, c.Sentence)
		b = append(b, `,"surviving":`...)
		b = appendTiers(b, func(b []byte, t network.Tier) []byte {
			s := c.Surviving[t]
			if len(s) == 0 {
				return append(b, "null"...)
			}
			first, last := s[0], s[len(s)-1]
			b = append(b, '[')
			b = appendDay(b, first.First, !first.OpenStart)
			b = append(b, ',')
			b = appendDay(b, last.Last, !last.OpenEnd)
			return append(b, ']')
		})
		b = append(b, `,"surviving_intervals":`...)
		b = appendTiers(b, func(b []byte, t network.Tier) []byte {
			if len(c.Surviving[t]) == 0 {
				return append(b, "null"...)
			}
			return appendSpans(b, c.Surviving[t])
		})
		if c.Note != "" {
			b = append(b, `,"note":`...)
			b = AppendJSONString(b, c.Note)
		}
		b = append(b, '}')
	}
	b = append(b, `],"conflicts":[`...)
	for i := range r.Conflicts {
		c := &r.Conflicts[i]
		if i > 0 {
			b = append(b, ',')
		}
		b = append(b, `{"tier":`...)
		b = AppendJSONString(b, c.Tier.String())
		b = append(b, `,"evidence":`...)
		b = appendStrings(b, c.Evidence)
		b = append(b, `,"steps":`...)
		b = appendSteps(b, c.Steps)
		b = append(b, '}')
	}
	b = append(b, `],"conflicts_complete":`...)
	b = appendTiers(b, func(b []byte, t network.Tier) []byte { return strconv.AppendBool(b, r.ConflictsComplete[t]) })
	b = append(b, `,"corrections":[`...)
	for i := range r.Corrections {
		c := &r.Corrections[i]
		if i > 0 {
			b = append(b, ',')
		}
		b = append(b, `{"tier":`...)
		b = AppendJSONString(b, c.Tier.String())
		b = append(b, `,"remove":`...)
		b = appendStrings(b, c.Evidence)
		b = append(b, `,"cheapest":`...)
		b = strconv.AppendBool(b, c.Cheapest)
		b = append(b, '}')
	}
	b = append(b, `],"evidence":[`...)
	for i := range r.Evidence {
		e := &r.Evidence[i]
		if i > 0 {
			b = append(b, ',')
		}
		b = append(b, `{"id":`...)
		b = AppendJSONString(b, e.ID)
		b = append(b, `,"kind":`...)
		b = AppendJSONString(b, e.Kind)
		b = append(b, `,"event":`...)
		b = AppendJSONString(b, e.Event)
		b = append(b, `,"what":`...)
		b = AppendJSONString(b, e.What)
		b = appendOmitEmpty(b, `,"method":`, e.Method)
		b = appendOmitEmpty(b, `,"sample":`, e.Sample)
		b = appendOmitEmpty(b, `,"confidence":`, e.Confidence)
		b = append(b, `,"bounds":[`...)
		for j := range e.Bounds {
			eb := &e.Bounds[j]
			if j > 0 {
				b = append(b, ',')
			}
			b = append(b, `{"side":`...)
			b = AppendJSONString(b, eb.Side)
			b = append(b, `,"date":`...)
			b = AppendJSONString(b, eb.Date)
			b = append(b, `,"tier":`...)
			b = AppendJSONString(b, eb.Tier.String())
			b = appendOmitEmpty(b, `,"milestone":`, eb.Milestone)
			b = appendOmitEmpty(b, `,"material":`, eb.Material)
			b = appendOmitEmpty(b, `,"source":`, eb.Source)
			if eb.Side != "after" {
				b = append(b, `,"precision":`...)
				b = AppendJSONString(b, eb.Precision.String())
			}
			b = append(b, '}')
		}
		b = append(b, ']')
		b = appendOmitEmpty(b, `,"source":`, e.Source)
		if e.Unlisted {
			b = append(b, `,"unlisted":true`...)
		}
		b = append(b, '}')
	}
	b = append(b, `],"disagreements":[`...)
	for i := range r.Disagreements {
		d := &r.Disagreements[i]
		if i > 0 {
			b = append(b, ',')
		}
		b = append(b, `{"material":`...)
		b = AppendJSONString(b, d.Material)
		b = append(b, `,"milestone":`...)
		b = AppendJSONString(b, d.Kind)
		b = append(b, `,"place":`...)
		b = appendOptString(b, d.Place)
		b = append(b, `,"claims":`...)
		b = appendStrings(b, d.Claims)
		b = append(b, `,"used":`...)
		b = AppendJSONString(b, d.Used)
		b = append(b, `,"changes_verdict":`...)
		b = strconv.AppendBool(b, d.ChangesVerdict)
		b = append(b, `,"text":`...)
		b = AppendJSONString(b, d.Text)
		b = append(b, '}')
	}
	b = append(b, `],"sources":[`...)
	for i := range r.Sources {
		s := &r.Sources[i]
		if i > 0 {
			b = append(b, ',')
		}
		b = append(b, `{"key":`...)
		b = AppendJSONString(b, s.Key)
		b = append(b, `,"cite":`...)
		b = AppendJSONString(b, s.Cite)
		b = appendOmitEmpty(b, `,"url":`, s.URL)
		b = append(b, '}')
	}
	b = append(b, `],"notes":`...)
	b = appendStrings(b, r.Notes)
	b = append(b, `,"cautions":`...)
	b = appendStrings(b, r.Cautions)
	return append(b, '}')
}

// appendTiers writes {"hard":…,"firm":…,"soft":…}.
func appendTiers(b []byte, value func([]byte, network.Tier) []byte) []byte {
	b = append(b, `{"hard":`...)
	b = value(b, network.Hard)
	b = append(b, `,"firm":`...)
	b = value(b, network.Firm)
	b = append(b, `,"soft":`...)
	b = value(b, network.Soft)
	return append(b, '}')
}

func appendBound(b []byte, bd *constraint.Bound) []byte {
	b = append(b, `{"date":`...)
	if bd.Bounded {
		b = appendDay(b, bd.Day, true)
		b = append(b, `,"year":`...)
		b = strconv.AppendInt(b, bd.Day.Year(), 10)
		b = append(b, `,"precision":`...)
		b = AppendJSONString(b, bd.Precision.String())
	} else {
		b = append(b, `null,"year":null,"precision":null`...)
	}
	because, chain, from := chainOf(bd)
	b = append(b, `,"because":`...)
	b = appendStrings(b, because)
	b = append(b, `,"chain":`...)
	b = appendSteps(b, chain)
	b = append(b, `,"from":`...)
	b = appendOptString(b, from)
	b = append(b, `,"steps":`...)
	b = strconv.AppendInt(b, int64(len(bd.Chain)), 10)
	return append(b, '}')
}

// maxJSONChain is the longest chain the JSON writes whole in each bound.
// A longer one that continues another event's bound (through an order)
// is written as a reference: "from" names that event (its bound at the
// same tier and side comes first), "because" and "chain" hold this
// bound's own steps and "steps" counts them all, so that the document
// grows with the case, not with its square.
const maxJSONChain = 8

// chainOf is what the JSON writes of a bound's chain: the ids, the steps
// and the event it continues ("" when written whole).
func chainOf(bd *constraint.Bound) (because []string, chain []constraint.Step, from string) {
	if bd.From == "" || len(bd.Chain) <= maxJSONChain {
		return bd.Because, bd.Chain, ""
	}
	chain = bd.Chain[bd.Own:]
	for _, s := range chain {
		if len(because) == 0 || because[len(because)-1] != s.Evidence {
			because = append(because, s.Evidence)
		}
	}
	return because, chain, bd.From
}

func appendSteps(b []byte, steps []constraint.Step) []byte {
	b = append(b, '[')
	for i := range steps {
		if i > 0 {
			b = append(b, ',')
		}
		b = append(b, `{"evidence":`...)
		b = AppendJSONString(b, steps[i].Evidence)
		b = append(b, `,"text":`...)
		b = AppendJSONString(b, steps[i].Text)
		b = append(b, '}')
	}
	return append(b, ']')
}

func appendSpans(b []byte, list []constraint.Span) []byte {
	b = append(b, '[')
	for i, s := range list {
		if i > 0 {
			b = append(b, ',')
		}
		b = append(b, '[')
		b = appendDay(b, s.First, !s.OpenStart)
		b = append(b, ',')
		b = appendDay(b, s.Last, !s.OpenEnd)
		b = append(b, ']')
	}
	return append(b, ']')
}

// appendDay writes a day as an ISO 8601 string, or null when !ok.
func appendDay(b []byte, d date.Day, ok bool) []byte {
	if !ok {
		return append(b, "null"...)
	}
	b = append(b, '"')
	b = d.AppendISO(b)
	return append(b, '"')
}

// appendStrings writes a list of strings; nil is written [], as nonNil does.
func appendStrings(b []byte, list []string) []byte {
	b = append(b, '[')
	for i, s := range list {
		if i > 0 {
			b = append(b, ',')
		}
		b = AppendJSONString(b, s)
	}
	return append(b, ']')
}

// appendOptString writes s, or null when it is empty (as strPtr does).
func appendOptString(b []byte, s string) []byte {
	if s == "" {
		return append(b, "null"...)
	}
	return AppendJSONString(b, s)
}

// appendOmitEmpty writes key and s unless s is empty (omitempty).
func appendOmitEmpty(b []byte, key, s string) []byte {
	if s == "" {
		return b
	}
	b = append(b, key...)
	return AppendJSONString(b, s)
}

const hexDigits = "0123456789abcdef"

// plain8 reports whether none of the eight bytes of w needs escaping or
// decoding: each is at least 0x20, below 0x80, and neither '"' nor '\\'.
// (The classic "has a zero byte" test, (x - 0x01…) & ^x & 0x80…, applied
// to w ^ '"'…, to w ^ '\\'…, and to w - 0x20… for the small bytes.)
func plain8(w uint64) bool {
	const ones, highs = 0x0101010101010101, 0x8080808080808080
	q, bs := w^('"'*ones), w^('\\'*ones)
	small := (w - 0x20*ones) & ^w
	quote := (q - ones) & ^q
	backslash := (bs - ones) & ^bs
	return (small|quote|backslash|w)&highs == 0
}

// AppendJSONString appends s as a JSON string, escaped as encoding/json
// does with HTML escaping off: quote, backslash and the control characters
// escaped (\b \f \n \r \t by name, the rest as \u00XX), invalid UTF-8 as
// \ufffd, and U+2028 and U+2029 escaped for JavaScript.
func AppendJSONString(b []byte, s string) []byte {
	b = append(b, '"')
	start := 0
	for i := 0; i < len(s); {
		// Skip eight plain bytes at a time: none below 0x20, none a quote
		// or a backslash, none with the high bit set.
		for i+8 <= len(s) && plain8(uint64(s[i])|uint64(s[i+1])<<8|uint64(s[i+2])<<16|uint64(s[i+3])<<24|
			uint64(s[i+4])<<32|uint64(s[i+5])<<40|uint64(s[i+6])<<48|uint64(s[i+7])<<56) {
			i += 8
		}
		if i >= len(s) {
			break
		}
		c := s[i]
		if c < utf8.RuneSelf {
			if c >= 0x20 && c != '"' && c != '\\' {
				i++
				continue
			}
			b = append(b, s[start:i]...)
			switch c {
			case '"', '\\':
				b = append(b, '\\', c)
			case '\b':
				b = append(b, '\\', 'b')
			case '\f':
				b = append(b, '\\', 'f')
			case '\n':
				b = append(b, '\\', 'n')
			case '\r':
				b = append(b, '\\', 'r')
			case '\t':
				b = append(b, '\\', 't')
			default:
				b = append(b, '\\', 'u', '0', '0', hexDigits[c>>4], hexDigits[c&0xF])
			}
			i++
			start = i
			continue
		}
		r, size := utf8.DecodeRuneInString(s[i:])
		if r == utf8.RuneError && size == 1 {
			b = append(b, s[start:i]...)
			b = append(b, `\ufffd`...)
			i += size
			start = i
			continue
		}
		if r == '\u2028' || r == '\u2029' {
			b = append(b, s[start:i]...)
			b = append(b, '\\', 'u', '2', '0', '2', hexDigits[r&0xF])
			i += size
			start = i
			continue
		}
		i += size
	}
	b = append(b, s[start:]...)
	return append(b, '"')
}
