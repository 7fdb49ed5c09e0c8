package cli

import "github.com/spf13/cobra"

// NewDateCmd builds "terminus date" (placeholder until the date command is written).
func NewDateCmd(s IO) *cobra.Command {
	return &cobra.Command{Use: "date EXPR...", Short: "Show how date expressions are read"}
}
