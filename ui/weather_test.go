package ui

import (
	"fmt"
	"os"
	"testing"

	"github.com/stretchr/testify/assert"
	"github.com/stretchr/testify/require"

	"nodelife/engine/plan"
	"nodelife/engine/scenario"
	"nodelife/engine/weather"
)

// ohareEPW is the engine's test weather file: NSRDB TMY3 for Chicago
// O'Hare as EPW (engine/weather/testdata/SOURCE.md names its source).
const ohareEPW = "../engine/weather/testdata/nsrdb-tmy3-725300-chicago-ohare.epw"

func readOhare(t *testing.T) []byte {
	t.Helper()
	data, err := os.ReadFile(ohareEPW)
	require.NoError(t, err)
	return data
}

// outdoorPanel is the demo outdoors with a panel: a node whose answer
// depends on the weather.
func outdoorPanel() scenario.Scenario {
	s := scenario.Demo()
	s.Site.Placement = scenario.Outdoor
	s.Harvest.Kind = scenario.HarvestPanel
	return s
}

func TestAppWeatherFileForTheSite(t *testing.T) {
	a, _ := newHosted(t)
	_, err := a.Load(outdoorPanel().JSON())
	require.NoError(t, err)
	normals := a.res.EnergyWh.Harvested

	require.NoError(t, a.Open(readOhare(t), "ohare.epw"))
	assert.Equal(t, "ohare.epw", a.scen.Site.WeatherFile)
	assert.Equal(t, "ohare.epw", a.Debug().Values["site.weather_file"], "the Weather row shows the file")
	assert.Contains(t, a.Debug().Notice, "now uses the weather in ohare.epw")

	// The answer is the engine's for the scenario with that file.
	w, err := weather.Read("ohare.epw", mustOpen(t, ohareEPW))
	require.NoError(t, err)
	want, err := plan.RunWith(a.scen, plan.Inputs{Weather: w})
	require.NoError(t, err)
	assert.Equal(t, want.EnergyWh.Harvested, a.res.EnergyWh.Harvested)
	assert.NotEqual(t, normals, a.res.EnergyWh.Harvested, "Chicago's hours are not Oslo's normals")
	codes := map[string]bool{}
	for _, c := range a.res.Cautions {
		codes[c.Code] = true
	}
	assert.True(t, codes["weather-file-far"], "an Oslo site with Chicago's weather is cautioned: %v", codes)

	// Undo goes back to the normals; the Weather row's other choice too.
	tick(a, keys(KeyUndo))
	assert.Empty(t, a.scen.Site.WeatherFile)
	assert.Equal(t, normals, a.res.EnergyWh.Harvested)
	tick(a, keys(KeyRedo))
	require.Equal(t, "ohare.epw", a.scen.Site.WeatherFile)
	tabTo(t, a, "site.weather_file")
	a.step(keys(KeyDown))
	assert.Empty(t, a.scen.Site.WeatherFile, "the next choice is the climate normals")
	assert.NotContains(t, a.Debug().Values, "site.weather_file", "no file, no Weather row")
}

func mustOpen(t *testing.T, name string) *os.File {
	t.Helper()
	f, err := os.Open(name)
	require.NoError(t, err)
	t.Cleanup(func() { f.Close() })
	return f
}

func TestAppScenarioWaitsForItsWeather(t *testing.T) {
	a, _ := newHosted(t)
	s := outdoorPanel()
	s.Name = "yard camera with hourly weather"
	s.Site.WeatherFile = "data/OHARE.epw"
	err := a.Open(s.JSON(), "yard.json")
	require.Error(t, err)
	assert.Equal(t, scenario.Demo().Name, a.scen.Name, "the scenario on screen stays")
	assert.Contains(t, a.Debug().Notice, `uses the weather file "data/OHARE.epw"`)
	assert.Contains(t, a.Debug().Notice, "drop ohare.epw on the page")

	// The file comes, under its own name's case: the scenario opens with it.
	require.NoError(t, a.Open(readOhare(t), "ohare.epw"))
	assert.Equal(t, s.Name, a.scen.Name)
	assert.Equal(t, "data/OHARE.epw", a.scen.Site.WeatherFile, "the file's path stays as the scenario wrote it")
	assert.Contains(t, a.Debug().Notice, "Opened yard.json with ohare.epw")
	assert.Equal(t, 1, a.Debug().Undo)
}

func TestAppKeptScenarioNeedsWeather(t *testing.T) {
	s := outdoorPanel()
	s.Name = "kept with weather"
	s.Site.WeatherFile = "ohare.epw"
	h := &host{}
	other := scenario.Demo()
	other.Node.Vision.FPS = 2
	kept := fmt.Sprintf(`{"format":%q,"options":[{"letter":"A","scenario":%s}]}`, keptFormat, other.JSON())
	a, err := New(Options{Host: h, Scenario: s.JSON(), KeptOptions: []byte(kept)})
	require.NoError(t, err, "a kept scenario whose weather is missing is not a broken one")
	a.resize(1280, 720, 1)
	tick(a, &Input{MouseX: -1, MouseY: -1})
	assert.Equal(t, scenario.Demo().Name, a.scen.Name)
	assert.Empty(t, h.changed, "the demo is not kept over the waiting scenario")
	assert.Contains(t, a.Debug().Notice, "The kept scenario uses the weather file")
	require.Len(t, a.kept, 1, "the kept options come back too")
	assert.Equal(t, 2.0, a.kept[0].Scen.Node.Vision.FPS)

	require.NoError(t, a.Open(readOhare(t), "ohare.epw"))
	assert.Equal(t, s.Name, a.scen.Name)
	assert.NotEmpty(t, h.changed)
}

func TestAppBadWeatherFile(t *testing.T) {
	a, _ := newHosted(t)
	before := string(a.ScenarioJSON())
	err := a.Open([]byte("LOCATION,nowhere\nnot,a,weather,file\n"), "bad.epw")
	require.Error(t, err)
	assert.Contains(t, a.Debug().Notice, "bad.epw could not be used")
	assert.Contains(t, a.Debug().Notice, "bad.epw:", "the reader's error names the file and its line")
	assert.Equal(t, before, string(a.ScenarioJSON()))
	assert.Empty(t, a.weather)
}
