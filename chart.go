package main

import "io"

// cmdChart writes a scenario's chart as SVG or its daily rows as CSV.
func cmdChart(args []string, stdin io.Reader, stdout io.Writer) error {
	return usageError{"chart: not yet available"}
}
