package cli

import (
	"fmt"

	"github.com/spf13/cobra"

	"terminus/materials"
)

// NewMaterialsCmd builds "terminus materials" and its subcommands.
func NewMaterialsCmd(s IO) *cobra.Command {
	var files []string
	cmd := &cobra.Command{
		Use:   "materials",
		Short: "List, show, lint and count the materials dataset",
		Long: `Work with the dataset of dated materials that terminus reasons from.

Every milestone of a material (made, sold, arrived, withdrawn) names its
source; 'show' prints each with its full citation. --materials FILE adds a
file of your own over the built-in set (an entry with the same id replaces
the built-in one); it may be given several times.`,
		Args: cobra.NoArgs,
		RunE: func(c *cobra.Command, _ []string) error { return c.Help() },
	}
	cmd.PersistentFlags().StringArrayVar(&files, "materials", nil, "a materials file (YAML or TOML) to add over the built-in dataset; repeatable")
	load := func() (*materials.Dataset, error) {
		ds, notes, err := datasetWith(files)
		if err != nil {
			return nil, usageError(err)
		}
		for _, n := range notes {
			fmt.Fprintf(s.Err, "terminus: note: %s\n", n)
		}
		return ds, nil
	}
	cmd.AddCommand(
		newMaterialsListCmd(s, load),
		newMaterialsShowCmd(s, load),
		newMaterialsSourcesCmd(s, load),
		newMaterialsLintCmd(s, &files),
		newMaterialsStatsCmd(s, load),
	)
	return cmd
}

// datasetLoader loads the dataset a materials command reads: the built-in
// one with any --materials files over it.
type datasetLoader func() (*materials.Dataset, error)
