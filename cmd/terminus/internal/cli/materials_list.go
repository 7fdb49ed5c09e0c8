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
	"terminus/materials"
)

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
