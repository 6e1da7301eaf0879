package sun_test

import (
	"testing"
	"time"

	"nodelife/engine/sun"
)

var sinkPos sun.Position

func BenchmarkAt(b *testing.B) {
	at := time.Date(2025, 5, 17, 18, 30, 0, 0, time.UTC)
	for b.Loop() {
		sinkPos = sun.At(at, 39.742, -105.179)
	}
}

func BenchmarkEvents(b *testing.B) {
	loc := time.FixedZone("MST", -7*3600)
	date := time.Date(2025, 5, 17, 0, 0, 0, 0, loc)
	var day sun.Day
	for b.Loop() {
		day, _ = sun.Events(date, 39.742, -105.179, loc)
	}
	_ = day
}

// BenchmarkYearAt10Min is a year of positions at 10-minute steps, 52 560
// calls, the size of a simulation's sun table.
func BenchmarkYearAt10Min(b *testing.B) {
	start := time.Date(2025, 1, 1, 0, 0, 0, 0, time.UTC)
	const steps = 365 * 24 * 6
	for b.Loop() {
		at := start
		for range steps {
			sinkPos = sun.At(at, 39.742, -105.179)
			at = at.Add(10 * time.Minute)
		}
	}
}
