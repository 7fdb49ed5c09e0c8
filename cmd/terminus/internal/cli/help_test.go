package cli

import (
	"bytes"
	"context"
	"os"
	"path/filepath"
	"strings"
	"testing"
	"time"

	"github.com/spf13/cobra"
)

// Every example in every --help runs as written, from the root of the
// repository: none is bad use (exit 2). A redirection to a file is
// written to a scratch folder; "< FILE" is read as standard input; a
// glob is expanded as a shell would. The local page's examples start the
// server, which must print its address, and are stopped at once (on any
// free port where the example names none, so that the test never waits
// for a busy one).
func TestHelpExamplesRun(t *testing.T) {
	root := NewRootCmd(IO{In: strings.NewReader(""), Out: &bytes.Buffer{}, Err: &bytes.Buffer{}})
	var lines []string
	var walk func(c *cobra.Command)
	walk = func(c *cobra.Command) {
		for _, l := range strings.Split(c.Example, "\n") {
			l = strings.TrimSpace(l)
			if strings.HasPrefix(l, "terminus ") {
				lines = append(lines, l)
			}
		}
		for _, sub := range c.Commands() {
			walk(sub)
		}
	}
	walk(root)
	if len(lines) < 15 {
		t.Fatalf("only %d examples found", len(lines))
	}
	scratch := t.TempDir()
	t.Chdir("../../../..")
	for _, line := range lines {
		t.Run(line, func(t *testing.T) {
			args, stdin := exampleArgs(t, line, scratch)
			var out, errw bytes.Buffer
			if args[0] == "serve" {
				if !strings.Contains(line, "--port") {
					args = append(args, "--port", "0")
				}
				ctx, cancel := context.WithCancel(t.Context())
				done := make(chan int)
				w := &syncBuffer{}
				go func() { done <- Main(ctx, args, stdin, w, &errw) }()
				deadline := time.Now().Add(10 * time.Second)
				for !strings.Contains(w.String(), "http://") && time.Now().Before(deadline) {
					time.Sleep(20 * time.Millisecond)
				}
				cancel()
				code := <-done
				if !strings.Contains(w.String(), "http://") || code == 2 {
					t.Errorf("exit %d, stdout %q, stderr %q", code, w.String(), errw.String())
				}
				return
			}
			code := Main(t.Context(), args, stdin, &out, &errw)
			if code == 2 {
				t.Errorf("exit 2 (bad use): %s", errw.String())
			}
		})
	}
}

// exampleArgs splits an example line as a shell would: quotes, a trailing
// comment, "> file", "< file" and globs.
func exampleArgs(t *testing.T, line, scratch string) ([]string, *bytes.Reader) {
	t.Helper()
	if i := strings.Index(line, "  #"); i >= 0 {
		line = line[:i]
	}
	var words []string
	var cur strings.Builder
	quote := rune(0)
	inWord := false
	for _, r := range line {
		switch {
		case quote != 0 && r == quote:
			quote = 0
		case quote != 0:
			cur.WriteRune(r)
		case r == '"' || r == '\'':
			quote, inWord = r, true
		case r == ' ':
			if inWord {
				words = append(words, cur.String())
				cur.Reset()
				inWord = false
			}
		default:
			cur.WriteRune(r)
			inWord = true
		}
	}
	if inWord {
		words = append(words, cur.String())
	}
	stdin := bytes.NewReader(nil)
	var args []string
	for i := 1; i < len(words); i++ {
		switch w := words[i]; {
		case w == ">" && i+1 < len(words):
			i++ // output goes to the scratch folder, unread
			_ = filepath.Join(scratch, words[i])
		case w == "<" && i+1 < len(words):
			i++
			b, err := os.ReadFile(words[i])
			if err != nil {
				t.Fatalf("%s: %v", line, err)
			}
			stdin = bytes.NewReader(b)
		case strings.ContainsAny(w, "*?[") && !strings.HasPrefix(w, "["):
			m, _ := filepath.Glob(w)
			if len(m) == 0 {
				t.Fatalf("%s: %s matches no file", line, w)
			}
			args = append(args, m...)
		default:
			args = append(args, w)
		}
	}
	return args, stdin
}
