package climate

// Preset is a built-in climate of our own: monthly normals for a typical
// site of one climate type, January first, for the northern hemisphere
// (south of the equator they shift by six months: ForLatitude).
//
// The values are invented for planning, rounded and representative of their
// Köppen–Geiger class (Köppen 1936; Kottek et al., "World Map of the
// Köppen-Geiger climate classification updated", Meteorol. Z. 15 (2006)
// 259–263): common practice, not any station's record. Each is editable
// month by month in the scenario.
type Preset struct {
	ID   string `json:"id"`
	Name string `json:"name"`
	// TminC and TmaxC are the mean daily minimum and maximum air temperature.
	TminC [12]float64 `json:"tmin_c"`
	TmaxC [12]float64 `json:"tmax_c"`
	// Clearness is the monthly mean daily clearness index K̄T.
	Clearness [12]float64 `json:"clearness"`
	// SoilingPct and SnowLossPct are typical monthly panel losses.
	SoilingPct  [12]float64 `json:"soiling_pct"`
	SnowLossPct [12]float64 `json:"snow_loss_pct"`
	Note        string      `json:"note"`
}

// Presets lists the built-in climates.
func Presets() []Preset {
	return []Preset{
		{ID: "marine-temperate", Name: "marine temperate (Köppen Cfb)",
			TminC:       [12]float64{2, 2, 3, 5, 8, 11, 13, 13, 11, 8, 5, 3},
			TmaxC:       [12]float64{8, 8, 11, 14, 17, 20, 22, 22, 19, 15, 11, 8},
			Clearness:   [12]float64{0.33, 0.38, 0.42, 0.46, 0.48, 0.48, 0.48, 0.47, 0.44, 0.40, 0.34, 0.30},
			SoilingPct:  [12]float64{1, 1, 1, 2, 2, 2, 2, 2, 2, 1, 1, 1},
			SnowLossPct: [12]float64{3, 2, 0, 0, 0, 0, 0, 0, 0, 0, 0, 1},
			Note:        "mild, cloudy, rain all year: a coastal city around 50° N"},
		{ID: "cold-continental", Name: "cold continental (Köppen Dfb)",
			TminC:       [12]float64{-12, -11, -6, 1, 7, 11, 13, 12, 7, 2, -4, -9},
			TmaxC:       [12]float64{-4, -2, 4, 12, 19, 23, 25, 24, 18, 10, 2, -2},
			Clearness:   [12]float64{0.42, 0.47, 0.50, 0.48, 0.50, 0.50, 0.51, 0.50, 0.48, 0.44, 0.38, 0.38},
			SoilingPct:  [12]float64{1, 1, 2, 3, 3, 3, 3, 3, 3, 2, 1, 1},
			SnowLossPct: [12]float64{40, 35, 20, 2, 0, 0, 0, 0, 0, 2, 15, 35},
			Note:        "cold snowy winters, warm summers: inland around 50–55° N"},
		{ID: "subarctic", Name: "subarctic (Köppen Dfc)",
			TminC:       [12]float64{-22, -21, -16, -7, 1, 7, 10, 8, 2, -5, -15, -20},
			TmaxC:       [12]float64{-13, -10, -4, 4, 12, 19, 21, 18, 11, 2, -7, -11},
			Clearness:   [12]float64{0.35, 0.45, 0.52, 0.52, 0.50, 0.48, 0.47, 0.45, 0.42, 0.38, 0.33, 0.30},
			SoilingPct:  [12]float64{1, 1, 1, 2, 2, 2, 2, 2, 2, 1, 1, 1},
			SnowLossPct: [12]float64{60, 60, 50, 25, 3, 0, 0, 0, 0, 10, 40, 55},
			Note:        "long dark winters, short summers: around 65° N"},
		{ID: "mediterranean", Name: "Mediterranean (Köppen Csa)",
			TminC:       [12]float64{6, 6, 8, 10, 14, 18, 21, 21, 18, 14, 10, 7},
			TmaxC:       [12]float64{14, 15, 17, 20, 24, 29, 32, 32, 28, 23, 18, 15},
			Clearness:   [12]float64{0.48, 0.52, 0.55, 0.57, 0.60, 0.65, 0.68, 0.67, 0.62, 0.55, 0.49, 0.46},
			SoilingPct:  [12]float64{2, 2, 2, 3, 3, 4, 5, 5, 4, 3, 2, 2},
			SnowLossPct: [12]float64{},
			Note:        "hot dry summers, mild wet winters: around 38° N"},
		{ID: "hot-desert", Name: "hot desert (Köppen BWh)",
			TminC:       [12]float64{6, 8, 11, 15, 19, 24, 27, 26, 22, 16, 10, 6},
			TmaxC:       [12]float64{19, 22, 26, 31, 36, 41, 42, 41, 38, 32, 25, 19},
			Clearness:   [12]float64{0.62, 0.64, 0.66, 0.68, 0.70, 0.71, 0.68, 0.68, 0.68, 0.66, 0.63, 0.61},
			SoilingPct:  [12]float64{4, 4, 5, 6, 7, 8, 8, 8, 7, 6, 5, 4},
			SnowLossPct: [12]float64{},
			Note:        "very hot, dry and dusty: around 30° N"},
		{ID: "humid-tropical", Name: "humid tropical (Köppen Af)",
			TminC:       [12]float64{23, 23, 24, 24, 24, 24, 23, 23, 23, 23, 23, 23},
			TmaxC:       [12]float64{31, 32, 32, 33, 32, 32, 31, 31, 31, 31, 31, 31},
			Clearness:   [12]float64{0.48, 0.50, 0.50, 0.49, 0.48, 0.49, 0.50, 0.49, 0.47, 0.46, 0.45, 0.46},
			SoilingPct:  [12]float64{2, 2, 2, 2, 2, 2, 2, 2, 2, 2, 2, 2},
			SnowLossPct: [12]float64{},
			Note:        "hot and humid all year, frequent showers: near the equator"},
	}
}

// PresetIDs lists the presets' identifiers.
func PresetIDs() []string {
	var ids []string
	for _, p := range Presets() {
		ids = append(ids, p.ID)
	}
	return ids
}

// LookupPreset returns the preset with the given identifier.
func LookupPreset(id string) (Preset, bool) {
	for _, p := range Presets() {
		if p.ID == id {
			return p, true
		}
	}
	return Preset{}, false
}

// ForLatitude returns the preset as it applies at latDeg: south of the
// equator the months shift by six, so January takes July's values.
func (p Preset) ForLatitude(latDeg float64) Preset {
	if latDeg >= 0 {
		return p
	}
	shift := func(a [12]float64) [12]float64 {
		var out [12]float64
		for i := range a {
			out[i] = a[(i+6)%12]
		}
		return out
	}
	q := p
	q.TminC, q.TmaxC, q.Clearness = shift(p.TminC), shift(p.TmaxC), shift(p.Clearness)
	q.SoilingPct, q.SnowLossPct = shift(p.SoilingPct), shift(p.SnowLossPct)
	return q
}
