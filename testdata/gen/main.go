// Command gen writes a synthetic collection for the survey command: N
// invented records built from the materials of the built-in dataset, as
// JSON Lines or CSV, with a share of malformed records of several kinds
// (broken JSON, a misspelt material, a bad date, an unknown key or place,
// invalid UTF-8, blank lines; in CSV also rows with a field too many or
// too few, unbalanced quotes, CRLF line ends). -tell says on stderr how
// many lines and malformed records it wrote, for the survey's accounting to
// be checked against. The same seed gives the same bytes.
//
//	go run ./testdata/gen -n 100000 -bad 0.02 -format jsonl -seed 1 > c.jsonl
//
// The claims are drawn around the first date of the materials found, so
// that every verdict turns up; the records and their dates are invented,
// only the materials are real.
package main

import (
	"bufio"
	"bytes"
	"encoding/csv"
	"encoding/json"
	"flag"
	"fmt"
	"math/rand/v2"
	"os"
	"strings"

	"terminus/constraint/date"
	"terminus/materials"
)

type material struct {
	names []string // names safe in every format
	first int64    // year of the earliest milestone
}

func main() {
	n := flag.Int("n", 1000, "number of records")
	bad := flag.Float64("bad", 0.02, "share of malformed records, 0 to 1")
	format := flag.String("format", "jsonl", "jsonl or csv")
	seed := flag.Uint64("seed", 1, "random seed")
	tell := flag.Bool("tell", false, "say on stderr how many lines, blank lines and malformed records were written")
	flag.Parse()
	if *format != "jsonl" && *format != "csv" {
		fmt.Fprintf(os.Stderr, "gen: -format %q: expected jsonl or csv\n", *format)
		os.Exit(2)
	}
	if *bad < 0 || *bad > 1 || *n < 0 {
		fmt.Fprintln(os.Stderr, "gen: -n must be 0 or more and -bad between 0 and 1")
		os.Exit(2)
	}
	ds, err := materials.Builtin()
	if err != nil {
		fmt.Fprintf(os.Stderr, "gen: the built-in dataset: %v\n", err)
		os.Exit(1)
	}
	mats := usable(ds)
	g := &gen{rng: rand.New(rand.NewPCG(*seed, *seed^0x9e3779b97f4a7c15)), mats: mats, bad: *bad}
	w := bufio.NewWriterSize(os.Stdout, 1<<20)
	var t tally
	if *format == "csv" {
		t, err = g.csv(w, *n)
	} else {
		t, err = g.jsonl(w, *n)
	}
	if err == nil {
		err = w.Flush()
	}
	if err != nil {
		fmt.Fprintf(os.Stderr, "gen: %v\n", err)
		os.Exit(1)
	}
	if *tell {
		header := 0
		if *format == "csv" {
			header = 1
		}
		fmt.Fprintf(os.Stderr, "gen: %d lines = %d header + %d blank + %d in records; %d records, %d malformed\n",
			t.lines, header, t.blank, t.lines-header-t.blank, *n, t.malformed)
	}
}

// usable keeps the materials with a dated milestone, and of their names
// those without the characters the CSV materials column uses.
func usable(ds *materials.Dataset) []material {
	var out []material
	for _, m := range ds.Materials {
		first, ok := int64(0), false
		for _, ms := range m.Milestones {
			if d, bounded := ms.Date.Earliest(); bounded && (!ok || d.Year() < first) {
				first, ok = d.Year(), true
			}
		}
		if !ok {
			continue
		}
		names := []string{m.ID}
		for _, nm := range m.Names {
			if !strings.ContainsAny(nm, ";|?,\"") {
				names = append(names, nm)
			}
		}
		out = append(out, material{names: names, first: first})
	}
	return out
}

type gen struct {
	rng  *rand.Rand
	mats []material
	bad  float64
}

var places = []string{"NL", "GB", "FR", "DE", "IT", "ES", "US", "JP", "CN", "IN", "EG", "150", ""}

type record struct {
	id, title, place, claim, notAfter string
	findings                          [][]string // alternatives per finding
	probable                          []bool
}

func (g *gen) record(i int) record {
	r := record{id: fmt.Sprintf("gen-%07d", i+1), title: fmt.Sprintf("Invented object %d", i+1), place: places[g.rng.IntN(len(places))]}
	nf := 1 + g.rng.IntN(4)
	latest := int64(-100000)
	for range nf {
		m := g.mats[g.rng.IntN(len(g.mats))]
		alts := []string{m.names[g.rng.IntN(len(m.names))]}
		first := m.first
		if g.rng.IntN(100) < 15 {
			o := g.mats[g.rng.IntN(len(g.mats))]
			alts = append(alts, o.names[g.rng.IntN(len(o.names))])
			first = min(first, o.first)
		}
		latest = max(latest, first)
		r.findings = append(r.findings, alts)
		r.probable = append(r.probable, g.rng.IntN(100) < 10)
	}
	// Claims lie around the newest material's date, never after 2025;
	// years are written as EDTF wants them (four digits, "0395", "-0564"),
	// so that only the records meant to be malformed are.
	year := min(latest+int64(g.rng.IntN(260))-120, 2025)
	switch g.rng.IntN(3) {
	case 0:
		r.claim = edtfYear(year)
	case 1:
		r.claim = edtfYear(year) + "/" + edtfYear(year+9)
	default:
		r.claim = "c. " + edtfYear(year)
	}
	if year < 1 {
		r.claim = edtfYear(year)
	}
	if g.rng.IntN(100) < 20 {
		r.notAfter = edtfYear(year + int64(g.rng.IntN(60)))
	}
	return r
}

// edtfYear writes a year as EDTF wants it: four digits at least ("0395",
// "-0564"), and a "Y" before a year of more than four.
func edtfYear(y int64) string {
	if y > 9999 || y < -9999 {
		return "Y" + date.FormatYear(y)
	}
	return date.FormatYear(y)
}

// misspell drops one letter of a name so that it no longer matches.
func (g *gen) misspell(s string) string {
	if len(s) < 3 {
		return s + "qx"
	}
	i := 1 + g.rng.IntN(len(s)-2)
	return s[:i] + "qx" + s[i+1:]
}

// jsonl writes the collection as JSON Lines. The malformed records are of
// seven kinds: a line cut in half, a misspelt material, a bad date, an
// unknown key, an unknown place, invalid UTF-8, and blank lines before a
// record (lines that belong to no record; the record itself is good).
func (g *gen) jsonl(w *bufio.Writer, n int) (tally, error) {
	var t tally
	type finding struct {
		Material   any    `json:"material"`
		Confidence string `json:"confidence,omitempty"`
	}
	type rec struct {
		ID       string            `json:"id"`
		Title    string            `json:"title"`
		Place    string            `json:"place,omitempty"`
		Findings []finding         `json:"findings"`
		Records  []map[string]any  `json:"records,omitempty"`
		Claims   []map[string]any  `json:"claims"`
		Extra    map[string]string `json:"claimz,omitempty"`
	}
	for i := range n {
		r := g.record(i)
		broken := g.rng.Float64() < g.bad
		kind := g.rng.IntN(7)
		if broken {
			t.malformed++
		}
		if broken && kind == 6 {
			t.malformed-- // the record itself is good
			w.WriteString("\n \t\n")
			t.lines += 2
			t.blank += 2
		}
		if broken && kind == 1 {
			r.findings[0][0] = g.misspell(r.findings[0][0])
		}
		if broken && kind == 2 {
			r.claim = "18x5"
		}
		if broken && kind == 4 {
			r.place = "XQ"
		}
		out := rec{ID: r.id, Title: r.title, Place: r.place, Claims: []map[string]any{{"date": r.claim}}}
		for j, alts := range r.findings {
			f := finding{Material: alts[0]}
			if len(alts) > 1 {
				f.Material = alts
			}
			if r.probable[j] {
				f.Confidence = "probable"
			}
			out.Findings = append(out.Findings, f)
		}
		if r.notAfter != "" {
			out.Records = []map[string]any{{"not_after": r.notAfter, "source": "invented inventory"}}
		}
		if broken && kind == 3 {
			out.Extra = map[string]string{"x": "y"}
		}
		b, err := json.Marshal(out)
		if err != nil {
			return t, err
		}
		if broken && kind == 0 {
			b = b[:len(b)/2]
		}
		if broken && kind == 5 {
			b = bytes.Replace(b, []byte("Invented object"), []byte("Invented \xff object"), 1)
		}
		w.Write(b)
		w.WriteByte('\n')
		t.lines++
	}
	return t, nil
}

// csv writes the collection as CSV. The malformed records are of eight
// kinds: a misspelt material, a bad date, an unknown place, a field too
// many, a field too few, an unbalanced quote (a title that opens a quote
// and never closes it), invalid UTF-8, and blank lines before a record
// (not malformed itself, but lines that belong to no record). Some good
// records have a title of two lines, quoted; some lines end in CRLF; the
// file starts with a byte-order mark when -bad is above 0. Every quoted
// field begins with a letter, so an unbalanced quote meets, at the next
// quote of the file, an opening quote followed by text: the survey reads
// it as an error record of its own line, and every other record as
// written.
func (g *gen) csv(w *bufio.Writer, n int) (tally, error) {
	var t tally
	if g.bad > 0 {
		w.WriteString("\xef\xbb\xbf")
	}
	var buf bytes.Buffer
	cw := csv.NewWriter(&buf)
	emit := func(row []string) error {
		buf.Reset()
		if err := cw.Write(row); err != nil {
			return err
		}
		cw.Flush()
		b := buf.Bytes()
		if g.bad > 0 && g.rng.IntN(10) == 0 {
			b = append(b[:len(b)-1], "\r\n"...)
		}
		w.Write(b)
		t.lines += bytes.Count(b, []byte("\n"))
		return cw.Error()
	}
	if err := emit([]string{"id", "title", "place", "claim", "materials", "not_before", "not_after", "inventory"}); err != nil {
		return t, err
	}
	for i := range n {
		r := g.record(i)
		broken := g.rng.Float64() < g.bad
		kind := g.rng.IntN(8)
		if broken {
			t.malformed++
		}
		switch {
		case broken && kind == 0:
			r.findings[0][0] = g.misspell(r.findings[0][0])
		case broken && kind == 1:
			r.claim = "18x5"
		case broken && kind == 2:
			r.place = "XQ"
		case broken && kind == 5:
			r.title = "\"" + r.title // written by hand below: csv would quote it
		case broken && kind == 6:
			r.title += " \xff\xfe"
		case broken && kind == 7:
			t.malformed-- // the record itself is good
			w.WriteString("\n \t\n")
			t.lines += 2
			t.blank += 2
		case !broken && g.rng.IntN(50) == 0:
			r.title += "\nsecond line of the title"
		}
		var fs []string
		for j, alts := range r.findings {
			s := strings.Join(alts, "|")
			if r.probable[j] {
				s += "?"
			}
			fs = append(fs, s)
		}
		row := []string{r.id, r.title, r.place, r.claim, strings.Join(fs, "; "), "", r.notAfter, fmt.Sprintf("INV %d", 1000+i)}
		switch {
		case broken && kind == 3:
			row = append(row, "a field too many")
		case broken && kind == 4:
			row = row[:5]
		case broken && kind == 5:
			w.WriteString(strings.Join(row, ",") + "\n")
			t.lines++
			continue
		}
		if err := emit(row); err != nil {
			return t, err
		}
	}
	return t, nil
}

// tally counts what a collection holds, for the survey's accounting to be
// checked against: the records are -n, one per input record.
type tally struct {
	lines, blank, malformed int
}
