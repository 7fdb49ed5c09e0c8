package constraint_test

import (
	"context"
	"errors"
	"slices"
	"strconv"
	"strings"
	"terminus/constraint"
	"terminus/constraint/casefile"
	"terminus/constraint/input"
	"testing"

	"terminus/constraint/date"
	"terminus/constraint/network"
	"terminus/materials"
)

// The cases below are invented; each expected value is derived by hand in
// the comment beside it from the rules in the package documentation and
// the fixture materials in testdata/fixture-materials.yaml (invented too).

func fixture(t *testing.T) *materials.Dataset {
	t.Helper()
	ds, err := materials.LoadFile("testdata/fixture-materials.yaml")
	if err != nil {
		t.Fatalf("fixture dataset: %v", err)
	}
	return ds
}

func analyze(t *testing.T, yaml string) *constraint.Result {
	t.Helper()
	c, err := casefile.Parse("case.yaml", []byte(yaml), input.YAML, input.Limits{})
	if err != nil {
		t.Fatalf("parse: %v", err)
	}
	res, err := constraint.Analyze(context.Background(), c, fixture(t), constraint.Options{})
	if err != nil {
		t.Fatalf("analyze: %v", err)
	}
	return res
}

func day(s string) date.Day {
	d, err := date.Parse(s)
	if err != nil {
		panic(err)
	}
	v, _ := d.Earliest()
	return v
}

// wantWindow checks one event's window at one tier; "" means unbounded,
// "-" means the tier has no window (it conflicts).
func wantWindow(t *testing.T, r *constraint.Result, event string, tier network.Tier, lo, hi string) {
	t.Helper()
	for _, e := range r.Events {
		if e.ID != event {
			continue
		}
		w := e.Windows[tier]
		if lo == "-" {
			if w != nil {
				t.Errorf("%s %s: got a window, want none", event, tier)
			}
			return
		}
		if w == nil {
			t.Fatalf("%s %s: no window, want %s…%s", event, tier, lo, hi)
		}
		check := func(which string, b constraint.Bound, want string) {
			if want == "" {
				if b.Bounded {
					t.Errorf("%s %s %s = %s, want unbounded", event, tier, which, b.Day.ISO())
				}
				return
			}
			if !b.Bounded || b.Day != day(want) {
				got := "unbounded"
				if b.Bounded {
					got = b.Day.ISO()
				}
				t.Errorf("%s %s %s = %s, want %s", event, tier, which, got, want)
			}
		}
		check("earliest", w.Earliest, lo)
		check("latest", w.Latest, hi)
		return
	}
	t.Fatalf("no event %s", event)
}

func TestMilestoneTiers(t *testing.T) {
	// fixture yellow: made 1809 (hard), sold 1816 (firm), arrived NL 1830
	// and Europe (150) 1825 (soft).
	tests := []struct {
		name, place, confidence string
		hard, firm, soft        string
	}{
		// NL has its own arrival, the most specific: 1830.
		{"certain in NL", "NL", "certain", "1809-01-01", "1816-01-01", "1830-01-01"},
		// DE lies in 155 Western Europe, in 150 Europe: the 150 arrival.
		{"certain in DE", "DE", "certain", "1809-01-01", "1816-01-01", "1825-01-01"},
		// JP has no arrival: soft falls back to firm.
		{"certain in JP", "JP", "certain", "1809-01-01", "1816-01-01", "1816-01-01"},
		// No place: arrivals are not used.
		{"no place", "", "certain", "1809-01-01", "1816-01-01", "1816-01-01"},
		// constraint.Probable caps at firm: nothing at hard; firm takes made and sold.
		{"probable", "NL", "probable", "", "1816-01-01", "1830-01-01"},
		// constraint.Possible caps at soft: everything lands in the soft tier.
		{"possible", "NL", "possible", "", "", "1830-01-01"},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			place := ""
			if tc.place != "" {
				place = "place: " + tc.place + "\n"
			}
			r := analyze(t, place+"findings:\n  - {id: f, material: fixture yellow, confidence: "+tc.confidence+"}\n")
			wantWindow(t, r, "making", network.Hard, tc.hard, "")
			wantWindow(t, r, "making", network.Firm, tc.firm, "")
			wantWindow(t, r, "making", network.Soft, tc.soft, "")
		})
	}
}

func TestFallbackNote(t *testing.T) {
	r := analyze(t, "place: JP\nfindings:\n  - {id: f, material: fx-yellow}\n")
	found := false
	for _, n := range r.Notes {
		if strings.Contains(n, "No arrival data for fixture yellow in") && strings.Contains(n, "falls back") {
			found = true
		}
	}
	if !found {
		t.Errorf("no fallback note in %q", r.Notes)
	}
}

func TestUncertainMilestoneLowersTier(t *testing.T) {
	// fixture white: made "1916?" (hard, lowered to firm), sold 1921 (firm).
	// Hard tier: nothing. Firm: max(1916, 1921) = 1921.
	r := analyze(t, "findings:\n  - {material: fixture white}\n")
	wantWindow(t, r, "making", network.Hard, "", "")
	wantWindow(t, r, "making", network.Firm, "1921-01-01", "")
}

func TestApproximateMilestoneWidens(t *testing.T) {
	// fixture red: made "1868~". With circa year P2Y the start moves back two
	// calendar years: 1866-01-01.
	r := analyze(t, "circa: {year: P2Y}\nfindings:\n  - {material: fixture red}\n")
	wantWindow(t, r, "making", network.Hard, "1866-01-01", "")
	// The default policy (year P5Y) moves it back five: 1863-01-01.
	r = analyze(t, "findings:\n  - {material: fixture red}\n")
	wantWindow(t, r, "making", network.Hard, "1863-01-01", "")
}

func TestWithdrawnWithAllowance(t *testing.T) {
	// fixture green: withdrawn 1960 with its own allowance P5Y: the last day
	// 1960-12-31 plus five calendar years is 1965-12-31 (soft).
	r := analyze(t, "findings:\n  - {id: f, material: fixture green}\n")
	wantWindow(t, r, "making", network.Hard, "1814-01-01", "")
	wantWindow(t, r, "making", network.Firm, "1822-01-01", "")
	wantWindow(t, r, "making", network.Soft, "1822-01-01", "1965-12-31")
	// A case-wide allowance does not override the milestone's own.
	r = analyze(t, "stock_allowance: P20Y\nfindings:\n  - {id: f, material: fixture green}\n")
	wantWindow(t, r, "making", network.Soft, "1822-01-01", "1965-12-31")
	// Without one, the milestone of fixture early (allowance P0D) ends at
	// 1920-12-31 itself.
	r = analyze(t, "findings:\n  - {id: f, material: fixture early}\n")
	wantWindow(t, r, "making", network.Soft, "1900-01-01", "1920-12-31")
}

func TestAlternativesUnion(t *testing.T) {
	// fixture early is available 1900–1920 (soft: withdrawn 1920, no
	// allowance); fixture late from 1950. One of them: the soft window is
	// [1900, 1920] ∪ [1950, open); the hard window [1900, open).
	r := analyze(t, `findings:
  - {id: f, material: [fixture early, fixture late]}
claims:
  - {id: c1930, date: "1930"}
  - {id: c1910, date: "1910"}
  - {id: c1890, date: "1890"}
`)
	wantWindow(t, r, "making", network.Hard, "1900-01-01", "")
	soft := r.Events[0].Windows[network.Soft]
	if len(soft.Intervals) != 2 || soft.Intervals[0].Last != day("1920-12-31") || soft.Intervals[1].First != day("1950-01-01") || !soft.Intervals[1].OpenEnd {
		t.Errorf("soft intervals = %+v, want [1900-01-01,1920-12-31] and [1950-01-01, open)", soft.Intervals)
	}
	want := map[string]constraint.Verdict{
		"c1930": constraint.Doubtful,   // in the gap: only soft evidence (the withdrawal) is against it
		"c1910": constraint.Consistent, // inside the first part
		"c1890": constraint.Excluded,   // before both makings (hard)
	}
	for _, c := range r.Claims {
		if c.Verdict != want[c.ID] {
			t.Errorf("claim %s: verdict %s, want %s", c.ID, c.Verdict, want[c.ID])
		}
	}
}

func TestRecordsAndStrength(t *testing.T) {
	// constraint.Record not_after 1912-06, firm by default: the firm latest is its last
	// day, 1912-06-30; the hard tier is open. A record "on: 1850?" (firm,
	// lowered to soft) puts the soft window inside 1850.
	r := analyze(t, `events: [making, signing]
records:
  - {id: r1, event: making, not_after: 1912-06}
  - {id: r2, event: signing, on: "1850?"}
  - {id: r3, event: signing, not_before: "1840", strength: hard}
`)
	wantWindow(t, r, "making", network.Hard, "", "")
	wantWindow(t, r, "making", network.Firm, "", "1912-06-30")
	wantWindow(t, r, "signing", network.Hard, "1840-01-01", "")
	wantWindow(t, r, "signing", network.Firm, "1840-01-01", "")
	wantWindow(t, r, "signing", network.Soft, "1850-01-01", "1850-12-31")
}

func TestOrderWithGapAndChain(t *testing.T) {
	// Making has fixture yellow (hard 1809-01-01). The retouch comes at least
	// a year later: MinDays(P1Y) = 365, so 1809-01-01 + 365 = 1810-01-01,
	// and the chain is the finding, then the order.
	r := analyze(t, `events:
  - {id: making}
  - {id: retouch, after: [{event: making, at_least: P1Y}]}
findings:
  - {id: f-yellow, material: fixture yellow, event: making}
`)
	wantWindow(t, r, "retouch", network.Hard, "1810-01-01", "")
	got := r.Events[1].Windows[network.Hard].Earliest.Because
	if strings.Join(got, ",") != "f-yellow,order:retouch>making" {
		t.Errorf("because = %v, want [f-yellow order:retouch>making]", got)
	}
}

func TestConflictAndCorrection(t *testing.T) {
	// fixture violet: made 1856 (hard), sold 1857 (firm). A firm inventory
	// of 1850 (not_after) cannot hold with it: hard agrees (the record is
	// firm), firm conflicts with {f, r}; the cheapest correction sets the
	// firm record aside rather than the hard finding.
	r := analyze(t, `findings:
  - {id: f, material: fixture violet}
records:
  - {id: r, not_after: "1850", source: inventory}
claims:
  - {date: "1845"}
`)
	if !r.Consistent[network.Hard] || r.Consistent[network.Firm] || r.Consistent[network.Soft] {
		t.Fatalf("consistent = %v, want hard only", r.Consistent)
	}
	if len(r.Conflicts) != 1 || strings.Join(r.Conflicts[0].Evidence, ",") != "f,r" || r.Conflicts[0].Tier != network.Firm {
		t.Errorf("conflicts = %+v, want one at firm: f, r", r.Conflicts)
	}
	found := false
	for _, c := range r.Corrections {
		if c.Tier == network.Firm && strings.Join(c.Evidence, ",") == "r" {
			found = true
		}
	}
	if !found {
		t.Errorf("corrections = %+v, want firm: r", r.Corrections)
	}
	// The claim is judged at the hard tier, the weakest that agrees: 1845 is
	// before the making of the violet (1856), so it is excluded.
	if c := r.Claims[0]; c.Verdict != constraint.Excluded || c.JudgedAt != network.Hard {
		t.Errorf("claim: %s at %s, want excluded at hard", c.Verdict, c.JudgedAt)
	}
}

func TestVerdictLevels(t *testing.T) {
	// fixture yellow in NL: hard ≥ 1809, firm ≥ 1816, soft ≥ 1830.
	cases := map[string]constraint.Verdict{
		"1800":      constraint.Excluded,   // before 1809
		"1812":      constraint.Improbable, // after 1809, before 1816
		"1820":      constraint.Doubtful,   // after 1816, before 1830
		"1835":      constraint.Consistent, // after everything
		"1805/1812": constraint.Improbable, // 1809–1812 survives at hard only
		"c. 1826":   constraint.Consistent, // widened by P5Y to 1821–1831: meets 1830
	}
	for claim, want := range cases {
		t.Run(claim, func(t *testing.T) {
			r := analyze(t, "place: NL\nfindings:\n  - {id: f, material: fixture yellow}\nclaims:\n  - {date: \""+claim+"\"}\n")
			if got := r.Claims[0].Verdict; got != want {
				t.Errorf("verdict %s, want %s", got, want)
			}
			if want != constraint.Consistent && strings.Join(r.Claims[0].Deciding, ",") != "f" {
				t.Errorf("deciding = %v, want [f]", r.Claims[0].Deciding)
			}
		})
	}
}

func TestDisagreementSensitivity(t *testing.T) {
	// fixture blue: made 1704 (fx-a) or 1706 (fx-b); sold 1724. The bound
	// uses 1704. A claim of 1705 survives at hard (≥ 1704) and fails at firm
	// (≥ 1724): improbable. Under 1706 it would fail at hard: excluded, so
	// the disagreement changes the verdict.
	r := analyze(t, "findings:\n  - {id: f, material: fixture blue}\nclaims:\n  - {date: \"1705\"}\n")
	wantWindow(t, r, "making", network.Hard, "1704-01-01", "")
	if r.Claims[0].Verdict != constraint.Improbable {
		t.Errorf("verdict %s, want improbable", r.Claims[0].Verdict)
	}
	if len(r.Disagreements) != 1 {
		t.Fatalf("disagreements = %+v, want one", r.Disagreements)
	}
	d := r.Disagreements[0]
	if !d.ChangesVerdict || !strings.Contains(d.Text, "claim claim-1 would be excluded") {
		t.Errorf("disagreement = %+v, want a changed verdict", d)
	}
	// A claim of 1750 is consistent under either claim.
	r = analyze(t, "findings:\n  - {id: f, material: fixture blue}\nclaims:\n  - {date: \"1750\"}\n")
	if r.Disagreements[0].ChangesVerdict {
		t.Errorf("1750: %s", r.Disagreements[0].Text)
	}
	// fixture teal arrived in NL in 1840 (fx-a) or 1850 (fx-b): the soft
	// bound uses 1840; a claim of 1845 is consistent, doubtful under 1850.
	r = analyze(t, "place: NL\nfindings:\n  - {id: f, material: fixture teal}\nclaims:\n  - {date: \"1845\"}\n")
	wantWindow(t, r, "making", network.Soft, "1840-01-01", "")
	if len(r.Disagreements) != 1 {
		t.Fatalf("teal: disagreements = %+v, want one", r.Disagreements)
	}
	want := "Sources disagree on when fixture teal arrived in Netherlands (NL): 1840 (fx-a), 1850 (fx-b). The bound uses 1840 (fx-a), the most conservative. Under 1850 (fx-b) claim claim-1 would be doubtful."
	if d := r.Disagreements[0]; d.Text != want || !d.ChangesVerdict {
		t.Errorf("teal: disagreement text\n %q\nwant\n %q", d.Text, want)
	}
}

// Two dates from one source are no disagreement between sources, and the
// text says so: Splitstoser et al. 2016 give both the Huaca Prieta find
// (4250 to 4000 BCE) and the earlier record it displaced (Fifth Dynasty
// Egypt) for natural indigo in the built-in dataset; two sources for
// fixture blue still disagree.
func TestDisagreementOfOneSource(t *testing.T) {
	c, err := casefile.Parse("case.yaml", []byte("findings:\n  - {material: natural indigo}\nclaims:\n  - {date: \"1500\"}\n"), input.YAML, input.Limits{})
	if err != nil {
		t.Fatal(err)
	}
	r, err := constraint.Analyze(context.Background(), c, builtin(t), constraint.Options{})
	if err != nil {
		t.Fatal(err)
	}
	var found bool
	for _, d := range r.Disagreements {
		if d.Material == "natural-indigo" && d.Kind == "made" {
			found = true
			if !d.OneSource || !strings.HasPrefix(d.Text, "One source gives two dates for when natural indigo was made: 4250 to 4000 BCE (splitstoser-2016-indigo)") {
				t.Errorf("one source's two dates: %+v", d)
			}
		}
	}
	if !found {
		t.Errorf("no disagreement on natural indigo's making: %+v", r.Disagreements)
	}
	r = analyze(t, "findings:\n  - {id: f, material: fixture blue}\nclaims:\n  - {date: \"1750\"}\n")
	if d := r.Disagreements[0]; d.OneSource || !strings.HasPrefix(d.Text, "Sources disagree on when fixture blue was made") {
		t.Errorf("two sources: %+v", d)
	}
}

// TestDendrochronology expresses the rule of thumb for oak panels (common
// practice; as given by Kuniholm 2000 and Klein 1998, see FIELD-NOTES): add
// at least 7 sapwood rings (western European oak) or 9 (Baltic oak) to the
// last heartwood ring, then at least 2 years of seasoning. Last heartwood
// ring 1651: painted no earlier than 1660 (western) or 1662 (Baltic).
//
// The ring of 1651 is complete at the end of 1651 (on: 1651-12-31). Gaps
// use the fewest days a duration can span: MinDays(P7Y) = 2555 (seven years
// without a leap day, as around 1700), MinDays(P9Y) = 3286, MinDays(P2Y) =
// 730. Western: 1651-12-31 + 2555 + 730 = 1660-12-28, in 1660. Baltic:
// 1651-12-31 + 3286 + 730 = 1662-12-29, in 1662.
func TestDendrochronology(t *testing.T) {
	for _, tc := range []struct {
		name, rings string
		want        string
	}{
		{"western European oak", "P7Y", "1660-12-28"},
		{"Baltic oak", "P9Y", "1662-12-29"},
	} {
		t.Run(tc.name, func(t *testing.T) {
			r := analyze(t, `events:
  - {id: heartwood, label: last heartwood ring}
  - {id: felling, after: [{event: heartwood, at_least: `+tc.rings+`, note: sapwood rings}]}
  - {id: painting, after: [{event: felling, at_least: P2Y, note: seasoning}]}
records:
  - {id: dendro, event: heartwood, on: 1651-12-31, strength: hard, source: tree-ring report}
`)
			wantWindow(t, r, "painting", network.Hard, tc.want, "")
			got := r.Events[2].Windows[network.Hard].Earliest.Because
			if strings.Join(got, ",") != "dendro,order:felling>heartwood,order:painting>felling" {
				t.Errorf("because = %v", got)
			}
		})
	}
}

func TestCaseErrors(t *testing.T) {
	tests := []struct {
		name, yaml string
		line, col  int
		msg, hint  string
	}{
		{"unknown key", "title: x\nfindngs: []\n", 2, 1, `unknown key "findngs"`, `did you mean 'findings'?`},
		{"unknown material", "findings:\n  - material: fixture yelow\n", 2, 15, `unknown material "fixture yelow"`, "fixture yellow"},
		{"unknown event", "findings:\n  - {material: fx-red, event: retuch}\nevents: [making, retouch]\n", 2, 31, `unknown event "retuch"`, `did you mean 'retouch'?`},
		{"unknown place", "place: NLD\n", 1, 8, `unknown place "NLD"`, ""},
		{"bad date", "records:\n  - {not_after: 1912-13}\n", 2, 22, "is not a date", "terminus date"},
		{"two kinds", "records:\n  - {on: '1900', not_after: '1912'}\n", 2, 5, "only one of", "split"},
		{"reversed interval", "records:\n  - {between: 1900/1890}\n", 2, 0, "", ""},
		{"bad confidence", "findings:\n  - {material: fx-red, confidence: sure}\n", 2, 36, `confidence "sure"`, ""},
		{"cycle", "events:\n  - {id: a, after: b}\n  - {id: b, after: a}\n", 0, 0, "each after the other", ""},
		{"bad duration", "events:\n  - a\n  - {id: b, after: [{event: a, at_least: 2 years}]}\n", 3, 0, "not a duration", "P5Y"},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			c, err := casefile.Parse("case.yaml", []byte(tc.yaml), input.YAML, input.Limits{})
			if err == nil {
				_, err = constraint.Analyze(context.Background(), c, fixture(t), constraint.Options{})
			}
			var e *input.Error
			if !errors.As(err, &e) {
				t.Fatalf("error = %v (%T), want *input.Error", err, err)
			}
			if tc.line > 0 && e.Line != tc.line {
				t.Errorf("line %d, want %d (%v)", e.Line, tc.line, e)
			}
			if tc.col > 0 && e.Column != tc.col {
				t.Errorf("column %d, want %d (%v)", e.Column, tc.col, e)
			}
			if !strings.Contains(e.Msg, tc.msg) {
				t.Errorf("message %q, want it to contain %q", e.Msg, tc.msg)
			}
			if !strings.Contains(e.Hint(), tc.hint) {
				t.Errorf("hint %q, want it to contain %q", e.Hint(), tc.hint)
			}
		})
	}
}

func TestTOMLCase(t *testing.T) {
	toml := `title = "A TOML case"
place = "NL"

[[findings]]
id = "f"
material = "fixture yellow"

[[claims]]
date = "1820"
`
	c, err := casefile.Parse("case.toml", []byte(toml), input.TOML, input.Limits{})
	if err != nil {
		t.Fatal(err)
	}
	res, err := constraint.Analyze(context.Background(), c, fixture(t), constraint.Options{})
	if err != nil {
		t.Fatal(err)
	}
	if res.Claims[0].Verdict != constraint.Doubtful {
		t.Errorf("verdict %s, want doubtful (1820 is before the NL arrival 1830)", res.Claims[0].Verdict)
	}
	// A misspelt key in TOML is found on its line.
	_, err = casefile.Parse("case.toml", []byte("title = \"x\"\n\n[[findings]]\nmaterial = \"fx-red\"\nconfidense = \"probable\"\n"), input.TOML, input.Limits{})
	var e *input.Error
	if !errors.As(err, &e) || e.Line != 5 || !strings.Contains(e.Msg, `unknown key "confidense"`) {
		t.Errorf("error = %v, want line 5 unknown key", err)
	}
}

// An event that no evidence bounds gets a note, so that "consistent" is
// not read as support; an event bounded on one side only does not.
func TestUnboundedEventNote(t *testing.T) {
	const note = "Nothing in the evidence bounds making (making of the object)"
	hasNote := func(r *constraint.Result) bool {
		for _, n := range r.Notes {
			if strings.HasPrefix(n, note) {
				return true
			}
		}
		return false
	}
	r := analyze(t, "claims:\n  - {date: \"1850\"}\n")
	if r.Claims[0].Verdict != constraint.Consistent || !hasNote(r) {
		t.Errorf("no evidence: verdict %s, notes %q; want consistent with the note", r.Claims[0].Verdict, r.Notes)
	}
	r = analyze(t, "findings:\n  - {id: f, material: fixture yellow}\nclaims:\n  - {date: \"1850\"}\n")
	if hasNote(r) {
		t.Errorf("a bounded event got the note: %q", r.Notes)
	}
	r = analyze(t, "records:\n  - {id: r, not_after: \"1900\"}\nclaims:\n  - {date: \"1850\"}\n")
	if hasNote(r) {
		t.Errorf("an event bounded above got the note: %q", r.Notes)
	}
}

// A place may be written as a country's or area's English name or a
// former name; the report says how it was read. A name that matches
// nothing is an error that suggests codes.
func TestPlacesByName(t *testing.T) {
	for _, tc := range []struct {
		place, code, note string
	}{
		{"Holland", "NL", "Place 'Holland' is read as Netherlands (NL)."},
		{"western europe", "155", "Place 'western europe' is read as Western Europe (155)."},
		{"Japan", "JP", "Place 'Japan' is read as Japan (JP)."},
		{"Persia", "IR", "Place 'Persia' is read as Iran (IR)."},
		{"Ottoman Empire", "TR", "the Ottoman Empire is read as Türkiye, its heartland"},
		{"NL", "NL", ""},
	} {
		r := analyze(t, "place: "+tc.place+"\nfindings:\n  - {id: f, material: fixture yellow}\n")
		if r.Place != tc.code || r.Events[0].Place != tc.code {
			t.Errorf("%s: read as %q, want %q", tc.place, r.Place, tc.code)
		}
		if tc.note != "" && !slices.ContainsFunc(r.Notes, func(n string) bool { return strings.Contains(n, tc.note) }) {
			t.Errorf("%s: no note %q in %q", tc.place, tc.note, r.Notes)
		}
	}
	c, err := casefile.Parse("case.yaml", []byte("place: Neatherlands\n"), input.YAML, input.Limits{})
	if err != nil {
		t.Fatal(err)
	}
	_, err = constraint.Analyze(context.Background(), c, fixture(t), constraint.Options{})
	var e *input.Error
	if !errors.As(err, &e) || !strings.Contains(e.Msg, `unknown place "Neatherlands"`) || !strings.Contains(e.Hint(), "'NL'") || !strings.Contains(e.Hint(), "NL Netherlands") {
		t.Errorf("a misspelt name: %v (hint %q)", err, e.Hint())
	}
}

// Every piece of evidence that alone rules a claim out is deciding, and
// the sentence says how robust the verdict is; a chain decides only
// together.
func TestDecidingEvidence(t *testing.T) {
	// fixture late: made 1950 (hard). Three findings, two samples.
	r := analyze(t, `findings:
  - {id: f1, material: fixture late, sample: S1}
  - {id: f2, material: fixture late, sample: S2}
  - {id: f3, material: fixture late, sample: S2}
  - {id: f4, material: fixture yellow, sample: S3}
claims:
  - {date: "1898"}
`)
	c := r.Claims[0]
	if c.Verdict != constraint.Excluded || strings.Join(c.Deciding, ",") != "f1,f2,f3" || !c.DecidingEachAlone {
		t.Fatalf("got %s deciding %v each alone %v; want excluded by f1, f2, f3 each alone (f4, yellow of 1809, allows 1898)", c.Verdict, c.Deciding, c.DecidingEachAlone)
	}
	if !strings.Contains(c.Sentence, "f1, f2 and f3, three independent findings from two samples, each enough on its own") {
		t.Errorf("sentence %q", c.Sentence)
	}
	// A record on one event carried to another by an order: the chain.
	r = analyze(t, `events:
  - id: a
  - {id: b, after: [{event: a, at_least: P10Y}]}
records:
  - {id: r, event: a, not_before: "1900"}
claims:
  - {event: b, date: "1905"}
`)
	c = r.Claims[0]
	if c.Verdict != constraint.Improbable || c.DecidingEachAlone || !strings.Contains(c.Sentence, "(r → order:b>a, together)") {
		t.Errorf("chain: %s each alone %v, sentence %q", c.Verdict, c.DecidingEachAlone, c.Sentence)
	}
}

// When the soft tier conflicts, a claim is judged at the firm tier and
// its sentence says so, in every format (they all show this sentence).
func TestVerdictJudgedAtTheWeakestAgreeingTier(t *testing.T) {
	// fixture yellow arrived NL 1830 (soft); a soft record not after 1820
	// contradicts it: the soft tier conflicts.
	r := analyze(t, `place: NL
findings:
  - {id: f, material: fixture yellow}
records:
  - {id: r, not_after: "1820", strength: soft}
claims:
  - {date: "1818"}
`)
	c := r.Claims[0]
	if r.Consistent[network.Soft] || c.Verdict != constraint.Consistent || c.JudgedAt != network.Firm {
		t.Fatalf("soft consistent %v, verdict %s judged at %s", r.Consistent[network.Soft], c.Verdict, c.JudgedAt)
	}
	if strings.Contains(c.Sentence, "all the evidence") || !strings.Contains(c.Sentence, "judged at the firm tier") {
		t.Errorf("sentence %q", c.Sentence)
	}
}

// TestDisagreementCirca: an approximate claim counts from its widened end,
// which can come before a plainer claim written with an earlier year; the
// list of claims says how each one was read, so that "the most
// conservative" can be checked by eye. fixture red: made c. 1868 (fx-a) or
// 1866 (fx-b).
func TestDisagreementCirca(t *testing.T) {
	r := analyze(t, "findings:\n  - {id: f, material: fixture red}\nclaims:\n  - {date: \"1900\"}\n")
	if len(r.Disagreements) != 1 {
		t.Fatalf("disagreements = %+v, want one", r.Disagreements)
	}
	d := r.Disagreements[0]
	lo := r.Events[0].Windows[network.Hard].Earliest.Day
	want := "c. 1868, read as " + strconv.FormatInt(lo.Year(), 10) + " at the earliest (fx-a)"
	if lo.Year() >= 1866 || d.Used != want || !strings.Contains(d.Text, want+", 1866 (fx-b)") {
		t.Errorf("hard lower bound %s; disagreement %+v, want it to use %q before 1866", lo.ISO(), d, want)
	}
}
