//go:build !js

package ui

import "runtime"

// yield lets other goroutines run between the advice's simulation runs.
// Natively they run in parallel anyway.
func (a *App) yield() { runtime.Gosched() }
