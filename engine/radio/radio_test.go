package radio

import (
	"errors"
	"testing"

	"github.com/stretchr/testify/assert"
	"github.com/stretchr/testify/require"
)

func TestClasses(t *testing.T) {
	// The identifiers are the lower-case names.
	assert.Equal(t, []Class{"ble", "lora", "wifi", "lpwa"}, Classes())
	for _, c := range Classes() {
		assert.True(t, c.Valid(), c)
		p := Defaults(c)
		m, err := Evaluate(p)
		require.NoError(t, err, c)
		assert.Equal(t, c, m.Class)
		e, err := EnergyPerMessageJ(p)
		require.NoError(t, err)
		assert.Equal(t, m.EnergyJ(), e)
		assert.Greater(t, e, 0.0)
		peak, err := PeakCurrentMA(p)
		require.NoError(t, err)
		assert.Equal(t, m.PeakMA, peak)
		assert.NoError(t, p.Validate())
	}
	for _, c := range []Class{"", "BLE", "zigbee"} {
		assert.False(t, c.Valid(), c)
	}
}

func TestUnknownClass(t *testing.T) {
	_, err := EnergyPerMessageJ(Params{Class: "zigbee"})
	require.Error(t, err)
	assert.Equal(t, `class: "zigbee" is not a radio class (allowed: "ble", "lora", "wifi", "lpwa")`, err.Error())
	assert.ErrorIs(t, err, ErrRange)
	_, err = PeakCurrentMA(Params{})
	var fe *FieldError
	require.True(t, errors.As(err, &fe))
	assert.Equal(t, "class", fe.Path)
}

func TestOnlySelectedClassChecked(t *testing.T) {
	// The other classes' zero parameters do not matter.
	e, err := EnergyPerMessageJ(Params{Class: BLE, BLE: DefaultBLE()})
	require.NoError(t, err)
	assert.Greater(t, e, 0.0)
	_, err = EnergyPerMessageJ(Params{Class: LoRa, BLE: DefaultBLE()})
	assert.ErrorIs(t, err, ErrRange)
}

func TestPeakSkipsEmptyPhases(t *testing.T) {
	p := DefaultLoRa()
	p.Wake = Burst{DurationS: 0, CurrentMA: 500} // a current that never flows
	m, err := p.Evaluate()
	require.NoError(t, err)
	assert.Equal(t, p.TXCurrentMA, m.PeakMA)
	// A receive current above the transmit current is the peak.
	p = DefaultLoRa()
	p.TXCurrentMA, p.RXCurrentMA = 10, 11
	m, err = p.Evaluate()
	require.NoError(t, err)
	assert.Equal(t, 11.0, m.PeakMA)
}

func TestClassOrderOfEnergy(t *testing.T) {
	// REFERENCE-VALUES §8: a BLE event (µJ) < a LoRa uplink (mJ) < an LPWA or
	// Wi-Fi report (tenths of J to J).
	e := map[Class]float64{}
	for _, c := range Classes() {
		e[c], _ = EnergyPerMessageJ(Defaults(c))
	}
	assert.Less(t, e[BLE], e[LoRa])
	assert.Less(t, e[LoRa], e[LPWA])
	assert.Less(t, e[LoRa], e[WiFi])
}
