package cli

import (
	"fmt"
	"io"
	"strings"

	"github.com/spf13/cobra"

	"terminus/constraint/wording"
	"terminus/materials"
)

func newMaterialsLintCmd(s IO, overlays *[]string) *cobra.Command {
	return &cobra.Command{
		Use:   "lint FILE...",
		Short: "Check materials files: schema, dates, sources, order of milestones",
		Long: `Check materials files as one set: the schema (unknown keys, bad dates,
unknown places, kinds and bases), every milestone citing a source that
exists (in the files, the built-in bibliography or a --materials file),
every source of the files cited, no name shared by two materials, and
milestones in a possible order (sold not before made, withdrawn not
before sold). Prints each problem with its file and line, then the counts
of documented and from-memory milestones. Exit status 1 when there are
problems.`,
		Example: `  terminus materials lint examples/own-materials.yaml
  terminus materials lint materials/data/*.yaml`,
		Args: cobra.MinimumNArgs(1),
		RunE: func(c *cobra.Command, args []string) error {
			// Sources the files cite may come from the built-in set and any
			// --materials files; if those do not load, the files stand alone.
			base, _, err := datasetWith(*overlays)
			if err != nil {
				base = nil
			}
			d, problems, err := materials.LintFiles(base, args...)
			if err != nil {
				return usageError(err)
			}
			var b strings.Builder
			for _, p := range problems {
				fmt.Fprintf(&b, "%s\n", p)
			}
			if d != nil {
				st := d.Stats()
				fmt.Fprintf(&b, "%d %s, %d %s, %d %s: %d documented, %d from memory\n",
					len(args), wording.Plural(len(args), "file", "files"),
					st.Materials, wording.Plural(st.Materials, "material", "materials"),
					st.Milestones, wording.Plural(st.Milestones, "milestone", "milestones"),
					st.Documented, st.FromMemory)
			}
			if len(problems) > 0 {
				fmt.Fprintf(&b, "%d %s\n", len(problems), wording.Plural(len(problems), "problem", "problems"))
			} else {
				b.WriteString("no problems\n")
			}
			if _, err := io.WriteString(s.Out, b.String()); err != nil {
				return err
			}
			if len(problems) > 0 {
				return &ExitError{Code: 1}
			}
			return nil
		},
	}
}
