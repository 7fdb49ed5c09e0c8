package survey

import (
	"bufio"
	"io"
	"strconv"
	"sync"

	"terminus/cmd/terminus/internal/report"
)

// JSONLWriter writes one JSON object per record, in input order:
//
//	{"id": "inv-7", "file": "c.jsonl", "line": 7, "status": "improbable",
//	 "columns": {...}, "result": {...the check --format json document...}}
//	{"id": "line-8", "file": "c.jsonl", "line": 8, "status": "error",
//	 "error": "c.jsonl:8:31: finding finding-1: unknown material \"smalts\"",
//	 "hint": "did you mean 'smalt'?"}
//
// "columns" holds the free CSV columns (absent when there are none). The
// counts are not written: every line is a record.
type JSONLWriter struct {
	w    *bufio.Writer
	free []string
	// bufs holds the encoding buffers of records already written, for
	// Render to reuse (a record is a few kilobytes; a survey, millions).
	bufs sync.Pool
}

// NewJSONLWriter returns a writer to w; free names the free columns.
func NewJSONLWriter(w io.Writer, free []string) *JSONLWriter {
	return &JSONLWriter{w: bufio.NewWriterSize(w, 256<<10), free: free}
}

// Render encodes the record.
func (j *JSONLWriter) Render(o *Outcome) error {
	var b []byte
	if p, ok := j.bufs.Get().(*[]byte); ok {
		b = (*p)[:0]
	} else {
		b = make([]byte, 0, 8<<10)
	}
	b = append(b, `{"id":`...)
	b = report.AppendJSONString(b, o.ID)
	b = append(b, `,"file":`...)
	b = report.AppendJSONString(b, o.File)
	b = append(b, `,"line":`...)
	b = strconv.AppendInt(b, int64(o.Line), 10)
	b = append(b, `,"status":`...)
	b = report.AppendJSONString(b, string(o.Summary.Status))
	if len(j.free) > 0 && o.Free != nil {
		b = append(b, `,"columns":{`...)
		for i, name := range j.free {
			if i > 0 {
				b = append(b, ',')
			}
			b = report.AppendJSONString(b, name)
			b = append(b, ':')
			b = report.AppendJSONString(b, o.Free[i])
		}
		b = append(b, '}')
	}
	switch {
	case o.Err != nil:
		b = append(b, `,"error":`...)
		b = report.AppendJSONString(b, o.Summary.Err)
		if o.Summary.Hint != "" {
			b = append(b, `,"hint":`...)
			b = report.AppendJSONString(b, o.Summary.Hint)
		}
	case o.Result != nil:
		b = append(b, `,"result":`...)
		b = report.AppendJSONLine(b, o.Result)
	}
	b = append(b, "}\n"...)
	o.Out = b
	return nil
}

// Write writes the encoded record and keeps its buffer for reuse.
func (j *JSONLWriter) Write(o *Outcome) error {
	_, err := j.w.Write(o.Out)
	if cap(o.Out) <= 256<<10 { // an outsized record's buffer goes to the collector
		b := o.Out
		j.bufs.Put(&b)
	}
	o.Out = nil
	return err
}

// Flush hands on the records written so far.
func (j *JSONLWriter) Flush() error { return j.w.Flush() }

// Close flushes the output.
func (j *JSONLWriter) Close(Counts) error { return j.w.Flush() }
