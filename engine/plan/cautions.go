package plan

import (
	"fmt"
	"math"
	"strings"
	"time"

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
	if chem.Primary && s.Harvest.Kind != scenario.HarvestNone {
		add("primary-with-harvester",
			"A %s harvester is fitted to primary %s cells, which must never be charged: the plan lets the harvest feed the node directly and never into the cells. Make sure the circuit cannot charge them (a blocking diode or a supply selector), or choose a rechargeable chemistry.",
			s.Harvest.Kind, chem.Name)
	}
	if !chem.Primary && s.Harvest.Kind != scenario.HarvestNone && r.TempMinC < chem.ChargeMinC {
		add("no-charge-when-cold",
			"%s cells must not be charged below %.0f °C; the plan stops charging when the cells are colder, and the site reaches %.0f °C. Check the charger enforces it.",
			chem.Name, chem.ChargeMinC, r.TempMinC)
	}
	if s.Harvest.Kind == scenario.HarvestPanel {
		add("solar-installation",
			"Mount panels and run cables to local electrical codes; work at height needs the usual precautions.")
	}
	if !chem.Primary && s.Harvest.Kind != scenario.HarvestNone && r.TempMaxC > chem.ChargeMaxC {
		add("no-charge-when-hot",
			"%s cells must not be charged above %.0f °C; the plan stops charging when the cells are warmer, and they reach %.0f °C here. Shade the enclosure or check the charger enforces it.",
			chem.Name, chem.ChargeMaxC, r.TempMaxC)
	}
	if f := r.Pack.Form; f.MaxPulseMA > 0 {
		peak := sim.NodePeakMA(s)
		if limit := f.MaxPulseMA * float64(r.Pack.Parallel); peak > limit {
			add("pulse-current",
				"The node's peak current of %.0f mA is above the %.0f mA pulse rating of %d %s %s cell(s) in parallel: the voltage will sag on every burst. Fit a buffer capacitor beside the cells, add cells in parallel, or choose a cell rated for pulses.",
				peak, limit, r.Pack.Parallel, f.Name, chem.Name)
		}
		// Constant power through the regulator: the current is highest at the
		// cut-off voltage.
		meanMA := r.LoadW.Total() / r.Pack.CutoffV() * 1000
		if limit := f.MaxContinuousMA * float64(r.Pack.Parallel); f.MaxContinuousMA > 0 && meanMA > limit {
			add("continuous-current",
				"The node's mean current of %.1f mA is above the cells' %.0f mA continuous rating; choose larger cells or more in parallel.",
				meanMA, limit)
		}
	}
	if r.BrownoutH > 0 {
		why := "the cells are outside their rated temperature range"
		if r.PlannedBrownoutLimit == sim.LimitVoltage {
			why = "even fresh cells cannot hold the node's minimum voltage under its peak current"
		}
		add("brownouts-in-plan",
			"Even with the swaps as planned, the node browns out for about %.0f hours over the plan, first on %s: %s.",
			r.BrownoutH, r.PlannedBrownout.Format(time.DateOnly), why)
	}
	if chem.ID == "li-socl2" {
		add("passivation",
			"Lithium thionyl chloride cells passivate in storage: the first pulses after a long shelf time sag. Condition new cells or fit a buffer capacitor.")
	}
	// Transport: one line, a pointer to the rules, not legal advice.
	const transport = "dangerous goods in transport: UN 38.3 tested, shipped under the carriers' rules."
	switch lithium := strings.HasPrefix(chem.ID, "li"); {
	case lithium && chem.Primary:
		add("lithium-primary", "Never charge, crush or short-circuit lithium primary cells; they are "+transport)
	case lithium:
		add("lithium-transport", "Lithium-ion cells and packs are "+transport)
	}
	if !chem.Primary && s.Harvest.Kind == "none" {
		add("rechargeable-without-harvest",
			"Rechargeable %s cells lose about %.0f %% of their charge a year on the shelf and in use; with no harvester a primary chemistry usually lasts longer.",
			chem.Name, chem.SelfDischargePerYear*100)
	}
	return cs
}

// inputCautions warn about the files a scenario names.
func inputCautions(s scenario.Scenario, in Inputs) []Caution {
	var cs []Caution
	if w := in.Weather; w != nil {
		if km := distanceKm(s.Site.LatDeg, s.Site.LonDeg, w.Site.LatDeg, w.Site.LonDeg); km > 50 {
			cs = append(cs, Caution{Code: "weather-file-far",
				Message: fmt.Sprintf("The weather file's station (%s, %.2f°, %.2f°) is %.0f km from the site; its weather may not be the site's.",
					w.Site.Name, w.Site.LatDeg, w.Site.LonDeg, km)})
		}
	}
	return cs
}

// distanceKm is the great-circle distance by the haversine formula on a
// sphere of radius 6371 km (the mean Earth radius, IUGG).
func distanceKm(lat1, lon1, lat2, lon2 float64) float64 {
	const r = 6371.0
	rad := math.Pi / 180
	dLat, dLon := (lat2-lat1)*rad, (lon2-lon1)*rad
	a := math.Sin(dLat/2)*math.Sin(dLat/2) + math.Cos(lat1*rad)*math.Cos(lat2*rad)*math.Sin(dLon/2)*math.Sin(dLon/2)
	return 2 * r * math.Asin(math.Min(1, math.Sqrt(a)))
}
