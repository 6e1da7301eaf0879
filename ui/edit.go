package ui

import (
	"bytes"
	"encoding/json"
	"errors"
	"fmt"
	"math"
	"regexp"
	"strconv"
	"strings"

	"nodelife/engine/cell"
	"nodelife/engine/scenario"
)

// Edit is a value the user committed, for the app to check and apply. The app
// answers with Form.Settle.
type Edit struct {
	Path, Text string
	// Drag marks a value from a slider being dragged: applied at once, and
	// the whole drag is one step of the undo history.
	Drag bool
}

// checkTyping checks the focused input's text with the engine's parser as
// it is typed, and marks a value the engine would refuse in place, with the
// reason, before Enter; the answer stays the last good one until a value is
// applied. An empty field or a lone sign is not checked: the user is still
// typing. It reports whether the input's mark changed. Call with a.mu held.
func (a *App) checkTyping() bool {
	r := a.form.Focused()
	if r == nil || r.Text == nil {
		a.typed = ""
		return false
	}
	key := r.Path + "\x00" + r.Text.Text
	if key == a.typed {
		return false
	}
	a.typed = key
	why := "" // back at the applied value: nothing to mark
	if t := strings.TrimSpace(r.Text.Text); r.Text.Edited() && t != "" && t != "-" && t != "+" {
		if _, err := applyEdit(a.scen, Edit{Path: r.Path, Text: r.Text.Text}); err != nil {
			why = reason(err, r.Path)
		}
	}
	if why == r.Text.Err {
		return false
	}
	r.Text.Err = why
	return true
}

// Paths of the form's inputs that are not one scenario field.
const (
	pathPlace    = "site.place"    // an example place: position, clock and climate
	pathPosition = "site.position" // "latitude, longitude"
)

// applyEdit returns s with the edit made, checked by the engine's own parser,
// so the app refuses exactly what a scenario file would be refused for, with
// the same words. Some inputs set more than one field: a place, a position,
// a node profile (every node field), a chemistry or form (the form the
// chemistry is made in, and the form's own capacity).
func applyEdit(s scenario.Scenario, e Edit) (scenario.Scenario, error) {
	switch e.Path {
	case pathPosition:
		lat, lon, err := parsePosition(e.Text)
		if err != nil {
			return s, err
		}
		return withValues(s, map[string]json.RawMessage{"site.lat_deg": number(lat), "site.lon_deg": number(lon)})
	case pathPlace:
		if e.Text == "" { // "your own site": nothing to set
			return s, nil
		}
		for _, p := range Places() {
			if p.Name == e.Text {
				return withValues(s, map[string]json.RawMessage{
					"site.lat_deg": number(p.LatDeg), "site.lon_deg": number(p.LonDeg),
					"site.timezone": str(p.Timezone), "site.climate.preset": str(p.Climate),
				})
			}
		}
		return s, fmt.Errorf("%q is not one of the example places", e.Text)
	case "node.profile":
		if _, ok := scenario.LookupProfile(e.Text); ok {
			t := s
			scenario.ApplyProfile(&t, e.Text)
			return scenario.Parse(t.JSON())
		}
	case "cells.chemistry":
		form := s.Cells.Form
		if c, ok := cell.Lookup(e.Text); ok {
			if _, made := c.Form(form); !made {
				form = commonForm(c)
			}
		}
		return withValues(s, map[string]json.RawMessage{
			"cells.chemistry": str(e.Text), "cells.form": str(form), "cells.capacity_mah": json.RawMessage("null")})
	case "cells.form":
		return withValues(s, map[string]json.RawMessage{"cells.form": str(e.Text), "cells.capacity_mah": json.RawMessage("null")})
	}
	f, ok := scenario.FieldByPath(e.Path)
	if !ok {
		panic("ui: unknown field " + e.Path)
	}
	return withValues(s, map[string]json.RawMessage{e.Path: literal(e.Text, f)})
}

// commonForm is the form to switch to when a chemistry is not made in the
// current one: AA, then the 18650, then the chemistry's first.
func commonForm(c cell.Chemistry) string {
	for _, name := range []string{"AA", "18650"} {
		if _, ok := c.Form(name); ok {
			return name
		}
	}
	if len(c.Forms) > 0 {
		return c.Forms[0].Name
	}
	return ""
}

// withValues returns s with the values at the given paths replaced and the
// result parsed as a scenario file.
func withValues(s scenario.Scenario, values map[string]json.RawMessage) (scenario.Scenario, error) {
	var root map[string]any
	dec := json.NewDecoder(bytes.NewReader(s.JSON()))
	dec.UseNumber()
	if err := dec.Decode(&root); err != nil {
		panic("ui: the engine wrote a scenario it cannot read: " + err.Error())
	}
	for path, v := range values {
		scenario.SetPath(root, path, v)
	}
	data, err := json.Marshal(root)
	if err != nil {
		panic("ui: " + err.Error())
	}
	return scenario.Parse(data)
}

// withValue returns s with the field at path set to the typed text.
func withValue(s scenario.Scenario, path, text string) (scenario.Scenario, error) {
	return applyEdit(s, Edit{Path: path, Text: text})
}

// literal is typed text as a JSON value for field f. Numbers go in as
// numbers; text that is not a number goes in as a JSON string and the engine
// says so; empty text clears an optional field. Other kinds are strings.
func literal(text string, f scenario.Field) json.RawMessage {
	t := strings.TrimSpace(text)
	if t == "" && f.Optional {
		return json.RawMessage("null")
	}
	if f.Kind == scenario.Number || f.Kind == scenario.Integer {
		if v, err := strconv.ParseFloat(t, 64); err == nil && !math.IsInf(v, 0) && !math.IsNaN(v) {
			return number(v)
		}
	}
	return str(t)
}

func number(v float64) json.RawMessage {
	return json.RawMessage(strconv.FormatFloat(v, 'g', -1, 64))
}

func str(s string) json.RawMessage {
	q, _ := json.Marshal(s)
	return q
}

// errPosition is the refusal of a position that does not read as two numbers.
var errPosition = errors.New(`write latitude and longitude in degrees, e.g. "59.91, 10.75" or "33.45 N 112.07 W"`)

var coordRE = regexp.MustCompile(`([+-]?[0-9]+(?:\.[0-9]*)?)\s*°?\s*([NSEW])?`)

// parsePosition reads "latitude, longitude" in decimal degrees: "59.91,
// 10.75", "59.91 10.75", "59.91° N, 10.75° E" or "37.81 S 144.96 E". South and
// west make a value negative; with compass letters the order may be swapped.
func parsePosition(text string) (lat, lon float64, err error) {
	t := strings.ToUpper(strings.TrimSpace(text))
	ms := coordRE.FindAllStringSubmatch(t, -1)
	rest := strings.TrimSpace(strings.Replace(coordRE.ReplaceAllString(t, ""), ",", "", 1))
	if len(ms) != 2 || rest != "" {
		return 0, 0, errPosition
	}
	vals := [2]float64{}
	for i, m := range ms {
		v, err := strconv.ParseFloat(m[1], 64)
		if err != nil {
			return 0, 0, errPosition
		}
		if m[2] == "S" || m[2] == "W" {
			if v < 0 {
				return 0, 0, errPosition // a sign and a letter: say one thing
			}
			v = -v
		}
		vals[i] = v
	}
	a, b := ms[0][2], ms[1][2]
	if (a == "E" || a == "W") && (b == "N" || b == "S") {
		return vals[1], vals[0], nil
	}
	if (a == "E" || a == "W") || (b == "N" || b == "S") {
		return 0, 0, errPosition
	}
	return vals[0], vals[1], nil
}

// formatPosition writes a position as the field shows it.
func formatPosition(lat, lon float64) string {
	return FormatNumber(lat) + ", " + FormatNumber(lon)
}

// reason is the engine's complaint about the value at path, without the path
// (the field shows where): `61 is out of range (allowed: …)`. For an input
// that sets several fields it names the field at fault.
func reason(err error, path string) string {
	var fes []*scenario.FieldError
	var es scenario.Errors
	if errors.As(err, &es) {
		for _, e := range es {
			var fe *scenario.FieldError
			if errors.As(e, &fe) {
				fes = append(fes, fe)
			}
		}
	} else {
		var fe *scenario.FieldError
		if errors.As(err, &fe) {
			fes = append(fes, fe)
		}
	}
	for _, fe := range fes {
		if fe.Path == path {
			return strings.TrimPrefix(fe.Error(), fe.Path+": ")
		}
	}
	if path == pathPosition {
		for _, fe := range fes {
			switch fe.Path {
			case "site.lat_deg":
				return "latitude " + strings.TrimPrefix(fe.Error(), fe.Path+": ")
			case "site.lon_deg":
				return "longitude " + strings.TrimPrefix(fe.Error(), fe.Path+": ")
			}
		}
	}
	if len(fes) > 0 {
		return fes[0].Error()
	}
	return err.Error()
}
