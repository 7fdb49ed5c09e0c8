package materials_test

import (
	"testing"

	"terminus/materials"
)

// modernFile is the family file these checks cover: 20th-century pigments,
// writing and printing inks, and the other dated materials (binders,
// brighteners, papers, boards and film bases).
const modernFile = "modern-pigments-inks-other.yaml"

// TestModernAgainstSources checks that the embedded dataset holds dates as
// the named published sources give them. One row per value; the source and
// the place in it stand beside the value. Rows written from memory say so.
func TestModernAgainstSources(t *testing.T) {
	d := checkBuiltin(t)
	rows := []sourceRow{
		// Gettens and Stout, Painting Materials (1942), entry Titanium White, p. 161: regular production in Norway and America about 1916-1919.
		{"titanium-white-anatase", materials.KindSold, "", "1916/1919", "Gettens and Stout 1942, p. 161"},
		// MFA Boston text in the Palazzo Spinelli glossary, "Titanium white": commercial manufacture in Norway and the US in 1916.
		{"titanium-white-anatase", materials.KindSold, "", "1916", "Palazzo Spinelli / MFA Boston, Titanium white"},
		// Same entry: rutile white pigments first produced commercially in 1940.
		{"titanium-white-rutile", materials.KindSold, "", "1940", "Palazzo Spinelli / MFA Boston, Titanium white"},
		// Gettens and Stout 1942, entry Para Red, p. 132: first made by Holliday and Sons in 1880.
		{"para-red", materials.KindMade, "", "1880", "Gettens and Stout 1942, p. 132"},
		// Gettens and Stout 1942, entry Lithol Red, p. 125: first made by Julius in 1899.
		{"lithol-red-pr49", materials.KindMade, "", "1899", "Gettens and Stout 1942, p. 125"},
		// Gettens and Stout 1942, entry Manganese Blue, p. 128: first in the patent literature about 1935.
		{"manganese-blue", materials.KindSold, "", "1935~", "Gettens and Stout 1942, p. 128"},
		// MFA Boston, CAMEO, "Manganese blue", Description: discovered 1907.
		{"manganese-blue", materials.KindMade, "", "1907", "CAMEO, Manganese blue"},
		// Encyclopaedia Britannica, "dye", Phthalocyanine compounds: the copper compound known from 1927, introduced 1934.
		{"phthalocyanine-blue", materials.KindMade, "", "1927", "Britannica, dye, Phthalocyanine compounds"},
		// MFA Boston, CAMEO, "Phthalocyanine blue", Description: marketed by ICI as Monastral blue in 1935.
		{"phthalocyanine-blue", materials.KindSold, "", "1935", "CAMEO, Phthalocyanine blue"},
		// Wikipedia, "Quinacridone", Derivatives: first sold as pigments by Du Pont in 1958.
		{"quinacridone", materials.KindSold, "", "1958", "Wikipedia, Quinacridone, Derivatives"},
		// Wallquist and Lenz, High Performance Pigments (2009), ch. 11: first DPP pigment on the market in 1986.
		{"diketopyrrolopyrrole-red", materials.KindSold, "", "1986", "Wallquist and Lenz 2009, ch. 11"},
		// Christie and Abel, Physical Sciences Reviews 6 (2021), abstract: DPP system discovered by accident in 1974.
		{"diketopyrrolopyrrole-red", materials.KindMade, "", "1974", "Christie and Abel 2021, abstract"},
		// MFA Boston, CAMEO, "Red lake C": first synthesised in Germany in 1902.
		{"red-lake-c", materials.KindMade, "", "1902", "CAMEO, Red lake C"},
		// From memory, not read here: Herbst and Hunger, Industrial Organic Pigments, Hansa Yellow G found 1909.
		// Chemie der organischen Farbstoffe (TIB record 1860183395), p. 48: the first azo dye, 1859 (lower bound).
		{"hansa-yellow-g", materials.KindMade, "", "1859/..", "Chemie der organischen Farbstoffe, p. 48"},
		// Messier, Baas, Tafilowski and Varga, JAIC 44 (2005), abstract: first brightener in samples of 1950-54.
		{"optical-brightener-photographic-paper", materials.KindMade, "", "1950/1954", "Messier et al. 2005, abstract"},
		// Wikipedia, "Acrylic paint", History: Rowney's Cryla of 1963, the first artists' acrylic in Europe.
		{"acrylic-emulsion-paint", materials.KindArrived, "150", "../1963", "Wikipedia, Acrylic paint, History"},
		// Wikipedia, "Acrylic paint", History: Politec colours made in Mexico in 1953.
		{"acrylic-emulsion-paint", materials.KindArrived, "MX", "1953", "Wikipedia, Acrylic paint, History"},
		// Biographical dictionary of Hungarians (English), entry Bíró: the pen on the market in Argentina in 1945.
		{"ballpoint-paste-ink", materials.KindSold, "", "1945", "Biographical dictionary of Hungarians, Bíró"},
		{"ballpoint-paste-ink", materials.KindArrived, "AR", "1945", "Biographical dictionary of Hungarians, Bíró"},
		// Wikipedia, "Reynolds International Pen Company", lead: first ballpoints sold on the US market, October 1945.
		{"ballpoint-paste-ink", materials.KindArrived, "US", "../1945-10", "Wikipedia, Reynolds International Pen Company"},
		// Wikipedia, "Sulfite process", History: first kraft mill, Sweden, 1890.
		{"kraft-pulp-paper", materials.KindSold, "", "1890", "Wikipedia, Sulfite process, History"},
		// Encyclopaedia Britannica, "papermaking": Dahl's sulphate (kraft) pulp of 1884.
		{"kraft-pulp-paper", materials.KindMade, "", "1884", "Britannica, papermaking"},
		// Paper Discovery Center, Hall of Fame, Keller: first commercial groundwood pulp in the US, 1867.
		{"groundwood-paper", materials.KindArrived, "US", "../1867", "Paper Discovery Center, Keller"},
		// Smithsonian HistoryWired, Robert's paper machine: first two Fourdrinier machines in the US, 1827.
		{"fourdrinier-machine-paper", materials.KindArrived, "US", "../1827", "Smithsonian HistoryWired"},
		// Hazen, Studies in Bibliography 5 (1952-53), p. 187: Baskerville's Vergil of 1757.
		{"wove-paper", materials.KindMade, "", "1757", "Hazen 1952-53, p. 187"},
		// Lauren Rogers Museum of Art, Masonite and American Art (2007): invented at Laurel in 1924.
		{"hardboard-masonite", materials.KindMade, "", "1924", "Lauren Rogers Museum of Art 2007, p. 2"},
		// Wikipedia, "Cellulose acetate film", History: triacetate base introduced in 1948.
		{"cellulose-triacetate-film-base", materials.KindMade, "", "1948", "Wikipedia, Cellulose acetate film"},
		// DuPont heritage page "1923 Duco Paint": marketed as Viscolac in 1921 (Duco on Oakland cars from 1923).
		{"nitrocellulose-lacquer-duco", materials.KindSold, "", "1921", "DuPont heritage, Duco"},
		// Wikipedia, "Alizarine ink": created by Leonhardi in 1855.
		{"alizarine-ink", materials.KindMade, "", "1855", "Wikipedia, Alizarine ink"},
		// Encyclopaedia Britannica, biography "Hugh Burgess": the soda process of 1851; US patent 1854.
		{"soda-pulp-paper", materials.KindMade, "", "1851", "Britannica, Hugh Burgess"},
		{"soda-pulp-paper", materials.KindArrived, "US", "../1854", "Britannica, Hugh Burgess"},
		// The Apsley Paper Trail, "The cylinder mould machine": Dickinson's machine patented at Apsley in 1809.
		{"cylinder-mould-machine-paper", materials.KindMade, "", "1809", "Apsley Paper Trail, cylinder mould machine"},
		// Same page: the type first used by the US paper industry in 1819 (the Smithsonian gives 1817).
		{"cylinder-mould-machine-paper", materials.KindArrived, "US", "1819", "Apsley Paper Trail, cylinder mould machine"},
		{"cylinder-mould-machine-paper", materials.KindArrived, "US", "1817", "Smithsonian HistoryWired"},
		// Wikipedia, "Film stock": Kodak discontinued nitrate base in 1951.
		{"cellulose-nitrate-film-base", materials.KindWithdrawn, "US", "1951", "Wikipedia, Film stock"},
		// Hazards in Collections, "Nitrate film": Eastman roll film from 1889.
		{"cellulose-nitrate-film-base", materials.KindMade, "", "1889", "Hazards in Collections, Nitrate film"},
		// NIOSH Hazard Review: Carbonless Copy Paper, section 1.2: introduced by NCR in 1954; Japanese licence 1962.
		{"carbonless-copy-paper", materials.KindMade, "", "1954", "NIOSH, Carbonless Copy Paper, 1.2"},
		{"carbonless-copy-paper", materials.KindArrived, "JP", "../1962", "NIOSH, Carbonless Copy Paper, 1.2"},
		// Birmingham Archives of Soho, "Copying press": the first presses sold in 1780.
		{"copying-ink", materials.KindSold, "", "1780", "Birmingham Archives of Soho, Copying press"},
		// Encyclopaedia Britannica, "Bakelite": invented in 1907.
		{"bakelite", materials.KindMade, "", "1907", "Britannica, Bakelite"},
		// Winsor & Newton, "Spotlight on: Manganese Blue": barium manganate phased out in the 1970s.
		{"manganese-blue", materials.KindWithdrawn, "", "197X", "Winsor & Newton, Manganese Blue"},
		// French Wikipedia, "Bleu de manganèse" (2010 copy), Composition: barium manganate production ceased in the early 1970s.
		{"manganese-blue", materials.KindWithdrawn, "", "197X", "Wikipédia (fr), Bleu de manganèse"},
		// MFA Boston, CAMEO, "Rutile": experimental rutile pigments patented 1931; industrial production began 1938/39.
		{"titanium-white-rutile", materials.KindMade, "", "1931", "CAMEO, Rutile"},
		{"titanium-white-rutile", materials.KindSold, "", "1938/1939", "CAMEO, Rutile"},
		// Chamberlain, in Faulkner and Schwartz, High Performance Pigments (2009), ch. 12: sulphonated dioxazines found at Hoechst in 1928.
		{"dioxazine-violet", materials.KindMade, "", "1928", "Chamberlain 2009, ch. 12"},
		// Wikipedia, "Film base", Polyester: first used for specialised photographic applications in 1955.
		{"polyester-film-base", materials.KindSold, "", "1955", "Wikipedia, Film base, Polyester"},
		// Wikipedia, "Polyvinyl acetate", lead: discovered by Klatte in 1912 (the conservative start for PVA paints).
		{"pva-emulsion-paint", materials.KindMade, "", "1912", "Wikipedia, Polyvinyl acetate"},
		// Hilton, Forensic Science International 26 (1984), pp. 269-275: Paper Mate introduced the Eraser Mate in early 1979.
		{"erasable-ballpoint-ink", materials.KindMade, "", "1979", "Hilton 1984, Forensic Sci. Int."},
		{"erasable-ballpoint-ink", materials.KindSold, "", "1979", "Hilton 1984, Forensic Sci. Int."},
		// Japanese Wikipedia, "Sakura Kurepasu", overview: the Pigma pigment-ink pen of 1982 and the Ball Sign gel-ink ballpoint of 1984.
		{"pigment-fineliner-ink", materials.KindSold, "", "1982", "Wikipedia (ja), Sakura Kurepasu"},
		{"pigment-fineliner-ink", materials.KindMade, "", "../1982", "Wikipedia (ja), Sakura Kurepasu"},
		{"gel-pen-ink", materials.KindSold, "", "1984", "Wikipedia (ja), Sakura Kurepasu"},
		{"gel-pen-ink", materials.KindMade, "", "../1984", "Wikipedia (ja), Sakura Kurepasu"},
		// TIME, 12 February 1979: Paper Mate's erasable Eraser Mate to be launched in spring 1979.
		{"erasable-ballpoint-ink", materials.KindMade, "", "1979", "TIME, 12 February 1979"},
		// Heritage Science 2022, Farbenbuch colour charts, Table 1: Pigment Red 3, discovery or first synthesis 1904; found in a 1925 chart.
		{"toluidine-red", materials.KindMade, "", "1904", "Heritage Science 2022, Farbenbuch charts, Table 1"},
		{"toluidine-red", materials.KindAttested, "DE", "1925", "Heritage Science 2022, Farbenbuch charts, Table 1"},
		// Bagchi, Private Investment in India 1900-1939 (1972), ch. 13, The industry up to 1924: Bally Paper Mills, one machine, 1870.
		{"fourdrinier-machine-paper", materials.KindArrived, "IN", "1870", "Bagchi 1972, ch. 13"},
		// chinaadvent.com, Tianzhang Recording Paper Factory, Origins: Shanghai Machine Paper Mill approved in 1882.
		{"fourdrinier-machine-paper", materials.KindArrived, "CN", "1882", "chinaadvent.com, Tianzhang paper factory, Origins"},
		// Damlıbağ, OTAM 37 (2015), abstract: the Hamidiye paper factory in production in 1893.
		{"fourdrinier-machine-paper", materials.KindArrived, "TR", "../1893", "Damlıbağ 2015, abstract"},
		// Technology in Australia 1788-1988, ch. 4 VIII Pulp and Paper, p. 245: machine mills at Liverpool and South Melbourne, 1868.
		{"fourdrinier-machine-paper", materials.KindArrived, "AU", "../1868", "Technology in Australia 1988, p. 245"},
		// Same, p. 247: APPM's Burnie pulp mill made bleached eucalypt soda pulp from early 1939.
		{"soda-pulp-paper", materials.KindArrived, "AU", "../1939", "Technology in Australia 1988, p. 247"},
		// The Hindu, 15 February 2021: Travancore Titanium Products began sulphate-route production in 1951.
		{"titanium-white-anatase", materials.KindArrived, "IN", "1951", "The Hindu, 15 February 2021"},
		// Nandini Consultancy Centre at chemarc.com, History of titanium dioxide units in India: anatase from 1950.
		{"titanium-white-anatase", materials.KindArrived, "IN", "1950", "chemarc.com, Titanium dioxide industry in India"},
		// Encyclopedia of Australian Science and Innovation, Masonite Corporation (Australia): first hardboard plant, 1938.
		{"hardboard-masonite", materials.KindArrived, "AU", "../1938", "EOAS, Masonite Corporation (Australia)"},
		// Museums Victoria Collections, article 2648, Paint Preparation: alkyd enamels on sale from the late 1940s.
		{"alkyd-paint", materials.KindArrived, "AU", "1946/1949", "Museums Victoria, Paint Preparation"},
		// chromatopia.org, "Arylide" (2017), opening: the Hansa pigments discovered in 1909 (beside the from-memory row above).
		{"hansa-yellow-g", materials.KindMade, "", "1909", "chromatopia.org, Arylide"},
		// Korean Society of Wood Science and Technology, 50-year history, p. 140: the first paper mill at work in 1901.
		{"fourdrinier-machine-paper", materials.KindArrived, "KR", "../1901", "KSWST 50-year history, p. 140"},
		// The Guardian (Nigeria), 9 August 2020: the first paper factory established in 1969.
		{"fourdrinier-machine-paper", materials.KindArrived, "NG", "1969", "The Guardian (Nigeria), 9 August 2020"},

		// Fourth round of reading.
		// Palazzo Spinelli / MFA Boston, "Titanium white": ground rutile white as early as 1870; manufacture in Norway and the US, 1916.
		{"ground-rutile-white", materials.KindMade, "", "1870", "Palazzo Spinelli / MFA Boston, Titanium white"},
		{"titanium-white-anatase", materials.KindArrived, "NO", "1916", "Palazzo Spinelli / MFA Boston, Titanium white"},
		{"titanium-white-anatase", materials.KindArrived, "US", "1916", "Palazzo Spinelli / MFA Boston, Titanium white"},
		// KRONOS company history (read at kronostio.lookchem.com): commercial production from 1916; first rutile pigment marketed 1939.
		{"titanium-white-anatase", materials.KindSold, "", "1916", "KRONOS, About"},
		{"titanium-white-rutile", materials.KindSold, "", "1939", "KRONOS, About"},
		// Wikipedia, "British Titan Products", lead: imports from Germany until the British venture of 1934.
		{"titanium-white-anatase", materials.KindArrived, "GB", "1916/1934", "Wikipedia, British Titan Products"},
		{"titanium-white-anatase", materials.KindArrived, "GB", "1934", "Wikipedia, British Titan Products"},
		// The Economic Weekly, 19 December 1955, "Titanium Dioxide Industry": TiO2 in use in India in 1955 (span from the first sale anywhere).
		{"titanium-white-anatase", materials.KindArrived, "IN", "1916/1955", "The Economic Weekly, 19 December 1955"},
		// Herens et al., Heritage Science 5 (2017), abstract: titanium white in van Dongen's La Violoniste, about 1922.
		{"titanium-white-anatase", materials.KindAttested, "FR", "1922~", "Herens et al. 2017, abstract"},
		// Wikipedia, "Titanium white", caption after Laver 1997, p. 340: Dove's Silver Sun, 1929.
		{"titanium-white-anatase", materials.KindAttested, "US", "1929", "Wikipedia, Titanium white"},
		// Heritage Science 4 (2016), Pollock's Alchemy (1947), abstract and Fig. 8: ZnO-anatase white, rutile-anhydrite white, phthalo blue and green, alkyd.
		{"titanium-white-anatase", materials.KindAttested, "US", "1947", "Heritage Science 2016, Alchemy"},
		{"titanium-white-rutile", materials.KindAttested, "US", "1947", "Heritage Science 2016, Alchemy"},
		{"phthalocyanine-blue", materials.KindAttested, "US", "1947", "Heritage Science 2016, Alchemy"},
		{"phthalocyanine-green", materials.KindAttested, "US", "1947", "Heritage Science 2016, Alchemy"},
		{"alkyd-paint", materials.KindAttested, "US", "1947", "Heritage Science 2016, Alchemy"},
		// Dooley et al., Analytical Methods 2017, abstract: alkyd mapped in Lavender Mist (1950).
		{"alkyd-paint", materials.KindAttested, "US", "1950", "Dooley et al. 2017, abstract"},
		// Journal of Raman Spectroscopy 2008 (DOI 10.1002/jrs.2021), abstract: PG 7 in Beckmann 1950; a naphthol AS red in Baselitz 1964/65.
		{"phthalocyanine-green", materials.KindAttested, "US", "1950", "J. Raman Spectrosc. 2008, abstract"},
		{"naphthol-as-red", materials.KindAttested, "DE", "1964/1965", "J. Raman Spectrosc. 2008, abstract"},
		// German Wikipedia, Naphthol AS, Geschichte: the anilide found as a coupling component in 1911 (lower bound).
		{"naphthol-as-red", materials.KindMade, "", "1911/..", "de.wikipedia, Naphthol AS, Geschichte"},
		// CAMEO, "Phthalocyanine blue": ICI marketed Monastral blue in 1935.
		{"phthalocyanine-blue", materials.KindArrived, "GB", "1935", "CAMEO, Phthalocyanine blue"},
		// Gettens and Stout 1942, p. 132, and Paint Making and Color Grinding (1913): printing-ink makers had a para red before 1894.
		{"para-red", materials.KindArrived, "US", "1880/1894", "Paint Making and Color Grinding, permanent reds"},
		// Palazzo Spinelli glossary (Italian), manganese blue: discovered 1892, in painting from about 1930.
		{"manganese-blue", materials.KindMade, "", "1892", "Palazzo Spinelli glossary, blu di manganese"},
		{"manganese-blue", materials.KindSold, "", "1930~", "Palazzo Spinelli glossary, blu di manganese"},
		// Fremout, Verboven and Saverwyns, e-Preservation Science 11 (2014), abstract: waterborne acrylic in De Keyser's Camping II (1969).
		{"acrylic-emulsion-paint", materials.KindAttested, "BE", "1969", "Fremout et al. 2014, abstract"},
		// Messier et al., JAIC 44 (2005), abstract: first brightened papers in dated samples of 1950-54.
		{"optical-brightener-photographic-paper", materials.KindAttested, "", "1950/1954", "Messier et al. 2005, abstract"},
		// JAIC (2013/14), Siqueiros's cellulose nitrate paint, abstract: first used just before 1935; a Pollock of 1936/37.
		{"nitrocellulose-lacquer-duco", materials.KindAttested, "MX", "1934/1935", "JAIC 2013, Siqueiros, abstract"},
		{"nitrocellulose-lacquer-duco", materials.KindAttested, "US", "1936/1937", "JAIC 2013, Siqueiros, abstract"},
		// Trout, Environmental Health Perspectives 1972: PCB carbonless paper in ledger-paper waste about 1970-71.
		{"pcb-carbonless-copy-paper", materials.KindAttested, "US", "1970/1971", "Trout 1972"},
		// Vastrick, Carbonless paper (CRC chapter), abstract: patent filed 30 June 1953, first commercial sale 26 March 1954.
		{"pcb-carbonless-copy-paper", materials.KindMade, "", "1953-06-30", "Vastrick, Carbonless paper, abstract"},
		{"pcb-carbonless-copy-paper", materials.KindSold, "", "1954-03-26", "Vastrick, Carbonless paper, abstract"},
		// Heritage 6 (2023), abstract: fluorescent paints in the UBUNTU mural, Reggio Emilia, 2018.
		{"fluorescent-daylight-pigment", materials.KindAttested, "IT", "2018", "Heritage 2023, UBUNTU mural"},
		// Ferreira et al., Studies in Conservation 58 (2013), abstract: Portuguese painters using PVAc emulsion paints in 1961.
		{"pva-emulsion-paint", materials.KindAttested, "PT", "1961", "Ferreira et al. 2013, abstract"},
		// Britannica, "Hugh Burgess": part of an edition of the London Journal printed on soda pulp paper before 1854.
		{"soda-pulp-paper", materials.KindSold, "", "1851/1854", "Britannica, Hugh Burgess"},
		{"soda-pulp-paper", materials.KindAttested, "GB", "1851/1854", "Britannica, Hugh Burgess"},
		// Wikipedia, "László Bíró": first production shown in Budapest 1931; Paris patent 1938; further patent filed 17 June 1943.
		{"ballpoint-paste-ink", materials.KindMade, "", "1931", "Wikipedia, László Bíró"},
		{"ballpoint-paste-ink", materials.KindMade, "", "1938", "Wikipedia, László Bíró"},
		{"ballpoint-paste-ink", materials.KindMade, "", "1943-06-17", "Wikipedia, László Bíró"},
		// Wikipedia, "Ballpoint pen", Postwar proliferation: Vila Sivill Hermanos' Regia Continua, 1946.
		{"ballpoint-paste-ink", materials.KindArrived, "ES", "../1946", "Wikipedia, Ballpoint pen"},
		// Portuguese Wikipedia, "Bic": the Bic Cristal launched on 27 December 1950.
		{"ballpoint-paste-ink", materials.KindArrived, "FR", "1950-12-27", "pt.wikipedia, Bic"},
		// Wikipedia, "Ohto": ballpoints brought by the US Army; the first Japanese ballpoint in 1949; water-based ballpoint in the 1960s.
		{"ballpoint-paste-ink", materials.KindArrived, "JP", "1945/1949", "Wikipedia, Ohto"},
		{"ballpoint-paste-ink", materials.KindArrived, "JP", "1949", "Wikipedia, Ohto"},
		{"rollerball-ink", materials.KindMade, "", "196X", "Wikipedia, Ohto"},
		// Korean Ministry of Trade, Industry and Energy, e-book, April issue, p. 3: ballpoints came with the US Army in 1945; Wangja ballpoint 1958.
		{"ballpoint-paste-ink", materials.KindArrived, "KR", "1945", "MOTIE e-book, p. 3"},
		{"ballpoint-paste-ink", materials.KindArrived, "KR", "1958", "MOTIE e-book, p. 3"},
		// Aldrich Contemporary Art Museum, Ballpoint Pen Drawing Since 1950 (2013): Giacometti from the early 1950s; Fabre 1977-1992.
		{"ballpoint-paste-ink", materials.KindAttested, "FR", "1950/1954", "Aldrich Museum 2013, Ballpoint"},
		{"ballpoint-paste-ink", materials.KindAttested, "BE", "1977/1992", "Aldrich Museum 2013, Ballpoint"},
		// Black, J. Crim. Law Criminol. Police Sci. 57 (1966), p. 521: fibre-tip pens appeared in 1964.
		{"fibre-tip-pen-ink", materials.KindArrived, "US", "1964", "Black 1966, p. 521"},
		// CAMEO, "Oil pastel": introduced as children's crayons in Japan in 1925; Wikipedia, "Oil pastel": developed in 1924.
		{"oil-pastel", materials.KindMade, "", "1925", "CAMEO, Oil pastel"},
		{"oil-pastel", materials.KindArrived, "JP", "1925", "CAMEO, Oil pastel"},
		{"oil-pastel", materials.KindMade, "", "1924", "Wikipedia, Oil pastel"},
		// Krejci, US patent 2,564,700 (application of 1947): carbon black made in a furnace.
		{"furnace-black", materials.KindMade, "", "1947", "Krejci, US 2,564,700"},
		// Wikipedia, "Carbonless copy paper": NCR applied for the patent on 30 June 1953.
		{"carbonless-copy-paper", materials.KindMade, "", "1953-06-30", "Wikipedia, Carbonless copy paper"},
		// Wikipedia, "Masonite": a hardboard-like board in England in 1898; mass production from 1929. Wikipedia, "William H. Mason": plant working from 1926.
		{"hardboard-masonite", materials.KindMade, "", "1898", "Wikipedia, Masonite"},
		{"hardboard-masonite", materials.KindSold, "", "1926", "Wikipedia, William H. Mason"},
		// Egbewole and Rotowa, Am. J. Agric. For. 5 (2017), abstract: Nigeria's pulp and paper mills set up in the 1960s-70s.
		{"fourdrinier-machine-paper", materials.KindArrived, "NG", "../1979", "Egbewole and Rotowa 2017, abstract"},
		// Bagchi 1972, ch. 13, with the first machine sale in England (1803): first import span for India.
		{"fourdrinier-machine-paper", materials.KindArrived, "IN", "1803/1870", "Bagchi 1972, ch. 13"},
		// Wikipedia, "Liquid Paper" (older copy) and World of Invention, "Typing correction fluid": Mistake Out of 1951.
		{"correction-fluid", materials.KindMade, "", "1951", "Wikipedia, Liquid Paper"},
		{"correction-fluid", materials.KindSold, "", "1951~", "Wikipedia, Liquid Paper"},
		// Reference series of historical events, Carlson and Kornei: first electrophotographic copy, 22 October 1938.
		{"xerographic-toner", materials.KindMade, "", "1938-10-22", "Great events reference, first xerographic copy"},
		// Wikipedia, "Day-Glo Color Corp.", History: the Fluor-S-Art Co. selling fluorescent paints from 1934.
		{"fluorescent-daylight-pigment", materials.KindSold, "", "1934", "Wikipedia, Day-Glo Color Corp."},
		// Wikipedia, "Duco": DuPont's nitrocellulose car lacquer of the 1920s.
		{"nitrocellulose-lacquer-duco", materials.KindMade, "", "192X", "Wikipedia, Duco"},
		// Shanghai paper industry gazetteer (1996), ch. 1: imported machine paper by the 1870s; the Shanghai mill begun in 1882.
		{"fourdrinier-machine-paper", materials.KindArrived, "CN", "1882", "Shanghai paper gazetteer 1996, ch. 1"},
		{"fourdrinier-machine-paper", materials.KindArrived, "CN", "1803/1879", "Shanghai paper gazetteer 1996, ch. 1"},
		// Reference-work chapter "PCBs and associated aromatics", pp. 851-857: open uses of PCBs phased out about 1971.
		{"pcb-carbonless-copy-paper", materials.KindWithdrawn, "US", "1971~", "Reference chapter, PCBs and associated aromatics"},
		// Wikipedia, "Film stock": the industry on safety film internationally by 1955.
		{"cellulose-nitrate-film-base", materials.KindWithdrawn, "", "1955", "Wikipedia, Film stock"},
		// Second round, arrivals:
		// Verla Mill Museum, groundwood industry in Finland (timeline): first groundwood mills.
		{"groundwood-paper", materials.KindArrived, "FI", "../1859", "Verla Mill Museum, timeline"},
		{"groundwood-paper", materials.KindArrived, "SE", "../1857", "Verla Mill Museum, timeline"},
		{"groundwood-paper", materials.KindArrived, "DK", "../1857", "Verla Mill Museum, timeline"},
		{"groundwood-paper", materials.KindArrived, "RU", "../1858", "Verla Mill Museum, timeline"},
		// Finnish Heritage Agency wiki, Paperitehdas: first paper machine in Finland, Frenckell's mill, 1842.
		{"fourdrinier-machine-paper", materials.KindArrived, "FI", "../1842", "Finnish Heritage Agency, Paperitehdas"},
		// Te Ara, Pulp and paper, page 1: first commercial paper mills, Dunedin and Mataura, 1876.
		{"fourdrinier-machine-paper", materials.KindArrived, "NZ", "../1876", "Te Ara, Pulp and paper, page 1"},
		// Greening 1952, Paper Makers in Canada: the Fourdrinier machine came to Canada in the 1830s.
		{"fourdrinier-machine-paper", materials.KindArrived, "CA", "../1839", "Greening 1952, origin of the union"},
		// Wikipedia, British Titan Products, lead: titanium dioxide imported from Germany until 1934.
		{"titanium-white-anatase", materials.KindArrived, "DE", "../1934", "Wikipedia, British Titan Products"},
		// Morris and Travis 1992, American Dyestuff Reporter: IG Farben introduced Heliogen Blue B in 1934.
		{"phthalocyanine-blue", materials.KindArrived, "DE", "1934", "Morris and Travis 1992"},
		// Tamburini et al., Heritage Science 2023, abstract: Pigment Red 53:1 in the later Karen garments.
		{"red-lake-c", materials.KindArrived, "MM", "../1910", "Tamburini et al. 2023, Karen garments, abstract"},
		// Science Museum Group, object 1977-296/1: Sign Pen made in Japan 1962; in Britain from 1967.
		{"fibre-tip-pen-ink", materials.KindArrived, "JP", "1962", "Science Museum Group 1977-296/1"},
		{"fibre-tip-pen-ink", materials.KindArrived, "GB", "1967", "Science Museum Group 1977-296/1"},
		// Museum of Writing, item 8997: the Miles Martin Biro of 1945.
		{"ballpoint-paste-ink", materials.KindArrived, "GB", "1945", "Museum of Writing, item 8997"},
	}
	checkSourceRows(t, d, modernFile, rows)
}

// TestModernOrderOfTheTrade checks facts of the trade that tie materials of
// this family to each other. Each comparison uses the earliest bounded claim.
func TestModernOrderOfTheTrade(t *testing.T) {
	d := checkBuiltin(t)
	checkOrder(t, d, orderRule{}, []orderRow{
		// Common practice: anatase grades from the late 1910s, rutile grades only from about 1940.
		{"titanium-white-anatase", "titanium-white-rutile", materials.KindSold, "anatase before rutile (common practice)"},
		// Common practice: the green is the chlorinated blue and came after it.
		{"phthalocyanine-blue", "phthalocyanine-green", materials.KindMade, "phthalocyanine blue before green (common practice)"},
		// Common practice: solvent acrylics (Magna) came before the water-borne emulsions.
		{"acrylic-solution-paint", "acrylic-emulsion-paint", materials.KindMade, "solution acrylics before emulsions (common practice)"},
		// Common practice: diacetate film base came before triacetate.
		{"cellulose-acetate-film-base", "cellulose-triacetate-film-base", materials.KindMade, "diacetate before triacetate (common practice)"},
		// Common practice: mechanical wood pulp came before the chemical pulps.
		{"groundwood-paper", "sulfite-pulp-paper", materials.KindMade, "groundwood before sulphite (common practice)"},
		// Common practice: hand-made wove paper came before machine-made paper.
		{"wove-paper", "fourdrinier-machine-paper", materials.KindMade, "wove paper before the paper machine (common practice)"},
		// Common practice: the soda process came before the sulphate (kraft) process that grew out of it.
		{"soda-pulp-paper", "kraft-pulp-paper", materials.KindMade, "soda before kraft (common practice)"},
		// Common practice: nitrate film base came before the acetate safety bases.
		{"cellulose-nitrate-film-base", "cellulose-acetate-film-base", materials.KindMade, "nitrate before acetate (common practice)"},
		// Common practice: acetate safety bases came before polyester.
		{"cellulose-triacetate-film-base", "polyester-film-base", materials.KindMade, "triacetate before polyester (common practice)"},
		// Common practice: the felt marker came before the fine fibre-tip pen.
		{"felt-tip-marker-ink", "fibre-tip-pen-ink", materials.KindMade, "felt marker before fibre tip (common practice)"},
	})

	// Common practice: ballpoint pens first went on sale in 1945, years after
	// the first patents; no sold claim may be earlier than 1945.
	first, ok := earliestOf(mustLookup(t, d, "ballpoint-paste-ink").Claims(materials.KindSold, ""))
	if !ok {
		t.Fatal("ballpoint-paste-ink has no sold claim")
	}
	if y, _, _ := first.Civil(); y != 1945 {
		t.Errorf("ballpoint paste first sold in %d, want 1945 (common practice)", y)
	}

	// Messier et al. 2005: no optical brightener in photographic paper
	// before 1950, so no made claim may start earlier.
	obaStart, ok := earliestOf(mustLookup(t, d, "optical-brightener-photographic-paper").Claims(materials.KindMade, ""))
	if !ok {
		t.Fatal("optical-brightener-photographic-paper has no made claim")
	}
	if y, _, _ := obaStart.Civil(); y < 1950 {
		t.Errorf("optical brightener in photographic paper made from %d, before 1950 (Messier et al. 2005)", y)
	}
}

// TestModernFileShape checks what this family promises: what every family
// file promises (see checkFamilyFile), at least 40 materials, enough binders,
// fillers, brighteners and supports, arrivals over several places,
// withdrawals, and materials with disagreeing claims.
func TestModernFileShape(t *testing.T) {
	var arrivals, withdrawn, disputed int
	regions := map[string]bool{}
	classes := map[string]int{}
	for _, m := range checkFamilyFile(t, checkBuiltin(t), modernFile, 40) {
		classes[m.Class]++
		seen := map[string]int{}
		for _, ms := range m.Milestones {
			switch ms.Kind {
			case materials.KindArrived:
				arrivals++
				regions[ms.Place] = true
			case materials.KindWithdrawn:
				withdrawn++
			}
			seen[string(ms.Kind)+"@"+ms.Place]++
		}
		for _, c := range seen {
			if c > 1 {
				disputed++
				break
			}
		}
	}
	other := classes["binder"] + classes["filler"] + classes["brightener"] + classes["support"]
	if other < 20 {
		t.Errorf("only %d binders, fillers, brighteners and supports; want at least 20 (%v)", other, classes)
	}
	if arrivals < 15 || len(regions) < 4 {
		t.Errorf("%d arrivals over %d places; want at least 15 over 4", arrivals, len(regions))
	}
	if withdrawn < 4 {
		t.Errorf("%d withdrawn milestones; want at least 4", withdrawn)
	}
	if disputed < 5 {
		t.Errorf("%d materials with disagreeing claims; want at least 5", disputed)
	}
}
