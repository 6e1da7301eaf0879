package cell

// The rechargeable chemistries of the library. Form capacities are rated at
// C/5 and 20 °C (IEC 61960-3 for lithium cells, IEC 61951-2 for NiMH, from
// memory); resistances are DC values at 20 °C and half charge; current
// limits are the maker's continuous and pulse ratings. Sources are cited
// generically (a designation, never a brand).

// liIon is the lithium-ion cell with an NMC or LCO cathode and a graphite
// anode.
func liIon() Chemistry {
	return Chemistry{
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
		// Rested open-circuit voltage of a graphite/NMC cell charged to 4.2 V
		// (common practice; the usual OCV–SoC table of cell datasheets).
		OCV: []SoCPoint{
			{0, 3.0}, {0.05, 3.45}, {0.1, 3.55}, {0.2, 3.65}, {0.3, 3.7}, {0.4, 3.75},
			{0.5, 3.8}, {0.6, 3.86}, {0.7, 3.93}, {0.8, 4.0}, {0.9, 4.08}, {1, 4.2},
		},
		// DC resistance rises steeply in the cold: about 2× at 0 °C, 4–5× at
		// −20 °C, an order of magnitude at −40 °C (from memory, after the review by
		// Jaguemont et al., Appl. Energy 164 (2016) 99).
		ResistanceVsTemp: []TempPoint{{-40, 12}, {-20, 4.5}, {0, 2}, {20, 1}, {40, 0.8}, {60, 0.7}},
		// Storage for a year at 25 °C and 40 % charge keeps 96 % of the capacity
		// (Battery University BU-808 storage table; from memory): 4 %/yr at 25 °C,
		// ×0.71 (Arrhenius, common Ea) ≈ 3 %/yr at 20 °C. Stored full, the loss is
		// several times higher (same table).
		CalendarFadePerYear: 0.03,
		FadeEaJPerMol:       ArrheniusEaCommon,
		// Typical datasheet: 80 % of rated capacity after 500 full cycles at
		// 20–25 °C (from memory): 0.2 / 500 per cycle.
		CycleFadePerCycle: 0.2 / 500,
		EndOfLife:         0.8, // common practice end-of-life criterion
		// Typical energy cells (from memory): 14500 800 mAh, about 100 mΩ AC
		// (a typical 14500 datasheet), 2 C continuous; 18650 3000 mAh and 21700
		// 4800 mAh energy cells at 1.5–2 C continuous and about 3 C for
		// seconds; 26650 5000 mAh. DC resistance ≈ 1.5× the 1 kHz AC value
		// (common practice).
		Forms: []Form{
			{Name: "14500", CapacityMAh: 800, ResistanceMOhm: 150, MaxContinuousMA: 1600, MaxPulseMA: 3000},
			{Name: "18650", CapacityMAh: 3000, ResistanceMOhm: 45, MaxContinuousMA: 6000, MaxPulseMA: 10000},
			{Name: "21700", CapacityMAh: 4800, ResistanceMOhm: 30, MaxContinuousMA: 9600, MaxPulseMA: 15000},
			{Name: "26650", CapacityMAh: 5000, ResistanceMOhm: 30, MaxContinuousMA: 10000, MaxPulseMA: 15000},
		},
		Sources: []Source{
			{"nominal_v", "from memory: IEC 61960-3 cells are rated 3.6–3.7 V"},
			{"mean_discharge_v", "from memory: mean of a C/5 discharge from 4.2 V to 3.0 V, 3.6–3.7 V"},
			{"cutoff_v", "common practice: 3.0 V end voltage"},
			{"self_discharge_per_year", "Battery University BU-802b: 1–2 %/month, 2 %/month used"},
			{"activation_energy_j_per_mol", "common practice: rate doubles per 10 °C (Battery University BU-802b)"},
			{"operating_c", "Battery University BU-410: discharge −20 to 60 °C"},
			{"charge_c", "Battery University BU-410: no charging below 0 °C, up to 45 °C"},
			{"max_charge_c", "common practice: standard charge at 0.5 C"},
			{"charge_efficiency", "common practice: about 95 % energy efficiency at low charge rates"},
			{"capacity_vs_temp", "common practice / from memory; −40 °C after Nagasubramanian, J. Appl. Electrochem. 31 (2001) 99"},
			{"ocv", "common practice: rested OCV–SoC table of graphite/NMC cells charged to 4.2 V"},
			{"resistance_vs_temp", "from memory, after Jaguemont et al., Appl. Energy 164 (2016) 99"},
			{"calendar_fade_per_year", "from memory: Battery University BU-808, 96 % after a year at 25 °C and 40 % charge, scaled to 20 °C"},
			{"fade_activation_energy_j_per_mol", "common practice: rate doubles per 10 °C"},
			{"cycle_fade_per_cycle", "from memory: typical datasheet, 80 % after 500 full cycles"},
			{"end_of_life", "common practice: 80 % of rated capacity"},
			{"forms", "from memory: typical 14500, 18650, 21700 and 26650 energy cells"},
			{"forms.resistance_mohm", "from memory: typical datasheet AC resistance × 1.5 for DC (common practice)"},
			{"forms.max_current_ma", "from memory: typical energy-cell datasheets, about 2 C continuous"},
		},
	}
}

// lifePO4 is the lithium iron phosphate cell: a lower, very flat voltage,
// long cycle life and slow ageing.
func lifePO4() Chemistry {
	return Chemistry{
		ID:   "lifepo4",
		Name: "lithium iron phosphate (LiFePO4)",
		// Nominal 3.2 V, flat plateau 3.2–3.3 V; end voltage 2.5 V (2.0–2.5 V on
		// typical LiFePO4 datasheets; common practice).
		NominalV:       3.2,
		MeanDischargeV: 3.2,
		CutoffV:        2.5,
		// REFERENCE-VALUES §6.1: about 1–3 %/month (common practice); 2 %/month ≈
		// 22 %/yr, as for Li-ion.
		SelfDischargePerYear:    0.22,
		ActivationEnergyJPerMol: ArrheniusEaCommon,
		// Typical LiFePO4 datasheet: discharge −20 to +60 °C (from memory); charge
		// 0 to 45 °C, the lithium-ion window of Battery University BU-410 (the
		// graphite anode plates lithium below 0 °C whatever the cathode).
		OperatingMinC: -20, OperatingMaxC: 60,
		ChargeMinC: 0, ChargeMaxC: 45,
		// Standard charge 0.5 C (common practice; datasheets allow 1 C and more).
		MaxChargeC: 0.5,
		// Coulombic efficiency above 99 % and a flat voltage: about 95 % energy
		// efficiency at low rates (common practice).
		ChargeEfficiency: 0.95,
		// Common practice / from memory (REFERENCE-VALUES §6.2: 0.80–0.90 at 0 °C,
		// 0.55–0.70 at −20 °C at C/5); −40 °C from memory.
		CapacityVsTemp: []TempPoint{{-40, 0.15}, {-20, 0.62}, {0, 0.85}, {20, 1}, {40, 1}, {60, 0.97}},
		// The flat two-phase plateau near 3.3 V (common practice; rested OCV after
		// a charge to 3.65 V).
		OCV: []SoCPoint{
			{0, 2.5}, {0.05, 3.0}, {0.1, 3.2}, {0.2, 3.25}, {0.4, 3.28},
			{0.6, 3.3}, {0.8, 3.32}, {0.95, 3.35}, {1, 3.4},
		},
		// From memory: rises in the cold somewhat more steeply than NMC cells.
		ResistanceVsTemp: []TempPoint{{-40, 15}, {-20, 5}, {0, 2.2}, {20, 1}, {40, 0.8}, {60, 0.7}},
		// About 2 %/yr at 20–25 °C and mid charge, slower than NMC cells (from
		// memory, after Naumann et al., "Analysis and modeling of calendar aging
		// of a commercial LiFePO4/graphite cell", J. Energy Storage 17 (2018) 153).
		CalendarFadePerYear: 0.02,
		FadeEaJPerMol:       ArrheniusEaCommon,
		// Typical datasheet: 80 % after 2000 full cycles (common practice).
		CycleFadePerCycle: 0.2 / 2000,
		EndOfLife:         0.8, // common practice end-of-life criterion
		// Typical LiFePO4 datasheets (from memory): 14500 600 mAh; 18650
		// 1500 mAh; 26650 3000 mAh (2300–4000 mAh by type; a 26650 datasheet
		// shows 18 mΩ AC, 2 C continuous, 15 A pulse); 32700 6000 mAh. About
		// 2 C continuous; DC resistance ≈ 1.2–1.5× the AC value.
		Forms: []Form{
			{Name: "14500", CapacityMAh: 600, ResistanceMOhm: 120, MaxContinuousMA: 1200, MaxPulseMA: 2000},
			{Name: "18650", CapacityMAh: 1500, ResistanceMOhm: 40, MaxContinuousMA: 3000, MaxPulseMA: 6000},
			{Name: "26650", CapacityMAh: 3000, ResistanceMOhm: 22, MaxContinuousMA: 6000, MaxPulseMA: 15000},
			{Name: "32700", CapacityMAh: 6000, ResistanceMOhm: 15, MaxContinuousMA: 12000, MaxPulseMA: 20000},
		},
		Sources: []Source{
			{"nominal_v", "common practice: 3.2 V nominal for LiFePO4 cells"},
			{"mean_discharge_v", "common practice: flat plateau 3.2–3.3 V"},
			{"cutoff_v", "common practice: typical datasheets give 2.0–2.5 V; 2.5 V used"},
			{"self_discharge_per_year", "common practice: 1–3 %/month (REFERENCE-VALUES §6.1), 2 %/month used"},
			{"activation_energy_j_per_mol", "common practice: rate doubles per 10 °C (Battery University BU-802b)"},
			{"operating_c", "from memory: typical LiFePO4 datasheet, discharge −20 to +60 °C"},
			{"charge_c", "Battery University BU-410: no charging of lithium-ion types below 0 °C, up to 45 °C"},
			{"max_charge_c", "common practice: standard charge at 0.5 C"},
			{"charge_efficiency", "common practice: about 95 % energy efficiency at low charge rates"},
			{"capacity_vs_temp", "common practice / from memory (REFERENCE-VALUES §6.2)"},
			{"ocv", "common practice: flat plateau near 3.3 V"},
			{"resistance_vs_temp", "from memory"},
			{"calendar_fade_per_year", "from memory, after Naumann et al., J. Energy Storage 17 (2018) 153: about 2 %/yr at 20–25 °C"},
			{"fade_activation_energy_j_per_mol", "common practice: rate doubles per 10 °C"},
			{"cycle_fade_per_cycle", "common practice: typical datasheet, 80 % after 2000 full cycles"},
			{"end_of_life", "common practice: 80 % of rated capacity"},
			{"forms", "from memory: typical 14500 / 18650 / 26650 / 32700 LiFePO4 datasheets"},
			{"forms.resistance_mohm", "from memory: typical datasheet AC resistance × 1.2–1.5 for DC"},
			{"forms.max_current_ma", "from memory: typical LiFePO4 datasheets, about 2 C continuous"},
		},
	}
}

// nimhLSD is the low-self-discharge nickel–metal hydride cell, sold
// pre-charged.
func nimhLSD() Chemistry {
	return Chemistry{
		ID:   "nimh-lsd",
		Name: "nickel–metal hydride, low self-discharge",
		// IEC 61951-2 designation voltage for HR cells: 1.2 V (from memory); the
		// discharge plateau at C/5 sits near 1.2 V (common practice).
		NominalV:       1.2,
		MeanDischargeV: 1.2,
		// IEC 61951-2 rates capacity at 0.2 It to 1.0 V (from memory).
		CutoffV: 1.0,
		// About 15 %/yr: makers claim 85 % kept after a year; Battery University
		// "15 % in 1 year" (REFERENCE-VALUES §6.1).
		SelfDischargePerYear:    0.15,
		ActivationEnergyJPerMol: ArrheniusEaCommon,
		// Typical LSD datasheet: discharge −20 to +50 °C, charge 0 to 45 °C (from
		// memory; common practice for NiMH).
		OperatingMinC: -20, OperatingMaxC: 50,
		ChargeMinC: 0, ChargeMaxC: 45,
		// A harvester charges without −ΔV end-of-charge detection: NiMH tolerates
		// permanent overcharge only up to C/10 (common practice; IEC 61951-2
		// standard charge 0.1 It for 16 h, from memory).
		MaxChargeC: 0.1,
		// Charge/discharge energy efficiency 66–92 % (Wikipedia "Nickel–metal
		// hydride battery"); 70 % used for slow charging with overcharge.
		ChargeEfficiency: 0.7,
		// Common practice / from memory (REFERENCE-VALUES §6.2: 0.85–0.90 at 0 °C,
		// 0.50–0.70 at −20 °C at C/5); −40 °C from memory (aqueous electrolyte).
		CapacityVsTemp: []TempPoint{{-40, 0.2}, {-20, 0.6}, {0, 0.87}, {20, 1}, {40, 0.97}, {60, 0.9}},
		// Rested OCV: 1.4 V just after charge, a long plateau near 1.25–1.3 V
		// (common practice).
		OCV: []SoCPoint{{0, 1.1}, {0.05, 1.18}, {0.1, 1.21}, {0.3, 1.25}, {0.5, 1.27}, {0.7, 1.29}, {0.9, 1.32}, {1, 1.4}},
		// From memory: the aqueous electrolyte's resistance rises in the cold.
		ResistanceVsTemp: []TempPoint{{-40, 8}, {-20, 3}, {0, 1.6}, {20, 1}, {40, 0.85}, {60, 0.8}},
		// Standby NiMH packs reach 80 % in about five years at room temperature
		// (from memory): 4 %/yr.
		CalendarFadePerYear: 0.04,
		FadeEaJPerMol:       ArrheniusEaCommon,
		// Cycle durability 500–2000 cycles (Wikipedia "Nickel–metal hydride
		// battery"); 500 full cycles to 80 % used.
		CycleFadePerCycle: 0.2 / 500,
		EndOfLife:         0.8, // common practice end-of-life criterion
		// Typical LSD datasheets (from memory): HR03 750 mAh and HR6 1900 mAh
		// minimum rated capacity; DC resistance about 40–70 mΩ; about 1 C
		// continuous (the AA) and higher pulses. LSD cells are made mostly in AA
		// and AAA.
		Forms: []Form{
			{Name: "AAA", CapacityMAh: 750, ResistanceMOhm: 70, MaxContinuousMA: 800, MaxPulseMA: 2000},
			{Name: "AA", CapacityMAh: 1900, ResistanceMOhm: 40, MaxContinuousMA: 2000, MaxPulseMA: 5000},
		},
		Sources: []Source{
			{"nominal_v", "from memory: IEC 61951-2 designation voltage for HR cells"},
			{"mean_discharge_v", "common practice: plateau near 1.2 V at C/5"},
			{"cutoff_v", "from memory: IEC 61951-2 rates capacity at 0.2 It to 1.0 V"},
			{"self_discharge_per_year", "Battery University: 15 % in 1 year; makers' 85 % after 1 yr (REFERENCE-VALUES §6.1)"},
			{"activation_energy_j_per_mol", "common practice: rate doubles per 10 °C (Battery University BU-802b)"},
			{"operating_c", "from memory: typical LSD datasheet, discharge −20 to +50 °C"},
			{"charge_c", "from memory / common practice for NiMH: charge 0 to 45 °C"},
			{"max_charge_c", "common practice: C/10 without end-of-charge detection (IEC 61951-2 standard charge 0.1 It, from memory)"},
			{"charge_efficiency", "Wikipedia 'Nickel–metal hydride battery': 66–92 %; 70 % used"},
			{"capacity_vs_temp", "common practice / from memory (REFERENCE-VALUES §6.2)"},
			{"ocv", "common practice"},
			{"resistance_vs_temp", "from memory"},
			{"calendar_fade_per_year", "from memory: standby NiMH reaches 80 % in about five years"},
			{"fade_activation_energy_j_per_mol", "common practice: rate doubles per 10 °C"},
			{"cycle_fade_per_cycle", "Wikipedia 'Nickel–metal hydride battery': 500–2000 cycles; 500 used"},
			{"end_of_life", "common practice: 80 % of rated capacity"},
			{"forms", "from memory: typical HR03 / HR6 low-self-discharge datasheets (minimum rated capacity)"},
			{"forms.resistance_mohm", "from memory"},
			{"forms.max_current_ma", "from memory"},
		},
	}
}
