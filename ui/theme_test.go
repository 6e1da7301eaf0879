package ui

import (
	"image/color"
	"testing"
)

func TestTextContrast(t *testing.T) {
	// WCAG 2.1 level AA asks 4.5:1 for body text.
	const minContrast = 4.5
	for name, th := range map[string]Theme{"light": Light(), "dark": Dark()} {
		p := th.Palette
		pairs := []struct {
			what   string
			fg, bg color.NRGBA
		}{
			{"ink on background", p.Ink, p.Background},
			{"secondary on background", p.InkSecondary, p.Background},
			{"ink on panel", p.Ink, p.Panel},
			{"secondary on panel", p.InkSecondary, p.Panel},
			{"caution text", p.Ink, p.CautionFill},
			{"error text on background", p.Flat, p.Background},
			{"flat date on panel", p.Flat, p.Panel},
			{"swap label on panel", p.Swap, p.Panel},
			{"reserve label on panel", p.Reserve, p.Panel},
			{"value in a refused box", p.Ink, p.ErrorFill},
			{"unit in a refused box", p.InkSecondary, p.ErrorFill},
			{"selected text", p.Ink, selectionColor(p)},
			{"chosen segment", p.Panel, p.Mean},
			{"notice text", p.Ink, p.CautionFill},
		}
		for _, c := range pairs {
			if got := Contrast(c.fg, c.bg); got < minContrast {
				t.Errorf("%s: %s contrast %.2f, want ≥ %.1f", name, c.what, got, minContrast)
			}
		}
	}
}

func TestContrastKnownValues(t *testing.T) {
	// Black on white is 21:1 by the WCAG definition; a colour on itself 1:1.
	black, white := hex(0x000000), hex(0xFFFFFF)
	if got := Contrast(black, white); got < 20.99 || got > 21.01 {
		t.Errorf("Contrast(black, white) = %g, want 21", got)
	}
	if got := Contrast(white, white); got != 1 {
		t.Errorf("Contrast(white, white) = %g, want 1", got)
	}
}
