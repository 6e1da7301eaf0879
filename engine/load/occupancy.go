package load

// Occupancy is a weekly pattern of detections of our own: how busy a kind of
// place is by local weekday and hour, relative to its weekly mean (the
// pattern's mean over the 168 hours is 1). A scenario scales it by its mean
// detections per hour. The shapes are invented for planning (common
// practice: retail, office and commuter rhythms), not measurements.
type Occupancy struct {
	ID, Name string
	// Weekday, Saturday and Sunday hour weights before normalising.
	weekday, saturday, sunday [24]float64
}

// Occupancies lists the built-in patterns.
func Occupancies() []Occupancy {
	return []Occupancy{
		{ID: "store", Name: "store: opening hours, lunch and after-work peaks, quieter Sundays",
			weekday:  [24]float64{0, 0, 0, 0, 0, 0, 0.1, 0.4, 0.8, 1, 1.1, 1.4, 1.6, 1.3, 1.1, 1.2, 1.5, 1.8, 1.7, 1.3, 0.8, 0.3, 0, 0},
			saturday: [24]float64{0, 0, 0, 0, 0, 0, 0, 0.2, 0.8, 1.4, 1.8, 2, 2, 1.9, 1.8, 1.7, 1.6, 1.4, 1.1, 0.8, 0.4, 0.1, 0, 0},
			sunday:   [24]float64{0, 0, 0, 0, 0, 0, 0, 0, 0.2, 0.6, 0.9, 1.1, 1.2, 1.1, 1, 0.9, 0.8, 0.6, 0.3, 0.1, 0, 0, 0, 0}},
		{ID: "office", Name: "office: working days, arrival, lunch and departure peaks",
			weekday:  [24]float64{0, 0, 0, 0, 0, 0, 0.1, 0.6, 1.8, 1.2, 1, 1, 1.5, 1.4, 1, 1, 1.1, 1.6, 0.8, 0.3, 0.1, 0.05, 0, 0},
			saturday: [24]float64{0, 0, 0, 0, 0, 0, 0, 0, 0.05, 0.1, 0.1, 0.1, 0.1, 0.1, 0.1, 0.05, 0, 0, 0, 0, 0, 0, 0, 0},
			sunday:   [24]float64{}},
		{ID: "parking", Name: "parking: commuter peaks on working days, middays at weekends",
			weekday:  [24]float64{0.05, 0.05, 0.05, 0.05, 0.05, 0.1, 0.3, 1.5, 2, 1.2, 0.6, 0.6, 0.8, 0.7, 0.6, 0.7, 1.2, 1.8, 1.2, 0.5, 0.3, 0.2, 0.1, 0.05},
			saturday: [24]float64{0.05, 0.05, 0.05, 0.05, 0.05, 0.05, 0.1, 0.2, 0.4, 0.7, 0.9, 1, 1, 0.9, 0.9, 0.8, 0.7, 0.5, 0.4, 0.3, 0.2, 0.2, 0.1, 0.05},
			sunday:   [24]float64{0.05, 0.05, 0.05, 0.05, 0.05, 0.05, 0.05, 0.1, 0.2, 0.4, 0.6, 0.7, 0.7, 0.6, 0.6, 0.5, 0.4, 0.3, 0.2, 0.2, 0.1, 0.1, 0.05, 0.05}},
		{ID: "corridor", Name: "corridor: steady through the working day, little at night",
			weekday:  [24]float64{0.05, 0.05, 0.05, 0.05, 0.05, 0.05, 0.3, 0.9, 1.2, 1, 1, 1, 1.2, 1.1, 1, 1, 1, 1.1, 0.8, 0.4, 0.2, 0.1, 0.05, 0.05},
			saturday: [24]float64{0.05, 0.05, 0.05, 0.05, 0.05, 0.05, 0.05, 0.1, 0.2, 0.3, 0.3, 0.3, 0.3, 0.3, 0.3, 0.3, 0.2, 0.2, 0.1, 0.1, 0.05, 0.05, 0.05, 0.05},
			sunday:   [24]float64{0.05, 0.05, 0.05, 0.05, 0.05, 0.05, 0.05, 0.05, 0.1, 0.2, 0.2, 0.2, 0.2, 0.2, 0.2, 0.2, 0.1, 0.1, 0.1, 0.05, 0.05, 0.05, 0.05, 0.05}},
		{ID: "home", Name: "home: mornings and evenings on working days, all day at weekends",
			weekday:  [24]float64{0.05, 0.05, 0.05, 0.05, 0.05, 0.2, 1, 1.5, 1, 0.3, 0.3, 0.3, 0.4, 0.3, 0.3, 0.3, 0.5, 1.2, 1.5, 1.5, 1.3, 1, 0.5, 0.2},
			saturday: [24]float64{0.05, 0.05, 0.05, 0.05, 0.05, 0.05, 0.2, 0.6, 1, 1.2, 1.2, 1.1, 1.2, 1, 1, 1, 1, 1.1, 1.3, 1.3, 1.2, 1, 0.6, 0.3},
			sunday:   [24]float64{0.05, 0.05, 0.05, 0.05, 0.05, 0.05, 0.1, 0.4, 0.9, 1.2, 1.2, 1.1, 1.2, 1, 1, 1, 1, 1.1, 1.3, 1.3, 1.1, 0.8, 0.4, 0.2}},
	}
}

// OccupancyIDs lists the patterns' identifiers.
func OccupancyIDs() []string {
	var ids []string
	for _, o := range Occupancies() {
		ids = append(ids, o.ID)
	}
	return ids
}

// LookupOccupancy returns the pattern with the given identifier.
func LookupOccupancy(id string) (Occupancy, bool) {
	for _, o := range Occupancies() {
		if o.ID == id {
			return o, true
		}
	}
	return Occupancy{}, false
}

// Weekly returns the pattern scaled to a weekly mean of meanPerH detections
// per hour, by weekday (Monday first) and hour.
func (o Occupancy) Weekly(meanPerH float64) [7][24]float64 {
	var w [7][24]float64
	var sum float64
	for d := range w {
		day := o.weekday
		switch d {
		case 5:
			day = o.saturday
		case 6:
			day = o.sunday
		}
		w[d] = day
		for _, x := range day {
			sum += x
		}
	}
	scale := meanPerH * 168 / sum
	for d := range w {
		for h := range w[d] {
			w[d][h] *= scale
		}
	}
	return w
}
