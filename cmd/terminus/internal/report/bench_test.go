package report

import (
	"io"
	"path/filepath"
	"testing"
)

// BenchmarkHTMLReport writes the HTML report (with its picture) of each
// example.
func BenchmarkHTMLReport(b *testing.B) {
	files, _ := filepath.Glob(filepath.Join(repoRoot, "examples", "*", "case.yaml"))
	for _, f := range files {
		r := builtinResult(b, f)
		b.Run(filepath.Base(filepath.Dir(f)), func(b *testing.B) {
			b.ReportAllocs()
			for b.Loop() {
				if err := HTML(io.Discard, r); err != nil {
					b.Fatal(err)
				}
			}
		})
	}
}
