package report

import (
	"bytes"
	"encoding/json"
	"os"
	"path/filepath"
	"regexp"
	"strings"
	"testing"

	"terminus/cmd/terminus/internal/nodetest"
	"terminus/constraint/network"
)

var contextFile = filepath.Join(repoRoot, "docs", "linked-art-context.json")

func linkedArtDoc(t *testing.T, path string, opts LinkedArtOptions) (map[string]any, []byte) {
	t.Helper()
	var b bytes.Buffer
	if err := LinkedArt(opts)(&b, builtinResult(t, path)); err != nil {
		t.Fatal(err)
	}
	var doc map[string]any
	if err := json.Unmarshal(b.Bytes(), &doc); err != nil {
		t.Fatalf("not JSON: %v", err)
	}
	return doc, b.Bytes()
}

// get follows a path of keys and list indexes through a decoded document.
func get(v any, path ...any) any {
	for _, p := range path {
		switch k := p.(type) {
		case string:
			m, _ := v.(map[string]any)
			v = m[k]
		case int:
			l, _ := v.([]any)
			if k >= len(l) {
				return nil
			}
			v = l[k]
		}
	}
	return v
}

func TestLinkedArtShape(t *testing.T) {
	landscape := filepath.Join(repoRoot, "examples", "retouched-landscape", "case.yaml")
	for _, tc := range []struct {
		name  string
		path  string
		opts  LinkedArtOptions
		where []any
		want  any
		why   string
	}{
		{"object", landscape, LinkedArtOptions{}, []any{"type"}, "HumanMadeObject", "the object is a Linked Art HumanMadeObject"},
		{"hard begin", landscape, LinkedArtOptions{}, []any{"produced_by", "timespan", "begin_of_the_begin"}, "1809-01-01T00:00:00Z", "the hard window starts with chrome yellow, made 1809"},
		{"hard end open", landscape, LinkedArtOptions{}, []any{"produced_by", "timespan", "end_of_the_end"}, nil, "an open end is left out, never invented"},
		{"firm end", landscape, LinkedArtOptions{Tier: network.Firm}, []any{"produced_by", "timespan", "end_of_the_end"}, "1902-12-31T23:59:59Z", "the firm window ends with the sale record of 1902"},
		{"later event", landscape, LinkedArtOptions{}, []any{"modified_by", 0, "_label"}, "retouching in the sky", "an event after the production is a modification"},
		{"cited evidence", landscape, LinkedArtOptions{}, []any{"produced_by", "timespan", "assigned_by", 0, "used_specific_object", 0, "_label"}, "f-highlight", "the dating cites the evidence at the bound"},
		{"chosen production", filepath.Join(repoRoot, "examples", "oak-panel", "case.yaml"), LinkedArtOptions{Production: "painting"}, []any{"produced_by", "part", 0, "_label"}, "last heartwood ring formed", "an event before the production is a part of it"},
		{"BCE", filepath.Join(repoRoot, "examples", "ancient-textile", "case.yaml"), LinkedArtOptions{}, []any{"produced_by", "timespan", "begin_of_the_begin"}, "-2999-01-01T00:00:00Z", "3000 BCE is astronomical -2999, as XML Schema 1.1 counts"},
		{"conflict", filepath.Join(repoRoot, "testdata", "picture", "conflicting-tiers.yaml"), LinkedArtOptions{Tier: network.Firm}, []any{"produced_by", "timespan"}, nil, "a tier in conflict gives no time-span"},
	} {
		t.Run(tc.name, func(t *testing.T) {
			doc, _ := linkedArtDoc(t, tc.path, tc.opts)
			if got := get(doc, tc.where...); got != tc.want {
				t.Errorf("%v = %v, want %v (%s)", tc.where, got, tc.want, tc.why)
			}
		})
	}
}

func TestLinkedArtUnknownProduction(t *testing.T) {
	var b bytes.Buffer
	err := LinkedArt(LinkedArtOptions{Production: "paintnig"})(&b, builtinResult(t, filepath.Join(repoRoot, "examples", "oak-panel", "case.yaml")))
	if err == nil || !strings.Contains(err.Error(), "heartwood, felling, painting") {
		t.Errorf("an unknown production event: %v, want an error that lists the events", err)
	}
}

// TestLinkedArtUsesOnlyShippedTerms checks, without node, that every key
// and class the export writes is a term of the shipped context.
func TestLinkedArtUsesOnlyShippedTerms(t *testing.T) {
	data, err := os.ReadFile(contextFile)
	if err != nil {
		t.Fatal(err)
	}
	var ctx struct {
		Context map[string]any `json:"@context"`
	}
	if err := json.Unmarshal(data, &ctx); err != nil {
		t.Fatal(err)
	}
	var walk func(v any)
	walk = func(v any) {
		switch x := v.(type) {
		case map[string]any:
			for k, val := range x {
				if k != "@context" && ctx.Context[k] == nil {
					t.Errorf("key %q is not in the shipped context", k)
				}
				if k == "type" && ctx.Context[val.(string)] == nil {
					t.Errorf("class %q is not in the shipped context", val)
				}
				walk(val)
			}
		case []any:
			for _, e := range x {
				walk(e)
			}
		}
	}
	for _, f := range append(pictureCases(t), filepath.Join(repoRoot, "examples", "oak-panel", "case.yaml")) {
		for _, tier := range []network.Tier{network.Hard, network.Firm, network.Soft} {
			doc, _ := linkedArtDoc(t, f, LinkedArtOptions{Tier: tier})
			walk(doc)
		}
	}
}

// TestLinkedArtExpandsToRDF has jsonld.js (the JSON-LD processor of the
// W3C JSON-LD working group's editors) expand every export and convert it
// to RDF in safe mode, which fails on any term it would drop, with the
// shipped context, and looks for the time-span in the triples.
func TestLinkedArtExpandsToRDF(t *testing.T) {
	nodetest.Need(t, false)
	cases, _ := filepath.Glob(filepath.Join(repoRoot, "examples", "*", "case.yaml"))
	cases = append(cases, pictureCases(t)...)
	begin := regexp.MustCompile(`<http://www\.cidoc-crm\.org/cidoc-crm/P82a_begin_of_the_begin> "(-?[0-9]{4,}-[0-9]{2}-[0-9]{2}T00:00:00Z)"\^\^<http://www\.w3\.org/2001/XMLSchema#dateTime>`)
	var docs []json.RawMessage
	for _, f := range cases {
		_, raw := linkedArtDoc(t, f, LinkedArtOptions{Tier: network.Firm})
		docs = append(docs, raw)
	}
	in, _ := json.Marshal(docs)
	var all []string
	if err := json.Unmarshal(nodetest.Run(t, in, "expand.mjs", contextFile), &all); err != nil || len(all) != len(cases) {
		t.Fatalf("expand.mjs gave %d results for %d documents (%v)", len(all), len(cases), err)
	}
	for i, f := range cases {
		quads := all[i]
		name := filepath.Base(filepath.Dir(f)) + "/" + filepath.Base(f)
		if !strings.Contains(quads, "<http://www.cidoc-crm.org/cidoc-crm/E22_Human-Made_Object>") {
			t.Errorf("%s: no E22 Human-Made Object in the RDF", name)
		}
		if !strings.Contains(quads, "<http://www.cidoc-crm.org/cidoc-crm/P108i_was_produced_by>") {
			t.Errorf("%s: no production in the RDF", name)
		}
		if strings.Contains(f, "conflicting-tiers") || strings.Contains(f, "hard-conflict") {
			continue // no firm window: no time-span to find
		}
		if !begin.MatchString(quads) && !strings.Contains(quads, "P82b_end_of_the_end") {
			t.Errorf("%s: no time-span bound in the RDF:\n%s", name, quads)
		}
	}
}

// TestShippedContextMatchesLinkedArt holds every term of the shipped
// context to the property or class the published Linked Art context
// (https://linked.art/ns/v1/linked-art.json) gives it. The pairs were
// checked against that context as the OpenAtlas project (craws/OpenAtlas,
// openatlas/api/resources/resolve_endpoints.py, parse_loud_context) lists
// it, IRI to term; they had been written from memory of the model.
func TestShippedContextMatchesLinkedArt(t *testing.T) {
	linkedArt := map[string]string{
		"_label":               "rdfs:label",
		"HumanMadeObject":      "crm:E22_Human-Made_Object",
		"Production":           "crm:E12_Production",
		"Modification":         "crm:E11_Modification",
		"Activity":             "crm:E7_Activity",
		"TimeSpan":             "crm:E52_Time-Span",
		"Place":                "crm:E53_Place",
		"Name":                 "crm:E33_E41_Linguistic_Appellation",
		"Identifier":           "crm:E42_Identifier",
		"LinguisticObject":     "crm:E33_Linguistic_Object",
		"AttributeAssignment":  "crm:E13_Attribute_Assignment",
		"identified_by":        "crm:P1_is_identified_by",
		"content":              "crm:P190_has_symbolic_content",
		"referred_to_by":       "crm:P67i_is_referred_to_by",
		"produced_by":          "crm:P108i_was_produced_by",
		"modified_by":          "crm:P31i_was_modified_by",
		"part":                 "crm:P9_consists_of",
		"took_place_at":        "crm:P7_took_place_at",
		"timespan":             "crm:P4_has_time-span",
		"begin_of_the_begin":   "crm:P82a_begin_of_the_begin",
		"end_of_the_end":       "crm:P82b_end_of_the_end",
		"assigned_by":          "crm:P141i_was_assigned_by",
		"used_specific_object": "crm:P16_used_specific_object",
	}
	data, err := os.ReadFile(contextFile)
	if err != nil {
		t.Fatal(err)
	}
	var ctx struct {
		Context map[string]json.RawMessage `json:"@context"`
	}
	if err := json.Unmarshal(data, &ctx); err != nil {
		t.Fatal(err)
	}
	prefixes := map[string]bool{"@version": true, "crm": true, "rdfs": true, "xsd": true, "id": true, "type": true}
	for term, raw := range ctx.Context {
		if prefixes[term] {
			continue
		}
		var def struct {
			ID string `json:"@id"`
		}
		if err := json.Unmarshal(raw, &def); err != nil {
			t.Errorf("term %q: %v", term, err)
			continue
		}
		want, ok := linkedArt[term]
		switch {
		case !ok:
			t.Errorf("term %q (%s) is not one this test has checked against Linked Art", term, def.ID)
		case def.ID != want:
			t.Errorf("term %q is %s in the shipped context, %s in Linked Art's", term, def.ID, want)
		}
	}
	for term := range linkedArt {
		if _, ok := ctx.Context[term]; !ok {
			t.Errorf("the shipped context lacks %q", term)
		}
	}
}
