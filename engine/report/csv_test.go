package report_test

import (
	"bytes"
	"encoding/csv"
	"fmt"
	"strconv"
	"strings"
	"testing"

	"github.com/stretchr/testify/assert"
	"github.com/stretchr/testify/require"

	"nodelife/engine/plan"
	"nodelife/engine/report"
)

func readCSV(t *testing.T, data []byte) [][]string {
	t.Helper()
	rows, err := csv.NewReader(bytes.NewReader(data)).ReadAll()
	require.NoError(t, err)
	return rows
}

func TestDailyCSV(t *testing.T) {
	r := handMade()
	r.Daily[0].TempMinC = -7.125
	r.Daily[0].TempMeanC = -0.0001 // rounds to zero, written without a sign
	data := report.DailyCSV(r)
	assert.False(t, bytes.HasPrefix(data, []byte("\xEF\xBB\xBF")), "byte-order mark")
	assert.Equal(t, len(r.Daily)+1, bytes.Count(data, []byte("\r\n")), "CRLF after every row")
	assert.Equal(t, bytes.Count(data, []byte("\n")), bytes.Count(data, []byte("\r\n")), "bare LF")

	rows := readCSV(t, data)
	require.Len(t, rows, len(r.Daily)+1)
	assert.Equal(t, []string{"date", "soc_min_pct", "soc_mean_pct", "soc_max_pct",
		"temp_min_c", "temp_mean_c", "temp_max_c", "harvest_wh", "load_wh"}, rows[0])
	assert.Equal(t, []string{"2027-01-01", "98.000", "100.000", "100.000", "-7.125", "0.000", "5.000", "0.500000", "0.250000"}, rows[1])
	// Every row reads back to the day it came from (to the written precision).
	for i, d := range r.Daily {
		row := rows[i+1]
		require.Len(t, row, 9)
		assert.Equal(t, d.Date, row[0])
		for j, want := range []float64{d.SoCMinPct, d.SoCMeanPct, d.SoCMaxPct, d.TempMinC, d.TempMeanC, d.TempMaxC, d.HarvestWh, d.LoadWh} {
			got, err := strconv.ParseFloat(row[j+1], 64)
			require.NoError(t, err)
			assert.InDelta(t, want, got, 0.0005, "%s %s", d.Date, rows[0][j+1])
		}
	}
	// No days: the header alone.
	assert.Equal(t, "date,soc_min_pct,soc_mean_pct,soc_max_pct,temp_min_c,temp_mean_c,temp_max_c,harvest_wh,load_wh\r\n",
		string(report.DailyCSV(plan.Result{})))
}

func TestSwapsCSV(t *testing.T) {
	r := handMade()
	r.Swaps = append(r.Swaps, plan.Swap{Date: "2028-11-02", Due: "2028-11-16", Reason: `voltage, "cold"`},
		plan.Swap{Date: "2028-12-01", Due: "2028-12-15", Reason: "two\nlines"})
	data := report.SwapsCSV(r)
	// RFC 4180 section 2, rules 6 and 7: a field with a comma, quote or line
	// break is quoted, and its quotes doubled.
	assert.Contains(t, string(data), "2028-11-02,2028-11-16,\"voltage, \"\"cold\"\"\"\r\n")
	assert.Contains(t, string(data), "2027-07-01,2027-07-15,reserve\r\n", "a plain field is not quoted")
	rows := readCSV(t, data)
	require.Len(t, rows, len(r.Swaps)+1)
	assert.Equal(t, []string{"date", "due", "reason"}, rows[0])
	for i, s := range r.Swaps {
		// encoding/csv reads a quoted CRLF back as LF; our fields have LF.
		assert.Equal(t, []string{s.Date, s.Due, s.Reason}, rows[i+1])
	}
	assert.Equal(t, "date,due,reason\r\n", string(report.SwapsCSV(plan.Result{})))
}

// tiny is a two-day result, made up for the examples.
func tiny() plan.Result {
	return plan.Result{Scenario: "Dock 4", Start: "2027-03-01", End: "2027-03-03",
		Daily: []plan.Day{
			{Date: "2027-03-01", SoCMinPct: 99.5, SoCMeanPct: 99.75, SoCMaxPct: 100, TempMinC: -2.5, TempMeanC: 1, TempMaxC: 4.25, HarvestWh: 0.012, LoadWh: 0.036},
			{Date: "2027-03-02", SoCMinPct: 99, SoCMeanPct: 99.25, SoCMaxPct: 99.5, TempMinC: -3, TempMeanC: 0.5, TempMaxC: 3, HarvestWh: 0.01, LoadWh: 0.036},
		},
		Swaps: []plan.Swap{{Date: "2029-05-14", Due: "2029-05-28", Reason: "reserve"}},
	}
}

func ExampleDailyCSV() {
	lines := strings.Split(string(report.DailyCSV(tiny())), "\r\n")
	fmt.Println(lines[0])
	fmt.Println(lines[1])
	// Output:
	// date,soc_min_pct,soc_mean_pct,soc_max_pct,temp_min_c,temp_mean_c,temp_max_c,harvest_wh,load_wh
	// 2027-03-01,99.500,99.750,100.000,-2.500,1.000,4.250,0.012000,0.036000
}

func ExampleSwapsCSV() {
	fmt.Print(strings.ReplaceAll(string(report.SwapsCSV(tiny())), "\r\n", "\n"))
	// Output:
	// date,due,reason
	// 2029-05-14,2029-05-28,reserve
}
