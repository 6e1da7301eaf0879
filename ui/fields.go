package ui

import (
	"fmt"
	"slices"
	"strings"

	"nodelife/engine/cell"
	"nodelife/engine/climate"
	"nodelife/engine/scenario"
)

// control is the kind of input a row shows.
type control int

const (
	ctlNumber   control = iota // a typed number
	ctlDate                    // a typed date
	ctlPosition                // typed or pasted "latitude, longitude"
	ctlZone                    // a typed time zone name
	ctlDrop                    // a drop-down
	ctlSegments                // a few options side by side
)

// fieldSpec is one input: its path, our short label, the kind of control,
// the step of an arrow key and, for a slider, its stops.
type fieldSpec struct {
	path, label string
	ctl         control
	step        float64
	stops       []float64
}

// groupSpec is a titled run of inputs.
type groupSpec struct {
	title  string
	fields []fieldSpec
}

// Slider stops: evenly spaced along the track, so the common range gets most
// of it. Frame rates of always-on vision run from about 1 to 30 fps (our
// design notes, PRODUCT.md); events per hour from a quiet corridor to a busy
// doorway (common practice), with the typed field for anything beyond.
var (
	fpsStops    = []float64{0, 0.5, 1, 2, 3, 4, 5, 6, 8, 10, 12, 15, 20, 25, 30}
	eventsStops = []float64{0, 1, 2, 3, 5, 8, 10, 12, 15, 20, 30, 40, 60, 80, 100, 150, 200, 300, 500}
)

// specsFor lists the inputs for a scenario, in Tab order. Which rows show
// depends on the scenario: the temperature of its placement, the climate
// outdoors, the harvester's area when there is one.
func specsFor(s scenario.Scenario) []groupSpec {
	site := []fieldSpec{
		{pathPlace, "Example place", ctlDrop, 0, nil},
		{pathPosition, "Lat, lon", ctlPosition, 0, nil},
		{"site.timezone", "Time zone", ctlZone, 0, nil},
		{"site.placement", "Placement", ctlSegments, 0, nil},
	}
	if s.Site.WeatherFile != "" {
		site = append(site, fieldSpec{"site.weather_file", "Weather", ctlDrop, 0, nil})
	}
	switch s.Site.Placement {
	case scenario.Fixed:
		site = append(site, fieldSpec{"site.fixed_temp_c", "Room temperature", ctlNumber, 1, nil})
	case scenario.Outdoor:
		site = append(site, fieldSpec{"site.climate.preset", "Climate", ctlDrop, 0, nil})
		// The air's mean is the climate's; a weather file brings its own.
		if s.Site.Climate.Preset == "none" && s.Site.Climate.TminC == nil && s.Site.WeatherFile == "" {
			site = append(site, fieldSpec{"site.outdoor_mean_c", "Outdoor mean", ctlNumber, 1, nil})
		}
	default:
		site = append(site, fieldSpec{"site.indoor_temp_c", "Indoor temperature", ctlNumber, 1, nil})
	}
	// The costs of ownership the options view adds up; the harvester's
	// only with a harvester.
	cost := []fieldSpec{
		{"cost.currency", "Currency", ctlDrop, 0, nil},
		{"cost.cell", "Cell price", ctlNumber, 1, nil},
		{"cost.visit", "Visit cost", ctlNumber, 10, nil},
	}
	if s.Harvest.Kind != scenario.HarvestNone {
		cost = append(cost,
			fieldSpec{"cost.panel", "Harvester, fixed", ctlNumber, 1, nil},
			fieldSpec{"cost.panel_per_cm2", "Harvester per cm²", ctlNumber, 0.05, nil})
	}
	harvest := []fieldSpec{{"harvest.kind", "Harvester", ctlSegments, 0, nil}}
	switch s.Harvest.Kind {
	case scenario.HarvestPanel:
		harvest = append(harvest, fieldSpec{"harvest.panel.area_cm2", "Panel area", ctlNumber, 5, nil})
	case scenario.HarvestIndoor:
		harvest = append(harvest, fieldSpec{"harvest.indoor.area_cm2", "Cell area", ctlNumber, 5, nil})
	}
	return []groupSpec{
		{"Site", site},
		{"Node", []fieldSpec{
			{"node.profile", "Node profile", ctlDrop, 0, nil},
			{"node.vision.fps", "Frame rate", ctlNumber, 1, fpsStops},
			{"node.events.per_hour", "Events per hour", ctlNumber, 1, eventsStops},
			{"node.vision.frame_uj", "Energy per frame", ctlNumber, 10, nil},
			{"node.events.wake_mj", "Energy per event", ctlNumber, 5, nil},
			{"node.sleep_uw", "Sleep power", ctlNumber, 5, nil},
			{"node.radio.class", "Radio", ctlDrop, 0, nil},
		}},
		{"Cells", []fieldSpec{
			{"cells.chemistry", "Chemistry", ctlDrop, 0, nil},
			{"cells.form", "Form factor", ctlDrop, 0, nil},
			{"cells.parallel", "In parallel", ctlNumber, 1, nil},
			{"cells.capacity_mah", "Cell capacity", ctlNumber, 100, nil},
		}},
		{"Harvest", harvest},
		{"Plan", []fieldSpec{
			{"plan.start", "Start", ctlDate, 0, nil},
			{"plan.years", "Plan length", ctlNumber, 1, nil},
			{"plan.reserve_pct", "Swap reserve", ctlNumber, 1, nil},
		}},
		{"Cost", cost},
	}
}

// unitFor is the unit an input's box shows: the field's, degrees for the
// position, and the currency for a cost.
func unitFor(s scenario.Scenario, path string) string {
	switch path {
	case pathPosition:
		return "°"
	case "cost.panel_per_cm2":
		return s.Cost.Currency + "/cm²"
	case "cost.cell", "cost.visit", "cost.panel":
		return s.Cost.Currency
	}
	f, _ := scenario.FieldByPath(path)
	return f.Unit
}

// currencies are the currency list's choices: ISO 4217 codes of the
// currencies most trade is invoiced in (common practice); a file may name
// any other, which the list then offers too.
var currencies = []string{"EUR", "USD", "GBP", "CHF", "NOK", "SEK", "DKK", "PLN", "JPY", "CNY", "INR", "CAD", "AUD"}

// Short names of the chemistries for the box (the list shows the full name):
// the trade's shorthand by active materials (common practice).
var chemistryShort = map[string]string{
	"li-socl2": "Li-SOCl2", "li-mno2": "Li-MnO2", "li-fes2": "Li-FeS2", "alkaline": "alkaline",
	"li-ion": "Li-ion", "lifepo4": "LiFePO4", "nimh-lsd": "NiMH LSD",
}

// Names of the radio classes in our words.
var radioNames = map[string][2]string{
	"none":  {"in the wake", "message energy counted in the wake"},
	"fixed": {"fixed energy", "a fixed energy per message"},
	"ble":   {"BLE", "Bluetooth Low Energy advertising"},
	"lora":  {"LoRa-class", "long range, sub-GHz"},
	"wifi":  {"Wi-Fi", "connect and post"},
	"lpwa":  {"LPWA", "cellular LTE-M / NB-IoT"},
}

// optionsFor lists what a choice offers for s.
func optionsFor(s scenario.Scenario, path string) []Option {
	switch path {
	case pathPlace:
		opts := []Option{{Value: "", Label: "your own site"}}
		for _, p := range Places() {
			opts = append(opts, Option{Value: p.Name, Label: p.Name, Detail: fmt.Sprintf("%s, %s", FormatNumber(p.LatDeg), FormatNumber(p.LonDeg))})
		}
		return opts
	case "site.placement":
		return []Option{{scenario.Outdoor, "outdoor", ""}, {scenario.Indoor, "indoor", ""}, {scenario.Fixed, "fixed °C", ""}}
	case "harvest.kind":
		return []Option{{scenario.HarvestNone, "none", ""}, {scenario.HarvestPanel, "panel", ""}, {scenario.HarvestIndoor, "indoor", ""}}
	case "site.climate.preset":
		opts := []Option{{Value: "none", Label: "none", Detail: "mean and ranges below"}}
		for _, p := range climate.Presets() {
			name, _, _ := strings.Cut(p.Name, " (")
			opts = append(opts, Option{Value: p.ID, Label: name})
		}
		return opts
	case "node.profile":
		opts := []Option{{Value: "custom", Label: "custom", Detail: "your own values"}}
		for _, p := range scenario.Profiles() {
			opts = append(opts, Option{Value: p.ID, Label: p.Name})
		}
		return opts
	case "node.radio.class":
		f, _ := scenario.FieldByPath(path)
		var opts []Option
		for _, id := range f.Enum {
			n := radioNames[id]
			opts = append(opts, Option{Value: id, Label: n[0], Detail: n[1]})
		}
		return opts
	case "cells.chemistry":
		var opts []Option
		for _, c := range cell.Library() {
			short := chemistryShort[c.ID]
			if short == "" {
				short = c.ID
			}
			opts = append(opts, Option{Value: c.ID, Label: short, Detail: c.Name})
		}
		return opts
	case "site.weather_file":
		// The file the scenario names, or none: another file is dropped
		// on the page.
		return []Option{
			{Value: s.Site.WeatherFile, Label: weatherKey(s.Site.WeatherFile), Detail: "hourly weather from the file"},
			{Value: "", Label: "climate normals", Detail: "no weather file"},
		}
	case "cost.currency":
		var opts []Option
		for _, c := range currencies {
			opts = append(opts, Option{Value: c, Label: c})
		}
		if !slices.Contains(currencies, s.Cost.Currency) {
			opts = append(opts, Option{Value: s.Cost.Currency, Label: s.Cost.Currency, Detail: "from the file"})
		}
		return opts
	case "cells.form":
		var opts []Option
		if c, ok := cell.Lookup(s.Cells.Chemistry); ok {
			for _, f := range c.Forms {
				opts = append(opts, Option{Value: f.Name, Label: f.Name, Detail: FormatNumber(f.CapacityMAh) + " mAh"})
			}
		}
		return opts
	}
	panic("ui: no options for " + path)
}

// groupInfo is the read-only line beside a group's title, long then short;
// the layout takes the long one when it fits.
func groupInfo(title string, s scenario.Scenario) []string {
	switch title {
	case "Cells":
		// 1S1P: cells in series and in parallel, the trade's shorthand.
		return []string{fmt.Sprintf("%dS%dP", s.Cells.Series, s.Cells.Parallel)}
	case "Node":
		return nil
	}
	return nil
}

// valueText is an input's value in s as its control shows it. An unset cell
// capacity shows the form factor's rated capacity.
func valueText(s scenario.Scenario, path string) string {
	switch path {
	case pathPosition:
		return formatPosition(s.Site.LatDeg, s.Site.LonDeg)
	case pathPlace:
		return placeNear(s.Site.LatDeg, s.Site.LonDeg, s.Site.Timezone)
	}
	f, ok := scenario.FieldByPath(path)
	if !ok {
		panic("ui: unknown field " + path)
	}
	switch v := f.Get(&s).(type) {
	case nil: // an optional field not given
		if path == "cells.capacity_mah" {
			if c, ok := cell.Lookup(s.Cells.Chemistry); ok {
				if form, ok := c.Form(s.Cells.Form); ok {
					return FormatNumber(form.CapacityMAh)
				}
			}
		}
		return ""
	case float64:
		return FormatNumber(v)
	case int:
		return fmt.Sprint(v)
	case string:
		return v
	}
	panic("ui: field " + path + " has no single value")
}

// Help lines of our own, by input, where the full text is too long for one
// line of the narrowest column the form uses (formColMin: the narrow
// layout's, and each of two columns) in the help style: a line cut with "…"
// reads as broken. The row shows the full text, wrapped, while it has the
// keyboard.
var helpLines = map[string]string{
	pathPosition:          "degrees; south and west negative",
	"site.timezone":       "IANA time zone; schedules follow its local clock",
	"site.placement":      "outdoor air, heated indoors, or a set temperature",
	"site.fixed_temp_c":   "the space's set temperature (cold room, freezer)",
	"site.climate.preset": "built-in monthly normals; none: your own values", // with no preset picked
	"node.radio.class":    "message energy: per radio, fixed, or in the wake",
	"harvest.kind":        "a solar panel outdoors or an indoor-light cell",
	"plan.reserve_pct":    "swap the cells at this state of charge",
	"cost.currency":       "the currency of every cost below",
	"site.weather_file":   "a TMY3 or EPW file dropped on the page",
}

// Short lines for the profiles, by ID: what the node does, the first clause
// of the profile's note or less (its radio shows in the Radio row). Every
// note is too long for the line, so every profile needs one.
var profileLines = map[string]string{
	"shelf-watcher":    "watches a shelf for gaps a few times a minute",
	"doorway-counter":  "counts people through a door at 10 fps",
	"wake-on-presence": "wakes a larger processor when someone arrives",
	"parking-bay":      "checks a bay every few seconds outdoors",
	"cold-room":        "watches a cold store once a second",
}

// Short lines for the climate presets whose note is too long, by ID: the
// note with fewer words.
var presetLines = map[string]string{
	"marine-temperate": "mild, cloudy, rain all year: coasts around 50° N",
	"cold-continental": "snowy winters, warm summers: inland 50–55° N",
	"humid-tropical":   "hot, humid, frequent showers: near the equator",
}

// Names of the chemistries for the short line where the library's name is
// too long beside "primary, never charge" or "rechargeable".
var chemistryLines = map[string]string{
	"li-socl2": "lithium thionyl chloride",
	"alkaline": "alkaline zinc–MnO2",
	"nimh-lsd": "low self-discharge NiMH",
}

// helpText is the help under an input: the one line under it, and the full
// text the row shows, wrapped, while it has the keyboard (the same when the
// full text fits the line). The full text is the engine's own description,
// or where ours says more in the app (a profile's or a preset's note, where
// an unset capacity comes from), ours.
func helpText(s scenario.Scenario, path string) (line, full string) {
	line, full = helpParts(s, path)
	if line == "" {
		line = full
	}
	return line, full
}

// helpParts is an input's short help line, "" when the full text is short
// enough to be the line, and its full text.
func helpParts(s scenario.Scenario, path string) (line, full string) {
	switch path {
	case pathPlace:
		return "", "sets latitude, longitude, time zone and climate"
	case pathPosition:
		return helpLines[path], `degrees north and east (south and west negative); paste "59.91, 10.75"`
	case "cells.capacity_mah":
		if s.Cells.CapacityMAh == 0 {
			return "rated capacity per " + s.Cells.Form + " cell; type to override",
				"rated capacity of one " + s.Cells.Form + " cell; type a value to override"
		}
	case "node.profile":
		// The field's own description is about files; in the app a pick
		// sets every node input, and the profile's note says what it is.
		if p, ok := scenario.LookupProfile(s.Node.Profile); ok {
			return profileLines[p.ID], p.Note + "; picking it sets all the node's values"
		}
		return "your own node; pick a profile to start from",
			"your own node; pick a profile to start from a typical node of that kind"
	case "site.climate.preset":
		if p, ok := climate.LookupPreset(s.Site.Climate.Preset); ok {
			return presetLines[p.ID], p.Note
		}
	case "cells.chemistry":
		if c, ok := cell.Lookup(s.Cells.Chemistry); ok {
			kind := "rechargeable"
			if c.Primary {
				kind = "primary, never charge"
			}
			if name, ok := chemistryLines[c.ID]; ok {
				line = name + "; " + kind
			}
			return line, c.Name + "; " + kind
		}
	}
	f, _ := scenario.FieldByPath(path)
	return helpLines[path], f.Doc
}
