package sky_test

import (
	"os"
	"testing"
	"time"

	"github.com/stretchr/testify/require"

	"nodelife/engine/weather"
)

// The Golden, Colorado files live once, in engine/weather/testdata (see its
// SOURCE.md), and are read with the engine's TMY3 reader. Each row is stamped
// at the END of its interval in local standard time (no daylight saving);
// missing values (−9900) read as NaN.

type tmySite struct {
	latDeg, lonDeg float64
	loc            *time.Location // fixed zone at the file's UTC offset
}

type tmyRow struct {
	line                   int       // line in the file
	end                    time.Time // end of the interval, in site.loc
	etrWh, etrnWh          float64
	ghiWm2, dniWm2, dhiWm2 float64
	albedo                 float64
}

func readTMY3(t *testing.T, path string) (tmySite, []tmyRow) {
	t.Helper()
	f, err := os.Open(path)
	require.NoError(t, err)
	defer f.Close()
	s, err := weather.ReadTMY3(path, f)
	require.NoError(t, err)
	site := tmySite{latDeg: s.Site.LatDeg, lonDeg: s.Site.LonDeg, loc: s.Records[0].End.Location()}
	rows := make([]tmyRow, len(s.Records))
	for i, r := range s.Records {
		rows[i] = tmyRow{line: i + 3, end: r.End, etrWh: r.ETRWm2, etrnWh: r.ETRNWm2,
			ghiWm2: r.GHIWm2, dniWm2: r.DNIWm2, dhiWm2: r.DHIWm2, albedo: r.Albedo}
	}
	return site, rows
}
