package materials

import (
	"crypto/sha256"
	"errors"
	"fmt"
	"regexp"
	"slices"
	"strconv"
	"strings"

	"terminus/constraint/date"
	"terminus/constraint/input"
	"terminus/materials/spell"
)

// fileResult is what one file gave.
type fileResult struct {
	sources   []Source
	materials []*Material
	errs      ErrorList
	sum       [32]byte // SHA-256 of the file's bytes
}

// parser checks one file's node tree against the schema.
type parser struct {
	file    string
	regions *Regions
	errs    ErrorList
	keys    schemaKeys
}

// schemaKeys are the keys each kind of mapping may have.
type schemaKeys struct {
	top, source, material, colourIndex, milestone []string
}

func newSchemaKeys() schemaKeys {
	return schemaKeys{
		top:         []string{"sources", "materials"},
		source:      []string{"key", "cite", "url", "type"},
		material:    []string{"id", "names", "class", "origin", "colour_index", "cas", "formula", "note", "markers", "families", "milestones"},
		colourIndex: []string{"name", "number"},
		milestone:   []string{"kind", "date", "place", "source", "basis", "note", "allowance", "object"},
	}
}

// parseFile reads one file strictly: the tree (through package input, with
// its limits and its rules for every format), then the schema. An empty
// file holds nothing.
func parseFile(f rawFile, regions *Regions) *fileResult {
	p := &parser{file: f.name, regions: regions, keys: newSchemaKeys()}
	res := &fileResult{sum: sha256.Sum256(f.data)}
	root, err := input.Parse(f.name, f.data, f.format, input.Limits{})
	var ie *input.Error
	switch {
	case err == nil:
		res.sources, res.materials = p.top(root)
	case errors.As(err, &ie) && ie.Msg == "the file is empty":
	case errors.As(err, &ie):
		p.errs = append(p.errs, ie)
	default:
		p.errs = append(p.errs, &Error{File: f.name, Line: 1, Msg: err.Error(), Err: err})
	}
	res.errs = p.errs
	return res
}

func (p *parser) errAt(n *input.Node, msg, hint string) {
	line, col := 1, 0
	if n != nil && n.Line > 0 {
		line, col = int(n.Line), int(n.Column)
	}
	p.errs = append(p.errs, &Error{File: p.file, Line: line, Column: col, Msg: msg, Suggestion: hint})
}

// fields reads the keys of mapping n, reporting every problem (see
// [input.ReadFields]); nil when n is not a mapping.
func (p *parser) fields(n *input.Node, what string, allowed []string) *input.Fields {
	return input.ReadFields(p.file, n, what, allowed, func(e *input.Error) bool {
		p.errs = append(p.errs, e)
		return true
	})
}

// str reads a scalar as text; a null is "".
func (p *parser) str(f input.Field, what string) string {
	if f.Value == nil || f.Typo {
		return ""
	}
	if f.Value.Kind != input.Scalar {
		p.errAt(f.Value, fmt.Sprintf("expected %s as text; found %s", what, f.Value.Describe()), "")
		return ""
	}
	if f.Value.IsNull() {
		return ""
	}
	return f.Value.Value
}

// required reads a key that must be there and not empty; what names the
// mapping in messages, made only when one is needed.
func (p *parser) required(fs *input.Fields, key string, what func() string, at *input.Node) string {
	f, ok := fs.Lookup(key)
	if !ok {
		p.errAt(at, fmt.Sprintf("%s has no %q", what(), key), "")
		return ""
	}
	s := strings.TrimSpace(p.str(f, key))
	if s == "" && !f.Typo {
		p.errAt(f.Value, fmt.Sprintf("%q of %s is empty", key, what()), "")
	}
	return s
}

// words is a fixed name for a mapping in messages.
func words(s string) func() string { return func() string { return s } }

func (p *parser) top(root *input.Node) ([]Source, []*Material) {
	root = deref(root)
	if root.Kind == input.Scalar && root.IsNull() {
		return nil, nil
	}
	fs := p.fields(root, "materials file", p.keys.top)
	var sources []Source
	var mats []*Material
	if f, ok := fs.Given("sources"); ok {
		for _, n := range p.list(f.Value, "sources") {
			if s, ok := p.source(n); ok {
				sources = append(sources, s)
			}
		}
	}
	if f, ok := fs.Given("materials"); ok {
		for _, n := range p.list(f.Value, "materials") {
			if m := p.material(n); m != nil {
				mats = append(mats, m)
			}
		}
	}
	return sources, mats
}

func (p *parser) list(n *input.Node, what string) []*input.Node {
	n = deref(n)
	if n.Kind == input.Scalar && n.IsNull() {
		return nil
	}
	if n.Kind != input.Sequence {
		p.errAt(n, fmt.Sprintf("expected %s as a list; found %s", what, n.Describe()), "start each entry with '- '")
		return nil
	}
	return n.Content
}

func (p *parser) source(n *input.Node) (Source, bool) {
	n = deref(n)
	fs := p.fields(n, "source", p.keys.source)
	if fs == nil {
		return Source{}, false
	}
	s := Source{File: p.file, Line: int(n.Line), col: int(n.Column)}
	s.Key = p.required(fs, "key", words("a source"), n)
	s.Cite = p.required(fs, "cite", func() string { return fmt.Sprintf("source %q", s.Key) }, n)
	if f, ok := fs.Given("url"); ok {
		s.URL = strings.TrimSpace(p.str(f, "url"))
		if s.URL != "" && !strings.HasPrefix(s.URL, "https://") && !strings.HasPrefix(s.URL, "http://") {
			p.errAt(f.Value, fmt.Sprintf("url %q of source %q is not a web address", s.URL, s.Key), "write it in full, starting with https://")
		}
	}
	if f, ok := fs.Given("type"); ok {
		s.Type = strings.TrimSpace(p.str(f, "a source type"))
		if s.Type != "" && !slices.Contains(SourceTypes(), s.Type) {
			hint := "type is one of " + strings.Join(SourceTypes(), ", ")
			if n := spell.Nearest(s.Type, SourceTypes(), 1); len(n) == 1 {
				hint = "did you mean " + quote(n[0]) + "? (" + hint + ")"
			}
			p.errAt(f.Value, fmt.Sprintf("unknown type %q of source %q", s.Type, s.Key), hint)
		}
	}
	if s.Key != "" && !validID(s.Key) {
		p.errAt(fs.At("key").Value, fmt.Sprintf("source key %q is not lower case letters, digits and hyphens", s.Key),
			"write it like 'artists-pigments-1'")
	}
	return s, s.Key != ""
}

func (p *parser) material(n *input.Node) *Material {
	n = deref(n)
	fs := p.fields(n, "material", p.keys.material)
	if fs == nil {
		return nil
	}
	m := &Material{File: p.file, Line: int(n.Line), col: int(n.Column)}
	m.ID = p.required(fs, "id", words("a material"), n)
	if m.ID != "" && !validID(m.ID) {
		p.errAt(fs.At("id").Value, fmt.Sprintf("id %q is not lower case letters, digits and hyphens", m.ID),
			"write it like "+quote(suggestID(m.ID)))
	}
	what := "material " + strconv.Quote(m.ID)
	if f, ok := fs.Given("names"); ok {
		list := p.list(f.Value, "names")
		m.Names = make([]string, 0, len(list))
		m.keys = make([]string, 1, len(list)+1)
		m.keys[0] = fold(m.ID)
		for _, nn := range list {
			nn = deref(nn)
			s := strings.TrimSpace(p.str(input.Field{Value: nn}, "a name"))
			k := fold(s)
			switch {
			case s == "":
				p.errAt(nn, "empty name in "+what, "")
			case k == "":
				p.errAt(nn, fmt.Sprintf("name %q of %s has no letters or digits", s, what), "")
			default:
				m.Names = append(m.Names, s)
				m.keys = append(m.keys, k)
			}
		}
	}
	m.Class = p.oneOf(fs, "class", what, n, Classes())
	m.Origin = p.oneOf(fs, "origin", what, n, Origins())
	if f, ok := fs.Given("colour_index"); ok {
		m.ColourIndex = p.colourIndex(f, what)
	}
	if f, ok := fs.Given("cas"); ok {
		m.CAS = strings.TrimSpace(p.str(f, "cas"))
		if m.CAS != "" {
			if msg, hint := checkCAS(m.CAS); msg != "" {
				p.errAt(f.Value, fmt.Sprintf("cas %q of %s: %s", m.CAS, what, msg), hint)
			}
		}
	}
	if f, ok := fs.Given("formula"); ok {
		m.Formula = strings.TrimSpace(p.str(f, "formula"))
	}
	if f, ok := fs.Given("note"); ok {
		m.Note = strings.TrimSpace(p.str(f, "note"))
	}
	if f, ok := fs.Given("markers"); ok {
		m.Markers = p.groupNames(f, "markers", what)
	}
	if f, ok := fs.Given("families"); ok {
		m.Families = p.groupNames(f, "families", what)
	}
	if len(m.keys) == 0 {
		m.keys = []string{fold(m.ID)}
	}
	if f, ok := fs.Given("milestones"); ok {
		list := p.list(f.Value, "milestones")
		m.Milestones = make([]Milestone, 0, len(list))
		for _, mn := range list {
			if ms, ok := p.milestone(mn, what); ok {
				m.Milestones = append(m.Milestones, ms)
			}
		}
	}
	return m
}

// groupNames reads a list of marker or family names.
func (p *parser) groupNames(f input.Field, key, what string) []string {
	list := p.list(f.Value, key)
	out := make([]string, 0, len(list))
	for _, nn := range list {
		nn = deref(nn)
		s := strings.TrimSpace(p.str(input.Field{Value: nn}, "a name"))
		switch {
		case s == "":
			p.errAt(nn, "empty name in the "+key+" of "+what, "")
		case fold(s) == "":
			p.errAt(nn, fmt.Sprintf("name %q in the %s of %s has no letters or digits", s, key, what), "")
		default:
			out = append(out, s)
		}
	}
	return out
}

func (p *parser) oneOf(fs *input.Fields, key, what string, at *input.Node, allowed []string) string {
	s := p.required(fs, key, words(what), at)
	if s == "" || slices.Contains(allowed, s) {
		return s
	}
	hint := key + " is one of " + strings.Join(allowed, ", ")
	if n := spell.Nearest(s, allowed, 1); len(n) == 1 {
		hint = "did you mean " + quote(n[0]) + "? (" + hint + ")"
	}
	p.errAt(fs.At(key).Value, fmt.Sprintf("unknown %s %q for %s", key, s, what), hint)
	return s
}

var ciNumber = regexp.MustCompile(`^[0-9]{5}(:[0-9]{1,2})?$`)

func (p *parser) colourIndex(f input.Field, what string) *ColourIndex {
	fs := p.fields(f.Value, "colour_index", p.keys.colourIndex)
	if fs == nil {
		return nil
	}
	ci := &ColourIndex{}
	if g, ok := fs.Given("name"); ok {
		ci.Name = strings.TrimSpace(p.str(g, "the Colour Index name"))
	}
	if g, ok := fs.Given("number"); ok {
		ci.Number = strings.TrimSpace(p.str(g, "the Colour Index number"))
		if ci.Number != "" && !ciNumber.MatchString(ci.Number) {
			p.errAt(g.Value, fmt.Sprintf("Colour Index number %q of %s is not five digits with an optional ':n' suffix", ci.Number, what),
				`write it like "77510" or "58000:1", quoted`)
		}
	}
	if ci.Name == "" && ci.Number == "" {
		p.errAt(f.Value, "colour_index of "+what+" has neither name nor number", "give {name: Pigment Blue 27, number: \"77510\"} or leave colour_index out")
		return nil
	}
	return ci
}

func (p *parser) milestone(n *input.Node, what string) (Milestone, bool) {
	n = deref(n)
	fs := p.fields(n, "milestone", p.keys.milestone)
	if fs == nil {
		return Milestone{}, false
	}
	ms := Milestone{File: p.file, Line: int(n.Line), Column: int(n.Column)}
	where := func() string { return "a milestone of " + what }
	ok := true
	kind := p.required(fs, "kind", where, n)
	switch Kind(kind) {
	case KindMade, KindSold, KindArrived, KindWithdrawn, KindAttested:
		ms.Kind = Kind(kind)
	case "":
		ok = false
	default:
		hint := "kind is one of made, sold, arrived, withdrawn, attested"
		if s := spell.Nearest(kind, []string{"made", "sold", "arrived", "withdrawn", "attested"}, 1); len(s) == 1 {
			hint = "did you mean " + quote(s[0]) + "? (" + hint + ")"
		}
		p.errAt(fs.At("kind").Value, fmt.Sprintf("unknown milestone kind %q in %s", kind, what), hint)
		ok = false
	}
	if f, has := fs.Lookup("date"); has && f.Typo {
		ok = false
	} else if has {
		text := strings.TrimSpace(p.str(f, "a date"))
		if text == "" {
			p.errAt(f.Value, "empty date in "+where(), `write an EDTF date such as "1856", "1830~" or "1704/1706"`)
			ok = false
		} else if d, err := date.Parse(text); err != nil {
			col := int(f.Value.Column)
			msg := err.Error()
			var pe *date.ParseError
			if errors.As(err, &pe) {
				msg = pe.Msg
				if f.Value.Value == text {
					if f.Value.Quoted {
						col++
					}
					col += pe.Pos
				}
			}
			p.errs = append(p.errs, &Error{File: p.file, Line: int(f.Value.Line), Column: col,
				Msg: fmt.Sprintf("bad date %q in %s: %s", text, where(), msg), Err: err,
				Suggestion: `write an EDTF date such as "1856", "1830~", "18XX" or "1704/1706", quoted`})
			ok = false
		} else {
			ms.Date = d
		}
	} else {
		p.errAt(n, where()+" has no \"date\"", "")
		ok = false
	}
	if f, has := fs.Given("place"); has {
		ms.Place = strings.TrimSpace(p.str(f, "a place"))
		if ms.Place != "" && !p.regions.Valid(ms.Place) {
			hint := "a place is an ISO 3166-1 alpha-2 code (\"NL\") or a UN M49 area code (\"155\", quoted)"
			if s := p.regions.Suggest(ms.Place); len(s) > 0 {
				hint = "did you mean " + input.OrList(s) + "? (" + hint + ")"
			}
			msg := fmt.Sprintf("unknown place %q in %s", ms.Place, where())
			if f.Value.Type == input.Int {
				msg += " (an unquoted number loses its leading zeros)"
			}
			p.errAt(f.Value, msg, hint)
			ok = false
		}
	}
	if ms.Kind == KindArrived && ms.Place == "" && !fs.At("place").Typo {
		p.errAt(n, "an arrived milestone of "+what+" has no place", "add place: with the country or area code where it arrived")
		ok = false
	}
	if f, has := fs.Given("source"); has {
		ms.Source = strings.TrimSpace(p.str(f, "a source key"))
		ms.sourceLine, ms.sourceCol = int(f.Value.Line), int(f.Value.Column)
	}
	if ms.Source == "" && !fs.At("source").Typo {
		p.errAt(n, where()+" cites no source", "every milestone names a source key from the bibliography; write 'from-memory' as its basis if you could not check it")
		ok = false
	}
	basis := p.required(fs, "basis", where, n)
	switch Basis(basis) {
	case BasisDocumented, BasisFromMemory:
		ms.Basis = Basis(basis)
	case "":
		ok = false
	default:
		p.errAt(fs.At("basis").Value, fmt.Sprintf("unknown basis %q in %s", basis, where()),
			"basis is 'documented' (you read the claim in the source) or 'from-memory'")
		ok = false
	}
	if f, has := fs.Given("note"); has {
		ms.Note = strings.TrimSpace(p.str(f, "a note"))
	}
	if f, has := fs.Given("object"); has {
		ms.Object = strings.TrimSpace(p.str(f, "an object"))
		if ms.Kind != "" && ms.Kind != KindAttested {
			p.errAt(f.Key, fmt.Sprintf("object on a %s milestone of %s", ms.Kind, what),
				"only an attested milestone names an object; put what you want to say in its note")
			ok = false
		}
	}
	if ms.Kind == KindAttested && ms.Object == "" && !fs.At("object").Typo {
		p.errAt(n, "an attested milestone of "+what+" names no object", "add object: with the dated object or context in which the material was identified")
		ok = false
	}
	if f, has := fs.Given("allowance"); has {
		text := strings.TrimSpace(p.str(f, "an allowance"))
		switch {
		case ms.Kind != "" && ms.Kind != KindWithdrawn:
			p.errAt(f.Key, fmt.Sprintf("allowance on a %s milestone of %s", ms.Kind, what),
				"only a withdrawn milestone has an allowance (how long stocks lingered); remove it here")
			ok = false
		case text == "":
		default:
			u, err := date.ParseDuration(text)
			if err != nil {
				msg := err.Error()
				var pe *date.ParseError
				if errors.As(err, &pe) {
					msg = pe.Msg
				}
				p.errs = append(p.errs, &Error{File: p.file, Line: int(f.Value.Line), Column: int(f.Value.Column),
					Msg: fmt.Sprintf("bad allowance %q in %s: %s", text, where(), msg), Err: err,
					Suggestion: "write an ISO 8601 duration such as P10Y or P6M"})
				ok = false
			} else {
				ms.Allowance = &u
			}
		}
	}
	return ms, ok
}

// validID reports whether s is lower case letters and digits in words
// joined by single hyphens: "prussian-blue", "pigment-red-83".
func validID(s string) bool {
	if s == "" || s[0] == '-' || s[len(s)-1] == '-' {
		return false
	}
	for i := 0; i < len(s); i++ {
		c := s[i]
		switch {
		case 'a' <= c && c <= 'z', '0' <= c && c <= '9':
		case c == '-' && s[i-1] != '-':
		default:
			return false
		}
	}
	return true
}

// suggestID turns "Prussian Blue" into "prussian-blue".
func suggestID(s string) string {
	words := strings.FieldsFunc(s, func(r rune) bool {
		return !(r >= 'a' && r <= 'z' || r >= 'A' && r <= 'Z' || r >= '0' && r <= '9' || r > 0x7f)
	})
	for i, w := range words {
		words[i] = fold(w)
	}
	return strings.Join(slices.DeleteFunc(words, func(w string) bool { return w == "" }), "-")
}

// checkCAS checks the shape and check digit of a CAS Registry Number (the
// check digit is the sum of the other digits, each times its position
// counted from the right, modulo 10: the registry's published rule).
func checkCAS(s string) (msg, hint string) {
	parts := strings.Split(s, "-")
	if len(parts) != 3 || len(parts[0]) < 2 || len(parts[0]) > 7 || len(parts[1]) != 2 || len(parts[2]) != 1 {
		return "not a CAS Registry Number", "write it as digits in three groups, like 14038-43-8"
	}
	digits := parts[0] + parts[1]
	sum := 0
	for i := range len(digits) {
		c := digits[len(digits)-1-i]
		if c < '0' || c > '9' {
			return "not a CAS Registry Number", "write it as digits in three groups, like 14038-43-8"
		}
		sum += int(c-'0') * (i + 1)
	}
	c := parts[2][0]
	if c < '0' || c > '9' {
		return "not a CAS Registry Number", "write it as digits in three groups, like 14038-43-8"
	}
	if want := byte('0' + sum%10); c != want {
		return fmt.Sprintf("check digit is %c, but the digits before it give %c", c, want),
			"check the number against the source; one digit is probably mistyped"
	}
	return "", ""
}

// deref stands in an empty node for a missing one, so that a message can
// still be placed.
func deref(n *input.Node) *input.Node {
	if n == nil {
		return &input.Node{}
	}
	return n
}
