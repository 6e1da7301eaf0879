package ui

import (
	"strings"
	"testing"

	"github.com/stretchr/testify/assert"
	"github.com/stretchr/testify/require"

	"nodelife/engine/cell"
	"nodelife/engine/scenario"
)

func TestParsePosition(t *testing.T) {
	for _, c := range []struct {
		text     string
		lat, lon float64
		ok       bool
	}{
		{"59.91, 10.75", 59.91, 10.75, true},
		{"59.91,10.75", 59.91, 10.75, true},
		{" 59.91 10.75 ", 59.91, 10.75, true},
		{"-37.81, 144.96", -37.81, 144.96, true},
		{"59.91° N, 10.75° E", 59.91, 10.75, true},
		{"33.45 N 112.07 W", 33.45, -112.07, true},
		{"37.81 S, 144.96 E", -37.81, 144.96, true},
		{"10.75 E, 59.91 N", 59.91, 10.75, true}, // compass letters may swap the order
		{"59.91", 0, 0, false},
		{"59.91, 10.75, 3", 0, 0, false},
		{"-33.45 S, 10 E", 0, 0, false}, // a sign and a letter
		{"59.91 E, 10.75 E", 0, 0, false},
		{"north", 0, 0, false},
	} {
		lat, lon, err := parsePosition(c.text)
		if (err == nil) != c.ok || c.ok && (lat != c.lat || lon != c.lon) {
			t.Errorf("parsePosition(%q) = %g, %g, %v; want %g, %g, ok %v", c.text, lat, lon, err, c.lat, c.lon, c.ok)
		}
	}
}

func TestApplyEditSetsSeveralFields(t *testing.T) {
	demo := scenario.Demo()
	s, err := applyEdit(demo, Edit{Path: pathPlace, Text: "Melbourne"})
	if err != nil {
		t.Fatal(err)
	}
	if s.Site.LatDeg != -37.81 || s.Site.LonDeg != 144.96 || s.Site.Timezone != "Australia/Melbourne" || s.Site.Climate.Preset != "marine-temperate" {
		t.Errorf("Melbourne: %+v", s.Site)
	}
	if valueText(s, pathPlace) != "Melbourne" {
		t.Errorf("the place shown after picking Melbourne: %q", valueText(s, pathPlace))
	}

	s, err = applyEdit(demo, Edit{Path: pathPosition, Text: "69.65, 18.96"})
	if err != nil || s.Site.LatDeg != 69.65 || s.Site.LonDeg != 18.96 {
		t.Errorf("position: %v, %v (%v)", s.Site.LatDeg, s.Site.LonDeg, err)
	}
	_, err = applyEdit(demo, Edit{Path: pathPosition, Text: "95, 10"})
	if got := reason(err, pathPosition); !strings.HasPrefix(got, "latitude 95 is out of range") {
		t.Errorf("latitude 95: reason %q, want the engine's range with the field named", got)
	}

	// A chemistry not made in the current form moves to a form it is made in
	// and the form's own capacity.
	demo.Cells.CapacityMAh = 9000
	s, err = applyEdit(demo, Edit{Path: "cells.chemistry", Text: "li-ion"})
	if err != nil {
		t.Fatal(err)
	}
	c, _ := cell.Lookup("li-ion")
	if _, ok := c.Form(s.Cells.Form); !ok || s.Cells.CapacityMAh != 0 {
		t.Errorf("li-ion: form %q, capacity %v; want a form li-ion is made in and the rated capacity", s.Cells.Form, s.Cells.CapacityMAh)
	}
	s, err = applyEdit(scenario.Demo(), Edit{Path: "cells.chemistry", Text: "alkaline"})
	if err != nil || s.Cells.Form != "D" {
		t.Errorf("alkaline keeps the D form it is made in: %q (%v)", s.Cells.Form, err)
	}

	// A profile fills every node field.
	p := scenario.Profiles()[0]
	s, err = applyEdit(scenario.Demo(), Edit{Path: "node.profile", Text: p.ID})
	if err != nil {
		t.Fatal(err)
	}
	want := scenario.Demo()
	scenario.ApplyProfile(&want, p.ID)
	if string(s.JSON()) != string(want.JSON()) {
		t.Errorf("profile %s: the scenario differs from scenario.ApplyProfile's", p.ID)
	}

	// A form factor is a string even when it reads as a number.
	s, err = applyEdit(s, Edit{Path: "cells.chemistry", Text: "li-ion"})
	if err == nil {
		s, err = applyEdit(s, Edit{Path: "cells.form", Text: "21700"})
	}
	if err != nil || s.Cells.Form != "21700" {
		t.Errorf("form 21700: %q (%v)", s.Cells.Form, err)
	}
	// A date goes in as typed and is checked by the engine.
	if _, err = applyEdit(scenario.Demo(), Edit{Path: "plan.start", Text: "2027-02-30"}); err == nil {
		t.Error("the engine took 30 February")
	}
}

func TestOptionsCoverTheEnums(t *testing.T) {
	s := scenario.Demo()
	for _, path := range []string{"site.placement", "harvest.kind", "site.climate.preset", "node.profile", "node.radio.class", "cells.chemistry"} {
		f, _ := scenario.FieldByPath(path)
		opts := optionsFor(s, path)
		if len(opts) != len(f.Enum) {
			t.Errorf("%s: %d options for %d values", path, len(opts), len(f.Enum))
		}
		for _, o := range opts {
			ok := false
			for _, e := range f.Enum {
				ok = ok || e == o.Value
			}
			if !ok || o.Label == "" {
				t.Errorf("%s: option %+v is not one of %v or has no label", path, o, f.Enum)
			}
		}
	}
	for _, p := range Places() {
		if _, err := applyEdit(s, Edit{Path: pathPlace, Text: p.Name}); err != nil {
			t.Errorf("place %s: %v", p.Name, err)
		}
	}
}

func TestFileName(t *testing.T) {
	for _, c := range []struct{ name, want string }{
		{"Brindle Market, Grünerløkka store: shelf watcher, aisle 4", "brindle-market-grünerløkka-store-shelf-watcher-aisle-4.json"},
		{"", "scenario.json"},
		{"  ---  ", "scenario.json"},
	} {
		if got := fileName(c.name, ".json"); got != c.want {
			t.Errorf("fileName(%q) = %q, want %q", c.name, got, c.want)
		}
	}
}

func TestHistory(t *testing.T) {
	var h History
	a, b, c := scenario.Demo(), scenario.Demo(), scenario.Demo()
	b.Name, c.Name = "b", "c"
	h.Record(a) // a → b
	h.Record(b) // b → c
	got, ok := h.Undo(c)
	if !ok || got.Name != "b" {
		t.Fatalf("Undo: %q %v, want b", got.Name, ok)
	}
	got, _ = h.Undo(got)
	if got.Name != a.Name || h.CanUndo() {
		t.Fatalf("second Undo: %q, can undo %v; want the first, nothing left", got.Name, h.CanUndo())
	}
	got, _ = h.Redo(got)
	got, _ = h.Redo(got)
	if got.Name != "c" || h.CanRedo() {
		t.Errorf("two Redos: %q, can redo %v; want c, nothing left", got.Name, h.CanRedo())
	}
	h.Undo(got)
	h.Record(b) // a new change forgets what could be redone
	if h.CanRedo() {
		t.Error("Redo after a new change")
	}
	h = History{Limit: 3}
	for range 10 {
		h.Record(a)
	}
	if u, _ := h.Depth(); u != 3 {
		t.Errorf("limit 3: %d steps kept", u)
	}
}

func TestAppChecksAsYouType(t *testing.T) {
	a, _ := newHosted(t)
	res := string(a.ResultJSON())
	tabTo(t, a, "node.vision.fps")
	a.step(chars("61"))
	want := a.Debug().Errors["node.vision.fps"]
	require.NotEmpty(t, want, "61 fps is marked before Enter")
	s := a.scen
	s.Node.Vision.FPS = 61
	_, perr := scenario.Parse(s.JSON())
	require.Error(t, perr)
	assert.Contains(t, perr.Error(), want, "in the engine's words")
	assert.Equal(t, res, string(a.ResultJSON()), "the answer stays until a value is applied")

	a.step(keys(KeyBackspace))
	assert.Empty(t, a.Debug().Errors["node.vision.fps"], "6 fps is fine")
	a.step(keys(KeyBackspace))
	assert.Empty(t, a.Debug().Errors["node.vision.fps"], "an empty field is not nagged about")
	a.step(chars("1..2"))
	assert.NotEmpty(t, a.Debug().Errors["node.vision.fps"], "not a number")
	for range 4 {
		a.step(keys(KeyBackspace))
	}
	a.step(chars("5"))
	assert.Empty(t, a.Debug().Errors["node.vision.fps"], "back at the applied value")
	a.step(keys(KeyBackspace))
	a.step(chars("7"))
	a.step(keys(KeyEnter))
	assert.Equal(t, 7.0, a.scen.Node.Vision.FPS)
	assert.Empty(t, a.Debug().Errors)
}
