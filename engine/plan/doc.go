// Package plan turns a scenario into the answer a user acts on: the lifetime
// and first brown-out of the cells as installed, the swap dates of the planned
// cells, where the energy went, cautions, and a daily state-of-charge summary
// for charting. Result is the one shape every interface shares: the command
// line's `plan --json`, the browser app and its JavaScript API all marshal
// the same value with encoding/json.
//
// Dates are ISO 8601 calendar dates local to the site; energies are Wh;
// daily values are rounded to 0.001 (they are for charts), the ledger is not.
package plan
