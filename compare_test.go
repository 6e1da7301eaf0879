package main

import (
	"encoding/json"
	"os"
	"path/filepath"
	"strings"
	"testing"
	"unicode/utf8"

	"github.com/stretchr/testify/assert"
	"github.com/stretchr/testify/require"

	"nodelife/engine/plan"
	"nodelife/engine/scenario"
)

// panelVariant is the demo with an 18650 li-ion cell and a 40 cm² panel
// outdoors: it outlives the demo's 8-year plan (see
// engine/plan/options_test.go, TestCompareDemoOptions).
func panelVariant() scenario.Scenario {
	s := scenario.Demo()
	s.Name = "18650 + 40 cm² panel"
	s.Site.Placement = scenario.Outdoor
	s.Cells.Chemistry, s.Cells.Form = "li-ion", "18650"
	s.Harvest.Kind, s.Harvest.Panel.AreaCm2 = scenario.HarvestPanel, 40
	return s
}

// writeScenarios writes each scenario into dir under its file name and
// returns the paths.
func writeScenarios(t *testing.T, dir string, files map[string]scenario.Scenario, order ...string) []string {
	t.Helper()
	var paths []string
	for _, name := range order {
		p := filepath.Join(dir, name)
		require.NoError(t, os.WriteFile(p, files[name].JSON(), 0o644))
		paths = append(paths, p)
	}
	return paths
}

func TestCompareCommandTable(t *testing.T) {
	dir := t.TempDir()
	p := writeScenarios(t, dir, map[string]scenario.Scenario{"d-cell.json": scenario.Demo(), "panel.json": panelVariant()},
		"d-cell.json", "panel.json")
	code, out, errOut := runCmd(t, "", "compare", p[0], p[1])
	require.Equal(t, 0, code, errOut)
	lines := strings.Split(out, "\n")
	assert.Equal(t, "Options over 8 years, costs in EUR", lines[0])

	// The table: from the head row to "Cost a year", every non-blank line
	// equally wide (fixed-width columns, values right-aligned).
	var table []string
	for _, l := range lines[2:] {
		if l != "" {
			table = append(table, l)
		}
		if strings.HasPrefix(l, "  Cost a year") {
			break
		}
	}
	require.Len(t, table, 1+7+5, out)
	for _, l := range table {
		assert.Equal(t, utf8.RuneCountInString(table[0]), utf8.RuneCountInString(l), "not aligned: %q", l)
	}
	// The demo's long name is cut at the head of its column and given in
	// full, with its file, below the table.
	assert.Contains(t, table[0], "Brindle Market, Grünerl…   18650 + 40 cm² panel")
	assert.Contains(t, out, "  "+p[0]+": Brindle Market, Grünerløkka store: shelf watcher, aisle 4\n")
	// Hand-computed costs (defaults: 9 a cell, 15 + 0.2 a cm² a harvester,
	// 120 a visit; engine/plan/options_test.go): the D cell has one swap,
	// 2 × 9 = 18 for cells, 120 for the visit, 138 in all, 17.25 a year; the
	// panel option no swap, 9 for its cell, 15 + 40 × 0.2 = 23 for the
	// panel, 32 in all, 4 a year.
	row := func(label string) []string {
		for _, l := range table {
			if strings.HasPrefix(l, "  "+label+"  ") {
				return strings.Fields(strings.TrimPrefix(l, "  "+label))
			}
		}
		t.Fatalf("no row %q in\n%s", label, out)
		return nil
	}
	assert.Equal(t, []string{"1", "0"}, row("Swaps"))
	assert.Equal(t, []string{"2031-07-04", "none"}, row("First swap"))
	assert.Equal(t, []string{"18.00", "EUR", "9.00", "EUR"}, row("Cells cost"))
	assert.Equal(t, []string{"0.00", "EUR", "23.00", "EUR"}, row("Harvester cost"))
	assert.Equal(t, []string{"120.00", "EUR", "0.00", "EUR"}, row("Visits cost"))
	assert.Equal(t, []string{"138.00", "EUR", "32.00", "EUR"}, row("Total cost"))
	assert.Equal(t, []string{"17.25", "EUR", "4.00", "EUR"}, row("Cost a year"))
	assert.Equal(t, []string{"4", "y", "10", "mo", "more", "than", "8", "y"}, row("Lasts"))

	assert.Contains(t, out, "\n\"18650 + 40 cm² panel\" is the cheapest over 8 years: 32.00 EUR in all, 4.00 EUR a year.\n")
	assert.Contains(t, out, "\"18650 + 40 cm² panel\" lasts longest: its first cells outlive the 8-year plan.\n")
	assert.Contains(t, out, "not discounted")
	assert.Contains(t, out, "  - "+p[1]+": ") // the panel option's cautions
	assert.Contains(t, out, "solar-installation")
	assert.Contains(t, out, "planning aid")
}

func TestCompareCommandJSON(t *testing.T) {
	dir := t.TempDir()
	unnamed := scenario.Demo()
	unnamed.Name = ""
	p := writeScenarios(t, dir, map[string]scenario.Scenario{"d-cell.json": unnamed, "panel.json": panelVariant()},
		"panel.json", "d-cell.json")
	// The flag after the files, as plan allows.
	code, out, errOut := runCmd(t, "", "compare", p[0], p[1], "--json")
	require.Equal(t, 0, code, errOut)
	var got plan.Comparison
	require.NoError(t, json.Unmarshal([]byte(out), &got))
	assert.Equal(t, "nodelife.comparison/1", got.Format)
	assert.Equal(t, "EUR", got.Currency)
	assert.Equal(t, 8, got.Years)
	require.Len(t, got.Options, 2)
	// An empty name: the option takes its file's name.
	assert.Equal(t, []string{"18650 + 40 cm² panel", "d-cell.json"}, []string{got.Options[0].Name, got.Options[1].Name})
	// 32 and 138 in all (see TestCompareCommandTable).
	assert.InDelta(t, 32, got.Options[0].CostTotal, 1e-9)
	assert.InDelta(t, 138, got.Options[1].CostTotal, 1e-9)
	assert.Equal(t, []string{"18650 + 40 cm² panel"}, got.Cheapest)

	// The same as the engine's comparison of the same options.
	d, pv := scenario.Demo(), panelVariant()
	d.Name = ""
	want, err := plan.Compare([]plan.Option{
		{Name: "18650 + 40 cm² panel", Scenario: pv, Result: mustPlan(t, pv)},
		{Name: "d-cell.json", Scenario: d, Result: mustPlan(t, d)},
	})
	require.NoError(t, err)
	var wantAny, gotAny any
	b, _ := json.Marshal(want)
	require.NoError(t, json.Unmarshal(b, &wantAny))
	require.NoError(t, json.Unmarshal([]byte(out), &gotAny))
	assert.Equal(t, wantAny, gotAny)
}

func TestCompareCommandNames(t *testing.T) {
	// Two scenarios with the same name: each gets its file's name after it.
	dir := t.TempDir()
	a, b := scenario.Demo(), scenario.Demo()
	b.Cells.Parallel = 2
	p := writeScenarios(t, dir, map[string]scenario.Scenario{"one.json": a, "two.json": b}, "one.json", "two.json")
	code, out, errOut := runCmd(t, "", "compare", "--json", p[0], p[1])
	require.Equal(t, 0, code, errOut)
	var got plan.Comparison
	require.NoError(t, json.Unmarshal([]byte(out), &got))
	assert.Equal(t, a.Name+" (one.json)", got.Options[0].Name)
	assert.Equal(t, a.Name+" (two.json)", got.Options[1].Name)
	// Two D cells in parallel: 2 cells a set.
	assert.Equal(t, 2, got.Options[1].CellsPerSet)
}

func TestCompareCommandBadInput(t *testing.T) {
	dir := t.TempDir()
	good := writeScenarios(t, dir, map[string]scenario.Scenario{"good.json": scenario.Demo()}, "good.json")[0]
	bad := filepath.Join(dir, "store-12.json")
	require.NoError(t, os.WriteFile(bad, []byte(`{"cells": {"capacity_mah": -5}}`), 0o644))
	broken := filepath.Join(dir, "broken.json")
	require.NoError(t, os.WriteFile(broken, []byte("{\n  \"name\": \"x\",\n}"), 0o644))

	code, out, errOut := runCmd(t, "", "compare", good, bad)
	assert.Equal(t, 2, code)
	assert.Empty(t, out)
	assert.Equal(t, "nodelife: "+bad+": cells.capacity_mah: -5 is out of range (allowed: a number from 1 to 1000000 mAh, or null)\n", errOut)

	// Every bad file is reported, one line each, before anything is planned.
	code, _, errOut = runCmd(t, "", "compare", bad, good, broken, filepath.Join(dir, "missing.json"))
	assert.Equal(t, 2, code)
	lines := strings.Split(strings.TrimSpace(errOut), "\n")
	require.Len(t, lines, 3, errOut)
	assert.Contains(t, lines[0], bad+": cells.capacity_mah:")
	assert.Contains(t, lines[1], broken+": line 3, column 1:")
	assert.Contains(t, lines[2], "missing.json")

	// Different currencies: the file that differs, and the one it differs from.
	usd := scenario.Demo()
	usd.Cost.Currency = "USD"
	other := writeScenarios(t, dir, map[string]scenario.Scenario{"usd.json": usd}, "usd.json")[0]
	code, _, errOut = runCmd(t, "", "compare", good, other)
	assert.Equal(t, 2, code)
	assert.Equal(t, "nodelife: "+other+`: cost.currency: "USD" differs from "EUR" in `+good+" (allowed: one currency for every option)\n", errOut)

	// A weather file is read relative to its own scenario.
	w := scenario.Demo()
	w.Site.WeatherFile = "nowhere.epw"
	sub := filepath.Join(dir, "sub")
	require.NoError(t, os.Mkdir(sub, 0o755))
	wp := writeScenarios(t, sub, map[string]scenario.Scenario{"w.json": w}, "w.json")[0]
	code, _, errOut = runCmd(t, "", "compare", good, wp)
	assert.Equal(t, 2, code)
	assert.Contains(t, errOut, wp+": site.weather_file: open "+filepath.Join(sub, "nowhere.epw"))

	// One file, five files, none, standard input, an unknown flag.
	for _, args := range [][]string{
		{"compare", good},
		{"compare", good, good, good, good, good},
		{"compare"},
		{"compare", good, "-"},
		{"compare", "--bogus", good, good},
	} {
		code, out, errOut := runCmd(t, "", args...)
		assert.Equal(t, 2, code, "%v", args)
		assert.Empty(t, out, "%v", args)
		assert.NotEmpty(t, errOut, "%v", args)
	}
	_, _, errOut = runCmd(t, "", "compare", good, good, good, good, good)
	assert.Contains(t, errOut, "give 2 to 4 scenario files, not 5")
	_, _, errOut = runCmd(t, "", "compare", good)
	assert.Contains(t, errOut, "give 2 to 4 scenario files, not 1")
}

func TestCompareCommandWeatherFiles(t *testing.T) {
	// Each scenario reads its weather file from its own folder.
	data, err := os.ReadFile("engine/weather/testdata/nsrdb-tmy3-724666-golden-co.csv")
	require.NoError(t, err)
	var paths []string
	for _, name := range []string{"east", "west"} {
		dir := filepath.Join(t.TempDir(), name)
		require.NoError(t, os.Mkdir(dir, 0o755))
		require.NoError(t, os.WriteFile(filepath.Join(dir, "golden.csv"), data, 0o644))
		s := panelVariant()
		s.Name = name
		s.Site.LatDeg, s.Site.LonDeg, s.Site.Timezone = 39.742, -105.179, "America/Denver"
		s.Site.WeatherFile = "golden.csv"
		s.Plan.Years = 2
		paths = append(paths, writeScenarios(t, dir, map[string]scenario.Scenario{name + ".json": s}, name+".json")[0])
	}
	code, out, errOut := runCmd(t, "", "compare", "--json", paths[0], paths[1])
	require.Equal(t, 0, code, errOut)
	var got plan.Comparison
	require.NoError(t, json.Unmarshal([]byte(out), &got))
	assert.Equal(t, 2, got.Years)
	// The same node and weather: the same cost.
	assert.Equal(t, got.Options[0].CostTotal, got.Options[1].CostTotal)
}
