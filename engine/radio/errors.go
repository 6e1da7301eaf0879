package radio

import (
	"errors"
	"strconv"
	"strings"
)

// ErrRange is the sentinel of every *FieldError: a parameter's value is not
// allowed.
var ErrRange = errors.New("value not allowed")

// FieldError is a radio parameter whose value is not allowed. Its message
// reads like "lora.spreading_factor: 13 is out of range (allowed: 7 to 12)".
type FieldError struct {
	Path    string // the parameter, e.g. "lora.spreading_factor"
	Value   string // the value as given, e.g. "13"
	Problem string // what is wrong, e.g. "is out of range"
	Allowed string // what is allowed, e.g. "7 to 12"
}

func (e *FieldError) Error() string {
	var b strings.Builder
	b.WriteString(e.Path)
	b.WriteString(": ")
	if e.Value != "" {
		b.WriteString(e.Value)
		b.WriteByte(' ')
	}
	b.WriteString(e.Problem)
	if e.Allowed != "" {
		b.WriteString(" (allowed: ")
		b.WriteString(e.Allowed)
		b.WriteByte(')')
	}
	return b.String()
}

// Unwrap returns ErrRange.
func (e *FieldError) Unwrap() error { return ErrRange }

// checker collects every problem of one parameter set, in field order.
type checker struct{ errs []error }

func (c *checker) add(path, value, problem, allowed string) {
	c.errs = append(c.errs, &FieldError{Path: path, Value: value, Problem: problem, Allowed: allowed})
}

// float checks lo ≤ v ≤ hi; NaN fails. unit follows the range in the message.
func (c *checker) float(path string, v, lo, hi float64, unit string) {
	if v >= lo && v <= hi {
		return
	}
	allowed := fmtFloat(lo) + " to " + fmtFloat(hi)
	if unit != "" {
		allowed += " " + unit
	}
	c.add(path, fmtFloat(v), "is out of range", allowed)
}

// positive checks 0 < v ≤ hi; NaN fails.
func (c *checker) positive(path string, v, hi float64, unit string) {
	if v > 0 && v <= hi {
		return
	}
	c.add(path, fmtFloat(v), "is out of range", "more than 0, up to "+fmtFloat(hi)+" "+unit)
}

// integer checks lo ≤ v ≤ hi.
func (c *checker) integer(path string, v, lo, hi int) {
	if v >= lo && v <= hi {
		return
	}
	c.add(path, strconv.Itoa(v), "is out of range", strconv.Itoa(lo)+" to "+strconv.Itoa(hi))
}

// burst checks a phase's duration and current.
func (c *checker) burst(path string, b Burst) {
	c.float(path+".duration_s", b.DurationS, 0, maxPhaseS, "s")
	c.float(path+".current_ma", b.CurrentMA, 0, maxCurrentMA, "mA")
}

func (c *checker) err() error { return errors.Join(c.errs...) }

func fmtFloat(v float64) string { return strconv.FormatFloat(v, 'g', -1, 64) }
