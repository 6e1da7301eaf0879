package climate

import (
	"math"

	"nodelife/engine/sun"
)

// Monthly is the outdoor air from monthly normals: each day's minimum and
// maximum interpolated linearly between the months' middles (periodic over
// the year), and the hours of the day by Parton & Logan's diurnal curve with
// the day's sunrise and sunset.
//
// Sunrise and sunset are in local mean solar time, from Cooper's declination
// and the 90.833° zenith (Duffie & Beckman eq. 1.6.1b; NOAA's rise and set
// zenith): accurate to a few minutes, ample for the shape of the day.
type Monthly struct {
	TminC, TmaxC [12]float64
	LatDeg       float64
}

// midMonth is the day of year at the middle of each month (non-leap year).
var midMonth = [12]float64{16, 45.5, 75, 105.5, 136, 166.5, 197, 228, 258.5, 289, 319.5, 350}

// DayMinMax returns the mean daily minimum and maximum on dayOfYear (1–366,
// fractional), interpolated between the months' middles.
func (m Monthly) DayMinMax(dayOfYear float64) (tmin, tmax float64) {
	d := math.Mod(dayOfYear-1, 365) + 1
	i := 11 // the month whose middle is at or before d, wrapping
	for j := 0; j < 12; j++ {
		if midMonth[j] <= d {
			i = j
		}
	}
	j := (i + 1) % 12
	span := midMonth[j] - midMonth[i]
	at := d - midMonth[i]
	if span <= 0 {
		span += 365
	}
	if at < 0 {
		at += 365
	}
	f := at / span
	return m.TminC[i] + f*(m.TminC[j]-m.TminC[i]), m.TmaxC[i] + f*(m.TmaxC[j]-m.TmaxC[i])
}

// TempC returns the air temperature at local mean solar time: dayOfYear
// (1 = 1 January 00:00) and hour (0–24).
func (m Monthly) TempC(dayOfYear, hour float64) float64 {
	tmin, tmax := m.DayMinMax(dayOfYear)
	decl := sun.DeclinationCooperDeg(int(dayOfYear))
	ws, polar := sun.HourAngleAtZenithDeg(m.LatDeg, decl, sun.SunriseZenithDeg)
	rise, set := 12-ws/15, 12+ws/15
	if polar != sun.NotPolar {
		rise, set = math.NaN(), math.NaN()
	}
	return PartonLogan(tmin, tmax, rise, set, hour)
}

func (m Monthly) Constant() bool { return false }
