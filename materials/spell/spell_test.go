package spell

import (
	"math/rand/v2"
	"strings"
	"testing"
)

// plainLevenshtein is the edit distance of a and b (in runes), the
// textbook dynamic programme (Wagner and Fischer 1974): the reference for
// Within and PrefixWithin.
func plainLevenshtein(a, b string) int {
	ra, rb := []rune(a), []rune(b)
	if len(ra) < len(rb) {
		ra, rb = rb, ra
	}
	prev := make([]int, len(rb)+1)
	cur := make([]int, len(rb)+1)
	for j := range prev {
		prev[j] = j
	}
	for i := 1; i <= len(ra); i++ {
		cur[0] = i
		for j := 1; j <= len(rb); j++ {
			cost := 1
			if ra[i-1] == rb[j-1] {
				cost = 0
			}
			cur[j] = min(prev[j]+1, cur[j-1]+1, prev[j-1]+cost)
		}
		prev, cur = cur, prev
	}
	return prev[len(rb)]
}

func TestDistanceTable(t *testing.T) {
	for _, tc := range []struct {
		a, b string
		want int
	}{
		{"", "", 0}, {"a", "", 1}, {"kitten", "sitting", 3}, {"made", "maed", 2}, {"grün", "grun", 1},
	} {
		if got := plainLevenshtein(tc.a, tc.b); got != tc.want {
			t.Errorf("plainLevenshtein(%q, %q): got %d, want %d", tc.a, tc.b, got, tc.want)
		}
		for limit := 0; limit <= tc.want+1; limit++ {
			if got, want := Within([]rune(tc.a), []rune(tc.b), limit), min(tc.want, limit+1); got != want {
				t.Errorf("Within(%q, %q, %d): got %d, want %d", tc.a, tc.b, limit, got, want)
			}
		}
	}
}

// The bounded edit distance agrees with the plain one wherever it is
// within the limit, and says limit+1 otherwise, on random words over a
// small alphabet (so that near misses are common), some longer than the
// stack buffer.
func TestWithinMatchesPlain(t *testing.T) {
	rng := rand.New(rand.NewPCG(1, 2))
	word := func() string {
		n := rng.IntN(12)
		if rng.IntN(20) == 0 {
			n = 60 + rng.IntN(20)
		}
		b := make([]rune, n)
		for i := range b {
			b[i] = []rune("abcü ")[rng.IntN(5)]
		}
		return string(b)
	}
	for range 20000 {
		a, b := word(), word()
		if rng.IntN(3) == 0 {
			b = a[:len(a)/2] + word()
		}
		d := plainLevenshtein(a, b)
		limit := rng.IntN(8)
		if got, want := Within([]rune(a), []rune(b), limit), min(d, limit+1); got != want {
			t.Fatalf("Within(%q, %q, %d) = %d, want %d (distance %d)", a, b, limit, got, want, d)
		}
		if got := Distance(a, b); got != d {
			t.Fatalf("Distance(%q, %q) = %d, want %d", a, b, got, d)
		}
		if ra, rb := []rune(a), []rune(b); len(rb) >= len(ra)+1 {
			p := len(ra) + 2
			for n := max(0, len(ra)-1); n <= len(ra)+1; n++ {
				p = min(p, plainLevenshtein(a, string(rb[:n])))
			}
			if got, want := PrefixWithin(ra, rb, limit), min(p, limit+1); got != want {
				t.Fatalf("PrefixWithin(%q, %q, %d) = %d, want %d", a, b, limit, got, want)
			}
		}
	}
}

func TestNearest(t *testing.T) {
	keys := []string{"id", "title", "place", "circa", "events", "findings", "records", "claims"}
	for _, tc := range []struct {
		word string
		want string
		why  string
	}{
		{"claimz", "claims", "one substitution"},
		{"Findngs", "findings", "case does not count; one deletion"},
		{"plaec", "place", "two edits, within the floor of two"},
		{"xyz", "", "nothing near"},
		{"ttle", "title", "one insertion"},
		{"evnts", "events", "one deletion"},
	} {
		t.Run(tc.word, func(t *testing.T) {
			got := strings.Join(Nearest(tc.word, keys, 1), "")
			if got != tc.want {
				t.Errorf("Nearest(%q) = %q, want %q (%s)", tc.word, got, tc.want, tc.why)
			}
		})
	}
	// Limit: a third of the length, at least two.
	for word, want := range map[string]int{"ab": 2, "abcdefgh": 2, "abcdefghi": 3, "ultramarine blue": 5} {
		if got := Limit(word); got != want {
			t.Errorf("Limit(%q) = %d, want %d", word, got, want)
		}
	}
}
