package cell

import (
	"slices"
	"strings"
	"testing"

	"github.com/stretchr/testify/assert"
	"github.com/stretchr/testify/require"
)

// madeIn lists the standard form factors each chemistry is made in, by common
// designation. Primaries: IEC 60086-2 sizes (LR03/LR6/LR14/LR20, FR03/FR6,
// CR2032/CR2/CR123A; ER cells in the ANSI sizes, Linden & Reddy, Handbook of
// Batteries, 4th ed., §14.6.2). Lithium-ion types: the IEC 61960-3 cylindrical
// sizes diameter×length (14500, 18650, 21700, 26650, 32700). Low-self-
// discharge NiMH: HR03 and HR6 (common practice). A form outside its list is a
// size the chemistry is not made in, or made in too rarely to offer.
var madeIn = map[string][]string{
	"li-socl2": {"1/2AA", "AA", "C", "D"},
	"li-mno2":  {"CR2032", "CR2", "CR123A"},
	"li-fes2":  {"AAA", "AA"}, // no C or D Li-FeS₂ cells on the market (from memory)
	"alkaline": {"AAA", "AA", "C", "D"},
	"li-ion":   {"14500", "18650", "21700", "26650"},
	"lifepo4":  {"14500", "18650", "26650", "32700"},
	"nimh-lsd": {"AAA", "AA"},
}

func TestFormsExistAndAreSane(t *testing.T) {
	for _, c := range Library() {
		allowed, ok := madeIn[c.ID]
		require.True(t, ok, c.ID)
		seen := map[string]bool{}
		for _, f := range c.Forms {
			assert.Containsf(t, allowed, f.Name, "%s is not made in %s", c.ID, f.Name)
			assert.Falsef(t, seen[f.Name], "%s lists %s twice", c.ID, f.Name)
			seen[f.Name] = true
			assert.Positivef(t, f.CapacityMAh, "%s %s capacity", c.ID, f.Name)
			assert.Positivef(t, f.ResistanceMOhm, "%s %s resistance", c.ID, f.Name)
			assert.Positivef(t, f.MaxContinuousMA, "%s %s continuous current", c.ID, f.Name)
			assert.GreaterOrEqualf(t, f.MaxPulseMA, f.MaxContinuousMA, "%s %s: pulse ≥ continuous", c.ID, f.Name)

			// A pulse rating means the cell holds its voltage under the pulse: a
			// cell at half charge and 20 °C stays at or above its cut-off at its
			// rated pulse current (common practice: datasheets rate pulses to
			// the end voltage).
			p := Pack{Chem: c, Form: f, Series: 1, Parallel: 1, CellCapacityMAh: f.CapacityMAh}
			v := p.TerminalV(0.5, 20, f.MaxPulseMA/1000)
			assert.GreaterOrEqualf(t, v, c.CutoffV, "%s %s at its %g mA pulse: %g V, below the %g V cut-off", c.ID, f.Name, f.MaxPulseMA, v, c.CutoffV)
		}
		// Form returns what Forms lists; an unknown name is not found.
		for _, f := range c.Forms {
			got, ok := c.Form(f.Name)
			assert.True(t, ok)
			assert.Equal(t, f, got)
		}
		_, ok = c.Form("9V")
		assert.False(t, ok, c.ID)
	}
	// The example: there is no D-size lithium-ion cell, and no
	// cylindrical lithium-ion size in alkaline.
	liion, _ := Lookup("li-ion")
	_, ok := liion.Form("D")
	assert.False(t, ok, "no D for li-ion")
	alk, _ := Lookup("alkaline")
	_, ok = alk.Form("18650")
	assert.False(t, ok, "no 18650 for alkaline")

	// In one size the energy follows the chemistries' known order: bobbin
	// Li-SOCl₂ > Li-FeS₂ > alkaline (at low drain) > NiMH (common practice;
	// Linden & Reddy, Fig. 14.74 compares AA Li/FeS₂ and alkaline).
	aa := func(id string) float64 {
		c, _ := Lookup(id)
		f, ok := c.Form("AA")
		require.True(t, ok, id)
		return Pack{Chem: c, Form: f, Series: 1, Parallel: 1, CellCapacityMAh: f.CapacityMAh}.EnergyWh()
	}
	assert.Greater(t, aa("li-socl2"), aa("li-fes2"))
	assert.Greater(t, aa("li-fes2"), aa("alkaline"))
	assert.Greater(t, aa("alkaline"), aa("nimh-lsd"))
	// An AA holds 2–10 Wh whatever its chemistry (common practice: 1.2 V ×
	// 1.9 Ah NiMH to 3.6 V × 2.7 Ah Li-SOCl₂).
	for _, id := range []string{"li-socl2", "li-fes2", "alkaline", "nimh-lsd"} {
		wh := aa(id)
		assert.Truef(t, wh >= 2 && wh <= 10, "%s AA: %g Wh, want 2–10 Wh", id, wh)
	}
}

func TestOCVCurves(t *testing.T) {
	for _, c := range Library() {
		ocv := c.OCV
		// 6–12 rows from SoC 0 to SoC 1 (the brief for the library).
		require.Truef(t, len(ocv) >= 6 && len(ocv) <= 12, "%s: %d OCV rows, want 6–12", c.ID, len(ocv))
		assert.Equal(t, 0.0, ocv[0].SoC, c.ID)
		assert.Equal(t, 1.0, ocv[len(ocv)-1].SoC, c.ID)
		for i := 1; i < len(ocv); i++ {
			assert.Greaterf(t, ocv[i].SoC, ocv[i-1].SoC, "%s row %d: SoC rises", c.ID, i)
			assert.Greaterf(t, ocv[i].V, ocv[i-1].V, "%s row %d: OCV rises with charge", c.ID, i)
		}
		// Empty means at the cut-off: a resting cell is at or above it.
		assert.GreaterOrEqualf(t, ocv[0].V, c.CutoffV, "%s: OCV at SoC 0", c.ID)
		// A full cell rests at or above its nominal voltage (common practice:
		// fresh LR6 1.56–1.65 V, ER 3.67 V, Li-ion 4.2 V, NiMH about 1.4 V).
		assert.GreaterOrEqualf(t, ocv[len(ocv)-1].V, c.NominalV, "%s: OCV at SoC 1", c.ID)
		// OCVAt reads the table and holds its ends.
		for _, p := range ocv {
			assert.Equal(t, p.V, c.OCVAt(p.SoC), c.ID)
		}
		assert.Equal(t, ocv[0].V, c.OCVAt(-0.5), c.ID)
		assert.Equal(t, ocv[len(ocv)-1].V, c.OCVAt(1.5), c.ID)

		// The mean over SoC (trapezoids, exact for the linear interpolation)
		// is the energy per unit charge at rest. Under a low-drain load a cell
		// cannot deliver more than its rest voltage, so the mean discharge
		// voltage is at most the mean OCV; and at low drain the drop is only a
		// few percent, so at most 10 % below it (common practice).
		mean := 0.0
		for i := 1; i < len(ocv); i++ {
			mean += (ocv[i].SoC - ocv[i-1].SoC) * (ocv[i].V + ocv[i-1].V) / 2
		}
		assert.Truef(t, c.MeanDischargeV <= mean && c.MeanDischargeV >= mean/1.10,
			"%s: mean OCV %.3f V vs mean discharge voltage %g V, want the discharge voltage within 0–10 %% below", c.ID, mean, c.MeanDischargeV)
	}
}

func TestResistanceVsTemp(t *testing.T) {
	for _, c := range Library() {
		tab := c.ResistanceVsTemp
		require.NotEmpty(t, tab, c.ID)
		for i := 1; i < len(tab); i++ {
			assert.Greater(t, tab[i].TempC, tab[i-1].TempC, c.ID)
		}
		assert.LessOrEqual(t, tab[0].TempC, -40.0, c.ID)
		assert.GreaterOrEqual(t, tab[len(tab)-1].TempC, 60.0, c.ID)
		assert.Equal(t, 1.0, c.ResistanceFactor(20), c.ID)
		// Colder never lowers the resistance; below 20 °C the factor is ≥ 1 and
		// at −20 °C clearly above 1 (common practice: every electrolyte
		// conducts worse in the cold).
		prev := c.ResistanceFactor(100)
		for temp := 100.0; temp >= -60; temp -= 0.5 {
			f := c.ResistanceFactor(temp)
			assert.GreaterOrEqualf(t, f, prev, "%s at %g °C", c.ID, temp)
			assert.Positivef(t, f, "%s at %g °C", c.ID, temp)
			if temp < 20 {
				assert.GreaterOrEqualf(t, f, 1.0, "%s at %g °C", c.ID, temp)
			}
			prev = f
		}
		assert.Greater(t, c.ResistanceFactor(-20), 1.5, c.ID)
	}
}

func TestOperatingAndChargeWindows(t *testing.T) {
	for _, c := range Library() {
		// Every chemistry here works from below freezing to above 45 °C
		// (datasheet ranges: the narrowest is alkaline, −18 to +55 °C).
		assert.Less(t, c.OperatingMinC, 0.0, c.ID)
		assert.Greater(t, c.OperatingMaxC, 45.0, c.ID)
		assert.GreaterOrEqual(t, c.OperatingMinC, -60.0, c.ID)
		assert.LessOrEqual(t, c.OperatingMaxC, 90.0, c.ID)
		if c.Primary {
			// Primary cells are never charged and do not age by cycling.
			for name, v := range map[string]float64{
				"ChargeMinC": c.ChargeMinC, "ChargeMaxC": c.ChargeMaxC, "MaxChargeC": c.MaxChargeC,
				"ChargeEfficiency": c.ChargeEfficiency, "CalendarFadePerYear": c.CalendarFadePerYear,
				"FadeEaJPerMol": c.FadeEaJPerMol, "CycleFadePerCycle": c.CycleFadePerCycle, "EndOfLife": c.EndOfLife,
			} {
				assert.Zerof(t, v, "%s.%s", c.ID, name)
			}
			assert.Zero(t, c.CalendarFadeAt(60), c.ID)
			continue
		}
		assert.Less(t, c.ChargeMinC, c.ChargeMaxC, c.ID)
		assert.GreaterOrEqual(t, c.ChargeMinC, c.OperatingMinC, c.ID)
		assert.LessOrEqual(t, c.ChargeMaxC, c.OperatingMaxC, c.ID)
		// No charging below freezing for any rechargeable here: BU-410 for the
		// lithium-ion types (REFERENCE-VALUES §6.3), common practice for NiMH.
		assert.GreaterOrEqual(t, c.ChargeMinC, 0.0, c.ID)
		// Charge rates and efficiencies within common practice: up to 1 C, and
		// 60–100 % (NiMH 66–92 %, Wikipedia; lithium types about 95 %).
		assert.Truef(t, c.MaxChargeC > 0 && c.MaxChargeC <= 1, "%s.MaxChargeC = %g", c.ID, c.MaxChargeC)
		assert.Truef(t, c.ChargeEfficiency >= 0.6 && c.ChargeEfficiency < 1, "%s.ChargeEfficiency = %g", c.ID, c.ChargeEfficiency)
	}
	// REFERENCE-VALUES §6.3 / BU-410: lithium-ion types charge within 0–45 °C.
	for _, id := range []string{"li-ion", "lifepo4"} {
		c, _ := Lookup(id)
		assert.Equal(t, 0.0, c.ChargeMinC, id)
		assert.LessOrEqual(t, c.ChargeMaxC, 45.0, id)
	}
}

func TestFadeOnlyForRechargeables(t *testing.T) {
	for _, c := range Library() {
		if c.Primary {
			continue // zeros checked in TestOperatingAndChargeWindows
		}
		assert.Truef(t, c.EndOfLife > 0 && c.EndOfLife < 1, "%s.EndOfLife = %g", c.ID, c.EndOfLife)
		assert.Positive(t, c.FadeEaJPerMol, c.ID)
		// Calendar fade at 20 °C of 0.5–10 %/yr, and full cycles to end of life
		// of 300–5000 (common practice: datasheet cycle lives from a few
		// hundred for NiMH and Li-ion to a few thousand for LiFePO₄).
		assert.Truef(t, c.CalendarFadePerYear >= 0.005 && c.CalendarFadePerYear <= 0.10,
			"%s.CalendarFadePerYear = %g, want 0.005–0.10", c.ID, c.CalendarFadePerYear)
		require.Positive(t, c.CycleFadePerCycle, c.ID)
		cycles := (1 - c.EndOfLife) / c.CycleFadePerCycle
		assert.Truef(t, cycles >= 300 && cycles <= 5000, "%s: %g cycles to end of life, want 300–5000", c.ID, cycles)
	}
	// LiFePO₄ outlasts NMC/LCO in cycles and at rest (common practice).
	liion, _ := Lookup("li-ion")
	lfp, _ := Lookup("lifepo4")
	assert.Less(t, lfp.CycleFadePerCycle, liion.CycleFadePerCycle)
	assert.Less(t, lfp.CalendarFadePerYear, liion.CalendarFadePerYear)
}

// sourceGroups are the parameter groups a chemistry's Sources must cover;
// rechargeable ones also cover chargeGroups.
var (
	sourceGroups = []string{
		"nominal_v", "mean_discharge_v", "cutoff_v", "self_discharge_per_year",
		"activation_energy_j_per_mol", "operating_c", "capacity_vs_temp", "ocv",
		"resistance_vs_temp", "forms", "forms.resistance_mohm", "forms.max_current_ma",
	}
	chargeGroups = []string{
		"charge_c", "max_charge_c", "charge_efficiency", "calendar_fade_per_year",
		"fade_activation_energy_j_per_mol", "cycle_fade_per_cycle", "end_of_life",
	}
)

func TestSourcesCoverEveryGroup(t *testing.T) {
	// A source text names a handbook, standard, paper or maker datasheet, or
	// says "common practice" / "from memory" (STYLE.md).
	markers := []string{"from memory", "common practice", "Linden", "IEC ", "Battery University",
		"datasheet", "handbook", "Wikipedia", "REFERENCE-VALUES", "J. ", "Appl. "}
	for _, c := range Library() {
		want := slices.Clone(sourceGroups)
		if !c.Primary {
			want = append(want, chargeGroups...)
		}
		var got []string
		for _, s := range c.Sources {
			assert.Containsf(t, want, s.Field, "%s: source for an unknown or inapplicable group %q", c.ID, s.Field)
			assert.NotContainsf(t, got, s.Field, "%s: two sources for %q", c.ID, s.Field)
			got = append(got, s.Field)
			marked := slices.ContainsFunc(markers, func(m string) bool { return strings.Contains(s.Text, m) })
			assert.Truef(t, marked, "%s, %s: %q names no source", c.ID, s.Field, s.Text)
		}
		for _, g := range want {
			assert.Containsf(t, got, g, "%s has no source for %s", c.ID, g)
		}
	}
}
