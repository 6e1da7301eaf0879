package plan

import (
	"fmt"

	"nodelife/engine/scenario"
	"nodelife/engine/sim"
)

// Cautions lists the warnings that apply to a scenario and its run.
func Cautions(s scenario.Scenario, r sim.Result) []Caution {
	chem := r.Pack.Chem
	cs := []Caution{}
	add := func(code, format string, args ...any) {
		cs = append(cs, Caution{Code: code, Message: fmt.Sprintf(format, args...)})
	}
	if r.TempMinC < chem.OperatingMinC || r.TempMaxC > chem.OperatingMaxC {
		add("outside-rated-temperature",
			"The cells see %.0f to %.0f °C, outside the %s rating of %.0f to %.0f °C: cells outside their rated range lose capacity and can fail unsafely. Check the cell maker's datasheet.",
			r.TempMinC, r.TempMaxC, chem.Name, chem.OperatingMinC, chem.OperatingMaxC)
	}
	if f := chem.UsableFraction(r.TempMinC); f < 0.9 {
		add("cold-capacity",
			"At %.0f °C these cells deliver about %.0f %% of their 20 °C capacity; the plan accounts for it, but a colder spell than modelled shortens the life.",
			r.TempMinC, f*100)
	}
	if chem.ID == "li-socl2" {
		add("passivation",
			"Lithium thionyl chloride cells build a passivation layer in storage: the first pulses after a long shelf time can sag (voltage delay). Condition new cells or fit a buffer capacitor if the node wakes a radio.")
	}
	if chem.Primary && chem.ID != "alkaline" {
		add("lithium-primary",
			"Lithium primary cells must never be charged, crushed or short-circuited; lithium cells and packs are dangerous goods in transport (UN 38.3 tested, shipped under the carriers' rules).")
	}
	if !chem.Primary && s.Harvest.Kind == "none" {
		add("rechargeable-without-harvest",
			"Rechargeable %s cells lose about %.0f %% of their charge a year on the shelf and in use; with no harvester a primary chemistry usually lasts longer.",
			chem.Name, chem.SelfDischargePerYear*100)
	}
	return cs
}
