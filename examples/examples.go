// Package examples embeds the invented example cases of this folder, so
// that the binary can offer them (the local page starts from them) where
// the repository is not at hand.
package examples

import (
	"embed"
	"io/fs"
	"path"
	"slices"
)

//go:embed */case.*
var files embed.FS

// Case is one example: its folder's name, its case file's name and text.
type Case struct {
	Name, File string
	Data       []byte
}

// Cases lists the examples in the order of their names.
func Cases() ([]Case, error) {
	names, err := fs.Glob(files, "*/case.*")
	if err != nil {
		return nil, err
	}
	slices.Sort(names)
	out := make([]Case, 0, len(names))
	for _, n := range names {
		data, err := files.ReadFile(n)
		if err != nil {
			return nil, err
		}
		out = append(out, Case{Name: path.Dir(n), File: path.Base(n), Data: data})
	}
	return out, nil
}
