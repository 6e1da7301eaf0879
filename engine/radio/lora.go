package radio

import (
	"math"
	"strconv"
	"time"
)

// LDRO is the low-data-rate-optimisation setting (the DE bit of the
// time-on-air formula).
type LDRO int

// Low-data-rate-optimisation settings. The zero value is LDROAuto.
const (
	// LDROAuto turns the optimisation on when a symbol lasts 16 ms or more,
	// as the common LoRa transceivers' datasheets mandate (SF11 and SF12 at
	// 125 kHz, SF12 at 250 kHz).
	LDROAuto LDRO = iota
	LDROOn        // forced on
	LDROOff       // forced off, whatever the symbol time
)

func (d LDRO) String() string {
	switch d {
	case LDROAuto:
		return "auto"
	case LDROOn:
		return "on"
	case LDROOff:
		return "off"
	}
	return "LDRO(" + strconv.Itoa(int(d)) + ")"
}

// ldroThresholdMS is the symbol time from which the optimisation is mandatory:
// "T_sym ≥ 16 ms" (REFERENCE-VALUES §8.1; the transceiver datasheets).
const ldroThresholdMS = 16

// maxPHYPayloadBytes is the largest LoRa PHY payload: the explicit header's
// length field is one byte (AN1200.13; the transceiver datasheets).
const maxPHYPayloadBytes = 255

// LoRaModulation is a LoRa modem packet's settings, the inputs of the
// time-on-air formula other than the payload length.
type LoRaModulation struct {
	SpreadingFactor int     // SF, 7 to 12
	BandwidthKHz    float64 // BW, 7.8 to 500 kHz (the modem's 7.8 … 500 kHz settings)
	// CodingRate is n of the code rate 4/n, 5 to 8 (the formula's CR is n − 4).
	CodingRate int
	// PreambleSymbols is the programmed preamble length n_preamble, 6 to
	// 65535 (the transceiver's 16-bit preamble register, minimum 6; from
	// memory). The modem adds 4.25 symbols of sync word and start frame delimiter.
	PreambleSymbols     int
	ImplicitHeader      bool // IH = 1: no explicit header (fixed-length packets)
	CRC                 bool // payload CRC on
	LowDataRateOptimize LDRO // DE: LDROAuto (the zero value), LDROOn or LDROOff
}

// Validate checks the settings; the paths are "lora.<parameter>".
func (m LoRaModulation) Validate() error {
	var c checker
	m.check(&c)
	return c.err()
}

func (m LoRaModulation) check(c *checker) {
	switch sf := m.SpreadingFactor; {
	case sf == 5 || sf == 6:
		c.add("lora.spreading_factor", strconv.Itoa(sf),
			"is not supported: SF5 and SF6 use a different time-on-air formula", "7 to 12")
	default:
		c.integer("lora.spreading_factor", sf, 7, 12)
	}
	// 7.8 kHz: the modem's narrowest bandwidth setting, 7.8125 kHz, as the
	// datasheets print it; 500 kHz its widest (AN1200.13).
	c.float("lora.bandwidth_khz", m.BandwidthKHz, 7.8, 500, "kHz")
	if m.CodingRate < 5 || m.CodingRate > 8 {
		c.add("lora.coding_rate", strconv.Itoa(m.CodingRate), "is out of range", "5 to 8, for 4/5 to 4/8")
	}
	c.integer("lora.preamble_symbols", m.PreambleSymbols, 6, 65535)
	if m.LowDataRateOptimize < LDROAuto || m.LowDataRateOptimize > LDROOff {
		c.add("lora.low_data_rate_optimize", strconv.Itoa(int(m.LowDataRateOptimize)),
			"is not a setting", "auto, on, off")
	}
}

// symbolMS returns T_sym in milliseconds, 2^SF / BW with BW in kHz.
func (m LoRaModulation) symbolMS() float64 {
	return float64(int(1)<<m.SpreadingFactor) / m.BandwidthKHz
}

// SymbolTime returns the symbol duration T_sym = 2^SF / BW, to the nanosecond.
func (m LoRaModulation) SymbolTime() time.Duration {
	return time.Duration(math.Round(m.symbolMS() * 1e6))
}

// LowDataRate reports whether the optimisation is on (DE = 1): forced by
// LDROOn or LDROOff, else on when T_sym ≥ 16 ms.
func (m LoRaModulation) LowDataRate() bool {
	switch m.LowDataRateOptimize {
	case LDROOn:
		return true
	case LDROOff:
		return false
	}
	// 2^SF / BW ≥ 16 ms, with BW in kHz; multiplying by 16 is exact.
	return float64(int(1)<<m.SpreadingFactor) >= ldroThresholdMS*m.BandwidthKHz
}

// PayloadSymbols returns n_payload, the symbols after the preamble (header,
// payload and CRC) of a packet of payloadBytes PHY payload bytes:
//
//	n_payload = 8 + max(⌈(8·PL − 4·SF + 28 + 16·CRC − 20·IH) / (4·(SF − 2·DE))⌉·(CR + 4), 0)
//
// It panics if the settings are not valid (call Validate first).
//
// Reference: AN1200.13, LoRa Modem Designer's Guide, rev. 1 (2013), the
// time-on-air formula, as printed also in the time-on-air section of a common
// LoRa transceiver's datasheet (REFERENCE-VALUES §8.1).
func (m LoRaModulation) PayloadSymbols(payloadBytes int) int {
	if m.Validate() != nil || payloadBytes < 0 || payloadBytes > maxPHYPayloadBytes {
		panic("radio: PayloadSymbols with invalid settings")
	}
	return m.payloadSymbols(payloadBytes)
}

func (m LoRaModulation) payloadSymbols(pl int) int {
	b := func(v bool) int {
		if v {
			return 1
		}
		return 0
	}
	sf := m.SpreadingFactor
	// AN1200.13 n_payload: numerator 8·PL − 4·SF + 28 + 16·CRC − 20·IH,
	// denominator 4·(SF − 2·DE).
	num := 8*pl - 4*sf + 28 + 16*b(m.CRC) - 20*b(m.ImplicitHeader)
	den := 4 * (sf - 2*b(m.LowDataRate()))
	blocks := 0
	if num > 0 {
		blocks = (num + den - 1) / den // ⌈num/den⌉ for num > 0
	}
	// 8 + max(⌈num/den⌉, 0)·(CR + 4); (CR + 4) is the code rate's n, 5 to 8.
	return 8 + blocks*m.CodingRate
}

// toaMS returns the time on air in milliseconds:
//
//	T_sym      = 2^SF / BW
//	T_preamble = (n_preamble + 4.25)·T_sym
//	ToA        = T_preamble + n_payload·T_sym
//
// computed as (4·n_preamble + 17 + 4·n_payload)·2^SF / (4·BW): an exact
// integer over an exact product, so one rounding in all.
//
// Reference: AN1200.13, LoRa Modem Designer's Guide, rev. 1 (2013).
func (m LoRaModulation) toaMS(pl int) float64 {
	// ToA = (n_preamble + 4.25 + n_payload)·T_sym, in quarter symbols.
	quarterSymbols := 4*m.PreambleSymbols + 17 + 4*m.payloadSymbols(pl)
	// T_sym = 2^SF / BW (ms with BW in kHz).
	return float64(quarterSymbols) * float64(int(1)<<m.SpreadingFactor) / (4 * m.BandwidthKHz)
}

// TimeOnAir returns the time on air of a LoRa packet of payloadBytes PHY
// payload bytes (PL, 0 to 255; for a LoRaWAN uplink the application payload
// plus 13 bytes of MAC overhead), to the nanosecond, by the AN1200.13 formula
// (see PayloadSymbols).
//
// Reference: AN1200.13, LoRa Modem Designer's Guide, rev. 1 (2013).
func TimeOnAir(m LoRaModulation, payloadBytes int) (time.Duration, error) {
	var c checker
	m.check(&c)
	c.integer("lora.phy_payload_bytes", payloadBytes, 0, maxPHYPayloadBytes)
	if err := c.err(); err != nil {
		return 0, err
	}
	return time.Duration(math.Round(m.toaMS(payloadBytes) * 1e6)), nil
}

// LoRaWANOverheadBytes is a LoRaWAN uplink's MAC overhead: MHDR 1 + DevAddr 4
// + FCtrl 1 + FCnt 2 + FPort 1 + MIC 4 (REFERENCE-VALUES §8.1).
const LoRaWANOverheadBytes = 1 + 4 + 1 + 2 + 1 + 4

// LoRaParams is a LoRa-class uplink: the packet on air, the class-A receive
// windows that follow it, and the microcontroller's wake overhead.
type LoRaParams struct {
	Modulation LoRaModulation
	// PayloadBytes is the application payload; MACOverheadBytes is added to
	// it to make the PHY payload (LoRaWANOverheadBytes, or 0 for raw LoRa).
	PayloadBytes     int
	MACOverheadBytes int
	SupplyV          float64 // supply voltage, V
	TXCurrentMA      float64 // supply current while transmitting, mA
	RXCurrentMA      float64 // supply current while a receive window is open, mA
	// RXWindows is how many class-A receive windows open after the uplink
	// (0 to 2); with no downlink both open and time out.
	RXWindows int
	// RXWindowSymbols is how long a window stays open when nothing arrives,
	// in symbols of its data rate (0 to 1023). RX1 uses the uplink's
	// spreading factor, RX2 RX2SpreadingFactor, both at the uplink's bandwidth.
	RXWindowSymbols    int
	RX2SpreadingFactor int   // 7 to 12
	Wake               Burst // microcontroller wake per message: start-up, stack, radio set-up
}

// DefaultLoRa returns a LoRaWAN class-A uplink of a 20-byte report at SF9.
//
//   - SF9, 125 kHz, 4/5, 8-symbol preamble, explicit header, CRC on, LDRO
//     auto: a LoRaWAN uplink's settings (REFERENCE-VALUES §8.1's table). SF9
//     is a middle data rate, our pick: a node near its gateway runs SF7, a
//     far one SF12; set what the coverage gives.
//   - 20 bytes of application payload (§8.1's example) + 13 bytes of MAC.
//   - 3.3 V (common practice).
//   - TX 43.5 mA: +14 dBm, the usual sub-GHz ERP limit in Europe (from
//     memory), sits between the datasheet figures quoted in §8.1, +13 dBm on
//     the RFO pin 29 mA and +17 dBm on PA_BOOST 87 mA; linear in dBm between
//     them gives 29 + (87 − 29)/4 = 43.5 mA (our interpolation; §8.1's
//     44 mA column). 29 mA would understate a module that only wires the
//     PA_BOOST pin (common on modules), 87 mA overstate +14 dBm.
//   - RX 11 mA (REFERENCE-VALUES §8.1: 10.8–11.5 mA).
//   - Both receive windows open 8 symbols: 8.2 ms at SF7 and 262 ms at SF12,
//     inside §8.1's common-practice 5–10 ms and 0.15–0.3 s; RX2 at SF12, the
//     EU868 default RX2 data rate (from memory).
//   - Wake 10 ms at 5 mA: a small microcontroller starting, running the
//     LoRaWAN stack (frame and MIC) and setting up the radio (common practice).
func DefaultLoRa() LoRaParams {
	return LoRaParams{
		Modulation: LoRaModulation{
			SpreadingFactor: 9, BandwidthKHz: 125, CodingRate: 5, PreambleSymbols: 8,
			CRC: true, LowDataRateOptimize: LDROAuto,
		},
		PayloadBytes:       20,
		MACOverheadBytes:   LoRaWANOverheadBytes,
		SupplyV:            3.3,
		TXCurrentMA:        loraTXMA14dBm,
		RXCurrentMA:        11,
		RXWindows:          2,
		RXWindowSymbols:    8,
		RX2SpreadingFactor: 12,
		Wake:               Burst{DurationS: 0.010, CurrentMA: 5},
	}
}

// loraTXMA14dBm: +14 dBm interpolated linearly in dBm between a common LoRa
// transceiver's datasheet supply currents at +13 dBm (29 mA) and +17 dBm
// (87 mA), as quoted in REFERENCE-VALUES §8.1 [SRC2]; see DefaultLoRa.
const loraTXMA14dBm = 29 + (87-29)*(14-13)/(17-13.0)

// Validate checks the parameters; the paths are "lora.<parameter>".
func (p LoRaParams) Validate() error {
	_, err := p.Evaluate()
	return err
}

func (p LoRaParams) check(c *checker) {
	p.Modulation.check(c)
	c.integer("lora.mac_overhead_bytes", p.MACOverheadBytes, 0, maxPHYPayloadBytes)
	if p.MACOverheadBytes >= 0 && p.MACOverheadBytes <= maxPHYPayloadBytes {
		if hi := maxPHYPayloadBytes - p.MACOverheadBytes; p.PayloadBytes < 0 || p.PayloadBytes > hi {
			c.add("lora.payload_bytes", strconv.Itoa(p.PayloadBytes), "is out of range",
				"0 to "+strconv.Itoa(hi)+" with "+strconv.Itoa(p.MACOverheadBytes)+" bytes of MAC overhead")
		}
	}
	c.float("lora.supply_v", p.SupplyV, minSupplyV, maxSupplyV, "V")
	c.positive("lora.tx_current_ma", p.TXCurrentMA, maxCurrentMA, "mA")
	c.float("lora.rx_current_ma", p.RXCurrentMA, 0, maxCurrentMA, "mA")
	c.integer("lora.rx_windows", p.RXWindows, 0, 2)
	// 1023: the common transceivers' 10-bit symbol time-out (from memory).
	c.integer("lora.rx_window_symbols", p.RXWindowSymbols, 0, 1023)
	c.integer("lora.rx2_spreading_factor", p.RX2SpreadingFactor, 7, 12)
	c.burst("lora.wake", p.Wake)
}

// TimeOnAir returns the uplink's time on air (PHY payload = application
// payload + MAC overhead).
func (p LoRaParams) TimeOnAir() (time.Duration, error) {
	if err := p.Validate(); err != nil {
		return 0, err
	}
	return TimeOnAir(p.Modulation, p.PayloadBytes+p.MACOverheadBytes)
}

// Evaluate returns the uplink as phases: "wake" (the microcontroller's
// overhead), "tx" (time on air at TXCurrentMA) and "rx1", "rx2" (each window
// open RXWindowSymbols symbols at RXCurrentMA). The energy is
//
//	E = V·(I_tx·ToA + I_rx·Σ t_rx + I_wake·t_wake)
//
// (REFERENCE-VALUES §8.1: TX energy V·I_TX·ToA; receive windows and wake,
// common practice). The peak is the highest phase current, normally TX.
func (p LoRaParams) Evaluate() (Message, error) {
	var c checker
	p.check(&c)
	if err := c.err(); err != nil {
		return Message{}, err
	}
	mod := p.Modulation
	phases := []Phase{
		{"wake", p.Wake},
		{"tx", Burst{DurationS: mod.toaMS(p.PayloadBytes+p.MACOverheadBytes) / 1000, CurrentMA: p.TXCurrentMA}},
	}
	windowS := func(sf int) float64 {
		w := mod
		w.SpreadingFactor = sf
		return float64(p.RXWindowSymbols) * w.symbolMS() / 1000
	}
	if p.RXWindows >= 1 {
		// RX1 at the uplink's data rate (RX1DROffset 0, the default; from memory).
		phases = append(phases, Phase{"rx1", Burst{windowS(mod.SpreadingFactor), p.RXCurrentMA}})
	}
	if p.RXWindows >= 2 {
		phases = append(phases, Phase{"rx2", Burst{windowS(p.RX2SpreadingFactor), p.RXCurrentMA}})
	}
	return Message{Class: LoRa, SupplyV: p.SupplyV, Phases: phases, PeakMA: peakOf(phases, 0)}, nil
}
