package climate

import (
	"fmt"
	"testing"

	"github.com/stretchr/testify/assert"

	"nodelife/engine/scenario"
)

func TestPlacements(t *testing.T) {
	site := scenario.Default().Site
	site.Placement, site.FixedTempC = scenario.Fixed, -18
	assert.Equal(t, -18.0, ForSite(site).TempC(100, 12))
	assert.True(t, ForSite(site).Constant())
	site.Placement, site.IndoorTempC = scenario.Indoor, 21
	assert.Equal(t, 21.0, ForSite(site).TempC(200, 3))
	site.Placement = scenario.Outdoor
	assert.False(t, ForSite(site).Constant())
}

func TestSeasonalCurve(t *testing.T) {
	site := scenario.Default().Site
	site.Placement, site.OutdoorMeanC, site.OutdoorAnnualRangeC, site.OutdoorDailyRangeC = scenario.Outdoor, 8, 20, 10
	north := ForSite(site)
	// Coldest mid-January at 03:00, warmest mid-July at 15:00: mean ∓ annual/2 ∓ daily/2.
	assert.InDelta(t, 8-10-5, north.TempC(15.5, 3), 1e-9)
	assert.InDelta(t, 8+10+5, north.TempC(15.5+365.25/2, 15), 1e-9)
	// Equinox-ish quarter points sit at the mean (daily term zero at 09:00 and 21:00).
	assert.InDelta(t, 8, north.TempC(15.5+365.25/4, 9), 1e-9)
	site.LatDeg = -35
	south := ForSite(site)
	assert.InDelta(t, 8+10+5, south.TempC(15.5, 15), 1e-9, "January is summer in the south")
}

func ExampleSeasonal() {
	s := Seasonal{MeanC: 6, AnnualRangeC: 20, DailyRangeC: 8, ColdestDay: 15.5}
	for _, day := range []float64{15.5, 198} {
		fmt.Printf("day %3.0f: %5.1f °C at 03:00, %5.1f °C at 15:00\n", day, s.TempC(day, 3), s.TempC(day, 15))
	}
	// Output:
	// day  16:  -8.0 °C at 03:00,   0.0 °C at 15:00
	// day 198:  12.0 °C at 03:00,  20.0 °C at 15:00
}
