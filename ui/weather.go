package ui

import (
	"bytes"
	"errors"
	"fmt"
	"strconv"
	"strings"
	"time"

	"nodelife/engine/plan"
	"nodelife/engine/scenario"
	"nodelife/engine/sim"
	"nodelife/engine/weather"
)

// Weather files in the app. A scenario may name a weather file
// (site.weather_file), which a page cannot read from the disk by its path.
// The user drops the file on the page or picks it, the app keeps it for the
// visit by its file name, and plans every scenario that names a file of that
// name with it. A scenario opened before its weather file waits for it.

// weatherKey is the name a weather file is known by: the last part of its
// path, in lower case, so "data/Oslo.epw" finds a dropped "oslo.epw".
func weatherKey(path string) string {
	return strings.ToLower(path[strings.LastIndexAny(path, `/\`)+1:])
}

// waiting is a scenario file that names a weather file the page does not
// have yet.
type waiting struct {
	data []byte
	name string // what the user calls it: the file's name, or "the kept scenario"
	file string // the weather file it names
}

// run plans s with the weather file it names, when the page has it; a
// scenario that names one the page lacks is refused at site.weather_file
// with what to do. Call with a.mu held.
func (a *App) run(s scenario.Scenario) (plan.Result, error) {
	in := a.inputsFor(s)
	w := in.Weather
	if s.Site.WeatherFile != "" {
		if w == nil {
			return plan.Result{}, &scenario.FieldError{Path: "site.weather_file", Value: strconv.Quote(s.Site.WeatherFile),
				Problem: "is not in the page", Allowed: "drop the file on the page or pick it with Open…, then open the scenario",
				Err: sim.ErrWeatherNotLoaded}
		}
	}
	if a.planner.Inputs.Weather != w {
		a.planner.SetInputs(plan.Inputs{Weather: w})
	}
	return a.planner.Run(s)
}

// inputsFor is the files s names, as far as the page has them. Call with
// a.mu held.
func (a *App) inputsFor(s scenario.Scenario) plan.Inputs {
	if s.Site.WeatherFile == "" {
		return plan.Inputs{}
	}
	return plan.Inputs{Weather: a.weather[weatherKey(s.Site.WeatherFile)]}
}

// needsWeather reports whether err is a scenario's weather file missing from
// the page.
func needsWeather(err error) bool { return errors.Is(err, sim.ErrWeatherNotLoaded) }

// openWeather reads a weather file and keeps it for the visit. A scenario
// waiting for it opens; else the scenario on screen takes it as its weather
// (an undoable edit). Call with a.mu held.
func (a *App) openWeather(data []byte, name string) error {
	w, err := weather.Read(name, bytes.NewReader(data))
	if err != nil {
		return err
	}
	if a.weather == nil {
		a.weather = map[string]*weather.Series{}
	}
	key := weatherKey(name)
	a.weather[key] = w // a file of the same name given before is replaced
	what := fmt.Sprintf("%s: %s weather of %s, %d records", name, strings.ToUpper(w.Format), stationName(w), len(w.Records))
	if p := a.waiting; p != nil && weatherKey(p.file) == key {
		a.waiting = nil
		if err := a.open(p.data); err != nil {
			return fmt.Errorf("%s could not be opened with it: %w", p.name, err)
		}
		a.setNotice(fmt.Sprintf("Opened %s with %s. Ctrl+Z goes back to the scenario before it.", p.name, what), false)
		return nil
	}
	s := a.scen
	s.Site.WeatherFile = name
	r, err := a.run(s)
	if err != nil {
		return err
	}
	a.redraw.commit(time.Now())
	a.replace(s, r)
	a.setNotice(fmt.Sprintf("The site now uses the weather in %s. Ctrl+Z goes back to the climate normals.", what), false)
	return nil
}

// stationName is a weather file's station as its header names it.
func stationName(w *weather.Series) string {
	if n := strings.TrimSpace(w.Site.Name); n != "" {
		return n
	}
	return fmt.Sprintf("%.2f°, %.2f°", w.Site.LatDeg, w.Site.LonDeg)
}

// waitForWeather keeps a scenario file whose weather file is missing until
// that file comes, and says so across the page. Call with a.mu held.
func (a *App) waitForWeather(data []byte, name string) {
	s, err := scenario.Parse(data)
	if err != nil {
		return
	}
	a.waiting = &waiting{data: data, name: name, file: s.Site.WeatherFile}
	a.setNotice(fmt.Sprintf("%s uses the weather file %s, which a page cannot read from your disk: "+
		"drop %s on the page (or pick it with Open… → Scenario or weather file…) and %s opens with it.",
		name, strconv.Quote(s.Site.WeatherFile), weatherKey(s.Site.WeatherFile), name), false)
}
