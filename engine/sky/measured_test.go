package sky_test

import (
	"math"
	"testing"
	"time"

	"github.com/stretchr/testify/assert"
	"github.com/stretchr/testify/require"

	"nodelife/engine/sky"
	"nodelife/engine/sun"
)

// Checks against real data from Golden, Colorado (../weather/testdata/SOURCE.md): the
// NSRDB TMY3 file's own extraterrestrial columns, and one day of 1-minute
// SRRL measurements.

const tmyPath = "../weather/testdata/nsrdb-tmy3-724666-golden-co.csv"

func TestTMY3ETRNIsWRCSpencer(t *testing.T) {
	// The file's ETRN (extraterrestrial normal, Wh/m² over the hour) in
	// hours the Sun is up throughout is 1367 W/m² (the WRC solar constant)
	// times Spencer's eccentricity factor for the day: within 0.5 Wh/m², the
	// file's integer rounding. This establishes the producer's solar
	// constant, which the ETR check below must use (1367, not the engine's
	// 1361: 0.44 % apart).
	site, rows := readTMY3(t, tmyPath)
	require.Len(t, rows, 8760)
	n := 0
	for _, r := range rows {
		start := r.end.Add(-time.Hour)
		if sun.At(start, site.latDeg, site.lonDeg).ZenithDeg > 85 || sun.At(r.end, site.latDeg, site.lonDeg).ZenithDeg > 85 {
			continue // partly lit hours carry a fraction of ETRN
		}
		n++
		want := sky.SolarConstantWRCWm2 * sky.SpencerFactor(start.Add(30*time.Minute).YearDay())
		assert.Truef(t, withinAbsOrRel(r.etrnWh, want, 0.5+1e-9, 0), "line %d (%v): ETRN %g, want 1367·Spencer = %.2f (tol 0.5)", r.line, r.end, r.etrnWh, want)
	}
	assert.Greater(t, n, 3000)
}

func TestTMY3ETRAgainstEngine(t *testing.T) {
	// The file's ETR column (extraterrestrial horizontal, Wh/m² over the
	// hour ending at the stamp, local standard time UTC−7) against the
	// engine's IntervalExtraterrestrialWhm2 over the same hour, both with
	// Gsc = 1367 W/m² (the file's constant, see the ETRN test; with the
	// engine's 1361 every value would be 0.44 % lower). The two differ by
	// design in two known ways, each given its own allowance per hour:
	//   - rounding: the file holds integers, ±0.5 Wh/m²;
	//   - eccentricity: the file uses Spencer's series, the engine 1/R²
	//     from the NOAA distance; they differ by < 0.1 % (TestNormalIrradiance);
	//   - refraction: the file integrates the refracted elevation (see
	//     TestTMY3ETRIsRefracted), the engine the geometric one, as
	//     extraterrestrial irradiance should. Refraction R(h) adds at most
	//     Gon·R(h)·π/180 to the horizontal irradiance (sin is 1-Lipschitz),
	//     and R falls with h, so over the hour the excess is at most
	//     Gon·R(h_low)·π/180 Wh/m², h_low the hour's lowest elevation
	//     (but not below −0.575°, NOAA's refraction peak).
	// The clipped integral (D&B eq. 1.10.4 over the sunlit part) needs no
	// other allowance: its closed form is exact for a constant δ.
	site, rows := readTMY3(t, tmyPath)
	var worst, sumFile, sumEngine float64
	for _, r := range rows {
		start := r.end.Add(-time.Hour)
		got := sky.IntervalExtraterrestrialWhm2(start, r.end, site.latDeg, site.lonDeg, sky.SolarConstantWRCWm2)
		p0, p1 := sun.At(start, site.latDeg, site.lonDeg), sun.At(r.end, site.latDeg, site.lonDeg)
		low := max(min(90-p0.ZenithDeg, 90-p1.ZenithDeg), -0.575)
		refraction := 0.0
		if r.etrWh > 0 || got > 0 {
			refraction = sky.NormalWm2(p0.DistanceAU, sky.SolarConstantWRCWm2) * sun.RefractionDeg(low) * math.Pi / 180
		}
		tol := 0.5 + 0.001*r.etrWh + refraction
		worst = max(worst, math.Abs(got-r.etrWh))
		sumFile += r.etrWh
		sumEngine += got
		assert.Truef(t, withinAbsOrRel(got, r.etrWh, tol, 0), "line %d (hour ending %v): engine ETR %.2f, file %g Wh/m² (tol %.2f)", r.line, r.end, got, r.etrWh, tol)
	}
	// Over the year the refraction excess is a small share: the sums agree
	// to 0.3 % (integrating the file's hours at 1-minute steps with and
	// without refraction differs by 0.19 % over this year [CALC while
	// writing this test]).
	assert.InDelta(t, 1, sumEngine/sumFile, 0.003)
	t.Logf("TMY3 ETR vs engine: worst hour %.2f Wh/m², annual ratio %.5f", worst, sumEngine/sumFile)
}

func TestTMY3ETRIsRefracted(t *testing.T) {
	// The same column reproduced by integrating 1367·Spencer(n)·sin(h′)⁺
	// over each hour, h′ the NOAA apparent (refracted) elevation from
	// sun.At, at 1-minute resolution: every hour within 1 Wh/m² — 0.5 for
	// the file's rounding and 0.5 for the producer's own position and
	// refraction algorithms (0.5 Wh/m² is a 0.02° elevation difference held
	// for a whole hour: 1414 W/m² × 0.02° × π/180). This pins the file's
	// conventions (hour-ending stamps, UTC−7, refracted elevation) and the
	// engine's sun geometry against an independent producer; a 1-hour
	// timestamp error, or the geometric elevation, fails it.
	site, rows := readTMY3(t, tmyPath)
	const steps = 60
	worst := 0.0
	for _, r := range rows {
		start := r.end.Add(-time.Hour)
		sum := 0.0
		for i := range steps {
			at := start.Add(time.Duration((float64(i) + 0.5) / steps * float64(time.Hour)))
			h := sun.At(at, site.latDeg, site.lonDeg).ElevationDeg
			if h > 0 {
				sum += sky.SolarConstantWRCWm2 * sky.SpencerFactor(at.YearDay()) * math.Sin(h*math.Pi/180) / steps
			}
		}
		worst = max(worst, math.Abs(sum-r.etrWh))
		assert.Truef(t, withinAbsOrRel(sum, r.etrWh, 1, 0), "line %d (hour ending %v): refracted integral %.2f, file %g Wh/m² (tol 1)", r.line, r.end, sum, r.etrWh)
	}
	t.Logf("TMY3 ETR vs refracted integral: worst hour %.2f Wh/m²", worst)
}

const srrlPath = "../weather/testdata/srrl-golden-co-2012-05-17-1min.csv"

func TestSRRLClosure(t *testing.T) {
	// One day of 1-minute measurements, 17 May 2012 (stamps at the end of
	// each minute, UTC−7; the minute's midpoint is used). It is a day of
	// broken cloud, not a clear one: DNI swings between 0 and 890 W/m² and
	// GHI reaches 1232 W/m² by cloud enhancement at 11:18.
	//
	// Component closure, the BSRN comparison test: DNI·cos θz + DHI must
	// match GHI within ±8 % for θz < 75° and GHI > 50 W/m² (Long & Dutton,
	// BSRN Global Network recommended QC tests, V2.0 (2002) — limits from
	// memory). Under moving clouds the pyrheliometer and pyranometers do not
	// see the same sky at the same instant, so a few minutes may fail; at
	// least 95 % must pass (common practice for QC screening), and the day's
	// sums must agree within 2 % (about the combined instruments'
	// uncertainty, from memory).
	site, rows := readTMY3(t, srrlPath)
	require.Len(t, rows, 1440)
	var n, pass int
	var sumGHI, sumClosure float64
	for _, r := range rows {
		p := sun.At(r.end.Add(-30*time.Second), site.latDeg, site.lonDeg)
		if p.ZenithDeg >= 75 || r.ghiWm2 <= 50 {
			continue
		}
		c := r.dniWm2*math.Cos(p.ZenithDeg*math.Pi/180) + r.dhiWm2
		n++
		if math.Abs(c-r.ghiWm2) <= 0.08*r.ghiWm2 {
			pass++
		}
		sumGHI += r.ghiWm2
		sumClosure += c
	}
	require.Greater(t, n, 600)
	assert.GreaterOrEqualf(t, float64(pass), 0.95*float64(n), "%d of %d minutes within ±8 %%", pass, n)
	assert.InDelta(t, 1, sumClosure/sumGHI, 0.02)

	// Minutes of steady direct sun (DNI > 500 W/m² and GHI within 1 % of
	// both neighbours) have no cloud timing problem: there closure must
	// hold within 3 % (thermopile pyranometer and pyrheliometer
	// uncertainties of about 2 % and 1.5 %, from memory). The Sun's zenith
	// from sun.At is what makes this work: a 1-hour time-zone error moves
	// it by ~15° and breaks closure by 20–40 % (tried while writing this
	// test).
	steady := 0
	for i := 1; i+1 < len(rows); i++ {
		r := rows[i]
		if r.dniWm2 <= 500 || math.Abs(rows[i-1].ghiWm2-r.ghiWm2) > 0.01*r.ghiWm2 || math.Abs(rows[i+1].ghiWm2-r.ghiWm2) > 0.01*r.ghiWm2 {
			continue
		}
		p := sun.At(r.end.Add(-30*time.Second), site.latDeg, site.lonDeg)
		if p.ZenithDeg >= 75 {
			continue
		}
		steady++
		c := r.dniWm2*math.Cos(p.ZenithDeg*math.Pi/180) + r.dhiWm2
		assert.Truef(t, withinAbsOrRel(c, r.ghiWm2, 0, 0.03), "line %d (%v): DNI·cos θz + DHI = %.1f, GHI %.1f (tol 3 %%)", r.line, r.end, c, r.ghiWm2)
	}
	assert.Greater(t, steady, 50)
}

func TestSRRLPlaneOfArray(t *testing.T) {
	// A panel at the site's latitude tilt (40°) facing south, ground
	// albedo from the file's own measured column. Reference: the isotropic
	// transposition of the measured GHI/DNI/DHI, minute by minute, summed
	// over the day. Against it:
	//   - the engine's modelled chain from measured GHI only (Erbs split
	//     with the NOAA geometry and Gon, then isotropic): within 5 % of the
	//     day's total — separation models err by 20–40 % per hour on DNI
	//     but largely cancel over a day on a tilted plane (common practice;
	//     no single source);
	//   - Hay & Davies with the measured components: within 3 % of the
	//     isotropic total (the circumsolar share on a broken-cloud day is
	//     small; common practice).
	site, rows := readTMY3(t, srrlPath)
	panel := sky.Surface{TiltDeg: 40, AzimuthDeg: 180}
	var measured, modelled, hayDavies, ghi float64
	for _, r := range rows {
		p := sun.At(r.end.Add(-30*time.Second), site.latDeg, site.lonDeg)
		panel.Albedo = max(r.albedo, 0)
		irr := sky.Irradiance{GHIWm2: max(r.ghiWm2, 0), DNIWm2: max(r.dniWm2, 0), DHIWm2: max(r.dhiWm2, 0)}
		gon := sky.NormalWm2(p.DistanceAU, sky.SolarConstantWm2)
		measured += panel.Isotropic(irr, p.ZenithDeg, p.AzimuthDeg).TotalWm2() / 60
		hayDavies += panel.HayDavies(irr, p.ZenithDeg, p.AzimuthDeg, gon).TotalWm2() / 60
		modelled += panel.Isotropic(sky.Erbs(irr.GHIWm2, p.ZenithDeg, gon), p.ZenithDeg, p.AzimuthDeg).TotalWm2() / 60
		ghi += irr.GHIWm2 / 60
	}
	assert.InDelta(t, 1, modelled/measured, 0.05, "Erbs+isotropic %.0f vs measured-component isotropic %.0f Wh/m²", modelled, measured)
	assert.InDelta(t, 1, hayDavies/measured, 0.03, "Hay & Davies %.0f vs isotropic %.0f Wh/m²", hayDavies, measured)
	// In mid-May at 40° N a 40° south-facing plane gets less than the
	// horizontal (the summer Sun is high); it must not get more than GHI.
	assert.Less(t, measured, ghi)
	t.Logf("17 May 2012: GHI %.0f Wh/m²; POA 40°S isotropic(measured) %.0f, Erbs model %.0f, Hay & Davies %.0f", ghi, measured, modelled, hayDavies)
}

func TestTMY3YearOrientation(t *testing.T) {
	// The properties on a real typical year: at a mid latitude
	// (Golden, 39.7° N) a panel facing the equator at tilt ≈ latitude
	// collects more per year than a flat one, and more than one facing
	// the pole. Isotropic transposition of the file's GHI/DNI/DHI.
	site, rows := readTMY3(t, tmyPath)
	surfaces := map[string]sky.Surface{
		"flat":         {TiltDeg: 0, AzimuthDeg: 180, Albedo: 0.2},
		"south 40°":    {TiltDeg: 40, AzimuthDeg: 180, Albedo: 0.2},
		"north 40°":    {TiltDeg: 40, AzimuthDeg: 0, Albedo: 0.2},
		"vertical S":   {TiltDeg: 90, AzimuthDeg: 180, Albedo: 0.2},
		"vertical E":   {TiltDeg: 90, AzimuthDeg: 90, Albedo: 0.2},
		"vertical N":   {TiltDeg: 90, AzimuthDeg: 0, Albedo: 0.2},
		"flat (check)": {TiltDeg: 0, AzimuthDeg: 0, Albedo: 0.2},
	}
	annual := map[string]float64{}
	ghi := 0.0
	for _, r := range rows {
		p := sun.At(r.end.Add(-30*time.Minute), site.latDeg, site.lonDeg)
		irr := sky.Irradiance{GHIWm2: r.ghiWm2, DNIWm2: r.dniWm2, DHIWm2: r.dhiWm2}
		ghi += r.ghiWm2
		for name, s := range surfaces {
			annual[name] += s.Isotropic(irr, p.ZenithDeg, p.AzimuthDeg).TotalWm2()
		}
	}
	assert.Greater(t, annual["south 40°"], annual["flat"])
	assert.Greater(t, annual["flat"], annual["north 40°"])
	assert.Greater(t, annual["vertical S"], annual["vertical E"])
	assert.Greater(t, annual["vertical E"], annual["vertical N"])
	assert.InDelta(t, annual["flat"], annual["flat (check)"], 1e-6, "a flat panel has no azimuth")
	// A flat panel sees about GHI: DNI·cos θz + DHI differs from GHI only by
	// the file's closure error (TMY3 components are modelled to close,
	// within a few % at hourly resolution, from memory).
	assert.InDelta(t, 1, annual["flat"]/ghi, 0.03)
	t.Logf("Golden TMY3, kWh/m² per year: GHI %.0f, flat %.0f, south 40° %.0f, north 40° %.0f",
		ghi/1000, annual["flat"]/1000, annual["south 40°"]/1000, annual["north 40°"]/1000)
}

func TestClearSkyYearSouthernHemisphere(t *testing.T) {
	// No measured southern file is at hand, so a modelled clear-sky year at
	// 34° S (Haurwitz GHI, Erbs split, isotropic): the equator now lies
	// north, and a north-facing panel tilted at the latitude collects more
	// than a flat one, which collects more than a south-facing one.
	const lat, lon = -34.0, 151.0
	start := time.Date(2025, 1, 1, 0, 0, 0, 0, time.UTC)
	surfaces := []sky.Surface{
		{TiltDeg: 34, AzimuthDeg: 0, Albedo: 0.2},
		{TiltDeg: 0, AzimuthDeg: 0, Albedo: 0.2},
		{TiltDeg: 34, AzimuthDeg: 180, Albedo: 0.2},
	}
	totals := make([]float64, len(surfaces))
	for at := start; at.Before(start.AddDate(1, 0, 0)); at = at.Add(30 * time.Minute) {
		p := sun.At(at, lat, lon)
		gon := sky.NormalWm2(p.DistanceAU, sky.SolarConstantWm2)
		irr := sky.Erbs(sky.HaurwitzGHIWm2(p.ApparentZenithDeg()), p.ZenithDeg, gon)
		for i, s := range surfaces {
			v := s.Isotropic(irr, p.ZenithDeg, p.AzimuthDeg).TotalWm2()
			require.False(t, math.IsNaN(v), "NaN at %v", at)
			totals[i] += v
		}
	}
	assert.Greater(t, totals[0], totals[1], "north-facing at latitude tilt beats flat in the south")
	assert.Greater(t, totals[1], totals[2], "flat beats south-facing in the south")
}
