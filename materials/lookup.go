package materials

import (
	"cmp"
	"math/bits"
	"slices"
	"strings"
	"unicode"

	"terminus/materials/spell"
)

// index maps folded keys to materials.
type index struct {
	names  map[string]*Material   // id and every name
	groups map[string]*Group      // every marker and family name
	ci     map[string][]*Material // Colour Index name, its short form and number
	cas    map[string][]*Material // CAS RN digits
	all    []nameRef              // every id, name and group name, for suggestions
}

type nameRef struct {
	key, shown string
	runes      []rune // key, as runes for the edit distance
	mask       uint64 // runeMask(runes)
	group      bool   // a marker or family name
}

// GroupKind says what a [Group] name is.
type GroupKind string

// The kinds of group.
const (
	// GroupMarker is a compound or phase that an analysis identifies and
	// that several materials may carry: carminic acid, indigotin.
	GroupMarker GroupKind = "marker"
	// GroupFamily is a name the trade gives a group of materials: carbon
	// black, ultramarine.
	GroupFamily GroupKind = "family"
	// GroupColourIndex is a Colour Index name or number that several
	// materials share.
	GroupColourIndex GroupKind = "Colour Index"
	// GroupCAS is a CAS Registry Number that several materials share.
	GroupCAS GroupKind = "CAS RN"
)

// Group is a name that stands for several materials, and those materials
// in dataset order.
type Group struct {
	Name    string // as the dataset first writes it, or as asked
	Kind    GroupKind
	Members []*Material
}

// Groups returns every marker and family of the dataset, sorted by name.
func (d *Dataset) Groups() []*Group {
	ix := d.index
	if ix == nil {
		ix = buildIndex(d.Materials, nil)
	}
	seen := make(map[*Group]bool, len(ix.groups))
	out := make([]*Group, 0, len(ix.groups))
	for _, g := range ix.groups {
		if !seen[g] {
			seen[g] = true
			out = append(out, g)
		}
	}
	slices.SortFunc(out, func(a, b *Group) int { return cmp.Compare(strings.ToLower(a.Name), strings.ToLower(b.Name)) })
	return out
}

// runeMask sets bit r%64 for every rune r of rs. A key's bits missing from
// a name's mask are runes of the key that the name lacks, each costing at
// least one edit: a lower bound on the edit distance to the name and to
// any start of it.
func runeMask(rs []rune) uint64 {
	var m uint64
	for _, r := range rs {
		m |= 1 << (uint32(r) % 64)
	}
	return m
}

// buildIndex indexes ms; names, when not nil, already maps every folded id
// and name to its material (the first to have it).
func buildIndex(ms []*Material, names map[string]*Material) *index {
	nKeys := 0
	for _, m := range ms {
		nKeys += len(m.Names) + 1
	}
	// Sized for what goes in: a Colour Index name, its short form and its
	// number per material at most, and one CAS RN.
	ix := &index{names: names, groups: map[string]*Group{}, ci: make(map[string][]*Material, 3*len(ms)), cas: make(map[string][]*Material, len(ms))}
	ix.all = make([]nameRef, 0, nKeys)
	fill := names == nil
	if fill {
		ix.names = make(map[string]*Material, nKeys)
	}
	addMulti := func(m map[string][]*Material, k string, mat *Material) {
		if k == "" || slices.Contains(m[k], mat) {
			return
		}
		m[k] = append(m[k], mat)
	}
	for _, m := range ms {
		// Names before the id, so that a suggestion shows a name.
		keys := m.foldedNames()
		for i := range keys {
			j := (i + 1) % len(keys)
			k, n := keys[j], m.ID
			if j > 0 {
				n = m.Names[j-1]
			}
			if k == "" {
				continue
			}
			if _, ok := ix.names[k]; !ok && fill {
				ix.names[k] = m
			}
			ix.all = append(ix.all, nameRef{key: k, shown: n, runes: []rune(k), mask: runeMask([]rune(k))})
		}
		for _, gl := range [...]struct {
			kind  GroupKind
			names []string
		}{{GroupMarker, m.Markers}, {GroupFamily, m.Families}} {
			kind := gl.kind
			for _, name := range gl.names {
				k := fold(name)
				g, ok := ix.groups[k]
				if !ok {
					g = &Group{Name: name, Kind: kind}
					ix.groups[k] = g
					ix.all = append(ix.all, nameRef{key: k, shown: name, runes: []rune(k), mask: runeMask([]rune(k)), group: true})
				}
				if !slices.Contains(g.Members, m) {
					g.Members = append(g.Members, m)
				}
			}
		}
		if ci := m.ColourIndex; ci != nil {
			addMulti(ix.ci, fold(ci.Name), m)
			addMulti(ix.ci, fold(ciShort(ci.Name)), m)
			addMulti(ix.ci, fold(ci.Number), m)
		}
		addMulti(ix.cas, fold(m.CAS), m)
	}
	return ix
}

// Lookup finds one material by its id, any of its names, its Colour Index
// generic name ("Pigment Blue 27", short "PB27" or "PB 27") or number
// ("77510", "C.I. 77510"), or its CAS RN. Case, accents, hyphens, spaces and
// punctuation do not count. A miss is a [*NotFoundError] with the nearest
// names; a marker, a family, or a Colour Index or CAS key that several
// materials share is an [*AmbiguousError] (use [Dataset.Resolve] to read it
// as their alternatives).
func (d *Dataset) Lookup(name string) (*Material, error) {
	r, err := d.Resolve(name)
	if err != nil {
		return nil, err
	}
	if r.Group != nil {
		ids := make([]string, len(r.Materials))
		for i, m := range r.Materials {
			ids[i] = m.ID
		}
		return nil, &AmbiguousError{Name: name, Kind: r.Group.Kind, Matches: ids}
	}
	return r.Materials[0], nil
}

// Resolution is what a name in a finding stands for: one material, or the
// members of a group (a marker, a family, a shared Colour Index or CAS key),
// every one of which the finding may be.
type Resolution struct {
	Materials []*Material // one, or the group's members in dataset order
	Group     *Group      // nil when the name names one material
}

// Resolve reads a name as [Dataset.Lookup] does, except that a marker
// ("carminic acid"), a family ("carbon black") or a Colour Index or CAS
// key that several materials share resolves to all of them: an analysis
// that found the compound cannot tell which of them it was. A material's own
// name always wins, so a specific name resolves to one material.
func (d *Dataset) Resolve(name string) (Resolution, error) {
	ix := d.index
	if ix == nil {
		ix = buildIndex(d.Materials, nil)
	}
	k := fold(name)
	if m, ok := ix.names[k]; ok {
		return Resolution{Materials: []*Material{m}}, nil
	}
	if g, ok := ix.groups[k]; ok {
		return Resolution{Materials: g.Members, Group: g}, nil
	}
	try := []string{k}
	if rest, ok := strings.CutPrefix(k, "ci"); ok && rest != "" {
		try = append(try, rest)
	}
	for _, t := range try {
		for i, tab := range []map[string][]*Material{ix.ci, ix.cas} {
			switch ms := tab[t]; len(ms) {
			case 0:
			case 1:
				return Resolution{Materials: ms}, nil
			default:
				kind := GroupColourIndex
				if i == 1 {
					kind = GroupCAS
				}
				return Resolution{Materials: ms, Group: &Group{Name: name, Kind: kind, Members: ms}}, nil
			}
		}
	}
	return Resolution{}, &NotFoundError{Name: name, Suggestions: ix.nearest(k, 3)}
}

// nearest returns up to n names nearest to key by edit distance, within a
// distance that still looks like a slip of spelling.
func (ix *index) nearest(key string, n int) []string {
	if key == "" {
		return nil
	}
	type cand struct {
		shown string
		dist  int
	}
	kr := []rune(key)
	limit := max(2, len(kr)/3)
	kmask := runeMask(kr)
	best := map[string]cand{}
	for _, r := range ix.all {
		if bits.OnesCount64(kmask&^r.mask) > limit {
			continue // too many of the key's letters are missing
		}
		dist := spell.Within(kr, r.runes, limit)
		if len(key) >= 4 && dist > 1 {
			if strings.Contains(r.key, key) {
				dist = 1
			} else if rk := r.runes; len(rk) > len(kr)+1 {
				// A slip in the first word of a longer name: compare with
				// the name's start (a letter shorter or longer than the
				// query), one more for what is left out.
				dist = min(dist, spell.PrefixWithin(kr, rk, limit-1)+1)
			}
		}
		if dist > limit {
			continue
		}
		id := "group:" + r.key // a marker or family is one candidate of its own
		if !r.group {
			id = ix.names[r.key].ID
		}
		if c, ok := best[id]; !ok || dist < c.dist {
			best[id] = cand{r.shown, dist}
		}
	}
	cs := make([]cand, 0, len(best))
	for _, c := range best {
		cs = append(cs, c)
	}
	slices.SortFunc(cs, func(a, b cand) int { return cmp.Or(cmp.Compare(a.dist, b.dist), cmp.Compare(a.shown, b.shown)) })
	out := make([]string, 0, n)
	for _, c := range cs {
		if len(out) == n {
			break
		}
		out = append(out, c.shown)
	}
	return out
}

// ciColour gives the letters that stand for a colour word of a Colour Index
// generic name in its usual short form (Pigment Blue 27 is PB27, Pigment
// Black 11 PBk11, Natural Brown 8 NBr8): common practice.
func ciColour(word string) (string, bool) {
	switch strings.ToLower(word) {
	case "blue":
		return "B", true
	case "red":
		return "R", true
	case "yellow":
		return "Y", true
	case "green":
		return "G", true
	case "orange":
		return "O", true
	case "violet":
		return "V", true
	case "brown":
		return "Br", true
	case "black":
		return "Bk", true
	case "white":
		return "W", true
	case "metal":
		return "M", true
	}
	return "", false
}

// ciShort turns "Pigment Blue 27" into "PB27" and "Basic Violet 3" into
// "BV3": the initials of the usage words, the colour's letters and the
// number. It returns "" when name does not have that shape.
func ciShort(name string) string {
	f := strings.Fields(name)
	if len(f) < 3 {
		return ""
	}
	num := f[len(f)-1]
	colour, ok := ciColour(f[len(f)-2])
	if !ok && strings.EqualFold(f[len(f)-3]+" "+f[len(f)-2], "Fluorescent Brightener") {
		return "FB" + num // Fluorescent Brightener 28 is FB28: common practice
	}
	if !ok || num == "" || num[0] < '0' || num[0] > '9' {
		return ""
	}
	var b strings.Builder
	for _, w := range f[:len(f)-2] {
		r := []rune(w)
		b.WriteRune(unicode.ToUpper(r[0]))
	}
	return b.String() + colour + num
}

// fold reduces a name to its lookup key: lower case, Latin accents and
// ligatures folded to plain letters (é→e, ß→ss, æ→ae, ü→u), and everything
// but letters and digits dropped.
func fold(s string) string {
	plain := true
	for i := 0; i < len(s) && plain; i++ {
		c := s[i]
		plain = 'a' <= c && c <= 'z' || '0' <= c && c <= '9'
	}
	if plain {
		return s
	}
	var b strings.Builder
	b.Grow(len(s))
	for _, r := range s {
		if r < 0x80 {
			switch {
			case 'a' <= r && r <= 'z', '0' <= r && r <= '9':
				b.WriteRune(r)
			case 'A' <= r && r <= 'Z':
				b.WriteRune(r + 'a' - 'A')
			}
			continue
		}
		if f, ok := foldRune(r); ok {
			b.WriteString(f)
			continue
		}
		if unicode.IsLetter(r) || unicode.IsDigit(r) {
			b.WriteRune(unicode.ToLower(r))
		}
	}
	return b.String()
}

// foldRune gives the plain form of a Latin letter with diacritics or a
// ligature of the European languages, after the Unicode decompositions of
// Latin-1 Supplement and Latin Extended-A; ß, æ, œ, ø, ł, đ and þ are
// written out as is common practice.
func foldRune(r rune) (string, bool) {
	switch r {
	case 'à', 'á', 'â', 'ã', 'ä', 'å', 'ā', 'ă', 'ą', 'ǎ', 'À', 'Á', 'Â', 'Ã', 'Ä', 'Å', 'Ā', 'Ă', 'Ą', 'Ǎ':
		return "a", true
	case 'æ', 'ǽ', 'Æ', 'Ǽ':
		return "ae", true
	case 'ç', 'ć', 'ĉ', 'ċ', 'č', 'Ç', 'Ć', 'Ĉ', 'Ċ', 'Č':
		return "c", true
	case 'ď', 'đ', 'ð', 'Ď', 'Đ', 'Ð':
		return "d", true
	case 'è', 'é', 'ê', 'ë', 'ē', 'ĕ', 'ė', 'ę', 'ě', 'È', 'É', 'Ê', 'Ë', 'Ē', 'Ĕ', 'Ė', 'Ę', 'Ě':
		return "e", true
	case 'ĝ', 'ğ', 'ġ', 'ģ', 'Ĝ', 'Ğ', 'Ġ', 'Ģ':
		return "g", true
	case 'ĥ', 'ħ', 'Ĥ', 'Ħ':
		return "h", true
	case 'ì', 'í', 'î', 'ï', 'ĩ', 'ī', 'ĭ', 'į', 'ı', 'ǐ', 'Ì', 'Í', 'Î', 'Ï', 'Ĩ', 'Ī', 'Ĭ', 'Į', 'İ', 'Ǐ':
		return "i", true
	case 'ĳ', 'Ĳ':
		return "ij", true
	case 'ĵ', 'Ĵ':
		return "j", true
	case 'ķ', 'Ķ':
		return "k", true
	case 'ĺ', 'ļ', 'ľ', 'ŀ', 'ł', 'Ĺ', 'Ļ', 'Ľ', 'Ŀ', 'Ł':
		return "l", true
	case 'ñ', 'ń', 'ņ', 'ň', 'ŉ', 'Ñ', 'Ń', 'Ņ', 'Ň':
		return "n", true
	case 'ò', 'ó', 'ô', 'õ', 'ö', 'ø', 'ō', 'ŏ', 'ő', 'ǒ', 'Ò', 'Ó', 'Ô', 'Õ', 'Ö', 'Ø', 'Ō', 'Ŏ', 'Ő', 'Ǒ':
		return "o", true
	case 'œ', 'Œ':
		return "oe", true
	case 'ŕ', 'ŗ', 'ř', 'Ŕ', 'Ŗ', 'Ř':
		return "r", true
	case 'ś', 'ŝ', 'ş', 'š', 'ſ', 'Ś', 'Ŝ', 'Ş', 'Š', 'ș':
		return "s", true
	case 'ß':
		return "ss", true
	case 'ţ', 'ť', 'ŧ', 'Ţ', 'Ť', 'Ŧ', 'ț', 'Ț':
		return "t", true
	case 'þ', 'Þ':
		return "th", true
	case 'ù', 'ú', 'û', 'ü', 'ũ', 'ū', 'ŭ', 'ů', 'ű', 'ų', 'ǔ', 'Ù', 'Ú', 'Û', 'Ü', 'Ũ', 'Ū', 'Ŭ', 'Ů', 'Ű', 'Ų', 'Ǔ':
		return "u", true
	case 'ŵ', 'Ŵ':
		return "w", true
	case 'ý', 'ÿ', 'ŷ', 'Ý', 'Ÿ', 'Ŷ':
		return "y", true
	case 'ź', 'ż', 'ž', 'Ź', 'Ż', 'Ž':
		return "z", true
	}
	return "", false
}
