package constraint

import (
	"context"
	"fmt"
	"strings"

	"terminus/constraint/network"
	"terminus/constraint/wording"
	"terminus/materials"
)

// sensitivity re-solves the case under the other claim of every
// disagreement (the least conservative one) and says whether a verdict or
// the consistency of a tier would change.
func (a *analysis) sensitivity(ctx context.Context, opt Options, res *Result) error {
	for i := range res.Disagreements {
		d := &res.Disagreements[i]
		ov := override{overrideKey(d.Material, materials.Kind(d.Kind), d.Place): len(d.Claims) - 1}
		alt, err := a.run(ctx, opt, ov)
		if err != nil {
			return err
		}
		var changes []string
		for t := range res.Consistent {
			if res.Consistent[t] != alt.Consistent[t] {
				changes = append(changes, fmt.Sprintf("the %s tier would %s", network.Tier(t), map[bool]string{true: "agree", false: "conflict"}[alt.Consistent[t]]))
			}
		}
		for j := range res.Claims {
			if res.Claims[j].Verdict != alt.Claims[j].Verdict {
				changes = append(changes, fmt.Sprintf("claim %s would be %s", res.Claims[j].ID, alt.Claims[j].Verdict))
			}
		}
		latest := d.Claims[len(d.Claims)-1]
		what := "was " + d.Kind // made, sold, withdrawn
		if d.Kind == string(materials.KindArrived) {
			what = "arrived"
		}
		if d.Place != "" {
			what += " in " + a.placeName(d.Place)
		}
		head := "Sources disagree on"
		if d.OneSource {
			head = "One source gives " + wording.Count(len(d.Claims)) + " dates for"
		}
		d.Text = fmt.Sprintf("%s when %s %s: %s. The bound uses %s, the most conservative.", head, d.Name, what, strings.Join(d.Claims, ", "), d.Used)
		if len(changes) == 0 {
			d.Text += fmt.Sprintf(" Under %s no verdict would change.", latest)
		} else {
			d.ChangesVerdict = true
			d.Text += fmt.Sprintf(" Under %s %s.", latest, strings.Join(changes, "; "))
		}
	}
	return nil
}
