package materials

import (
	"cmp"
	"errors"
	"math/rand/v2"
	"slices"
	"strings"
	"testing"
	"testing/fstest"

	"terminus/materials/spell"
)

func mapFS(files map[string]string) fstest.MapFS {
	fsys := fstest.MapFS{}
	for name, text := range files {
		fsys[name] = &fstest.MapFile{Data: []byte(text)}
	}
	return fsys
}

func TestFold(t *testing.T) {
	for _, tc := range []struct{ in, want string }{
		{"Eosin Y", "eosiny"},
		{"eosin-y", "eosiny"},
		{"EOSIN  Y", "eosiny"},
		{"Preußischblau", "preussischblau"},
		{"Schwedisch Grün", "schwedischgrun"},
		{"bleu de Prusse", "bleudeprusse"},
		{"vert Véronèse", "vertveronese"},
		{"Æther œuvre", "aetheroeuvre"},
		{"żółcień", "zolcien"},
		{"C.I. 77510", "ci77510"},
		{"58000:1", "580001"},
		{"14038-43-8", "14038438"},
		{"Scheele's green", "scheelesgreen"},
		{"藍", "藍"},
		{"Ελληνικό", "ελληνικό"},
		{"  -- ", ""},
	} {
		if got := fold(tc.in); got != tc.want {
			t.Errorf("fold(%q): got %q, want %q", tc.in, got, tc.want)
		}
	}
}

func TestCIShort(t *testing.T) {
	// The short forms are common practice among conservators.
	for _, tc := range []struct{ in, want string }{
		{"Pigment Blue 27", "PB27"},
		{"Pigment Black 11", "PBk11"},
		{"Pigment Brown 7", "PBr7"},
		{"Natural Red 4", "NR4"},
		{"Basic Violet 3", "BV3"},
		{"Pigment Red 48:2", "PR48:2"},
		{"Solvent Yellow", ""},
		{"Pigment Mauve 1", ""},
		{"Fluorescent Brightener 28", "FB28"},
		{"", ""},
	} {
		if got := ciShort(tc.in); got != tc.want {
			t.Errorf("ciShort(%q): got %q, want %q", tc.in, got, tc.want)
		}
	}
}

func TestLookup(t *testing.T) {
	d, err := LoadFile("testdata/good.yaml")
	if err != nil {
		t.Fatal(err)
	}
	for _, q := range []string{
		"prussian-blue", "Prussian Blue", "PRUSSIAN BLUE", "prussianblue", "Berlin-Blue",
		"Preussischblau", "preußischblau", "Bleu de Prusse",
		"Pigment Blue 27", "PB27", "PB 27", "pb-27", "C.I. Pigment Blue 27",
		"77510", "C.I. 77510", "CI 77510",
		"14038-43-8", "14038438",
	} {
		t.Run(q, func(t *testing.T) {
			m, err := d.Lookup(q)
			if err != nil {
				t.Fatalf("Lookup(%q): %v", q, err)
			}
			if m.ID != "prussian-blue" {
				t.Errorf("Lookup(%q): got %q", q, m.ID)
			}
		})
	}
	if m, err := d.Lookup("scheeles green"); err != nil || m.ID != "scheeles-green" {
		t.Errorf("Lookup(scheeles green): got %v, %v", m, err)
	}
}

func TestLookupMiss(t *testing.T) {
	d, err := LoadFile("testdata/good.yaml")
	if err != nil {
		t.Fatal(err)
	}
	for _, tc := range []struct {
		q    string
		want []string // suggestions, nearest first
	}{
		{"prusian blue", []string{"Prussian blue"}},
		{"Berlin bleu", []string{"Berlin blue"}},
		{"scheele", []string{"Scheele's green"}},
		{"quinacridone", nil},
		{"", nil},
	} {
		t.Run(tc.q, func(t *testing.T) {
			_, err := d.Lookup(tc.q)
			var nf *NotFoundError
			if !errors.As(err, &nf) {
				t.Fatalf("Lookup(%q): got %v, want a *NotFoundError", tc.q, err)
			}
			if !slices.Equal(nf.Suggestions, tc.want) {
				t.Errorf("suggestions: got %q, want %q", nf.Suggestions, tc.want)
			}
			if nf.Name != tc.q || !strings.Contains(nf.Error(), "no material named") {
				t.Errorf("error: got %q", nf.Error())
			}
			if len(tc.want) > 0 && nf.Hint() != "did you mean '"+tc.want[0]+"'?" {
				t.Errorf("hint: got %q", nf.Hint())
			}
		})
	}
}

func TestLookupAmbiguous(t *testing.T) {
	d, err := Load(mapFS(map[string]string{"a.yaml": `sources:
  - {key: k, cite: "Laver, M., Titanium dioxide whites, in Artists' Pigments vol. 3, 1997, pp. 295-355"}
materials:
  - id: titanium-white-anatase
    names: [anatase titanium white]
    class: pigment
    origin: synthetic
    colour_index: {name: Pigment White 6, number: "77891"}
    milestones:
      - {kind: made, date: "1916", source: k, basis: from-memory}
  - id: titanium-white-rutile
    names: [rutile titanium white]
    class: pigment
    origin: synthetic
    colour_index: {name: Pigment White 6, number: "77891"}
    milestones:
      - {kind: made, date: "1938", source: k, basis: from-memory}
`}))
	if err != nil {
		t.Fatal(err)
	}
	_, err = d.Lookup("PW6")
	var amb *AmbiguousError
	if !errors.As(err, &amb) {
		t.Fatalf("Lookup(PW6): got %v, want an *AmbiguousError", err)
	}
	if want := []string{"titanium-white-anatase", "titanium-white-rutile"}; !slices.Equal(amb.Matches, want) {
		t.Errorf("matches: got %q, want %q", amb.Matches, want)
	}
	if !strings.Contains(amb.Hint(), "titanium-white-anatase") {
		t.Errorf("hint: got %q", amb.Hint())
	}
}

func TestCheckCAS(t *testing.T) {
	// Check digits as the CAS registry defines them. The registry numbers
	// below are from memory (water, Prussian blue, litharge); each also
	// passes the rule worked by hand.
	for _, tc := range []struct {
		in string
		ok bool
	}{
		{"7732-18-5", true},  // water
		{"14038-43-8", true}, // Prussian blue
		{"1317-36-8", true},  // lead(II) oxide (litharge)
		{"7732-18-4", false}, // check digit off by one
		{"7732-185", false},  // groups
		{"77a2-18-5", false}, // not digits
		{"1-18-5", false},    // first group too short
		{"12345678-18-5", false},
	} {
		msg, _ := checkCAS(tc.in)
		if got := msg == ""; got != tc.ok {
			t.Errorf("checkCAS(%q): got ok=%v (%q), want %v", tc.in, got, msg, tc.ok)
		}
	}
}

func TestValidID(t *testing.T) {
	for _, tc := range []struct {
		id string
		ok bool
	}{
		{"prussian-blue", true}, {"pigment-red-83", true}, {"a", true}, {"2b", true},
		{"", false}, {"-a", false}, {"a-", false}, {"a--b", false}, {"Prussian-blue", false}, {"a_b", false}, {"é", false},
	} {
		if got := validID(tc.id); got != tc.ok {
			t.Errorf("validID(%q): got %v, want %v", tc.id, got, tc.ok)
		}
	}
}

// TestHandMadeDataset checks that a dataset put together in code, without
// the loader, still answers.
func TestHandMadeDataset(t *testing.T) {
	d := &Dataset{
		Materials: []*Material{{ID: "lead-white", Names: []string{"lead white", "Bleiweiß"}, CAS: "1319-46-6"}},
		Sources:   []Source{{Key: "k", Cite: "a cite"}},
	}
	if m, err := d.Lookup("bleiweiss"); err != nil || m.ID != "lead-white" {
		t.Errorf("Lookup: got %v, %v", m, err)
	}
	if m, err := d.Lookup("1319-46-6"); err != nil || m.ID != "lead-white" {
		t.Errorf("Lookup by CAS: got %v, %v", m, err)
	}
	if s, ok := d.Source("k"); !ok || s.Cite != "a cite" {
		t.Errorf("Source: got %v, %v", s, ok)
	}
	if c, area := d.Arrival(d.Materials[0], "NL"); c != nil || area != "" {
		t.Errorf("Arrival without regions: got %v %q", c, area)
	}
}

// nearestPlain is the suggestion rule spelt out with the exact edit
// distance (held to the textbook table in package spell) and no
// shortcuts: the reference for index.nearest.
func nearestPlain(ix *index, key string, n int) []string {
	kr := []rune(key)
	limit := spell.Limit(key)
	type cand struct {
		shown string
		dist  int
	}
	best := map[string]cand{}
	for _, r := range ix.all {
		dist := spell.Distance(key, r.key)
		if len(key) >= 4 {
			if strings.Contains(r.key, key) {
				dist = min(dist, 1)
			} else if rk := []rune(r.key); len(rk) > len(kr)+1 {
				for n := len(kr) - 1; n <= len(kr)+1; n++ {
					dist = min(dist, spell.Distance(key, string(rk[:n]))+1)
				}
			}
		}
		if dist > limit {
			continue
		}
		id := "group:" + r.key // a marker or family stands for itself
		if m, ok := ix.names[r.key]; ok && !r.group {
			id = m.ID
		}
		if c, ok := best[id]; !ok || dist < c.dist {
			best[id] = cand{r.shown, dist}
		}
	}
	var cs []cand
	for _, c := range best {
		cs = append(cs, c)
	}
	slices.SortFunc(cs, func(a, b cand) int { return cmp.Or(cmp.Compare(a.dist, b.dist), cmp.Compare(a.shown, b.shown)) })
	out := []string{}
	for _, c := range cs {
		if len(out) == n {
			break
		}
		out = append(out, c.shown)
	}
	return out
}

// The pruned suggestion search (rune masks, bounded distances) suggests
// exactly what the plain rule does, for 600 slips of spelling of the
// built-in names: a letter dropped, doubled, swapped or replaced.
func TestNearestMatchesPlainRule(t *testing.T) {
	d := builtinOrFatal(t)
	ix := d.index
	rng := rand.New(rand.NewPCG(3, 4))
	slips := 600
	if testing.Short() {
		slips = 100 // the race pass of CI
	}
	for i := range slips {
		rs := []rune(ix.all[rng.IntN(len(ix.all))].key)
		for range 1 + rng.IntN(3) {
			if len(rs) < 2 {
				break
			}
			j := rng.IntN(len(rs) - 1)
			switch rng.IntN(4) {
			case 0:
				rs = append(rs[:j:j], rs[j+1:]...)
			case 1:
				rs = append(rs[:j+1:j+1], rs[j:]...)
			case 2:
				rs[j], rs[j+1] = rs[j+1], rs[j]
			default:
				rs[j] = []rune("aeiouxyz")[rng.IntN(8)]
			}
		}
		key := string(rs)
		if got, want := ix.nearest(key, 3), nearestPlain(ix, key, 3); !slices.Equal(got, want) {
			t.Fatalf("slip %d %q: nearest = %q, plain rule = %q", i, key, got, want)
		}
	}
}

func TestResolveGroups(t *testing.T) {
	d, err := Load(mapFS(map[string]string{"a.yaml": `sources:
  - {key: k, cite: "Gettens, R. J. and Stout, G. L., Painting Materials, 1942, p. 1"}
materials:
  - id: natural-blue
    names: [natural blue]
    families: [ultramarine]
    markers: [lazurite]
    class: pigment
    origin: mineral
    colour_index: {name: Pigment Blue 29, number: "77007"}
    milestones:
      - {kind: made, date: "0500", source: k, basis: from-memory}
  - id: synthetic-blue
    names: [synthetic blue]
    families: [Ultramarine]
    markers: [lazurite]
    class: pigment
    origin: synthetic
    colour_index: {name: Pigment Blue 29, number: "77007"}
    milestones:
      - {kind: made, date: "1826", source: k, basis: from-memory}
`}))
	if err != nil {
		t.Fatal(err)
	}
	for _, tc := range []struct {
		name string
		kind GroupKind // "" for one material
		ids  string
		why  string
	}{
		{"ultra-marine", GroupFamily, "natural-blue synthetic-blue", "a family, folded"},
		{"Lazurite", GroupMarker, "natural-blue synthetic-blue", "a marker"},
		{"PB29", GroupColourIndex, "natural-blue synthetic-blue", "a shared Colour Index short name"},
		{"synthetic blue", "", "synthetic-blue", "a material's own name is one material"},
	} {
		t.Run(tc.name, func(t *testing.T) {
			r, err := d.Resolve(tc.name)
			if err != nil {
				t.Fatal(err)
			}
			var ids []string
			for _, m := range r.Materials {
				ids = append(ids, m.ID)
			}
			kind := GroupKind("")
			if r.Group != nil {
				kind = r.Group.Kind
			}
			if kind != tc.kind || strings.Join(ids, " ") != tc.ids {
				t.Errorf("Resolve(%q) = %s %v, want %s %s (%s)", tc.name, kind, ids, tc.kind, tc.ids, tc.why)
			}
		})
	}
	var amb *AmbiguousError
	if _, err := d.Lookup("ultramarine"); !errors.As(err, &amb) || amb.Kind != GroupFamily || len(amb.Matches) != 2 {
		t.Errorf("Lookup of a family: %v, want an ambiguity naming two materials", err)
	}
	var nf *NotFoundError
	if _, err := d.Lookup("lazurit"); !errors.As(err, &nf) || len(nf.Suggestions) == 0 || nf.Suggestions[0] != "lazurite" {
		t.Errorf("a misspelt marker: %v, want the marker suggested", err)
	}
}
