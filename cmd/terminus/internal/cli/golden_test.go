package cli

import (
	"os"
	"path/filepath"
	"regexp"
	"strings"
	"testing"
)

// The golden files under testdata/golden hold the output of every format
// of check on every example, and of every format of survey on the
// survey test collections, as they were when written: a change of
// behaviour shows as a difference, and a change of code that should not
// change behaviour (a move, a split) must leave them byte for byte. The
// examples' own expected.md files are the Markdown goldens of check. The
// dataset's digest, which every edit of the data changes, is written as
// "…" in them. go test ./cmd/... -update rewrites them.

const goldenDir = "../../../../testdata/golden"

// digests finds the dataset's SHA-256 as each format writes it.
var digests = regexp.MustCompile(`(sha256[":\s]+)[0-9a-f]{12,64}…?`)

func normGolden(s string) string { return digests.ReplaceAllString(s, "${1}…") }

func checkGolden(t *testing.T, name, got string) {
	t.Helper()
	path := filepath.Join(goldenDir, name)
	got = normGolden(got)
	if *update {
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
		t.Fatalf("no golden file: %v (run go test ./cmd/... -update)", err)
	}
	if string(want) != got {
		t.Errorf("%s differs (go test ./cmd/... -update rewrites it):\n%s", path, lineDiff(string(want), got))
	}
}

func TestGoldenCheck(t *testing.T) {
	cases, _ := filepath.Glob("../../../../examples/*/case.*")
	if len(cases) == 0 {
		t.Fatal("no examples found")
	}
	for _, c := range cases {
		example := filepath.Base(filepath.Dir(c))
		rel, _ := filepath.Rel("../../../..", c)
		for _, format := range []string{"text", "json", "html", "svg"} {
			t.Run(example+"/"+format, func(t *testing.T) {
				wd, _ := os.Getwd()
				t.Chdir("../../../..")
				out, errs, code := execute(t, "check", "--format", format, rel)
				t.Chdir(wd)
				if code == 2 {
					t.Fatalf("exit 2: %s", errs)
				}
				checkGolden(t, filepath.Join("check", example+"."+format), out)
			})
		}
	}
}

func TestGoldenSurvey(t *testing.T) {
	for _, in := range []string{"collection.csv", "collection.jsonl"} {
		for _, format := range []string{"jsonl", "csv", "md", "html"} {
			t.Run(in+"/"+format, func(t *testing.T) {
				wd, _ := os.Getwd()
				t.Chdir("../../../..")
				out, errs, code := execute(t, "survey", "--materials", "constraint/testdata/fixture-materials.yaml",
					"--format", format, filepath.Join("testdata", "survey", in))
				t.Chdir(wd)
				if code == 2 {
					t.Fatalf("exit 2: %s", errs)
				}
				checkGolden(t, filepath.Join("survey", strings.TrimPrefix(in, "collection.")+"-in."+format), out)
			})
		}
	}
}
