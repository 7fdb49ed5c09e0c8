package wording

// Plural picks the word for n things: one for exactly one, many for every
// other count (0 records, 1 record, 2 records; -1 is not one either).
func Plural(n int, one, many string) string {
	if n == 1 {
		return one
	}
	return many
}
