package sim

import (
	"nodelife/engine/load"
	"nodelife/engine/radio"
	"nodelife/engine/scenario"
)

// LoadParams turns a scenario's node into the load model's parameters.
// packV is the pack's nominal voltage, for the regulator's quiescent draw.
func LoadParams(s scenario.Scenario, packV float64) load.Params {
	n := s.Node
	v := n.Vision
	or := func(p *float64, def float64) float64 {
		if p != nil {
			return *p
		}
		return def
	}
	p := load.Params{
		SleepW:              n.SleepUW * 1e-6,
		RegulatorEfficiency: n.RegulatorEfficiency,
		QuiescentW:          n.RegulatorQuiescentUA * 1e-6 * packV,
		FPS:                 v.FPS,
		ClosedFPS:           or(v.ClosedFPS, v.FPS),
		DarkFPS:             or(v.DarkFPS, 60), // the field's maximum: no limit
		BusyFPS:             or(v.BusyFPS, 0),  // 0: never above the current rate
		FrameJ:              v.FrameUJ * 1e-6,
		EmptyShare:          v.EmptyShare,
		SensorW:             v.SensorMW * 1e-3,
		ExposureSAt100Lux:   v.ExposureMSAt100Lux * 1e-3,
		MaxExposureS:        v.MaxExposureMS * 1e-3,
		IlluminatorW:        n.Illuminator.PowerMW * 1e-3,
		PulseS:              n.Illuminator.PulseMS * 1e-3,
		ThresholdLux:        n.Illuminator.ThresholdLux,
		DwellS:              n.Events.DwellS,
		HoldoffS:            n.Events.HoldoffS,
		AwakeS:              n.Events.AwakeS,
		PauseVision:         n.Events.PauseVision,
		WakeJ:               n.Events.WakeMJ * 1e-3,
		MessageJ:            MessageJ(s),
		HeartbeatsPerDay:    n.Heartbeat.PerDay,
	}
	switch o, ok := load.LookupOccupancy(n.Events.Occupancy); {
	case n.Events.Weekly != nil:
		for i, r := range n.Events.Weekly {
			p.Weekly[i/24][i%24] = r
		}
	case ok:
		p.Weekly = o.Weekly(n.Events.PerHour)
	default:
		p.Weekly = load.Flat(n.Events.PerHour)
	}
	return p
}

// radioParams are the radio package's defaults for the scenario's class,
// with its payload and LoRa spreading factor.
func radioParams(s scenario.Scenario) (radio.Params, bool) {
	c := radio.Class(s.Node.Radio.Class)
	if !c.Valid() {
		return radio.Params{}, false
	}
	p := radio.Defaults(c)
	p.LoRa.PayloadBytes = s.Node.Radio.PayloadBytes
	p.LoRa.Modulation.SpreadingFactor = s.Node.Radio.LoRaSF
	p.BLE.AdvDataBytes = min(s.Node.Radio.PayloadBytes, 31)
	return p, true
}

// MessageJ is the energy of one radio message: none when the radio is not
// modelled (its energy is in wake_mj), the given figure for class "fixed",
// else the radio class's model (engine/radio).
func MessageJ(s scenario.Scenario) float64 {
	if s.Node.Radio.Class == "fixed" {
		return s.Node.Radio.MessageMJ * 1e-3
	}
	p, ok := radioParams(s)
	if !ok {
		return 0
	}
	e, err := radio.EnergyPerMessageJ(p)
	if err != nil {
		panic("sim: radio: " + err.Error()) // the scenario's ranges keep the radio's
	}
	return e
}

// NodePeakMA is the node's peak current from the cells: as the scenario
// gives it, else the radio's peak during a message, at least
// scenario.DefaultPeakMA.
func NodePeakMA(s scenario.Scenario) float64 {
	if s.Node.PeakMA != nil {
		return *s.Node.PeakMA
	}
	peak := scenario.DefaultPeakMA
	if p, ok := radioParams(s); ok {
		if r, err := radio.PeakCurrentMA(p); err == nil {
			peak = max(peak, r)
		}
	}
	return peak
}
