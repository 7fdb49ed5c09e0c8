// Package spell measures how far apart two words are, for the "did you
// mean" hints given on a misspelt material, place, key or event.
//
// # Model
//
// The distance is the Levenshtein edit distance (insertions, deletions and
// substitutions of one rune each, all costing one), computed by the
// Wagner–Fischer table. [Within] stops as soon as the distance must exceed
// a limit and allocates nothing for words of up to 63 runes; [PrefixWithin]
// compares a word with the starts of a longer name in one table.
//
// # Limits
//
// No weights for neighbouring keys or transpositions (a swap of two letters
// counts two), no phonetic matching and no case folding: callers fold first.
package spell

import (
	"cmp"
	"slices"
	"strings"
	"unicode/utf8"
)

// Distance is the edit distance of a and b, counted in runes.
func Distance(a, b string) int {
	ra, rb := []rune(a), []rune(b)
	return Within(ra, rb, max(len(ra), len(rb)))
}

// PrefixWithin is the least edit distance between key and the starts of
// name one rune shorter, as long, and one rune longer than key (name must
// have len(key)+1 runes at least), capped at limit+1 like [Within]: one
// table, whose rows are name's runes, gives all three.
func PrefixWithin(key, name []rune, limit int) int {
	if limit < 0 {
		return 0
	}
	m := len(key)
	var buf [2 * 64]int
	var prev, cur []int
	if m+1 <= 64 {
		prev, cur = buf[:m+1], buf[64:64+m+1]
	} else {
		prev, cur = make([]int, m+1), make([]int, m+1)
	}
	for j := range prev {
		prev[j] = j
	}
	best := limit + 1
	if m <= 1 { // the empty start of name is one of the three
		best = min(best, m)
	}
	for i := 1; i <= m+1 && i <= len(name); i++ {
		cur[0] = i
		rowMin := i
		for j := 1; j <= m; j++ {
			cost := 1
			if name[i-1] == key[j-1] {
				cost = 0
			}
			cur[j] = min(prev[j]+1, cur[j-1]+1, prev[j-1]+cost)
			rowMin = min(rowMin, cur[j])
		}
		if i >= m-1 {
			best = min(best, cur[m])
		}
		if rowMin > limit {
			break // later rows only grow from this one
		}
		prev, cur = cur, prev
	}
	return min(best, limit+1)
}

// Within is the edit distance of a and b when it is at most limit, and
// limit+1 otherwise; it gives up as soon as the distance must exceed
// limit, which makes suggestions cheap (most names are far off).
func Within(a, b []rune, limit int) int {
	if limit < 0 {
		return 0
	}
	if len(a) < len(b) {
		a, b = b, a
	}
	if len(a)-len(b) > limit {
		return limit + 1
	}
	var buf [2 * 64]int
	var prev, cur []int
	if len(b)+1 <= 64 {
		prev, cur = buf[:len(b)+1], buf[64:64+len(b)+1]
	} else {
		prev, cur = make([]int, len(b)+1), make([]int, len(b)+1)
	}
	for j := range prev {
		prev[j] = j
	}
	for i := 1; i <= len(a); i++ {
		cur[0] = i
		rowMin := i
		for j := 1; j <= len(b); j++ {
			cost := 1
			if a[i-1] == b[j-1] {
				cost = 0
			}
			cur[j] = min(prev[j]+1, cur[j-1]+1, prev[j-1]+cost)
			rowMin = min(rowMin, cur[j])
		}
		if rowMin > limit {
			return limit + 1 // every later row only grows from this one
		}
		prev, cur = cur, prev
	}
	return min(prev[len(b)], limit+1)
}

// Limit is how many edits a word may be from a candidate and still look
// like a slip of spelling: a third of its length in runes, and at least
// two. Every "did you mean" of terminus uses this one rule.
func Limit(word string) int { return max(2, utf8.RuneCountInString(word)/3) }

// Nearest returns up to n of candidates within [Limit] edits of word,
// compared without case, nearest first and, at the same distance, in the
// order of the candidates' text; each candidate once.
func Nearest(word string, candidates []string, n int) []string {
	type cand struct {
		s string
		d int
	}
	w := []rune(strings.ToLower(word))
	limit := Limit(word)
	var cs []cand
	for _, c := range candidates {
		if d := Within(w, []rune(strings.ToLower(c)), limit); d <= limit {
			cs = append(cs, cand{c, d})
		}
	}
	slices.SortStableFunc(cs, func(a, b cand) int { return cmp.Or(cmp.Compare(a.d, b.d), cmp.Compare(a.s, b.s)) })
	out := make([]string, 0, n)
	for _, c := range cs {
		if len(out) == n {
			break
		}
		if !slices.Contains(out, c.s) {
			out = append(out, c.s)
		}
	}
	return out
}
