package report

import (
	"encoding/json"
	"fmt"
	"io"
	"strings"

	"terminus/constraint"
	"terminus/constraint/date"
	"terminus/constraint/network"
	"terminus/constraint/wording"
)

// The linked-data export: the object as a Linked Art HumanMadeObject
// (CIDOC CRM E22) whose production (E12) and each other event are
// activities with a time-span (E52) for one chosen tier, the window's
// first and last days as begin_of_the_begin and end_of_the_end; each
// time-span is assigned by an AttributeAssignment (E13), the dating,
// that cites the evidence behind its bounds (used_specific_object) and
// carries the cautions. An open end is left out, as Linked Art does for
// an unknown bound; a tier in conflict gives no time-span and a note
// that says so.
//
// Events after the production, by the orders of the case, are
// modifications of the object (modified_by, E11); the others are parts
// of the production (part, E7). The document names the Linked Art
// context; docs/linked-art-context.json holds the terms it uses, so that
// it can be expanded without fetching anything.

// LinkedArtContext is the address of the context the document names.
const LinkedArtContext = "https://linked.art/ns/v1/linked-art.json"

// LinkedArtOptions chooses what the export says.
type LinkedArtOptions struct {
	// Tier is the tier whose windows become the time-spans.
	Tier network.Tier
	// Production is the event that is the object's production; empty:
	// the event "making" if there is one, else the first event.
	Production string
}

// laNode is a node of the document; the fields are written in this order,
// empty ones left out.
type laNode struct {
	Context            string    `json:"@context,omitempty"`
	Type               string    `json:"type"`
	Label              string    `json:"_label,omitempty"`
	Content            string    `json:"content,omitempty"`
	IdentifiedBy       []*laNode `json:"identified_by,omitempty"`
	TookPlaceAt        []*laNode `json:"took_place_at,omitempty"`
	Timespan           *laNode   `json:"timespan,omitempty"`
	Begin              string    `json:"begin_of_the_begin,omitempty"`
	End                string    `json:"end_of_the_end,omitempty"`
	AssignedBy         []*laNode `json:"assigned_by,omitempty"`
	UsedSpecificObject []*laNode `json:"used_specific_object,omitempty"`
	ProducedBy         *laNode   `json:"produced_by,omitempty"`
	Part               []*laNode `json:"part,omitempty"`
	ModifiedBy         []*laNode `json:"modified_by,omitempty"`
	ReferredToBy       []*laNode `json:"referred_to_by,omitempty"`
}

func statement(label, content string) *laNode {
	return &laNode{Type: "LinguisticObject", Label: label, Content: content}
}

// LinkedArt returns a writer of the linked-data export with opts.
func LinkedArt(opts LinkedArtOptions) func(io.Writer, *constraint.Result) error {
	return func(w io.Writer, r *constraint.Result) error {
		doc, err := linkedArt(r, opts)
		if err != nil {
			return err
		}
		// Encoded compact, the document is indented as it passes to w
		// (encoding/json would hold it twice more to indent it).
		in := newIndenter(w)
		enc := json.NewEncoder(in)
		enc.SetEscapeHTML(false)
		if err := enc.Encode(doc); err != nil {
			return err
		}
		return in.Flush()
	}
}

func linkedArt(r *constraint.Result, opts LinkedArtOptions) (*laNode, error) {
	if len(r.Events) == 0 {
		return nil, fmt.Errorf("the case has no event to export")
	}
	prod := opts.Production
	if prod == "" {
		prod = r.Events[0].ID
		for _, e := range r.Events {
			if e.ID == "making" {
				prod = e.ID
			}
		}
	}
	var prodEvent *constraint.EventResult
	var ids []string
	for i := range r.Events {
		ids = append(ids, r.Events[i].ID)
		if r.Events[i].ID == prod {
			prodEvent = &r.Events[i]
		}
	}
	if prodEvent == nil {
		return nil, fmt.Errorf("no event %q to export as the production: the events are %s", prod, strings.Join(ids, ", "))
	}
	title := r.Title
	if title == "" {
		title = "untitled case"
	}
	obj := &laNode{Context: LinkedArtContext, Type: "HumanMadeObject", Label: title,
		IdentifiedBy: []*laNode{{Type: "Name", Content: title}}}
	if r.ID != "" {
		obj.IdentifiedBy = append(obj.IdentifiedBy, &laNode{Type: "Identifier", Content: r.ID})
	}
	obj.ProducedBy = activity(r, *prodEvent, "Production", opts.Tier)
	later := after(r, prod)
	for _, e := range r.Events {
		switch {
		case e.ID == prod:
		case later[e.ID]:
			obj.ModifiedBy = append(obj.ModifiedBy, activity(r, e, "Modification", opts.Tier))
		default:
			obj.ProducedBy.Part = append(obj.ProducedBy.Part, activity(r, e, "Activity", opts.Tier))
		}
	}
	for _, c := range r.Claims {
		obj.ReferredToBy = append(obj.ReferredToBy, statement("verdict on claim "+c.ID, claimText(c, r.Events)))
	}
	return obj, nil
}

// after finds the events that come after prod, directly or through
// others, by the orders of the case (evidence of kind "order", whose
// bound names the earlier event).
func after(r *constraint.Result, prod string) map[string]bool {
	known := map[string]bool{}
	for _, e := range r.Events {
		known[e.ID] = true
	}
	next := map[string][]string{}
	for _, ev := range r.Evidence {
		if ev.Kind != "order" {
			continue
		}
		for _, b := range ev.Bounds {
			if known[b.Earlier] {
				next[b.Earlier] = append(next[b.Earlier], ev.Event)
			}
		}
	}
	seen := map[string]bool{}
	stack := []string{prod}
	for len(stack) > 0 {
		e := stack[len(stack)-1]
		stack = stack[:len(stack)-1]
		for _, n := range next[e] {
			if !seen[n] {
				seen[n] = true
				stack = append(stack, n)
			}
		}
	}
	return seen
}

// activity is one event at tier t.
func activity(r *constraint.Result, e constraint.EventResult, typ string, t network.Tier) *laNode {
	label := e.ID
	if e.Label != "" {
		label = e.Label
	}
	a := &laNode{Type: typ, Label: label, IdentifiedBy: []*laNode{{Type: "Identifier", Content: e.ID}}}
	if e.Place != "" {
		a.TookPlaceAt = []*laNode{{Type: "Place", Label: e.Place, IdentifiedBy: []*laNode{{Type: "Identifier", Content: e.Place}}}}
	}
	w := e.Windows[t]
	if w == nil {
		a.ReferredToBy = append(a.ReferredToBy, statement("dating from materials",
			fmt.Sprintf("At the %s tier the evidence conflicts: no window can be given until the conflicts are resolved.", wording.Tier(t))))
		return a
	}
	span := &laNode{Type: "TimeSpan", Label: windowText(w) + " (" + wording.Tier(t) + " tier)",
		IdentifiedBy: []*laNode{{Type: "Name", Content: windowText(w)}}}
	if w.Earliest.Bounded {
		span.Begin = dateTime(w.Earliest.Day, false)
	}
	if w.Latest.Bounded {
		span.End = dateTime(w.Latest.Day, true)
	}
	dating := &laNode{Type: "AttributeAssignment",
		Label: fmt.Sprintf("dating from materials by terminus, at the %s tier", wording.Tier(t))}
	seen := map[string]bool{}
	for _, b := range []constraint.Bound{w.Earliest, w.Latest} {
		for i, s := range b.Chain {
			// A long chain gives its first and last two steps and counts
			// the others, as the other formats do: an export that grows
			// with the case, not with its square.
			if n := len(b.Chain); n > chainStepsShown && i >= 2 && i < n-2 {
				if i == 2 {
					dating.UsedSpecificObject = append(dating.UsedSpecificObject, statement("order of events", fmt.Sprintf("… %d more steps …", n-4)))
				}
				continue
			}
			if seen[s.Evidence] {
				continue
			}
			seen[s.Evidence] = true
			dating.UsedSpecificObject = append(dating.UsedSpecificObject, statement(s.Evidence, s.Text))
		}
	}
	dating.UsedSpecificObject = append(dating.UsedSpecificObject, statement("materials dataset", fmt.Sprintf("terminus materials dataset %s, sha256 %s", r.Dataset.Version, r.Dataset.SHA256)))
	var words []string
	if w.Earliest.Bounded {
		words = append(words, fmt.Sprintf("%s %s (%s)", wording.NotBefore(t), wording.Bound(w.Earliest.Day, false), wording.Chain(w.Earliest.Because)))
	}
	if w.Latest.Bounded {
		words = append(words, fmt.Sprintf("%s %s (%s)", wording.NotAfter(t), wording.Bound(w.Latest.Day, true), wording.Chain(w.Latest.Because)))
	}
	if len(words) == 0 {
		words = append(words, "the evidence considered sets no bound")
	}
	dating.ReferredToBy = append(dating.ReferredToBy, statement("window", "On the evidence considered, "+label+" "+strings.Join(words, "; and ")+"."))
	for _, c := range r.Cautions {
		dating.ReferredToBy = append(dating.ReferredToBy, statement("caution", c))
	}
	span.AssignedBy = []*laNode{dating}
	a.Timespan = span
	return a
}

// dateTime writes the start (or, for an upper bound, the end) of day d
// as an xsd:dateTime in UTC, years astronomical as XML Schema 1.1 counts
// them (0000 is 1 BCE).
func dateTime(d date.Day, upper bool) string {
	if upper {
		return d.ISO() + "T23:59:59Z"
	}
	return d.ISO() + "T00:00:00Z"
}
