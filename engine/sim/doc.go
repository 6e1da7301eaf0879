// Package sim steps one node through its planning horizon: every step (1–60
// minutes, from local midnight of the start date in the site's time zone) it
// takes the cell temperature and the harvested power from the site's Year
// table, the node's load and self-discharge, and moves the cells' stored
// energy, keeping an energy ledger that balances to rounding:
//
//	installed + harvested − harvest unused − charge loss
//	    = load + self-discharge + swapped out + remaining
//
// Harvested power feeds the load first; only the surplus reaches the cells,
// and only when they can take it: never primary cells, only inside the
// chemistry's charge temperature window, at most at its maximum charge rate,
// at its charge efficiency, and never past full. What they cannot take is
// "harvest unused".
//
// State of charge is the energy the cells can still deliver at their present
// temperature, as a share of what they could deliver when full at that
// temperature. Cold lowers it (energy held in a cold cell cannot be drawn),
// so an outdoor node's curve dips in winter and recovers in spring. The cells
// are flat (brown-out) when the state of charge reaches zero.
//
// Two cell sets run through the same steps: the planned one, swapped for
// fresh cells whenever its state of charge falls to the reserve, whose curve
// and ledger the result reports; and the first set left alone, whose flat
// date is the node's lifetime. Outside the valid scenario ranges the results
// are undefined; scenario.Parse enforces them.
package sim
