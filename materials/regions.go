package materials

import (
	_ "embed"
	"fmt"
	"slices"
	"strconv"
	"strings"
	"sync"

	"terminus/materials/spell"
)

//go:embed regions.txt
var regionsTable string

// Regions is the table of places: UN M49 areas and ISO 3166-1 alpha-2
// countries, each with its parent area. It is read-only.
type Regions struct {
	places  map[string]*place // by code: "NL", "155", "001"
	byNum   map[string]string // M49 country number → alpha-2
	ordered []string          // codes in table order
}

type place struct {
	code, num, parent, name string
	area                    bool
}

// builtinRegions parses the embedded table once.
var builtinRegions = sync.OnceValues(func() (*Regions, error) {
	return parseRegions("regions.txt", regionsTable)
})

// BuiltinRegions returns the project's region table.
func BuiltinRegions() (*Regions, error) { return builtinRegions() }

func parseRegions(file, text string) (*Regions, error) {
	r := &Regions{places: map[string]*place{}, byNum: map[string]string{}}
	for i, line := range strings.Split(text, "\n") {
		line = strings.TrimSpace(line)
		if line == "" || strings.HasPrefix(line, "#") {
			continue
		}
		f := strings.SplitN(line, " ", 4)
		bad := func(msg string) error {
			return &Error{File: file, Line: i + 1, Column: 1, Msg: msg}
		}
		if len(f) < 4 {
			return nil, bad("expected 'area CODE PARENT NAME' or 'CC NUM PARENT NAME'")
		}
		p := &place{parent: f[2], name: f[3]}
		if f[0] == "area" {
			p.code, p.num, p.area = f[1], f[1], true
		} else {
			p.code, p.num = f[0], f[1]
			if len(p.code) != 2 {
				return nil, bad("a country code has two letters")
			}
			r.byNum[p.num] = p.code
		}
		if _, err := strconv.Atoi(p.num); err != nil || len(p.num) != 3 {
			return nil, bad("an M49 code has three digits")
		}
		if p.parent == "-" {
			p.parent = ""
		} else if _, ok := r.places[p.parent]; !ok {
			return nil, bad(fmt.Sprintf("parent area %q is not defined above", p.parent))
		}
		if _, dup := r.places[p.code]; dup {
			return nil, bad(fmt.Sprintf("code %q is defined twice", p.code))
		}
		r.places[p.code] = p
		r.ordered = append(r.ordered, p.code)
	}
	return r, nil
}

// Valid reports whether code is a known alpha-2 country code or M49 area
// code, written exactly (upper case, three digits for areas).
func (r *Regions) Valid(code string) bool {
	_, ok := r.places[code]
	return ok
}

// Name returns the English name of code, or "" when unknown.
func (r *Regions) Name(code string) string {
	if p, ok := r.places[code]; ok {
		return p.name
	}
	return ""
}

// IsArea reports whether code is an M49 area (not a country).
func (r *Regions) IsArea(code string) bool {
	p, ok := r.places[code]
	return ok && p.area
}

// M49 returns the M49 number of a country or area, or "".
func (r *Regions) M49(code string) string {
	if p, ok := r.places[code]; ok {
		return p.num
	}
	return ""
}

// Parent returns the area directly above code, or "" for the world and for
// unknown codes.
func (r *Regions) Parent(code string) string {
	if p, ok := r.places[code]; ok {
		return p.parent
	}
	return ""
}

// Ancestors returns code and the areas that contain it, most specific
// first: country, intermediate region, sub-region, region, "001". It
// returns nil for an unknown code.
func (r *Regions) Ancestors(code string) []string {
	var out []string
	for p, ok := r.places[code]; ok; p, ok = r.places[p.parent] {
		out = append(out, p.code)
	}
	return out
}

// Within reports whether place lies in area: it is area itself or one of
// the areas that contain it. The world ("001") contains every known place.
func (r *Regions) Within(place, area string) bool {
	for p, ok := r.places[place]; ok; p, ok = r.places[p.parent] {
		if p.code == area {
			return true
		}
	}
	return false
}

// Region returns the top-level M49 region (Africa "002", Americas "019",
// Asia "142", Europe "150", Oceania "009") that holds code; "001" for the
// world and places directly in it; "" when code is unknown.
func (r *Regions) Region(code string) string {
	a := r.Ancestors(code)
	switch len(a) {
	case 0:
		return ""
	case 1:
		return a[0]
	}
	if top := a[len(a)-2]; r.IsArea(top) {
		return top
	}
	return "001"
}

// Codes returns every code in table order: areas before what they hold.
func (r *Regions) Codes() []string { return slices.Clone(r.ordered) }

// Suggest returns up to three known codes that code may have meant: the
// same code in upper case or padded to three digits, the alpha-2 code of an
// M49 country number, a code whose name is code, well-known non-ISO codes
// ("UK"), then codes one edit away.
func (r *Regions) Suggest(code string) []string {
	var out []string
	add := func(c string) {
		if c != "" && r.Valid(c) && !slices.Contains(out, c) && len(out) < 3 {
			out = append(out, c)
		}
	}
	s := strings.TrimSpace(code)
	up := strings.ToUpper(s)
	add(up)
	if n, err := strconv.Atoi(s); err == nil && n >= 0 && n < 1000 {
		pad := fmt.Sprintf("%03d", n)
		add(r.byNum[pad])
		add(pad)
	}
	switch up {
	case "UK":
		add("GB")
	case "EL":
		add("GR")
	case "EU":
		add("150")
	}
	key := fold(s)
	if key != "" {
		for _, c := range r.ordered {
			if fold(r.places[c].name) == key {
				add(c)
			}
		}
		for _, c := range r.ordered {
			if len(key) >= 3 && strings.HasPrefix(fold(r.places[c].name), key) {
				add(c)
			}
		}
	}
	if len(up) == 2 || len(up) == 3 {
		for _, c := range r.ordered {
			if len(c) == len(up) && spell.Distance(c, up) == 1 {
				add(c)
			}
		}
	}
	return out
}
