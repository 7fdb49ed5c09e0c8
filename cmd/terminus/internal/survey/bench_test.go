package survey

import (
	"bytes"
	"context"
	"fmt"
	"io"
	"os"
	"path/filepath"
	"testing"

	"terminus/constraint"
	"terminus/materials"
)

// benchCollection makes n invented records of the shape the generator
// writes (one to three findings, a claim, sometimes a not_after record).
func benchCollection(n int, csv bool) []byte {
	names := []string{"lead white", "prussian blue", "vermilion", "chrome yellow", "madder", "smalt", "azurite", "indigo"}
	var b bytes.Buffer
	if csv {
		b.WriteString("id,title,place,claim,materials,not_before,not_after,inventory\n")
	}
	for i := range n {
		m1, m2 := names[i%len(names)], names[(i*7+3)%len(names)]
		year := 1600 + (i*37)%400
		if csv {
			fmt.Fprintf(&b, "b-%d,Object %d,NL,%d,%s; %s|%s?,,%d,INV %d\n", i, i, year, m1, m2, m1, year+30, i)
		} else {
			fmt.Fprintf(&b, `{"id": "b-%d", "title": "Object %d", "place": "NL", "findings": [{"material": %q}, {"material": [%q, %q], "confidence": "probable"}], "records": [{"not_after": "%d"}], "claims": [{"date": "%d"}]}`+"\n", i, i, m1, m2, m1, year+30, year)
		}
	}
	return b.Bytes()
}

func writeTemp(b testing.TB, name string, data []byte) string {
	p := filepath.Join(b.TempDir(), name)
	if err := os.WriteFile(p, data, 0o644); err != nil {
		b.Fatal(err)
	}
	return p
}

// BenchmarkSurvey runs whole surveys of 1000 records: read, parse, check
// (without the sensitivity re-solves, the survey's default) and write
// JSON Lines (or, in check-csv-out, the csv summary), against a
// parse-only pass over the same input (the floor).
func BenchmarkSurvey(b *testing.B) {
	ds, err := materials.Builtin()
	if err != nil {
		b.Fatal(err)
	}
	const n = 1000
	for _, format := range []Format{JSONL, CSV} {
		path := writeTemp(b, "c."+string(format), benchCollection(n, format == CSV))
		for _, mode := range []string{"check", "check-csv-out", "parse-only", "check+sensitivity"} {
			b.Run(fmt.Sprintf("%s/%s", format, mode), func(b *testing.B) {
				b.ReportAllocs()
				cpu0 := cpuTime()
				for b.Loop() {
					in, err := Open(path, nil, "")
					if err != nil {
						b.Fatal(err)
					}
					opt := Options{Dataset: ds, ParseOnly: mode == "parse-only", Analyze: constraint.Options{NoSensitivity: mode != "check+sensitivity"}}
					var w Writer = NewJSONLWriter(io.Discard, nil)
					if mode == "check-csv-out" {
						w = NewCSVWriter(io.Discard, in.Free)
					}
					c, err := Run(context.Background(), []*Input{in}, w, opt)
					if err != nil || c.Records != n || c.Errors() != 0 {
						b.Fatalf("%v %+v", err, c)
					}
				}
				b.ReportMetric(float64(b.Elapsed().Nanoseconds())/float64(b.N*n), "ns/record")
				if cpu := cpuTime() - cpu0; cpu > 0 {
					b.ReportMetric(float64(cpu.Nanoseconds())/float64(b.N*n), "cpu-ns/record")
				}
			})
		}
	}
}

// BenchmarkParse decodes one record, without the reasoner.
func BenchmarkParse(b *testing.B) {
	for _, format := range []Format{JSONL, CSV} {
		path := writeTemp(b, "c."+string(format), benchCollection(1, format == CSV))
		in, err := Open(path, nil, "")
		if err != nil {
			b.Fatal(err)
		}
		raw, err := in.next()
		if err != nil {
			b.Fatal(err)
		}
		b.Run(string(format), func(b *testing.B) {
			b.ReportAllocs()
			for b.Loop() {
				if _, err := parse(raw); err != nil {
					b.Fatal(err)
				}
			}
		})
	}
}

// BenchmarkReadCSV splits the records of a CSV collection of 10,000 rows,
// one in fifty with a quoted field over two lines, without parsing them:
// the reader's own cost.
func BenchmarkReadCSV(b *testing.B) {
	var text bytes.Buffer
	text.Write(benchCollection(10000, true))
	for i := range 200 {
		fmt.Fprintf(&text, "q-%d,\"Object\non two lines\",NL,1840,smalt,,,INV\n", i)
	}
	path := writeTemp(b, "c.csv", text.Bytes())
	b.SetBytes(int64(text.Len()))
	b.ReportAllocs()
	for b.Loop() {
		in, err := Open(path, nil, "")
		if err != nil {
			b.Fatal(err)
		}
		n := 0
		for {
			_, err := in.next()
			if err != nil {
				break
			}
			n++
		}
		in.Close()
		if n != 10200 {
			b.Fatalf("%d records", n)
		}
	}
}
