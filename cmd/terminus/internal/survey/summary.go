package survey

import (
	"errors"
	"fmt"
	"strings"

	"terminus/constraint"
	"terminus/constraint/network"
	"terminus/constraint/wording"
)

// Status is what became of one record: the worst verdict among its claims,
// or that it has none, or that it could not be read.
type Status string

// The statuses, from the worst to the best; Error and Parsed are not
// verdicts.
const (
	StatusExcluded     Status = Status(constraint.Excluded)
	StatusUndetermined Status = Status(constraint.Undetermined)
	StatusImprobable   Status = Status(constraint.Improbable)
	StatusDoubtful     Status = Status(constraint.Doubtful)
	StatusConsistent   Status = Status(constraint.Consistent)
	StatusNoClaim      Status = "no claim"
	StatusError        Status = "error"
	// StatusParsed marks a record read in a parse-only pass.
	StatusParsed Status = "parsed"
)

// Statuses lists the statuses in report order: the records that need a
// look first.
func Statuses() []Status {
	return []Status{StatusExcluded, StatusUndetermined, StatusImprobable, StatusDoubtful, StatusError, StatusConsistent, StatusNoClaim, StatusParsed}
}

func (s Status) rank() int {
	for i, x := range Statuses() {
		if x == s {
			return i
		}
	}
	return len(Statuses())
}

// Summary is the short account of one record that the csv, md and html
// outputs show.
type Summary struct {
	Status Status
	Title  string
	// Claims is each claim with its verdict: "1870/1879 improbable".
	Claims string
	// Event is the event whose windows are shown: that of the first claim,
	// else the first event.
	Event string
	// Windows holds per tier (hard, firm, soft) the earliest and latest
	// day: ISO 8601, ".." when unbounded, "conflict" when the tier's
	// evidence contradicts itself. WindowsText holds the same as people
	// write it, at the precision of the evidence ("1200 BCE", "1658",
	// "open"), for the summaries people read.
	Windows     [3][2]string
	WindowsText [3][2]string
	// Deciding names the evidence that rules out each claim that is not
	// consistent: "finding-2 (Prussian blue)".
	Deciding string
	// Conflicts lists the tiers whose evidence conflicts, with a minimal
	// conflicting set each: "soft: finding-1, not-after".
	Conflicts string
	// Unbounded is true when no evidence bounds the shown event at any
	// tier: its claims are consistent only because nothing speaks to them.
	Unbounded bool
	// Unlisted counts the record's findings of materials not in the
	// dataset, which bound nothing.
	Unlisted int
	// Fails is true when the record counts toward exit status 1.
	Fails bool
	// Err and Hint describe a record error.
	Err, Hint string
}

func summarize(r *constraint.Result, fails bool) Summary {
	s := Summary{Title: r.Title, Fails: fails, Status: StatusConsistent}
	if len(r.Claims) == 0 {
		s.Status = StatusNoClaim
	}
	what := map[string]string{}
	for _, e := range r.Evidence {
		what[e.ID] = e.What
		if e.Unlisted {
			s.Unlisted++
		}
	}
	var claims, deciding []string
	for _, c := range r.Claims {
		claims = append(claims, c.DateText+" "+string(c.Verdict))
		if Status(c.Verdict).rank() < s.Status.rank() {
			s.Status = Status(c.Verdict)
		}
		if len(c.Deciding) == 0 {
			continue
		}
		ids := make([]string, len(c.Deciding))
		for i, id := range c.Deciding {
			ids[i] = id
			if w := what[id]; w != "" {
				ids[i] += " (" + w + ")"
			}
		}
		d := strings.Join(ids, ", ")
		if len(r.Claims) > 1 {
			d = c.ID + ": " + d
		}
		deciding = append(deciding, d)
	}
	s.Claims = strings.Join(claims, "; ")
	s.Deciding = strings.Join(deciding, "; ")
	ev := -1
	if len(r.Claims) > 0 {
		for i, e := range r.Events {
			if e.ID == r.Claims[0].Event {
				ev = i
			}
		}
	}
	if ev < 0 && len(r.Events) > 0 {
		ev = 0
	}
	if ev >= 0 {
		e := r.Events[ev]
		s.Event = e.ID
		for t, w := range e.Windows {
			if w == nil {
				s.Windows[t] = [2]string{"conflict", "conflict"}
				s.WindowsText[t] = s.Windows[t]
				continue
			}
			s.Windows[t] = [2]string{boundText(w.Earliest), boundText(w.Latest)}
			s.WindowsText[t] = [2]string{peopleText(w.Earliest, false), peopleText(w.Latest, true)}
		}
		s.Unbounded = s.Windows[network.Soft] == [2]string{"..", ".."}
	}
	var conflicts []string
	seen := map[network.Tier]bool{}
	for _, c := range r.Conflicts {
		if seen[c.Tier] {
			continue
		}
		seen[c.Tier] = true
		conflicts = append(conflicts, c.Tier.String()+": "+strings.Join(c.Evidence, ", "))
	}
	s.Conflicts = strings.Join(conflicts, "; ")
	return s
}

// peopleText shows a bound as people write it, at its precision.
func peopleText(b constraint.Bound, upper bool) string {
	if !b.Bounded {
		return "open"
	}
	return wording.BoundAt(b.Day, upper, b.Precision)
}

func boundText(b constraint.Bound) string {
	if !b.Bounded {
		return ".."
	}
	return b.Day.ISO()
}

func errorSummary(err error) Summary {
	s := Summary{Status: StatusError, Err: err.Error(), Fails: true}
	var h interface{ Hint() string }
	if errors.As(err, &h) {
		s.Hint = h.Hint()
	}
	return s
}

// Counts are the totals of a survey. Every physical line read is
// accounted for: Lines = HeaderLines + BlankLines + RecordLines, and every
// record is judged or an error: Records = Judged() + Errors() (see
// [Counts.Balanced] and [Counts.Accounting]).
type Counts struct {
	// Records counts the output records, one per input record.
	Records int
	// Lines counts the physical lines read; HeaderLines the CSV header
	// rows and BlankLines the lines with nothing but spaces and tabs among
	// them; RecordLines the lines of the records, judged or errors.
	Lines, HeaderLines, BlankLines, RecordLines int
	// ByStatus counts the records by [Status].
	ByStatus map[Status]int
	// Conflicting counts the records whose evidence conflicts at some tier.
	Conflicting int
	// Failing counts the records that give exit status 1: a claim not
	// consistent or evidence conflicting at the chosen tier, or an error.
	Failing int
	// Unbounded counts the records that no evidence bounds.
	Unbounded int
	// Unlisted counts the findings of materials not in the dataset, and
	// UnlistedRecords the records that have any.
	Unlisted, UnlistedRecords int
}

func (c *Counts) add(s Summary) {
	if c.ByStatus == nil {
		c.ByStatus = map[Status]int{}
	}
	c.Records++
	c.ByStatus[s.Status]++
	if s.Conflicts != "" {
		c.Conflicting++
	}
	if s.Fails {
		c.Failing++
	}
	if s.Unbounded {
		c.Unbounded++
	}
	if s.Unlisted > 0 {
		c.Unlisted += s.Unlisted
		c.UnlistedRecords++
	}
}

// Errors is the number of records that could not be read or checked.
func (c Counts) Errors() int { return c.ByStatus[StatusError] }

// Judged is the number of records checked (or, in a parse-only pass,
// read): every record that is not an error.
func (c Counts) Judged() int { return c.Records - c.Errors() }

// Balanced reports whether every line read is accounted for: in the header,
// blank, or in exactly one record.
func (c Counts) Balanced() bool {
	return c.Lines == c.HeaderLines+c.BlankLines+c.RecordLines
}

// AccountingSentence is [Counts.Accounting] as a sentence for the
// summary reports, which says whether the lines add up.
func (c Counts) AccountingSentence() string {
	if c.Balanced() {
		return "Every line read is accounted for: " + c.Accounting() + "."
	}
	return "The lines read do not add up, a fault of terminus: " + c.Accounting() + "."
}

// Accounting says where every line went, in one line for people: "12
// lines = 1 header + 1 blank + 10 in records; 9 records = 6 judged + 3
// errors". The header and blank terms are left out when there are none.
func (c Counts) Accounting() string {
	judged := "judged"
	if n := c.ByStatus[StatusParsed]; n > 0 && n == c.Judged() {
		judged = "read"
	}
	out := fmt.Sprintf("%d %s = ", c.Lines, wording.Plural(c.Lines, "line", "lines"))
	if c.HeaderLines > 0 {
		out += fmt.Sprintf("%d %s + ", c.HeaderLines, wording.Plural(c.HeaderLines, "header", "headers"))
	}
	if c.BlankLines > 0 {
		out += fmt.Sprintf("%d blank + ", c.BlankLines)
	}
	return out + fmt.Sprintf("%d in records; %d %s = %d %s + %d %s", c.RecordLines, c.Records, wording.Plural(c.Records, "record", "records"),
		c.Judged(), judged, c.Errors(), wording.Plural(c.Errors(), "error", "errors"))
}

// String gives the counts in one line for people: "120 records: 100
// consistent, 12 improbable, 8 errors".
func (c Counts) String() string {
	var parts []string
	for _, s := range Statuses() {
		if n := c.ByStatus[s]; n > 0 {
			name := string(s)
			if s == StatusError {
				name = wording.Plural(n, "error", "errors")
			}
			parts = append(parts, fmt.Sprintf("%d %s", n, name))
		}
	}
	out := fmt.Sprintf("%d %s", c.Records, wording.Plural(c.Records, "record", "records"))
	if len(parts) > 0 {
		out += ": " + strings.Join(parts, ", ")
	}
	if c.Conflicting > 0 {
		out += fmt.Sprintf("; the evidence conflicts in %d", c.Conflicting)
	}
	return out
}
