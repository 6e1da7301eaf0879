package radio_test

import (
	"fmt"

	"nodelife/engine/radio"
)

// A LoRaWAN uplink of 20 bytes (33 on air with the MAC overhead) at each
// spreading factor; REFERENCE-VALUES §8.1's table, PL = 33 column.
func ExampleTimeOnAir() {
	m := radio.LoRaModulation{BandwidthKHz: 125, CodingRate: 5, PreambleSymbols: 8, CRC: true}
	for sf := 7; sf <= 12; sf++ {
		m.SpreadingFactor = sf
		toa, err := radio.TimeOnAir(m, 20+radio.LoRaWANOverheadBytes)
		if err != nil {
			fmt.Println(err)
			return
		}
		fmt.Printf("SF%-2d %9.3f ms  LDRO %v\n", sf, float64(toa.Nanoseconds())/1e6, m.LowDataRate())
	}
	// Output:
	// SF7     71.936 ms  LDRO false
	// SF8    133.632 ms  LDRO false
	// SF9    246.784 ms  LDRO false
	// SF10   452.608 ms  LDRO false
	// SF11   987.136 ms  LDRO true
	// SF12  1810.432 ms  LDRO true
}

// Each class's default message: energy and peak current.
func ExampleEnergyPerMessageJ() {
	for _, c := range radio.Classes() {
		p := radio.Defaults(c)
		e, err := radio.EnergyPerMessageJ(p)
		if err != nil {
			fmt.Println(err)
			return
		}
		peak, _ := radio.PeakCurrentMA(p)
		fmt.Printf("%-4s %8.3f mJ  peak %5.1f mA\n", c, e*1e3, peak)
	}
	// Output:
	// ble     0.030 mJ  peak   6.0 mA
	// lora   46.296 mJ  peak  43.5 mA
	// wifi  815.100 mJ  peak 300.0 mA
	// lpwa  448.200 mJ  peak 400.0 mA
}
