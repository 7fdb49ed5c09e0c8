// Command gen writes a synthetic collection for the survey command: N
// invented records built from the materials of the built-in dataset, as
// JSON Lines or CSV, with a share of malformed records of several kinds
// (broken JSON, a misspelt material, a bad date, an unknown key or place,
// a CSV row with a field too many). The same seed gives the same bytes.
//
//	go run ./testdata/gen -n 100000 -bad 0.02 -format jsonl -seed 1 > c.jsonl
//
// The claims are drawn around the first date of the materials found, so
// that every verdict turns up; the records and their dates are invented,
// only the materials are real.
package main

import (
	"bufio"
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
	if *format == "csv" {
		err = g.csv(w, *n)
	} else {
		err = g.jsonl(w, *n)
	}
	if err == nil {
		err = w.Flush()
	}
	if err != nil {
		fmt.Fprintf(os.Stderr, "gen: %v\n", err)
		os.Exit(1)
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
		r.claim = date.FormatYear(year)
	case 1:
		r.claim = date.FormatYear(year) + "/" + date.FormatYear(year+9)
	default:
		r.claim = "c. " + date.FormatYear(year)
	}
	if year < 1 {
		r.claim = date.FormatYear(year)
	}
	if g.rng.IntN(100) < 20 {
		r.notAfter = date.FormatYear(year + int64(g.rng.IntN(60)))
	}
	return r
}

// misspell drops one letter of a name so that it no longer matches.
func (g *gen) misspell(s string) string {
	if len(s) < 3 {
		return s + "qx"
	}
	i := 1 + g.rng.IntN(len(s)-2)
	return s[:i] + "qx" + s[i+1:]
}

func (g *gen) jsonl(w *bufio.Writer, n int) error {
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
		kind := g.rng.IntN(5)
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
			return err
		}
		if broken && kind == 0 {
			b = b[:len(b)/2]
		}
		w.Write(b)
		w.WriteByte('\n')
	}
	return nil
}

func (g *gen) csv(w *bufio.Writer, n int) error {
	cw := csv.NewWriter(w)
	if err := cw.Write([]string{"id", "title", "place", "claim", "materials", "not_before", "not_after", "inventory"}); err != nil {
		return err
	}
	for i := range n {
		r := g.record(i)
		broken := g.rng.Float64() < g.bad
		kind := g.rng.IntN(4)
		if broken && kind == 0 {
			r.findings[0][0] = g.misspell(r.findings[0][0])
		}
		if broken && kind == 1 {
			r.claim = "18x5"
		}
		if broken && kind == 2 {
			r.place = "XQ"
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
		if broken && kind == 3 {
			row = append(row, "a field too many")
		}
		if err := cw.Write(row); err != nil {
			return err
		}
	}
	cw.Flush()
	return cw.Error()
}
