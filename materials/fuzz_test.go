package materials

import (
	"errors"
	"os"
	"path/filepath"
	"strings"
	"testing"

	"terminus/constraint/input"
)

// FuzzLoad feeds arbitrary text to the loader as YAML and as TOML. It must
// never panic, and every problem it reports must be an [*Error] that names
// the file and a line.
func FuzzLoad(f *testing.F) {
	for _, glob := range []string{"testdata/*.yaml", "testdata/*.toml", "testdata/bad/*"} {
		names, _ := filepath.Glob(glob)
		for _, n := range names {
			b, err := os.ReadFile(n)
			if err != nil {
				f.Fatal(err)
			}
			f.Add(string(b), strings.HasSuffix(n, ".toml"))
		}
	}
	f.Add("materials:\n  - &a {id: x}\n  - *a\n", false)
	f.Add("materials: [{id: x, milestones: [{kind: made, date: [1], allowance: {}}]}]", false)
	f.Add("[[materials]]\nid = 1\n[[materials.milestones]]\ndate = 1874-05-21\n", true)
	f.Fuzz(func(t *testing.T, text string, isTOML bool) {
		name := "fuzz.yaml"
		if isTOML {
			name = "fuzz.toml"
		}
		format := input.YAML
		if isTOML {
			format = input.TOML
		}
		d, err := loadFiles([]rawFile{{name: name, data: []byte(text), format: format}}, nil)
		if err == nil {
			if d == nil {
				t.Fatal("no dataset and no error")
			}
			// What loads must lint and look up without panicking.
			_ = Lint(d)
			_ = d.Stats()
			for _, m := range d.Materials {
				if _, err := d.Lookup(m.ID); err != nil {
					t.Errorf("loaded material %q does not resolve: %v", m.ID, err)
				}
			}
			return
		}
		var list ErrorList
		if !errors.As(err, &list) || len(list) == 0 {
			t.Fatalf("error %v (%T) is not a list of problems", err, err)
		}
		for _, e := range list {
			if e.File != name || e.Line < 1 {
				t.Errorf("problem without file and line: %q (file %q, line %d)", e.Error(), e.File, e.Line)
			}
		}
	})
}
