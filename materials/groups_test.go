package materials_test

import (
	"errors"
	"slices"
	"strings"
	"testing"

	"terminus/materials"
)

// A finding that names a marker or a family is read as every material that
// carries it, bounded by the earliest; a group that misses a member can
// wrongly exclude a genuine object. These rows are names that practitioners
// write in findings, each with the material or the exact set of materials
// it must stand for, and why.
var groupRows = []struct {
	name   string
	want   []string // ids; one id means the name names one material
	reason string
}{
	// Names practitioners type.
	{"ultramarine", []string{"natural-ultramarine", "synthetic-ultramarine"}, "the trade name covers the lapis pigment and the synthetic one, which an analysis often cannot tell apart"},
	{"ultramarine blue", []string{"natural-ultramarine", "synthetic-ultramarine"}, "as ultramarine"},
	{"titanium white", []string{"titanium-white-anatase", "titanium-white-rutile", "ground-rutile-white", "titanium-barium-white", "titanium-calcium-white"}, "every titanium dioxide white, pure or on an extender, natural or synthetic"},
	{"titanium dioxide", []string{"titanium-white-anatase", "titanium-white-rutile", "ground-rutile-white", "titanium-barium-white", "titanium-calcium-white", "correction-fluid", "pearlescent-mica-titania"}, "the compound, in every material made with it"},
	{"rutile", []string{"titanium-white-rutile", "ground-rutile-white", "titanium-barium-white", "titanium-calcium-white", "pearlescent-mica-titania"}, "the phase: ground natural rutile (from 1870) must stay among the alternatives"},
	{"anatase", []string{"titanium-white-anatase", "titanium-barium-white", "titanium-calcium-white", "pearlescent-mica-titania"}, "the phase"},
	{"PW6", []string{"titanium-white-anatase", "titanium-white-rutile", "ground-rutile-white"}, "Pigment White 6 (77891) is titanium dioxide in either crystal form"},
	{"carbon", []string{"bistre", "bone-black", "lamp-black", "charcoal-black", "vine-black", "pine-soot", "carbon-paper", "letterpress-printing-ink", "inkjet-pigment-ink", "gas-black", "india-ink", "xerographic-toner", "furnace-black", "graphite"}, "elemental carbon: every carbon black, graphite, and the soot inks and copies"},
	{"carbon black", []string{"bone-black", "lamp-black", "charcoal-black", "vine-black", "pine-soot", "gas-black", "furnace-black"}, "every carbon-based black pigment; Raman cannot tell most of them apart"},
	{"hematite", []string{"red-ochre", "hematite-pigment", "umber", "sienna", "mars-red", "mars-violet", "mars-brown"}, "the phase, natural and synthetic, burnt earths included"},
	{"Turkey red", []string{"madder", "turkey-red-madder", "synthetic-alizarin"}, "the process was worked with madder and then with synthetic alizarin"},
	{"geranium lake", []string{"eosin-lake"}, "the trade name of the eosin lake"},
	{"PY3", []string{"hansa-yellow-10g"}, "Colour Index short name"},
	{"Pigment Yellow 3", []string{"hansa-yellow-10g"}, "Colour Index generic name"},
	{"PY12", []string{"diarylide-yellow-aaa"}, "Colour Index short name"},
	{"PR57", []string{"lithol-rubine"}, "Colour Index short name, written as a name of lithol rubine"},
	{"lithol rubine", []string{"lithol-rubine"}, "one pigment"},
	{"alizarin", []string{"madder", "madder-lake", "alizarine-ink", "turkey-red-madder", "synthetic-alizarin", "alizarin-crimson"}, "the compound: madder and its lakes and dyeings, and synthetic alizarin"},
	{"purpurin", []string{"madder", "madder-lake", "relbunium", "turkey-red-madder"}, "the compound of madder and its Andean relatives"},
	{"optical brightener", []string{"optical-brightener-photographic-paper", "optical-brightener-paper"}, "every brightener entry"},
	{"ballpoint", []string{"ballpoint-paste-ink", "erasable-ballpoint-ink"}, "what a document examiner writes for a ballpoint line"},
	{"ballpoint ink", []string{"ballpoint-paste-ink", "erasable-ballpoint-ink"}, "as ballpoint"},
	{"dayflower", []string{"dayflower-blue"}, "one dye"},
	{"aniline violet", []string{"mauveine", "methyl-violet"}, "the name was given to Perkin's mauve and later to methyl violet"},
	{"Perkin's mauve", []string{"mauveine"}, "one dye"},
	{"indigo", []string{"natural-indigo", "woad", "japanese-indigo", "synthetic-indigo"}, "the dye from any indigo plant or from synthesis"},
	{"cochineal", []string{"cochineal-carmine", "armenian-cochineal", "polish-cochineal", "american-cochineal"}, "the insect family"},
	{"carmine", []string{"cochineal-carmine"}, "the cochineal lake pigment"},
	{"lamp black", []string{"lamp-black"}, "one pigment"},
	{"ochre", []string{"yellow-ochre", "red-ochre"}, "red and yellow ochre"},
	{"lead white", []string{"lead-white"}, "the basic lead carbonate entry, whose window holds every process"},
	{"Prussian blue", []string{"prussian-blue"}, "one pigment"},
	{"smalt", []string{"smalt"}, "one pigment"},

	// The groups completed with them.
	{"lazurite", []string{"natural-ultramarine", "synthetic-ultramarine"}, "the phase of both ultramarines"},
	{"luteolin", []string{"weld", "dyers-broom", "sawwort", "dyers-chamomile"}, "every luteolin dye"},
	{"apigenin", []string{"weld", "dyers-broom", "sawwort", "dyers-chamomile"}, "every apigenin dye"},
	{"rhamnetin", []string{"buckthorn-lake", "rhamnus-berry-dye"}, "the Rhamnus berry dye and its lake"},
	{"crocin", []string{"saffron", "gardenia"}, "the carotenoid of saffron and gardenia"},
	{"crocetin", []string{"saffron", "gardenia"}, "as crocin"},
	{"indigotin", []string{"tyrian-purple", "natural-indigo", "woad", "maya-blue", "vergaut", "japanese-indigo", "synthetic-indigo"}, "the compound, in every indigo source and in the paints and purples that hold it"},
	{"indirubin", []string{"natural-indigo", "woad", "japanese-indigo"}, "the red by-product of plant indigo"},
	{"indigo dye", []string{"natural-indigo", "woad", "japanese-indigo", "synthetic-indigo"}, "as indigo"},
	{"brazilin", []string{"sappanwood", "american-brazilwood"}, "both brazilwoods"},
	{"berberine", []string{"barberry", "amur-cork-tree"}, "both berberine dyes"},
	{"carminic acid", []string{"cochineal-carmine", "armenian-cochineal", "polish-cochineal", "american-cochineal"}, "every cochineal and carmine"},
	{"laccaic acid", []string{"lac-dye"}, "lac"},
	{"Hansa yellow", []string{"hansa-yellow-10g", "arylide-yellow-rn", "arylide-yellow-4gx", "arylide-yellow-5gx", "arylide-yellow-fgl", "hansa-yellow-g"}, "every arylide (Hansa) yellow"},
	{"arylide yellow", []string{"hansa-yellow-10g", "arylide-yellow-rn", "arylide-yellow-4gx", "arylide-yellow-5gx", "arylide-yellow-fgl", "hansa-yellow-g"}, "as Hansa yellow"},
	{"diarylide yellow", []string{"diarylide-yellow-aaa", "diarylide-yellow-aamx", "diarylide-yellow-aaot", "diarylide-yellow-hr"}, "every diarylide yellow"},
	{"naphthol red", []string{"naphthol-red-f3rk", "naphthol-as-red"}, "every naphthol AS red"},
	{"naphthol AS pigments", []string{"naphthol-red-f3rk", "naphthol-as-red"}, "as naphthol red"},
	{"fustic", []string{"young-fustic", "old-fustic"}, "the name passed from the European smoke tree to the American mulberry wood"},
	{"rhodamine", []string{"rhodamine-b", "rhodamine-6g"}, "both rhodamines"},
	{"藤黄", []string{"gamboge"}, "gamboge in Chinese (téng huáng); not 雌黄, which is orpiment in Chinese and gamboge in Japanese, so no one name for it"},
	{"Novoperm", []string{"arylide-yellow-fgl", "diarylide-yellow-hr", "naphthol-red-f3rk", "benzimidazolone-pigments"}, "a maker's range name across several pigment classes"},
}

// groupsOfOne are rows whose name is a marker or family that, in this
// dataset, only one material carries.
var groupsOfOne = map[string]bool{"laccaic acid": true}

func TestGroupNamesResolve(t *testing.T) {
	d := checkBuiltin(t)
	for _, r := range groupRows {
		t.Run(r.name, func(t *testing.T) {
			res, err := d.Resolve(r.name)
			if err != nil {
				t.Fatalf("Resolve(%q): %v (%s)", r.name, err, r.reason)
			}
			var got []string
			for _, m := range res.Materials {
				got = append(got, m.ID)
			}
			want := slices.Clone(r.want)
			slices.Sort(got)
			slices.Sort(want)
			if !slices.Equal(got, want) {
				t.Errorf("Resolve(%q) = %v, want %v (%s)", r.name, got, want, r.reason)
			}
			if len(r.want) == 1 && res.Group != nil && !groupsOfOne[r.name] {
				t.Errorf("Resolve(%q) is the %s %q, want the one material %s (%s)", r.name, res.Group.Kind, res.Group.Name, r.want[0], r.reason)
			}
			if (len(r.want) > 1 || groupsOfOne[r.name]) && res.Group == nil {
				t.Errorf("Resolve(%q) names one material, want a group of %d (%s)", r.name, len(r.want), r.reason)
			}
		})
	}
}

// Every group has a member that can be named on its own: a name of its
// own that resolves to it alone and is not the group's name.
func TestGroupsHaveOwnNamedMembers(t *testing.T) {
	d := checkBuiltin(t)
	for _, g := range d.Groups() {
		t.Run(string(g.Kind)+"/"+g.Name, func(t *testing.T) {
			if len(g.Members) == 0 {
				t.Fatalf("group %q has no members", g.Name)
			}
			for _, m := range g.Members {
				for _, n := range append([]string{m.ID}, m.Names...) {
					if strings.EqualFold(n, g.Name) {
						continue
					}
					res, err := d.Resolve(n)
					if err == nil && res.Group == nil && len(res.Materials) == 1 && res.Materials[0] == m {
						return
					}
				}
			}
			t.Errorf("no member of %s %q has a name of its own distinct from the group", g.Kind, g.Name)
		})
	}
}

// A misspelt name must suggest what was meant, not only a near neighbour
// of another meaning: "dayflowr" is the dayflower, not safflower.
func TestMisspeltDayflowerSuggestion(t *testing.T) {
	d := checkBuiltin(t)
	_, err := d.Lookup("dayflowr")
	var nf *materials.NotFoundError
	if !errors.As(err, &nf) {
		t.Fatalf("Lookup(%q): got %v, want a NotFoundError", "dayflowr", err)
	}
	if len(nf.Suggestions) == 0 || !strings.EqualFold(nf.Suggestions[0], "dayflower") {
		t.Errorf("Lookup(%q) suggests %v, want dayflower first", "dayflowr", nf.Suggestions)
	}
}
