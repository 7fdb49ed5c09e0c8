package survey

import (
	"context"
	"errors"
	"fmt"
	"io"
	"runtime"
	"sync"
	"sync/atomic"
	"time"

	"terminus/constraint"
	"terminus/constraint/input"
	"terminus/materials"
)

// Outcome is what the survey made of one input record.
type Outcome struct {
	// File and Line say where the record starts; ID is its id column or
	// field, "line-N" when it has none.
	File string
	Line int
	ID   string
	// Lines is the number of physical lines the record takes: one, or
	// more for a CSV record with a quoted field that spans lines.
	Lines int
	// Free holds the values of the free CSV columns, in the order of
	// [FreeColumns]; empty cells for a record of a file without them.
	Free []string
	// Result is the reasoner's result; nil for an error and in a
	// parse-only pass. Writers may read it only in Render.
	Result  *constraint.Result
	Err     error
	Summary Summary
	// Out is what Render made of the outcome, for Write.
	Out []byte

	seq      int
	canceled bool
}

// A Writer turns outcomes into output. Render is called from many workers
// at once, each with its own outcome, and does the costly part (encoding);
// Write is called once per record, in input order, from one goroutine;
// Close once at the end with the totals. A writer that streams may also
// have a Flush() error method, which Run calls when the survey stops
// early (canceled, or an input failed), so that the records written so far
// reach the output.
type Writer interface {
	Render(o *Outcome) error
	Write(o *Outcome) error
	Close(c Counts) error
}

// Options tune a survey.
type Options struct {
	Dataset *materials.Dataset
	Analyze constraint.Options
	// Workers is the number of records checked at once; 0 uses
	// runtime.GOMAXPROCS.
	Workers int
	// Window is the most records in flight (read but not yet written),
	// which bounds the memory; 0 uses 32 per worker, at least 64.
	Window int
	// ParseOnly reads and decodes every record without checking it: the
	// floor a survey cannot go below.
	ParseOnly bool
	// Fails says whether a result counts toward exit status 1; nil: a
	// claim that is not consistent or a tier in conflict.
	Fails func(*constraint.Result) bool
	// Notes are put before every result's notes (which user materials
	// replaced built-in ones).
	Notes []string
	// Progress, when not nil, receives a progress line about four times a
	// second and a cleared line at the end.
	Progress io.Writer
}

// FreeColumns returns the free CSV columns of all inputs, each once, in
// the order they first appear.
func FreeColumns(inputs []*Input) []string {
	var out []string
	seen := map[string]bool{}
	for _, in := range inputs {
		for _, f := range in.Free {
			if !seen[f] {
				seen[f] = true
				out = append(out, f)
			}
		}
	}
	return out
}

func defaultFails(r *constraint.Result) bool {
	for _, ok := range r.Consistent {
		if !ok {
			return true
		}
	}
	for _, c := range r.Claims {
		if c.Verdict != constraint.Consistent {
			return true
		}
	}
	return false
}

type job struct {
	seq int
	raw rawRecord
}

// Run checks every record of the inputs, in parallel, and hands the
// outcomes to w in input order. A record that cannot be read or checked
// is an outcome with an error; it never stops the survey. Run stops early
// only when ctx is done, when w fails, or when an input cannot be read
// further; it closes the inputs.
func Run(ctx context.Context, inputs []*Input, w Writer, opt Options) (Counts, error) {
	defer func() {
		for _, in := range inputs {
			in.Close()
		}
	}()
	if opt.Dataset == nil && !opt.ParseOnly {
		return Counts{}, errors.New("survey: no materials dataset")
	}
	workers := opt.Workers
	if workers <= 0 {
		workers = runtime.GOMAXPROCS(0)
	}
	window := opt.Window
	if window <= 0 {
		window = max(64, 32*workers)
	}
	fails := opt.Fails
	if fails == nil {
		fails = defaultFails
	}
	if opt.Analyze.Memo == nil && opt.Dataset != nil {
		// The records of a collection share their materials: work out each
		// material's bounds at a place once for the whole survey.
		opt.Analyze.Memo = constraint.NewMemo(opt.Dataset)
	}
	free := FreeColumns(inputs)
	column := make(map[string]int, len(free))
	for i, f := range free {
		column[f] = i
	}
	freeIdx := map[*Input][]int{}
	for _, in := range inputs {
		idx := make([]int, len(in.Free))
		for i, f := range in.Free {
			idx[i] = column[f]
		}
		freeIdx[in] = idx
	}

	ctx, cancel := context.WithCancel(ctx)
	defer cancel()
	slots := make(chan struct{}, window)
	jobs := make(chan job, workers)
	results := make(chan *Outcome, workers)
	var readErr error
	var done atomic.Int64

	go func() { // the reader: one record after another, in order
		defer close(jobs)
		seq := 0
		for _, in := range inputs {
			for {
				raw, err := in.next()
				if errors.Is(err, io.EOF) {
					break
				}
				if err != nil {
					readErr = err
					cancel()
					return
				}
				select {
				case slots <- struct{}{}:
				case <-ctx.Done():
					return
				}
				jobs <- job{seq: seq, raw: raw}
				seq++
			}
		}
	}()

	var wg sync.WaitGroup
	var renderErr error
	var renderOnce sync.Once
	for range workers {
		wg.Go(func() {
			for j := range jobs {
				o := check(ctx, j, opt, fails, freeIdx[j.raw.in], len(free))
				if !o.canceled {
					if err := w.Render(o); err != nil {
						renderOnce.Do(func() { renderErr = err; cancel() })
						o.canceled = true
					}
				}
				o.Result = nil
				results <- o
			}
		})
	}
	go func() { wg.Wait(); close(results) }()

	stopProgress := startProgress(opt.Progress, inputs, &done)
	defer stopProgress()

	var counts Counts
	counts.ByStatus = map[Status]int{}
	ring := make([]*Outcome, window)
	next := 0
	var writeErr error
	stopped := false
	for o := range results {
		ring[o.seq%window] = o
		for {
			cur := ring[next%window]
			if cur == nil || cur.seq != next {
				break
			}
			ring[next%window] = nil
			next++
			if stopped || cur.canceled {
				stopped = true
				<-slots
				continue
			}
			err := w.Write(cur)
			<-slots // only now is the record out of flight
			if err != nil {
				writeErr = err
				stopped = true
				cancel()
				continue
			}
			counts.add(cur.Summary)
			counts.RecordLines += cur.Lines
			done.Add(1)
		}
	}
	stopProgress()
	if writeErr != nil || renderErr != nil || readErr != nil || ctx.Err() != nil {
		// Stopped early: the records written so far are whole; let a
		// streaming writer hand them on.
		if f, ok := w.(interface{ Flush() error }); ok && writeErr == nil {
			_ = f.Flush()
		}
	}
	switch {
	case writeErr != nil:
		return counts, writeErr
	case renderErr != nil:
		return counts, renderErr
	case readErr != nil:
		return counts, readErr
	}
	if err := ctx.Err(); err != nil {
		return counts, err // the caller's context is done
	}
	for _, in := range inputs { // the reader is done: its counts are final
		counts.Lines += in.lines
		counts.HeaderLines += in.header
		counts.BlankLines += in.blank
	}
	return counts, w.Close(counts)
}

// check parses and analyses one record.
func check(ctx context.Context, j job, opt Options, fails func(*constraint.Result) bool, freeIdx []int, nfree int) *Outcome {
	raw := j.raw
	o := &Outcome{seq: j.seq, File: raw.in.DisplayName(), Line: raw.line, Lines: raw.lines}
	if ctx.Err() != nil {
		o.canceled = true
		return o
	}
	p, err := parse(raw)
	o.ID = p.id
	if nfree > 0 {
		o.Free = make([]string, nfree)
		for i, v := range p.free {
			o.Free[freeIdx[i]] = v
		}
	}
	if err == nil && opt.ParseOnly {
		o.Summary = Summary{Status: StatusParsed}
		return o
	}
	var res *constraint.Result
	if err == nil {
		res, err = constraint.Analyze(ctx, p.c, opt.Dataset, opt.Analyze)
		if err != nil && ctx.Err() != nil {
			o.canceled = true
			return o
		}
		if err != nil && raw.in.Format == JSONL {
			err = onLine(err, o.File, o.Line)
		}
	}
	if err != nil {
		var ce *input.Error
		if !errors.As(err, &ce) {
			err = fmt.Errorf("%s:%d: %w", o.File, o.Line, err)
		}
		o.Err = err
		o.Summary = errorSummary(err)
		return o
	}
	if len(opt.Notes) > 0 {
		res.Notes = append(append([]string{}, opt.Notes...), res.Notes...)
	}
	o.Result = res
	o.Summary = summarize(res, fails(res))
	return o
}

// startProgress draws "12 034 records · 41 % · 2 100/s" on w until the
// returned function is called (which clears the line); w nil does
// nothing.
func startProgress(w io.Writer, inputs []*Input, done *atomic.Int64) func() {
	if w == nil {
		return func() {}
	}
	var total int64
	for _, in := range inputs {
		if in.Size < 0 {
			total = -1
			break
		}
		total += in.Size
	}
	start := time.Now()
	stop := make(chan struct{})
	finished := make(chan struct{})
	go func() {
		defer close(finished)
		t := time.NewTicker(250 * time.Millisecond)
		defer t.Stop()
		for {
			select {
			case <-stop:
				fmt.Fprint(w, "\r\x1b[K")
				return
			case <-t.C:
				n := done.Load()
				rate := float64(n) / time.Since(start).Seconds()
				line := fmt.Sprintf("\r\x1b[Ksurvey: %d records", n)
				if total > 0 {
					var read int64
					for _, in := range inputs {
						read += in.read.Load()
					}
					frac := float64(read) / float64(total)
					const width = 24
					filled := min(width, int(frac*width))
					bar := make([]byte, width)
					for i := range bar {
						bar[i] = '.'
						if i < filled {
							bar[i] = '#'
						}
					}
					line += fmt.Sprintf(" [%s] %3.0f%%", bar, 100*frac)
				}
				line += fmt.Sprintf(" %.0f/s", rate)
				fmt.Fprint(w, line)
			}
		}
	}()
	var once sync.Once
	return func() {
		once.Do(func() { close(stop); <-finished })
	}
}
