// Package network solves interval networks over time points: a simple
// temporal network with disjunctions (a temporal constraint satisfaction
// problem in the sense of Dechter, Meiri and Pearl, "Temporal constraint
// networks", Artificial Intelligence 49, 1991). It knows nothing of dates
// or materials; callers translate their evidence into it.
//
// # Model
//
// A [Network] holds integer variables (time points, in whatever unit the
// caller chooses) and a reference point [Zero] fixed at 0. A [Constraint]
// has an id, a strength [Tier] and one or more alternatives; an [Alt]
// {From, To, Lo, Hi} means Lo <= To - From <= Hi, and with From == Zero it
// is a unary bound Lo <= To <= Hi. A side at or beyond [Inf] (or -Inf) is
// unbounded. A constraint with several alternatives holds when at least one
// of them holds (a disjunction).
//
// [Network.Add] returns the constraint's index: constraints are numbered
// from 0 in the order they were added, and every result names constraints
// by these indices. The ids are for people: [Network.ID] and
// [Network.IDs] give them back, and they break ties, so that results do
// not depend on the order of Add.
//
// [Network.Solve] uses every constraint whose tier is at most the requested
// one, so the windows of the tiers nest: soft within firm within hard.
// Solve only reads the network, so several goroutines may solve one network
// at once; [Network.Add] must not run alongside them.
//
// # Results
//
// For a consistent network, [Result.Domain] is the exact projection of the
// set of integer solutions on each variable, a sorted union of disjoint
// intervals; [Result.Earliest] and [Result.Latest] are its ends, each with
// the constraints that force it, in order from the reference point to the
// variable: the shortest path of the distance graph that yields the bound
// (for a chain Zero → a → b: the bound on a, then the step from a to b). A
// disjunction is named when its chosen alternative lies on that path, and
// a one-of set by the constraint that sets the end of its run. Among
// equally tight paths of one scenario the one with fewer steps wins, then
// the one whose last step has the smaller constraint id; between scenarios
// that give the same bound the first found is kept (a later, shorter one
// may replace it). Results are deterministic. Because slices may share
// storage with each other; treat them as read-only.
//
// For an inconsistent network the domains are empty, and
// [Result.Conflicts] lists minimal conflict sets (inconsistent, and every
// proper subset consistent), found with QuickXplain (U. Junker,
// "QuickXplain: preferred explanations and relaxations for
// over-constrained problems", AAAI 2004), started on the constraints of a
// negative cycle where there is one, and completed by hitting-set duality
// (R. Reiter, "A theory of diagnosis from first principles", Artificial
// Intelligence 32, 1987): the list is complete when the complement of
// every minimal hitting set of the conflicts found is consistent, which
// [Result.ConflictsComplete] reports. [Result.Correction] is a cheapest set
// of constraints whose removal restores consistency: a minimum-cost
// hitting set of all conflicts (costs soft 1, firm 1,000, hard 1,000,000;
// among sets of one cost, the one whose ids sort first), found by an
// implicit hitting-set loop that adds conflicts until the cheapest hitting
// set leaves a consistent network, so it is exact even when the reported
// list is capped. The cheapest hitting set is found by branch and bound:
// each branch takes one member of the first conflict not yet hit and sets
// aside the members tried before it, and a branch is cut when its cost
// plus a lower bound (the cheapest member of each of a run of disjoint
// conflicts not yet hit) passes the best found.
//
// # Method
//
// Constraints whose alternatives all bound the same single variable are
// merged, without branching, into an interval set on that variable (the
// intersection of the unions); a variable no binary constraint reaches has
// that set as its domain. Variables linked by binary constraints form
// components that are solved apart. A component without a choice left is
// a simple temporal network: a feasible potential is computed with the
// Goldberg–Radzik label-correcting method (A. V. Goldberg and T. Radzik,
// Applied Mathematics Letters 6, 1993), with parent-graph cycle checks to
// find negative cycles, then the bounds from and to the reference point by
// Dijkstra's method on reduced costs, keeping the shortest-path trees for
// the explanations. [Network.SolveTiers] gives the three tiers' results
// at once; for a network of unary bounds alone it cuts each variable's set
// tier after tier instead of starting again.
//
// The choices are the binary (or mixed) disjunctions and the gappy interval
// sets of linked variables. The search is depth first. At every node it
// has the bounds of the choices made so far (solved, or carried from the
// parent by label correcting), drops the alternatives the bounds exclude,
// drops a choice the bounds already satisfy, and looks one alternative
// ahead: it propagates the bounds of every alternative of every open
// choice, drops those that fail and fixes a choice left with one. A node is
// pruned when every variable's values there, its window cut by the union
// over each open choice's alternatives of the windows they lead to, lie
// inside the union already found, since deeper choices only narrow them.
// Before branching the node dives: it fixes every open choice to its first
// alternative and solves that scenario at once, which often covers what
// was missing and lets the node be pruned. Otherwise it branches on a
// choice that moves a window still uncovered. The domains are the union of
// the windows of the consistent leaves.
//
// # Limits
//
// Consistency of disjunctive networks is NP-complete: with k choices of at
// most a alternatives the search may take O(a^k) nodes, each costing about
// one network solve. [Options.MaxNodes] caps every search, and Solve then
// fails with [ErrLimit] rather than return an inexact answer. Finite bounds
// must lie within ±[Limit] and a network may hold at most [MaxVars]
// variables, so that no path length overflows int64.
//
// Explaining an inconsistency is exponential at worst too: forty records of
// one object, each one of two hundred years, the even and the odd years in
// turn, make four hundred conflicts of two, and the minimal hitting sets
// and cheapest corrections of random one-of sets grow faster still. So an
// explanation has a work budget, [Options.MaxWork]: 0 means
// [DefaultMaxWork], 200,000 units, and a caller that wants more (or less)
// sets another positive value. A unit is one consistency check, one search
// node inside a check, one node of the search for a cheapest hitting set,
// or one candidate set of the enumeration of minimal hitting sets (and one
// per 64 sets a candidate is compared with). The first conflict may use the
// whole budget; the search for more conflicts stops when half of the budget
// is spent (ConflictsComplete is then false), the search for the cheapest
// correction when three quarters are, and the rest goes to finding any
// correction: the constraints are added, the costliest first, in blocks
// that halve when they fail, and those that fail alone are the correction.
// A consistency check that passes [Options.MaxNodes] also ends the step it
// serves. When the cheapest correction was not proved, [Result.BudgetSpent]
// says so: Correction then restores consistency but may not be the
// cheapest, or is empty when even the last quarter did not suffice. The
// conflicts listed are minimal in every case, and [Result.Work] tells the
// work spent. The records above take 32,144 units (TestRecordsOneOfEnds).
//
// Measured with go test -bench . -benchmem -count 6 on a shared two-core
// AMD EPYC (Turin) machine (the spread is the load of other work), solving
// at the soft tier and reading every bound with its explanation:
//
//	events              10          100          1,000        10,000
//	ordered series   19–31 µs   171–243 µs     2.0–2.5 ms    21–26 ms
//	dense (8n pairs) 46–66 µs   0.47–0.75 ms   7.0–9.6 ms    79–128 ms
//	disjunctive      41–58 µs   2.1–3.3 ms     212–309 ms    25–34 s
//
// The ordered series and the dense network grow as n log n. The ordered
// series has a window on every item (one in seven open on one side), the
// items in order, and every fifth gap bounded; the disjunctive series adds
// a one-of date to every tenth item and a choice of gap to every tenth
// step, so its choices grow with n: its search nodes grow about linearly
// (84, 886 and 8,544 nodes for 100, 1,000 and 10,000 items) and each
// costs O(n), so it grows as n². The z3 SMT solver on the same instances
// (one process, push/pop, two optimisation queries per variable, answers
// checked equal) takes 28–46 ms, 51–96 ms and 33–54 ms for the three
// shapes at 10 events and 1.2–2.4 s, 16.5–26.9 s and 1.8–3.3 s at 100.
// Timed in the same runs, that is 790–1,800 times slower at 10 events and
// 5,400–51,000 at 100 on the simple shapes, and 600–1,000 (10) and
// 660–1,400 (100) on the disjunctive one. Made inconsistent by one soft
// bound on the first item, the shapes give their conflicts and correction
// in 0.65–4.8 ms at 100 events and 6.7–40 ms at 1,000
// (BenchmarkConflicts). The forty records above take 141–157 ms and 57 MiB
// allocated in all (BenchmarkRecordsOneOf).
package network
