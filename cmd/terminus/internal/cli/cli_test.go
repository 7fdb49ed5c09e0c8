package cli

import (
	"bytes"
	"context"
	"encoding/json"
	"flag"
	"os"
	"path/filepath"
	"strings"
	"testing"

	"terminus/cmd/terminus/internal/golden"
)

var update = flag.Bool("update", false, "rewrite the expected reports of the examples")

// execute runs terminus with args and returns what it printed and its
// exit status.
func execute(t *testing.T, args ...string) (stdout, stderr string, code int) {
	t.Helper()
	var out, errw bytes.Buffer
	code = Main(context.Background(), args, strings.NewReader(""), &out, &errw)
	return out.String(), errw.String(), code
}

// checkFails runs terminus with args and checks that it fails on its input
// (exit 2), prints no report, and says each of want on stderr; it returns
// stderr.
func checkFails(t *testing.T, want []string, args ...string) string {
	t.Helper()
	out, errs, code := execute(t, args...)
	if code != 2 {
		t.Errorf("exit %d, want 2", code)
	}
	if out != "" {
		t.Errorf("stdout not empty: %q", out)
	}
	for _, w := range want {
		if !strings.Contains(errs, w) {
			t.Errorf("stderr %q lacks %q", errs, w)
		}
	}
	return errs
}

// checkPrints runs terminus with args and checks that it succeeds with
// nothing on stderr and prints each of want; it returns stdout.
func checkPrints(t *testing.T, want []string, args ...string) string {
	t.Helper()
	out, errs, code := execute(t, args...)
	if code != 0 || errs != "" {
		t.Fatalf("exit %d, stderr %q", code, errs)
	}
	for _, w := range want {
		if !strings.Contains(out, w) {
			t.Errorf("output lacks %q\ngot:\n%s", w, out)
		}
	}
	return out
}

const fixture = "../../../../constraint/testdata/fixture-materials.yaml"

// writeFile writes text to a file of that name in a folder of the test's own
// and returns its path.
func writeFile(t *testing.T, name, text string) string {
	t.Helper()
	p := filepath.Join(t.TempDir(), name)
	if err := os.WriteFile(p, []byte(text), 0o644); err != nil {
		t.Fatal(err)
	}
	return p
}

func TestVersion(t *testing.T) {
	out, _, code := execute(t, "--version")
	if code != 0 || !strings.HasPrefix(out, "terminus ") || !strings.Contains(out, "dataset ") {
		t.Errorf("--version: code %d, out %q", code, out)
	}
}

func TestCheckExitStatus(t *testing.T) {
	// With the fixture materials (invented for tests): fixture yellow is made
	// 1809 (hard), sold 1816 (firm), arrived NL 1830 (soft).
	tests := []struct {
		name, claim, failOn string
		want                int
	}{
		{"consistent", "1840", "soft", 0},
		{"doubtful fails at soft", "1820", "soft", 1},
		{"doubtful passes at firm", "1820", "firm", 0},
		{"improbable fails at firm", "1812", "firm", 1},
		{"improbable passes at hard", "1812", "hard", 0},
		{"excluded fails at hard", "1800", "hard", 1},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			p := writeFile(t, "case.yaml", "place: NL\nfindings:\n  - material: fixture yellow\nclaims:\n  - date: \""+tc.claim+"\"\n")
			out, errs, code := execute(t, "check", "--materials", fixture, "--fail-on", tc.failOn, p)
			if code != tc.want {
				t.Errorf("exit %d, want %d\nstdout: %s\nstderr: %s", code, tc.want, out, errs)
			}
			if out == "" {
				t.Error("no report on stdout")
			}
		})
	}
}

func TestCheckBadInput(t *testing.T) {
	tests := []struct {
		name, text string
		want       []string
	}{
		{"unknown material", "findings:\n  - material: fixture yelow\n", []string{"case.yaml:2:15: finding finding-1: unknown material", "terminus: hint: did you mean"}},
		{"misspelt key", "title: x\nclaimz: []\n", []string{"case.yaml:2:1: case file: unknown key \"claimz\"", "did you mean 'claims'?"}},
		{"bad yaml", "title: [x\n", []string{"case.yaml:", "not valid YAML"}},
		// The message lists every calendar the dates are read in (it once
		// named five of the eleven), and suggests the nearest.
		{"unknown calendar", "records:\n  - {not_after: \"1300\", calendar: persain}\n",
			[]string{"case.yaml:2:35: calendar \"persain\"", "islamic, persian, hebrew, french republican, buddhist or roc", "did you mean 'persian'?"}},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			errs := checkFails(t, tc.want, "check", "--materials", fixture, writeFile(t, "case.yaml", tc.text))
			if !strings.HasPrefix(errs, "terminus: error: ") {
				t.Errorf("stderr %q does not start with terminus: error:", errs)
			}
		})
	}
	// A missing file, a bad flag value.
	if out, errs, code := execute(t, "check", "no-such-case.yaml"); code != 2 || out != "" || !strings.Contains(errs, "no-such-case.yaml") {
		t.Errorf("missing file: %d %q %q", code, out, errs)
	}
	p := writeFile(t, "case.yaml", "findings: []\n")
	if _, errs, code := execute(t, "check", "--fail-on", "medium", p); code != 2 || !strings.Contains(errs, "--fail-on") {
		t.Errorf("bad --fail-on: %d %q", code, errs)
	}
	if _, errs, code := execute(t, "check", "--format", "pdf", p); code != 2 || !strings.Contains(errs, "--format") {
		t.Errorf("bad --format: %d %q", code, errs)
	}
	if _, _, code := execute(t, "chek"); code != 2 {
		t.Errorf("unknown command: exit %d, want 2", code)
	}
}

func TestCheckJSON(t *testing.T) {
	p := writeFile(t, "case.yaml", "title: J\nplace: NL\nfindings:\n  - {id: f-yellow, material: fixture yellow}\nclaims:\n  - {date: 1870/1879}\n")
	out, errs, code := execute(t, "check", "--materials", fixture, "--format", "json", p)
	if code != 0 {
		t.Fatalf("exit %d: %s", code, errs)
	}
	var doc struct {
		SchemaVersion int             `json:"schema_version"`
		Consistent    map[string]bool `json:"consistent"`
		Events        []struct {
			ID      string `json:"id"`
			Windows map[string]*struct {
				Earliest struct {
					Date    *string  `json:"date"`
					Year    *int64   `json:"year"`
					Because []string `json:"because"`
				} `json:"earliest"`
				Latest struct {
					Date *string `json:"date"`
				} `json:"latest"`
			} `json:"windows"`
		} `json:"events"`
		Claims []struct {
			Verdict   string                `json:"verdict"`
			Surviving map[string]*[2]string `json:"surviving"`
		} `json:"claims"`
		Cautions []string `json:"cautions"`
	}
	if err := json.Unmarshal([]byte(out), &doc); err != nil {
		t.Fatalf("not JSON: %v\n%s", err, out)
	}
	if doc.SchemaVersion != 2 || !doc.Consistent["soft"] || len(doc.Cautions) != 5 {
		t.Errorf("header fields: %+v", doc)
	}
	hard := doc.Events[0].Windows["hard"]
	if hard == nil || *hard.Earliest.Date != "1809-01-01" || *hard.Earliest.Year != 1809 || hard.Latest.Date != nil || strings.Join(hard.Earliest.Because, ",") != "f-yellow" {
		t.Errorf("hard window: %+v", hard)
	}
	if c := doc.Claims[0]; c.Verdict != "consistent" || (*c.Surviving["soft"])[0] != "1870-01-01" || (*c.Surviving["soft"])[1] != "1879-12-31" {
		t.Errorf("claim: %+v", c)
	}
}

func TestInit(t *testing.T) {
	dir := t.TempDir()
	p := filepath.Join(dir, "new.yaml")
	if _, errs, code := execute(t, "init", p); code != 0 {
		t.Fatalf("init: %d %s", code, errs)
	}
	if _, errs, code := execute(t, "init", p); code != 2 || !strings.Contains(errs, "--force") {
		t.Errorf("second init: %d %q, want exit 2 with a hint", code, errs)
	}
	// The starter file checks without errors against the built-in dataset.
	if _, errs, code := execute(t, "check", p); code == 2 {
		t.Errorf("the starter case does not check: %s", errs)
	}
}

// TestExamples runs every example as a user would and compares the
// Markdown report with the expected one beside it (go test -update
// rewrites them).
func TestExamples(t *testing.T) {
	cases, _ := filepath.Glob("../../../../examples/*/case.*")
	if len(cases) == 0 {
		t.Fatal("no examples found")
	}
	for _, c := range cases {
		dir := filepath.Dir(c)
		t.Run(filepath.Base(dir), func(t *testing.T) {
			rel, _ := filepath.Rel("../../../..", c)
			wd, _ := os.Getwd()
			t.Chdir("../../../..")
			out, errs, code := execute(t, "check", "--format", "md", rel)
			t.Chdir(wd)
			if code == 2 {
				t.Fatalf("exit 2: %s", errs)
			}
			want := filepath.Join(dir, "expected.md")
			if *update {
				if err := os.WriteFile(want, []byte(out), 0o644); err != nil {
					t.Fatal(err)
				}
				return
			}
			b, err := os.ReadFile(want)
			if err != nil {
				t.Fatalf("no expected report: %v (run go test ./cmd/... -update)", err)
			}
			// The dataset's digest changes with every edit of the data; the
			// reports are compared without it.
			if golden.Normalize(string(b)) != golden.Normalize(out) {
				t.Errorf("report differs from %s (go test -update rewrites it):\n%s", want, golden.Diff(string(b), out))
			}
		})
	}
}
