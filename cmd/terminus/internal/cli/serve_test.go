package cli

import (
	"bytes"
	"context"
	"encoding/json"
	"io"
	"net/http"
	"net/http/httptest"
	"os"
	"path/filepath"
	"regexp"
	"strings"
	"sync"
	"testing"
	"time"

	"terminus/cmd/terminus/internal/golden"
	"terminus/cmd/terminus/internal/nodetest"
	"terminus/cmd/terminus/internal/serve"
)

// syncBuffer is a buffer the command writes to while the test reads it.
type syncBuffer struct {
	mu sync.Mutex
	b  bytes.Buffer
}

func (s *syncBuffer) Write(p []byte) (int, error) {
	s.mu.Lock()
	defer s.mu.Unlock()
	return s.b.Write(p)
}

func (s *syncBuffer) String() string {
	s.mu.Lock()
	defer s.mu.Unlock()
	return s.b.String()
}

func TestServeUsage(t *testing.T) {
	for _, tc := range []struct {
		args []string
		want string
		why  string
	}{
		{[]string{"serve", "--port", "70000"}, "--port 70000", "a port out of range"},
		{[]string{"serve", "--listen", "my laptop"}, "--listen", "an address that is not one"},
		{[]string{"serve", "extra"}, "terminus serve takes no arguments", "serve takes no arguments"},
	} {
		_, errs, code := execute(t, tc.args...)
		if code != 2 || !strings.Contains(errs, tc.want) {
			t.Errorf("%v: exit %d, stderr %q; want 2 and %q (%s)", tc.args, code, errs, tc.want, tc.why)
		}
	}
}

// TestServeCommand starts the command as a user would, reads the address
// it prints, fetches the page and stops it as Ctrl-C would.
func TestServeCommand(t *testing.T) {
	ctx, cancel := context.WithCancel(context.Background())
	var out, errw syncBuffer
	done := make(chan int, 1)
	go func() { done <- Main(ctx, []string{"serve", "--port", "0"}, strings.NewReader(""), &out, &errw) }()
	addr := regexp.MustCompile(`the page is at (http://127\.0\.0\.1:[0-9]+/)`)
	var url string
	for deadline := time.Now().Add(20 * time.Second); time.Now().Before(deadline); time.Sleep(20 * time.Millisecond) {
		if m := addr.FindStringSubmatch(out.String()); m != nil {
			url = m[1]
			break
		}
	}
	if url == "" {
		cancel()
		t.Fatalf("no address printed: %q %q", out.String(), errw.String())
	}
	resp, err := http.Get(url)
	if err != nil {
		t.Fatal(err)
	}
	page, _ := io.ReadAll(resp.Body)
	resp.Body.Close()
	if resp.StatusCode != 200 || !bytes.Contains(page, []byte("terminus")) {
		t.Errorf("GET %s: %d %s", url, resp.StatusCode, page)
	}
	cancel()
	select {
	case code := <-done:
		if code != 0 {
			t.Errorf("stopped with exit %d: %s", code, errw.String())
		}
	case <-time.After(10 * time.Second):
		t.Fatal("the server did not stop")
	}
}

// TestServePageInBrowser uses the page in chromium as a person would (see
// testdata/node/page.mjs) and compares the Markdown it downloads with what
// 'terminus check --format md' writes for the case file it downloads.
// The screenshots are kept with go test -artifacts.
func TestServePageInBrowser(t *testing.T) {
	if testing.Short() {
		t.Skip("a browser test")
	}
	nodetest.Need(t, true)
	opts, err := serveOptions(nil, serve.DefaultMaxBytes)
	if err != nil {
		t.Fatal(err)
	}
	s, err := serve.New(opts)
	if err != nil {
		t.Fatal(err)
	}
	ts := httptest.NewServer(s)
	defer ts.Close()
	dir := t.ArtifactDir()
	var got struct {
		Shots         []string
		Tabbed        []string
		Before, After string
		FocusAfterAdd string
		Suggestions   []string
		Chips         []string
		Error         struct {
			Text, Field string
			DescribedBy bool
		}
		Overflow       map[string]float64
		Materials      string
		MaterialDetail string
		Failed         []string
		Outside        []string
	}
	if err := json.Unmarshal(nodetest.Run(t, nil, "page.mjs", ts.URL+"/", dir), &got); err != nil {
		t.Fatal(err)
	}
	for _, want := range []string{"example-select", "upload", "md"} {
		if !strings.Contains(strings.Join(got.Tabbed, " "), want) {
			t.Errorf("the keyboard does not reach %q: %v", want, got.Tabbed)
		}
	}
	if !strings.Contains(got.Before, "c-inscription (1847): consistent") {
		t.Errorf("the example's verdict: %q", got.Before)
	}
	if got.FocusAfterAdd != "findings.6.material" {
		t.Errorf("after 'Add a finding' the focus is on %q, want the new finding's material", got.FocusAfterAdd)
	}
	if len(got.Suggestions) == 0 || !strings.HasPrefix(got.Suggestions[0], "phthalo") {
		t.Errorf("typing 'phthalo' suggests %v", got.Suggestions)
	}
	if !strings.Contains(got.After, "c-inscription (1847): excluded") {
		t.Errorf("adding phthalocyanine blue to the original layers should exclude 1847: %q", got.After)
	}
	if got.Error.Field != "claims.0.date" || !got.Error.DescribedBy || !strings.Contains(got.Error.Text, "is not a date") {
		t.Errorf("a bad date's error: %+v", got.Error)
	}
	for w, o := range got.Overflow {
		if o > 0 {
			t.Errorf("at %s px the page scrolls sideways by %v px", w, o)
		}
	}
	if !strings.HasSuffix(got.Materials, "materials.") || got.MaterialDetail == "" {
		t.Errorf("the materials browser: %q, %q", got.Materials, got.MaterialDetail)
	}
	if len(got.Failed) > 0 || len(got.Outside) > 0 {
		t.Errorf("requests failed %v or left the server %v", got.Failed, got.Outside)
	}
	caseFile, err := os.ReadFile(filepath.Join(dir, "case.yaml"))
	if err != nil {
		t.Fatal(err)
	}
	for _, want := range []string{"calendar: julian", "year_start: 25 March", "note: the ledger counts its years from Lady Day"} {
		if !strings.Contains(string(caseFile), want) {
			t.Errorf("the downloaded case lacks %q (set in the record's fields):\n%s", want, caseFile)
		}
	}
	md, err := os.ReadFile(filepath.Join(dir, "dating-section.md"))
	if err != nil {
		t.Fatal(err)
	}
	wd, _ := os.Getwd()
	t.Chdir(dir)
	want, errs, code := execute(t, "check", "--format", "md", "case.yaml")
	t.Chdir(wd)
	if code == 2 {
		t.Fatalf("check on the downloaded case: %s", errs)
	}
	if string(md) != want {
		t.Errorf("the page's Markdown differs from 'terminus check --format md' on the downloaded case:\n%s", golden.Diff(want, string(md)))
	}
	t.Logf("screenshots: %v", got.Shots)
}
