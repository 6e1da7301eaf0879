package radio

import "testing"

// BenchmarkTimeOnAir times one AN1200.13 time on air, SF12 (LDRO on).
func BenchmarkTimeOnAir(b *testing.B) {
	m := lorawan125(12)
	for b.Loop() {
		if _, err := TimeOnAir(m, 33); err != nil {
			b.Fatal(err)
		}
	}
}

// BenchmarkTimeOnAirAllSF times the six spreading factors at one payload.
func BenchmarkTimeOnAirAllSF(b *testing.B) {
	ms := [6]LoRaModulation{}
	for i := range ms {
		ms[i] = lorawan125(7 + i)
	}
	for b.Loop() {
		for _, m := range ms {
			if _, err := TimeOnAir(m, 33); err != nil {
				b.Fatal(err)
			}
		}
	}
}

// BenchmarkEnergyPerMessageJ times the default LoRa uplink's energy,
// validation included.
func BenchmarkEnergyPerMessageJ(b *testing.B) {
	p := Defaults(LoRa)
	for b.Loop() {
		if _, err := EnergyPerMessageJ(p); err != nil {
			b.Fatal(err)
		}
	}
}
