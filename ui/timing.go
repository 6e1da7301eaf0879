package ui

import "time"

// Redraw is how long the last change of the scenario (an edit committed, a
// file opened, an undo) took to reach the screen, measured by the app itself
// so that a benchmark driving it from outside can leave its own input pacing
// out. nodelife.debug() reports it as "redraw".
type Redraw struct {
	// Run is the change it belongs to: the value of Stats.Runs once the
	// change was shown.
	Run int64 `json:"run"`
	// ComputeMs is from the commit to the answer laid out: the scenario
	// parsed, the engine run, the answer and the page layout.
	ComputeMs float64 `json:"compute_ms"`
	// ToFrameMs is from the commit to the end of the app's Draw of the first
	// frame that shows the change (the browser composites that frame at its
	// next paint); 0 until it is drawn.
	ToFrameMs float64 `json:"to_frame_ms"`
	// Frame is that frame's number (Stats.Frames); 0 until it is drawn.
	Frame int64 `json:"frame"`
}

// redrawClock follows one change from its commit to its frame.
type redrawClock struct {
	start   time.Time // when the change being computed was committed
	pending bool      // the change is shown but not yet drawn
	last    Redraw
}

// commit marks the start of a change.
func (c *redrawClock) commit(now time.Time) { c.start = now }

// computed records that change number run is laid out at now.
func (c *redrawClock) computed(run int64, now time.Time) {
	c.last = Redraw{Run: run, ComputeMs: ms(now.Sub(c.start))}
	c.pending = true
}

// drew records that frame, ending at now, is the first to show the change.
func (c *redrawClock) drew(frame int64, now time.Time) {
	if !c.pending {
		return
	}
	c.pending = false
	c.last.Frame, c.last.ToFrameMs = frame, ms(now.Sub(c.start))
}

func ms(d time.Duration) float64 { return float64(d.Microseconds()) / 1000 }
