package cell

import "math"

// Thermal holds a chemistry's temperature-dependent values on a grid of
// 1/16 °C from −80 °C to +100 °C, so a simulation step costs a table lookup
// instead of an exponential. Between grid points it interpolates linearly:
// exact for the piecewise-linear capacity table (its rows sit on the grid),
// and within 2e-5 relative of the Arrhenius rate: the error of linear
// interpolation of an exponential is h²·k²/8, with h = 1/16 K and
// k = Ea/(R·T²), 0.074 /K at 20 °C (3e-6) and 0.17 /K at −80 °C (1.5e-5).
// Outside the grid it computes the values directly.
type Thermal struct {
	chem      Chemistry
	usable    []float64
	sdPerYr   []float64
	rFactor   []float64
	fadePerYr []float64
	minC      float64
	perKelvn  float64
}

// Values are a chemistry's temperature-dependent values at one temperature.
type Values struct {
	Usable           float64 // usable fraction of capacity
	SelfDischargeYr  float64 // self-discharge, fraction of rated capacity per year
	ResistanceFactor float64 // internal resistance relative to 20 °C
	CalendarFadeYr   float64 // calendar fade, fraction of capacity per year
}

const (
	thermalMinC  = -80.0
	thermalMaxC  = 100.0
	thermalSteps = 16 // per °C; a power of two, so grid temperatures are exact
)

// NewThermal tabulates c.
func NewThermal(c Chemistry) *Thermal {
	n := int((thermalMaxC-thermalMinC)*thermalSteps) + 1
	th := &Thermal{chem: c, usable: make([]float64, n), sdPerYr: make([]float64, n),
		rFactor: make([]float64, n), fadePerYr: make([]float64, n), minC: thermalMinC, perKelvn: thermalSteps}
	for i := range n {
		t := thermalMinC + float64(i)/thermalSteps
		th.usable[i] = c.UsableFraction(t)
		th.sdPerYr[i] = c.SelfDischargeAt(t)
		th.rFactor[i] = c.ResistanceFactor(t)
		th.fadePerYr[i] = c.CalendarFadeAt(t)
	}
	return th
}

// All returns every temperature-dependent value at tempC, interpolated like
// At (the resistance table is piecewise linear on the grid, so exact; the
// calendar fade is Arrhenius, within 2e-5).
func (th *Thermal) All(tempC float64) Values {
	x := (tempC - th.minC) * th.perKelvn
	i := int(math.Floor(x))
	if i < 0 || i >= len(th.usable)-1 || math.IsNaN(x) {
		c := th.chem
		return Values{c.UsableFraction(tempC), c.SelfDischargeAt(tempC), c.ResistanceFactor(tempC), c.CalendarFadeAt(tempC)}
	}
	f := x - float64(i)
	lerp := func(a []float64) float64 { return a[i] + f*(a[i+1]-a[i]) }
	return Values{lerp(th.usable), lerp(th.sdPerYr), lerp(th.rFactor), lerp(th.fadePerYr)}
}

// At returns the usable fraction and the self-discharge (fraction of rated
// capacity per year) at tempC.
func (th *Thermal) At(tempC float64) (usable, sdPerYear float64) {
	x := (tempC - th.minC) * th.perKelvn
	i := int(math.Floor(x))
	if i < 0 || i >= len(th.usable)-1 || math.IsNaN(x) {
		return th.chem.UsableFraction(tempC), th.chem.SelfDischargeAt(tempC)
	}
	f := x - float64(i)
	usable = th.usable[i] + f*(th.usable[i+1]-th.usable[i])
	sdPerYear = th.sdPerYr[i] + f*(th.sdPerYr[i+1]-th.sdPerYr[i])
	return usable, sdPerYear
}
