package radio

import "time"

// The legacy advertising packet on the LE 1M PHY: preamble 1 + access address
// 4 + PDU header 2 + AdvA 6 + CRC 3 bytes, before the AdvData (Bluetooth Core
// Specification, Vol 6 Part B §2.1 and §2.3; section numbers from memory).
const bleFixedBytes = 1 + 4 + 2 + 6 + 3

// bleRampUS is the radio's time on the channel besides the packet's bits: the
// measured base of 144 µs for a packet with a 6-byte AdvA and no AdvData
// (a radio maker's application note on measuring BLE power, quoted in
// REFERENCE-VALUES §8.2, "including pilot tone") less its 16 bytes of bits at
// 1 µs each: 16 µs.
const bleRampUS = 144 - 8*bleFixedBytes

// maxLegacyAdvData is the AdvData limit of a legacy advertising PDU (Bluetooth
// Core Specification; REFERENCE-VALUES §8.2).
const maxLegacyAdvData = 31

// BLEAirtime returns the time one legacy advertising packet with advDataBytes
// of AdvData (0 to 31) occupies one channel on the LE 1M PHY:
//
//	t = 16 µs + 8·(16 + N) µs
//
// one bit per microsecond at 1 Mb/s over the packet's 16 fixed bytes and N
// bytes of AdvData, plus the 16 µs the radio spends on the channel besides the
// bits (the pilot tone of the application note's measurement). It is 144 µs
// with no AdvData and 392 µs with 31 bytes (REFERENCE-VALUES §8.2).
//
// Reference: Bluetooth SIG, Bluetooth Core Specification (v4.0 onward), Vol 6
// (Low Energy Controller) Part B (Link Layer) §2.1, packet format; the base
// time from a radio maker's application note as quoted in REFERENCE-VALUES §8.2.
func BLEAirtime(advDataBytes int) (time.Duration, error) {
	var c checker
	c.integer("ble.adv_data_bytes", advDataBytes, 0, maxLegacyAdvData)
	if err := c.err(); err != nil {
		return 0, err
	}
	return bleAirtime(advDataBytes), nil
}

func bleAirtime(n int) time.Duration {
	return time.Duration(bleRampUS+8*(bleFixedBytes+n)) * time.Microsecond
}

// BLEParams is one legacy advertising event: the same packet sent on each
// advertising channel after one wake-up.
type BLEParams struct {
	AdvDataBytes int     // AdvData per packet, 0 to 31 bytes
	Channels     int     // advertising channels used per event, 1 to 3
	SupplyV      float64 // supply voltage, V
	TXCurrentMA  float64 // supply current while transmitting, mA
	// Wake is the per-event overhead: wake-up, radio set-up and crystal guard
	// time, channel hops.
	Wake Burst
	// Listen is the time and current after each packet spent turning round
	// and listening for a scan or connection request (connectable or scannable
	// advertising); zero for a non-connectable beacon.
	Listen Burst
}

// DefaultBLE returns a non-connectable legacy advertising event with a full
// 31-byte AdvData on all three channels.
//
//   - 31 bytes, 3 channels: the legacy maximum and the usual channel set
//     (REFERENCE-VALUES §8.2).
//   - 3.0 V, TX 6 mA: 0 dBm on a modern SoC with a DC/DC converter at ~3 V,
//     the top of §8.2's 5–6 mA (common practice).
//   - Wake 1 ms at 3 mA: §8.2's "~1 ms wake-up"; its ≈ 10 µC event estimate
//     less 3 × 0.4 ms × 5.5 mA ≈ 6.6 µC of transmission leaves ≈ 3 µC for
//     wake-up and turnarounds (common practice).
//   - No listening (a beacon).
//
// The event costs ≈ 30 µJ, inside §8.2's common-practice 15–60 µJ.
func DefaultBLE() BLEParams {
	return BLEParams{
		AdvDataBytes: maxLegacyAdvData,
		Channels:     3,
		SupplyV:      3.0,
		TXCurrentMA:  6,
		Wake:         Burst{DurationS: 0.001, CurrentMA: 3},
	}
}

// Validate checks the parameters; the paths are "ble.<parameter>".
func (p BLEParams) Validate() error {
	_, err := p.Evaluate()
	return err
}

func (p BLEParams) check(c *checker) {
	c.integer("ble.adv_data_bytes", p.AdvDataBytes, 0, maxLegacyAdvData)
	// Three primary advertising channels, 37, 38 and 39 (Bluetooth Core
	// Specification; REFERENCE-VALUES §8.2).
	c.integer("ble.channels", p.Channels, 1, 3)
	c.float("ble.supply_v", p.SupplyV, minSupplyV, maxSupplyV, "V")
	c.positive("ble.tx_current_ma", p.TXCurrentMA, maxCurrentMA, "mA")
	c.burst("ble.wake", p.Wake)
	c.burst("ble.listen", p.Listen)
}

// Evaluate returns the event as phases: "wake", "tx" (Channels × BLEAirtime
// at TXCurrentMA) and "listen" (Channels × Listen):
//
//	E = V·(I_wake·t_wake + n_ch·(I_tx·t_air + I_listen·t_listen))
//
// The peak is the highest phase current, normally TX.
func (p BLEParams) Evaluate() (Message, error) {
	var c checker
	p.check(&c)
	if err := c.err(); err != nil {
		return Message{}, err
	}
	n := float64(p.Channels)
	airS := bleAirtime(p.AdvDataBytes).Seconds()
	phases := []Phase{
		{"wake", p.Wake},
		{"tx", Burst{DurationS: n * airS, CurrentMA: p.TXCurrentMA}},
		{"listen", Burst{DurationS: n * p.Listen.DurationS, CurrentMA: p.Listen.CurrentMA}},
	}
	return Message{Class: BLE, SupplyV: p.SupplyV, Phases: phases, PeakMA: peakOf(phases, 0)}, nil
}
