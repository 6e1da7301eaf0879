package cell

// The primary (never charged) chemistries of the library. Charge and fade
// parameters stay zero. Form capacities are at low drain (µA to tens of mA)
// and 20 °C to the chemistry's cut-off; resistances are DC values at 20 °C
// and half charge; current limits are the maker's continuous and pulse
// ratings. Sources are cited generically (a designation, never a brand).

// liSOCl2 is the bobbin lithium thionyl chloride cell: the longest-lived
// primary at µA–mA loads, with a high internal resistance that limits pulses.
func liSOCl2() Chemistry {
	return Chemistry{
		ID:      "li-socl2",
		Name:    "lithium thionyl chloride (bobbin)",
		Primary: true,
		// IEC 60086-1 designation voltage for ER cells: 3.6 V.
		NominalV: 3.6,
		// Bobbin cells hold a flat plateau near 3.5 V at µA–mA loads (from memory;
		// Linden & Reddy, Handbook of Batteries, 4th ed., 2011, Fig. 14.17:
		// plateau 3.3–3.6 V at 0.2–35 mA and 20 °C).
		MeanDischargeV: 3.5,
		// Datasheet end voltage for ER bobbin cells is 2.0 V (typical ER14505
		// datasheet; from memory).
		CutoffV: 2.0,
		// Thionyl chloride: about 1 % per year (Wikipedia "Self-discharge" table;
		// Linden & Reddy, Li primary chapter; typical bobbin datasheets "1 % or
		// less per year").
		SelfDischargePerYear:    0.01,
		ActivationEnergyJPerMol: ArrheniusEaCommon,
		// Rated range of bobbin cells, −55 to +85 °C (typical ER14505 datasheet).
		OperatingMinC: -55, OperatingMaxC: 85,
		// Common practice / from memory (REFERENCE-VALUES §6.2: 0.90–0.97 at 0 °C,
		// 0.70–0.85 at −20 °C at µA–mA loads); −40 °C from memory.
		CapacityVsTemp: []TempPoint{{-40, 0.55}, {-20, 0.78}, {0, 0.93}, {20, 1}, {40, 1}, {60, 0.97}},
		// Open-circuit voltage 3.67 V over almost the whole discharge, falling
		// only in the last few percent (typical bobbin-cell technical brochure:
		// OCV 3.67 V; the knee from memory). At the cut-off the cell rests near
		// 2.9 V (from memory).
		OCV: []SoCPoint{{0, 2.9}, {0.02, 3.3}, {0.05, 3.5}, {0.1, 3.6}, {0.3, 3.64}, {0.6, 3.66}, {1, 3.67}},
		// The plateau voltage at a given drain sinks in the cold (Linden & Reddy
		// Fig. 14.17(b)); the multipliers are from memory.
		ResistanceVsTemp: []TempPoint{{-40, 4}, {-20, 2.5}, {0, 1.5}, {20, 1}, {40, 0.8}, {60, 0.7}},
		// Typical bobbin datasheets (ER14250, ER14505, ER26500, ER34615; from
		// memory): capacity at low drain to 2.0 V, and maximum continuous and
		// pulse currents. Linden & Reddy Fig. 14.17 shows 19 Ah for the D cell
		// at about 4 mA. Resistance: a bobbin cell drops about 0.5 V at its rated
		// pulse current at 20 °C (from memory), so R ≈ 0.5 V / pulse current.
		Forms: []Form{
			{Name: "1/2AA", CapacityMAh: 1200, ResistanceMOhm: 5000, MaxContinuousMA: 50, MaxPulseMA: 100},
			{Name: "AA", CapacityMAh: 2600, ResistanceMOhm: 2500, MaxContinuousMA: 100, MaxPulseMA: 200},
			{Name: "C", CapacityMAh: 8500, ResistanceMOhm: 1700, MaxContinuousMA: 150, MaxPulseMA: 300},
			{Name: "D", CapacityMAh: 19000, ResistanceMOhm: 1250, MaxContinuousMA: 230, MaxPulseMA: 400},
		},
		Sources: []Source{
			{"nominal_v", "IEC 60086-1 designation voltage for ER cells"},
			{"mean_discharge_v", "from memory: flat plateau near 3.5 V at low drain (Linden & Reddy, Handbook of Batteries, 4th ed., Fig. 14.17)"},
			{"cutoff_v", "from memory: typical ER14505 datasheet rates capacity to 2.0 V"},
			{"self_discharge_per_year", "Linden & Reddy, Handbook of Batteries, 4th ed. (2011); Wikipedia 'Self-discharge' table: 1 %/yr"},
			{"activation_energy_j_per_mol", "common practice: rate doubles per 10 °C (Battery University BU-802b)"},
			{"operating_c", "typical ER14505 datasheet: −55 to +85 °C"},
			{"capacity_vs_temp", "common practice / from memory, after Linden's handbook curves"},
			{"ocv", "typical bobbin-cell brochure: OCV 3.67 V; end-of-life knee from memory"},
			{"resistance_vs_temp", "from memory; shape after Linden & Reddy Fig. 14.17(b) (plateau voltage vs temperature)"},
			{"forms", "from memory: typical ER14250 / ER14505 / ER26500 / ER34615 datasheets; Linden & Reddy Fig. 14.17 (D, 19 Ah)"},
			{"forms.resistance_mohm", "from memory: about 0.5 V drop at the rated pulse current at 20 °C"},
			{"forms.max_current_ma", "from memory: typical ER14250 / ER14505 / ER26500 / ER34615 datasheets"},
		},
	}
}

// liMnO2 is the lithium manganese dioxide cell: coin cells and spirally
// wound cylindrical cells with a high pulse capability.
func liMnO2() Chemistry {
	return Chemistry{
		ID:      "li-mno2",
		Name:    "lithium manganese dioxide",
		Primary: true,
		// IEC 60086-1 designation voltage for CR cells: 3.0 V.
		NominalV: 3.0,
		// Mid-point voltage about 2.9 V at low rates and 20 °C (Linden & Reddy,
		// Fig. 14.50, read from memory).
		MeanDischargeV: 2.9,
		// Datasheet end voltage 2.0 V (Linden & Reddy Fig. 14.50 and 14.52; typical
		// CR2 and CR123A datasheets).
		CutoffV: 2.0,
		// About 1 %/yr (Linden & Reddy, from memory); a primary-cell maker's FAQ
		// gives about 1.5 %/yr (REFERENCE-VALUES §6.1: 0.5–1.5 %/yr).
		SelfDischargePerYear:    0.01,
		ActivationEnergyJPerMol: ArrheniusEaCommon,
		// Typical CR2 / CR123A datasheet: discharge −40 to +60 °C.
		OperatingMinC: -40, OperatingMaxC: 60,
		// Common practice / from memory (REFERENCE-VALUES §6.2: 0.90–0.95 at 0 °C,
		// 0.60–0.80 at −20 °C); −40 °C from memory.
		CapacityVsTemp: []TempPoint{{-40, 0.4}, {-20, 0.7}, {0, 0.92}, {20, 1}, {40, 1}, {60, 0.97}},
		// Fresh cells rest at 3.2–3.3 V, most of the discharge near 3.0 V, then a
		// sloping end to the cut-off (from memory, after Linden's discharge curves).
		OCV: []SoCPoint{{0, 2.5}, {0.05, 2.75}, {0.15, 2.9}, {0.4, 3.0}, {0.7, 3.05}, {0.9, 3.12}, {1, 3.25}},
		// Organic electrolyte: resistance rises in the cold (from memory).
		ResistanceVsTemp: []TempPoint{{-40, 5}, {-20, 2.8}, {0, 1.6}, {20, 1}, {40, 0.85}, {60, 0.8}},
		// CR2032: 225 mAh at 0.2 mA, 3 mA continuous and 15 mA pulse (typical coin
		// datasheet; a CR2450 datasheet gives the same 3 / 15 mA), about 15 Ω
		// (from memory). CR2: 800 mAh to 2.0 V at 100 Ω, 1000 mA continuous,
		// 2500 mA pulse (typical CR2 datasheet). CR123A: 1500 mAh to 2.0 V,
		// 1500 mA continuous, 2500 mA pulse (typical CR123A datasheet; from
		// memory). Resistances of the spiral cells from memory.
		Forms: []Form{
			{Name: "CR2032", CapacityMAh: 225, ResistanceMOhm: 15000, MaxContinuousMA: 3, MaxPulseMA: 15},
			{Name: "CR2", CapacityMAh: 800, ResistanceMOhm: 350, MaxContinuousMA: 1000, MaxPulseMA: 2500},
			{Name: "CR123A", CapacityMAh: 1500, ResistanceMOhm: 250, MaxContinuousMA: 1500, MaxPulseMA: 2500},
		},
		Sources: []Source{
			{"nominal_v", "IEC 60086-1 designation voltage for CR cells"},
			{"mean_discharge_v", "from memory: mid-point about 2.9 V at low rates (Linden & Reddy, Handbook of Batteries, 4th ed., Fig. 14.50)"},
			{"cutoff_v", "Linden & Reddy Fig. 14.50/14.52 and typical CR2 / CR123A datasheets: 2.0 V end voltage"},
			{"self_discharge_per_year", "from memory: Linden & Reddy about 1 %/yr; a maker's FAQ about 1.5 %/yr (REFERENCE-VALUES §6.1)"},
			{"activation_energy_j_per_mol", "common practice: rate doubles per 10 °C (Battery University BU-802b)"},
			{"operating_c", "typical CR2 / CR123A datasheet: −40 to +60 °C"},
			{"capacity_vs_temp", "common practice / from memory, after Linden's handbook curves"},
			{"ocv", "from memory, after Linden's discharge curves"},
			{"resistance_vs_temp", "from memory"},
			{"forms", "typical CR2032 / CR2 / CR123A datasheets (from memory)"},
			{"forms.resistance_mohm", "from memory"},
			{"forms.max_current_ma", "typical coin-cell datasheet (3 mA / 15 mA); typical CR2 and CR123A datasheets"},
		},
	}
}

// liFeS2 is the 1.5 V lithium iron disulfide cell, a drop-in for alkaline
// AA and AAA with far better cold and high-drain performance.
func liFeS2() Chemistry {
	return Chemistry{
		ID:      "li-fes2",
		Name:    "lithium iron disulfide",
		Primary: true,
		// IEC 60086-1 designation voltage for FR cells: 1.5 V.
		NominalV: 1.5,
		// Rests near 1.7–1.8 V but settles near 1.5 V once the load exceeds a few
		// mA (typical FR6 datasheet; from memory).
		MeanDischargeV: 1.5,
		// Common practice end voltage for 1.5 V devices, as for alkaline.
		CutoffV: 0.9,
		// Makers claim 20 years' shelf life (typical FR6 datasheet), i.e. about
		// 1 %/yr (from memory; not in REFERENCE-VALUES §6.1).
		SelfDischargePerYear:    0.01,
		ActivationEnergyJPerMol: ArrheniusEaCommon,
		// Typical FR6 maker handbook: operates from −40 °C to +60 °C.
		OperatingMinC: -40, OperatingMaxC: 60,
		// From memory, after the maker handbooks' temperature curves: the ether
		// electrolyte keeps most of the capacity in the cold.
		CapacityVsTemp: []TempPoint{{-40, 0.6}, {-20, 0.8}, {0, 0.92}, {20, 1}, {40, 1}, {60, 0.97}},
		// Fresh 1.8 V; the two-step discharge at light drain (Linden & Reddy,
		// Fig. 14.75) rests near 1.6–1.7 V for most of its life (from memory).
		OCV: []SoCPoint{{0, 1.2}, {0.05, 1.45}, {0.2, 1.55}, {0.5, 1.6}, {0.8, 1.65}, {0.95, 1.72}, {1, 1.8}},
		// From memory: far flatter in the cold than alkaline.
		ResistanceVsTemp: []TempPoint{{-40, 3}, {-20, 2}, {0, 1.4}, {20, 1}, {40, 0.9}, {60, 0.85}},
		// FR6: 3000 mAh at 25 mA to 0.9 V (typical FR6 datasheet; later
		// generations rate 3500 mAh), 2 A continuous, 3 A pulse. FR03: 1200 mAh,
		// 1.5 A continuous, 2 A pulse. Resistances 150–200 mΩ: typical FR6 maker
		// handbook (from memory).
		Forms: []Form{
			{Name: "AAA", CapacityMAh: 1200, ResistanceMOhm: 200, MaxContinuousMA: 1500, MaxPulseMA: 2000},
			{Name: "AA", CapacityMAh: 3000, ResistanceMOhm: 150, MaxContinuousMA: 2000, MaxPulseMA: 3000},
		},
		Sources: []Source{
			{"nominal_v", "IEC 60086-1 designation voltage for FR cells"},
			{"mean_discharge_v", "from memory: typical FR6 datasheet, about 1.5 V under a load of a few mA"},
			{"cutoff_v", "common practice: 0.9 V end voltage, as for alkaline"},
			{"self_discharge_per_year", "from memory: typical FR6 datasheet claims 20 years' shelf life, about 1 %/yr"},
			{"activation_energy_j_per_mol", "common practice: rate doubles per 10 °C (Battery University BU-802b)"},
			{"operating_c", "typical FR6 / FR03 maker handbook: −40 to +60 °C"},
			{"capacity_vs_temp", "from memory, after typical FR6 maker handbook curves"},
			{"ocv", "from memory; two-step discharge after Linden & Reddy, Handbook of Batteries, 4th ed., Fig. 14.75"},
			{"resistance_vs_temp", "from memory"},
			{"forms", "from memory: typical FR03 / FR6 datasheets at low drain (FR6 3000–3500 mAh)"},
			{"forms.resistance_mohm", "from memory: typical FR6 maker handbook, 90–150 mΩ fresh"},
			{"forms.max_current_ma", "from memory: typical FR03 / FR6 datasheets"},
		},
	}
}

// alkaline is the alkaline zinc–manganese dioxide cell: cheap, everywhere,
// weak in the cold and under high drain.
func alkaline() Chemistry {
	return Chemistry{
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
		// Fresh cells rest at 1.56–1.65 V (a typical LR6 specification); the
		// open-circuit voltage slopes down with discharge (from memory).
		OCV: []SoCPoint{{0, 1.0}, {0.1, 1.15}, {0.25, 1.22}, {0.5, 1.3}, {0.75, 1.4}, {0.9, 1.48}, {1, 1.58}},
		// A typical LR6 maker handbook shows the internal resistance several
		// times higher at −40 °C than at room temperature (from memory).
		ResistanceVsTemp: []TempPoint{{-40, 6}, {-20, 3}, {0, 1.6}, {20, 1}, {40, 0.8}, {60, 0.75}},
		// Low-drain capacities of LR03 / LR6 / LR14 / LR20 (from memory);
		// resistance of a fresh LR6 150–300 mΩ, rising through the discharge
		// (typical maker handbook, from memory). Alkaline datasheets rate no
		// pulse current; the limits below keep a half-discharged cell above
		// 1.0 V under the pulse at 20 °C, and the continuous ones sit where the
		// delivered capacity has fallen to about half (from memory).
		Forms: []Form{
			{Name: "AAA", CapacityMAh: 1150, ResistanceMOhm: 300, MaxContinuousMA: 300, MaxPulseMA: 1000},
			{Name: "AA", CapacityMAh: 2850, ResistanceMOhm: 200, MaxContinuousMA: 700, MaxPulseMA: 1500},
			{Name: "C", CapacityMAh: 8000, ResistanceMOhm: 150, MaxContinuousMA: 1000, MaxPulseMA: 2000},
			{Name: "D", CapacityMAh: 17000, ResistanceMOhm: 120, MaxContinuousMA: 1500, MaxPulseMA: 2500},
		},
		Sources: []Source{
			{"nominal_v", "IEC 60086-1 designation voltage for LR cells"},
			{"mean_discharge_v", "from memory: sloping discharge, mean about 1.25 V at low drain"},
			{"cutoff_v", "common practice: 0.9 V end voltage"},
			{"self_discharge_per_year", "Battery University BU-802b: 2–4 %/yr, 5–10 yr shelf life"},
			{"activation_energy_j_per_mol", "common practice: rate doubles per 10 °C (Battery University BU-802b)"},
			{"operating_c", "from memory: typical LR6 datasheet rating"},
			{"capacity_vs_temp", "common practice / from memory, after Linden's handbook curves; strongly rate dependent"},
			{"ocv", "typical LR6 specification: fresh 1.56–1.65 V; slope from memory"},
			{"resistance_vs_temp", "from memory: typical LR6 maker handbook"},
			{"forms", "from memory: typical LR03 / LR6 / LR14 / LR20 datasheets at low drain"},
			{"forms.resistance_mohm", "from memory: typical LR6 maker handbook, 150–300 mΩ fresh"},
			{"forms.max_current_ma", "from memory: alkaline datasheets rate no pulse current; limits keep a half-discharged cell above 1.0 V at 20 °C"},
		},
	}
}
