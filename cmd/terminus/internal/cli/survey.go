package cli

import (
	"errors"
	"fmt"
	"io"
	"os"
	"strconv"

	"github.com/spf13/cobra"

	"terminus/cmd/terminus/internal/survey"
	"terminus/constraint"
	"terminus/constraint/wording"
)

// surveyWriter returns the writer for a survey --format value, and a
// cleanup to defer.
func surveyWriter(format string, w io.Writer, free []string, info survey.ReportInfo) (survey.Writer, func(), error) {
	switch format {
	case "jsonl", "":
		return survey.NewJSONLWriter(w, free), func() {}, nil
	case "csv":
		return survey.NewCSVWriter(w, free), func() {}, nil
	case "md", "markdown":
		rw := survey.NewMarkdownWriter(w, info)
		return rw, rw.Cleanup, nil
	case "html":
		rw := survey.NewHTMLWriter(w, info)
		return rw, rw.Cleanup, nil
	}
	return nil, nil, fmt.Errorf("unknown --format %q: expected jsonl, csv, md or html", format)
}

// isTerminal reports whether w is a character device (a terminal).
func isTerminal(w io.Writer) bool {
	f, ok := w.(*os.File)
	if !ok {
		return false
	}
	st, err := f.Stat()
	return err == nil && st.Mode()&os.ModeCharDevice != 0
}

// NewSurveyCmd builds "terminus survey".
func NewSurveyCmd(s IO) *cobra.Command {
	var (
		format, input, failOn string
		matFiles              []string
		maxConflicts, jobs    int
		sensitivity, quiet    bool
		parseOnly             bool
	)
	cmd := &cobra.Command{
		Use:   "survey FILE...",
		Short: "Date a collection: one result for each CSV or JSON Lines record",
		Long: `Survey checks every record of one or more collection files, as check does
for one case, on every core, and writes one output record per input record in
input order. "-" reads standard input.

Input (--input, detected from the extension or the first character when not
given): JSON Lines, one case per line in the case file schema with an optional
"id"; or CSV with a header row and the columns id, title, place, claim,
materials (findings apart with ';', alternatives with '|', a final '?' for a
probable identification), not_before and not_after. Any other CSV column is
kept through to the output unchanged.

Output (--format): jsonl, one object per record with its id, file, line,
status and the check --format json result or the error; csv, one summary row
per record (windows per tier, verdicts, deciding evidence); md or html, a
summary report with the counts and the excluded and improbable records first.

A malformed record never stops the survey: it becomes an output record with
its line and the error. In CSV, a quoted field may span lines only when it
closes (its quote followed by a comma or the line's end) and the row then has
the header's number of fields; otherwise the line that opens the quote is an
error record and reading goes on at the next line. Every line read is
accounted for: the counts (lines read = header + blank + lines in records;
records = judged + errors) go to stderr (unless --quiet) and into md and
html reports. A progress line is drawn on stderr when it is a terminal.

The sensitivity check of check (re-solving under every other claim where
sources disagree) is off by default here: it multiplies the work by the number
of disagreements, and a collection is screened first, then its flagged records
checked one by one. --sensitivity turns it on. Memory stays bounded however
long the input; unless GOGC or GOMEMLIMIT is set, the survey runs the garbage
collector at a ` + strconv.Itoa(surveyGCPercent) + ` % target under a ` + strconv.Itoa(surveyMemoryLimitMiB) + ` MiB soft limit.

Exit status: 0 when every record was checked and all are consistent; 1 when a
claim is not consistent or the evidence conflicts at the --fail-on tier or a
stronger one in any record, or any record could not be read or checked (record
errors count toward exit 1); 2 for bad usage or an input that cannot be read.`,
		Example: `  terminus survey examples/collection.jsonl > results.jsonl
  terminus survey --format csv examples/collection.csv > flagged.csv
  terminus survey --format html --fail-on firm examples/collection.*sv > survey.html
  terminus survey --input csv - < examples/collection.csv`,
		Args: cobra.MinimumNArgs(1),
		RunE: func(cmd *cobra.Command, args []string) error {
			inFormat, err := survey.ParseFormat(input)
			if err != nil {
				return usageError(fmt.Errorf("--input: %w", err))
			}
			tier, err := parseTier(failOn)
			if err != nil {
				return usageError(err)
			}
			if _, _, err := surveyWriter(format, io.Discard, nil, survey.ReportInfo{}); err != nil {
				return usageError(err)
			}
			if jobs < 0 {
				return usageError(fmt.Errorf("--jobs %d: expected 0 (every core) or more", jobs))
			}
			ds, dsNotes, err := datasetWith(matFiles)
			if err != nil {
				return usageError(err)
			}
			stdin := 0
			for _, a := range args {
				if a == "-" {
					stdin++
				}
			}
			if stdin > 1 {
				return usageError(errors.New("standard input ('-') can be read only once"))
			}
			var inputs []*survey.Input
			closeAll := func() {
				for _, in := range inputs {
					in.Close()
				}
			}
			for _, a := range args {
				in, err := survey.Open(a, s.In, inFormat)
				if err != nil {
					closeAll()
					return usageError(err)
				}
				inputs = append(inputs, in)
			}
			info := survey.ReportInfo{DatasetVersion: ds.Version, DatasetSHA256: ds.SHA256, FailOn: tier.String(), ParseOnly: parseOnly}
			for _, in := range inputs {
				info.Inputs = append(info.Inputs, in.DisplayName())
			}
			w, cleanup, _ := surveyWriter(format, s.Out, survey.FreeColumns(inputs), info)
			defer cleanup()
			opt := survey.Options{
				Dataset:   ds,
				Analyze:   constraint.Options{MaxConflicts: maxConflicts, NoSensitivity: !sensitivity},
				Workers:   jobs,
				ParseOnly: parseOnly,
				Fails:     func(r *constraint.Result) bool { return Fails(r, tier) },
				Notes:     dsNotes,
			}
			if isTerminal(s.Err) {
				opt.Progress = s.Err
			}
			defer tuneGC(surveyGCPercent, surveyMemoryLimitMiB)()
			counts, err := survey.Run(cmd.Context(), inputs, w, opt)
			if err != nil {
				var ie *survey.InputError
				if errors.As(err, &ie) {
					return usageError(err)
				}
				return &ExitError{Code: 2, Err: fmt.Errorf("survey stopped after %d records: %w", counts.Records, err)}
			}
			if !quiet {
				fmt.Fprintf(s.Err, "terminus: survey: %s\n", counts)
				fmt.Fprintf(s.Err, "terminus: survey: %s\n", counts.Accounting())
				if n := counts.Errors(); n > 0 {
					fmt.Fprintf(s.Err, "terminus: survey: %d %s could not be checked; the output gives each with its line and the error\n", n, wording.Plural(n, "record", "records"))
				}
			}
			if counts.Failing > 0 {
				return &ExitError{Code: 1}
			}
			return nil
		},
	}
	f := cmd.Flags()
	f.StringVarP(&format, "format", "f", "jsonl", "output format: jsonl, csv, md or html")
	f.StringVar(&input, "input", "auto", "input format: jsonl, csv or auto (by extension, else by the first character)")
	f.StringArrayVar(&matFiles, "materials", nil, "a materials file (YAML or TOML) to add over the built-in dataset; repeatable")
	f.StringVar(&failOn, "fail-on", "soft", "exit 1 when a claim fails or the evidence conflicts at this tier or a stronger one: hard, firm or soft")
	f.IntVar(&maxConflicts, "max-conflicts", 10, "the most minimal conflicts to list per tier and record")
	f.IntVarP(&jobs, "jobs", "j", 0, "records checked at once (0: one per core)")
	f.BoolVar(&sensitivity, "sensitivity", false, "re-solve each record under the other claims of disagreeing sources, as check does (slower)")
	f.BoolVarP(&quiet, "quiet", "q", false, "do not print the counts on stderr")
	f.BoolVar(&parseOnly, "parse-only", false, "read and decode every record without checking it (to measure the input floor)")
	_ = f.MarkHidden("parse-only")
	return cmd
}
