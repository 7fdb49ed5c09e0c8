package cli

import "github.com/spf13/cobra"

// NewMaterialsCmd builds "terminus materials" (placeholder until written).
func NewMaterialsCmd(s IO) *cobra.Command {
	return &cobra.Command{Use: "materials", Short: "List, show and lint the materials dataset"}
}
