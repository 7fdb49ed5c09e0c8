package network

import (
	"errors"
	"fmt"
)

// Tier is the strength of a constraint.
type Tier int8

// The tiers, strongest first. Solving at a tier uses every constraint whose
// tier is at most that one.
const (
	Hard Tier = iota
	Firm
	Soft
)

// String returns "hard", "firm" or "soft".
func (t Tier) String() string {
	switch t {
	case Hard:
		return "hard"
	case Firm:
		return "firm"
	case Soft:
		return "soft"
	}
	return fmt.Sprintf("tier(%d)", int8(t))
}

// Inf marks an unbounded side: Lo <= -Inf or Hi >= Inf.
const Inf int64 = 1 << 60

// Limit is the largest magnitude of a finite bound.
const Limit int64 = 1 << 40

// MaxVars is the largest number of variables a network may hold, the
// reference point included.
const MaxVars = 1 << 20

// Var is a variable of a network.
type Var int32

// Zero is the reference point, fixed at 0; every network has it.
const Zero Var = 0

// Alt is one alternative of a constraint: Lo <= To - From <= Hi. With
// From == Zero it bounds To alone.
type Alt struct {
	From, To Var
	Lo, Hi   int64
}

// Constraint is a piece of evidence: at least one of its alternatives holds.
type Constraint struct {
	ID   string
	Tier Tier
	Alts []Alt
}

// Network is a set of variables and constraints. The zero value is not
// ready for use; call [New].
type Network struct {
	names []string
	cons  []Constraint
	ids   map[string]int
	alts  []Alt // backing store of the constraints' alternatives
}

// New returns a network holding only the reference point [Zero].
func New() *Network {
	return &Network{names: []string{"zero"}, ids: map[string]int{}}
}

// AddVar adds a variable and returns it. The name is for people only;
// names need not be unique.
func (n *Network) AddVar(name string) Var {
	n.names = append(n.names, name)
	return Var(len(n.names) - 1)
}

// Name returns the name given to v, "zero" for [Zero], or "" for a
// variable not in the network.
func (n *Network) Name(v Var) string {
	if v < 0 || int(v) >= len(n.names) {
		return ""
	}
	return n.names[v]
}

// Index returns the index of the constraint with the given id: its
// position in the order of Add (and of [Network.Constraints]).
func (n *Network) Index(id string) (int, bool) {
	i, ok := n.ids[id]
	return i, ok
}

// ID returns the id of the constraint of index i, or "" when there is none.
func (n *Network) ID(i int) string {
	if i < 0 || i >= len(n.cons) {
		return ""
	}
	return n.cons[i].ID
}

// IDs returns the ids of the constraints of the given indices, in order.
func (n *Network) IDs(indices []int) []string {
	out := make([]string, len(indices))
	for k, i := range indices {
		out[k] = n.ID(i)
	}
	return out
}

// NumVars returns the number of variables, the reference point included.
func (n *Network) NumVars() int { return len(n.names) }

// NumConstraints returns the number of constraints; their indices are 0 to
// NumConstraints() − 1.
func (n *Network) NumConstraints() int { return len(n.cons) }

// Constraints returns a copy of the constraints in the order they were added.
func (n *Network) Constraints() []Constraint {
	out := make([]Constraint, len(n.cons))
	for i, c := range n.cons {
		c.Alts = append([]Alt(nil), c.Alts...)
		out[i] = c
	}
	return out
}

// ErrLimit reports that a search exceeded [Options.MaxNodes].
var ErrLimit = errors.New("search limit reached")

// ErrInvalid is wrapped by every error of [Network.Add].
var ErrInvalid = errors.New("invalid constraint")

// ConstraintError describes a constraint that [Network.Add] refused.
type ConstraintError struct {
	ID  string // the constraint's id
	Alt int    // index of the offending alternative, or -1
	Msg string // what is wrong and what was expected
}

func (e *ConstraintError) Error() string {
	if e.Alt >= 0 {
		return fmt.Sprintf("constraint %q, alternative %d: %s", e.ID, e.Alt+1, e.Msg)
	}
	return fmt.Sprintf("constraint %q: %s", e.ID, e.Msg)
}

// Unwrap returns [ErrInvalid].
func (e *ConstraintError) Unwrap() error { return ErrInvalid }

// Add adds a constraint and returns its index, the number of constraints
// added before it. It refuses (with a *[ConstraintError], and index -1) an
// empty or duplicate id, a tier other than Hard, Firm or Soft, no
// alternatives, a variable not in the network, an alternative relating a
// variable to itself, Lo > Hi, a finite bound beyond ±[Limit], and a side
// that is infinite the wrong way (Lo >= Inf or Hi <= -Inf). Sides beyond
// ±Inf are stored as ±Inf.
func (n *Network) Add(c Constraint) (int, error) {
	if err := n.add(c); err != nil {
		return -1, err
	}
	return len(n.cons) - 1, nil
}

func (n *Network) add(c Constraint) (err error) {
	bad := func(alt int, format string, args ...any) error {
		return &ConstraintError{ID: c.ID, Alt: alt, Msg: fmt.Sprintf(format, args...)}
	}
	if c.ID == "" {
		return bad(-1, "empty id; give every constraint the id of its evidence")
	}
	if _, dup := n.ids[c.ID]; dup {
		return bad(-1, "duplicate id; ids must be unique within a network")
	}
	if c.Tier < Hard || c.Tier > Soft {
		return bad(-1, "tier %d; expected Hard, Firm or Soft", int8(c.Tier))
	}
	if len(c.Alts) == 0 {
		return bad(-1, "no alternatives; expected at least one")
	}
	if len(n.names) > MaxVars {
		return bad(-1, "network holds %d variables, more than %d", len(n.names), MaxVars)
	}
	// The alternatives are copied into the network's own store (a few
	// constraints share one allocation); a full slice expression keeps
	// each constraint's apart.
	if cap(n.alts)-len(n.alts) < len(c.Alts) {
		n.alts = make([]Alt, 0, max(16, 2*cap(n.alts), len(c.Alts)))
	}
	start := len(n.alts)
	n.alts = n.alts[:start+len(c.Alts)]
	defer func() {
		if err != nil {
			n.alts = n.alts[:start] // a refused constraint leaves nothing
		}
	}()
	alts := n.alts[start : start+len(c.Alts) : start+len(c.Alts)]
	for i, a := range c.Alts {
		for _, v := range [2]Var{a.From, a.To} {
			if v < 0 || int(v) >= len(n.names) {
				return bad(i, "variable %d is not in the network (it has %d variables); create variables with AddVar", v, len(n.names))
			}
		}
		if a.From == a.To {
			return bad(i, "relates variable %q to itself; use distinct From and To", n.names[a.From])
		}
		if a.Lo >= Inf {
			return bad(i, "lower side %d is +Inf; expected a finite value or -Inf", a.Lo)
		}
		if a.Hi <= -Inf {
			return bad(i, "upper side %d is -Inf; expected a finite value or +Inf", a.Hi)
		}
		a.Lo, a.Hi = max(a.Lo, -Inf), min(a.Hi, Inf)
		if a.Lo > -Inf && (a.Lo < -Limit || a.Lo > Limit) {
			return bad(i, "lower side %d is beyond ±%d; use -Inf for no bound", a.Lo, Limit)
		}
		if a.Hi < Inf && (a.Hi < -Limit || a.Hi > Limit) {
			return bad(i, "upper side %d is beyond ±%d; use Inf for no bound", a.Hi, Limit)
		}
		if a.Lo > a.Hi {
			return bad(i, "lower side %d is above upper side %d; swap them or check the evidence", a.Lo, a.Hi)
		}
		alts[i] = a
	}
	c.Alts = alts
	n.ids[c.ID] = len(n.cons)
	n.cons = append(n.cons, c)
	return nil
}
