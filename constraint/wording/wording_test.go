package wording

import (
	"testing"

	"terminus/constraint/date"
)

func TestBound(t *testing.T) {
	for _, tc := range []struct {
		day   date.Day
		upper bool
		want  string
		why   string
	}{
		{date.Gregorian(1870, 1, 1), false, "1870", "the first day of a year, as a lower bound"},
		{date.Gregorian(1870, 12, 31), true, "1870", "the last day of a year, as an upper bound"},
		{date.Gregorian(1870, 12, 31), false, "1870-12-31", "the last day as a lower bound is a day"},
		{date.Gregorian(1870, 5, 1), false, "1870-05", "the first day of a month"},
		{date.Gregorian(1870, 2, 28), true, "1870-02", "the last day of February in a common year"},
		{date.Gregorian(-1199, 1, 1), false, "1200 BCE", "astronomical year -1199 is 1200 BCE"},
		{date.Gregorian(79, 8, 24), false, "24 Aug 79 CE", "a day of a year below 1000, in words with its era"},
		{date.Gregorian(79, 8, 1), false, "Aug 79 CE", "a month of a year below 1000"},
		{date.Gregorian(1, 1, 1), false, "1 CE", "year 1 is 1 CE, not '1'"},
		{date.Gregorian(0, 12, 31), true, "1 BCE", "astronomical year 0 is 1 BCE"},
	} {
		if got := Bound(tc.day, tc.upper); got != tc.want {
			t.Errorf("Bound(%s, %v) = %q, want %q (%s)", tc.day.ISO(), tc.upper, got, tc.want, tc.why)
		}
	}
}

func TestDuration(t *testing.T) {
	for in, want := range map[string]string{"P7Y": "7 years", "P1Y6M": "1 year 6 months", "P0D": "0 days", "P2W": "2 weeks", "P1D": "1 day"} {
		d, err := date.ParseDuration(in)
		if err != nil {
			t.Fatal(err)
		}
		if got := Duration(d); got != want {
			t.Errorf("Duration(%s) = %q, want %q", in, got, want)
		}
	}
}

func TestTierWords(t *testing.T) {
	if Tier(0) != "hard" || NotBefore(1) != "is unlikely to be earlier than" || NotAfter(2) != "would be unusual after" {
		t.Errorf("tier words: %q %q %q", Tier(0), NotBefore(1), NotAfter(2))
	}
	if len(Cautions()) != 5 {
		t.Errorf("the five cautions of the contract: got %d", len(Cautions()))
	}
}

func TestVerdictSentence(t *testing.T) {
	all := [3]bool{true, true, true}
	softConflicts := [3]bool{true, true, false}
	for _, tc := range []struct {
		facts VerdictFacts
		want  string
		why   string
	}{
		{VerdictFacts{Verdict: "consistent", JudgedAt: 2, Consistent: all},
			"It meets the window of all the evidence (hard, firm and soft). This does not prove the date; it only fails to rule it out.",
			"every tier agrees: judged at the soft tier"},
		{VerdictFacts{Verdict: "consistent", JudgedAt: 1, Consistent: softConflicts},
			"It meets the window of the hard and firm evidence. This does not prove the date; it only fails to rule it out. The soft evidence contradicts itself and was set aside, so the claim was judged at the firm tier (see the conflicts).",
			"the soft tier conflicts: the sentence must not say 'all the evidence'"},
		{VerdictFacts{Verdict: "excluded", JudgedAt: 2, Consistent: all, Deciding: []string{"f1", "f2", "f3"}, EachAlone: true, Findings: 3, Samples: 2},
			"It contradicts hard evidence: f1, f2 and f3, three independent findings from two samples, each enough on its own; if the findings belong to this event, the object cannot date from then.",
			"several findings each exclude: the reader sees how robust it is"},
		{VerdictFacts{Verdict: "improbable", JudgedAt: 1, Consistent: softConflicts, Deciding: []string{"r", "o"}},
			"It contradicts firm evidence (r → o, together); very unlikely, and it needs an explanation to stand. The soft evidence contradicts itself and was set aside, so the claim was judged at the firm tier (see the conflicts).",
			"a chain decides only together; the soft tier was set aside"},
		{VerdictFacts{Verdict: "doubtful", JudgedAt: 2, Consistent: all, Deciding: []string{"f"}, EachAlone: true, Findings: 1},
			"It contradicts only soft evidence (f); unusual rather than unlikely, worth a note.",
			"one finding"},
		{VerdictFacts{Verdict: "excluded", JudgedAt: 0, Consistent: [3]bool{true, false, false}, Deciding: []string{"f"}, EachAlone: true},
			"It contradicts hard evidence (f); if the findings belong to this event, the object cannot date from then. The firm and soft evidence contradict themselves and were set aside, so the claim was judged at the hard tier alone (see the conflicts).",
			"the firm tier conflicts: judged at hard"},
		{VerdictFacts{Verdict: "undetermined", Note: "the hard evidence contradicts itself; resolve the conflicts first"},
			"No verdict: the hard evidence contradicts itself; resolve the conflicts first.", "no tier agrees"},
	} {
		if got := VerdictSentence(tc.facts); got != tc.want {
			t.Errorf("%s:\n got %q\nwant %q", tc.why, got, tc.want)
		}
	}
}

func TestPrecision(t *testing.T) {
	parse := func(s string) date.Date {
		d, err := date.Parse(s)
		if err != nil {
			t.Fatal(err)
		}
		return d
	}
	for in, want := range map[string]Precision{"1870": Year, "1870s": Year, "1870~": Year, "1870-05": Month, "1651-12-31": Day, "1870/1879": Year, "../1900": Year} {
		if got := PrecisionOf(parse(in)); got != want {
			t.Errorf("PrecisionOf(%s) = %s, want %s", in, got, want)
		}
	}
	// The oak-panel rule of thumb (Kuniholm 2000; Klein 1998): last
	// heartwood ring 1651, at least 7 sapwood rings, at least 2 years of
	// seasoning: earliest use 1660. A day-level record plus year-level gaps
	// gives a year; rounded outward, the bound only widens.
	if got := BoundAt(date.Gregorian(1660, 12, 28), false, Year); got != "1660" {
		t.Errorf("BoundAt year = %q, want 1660", got)
	}
	if got := BoundAt(date.Gregorian(1900, 3, 5), true, Year); got != "1900" {
		t.Errorf("upper BoundAt year = %q, want 1900", got)
	}
	if got := BoundAt(date.Gregorian(1900, 3, 5), false, Month); got != "1900-03" {
		t.Errorf("BoundAt month = %q, want 1900-03", got)
	}
}
