// Package report turns a plan.Result into files to keep or hand on: the
// state-of-charge chart as a standalone SVG 1.1 document (SVG), and the daily
// rows and the planned swaps as RFC 4180 CSV (DailyCSV, SwapsCSV).
//
// The chart shows, on one time axis, the daily minimum–maximum state of
// charge as a band with the daily mean as a line, the reserve line, the swap
// visits and the date the first cells go flat, then a strip of the daily
// mean temperature at the cells and the monthly harvested and used energy in
// Wh. Asked to (SVGOptions.Shading, ShadingFor), it shades the days shorter
// than 12 hours at the site behind the state of charge (ShortDaySpans), the
// same days the app's chart shades. It uses the app's light palette and a
// generic sans-serif font, embeds nothing and links to nothing, and is a
// pure function of its input: the same Result and options give the same
// bytes. Layout exposes the scales the
// chart is drawn with, so tests can check the geometry.
//
// Valid range: any Result the planner makes (1 to 20 years of daily rows).
// Rows whose date does not parse are left out of the chart and kept in the
// CSV as they are; non-finite values are left out of the chart's lines and
// written as "NaN" or "±Inf" in the CSV; a Result with no days gives a chart
// frame that says so.
package report
