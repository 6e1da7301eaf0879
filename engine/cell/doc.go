// Package cell models battery cells and packs: a library of chemistries with
// sourced parameters (voltage, capacity per standard form factor, usable
// capacity against temperature, self-discharge with Arrhenius temperature
// scaling, operating and charging temperature windows) and packs of identical
// cells in series × parallel.
//
// The model is energy based: a pack holds its rated capacity times its mean
// discharge voltage. Usable capacity at a temperature is a fraction of the
// 20 °C capacity, read from a per-chemistry table by linear interpolation and
// held at the end values beyond the table (the tables span −40 °C to +60 °C;
// outside that range the cell is outside every chemistry's rating and the
// simulation raises a caution). Self-discharge is a loss of a fixed fraction
// of rated capacity per year at 20 °C, scaled by the Arrhenius equation at
// other temperatures.
//
// Every number in the library names its source in a comment and in the
// Sources of its chemistry; a rule of the trade is marked "common practice",
// a value recalled without a source at hand "from memory".
package cell
