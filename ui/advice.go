package ui

import (
	"context"
	"time"

	"nodelife/engine/plan"
)

// progressEvery is how often the advice's progress is redrawn.
const progressEvery = 250 * time.Millisecond

// adviceJob is the advice being worked out in the background for the
// current scenario.
type adviceJob struct {
	status AdviceStatus
	gen    int                // counts scenarios; a job for an older one is ignored
	cancel context.CancelFunc // stops the running job, or nil
	done   chan struct{}      // closed when the running job ends
	wanted bool               // start a job once the answer is on screen
	after  int64              // … that is, once a frame after this one is drawn
	now    bool               // start without waiting for a frame (tests)
}

// wantAdvice stops the advice for the old scenario and asks for it for the
// current one, once its answer is on screen. Call with a.mu held.
func (a *App) wantAdvice() {
	if a.advice.cancel != nil {
		a.advice.cancel()
		a.advice.cancel = nil
	}
	a.advice.gen++
	a.advice.status = AdviceStatus{State: AdviceWaiting}
	a.advice.wanted = true
	a.advice.after = a.stats.Frames
}

// layoutProgress lays the page out again for the advice's progress. When
// nothing else waits to be drawn and the progress moved nothing, only the
// footer and the advice block are repainted: under software GL a whole
// frame costs as much as a simulation run. Call with a.mu held.
func (a *App) layoutProgress() {
	full := a.dirty || a.menu != nil || a.form.OpenList() != nil || a.page.options != nil
	footer, advice := a.page.Footer, a.page.Advice
	a.layout()
	if full || a.page.Footer != footer || a.page.Advice != advice {
		return
	}
	a.dirty = false
	a.repaint = append(a.repaint, a.page.Footer, a.page.Advice.Intersect(a.page.Side))
}

// maybeStartAdvice starts the advice in the background once the answer has
// been drawn and no slider is being dragged. Call with a.mu held.
func (a *App) maybeStartAdvice() {
	j := &a.advice
	if !j.wanted || a.drag.active || a.form.Dragging() || (a.stats.Frames <= j.after && !j.now) {
		return
	}
	j.wanted = false
	ctx, cancel := context.WithCancel(context.Background())
	j.cancel = cancel
	j.done = make(chan struct{})
	j.status = AdviceStatus{State: AdviceRunning}
	gen, done := j.gen, j.done
	s, r, in := a.scen, a.res, a.inputsFor(a.scen)
	r.Advice = nil
	go func() {
		defer close(done)
		var shown time.Time
		adv, err := plan.Advise(ctx, s, in, r, plan.AdviceOptions{Progress: func(d, t int) {
			a.mu.Lock()
			if a.advice.gen == gen {
				a.advice.status.Done, a.advice.status.Total = d, t
				// Redraw the progress a few times a second, not after
				// every run: a frame costs the page as much as a run.
				if now := time.Now(); now.Sub(shown) >= progressEvery {
					shown = now
					a.layoutProgress()
				}
			}
			a.mu.Unlock()
			a.yield()
		}})
		a.mu.Lock()
		defer a.mu.Unlock()
		if a.advice.gen != gen {
			return // the scenario changed meanwhile
		}
		cancel()
		a.advice.cancel = nil
		if err != nil {
			a.advice.status = AdviceStatus{State: AdviceFailed, Err: err.Error()}
			a.layout()
			return
		}
		a.res.Advice = &adv
		a.remarshal()
		a.answer = AnswerFor(a.scen, a.res)
		a.advice.status = AdviceStatus{State: AdviceDone}
		a.changed()
		a.layout()
	}()
}
