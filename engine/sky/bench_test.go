package sky_test

import (
	"testing"
	"time"

	"nodelife/engine/sky"
	"nodelife/engine/sun"
)

var sinkPOA sky.POA

// BenchmarkYearPOA10Min is a year of clear-sky plane-of-array irradiance at
// 10-minute steps (52 560 steps): sun position, Haurwitz GHI, Erbs split,
// Hay & Davies on a 40° south-facing panel.
func BenchmarkYearPOA10Min(b *testing.B) {
	start := time.Date(2025, 1, 1, 0, 0, 0, 0, time.UTC)
	panel := sky.Surface{TiltDeg: 40, AzimuthDeg: 180, Albedo: 0.2}
	const steps = 365 * 24 * 6
	for b.Loop() {
		at := start
		for range steps {
			p := sun.At(at, 39.742, -105.179)
			gon := sky.NormalWm2(p.DistanceAU, sky.SolarConstantWm2)
			irr := sky.Erbs(sky.HaurwitzGHIWm2(p.ApparentZenithDeg()), p.ZenithDeg, gon)
			sinkPOA = panel.HayDavies(irr, p.ZenithDeg, p.AzimuthDeg, gon)
			at = at.Add(10 * time.Minute)
		}
	}
}

// BenchmarkPOAStep is one step of the above without the sun position, the
// per-step cost once positions come from a precomputed table.
func BenchmarkPOAStep(b *testing.B) {
	p := sun.At(time.Date(2025, 5, 17, 18, 0, 0, 0, time.UTC), 39.742, -105.179)
	panel := sky.Surface{TiltDeg: 40, AzimuthDeg: 180, Albedo: 0.2}
	gon := sky.NormalWm2(p.DistanceAU, sky.SolarConstantWm2)
	for b.Loop() {
		irr := sky.Erbs(sky.HaurwitzGHIWm2(p.ApparentZenithDeg()), p.ZenithDeg, gon)
		sinkPOA = panel.HayDavies(irr, p.ZenithDeg, p.AzimuthDeg, gon)
	}
}

func BenchmarkIntervalExtraterrestrial(b *testing.B) {
	start := time.Date(2025, 5, 17, 14, 0, 0, 0, time.UTC)
	var s float64
	for b.Loop() {
		s = sky.IntervalExtraterrestrialWhm2(start, start.Add(time.Hour), 39.742, -105.179, sky.SolarConstantWm2)
	}
	_ = s
}
