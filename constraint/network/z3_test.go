package network

import (
	"bufio"
	"context"
	"fmt"
	"io"
	"math/rand/v2"
	"os/exec"
	"slices"
	"strconv"
	"strings"
	"testing"
)

// The reference solver: the z3 SMT solver (Debian package z3), driven
// through SMT-LIB 2 on a pipe. One process serves many networks, each
// inside push/pop.

type z3 struct {
	cmd *exec.Cmd
	in  io.WriteCloser
	out *bufio.Reader
}

func startZ3(tb testing.TB) *z3 {
	tb.Helper()
	path, err := exec.LookPath("z3")
	if err != nil {
		tb.Skip("SKIP: z3 is not installed (apt-get install z3); the comparison with the reference solver did not run")
	}
	cmd := exec.Command(path, "-in")
	in, err := cmd.StdinPipe()
	if err != nil {
		tb.Fatal(err)
	}
	out, err := cmd.StdoutPipe()
	if err != nil {
		tb.Fatal(err)
	}
	if err := cmd.Start(); err != nil {
		tb.Fatal(err)
	}
	z := &z3{cmd: cmd, in: in, out: bufio.NewReaderSize(out, 1<<20)}
	tb.Cleanup(func() {
		in.Close()
		cmd.Wait()
	})
	return z
}

// send writes commands and returns the lines z3 printed for them.
func (z *z3) send(tb testing.TB, script string) []string {
	tb.Helper()
	if _, err := io.WriteString(z.in, script+"\n(echo \"@@end\")\n"); err != nil {
		tb.Fatalf("z3: %v", err)
	}
	var lines []string
	for {
		line, err := z.out.ReadString('\n')
		if err != nil {
			tb.Fatalf("z3: %v after %q", err, lines)
		}
		line = strings.TrimSpace(line)
		if line == "@@end" {
			return lines
		}
		if strings.HasPrefix(line, "(error") {
			tb.Fatalf("z3: %s", line)
		}
		lines = append(lines, line)
	}
}

// smt writes the declarations and assertions of the constraints cs over
// the variables of n; x0 is the reference point.
func smt(n *Network, cs []Constraint) string {
	var b strings.Builder
	b.WriteString("(declare-const x0 Int)\n(assert (= x0 0))\n")
	for v := 1; v < n.NumVars(); v++ {
		fmt.Fprintf(&b, "(declare-const x%d Int)\n", v)
	}
	for _, c := range cs {
		b.WriteString("(assert (or")
		for _, a := range c.Alts {
			d := fmt.Sprintf("(- x%d x%d)", a.To, a.From)
			b.WriteString(" (and true")
			if a.Lo > -Inf {
				fmt.Fprintf(&b, " (<= %s %s)", smtInt(a.Lo), d)
			}
			if a.Hi < Inf {
				fmt.Fprintf(&b, " (<= %s %s)", d, smtInt(a.Hi))
			}
			b.WriteString(")")
		}
		b.WriteString("))\n")
	}
	return b.String()
}

func smtInt(x int64) string {
	if x < 0 {
		return fmt.Sprintf("(- %d)", -x)
	}
	return strconv.FormatInt(x, 10)
}

// parseObjective reads a value as z3 prints it: 5, (- 5), oo, (* (- 1) oo).
func parseObjective(s string) (int64, error) {
	switch s {
	case "oo":
		return Inf, nil
	case "(* (- 1) oo)", "(- oo)":
		return -Inf, nil
	}
	neg := false
	if strings.HasPrefix(s, "(- ") && strings.HasSuffix(s, ")") {
		neg, s = true, s[3:len(s)-1]
	}
	x, err := strconv.ParseInt(s, 10, 64)
	if err != nil {
		return 0, fmt.Errorf("objective %q: %w", s, err)
	}
	if neg {
		x = -x
	}
	return x, nil
}

// windows asks z3 for consistency and, when consistent, the least and
// greatest value of every variable. z3's optimiser may not terminate on
// unbounded integer objectives, so every variable is boxed in ±box with
// box = 2·nodes·w + 1. A finite end of a window is a path length, at most
// nodes·w; and a value x feasible without the box is feasible within
// ±(|x| + nodes·w) (the box adds no negative cycle), so a side is
// unbounded exactly when its boxed optimum lies beyond nodes·w.
func (z *z3) windows(tb testing.TB, n *Network, cs []Constraint, w int64) (bool, []Interval) {
	tb.Helper()
	box := 2*int64(n.NumVars())*w + 1
	far := int64(n.NumVars()) * w
	var b strings.Builder
	b.WriteString("(push)\n")
	b.WriteString(smt(n, cs))
	for v := 1; v < n.NumVars(); v++ {
		fmt.Fprintf(&b, "(assert (<= %s x%d %d))\n", smtInt(-box), v, box)
	}
	b.WriteString("(check-sat)")
	lines := z.send(tb, b.String())
	if len(lines) != 1 || (lines[0] != "sat" && lines[0] != "unsat") {
		tb.Fatalf("z3: check-sat answered %q", lines)
	}
	if lines[0] == "unsat" {
		z.send(tb, "(pop)")
		return false, nil
	}
	// One objective per query: several objectives in one query (even in
	// box mode) gave wrong optima with z3 4.8.12.
	out := make([]Interval, n.NumVars())
	for v := 1; v < n.NumVars(); v++ {
		for _, dir := range []string{"minimize", "maximize"} {
			lines := z.send(tb, fmt.Sprintf("(push)\n(%s x%d)\n(check-sat)\n(get-objectives)\n(pop)", dir, v))
			var x int64
			found := false
			for _, l := range lines {
				body, ok := strings.CutPrefix(l, fmt.Sprintf("(x%d ", v))
				if !ok {
					continue
				}
				var err error
				if x, err = parseObjective(strings.TrimSuffix(body, ")")); err != nil {
					tb.Fatalf("z3: %v in %q", err, lines)
				}
				found = true
			}
			if !found || lines[0] != "sat" {
				tb.Fatalf("z3: %s x%d answered %q", dir, v, lines)
			}
			switch {
			case dir == "minimize" && x < -far:
				out[v].Lo = -Inf
			case dir == "minimize":
				out[v].Lo = x
			case x > far:
				out[v].Hi = Inf
			default:
				out[v].Hi = x
			}
		}
	}
	z.send(tb, "(pop)")
	return true, out
}

// sat asks z3 whether cs plus the extra assertions are satisfiable.
func (z *z3) sat(tb testing.TB, n *Network, cs []Constraint, extra string) bool {
	tb.Helper()
	lines := z.send(tb, "(push)\n"+smt(n, cs)+extra+"(check-sat)\n(pop)")
	if len(lines) != 1 || (lines[0] != "sat" && lines[0] != "unsat") {
		tb.Fatalf("z3: check-sat answered %q", lines)
	}
	return lines[0] == "sat"
}

// TestZ3 compares Solve with z3 on 1,000 random networks with
// disjunctions and unbounded sides: consistency, earliest and latest of
// every variable, the gaps of every domain, and, when inconsistent, that
// every conflict is unsatisfiable and minimal and the correction leaves a
// satisfiable network.
func TestZ3(t *testing.T) {
	if testing.Short() {
		t.Skip("SKIP: comparison with z3 in -short mode")
	}
	z := startZ3(t)
	ctx := context.Background()
	rng := rand.New(rand.NewPCG(3, 5))
	var checked, disj, incons int
	for i := 0; checked < 1000 && i < 3000; i++ {
		sp := genSpec{
			vars:   2 + rng.IntN(7),
			w:      int64(5 + rng.IntN(100)),
			pDisj:  0.2 + 0.3*rng.Float64(),
			pOpen:  0.2 * rng.Float64(),
			pUnary: 0.2 + 0.4*rng.Float64(),
		}
		sp.cons = sp.vars + rng.IntN(2*sp.vars)
		n := genNetwork(rng, sp)
		tier := Tier(rng.IntN(3))
		var cs []Constraint
		hasDisj := false
		for _, c := range n.Constraints() {
			if c.Tier <= tier {
				cs = append(cs, c)
				hasDisj = hasDisj || len(c.Alts) > 1
			}
		}
		if !hasDisj {
			continue
		}
		disj++
		name := fmt.Sprintf("net%04d/%s", i, tier)
		res, err := n.Solve(ctx, tier, Options{})
		if err != nil {
			t.Fatalf("%s: %v", name, err)
		}
		ok, want := z.windows(t, n, cs, sp.w)
		checked++
		if ok != res.Consistent {
			t.Errorf("%s: consistent = %v, z3 says %v\n%s", name, res.Consistent, ok, smt(n, cs))
			continue
		}
		if ok {
			for v := Var(1); int(v) < n.NumVars(); v++ {
				got := Interval{res.Earliest(v).Value, res.Latest(v).Value}
				if got != want[v] {
					t.Errorf("%s: %s: window %v, z3 says %v\n%s", name, n.Name(v), got, want[v], smt(n, cs))
				}
				// A value inside each gap of the domain must be infeasible.
				dom := res.Domain(v)
				for k := 1; k < len(dom); k++ {
					gap := dom[k-1].Hi + 1
					if z.sat(t, n, cs, fmt.Sprintf("(assert (= x%d %s))\n", v, smtInt(gap))) {
						t.Errorf("%s: %s: domain %v excludes %d, z3 finds a solution with it", name, n.Name(v), dom, gap)
					}
				}
			}
			continue
		}
		incons++
		for _, k := range res.Conflicts {
			if z.sat(t, n, constraintsAt(n, k), "") {
				t.Errorf("%s: conflict %v is satisfiable", name, n.IDs(k))
			}
			for j := range k {
				if !z.sat(t, n, constraintsAt(n, slices.Delete(slices.Clone(k), j, j+1)), "") {
					t.Errorf("%s: conflict %v is not minimal without %s", name, n.IDs(k), n.ID(k[j]))
				}
			}
		}
		var rest []Constraint
		for _, c := range cs {
			if !slices.Contains(n.IDs(res.Correction), c.ID) {
				rest = append(rest, c)
			}
		}
		if !z.sat(t, n, rest, "") {
			t.Errorf("%s: without the correction %v the network is still unsatisfiable", name, res.Correction)
		}
	}
	if checked < 1000 || incons < 50 {
		t.Errorf("weak sample: %d networks with disjunctions checked, %d inconsistent", checked, incons)
	}
	t.Logf("%d networks with disjunctions compared with z3, %d inconsistent", checked, incons)
}
