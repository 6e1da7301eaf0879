package weather

import (
	"bytes"
	"errors"
	"math"
	"os"
	"strconv"
	"strings"
	"testing"
	"time"

	"github.com/stretchr/testify/assert"
	"github.com/stretchr/testify/require"
)

func open(t *testing.T, name string) *os.File {
	t.Helper()
	f, err := os.Open("testdata/" + name)
	require.NoError(t, err)
	t.Cleanup(func() { f.Close() })
	return f
}

func TestReadTMY3Golden(t *testing.T) {
	s, err := ReadTMY3("golden.csv", open(t, "nsrdb-tmy3-724666-golden-co.csv"))
	require.NoError(t, err)
	// Metadata line of the file (testdata/SOURCE.md): 724666, UTC−7, 39.742, −105.179, 1829 m.
	assert.Equal(t, "724666", s.Site.ID)
	assert.Equal(t, -7.0, s.Site.TZOffsetH)
	assert.Equal(t, 39.742, s.Site.LatDeg)
	assert.Equal(t, -105.179, s.Site.LonDeg)
	assert.Equal(t, 1829.0, s.Site.ElevM)
	require.Len(t, s.Records, 8760)
	first := s.Records[0]
	// First data row: 1/1/1999,1:00 … Dry-bulb −3 °C, pressure 806 mbar, albedo 0.33.
	assert.Equal(t, "1999-01-01T01:00:00-07:00", first.End.Format(time.RFC3339))
	assert.Equal(t, time.Hour, first.Interval)
	assert.Equal(t, -3.0, first.TempC)
	assert.Equal(t, 806.0, first.PressMb)
	assert.Equal(t, 0.33, first.Albedo)
	assert.Equal(t, 0.0, first.GHIWm2)
	assert.True(t, math.IsNaN(first.SnowCm), "TMY3 has no snow depth")
	// Last row is stamped 24:00 (hour-ending): midnight of the next day.
	last := s.Records[8759]
	assert.Equal(t, "1997-01-01T00:00:00-07:00", last.End.Format(time.RFC3339))
	// Physical sanity over the year: noon hours in June are bright, nights dark.
	for _, r := range s.Records {
		assert.False(t, math.IsNaN(r.GHIWm2))
		if r.ETRWm2 == 0 {
			assert.Equal(t, 0.0, r.GHIWm2, "no global irradiance without extraterrestrial at %v", r.End)
		}
	}
}

func TestReadTMY3OneMinuteMeasurements(t *testing.T) {
	s, err := ReadTMY3("srrl.csv", open(t, "srrl-golden-co-2012-05-17-1min.csv"))
	require.NoError(t, err)
	require.Len(t, s.Records, 1440)
	assert.Equal(t, time.Minute, s.Records[0].Interval)
	// −9900 marks missing values (testdata/SOURCE.md): the first row's ETR.
	assert.True(t, math.IsNaN(s.Records[0].ETRWm2))
	assert.InDelta(t, 16.82, s.Records[0].TempC, 1e-12)
	// A clear May day at 39.7° N peaks near 1000 W/m² around solar noon
	// (common practice: clear-sky noon GHI at mid latitudes in May is 900–1100 W/m²).
	peak := 0.0
	for _, r := range s.Records {
		peak = max(peak, r.GHIWm2)
	}
	assert.Greater(t, peak, 850.0)
	assert.Less(t, peak, 1300.0)
}

func TestReadEPWChicago(t *testing.T) {
	s, err := ReadEPW("chicago.epw", open(t, "nsrdb-tmy3-725300-chicago-ohare.epw"))
	require.NoError(t, err)
	// LOCATION line: Chicago Ohare Intl Ap, 725300, 41.98, −87.92, −6.0, 201.0.
	assert.Equal(t, "725300", s.Site.ID)
	assert.Equal(t, 41.98, s.Site.LatDeg)
	assert.Equal(t, -87.92, s.Site.LonDeg)
	assert.Equal(t, -6.0, s.Site.TZOffsetH)
	assert.Equal(t, 201.0, s.Site.ElevM)
	require.Len(t, s.Records, 8760)
	// First data row: 1986,1,1,1,0,…,−12.2 °C, 99500 Pa; snow depth 0, albedo 0.
	r := s.Records[0]
	assert.Equal(t, "1986-01-01T01:00:00-06:00", r.End.Format(time.RFC3339))
	assert.Equal(t, -12.2, r.TempC)
	assert.Equal(t, 995.0, r.PressMb)
	assert.Equal(t, 0.0, r.SnowCm)
	// Monthly means: Chicago's January is below freezing and its July warm
	// (common practice: O'Hare normals are about −5 °C and +23 °C).
	means := s.MonthlyMeans(func(r Record) float64 { return r.TempC })
	assert.Less(t, means[0], 0.0)
	assert.Greater(t, means[6], 18.0)
}

func TestParseErrorsNameLineColumnAndValue(t *testing.T) {
	golden, err := os.ReadFile("testdata/nsrdb-tmy3-724666-golden-co.csv")
	require.NoError(t, err)
	lines := strings.Split(string(golden), "\n")
	// Row 3 of the file is the first data row; its 32nd column is Dry-bulb (C).
	bad := append([]string{}, lines...)
	cols := strings.Split(bad[2], ",")
	cols[31] = "warm"
	bad[2] = strings.Join(cols, ",")
	_, err = ReadTMY3("golden.csv", strings.NewReader(strings.Join(bad, "\n")))
	var pe *ParseError
	require.True(t, errors.As(err, &pe), "%v", err)
	assert.ErrorIs(t, err, ErrFormat)
	assert.Equal(t, 3, pe.Line)
	assert.Equal(t, len(strings.Join(cols[:31], ","))+2, pe.Column)
	assert.Equal(t, "Dry-bulb (C)", pe.Field)
	assert.Equal(t, `golden.csv: line 3, column `+strconv.Itoa(pe.Column)+` (Dry-bulb (C)): "warm" is not a number (allowed: -90 to 70 °C)`, err.Error())

	cases := []struct {
		name, text, want string
	}{
		{"out of range", strings.Replace(strings.Join(lines[:4], "\n"), "1/1/1999,1:00,0,0,0,", "1/1/1999,1:00,0,0,2000,", 1),
			`line 3, column 19 (GHI (W/m^2)): "2000" is out of range (allowed: 0 to 1500 W/m²)`},
		{"bad date", strings.Replace(strings.Join(lines[:4], "\n"), "1/1/1999,1:00", "13/1/1999,1:00", 1),
			`line 3, column 1 (Date (MM/DD/YYYY)): "13/1/1999" is not a date`},
		{"bad time", strings.Replace(strings.Join(lines[:4], "\n"), "1/1/1999,1:00", "1/1/1999,25:00", 1),
			`(Time (HH:MM)): "25:00" is not a time of day`},
		{"missing column", strings.Replace(strings.Join(lines[:4], "\n"), "Dry-bulb (C)", "Drybulb", 1),
			`line 2 (Dry-bulb (C)): column is missing from the header`},
		{"short row", strings.Join(lines[:2], "\n") + "\n1/1/1999,1:00,0,0\n" + lines[3],
			`line 3 (GHI (W/m^2)): is missing: the row has 4 columns`},
		{"empty", "", "ends early"},
		{"bad quote", `724666,"DENVER` + "\n", "line 1"},
	}
	for _, c := range cases {
		_, err := ReadTMY3("f.csv", strings.NewReader(c.text))
		require.Error(t, err, c.name)
		assert.Contains(t, err.Error(), c.want, c.name)
		assert.ErrorIs(t, err, ErrFormat, c.name)
	}

	epw, err := os.ReadFile("testdata/nsrdb-tmy3-725300-chicago-ohare.epw")
	require.NoError(t, err)
	elines := strings.Split(string(epw), "\n")
	badRow := strings.Replace(elines[8], ",-12.2,", ",-120.2,", 1)
	_, err = ReadEPW("c.epw", strings.NewReader(strings.Join(append(elines[:8:8], badRow, elines[9]), "\n")))
	require.Error(t, err)
	assert.Contains(t, err.Error(), `c.epw: line 9, column`)
	assert.Contains(t, err.Error(), `(dry bulb temperature): "-120.2" is out of range`)
	_, err = ReadEPW("c.epw", strings.NewReader("NOT,AN,EPW\n"))
	assert.ErrorContains(t, err, "is not the LOCATION line")
}

func TestReadByName(t *testing.T) {
	epw, err := os.ReadFile("testdata/nsrdb-tmy3-725300-chicago-ohare.epw")
	if err != nil {
		t.Fatal(err)
	}
	// The extension picks the reader, in any case: the EPW reader takes the
	// file, the TMY3 reader refuses it (its first line is no TMY3 metadata).
	for _, c := range []struct {
		name string
		ok   bool
	}{{"ohare.epw", true}, {"C:\\weather\\OHARE.EPW", true}, {"ohare.csv", false}} {
		s, err := Read(c.name, bytes.NewReader(epw))
		if (err == nil) != c.ok {
			t.Errorf("Read(%q): err %v, want ok %v", c.name, err, c.ok)
		}
		if c.ok && (s == nil || len(s.Records) < 8760) {
			t.Errorf("Read(%q): no hourly records", c.name)
		}
	}
	for _, name := range []string{"ohare.txt", "epw", "weather.epw/notes"} {
		if _, err := Read(name, bytes.NewReader(epw)); !errors.Is(err, ErrNotWeather) || !strings.Contains(err.Error(), "allowed: a TMY3 file ending .csv or an EPW file ending .epw") {
			t.Errorf("Read(%q): %v, want ErrNotWeather with what is allowed", name, err)
		}
	}
}

func TestFormatOf(t *testing.T) {
	for name, want := range map[string]string{
		"oslo.epw": "epw", "C:\\weather\\OSLO.EPW": "epw", "data/tmy3/725300TYA.CSV": "tmy3",
		"oslo.txt": "", "epw": "", "weather.epw/notes": "", "": "",
	} {
		assert.Equal(t, want, FormatOf(name), name)
	}
}
