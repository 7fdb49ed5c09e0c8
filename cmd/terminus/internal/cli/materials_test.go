package cli

import (
	"encoding/csv"
	"encoding/json"
	"path/filepath"
	"strconv"
	"strings"
	"testing"

	"terminus/constraint/date"
	"terminus/materials"
)

func builtinForCLI(t *testing.T) *materials.Dataset {
	t.Helper()
	d, err := materials.Builtin()
	if err != nil {
		t.Fatalf("the built-in dataset does not load: %v", err)
	}
	return d
}

func TestMaterialsListText(t *testing.T) {
	d := builtinForCLI(t)
	out, errw, code := execute(t, "materials", "list")
	if code != 0 || errw != "" {
		t.Fatalf("exit %d, stderr %q", code, errw)
	}
	lines := strings.Split(strings.TrimSpace(out), "\n")
	if !strings.HasPrefix(lines[0], "ID ") || !strings.Contains(lines[0], "MADE") {
		t.Errorf("header: got %q", lines[0])
	}
	if got, want := len(lines), len(d.Materials)+2; got != want {
		t.Errorf("lines: got %d, want %d (header, one per material, count)", got, want)
	}
	n := strconv.Itoa(len(d.Materials))
	if want := n + " of " + n + " materials"; lines[len(lines)-1] != want {
		t.Errorf("last line: got %q, want %q", lines[len(lines)-1], want)
	}
}

func TestMaterialsListJSON(t *testing.T) {
	out, errw, code := execute(t, "materials", "list", "--class", "pigment", "--made-before", "1800", "--format", "json")
	if code != 0 {
		t.Fatalf("exit %d, stderr %q", code, errw)
	}
	var got []map[string]any
	if err := json.Unmarshal([]byte(out), &got); err != nil {
		t.Fatalf("not JSON: %v\n%s", err, out)
	}
	if len(got) == 0 {
		t.Fatal("no pigment made before 1800")
	}
	limit := date.Gregorian(1800, 1, 1)
	sawNullPlace := false
	for _, m := range got {
		for _, k := range []string{"id", "names", "class", "origin", "colour_index", "cas", "formula", "note", "milestones"} {
			if _, ok := m[k]; !ok {
				t.Errorf("%v: no field %q", m["id"], k)
			}
		}
		if m["class"] != "pigment" {
			t.Errorf("%v: class %v", m["id"], m["class"])
		}
		earliest := date.Day(1 << 40)
		for _, raw := range m["milestones"].([]any) {
			ms := raw.(map[string]any)
			for _, k := range []string{"kind", "date", "place", "source", "basis"} {
				if _, ok := ms[k]; !ok {
					t.Errorf("%v: milestone without %q: %v", m["id"], k, ms)
				}
			}
			if ms["place"] == nil {
				sawNullPlace = true
			}
			if ms["kind"] == "made" {
				dd, err := date.Parse(ms["date"].(string))
				if err != nil {
					t.Errorf("%v: date %v: %v", m["id"], ms["date"], err)
					continue
				}
				if first, ok := dd.Earliest(); ok && first < earliest {
					earliest = first
				}
			}
		}
		if earliest >= limit {
			t.Errorf("%v is listed as made before 1800, but its earliest made claim is not", m["id"])
		}
	}
	if !sawNullPlace {
		t.Errorf("no milestone has \"place\": null")
	}
}

func TestMaterialsListCSVAndPlace(t *testing.T) {
	out, errw, code := execute(t, "materials", "list", "--place", "JP", "--format", "csv")
	if code != 0 {
		t.Fatalf("exit %d, stderr %q", code, errw)
	}
	rows, err := csv.NewReader(strings.NewReader(out)).ReadAll()
	if err != nil {
		t.Fatalf("not CSV: %v", err)
	}
	head := rows[0]
	if head[0] != "id" || head[len(head)-1] != "arrived_JP" {
		t.Errorf("header: got %q", head)
	}
	if len(rows) < 2 {
		t.Fatal("no material arrived in Japan")
	}
	d := builtinForCLI(t)
	for _, r := range rows[1:] {
		m, err := d.Lookup(r[0])
		if err != nil {
			t.Errorf("row %q: %v", r[0], err)
			continue
		}
		claims, area := d.Arrival(m, "JP")
		if len(claims) == 0 || !strings.HasSuffix(r[len(r)-1], "("+area+")") {
			t.Errorf("row %q: arrival %q, dataset has %v in %q", r[0], r[len(r)-1], claims, area)
		}
	}
}

func TestMaterialsUsageErrors(t *testing.T) {
	for _, tc := range []struct {
		args      []string
		msg, hint string
	}{
		{[]string{"materials", "list", "--place", "Japan"}, `unknown --place "Japan"`, "did you mean JP"},
		{[]string{"materials", "list", "--class", "pigmnet"}, `unknown --class "pigmnet"`, ""},
		{[]string{"materials", "list", "--made-before", "soon"}, "--made-before", ""},
		{[]string{"materials", "list", "--format", "xml"}, `unknown --format "xml"`, ""},
		{[]string{"materials", "show", "prusian blue"}, `no material named "prusian blue"`, "did you mean 'Prussian blue'"},
		{[]string{"materials", "show"}, "terminus materials show needs a NAME", ""},
		{[]string{"materials", "list", "--materials", "absent.yaml"}, "absent.yaml", ""},
	} {
		t.Run(strings.Join(tc.args, " "), func(t *testing.T) {
			out, errw, code := execute(t, tc.args...)
			if code != 2 {
				t.Errorf("exit: got %d, want 2", code)
			}
			if out != "" {
				t.Errorf("stdout: got %q, want nothing", out)
			}
			if !strings.HasPrefix(errw, "terminus: error: ") || !strings.Contains(errw, tc.msg) {
				t.Errorf("stderr: got %q, want an error with %q", errw, tc.msg)
			}
			if tc.hint != "" && !strings.Contains(errw, "terminus: hint: "+tc.hint) {
				t.Errorf("stderr: got %q, want a hint with %q", errw, tc.hint)
			}
		})
	}
}

func TestMaterialsShow(t *testing.T) {
	d := builtinForCLI(t)
	m, err := d.Lookup("Prussian blue")
	if err != nil {
		t.Fatal(err)
	}
	out, errw, code := execute(t, "materials", "show", "PB 27", "--place", "JP")
	if code != 0 {
		t.Fatalf("exit %d, stderr %q", code, errw)
	}
	if !strings.HasPrefix(out, m.Name()+" ("+m.ID+")\n") {
		t.Errorf("first line: got %q", strings.SplitN(out, "\n", 2)[0])
	}
	for _, ms := range m.Milestones {
		src, ok := d.Source(ms.Source)
		if !ok {
			t.Fatalf("source %q missing", ms.Source)
		}
		if !strings.Contains(out, src.Cite) {
			t.Errorf("the full cite of %q is not shown", ms.Source)
		}
		if !strings.Contains(out, ms.Date.EDTF()) {
			t.Errorf("date %s is not shown", ms.Date.EDTF())
		}
	}
	if !strings.Contains(out, "for JP the arrival of") {
		t.Errorf("no arrival line for --place JP:\n%s", out)
	}
	out, _, code = execute(t, "materials", "show", "--format", "json", "Berlin", "blue")
	var j map[string]any
	if code != 0 || json.Unmarshal([]byte(out), &j) != nil || j["id"] != m.ID {
		t.Errorf("show --format json: exit %d, %q", code, out)
	}
}

func TestMaterialsSources(t *testing.T) {
	d := builtinForCLI(t)
	out, errw, code := execute(t, "materials", "sources")
	if code != 0 {
		t.Fatalf("exit %d, stderr %q", code, errw)
	}
	for _, s := range d.Sources {
		if !strings.Contains(out, s.Key+"  (") || !strings.Contains(out, s.Cite) {
			t.Errorf("source %q is not listed with its cite", s.Key)
		}
	}
	if want := strconv.Itoa(len(d.Sources)) + " sources\n"; !strings.HasSuffix(out, want) {
		t.Errorf("last line: want %q", want)
	}
}

const cliGood = `sources:
  - key: handbook-x
    cite: "Gettens, R. J. and Stout, G. L., Painting Materials: A Short Encyclopaedia, D. Van Nostrand, New York, 1942, p. 158"
materials:
  - id: smalt-test
    names: [smalt for the test]
    class: pigment
    origin: synthetic
    milestones:
      - {kind: made, date: "1540/1560", source: handbook-x, basis: documented}
      - {kind: sold, date: "16XX", source: artists-pigments-2, basis: from-memory}
`

func TestMaterialsLint(t *testing.T) {
	good := writeFile(t, "good.yaml", cliGood)
	out, errw, code := execute(t, "materials", "lint", good)
	if code != 0 {
		t.Fatalf("lint good: exit %d, stdout %q, stderr %q", code, out, errw)
	}
	// artists-pigments-2 comes from the built-in bibliography.
	if !strings.Contains(out, "1 file, 1 material, 2 milestones: 1 documented, 1 from memory") || !strings.HasSuffix(out, "no problems\n") {
		t.Errorf("lint good: got %q", out)
	}

	bad := writeFile(t, "bad.yaml", strings.Replace(cliGood, `date: "16XX"`, `date: "15XX", note: "too early"`, 1)+
		"  - id: smalt-test-2\n    names: [smalt for the test]\n    class: pigment\n    origin: synthetic\n    milestones:\n      - {kind: made, date: \"1540\", source: nowhere, basis: documented}\n")
	out, _, code = execute(t, "materials", "lint", bad)
	if code != 2 && code != 1 {
		t.Fatalf("lint bad: exit %d", code)
	}
	if code != 1 {
		t.Errorf("lint bad: exit %d, want 1", code)
	}
	for _, want := range []string{bad + ":12:5: name \"smalt for the test\"", bad + ":17:44: ", "source \"nowhere\"", "2 problems\n"} {
		if !strings.Contains(out, want) {
			t.Errorf("lint bad: output lacks %q:\n%s", want, out)
		}
	}

	order := writeFile(t, "order.yaml", strings.Replace(cliGood, `date: "16XX"`, `date: "14XX"`, 1))
	out, _, code = execute(t, "materials", "lint", order)
	if code != 1 || !strings.Contains(out, order+":11:9: sold milestone of \"smalt-test\" (14XX) starts before its earliest made claim") {
		t.Errorf("lint order: exit %d, got %q", code, out)
	}

	// A source defined in a --materials file may be cited by the linted one.
	lib := writeFile(t, "library.yaml", `sources:
  - key: my-own-notes
    cite: "Gettens, R. J. and Stout, G. L., Painting Materials: A Short Encyclopaedia, D. Van Nostrand, New York, 1942, p. 165"
materials:
  - id: library-only
    class: pigment
    origin: mineral
    milestones:
      - {kind: made, date: "1271", source: my-own-notes, basis: documented}
`)
	cites := writeFile(t, "cites.yaml", strings.Replace(cliGood, "source: artists-pigments-2", "source: my-own-notes", 1))
	if out, _, code = execute(t, "materials", "lint", cites); code != 1 || !strings.Contains(out, `"my-own-notes"`) {
		t.Errorf("lint without the library: exit %d, %q", code, out)
	}
	if out, _, code = execute(t, "materials", "lint", "--materials", lib, cites); code != 0 {
		t.Errorf("lint with the library: exit %d, %q", code, out)
	}

	_, errw, code = execute(t, "materials", "lint", filepath.Join(t.TempDir(), "absent.yaml"))
	if code != 2 || !strings.Contains(errw, "terminus: error: ") {
		t.Errorf("lint absent: exit %d, stderr %q", code, errw)
	}
}

func TestMaterialsStats(t *testing.T) {
	d := builtinForCLI(t)
	st := d.Stats()
	checkPrints(t, []string{
		"materials  ", strconv.Itoa(st.Materials),
		"documented with page or section", "disagreeing claims", d.SHA256,
	}, "materials", "stats")
	out, _, code := execute(t, "materials", "stats", "--format", "json")
	var j map[string]any
	if code != 0 || json.Unmarshal([]byte(out), &j) != nil {
		t.Fatalf("stats json: exit %d, %q", code, out)
	}
	if j["materials"] != float64(st.Materials) || j["documented"].(float64)+j["from_memory"].(float64) != j["milestones"] {
		t.Errorf("stats json does not add up: %v", j)
	}
}

func TestMaterialsOverlay(t *testing.T) {
	user := writeFile(t, "mine.yaml", `materials:
  - id: prussian-blue
    names: [Prussian blue, my own Prussian blue]
    class: pigment
    origin: synthetic
    milestones:
      - {kind: made, date: "1706", source: artists-pigments-1, basis: from-memory}
`)
	out, errw, code := execute(t, "materials", "show", "--materials", user, "my own prussian blue")
	if code != 0 {
		t.Fatalf("exit %d, stderr %q", code, errw)
	}
	if !strings.Contains(errw, "terminus: note: material \"prussian-blue\" from "+user+" replaces the built-in entry") {
		t.Errorf("stderr: got %q, want a note on the replaced id", errw)
	}
	if !strings.Contains(out, "milestones (1)") {
		t.Errorf("the user's entry is not the one shown:\n%s", out)
	}
	out, _, code = execute(t, "materials", "stats", "--format", "json", "--materials", user)
	var j map[string]any
	if code != 0 || json.Unmarshal([]byte(out), &j) != nil {
		t.Fatalf("stats with overlay: exit %d", code)
	}
	ds := j["dataset"].(map[string]any)
	if ds["sha256"] == builtinForCLI(t).SHA256 || !strings.HasSuffix(ds["version"].(string), "+local") {
		t.Errorf("overlay did not change the dataset's digest and version: %v", ds)
	}
}

func TestMaterialsShowText(t *testing.T) {
	user := writeFile(t, "mine.yaml", cliGood)
	out, errw, code := execute(t, "materials", "show", "--materials", user, "smalt for the test")
	if code != 0 {
		t.Fatalf("exit %d, stderr %q", code, errw)
	}
	people := func(s string) string {
		d, err := date.Parse(s)
		if err != nil {
			t.Fatal(err)
		}
		if d.String() == d.EDTF() {
			return d.EDTF()
		}
		return d.EDTF() + " (" + d.String() + ")"
	}
	ap2, ok := builtinForCLI(t).Source("artists-pigments-2")
	if !ok {
		t.Fatal("the built-in bibliography has no artists-pigments-2")
	}
	want := "smalt for the test (smalt-test)\n" +
		"  class          pigment, synthetic\n" +
		"  defined at     " + user + ":5\n" +
		"\n" +
		"milestones (2)\n" +
		"  made       " + people("1540/1560") + "  [documented]\n" +
		"             source handbook-x: Gettens, R. J. and Stout, G. L., Painting Materials: A Short Encyclopaedia, D. Van Nostrand, New York, 1942, p. 158\n" +
		"  sold       " + people("16XX") + "  [from-memory]\n" +
		"             source artists-pigments-2: " + ap2.Cite + "\n"
	if out != want {
		t.Errorf("show:\n got:\n%s\nwant:\n%s", out, want)
	}
}

// A user's materials file whose milestones are out of order (a sale before
// the first making) is bad input for check, as it is for lint.
func TestCheckRefusesMilestonesOutOfOrder(t *testing.T) {
	mats := writeFile(t, "order.yaml", `sources:
  - {key: lab, cite: "Our register, entry 3", type: museum}
materials:
  - id: house-blue
    class: pigment
    origin: synthetic
    milestones:
      - {kind: made, date: "1850", source: lab, basis: documented}
      - {kind: sold, date: "1840", source: lab, basis: documented}
`)
	c := writeFile(t, "case.yaml", "findings:\n  - material: house-blue\n")
	out, errw, code := execute(t, "check", "--materials", mats, c)
	if code != 2 || out != "" || !strings.Contains(errw, mats+":9:9: sold milestone of \"house-blue\" (1840) starts before its earliest made claim") {
		t.Errorf("exit %d, stdout %q, stderr %q", code, out, errw)
	}
}

// A marker or family says how many materials it stands for in words that
// fit the count: "any of these 4 materials", or "this one material".
func TestMaterialsShowGroupCount(t *testing.T) {
	checkPrints(t, []string{"luteolin is a marker: a finding that names it is read as any of these 4 materials, bounded by the earliest"}, "materials", "show", "luteolin")
	out := checkPrints(t, []string{"laccaic acid is a marker: a finding that names it is read as this one material"}, "materials", "show", "laccaic acid")
	if strings.Contains(out, "1 materials") {
		t.Errorf("show laccaic acid:\n%s", out)
	}
}
