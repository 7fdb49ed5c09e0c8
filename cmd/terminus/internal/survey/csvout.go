package survey

import (
	"bufio"
	"bytes"
	"encoding/csv"
	"io"
	"strconv"
)

// CSVWriter writes one summary row per record, in input order, after a
// header: id, file, line, the free columns, then status, claims, event,
// hard_earliest, hard_latest, firm_earliest, firm_latest, soft_earliest,
// soft_latest, deciding, conflicts, error, hint.
type CSVWriter struct {
	w      *bufio.Writer
	free   []string
	header bool
}

// NewCSVWriter returns a writer to w; free names the free columns.
func NewCSVWriter(w io.Writer, free []string) *CSVWriter {
	return &CSVWriter{w: bufio.NewWriterSize(w, 256<<10), free: free}
}

// SummaryColumns are the columns the csv output adds after the free ones.
func SummaryColumns() []string {
	return []string{"status", "claims", "event", "hard_earliest", "hard_latest", "firm_earliest", "firm_latest",
		"soft_earliest", "soft_latest", "deciding", "conflicts", "error", "hint"}
}

func (c *CSVWriter) writeHeader() error {
	c.header = true
	cw := csv.NewWriter(c.w)
	row := append(append([]string{"id", "file", "line"}, c.free...), SummaryColumns()...)
	if err := cw.Write(row); err != nil {
		return err
	}
	cw.Flush()
	return cw.Error()
}

// Render makes the record's row.
func (c *CSVWriter) Render(o *Outcome) error {
	s := o.Summary
	row := make([]string, 0, 3+len(c.free)+13)
	row = append(row, o.ID, o.File, strconv.Itoa(o.Line))
	if o.Free != nil {
		row = append(row, o.Free...)
	} else {
		row = append(row, make([]string, len(c.free))...)
	}
	row = append(row, string(s.Status), s.Claims, s.Event)
	for _, w := range s.Windows {
		row = append(row, w[0], w[1])
	}
	row = append(row, s.Deciding, s.Conflicts, s.Err, s.Hint)
	var buf bytes.Buffer
	cw := csv.NewWriter(&buf)
	if err := cw.Write(row); err != nil {
		return err
	}
	cw.Flush()
	o.Out = buf.Bytes()
	return cw.Error()
}

// Write writes the row (and the header before the first).
func (c *CSVWriter) Write(o *Outcome) error {
	if !c.header {
		if err := c.writeHeader(); err != nil {
			return err
		}
	}
	_, err := c.w.Write(o.Out)
	return err
}

// Flush hands on the rows written so far.
func (c *CSVWriter) Flush() error { return c.w.Flush() }

// Close writes the header if no record came, and flushes.
func (c *CSVWriter) Close(Counts) error {
	if !c.header {
		if err := c.writeHeader(); err != nil {
			return err
		}
	}
	return c.w.Flush()
}
