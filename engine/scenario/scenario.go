package scenario

import (
	_ "embed"
	"sync"
	"time"
	_ "time/tzdata" // IANA zones inside the binary and the WebAssembly app

	"nodelife/engine/climate"
)

// Format is the value of the top-level "format" key of this version.
const Format = "nodelife.scenario/1"

// Placements of a node.
const (
	Outdoor = "outdoor"
	Indoor  = "indoor"
	Fixed   = "fixed" // a space held at one temperature: a cold room, a freezer
)

// Scenario is one node at one site over a planning horizon.
type Scenario struct {
	Format  string
	Name    string
	Site    Site
	Node    Node
	Cells   Cells
	Harvest Harvest
	Cost    Cost
	Plan    Plan
}

// Cost is what a plan costs, in one currency the user names. The defaults
// are invented demo figures.
type Cost struct {
	Currency    string
	Cell        float64 // per cell
	Panel       float64 // per harvester: charger, mounting, cable
	PanelPerCm2 float64 // per cm² of harvester
	Visit       float64 // per site visit: travel and labour
}

// Site is where the node is and what surrounds it.
type Site struct {
	LatDeg   float64
	LonDeg   float64
	Timezone string // IANA name, e.g. "Europe/Oslo"
	// Placement is Outdoor, Indoor or Fixed.
	Placement   string
	FixedTempC  float64 // used when Placement is Fixed
	IndoorTempC float64 // used when Placement is Indoor
	// The outdoor air: annual mean, warmest minus coldest month, and the
	// typical day's maximum minus minimum. Used when Placement is Outdoor.
	OutdoorMeanC        float64
	OutdoorAnnualRangeC float64
	OutdoorDailyRangeC  float64
	// Albedo is the ground's reflectance in front of a panel.
	Albedo float64
	// WeatherFile names a TMY3 (.csv) or EPW (.epw) typical-year file whose
	// hourly irradiance and temperature replace the monthly model; "" for none.
	WeatherFile string
	// HorizonDeg is the obstruction elevation above the horizon at evenly
	// spaced azimuths from north, clockwise; empty for an open horizon.
	HorizonDeg []float64
	Climate    Climate
	Hours      Hours
	Lighting   Lighting
	// IndoorClosedTempC is the indoor temperature while the site is closed;
	// nil: no setback.
	IndoorClosedTempC *float64
	Enclosure         Enclosure
}

// Enclosure is the node's housing, which the sun warms outdoors.
type Enclosure struct {
	Absorptance float64 // share of sunlight absorbed
	UWm2K       float64 // heat loss to the air, W/(m²·K)
}

// Climate is the site's monthly normals, January first. Absent lists (nil)
// come from the preset.
type Climate struct {
	Preset       string    // "none" or a climate.Presets ID
	TminC, TmaxC []float64 // monthly mean daily minimum and maximum, °C
	Clearness    []float64 // monthly mean daily clearness index K̄T
}

// Hours are when the site is open, on its local clock.
type Hours struct {
	Open, Close string   // "HH:MM"; Close before Open runs past midnight
	Days        []string // "mon" … "sun": the days it opens
}

// Lighting is the illuminance at the node from the site's lights.
type Lighting struct {
	OpenLux, ClosedLux float64
}

// Node is the sensor node's own consumption.
type Node struct {
	Profile              string  // "custom" or a Profiles ID
	SleepUW              float64 // constant always-on draw at the node, µW
	RegulatorEfficiency  float64 // fraction of cell power that reaches the node
	RegulatorQuiescentUA float64 // the regulator's own draw from the cells, µA
	// PeakMA is the node's peak current from the cells; nil: the radio's
	// peak, at least DefaultPeakMA (sim.NodePeakMA).
	PeakMA *float64
	// MinInputV is the lowest cell voltage the node runs on under its peak
	// current; nil: the cells' cut-off voltage.
	MinInputV   *float64
	Vision      Vision
	Illuminator Illuminator
	Events      Events
	Radio       Radio
	Heartbeat   Heartbeat
}

// Vision is the always-on camera.
type Vision struct {
	FPS     float64 // frames per second while the site is open
	FrameUJ float64 // readout and processing energy of a busy frame, µJ
	// ClosedFPS, DarkFPS and BusyFPS: nil leaves FPS as it is.
	ClosedFPS, DarkFPS, BusyFPS *float64
	EmptyShare                  float64 // an empty frame's share of FrameUJ
	SensorMW                    float64 // sensor power while exposing
	ExposureMSAt100Lux          float64
	MaxExposureMS               float64
}

// Illuminator is the LED that lights dark scenes.
type Illuminator struct {
	PowerMW, PulseMS, ThresholdLux float64
}

// Events are detections that wake a host processor and send a message.
type Events struct {
	PerHour     float64   // mean over the week
	WakeMJ      float64   // host energy per wake, mJ
	Occupancy   string    // "flat" or a load.Occupancies ID
	Weekly      []float64 // 168 hourly rates, Monday 00:00 first; nil: PerHour × Occupancy
	DwellS      float64
	HoldoffS    float64
	AwakeS      float64
	PauseVision bool
}

// Radio is how the node sends its messages.
type Radio struct {
	Class        string // "none", "fixed" or a radio.Class
	MessageMJ    float64
	PayloadBytes int
	LoRaSF       int
}

// Heartbeat is a periodic status message.
type Heartbeat struct {
	PerDay float64
}

// Cells are the node's battery.
type Cells struct {
	Chemistry string // a cell.Library ID
	Form      string // a form factor of the chemistry
	Series    int
	Parallel  int
	// CapacityMAh overrides the form factor's rated capacity of one cell when
	// above zero.
	CapacityMAh float64
}

// Harvesters.
const (
	HarvestNone   = "none"
	HarvestPanel  = "panel"  // a small solar panel outdoors
	HarvestIndoor = "indoor" // an indoor-light cell under the site's lights
)

// Harvest is the energy harvester.
type Harvest struct {
	Kind              string
	ChargerEfficiency float64 // charger or MPPT efficiency into the cells
	Panel             Panel
	Indoor            IndoorCell
}

// Panel is a small solar panel.
type Panel struct {
	AreaCm2    float64
	Efficiency float64 // at standard test conditions
	// TiltDeg from horizontal; nil: the site's latitude (|lat|).
	TiltDeg *float64
	// AzimuthDeg from north, clockwise; nil: facing the equator.
	AzimuthDeg       *float64
	TempCoeffPctPerC float64 // power temperature coefficient, %/°C
	NOCTC            float64 // nominal operating cell temperature, °C
	SoilingPct       []float64
	SnowLossPct      []float64
}

// IndoorCell is a photovoltaic cell made for indoor light.
type IndoorCell struct {
	AreaCm2    float64
	Efficiency float64 // under the site's indoor light
	LuxPerWm2  float64 // luminous efficacy of the light source, lm/W
}

// PanelTiltDeg returns the panel's tilt: as given, or the latitude.
func (s Scenario) PanelTiltDeg() float64 {
	if t := s.Harvest.Panel.TiltDeg; t != nil {
		return *t
	}
	return min(abs(s.Site.LatDeg), 90)
}

// PanelAzimuthDeg returns the panel's azimuth: as given, or facing the
// equator (180° north of it, 0° south of it).
func (s Scenario) PanelAzimuthDeg() float64 {
	if a := s.Harvest.Panel.AzimuthDeg; a != nil {
		return *a
	}
	if s.Site.LatDeg < 0 {
		return 0
	}
	return 180
}

// DefaultPeakMA is the node's peak current when the scenario gives none: a
// microcontroller and a low-power radio transmitting (common practice: BLE
// and sub-GHz radios draw 5–45 mA at their usual output powers,
// REFERENCE-VALUES §8).
const DefaultPeakMA = 20.0

// NodeMinInputV returns the lowest cell voltage the node runs on: as given,
// else the pack's cut-off voltage.
func (s Scenario) NodeMinInputV(packCutoffV float64) float64 {
	if s.Node.MinInputV != nil {
		return *s.Node.MinInputV
	}
	return packCutoffV
}

// preset returns the site's climate preset, shifted for its hemisphere.
func (s Scenario) preset() (climate.Preset, bool) {
	p, ok := climate.LookupPreset(s.Site.Climate.Preset)
	return p.ForLatitude(s.Site.LatDeg), ok
}

// Normals returns the monthly mean daily minimum and maximum temperatures in
// force: as given, else the preset's; ok is false when there are none (the
// outdoor_* curve applies).
func (s Scenario) Normals() (tmin, tmax [12]float64, ok bool) {
	p, hasPreset := s.preset()
	tmin, tmax = p.TminC, p.TmaxC
	if c := s.Site.Climate; c.TminC != nil || c.TmaxC != nil {
		if c.TminC != nil {
			copy(tmin[:], c.TminC)
		}
		if c.TmaxC != nil {
			copy(tmax[:], c.TmaxC)
		}
		return tmin, tmax, hasPreset || (c.TminC != nil && c.TmaxC != nil)
	}
	return tmin, tmax, hasPreset
}

// Clearness returns the monthly mean clearness index in force: as given,
// else the preset's, else 0.45 (common practice for a temperate
// mid-latitude site; Duffie & Beckman's monthly tables mostly span 0.35–0.55,
// from memory).
func (s Scenario) Clearness() [12]float64 {
	return s.monthly(s.Site.Climate.Clearness, func(p climate.Preset) [12]float64 { return p.Clearness }, 0.45)
}

// PanelSoilingPct and PanelSnowLossPct return the monthly panel losses in
// force: as given, else the preset's, else 2 % soiling (common practice) and
// no snow.
func (s Scenario) PanelSoilingPct() [12]float64 {
	return s.monthly(s.Harvest.Panel.SoilingPct, func(p climate.Preset) [12]float64 { return p.SoilingPct }, 2)
}

func (s Scenario) PanelSnowLossPct() [12]float64 {
	return s.monthly(s.Harvest.Panel.SnowLossPct, func(p climate.Preset) [12]float64 { return p.SnowLossPct }, 0)
}

func (s Scenario) monthly(given []float64, fromPreset func(climate.Preset) [12]float64, def float64) [12]float64 {
	var out [12]float64
	switch p, ok := s.preset(); {
	case given != nil:
		copy(out[:], given)
	case ok:
		out = fromPreset(p)
	default:
		for i := range out {
			out[i] = def
		}
	}
	return out
}

func abs(x float64) float64 {
	if x < 0 {
		return -x
	}
	return x
}

// Plan is the planning horizon and the swap rules.
type Plan struct {
	Start      string // ISO 8601 calendar date, local to the site
	Years      int
	StepMin    int
	ReservePct float64 // swap when the state of charge falls to this
	// WeatherYears is how many weather years the advice draws; Seed seeds
	// them.
	WeatherYears int
	Seed         int
	// LeadDays is how long before the cells come due the visit is planned;
	// the visit then moves back to the nearest allowed day.
	LeadDays      int
	VisitDays     []string // "mon" … "sun"
	BlockedMonths []string // "jan" … "dec": no visits (roof work in deep winter)
}

// Location returns the site's time zone. It panics on a zone that Parse would
// have rejected.
func (s Scenario) Location() *time.Location {
	if loc, ok := zones.Load(s.Site.Timezone); ok {
		return loc.(*time.Location)
	}
	loc, err := time.LoadLocation(s.Site.Timezone)
	if err != nil {
		panic("scenario: " + err.Error())
	}
	zones.Store(s.Site.Timezone, loc)
	return loc
}

// zones remembers loaded time zones: time.LoadLocation reads a file each
// call, and the advice runs a scenario hundreds of times.
var zones sync.Map

// StartTime returns local midnight at the start of the plan.
func (s Scenario) StartTime() time.Time {
	d, err := time.Parse(time.DateOnly, s.Plan.Start)
	if err != nil {
		panic("scenario: " + err.Error())
	}
	return time.Date(d.Year(), d.Month(), d.Day(), 0, 0, 0, 0, s.Location())
}

// EndTime returns local midnight at the end of the plan.
func (s Scenario) EndTime() time.Time {
	return s.StartTime().AddDate(s.Plan.Years, 0, 0)
}

// Default returns a scenario with every field at its default.
func Default() Scenario {
	var s Scenario
	for _, f := range Fields() {
		f.setDefault(&s)
	}
	return s
}

//go:embed demo.json
var demoJSON []byte

// DemoJSON returns the built-in demo scenario file.
func DemoJSON() []byte { return append([]byte(nil), demoJSON...) }

// Demo returns the built-in demo scenario.
func Demo() Scenario {
	s, err := Parse(demoJSON)
	if err != nil {
		panic("scenario: built-in demo does not parse: " + err.Error())
	}
	return s
}
