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
	Forms          []Form      `json:"forms"`
	Sources        []Source    `json:"sources"`
}

// ArrheniusEaCommon is the activation energy that doubles a reaction rate
// between 25 °C and 35 °C: Ea = R·ln2 / (1/298.15 − 1/308.15) = 52.9 kJ/mol.
// The doubling per 10 °C is common practice for self-discharge (Battery
// University BU-802b; REFERENCE-VALUES §6.4 computes the implied Ea).
const ArrheniusEaCommon = GasConstant * math.Ln2 / (1/298.15 - 1/308.15)

// Library returns the cell library, sorted by ID. Each call returns a fresh
// copy, so callers may keep or change it.
func Library() []Chemistry {
	lib := []Chemistry{
		{
			ID:      "li-socl2",
			Name:    "lithium thionyl chloride (bobbin)",
			Primary: true,
			// IEC 60086-1 designation voltage for ER cells: 3.6 V.
			NominalV: 3.6,
			// Bobbin cells hold a flat plateau near 3.5 V at µA–mA loads (from memory).
			MeanDischargeV: 3.5,
			// Datasheet end voltage for ER bobbin cells is 2.0 V (from memory).
			CutoffV: 2.0,
			// Thionyl chloride: about 1 % per year (Wikipedia "Self-discharge" table;
			// Linden & Reddy, Handbook of Batteries, 4th ed., 2011, Li primary chapter).
			SelfDischargePerYear:    0.01,
			ActivationEnergyJPerMol: ArrheniusEaCommon,
			// Rated range of bobbin cells, −55 to +85 °C (from memory).
			OperatingMinC: -55, OperatingMaxC: 85,
			// Common practice / from memory (REFERENCE-VALUES §6.2: 0.90–0.97 at 0 °C,
			// 0.70–0.85 at −20 °C at µA–mA loads); −40 °C from memory.
			CapacityVsTemp: []TempPoint{{-40, 0.55}, {-20, 0.78}, {0, 0.93}, {20, 1}, {40, 1}, {60, 0.97}},
			// Typical bobbin-cell datasheet capacities at low drain to 2.0 V
			// (ER14505, ER26500, ER34615; from memory).
			Forms: []Form{{"AA", 2600}, {"C", 8500}, {"D", 19000}},
			Sources: []Source{
				{"nominal_v", "IEC 60086-1 designation voltage for ER cells"},
				{"mean_discharge_v", "from memory: flat plateau near 3.5 V at low drain"},
				{"cutoff_v", "from memory: bobbin-cell datasheets rate capacity to 2.0 V"},
				{"self_discharge_per_year", "Linden & Reddy, Handbook of Batteries, 4th ed. (2011); Wikipedia 'Self-discharge' table: 1 %/yr"},
				{"activation_energy_j_per_mol", "common practice: rate doubles per 10 °C (Battery University BU-802b)"},
				{"capacity_vs_temp", "common practice / from memory, after Linden's handbook curves"},
				{"forms", "from memory: typical ER14505 / ER26500 / ER34615 datasheets"},
				{"operating_c", "from memory: typical bobbin-cell rating"},
			},
		},
		{
			ID:      "alkaline",
			Name:    "alkaline zinc–manganese dioxide",
			Primary: true,
			// IEC 60086-1 designation voltage for LR cells: 1.5 V.
			NominalV: 1.5,
			// The voltage slopes from 1.5 V to the cut-off; mean near 1.25 V at low
			// drain (from memory).
			MeanDischargeV: 1.25,
			CutoffV:        0.9, // common practice end voltage for 1.5 V devices
			// 2–4 %/yr, 5–10 yr shelf life: Battery University BU-802b (REFERENCE-VALUES §6.1).
			SelfDischargePerYear:    0.03,
			ActivationEnergyJPerMol: ArrheniusEaCommon,
			OperatingMinC:           -18, OperatingMaxC: 55, // from memory: typical LR6 datasheet rating
			// Common practice / from memory (REFERENCE-VALUES §6.2: 0.70–0.85 at 0 °C,
			// 0.10–0.40 at −20 °C at 25–100 mA; better at µA drain).
			CapacityVsTemp: []TempPoint{{-40, 0.05}, {-20, 0.3}, {0, 0.78}, {20, 1}, {40, 1}, {60, 0.95}},
			// Low-drain capacities of LR03 / LR6 / LR14 / LR20 (from memory).
			Forms: []Form{{"AAA", 1150}, {"AA", 2850}, {"C", 8000}, {"D", 17000}},
			Sources: []Source{
				{"nominal_v", "IEC 60086-1 designation voltage for LR cells"},
				{"mean_discharge_v", "from memory: sloping discharge, mean about 1.25 V at low drain"},
				{"cutoff_v", "common practice: 0.9 V end voltage"},
				{"self_discharge_per_year", "Battery University BU-802b: 2–4 %/yr, 5–10 yr shelf life"},
				{"activation_energy_j_per_mol", "common practice: rate doubles per 10 °C (Battery University BU-802b)"},
				{"capacity_vs_temp", "common practice / from memory, after Linden's handbook curves; strongly rate dependent"},
				{"forms", "from memory: typical LR03 / LR6 / LR14 / LR20 datasheets at low drain"},
				{"operating_c", "from memory: typical LR6 datasheet rating"},
			},
		},
		{
			ID:   "li-ion",
			Name: "lithium-ion (NMC/LCO)",
			// Nominal 3.6 V (IEC 61960-3 cells are commonly rated 3.6–3.7 V; from memory).
			NominalV:       3.6,
			MeanDischargeV: 3.6,
			CutoffV:        3.0, // common practice end voltage for protected NMC/LCO cells
			// 1–2 %/month after the first day, plus about 3 %/month with a protection
			// circuit: Battery University BU-802b. 2 %/month ≈ 22 %/yr.
			SelfDischargePerYear:    0.22,
			ActivationEnergyJPerMol: ArrheniusEaCommon,
			// Discharge −20 to +60 °C, charge 0 to 45 °C: Battery University BU-410.
			OperatingMinC: -20, OperatingMaxC: 60,
			ChargeMinC: 0, ChargeMaxC: 45,
			// Standard charge at 0.5 C (common practice; IEC 61960-3 rates capacity
			// after a manufacturer's standard charge).
			MaxChargeC: 0.5,
			// Coulombic efficiency above 99 %, energy efficiency of charging about
			// 95 % at low rates (common practice).
			ChargeEfficiency: 0.95,
			// Common practice / from memory (REFERENCE-VALUES §6.2: 0.85–0.90 at 0 °C,
			// 0.60–0.75 at −20 °C at C/5); −40 °C after Nagasubramanian (2001), ≈5 %.
			CapacityVsTemp: []TempPoint{{-40, 0.05}, {-20, 0.68}, {0, 0.88}, {20, 1}, {40, 1}, {60, 0.95}},
			// Typical 18650 and 21700 energy cells (from memory).
			Forms: []Form{{"18650", 3000}, {"21700", 4800}},
			Sources: []Source{
				{"nominal_v", "from memory: IEC 61960-3 cells are rated 3.6–3.7 V"},
				{"cutoff_v", "common practice: 3.0 V end voltage"},
				{"self_discharge_per_year", "Battery University BU-802b: 1–2 %/month, 2 %/month used"},
				{"activation_energy_j_per_mol", "common practice: rate doubles per 10 °C (Battery University BU-802b)"},
				{"operating_c", "Battery University BU-410: discharge −20 to 60 °C"},
				{"charge_c", "Battery University BU-410: no charging below 0 °C, up to 45 °C"},
				{"max_charge_c", "common practice: standard charge at 0.5 C"},
				{"charge_efficiency", "common practice: about 95 % energy efficiency at low charge rates"},
				{"capacity_vs_temp", "common practice / from memory; −40 °C after Nagasubramanian, J. Appl. Electrochem. 31 (2001) 99"},
				{"forms", "from memory: typical 18650 and 21700 energy cells"},
			},
		},
	}
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
