package ui

import (
	"strings"
	"testing"
)

func TestWrap(t *testing.T) {
	m := fonts(t)
	st := TextStyle{Regular, 12}
	text := "Lithium thionyl chloride cells build a passivation layer in storage: the first pulses after a long shelf time can sag."
	for _, width := range []float64{60, 150, 280, 2000} {
		lines := Wrap(m, text, st, width)
		for _, l := range lines {
			if w := m.Advance(l, st); w > width {
				t.Errorf("width %g: line %q is %g px", width, l, w)
			}
		}
		got, want := strings.Join(lines, " "), text
		if width < m.Advance("passivation", st) { // a word is broken: compare without spaces
			got, want = strings.ReplaceAll(got, " ", ""), strings.ReplaceAll(want, " ", "")
		}
		if got != want {
			t.Errorf("width %g: words lost or changed: %q", width, got)
		}
		if width == 2000 && len(lines) != 1 {
			t.Errorf("width 2000: %d lines, want 1", len(lines))
		}
	}
	// A word wider than the line is broken between characters.
	lines := Wrap(m, "0123456789012345678901234567890123456789", st, 50)
	if len(lines) < 2 || strings.Join(lines, "") != "0123456789012345678901234567890123456789" {
		t.Errorf("long word: %q", lines)
	}
}

func TestElide(t *testing.T) {
	m := fonts(t)
	st := TextStyle{Medium, 16}
	name := "Brindle Market, Grünerløkka store: shelf watcher, aisle 4"
	if got := Elide(m, name, st, 1000); got != name {
		t.Errorf("room enough: %q, want it whole", got)
	}
	got := Elide(m, name, st, 150)
	if !strings.HasSuffix(got, "…") || m.Advance(got, st) > 150 || !strings.HasPrefix(name, strings.TrimSuffix(got, "…")) {
		t.Errorf("150 px: %q (%g px)", got, m.Advance(got, st))
	}
}
