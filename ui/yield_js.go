//go:build js

package ui

import "time"

// yieldWait bounds the wait for a tick: a page in a background tab gets no
// animation frames, and the advice goes on without them.
const yieldWait = 250 * time.Millisecond

// yield hands the page back between the advice's simulation runs. A
// WebAssembly program runs on the page's one thread and goroutines are not
// preempted, so the background advice waits after each run until the app has
// ticked once: the browser takes input and draws a frame between any two runs,
// and the page is never held for longer than one run.
func (a *App) yield() {
	a.mu.Lock()
	if a.tick == nil {
		a.tick = make(chan struct{})
	}
	ch := a.tick
	a.mu.Unlock()
	select {
	case <-ch:
	case <-time.After(yieldWait):
	}
}
