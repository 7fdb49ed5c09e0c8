package network

// This file prepares a solve: the active constraints become interval sets
// on single variables and, for the variables that binary constraints
// link, components of arcs and choices in solver form.

// calt is an alternative in solver form over local nodes: lo <= to − from
// <= hi, with the constraints that set each side.
type calt struct {
	from, to     int32
	lo, hi       int64
	loTag, hiTag int32
}

// arcs appends the arcs of the distance graph that a stands for.
func (a calt) arcs(out []arc) []arc {
	if a.hi < Inf {
		out = append(out, arc{a.from, a.to, a.hi, a.hiTag})
	}
	if a.lo > -Inf {
		out = append(out, arc{a.to, a.from, -a.lo, a.loTag})
	}
	return out
}

// problem is one component: local node 0 is the reference point and
// vars[i] the variable of local node i.
type problem struct {
	vars    []Var
	base    []arc    // the arcs that always hold
	choices [][]calt // the disjunctions, each of two or more alternatives
}

// prepared is the active constraints in solver form.
type prepared struct {
	sets     [][]piece // per variable; nil when unconstrained
	empty    int       // a variable whose set is empty, or -1
	problems []*problem
	isolated []Var // variables solved by their set alone
}

// unaryOf reports whether every alternative of c bounds one and the same
// variable, and returns it.
func unaryOf(c *Constraint) (Var, bool) {
	v := Var(-1)
	for _, a := range c.Alts {
		var w Var
		switch {
		case a.From == Zero:
			w = a.To
		case a.To == Zero:
			w = a.From
		default:
			return 0, false
		}
		if v >= 0 && w != v {
			return 0, false
		}
		v = w
	}
	return v, true
}

// allVars lists the variables 1 to nv − 1.
func allVars(nv int) []Var {
	vs := make([]Var, 0, nv-1)
	for v := 1; v < nv; v++ {
		vs = append(vs, Var(v))
	}
	return vs
}

// addUnary intersects the set of the variable that the unary constraint
// c (index ci) bounds with c, and notes the first variable left empty.
func (s *solver) addUnary(p *prepared, c *Constraint, ci int32) {
	v, _ := unaryOf(c)
	switch {
	case len(c.Alts) == 1 && p.sets[v] != nil:
		p.sets[v] = s.clip(p.sets[v], c, ci)
	case p.sets[v] == nil:
		p.sets[v] = s.ownUnarySet(ci)
	default:
		p.sets[v] = s.intersect(p.sets[v], s.unarySet(ci))
	}
	if len(p.sets[v]) == 0 && p.empty < 0 {
		p.empty = int(v)
	}
}

// prepare turns the active constraints into interval sets and components.
func (s *solver) prepare(active []int32) *prepared {
	nv := len(s.n.names)
	p := &prepared{sets: make([][]piece, nv), empty: -1}
	var links []int32 // the constraints that relate two variables
	for _, ci := range active {
		c := &s.n.cons[ci]
		if _, ok := unaryOf(c); !ok {
			links = append(links, ci)
			continue
		}
		s.addUnary(p, c, ci)
		if p.empty >= 0 {
			return p // nothing to solve: the caller needs no more
		}
	}
	if len(links) == 0 { // every variable stands alone
		p.isolated = allVars(nv)
		return p
	}
	s.formProblems(p, links)
	return p
}

// components is a union-find forest over the variables.
type components []int32

func newComponents(nv int) components {
	c := make(components, nv)
	for i := range c {
		c[i] = int32(i)
	}
	return c
}

// find returns the root of x's component.
func (c components) find(x int32) int32 {
	for c[x] != x {
		c[x] = c[c[x]]
		x = c[x]
	}
	return x
}

// join merges the components of a and b; the reference point links
// nothing.
func (c components) join(a, b Var) {
	if a == Zero || b == Zero {
		return
	}
	ra, rb := c.find(int32(a)), c.find(int32(b))
	if ra != rb {
		c[max(ra, rb)] = min(ra, rb)
	}
}

// formProblems splits the variables that the links reach into
// components, numbered by their smallest variable, and lays their sets and
// links out as arcs and choices; the other variables are isolated.
func (s *solver) formProblems(p *prepared, links []int32) {
	n := s.n
	nv := len(n.names)
	comp := newComponents(nv)
	linked := make([]bool, nv)
	for _, ci := range links {
		first := Var(-1)
		for _, a := range n.cons[ci].Alts {
			linked[a.From], linked[a.To] = true, true
			for _, v := range [2]Var{a.From, a.To} {
				if v == Zero {
					continue
				}
				if first < 0 {
					first = v
				}
				comp.join(first, v)
			}
		}
	}
	byRoot := map[int32]*problem{}
	local := make([]int32, nv) // variable → its node in its problem
	for v := 1; v < nv; v++ {
		if !linked[v] {
			p.isolated = append(p.isolated, Var(v))
			continue
		}
		r := comp.find(int32(v))
		pr := byRoot[r]
		if pr == nil {
			pr = &problem{vars: []Var{Zero}}
			byRoot[r] = pr
			p.problems = append(p.problems, pr)
		}
		local[v] = int32(len(pr.vars))
		pr.vars = append(pr.vars, Var(v))
		pr.addSet(local[v], p.sets[v])
	}
	for _, ci := range links {
		c := &n.cons[ci]
		v := c.Alts[0].From
		if v == Zero {
			v = c.Alts[0].To
		}
		byRoot[comp.find(int32(v))].addLink(c, ci, local)
	}
}

// addSet lays the interval set of local node lv out: its hull as arcs, and
// its runs as a choice when it has gaps.
func (pr *problem) addSet(lv int32, set []piece) {
	if len(set) == 0 {
		return
	}
	first, last := set[0], set[len(set)-1]
	hull := calt{0, lv, first.lo, last.hi, first.loTag, last.hiTag}
	pr.base = hull.arcs(pr.base)
	if len(set) > 1 {
		alts := make([]calt, len(set))
		for i, q := range set {
			alts[i] = calt{0, lv, q.lo, q.hi, q.loTag, q.hiTag}
		}
		pr.choices = append(pr.choices, alts)
	}
}

// addLink lays the binary constraint c (index ci) out: arcs when it has one
// alternative, a choice otherwise.
func (pr *problem) addLink(c *Constraint, ci int32, local []int32) {
	alts := make([]calt, len(c.Alts))
	for i, a := range c.Alts {
		alts[i] = calt{local[a.From], local[a.To], a.Lo, a.Hi, ci, ci}
	}
	if len(alts) == 1 {
		pr.base = alts[0].arcs(pr.base)
	} else {
		pr.choices = append(pr.choices, alts)
	}
}

// isolatedResult allocates r's per-variable answers and fills in those of
// the isolated variables (and of Zero) from their sets.
func (s *solver) isolatedResult(p *prepared, r *Result) {
	nv := len(s.n.names)
	r.domains = make([]Set, nv)
	r.earliest = make([]Bound, nv)
	r.latest = make([]Bound, nv)
	// The isolated variables' sets and explanations share one backing
	// array each (full slice expressions keep them apart).
	total := 1
	for _, v := range p.isolated {
		total += max(1, len(p.sets[v]))
	}
	ivs := make([]Interval, 1, total)
	r.domains[0] = ivs[0:1:1] // Zero is 0
	tags := make([]int, 0, 2*len(p.isolated))
	because := func(tag int32) []int {
		if tag < 0 {
			return nil
		}
		tags = append(tags, int(tag))
		return tags[len(tags)-1 : len(tags) : len(tags)]
	}
	for _, v := range p.isolated {
		set := p.sets[v]
		start := len(ivs)
		if set == nil {
			ivs = append(ivs, Interval{-Inf, Inf})
			r.domains[v] = ivs[start:len(ivs):len(ivs)]
			r.earliest[v] = Bound{Value: -Inf}
			r.latest[v] = Bound{Value: Inf}
			continue
		}
		for _, q := range set {
			ivs = append(ivs, Interval{q.lo, q.hi})
		}
		r.domains[v] = ivs[start:len(ivs):len(ivs)]
		r.earliest[v] = Bound{Value: set[0].lo, Because: because(set[0].loTag)}
		r.latest[v] = Bound{Value: set[len(set)-1].hi, Because: because(set[len(set)-1].hiTag)}
	}
}
