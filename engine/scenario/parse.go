package scenario

import (
	"encoding/json"
	"errors"
	"fmt"
	"math"
	"sort"
	"strconv"
	"strings"
	"time"
	"unicode/utf8"

	"github.com/tidwall/gjson"

	"nodelife/engine/cell"
)

// Parse reads a scenario file. Absent fields take their defaults. On bad
// input it returns *SyntaxError or Errors listing every problem in file order;
// each problem is a *FieldError.
func Parse(data []byte) (Scenario, error) {
	if !gjson.ValidBytes(data) {
		return Scenario{}, syntaxError(data)
	}
	root := gjson.ParseBytes(data)
	if !root.IsObject() {
		return Scenario{}, Errors{&FieldError{Path: "(top level)", Value: short(root.Raw),
			Problem: "is not a JSON object", Allowed: `an object such as {"format": "` + Format + `", …}`, Err: ErrType}}
	}
	p := parser{fields: map[string]Field{}, objects: objects(), s: Default(), present: map[string]bool{}}
	for _, f := range Fields() {
		p.fields[f.Path] = f
	}
	p.object("", root)
	p.applyProfile()
	p.crossChecks()
	if len(p.errs) > 0 {
		return Scenario{}, p.errs
	}
	return p.s, nil
}

type parser struct {
	fields  map[string]Field
	objects map[string]bool
	s       Scenario
	errs    Errors
	present map[string]bool // leaf paths the file gives
}

// applyProfile fills the node fields the file leaves out from its profile.
func (p *parser) applyProfile() {
	prof, ok := LookupProfile(p.s.Node.Profile)
	if !ok {
		return
	}
	for path, v := range prof.Values {
		if !p.present[path] {
			p.fields[path].set(&p.s, v)
		}
	}
}

func (p *parser) fail(path string, value gjson.Result, problem, allowed string, sentinel error) {
	p.errs = append(p.errs, &FieldError{Path: path, Value: short(value.Raw), Problem: problem, Allowed: allowed, Err: sentinel})
}

func (p *parser) object(prefix string, obj gjson.Result) {
	seen := map[string]bool{}
	obj.ForEach(func(key, value gjson.Result) bool {
		name := key.String()
		path := join(prefix, name)
		if seen[name] {
			p.fail(path, gjson.Result{}, "appears twice", "each key once", ErrUnknownKey)
			return true
		}
		seen[name] = true
		switch {
		case p.objects[path]:
			if !value.IsObject() {
				p.fail(path, value, "is not an object", "an object of "+strings.Join(p.children(path), ", "), ErrType)
				return true
			}
			p.object(path, value)
		case p.fields[path].Path != "":
			p.leaf(p.fields[path], value)
		default:
			p.errs = append(p.errs, &FieldError{Path: path, Problem: "is not a known key" + p.suggest(prefix, name),
				Allowed: "keys " + strings.Join(p.children(prefix), ", "), Err: ErrUnknownKey})
		}
		return true
	})
}

func (p *parser) leaf(f Field, v gjson.Result) {
	p.present[f.Path] = true
	if v.Type == gjson.Null && f.Optional {
		return
	}
	switch f.Kind {
	case Bool:
		if v.Type != gjson.True && v.Type != gjson.False {
			p.fail(f.Path, v, "is not true or false", "true or false", ErrType)
			return
		}
		*f.ref(&p.s).(*bool) = v.Bool()
	case Number, Integer:
		x, ok := p.number(f, f.Path, v)
		if !ok {
			return
		}
		switch ptr := f.ref(&p.s).(type) {
		case *float64:
			*ptr = x
		case **float64:
			*ptr = &x
		case *int:
			*ptr = int(x)
		}
	case NumberList:
		if !v.IsArray() {
			p.fail(f.Path, v, "is not a list of numbers", allowedText(f), ErrType)
			return
		}
		items := v.Array()
		if (f.Len > 0 && len(items) != f.Len) || (f.MaxLen > 0 && len(items) > f.MaxLen) {
			p.fail(f.Path, v, fmt.Sprintf("has %d values", len(items)), allowedText(f), ErrRange)
			return
		}
		xs := make([]float64, 0, len(items))
		for i, item := range items {
			x, ok := p.number(f, fmt.Sprintf("%s[%d]", f.Path, i), item)
			if !ok {
				return
			}
			xs = append(xs, x)
		}
		*f.ref(&p.s).(*[]float64) = xs
	case ChoiceList:
		if !v.IsArray() {
			p.fail(f.Path, v, "is not a list", allowedText(f), ErrType)
			return
		}
		if n := len(v.Array()); n < f.MinLen || (f.MaxLen > 0 && n > f.MaxLen) {
			p.fail(f.Path, v, fmt.Sprintf("has %d values", n), allowedText(f), ErrRange)
			return
		}
		seen := map[string]bool{}
		out := []string{}
		for i, item := range v.Array() {
			path := fmt.Sprintf("%s[%d]", f.Path, i)
			if item.Type != gjson.String {
				p.fail(path, item, "is not a string", allowedText(f), ErrType)
				return
			}
			str := item.String()
			if checkString(Field{Kind: Choice, Enum: f.Enum}, str) != "" {
				p.fail(path, item, "is not one of the choices", allowedText(f), ErrRange)
				return
			}
			if seen[str] {
				p.fail(path, item, "appears twice", allowedText(f), ErrRange)
				return
			}
			seen[str] = true
			out = append(out, str)
		}
		*f.ref(&p.s).(*[]string) = out
	default:
		if v.Type != gjson.String {
			p.fail(f.Path, v, "is not a string", allowedText(f), ErrType)
			return
		}
		str := v.String()
		if msg := checkString(f, str); msg != "" {
			p.fail(f.Path, v, msg, allowedText(f), ErrRange)
			return
		}
		*f.ref(&p.s).(*string) = str
	}
}

// number reads one number of field f at path, reporting what is wrong.
func (p *parser) number(f Field, path string, v gjson.Result) (float64, bool) {
	if v.Type != gjson.Number {
		p.fail(path, v, "is not a number", rangeText(f), ErrType)
		return 0, false
	}
	x := v.Num
	if f.Kind == Integer && x != math.Trunc(x) {
		p.fail(path, v, "is not a whole number", rangeText(f), ErrType)
		return 0, false
	}
	if x < f.Min || x > f.Max {
		p.fail(path, v, "is out of range", rangeText(f), ErrRange)
		return 0, false
	}
	return x, true
}

// checkString returns what is wrong with str as a value of f, or "".
func checkString(f Field, str string) string {
	switch f.Kind {
	case Text:
		if utf8.RuneCountInString(str) > int(f.Max) {
			return "is too long"
		}
	case Choice:
		for _, e := range f.Enum {
			if e == str {
				return ""
			}
		}
		return "is not one of the choices"
	case Date:
		d, err := time.Parse(time.DateOnly, str)
		if err != nil {
			return "is not a calendar date"
		}
		if d.Format(time.DateOnly) < MinDate || d.Format(time.DateOnly) > MaxDate {
			return "is out of range"
		}
	case Clock:
		if _, ok := ClockMinutes(str); !ok {
			return "is not a time of day"
		}
	case Zone:
		// "" and "Local" are names the Go library accepts but that are not IANA zones.
		if str == "" || str == "Local" {
			return "is not an IANA time zone"
		}
		if _, err := time.LoadLocation(str); err != nil {
			return "is not an IANA time zone"
		}
	}
	return ""
}

// crossChecks tests what depends on more than one field.
func (p *parser) crossChecks() {

	if r := p.s.Node.Radio; r.Class == "ble" && r.PayloadBytes > 31 {
		p.errs = append(p.errs, &FieldError{Path: "node.radio.payload_bytes", Value: strconv.Itoa(r.PayloadBytes),
			Problem: "is too long for BLE advertising", Allowed: "0 to 31 bytes of advertising data with node.radio.class ble", Err: ErrRange})
	}
	if tmin, tmax, ok := p.s.Normals(); ok {
		for i := range tmin {
			if tmin[i] > tmax[i] {
				p.errs = append(p.errs, &FieldError{Path: fmt.Sprintf("site.climate.tmax_c[%d]", i), Value: fmtNum(tmax[i]),
					Problem: "is below the month's minimum", Allowed: fmt.Sprintf("at least site.climate.tmin_c[%d], %s °C", i, fmtNum(tmin[i])), Err: ErrRange})
			}
		}
	}
	chem, ok := cell.Lookup(p.s.Cells.Chemistry)
	if !ok {
		return // already reported
	}
	if _, ok := chem.Form(p.s.Cells.Form); !ok {
		p.errs = append(p.errs, &FieldError{Path: "cells.form", Value: strconv.Quote(p.s.Cells.Form),
			Problem: "is not made in " + chem.ID, Allowed: strings.Join(chem.FormNames(), ", "), Err: ErrRange})
	}
}

// children lists the keys allowed directly under an object path.
func (p *parser) children(prefix string) []string {
	var names []string
	add := func(path string) {
		rest, ok := strings.CutPrefix(path, prefix)
		if prefix != "" {
			if !ok || !strings.HasPrefix(rest, ".") {
				return
			}
			rest = rest[1:]
		}
		if rest != "" && !strings.Contains(rest, ".") {
			names = append(names, rest)
		}
	}
	for _, f := range Fields() {
		add(f.Path)
	}
	var objs []string
	for o := range p.objects {
		objs = append(objs, o)
	}
	sort.Strings(objs)
	for _, o := range objs {
		add(o)
	}
	return names
}

// suggest returns `; did you mean "x"?` for a close sibling key or a key of
// that name elsewhere in the file, or "".
func (p *parser) suggest(prefix, name string) string {
	best, bestD := "", 1<<30
	for _, c := range p.children(prefix) {
		d := editDistance(strings.ToLower(name), c)
		// "lat" for "lat_deg", or "latitude" for "lat_deg": a shared stem.
		stem, _, _ := strings.Cut(c, "_")
		lower := strings.ToLower(name)
		if (strings.HasPrefix(c, lower) && len(name) >= 2) || (len(stem) >= 3 && strings.HasPrefix(lower, stem)) {
			d = 1
		}
		if d < bestD {
			best, bestD = c, d
		}
	}
	if best != "" && bestD <= max(2, len(name)/3) {
		return fmt.Sprintf("; did you mean %q?", join(prefix, best))
	}
	for _, f := range Fields() {
		if f.Name() == name {
			return fmt.Sprintf("; did you mean %q?", f.Path)
		}
	}
	return ""
}

// editDistance is the Levenshtein distance between a and b.
func editDistance(a, b string) int {
	ra, rb := []rune(a), []rune(b)
	prev := make([]int, len(rb)+1)
	cur := make([]int, len(rb)+1)
	for j := range prev {
		prev[j] = j
	}
	for i := 1; i <= len(ra); i++ {
		cur[0] = i
		for j := 1; j <= len(rb); j++ {
			cost := 1
			if ra[i-1] == rb[j-1] {
				cost = 0
			}
			cur[j] = min(prev[j]+1, cur[j-1]+1, prev[j-1]+cost)
		}
		prev, cur = cur, prev
	}
	return prev[len(rb)]
}

func rangeText(f Field) string {
	kind := "a number"
	if f.Kind == Integer {
		kind = "a whole number"
	}
	s := fmt.Sprintf("%s from %s to %s", kind, fmtNum(f.Min), fmtNum(f.Max))
	if f.Unit != "" {
		s += " " + f.Unit
	}
	if f.Optional {
		s += ", or null"
	}
	return s
}

func allowedText(f Field) string {
	switch f.Kind {
	case Text:
		return fmt.Sprintf("a string of at most %d characters", int(f.Max))
	case Choice:
		q := make([]string, len(f.Enum))
		for i, e := range f.Enum {
			q[i] = strconv.Quote(e)
		}
		return strings.Join(q, ", ")
	case Date:
		return "a date YYYY-MM-DD from " + MinDate + " to " + MaxDate
	case Zone:
		return `an IANA time zone name such as "Europe/Oslo" or "America/Denver"`
	case Clock:
		return `a time "HH:MM" from "00:00" to "24:00"`
	case NumberList:
		n := fmt.Sprintf("up to %d", f.MaxLen)
		if f.Len > 0 {
			n = fmt.Sprint(f.Len)
		}
		s := fmt.Sprintf("a list of %s numbers, each from %s to %s", n, fmtNum(f.Min), fmtNum(f.Max))
		if f.Unit != "" {
			s += " " + f.Unit
		}
		return s
	case ChoiceList:
		s := "a list of distinct values from " + allowedText(Field{Kind: Choice, Enum: f.Enum})
		if f.MinLen > 0 {
			s = fmt.Sprintf("a list of at least %d distinct values from %s", f.MinLen, allowedText(Field{Kind: Choice, Enum: f.Enum}))
		}
		if f.MaxLen > 0 {
			s += fmt.Sprintf(", at most %d", f.MaxLen)
		}
		return s
	case Bool:
		return "true or false"
	}
	return rangeText(f)
}

// ClockMinutes reads "HH:MM" (00:00 to 24:00) as minutes after midnight.
func ClockMinutes(s string) (int, bool) {
	if len(s) != 5 || s[2] != ':' {
		return 0, false
	}
	h, err1 := strconv.Atoi(s[:2])
	m, err2 := strconv.Atoi(s[3:])
	if err1 != nil || err2 != nil || h < 0 || h > 24 || m < 0 || m > 59 || (h == 24 && m != 0) ||
		s[0] == '+' || s[0] == '-' || s[3] == '+' || s[3] == '-' {
		return 0, false
	}
	return h*60 + m, true
}

func fmtNum(x float64) string { return strconv.FormatFloat(x, 'f', -1, 64) }

func join(prefix, name string) string {
	if prefix == "" {
		return name
	}
	return prefix + "." + name
}

// short trims a raw JSON value for an error message.
func short(raw string) string {
	raw = strings.TrimSpace(raw)
	if utf8.RuneCountInString(raw) > 40 {
		return string([]rune(raw)[:37]) + "…"
	}
	return raw
}

// syntaxError locates malformed JSON with encoding/json's offset.
func syntaxError(data []byte) error {
	var v any
	err := json.Unmarshal(data, &v)
	var se *json.SyntaxError
	offset := int64(len(data))
	msg := "not valid JSON"
	if errors.As(err, &se) {
		offset, msg = se.Offset, se.Error()
	} else if err != nil {
		msg = err.Error()
	}
	line, col := 1, 1
	// encoding/json's offset counts the bad byte; point at it.
	for i := int64(0); i < offset-1 && i < int64(len(data)); i++ {
		if data[i] == '\n' {
			line, col = line+1, 1
		} else {
			col++
		}
	}
	return &SyntaxError{Line: line, Column: col, Msg: msg}
}
