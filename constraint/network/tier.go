package network

import (
	"fmt"
	"strings"
)

// Tiers lists the tiers, strongest first.
func Tiers() [3]Tier { return [3]Tier{Hard, Firm, Soft} }

// ParseTier reads a tier's name as [Tier.String] writes it, in any case.
func ParseTier(s string) (Tier, error) {
	for _, t := range Tiers() {
		if strings.EqualFold(s, t.String()) {
			return t, nil
		}
	}
	return 0, fmt.Errorf("unknown tier %q: expected hard, firm or soft", s)
}
