package network

// Options tune [Network.Solve].
type Options struct {
	// MaxConflicts caps the number of conflicts reported; 0 means 10.
	MaxConflicts int
	// MaxNodes caps the number of search nodes of one consistency check or
	// domain computation; 0 means 1,000,000. Beyond it Solve fails with
	// [ErrLimit].
	MaxNodes int
	// MaxWork is the work budget of explaining an inconsistency (see the
	// package documentation for its units and its shares); 0 means
	// [DefaultMaxWork]. Beyond it Solve returns what it has found, marked
	// with [Result.BudgetSpent].
	MaxWork int
}

// DefaultMaxWork is the work budget of explaining an inconsistency when
// [Options.MaxWork] is 0.
const DefaultMaxWork = 200_000

func (o Options) maxConflicts() int {
	if o.MaxConflicts <= 0 {
		return 10
	}
	return o.MaxConflicts
}

func (o Options) maxNodes() int {
	if o.MaxNodes <= 0 {
		return 1_000_000
	}
	return o.MaxNodes
}

func (o Options) maxWork() int {
	if o.MaxWork <= 0 {
		return DefaultMaxWork
	}
	return o.MaxWork
}

// Interval is a closed run of integers; Lo <= -Inf or Hi >= Inf marks an
// unbounded side.
type Interval struct{ Lo, Hi int64 }

// Set is a sorted list of disjoint, non-adjacent intervals.
type Set []Interval

// Contains reports whether x lies in s.
func (s Set) Contains(x int64) bool {
	for _, iv := range s {
		if x < iv.Lo {
			return false
		}
		if x <= iv.Hi {
			return true
		}
	}
	return false
}

// Bound is one end of a window and the indices of the constraints that
// force it, from the reference point to the variable. Value is -Inf or Inf
// when the window is unbounded on that side (Because is then empty).
type Bound struct {
	Value   int64
	Because []int
}

// Result is the outcome of solving a network at one tier. Constraints are
// named by their indices (see [Network.Add]); lists of them that are sets
// are in the order of the constraints' ids.
type Result struct {
	Tier       Tier
	Consistent bool
	// Conflicts holds minimal conflict sets (the list sorted by size,
	// then by ids), at most Options.MaxConflicts.
	Conflicts [][]int
	// ConflictsComplete reports that Conflicts holds every minimal conflict.
	ConflictsComplete bool
	// Correction is a cheapest set of constraints whose removal restores
	// consistency; empty when consistent. When BudgetSpent, it restores
	// consistency but may not be the cheapest, and is empty when the
	// budget did not suffice to find one.
	Correction []int
	// BudgetSpent reports that the work budget (Options.MaxWork) ran out
	// before the cheapest correction was proved. (When the budget cut the
	// list of conflicts short, ConflictsComplete is false.)
	BudgetSpent bool
	// Nodes counts the search nodes (network solves) spent on the domains.
	Nodes int
	// Work counts the work spent explaining an inconsistency, in the units
	// of Options.MaxWork.
	Work int

	domains  []Set
	earliest []Bound
	latest   []Bound
}

// Domain returns the exact set of values of v over all solutions; it is
// empty when the network is inconsistent or v is not in it.
func (r *Result) Domain(v Var) Set {
	if v < 0 || int(v) >= len(r.domains) {
		return nil
	}
	return r.domains[v]
}

// Earliest returns the least value of v and its explanation. When the
// network is inconsistent or v is not in it, Value is Inf (the minimum of
// an empty set).
func (r *Result) Earliest(v Var) Bound {
	if v < 0 || int(v) >= len(r.earliest) {
		return Bound{Value: Inf}
	}
	return r.earliest[v]
}

// Latest returns the greatest value of v and its explanation. When the
// network is inconsistent or v is not in it, Value is -Inf.
func (r *Result) Latest(v Var) Bound {
	if v < 0 || int(v) >= len(r.latest) {
		return Bound{Value: -Inf}
	}
	return r.latest[v]
}

// cost of removing a constraint of a tier from a correction.
func cost(t Tier) int64 {
	switch t {
	case Soft:
		return 1
	case Firm:
		return 1_000
	}
	return 1_000_000
}
