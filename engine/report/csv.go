package report

import (
	"bytes"
	"encoding/csv"
	"strconv"

	"nodelife/engine/plan"
)

// DailyColumns is the header row of DailyCSV.
var DailyColumns = []string{"date", "soc_min_pct", "soc_mean_pct", "soc_max_pct",
	"temp_min_c", "temp_mean_c", "temp_max_c", "harvest_wh", "load_wh"}

// SwapColumns is the header row of SwapsCSV.
var SwapColumns = []string{"date", "due", "reason"}

// DailyCSV writes the result's daily rows as RFC 4180 CSV: a header row
// (DailyColumns), then one row per day in the result's order, CRLF line
// ends, no byte-order mark. State of charge (%) and temperatures (°C) have
// three decimals and energies (Wh) six, the precision of plan.Day.
func DailyCSV(r plan.Result) []byte {
	rows := make([][]string, 0, len(r.Daily)+1)
	rows = append(rows, DailyColumns)
	for _, d := range r.Daily {
		rows = append(rows, []string{d.Date,
			fixed(d.SoCMinPct, 3), fixed(d.SoCMeanPct, 3), fixed(d.SoCMaxPct, 3),
			fixed(d.TempMinC, 3), fixed(d.TempMeanC, 3), fixed(d.TempMaxC, 3),
			fixed(d.HarvestWh, 6), fixed(d.LoadWh, 6)})
	}
	return writeCSV(rows)
}

// SwapsCSV writes the planned swaps as RFC 4180 CSV: a header row
// (SwapColumns), then one row per swap: the visit date, the date the cells
// come due and why ("reserve", "flat", "voltage" or "fade").
func SwapsCSV(r plan.Result) []byte {
	rows := make([][]string, 0, len(r.Swaps)+1)
	rows = append(rows, SwapColumns)
	for _, s := range r.Swaps {
		rows = append(rows, []string{s.Date, s.Due, s.Reason})
	}
	return writeCSV(rows)
}

func writeCSV(rows [][]string) []byte {
	var b bytes.Buffer
	w := csv.NewWriter(&b)
	w.UseCRLF = true // RFC 4180, section 2, rule 1
	// Writing to a bytes.Buffer cannot fail.
	_ = w.WriteAll(rows)
	return b.Bytes()
}

// fixed formats x with prec decimals, without a "-0".
func fixed(x float64, prec int) string {
	s := strconv.FormatFloat(x, 'f', prec, 64)
	if len(s) > 1 && s[0] == '-' && isZero(s[1:]) {
		return s[1:]
	}
	return s
}

func isZero(s string) bool {
	for _, c := range s {
		if c != '0' && c != '.' {
			return false
		}
	}
	return true
}
