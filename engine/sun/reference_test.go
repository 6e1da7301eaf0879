package sun_test

import (
	"bufio"
	"math"
	"os"
	"strconv"
	"strings"
	"testing"
	"time"

	"github.com/stretchr/testify/assert"
	"github.com/stretchr/testify/require"

	"nodelife/engine/sun"
)

// refRow is one row of testdata/astronomy-engine-reference.csv, written by
// tools/refsun/gen.mjs with the npm package astronomy-engine (see the file's
// header comment for the conventions).
type refRow struct {
	line            int
	utc             time.Time
	lat, lon        float64
	elevDeg, azDeg  float64 // topocentric, no refraction
	elevRefrDeg     float64 // astronomy-engine's "normal" refraction
	tzHours         int
	localDate       time.Time
	sunrise, sunset time.Time // zero if none that day
	hasRise, hasSet bool
}

func readReference(t *testing.T) []refRow {
	t.Helper()
	f, err := os.Open("testdata/astronomy-engine-reference.csv")
	require.NoError(t, err)
	defer f.Close()
	var rows []refRow
	sc := bufio.NewScanner(f)
	line, header := 0, false
	for sc.Scan() {
		line++
		text := sc.Text()
		if strings.HasPrefix(text, "#") || text == "" {
			continue
		}
		if !header {
			require.Equal(t, "utc,lat_deg,lon_deg,elevation_deg,azimuth_deg,elevation_refracted_deg,tz_offset_h,local_date,sunrise_utc,sunset_utc", text)
			header = true
			continue
		}
		f := strings.Split(text, ",")
		require.Lenf(t, f, 10, "line %d", line)
		num := func(i int) float64 {
			v, err := strconv.ParseFloat(f[i], 64)
			require.NoErrorf(t, err, "line %d column %d", line, i+1)
			return v
		}
		when := func(i int) (time.Time, bool) {
			if f[i] == "" {
				return time.Time{}, false
			}
			v, err := time.Parse(time.RFC3339Nano, f[i])
			require.NoErrorf(t, err, "line %d column %d", line, i+1)
			return v, true
		}
		r := refRow{line: line, lat: num(1), lon: num(2), elevDeg: num(3), azDeg: num(4), elevRefrDeg: num(5)}
		r.utc, _ = when(0)
		tz, err := strconv.Atoi(f[6])
		require.NoErrorf(t, err, "line %d", line)
		r.tzHours = tz
		loc := time.FixedZone("", tz*3600)
		r.localDate, err = time.ParseInLocation("2006-01-02", f[7], loc)
		require.NoErrorf(t, err, "line %d", line)
		r.sunrise, r.hasRise = when(8)
		r.sunset, r.hasSet = when(9)
		rows = append(rows, r)
	}
	require.NoError(t, sc.Err())
	return rows
}

// angleDiff is a − b reduced to [−180, 180).
func angleDiff(a, b float64) float64 {
	d := math.Mod(a-b+180, 360)
	if d < 0 {
		d += 360
	}
	return d - 180
}

func TestAgainstAstronomyEngine(t *testing.T) {
	// The check against a general-purpose astronomy library:
	// elevation and azimuth within 0.05°, sunrise and sunset within 2 min,
	// for |lat| < 65° and 2000–2050. astronomy-engine (VSOP87, IAU
	// precession/nutation, aberration, ΔT) is good to well under 0.01°, so
	// these bounds test the NOAA equations' stated ~0.01° and 1 min
	// (REFERENCE-VALUES §1c) with margin.
	const (
		angleTol = 0.05  // degrees (issue 3)
		eventTol = 120.0 // seconds (issue 3)
		// Azimuth is ill-conditioned near the zenith: a position error ε
		// moves it by ε/sin θz, so azimuth is compared only where the Sun
		// is more than 5° from the zenith (geometry, not a tuning).
		azMaxElev = 85.0
		// Refraction models differ most at the horizon (astronomy-engine's
		// Saemundsson-type formula vs NOAA's piecewise fit); the refracted
		// elevations are compared above 5°, NOAA's own branch boundary.
		refrMinElev = 5.0
	)
	rows := readReference(t)
	require.GreaterOrEqual(t, len(rows), 300, "a few hundred dates and places")
	var maxElev, maxAz, maxRefr, maxEvent float64
	events := 0
	for _, r := range rows {
		require.Less(t, math.Abs(r.lat), 65.0)
		p := sun.At(r.utc, r.lat, r.lon)
		dElev := (90 - p.ZenithDeg) - r.elevDeg
		maxElev = max(maxElev, math.Abs(dElev))
		assert.Truef(t, math.Abs(dElev) <= angleTol, "line %d: At(%v, %g, %g) geometric elevation = %.5f, want %.5f (tol %g)",
			r.line, r.utc, r.lat, r.lon, 90-p.ZenithDeg, r.elevDeg, angleTol)
		if r.elevDeg < azMaxElev {
			dAz := angleDiff(p.AzimuthDeg, r.azDeg)
			maxAz = max(maxAz, math.Abs(dAz))
			assert.Truef(t, math.Abs(dAz) <= angleTol, "line %d: azimuth = %.5f, want %.5f (tol %g)", r.line, p.AzimuthDeg, r.azDeg, angleTol)
		}
		if r.elevDeg > refrMinElev {
			dRefr := p.ElevationDeg - r.elevRefrDeg
			maxRefr = max(maxRefr, math.Abs(dRefr))
			assert.Truef(t, math.Abs(dRefr) <= angleTol, "line %d: apparent elevation = %.5f, want %.5f (tol %g)", r.line, p.ElevationDeg, r.elevRefrDeg, angleTol)
		}

		loc := time.FixedZone("", r.tzHours*3600)
		day, err := sun.Events(r.localDate, r.lat, r.lon, loc)
		require.NoError(t, err)
		// Below 65° there is no polar day or night at 90.833°: the Sun must
		// rise and set each day, as the reference found.
		require.Truef(t, r.hasRise && r.hasSet, "line %d: reference has no rise/set", r.line)
		require.Equalf(t, sun.NotPolar, day.Polar, "line %d", r.line)
		for _, ev := range []struct {
			name      string
			got, want time.Time
		}{{"sunrise", day.Sunrise, r.sunrise}, {"sunset", day.Sunset, r.sunset}} {
			d := ev.got.Sub(ev.want).Seconds()
			maxEvent = max(maxEvent, math.Abs(d))
			events++
			assert.Truef(t, math.Abs(d) <= eventTol, "line %d: Events(%s, %g, %g).%s = %v, want %v (tol %g s)",
				r.line, r.localDate.Format("2006-01-02"), r.lat, r.lon, ev.name, ev.got.UTC(), ev.want, eventTol)
		}
	}
	t.Logf("%d rows, %d events: max |Δ| elevation %.4f°, azimuth %.4f°, refracted elevation %.4f°, rise/set %.1f s",
		len(rows), events, maxElev, maxAz, maxRefr, maxEvent)
}
