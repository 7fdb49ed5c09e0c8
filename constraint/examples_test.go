package constraint_test

import (
	"os"
	"path/filepath"
	"testing"
)

// exampleFile is one of the project's examples: its path and its text.
type exampleFile struct {
	path string
	data []byte
}

// examples reads every example case file; it fails when there are none.
func examples(t *testing.T) []exampleFile {
	t.Helper()
	paths, _ := filepath.Glob("../examples/*/case.yaml")
	if len(paths) == 0 {
		t.Fatal("no examples found")
	}
	out := make([]exampleFile, len(paths))
	for i, p := range paths {
		data, err := os.ReadFile(p)
		if err != nil {
			t.Fatal(err)
		}
		out[i] = exampleFile{p, data}
	}
	return out
}
