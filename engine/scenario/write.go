package scenario

import (
	"bytes"
	"encoding/json"
	"strconv"
	"strings"
)

// JSON writes the scenario as an indented scenario file with every field, in
// the order of Fields. Parse(s.JSON()) gives s back.
func (s Scenario) JSON() []byte {
	var b bytes.Buffer
	b.WriteString("{")
	open := []string{} // the object path currently open, element by element
	first := []bool{true}
	indent := func() { b.WriteString("\n" + strings.Repeat("  ", len(open)+1)) }
	comma := func() {
		if !first[len(first)-1] {
			b.WriteString(",")
		}
		first[len(first)-1] = false
	}
	for _, f := range Fields() {
		v := f.Get(&s)
		if v == nil {
			continue // an optional field not given
		}
		parts := strings.Split(f.Path, ".")
		dirs, name := parts[:len(parts)-1], parts[len(parts)-1]
		// Close objects that this field is not in, then open the ones it is.
		common := 0
		for common < len(open) && common < len(dirs) && open[common] == dirs[common] {
			common++
		}
		for len(open) > common {
			open, first = open[:len(open)-1], first[:len(first)-1]
			indent()
			b.WriteString("}")
		}
		for _, d := range dirs[common:] {
			comma()
			indent()
			b.WriteString(strconv.Quote(d) + ": {")
			open, first = append(open, d), append(first, true)
		}
		comma()
		indent()
		b.WriteString(strconv.Quote(name) + ": ")
		switch x := v.(type) {
		case float64:
			b.WriteString(strconv.FormatFloat(x, 'g', -1, 64))
		case int:
			b.WriteString(strconv.Itoa(x))
		case string:
			q, _ := json.Marshal(x)
			b.Write(q)
		case []float64:
			b.WriteString("[")
			for i, y := range x {
				if i > 0 {
					b.WriteString(", ")
				}
				b.WriteString(strconv.FormatFloat(y, 'g', -1, 64))
			}
			b.WriteString("]")
		case bool:
			b.WriteString(strconv.FormatBool(x))
		case []string:
			q, _ := json.Marshal(x)
			b.Write(bytes.ReplaceAll(q, []byte(`","`), []byte(`", "`)))
		}
	}
	for len(open) > 0 {
		open = open[:len(open)-1]
		indent()
		b.WriteString("}")
	}
	b.WriteString("\n}\n")
	return b.Bytes()
}

// SetPath puts v at a dotted JSON path ("cells.capacity_mah") in a decoded
// scenario file, making the objects on the way where they are missing or
// are not objects. It lets callers change a few values of a file while
// keeping the rest as written.
func SetPath(root map[string]any, path string, v any) {
	parts := strings.Split(path, ".")
	obj := root
	for _, p := range parts[:len(parts)-1] {
		next, ok := obj[p].(map[string]any)
		if !ok {
			next = map[string]any{}
			obj[p] = next
		}
		obj = next
	}
	obj[parts[len(parts)-1]] = v
}
