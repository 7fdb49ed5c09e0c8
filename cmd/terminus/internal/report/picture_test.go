package report

import (
	"bytes"
	"encoding/json"
	"flag"
	"math"
	"math/rand/v2"
	"os"
	"path/filepath"
	"regexp"
	"strings"
	"testing"

	"terminus/cmd/terminus/internal/golden"
	"terminus/cmd/terminus/internal/nodetest"
	"terminus/constraint"
	"terminus/constraint/input"
	"terminus/materials"
)

var update = flag.Bool("update", false, "rewrite the golden files of the picture and the HTML report")

const repoRoot = "../../../.."

// pictureCases are the invented cases of testdata/picture: windows open
// at either end, conflicting tiers (firm, and hard), claims outside every
// window, spans before the common era and across its start, many events.
func pictureCases(t *testing.T) []string {
	t.Helper()
	files, _ := filepath.Glob(filepath.Join(repoRoot, "testdata", "picture", "*.yaml"))
	if len(files) < 6 {
		t.Fatalf("found %d picture cases, want the six of testdata/picture", len(files))
	}
	return files
}

// builtinResult analyzes a case file against the built-in dataset; the
// file is named by its path from the repository's root.
func builtinResult(t testing.TB, path string) *constraint.Result {
	t.Helper()
	data, err := os.ReadFile(path)
	if err != nil {
		t.Fatal(err)
	}
	ds, err := materials.Builtin()
	if err != nil {
		t.Fatal(err)
	}
	rel, _ := filepath.Rel(repoRoot, path)
	return analyze(t, filepath.ToSlash(rel), data, input.FormatOf(path), ds)
}

func checkPictureGolden(t *testing.T, name, got string) {
	t.Helper()
	golden.Check(t, filepath.Join(repoRoot, "testdata", "golden", "picture", name), got, *update)
}

func TestPictureGolden(t *testing.T) {
	for _, f := range pictureCases(t) {
		name := strings.TrimSuffix(filepath.Base(f), ".yaml")
		t.Run(name, func(t *testing.T) {
			r := builtinResult(t, f)
			var svg, page bytes.Buffer
			if err := SVG(&svg, r); err != nil {
				t.Fatal(err)
			}
			if err := HTML(&page, r); err != nil {
				t.Fatal(err)
			}
			checkPictureGolden(t, name+".svg", svg.String())
			checkPictureGolden(t, name+".html", page.String())
		})
	}
}

func TestTicksAreDistinctAndSensible(t *testing.T) {
	for _, tc := range []struct {
		lo, hi float64
		want   string
		why    string
	}{
		{1940.2, 1940.4, "1936 1938 1940 1942 1944", "a window of days: the axis is at least ten years wide, ticks a year or more apart"},
		{1809, 1939, "1820 1840 1860 1880 1900 1920", "a century and more: ticks every 20 years"},
		{-2999, -199, "3000 BCE 2500 BCE 2000 BCE 1500 BCE 1000 BCE 500 BCE", "before the common era, counted as people count: 3000 BCE is astronomical -2999"},
		{-450, 120, "400 BCE 300 BCE 200 BCE 100 BCE 1 CE 100", "across the start of the era: no year 0"},
		{-3, 4, "4 BCE 2 BCE 2 4", "a narrow span across the era, ticks two years apart: no tick for a year 0 that people do not count"},
	} {
		lo, hi := tc.lo, tc.hi
		if hi-lo < minAxisYears {
			lo, hi = axisRange(extent{lo: lo, hi: hi, any: true})
		}
		var labels []string
		seen := map[string]bool{}
		for _, tk := range ticks(lo, hi) {
			if seen[tk.label] {
				t.Errorf("%s: tick %q twice", tc.why, tk.label)
			}
			seen[tk.label] = true
			labels = append(labels, tk.label)
		}
		if got := strings.Join(labels, " "); got != tc.want {
			t.Errorf("ticks(%v, %v) = %q, want %q (%s)", tc.lo, tc.hi, got, tc.want, tc.why)
		}
	}
}

func TestAxisNeverCollapses(t *testing.T) {
	lo, hi := axisRange(extent{lo: 1940, hi: 1940, any: true})
	if hi-lo < minAxisYears {
		t.Errorf("one finite bound gives an axis of %v years, want at least %d", hi-lo, minAxisYears)
	}
	if n := len(ticks(lo, hi)); n < 3 {
		t.Errorf("one finite bound gives %d ticks, want several", n)
	}
}

func TestPlacerNeverOverlaps(t *testing.T) {
	rng := rand.New(rand.NewPCG(1, 2))
	for trial := range 200 {
		p := &placer{min: plotLeft, max: plotRight}
		type box struct {
			x0, x1 float64
			row    int
		}
		var boxes []box
		for range 1 + rng.IntN(8) {
			w := 20 + rng.Float64()*300
			x := plotLeft - 50 + rng.Float64()*(plotRight-plotLeft+100)
			x0, row := p.place(w, at(x, x-w), at(x))
			if x0 < plotLeft-1e-9 || x0+w > plotRight+1e-9 {
				t.Fatalf("trial %d: label [%v, %v] leaves [%v, %v]", trial, x0, x0+w, plotLeft, plotRight)
			}
			for _, b := range boxes {
				if b.row == row && x0 < b.x1 && b.x0 < x0+w {
					t.Fatalf("trial %d: labels overlap on row %d: [%v, %v] and [%v, %v]", trial, row, b.x0, b.x1, x0, x0+w)
				}
			}
			boxes = append(boxes, box{x0, x0 + w, row})
		}
	}
}

func TestWrapAndShorten(t *testing.T) {
	long := "first paint layers of the cabinet doors and the carcass, with a very long label indeed that goes on"
	lines, cut := wrapText(long, 200, 11, false, 2)
	if len(lines) != 2 || !cut || !strings.HasSuffix(lines[1], "…") {
		t.Errorf("wrapText = %q, %v; want two lines, the last cut with …", lines, cut)
	}
	for _, l := range lines {
		if w := textWidth(l, 11, false); w > 200 {
			t.Errorf("line %q is %v wide, more than 200", l, w)
		}
	}
	if lines, cut := wrapText("short", 200, 11, false, 2); len(lines) != 1 || cut {
		t.Errorf("short text wrapped: %q %v", lines, cut)
	}
	if got := shortID("order:a-very-long-event-name>another-long-one"); len([]rune(got)) != 24 || !strings.HasSuffix(got, "…") {
		t.Errorf("shortID = %q, want 24 characters ending in …", got)
	}
}

// TestEveryClaimIsDrawn checks that a claim outside every window is on
// the axis: each claim has a labelled mark inside the plot.
func TestEveryClaimIsDrawn(t *testing.T) {
	r := builtinResult(t, filepath.Join(repoRoot, "testdata", "picture", "claims-outside.yaml"))
	svg := picture(r)
	marks := regexp.MustCompile(`<g class="claim"><title>claim ([^:]+):`).FindAllStringSubmatch(svg, -1)
	if len(marks) != len(r.Claims) {
		t.Fatalf("%d claim marks for %d claims", len(marks), len(r.Claims))
	}
	xs := regexp.MustCompile(`<g class="claim"><title>[^<]*</title><path d="M([0-9.]+) `).FindAllStringSubmatch(svg, -1)
	for _, x := range xs {
		var v float64
		if _, err := fmtSscan(x[1], &v); err != nil || v < plotLeft || v > plotRight {
			t.Errorf("a claim mark at x=%s lies outside the plot [%v, %v]", x[1], plotLeft, plotRight)
		}
	}
}

// TestConflictIsMarked checks that a conflicting tier is drawn, marked
// and labelled with the evidence that clashes, never dropped.
func TestConflictIsMarked(t *testing.T) {
	r := builtinResult(t, filepath.Join(repoRoot, "testdata", "picture", "conflicting-tiers.yaml"))
	svg := picture(r)
	for _, want := range []string{`class="conflict"`, "no window: the evidence conflicts", "r-sale", "f-blue", `class="clash"`} {
		if !strings.Contains(svg, want) {
			t.Errorf("the picture of a conflicting tier lacks %q", want)
		}
	}
}

func fmtSscan(s string, v *float64) (int, error) {
	f, err := json.Number(s).Float64()
	*v = f
	if math.IsNaN(f) {
		return 0, err
	}
	return 1, err
}

// TestPictureLayoutInBrowser draws every picture in chromium and measures
// what it drew: no two labels overlap, nothing lies outside the drawing.
// The screenshots are kept with go test -artifacts.
func TestPictureLayoutInBrowser(t *testing.T) {
	if testing.Short() {
		t.Skip("a browser test")
	}
	nodetest.Need(t, true)
	dir := t.TempDir()
	var files []string
	write := func(name string, r *constraint.Result, html bool) {
		var b bytes.Buffer
		var err error
		if html {
			err = HTML(&b, r)
		} else {
			err = SVG(&b, r)
		}
		if err != nil {
			t.Fatal(err)
		}
		p := filepath.Join(dir, name)
		if err := os.WriteFile(p, b.Bytes(), 0o644); err != nil {
			t.Fatal(err)
		}
		files = append(files, p)
	}
	for _, f := range pictureCases(t) {
		write(strings.TrimSuffix(filepath.Base(f), ".yaml")+".svg", builtinResult(t, f), false)
	}
	examples, _ := filepath.Glob(filepath.Join(repoRoot, "examples", "*", "case.yaml"))
	for _, f := range examples {
		write(filepath.Base(filepath.Dir(f))+".svg", builtinResult(t, f), false)
	}
	write("report-bce-spans.html", builtinResult(t, filepath.Join(repoRoot, "testdata", "picture", "bce-spans.yaml")), true)
	out := t.ArtifactDir()
	lines := bytes.Split(bytes.TrimSpace(nodetest.Run(t, nil, "layout.mjs", append([]string{out}, files...)...)), []byte("\n"))
	if len(lines) != len(files) {
		t.Fatalf("measured %d pictures, want %d", len(lines), len(files))
	}
	for _, l := range lines {
		var m struct {
			File     string
			Shot     string
			Labels   int
			Overlaps [][]string
			Outside  []string
		}
		if err := json.Unmarshal(l, &m); err != nil {
			t.Fatal(err)
		}
		name := filepath.Base(m.File)
		if m.Labels < 5 {
			t.Errorf("%s: %d labels drawn, too few to be the picture", name, m.Labels)
		}
		for _, o := range m.Overlaps {
			t.Errorf("%s: labels overlap: %q and %q", name, o[0], o[1])
		}
		for _, o := range m.Outside {
			t.Errorf("%s: outside the drawing: %s", name, o)
		}
		t.Logf("%s: %d labels, screenshot %s", name, m.Labels, m.Shot)
	}
}
