// Command nodelife plans battery life and cell swaps for always-on camera
// sensor nodes, and serves the browser app.
//
//	nodelife plan [--json] SCENARIO.json   plan one node ("-" reads standard input)
//	nodelife cells [--json]                the cell library with its sources
//	nodelife presets [--json]              node profiles, occupancy patterns, climate presets
//	nodelife compare [--json] A.json B.json [C.json D.json]  options side by side
//	nodelife chart [--svg | --csv | --swaps-csv] SCENARIO.json    the chart as SVG, the rows as CSV
//	nodelife demo                          print the built-in demo scenario
//	nodelife schema                        print the scenario format's JSON Schema
//	nodelife serve [--addr 127.0.0.1:8080] serve the app from this binary
//	nodelife sun --lat D --lon D --time RFC3339 [--json]
//	                                       the sun's position and the day's events
//
// Exit status: 0 on success, 2 on bad input (the message names the file, the
// JSON path, the value and what is allowed), 1 on any other failure.
package main

import (
	"context"
	"encoding/json"
	"errors"
	"flag"
	"fmt"
	"io"
	"math"
	"net"
	"net/http"
	"os"
	"path/filepath"
	"sort"
	"strings"
	"time"

	"nodelife/engine/cell"
	"nodelife/engine/climate"
	"nodelife/engine/load"
	"nodelife/engine/plan"
	"nodelife/engine/scenario"
	"nodelife/engine/sky"
	"nodelife/engine/sun"
	"nodelife/engine/weather"
	"nodelife/static"
)

// usageError is bad input from the user: exit status 2.
type usageError struct{ msg string }

func (e usageError) Error() string { return e.msg }

func main() {
	os.Exit(run(os.Args[1:], os.Stdin, os.Stdout, os.Stderr))
}

const usage = `nodelife plans battery life and cell swaps for always-on camera sensor nodes.

usage:
  nodelife plan [--json] [--fast] SCENARIO.json
                                         plan one node with advice ("-" reads standard input;
                                         --fast: the answer without the advice)
  nodelife cells [--json]                the cell library with its sources
  nodelife presets [--json]              node profiles, occupancy patterns, climate presets
  nodelife compare [--json] A.json B.json [C.json D.json]
                                         two to four options side by side, with their cost
  nodelife chart [--svg | --csv | --swaps-csv] [--width N --height N] SCENARIO.json
                                         the state-of-charge chart as SVG, or the daily rows
                                         or the swaps as CSV
  nodelife demo                          print the built-in demo scenario
  nodelife schema                        print the scenario format's JSON Schema
  nodelife serve [--addr 127.0.0.1:8080] serve the app from this binary
  nodelife sun --lat D --lon D --time RFC3339 [--json]
                                         the sun's position at a place and instant,
                                         and that local day's sunrise, noon and sunset
`

// run is main without the process: it returns the exit status.
func run(args []string, stdin io.Reader, stdout, stderr io.Writer) int {
	if len(args) == 0 {
		fmt.Fprint(stderr, usage)
		return 2
	}
	var err error
	switch args[0] {
	case "plan":
		err = cmdPlan(args[1:], stdin, stdout)
	case "cells":
		err = cmdCells(args[1:], stdout)
	case "presets":
		err = cmdPresets(args[1:], stdout)
	case "compare":
		err = cmdCompare(args[1:], stdout)
	case "chart":
		err = cmdChart(args[1:], stdin, stdout)
	case "demo":
		_, err = stdout.Write(scenario.DemoJSON())
	case "schema":
		_, err = stdout.Write(scenario.Schema())
	case "serve":
		err = cmdServe(args[1:], stdout)
	case "sun":
		err = cmdSun(args[1:], stdout)
	case "help", "-h", "--help":
		fmt.Fprint(stdout, usage)
	default:
		err = usageError{fmt.Sprintf("unknown command %q\n\n%s", args[0], usage)}
	}
	if err == nil {
		return 0
	}
	var ue usageError
	if errors.As(err, &ue) {
		fmt.Fprintln(stderr, "nodelife: "+err.Error())
		return 2
	}
	fmt.Fprintln(stderr, "nodelife: "+err.Error())
	return 1
}

func newFlags(name string) *flag.FlagSet {
	fs := flag.NewFlagSet(name, flag.ContinueOnError)
	fs.SetOutput(io.Discard)
	return fs
}

func parseFlags(fs *flag.FlagSet, args []string) error {
	if err := fs.Parse(args); err != nil {
		return usageError{fmt.Sprintf("%s: %v", fs.Name(), err)}
	}
	return nil
}

// fileArgs parses flags placed anywhere among the file names (nodelife
// plan FILE --json as well as nodelife plan --json FILE) and returns the
// file names.
func fileArgs(fs *flag.FlagSet, args []string) ([]string, error) {
	var files []string
	for len(args) > 0 {
		if err := parseFlags(fs, args); err != nil {
			return nil, err
		}
		args = fs.Args()
		if len(args) > 0 {
			files, args = append(files, args[0]), args[1:]
		}
	}
	return files, nil
}

// loadScenario reads and parses a scenario file ("-": standard input) and
// the files it names. Bad input comes back as a usageError with one
// "FILE: path: problem" line per problem; name is how the file is called in
// messages.
func loadScenario(file string, stdin io.Reader) (s scenario.Scenario, in plan.Inputs, name string, err error) {
	name = file
	var data []byte
	if file == "-" {
		name = "standard input"
		data, err = io.ReadAll(stdin)
	} else {
		data, err = os.ReadFile(file)
	}
	if err != nil {
		return s, in, name, usageError{err.Error()}
	}
	if s, err = scenario.Parse(data); err != nil {
		return s, in, name, usageError{prefixLines(name, err)}
	}
	if in, err = readInputs(s, name, file == "-"); err != nil {
		return s, in, name, usageError{prefixLines(name, err)}
	}
	return s, in, name, nil
}

func cmdPlan(args []string, stdin io.Reader, stdout io.Writer) error {
	fs := newFlags("plan")
	asJSON := fs.Bool("json", false, "print the result as JSON")
	fast := fs.Bool("fast", false, "skip the advice (weather draws, sizing, levers)")
	files, err := fileArgs(fs, args)
	if err != nil {
		return err
	}
	if len(files) != 1 {
		return usageError{"plan: give one scenario file (\"-\" reads standard input); `nodelife demo` prints an example"}
	}
	s, in, name, err := loadScenario(files[0], stdin)
	if err != nil {
		return err
	}
	var r plan.Result
	if *fast {
		r, err = plan.RunWith(s, in)
	} else {
		r, err = plan.Plan(context.Background(), s, in, plan.AdviceOptions{})
	}
	if err != nil {
		return usageError{prefixLines(name, err)}
	}
	if *asJSON {
		return writeJSON(stdout, r)
	}
	_, err = io.WriteString(stdout, summary(s, r))
	return err
}

// prefixLines puts the file name before each line of an error, as
// "FILE: path: problem", one problem a line.
func prefixLines(name string, err error) string {
	var lines []string
	for _, line := range strings.Split(err.Error(), "\n") {
		lines = append(lines, name+": "+line)
	}
	return strings.Join(lines, "\nnodelife: ")
}

// readInputs reads the files a scenario names, relative to the scenario
// file's folder (the working folder for standard input).
func readInputs(s scenario.Scenario, scenarioPath string, stdin bool) (plan.Inputs, error) {
	var in plan.Inputs
	if s.Site.WeatherFile == "" {
		return in, nil
	}
	p := s.Site.WeatherFile
	if !filepath.IsAbs(p) && !stdin {
		p = filepath.Join(filepath.Dir(scenarioPath), p)
	}
	f, err := os.Open(p)
	if err != nil {
		return in, usageError{fmt.Sprintf("site.weather_file: %v", err)}
	}
	defer f.Close()
	in.Weather, err = weather.Read(p, f)
	if errors.Is(err, weather.ErrNotWeather) {
		return in, usageError{fmt.Sprintf("site.weather_file: %q is not a weather file (allowed: a TMY3 file ending .csv or an EPW file ending .epw)", s.Site.WeatherFile)}
	}
	if err != nil {
		return in, usageError{err.Error()}
	}
	return in, nil
}

// endText says in words how the first cells end, by the limit that ends
// them.
func endText(r plan.Result) string {
	date := *r.FirstBrownout
	limit := ""
	if r.EndOfLifeLimit != nil {
		limit = *r.EndOfLifeLimit
	}
	switch limit {
	case "voltage":
		return "on " + date + " the cells can no longer hold the node's minimum voltage under its peak current, if nobody swaps them"
	case "temperature":
		return "on " + date + " the cells leave their rated temperature range and the node browns out, swapped or not"
	}
	return "cells flat on " + date + " if nobody swaps them"
}

// dueText says in words why cells come due.
func dueText(reason string, reservePct float64) string {
	switch reason {
	case "reserve":
		return fmt.Sprintf("state of charge down to the %g %% reserve", reservePct)
	case "flat":
		return "flat"
	case "voltage":
		return "too little voltage under the node's peak current"
	case "fade":
		return "aged to end of life"
	}
	return reason
}

// summary is the human-readable answer.
func summary(s scenario.Scenario, r plan.Result) string {
	var b strings.Builder
	row := func(label, format string, args ...any) {
		fmt.Fprintf(&b, "  %-14s%s\n", label, fmt.Sprintf(format, args...))
	}
	fmt.Fprintf(&b, "%s\n", r.Scenario)
	if r.FirstBrownout != nil {
		row("Lasts", "%s: %s", r.Lifetime, endText(r))
	} else {
		row("Lasts", "%s: the cells outlive the %d-year plan", r.Lifetime, s.Plan.Years)
	}
	if len(r.Swaps) > 0 {
		sw := r.Swaps[0]
		row("First swap", "visit on %s; the cells come due on %s (%s)", sw.Date, sw.Due, dueText(sw.Reason, s.Plan.ReservePct))
		var dates []string
		for _, sw := range r.Swaps {
			dates = append(dates, sw.Date)
		}
		row("Swaps", "%d in the plan, %s to %s: %s", len(r.Swaps), r.Start, r.End, strings.Join(dates, ", "))
	} else {
		row("Swaps", "none in the plan, %s to %s", r.Start, r.End)
	}
	chem, _ := cell.Lookup(s.Cells.Chemistry)
	row("Cells", "%d in series × %d in parallel, %s %s; pack %.0f mAh, %.1f V, %.1f Wh", s.Cells.Series, s.Cells.Parallel,
		s.Cells.Form, chem.Name, r.PackMAh, r.PackV, r.PackWh)
	// Load shares, largest first.
	type share struct {
		name string
		wh   float64
	}
	var shares []share
	for c := load.Component(0); c < load.NumComponents; c++ {
		shares = append(shares, share{c.String(), r.EnergyWh.LoadByComponent[c.String()]})
	}
	sort.SliceStable(shares, func(i, j int) bool { return shares[i].wh > shares[j].wh })
	var parts []string
	for _, sh := range shares {
		if r.EnergyWh.Load > 0 {
			parts = append(parts, fmt.Sprintf("%s %.0f %%", sh.name, sh.wh/r.EnergyWh.Load*100))
		}
	}
	row("Average load", "%.3g mW from the cells (%s)", r.AverageLoadMW, strings.Join(parts, ", "))
	row("Temperature", "%.0f to %.0f °C at the cells", r.TempMinC, r.TempMaxC)
	e := r.EnergyWh
	row("Energy, Wh", "installed %.1f, load %.1f, self-discharge %.1f, swapped out %.1f, remaining %.1f",
		e.Installed, e.Load, e.SelfDischarge, e.SwappedOut, e.Remaining)
	if r.Advice != nil && len(r.Advice.Sentences) > 0 {
		b.WriteString("Advice\n")
		for _, line := range r.Advice.Sentences {
			fmt.Fprintf(&b, "  - %s\n", line)
		}
	}
	if len(r.Cautions) > 0 {
		b.WriteString("Cautions\n")
		for _, c := range r.Cautions {
			fmt.Fprintf(&b, "  - %s\n", c.Message)
		}
	}
	b.WriteString("A planning aid: confirm with the cell maker's datasheet and a field measurement.\n")
	return b.String()
}

func cmdCells(args []string, stdout io.Writer) error {
	fs := newFlags("cells")
	asJSON := fs.Bool("json", false, "print the library as JSON")
	if err := parseFlags(fs, args); err != nil {
		return err
	}
	lib := cell.Library()
	if *asJSON {
		return writeJSON(stdout, map[string]any{"chemistries": lib})
	}
	var b strings.Builder
	for _, c := range lib {
		kind := "rechargeable"
		if c.Primary {
			kind = "primary, never charge"
		}
		fmt.Fprintf(&b, "%s: %s (%s)\n", c.ID, c.Name, kind)
		fmt.Fprintf(&b, "  %.3g V nominal, %.3g V mean, %.3g V cut-off; self-discharge %.3g %%/yr at 20 °C; rated %.0f to %.0f °C\n",
			c.NominalV, c.MeanDischargeV, c.CutoffV, c.SelfDischargePerYear*100, c.OperatingMinC, c.OperatingMaxC)
		var forms []string
		for _, f := range c.Forms {
			forms = append(forms, fmt.Sprintf("%s %.0f mAh", f.Name, f.CapacityMAh))
		}
		fmt.Fprintf(&b, "  forms: %s\n", strings.Join(forms, ", "))
		var temps []string
		for _, p := range c.CapacityVsTemp {
			temps = append(temps, fmt.Sprintf("%g °C %.0f %%", p.TempC, p.Fraction*100))
		}
		fmt.Fprintf(&b, "  usable capacity: %s\n", strings.Join(temps, ", "))
		for _, s := range c.Sources {
			fmt.Fprintf(&b, "  source, %s: %s\n", s.Field, s.Text)
		}
	}
	_, err := io.WriteString(stdout, b.String())
	return err
}

func cmdServe(args []string, stdout io.Writer) error {
	fs := newFlags("serve")
	addr := fs.String("addr", "127.0.0.1:8080", "address to listen on")
	if err := parseFlags(fs, args); err != nil {
		return err
	}
	ln, err := net.Listen("tcp", *addr)
	if err != nil {
		return err
	}
	if host, _, _ := net.SplitHostPort(ln.Addr().String()); !net.ParseIP(host).IsLoopback() {
		fmt.Fprintf(stdout, "note: %s is reachable from other machines\n", host)
	}
	h := static.Handler(static.Files, static.Extra{
		"/scenario.schema.json": scenario.Schema(),
		"/demo.json":            scenario.DemoJSON(),
	})
	fmt.Fprintf(stdout, "nodelife: serving the app on http://%s/ (Ctrl-C stops)\n", ln.Addr())
	srv := &http.Server{Handler: h, ReadHeaderTimeout: 10 * time.Second}
	return srv.Serve(ln)
}

// sunReport is the JSON of `nodelife sun`.
type sunReport struct {
	Time                  string  `json:"time"`
	LatDeg                float64 `json:"lat_deg"`
	LonDeg                float64 `json:"lon_deg"`
	ZenithDeg             float64 `json:"zenith_deg"`
	ElevationDeg          float64 `json:"elevation_deg"`
	AzimuthDeg            float64 `json:"azimuth_deg"`
	DeclinationDeg        float64 `json:"declination_deg"`
	EquationOfTimeMin     float64 `json:"equation_of_time_min"`
	Sunrise               *string `json:"sunrise"`
	Sunset                *string `json:"sunset"`
	SolarNoon             *string `json:"solar_noon"`
	Polar                 *string `json:"polar"`
	DayLengthH            float64 `json:"day_length_h"`
	ExtraterrestrialDaily float64 `json:"extraterrestrial_daily_wh_m2"`
}

func cmdSun(args []string, stdout io.Writer) error {
	fs := newFlags("sun")
	lat := fs.Float64("lat", math.NaN(), "latitude, degrees north")
	lon := fs.Float64("lon", math.NaN(), "longitude, degrees east")
	at := fs.String("time", "", "instant, RFC 3339 (e.g. 2027-06-21T12:00:00+02:00)")
	asJSON := fs.Bool("json", false, "print JSON")
	if err := parseFlags(fs, args); err != nil {
		return err
	}
	if math.IsNaN(*lat) || math.IsNaN(*lon) || *at == "" {
		return usageError{"sun: give --lat, --lon and --time"}
	}
	if err := sun.CheckSite(*lat, *lon); err != nil {
		return usageError{err.Error()} // "sun: latitude … out of range …"
	}
	t, err := time.Parse(time.RFC3339, *at)
	if err != nil {
		return usageError{fmt.Sprintf("sun: --time %q is not an RFC 3339 instant (allowed: e.g. 2027-06-21T12:00:00+02:00 or …Z)", *at)}
	}
	pos := sun.At(t, *lat, *lon)
	// The day is the calendar date of --time at its own UTC offset.
	day, err := sun.Events(t, *lat, *lon, t.Location())
	if err != nil {
		return usageError{"sun: " + err.Error()}
	}
	rep := sunReport{Time: t.Format(time.RFC3339), LatDeg: *lat, LonDeg: *lon,
		ZenithDeg: pos.ZenithDeg, ElevationDeg: pos.ElevationDeg, AzimuthDeg: pos.AzimuthDeg,
		DeclinationDeg: pos.DeclinationDeg, EquationOfTimeMin: pos.EquationOfTimeMin,
		DayLengthH:            day.DayLengthH,
		ExtraterrestrialDaily: sky.DailyExtraterrestrialWhm2(day.SolarNoon, *lat, sky.SolarConstantWm2)}
	utc := func(x time.Time) *string {
		v := x.UTC().Format(time.RFC3339)
		return &v
	}
	rep.SolarNoon = utc(day.SolarNoon)
	if day.Polar != sun.NotPolar {
		p := string(day.Polar)
		rep.Polar = &p
	} else {
		rep.Sunrise, rep.Sunset = utc(day.Sunrise), utc(day.Sunset)
	}
	if *asJSON {
		return writeJSON(stdout, rep)
	}
	var b strings.Builder
	fmt.Fprintf(&b, "Sun at %.4f°, %.4f° on %s\n", *lat, *lon, rep.Time)
	fmt.Fprintf(&b, "  elevation      %8.3f° (refracted; geometric zenith %.3f°)\n", pos.ElevationDeg, pos.ZenithDeg)
	fmt.Fprintf(&b, "  azimuth        %8.3f° from north, clockwise\n", pos.AzimuthDeg)
	fmt.Fprintf(&b, "  declination    %8.3f°\n", pos.DeclinationDeg)
	fmt.Fprintf(&b, "  equation of time %+.2f min\n", pos.EquationOfTimeMin)
	local := func(x time.Time) string { return x.In(t.Location()).Format("15:04:05 Z07:00") }
	if rep.Polar != nil {
		fmt.Fprintf(&b, "  polar %s all day; solar noon %s\n", *rep.Polar, local(day.SolarNoon))
	} else {
		fmt.Fprintf(&b, "  sunrise %s, solar noon %s, sunset %s (%.2f h of daylight)\n",
			local(day.Sunrise), local(day.SolarNoon), local(day.Sunset), day.DayLengthH)
	}
	fmt.Fprintf(&b, "  extraterrestrial irradiation on the horizontal that day: %.0f Wh/m²\n", rep.ExtraterrestrialDaily)
	_, err = io.WriteString(stdout, b.String())
	return err
}

// presetsReport is the JSON of `nodelife presets`.
type presetsReport struct {
	Profiles    []profileReport   `json:"node_profiles"`
	Occupancies []occupancyReport `json:"occupancies"`
	Climates    []climate.Preset  `json:"climates"`
}

type profileReport struct {
	ID     string         `json:"id"`
	Name   string         `json:"name"`
	Note   string         `json:"note"`
	Values map[string]any `json:"values"`
}

type occupancyReport struct {
	ID     string         `json:"id"`
	Name   string         `json:"name"`
	Weekly [7][24]float64 `json:"weekly_at_1_per_hour"`
}

func cmdPresets(args []string, stdout io.Writer) error {
	fs := newFlags("presets")
	asJSON := fs.Bool("json", false, "print JSON")
	if err := parseFlags(fs, args); err != nil {
		return err
	}
	var rep presetsReport
	for _, p := range scenario.Profiles() {
		rep.Profiles = append(rep.Profiles, profileReport{p.ID, p.Name, p.Note, p.Values})
	}
	for _, o := range load.Occupancies() {
		rep.Occupancies = append(rep.Occupancies, occupancyReport{o.ID, o.Name, o.Weekly(1)})
	}
	rep.Climates = climate.Presets()
	if *asJSON {
		return writeJSON(stdout, rep)
	}
	var b strings.Builder
	b.WriteString("Node profiles (node.profile):\n")
	for _, p := range rep.Profiles {
		fmt.Fprintf(&b, "  %-18s %s: %s\n", p.ID, p.Name, p.Note)
	}
	b.WriteString("Occupancy patterns (node.events.occupancy):\n")
	for _, o := range rep.Occupancies {
		fmt.Fprintf(&b, "  %-18s %s\n", o.ID, o.Name)
	}
	b.WriteString("Climate presets (site.climate.preset):\n")
	for _, c := range rep.Climates {
		fmt.Fprintf(&b, "  %-18s %s: %s\n", c.ID, c.Name, c.Note)
	}
	_, err := io.WriteString(stdout, b.String())
	return err
}

// writeJSON writes v to w as indented JSON, as every --json output is.
func writeJSON(w io.Writer, v any) error {
	enc := json.NewEncoder(w)
	enc.SetIndent("", "  ")
	return enc.Encode(v)
}
