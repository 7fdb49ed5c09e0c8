package materials_test

import (
	"testing"

	"terminus/materials"
)

// pigmentsFile is the family file these checks cover: twentieth-century
// organic pigments (arylide and diarylide yellows, beta-naphthol and BON-acid
// reds, perylenes, isoindolines, quinacridone variants and others) and the
// later mixed-metal-oxide and sulphide inorganics.
const pigmentsFile = "modern-organic-pigments.yaml"

// TestPigmentsAgainstSources checks that the embedded dataset holds dates as
// the named published sources give them. One row per value; the source and
// the place in it stand beside the value. Rows written from memory say so.
func TestPigmentsAgainstSources(t *testing.T) {
	d := checkBuiltin(t)
	rows := []sourceRow{
		// Heritage Science 2022 (Das Deutsche Farbenbuch, 1925), Table 1: Pigment Red 4 discovered 1906.
		{"chlorinated-para-red", materials.KindMade, "", "1906", "Heritage Science 2022, Farbenbuch, Table 1"},
		// Same table: Pigment Red 4 found by Raman in Siegle's oil colour "Echthellrot PR" on a 1925 chart.
		{"chlorinated-para-red", materials.KindAttested, "DE", "1925", "Heritage Science 2022, Farbenbuch, Table 1"},
		// Same table: Pigment Red 57 (BONS) discovered 1903.
		{"lithol-rubine", materials.KindMade, "", "1903", "Heritage Science 2022, Farbenbuch, Table 1"},
		// Same table: Pigment Red 57 (PR57:1?) found by Raman in Turm's watercolour "Karminlack", 1925 chart.
		{"lithol-rubine", materials.KindAttested, "DE", "1925", "Heritage Science 2022, Farbenbuch, Table 1"},
		// Seilnacht, pigment lexicon, Pigment Yellow 74: a successor of the Hansa yellow marketed in 1909.
		{"arylide-yellow-5gx", materials.KindMade, "", "1909/..", "Seilnacht, Brillantgelb PY74, Geschichte"},
		// chsopensource.org, PO 5: dated 1907.
		{"dinitraniline-orange", materials.KindMade, "", "1907", "chsopensource.org, PO 5"},
		// TIB textbook (record 1867460173), Zur Geschichte der Azofarbstoffe: the naphthol azo dyes after chrysoidine (1876); lower bounds only.
		{"parachlor-red", materials.KindMade, "", "1876/..", "TIB textbook 1867460173, history of the azo dyes"},
		{"orthonitraniline-orange", materials.KindMade, "", "1876/..", "TIB textbook 1867460173, history of the azo dyes"},
		{"permanent-red-2b", materials.KindMade, "", "1876/..", "TIB textbook 1867460173, history of the azo dyes"},
		// Chemie der organischen Farbstoffe (TIB record 1860183395), p. 48: the first azo dye, Griess's aminoazobenzene, 1859 (lower bounds).
		{"hansa-yellow-10g", materials.KindMade, "", "1859/..", "Chemie der organischen Farbstoffe, p. 48"},
		{"arylide-yellow-rn", materials.KindMade, "", "1859/..", "Chemie der organischen Farbstoffe, p. 48"},
		{"arylide-yellow-4gx", materials.KindMade, "", "1859/..", "Chemie der organischen Farbstoffe, p. 48"},
		{"arylide-yellow-5gx", materials.KindMade, "", "1859/..", "Chemie der organischen Farbstoffe, p. 48"},
		{"arylide-yellow-fgl", materials.KindMade, "", "1859/..", "Chemie der organischen Farbstoffe, p. 48"},
		// Christie and Abel, Monoazo pigments based on acetoacetanilides, abstract: on the market from the early twentieth century.
		{"arylide-yellow-rn", materials.KindSold, "", "19XX", "Christie and Abel, monoazo acetoacetanilides, abstract"},
		{"arylide-yellow-4gx", materials.KindSold, "", "19XX", "Christie and Abel, monoazo acetoacetanilides, abstract"},
		{"arylide-yellow-5gx", materials.KindSold, "", "19XX", "Christie and Abel, monoazo acetoacetanilides, abstract"},
		{"arylide-yellow-fgl", materials.KindSold, "", "19XX", "Christie and Abel, monoazo acetoacetanilides, abstract"},
		// Meldola 1891, benzidine colours: the first disazo colours derived from benzidine, Böttiger 1884 (lower bounds).
		{"diarylide-yellow-aaa", materials.KindMade, "", "1884/..", "Meldola 1891, azo scarlets and benzidine colours"},
		{"diarylide-yellow-aamx", materials.KindMade, "", "1884/..", "Meldola 1891, azo scarlets and benzidine colours"},
		{"diarylide-yellow-aaot", materials.KindMade, "", "1884/..", "Meldola 1891, azo scarlets and benzidine colours"},
		{"diarylide-yellow-hr", materials.KindMade, "", "1884/..", "Meldola 1891, azo scarlets and benzidine colours"},
		// Christie and Abel 2021, diarylide yellows, abstract: commercialised in the early twentieth century.
		{"diarylide-yellow-aamx", materials.KindSold, "", "19XX", "Christie and Abel 2021, diarylides, abstract"},
		{"diarylide-yellow-aaot", materials.KindSold, "", "19XX", "Christie and Abel 2021, diarylides, abstract"},
		{"diarylide-yellow-hr", materials.KindSold, "", "19XX", "Christie and Abel 2021, diarylides, abstract"},
		// sandrinemaugy.com (2016), perylene family: the first perylene discovered in 1912.
		{"perylene-scarlet", materials.KindMade, "", "1912/..", "sandrinemaugy.com 2016, perylene family"},
		{"perylene-maroon", materials.KindMade, "", "1912/..", "sandrinemaugy.com 2016, perylene family"},
		{"perylene-red-190", materials.KindMade, "", "1912/..", "sandrinemaugy.com 2016, perylene family"},
		{"perylene-dianhydride", materials.KindMade, "", "1912/..", "sandrinemaugy.com 2016, perylene family"},
		{"perylene-violet", materials.KindMade, "", "1912/..", "sandrinemaugy.com 2016, perylene family"},
		{"perylene-green", materials.KindMade, "", "1912/..", "sandrinemaugy.com 2016, perylene family"},
		{"perylene-black-32", materials.KindMade, "", "1912/..", "sandrinemaugy.com 2016, perylene family"},
		// BASF, US patent 8,026,361 (filed 2007): PY185 known for about 30 years, on the market for about 25.
		{"isoindoline-yellow-185", materials.KindMade, "", "1977~", "US 8,026,361, description"},
		{"isoindoline-yellow-185", materials.KindSold, "", "1982~", "US 8,026,361, description"},
		// handprint.com, magenta page: PR122 quinacridone magenta printed with 1958 (meaning not stated).
		{"quinacridone-magenta-122", materials.KindSold, "", "1958?", "handprint.com, magenta pigments"},
		// Christie and Abel, Physical Sciences Reviews 2021, disazopyrazolones, abstract: PO13, the first
		// of the series, discovered in 1910 and made a commercial product some twenty years later.
		{"pyrazolone-orange-13", materials.KindMade, "", "1910", "Christie and Abel 2021, disazopyrazolones, abstract"},
		{"pyrazolone-orange-13", materials.KindSold, "", "1930~", "Christie and Abel 2021, disazopyrazolones, abstract"},
		{"pyrazolone-orange-34", materials.KindMade, "", "1910/..", "Christie and Abel 2021, disazopyrazolones, abstract"},
		{"pyrazolone-red-38", materials.KindMade, "", "1910/..", "Christie and Abel 2021, disazopyrazolones, abstract"},
		// Christie and Abel, Physical Sciences Reviews 2021, carbonyl pigments, abstract: anthraquinonoids
		// discovered in the early twentieth century as vat dyes.
		{"anthraquinoid-red-177", materials.KindMade, "", "19XX", "Christie and Abel 2021, carbonyl pigments, abstract"},
		{"anthraquinone-yellow-147", materials.KindMade, "", "19XX", "Christie and Abel 2021, carbonyl pigments, abstract"},
		{"dibromanthanthrone", materials.KindMade, "", "19XX", "Christie and Abel 2021, carbonyl pigments, abstract"},
		// Pugin (Geigy), US patent 2,973,358, tetrachloro-imino-isoindolinone derivatives, application of 1957.
		{"isoindolinone-yellow-109", materials.KindMade, "", "1957/..", "US 2,973,358, bibliographic section"},
		{"isoindolinone-yellow-110", materials.KindMade, "", "1957/..", "US 2,973,358, bibliographic section"},
		// Wikipedia, Quinacridone, section Derivatives: quinacridones first sold as pigments by Du Pont in 1958.
		{"quinacridone-magenta-122", materials.KindSold, "", "1958/..", "Wikipedia, Quinacridone, Derivatives"},
		{"quinacridone-magenta-202", materials.KindSold, "", "1958/..", "Wikipedia, Quinacridone, Derivatives"},
		{"quinacridone-burnt-orange", materials.KindSold, "", "1958/..", "Wikipedia, Quinacridone, Derivatives"},
		{"quinacridone-gold", materials.KindSold, "", "1958/..", "Wikipedia, Quinacridone, Derivatives"},
		// Spanish Wikipedia, Amarillo Hansa, Historia: the Hansa yellows (PY1, 3, 5, 10) appeared in Germany from 1911.
		{"hansa-yellow-10g", materials.KindSold, "", "1911", "Spanish Wikipedia, Amarillo Hansa, Historia"},
		// German Wikipedia, Mischphasenoxidpigment, Titanat-Pigmente: the rutile titanates, no date.
		{"chrome-titanate-yellow", materials.KindMade, "", "19XX", "de.wikipedia, Mischphasenoxidpigment"},
		{"nickel-titanate-yellow", materials.KindMade, "", "19XX", "de.wikipedia, Mischphasenoxidpigment"},

		// From memory, not read here: Herbst and Hunger, Industrial Organic Pigments.
		{"diarylide-yellow-aaa", materials.KindSold, "", "1935~", "Herbst and Hunger 2004 (from memory)"},
		// TIB textbook (record 1867460173): the naphthol azo dyes after chrysoidine (1876); lower bound.
		{"dinitraniline-orange", materials.KindMade, "", "1876/..", "TIB textbook 1867460173, history of the azo dyes"},
		{"naphthol-red-f3rk", materials.KindMade, "", "1960/1969", "Herbst and Hunger 2004 (from memory)"},
		{"perylene-scarlet", materials.KindMade, "", "1913/..", "Herbst and Hunger 2004 (from memory)"},
		{"perylene-maroon", materials.KindMade, "", "1913/..", "Herbst and Hunger 2004 (from memory)"},
		{"perylene-red-190", materials.KindMade, "", "1913/..", "Herbst and Hunger 2004 (from memory)"},
		{"perylene-violet", materials.KindMade, "", "1913/..", "Herbst and Hunger 2004 (from memory)"},
		{"perinone-orange", materials.KindMade, "", "1924~", "Herbst and Hunger 2004 (from memory)"},
		{"isoindoline-yellow-139", materials.KindMade, "", "1960/1979", "Herbst and Hunger 2004 (from memory)"},
		{"isoindoline-orange-69", materials.KindMade, "", "1960/1989", "Herbst and Hunger 2004 (from memory)"},
		{"quinacridone-magenta-122", materials.KindMade, "", "1896/..", "Herbst and Hunger 2004 (from memory)"},
		{"quinacridone-magenta-202", materials.KindMade, "", "1896/..", "Herbst and Hunger 2004 (from memory)"},
		{"quinacridone-burnt-orange", materials.KindMade, "", "1896/..", "Herbst and Hunger 2004 (from memory)"},
		{"quinacridone-gold", materials.KindMade, "", "1896/..", "Herbst and Hunger 2004 (from memory)"},
		{"nickel-azo-yellow", materials.KindMade, "", "1960/1979", "Herbst and Hunger 2004 (from memory)"},
		{"nickel-azo-green", materials.KindMade, "", "19XX", "Herbst and Hunger 2004 (from memory)"},
		{"cobalt-titanate-green", materials.KindMade, "", "19XX", "Herbst and Hunger 2004 (from memory)"},
		{"cerium-sulphide", materials.KindMade, "", "19XX", "Herbst and Hunger 2004 (from memory)"},
		// Elsevier 2001 abstract on gamma-Ce2S3: used as a safe red pigment for plastics by 2001 (start open).
		{"cerium-sulphide", materials.KindSold, "", "../2001", "Elsevier 2001 abstract, gamma-Ce2S3"},
	}
	checkSourceRows(t, d, pigmentsFile, rows)
}

// TestPigmentsNames checks that the pigments resolve by the names the trade
// uses: Colour Index short and long forms, and trade names.
func TestPigmentsNames(t *testing.T) {
	d := checkBuiltin(t)
	checkNames(t, d, []nameRow{
		{"PY3", "hansa-yellow-10g"},
		{"Pigment Yellow 3", "hansa-yellow-10g"},
		{"lithol rubine", "lithol-rubine"},
		{"PR57", "lithol-rubine"},
		{"PR57:1", "lithol-rubine"},
		{"PR48:2", "permanent-red-2b"},
		{"PR170", "naphthol-red-f3rk"},
		{"PO5", "dinitraniline-orange"},
		{"PV29", "perylene-violet"},
		{"PBk31", "perylene-green"},
		{"PY139", "isoindoline-yellow-139"},
		{"PY150", "nickel-azo-yellow"},
		{"PBr24", "chrome-titanate-yellow"},
		{"PY53", "nickel-titanate-yellow"},
		{"PG50", "cobalt-titanate-green"},
	})
}

// TestPigmentsFileShape checks what every family file promises (see
// checkFamilyFile) for this family, with at least 42 materials, and that
// every material is a synthetic pigment with a Colour Index name (cerium
// sulphide excepted, see its note).
func TestPigmentsFileShape(t *testing.T) {
	for _, m := range checkFamilyFile(t, checkBuiltin(t), pigmentsFile, 42) {
		if m.Class != "pigment" || m.Origin != "synthetic" {
			t.Errorf("%s: class %q origin %q, want a synthetic pigment", m.ID, m.Class, m.Origin)
		}
		if m.ColourIndex == nil && m.ID != "cerium-sulphide" {
			t.Errorf("%s has no Colour Index name", m.ID)
		}
	}
}
