// Package nodetest runs, for Go tests, the scripts of testdata/node with
// node: a driver for Debian's chromium (playwright-core, which downloads
// no browser of its own) and the JSON-LD processor jsonld.js. A test that
// needs one calls [Run]; where node, the installed packages or chromium
// are missing, the test is skipped with a message that says what to
// install (CI installs them all: apt-get install chromium nodejs npm, then
// npm ci in testdata/node).
package nodetest

import (
	"bytes"
	"context"
	"os"
	"os/exec"
	"path/filepath"
	"runtime"
	"testing"
	"time"
)

// Dir is the folder of the scripts, found from this file's place in the
// repository.
func Dir() string {
	_, file, _, _ := runtime.Caller(0)
	return filepath.Join(filepath.Dir(file), "..", "..", "..", "..", "testdata", "node")
}

// Chromium is the browser the scripts drive: $CHROMIUM, else Debian's.
func Chromium() string {
	if c := os.Getenv("CHROMIUM"); c != "" {
		return c
	}
	return "/usr/bin/chromium"
}

// Need skips t unless node and the packages are installed and, when
// browser is true, chromium too.
func Need(t testing.TB, browser bool) {
	t.Helper()
	if _, err := exec.LookPath("node"); err != nil {
		t.Skip("SKIPPED: node is not installed (apt-get install nodejs npm; then npm ci in testdata/node)")
	}
	if _, err := os.Stat(filepath.Join(Dir(), "node_modules", "playwright-core")); err != nil {
		t.Skip("SKIPPED: the test tools are not installed (npm ci in testdata/node)")
	}
	if browser {
		if _, err := os.Stat(Chromium()); err != nil {
			t.Skip("SKIPPED: chromium is not installed (apt-get install chromium)")
		}
	}
}

// Run runs script (a file of testdata/node) with args and standard input
// stdin, and returns its standard output; a failure fails t with the
// script's standard error.
func Run(t testing.TB, stdin []byte, script string, args ...string) []byte {
	t.Helper()
	ctx, cancel := context.WithTimeout(context.Background(), 3*time.Minute)
	defer cancel()
	cmd := exec.CommandContext(ctx, "node", append([]string{filepath.Join(Dir(), script)}, args...)...)
	cmd.Env = append(os.Environ(), "CHROMIUM="+Chromium())
	cmd.Stdin = bytes.NewReader(stdin)
	var out, errb bytes.Buffer
	cmd.Stdout, cmd.Stderr = &out, &errb
	if err := cmd.Run(); err != nil {
		t.Fatalf("node %s: %v\n%s", script, err, errb.String())
	}
	return out.Bytes()
}
