package cli

import (
	"errors"
	"fmt"
	"strings"

	"github.com/spf13/cobra"

	"terminus/constraint/wording"
	"terminus/materials/spell"
)

// ourArgs puts our own words on every command's argument check, in place
// of the library's ("requires at least 1 arg(s), only received 0"): what
// the command takes, an example to copy, and for a command with
// subcommands the nearest one to a mistyped word. A check that already
// says it in our words passes through.
func ourArgs(c *cobra.Command) {
	check := c.Args
	c.Args = func(cmd *cobra.Command, args []string) error {
		if check == nil {
			return nil
		}
		err := check(cmd, args)
		var ours *ExitError
		if err == nil || errors.As(err, &ours) {
			return err
		}
		return usageError(argsError(cmd, args))
	}
	for _, sub := range c.Commands() {
		ourArgs(sub)
	}
}

// argsError says what was wrong with a command's arguments.
func argsError(cmd *cobra.Command, args []string) error {
	path := cmd.CommandPath()
	help := fmt.Sprintf("'%s --help' shows more", path)
	if cmd.HasAvailableSubCommands() && len(args) > 0 {
		var names []string
		for _, sub := range cmd.Commands() {
			if sub.IsAvailableCommand() {
				names = append(names, sub.Name())
			}
		}
		hint := fmt.Sprintf("'%s --help' lists the commands", path)
		if near := spell.Nearest(args[0], names, 1); len(near) > 0 {
			hint = fmt.Sprintf("did you mean '%s %s'? %s", path, near[0], hint)
		}
		return &hintError{err: fmt.Errorf("%s has no command %q", path, args[0]), hint: hint}
	}
	if ex := firstExample(cmd); ex != "" {
		help = "for example: " + ex + "; " + help
	}
	_, takes, _ := strings.Cut(cmd.Use, " ")
	var err error
	switch {
	case takes == "":
		err = fmt.Errorf("%s takes no arguments, got %s", path, quoted(args))
	case len(args) == 0:
		err = fmt.Errorf("%s needs %s", path, spelled(takes))
	default:
		err = fmt.Errorf("%s takes %s, got %s", path, spelled(takes), quoted(args))
	}
	return &hintError{err: err, hint: help}
}

// spelled says a usage line's arguments in words: "FILE..." is "at least
// one FILE", "[FILE]" "at most one FILE", "NAME" "a NAME".
func spelled(takes string) string {
	switch {
	case strings.HasSuffix(takes, "..."):
		return "at least one " + strings.TrimSuffix(takes, "...")
	case strings.HasPrefix(takes, "[") && strings.HasSuffix(takes, "]"):
		return "at most one " + takes[1:len(takes)-1]
	}
	return "a " + takes
}

// firstExample is the first line of a command's examples, trimmed.
func firstExample(cmd *cobra.Command) string {
	first, _, _ := strings.Cut(strings.TrimSpace(cmd.Example), "\n")
	return strings.TrimSpace(first)
}

// quoted lists arguments as the user typed them: "a", "b" (3 arguments).
func quoted(args []string) string {
	q := make([]string, len(args))
	for i, a := range args {
		q[i] = fmt.Sprintf("%q", a)
	}
	return fmt.Sprintf("%d %s: %s", len(args), wording.Plural(len(args), "argument", "arguments"), strings.Join(q, " "))
}
