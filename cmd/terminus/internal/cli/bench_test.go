package cli

import (
	"bytes"
	"context"
	"io"
	"path/filepath"
	"strings"
	"testing"

	"terminus/cmd/terminus/internal/report"
	"terminus/constraint"
	"terminus/constraint/casefile"
	"terminus/constraint/input"
	"terminus/materials"
)

// BenchmarkCheckExample runs check on each example end to end in-process:
// read the case, analyze it against the built-in dataset (already parsed),
// write the Markdown report.
func BenchmarkCheckExample(b *testing.B) {
	cases, _ := filepath.Glob("../../../../examples/*/case.*")
	for _, c := range cases {
		name := filepath.Base(filepath.Dir(c))
		b.Run(name, func(b *testing.B) {
			b.ReportAllocs()
			for b.Loop() {
				var out, errw bytes.Buffer
				if code := Main(context.Background(), []string{"check", "--format", "md", c}, strings.NewReader(""), &out, &errw); code == 2 {
					b.Fatal(errw.String())
				}
			}
		})
	}
}

// BenchmarkAnalyze isolates the reasoner on each example (no file reading,
// no report).
func BenchmarkAnalyze(b *testing.B) {
	ds, err := materials.Builtin()
	if err != nil {
		b.Fatal(err)
	}
	cases, _ := filepath.Glob("../../../../examples/*/case.*")
	for _, path := range cases {
		c, err := casefile.Read(path, input.Limits{})
		if err != nil {
			b.Fatal(err)
		}
		for _, sens := range []bool{true, false} {
			name := filepath.Base(filepath.Dir(path))
			if !sens {
				name += "/no-sensitivity"
			}
			b.Run(name, func(b *testing.B) {
				b.ReportAllocs()
				for b.Loop() {
					r, err := constraint.Analyze(context.Background(), c, ds, constraint.Options{NoSensitivity: !sens})
					if err != nil {
						b.Fatal(err)
					}
					_ = report.Markdown(io.Discard, r)
				}
			})
		}
	}
}
