package materials

import (
	"regexp"

	"terminus/constraint/date"
)

// Stats are the counts that show how far a dataset reaches and how well it
// is sourced.
type Stats struct {
	Materials int
	ByClass   map[string]int
	ByOrigin  map[string]int

	Milestones int
	ByKind     map[Kind]int
	Documented int // basis documented
	FromMemory int // basis from-memory
	// DocumentedLocated counts documented milestones whose source's cite
	// names a page, section, chapter or entry.
	DocumentedLocated int

	// ArrivedByRegion counts arrived milestones by the top-level M49 region
	// ("150" Europe …; "001" for the world itself) of their place.
	ArrivedByRegion map[string]int
	// ArrivedByPlace counts arrived milestones by place as written.
	ArrivedByPlace map[string]int
	Withdrawn      int

	// Attested counts attestations, AttestedMaterials the materials that
	// have one.
	Attested          int
	AttestedMaterials int
	// Markers and Families count the group names.
	Markers, Families int

	// BySourceClass counts milestones by the class of their source
	// ([SourceClass]: scholarly, encyclopedia, trade, web, unclassified).
	BySourceClass map[string]int
	// WeakAlone counts milestones that rest on a weak source alone: their
	// source is a company, news, blog, forum, shop or other web page, and
	// no milestone of the same material, kind and place from a stronger
	// source overlaps their date.
	WeakAlone int

	// Disagreeing counts materials with two or more claims of the same kind
	// and place: sources that disagree.
	Disagreeing int

	Sources      int
	SourcesCited int
}

// DocumentedShare is the share of milestones with basis documented (0 when
// there are none).
func (s Stats) DocumentedShare() float64 { return share(s.Documented, s.Milestones) }

// LocatedShare is the share of documented milestones whose cite names a
// page or section.
func (s Stats) LocatedShare() float64 { return share(s.DocumentedLocated, s.Documented) }

func share(n, of int) float64 {
	if of == 0 {
		return 0
	}
	return float64(n) / float64(of)
}

// locator finds a page, section, chapter, column or entry in a citation:
// "pp. 120-125", "p. 47", "section 3.2", "§ 4", "ch. 5", "s.v. madder".
var locator = regexp.MustCompile(`(?i)(\bpp?\.\s*[0-9ivxlcdm]|\bpages?\s+[0-9ivxlcdm]|\bsections?\s+\S|\bsect\.\s*\S|§\s*\S|\bchapters?\s+\S|\bch\.\s*[0-9ivxlcdm]|\bs\.\s?v\.|\bcols?\.\s*[0-9]|\bentry\s+\S|\bentries\s+\S|\babstract\b|\bscope note\b|\bpassage on\b|\bopening paragraphs?\b|\brecipe\s+\S|\bbook\s+[0-9ivxlcdm]+\b|\barticle\s+["'A-Z]|\bnote on\b|\bpages?\s+\S|\bwhole article\b|\bopening extract\b|\bparagraphs?\s+on\b|\bcaptions\b|\btext of the episode\b)`)

// HasLocator reports whether a citation names where in the source the
// claim stands: a page, section, chapter, column or entry, or for a short
// text its abstract, scope note, a named passage, paragraph, recipe or
// note.
func HasLocator(cite string) bool { return locator.MatchString(cite) }

// Stats counts d's materials and milestones.
func (d *Dataset) Stats() Stats {
	s := Stats{
		ByClass: map[string]int{}, ByOrigin: map[string]int{}, ByKind: map[Kind]int{},
		ArrivedByRegion: map[string]int{}, ArrivedByPlace: map[string]int{}, BySourceClass: map[string]int{},
	}
	for _, g := range d.Groups() {
		if g.Kind == GroupMarker {
			s.Markers++
		} else {
			s.Families++
		}
	}
	typeOf := make(map[string]string, len(d.Sources))
	for _, src := range d.Sources {
		typeOf[src.Key] = src.Type
	}
	located := map[string]bool{}
	for _, src := range d.Sources {
		located[src.Key] = HasLocator(src.Cite)
	}
	cited := map[string]bool{}
	for _, m := range d.Materials {
		s.Materials++
		s.ByClass[m.Class]++
		s.ByOrigin[m.Origin]++
		type kp struct {
			k     Kind
			place string
		}
		seen := map[kp]int{}
		disagree := false
		attested := false
		for i := range m.Milestones {
			ms := &m.Milestones[i]
			s.BySourceClass[SourceClass(typeOf[ms.Source])]++
			if WeakSource(typeOf[ms.Source]) && !backedUp(m, i, typeOf) {
				s.WeakAlone++
			}
			s.Milestones++
			s.ByKind[ms.Kind]++
			cited[ms.Source] = true
			switch ms.Basis {
			case BasisDocumented:
				s.Documented++
				if located[ms.Source] {
					s.DocumentedLocated++
				}
			case BasisFromMemory:
				s.FromMemory++
			}
			switch ms.Kind {
			case KindArrived:
				s.ArrivedByPlace[ms.Place]++
				if d.Regions != nil {
					s.ArrivedByRegion[d.Regions.Region(ms.Place)]++
				}
			case KindWithdrawn:
				s.Withdrawn++
			case KindAttested:
				s.Attested++
				attested = true
			}
			seen[kp{ms.Kind, ms.Place}]++
			if seen[kp{ms.Kind, ms.Place}] == 2 {
				disagree = true
			}
		}
		if disagree {
			s.Disagreeing++
		}
		if attested {
			s.AttestedMaterials++
		}
	}
	s.Sources = len(d.Sources)
	for _, src := range d.Sources {
		if cited[src.Key] {
			s.SourcesCited++
		}
	}
	return s
}

// backedUp reports whether milestone i of m is backed up by another of the
// same kind and place, from a source that is not weak, whose date overlaps
// its own.
func backedUp(m *Material, i int, typeOf map[string]string) bool {
	ms := &m.Milestones[i]
	for j := range m.Milestones {
		o := &m.Milestones[j]
		if j == i || o.Kind != ms.Kind || o.Place != ms.Place || WeakSource(typeOf[o.Source]) || typeOf[o.Source] == "" {
			continue
		}
		if overlaps(ms.Date, o.Date) {
			return true
		}
	}
	return false
}

// overlaps reports whether two dates share a day (open ends reach out).
func overlaps(a, b date.Date) bool {
	aFirst, aHasFirst := a.Earliest()
	aLast, aHasLast := a.Latest()
	bFirst, bHasFirst := b.Earliest()
	bLast, bHasLast := b.Latest()
	return (!aHasFirst || !bHasLast || aFirst <= bLast) && (!bHasFirst || !aHasLast || bFirst <= aLast)
}
