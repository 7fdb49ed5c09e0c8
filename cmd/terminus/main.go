// Command terminus dates objects and documents from the materials found in
// them. Run "terminus --help" for the commands.
package main

import (
	"context"
	"os"
	"os/signal"

	"terminus/cmd/terminus/internal/cli"
)

func main() {
	ctx, stop := signal.NotifyContext(context.Background(), os.Interrupt)
	code := cli.Main(ctx, os.Args[1:], os.Stdin, os.Stdout, os.Stderr)
	stop()
	os.Exit(code)
}
