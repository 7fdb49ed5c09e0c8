// Package golden compares the output of Go tests with the golden files of
// testdata/golden and the examples' expected reports. The dataset's SHA-256
// digest, which every edit of the data changes, is compared as "…"; a
// difference is shown by its first differing lines; a test's -update flag
// rewrites the file instead of comparing.
package golden

import (
	"os"
	"path/filepath"
	"regexp"
	"strconv"
	"strings"
	"testing"
)

// digests finds the dataset's SHA-256 as each format writes it.
var digests = regexp.MustCompile(`(sha256[":\s]+)[0-9a-f]{12,64}…?`)

// Normalize writes the dataset's digest as "…".
func Normalize(s string) string { return digests.ReplaceAllString(s, "${1}…") }

// Check compares got, normalized, with the golden file at path; with
// update it writes the file (and its folder) instead.
func Check(t testing.TB, path, got string, update bool) {
	t.Helper()
	got = Normalize(got)
	if update {
		if err := os.MkdirAll(filepath.Dir(path), 0o755); err != nil {
			t.Fatal(err)
		}
		if err := os.WriteFile(path, []byte(got), 0o644); err != nil {
			t.Fatal(err)
		}
		return
	}
	want, err := os.ReadFile(path)
	if err != nil {
		t.Fatalf("no golden file: %v (go test with -update writes it)", err)
	}
	if string(want) != got {
		t.Errorf("%s differs (go test with -update rewrites it):\n%s", path, Diff(string(want), got))
	}
}

// Diff shows the first five lines that differ, as "line n:", "- want"
// and "+ got".
func Diff(want, got string) string {
	w, g := strings.Split(want, "\n"), strings.Split(got, "\n")
	var b strings.Builder
	shown := 0
	for i := 0; i < len(w) || i < len(g); i++ {
		var wl, gl string
		if i < len(w) {
			wl = w[i]
		}
		if i < len(g) {
			gl = g[i]
		}
		if wl != gl {
			b.WriteString("line " + strconv.Itoa(i+1) + ":\n- " + wl + "\n+ " + gl + "\n")
			if shown++; shown == 5 {
				break
			}
		}
	}
	return b.String()
}
