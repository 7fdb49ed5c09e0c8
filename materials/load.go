package materials

import (
	"crypto/sha256"
	"embed"
	"encoding/hex"
	"errors"
	"fmt"
	"io/fs"
	"path"
	"slices"
	"strings"
	"sync"

	"terminus/constraint/input"
	"terminus/materials/spell"
)

//go:embed data
var dataFS embed.FS

// builtinPrefix is how the embedded files are named in messages, so that a
// problem in the built-in data points at the file to fix.
const builtinPrefix = "materials/data/"

var builtin = sync.OnceValues(func() (*Dataset, error) {
	return loadBuiltin()
})

// loadBuiltin reads the built-in dataset from its snapshot when the
// snapshot was made from the embedded files, and strictly from the YAML
// files otherwise (see snapshot.go).
func loadBuiltin() (*Dataset, error) {
	sub, err := fs.Sub(dataFS, "data")
	if err != nil {
		return nil, fmt.Errorf("materials: embedded data: %w", err)
	}
	if d, err := decodeSnapshot(builtinSnapshot, sub); err == nil {
		d.Version = DataVersion
		return d, nil
	}
	return loadBuiltinYAML(sub)
}

// loadBuiltinYAML reads the built-in dataset strictly from its YAML files
// (sub is the embedded data folder).
func loadBuiltinYAML(sub fs.FS) (*Dataset, error) {
	d, err := loadFS(sub, builtinPrefix, nil)
	if err != nil {
		return nil, fmt.Errorf("built-in materials dataset: %w", err)
	}
	d.Version = DataVersion
	return d, nil
}

// Builtin returns the dataset embedded in the binary. It is parsed on the
// first call and shared after that: callers must not change it.
func Builtin() (*Dataset, error) { return builtin() }

// Load reads every *.yaml, *.yml and *.toml file at the root of fsys (files
// sorted by name) as one dataset: every source a milestone cites must be
// defined in one of them. Problems are an [ErrorList].
func Load(fsys fs.FS) (*Dataset, error) {
	d, err := loadFS(fsys, "", nil)
	if err != nil {
		return nil, err
	}
	d.Version = "local"
	return d, nil
}

// LoadFile reads one materials file as a dataset of its own: TOML when its
// name ends in .toml, YAML for .yaml, .yml and .json (JSON is YAML).
func LoadFile(name string) (*Dataset, error) {
	d, err := loadPaths([]string{name}, nil)
	if err != nil {
		return nil, err
	}
	d.Version = "local"
	return d, nil
}

// Extend reads a user's files over d: their milestones may cite d's
// sources, a material with the id of one of d's replaces it, and the notes
// say which were replaced. d is not changed.
func (d *Dataset) Extend(names ...string) (*Dataset, []string, error) {
	if len(names) == 0 {
		return d, nil, nil
	}
	user, err := loadPaths(names, d)
	if err != nil {
		return nil, nil, err
	}
	// A user's milestones out of order (a sale before the first making, a
	// withdrawal before the first sale) would make the reasoner bound on
	// data that contradicts itself: refuse them as the lint does. (A bound
	// later than an attestation is capped by the reasoner; the lint still
	// reports it.)
	var errs ErrorList
	for _, m := range user.Materials {
		for _, p := range user.lintSequence(m) {
			errs = append(errs, &Error{File: p.File, Line: p.Line, Column: p.Column, Msg: p.Msg,
				Suggestion: "put the milestones in a possible order ('terminus materials lint FILE' lists every problem)"})
		}
	}
	if len(errs) > 0 {
		errs.sort()
		return nil, nil, errs
	}
	out, notes := Overlay(d, user)
	return out, notes, nil
}

// Overlay lays user over base: a user material with the id of a base one
// replaces it (in its place), others are added after; user sources are
// added, and a user source with a base key replaces it. The notes say which
// ids and keys were replaced. Neither dataset is changed.
func Overlay(base, user *Dataset) (*Dataset, []string) {
	var notes []string
	out := &Dataset{Regions: base.Regions}
	if out.Regions == nil {
		out.Regions = user.Regions
	}
	byID := map[string]*Material{}
	for _, m := range user.Materials {
		byID[m.ID] = m
	}
	used := map[string]bool{}
	for _, m := range base.Materials {
		if u, ok := byID[m.ID]; ok {
			notes = append(notes, fmt.Sprintf("material %q from %s replaces the built-in entry", m.ID, u.File))
			out.Materials = append(out.Materials, u)
			used[m.ID] = true
			continue
		}
		out.Materials = append(out.Materials, m)
	}
	for _, m := range user.Materials {
		if !used[m.ID] {
			out.Materials = append(out.Materials, m)
		}
	}
	userKeys := map[string]Source{}
	for _, s := range user.Sources {
		userKeys[s.Key] = s
	}
	for _, s := range base.Sources {
		if u, ok := userKeys[s.Key]; ok {
			if u.Cite != s.Cite || u.URL != s.URL {
				notes = append(notes, fmt.Sprintf("source %q from %s replaces the built-in entry", s.Key, u.File))
			}
			continue
		}
		out.Sources = append(out.Sources, s)
	}
	out.Sources = append(out.Sources, user.Sources...)
	out.fileData = append(slices.Clone(base.fileData), user.fileData...)
	switch v := base.Version; {
	case v == "" || v == "local":
		out.Version = "local"
	case strings.HasSuffix(v, "+local"):
		out.Version = v
	default:
		out.Version = v + "+local"
	}
	out.finish()
	return out, notes
}

// fileDigest is one file read, for the dataset digest.
type fileDigest struct {
	name string
	sum  [32]byte
}

// finish builds the indexes, file list and digest of a dataset.
func (d *Dataset) finish() { d.finishWith(nil) }

// finishWith is finish with the map of folded names to materials already
// made (by the checks across files), or nil.
func (d *Dataset) finishWith(names map[string]*Material) {
	d.sources = make(map[string]int, len(d.Sources))
	for i, s := range d.Sources {
		d.sources[s.Key] = i
	}
	d.index = buildIndex(d.Materials, names)
	h := sha256.New()
	d.Files = d.Files[:0]
	for _, f := range d.fileData {
		h.Write([]byte(f.name))
		h.Write([]byte{0})
		h.Write(f.sum[:])
		d.Files = append(d.Files, f.name)
	}
	d.SHA256 = hex.EncodeToString(h.Sum(nil))
}

// rawFile is one file's text, ready to parse.
type rawFile struct {
	name   string // as shown in messages
	data   []byte
	format input.Format
}

// formatOf gives the format of a materials file by its name; ok is false
// for a name that is not one.
func formatOf(name string) (f input.Format, ok bool) {
	switch strings.ToLower(path.Ext(name)) {
	case ".yaml", ".yml":
		return input.YAML, true
	case ".json":
		return input.JSON, true
	case ".toml":
		return input.TOML, true
	}
	return 0, false
}

func loadFS(fsys fs.FS, prefix string, base *Dataset) (*Dataset, error) {
	entries, err := fs.ReadDir(fsys, ".")
	if err != nil {
		return nil, fmt.Errorf("materials: reading the dataset folder: %w", err)
	}
	var files []rawFile
	for _, e := range entries {
		if e.IsDir() {
			continue
		}
		format, ok := formatOf(e.Name())
		if !ok || format == input.JSON {
			continue
		}
		b, err := fs.ReadFile(fsys, e.Name())
		if err != nil {
			return nil, fmt.Errorf("materials: reading %s: %w", prefix+e.Name(), err)
		}
		files = append(files, rawFile{name: prefix + e.Name(), data: b, format: format})
	}
	return loadFiles(files, base)
}

func loadPaths(names []string, base *Dataset) (*Dataset, error) {
	var files []rawFile
	for _, n := range names {
		format, ok := formatOf(n)
		if !ok {
			return nil, &Error{File: n, Line: 1, Msg: "not a materials file: expected a name ending in .yaml, .yml, .json or .toml",
				Suggestion: "materials files are YAML or TOML; rename the file to show which"}
		}
		b, err := input.ReadFile(n, input.Limits{})
		if err != nil {
			// A file that cannot be read at all is no problem in a file:
			// the caller reports it as bad use.
			var ie *input.Error
			if errors.As(err, &ie) && ie.Err != nil {
				return nil, fmt.Errorf("%s: %w", n, ie.Err)
			}
			return nil, errors.New(err.Error())
		}
		files = append(files, rawFile{name: n, data: b, format: format})
	}
	return loadFiles(files, base)
}

// maxErrors bounds how many problems one load reports.
const maxErrors = 200

// loadFiles parses files and checks them together: source keys unique
// across them, every cited key defined (in them or in base), ids and names
// unique.
func loadFiles(files []rawFile, base *Dataset) (*Dataset, error) {
	regions, err := BuiltinRegions()
	if err != nil {
		return nil, fmt.Errorf("materials: region table: %w", err)
	}
	if base != nil && base.Regions != nil {
		regions = base.Regions
	}
	parsed := make([]*fileResult, len(files))
	if len(files) > 1 {
		var wg sync.WaitGroup
		for i, f := range files {
			wg.Go(func() { parsed[i] = parseFile(f, regions) })
		}
		wg.Wait()
	} else {
		for i, f := range files {
			parsed[i] = parseFile(f, regions)
		}
	}
	d := &Dataset{Regions: regions}
	var errs ErrorList
	for i, p := range parsed {
		errs = append(errs, p.errs...)
		d.Sources = append(d.Sources, p.sources...)
		d.Materials = append(d.Materials, p.materials...)
		d.fileData = append(d.fileData, fileDigest{name: files[i].name, sum: p.sum})
	}
	cross, names := crossCheck(d, base)
	errs = append(errs, cross...)
	if len(errs) > 0 {
		errs.sort()
		if len(errs) > maxErrors {
			errs = errs[:maxErrors]
		}
		return nil, errs
	}
	d.finishWith(names)
	return d, nil
}

// crossCheck finds the problems that span files: duplicate source keys,
// cited keys never defined, duplicate ids and names. It also returns the
// folded names it mapped to their materials, for the lookup index.
func crossCheck(d *Dataset, base *Dataset) (ErrorList, map[string]*Material) {
	var errs ErrorList
	keys := map[string]Source{}
	for _, s := range d.Sources {
		if prev, dup := keys[s.Key]; dup {
			errs = append(errs, &Error{File: s.File, Line: s.Line, Column: s.col,
				Msg:        fmt.Sprintf("source key %q is already defined at %s:%d", s.Key, prev.File, prev.Line),
				Suggestion: "source keys are unique across the dataset; cite the existing entry or give this one a new key"})
			continue
		}
		keys[s.Key] = s
	}
	known := func(k string) bool {
		if _, ok := keys[k]; ok {
			return true
		}
		if base != nil {
			_, ok := base.Source(k)
			return ok
		}
		return false
	}
	var all []string
	for k := range keys {
		all = append(all, k)
	}
	if base != nil {
		for _, s := range base.Sources {
			all = append(all, s.Key)
		}
	}
	ids := make(map[string]*Material, len(d.Materials))
	names := make(map[string]*Material, 8*len(d.Materials))
	for _, m := range d.Materials {
		if prev, dup := ids[m.ID]; dup {
			errs = append(errs, &Error{File: m.File, Line: m.Line, Column: m.col,
				Msg:        fmt.Sprintf("id %q is already used at %s:%d", m.ID, prev.File, prev.Line),
				Suggestion: "ids are unique; if this is another material, give it its own id"})
		} else {
			ids[m.ID] = m
		}
		for i, k := range m.foldedNames() {
			n := m.ID
			if i > 0 {
				n = m.Names[i-1]
			}
			if other, dup := names[k]; dup && other != m && other.ID != m.ID {
				errs = append(errs, &Error{File: m.File, Line: m.Line, Column: m.col,
					Msg:        fmt.Sprintf("name %q of %q is also a name of %q (%s:%d)", n, m.ID, other.ID, other.File, other.Line),
					Suggestion: "a name may belong to one material only; keep it on the one it describes best"})
				continue
			}
			names[k] = m
		}
		for i := range m.Milestones {
			ms := &m.Milestones[i]
			if ms.Source != "" && !known(ms.Source) {
				line, col := ms.Line, ms.Column
				if ms.sourceLine > 0 {
					line, col = ms.sourceLine, ms.sourceCol
				}
				e := &Error{File: ms.File, Line: line, Column: col,
					Msg: fmt.Sprintf("milestone of %q cites source %q, which is not in the bibliography", m.ID, ms.Source)}
				if s := spell.Nearest(ms.Source, all, 3); len(s) > 0 {
					e.Suggestion = "did you mean " + input.OrList(s) + "? (or add the source under 'sources:')"
				} else {
					e.Suggestion = "add it under 'sources:' with its full citation"
				}
				errs = append(errs, e)
			}
		}
	}
	errs = append(errs, checkGroups(d.Materials, names, base)...)
	if base != nil {
		for _, m := range d.Materials {
			for _, n := range append([]string{m.ID}, m.Names...) {
				other, err := base.Lookup(n)
				if err != nil || other.ID == m.ID {
					continue
				}
				if _, replaced := ids[other.ID]; replaced {
					continue
				}
				errs = append(errs, &Error{File: m.File, Line: m.Line, Column: m.col,
					Msg:        fmt.Sprintf("name %q of %q already names the built-in material %q", n, m.ID, other.ID),
					Suggestion: fmt.Sprintf("to replace the built-in entry, give yours the id %q", other.ID)})
			}
		}
	}
	return errs, names
}

// checkGroups finds marker and family names that are also the name of a
// material (here or in base), which would make a specific name read as
// several materials or a group read as one, and names written as a marker
// by one material and a family by another.
func checkGroups(ms []*Material, names map[string]*Material, base *Dataset) ErrorList {
	var errs ErrorList
	type first struct {
		m    *Material
		kind string
	}
	kinds := map[string]first{}
	for _, m := range ms {
		for _, gl := range [...]struct {
			kind  string
			names []string
		}{{"marker", m.Markers}, {"family", m.Families}} {
			for _, g := range gl.names {
				k := fold(g)
				if other, ok := names[k]; ok {
					errs = append(errs, &Error{File: m.File, Line: m.Line, Column: m.col,
						Msg:        fmt.Sprintf("%s %q of %q is also a name of the material %q (%s:%d)", gl.kind, g, m.ID, other.ID, other.File, other.Line),
						Suggestion: "a name that several materials answer to belongs in their markers or families, not in one material's names"})
				} else if base != nil && base.index != nil {
					if other, ok := base.index.names[k]; ok {
						errs = append(errs, &Error{File: m.File, Line: m.Line, Column: m.col,
							Msg:        fmt.Sprintf("%s %q of %q is a name of the built-in material %q", gl.kind, g, m.ID, other.ID),
							Suggestion: "choose another group name, or replace the built-in entry by giving yours its id"})
					}
				}
				if f, ok := kinds[k]; ok && f.kind != gl.kind {
					errs = append(errs, &Error{File: m.File, Line: m.Line, Column: m.col,
						Msg:        fmt.Sprintf("%q is a %s of %q but a %s of %q (%s:%d)", g, gl.kind, m.ID, f.kind, f.m.ID, f.m.File, f.m.Line),
						Suggestion: "list it the same way on every material: markers for compounds an analysis finds, families for trade names"})
				} else if !ok {
					kinds[k] = first{m, gl.kind}
				}
			}
		}
	}
	return errs
}

// errorsAsList returns err's problems as a list, whatever its shape.
func errorsAsList(err error) ErrorList {
	var l ErrorList
	if errors.As(err, &l) {
		return l
	}
	var e *Error
	if errors.As(err, &e) {
		return ErrorList{e}
	}
	return nil
}
