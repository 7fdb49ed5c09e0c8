package report

import (
	"fmt"
	"io"
	"slices"
	"strings"

	"terminus/constraint"
	"terminus/constraint/network"
	"terminus/constraint/wording"
)

// Width is the column the text report wraps at.
const Width = 80

// windowText shows a window as "1816 – 1912-06" with open ends as "open".
func windowText(w *constraint.Window) string {
	if w == nil {
		return "no window (the evidence conflicts)"
	}
	lo, hi := "open", "open"
	if w.Earliest.Bounded {
		lo = wording.BoundAt(w.Earliest.Day, false, w.Earliest.Precision)
	}
	if w.Latest.Bounded {
		hi = wording.BoundAt(w.Latest.Day, true, w.Latest.Precision)
	}
	s := lo + " – " + hi
	if len(w.Intervals) > 1 {
		s += " (in parts: " + spansText(w.Intervals) + ")"
	}
	return s
}

func spanText(s constraint.Span) string {
	lo, hi := "open", "open"
	if !s.OpenStart {
		lo = wording.Bound(s.First, false)
	}
	if !s.OpenEnd {
		hi = wording.Bound(s.Last, true)
	}
	if lo == hi {
		return lo
	}
	return lo + " – " + hi
}

func spansText(list []constraint.Span) string {
	if len(list) == 0 {
		return "none"
	}
	parts := make([]string, len(list))
	for i, s := range list {
		parts[i] = spanText(s)
	}
	return strings.Join(parts, ", ")
}

// wrap writes text wrapped at Width, the first line after prefix and the
// others indented to match.
func wrap(w io.Writer, prefix, text string) {
	indent := strings.Repeat(" ", len([]rune(prefix)))
	line := prefix
	empty := true
	for _, word := range strings.Fields(text) {
		if !empty && len([]rune(line))+1+len([]rune(word)) > Width {
			fmt.Fprintln(w, line)
			line = indent + word
			continue
		}
		if empty {
			line += word
			empty = false
		} else {
			line += " " + word
		}
	}
	fmt.Fprintln(w, line)
}

func consistencyLine(r *constraint.Result) string {
	var bad []string
	for t, ok := range r.Consistent {
		if !ok {
			bad = append(bad, wording.Tier(t))
		}
	}
	if len(bad) == 0 {
		return "The evidence agrees at every tier (hard, firm, soft)."
	}
	return fmt.Sprintf("The evidence conflicts at the %s %s: see Conflicts.", strings.Join(bad, " and "), wording.Plural(len(bad), "tier", "tiers"))
}

func datasetLine(r *constraint.Result) string {
	sha := r.Dataset.SHA256
	if len(sha) > 12 {
		sha = sha[:12]
	}
	return fmt.Sprintf("dataset %s (sha256 %s…)", r.Dataset.Version, sha)
}

// Text writes r for a terminal, wrapped at 80 columns.
func Text(w io.Writer, r *constraint.Result) error {
	ew := &errWriter{w: w}
	title := r.Title
	if title == "" {
		title = "(untitled case)"
	}
	wrap(ew, "", title)
	meta := r.File
	if r.ID != "" {
		meta += " · object " + r.ID
	}
	if r.Place != "" {
		meta += " · place " + r.Place
	}
	meta += " · " + datasetLine(r)
	wrap(ew, "", meta)
	fmt.Fprintln(ew)
	wrap(ew, "", consistencyLine(r))

	fmt.Fprintln(ew)
	fmt.Fprintln(ew, "WINDOWS")
	for _, e := range r.Events {
		head := e.ID
		if e.Label != "" {
			head += " — " + e.Label
		}
		wrap(ew, "", head)
		for t, win := range e.Windows {
			wrap(ew, fmt.Sprintf("  %-5s ", wording.Tier(t)), windowText(win))
			if win == nil {
				continue
			}
			if t > 0 && sameWindow(e.Windows[t-1], win) {
				wrap(ew, "        ", "(as "+wording.Tier(t-1)+")")
				continue
			}
			var prev *constraint.Window
			if t > 0 {
				prev = e.Windows[t-1]
			}
			if prev != nil && sameBound(prev.Earliest, win.Earliest) {
				wrap(ew, "        ", fmt.Sprintf("earliest %s: as %s", wording.BoundAt(win.Earliest.Day, false, win.Earliest.Precision), wording.Tier(t-1)))
			} else {
				writeChain(ew, "earliest", win.Earliest)
			}
			if prev != nil && sameBound(prev.Latest, win.Latest) {
				wrap(ew, "        ", fmt.Sprintf("latest %s: as %s", wording.BoundAt(win.Latest.Day, true, win.Latest.Precision), wording.Tier(t-1)))
			} else {
				writeChain(ew, "latest", win.Latest)
			}
		}
	}

	if len(r.Claims) > 0 {
		fmt.Fprintln(ew)
		fmt.Fprintln(ew, "CLAIMS")
		for _, c := range r.Claims {
			head := fmt.Sprintf("%s: %s %s", c.ID, c.Event, c.DateText)
			if c.By != "" {
				head += " (by " + c.By + ")"
			}
			wrap(ew, "  ", head+" → "+strings.ToUpper(string(c.Verdict)))
			wrap(ew, "      ", c.Sentence)
			if c.Verdict != constraint.Undetermined {
				var parts []string
				for t := network.Hard; t <= c.JudgedAt; t++ {
					parts = append(parts, wording.Tier(t)+" "+spansText(c.Surviving[t]))
				}
				wrap(ew, "      ", "surviving: "+strings.Join(parts, "; "))
			}
			if len(c.Deciding) > 0 {
				wrap(ew, "      ", "deciding evidence: "+strings.Join(c.Deciding, ", "))
			}
		}
	}

	if len(r.Conflicts) > 0 {
		fmt.Fprintln(ew)
		fmt.Fprintln(ew, "CONFLICTS")
		for i, c := range r.Conflicts {
			wrap(ew, fmt.Sprintf("  %d. ", i+1), fmt.Sprintf("%s tier: %s cannot all hold", wording.Tier(c.Tier), strings.Join(c.Evidence, ", ")))
			for _, s := range c.Steps {
				wrap(ew, "       - ", s.Text)
			}
		}
		for t, complete := range r.ConflictsComplete {
			if !complete {
				wrap(ew, "  ", fmt.Sprintf("More conflicts exist at the %s tier than are listed.", wording.Tier(t)))
			}
		}
		for _, c := range r.Corrections {
			if c.Cheapest {
				wrap(ew, "  ", fmt.Sprintf("Cheapest correction at the %s tier: set aside %s.", wording.Tier(c.Tier), strings.Join(c.Evidence, ", ")))
			} else {
				wrap(ew, "  ", wording.Correction(wording.Tier(c.Tier), c.Evidence, false))
			}
		}
	}

	if len(r.Disagreements) > 0 {
		fmt.Fprintln(ew)
		fmt.Fprintln(ew, "SOURCES DISAGREE")
		for _, d := range r.Disagreements {
			wrap(ew, "  - ", d.Text)
		}
	}
	if len(r.Notes) > 0 {
		fmt.Fprintln(ew)
		fmt.Fprintln(ew, "NOTES")
		for _, n := range r.Notes {
			wrap(ew, "  - ", n)
		}
	}
	fmt.Fprintln(ew)
	fmt.Fprintln(ew, "CAUTIONS")
	for _, c := range r.Cautions {
		wrap(ew, "  - ", c)
	}
	return ew.err
}

func sameWindow(a, b *constraint.Window) bool {
	if a == nil || b == nil || len(a.Intervals) != len(b.Intervals) {
		return false
	}
	for i := range a.Intervals {
		if a.Intervals[i] != b.Intervals[i] {
			return false
		}
	}
	return true
}

func sameBound(a, b constraint.Bound) bool {
	return a.Bounded && b.Bounded && a.Day == b.Day && slices.Equal(a.Because, b.Because)
}

func writeChain(w io.Writer, which string, b constraint.Bound) {
	if !b.Bounded {
		return
	}
	prefix := fmt.Sprintf("        %s %s: ", which, wording.BoundAt(b.Day, which == "latest", b.Precision))
	if len(b.Chain) == 0 {
		wrap(w, prefix, "(no evidence recorded)")
		return
	}
	arrow := strings.Repeat(" ", len([]rune(prefix))-2) + "→ "
	for i, s := range b.Chain {
		// A long chain shows its first and last two steps and counts
		// the others, so that a long order of events reads in linear
		// space.
		if len(b.Chain) > chainStepsShown && i >= 2 && i < len(b.Chain)-2 {
			if i == 2 {
				wrap(w, arrow, fmt.Sprintf("… %d more steps …", len(b.Chain)-4))
			}
			continue
		}
		if i == 0 {
			wrap(w, prefix, s.Text)
		} else {
			wrap(w, arrow, s.Text)
		}
	}
}

// chainStepsShown is how many steps of a chain text and Markdown write
// out in full.
const chainStepsShown = 6

type errWriter struct {
	w   io.Writer
	err error
}

func (e *errWriter) Write(p []byte) (int, error) {
	if e.err != nil {
		return 0, e.err
	}
	n, err := e.w.Write(p)
	e.err = err
	return n, err
}
