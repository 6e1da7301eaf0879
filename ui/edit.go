package ui

import (
	"bytes"
	"encoding/json"
	"errors"
	"math"
	"strconv"
	"strings"

	"nodelife/engine/scenario"
)

// withValue returns s with the field at path set to the typed text, checked
// by the engine's own parser, so the app refuses exactly what a scenario file
// would be refused for, with the same words. Text that is not a number goes in
// as a JSON string and the engine says so; empty text clears an optional
// field.
func withValue(s scenario.Scenario, path, text string) (scenario.Scenario, error) {
	var root map[string]any
	dec := json.NewDecoder(bytes.NewReader(s.JSON()))
	dec.UseNumber()
	if err := dec.Decode(&root); err != nil {
		panic("ui: the engine wrote a scenario it cannot read: " + err.Error())
	}
	obj := root
	parts := strings.Split(path, ".")
	for _, p := range parts[:len(parts)-1] {
		next, ok := obj[p].(map[string]any)
		if !ok {
			next = map[string]any{}
			obj[p] = next
		}
		obj = next
	}
	f, _ := scenario.FieldByPath(path)
	obj[parts[len(parts)-1]] = literal(text, f.Optional)
	data, err := json.Marshal(root)
	if err != nil {
		panic("ui: " + err.Error())
	}
	return scenario.Parse(data)
}

// literal is typed text as a JSON value.
func literal(text string, optional bool) json.RawMessage {
	t := strings.TrimSpace(text)
	if t == "" && optional {
		return json.RawMessage("null")
	}
	if v, err := strconv.ParseFloat(t, 64); err == nil && !math.IsInf(v, 0) && !math.IsNaN(v) {
		return json.RawMessage(strconv.FormatFloat(v, 'g', -1, 64))
	}
	q, _ := json.Marshal(t)
	return q
}

// reason is the engine's complaint about the value at path, without the path
// (the field shows where): `61 is out of range (allowed: …)`.
func reason(err error, path string) string {
	var es scenario.Errors
	if errors.As(err, &es) {
		for _, e := range es {
			var fe *scenario.FieldError
			if errors.As(e, &fe) && fe.Path == path {
				return strings.TrimPrefix(fe.Error(), fe.Path+": ")
			}
		}
	}
	var fe *scenario.FieldError
	if errors.As(err, &fe) {
		return strings.TrimPrefix(fe.Error(), fe.Path+": ")
	}
	return err.Error()
}
