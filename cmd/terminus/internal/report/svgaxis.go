package report

import (
	"math"

	"terminus/constraint"
	"terminus/constraint/date"
	"terminus/constraint/wording"
)

// The axis of the picture: a linear scale in years over every finite
// bound, claim and record of the result, never narrower than
// minAxisYears, with ticks at 1, 2 or 5 times a power of ten years.

// minAxisYears is the narrowest span the axis shows, so that a window of
// a few days is not stretched over the page with ticks a day apart.
const minAxisYears = 10

// fracYear turns a day into a year with a fraction, for the axis.
func fracYear(d date.Day) float64 {
	y, _, _ := d.Civil()
	start := date.Gregorian(y, 1, 1)
	length := float64(date.Gregorian(y+1, 1, 1) - start)
	return float64(y) + float64(d-start)/length
}

// yearScale maps years to x in the drawing.
type yearScale struct {
	lo, hi float64 // the years at x0 and x1
	x0, x1 float64
}

func (s yearScale) x(y float64) float64 { return s.x0 + (y-s.lo)/(s.hi-s.lo)*(s.x1-s.x0) }

// dayX is the x of the start of day d; the end of a run of days is
// dayX(last+1).
func (s yearScale) dayX(d date.Day) float64 { return s.x(fracYear(d)) }

// extent collects the finite years a picture must show.
type extent struct {
	lo, hi float64
	any    bool
}

func (e *extent) add(y float64) {
	if !e.any {
		e.lo, e.hi, e.any = y, y, true
		return
	}
	e.lo, e.hi = math.Min(e.lo, y), math.Max(e.hi, y)
}

func (e *extent) addSpan(s constraint.Span) {
	if !s.OpenStart {
		e.add(fracYear(s.First))
	}
	if !s.OpenEnd {
		e.add(fracYear(s.Last + 1))
	}
}

// pictureExtent is every finite end of every window, every claim (its
// whole date, not only what survives), every record and every bound that
// takes part in a conflict.
func pictureExtent(r *constraint.Result, claims []claimSpan, marks []conflictMark) extent {
	var e extent
	for _, ev := range r.Events {
		for _, w := range ev.Windows {
			if w == nil {
				continue
			}
			for _, s := range w.Intervals {
				e.addSpan(s)
			}
		}
	}
	for _, c := range claims {
		e.addSpan(c.span)
	}
	for _, ev := range r.Evidence {
		if ev.Kind != "record" {
			continue
		}
		for _, b := range ev.Bounds {
			e.add(fracYear(b.Day))
		}
	}
	for _, m := range marks {
		e.add(fracYear(m.day))
	}
	return e
}

// axisRange pads the extent and widens it to at least minAxisYears
// around its middle.
func axisRange(e extent) (lo, hi float64) {
	lo, hi = e.lo, e.hi
	if hi-lo < minAxisYears {
		mid := (lo + hi) / 2
		lo, hi = mid-minAxisYears/2, mid+minAxisYears/2
	}
	pad := (hi - lo) * 0.04
	return lo - pad, hi + pad
}

// niceStep picks a tick spacing of 1, 2 or 5 times a power of ten years,
// at least a year, giving at most about nine ticks over span.
func niceStep(span float64) int64 {
	raw := span / 8
	if raw <= 1 {
		return 1
	}
	p := math.Pow(10, math.Floor(math.Log10(raw)))
	for _, m := range []float64{1, 2, 5, 10} {
		if raw <= m*p {
			return int64(m * p)
		}
	}
	return int64(10 * p)
}

// tick is a mark on the axis: where (an astronomical year's start) and
// its label.
type tick struct {
	year  float64
	label string
}

// ticks lists the ticks between lo and hi. Ticks are counted in the
// years people use, which have no year 0: the tick "1200 BCE" stands at
// the start of astronomical year -1199, and the tick between the eras at
// the start of 1 CE (only when the step is 10 years or more; with finer
// steps it would crowd its neighbour).
func ticks(lo, hi float64) []tick {
	step := niceStep(hi - lo)
	var out []tick
	first := int64(math.Ceil((lo-1)/float64(step))) * step
	for h := first; ; h += step {
		astro := float64(h)
		switch {
		case h < 0:
			astro = float64(h + 1)
		case h == 0:
			if step < 10 {
				continue
			}
			astro = 1
		}
		if astro > hi {
			break
		}
		if astro >= lo {
			out = append(out, tick{year: astro, label: wording.AxisYear(h)})
		}
	}
	return out
}
