package cli

import (
	"fmt"
	"io"
	"slices"
	"strings"
	"text/tabwriter"

	"github.com/spf13/cobra"

	"terminus/materials"
)

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
