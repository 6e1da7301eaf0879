package sun_test

import (
	"fmt"
	"time"

	"nodelife/engine/sun"
)

// Golden, Colorado, on the morning of the SPA worked example.
func ExampleEvents() {
	mst := time.FixedZone("MST", -7*3600)
	date := time.Date(2003, 10, 17, 0, 0, 0, 0, mst)
	day, err := sun.Events(date, 39.742476, -105.1786, mst)
	if err != nil {
		fmt.Println(err)
		return
	}
	fmt.Println("sunrise", day.Sunrise.Format("15:04:05"))
	fmt.Println("noon   ", day.SolarNoon.Format("15:04:05"))
	fmt.Println("sunset ", day.Sunset.Format("15:04:05"))
	fmt.Printf("day     %.2f h\n", day.DayLengthH)

	p := sun.At(time.Date(2003, 10, 17, 12, 30, 30, 0, mst), 39.742476, -105.1786)
	fmt.Printf("at 12:30:30 elevation %.3f°, azimuth %.3f°\n", p.ElevationDeg, p.AzimuthDeg)

	polar, _ := sun.Events(time.Date(2024, 12, 21, 0, 0, 0, 0, time.UTC), 78.22, 15.65, time.UTC)
	fmt.Printf("Svalbard, 21 Dec: polar %q, %.0f h\n", polar.Polar, polar.DayLengthH)
	// Output:
	// sunrise 06:12:43
	// noon    11:46:04
	// sunset  17:18:50
	// day     11.10 h
	// at 12:30:30 elevation 39.891°, azimuth 194.343°
	// Svalbard, 21 Dec: polar "night", 0 h
}
