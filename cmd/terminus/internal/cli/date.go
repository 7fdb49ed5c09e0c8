package cli

import (
	"fmt"
	"io"
	"strconv"
	"strings"

	"github.com/spf13/cobra"

	"terminus/constraint/date"
)

// NewDateCmd builds "terminus date": how date expressions are read.
func NewDateCmd(s IO) *cobra.Command {
	var format, calendar, yearStart, within string
	var julian bool
	cmd := &cobra.Command{
		Use:   "date EXPR...",
		Short: "Show how date expressions are read",
		Long: `Show how each date expression is read: its canonical EDTF form, the first
and last day it can be (proleptic Gregorian calendar, astronomical years:
0000 is 1 BCE), the calendar it was read in, its precision and qualifiers,
the alternatives of a one-of set, how far the default circa policy widens
an approximate date, and notes on the conventions and widenings used.

Expressions are EDTF (1874, 1874-05-21, 187X, 1874~, 1870/1879, ../1900,
-1199, [1667,1668,1670..1672]), friendly forms (c. 1870, 1870s, early
1870s, 1200 BCE, AD 79, before 1900, after 1850, 1870-1875, 21 May 1874,
18th century, second quarter of the 19th century, 3rd century BCE), Old
Style dates (10 Feb 1712/13, 1712/3), and the dates of other calendars:
Japanese eras (Meiji 14.5.3, Ansei 4, 7th month, 明治十四年五月), Chinese
reigns (Qianlong 12, 乾隆十二年), zodiac and sexagenary years with a range
(year of the horse in 1800/1899, Horse 7 in 1840/1880, 庚子 in 1800/1999),
Hijri (1300 AH, 15 Ramadan 1300), solar Hijri (1300 SH), Hebrew (5600 AM,
1 Tishri 5600), French Republican (18 Brumaire an VIII), Buddhist Era
(BE 2475) and Republic of China years (民國20年).

Quote an expression that holds spaces. A negative year (-1199) is read as
a date, not as a flag. A date ending in "(Julian)" or "O.S." is on the
Julian calendar; --julian reads every unmarked date so.`,
		Example: `  terminus date 1874 "c. 1870" "early 1870s" "1200 BCE" -1199
  terminus date --format json "[1667,1668,1670..1672]"
  terminus date "1582-10-04 (Julian)" "10 Feb 1712/13" "18th century"
  terminus date "Ansei 4, 7th month" "year of the snake" --within 1840/1870`,
		Args: cobra.MinimumNArgs(1),
		// Flags are read in RunE, so that a negative year is a date.
		DisableFlagParsing: true,
		RunE: func(c *cobra.Command, raw []string) error {
			args, help, err := parseDateArgs(c, raw)
			if err != nil {
				return usageError(fmt.Errorf("%w (see '%s --help')", err, c.CommandPath()))
			}
			if help {
				return c.Help()
			}
			if len(args) == 0 {
				return usageError(fmt.Errorf("requires at least 1 arg(s), only received 0"))
			}
			if format != "text" && format != "json" {
				return usageError(fmt.Errorf("unknown --format %q: expected text or json", format))
			}
			var opts date.Options
			if julian {
				opts.Calendar = date.CalendarJulian
			}
			if calendar != "" {
				if opts.Calendar, err = date.ParseCalendar(calendar); err != nil {
					return usageError(fmt.Errorf("--calendar: %w", err))
				}
			}
			if yearStart != "" {
				if opts.YearStart, err = date.ParseYearStart(yearStart); err != nil {
					return usageError(fmt.Errorf("--year-start: %w", err))
				}
			}
			if within != "" {
				if opts.Within, err = date.Parse(within); err != nil {
					return usageError(fmt.Errorf("--within: %w", err))
				}
			}
			ds := make([]date.Date, 0, len(args))
			for _, a := range args {
				d, err := date.ParseWith(a, opts)
				if err != nil {
					return usageError(err)
				}
				ds = append(ds, d)
			}
			circa := date.DefaultCirca()
			if format == "json" {
				out := dateListJSON{SchemaVersion: 1, Circa: circa.String()}
				for _, d := range ds {
					out.Dates = append(out.Dates, newDateJSON(d, circa))
				}
				return writeJSON(s.Out, out)
			}
			return writeDatesText(s.Out, ds, circa)
		},
	}
	cmd.Flags().StringVarP(&format, "format", "f", "text", "output format: text or json")
	cmd.Flags().BoolVar(&julian, "julian", false, "read unmarked dates on the Julian calendar")
	cmd.Flags().StringVar(&calendar, "calendar", "", "the calendar of unmarked dates (julian), or of zodiac and sexagenary dates (japanese, chinese, korean)")
	cmd.Flags().StringVar(&yearStart, "year-start", "", "the day the year began in the documents: 1 January, 25 March, 1 March or 25 December")
	cmd.Flags().StringVar(&within, "within", "", "the range a zodiac or sexagenary year is looked for in (e.g. 1800/1899)")
	cmd.Flags().BoolP("help", "h", false, "help for date")
	return cmd
}

// parseDateArgs reads the flags of "terminus date" from raw and returns the
// expressions in their order. An argument that starts with a minus sign and
// a digit ("-1199", "-0044-03-15") is a date, never a flag.
func parseDateArgs(c *cobra.Command, raw []string) (args []string, help bool, err error) {
	const hold = "\x00date-arg-"
	var held []string
	flagArgs := make([]string, 0, len(raw))
	dashes := false
	for _, a := range raw {
		if !dashes && len(a) > 1 && a[0] == '-' && a[1] >= '0' && a[1] <= '9' {
			flagArgs = append(flagArgs, hold+strconv.Itoa(len(held)))
			held = append(held, a)
			continue
		}
		dashes = dashes || a == "--"
		flagArgs = append(flagArgs, a)
	}
	fs := c.Flags()
	if err := fs.Parse(flagArgs); err != nil {
		return nil, false, err
	}
	if help, _ = fs.GetBool("help"); help {
		return nil, true, nil
	}
	for _, a := range fs.Args() {
		if k, ok := strings.CutPrefix(a, hold); ok {
			n, _ := strconv.Atoi(k)
			a = held[n]
		}
		args = append(args, a)
	}
	return args, false, nil
}

// maxTextAlternatives is how many alternatives the text output lists.
const maxTextAlternatives = 12

type dateListJSON struct {
	SchemaVersion int        `json:"schema_version"`
	Circa         string     `json:"circa"`
	Dates         []dateJSON `json:"dates"`
}

type endJSON struct {
	Approximate bool `json:"approximate"`
	Uncertain   bool `json:"uncertain"`
}

type dateJSON struct {
	Input        string       `json:"input"`
	EDTF         string       `json:"edtf"`
	Text         string       `json:"text"`
	Calendar     string       `json:"calendar"`
	Precision    string       `json:"precision"`
	First        *string      `json:"first"`
	Last         *string      `json:"last"`
	Approximate  bool         `json:"approximate"`
	Uncertain    bool         `json:"uncertain"`
	Start        endJSON      `json:"start"`
	End          endJSON      `json:"end"`
	Alternatives [][2]*string `json:"alternatives,omitempty"`
	Widened      *[2]*string  `json:"widened,omitempty"`
	WidenedBy    *[2]string   `json:"widened_by,omitempty"`
	Notes        []string     `json:"notes,omitempty"`
}

func isoOrNil(d date.Day, ok bool) *string {
	if !ok {
		return nil
	}
	s := d.ISO()
	return &s
}

func newDateJSON(d date.Date, circa date.Circa) dateJSON {
	sa, su, ea, eu := d.QualifiedEnds()
	j := dateJSON{
		Input:       d.Input,
		EDTF:        d.EDTF(),
		Text:        d.String(),
		Calendar:    d.Calendar().String(),
		Precision:   d.Precision.String(),
		First:       isoOrNil(d.Earliest()),
		Last:        isoOrNil(d.Latest()),
		Approximate: d.Approximate,
		Uncertain:   d.Uncertain,
		Start:       endJSON{sa, su},
		End:         endJSON{ea, eu},
		Notes:       d.Notes(),
	}
	if d.OneOf || len(d.Alternatives) > 1 {
		j.Alternatives = [][2]*string{}
		for _, a := range d.Alternatives {
			j.Alternatives = append(j.Alternatives, [2]*string{isoOrNil(a.First, !a.OpenStart), isoOrNil(a.Last, !a.OpenEnd)})
		}
	}
	if d.Approximate {
		w := d.Widen(circa)
		j.Widened = &[2]*string{isoOrNil(w.Earliest()), isoOrNil(w.Latest())}
		bs, be := d.WidenBy(circa)
		j.WidenedBy = &[2]string{bs.String(), be.String()}
	}
	return j
}

// dayText writes a day, or "open" for an unbounded end.
func dayText(d date.Day, ok bool) string {
	if !ok {
		return "open"
	}
	return d.ISO()
}

func writeDatesText(w io.Writer, ds []date.Date, circa date.Circa) error {
	var b strings.Builder
	for i, d := range ds {
		if i > 0 {
			b.WriteByte('\n')
		}
		row := func(k, v string) { fmt.Fprintf(&b, "  %-12s %s\n", k, v) }
		fmt.Fprintf(&b, "%s\n", d.Input)
		row("EDTF", d.EDTF())
		row("reads as", d.String())
		if cal := d.Calendar(); cal != date.CalendarGregorian {
			row("calendar", cal.String()+", converted to Gregorian days")
		}
		row("first day", dayText(d.Earliest()))
		row("last day", dayText(d.Latest()))
		row("precision", d.Precision.String())
		row("qualifiers", qualifierText(d))
		if d.OneOf || len(d.Alternatives) > 1 {
			for k, a := range d.Alternatives {
				label := ""
				if k == 0 {
					label = "one of"
				}
				if k == maxTextAlternatives && len(d.Alternatives) > maxTextAlternatives+1 {
					row("", fmt.Sprintf("… and %d more (--format json lists them all)", len(d.Alternatives)-k))
					break
				}
				row(label, dayText(a.First, !a.OpenStart)+" to "+dayText(a.Last, !a.OpenEnd))
			}
		}
		if d.Approximate {
			wd := d.Widen(circa)
			f, fok := wd.Earliest()
			l, lok := wd.Latest()
			by := ""
			switch bs, be := d.WidenBy(circa); {
			case bs == be:
				by = bs.String() + " each side"
			case bs == date.Duration{}:
				by = be.String() + " at the end"
			case be == date.Duration{}:
				by = bs.String() + " at the start"
			default:
				by = bs.String() + " at the start, " + be.String() + " at the end"
			}
			row("circa", dayText(f, fok)+" to "+dayText(l, lok)+" (default policy: "+by+")")
		}
		for k, n := range d.Notes() {
			label := ""
			if k == 0 {
				label = "notes"
			}
			row(label, n)
		}
	}
	_, err := io.WriteString(w, b.String())
	return err
}

func qualifierText(d date.Date) string {
	sa, su, ea, eu := d.QualifiedEnds()
	if !d.Approximate && !d.Uncertain {
		return "none"
	}
	end := func(a, u bool) string {
		switch {
		case a && u:
			return "approximate and uncertain"
		case a:
			return "approximate"
		case u:
			return "uncertain"
		}
		return "exact"
	}
	s, e := end(sa, su), end(ea, eu)
	if s == e && !d.OneOf {
		return s
	}
	if d.OneOf {
		q := []string{}
		if d.Approximate {
			q = append(q, "approximate")
		}
		if d.Uncertain {
			q = append(q, "uncertain")
		}
		return strings.Join(q, " and ") + " (some members)"
	}
	return "start " + s + ", end " + e
}
