package report

import (
	"terminus/constraint"
	"terminus/constraint/date"
	"terminus/constraint/network"
)

// This file is the reference the JSON writer is held to: the document as
// Go structs, encoded by encoding/json in the tests. AppendJSONLine must
// give the same bytes; a field added to the writer is added here too.

type jsonResult struct {
	SchemaVersion     int                `json:"schema_version"`
	ID                string             `json:"id,omitempty"`
	Title             string             `json:"title"`
	File              string             `json:"file"`
	Place             *string            `json:"place"`
	Dataset           jsonDataset        `json:"dataset"`
	Consistent        jsonTiers[bool]    `json:"consistent"`
	Events            []jsonEvent        `json:"events"`
	Claims            []jsonClaim        `json:"claims"`
	Conflicts         []jsonConflict     `json:"conflicts"`
	ConflictsComplete jsonTiers[bool]    `json:"conflicts_complete"`
	Corrections       []jsonCorrection   `json:"corrections"`
	Evidence          []jsonEvidence     `json:"evidence"`
	Disagreements     []jsonDisagreement `json:"disagreements"`
	Sources           []jsonSource       `json:"sources"`
	Notes             []string           `json:"notes"`
	Cautions          []string           `json:"cautions"`
}

type jsonTiers[T any] struct {
	Hard T `json:"hard"`
	Firm T `json:"firm"`
	Soft T `json:"soft"`
}

func (t *jsonTiers[T]) set(tier network.Tier, v T) {
	switch tier {
	case network.Hard:
		t.Hard = v
	case network.Firm:
		t.Firm = v
	default:
		t.Soft = v
	}
}

type jsonDataset struct {
	Version string `json:"version"`
	SHA256  string `json:"sha256"`
}

type jsonEvent struct {
	ID      string                 `json:"id"`
	Label   string                 `json:"label"`
	Place   *string                `json:"place"`
	Windows jsonTiers[*jsonWindow] `json:"windows"`
}

type jsonWindow struct {
	Earliest  jsonBound    `json:"earliest"`
	Latest    jsonBound    `json:"latest"`
	Intervals [][2]*string `json:"intervals"`
}

type jsonBound struct {
	Date      *string    `json:"date"`
	Year      *int64     `json:"year"`
	Precision *string    `json:"precision"`
	Because   []string   `json:"because"`
	Chain     []jsonStep `json:"chain"`
	From      *string    `json:"from"`
	Steps     int        `json:"steps"`
}

type jsonStep struct {
	Evidence string `json:"evidence"`
	Text     string `json:"text"`
}

type jsonClaim struct {
	ID                 string                  `json:"id"`
	Event              string                  `json:"event"`
	Date               string                  `json:"date"`
	By                 string                  `json:"by,omitempty"`
	Verdict            string                  `json:"verdict"`
	JudgedAt           *string                 `json:"judged_at"`
	Deciding           []string                `json:"deciding"`
	DecidingEachAlone  bool                    `json:"deciding_each_alone"`
	Sentence           string                  `json:"sentence"`
	Surviving          jsonTiers[*[2]*string]  `json:"surviving"`
	SurvivingIntervals jsonTiers[[][2]*string] `json:"surviving_intervals"`
	Note               string                  `json:"note,omitempty"`
}

type jsonConflict struct {
	Tier     string     `json:"tier"`
	Evidence []string   `json:"evidence"`
	Steps    []jsonStep `json:"steps"`
}

type jsonCorrection struct {
	Tier     string   `json:"tier"`
	Remove   []string `json:"remove"`
	Cheapest bool     `json:"cheapest"`
}

type jsonEvidence struct {
	ID         string              `json:"id"`
	Kind       string              `json:"kind"`
	Event      string              `json:"event"`
	What       string              `json:"what"`
	Method     string              `json:"method,omitempty"`
	Sample     string              `json:"sample,omitempty"`
	Confidence string              `json:"confidence,omitempty"`
	Bounds     []jsonEvidenceBound `json:"bounds"`
	Source     string              `json:"source,omitempty"`
	Unlisted   bool                `json:"unlisted,omitempty"`
}

type jsonEvidenceBound struct {
	Side      string `json:"side"`
	Date      string `json:"date"`
	Tier      string `json:"tier"`
	Milestone string `json:"milestone,omitempty"`
	Material  string `json:"material,omitempty"`
	Source    string `json:"source,omitempty"`
	Precision string `json:"precision,omitempty"`
}

type jsonDisagreement struct {
	Material       string   `json:"material"`
	Milestone      string   `json:"milestone"`
	Place          *string  `json:"place"`
	Claims         []string `json:"claims"`
	Used           string   `json:"used"`
	ChangesVerdict bool     `json:"changes_verdict"`
	Text           string   `json:"text"`
}

type jsonSource struct {
	Key  string `json:"key"`
	Cite string `json:"cite"`
	URL  string `json:"url,omitempty"`
}

func strPtr(s string) *string {
	if s == "" {
		return nil
	}
	return &s
}

func dayPtr(d date.Day, ok bool) *string {
	if !ok {
		return nil
	}
	s := d.ISO()
	return &s
}

func spans(list []constraint.Span) [][2]*string {
	out := make([][2]*string, 0, len(list))
	for _, s := range list {
		out = append(out, [2]*string{dayPtr(s.First, !s.OpenStart), dayPtr(s.Last, !s.OpenEnd)})
	}
	return out
}

func bound(b constraint.Bound) jsonBound {
	because, chain, from := chainOf(&b)
	out := jsonBound{Because: nonNil(because), Chain: []jsonStep{}, From: strPtr(from), Steps: len(b.Chain)}
	if b.Bounded {
		out.Date = dayPtr(b.Day, true)
		y := b.Day.Year()
		out.Year = &y
		out.Precision = strPtr(b.Precision.String())
	}
	for _, s := range chain {
		out.Chain = append(out.Chain, jsonStep{Evidence: s.Evidence, Text: s.Text})
	}
	return out
}

func nonNil(s []string) []string {
	if s == nil {
		return []string{}
	}
	return s
}

func toJSON(r *constraint.Result) jsonResult {
	out := jsonResult{
		SchemaVersion: SchemaVersion, ID: r.ID, Title: r.Title, File: r.File, Place: strPtr(r.Place),
		Dataset:     jsonDataset{Version: r.Dataset.Version, SHA256: r.Dataset.SHA256},
		Events:      []jsonEvent{},
		Claims:      []jsonClaim{},
		Conflicts:   []jsonConflict{},
		Corrections: []jsonCorrection{},
		Evidence:    []jsonEvidence{},
		Sources:     []jsonSource{},
		Notes:       nonNil(r.Notes), Cautions: nonNil(r.Cautions),
		Disagreements: []jsonDisagreement{},
	}
	for t, ok := range r.Consistent {
		out.Consistent.set(network.Tier(t), ok)
		out.ConflictsComplete.set(network.Tier(t), r.ConflictsComplete[t])
	}
	for _, e := range r.Events {
		je := jsonEvent{ID: e.ID, Label: e.Label, Place: strPtr(e.Place)}
		for t, w := range e.Windows {
			if w == nil {
				continue
			}
			je.Windows.set(network.Tier(t), &jsonWindow{Earliest: bound(w.Earliest), Latest: bound(w.Latest), Intervals: spans(w.Intervals)})
		}
		out.Events = append(out.Events, je)
	}
	for _, c := range r.Claims {
		jc := jsonClaim{ID: c.ID, Event: c.Event, Date: c.Date, By: c.By, Verdict: string(c.Verdict), Deciding: nonNil(c.Deciding),
			DecidingEachAlone: c.DecidingEachAlone, Sentence: c.Sentence, Note: c.Note}
		if c.Verdict != constraint.Undetermined {
			jc.JudgedAt = strPtr(c.JudgedAt.String())
		}
		for t, s := range c.Surviving {
			if len(s) == 0 {
				continue
			}
			first, last := s[0], s[len(s)-1]
			hull := [2]*string{dayPtr(first.First, !first.OpenStart), dayPtr(last.Last, !last.OpenEnd)}
			jc.Surviving.set(network.Tier(t), &hull)
			jc.SurvivingIntervals.set(network.Tier(t), spans(s))
		}
		out.Claims = append(out.Claims, jc)
	}
	for _, c := range r.Conflicts {
		jc := jsonConflict{Tier: c.Tier.String(), Evidence: nonNil(c.Evidence), Steps: []jsonStep{}}
		for _, s := range c.Steps {
			jc.Steps = append(jc.Steps, jsonStep{Evidence: s.Evidence, Text: s.Text})
		}
		out.Conflicts = append(out.Conflicts, jc)
	}
	for _, c := range r.Corrections {
		out.Corrections = append(out.Corrections, jsonCorrection{Tier: c.Tier.String(), Remove: nonNil(c.Evidence), Cheapest: c.Cheapest})
	}
	for _, e := range r.Evidence {
		je := jsonEvidence{ID: e.ID, Kind: e.Kind, Event: e.Event, What: e.What, Method: e.Method, Sample: e.Sample,
			Confidence: e.Confidence, Source: e.Source, Unlisted: e.Unlisted, Bounds: []jsonEvidenceBound{}}
		for _, b := range e.Bounds {
			je.Bounds = append(je.Bounds, jsonEvidenceBound{Side: b.Side, Date: b.Date, Tier: b.Tier.String(),
				Milestone: b.Milestone, Material: b.Material, Source: b.Source})
			if b.Side != "after" {
				je.Bounds[len(je.Bounds)-1].Precision = b.Precision.String()
			}
		}
		out.Evidence = append(out.Evidence, je)
	}
	for _, d := range r.Disagreements {
		out.Disagreements = append(out.Disagreements, jsonDisagreement{Material: d.Material, Milestone: d.Kind,
			Place: strPtr(d.Place), Claims: nonNil(d.Claims), Used: d.Used, ChangesVerdict: d.ChangesVerdict, Text: d.Text})
	}
	for _, s := range r.Sources {
		out.Sources = append(out.Sources, jsonSource{Key: s.Key, Cite: s.Cite, URL: s.URL})
	}
	return out
}
