package survey

import (
	"bufio"
	"bytes"
	"fmt"
	"html/template"
	"io"
	"os"
	"strings"

	"terminus/constraint"
	"terminus/constraint/wording"
)

// spill holds the rows of one section: in memory up to a limit, then in a
// temporary file, so that a report on a million records needs no more
// memory than one on a thousand.
type spill struct {
	mem   bytes.Buffer
	file  *os.File
	buf   *bufio.Writer
	limit int
	n     int
}

func (s *spill) write(b []byte) error {
	s.n++
	if s.file == nil && s.mem.Len()+len(b) <= s.limit {
		s.mem.Write(b)
		return nil
	}
	if s.file == nil {
		f, err := os.CreateTemp("", "terminus-survey-*")
		if err != nil {
			return fmt.Errorf("survey: a temporary file for the report: %w", err)
		}
		s.file = f
		s.buf = bufio.NewWriterSize(f, 64<<10)
		if _, err := s.buf.Write(s.mem.Bytes()); err != nil {
			return err
		}
		s.mem = bytes.Buffer{}
	}
	_, err := s.buf.Write(b)
	return err
}

// copyTo writes the rows out, in the order they came.
func (s *spill) copyTo(w io.Writer) error {
	if s.file == nil {
		_, err := w.Write(s.mem.Bytes())
		return err
	}
	if err := s.buf.Flush(); err != nil {
		return err
	}
	if _, err := s.file.Seek(0, io.SeekStart); err != nil {
		return err
	}
	_, err := io.Copy(w, s.file)
	return err
}

func (s *spill) close() {
	if s.file != nil {
		name := s.file.Name()
		s.file.Close()
		os.Remove(name)
		s.file = nil
	}
}

// ReportInfo is what a summary report says about the survey as a whole.
type ReportInfo struct {
	Inputs         []string // the file names
	DatasetVersion string
	DatasetSHA256  string
	FailOn         string // the --fail-on tier
	ParseOnly      bool
}

// ReportWriter writes a summary report in Markdown or HTML: the counts by
// status, then one section per status with the records that need a look
// first (excluded, undetermined, improbable, doubtful, errors), each with
// its windows and deciding evidence, then the consistent ones and those
// without a claim, and the cautions every report carries. Rows wait in
// per-section spills (memory, then temporary files) until the end.
type ReportWriter struct {
	w        io.Writer
	html     bool
	info     ReportInfo
	sections map[Status]*spill
	rowTmpl  *template.Template
	errTmpl  *template.Template
}

// SpillLimit is how many bytes of rows a report section keeps in memory
// before it moves them to a temporary file.
const SpillLimit = 4 << 20

// NewMarkdownWriter returns a Markdown summary report writer to w.
func NewMarkdownWriter(w io.Writer, info ReportInfo) *ReportWriter {
	return newReportWriter(w, info, false, SpillLimit)
}

// NewHTMLWriter returns a self-contained HTML summary report writer to w;
// every value is escaped by html/template.
func NewHTMLWriter(w io.Writer, info ReportInfo) *ReportWriter {
	return newReportWriter(w, info, true, SpillLimit)
}

func newReportWriter(w io.Writer, info ReportInfo, html bool, limit int) *ReportWriter {
	r := &ReportWriter{w: w, html: html, info: info, sections: map[Status]*spill{}}
	for _, s := range Statuses() {
		r.sections[s] = &spill{limit: limit}
	}
	if html {
		r.rowTmpl = template.Must(template.New("row").Parse(htmlRow))
		r.errTmpl = template.Must(template.New("err").Parse(htmlErrRow))
	}
	return r
}

// mdCell makes text safe for a Markdown table cell.
func mdCell(s string) string {
	if s == "" {
		return ""
	}
	s = strings.NewReplacer("\\", "\\\\", "|", "\\|", "\r\n", " ", "\n", " ", "\r", " ", "<", "&lt;", ">", "&gt;",
		"*", "\\*", "_", "\\_", "`", "\\`", "[", "\\[", "]", "\\]").Replace(s)
	return s
}

func window(w [2]string) string {
	if w[0] == "" && w[1] == "" {
		return ""
	}
	if w[0] == "conflict" {
		return "conflict"
	}
	return w[0] + " – " + w[1]
}

type rowData struct {
	ID, Title, Claims, Hard, Firm, Soft, Deciding, Conflicts, Err, Hint string
	Line                                                                int
	File                                                                string
}

func (r *ReportWriter) data(o *Outcome) rowData {
	s := o.Summary
	return rowData{ID: o.ID, File: o.File, Line: o.Line, Title: s.Title, Claims: s.Claims, Hard: window(s.WindowsText[0]),
		Firm: window(s.WindowsText[1]), Soft: window(s.WindowsText[2]), Deciding: s.Deciding, Conflicts: s.Conflicts, Err: s.Err, Hint: s.Hint}
}

// Render makes the record's table row.
func (r *ReportWriter) Render(o *Outcome) error {
	d := r.data(o)
	var b bytes.Buffer
	switch {
	case r.html && o.Summary.Status == StatusError:
		if err := r.errTmpl.Execute(&b, d); err != nil {
			return err
		}
	case r.html:
		if err := r.rowTmpl.Execute(&b, d); err != nil {
			return err
		}
	case o.Summary.Status == StatusError:
		fmt.Fprintf(&b, "| %s | %s:%d | %s | %s |\n", mdCell(d.ID), mdCell(d.File), d.Line, mdCell(d.Err), mdCell(d.Hint))
	default:
		deciding := d.Deciding
		if d.Conflicts != "" {
			if deciding != "" {
				deciding += "; "
			}
			deciding += "conflict " + d.Conflicts
		}
		fmt.Fprintf(&b, "| %s | %s:%d | %s | %s | %s | %s | %s | %s |\n", mdCell(d.ID), mdCell(d.File), d.Line, mdCell(d.Title),
			mdCell(d.Claims), mdCell(d.Hard), mdCell(d.Firm), mdCell(d.Soft), mdCell(deciding))
	}
	o.Out = b.Bytes()
	return nil
}

// Write files the row in its section.
func (r *ReportWriter) Write(o *Outcome) error {
	return r.sections[o.Summary.Status].write(o.Out)
}

// sectionTitle heads a status's section of the report.
func sectionTitle(s Status) string {
	switch s {
	case StatusExcluded:
		return "Excluded: a claim contradicts hard evidence"
	case StatusUndetermined:
		return "Undetermined: the hard evidence contradicts itself"
	case StatusImprobable:
		return "Improbable: a claim contradicts firm evidence"
	case StatusDoubtful:
		return "Doubtful: a claim contradicts only soft evidence"
	case StatusError:
		return "Record errors: not checked"
	case StatusConsistent:
		return "Consistent"
	case StatusNoClaim:
		return "No claim to judge"
	case StatusParsed:
		return "Read (parse-only pass, not checked)"
	}
	return string(s)
}

// Cleanup removes the temporary files, if any; Close does it too. Call it
// (deferred) when a survey may end without Close.
func (r *ReportWriter) Cleanup() {
	for _, s := range r.sections {
		s.close()
	}
}

// Close writes the report: counts, the sections in order, the cautions.
func (r *ReportWriter) Close(c Counts) error {
	defer r.Cleanup()
	bw := bufio.NewWriterSize(r.w, 256<<10)
	var err error
	if r.html {
		err = r.closeHTML(bw, c)
	} else {
		err = r.closeMarkdown(bw, c)
	}
	if err != nil {
		return err
	}
	return bw.Flush()
}

func (r *ReportWriter) closeMarkdown(w *bufio.Writer, c Counts) error {
	fmt.Fprintf(w, "# Survey of %d %s\n\n", c.Records, wording.Plural(c.Records, "record", "records"))
	if len(r.info.Inputs) > 0 {
		fmt.Fprintf(w, "Read from %s. ", mdCell(strings.Join(r.info.Inputs, ", ")))
	}
	if r.info.DatasetVersion != "" {
		fmt.Fprintf(w, "Materials dataset %s (sha256 %s).", mdCell(r.info.DatasetVersion), shortSum(r.info.DatasetSHA256))
	}
	fmt.Fprint(w, "\n\n| status | records |\n|---|---:|\n")
	for _, s := range Statuses() {
		if n := c.ByStatus[s]; n > 0 {
			fmt.Fprintf(w, "| %s | %d |\n", s, n)
		}
	}
	fmt.Fprintf(w, "| **total** | %d |\n\n", c.Records)
	fmt.Fprintf(w, "%s\n\n", c.AccountingSentence())
	if c.Conflicting > 0 {
		fmt.Fprintf(w, "The evidence of %d %s conflicts at some tier; see the deciding column.\n\n", c.Conflicting, wording.Plural(c.Conflicting, "record", "records"))
	}
	if c.Unbounded > 0 {
		fmt.Fprintf(w, "No finding or record bounds the date of %d %s: a verdict of consistent there only says that nothing speaks against the claim.\n\n", c.Unbounded, wording.Plural(c.Unbounded, "record", "records"))
	}
	if c.Unlisted > 0 {
		fmt.Fprintf(w, "%d %s of %d %s name materials not in the dataset, which bound nothing.\n\n", c.Unlisted, wording.Plural(c.Unlisted, "finding", "findings"), c.UnlistedRecords, wording.Plural(c.UnlistedRecords, "record", "records"))
	}
	if r.info.FailOn != "" {
		fmt.Fprintf(w, "%d %s fail at the %s tier or a stronger one, or could not be checked.\n\n", c.Failing, wording.Plural(c.Failing, "record", "records"), r.info.FailOn)
	}
	for _, s := range Statuses() {
		sec := r.sections[s]
		if sec.n == 0 {
			continue
		}
		fmt.Fprintf(w, "## %s (%d)\n\n", sectionTitle(s), sec.n)
		if s == StatusError {
			fmt.Fprint(w, "| id | where | error | hint |\n|---|---|---|---|\n")
		} else {
			fmt.Fprint(w, "| id | where | title | claims | hard window | firm window | soft window | deciding evidence |\n|---|---|---|---|---|---|---|---|\n")
		}
		if err := sec.copyTo(w); err != nil {
			return err
		}
		fmt.Fprint(w, "\n")
	}
	fmt.Fprint(w, "## Cautions\n\n")
	for _, s := range constraint.Cautions() {
		fmt.Fprintf(w, "- %s\n", s)
	}
	return nil
}

func shortSum(s string) string {
	if len(s) > 12 {
		return s[:12]
	}
	return s
}

const htmlRow = `<tr><td>{{.ID}}</td><td>{{.File}}:{{.Line}}</td><td>{{.Title}}</td><td>{{.Claims}}</td><td>{{.Hard}}</td><td>{{.Firm}}</td><td>{{.Soft}}</td><td>{{.Deciding}}{{if .Conflicts}}{{if .Deciding}}; {{end}}conflict {{.Conflicts}}{{end}}</td></tr>
`

const htmlErrRow = `<tr><td>{{.ID}}</td><td>{{.File}}:{{.Line}}</td><td>{{.Err}}</td><td>{{.Hint}}</td></tr>
`

const htmlHead = `<!DOCTYPE html>
<html lang="en">
<head>
<meta charset="utf-8">
<title>Survey of {{.Records}} records</title>
<style>
body { font-family: system-ui, sans-serif; margin: 2em; color: #222; }
table { border-collapse: collapse; margin: 1em 0; }
th, td { border: 1px solid #ccc; padding: 0.25em 0.5em; text-align: left; vertical-align: top; }
th { background: #f3f3f3; }
td.n { text-align: right; }
h2.excluded, h2.undetermined { color: #a00; }
h2.improbable { color: #b50; }
h2.doubtful { color: #875; }
</style>
</head>
<body>
<h1>Survey of {{.Records}} {{if eq .Records 1}}record{{else}}records{{end}}</h1>
<p>{{if .Inputs}}Read from {{.Inputs}}. {{end}}{{if .Version}}Materials dataset {{.Version}} (sha256 {{.SHA}}).{{end}}</p>
<table><tr><th>status</th><th>records</th></tr>
{{range .Rows}}<tr><td>{{.Status}}</td><td class="n">{{.N}}</td></tr>
{{end}}<tr><th>total</th><th class="n">{{.Records}}</th></tr></table>
<p>{{.Accounting}}</p>
{{if .Conflicting}}<p>The evidence of {{.Conflicting}} {{if eq .Conflicting 1}}record{{else}}records{{end}} conflicts at some tier; see the deciding column.</p>
{{end}}{{if .Unbounded}}<p>No finding or record bounds the date of {{.Unbounded}} {{if eq .Unbounded 1}}record{{else}}records{{end}}: a verdict of consistent there only says that nothing speaks against the claim.</p>
{{end}}{{if .Unlisted}}<p>{{.Unlisted}} {{if eq .Unlisted 1}}finding{{else}}findings{{end}} of {{.UnlistedRecords}} {{if eq .UnlistedRecords 1}}record name{{else}}records name{{end}} materials not in the dataset, which bound nothing.</p>
{{end}}{{if .FailOn}}<p>{{.Failing}} {{if eq .Failing 1}}record fails{{else}}records fail{{end}} at the {{.FailOn}} tier or a stronger one, or could not be checked.</p>
{{end}}`

const htmlSection = `<h2 class="{{.Class}}">{{.Title}} ({{.N}})</h2>
<table>
{{if .Errors}}<tr><th>id</th><th>where</th><th>error</th><th>hint</th></tr>
{{else}}<tr><th>id</th><th>where</th><th>title</th><th>claims</th><th>hard window</th><th>firm window</th><th>soft window</th><th>deciding evidence</th></tr>
{{end}}`

const htmlFoot = `<h2>Cautions</h2>
<ul>
{{range .}}<li>{{.}}</li>
{{end}}</ul>
</body>
</html>
`

func (r *ReportWriter) closeHTML(w *bufio.Writer, c Counts) error {
	type countRow struct {
		Status Status
		N      int
	}
	head := struct {
		Records, Conflicting, Failing, Unbounded int
		Unlisted, UnlistedRecords                int
		Inputs, Version, SHA, FailOn             string
		Accounting                               template.HTML
		Rows                                     []countRow
	}{Accounting: template.HTML(template.HTMLEscapeString(c.AccountingSentence())), Records: c.Records, Conflicting: c.Conflicting, Failing: c.Failing, Unbounded: c.Unbounded,
		Unlisted: c.Unlisted, UnlistedRecords: c.UnlistedRecords, Inputs: strings.Join(r.info.Inputs, ", "),
		Version: r.info.DatasetVersion, SHA: shortSum(r.info.DatasetSHA256), FailOn: r.info.FailOn}
	for _, s := range Statuses() {
		if n := c.ByStatus[s]; n > 0 {
			head.Rows = append(head.Rows, countRow{s, n})
		}
	}
	if err := template.Must(template.New("head").Parse(htmlHead)).Execute(w, head); err != nil {
		return err
	}
	sect := template.Must(template.New("section").Parse(htmlSection))
	for _, s := range Statuses() {
		sec := r.sections[s]
		if sec.n == 0 {
			continue
		}
		class := strings.ReplaceAll(string(s), " ", "-")
		if err := sect.Execute(w, struct {
			Class, Title string
			N            int
			Errors       bool
		}{class, sectionTitle(s), sec.n, s == StatusError}); err != nil {
			return err
		}
		if err := sec.copyTo(w); err != nil {
			return err
		}
		fmt.Fprint(w, "</table>\n")
	}
	return template.Must(template.New("foot").Parse(htmlFoot)).Execute(w, constraint.Cautions())
}
