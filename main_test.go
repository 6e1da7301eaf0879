package main

import (
	"bytes"
	"context"
	"encoding/json"
	"os"
	"path/filepath"
	"regexp"
	"strings"
	"testing"
	"time"

	"github.com/stretchr/testify/assert"
	"github.com/stretchr/testify/require"

	"nodelife/engine/plan"
	"nodelife/engine/scenario"
)

func runCmd(t *testing.T, stdin string, args ...string) (code int, stdout, stderr string) {
	t.Helper()
	var out, errOut bytes.Buffer
	code = run(args, strings.NewReader(stdin), &out, &errOut)
	return code, out.String(), errOut.String()
}

func writeFile(t *testing.T, name string, data []byte) string {
	t.Helper()
	p := filepath.Join(t.TempDir(), name)
	require.NoError(t, os.WriteFile(p, data, 0o644))
	return p
}

func TestPlanJSONMatchesEngine(t *testing.T) {
	p := writeFile(t, "demo.json", scenario.DemoJSON())
	for _, args := range [][]string{{"plan", "--json", p}, {"plan", p, "--json"}} {
		code, out, errOut := runCmd(t, "", args...)
		require.Equal(t, 0, code, errOut)
		var got, want any
		require.NoError(t, json.Unmarshal([]byte(out), &got))
		full, err := plan.Plan(context.Background(), scenario.Demo(), plan.Inputs{}, plan.AdviceOptions{})
		require.NoError(t, err)
		b, _ := json.Marshal(full)
		require.NoError(t, json.Unmarshal(b, &want))
		assert.Equal(t, want, got)
	}
	// Standard input.
	code, out, _ := runCmd(t, string(scenario.DemoJSON()), "plan", "--json", "-")
	assert.Equal(t, 0, code)
	assert.Contains(t, out, `"lifetime_days"`)
}

func TestPlanSummary(t *testing.T) {
	p := writeFile(t, "demo.json", scenario.DemoJSON())
	code, out, _ := runCmd(t, "", "plan", p)
	require.Equal(t, 0, code)
	r := mustPlan(t, scenario.Demo())
	assert.Contains(t, out, "Lasts         "+r.Lifetime+": cells flat on "+*r.FirstBrownout)
	assert.Contains(t, out, *r.FirstBrownout)
	assert.Contains(t, out, "First swap    visit on "+r.Swaps[0].Date+"; the cells come due on "+r.Swaps[0].Due)
	assert.Contains(t, out, "planning aid")
}

func TestBadInputExitsTwo(t *testing.T) {
	bad := writeFile(t, "store-12.json", []byte(`{"cells": {"capacity_mah": -5}, "node": {"vision": {"fsp": 3}}}`))
	code, out, errOut := runCmd(t, "", "plan", bad)
	assert.Equal(t, 2, code)
	assert.Empty(t, out)
	lines := strings.Split(strings.TrimSpace(errOut), "\n")
	require.Len(t, lines, 2)
	// Each line: the file, the JSON path, the value and what is allowed.
	assert.Equal(t, "nodelife: "+bad+": cells.capacity_mah: -5 is out of range (allowed: a number from 1 to 1000000 mAh, or null)", lines[0])
	assert.Contains(t, lines[1], bad+`: node.vision.fsp: is not a known key; did you mean "node.vision.fps"?`)

	syntax := writeFile(t, "broken.json", []byte("{\n  \"name\": \"x\",\n}"))
	code, _, errOut = runCmd(t, "", "plan", syntax)
	assert.Equal(t, 2, code)
	assert.Contains(t, errOut, syntax+": line 3, column 1:")

	code, _, errOut = runCmd(t, "", "plan", filepath.Join(t.TempDir(), "missing.json"))
	assert.Equal(t, 2, code)
	assert.Contains(t, errOut, "missing.json")

	for _, args := range [][]string{{}, {"frobnicate"}, {"plan"}, {"plan", "a.json", "b.json"}, {"cells", "--bogus"}} {
		code, _, errOut := runCmd(t, "", args...)
		assert.Equal(t, 2, code, "%v", args)
		assert.NotEmpty(t, errOut, "%v", args)
	}
}

func TestCellsJSON(t *testing.T) {
	code, out, _ := runCmd(t, "", "cells", "--json")
	require.Equal(t, 0, code)
	var lib struct {
		Chemistries []struct {
			ID      string `json:"id"`
			Sources []struct {
				Field, Source string
			} `json:"sources"`
		} `json:"chemistries"`
	}
	require.NoError(t, json.Unmarshal([]byte(out), &lib))
	var ids []string
	for _, c := range lib.Chemistries {
		ids = append(ids, c.ID)
		assert.NotEmpty(t, c.Sources, c.ID)
	}
	assert.Subset(t, ids, []string{"li-socl2", "alkaline", "li-ion"})

	code, out, _ = runCmd(t, "", "cells")
	assert.Equal(t, 0, code)
	assert.Contains(t, out, "li-socl2: lithium thionyl chloride")
}

func TestDemoAndSchema(t *testing.T) {
	code, out, _ := runCmd(t, "", "demo")
	require.Equal(t, 0, code)
	_, err := scenario.Parse([]byte(out))
	assert.NoError(t, err)
	code, out, _ = runCmd(t, "", "schema")
	require.Equal(t, 0, code)
	committed, err := os.ReadFile("engine/scenario/schema.json")
	require.NoError(t, err)
	assert.True(t, string(committed) == out, "engine/scenario/schema.json differs from `nodelife schema`: run `make schema`")
}

// TestREADMEDocumentsTheFormats keeps the README's tables in step with the
// scenario fields and the result's keys.
func TestREADMEDocumentsTheFormats(t *testing.T) {
	readme, err := os.ReadFile("README.md")
	require.NoError(t, err)
	text := string(readme)
	for _, f := range scenario.Fields() {
		assert.True(t, strings.Contains(text, "| `"+f.Path+"` |"), "README lacks scenario field %s", f.Path)
	}
	// A scenario with a panel, so that every advice key is there.
	s := scenario.Demo()
	s.Site.Placement, s.Harvest.Kind, s.Cells.Chemistry, s.Cells.Form = scenario.Outdoor, scenario.HarvestPanel, "li-ion", "14500"
	s.Plan.Years, s.Plan.WeatherYears = 2, 3
	full, err := plan.Plan(context.Background(), s, plan.Inputs{}, plan.AdviceOptions{})
	require.NoError(t, err)
	b, err := json.Marshal(full)
	require.NoError(t, err)
	var m map[string]any
	require.NoError(t, json.Unmarshal(b, &m))
	for k := range m {
		assert.True(t, strings.Contains(text, "`"+k+"`"), "README lacks result key %s", k)
	}
	for k, v := range m["advice"].(map[string]any) {
		assert.True(t, strings.Contains(text, "`"+k+"`"), "README lacks advice key %s", k)
		if obj, ok := v.(map[string]any); ok {
			for k2 := range obj {
				assert.True(t, strings.Contains(text, "`"+k2+"`"), "README lacks advice key %s.%s", k, k2)
			}
		}
	}
	for k := range m["energy_wh"].(map[string]any) {
		assert.True(t, strings.Contains(text, "`"+k+"`"), "README lacks energy_wh key %s", k)
	}
	for k := range m["daily"].([]any)[0].(map[string]any) {
		assert.True(t, strings.Contains(text, "`"+k+"`"), "README lacks daily key %s", k)
	}
	// Every caution code the engine can raise is listed.
	src, err := os.ReadFile("engine/plan/cautions.go")
	require.NoError(t, err)
	codes := regexp.MustCompile(`(?:add\(|Code: )"([a-z-]+)"`).FindAllStringSubmatch(string(src), -1)
	require.NotEmpty(t, codes)
	for _, c := range codes {
		assert.True(t, strings.Contains(text, "`"+c[1]+"`"), "README lacks caution %s", c[1])
	}
}

func mustPlan(t *testing.T, s scenario.Scenario) plan.Result {
	t.Helper()
	r, err := plan.Run(s)
	require.NoError(t, err)
	return r
}

func TestSunCommand(t *testing.T) {
	// Reda & Andreas SPA example (NREL/TP-560-34302, Table A5.1), compared
	// with the NOAA-equation values and tolerances of REFERENCE-VALUES §1a:
	// geometric zenith 50.127926°, azimuth 194.342583°, EoT 14.64661 min,
	// sunrise 06:12:43 local (13:12:43 UT) within 60 s.
	code, out, errOut := runCmd(t, "", "sun", "--lat", "39.742476", "--lon", "-105.1786", "--time", "2003-10-17T12:30:30-07:00", "--json")
	require.Equal(t, 0, code, errOut)
	var r map[string]any
	require.NoError(t, json.Unmarshal([]byte(out), &r))
	assert.InDelta(t, 50.127926, r["zenith_deg"], 0.01)
	assert.InDelta(t, 194.342583, r["azimuth_deg"], 0.01)
	assert.InDelta(t, 14.64661, r["equation_of_time_min"], 0.02)
	assert.InDelta(t, 39.891362, r["elevation_deg"], 0.02) // NOAA apparent elevation
	rise, err := time.Parse(time.RFC3339, r["sunrise"].(string))
	require.NoError(t, err)
	assert.InDelta(t, 0, rise.Sub(time.Date(2003, 10, 17, 13, 12, 43, 0, time.UTC)).Seconds(), 60)
	assert.Nil(t, r["polar"])
	// Daily extraterrestrial irradiation, D&B eq. 1.10.3 at φ = 39.7425°,
	// δ = −9.3158°, 1361 W/m² / R² with R = 0.99654 AU (REFERENCE-VALUES §1a)
	// [CALC, separate Python session]: 6316 Wh/m²; the engine takes δ at solar
	// noon rather than 12:30, hence the tolerance.
	assert.InDelta(t, 6316, r["extraterrestrial_daily_wh_m2"], 15)

	// Polar night in Svalbard at the December solstice: no rise, no set.
	code, out, _ = runCmd(t, "", "sun", "--lat", "78.2", "--lon", "15.6", "--time", "2027-12-21T12:00:00+01:00", "--json")
	require.Equal(t, 0, code)
	require.NoError(t, json.Unmarshal([]byte(out), &r))
	assert.Equal(t, "night", r["polar"])
	assert.Nil(t, r["sunrise"])
	assert.Nil(t, r["sunset"])
	assert.Equal(t, 0.0, r["day_length_h"])
	assert.Equal(t, 0.0, r["extraterrestrial_daily_wh_m2"])

	code, out, _ = runCmd(t, "", "sun", "--lat", "39.74", "--lon", "-105.18", "--time", "2027-06-21T12:00:00-06:00")
	assert.Equal(t, 0, code)
	assert.Contains(t, out, "sunrise")

	for _, args := range [][]string{
		{"sun", "--lat", "91", "--lon", "0", "--time", "2027-01-01T00:00:00Z"},
		{"sun", "--lat", "10", "--lon", "0", "--time", "yesterday"},
		{"sun", "--lat", "10"},
	} {
		code, _, errOut := runCmd(t, "", args...)
		assert.Equal(t, 2, code, "%v", args)
		assert.NotEmpty(t, errOut)
	}
}

func TestPlanWithWeatherFile(t *testing.T) {
	dir := t.TempDir()
	data, err := os.ReadFile("engine/weather/testdata/nsrdb-tmy3-724666-golden-co.csv")
	require.NoError(t, err)
	require.NoError(t, os.WriteFile(filepath.Join(dir, "golden.csv"), data, 0o644))
	s := scenario.Demo()
	s.Site.LatDeg, s.Site.LonDeg, s.Site.Timezone = 39.742, -105.179, "America/Denver"
	s.Site.Placement, s.Site.WeatherFile = scenario.Outdoor, "golden.csv"
	s.Harvest.Kind = scenario.HarvestPanel
	s.Cells.Chemistry, s.Cells.Form = "li-ion", "18650"
	p := filepath.Join(dir, "golden-node.json")
	require.NoError(t, os.WriteFile(p, s.JSON(), 0o644))
	code, out, errOut := runCmd(t, "", "plan", "--json", p)
	require.Equal(t, 0, code, errOut)
	var r plan.Result
	require.NoError(t, json.Unmarshal([]byte(out), &r))
	assert.Greater(t, r.EnergyWh.Harvested, 0.0)
	// The file's coldest hour at Golden is far below freezing (TMY3 dry-bulb).
	assert.Less(t, r.TempMinC, -10.0)
	assert.NotContains(t, codesOf(r), "weather-file-far")

	// A missing file is bad input, named at its JSON path.
	s.Site.WeatherFile = "nowhere.epw"
	require.NoError(t, os.WriteFile(p, s.JSON(), 0o644))
	code, _, errOut = runCmd(t, "", "plan", p)
	assert.Equal(t, 2, code)
	assert.Contains(t, errOut, "site.weather_file")
	assert.Contains(t, errOut, "nowhere.epw")
}

func codesOf(r plan.Result) []string {
	var cs []string
	for _, c := range r.Cautions {
		cs = append(cs, c.Code)
	}
	return cs
}

func TestPresetsCommand(t *testing.T) {
	code, out, _ := runCmd(t, "", "presets", "--json")
	require.Equal(t, 0, code)
	var rep struct {
		Profiles []struct {
			ID     string         `json:"id"`
			Values map[string]any `json:"values"`
		} `json:"node_profiles"`
		Occupancies []struct{ ID string } `json:"occupancies"`
		Climates    []struct {
			ID    string    `json:"id"`
			TminC []float64 `json:"tmin_c"`
		} `json:"climates"`
	}
	require.NoError(t, json.Unmarshal([]byte(out), &rep))
	assert.Len(t, rep.Profiles, len(scenario.Profiles()))
	assert.NotEmpty(t, rep.Profiles[0].Values)
	assert.NotEmpty(t, rep.Occupancies)
	assert.Len(t, rep.Climates[0].TminC, 12)
	code, out, _ = runCmd(t, "", "presets")
	assert.Equal(t, 0, code)
	assert.Contains(t, out, "doorway-counter")
}

func TestSummarySaysWhatEndsTheCells(t *testing.T) {
	s := scenario.Demo()
	s.Site.Placement, s.Site.FixedTempC = scenario.Fixed, -25
	s.Cells.Chemistry, s.Cells.Form = "alkaline", "D" // rated down to −18 °C
	s.Plan.Years = 1
	p := writeFile(t, "freezer.json", s.JSON())
	code, out, _ := runCmd(t, "", "plan", "--fast", p)
	require.Equal(t, 0, code)
	assert.Contains(t, out, "leave their rated temperature range")
	assert.NotContains(t, out, "cells flat on")
}
