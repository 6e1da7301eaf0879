package scenario

import (
	"errors"
	"fmt"
	"strings"
)

// Sentinels for errors.Is on a *FieldError or *SyntaxError.
var (
	ErrSyntax     = errors.New("not valid JSON")
	ErrUnknownKey = errors.New("unknown key")
	ErrType       = errors.New("wrong type")
	ErrRange      = errors.New("value not allowed")
)

// FieldError is a problem with one value of a scenario file.
type FieldError struct {
	Path    string // JSON path of the value, e.g. "cells.capacity_mah"
	Value   string // the value as written in the file (raw JSON)
	Problem string // what is wrong, e.g. "is out of range"
	Allowed string // what is allowed, e.g. "1 to 1000000 mAh"
	Err     error  // one of the sentinels
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

func (e *FieldError) Unwrap() error { return e.Err }

// SyntaxError is malformed JSON, located by line and column (both from 1).
type SyntaxError struct {
	Line, Column int
	Msg          string
}

func (e *SyntaxError) Error() string {
	return fmt.Sprintf("line %d, column %d: %s", e.Line, e.Column, e.Msg)
}

func (e *SyntaxError) Unwrap() error { return ErrSyntax }

// Errors is every problem found in one file, in file order.
type Errors []error

func (es Errors) Error() string {
	msgs := make([]string, len(es))
	for i, e := range es {
		msgs[i] = e.Error()
	}
	return strings.Join(msgs, "\n")
}

// Unwrap lets errors.Is and errors.As look at each problem.
func (es Errors) Unwrap() []error { return es }
