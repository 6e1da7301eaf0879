package climate

import "math"

// Model gives the cell temperature (°C) at a local day of year (1 = 1 January
// 00:00, fractional) and local clock hour (0–24).
type Model interface {
	TempC(dayOfYear, hour float64) float64
	// Constant reports whether TempC never changes, so callers can skip work.
	Constant() bool
}

// Constant is a fixed temperature in °C.
type Constant float64

func (c Constant) TempC(float64, float64) float64 { return float64(c) }
func (c Constant) Constant() bool                 { return true }

// Seasonal is the outdoor air as an annual cosine plus a daily cosine:
//
//	T = mean − (annual/2)·cos(2π(d − d₀)/365.25) − (daily/2)·cos(2π(h − 3)/24)
//
// with d₀ = 15.5 (mid-January) north of the equator and 15.5 + 182.625 south
// of it, and the daily minimum at 03:00, the maximum at 15:00 (common
// practice: the first harmonic of the annual temperature wave).
type Seasonal struct {
	MeanC, AnnualRangeC, DailyRangeC float64
	ColdestDay                       float64 // d₀, day of year
}

func (s Seasonal) TempC(day, hour float64) float64 {
	annual := math.Cos(2 * math.Pi * (day - s.ColdestDay) / 365.25)
	daily := math.Cos(2 * math.Pi * (hour - 3) / 24)
	return s.MeanC - s.AnnualRangeC/2*annual - s.DailyRangeC/2*daily
}

func (s Seasonal) Constant() bool { return s.AnnualRangeC == 0 && s.DailyRangeC == 0 }
