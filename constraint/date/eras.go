package date

// The era tables of the East Asian calendars. This file is a data table.
//
// Japanese eras from Keichō: the Gregorian year of the lunisolar year in
// which each was proclaimed (the list of Japanese era names, as in
// Wikipedia's "Japanese era name" and the conversion tables of the
// period; held to ICU's era years by the oracle test). Before Meiji an
// era's year 1 is the whole lunisolar year of its proclamation and its
// last year is the year in which the next era was proclaimed: later
// records name a year by the era that ended it (the Ansei earthquakes of
// Kaei 7), and a document written after the change may not yet have known
// of it, so both names are read over the whole year. From Meiji on the
// eras begin on known days: Meiji was decreed on Keiō 4/9/8 for the whole
// of that year (from 1/1, 25 January 1868), Taishō began on 30 July 1912,
// Shōwa on 25 December 1926, Heisei on 8 January 1989 and Reiwa on 1 May
// 2019.
//
// Chinese reigns of the Ming and Qing: the Gregorian year of each reign's
// year 1 (the lunisolar year after the accession, as a rule) and its last
// year number, from the standard lists of the dynasties' reign titles.

type era struct {
	name    string   // romanised, with macrons
	kanji   string   // as written (Japanese shinjitai, Chinese traditional)
	aliases []string // other spellings, folded by foldLatin or kanjiFold
	start   int64    // the Gregorian year of the lunisolar year 1
	last    int      // the last year number; 0 for the current era
	from    [3]int   // from Meiji on: the first day of the era (Gregorian year, month, day)
	note    string
	reign   bool // a Joseon king's reign, counted in two ways: see koreanKings
}

var japaneseEras = []era{
	{name: "Keichō", kanji: "慶長", start: 1596},
	{name: "Genna", kanji: "元和", aliases: []string{"genwa"}, start: 1615},
	{name: "Kan'ei", kanji: "寛永", start: 1624},
	{name: "Shōhō", kanji: "正保", start: 1644},
	{name: "Keian", kanji: "慶安", aliases: []string{"kyoan"}, start: 1648},
	{name: "Jōō", kanji: "承応", aliases: []string{"shoo"}, start: 1652},
	{name: "Meireki", kanji: "明暦", aliases: []string{"myoryaku", "meiryaku"}, start: 1655},
	{name: "Manji", kanji: "万治", start: 1658},
	{name: "Kanbun", kanji: "寛文", start: 1661},
	{name: "Enpō", kanji: "延宝", aliases: []string{"enho"}, start: 1673},
	{name: "Tenna", kanji: "天和", aliases: []string{"tenwa"}, start: 1681},
	{name: "Jōkyō", kanji: "貞享", start: 1684},
	{name: "Genroku", kanji: "元禄", start: 1688},
	{name: "Hōei", kanji: "宝永", start: 1704},
	{name: "Shōtoku", kanji: "正徳", start: 1711},
	{name: "Kyōhō", kanji: "享保", start: 1716},
	{name: "Genbun", kanji: "元文", start: 1736},
	{name: "Kanpō", kanji: "寛保", aliases: []string{"kanho"}, start: 1741},
	{name: "Enkyō", kanji: "延享", start: 1744},
	{name: "Kan'en", kanji: "寛延", start: 1748},
	{name: "Hōreki", kanji: "宝暦", aliases: []string{"horyaku"}, start: 1751},
	{name: "Meiwa", kanji: "明和", start: 1764},
	{name: "An'ei", kanji: "安永", start: 1772},
	{name: "Tenmei", kanji: "天明", start: 1781},
	{name: "Kansei", kanji: "寛政", start: 1789},
	{name: "Kyōwa", kanji: "享和", start: 1801},
	{name: "Bunka", kanji: "文化", start: 1804},
	{name: "Bunsei", kanji: "文政", start: 1818},
	{name: "Tenpō", kanji: "天保", start: 1830},
	{name: "Kōka", kanji: "弘化", start: 1844},
	{name: "Kaei", kanji: "嘉永", start: 1848},
	{name: "Ansei", kanji: "安政", start: 1854},
	{name: "Man'en", kanji: "万延", start: 1860},
	{name: "Bunkyū", kanji: "文久", start: 1861},
	{name: "Genji", kanji: "元治", start: 1864},
	{name: "Keiō", kanji: "慶応", start: 1865},
	{name: "Meiji", kanji: "明治", start: 1868, last: 45, from: [3]int{1868, 1, 25}},
	{name: "Taishō", kanji: "大正", start: 1912, last: 15, from: [3]int{1912, 7, 30}},
	{name: "Shōwa", kanji: "昭和", start: 1926, last: 64, from: [3]int{1926, 12, 25}},
	{name: "Heisei", kanji: "平成", start: 1989, last: 31, from: [3]int{1989, 1, 8}},
	{name: "Reiwa", kanji: "令和", start: 2019, from: [3]int{2019, 5, 1}},
}

var chineseEras = []era{
	// Ming
	{name: "Hongwu", kanji: "洪武", aliases: []string{"hungwu"}, start: 1368, last: 35,
		note: "years 32 to 35 are the Yongle court's count for 1399–1402"},
	{name: "Jianwen", kanji: "建文", aliases: []string{"chienwen"}, start: 1399, last: 4},
	{name: "Yongle", kanji: "永樂", aliases: []string{"yunglo", "永乐"}, start: 1403, last: 22},
	{name: "Hongxi", kanji: "洪熙", aliases: []string{"hunghsi"}, start: 1425, last: 1},
	{name: "Xuande", kanji: "宣德", aliases: []string{"hsuante", "宣徳"}, start: 1426, last: 10},
	{name: "Zhengtong", kanji: "正統", aliases: []string{"chengtung", "正统"}, start: 1436, last: 14},
	{name: "Jingtai", kanji: "景泰", aliases: []string{"chingtai"}, start: 1450, last: 8},
	{name: "Tianshun", kanji: "天順", aliases: []string{"tienshun", "天顺"}, start: 1457, last: 8},
	{name: "Chenghua", kanji: "成化", aliases: []string{"chenghua"}, start: 1465, last: 23},
	{name: "Hongzhi", kanji: "弘治", aliases: []string{"hungchih"}, start: 1488, last: 18},
	{name: "Zhengde", kanji: "正德", aliases: []string{"chengte"}, start: 1506, last: 16},
	{name: "Jiajing", kanji: "嘉靖", aliases: []string{"chiaching"}, start: 1522, last: 45},
	{name: "Longqing", kanji: "隆慶", aliases: []string{"lungching", "隆庆"}, start: 1567, last: 6},
	{name: "Wanli", kanji: "萬曆", aliases: []string{"万历", "萬历", "万曆"}, start: 1573, last: 48},
	{name: "Taichang", kanji: "泰昌", aliases: []string{"taichang"}, start: 1620, last: 1},
	{name: "Tianqi", kanji: "天啟", aliases: []string{"tienchi", "天启"}, start: 1621, last: 7},
	{name: "Chongzhen", kanji: "崇禎", aliases: []string{"chungchen", "崇祯"}, start: 1628, last: 17},
	// Qing
	{name: "Shunzhi", kanji: "順治", aliases: []string{"shunchih", "顺治"}, start: 1644, last: 18},
	{name: "Kangxi", kanji: "康熙", aliases: []string{"kanghsi"}, start: 1662, last: 61},
	{name: "Yongzheng", kanji: "雍正", aliases: []string{"yungcheng"}, start: 1723, last: 13},
	{name: "Qianlong", kanji: "乾隆", aliases: []string{"chienlung"}, start: 1736, last: 64,
		note: "years 61 to 64 are the palace's own count while the Qianlong emperor lived in retirement (1796–1799)"},
	{name: "Jiaqing", kanji: "嘉慶", aliases: []string{"chiaching", "嘉庆"}, start: 1796, last: 25},
	{name: "Daoguang", kanji: "道光", aliases: []string{"taokuang"}, start: 1821, last: 30},
	{name: "Xianfeng", kanji: "咸豐", aliases: []string{"hsienfeng", "咸丰"}, start: 1851, last: 11},
	{name: "Tongzhi", kanji: "同治", aliases: []string{"tungchih"}, start: 1862, last: 13},
	{name: "Guangxu", kanji: "光緒", aliases: []string{"kuanghsu", "光绪"}, start: 1875, last: 34},
	{name: "Xuantong", kanji: "宣統", aliases: []string{"hsuantung", "宣统"}, start: 1909, last: 16,
		note: "years 4 to 16 are the count of the abdicated court in the Forbidden City (1912–1924)"},
}

// koreanEras are the era names of the Korean Empire, on the Gregorian
// calendar (adopted in 1896); a year 1 is read as its whole year.
var koreanEras = []era{
	{name: "Geonyang", kanji: "建陽", aliases: []string{"konyang"}, start: 1896, last: 2},
	{name: "Gwangmu", kanji: "光武", aliases: []string{"kwangmu"}, start: 1897, last: 11},
	{name: "Yunghui", kanji: "隆熙", aliases: []string{"yunghui", "yungheui"}, start: 1907, last: 4},
}

// koreanKings are the kings of Joseon, by temple name, with the Gregorian
// year of their accession and of the end of their reign (the list of
// Joseon monarchs, as in Wikipedia's "List of Joseon monarchs"). The
// annals count a reign from the year after the accession (the accession
// year is "the year of accession", 即位年), but other records count the
// accession year as the first; "Yeongjo 12" is read as one of the two
// lunisolar years, on the Korean calendar, and the notes say so.
var koreanKings = []era{
	{name: "Taejo", kanji: "太祖", aliases: []string{"태조", "t'aejo"}, start: 1392, last: 7, reign: true},
	{name: "Jeongjong", kanji: "定宗", aliases: []string{"정종", "chongjong"}, start: 1398, last: 3, reign: true},
	{name: "Taejong", kanji: "太宗", aliases: []string{"태종", "t'aejong"}, start: 1400, last: 19, reign: true},
	{name: "Sejong", kanji: "世宗", aliases: []string{"세종"}, start: 1418, last: 33, reign: true},
	{name: "Munjong", kanji: "文宗", aliases: []string{"문종"}, start: 1450, last: 3, reign: true},
	{name: "Danjong", kanji: "端宗", aliases: []string{"단종", "tanjong"}, start: 1452, last: 4, reign: true},
	{name: "Sejo", kanji: "世祖", aliases: []string{"세조"}, start: 1455, last: 14, reign: true},
	{name: "Yejong", kanji: "睿宗", aliases: []string{"예종"}, start: 1468, last: 2, reign: true},
	{name: "Seongjong", kanji: "成宗", aliases: []string{"성종", "songjong"}, start: 1469, last: 26, reign: true},
	{name: "Yeonsangun", kanji: "燕山君", aliases: []string{"연산군", "yonsangun"}, start: 1494, last: 13, reign: true},
	{name: "Jungjong", kanji: "中宗", aliases: []string{"중종", "chungjong"}, start: 1506, last: 39, reign: true},
	{name: "Injong", kanji: "仁宗", aliases: []string{"인종"}, start: 1544, last: 2, reign: true},
	{name: "Myeongjong", kanji: "明宗", aliases: []string{"명종", "myongjong"}, start: 1545, last: 23, reign: true},
	{name: "Seonjo", kanji: "宣祖", aliases: []string{"선조", "sonjo"}, start: 1567, last: 42, reign: true},
	{name: "Gwanghaegun", kanji: "光海君", aliases: []string{"광해군", "kwanghaegun"}, start: 1608, last: 16, reign: true},
	{name: "Injo", kanji: "仁祖", aliases: []string{"인조"}, start: 1623, last: 27, reign: true},
	{name: "Hyojong", kanji: "孝宗", aliases: []string{"효종"}, start: 1649, last: 11, reign: true},
	{name: "Hyeonjong", kanji: "顯宗", aliases: []string{"현종", "hyonjong", "顕宗"}, start: 1659, last: 16, reign: true},
	{name: "Sukjong", kanji: "肅宗", aliases: []string{"숙종", "粛宗"}, start: 1674, last: 47, reign: true},
	{name: "Gyeongjong", kanji: "景宗", aliases: []string{"경종", "kyongjong"}, start: 1720, last: 5, reign: true},
	{name: "Yeongjo", kanji: "英祖", aliases: []string{"영조", "yongjo"}, start: 1724, last: 53, reign: true},
	{name: "Jeongjo", kanji: "正祖", aliases: []string{"정조", "chongjo"}, start: 1776, last: 25, reign: true},
	{name: "Sunjo", kanji: "純祖", aliases: []string{"순조"}, start: 1800, last: 35, reign: true},
	{name: "Heonjong", kanji: "憲宗", aliases: []string{"헌종", "honjong"}, start: 1834, last: 16, reign: true},
	{name: "Cheoljong", kanji: "哲宗", aliases: []string{"철종", "ch'oljong"}, start: 1849, last: 15, reign: true},
	{name: "Gojong", kanji: "高宗", aliases: []string{"고종", "kojong"}, start: 1863, last: 45, reign: true},
	{name: "Sunjong", kanji: "純宗", aliases: []string{"순종"}, start: 1907, last: 4, reign: true},
}
