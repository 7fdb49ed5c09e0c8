package materials

import (
	"fmt"
	"io/fs"
	"os"
	"path/filepath"
	"strings"
	"testing"

	"gopkg.in/yaml.v3"
)

// decodeYAML reads text with the general decoder, as the loader does when
// the quick reader gives up.
func decodeYAML(text string) (*node, error) {
	var doc yaml.Node
	if err := yaml.Unmarshal([]byte(text), &doc); err != nil {
		return nil, err
	}
	root := &doc
	if doc.Kind == yaml.DocumentNode && len(doc.Content) == 1 {
		root = doc.Content[0]
	}
	return fromYAML(root, map[*yaml.Node]*node{}), nil
}

// sameTree compares what the schema check reads of two trees: kinds,
// values, quoting, positions, and whether a scalar is null or an integer.
func sameTree(a, b *node, path string) error {
	if a.kind != b.kind || a.line != b.line || a.col != b.col {
		return fmt.Errorf("%s: kind/line/column %v %d:%d, decoder %v %d:%d", path, a.kind, a.line, a.col, b.kind, b.line, b.col)
	}
	if a.kind == scalarNode {
		if a.value != b.value {
			return fmt.Errorf("%s: value %q, decoder %q", path, a.value, b.value)
		}
		if a.null != b.null || a.integer != b.integer || a.quoted != b.quoted {
			return fmt.Errorf("%s: null/integer/quoted %v/%v/%v, decoder %v/%v/%v (value %q)",
				path, a.null, a.integer, a.quoted, b.null, b.integer, b.quoted, a.value)
		}
	}
	if len(a.content) != len(b.content) {
		return fmt.Errorf("%s: %d children, decoder %d", path, len(a.content), len(b.content))
	}
	for i := range a.content {
		if err := sameTree(a.content[i], b.content[i], fmt.Sprintf("%s/%d", path, i)); err != nil {
			return err
		}
	}
	return nil
}

func checkFastAgrees(t *testing.T, name, text string) bool {
	t.Helper()
	fast, ok := fastYAML([]byte(text))
	if !ok {
		return false
	}
	slow, err := decodeYAML(text)
	if err != nil {
		t.Fatalf("%s: the quick reader accepted what the decoder rejects (%v):\n%s", name, err, text)
	}
	if err := sameTree(fast, slow, name); err != nil {
		t.Fatalf("the quick reader disagrees with the decoder: %v\n%s", err, text)
	}
	return true
}

// TestFastYAMLAgrees runs the quick reader over every YAML file the project
// has, the dataset included, and wants the decoder's tree from each file it
// accepts; the dataset files must all be accepted, or loading is slow.
func TestFastYAMLAgrees(t *testing.T) {
	err := fs.WalkDir(os.DirFS("."), ".", func(path string, d fs.DirEntry, err error) error {
		if err != nil || d.IsDir() || !strings.HasSuffix(path, ".yaml") {
			return err
		}
		b, err := os.ReadFile(path)
		if err != nil {
			return err
		}
		accepted := checkFastAgrees(t, path, string(b))
		if strings.HasPrefix(path, "data"+string(filepath.Separator)) && !accepted {
			t.Errorf("%s: the quick reader gives up on a dataset file", path)
		}
		return nil
	})
	if err != nil {
		t.Fatal(err)
	}
	for _, text := range []string{
		"a: b\n",
		"a:\n  - x\n  - y\n",
		"a:\n- x\n- {k: v, n: \"77510\"}\nb: c # note\n",
		"materials:\n  - id: x\n    names: [a, b's, \"c\", 'd''e']\n    note: a plain: no\n",
		"a: \"\\u00e9t\\u00e9 \\\"q\\\"\"\n",
		"a: [1, -2, ~, null, '']\n",
		"a: {b: [c, {d: e}]}\n",
		"a: b:c\nd: 58000:1\n",
		"ä: ü ß\n",
		"a: -1044/-0770\n",
	} {
		if !checkFastAgrees(t, "inline", text) && strings.Count(text, "\n") < 3 {
			t.Logf("quick reader gives up on %q", text)
		}
	}
}

// FuzzFastYAML holds the quick reader to the decoder: whatever it accepts,
// the decoder reads to the same tree.
func FuzzFastYAML(f *testing.F) {
	names, _ := filepath.Glob("testdata/*.yaml")
	bad, _ := filepath.Glob("testdata/bad/*.yaml")
	for _, n := range append(names, bad...) {
		b, err := os.ReadFile(n)
		if err != nil {
			f.Fatal(err)
		}
		f.Add(string(b))
	}
	f.Add("a: [b, {c: d}]\n")
	f.Add("- a\n- b: c\n  d: e\n")
	f.Fuzz(func(t *testing.T, text string) {
		checkFastAgrees(t, "fuzz", text)
	})
}

// BenchmarkYAMLTree compares the quick reader with the general decoder on
// the embedded dataset files.
func BenchmarkYAMLTree(b *testing.B) {
	var files [][]byte
	entries, err := fs.ReadDir(dataFS, "data")
	if err != nil {
		b.Fatal(err)
	}
	size := 0
	for _, e := range entries {
		data, err := fs.ReadFile(dataFS, "data/"+e.Name())
		if err != nil {
			b.Fatal(err)
		}
		files = append(files, data)
		size += len(data)
	}
	b.Run("quick", func(b *testing.B) {
		b.ReportAllocs()
		b.SetBytes(int64(size))
		for b.Loop() {
			for _, f := range files {
				if _, ok := fastYAML(f); !ok {
					b.Fatal("quick reader gave up")
				}
			}
		}
	})
	b.Run("decoder", func(b *testing.B) {
		b.ReportAllocs()
		b.SetBytes(int64(size))
		for b.Loop() {
			for _, f := range files {
				if _, err := decodeYAML(string(f)); err != nil {
					b.Fatal(err)
				}
			}
		}
	})
}
