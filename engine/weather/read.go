package weather

import (
	"encoding/csv"
	"errors"
	"fmt"
	"io"
	"math"
	"strconv"
	"strings"
	"time"
)

// reader wraps encoding/csv (RFC 4180) and turns its errors, and ours, into
// *ParseError with the line and column.
type reader struct {
	file string
	csv  *csv.Reader
	row  []string
}

func newReader(file string, r io.Reader) *reader {
	c := csv.NewReader(r)
	c.FieldsPerRecord = -1
	c.ReuseRecord = true
	return &reader{file: file, csv: c}
}

// next reads a row; io.EOF at the end.
func (r *reader) next() error {
	row, err := r.csv.Read()
	if err == io.EOF {
		return err
	}
	var pe *csv.ParseError
	if errors.As(err, &pe) {
		return &ParseError{File: r.file, Line: pe.Line, Column: pe.Column, Problem: pe.Err.Error(), Allowed: "RFC 4180 CSV"}
	}
	if err != nil {
		return &ParseError{File: r.file, Problem: err.Error()}
	}
	r.row = row
	return nil
}

func (r *reader) line() int {
	line, _ := r.csv.FieldPos(0)
	return line
}

// fail reports a problem with field i of the current row.
func (r *reader) fail(i int, field, problem, allowed string) error {
	line, col := r.csv.FieldPos(min(i, len(r.row)-1))
	val := ""
	if i < len(r.row) {
		val = r.row[i]
	} else {
		col = 0
		problem = fmt.Sprintf("is missing: the row has %d columns", len(r.row))
	}
	return &ParseError{File: r.file, Line: line, Column: col, Field: field, Value: val, Problem: problem, Allowed: allowed}
}

// num reads field i as a number; values equal to one of missing become NaN.
func (r *reader) num(i int, field string, b bound, missing ...float64) (float64, error) {
	if i >= len(r.row) {
		return 0, r.fail(i, field, "", "")
	}
	s := strings.TrimSpace(r.row[i])
	x, err := strconv.ParseFloat(s, 64)
	if err != nil || math.IsInf(x, 0) || math.IsNaN(x) {
		return 0, r.fail(i, field, "is not a number", b.allowed())
	}
	for _, m := range missing {
		if x == m {
			return math.NaN(), nil
		}
	}
	if !b.ok(x) {
		return 0, r.fail(i, field, "is out of range", b.allowed())
	}
	return x, nil
}

// site reads a station's latitude, longitude, UTC offset and elevation from
// the given columns of the current row.
func (r *reader) site(st *Site, iLat, iLon, iTZ, iElev int) error {
	var err error
	for _, f := range []struct {
		dst  *float64
		i    int
		name string
		b    bound
	}{
		{&st.LatDeg, iLat, "latitude", bound{-90, 90, "°"}},
		{&st.LonDeg, iLon, "longitude", bound{-180, 180, "°"}},
		{&st.TZOffsetH, iTZ, "time zone", bound{-12, 14, "h"}},
		{&st.ElevM, iElev, "elevation", bound{-500, 9000, "m"}},
	} {
		if *f.dst, err = r.num(f.i, f.name, f.b); err != nil {
			return err
		}
	}
	return nil
}

// ReadTMY3 reads a TMY3 CSV file (or a measurement file in the same layout):
// a metadata line (station, name, state, UTC offset, latitude, longitude,
// elevation), a header line, then one row per interval. Columns are found by
// their header names; −9900 and −9999 mark missing values.
func ReadTMY3(file string, in io.Reader) (*Series, error) {
	r := newReader(file, in)
	if err := r.next(); err != nil {
		return nil, eofIsShort(err, file, "a TMY3 metadata line")
	}
	s := &Series{Format: "tmy3"}
	if len(r.row) < 7 {
		return nil, r.fail(len(r.row), "metadata", "", "")
	}
	s.Site.ID, s.Site.Name = strings.TrimSpace(r.row[0]), strings.TrimSpace(r.row[1])
	if err := r.site(&s.Site, 4, 5, 3, 6); err != nil {
		return nil, err
	}
	if err := r.next(); err != nil {
		return nil, eofIsShort(err, file, "a TMY3 header line")
	}
	col := map[string]int{}
	for i, name := range r.row {
		col[strings.TrimSpace(name)] = i
	}
	need := []string{"Date (MM/DD/YYYY)", "Time (HH:MM)", "GHI (W/m^2)", "DNI (W/m^2)", "DHI (W/m^2)", "Dry-bulb (C)"}
	for _, n := range need {
		if _, ok := col[n]; !ok {
			return nil, &ParseError{File: file, Line: r.line(), Field: n, Problem: "column is missing from the header",
				Allowed: "the TMY3 header (NREL/TP-581-43156)"}
		}
	}
	optional := func(name string) int {
		if i, ok := col[name]; ok {
			return i
		}
		return -1
	}
	iETR, iETRN := optional("ETR (W/m^2)"), optional("ETRN (W/m^2)")
	iPress, iAlb := optional("Pressure (mbar)"), optional("Alb (unitless)")
	zone := fixedZone(s.Site.TZOffsetH)
	for {
		if err := r.next(); err == io.EOF {
			break
		} else if err != nil {
			return nil, err
		}
		if len(r.row) == 1 && strings.TrimSpace(r.row[0]) == "" {
			continue
		}
		end, err := tmy3Time(r, col["Date (MM/DD/YYYY)"], col["Time (HH:MM)"], zone)
		if err != nil {
			return nil, err
		}
		rec := Record{End: end, ETRWm2: math.NaN(), ETRNWm2: math.NaN(), PressMb: math.NaN(), Albedo: math.NaN(), SnowCm: math.NaN()}
		fields := []struct {
			dst  *float64
			i    int
			name string
			b    bound
		}{
			{&rec.GHIWm2, col["GHI (W/m^2)"], "GHI (W/m^2)", irradianceBound},
			{&rec.DNIWm2, col["DNI (W/m^2)"], "DNI (W/m^2)", irradianceBound},
			{&rec.DHIWm2, col["DHI (W/m^2)"], "DHI (W/m^2)", irradianceBound},
			{&rec.TempC, col["Dry-bulb (C)"], "Dry-bulb (C)", tempBound},
			{&rec.ETRWm2, iETR, "ETR (W/m^2)", irradianceBound},
			{&rec.ETRNWm2, iETRN, "ETRN (W/m^2)", irradianceBound},
			{&rec.PressMb, iPress, "Pressure (mbar)", pressureBound},
			{&rec.Albedo, iAlb, "Alb (unitless)", albedoBound},
		}
		for _, f := range fields {
			if f.i < 0 {
				continue // an optional column this file does not have
			}
			if *f.dst, err = r.num(f.i, f.name, f.b, -9900, -9999); err != nil {
				return nil, err
			}
		}
		s.Records = append(s.Records, rec)
	}
	return s, finish(s, file)
}

func tmy3Time(r *reader, iDate, iTime int, zone *time.Location) (time.Time, error) {
	if iDate >= len(r.row) || iTime >= len(r.row) {
		return time.Time{}, r.fail(max(iDate, iTime), "Date/Time", "", "")
	}
	var mo, d, y int
	if n, err := fmt.Sscanf(strings.TrimSpace(r.row[iDate]), "%d/%d/%d", &mo, &d, &y); n != 3 || err != nil ||
		mo < 1 || mo > 12 || d < 1 || d > 31 {
		return time.Time{}, r.fail(iDate, "Date (MM/DD/YYYY)", "is not a date", "MM/DD/YYYY")
	}
	parts := strings.Split(strings.TrimSpace(r.row[iTime]), ":")
	h, errH := strconv.Atoi(parts[0])
	var m int
	var errM error = errors.New("no minutes")
	if len(parts) >= 2 && len(parts) <= 3 {
		m, errM = strconv.Atoi(parts[1])
	}
	if errH != nil || errM != nil || h < 0 || h > 24 || m < 0 || m > 59 || (h == 24 && m != 0) {
		return time.Time{}, r.fail(iTime, "Time (HH:MM)", "is not a time of day", "HH:MM from 00:00 to 24:00")
	}
	t := time.Date(y, time.Month(mo), d, h, m, 0, 0, zone)
	if t.Day() != d && !(h == 24) {
		return time.Time{}, r.fail(iDate, "Date (MM/DD/YYYY)", "is not a calendar date", "MM/DD/YYYY")
	}
	return t, nil
}

// ReadEPW reads an EnergyPlus weather file: eight header lines (LOCATION,
// DESIGN CONDITIONS, …, DATA PERIODS), then hourly rows of 35 fields. Missing
// values follow the EPW conventions (99.9 °C, 999999 Pa, 9999 Wh/m², 999 cm).
func ReadEPW(file string, in io.Reader) (*Series, error) {
	r := newReader(file, in)
	s := &Series{Format: "epw"}
	for i := 0; i < 8; i++ {
		if err := r.next(); err != nil {
			return nil, eofIsShort(err, file, "8 EPW header lines")
		}
		if i == 0 {
			if strings.TrimSpace(r.row[0]) != "LOCATION" {
				return nil, r.fail(0, "header", "is not the LOCATION line", "an EPW file starting with LOCATION")
			}
			if len(r.row) < 10 {
				return nil, r.fail(len(r.row), "LOCATION", "", "")
			}
			s.Site.Name, s.Site.ID = strings.TrimSpace(r.row[1]), strings.TrimSpace(r.row[5])
			if err := r.site(&s.Site, 6, 7, 8, 9); err != nil {
				return nil, err
			}
		}
	}
	zone := fixedZone(s.Site.TZOffsetH)
	for {
		if err := r.next(); err == io.EOF {
			break
		} else if err != nil {
			return nil, err
		}
		if len(r.row) < 33 {
			return nil, r.fail(len(r.row), "data row", "", "")
		}
		ints := [4]int{}
		names := [4]string{"year", "month", "day", "hour"}
		lims := [4][2]int{{1, 9999}, {1, 12}, {1, 31}, {1, 24}}
		for i := range ints {
			v, err := strconv.Atoi(strings.TrimSpace(r.row[i]))
			if err != nil || v < lims[i][0] || v > lims[i][1] {
				return nil, r.fail(i, names[i], "is not a valid "+names[i], fmt.Sprintf("a whole number from %d to %d", lims[i][0], lims[i][1]))
			}
			ints[i] = v
		}
		rec := Record{End: time.Date(ints[0], time.Month(ints[1]), ints[2], ints[3], 0, 0, 0, zone)}
		var err error
		fields := []struct {
			dst     *float64
			i       int
			name    string
			b       bound
			missing []float64
		}{
			{&rec.TempC, 6, "dry bulb temperature", tempBound, []float64{99.9}},
			{&rec.PressMb, 9, "atmospheric station pressure", bound{30000, 110000, "Pa"}, []float64{999999}},
			{&rec.ETRWm2, 10, "extraterrestrial horizontal radiation", irradianceBound, []float64{9999}},
			{&rec.ETRNWm2, 11, "extraterrestrial direct normal radiation", irradianceBound, []float64{9999}},
			{&rec.GHIWm2, 13, "global horizontal radiation", irradianceBound, []float64{9999}},
			{&rec.DNIWm2, 14, "direct normal radiation", irradianceBound, []float64{9999}},
			{&rec.DHIWm2, 15, "diffuse horizontal radiation", irradianceBound, []float64{9999}},
			{&rec.SnowCm, 30, "snow depth", snowBound, []float64{999}},
			{&rec.Albedo, 32, "albedo", bound{0, 1000, ""}, []float64{999, 999.000}},
		}
		for _, f := range fields {
			if *f.dst, err = r.num(f.i, f.name, f.b, f.missing...); err != nil {
				return nil, err
			}
		}
		rec.PressMb /= 100 // Pa → mbar
		if rec.Albedo > 1 {
			rec.Albedo = math.NaN() // EPW writes albedo 0–1; anything else is a missing-value code
		}
		s.Records = append(s.Records, rec)
	}
	return s, finish(s, file)
}

// finish sets each record's interval and checks the series is in order.
func finish(s *Series, file string) error {
	if len(s.Records) < 2 {
		return &ParseError{File: file, Problem: fmt.Sprintf("has %d data rows", len(s.Records)), Allowed: "at least 2"}
	}
	step := s.Records[1].End.Sub(s.Records[0].End)
	if step <= 0 || step > time.Hour {
		step = time.Hour // typical years splice months from different years
	}
	for i := range s.Records {
		s.Records[i].Interval = step
	}
	return nil
}

func eofIsShort(err error, file, want string) error {
	if err == io.EOF {
		return &ParseError{File: file, Problem: "ends early", Allowed: want}
	}
	return err
}

func fixedZone(offsetH float64) *time.Location {
	sec := int(math.Round(offsetH * 3600))
	name := fmt.Sprintf("UTC%+03d:%02d", sec/3600, abs(sec%3600)/60)
	return time.FixedZone(name, sec)
}

func abs(x int) int {
	if x < 0 {
		return -x
	}
	return x
}

// ErrNotWeather reports a file name that is neither a TMY3 (.csv) nor an EPW
// (.epw) file.
var ErrNotWeather = errors.New("not a weather file")

// FormatOf is the format a weather file's name gives it, by the extension
// of its last path element in any case: "epw" for ".epw", "tmy3" for
// ".csv", "" for any other name.
func FormatOf(file string) string {
	base := strings.ToLower(file[strings.LastIndexAny(file, `/\`)+1:])
	switch {
	case strings.HasSuffix(base, ".epw"):
		return "epw"
	case strings.HasSuffix(base, ".csv"):
		return "tmy3"
	}
	return ""
}

// Read reads a weather file by its name (FormatOf): ".epw" with ReadEPW,
// ".csv" with ReadTMY3. Any other name gives an error wrapping
// ErrNotWeather that says what is allowed.
func Read(file string, in io.Reader) (*Series, error) {
	switch FormatOf(file) {
	case "epw":
		return ReadEPW(file, in)
	case "tmy3":
		return ReadTMY3(file, in)
	}
	return nil, fmt.Errorf("%q is %w (allowed: a TMY3 file ending .csv or an EPW file ending .epw)", file, ErrNotWeather)
}
