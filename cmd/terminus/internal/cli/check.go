package cli

import (
	"fmt"
	"io"
	"strconv"
	"strings"

	"github.com/spf13/cobra"

	"terminus/cmd/terminus/internal/report"
	"terminus/constraint"
	"terminus/constraint/casefile"
	"terminus/constraint/input"
	"terminus/constraint/network"
	"terminus/materials"
)

// writerFor returns the report writer for a --format value; ld says
// what the linked-data export (jsonld) exports.
func writerFor(format string, ld report.LinkedArtOptions) (func(io.Writer, *constraint.Result) error, error) {
	switch format {
	case "text", "":
		return report.Text, nil
	case "md", "markdown":
		return report.Markdown, nil
	case "json":
		return report.JSON, nil
	case "html":
		return report.HTML, nil
	case "svg":
		return report.SVG, nil
	case "jsonld":
		return report.LinkedArt(ld), nil
	}
	return nil, fmt.Errorf("unknown --format %q: expected text, md, json, jsonld, html or svg", format)
}

// parseTier reads a --fail-on value.
func parseTier(s string) (network.Tier, error) {
	t, err := network.ParseTier(s)
	if err != nil {
		return 0, fmt.Errorf("unknown --fail-on %q: expected hard, firm or soft", s)
	}
	return t, nil
}

// parseSize reads a --max-input-size value: a number of bytes, or with KiB,
// MiB or GiB (K, M and G mean the same).
func parseSize(s string) (int64, error) {
	t := strings.TrimSpace(s)
	mult := int64(1)
	for _, u := range []struct {
		suffix string
		mult   int64
	}{{"GiB", 1 << 30}, {"MiB", 1 << 20}, {"KiB", 1 << 10}, {"G", 1 << 30}, {"M", 1 << 20}, {"K", 1 << 10}, {"B", 1}} {
		if rest, ok := strings.CutSuffix(t, u.suffix); ok {
			t, mult = strings.TrimSpace(rest), u.mult
			break
		}
	}
	n, err := strconv.ParseInt(t, 10, 64)
	if err != nil || n <= 0 || n > (1<<40)/mult {
		return 0, fmt.Errorf("--max-input-size %q: expected a size such as 16MiB, 512KiB or 100000", s)
	}
	return n * mult, nil
}

// readCase reads the case at path; "-" is standard input, in the format
// given (YAML when none is).
func readCase(s IO, path, format string, l input.Limits) (*constraint.Case, error) {
	if path == "-" {
		f, err := input.ParseFormat(format)
		if err != nil {
			return nil, err
		}
		return casefile.ReadFrom("(standard input)", s.In, f, l)
	}
	return casefile.Read(path, l)
}

// datasetWith is the built-in dataset with the user's files laid over it,
// and the notes that say which entries they replaced.
func datasetWith(files []string) (*materials.Dataset, []string, error) {
	ds, err := materials.Builtin()
	if err != nil {
		return nil, nil, fmt.Errorf("the built-in dataset does not load: %w", err)
	}
	return ds.Extend(files...)
}

// Fails reports whether a result should give exit status 1 when failing
// at tier failOn: a claim that is not consistent at that tier or a
// stronger one, or evidence that conflicts there.
func Fails(r *constraint.Result, failOn network.Tier) bool {
	for t := network.Hard; t <= failOn; t++ {
		if !r.Consistent[t] {
			return true
		}
	}
	worst := map[constraint.Verdict]network.Tier{
		constraint.Excluded: network.Hard, constraint.Undetermined: network.Hard,
		constraint.Improbable: network.Firm, constraint.Doubtful: network.Soft,
	}
	for _, c := range r.Claims {
		if t, bad := worst[c.Verdict]; bad && t <= failOn {
			return true
		}
	}
	return false
}

// NewCheckCmd builds "terminus check".
func NewCheckCmd(s IO) *cobra.Command {
	var (
		format       string
		matFiles     []string
		failOn       string
		maxConflicts int
		maxSize      string
		inFormat     string
		ldTier       string
		production   string
	)
	cmd := &cobra.Command{
		Use:   "check CASE...",
		Short: "Date an object from its case file: windows, verdicts, conflicts",
		Long: `Check reads a case file (YAML, JSON or TOML) describing an object's events,
the materials found in it, its documented dates and the dates claimed for it,
and prints for every event the earliest and latest plausible date at each
strength tier (hard, firm, soft) with the evidence behind every bound, the
verdict on each claim, and any conflicts with their cheapest correction.

CASE "-" reads the case from standard input (YAML unless --input-format
says otherwise). A case file may be at most 16 MiB and nest at most 64
levels (--max-input-size raises the size). Unless GOGC or GOMEMLIMIT is set,
check runs the garbage collector under a ` + strconv.Itoa(checkMemoryLimitMiB) + ` MiB soft limit, so that even
a case of 10,000 ordered events stays under 256 MiB in every format.

Exit status: 0 when the evidence agrees and every claim is consistent; 1 when
a claim is not consistent or the evidence conflicts at the --fail-on tier or a
stronger one; 2 for bad input.`,
		Example: `  terminus check examples/retouched-landscape/case.yaml
  terminus check --format md examples/dated-letter/case.yaml > dating-section.md
  terminus check --fail-on firm examples/oak-panel/case.yaml
  terminus check - < examples/print-series/case.yaml`,
		Args: func(cmd *cobra.Command, args []string) error {
			if len(args) == 0 {
				return usageError(&hintError{err: fmt.Errorf("check needs a case file"), hint: "terminus check CASE.yaml; 'terminus init case.yaml' writes a starter case"})
			}
			return nil
		},
		RunE: func(cmd *cobra.Command, args []string) error {
			ld := report.LinkedArtOptions{Production: production}
			var err error
			if ld.Tier, err = network.ParseTier(ldTier); err != nil {
				return usageError(fmt.Errorf("unknown --tier %q: expected hard, firm or soft", ldTier))
			}
			write, err := writerFor(format, ld)
			if err != nil {
				return usageError(err)
			}
			tier, err := parseTier(failOn)
			if err != nil {
				return usageError(err)
			}
			if maxConflicts < 1 {
				return usageError(fmt.Errorf("--max-conflicts %d: expected 1 or more", maxConflicts))
			}
			limits := input.Limits{}
			if maxSize != "" {
				if limits.MaxBytes, err = parseSize(maxSize); err != nil {
					return usageError(err)
				}
			}
			ds, dsNotes, err := datasetWith(matFiles)
			if err != nil {
				return usageError(err)
			}
			// Everything is computed before anything is written, so that bad
			// input leaves stdout empty.
			defer tuneGC(checkGCPercent, checkMemoryLimitMiB)()
			var out spool
			fail := false
			for i, path := range args {
				c, err := readCase(s, path, inFormat, limits)
				if err != nil {
					return usageError(err)
				}
				res, err := constraint.Analyze(cmd.Context(), c, ds, constraint.Options{MaxConflicts: maxConflicts})
				if err != nil {
					if _, ok := err.(*input.Error); ok {
						return usageError(err)
					}
					return &ExitError{Code: 2, Err: fmt.Errorf("%s: %w", path, err)}
				}
				res.Notes = append(append([]string{}, dsNotes...), res.Notes...)
				if i > 0 && format != "json" && format != "jsonld" {
					out.WriteString("\n")
				}
				if err := write(&out, res); err != nil {
					return err
				}
				fail = fail || Fails(res, tier)
			}
			if _, err := out.WriteTo(s.Out); err != nil {
				return err
			}
			if fail {
				return &ExitError{Code: 1}
			}
			return nil
		},
	}
	f := cmd.Flags()
	f.StringVarP(&format, "format", "f", "text", "output format: text, md, json, jsonld (Linked Art), html (a page with the timeline) or svg (the timeline alone)")
	f.StringVar(&ldTier, "tier", "hard", "with --format jsonld: the tier whose windows become the time-spans: hard, firm or soft")
	f.StringVar(&production, "production", "", "with --format jsonld: the event that is the object's production (default: making, else the first event)")
	f.StringArrayVar(&matFiles, "materials", nil, "a materials file (YAML or TOML) to add over the built-in dataset; repeatable")
	f.StringVar(&failOn, "fail-on", "soft", "exit 1 when a claim fails or the evidence conflicts at this tier or a stronger one: hard, firm or soft")
	f.IntVar(&maxConflicts, "max-conflicts", 10, "the most minimal conflicts to list per tier")
	f.StringVar(&maxSize, "max-input-size", "", "the largest case file to read (default 16MiB)")
	f.StringVar(&inFormat, "input-format", "yaml", "the format of a case read from standard input ('-'): yaml, toml or json")
	return cmd
}
