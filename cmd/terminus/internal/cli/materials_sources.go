package cli

import (
	"fmt"
	"io"
	"slices"
	"strings"

	"github.com/spf13/cobra"

	"terminus/constraint/wording"
	"terminus/materials"
)

func newMaterialsSourcesCmd(s IO, load datasetLoader) *cobra.Command {
	var format string
	cmd := &cobra.Command{
		Use:   "sources",
		Short: "List the bibliography: each source and how many milestones cite it",
		Args:  cobra.NoArgs,
		RunE: func(c *cobra.Command, _ []string) error {
			ds, err := load()
			if err != nil {
				return err
			}
			cited := map[string]int{}
			for _, m := range ds.Materials {
				for _, ms := range m.Milestones {
					cited[ms.Source]++
				}
			}
			srcs := slices.Clone(ds.Sources)
			slices.SortFunc(srcs, func(a, b materials.Source) int { return strings.Compare(a.Key, b.Key) })
			switch format {
			case "text", "":
				var b strings.Builder
				for _, src := range srcs {
					fmt.Fprintf(&b, "%s  (%d %s)\n    %s\n", src.Key, cited[src.Key], wording.Plural(cited[src.Key], "milestone", "milestones"), src.Cite)
					if src.URL != "" {
						fmt.Fprintf(&b, "    %s\n", src.URL)
					}
				}
				fmt.Fprintf(&b, "%d sources\n", len(srcs))
				_, err := io.WriteString(s.Out, b.String())
				return err
			case "json":
				type sourceJSON struct {
					Key   string  `json:"key"`
					Cite  string  `json:"cite"`
					URL   *string `json:"url"`
					Cited int     `json:"cited"`
				}
				out := make([]sourceJSON, 0, len(srcs))
				for _, src := range srcs {
					out = append(out, sourceJSON{src.Key, src.Cite, optional(src.URL), cited[src.Key]})
				}
				return writeJSON(s.Out, out)
			}
			return usageError(fmt.Errorf("unknown --format %q: expected text or json", format))
		},
	}
	cmd.Flags().StringVarP(&format, "format", "f", "text", "output format: text or json")
	return cmd
}
