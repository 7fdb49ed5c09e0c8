package cli

import (
	"fmt"
	"runtime/debug"

	"terminus/materials"
)

// version is set at link time with -ldflags "-X ...cli.version=v1.2.3".
var version = ""

func toolVersion() string {
	if version != "" {
		return version
	}
	if bi, ok := debug.ReadBuildInfo(); ok && bi.Main.Version != "" && bi.Main.Version != "(devel)" {
		return bi.Main.Version
	}
	return "devel"
}

// printVersion prints the tool's version and the built-in dataset's.
func printVersion(s IO) error {
	ds, err := materials.Builtin()
	if err != nil {
		return fmt.Errorf("the built-in dataset does not load: %w", err)
	}
	sha := ds.SHA256
	if len(sha) > 16 {
		sha = sha[:16]
	}
	_, err = fmt.Fprintf(s.Out, "terminus %s\ndataset %s (%d materials, sha256 %s)\n", toolVersion(), ds.Version, len(ds.Materials), sha)
	return err
}
