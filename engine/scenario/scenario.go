package scenario

import (
	_ "embed"
	"time"
	_ "time/tzdata" // IANA zones inside the binary and the WebAssembly app
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
	Plan    Plan
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
}

// Node is the sensor node's own consumption.
type Node struct {
	SleepUW             float64 // constant always-on draw at the node, µW
	RegulatorEfficiency float64 // fraction of cell power that reaches the node
	Vision              Vision
	Events              Events
}

// Vision is the always-on camera.
type Vision struct {
	FPS     float64 // frames per second
	FrameUJ float64 // energy per frame, µJ
}

// Events are detections that wake a host processor and send a message.
type Events struct {
	PerHour float64
	WakeMJ  float64 // energy per event, host wake plus radio message, mJ
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

// Harvest is the energy harvester. Only "none" exists in this version.
type Harvest struct {
	Kind string
}

// Plan is the planning horizon.
type Plan struct {
	Start      string // ISO 8601 calendar date, local to the site
	Years      int
	StepMin    int
	ReservePct float64 // swap when the state of charge falls to this
}

// Location returns the site's time zone. It panics on a zone that Parse would
// have rejected.
func (s Scenario) Location() *time.Location {
	loc, err := time.LoadLocation(s.Site.Timezone)
	if err != nil {
		panic("scenario: " + err.Error())
	}
	return loc
}

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
