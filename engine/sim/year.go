package sim

import (
	"errors"
	"math"
	"strconv"
	"time"

	"nodelife/engine/climate"
	"nodelife/engine/harvest"
	"nodelife/engine/scenario"
	"nodelife/engine/sky"
	"nodelife/engine/sun"
	"nodelife/engine/weather"
)

// Year is the site's environment through one typical year at the
// simulation's resolution: for each slot of each UTC calendar day, the air
// (or room) temperature, the global horizontal irradiance, the daylight
// illuminance and the power a solar panel delivers to the charger. Rows
// follow a leap year's 366 days, so 29 February has its own; a simulated
// instant uses the row of its UTC month and day in any year. Each slot holds
// the value at its midpoint (weather files: the value of the hour that
// covers it).
//
// A Year depends only on the site, the harvester, the weather file and the
// resolution, not on the node or the cells, so callers that re-run a
// scenario after editing the load or the cells can build it once and reuse
// it (RunWith).
type Year struct {
	ResMin     int       // slot length, minutes; divides 1440
	PerDay     int       // slots per day
	TempC      []float64 // air or room temperature, °C
	CellTempC  []float64 // the cells' temperature: outdoors, the air plus the sun on the enclosure
	GHIWm2     []float64 // global horizontal irradiance, W/m²
	LuxOutdoor []float64 // daylight illuminance on the horizontal, lx
	// HarvestW is the power a solar panel of PanelAreaCm2 delivers to the
	// cells' charger, W; nil without a panel. The output is proportional to
	// the area (the cell temperature depends on the irradiance, not the
	// area), so a run scales it to its own panel: one table serves every
	// panel size, which the sizing search relies on. A table made by hand
	// with PanelAreaCm2 0 is used as it is.
	HarvestW     []float64
	PanelAreaCm2 float64
}

// tableYear is the leap year whose calendar lays out the rows.
const tableYear = 2028

// ErrWeatherNotLoaded is returned when a scenario names a weather file that
// the caller did not read.
var ErrWeatherNotLoaded = errors.New("weather file not loaded")

// resolutionFor returns the largest divisor of 1440 not above stepMin, so
// slots tile every day exactly.
func resolutionFor(stepMin int) int {
	for r := stepMin; r > 1; r-- {
		if 1440%r == 0 {
			return r
		}
	}
	return 1
}

// NewYear builds the environment table of a scenario's site. w is the
// weather file the scenario names (site.weather_file), read by the caller;
// nil when it names none.
//
// Without a weather file, irradiance comes from the monthly mean clearness
// index: the day's extraterrestrial irradiation H0 (D&B eq. 1.10.3) × K̄T,
// spread over the day with Collares-Pereira & Rabl's r_t, split into beam and
// diffuse with Erbs et al.; temperature from the climate model. With one, the
// file's GHI, DNI, DHI, dry-bulb temperature and snow depth are used hour by
// hour. Either way the panel sees Hay & Davies plane-of-array irradiance from
// the NOAA sun position, with the beam blocked behind the horizon profile and
// reduced by the ASHRAE incidence-angle modifier, less soiling and snow.
func NewYear(s scenario.Scenario, w *weather.Series) (*Year, error) {
	if s.Site.WeatherFile != "" && w == nil {
		return nil, &scenario.FieldError{Path: "site.weather_file", Value: strconv.Quote(s.Site.WeatherFile),
			Problem: "is not loaded", Allowed: "a TMY3 (.csv) or EPW (.epw) file given with the scenario", Err: ErrWeatherNotLoaded}
	}
	res := resolutionFor(s.Plan.StepMin)
	y := &Year{ResMin: res, PerDay: 1440 / res}
	n := 366 * y.PerDay
	y.TempC = make([]float64, n)
	y.GHIWm2 = make([]float64, n)
	y.LuxOutdoor = make([]float64, n)
	panel := s.Harvest.Kind == scenario.HarvestPanel
	if panel {
		y.HarvestW = make([]float64, n)
		y.PanelAreaCm2 = s.Harvest.Panel.AreaCm2
	}

	var file *fileSlots
	if w != nil {
		file = mapWeather(w, y)
	}
	fillTemperature(s, y, file)
	y.CellTempC = y.TempC
	// Sunlight matters outdoors (daylight at the node, the enclosure, the
	// panel); indoors the site's lights rule.
	if s.Site.Placement != scenario.Outdoor && !panel {
		return y, nil
	}
	if s.Site.Placement == scenario.Outdoor {
		y.CellTempC = make([]float64, n)
	}
	enc := s.Site.Enclosure
	soiling, snowLoss := s.PanelSoilingPct(), s.PanelSnowLossPct()
	clearness := s.Clearness()

	lat, lon := s.Site.LatDeg, s.Site.LonDeg
	tilt, surfAz := s.PanelTiltDeg(), s.PanelAzimuthDeg()
	surface := sky.Surface{TiltDeg: tilt, AzimuthDeg: surfAz, Albedo: s.Site.Albedo}
	p := s.Harvest.Panel
	pv := harvest.Panel{AreaM2: p.AreaCm2 * 1e-4, Efficiency: p.Efficiency, TempCoeffPerC: p.TempCoeffPctPerC / 100,
		NOCTC: p.NOCTC, ChargerEfficiency: s.Harvest.ChargerEfficiency}

	// The Sun's declination, equation of time and distance at each UTC
	// midnight of the table year; slots interpolate between them (they move
	// by at most 0.4° and 0.5 min a day).
	base := time.Date(tableYear, 1, 1, 0, 0, 0, 0, time.UTC)
	eph := make([]sun.Ephemeris, 367)
	for d := range eph {
		eph[d] = sun.EphemerisAt(base.AddDate(0, 0, d))
	}
	solarOffsetMin := lon * 4 // local mean solar time − UTC, minutes
	for d := 0; d < 366; d++ {
		e0, e1 := eph[d], eph[d+1]
		// The day's sunset hour angle and extraterrestrial irradiation, at its
		// middle: the clearness model spreads that over the day.
		midDecl := (e0.DeclinationDeg + e1.DeclinationDeg) / 2
		midGon := sky.NormalWm2((e0.DistanceAU+e1.DistanceAU)/2, sky.SolarConstantWm2)
		wsDeg, _ := sun.HourAngleAtZenithDeg(lat, midDecl, 90)
		h0 := sky.DailyHorizontalWhm2(lat, midDecl, midGon)
		for k := 0; k < y.PerDay; k++ {
			i := d*y.PerDay + k
			minute := (float64(k) + 0.5) * float64(res) // slot midpoint, UTC minutes
			f := minute / 1440
			decl := e0.DeclinationDeg + f*(e1.DeclinationDeg-e0.DeclinationDeg)
			eot := e0.EquationOfTimeMin + f*(e1.EquationOfTimeMin-e0.EquationOfTimeMin)
			dist := e0.DistanceAU + f*(e1.DistanceAU-e0.DistanceAU)
			// NOAA: true solar time = UTC minutes + E + 4·lon; hour angle = TST/4 − 180°.
			ha := math.Mod((minute+eot+4*lon)/4, 360) - 180
			zen, az := sun.Horizontal(lat, decl, ha)
			gon := sky.NormalWm2(dist, sky.SolarConstantWm2)

			var irr sky.Irradiance
			var snowCm float64
			month := solarMonth(d, minute+solarOffsetMin)
			if file != nil {
				irr = sky.Irradiance{GHIWm2: file.ghi[i], DNIWm2: file.dni[i], DHIWm2: file.dhi[i]}
				snowCm = file.snow[i]
				if zen >= 90 {
					irr.DNIWm2 = 0 // the hour's beam belongs to its sunlit part
				}
			} else if zen < 90 {
				// Mean day of the month: H = K̄T·H0, spread by r_t (per hour → W/m²).
				kt := clearness[month-1]
				ghi := kt * h0 * sky.CollaresPereiraRablRt(ha, wsDeg)
				irr = sky.Erbs(ghi, zen, gon)
			}
			y.GHIWm2[i] = irr.GHIWm2
			y.LuxOutdoor[i] = max(sky.IlluminanceLx(irr.GHIWm2, sky.DaylightLmPerW), TwilightLux(90-zen))
			if s.Site.Placement == scenario.Outdoor {
				y.CellTempC[i] = y.TempC[i] + EnclosureRiseC(irr.GHIWm2, enc.Absorptance, enc.UWm2K)
			}
			if !panel || irr.GHIWm2 <= 0 {
				continue
			}
			if 90-zen < harvest.HorizonDeg(s.Site.HorizonDeg, az) {
				irr.DNIWm2 = 0 // the sun is behind an obstruction
			}
			poa := surface.HayDavies(irr, zen, az, gon)
			aoi := sky.AngleOfIncidenceDeg(zen, az, tilt, surfAz)
			g := poa.BeamWm2*sky.IAMASHRAE(aoi, sky.ASHRAEB0) + poa.SkyDiffuseWm2 + poa.GroundWm2
			g *= (1 - soiling[month-1]/100) * (1 - snowLoss[month-1]/100)
			if harvest.SnowCovered(snowCm, tilt) {
				g = 0
			}
			y.HarvestW[i] = pv.OutputW(g, y.TempC[i])
		}
	}
	return y, nil
}

// solarMonth is the month (1–12) of a table row's day shifted by minutes
// (the slot's local mean solar time), wrapping around the year.
func solarMonth(row int, minutes float64) time.Month {
	d := row + int(math.Floor(minutes/1440))
	d = (d%366 + 366) % 366
	m := time.December
	for m > time.January && daysBefore[m-1] > d {
		m--
	}
	return m
}

// fillTemperature sets the table's temperatures: the weather file's where
// it has one and the placement is outdoors, else the climate model's.
func fillTemperature(s scenario.Scenario, y *Year, file *fileSlots) {
	if file != nil && s.Site.Placement == scenario.Outdoor {
		copy(y.TempC, file.temp)
		return
	}
	clim := climateFor(s)
	if clim.Constant() {
		t := clim.TempC(1, 0)
		for i := range y.TempC {
			y.TempC[i] = t
		}
		return
	}
	// Local mean solar time: UTC + longitude/15 h.
	solar := time.Duration(s.Site.LonDeg / 15 * float64(time.Hour))
	base := time.Date(tableYear, 1, 1, 0, 0, 0, 0, time.UTC)
	half := time.Duration(y.ResMin) * time.Minute / 2
	for i := range y.TempC {
		mid := base.Add(time.Duration(i)*time.Duration(y.ResMin)*time.Minute + half).Add(solar)
		hour := float64(mid.Hour()) + float64(mid.Minute())/60 + float64(mid.Second())/3600
		y.TempC[i] = clim.TempC(float64(mid.YearDay())+hour/24, hour)
	}
}

// row returns the table row of a UTC month and day.
func row(m time.Month, d int) int {
	return daysBefore[m-1] + d - 1
}

// daysBefore[m] is the number of days before month m+1 in a leap year.
var daysBefore = [12]int{0, 31, 60, 91, 121, 152, 182, 213, 244, 274, 305, 335}

// Index returns the slot of the instant t.
func (y *Year) Index(t time.Time) int {
	u := t.UTC()
	return row(u.Month(), u.Day())*y.PerDay + (u.Hour()*60+u.Minute())/y.ResMin
}

// climateFor returns the temperature model of a scenario's site: a constant
// for fixed and indoor placements; outdoors the monthly normals in force
// (given or from the preset), else the seasonal curve of the outdoor_*
// fields.
func climateFor(s scenario.Scenario) climate.Model {
	switch s.Site.Placement {
	case scenario.Fixed:
		return climate.Constant(s.Site.FixedTempC)
	case scenario.Indoor:
		return climate.Constant(s.Site.IndoorTempC)
	}
	if tmin, tmax, ok := s.Normals(); ok {
		return climate.Monthly{TminC: tmin, TmaxC: tmax, LatDeg: s.Site.LatDeg}
	}
	coldest := 15.5 // mid-January, common practice
	if s.Site.LatDeg < 0 {
		coldest += 365.25 / 2
	}
	return climate.Seasonal{MeanC: s.Site.OutdoorMeanC, AnnualRangeC: s.Site.OutdoorAnnualRangeC,
		DailyRangeC: s.Site.OutdoorDailyRangeC, ColdestDay: coldest}
}

// EnclosureRiseC is how far the sun lifts a small outdoor enclosure above
// the air, in the steady state of an energy balance with the heat-loss form
// of Faiman's module-temperature model:
//
//	ΔT = α · G / U
//
// with G the global horizontal irradiance on its top, α its solar
// absorptance and U its heat-loss coefficient to the air. Faiman fitted
// U0 ≈ 25 W/(m²·K) in still air for PV modules (from memory); the enclosure's
// own thermal mass, which delays and damps the rise, is ignored.
//
// Reference: D. Faiman, "Assessing the outdoor operating temperature of
// photovoltaic modules", Progress in Photovoltaics 16 (2008) 307–315.
func EnclosureRiseC(ghiWm2, absorptance, uWm2K float64) float64 {
	return absorptance * max(ghiWm2, 0) / uWm2K
}

// TwilightLux is the outdoor illuminance when the sun is low or just below
// the horizon, where irradiance models give nothing: about 400 lx at sunset,
// falling tenfold every 2.5° of depression to about 1.6 lx at −6°, the end
// of civil twilight (common practice: a few lux at the end of civil
// twilight, hundreds at sunset; from memory). Above the horizon it is held at
// 400 lx as a floor under the daylight model.
func TwilightLux(elevationDeg float64) float64 {
	return twilightFloorLux * math.Pow(10, 0.4*min(elevationDeg, 0))
}

// twilightFloorLux is the illuminance at sunset, the floor under daylight.
const twilightFloorLux = 400
