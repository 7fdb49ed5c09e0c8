package cli

import (
	"errors"
	"fmt"
	"io/fs"
	"os"

	"github.com/spf13/cobra"
)

// starterCase is the commented case file that "terminus init" writes.
const starterCase = `# A terminus case file: what was found in one object and what is documented
# about it. Check it with:  terminus check THIS-FILE
# Dates are EDTF (1874, 1874-05, 1874-05-21, 1870/1879, 1870~ about, 1870? uncertain)
# or friendly forms (c. 1870, 1870s, before 1900, 1200 BCE); 'terminus date EXPR'
# shows how a date is read.

# id: INV-0000                           # the inventory or accession number; optional
title: Describe the object here          # free text
place: NL                                # where it was made: ISO 3166-1 code or UN M49 area; optional

# How far an approximate date (~, c.) is widened on each side; optional.
# circa: {year: P5Y, decade: P5Y}

# The moments in the object's history. Without this list there is one event,
# 'making'. 'after' orders events (hard by default); gaps are ISO 8601 durations.
events:
  - id: making
    label: original paint layers
  - id: retouch
    label: later retouching
    after: [{event: making, at_least: P1Y}]

# The materials identified, each assigned to the event (layer) it belongs to.
# confidence: certain (default) | probable (caps at firm) | possible (caps at soft)
findings:
  - id: f-blue
    material: Prussian blue               # an id or any known name; 'terminus materials list'
    event: making
    method: Raman
    sample: S1, sky, cross-section
  - id: f-green
    material: [emerald green, viridian]   # alternatives: one of these
    event: making
    confidence: probable
    method: XRF (Cu, As not resolved)
  - id: f-retouch
    material: titanium white (rutile)
    event: retouch
    method: Raman

# Documented dates: on, not_before, not_after or between; strength firm by default.
records:
  - id: r-inventory
    event: making
    not_after: 1905-03
    strength: firm
    source: estate inventory, item 14

# The dates claimed for the object, to be judged.
claims:
  - event: making
    date: 1840/1849
    by: label on the stretcher
`

// NewInitCmd builds "terminus init".
func NewInitCmd(s IO) *cobra.Command {
	var force bool
	cmd := &cobra.Command{
		Use:   "init [FILE]",
		Short: "Write a commented starter case file",
		Long:  "Init writes a commented starter case file to FILE, or to standard output\nwithout one. It does not overwrite a file unless --force is given.",
		Args:  cobra.MaximumNArgs(1),
		RunE: func(cmd *cobra.Command, args []string) error {
			if len(args) == 0 {
				_, err := fmt.Fprint(s.Out, starterCase)
				return err
			}
			flags := os.O_WRONLY | os.O_CREATE | os.O_EXCL
			if force {
				flags = os.O_WRONLY | os.O_CREATE | os.O_TRUNC
			}
			f, err := os.OpenFile(args[0], flags, 0o644)
			if errors.Is(err, fs.ErrExist) {
				return usageError(&hintError{err: fmt.Errorf("%s exists already", args[0]), hint: "choose another name, or add --force to overwrite it"})
			}
			if err != nil {
				return usageError(err)
			}
			if _, err := f.WriteString(starterCase); err != nil {
				f.Close()
				return err
			}
			if err := f.Close(); err != nil {
				return err
			}
			fmt.Fprintf(s.Err, "terminus: wrote %s; edit it, then run: terminus check %s\n", args[0], args[0])
			return nil
		},
	}
	cmd.Flags().BoolVar(&force, "force", false, "overwrite FILE if it exists")
	return cmd
}

// hintError is an error with a suggestion for the "hint:" line.
type hintError struct {
	err  error
	hint string
}

func (e *hintError) Error() string { return e.err.Error() }
func (e *hintError) Hint() string  { return e.hint }
func (e *hintError) Unwrap() error { return e.err }
