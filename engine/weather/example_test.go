package weather_test

import (
	"fmt"
	"strings"

	"nodelife/engine/weather"
)

func ExampleReadTMY3() {
	file := `999999,EXAMPLE STATION,XX,1,60.0,10.0,100
Date (MM/DD/YYYY),Time (HH:MM),GHI (W/m^2),DNI (W/m^2),DHI (W/m^2),Dry-bulb (C)
06/21/2001,12:00,610,450,240,18.5
06/21/2001,13:00,,450,240,19.0
`
	_, err := weather.ReadTMY3("example.csv", strings.NewReader(file))
	fmt.Println(err)
	// Output:
	// example.csv: line 4, column 18 (GHI (W/m^2)): "" is not a number (allowed: 0 to 1500 W/m²)
}
