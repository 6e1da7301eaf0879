package sky_test

import "math"

// withinAbsOrRel reports whether got is within abs of want, or within rel
// of it relatively (use 0 to skip either).
func withinAbsOrRel(got, want, abs, rel float64) bool {
	d := math.Abs(got - want)
	return d <= abs || d <= rel*math.Abs(want)
}

// mj converts Wh/m² to MJ/m², the unit of Duffie & Beckman's examples.
func mj(whm2 float64) float64 { return whm2 * 3600 / 1e6 }
