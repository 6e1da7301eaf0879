// Package ui is the browser app: an ebiten game that shows one scenario's
// inputs as editable fields, its state-of-charge chart and its answer, and
// re-runs the engine when a value is committed.
//
// The pieces, each in its own file:
//
//   - App (app.go) is the ebiten.Game: it reads one Input snapshot per tick
//     (input.go, the only place that asks ebiten for input), hands it to the
//     widgets, re-runs plan.Run on a committed edit, and redraws only when
//     something changed.
//   - Widgets keep state apart from drawing: NumberField (numberfield.go) and
//     Form (form.go, its fields listed in fields.go) change state in
//     Update(*Input); their draw functions only read. Tests drive them with
//     hand-made Inputs. A committed value is checked by the engine's own
//     parser (edit.go), so the app refuses what a file would be refused for.
//   - LayoutPage (layout.go) places the header, the fields, the chart and the
//     answer for a window size in CSS pixels. The chart's scales, ticks and
//     label placement (chart.go), its layout (chartview.go) and the answer's
//     wording (answer.go) are pure functions that fill display lists
//     (display.go) of positioned text, which tests check and drawing paints.
//   - Theme (theme.go) holds the palette, type sizes and spacing as a value;
//     Fonts (fonts.go) parses the Go fonts once.
//
// All geometry is in CSS pixels; Painter (paint.go) multiplies by the device
// scale factor when it draws, so text and lines are sharp on high-DPI screens.
// api.go is what the page's JavaScript bridge calls, in plain Go so that it is
// tested natively.
package ui
