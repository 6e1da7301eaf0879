package radio

import (
	"testing"

	"github.com/stretchr/testify/assert"
	"github.com/stretchr/testify/require"
)

// inRange asserts lo ≤ got ≤ hi: the Wi-Fi and LPWA figures of
// REFERENCE-VALUES §8.3 and §8.4 are ranges, never points.
func inRange(t *testing.T, got, lo, hi float64, what string) {
	t.Helper()
	assert.Truef(t, got >= lo && got <= hi, "%s = %g, want %g to %g", what, got, lo, hi)
}

func TestWiFiInCommonRanges(t *testing.T) {
	m, err := DefaultWiFi().Evaluate()
	require.NoError(t, err)
	// §8.3 (common practice): 0.2–2 J per report; awake 1–5 s at ~80–150 mA
	// average, 3.3 V.
	inRange(t, m.EnergyJ(), 0.2, 2, "Wi-Fi report energy, J")
	inRange(t, m.AwakeS(), 1, 5, "Wi-Fi awake time, s")
	inRange(t, m.EnergyJ()/m.SupplyV/m.AwakeS()*1e3, 80, 150, "Wi-Fi mean current, mA")
	assert.Equal(t, 3.3, m.SupplyV)
	// By hand from DefaultWiFi's documented phases: 3.3 V × (0.2·40 + 1.0·110
	// + 0.4·90 + 0.6·100 + 0.3·110) mA·s.
	assert.InEpsilon(t, 3.3*(0.2*40+1.0*110+0.4*90+0.6*100+0.3*110)*1e-3, m.EnergyJ(), 1e-12)
	assert.Equal(t, 300.0, m.PeakMA)

	// §8.3 (common practice): static IP, cached BSSID/channel and UDP: ~30–100 mJ.
	q, err := WiFiQuickReport().Evaluate()
	require.NoError(t, err)
	inRange(t, q.EnergyJ(), 0.030, 0.100, "quick Wi-Fi report energy, J")

	// The peak is the highest phase mean when it exceeds the burst figure.
	p := DefaultWiFi()
	p.TXPeakMA = 0
	m, err = p.Evaluate()
	require.NoError(t, err)
	assert.Equal(t, 110.0, m.PeakMA)
}

func TestLPWAInCommonRanges(t *testing.T) {
	m, err := DefaultLPWA().Evaluate()
	require.NoError(t, err)
	// §8.4 (common practice / from memory): ≈ 0.1–1 J in good coverage.
	inRange(t, m.EnergyJ(), 0.1, 1, "LPWA report energy, J")
	assert.InEpsilon(t, 3.6*(0.5*15+0.3*70+0.3*120+10*6)*1e-3, m.EnergyJ(), 1e-12)
	assert.Equal(t, 400.0, m.PeakMA)

	// §8.4: a long RRC-inactivity tail (its example: 10–20 s at 5–60 mA) raises
	// the report to "several J"; at the example's upper end, 20 s at 60 mA, we
	// read "several" as 2 to 10 J.
	p := DefaultLPWA()
	p.Tail = Burst{DurationS: 20, CurrentMA: 60}
	long, err := p.Evaluate()
	require.NoError(t, err)
	inRange(t, long.EnergyJ(), 2, 10, "LPWA report with a long tail, J")
	// An early release (no tail) is cheaper than the default.
	p.Tail = Burst{}
	short, err := p.Evaluate()
	require.NoError(t, err)
	assert.Less(t, short.EnergyJ(), m.EnergyJ())
	inRange(t, short.EnergyJ(), 0.1, 1, "LPWA report with early release, J")
}

func TestPhasedErrors(t *testing.T) {
	w := DefaultWiFi()
	w.Connect.DurationS = -1
	w.TXPeakMA = 2001
	assert.EqualError(t, w.Validate(), "wifi.connect.duration_s: -1 is out of range (allowed: 0 to 600 s)\n"+
		"wifi.tx_peak_ma: 2001 is out of range (allowed: 0 to 2000 mA)")
	l := DefaultLPWA()
	l.Tail.DurationS = 601
	assert.EqualError(t, l.Validate(), "lpwa.tail.duration_s: 601 is out of range (allowed: 0 to 600 s)")
	l = DefaultLPWA()
	l.SupplyV = 0.5
	assert.EqualError(t, l.Validate(), "lpwa.supply_v: 0.5 is out of range (allowed: 1 to 12 V)")
}
