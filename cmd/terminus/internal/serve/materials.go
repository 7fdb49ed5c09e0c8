package serve

import (
	"cmp"
	"net/http"
	"slices"
	"strconv"
	"strings"
	"unicode"

	"terminus/constraint"
	"terminus/constraint/date"
	"terminus/materials"
)

// The materials the page searches and browses: every name, marker and
// family of the dataset, folded for a search as people type (case,
// accents, spaces and punctuation ignored).

type materialIndex struct {
	ds      *materials.Dataset
	entries []searchEntry
}

type searchEntry struct {
	key   string // folded
	shown string
	kind  string // "material", "marker", "family"
	m     *materials.Material
	group *materials.Group
}

func newMaterialIndex(ds *materials.Dataset) *materialIndex {
	ix := &materialIndex{ds: ds}
	for _, m := range ds.Materials {
		ix.entries = append(ix.entries, searchEntry{key: fold(m.ID), shown: m.Name(), kind: "material", m: m})
		for _, n := range m.Names {
			ix.entries = append(ix.entries, searchEntry{key: fold(n), shown: n, kind: "material", m: m})
		}
		if m.ColourIndex != nil {
			ix.entries = append(ix.entries, searchEntry{key: fold(m.ColourIndex.Name), shown: m.ColourIndex.Name, kind: "material", m: m})
		}
	}
	for _, g := range ds.Groups() {
		ix.entries = append(ix.entries, searchEntry{key: fold(g.Name), shown: g.Name, kind: string(g.Kind), group: g})
	}
	return ix
}

// fold lowers s and drops accents, spaces and punctuation, so that
// "Scheele's green", "scheeles-green" and "Schéele green" meet.
func fold(s string) string {
	var b strings.Builder
	for _, r := range strings.ToLower(s) {
		if r < 0x80 {
			if unicode.IsLetter(r) || unicode.IsDigit(r) {
				b.WriteRune(r)
			}
			continue
		}
		if base, ok := accentless[r]; ok {
			b.WriteRune(base)
		} else if unicode.IsLetter(r) || unicode.IsDigit(r) {
			b.WriteRune(r)
		}
	}
	return b.String()
}

var accentless = func() map[rune]rune {
	m := map[rune]rune{}
	for base, list := range map[rune]string{
		'a': "àáâãäåāăą", 'c': "çćčĉ", 'e': "èéêëēĕėęě", 'i': "ìíîïīĭį", 'n': "ñńňņ", 'o': "òóôõöøōŏő",
		'u': "ùúûüūŭůűų", 'y': "ýÿ", 's': "śšşș", 'z': "źżž", 'g': "ğ", 'l': "łľ", 'r': "řŕ", 't': "ťţț", 'd': "ď",
	} {
		for _, r := range list {
			m[r] = base
		}
	}
	return m
}()

// hit is one suggestion of the finding's search box.
type hit struct {
	Name    string   `json:"name"`
	Kind    string   `json:"kind"`
	ID      string   `json:"id,omitempty"`
	Display string   `json:"display"`
	Class   string   `json:"class,omitempty"`
	Made    string   `json:"made,omitempty"`
	Members []string `json:"members,omitempty"`
}

// search suggests up to 15 names for a query: names that start with it
// first, then names that contain it, one per material or group.
func (s *Server) search(w http.ResponseWriter, r *http.Request) {
	q := fold(r.URL.Query().Get("q"))
	hits := []hit{}
	if q == "" {
		writeJSON(w, hits)
		return
	}
	type scored struct {
		e     searchEntry
		score int
	}
	var found []scored
	seen := map[string]bool{}
	for _, e := range s.index.entries {
		i := strings.Index(e.key, q)
		if i < 0 {
			continue
		}
		score := 2
		if i == 0 {
			score = 1
		}
		if e.key == q {
			score = 0
		}
		found = append(found, scored{e, score})
	}
	slices.SortStableFunc(found, func(a, b scored) int {
		return cmp.Or(cmp.Compare(a.score, b.score), cmp.Compare(len(a.e.key), len(b.e.key)), cmp.Compare(a.e.key, b.e.key))
	})
	for _, f := range found {
		id := f.e.kind + ":" + f.e.shown
		if f.e.m != nil {
			id = f.e.m.ID
		}
		if seen[id] {
			continue
		}
		seen[id] = true
		h := hit{Name: f.e.shown, Kind: f.e.kind}
		if f.e.m != nil {
			h.ID, h.Display, h.Class, h.Made = f.e.m.ID, f.e.m.Name(), f.e.m.Class, madeText(f.e.m)
		} else {
			h.Display = f.e.shown
			for _, m := range f.e.group.Members {
				h.Members = append(h.Members, m.Name())
			}
		}
		hits = append(hits, h)
		if len(hits) == 15 {
			break
		}
	}
	writeJSON(w, hits)
}

// madeText is a material's first making as people write it.
func madeText(m *materials.Material) string {
	var parts []string
	for _, ms := range m.Claims(materials.KindMade, "") {
		parts = append(parts, ms.Date.String())
	}
	return strings.Join(parts, "; ")
}

// milestoneView is a milestone with its source, for the page.
type milestoneView struct {
	Kind   string `json:"kind"`
	Date   string `json:"date"`
	EDTF   string `json:"edtf"`
	Place  string `json:"place,omitempty"`
	Basis  string `json:"basis"`
	Note   string `json:"note,omitempty"`
	Object string `json:"object,omitempty"`
	Source string `json:"source"`
	Cite   string `json:"cite,omitempty"`
	URL    string `json:"url,omitempty"`
}

type materialView struct {
	ID         string          `json:"id"`
	Name       string          `json:"name"`
	Names      []string        `json:"names"`
	Class      string          `json:"class"`
	Origin     string          `json:"origin"`
	CI         string          `json:"colour_index,omitempty"`
	CAS        string          `json:"cas,omitempty"`
	Formula    string          `json:"formula,omitempty"`
	Note       string          `json:"note,omitempty"`
	Markers    []string        `json:"markers,omitempty"`
	Families   []string        `json:"families,omitempty"`
	Made       string          `json:"made,omitempty"`
	Milestones []milestoneView `json:"milestones,omitempty"`
}

func (s *Server) view(m *materials.Material, full bool) materialView {
	v := materialView{ID: m.ID, Name: m.Name(), Names: m.Names, Class: m.Class, Origin: m.Origin, CAS: m.CAS,
		Formula: m.Formula, Note: m.Note, Markers: m.Markers, Families: m.Families, Made: madeText(m)}
	if m.ColourIndex != nil {
		v.CI = strings.TrimSpace(m.ColourIndex.Name + " " + m.ColourIndex.Number)
	}
	if !full {
		v.Names, v.Note = nil, ""
		return v
	}
	for _, ms := range m.Milestones {
		mv := milestoneView{Kind: string(ms.Kind), Date: ms.Date.String(), EDTF: ms.Date.EDTF(), Basis: string(ms.Basis),
			Note: ms.Note, Object: ms.Object, Source: ms.Source}
		if ms.Place != "" {
			mv.Place = ms.Place
			if s.opts.Dataset.Regions != nil {
				mv.Place = s.opts.Dataset.Regions.Name(ms.Place) + " (" + ms.Place + ")"
			}
		}
		if src, ok := s.opts.Dataset.Source(ms.Source); ok {
			mv.Cite, mv.URL = src.Cite, src.URL
		}
		v.Milestones = append(v.Milestones, mv)
	}
	return v
}

func (s *Server) material(w http.ResponseWriter, r *http.Request) {
	m, err := s.opts.Dataset.Lookup(r.PathValue("id"))
	if err != nil {
		http.Error(w, err.Error(), http.StatusNotFound)
		return
	}
	writeJSON(w, s.view(m, true))
}

// group lists what a marker or family stands for.
func (s *Server) group(w http.ResponseWriter, r *http.Request) {
	name := r.URL.Query().Get("name")
	res, err := s.opts.Dataset.Resolve(name)
	if err != nil {
		http.Error(w, err.Error(), http.StatusNotFound)
		return
	}
	out := struct {
		Name    string         `json:"name"`
		Kind    string         `json:"kind"`
		Members []materialView `json:"members"`
	}{Name: name, Kind: "material"}
	if res.Group != nil {
		out.Kind = string(res.Group.Kind)
	}
	for _, m := range res.Materials {
		out.Members = append(out.Members, s.view(m, true))
	}
	writeJSON(w, out)
}

// filters lists the values the materials browser filters by.
func (s *Server) filters(w http.ResponseWriter, r *http.Request) {
	writeJSON(w, map[string][]string{"classes": materials.Classes(), "origins": materials.Origins()})
}

// materials lists the materials that pass the browser's filters: a text
// in any name, marker or family; a class; an origin; a place (a milestone
// there, or in an area that holds it or that it holds); a period (made
// before its end, and not withdrawn everywhere before its start).
func (s *Server) materials(w http.ResponseWriter, r *http.Request) {
	q := r.URL.Query()
	text := fold(q.Get("q"))
	class, origin, placeCode := q.Get("class"), q.Get("origin"), strings.ToUpper(strings.TrimSpace(q.Get("place")))
	from, fromOK := yearParam(q.Get("from"))
	to, toOK := yearParam(q.Get("to"))
	out := []materialView{}
	for _, m := range s.opts.Dataset.Materials {
		if class != "" && m.Class != class || origin != "" && m.Origin != origin {
			continue
		}
		if text != "" && !s.matches(m, text) {
			continue
		}
		if placeCode != "" && !s.atPlace(m, placeCode) {
			continue
		}
		if (fromOK || toOK) && !inPeriod(m, from, fromOK, to, toOK) {
			continue
		}
		out = append(out, s.view(m, false))
	}
	writeJSON(w, out)
}

func (s *Server) matches(m *materials.Material, text string) bool {
	for _, n := range append(append(append([]string{m.ID}, m.Names...), m.Markers...), m.Families...) {
		if strings.Contains(fold(n), text) {
			return true
		}
	}
	return false
}

func (s *Server) atPlace(m *materials.Material, code string) bool {
	rg := s.opts.Dataset.Regions
	for _, ms := range m.Milestones {
		if ms.Place == "" {
			continue
		}
		if ms.Place == code || rg != nil && (rg.Within(code, ms.Place) || rg.Within(ms.Place, code)) {
			return true
		}
	}
	return false
}

// yearParam reads a year as people write it ("1850", "1200 BCE") through
// the date reader.
func yearParam(s string) (int64, bool) {
	s = strings.TrimSpace(s)
	if s == "" {
		return 0, false
	}
	if n, err := strconv.ParseInt(s, 10, 64); err == nil {
		return n, true
	}
	d, err := date.Parse(s)
	if err != nil {
		return 0, false
	}
	if first, ok := d.Earliest(); ok {
		return first.Year(), true
	}
	return 0, false
}

// inPeriod: made (by its earliest claim) no later than the period's end,
// and not withdrawn everywhere (by the latest claim, with its stock
// allowance) before its start.
func inPeriod(m *materials.Material, from int64, fromOK bool, to int64, toOK bool) bool {
	if toOK {
		made := m.Claims(materials.KindMade, "")
		if len(made) == 0 {
			return false
		}
		early := false
		for _, ms := range made {
			if first, ok := ms.Date.Earliest(); !ok || first.Year() <= to {
				early = true
			}
		}
		if !early {
			return false
		}
	}
	if fromOK {
		for _, ms := range m.Milestones {
			if ms.Kind != materials.KindWithdrawn || ms.Place != "" {
				continue
			}
			allow := constraint.DefaultStockAllowance()
			if ms.Allowance != nil {
				allow = *ms.Allowance
			}
			if last, ok := ms.Date.Latest(); ok && allow.AddTo(last).Year() < from {
				return false
			}
		}
	}
	return true
}
