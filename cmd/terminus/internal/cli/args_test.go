package cli

import (
	"strings"
	"testing"
)

// TestArgsInOurWords: a wrong count of arguments, or a mistyped command,
// gets our words (what the command takes, an example, the nearest
// command), exit 2 and no output; never the library's "arg(s)".
func TestArgsInOurWords(t *testing.T) {
	for _, tc := range []struct {
		args []string
		want []string
	}{
		{[]string{"materials", "lint"}, []string{"terminus materials lint needs at least one FILE", "hint: for example: terminus materials lint "}},
		{[]string{"materials", "show"}, []string{"terminus materials show needs a NAME", "--help' shows more"}},
		{[]string{"survey"}, []string{"terminus survey needs at least one FILE"}},
		{[]string{"date"}, []string{"terminus date needs at least one EXPR"}},
		{[]string{"init", "a", "b"}, []string{`terminus init takes at most one FILE, got 2 arguments: "a" "b"`}},
		{[]string{"serve", "x"}, []string{`terminus serve takes no arguments, got 1 argument: "x"`}},
		{[]string{"materials", "stats", "x"}, []string{"takes no arguments"}},
		{[]string{"chek", "case.yaml"}, []string{`terminus has no command "chek"`, "did you mean 'terminus check'?"}},
		{[]string{"materials", "sourcs"}, []string{`terminus materials has no command "sourcs"`, "did you mean 'terminus materials sources'?"}},
		{[]string{"materials", "zzzzzzzz"}, []string{"'terminus materials --help' lists the commands"}},
		{[]string{"check"}, []string{"check needs a case file"}},
	} {
		t.Run(strings.Join(tc.args, " "), func(t *testing.T) {
			errs := checkFails(t, tc.want, tc.args...)
			if strings.Contains(errs, "arg(s)") || strings.Contains(errs, "did you mean") && strings.Contains(tc.args[len(tc.args)-1], "zzz") {
				t.Errorf("stderr %q", errs)
			}
		})
	}
}

// TestHelpFitsTerminal: every help page reads in an 80-column terminal;
// only an example command line may run longer, as it must be copied whole.
func TestHelpFitsTerminal(t *testing.T) {
	root := NewRootCmd(IO{})
	pages := [][]string{{"--help"}}
	for _, c := range root.Commands() {
		pages = append(pages, []string{c.Name(), "--help"})
		for _, sub := range c.Commands() {
			pages = append(pages, []string{c.Name(), sub.Name(), "--help"})
		}
	}
	for _, args := range pages {
		out, _, code := execute(t, args...)
		if code != 0 || out == "" {
			t.Errorf("%v: exit %d, %d bytes", args, code, len(out))
		}
		for i, line := range strings.Split(out, "\n") {
			if n := len([]rune(line)); n > 80 && !strings.HasPrefix(line, "  terminus ") {
				t.Errorf("terminus %s: line %d has %d columns: %q", strings.Join(args, " "), i+1, n, line)
			}
		}
	}
}
