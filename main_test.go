package main

import (
	"bytes"
	"encoding/json"
	"os"
	"path/filepath"
	"strings"
	"testing"

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
		b, _ := json.Marshal(plan.Run(scenario.Demo()))
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
	r := plan.Run(scenario.Demo())
	assert.Contains(t, out, "Lasts         "+r.Lifetime)
	assert.Contains(t, out, *r.FirstBrownout)
	assert.Contains(t, out, "First swap    "+r.Swaps[0].Date)
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
	assert.Equal(t, string(committed), out)
}

// TestREADMEDocumentsTheFormats keeps the README's tables in step with the
// scenario fields and the result's keys.
func TestREADMEDocumentsTheFormats(t *testing.T) {
	readme, err := os.ReadFile("README.md")
	require.NoError(t, err)
	text := string(readme)
	for _, f := range scenario.Fields() {
		assert.Contains(t, text, "| `"+f.Path+"` |", "README lacks scenario field %s", f.Path)
	}
	b, err := json.Marshal(plan.Run(scenario.Demo()))
	require.NoError(t, err)
	var m map[string]any
	require.NoError(t, json.Unmarshal(b, &m))
	for k := range m {
		assert.Contains(t, text, "`"+k+"`", "README lacks result key %s", k)
	}
	for k := range m["energy_wh"].(map[string]any) {
		assert.Contains(t, text, "`"+k+"`", "README lacks energy_wh key %s", k)
	}
	for _, c := range []string{"outside-rated-temperature", "cold-capacity", "passivation", "lithium-primary", "rechargeable-without-harvest"} {
		assert.Contains(t, text, "`"+c+"`")
	}
}
