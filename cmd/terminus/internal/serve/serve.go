// Package serve is the local page of "terminus serve": a small web server
// for people who would rather not use a terminal. The page edits a case
// (the object, events and their order with gaps, findings, records and
// claims), shows the results as the user types (windows per tier,
// verdicts, conflicts and the cheapest correction, the picture, the
// chains of evidence), downloads the case file and every report, and
// browses the materials dataset.
//
// # No reasoning of its own
//
// Every edit is sent to the server as a case file in strict JSON and read
// by the same reader as the command line (package casefile, package
// input), analyzed by the same reasoner (package constraint) and written
// by the same report writers. The page only edits and shows: an error
// comes back in the words of the command line, with the path of the field
// it concerns, found from the position the reader gives.
//
// # Safe by default
//
// The server keeps no state and listens on the loopback interface unless
// told otherwise; every asset is embedded and the page's content security
// policy lets it reach only its own server. Requests are limited in size;
// GET changes nothing; every POST must carry the page's own Origin and a
// Host header naming the server, so that another site, or a name that a
// DNS rebinding points at the machine, cannot use it.
package serve

import (
	"bytes"
	"embed"
	"encoding/json"
	"errors"
	"fmt"
	"io"
	"io/fs"
	"net"
	"net/http"

	"terminus/cmd/terminus/internal/report"
	"terminus/constraint"
	"terminus/constraint/input"
	"terminus/materials"
)

//go:embed static
var staticFiles embed.FS

// DefaultMaxBytes is the largest request body the server reads: a case
// file of a mebibyte is far larger than any object needs.
const DefaultMaxBytes = 1 << 20

// Example is a case the page can start from.
type Example struct {
	Name  string // the folder's name, "retouched-landscape"
	Title string
	Data  []byte // the case file
	File  string // its name, for its format
}

// Options configure a [Server].
type Options struct {
	// Dataset is the materials dataset; Notes say which built-in entries a
	// user's files replaced.
	Dataset *materials.Dataset
	Notes   []string
	// Examples are the cases offered as starting points.
	Examples []Example
	// MaxBytes limits a request's body; 0 means DefaultMaxBytes.
	MaxBytes int64
	// AnyIP lets the Host header name the server by any IP address, as
	// other computers must when it listens beyond the loopback interface;
	// otherwise only a loopback address or "localhost" will do. A name that
	// is not an IP address (which a DNS rebinding would use) is refused
	// either way, and so is a port that is not the server's.
	AnyIP bool
}

// Server answers the page's requests.
type Server struct {
	opts    Options
	mux     *http.ServeMux
	index   *materialIndex
	regions []place
}

type place struct {
	Code string `json:"code"`
	Name string `json:"name"`
}

// New makes a server.
func New(opts Options) (*Server, error) {
	if opts.Dataset == nil {
		return nil, errors.New("serve: no dataset")
	}
	if opts.MaxBytes <= 0 {
		opts.MaxBytes = DefaultMaxBytes
	}
	s := &Server{opts: opts, mux: http.NewServeMux(), index: newMaterialIndex(opts.Dataset)}
	if rg := opts.Dataset.Regions; rg != nil {
		for _, c := range rg.Codes() {
			s.regions = append(s.regions, place{Code: c, Name: rg.Name(c)})
		}
	}
	static, err := fs.Sub(staticFiles, "static")
	if err != nil {
		return nil, err
	}
	s.mux.Handle("GET /static/", http.StripPrefix("/static/", http.FileServerFS(static)))
	s.mux.HandleFunc("GET /{$}", func(w http.ResponseWriter, r *http.Request) {
		http.ServeFileFS(w, r, static, "index.html")
	})
	s.mux.HandleFunc("GET /static/report.css", func(w http.ResponseWriter, r *http.Request) {
		w.Header().Set("Content-Type", "text/css; charset=utf-8")
		io.WriteString(w, report.HTMLStyle())
	})
	s.mux.HandleFunc("GET /api/examples", s.examples)
	s.mux.HandleFunc("GET /api/examples/{name}", s.example)
	s.mux.HandleFunc("GET /api/places", func(w http.ResponseWriter, r *http.Request) { writeJSON(w, s.regions) })
	s.mux.HandleFunc("GET /api/search", s.search)
	s.mux.HandleFunc("GET /api/materials", s.materials)
	s.mux.HandleFunc("GET /api/materials/{id}", s.material)
	s.mux.HandleFunc("GET /api/groups", s.group)
	s.mux.HandleFunc("GET /api/filters", s.filters)
	s.mux.HandleFunc("POST /api/upload", s.upload)
	s.mux.HandleFunc("POST /api/check", s.check)
	s.mux.HandleFunc("POST /api/export/{format}", s.export)
	return s, nil
}

// ServeHTTP checks every request before it reaches a handler: the Host
// header, the Origin of anything that is not a GET, the size of the body,
// and sets the headers that keep the page to itself.
func (s *Server) ServeHTTP(w http.ResponseWriter, r *http.Request) {
	h := w.Header()
	h.Set("Content-Security-Policy", "default-src 'self'; img-src 'self' data: blob:; style-src 'self'; script-src 'self'; connect-src 'self'; object-src 'none'; frame-ancestors 'none'; base-uri 'none'; form-action 'none'")
	h.Set("X-Content-Type-Options", "nosniff")
	h.Set("Referrer-Policy", "no-referrer")
	h.Set("Cross-Origin-Resource-Policy", "same-origin")
	h.Set("Cache-Control", "no-store")
	if !s.hostAllowed(r) {
		http.Error(w, "this server answers only to its own address", http.StatusMisdirectedRequest)
		return
	}
	if r.Method != http.MethodGet && r.Method != http.MethodHead {
		if origin := r.Header.Get("Origin"); origin != "http://"+r.Host {
			http.Error(w, "refused: a request that changes or computes anything must come from this page (its Origin is checked)", http.StatusForbidden)
			return
		}
		r.Body = http.MaxBytesReader(w, r.Body, s.opts.MaxBytes)
	}
	s.mux.ServeHTTP(w, r)
}

// hostAllowed says whether the Host header names this server.
func (s *Server) hostAllowed(r *http.Request) bool {
	host, port, err := net.SplitHostPort(r.Host)
	if err != nil {
		return false
	}
	if local, ok := r.Context().Value(http.LocalAddrContextKey).(net.Addr); ok {
		if _, lport, err := net.SplitHostPort(local.String()); err == nil && lport != port {
			return false
		}
	}
	if host == "localhost" {
		return true
	}
	ip := net.ParseIP(host)
	return ip != nil && (ip.IsLoopback() || s.opts.AnyIP)
}

func writeJSON(w http.ResponseWriter, v any) {
	w.Header().Set("Content-Type", "application/json; charset=utf-8")
	enc := json.NewEncoder(w)
	enc.SetEscapeHTML(false)
	enc.Encode(v)
}

// readBody reads a request's body within the limit; a body over it is an
// error in words.
func (s *Server) readBody(w http.ResponseWriter, r *http.Request) ([]byte, bool) {
	data, err := io.ReadAll(r.Body)
	if err != nil {
		var tooBig *http.MaxBytesError
		if errors.As(err, &tooBig) {
			http.Error(w, fmt.Sprintf("the request is larger than %d bytes", s.opts.MaxBytes), http.StatusRequestEntityTooLarge)
		} else {
			http.Error(w, "the request could not be read", http.StatusBadRequest)
		}
		return nil, false
	}
	return data, true
}

func (s *Server) examples(w http.ResponseWriter, r *http.Request) {
	type ex struct {
		Name  string `json:"name"`
		Title string `json:"title"`
	}
	list := []ex{}
	for _, e := range s.opts.Examples {
		list = append(list, ex{e.Name, e.Title})
	}
	writeJSON(w, list)
}

// loaded is a case sent to the page to edit: its tree in JSON, and the
// first problem the strict reader finds in it, if any.
type loaded struct {
	Case  json.RawMessage `json:"case"`
	Error *fieldError     `json:"error,omitempty"`
}

func (s *Server) example(w http.ResponseWriter, r *http.Request) {
	for _, e := range s.opts.Examples {
		if e.Name == r.PathValue("name") {
			s.load(w, e.File, e.Data)
			return
		}
	}
	http.Error(w, "no such example", http.StatusNotFound)
}

// upload reads a case file the user chose, named by the query's name (for
// its format), through the same reader as the command line.
func (s *Server) upload(w http.ResponseWriter, r *http.Request) {
	data, ok := s.readBody(w, r)
	if !ok {
		return
	}
	name := r.URL.Query().Get("name")
	if name == "" {
		name = "case.yaml"
	}
	s.load(w, name, data)
}

func (s *Server) load(w http.ResponseWriter, name string, data []byte) {
	limits := input.Limits{MaxBytes: s.opts.MaxBytes}
	root, err := input.Parse(name, data, input.FormatOf(name), limits)
	if err != nil {
		writeJSON(w, loaded{Error: newFieldError(err, nil)})
		return
	}
	var b bytes.Buffer
	treeJSON(&b, root)
	out := loaded{Case: b.Bytes()}
	// The file's own problems, as the command line would find them, show
	// beside the fields once the page sends the case back; an error of the
	// reader here would name lines of a file the page no longer shows.
	writeJSON(w, out)
}

// analyze reads a case sent by the page (strict JSON) and analyzes it.
func (s *Server) analyze(r *http.Request, data []byte) (*constraint.Result, *input.Node, error) {
	limits := input.Limits{MaxBytes: s.opts.MaxBytes}
	root, err := input.Parse(caseName, data, input.JSON, limits)
	if err != nil {
		return nil, nil, err
	}
	c, err := parseCase(data, limits)
	if err != nil {
		return nil, root, err
	}
	res, err := constraint.Analyze(r.Context(), c, s.opts.Dataset, constraint.Options{})
	if err != nil {
		return nil, root, err
	}
	res.Notes = append(append([]string{}, s.opts.Notes...), res.Notes...)
	return res, root, nil
}
