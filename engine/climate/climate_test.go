package climate

import (
	"fmt"
	"testing"

	"github.com/stretchr/testify/assert"
)

func TestConstant(t *testing.T) {
	c := Constant(-18)
	assert.Equal(t, -18.0, c.TempC(100, 12))
	assert.True(t, c.Constant())
}

func TestSeasonalCurve(t *testing.T) {
	north := Seasonal{MeanC: 8, AnnualRangeC: 20, DailyRangeC: 10, ColdestDay: 15.5}
	// Coldest mid-January at 03:00, warmest mid-July at 15:00: mean ∓ annual/2 ∓ daily/2.
	assert.InDelta(t, 8-10-5, north.TempC(15.5, 3), 1e-9)
	assert.InDelta(t, 8+10+5, north.TempC(15.5+365.25/2, 15), 1e-9)
	// Quarter points sit at the mean (daily term zero at 09:00 and 21:00).
	assert.InDelta(t, 8, north.TempC(15.5+365.25/4, 9), 1e-9)
	assert.False(t, north.Constant())
	assert.True(t, Seasonal{MeanC: 3}.Constant())
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
