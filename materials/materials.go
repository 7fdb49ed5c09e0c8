// Package materials is the dated, sourced dataset of colorants and the other
// materials an examiner meets beside them: its schema, strict loading, lookup
// by any name, the region table for places, lint and statistics.
//
// # Model
//
// A [Material] is one substance as practitioners keep it apart from others:
// natural and synthetic ultramarine are two materials, and so are the two
// crystal forms of titanium dioxide white. Each material carries dated
// [Milestone] records of four kinds ([KindMade], [KindSold], [KindArrived],
// [KindWithdrawn]). Every milestone names a [Source] from the dataset's
// bibliography and says whether its date was read there ([BasisDocumented])
// or written down from memory ([BasisFromMemory]). Several milestones of the
// same kind and place are the claims of sources that disagree; the dataset
// keeps them all and leaves the choice to the reasoner.
//
// Places are ISO 3166-1 alpha-2 country codes ("NL") or UN M49 area codes
// ("155" Western Europe, "150" Europe, "001" World), resolved by [Regions].
// An arrival recorded for an area holds for every country inside it, and
// [Dataset.Arrival] picks the most specific area that contains a place.
//
// # Files
//
// A dataset is read from YAML (*.yaml, *.yml) or TOML (*.toml) files, each
// with a "sources" list and a "materials" list. Decoding is strict: an
// unknown key, a date that is not EDTF, a source key or place that does not
// exist, a duplicate id or name, a bad kind or basis, or an allowance on a
// milestone other than withdrawn is an [*Error] naming the file, line and
// column, with a hint where one fits. A file with several problems yields an
// [ErrorList] holding each of them.
//
// The dataset files keep to a plain subset of YAML (block mappings and
// lists, one-line flow lists and mappings, quoted and plain scalars); a
// quick reader takes that subset and hands anything else to the general
// YAML decoder, which gives the same tree. TOML files are read into the
// same tree, with the line of each table and key.
//
// The built-in dataset is embedded in the binary and parsed once, on first
// use, by [Builtin]; after that it is only read. It is read from a snapshot
// of the validated YAML files, made by go generate and embedded beside
// them, which takes about a millisecond where the strict YAML load takes
// several; the snapshot records a checksum of each file it was made from,
// and when the embedded files no longer match, [Builtin] reads the YAML
// strictly instead. [Load], [LoadFile] and a user's files always take the
// strict path. A user's own file is laid
// over it with [Dataset.Extend] or [Overlay]: an entry with the same id
// replaces the built-in one, and the notes returned say which.
//
// # Limits
//
// The dataset is as good as its sources. Dates of first making, sale and
// arrival are lower bounds of availability, not of use; end dates are weak
// because stocks linger. Lookup folds case, accents, hyphens, spaces and
// punctuation, but does not guess at spelling: a miss is a [*NotFoundError]
// with the nearest names, never a silent best match. The accent folding
// covers the Latin letters of the European languages; other scripts are
// compared as written, without case.
package materials

import (
	"terminus/constraint/date"
)

// Kind is the kind of a milestone.
type Kind string

// The milestone kinds, in the order a material's history runs.
const (
	// KindMade is first existence anywhere: discovery, synthesis or the
	// earliest known use.
	KindMade Kind = "made"
	// KindSold is the first commercial manufacture or sale as a colorant.
	KindSold Kind = "sold"
	// KindArrived is the first availability in a place.
	KindArrived Kind = "arrived"
	// KindWithdrawn is the end of manufacture, or a ban; with a place, in
	// that place only.
	KindWithdrawn Kind = "withdrawn"
	// KindAttested is a securely dated object or context in which the
	// material was identified: evidence that it existed by then (and, with
	// a place, was at hand there). It bounds nothing by itself; it caps the
	// lower bounds of the other kinds, which must never be later.
	KindAttested Kind = "attested"
)

// Kinds lists the milestone kinds in order.
func Kinds() []Kind { return []Kind{KindMade, KindSold, KindArrived, KindWithdrawn, KindAttested} }

// Basis says how a milestone's date was taken from its source.
type Basis string

// The bases.
const (
	// BasisDocumented: the writer of the entry read the claim in the source.
	BasisDocumented Basis = "documented"
	// BasisFromMemory: the claim is attributed to the source from memory.
	BasisFromMemory Basis = "from-memory"
)

// Classes are the values a material's class may take.
func Classes() []string {
	return []string{"pigment", "dye", "lake", "ink", "binder", "filler", "brightener", "support"}
}

// SourceTypes are the kinds of publication a source may be, the scholarly
// ones first: a journal or conference paper or thesis, a book or handbook,
// a museum, library or archive publication, a reference work (encyclopedia,
// thesaurus), an official text (patent, law, standard, government report,
// the Colour Index), a trade publication (catalogue, maker's printed
// literature), then the web pages of a company, a news site, a blog, a
// forum, a shop, and any other web page.
func SourceTypes() []string {
	return []string{"paper", "book", "museum", "reference", "official", "trade", "company", "news", "blog", "forum", "shop", "web"}
}

// WeakSource reports whether a source type is a weak one for a report that
// a court or a curator reads: a company, news, blog, forum, shop or other
// web page.
func WeakSource(typ string) bool {
	switch typ {
	case "company", "news", "blog", "forum", "shop", "web":
		return true
	}
	return false
}

// SourceClass groups a source type for statistics: scholarly (paper, book,
// museum, official), encyclopedia (reference), trade, web (the weak types),
// or unclassified.
func SourceClass(typ string) string {
	switch typ {
	case "paper", "book", "museum", "official":
		return "scholarly"
	case "reference":
		return "encyclopedia"
	case "trade":
		return "trade"
	case "":
		return "unclassified"
	}
	if WeakSource(typ) {
		return "web"
	}
	return "unclassified"
}

// Origins are the values a material's origin may take.
func Origins() []string {
	return []string{"natural", "mineral", "synthetic", "semi-synthetic"}
}

// Source is one entry of the dataset's bibliography.
type Source struct {
	Key  string // unique across the dataset
	Cite string // the full citation: authors, title, publisher or journal, year, pages
	URL  string // optional address
	// Type is what kind of publication it is, one of [SourceTypes]; empty
	// when a user's file does not say.
	Type string

	File string // where it was defined
	Line int

	col int
}

// ColourIndex is a Colour Index International generic name and constitution
// number.
type ColourIndex struct {
	Name   string // "Pigment Blue 27"
	Number string // "77510", or with a suffix "58000:1"
}

// Milestone is one dated claim about a material.
type Milestone struct {
	Kind   Kind
	Date   date.Date
	Place  string // ISO 3166-1 alpha-2 or UN M49 area code; empty for "anywhere"
	Source string // a key into the bibliography
	Basis  Basis
	Note   string
	// Allowance is the time stocks may have lingered after a withdrawal;
	// only withdrawn milestones carry it.
	Allowance *date.Duration
	// Object names the dated object or context of an attestation; only
	// attested milestones carry it.
	Object string

	File         string
	Line, Column int

	sourceLine, sourceCol int // where the source key is written
}

// Material is one entry of the dataset.
type Material struct {
	ID          string   // lower case letters, digits and hyphens
	Names       []string // synonyms and trade names, any language; the first is the display name
	Class       string   // one of [Classes]
	Origin      string   // one of [Origins]
	ColourIndex *ColourIndex
	CAS         string // CAS Registry Number, "14038-43-8"
	Formula     string
	Note        string
	// Markers are the compounds or phases an analysis identifies that this
	// material carries ("carminic acid", "indigotin"); Families are names
	// the trade gives a group of materials it belongs to ("carbon black",
	// "ultramarine"). A finding that names either is read as every material
	// that carries it (see [Dataset.Resolve]).
	Markers    []string
	Families   []string
	Milestones []Milestone

	File string
	Line int

	col  int      // column of the entry, for messages
	keys []string // folded id and names, as the loader computed them
}

// foldedNames returns the lookup keys of the id and of every name, in that
// order.
func (m *Material) foldedNames() []string {
	if len(m.keys) == len(m.Names)+1 {
		return m.keys
	}
	keys := make([]string, 0, len(m.Names)+1)
	keys = append(keys, fold(m.ID))
	for _, n := range m.Names {
		keys = append(keys, fold(n))
	}
	return keys
}

// Name returns the material's display name: its first name, or its id.
func (m *Material) Name() string {
	if len(m.Names) > 0 {
		return m.Names[0]
	}
	return m.ID
}

// Claims returns the milestones of kind k (and, when place is not empty, of
// that place), in dataset order.
func (m *Material) Claims(k Kind, place string) []Milestone {
	var out []Milestone
	for _, ms := range m.Milestones {
		if ms.Kind == k && (place == "" || ms.Place == place) {
			out = append(out, ms)
		}
	}
	return out
}

// Dataset is a loaded set of materials with its bibliography and region
// table. A Dataset is not changed after loading; functions that combine
// datasets return new ones.
type Dataset struct {
	Materials []*Material // in file order, files sorted by name
	Sources   []Source
	Regions   *Regions

	// Version is the dataset version: the built-in [DataVersion], with
	// "+local" when a user's files were laid over it.
	Version string
	// SHA256 is the hex digest over the files read (sorted by name, name and
	// content), so that a report can say exactly which data it used.
	SHA256 string
	// Files are the names of the files read, sorted.
	Files []string

	index    *index
	sources  map[string]int
	fileData []fileDigest
}

// DataVersion is the version of the built-in dataset.
const DataVersion = "2026.12"

// Source returns the bibliography entry for key.
func (d *Dataset) Source(key string) (Source, bool) {
	if d.sources == nil { // a dataset put together by hand
		for _, s := range d.Sources {
			if s.Key == key {
				return s, true
			}
		}
		return Source{}, false
	}
	if i, ok := d.sources[key]; ok {
		return d.Sources[i], true
	}
	return Source{}, false
}

// Arrival returns the arrived claims of m for the most specific area that
// contains place: place itself first, then its intermediate region,
// sub-region, region and the world ("001"). It returns nil and "" when no
// area containing place has an arrival, or when place is unknown.
func (d *Dataset) Arrival(m *Material, place string) (claims []Milestone, area string) {
	if area = d.ArrivalArea(m, place); area == "" {
		return nil, ""
	}
	return m.Claims(KindArrived, area), area
}

// ArrivalArea returns the area whose arrival claims [Dataset.Arrival]
// would return for m at place (the most specific one that has any), or ""
// when there are none; it allocates nothing.
func (d *Dataset) ArrivalArea(m *Material, place string) string {
	if m == nil || d.Regions == nil || !m.hasArrivals() {
		return ""
	}
	for code := place; d.Regions.Valid(code); code = d.Regions.Parent(code) {
		for i := range m.Milestones {
			if ms := &m.Milestones[i]; ms.Kind == KindArrived && ms.Place == code {
				return code
			}
		}
	}
	return ""
}

func (m *Material) hasArrivals() bool { return m.has(KindArrived) }

func (m *Material) has(k Kind) bool {
	for i := range m.Milestones {
		if m.Milestones[i].Kind == k {
			return true
		}
	}
	return false
}

// WithdrawalArea returns the area whose withdrawn claims bound m for an
// object made at place: the most specific area containing place that has
// any ("001" and no place at all stand for the whole world, and come
// last). A withdrawal in one country bounds only what was made there; an
// object of unknown place is bounded only by worldwide ones. ok is false
// when no withdrawal applies; the world is returned as "".
func (d *Dataset) WithdrawalArea(m *Material, place string) (area string, ok bool) {
	if m == nil || !m.has(KindWithdrawn) {
		return "", false
	}
	if d.Regions != nil && place != "" {
		for code := place; d.Regions.Valid(code) && code != "001"; code = d.Regions.Parent(code) {
			for i := range m.Milestones {
				if ms := &m.Milestones[i]; ms.Kind == KindWithdrawn && ms.Place == code {
					return code, true
				}
			}
		}
	}
	for i := range m.Milestones {
		if ms := &m.Milestones[i]; ms.Kind == KindWithdrawn && (ms.Place == "" || ms.Place == "001") {
			return "", true
		}
	}
	return "", false
}

// InArea reports whether a milestone's place lies in area ("" for the
// world, which holds every milestone).
func (d *Dataset) InArea(ms *Milestone, area string) bool {
	switch {
	case area == "" || area == "001":
		return true
	case ms.Place == "" || ms.Place == "001":
		return false
	case d.Regions == nil:
		return ms.Place == area
	}
	return d.Regions.Within(ms.Place, area)
}
