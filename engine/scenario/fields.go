package scenario

import (
	"strings"

	"nodelife/engine/cell"
)

// Kind is the JSON type of a field and how its value is checked.
type Kind int

const (
	Number  Kind = iota // a JSON number within [Min, Max]
	Integer             // a whole JSON number within [Min, Max]
	Text                // a JSON string of at most Max characters
	Choice              // a JSON string from Enum
	Date                // a JSON string "YYYY-MM-DD" within [MinDate, MaxDate]
	Zone                // a JSON string naming an IANA time zone
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
	// Optional fields may be absent or null; they have no default value and
	// their zero value means "not given".
	Optional bool
	// Default is the value an absent field takes: float64, int or string.
	Default any
	// ref returns a pointer into s: *float64, *int or *string.
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

		{Path: "node.sleep_uw", Kind: Number, Unit: "µW", Min: 0, Max: 1e6, Default: 50.0,
			Doc: "constant always-on draw of the node", ref: func(s *Scenario) any { return &s.Node.SleepUW }},
		{Path: "node.regulator_efficiency", Kind: Number, Min: 0.1, Max: 1, Default: 0.85,
			Doc: "fraction of the cell's power that reaches the node", ref: func(s *Scenario) any { return &s.Node.RegulatorEfficiency }},
		{Path: "node.vision.fps", Kind: Number, Unit: "fps", Min: 0, Max: 60, Default: 5.0,
			Doc: "frames per second of the always-on camera", ref: func(s *Scenario) any { return &s.Node.Vision.FPS }},
		{Path: "node.vision.frame_uj", Kind: Number, Unit: "µJ", Min: 0, Max: 1e5, Default: 200.0,
			Doc: "energy per frame: sensor readout plus processing", ref: func(s *Scenario) any { return &s.Node.Vision.FrameUJ }},
		{Path: "node.events.per_hour", Kind: Number, Unit: "/h", Min: 0, Max: 3600, Default: 10.0,
			Doc: "detections per hour that wake the host", ref: func(s *Scenario) any { return &s.Node.Events.PerHour }},
		{Path: "node.events.wake_mj", Kind: Number, Unit: "mJ", Min: 0, Max: 1e5, Default: 50.0,
			Doc: "energy per event: host wake plus radio message", ref: func(s *Scenario) any { return &s.Node.Events.WakeMJ }},

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

		{Path: "harvest.kind", Kind: Choice, Enum: []string{"none"}, Default: "none",
			Doc: "energy harvester", ref: func(s *Scenario) any { return &s.Harvest.Kind }},

		{Path: "plan.start", Kind: Date, Default: "2027-01-01",
			Doc: "first day of the plan, local to the site", ref: func(s *Scenario) any { return &s.Plan.Start }},
		{Path: "plan.years", Kind: Integer, Unit: "y", Min: 1, Max: 20, Default: 5,
			Doc: "planning horizon", ref: func(s *Scenario) any { return &s.Plan.Years }},
		{Path: "plan.step_min", Kind: Integer, Unit: "min", Min: 1, Max: 60, Default: 10,
			Doc: "simulation step", ref: func(s *Scenario) any { return &s.Plan.StepMin }},
		{Path: "plan.reserve_pct", Kind: Number, Unit: "%", Min: 0, Max: 50, Default: 10.0,
			Doc: "swap the cells when the state of charge falls to this", ref: func(s *Scenario) any { return &s.Plan.ReservePct }},
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

// Get returns the field's value in s: float64, int or string.
func (f Field) Get(s *Scenario) any {
	switch p := f.ref(s).(type) {
	case *float64:
		return *p
	case *int:
		return *p
	case *string:
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
	}
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
