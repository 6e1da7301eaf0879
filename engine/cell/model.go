package cell

import "math"

// GasConstant is the molar gas constant R in J/(mol·K) (CODATA 2018, exact).
const GasConstant = 8.314462618

// zeroCelsiusK converts °C to kelvin.
const zeroCelsiusK = 273.15

// ArrheniusRatio returns k(t2C)/k(t1C) for a rate that follows the Arrhenius
// equation k(T) = A·exp(−Ea/(R·T)):
//
//	k(T₂)/k(T₁) = exp[(Ea/R)·(1/T₁ − 1/T₂)], T in kelvin.
//
// Reference: S. Arrhenius, "Über die Reaktionsgeschwindigkeit bei der
// Inversion von Rohrzucker durch Säuren", Z. Phys. Chem. 4 (1889) 226–248.
func ArrheniusRatio(eaJPerMol, t1C, t2C float64) float64 {
	t1 := t1C + zeroCelsiusK
	t2 := t2C + zeroCelsiusK
	return math.Exp(eaJPerMol / GasConstant * (1/t1 - 1/t2))
}

// SelfDischargeAt returns the fraction of rated capacity lost per year at
// tempC: the 20 °C rate scaled by ArrheniusRatio.
func (c Chemistry) SelfDischargeAt(tempC float64) float64 {
	return c.SelfDischargePerYear * ArrheniusRatio(c.ActivationEnergyJPerMol, 20, tempC)
}

// UsableFraction returns the usable fraction of the 20 °C capacity at tempC,
// interpolated linearly in CapacityVsTemp and held at the end values beyond it.
func (c Chemistry) UsableFraction(tempC float64) float64 {
	return interpClamped(c.CapacityVsTemp, tempC)
}

// OCVAt returns the open-circuit voltage of one cell at state of charge soc
// (0–1), interpolated linearly in OCV and held at the ends.
func (c Chemistry) OCVAt(soc float64) float64 {
	if len(c.OCV) == 0 {
		panic("cell: " + c.ID + " has no OCV curve")
	}
	tab := make([]TempPoint, len(c.OCV)) // same interpolation, x = SoC
	for i, p := range c.OCV {
		tab[i] = TempPoint{TempC: p.SoC, Fraction: p.V}
	}
	return interpClamped(tab, soc)
}

// ResistanceFactor returns how many times its 20 °C internal resistance a
// cell has at tempC, interpolated linearly in ResistanceVsTemp and held at
// the ends.
func (c Chemistry) ResistanceFactor(tempC float64) float64 {
	if len(c.ResistanceVsTemp) == 0 {
		return 1
	}
	return interpClamped(c.ResistanceVsTemp, tempC)
}

// CalendarFadeAt returns the fraction of capacity lost per year at rest at
// tempC: the 20 °C rate scaled by ArrheniusRatio.
func (c Chemistry) CalendarFadeAt(tempC float64) float64 {
	if c.CalendarFadePerYear == 0 {
		return 0
	}
	return c.CalendarFadePerYear * ArrheniusRatio(c.FadeEaJPerMol, 20, tempC)
}

func interpClamped(tab []TempPoint, x float64) float64 {
	if len(tab) == 0 {
		panic("cell: empty capacity table")
	}
	if math.IsNaN(x) {
		return math.NaN()
	}
	if x <= tab[0].TempC {
		return tab[0].Fraction
	}
	last := tab[len(tab)-1]
	if x >= last.TempC {
		return last.Fraction
	}
	for i := 1; i < len(tab); i++ {
		if x <= tab[i].TempC {
			a, b := tab[i-1], tab[i]
			return a.Fraction + (b.Fraction-a.Fraction)*(x-a.TempC)/(b.TempC-a.TempC)
		}
	}
	return last.Fraction
}

// Pack is a battery of identical cells, Series in series × Parallel in parallel.
type Pack struct {
	Chem     Chemistry
	Form     Form // the cells' form factor (its resistance and current limits)
	Series   int
	Parallel int
	// CellCapacityMAh is the rated capacity of one cell.
	CellCapacityMAh float64
}

// CapacityMAh is the pack's rated capacity (cells in parallel add capacity).
func (p Pack) CapacityMAh() float64 { return p.CellCapacityMAh * float64(p.Parallel) }

// CutoffV is the pack's end-of-discharge voltage.
func (p Pack) CutoffV() float64 { return p.Chem.CutoffV * float64(p.Series) }

// NominalV is the pack's nominal voltage (cells in series add voltage).
func (p Pack) NominalV() float64 { return p.Chem.NominalV * float64(p.Series) }

// ResistanceOhm is the pack's internal resistance at tempC: cells in series
// add, in parallel divide.
func (p Pack) ResistanceOhm(tempC float64) float64 {
	return p.Form.ResistanceMOhm / 1000 * p.Chem.ResistanceFactor(tempC) * float64(p.Series) / float64(p.Parallel)
}

// TerminalV is the pack's voltage while it delivers currentA at state of
// charge soc (0–1) and tempC: open-circuit voltage less the drop across the
// internal resistance (a Thevenin model without the RC branch: pulses of
// about a second see the DC resistance; common practice).
func (p Pack) TerminalV(soc, tempC, currentA float64) float64 {
	return p.Chem.OCVAt(soc)*float64(p.Series) - currentA*p.ResistanceOhm(tempC)
}

// EnergyWh is the pack's rated energy at 20 °C: capacity × mean discharge
// voltage × cells.
func (p Pack) EnergyWh() float64 {
	return p.CellCapacityMAh / 1000 * p.Chem.MeanDischargeV * float64(p.Series*p.Parallel)
}
