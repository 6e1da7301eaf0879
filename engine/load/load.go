package load

import "nodelife/engine/scenario"

// Component is one part of the node's load.
type Component int

// The components of the load, in report order.
const (
	Sleep Component = iota
	Vision
	Events
	Regulator
	NumComponents
)

var componentNames = [NumComponents]string{"sleep", "vision", "events", "regulator"}

// String returns the component's name as used in results: "sleep", "vision" …
func (c Component) String() string { return componentNames[c] }

// Breakdown is power (W) or energy (Wh) by component.
type Breakdown [NumComponents]float64

// Total sums the breakdown.
func (b Breakdown) Total() float64 {
	var t float64
	for _, x := range b {
		t += x
	}
	return t
}

// Model is the node's load.
type Model struct {
	// NodeW is the mean power of each component at the node (Regulator is 0).
	NodeW      Breakdown
	Efficiency float64
}

// FromNode builds the load model of a scenario's node.
func FromNode(n scenario.Node) Model {
	var m Model
	m.NodeW[Sleep] = n.SleepUW * 1e-6
	// Vision: frames per second × energy per frame (µJ) = W.
	m.NodeW[Vision] = n.Vision.FPS * n.Vision.FrameUJ * 1e-6
	// Events: events per hour × energy per event (mJ) / 3600 s = W.
	m.NodeW[Events] = n.Events.PerHour * n.Events.WakeMJ * 1e-3 / 3600
	m.Efficiency = n.RegulatorEfficiency
	return m
}

// CellW returns the power drawn from the cells by component: each node
// component as it is, plus the regulator's loss P·(1/η − 1).
func (m Model) CellW() Breakdown {
	b := m.NodeW
	b[Regulator] = m.NodeW.Total() * (1/m.Efficiency - 1)
	return b
}
