package materials_test

import (
	"strings"
	"testing"

	"terminus/materials"
)

// antiquityFile is the family file these checks cover.
const antiquityFile = "antiquity-natural.yaml"

// TestAntiquityAgainstSources checks that the embedded dataset holds dates
// as the named published sources give them. One row per value; the source
// and the place in it stand beside the value. Dates are EDTF in
// astronomical years (2000 BCE = -1999).
func TestAntiquityAgainstSources(t *testing.T) {
	d := checkBuiltin(t)
	rows := []sourceRow{
		// Wikipedia, "Rubia tinctorum", section History: madder-dyed cotton from Mohenjo-daro, 3rd millennium BCE.
		{"madder", materials.KindMade, "", "-2999/-2000", "Wikipedia, Rubia tinctorum, History"},
		// Cesaratto, Luo, Smith and Leona, Heritage Science 6 (2018), abstract: imported carmine replaced safflower early in 1869.
		{"cochineal-carmine", materials.KindArrived, "JP", "1869", "Cesaratto et al. 2018, abstract"},
		// Wikipedia, "Lead-tin yellow", section History: no paintings with it after 1750.
		{"lead-tin-yellow-i", materials.KindWithdrawn, "", "1750", "Wikipedia, Lead-tin yellow, History"},
		// Same article, History: type I the standard oil-painting yellow until the 18th century, replaced early in it by Naples yellow.
		{"lead-tin-yellow-i", materials.KindWithdrawn, "", "17XX", "Wikipedia, Lead-tin yellow, History"},
		// Gettens and Stout, Painting Materials (1942), entry Smalt, p. 158: invention about 1540-1560.
		{"smalt", materials.KindMade, "", "1540/1560", "Gettens and Stout 1942, p. 158"},
		// Getty 1995 preprints, pp. 74-76: smalt on a South German painting of about 1400-1500.
		{"smalt", materials.KindMade, "", "14XX", "Getty 1995 preprints, table 2 and text"},
		// Wikipedia, "Han purple and Han blue", lead section: from the Western Zhou period, 1045-771 BCE.
		{"han-blue", materials.KindMade, "", "-1044/-0770", "Wikipedia, Han purple and Han blue, lead"},
		// Gettens and Stout, Painting Materials (1942), p. 140: Egyptian blue manufactured by 2000 BCE.
		{"egyptian-blue", materials.KindMade, "", "-1999", "Gettens and Stout 1942, p. 140"},
		// Wikipedia, "Indian yellow", lead section: commercially unavailable about 1921.
		{"indian-yellow", materials.KindWithdrawn, "", "1921~", "Wikipedia, Indian yellow, lead"},
		// The Cyclopaedia of India, vol. 1, entry Gamboge: piece brought from China by van Neck in 1603.
		{"gamboge", materials.KindArrived, "150", "1603", "Cyclopaedia of India, Gamboge"},
		// Wikipedia, "Tyrian purple", section Background: made until the fall of Constantinople, 1453.
		{"tyrian-purple", materials.KindWithdrawn, "150", "1453", "Wikipedia, Tyrian purple, Background"},
		{"tyrian-purple", materials.KindWithdrawn, "145", "1453", "Wikipedia, Tyrian purple, Background"},
		// Stieglitz, The Biblical Archaeologist 57 (1994), abstract: Minoan sea purple before 1750 BCE.
		{"tyrian-purple", materials.KindMade, "", "-1749~", "Stieglitz 1994, abstract"},
		// Sukenik et al., J. Archaeol. Sci. Reports 57 (2024), abstract: Cave of Skulls textile, radiocarbon 1954-1767 BCE, Kermes vermilio by HPLC.
		{"kermes", materials.KindMade, "", "-1953/-1766", "Sukenik et al. 2024, abstract"},
		// MFA Boston, CAMEO, entry Sepia: watercolour introduced by Seydelmann about 1780.
		{"sepia", materials.KindSold, "", "1780~", "CAMEO, Sepia"},
		// Gettens and Stout, Painting Materials (1942), entry Ultramarine, p. 165: Marco Polo at the mines, 1271.
		{"natural-ultramarine", materials.KindArrived, "150", "1271", "Gettens and Stout 1942, p. 165"},
		// Getty AAT, vermilion (pigment), scope note: the dry process reached Europe about the 8th century.
		{"vermilion", materials.KindArrived, "150", "07XX~", "Getty AAT, vermilion"},
		// Wikipedia, "Lead white", History: the Chinese method reached Japan in the 7th century.
		{"lead-white", materials.KindArrived, "JP", "06XX", "Wikipedia, Lead white, History"},
		// Wikipedia, "Indian yellow", History: Rajput and Mughal miniatures from the 16th century.
		{"indian-yellow", materials.KindMade, "", "15XX", "Wikipedia, Indian yellow, History"},
		// Hansen, The quest for quercitron (MA thesis, Delaware, 2011), abstract: found by Bancroft in 1771.
		{"quercitron", materials.KindMade, "", "1771", "Hansen 2011, abstract"},
		// Hansen 2011, abstract: British patent of 1775.
		{"quercitron", materials.KindSold, "", "1775", "Hansen 2011, abstract"},
		// Hunt, Gold Bulletin 9 (1976), pp. 134-139: a method published by 1659, before Cassius.
		{"purple-of-cassius", materials.KindMade, "", "1659", "Hunt 1976, p. 134"},
		// Getty AAT, purple of Cassius, scope note: first made by Andreas Cassius in 1676.
		{"purple-of-cassius", materials.KindMade, "", "1676", "Getty AAT, purple of Cassius"},
		// Wallert, Hermens and Peek (eds.), Historical Painting Techniques (Getty, 1995), p. 74, table 2: Basohli miniatures 1660-70.
		{"smalt", materials.KindArrived, "IN", "1660/1670", "Getty 1995 preprints, table 2"},
		// MFA Boston, CAMEO, entry Turmeric: imported to Europe in 1612.
		{"turmeric", materials.KindArrived, "150", "1612", "CAMEO, Turmeric"},
		// Scott, Copper and Bronze in Art (Getty, 2002), p. 131: green verditer in a del Cossa of about 1472.
		{"green-verditer", materials.KindMade, "", "1472~", "Scott 2002, p. 131"},
		// Wikipedia, "Reseda luteola", History and usage: out of wide use by the end of the 19th century.
		{"weld", materials.KindWithdrawn, "150", "1899~", "Wikipedia, Reseda luteola"},
		// University of Pennsylvania ACL, object RE-020-107, Historical Use: Egyptian New Kingdom tombs, 16th-11th century BCE.
		{"orpiment", materials.KindMade, "", "-1549/-1069", "UPenn ACL, Orpiment"},
		// Gettens and Stout, Painting Materials (1942), entry Verdigris, p. 169: described by Theophrastus, about 300 BCE.
		{"verdigris", materials.KindMade, "", "-0299~", "Gettens and Stout 1942, p. 169"},
		// Oxford Herbaria, Plants400, Carthamus: oldest safflower dyes outside Egypt on 8th-century Japanese textiles.
		{"safflower", materials.KindArrived, "JP", "07XX", "Oxford Plants400, Carthamus"},
		// Scottish National Dictionary, entry Cudbear: Woodcroft's index of patents, 1758.
		{"cudbear", materials.KindMade, "", "1758", "Scottish National Dictionary, Cudbear"},
		// MFA Boston, CAMEO, entry Mosaic gold: replaced by bronze powders in the mid-19th century.
		{"mosaic-gold", materials.KindWithdrawn, "150", "1850~", "CAMEO, Mosaic gold"},
		// Dodge, Itinerario (2024), title: the Atlantic logwood trade, 1550-1775.
		{"logwood", materials.KindArrived, "150", "1550~", "Dodge 2024, title and abstract"},
		// Radini et al., Science Advances 5 (2019), abstract: lapis lazuli in dental calculus, Germany, 11th or early 12th century.
		{"natural-ultramarine", materials.KindArrived, "DE", "0997/1162", "Radini et al. 2019, abstract"},
		// Wikipedia, "Mosaic gold", lead section: recipe in Ge Hong's 3rd-century Baopuzi.
		{"mosaic-gold", materials.KindMade, "", "02XX", "Wikipedia, Mosaic gold"},
		// Phipps, Cochineal Red, Met Bulletin 67 (3), 2010, p. 40: the Manila galleons carried cochineal by the 1580s.
		{"american-cochineal", materials.KindArrived, "PH", "158X", "Phipps 2010, p. 40"},
		// Phipps 2010, p. 40: known to the Kangxi emperor by about 1700; shipped to China before the 1700s.
		{"american-cochineal", materials.KindArrived, "CN", "1700~", "Phipps 2010, p. 40"},
		// Phipps 2010, p. 40: in the trade of Siam and Cambodia by the time of the 1765 Canton loadings
		// (an "in trade by" date: no start is given, so the claim is open).
		{"american-cochineal", materials.KindArrived, "TH", "../1765", "Phipps 2010, p. 40"},
		{"american-cochineal", materials.KindArrived, "KH", "../1765", "Phipps 2010, p. 40"},
		// Phipps 2010, p. 44: Persia importing American cochineal by the end of the 16th century.
		{"american-cochineal", materials.KindArrived, "IR", "1600~", "Phipps 2010, p. 44"},
		// Phipps 2010, p. 44: East India Company ships brought it to Turkey in the 17th and 18th centuries.
		{"american-cochineal", materials.KindArrived, "TR", "16XX", "Phipps 2010, p. 44"},
		// Phipps 2010, p. 45: shipped to Surat soon after the English factory of 1612.
		{"american-cochineal", materials.KindArrived, "IN", "161X", "Phipps 2010, p. 45"},
		// Phipps 2010, p. 45: by 1834 (Burnes) it had displaced the Bukhara insect dyes in the Punjab markets
		// (an "in use by" date, so the claim is open).
		{"american-cochineal", materials.KindArrived, "034", "../1834", "Phipps 2010, p. 45"},
		// Kogou et al., Applied Physics A (2015), abstract: cochineal on Canton watercolours dated 1817-1831.
		{"american-cochineal", materials.KindArrived, "CN", "1817/1831", "Kogou et al. 2015, abstract"},
		// Colomban et al., Materials 14 (2021) 7434, abstract: European-recipe Naples yellow on a late Kangxi incense burner.
		{"naples-yellow", materials.KindArrived, "CN", "1700/1722", "Colomban et al. 2021, abstract"},
		// Colomban et al. 2021, abstract: smalt as the cobalt source of a Qianlong-mark ewer, third quarter of the 18th century.
		{"smalt", materials.KindArrived, "CN", "1750/1775", "Colomban et al. 2021, abstract"},
		// Seldes et al., JAIC 38 (1999), Conclusions: smalt in Pérez Holguín's Potosí workshop, late 17th and early 18th centuries.
		{"smalt", materials.KindArrived, "BO", "1675/1725", "Seldes et al. 1999, Conclusions"},
		// Wikipedia (Spanish), "Azul maya", history: Azul Habana of Cuban colonial murals, about 1750-1860.
		{"maya-blue", materials.KindArrived, "CU", "1750~", "Wikipedia (es), Azul maya"},
		// Yun and Chang, Journal of Conservation Science 32 (2016), abstract: smalt in Joseon portraits of the late 18th century.
		{"smalt", materials.KindArrived, "KR", "1750/1799", "Yun and Chang 2016, abstract"},
		// Seldes et al., JAIC 41 (2002), 3.1.1: Pisarro's copper resinate at Yavi; cardenillo varnish in 18th-century Cuzco.
		{"copper-resinate", materials.KindArrived, "AR", "1667/1720", "Seldes et al. 2002, 1 and 3.1.1"},
		{"copper-resinate", materials.KindArrived, "PE", "17XX", "Seldes et al. 2002, 3.1.1"},
		// Gómez et al., e-Preservation Science 7 (2010), abstract: copper resinate on an 18th-century Jesuit mission sculpture.
		{"copper-resinate", materials.KindArrived, "PY", "17XX", "Gómez et al. 2010, abstract"},
		// Burgio et al., Studies in Conservation 52 (2007), abstract: copper resinate on a 17th-century Chinese Coromandel screen.
		{"copper-resinate", materials.KindArrived, "CN", "16XX", "Burgio et al. 2007, abstract"},
		// Han et al., Humanities and Social Sciences Communications 9 (2022), abstract: synthetic lead white at Liangdaicun, 8th century BCE.
		{"lead-white", materials.KindMade, "", "-0799/-0700", "Han et al. 2022, abstract"},
		// Han et al. 2022, abstract: the corrosion method appeared in Greece in the 4th century BCE.
		{"lead-white", materials.KindArrived, "150", "-03XX", "Han et al. 2022, abstract"},
		// Han et al. 2022, introduction: Egyptian blue about 3200 BCE (written as a range around the round figure).
		{"egyptian-blue", materials.KindMade, "", "-3299/-3100", "Han et al. 2022, introduction"},
		// Dyer, Tamburini and Sotiropoulou, Dyes and Pigments (2018), abstract: 3rd-century BCE oinochoe from Canosa.
		{"egyptian-blue", materials.KindArrived, "IT", "-0299/-0200", "Dyer et al. 2018, abstract"},
		{"lac-dye", materials.KindArrived, "150", "-0299/-0200", "Dyer et al. 2018, abstract"},
		{"madder-lake", materials.KindArrived, "150", "-0299/-0200", "Dyer et al. 2018, abstract"},
		// Brysbaert, Studies in Conservation 51 (2006), abstract: lazurite in 13th-century BCE wall paintings from Gla.
		{"natural-ultramarine", materials.KindMade, "", "-1299/-1200", "Brysbaert 2006, abstract"},
		{"natural-ultramarine", materials.KindArrived, "150", "-1299/-1200", "Brysbaert 2006, abstract"},
		// Seccaroni and Jung, Acta Via Serica 7 (2022), abstract: wall paintings of the 2nd to 10th century CE.
		{"natural-ultramarine", materials.KindMade, "", "0101/0200", "Seccaroni and Jung 2022, abstract"},
		// Shui et al., Heritage Science 10 (2022), abstract: Five Dynasties murals of Mogao Cave 256.
		{"natural-ultramarine", materials.KindArrived, "CN", "0907/0960", "Shui et al. 2022, abstract"},
		// Moon, Lee and Lee, Minerals 11 (2021), abstract: Afrasiab murals, presumed mid-7th century.
		{"natural-ultramarine", materials.KindArrived, "UZ", "0625/0675", "Moon et al. 2021, abstract"},
		// Cortea et al., Heritage 7 (2024), abstract: lazurite in Roman Dacia (province span 106-271, conventional).
		{"natural-ultramarine", materials.KindArrived, "RO", "0106/0271", "Cortea et al. 2024, abstract"},
		// Wallert, Hermens and Peek (eds.), Getty 1995, p. 74: smalt at the Chora, 1325-1453.
		{"smalt", materials.KindMade, "", "1325/1453", "Getty 1995 preprints, p. 74"},
		// Shui et al. 2022, abstract: smalt on Qing statues repainted in the first half of the 19th century.
		{"smalt", materials.KindArrived, "CN", "1800/1850", "Shui et al. 2022, abstract"},
		// Zech-Matterne and Leconte, Vegetation History and Archaeobotany 19 (2010), abstract: woad back to the Neolithic.
		{"woad", materials.KindMade, "", "../-2199", "Zech-Matterne and Leconte 2010, abstract"},
		// PLOS ONE (2025) e0321262, abstract: woad leaves processed 34,000-32,000 years ago.
		{"woad", materials.KindMade, "", "Y-32050/Y-30050", "PLOS ONE 2025, abstract"},
		// UCL Digital Egypt, Cosmetic materials: malachite and pyrolusite in predynastic burials (period dates conventional).
		{"malachite", materials.KindMade, "", "-4399/-3100", "UCL Digital Egypt, Cosmetic materials"},
		{"manganese-black", materials.KindArrived, "EG", "-4399/-3100", "UCL Digital Egypt, Cosmetic materials"},
		// National Gallery of Art, Japan: The Shaping of Daimyo Culture (1988), cat. 266, p. 345: cochineal jinbaori.
		{"american-cochineal", materials.KindArrived, "JP", "../1602", "NGA 1988, cat. 266"},
		// Phipps 2010, p. 40: cochineal traded at Manila for Chinese goods by the 1580s.
		{"american-cochineal", materials.KindArrived, "CN", "158X", "Phipps 2010, p. 40"},
		// Splitstoser et al., Science Advances 2 (2016), abstract: indigo at Huaca Prieta, and Fifth Dynasty Egypt.
		{"natural-indigo", materials.KindMade, "", "-4249/-3999", "Splitstoser et al. 2016, abstract"},
		{"natural-indigo", materials.KindMade, "", "-2493/-2344", "Splitstoser et al. 2016, abstract"},
		// Wikipedia, "Isatis tinctoria": Indian indigo known in Europe since Roman times.
		{"natural-indigo", materials.KindArrived, "150", "-0099/0399", "Wikipedia, Isatis tinctoria"},
		// Metropolitan Museum of Art, record 736486: indigo-dyed Tellem textiles from the 11th century.
		{"natural-indigo", materials.KindArrived, "ML", "1001/1100", "Met Museum, record 736486"},
		// Wikipedia, "Dragon's blood": known to the Romans.
		{"dragons-blood", materials.KindArrived, "150", "00XX", "Wikipedia, Dragon's blood"},
		// Wikipedia, "Turmeric", History: medieval Europe; Assyrian texts of the 7th century BCE.
		{"turmeric", materials.KindArrived, "150", "0500/1499", "Wikipedia, Turmeric"},
		{"turmeric", materials.KindArrived, "IQ", "-0699/-0600", "Wikipedia, Turmeric"},
		// Kelsey Museum, Ancient Color: realgar ingots in a 1st-century BCE wreck off Marseille.
		{"realgar", materials.KindArrived, "150", "-0099/0000", "Kelsey Museum, Ancient Color"},
		// Raman spectroscopic analysis of ancient Egyptian pigments, abstract: realgar with pararealgar in a Tell el-Amarna specimen, about 1340 BCE.
		{"realgar", materials.KindMade, "", "-1339~", "Raman analysis of Amarna pigments, abstract"},
		{"realgar", materials.KindAttested, "EG", "-1339~", "Raman analysis of Amarna pigments, abstract"},
		// Iconofile (supplier), Realgar, History of Use (weak source): raw lumps in a 14th-century BCE Egyptian tomb.
		{"realgar", materials.KindMade, "", "-13XX", "Iconofile, Realgar"},
		// Pliny, Natural History, book 35, on atramentum (Bostock and Riley): soot black from resin, and Apelles' burnt-ivory black.
		{"lamp-black", materials.KindMade, "", "../0077", "Pliny, Natural History 35, atramentum"},
		{"bone-black", materials.KindMade, "", "../0077", "Pliny, Natural History 35, atramentum"},
		// Dyers' Company, bill against logwood (1621): statute of 39 Elizabeth (1597); start at the made date.
		{"logwood", materials.KindArrived, "GB", "1500/1597", "Dyers' Company 1621"},
		// Getty AAT, mummy (pigment): prepared in the 16th and 17th centuries.
		{"mummy-brown", materials.KindMade, "", "15XX", "Getty AAT, mummy"},
		// Wikipedia, "Mummy brown", History: production ended later in the 20th century, when the supply of mummies ran out.
		{"mummy-brown", materials.KindWithdrawn, "", "19XX", "Wikipedia, Mummy brown, History"},
		// Palazzo Spinelli ARGOMED, massicot: Pliny's account of its discovery (start open).
		{"massicot", materials.KindMade, "", "../0079", "ARGOMED, massicot"},
		// Domingo, García-Borja and Roldán, Archaeometry 54 (2012), abstract: cinnabar and hematite, 5300-5000 cal BC.
		{"cinnabar", materials.KindMade, "", "-5299/-4999", "Domingo et al. 2012, abstract"},
		{"hematite-pigment", materials.KindMade, "", "-5299/-4999", "Domingo et al. 2012, abstract"},
		// Siddall, Minerals 8 (2018), 201, section 1: red ochre extraction 300-200 thousand years ago in Africa.
		{"hematite-pigment", materials.KindMade, "", "Y-300000/Y-200000", "Siddall 2018, section 1"},
		// Roucadour cave pigments, J. Raman Spectrosc. (2006), abstract (read in the first round): haematite in the dark red paint.
		{"hematite-pigment", materials.KindMade, "", "../-9999", "Roucadour cave pigments, J. Raman Spectrosc. (2006), abstract"},
		// J. Raman Spectrosc. abstract on Pompeii pigments (read in the first round): hematite among the pigments.
		{"hematite-pigment", materials.KindMade, "", "../0079", "J. Raman Spectrosc. abstract on Pompeii pigments"},
		// Uda et al., NIM B (2000), abstract and text: hematite by XRD in the red parts of the Malqata palace walls.
		{"hematite-pigment", materials.KindAttested, "EG", "-1389/-1351", "Uda et al., NIM B (2000), Malqata palace"},
		// Wikipedia, "Han purple and Han blue": used until the end of the Han dynasty (placed in China).
		{"han-blue", materials.KindWithdrawn, "CN", "0220~", "Wikipedia, Han purple and Han blue"},
		{"han-purple", materials.KindWithdrawn, "CN", "0220~", "Wikipedia, Han purple and Han blue"},
		// Wikipedia, "Cochineal", section Art: lac imported into Spain from the early 13th century.
		{"lac-dye", materials.KindArrived, "ES", "12XX", "Wikipedia, Cochineal, Art"},
		// Heritage Science 9 (2021), abstract: lac and brazilwood paints in 12th-15th-century Portuguese manuscripts.
		{"lac-dye", materials.KindArrived, "PT", "1101/1500", "Heritage Science 2021, abstract"},
		{"sappanwood", materials.KindArrived, "PT", "1101/1500", "Heritage Science 2021, abstract"},
		// Segreti per colori (15th century), in Merrifield 1849, ch. 8: verzino recipes.
		{"sappanwood", materials.KindArrived, "IT", "14XX", "Segreti per colori, Merrifield 1849"},
		// Seldes et al., JAIC 38 (1999), section 6: azurite in Córdoba at the beginning of the 17th century.
		{"azurite", materials.KindArrived, "AR", "1600/1625", "Seldes et al. 1999, Conclusions"},
		// Mantzouris and Karapanagiotis, Coloration Technology (2015), abstract: Porphyrophora in Hellenistic Macedonia.
		{"armenian-cochineal", materials.KindArrived, "150", "-0299/-0100", "Mantzouris and Karapanagiotis 2015, abstract"},
		// News report of Arnold's 2025 paper (weak source): Maya blue from about 300 BCE.
		{"maya-blue", materials.KindMade, "", "-0299~", "gaya.one news report, 2025"},
		// Palazzo Spinelli ARGOMED, nero di vite: described by Vitruvius, Pliny and Cennini (start open).
		{"vine-black", materials.KindMade, "", "../0079", "ARGOMED, nero di vite"},
		// Wikipedia, "India ink", History: pine-soot ink before the 11th century (start open).
		{"pine-soot", materials.KindMade, "", "../1000", "Wikipedia, India ink"},
		// Ministère de la Culture, Lascaux, Das Rohmaterial: hematite reds and manganese blacks (start open).
		{"hematite-pigment", materials.KindMade, "", "../-9999", "Lascaux website, raw material"},
		{"manganese-black", materials.KindMade, "", "../-9999", "Lascaux website, raw material"},
		// Heyes et al., Scientific Reports 6 (2016): manganese oxide blocks of 60,000-40,000 years ago (use debated).
		{"manganese-black", materials.KindMade, "", "Y-58050/Y-38050?", "Heyes et al. 2016, abstract"},
		// Attestations: dated objects with the analytical identification, one row each.
		// Han et al. 2022, abstract: Liangdaicun lead white, 8th century BCE.
		{"lead-white", materials.KindAttested, "CN", "-0799/-0700", "Han et al. 2022, abstract"},
		// Clark and Mirabaud, J. Raman Spectrosc. 37 (2006), abstract: Persian book of poetry dated 1541.
		{"lead-white", materials.KindAttested, "IR", "1541", "Clark and Mirabaud 2006, abstract"},
		{"natural-ultramarine", materials.KindAttested, "IR", "1541", "Clark and Mirabaud 2006, abstract"},
		{"natural-indigo", materials.KindAttested, "IR", "1541", "Clark and Mirabaud 2006, abstract"},
		{"vermilion", materials.KindAttested, "IR", "1541", "Clark and Mirabaud 2006, abstract"},
		{"hematite-pigment", materials.KindAttested, "IR", "1541", "Clark and Mirabaud 2006, abstract"},
		{"orpiment", materials.KindAttested, "IR", "1541", "Clark and Mirabaud 2006, abstract"},
		{"red-lead", materials.KindAttested, "IR", "1541", "Clark and Mirabaud 2006, abstract"},
		// J. Raman Spectrosc. (2004), abstract: Persian Herati manuscript dated 1530.
		{"lead-white", materials.KindAttested, "AF", "1530", "Herat manuscript 2004, abstract"},
		{"natural-ultramarine", materials.KindAttested, "AF", "1530", "Herat manuscript 2004, abstract"},
		{"cinnabar", materials.KindAttested, "AF", "1530", "Herat manuscript 2004, abstract"},
		{"orpiment", materials.KindAttested, "AF", "1530", "Herat manuscript 2004, abstract"},
		{"red-lead", materials.KindAttested, "AF", "1530", "Herat manuscript 2004, abstract"},
		// Brysbaert 2006, abstract: Gla wall paintings, 13th century BCE.
		{"natural-ultramarine", materials.KindAttested, "GR", "-1299/-1200", "Brysbaert 2006, abstract"},
		// Moon et al. 2021, abstract: Afrasiab murals, presumed mid-7th century.
		{"natural-ultramarine", materials.KindAttested, "UZ", "0625/0675?", "Moon et al. 2021, abstract"},
		// Shui et al. 2022, abstract: Mogao Cave 256.
		{"natural-ultramarine", materials.KindAttested, "CN", "0907/0960", "Shui et al. 2022, abstract"},
		{"smalt", materials.KindAttested, "CN", "1800/1850", "Shui et al. 2022, abstract"},
		// Radini et al. 2019, abstract: Dalheim dental calculus.
		{"natural-ultramarine", materials.KindAttested, "DE", "0997/1162", "Radini et al. 2019, abstract"},
		// Splitstoser et al. 2016, abstract: Huaca Prieta.
		{"natural-indigo", materials.KindAttested, "PE", "-4249/-3999", "Splitstoser et al. 2016, abstract"},
		// Seldes et al., JAIC 38 (1999), 4.1 and 6: Zapata 1764; Saint Dorotea about 1740; Pérez Holguín's workshop.
		{"natural-indigo", materials.KindAttested, "PE", "1764", "Seldes et al. 1999, 4.1"},
		{"natural-indigo", materials.KindAttested, "005", "1740~", "Seldes et al. 1999, 4.1"},
		{"azurite", materials.KindAttested, "005", "1740~", "Seldes et al. 1999, 4.1"},
		{"smalt", materials.KindAttested, "BO", "1675/1725", "Seldes et al. 1999, Conclusions"},
		// Domingo et al. 2012, abstract: Early Neolithic Valencia, 5300-5000 cal BC.
		{"cinnabar", materials.KindAttested, "ES", "-5299/-4999", "Domingo et al. 2012, abstract"},
		{"hematite-pigment", materials.KindAttested, "ES", "-5299/-4999", "Domingo et al. 2012, abstract"},
		// Thessaloniki figurines, abstract: Hellenistic and Roman tombs.
		{"cinnabar", materials.KindAttested, "GR", "-0299/-0100", "Thessaloniki figurines, abstract"},
		{"egyptian-blue", materials.KindAttested, "GR", "-0299/-0100", "Thessaloniki figurines, abstract"},
		{"red-ochre", materials.KindAttested, "GR", "-0299/-0100", "Thessaloniki figurines, abstract"},
		{"yellow-ochre", materials.KindAttested, "GR", "-0299/-0100", "Thessaloniki figurines, abstract"},
		{"madder-lake", materials.KindAttested, "GR", "0001/0200", "Thessaloniki figurines, abstract"},
		// Getty 1995 preprints, p. 74 and table 2: Chora, a South German painting, Basohli miniatures.
		{"smalt", materials.KindAttested, "TR", "1325/1453", "Getty 1995 preprints, p. 74"},
		{"smalt", materials.KindAttested, "DE", "1400/1600", "Getty 1995 preprints, table 2"},
		{"smalt", materials.KindAttested, "IN", "1660/1670", "Getty 1995 preprints, table 2"},
		// Colomban et al. 2021, abstract: Qianlong-mark ewer; late Kangxi incense burner.
		{"smalt", materials.KindAttested, "CN", "1750/1775", "Colomban et al. 2021, abstract"},
		{"naples-yellow", materials.KindAttested, "CN", "1700/1722?", "Colomban et al. 2021, abstract"},
		// Kogou et al. 2015, abstract: Reeves botanical watercolours, 1817-1831.
		{"american-cochineal", materials.KindAttested, "CN", "1817/1831", "Kogou et al. 2015, abstract"},
		{"lac-dye", materials.KindAttested, "CN", "1817/1831", "Kogou et al. 2015, abstract"},
		// Dyer et al. 2018, abstract: Canosa oinochoe, 3rd century BCE.
		{"lac-dye", materials.KindAttested, "IT", "-0299/-0200", "Dyer et al. 2018, abstract"},
		{"madder-lake", materials.KindAttested, "IT", "-0299/-0200", "Dyer et al. 2018, abstract"},
		{"egyptian-blue", materials.KindAttested, "IT", "-0299/-0200", "Dyer et al. 2018, abstract"},
		// Sgamellotti, conference abstract: Raphael's Triumph of Galatea, 1511/12.
		{"egyptian-blue", materials.KindAttested, "IT", "1511/1512", "Sgamellotti, abstract"},
		// Mantzouris and Karapanagiotis 2015, abstract: Hellenistic figurines from Macedonia.
		{"armenian-cochineal", materials.KindAttested, "GR", "-0299/-0100", "Mantzouris and Karapanagiotis 2015, abstract"},
		// Burgio et al. 2007 and Seldes et al. 2002: copper resinate in China and at Yavi.
		{"copper-resinate", materials.KindAttested, "CN", "16XX", "Burgio et al. 2007, abstract"},
		{"copper-resinate", materials.KindAttested, "AR", "1667/1720", "Seldes et al. 2002, 3.1.1"},
		// Sukenik et al., J. Archaeol. Sci. Reports 57 (2024), abstract: the Cave of Skulls textile.
		{"kermes", materials.KindAttested, "IL", "-1953/-1766", "Sukenik et al. 2024, abstract"},
		// Berger et al. 2024, Sukenik et al. 2021, Karapanagiotis 2019: shellfish purple.
		{"tyrian-purple", materials.KindAttested, "GR", "-1599/-1500", "Berger et al. 2024, abstract"},
		{"tyrian-purple", materials.KindAttested, "IL", "-1049/-0950", "Sukenik et al. 2021, abstract"},
		{"tyrian-purple", materials.KindAttested, "GR", "-0399/-0300", "Karapanagiotis 2019, abstract"},
		// Sukenik et al. 2017, abstract: madder and plant indigotin at Timna, 13th-10th century BCE.
		{"madder", materials.KindAttested, "IL", "-1299/-0900", "Sukenik et al. 2017, abstract"},
		{"woad", materials.KindAttested, "IL", "-1299/-0900", "Sukenik et al. 2017, abstract"},
		// Liu et al. 2007, via the SSRL highlight: Chinese purple on a Qin terracotta archer.
		{"han-purple", materials.KindAttested, "CN", "-0245/-0209", "Liu et al. 2007"},
		// Shugar et al. 2019, abstract: Kew samples of 1883.
		{"indian-yellow", materials.KindAttested, "IN", "1883", "Shugar et al. 2019, abstract"},
		// Wikipedia, "Lead-tin-yellow", History and captions: Titian, Rembrandt, Vermeer.
		{"lead-tin-yellow-i", materials.KindAttested, "IT", "1520/1523", "Wikipedia, Lead-tin-yellow, captions"},
		{"lead-tin-yellow-i", materials.KindAttested, "NL", "1635/1638", "Wikipedia, Lead-tin-yellow, captions"},
		{"lead-tin-yellow-i", materials.KindAttested, "NL", "1657/1658", "Wikipedia, Lead-tin-yellow, captions"},
		// Dictionarium Polygraphicum (London, 1735), entry Turmerick: a dated document of its use.
		{"turmeric", materials.KindAttested, "GB", "1735", "Dictionarium Polygraphicum 1735"},
		// Haude, JAIC 37 (1998), section 5, and Straulino-Mainou et al., Coatings 11 (2021): Maya blue in colonial Mexico.
		{"maya-blue", materials.KindAttested, "MX", "1578/1585", "Haude 1998, section 5"},
		{"maya-blue", materials.KindAttested, "MX", "1521/1600", "Straulino-Mainou et al. 2021, abstract"},
		// Nakamura et al., Studies in Conservation 59 (2014) and Analytical Chemistry 81 (2009), abstracts: Shōsōin textiles.
		{"safflower", materials.KindAttested, "JP", "0752", "Nakamura et al. 2014, abstract"},
		{"madder", materials.KindAttested, "JP", "07XX", "Nakamura et al. 2009, abstract"},
		{"natural-indigo", materials.KindAttested, "JP", "07XX", "Nakamura et al. 2009, abstract"},
		// Heritage Science 7 (2019), abstract: Palace of Apries reliefs (reign 589-570 BCE, conventional).
		{"lead-tin-yellow-i", materials.KindMade, "", "-0588/-0569", "Palace of Apries 2019, abstract"},
		{"lead-tin-yellow-ii", materials.KindMade, "", "-0588/-0569", "Palace of Apries 2019, abstract"},
		{"naples-yellow", materials.KindAttested, "EG", "-0588/-0569", "Palace of Apries 2019, abstract"},
		{"egyptian-blue", materials.KindAttested, "EG", "-0588/-0569", "Palace of Apries 2019, abstract"},
		// Vázquez de Ágredos-Pascual et al., Microchemical Journal 150 (2019): oldest Maya blue, Chupícuaro culture.
		{"maya-blue", materials.KindMade, "", "../0250", "Vázquez de Ágredos-Pascual et al. 2019"},
		// Second round, arrivals:
		// Sepulveda et al., Heritage Science 2021, abstract: indigo in Tarapaca-40 and Pica-8 textiles, northern Chile.
		{"natural-indigo", materials.KindArrived, "CL", "-1099/1450", "Sepulveda et al. 2021, abstract"},
		// Erquicia Cruz 2013 (XXVI Simposio, Guatemala), abstract: indigo the chief export of San Salvador from the 17th century.
		{"natural-indigo", materials.KindArrived, "SV", "../1699", "Erquicia Cruz 2013, abstract"},
		// Norgeshistorie.no, Fargeeksplosjonen pa 1700-tallet: Mexican cochineal through the Christiania customs in 1794.
		{"american-cochineal", materials.KindArrived, "NO", "1530/1794", "Norgeshistorie.no, Fargeeksplosjonen"},
	}
	checkSourceRows(t, d, antiquityFile, rows)
}

// TestAntiquityTradeFacts checks facts of the trade (common practice) that
// the family must carry.
func TestAntiquityTradeFacts(t *testing.T) {
	d := checkBuiltin(t)

	t.Run("madder dyed by about 2000 BCE", func(t *testing.T) {
		// Common practice: madder was used to dye leather and cloth by about 2000 BCE.
		m := mustLookup(t, d, "madder")
		first, ok := earliestOf(m.Claims(materials.KindMade, ""))
		if !ok {
			t.Fatal("madder has no bounded made claim")
		}
		if first > year(-1949) {
			t.Errorf("madder earliest made %s, want no later than about 2000 BCE", first.ISO())
		}
	})
	t.Run("cochineal carmine in Japan about 1870", func(t *testing.T) {
		// Common practice: cochineal carmine reached Japan by about 1870.
		m := mustLookup(t, d, "cochineal carmine")
		claims, area := d.Arrival(m, "JP")
		if area != "JP" || len(claims) == 0 {
			t.Fatalf("no arrival in JP (area %q)", area)
		}
		for _, c := range claims {
			lo, ok1 := c.Date.Earliest()
			hi, ok2 := c.Date.Latest()
			if !ok1 || !ok2 || lo < year(1860) || hi >= year(1881) {
				t.Errorf("JP arrival %s, want about 1870", c.Date.EDTF())
			}
		}
	})
	t.Run("group names read as every member", func(t *testing.T) {
		// Common practice: a report that names only the compound or the trade
		// family cannot tell which member was used, so every member counts.
		checkGroups(t, d, []groupRow{
			{"cochineal", []string{"american-cochineal", "polish-cochineal", "armenian-cochineal", "cochineal-carmine"}},
			{"carminic acid", []string{"american-cochineal", "polish-cochineal", "armenian-cochineal", "cochineal-carmine"}},
			{"brazilwood", []string{"sappanwood", "american-brazilwood"}},
			{"brazilin", []string{"sappanwood", "american-brazilwood"}},
			{"lead-tin yellow", []string{"lead-tin-yellow-i", "lead-tin-yellow-ii"}},
			{"indigo", []string{"natural-indigo", "woad"}},
			{"indigotin", []string{"natural-indigo", "woad", "maya-blue"}},
			{"lazurite", []string{"natural-ultramarine"}},
			{"ochre", []string{"red-ochre", "yellow-ochre"}},
			{"mercury sulphide", []string{"cinnabar", "vermilion"}},
		})
	})
	t.Run("medieval brazil is not bounded by the American wood", func(t *testing.T) {
		// Common practice: 'brazil' in a medieval recipe or manuscript is the
		// Asian sappanwood; the family must reach back before 1500.
		r, err := d.Resolve("brazilwood")
		if err != nil {
			t.Fatal(err)
		}
		earliest := year(1500)
		for _, m := range r.Materials {
			if e, ok := earliestOf(m.Claims(materials.KindMade, "")); !ok || e < earliest {
				earliest = year(-9999)
			}
		}
		if earliest >= year(1500) {
			t.Errorf("the brazilwood family starts no earlier than 1500")
		}
	})
	t.Run("lead-tin yellow ends about 1750", func(t *testing.T) {
		// Common practice: lead-tin yellow vanished about 1750 and was rediscovered in the 20th century.
		m := mustLookup(t, d, "lead-tin-yellow-i")
		ws := m.Claims(materials.KindWithdrawn, "")
		if len(ws) == 0 {
			t.Fatal("no withdrawn claim")
		}
		found := false
		for _, w := range ws {
			lo, ok1 := w.Date.Earliest()
			hi, ok2 := w.Date.Latest()
			if ok1 && ok2 && lo >= year(1700) && hi < year(1800) {
				found = true
			}
		}
		if !found {
			t.Errorf("no withdrawn claim in the 18th century near 1750")
		}
		if !strings.Contains(m.Note, "1941") {
			t.Errorf("note should name the 20th-century rediscovery (1941): %q", m.Note)
		}
	})
}

// TestAntiquityFileLintsClean checks what every family file promises (see
// checkFamilyFile) for this family.
func TestAntiquityFileLintsClean(t *testing.T) {
	checkFamilyFile(t, checkBuiltin(t), antiquityFile, 12)
}
