package ui

import (
	"image/color"
	"math"
)

// Theme is the app's look: colours, type sizes and spacing. It is a value
// handed to the app and to every draw function; the zero Theme means Light().
type Theme struct {
	Palette Palette
	Type    TypeScale
	Space   Spacing
}

// Palette holds the colours by role. Text roles keep a contrast of at least
// 4.5:1 against the surfaces they are drawn on (theme_test.go checks it).
type Palette struct {
	Background   color.NRGBA // the page
	Panel        color.NRGBA // chart and answer panels, field boxes
	Rule         color.NRGBA // thin separators and panel edges (not text)
	Ink          color.NRGBA // main text
	InkSecondary color.NRGBA // labels, units, help, axis ticks
	Grid         color.NRGBA // chart grid lines (not text)
	Band         color.NRGBA // daily min–max state of charge, translucent
	Mean         color.NRGBA // daily mean state of charge
	Reserve      color.NRGBA // the reserve line and its label
	Swap         color.NRGBA // swap markers and labels
	Flat         color.NRGBA // brown-out / cell flat marker; also errors
	CautionFill  color.NRGBA
	CautionEdge  color.NRGBA // not text
	Focus        color.NRGBA // focus ring of a field (not text)
	ErrorFill    color.NRGBA // a field holding a bad value
	Harvest      color.NRGBA // harvest bars (not text)
	Load         color.NRGBA // load bars (not text)
	Accent       color.NRGBA // energy bars, progress (not text)
	// ShortDays shades the days under 12 h behind the chart's plot (not
	// text): in Light the strip's cold blue at about 8 % over the panel, in
	// Dark the page's background with a touch of it, a shade darker than the
	// panel. Both are fainter than the grid, which shows on them.
	ShortDays color.NRGBA
	// The temperature strip: cold at −20 °C, Mild at 20 °C, hot at 45 °C.
	TempCold, TempMild, TempHot color.NRGBA
}

// TypeScale is the text sizes in CSS pixels.
type TypeScale struct {
	Label  float64 // labels, units, help, ticks
	Body   float64 // values and running text
	Head   float64 // section heads
	Answer float64 // the lifetime
}

// Spacing is the grid in CSS pixels.
type Spacing struct {
	Unit   float64 // the base grid step; margins and gaps are multiples
	Margin float64 // around the page
	Gutter float64 // between columns
}

func hex(v uint32) color.NRGBA {
	return color.NRGBA{uint8(v >> 16), uint8(v >> 8), uint8(v), 0xff}
}

func withAlpha(c color.NRGBA, a float64) color.NRGBA {
	c.A = uint8(math.Round(a * 255))
	return c
}

// Light is the default theme, for light surroundings.
func Light() Theme {
	return Theme{
		Palette: Palette{
			Background:   hex(0xF6F4EF),
			Panel:        hex(0xFFFFFF),
			Rule:         hex(0xD9D5CC),
			Ink:          hex(0x1D2327),
			InkSecondary: hex(0x5B6770),
			Grid:         hex(0xECE9E2),
			Band:         withAlpha(hex(0x2A7F86), 0.25),
			Mean:         hex(0x1F6B72),
			Reserve:      hex(0x5B6770),
			Swap:         hex(0x7A5BA6),
			Flat:         hex(0xB3372B),
			CautionFill:  hex(0xFFF3D6),
			CautionEdge:  hex(0xD99A2B),
			Focus:        hex(0x1F6B72),
			ErrorFill:    hex(0xFCEBE8),
			Harvest:      hex(0xD99A2B),
			Load:         hex(0x5B6770),
			Accent:       hex(0x2A7F86),
			ShortDays:    hex(0xF1F4F9), // as the SVG chart's (engine/report)
			TempCold:     hex(0x4B7BB5),
			TempMild:     hex(0xE9E6DF),
			TempHot:      hex(0xC0563F),
		},
		Type:  defaultType(),
		Space: defaultSpace(),
	}
}

// Dark is the theme for dark surroundings.
func Dark() Theme {
	return Theme{
		Palette: Palette{
			Background:   hex(0x14181C),
			Panel:        hex(0x1C2228),
			Rule:         hex(0x333B43),
			Ink:          hex(0xE6E8EA),
			InkSecondary: hex(0x9AA5AE),
			Grid:         hex(0x262D34),
			Band:         withAlpha(hex(0x3FA7AF), 0.30),
			Mean:         hex(0x5CC4CC),
			Reserve:      hex(0x9AA5AE),
			Swap:         hex(0xA98BD6),
			Flat:         hex(0xE0655A),
			CautionFill:  hex(0x3A2F17),
			CautionEdge:  hex(0xE8B24E),
			Focus:        hex(0x5CC4CC),
			ErrorFill:    hex(0x3A1F1C),
			Harvest:      hex(0xE8B24E),
			Load:         hex(0x9AA5AE),
			Accent:       hex(0x3FA7AF),
			ShortDays:    hex(0x141A21),
			TempCold:     hex(0x4B7BB5),
			TempMild:     hex(0x2A2F35),
			TempHot:      hex(0xC0563F),
		},
		Type:  defaultType(),
		Space: defaultSpace(),
	}
}

// Sizes 12/14/20/32 px and an 8 px grid: our design notes (UI.md).
func defaultType() TypeScale { return TypeScale{Label: 12, Body: 14, Head: 20, Answer: 32} }
func defaultSpace() Spacing  { return Spacing{Unit: 8, Margin: 16, Gutter: 16} }

// Contrast is the WCAG 2.x contrast ratio of two opaque colours, 1 to 21.
//
// Reference: W3C, "Web Content Accessibility Guidelines (WCAG) 2.1", 2018,
// definitions of "contrast ratio" and "relative luminance".
func Contrast(a, b color.NRGBA) float64 {
	la, lb := luminance(a), luminance(b)
	if la < lb {
		la, lb = lb, la
	}
	return (la + 0.05) / (lb + 0.05)
}

func luminance(c color.NRGBA) float64 {
	lin := func(v uint8) float64 {
		s := float64(v) / 255
		if s <= 0.03928 {
			return s / 12.92
		}
		return math.Pow((s+0.055)/1.055, 2.4)
	}
	return 0.2126*lin(c.R) + 0.7152*lin(c.G) + 0.0722*lin(c.B)
}

// over composites a translucent colour over an opaque one.
func over(top, bottom color.NRGBA) color.NRGBA {
	a := float64(top.A) / 255
	mix := func(t, b uint8) uint8 { return uint8(math.Round(float64(t)*a + float64(b)*(1-a))) }
	return color.NRGBA{mix(top.R, bottom.R), mix(top.G, bottom.G), mix(top.B, bottom.B), 0xff}
}
