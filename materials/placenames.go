package materials

import (
	"slices"
	"strings"

	"terminus/materials/spell"
)

// A placeName is a name people write for a place that is not the table's
// own: a former or historical name, or an everyday English one, and the
// code it is read as, with what a reader should know of the mapping.
type placeName struct {
	name, code, note string
}

// placeNames are the names read as codes beyond the table's own names.
// Where a historical state spread over several of today's countries, it
// is read as the country of its heartland and the note says so; the case
// can always give the code itself.
var placeNames = []placeName{
	{"Holland", "NL", ""},
	{"Dutch Republic", "NL", ""},
	{"Netherlands, the", "NL", ""},
	{"Flanders", "BE", "Flanders lies today mostly in Belgium; write FR for French Flanders"},
	{"England", "GB", "England is part of the United Kingdom (GB)"},
	{"Scotland", "GB", "Scotland is part of the United Kingdom (GB)"},
	{"Wales", "GB", "Wales is part of the United Kingdom (GB)"},
	{"Britain", "GB", ""},
	{"Great Britain", "GB", ""},
	{"UK", "GB", ""},
	{"USA", "US", ""},
	{"United States of America", "US", ""},
	{"America", "US", "'America' is read as the United States; write 019 for the Americas"},
	{"Persia", "IR", ""},
	{"Siam", "TH", ""},
	{"Ceylon", "LK", ""},
	{"Burma", "MM", ""},
	{"Formosa", "TW", ""},
	{"Bohemia", "CZ", ""},
	{"Moravia", "CZ", ""},
	{"Prussia", "DE", "Prussia is read as Germany, where most of it lay; its eastern lands are today in Poland and Russia"},
	{"Austria-Hungary", "AT", "Austria-Hungary is read as Austria; write the code of the present country where the object was made"},
	{"Ottoman Empire", "TR", "the Ottoman Empire is read as Türkiye, its heartland; write the code of the present country where the object was made"},
	{"Ottoman lands", "TR", "the Ottoman lands are read as Türkiye, their heartland; write the code of the present country where the object was made"},
	{"Anatolia", "TR", ""},
	{"Mesopotamia", "IQ", ""},
	{"Abyssinia", "ET", ""},
	{"Gold Coast", "GH", ""},
	{"Dahomey", "BJ", ""},
	{"Zaire", "CD", ""},
	{"Rhodesia", "ZW", "Rhodesia is read as Zimbabwe; Northern Rhodesia is Zambia (ZM)"},
	{"Dutch East Indies", "ID", ""},
	{"Indochina", "035", "Indochina is read as South-eastern Asia; write VN, LA or KH for one country"},
	{"Korea", "KR", "Korea is read as South Korea (KR), where the dataset keeps the arrivals in Korea; write KP for the north"},
	{"Soviet Union", "RU", "the Soviet Union is read as Russia; write the code of the present country where the object was made"},
	{"USSR", "RU", "the USSR is read as Russia; write the code of the present country where the object was made"},
	{"Russia", "RU", ""},
	{"Czechoslovakia", "CZ", "Czechoslovakia is read as Czechia; write SK for Slovakia"},
	{"Yugoslavia", "039", "Yugoslavia is read as Southern Europe; write the code of the present country where the object was made"},
	{"Levant", "145", "the Levant is read as Western Asia"},
	{"Near East", "145", "the Near East is read as Western Asia"},
	{"Middle East", "145", "the Middle East is read as Western Asia"},
	{"Far East", "030", "the Far East is read as Eastern Asia"},
	{"East Asia", "030", ""},
	{"South Asia", "034", ""},
	{"Southeast Asia", "035", ""},
	{"Latin America", "419", ""},
}

// ResolvePlace reads a place as a case writes it: a code of the table
// ("NL", "155"), a name of the table ("Netherlands", "Western Europe"), or
// one of the former and everyday names it knows ("Holland", "Persia",
// "Siam"). Case, accents, spaces and punctuation do not count in names.
// It returns the code and, when the place was not written as a code, a
// note that says how it was read; ok is false when nothing matches (then
// [Regions.Suggest] has the nearest).
func (r *Regions) ResolvePlace(place string) (code, note string, ok bool) {
	p := strings.TrimSpace(place)
	if r.Valid(p) {
		return p, "", true
	}
	key := fold(p)
	if key == "" {
		return "", "", false
	}
	for _, c := range r.ordered {
		if fold(r.places[c].name) == key {
			return c, "Place " + quoteName(place) + " is read as " + r.describe(c) + ".", true
		}
	}
	for _, n := range placeNames {
		if fold(n.name) == key {
			text := "Place " + quoteName(place) + " is read as " + r.describe(n.code)
			if n.note != "" {
				text += ": " + n.note
			}
			return n.code, text + ".", true
		}
	}
	return "", "", false
}

// SuggestPlace gives up to three codes a misspelt place name may have
// meant, by the codes' rules ([Regions.Suggest]) and then by the names of
// the table and the names ResolvePlace knows.
func (r *Regions) SuggestPlace(place string) []string {
	out := r.Suggest(place)
	if len(out) >= 3 {
		return out
	}
	names := make([]string, 0, len(r.ordered)+len(placeNames))
	byName := map[string]string{}
	for _, c := range r.ordered {
		names = append(names, r.places[c].name)
		byName[r.places[c].name] = c
	}
	for _, n := range placeNames {
		names = append(names, n.name)
		byName[n.name] = n.code
	}
	for _, n := range spell.Nearest(place, names, 3) {
		if c := byName[n]; !slices.Contains(out, c) && len(out) < 3 {
			out = append(out, c)
		}
	}
	return out
}

func (r *Regions) describe(code string) string {
	if n := r.Name(code); n != "" {
		return n + " (" + code + ")"
	}
	return code
}

func quoteName(s string) string { return "'" + s + "'" }
