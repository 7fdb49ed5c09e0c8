package constraint

import (
	"sync"

	"terminus/constraint/network"
	"terminus/materials"
)

// maxMemoEntries bounds a Memo whatever the input: full, it holds 27.6 MiB
// (measured with every built-in material at every place of the table).
const maxMemoEntries = 1 << 15

// A Memo keeps what analyses of many cases against one dataset have in
// common, each material's bounds at a place and their texts, so that a
// survey of a collection works them out once per material and place
// rather than once per record. It is safe for concurrent use. A Memo
// serves only the dataset it was made for, and only cases that keep the
// default circa policy and stock allowance; other analyses ignore it. Once
// it holds maxMemoEntries entries (a collection rarely names more than a
// few places, but one might name them all), the rest are worked out each
// time.
type Memo struct {
	ds      *materials.Dataset
	mu      sync.RWMutex
	entries map[memoKey]*memoEntry
}

// NewMemo returns an empty memo for analyses against ds.
func NewMemo(ds *materials.Dataset) *Memo {
	return &Memo{ds: ds, entries: map[memoKey]*memoEntry{}}
}

type memoKey struct {
	m     *materials.Material
	place string
	cap   network.Tier
}

// memoEntry is what materialBounds works out for one key: the items (with
// their texts made), the disagreements and notes it records and whether
// the place has no arrival data for the material. Nothing in it is changed after it
// is stored.
type memoEntry struct {
	items         []boundItem
	disagreements []Disagreement
	notes         []string
	noArrival     bool
}

// memoFor returns the memo an analysis may use, or nil.
func (a *analysis) memoFor(opt Options) *Memo {
	if opt.Memo == nil || opt.Memo.ds != a.ds || len(a.c.Circa) > 0 || a.c.StockAllowance != nil {
		return nil
	}
	return opt.Memo
}

// memoBounds is materialBounds through the memo: the same items, and the
// same disagreements and arrival notes recorded in b.
func (a *analysis) memoBounds(memo *Memo, m *materials.Material, place string, cap network.Tier, b *built) []boundItem {
	key := memoKey{m, place, cap}
	memo.mu.RLock()
	e, ok := memo.entries[key]
	memo.mu.RUnlock()
	if !ok {
		scratch := &built{}
		items := a.materialBounds(m, place, cap, nil, scratch)
		for i := range items {
			items[i].txt = a.itemText(&items[i])
			items[i].iso = items[i].day.ISO()
		}
		e = &memoEntry{items: items[:len(items):len(items)], disagreements: scratch.disagreements, notes: scratch.notes, noArrival: len(scratch.noArrival) > 0}
		memo.mu.Lock()
		if prev, ok := memo.entries[key]; ok {
			e = prev // another analysis got there first; keep one
		} else if len(memo.entries) < maxMemoEntries {
			memo.entries[key] = e
		}
		memo.mu.Unlock()
	}
	b.disagreements = append(b.disagreements, e.disagreements...)
	b.notes = append(b.notes, e.notes...)
	if e.noArrival {
		b.addNoArrival(place, displayName(m))
	}
	return e.items
}
