package scenario

import (
	"encoding/json"
	"strings"
)

// SchemaID is the $id of the published JSON Schema.
const SchemaID = "https://nodelife.invalid/scenario.schema.json"

// Schema returns the JSON Schema (draft 2020-12) of the scenario format,
// generated from Fields. engine/scenario/schema.json is its committed copy
// (`make schema` rewrites it; a test keeps the two equal).
func Schema() []byte {
	root := schemaObject("", "A nodelife scenario: one sensor node at one site over a planning horizon.")
	root["$schema"] = "https://json-schema.org/draft/2020-12/schema"
	root["$id"] = SchemaID
	root["title"] = "nodelife scenario, format " + Format
	objs := map[string]map[string]any{"": root}
	for _, f := range Fields() {
		parts := strings.Split(f.Path, ".")
		parent := objs[""]
		for i := range parts[:len(parts)-1] {
			p := strings.Join(parts[:i+1], ".")
			o, ok := objs[p]
			if !ok {
				o = schemaObject(p, objectDocs[p])
				objs[p] = o
				parent["properties"].(map[string]any)[parts[i]] = o
			}
			parent = o
		}
		parent["properties"].(map[string]any)[parts[len(parts)-1]] = fieldSchema(f)
	}
	b, err := json.MarshalIndent(root, "", "  ")
	if err != nil {
		panic("scenario: schema: " + err.Error())
	}
	return append(b, '\n')
}

// objectDocs describes each object of the format.
var objectDocs = map[string]string{
	"site":             "Where the node is and what surrounds it.",
	"site.climate":     "Monthly normals, January first: a built-in preset, or values of your own month by month.",
	"site.enclosure":   "The node's housing, which the sun warms outdoors.",
	"site.hours":       "When the site is open, on its local clock (lighting and setback follow it).",
	"site.lighting":    "The site's lights at the node (indoor and fixed placements).",
	"node.illuminator": "The LED that lights dark scenes for the camera.",
	"node.radio":       "How the node sends a message: one per wake, one per heartbeat.",
	"node.heartbeat":   "Periodic status messages.",
	"harvest.panel":    "A small solar panel (harvest.kind \"panel\").",
	"harvest.indoor":   "An indoor-light photovoltaic cell (harvest.kind \"indoor\").",
	"node":             "The sensor node's own consumption.",
	"node.vision":      "The always-on camera.",
	"node.events":      "Detections that wake a host processor and send a message.",
	"cells":            "The node's battery: identical cells in series × parallel.",
	"harvest":          "The energy harvester.",
	"plan":             "The planning horizon and the swap rules.",
	"cost":             "What the plan costs, in one currency (defaults are invented demo figures).",
}

func schemaObject(path, doc string) map[string]any {
	return map[string]any{
		"type":                 "object",
		"description":          doc,
		"additionalProperties": false,
		"properties":           map[string]any{},
	}
}

func fieldSchema(f Field) map[string]any {
	m := map[string]any{"description": f.Doc}
	if f.Unit != "" {
		m["description"] = f.Doc + " (" + f.Unit + ")"
	}
	switch f.Kind {
	case Number, Integer:
		m["type"] = "number"
		if f.Kind == Integer {
			m["type"] = "integer"
		}
		if f.Optional {
			m["type"] = []string{m["type"].(string), "null"}
		}
		m["minimum"], m["maximum"] = f.Min, f.Max
	case Text:
		m["type"], m["maxLength"] = "string", int(f.Max)
	case Choice:
		m["type"], m["enum"] = "string", f.Enum
	case Date:
		m["type"], m["format"] = "string", "date"
		m["formatMinimum"], m["formatMaximum"] = MinDate, MaxDate
	case Zone:
		m["type"] = "string"
		m["description"] = f.Doc + " (an IANA time zone name)"
	case Clock:
		m["type"], m["pattern"] = "string", `^(([01][0-9]|2[0-3]):[0-5][0-9]|24:00)$`
	case NumberList:
		m["type"] = "array"
		m["items"] = map[string]any{"type": "number", "minimum": f.Min, "maximum": f.Max}
		if f.Len > 0 {
			m["minItems"], m["maxItems"] = f.Len, f.Len
		} else {
			m["maxItems"] = f.MaxLen
		}
	case Bool:
		m["type"] = "boolean"
	case ChoiceList:
		m["type"], m["uniqueItems"] = "array", true
		m["items"] = map[string]any{"type": "string", "enum": f.Enum}
		if f.MinLen > 0 {
			m["minItems"] = f.MinLen
		}
		if f.MaxLen > 0 {
			m["maxItems"] = f.MaxLen
		}
	}
	if !f.Optional {
		m["default"] = f.Default
	}
	return m
}
