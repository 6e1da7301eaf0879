package main

import (
	"fmt"
	"io"

	"nodelife/engine/plan"
	"nodelife/engine/report"
)

// cmdChart writes a scenario's state-of-charge chart as SVG, its daily rows
// as CSV or its swaps as CSV. The scenario is read and planned as `nodelife
// plan --fast` does: no advice.
func cmdChart(args []string, stdin io.Reader, stdout io.Writer) error {
	fs := newFlags("chart")
	asSVG := fs.Bool("svg", false, "the chart as SVG (the default)")
	asCSV := fs.Bool("csv", false, "the daily rows as CSV")
	swapsCSV := fs.Bool("swaps-csv", false, "the swaps as CSV")
	width := fs.Int("width", report.DefaultWidth, "the chart's width, px")
	height := fs.Int("height", report.DefaultHeight, "the chart's height, px")
	files, err := fileArgs(fs, args)
	if err != nil {
		return err
	}
	formats := 0
	for _, on := range []bool{*asSVG, *asCSV, *swapsCSV} {
		if on {
			formats++
		}
	}
	if formats > 1 {
		return usageError{"chart: give one of --svg, --csv and --swaps-csv"}
	}
	if *width < report.MinWidth || *width > report.MaxWidth {
		return usageError{fmt.Sprintf("chart: --width %d is out of range (allowed: %d to %d px)", *width, report.MinWidth, report.MaxWidth)}
	}
	if *height < report.MinHeight || *height > report.MaxHeight {
		return usageError{fmt.Sprintf("chart: --height %d is out of range (allowed: %d to %d px)", *height, report.MinHeight, report.MaxHeight)}
	}
	if len(files) != 1 {
		return usageError{"chart: give one scenario file (\"-\" reads standard input); `nodelife demo` prints an example"}
	}
	s, in, name, err := loadScenario(files[0], stdin)
	if err != nil {
		return err
	}
	r, err := plan.RunWith(s, in)
	if err != nil {
		return usageError{prefixLines(name, err)}
	}
	var out []byte
	switch {
	case *asCSV:
		out = report.DailyCSV(r)
	case *swapsCSV:
		out = report.SwapsCSV(r)
	default:
		out = report.SVG(r, report.SVGOptions{Width: *width, Height: *height, ReservePct: s.Plan.ReservePct,
			Shading: report.ShadingFor(s)})
	}
	_, err = stdout.Write(out)
	return err
}
