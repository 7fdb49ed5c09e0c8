package materials

import (
	_ "embed"
	"errors"
	"fmt"
	"hash/crc32"
	"io"
	"io/fs"
	"path"
	"strings"

	"terminus/constraint/date"
)

// The built-in dataset is read at start-up from a snapshot of its validated
// YAML files rather than from the files themselves: the strict YAML load
// costs several milliseconds, the snapshot a fraction of one. The YAML files
// stay the source of truth. The snapshot records the name, size and CRC-32C
// of each file it was made from; when the embedded files do not match them
// (a data file was edited and the snapshot not made again) the loader reads
// the YAML strictly instead, so a stale snapshot costs time, never
// correctness. TestBuiltinSnapshot fails when the snapshot is stale and
// says how to make it again:
//
//go:generate go test -run ^TestBuiltinSnapshot$ -update .

//go:embed builtin-snapshot.bin
var builtinSnapshot string

// snapshotMagic opens a snapshot; snapshotFormat is the version of the
// layout that follows, raised whenever the layout or the fields stored
// change.
const (
	snapshotMagic  = "terminus materials snapshot\n"
	snapshotFormat = 2
)

// errStaleSnapshot is a snapshot made from other files than those embedded.
var errStaleSnapshot = errors.New("the materials snapshot was made from other data files")

// snapshotTable is the CRC-32C table the snapshot's file checks use.
var snapshotTable = crc32.MakeTable(crc32.Castagnoli)

// decodeSnapshot reads a snapshot made by encodeSnapshot, checking first
// that the files of data (the embedded folder) are the ones it was made
// from. The dataset is finished (indexes, file list, digest) but has no
// version. A snapshot that is stale is errStaleSnapshot; one that is
// damaged is another error.
func decodeSnapshot(snap string, data fs.FS) (*Dataset, error) {
	rest, ok := strings.CutPrefix(snap, snapshotMagic)
	if !ok {
		return nil, errors.New("materials snapshot: not a snapshot")
	}
	r := &snapReader{s: rest}
	if v := r.uint(); v != snapshotFormat {
		return nil, fmt.Errorf("materials snapshot: layout %d, this build reads %d", v, snapshotFormat)
	}
	poolLen := r.count(1)
	if r.err != nil || poolLen > len(r.s)-r.pos {
		return nil, errors.New("materials snapshot: damaged string pool")
	}
	r.pool = r.s[r.pos : r.pos+poolLen]
	r.pos += poolLen

	d := &Dataset{}
	nFiles := r.count(4)
	d.fileData = make([]fileDigest, 0, nFiles)
	type check struct {
		size int
		crc  uint32
	}
	checks := make([]check, 0, nFiles)
	for range nFiles {
		f := fileDigest{name: r.str()}
		c := check{size: r.count(0), crc: uint32(r.uint())}
		copy(f.sum[:], r.bytes(len(f.sum)))
		d.fileData = append(d.fileData, f)
		checks = append(checks, c)
	}
	if r.err != nil {
		return nil, fmt.Errorf("materials snapshot: %w", r.err)
	}
	names, err := builtinFileNames(data)
	if err != nil {
		return nil, err
	}
	if len(names) != len(d.fileData) {
		return nil, errStaleSnapshot
	}
	buf := make([]byte, 32<<10)
	for i, n := range names {
		if builtinPrefix+n != d.fileData[i].name {
			return nil, errStaleSnapshot
		}
		size, crc, err := checksum(data, n, buf)
		if err != nil {
			return nil, err
		}
		if size != checks[i].size || crc != checks[i].crc {
			return nil, errStaleSnapshot
		}
	}

	regions, err := BuiltinRegions()
	if err != nil {
		return nil, fmt.Errorf("materials: region table: %w", err)
	}
	d.Regions = regions
	if n, ok := r.list(6); ok {
		d.Sources = make([]Source, n)
		for i := range d.Sources {
			s := &d.Sources[i]
			s.Key, s.Cite, s.URL, s.Type, s.File = r.str(), r.str(), r.str(), r.str(), r.str()
			s.Line, s.col = r.int(), r.int()
		}
	}
	if n, ok := r.list(12); ok {
		d.Materials = make([]*Material, n)
		block := make([]Material, n) // one allocation for them all
		// Milestones with the same date text share one parsed date: the
		// dataset is only read, and half of its dates are repeats.
		dates := make(map[string]*date.Date, 2*n)
		for i := range d.Materials {
			m := &block[i]
			if err := r.material(m, dates); err != nil {
				return nil, err
			}
			d.Materials[i] = m
		}
	}
	if r.err == nil && r.pos != len(r.s) {
		r.err = errors.New("trailing bytes")
	}
	if r.err != nil {
		return nil, fmt.Errorf("materials snapshot: %w", r.err)
	}
	d.finish()
	return d, nil
}

// builtinFileNames lists the data files of the embedded folder as the YAML
// loader reads them, sorted.
func builtinFileNames(data fs.FS) ([]string, error) {
	entries, err := fs.ReadDir(data, ".")
	if err != nil {
		return nil, fmt.Errorf("materials: reading the dataset folder: %w", err)
	}
	var names []string
	for _, e := range entries {
		if _, ok := formatOf(e.Name()); ok && !e.IsDir() && !strings.EqualFold(path.Ext(e.Name()), ".json") {
			names = append(names, e.Name())
		}
	}
	return names, nil
}

// checksum returns the size and CRC-32C of file name in fsys, read through
// buf.
func checksum(fsys fs.FS, name string, buf []byte) (int, uint32, error) {
	f, err := fsys.Open(name)
	if err != nil {
		return 0, 0, fmt.Errorf("materials: reading %s: %w", builtinPrefix+name, err)
	}
	defer f.Close()
	size, crc := 0, uint32(0)
	for {
		n, err := f.Read(buf)
		size += n
		crc = crc32.Update(crc, snapshotTable, buf[:n])
		if errors.Is(err, io.EOF) {
			return size, crc, nil
		}
		if err != nil {
			return 0, 0, fmt.Errorf("materials: reading %s: %w", builtinPrefix+name, err)
		}
	}
}

// material reads one material; dates holds the dates parsed so far, by
// their text.
func (r *snapReader) material(m *Material, dates map[string]*date.Date) error {
	m.ID = r.str()
	m.Names, m.keys = r.strs(), r.strs()
	m.Class, m.Origin = r.str(), r.str()
	if r.flag() {
		m.ColourIndex = &ColourIndex{Name: r.str(), Number: r.str()}
	}
	m.CAS, m.Formula, m.Note, m.File = r.str(), r.str(), r.str(), r.str()
	m.Line, m.col = r.int(), r.int()
	m.Markers, m.Families = r.strs(), r.strs()
	if n, ok := r.list(16); ok {
		m.Milestones = make([]Milestone, n)
		for i := range m.Milestones {
			ms := &m.Milestones[i]
			ms.Kind = Kind(r.str())
			text := r.str()
			ms.Place, ms.Source, ms.Basis, ms.Note, ms.Object = r.str(), r.str(), Basis(r.str()), r.str(), r.str()
			if r.flag() {
				ms.Allowance = &date.Duration{Years: r.int64(), Months: r.int64(), Weeks: r.int64(), Days: r.int64()}
			}
			ms.File = r.str()
			ms.Line, ms.Column, ms.sourceLine, ms.sourceCol = r.int(), r.int(), r.int(), r.int()
			if r.err != nil {
				return fmt.Errorf("materials snapshot: %w", r.err)
			}
			if dt, ok := dates[text]; ok {
				ms.Date = *dt
				continue
			}
			dt, err := date.Parse(text)
			if err != nil {
				return fmt.Errorf("materials snapshot: milestone of %q at %s:%d: %w", m.ID, ms.File, ms.Line, err)
			}
			ms.Date = dt
			dates[text] = &ms.Date
		}
	}
	return r.err
}

// snapReader reads the records of a snapshot: unsigned and zig-zag
// varints, and strings as an offset and length into the pool. The first
// problem sticks; after it every read gives zero.
type snapReader struct {
	s, pool string
	pos     int
	err     error
}

func (r *snapReader) fail(msg string) {
	if r.err == nil {
		r.err = fmt.Errorf("%s at byte %d", msg, len(snapshotMagic)+r.pos)
	}
}

func (r *snapReader) uint() uint64 {
	var v uint64
	for shift := uint(0); r.err == nil; shift += 7 {
		if r.pos >= len(r.s) {
			r.fail("unexpected end")
			break
		}
		if shift > 63 {
			r.fail("varint too long")
			break
		}
		c := r.s[r.pos]
		r.pos++
		v |= uint64(c&0x7f) << shift
		if c < 0x80 {
			return v
		}
	}
	return 0
}

func (r *snapReader) int64() int64 {
	u := r.uint()
	return int64(u>>1) ^ -int64(u&1)
}

func (r *snapReader) int() int {
	v := r.int64()
	if int64(int(v)) != v {
		r.fail("number out of range")
		return 0
	}
	return int(v)
}

// count reads a number of items that take at least min bytes each, so that
// a damaged count cannot ask for more than the snapshot holds.
func (r *snapReader) count(min int) int {
	u := r.uint()
	if u > uint64(len(r.s)) || min > 0 && int(u)*min > len(r.s)-r.pos {
		r.fail("count too large")
		return 0
	}
	return int(u)
}

// list reads the length of a list stored as n+1, 0 for a nil list; ok is
// false for nil.
func (r *snapReader) list(min int) (int, bool) {
	n := r.count(0)
	if n == 0 {
		return 0, false
	}
	if (n-1)*min > len(r.s)-r.pos {
		r.fail("count too large")
		return 0, false
	}
	return n - 1, r.err == nil
}

func (r *snapReader) flag() bool {
	switch r.uint() {
	case 0:
		return false
	case 1:
		return true
	}
	r.fail("bad flag")
	return false
}

func (r *snapReader) str() string {
	off, n := r.uint(), r.uint()
	if r.err != nil {
		return ""
	}
	if off > uint64(len(r.pool)) || n > uint64(len(r.pool))-off {
		r.fail("string out of the pool")
		return ""
	}
	return r.pool[off : off+n]
}

// strs reads a list of strings written as a list; nil for a nil list.
func (r *snapReader) strs() []string {
	n, ok := r.list(2)
	if !ok {
		return nil
	}
	out := make([]string, n)
	for i := range out {
		out[i] = r.str()
	}
	return out
}

func (r *snapReader) bytes(n int) string {
	if r.err != nil {
		return ""
	}
	if n > len(r.s)-r.pos {
		r.fail("unexpected end")
		return ""
	}
	b := r.s[r.pos : r.pos+n]
	r.pos += n
	return b
}
