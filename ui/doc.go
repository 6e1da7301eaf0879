// Package ui is the browser app: an ebiten game that shows one scenario's
// inputs, its state-of-charge chart and its answer, re-runs the engine when a
// value is committed, and works out the advice in the background.
//
// The pieces, each in its own file:
//
//   - App (app.go) is the ebiten.Game: it reads one Input snapshot per tick
//     (input.go, the only place that asks ebiten for input), hands it to the
//     widgets, re-runs plan.Planner on a committed edit, keeps the undo
//     History (history.go), and redraws only when something changed. Its
//     header actions and export menu are in actions.go; the page around it
//     (autosave, downloads, the file picker) is a Host.
//   - Widgets keep state apart from drawing: TextField (textfield.go: numbers,
//     dates, positions, time zones), Choice (choice.go: drop-downs and
//     segments) and Slider (slider.go) change state in Update(*Input); their
//     draw functions only read. Form (form.go) is the rows of them in Tab
//     order, grouped, their specs in fields.go and the example places in
//     places.go. Tests drive them with hand-made Inputs. A committed value is
//     checked by the engine's own parser (edit.go), so the app refuses what a
//     file would be refused for.
//   - LayoutPage (layout.go) places the header, the inputs, the chart and the
//     side column (answer, advice, energy, cautions; answer.go) for a window
//     size in CSS pixels. The chart's scales, ticks, bins and label placement
//     (chart.go), its layout with the temperature strip and monthly bars
//     (chartview.go) and the hover read-out (hover.go) are pure functions that
//     fill display lists (display.go) of positioned text, which tests check
//     and drawing paints.
//   - The advice (advice.go) runs plan.Advise in a goroutine after the answer
//     is on screen, shows its progress, and is cancelled when the scenario
//     changes; in the browser it waits for a tick between runs (yield_js.go)
//     so the page keeps taking input and drawing.
//   - Theme (theme.go) holds the palette, type sizes and spacing as a value;
//     Fonts (fonts.go) parses the Go fonts once.
//
// All geometry is in CSS pixels; Painter (paint.go) multiplies by the device
// scale factor when it draws, so text and lines are sharp on high-DPI screens.
// api.go is what the page's JavaScript bridge calls, in plain Go so that it is
// tested natively.
package ui
