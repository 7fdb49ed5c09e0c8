package date

import (
	"strings"
	"unicode/utf8"
)

// foldLatin lowers s and drops the marks and signs that romanisations add
// or leave out: macrons and other accents, apostrophes, hyphens, spaces.
// Long vowels written double (ou, oo, uu) and m before b, p or m (Tempō)
// are folded too, so that Tenpō, Tempo, Tenpou and Ten-po agree.
func foldLatin(s string) string {
	var b strings.Builder
	b.Grow(len(s))
	for _, r := range s {
		switch {
		case r >= 'A' && r <= 'Z':
			b.WriteRune(r + 32)
		case r >= 'a' && r <= 'z', r >= '0' && r <= '9':
			b.WriteRune(r)
		case r < 0x80:
			// spaces, apostrophes, hyphens, dots: dropped
		default:
			if c, ok := latinFold[r]; ok {
				b.WriteByte(c)
			} else if r > 0x2000 && r < 0x2100 || r == 'ʻ' || r == 'ʿ' || r == 'ʾ' || r == 'ʼ' {
				// quotation marks and the signs for ayn and hamza
			} else {
				b.WriteRune(r)
			}
		}
	}
	out := b.String()
	for _, rep := range [][2]string{{"ou", "o"}, {"oo", "o"}, {"uu", "u"}, {"mb", "nb"}, {"mp", "np"}, {"mm", "nm"}} {
		out = strings.ReplaceAll(out, rep[0], rep[1])
	}
	return out
}

var latinFold = map[rune]byte{
	'ā': 'a', 'á': 'a', 'à': 'a', 'â': 'a', 'ä': 'a', 'ǎ': 'a', 'Ā': 'a', 'Á': 'a', 'Â': 'a',
	'ē': 'e', 'é': 'e', 'è': 'e', 'ê': 'e', 'ë': 'e', 'ě': 'e', 'Ē': 'e', 'É': 'e',
	'ī': 'i', 'í': 'i', 'ì': 'i', 'î': 'i', 'ï': 'i', 'ǐ': 'i', 'Ī': 'i', 'İ': 'i', 'ı': 'i',
	'ō': 'o', 'ó': 'o', 'ò': 'o', 'ô': 'o', 'ö': 'o', 'ǒ': 'o', 'Ō': 'o', 'Ô': 'o', 'Ö': 'o',
	'ū': 'u', 'ú': 'u', 'ù': 'u', 'û': 'u', 'ü': 'u', 'ǔ': 'u', 'ǖ': 'u', 'ǘ': 'u', 'ǚ': 'u', 'ǜ': 'u', 'Ū': 'u', 'Ü': 'u',
	'ḥ': 'h', 'Ḥ': 'h', 'ḍ': 'd', 'Ḍ': 'd', 'ṣ': 's', 'Ṣ': 's', 'ṭ': 't', 'Ṭ': 't', 'ẓ': 'z', 'Ẓ': 'z',
	'ş': 's', 'Ş': 's', 'š': 's', 'Š': 's', 'ç': 'c', 'Ç': 'c', 'ğ': 'g', 'ñ': 'n', 'ṅ': 'n', 'ž': 'z', 'ẖ': 'h',
}

// cjkNumber reads a number written in Chinese or Japanese numerals (一 to
// 九, 十, 百, 千, 〇 or 零, 廿 for 20, 卅 for 30, 两), in ASCII or full-width
// digits, or 元 (the first year of an era) and 正 (the first month). It
// returns false when s is no such number.
func cjkNumber(s string) (int64, bool) {
	if s == "" {
		return 0, false
	}
	if s == "元" || s == "正" {
		return 1, true
	}
	// digits, ASCII or full-width, or 〇-style positional numerals
	var v int64
	positional := true
	for _, r := range s {
		d := cjkDigit(r)
		switch {
		case r >= '0' && r <= '9':
			d = int(r - '0')
		case r >= '０' && r <= '９':
			d = int(r - '０')
		case r == '〇' || r == '零':
			d = 0
		case d < 0:
			positional = false
		}
		if !positional {
			break
		}
		v = v*10 + int64(d)
		if v > maxYear {
			return 0, false
		}
	}
	if positional {
		// "一八五七" is positional too; "十四" is not (十 is no digit)
		return v, true
	}
	// 十, 百, 千 with multipliers: 二十三, 十四, 百二十, 廿三
	var total, cur int64
	for _, r := range s {
		if d := cjkDigit(r); d >= 0 {
			cur = int64(d)
			continue
		}
		switch r {
		case '十', '拾':
			if cur == 0 {
				cur = 1
			}
			total += cur * 10
			cur = 0
		case '廿':
			total += 20
			cur = 0
		case '卅':
			total += 30
			cur = 0
		case '百', '佰':
			if cur == 0 {
				cur = 1
			}
			total += cur * 100
			cur = 0
		case '千', '仟':
			if cur == 0 {
				cur = 1
			}
			total += cur * 1000
			cur = 0
		case '〇', '零':
		default:
			return 0, false
		}
	}
	return total + cur, true
}

func cjkDigit(r rune) int {
	switch r {
	case '一', '壹':
		return 1
	case '二', '貳', '贰', '两', '兩':
		return 2
	case '三', '參', '叁':
		return 3
	case '四', '肆':
		return 4
	case '五', '伍':
		return 5
	case '六', '陸':
		return 6
	case '七', '柒':
		return 7
	case '八', '捌':
		return 8
	case '九', '玖':
		return 9
	}
	return -1
}

// hasNonASCII reports whether s[lo:hi] holds a byte outside ASCII.
func hasNonASCII(s string, lo, hi int) bool {
	for i := lo; i < hi; i++ {
		if s[i] >= utf8.RuneSelf {
			return true
		}
	}
	return false
}

// kanjiFold maps the traditional forms of characters in era names to the
// forms the tables use (Japanese shinjitai and the Chinese traditional).
var kanjiFold = strings.NewReplacer("寬", "寛", "應", "応", "寶", "宝", "曆", "暦", "萬", "万", "德", "徳",
	"祿", "禄", "國", "国")
