package materials

import (
	"cmp"
	"fmt"
	"slices"
	"strings"

	"terminus/constraint/date"
)

// Problem is one finding of [Lint].
type Problem struct {
	File         string
	Line, Column int
	Msg          string
}

func (p Problem) String() string {
	if p.Column > 0 {
		return fmt.Sprintf("%s:%d:%d: %s", p.File, p.Line, p.Column, p.Msg)
	}
	return fmt.Sprintf("%s:%d: %s", p.File, p.Line, p.Msg)
}

// Problems turns a load error into problems, so that a lint can show
// schema errors and logic errors alike. It returns nil for other errors.
func Problems(err error) []Problem {
	var out []Problem
	for _, e := range errorsAsList(err) {
		msg := e.Msg
		if e.Suggestion != "" {
			msg += "; " + e.Suggestion
		}
		out = append(out, Problem{File: e.File, Line: e.Line, Column: e.Column, Msg: msg})
	}
	return out
}

// Lint checks the logic of a loaded dataset, beyond what loading already
// enforces:
//
//   - every material has a made milestone;
//   - no sold or arrived claim starts before the earliest made claim, and
//     no withdrawn claim lies wholly before the earliest sold claim (or
//     made, when there is no sold);
//   - no made, sold or arrived bound is later than an attestation that
//     should bound it (see lintOrder);
//   - every milestone names a source, and every source key cited exists;
//   - every source in the bibliography is cited by some milestone;
//   - no name (folded as [Dataset.Lookup] folds it) belongs to two materials;
//   - ids and source keys are unique;
//   - a Colour Index name has the usual shape ("Pigment Blue 27").
//
// Problems are sorted by file and line.
func Lint(d *Dataset) []Problem { return lint(d, nil) }

// LintFiles reads the named files as one set and lints it: schema problems
// (every one the loader finds) or, when the files load, the problems of
// [Lint]. A source the files cite but do not define may come from base
// (nil for none); only the files' own sources must be cited. The dataset
// is nil when the files do not load. The error is for files that cannot be
// read at all.
func LintFiles(base *Dataset, names ...string) (*Dataset, []Problem, error) {
	d, err := loadPaths(names, base)
	if err != nil {
		if ps := Problems(err); ps != nil {
			return nil, ps, nil
		}
		return nil, nil, err
	}
	var known func(string) bool
	if base != nil {
		known = func(k string) bool { _, ok := base.Source(k); return ok }
	}
	return d, lint(d, known), nil
}

func lint(d *Dataset, known func(key string) bool) []Problem {
	var ps []Problem
	add := func(file string, line, col int, format string, args ...any) {
		ps = append(ps, Problem{File: file, Line: line, Column: col, Msg: fmt.Sprintf(format, args...)})
	}
	cited := map[string]bool{}
	keys := map[string]Source{}
	for _, s := range d.Sources {
		if prev, dup := keys[s.Key]; dup {
			add(s.File, s.Line, s.col, "source key %q is already defined at %s:%d", s.Key, prev.File, prev.Line)
			continue
		}
		keys[s.Key] = s
	}
	ids := map[string]*Material{}
	names := map[string]*Material{}
	for _, m := range d.Materials {
		if prev, dup := ids[m.ID]; dup {
			add(m.File, m.Line, m.col, "id %q is already used at %s:%d", m.ID, prev.File, prev.Line)
		}
		ids[m.ID] = m
		for _, n := range append([]string{m.ID}, m.Names...) {
			k := fold(n)
			if other, ok := names[k]; ok && other != m {
				add(m.File, m.Line, m.col, "name %q of %q is also a name of %q (%s:%d)", n, m.ID, other.ID, other.File, other.Line)
				continue
			}
			names[k] = m
		}
		for _, ms := range m.Milestones {
			switch {
			case ms.Source == "":
				add(ms.File, ms.Line, ms.Column, "%s milestone of %q has no source", ms.Kind, m.ID)
			case !hasKey(keys, ms.Source) && (known == nil || !known(ms.Source)):
				line, col := ms.Line, ms.Column
				if ms.sourceLine > 0 {
					line, col = ms.sourceLine, ms.sourceCol
				}
				add(ms.File, line, col, "%s milestone of %q cites %q, which is not in the bibliography", ms.Kind, m.ID, ms.Source)
			}
			cited[ms.Source] = true
		}
		if ci := m.ColourIndex; ci != nil && ci.Name != "" && !ciNameShape(ci.Name) {
			add(m.File, m.Line, m.col, "Colour Index name %q of %q is not of the form 'Pigment Blue 27'", ci.Name, m.ID)
		}
		ps = append(ps, d.lintOrder(m)...)
	}
	for _, s := range d.Sources {
		if !cited[s.Key] {
			add(s.File, s.Line, s.col, "source %q is never cited; cite it or remove it", s.Key)
		}
	}
	slices.SortStableFunc(ps, func(a, b Problem) int {
		return cmp.Or(cmp.Compare(a.File, b.File), cmp.Compare(a.Line, b.Line), cmp.Compare(a.Column, b.Column))
	})
	return ps
}

func hasKey(m map[string]Source, k string) bool {
	_, ok := m[k]
	return ok
}

// lintOrder checks that a material's milestones come in a possible order
// and that none is later than the material's own dated evidence:
//
//   - a sold or arrived claim must not start before the earliest made
//     claim, and a withdrawn claim must not lie wholly before the earliest
//     sold claim (or made, when there is no sold);
//   - the earliest made claim, the earliest sold claim, and the earliest
//     arrived claim of each area must not be later than an attestation
//     that bounds them (any attestation for made and sold; one in the
//     area or inside it for an arrival), since that would put a bound
//     after an object known to hold the material.
//
// A kind with a claim open at its start gives no lower bound, so it is
// not compared.
func (d *Dataset) lintOrder(m *Material) []Problem {
	ps := d.lintSequence(m)
	if len(m.Claims(KindMade, "")) > 0 {
		ps = append(ps, d.lintAttestations(m)...)
	}
	return ps
}

// lintSequence finds the milestones of m out of order: no made claim, a
// sale or arrival starting before the first making, a withdrawal wholly
// before the first sale.
func (d *Dataset) lintSequence(m *Material) []Problem {
	var ps []Problem
	made := m.Claims(KindMade, "")
	if len(made) == 0 {
		return []Problem{{File: m.File, Line: m.Line, Column: m.col, Msg: fmt.Sprintf("material %q has no made milestone", m.ID)}}
	}
	at := func(ms Milestone, format string, args ...any) {
		ps = append(ps, Problem{File: ms.File, Line: ms.Line, Column: ms.Column, Msg: fmt.Sprintf(format, args...)})
	}
	firstMade, okMade := earliestStart(made)
	if okMade {
		for _, k := range []Kind{KindSold, KindArrived} {
			for _, ms := range m.Claims(k, "") {
				if first, ok := ms.Date.Earliest(); ok && first < firstMade {
					at(ms, "%s milestone of %q (%s) starts before its earliest made claim (%s)", ms.Kind, m.ID, ms.Date.EDTF(), firstMade.ISO())
				}
			}
		}
	}
	sold := m.Claims(KindSold, "")
	end := func(after date.Day, ok bool, what string) {
		if !ok {
			return
		}
		for _, ms := range m.Claims(KindWithdrawn, "") {
			if last, ok := ms.Date.Latest(); ok && last < after {
				at(ms, "withdrawn milestone of %q (%s) lies wholly before its earliest %s claim", m.ID, ms.Date.EDTF(), what)
			}
		}
	}
	if len(sold) > 0 {
		first, ok := earliestStart(sold)
		end(first, ok, "sold")
	} else {
		end(firstMade, okMade, "made")
	}
	return ps
}

// lintAttestations finds the made, sold and arrived bounds of m that are
// later than an attestation that bounds them (see [Dataset.lintOrder]).
func (d *Dataset) lintAttestations(m *Material) []Problem {
	var ps []Problem
	at := func(ms Milestone, format string, args ...any) {
		ps = append(ps, Problem{File: ms.File, Line: ms.Line, Column: ms.Column, Msg: fmt.Sprintf(format, args...)})
	}
	made, sold := m.Claims(KindMade, ""), m.Claims(KindSold, "")
	attested := m.Claims(KindAttested, "")
	capped := func(claims []Milestone, area string, what string) {
		first, ok := earliestStart(claims)
		if !ok {
			return
		}
		var by *Milestone
		var byDay date.Day
		for i := range attested {
			a := &attested[i]
			if !d.InArea(a, area) {
				continue
			}
			if day, ok := a.Date.Earliest(); ok && day < first && (by == nil || day < byDay) {
				by, byDay = a, day
			}
		}
		if by == nil {
			return
		}
		for _, ms := range claims {
			if day, ok := ms.Date.Earliest(); ok && day == first {
				at(ms, "the earliest %s of %q (%s) is later than its attestation %s in %s (%s:%d): record the earlier evidence as another %s claim, or correct the attestation",
					what, m.ID, ms.Date.EDTF(), by.Date.EDTF(), by.Object, by.File, by.Line, ms.Kind)
				break
			}
		}
	}
	if len(attested) > 0 {
		capped(made, "", "made claim")
		if len(sold) > 0 {
			capped(sold, "", "sold claim")
		}
		var areas []string
		for _, ms := range m.Claims(KindArrived, "") {
			if !slices.Contains(areas, ms.Place) {
				areas = append(areas, ms.Place)
			}
		}
		for _, a := range areas {
			capped(m.Claims(KindArrived, a), a, "arrival in "+a)
		}
	}
	return ps
}

// earliestStart is the first day of the earliest claim; false when a claim
// is open at its start.
func earliestStart(ms []Milestone) (date.Day, bool) {
	var best date.Day
	for i, m := range ms {
		d, ok := m.Date.Earliest()
		if !ok {
			return 0, false
		}
		if i == 0 || d < best {
			best = d
		}
	}
	return best, len(ms) > 0
}

// ciNameShape reports whether a Colour Index generic name has the usual
// shape: capitalised words, then a number with an optional ":n"
// ("Pigment Blue 27", "Pigment Red 48:2", "Fluorescent Brightener 28").
func ciNameShape(name string) bool {
	f := strings.Split(name, " ")
	if len(f) < 2 {
		return false
	}
	for _, w := range f[:len(f)-1] {
		if w == "" || w[0] < 'A' || w[0] > 'Z' {
			return false
		}
		for i := 1; i < len(w); i++ {
			if w[i] < 'a' || w[i] > 'z' {
				return false
			}
		}
	}
	num, suffix, hasSuffix := strings.Cut(f[len(f)-1], ":")
	if num == "" || !allDigitsText(num) {
		return false
	}
	return !hasSuffix || suffix != "" && allDigitsText(suffix)
}

func allDigitsText(s string) bool {
	for i := 0; i < len(s); i++ {
		if s[i] < '0' || s[i] > '9' {
			return false
		}
	}
	return true
}
