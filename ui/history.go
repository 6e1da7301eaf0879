package ui

import "nodelife/engine/scenario"

// History is the undo and redo stacks of scenarios. The app records the
// scenario before each change it applies; Undo gives it back and keeps the
// current one for Redo. A new change forgets what could be redone.
type History struct {
	past, future []scenario.Scenario
	// Limit bounds the undo stack (the oldest step is dropped); 0 means 200.
	Limit int
}

// Record remembers before, the scenario a change replaces.
func (h *History) Record(before scenario.Scenario) {
	limit := h.Limit
	if limit <= 0 {
		limit = 200
	}
	h.past = append(h.past, before)
	if len(h.past) > limit {
		h.past = append(h.past[:0:0], h.past[len(h.past)-limit:]...)
	}
	h.future = h.future[:0]
}

// Undo returns the scenario before the last change, keeping cur for Redo;
// false when there is nothing to undo.
func (h *History) Undo(cur scenario.Scenario) (scenario.Scenario, bool) {
	return shift(&h.past, &h.future, cur)
}

// Redo returns the scenario the last Undo left, keeping cur for Undo; false
// when there is nothing to redo.
func (h *History) Redo(cur scenario.Scenario) (scenario.Scenario, bool) {
	return shift(&h.future, &h.past, cur)
}

// shift pops the top of from, pushes cur on to and returns the popped one.
func shift(from, to *[]scenario.Scenario, cur scenario.Scenario) (scenario.Scenario, bool) {
	if len(*from) == 0 {
		return cur, false
	}
	s := (*from)[len(*from)-1]
	*from = (*from)[:len(*from)-1]
	*to = append(*to, cur)
	return s, true
}

// CanUndo and CanRedo tell whether there is a step to take.
func (h *History) CanUndo() bool { return len(h.past) > 0 }

// CanRedo reports whether an undone step can be redone.
func (h *History) CanRedo() bool { return len(h.future) > 0 }

// Depth is how many steps can be undone and redone.
func (h *History) Depth() (undo, redo int) { return len(h.past), len(h.future) }
