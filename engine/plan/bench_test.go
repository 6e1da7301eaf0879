package plan

import (
	"testing"

	"nodelife/engine/scenario"
)

// BenchmarkRunDemo times the built-in demo scenario (8 years at 10-minute
// steps): the work behind one edit in the app.
func BenchmarkRunDemo(b *testing.B) {
	s := scenario.Demo()
	for b.Loop() {
		if _, err := Run(s); err != nil {
			b.Fatal(err)
		}
	}
}

// BenchmarkRunOutdoor5y times 5 years at 10-minute steps outdoors, where the
// temperature changes every step.
func BenchmarkRunOutdoor5y(b *testing.B) {
	s := scenario.Demo()
	s.Site.Placement = scenario.Outdoor
	s.Plan.Years = 5
	for b.Loop() {
		if _, err := Run(s); err != nil {
			b.Fatal(err)
		}
	}
}
