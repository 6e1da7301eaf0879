package load

// Component is one part of the node's load.
type Component int

// The components of the load, in report order.
const (
	Sleep       Component = iota // the always-on floor
	Vision                       // frames: readout, exposure and processing
	Illuminator                  // the LED that lights dark scenes for the camera
	Events                       // the host processor woken by detections
	Radio                        // messages: one per event, and heartbeats
	Regulator                    // the regulator's loss and quiescent draw
	NumComponents
)

var componentNames = [NumComponents]string{"sleep", "vision", "illuminator", "events", "radio", "regulator"}

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

// Params is the node as the load model sees it, in SI units. Every frame
// rate is resolved (equal to FPS where a scenario leaves it out).
type Params struct {
	SleepW              float64
	RegulatorEfficiency float64 // share of the cells' power that reaches the node, (0, 1]
	QuiescentW          float64 // the regulator's own draw from the cells

	// Frames per second: while the site is open, while it is closed, while
	// the scene is dark (below the illuminator's threshold: night outdoors,
	// lights off indoors), and while it is busy (someone in view).
	FPS, ClosedFPS, DarkFPS, BusyFPS float64
	// FrameJ is the readout and processing energy of a frame of a busy
	// scene; an empty scene costs EmptyShare of it (the network stops early).
	FrameJ     float64
	EmptyShare float64
	// Exposure: the sensor draws SensorW while it exposes, for
	// ExposureSAt100Lux × 100 lx / E (longer in dim light), at most
	// MaxExposureS.
	SensorW           float64
	ExposureSAt100Lux float64
	MaxExposureS      float64

	// The illuminator draws IlluminatorW for PulseS per frame while the
	// scene is below ThresholdLux.
	IlluminatorW, PulseS, ThresholdLux float64

	// Weekly is the mean detections per hour by local weekday (Monday
	// first) and hour.
	Weekly [7][24]float64
	// DwellS is how long a detected presence stays in view; HoldoffS merges
	// detections closer than it; AwakeS is how long the host stays up per
	// wake, with vision paused meanwhile if PauseVision.
	DwellS, HoldoffS, AwakeS float64
	PauseVision              bool
	WakeJ                    float64 // host energy per wake
	MessageJ                 float64 // radio energy per message (one per wake, one per heartbeat)
	HeartbeatsPerDay         float64
}

// Conditions are what the load depends on at an instant.
type Conditions struct {
	Weekday int     // 0 = Monday … 6 = Sunday, local
	Hour    int     // local clock hour, 0–23
	Open    bool    // the site is open
	Lux     float64 // illuminance of the scene
}

// WakesPerHour is the host's wakes per hour at a detection rate of ratePerH
// (events per hour, taken as Poisson) when detections closer than holdoffS
// merge into one: the non-paralysable dead-time model,
//
//	m = n / (1 + n τ)
//
// Reference: G. F. Knoll, Radiation Detection and Measurement, 4th ed.
// (Wiley, 2010), ch. 4, "Dead time" (the non-paralyzable model).
func WakesPerHour(ratePerH, holdoffS float64) float64 {
	return ratePerH / (1 + ratePerH*holdoffS/3600)
}

// BusyShare is the share of time someone is in view: detections per hour ×
// dwell, capped at 1 (common practice: utilisation of a single server).
func BusyShare(ratePerH, dwellS float64) float64 {
	return min(ratePerH*dwellS/3600, 1)
}

// ExposureS is the exposure time for a scene at lux: inversely proportional
// to the illuminance (a fixed signal level; common practice for auto
// exposure), capped at the longest exposure the frame allows.
func (p *Params) ExposureS(lux float64) float64 {
	if lux <= 0 {
		return p.MaxExposureS
	}
	return min(p.ExposureSAt100Lux*100/lux, p.MaxExposureS)
}

// NodeW returns the power at the node by component under conditions c
// (Regulator is 0: see CellW).
func (p *Params) NodeW(c Conditions) Breakdown {
	var b Breakdown
	b[Sleep] = p.SleepW
	rate := p.Weekly[c.Weekday][c.Hour]
	wakes := WakesPerHour(rate, p.HoldoffS)
	busy := BusyShare(rate, p.DwellS)
	dark := c.Lux < p.ThresholdLux

	fps := p.FPS
	if !c.Open {
		fps = p.ClosedFPS
	}
	if dark {
		fps = min(fps, p.DarkFPS)
	}
	fps = fps*(1-busy) + max(fps, p.BusyFPS)*busy
	if p.PauseVision {
		fps *= 1 - min(wakes*p.AwakeS/3600, 1)
	}
	frameJ := p.FrameJ*(busy+(1-busy)*p.EmptyShare) + p.SensorW*p.ExposureS(c.Lux)
	b[Vision] = fps * frameJ
	if dark {
		b[Illuminator] = fps * p.IlluminatorW * p.PulseS
	}
	b[Events] = wakes * p.WakeJ / 3600
	b[Radio] = (wakes + p.HeartbeatsPerDay/24) * p.MessageJ / 3600
	return b
}

// CellW returns the power drawn from the cells by component: each node
// component as it is, plus the regulator: its loss P·(1/η − 1) and its
// quiescent draw.
func (p *Params) CellW(c Conditions) Breakdown {
	b, _ := p.CellWTotal(c)
	return b
}

// CellWTotal is CellW and its total.
func (p *Params) CellWTotal(c Conditions) (Breakdown, float64) {
	b := p.NodeW(c)
	node := b.Total()
	b[Regulator] = node*(1/p.RegulatorEfficiency-1) + p.QuiescentW
	return b, node + b[Regulator]
}

// Flat returns a weekly profile of the same rate every hour.
func Flat(ratePerH float64) [7][24]float64 {
	var w [7][24]float64
	for d := range w {
		for h := range w[d] {
			w[d][h] = ratePerH
		}
	}
	return w
}
