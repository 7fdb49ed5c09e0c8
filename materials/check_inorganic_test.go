package materials_test

import (
	"testing"

	"terminus/materials"
)

// inorganicFile is the family file these checks cover: the inorganic and
// early synthetic pigments of the 18th and 19th centuries.
const inorganicFile = "inorganic-1700-1900.yaml"

// TestInorganicAgainstSources checks that the embedded dataset holds dates
// as the named published sources give them. One row per value; the source
// and the place in it stand beside the value, and rows taken from memory
// say so.
func TestInorganicAgainstSources(t *testing.T) {
	d := checkBuiltin(t)
	rows := []sourceRow{
		// Kraft, "The history of Prussian blue", Taylor & Francis chapter, abstract: invented in Berlin in 1706.
		{"prussian-blue", materials.KindMade, "", "1706", "Kraft, History of Prussian blue, abstract"},
		// Buxbaum et al., Industrial Inorganic Pigments, section 3.6.1: discovered by Diesbach in Berlin in 1704.
		{"prussian-blue", materials.KindMade, "", "1704", "Buxbaum et al., Industrial Inorganic Pigments, 3.6.1"},
		// Degussa, Iron Blue Pigments: Woodward's account of its manufacture, 1726.
		{"prussian-blue", materials.KindArrived, "GB", "1726", "Degussa, Iron Blue Pigments"},
		// Wikipedia, "Prussian blue", older revision (liquisearch), History: the recipe published by John Woodward in 1724.
		{"prussian-blue", materials.KindArrived, "GB", "../1724", "Wikipedia, Prussian blue, History (older revision)"},
		// Tokyo National Research Institute for Cultural Properties, Gungyo-zu page: among the earliest uses in Japanese painting (Jakuchū, 1716-1800).
		{"prussian-blue", materials.KindArrived, "JP", "../1800", "Tobunken, Dōshoku sai-e, Gungyo-zu"},
		// AMICO catalogue record, Hokusai, The Kirifuri Waterfall: Prussian blue introduced into Japan in 1825.
		{"prussian-blue", materials.KindArrived, "JP", "1825", "AMICO, Hokusai, Kirifuri Waterfall"},
		// Bailey, Studies in Conservation 57 (2012), abstract: on Canton watercolours sent 1817-1830.
		{"prussian-blue", materials.KindArrived, "CN", "1817/1830", "Bailey 2012, abstract"},
		// Seldes et al., JAIC 38 (1999), Conclusions: not in Cuzco paintings before 1770; first South American record 1789.
		{"prussian-blue", materials.KindArrived, "PE", "1770~", "Seldes et al. 1999, Conclusions"},
		{"prussian-blue", materials.KindArrived, "005", "1789", "Seldes et al. 1999, Conclusions"},
		// Journal of Color Science and Technology, Qajar penboxes, abstract: chrome green places a work after the mid-19th century.
		{"chrome-green", materials.KindArrived, "IR", "1850~", "JCST, Qajar penboxes, abstract"},
		// Wikipedia, "Scheele's green", lead section: invented by Scheele in 1775.
		{"scheeles-green", materials.KindMade, "", "1775", "Wikipedia, Scheele's green, lead"},
		// Gettens and Stout, Painting Materials (1942), p. 113, Emerald green: first made at Schweinfurt in 1814.
		{"emerald-green", materials.KindMade, "", "1814", "Gettens and Stout 1942, p. 113"},
		// KIK-IRPA glossary, vert de Schweinfurt: Mitis at Kirchberg near Vienna, 1798-1812.
		{"emerald-green", materials.KindMade, "", "1798/1812", "KIK-IRPA, vert de Schweinfurt"},
		// Frimmel, Studien und Skizzen zur Gemäldekunde 1 (1913), p. 239: Scheele's green invented 1778.
		{"scheeles-green", materials.KindMade, "", "1778", "Frimmel 1913, p. 239"},
		// Winsor & Newton, "Spotlight on colour: Emerald Green" (2013): available to artists until the 1960s.
		{"emerald-green", materials.KindWithdrawn, "", "196X", "Winsor & Newton, Emerald Green (2013)"},
		// German Wikipedia, "Schweinfurter Grün", lead: a pesticide to around the middle of the 20th century.
		{"emerald-green", materials.KindWithdrawn, "", "1940/1969", "Wikipedia (de), Schweinfurter Grün"},
		// Wikipedia, "Cobalt blue", Historical uses: Thénard 1802; production in France from 1807.
		{"cobalt-blue", materials.KindMade, "", "1802", "Wikipedia, Cobalt blue"},
		{"cobalt-blue", materials.KindSold, "", "1807", "Wikipedia, Cobalt blue"},
		// Wikipedia, "Cerulean", recent revision: Höpfner first synthesized cobalt stannate in 1789.
		{"cerulean-blue", materials.KindMade, "", "1789", "Wikipedia, Cerulean"},
		// MFA Boston, CAMEO, Cerulean blue: Höpfner 1805; sold as coeruleum by Rowney in 1860.
		{"cerulean-blue", materials.KindMade, "", "1805", "CAMEO, Cerulean blue"},
		{"cerulean-blue", materials.KindSold, "", "1860", "CAMEO, Cerulean blue"},
		// Gettens and Stout, Painting Materials (1942), p. 109, Cobalt green: discovered by Rinmann in 1780.
		{"cobalt-green", materials.KindMade, "", "1780", "Gettens and Stout 1942, p. 109"},
		// KIK-IRPA glossary, violet de cobalt: Salvétat, 1859.
		{"cobalt-violet-phosphate", materials.KindMade, "", "1859", "KIK-IRPA, violet de cobalt"},
		// Gettens and Stout, Painting Materials (1942), p. 110, Cobalt yellow: Fischer 1848; artists' pigment 1861.
		{"aureolin", materials.KindMade, "", "1848", "Gettens and Stout 1942, p. 110"},
		{"aureolin", materials.KindSold, "", "1861", "Gettens and Stout 1942, p. 110"},
		// KIK-IRPA glossary, vert de chrome: viridian first prepared by Pannetier in 1838.
		{"viridian", materials.KindMade, "", "1838", "KIK-IRPA, vert de chrome"},
		// Palazzo Spinelli, ArgoMed glossary, record 2644: invented by Pannetier in 1835.
		{"viridian", materials.KindMade, "", "1835", "Palazzo Spinelli, ArgoMed 2644"},
		// Wikipedia, "Viridian", History: Guignet's patented process of 1859.
		{"viridian", materials.KindSold, "", "1859", "Wikipedia, Viridian, History"},
		// Gettens and Stout, Painting Materials (1942), p. 107: Vauquelin proposed chromium oxide for glazes in 1809.
		{"chromium-oxide-green", materials.KindMade, "", "1809", "Gettens and Stout 1942, p. 107"},
		// Gettens and Stout, Painting Materials (1942), p. 107: not an artists' pigment until about 1862.
		{"chromium-oxide-green", materials.KindSold, "", "1862~", "Gettens and Stout 1942, p. 107"},
		// Wikipedia, "Prussian blue", History: Frisch sold the pigment no later than 1708.
		{"prussian-blue", materials.KindSold, "", "1708", "Wikipedia, Prussian blue, History"},
		// Chipstone, American Furniture 2003, fig. 7 caption (Gilmor 1814): chrome yellow on Baltimore carriages.
		{"chrome-yellow", materials.KindArrived, "US", "1814", "Chipstone, American Furniture 2003, fig. 7"},
		// Wikipedia, "Jean-Baptiste Guimet": a synthetic route to ultramarine found in 1826.
		{"synthetic-ultramarine", materials.KindMade, "", "1826", "Wikipedia, Jean-Baptiste Guimet"},
		// Collier's Encyclopedia, vol. 10, Ultramarine: Société d'Encouragement prize awarded to Guimet in 1828.
		{"synthetic-ultramarine", materials.KindMade, "", "1828", "Collier's Encyclopedia, vol. 10, Ultramarine"},
		// Gettens and Stout, Painting Materials (1942), p. 102: cadmium yellow commercially available about 1846.
		{"cadmium-yellow", materials.KindSold, "", "1846~", "Gettens and Stout 1942, p. 102"},
		// Gettens and Stout, Painting Materials (1942), p. 102: first shown at the 1851 Exhibition (after Laurie).
		{"cadmium-yellow", materials.KindArrived, "GB", "1851", "Gettens and Stout 1942, p. 102"},
		// Gettens and Stout, Painting Materials (1942), p. 101: cadmium red commercial about 1910.
		{"cadmium-red", materials.KindSold, "", "1910~", "Gettens and Stout 1942, p. 101"},
		// Gettens and Stout, Painting Materials (1942), p. 177, Zinc white: Winsor & Newton's Chinese white, 1834.
		{"zinc-white", materials.KindSold, "", "1834", "Gettens and Stout 1942, p. 177"},
		// Gettens and Stout, Painting Materials (1942), p. 177: first trial orders from Hafkenscheid, Amsterdam, 1854.
		{"zinc-white", materials.KindArrived, "NL", "1854", "Gettens and Stout 1942, p. 177"},
		// Gettens and Stout, Painting Materials (1942), p. 93: antimony oxide as Timonox in 1920.
		{"antimony-white", materials.KindSold, "", "1920", "Gettens and Stout 1942, p. 93"},
		// Gettens and Stout, Painting Materials (1942), p. 167: ultramarine green by Köttig, Meissen, 1828.
		{"ultramarine-green", materials.KindMade, "", "1828", "Gettens and Stout 1942, p. 167"},
		// MFA Boston, CAMEO, Lead oxychloride: Turner's patent of 1781; advertised in Boston in 1784.
		{"turners-yellow", materials.KindSold, "", "1781", "CAMEO, Lead oxychloride"},
		{"turners-yellow", materials.KindArrived, "US", "1784", "CAMEO, Lead oxychloride"},
		// Wikipedia, "Paris green", Uses: used against the potato beetle in Illinois and Indiana in 1867.
		{"emerald-green", materials.KindArrived, "US", "1867", "Wikipedia, Paris green, Uses"},
		// Getty AAT, Mars black, scope note: developed in the early 20th century.
		{"mars-black", materials.KindMade, "", "1900/1933", "Getty AAT, Mars black"},
		// Wikipedia, "Braunschweigisches Grün" (German): made and sold by the Gravenhorst brothers from 1767.
		{"brunswick-green", materials.KindSold, "", "1767", "German Wikipedia, Braunschweigisches Grün"},
		// Scott, Copper and Bronze in Art (Getty, 2002), p. 323: Brunswick green made from around 1795.
		{"brunswick-green", materials.KindSold, "", "1795~", "Scott 2002, p. 323"},
		// Texas State Historical Association, Handbook of Texas, Carbon black industry: Wright's process, 1864.
		{"gas-black", materials.KindMade, "", "1864", "Handbook of Texas, Carbon black industry"},
		// Wikipedia, "Manganese violet", History: first documented production by Winsor & Newton in 1890.
		{"manganese-violet", materials.KindSold, "", "1890", "Wikipedia, Manganese violet, History"},
		// Eremin et al., Journal of Raman Spectroscopy 39 (2008), abstract: in 19th-century Thai manuscripts Prussian blue, then synthetic ultramarine, replaced indigo.
		{"prussian-blue", materials.KindArrived, "TH", "18XX", "Eremin et al. 2008, abstract"},
		{"synthetic-ultramarine", materials.KindArrived, "TH", "1826/1899", "Eremin et al. 2008, abstract (bounded below by Guimet)"},
		// Eremin et al. 2008, abstract: chrome yellow beside gamboge in one later 19th-century Thai manuscript.
		{"chrome-yellow", materials.KindArrived, "TH", "1850/1899", "Eremin et al. 2008, abstract"},
		// Wheeler, Burgio and Shulman, Journal of the Institute of Conservation 34 (2011), abstract: Prussian blue and chrome yellow on 19th-century Kalighat paintings.
		{"prussian-blue", materials.KindArrived, "IN", "18XX", "Wheeler et al. 2011, abstract"},
		{"chrome-yellow", materials.KindArrived, "IN", "1809/1899", "Wheeler et al. 2011, abstract (bounded below by Vauquelin)"},
		// Marx, blue paints in Ethiopian church paintings, summary: synthetic ultramarine spread in the second half of the 19th century.
		{"synthetic-ultramarine", materials.KindArrived, "ET", "1850/1899", "Marx, Ethiopian blues, summary"},
		// Cutts et al., British Museum Technical Research Bulletin 4 (2010), summary: early synthetic ultramarine in a painting of after 1855.
		{"synthetic-ultramarine", materials.KindArrived, "ET", "1855/1893", "Cutts et al. 2010, summary"},

		// nl.wikipedia, "Viridiaan", Geschiedenis: Field's own swatch in his Practical Journal, 1815; possibly on Turner's Somer Hill, 1812; Pannetier and Binet about 1838.
		{"viridian", materials.KindMade, "", "1815", "nl.wikipedia, Viridiaan"},
		{"viridian", materials.KindMade, "", "1812?", "nl.wikipedia, Viridiaan"},
		{"viridian", materials.KindSold, "", "1838?", "nl.wikipedia, Viridiaan"},
		{"viridian", materials.KindArrived, "GB", "1815", "nl.wikipedia, Viridiaan"},
		// Merriam-Webster, word history of "lithopone": de Douhet's French patents of 1850 and 1851.
		{"lithopone", materials.KindMade, "", "1850", "Merriam-Webster, lithopone"},
		{"lithopone", materials.KindArrived, "FR", "1850", "Merriam-Webster, lithopone"},
		// Orr's Zinc White: The First Fifty Years (1948), pp. 48-52: de Douhet's patent of 1850, worked for about two years.
		{"lithopone", materials.KindMade, "", "1850", "Orr's Zinc White, pp. 48-52"},
		// de.wikipedia, "Lithopone": first manufactured by de Douhet in 1853.
		{"lithopone", materials.KindMade, "", "1853", "de.wikipedia, Lithopone"},
		{"lithopone", materials.KindSold, "", "1853?", "de.wikipedia, Lithopone"},
		// Grace's Guide, "John Bryson Orr": experiments 1861, bulk 1868, Glasgow factory 1872.
		{"lithopone", materials.KindMade, "", "1861", "Grace's Guide, John Bryson Orr"},
		{"lithopone", materials.KindSold, "", "1868", "Grace's Guide, John Bryson Orr"},
		{"lithopone", materials.KindArrived, "GB", "../1872", "Grace's Guide, John Bryson Orr"},
		// Li et al., Heritage Science 2014, abstract: lithopone, chrome yellow and Mars red on the Jokhang wall paintings, after the 1850s.
		{"lithopone", materials.KindArrived, "CN", "1850/1910", "Li et al. 2014, abstract"},
		{"chrome-yellow", materials.KindArrived, "CN", "1850/1910", "Li et al. 2014, abstract"},
		{"mars-red", materials.KindArrived, "CN", "1850/1910", "Li et al. 2014, abstract"},
		// Andreas, Chemie in unserer Zeit 30 (1996), p. 23: Scheele's green sold as Swedish green; Mitis green 1805; Schweinfurt 1814; Nancy 1822.
		{"scheeles-green", materials.KindSold, "", "1778/1786", "Andreas 1996, p. 23"},
		{"scheeles-green", materials.KindArrived, "SE", "1778/1786", "Andreas 1996, p. 23"},
		{"emerald-green", materials.KindSold, "", "1805", "Andreas 1996, p. 23"},
		{"emerald-green", materials.KindArrived, "AT", "1805", "Andreas 1996, p. 23"},
		{"emerald-green", materials.KindArrived, "DE", "../1814", "Andreas 1996, p. 23"},
		{"emerald-green", materials.KindArrived, "FR", "1822", "Andreas 1996, p. 23"},
		// Zhang et al., Heritage Science 9 (2021), abstract: imported synthetic ultramarine and emerald green on a Guangzhou Tongcao painting, 1840-1912.
		{"emerald-green", materials.KindArrived, "CN", "1840/1912", "Zhang et al. 2021, abstract"},
		{"synthetic-ultramarine", materials.KindArrived, "CN", "1840/1912", "Zhang et al. 2021, abstract"},
		// Oh et al., Journal of Conservation Science 36 (2020), abstract: emerald green and ultramarine blue imported after the mid-19th century.
		{"emerald-green", materials.KindArrived, "KR", "1850~", "Oh et al. 2020, abstract"},
		{"emerald-green", materials.KindArrived, "JP", "1850~", "Oh et al. 2020, abstract"},
		{"synthetic-ultramarine", materials.KindArrived, "KR", "1850~", "Oh et al. 2020, abstract"},
		{"synthetic-ultramarine", materials.KindArrived, "JP", "1850~", "Oh et al. 2020, abstract"},
		// Shimadzu, Bulletin of the National Museum of Japanese History, abstract: synthetic ultramarine imported by the later 19th century.
		{"synthetic-ultramarine", materials.KindArrived, "JP", "1850/1899", "Shimadzu, Rekihaku bulletin, abstract"},
		// de.wikipedia, "Ultramarinfabriken Carl Leverkus": first factory at Wermelskirchen, 1834.
		{"synthetic-ultramarine", materials.KindArrived, "DE", "../1834", "de.wikipedia, Ultramarinfabriken Carl Leverkus"},
		// Prückner, Dingler's Polytechnisches Journal 94 (1844), p. 388: Nuremberg green ultramarine seen about ten years after 1828.
		{"ultramarine-green", materials.KindSold, "", "1838~", "Prückner 1844, p. 388"},
		{"ultramarine-green", materials.KindArrived, "DE", "1838~", "Prückner 1844, p. 388"},
		// Heritage Science 11 (2023), abstract: emerald green in Qajar manuscripts.
		{"emerald-green", materials.KindArrived, "IR", "1814/1925", "Heritage Science 2023, Qajar manuscripts"},
		// Eremin et al. 2008, abstract: emerald green and zinc yellow in the later Thai manuscripts.
		{"emerald-green", materials.KindArrived, "TH", "1814/1999", "Eremin et al. 2008, abstract"},
		{"zinc-yellow", materials.KindArrived, "TH", "1809/1999", "Eremin et al. 2008, abstract"},
		// James, JAIC 44 (2005), abstract: Prussian blue in Ethiopian icons of the 17th-19th centuries.
		{"prussian-blue", materials.KindArrived, "ET", "1704/1899", "James 2005, abstract"},
		// ICOM-CC thangka forum 2009, abstract: brass powder on a late 19th- or early 20th-century Tibetan thangka.
		{"bronze-powder", materials.KindArrived, "CN", "1850/1949", "ICOM-CC 2009, thangkas"},
		// Wikipedia, "Cobalt blue": Blaafarveværket, Norway, the leading maker in the 19th century.
		{"cobalt-blue", materials.KindArrived, "NO", "18XX", "Wikipedia, Cobalt blue"},
		// Chipstone, American Furniture 2003, fig. 7: chrome yellow in trade use at Baltimore by 1814.
		{"chrome-yellow", materials.KindSold, "", "1814", "Chipstone, American Furniture 2003, fig. 7"},
		// National Gallery Technical Bulletin, Monet's Bathers at La Grenouillère: chrome yellow introduced about 1818.
		{"chrome-yellow", materials.KindSold, "", "1818~", "NG Technical Bulletin, Bathers at La Grenouillère"},
		// Monico et al., EPJ Plus 137 (2022), introduction: cadmium red sold from 1910; cadmium red lithopone from 1921.
		{"cadmium-red", materials.KindSold, "", "1910", "Monico et al. 2022, introduction"},
		{"cadmium-red-lithopone", materials.KindMade, "", "1921", "Monico et al. 2022, introduction"},
		// Salter's Field's Chromatography (1869): prussiate of copper, and Bouvier's French Prussian brown.
		{"copper-ferrocyanide-brown", materials.KindMade, "", "1706/1869", "Salter 1869, Prussiate of copper"},
		{"prussian-brown", materials.KindMade, "", "1706/1869", "Salter 1869, French Prussian-brown"},
		// Attestations: the object's date as the source gives it.
		// National Gallery Technical Bulletin, Monet's Bathers at La Grenouillère (1869): the pigments identified.
		{"prussian-blue", materials.KindAttested, "FR", "1869", "NG Technical Bulletin, Bathers at La Grenouillère"},
		{"cobalt-blue", materials.KindAttested, "FR", "1869", "NG Technical Bulletin, Bathers at La Grenouillère"},
		{"chrome-yellow", materials.KindAttested, "FR", "1869", "NG Technical Bulletin, Bathers at La Grenouillère"},
		{"barium-yellow", materials.KindAttested, "FR", "1869", "NG Technical Bulletin, Bathers at La Grenouillère"},
		{"emerald-green", materials.KindAttested, "FR", "1869", "NG Technical Bulletin, Bathers at La Grenouillère"},
		{"chrome-green", materials.KindAttested, "FR", "1869", "NG Technical Bulletin, Bathers at La Grenouillère"},
		// Berns et al., Seurat's Grande Jatte: first campaign 1884-85; zinc yellow in the divisionist campaign from October 1885.
		{"chrome-yellow", materials.KindAttested, "FR", "1884/1885", "Berns et al., Grande Jatte"},
		{"cadmium-yellow", materials.KindAttested, "FR", "1884/1885", "Berns et al., Grande Jatte"},
		{"viridian", materials.KindAttested, "FR", "1884/1885", "Berns et al., Grande Jatte"},
		{"emerald-green", materials.KindAttested, "FR", "1884/1885", "Berns et al., Grande Jatte"},
		{"cobalt-blue", materials.KindAttested, "FR", "1884/1885", "Berns et al., Grande Jatte"},
		{"zinc-yellow", materials.KindAttested, "FR", "1885-10/1886", "Berns et al., Grande Jatte"},
		// Wikipedia, "Blue": the pigments of Monet's Gare Saint-Lazare (1877).
		{"cerulean-blue", materials.KindAttested, "FR", "1877", "Wikipedia, Blue"},
		{"synthetic-ultramarine", materials.KindAttested, "FR", "1877", "Wikipedia, Blue"},
		// Heritage Science 5 (2017): Van Gogh's Irises, May 1890.
		{"cobalt-blue", materials.KindAttested, "FR", "1890-05", "Heritage Science 2017, Irises and Roses"},
		{"zinc-white", materials.KindAttested, "FR", "1890-05", "Heritage Science 2017, Irises and Roses"},
		{"prussian-blue", materials.KindAttested, "FR", "1890-05", "Heritage Science 2017, Irises and Roses"},
		// Heritage Science 2019, abstract: chrome yellows in Field with Irises near Arles (1888).
		{"chrome-yellow", materials.KindAttested, "FR", "1888", "Heritage Science 2019, Field with Irises"},
		// Conserva 12 (2008), abstract: Sans y Cabot's Colonización de México, 1863 (place of making not stated).
		{"cobalt-blue", materials.KindAttested, "", "1863", "Conserva 12, 2008, abstract"},
		{"zinc-white", materials.KindAttested, "", "1863", "Conserva 12, 2008, abstract"},
		// Seonwonsa Ksitigarbha painting of 1917, abstract: emerald green.
		{"emerald-green", materials.KindAttested, "KR", "1917", "Seonwonsa Ksitigarbha study, abstract"},
		// Cutts et al., BM Technical Research Bulletin 4 (2010), summary: synthetic ultramarine, after 1855, given 1893.
		{"synthetic-ultramarine", materials.KindAttested, "ET", "1855/1893", "Cutts et al. 2010, summary"},
		// Japanese prints and paintings: Heritage Science 2018 (1864) and 2016 (1864-1895); Tobunken (Jakuchū); Kibi International University (Ryukyu map, 1781-1798).
		{"prussian-blue", materials.KindAttested, "JP", "1864", "Heritage Science 2018, nishiki-e timeline"},
		{"prussian-blue", materials.KindAttested, "JP", "1864/1895", "Heritage Science 2016, Meiji prints"},
		{"prussian-blue", materials.KindAttested, "JP", "1716/1800", "Tobunken, Dōshoku sai-e, Gungyo-zu"},
		{"prussian-blue", materials.KindAttested, "JP", "1781/1798", "Kibi International University, Ryukyu map"},
		// Wikipedia, "Prussian blue", older revision (liquisearch), History: van der Werff's Entombment of 1709 the oldest known painting with it.
		{"prussian-blue", materials.KindAttested, "NL", "1709", "Wikipedia, Prussian blue, History (older revision)"},
		// Roy, NG Technical Bulletin 28 (2007), abstract: Monet's late palette.
		{"cobalt-violet-arsenate", materials.KindAttested, "FR", "1900/1926", "Roy 2007, abstract"},
		{"zinc-yellow", materials.KindAttested, "FR", "1900/1926", "Roy 2007, abstract"},
		{"viridian", materials.KindAttested, "FR", "1900/1926", "Roy 2007, abstract"},
		{"cadmium-yellow", materials.KindAttested, "FR", "1900/1926", "Roy 2007, abstract"},
		// Mass et al. 2013 (Matisse, 1905-06) and Monico et al. 2020 (Munch, The Scream, about 1910).
		{"cadmium-yellow", materials.KindAttested, "FR", "1905/1906", "Mass et al. 2013, abstract"},
		{"cadmium-yellow", materials.KindAttested, "NO", "1910~", "Monico et al. 2020, abstract"},
		// Journal of the Institute of Conservation 41 (2018), abstract: Hooker's green on 19th-century Chinese export watercolours.
		{"hookers-green", materials.KindArrived, "CN", "18XX", "JIC 2018, Chinese export watercolours"},
		// Heritage Science 2019, abstract: Prussian blue the main blue of Burmese yun lacquer, 18th-20th centuries.
		{"prussian-blue", materials.KindArrived, "MM", "1704/1999", "Heritage Science 2019, Burmese yun lacquer"},
		// Kantoğlu et al., Restaurator 39 (2018), abstract: Prussian blue and zinc oxide in Ottoman documents.
		{"prussian-blue", materials.KindArrived, "TR", "1704/1922", "Kantoğlu et al. 2018, abstract"},
		{"zinc-white", materials.KindArrived, "TR", "1782/1922", "Kantoğlu et al. 2018, abstract"},
		// Wikipedia, "Cobalt blue": Saxon blue colour works in the 19th century.
		{"cobalt-blue", materials.KindArrived, "DE", "18XX", "Wikipedia, Cobalt blue"},
		// Merriam-Webster, word history of "lithopone": Leger's Belgian patent application of 1869.
		{"lithopone", materials.KindArrived, "BE", "1869", "Merriam-Webster, lithopone"},
		// From memory (the grant year), the patent text read: Cumberland's US patent 767 for a lead sulfate white.
		{"lead-sulfate-white", materials.KindMade, "", "1838", "US patent 767 (year from memory)"},
		// Jones and Ledingham, "Arsenic in Napoleon's wallpaper", Nature, title and abstract (Semantic Scholar): the Longwood wallpaper, St Helena, 1815-1821.
		{"scheeles-green", materials.KindAttested, "SH", "1815/1821", "Jones and Ledingham, Nature, Napoleon's wallpaper"},
		// Otero et al., Heritage Science 5:46 (2017), abstract: 19th-century Winsor & Newton records of zinc (Citron) and barium (Lemon) chromates.
		{"zinc-yellow", materials.KindMade, "", "18XX", "Otero et al. 2017, abstract"},
		{"barium-yellow", materials.KindMade, "", "18XX", "Otero et al. 2017, abstract"},
		// Field, Chromatography (an edition by Field, before Salter's 1869 revision), III Chrome greens: chromate of lead with Prussian blue.
		{"chrome-green", materials.KindMade, "", "1809/1854", "Field, Chromatography, Chrome greens"},
		// Knight's Cyclopaedia of the Industry of All Nations (1851), Bronzing; bronze powder: beaten copper-alloy leaves ground to powder.
		{"bronze-powder", materials.KindMade, "", "../1851", "Knight's Cyclopaedia 1851, Bronzing"},
		// Edwards, Aluminum Paint and Powder (2nd ed., 1936), Preface: commercially available for most of the fifty years since 1886.
		{"aluminium-powder", materials.KindSold, "", "1886/1911", "Edwards 1936, Preface"},
		// Journal of Raman Spectroscopy 1999, abstract: chrome orange and baryte on Javanese and Thai manuscripts.
		{"chrome-orange", materials.KindArrived, "035", "1809/1999", "J. Raman Spectrosc. 1999, Asian manuscripts"},
		{"barytes", materials.KindArrived, "035", "1782/1999", "J. Raman Spectrosc. 1999, Asian manuscripts"},
		// Second round, arrivals:
		// Nandadeva 1998 (PhD thesis, Delaware), abstract: Sri Lankan temple murals, mid-18th to late 19th century.
		{"prussian-blue", materials.KindArrived, "LK", "../1899", "Nandadeva 1998, abstract"},
		{"lithopone", materials.KindArrived, "LK", "../1899", "Nandadeva 1998, abstract"},
		// Gajic-Kvascev et al., Coatings 13 (2023) 1200, abstract and section 1: Serbian icons of 1700-1750.
		{"prussian-blue", materials.KindArrived, "RS", "../1750", "Gajic-Kvascev et al. 2023, abstract"},
		// Petroviciu et al., Heritage Science 2019, abstract: Transylvanian textiles acquired about 1905.
		{"prussian-blue", materials.KindArrived, "RO", "../1905", "Petroviciu et al. 2019, abstract"},
	}
	checkSourceRows(t, d, inorganicFile, rows)
}

// TestInorganicTradeFacts checks facts of the trade (common practice) that
// this family must carry, and that the dates practitioners quarrel over are
// kept as separate claims.
func TestInorganicTradeFacts(t *testing.T) {
	d := checkBuiltin(t)

	t.Run("Prussian blue in Japan by about 1830", func(t *testing.T) {
		// Common practice: Prussian blue was in use in Japan by about 1830.
		m := mustLookup(t, d, "Berlin blue")
		claims, area := d.Arrival(m, "JP")
		if area != "JP" || len(claims) == 0 {
			t.Fatalf("no arrival in JP (area %q)", area)
		}
		ok := false
		for _, c := range claims {
			if lo, bounded := c.Date.Earliest(); bounded && lo < year(1836) {
				ok = true
			}
		}
		if !ok {
			t.Errorf("no JP arrival at or before about 1830")
		}
	})
	disputes := []struct {
		name  string
		kind  materials.Kind
		years []string
	}{
		// Common practice: the disputed years of the field (each claim with its own source).
		{"Prussian blue", materials.KindMade, []string{"1704", "1706"}},
		{"cerulean blue", materials.KindMade, []string{"1789", "1805"}},
		{"viridian", materials.KindMade, []string{"1835", "1838"}},
		{"synthetic ultramarine", materials.KindMade, []string{"1826", "1828"}},
	}
	for _, c := range disputes {
		t.Run(c.name+" keeps both claims", func(t *testing.T) {
			m := mustLookup(t, d, c.name)
			have := map[string]string{}
			for _, ms := range m.Claims(c.kind, "") {
				have[ms.Date.EDTF()] = ms.Source
			}
			sources := map[string]bool{}
			for _, y := range c.years {
				src, ok := have[y]
				if !ok {
					t.Errorf("%s: no %s claim dated %s; have %v", c.name, c.kind, y, have)
					continue
				}
				sources[src] = true
			}
			if len(sources) < 2 && len(have) > 0 {
				t.Errorf("%s: the disputed claims should come from different sources, got %v", c.name, have)
			}
		})
	}
	t.Run("sale follows invention", func(t *testing.T) {
		// Common practice: invention is not availability; a colour is sold no
		// earlier than it is first made.
		for _, m := range familyMaterials(d, inorganicFile) {
			made, ok := earliestOf(m.Claims(materials.KindMade, ""))
			if !ok {
				continue
			}
			for _, s := range m.Claims(materials.KindSold, "") {
				if hi, bounded := s.Date.Latest(); bounded && hi < made {
					t.Errorf("%s: sold %s lies wholly before the earliest made claim", m.ID, s.Date.EDTF())
				}
			}
		}
	})
	t.Run("arsenic greens have an end", func(t *testing.T) {
		// Common practice: the copper-arsenic greens went out of manufacture.
		for _, name := range []string{"emerald green", "Scheele's green"} {
			m := mustLookup(t, d, name)
			ws := m.Claims(materials.KindWithdrawn, "")
			if len(ws) == 0 {
				t.Errorf("%s: no withdrawn claim", name)
			}
			for _, w := range ws {
				if w.Allowance == nil {
					t.Errorf("%s: withdrawn %s has no allowance for lingering stocks", name, w.Date.EDTF())
				}
			}
		}
	})
	t.Run("variants stay apart", func(t *testing.T) {
		// Common practice: hydrated and anhydrous chromium oxide greens, and the
		// two cobalt violets, are different pigments with different dates.
		checkApart(t, d, [][2]string{
			{"viridian", "chromium oxide green"},
			{"cobalt violet dark", "cobalt violet light"},
			{"cadmium red", "cadmium red lithopone"},
			{"ultramarine violet", "ultramarine red"},
		})
	})
}

// TestInorganicFileLintsClean checks what every family file promises (see
// checkFamilyFile) for this family.
func TestInorganicFileLintsClean(t *testing.T) {
	checkFamilyFile(t, checkBuiltin(t), inorganicFile, 30)
}
