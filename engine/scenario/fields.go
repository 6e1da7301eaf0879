package scenario

import (
	"strings"

	"nodelife/engine/cell"
	"nodelife/engine/climate"
	"nodelife/engine/load"
)

// Kind is the JSON type of a field and how its value is checked.
type Kind int

const (
	Number     Kind = iota // a JSON number within [Min, Max]
	Integer                // a whole JSON number within [Min, Max]
	Text                   // a JSON string of at most Max characters
	Choice                 // a JSON string from Enum
	Date                   // a JSON string "YYYY-MM-DD" within [MinDate, MaxDate]
	Zone                   // a JSON string naming an IANA time zone
	Clock                  // a JSON string "HH:MM", 00:00 to 24:00
	NumberList             // a JSON array of numbers, each within [Min, Max]
	ChoiceList             // a JSON array of distinct strings from Enum
	Bool                   // a JSON true or false
)

// Field describes one leaf of the scenario file.
type Field struct {
	Path string // dotted JSON path, e.g. "cells.capacity_mah"
	Kind Kind
	Unit string // shown after the value: "mAh", "°C" …
	Doc  string // one line for the schema, the README and the app's help
	// Min and Max bound Number and Integer values (inclusive) and the length
	// of Text values (Max).
	Min, Max float64
	// Enum lists the allowed values of a Choice.
	Enum []string
	// Len is the exact length of a NumberList, or 0 for any length from
	// MinLen up to MaxLen (lists of choices too; 0: no bound).
	Len, MinLen, MaxLen int
	// Optional fields may be absent or null; they have no default value. A
	// *float64 field is nil when not given; a float64 one is 0 (its Min is
	// above 0).
	Optional bool
	// Default is the value an absent field takes: float64, int, string,
	// []float64 or []string.
	Default any
	// ref returns a pointer into s: *float64, **float64, *int, *string,
	// *[]float64 or *[]string.
	ref func(s *Scenario) any
}

// Date bounds keep the horizon where the NOAA solar equations are accurate
// (1800–2100, per NOAA's "Solar Calculation Details").
const (
	MinDate = "1950-01-01"
	MaxDate = "2079-12-31"
)

// Fields returns the scenario format's fields in file order.
func Fields() []Field {
	return []Field{
		{Path: "format", Kind: Choice, Enum: []string{Format}, Default: Format,
			Doc: "file format and version", ref: func(s *Scenario) any { return &s.Format }},
		{Path: "name", Kind: Text, Max: 200, Default: "Untitled scenario",
			Doc: "a name for this scenario", ref: func(s *Scenario) any { return &s.Name }},

		{Path: "site.lat_deg", Kind: Number, Unit: "°", Min: -90, Max: 90, Default: 51.5,
			Doc: "latitude, north positive", ref: func(s *Scenario) any { return &s.Site.LatDeg }},
		{Path: "site.lon_deg", Kind: Number, Unit: "°", Min: -180, Max: 180, Default: 0.0,
			Doc: "longitude, east positive", ref: func(s *Scenario) any { return &s.Site.LonDeg }},
		{Path: "site.timezone", Kind: Zone, Default: "UTC",
			Doc: "IANA time zone of the site; schedules follow its local clock", ref: func(s *Scenario) any { return &s.Site.Timezone }},
		{Path: "site.placement", Kind: Choice, Enum: []string{Outdoor, Indoor, Fixed}, Default: Indoor,
			Doc: "outdoor air, a heated indoor space, or a space held at one temperature", ref: func(s *Scenario) any { return &s.Site.Placement }},
		{Path: "site.fixed_temp_c", Kind: Number, Unit: "°C", Min: -60, Max: 85, Default: 4.0,
			Doc: "temperature of a fixed-temperature space (cold room, freezer)", ref: func(s *Scenario) any { return &s.Site.FixedTempC }},
		{Path: "site.indoor_temp_c", Kind: Number, Unit: "°C", Min: -10, Max: 45, Default: 20.0,
			Doc: "indoor temperature", ref: func(s *Scenario) any { return &s.Site.IndoorTempC }},
		{Path: "site.outdoor_mean_c", Kind: Number, Unit: "°C", Min: -40, Max: 40, Default: 10.0,
			Doc: "outdoor annual mean air temperature", ref: func(s *Scenario) any { return &s.Site.OutdoorMeanC }},
		{Path: "site.outdoor_annual_range_c", Kind: Number, Unit: "°C", Min: 0, Max: 60, Default: 15.0,
			Doc: "warmest minus coldest monthly mean temperature", ref: func(s *Scenario) any { return &s.Site.OutdoorAnnualRangeC }},
		{Path: "site.outdoor_daily_range_c", Kind: Number, Unit: "°C", Min: 0, Max: 30, Default: 8.0,
			Doc: "typical daily maximum minus minimum temperature", ref: func(s *Scenario) any { return &s.Site.OutdoorDailyRangeC }},

		{Path: "site.albedo", Kind: Number, Min: 0, Max: 1, Default: 0.2,
			Doc: "ground reflectance (albedo) in front of a panel", ref: func(s *Scenario) any { return &s.Site.Albedo }},
		{Path: "site.weather_file", Kind: Text, Max: 500, Default: "",
			Doc: "a TMY3 (.csv) or EPW (.epw) typical-year file, relative to the scenario file; its hourly irradiance and temperature replace the monthly model",
			ref: func(s *Scenario) any { return &s.Site.WeatherFile }},
		{Path: "site.horizon_deg", Kind: NumberList, Unit: "°", Min: 0, Max: 90, MaxLen: 72, Default: []float64{},
			Doc: "obstructions: elevation above the horizon at evenly spaced azimuths from north, clockwise", ref: func(s *Scenario) any { return &s.Site.HorizonDeg }},
		{Path: "site.indoor_closed_temp_c", Kind: Number, Unit: "°C", Min: -10, Max: 45, Optional: true,
			Doc: "indoor temperature while the site is closed (a setback); absent: the same as open", ref: func(s *Scenario) any { return &s.Site.IndoorClosedTempC }},
		{Path: "site.enclosure.absorptance", Kind: Number, Min: 0, Max: 1, Default: 0.5,
			Doc: "share of sunlight the node's enclosure absorbs outdoors (white 0.2, light grey 0.5, black 0.9)", ref: func(s *Scenario) any { return &s.Site.Enclosure.Absorptance }},
		{Path: "site.enclosure.u_w_m2k", Kind: Number, Unit: "W/(m²·K)", Min: 5, Max: 100, Default: 25.0,
			Doc: "heat loss of the enclosure to the air, per m² and K: higher runs cooler in the sun", ref: func(s *Scenario) any { return &s.Site.Enclosure.UWm2K }},
		{Path: "site.climate.preset", Kind: Choice, Enum: append([]string{"none"}, climate.PresetIDs()...), Default: "none",
			Doc: "a built-in climate giving monthly normals, clearness and panel losses (northern months; shifted six months south of the equator)", ref: func(s *Scenario) any { return &s.Site.Climate.Preset }},
		{Path: "site.climate.tmin_c", Kind: NumberList, Unit: "°C", Min: -70, Max: 60, Len: 12, Optional: true,
			Doc: "monthly mean daily minimum air temperature, January first; absent: the preset's, or the outdoor_* curve without one", ref: func(s *Scenario) any { return &s.Site.Climate.TminC }},
		{Path: "site.climate.tmax_c", Kind: NumberList, Unit: "°C", Min: -70, Max: 60, Len: 12, Optional: true,
			Doc: "monthly mean daily maximum air temperature, January first; absent: as tmin_c", ref: func(s *Scenario) any { return &s.Site.Climate.TmaxC }},
		{Path: "site.climate.clearness", Kind: NumberList, Min: 0.05, Max: 0.85, Len: 12, Optional: true,
			Doc: "monthly mean daily clearness index (January first): the share of the sun's energy above the air that reaches the ground; absent: the preset's, or 0.45", ref: func(s *Scenario) any { return &s.Site.Climate.Clearness }},
		{Path: "site.hours.open", Kind: Clock, Default: "07:00",
			Doc: "opening time, local clock", ref: func(s *Scenario) any { return &s.Site.Hours.Open }},
		{Path: "site.hours.close", Kind: Clock, Default: "21:00",
			Doc: "closing time, local clock; before the opening time, the site closes after midnight", ref: func(s *Scenario) any { return &s.Site.Hours.Close }},
		{Path: "site.hours.days", Kind: ChoiceList, Enum: Weekdays(), Default: []string{"mon", "tue", "wed", "thu", "fri", "sat"},
			Doc: "the days the site opens", ref: func(s *Scenario) any { return &s.Site.Hours.Days }},
		{Path: "site.lighting.open_lux", Kind: Number, Unit: "lx", Min: 0, Max: 100000, Default: 500.0,
			Doc: "illuminance at the node while the site is open (indoor and fixed placements)", ref: func(s *Scenario) any { return &s.Site.Lighting.OpenLux }},
		{Path: "site.lighting.closed_lux", Kind: Number, Unit: "lx", Min: 0, Max: 100000, Default: 0.0,
			Doc: "illuminance at the node while the site is closed", ref: func(s *Scenario) any { return &s.Site.Lighting.ClosedLux }},

		{Path: "node.profile", Kind: Choice, Enum: append([]string{"custom"}, ProfileIDs()...), Default: "custom",
			Doc: "a node profile of ours whose values fill every node field the file leaves out", ref: func(s *Scenario) any { return &s.Node.Profile }},
		{Path: "node.sleep_uw", Kind: Number, Unit: "µW", Min: 0, Max: 1e6, Default: 50.0,
			Doc: "constant always-on draw of the node", ref: func(s *Scenario) any { return &s.Node.SleepUW }},
		{Path: "node.regulator_efficiency", Kind: Number, Min: 0.1, Max: 1, Default: 0.85,
			Doc: "fraction of the cell's power that reaches the node", ref: func(s *Scenario) any { return &s.Node.RegulatorEfficiency }},
		{Path: "node.regulator_quiescent_ua", Kind: Number, Unit: "µA", Min: 0, Max: 1000, Default: 0.0,
			Doc: "the regulator's own quiescent current from the cells", ref: func(s *Scenario) any { return &s.Node.RegulatorQuiescentUA }},
		{Path: "node.peak_ma", Kind: Number, Unit: "mA", Min: 0.01, Max: 5000, Optional: true,
			Doc: "the node's peak current from the cells (host and radio burst); absent: the radio's peak, at least 20 mA", ref: func(s *Scenario) any { return &s.Node.PeakMA }},
		{Path: "node.min_input_v", Kind: Number, Unit: "V", Min: 0.5, Max: 60, Optional: true,
			Doc: "the lowest cell voltage the node runs on, under its peak current; absent: the cells' cut-off voltage", ref: func(s *Scenario) any { return &s.Node.MinInputV }},
		{Path: "node.vision.fps", Kind: Number, Unit: "fps", Min: 0, Max: 60, Default: 5.0,
			Doc: "frames per second of the always-on camera", ref: func(s *Scenario) any { return &s.Node.Vision.FPS }},
		{Path: "node.vision.frame_uj", Kind: Number, Unit: "µJ", Min: 0, Max: 1e5, Default: 200.0,
			Doc: "energy per frame: sensor readout plus processing", ref: func(s *Scenario) any { return &s.Node.Vision.FrameUJ }},
		{Path: "node.vision.closed_fps", Kind: Number, Unit: "fps", Min: 0, Max: 60, Optional: true,
			Doc: "frames per second while the site is closed; absent: fps", ref: func(s *Scenario) any { return &s.Node.Vision.ClosedFPS }},
		{Path: "node.vision.dark_fps", Kind: Number, Unit: "fps", Min: 0, Max: 60, Optional: true,
			Doc: "at most this many frames per second while the scene is dark (below the illuminator's threshold); absent: no limit", ref: func(s *Scenario) any { return &s.Node.Vision.DarkFPS }},
		{Path: "node.vision.busy_fps", Kind: Number, Unit: "fps", Min: 0, Max: 60, Optional: true,
			Doc: "frames per second while someone is in view; absent: no change", ref: func(s *Scenario) any { return &s.Node.Vision.BusyFPS }},
		{Path: "node.vision.empty_share", Kind: Number, Min: 0, Max: 1, Default: 1.0,
			Doc: "what a frame of an empty scene costs, as a share of frame_uj (processing stops early)", ref: func(s *Scenario) any { return &s.Node.Vision.EmptyShare }},
		{Path: "node.vision.sensor_mw", Kind: Number, Unit: "mW", Min: 0, Max: 1000, Default: 0.0,
			Doc: "sensor power while exposing; exposures grow in dim light", ref: func(s *Scenario) any { return &s.Node.Vision.SensorMW }},
		{Path: "node.vision.exposure_ms_at_100lux", Kind: Number, Unit: "ms", Min: 0.01, Max: 1000, Default: 10.0,
			Doc: "exposure time at 100 lx; it scales inversely with the scene's illuminance", ref: func(s *Scenario) any { return &s.Node.Vision.ExposureMSAt100Lux }},
		{Path: "node.vision.max_exposure_ms", Kind: Number, Unit: "ms", Min: 0.01, Max: 1000, Default: 66.0,
			Doc: "the longest exposure", ref: func(s *Scenario) any { return &s.Node.Vision.MaxExposureMS }},
		{Path: "node.illuminator.power_mw", Kind: Number, Unit: "mW", Min: 0, Max: 10000, Default: 0.0,
			Doc: "LED power while lit; 0 for none", ref: func(s *Scenario) any { return &s.Node.Illuminator.PowerMW }},
		{Path: "node.illuminator.pulse_ms", Kind: Number, Unit: "ms", Min: 0, Max: 1000, Default: 5.0,
			Doc: "LED on-time per frame", ref: func(s *Scenario) any { return &s.Node.Illuminator.PulseMS }},
		{Path: "node.illuminator.threshold_lux", Kind: Number, Unit: "lx", Min: 0, Max: 10000, Default: 5.0,
			Doc: "the LED lights frames when the scene is darker than this", ref: func(s *Scenario) any { return &s.Node.Illuminator.ThresholdLux }},
		{Path: "node.events.per_hour", Kind: Number, Unit: "/h", Min: 0, Max: 3600, Default: 10.0,
			Doc: "detections per hour that wake the host", ref: func(s *Scenario) any { return &s.Node.Events.PerHour }},
		{Path: "node.events.wake_mj", Kind: Number, Unit: "mJ", Min: 0, Max: 1e5, Default: 50.0,
			Doc: "energy per wake: host power × awake time", ref: func(s *Scenario) any { return &s.Node.Events.WakeMJ }},
		{Path: "node.events.occupancy", Kind: Choice, Enum: append([]string{"flat"}, load.OccupancyIDs()...), Default: "flat",
			Doc: "weekly pattern of detections around per_hour, its weekly mean (flat: the same every hour)", ref: func(s *Scenario) any { return &s.Node.Events.Occupancy }},
		{Path: "node.events.weekly", Kind: NumberList, Unit: "/h", Min: 0, Max: 3600, Len: 168, Optional: true,
			Doc: "detections per hour for each hour of the week, Monday 00:00 first, local clock; replaces per_hour and occupancy", ref: func(s *Scenario) any { return &s.Node.Events.Weekly }},
		{Path: "node.events.dwell_s", Kind: Number, Unit: "s", Min: 0, Max: 3600, Default: 10.0,
			Doc: "how long a detected presence stays in view", ref: func(s *Scenario) any { return &s.Node.Events.DwellS }},
		{Path: "node.events.holdoff_s", Kind: Number, Unit: "s", Min: 0, Max: 3600, Default: 0.0,
			Doc: "detections closer than this merge into one wake", ref: func(s *Scenario) any { return &s.Node.Events.HoldoffS }},
		{Path: "node.events.awake_s", Kind: Number, Unit: "s", Min: 0, Max: 600, Default: 2.0,
			Doc: "how long the host stays up per wake", ref: func(s *Scenario) any { return &s.Node.Events.AwakeS }},
		{Path: "node.events.pause_vision", Kind: Bool, Default: false,
			Doc: "stop looking while the host is up", ref: func(s *Scenario) any { return &s.Node.Events.PauseVision }},
		{Path: "node.radio.class", Kind: Choice, Enum: []string{"none", "fixed", "ble", "lora", "wifi", "lpwa"}, Default: "none",
			Doc: "the radio: none (wake_mj includes the message), fixed (message_mj each), or a radio class computed per message", ref: func(s *Scenario) any { return &s.Node.Radio.Class }},
		{Path: "node.radio.message_mj", Kind: Number, Unit: "mJ", Min: 0, Max: 1e5, Default: 0.0,
			Doc: "energy per message for class fixed", ref: func(s *Scenario) any { return &s.Node.Radio.MessageMJ }},
		{Path: "node.radio.payload_bytes", Kind: Integer, Unit: "B", Min: 0, Max: 222, Default: 20,
			Doc: "application payload per message (BLE advertising: at most 31)", ref: func(s *Scenario) any { return &s.Node.Radio.PayloadBytes }},
		{Path: "node.radio.lora_sf", Kind: Integer, Min: 7, Max: 12, Default: 9,
			Doc: "LoRa spreading factor (125 kHz, coding rate 4/5)", ref: func(s *Scenario) any { return &s.Node.Radio.LoRaSF }},
		{Path: "node.heartbeat.per_day", Kind: Number, Unit: "/d", Min: 0, Max: 1440, Default: 0.0,
			Doc: "periodic status messages per day", ref: func(s *Scenario) any { return &s.Node.Heartbeat.PerDay }},

		{Path: "cells.chemistry", Kind: Choice, Enum: cell.IDs(), Default: "li-socl2",
			Doc: "cell chemistry", ref: func(s *Scenario) any { return &s.Cells.Chemistry }},
		{Path: "cells.form", Kind: Choice, Enum: allForms(), Default: "D",
			Doc: "form factor; must exist for the chemistry", ref: func(s *Scenario) any { return &s.Cells.Form }},
		{Path: "cells.series", Kind: Integer, Min: 1, Max: 12, Default: 1,
			Doc: "cells in series", ref: func(s *Scenario) any { return &s.Cells.Series }},
		{Path: "cells.parallel", Kind: Integer, Min: 1, Max: 20, Default: 1,
			Doc: "cells in parallel", ref: func(s *Scenario) any { return &s.Cells.Parallel }},
		{Path: "cells.capacity_mah", Kind: Number, Unit: "mAh", Min: 1, Max: 1e6, Optional: true,
			Doc: "rated capacity of one cell; absent: the form factor's", ref: func(s *Scenario) any { return &s.Cells.CapacityMAh }},

		{Path: "harvest.kind", Kind: Choice, Enum: []string{HarvestNone, HarvestPanel, HarvestIndoor}, Default: HarvestNone,
			Doc: "energy harvester: none, a solar panel outdoors, or an indoor-light cell", ref: func(s *Scenario) any { return &s.Harvest.Kind }},
		{Path: "harvest.charger_efficiency", Kind: Number, Min: 0.1, Max: 1, Default: 0.8,
			Doc: "efficiency of the charger (or MPPT) between the harvester and the cells", ref: func(s *Scenario) any { return &s.Harvest.ChargerEfficiency }},
		{Path: "harvest.panel.area_cm2", Kind: Number, Unit: "cm²", Min: 1, Max: 100000, Default: 40.0,
			Doc: "panel area", ref: func(s *Scenario) any { return &s.Harvest.Panel.AreaCm2 }},
		{Path: "harvest.panel.efficiency", Kind: Number, Min: 0.01, Max: 0.5, Default: 0.17,
			Doc: "panel efficiency at standard test conditions", ref: func(s *Scenario) any { return &s.Harvest.Panel.Efficiency }},
		{Path: "harvest.panel.tilt_deg", Kind: Number, Unit: "°", Min: 0, Max: 90, Optional: true,
			Doc: "tilt from horizontal; absent: the latitude", ref: func(s *Scenario) any { return &s.Harvest.Panel.TiltDeg }},
		{Path: "harvest.panel.azimuth_deg", Kind: Number, Unit: "°", Min: 0, Max: 360, Optional: true,
			Doc: "direction the panel faces, from north clockwise; absent: the equator", ref: func(s *Scenario) any { return &s.Harvest.Panel.AzimuthDeg }},
		{Path: "harvest.panel.temp_coeff_pct_per_c", Kind: Number, Unit: "%/°C", Min: -1, Max: 0, Default: -0.4,
			Doc: "change of panel power per °C of cell temperature above 25 °C", ref: func(s *Scenario) any { return &s.Harvest.Panel.TempCoeffPctPerC }},
		{Path: "harvest.panel.noct_c", Kind: Number, Unit: "°C", Min: 20, Max: 70, Default: 45.0,
			Doc: "nominal operating cell temperature (800 W/m², 20 °C air)", ref: func(s *Scenario) any { return &s.Harvest.Panel.NOCTC }},
		{Path: "harvest.panel.soiling_pct", Kind: NumberList, Unit: "%", Min: 0, Max: 100, Len: 12, Optional: true,
			Doc: "monthly loss to dust and dirt (January first); absent: the climate preset's, or 2 %", ref: func(s *Scenario) any { return &s.Harvest.Panel.SoilingPct }},
		{Path: "harvest.panel.snow_loss_pct", Kind: NumberList, Unit: "%", Min: 0, Max: 100, Len: 12, Optional: true,
			Doc: "monthly loss to snow cover (January first); absent: the climate preset's, or none; a weather file's snow depth adds to it", ref: func(s *Scenario) any { return &s.Harvest.Panel.SnowLossPct }},
		{Path: "harvest.indoor.area_cm2", Kind: Number, Unit: "cm²", Min: 1, Max: 10000, Default: 20.0,
			Doc: "indoor-light cell area", ref: func(s *Scenario) any { return &s.Harvest.Indoor.AreaCm2 }},
		{Path: "harvest.indoor.efficiency", Kind: Number, Min: 0.005, Max: 0.5, Default: 0.05,
			Doc: "cell efficiency under the site's indoor light", ref: func(s *Scenario) any { return &s.Harvest.Indoor.Efficiency }},
		{Path: "harvest.indoor.lux_per_wm2", Kind: Number, Unit: "lm/W", Min: 50, Max: 700, Default: 300.0,
			Doc: "luminous efficacy of the indoor light: lux per W/m²", ref: func(s *Scenario) any { return &s.Harvest.Indoor.LuxPerWm2 }},

		{Path: "cost.currency", Kind: Text, Max: 12, Default: "EUR",
			Doc: "the currency of the costs below (a name or ISO 4217 code)", ref: func(s *Scenario) any { return &s.Cost.Currency }},
		{Path: "cost.cell", Kind: Number, Min: 0, Max: 1e6, Default: 9.0,
			Doc: "price of one cell", ref: func(s *Scenario) any { return &s.Cost.Cell }},
		{Path: "cost.panel", Kind: Number, Min: 0, Max: 1e6, Default: 15.0,
			Doc: "fixed cost of a harvester: charger, mounting, cable", ref: func(s *Scenario) any { return &s.Cost.Panel }},
		{Path: "cost.panel_per_cm2", Kind: Number, Min: 0, Max: 1e4, Default: 0.2,
			Doc: "cost of harvester area per cm²", ref: func(s *Scenario) any { return &s.Cost.PanelPerCm2 }},
		{Path: "cost.visit", Kind: Number, Min: 0, Max: 1e7, Default: 120.0,
			Doc: "cost of one site visit: travel and labour", ref: func(s *Scenario) any { return &s.Cost.Visit }},

		{Path: "plan.start", Kind: Date, Default: "2027-01-01",
			Doc: "first day of the plan, local to the site", ref: func(s *Scenario) any { return &s.Plan.Start }},
		{Path: "plan.years", Kind: Integer, Unit: "y", Min: 1, Max: 20, Default: 5,
			Doc: "planning horizon", ref: func(s *Scenario) any { return &s.Plan.Years }},
		{Path: "plan.step_min", Kind: Integer, Unit: "min", Min: 1, Max: 60, Default: 10,
			Doc: "simulation step", ref: func(s *Scenario) any { return &s.Plan.StepMin }},
		{Path: "plan.reserve_pct", Kind: Number, Unit: "%", Min: 0, Max: 50, Default: 10.0,
			Doc: "swap the cells when the state of charge falls to this", ref: func(s *Scenario) any { return &s.Plan.ReservePct }},
		{Path: "plan.weather_years", Kind: Integer, Min: 0, Max: 1000, Default: 100,
			Doc: "weather years drawn for the risk and sizing advice (0: none)", ref: func(s *Scenario) any { return &s.Plan.WeatherYears }},
		{Path: "plan.seed", Kind: Integer, Min: 0, Max: 2147483647, Default: 1,
			Doc: "seed of the weather draws: the same seed gives the same answer", ref: func(s *Scenario) any { return &s.Plan.Seed }},
		{Path: "plan.lead_days", Kind: Integer, Unit: "d", Min: 0, Max: 365, Default: 0,
			Doc: "plan each visit this long before the cells come due", ref: func(s *Scenario) any { return &s.Plan.LeadDays }},
		{Path: "plan.visit_days", Kind: ChoiceList, Enum: Weekdays(), MinLen: 1, Default: []string{"mon", "tue", "wed", "thu", "fri"},
			Doc: "the days a crew can visit; a visit moves back to the nearest one", ref: func(s *Scenario) any { return &s.Plan.VisitDays }},
		{Path: "plan.blocked_months", Kind: ChoiceList, Enum: Months(), MaxLen: 11, Default: []string{},
			Doc: "months with no visits (for example no roof work in deep winter)", ref: func(s *Scenario) any { return &s.Plan.BlockedMonths }},
	}
}

// FieldByPath returns the field with the given path.
func FieldByPath(path string) (Field, bool) {
	for _, f := range Fields() {
		if f.Path == path {
			return f, true
		}
	}
	return Field{}, false
}

// Get returns the field's value in s: float64, int, string, []float64,
// []string, or nil for an optional field not given.
func (f Field) Get(s *Scenario) any {
	switch p := f.ref(s).(type) {
	case *float64:
		if f.Optional && *p == 0 {
			return nil
		}
		return *p
	case **float64:
		if *p == nil {
			return nil
		}
		return **p
	case *int:
		return *p
	case *string:
		return *p
	case *[]float64:
		if f.Optional && *p == nil {
			return nil
		}
		return *p
	case *[]string:
		return *p
	case *bool:
		return *p
	}
	panic("scenario: field " + f.Path + " has no value")
}

func (f Field) setDefault(s *Scenario) {
	if f.Optional {
		return
	}
	switch p := f.ref(s).(type) {
	case *float64:
		*p = f.Default.(float64)
	case *int:
		*p = f.Default.(int)
	case *string:
		*p = f.Default.(string)
	case *[]float64:
		*p = append([]float64{}, f.Default.([]float64)...)
	case *[]string:
		*p = append([]string{}, f.Default.([]string)...)
	case *bool:
		*p = f.Default.(bool)
	}
}

// Months are the identifiers of the months, January first.
func Months() []string {
	return []string{"jan", "feb", "mar", "apr", "may", "jun", "jul", "aug", "sep", "oct", "nov", "dec"}
}

// Weekdays are the identifiers of the days of the week, Monday first.
func Weekdays() []string { return []string{"mon", "tue", "wed", "thu", "fri", "sat", "sun"} }

func repeat(x float64, n int) []float64 {
	out := make([]float64, n)
	for i := range out {
		out[i] = x
	}
	return out
}

// Name is the last element of the field's path.
func (f Field) Name() string { return f.Path[strings.LastIndexByte(f.Path, '.')+1:] }

// objects lists the paths of the scenario's objects, "" for the top level.
func objects() map[string]bool {
	objs := map[string]bool{"": true}
	for _, f := range Fields() {
		p := f.Path
		for i := strings.LastIndexByte(p, '.'); i >= 0; i = strings.LastIndexByte(p, '.') {
			p = p[:i]
			objs[p] = true
		}
	}
	return objs
}

func allForms() []string {
	seen := map[string]bool{}
	var forms []string
	for _, c := range cell.Library() {
		for _, f := range c.Forms {
			if !seen[f.Name] {
				seen[f.Name] = true
				forms = append(forms, f.Name)
			}
		}
	}
	return forms
}
