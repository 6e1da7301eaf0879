// Package radio models the energy of one radio message for the four radio
// classes a sensor node uses: BLE advertising ("ble"), a LoRa-class long-range
// uplink ("lora"), a Wi-Fi connect-and-post ("wifi") and a cellular LPWA
// (LTE-M or NB-IoT) report from power-saving mode ("lpwa").
//
// Each message is a short list of phases, each a duration at a mean supply
// current; the energy is the supply voltage times the charge summed over the
// phases, and the peak current is the highest current drawn during the
// message (for the cell's pulse check; a host processor running at the same
// time is the load model's to add). LoRa time on air follows the AN1200.13
// modem formula for spreading factors 7 to 12 (SF5 and SF6 use a different
// formula and are rejected); BLE airtime follows the Bluetooth Core
// Specification bit timing of the LE 1M PHY for legacy advertising (0 to 31
// bytes of AdvData); Wi-Fi and LPWA are phase models whose defaults are common
// practice. Messages cost energy only while awake: the sleep between the
// phases (for example between a LoRa uplink and its receive windows) belongs
// to the node's sleep floor. Every parameter has a valid range; a value
// outside it is reported as a *FieldError naming the parameter, the value and
// the range, never clamped.
package radio
