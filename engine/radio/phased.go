package radio

// WiFiParams is a Wi-Fi report from deep sleep: boot, join the network, get
// an address, open a session and post. Each phase is a length at a mean
// current; TXPeakMA is the short transmit bursts' current inside them.
type WiFiParams struct {
	SupplyV float64 // supply voltage, V
	Boot    Burst   // wake from deep sleep: boot and RF calibration
	Connect Burst   // scan, authenticate, associate, WPA2 handshake
	DHCP    Burst   // address lease; zero with a static address
	Session Burst   // TCP connect and TLS handshake; zero for UDP
	Post    Burst   // send the request, wait for the reply, disconnect
	// TXPeakMA is the supply current of a transmit burst at full power,
	// above the phase means.
	TXPeakMA float64
}

// DefaultWiFi returns a report over HTTPS with DHCP, awake 2.5 s at a mean
// 99 mA, 3.3 V: ≈ 0.82 J, inside REFERENCE-VALUES §8.3's common-practice
// 0.2–2 J (awake 1–5 s at 80–150 mA, 3.3 V). Phase split, our pick within
// that: boot 0.2 s at 40 mA, connect 1.0 s at 110 mA, DHCP 0.4 s at 90 mA,
// TCP + TLS 0.6 s at 100 mA, post 0.3 s at 110 mA (common practice). Transmit
// bursts 300 mA: 2.4 GHz Wi-Fi microcontroller modules draw roughly
// 200–350 mA transmitting 802.11b at full power (from memory).
func DefaultWiFi() WiFiParams {
	return WiFiParams{
		SupplyV:  3.3,
		Boot:     Burst{DurationS: 0.2, CurrentMA: 40},
		Connect:  Burst{DurationS: 1.0, CurrentMA: 110},
		DHCP:     Burst{DurationS: 0.4, CurrentMA: 90},
		Session:  Burst{DurationS: 0.6, CurrentMA: 100},
		Post:     Burst{DurationS: 0.3, CurrentMA: 110},
		TXPeakMA: 300,
	}
}

// WiFiQuickReport returns DefaultWiFi with a static address, a remembered
// access point and channel, and one UDP datagram: boot 0.1 s, connect 0.15 s,
// no DHCP, no session, send 0.05 s at 120 mA. ≈ 87 mJ, inside §8.3's
// common-practice 30–100 mJ for this set-up (common practice).
func WiFiQuickReport() WiFiParams {
	p := DefaultWiFi()
	p.Boot.DurationS = 0.1
	p.Connect.DurationS = 0.15
	p.DHCP = Burst{}
	p.Session = Burst{}
	p.Post = Burst{DurationS: 0.05, CurrentMA: 120}
	return p
}

// Validate checks the parameters; the paths are "wifi.<parameter>".
func (p WiFiParams) Validate() error {
	_, err := p.Evaluate()
	return err
}

// Evaluate returns the report as the phases "boot", "connect", "dhcp",
// "session", "post"; E = V·Σ I_k·t_k. The peak is TXPeakMA or the highest
// phase mean, whichever is higher.
func (p WiFiParams) Evaluate() (Message, error) {
	phases := []Phase{{"boot", p.Boot}, {"connect", p.Connect}, {"dhcp", p.DHCP}, {"session", p.Session}, {"post", p.Post}}
	var c checker
	c.float("wifi.supply_v", p.SupplyV, minSupplyV, maxSupplyV, "V")
	for _, ph := range phases {
		c.burst("wifi."+ph.Name, ph.Burst)
	}
	c.float("wifi.tx_peak_ma", p.TXPeakMA, 0, maxCurrentMA, "mA")
	if err := c.err(); err != nil {
		return Message{}, err
	}
	return Message{Class: WiFi, SupplyV: p.SupplyV, Phases: phases, PeakMA: peakOf(phases, p.TXPeakMA)}, nil
}

// LPWAParams is an LTE-M or NB-IoT report from power-saving mode (PSM): wake,
// connect, send a small report, then stay connected until the network
// releases the link. Each phase is a length at a mean current; TXPeakMA is
// the transmit bursts' current inside them.
type LPWAParams struct {
	SupplyV float64 // supply voltage, V
	Wake    Burst   // leave PSM, find and synchronise to the cell, read its system information
	Connect Burst   // random access and RRC connection set-up or resume
	Data    Burst   // send the report (~50 B) and receive the acknowledgement
	// Tail is the connected time after the data until the RRC release: the
	// network's inactivity timer, with connected-mode DRX; zero when the node
	// asks for an early release.
	Tail Burst
	// TXPeakMA is the supply current of a transmit burst at full power
	// (+23 dBm), above the phase means.
	TXPeakMA float64
}

// DefaultLPWA returns a report in good coverage with a 10 s inactivity tail,
// 3.6 V: wake 0.5 s at 15 mA, connect 0.3 s at 70 mA, data 0.3 s at 120 mA,
// tail 10 s at 6 mA (common practice, our pick): ≈ 0.45 J, inside
// REFERENCE-VALUES §8.4's 0.1–1 J in good coverage. 3.6 V: LPWA modules take a
// 3.0–4.3 V supply, often straight from a 3.6 V lithium cell (from memory).
// Transmit bursts 400 mA: modules at +23 dBm draw roughly 200–500 mA (from
// memory); the upper half errs safe for the pulse check.
func DefaultLPWA() LPWAParams {
	return LPWAParams{
		SupplyV:  3.6,
		Wake:     Burst{DurationS: 0.5, CurrentMA: 15},
		Connect:  Burst{DurationS: 0.3, CurrentMA: 70},
		Data:     Burst{DurationS: 0.3, CurrentMA: 120},
		Tail:     Burst{DurationS: 10, CurrentMA: 6},
		TXPeakMA: 400,
	}
}

// Validate checks the parameters; the paths are "lpwa.<parameter>".
func (p LPWAParams) Validate() error {
	_, err := p.Evaluate()
	return err
}

// Evaluate returns the report as the phases "wake", "connect", "data",
// "tail"; E = V·Σ I_k·t_k. The peak is TXPeakMA or the highest phase mean,
// whichever is higher.
func (p LPWAParams) Evaluate() (Message, error) {
	phases := []Phase{{"wake", p.Wake}, {"connect", p.Connect}, {"data", p.Data}, {"tail", p.Tail}}
	var c checker
	c.float("lpwa.supply_v", p.SupplyV, minSupplyV, maxSupplyV, "V")
	for _, ph := range phases {
		c.burst("lpwa."+ph.Name, ph.Burst)
	}
	c.float("lpwa.tx_peak_ma", p.TXPeakMA, 0, maxCurrentMA, "mA")
	if err := c.err(); err != nil {
		return Message{}, err
	}
	return Message{Class: LPWA, SupplyV: p.SupplyV, Phases: phases, PeakMA: peakOf(phases, p.TXPeakMA)}, nil
}
