package ui

import "math"

// Place is an example site to start from: where it is, its clock and a
// climate preset of ours that suits it.
type Place struct {
	Name     string
	LatDeg   float64
	LonDeg   float64
	Timezone string
	Climate  string // a site.climate.preset
}

// Places are the example places, north to south. Coordinates are city
// centres rounded to 0.01° (from memory); the climate is our preset nearest
// the city's Köppen class (common knowledge of these cities' climates).
func Places() []Place {
	return []Place{
		{"Tromsø", 69.65, 18.96, "Europe/Oslo", "subarctic"},
		{"Oslo", 59.91, 10.75, "Europe/Oslo", "cold-continental"},
		{"Hamburg", 53.55, 9.99, "Europe/Berlin", "marine-temperate"},
		{"Chicago", 41.88, -87.63, "America/Chicago", "cold-continental"},
		{"Seville", 37.39, -5.98, "Europe/Madrid", "mediterranean"},
		{"Phoenix", 33.45, -112.07, "America/Phoenix", "hot-desert"},
		{"Singapore", 1.35, 103.82, "Asia/Singapore", "humid-tropical"},
		{"Melbourne", -37.81, 144.96, "Australia/Melbourne", "marine-temperate"},
	}
}

// placeNear is the example place within 0.05° of lat, lon on the same clock
// (a site in the city), or "".
func placeNear(lat, lon float64, tz string) string {
	for _, p := range Places() {
		if p.Timezone == tz && math.Abs(p.LatDeg-lat) <= 0.05 && math.Abs(p.LonDeg-lon) <= 0.05 {
			return p.Name
		}
	}
	return ""
}
