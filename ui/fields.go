package ui

import (
	"fmt"
	"strings"

	"nodelife/engine/cell"
	"nodelife/engine/scenario"
)

// fieldSpec is one editable number: its path, our short label and the step of
// an arrow key.
type fieldSpec struct {
	path, label string
	step        float64
}

// groupSpec is a titled run of fields.
type groupSpec struct {
	title  string
	fields []fieldSpec
}

// specsFor lists the editable fields for a scenario. The temperature field is
// the one its placement uses.
func specsFor(s scenario.Scenario) []groupSpec {
	temp := fieldSpec{"site.indoor_temp_c", "Indoor temperature", 1}
	switch s.Site.Placement {
	case scenario.Fixed:
		temp = fieldSpec{"site.fixed_temp_c", "Room temperature", 1}
	case scenario.Outdoor:
		temp = fieldSpec{"site.outdoor_mean_c", "Outdoor mean", 1}
	}
	return []groupSpec{
		{"Node", []fieldSpec{
			{"node.vision.fps", "Frame rate", 1},
			{"node.vision.frame_uj", "Energy per frame", 10},
			{"node.events.per_hour", "Events per hour", 1},
			{"node.events.wake_mj", "Energy per event", 5},
			{"node.sleep_uw", "Sleep power", 5},
		}},
		{"Cells", []fieldSpec{{"cells.capacity_mah", "Cell capacity", 100}}},
		{"Site", []fieldSpec{temp}},
		{"Plan", []fieldSpec{
			{"plan.years", "Plan length", 1},
			{"plan.reserve_pct", "Swap reserve", 1},
		}},
	}
}

// groupInfo is the read-only line beside a group's title: what its fields
// cannot change yet. Each is given long and, where there is one, short
// (chemistry by its ID); the layout takes the long one when it fits.
func groupInfo(title string, s scenario.Scenario) []string {
	switch title {
	case "Cells":
		// 1S1P: cells in series and in parallel, the trade's shorthand.
		pack := fmt.Sprintf("%dS%dP", s.Cells.Series, s.Cells.Parallel)
		short := s.Cells.Form + " · " + s.Cells.Chemistry + " · " + pack
		if c, ok := cell.Lookup(s.Cells.Chemistry); ok {
			name, _, _ := strings.Cut(c.Name, " (") // the name without its qualifier
			return []string{s.Cells.Form + " · " + name + " · " + pack, short}
		}
		return []string{short}
	case "Site":
		return []string{s.Site.Placement + " · " + s.Site.Timezone}
	case "Plan":
		return []string{"from " + s.Plan.Start}
	}
	return nil
}

// valueText is the field's value in s as the box shows it. An unset cell
// capacity shows the form factor's rated capacity.
func valueText(s scenario.Scenario, path string) string {
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
	}
	panic("ui: field " + path + " is not a number")
}

// helpText is the one line under a field: the engine's own description, and
// for an unset capacity, where the number comes from.
func helpText(s scenario.Scenario, f scenario.Field) string {
	if f.Path == "cells.capacity_mah" && s.Cells.CapacityMAh == 0 {
		return "rated capacity of one " + s.Cells.Form + " cell; type a value to override"
	}
	return f.Doc
}
