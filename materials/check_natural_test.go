package materials_test

import (
	"errors"
	"testing"

	"terminus/materials"
)

// naturalFile is the family file these checks cover.
const naturalFile = "natural-colorants-minerals.yaml"

// TestNaturalAgainstSources checks that the embedded dataset holds dates
// as the named published sources give them. One row per value; the source
// and the place in it stand beside the value. Dates are EDTF in
// astronomical years (2000 BCE = -1999); attestations are the dated objects
// in which an analysis found the material.
func TestNaturalAgainstSources(t *testing.T) {
	d := checkBuiltin(t)
	rows := []sourceRow{
		// CAMEO, Fustic, description: imported into Europe in 1510 from the West Indies and Central and South America; the start is left open.
		{"old-fustic", materials.KindMade, "", "../1510", "CAMEO, Fustic"},
		// Dyes in post-Byzantine and Ottoman textiles (HPLC study), abstract: Post-Byzantine ecclesiastical textiles of Mount Athos, 16th to early 20th century.
		{"old-fustic", materials.KindAttested, "GR", "1500/1930", "Dyes in post-Byzantine and Ottoman textiles (HPLC study), abstract"},
		// Getty AAT, cutch (pigment): used in India since ancient times; no date is given, so the start is left open.
		{"cutch", materials.KindMade, "", "../0499", "Getty AAT, cutch (pigment)"},
		// Getty AAT, cutch (pigment): first import: exported to Japan as early as the 1500s.
		{"cutch", materials.KindArrived, "JP", "15XX", "Getty AAT, cutch (pigment)"},
		// Getty AAT, cutch (pigment): first import: exported to China as early as the 1500s.
		{"cutch", materials.KindArrived, "CN", "15XX", "Getty AAT, cutch (pigment)"},
		// Getty AAT, cutch (pigment): first documented use: not used in European dyeing until the 1800s.
		{"cutch", materials.KindArrived, "150", "18XX", "Getty AAT, cutch (pigment)"},
		// Sienna, Henna in the ancient world (essay): the earliest potential record: hair dyed orange-red in predynastic burials at Nekhen (Hierakonpolis), about 3400 BCE; uncertain, ...
		{"henna", materials.KindMade, "", "-3399%", "Sienna, Henna in the ancient world (essay)"},
		// Encyclopaedia Britannica 1911, Henna: used by the ancient Egyptians, as their mummies show; no date is given, so the start is left open.
		{"henna", materials.KindMade, "", "../-0331", "Encyclopaedia Britannica 1911, Henna"},
		// TCF DATU, Walnut, Historical Data: Pliny (Natural History, about 77 CE) gives a recipe for dyeing grey hair brown with walnut; Greek and Roman writers knew the tree; the ...
		{"walnut-hull-dye", materials.KindMade, "", "../0077", "TCF DATU, Walnut, Historical Data"},
		// Pliny, Natural History 15.24 (Bostock and Riley, Perseus): walnut husk dyes wool; young nuts redden the hair.
		{"walnut-hull-dye", materials.KindMade, "", "../0077", "Pliny, Natural History 15.24"},
		// CAMEO, Relbun roots: used by the Paracas culture of Peru for dyeing textiles in about 700 BCE.
		{"relbunium", materials.KindMade, "", "-0699~", "CAMEO, Relbun roots"},
		// Wouters and Rosario-Chirinos, JAIC 31 (1992), section 5: South Peruvian textiles of 100-200 CE (analysed by Schweppe, 1986).
		{"relbunium", materials.KindAttested, "PE", "0100/0200", "Wouters and Rosario-Chirinos, JAIC 31 (1992), section 5"},
		// Dyes in post-Byzantine and Ottoman textiles (HPLC study), abstract: found in Ottoman textiles of the 16th to 18th century and in post-Byzantine ones; older use is known to ...
		{"dyers-broom", materials.KindMade, "", "../1799", "Dyes in post-Byzantine and Ottoman textiles (HPLC study), abstract"},
		// Dyes in post-Byzantine and Ottoman textiles (HPLC study), abstract: Ottoman textiles of the 16th to 18th century in the Topkapı Palace Museum, Istanbul.
		{"dyers-broom", materials.KindAttested, "TR", "1500/1799", "Dyes in post-Byzantine and Ottoman textiles (HPLC study), abstract"},
		// Dyes in post-Byzantine and Ottoman textiles (HPLC study), abstract: Post-Byzantine ecclesiastical textiles of Mount Athos, 16th to early 20th century.
		{"dyers-broom", materials.KindAttested, "GR", "1500/1930", "Dyes in post-Byzantine and Ottoman textiles (HPLC study), abstract"},
		// Dean 2012, Sawwort (after Cardon 2007): used in Europe since the Middle Ages and prized in Tuscany in the 14th and 15th centuries (after Cardon 2007); the start is left open.
		{"sawwort", materials.KindMade, "", "../13XX", "Dean 2012, Sawwort (after Cardon 2007)"},
		// Cardon and Houssaye Michienzi, DHA 34 (2015), abstract: sawwort and weld in the Salviati dye company of Florence, 1483-1498.
		{"sawwort", materials.KindMade, "", "../1498", "Cardon and Houssaye Michienzi 2015, abstract"},
		// Dyes in post-Byzantine and Ottoman textiles (HPLC study), abstract: buckthorn berries found in Ottoman textiles of the 16th to 18th century; the start is left open.
		{"rhamnus-berry-dye", materials.KindMade, "", "../1799", "Dyes in post-Byzantine and Ottoman textiles (HPLC study), abstract"},
		// Dyes in post-Byzantine and Ottoman textiles (HPLC study), abstract: Ottoman textiles of the 16th to 18th century in the Topkapı Palace Museum, Istanbul.
		{"rhamnus-berry-dye", materials.KindAttested, "TR", "1500/1799", "Dyes in post-Byzantine and Ottoman textiles (HPLC study), abstract"},
		// TCF DATU, Berberis, Historical Data: European sources document barberry as a dye as early as the 14th century (after Cannon and Cannon, 1994); Asian use may be older, so the ...
		{"barberry", materials.KindMade, "", "../13XX", "TCF DATU, Berberis, Historical Data"},
		// Gao et al., J. Archaeol. Sci. (2024), abstract: Berberis among the yellow dyes of Wei and Jin textiles (220-420 CE) from Bazhou, Xinjiang.
		{"barberry", materials.KindMade, "", "0220/0420", "Gao et al., J. Archaeol. Sci. (2024), abstract"},
		// Gao et al., J. Archaeol. Sci. (2024), abstract: Archaeological textiles of the Wei and Jin dynasties (220-420 CE) from Bazhou, Xinjiang.
		{"barberry", materials.KindAttested, "CN", "0220/0420", "Gao et al., J. Archaeol. Sci. (2024), abstract"},
		// Four Tang silks of the China National Silk Museum (2024), abstract: Four Tang dynasty silk fabrics in the China National Silk Museum.
		{"barberry", materials.KindAttested, "CN", "0618/0907", "Four Tang silks of the China National Silk Museum (2024), abstract"},
		// Nuruosmaniye colour database, Sumac: used since antiquity, more for tanning than for dyeing; the start is left open.
		{"sumac", materials.KindMade, "", "../0499", "Nuruosmaniye colour database, Sumac"},
		// CAMEO, Sicilian sumac: an important tanning agent in the Middle Ages; the start is left open.
		{"sumac", materials.KindMade, "", "../14XX", "CAMEO, Sicilian sumac"},
		// Getty AAT, gall (plant material): galls with ferrous sulfate give a black dye and galls have been used for centuries in tanning; no date is given, so the start is left open.
		{"oak-galls", materials.KindMade, "", "../17XX", "Getty AAT, gall (plant material)"},
		// Wikipedia, Alkanna tinctoria, lead: used as a dye in the Mediterranean since antiquity; no date is given, so the start is left open.
		{"alkanet", materials.KindMade, "", "../0499", "Wikipedia, Alkanna tinctoria, lead"},
		// Lloyd 1911, Santalum rubrum: used for colouring in medieval Europe, priced in England in 1326 and 1399; Indian use is older, so the start is left open.
		{"red-sandalwood", materials.KindMade, "", "../1326", "Lloyd 1911, Santalum rubrum"},
		// Lloyd 1911, Santalum rubrum: first documented use: quoted in England at three shillings a pound in 1326 (and 1399); entered in the Durham monastery accounts in 1530.
		{"red-sandalwood", materials.KindArrived, "GB", "1326", "Lloyd 1911, Santalum rubrum"},
		// From memory, not read here: Cardon, Natural Dyes (2007): a traditional yellow of Anatolian and European dyers; no dated early evidence was read, so the start is left open.
		{"dyers-chamomile", materials.KindMade, "", "../17XX", "Cardon, Natural Dyes (2007) (from memory)"},
		// Wikipedia, Turkey red, lead and History: the process came from the Levant, developed in India and China, and was brought to Europe in the 1740s; the start is left open.
		{"turkey-red-madder", materials.KindMade, "", "../174X", "Wikipedia, Turkey red, lead and History"},
		// Wikipedia, Turkey red, lead and History: first import: Turkey red was brought to Europe in the 1740s, known in France as rouge d'Andrinople.
		{"turkey-red-madder", materials.KindArrived, "150", "174X", "Wikipedia, Turkey red, lead and History"},
		// Cooper Hewitt, Object of the Day, Turkey red sample book: first documented use: practised throughout the eastern Mediterranean and unknown in Europe before the 18th century, ...
		{"turkey-red-madder", materials.KindArrived, "TR", "../17XX", "Cooper Hewitt, Object of the Day, Turkey red sample book"},
		// Cooper Hewitt, Object of the Day, Turkey red sample book: first documented use: master dyers were brought from Turkey or Greece to Rouen, Mulhouse and Manchester in the 18th ...
		{"turkey-red-madder", materials.KindArrived, "GR", "../17XX", "Cooper Hewitt, Object of the Day, Turkey red sample book"},
		// Lowengard 2006, chapter Turkey Red (quoting Brown, History of Glasgow): first documented use: Papillon, who took the process to Glasgow in 1785, was an eminent Turkey-red ...
		{"turkey-red-madder", materials.KindArrived, "FR", "../1785", "Lowengard 2006, chapter Turkey Red (quoting Brown, History of Glasgow)"},
		// Wertz et al., ICOM-CC 2017, abstract and introduction: local manufacture: Turkey red was produced in Western Europe from the mid-18th to the early 20th century; dyers began ...
		{"turkey-red-madder", materials.KindArrived, "155", "1750~", "Wertz et al., ICOM-CC 2017, abstract and introduction"},
		// Lowengard 2006, chapter Turkey Red (quoting Brown, History of Glasgow): local manufacture: George Mackintosh brought Papillon from Rouen and built a Turkey red dye-house at ...
		{"turkey-red-madder", materials.KindArrived, "GB", "1785", "Lowengard 2006, chapter Turkey Red (quoting Brown, History of Glasgow)"},
		// J. Raman Spectrosc. 35 (2004), Lindisfarne Gospels, abstract: earliest dated use found: the Insular palette of the Lindisfarne Gospels (about 715) and two nearly contemporary ...
		{"vergaut", materials.KindMade, "", "0715~", "J. Raman Spectrosc. 35 (2004), Lindisfarne Gospels, abstract"},
		// J. Raman Spectrosc. 35 (2004), Lindisfarne Gospels, abstract: Lindisfarne Gospels, British Library, Cotton MS Nero D iv, about 715.
		{"vergaut", materials.KindAttested, "GB", "0715~", "J. Raman Spectrosc. 35 (2004), Lindisfarne Gospels, abstract"},
		// CAMEO, Uemura dye archive 269 C: the plant (tsukikusa) is named in a Man'yōshū poem, volume 7, of the 7th-8th century, which speaks of dyeing a robe with it.
		{"dayflower-blue", materials.KindMade, "", "0600/0759", "CAMEO, Uemura dye archive 269 C"},
		// CAMEO, Dayflower: Ukiyo-e colorant: Suzuki Harunobu, Beauties of the Yoshiwara (colour-printed book; Harunobu's full-colour prints date from 1765 until his death in 1770).
		{"dayflower-blue", materials.KindAttested, "JP", "1765/1770", "CAMEO, Dayflower: Ukiyo-e colorant"},
		// Ye, Salmon and Cass, JAIC 39 (2000), section 2: Chinese literary sources list gromwell among the plant dyes of the Western Zhou dynasty's dyeing system.
		{"gromwell", materials.KindMade, "", "-1044/-0710", "Ye, Salmon and Cass, JAIC 39 (2000), section 2"},
		// JAANUS, shikon and murasaki: first documented use: in the Heian period (9th-12th century) the Musashino area near present-day Tokyo was an important source of murasaki for ...
		{"gromwell", materials.KindArrived, "JP", "../11XX", "JAANUS, shikon and murasaki"},
		// Dunhuang embroidery dye palette (British Museum), abstract: Embroidery Sakyamuni preaching on Vulture Peak, from the cave temples at Dunhuang, thought to be of the 8th ...
		{"gromwell", materials.KindAttested, "CN", "07XX?", "Dunhuang embroidery dye palette (British Museum), abstract"},
		// Gao et al., J. Archaeol. Sci. (2024), abstract: Phellodendron amurense and P. chinense among the yellow dyes of Wei and Jin textiles (220-420 CE) from Bazhou, Xinjiang, ...
		{"amur-cork-tree", materials.KindMade, "", "0220/0420", "Gao et al., J. Archaeol. Sci. (2024), abstract"},
		// Gao et al., J. Archaeol. Sci. (2024), abstract: Archaeological textiles of the Wei and Jin dynasties (220-420 CE) from Bazhou, Xinjiang.
		{"amur-cork-tree", materials.KindAttested, "CN", "0220/0420", "Gao et al., J. Archaeol. Sci. (2024), abstract"},
		// Four Tang silks of the China National Silk Museum (2024), abstract: Four Tang dynasty silk fabrics in the China National Silk Museum.
		{"amur-cork-tree", materials.KindAttested, "CN", "0618/0907", "Four Tang silks of the China National Silk Museum (2024), abstract"},
		// Trip.com moment, Yellow from plant dye: the Northern Wei agricultural treatise Qimin yaoshu (about 533-544) records dyeing paper with Amur cork tree against insects; dates of ...
		{"amur-cork-tree", materials.KindMade, "", "0533/0544?", "Trip.com moment, Yellow from plant dye"},
		// Nara National Museum, Shōsō-in glossary, kihada: papers dyed with it were common for sutra scrolls of the Shōsō-in period; the start is left open.
		{"amur-cork-tree", materials.KindMade, "", "../07XX", "Nara National Museum, Shōsō-in glossary, kihada"},
		// Nara National Museum, Shōsō-in glossary, kihada: first documented use: Phellodendron-dyed papers common for the sutra scrolls kept among the 8th-century Shōsō-in treasures.
		{"amur-cork-tree", materials.KindArrived, "JP", "07XX", "Nara National Museum, Shōsō-in glossary, kihada"},
		// Sasaki and Sasaki, e-PS 10 (2013), abstract: A Chinese-style kasaya (Buddhist robe) of the 14th century.
		{"amur-cork-tree", materials.KindAttested, "JP", "13XX", "Sasaki and Sasaki, e-PS 10 (2013), abstract"},
		// Qing palace textiles by UHPLC-Q-ToF MS, abstract: Bright yellow silk textiles of the Qing dynasty Royal Palace, Palace Museum, Beijing.
		{"amur-cork-tree", materials.KindAttested, "CN", "1644/1911", "Qing palace textiles by UHPLC-Q-ToF MS, abstract"},
		// Ye, Salmon and Cass, JAIC 39 (2000), section 2: Chinese literary sources list gardenia as the yellow of the Western Zhou dynasty's dyeing system.
		{"gardenia", materials.KindMade, "", "-1044/-0710", "Ye, Salmon and Cass, JAIC 39 (2000), section 2"},
		// Trip.com moment, Yellow from plant dye: the main material for dyeing yellow since the Western Zhou; with madder a cash crop of the Han dynasty.
		{"gardenia", materials.KindMade, "", "-1044/-0770", "Trip.com moment, Yellow from plant dye"},
		// Han, Economic Botany 69 (2015), abstract: pagoda bud (huai hua, huai mi) is among the dyes of the Ming and Qing dyeing manuscripts studied; the start is left open.
		{"pagoda-tree-buds", materials.KindMade, "", "../1644", "Han, Economic Botany 69 (2015), abstract"},
		// Qing palace textiles by UHPLC-Q-ToF MS, abstract: Bright yellow silk textiles of the Qing dynasty Royal Palace, Palace Museum, Beijing.
		{"pagoda-tree-buds", materials.KindAttested, "CN", "1644/1911", "Qing palace textiles by UHPLC-Q-ToF MS, abstract"},
		// Yellow dyes in 19th-century Chinese textiles, abstract: Yellow silks brought from southern China by American China-trade ships in the 19th century (Peabody Essex Museum).
		{"pagoda-tree-buds", materials.KindAttested, "CN", "18XX", "Yellow dyes in 19th-century Chinese textiles, abstract"},
		// Tamburini et al., Heritage Science 8 (2020), abstract: Central Asian ikat textiles of the 19th century, Arthur M. Sackler Gallery (Guido Goldman collection).
		{"pagoda-tree-buds", materials.KindAttested, "143", "18XX", "Tamburini et al., Heritage Science 8 (2020), abstract"},
		// Wikipedia, Persicaria tinctoria, lead: already in use in the Western Zhou period; the most important blue of East Asia until Indigofera arrived from the south.
		{"japanese-indigo", materials.KindMade, "", "-1044/-0770", "Wikipedia, Persicaria tinctoria, lead"},
		// Ye, Salmon and Cass, JAIC 39 (2000), section 2: Chinese literary sources list Polygonum tinctorium as the blue of the Western Zhou dyeing system.
		{"japanese-indigo", materials.KindMade, "", "-1044/-0710", "Ye, Salmon and Cass, JAIC 39 (2000), section 2"},
		// Han, Economic Botany 69 (2015), abstract: Chinese gallnut is among the dyes of the Ming and Qing dyeing manuscripts studied; the start is left open.
		{"chinese-gallnut", materials.KindMade, "", "../1644", "Han, Economic Botany 69 (2015), abstract"},
		// Getty AAT, gall (plant material): galls of Rhus semialata in China and Japan give black with iron sulfate and have long been used; no date is given, so the start is left open.
		{"chinese-gallnut", materials.KindMade, "", "../17XX", "Getty AAT, gall (plant material)"},
		// Marey Mahmoud and Papadopoulou, ArcheoSciences 37, TT189, abstract: the green of the wall paintings of the tomb of Nakht-Djehuty (TT189), of the time of Ramesses II; the ...
		{"egyptian-green", materials.KindMade, "", "../-1211", "Marey Mahmoud and Papadopoulou, ArcheoSciences 37, TT189, abstract"},
		// Marey Mahmoud and Papadopoulou, ArcheoSciences 37, TT189, abstract: Wall paintings of the tomb of Nakht-Djehuty (TT189), El-Qurna necropolis, Thebes, time of Ramesses II ...
		{"egyptian-green", materials.KindAttested, "EG", "-1278/-1211", "Marey Mahmoud and Papadopoulou, ArcheoSciences 37, TT189, abstract"},
		// The Egyptian green pigment, Archaeometry 45 (2003), abstract: ancient raw cakes of Egyptian blue and green pigment and samples from paintings in the Louvre were analysed; the ...
		{"egyptian-green", materials.KindMade, "", "../0499", "The Egyptian green pigment, Archaeometry 45 (2003), abstract"},
		// Shen et al., Heritage Science (2024), abstract: the green of the wall paintings of the Kizil Grottoes (3rd-8th century), the earliest Buddhist caves of China.
		{"atacamite", materials.KindMade, "", "0200/0799", "Shen et al., Heritage Science (2024), abstract"},
		// Lei, Studies in Conservation 57 (2012), abstract: proposed as the most popular green of Chinese wall and architectural painting from the Northern Dynasties to the late Qing; ...
		{"atacamite", materials.KindMade, "", "0386/0581?", "Lei, Studies in Conservation 57 (2012), abstract"},
		// Painting the Palace of Apries II, Heritage Science (2019), abstract: among the pigments of the painted reliefs of the Palace of Apries (Apries reigned 589-570 BCE, from ...
		{"atacamite", materials.KindMade, "", "../-0569", "Painting the Palace of Apries II, Heritage Science (2019), abstract"},
		// Painting the Palace of Apries II, Heritage Science (2019), abstract: Painted limestone reliefs of the Palace of Apries, Memphis, excavated by Petrie in 1908-1910 (Ny ...
		{"atacamite", materials.KindAttested, "EG", "-0588/-0569", "Painting the Palace of Apries II, Heritage Science (2019), abstract"},
		// Shen et al., Heritage Science (2024), abstract: Wall paintings of the Kizil Grottoes, Xinjiang (3rd-8th century).
		{"atacamite", materials.KindAttested, "CN", "0200/0799", "Shen et al., Heritage Science (2024), abstract"},
		// De Haro et al., Heritage 6 (2023), abstract: Andean colonial paintings of the Viceroyalty of Peru (16th-18th century), among them the altarpiece of the church of Ancoraimes, ...
		{"atacamite", materials.KindAttested, "005", "1500/1799", "De Haro et al., Heritage 6 (2023), abstract"},
		// Lei, Studies in Conservation 57 (2012), abstract: copper trihydroxychlorides proposed as the most popular green of Chinese wall painting from the Northern Dynasties on; a ...
		{"paratacamite", materials.KindMade, "", "0386/0581?", "Lei, Studies in Conservation 57 (2012), abstract"},
		// Frost et al., J. Raman Spectrosc. 33 (2002), abstract: atacamite and paratacamite as corrosion of archaeological copper, brass and bronze; no dates, start left open.
		{"paratacamite", materials.KindMade, "", "../-0029", "Frost et al., J. Raman Spectrosc. 33 (2002), abstract"},
		// Lei, Studies in Conservation 57 (2012), abstract: copper trihydroxychlorides (the group of botallackite, atacamite, paratacamite and clinoatacamite) proposed as the common ...
		{"clinoatacamite", materials.KindMade, "", "0386/0581?", "Lei, Studies in Conservation 57 (2012), abstract"},
		// Frost et al., J. Raman Spectrosc. 33 (2002), introduction: one of the four basic copper chloride minerals found in the corrosion of copper, brass and bronze objects of ...
		{"clinoatacamite", materials.KindMade, "", "../-0029", "Frost et al., J. Raman Spectrosc. 33 (2002), introduction"},
		// Lei, Studies in Conservation 57 (2012), abstract: copper trihydroxychlorides proposed as the common Chinese wall-painting green from the Northern Dynasties on; a proposal ...
		{"botallackite", materials.KindMade, "", "0386/0581?", "Lei, Studies in Conservation 57 (2012), abstract"},
		// Frost et al., J. Raman Spectrosc. 33 (2002), introduction: one of the four basic copper chloride minerals of copper, brass and bronze corrosion on archaeological objects; the ...
		{"botallackite", materials.KindMade, "", "../-0029", "Frost et al., J. Raman Spectrosc. 33 (2002), introduction"},
		// ARGOMED, Chrysocolla: found as a pigment in Twelfth Dynasty Egyptian tombs (dynasty dates conventional).
		{"chrysocolla", materials.KindMade, "", "-1990/-1802", "ARGOMED, Chrysocolla"},
		// ARGOMED, Chrysocolla: Painted tombs of the Twelfth Dynasty, Egypt.
		{"chrysocolla", materials.KindAttested, "EG", "-1990/-1802", "ARGOMED, Chrysocolla"},
		// Eremin et al., J. Raman Spectrosc. 39 (2008), abstract: the main green of the 18th-century Thai manuscripts studied, its first identification anywhere.
		{"copper-citrate", materials.KindMade, "", "17XX", "Eremin et al., J. Raman Spectrosc. 39 (2008), abstract"},
		// Eremin et al., J. Raman Spectrosc. 39 (2008), abstract: replaced in later Thai manuscripts by emerald green and by Prussian blue with yellows; a soft end for Thailand only.
		{"copper-citrate", materials.KindWithdrawn, "TH", "18XX", "Eremin et al., J. Raman Spectrosc. 39 (2008), abstract"},
		// Eremin et al., J. Raman Spectrosc. 39 (2008), abstract: Thai manuscripts of the 18th century.
		{"copper-citrate", materials.KindAttested, "TH", "17XX", "Eremin et al., J. Raman Spectrosc. 39 (2008), abstract"},
		// Liu et al., Minerals 13 (2023), abstract: used in quantity as the yellow of the murals of Hanxiu's tomb (740 CE); the study compares other Chinese tomb murals, so the start ...
		{"vanadinite", materials.KindMade, "", "../0740", "Liu et al., Minerals 13 (2023), abstract"},
		// Holakooei et al., Spectrochim. Acta A 169 (2016), abstract: with wulfenite in a yellow stain on a late Sasanian painted stucco; the start is left open.
		{"vanadinite", materials.KindMade, "", "../0651", "Holakooei et al., Spectrochim. Acta A 169 (2016), abstract"},
		// Liu et al., Minerals 13 (2023), abstract: Mural paintings of the tomb of Hanxiu, Tang prime minister (died 740 CE), near Xi'an.
		{"vanadinite", materials.KindAttested, "CN", "0740", "Liu et al., Minerals 13 (2023), abstract"},
		// Holakooei et al., Spectrochim. Acta A 169 (2016), abstract: Painted stucco fragment of the Ghaleh Guri, Ramavand, western Iran, late Sasanian.
		{"vanadinite", materials.KindAttested, "IR", "0224/0651", "Holakooei et al., Spectrochim. Acta A 169 (2016), abstract"},
		// Boczar 2023, Exotic colour and pigments: a bright mined white used on Egyptian funerary objects from the Old Kingdom (period dates conventional).
		{"huntite", materials.KindMade, "", "-2685/-2180", "Boczar 2023, Exotic colour and pigments"},
		// Armenian Egyptology Centre Newsletter 9 (El Goresy 1997 survey): El Goresy's survey of 1500 samples from 126 dated sites found huntite entering use under Hatshepsut and ...
		{"huntite", materials.KindMade, "", "-1478/-1424", "Armenian Egyptology Centre Newsletter 9 (El Goresy 1997 survey)"},
		// J. Raman Spectrosc. abstract on Pompeii pigments: the white powder in a Pompeian pigment bowl is mainly huntite; the start is left open.
		{"huntite", materials.KindMade, "", "../0079", "J. Raman Spectrosc. abstract on Pompeii pigments"},
		// J. Raman Spectrosc. abstract on Pompeii pigments: White powder in a pigment bowl from Pompeii, buried in 79 CE (National Archaeological Museum of Naples).
		{"huntite", materials.KindAttested, "IT", "0079", "J. Raman Spectrosc. abstract on Pompeii pigments"},
		// Eremin et al., J. Raman Spectrosc. 39 (2008), abstract: Thai manuscripts of the 18th to 20th century.
		{"huntite", materials.KindAttested, "TH", "1700/1999", "Eremin et al., J. Raman Spectrosc. 39 (2008), abstract"},
		// Raman analysis of pigments from the Egyptian Old Kingdom, J. Raman Spectrosc. 35 (2004), abstract: huntite on Old Kingdom objects in the British Museum.
		{"huntite", materials.KindAttested, "EG", "-2685/-2180", "J. Raman Spectrosc. 35 (2004), Old Kingdom pigments, abstract"},
		// Fulcher and Budka, J. Archaeol. Sci. Reports 33 (2020), abstract: huntite in 18th Dynasty paint palettes from Sai Island, 1548-1302 BCE.
		{"huntite", materials.KindAttested, "SD", "-1547/-1301", "Fulcher and Budka 2020, Sai Island, abstract"},
		// Marey Mahmoud and Papadopoulou, ArcheoSciences 37, TT189, abstract: calcite with gypsum the white of the tomb of Nakht-Djehuty; the start is left open.
		{"calcite", materials.KindMade, "", "../-1211", "Marey Mahmoud and Papadopoulou, ArcheoSciences 37, TT189, abstract"},
		// Mogao pigments page (dhdzgy.com): gypsum, talc, kaolin and calcite are the whites of the Mogao murals; the start is left open.
		{"calcite", materials.KindMade, "", "../1368", "Mogao pigments page (dhdzgy.com)"},
		// Marey Mahmoud and Papadopoulou, ArcheoSciences 37, TT189, abstract: Wall paintings of the tomb of Nakht-Djehuty (TT189), El-Qurna necropolis, Thebes, time of Ramesses II ...
		{"calcite", materials.KindAttested, "EG", "-1278/-1211", "Marey Mahmoud and Papadopoulou, ArcheoSciences 37, TT189, abstract"},
		// Pigment analysis: potentialities and problems, abstract: Egyptian ushabti of the New Kingdom (period dates conventional).
		{"calcite", materials.KindAttested, "EG", "-1549/-1069", "Pigment analysis: potentialities and problems, abstract"},
		// Lead(II) sulfide and pararealgar on a 13th-century manuscript, abstract: used throughout as a deep yellow in an early 13th-century Byzantine/Syriac Gospel lectionary; since ...
		{"pararealgar", materials.KindMade, "", "../1239", "Lead(II) sulfide and pararealgar on a 13th-century manuscript, abstract"},
		// Fitzwilliam Museum, Realgar and pararealgar: realgar can turn to pararealgar on the page, so the two are often found together; the arsenic sulfides were favoured by Venetian ...
		{"pararealgar", materials.KindMade, "", "../1594", "Fitzwilliam Museum, Realgar and pararealgar"},
		// Lead(II) sulfide and pararealgar on a 13th-century manuscript, abstract: Byzantine/Syriac Gospel lectionary of the early 13th century.
		{"pararealgar", materials.KindAttested, "145", "1200/1239", "Lead(II) sulfide and pararealgar on a 13th-century manuscript, abstract"},
		// Pararealgar by Raman microspectroscopy (Tintoretto), abstract: A major work by Jacopo Tintoretto (active about 1540-1594).
		{"pararealgar", materials.KindAttested, "IT", "1540/1594", "Pararealgar by Raman microspectroscopy (Tintoretto), abstract"},
		// Raman spectroscopic analysis of ancient Egyptian pigments, abstract: realgar with pararealgar in a Tell el-Amarna specimen, about 1340 BCE.
		{"pararealgar", materials.KindAttested, "EG", "-1339~", "Raman analysis of Amarna pigments, abstract"},
		// Raman analysis of pigments from the Egyptian Old Kingdom, J. Raman Spectrosc. 35 (2004), abstract: jarosite on Old Kingdom objects, not an alteration product; the start is left open.
		{"jarosite", materials.KindMade, "", "../-2180", "J. Raman Spectrosc. 35 (2004), Old Kingdom pigments, abstract"},
		{"jarosite", materials.KindAttested, "EG", "-2685/-2180", "J. Raman Spectrosc. 35 (2004), Old Kingdom pigments, abstract"},
		// Uda et al., NIM B (2000), Malqata palace, abstract: goethite the yellow of the painted walls of Amenhotep III's Malqata palace; the start is left open.
		{"mineral-goethite", materials.KindMade, "", "../-1351", "Uda et al., NIM B (2000), Malqata palace, abstract"},
		// Uda et al., NIM B (2000), Malqata palace, abstract: Painted walls of the Malqata palace, Thebes, founded by Amenhotep III (18th Dynasty; reign dates conventional, from memory).
		{"mineral-goethite", materials.KindAttested, "EG", "-1389/-1351", "Uda et al., NIM B (2000), Malqata palace, abstract"},
		// J. Raman Spectrosc. abstract on Pompeii pigments: goethite among the ochres in bowls and wall paintings of Pompeii and the Vesuvian area; the start is left open.
		{"mineral-goethite", materials.KindMade, "", "../0079", "J. Raman Spectrosc. abstract on Pompeii pigments"},
		// Roucadour cave pigments, J. Raman Spectrosc. (2006), abstract: magnetite grains with haematite, manganese oxide and carbon in dark red paint of the Palaeolithic Roucadour ...
		{"magnetite", materials.KindMade, "", "../-9999", "Roucadour cave pigments, J. Raman Spectrosc. (2006), abstract"},
		// Tübingen, GRAPHTEC project page: graphite decoration of pottery spread over most of the Balkans during the 5th millennium BCE.
		{"graphite", materials.KindMade, "", "-4999/-4000", "Tübingen, GRAPHTEC project page"},
		// Kelsey Museum, Ancient Color, White pigments: kaolinite among the white pigments of Mediterranean antiquity, from clay deposits found throughout the Mediterranean; the start ...
		{"kaolin", materials.KindMade, "", "../0399", "Kelsey Museum, Ancient Color, White pigments"},
		// Mogao pigments page (dhdzgy.com): kaolin among the whites of the Mogao murals; the start is left open.
		{"kaolin", materials.KindMade, "", "../1368", "Mogao pigments page (dhdzgy.com)"},
		// Mogao pigments page (dhdzgy.com): talc among the whites of the Mogao murals; the start is left open.
		{"talc", materials.KindMade, "", "../1368", "Mogao pigments page (dhdzgy.com)"},
		// Atanassova et al., Minerals 14 (2024), 152, abstract: talc in the white paint of Early Neolithic sherds, Thracian valley (period end from memory).
		{"talc", materials.KindMade, "", "../-5499", "Atanassova et al., Minerals 14 (2024), abstract"},
	}
	checkSourceRows(t, d, naturalFile, rows)
}

// TestNaturalTradeFacts checks facts of the trade (common practice) and
// safety properties the family must carry.
func TestNaturalTradeFacts(t *testing.T) {
	d := checkBuiltin(t)

	t.Run("a misspelt dayflower suggests dayflower", func(t *testing.T) {
		// The dayflower blue of Japanese prints must not be hidden behind
		// safflower when a user misspells it.
		for _, name := range []string{"dayflowr", "day flower blu", "aobanna", "tsuyukussa"} {
			_, err := d.Lookup(name)
			var nf *materials.NotFoundError
			if !errors.As(err, &nf) {
				t.Errorf("Lookup(%q) = %v, want a not-found error with suggestions", name, err)
				continue
			}
			found := false
			for _, s := range nf.Suggestions {
				if m, err := d.Lookup(s); err == nil && m.ID == "dayflower-blue" {
					found = true
				}
			}
			if !found {
				t.Errorf("Lookup(%q) suggests %v, none of them dayflower blue", name, nf.Suggestions)
			}
		}
	})
	t.Run("East Asian names resolve", func(t *testing.T) {
		// Common practice: the trade names in Japanese, Chinese and Korean.
		checkNames(t, d, []nameRow{
			{"aobana", "dayflower-blue"}, {"露草", "dayflower-blue"}, {"닭의장풀", "dayflower-blue"},
			{"shikon", "gromwell"}, {"紫草", "gromwell"}, {"지치", "gromwell"},
			{"kihada", "amur-cork-tree"}, {"黄柏", "amur-cork-tree"}, {"황벽나무", "amur-cork-tree"},
			{"kuchinashi", "gardenia"}, {"栀子", "gardenia"}, {"치자", "gardenia"},
			{"huaihua", "pagoda-tree-buds"}, {"槐米", "pagoda-tree-buds"},
			{"tade-ai", "japanese-indigo"}, {"蓼藍", "japanese-indigo"},
			{"wubeizi", "chinese-gallnut"}, {"五倍子", "chinese-gallnut"},
		})
	})
	t.Run("alteration products give no hard lower bound", func(t *testing.T) {
		// Pararealgar grows from realgar in light, and the copper chlorides
		// from copper pigments and bronze: a first use as a pigment must not
		// bound older objects that carry them.
		for _, id := range []string{"pararealgar", "paratacamite", "clinoatacamite", "botallackite", "atacamite"} {
			m := mustLookup(t, d, id)
			open := false
			for _, c := range m.Claims(materials.KindMade, "") {
				if _, ok := c.Date.Earliest(); !ok {
					open = true
				}
			}
			if !open {
				t.Errorf("%s: no made claim open at its start", id)
			}
		}
	})
	t.Run("Turkey red is a family of the madder process", func(t *testing.T) {
		// Common practice: Turkey red names a process on cotton, done with
		// madder and, after 1869, with synthetic alizarin.
		checkGroups(t, d, []groupRow{{"Turkey red", []string{"turkey-red-madder"}}})
		m := mustLookup(t, d, "turkey-red-madder")
		for _, c := range m.Claims(materials.KindArrived, "GB") {
			if lo, ok := c.Date.Earliest(); ok && lo < year(1700) {
				t.Errorf("GB arrival %s before the 18th century", c.Date.EDTF())
			}
		}
	})
	t.Run("Relbunium reds precede cochineal in Peru", func(t *testing.T) {
		// Wouters and Rosario-Chirinos 1992: plant reds of Relbunium before
		// the Huari and Tiahuanaco periods (700-1100 CE).
		m := mustLookup(t, d, "relbunium")
		first, ok := earliestOf(m.Claims(materials.KindMade, ""))
		if !ok || first > year(700) {
			t.Errorf("relbunium made %v, want before 700 CE", m.Claims(materials.KindMade, ""))
		}
	})
}

// TestNaturalFileLintsClean checks what every family file promises (see
// checkFamilyFile) for this family, and that the family holds enough
// attestations.
func TestNaturalFileLintsClean(t *testing.T) {
	attested := 0
	for _, m := range checkFamilyFile(t, checkBuiltin(t), naturalFile, 38) {
		attested += len(m.Claims(materials.KindAttested, ""))
	}
	if attested < 10 {
		t.Errorf("only %d attestations in %s", attested, naturalFile)
	}
}
