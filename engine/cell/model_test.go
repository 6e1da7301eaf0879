package cell

import (
	"math"
	"testing"

	"github.com/stretchr/testify/assert"
)

// handChem is a made-up chemistry with round numbers, so that pack voltages
// can be computed by hand.
func handChem() Chemistry {
	return Chemistry{
		ID:               "hand",
		NominalV:         3.5,
		MeanDischargeV:   3.5,
		CutoffV:          3.0,
		OCV:              []SoCPoint{{0, 3.0}, {0.5, 3.5}, {1, 4.0}},
		ResistanceVsTemp: []TempPoint{{-20, 3}, {20, 1}, {60, 0.5}},
	}
}

func TestPackTerminalVHandComputed(t *testing.T) {
	form := Form{Name: "hand", CapacityMAh: 1000, ResistanceMOhm: 50, MaxContinuousMA: 1000, MaxPulseMA: 2000}
	p := Pack{Chem: handChem(), Form: form, Series: 2, Parallel: 4, CellCapacityMAh: 1000}
	// Each case is worked by hand: OCV interpolated in the three-row table,
	// times 2 in series; resistance 50 mΩ × factor × 2 series / 4 parallel.
	cases := []struct {
		name                 string
		soc, tempC, currentA float64
		want                 float64
	}{
		// OCV(0.25) = 3.25 V → 6.5 V; R = 0.05 × 1 × 2/4 = 0.025 Ω; 2 A → 0.05 V.
		{"20 °C", 0.25, 20, 2, 6.45},
		// Factor at 0 °C halfway between 3 (−20 °C) and 1 (20 °C) = 2: R = 0.05 Ω.
		{"0 °C", 0.25, 0, 2, 6.4},
		// Held at the table's cold end: factor 3 → R = 0.075 Ω; OCV(1) = 4 V → 8 V.
		{"−40 °C, full", 1, -40, 2, 7.85},
		// Factor at 40 °C halfway between 1 and 0.5 = 0.75: R = 0.01875 Ω.
		{"40 °C, empty", 0, 40, 4, 5.925},
		// No current, no drop: 2 × OCV(0.75) = 2 × 3.75 V.
		{"open circuit", 0.75, -10, 0, 7.5},
		// SoC beyond the table holds its ends.
		{"SoC above 1", 1.2, 20, 0, 8},
	}
	for _, c := range cases {
		got := p.TerminalV(c.soc, c.tempC, c.currentA)
		assert.InDeltaf(t, c.want, got, 1e-12, "%s: TerminalV(%g, %g, %g) = %g, want %g", c.name, c.soc, c.tempC, c.currentA, got, c.want)
	}
	// ResistanceOhm: cells in series add, in parallel divide (hand values).
	assert.InDelta(t, 0.025, p.ResistanceOhm(20), 1e-15)
	one := Pack{Chem: handChem(), Form: form, Series: 1, Parallel: 1, CellCapacityMAh: 1000}
	assert.InDelta(t, 0.05, one.ResistanceOhm(20), 1e-15)
	assert.InDelta(t, 0.15, one.ResistanceOhm(-20), 1e-15)
}

func TestPackTerminalVLibrary(t *testing.T) {
	// A library pack at rest shows Series × its OCV; under load it drops by
	// exactly I·R, and the drop grows in the cold.
	for _, c := range Library() {
		f := c.Forms[0]
		p := Pack{Chem: c, Form: f, Series: 3, Parallel: 2, CellCapacityMAh: f.CapacityMAh}
		for _, soc := range []float64{0, 0.5, 1} {
			assert.InDelta(t, 3*c.OCVAt(soc), p.TerminalV(soc, 20, 0), 1e-12, c.ID)
		}
		i := f.MaxContinuousMA / 1000
		drop20 := p.TerminalV(0.5, 20, 0) - p.TerminalV(0.5, 20, i)
		assert.InEpsilonf(t, i*f.ResistanceMOhm/1000*3/2, drop20, 1e-9, "%s %s drop at 20 °C", c.ID, f.Name)
		dropCold := p.TerminalV(0.5, -20, 0) - p.TerminalV(0.5, -20, i)
		assert.Greaterf(t, dropCold, drop20, "%s %s: colder, bigger drop", c.ID, f.Name)
	}
}

func TestCalendarFadeArrhenius(t *testing.T) {
	// With the common-practice Ea the fade scales by REFERENCE-VALUES §6.4's
	// [CALC] ratios (printed to 4–5 digits; 1e-4 relative, the bound,
	// or half a unit in the last printed digit).
	ratios := []struct{ tempC, want, unit float64 }{
		{-20, 0.0323, 1e-4}, {0, 0.2038, 1e-4}, {10, 0.4643, 1e-4}, {30, 2.0475, 1e-4},
		{40, 4.0045, 1e-4}, {45, 5.5126, 1e-4}, {60, 13.576, 1e-3},
	}
	for _, c := range Library() {
		if c.Primary {
			continue
		}
		assert.InDelta(t, c.CalendarFadePerYear, c.CalendarFadeAt(20), 1e-15, c.ID)
		if c.FadeEaJPerMol != ArrheniusEaCommon {
			continue
		}
		for _, r := range ratios {
			got := c.CalendarFadeAt(r.tempC) / c.CalendarFadePerYear
			tol := max(r.unit/2, 1e-4*r.want)
			assert.Truef(t, math.Abs(got-r.want) <= tol, "%s.CalendarFadeAt(%g)/CalendarFadeAt(20) = %.6g, want %g (tol %g)", c.ID, r.tempC, got, r.want, tol)
		}
	}
	// Another activation energy: 0.6 eV gives k30/k20 = 2.189 and k40/k20 =
	// 4.558 (REFERENCE-VALUES §6.4 [CALC]; 1 eV = 96485.33212 J/mol, CODATA).
	c := Chemistry{CalendarFadePerYear: 0.01, FadeEaJPerMol: 0.6 * 96485.33212}
	assert.InDelta(t, 0.02189, c.CalendarFadeAt(30), 0.01*0.0006)
	assert.InDelta(t, 0.04558, c.CalendarFadeAt(40), 0.01*0.0006)
	// No fade rate, no fade, whatever the temperature.
	assert.Zero(t, Chemistry{FadeEaJPerMol: ArrheniusEaCommon}.CalendarFadeAt(60))
}
