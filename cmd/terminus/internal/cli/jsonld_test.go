package cli

import (
	"encoding/json"
	"strings"
	"testing"
)

func TestCheckJSONLD(t *testing.T) {
	for _, tc := range []struct {
		args     []string
		code     int
		inOut    string
		inStderr string
		why      string
	}{
		{[]string{"--format", "jsonld"}, 1, `"begin_of_the_begin": "1809-01-01T00:00:00Z"`, "", "the hard window by default; the claim is judged as usual for the exit status"},
		{[]string{"--format", "jsonld", "--tier", "firm"}, 1, `"end_of_the_end": "1902-12-31T23:59:59Z"`, "", "--tier firm exports the firm windows"},
		{[]string{"--format", "jsonld", "--tier", "medium"}, 2, "", "unknown --tier", "a tier that does not exist is bad usage"},
		{[]string{"--format", "jsonld", "--production", "varnish"}, 2, "", `no event "varnish"`, "a production event that does not exist"},
	} {
		t.Run(strings.Join(tc.args, " "), func(t *testing.T) {
			args := append([]string{"check"}, tc.args...)
			out, errs, code := execute(t, append(args, "../../../../examples/retouched-landscape/case.yaml")...)
			if code != tc.code && !(tc.code == 1 && code == 0) {
				t.Fatalf("exit %d, want %d (%s); stderr %s", code, tc.code, tc.why, errs)
			}
			if !strings.Contains(out, tc.inOut) || !strings.Contains(errs, tc.inStderr) {
				t.Errorf("%s: stdout lacks %q or stderr lacks %q:\n%s\n%s", tc.why, tc.inOut, tc.inStderr, out, errs)
			}
			if tc.code < 2 {
				var doc map[string]any
				if err := json.Unmarshal([]byte(out), &doc); err != nil || doc["@context"] != "https://linked.art/ns/v1/linked-art.json" {
					t.Errorf("not a Linked Art document: %v", err)
				}
			}
		})
	}
}
