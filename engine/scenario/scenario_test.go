package scenario

import (
	"encoding/json"
	"errors"
	"fmt"
	"os"
	"strings"
	"testing"

	"github.com/stretchr/testify/assert"
	"github.com/stretchr/testify/require"

	"nodelife/engine/cell"
)

// doc builds a scenario file that sets one path to a raw JSON value.
func doc(path, raw string) []byte {
	parts := strings.Split(path, ".")
	out := raw
	for i := len(parts) - 1; i >= 0; i-- {
		out = fmt.Sprintf("{%q: %s}", parts[i], out)
	}
	return []byte(out)
}

// TestFieldsGroupObjects: the writer emits fields in table order, so each
// object's fields must stand together in the table.
func TestFieldsGroupObjects(t *testing.T) {
	closed := map[string]bool{}
	open := []string{}
	for _, f := range Fields() {
		parts := strings.Split(f.Path, ".")
		dirs := parts[:len(parts)-1]
		common := 0
		for common < len(open) && common < len(dirs) && open[common] == dirs[common] {
			common++
		}
		for len(open) > common {
			closed[strings.Join(open, ".")] = true
			open = open[:len(open)-1]
		}
		for _, d := range dirs[common:] {
			open = append(open, d)
			assert.False(t, closed[strings.Join(open, ".")], "%s reopens object %s", f.Path, strings.Join(open, "."))
		}
	}
}

func TestDemoParses(t *testing.T) {
	s := Demo()
	assert.Equal(t, Format, s.Format)
	assert.Equal(t, "li-socl2", s.Cells.Chemistry)
	assert.Equal(t, "D", s.Cells.Form)
	assert.Equal(t, "Europe/Oslo", s.Site.Timezone)
	assert.Equal(t, 5.0, s.Node.Vision.FPS)
	// Fields the demo leaves out keep their defaults.
	assert.Equal(t, Default().Site.FixedTempC, s.Site.FixedTempC)
}

func TestEmptyObjectIsDefault(t *testing.T) {
	s, err := Parse([]byte(`{}`))
	require.NoError(t, err)
	assert.Equal(t, Default(), s)
}

func TestRoundTrip(t *testing.T) {
	withCap := Demo()
	withCap.Cells.CapacityMAh = 17500
	withCap.Name = `quotes " and \ and ünïcode`
	for _, s := range []Scenario{Demo(), Default(), withCap} {
		back, err := Parse(s.JSON())
		require.NoError(t, err, string(s.JSON()))
		assert.Equal(t, s, back)
	}
	// The written file is valid JSON with every non-optional field.
	var m map[string]any
	require.NoError(t, json.Unmarshal(Demo().JSON(), &m))
	assert.Contains(t, m, "plan")
}

func TestFieldErrors(t *testing.T) {
	cases := []struct {
		in       string
		sentinel error
		path     string
		contains []string
	}{
		{`{"cells": {"capacity_mah": -5}}`, ErrRange, "cells.capacity_mah", []string{"-5", "1 to 1000000 mAh"}},
		{`{"node": {"vision": {"fps": "fast"}}}`, ErrType, "node.vision.fps", []string{`"fast"`, "is not a number", "0 to 60 fps"}},
		{`{"plan": {"years": 2.5}}`, ErrType, "plan.years", []string{"2.5", "whole number"}},
		{`{"plan": {"years": 21}}`, ErrRange, "plan.years", []string{"21", "1 to 20"}},
		{`{"plan": {"start": "2027-02-30"}}`, ErrRange, "plan.start", []string{`"2027-02-30"`, "YYYY-MM-DD"}},
		{`{"plan": {"start": "1900-01-01"}}`, ErrRange, "plan.start", []string{"out of range", MinDate}},
		{`{"site": {"timezone": "Europe/Olso"}}`, ErrRange, "site.timezone", []string{`"Europe/Olso"`, "IANA"}},
		{`{"site": {"timezone": "Local"}}`, ErrRange, "site.timezone", []string{"IANA"}},
		{`{"site": {"placement": "roof"}}`, ErrRange, "site.placement", []string{`"outdoor", "indoor", "fixed"`}},
		{`{"site": {"latitude": 59}}`, ErrUnknownKey, "site.latitude", []string{`did you mean "site.lat_deg"`, "lat_deg, lon_deg"}},
		{`{"node": {"vision": {"fsp": 2}}}`, ErrUnknownKey, "node.vision.fsp", []string{`did you mean "node.vision.fps"`}},
		{`{"fps": 2}`, ErrUnknownKey, "fps", []string{`did you mean "node.vision.fps"`}},
		{`{"site": 3}`, ErrType, "site", []string{"is not an object"}},
		{`{"cells": {"chemistry": "li-ion"}}`, ErrRange, "cells.form", []string{`"D" is not made in li-ion`, "18650, 21700"}},
		{`{"cells": {"chemistry": "lead-acid"}}`, ErrRange, "cells.chemistry", []string{`"lead-acid"`, `"li-socl2"`}},
		{`{"name": 7}`, ErrType, "name", []string{"is not a string"}},
		{`{"plan": {"step_min": 10, "step_min": 5}}`, ErrUnknownKey, "plan.step_min", []string{"appears twice"}},
	}
	for _, c := range cases {
		_, err := Parse([]byte(c.in))
		require.Error(t, err, c.in)
		assert.ErrorIs(t, err, c.sentinel, c.in)
		var fe *FieldError
		require.True(t, errors.As(err, &fe), c.in)
		assert.Equal(t, c.path, fe.Path, c.in)
		assert.True(t, strings.HasPrefix(err.Error(), c.path+": "), "%s: %q", c.in, err)
		for _, want := range c.contains {
			assert.Contains(t, err.Error(), want, c.in)
		}
	}
	// Every problem is reported, in file order.
	_, err := Parse([]byte(`{"plan": {"years": 0}, "site": {"lat_deg": 91}}`))
	var es Errors
	require.True(t, errors.As(err, &es))
	require.Len(t, es, 2)
	assert.Contains(t, es[0].Error(), "plan.years")
	assert.Contains(t, es[1].Error(), "site.lat_deg")
	// Optional fields take null as absent.
	s, err := Parse([]byte(`{"cells": {"capacity_mah": null}}`))
	require.NoError(t, err)
	assert.Equal(t, 0.0, s.Cells.CapacityMAh)
}

func TestSyntaxErrorLocation(t *testing.T) {
	cases := []struct {
		in        string
		line, col int
	}{
		{"{\n \"name\": \"x\",\n \"site\": {\"lat_deg\": 3,}\n}", 3, 24},
		{"{\"a\" 1}", 1, 6},
		{"", 1, 1},
	}
	for _, c := range cases {
		_, err := Parse([]byte(c.in))
		var se *SyntaxError
		require.True(t, errors.As(err, &se), "%q: %v", c.in, err)
		assert.ErrorIs(t, err, ErrSyntax)
		assert.Equal(t, c.line, se.Line, "%q: %v", c.in, err)
		assert.Equal(t, c.col, se.Column, "%q: %v", c.in, err)
	}
	_, err := Parse([]byte(`[1, 2]`))
	assert.ErrorIs(t, err, ErrType)
}

func TestSchemaFileIsCurrent(t *testing.T) {
	file, err := os.ReadFile("schema.json")
	require.NoError(t, err)
	assert.True(t, string(Schema()) == string(file), "schema.json is stale: run `make schema`")
}

// TestSchemaAgreesWithParser reads the published schema on its own terms and
// checks the parser against every property it declares: defaults, bounds,
// choices, and that no other keys are accepted.
func TestSchemaAgreesWithParser(t *testing.T) {
	file, err := os.ReadFile("schema.json")
	require.NoError(t, err)
	var root map[string]any
	require.NoError(t, json.Unmarshal(file, &root))

	leaves := map[string]map[string]any{}
	var walk func(prefix string, obj map[string]any)
	walk = func(prefix string, obj map[string]any) {
		assert.Equal(t, false, obj["additionalProperties"], "object %q", prefix)
		// An unknown key in this object is refused.
		_, err := Parse(doc(join(prefix, "no_such_key"), "1"))
		assert.ErrorIs(t, err, ErrUnknownKey, "object %q", prefix)
		for name, v := range obj["properties"].(map[string]any) {
			prop := v.(map[string]any)
			if prop["type"] == "object" {
				walk(join(prefix, name), prop)
				continue
			}
			leaves[join(prefix, name)] = prop
		}
	}
	walk("", root)

	fields := map[string]Field{}
	for _, f := range Fields() {
		fields[f.Path] = f
		_, ok := leaves[f.Path]
		assert.True(t, ok, "field %s missing from the schema", f.Path)
	}
	for path, prop := range leaves {
		f, ok := fields[path]
		if !assert.True(t, ok, "schema property %s unknown to the parser", path) {
			continue
		}
		accept := func(raw string) {
			s, err := Parse(withChemistryFor(path, raw))
			if assert.NoError(t, err, "%s = %s", path, raw) && prop["default"] != nil && raw == mustJSON(prop["default"]) {
				assert.JSONEq(t, mustJSON(prop["default"]), mustJSON(f.Get(&s)), "%s default", path)
			}
		}
		reject := func(raw string, sentinel error) {
			_, err := Parse(withChemistryFor(path, raw))
			assert.ErrorIs(t, err, sentinel, "%s = %s", path, raw)
			var fe *FieldError
			if assert.True(t, errors.As(err, &fe), "%s = %s", path, raw) {
				// The path of the field, or of the element of a list.
				assert.True(t, fe.Path == path || strings.HasPrefix(fe.Path, path+"["), "%s: error at %s", path, fe.Path)
			}
		}
		if d, ok := prop["default"]; ok {
			accept(mustJSON(d))
			// Absent means the default.
			def := Default()
			assert.JSONEq(t, mustJSON(d), mustJSON(f.Get(&def)), "%s: Default() vs schema default", path)
		} else {
			assert.True(t, f.Optional, "%s has no default but is not optional", path)
			accept("null")
		}
		switch typ := prop["type"].(type) {
		case []any: // ["number", "null"]
			checkNumber(t, prop, typ[0].(string), accept, reject)
		case string:
			switch typ {
			case "number", "integer":
				checkNumber(t, prop, typ, accept, reject)
			case "array":
				checkArray(t, prop, accept, reject)
			case "boolean":
				accept("true")
				accept("false")
				reject(`"yes"`, ErrType)
				reject("1", ErrType)
			case "string":
				reject("12", ErrType)
				if enum, ok := prop["enum"].([]any); ok {
					for _, e := range enum {
						accept(mustJSON(e))
					}
					reject(`"surely-not-a-choice"`, ErrRange)
				}
				if n, ok := prop["maxLength"].(float64); ok {
					accept(mustJSON(strings.Repeat("é", int(n))))
					reject(mustJSON(strings.Repeat("é", int(n)+1)), ErrRange)
				}
				if prop["pattern"] != nil { // the clock pattern
					for _, ok := range []string{`"00:00"`, `"07:30"`, `"23:59"`, `"24:00"`} {
						accept(ok)
					}
					for _, bad := range []string{`"24:01"`, `"7:30"`, `"07:60"`, `"noon"`, `"-1:00"`} {
						reject(bad, ErrRange)
					}
				}
				if prop["format"] == "date" {
					accept(mustJSON(prop["formatMinimum"]))
					accept(mustJSON(prop["formatMaximum"]))
					reject(`"1949-12-31"`, ErrRange)
					reject(`"2080-01-01"`, ErrRange)
					reject(`"01/02/2027"`, ErrRange)
				}
			default:
				t.Errorf("%s: unexpected type %v", path, typ)
			}
		}
	}
}

func checkNumber(t *testing.T, prop map[string]any, typ string, accept func(string), reject func(string, error)) {
	lo, hi := prop["minimum"].(float64), prop["maximum"].(float64)
	accept(mustJSON(lo))
	accept(mustJSON(hi))
	step := 1.0
	if typ == "number" {
		step = max((hi-lo)*1e-6, 1e-9)
		reject(`"7"`, ErrType)
	} else {
		reject(mustJSON(lo+0.5), ErrType)
	}
	reject(mustJSON(lo-step), ErrRange)
	reject(mustJSON(hi+step), ErrRange)
}

func checkArray(t *testing.T, prop map[string]any, accept func(string), reject func(string, error)) {
	items := prop["items"].(map[string]any)
	reject(`"1"`, ErrType)
	if enum, ok := items["enum"].([]any); ok {
		lo, hasMin := prop["minItems"].(float64)
		hi, hasMax := prop["maxItems"].(float64)
		if hasMin {
			reject(mustJSON(enum[:int(lo)-1]), ErrRange)
			accept(mustJSON(enum[:int(lo)]))
		} else {
			accept("[]")
		}
		if hasMax {
			reject(mustJSON(enum[:int(hi)+1]), ErrRange)
			accept(mustJSON(enum[:int(hi)]))
		} else {
			accept(mustJSON(enum))
		}
		reject(mustJSON([]any{enum[0], enum[0]}), ErrRange) // uniqueItems
		reject(`["someday"]`, ErrRange)
		reject(`[1]`, ErrType)
		return
	}
	lo, hi := items["minimum"].(float64), items["maximum"].(float64)
	n := 3
	if m, ok := prop["minItems"].(float64); ok {
		n = int(m)
		reject(mustJSON(make([]float64, n-1)), ErrRange)
		reject(mustJSON(make([]float64, n+1)), ErrRange)
	} else {
		max := int(prop["maxItems"].(float64))
		accept("[]")
		accept(mustJSON(fill(max, lo)))
		reject(mustJSON(fill(max+1, lo)), ErrRange)
	}
	accept(mustJSON(fill(n, lo)))
	accept(mustJSON(fill(n, hi)))
	bad := fill(n, lo)
	bad[n-1] = hi + 1
	reject(mustJSON(bad), ErrRange)
	bad[n-1] = lo - 1
	reject(mustJSON(bad), ErrRange)
	wrong := make([]any, n)
	for i := range wrong {
		wrong[i] = lo
	}
	wrong[0] = "x"
	reject(mustJSON(wrong), ErrType)
}

func fill(n int, x float64) []float64 {
	out := make([]float64, n)
	for i := range out {
		out[i] = x
	}
	return out
}

// withChemistryFor sets path to raw; for cells.form and cells.chemistry it
// pairs the value with a chemistry or form that makes the pair valid.
func withChemistryFor(path, raw string) []byte {
	if path == "cells.chemistry" {
		var id string
		if c, ok := cell.Lookup(strings.Trim(raw, `"`)); ok && json.Unmarshal([]byte(raw), &id) == nil {
			return []byte(fmt.Sprintf(`{"cells": {"chemistry": %s, "form": %q}}`, raw, c.Forms[0].Name))
		}
	}
	if path != "cells.form" {
		return doc(path, raw)
	}
	var form string
	if json.Unmarshal([]byte(raw), &form) == nil {
		for _, c := range cell.Library() {
			if _, ok := c.Form(form); ok {
				return []byte(fmt.Sprintf(`{"cells": {"chemistry": %q, "form": %s}}`, c.ID, raw))
			}
		}
	}
	return doc(path, raw)
}

func mustJSON(v any) string {
	b, err := json.Marshal(v)
	if err != nil {
		panic(err)
	}
	return string(b)
}

func TestEditDistance(t *testing.T) {
	assert.Equal(t, 0, editDistance("fps", "fps"))
	assert.Equal(t, 2, editDistance("fsp", "fps"))
	assert.Equal(t, 3, editDistance("kitten", "sitting")) // the textbook example
	assert.Equal(t, 1, editDistance("ü", "u"))
}

func TestProfilesFillWhatTheFileLeavesOut(t *testing.T) {
	s, err := Parse([]byte(`{"node": {"profile": "doorway-counter", "vision": {"fps": 3}}}`))
	require.NoError(t, err)
	assert.Equal(t, 3.0, s.Node.Vision.FPS, "the file's own value wins")
	require.NotNil(t, s.Node.Vision.BusyFPS)
	assert.Equal(t, 15.0, *s.Node.Vision.BusyFPS, "the profile fills the rest")
	assert.Equal(t, "lora", s.Node.Radio.Class)
	assert.Equal(t, "corridor", s.Node.Events.Occupancy)
	// Written out and read back, the scenario is the same (every field explicit).
	back, err := Parse(s.JSON())
	require.NoError(t, err)
	assert.Equal(t, s, back)
	// Every profile sets only node fields, of the right types, within range.
	for _, p := range Profiles() {
		d := Default()
		require.True(t, ApplyProfile(&d, p.ID), p.ID)
		_, err := Parse(d.JSON())
		assert.NoError(t, err, p.ID)
		for path := range p.Values {
			assert.True(t, strings.HasPrefix(path, "node."), "%s sets %s", p.ID, path)
		}
		assert.NotEmpty(t, p.Note)
	}
	assert.False(t, ApplyProfile(&s, "toaster"))
}

func TestRadioPayloadForBLE(t *testing.T) {
	_, err := Parse([]byte(`{"node": {"radio": {"class": "ble", "payload_bytes": 40}}}`))
	var fe *FieldError
	require.ErrorAs(t, err, &fe)
	assert.Equal(t, "node.radio.payload_bytes", fe.Path)
	_, err = Parse([]byte(`{"node": {"radio": {"class": "lora", "payload_bytes": 40}}}`))
	assert.NoError(t, err)
}

func TestSetPathChangesOneValueAndKeepsTheRest(t *testing.T) {
	var root map[string]any
	require.NoError(t, json.Unmarshal(DemoJSON(), &root))
	SetPath(root, "cells.capacity_mah", 1234)
	SetPath(root, "name", "changed")
	data, err := json.Marshal(root)
	require.NoError(t, err)
	s, err := Parse(data)
	require.NoError(t, err)
	assert.Equal(t, 1234.0, s.Cells.CapacityMAh)
	assert.Equal(t, "changed", s.Name)
	assert.Equal(t, Demo().Node, s.Node, "the values not set are kept")

	// Objects on the way are made, and a non-object on the way is replaced.
	m := map[string]any{"a": 1.0}
	SetPath(m, "a.b.c", "x")
	SetPath(m, "d", 2.0)
	assert.Equal(t, map[string]any{"a": map[string]any{"b": map[string]any{"c": "x"}}, "d": 2.0}, m)
}
