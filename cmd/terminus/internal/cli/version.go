package cli

import "runtime/debug"

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

func versionString() string { return "terminus " + toolVersion() }
