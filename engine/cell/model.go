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
	Series   int
	Parallel int
	// CellCapacityMAh is the rated capacity of one cell.
	CellCapacityMAh float64
}

// CapacityMAh is the pack's rated capacity (cells in parallel add capacity).
func (p Pack) CapacityMAh() float64 { return p.CellCapacityMAh * float64(p.Parallel) }

// NominalV is the pack's nominal voltage (cells in series add voltage).
func (p Pack) NominalV() float64 { return p.Chem.NominalV * float64(p.Series) }

// EnergyWh is the pack's rated energy at 20 °C: capacity × mean discharge
// voltage × cells.
func (p Pack) EnergyWh() float64 {
	return p.CellCapacityMAh / 1000 * p.Chem.MeanDischargeV * float64(p.Series*p.Parallel)
}
