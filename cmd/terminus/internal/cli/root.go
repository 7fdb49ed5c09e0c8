// Package cli is the terminus command tree. Every command is built by a
// constructor that takes the [IO] it writes to; nothing here is global.
package cli

import (
	"context"
	"errors"
	"fmt"
	"io"
	"strings"

	"github.com/spf13/cobra"
)

// IO is where a command reads and writes.
type IO struct {
	In       io.Reader
	Out, Err io.Writer
}

// ExitError carries an exit status other than 0 out of a command. A
// status-1 result (a claim not consistent) is not an error of use.
type ExitError struct {
	Code int
	Err  error // nil when the command already said what it had to
}

func (e *ExitError) Error() string {
	if e.Err == nil {
		return fmt.Sprintf("exit status %d", e.Code)
	}
	return e.Err.Error()
}

func (e *ExitError) Unwrap() error { return e.Err }

// usageError marks bad input or usage: exit status 2.
func usageError(err error) error { return &ExitError{Code: 2, Err: err} }

// Main runs terminus with args and returns the exit status.
func Main(ctx context.Context, args []string, in io.Reader, out, errw io.Writer) int {
	s := IO{In: in, Out: out, Err: errw}
	root := NewRootCmd(s)
	root.SetArgs(args)
	err := root.ExecuteContext(ctx)
	if err == nil {
		return 0
	}
	var ee *ExitError
	if errors.As(err, &ee) {
		if ee.Err != nil {
			printError(errw, ee.Err)
		}
		return ee.Code
	}
	// Errors from cobra itself (unknown command or flag) are usage errors.
	printError(errw, err)
	return 2
}

// hinter is an error that can suggest a fix.
type hinter interface{ Hint() string }

func printError(w io.Writer, err error) {
	fmt.Fprintf(w, "terminus: error: %v\n", err)
	var h hinter
	if errors.As(err, &h) && h.Hint() != "" {
		fmt.Fprintf(w, "terminus: hint: %s\n", h.Hint())
	}
}

// NewRootCmd builds the whole command tree.
func NewRootCmd(s IO) *cobra.Command {
	var showVersion bool
	root := &cobra.Command{
		Use:           "terminus",
		Short:         "Date objects and documents from the materials found in them",
		SilenceUsage:  true,
		SilenceErrors: true,
		Args:          cobra.NoArgs,
		RunE: func(cmd *cobra.Command, args []string) error {
			if showVersion {
				return printVersion(s)
			}
			return cmd.Help()
		},
	}
	root.Flags().BoolVarP(&showVersion, "version", "v", false, "print the tool and dataset versions")
	root.SetIn(s.In)
	root.SetOut(s.Out)
	root.SetErr(s.Err)
	root.SetFlagErrorFunc(func(c *cobra.Command, err error) error {
		return usageError(fmt.Errorf("%w (see '%s --help')", err, c.CommandPath()))
	})
	root.AddCommand(
		NewCheckCmd(s),
		NewInitCmd(s),
		NewDateCmd(s),
		NewMaterialsCmd(s),
		NewSurveyCmd(s),
		NewServeCmd(s),
	)
	ourArgs(root)
	// Flag descriptions wrap to a terminal's 80 columns.
	root.SetUsageTemplate(strings.ReplaceAll(root.UsageTemplate(), "FlagUsages", "FlagUsagesWrapped 80"))
	return root
}
