package materials

import (
	"errors"
	"fmt"
	"strings"
	"testing"

	"terminus/constraint/date"
)

func builtinOrFatal(t testing.TB) *Dataset {
	t.Helper()
	d, err := Builtin()
	if err != nil {
		var b strings.Builder
		ps := Problems(err)
		for _, p := range ps {
			fmt.Fprintf(&b, "\n  %s", p)
		}
		t.Fatalf("the built-in dataset does not load (%d problems):%s\n(%v)", len(ps), b.String(), err)
	}
	return d
}

// TestBuiltinLintsClean is the gate for the dataset files: every problem
// of schema or logic is listed, each with its file and line.
func TestBuiltinLintsClean(t *testing.T) {
	d := builtinOrFatal(t)
	ps := Lint(d)
	if len(ps) > 0 {
		var b strings.Builder
		for _, p := range ps {
			fmt.Fprintf(&b, "\n  %s", p)
		}
		t.Errorf("the built-in dataset has %d lint problems:%s", len(ps), b.String())
	}
	if d.Version != DataVersion || len(d.SHA256) != 64 {
		t.Errorf("version and digest: got %q %q", d.Version, d.SHA256)
	}
	for _, f := range d.Files {
		if !strings.HasPrefix(f, builtinPrefix) {
			t.Errorf("file %q is not named under %s", f, builtinPrefix)
		}
	}
}

// TestBuiltinResolvesEveryName looks every material up by its id, each of
// its names, its Colour Index name, short form and number, and its CAS RN.
// A Colour Index or CAS key that several materials share must name this
// one among its matches.
func TestBuiltinResolvesEveryName(t *testing.T) {
	d := builtinOrFatal(t)
	for _, m := range d.Materials {
		keys := append([]string{m.ID}, m.Names...)
		if ci := m.ColourIndex; ci != nil {
			keys = append(keys, ci.Name, ciShort(ci.Name), ci.Number)
			if ci.Number != "" {
				keys = append(keys, "C.I. "+ci.Number)
			}
		}
		keys = append(keys, m.CAS)
		for _, k := range keys {
			if k == "" {
				continue
			}
			got, err := d.Lookup(k)
			var amb *AmbiguousError
			switch {
			case errors.As(err, &amb):
				found := false
				for _, id := range amb.Matches {
					found = found || id == m.ID
				}
				if !found {
					t.Errorf("Lookup(%q) for %s: ambiguous among %q, without it", k, m.ID, amb.Matches)
				}
			case err != nil:
				t.Errorf("Lookup(%q) for %s: %v", k, m.ID, err)
			case got.ID != m.ID:
				t.Errorf("Lookup(%q) for %s: got %s", k, m.ID, got.ID)
			}
		}
	}
}

// byAbout returns the last day of "about" the written date, as the
// project's default circa policy widens it.
func byAbout(t *testing.T, s string) date.Day {
	t.Helper()
	d, err := date.Parse(s)
	if err != nil {
		t.Fatal(err)
	}
	last, ok := d.Widen(date.DefaultCirca()).Latest()
	if !ok {
		t.Fatalf("%s has no last day", s)
	}
	return last
}

// TestBuiltinTradeFacts checks facts of the trade that any dataset must
// agree with (common practice, no source).
func TestBuiltinTradeFacts(t *testing.T) {
	d := builtinOrFatal(t)

	t.Run("no synthetic organic dye before 1856 without a note", func(t *testing.T) {
		// Common practice: synthetic organic dyes appear from about 1856, the
		// first commercial aniline dye; an earlier one is an exception that
		// its entry must explain.
		limit := date.Gregorian(1856, 1, 1)
		for _, m := range d.Materials {
			if m.Origin != "synthetic" || (m.Class != "dye" && m.Class != "lake") {
				continue
			}
			for _, ms := range m.Claims(KindMade, "") {
				if first, ok := ms.Date.Earliest(); ok && first < limit && ms.Note == "" {
					t.Errorf("%s (%s:%d) is made %s, before 1856, with no note saying why", m.ID, ms.File, ms.Line, ms.Date.EDTF())
				}
			}
		}
	})

	arrivedBy := func(t *testing.T, name, place, about string) {
		t.Helper()
		m, err := d.Lookup(name)
		if err != nil {
			t.Fatalf("Lookup(%q): %v", name, err)
		}
		claims, area := d.Arrival(m, place)
		if len(claims) == 0 {
			t.Fatalf("%s has no arrived milestone for %s or an area holding it", m.ID, place)
		}
		limit := byAbout(t, about)
		for _, c := range claims {
			if first, ok := c.Date.Earliest(); ok && first <= limit {
				return
			}
		}
		t.Errorf("%s arrived in %s (area %s) only after %s: %v", m.ID, place, area, about, claims)
	}
	t.Run("Prussian blue in Japan by about 1830", func(t *testing.T) {
		// Common practice.
		arrivedBy(t, "Prussian blue", "JP", "1830~")
	})
	t.Run("cochineal carmine in Japan by about 1870", func(t *testing.T) {
		// Common practice.
		arrivedBy(t, "cochineal carmine", "JP", "1870~")
	})
	t.Run("madder in use by about 2000 BCE", func(t *testing.T) {
		// Common practice: madder dyed leather by about 2000 BCE
		// (astronomical year -1999).
		m, err := d.Lookup("madder")
		if err != nil {
			t.Fatal(err)
		}
		limit := byAbout(t, "-1999~")
		for _, c := range m.Claims(KindMade, "") {
			if first, ok := c.Date.Earliest(); ok && first <= limit {
				return
			}
		}
		t.Errorf("madder is made only after about 2000 BCE: %v", m.Claims(KindMade, ""))
	})
}

// TestBuiltinStats checks that the counts add up.
func TestBuiltinStats(t *testing.T) {
	d := builtinOrFatal(t)
	s := d.Stats()
	if s.Materials != len(d.Materials) {
		t.Errorf("materials: got %d, want %d", s.Materials, len(d.Materials))
	}
	sum := func(m map[string]int) int {
		n := 0
		for _, v := range m {
			n += v
		}
		return n
	}
	if sum(s.ByClass) != s.Materials || sum(s.ByOrigin) != s.Materials {
		t.Errorf("classes or origins do not add up: %v %v", s.ByClass, s.ByOrigin)
	}
	kinds := 0
	for _, v := range s.ByKind {
		kinds += v
	}
	if kinds != s.Milestones || s.Documented+s.FromMemory != s.Milestones {
		t.Errorf("milestones do not add up: %d by kind, %d+%d by basis, %d in all", kinds, s.Documented, s.FromMemory, s.Milestones)
	}
	if sum(s.ArrivedByRegion) != s.ByKind[KindArrived] || sum(s.ArrivedByPlace) != s.ByKind[KindArrived] {
		t.Errorf("arrivals do not add up: %v %v", s.ArrivedByRegion, s.ArrivedByPlace)
	}
	if s.Withdrawn != s.ByKind[KindWithdrawn] || s.DocumentedLocated > s.Documented || s.SourcesCited > s.Sources {
		t.Errorf("inconsistent stats: %+v", s)
	}
}

func TestStatsSmall(t *testing.T) {
	d, err := LoadFile("testdata/good.yaml")
	if err != nil {
		t.Fatal(err)
	}
	s := d.Stats()
	// good.yaml: two materials, six milestones of which one is documented
	// (and cites handbook-a, whose cite names pages), Prussian blue with two
	// disagreeing made claims.
	want := Stats{Materials: 2, Milestones: 6, Documented: 1, FromMemory: 5, DocumentedLocated: 1,
		Withdrawn: 1, Disagreeing: 1, Sources: 2, SourcesCited: 2}
	got := s
	got.ByClass, got.ByOrigin, got.ByKind, got.ArrivedByRegion, got.ArrivedByPlace, got.BySourceClass = nil, nil, nil, nil, nil, nil
	if fmt.Sprint(got) != fmt.Sprint(want) {
		t.Errorf("stats: got %+v, want %+v", got, want)
	}
	if s.ByKind[KindMade] != 3 || s.ByKind[KindArrived] != 2 || s.ArrivedByRegion["142"] != 2 || s.ArrivedByPlace["030"] != 1 {
		t.Errorf("by kind or region: got %v %v %v", s.ByKind, s.ArrivedByRegion, s.ArrivedByPlace)
	}
	if s.ByClass["pigment"] != 2 || s.ByOrigin["synthetic"] != 2 {
		t.Errorf("by class or origin: got %v %v", s.ByClass, s.ByOrigin)
	}
	if got := s.DocumentedShare(); got < 0.166 || got > 0.167 {
		t.Errorf("documented share: got %v, want 1/6", got)
	}
}

func TestStatsSourcesAndAttestations(t *testing.T) {
	d, err := Load(mapFS(map[string]string{"a.yaml": `sources:
  - {key: blog, cite: "A blog post", type: blog}
  - {key: paper, cite: "A paper, abstract", type: paper}
  - {key: wiki, cite: "An encyclopedia entry", type: reference}
materials:
  - id: a
    class: pigment
    origin: synthetic
    markers: [a marker]
    families: [a family]
    milestones:
      - {kind: made, date: "1850", source: blog, basis: documented}
      - {kind: made, date: "1850/1852", source: paper, basis: documented}
      - {kind: sold, date: "1860", source: blog, basis: documented}
      - {kind: sold, date: "1870", source: paper, basis: documented}
      - {kind: arrived, place: JP, date: "1880", source: blog, basis: documented}
      - {kind: attested, date: "1855", place: FR, object: "a dated sketch", source: wiki, basis: documented}
  - id: b
    class: pigment
    origin: synthetic
    families: [a family]
    milestones:
      - {kind: made, date: "1900", source: paper, basis: documented}
      - {kind: attested, date: "1901", object: "a dated print", source: paper, basis: documented}
`}))
	if err != nil {
		t.Fatal(err)
	}
	s := d.Stats()
	// Weak alone: the blog's sale (the paper's 1870 does not overlap 1860)
	// and its arrival (nothing else in JP); its made claim of 1850 overlaps
	// the paper's 1850/1852 and is backed up.
	if s.WeakAlone != 2 {
		t.Errorf("weak alone: got %d, want 2", s.WeakAlone)
	}
	if want := map[string]int{"web": 3, "scholarly": 4, "encyclopedia": 1}; fmt.Sprint(s.BySourceClass) != fmt.Sprint(want) {
		t.Errorf("by source class: got %v, want %v", s.BySourceClass, want)
	}
	if s.Attested != 2 || s.AttestedMaterials != 2 || s.Markers != 1 || s.Families != 1 {
		t.Errorf("attested %d of %d materials, %d markers, %d families; want 2, 2, 1, 1", s.Attested, s.AttestedMaterials, s.Markers, s.Families)
	}
}

func TestHasLocator(t *testing.T) {
	for _, tc := range []struct {
		cite string
		want bool
	}{
		{"Author, Title, Publisher, 1993, pp. 120-125", true},
		{"Author, Title, 1942, p. 158", true},
		{"Author, Title, 1942, p.158", true},
		{"Author, Title, 1986, section 3.2", true},
		{"Encyclopaedia, 11th ed., 1911, s.v. madder", true},
		{"Author, Title, ch. 5", true},
		{"Author, Title, § 4", true},
		{"Wikipedia contributors, \"Lead-tin yellow\", sections Nomenclature and History", true},
		{"Author, \"A paper\", Heritage Science 6, 2018, abstract", true},
		{"Getty AAT, \"red lead (pigment)\", scope note", true},
		{"Rosetti, The Plictho, recipe 94", true},
		{"Wikipedia-Autoren, \"Paul Böttiger\", whole article", true},
		{"Baty, P., Orr's Zinc White, a blog, 7 April 2012", false},
		{"Author, Title, vol. 1, Publisher, 1986", false},
		{"Journal of the American Institute for Conservation 44 (1), 2005", false},
	} {
		if got := HasLocator(tc.cite); got != tc.want {
			t.Errorf("HasLocator(%q): got %v, want %v", tc.cite, got, tc.want)
		}
	}
}

func TestLintLogic(t *testing.T) {
	d, err := Load(mapFS(map[string]string{"a.yaml": `sources:
  - {key: k, cite: "Gettens, R. J. and Stout, G. L., Painting Materials, 1942, p. 1"}
  - {key: unused, cite: "Harley, R. D., Artists' Pigments c. 1600-1835, 1982"}
materials:
  - id: early-sale
    class: pigment
    origin: synthetic
    milestones:
      - {kind: made, date: "1850", source: k, basis: from-memory}
      - {kind: sold, date: "1840", source: k, basis: from-memory}
      - {kind: withdrawn, date: "1830", source: k, basis: from-memory}
  - id: disagreeing
    class: pigment
    origin: synthetic
    milestones:
      - {kind: made, date: "1704", source: k, basis: from-memory}
      - {kind: made, date: "1706", source: k, basis: from-memory}
      - {kind: sold, date: "1705", source: k, basis: from-memory}
      - {kind: arrived, place: JP, date: "1700/1750", source: k, basis: from-memory}
  - id: never-made
    class: dye
    origin: natural
    milestones:
      - {kind: sold, date: "1800", source: k, basis: from-memory}
  - id: attested-early
    class: pigment
    origin: synthetic
    milestones:
      - {kind: made, date: "1710", source: k, basis: from-memory}
      - {kind: sold, date: "1720", source: k, basis: from-memory}
      - {kind: arrived, place: "150", date: "1715", source: k, basis: from-memory}
      - {kind: arrived, place: JP, date: "1780", source: k, basis: from-memory}
      - {kind: attested, date: "1709", place: NL, object: "a dated painting", source: k, basis: from-memory}
  - id: attested-open
    class: pigment
    origin: synthetic
    milestones:
      - {kind: made, date: "../1600", source: k, basis: from-memory}
      - {kind: made, date: "1650", source: k, basis: from-memory}
      - {kind: arrived, place: JP, date: "1700", source: k, basis: from-memory}
      - {kind: attested, date: "1500", place: DE, object: "a dated altarpiece", source: k, basis: from-memory}
`}))
	if err != nil {
		t.Fatal(err)
	}
	var got []string
	for _, p := range Lint(d) {
		got = append(got, p.String())
	}
	// Why each: a sale before the making; an end before the sale; an
	// arrival starting before the making (a claim that only overlaps the
	// making still starts before it); no making at all; made, sold and the
	// European arrival later than an attestation in the Netherlands (the
	// Japanese arrival is not bounded by it); and nothing for a material
	// whose made claim is open at its start, since it gives no lower bound
	// for an attestation to cap, nor for an arrival to start before.
	want := []string{
		`a.yaml:3:5: source "unused" is never cited`,
		`a.yaml:10:9: sold milestone of "early-sale" (1840) starts before its earliest made claim (1850-01-01)`,
		`a.yaml:11:9: withdrawn milestone of "early-sale" (1830) lies wholly before its earliest sold claim`,
		`a.yaml:19:9: arrived milestone of "disagreeing" (1700/1750) starts before its earliest made claim (1704-01-01)`,
		`a.yaml:20:5: material "never-made" has no made milestone`,
		`a.yaml:29:9: the earliest made claim of "attested-early" (1710) is later than its attestation 1709 in a dated painting (a.yaml:33)`,
		`a.yaml:30:9: the earliest sold claim of "attested-early" (1720) is later than its attestation 1709`,
		`a.yaml:31:9: the earliest arrival in 150 of "attested-early" (1715) is later than its attestation 1709`,
	}
	if len(got) != len(want) {
		t.Fatalf("got %d problems, want %d:\n%s", len(got), len(want), strings.Join(got, "\n"))
	}
	for i := range want {
		if !strings.HasPrefix(got[i], want[i]) {
			t.Errorf("problem %d: got %q, want %q", i, got[i], want[i])
		}
	}
}

func BenchmarkBuiltin(b *testing.B) {
	b.ReportAllocs()
	for b.Loop() {
		if _, err := loadBuiltin(); err != nil {
			b.Fatal(err)
		}
	}
}

func BenchmarkLookup(b *testing.B) {
	d := builtinOrFatal(b)
	b.ReportAllocs()
	for b.Loop() {
		if _, err := d.Lookup("Pigment Blue 27"); err != nil {
			var amb *AmbiguousError
			if !errors.As(err, &amb) {
				b.Fatal(err)
			}
		}
	}
}

func TestCINameShape(t *testing.T) {
	for _, tc := range []struct {
		name string
		ok   bool
	}{
		{"Pigment Blue 27", true}, {"Pigment Red 48:2", true}, {"Fluorescent Brightener 28", true}, {"Natural Red 4", true},
		{"Pigment Blue27", false}, {"pigment blue 27", false}, {"Pigment Blue 27:", false}, {"Pigment  Blue 27", false},
		{"PB27", false}, {"Pigment Blue 2a", false}, {"", false},
	} {
		if got := ciNameShape(tc.name); got != tc.ok {
			t.Errorf("ciNameShape(%q): got %v, want %v", tc.name, got, tc.ok)
		}
	}
}

// BenchmarkLookupUnknown is the cost of a misspelt name: the suggestions
// compare it with every name of the dataset.
func BenchmarkLookupUnknown(b *testing.B) {
	d := builtinOrFatal(b)
	b.ReportAllocs()
	for b.Loop() {
		var nf *NotFoundError
		if _, err := d.Lookup("prusian bleu"); !errors.As(err, &nf) || len(nf.Suggestions) == 0 {
			b.Fatalf("got %v", err)
		}
	}
}

// TestBuiltinReach holds the built-in dataset to what the project promises
// of it, as `terminus materials stats` counts: its breadth, its own proof
// by attestations, and how well it is sourced (every source typed, at least
// 97 % of milestones read in their source, at most 15 resting on a weak
// source alone).
func TestBuiltinReach(t *testing.T) {
	d := builtinOrFatal(t)
	s := d.Stats()
	for _, c := range []struct {
		what      string
		got, want int
	}{
		{"materials", s.Materials, 380},
		{"arrivals", s.ByKind[KindArrived], 320},
		{"places with arrivals", len(s.ArrivedByPlace), 50},
		{"attestations", s.Attested, 100},
		{"materials with an attestation", s.AttestedMaterials, 60},
	} {
		if c.got < c.want {
			t.Errorf("%s: %d, want at least %d", c.what, c.got, c.want)
		}
	}
	if share := s.DocumentedShare(); share < 0.97 {
		t.Errorf("documented: %.1f%%, want at least 97%%", 100*share)
	}
	if s.WeakAlone > 15 {
		t.Errorf("milestones resting on a weak source alone: %d, want at most 15", s.WeakAlone)
	}
	for _, src := range d.Sources {
		if src.Type == "" {
			t.Errorf("source %q (%s:%d) has no type", src.Key, src.File, src.Line)
		}
	}
}
