package cell

import (
	"math"
	"sort"
)

// Source ties one parameter of a chemistry to where its value comes from.
type Source struct {
	Field string `json:"field"`
	Text  string `json:"source"`
}

// Form is one standard form factor of a chemistry.
type Form struct {
	Name        string  `json:"name"`         // common designation: "AA", "D", "18650" …
	CapacityMAh float64 `json:"capacity_mah"` // rated capacity of one cell at low drain, 20 °C
	// ResistanceMOhm is the cell's DC internal resistance at 20 °C and half
	// charge, mΩ: what a current pulse drops across the cell.
	ResistanceMOhm float64 `json:"resistance_mohm"`
	// MaxContinuousMA and MaxPulseMA are the largest continuous and pulse
	// (about a second) currents the maker rates the cell for.
	MaxContinuousMA float64 `json:"max_continuous_ma"`
	MaxPulseMA      float64 `json:"max_pulse_ma"`
}

// SoCPoint is one row of an open-circuit voltage curve.
type SoCPoint struct {
	SoC float64 `json:"soc"` // state of charge, 0 (empty at the cut-off) to 1 (full)
	V   float64 `json:"v"`   // open-circuit voltage of one cell
}

// TempPoint is one row of a usable-capacity table.
type TempPoint struct {
	TempC    float64 `json:"temp_c"`
	Fraction float64 `json:"fraction"` // of the 20 °C capacity
}

// Chemistry holds the parameters of one cell chemistry.
type Chemistry struct {
	ID   string `json:"id"`
	Name string `json:"name"`
	// Primary cells must never be charged.
	Primary bool `json:"primary"`
	// NominalV is the nominal voltage of one cell (IEC designation voltage).
	NominalV float64 `json:"nominal_v"`
	// MeanDischargeV is the mean voltage over a low-drain discharge: rated
	// capacity × MeanDischargeV is the cell's energy.
	MeanDischargeV float64 `json:"mean_discharge_v"`
	// CutoffV is the end-of-discharge voltage of one cell.
	CutoffV float64 `json:"cutoff_v"`
	// SelfDischargePerYear is the fraction of rated capacity lost per year at 20 °C.
	SelfDischargePerYear float64 `json:"self_discharge_per_year"`
	// ActivationEnergyJPerMol scales self-discharge with temperature (Arrhenius).
	ActivationEnergyJPerMol float64 `json:"activation_energy_j_per_mol"`
	// OperatingMinC and OperatingMaxC bound the rated discharge temperatures.
	OperatingMinC float64 `json:"operating_min_c"`
	OperatingMaxC float64 `json:"operating_max_c"`
	// ChargeMinC and ChargeMaxC bound charging; zero for primary cells.
	ChargeMinC float64 `json:"charge_min_c"`
	ChargeMaxC float64 `json:"charge_max_c"`
	// MaxChargeC is the highest charge rate, as a multiple of the rated
	// capacity per hour (C-rate); zero for primary cells.
	MaxChargeC float64 `json:"max_charge_c"`
	// ChargeEfficiency is the energy stored per unit of energy charged
	// (coulombic times voltage efficiency); zero for primary cells.
	ChargeEfficiency float64 `json:"charge_efficiency"`
	// CapacityVsTemp is usable capacity against temperature, sorted by TempC.
	CapacityVsTemp []TempPoint `json:"capacity_vs_temp"`
	// OCV is the open-circuit voltage of one cell against state of charge at
	// 20 °C, sorted by SoC, from 0 to 1.
	OCV []SoCPoint `json:"ocv"`
	// ResistanceVsTemp multiplies the forms' 20 °C internal resistance at
	// other temperatures (1 at 20 °C; cold raises it), sorted by TempC.
	ResistanceVsTemp []TempPoint `json:"resistance_vs_temp"`
	// For rechargeable cells: capacity lost to ageing. CalendarFadePerYear is
	// the fraction of capacity lost per year at rest at 20 °C, scaled with
	// temperature by FadeEaJPerMol (Arrhenius); CycleFadePerCycle the fraction
	// lost per equivalent full cycle; at EndOfLife (a fraction of the rated
	// capacity, e.g. 0.8) the cells are due for replacement. Zero for primary
	// cells.
	CalendarFadePerYear float64  `json:"calendar_fade_per_year"`
	FadeEaJPerMol       float64  `json:"fade_activation_energy_j_per_mol"`
	CycleFadePerCycle   float64  `json:"cycle_fade_per_cycle"`
	EndOfLife           float64  `json:"end_of_life"`
	Forms               []Form   `json:"forms"`
	Sources             []Source `json:"sources"`
}

// ArrheniusEaCommon is the activation energy that doubles a reaction rate
// between 25 °C and 35 °C: Ea = R·ln2 / (1/298.15 − 1/308.15) = 52.9 kJ/mol.
// The doubling per 10 °C is common practice for self-discharge (Battery
// University BU-802b; REFERENCE-VALUES §6.4 computes the implied Ea).
const ArrheniusEaCommon = GasConstant * math.Ln2 / (1/298.15 - 1/308.15)

// Library returns the cell library, sorted by ID. Each call returns a fresh
// copy, so callers may keep or change it.
//
// Every number names its source in a comment beside it and in the
// chemistry's Sources, one row per parameter group: nominal_v,
// mean_discharge_v, cutoff_v, self_discharge_per_year,
// activation_energy_j_per_mol, operating_c, capacity_vs_temp, ocv,
// resistance_vs_temp, forms (capacities), forms.resistance_mohm and
// forms.max_current_ma; rechargeable chemistries add charge_c, max_charge_c,
// charge_efficiency, calendar_fade_per_year, fade_activation_energy_j_per_mol,
// cycle_fade_per_cycle and end_of_life.
func Library() []Chemistry {
	lib := []Chemistry{liSOCl2(), liMnO2(), liFeS2(), alkaline(), liIon(), lifePO4(), nimhLSD()}
	sort.Slice(lib, func(i, j int) bool { return lib[i].ID < lib[j].ID })
	return lib
}

// Lookup returns the chemistry with the given identifier.
func Lookup(id string) (Chemistry, bool) {
	for _, c := range Library() {
		if c.ID == id {
			return c, true
		}
	}
	return Chemistry{}, false
}

// IDs lists the identifiers of the library, sorted.
func IDs() []string {
	var ids []string
	for _, c := range Library() {
		ids = append(ids, c.ID)
	}
	return ids
}

// Form returns the named form factor of the chemistry.
func (c Chemistry) Form(name string) (Form, bool) {
	for _, f := range c.Forms {
		if f.Name == name {
			return f, true
		}
	}
	return Form{}, false
}

// FormNames lists the chemistry's form factors in library order.
func (c Chemistry) FormNames() []string {
	var names []string
	for _, f := range c.Forms {
		names = append(names, f.Name)
	}
	return names
}
