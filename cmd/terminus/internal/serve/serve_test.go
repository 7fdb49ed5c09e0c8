package serve

import (
	"bytes"
	"context"
	"encoding/json"
	"io"
	"io/fs"
	"net/http"
	"net/http/httptest"
	"os"
	"path/filepath"
	"regexp"
	"slices"
	"strings"
	"testing"

	"terminus/cmd/terminus/internal/report"
	"terminus/constraint"
	"terminus/constraint/casefile"
	"terminus/constraint/date"
	"terminus/constraint/input"
	"terminus/materials"
)

const repoRoot = "../../../.."

func newTestServer(t testing.TB) (*Server, []Example) {
	t.Helper()
	ds, err := materials.Builtin()
	if err != nil {
		t.Fatal(err)
	}
	var exs []Example
	files, _ := filepath.Glob(filepath.Join(repoRoot, "examples", "*", "case.yaml"))
	for _, f := range files {
		data, err := os.ReadFile(f)
		if err != nil {
			t.Fatal(err)
		}
		exs = append(exs, Example{Name: filepath.Base(filepath.Dir(f)), File: "case.yaml", Data: data})
	}
	s, err := New(Options{Dataset: ds, Examples: exs})
	if err != nil {
		t.Fatal(err)
	}
	return s, exs
}

// do sends a request as the page would (from its own origin, to its own
// host) unless the test changes the headers.
func do(s http.Handler, method, target string, body []byte, edit func(*http.Request)) *httptest.ResponseRecorder {
	r := httptest.NewRequest(method, "http://127.0.0.1:8047"+target, bytes.NewReader(body))
	r.Host = "127.0.0.1:8047"
	if method == http.MethodPost {
		r.Header.Set("Origin", "http://127.0.0.1:8047")
		r.Header.Set("Content-Type", "application/json")
	}
	if edit != nil {
		edit(r)
	}
	w := httptest.NewRecorder()
	s.ServeHTTP(w, r)
	return w
}

// editorJSON is an example as the page holds it: the server's tree of it.
func editorJSON(t testing.TB, s *Server, name string) []byte {
	t.Helper()
	w := do(s, http.MethodGet, "/api/examples/"+name, nil, nil)
	var l struct {
		Case json.RawMessage
	}
	if err := json.Unmarshal(w.Body.Bytes(), &l); err != nil || l.Case == nil {
		t.Fatalf("example %s: %v %s", name, err, w.Body)
	}
	return l.Case
}

func TestSafeByDefault(t *testing.T) {
	s, _ := newTestServer(t)
	body := []byte(`{"title": "x"}`)
	for _, tc := range []struct {
		name   string
		method string
		target string
		edit   func(*http.Request)
		want   int
		why    string
	}{
		{"page", "GET", "/", nil, 200, "the page itself"},
		{"check", "POST", "/api/check", nil, 200, "an edit from the page"},
		{"no origin", "POST", "/api/check", func(r *http.Request) { r.Header.Del("Origin") }, 403, "a POST without an Origin is refused"},
		{"other origin", "POST", "/api/check", func(r *http.Request) { r.Header.Set("Origin", "https://example.org") }, 403, "another site cannot use the server"},
		{"rebinding", "GET", "/", func(r *http.Request) { r.Host = "attacker.example:8047" }, 421, "a DNS name pointed at the machine is refused"},
		{"localhost", "GET", "/", func(r *http.Request) { r.Host = "localhost:8047" }, 200, "localhost is the loopback"},
		{"another interface", "GET", "/", func(r *http.Request) { r.Host = "192.0.2.7:8047" }, 421, "an address beyond the loopback only when the server was told to listen there"},
		{"GET computes nothing", "GET", "/api/check", nil, 405, "no state-changing or computing GET"},
		{"too big", "POST", "/api/check", func(r *http.Request) {
			r.Body = io.NopCloser(bytes.NewReader(append([]byte(`{"title": "`), bytes.Repeat([]byte("x"), DefaultMaxBytes+10)...)))
		}, 413, "the request size is limited"},
	} {
		t.Run(tc.name, func(t *testing.T) {
			w := do(s, tc.method, tc.target, body, tc.edit)
			if w.Code != tc.want {
				t.Errorf("%s %s: status %d, want %d (%s): %s", tc.method, tc.target, w.Code, tc.want, tc.why, w.Body)
			}
			if csp := w.Header().Get("Content-Security-Policy"); !strings.Contains(csp, "default-src 'self'") {
				t.Errorf("no content security policy: %q", csp)
			}
		})
	}
}

func TestAnyIPStillRefusesNames(t *testing.T) {
	s, _ := newTestServer(t)
	s.opts.AnyIP = true
	if w := do(s, "GET", "/", nil, func(r *http.Request) { r.Host = "192.0.2.7:8047" }); w.Code != 200 {
		t.Errorf("listening beyond the loopback, an IP address is answered: %d", w.Code)
	}
	if w := do(s, "GET", "/", nil, func(r *http.Request) { r.Host = "rebind.example:8047" }); w.Code != 421 {
		t.Errorf("listening beyond the loopback, a host name is still refused: %d", w.Code)
	}
}

func TestErrorsBesideTheirField(t *testing.T) {
	s, _ := newTestServer(t)
	for _, tc := range []struct {
		body, path, msg, why string
	}{
		{`{"findings": [{"material": "chrome yellow"}, {"material": "chrome yelow"}]}`, "findings.1.material", "unknown material", "the reasoner's error, at the finding's material"},
		{`{"claims": [{"date": "18x7"}]}`, "claims.0.date", "is not a date", "the reader's error, at the claim's date"},
		{`{"findings": [{"materail": "chrome yellow"}]}`, "findings.0.materail", "materail", "a misspelt key, at the key"},
		{`{"records": [{"not_after": "1902", "event": "varnish"}]}`, "records.0.event", "varnish", "an unknown event"},
	} {
		t.Run(tc.path, func(t *testing.T) {
			w := do(s, "POST", "/api/check", []byte(tc.body), nil)
			var ans checked
			if err := json.Unmarshal(w.Body.Bytes(), &ans); err != nil {
				t.Fatal(err)
			}
			if ans.OK || ans.Error == nil {
				t.Fatalf("no error for %s", tc.body)
			}
			var parts []string
			for _, p := range ans.Error.Path {
				b, _ := json.Marshal(p)
				parts = append(parts, strings.Trim(string(b), `"`))
			}
			if got := strings.Join(parts, "."); got != tc.path || !strings.Contains(ans.Error.Message, tc.msg) {
				t.Errorf("error %q at %q, want one with %q at %q (%s)", ans.Error.Message, got, tc.msg, tc.path, tc.why)
			}
		})
	}
}

// TestSameAnswerAsTheCommandLine holds the page to the command line: every
// example sent as the page sends it (the server's own tree, in JSON)
// gives the Markdown section the command line writes for the file, and
// the YAML the page downloads reads back to the same case.
func TestSameAnswerAsTheCommandLine(t *testing.T) {
	s, exs := newTestServer(t)
	for _, ex := range exs {
		t.Run(ex.Name, func(t *testing.T) {
			js := editorJSON(t, s, ex.Name)
			w := do(s, "POST", "/api/export/md", js, nil)
			if w.Code != 200 || !strings.Contains(w.Header().Get("Content-Disposition"), "dating-section.md") {
				t.Fatalf("export md: %d %s", w.Code, w.Body)
			}
			want := markdownOf(t, caseName, ex.Data, input.YAML)
			if w.Body.String() != want {
				t.Errorf("the page's Markdown differs from the command line's for the same case")
			}
			y := do(s, "POST", "/api/export/yaml", js, nil)
			if got := markdownOf(t, caseName, y.Body.Bytes(), input.YAML); got != want {
				t.Errorf("the downloaded YAML does not read back to the same case:\n%s", y.Body)
			}
		})
	}
}

func markdownOf(t *testing.T, name string, data []byte, f input.Format) string {
	t.Helper()
	c, err := casefile.Parse(name, data, f, input.Limits{})
	if err != nil {
		t.Fatal(err)
	}
	ds, _ := materials.Builtin()
	r, err := constraint.Analyze(context.Background(), c, ds, constraint.Options{})
	if err != nil {
		t.Fatal(err)
	}
	var b bytes.Buffer
	if err := report.Markdown(&b, r); err != nil {
		t.Fatal(err)
	}
	return b.String()
}

func TestUploadEveryFormat(t *testing.T) {
	s, _ := newTestServer(t)
	for name, text := range map[string]string{
		"a.yaml": "title: t\nfindings:\n  - material: chrome yellow\n",
		"a.toml": "title = \"t\"\n[[findings]]\nmaterial = \"chrome yellow\"\n",
		"a.json": `{"title": "t", "findings": [{"material": "chrome yellow"}]}`,
	} {
		w := do(s, "POST", "/api/upload?name="+name, []byte(text), nil)
		var l loaded
		if err := json.Unmarshal(w.Body.Bytes(), &l); err != nil || l.Error != nil {
			t.Fatalf("%s: %v %s", name, err, w.Body)
		}
		if want := `{"title":"t","findings":[{"material":"chrome yellow"}]}`; string(l.Case) != want {
			t.Errorf("%s read as %s, want %s", name, l.Case, want)
		}
	}
	w := do(s, "POST", "/api/upload?name=b.yaml", []byte("title: [unclosed\n"), nil)
	if !strings.Contains(w.Body.String(), `"error"`) {
		t.Errorf("a broken file gives no error: %s", w.Body)
	}
}

func TestSearchAndBrowse(t *testing.T) {
	s, _ := newTestServer(t)
	var hits []hit
	json.Unmarshal(do(s, "GET", "/api/search?q=carminic", nil, nil).Body.Bytes(), &hits)
	if len(hits) == 0 || hits[0].Kind != "marker" || len(hits[0].Members) < 2 {
		t.Errorf("carminic acid should come first, as a marker of several materials: %+v", hits)
	}
	json.Unmarshal(do(s, "GET", "/api/search?q=Schweinfurter", nil, nil).Body.Bytes(), &hits)
	if len(hits) == 0 || hits[0].ID != "emerald-green" {
		t.Errorf("a trade name in German finds emerald green: %+v", hits)
	}
	for _, tc := range []struct {
		query, in, out, why string
	}{
		{"class=pigment&q=blue", "prussian-blue", "madder", "class and text"},
		{"q=blue&from=1700&to=1720", "prussian-blue", "phthalocyanine-blue", "in use in a period: made by its end"},
		{"origin=natural", "madder", "prussian-blue", "origin"},
	} {
		var list []materialView
		json.Unmarshal(do(s, "GET", "/api/materials?"+tc.query, nil, nil).Body.Bytes(), &list)
		var ids []string
		for _, m := range list {
			ids = append(ids, m.ID)
		}
		joined := " " + strings.Join(ids, " ") + " "
		if !strings.Contains(joined, " "+tc.in+" ") || strings.Contains(joined, " "+tc.out+" ") {
			t.Errorf("%s (%s): want %s and not %s in %v", tc.query, tc.why, tc.in, tc.out, ids)
		}
	}
	var m materialView
	json.Unmarshal(do(s, "GET", "/api/materials/prussian-blue", nil, nil).Body.Bytes(), &m)
	if len(m.Milestones) == 0 || m.Milestones[0].Cite == "" {
		t.Errorf("a material's milestones come with their sources: %+v", m)
	}
}

// TestAssetsAreSmall keeps the page light: every embedded asset together
// under 500 kB.
func TestAssetsAreSmall(t *testing.T) {
	total := 0
	fs.WalkDir(staticFiles, ".", func(p string, d fs.DirEntry, err error) error {
		if err == nil && !d.IsDir() {
			data, _ := staticFiles.ReadFile(p)
			total += len(data)
		}
		return nil
	})
	total += len(report.HTMLStyle())
	if total == 0 || total > 500_000 {
		t.Errorf("embedded assets: %d bytes, want some and under 500 kB", total)
	}
	t.Logf("embedded assets: %d bytes", total)
}

// BenchmarkCheckHandler measures the answer to an edit of each example:
// reading the case, the analysis and the report's HTML.
func BenchmarkCheckHandler(b *testing.B) {
	s, exs := newTestServer(b)
	for _, ex := range exs {
		js := editorJSON(b, s, ex.Name)
		b.Run(ex.Name, func(b *testing.B) {
			b.ReportAllocs()
			for b.Loop() {
				if w := do(s, "POST", "/api/check", js, nil); w.Code != 200 || !bytes.Contains(w.Body.Bytes(), []byte(`"ok":true`)) {
					b.Fatalf("check: %d %s", w.Code, w.Body)
				}
			}
		})
	}
}

// The page's lists of calendars and year starts are those the case reader
// takes: every calendar of date.CalendarNames, each year start read by
// date.ParseYearStart (the page keeps its own copy, in app.js).
func TestPageCalendarsMatchTheReader(t *testing.T) {
	js, err := staticFiles.ReadFile("static/app.js")
	if err != nil {
		t.Fatal(err)
	}
	line := func(prefix string) string {
		for l := range strings.Lines(string(js)) {
			if strings.HasPrefix(l, prefix) {
				return l
			}
		}
		t.Fatalf("app.js has no line starting %q", prefix)
		return ""
	}
	quoted := regexp.MustCompile(`'([^']*)'`)
	var cals []string
	for _, m := range quoted.FindAllStringSubmatch(line("const CALENDARS = "), -1) {
		cals = append(cals, m[1])
	}
	if want := date.CalendarNames(); !slices.Equal(cals, want) {
		t.Errorf("the page's calendars %q, the reader's %q", cals, want)
	}
	starts := quoted.FindAllStringSubmatch(line("const YEAR_START_OPTIONS = "), -1)
	var values []string
	for i := 2; i < len(starts); i += 2 { // value, label pairs after the empty one
		values = append(values, starts[i][1])
		if _, err := date.ParseYearStart(starts[i][1]); err != nil {
			t.Errorf("the page's year start %q: %v", starts[i][1], err)
		}
	}
	if len(values) != 4 {
		t.Errorf("the page offers the year starts %q, want the four the reader knows", values)
	}
}
