package report

import (
	"fmt"
	"io"
	"strings"

	"terminus/constraint"
	"terminus/constraint/network"
	"terminus/constraint/wording"
)

// Markdown writes r as a section to paste into an examination or condition
// report: a dating paragraph in graded words, the windows, the evidence
// table, conflicts, notes, cautions and references.
func Markdown(w io.Writer, r *constraint.Result) error {
	ew := &errWriter{w: w}
	title := r.Title
	if title == "" {
		title = "untitled case"
	}
	fmt.Fprintf(ew, "## Dating from materials: %s\n\n", mdEscape(title))
	fmt.Fprintf(ew, "Case file `%s`", r.File)
	if r.ID != "" {
		fmt.Fprintf(ew, "; object %s", mdEscape(r.ID))
	}
	if r.Place != "" {
		fmt.Fprintf(ew, "; place of making %s", r.Place)
	}
	fmt.Fprintf(ew, "; materials %s.\n\n", datasetLine(r))

	fmt.Fprintln(ew, "### Summary")
	fmt.Fprintln(ew)
	for _, e := range r.Events {
		fmt.Fprintln(ew, eventParagraph(e))
		fmt.Fprintln(ew)
	}
	for _, c := range r.Claims {
		fmt.Fprintln(ew, claimParagraph(c, r.Events))
		fmt.Fprintln(ew)
	}
	fmt.Fprintln(ew, consistencyLine(r))
	fmt.Fprintln(ew)

	fmt.Fprintln(ew, "### Windows")
	fmt.Fprintln(ew)
	fmt.Fprintln(ew, "| Event | Tier | Earliest | Latest | Earliest set by | Latest set by |")
	fmt.Fprintln(ew, "|---|---|---|---|---|---|")
	for _, e := range r.Events {
		for t, win := range e.Windows {
			if win == nil {
				fmt.Fprintf(ew, "| %s | %s | — | — | conflict | conflict |\n", mdEscape(e.ID), wording.Tier(t))
				continue
			}
			lo, hi := "open", "open"
			if win.Earliest.Bounded {
				lo = wording.BoundAt(win.Earliest.Day, false, win.Earliest.Precision)
			}
			if win.Latest.Bounded {
				hi = wording.BoundAt(win.Latest.Day, true, win.Latest.Precision)
			}
			if len(win.Intervals) > 1 {
				hi += " (only within " + spansText(win.Intervals) + ")"
			}
			fmt.Fprintf(ew, "| %s | %s | %s | %s | %s | %s |\n", mdEscape(e.ID), wording.Tier(t), lo, mdEscape(hi),
				mdEscape(wording.Chain(win.Earliest.Because)), mdEscape(wording.Chain(win.Latest.Because)))
		}
	}
	fmt.Fprintln(ew)

	if len(r.Claims) > 0 {
		fmt.Fprintln(ew, "### Claims")
		fmt.Fprintln(ew)
		fmt.Fprintln(ew, "| Claim | Event | Date | Verdict | Survives (hard) | Survives (firm) | Survives (soft) | Deciding evidence |")
		fmt.Fprintln(ew, "|---|---|---|---|---|---|---|---|")
		for _, c := range r.Claims {
			var surv [3]string
			for t := range surv {
				surv[t] = survivingText(c, network.Tier(t))
			}
			fmt.Fprintf(ew, "| %s | %s | %s | **%s** | %s | %s | %s | %s |\n", mdEscape(c.ID), mdEscape(c.Event), mdEscape(c.DateText),
				c.Verdict, surv[0], surv[1], surv[2], mdEscape(strings.Join(c.Deciding, ", ")))
		}
		fmt.Fprintln(ew)
	}

	fmt.Fprintln(ew, "### Evidence")
	fmt.Fprintln(ew)
	fmt.Fprintln(ew, "| Evidence | Event | Material or record | Method (sample) | Confidence | Bound | Tier | Source |")
	fmt.Fprintln(ew, "|---|---|---|---|---|---|---|---|")
	for _, row := range evidenceRows(r, true) {
		if row.Tier == "" { // evidence that bounds nothing
			fmt.Fprintf(ew, "| %s | %s | %s | %s | %s | %s | | %s |\n", mdEscape(row.ID), mdEscape(row.Event), mdEscape(row.What),
				mdEscape(row.Method), row.Confidence, row.Bound, mdEscape(row.Source))
			continue
		}
		fmt.Fprintf(ew, "| %s | %s | %s | %s | %s | %s | %s | %s |\n", mdEscape(row.ID), mdEscape(row.Event), mdEscape(row.What),
			mdEscape(row.Method), row.Confidence, mdEscape(row.Bound), row.Tier, mdEscape(row.Source))
	}
	fmt.Fprintln(ew)

	if len(r.Conflicts) > 0 {
		fmt.Fprintln(ew, "### Conflicts")
		fmt.Fprintln(ew)
		for i, c := range r.Conflicts {
			fmt.Fprintf(ew, "%d. At the %s tier, these cannot all hold: %s.\n", i+1, wording.Tier(c.Tier), mdEscape(strings.Join(c.Evidence, ", ")))
			for _, s := range c.Steps {
				fmt.Fprintf(ew, "   - %s\n", mdEscape(s.Text))
			}
		}
		fmt.Fprintln(ew)
		for t, complete := range r.ConflictsComplete {
			if !complete {
				fmt.Fprintf(ew, "More conflicts exist at the %s tier than are listed.\n\n", wording.Tier(t))
			}
		}
		for _, c := range r.Corrections {
			fmt.Fprintf(ew, "- %s\n", mdEscape(wording.Correction(wording.Tier(c.Tier), c.Evidence, c.Cheapest)))
		}
		fmt.Fprintln(ew)
	}
	if len(r.Disagreements) > 0 {
		fmt.Fprintln(ew, "### Where sources disagree")
		fmt.Fprintln(ew)
		for _, d := range r.Disagreements {
			fmt.Fprintf(ew, "- %s\n", mdEscape(d.Text))
		}
		fmt.Fprintln(ew)
	}
	if len(r.Notes) > 0 {
		fmt.Fprintln(ew, "### Notes")
		fmt.Fprintln(ew)
		for _, n := range r.Notes {
			fmt.Fprintf(ew, "- %s\n", mdEscape(n))
		}
		fmt.Fprintln(ew)
	}
	fmt.Fprintln(ew, "### Cautions")
	fmt.Fprintln(ew)
	for _, c := range r.Cautions {
		fmt.Fprintf(ew, "- %s\n", mdEscape(c))
	}
	fmt.Fprintln(ew)
	if len(r.Sources) > 0 {
		fmt.Fprintln(ew, "### References")
		fmt.Fprintln(ew)
		for _, s := range r.Sources {
			cite := mdEscape(s.Cite)
			if cite == "" {
				cite = "(not in the bibliography)"
			}
			if s.URL != "" && !strings.ContainsAny(s.URL, "<> ") {
				cite += ", <" + s.URL + ">"
			}
			fmt.Fprintf(ew, "- [%s] %s\n", mdEscape(s.Key), cite)
		}
		fmt.Fprintln(ew)
	}
	return ew.err
}

var mdReplacer = strings.NewReplacer("|", `\|`, "*", `\*`, "_", `\_`, "<", "&lt;")

func mdEscape(s string) string { return mdReplacer.Replace(s) }

// eventParagraph puts an event's windows in graded words, in bold the
// event's name.
func eventParagraph(e constraint.EventResult) string {
	return fmt.Sprintf("**%s.** %s", mdEscape(eventName(e)), mdEscape(eventSentence(e)))
}

// claimParagraph says what the verdict on a claim means, the verdict in
// bold.
func claimParagraph(c constraint.ClaimResult, events []constraint.EventResult) string {
	lead, rest := claimSentences(c, events)
	return fmt.Sprintf("%s **%s**. %s", mdEscape(lead), c.Verdict, mdEscape(rest))
}
