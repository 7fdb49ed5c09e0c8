// Package survey checks a whole collection in one pass: it reads records
// from JSON Lines or CSV files, checks each one with the reasoner (package
// constraint) on every core, and writes one output record per input
// record, in input order, as JSON Lines, CSV or a Markdown or HTML
// summary report.
//
// # Input
//
// JSON Lines: one case per line, in the case file schema (the same keys as
// a YAML case file, written as a JSON object), plus an optional "id" (a
// string or a number) that is kept in the output. Each line is decoded
// strictly by [casefile.Parse]; an error carries the file, the line and
// the column within the line. Every physical line is one record, save the
// blank ones (nothing but spaces, tabs and carriage returns): a line of
// invalid UTF-8, of other white space or over the size limit is an error
// record of its own.
//
// CSV: a header row is required; names are read without regard to case,
// and a space or hyphen counts as an underscore. The columns read are:
//
//	id          the record's id (default "line-N", N its line)
//	title       free text
//	place       where the object was made: ISO 3166-1 alpha-2 or UN M49
//	claim       the claimed date (EDTF or a friendly form); several
//	            claims apart with ';'
//	materials   the findings apart with ';'; alternatives of one finding
//	            apart with '|'; a final '?' marks a probable
//	            identification: "lead white; azurite|smalt?"
//	not_before  a documented earliest date (a firm record, id not-before)
//	not_after   a documented latest date (a firm record, id not-after)
//
// Every other column is free: it is kept through to the csv and jsonl
// output unchanged. A header name that the one rule of every "did you
// mean" ([spell.Nearest]) takes for a slip of a known column ("matrials")
// stops the survey, rather than passing the column through unread; names
// of fewer than four letters are always free. Each row is one event,
// "making"; findings are finding-1, finding-2 … and claims claim-1 … in
// the order written. Fields follow RFC 4180 (quotes, "" inside quotes),
// read leniently within a line: a stray quote inside an unquoted field,
// and text after a closing quote, are kept as text.
//
// A quoted field may span lines only when it closes properly (its closing
// quote followed by a comma or the end of the line), within [MaxLine]
// bytes, and the row then has the header's number of fields. Otherwise the
// line that opens the quote is an error record naming that line and
// column, and reading goes on at the next line: one stray quote costs one
// record, never the rows after it. Deciding so reads at most MaxLine bytes
// ahead and costs linear work, however the quotes fall. A line longer than
// MaxLine, and a record with invalid UTF-8, are error records too.
//
// # Every line accounted for
//
// Every physical line read is the header, a blank line, or a line of
// exactly one output record. [Counts] says so: Lines = HeaderLines +
// BlankLines + RecordLines, and Records = Judged + Errors;
// [Counts.Accounting] writes it out for people, and the md and html
// reports and the command's closing line on stderr carry it. The jsonl and
// csv outputs have one row per input record, with its file and first
// line, and nothing else.
//
// # Records and errors
//
// Every input record yields exactly one output record: a result, or an
// error with its file, line and message and, where one fits, a hint. A
// malformed record never stops the survey and is never dropped. A
// [Status] sums each record up: the worst verdict among its claims
// (excluded, undetermined, improbable, doubtful, consistent), "no claim",
// or "error". [Counts] gives the totals. Only a whole input that cannot
// be read, or a CSV file without a usable header, stops a survey before it
// starts ([InputError]).
//
// # Order, parallelism and memory
//
// [Run] reads the inputs in one goroutine, checks records in as many
// workers as runtime.GOMAXPROCS (or [Options.Workers]) and writes them in
// input order from a reorder window of [Options.Window] records. A record
// holds a window slot from reading until writing, so at most that many
// records are in memory at once, however long the input. The summary
// reports keep their rows in memory up to [SpillLimit] bytes per section
// and in temporary files beyond.
//
// # Output
//
// [JSONLWriter]: one object per record with "id", "file", "line",
// "status", "columns" (the free CSV columns) and either "result" (the
// document of check --format json) or "error" and "hint". [CSVWriter]:
// one summary row per record: id, file, line, the free columns, status,
// claims with their verdicts, the event shown, the earliest and latest
// day at each tier ("..": unbounded; "conflict": the tier's evidence
// contradicts itself), the deciding evidence, conflicts, error and hint.
// [ReportWriter] (Markdown or HTML): the counts by status, then the
// records by status, the ones that need a look first, each with its
// windows and deciding evidence, and the cautions; they leave the free
// columns out (the csv summary keeps them). Output is deterministic: the
// same input gives the same bytes, however many workers.
//
// # Limits
//
// The windows shown in csv, md and html are those of one event per record
// (the first claim's, else the first); the jsonl result has them all. A
// CSV row is one event: for several events, retouchings or orders between
// them, use JSON Lines. The survey checks each record on its own; it does
// not compare records with each other.
package survey
