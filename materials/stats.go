package materials

import (
	"regexp"
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
		ArrivedByRegion: map[string]int{}, ArrivedByPlace: map[string]int{},
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
		for _, ms := range m.Milestones {
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
			}
			seen[kp{ms.Kind, ms.Place}]++
			if seen[kp{ms.Kind, ms.Place}] == 2 {
				disagree = true
			}
		}
		if disagree {
			s.Disagreeing++
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
