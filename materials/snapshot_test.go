package materials

import (
	"bytes"
	"encoding/binary"
	"errors"
	"flag"
	"hash/crc32"
	"io/fs"
	"os"
	"reflect"
	"strings"
	"testing"
	"testing/fstest"
)

var update = flag.Bool("update", false, "make the built-in snapshot again from the YAML data files")

// snapshotFile is the snapshot's name in the package folder.
const snapshotFile = "builtin-snapshot.bin"

// encodeSnapshot writes d (a strict load of the files of data) in the
// layout decodeSnapshot reads.
func encodeSnapshot(d *Dataset, data fs.FS) ([]byte, error) {
	w := &snapWriter{at: map[string]int{}}
	w.uint(uint64(len(d.fileData)))
	for _, f := range d.fileData {
		b, err := fs.ReadFile(data, strings.TrimPrefix(f.name, builtinPrefix))
		if err != nil {
			return nil, err
		}
		w.str(f.name)
		w.uint(uint64(len(b)))
		w.uint(uint64(crc32.Checksum(b, snapshotTable)))
		w.rec = append(w.rec, f.sum[:]...)
	}
	w.list(d.Sources == nil, len(d.Sources))
	for _, s := range d.Sources {
		w.str(s.Key)
		w.str(s.Cite)
		w.str(s.URL)
		w.str(s.Type)
		w.str(s.File)
		w.int(int64(s.Line))
		w.int(int64(s.col))
	}
	w.list(d.Materials == nil, len(d.Materials))
	for _, m := range d.Materials {
		w.str(m.ID)
		w.strs(m.Names)
		w.strs(m.keys)
		w.str(m.Class)
		w.str(m.Origin)
		w.flag(m.ColourIndex != nil)
		if ci := m.ColourIndex; ci != nil {
			w.str(ci.Name)
			w.str(ci.Number)
		}
		w.str(m.CAS)
		w.str(m.Formula)
		w.str(m.Note)
		w.str(m.File)
		w.int(int64(m.Line))
		w.int(int64(m.col))
		w.strs(m.Markers)
		w.strs(m.Families)
		w.list(m.Milestones == nil, len(m.Milestones))
		for _, ms := range m.Milestones {
			w.str(string(ms.Kind))
			w.str(ms.Date.Input)
			w.str(ms.Place)
			w.str(ms.Source)
			w.str(string(ms.Basis))
			w.str(ms.Note)
			w.str(ms.Object)
			w.flag(ms.Allowance != nil)
			if a := ms.Allowance; a != nil {
				w.int(a.Years)
				w.int(a.Months)
				w.int(a.Weeks)
				w.int(a.Days)
			}
			w.str(ms.File)
			w.int(int64(ms.Line))
			w.int(int64(ms.Column))
			w.int(int64(ms.sourceLine))
			w.int(int64(ms.sourceCol))
		}
	}
	out := []byte(snapshotMagic)
	out = binary.AppendUvarint(out, snapshotFormat)
	out = binary.AppendUvarint(out, uint64(len(w.pool)))
	out = append(out, w.pool...)
	return append(out, w.rec...), nil
}

// snapWriter gathers the records and the pool of strings they point into;
// each distinct string is stored once.
type snapWriter struct {
	pool, rec []byte
	at        map[string]int
}

func (w *snapWriter) uint(v uint64) { w.rec = binary.AppendUvarint(w.rec, v) }
func (w *snapWriter) int(v int64)   { w.rec = binary.AppendVarint(w.rec, v) }

func (w *snapWriter) flag(b bool) {
	if b {
		w.uint(1)
	} else {
		w.uint(0)
	}
}

func (w *snapWriter) list(isNil bool, n int) {
	if isNil {
		w.uint(0)
		return
	}
	w.uint(uint64(n) + 1)
}

func (w *snapWriter) str(s string) {
	off, ok := w.at[s]
	if !ok {
		off = len(w.pool)
		w.pool = append(w.pool, s...)
		w.at[s] = off
	}
	w.uint(uint64(off))
	w.uint(uint64(len(s)))
}

func (w *snapWriter) strs(ss []string) {
	w.list(ss == nil, len(ss))
	for _, s := range ss {
		w.str(s)
	}
}

func embeddedData(t testing.TB) fs.FS {
	t.Helper()
	sub, err := fs.Sub(dataFS, "data")
	if err != nil {
		t.Fatal(err)
	}
	return sub
}

// TestBuiltinSnapshot holds the committed snapshot to a fresh strict load
// of the YAML data files: the bytes must be what the encoder writes now,
// and the dataset decoded from them must equal the YAML one in every field,
// the lookup index and the digest included. With -update it writes the
// snapshot again.
func TestBuiltinSnapshot(t *testing.T) {
	data := embeddedData(t)
	want, err := loadBuiltinYAML(data)
	if err != nil {
		t.Fatalf("the YAML data files do not load, so no snapshot can be made of them: %v", err)
	}
	enc, err := encodeSnapshot(want, data)
	if err != nil {
		t.Fatal(err)
	}
	if *update {
		if err := os.WriteFile(snapshotFile, enc, 0o644); err != nil {
			t.Fatal(err)
		}
		t.Logf("wrote %s (%d bytes); build again to embed it", snapshotFile, len(enc))
		return
	}
	const regen = "make it again with 'go generate ./materials/' (or 'go test ./materials/ -run TestBuiltinSnapshot -update') and commit " + snapshotFile
	if !bytes.Equal(enc, []byte(builtinSnapshot)) {
		t.Fatalf("%s is stale: it differs from a fresh strict load of materials/data/*.yaml "+
			"(until it is made again, the built-in dataset is read from the YAML files, slowly); %s", snapshotFile, regen)
	}
	got, err := decodeSnapshot(builtinSnapshot, data)
	if err != nil {
		t.Fatalf("decoding %s: %v; %s", snapshotFile, err, regen)
	}
	got.Version = DataVersion
	if !reflect.DeepEqual(got, want) {
		for i := range min(len(got.Materials), len(want.Materials)) {
			if !reflect.DeepEqual(got.Materials[i], want.Materials[i]) {
				t.Errorf("material %d: from the snapshot\n%+v\nfrom the YAML\n%+v", i, got.Materials[i], want.Materials[i])
				break
			}
		}
		t.Fatalf("the dataset decoded from %s differs from the YAML load (a bug in the snapshot code)", snapshotFile)
	}
	if b, err := Builtin(); err != nil || b.SHA256 != want.SHA256 || b.Version != DataVersion {
		t.Errorf("Builtin: digest and version %v, want %s %s", err, want.SHA256, DataVersion)
	}
}

// TestSnapshotStale changes one byte of one data file, keeping its size:
// the snapshot must see that it was made from other files.
func TestSnapshotStale(t *testing.T) {
	data := embeddedData(t)
	names, err := builtinFileNames(data)
	if err != nil || len(names) == 0 {
		t.Fatalf("data files: %v %v", names, err)
	}
	files := func() fstest.MapFS {
		m := fstest.MapFS{}
		for _, n := range names {
			b, err := fs.ReadFile(data, n)
			if err != nil {
				t.Fatal(err)
			}
			m[n] = &fstest.MapFile{Data: b}
		}
		return m
	}
	check := func(name string, fsys fs.FS) {
		t.Helper()
		if _, err := decodeSnapshot(builtinSnapshot, fsys); !errors.Is(err, errStaleSnapshot) {
			t.Errorf("%s: got %v, want the stale-snapshot error", name, err)
		}
	}
	if _, err := decodeSnapshot(builtinSnapshot, files()); err != nil {
		t.Fatalf("the unchanged files: %v", err)
	}
	// A date a century later, of the same length: the first "18.." date of
	// the last file becomes "19..".
	edited := files()
	last := edited[names[len(names)-1]]
	i := bytes.Index(last.Data, []byte(`date: "18`))
	if i < 0 {
		t.Fatal("no 19th-century date to edit")
	}
	last.Data[i+len(`date: "1`)] = '9'
	check("a date edited", edited)

	fewer := files()
	delete(fewer, names[0])
	check("a file removed", fewer)

	more := files()
	more["zz-more.yaml"] = &fstest.MapFile{Data: []byte("materials: []\n")}
	check("a file added", more)

	renamed := files()
	renamed["0-"+names[0]] = renamed[names[0]]
	delete(renamed, names[0])
	check("a file renamed", renamed)
}

// TestSnapshotDamaged cuts the snapshot short at many lengths and changes
// bytes through it: decoding must fail with an error or give a dataset,
// never panic, and a cut snapshot must never decode.
func TestSnapshotDamaged(t *testing.T) {
	data := embeddedData(t)
	snap := builtinSnapshot
	cuts := 400
	if testing.Short() {
		cuts = 40 // the race pass of CI: each decode costs ten times as much there
	}
	step := max(1, len(snap)/cuts)
	for n := 0; n < len(snap); n += step {
		if _, err := decodeSnapshot(snap[:n], data); err == nil {
			t.Fatalf("a snapshot cut to %d of %d bytes decoded", n, len(snap))
		}
	}
	b := []byte(snap)
	for i := len(snapshotMagic); i < len(b); i += step {
		old := b[i]
		for _, c := range []byte{0x00, 0x7f, 0x80, 0xff} {
			b[i] = c
			_, _ = decodeSnapshot(string(b), data) // must not panic
		}
		b[i] = old
	}
	if _, err := decodeSnapshot("not a snapshot", data); err == nil || errors.Is(err, errStaleSnapshot) {
		t.Errorf("text that is no snapshot: got %v", err)
	}
}

// FuzzSnapshot feeds damaged snapshots to the decoder: it must never
// panic.
func FuzzSnapshot(f *testing.F) {
	f.Add(builtinSnapshot[:min(len(builtinSnapshot), 4096)])
	f.Add(snapshotMagic + "\x01\x00\x00")
	data := embeddedData(f)
	f.Fuzz(func(t *testing.T, snap string) {
		_, _ = decodeSnapshot(snap, data)
	})
}

// BenchmarkBuiltinYAML is the strict YAML load of the built-in dataset,
// which the snapshot stands in for.
func BenchmarkBuiltinYAML(b *testing.B) {
	data := embeddedData(b)
	b.ReportAllocs()
	for b.Loop() {
		if _, err := loadBuiltinYAML(data); err != nil {
			b.Fatal(err)
		}
	}
}
