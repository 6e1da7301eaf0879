package main

import (
	"fmt"
	"io"
	"os"

	"nodelife/engine/plan"
	"nodelife/engine/report"
	"nodelife/engine/scenario"
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
	// Accept the flags after the file name too, as plan does.
	var files []string
	for len(args) > 0 {
		if err := parseFlags(fs, args); err != nil {
			return err
		}
		args = fs.Args()
		if len(args) > 0 {
			files, args = append(files, args[0]), args[1:]
		}
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
	name := files[0]
	var data []byte
	var err error
	if name == "-" {
		name = "standard input"
		data, err = io.ReadAll(stdin)
	} else {
		data, err = os.ReadFile(name)
	}
	if err != nil {
		return usageError{err.Error()}
	}
	s, err := scenario.Parse(data)
	if err != nil {
		return usageError{prefixLines(name, err)}
	}
	in, err := readInputs(s, name, files[0] == "-")
	if err != nil {
		return usageError{prefixLines(name, err)}
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
		out = report.SVG(r, report.SVGOptions{Width: *width, Height: *height, ReservePct: s.Plan.ReservePct})
	}
	_, err = stdout.Write(out)
	return err
}
