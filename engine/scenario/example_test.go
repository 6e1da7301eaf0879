package scenario_test

import (
	"fmt"

	"nodelife/engine/scenario"
)

func ExampleParse() {
	_, err := scenario.Parse([]byte(`{"node": {"vision": {"fps": 90}}, "site": {"latitude": 59.9}}`))
	fmt.Println(err)
	// Output:
	// node.vision.fps: 90 is out of range (allowed: a number from 0 to 60 fps)
	// site.latitude: is not a known key; did you mean "site.lat_deg"? (allowed: keys lat_deg, lon_deg, timezone, placement, fixed_temp_c, indoor_temp_c, outdoor_mean_c, outdoor_annual_range_c, outdoor_daily_range_c, albedo, weather_file, horizon_deg, indoor_closed_temp_c, climate, enclosure, hours, lighting)
}
