package sun_test

import (
	"math"
	"time"
)

// withinAbsOrRel reports whether got is within abs of want, or within rel
// of it relatively (use 0 to skip either).
func withinAbsOrRel(got, want, abs, rel float64) bool {
	d := math.Abs(got - want)
	return d <= abs || d <= rel*math.Abs(want)
}

// clock returns the local clock time of t in loc in seconds since local
// midnight, to compare event times printed as hh:mm:ss.
func clock(t time.Time, loc *time.Location) float64 {
	t = t.In(loc)
	h, m, s := t.Clock()
	return float64(h*3600+m*60+s) + float64(t.Nanosecond())*1e-9
}

// hms is hh:mm:ss.sss in seconds.
func hms(h, m int, s float64) float64 { return float64(h*3600+m*60) + s }

// dms is degrees, arcminutes, arcseconds as degrees (sign from d, or neg).
func dms(neg bool, d, m int, s float64) float64 {
	v := float64(d) + float64(m)/60 + s/3600
	if neg {
		return -v
	}
	return v
}
