// Package load models what the sensor node draws from its cells, split by
// component: the always-on sleep floor, the vision pipeline (frames per second
// × energy per frame), events (each a host wake plus a radio message, at a
// mean rate per hour), and the regulator's loss between the cells and the
// node.
//
// In this version every component is a constant mean power: the node's
// schedule, the illuminator, radio classes and occupancy profiles come later
// and will fill the same breakdown. Powers are in watts; the regulator passes
// a fixed fraction (its efficiency, 0.1–1) of the cell's power to the node.
package load
