package sim

import (
	"math"
	"time"

	"nodelife/engine/weather"
)

// fileSlots is a weather file laid onto a Year's slots.
type fileSlots struct {
	ghi, dni, dhi, temp, snow []float64
}

// mapWeather lays each record of w over the slots its interval covers (in
// UTC, by month and day, whatever the file's own years: a typical year
// splices months from different years). Slots no record covers — 29 February
// in a file without it — take the same slot of the day before. A missing
// value (NaN) becomes 0 W/m² for irradiance, and the previous slot's value
// for temperature; a file without snow depth never covers a panel.
func mapWeather(w *weather.Series, y *Year) *fileSlots {
	n := len(y.TempC)
	f := &fileSlots{ghi: nanSlice(n), dni: nanSlice(n), dhi: nanSlice(n), temp: nanSlice(n), snow: nanSlice(n)}
	res := time.Duration(y.ResMin) * time.Minute
	for _, r := range w.Records {
		start := r.End.Add(-r.Interval).UTC()
		for t := start.Truncate(res); t.Before(r.End); t = t.Add(res) {
			if mid := t.Add(res / 2); mid.Before(start) || !mid.Before(r.End) {
				continue // the slot's midpoint is outside this record
			}
			i := y.Index(t)
			f.ghi[i], f.dni[i], f.dhi[i] = r.GHIWm2, r.DNIWm2, r.DHIWm2
			f.temp[i], f.snow[i] = r.TempC, r.SnowCm
		}
	}
	fill := func(xs []float64, missing float64) {
		for i, x := range xs {
			if !math.IsNaN(x) {
				continue
			}
			switch {
			case i >= y.PerDay && !math.IsNaN(xs[i-y.PerDay]):
				xs[i] = xs[i-y.PerDay]
			case i > 0 && !math.IsNaN(xs[i-1]):
				xs[i] = xs[i-1]
			default:
				xs[i] = missing
			}
		}
	}
	for _, xs := range [][]float64{f.ghi, f.dni, f.dhi} {
		for i, x := range xs {
			if math.IsNaN(x) && !math.IsNaN(f.temp[i]) {
				xs[i] = 0 // the record is there, the value is missing
			}
		}
		fill(xs, 0)
	}
	fill(f.temp, firstNumber(f.temp, 15))
	fill(f.snow, 0)
	return f
}

func nanSlice(n int) []float64 {
	xs := make([]float64, n)
	for i := range xs {
		xs[i] = math.NaN()
	}
	return xs
}

// firstNumber is the first non-NaN value in xs, or def.
func firstNumber(xs []float64, def float64) float64 {
	for _, x := range xs {
		if !math.IsNaN(x) {
			return x
		}
	}
	return def
}
