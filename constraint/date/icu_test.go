package date

import (
	"bufio"
	"math/rand/v2"
	"os"
	"os/exec"
	"path/filepath"
	"strconv"
	"strings"
	"testing"
)

// The calendars of ICU, as Node.js formats dates with Intl.DateTimeFormat
// ("-u-ca-islamic-civil", "persian", "hebrew", "japanese", "chinese",
// "dangi", "buddhist", "roc"), are an independent oracle: thousands of
// random days are converted both ways, day → calendar fields (this
// package's conversion must give ICU's fields) and fields → day (this
// package's parse of ICU's fields, written as records write them, must
// hold the day). The test skips, and says so, when node is not on the PATH;
// CI installs it (apt-get install nodejs).
//
// Where they differ by design:
//   - ICU's Chinese calendar uses UTC+8 and modern astronomy for every year;
//     the Qing calendar used Beijing local time and its own theory. A
//     month whose first day differs is allowed only where this package
//     widens the month (its new moon or a solar term near midnight).
//   - ICU's Japanese calendar counts era years from 1 January and puts the
//     start of a pre-1873 era on the lunisolar month and day of its
//     proclamation read as a Gregorian date; before 1873 only days from
//     March to December are compared, by year, and this package's reading
//     of an era's first and last years as whole lunisolar years holds ICU's.
//   - ICU's Korean (dangi) calendar may use another meridian before 1912;
//     differences are counted and must fall inside the widened months.
//   - Before BE 2484 (1941) the Thai year began in April: ICU counts from
//     January; this package's wider reading must hold ICU's.

const icuScript = `
const rl = require('readline').createInterface({input: process.stdin});
const fmts = {};
function fmt(ca) {
  if (!fmts[ca]) {
    const o = {timeZone: 'UTC', year: 'numeric', month: 'numeric', day: 'numeric'};
    if (ca === 'japanese' || ca === 'roc' || ca === 'buddhist' || ca === 'islamic-civil' || ca === 'persian') o.era = 'short';
    if (ca === 'hebrew') o.month = 'long';
    fmts[ca] = new Intl.DateTimeFormat('en-u-ca-' + ca, o);
  }
  return fmts[ca];
}
rl.on('line', line => {
  const [ca, iso] = line.split(' ');
  const [y, m, d] = iso.split('-').map(Number);
  const t = new Date(Date.UTC(2000, m - 1, d));
  t.setUTCFullYear(y);
  const parts = {};
  for (const p of fmt(ca).formatToParts(t)) parts[p.type] = p.value;
  console.log([ca, iso, parts.era || '', parts.relatedYear || parts.year || '', parts.month || '', parts.day || ''].join('\t'));
});
`

type icuRow struct {
	cal, iso, era, year, month, day string
}

func runICU(t *testing.T, queries []string) []icuRow {
	t.Helper()
	if testing.Short() {
		t.Skip("-short: the ICU calendar oracle runs in the full test pass")
	}
	node, err := exec.LookPath("node")
	if err != nil {
		t.Skip("node is not on the PATH: the ICU calendar oracle was not run (install nodejs to run it)")
	}
	script := filepath.Join(t.TempDir(), "icu.js")
	if err := os.WriteFile(script, []byte(icuScript), 0o600); err != nil {
		t.Fatal(err)
	}
	cmd := exec.Command(node, script)
	cmd.Stdin = strings.NewReader(strings.Join(queries, "\n") + "\n")
	out, err := cmd.Output()
	if err != nil {
		t.Fatalf("node: %v", err)
	}
	var rows []icuRow
	sc := bufio.NewScanner(strings.NewReader(string(out)))
	for sc.Scan() {
		f := strings.Split(sc.Text(), "\t")
		if len(f) != 6 {
			t.Fatalf("node printed %q", sc.Text())
		}
		rows = append(rows, icuRow{f[0], f[1], f[2], f[3], f[4], f[5]})
	}
	if len(rows) != len(queries) {
		t.Fatalf("node answered %d of %d queries", len(rows), len(queries))
	}
	return rows
}

func atoiT(t *testing.T, s string) int {
	t.Helper()
	v, err := strconv.Atoi(strings.ReplaceAll(s, ",", ""))
	if err != nil {
		t.Fatalf("not a number: %q", s)
	}
	return v
}

// holds parses text and reports whether day d lies in it.
func holds(t *testing.T, text string, o Options, d Day) bool {
	t.Helper()
	got, err := ParseWith(text, o)
	if err != nil {
		t.Errorf("ParseWith(%q): %v", text, err)
		return false
	}
	for _, a := range got.Alternatives {
		if (a.OpenStart || a.First <= d) && (a.OpenEnd || d <= a.Last) {
			return true
		}
	}
	return false
}

func randomDays(r *rand.Rand, n int, from, to int64) []Day {
	a, b := Gregorian(from, 1, 1), Gregorian(to, 12, 31)
	out := make([]Day, n)
	for i := range out {
		out[i] = a + Day(r.Int64N(int64(b-a+1)))
	}
	return out
}

// icuRange names a calendar to ask ICU about and the Gregorian years the
// days asked about are drawn from.
type icuRange struct {
	cal      string
	from, to int64
}

// askICU draws n random days from each range in turn and asks ICU about
// them: row i of the answer is about days[i].
func askICU(t *testing.T, r *rand.Rand, n int, ranges ...icuRange) (days []Day, rows []icuRow) {
	t.Helper()
	var lines []string
	for _, c := range ranges {
		for _, d := range randomDays(r, n, c.from, c.to) {
			days = append(days, d)
			lines = append(lines, c.cal+" "+d.ISO())
		}
	}
	return days, runICU(t, lines)
}

func TestArithmeticCalendarsAgainstICU(t *testing.T) {
	r := rand.New(rand.NewPCG(1300, 5600))
	days, rows := askICU(t, r, 1500, icuRange{"islamic-civil", 1600, 2100}, icuRange{"persian", 1800, 2100},
		icuRange{"hebrew", 1600, 2100}, icuRange{"buddhist", 1900, 2100}, icuRange{"roc", 1912, 2100})
	for i, row := range rows {
		d := days[i]
		switch row.cal {
		case "islamic-civil":
			y, m, dd := islamicFromDay(d)
			if int(y) != atoiT(t, row.year) || m != atoiT(t, row.month) || dd != atoiT(t, row.day) {
				t.Errorf("%s: islamic %d-%d-%d, ICU %s-%s-%s", row.iso, y, m, dd, row.year, row.month, row.day)
			}
			text := row.day + " " + islamicMonths[atoiT(t, row.month)-1] + " " + row.year + " AH"
			if !holds(t, text, Options{}, d) || islamicDay(int64(atoiT(t, row.year)), atoiT(t, row.month), atoiT(t, row.day)) != d {
				t.Errorf("%s: %q does not read as that day", row.iso, text)
			}
		case "persian":
			y, m, dd := persianFromDay(d)
			if int(y) != atoiT(t, row.year) || m != atoiT(t, row.month) || dd != atoiT(t, row.day) {
				t.Errorf("%s: persian %d-%d-%d, ICU %s-%s-%s", row.iso, y, m, dd, row.year, row.month, row.day)
			}
			text := row.day + " " + persianMonths[atoiT(t, row.month)-1] + " " + row.year + " SH"
			if got, err := Parse(text); err != nil || got.Alternatives[0].First != d || got.Alternatives[0].Last != d {
				t.Errorf("%s: %q reads as %v, %v", row.iso, text, iso(got), err)
			}
		case "hebrew":
			y, m, dd := hebrewFromDay(d)
			if int(y) != atoiT(t, row.year) || hebrewMonthTitle(y, m) != row.month && !(row.month == "Tamuz" && hebrewMonthTitle(y, m) == "Tammuz") || dd != atoiT(t, row.day) {
				t.Errorf("%s: hebrew %d %s %d, ICU %s %s %s", row.iso, y, hebrewMonthTitle(y, m), dd, row.year, row.month, row.day)
			}
			text := row.day + " " + row.month + " " + row.year
			if got, err := Parse(text); err != nil || got.Alternatives[0].First != d || got.Alternatives[len(got.Alternatives)-1].Last != d {
				t.Errorf("%s: %q reads as %v, %v", row.iso, text, iso(got), err)
			}
		case "buddhist":
			text := "BE " + row.year
			if !holds(t, text, Options{}, d) {
				t.Errorf("%s: %q does not hold the day", row.iso, text)
			}
			if y, _, _ := d.Civil(); y >= 1941 && atoiT(t, row.year) != int(y)+543 {
				t.Errorf("%s: ICU BE %s, want %d", row.iso, row.year, y+543)
			}
		case "roc":
			text := "ROC " + row.year + "" // the year; months are Gregorian
			if !holds(t, text, Options{}, d) {
				t.Errorf("%s: %q does not hold the day", row.iso, text)
			}
		}
	}
	t.Logf("compared %d days with ICU (Node.js Intl) both ways", len(rows))
}

// icuLunar splits ICU's month ("7", "7bis") into its number and leap.
func icuLunar(t *testing.T, s string) (int, bool) {
	if n, ok := strings.CutSuffix(s, "bis"); ok {
		return atoiT(t, n), true
	}
	return atoiT(t, s), false
}

func TestLunisolarAgainstICU(t *testing.T) {
	r := rand.New(rand.NewPCG(1645, 1912))
	days, rows := askICU(t, r, 1500, icuRange{"chinese", 1645, 2100}, icuRange{"dangi", 1653, 2100})
	calcs := map[string]*lsCalc{"chinese": newLSCalc(CalendarChinese), "dangi": newLSCalc(CalendarKorean)}
	differ := map[string]int{}
	for i, row := range rows {
		d := days[i]
		c := calcs[row.cal]
		num, leap := icuLunar(t, row.month)
		y := int64(atoiT(t, row.year))
		dd := atoiT(t, row.day)
		m, day := c.at(d)
		if m.year != y || m.num != num || m.leap != leap || day != dd {
			differ[row.cal]++
		}
		// fields → day: the widened reading of ICU's month and day holds d
		var p parser
		a, b, _, err := p.lsRead(c, y, num, leap, dd, row.iso, 0)
		if err != nil || d < a || d > b {
			cy := int64(0)
			if ci, ok := c.year(y, c.shifts(y)[0]), true; ok && len(ci) > 0 {
				cy = ci[0].year
			}
			t.Errorf("%s %s: ICU %s-%s-%s is read as %s..%s (%v); nominal here %d-%d%v-%d (%d)", row.cal, row.iso, row.year, row.month, row.day,
				a.ISO(), b.ISO(), err, m.year, m.num, map[bool]string{true: "bis"}[m.leap], day, cy)
		}
	}
	for cal, n := range differ {
		t.Logf("%s: %d of the compared days have another nominal month or day here than in ICU; each lies in the widened reading of ICU's", cal, n)
	}
	t.Logf("compared %d days with ICU's Chinese and Korean calendars", len(rows))
}

func TestJapaneseAgainstICU(t *testing.T) {
	r := rand.New(rand.NewPCG(1603, 1868))
	days, rows := askICU(t, r, 3000, icuRange{"japanese", 1600, 2100})
	compared := 0
	for i, row := range rows {
		d := days[i]
		era, _, _ := strings.Cut(row.era, " (")
		y, m, _ := d.Civil()
		switch {
		case y >= 1873:
			text := era + " " + row.year + "." + row.month + "." + row.day
			if got, err := Parse(text); err != nil || got.Alternatives[0].First != d || got.Alternatives[0].Last != d {
				t.Errorf("%s: %q reads as %v, %v", row.iso, text, iso(got), err)
			}
			compared++
		case m >= 3:
			text := era + " " + row.year
			if !holds(t, text, Options{}, d) {
				t.Errorf("%s: ICU says %q, which does not hold the day here", row.iso, text)
			}
			compared++
		}
	}
	t.Logf("compared %d Japanese era dates with ICU", compared)
}
