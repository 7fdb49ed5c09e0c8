package materials_test

import (
	"strings"
	"testing"

	"terminus/constraint/date"
	"terminus/materials"
)

// dyesFile is the family file these checks cover: synthetic organic dyes and
// their lakes, from picric acid to the indigoid vat dyes.
const dyesFile = "synthetic-dyes.yaml"

// TestDyesAgainstSources checks that the embedded dataset holds dates as the
// named published sources give them. One row per value; the source and the
// place in it stand beside the value. Rows written from memory say so.
func TestDyesAgainstSources(t *testing.T) {
	d := checkBuiltin(t)
	rows := []sourceRow{
		// Wikipedia, "Picric acid", History: made from indigo by Peter Woulfe in 1771.
		{"picric-acid", materials.KindMade, "", "1771", "Wikipedia, Picric acid, History"},
		// Freemantle, Chemistry World podcast "Picric acid": Woulfe's report on dyeing yellow with indigo, 1771.
		{"picric-acid", materials.KindMade, "", "1771", "Freemantle, Chemistry World, Picric acid"},
		// Scientific American, 12 June 1852: Guinon of Lyons dyeing silk with picric acid.
		{"picric-acid", materials.KindSold, "", "1852", "Scientific American 1852, A New Yellow Dye"},
		// Molecular Expressions (FSU), Picric Acid (web): first used for silk in 1849.
		{"picric-acid", materials.KindSold, "", "1849", "Molecular Expressions, Picric Acid"},
		// OED, "picric, a.", quotation of 1860 (O'Neill, Chemistry of Calico Printing): lately introduced as a dye for silks and woollens.
		{"picric-acid", materials.KindSold, "", "../1860", "OED, picric, 1860 quotation"},
		// Wikipedia, "Mauveine", History: discovered by Perkin in 1856.
		{"mauveine", materials.KindMade, "", "1856", "Wikipedia, Mauveine, History"},
		// Same section: the Greenford dyeworks produced it the next year.
		{"mauveine", materials.KindSold, "", "1857", "Wikipedia, Mauveine, History"},
		// German Wikipedia, "Fuchsin", Geschichte: Hofmann and Verguin, 1858.
		{"fuchsine", materials.KindMade, "", "1858", "de.wikipedia, Fuchsin, Geschichte"},
		// Wikipedia, "Fuchsine", History: Natanson made it in 1856.
		{"fuchsine", materials.KindMade, "", "1856", "Wikipedia, Fuchsine, History"},
		// The Connexion, "The fuchsia: intense colour honours French victory": patent sold to the Renard brothers, 1859.
		{"fuchsine", materials.KindSold, "", "1859", "The Connexion, The fuchsia"},
		// Wikipedia, "Magenta", History: Nicholson and Maule began making roseine in London in 1860.
		{"fuchsine", materials.KindArrived, "GB", "1860", "Wikipedia, Magenta, History"},
		// Cesaratto et al., Heritage Science 6 (2018), abstract: rosaniline in nishiki-e from 1864.
		{"fuchsine", materials.KindArrived, "JP", "1864", "Cesaratto et al. 2018, abstract"},
		// KIK-IRPA glossary, "bleu d'aniline": Girard and de Laire, 1860.
		{"aniline-blue", materials.KindMade, "", "1860", "KIK-IRPA glossary, bleu d'aniline"},
		// Carvalho, Forty Centuries of Ink (1904), chronology of the anilines: Nicholson's soluble blue, 1862.
		{"nicholson-blue", materials.KindMade, "", "1862", "Carvalho 1904, chronology of the anilines"},
		// Meldola, Coal and What We Get from It (1891), end of ch. II: methyl violet discovered 1861, manufactured 1866.
		{"methyl-violet", materials.KindMade, "", "1861", "Meldola 1891, ch. II list"},
		{"methyl-violet", materials.KindSold, "", "1866", "Meldola 1891, ch. II list"},
		// Cesaratto et al. 2018, abstract: methyl violet in nishiki-e from 1875.
		{"methyl-violet", materials.KindArrived, "JP", "1875", "Cesaratto et al. 2018, abstract"},
		// German Wikipedia, "Kristallviolett", lead: first made deliberately in 1883.
		{"crystal-violet", materials.KindMade, "", "1883", "de.wikipedia, Kristallviolett"},
		// Meldola 1891, ch. II list: aniline black introduced 1863.
		{"aniline-black", materials.KindSold, "", "1863", "Meldola 1891, ch. II list"},
		// French Wikipedia, "Brun de Bismarck": invented 1863.
		{"bismarck-brown", materials.KindMade, "", "1863", "fr.wikipedia, Brun de Bismarck"},
		// Meldola 1891, passage on the first azo colours: discovered by Martius in 1865, introduced 1866.
		{"bismarck-brown", materials.KindMade, "", "1865", "Meldola 1891, first azo colours"},
		{"bismarck-brown", materials.KindSold, "", "1866", "Meldola 1891, first azo colours"},
		// Carvalho 1904, chronology of the anilines: induline made known 1864; nigrosine discovered 1868.
		{"induline", materials.KindMade, "", "1864", "Carvalho 1904, chronology of the anilines"},
		{"nigrosine", materials.KindMade, "", "1868", "Carvalho 1904, chronology of the anilines"},
		// OED, "safranine", quoting Cain and Thorpe 1905: Duprey's French patents of 1865.
		{"safranine", materials.KindMade, "", "1865", "OED, safranine"},
		// University of Chicago Library, Origins of Color, Artificial Alizarin: Graebe and Liebermann, 1868.
		{"synthetic-alizarin", materials.KindMade, "", "1868", "U. Chicago Library, Artificial Alizarin"},
		// BJHS, "The British chemical industry and the indigo trade", abstract: the patents of June 1869.
		{"synthetic-alizarin", materials.KindMade, "", "1869", "BJHS, British chemical industry and the indigo trade, abstract"},
		// Darling, Encyclopedia of Science, "alizarin": made synthetically after 1871.
		{"synthetic-alizarin", materials.KindSold, "", "1871", "Darling, alizarin"},
		// Encyclopaedia Britannica, "dye", Xanthene and related dyes: Baeyer's fluorescein, 1871.
		{"fluorescein", materials.KindMade, "", "1871", "Britannica, dye, Xanthene dyes"},
		// Encyclopaedia Britannica 11th ed. (1911), "Fluorescein": discovered 1876.
		{"fluorescein", materials.KindMade, "", "1876", "Britannica 1911, Fluorescein"},
		// Meldola 1891, passage on the phthaleins: eosin introduced by Caro in 1874.
		{"eosin-y", materials.KindSold, "", "1874", "Meldola 1891, phthaleins"},
		// Carvalho 1904: eosin brought to the United States the year after 1874.
		{"eosin-y", materials.KindArrived, "US", "1875", "Carvalho 1904, chronology of the anilines"},
		// Cesaratto et al. 2018, abstract: eosine in nishiki-e from 1877.
		{"eosin-y", materials.KindArrived, "JP", "1877", "Cesaratto et al. 2018, abstract"},
		// German Wikipedia, "Methylenblau", Historisches: Caro, 1876.
		{"methylene-blue", materials.KindMade, "", "1876", "de.wikipedia, Methylenblau"},
		// German Wikipedia, "Malachitgrün": Otto Fischer, 1877.
		{"malachite-green", materials.KindMade, "", "1877", "de.wikipedia, Malachitgrün"},
		// Wikipedia, "Erythrosine", History: Kussmaul at Basel, 1876.
		{"erythrosine", materials.KindMade, "", "1876", "Wikipedia, Erythrosine, History"},
		// Wikipedia, "Rose bengal", lead: Gnehm, 1882.
		{"rose-bengal", materials.KindMade, "", "1882", "Wikipedia, Rose bengal"},
		// Meldola 1891, azo scarlets: Biebrich scarlet, Nietzki 1879.
		{"biebrich-scarlet", materials.KindMade, "", "1879", "Meldola 1891, azo scarlets"},
		// Meldola 1891, naphthol azo dyes: the Hoechst Ponceaux of 1878.
		{"ponceau-2r", materials.KindSold, "", "1878", "Meldola 1891, naphthol azo dyes"},
		// May, Molecule of the Month (Bristol, 2016), Congo Red: Böttiger, 1883.
		{"congo-red", materials.KindMade, "", "1883", "May 2016, Congo Red"},
		// Wikipedia, "Congo red", History: first synthesised in 1883 by Böttiger at Bayer.
		{"congo-red", materials.KindMade, "", "1883", "Wikipedia, Congo red, History"},
		// German Wikipedia, "Paul Böttiger": patent of 27 February 1884.
		{"congo-red", materials.KindMade, "", "1884", "de.wikipedia, Paul Böttiger"},
		// Arch. Pathol. Lab. Med. 125 (2001), p. 250, abstract: introduced in Berlin in 1885.
		{"congo-red", materials.KindSold, "", "1885", "APLM 2001, 'Congo' Red, abstract"},
		// German Wikipedia, "Tartrazin", Geschichte: Ziegler 1884; patented and produced by BASF 1885.
		{"tartrazine", materials.KindMade, "", "1884", "de.wikipedia, Tartrazin"},
		{"tartrazine", materials.KindSold, "", "1885", "de.wikipedia, Tartrazin"},
		// German Wikipedia, "Basic Blue 26", Geschichte: patented by BASF in 1883.
		{"victoria-blue-b", materials.KindMade, "", "1883", "de.wikipedia, Basic Blue 26"},
		// Meldola 1891, thio-dyes: primuline found by Green in 1887.
		{"primuline", materials.KindMade, "", "1887", "Meldola 1891, primuline"},
		// Wikipedia, "Indigo dye", Era of synthetic indigo: Baeyer's first synthesis, 1878.
		{"synthetic-indigo", materials.KindMade, "", "1878", "Wikipedia, Indigo dye, Era of synthetic indigo"},
		// Schmidt, Chemie in unserer Zeit 31 (1997), abstract: Indigo Pure BASF on the market in July 1897.
		{"synthetic-indigo", materials.KindSold, "", "1897-07", "Schmidt 1997, abstract"},
		// BASF chronology, 1897: an indigo label for the Chinese market around 1903.
		{"synthetic-indigo", materials.KindArrived, "CN", "1903~", "BASF chronology, 1897"},
		// Great Soviet Encyclopedia, "Friedländer, Paul": thioindigo, 1906.
		{"thioindigo", materials.KindMade, "", "1906", "Great Soviet Encyclopedia, Friedländer"},
		// Meldola 1891, on the methylated anilines: the bluer, benzylated methyl violet of 1868.
		{"methyl-violet-6b", materials.KindMade, "", "1868", "Meldola 1891, methylated anilines"},
		// Meldola 1891, naphthol azo dyes: Roussin and Poirrier's archil substitute of 1878.
		{"archil-substitute", materials.KindSold, "", "1878", "Meldola 1891, naphthol azo dyes"},
		// German Wikipedia, "Patentblau V": patented by Meister, Lucius & Brüning in 1888.
		{"patent-blue-v", materials.KindMade, "", "1888", "de.wikipedia, Patentblau V"},
		// MFA Boston, CAMEO, "Sulfur dye": cachou de Laval 1873, Vidal black 1893.
		{"cachou-de-laval", materials.KindMade, "", "1873", "CAMEO, Sulfur dye"},
		{"vidal-black", materials.KindMade, "", "1893", "CAMEO, Sulfur dye"},
		// MFA Boston, CAMEO, "Indanthrone blue": first prepared by Bohn in 1901.
		{"indanthrone", materials.KindMade, "", "1901", "CAMEO, Indanthrone blue"},
		// texdata.com, "100 years of Indanthren dyes": first mentioned at BASF in January 1901.
		{"indanthrone", materials.KindMade, "", "1901-01", "texdata 2001, 100 years of Indanthren dyes"},
		// Meldola 1891, azo colours from azobenzene: the old aniline yellow of 1863 (no longer a textile dye by 1891, so no end is recorded).
		{"aniline-yellow", materials.KindSold, "", "1863", "Meldola 1891, azo colours from azobenzene"},
		// LAGIS Hessen, licence for the Höchst tar-dye works (1862): fuchsine from January 1863, aldehyde green from 1864, alizarin on the market in 1869.
		{"fuchsine", materials.KindArrived, "DE", "1863-01", "LAGIS Hessen, Höchst works licence"},
		{"aldehyde-green", materials.KindSold, "", "1864", "LAGIS Hessen, Höchst works licence"},
		{"synthetic-alizarin", materials.KindSold, "", "1869", "LAGIS Hessen, Höchst works licence"},
		// Meldola 1891, dimethylaniline colours: Lauth's violet of 1876.
		{"thionine", materials.KindMade, "", "1876", "Meldola 1891, dimethylaniline colours"},
		// Chemie der organischen Farbstoffe (TIB copy), p. 151: quinoline red, Jacobsen 1882.
		{"quinoline-red", materials.KindMade, "", "1882", "Chemie der organischen Farbstoffe, p. 151"},
		// Wikipedia, "Azuline": popular for silk in 1861.
		{"azuline", materials.KindSold, "", "1861", "Wikipedia, Azuline"},
		// Heritage Science 11 (2023), Saxon textiles, abstract: first syntheses of rhodamine B (1887), orange II (1876), brilliant green (1879), quinoline yellow (1881).
		{"rhodamine-b", materials.KindMade, "", "1887", "Heritage Science 2023, Saxon textiles, abstract"},
		{"orange-ii", materials.KindMade, "", "1876", "Heritage Science 2023, Saxon textiles, abstract"},
		{"brilliant-green", materials.KindMade, "", "1879", "Heritage Science 2023, Saxon textiles, abstract"},
		{"quinoline-yellow", materials.KindMade, "", "1881", "Heritage Science 2023, Saxon textiles, abstract"},
		// Same abstract: the six dyes in textiles with the years 1892-1908 embroidered on them.
		{"fuchsine", materials.KindAttested, "RO", "1892/1908", "Heritage Science 2023, Saxon textiles, abstract"},
		{"methyl-violet", materials.KindAttested, "RO", "1892/1908", "Heritage Science 2023, Saxon textiles, abstract"},
		{"orange-ii", materials.KindAttested, "RO", "1892/1908", "Heritage Science 2023, Saxon textiles, abstract"},
		{"brilliant-green", materials.KindAttested, "RO", "1892/1908", "Heritage Science 2023, Saxon textiles, abstract"},
		{"quinoline-yellow", materials.KindAttested, "RO", "1892/1908", "Heritage Science 2023, Saxon textiles, abstract"},
		{"rhodamine-b", materials.KindAttested, "RO", "1892/1908", "Heritage Science 2023, Saxon textiles, abstract"},
		{"fuchsine", materials.KindArrived, "RO", "../1908", "Heritage Science 2023, Saxon textiles, abstract"},
		{"methyl-violet", materials.KindArrived, "RO", "../1908", "Heritage Science 2023, Saxon textiles, abstract"},
		{"orange-ii", materials.KindArrived, "RO", "../1908", "Heritage Science 2023, Saxon textiles, abstract"},
		{"brilliant-green", materials.KindArrived, "RO", "../1908", "Heritage Science 2023, Saxon textiles, abstract"},
		{"quinoline-yellow", materials.KindArrived, "RO", "../1908", "Heritage Science 2023, Saxon textiles, abstract"},
		{"rhodamine-b", materials.KindArrived, "RO", "../1908", "Heritage Science 2023, Saxon textiles, abstract"},
		// Cesaratto et al. 2018, abstract: dated nishiki-e with rosaniline (1864), methyl violet (1875), eosine (1877).
		{"fuchsine", materials.KindAttested, "JP", "1864", "Cesaratto et al. 2018, abstract"},
		{"methyl-violet", materials.KindAttested, "JP", "1875", "Cesaratto et al. 2018, abstract"},
		{"eosin-y", materials.KindAttested, "JP", "1877", "Cesaratto et al. 2018, abstract"},
		// Oliveira et al., Chem. Eur. J. 2014, abstract: mauveine in the 6d stamps of 1867-1880.
		{"mauveine", materials.KindAttested, "GB", "1867/1880", "Oliveira et al. 2014, abstract"},
		// Plater and Raab, J. Chem. Res. 46 (2022), abstract: mauveine in an 1860s silk dress, Gunnersbury Park.
		{"mauveine", materials.KindAttested, "GB", "186X", "Plater and Raab 2022, abstract"},
		// MAAS Sydney, record 85/1765, after Fletcher: aniline purples the rage in Australia in the 1860s.
		{"mauveine", materials.KindArrived, "AU", "186X", "MAAS 85/1765, statement of significance"},
		// Heritage Science 5 (2017), Irises and Roses: eosin lake in Van Gogh's Irises, May 1890.
		{"eosin-y", materials.KindAttested, "FR", "1890-05", "Heritage Science 2017, Irises and Roses"},
		{"eosin-lake", materials.KindAttested, "FR", "1890-05", "Heritage Science 2017, Irises and Roses"},
		{"eosin-lake", materials.KindMade, "", "1874/1890-05", "Heritage Science 2017, Irises and Roses (lower end common practice)"},
		// Meyers Konversations-Lexikon, 6th ed., "Fluoreszeïn": lead, tin and alumina lakes of eosin.
		{"eosin-lake", materials.KindMade, "", "1874/1909", "Meyers, Fluoreszeïn"},
		// RCE, The quest for Van Gogh's inks (2018): methyl violet in the violet ink of 1888.
		{"methyl-violet", materials.KindAttested, "FR", "1888-05/1888-06", "RCE 2018, Van Gogh's inks"},
		// Neevel et al., abstract (Akademie der bildenden Künste Wien): crystal violet by HPLC in the ink of Montmajour (1888).
		{"crystal-violet", materials.KindAttested, "FR", "1888-05/1888-06", "Neevel et al., Van Gogh's drawing inks"},
		// NGV Melbourne, record 50864: methyl violet in a dress of about 1865 (TLC, SERS).
		{"methyl-violet", materials.KindAttested, "", "1865~", "NGV 50864"},
		{"methyl-violet", materials.KindSold, "", "1865~", "NGV 50864"},
		// Autochromes Lumière (Ministère de la Culture), Dyeing the Starch: the factory manuscript of 1908.
		{"crystal-violet", materials.KindAttested, "FR", "1908", "Autochromes Lumière, Dyeing the Starch"},
		{"tartrazine", materials.KindAttested, "FR", "1908", "Autochromes Lumière, Dyeing the Starch"},
		{"erythrosine", materials.KindAttested, "FR", "1908", "Autochromes Lumière, Dyeing the Starch"},
		// L'Actualité Chimique (SCF), "À propos de la fuchsine": the Renard patent of 8 April 1859.
		{"fuchsine", materials.KindSold, "", "1859-04-08", "SCF, À propos de la fuchsine"},
		// German Wikipedia, "François-Emmanuel Verguin": Basel fuchsine from 1859, German firms from 1860.
		{"fuchsine", materials.KindArrived, "CH", "1859", "de.wikipedia, Verguin"},
		{"fuchsine", materials.KindArrived, "DE", "../1860", "de.wikipedia, Verguin"},
		// Tamburini et al., Heritage Science 8 (2020), abstract: four dyes in 19th-century Central Asian ikats.
		{"fuchsine", materials.KindArrived, "143", "../1900", "Tamburini et al. 2020, abstract"},
		{"methyl-violet", materials.KindArrived, "143", "../1900", "Tamburini et al. 2020, abstract"},
		{"rhodamine-b", materials.KindArrived, "143", "../1900", "Tamburini et al. 2020, abstract"},
		{"malachite-green", materials.KindArrived, "143", "../1900", "Tamburini et al. 2020, abstract"},
		// Getty AAT, indigo carmine: first prepared by Barth in 1740.
		{"indigo-carmine", materials.KindMade, "", "1740", "Getty AAT, indigo carmine"},
		// An early 19th-century German dyeing manual (TIB record 1905971214), p. 185: Saxon blue found by Barth in 1710 (uncertain).
		{"indigo-carmine", materials.KindMade, "", "1710?", "TIB 1905971214, p. 185"},
		// Encyclopaedia Iranica, Carpets ii: synthetic dyes in Persian carpets around the turn of the 20th century.
		{"synthetic-indigo", materials.KindArrived, "IR", "1900~", "Encyclopaedia Iranica, Carpets ii"},
		// Watt, Commercial Products of India (1908): the al dyes of India already killed by the synthetic dyes.
		{"synthetic-alizarin", materials.KindArrived, "IN", "../1908", "Watt 1908, via Nil Durpan p. 260"},
		// Meldola 1891, derivatives of magenta: Nicholson's soluble blues (1862), Hofmann's violets (1862), iodine green (1866).
		{"nicholson-blue", materials.KindMade, "", "1862", "Meldola 1891, derivatives of magenta"},
		{"water-blue", materials.KindMade, "", "1862", "Meldola 1891, derivatives of magenta"},
		{"hofmann-violet", materials.KindMade, "", "1862", "Meldola 1891, derivatives of magenta"},
		{"iodine-green", materials.KindMade, "", "1866", "Meldola 1891, derivatives of magenta"},
		// Wikipedia, "Allura Red AC", lead: developed by Allied Chemical in 1971.
		{"allura-red-ac", materials.KindMade, "", "1971", "Wikipedia, Allura Red AC"},
		// CulinaryLore (web) and Wikipedia, "Brilliant blue FCF": by 1929 and by 1969; no start read.
		{"brilliant-blue-fcf", materials.KindMade, "", "../1929", "CulinaryLore, FD&C Blue No. 1"},
		{"brilliant-blue-fcf", materials.KindMade, "", "../1969", "Wikipedia, Brilliant blue FCF"},
		// Wikipedia, "Methyl yellow", History: Griess, 1860s.
		{"methyl-yellow", materials.KindMade, "", "186X", "Wikipedia, Methyl yellow"},
		// Encyclopaedia Britannica 1911, "Primuline": thioflavine T (German patent 51738, 1888); thioflavine S and chloramine yellow undated.
		{"thioflavine-t", materials.KindMade, "", "1888", "Britannica 1911, Primuline"},
		{"thioflavine-s", materials.KindMade, "", "1887/1911", "Britannica 1911, Primuline"},
		{"chloramine-yellow", materials.KindMade, "", "1887/1911", "Britannica 1911, Primuline"},
		// Tamburini et al., Heritage Science 11 (2023), Karen garments, abstract: synthetic dyes in the later textiles (open start, by the early 1900s).
		{"synthetic-alizarin", materials.KindArrived, "MM", "../1910", "Tamburini et al. 2023, Karen garments"},
		{"rhodamine-b", materials.KindArrived, "MM", "../1910", "Tamburini et al. 2023, Karen garments"},
		{"malachite-green", materials.KindArrived, "MM", "../1910", "Tamburini et al. 2023, Karen garments"},
		{"brilliant-green", materials.KindArrived, "MM", "../1910", "Tamburini et al. 2023, Karen garments"},
		{"auramine", materials.KindArrived, "MM", "../1910", "Tamburini et al. 2023, Karen garments"},
		{"naphthol-yellow-s", materials.KindArrived, "MM", "../1910", "Tamburini et al. 2023, Karen garments"},
		{"chrysamine-g", materials.KindArrived, "MM", "../1910", "Tamburini et al. 2023, Karen garments"},
		{"crystal-violet", materials.KindArrived, "MM", "../1910", "Tamburini et al. 2023, Karen garments"},
		// Qingdao City Gazetteer, vol. 33, dyes: Weixin Chemical Works, sulphur dye from September 1919, methyl violet after 1922.
		{"sulphur-black-t", materials.KindArrived, "CN", "1919-09", "Qingdao City Gazetteer, vol. 33"},
		{"methyl-violet", materials.KindArrived, "CN", "../1922", "Qingdao City Gazetteer, vol. 33"},
		// Shanghai Dyestuffs 2013 (1), abstract: the 80th anniversary of China's first dye, Sulphur Black 1.
		{"sulphur-black-t", materials.KindArrived, "CN", "../1933", "Shanghai Dyestuffs 2013, abstract"},
		// Heibonsha World Encyclopedia, 染料: sulphur black in Okayama from 1914; alizarin red at Miike about then.
		{"sulphur-black-t", materials.KindArrived, "JP", "../1914", "Heibonsha, 染料"},
		{"synthetic-alizarin", materials.KindArrived, "JP", "../1914~", "Heibonsha, 染料"},
		// National Museum of Nature and Science, record 904990630001: Miike indigo in full production from 1933.
		{"synthetic-indigo", materials.KindArrived, "JP", "../1933", "Kahaku 904990630001"},
		// Tariff Commission, Report on the Dyestuff Industry (1954): sulphur black made in India by then.
		{"sulphur-black-t", materials.KindArrived, "IN", "../1954", "Tariff Commission 1954"},
		// Routledge chapter abstract on Uşak: anilines in use before the early 1870s.
		{"fuchsine", materials.KindArrived, "TR", "../1873", "Uşak chapter abstract"},
		// Heritage 8 (2025), Palestinian garments, abstract: rhodamine B and orange II.
		{"rhodamine-b", materials.KindArrived, "PS", "../1920", "Heritage 2025, Palestinian garments"},
		{"orange-ii", materials.KindArrived, "PS", "../1920", "Heritage 2025, Palestinian garments"},
		// Pinto and Seixas de Melo, Pure Appl. Chem. 90 (2018), abstract: eosin Y in Portuguese stamps of 1857-1909.
		{"eosin-y", materials.KindArrived, "PT", "../1909", "Pinto and Seixas de Melo 2018"},
		// Open-start French arrivals from the dated French attestations above.
		{"methyl-violet", materials.KindArrived, "FR", "../1888-06", "RCE 2018, Van Gogh's inks"},
		{"crystal-violet", materials.KindArrived, "FR", "../1888-06", "Neevel et al., Van Gogh's drawing inks"},
		{"eosin-y", materials.KindArrived, "FR", "../1890-05", "Heritage Science 2017, Irises and Roses"},
		{"eosin-lake", materials.KindArrived, "FR", "../1890-05", "Heritage Science 2017, Irises and Roses"},
		{"tartrazine", materials.KindArrived, "FR", "../1908", "Autochromes Lumière, Dyeing the Starch"},
		{"erythrosine", materials.KindArrived, "FR", "../1908", "Autochromes Lumière, Dyeing the Starch"},
		// Pinto, Oliveira and Seixas de Melo, Analyst 150 (2025), abstract: a mauveine sample from Perkin for the anniversary (taken as 1906, uncertain).
		{"mauveine", materials.KindAttested, "GB", "1906?", "Pinto et al. 2025, abstract"},
		// German Wikipedia, "Sudanfarbstoffe": Sudan III in animal experiments by 1886 (no start recorded).
		{"sudan-iii", materials.KindMade, "", "../1886", "de.wikipedia, Sudanfarbstoffe"},
		// German Wikipedia, "Acid Red 73", Geschichte: patented by Hoffmann and Cassella in 1885.
		{"brilliant-crocein-m", materials.KindMade, "", "1885", "de.wikipedia, Acid Red 73"},
		// Tamburini et al. 2023, Karen garments: orange I in the later textiles; made date from memory.
		{"orange-i", materials.KindArrived, "MM", "../1910", "Tamburini et al. 2023, Karen garments"},
		// TIB textbook (record 1867460173), Zur Geschichte der Azofarbstoffe: Poirrier's Oranges and the tropaeolins after chrysoidine (Witt, 1876).
		{"orange-i", materials.KindMade, "", "1876~", "TIB textbook 1867460173, history of the azo dyes"},
		// Japan Blue (company blog), 2017-04-22: synthetic indigo imported into Japan from Meiji 31 (1898).
		{"synthetic-indigo", materials.KindArrived, "JP", "1898", "Japan Blue, 日本の藍と明治 −インド藍"},
		// kraska.biz, Sulfur compounds as chromophores, History (web, no author): Immedial black 1897, Sulfur Black T 1899.
		{"immedial-black", materials.KindMade, "", "1897", "kraska.biz, sulphur dyes, History"},
		{"sulphur-black-t", materials.KindMade, "", "1899", "kraska.biz, sulphur dyes, History"},
		// TIB textbook 1867457938, Schwefelfarbstoffe, p. 138: the first diphenylamine black, Immedialschwarz (Cassella), 1897.
		{"immedial-black", materials.KindMade, "", "1897", "TIB 1867457938, p. 138"},
		{"immedial-black", materials.KindSold, "", "1897", "TIB 1867457938, p. 138"},
		// Gettens and Stout 1942, Alizarin (alizarin crimson): synthesis reported 1868; the artists' lake made from it.
		{"alizarin-crimson", materials.KindMade, "", "1868", "Gettens and Stout 1942, Alizarin"},
		// Dingler's Polytechnisches Journal 253 (1884), p. 86, Ueber das Auramin: a novelty on the market in 1884.
		{"auramine", materials.KindSold, "", "../1884", "Dingler 253 (1884), p. 86"},
		// Meldola 1891, oxazines: Koechlin's gallocyanin introduced in 1881 (making given as about that year).
		{"gallocyanine", materials.KindMade, "", "1881~", "Meldola 1891, oxazines"},
		{"gallocyanine", materials.KindSold, "", "1881", "Meldola 1891, oxazines"},
		// Meldola 1891, salicylic acid dyes and benzidine colours: chrysamines in use by 1891; the first benzidine colours 1884.
		{"chrysamine-g", materials.KindMade, "", "1884~/1891", "Meldola 1891, salicylic acid dyes"},
		// From memory, not read here (Colour Index; Zollinger): approximate dates of dyes added without a source read.
		// Meldola 1891, benzidine colours: Böttiger's first benzidine disazo colours of 1884; tolidine forms the same tetrazo salts (class year, approximate).
		{"benzopurpurin-4b", materials.KindMade, "", "1884~", "Meldola 1891, azo scarlets and benzidine colours"},
		// TIB textbook (record 1867460173): Congo red of 1884 the first direct cotton dye, a host of similar ones after it (class year, approximate).
		{"chrysophenine-g", materials.KindMade, "", "1884~", "TIB textbook 1867460173, history of the azo dyes"},
		{"rhodamine-6g", materials.KindMade, "", "1892~", "Colour Index (from memory)"},
		{"phloxine-b", materials.KindMade, "", "187X/188X", "Colour Index (from memory)"},
		// de Keijzer et al., triarylmethane dyes, abstract: the group began with Natanson's fuchsine of 1856 (lower bound).
		{"pararosaniline", materials.KindMade, "", "1856/..", "de Keijzer et al., triarylmethane dyes, abstract"},
		// Meldola 1891, dated list: the phosgene colours of the rosaniline group introduced in 1883 (class year, approximate).
		{"victoria-blue-r", materials.KindMade, "", "1883~", "Meldola 1891, dated list"},
		{"naphthol-blue-black", materials.KindMade, "", "1891~", "Colour Index (from memory)"},
		// Meldola 1891, naphthol azo dyes: Hoechst's beta-naphthol disulpho-acids and their orange-to-claret dyes, 1878 (class year, approximate).
		{"orange-g", materials.KindMade, "", "1878~", "Meldola 1891, naphthol azo dyes"},
		// TIB textbook (record 1867460173): Poirrier's Oranges and the tropaeolins after chrysoidine (Witt, 1876).
		{"methyl-orange", materials.KindMade, "", "1876~", "TIB textbook 1867460173, history of the azo dyes"},
		// CAMEO, Sulfur dye: the first sulphur dye in 1873; sulphur black among them (lower bound).
		{"sulphur-black-t", materials.KindMade, "", "1873/..", "CAMEO, Sulfur dye"},
		// CAMEO, Sulfur dye: the first sulphur dye in 1873; indophenol among them (lower bound for the sulphurised Hydron blue).
		{"hydron-blue", materials.KindMade, "", "1873/..", "CAMEO, Sulfur dye"},
		// From memory, not read here: Colour Index, auramine by Caro and Kern, 1883.
		{"auramine", materials.KindMade, "", "1883", "Colour Index (from memory)"},
		// Byfield, TSA Symposium 1994, pp. 45-51, opening section: Yoruba dyers took up synthetic dyes from the 1930s.
		{"synthetic-indigo", materials.KindArrived, "NG", "193X", "Byfield 1994, opening section"},
		// Zeng and Yan, Journal of Anshun University 2022 (5), opening summary: foreign indigo in Guizhou from the late Qing.
		{"synthetic-indigo", materials.KindArrived, "CN", "1900/1911", "Zeng and Yan 2022, opening summary"},
		// Floor, Studia Iranica 35 (2006), abstract: synthetic indigo in marked use in Iran after 1909.
		{"synthetic-indigo", materials.KindArrived, "IR", "1909", "Floor 2006, abstract"},
		// Tamburini et al., Heritage 6 (2023), abstract: fuchsin in the mountings of two late-19th-century Korean screens.
		{"fuchsine", materials.KindArrived, "KR", "1870/1899", "Tamburini et al. 2023, abstract"},
		// MAAS Sydney, record 85/1765, after Fletcher, Costume in Australia: aniline purples and fuchsias the rage in the 1860s.
		{"fuchsine", materials.KindArrived, "AU", "186X", "MAAS 85/1765, statement of significance"},
		// Second round, arrivals:
		// Tamburini, Klink-Hoppe and McCarthy, J. Cult. Herit. 66 (2024), abstract: dyes of 19th-century Central Asian ikats.
		{"ponceau-2r", materials.KindArrived, "143", "../1900", "Tamburini et al. 2024, JCH ikats, abstract"},
		{"rose-bengal", materials.KindArrived, "143", "../1900", "Tamburini et al. 2024, JCH ikats, abstract"},
		{"eosin-y", materials.KindArrived, "143", "../1900", "Tamburini et al. 2024, JCH ikats, abstract"},
		{"erythrosine", materials.KindArrived, "143", "../1900", "Tamburini et al. 2024, JCH ikats, abstract"},
		{"brilliant-green", materials.KindArrived, "143", "../1900", "Tamburini et al. 2024, JCH ikats, abstract"},
		// Do et al., Fibers and Polymers 2024, abstract: synthetic dyes in Indonesian silks of the 19th-20th centuries.
		{"congo-red", materials.KindArrived, "ID", "../1999", "Do et al. 2024, Indonesian silks, abstract"},
		{"orange-i", materials.KindArrived, "ID", "../1999", "Do et al. 2024, Indonesian silks, abstract"},
		{"malachite-green", materials.KindArrived, "ID", "../1999", "Do et al. 2024, Indonesian silks, abstract"},
		// Handbook of coal-tar colours (sachsen.digital 420735), p. 264: eosin in trade from 1874, found by Caro of BASF.
		{"eosin-y", materials.KindArrived, "DE", "1874", "sachsen.digital 420735, p. 264"},
		// "Congo Red: Out of Africa?", APLM 125 (2001), abstract: introduced in Berlin by AGFA in 1885.
		{"congo-red", materials.KindArrived, "DE", "1885", "APLM 2001, Congo red, abstract"},
		// Societe chimique de France, "La decouverte de la fuchsine", summary: the Renard brothers' patent of 1859.
		{"fuchsine", materials.KindArrived, "FR", "1859", "SCF, La decouverte de la fuchsine"},
		// KIK-IRPA glossary, bleu d'aniline: Renard brothers bought the rights soon after the 1861 patent.
		{"aniline-blue", materials.KindArrived, "FR", "1861~", "KIK-IRPA glossary, bleu d'aniline"},
		// Garfield, Mauve, sale of the Greenford works: alizarin output for 1874 already contracted in 1873.
		{"synthetic-alizarin", materials.KindArrived, "GB", "../1873", "Garfield, Mauve, sale of the works"},
		// Schmidt 1997, abstract: first Indigo Pure BASF made and marketed in July 1897.
		{"synthetic-indigo", materials.KindArrived, "DE", "1897-07", "Schmidt 1997, abstract"},
		// KIK-IRPA glossary, violet d'aniline: Perkin's Greenford Green works opened in 1857.
		{"mauveine", materials.KindArrived, "GB", "1857", "KIK-IRPA glossary, violet d'aniline"},
		// Revue des Deux Mondes 1874, t. 4, p. 910: Poirrier's violet de Paris has displaced Hofmann's violet.
		{"methyl-violet", materials.KindArrived, "FR", "../1874", "Revue des Deux Mondes 1874, t. 4, p. 910"},
		// Meldola 1891, passage on the phthaleins: rhodamines introduced by the Baden Aniline Company.
		{"rhodamine-b", materials.KindArrived, "DE", "../1891", "Meldola 1891, phthaleins"},
	}
	checkSourceRows(t, d, dyesFile, rows)
}

// TestDyesTradeFacts checks facts of the trade (common practice, no source)
// on this family's entries.
func TestDyesTradeFacts(t *testing.T) {
	d := checkBuiltin(t)

	t.Run("only picric acid is made before 1856, and it says so", func(t *testing.T) {
		// Common practice: synthetic organic dyes appear from about 1856;
		// picric acid (1771) is the documented exception. Semi-synthetic
		// derivatives of natural dyes (indigo carmine) are older by nature.
		limit := date.Gregorian(1856, 1, 1)
		early := map[string]bool{}
		for _, m := range familyMaterials(d, dyesFile) {
			if m.Origin != "synthetic" {
				continue
			}
			first, ok := earliestOf(m.Claims(materials.KindMade, ""))
			if !ok || first >= limit {
				continue
			}
			early[m.ID] = true
			if !strings.Contains(strings.ToLower(m.Note), "exception") {
				t.Errorf("%s is made before 1856 but its note does not call it an exception: %q", m.ID, m.Note)
			}
		}
		if len(early) != 1 || !early["picric-acid"] {
			t.Errorf("materials made before 1856: %v, want only picric-acid", early)
		}
	})

	t.Run("variants practitioners keep apart are separate entries", func(t *testing.T) {
		// Common practice: each pair has its own history and dates.
		checkApart(t, d, [][2]string{
			{"methyl violet", "crystal violet"},
			{"methyl violet 6B", "crystal violet"},
			{"fluorescein", "eosin Y"},
			{"eosin Y", "erythrosine"},
			{"eosin Y", "geranium lake"},
			{"malachite green", "Basic Violet 3"},
			{"synthetic alizarin", "madder"},
			{"synthetic indigo", "natural indigo"},
			{"indigo carmine", "synthetic indigo"},
			{"alizarin crimson", "madder lake"},
			{"aniline yellow", "acid yellow (aminoazobenzene sulphonic acid)"},
		})
	})

	// Some pairs start in the same year (a lake with its dye, methylene
	// blue with Lauth's violet): the order here is "no later than".
	checkOrder(t, d, orderRule{sameDay: true}, []orderRow{
		// Common practice: the crude mixture came two decades before the pure compound.
		{"methyl-violet", "crystal-violet", materials.KindMade, "methyl violet (1861) before crystal violet (1883)"},
		// Common practice: eosin is brominated fluorescein.
		{"fluorescein", "eosin-y", materials.KindMade, "fluorescein before eosin"},
		// Common practice: a lake is no older than its dye.
		{"eosin-y", "eosin-lake", materials.KindMade, "eosin before its lake"},
		// Common practice: the azo dyes begin with aniline yellow.
		{"aniline-yellow", "chrysoidine", materials.KindSold, "aniline yellow before chrysoidine"},
		{"aniline-yellow", "congo-red", materials.KindSold, "aniline yellow before the direct dyes"},
		// Common practice: acid yellow is made from aniline yellow, Biebrich scarlet from acid yellow.
		{"aniline-yellow", "acid-yellow", materials.KindMade, "aniline yellow before acid yellow"},
		{"acid-yellow", "biebrich-scarlet", materials.KindMade, "acid yellow before Biebrich scarlet"},
		// Common practice: synthetic alizarin came a decade before synthetic indigo.
		{"synthetic-alizarin", "synthetic-indigo", materials.KindSold, "synthetic alizarin before synthetic indigo"},
		// Common practice: methylene blue was Caro's development of Lauth's violet.
		{"thionine", "methylene-blue", materials.KindMade, "Lauth's violet before methylene blue"},
		// Common practice: thioindigo follows the indigo synthesis.
		{"synthetic-indigo", "thioindigo", materials.KindMade, "indigo before thioindigo"},
		// Common practice: a lake is no older than its dye.
		{"synthetic-alizarin", "alizarin-crimson", materials.KindMade, "alizarin before its lake"},
	})

	t.Run("invention is not availability: synthetic indigo took years to sell", func(t *testing.T) {
		// Common practice: Baeyer's synthesis and BASF's sale lie about two decades apart.
		m := mustLookup(t, d, "synthetic-indigo")
		made, ok1 := earliestOf(m.Claims(materials.KindMade, ""))
		sold, ok2 := earliestOf(m.Claims(materials.KindSold, ""))
		if !ok1 || !ok2 {
			t.Fatal("synthetic indigo lacks made or sold claims")
		}
		if years := float64(sold-made) / 365.25; years < 15 {
			t.Errorf("synthetic indigo sold %.1f years after it was made, want at least 15", years)
		}
	})

	t.Run("synthetic dyes reached Japan after their first sale", func(t *testing.T) {
		// Common practice: East Asian printmakers took up the new dyes years after Europe.
		for _, id := range []string{"fuchsine", "methyl-violet", "eosin-y", "synthetic-indigo"} {
			m := mustLookup(t, d, id)
			claims, area := d.Arrival(m, "JP")
			if len(claims) == 0 {
				t.Errorf("%s has no arrival for JP", id)
				continue
			}
			if area != "JP" {
				t.Errorf("%s: arrival for JP comes from area %s, want JP itself", id, area)
			}
			sold, ok := earliestOf(m.Claims(materials.KindSold, ""))
			arrived, ok2 := earliestOf(claims)
			if !ok || !ok2 {
				t.Errorf("%s lacks a bounded sold or arrived claim", id)
				continue
			}
			if arrived <= sold {
				t.Errorf("%s arrived in Japan %s, not after its first sale %s", id, arrived.ISO(), sold.ISO())
			}
		}
	})

	t.Run("an arrival in Japan does not hold for Korea", func(t *testing.T) {
		// The arrival of a country applies to that country only, not to its neighbours.
		m := mustLookup(t, d, "eosin-y")
		if claims, area := d.Arrival(m, "KR"); len(claims) != 0 {
			t.Errorf("eosin has arrival claims for KR from %s: %v", area, claims)
		}
	})
}

// TestDyesFileShape checks what the family promises: its size, arrivals over
// several regions, withdrawals, disagreeing claims, and that it lints clean
// and resolves by every name.
func TestDyesFileShape(t *testing.T) {
	d := checkBuiltin(t)
	ms := checkFamilyFile(t, d, dyesFile, 60)
	regions := map[string]bool{}
	var arrivals, milestones, documented, disagreeing int
	for _, m := range ms {
		groups := map[string]map[string]bool{}
		for _, x := range m.Milestones {
			milestones++
			if x.Basis == materials.BasisDocumented {
				documented++
			}
			switch x.Kind {
			case materials.KindArrived:
				arrivals++
				regions[x.Place] = true
			case materials.KindWithdrawn:
				// The national bans on one use (the US food, drug or
				// cosmetic listings of amaranth, erythrosine and rhodamine
				// B) were no end of the colorant, so the file records none;
				// an end it records must hold where it says.
				if x.Place != "" && !strings.Contains(x.Note, "only") {
					t.Errorf("%s: withdrawn in %s without saying it holds only there: %q", m.ID, x.Place, x.Note)
				}
			}
			k := string(x.Kind) + "@" + x.Place
			if groups[k] == nil {
				groups[k] = map[string]bool{}
			}
			groups[k][x.Date.EDTF()] = true
		}
		for _, dates := range groups {
			if len(dates) > 1 {
				disagreeing++
				break
			}
		}
	}
	if arrivals < 14 || len(regions) < 5 {
		t.Errorf("%d arrivals over %d regions (%v), want at least 14 over 5", arrivals, len(regions), regions)
	}
	if disagreeing < 5 {
		t.Errorf("%d materials with disagreeing claims, want at least 5", disagreeing)
	}
	if share := float64(documented) / float64(milestones); share < 0.9 {
		t.Errorf("documented share %.2f, want at least 0.90", share)
	}
}
