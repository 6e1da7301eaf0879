package main

import (
	"bytes"
	"encoding/csv"
	"encoding/xml"
	"os"
	"path/filepath"
	"strings"
	"testing"

	"github.com/stretchr/testify/assert"
	"github.com/stretchr/testify/require"

	"nodelife/engine/plan"
	"nodelife/engine/scenario"
)

func chartRun(t *testing.T, stdin string, args ...string) (code int, stdout, stderr string) {
	t.Helper()
	var out, errOut bytes.Buffer
	code = run(append([]string{"chart"}, args...), strings.NewReader(stdin), &out, &errOut)
	return code, out.String(), errOut.String()
}

func chartFile(t *testing.T, name string, data []byte) string {
	t.Helper()
	p := filepath.Join(t.TempDir(), name)
	require.NoError(t, os.WriteFile(p, data, 0o644))
	return p
}

// chartXML checks that doc is well-formed XML with an <svg> root and
// returns the root's attributes.
func chartXML(t *testing.T, doc string) map[string]string {
	t.Helper()
	d := xml.NewDecoder(strings.NewReader(doc))
	attrs := map[string]string{}
	for {
		tok, err := d.Token()
		if err != nil {
			require.ErrorContains(t, err, "EOF")
			break
		}
		if se, ok := tok.(xml.StartElement); ok && len(attrs) == 0 {
			require.Equal(t, "svg", se.Name.Local)
			for _, a := range se.Attr {
				attrs[a.Name.Local] = a.Value
			}
		}
	}
	require.NotEmpty(t, attrs, "no root element")
	return attrs
}

func TestChartSVG(t *testing.T) {
	p := chartFile(t, "demo.json", scenario.DemoJSON())
	code, out, errOut := chartRun(t, "", p)
	require.Equal(t, 0, code, errOut)
	attrs := chartXML(t, out)
	assert.Equal(t, "960", attrs["width"])
	assert.Equal(t, "540", attrs["height"])
	assert.Contains(t, out, "Brindle Market")
	assert.Contains(t, out, "reserve 10 %", "the scenario's reserve line")
	r, err := plan.Run(scenario.Demo())
	require.NoError(t, err)
	assert.Contains(t, out, r.Swaps[0].Date)

	// --svg explicitly, the size flags, flags after the file, standard input.
	code, out2, errOut := chartRun(t, string(scenario.DemoJSON()), "-", "--svg", "--width", "1200", "--height", "700")
	require.Equal(t, 0, code, errOut)
	attrs = chartXML(t, out2)
	assert.Equal(t, "0 0 1200 700", attrs["viewBox"])
}

func TestChartCSV(t *testing.T) {
	p := chartFile(t, "demo.json", scenario.DemoJSON())
	r, err := plan.Run(scenario.Demo())
	require.NoError(t, err)

	code, out, errOut := chartRun(t, "", "--csv", p)
	require.Equal(t, 0, code, errOut)
	rows, err := csv.NewReader(strings.NewReader(out)).ReadAll()
	require.NoError(t, err)
	require.Len(t, rows, len(r.Daily)+1)
	assert.Equal(t, []string{"date", "soc_min_pct", "soc_mean_pct", "soc_max_pct",
		"temp_min_c", "temp_mean_c", "temp_max_c", "harvest_wh", "load_wh"}, rows[0])
	assert.Equal(t, r.Daily[0].Date, rows[1][0])
	assert.Equal(t, r.Daily[len(r.Daily)-1].Date, rows[len(rows)-1][0])
	assert.True(t, strings.HasSuffix(out, "\r\n"))

	code, out, errOut = chartRun(t, "", p, "--swaps-csv")
	require.Equal(t, 0, code, errOut)
	rows, err = csv.NewReader(strings.NewReader(out)).ReadAll()
	require.NoError(t, err)
	require.Len(t, rows, len(r.Swaps)+1)
	assert.Equal(t, []string{"date", "due", "reason"}, rows[0])
	assert.Equal(t, []string{r.Swaps[0].Date, r.Swaps[0].Due, r.Swaps[0].Reason}, rows[1])
}

func TestChartWeatherFile(t *testing.T) {
	// A weather file named relative to the scenario file is read from its
	// folder, as plan reads it.
	data, err := os.ReadFile("engine/weather/testdata/nsrdb-tmy3-724666-golden-co.csv")
	require.NoError(t, err)
	dir := t.TempDir()
	require.NoError(t, os.WriteFile(filepath.Join(dir, "golden.csv"), data, 0o644))
	s := scenario.Demo()
	s.Site.LatDeg, s.Site.LonDeg, s.Site.Timezone = 39.742, -105.179, "America/Denver"
	s.Site.Placement, s.Site.WeatherFile = scenario.Outdoor, "golden.csv"
	s.Harvest.Kind = scenario.HarvestPanel
	s.Cells.Chemistry, s.Cells.Form = "li-ion", "18650"
	s.Plan.Years = 1
	p := filepath.Join(dir, "golden-node.json")
	require.NoError(t, os.WriteFile(p, s.JSON(), 0o644))
	code, out, errOut := chartRun(t, "", "--csv", p)
	require.Equal(t, 0, code, errOut)
	rows, err := csv.NewReader(strings.NewReader(out)).ReadAll()
	require.NoError(t, err)
	harvested := false
	for _, row := range rows[1:] {
		harvested = harvested || row[7] != "0.000000"
	}
	assert.True(t, harvested, "no day with harvest")
	code, out, errOut = chartRun(t, "", p)
	require.Equal(t, 0, code, errOut)
	chartXML(t, out)
	assert.Contains(t, out, `class="harvest"`)
}

func TestChartBadInput(t *testing.T) {
	bad := chartFile(t, "aisle-9.json", []byte(`{"cells": {"capacity_mah": -5}, "node": {"vision": {"fsp": 3}}}`))
	code, out, errOut := chartRun(t, "", bad)
	assert.Equal(t, 2, code)
	assert.Empty(t, out)
	lines := strings.Split(strings.TrimSpace(errOut), "\n")
	require.Len(t, lines, 2, errOut)
	assert.True(t, strings.HasPrefix(lines[0], "nodelife: "+bad+": cells.capacity_mah: -5 is out of range"), lines[0])
	assert.True(t, strings.HasPrefix(lines[1], "nodelife: "+bad+": node.vision.fsp: "), lines[1])

	// A weather file that is not there: the file and the field.
	s := scenario.Demo()
	s.Site.WeatherFile = "nowhere.epw"
	p := chartFile(t, "weather.json", s.JSON())
	code, _, errOut = chartRun(t, "", "--csv", p)
	assert.Equal(t, 2, code)
	assert.Contains(t, errOut, p+": site.weather_file: ")
	assert.Contains(t, errOut, "nowhere.epw")

	demo := chartFile(t, "demo.json", scenario.DemoJSON())
	for _, args := range [][]string{
		{},                                   // no file
		{demo, demo},                         // two files
		{"--csv", "--svg", demo},             // two formats
		{"--width", "100", demo},             // too narrow
		{"--height", "99999", demo},          // too tall
		{"--colour", demo},                   // unknown flag
		{filepath.Join(t.TempDir(), "none")}, // missing file
	} {
		code, out, errOut := chartRun(t, "", args...)
		assert.Equal(t, 2, code, "chart %q: %s", args, errOut)
		assert.Empty(t, out, "chart %q", args)
		assert.True(t, strings.HasPrefix(errOut, "nodelife: "), "chart %q: %s", args, errOut)
	}
}
