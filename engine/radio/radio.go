package radio

import (
	"fmt"
	"strconv"
)

// Class is a kind of radio, by its lower-case identifier.
type Class string

// The radio classes.
const (
	BLE  Class = "ble"  // BLE legacy advertising event
	LoRa Class = "lora" // LoRa-class long-range uplink (LoRaWAN class A by default)
	WiFi Class = "wifi" // Wi-Fi connect from deep sleep and post a report
	LPWA Class = "lpwa" // LTE-M or NB-IoT report from power-saving mode
)

// Classes returns the classes in display order.
func Classes() []Class { return []Class{BLE, LoRa, WiFi, LPWA} }

// Valid reports whether c is one of the classes.
func (c Class) Valid() bool {
	switch c {
	case BLE, LoRa, WiFi, LPWA:
		return true
	}
	return false
}

// Limits shared by the classes. They are our own bounds on what a message of
// these classes can be, wide enough for every real part, tight enough to catch
// a unit slip (A for mA, ms for s).
const (
	// maxCurrentMA bounds every current: above the ~500 mA transmit bursts of
	// LPWA modules (from memory) with a margin (our limit).
	maxCurrentMA = 2000
	// maxPhaseS bounds one phase: ten minutes is no longer a message (our limit).
	maxPhaseS = 600
	// minSupplyV, maxSupplyV bound the supply rail (our limit: one coin or
	// primary cell up to a 12 V system).
	minSupplyV = 1
	maxSupplyV = 12
)

// Burst is a phase's length and mean supply current.
type Burst struct {
	DurationS float64 // seconds, 0 to 600
	CurrentMA float64 // mean supply current during the phase, 0 to 2000 mA
}

// chargeMAs is the burst's charge in mA·s (mC).
func (b Burst) chargeMAs() float64 { return b.DurationS * b.CurrentMA }

// Phase is one named part of a message.
type Phase struct {
	Name string // e.g. "tx", "rx1", "connect"
	Burst
}

// Message is one radio message as the supply sees it.
type Message struct {
	Class   Class
	SupplyV float64
	// Phases in time order. The sleep between phases is not part of the
	// message (it is the node's sleep floor).
	Phases []Phase
	// PeakMA is the highest current drawn during the message: the highest
	// phase current, or a higher transmit-burst figure where phase currents
	// are averages (Wi-Fi, LPWA).
	PeakMA float64
}

// EnergyJ returns the message's energy in joules: V·Σ I_k·t_k.
func (m Message) EnergyJ() float64 {
	var q float64 // mA·s
	for _, p := range m.Phases {
		q += p.chargeMAs()
	}
	return m.SupplyV * q * 1e-3
}

// AwakeS returns the summed length of the phases in seconds.
func (m Message) AwakeS() float64 {
	var s float64
	for _, p := range m.Phases {
		s += p.DurationS
	}
	return s
}

// Params selects a class and holds every class's parameters; only the
// selected class's are used and checked, so a user can switch class without
// losing the others.
type Params struct {
	Class Class
	BLE   BLEParams
	LoRa  LoRaParams
	WiFi  WiFiParams
	LPWA  LPWAParams
}

// Defaults returns the parameters with class c selected and every class at
// its defaults (DefaultBLE, DefaultLoRa, DefaultWiFi, DefaultLPWA).
func Defaults(c Class) Params {
	return Params{Class: c, BLE: DefaultBLE(), LoRa: DefaultLoRa(), WiFi: DefaultWiFi(), LPWA: DefaultLPWA()}
}

// Validate checks the selected class and its parameters. It returns nil or
// every problem found (errors.Join of *FieldError).
func (p Params) Validate() error {
	_, err := Evaluate(p)
	return err
}

// Evaluate returns the message of the selected class.
func Evaluate(p Params) (Message, error) {
	switch p.Class {
	case BLE:
		return p.BLE.Evaluate()
	case LoRa:
		return p.LoRa.Evaluate()
	case WiFi:
		return p.WiFi.Evaluate()
	case LPWA:
		return p.LPWA.Evaluate()
	}
	return Message{}, &FieldError{Path: "class", Value: strconv.Quote(string(p.Class)),
		Problem: "is not a radio class", Allowed: fmt.Sprintf("%q, %q, %q, %q", BLE, LoRa, WiFi, LPWA)}
}

// EnergyPerMessageJ returns the energy of one message of the selected class,
// in joules.
func EnergyPerMessageJ(p Params) (float64, error) {
	m, err := Evaluate(p)
	if err != nil {
		return 0, err
	}
	return m.EnergyJ(), nil
}

// PeakCurrentMA returns the highest supply current during one message of the
// selected class, in mA.
func PeakCurrentMA(p Params) (float64, error) {
	m, err := Evaluate(p)
	if err != nil {
		return 0, err
	}
	return m.PeakMA, nil
}

// peakOf returns the highest current of the phases that last, or floor if
// that is higher.
func peakOf(phases []Phase, floorMA float64) float64 {
	peak := floorMA
	for _, p := range phases {
		if p.DurationS > 0 {
			peak = max(peak, p.CurrentMA)
		}
	}
	return peak
}
