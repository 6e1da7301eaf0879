package weather

import (
	"errors"
	"fmt"
	"math"
	"time"
)

// Site is a weather file's station.
type Site struct {
	ID        string
	Name      string
	LatDeg    float64
	LonDeg    float64
	ElevM     float64
	TZOffsetH float64 // local standard time minus UTC, hours
}

// Record is one interval of a weather file. Irradiances are mean W/m² over
// the interval (a TMY3 or EPW hour's Wh/m² equals its mean W/m²).
type Record struct {
	// End is the end of the interval, in the file's local standard time
	// (a fixed zone at Site.TZOffsetH); the year is the file's own.
	End      time.Time
	Interval time.Duration
	ETRWm2   float64 // extraterrestrial horizontal
	ETRNWm2  float64 // extraterrestrial normal
	GHIWm2   float64 // global horizontal
	DNIWm2   float64 // direct normal
	DHIWm2   float64 // diffuse horizontal
	TempC    float64 // dry bulb
	PressMb  float64 // station pressure, mbar (hPa)
	Albedo   float64 // ground reflectance, 0–1
	SnowCm   float64 // snow depth
}

// Series is a whole weather file.
type Series struct {
	Format  string // "tmy3" or "epw"
	Site    Site
	Records []Record
}

// ErrFormat is the sentinel of every *ParseError.
var ErrFormat = errors.New("malformed weather file")

// ParseError locates a problem in a weather file.
type ParseError struct {
	File    string
	Line    int    // from 1; 0 for the whole file
	Column  int    // from 1; 0 for the whole line
	Field   string // the column's name
	Value   string
	Problem string
	Allowed string
}

func (e *ParseError) Error() string {
	s := e.File
	if e.Line > 0 {
		s += fmt.Sprintf(": line %d", e.Line)
	}
	if e.Column > 0 {
		s += fmt.Sprintf(", column %d", e.Column)
	}
	if e.Field != "" {
		s += " (" + e.Field + ")"
	}
	s += ": "
	if e.Field != "" && (e.Value != "" || e.Column > 0) {
		s += fmt.Sprintf("%q ", e.Value) // quoted, so an empty value shows as ""
	}
	s += e.Problem
	if e.Allowed != "" {
		s += " (allowed: " + e.Allowed + ")"
	}
	return s
}

func (e *ParseError) Unwrap() error { return ErrFormat }

// bounds of physical values; outside them a file is wrong, not extreme.
type bound struct {
	lo, hi float64
	unit   string
}

var (
	irradianceBound = bound{0, 1500, "W/m²"} // above the solar constant, 1361 W/m²
	tempBound       = bound{-90, 70, "°C"}   // beyond the recorded extremes on Earth
	pressureBound   = bound{300, 1100, "mbar"}
	albedoBound     = bound{0, 1, ""}
	snowBound       = bound{0, 2000, "cm"}
)

func (b bound) allowed() string {
	s := fmt.Sprintf("%g to %g", b.lo, b.hi)
	if b.unit != "" {
		s += " " + b.unit
	}
	return s
}

func (b bound) ok(x float64) bool { return math.IsNaN(x) || (x >= b.lo && x <= b.hi) }

// MonthlyMeans returns the mean of f over each calendar month (index 0 =
// January), NaN for months without data.
func (s *Series) MonthlyMeans(f func(Record) float64) [12]float64 {
	var sum [12]float64
	var n [12]int
	for _, r := range s.Records {
		mid := r.End.Add(-r.Interval / 2)
		v := f(r)
		if math.IsNaN(v) {
			continue
		}
		sum[mid.Month()-1] += v
		n[mid.Month()-1]++
	}
	var out [12]float64
	for i := range out {
		out[i] = math.NaN()
		if n[i] > 0 {
			out[i] = sum[i] / float64(n[i])
		}
	}
	return out
}
