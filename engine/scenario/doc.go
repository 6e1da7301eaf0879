// Package scenario defines the scenario file: one node at one site, its cells,
// its harvester and the planning horizon, as JSON in the format
// "nodelife.scenario/1".
//
// Every field has a path ("cells.capacity_mah"), a unit in its name, a
// documented default and an allowed range or set of values, all in one table
// (fields.go). The parser (gjson based), the writer, the published JSON Schema
// (schema.json) and the command line's documentation all come from that table.
// Unknown keys are errors with a "did you mean" hint; a value of the wrong type
// or out of range is an error naming the JSON path, the value and what is
// allowed. Absent fields take their defaults, so files written for an earlier
// version of the format keep opening with the same meaning.
//
// Valid range: latitudes −90..90°, longitudes −180..180°, IANA time zones
// known to the Go time zone database (embedded, so the result does not depend
// on the machine), start dates 1950-01-01 to 2079-12-31 and horizons of
// 1–20 years, inside the range where the NOAA solar equations hold.
package scenario
