package cli

import (
	"fmt"
	"io"
	"strings"
	"text/tabwriter"

	"github.com/spf13/cobra"

	"terminus/materials"
)

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
	if len(g.Members) == 1 {
		fmt.Fprintf(&b, "%s is a %s: a finding that names it is read as this one material (the only one in the dataset that carries it)\n\n", g.Name, g.Kind)
	} else {
		fmt.Fprintf(&b, "%s is a %s: a finding that names it is read as any of these %d materials, bounded by the earliest\n\n", g.Name, g.Kind, len(g.Members))
	}
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
