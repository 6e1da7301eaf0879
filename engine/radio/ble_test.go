package radio

import (
	"testing"
	"time"

	"github.com/stretchr/testify/assert"
	"github.com/stretchr/testify/require"
)

func TestBLEAirtime(t *testing.T) {
	cases := []struct {
		n    int
		want time.Duration
	}{
		// REFERENCE-VALUES §8.2 [SRC]: 144 µs for the connectable packet with a
		// 6-byte AdvA and no AdvData, on the 1 Mbps PHY.
		{0, 144 * time.Microsecond},
		// §8.2 [SRC]: "for every additional transmitted bit, 1 µs should be added".
		{1, 152 * time.Microsecond},
		// §8.2 [CALC]: 31 B of AdvData ⇒ 144 + 248 = 392 µs per channel.
		{31, 392 * time.Microsecond},
	}
	for _, c := range cases {
		got, err := BLEAirtime(c.n)
		require.NoError(t, err)
		assert.Equalf(t, c.want, got, "BLEAirtime(%d)", c.n)
	}
	for _, n := range []int{-1, 32} {
		_, err := BLEAirtime(n)
		assert.ErrorIs(t, err, ErrRange, n)
	}
	_, err := BLEAirtime(32)
	assert.EqualError(t, err, "ble.adv_data_bytes: 32 is out of range (allowed: 0 to 31)")
}

func TestBLEEventEnergy(t *testing.T) {
	p := DefaultBLE()
	m, err := p.Evaluate()
	require.NoError(t, err)
	// §8.2 [CALC]: 392 µs per channel × 3 channels per event.
	for _, ph := range m.Phases {
		if ph.Name == "tx" {
			assert.InDelta(t, 3*392e-6, ph.DurationS, 1e-15)
		}
	}
	// By hand from DefaultBLE's documented values: 3.0 V × (6 mA × 3 × 392 µs
	// + 3 mA × 1 ms) = 30.168 µJ.
	assert.InEpsilon(t, 3.0*(6e-3*3*392e-6+3e-3*1e-3), m.EnergyJ(), 1e-12)
	// §8.2 (common practice): a legacy event is ≈ 15–60 µJ; its worked estimate
	// is ≈ 10 µC (≈ 30 µJ at 3 V). Every legacy AdvData length lands in range.
	assert.InDelta(t, 10e-6, m.EnergyJ()/m.SupplyV, 1e-6, "charge per event, C")
	for n := 0; n <= 31; n++ {
		p.AdvDataBytes = n
		e, err := EnergyPerMessageJ(Params{Class: BLE, BLE: p})
		require.NoError(t, err)
		assert.GreaterOrEqualf(t, e, 15e-6, "%d B", n)
		assert.LessOrEqualf(t, e, 60e-6, "%d B", n)
	}
	assert.Equal(t, 6.0, m.PeakMA)
}

func TestBLEProperties(t *testing.T) {
	for _, listen := range []Burst{{}, {DurationS: 150e-6, CurrentMA: 5.5}} {
		p := DefaultBLE()
		p.Listen = listen
		// More channels, more energy (strictly).
		prev := 0.0
		for ch := 1; ch <= 3; ch++ {
			p.Channels = ch
			m, err := p.Evaluate()
			require.NoError(t, err)
			assert.Greaterf(t, m.EnergyJ(), prev, "%d channels", ch)
			prev = m.EnergyJ()
		}
		// More AdvData never less energy.
		prev = 0
		for n := 0; n <= 31; n++ {
			p.AdvDataBytes = n
			m, err := p.Evaluate()
			require.NoError(t, err)
			assert.GreaterOrEqualf(t, m.EnergyJ(), prev, "%d B", n)
			prev = m.EnergyJ()
		}
	}
	// Listening for requests costs more than a beacon.
	p := DefaultBLE()
	beacon, _ := p.Evaluate()
	p.Listen = Burst{DurationS: 150e-6, CurrentMA: 5.5} // turnaround + listen, from memory
	conn, _ := p.Evaluate()
	assert.Greater(t, conn.EnergyJ(), beacon.EnergyJ())
}

func TestBLEErrors(t *testing.T) {
	cases := []struct {
		f    func(*BLEParams)
		want string
	}{
		{func(p *BLEParams) { p.Channels = 4 }, "ble.channels: 4 is out of range (allowed: 1 to 3)"},
		{func(p *BLEParams) { p.Channels = 0 }, "ble.channels: 0 is out of range (allowed: 1 to 3)"},
		{func(p *BLEParams) { p.AdvDataBytes = 40 }, "ble.adv_data_bytes: 40 is out of range (allowed: 0 to 31)"},
		{func(p *BLEParams) { p.TXCurrentMA = -6 }, "ble.tx_current_ma: -6 is out of range (allowed: more than 0, up to 2000 mA)"},
		{func(p *BLEParams) { p.Listen.CurrentMA = 2500 }, "ble.listen.current_ma: 2500 is out of range (allowed: 0 to 2000 mA)"},
	}
	for _, c := range cases {
		p := DefaultBLE()
		c.f(&p)
		assert.EqualError(t, p.Validate(), c.want)
	}
}
