package materials_test

import (
	"testing"

	"terminus/materials"
)

// inksFile is the family file these checks cover: office inks, copying and
// duplicating processes, reprographic and thermal papers, and photographic
// print materials.
const inksFile = "inks-copying-photo.yaml"

// TestInksAgainstSources checks that the embedded dataset holds dates as the
// named published sources give them. One row per value; the source and the
// place in it stand beside the value. Rows written from memory say so.
func TestInksAgainstSources(t *testing.T) {
	d := checkBuiltin(t)
	rows := []sourceRow{
		// Dube 1998, BPG Annual 17, Introduction: first introduced in the 1870s, chiefly for the letter-press copying process.
		{"copying-pencil", materials.KindMade, "", "187X", "Dube 1998, BPG Annual 17, Introduction"},
		// Dube 1998, BPG Annual 17, Introduction: marketed from the 1870s for copying and as a more indelible pencil.
		{"copying-pencil", materials.KindSold, "", "187X", "Dube 1998, BPG Annual 17, Introduction"},
		// Wikipedia, Copying pencil: introduced in the 1870s and marketed for copying documents.
		{"copying-pencil", materials.KindSold, "", "187X", "Wikipedia, Copying pencil"},
		// Wikipedia, Copying pencil: the article's illustration shows the dated letter as written in indelible pencil (identification as given by the article, not by analysis).
		{"copying-pencil", materials.KindAttested, "ZA", "1909-01-06", "Wikipedia, Copying pencil"},
		// Great Soviet Encyclopedia, Hectograph: invented in Russia by M. I. Alisov in 1869.
		{"hectograph-copy", materials.KindMade, "", "1869", "Great Soviet Encyclopedia, Hectograph"},
		// Wikipedia, Hectograph (2014): invented in Russia in 1869 by Mikhail Alisov.
		{"hectograph-copy", materials.KindMade, "", "1869", "Wikipedia, Hectograph (2014)"},
		// Letterology 2011: the Hektograph transfer tablet introduced in 1876 (after the Early Office Museum).
		{"hectograph-copy", materials.KindSold, "", "1876", "Letterology 2011"},
		// Ridout, Nature 1880, abstract: pads of several makers in trade by early 1880; recently introduced into Britain.
		{"hectograph-copy", materials.KindSold, "", "../1880", "Ridout, Nature 1880, abstract"},
		{"hectograph-copy", materials.KindArrived, "GB", "1879/1880", "Ridout, Nature 1880, abstract"},
		// Akaroa Mail, 13 April 1880, after Ridout in Nature: recently introduced into Britain.
		{"hectograph-copy", materials.KindArrived, "GB", "1879/1880", "Akaroa Mail 1880, after Ridout in Nature"},
		// Wikipedia, Photostat machine: stencil duplicators surfaced in 1874 (the article's background section).
		{"stencil-duplicator-ink", materials.KindMade, "", "1874", "Wikipedia, Photostat machine"},
		// Britannica (students), mimeograph: the machine originated with Edison's electric pen of 1875 and Dick's mimeograph of 1884.
		{"stencil-duplicator-ink", materials.KindMade, "", "1875", "Britannica (students), mimeograph"},
		// British Library, Evanion 7522: Edison's US patent for Autographic Printing, 1876: electric pen stencil, printing frame and a specially prepared ink.
		{"stencil-duplicator-ink", materials.KindMade, "", "1876", "British Library, Evanion 7522"},
		// Proudfoot 1972: stencils emerged as a practical process in 1881 and were perfected in 1888.
		{"stencil-duplicator-ink", materials.KindMade, "", "1881", "Proudfoot 1972"},
		// Thomas A. Edison Papers (Rutgers), Electric Pen: agents selling the pen and press by the end of 1875.
		{"stencil-duplicator-ink", materials.KindSold, "", "1875", "Thomas A. Edison Papers, Electric Pen"},
		// Princeton Graphic Arts 2009: the A. B. Dick Company released the Edison Mimeograph model 0 flatbed duplicator, at 12 dollars.
		{"stencil-duplicator-ink", materials.KindSold, "", "1887", "Princeton Graphic Arts 2009"},
		// British Library, Evanion 7522: Dick licensed Edison's stencil patent and sold his system as Edison's Mimeograph.
		{"stencil-duplicator-ink", materials.KindSold, "", "1887", "British Library, Evanion 7522"},
		// CAMEO, Spirit duplicator: invented in 1923 by Wilhelm Ritzerfeld.
		{"spirit-duplicator-copy", materials.KindMade, "", "1923", "CAMEO, Spirit duplicator"},
		// Getty AAT 300457828: invented by Wilhelm Ritzerfeld in 1923 as an evolution of the hectograph.
		{"spirit-duplicator-copy", materials.KindMade, "", "1923", "Getty AAT 300457828"},
		// Nadeau, copying chronology: carbon paper, 1806 (carbonated paper).
		{"carbon-paper", materials.KindMade, "", "1806", "Nadeau, copying chronology"},
		// Sunday Observer 2014: the term carbonated paper first used in Ralph Wedgwood's patent for his Stylographic Writer, 1806; Turri's typewriter needed black paper by 1808 at the latest.
		{"carbon-paper", materials.KindMade, "", "1806", "Sunday Observer 2014"},
		// L'Italo-Americano, carbon paper: Pellegrino Turri is said to have made the first carbon paper in 1801 to ink his typing machine.
		{"carbon-paper", materials.KindMade, "", "1801", "L'Italo-Americano, carbon paper"},
		// Wikipedia, Pellegrino Turri: the typing machine of 1801 and the carbon paper that inked it.
		{"carbon-paper", materials.KindMade, "", "1801", "Wikipedia, Pellegrino Turri"},
		// Wikipedia, Typewriter (2021): the article dates the first commercial typewriters to 1874 and describes the typewriter as printing through a ribbon of dried ink.
		{"typewriter-ribbon-ink", materials.KindMade, "", "1874", "Wikipedia, Typewriter (2021)"},
		// Wikipedia, Photostat machine: George C. Beidler founded the Rectigraph Company in 1906 or 1907, making the first photographic copying machines.
		{"photostat-paper", materials.KindMade, "", "1906/1907", "Wikipedia, Photostat machine"},
		// Wikipedia, Photostat machine: the Photostat machine invented in Kansas City by Oscar T. Gregory in 1907.
		{"photostat-paper", materials.KindMade, "", "1907", "Wikipedia, Photostat machine"},
		// Early Office Museum, camera copiers: the Rectigraph Company introduced camera-based copying machines in 1906 or 1907; the Photostat company did so during 1907-1911.
		{"photostat-paper", materials.KindSold, "", "1906/1907", "Early Office Museum, camera copiers"},
		// Wikipedia, Photostat machine: Photostat machines in use by 1912, one recorded at the New York Public Library (start not given).
		{"photostat-paper", materials.KindSold, "", "../1912", "Wikipedia, Photostat machine"},
		// Carvalho 1904, anilines as ink: in Carvalho's chronology of the anilines used as ink, eosine is Caro's invention of 1874.
		{"eosin-red-ink", materials.KindMade, "", "1874", "Carvalho 1904, anilines as ink"},
		// Carvalho 1904, anilines as ink: first import: eosine was brought to the United States the year after its invention, at 125 dollars a pound.
		{"eosin-red-ink", materials.KindArrived, "US", "1875", "Carvalho 1904, anilines as ink"},
		// Wikipedia, Quink: developed from 1928 under Kenneth Parker, first through Miner Laboratories of Chicago and from August 1930 by the chemist Galen Sayler at Janesville.
		{"quick-drying-fountain-pen-ink", materials.KindMade, "", "1928/1931", "Wikipedia, Quink"},
		// Wikipedia, Quink: production began on 17 March 1931 according to Kenneth Parker's journal; $89,000 shipped by 22 October.
		{"quick-drying-fountain-pen-ink", materials.KindSold, "", "1931-03-17", "Wikipedia, Quink"},
		// Wikipedia, Quink: local manufacture: made by the Parker Pen Company at Janesville, Wisconsin.
		{"quick-drying-fountain-pen-ink", materials.KindArrived, "US", "1931-03-17", "Wikipedia, Quink"},
		// Time, 10 March 1986: the Gutenberg 42-line Bible, the first book from movable metal type, printed some time between 1450 and 1455.
		{"letterpress-printing-ink", materials.KindMade, "", "1450/1455", "Time, 10 March 1986"},
		// Verheyen 1984, WAAC Newsletter 6 (1): Gutenberg's inks of 1452 held cooked copper and lead compounds.
		{"letterpress-printing-ink", materials.KindMade, "", "1452", "Verheyen 1984, WAAC Newsletter 6 (1)"},
		// Verheyen 1984, WAAC Newsletter 6 (1): about a thousand proton-induced X-ray emission (PIXE) analyses showed Gutenberg's inks by their copper to lead ratio, batch by batch, over about three years of printing from 1452.
		{"letterpress-printing-ink", materials.KindAttested, "DE", "1452/1455", "Verheyen 1984, WAAC Newsletter 6 (1)"},
		// Marsh, IEEE Spectrum 62 (9), 2025, abstract: Elmqvist's 1949 patent application for the Mingograph, the first ink-jet printer.
		{"inkjet-dye-ink", materials.KindMade, "", "1949", "Marsh 2025, IEEE Spectrum, abstract"},
		// CRC handbook, Ink-jet printing, abstract: early commercial use in oscillographic recorders in the 1950s.
		{"inkjet-dye-ink", materials.KindSold, "", "195X", "CRC handbook, Ink-jet printing, abstract"},
		// CRC handbook, Ink-jet printing, abstract: early commercial ink-jet use in oscillographic recorders in the 1950s; computer output from the 1960s.
		{"inkjet-dye-ink", materials.KindMade, "", "195X", "CRC handbook, Ink-jet printing, abstract"},
		// PrinterSuppliesSearch 2008: Siemens patented the first ink-jet printing device in 1951, which led to ink-jet chart recorders.
		{"inkjet-dye-ink", materials.KindMade, "", "1951", "PrinterSuppliesSearch 2008"},
		// eHow, History of Ink Jet Printers: Siemens strip chart recorders, the first commercial continuous ink-jet devices, 1951.
		{"inkjet-dye-ink", materials.KindSold, "", "1951", "eHow, History of Ink Jet Printers"},
		// HP Computer Museum, inkjet accessories: the ThinkJet and its ink cartridges, 1984.
		{"inkjet-dye-ink", materials.KindSold, "", "1984", "HP Computer Museum, inkjet accessories"},
		// net.micro, April 1984: HP's ThinkJet thermal ink-jet printer announced in March 1984, with ink cartridges good for 500 pages.
		{"inkjet-dye-ink", materials.KindSold, "", "1984", "net.micro, April 1984"},
		// Thermal inkjet and textile printing (2011 repost): HP introduced the first commercial desktop inkjet, the ThinkJet, in 1984; Canon's BJ-80 followed in 1985.
		{"inkjet-dye-ink", materials.KindSold, "", "1984", "Thermal inkjet and textile printing (2011 repost)"},
		// From memory, not read here: Jürgens 1999: pigmented black inkjet inks in office printers during the 1990s (recalled; the thesis's chapter on inks was not read).
		{"inkjet-pigment-ink", materials.KindMade, "", "199X?", "Jürgens 1999 (from memory)"},
		// NYPL, Atkins British Algae: Herschel invented the cyanotype process, today used only for blueprints, in 1842.
		{"blueprint-paper", materials.KindMade, "", "1842", "NYPL, Atkins British Algae"},
		// The Blueprint (2009 repost): Marion and Company of Paris marketed Herschel's process as ferroprussiate paper for copying plans from 1872.
		{"blueprint-paper", materials.KindSold, "", "1872", "The Blueprint (2009 repost)"},
		// Wikipedia, Photostat machine, Background: the blue process of the early 1870s.
		{"blueprint-paper", materials.KindSold, "", "1870/1874", "Wikipedia, Photostat machine"},
		// The Blueprint (2009 repost): first import: shown at the Philadelphia Centennial Exposition of 1876.
		{"blueprint-paper", materials.KindArrived, "US", "1876", "The Blueprint (2009 repost)"},
		// Britannica (students), blueprint: first documented use: blueprinting came into use about 1876.
		{"blueprint-paper", materials.KindArrived, "US", "1876~", "Britannica (students), blueprint"},
		// German Wikipedia, Diazotypie: diazo processes patented in the 1880s were negative, wet-developed and used mainly for textiles; positive methods from the 1890s.
		{"diazo-whiteprint-paper", materials.KindMade, "", "188X", "German Wikipedia, Diazotypie"},
		// Clerc, diazo processes: Feer's process of 1889, developed by water vapour, ammonia or an alkaline solution.
		{"diazo-whiteprint-paper", materials.KindMade, "", "1889", "Clerc, diazo processes"},
		// Clerc, diazo processes: Koegel's papers developed by ammonia vapour without washing, the basis of commercial Ozalid paper.
		{"diazo-whiteprint-paper", materials.KindMade, "", "1916/1922", "Clerc, diazo processes"},
		// German Wikipedia, Diazotypie: Kalle & Co. put the first dry (ammonia-developed) process on the market in 1920.
		{"diazo-whiteprint-paper", materials.KindSold, "", "1920", "German Wikipedia, Diazotypie"},
		// German Wikipedia, Diazotypie: local manufacture: Kalle & Co., on Gustav Kögel's invention.
		{"diazo-whiteprint-paper", materials.KindArrived, "DE", "1920", "German Wikipedia, Diazotypie"},
		// Researchain, thermal paper: NCR and 3M developed the first thermal papers in the 1960s; Texas Instruments invented the thermal print head in 1965.
		{"thermal-paper", materials.KindMade, "", "196X", "Researchain, thermal paper"},
		// Wikipedia, Thermal paper, History: thermal paper made by 1969, when the Silent 700 first printed on it (start not given).
		{"thermal-paper", materials.KindMade, "", "../1969", "Wikipedia, Thermal paper"},
		// Wikipedia, Thermal paper: Texas Instruments' Silent 700 terminal, on the market in 1969, was the first thermal print system on thermal paper.
		{"thermal-paper", materials.KindSold, "", "1969", "Wikipedia, Thermal paper"},
		// Wikipedia, Thermal paper: local manufacture: Ricoh, Jujo and Kanzaki made dye-based thermal paper in the 1970s and early 1980s.
		{"thermal-paper", materials.KindArrived, "JP", "../197X", "Wikipedia, Thermal paper"},
		// From memory, not read here: Wikipedia, Thermal paper: phenolic developers such as bisphenol A belong to the dye chemistry of the first thermal papers (recalled, not read in the history section).
		{"bpa-thermal-paper", materials.KindMade, "", "196X", "Wikipedia, Thermal paper (from memory)"},
		// INERIS 2020: thermal paper with 0.02 % or more bisphenol A by weight may not be placed on the European market from 2 January 2020.
		{"bpa-thermal-paper", materials.KindWithdrawn, "DE", "2020-01-02", "INERIS 2020"},
		// INERIS 2020: the restriction was proposed by France and applies from 2 January 2020.
		{"bpa-thermal-paper", materials.KindWithdrawn, "FR", "2020-01-02", "INERIS 2020"},
		// Regulation (EU) 2016/2235: REACH Annex XVII entry 66: not to be placed on the market in thermal paper at 0.02 % or more after 2 January 2020.
		{"bpa-thermal-paper", materials.KindWithdrawn, "IT", "2020-01-02", "Regulation (EU) 2016/2235"},
		// Regulation (EU) 2016/2235: REACH Annex XVII entry 66.
		{"bpa-thermal-paper", materials.KindWithdrawn, "ES", "2020-01-02", "Regulation (EU) 2016/2235"},
		// Regulation (EU) 2016/2235: REACH Annex XVII entry 66.
		{"bpa-thermal-paper", materials.KindWithdrawn, "NL", "2020-01-02", "Regulation (EU) 2016/2235"},
		// Regulation (EU) 2016/2235: REACH Annex XVII entry 66.
		{"bpa-thermal-paper", materials.KindWithdrawn, "BE", "2020-01-02", "Regulation (EU) 2016/2235"},
		// Regulation (EU) 2016/2235: REACH Annex XVII entry 66.
		{"bpa-thermal-paper", materials.KindWithdrawn, "AT", "2020-01-02", "Regulation (EU) 2016/2235"},
		// Regulation (EU) 2016/2235: REACH Annex XVII entry 66.
		{"bpa-thermal-paper", materials.KindWithdrawn, "PL", "2020-01-02", "Regulation (EU) 2016/2235"},
		// Regulation (EU) 2016/2235: REACH Annex XVII entry 66.
		{"bpa-thermal-paper", materials.KindWithdrawn, "SE", "2020-01-02", "Regulation (EU) 2016/2235"},
		// Science Museum Group 1937-361: Talbot invented in 1834 a process giving negative images on light-sensitive paper, from which positives could be contact-printed.
		{"salted-paper-print", materials.KindMade, "", "1834", "Science Museum Group 1937-361"},
		// Osterman 2006: Talbot disclosed his fixing of silver chloride prints with sodium thiosulfate in 1839.
		{"salted-paper-print", materials.KindMade, "", "1839", "Osterman 2006"},
		// Science Museum Group 1937-361: the oldest known surviving paper negative, dated August 1835 by Talbot; process identification by the museum.
		{"salted-paper-print", materials.KindAttested, "GB", "1835-08", "Science Museum Group 1937-361"},
		// NYPL, Atkins British Algae: invented by Sir John Herschel in 1842.
		{"cyanotype", materials.KindMade, "", "1842", "NYPL, Atkins British Algae"},
		// NYPL, Atkins British Algae: cyanotype photograms of algae; process named by the maker and the library, not by analysis.
		{"cyanotype", materials.KindAttested, "GB", "1843-10", "NYPL, Atkins British Algae"},
		// Hannavy 2008, p. 23: Blanquart-Evrard presented albumen paper to the French Academy of Sciences on 27 May 1850.
		{"albumen-paper", materials.KindMade, "", "1850-05-27", "Hannavy 2008, p. 23"},
		// Hannavy 2008, p. 23: Blanquart-Evrard opened a printing establishment at Lille in 1851 for prints in quantity.
		{"albumen-paper", materials.KindSold, "", "1851", "Hannavy 2008, p. 23"},
		// Reilly 1980, Preface: the albumen print dominated photographic printing from 1855 to 1895.
		{"albumen-paper", materials.KindSold, "", "1855", "Reilly 1980, Preface"},
		// Hannavy 2008, p. 23: local manufacture: presented in Paris and made by Blanquart-Evrard at Lille.
		{"albumen-paper", materials.KindArrived, "FR", "1850-05-27", "Hannavy 2008, p. 23"},
		// Osterman 2006: G. Wharton Simpson made prints with a collodion-chloride emulsion in 1865, though not commercially.
		{"collodion-printing-out-paper", materials.KindMade, "", "1865", "Osterman 2006"},
		// Hannavy 2008, p. 1175: Laurent and Martínez-Sánchez perfected leptographic collodion-chloride paper over a baryta layer in 1866.
		{"collodion-printing-out-paper", materials.KindMade, "", "1866", "Hannavy 2008, p. 1175"},
		// Hannavy 2008, p. 1175: leptographic paper was sold ready to use.
		{"collodion-printing-out-paper", materials.KindSold, "", "1866", "Hannavy 2008, p. 1175"},
		// The History of Photography, ch. 29: J. B. Obernetter of Munich successfully introduced collodio-chloride paper in Germany in 1868; many firms made it as Aristotypie in the 1880s and 1890s.
		{"collodion-printing-out-paper", materials.KindSold, "", "1868", "The History of Photography, ch. 29"},
		// HNOC, Collodion printing-out paper: limited commercial success until the Obernetter family manufactured it in the mid-1880s.
		{"collodion-printing-out-paper", materials.KindSold, "", "188X", "HNOC, Collodion printing-out paper"},
		// The History of Photography, ch. 29: local manufacture: Obernetter, Munich.
		{"collodion-printing-out-paper", materials.KindArrived, "DE", "../1868", "The History of Photography, ch. 29"},
		// HNOC, Collodion printing-out paper: dated print catalogued as collodion printing-out paper by the collection.
		{"collodion-printing-out-paper", materials.KindAttested, "US", "1895", "HNOC, Collodion printing-out paper"},
		// Graphics Atlas, Gelatin POP: invented by Sir William Abney in 1882.
		{"gelatin-printing-out-paper", materials.KindMade, "", "1882", "Graphics Atlas, Gelatin POP"},
		// ARCP 2015, aristotype: introduced in 1882 by William de Abney; industrial production from 1884.
		{"gelatin-printing-out-paper", materials.KindMade, "", "1882", "ARCP 2015, aristotype"},
		// Giliberti, POP: the page says Obernetter began making gelatin chloride printing-out paper in 1864; probably a confusion with collodion-chloride paper, hence uncertain.
		{"gelatin-printing-out-paper", materials.KindMade, "", "1864?", "Giliberti, POP"},
		// Graphics Atlas, Gelatin POP: commercialised by several companies from 1884; in common use 1885-1910.
		{"gelatin-printing-out-paper", materials.KindSold, "", "1884", "Graphics Atlas, Gelatin POP"},
		// ARCP 2015, aristotype: local manufacture: the Lumière brothers' Aristo paper from 1892.
		{"gelatin-printing-out-paper", materials.KindArrived, "FR", "../1892", "ARCP 2015, aristotype"},
		// HNOC, Gelatin printing-out paper: catalogued as gelatin printing-out paper by the collection.
		{"gelatin-printing-out-paper", materials.KindAttested, "US", "1888/1895", "HNOC, Gelatin printing-out paper"},
		// The History of Photography, ch. 29: invented and first produced in 1873 by Peter Mawdsley of the Liverpool Dry Plate and Photographic Printing Company.
		{"gelatin-silver-developing-out-paper", materials.KindMade, "", "1873", "The History of Photography, ch. 29"},
		// The History of Photography, ch. 29: first produced for sale in 1873 and recommended in the British Journal Photographic Almanac for 1874.
		{"gelatin-silver-developing-out-paper", materials.KindSold, "", "1873", "The History of Photography, ch. 29"},
		// Wikipedia, Gelatin silver process: made on a commercial basis as early as 1874; coating machines by the mid-1880s; baryta coating commercial in Germany in 1894.
		{"gelatin-silver-developing-out-paper", materials.KindSold, "", "1874", "Wikipedia, Gelatin silver process"},
		// The History of Photography, ch. 29: local manufacture: Liverpool.
		{"gelatin-silver-developing-out-paper", materials.KindArrived, "GB", "1873", "The History of Photography, ch. 29"},
		// Hannavy 2008, p. 1053: local manufacture: gelatine silver chloride paper, described by Eder and Pizzighelli in 1881, made on a large scale by Dr Just in Vienna from late 1882.
		{"gelatin-silver-developing-out-paper", materials.KindArrived, "AT", "../1882", "Hannavy 2008, p. 1053"},
		// Wikipedia, James Ambrose Cutting: black-backed collodion positives reported made by Frederick Scott Archer at least as early as 1852.
		{"ambrotype", materials.KindMade, "", "1852", "Wikipedia, James Ambrose Cutting"},
		// Wikipedia, James Ambrose Cutting: Cutting's three US patents of 1854 (11,213, 11,266 and 11,267) on collodion positives on glass.
		{"ambrotype", materials.KindMade, "", "1854", "Wikipedia, James Ambrose Cutting"},
		// Wikipedia, James Ambrose Cutting: first documented use: Cutting's patents, Boston, 1854; most popular in the mid- to late 1850s.
		{"ambrotype", materials.KindArrived, "US", "1854", "Wikipedia, James Ambrose Cutting"},
		// PHSC, The Iron Plate: the iron-plate process has its roots in Adolphe Martin's work in France; Hamilton Smith experimented with collodion on japanned iron over 1853-1855.
		{"tintype", materials.KindMade, "", "1853", "PHSC, The Iron Plate"},
		// Wikipedia, Tintype, lead: introduced in 1853 by Adolphe Alexandre Martin in Paris.
		{"tintype", materials.KindMade, "", "1853", "Wikipedia, Tintype"},
		// The Melainotype and Neff, Trans. APS: Smith's patent "Photographic Pictures on Japanned Surfaces" issued 19 February 1856 and assigned to Peter and William Neff.
		{"tintype", materials.KindMade, "", "1856-02-19", "The Melainotype and Neff, Trans. APS"},
		// The Melainotype and Neff, Trans. APS: Neff first manufactured the melainotype plate in Cincinnati in the summer of 1856.
		{"tintype", materials.KindSold, "", "1856", "The Melainotype and Neff, Trans. APS"},
		// The Melainotype and Neff, Trans. APS: local manufacture: Neff, Cincinnati.
		{"tintype", materials.KindArrived, "US", "1856", "The Melainotype and Neff, Trans. APS"},
		// Ware in Hannavy 2008, pp. 1135-1136: William Willis's British patent no. 2011 of 5 June 1873.
		{"platinum-print-paper", materials.KindMade, "", "1873-06-05", "Ware in Hannavy 2008, pp. 1135-1136"},
		// Science Museum Group, Platinotype Company: Willis patented the platinotype in 1873, with further patents in 1878 and 1880.
		{"platinum-print-paper", materials.KindMade, "", "1873", "Science Museum Group, Platinotype Company"},
		// Science Museum Group, Platinotype Company: the first commercial platinotype papers were offered for sale in 1880 by the Platinotype Company of London (founded 1879).
		{"platinum-print-paper", materials.KindSold, "", "1880", "Science Museum Group, Platinotype Company"},
		// Ware in Hannavy 2008, pp. 1135-1136: by 1880 the first commercial platinotype papers were on sale.
		{"platinum-print-paper", materials.KindSold, "", "1880", "Ware in Hannavy 2008, pp. 1135-1136"},
		// Science Museum Group, Platinotype Company: local manufacture: the Platinotype Company, London.
		{"platinum-print-paper", materials.KindArrived, "GB", "1880", "Science Museum Group, Platinotype Company"},
		// McCabe 2014, fig. 1: platinum print in a technical study of the collection's platinum, silver-platinum and palladium prints.
		{"platinum-print-paper", materials.KindAttested, "US", "1916", "McCabe 2014, fig. 1"},
		// Graphics Atlas, Chromogenic object view: resin-coated supports introduced in 1968 in the United States and in 1970 in Europe.
		{"resin-coated-photographic-paper", materials.KindMade, "", "1968", "Graphics Atlas, Chromogenic object view"},
		// US patent 3,260,602, resin laminated paper for photographic application: application code of 1962.
		{"resin-coated-photographic-paper", materials.KindMade, "", "1962", "US 3,260,602, bibliographic section"},
		// Graphics Atlas, Chromogenic object view: introduced in the United States in 1968.
		{"resin-coated-photographic-paper", materials.KindSold, "", "1968", "Graphics Atlas, Chromogenic object view"},
		// Graphics Atlas, Chromogenic object view: first documented use: introduced in the United States in 1968.
		{"resin-coated-photographic-paper", materials.KindArrived, "US", "1968", "Graphics Atlas, Chromogenic object view"},
		// Graphics Atlas, Chromogenic object view: first documented use: introduced in Europe in 1970.
		{"resin-coated-photographic-paper", materials.KindArrived, "150", "1970", "Graphics Atlas, Chromogenic object view"},
		// Graphics Atlas, Chromogenic object view: Kodacolor, introduced in 1942, was the first printing paper printed from negative film; fibre-based colour papers were made until 1971.
		{"chromogenic-colour-paper", materials.KindMade, "", "1942", "Graphics Atlas, Chromogenic object view"},
		// Weaver and Long 2009: the colour snapshot began in January 1942 with Kodak's Kodacolor negative-positive process and its fibre-base prints.
		{"chromogenic-colour-paper", materials.KindSold, "", "1942-01", "Weaver and Long 2009"},
		// Weaver and Long 2009: local manufacture: Eastman Kodak.
		{"chromogenic-colour-paper", materials.KindArrived, "US", "1942-01", "Weaver and Long 2009"},
		// Britannica, Instant-picture photography: Land demonstrated the system in 1947.
		{"instant-silver-diffusion-print", materials.KindMade, "", "1947", "Britannica, Instant-picture photography"},
		// Britannica, Instant-picture photography: marketed by the Polaroid Corporation in 1948.
		{"instant-silver-diffusion-print", materials.KindSold, "", "1948", "Britannica, Instant-picture photography"},
		// Paris Photo glossary, dye diffusion: Land's first instant camera, the Polaroid 95, in 1948; black and white only until the 1960s.
		{"instant-silver-diffusion-print", materials.KindSold, "", "1948", "Paris Photo glossary, dye diffusion"},
		// Britannica, Instant-picture photography: local manufacture: Polaroid Corporation.
		{"instant-silver-diffusion-print", materials.KindArrived, "US", "1948", "Britannica, Instant-picture photography"},
		// Paris Photo glossary, dye diffusion: colour Polaroid films first appeared in 1962; integral film with the SX-70 in 1972.
		{"instant-dye-diffusion-print", materials.KindMade, "", "1962", "Paris Photo glossary, dye diffusion"},
		// Britannica, Instant-picture photography: the instant colour print film Polacolor was introduced in 1963, an integral single-sheet colour film in 1972.
		{"instant-dye-diffusion-print", materials.KindSold, "", "1963", "Britannica, Instant-picture photography"},
		// Britannica, Instant-picture photography: local manufacture: Polaroid Corporation.
		{"instant-dye-diffusion-print", materials.KindArrived, "US", "1963", "Britannica, Instant-picture photography"},
	}
	checkSourceRows(t, d, inksFile, rows)
}

// TestInksOrderOfTheTrade checks orders that the trade takes for granted.
func TestInksOrderOfTheTrade(t *testing.T) {
	checkOrder(t, checkBuiltin(t), orderRule{soldOrMade: true}, []orderRow{
		// Common practice: the gelatin hectograph came before the spirit duplicator that grew out of it.
		{"hectograph-copy", "spirit-duplicator-copy", materials.KindMade, "hectograph before spirit duplicator (common practice)"},
		// Common practice: salted paper came before albumen paper.
		{"salted-paper-print", "albumen-paper", materials.KindMade, "salted paper before albumen (common practice)"},
		// Common practice: albumen paper came before the emulsion printing-out papers.
		{"albumen-paper", "gelatin-printing-out-paper", materials.KindSold, "albumen before gelatin POP (common practice)"},
		// Common practice: blueprints came before diazo whiteprints, which replaced them.
		{"blueprint-paper", "diazo-whiteprint-paper", materials.KindSold, "blueprint before whiteprint (common practice)"},
		// Common practice: the glass ambrotype came before the iron tintype.
		{"ambrotype", "tintype", materials.KindMade, "ambrotype before tintype (common practice)"},
		// Common practice: fibre-based colour paper came before resin-coated supports.
		{"chromogenic-colour-paper", "resin-coated-photographic-paper", materials.KindSold, "colour paper before RC supports (common practice)"},
		// Common practice: black-and-white instant prints came before colour ones.
		{"instant-silver-diffusion-print", "instant-dye-diffusion-print", materials.KindSold, "black-and-white before colour instant prints (common practice)"},
		// Common practice: dye inkjet inks came before pigment inkjet inks.
		{"inkjet-dye-ink", "inkjet-pigment-ink", materials.KindSold, "dye before pigment inkjet ink (common practice)"},
		// Common practice: the hand-coated cyanotype came before commercial blueprint paper.
		{"cyanotype", "blueprint-paper", materials.KindSold, "cyanotype before commercial blueprint paper (common practice)"},
	})
}

// TestInksFileShape checks what this family promises: what every family file
// promises (see checkFamilyFile), at least 22 materials, enough inks and
// supports, enough materials attested by a dated object, and enough arrivals.
func TestInksFileShape(t *testing.T) {
	var attestedMaterials, arrivals int
	classes := map[string]int{}
	for _, m := range checkFamilyFile(t, checkBuiltin(t), inksFile, 22) {
		classes[string(m.Class)]++
		if len(m.Claims(materials.KindAttested, "")) > 0 {
			attestedMaterials++
		}
		arrivals += len(m.Claims(materials.KindArrived, ""))
	}
	if classes["ink"] < 10 || classes["support"] < 10 {
		t.Errorf("want at least 10 inks and 10 supports, have %v", classes)
	}
	if attestedMaterials < 6 {
		t.Errorf("%d materials attested by a dated object; want at least 6", attestedMaterials)
	}
	if arrivals < 15 {
		t.Errorf("%d arrivals; want at least 15", arrivals)
	}
}
