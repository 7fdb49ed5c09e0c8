package cli

import (
	"encoding/csv"
	"encoding/json"
	"fmt"
	"io"
	"slices"
	"strings"
	"text/tabwriter"

	"github.com/spf13/cobra"

	"terminus/constraint/date"
	"terminus/constraint/wording"
	"terminus/materials"
)

// NewMaterialsCmd builds "terminus materials" and its subcommands.
func NewMaterialsCmd(s IO) *cobra.Command {
	var files []string
	cmd := &cobra.Command{
		Use:   "materials",
		Short: "List, show, lint and count the materials dataset",
		Long: `Work with the dataset of dated materials that terminus reasons from.

Every milestone of a material (made, sold, arrived, withdrawn) names its
source; 'show' prints each with its full citation. --materials FILE adds a
file of your own over the built-in set (an entry with the same id replaces
the built-in one); it may be given several times.`,
		Args: cobra.NoArgs,
		RunE: func(c *cobra.Command, _ []string) error { return c.Help() },
	}
	cmd.PersistentFlags().StringArrayVar(&files, "materials", nil, "a materials file (YAML or TOML) to add over the built-in dataset; repeatable")
	load := func() (*materials.Dataset, error) {
		ds, notes, err := datasetWith(files)
		if err != nil {
			return nil, usageError(err)
		}
		for _, n := range notes {
			fmt.Fprintf(s.Err, "terminus: note: %s\n", n)
		}
		return ds, nil
	}
	cmd.AddCommand(
		newMaterialsListCmd(s, load),
		newMaterialsShowCmd(s, load),
		newMaterialsSourcesCmd(s, load),
		newMaterialsLintCmd(s, &files),
		newMaterialsStatsCmd(s, load),
	)
	return cmd
}

type datasetLoader func() (*materials.Dataset, error)

// listFilter is what 'materials list' keeps.
type listFilter struct {
	classes, origins      []string
	madeBefore, madeAfter string
	place                 string
	before, after         date.Day
	hasBefore, hasAfter   bool
}

func (f *listFilter) prepare(ds *materials.Dataset) error {
	for _, c := range f.classes {
		if !slices.Contains(materials.Classes(), c) {
			return fmt.Errorf("unknown --class %q: expected one of %s", c, strings.Join(materials.Classes(), ", "))
		}
	}
	for _, o := range f.origins {
		if !slices.Contains(materials.Origins(), o) {
			return fmt.Errorf("unknown --origin %q: expected one of %s", o, strings.Join(materials.Origins(), ", "))
		}
	}
	if f.madeBefore != "" {
		d, err := date.Parse(f.madeBefore)
		if err != nil {
			return fmt.Errorf("--made-before: %w", err)
		}
		var ok bool
		if f.before, ok = d.Earliest(); !ok {
			return fmt.Errorf("--made-before %q has no first day: give a year such as 1850", f.madeBefore)
		}
		f.hasBefore = true
	}
	if f.madeAfter != "" {
		d, err := date.Parse(f.madeAfter)
		if err != nil {
			return fmt.Errorf("--made-after: %w", err)
		}
		var ok bool
		if f.after, ok = d.Latest(); !ok {
			return fmt.Errorf("--made-after %q has no last day: give a year such as 1850", f.madeAfter)
		}
		f.hasAfter = true
	}
	if f.place != "" && !ds.Regions.Valid(f.place) {
		return &placeError{f.place, ds.Regions.Suggest(f.place)}
	}
	return nil
}

// placeError is an unknown --place.
type placeError struct {
	code    string
	suggest []string
}

func (e *placeError) Error() string {
	return fmt.Sprintf("unknown --place %q: expected an ISO 3166-1 alpha-2 code (NL) or a UN M49 area code (155)", e.code)
}

func (e *placeError) Hint() string {
	if len(e.suggest) == 0 {
		return ""
	}
	return "did you mean " + strings.Join(e.suggest, ", ") + "?"
}

// firstMade is the first day of a material's earliest made claim.
func firstMade(m *materials.Material) (date.Day, bool) {
	var best date.Day
	found := false
	for _, ms := range m.Claims(materials.KindMade, "") {
		if d, ok := ms.Date.Earliest(); ok && (!found || d < best) {
			best, found = d, true
		}
	}
	return best, found
}

func (f *listFilter) keep(ds *materials.Dataset, m *materials.Material) bool {
	if len(f.classes) > 0 && !slices.Contains(f.classes, m.Class) {
		return false
	}
	if len(f.origins) > 0 && !slices.Contains(f.origins, m.Origin) {
		return false
	}
	if f.hasBefore || f.hasAfter {
		d, ok := firstMade(m)
		if !ok || (f.hasBefore && d >= f.before) || (f.hasAfter && d <= f.after) {
			return false
		}
	}
	if f.place != "" {
		if c, _ := ds.Arrival(m, f.place); len(c) == 0 {
			return false
		}
	}
	return true
}

func newMaterialsListCmd(s IO, load datasetLoader) *cobra.Command {
	var f listFilter
	var format string
	cmd := &cobra.Command{
		Use:   "list",
		Short: "List the materials, by class, origin, date of making or place",
		Long: `List the materials of the dataset.

--made-before Y keeps materials whose earliest made claim begins before Y;
--made-after Y those whose earliest made claim begins after Y ends.
--place P keeps materials with an arrival for P or an area that holds it,
and shows that arrival.`,
		Example: `  terminus materials list --class pigment --made-before 1800
  terminus materials list --place JP --format csv
  terminus materials list --format json --materials examples/own-materials.yaml`,
		Args: cobra.NoArgs,
		RunE: func(c *cobra.Command, _ []string) error {
			ds, err := load()
			if err != nil {
				return err
			}
			if err := f.prepare(ds); err != nil {
				return usageError(err)
			}
			var ms []*materials.Material
			for _, m := range ds.Materials {
				if f.keep(ds, m) {
					ms = append(ms, m)
				}
			}
			switch format {
			case "text", "":
				return listText(s.Out, ds, ms, f.place)
			case "json":
				return writeJSON(s.Out, materialsJSON(ms))
			case "csv":
				return listCSV(s.Out, ds, ms, f.place)
			}
			return usageError(fmt.Errorf("unknown --format %q: expected text, json or csv", format))
		},
	}
	fl := cmd.Flags()
	fl.StringSliceVar(&f.classes, "class", nil, "keep these classes ("+strings.Join(materials.Classes(), ", ")+"); repeatable or comma-separated")
	fl.StringSliceVar(&f.origins, "origin", nil, "keep these origins ("+strings.Join(materials.Origins(), ", ")+")")
	fl.StringVar(&f.madeBefore, "made-before", "", "keep materials first made before this date (a year or EDTF)")
	fl.StringVar(&f.madeAfter, "made-after", "", "keep materials first made after this date")
	fl.StringVar(&f.place, "place", "", "keep materials with an arrival for this place (NL, JP, 155, …)")
	fl.StringVarP(&format, "format", "f", "text", "output format: text, json or csv")
	return cmd
}

// claimsText joins the EDTF dates of claims: "1704, 1706".
func claimsText(claims []materials.Milestone) string {
	var out []string
	for _, c := range claims {
		if e := c.Date.EDTF(); !slices.Contains(out, e) {
			out = append(out, e)
		}
	}
	return strings.Join(out, ", ")
}

func arrivalText(ds *materials.Dataset, m *materials.Material, place string) string {
	claims, area := ds.Arrival(m, place)
	if len(claims) == 0 {
		return ""
	}
	return claimsText(claims) + " (" + area + ")"
}

func listText(w io.Writer, ds *materials.Dataset, ms []*materials.Material, place string) error {
	tw := tabwriter.NewWriter(w, 0, 4, 2, ' ', 0)
	head := "ID\tCLASS\tORIGIN\tMADE\tSOLD"
	if place != "" {
		head += "\tARRIVED " + place
	}
	fmt.Fprintln(tw, head+"\tNAME")
	for _, m := range ms {
		row := []string{m.ID, m.Class, m.Origin,
			dash(claimsText(m.Claims(materials.KindMade, ""))), dash(claimsText(m.Claims(materials.KindSold, "")))}
		if place != "" {
			row = append(row, arrivalText(ds, m, place))
		}
		row = append(row, m.Name())
		fmt.Fprintln(tw, strings.Join(row, "\t"))
	}
	if err := tw.Flush(); err != nil {
		return err
	}
	_, err := fmt.Fprintf(w, "%d of %d materials\n", len(ms), len(ds.Materials))
	return err
}

func dash(s string) string {
	if s == "" {
		return "-"
	}
	return s
}

func listCSV(w io.Writer, ds *materials.Dataset, ms []*materials.Material, place string) error {
	cw := csv.NewWriter(w)
	head := []string{"id", "names", "class", "origin", "colour_index_name", "colour_index_number", "cas", "formula", "made", "sold", "withdrawn"}
	if place != "" {
		head = append(head, "arrived_"+place)
	}
	if err := cw.Write(head); err != nil {
		return err
	}
	for _, m := range ms {
		var ciName, ciNum string
		if m.ColourIndex != nil {
			ciName, ciNum = m.ColourIndex.Name, m.ColourIndex.Number
		}
		row := []string{m.ID, strings.Join(m.Names, "; "), m.Class, m.Origin, ciName, ciNum, m.CAS, m.Formula,
			claimsText(m.Claims(materials.KindMade, "")), claimsText(m.Claims(materials.KindSold, "")),
			claimsText(m.Claims(materials.KindWithdrawn, ""))}
		if place != "" {
			row = append(row, arrivalText(ds, m, place))
		}
		if err := cw.Write(row); err != nil {
			return err
		}
	}
	cw.Flush()
	return cw.Error()
}

// The JSON shapes use the schema's field names.
type materialJSON struct {
	ID          string           `json:"id"`
	Names       []string         `json:"names"`
	Class       string           `json:"class"`
	Origin      string           `json:"origin"`
	ColourIndex *colourIndexJSON `json:"colour_index"`
	CAS         *string          `json:"cas"`
	Formula     *string          `json:"formula"`
	Note        *string          `json:"note"`
	Markers     []string         `json:"markers,omitempty"`
	Families    []string         `json:"families,omitempty"`
	Milestones  []milestoneJSON  `json:"milestones"`
}

type colourIndexJSON struct {
	Name   string `json:"name"`
	Number string `json:"number"`
}

type milestoneJSON struct {
	Kind      string  `json:"kind"`
	Date      string  `json:"date"`
	Place     *string `json:"place"`
	Source    string  `json:"source"`
	Basis     string  `json:"basis"`
	Note      string  `json:"note,omitempty"`
	Allowance string  `json:"allowance,omitempty"`
	Object    string  `json:"object,omitempty"`
}

func optional(s string) *string {
	if s == "" {
		return nil
	}
	return &s
}

func materialJSONOf(m *materials.Material) materialJSON {
	out := materialJSON{ID: m.ID, Names: m.Names, Class: m.Class, Origin: m.Origin,
		CAS: optional(m.CAS), Formula: optional(m.Formula), Note: optional(m.Note), Markers: m.Markers, Families: m.Families,
		Milestones: []milestoneJSON{}}
	if out.Names == nil {
		out.Names = []string{}
	}
	if ci := m.ColourIndex; ci != nil {
		out.ColourIndex = &colourIndexJSON{ci.Name, ci.Number}
	}
	for _, ms := range m.Milestones {
		j := milestoneJSON{Kind: string(ms.Kind), Date: ms.Date.EDTF(), Place: optional(ms.Place),
			Source: ms.Source, Basis: string(ms.Basis), Note: ms.Note, Object: ms.Object}
		if ms.Allowance != nil {
			j.Allowance = ms.Allowance.String()
		}
		out.Milestones = append(out.Milestones, j)
	}
	return out
}

func materialsJSON(ms []*materials.Material) []materialJSON {
	out := make([]materialJSON, 0, len(ms))
	for _, m := range ms {
		out = append(out, materialJSONOf(m))
	}
	return out
}

func writeJSON(w io.Writer, v any) error {
	enc := json.NewEncoder(w)
	enc.SetIndent("", "  ")
	enc.SetEscapeHTML(false)
	return enc.Encode(v)
}

func newMaterialsShowCmd(s IO, load datasetLoader) *cobra.Command {
	var format, place string
	cmd := &cobra.Command{
		Use:   "show NAME",
		Short: "Show a material with every milestone and its full source",
		Long: `Show one material: its names, Colour Index and CAS numbers, and every
milestone with its date, place, basis and the full citation of its source.
NAME is an id, any name, a Colour Index name or number, or a CAS RN; case,
accents, hyphens and spaces do not count. A marker (a compound an analysis
finds, such as carminic acid) or a family (a trade name for several
materials, such as carbon black) lists the materials it stands for: a
finding that names it is read as any of them.`,
		Example: `  terminus materials show "Prussian blue"
  terminus materials show PB27 --place JP
  terminus materials show "carminic acid"`,
		Args: cobra.MinimumNArgs(1),
		RunE: func(c *cobra.Command, args []string) error {
			ds, err := load()
			if err != nil {
				return err
			}
			name := strings.Join(args, " ")
			r, err := ds.Resolve(name)
			if err != nil {
				return usageError(err)
			}
			if place != "" && !ds.Regions.Valid(place) {
				return usageError(&placeError{place, ds.Regions.Suggest(place)})
			}
			switch format {
			case "text", "":
				if r.Group != nil {
					return showGroupText(s.Out, r.Group)
				}
				return showText(s.Out, ds, r.Materials[0], place)
			case "json":
				if r.Group != nil {
					return writeJSON(s.Out, groupJSON{Group: r.Group.Name, Kind: string(r.Group.Kind), Materials: materialsJSON(r.Materials)})
				}
				return writeJSON(s.Out, materialJSONOf(r.Materials[0]))
			}
			return usageError(fmt.Errorf("unknown --format %q: expected text or json", format))
		},
	}
	cmd.Flags().StringVarP(&format, "format", "f", "text", "output format: text or json")
	cmd.Flags().StringVar(&place, "place", "", "also say which arrival applies to this place")
	return cmd
}

// groupJSON is a marker or family and the materials it stands for.
type groupJSON struct {
	Group     string         `json:"group"`
	Kind      string         `json:"kind"`
	Materials []materialJSON `json:"materials"`
}

// showGroupText lists the materials a marker or family stands for, each
// with its earliest made and sold dates.
func showGroupText(w io.Writer, g *materials.Group) error {
	var b strings.Builder
	fmt.Fprintf(&b, "%s is a %s: a finding that names it is read as any of these %d materials, bounded by the earliest\n\n", g.Name, g.Kind, len(g.Members))
	tw := tabwriter.NewWriter(&b, 0, 4, 2, ' ', 0)
	fmt.Fprintln(tw, "  id\tname\tmade\tsold")
	for _, m := range g.Members {
		fmt.Fprintf(tw, "  %s\t%s\t%s\t%s\n", m.ID, m.Name(), claimsText(m.Claims(materials.KindMade, "")), claimsText(m.Claims(materials.KindSold, "")))
	}
	if err := tw.Flush(); err != nil {
		return err
	}
	b.WriteString("\n'terminus materials show ID' shows one of them with its sources.\n")
	_, err := io.WriteString(w, b.String())
	return err
}

func showText(w io.Writer, ds *materials.Dataset, m *materials.Material, place string) error {
	var b strings.Builder
	fmt.Fprintf(&b, "%s (%s)\n", m.Name(), m.ID)
	if len(m.Names) > 1 {
		fmt.Fprintf(&b, "  also known as  %s\n", strings.Join(m.Names[1:], "; "))
	}
	fmt.Fprintf(&b, "  class          %s, %s\n", m.Class, m.Origin)
	if ci := m.ColourIndex; ci != nil {
		fmt.Fprintf(&b, "  Colour Index   %s\n", strings.TrimSpace(strings.Join([]string{ci.Name, ci.Number}, " ")))
	}
	if m.CAS != "" {
		fmt.Fprintf(&b, "  CAS RN         %s\n", m.CAS)
	}
	if m.Formula != "" {
		fmt.Fprintf(&b, "  formula        %s\n", m.Formula)
	}
	if len(m.Markers) > 0 {
		fmt.Fprintf(&b, "  markers        %s\n", strings.Join(m.Markers, "; "))
	}
	if len(m.Families) > 0 {
		fmt.Fprintf(&b, "  families       %s\n", strings.Join(m.Families, "; "))
	}
	if m.Note != "" {
		fmt.Fprintf(&b, "  note           %s\n", m.Note)
	}
	fmt.Fprintf(&b, "  defined at     %s:%d\n", m.File, m.Line)
	fmt.Fprintf(&b, "\nmilestones (%d)\n", len(m.Milestones))
	for _, k := range materials.Kinds() {
		for _, ms := range m.Claims(k, "") {
			where := ""
			if ms.Place != "" {
				where = " in " + ms.Place
				if n := ds.Regions.Name(ms.Place); n != "" {
					where += " (" + n + ")"
				}
			}
			when := ms.Date.EDTF()
			if people := ms.Date.String(); people != when {
				when += " (" + people + ")"
			}
			fmt.Fprintf(&b, "  %-9s  %s%s  [%s]\n", ms.Kind, when, where, ms.Basis)
			if ms.Object != "" {
				fmt.Fprintf(&b, "             in %s\n", ms.Object)
			}
			if ms.Allowance != nil {
				fmt.Fprintf(&b, "             stocks may have lasted %s more\n", ms.Allowance.String())
			}
			if ms.Note != "" {
				fmt.Fprintf(&b, "             %s\n", ms.Note)
			}
			if src, ok := ds.Source(ms.Source); ok {
				fmt.Fprintf(&b, "             source %s: %s\n", src.Key, src.Cite)
				if src.URL != "" {
					fmt.Fprintf(&b, "             %s\n", src.URL)
				}
			} else {
				fmt.Fprintf(&b, "             source %s (not in the bibliography)\n", ms.Source)
			}
		}
	}
	if place != "" {
		claims, area := ds.Arrival(m, place)
		if len(claims) == 0 {
			fmt.Fprintf(&b, "\nno arrival recorded for %s or an area holding it\n", place)
		} else {
			fmt.Fprintf(&b, "\nfor %s the arrival of %s (%s) applies: %s\n", place, area, ds.Regions.Name(area), claimsText(claims))
		}
	}
	_, err := io.WriteString(w, b.String())
	return err
}

func newMaterialsSourcesCmd(s IO, load datasetLoader) *cobra.Command {
	var format string
	cmd := &cobra.Command{
		Use:   "sources",
		Short: "List the bibliography: each source and how many milestones cite it",
		Args:  cobra.NoArgs,
		RunE: func(c *cobra.Command, _ []string) error {
			ds, err := load()
			if err != nil {
				return err
			}
			cited := map[string]int{}
			for _, m := range ds.Materials {
				for _, ms := range m.Milestones {
					cited[ms.Source]++
				}
			}
			srcs := slices.Clone(ds.Sources)
			slices.SortFunc(srcs, func(a, b materials.Source) int { return strings.Compare(a.Key, b.Key) })
			switch format {
			case "text", "":
				var b strings.Builder
				for _, src := range srcs {
					fmt.Fprintf(&b, "%s  (%d %s)\n    %s\n", src.Key, cited[src.Key], wording.Plural(cited[src.Key], "milestone", "milestones"), src.Cite)
					if src.URL != "" {
						fmt.Fprintf(&b, "    %s\n", src.URL)
					}
				}
				fmt.Fprintf(&b, "%d sources\n", len(srcs))
				_, err := io.WriteString(s.Out, b.String())
				return err
			case "json":
				type sourceJSON struct {
					Key   string  `json:"key"`
					Cite  string  `json:"cite"`
					URL   *string `json:"url"`
					Cited int     `json:"cited"`
				}
				out := make([]sourceJSON, 0, len(srcs))
				for _, src := range srcs {
					out = append(out, sourceJSON{src.Key, src.Cite, optional(src.URL), cited[src.Key]})
				}
				return writeJSON(s.Out, out)
			}
			return usageError(fmt.Errorf("unknown --format %q: expected text or json", format))
		},
	}
	cmd.Flags().StringVarP(&format, "format", "f", "text", "output format: text or json")
	return cmd
}

func newMaterialsLintCmd(s IO, overlays *[]string) *cobra.Command {
	return &cobra.Command{
		Use:   "lint FILE...",
		Short: "Check materials files: schema, dates, sources, order of milestones",
		Long: `Check materials files as one set: the schema (unknown keys, bad dates,
unknown places, kinds and bases), every milestone citing a source that
exists (in the files, the built-in bibliography or a --materials file),
every source of the files cited, no name shared by two materials, and
milestones in a possible order (sold not before made, withdrawn not
before sold). Prints each problem with its file and line, then the counts
of documented and from-memory milestones. Exit status 1 when there are
problems.`,
		Example: `  terminus materials lint examples/own-materials.yaml
  terminus materials lint materials/data/*.yaml`,
		Args: cobra.MinimumNArgs(1),
		RunE: func(c *cobra.Command, args []string) error {
			// Sources the files cite may come from the built-in set and any
			// --materials files; if those do not load, the files stand alone.
			base, _, err := datasetWith(*overlays)
			if err != nil {
				base = nil
			}
			d, problems, err := materials.LintFiles(base, args...)
			if err != nil {
				return usageError(err)
			}
			var b strings.Builder
			for _, p := range problems {
				fmt.Fprintf(&b, "%s\n", p)
			}
			if d != nil {
				st := d.Stats()
				fmt.Fprintf(&b, "%d %s, %d %s, %d %s: %d documented, %d from memory\n",
					len(args), wording.Plural(len(args), "file", "files"),
					st.Materials, wording.Plural(st.Materials, "material", "materials"),
					st.Milestones, wording.Plural(st.Milestones, "milestone", "milestones"),
					st.Documented, st.FromMemory)
			}
			if len(problems) > 0 {
				fmt.Fprintf(&b, "%d %s\n", len(problems), wording.Plural(len(problems), "problem", "problems"))
			} else {
				b.WriteString("no problems\n")
			}
			if _, err := io.WriteString(s.Out, b.String()); err != nil {
				return err
			}
			if len(problems) > 0 {
				return &ExitError{Code: 1}
			}
			return nil
		},
	}
}

func newMaterialsStatsCmd(s IO, load datasetLoader) *cobra.Command {
	var format string
	cmd := &cobra.Command{
		Use:   "stats",
		Short: "Count materials, milestones, sources and how well documented",
		Args:  cobra.NoArgs,
		RunE: func(c *cobra.Command, _ []string) error {
			ds, err := load()
			if err != nil {
				return err
			}
			st := ds.Stats()
			switch format {
			case "text", "":
				return statsText(s.Out, ds, st)
			case "json":
				return writeJSON(s.Out, statsJSONOf(ds, st))
			}
			return usageError(fmt.Errorf("unknown --format %q: expected text or json", format))
		},
	}
	cmd.Flags().StringVarP(&format, "format", "f", "text", "output format: text or json")
	return cmd
}

// counts lists a count map as "a 3, b 2", largest first, then by name.
func counts[K ~string](m map[K]int, name func(K) string) string {
	keys := make([]K, 0, len(m))
	for k := range m {
		keys = append(keys, k)
	}
	slices.SortFunc(keys, func(a, b K) int {
		if m[a] != m[b] {
			return m[b] - m[a]
		}
		return strings.Compare(string(a), string(b))
	})
	parts := make([]string, len(keys))
	for i, k := range keys {
		parts[i] = fmt.Sprintf("%s %d", name(k), m[k])
	}
	if len(parts) == 0 {
		return "-"
	}
	return strings.Join(parts, ", ")
}

func percent(x float64) string { return fmt.Sprintf("%.1f%%", 100*x) }

func statsText(w io.Writer, ds *materials.Dataset, st materials.Stats) error {
	plain := func(k string) string { return k }
	region := func(k string) string {
		if n := ds.Regions.Name(k); n != "" {
			return n + " (" + k + ")"
		}
		return k
	}
	tw := tabwriter.NewWriter(w, 0, 4, 2, ' ', 0)
	fmt.Fprintf(tw, "dataset\t%s (sha256 %s)\n", ds.Version, ds.SHA256)
	fmt.Fprintf(tw, "materials\t%d\n", st.Materials)
	fmt.Fprintf(tw, "  by class\t%s\n", counts(st.ByClass, plain))
	fmt.Fprintf(tw, "  by origin\t%s\n", counts(st.ByOrigin, plain))
	fmt.Fprintf(tw, "milestones\t%d\n", st.Milestones)
	fmt.Fprintf(tw, "  by kind\t%s\n", counts(st.ByKind, func(k materials.Kind) string { return string(k) }))
	fmt.Fprintf(tw, "  documented\t%d (%s)\n", st.Documented, percent(st.DocumentedShare()))
	fromMemory := 0.0
	if st.Milestones > 0 {
		fromMemory = float64(st.FromMemory) / float64(st.Milestones)
	}
	fmt.Fprintf(tw, "  from memory\t%d (%s)\n", st.FromMemory, percent(fromMemory))
	fmt.Fprintf(tw, "  documented with page or section\t%d (%s of documented, %s of all milestones)\n", st.DocumentedLocated, percent(st.LocatedShare()), percent(float64(st.DocumentedLocated)/float64(max(st.Milestones, 1))))
	fmt.Fprintf(tw, "arrived\t%d in %d places\n", st.ByKind[materials.KindArrived], len(st.ArrivedByPlace))
	fmt.Fprintf(tw, "  by region\t%s\n", counts(st.ArrivedByRegion, region))
	fmt.Fprintf(tw, "  by place\t%s\n", counts(st.ArrivedByPlace, plain))
	fmt.Fprintf(tw, "withdrawn\t%d\n", st.Withdrawn)
	fmt.Fprintf(tw, "attested\t%d, of %d materials\n", st.Attested, st.AttestedMaterials)
	fmt.Fprintf(tw, "markers and families\t%d markers, %d families\n", st.Markers, st.Families)
	fmt.Fprintf(tw, "milestones by kind of source\t%s\n", counts(st.BySourceClass, plain))
	fmt.Fprintf(tw, "  resting on a weak source alone\t%d (company, news, blog, forum, shop or other web page, with no stronger source beside it)\n", st.WeakAlone)
	fmt.Fprintf(tw, "materials with disagreeing claims\t%d\n", st.Disagreeing)
	fmt.Fprintf(tw, "sources\t%d (%d cited)\n", st.Sources, st.SourcesCited)
	return tw.Flush()
}

type statsJSON struct {
	SchemaVersion     int            `json:"schema_version"`
	Dataset           map[string]any `json:"dataset"`
	Materials         int            `json:"materials"`
	ByClass           map[string]int `json:"by_class"`
	ByOrigin          map[string]int `json:"by_origin"`
	Milestones        int            `json:"milestones"`
	ByKind            map[string]int `json:"by_kind"`
	Documented        int            `json:"documented"`
	FromMemory        int            `json:"from_memory"`
	DocumentedShare   float64        `json:"documented_share"`
	DocumentedLocated int            `json:"documented_with_page_or_section"`
	LocatedShare      float64        `json:"located_share_of_documented"`
	ArrivedByRegion   map[string]int `json:"arrived_by_region"`
	ArrivedByPlace    map[string]int `json:"arrived_by_place"`
	Withdrawn         int            `json:"withdrawn"`
	Attested          int            `json:"attested"`
	AttestedMaterials int            `json:"attested_materials"`
	Markers           int            `json:"markers"`
	Families          int            `json:"families"`
	BySourceClass     map[string]int `json:"milestones_by_source_class"`
	WeakAlone         int            `json:"milestones_on_a_weak_source_alone"`
	Disagreeing       int            `json:"materials_with_disagreeing_claims"`
	Sources           int            `json:"sources"`
	SourcesCited      int            `json:"sources_cited"`
}

func statsJSONOf(ds *materials.Dataset, st materials.Stats) statsJSON {
	byKind := map[string]int{}
	for k, v := range st.ByKind {
		byKind[string(k)] = v
	}
	return statsJSON{
		SchemaVersion: 1,
		Dataset:       map[string]any{"version": ds.Version, "sha256": ds.SHA256, "files": ds.Files},
		Materials:     st.Materials, ByClass: st.ByClass, ByOrigin: st.ByOrigin,
		Milestones: st.Milestones, ByKind: byKind,
		Documented: st.Documented, FromMemory: st.FromMemory, DocumentedShare: st.DocumentedShare(),
		DocumentedLocated: st.DocumentedLocated, LocatedShare: st.LocatedShare(),
		ArrivedByRegion: st.ArrivedByRegion, ArrivedByPlace: st.ArrivedByPlace,
		Withdrawn: st.Withdrawn, Attested: st.Attested, AttestedMaterials: st.AttestedMaterials,
		Markers: st.Markers, Families: st.Families, BySourceClass: st.BySourceClass, WeakAlone: st.WeakAlone,
		Disagreeing: st.Disagreeing,
		Sources:     st.Sources, SourcesCited: st.SourcesCited,
	}
}
