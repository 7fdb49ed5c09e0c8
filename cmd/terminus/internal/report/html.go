package report

import (
	_ "embed"
	"fmt"
	"html/template"
	"io"
	"strings"

	"terminus/constraint"
	"terminus/constraint/network"
	"terminus/constraint/wording"
)

// The HTML report: one self-contained page built from the result with
// html/template (every value escaped by the template), holding the same
// sections as the Markdown report, the timeline picture with its text
// alternative, real tables with captions and column headers, and a print
// stylesheet for A4.

//go:embed report.html.tmpl
var reportTemplateText string

var reportTemplate = template.Must(template.New("report").Parse(reportTemplateText))

// HTML writes r as a self-contained page.
func HTML(w io.Writer, r *constraint.Result) error {
	ew := &errWriter{w: w}
	if err := reportTemplate.ExecuteTemplate(ew, "page", newHTMLView(r)); err != nil {
		if ew.err != nil {
			return ew.err
		}
		return fmt.Errorf("writing the HTML report: %w", err)
	}
	return ew.err
}

// HTMLBody writes the report's sections without the page around them, for
// a page that shows the report inside its own (the local page of
// "terminus serve").
func HTMLBody(w io.Writer, r *constraint.Result) error {
	ew := &errWriter{w: w}
	if err := reportTemplate.ExecuteTemplate(ew, "body", newHTMLView(r)); err != nil {
		if ew.err != nil {
			return ew.err
		}
		return fmt.Errorf("writing the HTML report: %w", err)
	}
	return ew.err
}

// htmlView is what the HTML report shows, in words, ready for a template.
type htmlView struct {
	Title, File, ID, Place, Dataset string
	Consistency                     string
	Consistent                      bool
	Events                          []eventView
	Claims                          []claimView
	Picture                         template.HTML
	PictureText                     string
	Windows                         []windowRow
	Evidence                        []evidenceRow
	Conflicts                       []conflictView
	MoreConflicts                   []string
	Corrections                     []string
	Disagreements                   []string
	Notes                           []string
	Cautions                        []string
	Sources                         []sourceView
}

// eventView is an event's windows in graded words.
type eventView struct{ Name, Sentence string }

// claimView is a claim, its verdict and what survives of it.
type claimView struct {
	ID, Event, Date, By, Verdict, Sentence, Deciding string
	Surviving                                        [3]string
}

// windowRow is one row of the windows table: an event at a tier.
type windowRow struct {
	Event, Tier                string
	Conflict                   bool
	Earliest, Latest           string
	EarliestBy, LatestBy       string
	EarliestSteps, LatestSteps []string
}

// conflictView is a minimal conflict and its steps.
type conflictView struct {
	Tier, Evidence string
	Steps          []string
}

// sourceView is a reference; URL is set only for a web address.
type sourceView struct{ Key, Cite, URL string }

// newHTMLView puts r in the words of the HTML report.
func newHTMLView(r *constraint.Result) *htmlView {
	v := &htmlView{
		Title: r.Title, File: r.File, ID: r.ID, Place: r.Place, Dataset: datasetLine(r),
		Consistency: consistencyLine(r), Consistent: r.Consistent[0] && r.Consistent[1] && r.Consistent[2],
		Picture: template.HTML(picture(r)), PictureText: pictureText(r),
		Disagreements: nil, Notes: r.Notes, Cautions: r.Cautions,
	}
	if v.Title == "" {
		v.Title = "untitled case"
	}
	for _, e := range r.Events {
		name, sentence := eventName(e), eventSentence(e)
		v.Events = append(v.Events, eventView{Name: name, Sentence: sentence})
		for t, w := range e.Windows {
			row := windowRow{Event: e.ID, Tier: wording.Tier(t)}
			if w == nil {
				row.Conflict = true
				v.Windows = append(v.Windows, row)
				continue
			}
			row.Earliest, row.Latest = "open", "open"
			if w.Earliest.Bounded {
				row.Earliest = wording.Bound(w.Earliest.Day, false)
				row.EarliestBy = wording.Chain(w.Earliest.Because)
				row.EarliestSteps = stepTexts(w.Earliest.Chain)
			}
			if w.Latest.Bounded {
				row.Latest = wording.Bound(w.Latest.Day, true)
				row.LatestBy = wording.Chain(w.Latest.Because)
				row.LatestSteps = stepTexts(w.Latest.Chain)
			}
			if len(w.Intervals) > 1 {
				row.Latest += " (in parts: " + spansText(w.Intervals) + ")"
			}
			v.Windows = append(v.Windows, row)
		}
	}
	for _, c := range r.Claims {
		cv := claimView{ID: c.ID, Event: c.Event, Date: c.DateText, By: c.By, Verdict: string(c.Verdict),
			Sentence: claimText(c, r.Events), Deciding: strings.Join(c.Deciding, ", ")}
		for t := range cv.Surviving {
			cv.Surviving[t] = survivingText(c, network.Tier(t))
		}
		v.Claims = append(v.Claims, cv)
	}
	v.Evidence = evidenceRows(r, false)
	for _, c := range r.Conflicts {
		v.Conflicts = append(v.Conflicts, conflictView{Tier: wording.Tier(c.Tier), Evidence: strings.Join(c.Evidence, ", "), Steps: stepTexts(c.Steps)})
	}
	if len(r.Conflicts) > 0 {
		for t, complete := range r.ConflictsComplete {
			if !complete {
				v.MoreConflicts = append(v.MoreConflicts, fmt.Sprintf("More conflicts exist at the %s tier than are listed.", wording.Tier(t)))
			}
		}
		for _, c := range r.Corrections {
			v.Corrections = append(v.Corrections, wording.Correction(wording.Tier(c.Tier), c.Evidence, c.Cheapest))
		}
	}
	for _, d := range r.Disagreements {
		v.Disagreements = append(v.Disagreements, d.Text)
	}
	for _, s := range r.Sources {
		sv := sourceView{Key: s.Key, Cite: s.Cite}
		if sv.Cite == "" {
			sv.Cite = "(not in the bibliography)"
		}
		if strings.HasPrefix(s.URL, "https://") || strings.HasPrefix(s.URL, "http://") {
			sv.URL = s.URL
		}
		v.Sources = append(v.Sources, sv)
	}
	return v
}

// stepTexts are the texts of a chain's steps; a long chain keeps its first
// and last two and counts the others, so that a long order of events
// gives a report that grows with the case, not with its square.
func stepTexts(steps []constraint.Step) []string {
	if len(steps) <= chainStepsShown {
		out := make([]string, len(steps))
		for i, s := range steps {
			out[i] = s.Text
		}
		return out
	}
	n := len(steps)
	return []string{steps[0].Text, steps[1].Text, fmt.Sprintf("… %d more steps …", n-4), steps[n-2].Text, steps[n-1].Text}
}

// HTMLStyle is the report's stylesheet, for a page that shows
// [HTMLBody] inside its own.
func HTMLStyle() string {
	var b strings.Builder
	if err := reportTemplate.ExecuteTemplate(&b, "css", nil); err != nil {
		return ""
	}
	return b.String()
}
