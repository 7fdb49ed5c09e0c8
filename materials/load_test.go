package materials

import (
	"errors"
	"os"
	"path/filepath"
	"slices"
	"strings"
	"testing"
	"testing/fstest"
)

func TestLoadGood(t *testing.T) {
	for _, name := range []string{"testdata/good.yaml", "testdata/good.toml"} {
		t.Run(filepath.Base(name), func(t *testing.T) {
			d, err := LoadFile(name)
			if err != nil {
				t.Fatalf("LoadFile: %v", err)
			}
			if got, want := len(d.Materials), 2; got != want {
				t.Fatalf("materials: got %d, want %d", got, want)
			}
			if got, want := len(d.Sources), 2; got != want {
				t.Fatalf("sources: got %d, want %d", got, want)
			}
			pb := d.Materials[0]
			if pb.ID != "prussian-blue" || pb.Class != "pigment" || pb.Origin != "synthetic" {
				t.Errorf("first material: got %q %q %q", pb.ID, pb.Class, pb.Origin)
			}
			if want := []string{"Prussian blue", "Berlin blue", "Preußischblau", "bleu de Prusse"}; !slices.Equal(pb.Names, want) {
				t.Errorf("names: got %q, want %q", pb.Names, want)
			}
			if pb.ColourIndex == nil || pb.ColourIndex.Name != "Pigment Blue 27" || pb.ColourIndex.Number != "77510" {
				t.Errorf("colour index: got %+v", pb.ColourIndex)
			}
			if pb.CAS != "14038-43-8" || pb.Formula != "Fe4[Fe(CN)6]3" {
				t.Errorf("cas, formula: got %q %q", pb.CAS, pb.Formula)
			}
			if got := len(pb.Milestones); got != 4 {
				t.Fatalf("milestones: got %d, want 4", got)
			}
			m := pb.Milestones[2]
			if m.Kind != KindArrived || m.Place != "JP" || m.Date.EDTF() != "1830~" || m.Basis != BasisFromMemory || m.Source != "handbook-b" {
				t.Errorf("third milestone: got %+v", m)
			}
			if m.File != name || m.Line == 0 {
				t.Errorf("third milestone position: got %s:%d", m.File, m.Line)
			}
			sg := d.Materials[1]
			w := sg.Milestones[1]
			if w.Kind != KindWithdrawn || w.Allowance == nil || w.Allowance.Years != 10 {
				t.Errorf("withdrawn milestone: got %+v (allowance %v)", w, w.Allowance)
			}
			if sg.Milestones[0].Allowance != nil {
				t.Errorf("made milestone has an allowance")
			}
			src, ok := d.Source("handbook-b")
			if !ok || !strings.HasPrefix(src.Cite, "Gettens") || src.URL == "" {
				t.Errorf("Source(handbook-b): got %+v, %v", src, ok)
			}
			if _, ok := d.Source("nope"); ok {
				t.Errorf("Source(nope) found something")
			}
			if len(d.SHA256) != 64 {
				t.Errorf("SHA256: got %q", d.SHA256)
			}
		})
	}
}

// TestLoadGoodLines checks that the TOML reader finds the lines of its
// tables, as the YAML reader does.
func TestLoadGoodLines(t *testing.T) {
	for _, tc := range []struct {
		file                string
		material, milestone int // line of the first material and of its third milestone
	}{
		{"testdata/good.yaml", 10, 21},
		{"testdata/good.toml", 11, 33},
	} {
		t.Run(filepath.Base(tc.file), func(t *testing.T) {
			d, err := LoadFile(tc.file)
			if err != nil {
				t.Fatal(err)
			}
			if got := d.Materials[0].Line; got != tc.material {
				t.Errorf("material line: got %d, want %d", got, tc.material)
			}
			if got := d.Materials[0].Milestones[2].Line; got != tc.milestone {
				t.Errorf("milestone line: got %d, want %d", got, tc.milestone)
			}
		})
	}
}

func TestLoadErrors(t *testing.T) {
	for _, tc := range []struct {
		file string
		pos  string // FILE:LINE:COL (or FILE:LINE) the first problem starts with
		msg  string // part of the message
		hint string // part of the hint; "" for none expected
	}{
		{"unknown-key.yaml", "10:56", `milestone: unknown key "bassis"`, "did you mean 'basis'"},
		{"unknown-key.toml", "20:1", `milestone: unknown key "sorce"`, "did you mean 'source'"},
		{"unknown-top.yaml", "1:1", `materials file: unknown key "source"`, "did you mean 'sources'"},
		{"bad-date.yaml", "10:", `bad date "17x6"`, "EDTF"},
		{"unknown-source.yaml", "10:44", `cites source "handbok-a", which is not in the bibliography`, "did you mean 'handbook-a'"},
		// One suggestion rule (spell.Nearest) for every hint: a key that differs only in case is a slip too.
		{"unknown-source-case.yaml", "10:44", `cites source "HANDBOOK-A", which is not in the bibliography`, "did you mean 'handbook-a'"},
		{"unknown-place.yaml", "11:32", `unknown place "Japan"`, "did you mean 'JP'"},
		{"place-number.yaml", "11:32", `unknown place "30"`, "did you mean '030'"},
		{"bad-kind.yaml", "10:16", `unknown milestone kind "maked"`, "did you mean 'made'"},
		{"bad-basis.yaml", "10:63", `unknown basis "read"`, "from-memory"},
		{"allowance-on-made.yaml", "10:76", "allowance on a made milestone", "only a withdrawn milestone"},
		{"missing-source.yaml", "10:9", "cites no source", "source key"},
		{"arrived-no-place.yaml", "11:9", "arrived milestone", "place"},
		{"duplicate-id.yaml", "11:5", `id "prussian-blue" is already used at testdata/bad/duplicate-id.yaml:5`, "unique"},
		{"duplicate-name.yaml", "11:5", `name "PRUSSIAN-BLUE" of "berlin-blue" is also a name of "prussian-blue"`, "one material"},
		{"duplicate-key.yaml", "8:5", `key "class" is given twice`, "keep one"},
		{"bad-class.yaml", "7:12", `unknown class "pigmnet"`, "did you mean 'pigment'"},
		{"bad-cas.yaml", "7:10", "check digit is 9, but the digits before it give 8", "mistyped"},
		{"bad-id.yaml", "5:9", `id "Prussian Blue" is not lower case`, "'prussian-blue'"},
		{"ci-number.yaml", "7:51", `Colour Index number "7751"`, `"77510"`},
		{"syntax.yaml", "10", "not valid YAML", "indentation"},
		{"syntax.toml", "2:18", "not valid TOML", "quoting"},
		{"two-docs.yaml", "11:1", "one YAML document", "'---'"},
		{"object-on-made.yaml", "10:76", "object on a made milestone", "only an attested milestone"},
		{"attested-no-object.yaml", "11:9", "names no object", "add object:"},
		{"bad-source-type.yaml", "4:11", `unknown type "bok" of source "handbook-a"`, "did you mean 'book'"},
		{"group-is-a-name.yaml", "11:5", `family "Ultramarine" of "natural-ultramarine" is also a name of the material "synthetic-ultramarine"`, "markers or families"},
	} {
		t.Run(tc.file, func(t *testing.T) {
			name := filepath.Join("testdata", "bad", tc.file)
			d, err := LoadFile(name)
			if err == nil {
				t.Fatalf("LoadFile(%s): no error, %d materials", name, len(d.Materials))
			}
			var e *Error
			if !errors.As(err, &e) {
				t.Fatalf("error %v (%T) is not a *Error", err, err)
			}
			want := name + ":" + tc.pos + ": "
			if strings.HasSuffix(tc.pos, ":") {
				want = name + ":" + tc.pos // the column is the date parser's to choose
			}
			if !strings.HasPrefix(e.Error(), want) {
				t.Errorf("error: got %q, want it to start with %q", e.Error(), want)
			}
			if !strings.Contains(e.Msg, tc.msg) {
				t.Errorf("message: got %q, want it to contain %q", e.Msg, tc.msg)
			}
			if tc.hint != "" && !strings.Contains(e.Hint(), tc.hint) {
				t.Errorf("hint: got %q, want it to contain %q", e.Hint(), tc.hint)
			}
			if len(errorsAsList(err)) != 1 {
				t.Errorf("want exactly one problem, got %v", errorsAsList(err))
			}
		})
	}
}

func TestLoadCollectsEveryProblem(t *testing.T) {
	fsys := fstest.MapFS{
		"a.yaml": {Data: []byte(`sources:
  - {key: k, cite: "Gettens, R. J. and Stout, G. L., Painting Materials, 1942"}
materials:
  - id: one
    class: pigmnet
    origin: mineral
    milestones:
      - {kind: made, date: "18x6", source: k, basis: documented}
  - id: two
    class: dye
    origin: natural
    milestones:
      - {kind: made, date: "1856", source: kk, basis: documented}
`)},
		"b.yaml": {Data: []byte(`sources:
  - {key: k, cite: "the same key again"}
`)},
		"notes.txt": {Data: []byte("not read")},
	}
	_, err := Load(fsys)
	list := errorsAsList(err)
	var got []string
	for _, e := range list {
		got = append(got, e.Error())
	}
	want := []string{
		"a.yaml:5:12: ",  // the class
		"a.yaml:8:",      // the date (its column is the date parser's)
		"a.yaml:13:44: ", // the unknown source, at its key
		"b.yaml:2:",      // the duplicate key
	}
	if len(got) != len(want) {
		t.Fatalf("got %d problems, want %d:\n%s", len(got), len(want), strings.Join(got, "\n"))
	}
	for i := range want {
		if !strings.HasPrefix(got[i], want[i]) {
			t.Errorf("problem %d: got %q, want it to start with %q", i, got[i], want[i])
		}
	}
	if !strings.Contains(err.Error(), "and 3 more problems") {
		t.Errorf("error text: got %q, want it to count the others", err.Error())
	}
}

func TestLoadEmptyAndUnknownFormat(t *testing.T) {
	d, err := Load(fstest.MapFS{"empty.yaml": {Data: nil}, "comment.toml": {Data: []byte("# nothing\n")}})
	if err != nil {
		t.Fatalf("empty files: %v", err)
	}
	if len(d.Materials) != 0 || len(d.Files) != 2 {
		t.Errorf("empty files: got %d materials from %q", len(d.Materials), d.Files)
	}
	dir := t.TempDir()
	p := filepath.Join(dir, "mine.txt")
	if err := os.WriteFile(p, []byte("materials: []\n"), 0o644); err != nil {
		t.Fatal(err)
	}
	_, err = LoadFile(p)
	var e *Error
	if !errors.As(err, &e) || !strings.Contains(e.Msg, ".yaml") {
		t.Errorf("LoadFile(.txt): got %v, want an error naming the accepted extensions", err)
	}
	if _, err := LoadFile(filepath.Join(dir, "absent.yaml")); !errors.Is(err, os.ErrNotExist) {
		t.Errorf("LoadFile(absent): got %v, want os.ErrNotExist", err)
	}
}

func TestExtendAndOverlay(t *testing.T) {
	base, err := LoadFile("testdata/good.yaml")
	if err != nil {
		t.Fatal(err)
	}
	dir := t.TempDir()
	user := filepath.Join(dir, "mine.yaml")
	// Cites a base source, replaces one material, adds another.
	if err := os.WriteFile(user, []byte(`materials:
  - id: prussian-blue
    names: [Prussian blue, Berliner Blau]
    class: pigment
    origin: synthetic
    milestones:
      - {kind: made, date: "1706", source: handbook-a, basis: documented}
  - id: smalt
    names: [smalt]
    class: pigment
    origin: synthetic
    milestones:
      - {kind: made, date: "15XX", source: handbook-b, basis: from-memory}
`), 0o644); err != nil {
		t.Fatal(err)
	}
	d, notes, err := base.Extend(user)
	if err != nil {
		t.Fatalf("Extend: %v", err)
	}
	if len(notes) != 1 || !strings.Contains(notes[0], `"prussian-blue"`) || !strings.Contains(notes[0], user) {
		t.Errorf("notes: got %q, want one naming prussian-blue and the file", notes)
	}
	if got := len(d.Materials); got != 3 {
		t.Fatalf("materials: got %d, want 3", got)
	}
	m, err := d.Lookup("Berliner Blau")
	if err != nil || m.ID != "prussian-blue" || len(m.Milestones) != 1 {
		t.Errorf("replaced entry: got %v, %v", m, err)
	}
	if _, err := d.Lookup("Berlin blue"); err == nil {
		t.Errorf("a name of the replaced entry still resolves")
	}
	if d.SHA256 == base.SHA256 || d.Version != "local" {
		t.Errorf("overlay of a local set: digest %s (base %s), version %q", d.SHA256, base.SHA256, d.Version)
	}
	versioned := *base
	versioned.Version = DataVersion
	if o, _ := Overlay(&versioned, d); o.Version != DataVersion+"+local" {
		t.Errorf("overlay of the built-in version: got %q", o.Version)
	} else if o2, _ := Overlay(o, d); o2.Version != o.Version {
		t.Errorf("overlay of an overlay: got %q", o2.Version)
	}
	if len(base.Materials) != 2 || base.Materials[0].Names[1] != "Berlin blue" {
		t.Errorf("Extend changed the base")
	}

	// A user material that takes a base material's name under another id.
	clash := filepath.Join(dir, "clash.yaml")
	if err := os.WriteFile(clash, []byte(`materials:
  - id: my-blue
    names: [Berlin blue]
    class: pigment
    origin: synthetic
    milestones:
      - {kind: made, date: "1706", source: handbook-a, basis: documented}
`), 0o644); err != nil {
		t.Fatal(err)
	}
	_, _, err = base.Extend(clash)
	var e *Error
	if !errors.As(err, &e) || !strings.Contains(e.Msg, `"prussian-blue"`) || !strings.Contains(e.Hint(), `id "prussian-blue"`) {
		t.Errorf("name clash: got %v (hint %q)", err, hintOf(err))
	}
}

func hintOf(err error) string {
	var h interface{ Hint() string }
	if errors.As(err, &h) {
		return h.Hint()
	}
	return ""
}

func TestArrival(t *testing.T) {
	d, err := LoadFile("testdata/good.yaml")
	if err != nil {
		t.Fatal(err)
	}
	pb, err := d.Lookup("prussian blue")
	if err != nil {
		t.Fatal(err)
	}
	for _, tc := range []struct {
		place, area, date string
	}{
		{"JP", "JP", "1830~"},  // its own claim
		{"CN", "030", "1840"},  // Eastern Asia's claim holds for China
		{"030", "030", "1840"}, // the area itself
		{"NL", "", ""},         // no claim for Western Europe, Europe or the world
		{"XX", "", ""},         // unknown
	} {
		t.Run(tc.place, func(t *testing.T) {
			claims, area := d.Arrival(pb, tc.place)
			if area != tc.area {
				t.Fatalf("area: got %q, want %q", area, tc.area)
			}
			if tc.date == "" {
				if claims != nil {
					t.Errorf("claims: got %v, want none", claims)
				}
				return
			}
			if len(claims) != 1 || claims[0].Date.EDTF() != tc.date {
				t.Errorf("claims: got %v, want one dated %s", claims, tc.date)
			}
		})
	}
}

func TestOverlaySourceNote(t *testing.T) {
	base, err := LoadFile("testdata/good.yaml")
	if err != nil {
		t.Fatal(err)
	}
	user, err := Load(mapFS(map[string]string{"mine.toml": `
[[sources]]
key = "handbook-b"
cite = "Gettens, R. J. and Stout, G. L., Painting Materials: A Short Encyclopaedia, Dover reprint, New York, 1966, p. 158"
`}))
	if err != nil {
		t.Fatal(err)
	}
	d, notes := Overlay(base, user)
	if len(notes) != 1 || !strings.Contains(notes[0], `source "handbook-b" from mine.toml replaces the built-in entry`) {
		t.Errorf("notes: got %q", notes)
	}
	if s, _ := d.Source("handbook-b"); !strings.Contains(s.Cite, "Dover") {
		t.Errorf("source after overlay: got %q", s.Cite)
	}
	if len(d.Sources) != 2 || len(d.Files) != 2 {
		t.Errorf("sources %d, files %q", len(d.Sources), d.Files)
	}
	// The same cite again is no replacement worth a note.
	same, err := Load(mapFS(map[string]string{"same.yaml": "sources:\n  - key: handbook-a\n    cite: \"" +
		"Feller, R. L. (ed.), Artists' Pigments: A Handbook of Their History and Characteristics, vol. 1, National Gallery of Art, Washington, 1986, pp. 191-217\"\n"}))
	if err != nil {
		t.Fatal(err)
	}
	if _, notes := Overlay(base, same); len(notes) != 0 {
		t.Errorf("identical source: notes %q", notes)
	}
}

func TestTOMLErrorLines(t *testing.T) {
	_, err := Load(mapFS(map[string]string{"m.toml": `[[sources]]
key = "k"
cite = "Gettens, R. J. and Stout, G. L., Painting Materials, 1942, p. 1"

[[materials]]
id = "vermilion"
class = "pigment"
origin = "mineral"

[[materials.milestones]]
kind = "made"
date = "07XX~"
source = "k"
basis = "documented"

[[materials.milestones]]
kind = "arrived"
place = "Europe"
date = "0800"
source = "k"
basis = "documented"

[[materials.milestones]]
kind = "made"
date = "not a date"
source = "k"
basis = "read"
`}))
	var got []string
	for _, e := range errorsAsList(err) {
		got = append(got, e.Error())
	}
	want := []string{
		`m.toml:18:9: unknown place "Europe"`,
		`m.toml:25:8: bad date "not a date"`,
		`m.toml:27:9: unknown basis "read"`,
	}
	if len(got) != len(want) {
		t.Fatalf("got %d problems, want %d:\n%s", len(got), len(want), strings.Join(got, "\n"))
	}
	for i := range want {
		if !strings.HasPrefix(got[i], want[i]) {
			t.Errorf("problem %d: got %q, want %q", i, got[i], want[i])
		}
	}
	if h := errorsAsList(err)[0].Hint(); !strings.Contains(h, "'150'") {
		t.Errorf("hint for Europe: got %q, want it to suggest 150", h)
	}
}

func TestLintFilesListsSchemaProblems(t *testing.T) {
	b, err := os.ReadFile("testdata/bad/unknown-key.yaml")
	if err != nil {
		t.Fatal(err)
	}
	p := filepath.Join(t.TempDir(), "two.yaml")
	text := string(b) + "      - {kind: maked, date: \"1710\", source: handbook-a, basis: from-memory}\n"
	if err := os.WriteFile(p, []byte(text), 0o644); err != nil {
		t.Fatal(err)
	}
	d, ps, err := LintFiles(nil, p)
	if err != nil || d != nil {
		t.Fatalf("LintFiles: %v, %v", d, err)
	}
	if len(ps) != 2 || !strings.Contains(ps[0].Msg, "did you mean 'basis'") ||
		!strings.HasPrefix(ps[1].String(), p+":11:16: unknown milestone kind") {
		t.Errorf("problems: got %v", ps)
	}
	if _, _, err := LintFiles(nil, "testdata/absent.yaml"); err == nil {
		t.Errorf("LintFiles(absent): no error")
	}
}
