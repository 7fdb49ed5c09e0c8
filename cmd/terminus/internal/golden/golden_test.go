package golden

import (
	"os"
	"path/filepath"
	"strings"
	"testing"
)

func TestNormalize(t *testing.T) {
	for _, tc := range []struct {
		in, want, why string
	}{
		{"(sha256 cb8bc8c27830…)", "(sha256 …)", "the Markdown and text reports' short digest"},
		{`"sha256":"` + strings.Repeat("ab", 32) + `"`, `"sha256":"…"`, "JSON's full digest"},
		{"sha256 abc", "sha256 abc", "fewer than 12 hex digits are no digest"},
		{"no digest here", "no digest here", "text without a digest is left alone"},
	} {
		t.Run(tc.why, func(t *testing.T) {
			if got := Normalize(tc.in); got != tc.want {
				t.Errorf("Normalize(%q) = %q, want %q", tc.in, got, tc.want)
			}
		})
	}
}

func TestDiff(t *testing.T) {
	if got := Diff("a\nb\nc", "a\nB\nc\nd"); got != "line 2:\n- b\n+ B\nline 4:\n- \n+ d\n" {
		t.Errorf("Diff = %q: want line 2 changed and line 4 added", got)
	}
	if got := Diff("same", "same"); got != "" {
		t.Errorf("Diff of equal texts = %q, want nothing", got)
	}
	many := strings.Repeat("x\n", 10)
	if got := strings.Count(Diff(many, strings.Repeat("y\n", 10)), "line "); got != 5 {
		t.Errorf("Diff shows %d lines of ten that differ, want the first 5", got)
	}
}

// fakeTB records a failure instead of failing the test that runs Check.
type fakeTB struct {
	testing.TB
	failed bool
}

func (f *fakeTB) Helper()                           {}
func (f *fakeTB) Errorf(format string, args ...any) { f.failed = true }
func (f *fakeTB) Fatalf(format string, args ...any) { f.failed = true }

func TestCheck(t *testing.T) {
	path := filepath.Join(t.TempDir(), "sub", "out.txt")
	Check(t, path, "dataset sha256 cb8bc8c27830…\n", true)
	b, err := os.ReadFile(path)
	if err != nil || string(b) != "dataset sha256 …\n" {
		t.Fatalf("-update wrote %q, %v; want the normalized text", b, err)
	}
	Check(t, path, "dataset sha256 0123456789ab…\n", false) // another digest is the same golden
	f := &fakeTB{TB: t}
	Check(f, path, "dataset sha256 …\nmore\n", false)
	if !f.failed {
		t.Error("Check passed output that differs from the golden file")
	}
}
