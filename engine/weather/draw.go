package weather

import (
	"math"
	"math/rand/v2"
	"time"
)

// Daily clearness model: the standard deviation of a day's clearness index
// about its month's mean and its day-to-day (lag-1) correlation.
const (
	// DailyClearnessSD: 0.10–0.15 at mid-latitude sites (common practice,
	// from memory, after the daily-clearness distributions of Liu & Jordan
	// and Bendt et al.); narrowed near the bounds by ClearnessDraws.
	DailyClearnessSD = 0.12
	// DailyClearnessLag1: about 0.3 (Graham, Hollands & Unny, "A time series
	// model for Kt with application to global synthetic weather
	// generation", Solar Energy 40 (1988) 83–92; from memory).
	DailyClearnessLag1 = 0.3
	minClearness       = 0.03
	maxClearness       = 0.85
)

// ClearnessDraws returns one drawn weather sequence: the daily clearness
// index K_T of each local day in days, as a first-order autoregressive
// Gaussian process about each month's mean (monthly[0] is January):
//
//	z_d = φ z_{d−1} + √(1 − φ²) ε_d,  ε_d ~ N(0, 1)
//	K_d = K̄_m + σ_m z_d
//
// with φ = DailyClearnessLag1 and σ_m = min(DailyClearnessSD, K̄_m/3,
// (0.85 − K̄_m)/3), so that draws stay inside the physical range
// [0.03, 0.85] three standard deviations out; the rare draw beyond is
// reflected back inside, which keeps the distribution symmetric and the
// monthly mean unbiased. The same seed gives the same sequence on every
// platform (math/rand/v2's PCG).
//
// Reference: Graham, Hollands & Unny (1988), above; R. J. Aguiar and M.
// Collares-Pereira, "TAG: a time-dependent, autoregressive, Gaussian model
// for generating synthetic hourly radiation", Solar Energy 49 (1992)
// 167–174 (the same AR(1)-Gaussian construction at the hourly scale).
func ClearnessDraws(monthly [12]float64, days []time.Time, seed uint64) []float64 {
	rng := rand.New(rand.NewPCG(seed, 0x6e6f64656c696665)) // "nodelife"
	phi := DailyClearnessLag1
	innov := math.Sqrt(1 - phi*phi)
	out := make([]float64, len(days))
	z := rng.NormFloat64()
	for i, d := range days {
		if i > 0 {
			z = phi*z + innov*rng.NormFloat64()
		}
		mean := monthly[d.Month()-1]
		sd := min(DailyClearnessSD, (mean-minClearness)/3, (maxClearness-mean)/3)
		k := mean + sd*max(z, -8) // bounded for the reflection below
		for k < minClearness || k > maxClearness {
			if k < minClearness {
				k = 2*minClearness - k
			} else {
				k = 2*maxClearness - k
			}
		}
		out[i] = k
	}
	return out
}
