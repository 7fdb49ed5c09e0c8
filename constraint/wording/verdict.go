package wording

import "strings"

// VerdictFacts are what a verdict sentence says: the verdict, the tier
// that judged it and why, and the evidence that decides it.
type VerdictFacts struct {
	Verdict string // consistent, doubtful, improbable, excluded, undetermined
	// JudgedAt is the tier whose window judged the claim (0 hard, 1 firm,
	// 2 soft): the weakest tier whose evidence agrees.
	JudgedAt int
	// Consistent tells per tier whether its evidence agrees.
	Consistent [3]bool
	// Deciding are the ids of the evidence that rules the claim out,
	// strongest first; EachAlone is true when each of them alone would,
	// false when only together (a chain through orders, say).
	Deciding  []string
	EachAlone bool
	// Findings and Samples count the findings among Deciding and the
	// distinct samples they were taken from (0 when a finding names none).
	Findings, Samples int
	Note              string // why no verdict, for undetermined
}

var numberWords = [...]string{"no", "one", "two", "three", "four", "five", "six", "seven", "eight", "nine", "ten", "eleven", "twelve"}

// Count writes a small number in words ("three"), a larger one in digits.
func Count(n int) string {
	if n >= 0 && n < len(numberWords) {
		return numberWords[n]
	}
	return itoa(n)
}

func itoa(n int) string {
	if n == 0 {
		return "0"
	}
	neg := n < 0
	if neg {
		n = -n
	}
	var b []byte
	for ; n > 0; n /= 10 {
		b = append([]byte{byte('0' + n%10)}, b...)
	}
	if neg {
		b = append([]byte{'-'}, b...)
	}
	return string(b)
}

// tierList names the tiers up to t: "hard", "hard and firm", "hard, firm
// and soft".
func tierList(t int) string {
	switch t {
	case 0:
		return "hard"
	case 1:
		return "hard and firm"
	}
	return "hard, firm and soft"
}

// setAside says which tiers' evidence contradicts itself and was set
// aside, or "" when every tier agrees.
func setAside(f VerdictFacts) string {
	switch {
	case f.JudgedAt >= 2:
		return ""
	case f.JudgedAt == 1:
		return " The soft evidence contradicts itself and was set aside, so the claim was judged at the firm tier (see the conflicts)."
	}
	return " The firm and soft evidence contradict themselves and were set aside, so the claim was judged at the hard tier alone (see the conflicts)."
}

// evidence says which evidence decides, and how robustly, after what it
// contradicts: " (f-blue)", " (r-dendro → order:felling>heartwood,
// together)", or ": f1, f2 and f3, three independent findings from two
// samples, each enough on its own".
func evidence(f VerdictFacts) string {
	ids := f.Deciding
	switch {
	case len(ids) == 0:
		return ""
	case !f.EachAlone:
		return " (" + Chain(ids) + ", together)"
	case len(ids) == 1:
		return " (" + ids[0] + ")"
	}
	what := Count(len(ids)) + " independent pieces of evidence"
	if f.Findings == len(ids) {
		what = Count(len(ids)) + " independent findings"
		if f.Samples > 1 {
			what += " from " + Count(f.Samples) + " samples"
		} else if f.Samples == 1 {
			what += " from one sample"
		}
	}
	return ": " + Join(ids, "and") + ", " + what + ", each enough on its own"
}

// VerdictSentence says what a verdict means, which tier judged it and
// why, and which evidence decides it: the one wording of every format.
func VerdictSentence(f VerdictFacts) string {
	switch f.Verdict {
	case "consistent":
		s := "It meets the window of the " + tierList(f.JudgedAt) + " evidence"
		if f.JudgedAt == 2 {
			s = "It meets the window of all the evidence (hard, firm and soft)"
		}
		return s + ". This does not prove the date; it only fails to rule it out." + setAside(f)
	case "doubtful":
		return "It contradicts only soft evidence" + evidence(f) + "; unusual rather than unlikely, worth a note."
	case "improbable":
		return "It contradicts firm evidence" + evidence(f) + "; very unlikely, and it needs an explanation to stand." + setAside(f)
	case "excluded":
		return "It contradicts hard evidence" + evidence(f) + "; if the findings belong to this event, the object cannot date from then." + setAside(f)
	}
	if f.Note != "" {
		return "No verdict: " + f.Note + "."
	}
	return "No verdict."
}

// Join joins a list as people write it: "a", "a and b", "a, b and c"
// (with "or" for a choice).
func Join(xs []string, and string) string {
	switch len(xs) {
	case 0:
		return ""
	case 1:
		return xs[0]
	}
	return strings.Join(xs[:len(xs)-1], ", ") + " " + and + " " + xs[len(xs)-1]
}

// Correction says what restores agreement at a tier: the smallest, weakest
// set of evidence to set aside, or, when the search stopped at its work
// budget, one that does (perhaps not the cheapest).
func Correction(tier string, evidence []string, cheapest bool) string {
	if !cheapest {
		return "Setting aside " + strings.Join(evidence, ", ") + " restores agreement at the " + tier + " tier; the search stopped at its work budget, so a cheaper change may exist."
	}
	return "The smallest, weakest change that restores agreement at the " + tier + " tier is to set aside " + strings.Join(evidence, ", ") + "."
}
