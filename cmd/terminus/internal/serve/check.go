package serve

import (
	"bytes"
	"fmt"
	"io"
	"net/http"

	"terminus/cmd/terminus/internal/report"
	"terminus/constraint"
	"terminus/constraint/input"
	"terminus/constraint/network"
	"terminus/constraint/wording"
)

// checked is the answer to an edit: the report's sections as HTML and a
// summary for the status line, or the error beside its field.
type checked struct {
	OK         bool            `json:"ok"`
	Error      *fieldError     `json:"error,omitempty"`
	HTML       string          `json:"html,omitempty"`
	Consistent map[string]bool `json:"consistent,omitempty"`
	Claims     []claimVerdict  `json:"claims,omitempty"`
}

type claimVerdict struct {
	ID      string `json:"id"`
	Event   string `json:"event"`
	Date    string `json:"date"`
	Verdict string `json:"verdict"`
}

// check analyzes the case the page sends and answers with the report.
func (s *Server) check(w http.ResponseWriter, r *http.Request) {
	data, ok := s.readBody(w, r)
	if !ok {
		return
	}
	res, root, err := s.analyze(r, data)
	if err != nil {
		if _, isInput := err.(*input.Error); !isInput && root != nil {
			http.Error(w, err.Error(), http.StatusInternalServerError)
			return
		}
		writeJSON(w, checked{Error: newFieldError(err, root)})
		return
	}
	var b bytes.Buffer
	if err := report.HTMLBody(&b, res); err != nil {
		http.Error(w, err.Error(), http.StatusInternalServerError)
		return
	}
	out := checked{OK: true, HTML: b.String(), Consistent: map[string]bool{}}
	for t, c := range res.Consistent {
		out.Consistent[wording.Tier(t)] = c
	}
	for _, c := range res.Claims {
		out.Claims = append(out.Claims, claimVerdict{ID: c.ID, Event: c.Event, Date: c.DateText, Verdict: string(c.Verdict)})
	}
	writeJSON(w, out)
}

// exports are the files the page downloads: what, its name and type.
var exports = map[string]struct {
	file, mime string
	write      func(io.Writer, *constraint.Result) error
}{
	"md":     {"dating-section.md", "text/markdown; charset=utf-8", report.Markdown},
	"html":   {"dating-report.html", "text/html; charset=utf-8", report.HTML},
	"json":   {"dating.json", "application/json", report.JSON},
	"jsonld": {"dating.jsonld", "application/ld+json", report.LinkedArt(report.LinkedArtOptions{Tier: network.Hard})},
}

// export answers with a file to download: the case file as YAML (even
// with errors in it, so that no work is lost) or a report.
func (s *Server) export(w http.ResponseWriter, r *http.Request) {
	data, ok := s.readBody(w, r)
	if !ok {
		return
	}
	format := r.PathValue("format")
	if format == "yaml" {
		y, err := caseYAML(data, input.Limits{MaxBytes: s.opts.MaxBytes})
		if err != nil {
			http.Error(w, err.Error(), http.StatusUnprocessableEntity)
			return
		}
		attach(w, caseName, "application/yaml; charset=utf-8", y)
		return
	}
	ex, known := exports[format]
	if !known {
		http.Error(w, fmt.Sprintf("no export %q: expected yaml, md, html, json or jsonld", format), http.StatusNotFound)
		return
	}
	res, _, err := s.analyze(r, data)
	if err != nil {
		http.Error(w, "the case has an error: "+err.Error(), http.StatusUnprocessableEntity)
		return
	}
	var b bytes.Buffer
	if err := ex.write(&b, res); err != nil {
		http.Error(w, err.Error(), http.StatusInternalServerError)
		return
	}
	attach(w, ex.file, ex.mime, b.Bytes())
}

func attach(w http.ResponseWriter, name, mime string, data []byte) {
	w.Header().Set("Content-Type", mime)
	w.Header().Set("Content-Disposition", fmt.Sprintf("attachment; filename=%q", name))
	w.Write(data)
}
